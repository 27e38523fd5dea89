/**
 * View factors of a shaded window: how much of the sky, of the ground and of the horizon band the
 * glass still sees past its overhang, fins, reveal and skyline — worked out once per window and used
 * for every hour (the diffuse counterpart of the sunlit fraction). docs/diffuse-shading.md gives the
 * method in words; this comment gives the formulas.
 *
 * Geometry and frame as in src/core/shading/sunlit.ts: wall-face coordinates seen from outside, x to
 * the right, y up, z out of the wall; the glass W × H lies a reveal depth R behind the wall face; the
 * overhang is the plate y = H + G, x ∈ [−EL, W + ER], z ∈ [0, P]; the fins are the plates x = −g
 * (left) and x = W + g (right), y ∈ [−EB, H + EA], z ∈ [0, P]; the skyline gives an elevation by
 * compass sector. Every device, the reveal's jambs, head and sill and the skyline are taken as BLACK:
 * they hide what is behind them and reflect nothing.
 *
 * Definitions. For a point of the glass, the (differential) view factor to a set of directions is
 * F = (1/π) ∫ cos θ dω over those directions (θ from the glass normal) — the view-factor integral of
 * radiation heat transfer (Siegel & Howell, *Thermal Radiation Heat Transfer*, configuration factors;
 * Incropera & DeWitt, ch. 13 — from memory, no equation numbers quoted). The window's value is the
 * average over the glass area. Three are kept:
 * - sky: directions above the horizon that no device, reveal face or skyline blocks;
 * - ground: directions below the horizon that no device or reveal face blocks (the skyline stands
 *   on the horizon and hides no ground);
 * - horizon band: the directions between the horizon and {@link HORIZON_BAND_DEG} above it that are
 *   open, as a share of what the bare window sees of that band.
 * A direction blocked by several things counts once: the blocked set is a union.
 * A bare vertical window sees sky ½ and ground ½ ((1 ± cos 90°)/2) and all of the band; the ratios
 * returned are the window's values over these.
 *
 * Method. Directions are written as (ψ, h): ψ the horizontal angle from the wall normal (positive to
 * the right seen from outside, compass azimuth = surface azimuth − ψ), h the elevation. Then
 * cos θ dω = cos²h cos ψ dh dψ, and along one azimuth ψ everything that blocks is an interval of
 * τ = tan h, exactly:
 * - reveal (R > 0): open only for tan ψ ∈ [−x/R, (W − x)/R] and τ ∈ [−y cos ψ / R, (H − y) cos ψ / R];
 * - overhang, D = H + G − y > 0 above the point, a = −EL − x, b = W + ER − x: blocked for
 *   τ ≥ D cos ψ / (P + R), τ ≥ D sin ψ / b (b > 0), τ ≥ D sin ψ / a (a < 0), and τ ≤ D sin ψ / b
 *   (b < 0), τ ≤ D sin ψ / a (a > 0) — a ray meets the plate where its depth −R + D / v lies in
 *   [0, P] and its x in [−EL, W + ER], v = τ / cos ψ;
 * - fin at x_f, e = x_f − x: for sin ψ on the fin's side, blocked where the ray meets the plate within
 *   its depth (|tan ψ| between |e| / (P + R) and |e| / R) and its height:
 *   τ ∈ [(y_b − y) sin ψ / e, (y_t − y) sin ψ / e];
 * - skyline: τ < tan α (α the elevation of the sector the azimuth falls in);
 * - sky τ > 0, ground τ < 0, band 0 < τ < tan 6.5°.
 * Over an interval of τ the elevation integral is exact: ∫ cos²h dh = A(τ₂) − A(τ₁) with
 * A(τ) = ½ atan τ + ½ τ / (1 + τ²). The open part of an azimuth is the reveal's (or the whole)
 * interval minus the union of the blocked ones (by inclusion–exclusion of the overhang's and the
 * fin's intervals; the skyline raises the lower end).
 *
 * The glass average, three nested integrals:
 * - height y, EXACT: at a fixed x and ψ every interval end above is a line τ = α + β y, so between
 *   the heights where two lines cross the open measure is a fixed sum of ±A(α + β y), and
 *   ∫ A(α + β y) dy = [B(τ)] / β with B(τ) = ½ τ atan τ (B' = A);
 * - azimuth ψ: Gauss–Legendre (3 nodes, panels of at most 0.5 rad) between the azimuths where the
 *   height integral jumps or has a kink for every height — the wall normal, the reveal's jambs, a
 *   fin's outer depth limit (its inner one lies beyond the jamb's), where an overhang end's bound
 *   takes over from its depth bound, the skyline's sector edges;
 * - width x: Gauss–Legendre (3 nodes, panels of at most W/3) between the abscissas where two of those
 *   jumps meet (the line integral has a kink there) or an overhang end stands over the glass, and
 *   graded towards each jamb (W/4, W/16, W/64), where devices and reveal faces meet the glass's edge
 *   lines and the line integral behaves like x·log x.
 *
 * Numerical error (tests/core/shading/viewFactors.test.ts): against the same integrals on a grid
 * many times finer, over random windows with every device, reveals up to ten times the window and
 * skylines, the measured worst case is 4e-5; the stated bound is {@link VIEW_FACTOR_ERROR} (0.002)
 * on each view factor and on the band share. Outside checks in tests/reference: Hottel's crossed
 * strings (to 1e-7 for a long overhang), the catalogue configuration factors (strip to parallel and
 * perpendicular rectangles, C-11, C-14) and a three.js ray-cast hemisphere integration (200 random
 * windows within 0.003). Cost: about a millisecond for a window with every device and a skyline
 * (`npm run bench`, viewfactors_vs_suncalc_annual); {@link windowViewFactors} keeps the last few
 * hundred windows it worked out, since worksheets and schedules ask for the same window often.
 *
 * Exact cases: no device, no reveal and no skyline gives exactly the bare window (½, ½, 1); a
 * skyline alone gives the closed form of src/core/shading/skyline.ts for the sky and its own closed
 * form for the band (the skyline does not depend on the point on the glass).
 *
 * Vertical windows only, like the sunlit fraction ({@link requireVerticalForShading}).
 */
