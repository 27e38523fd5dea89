
const { abs, sqrt } = Math;
/**
 * Exact area of the intersection of an axis-aligned rectangle with convex polygons given as
 * half-planes, and of a rectangle with a strip ({@link rectangleStripArea}, the closed form the
 * shadow union of src/core/shading/shadowPlan.ts uses). The general clipper is kept as the independent
 * check of that closed form (tests/core/gain/preparedFast.test.ts) and is itself checked against
 * polygon-clipping (tests/reference/polygon-clipping-union.test.ts); {@link writeQuadHalfPlanes}
 * also serves the point test of src/core/shading/sunlit.ts.
 *
 * Method: Sutherland–Hodgman clipping of a convex polygon by one half-plane at a time (Sutherland &
 * Hodgman, "Reentrant polygon clipping", Communications of the ACM 17(1), 1974); clipping a convex
 * polygon by a half-plane keeps it convex, so clipping the rectangle by every half-plane of several
 * convex polygons gives their exact common part. The area is the shoelace formula. All work happens
 * in two preallocated vertex buffers: nothing is allocated per call.
 *
 * A polygon of at most {@link MAX_HALF_PLANES} half-planes is clipped; each half-plane adds at most
 * one vertex, so the buffers hold 4 + MAX_HALF_PLANES vertices.
 *
 * Speed: when the quadrilaterals' bounding
 * boxes are given, each term of the union first shrinks the rectangle to the common part of the
 * boxes — exact, since each quadrilateral lies inside its box — and skips the term outright when
 * that part is empty. An axis-aligned edge of a convex quadrilateral lies on its box's boundary, so
 * once the rectangle is inside the box that half-plane cuts nothing and is not applied; shadows of
 * overhangs and fins (two axis-aligned edges each) then cost two slanted clips instead of four.
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
 * quadrilateral has no area, so the caller can drop it. When `box` is given, the quadrilateral's
 * bounding box (min x, min y, max x, max y) is written to `box[at]…box[at + 3]` — the layout
 * {@link unionAreaInRectangle} reads.
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
  box?: Float64Array,
): boolean {
  // Shoelace, twice the signed area.
  const twiceArea = (x0 * y1 - x1 * y0) + (x1 * y2 - x2 * y1) + (x2 * y3 - x3 * y2) + (x3 * y0 - x0 * y3);
  if (!(abs(twiceArea) > 0)) return false;
  if (box !== undefined) {
    box[at] = min4(x0, x1, x2, x3);
    box[at + 1] = min4(y0, y1, y2, y3);
    box[at + 2] = -min4(-x0, -x1, -x2, -x3);
    box[at + 3] = -min4(-y0, -y1, -y2, -y3);
  }
  const s = twiceArea > 0 ? 1 : -1;
  let k = at * 3;
  k = writeEdge(out, k, x0, y0, x1, y1, s);
  k = writeEdge(out, k, x1, y1, x2, y2, s);
  k = writeEdge(out, k, x2, y2, x3, y3, s);
  writeEdge(out, k, x3, y3, x0, y0, s);
  return true;
}

function min4(a: number, b: number, c: number, d: number): number {
  const ab = a < b ? a : b;
  const cd = c < d ? c : d;
  return ab < cd ? ab : cd;
}

function writeEdge(out: Float64Array, k: number, ax: number, ay: number, bx: number, by: number, s: number): number {
  const dx = (bx - ax) * s;
  const dy = (by - ay) * s;
  // √(dx² + dy²) rather than Math.hypot (several times slower): the shadow vertices stay far below
  // 1e150, and an axis-aligned edge still gets an exact unit normal (√(dx²) = |dx| in IEEE arithmetic).
  const len = sqrt(dx * dx + dy * dy);
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
  const near = abs(ax) + abs(ay) <= abs(bx) + abs(by);
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
  return clipArea(x0, y0, x1, y1, planes, starts, counts, groups, false);
}

/**
 * {@link clippedRectangleArea}, optionally skipping axis-aligned half-planes (A = 0 or B = 0) —
 * exact only when the rectangle already lies inside each such half-plane (see the module comment).
 */
