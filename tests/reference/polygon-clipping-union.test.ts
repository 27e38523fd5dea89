/**
 * Source: polygon-clipping 0.15.7 (npm, pinned in package.json), a general polygon boolean-operation
 * library (Martínez–Rueda sweep line). Its `union` and `intersection` of the shadow quadrilaterals
 * with the lit rectangle, measured by the shoelace formula over the returned rings, must equal
 * Sunpane's inclusion–exclusion of convex clips (src/core/shading/polygon.ts `unionAreaInRectangle`).
 *
 * Both are exact up to floating-point rounding, so the tolerance is 1e-9 of the rectangle's area
 * (polygon-clipping rounds crossing points to ~1e-15 relative; our clips add a few ulps per step).
 */
import fc from 'fast-check';
import polygonClipping, { type MultiPolygon, type Polygon } from 'polygon-clipping';
import { unionAreaInRectangle, writeQuadHalfPlanes } from '../../src/core/shading/polygon';

function ringArea(ring: [number, number][]): number {
  let twice = 0;
  for (let i = 0; i < ring.length - 1; i++) twice += ring[i][0] * ring[i + 1][1] - ring[i + 1][0] * ring[i][1];
  return twice / 2;
}

function multiPolygonArea(mp: MultiPolygon): number {
  let area = 0;
  for (const poly of mp) {
    area += Math.abs(ringArea(poly[0] as [number, number][]));
    for (const hole of poly.slice(1)) area -= Math.abs(ringArea(hole as [number, number][]));
  }
  return area;
}

/** A random parallelogram: a corner, two edge vectors (like a shadow: one edge along an axis or not). */
const parallelogramArb = fc
  .tuple(
    fc.double({ min: -2, max: 3, noNaN: true }),
    fc.double({ min: -2, max: 3, noNaN: true }),
    fc.double({ min: -3, max: 3, noNaN: true }),
    fc.double({ min: -3, max: 3, noNaN: true }),
    fc.double({ min: -3, max: 3, noNaN: true }),
    fc.double({ min: -3, max: 3, noNaN: true }),
  )
  .filter(([, , ux, uy, vx, vy]) => Math.abs(ux * vy - uy * vx) > 1e-3)
  .map(([x, y, ux, uy, vx, vy]) => [
    [x, y],
    [x + ux, y + uy],
    [x + ux + vx, y + uy + vy],
    [x + vx, y + vy],
  ] as [number, number][]);

describe('the shadow union agrees with polygon-clipping 0.15.7', () => {
  test('for up to three random parallelograms clipped to a rectangle, within 1e-9 of its area', () => {
    fc.assert(
      fc.property(fc.array(parallelogramArb, { minLength: 0, maxLength: 3 }), fc.double({ min: 0.1, max: 2, noNaN: true }), fc.double({ min: 0.1, max: 2, noNaN: true }), (quads, w, h) => {
        const planes = new Float64Array(36);
        quads.forEach((q, i) => {
          expect(writeQuadHalfPlanes(planes, i * 4, q[0][0], q[0][1], q[1][0], q[1][1], q[2][0], q[2][1], q[3][0], q[3][1])).toBe(true);
        });
        const ours = unionAreaInRectangle(0, 0, w, h, planes, quads.length);
        const rect: Polygon = [[[0, 0], [w, 0], [w, h], [0, h], [0, 0]]];
        const theirs =
          quads.length === 0
            ? 0
            : multiPolygonArea(polygonClipping.intersection(rect, polygonClipping.union(...quads.map((q): Polygon => [[...q, q[0]]]) as [Polygon, ...Polygon[]])));
        expect(Math.abs(ours - theirs)).toBeLessThanOrEqual(1e-9 * w * h);
      }),
      { numRuns: 250, seed: 20261201 },
    );
  });
});
