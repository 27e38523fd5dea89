/**
 * The one-hour gain at a date-time between the rows of the year (src/core/gain/prepared.ts and the
 * direct path of src/core/gain/windowGain.ts): the weather it reads, the words naming that weather,
 * the year's bounds, the outdoor dry-bulb from a series, the site's air reaching the sun, and a
 * horizontal window. The first mutation run of prepared.ts found these reached by no test (the
 * annual series and the row stamps take another path).
 *
 * Sources:
 * - docs/conventions.md: a date-time reads the row whose stamp is nearest (an hour-ending stamp
 *   names the hour that ends then); a supplied series' missing or physically impossible hour is
 *   missing, as in the annual series. The physically possible limits are those of Long & Shi (2008)
 *   (from memory): GHI ≤ 1.5 Sa μ0^1.2 + 100, DHI ≤ 0.95 Sa μ0^1.2 + 50 [W/m²].
 * - NREL SPA (Reda & Andreas 2008, eq. 42; from memory): the refraction is
 *   (P / 1010) · (283 / (273 + T)) · 1.02 / (60 tan(e0 + 10.3 / (e0 + 5.11))), so at one true
 *   altitude e0 the lift between two pressures at one temperature is proportional to their
 *   difference and inversely to 273 + T.
 * - Geometry: a horizontal plane (tilt 0) is lit by the sun whenever it is above the horizon, with
 *   cos θ = sin(altitude) (the incidence-angle equation with Σ = 0).
 * - The published methods named in the weather words: the ASHRAE clear-sky model (Gueymard &
 *   Thevenard 2013), Ineichen & Perez (2002), Erbs et al. (1982); the error convention of
 *   docs/architecture.md for the refusal.
 */
import { annualSeries } from '../../../src/core/gain/annual';
import { gainSteps } from '../../../src/core/gain/gainSteps';
import type { WindowSpec } from '../../../src/core/gain/window';
import { windowGainAt } from '../../../src/core/gain/windowGain';
import { ineichenPerezClearSky } from '../../../src/core/sky/clearSky';
import { civilToSerial, dayOfYear } from '../../../src/core/time/calendar';
import { refusalMessage } from '../../support/expectError';
import { baseSpec } from './gainFixtures';

const hours = (v: number) => new Array<number>(8760).fill(v);
/** Row (from 0) of the hour ending hh:00 on a day of 2026, hour-ending convention. */
const rowOf = (month: number, day: number, hourEnding: number) => Math.round((civilToSerial(2026, month, day, hourEnding) - civilToSerial(2026, 1, 1)) * 24) - 1;

