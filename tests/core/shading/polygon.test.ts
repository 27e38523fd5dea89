/**
 * Convex clipping and shadow-union kernel (src/core/shading/polygon.ts): areas checked against figures whose
 * areas follow from elementary geometry (triangle ½·base·height, rectangle, square of side s).
 * The general case is checked against polygon-clipping in tests/reference/polygon-clipping-union.test.ts.
 */
import fc from 'fast-check';
import { MAX_HALF_PLANES, clippedRectangleArea, rectangleStripArea, unionAreaInRectangle, writeQuadHalfPlanes } from '../../../src/core/shading/polygon';

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

describe('rectangleStripArea', () => {
  test('elementary figures: a diagonal cut leaves triangle ½, an axis strip a slab, a strip past the rectangle nothing', () => {
    // x + y ≤ 1 in the unit square: triangle of area ½; 0.5 ≤ x + y ≤ 1.5: 1 − 2 × ⅛ = ¾.
    expect(Math.abs(rectangleStripArea(0, 0, 1, 1, 1, 1, -5, 1) - 0.5)).toBeLessThan(TOL);
    expect(Math.abs(rectangleStripArea(0, 0, 1, 1, 1, 1, 0.5, 1.5) - 0.75)).toBeLessThan(TOL);
    // 0.5 ≤ y ≤ 0.75 (p = 0) in [0, 2] × [0, 1]: slab 2 × 0.25.
    expect(Math.abs(rectangleStripArea(0, 0, 2, 1, 0, 1, 0.5, 0.75) - 0.5)).toBeLessThan(TOL);
    // 1 ≤ x ≤ 3 (q = 0) with a negative coefficient: −3 ≤ −x ≤ −1 in [0, 2] × [0, 1]: 1 × 1.
    expect(Math.abs(rectangleStripArea(0, 0, 2, 1, -1, 0, -3, -1) - 1)).toBeLessThan(TOL);
    expect(rectangleStripArea(0, 0, 1, 1, 1, 1, 2, 3)).toBe(0);
    expect(rectangleStripArea(0, 0, 1, 1, 1, 1, 1, 1)).toBe(0);
    expect(rectangleStripArea(1, 0, 1, 1, 1, 1, -9, 9)).toBe(0);
    // No bound: the whole rectangle; p = q = 0 with 0 inside the strip: the whole rectangle too.
    expect(rectangleStripArea(0, 0, 2, 3, 0.3, -0.7, -Infinity, Infinity)).toBe(6);
    expect(rectangleStripArea(0, 0, 2, 3, 0, 0, -1, 1)).toBe(6);
  });

  test('equals the convex clip of the rectangle by the two half-planes of the strip, over random rectangles, directions and strips', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 4, noNaN: true }),
        fc.double({ min: 0, max: 4, noNaN: true }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.oneof(fc.constantFrom(0, 1e-12, 1), fc.double({ min: 0, max: 1, noNaN: true })),
        fc.double({ min: -8, max: 8, noNaN: true }),
        fc.double({ min: 0, max: 8, noNaN: true }),
        (x0, y0, w, h, angle, scale, w0, width) => {
          // Directions along the axes are drawn as exact zeros, as shadows have them.
          const p = Math.abs(Math.cos(angle)) < 1e-3 ? 0 : scale * Math.cos(angle);
          const q = Math.abs(Math.sin(angle)) < 1e-3 ? 0 : scale * Math.sin(angle);
          const n = Math.hypot(p, q);
          const closed = rectangleStripArea(x0, y0, x0 + w, y0 + h, p, q, w0, w0 + width);
          let clipped: number;
          if (n === 0) clipped = w0 <= 0 && 0 <= w0 + width && width > 0 ? w * h : 0;
          else {
            const planes = new Float64Array([p / n, q / n, (w0 + width) / n, -p / n, -q / n, -w0 / n]);
            clipped = clippedRectangleArea(x0, y0, x0 + w, y0 + h, planes, [0], [2], 1);
          }
          expect(Math.abs(closed - clipped)).toBeLessThanOrEqual(1e-12 * Math.max(1, w * h));
        },
      ),
      { numRuns: 5000, seed: 21 },
    );
  });
});

