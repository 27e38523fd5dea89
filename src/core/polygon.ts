/**
 * Exact area of the intersection of an axis-aligned rectangle with convex polygons given as
 * half-planes — the geometric kernel of the shadow union in {@link ./shading}.
 *
 * Method: Sutherland–Hodgman clipping of a convex polygon by one half-plane at a time (Sutherland &
 * Hodgman, "Reentrant polygon clipping", Communications of the ACM 17(1), 1974); clipping a convex
 * polygon by a half-plane keeps it convex, so clipping the rectangle by every half-plane of several
 * convex polygons gives their exact common part. The area is the shoelace formula. All work happens
 * in two preallocated vertex buffers: nothing is allocated per call.
 *
 * A polygon of at most {@link MAX_HALF_PLANES} half-planes is clipped; each half-plane adds at most
 * one vertex, so the buffers hold 4 + MAX_HALF_PLANES vertices.
 */

/** The most half-planes one clip may apply (three shadow parallelograms × 4 edges, with room to spare). */
export const MAX_HALF_PLANES = 28;

const MAX_VERTICES = 4 + MAX_HALF_PLANES;
const bufA = new Float64Array(2 * MAX_VERTICES);
const bufB = new Float64Array(2 * MAX_VERTICES);

/**
 * Writes the half-plane form (one per edge) of the convex quadrilateral (x0,y0)…(x3,y3) into
 * `out` at triple index `at` (4 triples), normalised so that (A, B) is a unit outward normal.
 * The vertices may run either way round; returns false (and writes nothing useful) when the
 * quadrilateral has no area, so the caller can drop it.
 *
 * @remarks Edge from Vi to Vi+1 with direction (dx, dy), counter-clockwise order: a point p is
 * inside when the cross product d × (p − Vi) ≥ 0, i.e. dy·px − dx·py ≤ dy·Vix − dx·Viy.
 */
export function writeQuadHalfPlanes(
  out: Float64Array,
  at: number,
  x0: number,
  y0: number,
  x1: number,
  y1: number,
  x2: number,
  y2: number,
  x3: number,
  y3: number,
): boolean {
  // Shoelace, twice the signed area.
  const twiceArea = (x0 * y1 - x1 * y0) + (x1 * y2 - x2 * y1) + (x2 * y3 - x3 * y2) + (x3 * y0 - x0 * y3);
  if (!(Math.abs(twiceArea) > 0)) return false;
  const s = twiceArea > 0 ? 1 : -1;
  let k = at * 3;
  k = writeEdge(out, k, x0, y0, x1, y1, s);
  k = writeEdge(out, k, x1, y1, x2, y2, s);
  k = writeEdge(out, k, x2, y2, x3, y3, s);
  writeEdge(out, k, x3, y3, x0, y0, s);
  return true;
}

function writeEdge(out: Float64Array, k: number, ax: number, ay: number, bx: number, by: number, s: number): number {
  const dx = (bx - ax) * s;
  const dy = (by - ay) * s;
  const len = Math.hypot(dx, dy);
  if (len === 0) {
    // A repeated vertex: a half-plane that keeps everything (0·x + 0·y ≤ 1).
    out[k] = 0;
    out[k + 1] = 0;
    out[k + 2] = 1;
    return k + 3;
  }
  const a = dy / len;
  const b = -dx / len;
  // Use the vertex nearer the origin for C: the rectangle lives near the origin, so this keeps the
  // rounding of C small when the other vertex is far away (sun grazing the wall).
  const near = Math.abs(ax) + Math.abs(ay) <= Math.abs(bx) + Math.abs(by);
  out[k] = a;
  out[k + 1] = b;
  out[k + 2] = near ? a * ax + b * ay : a * bx + b * by;
  return k + 3;
}

/**
 * Area of the part of the rectangle [x0, x1] × [y0, y1] that lies inside every listed half-plane.
 *
 * @param x0 - left edge of the rectangle
 * @param y0 - bottom edge
 * @param x1 - right edge (≤ x0 gives area 0)
 * @param y1 - top edge (≤ y0 gives area 0)
 * @param planes - packed (A, B, C) triples, `A·x + B·y ≤ C` inside
 * @param starts - triple indexes of the groups of planes to apply
 * @param counts - number of triples in each group
 * @param groups - how many of `starts`/`counts` to use
 * @returns the area [square of the length unit], ≥ 0
 * @remarks Sutherland & Hodgman (1974) clipping of the rectangle, then the shoelace formula. The
 * intersection of convex sets is convex, so the result is exact up to rounding.
 */
