/**
 * The hourly series of one window over a year: 8760 rows (8784 in a leap year), each stamped at the
 * END of its hour with the sun at the middle of the hour (docs/conventions.md#hourly-rows), in typed-array columns.
 *
 * Same calculation as {@link windowGainAt} hour by hour (the tests hold them together), written for
 * speed: the sun path comes from {@link annualSunPath} (slow terms every second day, interpolated;
 * without the declination and equation-of-time columns, which the series does not use); everything
 * that does not change by the hour (SHGC curve, glass area, sky view factor, the shading and the
 * plane's checks, the extraterrestrial irradiance by day) is worked out once; per hour only the
 * kernels run that the checked functions share ({@link prepareShading}, {@link preparePlane}), with
 * the sun's sines and cosines taken from the sun path (which has them from its topocentric vector),
 * and nothing is allocated. The hourly work is three short passes, each a function of its own:
 * angles (every hour), shading and SHGC (sun up and in front of the wall), irradiance and gain
 * (hours with light). Hours that cannot matter are skipped: no shading with the sun down or behind
 * the wall, no shadow work with the sun below the skyline, no sky model in the dark.
 * The fast paths it relies on (each beside the plain formula it replaces, each with an equality
 * test, each kept because it moves `npm run bench` by 10 % or more) are listed in docs/fast-paths.md.
 * tests/core/gain/preparedFast.test.ts holds every hour to the checked functions within 1e-12 (the
 * incidence angle within 1e-9 °: acos amplifies rounding near 0° and 180°).
 *
 * Weather: clear-sky models (12 monthly values or one for the year) at each hour's sun; a supplied
 * DNI + DHI series; or a supplied GHI series split by Erbs et al. (1982). A non-finite value in a
 * supplied series marks that row missing: `missing[i] = 1`, and its irradiance and gain are 0 —
 * the summary counts these hours so they never pass for dark ones.
 */
import { SunpaneError, DEG, RAD, acosClamped, requireRange, wrap180 } from '../common';
import { type PreparedWindow, monthlyValue, prepareWindow } from './prepared';
import { MAX_IRRADIANCE, outdoorTemperatureSource } from './windowSpec';
import { DAILY_RANGE_FRACTIONS } from './outdoorTemperature';
import { type PerezBrightnessColumns, type PlaneRows, type PreparedPlane, preparePlane, requirePossibleIrradiance } from '../sky';
import type { ShgcCurve } from '../glazing';
import { type PreparedShading, prepareShading } from '../shading';
import { annualSunPath, type SunPathYear } from '../sun';
import { describeDaylightSaving, standardToClock, type TimeConvention } from '../time';
import { type SharedYear, SharedYears, dniExtraByDay, fillWeather, monthOfDay, perezBrightnessOf, sharedYearKey, sharedYearOf, sunPathAt } from './sharedYear';
import type { DiffuseShading, WindowSpec } from './window';

const { atan2, cos, max, min, sin } = Math;
const { isFinite: numberIsFinite } = Number;
const NAN = Number.NaN;

/**
 * One window's year, hour by hour. Every column has `hours` entries; row i is the hour stamped
 * stampSerial[i], read by `timeConvention` (hour ending at the stamp, or the instant itself).
 */
export interface AnnualSeries {
  name: string;
  year: number;
  /** How the rows are stamped: `hourEnding` (end of the hour, sun at mid-hour) or `instant` (top of the hour, sun there). */
  timeConvention: TimeConvention;
  /** 8760, or 8784 in a leap year. */
  hours: number;
  /** Glass area [m²]. */
  glassArea: number;
  /** Local standard-time serial of each row's stamp: the END of its hour (`hourEnding`) or its start (`instant`). */
  stampSerial: Float64Array;
  /** The same stamps on the local clock (the same array as `stampSerial` without daylight saving). */
  clockStamp: Float64Array;
  /** The clock convention in words (daylight-saving rule, or standard time all year). */
  clockRule: string;
  /** How a supplied series' rows were fitted to the year, in words (undefined for clear skies). */
  yearFit?: string;
  /** Sun at the middle of the hour (`hourEnding`) or at the stamp (`instant`) [°]. */
  sunAltitude: Float64Array;
  sunAzimuth: Float64Array;
  /** Incidence angle on the glass [°], 0…180 (> 90: sun behind the window). */
  incidence: Float64Array;
  /**
   * Profile angle [°] as src/core/sun/surfaceAngles.ts `profileAngle` gives it: −90…90 with the sun in front
   * of the wall; |Ω| ≥ 90 when the sun is in or behind the wall plane (no shadow geometry then).
   */
  profileAngle: Float64Array;
  /** Sunlit fraction of the glazing, 0…1 (0 with the sun down, behind the wall or the skyline). */
  sunlitFraction: Float64Array;
  /** Direct normal and diffuse horizontal irradiance used [W/m²] (0 on missing rows). */
  dni: Float64Array;
  dhi: Float64Array;
  /**
   * Irradiance [W/m²]: beam on the window plane (unshaded; the sunlit fraction applies in the gain),
   * sky diffuse and ground reflected as they reach the glass past the window's devices and skyline.
   */
  beam: Float64Array;
  sky: Float64Array;
  ground: Float64Array;
  /** Sky diffuse and ground reflected on the bare window plane (no devices, no skyline) [W/m²]. */
  skyUnshaded: Float64Array;
  groundUnshaded: Float64Array;
  /**
   * The window's diffuse shading, constant over the year: sky and ground view ratios and the open
   * share of the horizon band (0…1 each, 1 for a bare window), and the treatment used.
   */
  diffuse: { skyViewRatio: number; groundViewRatio: number; horizonShare: number; diffuseShading: DiffuseShading };
  /** SHGC for the beam at the incidence angle; 0 when no beam can reach the glass (sun down or behind the window). */
  shgc: Float64Array;
  /** Window solar gain [W], and its radiant and convective parts. */
  gain: Float64Array;
  radiant: Float64Array;
  convective: Float64Array;
  /** The solar gain by part [W]: transmitted beam, and diffuse (sky + ground). */
  gainBeam: Float64Array;
  gainDiffuse: Float64Array;
  /** Outdoor dry-bulb [°C] (NaN without a source or on a missing row) and the conduction gain U·A·ΔT [W] (0 without a U-value). */
  dryBulb: Float64Array;
  conduction: Float64Array;
  /** True when the window has a U-value (the conduction column is then meaningful). */
  hasConduction: boolean;
  /** True when an interior shade is present (the beam then goes to the non-solar radiant time series). */
  interiorShade: boolean;
  /** Radiant shares of the beam, diffuse and conduction gains [-]. */
  radiantFractions: { beam: number; diffuse: number; conduction: number };
  /** 1 where the weather series has no value for the hour (gain etc. 0), else 0. */
  missing: Uint8Array;
}

