/**
 * The sun's path over a whole year, hour by hour: the fast path of the NREL SPA.
 *
 * The Earth-fixed (slow) part of the SPA — heliocentric position, nutation, obliquity, aberration,
 * geocentric right ascension and declination, Earth–sun distance, equation of time — changes
 * smoothly, so it is computed every second day at 0 h UT (Reda & Andreas 2008, Eq. 4–30 and
 * A1–A4, by {@link spaGeocentricSeries}: the periodic terms are carried from node to node by
 * rotation, so cos and sin are called only at the first node) and interpolated in between by
 * six-point (quintic) Lagrange interpolation over the nodes before and after, evaluated per node
 * step as a polynomial by Horner's rule. Only the fast part is done per hour: mean sidereal time
 * (Eq. 27, exact), hour angle (Eq. 31), parallax, altitude, refraction and azimuth (Eq. 32–46).
 *
 * Per hour nothing is allocated and few functions are called: cos and sin of the hour angle are
 * computed directly once a day and carried hour to hour by rotation; the parallax step uses the
 * vector form of the SPA's Eq. 36–41 (the sun's geocentric direction scaled by its distance in
 * Earth radii, 1/sin ξ, minus the observer's position (x, 0, y); algebraically identical); altitude
 * and azimuth are Math.atan2 of the vector's components, and the refraction's tangent comes from
 * the same components (no Math.tan). On request
 * the sines and cosines of altitude and azimuth are taken from the vector too (callers then need no
 * Math.sin / Math.cos per hour). The hourly work runs as short passes over the year (interpolation,
 * hour angle, vector, angles; with the trig columns altitude, refraction and azimuth each a pass of
 * their own), each pass a function of its own, which the
 * engine runs much faster than one long loop body. tests/core/sun/sunPath.test.ts shows agreement with
 * {@link sunPosition} within 1e-4° over full years at several latitudes (measured: altitude
 * ≤ 4e-7°, azimuth ≤ 7e-6° near the zenith).
 */
import { DEG, RAD, SunpaneError } from '../common';
import { EARTH_RADIUS_M, POLAR_RATIO, RISE_SET_ALTITUDE, requireSite, resolveSunOptions, spaGeocentricSeries } from './spa';
import { civilToSerial, deltaTAt, hoursInYear, julianDay, requireUtcOffset, requireYear, serialToUtcMs } from '../time';
import type { Site } from './site';

const { atan, atan2, ceil, cos, floor, min, round, sin, sqrt, tan } = Math;

const MS_PER_HOUR = 3_600_000;
const MS_PER_DAY = 86_400_000;
/** Days from 1970-01-01 00:00 UT to J2000.0 (JD 2451545.0). */
const DAYS_UNIX_TO_J2000 = 10_957.5;
const COS_15 = cos(15 * RAD);
const SIN_15 = sin(15 * RAD);
/**
 * Days between nodes. The slow terms' fastest periodic parts (lunar terms of 9.1–29.5 days in the
 * nutation and the Earth series, amplitudes ≤ 0.002°) make the interpolation error grow as
 * (2π·step/period)^(order + 1). Quintic (six-point) Lagrange interpolation at 2-day steps keeps it
 * near 3e-7° in altitude (azimuth errors grow as 1/cos(altitude) near the zenith: ~1e-5° at worst),
 * well under the 1e-4° requirement (measured in tests/core/sun/sunPath.test.ts).
 */
const NODE_STEP_DAYS = 2;
const HOURS_PER_STEP = 24 * NODE_STEP_DAYS;

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
  /** Geocentric declination [°]; empty (length 0) with `options.slowColumns` false. */
  declination: Float64Array;
  /** Equation of time [min]; empty (length 0) with `options.slowColumns` false. */
  equationOfTime: Float64Array;
  /**
   * With `options.trig`: sine and cosine of `altitude` and of `azimuth`, from the topocentric vector
   * (within a few ulps of Math.sin / Math.cos of the columns); otherwise undefined.
   */
  sinAltitude: Float64Array | undefined;
  cosAltitude: Float64Array | undefined;
  sinAzimuth: Float64Array | undefined;
  cosAzimuth: Float64Array | undefined;
}

