/**
 * The edges of a site's shared year (src/core/gain/sharedYear.ts) that the whole-year equality tests
 * of tests/core/gain/sharedYear.test.ts cannot see, because both sides of those tests read the same
 * shared year: the hours a measured year lights (overcast, twilight and beam-only hours), the
 * extraterrestrial irradiance and Perez brightness of the last day of a leap year, sites and skies
 * whose numbers run together when written one after the other, a supplied series re-read when it is
 * changed in place, and a site where the sun is up in the first hour of the year.
 *
 * Sources, named beside each check: Spencer (1971) for the extraterrestrial irradiance; Perez et al.
 * (1990) Eqs. 1, 2 and 9 with Table 6 for the brightness coefficients, and Kasten & Young (1989) Eq. 3
 * for their air mass; the isotropic sky and ground reflection of Liu & Jordan (Duffie & Beckman,
 * Solar Engineering of Thermal Processes, 4th ed., Eq. 2.15.1) and the beam on a tilted plane
 * DNI · cos θ (Eq. 1.6.3 for θ). The windows and weather are invented test inputs; the southern
 * polar site is an example location.
 */
import { annualOfPrepared } from '../../../src/core/gain/annual';
import { summarizeAnnual, summarizeWindowYear } from '../../../src/core/gain/annualSummary';
import { prepareWindow } from '../../../src/core/gain/prepared';
import { SharedYears, dniExtraByDay, perezBrightnessOf, sharedYearOf } from '../../../src/core/gain/sharedYear';
import type { WindowSpec } from '../../../src/core/gain/window';
import { baseSpec } from './gainFixtures';

const RAD = Math.PI / 180;

/** Spencer (1971): (r0/r)² = 1.000110 + 0.034221 cos Γ + 0.001280 sin Γ + 0.000719 cos 2Γ + 0.000077 sin 2Γ, Γ = 2π (n − 1)/365, times 1366.1 W/m². */
function spencer(n: number): number {
  const g = (2 * Math.PI * (n - 1)) / 365;
  return 1366.1 * (1.00011 + 0.034221 * Math.cos(g) + 0.00128 * Math.sin(g) + 0.000719 * Math.cos(2 * g) + 0.000077 * Math.sin(2 * g));
}

/** Perez et al. (1990) Table 6, composite set: f11, f12, f13, f21, f22, f23 by ε bin (typed from the paper). */
const TABLE_6 = [
  [-0.008, 0.588, -0.062, -0.06, 0.072, -0.022],
  [0.13, 0.683, -0.151, -0.019, 0.066, -0.029],
  [0.33, 0.487, -0.221, 0.055, -0.064, -0.026],
  [0.568, 0.187, -0.295, 0.109, -0.152, -0.014],
  [0.873, -0.392, -0.362, 0.226, -0.462, 0.001],
  [1.132, -1.237, -0.412, 0.288, -0.823, 0.056],
  [1.06, -1.6, -0.359, 0.264, -1.127, 0.131],
  [0.678, -0.327, -0.25, 0.156, -1.377, 0.251],
];
const EDGES = [1.065, 1.23, 1.5, 1.95, 2.8, 4.5, 6.2];

/** F1 and F2 of Perez et al. (1990) Eqs. 1, 2 and 9, with the Kasten & Young (1989) Eq. 3 air mass. */
function perezF(dni: number, dhi: number, altitude: number, e0: number): { f1: number; f2: number } {
  const z = (90 - altitude) * RAD;
  const k = 1.041 * z ** 3;
  const epsilon = ((dhi + dni) / dhi + k) / (1 + k);
  const m = 1 / (Math.sin(altitude * RAD) + 0.50572 * (altitude + 6.07995) ** -1.6364);
  const delta = (dhi * m) / e0;
  const [f11, f12, f13, f21, f22, f23] = TABLE_6[EDGES.filter((e) => epsilon >= e).length];
  return { f1: Math.max(0, f11 + f12 * delta + f13 * z), f2: f21 + f22 * delta + f23 * z };
}

/** A window's year worked out alone (its own sun path and weather). */
function ownSummary(spec: WindowSpec) {
  return summarizeAnnual(annualOfPrepared(prepareWindow(spec)));
}

