/**
 * Validation of a {@link WindowSpec}: every field checked, errors naming the field by its path
 * (`glazing.shgc`, `shading.overhang.projection`, `weather.dni`, `site.latitude` ...), and the
 * defaults of the optional fields in one place.
 */
import { SunpaneError, requireRange } from '../common';
import { LINKE_MAX, LINKE_MIN, TAU_B_MAX, TAU_D_MAX, type SkyModel } from '../sky';
import { hoursInYear, requireYear } from '../time';
import { requireAngleTable, type Glazing } from '../glazing';
import { PATH_SHADING_NAMES, requireShading, requireVerticalForShading, type Shading } from '../shading';
import type { Site } from '../sun';
import type { Weather, WindowSpec } from './window';

/**
 * Default radiant fraction of the window gain: 1, all transmitted solar gain treated as radiant
 * (reaching the floor and furnishings before the air), the usual treatment of unshaded glazing in
 * the radiant time series method (Spitler, Fisher & Pedersen 1997 — from memory; set
 * `glazing.radiantFraction` when the room or an interior shade calls for another split).
 */
export const DEFAULT_RADIANT_FRACTION = 1;
/** Largest window dimension and shading length accepted [m]. */
export const MAX_LENGTH = 1000;
/** Largest irradiance value accepted in a weather series [W/m²] (above any solar constant estimate). */
export const MAX_IRRADIANCE = 2000;

const SKY_MODELS: readonly SkyModel[] = ['isotropic', 'hayDavies', 'perez1990'];
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
}

function validateGlazing(glazing: Glazing): void {
  requireObject('glazing', glazing);
  requireRange('glazing.shgc', glazing.shgc, 0, 1);
  requireRange('glazing.panes', glazing.panes, 1, 4, undefined, { integer: true });
  optionalRange('glazing.interiorAttenuation', glazing.interiorAttenuation, 0, 1);
  optionalRange('glazing.radiantFraction', glazing.radiantFraction, 0, 1);
  if (glazing.angleTable !== undefined) requireAngleTable(glazing.angleTable, 'glazing.angleTable');
}

function validateShading(shading: Shading, width: number, height: number, surfaceTilt: number): void {
  requireShading({ width, height }, shading, PATH_SHADING_NAMES, { max: MAX_LENGTH, unit: 'm' });
  requireVerticalForShading(surfaceTilt, shading);
}

function validateMonthly(path: string, values: unknown, min: number, max: number, exclusiveMin: boolean): void {
  if (!Array.isArray(values) || (values.length !== 1 && values.length !== 12)) {
    throw new SunpaneError(path, values, 'must be a list of 12 monthly values (January first) or of one value for the whole year');
  }
  for (let i = 0; i < values.length; i++) requireRange(`${path}[${i}]`, values[i], min, max, undefined, { exclusiveMin });
}

function validateSeries(path: string, values: unknown, hours: number, year: number): void {
  const ok = Array.isArray(values) || values instanceof Float64Array || values instanceof Float32Array;
  if (!ok) throw new SunpaneError(path, values, `must be a list of ${hours} hourly values`);
  const v = values as ArrayLike<number>;
  if (v.length !== hours) {
    throw new SunpaneError(path, Array.from(v), `must hold one value per hour of ${year}: ${hours} values`);
  }
  for (let i = 0; i < hours; i++) {
    const x = v[i];
    if (typeof x !== 'number') throw new SunpaneError(`${path}[${i}]`, x, `must be a number from 0 to ${MAX_IRRADIANCE} W/m², or NaN for a missing hour`);
    // Non-finite values mark missing hours (documented); finite ones must be physical.
    if (Number.isFinite(x) && (x < 0 || x > MAX_IRRADIANCE)) {
      throw new SunpaneError(`${path}[${i}]`, x, `must be a number from 0 to ${MAX_IRRADIANCE} W/m², or NaN for a missing hour`);
    }
  }
}

function validateWeather(weather: Weather, year: number): void {
  const w = requireObject('weather', weather);
  const kind = w.kind as Weather['kind'];
  if (!WEATHER_KINDS.includes(kind)) throw new SunpaneError('weather.kind', w.kind, `must be one of ${WEATHER_KINDS.map((k) => `"${k}"`).join(', ')}`);
  const hours = hoursInYear(year);
  switch (weather.kind) {
    case 'ashraeClearSky':
      validateMonthly('weather.tauB', weather.tauB, 0, TAU_B_MAX, true);
      validateMonthly('weather.tauD', weather.tauD, 0, TAU_D_MAX, true);
      if (weather.tauB.length !== weather.tauD.length) throw new SunpaneError('weather.tauD', weather.tauD, `must hold as many values as weather.tauB (${weather.tauB.length})`);
      break;
    case 'ineichenClearSky':
      validateMonthly('weather.linkeTurbidity', weather.linkeTurbidity, LINKE_MIN, LINKE_MAX, false);
      break;
    case 'measured':
      validateSeries('weather.dni', weather.dni, hours, year);
      validateSeries('weather.dhi', weather.dhi, hours, year);
      break;
    case 'globalHorizontal':
      validateSeries('weather.ghi', weather.ghi, hours, year);
      break;
  }
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
  requireRange('width', spec.width, 0, MAX_LENGTH, 'm', { exclusiveMin: true });
  requireRange('height', spec.height, 0, MAX_LENGTH, 'm', { exclusiveMin: true });
  requireRange('frameFraction', spec.frameFraction, 0, 1, undefined, { exclusiveMax: true });
  validateGlazing(spec.glazing);
  validateShading(spec.shading, spec.width, spec.height, spec.surfaceTilt);
  requireRange('groundAlbedo', spec.groundAlbedo, 0, 1);
  if (!SKY_MODELS.includes(spec.skyModel)) throw new SunpaneError('skyModel', spec.skyModel, `must be one of ${SKY_MODELS.map((m) => `"${m}"`).join(', ')}`);
  const year = requireYear(spec.year, 'year');
  validateWeather(spec.weather, year);
  return spec;
}

/** The radiant fraction of a glazing's gain, default applied. */
export function radiantFractionOf(glazing: Glazing): number {
  return glazing.radiantFraction ?? DEFAULT_RADIANT_FRACTION;
}