export interface SunPathOptions {
  /**
   * Where in each hour the sun is evaluated and how rows are stamped: `middle` (default: rows
   * stamped at the end of each hour, sun at mid-hour — the `hourEnding` time convention, docs/conventions.md#hourly-rows), `end`
   * (stamped at the end, sun at the stamp) or `start` (stamped at the start, sun at the stamp — the
   * `instant` convention: rows 00:00 … 23:00).
   */
  at?: 'middle' | 'end' | 'start';
  /** ΔT = TT − UT [s], −100…10000; default Espenak & Meeus (2006) per day. */
  deltaT?: number;
  /**
   * Also the sines and cosines of altitude and azimuth: `true` in fresh columns, or in the given
   * columns (each at least `hours` long; e.g. columns of the caller's that it overwrites row by row
   * after reading them). Default false (no trig columns).
   */
  trig?: boolean | SunTrigColumns;
  /**
   * Whether to fill the declination and equation-of-time columns (default true). A caller that uses
   * only the sun's position (e.g. src/core/gain/annual.ts) passes false and saves their interpolation and
   * allocation; the two columns are then empty (length 0).
   */
  slowColumns?: boolean;
}

/** Columns for the sines and cosines of the sun's altitude and azimuth, one value per hour. */
export interface SunTrigColumns {
  sinAltitude: Float64Array;
  cosAltitude: Float64Array;
  sinAzimuth: Float64Array;
  cosAzimuth: Float64Array;
}

