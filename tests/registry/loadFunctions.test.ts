/**
 * Cooling load and conduction beside the solar gain in the worksheet functions, called as a cell
 * would call them, against the core they wrap (whose outside checks are the radiant time series
 * properties of tests/reference/rts-spitler-1997.test.ts and tests/core/load). Plumbing only:
 * columns, parts adding up, the window's own room, monthly τ values, messages in the user's words.
 * Window numbers are invented test inputs.
 */
import { SunpaneError } from '../../src/core/common/errors';
import { annualSeries } from '../../src/core/gain/annual';
import { DAILY_RANGE_FRACTIONS } from '../../src/core/gain/outdoorTemperature';
import { annualLoadParts } from '../../src/core/load/room';
import { illustrativeRadiantTimeSeries } from '../../src/core/load/rtsSeries';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import type { RawArg } from '../../src/registry/types';
import { baseSpec } from '../core/gain/gainFixtures';

function call(name: string, args: RawArg[]) {
  return applyFunction(findFunction(name)!, args);
}

/** A west window with conduction and a medium room, as a name/value range. */
const FIELDS: [string, number | string][] = [
  ['latitude', 40], ['longitude', -105], ['utcOffset', -7], ['elevation', 1600], ['surfaceAzimuth', 250], ['width', 2], ['height', 1.5], ['frameFraction', 0.1],
  ['shgc', 0.5], ['tauB', 0.4], ['tauD', 2.3], ['uValue', 2.8], ['indoorTemperature', 24], ['dryBulbMax', 33], ['dailyRange', 12], ['year', 2026], ['skyModel', 'perez1990'],
];
const windowRange = (extra: [string, number | string][] = []) => [...FIELDS, ...extra];
const spec = () =>
  baseSpec({
    surfaceAzimuth: 250,
    glazing: { shgc: 0.5, panes: 2, uValue: 2.8 },
    indoorTemperature: 24,
    weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [33], dailyRange: [12] },
  });
const FACTORS = [0.4, 0.3, 0.2, 0.1, ...new Array(20).fill(0)];

