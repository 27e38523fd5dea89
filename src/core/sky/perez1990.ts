/**
 * Sky diffuse irradiance on a tilted plane by the Perez et al. (1990) model: an isotropic background,
 * a circumsolar disc and a horizon band, weighted by brightness coefficients F1 and F2 that depend on
 * the sky's clearness ε and brightness Δ.
 *
 * Source: Perez, R., Ineichen, P., Seals, R., Michalsky, J. & Stewart, R. (1990), "Modeling daylight
 * availability and irradiance components from direct and global irradiance", Solar Energy 44(5),
 * 271–289: Eqs. 1–2 (ε, Δ), Eq. 9 (F1, F2), Table 6 (composite coefficient set; ε bins),
 * κ = 1.041 with the zenith in radians. The same model is given in Duffie & Beckman, Solar
 * Engineering of Thermal Processes, 4th ed., §2.16 and Table 2.16.1.
 */
import { RAD, requireRange } from '../common';
import { incidenceAngle } from '../sun';
import { COS_85, DNI_EXTRA_MAX, DNI_EXTRA_MIN, requireIrradiance } from './transposition';

const { cos, sin } = Math;

/** κ in the sky clearness ε, for the zenith in radians (Perez et al. 1990, Eq. 1). */
export const PEREZ_KAPPA = 1.041;

/** Upper edges of the first seven ε bins; the eighth bin is ε ≥ 6.2 (Perez et al. 1990, Table 6). */
export const PEREZ_EPSILON_EDGES: readonly number[] = Object.freeze([1.065, 1.23, 1.5, 1.95, 2.8, 4.5, 6.2]);

/** One row of brightness coefficients: f11, f12, f13, f21, f22, f23. */
export type PerezCoefficientRow = readonly [number, number, number, number, number, number];

/** Composite ("all sites") coefficient set, one row per ε bin — Perez et al. (1990), Table 6. */
export const PEREZ_1990_COMPOSITE: readonly PerezCoefficientRow[] = Object.freeze([
  [-0.008, 0.588, -0.062, -0.06, 0.072, -0.022],
  [0.13, 0.683, -0.151, -0.019, 0.066, -0.029],
  [0.33, 0.487, -0.221, 0.055, -0.064, -0.026],
  [0.568, 0.187, -0.295, 0.109, -0.152, -0.014],
  [0.873, -0.392, -0.362, 0.226, -0.462, 0.001],
  [1.132, -1.237, -0.412, 0.288, -0.823, 0.056],
  [1.06, -1.6, -0.359, 0.264, -1.127, 0.131],
  [0.678, -0.327, -0.25, 0.156, -1.377, 0.251],
] as const);

/** Highest air mass accepted (the Kasten–Young value at the horizon is about 37.9). */
export const AIR_MASS_MAX = 40;

/** The intermediate quantities of one Perez evaluation, for checking by hand. */
export interface PerezParts {
  /** Sky clearness ε [-]. */
  epsilon: number;
  /** Sky brightness Δ [-]. */
  delta: number;
  /** ε bin, 1…8. */
  bin: number;
  /** Circumsolar brightness coefficient F1 [-], ≥ 0. */
  f1: number;
  /** Horizon brightness coefficient F2 [-]. */
  f2: number;
  /** Isotropic, circumsolar and horizon-band parts [W/m²] (their sum, floored at 0, is the sky diffuse). */
  isotropic: number;
  circumsolar: number;
  horizon: number;
  /** Sky diffuse on the plane [W/m²], ≥ 0. */
  total: number;
}

/** The ε bin (1…8) of a sky clearness value: 1 + the number of bin edges at or below ε (bin 1 for NaN). */
export function perezBin(epsilon: number): number {
  let bin = 1;
  for (let k = 0; k < PEREZ_EPSILON_EDGES.length; k++) if (epsilon >= PEREZ_EPSILON_EDGES[k]) bin++;
  return bin;
}

/**
 * The Perez (1990) sky diffuse with its intermediate values, for any coefficient set (the published
 * composite set by default). Arguments as {@link skyDiffusePerez1990}, already checked.
 */
