/**
 * The sun's path over a whole year, hour by hour: the fast path of the NREL SPA.
 *
 * The Earth-fixed (slow) part of the SPA — heliocentric position, nutation, obliquity, aberration,
 * geocentric right ascension and declination, Earth–sun distance, equation of time — changes
 * smoothly over a day, so it is computed once per day at 0 h UT (Reda & Andreas 2008, Eq. 4–30 and
 * A1–A4, by {@link spaGeocentric}) and interpolated in between by four-point (cubic) Lagrange
 * interpolation over the days before and after. Only the fast part is done per hour: mean sidereal
 * time (Eq. 27, exact), hour angle (Eq. 31), parallax, altitude, refraction and azimuth (Eq. 32–46).
 *
 * The parallax step uses the vector form of the SPA's Eq. 36–41 (the sun's geocentric direction
 * scaled by its distance in Earth radii, 1/sin ξ, minus the observer's position (x, 0, y)); the two
 * are algebraically identical. tests/core/sunPath.test.ts shows agreement with {@link sunPosition}
 * within 1e-4° over full years at several latitudes.
 */
import { DEG, RAD, asinClamped } from './angles';
import { SunpaneError } from './errors';
import { type SpaSteps, refractionSpa, requireSite, resolveSunOptions, spaGeocentric } from './sun';
import { civilToSerial, deltaTAt, hoursInYear, julianDay, requireUtcOffset, requireYear, serialToUtcMs } from './time';
import type { Site } from './window';

const { sin, cos, tan, atan, atan2, sqrt, floor } = Math;

const MS_PER_HOUR = 3_600_000;
const MS_PER_DAY = 86_400_000;
const JD_J2000 = 2_451_545;
const POLAR_RATIO = 0.99664719; // SPA Eq. 33–35
const EARTH_RADIUS_M = 6_378_140;

/** One year of hourly sun positions at a site. */
export interface SunPathYear {
  year: number;
  /** 8760, or 8784 in a leap year. */
  hours: number;
  /** Local standard-time serial at the END of each hour (row stamp). */
  stampSerial: Float64Array;
  /** Topocentric altitude with refraction [°], −90…90 (negative at night). */
  altitude: Float64Array;
  /** Azimuth clockwise from true north [°], [0, 360). */
  azimuth: Float64Array;
  /** Zenith angle, 90 − altitude [°]. */
  zenith: Float64Array;
  /** Geocentric declination [°]. */
  declination: Float64Array;
  /** Equation of time [min]. */
  equationOfTime: Float64Array;
}

export interface SunPathOptions {
  /** Where in each hour the sun is evaluated: `middle` (default, DESIGN.md) or `end` (the stamp). */
  at?: 'middle' | 'end';
  /** ΔT = TT − UT [s], −100…10000; default Espenak & Meeus (2006) per day. */
  deltaT?: number;
}

/**
 * Hourly sun positions for a calendar year at a site (local standard time, rows stamped at the end
 * of each hour).
 * @param year - calendar year, 1901…9998
 * @param site - latitude [°] −90…90, longitude [°] −180…180, utcOffset [h] −12…14, and optional
 *   elevation [m], pressure [hPa], temperature [°C] as for {@link sunPosition}
 * @param options - `at`: `middle` (default) evaluates the sun at the middle of each hour, `end` at the
 *   stamp; `deltaT` [s]
 * @returns typed arrays, one value per hour; at night the altitude is simply negative
 * @remarks NREL SPA (Reda & Andreas 2008) with the slow terms computed daily and interpolated by
 *   cubic Lagrange interpolation; agrees with the direct algorithm within 1e-4°. Errors name the
 *   site fields as `site.latitude`, `site.longitude`, `site.utcOffset`, `site.elevation`,
 *   `site.pressure`, `site.temperature`.
 */
