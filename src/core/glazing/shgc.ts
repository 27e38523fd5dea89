/**
 * Angle-dependent solar heat gain coefficient (SHGC) of a window's glazing, its hemispherical
 * (diffuse) value, the interior attenuation coefficient and the glass area.
 *
 * Three sources of the angular shape, chosen by the glazing type:
 * - `clear` / `tinted`: uncoated panes by Fresnel reflection and absorption ({@link shgcAtAngle});
 * - `coated`: low-e and spectrally selective units by Karlsson & Roos (2000) ({@link karlssonRoosModel});
 * - `table`: the user's table of SHGC by incidence angle ({@link shgcFromTable}), interpolated
 *   shape-preservingly (Fritsch & Carlson 1980).
 * SHGC at an incidence of 90° or more (sun behind the glass) is 0.
 */
import { SunpaneError, requireRange, hemisphericalAverage, type MonotoneCubic, monotoneCubic } from '../common';
import { paneExtinctionFor, paneStackTransmittance } from './fresnel';
import { KR_TYPE_PARAMETER_MAX, KR_TYPE_PARAMETER_MIN, karlssonRoosModel } from './karlssonRoos';
import type { AngleTable, Glazing, GlazingType, ShgcBasis } from './types';

const { round } = Math;
const { isNaN: numberIsNaN } = Number;
const NAN = Number.NaN;

/** Panes accepted by the physical model. */
export const PANES_MIN = 1;
export const PANES_MAX = 4;
/** Smallest gap between two angles of a table [°]: closer rows carry no information and make slopes blow up. */
export const TABLE_MIN_SPACING = 0.01;
/** Step of the precomputed lookup in an {@link ShgcCurve} [°]. */
export const CURVE_STEP = 0.1;

/** An SHGC curve prepared for fast repeated use (e.g. 8760 hours). */
export interface ShgcCurve {
  /**
   * SHGC at an incidence angle [°], 0…180 (≥ 90 gives 0), from a precomputed 0.1° table with
   * linear interpolation; no allocation per call. Throws SunpaneError `incidence` for other values.
   */
  atAngle(incidence: number): number;
  /** Hemispherical (diffuse) SHGC [-]. */
  diffuse: number;
  /** SHGC at normal incidence [-]. */
  normal: number;
}

function requireShgc(argument: string, value: unknown): number {
  return requireRange(argument, value, 0, 1);
}

function requirePanes(argument: string, value: unknown): number {
  return requireRange(argument, value, PANES_MIN, PANES_MAX, undefined, { integer: true });
}

function requireIncidence(value: unknown, argument = 'incidence'): number {
  return requireRange(argument, value, 0, 180, '°');
}

/** The glazing types accepted, in the order messages list them. */
export const GLAZING_TYPES: readonly GlazingType[] = Object.freeze(['clear', 'tinted', 'coated', 'table'] as GlazingType[]);
/** The SHGC bases accepted. */
export const SHGC_BASES: readonly ShgcBasis[] = Object.freeze(['centreOfGlass', 'wholeWindow'] as ShgcBasis[]);

/**
 * Checks a glazing type; throws naming `argument` and listing the accepted types.
 * @param value - the type as given
 * @param argument - the name for messages
 */
export function requireGlazingType(value: unknown, argument = 'glazingType'): GlazingType {
  if (!GLAZING_TYPES.includes(value as GlazingType)) throw new SunpaneError(argument, value, `must be one of ${GLAZING_TYPES.map((t) => `"${t}"`).join(', ')}`);
  return value as GlazingType;
}

/** Checks an SHGC basis; throws naming `argument` and listing the accepted ones. */
export function requireShgcBasis(value: unknown, argument = 'shgcBasis'): ShgcBasis {
  if (!SHGC_BASES.includes(value as ShgcBasis)) throw new SunpaneError(argument, value, `must be one of ${SHGC_BASES.map((t) => `"${t}"`).join(', ')}`);
  return value as ShgcBasis;
}

/** The glazing's type with its default applied: `table` with an angle table, else `clear`. Errors name `glazing.type`. */
export function glazingTypeOf(glazing: Glazing): GlazingType {
  if (glazing.type === undefined) return glazing.angleTable !== undefined ? 'table' : 'clear';
  return requireGlazingType(glazing.type, 'glazing.type');
}