import { gaussLegendre as gaussLegendreRule, RAD, requireFinite, requireRange, wrap180, wrap360 } from '../common';
import { type ShadowPlan, shadowPlanOf } from './shadowPlan';
import { skylineSkyViewFactor } from './skyline';
import { requireShading, type WindowOpening } from './sunlit';
import type { Shading } from './types';

const { PI, sin, cos, tan, atan, asin, acos, ceil } = Math;
/** Infinity and NaN as module constants: under jest every lookup of a global costs about a microsecond (docs/testing.md). */
const INF = Infinity;
const NAN = NaN;
const HALF_PI = PI / 2;

/**
 * Upper edge of the horizon band [°]. The Perez model's horizon brightening comes from the sky just
 * above the horizon: the original model of Perez et al. (1986) took it as a band 6.5° high (from
 * memory); the 1990 model's F2 sin Σ term is that band seen by a tilted plane. A band of finite
 * height lets a low skyline or a device cut part of the brightening instead of all or nothing.
 */
export const HORIZON_BAND_DEG = 6.5;
const TAN_BAND = tan(HORIZON_BAND_DEG * RAD);

/** Stated bound on the numerical error of each view factor [-] (absolute). */
export const VIEW_FACTOR_ERROR = 0.002;

/** What a window's glass sees, averaged over its area. */
export interface WindowViewFactors {
  /** View factor to the open sky [-], 0…½ (½ for a bare vertical window). */
  sky: number;
  /** View factor to the open ground [-], 0…½. */
  ground: number;
  /** sky / ½: the share of the isotropic sky diffuse that reaches the glass, 0…1. */
  skyRatio: number;
  /** ground / ½: the share of the ground-reflected light that reaches the glass, 0…1. */
  groundRatio: number;
  /** Share of the horizon band (0…6.5° elevation) left open, cosine-weighted, 0…1. */
  horizonShare: number;
}

/** A bare vertical window. */
export const BARE_VIEW_FACTORS: Readonly<WindowViewFactors> = Object.freeze({ sky: 0.5, ground: 0.5, skyRatio: 1, groundRatio: 1, horizonShare: 1 });

/** ∫ cos²h dh from 0 to atan τ: ½ atan τ + ½ τ / (1 + τ²), written so that τ = ±∞ and ±0 work. */
function A(t: number): number {
  return 0.5 * atan(t) + 0.5 / (t + 1 / t);
}

/** ∫ cos²h dh over the whole band 0…6.5°, per unit of cos ψ dψ. */
const BAND_A = A(TAN_BAND);

/** The skyline as azimuth pieces of the front half (ψ ascending), each with tan of its elevation. */
interface SkylinePieces {
  n: number;
  lo: Float64Array;
  hi: Float64Array;
  tanElevation: Float64Array;
}

function skylinePieces(skyline: readonly number[] | undefined, surfaceAzimuth: number): SkylinePieces {
  if (skyline === undefined) return { n: 1, lo: Float64Array.of(-HALF_PI), hi: Float64Array.of(HALF_PI), tanElevation: Float64Array.of(0) };
  const n = skyline.length;
  const edges: number[] = [-90, 90];
  for (let k = 0; k < n; k++) {
    const psi = wrap180(surfaceAzimuth - (k * 360) / n);
    if (psi > -90 && psi < 90) edges.push(psi);
  }
  edges.sort((p, q) => p - q);
  const lo: number[] = [];
  const hi: number[] = [];
  const t: number[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    if (!(edges[i + 1] > edges[i])) continue;
    const mid = (edges[i] + edges[i + 1]) / 2;
    const k = Math.floor((wrap360(surfaceAzimuth - mid) * n) / 360);
    const alpha = skyline[k >= n ? n - 1 : k];
    const tanAlpha = alpha >= 90 ? INF : tan(alpha * RAD);
    if (t.length > 0 && t[t.length - 1] === tanAlpha) hi[hi.length - 1] = edges[i + 1] * RAD;
    else {
      lo.push(edges[i] * RAD);
      hi.push(edges[i + 1] * RAD);
      t.push(tanAlpha);
    }
  }
  return { n: t.length, lo: Float64Array.from(lo), hi: Float64Array.from(hi), tanElevation: Float64Array.from(t) };
}

/** Quadrature settings of the glass width (panels split at kinks) and of the azimuth. */
export interface ViewFactorQuadrature {
  /** Widest glass panel: the glass width over this. */
  glassPanels: number;
  /** Gauss–Legendre nodes per glass panel. */
  glassNodes: number;
  /** Widest azimuth panel [rad]. */
  panelWidth: number;
  /** Gauss–Legendre nodes per azimuth panel (2 on panels narrower than 0.02 rad). */
  panelNodes: number;
}

/** The settings used (docs/diffuse-shading.md; the error test holds them to {@link VIEW_FACTOR_ERROR}). */
export const DEFAULT_QUADRATURE: Readonly<ViewFactorQuadrature> = Object.freeze({ glassPanels: 3, glassNodes: 3, panelWidth: 0.5, panelNodes: 3 });

// Gauss–Legendre nodes and weights on [−1, 1] (the common rule, checked against Abramowitz &
// Stegun), kept per order.
const GL_CACHE: { x: Float64Array; w: Float64Array }[] = [];
function gaussLegendre(n: number): { x: Float64Array; w: Float64Array } {
  const hit = GL_CACHE[n];
  if (hit) return hit;
  const { nodes, weights } = gaussLegendreRule(n);
  return (GL_CACHE[n] = { x: nodes, w: weights });
}

