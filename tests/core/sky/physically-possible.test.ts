/**
 * Irradiance no sky can give is never used: the physically possible limits of Long, C. N. & Shi, Y.
 * (2008), "An automated quality assessment and control algorithm for surface radiation
 * measurements", The Open Atmospheric Science Journal 2, 23–37 (from memory: DNI ≤ Sa,
 * DHI ≤ 0.95 Sa μ0^1.2 + 50, GHI ≤ 1.5 Sa μ0^1.2 + 100 W/m²; checked on their own in
 * tests/reference/long-shi-2008.test.ts) applied to every way irradiance enters the engine:
 * a value given for one hour is refused with the limit at that sun; an hour of a supplied series
 * past the limit is missing (as the weather reader treats it); the clear-sky models never return
 * more than the limit. Regression: the registry fuzz found WINDOWIRRADIANCE(100, 1300, 1, 60, 90,
 * 172, 90, 0.2, "perez") = 188,538 W/m² on an east window.
 */
import * as fc from 'fast-check';
import { SunpaneError } from '../../../src/core/common';
import { annualSeries, windowGainAt } from '../../../src/core/gain';
import { ashraeClearSky, decomposeErbs, extraterrestrialSpencer, ineichenPerezClearSky, planeIrradiance, physicalIrradianceLimits } from '../../../src/core/sky';
import { findFunction } from '../../../src/registry';
import { applyFunction } from '../../../src/registry/evaluate';

const sinDeg = (d: number) => Math.sin((d * Math.PI) / 180);
/** The Long & Shi limits written out by hand (from memory), μ0 = sin(altitude). */
const dhiLimit = (altitude: number, sa: number) => (altitude > 0 ? 0.95 * sa * sinDeg(altitude) ** 1.2 : 0) + 50;
const ghiLimit = (altitude: number, sa: number) => (altitude > 0 ? 1.5 * sa * sinDeg(altitude) ** 1.2 : 0) + 100;

