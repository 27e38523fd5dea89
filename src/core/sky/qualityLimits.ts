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
import { requireRange } from '../common';
import { DNI_EXTRA_MAX, DNI_EXTRA_MIN } from './transposition';

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