/**
 * Hourly sun positions for a calendar year at a site (local standard time, rows stamped at the end
 * of each hour).
 * @param year - calendar year, 1901…9998
 * @param site - latitude [°] −90…90, longitude [°] −180…180, utcOffset [h] −12…14, and optional
 *   elevation [m], pressure [hPa], temperature [°C] as for {@link sunPosition}
 * @param options - `at`: `middle` (default) evaluates the sun at the middle of each hour, `end` at the
 *   stamp, `start` at the start of each hour (stamped there); `deltaT` [s]; `trig`: also the sines and cosines of altitude and azimuth (`true`: fresh
 *   columns; or columns to fill, each at least as long as the year has hours); `slowColumns`:
 *   false leaves the declination and equation-of-time columns empty (default true)
 * @returns typed arrays, one value per hour; at night the altitude is simply negative
 * @remarks NREL SPA (Reda & Andreas 2008) with the slow terms computed every second day and
 *   interpolated by quintic Lagrange interpolation; agrees with the direct algorithm within 1e-4°. Errors name the
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
  if (at !== 'middle' && at !== 'end' && at !== 'start') throw new SunpaneError('at', at, 'must be "middle", "end" or "start"');
  const trig = options.trig ?? false;
  if (typeof trig !== 'boolean' && !isTrigColumns(trig, hoursInYear(year)))
    throw new SunpaneError('trig', trig, 'must be true, false or four Float64Array columns (sinAltitude, cosAltitude, sinAzimuth, cosAzimuth) as long as the year');
  const slowColumns = options.slowColumns ?? true;
  if (typeof slowColumns !== 'boolean') throw new SunpaneError('slowColumns', slowColumns, 'must be true or false');
  const o = resolveSunOptions({ elevation: site.elevation, pressure: site.pressure, temperature: site.temperature, deltaT: options.deltaT }, 'site.');

  const hours = hoursInYear(year);
  const startSerial = civilToSerial(year, 1, 1);
  const yearStartMs = serialToUtcMs(startSerial, utcOffset);
  const shiftMs = (at === 'end' ? 1 : at === 'start' ? 0 : 0.5) * MS_PER_HOUR;

  // Nodes at 0 h UT every NODE_STEP_DAYS days, two before and three after the span of the instants.
  const firstDay = floor((yearStartMs + shiftMs) / MS_PER_DAY) - 2 * NODE_STEP_DAYS;
  const lastDay = floor((yearStartMs + shiftMs + (hours - 1) * MS_PER_HOUR) / MS_PER_DAY) + 3 * NODE_STEP_DAYS;
  const nodes = floor((lastDay - firstDay) / NODE_STEP_DAYS) + 1;
  const gNode = new Float64Array(nodes); // α − Δψ cos ε [°], unwrapped
  const aNode = new Float64Array(nodes); // cos δ / sin ξ
  const bNode = new Float64Array(nodes); // sin δ / sin ξ
  const declNode = new Float64Array(nodes);
  const eotNode = new Float64Array(nodes);
  const firstMs = firstDay * MS_PER_DAY;
  const lastMs = (firstDay + (nodes - 1) * NODE_STEP_DAYS) * MS_PER_DAY;
  spaGeocentricSeries(julianDay(firstMs), NODE_STEP_DAYS, nodes, o.deltaT ?? deltaTAt(firstMs), o.deltaT ?? deltaTAt(lastMs), (n, steps) => {
    let g = steps.alpha - steps.deltaPsi * cos(steps.epsilon * RAD); // so that H = ν0 + σ − g (Eq. 28, 31)
    if (n > 0) while (g < gNode[n - 1] - 180) g += 360; // unwrap across 360°
    gNode[n] = g;
    const inverseSinXi = 1 / sin(((8.794 / 3600) * RAD) / steps.R); // Eq. 32: distance in Earth radii
    aNode[n] = cos(steps.delta * RAD) * inverseSinXi;
    bNode[n] = sin(steps.delta * RAD) * inverseSinXi;
    declNode[n] = steps.delta;
    eotNode[n] = steps.E;
  });

  // Observer constants, Eq. 33–35.
  const latRad = latitude * RAD;
  const sinLat = sin(latRad);
  const cosLat = cos(latRad);
  const uRad = atan(POLAR_RATIO * tan(latRad));
  const x = cos(uRad) + (o.elevation / EARTH_RADIUS_M) * cosLat;
  const y = POLAR_RATIO * sin(uRad) + (o.elevation / EARTH_RADIUS_M) * sinLat;

  const stampSerial = new Float64Array(hours);
  const altitude = new Float64Array(hours);
  const azimuth = new Float64Array(hours);
  const zenith = new Float64Array(hours);
  const declination = new Float64Array(slowColumns ? hours : 0);
  const equationOfTime = new Float64Array(slowColumns ? hours : 0);
  const given = typeof trig === 'object' ? trig : undefined;
  const sinAltitude = given ? given.sinAltitude : trig ? new Float64Array(hours) : undefined;
  const cosAltitude = given ? given.cosAltitude : trig ? new Float64Array(hours) : undefined;
  const sinAzimuth = given ? given.sinAzimuth : trig ? new Float64Array(hours) : undefined;
  const cosAzimuth = given ? given.cosAzimuth : trig ? new Float64Array(hours) : undefined;
  const result: SunPathYear = {
    year,
    hours,
    stampSerial,
    altitude,
    azimuth,
    zenith,
    declination,
    equationOfTime,
    sinAltitude,
    cosAltitude,
    sinAzimuth,
    cosAzimuth,
  };

  // Hour i lies at node position (hourOffset + i) / HOURS_PER_STEP (a whole number of quarter hours
  // past the first node, so the split into segment and fraction is exact).
  const hourOffset = (yearStartMs + shiftMs) / MS_PER_HOUR - 24 * firstDay;
  const g = interpolateHourly(gNode, hourOffset, hours, G_SCRATCH);
  const a = interpolateHourly(aNode, hourOffset, hours, A_SCRATCH);
  const b = interpolateHourly(bNode, hourOffset, hours, B_SCRATCH);
  if (slowColumns) {
    interpolateHourly(declNode, hourOffset, hours, declination);
    interpolateHourly(eotNode, hourOffset, hours, equationOfTime);
  }

  // The hourly passes are functions of their own: a loop that the engine optimises while it runs
  // (on-stack replacement) leaves the code after it without type feedback, and a property read there
  // (a module import, an option) made the optimised annualSunPath bail out on every call.
  hourlyHourAngles(hours, startSerial, at === 'start' ? 0 : 1, yearStartMs, shiftMs, longitude, g, stampSerial);
  hourlyVectors(hours, sinLat, cosLat, x, y, g, a, b, altitude, zenith, azimuth, SOUTH_SCRATCH);
  const refractionScale = ((o.pressure / 1010) * (283 / (273 + o.temperature)) * 1.02) / 60; // Eq. 42, constant part
  if (sinAltitude && cosAltitude && sinAzimuth && cosAzimuth)
    hourlyAnglesWithTrig(hours, refractionScale, altitude, zenith, azimuth, SOUTH_SCRATCH, sinAltitude, cosAltitude, sinAzimuth, cosAzimuth);
  else hourlyAngles(hours, refractionScale, altitude, zenith, azimuth, SOUTH_SCRATCH);
  return result;
}

/** Whether `value` holds the four trig columns, Float64Arrays of at least `hours` entries. */
function isTrigColumns(value: unknown, hours: number): value is SunTrigColumns {
  if (value === null || typeof value !== 'object') return false;
  const v = value as Record<string, unknown>;
  return [v.sinAltitude, v.cosAltitude, v.sinAzimuth, v.cosAzimuth].every((c) => c instanceof Float64Array && c.length >= hours);
}

