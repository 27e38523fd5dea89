/**
 * Solar gain through one window for one hour: the beam, sky-diffuse and ground-reflected parts,
 * their radiant / convective split, and a step-by-step explanation for checking a number by hand.
 *
 *   Q = A_glass · IAC · [E_beam · F_sunlit · SHGC(θ) + (E_sky + E_ground) · SHGC_diffuse]
 *
 * with E the irradiance on the window plane [W/m²] (beam unshaded, sky diffuse through the skyline's
 * sky view factor), F_sunlit the sunlit fraction of the glazing, SHGC(θ) the solar heat gain
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
import { glassArea as glassAreaOf, interiorAttenuationOf, shgcCurve, type ShgcCurve } from '../glazing';
import { hasShading, sunlitFraction, skylineSkyViewFactor } from '../shading';
import { radiantFractionOf, validateWindowSpec } from './windowSpec';
import { ashraeClearSky, decomposeErbs, ineichenPerezClearSky, planeIrradiance } from '../sky';
import { sunPosition, type SunOptions, incidenceAngle, profileAngle } from '../sun';
import { civilToSerial, dayOfYear, hoursInYear, serialToCivil, serialToUtcMs, requireSerial } from '../time';
import type { Weather, WindowSpec } from './window';

/** The inputs of the gain equation for one hour. */
export interface GainInput {
  /** Glass area [m²], ≥ 0. */
  glassArea: number;
  /** Beam irradiance on the window plane, unshaded [W/m²], ≥ 0. */
  beam: number;
  /** Sky-diffuse irradiance on the window plane [W/m²], ≥ 0. */
  sky: number;
  /** Ground-reflected irradiance on the window plane [W/m²], ≥ 0. */
  ground: number;
  /** Sunlit fraction of the glazed area, 0…1. */
  sunlitFraction: number;
  /** SHGC at the beam's incidence angle, 0…1. */
  shgcBeam: number;
  /** Hemispherical (diffuse) SHGC, 0…1. */
  shgcDiffuse: number;
  /** Interior attenuation coefficient, 0…1 (1 = no interior shade). */
  interiorAttenuation: number;
  /** Radiant share of the gain, 0…1. */
  radiantFraction: number;
}

/** Window solar gain split by source and by heat-transfer mode [W]. */
export interface GainParts {
  /** Gain from the beam [W]. */
  beam: number;
  /** Gain from sky diffuse [W]. */
  sky: number;
  /** Gain from ground-reflected light [W]. */
  ground: number;
  /** beam + sky + ground [W]. */
  total: number;
  /** Radiant part of the total [W]. */
  radiant: number;
  /** Convective part of the total [W]. */
  convective: number;
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
  const fr = requireRange('radiantFraction', input.radiantFraction, 0, 1);
  const k = area * iac;
  const beam = k * eb * f * gb; // beam through the sunlit glass
  const sky = k * es * gd; // diffuse through all of the glass
  const ground = k * eg * gd;
  const total = beam + sky + ground;
  return { beam, sky, ground, total, radiant: fr * total, convective: (1 - fr) * total };
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
  /** Multiplier on sky diffuse from the skyline, 0…1. */
  skyViewFactor: number;
  dni: number;
  dhi: number;
  /** Irradiance on the window plane [W/m²]: beam unshaded, sky diffuse, ground reflected. */
  beam: number;
  sky: number;
  ground: number;
  shgcBeam: number;
  shgcDiffuse: number;
  interiorAttenuation: number;
  radiantFraction: number;
  /** Glass area [m²]. */
  glassArea: number;
  /** The gain [W]. */
  gain: GainParts;
}

/** A validated window with everything that does not change from hour to hour worked out once. */
export interface PreparedWindow {
  spec: WindowSpec;
  curve: ShgcCurve;
  glassArea: number;
  skyViewFactor: number;
  interiorAttenuation: number;
  radiantFraction: number;
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
  return {
    spec,
    curve: shgcCurve(spec.glazing),
    glassArea: glassAreaOf(spec.width, spec.height, spec.frameFraction),
    skyViewFactor: skyline !== undefined ? skylineSkyViewFactor(skyline, spec.surfaceAzimuth) : 1,
    interiorAttenuation: interiorAttenuationOf(spec.glazing),
    radiantFraction: radiantFractionOf(spec.glazing),
    vertical: spec.surfaceTilt === 90,
    shaded: hasShading(spec.shading),
    sunOptions,
    yearStart: civilToSerial(spec.year, 1, 1),
    hours: hoursInYear(spec.year),
  };
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
      const dni = weather.dni[hourIndex];
      const dhi = weather.dhi[hourIndex];
      if (!Number.isFinite(dni) || !Number.isFinite(dhi)) return undefined;
      return { dni, dhi };
    }
    case 'globalHorizontal': {
      const ghi = weather.ghi[hourIndex];
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

/** Gain of a prepared window at a local serial, with the hour's weather given or taken from the spec. */
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
    skyModel: spec.skyModel,
    skyViewFactor: w.skyViewFactor,
  });
  const shgcBeam = incidence >= 90 ? 0 : w.curve.atAngle(incidence);
  const gain = windowGainParts({
    glassArea: w.glassArea,
    beam: plane.beam,
    sky: plane.sky,
    ground: plane.ground,
    sunlitFraction: lit,
    shgcBeam,
    shgcDiffuse: w.curve.diffuse,
    interiorAttenuation: w.interiorAttenuation,
    radiantFraction: w.radiantFraction,
  });
  return {
    dateTime: serial,
    missing,
    weatherSource: missing ? `${weatherSource}: no value for this hour` : weatherSource,
    sunAltitude: sun.altitude,
    sunAzimuth: sun.azimuth,
    incidence,
    profileAngle: profile,
    sunlitFraction: lit,
    skyViewFactor: w.skyViewFactor,
    dni,
    dhi,
    beam: plane.beam,
    sky: plane.sky,
    ground: plane.ground,
    shgcBeam,
    shgcDiffuse: w.curve.diffuse,
    interiorAttenuation: w.interiorAttenuation,
    radiantFraction: w.radiantFraction,
    glassArea: w.glassArea,
    gain,
  };
}

/**
 * Solar gain of one window at one instant.
 * @param spec - the window (validated here; errors name the field by its path)
 * @param dateTime - local standard date-time at which the sun is evaluated (serial); for an hourly
 *   row stamped at the end of its hour pass the middle of the hour (stamp − 1/48)
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
  return gainOfPrepared(prepareWindow(spec), dateTime, weatherHour);
}