describe('the extraterrestrial irradiance and the sky brightness of a shared year', () => {
  test('the irradiance by day is Spencer (1971) on every day 1 to 366, the 31 December of a leap year included (1e-9 W/m²)', () => {
    const table = dniExtraByDay();
    for (let d = 1; d <= 366; d++) expect(Math.abs(table[d] - spencer(d))).toBeLessThan(1e-9);
    // Worked out on first use and kept (it depends on the day only).
    expect(dniExtraByDay()).toBe(table);
  });

  test('the Perez (1990) F1 and F2 kept with a year are the paper\'s, at noon on 1 January, 21 June and 31 December of a leap year (1e-9)', () => {
    const w = prepareWindow(baseSpec({ year: 2028 }));
    const sy = sharedYearOf(w);
    expect(sy.hours).toBe(8784);
    const b = perezBrightnessOf(sy);
    for (const day of [1, 173, 366]) {
      const i = (day - 1) * 24 + 12; // hour ending 13:00 local standard time
      expect(sy.altitude[i]).toBeGreaterThan(10);
      expect(sy.dhi[i]).toBeGreaterThan(0);
      const f = perezF(sy.dni[i], sy.dhi[i], sy.altitude[i], spencer(day));
      expect(Math.abs(b.f1[i] - f.f1)).toBeLessThan(1e-9);
      expect(Math.abs(b.f2[i] - f.f2)).toBeLessThan(1e-9);
    }
    // Worked out on first use and kept with the year.
    expect(perezBrightnessOf(sy)).toBe(b);
  });
});

describe('the hours a measured year lights', () => {
  test('an overcast hour, diffuse light before sunrise and a beam-only hour each reach the window (Liu & Jordan; DNI · cos θ)', () => {
    const base = baseSpec({ skyModel: 'isotropic' });
    const sy = sharedYearOf(prepareWindow(base));
    // 15 March: the hour ending 13:00 overcast, the hour before sunrise (the sun below the horizon at
    // its middle, up at its end) lit by the sky alone, the hour ending 11:00 with beam and no diffuse.
    const day = 73;
    const overcast = day * 24 + 12;
    const beamOnly = day * 24 + 10;
    let twilight = day * 24;
    while (sy.altitude[twilight + 1] <= 0) twilight++;
    expect(sy.altitude[twilight]).toBeLessThan(0);
    expect(sy.altitude[twilight]).toBeGreaterThan(-12);
    const dni = new Float64Array(8760);
    const dhi = new Float64Array(8760);
    dhi[overcast] = 150;
    dhi[twilight] = 20;
    dni[beamOnly] = 600;
    const spec = baseSpec({ skyModel: 'isotropic', weather: { kind: 'measured', dni, dhi } });
    const year = annualOfPrepared(prepareWindow(spec));
    // Vertical plane: sky = DHI (1 + cos 90°)/2, ground = GHI · 0.2 · (1 − cos 90°)/2.
    expect(year.sky[overcast]).toBeCloseTo(75, 9);
    expect(year.ground[overcast]).toBeCloseTo(15, 9);
    expect(year.sky[twilight]).toBeCloseTo(10, 9);
    expect(year.ground[twilight]).toBeCloseTo(2, 9);
    const a = year.sunAltitude[beamOnly] * RAD;
    const g = (year.sunAzimuth[beamOnly] - 180) * RAD;
    const cosTheta = Math.cos(a) * Math.cos(g); // D&B Eq. 1.6.3 for a vertical plane facing south
    expect(cosTheta).toBeGreaterThan(0.3);
    expect(year.beam[beamOnly]).toBeCloseTo(600 * cosTheta, 9);
    expect(year.ground[beamOnly]).toBeCloseTo((600 * Math.sin(a) * 0.2) / 2, 9);
    for (const i of [overcast, twilight, beamOnly]) expect(year.gain[i]).toBeGreaterThan(0);
    // The summary worked out from the shared year has the same three hours' energy, and nothing else.
    const total = year.gain[overcast] + year.gain[twilight] + year.gain[beamOnly];
    const summary = summarizeWindowYear(spec, new SharedYears()).summary;
    expect(summary.annualKWh).toBeCloseTo(total / 1000, 12);
    expect(summary.monthlyKWh[2]).toBeCloseTo(total / 1000, 12);
  });
});