describe('one hour past the physically possible limit is refused with the limit at that sun', () => {
  test('the fuzz case: DHI 1300 W/m² with the sun 1° high on day 172 is refused naming dhi and its limit (59.8 W/m²)', () => {
    const sa = extraterrestrialSpencer(172);
    const limit = dhiLimit(1, sa); // 0.95 · 1322.6 · 0.0174524^1.2 + 50
    expect(limit).toBeGreaterThan(59);
    expect(limit).toBeLessThan(61);
    const input = { dni: 100, dhi: 1300, sunAltitude: 1, sunAzimuth: 60, surfaceTilt: 90, surfaceAzimuth: 90, groundAlbedo: 0.2, dayOfYear: 172, skyModel: 'perez1990' as const };
    expect(() => planeIrradiance(input)).toThrow(SunpaneError);
    const says = `dhi = 1300 is not allowed: must be at most ${Number(limit.toFixed(1))} W/m², the physically possible limit (Long & Shi 2008) with the sun 1° high`;
    expect(() => planeIrradiance(input)).toThrow(says);
    const cell = applyFunction(findFunction('WINDOWIRRADIANCE')!, [100, 1300, 1, 60, 90, 172, 90, 0.2, 'perez']).flat()[0];
    expect(cell).toBeInstanceOf(SunpaneError);
    expect((cell as SunpaneError).message).toContain(says);
    // Just under the limit is accepted, and the east window gets a finite, modest irradiance.
    const ok = planeIrradiance({ ...input, dhi: Math.floor(limit) });
    expect(ok.total).toBeGreaterThan(0);
    expect(ok.total).toBeLessThan(sa);
  });

  test('DNI above the extraterrestrial value, and a global above its limit, are refused naming the argument', () => {
    const sa = extraterrestrialSpencer(3);
    const base = { dni: 0, dhi: 0, sunAltitude: 60, sunAzimuth: 180, surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, dayOfYear: 3, skyModel: 'isotropic' as const };
    expect(() => planeIrradiance({ ...base, dni: Math.ceil(sa) + 1 })).toThrow(`dni = ${Math.ceil(sa) + 1} is not allowed: must be at most ${Number(sa.toFixed(1))} W/m²`);
    // Global: 1400 · sin 60° + 1000 = 2212 > 1.5 · Sa · sin(60°)^1.2 + 100 (≈ 1882) while each part is within its own limit.
    expect(1400 * sinDeg(60) + 1000).toBeGreaterThan(ghiLimit(60, sa));
    expect(1000).toBeLessThan(dhiLimit(60, sa));
    expect(() => planeIrradiance({ ...base, dni: 1400, dhi: 1000 })).toThrow(/^dhi = 1000 is not allowed: must keep the global dni × sin\(altitude\) \+ dhi at or below/);
    // With the sun down only the allowance is left: 50 W/m² of diffuse.
    expect(() => planeIrradiance({ ...base, sunAltitude: -3, dhi: 51 })).toThrow(/with the sun at or below the horizon/);
    expect(planeIrradiance({ ...base, sunAltitude: -3, dhi: 50 }).sky).toBeCloseTo(25, 9);
  });

  test('a global horizontal past its limit is refused by SPLITGLOBAL (Erbs) naming ghi; within it the split is unchanged', () => {
    const sa = extraterrestrialSpencer(172);
    expect(() => decomposeErbs(1300, 89, 172)).toThrow(/^ghi = 1300 is not allowed: must be at most 11\d\.\d W\/m²/);
    expect(ghiLimit(1, sa)).toBeGreaterThan(110);
    expect(() => decomposeErbs(101, 95, 172)).toThrow(/^ghi = 101/);
    expect(decomposeErbs(50, 85, 1).dhi).toBeCloseTo(41.5704, 3); // Erbs et al. (1982) check value of tests/reference/erbs-1982.test.ts
  });

  test('a one-hour gain with its own DNI and DHI is refused the same way', () => {
    // 1 January 2021, hour ending 13:00 (serial 44197 + 13/24): the sun about 26° high at 40° N, so DHI 900 is past 0.95·Sa·sin^1.2 + 50.
    const at = 44197 + 13 / 24;
    expect(() => windowGainAt(windowSpec(), at, { dni: 100, dhi: 900 })).toThrow(/^dhi = 900 is not allowed: must be at most \d+(\.\d)? W\/m², the physically possible limit/);
    expect(windowGainAt(windowSpec(), at, { dni: 100, dhi: 100 }).gain.total).toBeGreaterThan(0);
  });
});

describe('an hour of a supplied series past the limit is missing, never used', () => {
  test('measured DNI/DHI: the impossible hour is flagged missing with zero gain, as the weather reader does; the one-hour path agrees', () => {
    const hours = 8760;
    const dni = new Array<number>(hours).fill(0);
    const dhi = new Array<number>(hours).fill(0);
    for (let i = 0; i < hours; i++) if (i % 24 >= 8 && i % 24 <= 16) { dni[i] = 500; dhi[i] = 100; }
    dhi[12] = 1500; // 1 January, hour ending 13:00: far past the diffuse limit with the winter sun
    dhi[36] = 700; // 2 January, hour ending 13:00: past the limit too (sun below 28°: limit below 600)
    const sa = extraterrestrialSpencer(2);
    expect(700).toBeGreaterThan(dhiLimit(28, sa));
    const spec = windowSpec({ kind: 'measured', dni, dhi });
    const s = annualSeries(spec);
    expect(s.missing[12]).toBe(1);
    expect(s.missing[36]).toBe(1);
    expect(s.gain[12]).toBe(0);
    expect(s.gain[36]).toBe(0);
    expect(s.missing[13]).toBe(0);
    expect(s.gain[13]).toBeGreaterThan(0);
    const hour = windowGainAt(spec, 44197 + 13 / 24);
    expect(hour.missing).toBe(true);
    expect(hour.gain.total).toBe(0);
  });

  test('global horizontal: an impossible hour is missing, its neighbours split by Erbs', () => {
    const ghi = new Array<number>(8760).fill(0);
    for (let i = 0; i < 8760; i++) if (i % 24 >= 8 && i % 24 <= 16) ghi[i] = 300;
    ghi[12] = 1900;
    const s = annualSeries(windowSpec({ kind: 'globalHorizontal', ghi }));
    expect(s.missing[12]).toBe(1);
    expect(s.missing[11]).toBe(0);
    expect(s.dhi[11]).toBeGreaterThan(0);
  });
});