function clipArea(
  x0: number,
  y0: number,
  x1: number,
  y1: number,
  planes: Float64Array,
  starts: ArrayLike<number>,
  counts: ArrayLike<number>,
  groups: number,
  skipAxisAligned: boolean,
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
      const a = planes[k];
      const b = planes[k + 1];
      if (skipAxisAligned && (a === 0 || b === 0)) continue;
      n = clipByHalfPlane(src, n, dst, a, b, planes[k + 2]);
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
  return abs(twice) / 2;
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
 * @param boxes - optional: their bounding boxes as written by {@link writeQuadHalfPlanes} (box of
 *   quadrilateral i at 4·i); given, each term is clipped within the common part of the boxes and
 *   skipped when that is empty (same result, less work)
 * @returns the covered area [square of the length unit], 0 … rectangle area
 * @remarks Inclusion–exclusion, |S1 ∪ S2 ∪ S3| = Σ|Si| − Σ|Si ∩ Sj| + |S1 ∩ S2 ∩ S3| (each term within
 * the rectangle), every term an exact convex clip by {@link clippedRectangleArea}.
 */
export function unionAreaInRectangle(x0: number, y0: number, x1: number, y1: number, planes: Float64Array, count: number, boxes?: Float64Array): number {
  if (count < 0 || count > 3) throw new RangeError(`unionAreaInRectangle: ${count} quadrilaterals, at most 3`);
  const useBoxes = boxes !== undefined;
  let covered = 0;
  for (let mask = 1; mask < 1 << count; mask++) {
    let groups = 0;
    let rx0 = x0;
    let ry0 = y0;
    let rx1 = x1;
    let ry1 = y1;
    for (let i = 0; i < count; i++) {
      if (mask & (1 << i)) {
        unionStarts[groups++] = i * 4;
        if (useBoxes) {
          const b = i * 4;
          if (boxes[b] > rx0) rx0 = boxes[b];
          if (boxes[b + 1] > ry0) ry0 = boxes[b + 1];
          if (boxes[b + 2] < rx1) rx1 = boxes[b + 2];
          if (boxes[b + 3] < ry1) ry1 = boxes[b + 3];
        }
      }
    }
    if (!(rx1 > rx0 && ry1 > ry0)) continue; // the boxes do not meet inside the rectangle: area 0
    const area = clipArea(rx0, ry0, rx1, ry1, planes, unionStarts, unionCounts, groups, useBoxes);
    covered += groups % 2 === 1 ? area : -area;
  }
  const full = (x1 - x0) * (y1 - y0);
  return covered < 0 ? 0 : covered > full ? full : covered;
}


/**
 * Area of the part of the rectangle [x0, x1] × [y0, y1] inside the strip w0 ≤ p·x + q·y ≤ w1 —
 * closed form, used for the shadow union of src/core/shading/sunlit.ts, where every shadow and every
 * intersection of shadows with the lit rectangle is such a rectangle-and-strip set.
 *
 * @param x0 - left edge (x1 ≤ x0 gives 0)
 * @param y0 - bottom edge (y1 ≤ y0 gives 0)
 * @param x1 - right edge
 * @param y1 - top edge
 * @param p - x coefficient of the strip's linear form (any finite value)
 * @param q - y coefficient (any finite value)
 * @param w0 - lower bound of p·x + q·y (w1 ≤ w0 gives 0)
 * @param w1 - upper bound
 * @returns the area [square of the length unit], 0 … rectangle area
 * @remarks Over the rectangle, v = p·x + q·y − v_min is the sum of two independent uniform parts
 * on [0, α] and [0, β] with α = |p|·W, β = |q|·H; the share of the rectangle with v ≤ s is the
 * distribution of that sum (Eq. P1, with β ≤ α after ordering):
 * s²/(2αβ) for 0 ≤ s ≤ β, (s − β/2)/α for β ≤ s ≤ α, 1 − (α + β − s)²/(2αβ) for α ≤ s ≤ α + β
 * (the convolution of two uniform densities — the trapezoidal distribution; e.g. Feller, *An
 * Introduction to Probability Theory and Its Applications* II, §I.9 — from memory). Each branch
 * divides only by quantities its own range keeps above 0, so a strip along an axis (p or q = 0)
 * is exact too. Area = W·H·[G(w1 − v_min) − G(w0 − v_min)].
 */
export function rectangleStripArea(x0: number, y0: number, x1: number, y1: number, p: number, q: number, w0: number, w1: number): number {
  const width = x1 - x0;
  const height = y1 - y0;
  if (!(width > 0 && height > 0 && w1 > w0)) return 0;
  const ap = (p < 0 ? -p : p) * width;
  const aq = (q < 0 ? -q : q) * height;
  const vMin = (p >= 0 ? p * x0 : p * x1) + (q >= 0 ? q * y0 : q * y1);
  const big = ap > aq ? ap : aq;
  const small = ap > aq ? aq : ap;
  const f = trapezoidCdf(w1 - vMin, big, small) - trapezoidCdf(w0 - vMin, big, small);
  return f > 0 ? width * height * f : 0;
}

/** Eq. P1: P(U + V ≤ s) for U uniform on [0, big], V uniform on [0, small], small ≤ big. */
function trapezoidCdf(s: number, big: number, small: number): number {
  if (!(s > 0)) return 0;
  const total = big + small;
  if (s >= total) return 1;
  if (s <= small) return (s * s) / (2 * big * small); // 0 < s ≤ small ≤ big
  if (s <= big) return (s - small / 2) / big; // 0 < s ≤ big
  const r = total - s; // big < s < total: small > 0
  return 1 - (r * r) / (2 * big * small);
}
