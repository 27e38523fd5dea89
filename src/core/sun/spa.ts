/**
 * Sun position by the NREL Solar Position Algorithm (SPA): every step of the report for one instant.
 *
 * Source: Reda, I. & Andreas, A., *Solar Position Algorithm for Solar Radiation Applications*,
 * NREL/TP-560-34302, National Renewable Energy Laboratory (revised January 2008). Equation numbers
 * in `// Eq. n` comments are that report's (section 3.1–3.15, equations 1–47; the equation of time is
 * its Appendix A.1, Eq. A1–A4). Stated uncertainty ±0.0003° in zenith and azimuth for the years
 * −2000…6000.
 *
 * Conventions (docs/conventions.md): degrees in and out; azimuth clockwise from true north (N 0, E 90, S 180,
 * W 270); altitude is topocentric (seen from the site, with parallax) and includes refraction; hour
 * angle negative in the morning. Time in is a UTC instant [ms since 1970-01-01]; ΔT = TT − UT from
 * {@link deltaTAt} unless given.
 */
import { DEG, RAD, asinClamped, wrap180, wrap360, SunpaneError, requireRange } from '../common';
import { type EarthHeliocentric, type Nutation, earthPeriodicSeries, earthPeriodicSums, nutationSeries, nutationSums } from './spaTerms';
import { deltaTAt, julianDay } from '../time';


const { sin, cos, tan, atan, atan2 } = Math;

/** Julian day of the J2000.0 epoch. */
const JD_J2000 = 2_451_545;
/** Semi-diameter of the sun used by the SPA for rise and set [°]. */
export const SUN_RADIUS = 0.26667;
/** Refraction at the horizon assumed for rise and set [°] (the SPA's default). */
export const HORIZON_REFRACTION = 0.5667;
/** Geometric altitude of the sun's centre at rise and set: the upper limb on the refracted horizon [°]. */
export const RISE_SET_ALTITUDE = -(SUN_RADIUS + HORIZON_REFRACTION);
/** Earliest and latest instants accepted: 1 January −2000 and 2 January 10000, UT [ms]. */
const UTC_MS_MIN = Date.UTC(-2000, 0, 1);
const UTC_MS_MAX = Date.UTC(10000, 0, 2);
/** ΔT polynomials (time/deltaT.ts) start in 1860; before that the caller must give ΔT. */
const DEFAULT_DELTA_T_FROM = Date.UTC(1860, 0, 1);

/** Observer and atmosphere; every field optional. */
export interface SunOptions {
  /** Site elevation above sea level [m], −500…9000; default 0. */
  elevation?: number;
  /** Mean air pressure [hPa], above 0 up to 1200; default: standard atmosphere at the elevation ({@link standardPressure}). */
  pressure?: number;
  /** Mean air temperature [°C], −90…60; default 12. */
  temperature?: number;
  /** ΔT = TT − UT [s], −100…10000; default {@link deltaTAt} (Espenak & Meeus 2006). */
  deltaT?: number;
}

/** Where the sun is, seen from the site. */
export interface SunPosition {
  /** Topocentric altitude of the sun's centre above the horizon, with refraction [°], −90…90. */
  altitude: number;
  /** Topocentric azimuth clockwise from true north [°], [0, 360). */
  azimuth: number;
  /** Topocentric zenith angle with refraction, 90 − altitude [°], 0…180. */
  zenith: number;
  /** Geocentric declination [°], about −23.44…23.44. */
  declination: number;
  /** Observer's local hour angle (geocentric) [°], (−180, 180], negative before solar noon. */
  hourAngle: number;
  /** Equation of time, apparent minus mean solar time [min], about −14.3…16.4. */
  equationOfTime: number;
  /** Geocentric apparent right ascension [°], [0, 360). */
  rightAscension: number;
  /** Topocentric altitude without refraction [°]. */
  altitudeUnrefracted: number;
  /** Apparent solar time at the site [h], [0, 24): 12 at solar noon. */
  solarTime: number;
  /** Earth–sun distance [AU]. */
  earthSunDistance: number;
}

