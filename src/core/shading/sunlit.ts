/**
 * Sunlit fraction of a window in a vertical wall, shaded by an overhang, left and right fins, a
 * reveal (glass set back behind the wall face) and a skyline — by exact shadow polygons.
 *
 * Geometry (docs/conventions.md#window-shading-geometry). Coordinates in the plane of the wall face, seen
 * from outside: x to the right, y up, origin at the lower-left corner of the wall opening; z is the
 * outward normal. The glass (width W, height H) lies a reveal depth R behind the wall face; the
 * overhang and fins are thin plates standing out from the wall face (z = 0 … P). With the sun
 * direction s = (sx, sy, sz) — sx = cos β sin γ, sy = sin β, sz = cos β cos γ, β the sun altitude,
 * γ = surface azimuth − sun azimuth, the horizontal shadow angle of src/core/sun/surfaceAngles.ts
 * (`wallSolarAzimuth`: positive when the sun is to the RIGHT as seen from outside) — a point at
 * depth d in front of the wall casts its shadow on the wall plane displaced by (−a·d, −b·d) with
 *
 *   a = sx / sz = tan γ,   b = sy / sz = tan β / cos γ = tan Ω (Ω the profile angle).
 *
 * The ray from a glass point (x, y) to the sun crosses the wall plane at (x + a·R, y + b·R): a
 * translation, so areas are kept. Then
 * - reveal: the ray leaves the reveal box through its open front face exactly when that crossing
 *   lies in the opening [0, W] × [0, H] (the box is convex) — the sill never shades a sun above the
 *   horizon; the lit part is the rectangle (glass + (aR, bR)) ∩ opening;
 * - overhang (projection P, gap G above the head, extensions EL/ER): the plate y = H + G,
 *   x ∈ [−EL, W + ER], z ∈ [0, P] casts the parallelogram (−EL, H+G), (W+ER, H+G),
 *   (W+ER − aP, H+G − bP), (−EL − aP, H+G − bP) — two horizontal edges;
 * - fins (projection P, gap g from the jamb, extensions EA above the head / EB below the sill): the
 *   plate x = −g (left) or W + g (right), y ∈ [−EB, H + EA] casts a parallelogram with two vertical
 *   edges, likewise.
 * A glass point is sunlit when its wall-plane point is in the lit rectangle and in no shadow
 * parallelogram, so the sunlit area = area(lit rectangle) − area(lit rectangle ∩ (S1 ∪ S2 ∪ S3)),
 * the union taken by inclusion–exclusion (overhang + fin − overhang ∩ fin: for any sun at most one
 * fin's shadow reaches the opening, the other falls on the far side of its fin). Overlapping shadows
 * are counted once, never summed. Each shadow has two edges along an axis and two along the sun's
 * direction on the wall, so with w = sin β·x − cos β sin γ·y (constant along that direction) it is a
 * box of intervals in (x, y, w); every intersection with the lit rectangle is again such a box, a
 * rectangle cut by a strip, whose area is a closed form ({@link rectangleStripArea},
 * src/core/shading/polygon.ts) — exact, without polygon clipping.
 *
 * Choice of union method (measured on this 2-core machine, annual series of the `npm run bench`
 * window: overhang + two fins + reveal + skyline): the closed form takes the series from about
 * 4.4 ms to 3.4 ms a year against the previous convex clipper with inclusion–exclusion (Sutherland–
 * Hodgman clips within bounding boxes), which in turn took 0.7 µs per evaluation against 30 µs for
 * `polygon-clipping` 0.15.7's general union. The convex clipper stays (src/core/shading/polygon.ts) as the
 * independent check: tests/core/gain/preparedFast.test.ts holds the closed form to it within 1e-12 of
 * the glazed area over 10 000 random cases, and tests/reference/polygon-clipping-union.test.ts
 * holds the clipper to polygon-clipping.
 *
 * The method itself is plain projective geometry (shadow of a point along the sun direction onto a
 * plane); the profile-angle and horizontal-shadow-angle forms of a and b are the usual ones of
 * building-shading texts (e.g. ASHRAE Handbook—Fundamentals, "Fenestration", exterior shading;
 * Duffie & Beckman, *Solar Engineering of Thermal Processes*, §1.9 "Shading" — from memory).
 *
 * Vertical walls only: the functions take no tilt. Callers with a tilted window and shading devices
 * use {@link requireVerticalForShading} to refuse it.
 */