export function perezParts(
  surfaceTilt: number,
  surfaceAzimuth: number,
  dhi: number,
  dni: number,
  dniExtra: number,
  sunZenith: number,
  sunAzimuth: number,
  airMass: number,
  coefficients: readonly PerezCoefficientRow[] = PEREZ_1990_COMPOSITE,
): PerezParts {
  const tiltRad = surfaceTilt * RAD;
  // Worked out whatever the sun and diffuse (the kernel reads it only with the sun up and some diffuse):
  // a guard here would be a second copy of the kernel's condition that no result could tell apart.
  const cosTheta = cos(incidenceAngle(90 - sunZenith, sunAzimuth, surfaceTilt, surfaceAzimuth) * RAD);
  // Stryker disable next-line ObjectLiteral: every field is written by perezPartsKernel (either branch) before the record is returned
  const out = { epsilon: 1, delta: 0, bin: 1, f1: 0, f2: 0, isotropic: 0, circumsolar: 0, horizon: 0, total: 0 };
  return perezPartsKernel(out, (1 + cos(tiltRad)) / 2, sin(tiltRad), dhi, dni, dniExtra, sunZenith, cos(sunZenith * RAD), airMass, cosTheta, coefficients);
}

/**
 * The one implementation of the Perez (1990) model behind {@link perezParts},
 * {@link skyDiffusePerez1990} and the prepared plane of src/core/sky/planeIrradiance.ts: arguments
 * already checked, the surface and sun given by the cosines and sines the hourly loop already has,
 * the result written into `out` (no allocation).
 * @param out - record to fill and return
 * @param isotropicView - (1 + cos Σ) / 2 [-], Σ the surface tilt
 * @param sinTilt - sin Σ [-]
 * @param dhi - diffuse horizontal irradiance [W/m²], ≥ 0
 * @param dni - direct normal irradiance [W/m²], ≥ 0
 * @param dniExtra - extraterrestrial normal irradiance [W/m²]
 * @param sunZenith - sun zenith angle [°], 0…180 (≥ 90: no sun, isotropic diffuse)
 * @param cosZenith - cos of the zenith angle (= sin of the altitude) [-]
 * @param airMass - relative air mass [-]
 * @param cosIncidence - cos of the sun's incidence angle on the plane [-], −1…1
 * @param coefficients - brightness coefficient rows, one per ε bin ({@link PEREZ_1990_COMPOSITE} for
 *   the published set; no default, which keeps the kernel small enough to inline)
 * @returns `out`; see {@link skyDiffusePerez1990} for the formulas
 */
export function perezPartsKernel(
  out: PerezParts,
  isotropicView: number,
  sinTilt: number,
  dhi: number,
  dni: number,
  dniExtra: number,
  sunZenith: number,
  cosZenith: number,
  airMass: number,
  cosIncidence: number,
  coefficients: readonly PerezCoefficientRow[],
): PerezParts {
  if (dhi <= 0 || sunZenith >= 90) return perezIsotropicOnly(out, isotropicView, dhi);
  perezBrightnessKernel(out, dhi, dni, dniExtra, sunZenith, airMass, coefficients);
  return perezCombineKernel(out, isotropicView, sinTilt, dhi, cosZenith, cosIncidence);
}

/** The brightness part of {@link PerezParts}: what the sky is, whatever the plane. */
export type PerezBrightness = Pick<PerezParts, 'epsilon' | 'delta' | 'bin' | 'f1' | 'f2'>;

/**
 * First half of {@link perezPartsKernel}: the sky's clearness ε, brightness Δ, bin and brightness
 * coefficients F1 and F2 (Perez et al. 1990, Eq. 1, 2, 9), which depend on the hour's sky and sun
 * only, not on the plane — so that windows of one site can share them hour by hour. Arguments
 * already checked; the sun up (zenith < 90°) and some diffuse (> 0).
 * @returns `out`, with epsilon, delta, bin, f1 and f2 written
 */
export function perezBrightnessKernel<T extends PerezBrightness>(out: T, dhi: number, dni: number, dniExtra: number, sunZenith: number, airMass: number, coefficients: readonly PerezCoefficientRow[]): T {
  const zRad = sunZenith * RAD;
  const kz3 = PEREZ_KAPPA * zRad * zRad * zRad;
  const epsilon = ((dhi + dni) / dhi + kz3) / (1 + kz3); // Eq. 1
  const delta = (dhi * airMass) / dniExtra; // Eq. 2
  const bin = perezBin(epsilon);
  const row = coefficients[bin - 1];
  const f1Raw = row[0] + row[1] * delta + row[2] * zRad; // Eq. 9
  out.epsilon = epsilon;
  out.delta = delta;
  out.bin = bin;
  out.f1 = f1Raw > 0 ? f1Raw : 0;
  out.f2 = row[3] + row[4] * delta + row[5] * zRad; // Eq. 9
  return out;
}

