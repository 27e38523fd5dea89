/**
 * Solar gain through one window for one hour: the beam, sky-diffuse and ground-reflected parts,
 * their radiant / convective split, and a step-by-step explanation for checking a number by hand.
 *
 *   Q = A_glass · IAC · [E_beam · F_sunlit · SHGC(θ) + (E_sky + E_ground) · SHGC_diffuse]
 *
 * with E the irradiance [W/m²]: E_beam on the window plane (unshaded), E_sky and E_ground reaching
 * the glass past the window's overhang, fins, reveal and skyline — the isotropic sky through the
 * sky view ratio, the circumsolar part through the sunlit fraction, the horizon brightening through
 * the open share of the horizon band, the ground-reflected light through the ground view ratio
 * (docs/diffuse-shading.md; `diffuseShading: "beamOnly"` gives the earlier treatment, where the
 * devices cut only the beam) — F_sunlit the sunlit fraction of the glazing, SHGC(θ) the solar heat gain
 * coefficient at the beam's incidence angle, SHGC_diffuse its hemispherical average and IAC the
 * interior attenuation coefficient. Source: ASHRAE Handbook—Fundamentals (2013) ch. 15, the
 * fenestration solar heat gain equations (beam, diffuse and interior attenuation terms; from
 * memory); docs/methods.md#gain.
 *
 * "No sun" is a result: at night, with the sun behind the wall or behind the skyline the beam part
 * is 0 and only the diffuse parts (possibly 0) remain. The beam counts only when the sun at the
 * instant evaluated is above the horizon.
 */
import { SunpaneError, requireRange } from '../common';
import { glassArea as glassAreaOf, interiorAttenuationsOf, shgcBasisOf, shgcCurve, type ShgcCurve, solarArea } from '../glazing';
import { BARE_VIEW_FACTORS, hasShading, sunlitFraction, skylineSkyViewFactor, type WindowViewFactors, windowViewFactors } from '../shading';
import { outdoorTemperatureSource, radiantFractionsOf, skyModelOf, validateWindowSpec } from './windowSpec';
import { ashraeClearSky, decomposeErbs, ineichenPerezClearSky, planeIrradiance, type SkyModel } from '../sky';
import { sunPosition, type SunOptions, incidenceAngle, profileAngle } from '../sun';
import { civilToSerial, clockToStandard, dayOfYear, fitYearOfHours, hoursInYear, serialToCivil, serialToUtcMs, requireSerial, standardToClock, type YearFit } from '../time';
import { fractionOfDailyRange } from './outdoorTemperature';
import type { DiffuseShading, Weather, WindowSpec } from './window';

/** The inputs of the gain equation for one hour. */
export interface GainInput {
  /** Glass area [m²], ≥ 0. */
  glassArea: number;
  /** Beam irradiance on the window plane, unshaded [W/m²], ≥ 0. */
  beam: number;
  /** Sky-diffuse irradiance reaching the glass [W/m²], ≥ 0 (already through the window's view of the sky). */
  sky: number;
  /** Ground-reflected irradiance reaching the glass [W/m²], ≥ 0 (already through the window's view of the ground). */
  ground: number;
  /** Sunlit fraction of the glazed area, 0…1. */
  sunlitFraction: number;
  /** SHGC at the beam's incidence angle, 0…1. */
  shgcBeam: number;
  /** Hemispherical (diffuse) SHGC, 0…1. */
  shgcDiffuse: number;
  /** Interior attenuation coefficient of the beam (and of diffuse when `interiorAttenuationDiffuse` is not given), 0…1 (1 = no interior shade). */
  interiorAttenuation: number;
  /** Interior attenuation coefficient of diffuse light, 0…1; default `interiorAttenuation`. */
  interiorAttenuationDiffuse?: number;
  /** Radiant share of the beam gain (and of diffuse when `radiantFractionDiffuse` is not given), 0…1. */
  radiantFraction: number;
  /** Radiant share of the diffuse gain, 0…1; default `radiantFraction`. */
  radiantFractionDiffuse?: number;
}

/** Window solar gain split by source and by heat-transfer mode [W]. */
export interface GainParts {
  /** Gain from the beam [W]. */
  beam: number;
  /** Gain from sky diffuse [W]. */
  sky: number;
  /** Gain from ground-reflected light [W]. */
  ground: number;
  /** beam + sky + ground: the solar gain [W]. */
  total: number;
  /** Radiant part of the solar gain [W]. */
  radiant: number;
  /** Convective part of the solar gain [W]. */
  convective: number;
  /** Conduction gain U · A · (T_out − T_in) [W], beside the solar gain (negative when heat flows out; 0 without a U-value). */
  conduction: number;
}