export function annualSunPath(year: number, site: Site, options: SunPathOptions = {}): SunPathYear {
  requireYear(year);
  if (site === null || typeof site !== 'object') throw new SunpaneError('site', site, 'must be a site with latitude, longitude and utcOffset');
  const { latitude, longitude, utcOffset } = site;
  requireSite(latitude, longitude, 'site.');
  requireUtcOffset(utcOffset, 'site.utcOffset');
  const at = options.at ?? 'middle';
  if (at !== 'middle' && at !== 'end') throw new SunpaneError('at', at, 'must be "middle" or "end"');
  const o = resolveSunOptions({ elevation: site.elevation, pressure: site.pressure, temperature: site.temperature, deltaT: options.deltaT }, 'site.');

  const hours = hoursInYear(year);
  const startSerial = civilToSerial(year, 1, 1);
  const yearStartMs = serialToUtcMs(startSerial, utcOffset);
  const shiftMs = (at === 'end' ? 1 : 0.5) * MS_PER_HOUR;

  // Daily nodes at 0 h UT, one before and two after the span of the instants.
  const firstDay = floor((yearStartMs + shiftMs) / MS_PER_DAY) - 1;
  const lastDay = floor((yearStartMs + shiftMs + (hours - 1) * MS_PER_HOUR) / MS_PER_DAY) + 2;
  const nodes = lastDay - firstDay + 1;
  const raLessNutation = new Float64Array(nodes); // α − Δψ cos ε [°], unwrapped
  const aNode = new Float64Array(nodes); // cos δ / sin ξ
  const bNode = new Float64Array(nodes); // sin δ / sin ξ
  const declNode = new Float64Array(nodes);
  const eotNode = new Float64Array(nodes);
  const steps = {} as SpaSteps;
  for (let n = 0; n < nodes; n++) {
    const ms = (firstDay + n) * MS_PER_DAY;
    spaGeocentric(julianDay(ms), o.deltaT ?? deltaTAt(ms), steps);
    let g = steps.alpha - steps.deltaPsi * cos(steps.epsilon * RAD); // so that H = ν0 + σ − g (Eq. 28, 31)
    if (n > 0) while (g < raLessNutation[n - 1] - 180) g += 360; // unwrap across 360°
    raLessNutation[n] = g;
    const inverseSinXi = 1 / sin(((8.794 / 3600) * RAD) / steps.R); // Eq. 32: distance in Earth radii
    aNode[n] = cos(steps.delta * RAD) * inverseSinXi;
    bNode[n] = sin(steps.delta * RAD) * inverseSinXi;
    declNode[n] = steps.delta;
    eotNode[n] = steps.E;
  }

  // Observer constants, Eq. 33–35.
  const latRad = latitude * RAD;
  const sinLat = sin(latRad);
  const cosLat = cos(latRad);
  const uRad = atan(POLAR_RATIO * tan(latRad));
  const x = cos(uRad) + (o.elevation / EARTH_RADIUS_M) * cosLat;
  const y = POLAR_RATIO * sin(uRad) + (o.elevation / EARTH_RADIUS_M) * sinLat;
  const { pressure, temperature } = o;

  const stampSerial = new Float64Array(hours);
  const altitude = new Float64Array(hours);
  const azimuth = new Float64Array(hours);
  const zenith = new Float64Array(hours);
  const declination = new Float64Array(hours);
  const equationOfTime = new Float64Array(hours);

  for (let i = 0; i < hours; i++) {
    stampSerial[i] = startSerial + (i + 1) / 24;
    const ms = yearStartMs + i * MS_PER_HOUR + shiftMs;
    const dayPos = ms / MS_PER_DAY - firstDay;
    const k = floor(dayPos);
    const p = dayPos - k;
    // Cubic Lagrange weights for nodes k−1, k, k+1, k+2 at −1, 0, 1, 2.
    const pm1 = p - 1;
    const pm2 = p - 2;
    const pp1 = p + 1;
    const w0 = (-p * pm1 * pm2) / 6;
    const w1 = (pp1 * pm1 * pm2) / 2;
    const w2 = (-pp1 * p * pm2) / 2;
    const w3 = (pp1 * p * pm1) / 6;
    const g = w0 * raLessNutation[k - 1] + w1 * raLessNutation[k] + w2 * raLessNutation[k + 1] + w3 * raLessNutation[k + 2];
    const a = w0 * aNode[k - 1] + w1 * aNode[k] + w2 * aNode[k + 1] + w3 * aNode[k + 2];
    const b = w0 * bNode[k - 1] + w1 * bNode[k] + w2 * bNode[k + 1] + w3 * bNode[k + 2];
    declination[i] = w0 * declNode[k - 1] + w1 * declNode[k] + w2 * declNode[k + 1] + w3 * declNode[k + 2];
    equationOfTime[i] = w0 * eotNode[k - 1] + w1 * eotNode[k] + w2 * eotNode[k + 1] + w3 * eotNode[k + 2];

    const jdOffset = julianDay(ms) - JD_J2000;
    const jc = jdOffset / 36_525;
    const nu0 = (280.46061837 + 360.98564736629 * jdOffset + jc * jc * (0.000387933 - jc / 38_710_000)) % 360; // Eq. 27
    const HRad = (nu0 + longitude - g) * RAD; // Eq. 28, 31
    // Topocentric vector in Earth radii: X toward the meridian, Y westward, Z toward the pole (Eq. 36–40).
    const vx = a * cos(HRad) - x;
    const vy = a * sin(HRad);
    const vz = b - y;
    const e0 = asinClamped((sinLat * vz + cosLat * vx) / sqrt(vx * vx + vy * vy + vz * vz)) * DEG; // Eq. 41
    const e = e0 + refractionSpa(e0, pressure, temperature); // Eq. 42, 43
    altitude[i] = e;
    zenith[i] = 90 - e; // Eq. 44
    const az = atan2(vy, vx * sinLat - vz * cosLat) * DEG + 180; // Eq. 45, 46
    azimuth[i] = az >= 360 ? az - 360 : az;
  }
  return { year, hours, stampSerial, altitude, azimuth, zenith, declination, equationOfTime };
}