import { RAD, wrap180, SunpaneError, describeValue, requireFinite, requireRange } from '../common';
import { writeQuadHalfPlanes } from './polygon';
import { shadowPlanOf, sunlitFromPlan, sunlitFromPlanRows } from './shadowPlan';
import { requireSkyline, skylineElevationUnchecked } from './skyline';
import type { Fin, Overhang, Shading } from './types';


const { abs, cos, floor, max, min, sin } = Math;

/** The glass of a window: width and height in one length unit (only ratios matter). */
export interface WindowOpening {
  /** [length] > 0 */
  width: number;
  /** [length] > 0 */
  height: number;
}

/** The argument names errors give for each field of a shading description. */
export interface ShadingNames {
  shading: string;
  overhang: { projection: string; gap: string; extensionLeft: string; extensionRight: string };
  leftFin: { projection: string; gap: string; extensionAbove: string; extensionBelow: string };
  rightFin: { projection: string; gap: string; extensionAbove: string; extensionBelow: string };
  revealDepth: string;
  skyline: string;
}

/** The flat names of the worksheet functions (`overhangProjection`, `leftFinGap`, …). */
export const FLAT_SHADING_NAMES: ShadingNames = {
  shading: 'shading',
  overhang: { projection: 'overhangProjection', gap: 'overhangGap', extensionLeft: 'overhangExtensionLeft', extensionRight: 'overhangExtensionRight' },
  leftFin: { projection: 'leftFinProjection', gap: 'leftFinGap', extensionAbove: 'leftFinExtensionAbove', extensionBelow: 'leftFinExtensionBelow' },
  rightFin: { projection: 'rightFinProjection', gap: 'rightFinGap', extensionAbove: 'rightFinExtensionAbove', extensionBelow: 'rightFinExtensionBelow' },
  revealDepth: 'revealDepth',
  skyline: 'skyline',
};

/** The path names of a window description (`shading.overhang.projection`, `shading.leftFin.gap`, …). */
export const PATH_SHADING_NAMES: ShadingNames = {
  shading: 'shading',
  overhang: { projection: 'shading.overhang.projection', gap: 'shading.overhang.gap', extensionLeft: 'shading.overhang.extensionLeft', extensionRight: 'shading.overhang.extensionRight' },
  leftFin: { projection: 'shading.leftFin.projection', gap: 'shading.leftFin.gap', extensionAbove: 'shading.leftFin.extensionAbove', extensionBelow: 'shading.leftFin.extensionBelow' },
  rightFin: { projection: 'shading.rightFin.projection', gap: 'shading.rightFin.gap', extensionAbove: 'shading.rightFin.extensionAbove', extensionBelow: 'shading.rightFin.extensionBelow' },
  revealDepth: 'shading.revealDepth',
  skyline: 'shading.skyline',
};

const OVERHANG_NAMES = FLAT_SHADING_NAMES.overhang;

/** An optional bound on every device length, with its unit, for callers that work in real units (a window description in metres). */
export interface LengthLimit {
  max: number;
  unit: string;
}

/** A device length: ≥ 0 (or any sign for extensions), finite, and within ±limit.max when a limit is given. */
function requireLength(argument: string, value: number, signed: boolean, limit?: LengthLimit): void {
  if (limit) requireRange(argument, value, signed ? -limit.max : 0, limit.max, limit.unit);
  else if (signed) requireFinite(argument, value);
  else requireRange(argument, value, 0, undefined);
}

/**
 * Checks a window opening.
 * @throws SunpaneError naming `width` or `height` when not a finite number above 0
 */
export function requireWindowOpening(window: WindowOpening): WindowOpening {
  if (window === null || typeof window !== 'object') throw new SunpaneError('width', window, 'must be a window of width and height above 0');
  requireRange('width', window.width, 0, undefined, undefined, { exclusiveMin: true });
  requireRange('height', window.height, 0, undefined, undefined, { exclusiveMin: true });
  return window;
}