/** Every intermediate value of the SPA for one instant and site (names and units as in the report). */
export interface SpaSteps {
  /** Julian day (UT) and Julian ephemeris day (TT). Eq. 4, 5. */
  jd: number;
  jde: number;
  /** Julian century (UT), Julian ephemeris century and millennium. Eq. 6–8. */
  jc: number;
  jce: number;
  jme: number;
  /** Earth heliocentric longitude [°], latitude [°], radius vector [AU]. Eq. 9–12. */
  L: number;
  B: number;
  R: number;
  /** Geocentric longitude and latitude [°]. Eq. 13, 14. */
  theta: number;
  beta: number;
  /** Nutation in longitude and obliquity [°]. Eq. 15–22. */
  deltaPsi: number;
  deltaEpsilon: number;
  /** Mean and true obliquity of the ecliptic [°]. Eq. 23, 24. */
  epsilon0: number;
  epsilon: number;
  /** Aberration correction [°]. Eq. 25. */
  deltaTau: number;
  /** Apparent sun longitude [°]. Eq. 26. */
  lambda: number;
  /** Mean and apparent sidereal time at Greenwich [°]. Eq. 27, 28. */
  nu0: number;
  nu: number;
  /** Geocentric right ascension and declination [°]. Eq. 29, 30. */
  alpha: number;
  delta: number;
  /** Observer local hour angle [°], [0, 360). Eq. 31. */
  H: number;
  /** Equatorial horizontal parallax [°] and parallax in right ascension [°]. Eq. 32–37. */
  xi: number;
  deltaAlpha: number;
  /** Topocentric right ascension, declination and local hour angle [°]. Eq. 38–40. */
  alphaPrime: number;
  deltaPrime: number;
  HPrime: number;
  /** Topocentric elevation without refraction, refraction correction, elevation with refraction [°]. Eq. 41–43. */
  e0: number;
  deltaE: number;
  e: number;
  /** Topocentric zenith angle [°]. Eq. 44. */
  zenith: number;
  /** Topocentric astronomers' azimuth (from south, westward) [°] and azimuth from north [°]. Eq. 45, 46. */
  gamma: number;
  phi: number;
  /** Sun's mean longitude [°] and equation of time [min]. Eq. A1–A4. */
  M: number;
  E: number;
}

const helio: EarthHeliocentric = { L: 0, B: 0, R: 0 };
const nutation: Nutation = { deltaPsi: 0, deltaEpsilon: 0 };
const fundamental = [0, 0, 0, 0, 0];

/**
 * The Earth-fixed part of the SPA: every quantity that does not depend on the observer, for one
 * instant. Used directly by {@link sunPosition} and once a day by the annual fast path.
 * @param jd - Julian day (UT)
 * @param deltaT - TT − UT [s]
 * @param out - object to fill (no allocation when given)
 * @returns `out` with jd…delta, nu0, nu, M and E filled in (the observer fields untouched)
 * @remarks Reda & Andreas (2008), Eq. 4–30 and A1–A4.
 */
export function spaGeocentric(jd: number, deltaT: number, out: SpaSteps = emptySteps()): SpaSteps {
  const jde = jd + deltaT / 86_400; // Eq. 5
  const jce = (jde - JD_J2000) / 36_525; // Eq. 7
  earthPeriodicSums(jce / 10, helio); // Eq. 9–11
  fundamentalArguments(jce, fundamental); // Eq. 15–19
  nutationSums(jce, fundamental, nutation); // Eq. 20–22
  return spaGeocentricFinish(jd, jde, helio, nutation, out);
}

/** Fundamental arguments of nutation X0…X4 [°] at Julian ephemeris century `jce`, into `out`. Eq. 15–19. */
function fundamentalArguments(jce: number, out: number[]): number[] {
  out[0] = 297.85036 + 445_267.11148 * jce - 0.0019142 * jce * jce + (jce * jce * jce) / 189_474;
  out[1] = 357.52772 + 35_999.05034 * jce - 0.0001603 * jce * jce - (jce * jce * jce) / 300_000;
  out[2] = 134.96298 + 477_198.867398 * jce + 0.0086972 * jce * jce + (jce * jce * jce) / 56_250;
  out[3] = 93.27191 + 483_202.017538 * jce - 0.0036825 * jce * jce + (jce * jce * jce) / 327_270;
  out[4] = 125.04452 - 1934.136261 * jce + 0.0020708 * jce * jce + (jce * jce * jce) / 450_000;
  return out;
}