/** The glazing's SHGC basis, default `centreOfGlass`. Errors name `glazing.shgcBasis`. */
export function shgcBasisOf(glazing: Glazing): ShgcBasis {
  return glazing.shgcBasis === undefined ? 'centreOfGlass' : requireShgcBasis(glazing.shgcBasis, 'glazing.shgcBasis');
}

/** Checks a Karlsson–Roos glazing-type parameter q, 1…10. */
export function requireTypeParameter(value: unknown, argument = 'glazingTypeParameter'): number {
  if (value === undefined || value === null) {
    throw new SunpaneError(argument, value, `must be given for a coated unit: the glazing-type parameter q of Karlsson & Roos (2000), from ${KR_TYPE_PARAMETER_MIN} to ${KR_TYPE_PARAMETER_MAX} (larger keeps the SHGC up to higher angles)`);
  }
  return requireRange(argument, value, KR_TYPE_PARAMETER_MIN, KR_TYPE_PARAMETER_MAX);
}

/**
 * SHGC at an incidence angle for a glazing type given by its name.
 *
 * @param shgcNormal - SHGC at normal incidence [-], 0…1
 * @param panes - number of panes, 1…4
 * @param incidence - incidence angle [°], 0…180; 90 or more gives 0
 * @param type - `clear` or `tinted` (Fresnel, {@link shgcAtAngle}) or `coated` (Karlsson & Roos 2000)
 * @param typeParameter - q for `coated`, 1…10 (ignored otherwise)
 * @returns SHGC at the angle [-], 0…shgcNormal
 * @throws SunpaneError naming `glazingType` (listing the accepted types; `table` needs a table, so
 *   it is refused here) or `glazingTypeParameter`
 */
export function shgcAtAngleOfType(shgcNormal: number, panes: number, incidence: number, type: string, typeParameter?: number): number {
  const t = requireGlazingType(type);
  if (t === 'table') throw new SunpaneError('glazingType', type, 'must be "clear", "tinted" or "coated" here (a table goes to the lookup functions)');
  const s = requireShgc('shgcNormal', shgcNormal);
  const n = requirePanes('panes', panes);
  const theta = requireIncidence(incidence);
  if (t !== 'coated') return physicalModel(s, n)(theta);
  const q = requireTypeParameter(typeParameter);
  return s * karlssonRoosModel(n, q)(theta);
}

/** Diffuse (hemispherical) SHGC for a glazing type given by its name; see {@link shgcAtAngleOfType}. */
export function diffuseShgcOfType(shgcNormal: number, panes: number, type: string, typeParameter?: number): number {
  const t = requireGlazingType(type);
  if (t === 'table') throw new SunpaneError('glazingType', type, 'must be "clear", "tinted" or "coated" here (a table goes to the lookup functions)');
  const s = requireShgc('shgcNormal', shgcNormal);
  const n = requirePanes('panes', panes);
  if (t !== 'coated') return hemisphericalAverage(physicalModel(s, n));
  const q = requireTypeParameter(typeParameter);
  const m = karlssonRoosModel(n, q);
  return hemisphericalAverage((theta) => s * m(theta));
}

/** The physical angular model: SHGC(θ) = SHGCn · T(θ) / T(0) with K·L fitted so T(0) = SHGCn. */
function physicalModel(shgcNormal: number, panes: number): (incidence: number) => number {
  if (shgcNormal === 0) return () => 0;
  const kl = paneExtinctionFor(shgcNormal, panes);
  const t0 = paneStackTransmittance(0, panes, kl);
  return (incidence) => {
    if (incidence >= 90) return 0;
    const ratio = paneStackTransmittance(incidence, panes, kl) / t0;
    return shgcNormal * (ratio < 1 ? ratio : 1);
  };
}