/** Checks an overhang for a window of width `width`. Errors name `overhangProjection`, `overhangGap`, `overhangExtensionLeft`, `overhangExtensionRight`. */
export function requireOverhang(overhang: Overhang, width: number, names: ShadingNames['overhang'] = OVERHANG_NAMES, limit?: LengthLimit): Overhang {
  if (overhang === null || typeof overhang !== 'object') throw new SunpaneError(names.projection, overhang, 'must be an overhang (projection, gap, extensionLeft, extensionRight)');
  requireLength(names.projection, overhang.projection, false, limit);
  requireLength(names.gap, overhang.gap, false, limit);
  requireLength(names.extensionLeft, overhang.extensionLeft, true, limit);
  requireLength(names.extensionRight, overhang.extensionRight, true, limit);
  if (width + overhang.extensionLeft + overhang.extensionRight < 0) {
    // Name the extension that cuts more: it is the one most likely mistyped.
    const left = overhang.extensionLeft <= overhang.extensionRight;
    const name = left ? names.extensionLeft : names.extensionRight;
    const other = left ? overhang.extensionRight : overhang.extensionLeft;
    throw new SunpaneError(name, left ? overhang.extensionLeft : overhang.extensionRight, `must be at least ${describeValue(-(width + other))}`, 'the overhang width, window width + left + right extension, must not be negative');
  }
  return overhang;
}

/** Checks a fin for a window of height `height`; `names` gives the argument names for errors. */
function requireFin(fin: Fin, height: number, names: ShadingNames['leftFin'], limit?: LengthLimit): Fin {
  if (fin === null || typeof fin !== 'object') throw new SunpaneError(names.projection, fin, 'must be a fin (projection, gap, extensionAbove, extensionBelow)');
  requireLength(names.projection, fin.projection, false, limit);
  requireLength(names.gap, fin.gap, false, limit);
  requireLength(names.extensionAbove, fin.extensionAbove, true, limit);
  requireLength(names.extensionBelow, fin.extensionBelow, true, limit);
  if (height + fin.extensionAbove + fin.extensionBelow < 0) {
    const above = fin.extensionAbove <= fin.extensionBelow;
    const name = above ? names.extensionAbove : names.extensionBelow;
    const other = above ? fin.extensionBelow : fin.extensionAbove;
    throw new SunpaneError(name, above ? fin.extensionAbove : fin.extensionBelow, `must be at least ${describeValue(-(height + other))}`, 'the fin height, window height + extension above + extension below, must not be negative');
  }
  return fin;
}

/**
 * Checks a complete shading description for a window. Errors name the fields by `names`: the
 * worksheet functions' flat names by default (`overhangProjection`, `leftFinGap`, `revealDepth`,
 * `skyline`, …), or a window description's paths ({@link PATH_SHADING_NAMES}).
 */
export function requireShading(window: WindowOpening, shading: Shading, names: ShadingNames = FLAT_SHADING_NAMES, limit?: LengthLimit): Shading {
  requireWindowOpening(window);
  if (shading === null || typeof shading !== 'object') throw new SunpaneError(names.shading, shading, 'must be a shading description (an object, {} for none)');
  if (shading.overhang !== undefined) requireOverhang(shading.overhang, window.width, names.overhang, limit);
  if (shading.leftFin !== undefined) requireFin(shading.leftFin, window.height, names.leftFin, limit);
  if (shading.rightFin !== undefined) requireFin(shading.rightFin, window.height, names.rightFin, limit);
  if (shading.revealDepth !== undefined) requireLength(names.revealDepth, shading.revealDepth, false, limit);
  if (shading.skyline !== undefined) requireSkyline(shading.skyline, names.skyline);
  return shading;
}

/** True when the shading set holds any device or a skyline (a reveal of depth 0 is none). */
export function hasShading(shading: Shading): boolean {
  return shading.overhang !== undefined || shading.leftFin !== undefined || shading.rightFin !== undefined || (shading.revealDepth ?? 0) > 0 || shading.skyline !== undefined;
}

/**
 * Refuses shading devices on a window that is not vertical: the shadow polygons and the view factors
 * (src/core/shading/viewFactors.ts) are worked out for a vertical wall, where the devices stand
 * square to the glass and the horizon crosses it level. A skyline alone would do for the beam at any
 * tilt, but its sky view is for vertical windows too, so it is refused as well.
 * @throws SunpaneError naming `surfaceTilt` when tilt ≠ 90° and any device or skyline is given
 */
