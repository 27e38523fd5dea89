/**
 * Extraterrestrial irradiance: the solar flux on a surface normal to the sun's rays at the top of
 * the atmosphere, which varies ±3.3 % over the year with the Earth–Sun distance.
 *
 * Two published forms: the one-cosine form of the ASHRAE Handbook (used with the ASHRAE clear-sky
 * model) and Spencer's (1971) Fourier series (used for the clearness index of Erbs et al. and by the
 * anisotropic sky models). Handbook equation numbers cited here are from memory.
 */
import { requireRange } from '../common';

const { cos, sin, PI } = Math;

/** Solar constant of the ASHRAE Handbook—Fundamentals (2013) ch. 14 [W/m²]. */
export const SOLAR_CONSTANT_ASHRAE = 1367;
/** Solar constant used with Spencer's (1971) series, as in the Erbs et al. check [W/m²]. */
export const SOLAR_CONSTANT_SPENCER = 1366.1;

/** Lowest and highest day of the year accepted (a fractional day is allowed). */
export const DAY_OF_YEAR_MIN = 1;
export const DAY_OF_YEAR_MAX = 366;

/** Checks a day of the year, 1…366 (fractions allowed), naming the argument `dayOfYear`. */
export function requireDayOfYear(dayOfYear: unknown, argument = 'dayOfYear'): number {
  return requireRange(argument, dayOfYear, DAY_OF_YEAR_MIN, DAY_OF_YEAR_MAX);
}

/**
 * Extraterrestrial normal irradiance by the ASHRAE Handbook form.
 *
 * @param dayOfYear - day of the year, 1 (1 January) … 366; fractions allowed
 * @returns extraterrestrial irradiance on a plane normal to the sun [W/m²], 1321…1413
 * @remarks E0 = 1367 [1 + 0.033 cos(360° (n − 3) / 365)] — ASHRAE Handbook—Fundamentals (2013),
 * ch. 14, Eq. 4.
 */
export function extraterrestrialIrradiance(dayOfYear: number): number {
  const n = requireDayOfYear(dayOfYear);
  return SOLAR_CONSTANT_ASHRAE * (1 + 0.033 * cos((2 * PI * (n - 3)) / 365)); // ASHRAE ch. 14 Eq. 4
}

/**
 * Extraterrestrial normal irradiance by Spencer's (1971) Fourier series of the Earth–Sun distance.
 *
 * @param dayOfYear - day of the year, 1 … 366; fractions allowed
 * @returns extraterrestrial irradiance on a plane normal to the sun [W/m²], about 1321…1414
 * @remarks Γ = 2π (n − 1) / 365; (r0/r)² = 1.000110 + 0.034221 cos Γ + 0.001280 sin Γ
 * + 0.000719 cos 2Γ + 0.000077 sin 2Γ (Spencer, J. W. (1971), "Fourier series representation of
 * the position of the sun", Search 2(5), 172), times the solar constant 1366.1 W/m².
 */
export function extraterrestrialSpencer(dayOfYear: number): number {
  const n = requireDayOfYear(dayOfYear);
  const gammaRad = (2 * PI * (n - 1)) / 365; // day angle
  const distanceFactor =
    1.00011 + 0.034221 * cos(gammaRad) + 0.00128 * sin(gammaRad) + 0.000719 * cos(2 * gammaRad) + 0.000077 * sin(2 * gammaRad);
  return SOLAR_CONSTANT_SPENCER * distanceFactor;
}
