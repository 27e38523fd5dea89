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
import { requireRange } from '../common';
import { sunlitFraction } from '../shading';
import { planeIrradiance } from '../sky';
import { sunPosition, incidenceAngle, profileAngle } from '../sun';
import { clockToStandard, dayOfYear, DEFAULT_TIME_CONVENTION, evaluationSerial, requireStamp, rowOfSerial, rowStamp, serialToCivil, serialToUtcMs, standardToClock, type TimeConvention } from '../time';
import { type AnnualRow, annualRowOfPrepared } from './annual';
import { circumsolarShade, hourIndexOf, outdoorTemperatureAt, type PreparedWindow, prepareWindow, type WeatherHour, weatherFromSpec, weatherSourceText } from './prepared';
import type { DiffuseShading, WindowSpec } from './window';

export type { WeatherHour };

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

/** Everything about one hour's gain, from sun position to watts. */
export interface WindowGainHour {
  /** The date-time as given, in local standard time (serial), read by {@link convention}. */
  stamp: number;
  /** How the date-time was read: `hourEnding` (sun at mid-hour) or `instant`. */
  convention: TimeConvention;
  /** The local standard date-time the sun was evaluated at (serial). */
  dateTime: number;
  /** The row of the window's year this hour is (its numbers are that row's), or undefined off the rows' stamps. */
  row: number | undefined;
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

/** How close to a row's stamp a date-time must be to be that row [days]: about 9 ms. */
const ON_STAMP = 1e-7;

/** The row of the window's year whose stamp a date-time is, or undefined when it is none. */
export function rowAtStamp(w: PreparedWindow, stamp: number): number | undefined {
  const row = rowOfSerial(w.yearStart, stamp, w.convention);
  if (row < 0 || row >= w.hours) return undefined;
  return Math.abs(rowStamp(w.yearStart, row, w.convention) - stamp) < ON_STAMP ? row : undefined;
}

/**
 * Gain of a prepared window for a local standard date-time read by the window's time convention,
 * with the hour's weather given or taken from the window. At a row's stamp the numbers are the
 * year's row (the same passes and sun path as the annual series, {@link annualRowOfPrepared});
 * between stamps the same equations run at the evaluation instant with the sun by the direct SPA.
 */
export function gainAtStamp(w: PreparedWindow, stamp: number, weatherHour?: WeatherHour): WindowGainHour {
  const instant = evaluationSerial(stamp, w.convention);
  const row = rowAtStamp(w, stamp);
  if (row !== undefined) return hourOfRow(w, annualRowOfPrepared(w, row, weatherHour), stamp, instant, weatherHour !== undefined);
  return gainOfPrepared(w, instant, weatherHour, stamp);
}

/** The hour's explanation from a row of the year (every number the row's). */
function hourOfRow(w: PreparedWindow, r: AnnualRow, stamp: number, instant: number, given: boolean): WindowGainHour {
  const { spec } = w;
  const { month } = serialToCivil(instant);
  const source = given ? 'given for this hour' : weatherSourceText(spec.weather, month);
  const kd = w.solarArea * w.interiorAttenuationDiffuse;
  const gd = w.curve.diffuse;
  const conducts = spec.glazing.uValue !== undefined;
  return {
    stamp,
    convention: w.convention,
    dateTime: instant,
    row: r.row,
    clockTime: standardToClock(instant, spec.site.daylightSaving),
    yearFit: w.yearFit?.text,
    missing: r.missing,
    weatherSource: r.missing ? `${source}: no value for this hour` : source,
    sunAltitude: r.sunAltitude,
    sunAzimuth: r.sunAzimuth,
    incidence: r.incidence,
    profileAngle: r.profileAngle,
    sunlitFraction: r.sunlitFraction,
    skyViewRatio: w.shade.isotropic,
    groundViewRatio: w.shade.ground,
    horizonShare: w.shade.horizon,
    diffuseShading: w.beamOnly ? 'beamOnly' : 'viewFactors',
    dni: r.dni,
    dhi: r.dhi,
    beam: r.beam,
    sky: r.sky,
    ground: r.ground,
    skyUnshaded: r.skyUnshaded,
    groundUnshaded: r.groundUnshaded,
    shgcBeam: r.shgc,
    shgcDiffuse: gd,
    interiorAttenuation: w.interiorAttenuation,
    radiantFraction: w.radiantFraction,
    interiorAttenuationDiffuse: w.interiorAttenuationDiffuse,
    radiantFractionDiffuse: w.radiantFractionDiffuse,
    glassArea: w.glassArea,
    solarArea: w.solarArea,
    outdoorTemperature: conducts ? r.dryBulb : undefined,
    indoorTemperature: conducts ? spec.indoorTemperature : undefined,
    gain: { beam: r.gainBeam, sky: kd * r.sky * gd, ground: kd * r.ground * gd, total: r.gain, radiant: r.radiant, convective: r.convective, conduction: r.conduction },
  };
}

/**
 * Gain of a prepared window with the sun at a given instant (the direct path), with the hour's
 * weather given or taken from the spec.
 * @param w - the prepared window
 * @param serial - local standard serial of the instant the sun is evaluated at
 * @param weatherHour - the hour's DNI and DHI; undefined: the window's weather (a supplied series'
 *   row is the one `stamp` belongs to)
 * @param stamp - the date-time as given, read by the window's convention (its evaluation instant is `serial`)
 */
export function gainOfPrepared(w: PreparedWindow, serial: number, weatherHour: WeatherHour | undefined, stamp: number): WindowGainHour {
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
    weather = weatherFromSpec(w, clear ? 0 : hourIndexOf(w, stamp), month, doy, sun.altitude, sun.zenith);
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
  if (spec.glazing.uValue !== undefined) {
    outdoorTemperature = outdoorTemperatureAt(w, stamp, month);
    // A missing dry-bulb (NaN) conducts nothing.
    const dt = Number.isFinite(outdoorTemperature) ? (outdoorTemperature as number) - spec.indoorTemperature! : 0;
    gain.conduction = w.conductance * dt; // U · A · (T_out − T_in)
  }
  return {
    stamp,
    convention: w.convention,
    dateTime: serial,
    row: undefined,
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
 * Solar gain of one window for one hour.
 * @param spec - the window (validated here; errors name the field by its path). Its
 *   `timeConvention` says how `dateTime` is read: `hourEnding` (default) — the hour ending at
 *   `dateTime`, sun at its middle; `instant` — the sun at `dateTime`
 * @param dateTime - local date-time (serial): standard time, or clock time when the site has a
 *   daylight-saving rule (converted here; see src/core/time/clock.ts)
 * @param weatherHour - the hour's direct normal and diffuse horizontal irradiance [W/m²], each
 *   0…2000; omitted: from `spec.weather` — the clear-sky model, or the supplied series' row for the
 *   hour `dateTime` names (which must then fall in `spec.year`)
 * @returns sun, angles, sunlit fraction, irradiance, SHGCs, areas and the gain parts [W]; at night
 *   or with the sun behind the window the beam gain is 0; a missing row gives `missing: true` and
 *   zero irradiance and gain. At a row's stamp of the year the numbers are exactly those of that
 *   row of {@link annualSeries} (for a clear sky, of the year the hour falls in).
 * @remarks See the module comment for the gain equation and its source.
 */
export function windowGainAt(spec: WindowSpec, dateTime: number, weatherHour?: WeatherHour): WindowGainHour {
  const w = prepareWindow(forHour(spec, dateTime));
  requireStamp('dateTime', dateTime, w.convention);
  return gainAtStamp(w, standardStamp(w, dateTime), weatherHour);
}

/**
 * A date-time read by the window's convention, from the local clock to local standard time: an
 * hour-ending stamp moves with its hour's middle (as the annual series' clock stamps do), an
 * instant moves itself. Unchanged without a daylight-saving rule.
 */
export function standardStamp(w: PreparedWindow, dateTime: number): number {
  const rule = w.spec.site.daylightSaving;
  if (rule === undefined) return dateTime;
  return w.convention === 'hourEnding' ? clockToStandard(dateTime - 1 / 48, rule) + 1 / 48 : clockToStandard(dateTime, rule);
}

/**
 * The window for the hour a date-time names: under a clear sky the year of the series is the year
 * the hour falls in (so the hour is a row of it); supplied hourly weather keeps its own year.
 */
export function forHour(spec: WindowSpec, dateTime: number): WindowSpec {
  const clear = spec?.weather?.kind === 'ashraeClearSky' || spec?.weather?.kind === 'ineichenClearSky';
  if (!clear || !Number.isFinite(dateTime)) return spec; // (not a number: refused as dateTime by the caller)
  const convention = spec.timeConvention === 'instant' ? 'instant' : DEFAULT_TIME_CONVENTION;
  const year = serialToCivil(evaluationSerial(dateTime, convention)).year;
  return year === spec.year || year < 1901 || year > 9998 ? spec : { ...spec, year };
}