export { monthOfDay };

/**
 * The hourly series of one window over `spec.year`.
 * @param spec - the window (validated; errors name the field by its path; a supplied series of the
 *   wrong length is refused naming `weather.dni`, `weather.dhi` or `weather.ghi`)
 * @returns the columns of {@link AnnualSeries}; night rows have zero beam, sunlit fraction and (for
 *   clear-sky weather) zero irradiance; missing rows are flagged and zero
 * @remarks Per hour: sun by the NREL SPA (annual fast path), incidence and profile angles, sunlit
 *   fraction by shadow polygons, irradiance on the plane by the chosen sky model, then
 *   Q = A · IAC · [E_beam · F_sunlit · SHGC(θ) + (E_sky + E_ground) · SHGC_d] as in src/core/gain/windowGain.ts.
 */
export function annualSeries(spec: WindowSpec): AnnualSeries {
  const w = prepareWindow(spec);
  return annualOfPrepared(w, RECENT_YEARS.of(w));
}

/**
 * The sun and weather of the last few sites asked for: a workbook's windows, the pane's shading
 * options and a table of several windows come back to the same site, year and weather, and the
 * year's sun path, weather and sky brightness are the same numbers for all of them.
 */
const RECENT_YEARS = new SharedYears(4);

/** Sines and cosines of the sun for a one-off year: scratch columns of this module (one call runs at a time). */
const ONE_OFF_TRIG = { sinAltitude: new Float64Array(8784), cosAltitude: new Float64Array(8784), sinAzimuth: new Float64Array(8784), cosAzimuth: new Float64Array(8784) };

/**
 * {@link annualSeries} for a window already prepared.
 * @param w - the prepared window
 * @param shared - the sun's path and the weather of the window's site and year (./sharedYear.ts),
 *   when many windows share them; default: worked out for this window alone
 * @param reuse - write into this module's scratch series instead of fresh columns, for a summary of
 *   many windows (`summarizeWindowYear`): the result is valid only until the next call, and only in
 *   the columns a summary reads (gain, beam, sky, ground and their unshaded columns, sunlit
 *   fraction, SHGC, missing; incidence with the sun up, 180° with it behind the plane — night rows
 *   of the angles, the profile angle and the parts of the gain are skipped)
 */
export function annualOfPrepared(w: PreparedWindow, shared?: SharedYear, reuse = false): AnnualSeries {
  const { spec } = w;
  const n = w.hours;
  const sy = shared ?? sharedYearOf(w, ONE_OFF_TRIG);
  if (sy.hours !== n || (shared !== undefined && shared.key !== sharedYearKey(w))) throw new SunpaneError('year', spec.year, `the shared sun and weather are not those of this window's site, year and weather (${sy.key})`);
  const scratch = reuse ? yearScratch(n) : undefined;
  // With `reuse` the passes write every hour they consider (zeros included), so the rows none of
  // them considers (night, no light) need clearing only when the scratch last served another year.
  const col = scratch ? (c: Float64Array) => c : () => new Float64Array(n);
  if (scratch && scratchOwner.get(n) !== sy) {
    for (const c of [scratch.gain, scratch.beam, scratch.sky, scratch.ground, scratch.skyUnshaded, scratch.groundUnshaded, scratch.sunlitFraction, scratch.shgc]) c.fill(0);
    scratchOwner.set(n, sy);
  }
  // A full series from a shared year gets its own copies of the shared columns it hands out.
  const handOut = (c: Float64Array) => (shared !== undefined && !reuse ? c.slice() : c);
  const stampSerial = handOut(sy.stampSerial);
  const rule = spec.site.daylightSaving;
  let clockStamp = stampSerial;
  if (rule !== undefined) {
    clockStamp = new Float64Array(n);
    // An hour-ending row moves with its hour's middle; an instant row with itself.
    const half = w.convention === 'hourEnding' ? 1 / 48 : 0;
    for (let i = 0; i < n; i++) clockStamp[i] = standardToClock(sy.stampSerial[i] - half, rule) + half;
  }
  const c = scratch ?? ({} as Partial<AnnualSeries>);
  // A shared year's columns are read-only to a window: its own copy of the missing hours (conduction
  // may add some) and, for a full series, of the weather; a one-off year's fresh columns are taken over.
  const own = shared === undefined;
  const out: AnnualSeries = {
    name: spec.name,
    year: spec.year,
    timeConvention: w.convention,
    hours: n,
    glassArea: w.glassArea,
    stampSerial,
    clockStamp,
    clockRule: describeDaylightSaving(rule),
    yearFit: w.yearFit?.text,
    sunAltitude: handOut(sy.altitude),
    sunAzimuth: handOut(sy.azimuth),
    incidence: col(c.incidence as Float64Array),
    profileAngle: col(c.profileAngle as Float64Array),
    sunlitFraction: col(c.sunlitFraction as Float64Array),
    dni: own || reuse ? sy.dni : sy.dni.slice(),
    dhi: own || reuse ? sy.dhi : sy.dhi.slice(),
    beam: col(c.beam as Float64Array),
    sky: col(c.sky as Float64Array),
    ground: col(c.ground as Float64Array),
    skyUnshaded: col(c.skyUnshaded as Float64Array),
    groundUnshaded: col(c.groundUnshaded as Float64Array),
    diffuse: { skyViewRatio: w.shade.isotropic, groundViewRatio: w.shade.ground, horizonShare: w.shade.horizon, diffuseShading: w.beamOnly ? 'beamOnly' : 'viewFactors' },
    shgc: col(c.shgc as Float64Array),
    gain: col(c.gain as Float64Array),
    radiant: col(c.radiant as Float64Array),
    convective: col(c.convective as Float64Array),
    gainBeam: col(c.gainBeam as Float64Array),
    gainDiffuse: col(c.gainDiffuse as Float64Array),
    dryBulb: scratch && spec.glazing.uValue === undefined ? scratch.dryBulb : col(c.dryBulb as Float64Array).fill(NAN), // (a summary reads no dry-bulb)
    conduction: col(c.conduction as Float64Array),
    hasConduction: spec.glazing.uValue !== undefined,
    interiorShade: w.interiorShade,
    radiantFractions: { beam: w.radiantFraction, diffuse: w.radiantFractionDiffuse, conduction: w.radiantFractionConduction },
    missing: own ? sy.missing : copyInto(c.missing, sy.missing),
  };
  // Windows sharing a year share its sky's Perez brightness coefficients too (the same numbers).
  runPasses(w, sy, out, 0, n, { daylight: sy.daylight, lit: sy.lit, summaryOnly: reuse, shared: shared !== undefined });
  return out;
}

