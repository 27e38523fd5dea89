/**
 * The sun at any instant by the NREL SPA, for many instants at once (a worksheet range of
 * date-times): the Earth's slow part of the algorithm — heliocentric position, nutation,
 * aberration, apparent right ascension and declination, Earth–sun distance, equation of time
 * (Reda & Andreas 2008, Eq. 4–30 and A1–A4) — is worked out at 0 h UT every second day and kept,
 * and taken at the instant by six-point (quintic) Lagrange interpolation over the nodes around it; the
 * observer's part — sidereal time (Eq. 27, exact for the instant), hour angle, parallax, refraction,
 * altitude and azimuth (Eq. 31–46) — is worked out for the instant in the vector form the annual
 * path uses (src/core/sun/sunPath.ts; algebraically the SPA's Eq. 36–41), with the observer's
 * constants kept while the site stays the same.
 *
 * With nodes two days apart the interpolation error is far below the SPA's own uncertainty
 * (±0.0003°): tests/core/sun/sunNodes.test.ts holds altitude, azimuth, declination and equation of
 * time to the direct {@link sunPosition} within 1e-6° (1e-5 min) over random instants and sites
 * (measured over 20,000 instants 1900–2100: altitude 3e-7°, declination 3e-7°, equation of time
 * 9e-7 min, distance 3e-9 AU; with daily nodes 3e-7°, 6e-8°, 1e-7 min, 4e-11 AU — the altitude's
 * share is the sidereal time's rounding, not the interpolation). A column of 100,000 hourly
 * date-times needs some 2,100 nodes, half of what daily nodes take, and they are most of the cost
 * of a cold range: the bench line `range_100k_vs_suncalc` measures the whole worksheet path against
 * suncalc (docs/fast-paths.md).
 *
 * Nodes are kept per ΔT choice (the default polynomial, or a given value) and dropped all at once
 * when more than {@link MAX_NODES} are held.
 */
import { DEG, RAD, wrap360 } from '../common';
import { deltaTAt, julianDay } from '../time';
import { EARTH_RADIUS_M, POLAR_RATIO, RISE_SET_ALTITUDE, type SunOptions, type SunPosition, emptySteps, requireInstant, requireSite, resolveSunOptions, type ResolvedSunOptions, spaGeocentric } from './spa';
import { refractionFromComponents } from './sunPath';

/** Math's functions bound once (see src/core/sun/spaTerms.ts). */
const { floor, sin, cos, tan, atan, atan2, sqrt } = Math;

/** Most nodes kept before the store is emptied (each is five numbers). */
export const MAX_NODES = 60_000;
const MS_PER_DAY = 86_400_000;
/** Days between nodes. */
const NODE_DAYS = 2;
const MS_PER_NODE = NODE_DAYS * MS_PER_DAY;
/** Julian day of 1970-01-01 00:00 UT. */
const JD_UNIX = 2_440_587.5;

/**
 * Node values: α − Δψ cos ε (for the hour angle), α [°], δ [°], R [AU], E [min], and the sun's
 * geocentric direction scaled by its distance in Earth radii, a = cos δ / sin ξ and b = sin δ / sin ξ
 * (ξ the equatorial horizontal parallax, Eq. 32), for the vector form of Eq. 36–41.
 */
type Node = Float64Array;

/** Nodes by number (node k at 0 h UT of day 2k since 1970-01-01), one store per ΔT choice (NaN = the default polynomial). */
const stores = new Map<number, Map<number, Node>>();
let held = 0;

/** Drops every kept node (the bench starts each round cold with it). */
export function clearSunNodes(): void {
  stores.clear();
  held = 0;
  lastDay = Number.NaN;
}

const geoScratch = emptySteps();

