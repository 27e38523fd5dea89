/**
 * Transposition of horizontal irradiance to a tilted plane: the isotropic and Hay–Davies sky-diffuse
 * models, ground-reflected irradiance, and the ASHRAE clear-day diffuse ratio for vertical surfaces.
 * The Perez (1990) model is in perez1990.ts; {@link planeIrradiance} combines them.
 *
 * "No sun" is not an error: with the sun at or below the horizon the circumsolar terms are 0.
 * Equation numbers of Duffie & Beckman and of the ASHRAE Handbook cited here are from memory.
 */
import { RAD, requireRange } from '../common';

const { cos, sin } = Math;

/** Highest irradiance accepted on any input [W/m²]. */
export const IRRADIANCE_MAX = 2000;
/** Range accepted for the extraterrestrial normal irradiance argument [W/m²]. */
export const DNI_EXTRA_MIN = 1000;
export const DNI_EXTRA_MAX = 1500;
/** Floor on cos(zenith) in the circumsolar ratio: cos 85°, as in Perez et al. (1990). */
export const COS_85 = cos(85 * RAD);

/** Checks an irradiance argument, 0…2000 W/m². */
export function requireIrradiance(argument: string, value: unknown): number {
  return requireRange(argument, value, 0, IRRADIANCE_MAX, 'W/m²');
}

/**
 * Sky diffuse irradiance on a tilted plane under an isotropic sky.
 *
 * @param dhi - diffuse horizontal irradiance [W/m²], 0…2000
 * @param surfaceTilt - surface tilt [°], 0 (facing up) … 180 (facing down)
 * @returns sky diffuse irradiance on the plane [W/m²], 0…dhi
 * @remarks Id,T = DHI (1 + cos Σ) / 2 — Liu & Jordan; Duffie & Beckman, Solar Engineering of
 * Thermal Processes, 4th ed., Eq. 2.15.1 (sky term).
 */
export function skyDiffuseIsotropic(dhi: number, surfaceTilt: number): number {
  const d = requireIrradiance('dhi', dhi);
  const tilt = requireRange('surfaceTilt', surfaceTilt, 0, 180, '°');
  return (d * (1 + cos(tilt * RAD))) / 2;
}

/**
 * Ground-reflected irradiance on a tilted plane (isotropic reflection from an infinite, uniform
 * ground).
 *
 * @param ghi - global horizontal irradiance [W/m²], 0…2000
 * @param albedo - ground reflectance (errors name it `groundAlbedo`) [-], 0…1
 * @param surfaceTilt - surface tilt [°], 0…180
 * @returns ground-reflected irradiance on the plane [W/m²]; 0 for a horizontal plane facing up
 * @remarks Ig,T = GHI ρg (1 − cos Σ) / 2 — Duffie & Beckman, 4th ed., Eq. 2.15.1 (ground term).
 */
export function groundReflected(ghi: number, albedo: number, surfaceTilt: number): number {
  const g = requireIrradiance('ghi', ghi);
  const rho = requireRange('groundAlbedo', albedo, 0, 1);
  const tilt = requireRange('surfaceTilt', surfaceTilt, 0, 180, '°');
  return (g * rho * (1 - cos(tilt * RAD))) / 2;
}

/**
 * Sky diffuse irradiance on a tilted plane by the Hay–Davies model (isotropic + circumsolar).
 *
 * @param dhi - diffuse horizontal irradiance [W/m²], 0…2000
 * @param dni - direct normal irradiance [W/m²], 0…2000
 * @param dniExtra - extraterrestrial normal irradiance [W/m²], 1000…1500
 * @param cosIncidence - cosine of the sun's incidence angle on the plane [-], −1…1
 * @param sunZenith - sun zenith angle [°], 0…180
 * @param surfaceTilt - surface tilt [°], 0…180
 * @returns sky diffuse irradiance on the plane [W/m²], ≥ 0; with the sun at or below the horizon,
 * or behind the plane, the circumsolar part is 0
 * @remarks Ai = DNI / E0n (anisotropy index, limited to 1), Rb = max(0, cos θ) / max(cos 85°, cos z);
 * Id,T = DHI [(1 − Ai)(1 + cos Σ)/2 + Ai Rb] — Hay, J. E. & Davies, J. A. (1980), "Calculation of
 * the solar radiation incident on an inclined surface", Proc. First Canadian Solar Radiation Data
 * Workshop; Duffie & Beckman, 4th ed., Eq. 2.16.4 (sky terms). The cos 85° floor (our choice, as in
 * Perez 1990) bounds Rb near the horizon.
 */
