/**
 * A window made ready for hourly work: validated once, with everything that does not change from
 * hour to hour worked out (SHGC curve, areas, view factors and the diffuse multipliers, interior
 * attenuations, radiant fractions, conductance, sky model, sun options, the year's start and
 * length, the row map of a supplied series, the time convention), and the weather of an hour taken
 * from the window's weather description.
 */
import { RAD, SunpaneError } from '../common';
import { glassArea as glassAreaOf, interiorAttenuationsOf, shgcBasisOf, shgcCurve, type ShgcCurve, solarArea } from '../glazing';
import { BARE_VIEW_FACTORS, hasShading, skylineSkyViewFactor, type WindowViewFactors, windowViewFactors } from '../shading';
import { ashraeClearSky, decomposeErbs, extraterrestrialSpencer, ineichenPerezClearSky, isPossibleGlobal, isPossibleIrradiance, type SkyModel } from '../sky';
import type { SunOptions } from '../sun';
import { civilToSerial, DEFAULT_TIME_CONVENTION, fitYearOfHours, hoursInYear, rowOfSerial, type TimeConvention, type YearFit } from '../time';
import { fractionOfDailyRange } from './outdoorTemperature';
import { outdoorTemperatureSource, radiantFractionsOf, skyModelOf, validateWindowSpec } from './windowSpec';
import type { Weather, WindowSpec } from './window';

const { abs, cos, floor, min, round, sin } = Math;
const { isFinite: numberIsFinite } = Number;
const NAN = Number.NaN;

/** Direct normal and diffuse horizontal irradiance of one hour [W/m²]. */
export interface WeatherHour {
  dni: number;
  dhi: number;
}

/** A validated window with everything that does not change from hour to hour worked out once. */
export interface PreparedWindow {
  spec: WindowSpec;
  curve: ShgcCurve;
  glassArea: number;
  /** Area the SHGC applies to [m²] (glass area, or the rough opening for a whole-window SHGC). */
  solarArea: number;
  /** What the glass sees of the open sky, ground and horizon band (the bare window's when nothing shades). */
  viewFactors: WindowViewFactors;
  /** True for the earlier beam-only treatment of diffuse light ({@link WindowSpec.diffuseShading}). */
  beamOnly: boolean;
  /** The constant multipliers on the isotropic sky, the horizon band and the ground. */
  shade: { isotropic: number; horizon: number; ground: number };
  /** Beam-only treatment: the skyline's sky view, which then multiplies the circumsolar part too. */
  skylineSky: number;
  /** Interior attenuation of the beam [-] (the historical single coefficient). */
  interiorAttenuation: number;
  interiorAttenuationDiffuse: number;
  /** True when an interior shade is present (either attenuation below 1): the beam then goes to the non-solar radiant time series. */
  interiorShade: boolean;
  /** Radiant share of the beam gain [-]. */
  radiantFraction: number;
  radiantFractionDiffuse: number;
  radiantFractionConduction: number;
  /** U · rough-opening area [W/K], 0 without a U-value. */
  conductance: number;
  /** The sky model after defaults (`ashraeClearDay` on τb/τd clear skies unless given). */
  skyModel: SkyModel;
  /** Row map of a supplied series to the year (undefined for clear skies). */
  yearFit?: YearFit;
  vertical: boolean;
  shaded: boolean;
  sunOptions: SunOptions;
  /** Serial of 1 January 00:00 of spec.year. */
  yearStart: number;
  hours: number;
  /** How the window's date-times and hourly rows are read (default `hourEnding`). */
  convention: TimeConvention;
}

/** Validates a window and works out its hour-independent quantities. */
export function prepareWindow(spec: WindowSpec): PreparedWindow {
  validateWindowSpec(spec);
  const { site } = spec;
  const sunOptions: SunOptions = {};
  if (site.elevation !== undefined) sunOptions.elevation = site.elevation;
  if (site.pressure !== undefined) sunOptions.pressure = site.pressure;
  if (site.temperature !== undefined) sunOptions.temperature = site.temperature;
  const skyline = spec.shading.skyline;
  const iac = interiorAttenuationsOf(spec.glazing);
  const fr = radiantFractionsOf(spec.glazing);
  const w = spec.weather;
  const series = w.kind === 'measured' ? w.dni : w.kind === 'globalHorizontal' ? w.ghi : undefined;
  const vertical = spec.surfaceTilt === 90;
  // Per window, never per hour (devices are refused on tilted windows, so a tilted one is bare).
  const viewFactors = vertical ? windowViewFactors({ width: spec.width, height: spec.height }, spec.shading, spec.surfaceAzimuth) : { ...BARE_VIEW_FACTORS };
  const beamOnly = spec.diffuseShading === 'beamOnly';
  const skylineSky = skyline !== undefined ? skylineSkyViewFactor(skyline, spec.surfaceAzimuth) : 1;
  return {
    spec,
    curve: shgcCurve(spec.glazing),
    glassArea: glassAreaOf(spec.width, spec.height, spec.frameFraction),
    solarArea: solarArea(spec.width, spec.height, spec.frameFraction, shgcBasisOf(spec.glazing)),
    viewFactors,
    beamOnly,
    shade: beamOnly ? { isotropic: skylineSky, horizon: skylineSky, ground: 1 } : { isotropic: viewFactors.skyRatio, horizon: viewFactors.horizonShare, ground: viewFactors.groundRatio },
    skylineSky,
    interiorAttenuation: iac.beam,
    interiorAttenuationDiffuse: iac.diffuse,
    interiorShade: iac.shaded,
    radiantFraction: fr.beam,
    radiantFractionDiffuse: fr.diffuse,
    radiantFractionConduction: fr.conduction,
    conductance: (spec.glazing.uValue ?? 0) * spec.width * spec.height,
    skyModel: skyModelOf(spec),
    yearFit: series !== undefined ? fitYearOfHours(series.length, spec.year, w.kind === 'measured' ? 'weather.dni' : 'weather.ghi') : undefined,
    vertical,
    shaded: hasShading(spec.shading),
    sunOptions,
    yearStart: civilToSerial(spec.year, 1, 1),
    hours: hoursInYear(spec.year),
    convention: spec.timeConvention ?? DEFAULT_TIME_CONVENTION,
  };
}