const seriesHelio: EarthHeliocentric = { L: 0, B: 0, R: 0 };
const seriesNutation: Nutation = { deltaPsi: 0, deltaEpsilon: 0 };
const fundamentalLast = [0, 0, 0, 0, 0];

/**
 * {@link spaGeocentric} at equally spaced instants jd0 + n·step (UT), n = 0 … count − 1, for the
 * annual fast path: the periodic sums are carried from instant to instant by rotation
 * ({@link earthPeriodicSeries}, {@link nutationSeries}) instead of being evaluated afresh.
 * @param jd0 - Julian day (UT) of the first instant
 * @param stepDays - spacing [days] > 0
 * @param count - number of instants, at least 2
 * @param deltaTFirst - TT − UT [s] at the first instant
 * @param deltaTLast - TT − UT [s] at the last instant; in between ΔT is taken as linear in time
 * @param visit - called with n and the filled steps for each instant in turn (the same object each time)
 * @remarks Reda & Andreas (2008), Eq. 4–30 and A1–A4. Taking ΔT as linear over the span is the only
 *   approximation besides rounding: from 1901 on, the default ΔT polynomials (Espenak & Meeus 2006)
 *   curve by at most about 0.15 s/yr² (around 1920), so over a year and a month they depart from
 *   their chord by under 0.03 s, in which the sun moves about 0.04″/s × 0.03 s ≈ 3e-7°.
 */
export function spaGeocentricSeries(
  jd0: number,
  stepDays: number,
  count: number,
  deltaTFirst: number,
  deltaTLast: number,
  visit: (n: number, steps: SpaSteps) => void,
): void {
  const jdeFirst = jd0 + deltaTFirst / 86_400; // Eq. 5
  const jdeLast = jd0 + (count - 1) * stepDays + deltaTLast / 86_400;
  const stepJde = (jdeLast - jdeFirst) / (count - 1);
  const jceFirst = (jdeFirst - JD_J2000) / 36_525; // Eq. 7
  const stepJce = stepJde / 36_525;
  const L = new Float64Array(count);
  const B = new Float64Array(count);
  const R = new Float64Array(count);
  const deltaPsi = new Float64Array(count);
  const deltaEpsilon = new Float64Array(count);
  earthPeriodicSeries(jceFirst / 10, stepJce / 10, count, L, B, R); // Eq. 8–11
  fundamentalArguments(jceFirst, fundamental); // Eq. 15–19
  fundamentalArguments((jdeLast - JD_J2000) / 36_525, fundamentalLast);
  nutationSeries(jceFirst, stepJce, count, fundamental, fundamentalLast, deltaPsi, deltaEpsilon); // Eq. 20–22
  const out = emptySteps();
  for (let n = 0; n < count; n++) {
    seriesHelio.L = L[n];
    seriesHelio.B = B[n];
    seriesHelio.R = R[n];
    seriesNutation.deltaPsi = deltaPsi[n];
    seriesNutation.deltaEpsilon = deltaEpsilon[n];
    visit(n, spaGeocentricFinish(jd0 + n * stepDays, jdeFirst + n * stepJde, seriesHelio, seriesNutation, out));
  }
}

