/**
 * ΔT = TT − UT: the difference between Terrestrial Time, which the SPA's planetary series run on,
 * and Universal Time, which clocks keep. Known from observation in the past and extrapolated ahead.
 */
import { julianDay } from './calendar';

/**
 * ΔT = TT − UT [s] by the polynomial expressions of Espenak & Meeus (2006), *Five Millennium Canon
 * of Solar Eclipses* (NASA/TP-2006-214141), section "Polynomial expressions for Delta T", for
 * 1860 onward.
 * @param decimalYear - year with fraction, e.g. 2003.79; ≥ 1860
 * @returns ΔT [s]
 */
export function deltaTEspenakMeeus(decimalYear: number): number {
  const y = decimalYear;
  if (y < 1900) {
    const t = y - 1860;
    return 7.62 + 0.5737 * t - 0.251754 * t ** 2 + 0.01680668 * t ** 3 - 0.0004473624 * t ** 4 + t ** 5 / 233_174;
  }
  if (y < 1920) {
    const t = y - 1900;
    return -2.79 + 1.494119 * t - 0.0598939 * t ** 2 + 0.0061966 * t ** 3 - 0.000197 * t ** 4;
  }
  if (y < 1941) {
    const t = y - 1920;
    return 21.2 + 0.84493 * t - 0.0761 * t ** 2 + 0.0020936 * t ** 3;
  }
  if (y < 1961) {
    const t = y - 1950;
    return 29.07 + 0.407 * t - t ** 2 / 233 + t ** 3 / 2547;
  }
  if (y < 1986) {
    const t = y - 1975;
    return 45.45 + 1.067 * t - t ** 2 / 260 - t ** 3 / 718;
  }
  if (y < 2005) {
    const t = y - 2000;
    return 63.86 + 0.3345 * t - 0.060374 * t ** 2 + 0.0017275 * t ** 3 + 0.000651814 * t ** 4 + 0.00002373599 * t ** 5;
  }
  if (y < 2050) {
    const t = y - 2000;
    return 62.92 + 0.32217 * t + 0.005589 * t ** 2;
  }
  if (y < 2150) {
    const u = (y - 1820) / 100;
    return -20 + 32 * u * u - 0.5628 * (2150 - y);
  }
  const u = (y - 1820) / 100;
  return -20 + 32 * u * u;
}

/**
 * Decimal year of a UTC instant as the ΔT polynomials define it: y = year + (month − 0.5) / 12, so
 * 2000.0 falls in mid-January 2000 (JD 2451545 + 14), counted on in tropical years.
 */
export function decimalYear(utcMs: number): number {
  return 2000 + (julianDay(utcMs) - 2_451_545 - 14) / 365.24217;
}

/** ΔT [s] at a UTC instant by {@link deltaTEspenakMeeus}. */
export function deltaTAt(utcMs: number): number {
  return deltaTEspenakMeeus(decimalYear(utcMs));
}