describe('the hourly year with conduction and cooling load', () => {
  test('SOLARGAINYEAR gives conduction, the gain by part and the load by part; the parts add up', () => {
    const out = call('SOLARGAINYEAR', [windowRange([['roomConstruction', 'medium']]), [['gain', 'gainBeam', 'gainDiffuse', 'conduction', 'load', 'loadBeam', 'loadDiffuse', 'loadConduction']], null, null, true]);
    expect(out[0]).toEqual(['gain', 'gainBeam', 'gainDiffuse', 'conduction', 'load', 'loadBeam', 'loadDiffuse', 'loadConduction']);
    expect(out).toHaveLength(8761);
    const s = annualSeries(spec());
    const load = annualLoadParts(s, illustrativeRadiantTimeSeries('medium'));
    for (let i = 0; i < 8760; i += 53) {
      const r = out[i + 1] as number[];
      expect(r[0]).toBeCloseTo(s.gain[i], 9);
      expect(r[1] + r[2]).toBeCloseTo(r[0], 9);
      expect(r[3]).toBeCloseTo(s.conduction[i], 9);
      expect(r[4]).toBeCloseTo(load.total[i], 9);
      expect(r[5] + r[6] + r[7]).toBeCloseTo(r[4], 9);
    }
  });

  test("the conduction of an hour is U × rough opening × (outdoor − indoor), the outdoor by the daily-range fractions (hand check)", () => {
    const out = call('SOLARGAINYEAR', [windowRange(), [['conduction']]]);
    // 21 July, hour ending 15:00: row (201 days + 14 h); fraction of daily range at hour 15
    const row = 201 * 24 + 14;
    const t = 33 - DAILY_RANGE_FRACTIONS[14] * 12;
    expect(out[row][0]).toBeCloseTo(2.8 * 2 * 1.5 * (t - 24), 9);
  });

  test('factors given to the function are both series; a load without a room is refused naming quantities', () => {
    const out = call('SOLARGAINYEAR', [windowRange(), [['load']], null, null, false, [FACTORS]]);
    const s = annualSeries(spec());
    const load = annualLoadParts(s, { solar: FACTORS, nonSolar: FACTORS });
    expect(out[4816][0]).toBeCloseTo(load.total[4816], 9);
    const refused = call('SOLARGAINYEAR', [windowRange(), [['gain', 'load']]])[0][0] as SunpaneError;
    expect(refused).toBeInstanceOf(SunpaneError);
    expect(refused.message).toMatch(/^quantities = "load" is not allowed: needs the room's radiant time series: give factors, or the window's roomConstruction/);
  });

  test('WINDOWYEAR takes factors at its end and twelve monthly τb and τd', () => {
    const base = (q: string[]) => [2026, 40, -105, -7, 250, 2, 1.5, 0.5, [q], null, null];
    const glass = [2, 0.1, 0.2, 'perez', 90, 1, 1];
    const shading = [0, 0, 0, 0, 0, 0, 0, null];
    const out = call('WINDOWYEAR', [...base(['gain', 'load']), [[0.4]], [[2.3]], ...glass, ...shading, 'hourEnding', false, [FACTORS]]);
    const s = annualSeries(baseSpec({ site: { latitude: 40, longitude: -105, utcOffset: -7 }, surfaceAzimuth: 250, glazing: { shgc: 0.5, panes: 2 } }));
    const load = annualLoadParts(s, { solar: FACTORS, nonSolar: FACTORS });
    expect(out[4816][1]).toBeCloseTo(load.total[4816], 9);
    const tauB = [0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.3, 0.5, 0.5, 0.5, 0.5, 0.5];
    const monthly = call('WINDOWYEAR', [...base(['gain']), [tauB], [new Array(12).fill(2.3)], ...glass]);
    expect((call('WINDOWYEAR', [...base(['load']), 0.4, 2.3])[0][0] as SunpaneError).message).toMatch(/^quantity = "load" is not allowed: needs the room's radiant time series/);
    const july = annualSeries(baseSpec({ site: { latitude: 40, longitude: -105, utcOffset: -7 }, surfaceAzimuth: 250, glazing: { shgc: 0.5, panes: 2 }, weather: { kind: 'ashraeClearSky', tauB: [0.3], tauD: [2.3] } }));
    const other = annualSeries(baseSpec({ site: { latitude: 40, longitude: -105, utcOffset: -7 }, surfaceAzimuth: 250, glazing: { shgc: 0.5, panes: 2 }, weather: { kind: 'ashraeClearSky', tauB: [0.5], tauD: [2.3] } }));
    expect(monthly[4816][0]).toBeCloseTo(july.gain[4816], 9); // July
    expect(monthly[1000][0]).toBeCloseTo(other.gain[1000], 9); // February
  });
});

describe('design-day peaks with load and parts', () => {
  test('SOLARGAINPEAKS with parts: the gain by part, the conduction at the peak hour, and the load by part at its peak', () => {
    const t = call('SOLARGAINPEAKS', [windowRange([['roomConstruction', 'heavy']]), null, 21, true, true]);
    expect(t[0]).toEqual(['month', 'peakHour', 'peakGain', 'peakGainBeam', 'peakGainDiffuse', 'peakGainConduction', 'peakLoadHour', 'peakLoad', 'peakLoadBeam', 'peakLoadDiffuse', 'peakLoadConduction']);
    for (const r of t.slice(1) as number[][]) {
      expect(r[3] + r[4]).toBeCloseTo(r[2], 9);
      const hour = r[1];
      expect(r[5]).toBeCloseTo(2.8 * 3 * (33 - DAILY_RANGE_FRACTIONS[hour - 1] * 12 - 24), 9);
      expect(r[8] + r[9] + r[10]).toBeCloseTo(r[7], 9);
    }
    const plain = call('SOLARGAINPEAKS', [windowRange()]);
    for (const r of plain) expect(r).toHaveLength(3);
  });

  test('PEAKGAINS: twelve monthly τb/τd pairs give each month its own pair; a count other than 1 or 12 is refused naming tauB', () => {
    const site = [2026, 40, -105, -7, 270, 2, 1.5, 0.6];
    const tauB = [0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.3, 0.5, 0.5, 0.5, 0.5, 0.5];
    const monthly = call('PEAKGAINS', [...site, [tauB], [new Array(12).fill(2.3)]]);
    const clearer = call('PEAKGAINS', [...site, 0.3, 2.3]);
    const hazier = call('PEAKGAINS', [...site, 0.5, 2.3]);
    expect(monthly[6]).toEqual(clearer[6]);
    expect(monthly[0]).toEqual(hazier[0]);
    // one τd for the whole year beside twelve τb: the same τd every month
    expect(call('PEAKGAINS', [...site, [tauB], 2.3])).toEqual(monthly);
    // the same words as a window range's or the pane's monthly list
    expect(() => call('PEAKGAINS', [...site, 0.4, [[2.3, 2.3, 2.3]]])).toThrow(/^tauD = a list of 3 is not allowed: must hold one value for the whole year or 12 monthly values \(January first\)$/);
    expect(() => call('PEAKGAINS', [...site, [[0.4, 0.4]], [[2.3, 2.3]]])).toThrow(/^tauB = a list of 2 is not allowed: must hold one value for the whole year or 12 monthly values \(January first\)$/);
  });

  test('PEAKGAINS with factors and parts: 11 columns, the load parts adding up', () => {
    const args = [2026, 40, -105, -7, 270, 2, 1.5, 0.6, 0.4, 2.3, 21, [FACTORS]];
    const t = call('PEAKGAINS', [...args, null, null, null, null, null, null, null, null, null, null, null, null, null, null, null, 'hourEnding', false, true]);
    for (const r of t as number[][]) {
      expect(r).toHaveLength(11);
      expect(r[5]).toBe(0); // no U-value in this form: no conduction
      expect(r[8] + r[9] + r[10]).toBeCloseTo(r[7], 9);
    }
  });

  test('COOLINGLOAD with showGain puts the gain beside its load', () => {
    const gains = Array.from({ length: 24 }, (_, h) => (h > 6 && h < 18 ? 300 : 0));
    const out = call('COOLINGLOAD', [[gains], [FACTORS], 0.6, true]);
    expect(out).toHaveLength(24);
    expect(out[7][0]).toBe(300);
    expect(out[7][1]).toBeCloseTo(0.4 * 300 + 0.6 * 0.4 * 300, 9);
    expect(call('COOLINGLOAD', [[gains], [FACTORS], 0.6])[7]).toHaveLength(1);
  });
});

describe('bad input in the user’s words', () => {
  test('a room series that does not sum to 1 names the field, the count and the sum', () => {
    const off = [0.5, 0.5, ...new Array(21).fill(0), 0.1].join(' ');
    const e = call('SOLARGAIN', [windowRange([['solarRadiantTimeSeries', off], ['nonSolarRadiantTimeSeries', FACTORS.join(' ')]]), '2026-07-21 13:00'])[0][0] as SunpaneError;
    expect(e.message).toBe('window solarRadiantTimeSeries = a list of 24 is not allowed: the 24 radiant time factors must sum to 1 ± 0.01 (they sum to 1.1)');
    const short = call('SOLARGAIN', [windowRange([['solarRts', '0.5 0.5']]), '2026-07-21 13:00'])[0][0] as SunpaneError;
    expect(short.message).toBe('window solarRts = "0.5 0.5" is not allowed: must hold exactly 24 values, separated by spaces, commas or semicolons (it holds 2)');
    const unknown = call('SOLARGAIN', [windowRange([['roomConstruction', 'stone']]), '2026-07-21 13:00'])[0][0] as SunpaneError;
    expect(unknown.message).toMatch(/^window roomConstruction = "stone" is not allowed: must be one of "light", "medium", "heavy"/);
  });

  test('a daylight-saving end before its start shows both as date-times', () => {
    const e = call('SOLARGAIN', [windowRange([['daylightSavingStart', '2026-10-25 02:00'], ['daylightSavingEnd', '2026-03-29 03:00']]), '2026-07-21 13:00'])[0][0] as SunpaneError;
    expect(e.message).toBe('window daylightSavingEnd = "2026-03-29T03:00" is not allowed: must come after the start of daylight saving (2026-10-25T02:00); a period over the new year ends in the following year');
  });

  test('negative U, radiant fractions outside 0–1 and unknown glazing types name the field, value and range', () => {
    const hour = '2026-07-21 13:00';
    const plain = FIELDS.filter(([n]) => !['uValue', 'indoorTemperature', 'dryBulbMax', 'dailyRange'].includes(n));
    const msg = (extra: [string, number | string][]) => (call('SOLARGAIN', [[...plain, ...extra], hour])[0][0] as SunpaneError).message;
    expect(msg([['uValue', -1]])).toBe('window uValue = -1 is not allowed: must be a number from 0 to 10 W/(m²·K)');
    expect(msg([['radiantFractionConduction', 1.5]])).toBe('window radiantFractionConduction = 1.5 is not allowed: must be a number from 0 to 1');
    expect(msg([['glazingType', 'mirror']])).toMatch(/^window glazingType = "mirror" is not allowed: must be one of "clear", "tinted", "coated", "table"/);
  });
});