export function skyDiffuseHayDavies(dhi: number, dni: number, dniExtra: number, cosIncidence: number, sunZenith: number, surfaceTilt: number): number {
  const d = requireIrradiance('dhi', dhi);
  const b = requireIrradiance('dni', dni);
  const e0 = requireRange('dniExtra', dniExtra, DNI_EXTRA_MIN, DNI_EXTRA_MAX, 'W/m²');
  const cosTheta = requireRange('cosIncidence', cosIncidence, -1, 1);
  const zenith = requireRange('sunZenith', sunZenith, 0, 180, '°');
  const tilt = requireRange('surfaceTilt', surfaceTilt, 0, 180, '°');
  const isotropicView = (1 + cos(tilt * RAD)) / 2;
  if (zenith >= 90) return d * isotropicView;
  const ai = b / e0 < 1 ? b / e0 : 1; // anisotropy index
  const cosZ = cos(zenith * RAD);
  const rb = (cosTheta > 0 ? cosTheta : 0) / (cosZ > COS_85 ? cosZ : COS_85);
  return d * ((1 - ai) * isotropicView + ai * rb); // D&B Eq. 2.16.4
}

/**
 * The ASHRAE ratio Y of clear-sky diffuse irradiance on a vertical surface to that on a horizontal
 * surface.
 *
 * @param incidence - incidence angle of the sun on the vertical surface [°], 0…180 (> 90: sun behind)
 * @returns Y [-], 0.45…1.3
 * @remarks Y = max(0.45, 0.55 + 0.437 cos θ + 0.313 cos² θ) — ASHRAE Handbook—Fundamentals (2013)
 * ch. 14, Eq. 28 (after Threlkeld). Meant for the ASHRAE clear-sky model on design days, not for
 * measured weather.
 */
export function ashraeVerticalDiffuseRatio(incidence: number): number {
  const theta = requireRange('incidence', incidence, 0, 180, '°');
  return verticalDiffuseRatioFromCosine(cos(theta * RAD));
}

/** {@link ashraeVerticalDiffuseRatio} from cos θ (unchecked; the hourly kernels have the cosine). */
export function verticalDiffuseRatioFromCosine(c: number): number {
  const y = 0.55 + 0.437 * c + 0.313 * c * c;
  return y > 0.45 ? y : 0.45;
}

/**
 * Clear-day sky diffuse irradiance on a surface of any tilt by the ASHRAE diffuse ratio.
 *
 * @param dhi - diffuse horizontal irradiance [W/m²], 0…2000 (normally from the ASHRAE clear-sky model)
 * @param incidence - incidence angle of the sun on the surface [°], 0…180
 * @param surfaceTilt - surface tilt [°], 0…180
 * @returns sky diffuse irradiance on the plane [W/m²], ≥ 0
 * @remarks Ed,T = Ed (Y sin Σ + cos Σ) for Σ ≤ 90°, Ed Y sin Σ for Σ > 90° — ASHRAE
 * Handbook—Fundamentals (2013) ch. 14, Eqs. 29–30 (from memory). The same form is the sky model
 * `ashraeClearDay` of {@link planeIrradiance}. Y by {@link ashraeVerticalDiffuseRatio}.
 */
export function skyDiffuseAshraeClearDay(dhi: number, incidence: number, surfaceTilt: number): number {
  const d = requireIrradiance('dhi', dhi);
  const y = ashraeVerticalDiffuseRatio(incidence);
  const tilt = requireRange('surfaceTilt', surfaceTilt, 0, 180, '°');
  const tiltRad = tilt * RAD;
  return tilt <= 90 ? d * (y * sin(tiltRad) + cos(tiltRad)) : d * y * sin(tiltRad);
}
