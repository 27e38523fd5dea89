/**
 * What an hourly irradiance value can physically be, for checking weather data before it is used:
 * the "physically possible" limits of the Baseline Surface Radiation Network quality checks and
 * their comparison tests between the components (Long, C. N. & Shi, Y. (2008), "An automated
 * quality assessment and control algorithm for surface radiation measurements", The Open
 * Atmospheric Science Journal 2, 23–37; coefficients from memory, checked in
 * tests/reference/long-shi-2008.test.ts).
 *
 * The limits were set for measurements at an instant; an hourly value is an average over the hour,
 * which can only be lower than the highest instant in it, so the limits at the middle of the hour
 * are generous for hourly data rather than strict.
 */
import { SunpaneError, requireRange } from '../common';
import { DNI_EXTRA_MAX, DNI_EXTRA_MIN } from './transposition';

const { PI, asin, max, min } = Math;

/** Lowest value any component may read [W/m²]: a small negative reading is a sensor's night offset. */
export const IRRADIANCE_FLOOR = -4;

/** The comparison tests apply only when global horizontal irradiance is above this [W/m²]. */
export const COMPARISON_MIN_GHI = 50;

/** Upper limits of the three components at one sun position [W/m²]. */
export interface IrradianceLimits {
  ghi: number;
  dhi: number;
  dni: number;
}

/**
 * The physically possible upper limits of global horizontal, diffuse horizontal and direct normal
 * irradiance.
 * @param cosZenith - cosine of the solar zenith angle, −1…1 (≤ 0: sun down; the limits are then the allowances alone)
 * @param extraterrestrialNormal - extraterrestrial irradiance at the day's Earth–Sun distance [W/m²], 1000…1500
 * @returns GHI ≤ Sa · 1.5 · μ0^1.2 + 100, DHI ≤ Sa · 0.95 · μ0^1.2 + 50, DNI ≤ Sa [W/m²]
 * @remarks Long & Shi (2008), physically possible limits (from memory).
 */
export function physicalIrradianceLimits(cosZenith: number, extraterrestrialNormal: number): IrradianceLimits {
  const mu = requireRange('cosZenith', cosZenith, -1, 1);
  const sa = requireRange('extraterrestrialNormal', extraterrestrialNormal, DNI_EXTRA_MIN, DNI_EXTRA_MAX, 'W/m²');
  const m = mu > 0 ? mu ** 1.2 : 0;
  return { ghi: sa * 1.5 * m + 100, dhi: sa * 0.95 * m + 50, dni: sa };
}

/**
 * Highest ratio of diffuse to global horizontal irradiance (with global above {@link COMPARISON_MIN_GHI}).
 * @param zenith - solar zenith angle [°], 0…180
 * @returns 1.05 below 75°, 1.10 from 75° to below 93°, undefined beyond (no test)
 * @remarks Long & Shi (2008), comparison test of the diffuse ratio (from memory).
 */
export function diffuseRatioLimit(zenith: number): number | undefined {
  const z = requireRange('zenith', zenith, 0, 180, '°');
  return z < 75 ? 1.05 : z < 93 ? 1.1 : undefined;
}

/**
 * Largest relative difference between DNI · cos z + DHI and the measured GHI (with GHI above
 * {@link COMPARISON_MIN_GHI}).
 * @param zenith - solar zenith angle [°], 0…180
 * @returns 0.08 below 75°, 0.15 from 75° to below 93°, undefined beyond (no test)
 * @remarks Long & Shi (2008), comparison test of the global closure (from memory).
 */
export function closureTolerance(zenith: number): number | undefined {
  const z = requireRange('zenith', zenith, 0, 180, '°');
  return z < 75 ? 0.08 : z < 93 ? 0.15 : undefined;
}

/**
 * Whether a direct normal and diffuse horizontal irradiance pair is one some sky could give with the
 * sun where it is: DNI, DHI and the global DNI · sin β + DHI each at or below
 * {@link physicalIrradianceLimits}. Unchecked arguments (for the hourly series: an hour that fails
 * is treated as missing, as the weather reader does).
 * @param dni - direct normal irradiance [W/m²]
 * @param dhi - diffuse horizontal irradiance [W/m²]
 * @param sinAltitude - sine of the sun's altitude (= cos zenith) [-], −1…1
 * @param extraterrestrialNormal - the day's extraterrestrial normal irradiance [W/m²]
 */
