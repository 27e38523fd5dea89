/**
 * Validation of a {@link WindowSpec}: every field checked, errors naming the field by its path
 * (`glazing.shgc`, `shading.overhang.projection`, `weather.dni`, `site.latitude` ...), and the
 * defaults of the optional fields in one place.
 */
import { MONTHLY_LIST_RULE, SunpaneError, requireRange } from '../common';
import { LINKE_MAX, LINKE_MIN, TAU_B_MAX, TAU_D_MAX, type SkyModel } from '../sky';
import { fitYearOfHours, requireDaylightSaving, requireTimeConvention, requireYear } from '../time';
import { glazingTypeOf, interiorAttenuationsOf, requireAngleTable, requireTypeParameter, shgcBasisOf, type Glazing } from '../glazing';
import { PATH_SHADING_NAMES, requireShading, requireVerticalForShading, type Shading } from '../shading';
import type { Site } from '../sun';
import type { DiffuseShading, Weather, WindowSpec } from './window';
import { DAILY_RANGE_MAX, DRY_BULB_MAX, DRY_BULB_MIN } from './outdoorTemperature';

const { isFinite: numberIsFinite } = Number;

/**
 * Default radiant fraction of the window gain: 1, all transmitted solar gain treated as radiant
 * (reaching the floor and furnishings before the air), the usual treatment of unshaded glazing in
 * the radiant time series method (Spitler, Fisher & Pedersen 1997 — from memory; set
 * `glazing.radiantFraction` when the room or an interior shade calls for another split).
 */
export const DEFAULT_RADIANT_FRACTION = 1;
/**
 * Default radiant fraction of the conduction gain through glazing: 0.46 (from memory: the
 * fundamentals handbook's load-calculation chapter, radiative/convective split for fenestration
 * conduction). Set `glazing.radiantFractionConduction` to use another.
 */
export const DEFAULT_CONDUCTION_RADIANT_FRACTION = 0.46;
/** Largest U-value accepted [W/(m²·K)] (single glazing is about 6). */
export const U_VALUE_MAX = 10;
/** Range of indoor temperature accepted [°C]. */
export const INDOOR_TEMPERATURE_MIN = -20;
export const INDOOR_TEMPERATURE_MAX = 50;
/** Largest window dimension and shading length accepted [m]. */
export const MAX_LENGTH = 100;
/**
 * Smallest window width or height accepted [m]: 1 cm. Smaller sizes have no physical meaning for a
 * window and make the shadow arithmetic underflow (a 1e-200 m window), so they are refused by name.
 */
export const MIN_WINDOW_SIZE = 0.01;
/** Largest irradiance value accepted in a weather series [W/m²] (above any solar constant estimate). */
export const MAX_IRRADIANCE = 2000;

const SKY_MODELS: readonly SkyModel[] = ['isotropic', 'hayDavies', 'perez1990', 'ashraeClearDay'];
const DIFFUSE_SHADINGS: readonly DiffuseShading[] = ['viewFactors', 'beamOnly'];
const WEATHER_KINDS: readonly Weather['kind'][] = ['ashraeClearSky', 'ineichenClearSky', 'measured', 'globalHorizontal'];

function requireObject(path: string, value: unknown): Record<string, unknown> {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) throw new SunpaneError(path, value, 'must be given (an object)');
  return value as Record<string, unknown>;
}

function optionalRange(path: string, value: unknown, min: number | undefined, max: number | undefined, unit?: string, options?: { exclusiveMin?: boolean; integer?: boolean }): void {
  if (value !== undefined) requireRange(path, value, min, max, unit, options);
}

function validateSite(site: Site): void {
  requireObject('site', site);
  requireRange('site.latitude', site.latitude, -90, 90, '°');
  requireRange('site.longitude', site.longitude, -180, 180, '°');
  requireRange('site.utcOffset', site.utcOffset, -12, 14, 'h');
  optionalRange('site.elevation', site.elevation, -500, 9000, 'm');
  optionalRange('site.pressure', site.pressure, 0, 1200, 'hPa', { exclusiveMin: true });
  optionalRange('site.temperature', site.temperature, -90, 60, '°C');
  if (site.daylightSaving !== undefined) requireDaylightSaving(site.daylightSaving, 'site.daylightSaving');
}