function nodeOf(day: number, deltaT: number | undefined): Node {
  const key = deltaT === undefined ? Number.NaN : deltaT;
  let store = stores.get(key);
  if (store === undefined) {
    store = new Map();
    stores.set(key, store);
  }
  let node = store.get(day);
  if (node === undefined) {
    if (held >= MAX_NODES) {
      clearSunNodes();
      return nodeOf(day, deltaT);
    }
    const ms = day * MS_PER_NODE;
    const s = spaGeocentric(julianDay(ms), deltaT ?? deltaTAt(ms), geoScratch);
    node = new Float64Array(VALUES);
    node[0] = wrap360(s.alpha - (s.nu - s.nu0)); // α − Δψ cos ε (Eq. 28: ν − ν0 = Δψ cos ε)
    node[1] = s.alpha;
    node[2] = s.delta;
    node[3] = s.R;
    node[4] = s.E;
    const inverseSinXi = 1 / sin(((8.794 / 3600) * RAD) / s.R); // Eq. 32: distance in Earth radii
    node[5] = cos(s.delta * RAD) * inverseSinXi;
    node[6] = sin(s.delta * RAD) * inverseSinXi;
    store.set(day, node);
    held++;
  }
  return node;
}

/** An angle to 0…360 by floor (cheaper than the remainder `%` on a hot path; equal to an ulp). */
function floorWrap360(x: number): number {
  const r = x - 360 * floor(x / 360);
  return r >= 360 ? 0 : r;
}

/** Lagrange weights of the nodes at −2 … 3 for a position f in [0, 1). */
const W = new Float64Array(6);
/** Denominators Π_{j≠i} (x_i − x_j) for x = −2 … 3. */
const DENOM = [-120, 24, -12, 12, -24, 120];

function weights(f: number): Float64Array {
  const p0 = f + 2;
  const p1 = f + 1;
  const p2 = f;
  const p3 = f - 1;
  const p4 = f - 2;
  const p5 = f - 3;
  W[0] = (p1 * p2 * p3 * p4 * p5) / DENOM[0];
  W[1] = (p0 * p2 * p3 * p4 * p5) / DENOM[1];
  W[2] = (p0 * p1 * p3 * p4 * p5) / DENOM[2];
  W[3] = (p0 * p1 * p2 * p4 * p5) / DENOM[3];
  W[4] = (p0 * p1 * p2 * p3 * p5) / DENOM[4];
  W[5] = (p0 * p1 * p2 * p3 * p4) / DENOM[5];
  return W;
}

/**
 * The six nodes around the last day asked for, value by value (5 × 6, angles unwrapped from node to
 * node: they never move 180° in a day); consecutive instants of one day reuse them.
 */
const VALUES = 7;
const AROUND = new Float64Array(6 * VALUES);
let lastDay = Number.NaN;
let lastDeltaT: number | undefined;

function gather(day: number, deltaT: number | undefined): void {
  if (day === lastDay && deltaT === lastDeltaT) return;
  for (let i = 0; i < 6; i++) {
    const node = nodeOf(day - 2 + i, deltaT);
    for (let k = 0; k < VALUES; k++) {
      let v = node[k];
      if (i > 0 && k < 2) {
        const prev = AROUND[k * 6 + i - 1];
        while (v - prev > 180) v -= 360;
        while (v - prev < -180) v += 360;
      }
      AROUND[k * 6 + i] = v;
    }
  }
  lastDay = day;
  lastDeltaT = deltaT;
}

/** The weighted sum of node value k over the six gathered nodes. */
function interpolate(k: number, w: Float64Array): number {
  const o = k * 6;
  return w[0] * AROUND[o] + w[1] * AROUND[o + 1] + w[2] * AROUND[o + 2] + w[3] * AROUND[o + 3] + w[4] * AROUND[o + 4] + w[5] * AROUND[o + 5];
}

/** Observer constants of the last site (Eq. 33–35 and the refraction's constant part). */
let obsLatitude = Number.NaN;
let obsElevation = Number.NaN;
let obsPressure = Number.NaN;
let obsTemperature = Number.NaN;
let sinLat = 0;
let cosLat = 1;
let obsX = 1;
let obsY = 0;
let refractionScale = 0;