/**
 * Pass 1 of {@link annualSunPath}: row stamps and the hour angle of every hour (kept apart from the
 * vector pass: two short loops run faster than one long one).
 * @param hours - number of hours
 * @param startSerial - local serial of the start of the year
 * @param stampHour - 1: rows stamped at the end of their hour; 0: at its start
 * @param yearStartMs - UTC time of the start of the year [ms since 1970]
 * @param shiftMs - where in the hour the sun is evaluated [ms]
 * @param longitude - site longitude [°]
 * @param g - in: per hour, α − Δψ cos ε [°]; out: the hour angle H [°], not reduced
 * @param stampSerial - filled with the row stamps
 */
function hourlyHourAngles(hours: number, startSerial: number, stampHour: number, yearStartMs: number, shiftMs: number, longitude: number, g: Float64Array, stampSerial: Float64Array): void {
  for (let i = 0; i < hours; i++) {
    stampSerial[i] = startSerial + (i + stampHour) / 24;
    // Eq. 27 with 360.98564736629·D split as 360·frac(D) + 0.98564736629·D to keep H small and exact.
    const days = (yearStartMs + i * MS_PER_HOUR + shiftMs) * (1 / MS_PER_DAY) - DAYS_UNIX_TO_J2000; // JD − 2451545
    const jc = days * (1 / 36_525);
    const nu0 = 280.46061837 + 360 * (days - floor(days)) + 0.98564736629 * days + jc * jc * (0.000387933 - jc / 38_710_000);
    g[i] = nu0 + longitude - g[i]; // Eq. 28, 31 [°], not reduced
  }
}