function validateGlazing(glazing: Glazing): void {
  requireObject('glazing', glazing);
  requireRange('glazing.shgc', glazing.shgc, 0, 1);
  requireRange('glazing.panes', glazing.panes, 1, 4, undefined, { integer: true });
  const type = glazingTypeOf(glazing);
  if (type === 'coated') requireTypeParameter(glazing.typeParameter, 'glazing.typeParameter');
  if (type === 'table' && glazing.angleTable === undefined) throw new SunpaneError('glazing.angleTable', undefined, 'must be given for glazing type "table": a table of angles and SHGC values');
  if (type !== 'table' && glazing.angleTable !== undefined) throw new SunpaneError('glazing.type', type, 'must be "table" (or left out) when an angle table is given: the table would otherwise be ignored');
  shgcBasisOf(glazing);
  interiorAttenuationsOf(glazing);
  optionalRange('glazing.radiantFraction', glazing.radiantFraction, 0, 1);
  optionalRange('glazing.radiantFractionBeam', glazing.radiantFractionBeam, 0, 1);
  optionalRange('glazing.radiantFractionDiffuse', glazing.radiantFractionDiffuse, 0, 1);
  optionalRange('glazing.radiantFractionConduction', glazing.radiantFractionConduction, 0, 1);
  optionalRange('glazing.uValue', glazing.uValue, 0, U_VALUE_MAX, 'W/(m²·K)');
  if (glazing.angleTable !== undefined) requireAngleTable(glazing.angleTable, 'glazing.angleTable');
}

function validateShading(shading: Shading, width: number, height: number, surfaceTilt: number): void {
  requireShading({ width, height }, shading, PATH_SHADING_NAMES, { max: MAX_LENGTH, unit: 'm' });
  requireVerticalForShading(surfaceTilt, shading);
}

function validateMonthly(path: string, values: unknown, min: number, max: number, exclusiveMin: boolean, unit?: string): void {
  if (!Array.isArray(values) || (values.length !== 1 && values.length !== 12)) {
    throw new SunpaneError(path, values, MONTHLY_LIST_RULE);
  }
  for (let i = 0; i < values.length; i++) requireRange(`${path}[${i}]`, values[i], min, max, unit, { exclusiveMin });
}

function validateSeries(path: string, values: unknown, year: number, min = 0, max = MAX_IRRADIANCE, unit = 'W/m²'): number {
  const ok = Array.isArray(values) || values instanceof Float64Array || values instanceof Float32Array;
  if (!ok) throw new SunpaneError(path, values, 'must be a list of hourly values');
  const v = values as ArrayLike<number>;
  // 8760 or 8784 rows: fitted to the year by date (the rule is reported with the results).
  fitYearOfHours(v.length, year, path);
  for (let i = 0; i < v.length; i++) {
    const x = v[i];
    if (typeof x !== 'number') throw new SunpaneError(`${path}[${i}]`, x, `must be a number from ${min} to ${max} ${unit}, or NaN for a missing hour`);
    // Non-finite values mark missing hours (documented); finite ones must be physical.
    if (numberIsFinite(x) && (x < min || x > max)) {
      throw new SunpaneError(`${path}[${i}]`, x, `must be a number from ${min} to ${max} ${unit}, or NaN for a missing hour`);
    }
  }
  return v.length;
}

function validateWeather(weather: Weather, year: number): void {
  const w = requireObject('weather', weather);
  const kind = w.kind as Weather['kind'];
  if (!WEATHER_KINDS.includes(kind)) throw new SunpaneError('weather.kind', w.kind, `must be one of ${WEATHER_KINDS.map((k) => `"${k}"`).join(', ')}`);
  switch (weather.kind) {
    case 'ashraeClearSky':
      validateMonthly('weather.tauB', weather.tauB, 0, TAU_B_MAX, true);
      validateMonthly('weather.tauD', weather.tauD, 0, TAU_D_MAX, true);
      // Each list holds 1 or 12 values, so any pair goes together: one value stands for every month
      // (monthlyValue), and one beside twelve is read month by month.
      validateDesignTemperatures(weather);
      break;
    case 'ineichenClearSky':
      validateMonthly('weather.linkeTurbidity', weather.linkeTurbidity, LINKE_MIN, LINKE_MAX, false);
      validateDesignTemperatures(weather);
      break;
    case 'measured': {
      const n = validateSeries('weather.dni', weather.dni, year);
      if (validateSeries('weather.dhi', weather.dhi, year) !== n) throw new SunpaneError('weather.dhi', `${(weather.dhi as ArrayLike<number>).length} rows`, `must hold as many rows as weather.dni (${n})`);
      validateDryBulbSeries(weather.dryBulb, n, year);
      break;
    }
    case 'globalHorizontal':
      validateDryBulbSeries(weather.dryBulb, validateSeries('weather.ghi', weather.ghi, year), year);
      break;
  }
}

function validateDryBulbSeries(values: unknown, rows: number, year: number): void {
  if (values === undefined) return;
  if (validateSeries('weather.dryBulb', values, year, DRY_BULB_MIN, DRY_BULB_MAX, '°C') !== rows) {
    throw new SunpaneError('weather.dryBulb', `${(values as ArrayLike<number>).length} rows`, `must hold as many rows as the irradiance series (${rows})`);
  }
}

function validateDesignTemperatures(weather: { dryBulbMax?: number[]; dailyRange?: number[] }): void {
  if (weather.dryBulbMax !== undefined) validateMonthly('weather.dryBulbMax', weather.dryBulbMax, DRY_BULB_MIN, DRY_BULB_MAX, false, '°C');
  if (weather.dailyRange !== undefined) validateMonthly('weather.dailyRange', weather.dailyRange, 0, DAILY_RANGE_MAX, false, 'K');
  if ((weather.dryBulbMax === undefined) !== (weather.dailyRange === undefined)) {
    const missing = weather.dryBulbMax === undefined ? 'weather.dryBulbMax' : 'weather.dailyRange';
    throw new SunpaneError(missing, undefined, 'must be given with the other: the design-day dry-bulb needs its highest value and its daily range');
  }
}