/**
 * The running totals of a summary of one window's year (src/core/gain/annualSummary.ts turns them
 * into an {@link AnnualSummary}): each sum is added up hour by hour in the order of the hours, so
 * that totals gathered from the year's columns and totals gathered while the hours are worked out
 * are the same numbers.
 */
export interface YearTotals {
  /** Solar gain per month [Wh], January first. */
  monthlyWh: number[];
  /** Missing hours per month, January first. */
  monthlyMissingHours: number[];
  missingHours: number;
  /** Largest hourly gain [W] and its row (0 and row 0 for a year without gain). */
  peakW: number;
  peakIndex: number;
  /** Hours with beam on the glass (beam on the plane > 0 and sunlit fraction > 0). */
  sunlitHours: number;
  /** Hours with the sun above the horizon and in front of the plane, and their sum of sunlit fractions. */
  sunOnWallHours: number;
  sunlitSum: number;
  /** Σ beam · SHGC(θ) · sunlit fraction and Σ beam · SHGC(θ) [Wh/m²]. */
  beamKept: number;
  beamAll: number;
  /** Σ (sky + ground) on the glass and on the bare window [Wh/m²]. */
  diffuseKept: number;
  diffuseAll: number;
}

/** Totals of nothing yet. */
export function emptyYearTotals(): YearTotals {
  return {
    monthlyWh: new Array<number>(12).fill(0),
    monthlyMissingHours: new Array<number>(12).fill(0),
    missingHours: 0,
    peakW: 0,
    peakIndex: 0,
    sunlitHours: 0,
    sunOnWallHours: 0,
    sunlitSum: 0,
    beamKept: 0,
    beamAll: 0,
    diffuseKept: 0,
    diffuseAll: 0,
  };
}

/** Missing hours of a shared year, overall and by month, counted once per year (a window without conduction adds none). */
const MISSING_OF_YEAR = new WeakMap<SharedYear, { total: number; monthly: number[] }>();

function missingOfYear(sy: SharedYear): { total: number; monthly: number[] } {
  let m = MISSING_OF_YEAR.get(sy);
  if (m === undefined) {
    const monthly = new Array<number>(12).fill(0);
    let total = 0;
    const months = monthsOfYear(sy.year);
    for (let i = 0; i < sy.hours; i++) {
      if (sy.missing[i] === 1) {
        total++;
        monthly[months[(i / 24) | 0] - 1]++;
      }
    }
    m = { total, monthly };
    MISSING_OF_YEAR.set(sy, m);
  }
  return m;
}

/** Month (1…12) of each day of a year, kept by year (read-only). */
const MONTHS_OF_YEAR = new Map<number, Uint8Array>();

function monthsOfYear(year: number): Uint8Array {
  let m = MONTHS_OF_YEAR.get(year);
  if (m === undefined) {
    m = monthOfDay(year);
    if (MONTHS_OF_YEAR.size >= 8) MONTHS_OF_YEAR.clear();
    MONTHS_OF_YEAR.set(year, m);
  }
  return m;
}

/**
 * The summary totals of a window's year from its site's shared year, added up while the hours are
 * worked out: no hourly column of gain or irradiance is written and the year is not read again
 * afterwards. The same passes and the same arithmetic as {@link annualOfPrepared} with `reuse`
 * followed by adding up its columns (src/core/gain/annualSummary.ts), so the same numbers to the
 * last bit (tests/core/gain/sharedYear.test.ts): the rows this skips (night, no light) add 0 there.
 * For a window without a U-value (conduction can mark further hours missing: such a window goes
 * through the whole summary-only year instead).
 * @param w - the prepared window (no `glazing.uValue`)
 * @param sy - the shared year of its site, year and weather
 */