/**
 * Pass 2 of {@link annualSunPath}: the topocentric vector per hour. Its up, horizontal, westward and
 * southward components are parked in `up`, `horizontal`, `west` and `south` for pass 3.
 * @param hours - number of hours
 * @param sinLat - sine of the latitude
 * @param cosLat - cosine of the latitude
 * @param x - observer's distance from the Earth's axis [Earth radii] (SPA Eq. 34, 35)
 * @param y - observer's distance from the equatorial plane [Earth radii]
 * @param hourAngles - per hour, the hour angle [°] (pass 1)
 * @param a - per hour, cos δ / sin ξ
 * @param b - per hour, sin δ / sin ξ
 * @param up - filled with the up component
 * @param horizontal - filled with the horizontal length
 * @param west - filled with the westward component
 * @param south - filled with the southward component
 */
function hourlyVectors(
  hours: number,
  sinLat: number,
  cosLat: number,
  x: number,
  y: number,
  hourAngles: Float64Array,
  a: Float64Array,
  b: Float64Array,
  up: Float64Array,
  horizontal: Float64Array,
  west: Float64Array,
  south: Float64Array,
): void {
  const rad = RAD;
  const cos15 = COS_15;
  const sin15 = SIN_15;
  // cos and sin of the hour angle: directly every 24 hours, by rotation through one hour in between.
  let cosH = 1;
  let sinH = 0;
  let previousHourAngle = 0;
  for (let i = 0; i < hours; i++) {
    const hourAngle = hourAngles[i];
    if (i % 24 === 0) {
      cosH = cos(hourAngle * rad);
      sinH = sin(hourAngle * rad);
    } else {
      // H advances 15° + ε per hour (|ε| ≈ 0.04°): rotate by 15° and by ε (Taylor to ε⁵, exact to 1e-20).
      let step = hourAngle - previousHourAngle - 15;
      step -= 360 * round(step / 360);
      const eps = step * rad;
      const eps2 = eps * eps;
      const cosEps = 1 - eps2 * (0.5 - eps2 / 24);
      const sinEps = eps * (1 - eps2 * (1 / 6 - eps2 / 120));
      const cosStep = cos15 * cosEps - sin15 * sinEps;
      const sinStep = sin15 * cosEps + cos15 * sinEps;
      const c = cosH * cosStep - sinH * sinStep;
      sinH = sinH * cosStep + cosH * sinStep;
      cosH = c;
    }
    previousHourAngle = hourAngle;
    // Topocentric vector in Earth radii: X toward the meridian, Y westward, Z toward the pole (Eq. 36–40).
    const vx = a[i] * cosH - x;
    const vy = a[i] * sinH;
    const vz = b[i] - y;
    const s = vx * sinLat - vz * cosLat;
    up[i] = sinLat * vz + cosLat * vx;
    horizontal[i] = sqrt(vy * vy + s * s);
    west[i] = vy;
    south[i] = s;
  }
}

/**
 * Pass 3 of {@link annualSunPath}: altitude (Eq. 41, as atan2 of the up and horizontal
 * components), refraction (Eq. 42, 43 as in refractionSpa: none below −(0.26667 + 0.5667)°), zenith
 * (Eq. 44), azimuth (Eq. 45, 46), written over the components of pass 2.
 * @param hours - number of hours
 * @param refractionScale - constant part of Eq. 42 [°]
 * @param altitude - in: up component; out: altitude [°]
 * @param zenith - in: horizontal length; out: zenith angle [°]
 * @param azimuth - in: westward component; out: azimuth [°], [0, 360)
 * @param south - southward component
 */
function hourlyAngles(hours: number, refractionScale: number, altitude: Float64Array, zenith: Float64Array, azimuth: Float64Array, south: Float64Array): void {
  const deg = DEG;
  const refractionFrom = RISE_SET_ALTITUDE;
  for (let i = 0; i < hours; i++) {
    const u = altitude[i];
    const h = zenith[i];
    const e0 = atan2(u, h) * deg;
    const e = e0 < refractionFrom ? e0 : e0 + refractionFromComponents(refractionScale, u, h, e0);
    altitude[i] = e;
    zenith[i] = 90 - e;
    const az = atan2(azimuth[i], south[i]) * deg + 180;
    azimuth[i] = az >= 360 ? az - 360 : az;
  }
}