describe('clear-sky models never give more than the limit', () => {
  test('ASHRAE τb/τd: the pair the fuzz found (τb 1.2, τd 4) is refused naming tauD, as is τd 0.5 (a diffuse of 400 W/m² above the limit at 12°)', () => {
    expect(() => ashraeClearSky(0.05, 172, 1.2, 4)).toThrow(/^tauD = 4 is not allowed: .*with tauB = 1\.2/);
    expect(() => ashraeClearSky(60, 172, 0.4, 0.5)).toThrow(/^tauD = 0\.5 is not allowed/);
  });

  test('ASHRAE τb/τd: pairs across the span of published climate tables (τb 0.2–0.7, τd 1.5–2.8, from memory) are accepted and stay within the limit at every altitude', () => {
    for (const tb of [0.2, 0.3, 0.4, 0.5, 0.6, 0.7]) {
      for (const td of [1.5, 1.8, 2.1, 2.4, 2.8]) {
        for (const altitude of [0.01, 0.1, 0.5, 1, 2, 5, 10, 20, 40, 60, 90]) {
          const c = ashraeClearSky(altitude, 172, tb, td);
          const l = physicalIrradianceLimits(sinDeg(altitude), extraterrestrialSpencer(172));
          expect(c.dhi).toBeLessThanOrEqual(l.dhi);
          expect(c.ghi).toBeLessThanOrEqual(l.ghi);
        }
      }
    }
  });

  test('ASHRAE τb/τd: no accepted pair gives more than the limit at any altitude (property, 1,000 runs)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1.2, noNaN: true }), fc.double({ min: 0.01, max: 4, noNaN: true }), fc.double({ min: 1e-4, max: 90, noNaN: true }), fc.integer({ min: 1, max: 365 }), (tb, td, altitude, day) => {
        let c;
        try {
          c = ashraeClearSky(altitude, day, tb, td);
        } catch (e) {
          if (e instanceof SunpaneError && /^tau[BD] = /.test(e.message)) return;
          throw e;
        }
        const l = physicalIrradianceLimits(sinDeg(altitude), extraterrestrialSpencer(day));
        expect(c.dhi).toBeLessThanOrEqual(l.dhi + 1e-9);
        expect(c.ghi).toBeLessThanOrEqual(l.ghi + 1e-9);
        expect(c.dni).toBeLessThanOrEqual(l.dni + 1e-9);
      }),
      { numRuns: 1000, seed: 20261203 },
    );
  });

  test('Ineichen–Perez: at sea level, TL 2, the sun 0.3° high, the formula’s diffuse is past the limit and is held at it; above 2° nothing changes', () => {
    const sa = extraterrestrialSpencer(172);
    const low = ineichenPerezClearSky(0.3, 172, 2, 0);
    expect(low.dhi).toBeCloseTo(dhiLimit(0.3, sa), 9);
    expect(low.ghi).toBeCloseTo(low.dni * sinDeg(0.3) + low.dhi, 9);
    const high = ineichenPerezClearSky(2, 172, 2, 0);
    expect(high.dhi).toBeLessThan(dhiLimit(2, sa));
  });

  test('Ineichen–Perez: no accepted turbidity and elevation gives more than the limit (property, 3,000 runs)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 10, noNaN: true }), fc.double({ min: -500, max: 9000, noNaN: true }), fc.double({ min: 1e-4, max: 90, noNaN: true }), fc.integer({ min: 1, max: 365 }), (tl, h, altitude, day) => {
        const c = ineichenPerezClearSky(altitude, day, tl, h);
        const l = physicalIrradianceLimits(sinDeg(altitude), extraterrestrialSpencer(day));
        expect(c.dhi).toBeLessThanOrEqual(l.dhi + 1e-9);
        expect(c.ghi).toBeLessThanOrEqual(l.ghi + 1e-9);
        expect(c.dni).toBeLessThanOrEqual(l.dni + 1e-9);
      }),
      { numRuns: 3000, seed: 20261203 },
    );
  });
});