describe('windows of different sites and skies are never given each other\'s year', () => {
  /** Two windows the cache must keep apart: the second one's summary is its own year's, not the first one's. */
  function keptApart(first: WindowSpec, second: WindowSpec): void {
    const years = new SharedYears();
    const a = summarizeWindowYear(first, years).summary;
    const b = summarizeWindowYear(second, years).summary;
    expect(b).toEqual(ownSummary(second));
    expect(b).not.toEqual(a);
    expect(years.size).toBe(2);
  }

  test('sites at 41° N 5° E and 4° N 15° E (the same digits written one after the other)', () => {
    const site = { latitude: 41, longitude: 5, utcOffset: 1 };
    keptApart(baseSpec({ site }), baseSpec({ site: { ...site, latitude: 4, longitude: 15 } }));
  });

  test('monthly Linke turbidities 2.1, 3, 3.52, 2.5 … and 2.13, 3.5, 2, 2.5 … (the same characters in a row)', () => {
    const rest = new Array<number>(8).fill(3);
    keptApart(baseSpec({ weather: { kind: 'ineichenClearSky', linkeTurbidity: [2.1, 3, 3.52, 2.5, ...rest] } }), baseSpec({ weather: { kind: 'ineichenClearSky', linkeTurbidity: [2.13, 3.5, 2, 2.5, ...rest] } }));
  });

  test('monthly ASHRAE τd 2.3, 2, 2.32 … and 2.32, 2.3, 2 …, and τb 0.4, 1, 0.51 … and 0.41, 0.5, 1 …', () => {
    const tauD = (first: number[]) => [...first, ...new Array<number>(9).fill(2.3)];
    keptApart(baseSpec({ weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: tauD([2.3, 2, 2.32]) } }), baseSpec({ weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: tauD([2.32, 2.3, 2]) } }));
    const tauB = (first: number[]) => [...first, ...new Array<number>(9).fill(0.4)];
    keptApart(baseSpec({ weather: { kind: 'ashraeClearSky', tauB: tauB([0.4, 1, 0.51]), tauD: [1.8] } }), baseSpec({ weather: { kind: 'ashraeClearSky', tauB: tauB([0.41, 0.5, 1]), tauD: [1.8] } }));
  });
});

describe('supplied series: known by identity, read again when changed', () => {
  function ghiSeries(scale: number): Float64Array {
    const sy = sharedYearOf(prepareWindow(baseSpec()));
    return Float64Array.from(sy.altitude, (a) => (a > 0 ? scale * 900 * Math.sin(a * RAD) : 0));
  }

  test('two GHI series of one site are two weathers; one changed in place is read again', () => {
    const years = new SharedYears();
    const ghi = ghiSeries(0.8);
    const spec = baseSpec({ weather: { kind: 'globalHorizontal', ghi } });
    const first = prepareWindow(spec);
    const kept = years.of(first);
    years.of(prepareWindow(baseSpec({ weather: { kind: 'globalHorizontal', ghi: ghiSeries(0.5) } })));
    expect(years.size).toBe(2);
    expect(years.of(first)).toBe(kept);
    const before = summarizeWindowYear(spec, years).summary;
    ghi.fill(0, 4000, 6000); // a dull summer: the same series object, other values
    const after = summarizeWindowYear(spec, years).summary;
    expect(after).toEqual(ownSummary(spec));
    expect(after.annualKWh).toBeLessThan(before.annualKWh);
  });

  test('a missing hour of a measured series filled in afterwards is read again', () => {
    const sy = sharedYearOf(prepareWindow(baseSpec()));
    const dni = Float64Array.from(sy.dni);
    const dhi = Float64Array.from(sy.dhi);
    const noon = 180 * 24 + 12;
    dni[noon] = NaN;
    dhi[noon] = NaN;
    const spec = baseSpec({ weather: { kind: 'measured', dni, dhi } });
    const years = new SharedYears();
    expect(summarizeWindowYear(spec, years).summary.missingHours).toBe(1);
    dni[noon] = 700;
    dhi[noon] = 120;
    const filled = summarizeWindowYear(spec, years).summary;
    expect(filled.missingHours).toBe(0);
    expect(filled).toEqual(ownSummary(spec));
  });

  test('a site, year and weather asked for again is the same year, worked out once (clear sky, measured with missing hours, GHI)', () => {
    const sy = sharedYearOf(prepareWindow(baseSpec()));
    const dni = Float64Array.from(sy.dni, (v, i) => (i % 97 === 0 ? NaN : v));
    const specs = [baseSpec(), baseSpec({ weather: { kind: 'measured', dni, dhi: sy.dhi.slice() } }), baseSpec({ weather: { kind: 'globalHorizontal', ghi: ghiSeries(0.7) } })];
    const years = new SharedYears();
    for (const spec of specs) {
      const w = prepareWindow(spec);
      const year = years.of(w);
      expect(years.of(prepareWindow(spec))).toBe(year);
      expect(years.of(w)).toBe(year);
    }
    expect(years.size).toBe(3);
  });
});

describe('a site where the sun is up in the first hour of the year', () => {
  test('at 80° S (an example location) the summary from shared years counts the first hour once, as the year\'s own columns do', () => {
    const spec = baseSpec({ site: { latitude: -80, longitude: 0, utcOffset: 0 }, surfaceAzimuth: 180 });
    const own = annualOfPrepared(prepareWindow(spec));
    // Midnight sun in January: at 80° S the sun stays about 13° up at local midnight.
    expect(own.sunAltitude[0]).toBeGreaterThan(5);
    expect(own.incidence[0]).toBeLessThan(90);
    expect(own.gain[0]).toBeGreaterThan(0);
    expect(summarizeWindowYear(spec, new SharedYears()).summary).toEqual(summarizeAnnual(own));
  });
});
