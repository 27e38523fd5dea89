/**
 * The sun's path over a whole year, hour by hour: the fast path of the NREL SPA.
 *
 * The Earth-fixed (slow) part of the SPA — heliocentric position, nutation, obliquity, aberration,
 * geocentric right ascension and declination, Earth–sun distance, equation of time — changes
 * smoothly, so it is computed every second day at 0 h UT (Reda & Andreas 2008, Eq. 4–30 and
 * A1–A4, by {@link spaGeocentric}) and interpolated in between by six-point (quintic) Lagrange
 * interpolation over the nodes before and after. Only the fast part is done per hour: mean sidereal
 * time (Eq. 27, exact), hour angle (Eq. 31), parallax, altitude, refraction and azimuth (Eq. 32–46).
 *
 * Per hour nothing is allocated and few functions are called: cos and sin of the hour angle are
 * computed directly once a day and carried hour to hour by rotation; asin and atan2 are inlined
 * series (error < 1e-9 rad). The parallax step uses the vector form of the SPA's Eq. 36–41 (the
 * sun's geocentric direction scaled by its distance in Earth radii, 1/sin ξ, minus the observer's
 * position (x, 0, y)); the two are algebraically identical. tests/core/sunPath.test.ts shows agreement with {@link sunPosition}
 * within 1e-4° over full years at several latitudes.
 */
import { DEG, RAD } from './angles';
import { SunpaneError } from './errors';
import { RISE_SET_ALTITUDE, type SpaSteps, requireSite, resolveSunOptions, spaGeocentric } from './sun';
import { civilToSerial, deltaTAt, hoursInYear, julianDay, requireUtcOffset, requireYear, serialToUtcMs } from './time';
import type { Site } from './window';

const { sin, cos, tan, atan, sqrt, floor } = Math;

const MS_PER_HOUR = 3_600_000;
const MS_PER_DAY = 86_400_000;
/** Days from 1970-01-01 00:00 UT to J2000.0 (JD 2451545.0). */
const DAYS_UNIX_TO_J2000 = 10_957.5;
const COS_15 = Math.cos(15 * RAD);
const SIN_15 = Math.sin(15 * RAD);
const POLAR_RATIO = 0.99664719; // SPA Eq. 33–35
/**
 * Days between nodes. The slow terms' fastest periodic parts (lunar terms of 9.1–29.5 days in the
 * nutation and the Earth series, amplitudes ≤ 0.002°) make the interpolation error grow as
 * (2π·step/period)^(order + 1). Quintic (six-point) Lagrange interpolation at 2-day steps keeps it
 * near 3e-7° in altitude (azimuth errors grow as 1/cos(altitude) near the zenith: ~1e-5° at worst),
 * well under the 1e-4° requirement (measured in tests/core/sunPath.test.ts).
 */
const NODE_STEP_DAYS = 2;
const HOURS_PER_STEP = 24 * NODE_STEP_DAYS;
const EARTH_RADIUS_M = 6_378_140;

/*
 * Inverse trigonometry for the hourly loop, inlined polynomials instead of Math.asin / Math.atan2
 * (which the engine calls out of line). Accuracy (tests/core/sunPath.test.ts): below 1e-9 rad, i.e.
 * 6e-8° — three orders of magnitude under the 1e-4° this path must keep.
 */
/**
 * asin z for |z| ≤ 0.5 by its Taylor series Σ c_n z^(2n+1), c_n = (2n)! / (4^n (n!)² (2n + 1)), to
 * z²⁵ (truncation error < 1e-10); the coefficients written as exact fractions.
 */
function asinSmall(z: number): number {
  const z2 = z * z;
  let sum = 676_039 / 104_857_600; // c12
  sum = 88_179 / 12_058_624 + z2 * sum;
  sum = 46_189 / 5_505_024 + z2 * sum;
  sum = 12_155 / 1_245_184 + z2 * sum;
  sum = 6435 / 557_056 + z2 * sum;
  sum = 143 / 10_240 + z2 * sum;
  sum = 231 / 13_312 + z2 * sum;
  sum = 63 / 2816 + z2 * sum;
  sum = 35 / 1152 + z2 * sum;
  sum = 5 / 112 + z2 * sum;
  sum = 3 / 40 + z2 * sum;
  sum = 1 / 6 + z2 * sum; // c1
  return z * (1 + z2 * sum);
}

/**
 * asin x [rad] for x in [−1, 1] (clamped): the series for |x| ≤ 0.5, else
 * asin x = ±(π/2 − 2 asin √((1 − |x|)/2)). Error below 5e-10 rad.
 */