export function yearTotalsOfShared(w: PreparedWindow, sy: SharedYear): YearTotals {
  const { spec } = w;
  const n = w.hours;
  if (sy.hours !== n || sy.key !== sharedYearKey(w)) throw new SunpaneError('year', spec.year, `the shared sun and weather are not those of this window's site, year and weather (${sy.key})`);
  if (spec.glazing.uValue !== undefined) throw new SunpaneError('glazing.uValue', spec.glazing.uValue, 'is not read by the summary totals: a window with conduction is summed up from its summary-only year');
  const scratch = yearScratch(n);
  if (scratchOwner.get(n) !== sy) {
    for (const c of [scratch.gain, scratch.beam, scratch.sky, scratch.ground, scratch.skyUnshaded, scratch.groundUnshaded, scratch.sunlitFraction, scratch.shgc]) c.fill(0);
    scratchOwner.set(n, sy);
  }
  const totals = emptyYearTotals();
  const missing = missingOfYear(sy);
  totals.missingHours = missing.total;
  for (let m = 0; m < 12; m++) totals.monthlyMissingHours[m] = missing.monthly[m];
  const tilt = spec.surfaceTilt;
  const surfAz = spec.surfaceAzimuth;
  const shade = w.vertical ? prepareShading({ width: spec.width, height: spec.height }, spec.shading, surfAz) : undefined;
  const plane = preparePlane({ surfaceTilt: tilt, surfaceAzimuth: surfAz, groundAlbedo: spec.groundAlbedo, skyModel: w.skyModel, shade: w.shade });
  const brightness = plane.perez ? perezBrightnessOf(sy) : undefined;
  hourlyAngles(0, n, sy.daylight, sy, cos(tilt * RAD), sin(tilt * RAD), cos(surfAz * RAD), sin(surfAz * RAD), scratch.incidence, scratch.profileAngle, true);
  hourlyShading(0, n, sy.daylight, shade, w.curve, surfAz, sy, scratch.incidence, scratch.sunlitFraction, scratch.shgc);
  totals.sunOnWallHours = SHADING_TOTALS.hours;
  totals.sunlitSum = SHADING_TOTALS.sunlitSum;
  hourlyGainTotals(sy.lit, plane, brightness, w.solarArea * w.interiorAttenuation, w.solarArea * w.interiorAttenuationDiffuse, w.curve.diffuse, w.beamOnly ? w.skylineSky : -1, sy, scratch.sunlitFraction, scratch.shgc, monthsOfYear(spec.year), totals);
  return totals;
}

/** The sun of each hour as the passes read it: altitude and azimuth [°], their sines and cosines. */
export interface SunColumns {
  altitude: Float64Array;
  azimuth: Float64Array;
  sinAltitude: Float64Array;
  cosAltitude: Float64Array;
  sinAzimuth: Float64Array;
  cosAzimuth: Float64Array;
}

/** Which hours the passes consider over a whole year, and what they need not write. */
interface PassHours {
  /** The hours with the sun up, in order (shading and SHGC; with `summaryOnly`, the angles too). */
  daylight: Int32Array;
  /** The hours with weather and light, in order (irradiance and gain). */
  lit: Int32Array;
  /** For a summary: skip what it does not read. */
  summaryOnly: boolean;
  /** The year is shared: take its sky's Perez brightness coefficients from it. */
  shared: boolean;
}

/**
 * The hourly passes over rows `from` … `to` − 1 (the whole year, with `hours` saying which hours
 * each pass needs; or one row): angles, then shading and SHGC, then conduction (with a U-value),
 * then irradiance and gain. The weather columns of `out` must be filled.
 */
function runPasses(w: PreparedWindow, sun: SharedYear | SunColumns, out: AnnualSeries, from: number, to: number, hours?: PassHours): void {
  const { spec } = w;
  const tilt = spec.surfaceTilt;
  const surfAz = spec.surfaceAzimuth;
  // Checked once here; per hour only the kernels run (the same ones the checked functions use).
  const shade = w.vertical ? prepareShading({ width: spec.width, height: spec.height }, spec.shading, surfAz) : undefined;
  // The window's diffuse shading (view factors, worked out once in prepareWindow) goes in as constants.
  const plane = preparePlane({ surfaceTilt: tilt, surfaceAzimuth: surfAz, groundAlbedo: spec.groundAlbedo, skyModel: w.skyModel, shade: w.shade });
  const brightness = hours?.shared && plane.perez ? perezBrightnessOf(sun as SharedYear) : undefined;
  const summaryOnly = hours?.summaryOnly === true;

  // Short passes over the year, each a function of its own (as in src/core/sun/sunPath.ts: short
  // loops with few live values run much faster than one long loop body, and a function of its own
  // keeps its type feedback): angles for every hour; shading and SHGC for the hours with the sun in
  // front of the window; irradiance and gain for the hours with light.
  hourlyAngles(from, to, summaryOnly ? hours?.daylight : undefined, sun, cos(tilt * RAD), sin(tilt * RAD), cos(surfAz * RAD), sin(surfAz * RAD), out.incidence, out.profileAngle, summaryOnly);
  hourlyShading(from, to, hours?.daylight, shade, w.curve, surfAz, sun, out.incidence, out.sunlitFraction, out.shgc);
  if (out.hasConduction) hourlyConduction(w, out, from, to); // before the gain: a missing dry-bulb marks its hour missing
  hourlyGain(from, to, hours?.lit, plane, brightness, w.solarArea * w.interiorAttenuation, w.solarArea * w.interiorAttenuationDiffuse, w.radiantFraction, w.radiantFractionDiffuse, w.curve.diffuse, w.beamOnly ? w.skylineSky : -1, sun, out, summaryOnly);
}

/** One row of a window's year, worked out alone: the row's values of the columns of {@link AnnualSeries}. */
export interface AnnualRow {
  /** Row index in the year. */
  row: number;
  stampSerial: number;
  sunAltitude: number;
  sunAzimuth: number;
  incidence: number;
  profileAngle: number;
  sunlitFraction: number;
  dni: number;
  dhi: number;
  beam: number;
  sky: number;
  ground: number;
  skyUnshaded: number;
  groundUnshaded: number;
  shgc: number;
  gain: number;
  radiant: number;
  convective: number;
  gainBeam: number;
  gainDiffuse: number;
  dryBulb: number;
  conduction: number;
  /** True when the weather has no value for the row. */
  missing: boolean;
}

/** Sun paths of recent one-row calls, by year, site and convention (a few kept, oldest dropped first). */
const PATH_CACHE = new Map<string, SunPathYear>();
const PATH_CACHE_SIZE = 6;

