/**
 * Edges of a window's year (src/core/gain/annual.ts) that the whole-year tests of annual.test.ts and
 * sharedYear.test.ts do not reach: the refusals of the internal entry points (a shared year of
 * another site, a window with conduction in the totals path, a row outside the year), and a
 * property of the summary-only year: a window's summary does not depend on which window was
 * summed up before it (the scratch columns one window leaves must not reach the next).
 *
 * Properties, named beside each check: a year has its hours numbered 0 … 8759 (8784 hours in a
 * leap year, docs/conventions.md#hourly-rows); a summary of a window is a function of that window
 * alone. The windows are invented test inputs (tests/core/gain/gainFixtures.ts).
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { annualOfPrepared, annualRowOfPrepared, monthOfDay, yearTotalsOfShared } from '../../../src/core/gain/annual';
import { summarizeAnnual, summarizeWindowYear } from '../../../src/core/gain/annualSummary';
import { designDayDryBulb } from '../../../src/core/gain/outdoorTemperature';
import { prepareWindow } from '../../../src/core/gain/prepared';
import { SharedYears } from '../../../src/core/gain/sharedYear';
import { sunlitFraction } from '../../../src/core/shading/sunlit';
import { Mismatches } from '../../support/mismatches';
import { baseSpec } from './gainFixtures';

const SITE = baseSpec().site;

/** The refusal a call throws (fails the test when it throws none or another kind). */
function refusal(f: () => unknown): SunpaneError {
  try {
    f();
  } catch (e) {
    if (e instanceof SunpaneError) return e;
    throw e;
  }
  throw new Error('no refusal');
}

describe('refusals of the year’s internal entry points', () => {
  test('the summary totals and a window’s year refuse a shared year of another site or year, naming year', () => {
    const years = new SharedYears();
    const here = prepareWindow(baseSpec());
    const series = refusal(() => annualOfPrepared(prepareWindow(baseSpec({ year: 2027 })), years.of(here)));
    expect(series.argument).toBe('year');
    expect(series.value).toBe(2027);
    for (const other of [baseSpec({ site: { ...SITE, latitude: 41 } }), baseSpec({ year: 2027 }), baseSpec({ year: 2028 })]) {
      const e = refusal(() => yearTotalsOfShared(prepareWindow(other), years.of(here)));
      expect(e.argument).toBe('year');
      expect(e.value).toBe(other.year);
      expect(e.message).toMatch(/the shared sun and weather are not those of this window's site, year and weather \(2026\|/);
    }
  });

  test('the summary totals refuse a window with a U-value, naming glazing.uValue (its conduction can mark hours missing)', () => {
    const spec = baseSpec({ glazing: { shgc: 0.6, panes: 2, uValue: 1.4 }, indoorTemperature: 24, weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [30], dailyRange: [10] } });
    const w = prepareWindow(spec);
    const e = refusal(() => yearTotalsOfShared(w, new SharedYears().of(w)));
    expect(e.argument).toBe('glazing.uValue');
    expect(e.value).toBe(1.4);
    expect(e.message).toMatch(/is not read by the summary totals: a window with conduction is summed up from its summary-only year/);
  });

  test('one row of the year is refused outside 0 … hours − 1, naming row (docs/conventions.md#hourly-rows: 8760 rows, 8784 in a leap year)', () => {
    const common = prepareWindow(baseSpec());
    for (const row of [-1, 8760, Number.NaN]) {
      const e = refusal(() => annualRowOfPrepared(common, row));
      expect(e.argument).toBe('row');
      expect(e.message).toMatch(/must be a row of 2026: 0 to 8759/);
    }
    const leap = prepareWindow(baseSpec({ year: 2028 }));
    expect(refusal(() => annualRowOfPrepared(leap, 8784)).message).toMatch(/must be a row of 2028: 0 to 8783/);
    // The first and last rows are rows: the same numbers as the year's (one row is its year's row).
    const year = annualOfPrepared(leap);
    for (const row of [0, 8783, 4000]) {
      const r = annualRowOfPrepared(leap, row);
      expect(r.row).toBe(row);
      expect(r.gain).toBe(year.gain[row]);
      expect(r.stampSerial).toBe(year.stampSerial[row]);
    }
  });
});

