/**
 * The room behind a window and the year's cooling load by part. The radiant time series method
 * (Spitler, Fisher & Pedersen 1997, ASHRAE Trans. 103(2)) keeps the energy: with Σ r = 1 the load
 * over a repeating period equals the gain over it — checked here over a whole year — and with
 * radiant fractions 0 every part's load is its gain in the same hour. The series and fractions are
 * test inputs; the shipped series are our illustrative ones (src/core/load/rtsSeries.ts).
 */
import { annualLoadParts, loadPeak, windowRoomSeries } from '../../../src/core/load/room';
import { designDayPeaks } from '../../../src/core/load/designDay';
import { illustrativeRadiantTimeSeries } from '../../../src/core/load/rtsSeries';
import { annualSeries } from '../../../src/core/gain/annual';
import { baseSpec } from '../gain/gainFixtures';
import { expectArgumentError } from '../../support/expectError';

const SOLAR = [0.5, 0.3, 0.2, ...new Array(21).fill(0)];
const NON_SOLAR = [0.7, 0.2, 0.1, ...new Array(21).fill(0)];
const sum = (xs: ArrayLike<number>) => Array.from(xs).reduce((a, b) => a + b, 0);

/** A window with conduction on design days (invented inputs). */
const conducting = (over = {}) =>
  baseSpec({
    surfaceAzimuth: 250,
    glazing: { shgc: 0.5, panes: 2, uValue: 2.8, radiantFractionDiffuse: 0.9 },
    indoorTemperature: 24,
    weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [33], dailyRange: [12] },
    ...over,
  });

describe('the room of a window', () => {
  test('no room: no series (gains only)', () => {
    expect(windowRoomSeries(baseSpec())).toBeUndefined();
  });

  test('a construction gives its illustrative series, labelled as such', () => {
    const r = windowRoomSeries(baseSpec({ room: { construction: 'heavy' } }))!;
    const ref = illustrativeRadiantTimeSeries('heavy');
    expect(Array.from(r.solar)).toEqual(Array.from(ref.solar));
    expect(Array.from(r.nonSolar)).toEqual(Array.from(ref.nonSolar));
    expect(r.source).toMatch(/illustrative/);
  });

  test("the room's own series are used as given", () => {
    const r = windowRoomSeries(baseSpec({ room: { solar: SOLAR, nonSolar: NON_SOLAR } }))!;
    expect(Array.from(r.solar)).toEqual(SOLAR);
    expect(Array.from(r.nonSolar)).toEqual(NON_SOLAR);
  });

  test('bad rooms are refused naming the part, the value and what is allowed', () => {
    expectArgumentError(() => windowRoomSeries(baseSpec({ room: { construction: 'stone' } })), 'room.construction', /must be one of "light", "medium", "heavy"/);
    expectArgumentError(() => windowRoomSeries(baseSpec({ room: { construction: 'light', solar: SOLAR } })), 'room.construction', /cannot be given with the room's own series/);
    expectArgumentError(() => windowRoomSeries(baseSpec({ room: { solar: SOLAR } })), 'room.nonSolar', /must be given with the solar series/);
    expectArgumentError(() => windowRoomSeries(baseSpec({ room: { nonSolar: NON_SOLAR } })), 'room.solar', /must be given with the non-solar series/);
    const off = [...SOLAR];
    off[0] = 0.6;
    expectArgumentError(() => windowRoomSeries(baseSpec({ room: { solar: off, nonSolar: NON_SOLAR } })), 'room.solar', /must sum to 1 ± 0\.01 \(they sum to 1\.1\)/);
    const neg = [...NON_SOLAR];
    neg[2] = -0.1;
    expectArgumentError(() => windowRoomSeries(baseSpec({ room: { solar: SOLAR, nonSolar: neg } })), 'room.nonSolar[2]', /from 0 to 1/);
  });
});

describe("the year's cooling load by part", () => {
  test('over the repeating year the load of each part adds up to its gain (Σ r = 1, Spitler, Fisher & Pedersen 1997)', () => {
    const series = annualSeries(conducting());
    const load = annualLoadParts(series, { solar: SOLAR, nonSolar: NON_SOLAR });
    expect(sum(load.beam)).toBeCloseTo(sum(series.gainBeam), 6);
    expect(sum(load.diffuse)).toBeCloseTo(sum(series.gainDiffuse), 6);
    expect(sum(load.conduction)).toBeCloseTo(sum(series.conduction), 6);
    for (const i of [0, 4000, 8759]) expect(load.total[i]).toBeCloseTo(load.beam[i] + load.diffuse[i] + load.conduction[i], 9);
  });

  test('a part whose radiant fraction is 0 is loaded in its own hour', () => {
    const series = annualSeries(conducting({ glazing: { shgc: 0.5, panes: 2, uValue: 2.8, radiantFraction: 0, radiantFractionConduction: 0 } }));
    const load = annualLoadParts(series, { solar: SOLAR, nonSolar: NON_SOLAR });
    for (const i of [4800, 4812, 4816]) {
      expect(load.beam[i]).toBeCloseTo(series.gainBeam[i], 9);
      expect(load.conduction[i]).toBeCloseTo(series.conduction[i], 9);
    }
  });

  test('a radiant beam is delayed by the solar series, worked by hand at one hour', () => {
    const series = annualSeries(conducting());
    const load = annualLoadParts(series, { solar: SOLAR, nonSolar: NON_SOLAR });
    const i = 4816; // an afternoon hour in July (hour ending 17:00 on 20 July)
    // radiant fraction of the beam 1: Q = 0.5 q(i) + 0.3 q(i−1) + 0.2 q(i−2)
    expect(load.beam[i]).toBeCloseTo(0.5 * series.gainBeam[i] + 0.3 * series.gainBeam[i - 1] + 0.2 * series.gainBeam[i - 2], 9);
  });

  test('the peak of the load skips hours without weather', () => {
    const series = annualSeries(conducting());
    const load = Float64Array.from({ length: series.hours }, (_, i) => (i === 100 ? 5000 : i === 200 ? 3000 : 0));
    expect(loadPeak(series, load)).toEqual({ peakLoadW: 5000, peakLoadRow: 100, peakLoadStamp: series.stampSerial[100] });
    series.missing[100] = 1;
    expect(loadPeak(series, load).peakLoadRow).toBe(200);
  });

  test("design days use the window's own room when no factors are given", () => {
    const spec = conducting({ room: { construction: 'medium' } });
    const own = designDayPeaks(spec);
    const given = designDayPeaks(conducting(), { room: illustrativeRadiantTimeSeries('medium') });
    expect(own.map((m) => m.peakLoad)).toEqual(given.map((m) => m.peakLoad));
    const july = own[6];
    expect(july.coolingLoad![10]).toBeCloseTo(july.coolingLoadBeam![10] + july.coolingLoadDiffuse![10] + july.coolingLoadConduction![10], 9);
  });
});