// Scratch (one evaluation at a time; no allocation per azimuth).
let breaks = new Float64Array(256);
const blockLo = new Float64Array(4);
const blockHi = new Float64Array(4);
const clipLo = new Float64Array(4);
const clipHi = new Float64Array(4);
let blockCount = 0;

/** ∫ cos²h dh over [lo, hi] (in τ = tan h) minus the first `count` blocked intervals. */
function openMeasure(lo: number, hi: number, count: number): number {
  if (!(hi > lo)) return 0;
  let m = 0;
  for (let i = 0; i < count; i++) {
    const s = blockLo[i] > lo ? blockLo[i] : lo;
    const e = blockHi[i] < hi ? blockHi[i] : hi;
    if (e > s) {
      // insertion by start
      let j = m;
      while (j > 0 && clipLo[j - 1] > s) {
        clipLo[j] = clipLo[j - 1];
        clipHi[j] = clipHi[j - 1];
        j--;
      }
      clipLo[j] = s;
      clipHi[j] = e;
      m++;
    }
  }
  let cur = lo;
  let total = 0;
  for (let i = 0; i < m; i++) {
    if (clipLo[i] > cur) total += A(clipLo[i]) - A(cur);
    if (clipHi[i] > cur) cur = clipHi[i];
  }
  if (hi > cur) total += A(hi) - A(cur);
  return total;
}

function pushBlock(lo: number, hi: number): void {
  if (hi > lo) {
    blockLo[blockCount] = lo;
    blockHi[blockCount] = hi;
    blockCount++;
  }
}

/** Column results: ∫ cos²h dh over the open sky, ground and band directions of one azimuth. */
const column = { sky: 0, ground: 0, band: 0 };

/**
 * The open elevations along one azimuth ψ (sin ψ = s, cos ψ = c > 0) from glass point (x, y), with the
 * skyline's tan α = t there; writes {@link column}.
 */
function evaluateColumn(g: ShadowPlan, x: number, y: number, s: number, c: number, t: number): void {
  const R = g.reveal;
  let lo = -INF;
  let hi = INF;
  if (R > 0) {
    lo = (-y * c) / R;
    hi = ((g.height - y) * c) / R;
  }
  blockCount = 0;
  if (g.overhang) {
    const D = g.ohY - y;
    if (D > 0) {
      let tlo = (D * c) / (g.ohP + R);
      let thi = INF;
      let open = false;
      const a = g.ohXl - x;
      const b = g.ohXr - x;
      if (b > 0) {
        const w = (D * s) / b;
        if (w > tlo) tlo = w;
      } else if (b < 0) {
        const w = (D * s) / b;
        if (w < thi) thi = w;
      } else if (s > 0) open = true;
      if (a < 0) {
        const w = (D * s) / a;
        if (w > tlo) tlo = w;
      } else if (a > 0) {
        const w = (D * s) / a;
        if (w < thi) thi = w;
      } else if (s < 0) open = true;
      if (!open) pushBlock(tlo, thi);
    }
  }
  if (s < 0 && g.leftFin) finBlock(g.lfX - x, g.lfYb - y, g.lfYt - y, g.lfP, R, s, c);
  else if (s > 0 && g.rightFin) finBlock(g.rfX - x, g.rfYb - y, g.rfYt - y, g.rfP, R, s, c);
  // A point on the glass has lo ≤ 0 ≤ hi: the reveal's sill and head bounds never pass the horizontal.
  const devices = blockCount;
  column.ground = openMeasure(lo, 0, devices);
  if (t > 0) pushBlock(0, t);
  column.sky = openMeasure(0, hi, blockCount);
  column.band = openMeasure(0, hi < TAN_BAND ? hi : TAN_BAND, blockCount);
}

/**
 * The slope k = s/e (> 0) of a fin's bounds τ = (y_f − y)·k for a ray at sin ψ = s, cos ψ = c, if the
 * ray meets the fin within its depth; 0 if it does not. e = x_f − x is the fin's offset on the side of
 * s (the callers pass the left fin for s < 0 and the right one for s > 0, so e and s share their sign).
 * The ray meets the fin's plane within its depth when |tan ψ| ≥ |e| / (P + R), written without dividing
 * by c: |s| (P + R) ≥ |e| c. The inner limit |tan ψ| ≤ |e| / R is never passed inside the azimuths the
 * reveal leaves open (|e| = gap + x ≥ x, as for the breaks). A fin in the glass point's own plane
 * (e = 0) blocks nothing: every ray toward it leaves that plane at once.
 */
function finSlope(e: number, P: number, R: number, s: number, c: number): number {
  if (e === 0) return 0;
  const as = s < 0 ? -s : s;
  const ae = e < 0 ? -e : e;
  if (as * (P + R) < ae * c) return 0;
  return s / e;
}

/** Blocks the interval of a fin (see {@link finSlope}) for one glass point's column. */
function finBlock(e: number, yb: number, yt: number, P: number, R: number, s: number, c: number): void {
  const k = finSlope(e, P, R, s, c);
  if (k > 0) pushBlock(yb * k, yt * k);
}

let breakCount = 0;
function addBreak(psi: number, lo: number, hi: number): void {
  if (psi > lo && psi < hi) {
    if (breakCount === breaks.length) {
      const bigger = new Float64Array(breaks.length * 2);
      bigger.set(breaks);
      breaks = bigger;
    }
    breaks[breakCount++] = psi;
  }
}

/** Bounds of the forms c·cos ψ (C) and k·sin ψ (L) of one glass point, for the break search. */
const cBounds = new Float64Array(3);
const lBounds = new Float64Array(6);

/**
 * Adds the azimuths at which one glass point's column changes form (module comment) to the break list.
 */