describe('the one-hour gain between the rows of the year', () => {
  test('the weather is named in the explanation by its model and the month\'s values, or as the supplied series', () => {
    const t = civilToSerial(2026, 7, 9, 12, 20);
    const dni = (spec: WindowSpec) => gainSteps(spec, t).find((s) => s.quantity === 'direct normal irradiance')!.method;
    const dhi = (spec: WindowSpec) => gainSteps(spec, t).find((s) => s.quantity === 'diffuse horizontal irradiance')!.method;
    const tauB = [0.3, 0.31, 0.32, 0.33, 0.34, 0.35, 0.41, 0.37, 0.38, 0.39, 0.4, 0.42];
    const tauD = [2.5, 2.5, 2.4, 2.4, 2.3, 2.3, 2.25, 2.2, 2.2, 2.3, 2.4, 2.5];
    expect(dhi(baseSpec({ weather: { kind: 'ashraeClearSky', tauB, tauD } }))).toBe('ASHRAE clear-sky model, τb 0.41, τd 2.25 (Gueymard & Thevenard 2013)');
    const linkeTurbidity = [2.8, 2.9, 3, 3.1, 3.2, 3.3, 3.45, 3.3, 3.2, 3.1, 3, 2.9];
    expect(dhi(baseSpec({ weather: { kind: 'ineichenClearSky', linkeTurbidity } }))).toBe('Ineichen & Perez (2002) clear sky, Linke turbidity 3.45');
    expect(dhi(baseSpec({ weather: { kind: 'measured', dni: hours(100), dhi: hours(50) } }))).toBe('supplied hourly series');
    expect(dni(baseSpec({ weather: { kind: 'measured', dni: hours(100), dhi: hours(50) } }))).toBe('supplied hourly series; 8760 rows, one per hour of 2026');
    expect(dhi(baseSpec({ weather: { kind: 'globalHorizontal', ghi: hours(300) } }))).toBe('supplied global horizontal split by Erbs et al. (1982)');
  });

  test('a turbidity clear sky between the rows is the model at the hour\'s sun and the site\'s elevation', () => {
    const spec = baseSpec({ weather: { kind: 'ineichenClearSky', linkeTurbidity: [3.2] } }); // elevation 1600 m
    const t = civilToSerial(2026, 5, 14, 10, 20);
    const g = windowGainAt(spec, t);
    expect(g.row).toBeUndefined();
    const model = ineichenPerezClearSky(g.sunAltitude, dayOfYear(t - 1 / 48), 3.2, 1600);
    expect(g.dni).toBeCloseTo(model.dni, 9);
    expect(g.dhi).toBeCloseTo(model.dhi, 9);
    expect(g.dni).toBeGreaterThan(ineichenPerezClearSky(g.sunAltitude, dayOfYear(t - 1 / 48), 3.2, 0).dni); // not the sea-level sky
  });

  test('a supplied hour with one value missing, or past the physically possible, is missing between the rows as in its row', () => {
    const t = civilToSerial(2026, 6, 10, 12, 20); // reads the row of the hour ending 12:00
    const row = rowOf(6, 10, 12);
    const cases: [string, Partial<Record<'dni' | 'dhi' | 'ghi', number>>][] = [
      ['direct normal missing', { dni: Number.NaN }],
      ['diffuse missing', { dhi: Number.NaN }],
      ['diffuse above the extraterrestrial irradiance', { dhi: 1450 }],
      ['global missing', { ghi: Number.NaN }],
      ['global past the limit of 1.5 Sa sin(altitude)^1.2 + 100 (about 1980 W/m² at this noon)', { ghi: 1999 }],
    ];
    for (const [what, bad] of cases) {
      const spec =
        bad.ghi !== undefined
          ? baseSpec({ weather: { kind: 'globalHorizontal', ghi: hours(500).map((v, i) => (i === row ? bad.ghi! : v)) } })
          : baseSpec({ weather: { kind: 'measured', dni: hours(600).map((v, i) => (i === row && bad.dni !== undefined ? bad.dni : v)), dhi: hours(100).map((v, i) => (i === row && bad.dhi !== undefined ? bad.dhi : v)) } });
      expect([what, annualSeries(spec).missing[row]]).toEqual([what, 1]);
      const g = windowGainAt(spec, t);
      expect(g.row).toBeUndefined();
      expect([g.missing, g.gain.total, g.dni, g.dhi]).toEqual([true, 0, 0, 0]);
      expect(g.weatherSource.endsWith(': no value for this hour')).toBe(true);
      // The hour before is whole.
      expect(windowGainAt(spec, t - 1 / 24).missing).toBe(false);
    }
  });

  test('a supplied series is read in its own year only: the first rows are read, a date-time past the last row is refused', () => {
    const spec = baseSpec({ weather: { kind: 'measured', dni: hours(0), dhi: hours(40) } });
    // 00:40 on 1 January ends an hour whose stamp is nearest 01:00: the first row.
    expect(windowGainAt(spec, civilToSerial(2026, 1, 1, 0, 40)).dhi).toBe(40);
    const refusal = (t: number) => refusalMessage(() => windowGainAt(spec, t));
    // 00:20 on 1 January is nearest the stamp 00:00, the last row of 2025.
    expect(refusal(civilToSerial(2026, 1, 1, 0, 20))).toBe("dateTime = 46023.01389 is not allowed: must fall in 2026, the year of the window's weather series");
    // 00:40 on 1 January 2027 is nearest 01:00 of 2027, a row past the year's last (24:00 on 31 December).
    expect(refusal(civilToSerial(2027, 1, 1, 0, 40))).toBe("dateTime = 46388.02778 is not allowed: must fall in 2026, the year of the window's weather series");
  });

  test('the outdoor dry-bulb between the rows is the supplied series\' row (NaN for a missing one, then no conduction)', () => {
    const row = rowOf(8, 3, 15);
    const dryBulb = hours(0).map((_, i) => 10 + (i % 24));
    dryBulb[row + 1] = Number.NaN;
    const spec = baseSpec({ glazing: { shgc: 0.6, panes: 2, uValue: 2 }, indoorTemperature: 22, weather: { kind: 'measured', dni: hours(300), dhi: hours(80), dryBulb } });
    const g = windowGainAt(spec, civilToSerial(2026, 8, 3, 15, 10)); // nearest the stamp 15:00
    expect(g.row).toBeUndefined();
    expect(g.outdoorTemperature).toBe(dryBulb[row]);
    expect(g.gain.conduction).toBeCloseTo(2 * 2 * 1.5 * (dryBulb[row] - 22), 9);
    const gap = windowGainAt(spec, civilToSerial(2026, 8, 3, 15, 50)); // nearest 16:00, the missing row
    expect(gap.outdoorTemperature).toBeNaN();
    expect(gap.gain.conduction).toBe(0);
  });

  test('a stamp half-way between two rows reads its dry-bulb from the row it reads its weather from, on design days as from a series', () => {
    const designDay = baseSpec({
      glazing: { shgc: 0.6, panes: 2, uValue: 2 },
      indoorTemperature: 22,
      weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [30], dailyRange: [10] },
    });
    const half = civilToSerial(2026, 8, 3, 12, 30);
    const row = rowOf(8, 3, 12) + 1; // the stamp nearest 12:30 rounding up: 13:00
    const dryBulb = hours(0).map((_, i) => (i === row ? 27 : 20));
    const series = { ...designDay, weather: { kind: 'measured' as const, dni: hours(300), dhi: hours(80), dryBulb } };
    expect(windowGainAt(series, half).outdoorTemperature).toBe(27);
    expect(windowGainAt(designDay, half).outdoorTemperature).toBe(windowGainAt(designDay, civilToSerial(2026, 8, 3, 13)).outdoorTemperature);
  });

  test('the site\'s pressure and temperature set the refraction of the sun between the rows (SPA eq. 42)', () => {
    const t = civilToSerial(2026, 6, 10, 6, 10); // sun about 5° up in the morning
    const altitude = (pressure: number, temperature: number) => windowGainAt(baseSpec({ site: { ...baseSpec().site, pressure, temperature } }), t).sunAltitude;
    const lift1 = altitude(1000, 10) - altitude(1, 10);
    const lift2 = altitude(500, -20) - altitude(1, -20);
    expect(lift1).toBeGreaterThan(0.05);
    expect(lift2 / lift1).toBeCloseTo((499 / 253) / (999 / 283), 3);
  });

  test('a horizontal window is lit whenever the sun is up, with the beam DNI · sin(altitude), also with the sun behind its azimuth', () => {
    const spec = baseSpec({ surfaceTilt: 0, surfaceAzimuth: 180 });
    // A June morning at 40° N: the sun rises north of east, so at 06:20 it stands behind the azimuth 180°.
    for (const t of [civilToSerial(2026, 6, 21, 6, 20), civilToSerial(2026, 6, 21, 7)]) {
      const g = windowGainAt(spec, t);
      expect(g.sunAltitude).toBeGreaterThan(0);
      expect(Math.abs(((g.sunAzimuth - 180 + 540) % 360) - 180)).toBeGreaterThan(90);
      expect(g.sunlitFraction).toBe(1);
      expect(g.beam).toBeCloseTo(g.dni * Math.sin((g.sunAltitude * Math.PI) / 180), 6);
    }
  });
});