function cachedSunPath(w: PreparedWindow): SunPathYear {
  const { site, year } = w.spec;
  const key = [year, site.latitude, site.longitude, site.utcOffset, site.elevation, site.pressure, site.temperature, w.convention].join('|');
  let path = PATH_CACHE.get(key);
  if (path === undefined) {
    path = annualSunPath(year, site, { at: sunPathAt(w.convention), trig: true, slowColumns: false });
    if (PATH_CACHE.size >= PATH_CACHE_SIZE) PATH_CACHE.delete(PATH_CACHE.keys().next().value as string);
  } else PATH_CACHE.delete(key);
  PATH_CACHE.set(key, path);
  return path;
}

/** The scratch series of {@link annualOfPrepared} with `reuse` (one per year length), and the shared year each last served. */
const YEAR_SCRATCH = new Map<number, AnnualSeries>();
const scratchOwner = new Map<number, SharedYear>();

function yearScratch(n: number): AnnualSeries {
  let s = YEAR_SCRATCH.get(n);
  if (s === undefined) {
    s = emptySeries(n);
    YEAR_SCRATCH.set(n, s);
  }
  return s;
}

/** A series of fresh zero columns `n` long (scratch). */
function emptySeries(n: number): AnnualSeries {
  const col = () => new Float64Array(n);
  return {
    name: '',
    year: 0,
    timeConvention: 'hourEnding',
    hours: 0,
    glassArea: 0,
    stampSerial: col(),
    clockStamp: col(),
    clockRule: '',
    sunAltitude: col(),
    sunAzimuth: col(),
    incidence: col(),
    profileAngle: col(),
    sunlitFraction: col(),
    dni: col(),
    dhi: col(),
    beam: col(),
    sky: col(),
    ground: col(),
    skyUnshaded: col(),
    groundUnshaded: col(),
    diffuse: { skyViewRatio: 1, groundViewRatio: 1, horizonShare: 1, diffuseShading: 'viewFactors' },
    shgc: col(),
    gain: col(),
    radiant: col(),
    convective: col(),
    gainBeam: col(),
    gainDiffuse: col(),
    dryBulb: col(),
    conduction: col(),
    hasConduction: false,
    interiorShade: false,
    radiantFractions: { beam: 0, diffuse: 0, conduction: 0 },
    missing: new Uint8Array(n),
  };
}

/** Copies `from` into `into` when given (a scratch column), else into a fresh copy. */
function copyInto<T extends Float64Array | Uint8Array>(into: T | undefined, from: T): T {
  if (into === undefined) return from.slice() as T;
  into.set(from);
  return into;
}

/** Scratch series for one-row calls: full-length columns, only the computed row is meaningful. */
let rowScratch: AnnualSeries | undefined;

function scratchSeries(w: PreparedWindow, path: SunPathYear): AnnualSeries {
  if (rowScratch === undefined) rowScratch = emptySeries(8784);
  rowScratch.name = w.spec.name;
  rowScratch.year = w.spec.year;
  rowScratch.timeConvention = w.convention;
  rowScratch.hours = path.hours;
  rowScratch.glassArea = w.glassArea;
  rowScratch.hasConduction = w.spec.glazing.uValue !== undefined;
  return rowScratch;
}

/**
 * One row of the window's year, by the same passes and the same sun path as {@link annualSeries}:
 * the numbers are those of the year's row, to the last bit (a one-hour function at a row's stamp
 * and the hourly table agree exactly).
 * @param w - the prepared window
 * @param row - 0 … hours − 1
 * @param weatherHour - the row's DNI and DHI [W/m²] instead of the window's weather (each checked 0…2000)
 * @returns the row's values
 * @throws SunpaneError naming `dni` or `dhi` for a bad given value
 */
export function annualRowOfPrepared(w: PreparedWindow, row: number, weatherHour?: { dni: number; dhi: number }): AnnualRow {
  const path = cachedSunPath(w);
  if (!(row >= 0 && row < path.hours)) throw new SunpaneError('row', row, `must be a row of ${w.spec.year}: 0 to ${path.hours - 1}`);
  const out = scratchSeries(w, path);
  for (const c of [out.incidence, out.profileAngle, out.sunlitFraction, out.dni, out.dhi, out.beam, out.sky, out.ground, out.skyUnshaded, out.groundUnshaded, out.shgc, out.gain, out.radiant, out.convective, out.gainBeam, out.gainDiffuse, out.conduction]) c[row] = 0;
  out.dryBulb[row] = NAN;
  out.missing[row] = 0;
  if (weatherHour !== undefined) {
    out.dni[row] = requireRange('dni', weatherHour.dni, 0, MAX_IRRADIANCE, 'W/m²');
    out.dhi[row] = requireRange('dhi', weatherHour.dhi, 0, MAX_IRRADIANCE, 'W/m²');
    requirePossibleIrradiance(out.dni[row], out.dhi[row], sin(path.altitude[row] * RAD), dniExtraByDay()[((row / 24) | 0) + 1]);
  } else fillWeather(w, path.altitude, path.zenith, out, row, row + 1);
  runPasses(w, { altitude: path.altitude, azimuth: path.azimuth, sinAltitude: path.sinAltitude!, cosAltitude: path.cosAltitude!, sinAzimuth: path.sinAzimuth!, cosAzimuth: path.cosAzimuth! }, out, row, row + 1);
  return {
    row,
    stampSerial: path.stampSerial[row],
    sunAltitude: path.altitude[row],
    sunAzimuth: path.azimuth[row],
    incidence: out.incidence[row],
    profileAngle: out.profileAngle[row],
    sunlitFraction: out.sunlitFraction[row],
    dni: out.dni[row],
    dhi: out.dhi[row],
    beam: out.beam[row],
    sky: out.sky[row],
    ground: out.ground[row],
    skyUnshaded: out.skyUnshaded[row],
    groundUnshaded: out.groundUnshaded[row],
    shgc: out.shgc[row],
    gain: out.gain[row],
    radiant: out.radiant[row],
    convective: out.convective[row],
    gainBeam: out.gainBeam[row],
    gainDiffuse: out.gainDiffuse[row],
    dryBulb: out.dryBulb[row],
    conduction: out.conduction[row],
    missing: out.missing[row] === 1,
  };
}

