/**
 * The sunlit-fraction kernel of src/core/shading/sunlit.ts: a window's (checked) shading reduced once to
 * plain numbers — a {@link ShadowPlan} — and the exact closed-form shadow union for one sun.
 *
 * Geometry as in the module comment of src/core/shading/sunlit.ts (wall-face coordinates seen from
 * outside, x right, y up, origin at the lower-left corner of the opening; a = tan γ, b = tan Ω the
 * shadow slopes). Every shadow is a parallelogram with two edges along an axis and two along the
 * sun's direction on the wall, so with w = p·x + q·y, p = sin β, q = −cos β sin γ (w is constant
 * along that direction) each shadow is a box of intervals in (x, y, w):
 * - overhang (edge y = H + G, x ∈ [−EL, W + ER], projection P): y ∈ [H + G − bP, H + G] and
 *   w ∈ [w(−EL, H + G), w(W + ER, H + G)];
 * - fin (edge x = x_f, y ∈ [−EB, H + EA], projection P): x between x_f and x_f − aP, and w between
 *   w(x_f, −EB) and w(x_f, H + EA).
 * The lit rectangle (glass seen through the reveal) is a box in (x, y); the intersection of it with
 * any group of shadows is again a box — a rectangle cut by a strip — with an exact closed-form area
 * ({@link rectangleStripArea}). The shaded area is the union of the shadows within the lit
 * rectangle by inclusion–exclusion: overhang, fin, and overhang ∩ fin (at most one fin's shadow can
 * reach the opening for a given sun, so these three groups are all there are).
 */
import { rectangleStripArea } from './polygon';
import type { Shading } from './types';

/** A window's shading as numbers, for {@link sunlitFromPlan} (inputs already checked). */
export interface ShadowPlan {
  /** Glass width and height [length], their product. */
  width: number;
  height: number;
  area: number;
  /** Reveal depth [length] ≥ 0. */
  reveal: number;
  /** Overhang present with projection > 0; its edge height H + G, ends −EL and W + ER, projection. */
  overhang: boolean;
  ohY: number;
  ohXl: number;
  ohXr: number;
  ohP: number;
  /** Left fin present with projection > 0; its edge x = −g, ends −EB and H + EA, projection. */
  leftFin: boolean;
  lfX: number;
  lfYb: number;
  lfYt: number;
  lfP: number;
  /** Right fin likewise, edge x = W + g. */
  rightFin: boolean;
  rfX: number;
  rfYb: number;
  rfYt: number;
  rfP: number;
}

/**
 * Reduces a checked shading to a {@link ShadowPlan} (devices of projection 0 are left out: they cast
 * no shadow).
 * @param width - glass width [length] > 0 (checked by the caller)
 * @param height - glass height [length] > 0
 * @param shading - checked shading description (the skyline is not part of the plan)
 * @returns the plan
 */
export function shadowPlanOf(width: number, height: number, shading: Shading): ShadowPlan {
  const oh = shading.overhang;
  const lf = shading.leftFin;
  const rf = shading.rightFin;
  const hasOh = oh !== undefined && oh.projection > 0;
  const hasLf = lf !== undefined && lf.projection > 0;
  const hasRf = rf !== undefined && rf.projection > 0;
  return {
    width,
    height,
    area: width * height,
    reveal: shading.revealDepth ?? 0,
    overhang: hasOh,
    ohY: hasOh ? height + oh.gap : 0,
    ohXl: hasOh ? -oh.extensionLeft : 0,
    ohXr: hasOh ? width + oh.extensionRight : 0,
    ohP: hasOh ? oh.projection : 0,
    leftFin: hasLf,
    lfX: hasLf ? -lf.gap : 0,
    lfYb: hasLf ? -lf.extensionBelow : 0,
    lfYt: hasLf ? height + lf.extensionAbove : 0,
    lfP: hasLf ? lf.projection : 0,
    rightFin: hasRf,
    rfX: hasRf ? width + rf.gap : 0,
    rfYb: hasRf ? -rf.extensionBelow : 0,
    rfYt: hasRf ? height + rf.extensionAbove : 0,
    rfP: hasRf ? rf.projection : 0,
  };
}

/**
 * Sunlit fraction of the glass for one sun in front of the wall (skyline already tested).
 * @param g - the window's {@link ShadowPlan}
 * @param a - tan γ: shadow x-shift per unit depth is −a
 * @param b - tan Ω (> 0 with the sun up): shadow y-shift per unit depth is −b
 * @param p - sin β (> 0)
 * @param q - −cos β sin γ
 * @returns sunlit area / glass area, 0…1
 * @remarks Lit rectangle (glass + (aR, bR)) ∩ opening; shaded area by inclusion–exclusion of the
 * shadow boxes (module comment), each term exact by {@link rectangleStripArea}. One sun through
 * {@link sunlitFromPlanRows}, the one implementation.
 */
export function sunlitFromPlan(g: ShadowPlan, a: number, b: number, p: number, q: number): number {
  ONE_A[0] = a;
  ONE_B[0] = b;
  ONE_P[0] = p;
  ONE_Q[0] = q;
  sunlitFromPlanRows(g, ONE_ROW, 1, ONE_A, ONE_B, ONE_P, ONE_Q, ONE_RESULT);
  return ONE_RESULT[0];
}

/** Scratch of {@link sunlitFromPlan}: row 0, its a, b, p, q and its result. */
const ONE_ROW = new Int32Array(1);
const ONE_A = new Float64Array(1);
const ONE_B = new Float64Array(1);
const ONE_P = new Float64Array(1);
const ONE_Q = new Float64Array(1);
const ONE_RESULT = new Float64Array(1);