describe('no accepted input puts more on a window than the sun and sky can (property, 2,000 runs)', () => {
  test('every sky model, any plane: total ≤ DNI + 20 × the physically possible diffuse — and never above 2 × the extraterrestrial value', () => {
    // Bound (ours, from the models' forms): beam ≤ DNI; the Perez circumsolar ratio a/b is at most
    // 1/cos 85° ≈ 11.5, and with the accepted diffuse the brightness Δ stays below about 1.6, where F1 ≤ 1.3
    // (Table 6 rows), so sky ≤ DHI · (1 + 1.3 · 11.5 + |F2|) < 20 DHI; ground ≤ GHI.
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 2000, noNaN: true }),
        fc.double({ min: 0, max: 2000, noNaN: true }),
        fc.double({ min: -10, max: 90, noNaN: true }),
        fc.double({ min: 0, max: 360, noNaN: true }),
        fc.double({ min: 0, max: 180, noNaN: true }),
        fc.double({ min: 0, max: 360, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 366 }),
        fc.constantFrom('isotropic' as const, 'hayDavies' as const, 'perez1990' as const, 'ashraeClearDay' as const),
        (dni, dhi, sunAltitude, sunAzimuth, surfaceTilt, surfaceAzimuth, groundAlbedo, dayOfYear, skyModel) => {
          const sa = extraterrestrialSpencer(dayOfYear);
          const l = physicalIrradianceLimits(Math.max(-1, sinDeg(sunAltitude)), sa);
          // Draw inside the limits most of the time: scale the pair into them.
          const d = Math.min(dhi, l.dhi);
          const b = Math.min(dni, l.dni, sunAltitude > 0 ? Math.max(0, (l.ghi - d) / sinDeg(sunAltitude)) : l.dni);
          const r = planeIrradiance({ dni: b, dhi: d, sunAltitude, sunAzimuth, surfaceTilt, surfaceAzimuth, groundAlbedo, dayOfYear, skyModel });
          expect(r.total).toBeLessThanOrEqual(b + 20 * l.dhi + l.ghi);
          expect(r.total).toBeLessThanOrEqual(2 * sa);
          expect(Number.isFinite(r.total)).toBe(true);
        },
      ),
      { numRuns: 2000, seed: 20261203 },
    );
  });
});

type Weather = Parameters<typeof annualSeries>[0]['weather'];

/** A bare south window at an example location (40° N, 0° E, UTC+0), 2021, with the weather given. */
function windowSpec(weather: Weather = { kind: 'measured', dni: new Array<number>(8760).fill(0), dhi: new Array<number>(8760).fill(0) }): Parameters<typeof annualSeries>[0] {
  return {
    name: 'test',
    site: { latitude: 40, longitude: 0, utcOffset: 0 },
    surfaceAzimuth: 180,
    surfaceTilt: 90,
    width: 1,
    height: 1,
    frameFraction: 0,
    glazing: { shgc: 0.6, panes: 2 },
    shading: {},
    groundAlbedo: 0.2,
    year: 2021,
    weather,
  } as Parameters<typeof annualSeries>[0];
}