/**
 * Second half of {@link perezPartsKernel}: the sky diffuse on a plane from the hour's brightness
 * coefficients `out.f1` and `out.f2` (isotropic, circumsolar and horizon-band parts, Duffie &
 * Beckman Eq. 2.16.14). Arguments as {@link perezPartsKernel}; the sun up and some diffuse.
 * @returns `out`, with isotropic, circumsolar, horizon and total written
 */
export function perezCombineKernel(out: PerezParts, isotropicView: number, sinTilt: number, dhi: number, cosZenith: number, cosIncidence: number): PerezParts {
  const f1 = out.f1;
  const a = cosIncidence > 0 ? cosIncidence : 0;
  const b = cosZenith > COS_85 ? cosZenith : COS_85;
  const isotropic = dhi * (1 - f1) * isotropicView;
  const circumsolar = (dhi * f1 * a) / b;
  const horizon = dhi * out.f2 * sinTilt;
  const sum = isotropic + circumsolar + horizon; // Duffie & Beckman Eq. 2.16.14 (sky terms)
  out.isotropic = isotropic;
  out.circumsolar = circumsolar;
  out.horizon = horizon;
  out.total = sum > 0 ? sum : 0;
  return out;
}

/**
 * The branch of {@link perezPartsKernel} with no diffuse (all 0) or no sun (no circumsolar disc and
 * no brightness classification; the diffuse is taken as isotropic) — a function of its own, so that
 * the kernel's usual path stays small enough for the compiler to inline into hourly loops.
 */
function perezIsotropicOnly(out: PerezParts, isotropicView: number, dhi: number): PerezParts {
  const iso = dhi > 0 ? dhi * isotropicView : 0;
  out.epsilon = 1;
  out.delta = 0;
  out.bin = 1;
  out.f1 = 0;
  out.f2 = 0;
  out.isotropic = iso;
  out.circumsolar = 0;
  out.horizon = 0;
  out.total = iso;
  return out;
}

/**
 * Sky diffuse irradiance on a tilted plane by the Perez et al. (1990) model, composite coefficients.
 *
 * @param surfaceTilt - surface tilt [°], 0…180
 * @param surfaceAzimuth - direction the surface faces, clockwise from north [°], 0…360
 * @param dhi - diffuse horizontal irradiance [W/m²], 0…2000
 * @param dni - direct normal irradiance [W/m²], 0…2000
 * @param dniExtra - extraterrestrial normal irradiance [W/m²], 1000…1500
 * @param sunZenith - sun zenith angle [°], 0…180
 * @param sunAzimuth - sun azimuth clockwise from north [°], 0…360
 * @param airMass - relative air mass [-], 1…40 (e.g. Kasten–Young)
 * @returns sky diffuse irradiance on the plane [W/m²], ≥ 0 (a strongly negative horizon term is
 * floored at 0). With the sun at or below the horizon there is no circumsolar disc and the diffuse
 * is taken as isotropic; with the sun behind the plane the circumsolar part is 0.
 * @remarks ε = [(DHI + DNI)/DHI + κ z³] / (1 + κ z³); Δ = DHI m / E0n; F1 = max(0, f11 + f12 Δ + f13 z),
 * F2 = f21 + f22 Δ + f23 z (z in radians); Id,T = DHI [(1 − F1)(1 + cos Σ)/2 + F1 a/b + F2 sin Σ]
 * with a = max(0, cos θ), b = max(cos 85°, cos z) — Perez et al. (1990), Solar Energy 44(5),
 * Eqs. 1, 2, 9 and Table 6.
 */
export function skyDiffusePerez1990(
  surfaceTilt: number,
  surfaceAzimuth: number,
  dhi: number,
  dni: number,
  dniExtra: number,
  sunZenith: number,
  sunAzimuth: number,
  airMass: number,
): number {
  const tilt = requireRange('surfaceTilt', surfaceTilt, 0, 180, '°');
  const surfAz = requireRange('surfaceAzimuth', surfaceAzimuth, 0, 360, '°');
  const d = requireIrradiance('dhi', dhi);
  const b = requireIrradiance('dni', dni);
  const e0 = requireRange('dniExtra', dniExtra, DNI_EXTRA_MIN, DNI_EXTRA_MAX, 'W/m²');
  const zenith = requireRange('sunZenith', sunZenith, 0, 180, '°');
  const sunAz = requireRange('sunAzimuth', sunAzimuth, 0, 360, '°');
  const m = requireRange('airMass', airMass, 1, AIR_MASS_MAX);
  return perezParts(tilt, surfAz, d, b, e0, zenith, sunAz, m).total;
}
