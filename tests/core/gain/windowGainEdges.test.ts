/**
 * The one-hour gain (src/core/gain/windowGain.ts) where its first mutation run found it untested: the
 * refusals of the gain equation's inputs word for word (each names the input and its unit), the
 * diffuse light's own interior attenuation and radiant share, a clear-sky hour asked for in another
 * year than the window's (the numbers of that year's row, as windowGainAt documents), and the hour
 * between the rows of the year (its weather words, no beam or sunlit glass with the sun down or behind
 * a tilted window, the dry-bulb and indoor temperature reported only with a U-value).
 *
 * Sources: the fenestration gain equation Q = A · IAC · E · SHGC with its radiant share (ASHRAE
 * Handbook—Fundamentals (2013) ch. 15, from memory), worked out by hand below; the row and the words
 * of each hour are the documented behaviour of windowGainAt (its doc comment and the annual series'
 * columns). The windows are invented test inputs (tests/core/gain/gainFixtures.ts).
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { annualSeries } from '../../../src/core/gain/annual';
import type { WindowSpec } from '../../../src/core/gain/window';
import { windowGainAt, windowGainParts } from '../../../src/core/gain/windowGain';
import { sunPosition } from '../../../src/core/sun/spa';
import { civilToSerial, serialToUtcMs } from '../../../src/core/time/calendar';
import { baseSpec } from './gainFixtures';

const OK = { glassArea: 2, beam: 800, sky: 100, ground: 50, sunlitFraction: 1, shgcBeam: 0.6, shgcDiffuse: 0.52, interiorAttenuation: 1, radiantFraction: 0.7 };

describe('the gain equation\'s inputs', () => {
  test('each refused input is named with its allowed range and unit', () => {
    const cases: [Partial<typeof OK> & Record<string, number>, string][] = [
      [{ glassArea: -1 }, 'glassArea = -1 is not allowed: must be a number of at least 0 m²'],
      [{ beam: -2 }, 'beam = -2 is not allowed: must be a number of at least 0 W/m²'],
      [{ sky: -3 }, 'sky = -3 is not allowed: must be a number of at least 0 W/m²'],
      [{ ground: -4 }, 'ground = -4 is not allowed: must be a number of at least 0 W/m²'],
      [{ shgcBeam: 1.2 }, 'shgcBeam = 1.2 is not allowed: must be a number from 0 to 1'],
      [{ interiorAttenuation: 1.3 }, 'interiorAttenuation = 1.3 is not allowed: must be a number from 0 to 1'],
      [{ interiorAttenuationDiffuse: 1.4 }, 'interiorAttenuationDiffuse = 1.4 is not allowed: must be a number from 0 to 1'],
      [{ radiantFraction: 1.5 }, 'radiantFraction = 1.5 is not allowed: must be a number from 0 to 1'],
      [{ radiantFractionDiffuse: -0.1 }, 'radiantFractionDiffuse = -0.1 is not allowed: must be a number from 0 to 1'],
    ];
    for (const [bad, words] of cases) expect(() => windowGainParts({ ...OK, ...bad })).toThrow(words);
  });

  test('diffuse light with its own interior attenuation and radiant share (hand computation)', () => {
    // beam 2 × 0.5 × 800 × 0.6 = 480 W; sky 2 × 0.8 × 100 × 0.52 = 83.2 W; ground 2 × 0.8 × 50 × 0.52 = 41.6 W;
    // radiant 0.7 × 480 + 0.4 × (83.2 + 41.6) = 385.92 W
    const g = windowGainParts({ ...OK, interiorAttenuation: 0.5, interiorAttenuationDiffuse: 0.8, radiantFractionDiffuse: 0.4 });
    expect(g.beam).toBeCloseTo(480, 9);
    expect(g.sky).toBeCloseTo(83.2, 9);
    expect(g.ground).toBeCloseTo(41.6, 9);
    expect(g.radiant).toBeCloseTo(385.92, 9);
    expect(g.convective).toBeCloseTo(480 + 124.8 - 385.92, 9);
  });
});

describe('a clear-sky hour in another year than the window\'s', () => {
  /** The row of `series` stamped `stamp`. */
  function rowOf(series: { stampSerial: Float64Array }, stamp: number): number {
    return series.stampSerial.findIndex((s) => Math.abs(s - stamp) < 1e-7);
  }

  test('is the row of the year the hour falls in, with that row\'s numbers (ASHRAE and turbidity clear skies, 1901 to 9998)', () => {
    const skies: WindowSpec['weather'][] = [{ kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3] }, { kind: 'ineichenClearSky', linkeTurbidity: [3] }];
    for (const weather of skies) {
      for (const year of [2027, 1901, 9998]) {
        const spec = baseSpec({ weather });
        const stamp = civilToSerial(year, 7, 21, 13);
        const h = windowGainAt(spec, stamp);
        const series = annualSeries({ ...spec, year });
        const row = rowOf(series, stamp);
        expect(row).toBeGreaterThan(0);
        expect(h.row).toBe(row);
        expect(h.gain.total).toBe(series.gain[row]);
        expect(h.gain.total).toBeGreaterThan(0);
      }
    }
  });

  test('an hour in 1900 or 9999, outside the years a window may have (1901 to 9998), is worked out at its own sun, off the rows', () => {
    for (const weather of [{ kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3] }, { kind: 'ineichenClearSky', linkeTurbidity: [3] }] as WindowSpec['weather'][]) {
      for (const year of [1900, 9999]) {
        const stamp = civilToSerial(year, 7, 21, 13);
        const h = windowGainAt(baseSpec({ weather }), stamp);
        expect(h.row).toBeUndefined();
        expect(h.dateTime).toBeCloseTo(stamp - 1 / 48, 9);
        expect(h.sunAltitude).toBeGreaterThan(40); // early afternoon in July at 40° N
        expect(h.gain.total).toBeGreaterThan(0);
      }
    }
  });

  test('an instant at midnight on 1 January is the first row of the new year; an hour ending then is the last of the old one', () => {
    const midnight = civilToSerial(2027, 1, 1);
    const instant = windowGainAt(baseSpec({ timeConvention: 'instant' }), midnight);
    expect(instant.row).toBe(0);
    expect(instant.dateTime).toBe(midnight);
    const ending = windowGainAt(baseSpec(), midnight);
    expect(ending.row).toBe(8759);
  });

  test('between rows at the turn of the year (the hour ending 00:10 on 1 January, the sun at 23:40 on 31 December) the clear sky still answers', () => {
    const stamp = civilToSerial(2027, 1, 1, 0, 10);
    for (const weather of [{ kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3] }, { kind: 'ineichenClearSky', linkeTurbidity: [3] }] as WindowSpec['weather'][]) {
      const h = windowGainAt(baseSpec({ weather }), stamp);
      expect(h.row).toBeUndefined();
      expect(h.dateTime).toBeCloseTo(civilToSerial(2026, 12, 31, 23, 40), 9);
      expect(h.missing).toBe(false);
      expect(h.gain.total).toBe(0); // night
    }
  });

  test('a date-time that is not a number is refused as dateTime, not as the window\'s year', () => {
    expect(() => windowGainAt(baseSpec(), 'noon' as unknown as number)).toThrow(/^dateTime = /);
    expect(() => windowGainAt(baseSpec(), Number.NaN)).toThrow(/^dateTime = NaN/);
  });

  test('a window without weather, or no window, is refused by the description, not by a TypeError', () => {
    const t = civilToSerial(2026, 7, 21, 13);
    expect(() => windowGainAt({ ...baseSpec(), weather: undefined } as unknown as WindowSpec, t)).toThrow(SunpaneError);
    expect(() => windowGainAt(undefined as unknown as WindowSpec, t)).toThrow(SunpaneError);
  });

  test('with daylight saving, each row\'s clock stamp from the annual table names that row (a repeated clock hour: the first, daylight one)', () => {
    const site = { ...baseSpec().site, daylightSaving: { start: civilToSerial(2026, 3, 29, 2), end: civilToSerial(2026, 10, 25, 3), shift: 1 } };
    for (const timeConvention of ['hourEnding', 'instant'] as const) {
      const spec = baseSpec({ site, timeConvention });
      const series = annualSeries(spec);
      for (const day of [88, 298]) {
        for (let i = (day - 1) * 24 - 2; i < day * 24 + 2; i++) {
          const first = series.clockStamp.findIndex((c) => Math.abs(c - series.clockStamp[i]) < 1e-9);
          expect({ i, row: windowGainAt(spec, series.clockStamp[i]).row }).toEqual({ i, row: first });
        }
      }
    }
  });
});