/**
 * SHGC at an incidence angle by the physical model of uncoated panes.
 *
 * @param shgcNormal - SHGC at normal incidence [-], 0…1
 * @param panes - number of panes, 1…4
 * @param incidence - incidence angle [°], 0…180; 90 or more (sun behind the glass) gives 0
 * @returns SHGC at the angle [-], 0…shgcNormal, non-increasing with the angle
 * @remarks The angular shape is that of the solar transmittance T(θ) of N identical glass panes,
 * n = 1.526, by the Fresnel equations with absorption (Duffie & Beckman, Solar Engineering of
 * Thermal Processes, 4th ed., §5.1–5.3; {@link paneStackTransmittance}). The per-pane K·L is chosen
 * so that the stack's normal transmittance equals SHGCn (K·L = 0 when SHGCn is at or above the clear
 * stack's value: 0.917, 0.846, 0.786, 0.733 for 1…4 panes), then SHGC(θ) = SHGCn · T(θ) / T(0), so
 * SHGC(0) is exactly the given value. The absorbed-and-re-emitted part of the gain is assumed to
 * follow the same angular shape. For three or four nearly non-absorbing panes the parallel
 * polarisation lifts T(θ) above T(0) by up to about 0.02 % between 20° and 35°; the ratio is capped
 * at 1 so the SHGC never exceeds its normal value and never rises with angle. Low SHGC values are attributed to absorption, which makes the
 * curve fall faster with angle than a coated (low-e, reflective) product may; use an angle table
 * from the product's data for those.
 */
export function shgcAtAngle(shgcNormal: number, panes: number, incidence: number): number {
  const s = requireShgc('shgcNormal', shgcNormal);
  const n = requirePanes('panes', panes);
  const theta = requireIncidence(incidence);
  return physicalModel(s, n)(theta);
}

/**
 * Checks an angle table: angles strictly ascending within 0…90 °, at least 0.01° apart, values within 0…1, equal lengths,
 * at least one row. Errors name `${argument}.angles` / `${argument}.values`.
 */
export function requireAngleTable(table: AngleTable, argument = 'angleTable'): AngleTable {
  const angles = table?.angles;
  const values = table?.values;
  if (!Array.isArray(angles) || angles.length === 0) throw new SunpaneError(`${argument}.angles`, angles, 'must be a list of at least one angle from 0 to 90 °');
  if (!Array.isArray(values) || values.length !== angles.length) {
    throw new SunpaneError(`${argument}.values`, values, `must be a list of ${angles.length} SHGC values, one per angle`);
  }
  angles.forEach((a, k) => {
    requireRange(`${argument}.angles`, a, 0, 90, '°');
    if (k > 0 && !(a > angles[k - 1])) throw new SunpaneError(`${argument}.angles`, angles, `must be strictly ascending (angle ${k + 1}, ${a}, is not above ${angles[k - 1]})`);
    if (k > 0 && a - angles[k - 1] < TABLE_MIN_SPACING) {
      throw new SunpaneError(`${argument}.angles`, angles, `must be at least ${TABLE_MIN_SPACING}° apart (angles ${k} and ${k + 1} are ${angles[k - 1]} and ${a})`);
    }
  });
  values.forEach((v) => requireRange(`${argument}.values`, v, 0, 1));
  return table;
}

/** The interpolant of a checked table, extended with (90°, 0) when the table stops short of 90°. */
function tableModel(table: AngleTable): { model: (incidence: number) => number; knots: number[] } {
  const xs = [...table.angles];
  const ys = [...table.values];
  if (xs[xs.length - 1] < 90) {
    xs.push(90);
    ys.push(0);
  }
  const cubic: MonotoneCubic = monotoneCubic(xs, ys);
  return { model: (incidence) => (incidence >= 90 ? 0 : cubic.at(incidence)), knots: xs };
}

/**
 * SHGC at an incidence angle from the user's table of SHGC by angle.
 *
 * @param table - angles [°] strictly ascending within 0…90 and SHGC values 0…1, same length
 * @param incidence - incidence angle [°], 0…180; 90 or more gives 0
 * @returns SHGC at the angle [-], 0…1
 * @remarks Shape-preserving monotone cubic interpolation through the table's points (Fritsch, F. N.
 * & Carlson, R. E. (1980), SIAM J. Numer. Anal. 17(2), 238–246; {@link monotoneCubic}). Below the
 * first angle the first value holds. A table that stops short of 90° is extended with the point
 * (90°, 0), so the curve tapers to 0 at grazing incidence without overshoot.
 */
export function shgcFromTable(table: AngleTable, incidence: number): number {
  const t = requireAngleTable(table);
  const theta = requireIncidence(incidence);
  return tableModel(t).model(theta);
}