export function clippedRectangleArea(
  x0: number,
  y0: number,
  x1: number,
  y1: number,
  planes: Float64Array,
  starts: ArrayLike<number>,
  counts: ArrayLike<number>,
  groups: number,
): number {
  if (!(x1 > x0 && y1 > y0)) return 0;
  let total = 0;
  for (let g = 0; g < groups; g++) total += counts[g];
  // Each half-plane adds at most one vertex to a convex polygon: this bound keeps the buffers safe.
  if (total > MAX_HALF_PLANES) throw new RangeError(`clippedRectangleArea: ${total} half-planes, at most ${MAX_HALF_PLANES}`);
  let src = bufA;
  let dst = bufB;
  src[0] = x0;
  src[1] = y0;
  src[2] = x1;
  src[3] = y0;
  src[4] = x1;
  src[5] = y1;
  src[6] = x0;
  src[7] = y1;
  let n = 4;
  for (let g = 0; g < groups; g++) {
    const end = (starts[g] + counts[g]) * 3;
    for (let k = starts[g] * 3; k < end; k += 3) {
      n = clipByHalfPlane(src, n, dst, planes[k], planes[k + 1], planes[k + 2]);
      if (n < 3) return 0;
      const t = src;
      src = dst;
      dst = t;
    }
  }
  return polygonArea(src, n);
}

/**
 * One Sutherland–Hodgman step: clips the convex polygon `src` (n vertices, packed x, y) by
 * `a·x + b·y ≤ c` into `dst`; returns the new vertex count.
 */
function clipByHalfPlane(src: Float64Array, n: number, dst: Float64Array, a: number, b: number, c: number): number {
  let m = 0;
  let px = src[2 * n - 2];
  let py = src[2 * n - 1];
  let pd = a * px + b * py - c;
  for (let i = 0; i < n; i++) {
    const qx = src[2 * i];
    const qy = src[2 * i + 1];
    const qd = a * qx + b * qy - c;
    if (qd <= 0) {
      if (pd > 0) {
        // Entering: the crossing point first.
        const t = pd / (pd - qd);
        dst[2 * m] = px + t * (qx - px);
        dst[2 * m + 1] = py + t * (qy - py);
        m++;
      }
      dst[2 * m] = qx;
      dst[2 * m + 1] = qy;
      m++;
    } else if (pd <= 0) {
      // Leaving: the crossing point only.
      const t = pd / (pd - qd);
      dst[2 * m] = px + t * (qx - px);
      dst[2 * m + 1] = py + t * (qy - py);
      m++;
    }
    px = qx;
    py = qy;
    pd = qd;
  }
  return m;
}

/** Shoelace area of a packed polygon, measured from its first vertex to keep rounding small. */
function polygonArea(p: Float64Array, n: number): number {
  const ox = p[0];
  const oy = p[1];
  let twice = 0;
  for (let i = 1; i < n - 1; i++) {
    twice += (p[2 * i] - ox) * (p[2 * i + 3] - oy) - (p[2 * i + 2] - ox) * (p[2 * i + 1] - oy);
  }
  return Math.abs(twice) / 2;
}

const unionStarts = new Int32Array(3);
const unionCounts = new Int32Array([4, 4, 4]);

/**
 * Area of the part of the rectangle [x0, x1] × [y0, y1] covered by the UNION of up to three convex
 * quadrilaterals (overlaps counted once).
 *
 * @param planes - the quadrilaterals as written by {@link writeQuadHalfPlanes}: quadrilateral i at
 *   triple index 4·i
 * @param count - number of quadrilaterals, 0…3
 * @returns the covered area [square of the length unit], 0 … rectangle area
 * @remarks Inclusion–exclusion, |S1 ∪ S2 ∪ S3| = Σ|Si| − Σ|Si ∩ Sj| + |S1 ∩ S2 ∩ S3| (each term within
 * the rectangle), every term an exact convex clip by {@link clippedRectangleArea}.
 */
export function unionAreaInRectangle(x0: number, y0: number, x1: number, y1: number, planes: Float64Array, count: number): number {
  if (count < 0 || count > 3) throw new RangeError(`unionAreaInRectangle: ${count} quadrilaterals, at most 3`);
  let covered = 0;
  for (let mask = 1; mask < 1 << count; mask++) {
    let groups = 0;
    for (let i = 0; i < count; i++) {
      if (mask & (1 << i)) unionStarts[groups++] = i * 4;
    }
    const area = clippedRectangleArea(x0, y0, x1, y1, planes, unionStarts, unionCounts, groups);
    covered += groups % 2 === 1 ? area : -area;
  }
  const full = (x1 - x0) * (y1 - y0);
  return covered < 0 ? 0 : covered > full ? full : covered;
}