/**
 * The outdoor dry-bulb and conduction gain U·A·(T_out − T_in) of every hour: from the supplied
 * series (fitted to the year by date) or the design-day profile of each month (fractions of daily
 * range by hour ending, src/core/gain/outdoorTemperature.ts). A missing dry-bulb row gives NaN and
 * no conduction, and marks the hour missing.
 */
function hourlyConduction(w: PreparedWindow, out: AnnualSeries, from: number, to: number): void {
  const weather = w.spec.weather;
  const tIn = w.spec.indoorTemperature as number;
  const ua = w.conductance;
  const { dryBulb, conduction, missing } = out;
  if (outdoorTemperatureSource(weather) === 'series') {
    const series = (weather as { dryBulb: ArrayLike<number> }).dryBulb;
    const rowOf = w.yearFit!.rowOf;
    for (let i = from; i < to; i++) {
      const t = series[rowOf[i]];
      if (!numberIsFinite(t)) {
        missing[i] = 1;
        continue;
      }
      dryBulb[i] = t;
      conduction[i] = ua * (t - tIn);
    }
    return;
  }
  const d = weather as { dryBulbMax: number[]; dailyRange: number[] };
  const months = monthOfDay(w.spec.year);
  // Row h of a day: hourEnding — the hour ending h + 1 (the profile's value h); instant — the
  // instant h:00 (the profile's value at hour h, which for 00:00 is that of 24:00).
  const shift = w.convention === 'instant' ? 23 : 0;
  for (let day = (from / 24) | 0; day * 24 < to; day++) {
    const tMax = monthlyValue(d.dryBulbMax, months[day]);
    const range = monthlyValue(d.dailyRange, months[day]);
    for (let i = max(from, day * 24); i < min(to, day * 24 + 24); i++) {
      const t = tMax - DAILY_RANGE_FRACTIONS[(i - day * 24 + shift) % 24] * range;
      dryBulb[i] = t;
      conduction[i] = ua * (t - tIn);
    }
  }
}

/**
 * Per-hour scratch columns (a year has at most 8784 hours), reused since one call runs at a time:
 * sin γ and cos γ of the horizontal shadow angle, and cos θ, left by pass 1 for the later passes.
 */
const SIN_GAMMA_SCRATCH = new Float64Array(8784);
const COS_GAMMA_SCRATCH = new Float64Array(8784);
const COS_THETA_SCRATCH = new Float64Array(8784);
/** The hours with light gathered by pass 3, in order. */
const LIT_SCRATCH = new Int32Array(8784);
/** A fixed multiplier on the circumsolar part, by row (the beam-only treatment). */
const CIRCUMSOLAR_SCRATCH = new Float64Array(8784);

let dniExtraRows: Float64Array | undefined;

/** Extraterrestrial normal irradiance by row of an hourly year [W/m²]: that of the row's day (Spencer 1971, {@link dniExtraByDay}). */
function dniExtraByRow(): Float64Array {
  if (dniExtraRows === undefined) {
    const byDay = dniExtraByDay();
    const rows = new Float64Array(8784);
    for (let i = 0; i < rows.length; i++) rows[i] = byDay[((i / 24) | 0) + 1];
    dniExtraRows = rows;
  }
  return dniExtraRows;
}

/**
 * The columns pass 3 hands to {@link PreparedPlane.irradianceRows}: the sun, the weather, the cosine
 * of the incidence (pass 1), the extraterrestrial irradiance of each row's day, the multiplier on
 * the circumsolar part (the hour's sunlit fraction, or the fixed one of the beam-only treatment),
 * and the columns of `into` to fill.
 */
function planeRowsOf(sun: SunColumns, dni: Float64Array, dhi: Float64Array, sunlitFraction: Float64Array, circumsolarFixed: number, into: Pick<AnnualSeries, 'beam' | 'sky' | 'ground' | 'skyUnshaded' | 'groundUnshaded'>): PlaneRows {
  return {
    dni,
    dhi,
    altitude: sun.altitude,
    sinAltitude: sun.sinAltitude,
    cosIncidence: COS_THETA_SCRATCH,
    dniExtra: dniExtraByRow(),
    circumsolar: circumsolarFixed < 0 ? sunlitFraction : CIRCUMSOLAR_SCRATCH.fill(circumsolarFixed),
    beam: into.beam,
    sky: into.sky,
    ground: into.ground,
    skyUnshaded: into.skyUnshaded,
    groundUnshaded: into.groundUnshaded,
  };
}

/** γ of the hours with the sun in front of the plane, and those hours in order (pass 2). */
const GAMMA_SCRATCH = new Float64Array(8784);
const FRONT_SCRATCH = new Int32Array(8784);

/**
 * Pass 1 of {@link annualOfPrepared}: incidence and profile angle of every hour, day and night (for
 * a summary: the incidence of the hours with the sun up).
 * Same formulas as src/core/sun/surfaceAngles.ts incidenceAngle / profileAngle (D&B Eq. 1.6.3, 1.9.1a) with
 * the surface's trig worked out once and without the per-call argument checks; the sun's sines and
 * cosines come with the sun path (within a few ulps of Math.sin / Math.cos of its columns), those of
 * γ = surface azimuth − sun azimuth by the difference formulas. Leaves sin γ, cos γ and cos θ in the
 * scratch columns for the later passes.
 * @param from - first row (when no list)
 * @param n - row after the last (when no list)
 * @param list - the hours to consider, in order, instead of the range (the daylight hours of a summary)
 * @param sun - the sun's sines and cosines by hour
 * @param cosTilt - cos Σ
 * @param sinTilt - sin Σ
 * @param cosSurf - cos of the surface azimuth
 * @param sinSurf - sin of the surface azimuth
 * @param incidence - filled with θ [°], 0…180
 * @param profileAngle - filled with Ω [°] (180, not −180, for the sun straight behind)
 * @param summaryOnly - for a summary: the incidence only (180° behind the plane), no profile angle
 */