/**
 * Hemispherical (diffuse) SHGC by the physical model.
 *
 * @param shgcNormal - SHGC at normal incidence [-], 0…1
 * @param panes - number of panes, 1…4
 * @returns diffuse SHGC [-], below shgcNormal (0 for 0)
 * @remarks 2 ∫₀^{π/2} SHGC(θ) cos θ sin θ dθ by composite Gauss–Legendre quadrature
 * ({@link hemisphericalAverage}) of {@link shgcAtAngle}'s model.
 */
export function diffuseShgc(shgcNormal: number, panes: number): number {
  const s = requireShgc('shgcNormal', shgcNormal);
  const n = requirePanes('panes', panes);
  return hemisphericalAverage(physicalModel(s, n));
}

/**
 * Hemispherical (diffuse) SHGC from an angle table.
 *
 * @param table - as for {@link shgcFromTable}
 * @returns diffuse SHGC [-], 0…1
 * @remarks As {@link diffuseShgc}, integrating the interpolated table panel by panel between its
 * angles (each panel is one smooth cubic, so the quadrature is accurate to rounding).
 */
export function diffuseShgcFromTable(table: AngleTable): number {
  const { model, knots } = tableModel(requireAngleTable(table));
  return hemisphericalAverage(model, knots);
}

/**
 * Prepares a glazing's SHGC curve: the angle table when given, else the physical model.
 *
 * @param glazing - SHGC at normal incidence (0…1), panes (1…4, for the physical model) and an
 * optional angle table; errors name `glazing.shgc`, `glazing.panes`, `glazing.angleTable.angles`...
 * @returns the curve: `atAngle(θ)` from a 0.1° lookup, `diffuse` by integration of the exact model,
 * `normal` = SHGC at 0° (with a table, its interpolated value at 0°, not `glazing.shgc`)
 * @remarks See {@link shgcAtAngle}, {@link shgcFromTable}, {@link diffuseShgc}. The lookup agrees
 * with the exact model to about 1e-5.
 */
export function shgcCurve(glazing: Glazing): ShgcCurve {
  let lookup: Float64Array;
  let model: (incidence: number) => number;
  let diffuse: number;
  const type = glazingTypeOf(glazing);
  if (type === 'table') {
    if (glazing.angleTable === undefined) throw new SunpaneError('glazing.angleTable', undefined, 'must be given for glazing type "table": a table of angles and SHGC values');
    const { model: m, knots } = tableModel(requireAngleTable(glazing.angleTable, 'glazing.angleTable'));
    model = m;
    diffuse = hemisphericalAverage(m, knots);
    lookup = emptyLookup(model);
  } else {
    const s = requireShgc('glazing.shgc', glazing.shgc);
    const n = requirePanes('glazing.panes', glazing.panes);
    const q = type === 'coated' ? requireTypeParameter(glazing.typeParameter, 'glazing.typeParameter') : 0;
    // The models depend on these numbers only: their lookup table and diffuse value are kept (a
    // few recent glazings), so a window worked out again (e.g. its year, once per recalculation)
    // does not redo the Fresnel integration or refill the table. Same values.
    const key = `${type === 'coated' ? `kr${q}` : 'fresnel'}|${s}|${n}`;
    let kept = PHYSICAL_CURVES.get(key);
    if (kept === undefined) {
      const kr = type === 'coated' ? karlssonRoosModel(n, q) : undefined;
      const m = kr !== undefined ? (theta: number) => s * kr(theta) : physicalModel(s, n);
      kept = { model: m, lookup: emptyLookup(m), diffuse: hemisphericalAverage(m) };
      // Stryker disable next-line ConditionalExpression,EqualityOperator: how many curves are kept changes the time taken, never a value
      if (PHYSICAL_CURVES.size >= PHYSICAL_CURVES_KEPT) PHYSICAL_CURVES.delete(PHYSICAL_CURVES.keys().next().value as string);
      PHYSICAL_CURVES.set(key, kept);
    }
    ({ model, lookup, diffuse } = kept);
  }
  const atAngle = (incidence: number): number => {
    if (!(incidence >= 0 && incidence <= 180)) requireIncidence(incidence);
    if (incidence >= 90) return 0;
    const u = incidence / CURVE_STEP;
    const k = u | 0;
    const f = u - k;
    let lo = lookup[k];
    if (numberIsNaN(lo)) lo = lookup[k] = model(k * CURVE_STEP);
    let hi = lookup[k + 1];
    if (numberIsNaN(hi)) hi = lookup[k + 1] = model((k + 1) * CURVE_STEP);
    return lo + f * (hi - lo);
  };
  return { atAngle, diffuse, normal: lookup[0] };
}