/**
 * {@link hourlyAngles} that also writes the sines and cosines of altitude and azimuth, taken from the
 * components (sin e₀ = up / r, cos e₀ = horizontal / r; sin A = −west / horizontal, cos A = −south /
 * horizontal, as A = atan2(west, south) + 180°) and turned through the refraction Δe by its sine and
 * cosine (Taylor to Δe⁵ and Δe⁴; |Δe| < 0.02 rad, truncation < 1e-17). Since the angle columns come
 * from Math.atan2 (within an ulp), these agree with Math.sin / Math.cos of the columns
 * within a few ulps. With the sun exactly overhead (horizontal 0) the azimuth is 180° as in
 * {@link hourlyAngles}: sine 0, cosine −1.
 * @param hours - number of hours
 * @param refractionScale - constant part of Eq. 42 [°]
 * @param altitude - in: up component; out: altitude [°]
 * @param zenith - in: horizontal length; out: zenith angle [°]
 * @param azimuth - in: westward component; out: azimuth [°], [0, 360)
 * @param south - southward component
 * @param sinAlt - filled with sin(altitude)
 * @param cosAlt - filled with cos(altitude)
 * @param sinAz - filled with sin(azimuth)
 * @param cosAz - filled with cos(azimuth)
 */
function hourlyAnglesWithTrig(
  hours: number,
  refractionScale: number,
  altitude: Float64Array,
  zenith: Float64Array,
  azimuth: Float64Array,
  south: Float64Array,
  sinAlt: Float64Array,
  cosAlt: Float64Array,
  sinAz: Float64Array,
  cosAz: Float64Array,
): void {
  hourlyAltitudesWithTrig(hours, refractionScale, altitude, zenith, sinAlt, cosAlt);
  hourlyAzimuthsWithTrig(hours, azimuth, south, sinAz, cosAz);
}

/**
 * The altitude half of {@link hourlyAnglesWithTrig}, itself two passes (short loops run faster):
 * the geometric altitude e₀ with its sine and cosine for every hour, then the refraction for the
 * hours at or above −(0.26667 + 0.5667)°, from the same components as {@link hourlyAngles} (so the
 * altitude is the same number with or without the trig columns): the first pass keeps the up
 * component in a scratch column and leaves the horizontal length in `zenith`.
 * @param hours - number of hours
 * @param refractionScale - constant part of Eq. 42 [°]
 * @param altitude - in: up component; out: altitude [°]
 * @param zenith - in: horizontal length; out: zenith angle [°]
 * @param sinAlt - filled with sin(altitude)
 * @param cosAlt - filled with cos(altitude)
 */
function hourlyAltitudesWithTrig(hours: number, refractionScale: number, altitude: Float64Array, zenith: Float64Array, sinAlt: Float64Array, cosAlt: Float64Array): void {
  const deg = DEG;
  for (let i = 0; i < hours; i++) {
    const u = altitude[i];
    const h = zenith[i];
    const inverseR = 1 / sqrt(u * u + h * h);
    sinAlt[i] = u * inverseR;
    cosAlt[i] = h * inverseR;
    altitude[i] = atan2(u, h) * deg;
    UP_SCRATCH[i] = u;
  }
  hourlyRefraction(hours, refractionScale, altitude, zenith, UP_SCRATCH, sinAlt, cosAlt);
}

/**
 * Second pass of {@link hourlyAltitudesWithTrig}: refraction (Eq. 43) added to the altitude, its
 * sine and cosine turned through Δe by Δe's sine and cosine (Taylor to Δe⁵ and Δe⁴; |Δe| < 0.02 rad,
 * truncation < 1e-17), and the zenith angle (Eq. 44).
 * @param hours - number of hours
 * @param refractionScale - constant part of Eq. 42 [°]
 * @param altitude - in: geometric altitude e₀ [°]; out: with refraction [°]
 * @param zenith - in: horizontal length; out: zenith angle [°]
 * @param up - up component
 * @param sinAlt - in: sin e₀; out: sin(altitude)
 * @param cosAlt - in: cos e₀; out: cos(altitude)
 */