function hourlyAngles(
  from: number,
  n: number,
  list: Int32Array | undefined,
  sun: SunColumns,
  cosTilt: number,
  sinTilt: number,
  cosSurf: number,
  sinSurf: number,
  incidence: Float64Array,
  profileAngle: Float64Array,
  summaryOnly: boolean,
): void {
  const { sinAltitude: sinAlt, cosAltitude: cosAlt, sinAzimuth: sinAz, cosAzimuth: cosAz } = sun;
  const sinG = SIN_GAMMA_SCRATCH;
  const cosG = COS_GAMMA_SCRATCH;
  const cosT = COS_THETA_SCRATCH;
  const deg = DEG;
  const count = list ? list.length : n;
  for (let k = list ? 0 : from; k < count; k++) {
    const i = list ? list[k] : k;
    const sinBeta = sinAlt[i];
    const cosBeta = cosAlt[i];
    const sinA = sinAz[i];
    const cosA = cosAz[i];
    const sinGamma = sinSurf * cosA - cosSurf * sinA;
    const cosGamma = cosSurf * cosA + sinSurf * sinA;
    const cosTheta = sinBeta * cosTilt + cosBeta * sinTilt * cosGamma; // D&B Eq. 1.6.3
    sinG[i] = sinGamma;
    cosG[i] = cosGamma;
    cosT[i] = cosTheta;
    if (summaryOnly) {
      // A summary reads no profile angle, and the incidence only as "in front of the plane or not".
      incidence[i] = cosTheta < 0 ? 180 : acosClamped(cosTheta) * deg;
      continue;
    }
    incidence[i] = acosClamped(cosTheta) * deg;
    const omega = atan2(sinBeta, cosBeta * cosGamma) * deg; // D&B Eq. 1.9.1a
    profileAngle[i] = omega === -180 ? 180 : omega;
  }
}

/**
 * Pass 2 of {@link annualOfPrepared}: sunlit fraction and beam SHGC for the hours with the sun up and
 * in front of the window (θ < 90°); other rows stay 0 (no shadow work with the sun down or behind
 * the wall). Geometry for every such row, missing weather or not: the hours are gathered first and
 * their sunlit fractions worked out in one call ({@link PreparedShading.sunlitOfRows}), so that no
 * number goes through a call per hour. Leaves the count of those hours and the sum of their sunlit
 * fractions (in the order of the hours) in {@link SHADING_TOTALS}.
 * @param from - first row (when no list)
 * @param n - row after the last (when no list)
 * @param list - the hours to consider, in order, instead of the range (the daylight hours of a year)
 * @param shade - the prepared shading of a vertical window, or undefined (sunlit fraction 1)
 * @param curve - the glazing's SHGC curve
 * @param surfAz - surface azimuth [°]
 * @param sun - the sun's altitude and azimuth [°] and their sines and cosines by hour
 * @param incidence - θ [°] from pass 1
 * @param sunlitFraction - filled with the sunlit fraction, 0…1
 * @param shgc - filled with SHGC(θ)
 */
function hourlyShading(
  from: number,
  n: number,
  list: Int32Array | undefined,
  shade: PreparedShading | undefined,
  curve: ShgcCurve,
  surfAz: number,
  sun: SunColumns,
  incidence: Float64Array,
  sunlitFraction: Float64Array,
  shgc: Float64Array,
): void {
  const { altitude: alt, azimuth: az } = sun;
  const gammaColumn = GAMMA_SCRATCH;
  const front = FRONT_SCRATCH;
  const count = list ? list.length : n;
  // The hours with the sun up and in front of the plane: their γ and SHGC here, their sunlit
  // fractions all at once below (no call per hour).
  let m = 0;
  for (let k = list ? 0 : from; k < count; k++) {
    const i = list ? list[k] : k;
    const a = alt[i];
    const theta = incidence[i];
    if (!(a > 0 && theta < 90)) {
      sunlitFraction[i] = 0; // (so the columns start; written for the scratch series of a summary)
      shgc[i] = 0;
      continue;
    }
    gammaColumn[i] = wrap180(surfAz - az[i]); // horizontal shadow angle (src/core/shading/sunlit.ts convention)
    shgc[i] = curve.atAngle(theta);
    front[m++] = i;
  }
  if (shade !== undefined) {
    const wallFrame = { altitude: alt, azimuth: az, sinAltitude: sun.sinAltitude, cosAltitude: sun.cosAltitude, gamma: gammaColumn, sinGamma: SIN_GAMMA_SCRATCH, cosGamma: COS_GAMMA_SCRATCH };
    shade.sunlitOfRows(front, m, wallFrame, sunlitFraction);
  } else for (let k = 0; k < m; k++) sunlitFraction[front[k]] = 1;
  let sunlitSum = 0;
  for (let k = 0; k < m; k++) sunlitSum += sunlitFraction[front[k]];
  SHADING_TOTALS.hours = m;
  SHADING_TOTALS.sunlitSum = sunlitSum;
}

/**
 * What the last {@link hourlyShading} added up over the hours it considered with the sun up and in
 * front of the plane: their number and their sunlit fractions, in the order of the hours (a
 * summary's sun-on-wall hours and mean sunlit fraction).
 */
const SHADING_TOTALS = { hours: 0, sunlitSum: 0 };