describe('a window’s summary is its own, whatever was summed up before it', () => {
  test('windows with a U-value at two sites, summed up in turn, each give their own year’s summary', () => {
    // A window with a U-value goes through the summary-only year (scratch columns shared by all
    // windows); the rows its passes skip (night, no light) must not keep another site's numbers.
    const cond = { glazing: { shgc: 0.6, panes: 2, uValue: 1.4 }, indoorTemperature: 24 } as const;
    const weather = { kind: 'ashraeClearSky' as const, tauB: [0.4], tauD: [2.3], dryBulbMax: [30], dailyRange: [10] };
    const specs = [
      baseSpec({ ...cond, weather, site: { ...SITE, latitude: 5 } }),
      baseSpec({ ...cond, weather, site: { ...SITE, latitude: 60 } }),
      baseSpec({ ...cond, weather, site: { ...SITE, latitude: 5 }, surfaceAzimuth: 0 }),
      baseSpec({ site: { ...SITE, latitude: 60 } }), // no U-value: added up while its hours are worked out
    ];
    const own = specs.map((s) => summarizeAnnual(annualOfPrepared(prepareWindow(s))));
    const years = new SharedYears();
    for (const k of [0, 1, 2, 3, 0, 1, 3, 2]) expect(summarizeWindowYear(specs[k], years).summary).toEqual(own[k]);
  });
});

/** Spencer (1971): (r0/r)² = 1.000110 + 0.034221 cos Γ + 0.001280 sin Γ + 0.000719 cos 2Γ + 0.000077 sin 2Γ, Γ = 2π (n − 1)/365, times 1366.1 W/m². */
function spencer(n: number): number {
  const g = (2 * Math.PI * (n - 1)) / 365;
  return 1366.1 * (1.00011 + 0.034221 * Math.cos(g) + 0.00128 * Math.sin(g) + 0.000719 * Math.cos(2 * g) + 0.000077 * Math.sin(2 * g));
}

