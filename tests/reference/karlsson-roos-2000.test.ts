/**
 * Outside source: Karlsson, J. & Roos, A. (2000), "Modelling the angular behaviour of the total
 * solar energy transmittance of windows", Solar Energy 69(4), 321–329 — the normalised angular
 * model g(θ)/g(0) = 1 − a z^α − b z^β − c z^γ, z = θ/90°, a = 8, b = 0.25/q, c = 1 − a − b,
 * α = 5.2 + 0.7q, β = 2, γ = (5.26 + 0.06p) + (0.73 + 0.04p)q (p panes, q glazing-type parameter).
 *
 * The checks are the published formula evaluated by hand at stated points (arithmetic written out)
 * and its own properties (1 at 0°, 0 at 90°, falling with angle). The paper's table of q by
 * glazing type and its figures of measured units could not be read through this project's search,
 * so no comparison with the paper's measured low-e curve is made here (see docs/methods.md).
 */
import { karlssonRoosFactor, karlssonRoosModel } from '../../src/core/glazing/karlssonRoos';
import { diffuseShgcOfType, shgcAtAngleOfType, shgcCurve } from '../../src/core/glazing/shgc';
import { expectArgumentError } from '../support/expectError';

describe('Karlsson & Roos (2000) angular model for coated glazing', () => {
  test('q = 4, p = 2 at 60°: 0.874389 (the formula written out, 1e-6)', () => {
    // z = 2/3; α = 8, b = 0.0625, c = −7.0625, γ = 5.38 + 0.81·4 = 8.62
    // 1 − 8 (2/3)^8 − 0.0625 (2/3)^2 + 7.0625 (2/3)^8.62
    const z = 2 / 3;
    const expected = 1 - 8 * z ** 8 - 0.0625 * z ** 2 + 7.0625 * z ** 8.62;
    expect(expected).toBeCloseTo(0.874389, 6);
    expect(karlssonRoosFactor(60, 2, 4)).toBeCloseTo(expected, 12);
  });

  test('q = 6, p = 3 at 75°: the published constants give 0.560295 (the formula written out, 1e-6)', () => {
    // z = 5/6; α = 9.4, b = 0.041667, c = −7.041667, γ = (5.26 + 0.18) + (0.73 + 0.12)·6 = 10.54
    const z = 5 / 6;
    const b = 0.25 / 6;
    const expected = 1 - 8 * z ** 9.4 - b * z ** 2 - (1 - 8 - b) * z ** 10.54;
    expect(karlssonRoosFactor(75, 3, 6)).toBeCloseTo(expected, 12);
    expect(expected).toBeCloseTo(0.560295, 6);
  });

  test('the factor is 1 at normal incidence, 0 at 90° and never rises with angle (p 1…4, q 1…10)', () => {
    for (let p = 1; p <= 4; p++) {
      for (let q = 1; q <= 10; q += 0.5) {
        const m = karlssonRoosModel(p, q);
        expect(m(0)).toBe(1);
        expect(m(90)).toBe(0);
        let prev = 1;
        for (let t = 0; t <= 90; t += 0.5) {
          const v = m(t);
          expect(v).toBeLessThanOrEqual(prev + 1e-12);
          prev = v;
        }
      }
    }
  });

  test('a larger q keeps the transmittance up to higher angles (the parameter\'s stated role)', () => {
    expect(karlssonRoosFactor(60, 2, 8)).toBeGreaterThan(karlssonRoosFactor(60, 2, 4));
    expect(karlssonRoosFactor(60, 2, 4)).toBeGreaterThan(karlssonRoosFactor(60, 2, 2));
  });

  test('a coated glazing scales the factor by its normal SHGC, in the lookup and in the prepared curve', () => {
    expect(shgcAtAngleOfType(0.4, 2, 60, 'coated', 4)).toBeCloseTo(0.4 * karlssonRoosFactor(60, 2, 4), 12);
    const curve = shgcCurve({ shgc: 0.4, panes: 2, type: 'coated', typeParameter: 4 });
    expect(curve.atAngle(60)).toBeCloseTo(0.4 * karlssonRoosFactor(60, 2, 4), 5);
    expect(curve.diffuse).toBeCloseTo(diffuseShgcOfType(0.4, 2, 'coated', 4), 12);
    expect(curve.diffuse).toBeLessThan(0.4);
  });

  test('at 60° a coated double unit of SHGC 0.4 (q = 4) keeps more of its SHGC than the same SHGC modelled as absorbing clear panes', () => {
    // The issue this model answers: attributing a low SHGC to absorption bends the curve down too fast.
    const coated = shgcAtAngleOfType(0.4, 2, 60, 'coated', 4) / 0.4;
    const absorbing = shgcAtAngleOfType(0.4, 2, 60, 'clear') / 0.4;
    expect(coated).toBeGreaterThan(absorbing);
  });

  test('an unknown glazing type is refused listing the accepted ones; a coated unit needs q', () => {
    expect(() => shgcAtAngleOfType(0.4, 2, 30, 'lowe')).toThrow('glazingType = "lowe" is not allowed: must be one of "clear", "tinted", "coated", "table"');
    expectArgumentError(() => shgcAtAngleOfType(0.4, 2, 30, 'coated'), 'glazingTypeParameter');
    expectArgumentError(() => shgcAtAngleOfType(0.4, 2, 30, 'coated', 11), 'glazingTypeParameter');
    expectArgumentError(() => shgcCurve({ shgc: 0.4, panes: 2, type: 'coated' }), 'glazing.typeParameter');
    expectArgumentError(() => shgcCurve({ shgc: 0.4, panes: 2, type: 'frosted' as never }), 'glazing.type');
  });
});