function collectBreaks(g: ShadowPlan, pieces: SkylinePieces, x: number, y: number, lo: number, hi: number): void {
  const R = g.reveal;
  addBreak(0, lo, hi);
  let nc = 0;
  let nl = 0;
  if (R > 0) {
    cBounds[nc++] = (g.height - y) / R;
    cBounds[nc++] = -y / R;
  }
  if (g.overhang) {
    const D = g.ohY - y;
    if (D > 0) {
      cBounds[nc++] = D / (g.ohP + R);
      const a = g.ohXl - x;
      const b = g.ohXr - x;
      if (a !== 0) lBounds[nl++] = D / a;
      if (b !== 0) lBounds[nl++] = D / b;
    }
  }
  if (g.leftFin) nl = finBreaks(g.lfX - x, g.lfYb - y, g.lfYt - y, g.lfP, R, lo, hi, nl);
  if (g.rightFin) nl = finBreaks(g.rfX - x, g.rfYb - y, g.rfYt - y, g.rfP, R, lo, hi, nl);
  // c·cos ψ = k·sin ψ
  for (let i = 0; i < nc; i++) for (let j = 0; j < nl; j++) addBreak(atan(cBounds[i] / lBounds[j]), lo, hi);
  // Against the band's upper edge (everywhere) and the skyline's elevation (within its piece).
  crossingsWithLevel(TAN_BAND, lo, hi, lo, hi, nc, nl);
  for (let p = 0; p < pieces.n; p++) {
    const p0 = pieces.lo[p];
    const p1 = pieces.hi[p];
    if (p1 <= lo || p0 >= hi) continue;
    if (p > 0) addBreak(p0, lo, hi);
    const t = pieces.tanElevation[p];
    if (t > 0 && t < INF) crossingsWithLevel(t, p0 > lo ? p0 : lo, p1 < hi ? p1 : hi, lo, hi, nc, nl);
  }
}

/**
 * The azimuths where the integrand of a glass line jumps or has a kink whatever the height: the wall
 * normal, a fin's outer depth limit, where the overhang's end bound takes over from its depth bound,
 * and the skyline's sector edges.
 */
function structuralBreaks(g: ShadowPlan, pieces: SkylinePieces, x: number, lo: number, hi: number): void {
  const R = g.reveal;
  addBreak(0, lo, hi);
  if (g.overhang) {
    addBreak(atan((g.ohXl - x) / (g.ohP + R)), lo, hi);
    addBreak(atan((g.ohXr - x) / (g.ohP + R)), lo, hi);
  }
  if (g.leftFin) finDepthBreaks(g.lfX - x, g.lfP, R, lo, hi);
  if (g.rightFin) finDepthBreaks(g.rfX - x, g.rfP, R, lo, hi);
  for (let p = 1; p < pieces.n; p++) addBreak(pieces.lo[p], lo, hi);
}

function finDepthBreaks(e: number, P: number, R: number, lo: number, hi: number): void {
  if (e === 0) return;
  addBreak(atan(e / (P + R)), lo, hi);
}

/** The azimuth range a glass point at x sees through the reveal (the whole front half without one). */
function azimuthRange(g: ShadowPlan, x: number): [number, number] {
  const R = g.reveal;
  return R > 0 ? [atan(-x / R), atan((g.width - x) / R)] : [-HALF_PI, HALF_PI];
}

/**
 * The open sky, ground and band of one glass point: ∫ cos ψ (∫ cos²h dh) dψ over the open directions,
 * written into `out` [sky, ground, band] (divide sky and ground by π for view factors; band by 2 A(tan 6.5°)
 * for the share).
 */
function pointIntegrals(g: ShadowPlan, pieces: SkylinePieces, x: number, y: number, q: ViewFactorQuadrature, out: Float64Array): void {
  const [lo, hi] = azimuthRange(g, x);
  breakCount = 0;
  collectBreaks(g, pieces, x, y, lo, hi);
  const b = breaks.subarray(0, breakCount);
  b.sort();

  let sky = 0;
  let ground = 0;
  let band = 0;
  let piece = 0;
  let start = lo;
  for (let i = 0; i <= breakCount; i++) {
    const end = i < breakCount ? b[i] : hi;
    const width = end - start;
    if (width > 1e-15) {
      const mid = 0.5 * (start + end);
      while (piece < pieces.n - 1 && mid >= pieces.hi[piece]) piece++;
      const t = pieces.tanElevation[piece];
      const parts = ceil(width / q.panelWidth);
      const nodes = width < 0.02 ? 2 : q.panelNodes;
      const rule = gaussLegendre(nodes);
      const h = width / parts;
      for (let k = 0; k < parts; k++) {
        const center = start + (k + 0.5) * h;
        for (let j = 0; j < nodes; j++) {
          const psi = center + 0.5 * h * rule.x[j];
          const s = sin(psi);
          const c = cos(psi);
          evaluateColumn(g, x, y, s, c, t);
          const wt = 0.5 * h * rule.w[j] * c;
          sky += wt * column.sky;
          ground += wt * column.ground;
          band += wt * column.band;
        }
      }
    }
    start = end;
  }
  out[0] = sky;
  out[1] = ground;
  out[2] = band;
}