/**
 * The multiplier on the circumsolar part of the sky diffuse for an hour: the beam's sunlit fraction
 * (the circumsolar light comes from the sun's direction, so what shades the sun shades it), or, in
 * the beam-only treatment, the skyline's sky view as before.
 */
export function circumsolarShade(w: PreparedWindow, sunlit: number): number {
  return w.beamOnly ? w.skylineSky : sunlit;
}

/** Value of a 12-monthly or single-value list for a month 1…12. */
export function monthlyValue(values: readonly number[], month: number): number {
  return values.length === 12 ? values[month - 1] : values[0];
}

/** Words describing a weather source, for the explanation. */
export function weatherSourceText(weather: Weather, month: number): string {
  switch (weather.kind) {
    case 'ashraeClearSky':
      return `ASHRAE clear-sky model, τb ${monthlyValue(weather.tauB, month)}, τd ${monthlyValue(weather.tauD, month)} (Gueymard & Thevenard 2013)`;
    case 'ineichenClearSky':
      return `Ineichen & Perez (2002) clear sky, Linke turbidity ${monthlyValue(weather.linkeTurbidity, month)}`;
    case 'measured':
      return 'supplied hourly series';
    case 'globalHorizontal':
      return 'supplied global horizontal split by Erbs et al. (1982)';
  }
}

/**
 * Irradiance of the hour from the window's weather: clear-sky models at the sun's altitude, or the
 * supplied series' row `hourIndex`. Returns undefined for a missing row.
 */
export function weatherFromSpec(w: PreparedWindow, hourIndex: number, month: number, doy: number, sunAltitude: number, sunZenith: number): WeatherHour | undefined {
  const weather = w.spec.weather;
  switch (weather.kind) {
    case 'ashraeClearSky': {
      const c = ashraeClearSky(sunAltitude, doy, monthlyValue(weather.tauB, month), monthlyValue(weather.tauD, month));
      return { dni: c.dni, dhi: c.dhi };
    }
    case 'ineichenClearSky': {
      const c = ineichenPerezClearSky(sunAltitude, doy, monthlyValue(weather.linkeTurbidity, month), w.spec.site.elevation ?? 0);
      return { dni: c.dni, dhi: c.dhi };
    }
    case 'measured': {
      const row = w.yearFit!.rowOf[hourIndex];
      const dni = weather.dni[row];
      const dhi = weather.dhi[row];
      if (!numberIsFinite(dni) || !numberIsFinite(dhi)) return undefined;
      // Past the physically possible limits at this sun: missing, as the annual series has it.
      if (!isPossibleIrradiance(dni, dhi, sin(sunAltitude * RAD), extraterrestrialSpencer(doy))) return undefined;
      return { dni, dhi };
    }
    case 'globalHorizontal': {
      const ghi = weather.ghi[w.yearFit!.rowOf[hourIndex]];
      if (!numberIsFinite(ghi) || !isPossibleGlobal(ghi, cos(sunZenith * RAD), extraterrestrialSpencer(doy))) return undefined;
      const d = decomposeErbs(ghi, sunZenith, doy);
      return { dni: d.dni, dhi: d.dhi };
    }
  }
}

/** Row of the year's hourly series a date-time belongs to (the row with the nearest stamp), or throws naming `dateTime`. */
export function hourIndexOf(w: PreparedWindow, stamp: number): number {
  const index = rowOfSerial(w.yearStart, stamp, w.convention);
  if (index < 0 || index >= w.hours) {
    throw new SunpaneError('dateTime', stamp, `must fall in ${w.spec.year}, the year of the window's weather series`);
  }
  return index;
}

/**
 * Outdoor dry-bulb [°C] of the hour a date-time names (read by the window's time convention): the
 * supplied series' row, or the design-day profile of the month (local standard time) — for
 * `hourEnding` the profile's value at the end of the hour, for `instant` its value at the instant
 * (linear between the profile's hours); NaN for a missing row, undefined without a source.
 * @param w - the prepared window
 * @param stamp - the date-time as given (local standard serial)
 * @param month - the month of the hour, 1…12
 */
export function outdoorTemperatureAt(w: PreparedWindow, stamp: number, month: number): number | undefined {
  const weather = w.spec.weather;
  const source = outdoorTemperatureSource(weather);
  if (source === undefined) return undefined;
  if (source === 'series') {
    const series = (weather as { dryBulb: ArrayLike<number> }).dryBulb;
    const value = series[w.yearFit!.rowOf[hourIndexOf(w, stamp)]];
    return numberIsFinite(value) ? value : NAN;
  }
  const d = weather as { dryBulbMax: number[]; dailyRange: number[] };
  let hour: number;
  if (w.convention === 'instant') {
    hour = (stamp - floor(stamp)) * 24;
    if (abs(hour - round(hour)) < 1e-6) hour = round(hour); // on the hour: the profile's own value
  } else {
    const middle = stamp - 1 / 48;
    hour = min(24, floor((middle - floor(middle)) * 24 + 1e-9) + 1);
  }
  return monthlyValue(d.dryBulbMax, month) - fractionOfDailyRange(hour) * monthlyValue(d.dailyRange, month);
}
