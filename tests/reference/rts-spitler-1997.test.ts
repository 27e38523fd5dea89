/**
 * Outside source: Spitler, J. D., Fisher, D. E. & Pedersen, C. O. (1997), "The Radiant Time Series
 * Cooling Load Calculation Procedure", ASHRAE Transactions 103(2) — the RTS equation
 * Q_θ = Σ_{i=0..23} r_i q_{θ−i} over a periodic 24-hour design day with Σ r_i = 1, and the split of
 * each hour's gain into a convective part (load in the same hour) and a radiant part (load through
 * the series). The paper's structural properties are checked here: a constant gain gives an equal
 * constant load; a unit radiant impulse gives back the factor series; the 24-hour total is kept.
 * The factor lists below are test inputs chosen for the checks (not published tables; Sunpane ships
 * none), so only the method is being checked against the source.
 */
import { SunpaneError } from '../../src/core/common/errors';
import { coolingLoad, radiantToCoolingLoad, requireRadiantTimeFactors } from '../../src/core/load/rts';
import { peakOfDay } from '../../src/core/gain/designDay';

/** A decaying series that sums to exactly 1 (geometric, renormalised). */
function decayingFactors(ratio: number): number[] {
  const raw = Array.from({ length: 24 }, (_, i) => ratio ** i);
  const s = raw.reduce((a, b) => a + b, 0);
  return raw.map((v) => v / s);
}

const FACTORS = decayingFactors(0.6);
const FRONT_LOADED = [0.5, 0.3, 0.2, ...new Array(21).fill(0)];

describe('radiant time series (Spitler, Fisher & Pedersen 1997)', () => {
  test('a constant gain gives a load equal to the gain in every hour', () => {
    const gains = new Array(24).fill(750);
    for (const fr of [0, 0.4, 1]) {
      const load = coolingLoad(gains, FACTORS, fr);
      for (const q of load) expect(q).toBeCloseTo(750, 9);
    }
  });

  test('a unit radiant impulse at hour 5 gives back the factor series shifted to hour 5', () => {
    const impulse = new Array(24).fill(0);
    impulse[5] = 1;
    const load = radiantToCoolingLoad(impulse, FACTORS);
    for (let i = 0; i < 24; i++) expect(load[(5 + i) % 24]).toBeCloseTo(FACTORS[i], 12);
  });

  test('the 24-hour total of the load equals the 24-hour total of the gain', () => {
    const gains = Array.from({ length: 24 }, (_, h) => (h >= 6 && h <= 18 ? 1000 * Math.sin(((h - 6) / 12) * Math.PI) : 0));
    const load = coolingLoad(gains, FACTORS, 0.7);
    const total = (xs: ArrayLike<number>) => Array.from(xs).reduce((a, b) => a + b, 0);
    expect(total(load)).toBeCloseTo(total(gains), 8);
  });

  test('the radiant part is delayed: a front-loaded series worked by hand', () => {
    // gains: 1000 W in hour 10 only, radiant fraction 0.6, factors 0.5 / 0.3 / 0.2.
    // hour 10: convective 0.4·1000 = 400, radiant 0.5·0.6·1000 = 300 → 700 W
    // hour 11: 0.3·600 = 180 W; hour 12: 0.2·600 = 120 W; all other hours 0.
    const gains = new Array(24).fill(0);
    gains[10] = 1000;
    const load = coolingLoad(gains, FRONT_LOADED, 0.6);
    expect(load[10]).toBeCloseTo(700, 10);
    expect(load[11]).toBeCloseTo(180, 10);
    expect(load[12]).toBeCloseTo(120, 10);
    expect(load[9]).toBe(0);
    expect(load[13]).toBe(0);
  });

  test('gain late in the day wraps round to the early hours of the periodic day', () => {
    const gains = new Array(24).fill(0);
    gains[23] = 100;
    const load = radiantToCoolingLoad(gains, FRONT_LOADED);
    expect(load[23]).toBeCloseTo(50, 10);
    expect(load[0]).toBeCloseTo(30, 10);
    expect(load[1]).toBeCloseTo(20, 10);
  });

  test('with radiant fraction 0 the load is the gain itself', () => {
    const gains = Array.from({ length: 24 }, (_, h) => h * 10);
    expect(Array.from(coolingLoad(gains, FACTORS, 0))).toEqual(gains);
  });

  test('the peak of a load is at or after the peak of its gain (radiant delay)', () => {
    const gains = Array.from({ length: 24 }, (_, h) => (h >= 6 && h <= 18 ? 1000 * Math.sin(((h - 6) / 12) * Math.PI) : 0));
    const gainPeak = peakOfDay(gains);
    const loadPeak = peakOfDay(coolingLoad(gains, FACTORS, 1));
    expect(loadPeak.index).toBeGreaterThanOrEqual(gainPeak.index);
    expect(loadPeak.value).toBeLessThan(gainPeak.value);
  });

  test('factors summing to 1 within 0.01 are accepted and used as given', () => {
    const f = [...FRONT_LOADED];
    f[0] = 0.505;
    expect(requireRadiantTimeFactors(f)[0]).toBe(0.505);
  });

  test('factors not summing to 1 are refused naming the factors', () => {
    const f = [...FRONT_LOADED];
    f[0] = 0.6;
    expect(() => coolingLoad(new Array(24).fill(1), f, 0.5)).toThrow(SunpaneError);
    expect(() => coolingLoad(new Array(24).fill(1), f, 0.5)).toThrow(/^factors = a list of 24 is not allowed: the 24 radiant time factors must sum to 1 ± 0\.01 \(they sum to 1\.1\)/);
  });

  test('wrong counts, negative factors and a bad radiant fraction are refused by name', () => {
    expect(() => coolingLoad(new Array(23).fill(1), FACTORS, 0.5)).toThrow(/^gains = a list of 23/);
    expect(() => coolingLoad(new Array(24).fill(1), FACTORS.slice(0, 20), 0.5)).toThrow(/^factors = a list of 20/);
    const neg = [...FRONT_LOADED];
    neg[3] = -0.1;
    expect(() => coolingLoad(new Array(24).fill(1), neg, 0.5)).toThrow(/^factors\[3\] = -0\.1/);
    expect(() => coolingLoad(new Array(24).fill(1), FACTORS, 1.5)).toThrow(/^radiantFraction = 1\.5/);
    const nan = new Array(24).fill(1);
    nan[7] = Number.NaN;
    expect(() => coolingLoad(nan, FACTORS, 0.5)).toThrow(/^gains\[7\] = NaN/);
  });
});