// The exact integral over the glass height. For one x and one azimuth every interval end is a line
// τ = α + β·y in the height y of the glass point (module comment), so the open measure is a sum of
// ±A(α + β y) between the heights where two lines cross, and ∫ A(α + β y) dy = [B(τ)]/β with
// B(τ) = ½ τ atan τ (B' = A). The open sky is [max(0, t), hi] minus the overhang's and the fin's
// intervals, by inclusion–exclusion (each term an interval [max of lower lines, min of upper lines]);
// the band the same below τ_b; the ground [lo, 0] minus the fin's interval.
const L_ZERO = 0;
const L_BAND = 1;
const L_LEVEL = 2;
const L_LO = 3;
const L_HI = 4;
const L_OH_LO = 5;
const L_OH_HI = 6;
const L_FIN_LO = 7;
const L_FIN_HI = 8;
const LINES = 9;
const la = new Float64Array(LINES);
const lb = new Float64Array(LINES);
const val = new Float64Array(LINES);
const lastY = new Float64Array(LINES);
const lastB = new Float64Array(LINES);
/** A(α) of the level lines (β = 0) of the current column. */
const levelA = new Float64Array(LINES);
const coefSky = new Float64Array(LINES);
const coefGround = new Float64Array(LINES);
const coefBand = new Float64Array(LINES);
const activeLines = new Int32Array(LINES);
const heightBreaks = new Float64Array((LINES * (LINES - 1)) / 2);

/** The larger of two lines at the current values (the first on ties). */
function upperOf(i: number, j: number): number {
  return val[j] > val[i] ? j : i;
}

/** The smaller of two lines at the current values. */
function lowerOf(i: number, j: number): number {
  return val[j] < val[i] ? j : i;
}

/** Adds ±(A(line hi) − A(line lo)) to `coef` when the interval is open at the current values. */
function term(sign: number, lo: number, hi: number, coef: Float64Array): void {
  if (val[hi] > val[lo]) {
    coef[hi] += sign;
    coef[lo] -= sign;
  }
}

/** The sky (or band, upper line `top`) terms: [low, top] minus the overhang's and fin's intervals. */
function skyTerms(low: number, top: number, oh: boolean, fin: boolean, coef: Float64Array): void {
  term(1, low, top, coef);
  if (oh) term(-1, upperOf(L_OH_LO, low), lowerOf(L_OH_HI, top), coef);
  if (fin) term(-1, upperOf(L_FIN_LO, low), lowerOf(L_FIN_HI, top), coef);
  if (oh && fin) term(1, upperOf(upperOf(L_OH_LO, L_FIN_LO), low), lowerOf(lowerOf(L_OH_HI, L_FIN_HI), top), coef);
}

/**
 * ∫ over the glass height of ∫ cos²h dh over the open sky, ground and band directions of one azimuth
 * (sin ψ = s, cos ψ = c > 0) at glass abscissa x, skyline tan α = t there; writes {@link column}.
 */
function heightColumn(g: ShadowPlan, x: number, s: number, c: number, t: number): void {
  const R = g.reveal;
  const H = g.height;
  let n = 0;
  la[L_ZERO] = 0;
  lb[L_ZERO] = 0;
  la[L_BAND] = TAN_BAND;
  lb[L_BAND] = 0;
  activeLines[n++] = L_BAND;
  la[L_LEVEL] = t;
  lb[L_LEVEL] = 0;
  levelA[L_ZERO] = 0;
  levelA[L_BAND] = BAND_A;
  levelA[L_LEVEL] = t > 0 ? A(t) : 0;
  const low = t > 0 ? L_LEVEL : L_ZERO;
  if (t > 0 && t < INF) activeLines[n++] = L_LEVEL;
  if (R > 0) {
    la[L_LO] = 0;
    lb[L_LO] = -c / R;
    la[L_HI] = (H * c) / R;
    lb[L_HI] = -c / R;
    activeLines[n++] = L_HI;
  } else {
    la[L_LO] = -INF;
    lb[L_LO] = 0;
    la[L_HI] = INF;
    lb[L_HI] = 0;
    levelA[L_LO] = -PI / 4;
    levelA[L_HI] = PI / 4;
  }
  let oh = false;
  if (g.overhang) {
    // Blocked for τ between D·κlo and D·κhi, D = (H + G) − y (module comment).
    let klo = c / (g.ohP + R);
    let khi = INF;
    let open = false;
    const a = g.ohXl - x;
    const b = g.ohXr - x;
    if (b > 0) {
      if (s / b > klo) klo = s / b;
    } else if (b < 0) {
      if (s / b < khi) khi = s / b;
    } else if (s > 0) open = true;
    if (a < 0) {
      if (s / a > klo) klo = s / a;
    } else if (a > 0) {
      if (s / a < khi) khi = s / a;
    } else if (s < 0) open = true;
    if (!open && klo < khi) {
      oh = true;
      la[L_OH_LO] = klo * g.ohY;
      lb[L_OH_LO] = -klo;
      activeLines[n++] = L_OH_LO;
      if (khi < INF) {
        la[L_OH_HI] = khi * g.ohY;
        lb[L_OH_HI] = -khi;
        activeLines[n++] = L_OH_HI;
      } else {
        la[L_OH_HI] = INF;
        lb[L_OH_HI] = 0;
        levelA[L_OH_HI] = PI / 4;
      }
    }
  }
  let fin = false;
  if (s < 0 && g.leftFin) fin = finLines(g.lfX - x, g.lfYb, g.lfYt, g.lfP, R, s, c);
  else if (s > 0 && g.rightFin) fin = finLines(g.rfX - x, g.rfYb, g.rfYt, g.rfP, R, s, c);
  if (fin) {
    activeLines[n++] = L_FIN_LO;
    activeLines[n++] = L_FIN_HI;
  }
  // Heights where two lines cross (the horizon and the reveal's lower line meet the others only
  // where the fin crosses them: the rest stay on their own side of the horizon), sorted.
  let nb = 0;
  if (fin) {
    nb = addCrossing(L_FIN_LO, L_ZERO, H, nb);
    nb = addCrossing(L_FIN_HI, L_ZERO, H, nb);
    if (R > 0) {
      nb = addCrossing(L_FIN_LO, L_LO, H, nb);
      nb = addCrossing(L_FIN_HI, L_LO, H, nb);
    }
  }
  for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) nb = addCrossing(activeLines[i], activeLines[j], H, nb);
  lastY[L_LO] = NAN;
  lastY[L_HI] = NAN;
  lastY[L_OH_LO] = NAN;
  lastY[L_OH_HI] = NAN;
  lastY[L_FIN_LO] = NAN;
  lastY[L_FIN_HI] = NAN;
  let sky = 0;
  let ground = 0;
  let band = 0;
  let y0 = 0;
  for (let k = 0; k <= nb; k++) {
    const y1 = k < nb ? heightBreaks[k] : H;
    if (y1 > y0) {
      const ym = 0.5 * (y0 + y1);
      for (let i = 0; i < LINES; i++) {
        val[i] = la[i] + lb[i] * ym;
        coefSky[i] = 0;
        coefGround[i] = 0;
        coefBand[i] = 0;
      }
      skyTerms(low, L_HI, oh, fin, coefSky);
      skyTerms(low, lowerOf(L_HI, L_BAND), oh, fin, coefBand);
      term(1, L_LO, L_ZERO, coefGround);
      if (fin) term(-1, upperOf(L_FIN_LO, L_LO), lowerOf(L_FIN_HI, L_ZERO), coefGround);
      const dy = y1 - y0;
      for (let i = 0; i < LINES; i++) {
        const cs = coefSky[i];
        const cg = coefGround[i];
        const cb = coefBand[i];
        if (cs === 0 && cg === 0 && cb === 0) continue;
        // J = ∫ A(α + β y) dy over the segment (written out here: a call returning a number would
        // box it on every segment). [B(τ)]/β needs no other rule for nearly level lines: its rounding
        // error is about 2ε·|B(τ)/β| ≤ ε·|τ/β|·π/2, and τ/β is a height of the geometry (from the glass
        // point to the sill, the reveal head, the overhang or a fin end), so a few 1e-14 m at most.
        const b = lb[i];
        let J: number;
        if (b === 0) J = levelA[i] * dy;
        else {
          const a = la[i];
          const t1 = a + b * y1;
          const b1 = 0.5 * t1 * atan(t1);
          let b0: number;
          if (lastY[i] === y0) b0 = lastB[i];
          else {
            const t0 = a + b * y0;
            b0 = 0.5 * t0 * atan(t0);
          }
          lastY[i] = y1;
          lastB[i] = b1;
          J = (b1 - b0) / b;
        }
        sky += cs * J;
        ground += cg * J;
        band += cb * J;
      }
    }
    y0 = y1;
  }
  column.sky = sky;
  column.ground = ground;
  column.band = band;
}