/** Eq. 6–8 and 12–30, A1–A4 from the periodic sums: the rest of {@link spaGeocentric}. */
function spaGeocentricFinish(jd: number, jde: number, h: EarthHeliocentric, nut: Nutation, out: SpaSteps): SpaSteps {
  const jc = (jd - JD_J2000) / 36_525; // Eq. 6
  const jce = (jde - JD_J2000) / 36_525; // Eq. 7
  const jme = jce / 10; // Eq. 8
  const L = wrap360(h.L * DEG); // Eq. 12
  const B = h.B * DEG;
  const R = h.R;
  const theta = wrap360(L + 180); // Eq. 13
  const beta = -B; // Eq. 14
  const { deltaPsi, deltaEpsilon } = nut;

  const u = jme / 10;
  const epsilon0 =
    84_381.448 +
    u * (-4680.93 + u * (-1.55 + u * (1999.25 + u * (-51.38 + u * (-249.67 + u * (-39.05 + u * (7.12 + u * (27.87 + u * (5.79 + u * 2.45))))))))); // Eq. 23 [″]
  const epsilon = epsilon0 / 3600 + deltaEpsilon; // Eq. 24
  const deltaTau = -20.4898 / (3600 * R); // Eq. 25
  const lambda = theta + deltaPsi + deltaTau; // Eq. 26

  const nu0 = wrap360(280.46061837 + 360.98564736629 * (jd - JD_J2000) + jc * jc * (0.000387933 - jc / 38_710_000)); // Eq. 27
  const epsilonRad = epsilon * RAD;
  const nu = nu0 + deltaPsi * cos(epsilonRad); // Eq. 28

  const lambdaRad = lambda * RAD;
  const betaRad = beta * RAD;
  const alpha = wrap360(atan2(sin(lambdaRad) * cos(epsilonRad) - tan(betaRad) * sin(epsilonRad), cos(lambdaRad)) * DEG); // Eq. 29
  const delta = asinClamped(sin(betaRad) * cos(epsilonRad) + cos(betaRad) * sin(epsilonRad) * sin(lambdaRad)) * DEG; // Eq. 30

  const M = wrap360(280.4664567 + jme * (360_007.6982779 + jme * (0.03032028 + jme * (1 / 49_931 + jme * (-1 / 15_300 - jme / 2_000_000))))); // Eq. A2
  const E = 4 * wrap180(M - 0.0057183 - alpha + deltaPsi * cos(epsilonRad)); // Eq. A1, A3, A4 [min]

  out.jd = jd;
  out.jde = jde;
  out.jc = jc;
  out.jce = jce;
  out.jme = jme;
  out.L = L;
  out.B = B;
  out.R = R;
  out.theta = theta;
  out.beta = beta;
  out.deltaPsi = deltaPsi;
  out.deltaEpsilon = deltaEpsilon;
  out.epsilon0 = epsilon0;
  out.epsilon = epsilon;
  out.deltaTau = deltaTau;
  out.lambda = lambda;
  out.nu0 = nu0;
  out.nu = nu;
  out.alpha = alpha;
  out.delta = delta;
  out.M = M;
  out.E = E;
  return out;
}

/** Earth's flattening term b/a of the SPA (1 − 1/298.257). Eq. 34. */
export const POLAR_RATIO = 0.99664719;
/** Earth's equatorial radius used by the SPA [m]. Eq. 35. */
export const EARTH_RADIUS_M = 6_378_140;

/**
 * Atmospheric refraction of the SPA [°] for a true (unrefracted) altitude.
 * @param e0 - topocentric altitude without refraction [°]
 * @param pressure - [hPa] > 0
 * @param temperature - [°C]
 * @returns the lift [°]; 0 when the sun is below −(0.26667 + 0.5667)° (no refraction applied, as in the SPA)
 * @remarks Reda & Andreas (2008) Eq. 42: Δe = (P/1010)(283/(273 + T))·1.02 / (60 tan(e0 + 10.3/(e0 + 5.11))).
 */
export function refractionSpa(e0: number, pressure: number, temperature: number): number {
  if (e0 < RISE_SET_ALTITUDE) return 0;
  return ((pressure / 1010) * (283 / (273 + temperature)) * 1.02) / (60 * tan((e0 + 10.3 / (e0 + 5.11)) * RAD)); // Eq. 42
}

/**
 * Mean air pressure of the standard atmosphere at an elevation [hPa].
 * @param elevation - above sea level [m], −500…9000
 * @returns pressure [hPa]
 * @remarks Barometric formula of the U.S. Standard Atmosphere 1976 troposphere (ICAO standard
 * atmosphere): p = 1013.25 (1 − 2.25577·10⁻⁵ h)^5.25588.
 */
export function standardPressure(elevation: number): number {
  return 1013.25 * (1 - 2.25577e-5 * elevation) ** 5.25588;
}

/**
 * The observer part of the SPA (Eq. 31–46), filling `steps` from its geocentric fields.
 * @remarks Reda & Andreas (2008) Eq. 31–46.
 */