/**
 * The window gain equation.
 * @param input - irradiance on the plane, sunlit fraction, SHGCs, glass area, interior attenuation
 *   and radiant fraction (see {@link GainInput} for units and ranges)
 * @returns the gain parts [W]; all 0 when the irradiance is 0 (night)
 * @remarks Q_beam = A · IAC · E_beam · F_sunlit · SHGC(θ); Q_sky = A · IAC · E_sky · SHGC_d;
 *   Q_ground = A · IAC · E_ground · SHGC_d; radiant = f_r · Q, convective = (1 − f_r) · Q
 *   (ASHRAE Handbook—Fundamentals (2013) ch. 15, from memory).
 * @throws SunpaneError naming the input field out of range
 */
export function windowGainParts(input: GainInput): GainParts {
  const area = requireRange('glassArea', input.glassArea, 0, undefined, 'm²');
  const eb = requireRange('beam', input.beam, 0, undefined, 'W/m²');
  const es = requireRange('sky', input.sky, 0, undefined, 'W/m²');
  const eg = requireRange('ground', input.ground, 0, undefined, 'W/m²');
  const f = requireRange('sunlitFraction', input.sunlitFraction, 0, 1);
  const gb = requireRange('shgcBeam', input.shgcBeam, 0, 1);
  const gd = requireRange('shgcDiffuse', input.shgcDiffuse, 0, 1);
  const iac = requireRange('interiorAttenuation', input.interiorAttenuation, 0, 1);
  const iacD = input.interiorAttenuationDiffuse === undefined ? iac : requireRange('interiorAttenuationDiffuse', input.interiorAttenuationDiffuse, 0, 1);
  const fr = requireRange('radiantFraction', input.radiantFraction, 0, 1);
  const frD = input.radiantFractionDiffuse === undefined ? fr : requireRange('radiantFractionDiffuse', input.radiantFractionDiffuse, 0, 1);
  const beam = area * iac * eb * f * gb; // beam through the sunlit glass
  const sky = area * iacD * es * gd; // diffuse as it reaches the glass (view factors already applied)
  const ground = area * iacD * eg * gd;
  const total = beam + sky + ground;
  const radiant = fr * beam + frD * (sky + ground);
  return { beam, sky, ground, total, radiant, convective: total - radiant, conduction: 0 };
}

/** Direct normal and diffuse horizontal irradiance of one hour [W/m²]. */
export interface WeatherHour {
  dni: number;
  dhi: number;
}

/** Everything about one hour's gain, from sun position to watts. */
export interface WindowGainHour {
  /** The local standard date-time the sun was evaluated at (serial). */
  dateTime: number;
  /** The same instant on the local clock (serial; equals `dateTime` without daylight saving). */
  clockTime: number;
  /** How a supplied series' rows were fitted to the window's year, in words (undefined for clear skies). */
  yearFit?: string;
  /** True when the weather series has no value for this hour: irradiance and gain are then 0. */
  missing: boolean;
  /** Where DNI and DHI came from, in words. */
  weatherSource: string;
  sunAltitude: number;
  sunAzimuth: number;
  /** Incidence angle of the beam on the glass [°], 0…180 (> 90: sun behind the window). */
  incidence: number;
  /** Profile (vertical shadow) angle [°] as src/core/sun/surfaceAngles.ts defines it. */
  profileAngle: number;
  /** Sunlit fraction of the glazed area, 0…1. */
  sunlitFraction: number;
  /** The window's sky view ratio (sky view factor ÷ ½), 0…1: the share of the isotropic sky diffuse reaching the glass. */
  skyViewRatio: number;
  /** The window's ground view ratio (ground view factor ÷ ½), 0…1. */
  groundViewRatio: number;
  /** Open share of the horizon band (0…6.5°), 0…1: the share of the horizon brightening reaching the glass. */
  horizonShare: number;
  /** How devices act on the diffuse light: by view factors, or the earlier beam-only treatment. */
  diffuseShading: DiffuseShading;
  dni: number;
  dhi: number;
  /** Irradiance [W/m²]: beam on the window plane (unshaded), sky diffuse and ground reflected reaching the glass. */
  beam: number;
  sky: number;
  ground: number;
  /** Sky diffuse and ground-reflected irradiance on the bare window plane (no devices, no skyline) [W/m²]. */
  skyUnshaded: number;
  groundUnshaded: number;
  shgcBeam: number;
  shgcDiffuse: number;
  interiorAttenuation: number;
  radiantFraction: number;
  /** Interior attenuation of diffuse light and radiant share of the diffuse gain [-]. */
  interiorAttenuationDiffuse: number;
  radiantFractionDiffuse: number;
  /** Glass area [m²]. */
  glassArea: number;
  /** Area the SHGC applies to [m²]: the glass area, or the rough opening for a whole-window SHGC. */
  solarArea: number;
  /** Outdoor and indoor dry-bulb [°C] for the conduction gain (undefined without a U-value). */
  outdoorTemperature?: number;
  indoorTemperature?: number;
  /** The gain [W]. */
  gain: GainParts;
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
      if (!Number.isFinite(dni) || !Number.isFinite(dhi)) return undefined;
      return { dni, dhi };
    }
    case 'globalHorizontal': {
      const ghi = weather.ghi[w.yearFit!.rowOf[hourIndex]];
      if (!Number.isFinite(ghi)) return undefined;
      const d = decomposeErbs(ghi, sunZenith, doy);
      return { dni: d.dni, dhi: d.dhi };
    }
  }
}

