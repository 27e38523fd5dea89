/**
 * Curves of whole glazings (src/core/glazing/shgc.ts): each coated unit keeps its own Karlsson–Roos
 * curve, an angle table that already ends at 90° is used as given, and the SHGC basis check names its
 * argument.
 *
 * Sources named beside each check:
 * - Karlsson, J. & Roos, A. (2000), "Modelling the angular behaviour of the total solar energy
 *   transmittance of windows", Solar Energy 69(4), 321–329: g(θ)/g(0) = 1 − a z^α − b z^β − c z^γ,
 *   z = θ/90°, a = 8, b = 0.25/q, c = 1 − a − b, α = 5.2 + 0.7q, β = 2,
 *   γ = (5.26 + 0.06p) + (0.73 + 0.04p)q — written out below as in tests/reference/karlsson-roos-2000.test.ts;
 * - Fritsch, F. N. & Carlson, R. E. (1980), "Monotone piecewise cubic interpolation", SIAM J. Numer.
 *   Anal. 17(2): the interpolant of monotone data passes through the knots and stays between
 *   neighbouring knot values (their monotonicity result);
 * - the error convention of docs/architecture.md ("The one error type").
 */
import { requireShgcBasis, shgcCurve, shgcFromTable } from '../../../src/core/glazing/shgc';
import { SunpaneError } from '../../../src/core/common/errors';

/** Karlsson & Roos (2000), the published formula written out. */
function krFactor(thetaDeg: number, p: number, q: number): number {
  const z = thetaDeg / 90;
  const b = 0.25 / q;
  const c = 1 - 8 - b;
  return 1 - 8 * z ** (5.2 + 0.7 * q) - b * z ** 2 - c * z ** (5.26 + 0.06 * p + (0.73 + 0.04 * p) * q);
}

describe('coated units', () => {
  test('two coated units alike but for their glazing-type parameter each follow their own curve', () => {
    // q = 4, p = 2 at 60°: 0.874389 (Karlsson & Roos's formula by hand, as in the reference test).
    expect(krFactor(60, 2, 4)).toBeCloseTo(0.874389, 6);
    const soft = shgcCurve({ shgc: 0.613, panes: 2, type: 'coated', typeParameter: 4 });
    const hard = shgcCurve({ shgc: 0.613, panes: 2, type: 'coated', typeParameter: 9 });
    for (const theta of [30, 60, 75]) {
      expect(soft.atAngle(theta)).toBeCloseTo(0.613 * krFactor(theta, 2, 4), 9);
      expect(hard.atAngle(theta)).toBeCloseTo(0.613 * krFactor(theta, 2, 9), 9);
    }
    // The two parameters give visibly different curves at 75° (0.613 × 0.56 against 0.613 × 0.70, about).
    expect(Math.abs(soft.atAngle(75) - hard.atAngle(75))).toBeGreaterThan(0.05);
    // Asked again in the other order, each unit still gets its own curve.
    expect(shgcCurve({ shgc: 0.613, panes: 2, type: 'coated', typeParameter: 4 }).atAngle(75)).toBeCloseTo(0.613 * krFactor(75, 2, 4), 9);
  });
});

describe('angle tables', () => {
  test('a table that ends at 90° is interpolated as given: through its knots, monotone between them', () => {
    const table = { angles: [0, 45, 90], values: [0.5, 0.4, 0.1] };
    const curve = shgcCurve({ shgc: 0.5, panes: 2, angleTable: table });
    expect(curve.atAngle(45)).toBeCloseTo(0.4, 9);
    for (const theta of [50, 60, 70, 80, 89]) {
      const v = shgcFromTable(table, theta);
      // Fritsch & Carlson (1980): between the knots 0.4 (45°) and 0.1 (90°), falling.
      expect(v).toBeLessThanOrEqual(0.4);
      expect(v).toBeGreaterThanOrEqual(0.1);
      expect(curve.atAngle(theta)).toBeCloseTo(v, 4);
    }
    expect(shgcFromTable(table, 60)).toBeGreaterThan(shgcFromTable(table, 80));
    expect(Number.isFinite(curve.diffuse)).toBe(true);
    expect(curve.diffuse).toBeGreaterThan(0.1);
    expect(curve.diffuse).toBeLessThan(0.5);
  });
});

describe('incidence range of a curve', () => {
  test('0…180 ° is taken (90° and beyond give 0); just past 180° is refused naming incidence, with the range', () => {
    const curve = shgcCurve({ shgc: 0.55, panes: 1 });
    expect(curve.atAngle(180)).toBe(0);
    expect(curve.atAngle(0)).toBe(curve.normal);
    let caught: unknown;
    try {
      curve.atAngle(180.5);
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(SunpaneError);
    expect((caught as SunpaneError).message).toBe('incidence = 180.5 is not allowed: must be a number from 0 to 180 °');
  });
});

describe('SHGC basis', () => {
  test('called on its own, the check names shgcBasis and lists the two bases', () => {
    let caught: unknown;
    try {
      requireShgcBasis('frame');
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(SunpaneError);
    expect((caught as SunpaneError).message).toBe('shgcBasis = "frame" is not allowed: must be one of "centreOfGlass", "wholeWindow"');
    expect(requireShgcBasis('wholeWindow')).toBe('wholeWindow');
  });
});