/**
 * The 0.1° table of a model, filled on first use of each node (NaN = not yet worked out): a year of
 * one window visits only the angles its sun reaches, and the values are the same model(k · 0.1°).
 * lookup[count] (90°) and lookup[count + 1] are 0.
 */
function emptyLookup(model: (incidence: number) => number): Float64Array {
  const count = round(90 / CURVE_STEP);
  const lookup = new Float64Array(count + 2).fill(NAN, 0, count);
  lookup[0] = model(0);
  return lookup;
}

/** How many physical-model curves {@link shgcCurve} keeps (the oldest goes first). */
const PHYSICAL_CURVES_KEPT = 16;
/** Model curves by "model|shgc|panes": the model, its 0.1° table (filled as used) and diffuse SHGC. */
const PHYSICAL_CURVES = new Map<string, { model: (incidence: number) => number; lookup: Float64Array; diffuse: number }>();

/**
 * The interior attenuation coefficients of a glazing (blinds, curtains) for the beam and for diffuse
 * light: multipliers on those parts of the gain.
 *
 * @param glazing - its `interiorAttenuationBeam` / `interiorAttenuationDiffuse`, each 0…1, or
 *   `interiorAttenuation` for both, or none
 * @returns `{ beam, diffuse, shaded }`: the coefficients [-], 0…1 (1 = no interior shading), and
 *   whether an interior shade is present (either coefficient below 1). Errors name the field.
 * @remarks Gain with interior shading = gain of the bare glazing × IAC, the beam and diffuse parts
 * each with their own coefficient (ASHRAE Handbook—Fundamentals (2013) ch. 15, the IAC definition;
 * from memory).
 */
export function interiorAttenuationsOf(glazing: Glazing): { beam: number; diffuse: number; shaded: boolean } {
  const both = glazing.interiorAttenuation === undefined ? 1 : requireRange('glazing.interiorAttenuation', glazing.interiorAttenuation, 0, 1);
  const beam = glazing.interiorAttenuationBeam === undefined ? both : requireRange('glazing.interiorAttenuationBeam', glazing.interiorAttenuationBeam, 0, 1);
  const diffuse = glazing.interiorAttenuationDiffuse === undefined ? both : requireRange('glazing.interiorAttenuationDiffuse', glazing.interiorAttenuationDiffuse, 0, 1);
  return { beam, diffuse, shaded: beam < 1 || diffuse < 1 };
}

/** The interior attenuation coefficient for the beam ({@link interiorAttenuationsOf}). */
export function interiorAttenuationOf(glazing: Glazing): number {
  return interiorAttenuationsOf(glazing).beam;
}

/**
 * The area the SHGC applies to: the glass area for a centre-of-glass SHGC, the whole rough opening
 * for a whole-window SHGC (the frame's share is then already in the rating and not subtracted again).
 *
 * @param width - rough-opening width [m], above 0
 * @param height - rough-opening height [m], above 0
 * @param frameFraction - frame share of the rough opening [-], 0 up to (not including) 1
 * @param basis - `centreOfGlass` or `wholeWindow`
 * @returns area [m²]
 */
export function solarArea(width: number, height: number, frameFraction: number, basis: ShgcBasis): number {
  const glass = glassArea(width, height, frameFraction);
  return basis === 'wholeWindow' ? width * height : glass;
}

/**
 * Glass (daylight) area of a window from its rough opening and frame share.
 *
 * @param width - rough-opening width [m], above 0
 * @param height - rough-opening height [m], above 0
 * @param frameFraction - frame share of the rough-opening area [-], 0 up to (not including) 1
 * @returns glass area [m²] = width × height × (1 − frameFraction), above 0
 */
export function glassArea(width: number, height: number, frameFraction: number): number {
  const w = requireRange('width', width, 0, undefined, 'm', { exclusiveMin: true });
  const h = requireRange('height', height, 0, undefined, 'm', { exclusiveMin: true });
  const f = requireRange('frameFraction', frameFraction, 0, 1, undefined, { exclusiveMax: true });
  return w * h * (1 - f);
}