/** Row of the year's hourly series whose hour contains the serial, or throws naming `dateTime`. */
export function hourIndexOf(w: PreparedWindow, serial: number): number {
  const index = Math.floor((serial - w.yearStart) * 24 + 1e-9);
  if (index < 0 || index >= w.hours) {
    throw new SunpaneError('dateTime', serial, `must fall in ${w.spec.year}, the year of the window's weather series`);
  }
  return index;
}

/**
 * Outdoor dry-bulb [°C] of the hour containing a local standard serial: the supplied series' row, or
 * the design-day profile of the month (hour ending, local standard time); NaN for a missing row,
 * undefined without a source.
 */
export function outdoorTemperatureAt(w: PreparedWindow, serial: number, month: number): number | undefined {
  const weather = w.spec.weather;
  const source = outdoorTemperatureSource(weather);
  if (source === undefined) return undefined;
  if (source === 'series') {
    const series = (weather as { dryBulb: ArrayLike<number> }).dryBulb;
    const value = series[w.yearFit!.rowOf[hourIndexOf(w, serial)]];
    return Number.isFinite(value) ? value : Number.NaN;
  }
  const d = weather as { dryBulbMax: number[]; dailyRange: number[] };
  const hoursOfDay = (serial - Math.floor(serial)) * 24;
  const hourEnding = Math.min(24, Math.floor(hoursOfDay + 1e-9) + 1);
  return monthlyValue(d.dryBulbMax, month) - fractionOfDailyRange(hourEnding) * monthlyValue(d.dailyRange, month);
}