export function spaTopocentric(
  steps: SpaSteps,
  latitude: number,
  longitude: number,
  elevation: number,
  pressure: number,
  temperature: number,
): SpaSteps {
  const H = wrap360(steps.nu + longitude - steps.alpha); // Eq. 31
  const xi = 8.794 / (3600 * steps.R); // Eq. 32
  const latRad = latitude * RAD;
  const uRad = atan(POLAR_RATIO * tan(latRad)); // Eq. 33
  const x = cos(uRad) + (elevation / EARTH_RADIUS_M) * cos(latRad); // Eq. 34
  const y = POLAR_RATIO * sin(uRad) + (elevation / EARTH_RADIUS_M) * sin(latRad); // Eq. 35
  const HRad = H * RAD;
  const deltaRad = steps.delta * RAD;
  const sinXi = sin(xi * RAD);
  const denom = cos(deltaRad) - x * sinXi * cos(HRad);
  const deltaAlphaRad = atan2(-x * sinXi * sin(HRad), denom); // Eq. 36
  const deltaPrimeRad = atan2((sin(deltaRad) - y * sinXi) * cos(deltaAlphaRad), denom); // Eq. 37
  const deltaAlpha = deltaAlphaRad * DEG;
  const HPrime = H - deltaAlpha; // Eq. 39
  const HPrimeRad = HPrime * RAD;
  const e0 = asinClamped(sin(latRad) * sin(deltaPrimeRad) + cos(latRad) * cos(deltaPrimeRad) * cos(HPrimeRad)) * DEG; // Eq. 41
  const deltaE = refractionSpa(e0, pressure, temperature); // Eq. 42
  const e = e0 + deltaE; // Eq. 43
  const gamma = wrap360(atan2(sin(HPrimeRad), cos(HPrimeRad) * sin(latRad) - tan(deltaPrimeRad) * cos(latRad)) * DEG); // Eq. 45
  steps.H = H;
  steps.xi = xi;
  steps.deltaAlpha = deltaAlpha;
  steps.alphaPrime = wrap360(steps.alpha + deltaAlpha); // Eq. 38
  steps.deltaPrime = deltaPrimeRad * DEG;
  steps.HPrime = HPrime;
  steps.e0 = e0;
  steps.deltaE = deltaE;
  steps.e = e;
  steps.zenith = 90 - e; // Eq. 44
  steps.gamma = gamma;
  steps.phi = wrap360(gamma + 180); // Eq. 46
  return steps;
}

export function emptySteps(): SpaSteps {
  return {
    jd: 0, jde: 0, jc: 0, jce: 0, jme: 0, L: 0, B: 0, R: 0, theta: 0, beta: 0, deltaPsi: 0, deltaEpsilon: 0,
    epsilon0: 0, epsilon: 0, deltaTau: 0, lambda: 0, nu0: 0, nu: 0, alpha: 0, delta: 0, H: 0, xi: 0,
    deltaAlpha: 0, alphaPrime: 0, deltaPrime: 0, HPrime: 0, e0: 0, deltaE: 0, e: 0, zenith: 0, gamma: 0,
    phi: 0, M: 0, E: 0,
  };
}

const NO_OPTIONS: SunOptions = {};
/** Reused by {@link sunPosition} so that a call allocates only its result. */
const resolvedScratch: ResolvedSunOptions = { elevation: 0, pressure: 0, temperature: 0, deltaT: undefined };

/** Options after validation and defaults. */
export interface ResolvedSunOptions {
  elevation: number;
  pressure: number;
  temperature: number;
  /** undefined: ΔT from {@link deltaTAt} at each instant. */
  deltaT: number | undefined;
}

/**
 * Validates observer options and fills in defaults; errors name the field (`elevation`, `pressure`,
 * `temperature`, `deltaT`), the first three after `prefix` (e.g. `site.`).
 */
export function resolveSunOptions(
  options: SunOptions | undefined,
  prefix = '',
  out: ResolvedSunOptions = { elevation: 0, pressure: 0, temperature: 0, deltaT: undefined },
): ResolvedSunOptions {
  const o = options ?? NO_OPTIONS;
  const elevation = o.elevation === undefined ? 0 : requireRange(`${prefix}elevation`, o.elevation, -500, 9000, 'm');
  const pressure =
    o.pressure === undefined
      ? standardPressure(elevation)
      : requireRange(`${prefix}pressure`, o.pressure, 0, 1200, 'hPa', { exclusiveMin: true });
  const temperature = o.temperature === undefined ? 12 : requireRange(`${prefix}temperature`, o.temperature, -90, 60, '°C');
  const deltaT = o.deltaT === undefined ? undefined : requireRange('deltaT', o.deltaT, -100, 10_000, 's');
  out.elevation = elevation;
  out.pressure = pressure;
  out.temperature = temperature;
  out.deltaT = deltaT;
  return out;
}

