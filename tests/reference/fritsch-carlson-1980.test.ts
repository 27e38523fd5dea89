/**
 * Source: Fritsch, F. N. & Carlson, R. E. (1980), "Monotone piecewise cubic interpolation", SIAM J.
 * Numer. Anal. 17(2), 238–246: the theorem that the interpolant is monotone on monotone data when
 * (α, β) lie in the region of monotonicity (the circle α² + β² ≤ 9 used here lies within it), and
 * their test data set "RPN 14" (from memory):
 * x = 7.99, 8.09, 8.19, 8.7, 9.2, 10, 12, 15, 20;
 * y = 0, 2.76429e-5, 4.37498e-2, 0.169183, 0.469428, 0.943740, 0.998636, 0.999919, 0.999994.
 * A cubic Hermite interpolant reproduces straight lines exactly (its secants and tangents coincide).
 */
import { monotoneCubic } from '../../src/core/common/monotoneCubic';
import { closeToDigits, Mismatches } from '../support/mismatches';

const X = [7.99, 8.09, 8.19, 8.7, 9.2, 10, 12, 15, 20];
const Y = [0, 2.76429e-5, 4.37498e-2, 0.169183, 0.469428, 0.94374, 0.998636, 0.999919, 0.999994];

describe('Fritsch–Carlson monotone cubic interpolation', () => {
  test('passes through the data points of RPN 14 (1e-15)', () => {
    const f = monotoneCubic(X, Y);
    X.forEach((x, k) => expect(f.at(x)).toBeCloseTo(Y[k], 15));
  });

  test('is monotone non-decreasing and within [0, 1] over RPN 14, sampled every 0.001', () => {
    const f = monotoneCubic(X, Y);
    let previous = -Infinity;
    const found = new Mismatches();
    for (let x = 7.99; x <= 20; x += 0.001) {
      const v = f.at(x);
      found.check(v >= previous - 1e-15, () => `f(${x}) = ${v} below the value before it, ${previous}`);
      found.check(v >= 0 && v <= 1, () => `f(${x}) = ${v} outside 0…1`);
      previous = v;
    }
    expect(found.list).toEqual([]);
  });

  test('reproduces linear data exactly (1e-12)', () => {
    const f = monotoneCubic([0, 10, 25, 90], [0.8, 0.7, 0.55, -0.1]);
    const found = new Mismatches();
    for (let x = 0; x <= 90; x += 0.7) found.check(closeToDigits(f.at(x), 0.8 - 0.01 * x, 12), () => `f(${x}) = ${f.at(x)}, the line ${0.8 - 0.01 * x}`);
    expect(found.list).toEqual([]);
  });

  test('holds flat where two neighbouring values are equal', () => {
    const f = monotoneCubic([0, 30, 60, 90], [0.6, 0.6, 0.4, 0]);
    for (let x = 0; x <= 30; x += 0.5) expect(f.at(x)).toBeCloseTo(0.6, 12);
  });
});