export function requireVerticalForShading(surfaceTilt: number, shading: Shading): void {
  if (hasShading(shading) && surfaceTilt !== 90) {
    throw new SunpaneError(
      'surfaceTilt',
      surfaceTilt,
      'must be 90 ° (a vertical wall) when shading devices or a skyline are given',
      'the shadows and the sky and ground view factors of overhangs, fins, reveals and skylines are worked out for vertical walls only; remove the devices or skyline for a tilted window',
    );
  }
}

/** The sun direction in the wall frame, reduced to the two shadow slopes. */
interface ShadowSlopes {
  /** tan γ (γ positive with the sun to the right): shadow x-shift per unit depth is −a. */
  a: number;
  /** tan Ω (profile angle): shadow y-shift per unit depth is −b. */
  b: number;
  /** sy = sin β and −sx = −cos β sin γ: w = p·x + q·y is constant along the sun's direction on the wall. */
  p: number;
  q: number;
}

const slopes: ShadowSlopes = { a: 0, b: 0, p: 0, q: 0 };

/**
 * Fills {@link slopes} for a sun above the horizon and in front of the wall; returns false when the
 * sun is at or below the horizon or at or behind the wall plane.
 */
function sunSlopes(sunAltitude: number, sunAzimuth: number, surfaceAzimuth: number): boolean {
  if (!(sunAltitude > 0)) return false;
  const gamma = wrap180(surfaceAzimuth - sunAzimuth); // horizontal shadow angle, + = sun to the right
  // Decide "in the wall plane" on the degrees: cos(90° in radians) is 6e-17, not 0.
  if (gamma <= -90 || gamma >= 90) return false;
  const betaRad = sunAltitude * RAD;
  const gammaRad = gamma * RAD;
  return slopesFrom(sin(betaRad), cos(betaRad), sin(gammaRad), cos(gammaRad));
}

/** Fills {@link slopes} from the sines and cosines of β and γ; false when the sun is not in front (sz ≤ 0). */
function slopesFrom(sinBeta: number, cosBeta: number, sinGamma: number, cosGamma: number): boolean {
  const sz = cosBeta * cosGamma;
  if (!(sz > 0)) return false;
  slopes.a = (cosBeta * sinGamma) / sz; // a = sx / sz = tan γ
  slopes.b = sinBeta / sz; // b = sy / sz = tan β / cos γ = tan Ω
  slopes.p = sinBeta;
  slopes.q = -cosBeta * sinGamma;
  return true;
}

// Per-call scratch (no allocation on the hourly path): up to 3 shadow quadrilaterals × 4 half-planes
// for the point test {@link pointSunlit}.
const planes = new Float64Array(3 * 4 * 3);
let lit0x = 0;
let lit0y = 0;
let lit1x = 0;
let lit1y = 0;

/**
 * Builds the lit rectangle and the shadow parallelograms for the current {@link slopes} as
 * half-planes (for the point test); returns the number of shadows that can touch the lit rectangle
 * (their half-planes in {@link planes}).
 */
function buildShadows(width: number, height: number, shading: Shading): number {
  const { a, b } = slopes;
  const r = shading.revealDepth ?? 0;
  // Lit rectangle: (glass shifted by (aR, bR)) ∩ opening [0, W] × [0, H].
  lit0x = max(0, a * r);
  lit1x = min(width, width + a * r);
  lit0y = max(0, b * r);
  lit1y = min(height, height + b * r);
  let m = 0;
  const oh = shading.overhang;
  if (oh && oh.projection > 0) {
    const y = height + oh.gap;
    const xl = -oh.extensionLeft;
    const xr = width + oh.extensionRight;
    const dx = -a * oh.projection;
    const dy = -b * oh.projection;
    if (overlapsLit(min(xl, xl + dx), max(xr, xr + dx), y + dy, y) && writeQuadHalfPlanes(planes, m * 4, xl, y, xr, y, xr + dx, y + dy, xl + dx, y + dy)) m++;
  }
  const lf = shading.leftFin;
  if (lf && lf.projection > 0) m = addFin(m, -lf.gap, lf, height);
  const rf = shading.rightFin;
  if (rf && rf.projection > 0) m = addFin(m, width + rf.gap, rf, height);
  return m;
}