describe('an hour between the rows of the year', () => {
  // 10:30 local standard time (an instant), between the rows stamped 10:00 and 11:00.
  const between = civilToSerial(2026, 7, 21, 10, 30);
  const instantSpec = (overrides: Partial<WindowSpec> = {}) => baseSpec({ timeConvention: 'instant', ...overrides });

  test('given weather: its words, and a refused value named with its range and unit', () => {
    const h = windowGainAt(instantSpec(), between, { dni: 700, dhi: 120 });
    expect(h.row).toBeUndefined();
    expect(h.weatherSource).toBe('given for this hour');
    expect(windowGainAt(instantSpec(), civilToSerial(2026, 7, 21, 10), { dni: 700, dhi: 120 }).weatherSource).toBe('given for this hour');
    expect(() => windowGainAt(instantSpec(), between, { dni: 2500, dhi: 120 })).toThrow('dni = 2500 is not allowed: must be a number from 0 to 2000 W/m²');
    expect(() => windowGainAt(instantSpec(), between, { dni: 700, dhi: 2100 })).toThrow('dhi = 2100 is not allowed: must be a number from 0 to 2000 W/m²');
  });

  test('a missing row of a supplied series says so, at the row and between rows', () => {
    const dni = new Float64Array(8760).fill(Number.NaN);
    const dhi = new Float64Array(8760).fill(Number.NaN);
    const spec = instantSpec({ weather: { kind: 'measured', dni, dhi } });
    for (const t of [civilToSerial(2026, 7, 21, 10), between]) {
      const h = windowGainAt(spec, t);
      expect(h.missing).toBe(true);
      expect(h.weatherSource).toBe('supplied hourly series: no value for this hour');
      expect(h.gain.total).toBe(0);
    }
  });

  test('the diffuse treatment is reported as at the rows', () => {
    const atRow = civilToSerial(2026, 7, 21, 10);
    for (const t of [atRow, between]) {
      expect(windowGainAt(instantSpec(), t).diffuseShading).toBe('viewFactors');
      expect(windowGainAt(instantSpec({ diffuseShading: 'beamOnly' }), t).diffuseShading).toBe('beamOnly');
    }
  });

  test('at a row and between rows, the diffuse gains are area × IAC × E × diffuse SHGC of the hour\'s own numbers, with an interior shade', () => {
    const spec = instantSpec({ glazing: { shgc: 0.6, panes: 2, interiorAttenuation: 0.7 } });
    for (const t of [civilToSerial(2026, 7, 21, 10), between]) {
      const h = windowGainAt(spec, t);
      expect(h.interiorAttenuationDiffuse).toBeLessThan(1);
      expect(h.gain.sky).toBeCloseTo(h.solarArea * h.interiorAttenuationDiffuse * h.sky * h.shgcDiffuse, 9);
      expect(h.gain.ground).toBeCloseTo(h.solarArea * h.interiorAttenuationDiffuse * h.ground * h.shgcDiffuse, 9);
      expect(h.gain.sky).toBeGreaterThan(0);
    }
  });

  test('a supplied series\' window asked for an hour past its year is refused as dateTime, naming the year', () => {
    const spec = baseSpec({ weather: { kind: 'measured', dni: new Float64Array(8760), dhi: new Float64Array(8760) } });
    for (const t of [civilToSerial(2027, 1, 1, 1), civilToSerial(2027, 1, 1, 0, 30), civilToSerial(2025, 12, 31, 23)]) {
      expect(() => windowGainAt(spec, t)).toThrow(/^dateTime = .* must fall in 2026, the year of the window's weather series/);
    }
  });

  test('a tilted window has no sunlit glass and no beam SHGC with the sun behind it or below the horizon', () => {
    // Steep (80°) and facing north at 12:30 in July: the sun (about 73° up, due south) is behind it.
    const noon = civilToSerial(2026, 7, 21, 12, 30);
    const behind = windowGainAt(instantSpec({ surfaceTilt: 80, surfaceAzimuth: 0 }), noon);
    expect(behind.sunAltitude).toBeGreaterThan(60);
    expect(behind.incidence).toBeGreaterThan(90);
    expect(behind.sunlitFraction).toBe(0);
    expect(behind.shgcBeam).toBe(0);
    expect(behind.gain.beam).toBe(0);
    // Just after sunset, the window turned to face the sun: in front of the plane but below the horizon.
    const site = baseSpec().site;
    let t = civilToSerial(2026, 7, 21, 19, 5);
    let sun = sunPosition(serialToUtcMs(t, site.utcOffset), site.latitude, site.longitude, { elevation: site.elevation });
    while (sun.altitude > -0.5) {
      t += 10 / 1440;
      sun = sunPosition(serialToUtcMs(t, site.utcOffset), site.latitude, site.longitude, { elevation: site.elevation });
    }
    const below = windowGainAt(instantSpec({ surfaceTilt: 80, surfaceAzimuth: Math.round(sun.azimuth) }), t, { dni: 0, dhi: 20 });
    expect(below.row).toBeUndefined();
    expect(below.sunAltitude).toBeLessThan(0);
    expect(below.incidence).toBeLessThan(90);
    expect(below.sunlitFraction).toBe(0);
    expect(below.gain.beam).toBe(0);
    expect(below.gain.total).toBeGreaterThan(0); // the sky's diffuse light
  });

  test('the outdoor and indoor temperatures are reported only with a U-value (U = 0 included), and a missing dry-bulb conducts nothing', () => {
    const design = { kind: 'ashraeClearSky' as const, tauB: [0.4], tauD: [2.3], dryBulbMax: [32], dailyRange: [12] };
    const none = windowGainAt(instantSpec({ weather: design, indoorTemperature: 24 }), between);
    expect(none.outdoorTemperature).toBeUndefined();
    expect(none.indoorTemperature).toBeUndefined();
    expect(none.gain.conduction).toBe(0);
    const zero = windowGainAt(instantSpec({ weather: design, indoorTemperature: 24, glazing: { shgc: 0.6, panes: 2, uValue: 0 } }), between);
    expect(zero.outdoorTemperature).toBeGreaterThan(20);
    expect(zero.outdoorTemperature).toBeLessThanOrEqual(32);
    expect(zero.indoorTemperature).toBe(24);
    expect(zero.gain.conduction).toBe(0);
    const dryBulb = new Float64Array(8760).fill(Number.NaN);
    const missing = windowGainAt(instantSpec({ weather: { kind: 'measured', dni: new Float64Array(8760), dhi: new Float64Array(8760), dryBulb }, indoorTemperature: 24, glazing: { shgc: 0.6, panes: 2, uValue: 1.4 } }), between);
    expect(missing.indoorTemperature).toBe(24);
    expect(missing.gain.conduction).toBe(0);
  });
});