export function isPossibleIrradiance(dni: number, dhi: number, sinAltitude: number, extraterrestrialNormal: number): boolean {
  // The same expressions, in the same order, as physicalIrradianceLimits (a value at the limit passes both).
  const m = sinAltitude > 0 ? sinAltitude ** 1.2 : 0;
  const sa = extraterrestrialNormal;
  return dni <= sa && dhi <= sa * 0.95 * m + 50 && (sinAltitude > 0 ? dni * sinAltitude : 0) + dhi <= sa * 1.5 * m + 100;
}

/**
 * Whether a global horizontal irradiance is one some sky could give with the sun where it is:
 * GHI ≤ 1.5 Sa μ0^1.2 + 100 ({@link physicalIrradianceLimits}). Unchecked arguments.
 * @param ghi - global horizontal irradiance [W/m²]
 * @param cosZenith - cosine of the solar zenith angle [-] (≤ 0: sun down, only the allowance)
 * @param extraterrestrialNormal - the day's extraterrestrial normal irradiance [W/m²]
 */
export function isPossibleGlobal(ghi: number, cosZenith: number, extraterrestrialNormal: number): boolean {
  // The same expression, in the same order, as physicalIrradianceLimits (a value at the limit passes both).
  return ghi <= extraterrestrialNormal * 1.5 * (cosZenith > 0 ? cosZenith ** 1.2 : 0) + 100;
}

/**
 * Refuses a direct normal and diffuse horizontal irradiance pair that no sky can give with the sun
 * where it is ({@link isPossibleIrradiance}): such values come from a unit slip (hourly sums in
 * Wh/m² or kJ/m²), a wrong date-time or site, or swapped columns, and they would drive the sky
 * models far outside their range (a Perez circumsolar term of tens of thousands of W/m² on a
 * window facing a low sun).
 * @param dni - direct normal irradiance [W/m²] (already checked 0…2000)
 * @param dhi - diffuse horizontal irradiance [W/m²] (already checked 0…2000)
 * @param sinAltitude - sine of the sun's altitude [-], −1…1
 * @param extraterrestrialNormal - the day's extraterrestrial normal irradiance [W/m²], 1000…1500
 * @param names - the arguments' names as the user sees them (default `dni`, `dhi`)
 * @throws SunpaneError naming the argument past its limit, with the limit at this sun
 * @remarks Long & Shi (2008), physically possible limits (from memory).
 */
export function requirePossibleIrradiance(dni: number, dhi: number, sinAltitude: number, extraterrestrialNormal: number, names: { dni: string; dhi: string } = { dni: 'dni', dhi: 'dhi' }): void {
  if (isPossibleIrradiance(dni, dhi, sinAltitude, extraterrestrialNormal)) return;
  const limits = physicalIrradianceLimits(max(-1, min(1, sinAltitude)), extraterrestrialNormal);
  const altitude = (asin(max(-1, min(1, sinAltitude))) * 180) / PI;
  const sun = altitude > 0 ? `with the sun ${round(altitude, 2)}° high` : 'with the sun at or below the horizon';
  const why = `the physically possible limit (Long & Shi 2008) ${sun} and an extraterrestrial ${round(extraterrestrialNormal, 1)} W/m²; check the units (W/m², not hourly sums in Wh/m² or kJ/m²), the date-time and the site`;
  if (dni > limits.dni) throw new SunpaneError(names.dni, dni, `must be at most ${round(limits.dni, 1)} W/m², ${why}`);
  if (dhi > limits.dhi) throw new SunpaneError(names.dhi, dhi, `must be at most ${round(limits.dhi, 1)} W/m², ${why}`);
  const ghi = (sinAltitude > 0 ? dni * sinAltitude : 0) + dhi;
  throw new SunpaneError(names.dhi, dhi, `must keep the global ${names.dni} × sin(altitude) + ${names.dhi} at or below ${round(limits.ghi, 1)} W/m², ${why}`, `the global is ${round(ghi, 1)} W/m²`);
}

function round(x: number, digits: number): number {
  return Number(x.toFixed(digits));
}