/** Inserts the height in (0, H) where lines p and q cross, if any, into the sorted break list; returns the count. */
function addCrossing(p: number, q: number, H: number, nb: number): number {
  const db = lb[p] - lb[q];
  if (db === 0) return nb;
  const yc = (la[q] - la[p]) / db;
  if (!(yc > 0 && yc < H)) return nb;
  let j = nb;
  while (j > 0 && heightBreaks[j - 1] > yc) {
    heightBreaks[j] = heightBreaks[j - 1];
    j--;
  }
  heightBreaks[j] = yc;
  return nb + 1;
}

/** Sets the fin's two lines τ = (y_f − y)·k (see {@link finSlope}) for a glass line; false if the ray misses the fin. */
function finLines(e: number, yb: number, yt: number, P: number, R: number, s: number, c: number): boolean {
  const k = finSlope(e, P, R, s, c);
  if (!(k > 0)) return false;
  la[L_FIN_LO] = yb * k;
  lb[L_FIN_LO] = -k;
  la[L_FIN_HI] = yt * k;
  lb[L_FIN_HI] = -k;
  return true;
}

/**
 * The open sky, ground and band of the glass line at abscissa x, integrated over its height exactly
 * and over the azimuth by Gauss–Legendre between the breaks of its bottom and top points; written into
 * `out` as {@link pointIntegrals} does, times the height.
 */
function lineIntegrals(g: ShadowPlan, pieces: SkylinePieces, x: number, q: ViewFactorQuadrature, out: Float64Array): void {
  const [lo, hi] = azimuthRange(g, x);
  breakCount = 0;
  structuralBreaks(g, pieces, x, lo, hi);
  const br = breaks.subarray(0, breakCount);
  br.sort();
  let sky = 0;
  let ground = 0;
  let band = 0;
  let piece = 0;
  let start = lo;
  for (let i = 0; i <= breakCount; i++) {
    const end = i < breakCount ? br[i] : hi;
    const width = end - start;
    if (width > 1e-15) {
      const mid = 0.5 * (start + end);
      while (piece < pieces.n - 1 && mid >= pieces.hi[piece]) piece++;
      const t = pieces.tanElevation[piece];
      const parts = ceil(width / q.panelWidth);
      const nodes = width < 0.02 ? 2 : q.panelNodes;
      const rule = gaussLegendre(nodes);
      const h = width / parts;
      for (let k = 0; k < parts; k++) {
        const center = start + (k + 0.5) * h;
        for (let j = 0; j < nodes; j++) {
          const psi = center + 0.5 * h * rule.x[j];
          const c = cos(psi);
          heightColumn(g, x, sin(psi), c, t);
          const wt = 0.5 * h * rule.w[j] * c;
          sky += wt * column.sky;
          ground += wt * column.ground;
          band += wt * column.band;
        }
      }
    }
    start = end;
  }
  out[0] = sky;
  out[1] = ground;
  out[2] = band;
}

/**
 * A fin's break azimuth (where its depth test switches) and its two height bounds (k·sin ψ). Only the
 * outer depth limit |tan ψ| = |e| / (P + R) can fall inside the range the reveal leaves open: the inner
 * one, |e| / R, lies at or beyond the jamb's own limit (|e| = gap + x ≥ x for the left fin, and
 * likewise on the right), so it is never a break.
 */