/**
 * Pass 3 of {@link annualOfPrepared}: irradiance on the plane and gain for the hours with weather
 * and light; missing and dark rows stay 0. The hours are gathered first and their irradiance worked
 * out in one call ({@link PreparedPlane.irradianceRows}, straight into the series' columns), so that
 * no number goes through a call per hour.
 * @param from - first row (when no list)
 * @param n - row after the last (when no list)
 * @param list - the hours to consider, in order, instead of the range (the lit hours of a year)
 * @param plane - the prepared plane
 * @param brightness - a shared year's Perez brightness coefficients by hour, when the plane may use them
 * @param kb - area × beam interior attenuation [m²]
 * @param kd - area × diffuse interior attenuation [m²]
 * @param frb - radiant fraction of the beam gain [-]
 * @param frd - radiant fraction of the diffuse gain [-]
 * @param shgcDiffuse - diffuse SHGC [-]
 * @param circumsolarFixed - the multiplier on the circumsolar part in the beam-only treatment, or −1:
 *   the hour's sunlit fraction ({@link circumsolarShade})
 * @param sun - the sun's altitude [°] and its sine by hour
 * @param out - the series: reads dni, dhi, missing, sunlitFraction, shgc; fills beam, sky, ground, their unshaded columns, gain (and its beam and diffuse parts), radiant, convective
 * @param summaryOnly - leave out the gain's radiant/convective and beam/diffuse columns (a summary reads none of them)
 */
function hourlyGain(
  from: number,
  n: number,
  list: Int32Array | undefined,
  plane: PreparedPlane,
  brightness: PerezBrightnessColumns | undefined,
  kb: number,
  kd: number,
  frb: number,
  frd: number,
  shgcDiffuse: number,
  circumsolarFixed: number,
  sun: SunColumns,
  out: AnnualSeries,
  summaryOnly: boolean,
): void {
  const { dni: dniColumn, dhi: dhiColumn, missing, sunlitFraction, shgc, beam, sky, ground, gain, radiant, convective, gainBeam, gainDiffuse } = out;
  const alt = sun.altitude;
  // The hours with weather and light, gathered; their irradiance worked out in one call (no number
  // through a call per hour), then their gain.
  const rows = LIT_SCRATCH;
  let m = 0;
  const count = list ? list.length : n;
  for (let k = list ? 0 : from; k < count; k++) {
    const i = list ? list[k] : k;
    if (missing[i] === 1) continue;
    if (dhiColumn[i] === 0 && (dniColumn[i] === 0 || !(alt[i] > 0))) continue; // dark hour: irradiance and gain stay 0
    rows[m++] = i;
  }
  plane.irradianceRows(rows, m, planeRowsOf(sun, dniColumn, dhiColumn, sunlitFraction, circumsolarFixed, out), brightness);
  for (let k = 0; k < m; k++) {
    const i = rows[k];
    // Gain equation of src/core/gain/windowGain.ts windowGainParts, inlined for the hourly path.
    const qb = kb * beam[i] * sunlitFraction[i] * shgc[i];
    const qd = kd * (sky[i] + ground[i]) * shgcDiffuse;
    const q = qb + qd;
    gain[i] = q;
    if (summaryOnly) continue; // a summary reads none of the parts below
    const r = frb * qb + frd * qd;
    gainBeam[i] = qb;
    gainDiffuse[i] = qd;
    radiant[i] = r;
    convective[i] = q - r;
  }
}

/**
 * Pass 3 of {@link yearTotalsOfShared}: irradiance on the plane and gain for the lit hours of a
 * shared year (weather and light, none missing), added into the summary totals as they are worked
 * out instead of written to columns. The same arithmetic as {@link hourlyGain} and the same sums,
 * in the same order, as src/core/gain/annualSummary.ts adds up from the columns.
 * @param list - the lit hours of the shared year, in order
 * @param plane - the prepared plane
 * @param brightness - the shared year's Perez brightness coefficients, when the plane uses them
 * @param kb - area × beam interior attenuation [m²]
 * @param kd - area × diffuse interior attenuation [m²]
 * @param shgcDiffuse - diffuse SHGC [-]
 * @param circumsolarFixed - as {@link hourlyGain}
 * @param sy - the shared year (sun and weather)
 * @param sunlitFraction - sunlit fraction by hour (pass 2; 0 with the sun down)
 * @param shgc - SHGC(θ) by hour (pass 2; 0 with the sun down)
 * @param months - month (1…12) of each day of the year
 * @param totals - the totals to add into
 */
function hourlyGainTotals(
  list: Int32Array,
  plane: PreparedPlane,
  brightness: PerezBrightnessColumns | undefined,
  kb: number,
  kd: number,
  shgcDiffuse: number,
  circumsolarFixed: number,
  sy: SharedYear,
  sunlitFraction: Float64Array,
  shgc: Float64Array,
  months: Uint8Array,
  totals: YearTotals,
): void {
  const scratch = yearScratch(sy.hours);
  plane.irradianceRows(list, list.length, planeRowsOf(sy, sy.dni, sy.dhi, sunlitFraction, circumsolarFixed, scratch), brightness);
  const { beam, sky, ground, skyUnshaded, groundUnshaded } = scratch;
  const monthlyWh = totals.monthlyWh;
  let peakW = totals.peakW;
  let peakIndex = totals.peakIndex;
  let sunlitHours = totals.sunlitHours;
  let beamKept = totals.beamKept;
  let beamAll = totals.beamAll;
  let diffuseKept = totals.diffuseKept;
  let diffuseAll = totals.diffuseAll;
  for (let k = 0; k < list.length; k++) {
    const i = list[k];
    const lit = sunlitFraction[i];
    // Gain equation of src/core/gain/windowGain.ts windowGainParts, as in hourlyGain.
    const bm = beam[i];
    const s = shgc[i];
    const d = sky[i] + ground[i];
    const q = kb * bm * lit * s + kd * d * shgcDiffuse;
    monthlyWh[months[(i / 24) | 0] - 1] += q;
    if (q > peakW) {
      peakW = q;
      peakIndex = i;
    }
    if (bm > 0 && lit > 0) sunlitHours++;
    const b = bm * s;
    beamAll += b;
    beamKept += b * lit;
    diffuseKept += d;
    diffuseAll += skyUnshaded[i] + groundUnshaded[i];
  }
  totals.peakW = peakW;
  totals.peakIndex = peakIndex;
  totals.sunlitHours = sunlitHours;
  totals.beamKept = beamKept;
  totals.beamAll = beamAll;
  totals.diffuseKept = diffuseKept;
  totals.diffuseAll = diffuseAll;
}