/** Gain of a prepared window at a local standard-time serial, with the hour's weather given or taken from the spec. */
export function gainOfPrepared(w: PreparedWindow, serial: number, weatherHour?: WeatherHour): WindowGainHour {
  const { spec } = w;
  const { site } = spec;
  const utcMs = serialToUtcMs(serial, site.utcOffset);
  const sun = sunPosition(utcMs, site.latitude, site.longitude, w.sunOptions);
  const { month } = serialToCivil(serial);
  const doy = dayOfYear(serial);
  let weather: WeatherHour | undefined;
  let weatherSource: string;
  if (weatherHour !== undefined) {
    weather = { dni: requireRange('dni', weatherHour.dni, 0, 2000, 'W/m²'), dhi: requireRange('dhi', weatherHour.dhi, 0, 2000, 'W/m²') };
    weatherSource = 'given for this hour';
  } else {
    const clear = spec.weather.kind === 'ashraeClearSky' || spec.weather.kind === 'ineichenClearSky';
    weather = weatherFromSpec(w, clear ? 0 : hourIndexOf(w, serial), month, doy, sun.altitude, sun.zenith);
    weatherSource = weatherSourceText(spec.weather, month);
  }
  const incidence = incidenceAngle(sun.altitude, sun.azimuth, spec.surfaceTilt, spec.surfaceAzimuth);
  const profile = profileAngle(sun.altitude, sun.azimuth, spec.surfaceAzimuth);
  const sunUp = sun.altitude > 0;
  const lit = !sunUp || incidence >= 90 ? 0 : w.vertical ? sunlitFraction({ width: spec.width, height: spec.height }, spec.shading, sun.altitude, sun.azimuth, spec.surfaceAzimuth) : 1;
  const missing = weather === undefined;
  const dni = missing ? 0 : weather!.dni;
  const dhi = missing ? 0 : weather!.dhi;
  const plane = planeIrradiance({
    dni: sunUp ? dni : 0,
    dhi,
    sunAltitude: sun.altitude,
    sunAzimuth: sun.azimuth,
    surfaceTilt: spec.surfaceTilt,
    surfaceAzimuth: spec.surfaceAzimuth,
    groundAlbedo: spec.groundAlbedo,
    dayOfYear: doy,
    skyModel: w.skyModel,
    shade: { ...w.shade, circumsolar: circumsolarShade(w, lit) },
  });
  const shgcBeam = incidence >= 90 ? 0 : w.curve.atAngle(incidence);
  const gain = windowGainParts({
    glassArea: w.solarArea,
    beam: plane.beam,
    sky: plane.sky,
    ground: plane.ground,
    sunlitFraction: lit,
    shgcBeam,
    shgcDiffuse: w.curve.diffuse,
    interiorAttenuation: w.interiorAttenuation,
    interiorAttenuationDiffuse: w.interiorAttenuationDiffuse,
    radiantFraction: w.radiantFraction,
    radiantFractionDiffuse: w.radiantFractionDiffuse,
  });
  let outdoorTemperature: number | undefined;
  if (w.conductance > 0 || spec.glazing.uValue !== undefined) {
    outdoorTemperature = outdoorTemperatureAt(w, serial, month);
    const dt = outdoorTemperature !== undefined && Number.isFinite(outdoorTemperature) ? outdoorTemperature - spec.indoorTemperature! : 0;
    gain.conduction = w.conductance * dt; // U · A · (T_out − T_in)
  }
  return {
    dateTime: serial,
    clockTime: standardToClock(serial, site.daylightSaving),
    yearFit: w.yearFit?.text,
    missing,
    weatherSource: missing ? `${weatherSource}: no value for this hour` : weatherSource,
    sunAltitude: sun.altitude,
    sunAzimuth: sun.azimuth,
    incidence,
    profileAngle: profile,
    sunlitFraction: lit,
    skyViewRatio: w.shade.isotropic,
    groundViewRatio: w.shade.ground,
    horizonShare: w.shade.horizon,
    diffuseShading: w.beamOnly ? 'beamOnly' : 'viewFactors',
    dni,
    dhi,
    beam: plane.beam,
    sky: plane.sky,
    ground: plane.ground,
    skyUnshaded: plane.skyUnshaded,
    groundUnshaded: plane.groundUnshaded,
    shgcBeam,
    shgcDiffuse: w.curve.diffuse,
    interiorAttenuation: w.interiorAttenuation,
    radiantFraction: w.radiantFraction,
    interiorAttenuationDiffuse: w.interiorAttenuationDiffuse,
    radiantFractionDiffuse: w.radiantFractionDiffuse,
    glassArea: w.glassArea,
    solarArea: w.solarArea,
    outdoorTemperature,
    indoorTemperature: outdoorTemperature !== undefined ? spec.indoorTemperature : undefined,
    gain,
  };
}

/**
 * Solar gain of one window at one instant.
 * @param spec - the window (validated here; errors name the field by its path)
 * @param dateTime - local date-time at which the sun is evaluated (serial): standard time, or clock
 *   time when the site has a daylight-saving rule (converted here; see src/core/time/clock.ts);
 *   for an hourly row stamped at the end of its hour pass the middle of the hour (stamp − 1/48)
 * @param weatherHour - the hour's direct normal and diffuse horizontal irradiance [W/m²], each
 *   0…2000; omitted: from `spec.weather` — the clear-sky model at this instant, or the supplied
 *   series' row for the hour containing `dateTime` (which must then fall in `spec.year`)
 * @returns sun, angles, sunlit fraction, irradiance, SHGCs, glass area and the gain parts [W]; at
 *   night or with the sun behind the window the beam gain is 0; a missing row gives `missing: true`
 *   and zero irradiance and gain
 * @remarks See the module comment for the gain equation and its source.
 */
export function windowGainAt(spec: WindowSpec, dateTime: number, weatherHour?: WeatherHour): WindowGainHour {
  requireSerial('dateTime', dateTime);
  const w = prepareWindow(spec);
  return gainOfPrepared(w, clockToStandard(dateTime, spec.site.daylightSaving), weatherHour);
}