function finBreaks(e: number, yb: number, yt: number, P: number, R: number, lo: number, hi: number, nl: number): number {
  if (e === 0) return nl;
  addBreak(atan(e / (P + R)), lo, hi);
  lBounds[nl++] = yb / e;
  lBounds[nl++] = yt / e;
  return nl;
}

/** Azimuths in [from, to] where a level τ = t > 0 meets a bound c·cos ψ or k·sin ψ. */
function crossingsWithLevel(t: number, from: number, to: number, lo: number, hi: number, nc: number, nl: number): void {
  for (let i = 0; i < nc; i++) {
    const r = t / cBounds[i];
    if (r > 0 && r < 1) {
      const psi = acos(r);
      if (psi >= from && psi <= to) addBreak(psi, lo, hi);
      if (-psi >= from && -psi <= to) addBreak(-psi, lo, hi);
    }
  }
  for (let j = 0; j < nl; j++) {
    const r = t / lBounds[j];
    if (r > -1 && r < 1) {
      const psi = asin(r);
      if (psi >= from && psi <= to) addBreak(psi, lo, hi);
    }
  }
}

/**
 * Abscissas of the glass where the line integral has a kink: where two azimuths at which the
 * integrand jumps (the reveal's jambs, a fin's outer depth limit, the skyline's sector edges, the wall
 * normal) meet, and where an overhang end stands over the glass; plus a grading towards each jamb
 * at the scale of the reveal depth, where the view changes fastest. Ascending, inside (0, W).
 */
function glassBreaks(g: ShadowPlan, pieces: SkylinePieces): number[] {
  const W = g.width;
  const R = g.reveal;
  const out: number[] = [];
  const add = (x: number) => {
    if (x > 0 && x < W) out.push(x);
  };
  // Jump azimuths of the form tan ψ = (X0 − x) / Z, each on one side of the normal (sign of ψ).
  const X0: number[] = [];
  const Z: number[] = [];
  const side: number[] = [];
  const form = (x0: number, z: number, sign: number) => {
    X0.push(x0);
    Z.push(z);
    side.push(sign);
  };
  if (R > 0) {
    form(0, R, -1);
    form(W, R, 1);
  }
  // Grading towards the jambs: devices and reveal faces meet the glass's edge lines there, where
  // the line integral behaves like x·log x.
  for (let d = W / 4; d > W * GRADE_LIMIT; d /= GRADE_RATIO) {
    add(d);
    add(W - d);
  }
  if (g.leftFin) {
    form(g.lfX, g.lfP + R, -1);
  }
  if (g.rightFin) {
    form(g.rfX, g.rfP + R, 1);
  }
  if (g.overhang) {
    add(g.ohXl);
    add(g.ohXr);
  }
  for (let i = 0; i < X0.length; i++) {
    for (let j = i + 1; j < X0.length; j++) {
      if (side[i] !== side[j] || Z[i] === Z[j]) continue;
      const x = (X0[i] * Z[j] - X0[j] * Z[i]) / (Z[j] - Z[i]);
      if ((X0[i] - x) * side[i] > 0) add(x);
    }
    for (let p = 1; p < pieces.n; p++) {
      const t = tan(pieces.lo[p]);
      if (t * side[i] > 0) add(X0[i] - Z[i] * t);
    }
  }
  out.sort((a, b) => a - b);
  const unique: number[] = [];
  for (const x of out) if (unique.length === 0 || x - unique[unique.length - 1] > 1e-9 * W) unique.push(x);
  return unique;
}

/** Can any device or the reveal cut the view (a skyline alone does not depend on the point)? */
function hasDevices(g: ShadowPlan): boolean {
  return g.overhang || g.leftFin || g.rightFin || g.reveal > 0;
}

/** Band share of a skyline alone, in closed form: Σ over pieces (sin ψ₂ − sin ψ₁)(A(τ_b) − A(min(t, τ_b))) / (2 A(τ_b)). */
function skylineBandShare(pieces: SkylinePieces): number {
  let sum = 0;
  for (let p = 0; p < pieces.n; p++) {
    const t = pieces.tanElevation[p];
    if (t >= TAN_BAND) continue;
    sum += (sin(pieces.hi[p]) - sin(pieces.lo[p])) * (BAND_A - A(t));
  }
  const share = sum / (2 * BAND_A);
  return share < 0 ? 0 : share > 1 ? 1 : share;
}

const scratch = new Float64Array(3);
/** Grading of the glass panels towards each jamb: W/4, W/16, W/64 (down to W·GRADE_LIMIT). */
const GRADE_LIMIT = 1e-2;
const GRADE_RATIO = 4;

/** The view factors of a window whose shading is already checked. */
export function viewFactorsUnchecked(window: WindowOpening, shading: Shading, surfaceAzimuth: number, quadrature: ViewFactorQuadrature = DEFAULT_QUADRATURE): WindowViewFactors {
  const g = shadowPlanOf(window.width, window.height, shading);
  const skyline = shading.skyline;
  if (!hasDevices(g)) {
    if (skyline === undefined) return { ...BARE_VIEW_FACTORS };
    const skyRatio = skylineSkyViewFactor(skyline, surfaceAzimuth);
    return { sky: skyRatio / 2, ground: 0.5, skyRatio, groundRatio: 1, horizonShare: skylineBandShare(skylinePieces(skyline, surfaceAzimuth)) };
  }
  const pieces = skylinePieces(skyline, surfaceAzimuth);
  const { width: W, height: H } = window;
  const xb = glassBreaks(g, pieces);
  let sky = 0;
  let ground = 0;
  let band = 0;
  let x0 = 0;
  for (let k = 0; k <= xb.length; k++) {
    const x1 = k < xb.length ? xb[k] : W;
    const width = x1 - x0;
    if (width > 1e-12 * W) {
      const parts = ceil(width / (W / quadrature.glassPanels));
      const h = width / parts;
      const rule = gaussLegendre(quadrature.glassNodes);
      for (let p = 0; p < parts; p++) {
        const center = x0 + (p + 0.5) * h;
        for (let i = 0; i < rule.x.length; i++) {
          lineIntegrals(g, pieces, center + 0.5 * h * rule.x[i], quadrature, scratch);
          const w = (0.5 * h * rule.w[i]) / (W * H);
          sky += w * scratch[0];
          ground += w * scratch[1];
          band += w * scratch[2];
        }
      }
    }
    x0 = x1;
  }
  return finish(sky / PI, ground / PI, band / (2 * BAND_A));
}