describe('one row of the year worked out alone', () => {
  const cond = { glazing: { shgc: 0.6, panes: 2, uValue: 1.4 }, indoorTemperature: 24 } as const;
  const measured = () => ({ kind: 'measured' as const, dni: new Float64Array(8760).fill(600), dhi: new Float64Array(8760).fill(100), dryBulb: new Float64Array(8760).fill(30) });
  // 21 June 2026, the hour ending 13:00 (row 171·24 + 12): the sun high on a south wall at 40° N.
  const NOON = 171 * 24 + 12;

  test('a row is a function of its window and weather alone: what an earlier call left at that row never shows', () => {
    const lit = prepareWindow(baseSpec({ ...cond, weather: measured() }));
    const first = annualRowOfPrepared(lit, NOON);
    expect(first.gain).toBeGreaterThan(0);
    expect(first.dryBulb).toBe(30);
    expect(first.conduction).toBeCloseTo(1.4 * (2 * 1.5) * (30 - 24), 9); // U·A·ΔT, A the window's 2 m × 1.5 m
    // No light given: no irradiance and no solar gain (nothing to transmit), whatever the row held before.
    const dark = annualRowOfPrepared(lit, NOON, { dni: 0, dhi: 0 });
    for (const k of ['beam', 'sky', 'ground', 'skyUnshaded', 'groundUnshaded', 'gain', 'gainBeam', 'gainDiffuse', 'radiant'] as const) expect(dark[k]).toBe(0);
    // The same row of a window without a U-value: no dry-bulb (NaN, AnnualSeries.dryBulb) and no conduction.
    const bare = annualRowOfPrepared(prepareWindow(baseSpec({ weather: { kind: 'measured', dni: measured().dni, dhi: measured().dhi } })), NOON);
    expect(bare.dryBulb).toBeNaN();
    expect(bare.conduction).toBe(0);
    // A missing row, then the same row with its weather given: not missing any more.
    const gap = measured();
    gap.dni[NOON] = Number.NaN;
    const holed = prepareWindow(baseSpec({ weather: gap }));
    expect(annualRowOfPrepared(holed, NOON).missing).toBe(true);
    const given = annualRowOfPrepared(holed, NOON, { dni: 600, dhi: 100 });
    expect(given.missing).toBe(false);
    expect(given.gain).toBeGreaterThan(0);
    // A missing dry-bulb (AnnualSeries.dryBulb: NaN on a missing row) marks the row missing: no
    // conduction and no gain, as a missing irradiance does.
    const cold = measured();
    cold.dryBulb[NOON] = Number.NaN;
    const noTemperature = annualRowOfPrepared(prepareWindow(baseSpec({ ...cond, weather: cold })), NOON);
    expect(noTemperature.missing).toBe(true);
    expect(noTemperature.dryBulb).toBeNaN();
    expect(noTemperature.conduction).toBe(0);
    expect(noTemperature.gain).toBe(0);
  });

  test('given weather outside 0 … 2000 W/m² is refused naming dni or dhi with the range and unit (docs/architecture.md error convention)', () => {
    const w = prepareWindow(baseSpec());
    expect(refusal(() => annualRowOfPrepared(w, NOON, { dni: 2500, dhi: 0 })).message).toBe('dni = 2500 is not allowed: must be a number from 0 to 2000 W/m²');
    expect(refusal(() => annualRowOfPrepared(w, NOON, { dni: 0, dhi: -1 })).message).toBe('dhi = -1 is not allowed: must be a number from 0 to 2000 W/m²');
  });

  test('given weather is checked against the Long & Shi limit with the extraterrestrial irradiance of the row’s own day (Spencer 1971)', () => {
    const w = prepareWindow(baseSpec());
    // Rows of days across the year (the hour ending 01:00 and the one ending 13:00): a DNI of
    // 1500 W/m² is above the extraterrestrial irradiance of every day (at most about 1413 W/m²),
    // and the message gives the day's to 0.1 W/m².
    for (const [day, hour] of [[1, 0], [80, 12], [81, 0], [180, 12], [265, 0], [365, 12]]) {
      const e = refusal(() => annualRowOfPrepared(w, (day - 1) * 24 + hour, { dni: 1500, dhi: 0 }));
      expect(e.argument).toBe('dni');
      expect(e.message).toContain(`an extraterrestrial ${Number(spencer(day).toFixed(1))} W/m²`);
    }
  });
});

describe('the peak of a summary added up while the hours are worked out', () => {
  test('of equal hourly gains the first is the peak, as in the summary of the columns (AnnualSummary.peakStamp: the first such hour on ties)', () => {
    // A horizontal window under an isotropic sky with only diffuse light: the sky on the plane is
    // DHI · (1 + cos 0°)/2 = DHI and the ground (1 − cos 0°)/2 = 0 (Liu & Jordan), so every lit hour
    // has the same gain, to the last bit, and the peak is the first lit hour.
    const spec = baseSpec({ surfaceTilt: 0, skyModel: 'isotropic', weather: { kind: 'measured', dni: new Float64Array(8760), dhi: new Float64Array(8760).fill(60) } });
    const own = annualOfPrepared(prepareWindow(spec));
    const first = own.gain.findIndex((q) => q > 0);
    expect(first).toBeGreaterThan(0);
    const peak = own.gain[first];
    expect(own.gain.filter((q) => q > 0).every((q) => q === peak)).toBe(true);
    const shared = summarizeWindowYear(spec, new SharedYears()).summary;
    expect(shared).toEqual(summarizeAnnual(own));
    expect(shared.peakW).toBe(peak);
    expect(shared.peakStamp).toBe(own.stampSerial[first]);
  });
});