function addFin(m: number, x: number, fin: Fin, height: number): number {
  const yb = -fin.extensionBelow;
  const yt = height + fin.extensionAbove;
  const dx = -slopes.a * fin.projection;
  const dy = -slopes.b * fin.projection;
  if (overlapsLit(min(x, x + dx), max(x, x + dx), yb + dy, yt) && writeQuadHalfPlanes(planes, m * 4, x, yb, x, yt, x + dx, yt + dy, x + dx, yb + dy)) return m + 1;
  return m;
}

/** Does the box [x0, x1] × [y0, y1] overlap the lit rectangle with positive area? */
function overlapsLit(x0: number, x1: number, y0: number, y1: number): boolean {
  return x1 > lit0x && x0 < lit1x && y1 > lit0y && y0 < lit1y;
}

function requireSunAngles(sunAltitude: number, sunAzimuth: number, surfaceAzimuth: number): void {
  requireRange('sunAltitude', sunAltitude, -90, 90, '°');
  requireFinite('sunAzimuth', sunAzimuth, '°');
  requireFinite('surfaceAzimuth', surfaceAzimuth, '°');
}

/**
 * Sunlit fraction of the glass of a window in a vertical wall.
 *
 * @param window - glass width and height [length] > 0
 * @param shading - overhang, left / right fins (as seen from outside), reveal depth [length] ≥ 0
 *   and skyline [°]; every part optional, `{}` for none. A device of projection 0 casts no shadow.
 * @param sunAltitude - sun altitude [°] −90…90
 * @param sunAzimuth - sun azimuth [°] clockwise from north (any finite value, wrapped)
 * @param surfaceAzimuth - direction the window faces [°] clockwise from north (any finite value)
 * @returns the sunlit share of the glass area, 0…1. Returns 0 when the sun is at or below the
 * horizon, at or behind the wall plane (|sun azimuth − surface azimuth| ≥ 90°), or below the
 * skyline at its azimuth.
 * @throws SunpaneError naming `width`, `height`, `overhangProjection`, `overhangGap`,
 * `overhangExtensionLeft`/`Right` (also when the overhang's width W + EL + ER is negative),
 * `leftFinProjection`, `leftFinGap`, `leftFinExtensionAbove`/`Below` (also when the fin's height
 * H + EA + EB is negative), the same for `rightFin…`, `revealDepth`, `skyline`, `sunAltitude`,
 * `sunAzimuth` or `surfaceAzimuth`.
 * @remarks Exact shadow polygons united by inclusion–exclusion — see the module comment for the
 * formulas (a = tan γ, b = tan Ω) and the measured choice of the union method.
 */
export function sunlitFraction(window: WindowOpening, shading: Shading, sunAltitude: number, sunAzimuth: number, surfaceAzimuth: number): number {
  requireShading(window, shading);
  requireSunAngles(sunAltitude, sunAzimuth, surfaceAzimuth);
  return sunlitKernel(window.width, window.height, shading, hasShadingParts(shading), sunAltitude, sunAzimuth, surfaceAzimuth);
}

/**
 * The one implementation behind {@link sunlitFraction} and {@link prepareShading}: inputs already
 * checked; `shades` false when nothing can shade the glass (then 1 whenever the sun is in front).
 */
function sunlitKernel(width: number, height: number, shading: Shading, shades: boolean, sunAltitude: number, sunAzimuth: number, surfaceAzimuth: number): number {
  if (!sunSlopes(sunAltitude, sunAzimuth, surfaceAzimuth)) return 0;
  return sunlitAfterSlopes(width, height, shading, shades, sunAltitude, sunAzimuth);
}

/** The rest of {@link sunlitKernel} once {@link slopes} hold a sun above the horizon in front of the wall. */
function sunlitAfterSlopes(width: number, height: number, shading: Shading, shades: boolean, sunAltitude: number, sunAzimuth: number): number {
  if (!shades) return 1; // = (W·H − 0) / (W·H): the lit rectangle is the whole glass
  if (shading.skyline && sunAltitude < skylineElevationUnchecked(shading.skyline, sunAzimuth)) return 0;
  return sunlitFromPlan(shadowPlanOf(width, height, shading), slopes.a, slopes.b, slopes.p, slopes.q);
}

/** Can anything shade the glass: a device with projection above 0, a reveal or a skyline? */
function hasShadingParts(shading: Shading): boolean {
  return (
    (shading.overhang !== undefined && shading.overhang.projection > 0) ||
    (shading.leftFin !== undefined && shading.leftFin.projection > 0) ||
    (shading.rightFin !== undefined && shading.rightFin.projection > 0) ||
    (shading.revealDepth ?? 0) > 0 ||
    shading.skyline !== undefined
  );
}

