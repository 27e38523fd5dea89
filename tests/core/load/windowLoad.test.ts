/**
 * Cooling load of a window by the radiant time series as published (Spitler, Fisher & Pedersen
 * 1997, ASHRAE Trans. 103(2)): transmitted beam through the solar series, diffuse and conduction
 * through the non-solar series, each with its radiant fraction; an interior shade sends the beam
 * to the non-solar series. Checked by hand on impulses and by the method's conservation property.
 * The shipped series are illustrative (our room model): checked for their stated construction.
 */
import { annualCoolingLoad, windowCoolingLoad } from '../../../src/core/load/windowLoad';
import { firstOrderRadiantTimeSeries, illustrativeRadiantTimeSeries } from '../../../src/core/load/rtsSeries';
import { designDayPeaks } from '../../../src/core/load/designDay';
import { annualSeries } from '../../../src/core/gain/annual';
import { baseSpec } from '../gain/gainFixtures';
import { expectArgumentError } from '../../support/expectError';

const SOLAR = [0.5, 0.3, 0.2, ...new Array(21).fill(0)];
const NON_SOLAR = [0.7, 0.2, 0.1, ...new Array(21).fill(0)];
const zeros = () => new Array(24).fill(0);

describe('window cooling load by part', () => {
  test('a beam impulse goes through the solar series, a diffuse one through the non-solar series (hand check)', () => {
    const beam = zeros();
    beam[10] = 1000;
    const diffuse = zeros();
    diffuse[12] = 100;
    const load = windowCoolingLoad({ beam, diffuse, conduction: zeros() }, { solar: SOLAR, nonSolar: NON_SOLAR }, { beam: 1, diffuse: 1, conduction: 0.46 }, false);
    expect(load.beam[10]).toBeCloseTo(500, 12);
    expect(load.beam[11]).toBeCloseTo(300, 12);
    expect(load.beam[12]).toBeCloseTo(200, 12);
    expect(load.diffuse[12]).toBeCloseTo(70, 12);
    expect(load.diffuse[13]).toBeCloseTo(20, 12);
    expect(load.total[12]).toBeCloseTo(270, 12);
  });

  test('with an interior shade the beam goes through the non-solar series', () => {
    const beam = zeros();
    beam[10] = 1000;
    const load = windowCoolingLoad({ beam, diffuse: zeros(), conduction: zeros() }, { solar: SOLAR, nonSolar: NON_SOLAR }, { beam: 1, diffuse: 1, conduction: 0.46 }, true);
    expect(load.beam[10]).toBeCloseTo(700, 12);
    expect(load.beam[11]).toBeCloseTo(200, 12);
  });

  test('conduction: convective share now, radiant share through the non-solar series (hand check)', () => {
    const conduction = zeros();
    conduction[15] = 200;
    const load = windowCoolingLoad({ beam: zeros(), diffuse: zeros(), conduction }, { solar: SOLAR, nonSolar: NON_SOLAR }, { beam: 1, diffuse: 1, conduction: 0.46 }, false);
    expect(load.conduction[15]).toBeCloseTo(0.54 * 200 + 0.46 * 0.7 * 200, 12);
    expect(load.conduction[16]).toBeCloseTo(0.46 * 0.2 * 200, 12);
  });

  test('the 24-hour total of the load equals that of the gain (Σ r = 1)', () => {
    const beam = Array.from({ length: 24 }, (_, h) => (h > 6 && h < 18 ? 400 * Math.sin(((h - 6) / 12) * Math.PI) : 0));
    const diffuse = beam.map((b) => b / 4);
    const conduction = Array.from({ length: 24 }, (_, h) => 50 * Math.cos(((h - 15) / 24) * 2 * Math.PI));
    const room = illustrativeRadiantTimeSeries('heavy');
    const load = windowCoolingLoad({ beam, diffuse, conduction }, room, { beam: 1, diffuse: 0.9, conduction: 0.46 }, false);
    const sum = (xs: ArrayLike<number>) => Array.from(xs).reduce((a, b) => a + b, 0);
    expect(sum(load.total)).toBeCloseTo(sum(beam) + sum(diffuse) + sum(conduction), 8);
  });

  test('bad series and fractions are refused by name', () => {
    const g = { beam: zeros(), diffuse: zeros(), conduction: zeros() };
    expectArgumentError(() => windowCoolingLoad(g, { solar: SOLAR.map((x) => x * 1.5), nonSolar: NON_SOLAR }, { beam: 1, diffuse: 1, conduction: 0.5 }, false), 'solarFactors');
    expectArgumentError(() => windowCoolingLoad(g, { solar: SOLAR, nonSolar: NON_SOLAR.slice(1) }, { beam: 1, diffuse: 1, conduction: 0.5 }, false), 'nonSolarFactors');
    expectArgumentError(() => windowCoolingLoad(g, { solar: SOLAR, nonSolar: NON_SOLAR }, { beam: 1.2, diffuse: 1, conduction: 0.5 }, false), 'radiantFractionBeam');
    expectArgumentError(() => windowCoolingLoad(g, { solar: SOLAR, nonSolar: NON_SOLAR }, { beam: 1, diffuse: 1, conduction: -0.1 }, false), 'radiantFractionConduction');
  });
});

