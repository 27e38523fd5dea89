/**
 * Outdoor dry-bulb temperature for the conduction gain of a window: from the weather rows, or on a
 * clear design day from the day's highest temperature and its daily range by the fractions of the
 * daily range hour by hour.
 *
 * Fractions of daily range: the profile of the fundamentals handbook's climatic-design chapter
 * (ASHRAE Handbook—Fundamentals 2009 and later, ch. 14, "Generating design-day data", table of
 * fractions of daily temperature range; the 24 values below are from memory — the table itself
 * could not be read through this project's search): T(h) = Tmax − f(h) · DR, with f = 1 at the
 * coolest hour (05:00) and 0 at the warmest (14:00 and 15:00). Hours are hour-ending, local
 * standard time.
 */
import { requireRange } from '../common';

/** Fraction of the daily range below the day's highest dry-bulb, hour ending 1…24 (index 0 = hour ending 01:00); from memory. */
export const DAILY_RANGE_FRACTIONS: readonly number[] = Object.freeze([
  0.88, 0.92, 0.95, 0.98, 1.0, 0.98, 0.91, 0.74, 0.55, 0.38, 0.23, 0.13, 0.05, 0.0, 0.0, 0.06, 0.14, 0.24, 0.39, 0.5, 0.59, 0.68, 0.75, 0.82,
]);

/** Range of temperatures accepted [°C]. */
export const DRY_BULB_MIN = -60;
export const DRY_BULB_MAX = 60;
/** Largest daily range accepted [K]. */
export const DAILY_RANGE_MAX = 40;

/**
 * Design-day dry-bulb for one hour.
 * @param dryBulbMax - the day's highest dry-bulb [°C], −60…60
 * @param dailyRange - the day's range [K], 0…40
 * @param hourEnding - hour ending 1…24 (local standard time); fractions allowed and interpolated
 *   linearly between the table's hours (hour 0 = hour 24)
 * @returns dry-bulb [°C] = Tmax − f(h) · DR
 */
export function designDayDryBulb(dryBulbMax: number, dailyRange: number, hourEnding: number): number {
  const t = requireRange('dryBulbMax', dryBulbMax, DRY_BULB_MIN, DRY_BULB_MAX, '°C');
  const dr = requireRange('dailyRange', dailyRange, 0, DAILY_RANGE_MAX, 'K');
  const h = requireRange('hourEnding', hourEnding, 0, 24, 'h');
  return t - fractionOfDailyRange(h) * dr;
}

/** The fraction of daily range at a (fractional) hour ending 0…24, linear between the tabulated hours. */
export function fractionOfDailyRange(hourEnding: number): number {
  const k = Math.floor(hourEnding);
  const f = hourEnding - k;
  const at = (hour: number) => DAILY_RANGE_FRACTIONS[(((hour - 1) % 24) + 24) % 24];
  // The look-up wraps (hour 0 is hour 24); on a whole hour f = 0 and the second term adds exactly 0.
  return at(k) * (1 - f) + at(k + 1) * f;
}