/** A window's shading checked once, to evaluate at many sun positions (e.g. every hour of a year). */
export interface PreparedShading {
  /** False when nothing can shade the glass (no device with projection above 0, no reveal, no skyline). */
  readonly shades: boolean;
  /**
   * Sunlit fraction of the glass, the same result as {@link sunlitFraction} for the prepared window
   * and wall, without argument checks.
   * @param sunAltitude - [°], a finite number (not checked)
   * @param sunAzimuth - [°] clockwise from north, a finite number (not checked)
   * @returns 0…1; 0 with the sun at or below the horizon, at or behind the wall plane or below the skyline
   */
  sunlit(sunAltitude: number, sunAzimuth: number): number;
  /**
   * {@link sunlit} for a caller that already has the sun's angles in the wall frame (the annual
   * series): same result, without recomputing them.
   * @param sunAltitude - β [°], finite (not checked)
   * @param sunAzimuth - [°], finite (not checked)
   * @param gamma - `wrap180(surfaceAzimuth − sunAzimuth)` [°] (src/core/common/angles.ts), the horizontal shadow angle
   * @param sinBeta - sin β; @param cosBeta - cos β
   * @param sinGamma - sin γ; @param cosGamma - cos γ (γ converted to radians as `gamma * RAD`)
   * @returns as {@link sunlit}
   */
  sunlitInWallFrame(sunAltitude: number, sunAzimuth: number, gamma: number, sinBeta: number, cosBeta: number, sinGamma: number, cosGamma: number): number;
  /**
   * {@link sunlitInWallFrame} for many rows (e.g. the hours of a year): for each row i = rows[k],
   * k < count, the sun is read from the columns of `sun` at i and the sunlit fraction written to
   * out[i] — the same numbers, without a call per row (the hourly path passes no number through a
   * call, which the engine would box). Rows not listed are left as they are.
   * @param rows - the rows to work out (each below the columns' and `out`'s length)
   * @param count - how many of `rows`
   * @param sun - the sun by row in the wall frame
   * @param out - filled with the sunlit fraction, 0…1, at each listed row
   */
  sunlitOfRows(rows: Int32Array, count: number, sun: WallFrameColumns, out: Float64Array): void;
}

/**
 * Checks a window's shading once and returns a sunlit-fraction function for many sun positions.
 * @param window - glass width and height [length] > 0
 * @param shading - as for {@link sunlitFraction}; copied, so later changes to it do not bypass the checks
 * @param surfaceAzimuth - direction the window faces [°] clockwise from north (any finite value)
 * @returns {@link PreparedShading}
 * @throws SunpaneError naming the argument, as {@link sunlitFraction}
 * @remarks Same kernel as {@link sunlitFraction} (exact shadow polygons; see the module comment);
 * only the checks are done once instead of per call.
 */
