/**
 * The Fritsch–Carlson interpolant at the edges of floating point (the published method's own
 * property: on data that rise or fall it stays between its neighbours; Fritsch & Carlson (1980),
 * SIAM J. Numer. Anal. 17(2) — the worked data set is in tests/reference/fritsch-carlson-1980.test.ts).
 */
import { monotoneCubic } from '../../../src/core/common/monotoneCubic';
import { Mismatches } from '../../support/mismatches';

describe('monotone cubic with secants of very different size', () => {
  // Found by the registry fuzz (SHGCDIFFUSELOOKUP): a secant of 1e-320 beside one of 0.3 made
  // α = m/Δ overflow to Infinity and the limited tangent 0 × Infinity = NaN.
  const xs = [1.26, 11.16, 20.55, 39.69, 42.69, 44.03, 81.74];
  const ys = [7e-323, 5e-323, 1.2995711325944498e-292, 6e-323, 7e-323, 1, 7e-323];

  test('every value is finite and between the neighbouring data where the data are monotone', () => {
    const f = monotoneCubic(xs, ys);
    const found = new Mismatches();
    for (let x = 0; x <= 90; x += 0.01) {
      const v = f.at(x);
      found.check(Number.isFinite(v) && v >= 0 && v <= 1, () => `f(${x}) = ${v}, not a finite number in 0…1`);
    }
    expect(found.list).toEqual([]);
    // between 42.69 and 44.03 the data rise from 7e-323 to 1: the interpolant rises too
    let prev = -1;
    const falling = new Mismatches();
    for (let x = 42.69; x <= 44.03; x += 0.01) {
      const v = f.at(x);
      falling.check(v >= prev, () => `f(${x}) = ${v} below the value before it, ${prev}`);
      prev = v;
    }
    expect(falling.list).toEqual([]);
  });

  test('the tangent limit is unchanged on ordinary data (α² + β² > 9 scaled back onto the circle of radius 3)', () => {
    // Δ = 1 on [0,1], then a steep rise: without the limit m0 = 1, m1 = (1 + 10)/2 = 5.5, α² + β² = 31.25 > 9
    const f = monotoneCubic([0, 1, 2], [0, 1, 11]);
    const tau = 3 / Math.sqrt(1 + 5.5 * 5.5);
    const m0 = tau * 1;
    const m1 = tau * 5.5;
    const t = 0.5;
    const expected = (t ** 3 - 2 * t ** 2 + t) * m0 + (-2 * t ** 3 + 3 * t ** 2) * 1 + (t ** 3 - t ** 2) * m1;
    expect(f.at(0.5)).toBeCloseTo(expected, 12);
  });
});
