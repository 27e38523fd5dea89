/**
 * Invariants, edge cases and bad input of the sky modules: extraterrestrial irradiance, clear-sky
 * models and Erbs decomposition. Published check values are in tests/reference/.
 */
import fc from 'fast-check';
import { ashraeClearSky, ineichenPerezClearSky } from '../../../src/core/sky/clearSky';
import { decomposeErbs } from '../../../src/core/sky/decomposition';
import { extraterrestrialIrradiance, extraterrestrialSpencer } from '../../../src/core/sky/extraterrestrial';
import { expectArgumentError } from '../../support/expectError';
import { globalWithinLimit } from '../../support/possibleIrradiance';

const sinDeg = (d: number) => Math.sin((d * Math.PI) / 180);

const expectError = expectArgumentError;

describe('extraterrestrial irradiance', () => {
  test('both published forms stay within 1321–1415 W/m² and agree within 0.3 % all year', () => {
    for (let n = 1; n <= 366; n += 0.5) {
      const a = extraterrestrialIrradiance(n);
      const s = extraterrestrialSpencer(n);
      expect(a).toBeGreaterThan(1321);
      expect(a).toBeLessThan(1415);
      expect(Math.abs(s / a - 1)).toBeLessThan(0.003);
    }
  });

  test('a day of the year outside 1…366 is refused naming dayOfYear', () => {
    expectError(() => extraterrestrialIrradiance(0), 'dayOfYear');
    expectError(() => extraterrestrialSpencer(367), 'dayOfYear');
    expectError(() => extraterrestrialIrradiance(Number.NaN), 'dayOfYear');
  });
});

describe('clear-sky models', () => {
  test('random valid inputs give finite, non-negative parts with global = beam × sin β + diffuse (1e-9)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -90, max: 90, noNaN: true }),
        fc.double({ min: 1, max: 366, noNaN: true }),
        fc.double({ min: 0.01, max: 1.2, noNaN: true }),
        fc.double({ min: 0.01, max: 4, noNaN: true }),
        fc.double({ min: 1, max: 10, noNaN: true }),
        fc.double({ min: -500, max: 9000, noNaN: true }),
        (alt, day, tb, td, tl, h) => {
          // A τ pair whose sky passes the physically possible limits somewhere is refused naming tauD (tests/core/sky/physically-possible.test.ts).
          let ashrae;
          try {
            ashrae = ashraeClearSky(alt, day, tb, td);
          } catch (e) {
            expect(String(e)).toMatch(/tauD = .* is not allowed: must give, with tauB = /);
            ashrae = undefined;
          }
          for (const r of ashrae ? [ashrae, ineichenPerezClearSky(alt, day, tl, h)] : [ineichenPerezClearSky(alt, day, tl, h)]) {
            for (const v of [r.dni, r.dhi, r.ghi]) {
              expect(Number.isFinite(v)).toBe(true);
              expect(v).toBeGreaterThanOrEqual(0);
            }
            const expected = alt > 0 ? r.dni * sinDeg(alt) + r.dhi : 0;
            expect(Math.abs(r.ghi - expected)).toBeLessThan(1e-9 * Math.max(1, r.ghi));
          }
        },
      ),
      { numRuns: 300, seed: 7 },
    );
  });

  test('a larger beam optical depth gives less beam (ASHRAE model)', () => {
    expect(ashraeClearSky(40, 200, 0.5, 2).dni).toBeLessThan(ashraeClearSky(40, 200, 0.3, 2).dni);
  });

  test('the beam grows as the sun climbs (both models)', () => {
    let prevA = 0;
    let prevI = 0;
    for (let alt = 1; alt <= 90; alt += 1) {
      const a = ashraeClearSky(alt, 172, 0.4, 2.3).dni;
      const i = ineichenPerezClearSky(alt, 172, 3, 0).dni;
      expect(a).toBeGreaterThan(prevA);
      expect(i).toBeGreaterThanOrEqual(prevI);
      prevA = a;
      prevI = i;
    }
  });

  test('bad optical depths, turbidity and elevation are refused by name', () => {
    expectError(() => ashraeClearSky(30, 100, -0.1, 2), 'tauB');
    expectError(() => ashraeClearSky(30, 100, 0.4, 0), 'tauD');
    expectError(() => ashraeClearSky(30, 100, 0.4, 9), 'tauD');
    expectError(() => ashraeClearSky(95, 100, 0.4, 2), 'sunAltitude');
    expectError(() => ineichenPerezClearSky(30, 100, 11, 0), 'linkeTurbidity');
    expectError(() => ineichenPerezClearSky(30, 100, 3, -600), 'elevation');
  });
});

describe('Erbs decomposition', () => {
  test('diffuse + beam × cos z gives back the global while the sun is above 86.3° zenith and the beam is not capped (1e-9)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1200, noNaN: true }), fc.double({ min: 0, max: 86, noNaN: true }), fc.integer({ min: 1, max: 365 }), (drawn, z, day) => {
        const ghi = globalWithinLimit(drawn, z, day);
        const r = decomposeErbs(ghi, z, day);
        if (r.dni < extraterrestrialSpencer(day)) {
          expect(Math.abs(r.dhi + r.dni * Math.cos((z * Math.PI) / 180) - ghi)).toBeLessThan(1e-9 * Math.max(1, ghi));
        }
        expect(r.dhi).toBeLessThanOrEqual(ghi + 1e-9);
        expect(r.clearnessIndex).toBeGreaterThanOrEqual(0);
        expect(r.clearnessIndex).toBeLessThanOrEqual(1);
      }),
      { numRuns: 300, seed: 11 },
    );
  });

  test('with the sun at or below the horizon all of the global is diffuse', () => {
    expect(decomposeErbs(15, 92, 100)).toMatchObject({ dni: 0, dhi: 15 });
    expect(decomposeErbs(0, 90, 100)).toMatchObject({ dni: 0, dhi: 0 });
  });

  test('the direct normal never exceeds the extraterrestrial irradiance, even near the horizon', () => {
    // The largest global the limits allow at each zenith (Long & Shi 2008; more is refused, tests/core/sky/physically-possible.test.ts).
    for (let z = 80; z < 90; z += 0.25) expect(decomposeErbs(globalWithinLimit(2000, z, 1), z, 1).dni).toBeLessThanOrEqual(extraterrestrialSpencer(1));
  });

  test('negative or non-finite global is refused naming ghi; a zenith above 180 naming sunZenith', () => {
    expectError(() => decomposeErbs(-1, 30, 100), 'ghi');
    expectError(() => decomposeErbs(Number.POSITIVE_INFINITY, 30, 100), 'ghi');
    expectError(() => decomposeErbs(100, 181, 100), 'sunZenith');
  });
});