describe('illustrative series (our first-order room model)', () => {
  test('each sums to 1 and falls hour by hour; heavier construction holds more back', () => {
    for (const c of ['light', 'medium', 'heavy']) {
      const { solar, nonSolar, source } = illustrativeRadiantTimeSeries(c);
      expect(source).toMatch(/illustrative/);
      for (const r of [solar, nonSolar]) {
        expect(Array.from(r).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
        for (let k = 1; k < 24; k++) expect(r[k]).toBeLessThanOrEqual(r[k - 1]);
      }
      expect(solar[0]).toBeLessThan(nonSolar[0]);
    }
    expect(illustrativeRadiantTimeSeries('heavy').nonSolar[0]).toBeLessThan(illustrativeRadiantTimeSeries('light').nonSolar[0]);
  });

  test('the model written out: f0 = 0.4, τ = 4 h gives r0 = 0.4 + 0.6 (1 − e^−0.25) / (1 − e^−6)', () => {
    const r = firstOrderRadiantTimeSeries(0.4, 4);
    expect(r[0]).toBeCloseTo(0.4 + (0.6 * (1 - Math.exp(-0.25))) / (1 - Math.exp(-6)), 14);
    expect(r[5]).toBeCloseTo((0.6 * (Math.exp(-5 / 4) - Math.exp(-6 / 4))) / (1 - Math.exp(-6)), 14);
  });

  test('an unknown construction is refused listing the accepted ones', () => {
    expect(() => illustrativeRadiantTimeSeries('concrete')).toThrow('construction = "concrete" is not allowed: must be one of "light", "medium", "heavy"');
  });
});

describe('conduction and load through the design days and the year', () => {
  const spec = baseSpec({
    surfaceAzimuth: 270,
    indoorTemperature: 24,
    glazing: { shgc: 0.4, panes: 2, type: 'coated', typeParameter: 4, uValue: 1.6 },
    weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [33], dailyRange: [11] },
  });

  test('conduction is U × rough opening × (outdoor − indoor), outdoor by the fractions of daily range (hand check at 15:00 and 05:00)', () => {
    const july = designDayPeaks(spec)[6];
    // 1.6 W/(m²·K) × 2 × 1.5 m² = 4.8 W/K; hour ending 15: fraction 0 → 33 °C; hour ending 5: fraction 1 → 22 °C.
    expect(july.hourlyDryBulb[14]).toBeCloseTo(33, 12);
    expect(july.hourlyConduction[14]).toBeCloseTo(4.8 * (33 - 24), 12);
    expect(july.hourlyDryBulb[4]).toBeCloseTo(22, 12);
    expect(july.hourlyConduction[4]).toBeCloseTo(4.8 * (22 - 24), 12);
  });

  test('design-day cooling load uses both series and keeps the day total of solar + conduction gain', () => {
    const months = designDayPeaks(spec, { room: illustrativeRadiantTimeSeries('medium') });
    for (const m of months) {
      const gains = m.hourlyGain.reduce((a, b) => a + b, 0) + m.hourlyConduction.reduce((a, b) => a + b, 0);
      expect(m.coolingLoad!.reduce((a, b) => a + b, 0)).toBeCloseTo(gains, 6);
    }
  });

  test('the year: conduction column and cooling load agree with the design-day path on the 21st of July', () => {
    const s = annualSeries(spec);
    const i = (31 + 28 + 31 + 30 + 31 + 30 + 20) * 24 + 14;
    expect(s.dryBulb[i]).toBeCloseTo(33, 12);
    expect(s.conduction[i]).toBeCloseTo(4.8 * 9, 12);
    const load = annualCoolingLoad(s, illustrativeRadiantTimeSeries('light'));
    expect(load.length).toBe(8760);
    const sum = (xs: ArrayLike<number>) => Array.from(xs).reduce((a, b) => a + b, 0);
    expect(sum(load)).toBeCloseTo(sum(s.gain) + sum(s.conduction), 3);
  });

  test('U-value without indoor temperature or outdoor dry-bulb is refused by name', () => {
    expectArgumentError(() => annualSeries({ ...spec, indoorTemperature: undefined }), 'indoorTemperature');
    expectArgumentError(() => annualSeries({ ...spec, weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3] } }), 'weather.dryBulbMax');
    expectArgumentError(() => annualSeries({ ...spec, glazing: { ...spec.glazing, uValue: -1 } }), 'glazing.uValue');
  });

  test('a whole-window SHGC applies to the rough opening, a centre-of-glass one to the glass area', () => {
    const cog = annualSeries(baseSpec());
    const ww = annualSeries(baseSpec({ glazing: { shgc: 0.6, panes: 2, shgcBasis: 'wholeWindow' } }));
    const sum = (xs: ArrayLike<number>) => Array.from(xs).reduce((a, b) => a + b, 0);
    expect(sum(ww.gain) / sum(cog.gain)).toBeCloseTo(1 / 0.9, 9); // frame fraction 0.1 is not subtracted again
  });
});