function hourlyRefraction(hours: number, refractionScale: number, altitude: Float64Array, zenith: Float64Array, up: Float64Array, sinAlt: Float64Array, cosAlt: Float64Array): void {
  const rad = RAD;
  const refractionFrom = RISE_SET_ALTITUDE;
  for (let i = 0; i < hours; i++) {
    const e0 = altitude[i];
    if (e0 < refractionFrom) {
      zenith[i] = 90 - e0;
      continue;
    }
    const r = refractionFromComponents(refractionScale, up[i], zenith[i], e0); // Eq. 43 [°]
    const sin0 = sinAlt[i];
    const cos0 = cosAlt[i];
    const e = e0 + r;
    altitude[i] = e;
    zenith[i] = 90 - e;
    const rRad = r * rad;
    const r2 = rRad * rRad;
    const sinR = rRad * (1 - r2 * (1 / 6 - r2 / 120));
    const cosR = 1 - r2 * (0.5 - r2 / 24);
    sinAlt[i] = sin0 * cosR + cos0 * sinR;
    cosAlt[i] = cos0 * cosR - sin0 * sinR;
  }
}

/**
 * The azimuth half of {@link hourlyAnglesWithTrig}. The horizontal length is taken again from the
 * west and south components (the same sum of squares pass 2 took, so the same number).
 * @param hours - number of hours
 * @param azimuth - in: westward component; out: azimuth [°], [0, 360)
 * @param south - southward component
 * @param sinAz - filled with sin(azimuth)
 * @param cosAz - filled with cos(azimuth)
 */
function hourlyAzimuthsWithTrig(hours: number, azimuth: Float64Array, south: Float64Array, sinAz: Float64Array, cosAz: Float64Array): void {
  const deg = DEG;
  for (let i = 0; i < hours; i++) {
    const west = azimuth[i];
    const s = south[i];
    const h = sqrt(west * west + s * s);
    const az = atan2(west, s) * deg + 180;
    azimuth[i] = az >= 360 ? az - 360 : az;
    if (h > 0) {
      const inverseH = 1 / h;
      sinAz[i] = -west * inverseH;
      cosAz[i] = -s * inverseH;
    } else {
      sinAz[i] = 0;
      cosAz[i] = -1;
    }
  }
}

/**
 * Atmospheric refraction of the SPA, Eq. 43: Δe = scale / tan(e₀ + 10.3 / (e₀ + 5.11)) [°], for
 * e₀ ≥ −(0.26667 + 0.5667)°, without a call to Math.tan: with d = 10.3 / (e₀ + 5.11) [°] and
 * tan e₀ = up / horizontal, 1 / tan(e₀ + d) = (horizontal − up · tan d) / (up + horizontal · tan d)
 * (the denominator is (up² + horizontal²)^½ · sin(e₀ + d) / cos d, positive for these e₀), tan d
 * by its series to d¹¹ (d ≤ 2.41° = 0.042 rad: truncation below 1e-20).
 * @param scale - constant part of Eq. 42 [°]
 * @param up - up component of the topocentric vector
 * @param horizontal - horizontal length of the topocentric vector, ≥ 0
 * @param e0 - the altitude without refraction [°], atan2(up, horizontal), at least −0.83337°
 * @returns the refraction Δe [°]
 */
export function refractionFromComponents(scale: number, up: number, horizontal: number, e0: number): number {
  const d = (10.3 / (e0 + 5.11)) * RAD;
  const d2 = d * d;
  const tanD = d * (1 + d2 * (1 / 3 + d2 * (2 / 15 + d2 * (17 / 315 + d2 * (62 / 2835 + d2 * (1382 / 155_925))))));
  return (scale * (horizontal - up * tanD)) / (up + horizontal * tanD);
}

