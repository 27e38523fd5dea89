/**
 * Source: Abramowitz, M. & Stegun, I. A., Handbook of Mathematical Functions (1964), Table 25.4,
 * abscissae and weights of Gauss–Legendre quadrature: n = 2: ±0.577350269189626, weights 1;
 * n = 3: 0, ±0.774596669241483, weights 0.888888888888889 and 0.555555555555556.
 */
import { gaussLegendre } from '../../src/core/common/hemispherical';

describe('Gauss–Legendre nodes and weights', () => {
  test('two points: ±1/√3 with unit weights (1e-15)', () => {
    const { nodes, weights } = gaussLegendre(2);
    expect([...nodes].sort((a, b) => a - b)).toEqual([expect.closeTo(-0.577350269189626, 15), expect.closeTo(0.577350269189626, 15)]);
    expect(weights[0]).toBeCloseTo(1, 15);
    expect(weights[1]).toBeCloseTo(1, 15);
  });

  test('three points: 0 and ±0.774596669241483, weights 8/9 and 5/9 (1e-13)', () => {
    const { nodes, weights } = gaussLegendre(3);
    const pairs = [...nodes].map((x, i) => [x, weights[i]]).sort((a, b) => a[0] - b[0]);
    expect(pairs[0][0]).toBeCloseTo(-0.774596669241483, 15);
    expect(pairs[1][0]).toBeCloseTo(0, 15);
    expect(pairs[2][0]).toBeCloseTo(0.774596669241483, 15);
    expect(pairs[0][1]).toBeCloseTo(0.555555555555556, 13);
    expect(pairs[1][1]).toBeCloseTo(0.888888888888889, 13);
  });

  test('ten points integrate x^18 over [−1, 1] to 2/19 (1e-13)', () => {
    const { nodes, weights } = gaussLegendre(10);
    let s = 0;
    nodes.forEach((x, i) => (s += weights[i] * x ** 18));
    expect(s).toBeCloseTo(2 / 19, 13);
  });
});