export function prepareShading(window: WindowOpening, shading: Shading, surfaceAzimuth: number): PreparedShading {
  requireShading(window, shading);
  requireFinite('surfaceAzimuth', surfaceAzimuth, '°');
  const { width, height } = window;
  const copy: Shading = {};
  if (shading.overhang) copy.overhang = { ...shading.overhang };
  if (shading.leftFin) copy.leftFin = { ...shading.leftFin };
  if (shading.rightFin) copy.rightFin = { ...shading.rightFin };
  if (shading.revealDepth !== undefined) copy.revealDepth = shading.revealDepth;
  if (shading.skyline !== undefined) copy.skyline = [...shading.skyline];
  const shades = hasShadingParts(copy);
  const plan = shadowPlanOf(width, height, copy);
  const skyline = copy.skyline;
  const sectors = skyline === undefined ? 0 : skyline.length;
  return {
    shades,
    sunlit: (sunAltitude, sunAzimuth) => sunlitKernel(width, height, copy, shades, sunAltitude, sunAzimuth, surfaceAzimuth),
    sunlitInWallFrame: (sunAltitude, sunAzimuth, gamma, sinBeta, cosBeta, sinGamma, cosGamma) => {
      const one = ONE_SUN;
      one.altitude[0] = sunAltitude;
      one.azimuth[0] = sunAzimuth;
      one.sinAltitude[0] = sinBeta;
      one.cosAltitude[0] = cosBeta;
      one.gamma[0] = gamma;
      one.sinGamma[0] = sinGamma;
      one.cosGamma[0] = cosGamma;
      sunlitOfRows(ONE_ROW, 1, one, one.out);
      return one.out[0];
    },
    sunlitOfRows,
  };

  /** The one implementation of {@link PreparedShading.sunlitOfRows} and (one row) sunlitInWallFrame. */
  function sunlitOfRows(rows: Int32Array, count: number, sun: WallFrameColumns, out: Float64Array): void {
    const { altitude, azimuth, sinAltitude, cosAltitude, gamma, sinGamma, cosGamma } = sun;
    const s = planScratch(out.length);
    let m = 0;
    for (let k = 0; k < count; k++) {
      const i = rows[k];
      const sunAltitude = altitude[i];
      const g = gamma[i];
      // The tests of sunSlopes and slopesFrom, in the same order, on the caller's values.
      if (!(sunAltitude > 0) || g <= -90 || g >= 90) {
        out[i] = 0;
        continue;
      }
      const cosBeta = cosAltitude[i];
      const sz = cosBeta * cosGamma[i];
      if (!(sz > 0)) {
        out[i] = 0;
        continue;
      }
      if (!shades) {
        out[i] = 1;
        continue;
      }
      if (skyline !== undefined) {
        const sunAzimuth = azimuth[i];
        // skylineElevationUnchecked (src/core/shading/skyline.ts) without its wrap for an azimuth already in 0…360.
        if (sunAzimuth >= 0 && sunAzimuth < 360) {
          const j = floor((sunAzimuth * sectors) / 360);
          if (sunAltitude < skyline[j >= sectors ? sectors - 1 : j]) {
            out[i] = 0;
            continue;
          }
        } else if (sunAltitude < skylineElevationUnchecked(skyline, sunAzimuth)) {
          out[i] = 0;
          continue;
        }
      }
      const sinBeta = sinAltitude[i];
      const q = -cosBeta * sinGamma[i];
      s.a[i] = -q / sz; // a = sx / sz, b = sy / sz (as slopesFrom)
      s.b[i] = sinBeta / sz;
      s.p[i] = sinBeta;
      s.q[i] = q;
      s.rows[m++] = i;
    }
    if (m > 0) sunlitFromPlanRows(plan, s.rows, m, s.a, s.b, s.p, s.q, out);
  }
}

/** The sun by row in the wall frame, as {@link PreparedShading.sunlitOfRows} reads it. */
export interface WallFrameColumns {
  /** β [°] and the sun's azimuth [°] (finite, not checked). */
  altitude: Float64Array;
  azimuth: Float64Array;
  /** sin β and cos β. */
  sinAltitude: Float64Array;
  cosAltitude: Float64Array;
  /** γ = `wrap180(surfaceAzimuth − sunAzimuth)` [°], and its sine and cosine (γ in radians as `gamma * RAD`). */
  gamma: Float64Array;
  sinGamma: Float64Array;
  cosGamma: Float64Array;
}

/** One row of wall-frame sun and its result, for sunlitInWallFrame. */
const ONE_ROW = new Int32Array(1);
const ONE_SUN = {
  altitude: new Float64Array(1),
  azimuth: new Float64Array(1),
  sinAltitude: new Float64Array(1),
  cosAltitude: new Float64Array(1),
  gamma: new Float64Array(1),
  sinGamma: new Float64Array(1),
  cosGamma: new Float64Array(1),
  out: new Float64Array(1),
};

/** Scratch of sunlitOfRows: the rows that reach the shadow plan and their a, b, p, q (one call runs at a time). */
let PLAN_SCRATCH = { rows: new Int32Array(0), a: new Float64Array(0), b: new Float64Array(0), p: new Float64Array(0), q: new Float64Array(0) };

function planScratch(n: number): typeof PLAN_SCRATCH {
  if (PLAN_SCRATCH.rows.length < n) {
    const size = max(n, 8784);
    PLAN_SCRATCH = { rows: new Int32Array(size), a: new Float64Array(size), b: new Float64Array(size), p: new Float64Array(size), q: new Float64Array(size) };
  }
  return PLAN_SCRATCH;
}