/** Per-hour scratch columns (a year has at most 8784 hours); reused, since one call runs at a time. */
const G_SCRATCH = new Float64Array(8784);
const A_SCRATCH = new Float64Array(8784);
const B_SCRATCH = new Float64Array(8784);
const SOUTH_SCRATCH = new Float64Array(8784);
const UP_SCRATCH = new Float64Array(8784);

/**
 * Monomial coefficients of the six Lagrange basis polynomials for the nodes −2, −1, 0, 1, 2, 3:
 * ℓ_j(p) = Σ_d LAGRANGE_POWERS[6j + d] p^d.
 */
const LAGRANGE_POWERS: Float64Array = (() => {
  const out = new Float64Array(36);
  for (let j = 0; j < 6; j++) {
    let poly = [1]; // coefficients, lowest power first
    let scale = 1;
    for (let m = 0; m < 6; m++) {
      if (m === j) continue;
      const root = m - 2;
      poly = poly.map((c, d) => (d > 0 ? poly[d - 1] : 0) - root * c).concat(poly[poly.length - 1]);
      scale *= j - m;
    }
    poly.forEach((c, d) => (out[6 * j + d] = c / scale));
  }
  return out;
})();

/**
 * Quintic (six-point) Lagrange interpolation of node values to hours.
 * @param nodeValues - values at equally spaced nodes, HOURS_PER_STEP hours apart
 * @param hourOffset - position of hour 0 after node 0 [h]; a whole number of quarter hours, at least 2 steps
 * @param hours - number of hours; the nodes must reach 3 steps beyond the last
 * @param out - filled with the interpolated value for hours 0 … hours − 1
 * @returns `out`
 * @remarks Within each step between nodes k and k + 1 the interpolating polynomial through nodes
 *   k − 2 … k + 3 is written in powers of the fraction p and evaluated by Horner's rule.
 */
function interpolateHourly(nodeValues: Float64Array, hourOffset: number, hours: number, out: Float64Array): Float64Array {
  const w = LAGRANGE_POWERS;
  let i = 0;
  for (let k = floor(hourOffset / HOURS_PER_STEP); i < hours; k++) {
    const [f0, f1, f2, f3, f4, f5] = [nodeValues[k - 2], nodeValues[k - 1], nodeValues[k], nodeValues[k + 1], nodeValues[k + 2], nodeValues[k + 3]];
    const c0 = f0 * w[0] + f1 * w[6] + f2 * w[12] + f3 * w[18] + f4 * w[24] + f5 * w[30];
    const c1 = f0 * w[1] + f1 * w[7] + f2 * w[13] + f3 * w[19] + f4 * w[25] + f5 * w[31];
    const c2 = f0 * w[2] + f1 * w[8] + f2 * w[14] + f3 * w[20] + f4 * w[26] + f5 * w[32];
    const c3 = f0 * w[3] + f1 * w[9] + f2 * w[15] + f3 * w[21] + f4 * w[27] + f5 * w[33];
    const c4 = f0 * w[4] + f1 * w[10] + f2 * w[16] + f3 * w[22] + f4 * w[28] + f5 * w[34];
    const c5 = f0 * w[5] + f1 * w[11] + f2 * w[17] + f3 * w[23] + f4 * w[29] + f5 * w[35];
    // Hours of this step: from i up to (not including) the first at or past node k + 1.
    const end = min(hours, ceil(HOURS_PER_STEP * (k + 1) - hourOffset));
    const hourOfNode = hourOffset - HOURS_PER_STEP * k;
    for (; i < end; i++) {
      const p = (hourOfNode + i) * (1 / HOURS_PER_STEP);
      out[i] = c0 + p * (c1 + p * (c2 + p * (c3 + p * (c4 + p * c5))));
    }
  }
  return out;
}