function observer(latitude: number, o: ResolvedSunOptions): void {
  if (latitude === obsLatitude && o.elevation === obsElevation && o.pressure === obsPressure && o.temperature === obsTemperature) return;
  const latRad = latitude * RAD;
  sinLat = sin(latRad);
  cosLat = cos(latRad);
  const uRad = atan(POLAR_RATIO * tan(latRad)); // Eq. 33
  obsX = cos(uRad) + (o.elevation / EARTH_RADIUS_M) * cosLat; // Eq. 34
  obsY = POLAR_RATIO * sin(uRad) + (o.elevation / EARTH_RADIUS_M) * sinLat; // Eq. 35
  refractionScale = ((o.pressure / 1010) * (283 / (273 + o.temperature)) * 1.02) / 60; // Eq. 42, constant part
  obsLatitude = latitude;
  obsElevation = o.elevation;
  obsPressure = o.pressure;
  obsTemperature = o.temperature;
}
const resolved: ResolvedSunOptions = { elevation: 0, pressure: 0, temperature: 0, deltaT: undefined };
/** The options of the last call, so that a range of instants at one site resolves them once. */
let lastOptions: SunOptions | undefined;
let lastElevation: number | undefined;
let lastPressure: number | undefined;
let lastTemperature: number | undefined;
let lastGivenDeltaT: number | undefined;

function resolveOnce(options: SunOptions | undefined): ResolvedSunOptions {
  const o = options ?? {};
  if (lastOptions !== undefined && o.elevation === lastElevation && o.pressure === lastPressure && o.temperature === lastTemperature && o.deltaT === lastGivenDeltaT) return resolved;
  resolveSunOptions(options, '', resolved);
  lastOptions = o;
  lastElevation = o.elevation;
  lastPressure = o.pressure;
  lastTemperature = o.temperature;
  lastGivenDeltaT = o.deltaT;
  return resolved;
}

/** Geocentric local hour angle and declination at an instant: what the rise/transit/set search works on. */
export interface GeocentricHourAngle {
  /** Observer's geocentric local hour angle H [°], 0…360 (Eq. 31). */
  hourAngle: number;
  /** Geocentric declination δ [°] (Eq. 30). */
  declination: number;
}

/**
 * Geocentric local hour angle and declination of the sun at an instant, with the slow terms
 * interpolated between the kept nodes (as {@link sunPositionFromNodes}); no checks, for a caller that
 * has checked the site and the instant.
 * @param utcMs - UTC instant [ms since 1970-01-01]
 * @param longitude - [°] east positive
 * @param deltaT - TT − UT [s], or undefined for the default polynomial at each node
 * @param out - filled and returned
 * @returns H = ν0 + Δψ cos ε + λ − α (Eq. 27, 28, 31; ν0 exact for the instant) and δ (Eq. 30);
 *   tests/core/sun/sunNodes.test.ts holds both to the direct SPA within 1e-6°
 * @remarks Reda & Andreas (2008), NREL/TP-560-34302: Eq. 4–30 at the nodes, Eq. 27, 28, 31 at the instant.
 */
export function geocentricFromNodes(utcMs: number, longitude: number, deltaT: number | undefined, out: GeocentricHourAngle): GeocentricHourAngle {
  const nodesSinceUnix = utcMs / MS_PER_NODE;
  const day = floor(nodesSinceUnix);
  gather(day, deltaT);
  const w = weights(nodesSinceUnix - day);
  out.hourAngle = floorWrap360(siderealTime(utcMs) + longitude - interpolate(0, w));
  out.declination = interpolate(2, w);
  return out;
}