/** Where a window's outdoor dry-bulb comes from, or undefined when it has none. */
export function outdoorTemperatureSource(weather: Weather): 'series' | 'designDay' | undefined {
  if (weather.kind === 'measured' || weather.kind === 'globalHorizontal') return weather.dryBulb !== undefined ? 'series' : undefined;
  return weather.dryBulbMax !== undefined ? 'designDay' : undefined;
}

/**
 * Checks every field of a window description.
 * @param spec - the window, its site, glazing, shading, ground, sky model, weather and year
 * @returns the same spec (for chaining)
 * @throws SunpaneError naming the first bad field by its path, e.g. `glazing.shgc`,
 *   `shading.overhang.projection`, `weather.dni` (wrong length) or `weather.dni[17]` (bad value).
 *   Shading devices or a skyline on a window whose tilt is not 90° are refused naming `surfaceTilt`.
 *   A non-finite value in a measured series is not an error: it marks that hour as missing.
 */
export function validateWindowSpec(spec: WindowSpec): WindowSpec {
  requireObject('spec', spec);
  if (typeof spec.name !== 'string') throw new SunpaneError('name', spec.name, 'must be a text');
  validateSite(spec.site);
  requireRange('surfaceAzimuth', spec.surfaceAzimuth, 0, 360, '°');
  requireRange('surfaceTilt', spec.surfaceTilt, 0, 180, '°');
  requireRange('width', spec.width, MIN_WINDOW_SIZE, MAX_LENGTH, 'm');
  requireRange('height', spec.height, MIN_WINDOW_SIZE, MAX_LENGTH, 'm');
  requireRange('frameFraction', spec.frameFraction, 0, 1, undefined, { exclusiveMax: true });
  validateGlazing(spec.glazing);
  validateShading(spec.shading, spec.width, spec.height, spec.surfaceTilt);
  requireRange('groundAlbedo', spec.groundAlbedo, 0, 1);
  if (spec.diffuseShading !== undefined && !DIFFUSE_SHADINGS.includes(spec.diffuseShading)) {
    throw new SunpaneError('diffuseShading', spec.diffuseShading, `must be one of ${DIFFUSE_SHADINGS.map((m) => `"${m}"`).join(', ')} (default "viewFactors")`);
  }
  if (spec.skyModel !== undefined && !SKY_MODELS.includes(spec.skyModel)) throw new SunpaneError('skyModel', spec.skyModel, `must be one of ${SKY_MODELS.map((m) => `"${m}"`).join(', ')}`);
  const year = requireYear(spec.year, 'year');
  validateWeather(spec.weather, year);
  optionalRange('indoorTemperature', spec.indoorTemperature, INDOOR_TEMPERATURE_MIN, INDOOR_TEMPERATURE_MAX, '°C');
  if (spec.glazing.uValue !== undefined) {
    if (spec.indoorTemperature === undefined) throw new SunpaneError('indoorTemperature', undefined, `must be given with glazing.uValue: the conduction gain needs the indoor temperature, from ${INDOOR_TEMPERATURE_MIN} to ${INDOOR_TEMPERATURE_MAX} °C`);
    if (outdoorTemperatureSource(spec.weather) === undefined) {
      const field = spec.weather.kind === 'measured' || spec.weather.kind === 'globalHorizontal' ? 'weather.dryBulb' : 'weather.dryBulbMax';
      throw new SunpaneError(field, undefined, 'must be given with glazing.uValue: the conduction gain needs the outdoor dry-bulb (an hourly series, or on clear design days the highest dry-bulb and the daily range)');
    }
  }
  requireTimeConvention(spec.timeConvention);
  return spec;
}

/** The sky model of a window: as given, else `ashraeClearDay` on τb/τd clear skies and `perez1990` otherwise. */
export function skyModelOf(spec: WindowSpec): SkyModel {
  return spec.skyModel ?? (spec.weather.kind === 'ashraeClearSky' ? 'ashraeClearDay' : 'perez1990');
}

/** The radiant fraction of a glazing's gain, default applied. */
export function radiantFractionOf(glazing: Glazing): number {
  return glazing.radiantFraction ?? DEFAULT_RADIANT_FRACTION;
}

/** Radiant fractions of the beam, diffuse and conduction gains, defaults applied. */
export function radiantFractionsOf(glazing: Glazing): { beam: number; diffuse: number; conduction: number } {
  const both = radiantFractionOf(glazing);
  return { beam: glazing.radiantFractionBeam ?? both, diffuse: glazing.radiantFractionDiffuse ?? both, conduction: glazing.radiantFractionConduction ?? DEFAULT_CONDUCTION_RADIANT_FRACTION };
}