describe('edges the first mutation run of polygon.ts found untested', () => {
  test('a quadrilateral with a repeated vertex is its triangle: area ½·base·height, wherever the repeat falls', () => {
    // Elementary geometry: the triangle (0,0), (2,0), (0,2) has area ½ · 2 · 2 = 2. The repeated vertex
    // gives an edge of length 0, whose half-plane must keep everything. The buffer starts full of
    // non-zero values, so a half-plane left partly unwritten would show.
    const triangles = [
      [0, 0, 2, 0, 0, 2, 0, 2], // repeat on the third edge
      [0, 0, 0, 0, 2, 0, 0, 2], // repeat on the first edge
    ];
    for (const t of triangles) {
      const planes = new Float64Array(36).fill(7);
      expect(writeQuadHalfPlanes(planes, 0, t[0], t[1], t[2], t[3], t[4], t[5], t[6], t[7])).toBe(true);
      expect(Math.abs(unionAreaInRectangle(-1, -1, 3, 3, planes, 1) - 2)).toBeLessThan(TOL);
    }
  });

  test('a rectangle given right to left or top to bottom is empty (x1 ≤ x0 or y1 ≤ y0 gives 0, as documented)', () => {
    expect(clippedRectangleArea(2, 0, 1, 1, new Float64Array(0), [], [], 0)).toBe(0);
    expect(clippedRectangleArea(0, 1, 1, 0, new Float64Array(0), [], [], 0)).toBe(0);
    expect(rectangleStripArea(2, 0, 1, 1, 1, 1, -9, 9)).toBe(0);
    expect(rectangleStripArea(0, 1, 1, 0, 1, 1, -9, 9)).toBe(0);
  });

  test('exactly MAX_HALF_PLANES half-planes are accepted; one more is refused, naming both counts', () => {
    // Clipping by the same half-plane again changes nothing (A ∩ A = A): 28 copies of x ≤ 0.5 leave
    // half of the unit square.
    const planes = new Float64Array(3 * (MAX_HALF_PLANES + 1));
    for (let k = 0; k < MAX_HALF_PLANES + 1; k++) planes.set([1, 0, 0.5], 3 * k);
    expect(Math.abs(clippedRectangleArea(0, 0, 1, 1, planes, [0], [MAX_HALF_PLANES], 1) - 0.5)).toBeLessThan(TOL);
    expect(() => clippedRectangleArea(0, 0, 1, 1, planes, [0], [MAX_HALF_PLANES + 1], 1)).toThrow(`${MAX_HALF_PLANES + 1} half-planes, at most ${MAX_HALF_PLANES}`);
  });

  test('the union takes 0 to 3 quadrilaterals; a count outside that is refused, naming it', () => {
    const planes = new Float64Array(48);
    expect(() => unionAreaInRectangle(0, 0, 1, 1, planes, 4)).toThrow('4 quadrilaterals, at most 3');
    expect(() => unionAreaInRectangle(0, 0, 1, 1, planes, -1)).toThrow(RangeError);
  });

  test('a rectangle away from the origin, wholly inside the shape, is wholly covered (covered area = its own area)', () => {
    // [−1, 1] × [−1, 1] inside the square [−2, 2]²: the covered part is the whole rectangle, 2 × 2 = 4.
    const planes = quads([-2, -2, 2, -2, 2, 2, -2, 2]);
    expect(Math.abs(unionAreaInRectangle(-1, -1, 1, 1, planes, 1) - 4)).toBeLessThan(TOL);
    // And [1, 3] × [1, 2] inside [0, 4] × [0, 4]: 2 × 1 = 2.
    const far = quads([0, 0, 4, 0, 4, 4, 0, 4]);
    expect(Math.abs(unionAreaInRectangle(1, 1, 3, 2, far, 1) - 2)).toBeLessThan(TOL);
  });
});