/**
 * {@link sunlitFromPlan} for many suns (e.g. the hours of a year): for each row i = rows[k],
 * k < count, the sun's a, b, p and q are read from aCol[i], bCol[i], pCol[i], qCol[i] and the sunlit
 * fraction written to out[i]. A loop rather than a call per sun: the hourly path passes no number
 * through a call (which the engine would box), with the same arithmetic sun by sun.
 * @param g - the window's {@link ShadowPlan}
 * @param rows - the rows to work out
 * @param count - how many of `rows`
 * @param aCol - tan γ by row
 * @param bCol - tan Ω by row (> 0)
 * @param pCol - sin β by row (> 0)
 * @param qCol - −cos β sin γ by row
 * @param out - filled with the sunlit fraction, 0…1, at each row
 */
export function sunlitFromPlanRows(g: ShadowPlan, rows: Int32Array, count: number, aCol: Float64Array, bCol: Float64Array, pCol: Float64Array, qCol: Float64Array, out: Float64Array): void {
  const { width, height, area } = g;
  for (let k = 0; k < count; k++) {
    const i = rows[k];
    const a = aCol[i];
    const b = bCol[i];
    const p = pCol[i];
    const q = qCol[i];
    const ar = a * g.reveal;
    const br = b * g.reveal;
    const lx0 = ar > 0 ? ar : 0;
    const lx1 = ar < 0 ? width + ar : width;
    const ly0 = br > 0 ? br : 0;
    const ly1 = br < 0 ? height + br : height;
    if (!(lx1 > lx0 && ly1 > ly0)) {
      out[i] = 0;
      continue;
    }
    const litArea = (lx1 - lx0) * (ly1 - ly0);

    // Overhang: y and w bounded (w order kept: p > 0 and xl ≤ xr).
    let oh = false;
    let oy0 = 0;
    let ow0 = 0;
    let ow1 = 0;
    const oy1 = g.ohY;
    if (g.overhang) {
      const dx = -a * g.ohP;
      oy0 = oy1 - b * g.ohP;
      const xl = g.ohXl;
      const xr = g.ohXr;
      const bx0 = dx < 0 ? xl + dx : xl;
      const bx1 = dx > 0 ? xr + dx : xr;
      if (bx1 > lx0 && bx0 < lx1 && oy1 > ly0 && oy0 < ly1) {
        oh = true;
        ow0 = p * xl + q * oy1;
        ow1 = p * xr + q * oy1;
      }
    }
    // Fins: x and w bounded.
    let lf = false;
    let lx0f = 0;
    let lx1f = 0;
    let lw0 = 0;
    let lw1 = 0;
    if (g.leftFin) {
      const x = g.lfX;
      const xs = x - a * g.lfP;
      lx0f = xs < x ? xs : x;
      lx1f = xs < x ? x : xs;
      if (lx1f > lx0 && lx0f < lx1 && g.lfYt > ly0 && g.lfYb - b * g.lfP < ly1) {
        lf = true;
        const wb = p * x + q * g.lfYb;
        const wt = p * x + q * g.lfYt;
        lw0 = wb < wt ? wb : wt;
        lw1 = wb < wt ? wt : wb;
      }
    }
    let rf = false;
    let rx0f = 0;
    let rx1f = 0;
    let rw0 = 0;
    let rw1 = 0;
    if (g.rightFin) {
      const x = g.rfX;
      const xs = x - a * g.rfP;
      rx0f = xs < x ? xs : x;
      rx1f = xs < x ? x : xs;
      if (rx1f > lx0 && rx0f < lx1 && g.rfYt > ly0 && g.rfYb - b * g.rfP < ly1) {
        rf = true;
        const wb = p * x + q * g.rfYb;
        const wt = p * x + q * g.rfYt;
        rw0 = wb < wt ? wb : wt;
        rw1 = wb < wt ? wt : wb;
      }
    }
    if (!oh && !lf && !rf) {
      out[i] = litArea / area;
      continue;
    }

    // Inclusion–exclusion; each group's box is the intersection of its members' intervals with the lit rectangle.
    const oY0 = oy0 > ly0 ? oy0 : ly0;
    const oY1 = oy1 < ly1 ? oy1 : ly1;
    const lX0 = lx0f > lx0 ? lx0f : lx0;
    const lX1 = lx1f < lx1 ? lx1f : lx1;
    const rX0 = rx0f > lx0 ? rx0f : lx0;
    const rX1 = rx1f < lx1 ? rx1f : lx1;
    let covered = 0;
    if (oh) covered += rectangleStripArea(lx0, oY0, lx1, oY1, p, q, ow0, ow1);
    if (lf) {
      covered += rectangleStripArea(lX0, ly0, lX1, ly1, p, q, lw0, lw1);
      if (oh) covered -= rectangleStripArea(lX0, oY0, lX1, oY1, p, q, ow0 > lw0 ? ow0 : lw0, ow1 < lw1 ? ow1 : lw1);
    }
    // No left-and-right terms: both fin shadows are shifted by −a per unit depth, so the one on the
    // side the shift points away from the opening lies wholly outside it (x ≤ −g ≤ 0 for the left fin
    // when a ≥ 0, x ≥ W + g ≥ W for the right fin when a ≤ 0) and was left out above.
    if (rf) {
      covered += rectangleStripArea(rX0, ly0, rX1, ly1, p, q, rw0, rw1);
      if (oh) covered -= rectangleStripArea(rX0, oY0, rX1, oY1, p, q, ow0 > rw0 ? ow0 : rw0, ow1 < rw1 ? ow1 : rw1);
    }
    const shaded = covered < 0 ? 0 : covered > litArea ? litArea : covered;
    const f = (litArea - shaded) / area;
    out[i] = f < 0 ? 0 : f > 1 ? 1 : f;
  }
}