/** Validates latitude and longitude by their glossary names (after `prefix`, e.g. `site.`). */
export function requireSite(latitude: number, longitude: number, prefix = ''): void {
  requireRange(`${prefix}latitude`, latitude, -90, 90, '°');
  requireRange(`${prefix}longitude`, longitude, -180, 180, '°');
}

export function requireInstant(utcMs: number, deltaTGiven: boolean): void {
  if (typeof utcMs !== 'number' || !Number.isFinite(utcMs) || utcMs < UTC_MS_MIN || utcMs > UTC_MS_MAX) {
    throw new SunpaneError('utcMs', utcMs, 'must be an instant from the year −2000 to 9999 [ms since 1970-01-01 UT]');
  }
  if (!deltaTGiven && utcMs < DEFAULT_DELTA_T_FROM) {
    throw new SunpaneError('deltaT', undefined, 'must be given for instants before 1860 (the default ΔT polynomials start in 1860)');
  }
}

const scratch = emptySteps();

/** All SPA steps for one instant and site, options already resolved (no validation). */
function stepsAt(utcMs: number, latitude: number, longitude: number, o: ResolvedSunOptions, out: SpaSteps): SpaSteps {
  spaGeocentric(julianDay(utcMs), o.deltaT ?? deltaTAt(utcMs), out);
  return spaTopocentric(out, latitude, longitude, o.elevation, o.pressure, o.temperature);
}

/**
 * Every intermediate value of the SPA for one instant and site (for checks and teaching).
 * @param utcMs - UTC instant [ms since 1970-01-01], years −2000…9999 (before 1860 give `deltaT`)
 * @param latitude - [°] −90…90, north positive
 * @param longitude - [°] −180…180, east positive
 * @param options - elevation, pressure, temperature, ΔT
 * @returns the report's quantities, named as in it
 * @remarks Reda & Andreas (2008), Eq. 4–46 and A1–A4.
 */
export function spaSteps(utcMs: number, latitude: number, longitude: number, options?: SunOptions): SpaSteps {
  const o = resolveSunOptions(options);
  requireSite(latitude, longitude);
  requireInstant(utcMs, o.deltaT !== undefined);
  return stepsAt(utcMs, latitude, longitude, o, emptySteps());
}

/**
 * Topocentric sun position at an instant by the NREL SPA.
 * @param utcMs - UTC instant [ms since 1970-01-01], years −2000…9999 (the SPA's stated accuracy
 *   holds for −2000…6000; before 1860 `options.deltaT` is required)
 * @param latitude - site latitude [°] −90…90, north positive
 * @param longitude - site longitude [°] −180…180, east positive
 * @param options - elevation [m] (default 0), pressure [hPa] (default: standard atmosphere at the
 *   elevation), temperature [°C] (default 12), ΔT [s] (default Espenak & Meeus 2006)
 * @returns altitude/zenith with refraction, azimuth clockwise from north, geocentric declination,
 *   right ascension and hour angle, equation of time [min], apparent solar time [h]. At night the
 *   altitude is simply negative (refraction is added only above −0.8334°, as in the SPA).
 * @remarks Reda & Andreas (2008), NREL/TP-560-34302, Eq. 4–46 and A1–A4; uncertainty ±0.0003°.
 */
export function sunPosition(utcMs: number, latitude: number, longitude: number, options?: SunOptions): SunPosition {
  const o = resolveSunOptions(options, '', resolvedScratch);
  requireSite(latitude, longitude);
  requireInstant(utcMs, o.deltaT !== undefined);
  const s = stepsAt(utcMs, latitude, longitude, o, scratch);
  const hourAngle = wrap180(s.H);
  return {
    altitude: s.e,
    azimuth: s.phi,
    zenith: s.zenith,
    declination: s.delta,
    hourAngle,
    equationOfTime: s.E,
    rightAscension: s.alpha,
    altitudeUnrefracted: s.e0,
    solarTime: wrap360(180 + hourAngle) / 15,
    earthSunDistance: s.R,
  };
}