describe('the design-day dry-bulb of the year’s rows', () => {
  test('each row takes its month’s design day at its own hour: hour ending h + 1 for row h, the instant h:00 (00:00 = 24:00) for an instant row', () => {
    // The handbook's profile (ASHRAE Fundamentals, "Generating design-day data"; hours from memory):
    // the coolest hour ending 05:00 is Tmax − DR, hours ending 14:00 and 15:00 are Tmax;
    // designDayDryBulb is held to it by tests/core/gain/outdoorTemperature.test.ts.
    const dryBulbMax = [5, 7, 10, 14, 19, 24, 30, 29, 24, 17, 10, 6];
    const dailyRange = [6, 7, 8, 9, 10, 11, 12, 11, 10, 9, 8, 7];
    const cond = { glazing: { shgc: 0.6, panes: 2, uValue: 2 }, indoorTemperature: 22 } as const;
    const weather = { kind: 'ashraeClearSky' as const, tauB: [0.4], tauD: [2.3], dryBulbMax, dailyRange };
    const found = new Mismatches();
    for (const timeConvention of ['hourEnding', 'instant'] as const) {
      const year = annualOfPrepared(prepareWindow(baseSpec({ ...cond, weather, timeConvention })));
      const months = monthOfDay(2026);
      for (let i = 0; i < year.hours; i++) {
        const m = months[Math.floor(i / 24)];
        const hour = timeConvention === 'hourEnding' ? (i % 24) + 1 : i % 24;
        const want = designDayDryBulb(dryBulbMax[m - 1], dailyRange[m - 1], hour);
        found.check(year.dryBulb[i] === want, () => `${timeConvention} row ${i}: ${year.dryBulb[i]} against ${want}`);
        // q = U · A · (T_out − T_in), A = 2 m × 1.5 m.
        found.check(Math.abs(year.conduction[i] - 2 * 3 * (want - 22)) < 1e-9, () => `${timeConvention} row ${i}: conduction ${year.conduction[i]}`);
      }
      // The anchors themselves, on 15 July (day 196): the coolest hour Tmax − DR, the warmest Tmax.
      const day = 195 * 24;
      const coolest = timeConvention === 'hourEnding' ? 4 : 5;
      expect(year.dryBulb[day + coolest]).toBe(30 - 12);
      expect(year.dryBulb[day + coolest + 9]).toBe(30);
      expect(year.dryBulb[day + coolest + 10]).toBe(30);
    }
    expect(found.list).toEqual([]);
  });
});

describe('a full series from a shared year', () => {
  test('hands out columns of its own: what one caller writes into its series reaches neither the shared year nor the next series', () => {
    const gap = { kind: 'measured' as const, dni: new Float64Array(8760).fill(500), dhi: new Float64Array(8760).fill(80) };
    gap.dni[3000] = Number.NaN;
    const w = prepareWindow(baseSpec({ weather: gap }));
    const years = new SharedYears();
    const sy = years.of(w);
    const own = annualOfPrepared(w);
    const first = annualOfPrepared(w, sy);
    for (const k of ['stampSerial', 'clockStamp', 'sunAltitude', 'sunAzimuth', 'dni', 'dhi'] as const) first[k].fill(-1);
    first.missing.fill(1);
    const second = annualOfPrepared(w, years.of(w));
    const found = new Mismatches();
    for (const k of ['stampSerial', 'clockStamp', 'sunAltitude', 'sunAzimuth', 'dni', 'dhi', 'missing', 'sky', 'gain'] as const) {
      for (let i = 0; i < 8760; i++) found.check(Object.is(second[k][i], own[k][i]), () => `${k}[${i}]: ${second[k][i]} against ${own[k][i]}`);
    }
    expect(found.list.slice(0, 5)).toEqual([]);
    expect(second.missing[3000]).toBe(1);
  });
});

