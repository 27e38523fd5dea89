/**
 * Skyline (src/core/shading/skyline.ts): sector look-up, and the sky view factor of a vertical window.
 *
 * Sources: the view factor from a small plane element to part of the sky is the integral
 * F = (1/π) ∫ cos θ dω over the visible directions — the definition of the differential view
 * factor (Incropera & DeWitt, *Fundamentals of Heat and Mass Transfer*, ch. 13, view-factor
 * integral; from memory, no equation number quoted). Here it is evaluated by a plain numeric double
 * integral over altitude and azimuth, independently of the closed form in the module, and the open
 * horizon must give the isotropic-sky factor of a vertical surface, (1 + cos 90°)/2 = ½ (Liu & Jordan
 * isotropic sky, as in Duffie & Beckman, *Solar Engineering of Thermal Processes*, §2.15 — from
 * memory), i.e. a multiplier of 1.
 *
 * Tolerance of the numeric integral: midpoint rule on a 0.125° × 0.125° grid; the integrand is
 * bounded by 1 and jumps only along sector edges (in azimuth) and skyline elevations (in
 * altitude), so the error is below (edge cells) × (cell area)/(π/2) ≈ 2e-3; we allow 3e-3 (and
 * 6e-3 for the random skylines, integrated on a coarser 0.25° grid to keep the test quick).
 */
import fc from 'fast-check';
import { SunpaneError } from '../../../src/core/common/errors';
import { requireSkyline, skylineElevationAt, skylineSkyViewFactor } from '../../../src/core/shading/skyline';

const RAD = Math.PI / 180;

/** Multiplier 2F with F = (1/π)∫∫ cos θ dω, cos θ = cos h cos ψ, dω = cos h dh dψ, by the midpoint rule. */
function numericMultiplier(skyline: number[], surfaceAzimuth: number, step = 0.125): number {
  let sum = 0;
  const n = skyline.length;
  for (let psi = -90 + step / 2; psi < 90; psi += step) {
    const az = (((surfaceAzimuth + psi) % 360) + 360) % 360;
    const alpha = skyline[Math.min(n - 1, Math.floor((az * n) / 360))];
    const cosPsi = Math.cos(psi * RAD);
    for (let h = step / 2; h < 90; h += step) {
      if (h < alpha) continue;
      const cosH = Math.cos(h * RAD);
      sum += cosH * cosPsi * cosH;
    }
  }
  const F = (sum * (step * RAD) * (step * RAD)) / Math.PI;
  return 2 * F;
}

describe('skylineElevationAt', () => {
  const skyline = [10, 20, 30, 40]; // sectors [0, 90), [90, 180), [180, 270), [270, 360)
  test.each([
    [0, 10],
    [89.999, 10],
    [90, 20],
    [180, 30],
    [269.9, 30],
    [270, 40],
    [359.99, 40],
    [360, 10],
    [-90, 40],
    [725, 10],
  ])('at azimuth %p the elevation is %p° (sector includes its start, wraps round)', (az, el) => {
    expect(skylineElevationAt(skyline, az)).toBe(el);
  });

  test('one value is a uniform skyline', () => {
    expect(skylineElevationAt([12.5], 200)).toBe(12.5);
  });
});

describe('skylineSkyViewFactor', () => {
  test('an open horizon gives 1, a wall of 90° all round gives 0', () => {
    expect(skylineSkyViewFactor([0], 123)).toBeCloseTo(1, 14);
    expect(skylineSkyViewFactor([90, 90, 90], 10)).toBeCloseTo(0, 14);
  });

  test('the open-horizon case agrees with the numeric integral (which must give ½ · 2 = 1)', () => {
    expect(Math.abs(numericMultiplier([0], 0) - 1)).toBeLessThan(1e-5);
  });

  test('a uniform skyline at α gives 1 − 2α/π − sin 2α / π and matches the numeric integral', () => {
    for (const deg of [5, 15, 30, 45, 60, 80]) {
      const a = deg * RAD;
      const closed = 1 - (2 * a) / Math.PI - Math.sin(2 * a) / Math.PI;
      expect(skylineSkyViewFactor([deg], 77)).toBeCloseTo(closed, 12);
      expect(Math.abs(numericMultiplier([deg], 77) - closed)).toBeLessThan(3e-3);
    }
  });

  test('random skylines of 1–36 sectors and any wall azimuth agree with the numeric integral within 3e-3', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 90, noNaN: true }), { minLength: 1, maxLength: 36 }),
        fc.double({ min: 0, max: 360, noNaN: true }),
        (skyline, surfaceAzimuth) => {
          const ours = skylineSkyViewFactor(skyline, surfaceAzimuth);
          expect(Math.abs(ours - numericMultiplier(skyline, surfaceAzimuth, 0.25))).toBeLessThan(6e-3);
        },
      ),
      { numRuns: 25, seed: 12 },
    );
  });

  test('obstructions behind the wall do not matter', () => {
    // South wall: sectors centred on north (0–90 and 270–360 of 4) are behind it.
    expect(skylineSkyViewFactor([80, 0, 0, 80], 180)).toBeCloseTo(1, 14);
  });

  test('a skyline only on one side of the normal halves the obstruction of the same skyline on both sides', () => {
    const both = 1 - skylineSkyViewFactor([0, 40, 40, 0], 180);
    const one = 1 - skylineSkyViewFactor([0, 40, 0, 0], 180);
    expect(one).toBeCloseTo(both / 2, 12);
  });
});

describe('bad skylines name the argument', () => {
  test.each([[[]], [[-1]], [[10, 90.5]], [[Number.NaN]], ['30']])('%p', (sky) => {
    let caught: unknown;
    try {
      requireSkyline(sky as unknown);
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(SunpaneError);
    expect((caught as SunpaneError).argument).toBe('skyline');
  });

  test('a non-finite azimuth or surface azimuth is refused by name', () => {
    expect(() => skylineElevationAt([0], Number.NaN)).toThrow(/^azimuth/);
    expect(() => skylineSkyViewFactor([0], Infinity)).toThrow(/^surfaceAzimuth/);
  });
});
