/**
 * Convex clipping and shadow-union kernel (src/core/polygon.ts): areas checked against figures whose
 * areas follow from elementary geometry (triangle ½·base·height, rectangle, square of side s).
 * The general case is checked against polygon-clipping in tests/reference/polygon-clipping-union.test.ts.
 */
import { MAX_HALF_PLANES, clippedRectangleArea, unionAreaInRectangle, writeQuadHalfPlanes } from '../../src/core/polygon';

const TOL = 1e-12;

function quads(...qs: number[][]): Float64Array {
  const planes = new Float64Array(36);
  qs.forEach((q, i) => expect(writeQuadHalfPlanes(planes, i * 4, q[0], q[1], q[2], q[3], q[4], q[5], q[6], q[7])).toBe(true));
  return planes;
}

describe('clippedRectangleArea', () => {
  test('a rectangle cut by the diagonal half-plane x + y ≤ 1 keeps a triangle of area ½', () => {
    const s = Math.SQRT1_2;
    const planes = new Float64Array([s, s, s]);
    expect(clippedRectangleArea(0, 0, 2, 1, planes, [0], [1], 1)).toBeCloseTo(0.5, 12);
  });

  test('a half-plane that keeps everything leaves the whole rectangle, one that keeps nothing leaves 0', () => {
    expect(clippedRectangleArea(0, 0, 2, 3, new Float64Array([1, 0, 5]), [0], [1], 1)).toBeCloseTo(6, 12);
    expect(clippedRectangleArea(0, 0, 2, 3, new Float64Array([1, 0, -1]), [0], [1], 1)).toBe(0);
  });

  test('an empty rectangle has area 0', () => {
    expect(clippedRectangleArea(1, 0, 1, 3, new Float64Array(0), [], [], 0)).toBe(0);
    expect(clippedRectangleArea(0, 2, 1, 1, new Float64Array(0), [], [], 0)).toBe(0);
  });

  test('more half-planes than the buffers hold is a programming error, not a wrong area', () => {
    const n = MAX_HALF_PLANES + 1;
    expect(() => clippedRectangleArea(0, 0, 1, 1, new Float64Array(3 * n), [0], [n], 1)).toThrow(RangeError);
  });
});

describe('writeQuadHalfPlanes', () => {
  test('a quadrilateral with no area is refused so the caller drops it', () => {
    expect(writeQuadHalfPlanes(new Float64Array(12), 0, 0, 0, 1, 0, 2, 0, 3, 0)).toBe(false);
  });

  test('vertex order does not matter: clockwise and counter-clockwise give the same area', () => {
    const ccw = quads([0.2, 0.2, 0.8, 0.2, 0.8, 0.6, 0.2, 0.6]);
    const cw = quads([0.2, 0.2, 0.2, 0.6, 0.8, 0.6, 0.8, 0.2]);
    expect(unionAreaInRectangle(0, 0, 1, 1, ccw, 1)).toBeCloseTo(0.24, 12);
    expect(unionAreaInRectangle(0, 0, 1, 1, cw, 1)).toBeCloseTo(0.24, 12);
  });
});

describe('unionAreaInRectangle', () => {
  test('a square rotated 45° inside the rectangle covers side² = 2 × (½ diagonal)²', () => {
    const planes = quads([2, 1, 3, 2, 2, 3, 1, 2]);
    expect(Math.abs(unionAreaInRectangle(0, 0, 4, 4, planes, 1) - 2)).toBeLessThan(TOL);
  });

  test('two overlapping squares count their overlap once (1 + 1 − ¼)', () => {
    const planes = quads([0, 0, 1, 0, 1, 1, 0, 1], [0.5, 0.5, 1.5, 0.5, 1.5, 1.5, 0.5, 1.5]);
    expect(Math.abs(unionAreaInRectangle(-1, -1, 3, 3, planes, 2) - 1.75)).toBeLessThan(TOL);
  });

  test('three squares with a common corner region follow inclusion–exclusion exactly', () => {
    // Unit squares at (0,0), (0.5,0), (0.25,0.5): squares 1 ∪ 2 = [0, 1.5] × [0, 1], area 1.5; square 3
    // adds only its part above y = 1, 1 × 0.5 — total 2.
    const planes = quads([0, 0, 1, 0, 1, 1, 0, 1], [0.5, 0, 1.5, 0, 1.5, 1, 0.5, 1], [0.25, 0.5, 1.25, 0.5, 1.25, 1.5, 0.25, 1.5]);
    expect(Math.abs(unionAreaInRectangle(-1, -1, 3, 3, planes, 3) - 2)).toBeLessThan(TOL);
  });

  test('a shape reaching far outside is clipped to the rectangle', () => {
    const planes = quads([-1e9, -1e9, 1e9, -1e9, 1e9, 0.25, -1e9, 0.25]);
    expect(unionAreaInRectangle(0, 0, 2, 1, planes, 1)).toBeCloseTo(0.5, 6);
  });

  test('no shapes cover nothing', () => {
    expect(unionAreaInRectangle(0, 0, 2, 1, new Float64Array(36), 0)).toBe(0);
  });
});