/**
 * Is one point of the glass in the sun?
 *
 * @param window - glass width and height [length] > 0
 * @param shading - as for {@link sunlitFraction}
 * @param x - distance from the left jamb, seen from outside [length], 0…width
 * @param y - height above the sill [length], 0…height
 * @param sunAltitude - [°] −90…90
 * @param sunAzimuth - [°] clockwise from north
 * @param surfaceAzimuth - [°] clockwise from north
 * @returns 1 when the point sees the sun, 0 when it is shaded, or the sun is at or below the
 * horizon, behind the wall or below the skyline. A point exactly on a shadow edge counts as shaded.
 * @remarks Same geometry as {@link sunlitFraction}: the point's ray crosses the wall plane at
 * (x + aR, y + bR), which must lie in the opening and outside every shadow parallelogram.
 */
export function pointSunlit(window: WindowOpening, shading: Shading, x: number, y: number, sunAltitude: number, sunAzimuth: number, surfaceAzimuth: number): 0 | 1 {
  requireShading(window, shading);
  requireRange('x', x, 0, window.width);
  requireRange('y', y, 0, window.height);
  requireSunAngles(sunAltitude, sunAzimuth, surfaceAzimuth);
  if (!sunSlopes(sunAltitude, sunAzimuth, surfaceAzimuth)) return 0;
  if (shading.skyline && sunAltitude < skylineElevationUnchecked(shading.skyline, sunAzimuth)) return 0;
  const m = buildShadows(window.width, window.height, shading);
  const r = shading.revealDepth ?? 0;
  const px = x + slopes.a * r;
  const py = y + slopes.b * r;
  if (px < lit0x || px > lit1x || py < lit0y || py > lit1y || !(lit1x > lit0x && lit1y > lit0y)) return 0;
  for (let i = 0; i < m; i++) {
    let inside = true;
    for (let k = i * 12; k < i * 12 + 12; k += 3) {
      if (planes[k] * px + planes[k + 1] * py > planes[k + 2]) {
        inside = false;
        break;
      }
    }
    if (inside) return 0;
  }
  return 1;
}

/**
 * Depth of the shadow of an infinitely wide overhang below its edge on the wall.
 *
 * @param projection - overhang depth out from the wall [length] ≥ 0
 * @param sunAltitude - [°] −90…90
 * @param sunAzimuth - [°] clockwise from north
 * @param surfaceAzimuth - [°] clockwise from north
 * @returns P · tan Ω [length] ≥ 0, Ω the profile angle (tan Ω = tan β / cos γ); `null` when the sun
 * is at or below the horizon or at or behind the wall plane (no shadow is cast by the sun).
 * @remarks Vertical shadow length from the profile angle, e.g. ASHRAE Handbook—Fundamentals,
 * "Fenestration", exterior shading (from memory).
 */
export function shadowDepth(projection: number, sunAltitude: number, sunAzimuth: number, surfaceAzimuth: number): number | null {
  requireRange('projection', projection, 0, undefined);
  requireSunAngles(sunAltitude, sunAzimuth, surfaceAzimuth);
  if (!sunSlopes(sunAltitude, sunAzimuth, surfaceAzimuth)) return null;
  return projection * slopes.b; // Eq.: depth = P tan Ω
}

/**
 * Width of the shadow of an infinitely tall fin beside it on the wall.
 *
 * @param projection - fin depth out from the wall [length] ≥ 0
 * @param sunAltitude - [°] −90…90
 * @param sunAzimuth - [°] clockwise from north
 * @param surfaceAzimuth - [°] clockwise from north
 * @returns P · |tan γ| [length] ≥ 0, γ the horizontal shadow angle (wall-solar azimuth); the shadow
 * falls on the side away from the sun. `null` when the sun is at or below the horizon or at or
 * behind the wall plane.
 * @remarks Horizontal shadow length from the horizontal shadow angle, e.g. ASHRAE
 * Handbook—Fundamentals, "Fenestration", exterior shading (from memory).
 */
export function shadowWidth(projection: number, sunAltitude: number, sunAzimuth: number, surfaceAzimuth: number): number | null {
  requireRange('projection', projection, 0, undefined);
  requireSunAngles(sunAltitude, sunAzimuth, surfaceAzimuth);
  if (!sunSlopes(sunAltitude, sunAzimuth, surfaceAzimuth)) return null;
  return projection * abs(slopes.a); // Eq.: width = P |tan γ|
}