export function asinFast(x: number): number {
  const ax = x < 0 ? -x : x;
  if (ax <= 0.5) return asinSmall(x);
  const r = Math.PI / 2 - 2 * asinSmall(sqrt((1 - (ax > 1 ? 1 : ax)) / 2));
  return x < 0 ? -r : r;
}

/** atan t for 0 ≤ t ≤ 1: above tan 15°, atan t = 30° + atan((√3 t − 1)/(√3 + t)); then the series to u¹⁷ (|u| ≤ tan 15°, error < 1e-11). */
function atanUnit(t: number): number {
  let base = 0;
  if (t > 0.2679491924311227) {
    // tan 15° = 2 − √3; √3 = 1.7320508075688772
    t = (1.7320508075688772 * t - 1) / (1.7320508075688772 + t);
    base = Math.PI / 6;
  }
  const u2 = t * t;
  return base + t * (1 + u2 * (-1 / 3 + u2 * (1 / 5 + u2 * (-1 / 7 + u2 * (1 / 9 + u2 * (-1 / 11 + u2 * (1 / 13 + u2 * (-1 / 15 + u2 / 17))))))));
}

/** atan2(y, x) [rad] in [−π, π] as Math.atan2, but 0 when both are ±0. Error below 1e-10 rad. */
export function atan2Fast(y: number, x: number): number {
  const ax = x < 0 ? -x : x;
  const ay = y < 0 ? -y : y;
  if (ax === 0 && ay === 0) return 0;
  let r = ay <= ax ? atanUnit(ay / ax) : Math.PI / 2 - atanUnit(ax / ay);
  if (x < 0) r = Math.PI - r;
  return y < 0 ? -r : r;
}

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
  if (at !== 'middle' && at !== 'end') throw new SunpaneError('at', at, 'must be "middle" or "end"');
  const o = resolveSunOptions({ elevation: site.elevation, pressure: site.pressure, temperature: site.temperature, deltaT: options.deltaT }, 'site.');

  const hours = hoursInYear(year);
  const startSerial = civilToSerial(year, 1, 1);
  const yearStartMs = serialToUtcMs(startSerial, utcOffset);
  const shiftMs = (at === 'end' ? 1 : 0.5) * MS_PER_HOUR;

  // Nodes at 0 h UT every NODE_STEP_DAYS days, two before and three after the span of the instants.
  const firstDay = floor((yearStartMs + shiftMs) / MS_PER_DAY) - 2 * NODE_STEP_DAYS;
  const lastDay = floor((yearStartMs + shiftMs + (hours - 1) * MS_PER_HOUR) / MS_PER_DAY) + 3 * NODE_STEP_DAYS;
  const nodes = floor((lastDay - firstDay) / NODE_STEP_DAYS) + 1;
  const gNode = new Float64Array(nodes); // α − Δψ cos ε [°], unwrapped
  const aNode = new Float64Array(nodes); // cos δ / sin ξ
  const bNode = new Float64Array(nodes); // sin δ / sin ξ
  const declNode = new Float64Array(nodes);
  const eotNode = new Float64Array(nodes);
  const steps = {} as SpaSteps;
  for (let n = 0; n < nodes; n++) {
    const ms = (firstDay + n * NODE_STEP_DAYS) * MS_PER_DAY;
    spaGeocentric(julianDay(ms), o.deltaT ?? deltaTAt(ms), steps);
    let g = steps.alpha - steps.deltaPsi * cos(steps.epsilon * RAD); // so that H = ν0 + σ − g (Eq. 28, 31)
    if (n > 0) while (g < gNode[n - 1] - 180) g += 360; // unwrap across 360°
    gNode[n] = g;
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
  // The result is built before the hourly loop: code after a loop that the engine optimises while it
  // runs (on-stack replacement) has no type feedback yet, and an object literal there made every
  // fresh optimisation bail out at the end of the call.
  const result: SunPathYear = { year, hours, stampSerial, altitude, azimuth, zenith, declination, equationOfTime };

  // Hour i lies at node position (hourOffset + i) / HOURS_PER_STEP; hourOffset is a whole number of
  // quarter hours (offsets and the half-hour shift are), so the split into node k and fraction p is
  // exact and repeats every HOURS_PER_STEP hours: the quintic Lagrange weights (nodes k−2 … k+3 at
  // −2 … 3) are tabulated once.
  const hourOffset = (yearStartMs + shiftMs) / MS_PER_HOUR - 24 * firstDay;
  const weights = new Float64Array(HOURS_PER_STEP * 6);
  for (let j = 0; j < HOURS_PER_STEP; j++) {
    const t = hourOffset + j;
    const p = (t - HOURS_PER_STEP * floor(t / HOURS_PER_STEP)) / HOURS_PER_STEP;
    const [pp2, pp1, pm1, pm2, pm3] = [p + 2, p + 1, p - 1, p - 2, p - 3];
    weights.set(
      [
        (-pp1 * p * pm1 * pm2 * pm3) / 120,
        (pp2 * p * pm1 * pm2 * pm3) / 24,
        (-pp2 * pp1 * pm1 * pm2 * pm3) / 12,
        (pp2 * pp1 * p * pm2 * pm3) / 12,
        (-pp2 * pp1 * p * pm1 * pm3) / 24,
        (pp2 * pp1 * p * pm1 * pm2) / 120,
      ],
      j * 6,
    );
  }
  // Module constants and imports copied to locals for the hot loop.
  const [rad, deg, cos15, sin15] = [RAD, DEG, COS_15, SIN_15];
  const refractionScale = ((pressure / 1010) * (283 / (273 + temperature)) * 1.02) / 60; // Eq. 42, constant part
  const refractionFrom = RISE_SET_ALTITUDE;
  // cos and sin of the hour angle: directly every 24 hours, by rotation through one hour in between.
  let cosH = 1;
  let sinH = 0;
  let previousHourAngle = 0;
  for (let i = 0; i < hours; i++) {
    stampSerial[i] = startSerial + (i + 1) / 24;
    const ms = yearStartMs + i * MS_PER_HOUR + shiftMs;
    const k = floor((hourOffset + i) / HOURS_PER_STEP);
    const wi = (i % HOURS_PER_STEP) * 6;
    const w0 = weights[wi];
    const w1 = weights[wi + 1];
    const w2 = weights[wi + 2];
    const w3 = weights[wi + 3];
    const w4 = weights[wi + 4];
    const w5 = weights[wi + 5];
    const g = w0 * gNode[k - 2] + w1 * gNode[k - 1] + w2 * gNode[k] + w3 * gNode[k + 1] + w4 * gNode[k + 2] + w5 * gNode[k + 3];
    const a = w0 * aNode[k - 2] + w1 * aNode[k - 1] + w2 * aNode[k] + w3 * aNode[k + 1] + w4 * aNode[k + 2] + w5 * aNode[k + 3];
    const b = w0 * bNode[k - 2] + w1 * bNode[k - 1] + w2 * bNode[k] + w3 * bNode[k + 1] + w4 * bNode[k + 2] + w5 * bNode[k + 3];
    declination[i] = w0 * declNode[k - 2] + w1 * declNode[k - 1] + w2 * declNode[k] + w3 * declNode[k + 1] + w4 * declNode[k + 2] + w5 * declNode[k + 3];
    equationOfTime[i] = w0 * eotNode[k - 2] + w1 * eotNode[k - 1] + w2 * eotNode[k] + w3 * eotNode[k + 1] + w4 * eotNode[k + 2] + w5 * eotNode[k + 3];

    // Eq. 27 with 360.98564736629·D split as 360·frac(D) + 0.98564736629·D to keep H small and exact.
    const days = ms / MS_PER_DAY - DAYS_UNIX_TO_J2000; // JD − 2451545
    const jc = days / 36_525;
    const nu0 = 280.46061837 + 360 * (days - floor(days)) + 0.98564736629 * days + jc * jc * (0.000387933 - jc / 38_710_000);
    const hourAngle = nu0 + longitude - g; // Eq. 28, 31 [°], not reduced
    if (i % 24 === 0) {
      cosH = cos(hourAngle * rad);
      sinH = sin(hourAngle * rad);
    } else {
      // H advances 15° + ε per hour (ε ≈ 0.04°): rotate by 15° and by ε (Taylor to ε⁵, exact to 1e-20).
      let step = hourAngle - previousHourAngle - 15;
      step -= 360 * Math.round(step / 360);
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
    const vx = a * cosH - x;
    const vy = a * sinH;
    const vz = b - y;
    const e0 = asinFast((sinLat * vz + cosLat * vx) / sqrt(vx * vx + vy * vy + vz * vz)) * deg; // Eq. 41
    // Eq. 42, 43 as in refractionSpa: no refraction below −(0.26667 + 0.5667)°.
    const e = e0 < refractionFrom ? e0 : e0 + refractionScale / tan((e0 + 10.3 / (e0 + 5.11)) * rad);
    altitude[i] = e;
    zenith[i] = 90 - e; // Eq. 44
    const az = atan2Fast(vy, vx * sinLat - vz * cosLat) * deg + 180; // Eq. 45, 46
    azimuth[i] = az >= 360 ? az - 360 : az;
  }
  return result;
}