function clamp(v: number, top: number): number {
  return v > 0 ? (v < top ? v : top) : 0;
}

function finish(skyRaw: number, groundRaw: number, bandRaw: number): WindowViewFactors {
  const sky = clamp(skyRaw, 0.5);
  const ground = clamp(groundRaw, 0.5);
  return { sky, ground, skyRatio: 2 * sky, groundRatio: 2 * ground, horizonShare: clamp(bandRaw, 1) };
}

/**
 * View factors of a vertical window behind its overhang, fins, reveal and skyline, averaged over the
 * glass.
 *
 * @param window - glass width and height [length] > 0
 * @param shading - as for {@link sunlitFraction}: overhang, fins, reveal depth, skyline; `{}` for none
 * @param surfaceAzimuth - direction the window faces [°] clockwise from north (any finite value; it
 *   places the skyline)
 * @returns sky and ground view factors (0…½ each), their ratios to the bare window (0…1) and the open
 *   share of the horizon band (0…1); exactly ½, ½, 1, 1, 1 when nothing shades
 * @throws SunpaneError naming the shading argument (`overhangProjection`, `leftFinGap`, `skyline`, …),
 *   `width`, `height` or `surfaceAzimuth`
 * @remarks Devices, reveal faces and skyline are black; numerical error at most
 *   {@link VIEW_FACTOR_ERROR} per value (module comment).
 */
export function windowViewFactors(window: WindowOpening, shading: Shading, surfaceAzimuth: number): WindowViewFactors {
  requireShading(window, shading);
  requireFinite('surfaceAzimuth', surfaceAzimuth, '°');
  const key = cacheKey(window, shading, surfaceAzimuth);
  const hit = CACHE.get(key);
  if (hit !== undefined) return { ...hit };
  const vf = viewFactorsUnchecked(window, shading, surfaceAzimuth);
  // Stryker disable next-line ConditionalExpression,EqualityOperator: the bound on the cache's size changes memory use, never a value (every entry is the calculation's own result)
  if (CACHE.size >= CACHE_SIZE) CACHE.delete(CACHE.keys().next().value as string);
  CACHE.set(key, Object.freeze({ ...vf }));
  return vf;
}

/**
 * The last windows worked out, by geometry: a worksheet column of hourly gains, a schedule of alike
 * windows or a pane redrawing the same window asks for the same view factors again and again (about
 * a millisecond each for a window with every device and a skyline).
 */
const CACHE = new Map<string, Readonly<WindowViewFactors>>();
const CACHE_SIZE = 256;

/** Everything the view factors depend on, as text. */
function cacheKey(window: WindowOpening, shading: Shading, surfaceAzimuth: number): string {
  const o = shading.overhang;
  const l = shading.leftFin;
  const r = shading.rightFin;
  return [
    window.width,
    window.height,
    o ? `${o.projection},${o.gap},${o.extensionLeft},${o.extensionRight}` : '',
    l ? `${l.projection},${l.gap},${l.extensionAbove},${l.extensionBelow}` : '',
    r ? `${r.projection},${r.gap},${r.extensionAbove},${r.extensionBelow}` : '',
    shading.revealDepth ?? 0,
    shading.skyline ? `${surfaceAzimuth};${shading.skyline.join(',')}` : '',
  ].join('|');
}

/**
 * View factors of one point of the glass (not averaged): what a small piece of glass at (x, y) sees.
 *
 * @param window - glass width and height [length] > 0
 * @param shading - as for {@link windowViewFactors}
 * @param surfaceAzimuth - [°] clockwise from north
 * @param x - distance from the left jamb seen from outside [length], 0…width
 * @param y - height above the sill [length], 0…height
 * @returns sky and ground view factors of the point (0…½) and its open share of the horizon band (0…1)
 * @throws SunpaneError naming the argument
 */
export function pointViewFactors(window: WindowOpening, shading: Shading, surfaceAzimuth: number, x: number, y: number): { sky: number; ground: number; horizonShare: number } {
  requireShading(window, shading);
  requireFinite('surfaceAzimuth', surfaceAzimuth, '°');
  requireRange('x', x, 0, window.width);
  requireRange('y', y, 0, window.height);
  return pointViewFactorsUnchecked(window, shading, surfaceAzimuth, x, y);
}

/** The view factors of one glass point whose arguments are already checked, with a chosen quadrature (the tests' finer grids). */
export function pointViewFactorsUnchecked(window: WindowOpening, shading: Shading, surfaceAzimuth: number, x: number, y: number, quadrature: ViewFactorQuadrature = DEFAULT_QUADRATURE): { sky: number; ground: number; horizonShare: number } {
  const g = shadowPlanOf(window.width, window.height, shading);
  pointIntegrals(g, skylinePieces(shading.skyline, surfaceAzimuth), x, y, quadrature, scratch);
  const f = finish(scratch[0] / PI, scratch[1] / PI, scratch[2] / (2 * BAND_A));
  return { sky: f.sky, ground: f.ground, horizonShare: f.horizonShare };
}