describe('the columns of a year', () => {
  test('the radiant and convective parts split the gain by the radiant fractions: radiant = f_b · beam part + f_d · diffuse part, convective = gain − radiant (AnnualSeries.radiantFractions)', () => {
    const year = annualOfPrepared(prepareWindow(baseSpec({ glazing: { shgc: 0.6, panes: 2, radiantFractionBeam: 0.9, radiantFractionDiffuse: 0.5 } })));
    const { beam: fb, diffuse: fd } = year.radiantFractions;
    expect(fb).not.toBe(fd);
    const found = new Mismatches();
    let lit = 0;
    for (let i = 0; i < year.hours; i++) {
      if (year.gainBeam[i] > 0) lit++;
      found.check(Math.abs(year.gainBeam[i] + year.gainDiffuse[i] - year.gain[i]) <= 1e-9 * year.gain[i], () => `row ${i}: parts ${year.gainBeam[i]} + ${year.gainDiffuse[i]} against ${year.gain[i]}`);
      found.check(Math.abs(year.radiant[i] - (fb * year.gainBeam[i] + fd * year.gainDiffuse[i])) <= 1e-9 * year.gain[i], () => `row ${i}: radiant ${year.radiant[i]}`);
      found.check(Math.abs(year.convective[i] - (year.gain[i] - year.radiant[i])) <= 1e-9 * year.gain[i], () => `row ${i}: convective ${year.convective[i]}`);
    }
    expect(lit).toBeGreaterThan(1000);
    expect(found.list.slice(0, 5)).toEqual([]);
  });

  test('no sunlit glass and no beam SHGC with the sun at or below the horizon (AnnualSeries.sunlitFraction, .shgc)', () => {
    // A wall facing east: at sunrise the sun is in front of it while still below the horizon.
    for (const surfaceAzimuth of [90, 270]) {
      const year = annualOfPrepared(prepareWindow(baseSpec({ surfaceAzimuth })));
      let inFrontBelow = 0;
      const found = new Mismatches();
      for (let i = 0; i < year.hours; i++) {
        if (year.sunAltitude[i] > 0) continue;
        found.check(year.sunlitFraction[i] === 0 && year.shgc[i] === 0, () => `row ${i}: sunlit ${year.sunlitFraction[i]}, SHGC ${year.shgc[i]}`);
        if (year.incidence[i] >= 90) continue;
        // The same row worked out alone (no list of daylight hours: the pass checks the sun itself).
        if (inFrontBelow++ % 50 === 0) {
          const r = annualRowOfPrepared(prepareWindow(baseSpec({ surfaceAzimuth })), i);
          found.check(r.sunlitFraction === 0 && r.shgc === 0, () => `row ${i} alone: sunlit ${r.sunlitFraction}, SHGC ${r.shgc}`);
        }
      }
      expect(inFrontBelow).toBeGreaterThan(100);
      expect(found.list.slice(0, 5)).toEqual([]);
    }
  });

  test('one-row calls at sites whose numbers run together (4° N 15° E, 41° N 5° E) each take their own site’s sun', () => {
    const a = prepareWindow(baseSpec({ site: { latitude: 4, longitude: 15, utcOffset: 1, elevation: 100 } }));
    const b = prepareWindow(baseSpec({ site: { latitude: 41, longitude: 5, utcOffset: 1, elevation: 100 } }));
    const ya = annualOfPrepared(a);
    const yb = annualOfPrepared(b);
    for (const row of [NOON_ROW, NOON_ROW + 1]) {
      expect(annualRowOfPrepared(a, row).sunAltitude).toBe(ya.sunAltitude[row]);
      expect(annualRowOfPrepared(b, row).sunAltitude).toBe(yb.sunAltitude[row]);
    }
    expect(ya.sunAltitude[NOON_ROW]).not.toBe(yb.sunAltitude[NOON_ROW]);
  });
});

const NOON_ROW = 171 * 24 + 12;

describe('the shading of a window that is not its own mirror image', () => {
  test('with one fin, every daylight row’s sunlit fraction is sunlitFraction at the row’s sun (the checked shadow polygons)', () => {
    const shading = { leftFin: { projection: 0.5, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 }, overhang: { projection: 0.4, gap: 0.1, extensionLeft: 0, extensionRight: 0.6 } };
    const spec = baseSpec({ shading, surfaceAzimuth: 160 });
    const year = annualOfPrepared(prepareWindow(spec));
    const found = new Mismatches();
    let partly = 0;
    for (let i = 0; i < year.hours; i++) {
      if (!(year.sunAltitude[i] > 0 && year.incidence[i] < 90)) continue;
      const checked = sunlitFraction({ width: spec.width, height: spec.height }, shading, year.sunAltitude[i], year.sunAzimuth[i], spec.surfaceAzimuth);
      if (checked > 0 && checked < 1) partly++;
      found.check(Math.abs(year.sunlitFraction[i] - checked) <= 1e-9, () => `row ${i}: ${year.sunlitFraction[i]} against ${checked}`);
    }
    expect(partly).toBeGreaterThan(500);
    expect(found.list.slice(0, 5)).toEqual([]);
  });
});