/** Mean sidereal time at Greenwich ν0 [°] at an instant, not reduced to one turn (Eq. 27). */
function siderealTime(utcMs: number): number {
  const jd = utcMs / MS_PER_DAY + JD_UNIX;
  const jc = (jd - 2_451_545) / 36_525;
  return 280.46061837 + 360.98564736629 * (jd - 2_451_545) + jc * jc * (0.000387933 - jc / 38_710_000);
}

/**
 * Topocentric sun position at an instant by the NREL SPA with the slow terms interpolated between
 * nodes two days apart (see the module comment); same arguments, checks and results as {@link sunPosition}.
 * @param utcMs - UTC instant [ms since 1970-01-01], years −2000…9999 (before 1860 give `deltaT`)
 * @param latitude - site latitude [°] −90…90, north positive
 * @param longitude - site longitude [°] −180…180, east positive
 * @param options - elevation [m], pressure [hPa], temperature [°C], ΔT [s], as for {@link sunPosition}
 * @param out - an object to fill and return instead of a new one (a caller working through many
 *   instants reads one field of each and allocates nothing)
 * @returns the position; within ~1e-8° of {@link sunPosition} (tested within 1e-6°)
 * @remarks Reda & Andreas (2008), NREL/TP-560-34302: Eq. 4–30, A1–A4 at the nodes; Eq. 27, 31–46 at the instant.
 */
export function sunPositionFromNodes(utcMs: number, latitude: number, longitude: number, options?: SunOptions, out?: SunPosition): SunPosition {
  const o = resolveOnce(options);
  requireSite(latitude, longitude);
  requireInstant(utcMs, o.deltaT !== undefined);
  const nodesSinceUnix = utcMs / MS_PER_NODE;
  const day = floor(nodesSinceUnix);
  const f = nodesSinceUnix - day;
  gather(day, o.deltaT);
  const w = weights(f);
  const g = interpolate(0, w);
  const a = interpolate(5, w);
  const b = interpolate(6, w);
  observer(latitude, o);
  // Eq. 27 (exact for the instant) and Eq. 28, 31: H = ν0 + Δψ cos ε + λ − α.
  const nu0 = siderealTime(utcMs);
  // Reduced to 0…360 by floor rather than %: ν0 is some 10⁷ degrees, and floor is the cheaper way
  // (the result differs from an exact remainder by an ulp of ν0, ~2e-9°).
  const H = floorWrap360(nu0 + longitude - g);
  const HRad = H * RAD;
  // Eq. 36–41 in vector form (as src/core/sun/sunPath.ts): the topocentric vector in Earth radii,
  // X toward the meridian, Y westward, Z toward the pole, turned to up / horizontal / west / south.
  const vx = a * cos(HRad) - obsX;
  const vy = a * sin(HRad);
  const vz = b - obsY;
  const south = vx * sinLat - vz * cosLat;
  const up = sinLat * vz + cosLat * vx;
  const horizontal = sqrt(vy * vy + south * south);
  const e0 = atan2(up, horizontal) * DEG; // Eq. 41
  const e = e0 < RISE_SET_ALTITUDE ? e0 : e0 + refractionFromComponents(refractionScale, up, horizontal, e0); // Eq. 42, 43
  const az = atan2(vy, south) * DEG + 180; // Eq. 45, 46
  const hourAngle = H > 180 ? H - 360 : H; // H is in 0…360: (−180, 180]
  const p = out ?? ({} as SunPosition);
  p.altitude = e;
  p.azimuth = az >= 360 ? az - 360 : az;
  p.zenith = 90 - e; // Eq. 44
  p.declination = interpolate(2, w);
  p.hourAngle = hourAngle;
  p.equationOfTime = interpolate(4, w);
  p.rightAscension = floorWrap360(interpolate(1, w));
  p.altitudeUnrefracted = e0;
  p.solarTime = floorWrap360(180 + hourAngle) / 15;
  p.earthSunDistance = interpolate(3, w);
  return p;
}
