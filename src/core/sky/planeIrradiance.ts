/**
 * Irradiance on a window plane from direct normal and diffuse horizontal irradiance: beam, sky
 * diffuse (isotropic, Hay–Davies or Perez 1990) and ground-reflected parts — on the bare plane and
 * on the glass of a shaded window.
 *
 * A shaded window (docs/diffuse-shading.md) receives each part of the diffuse light through its own
 * multiplier, worked out by the shading folder and handed in as plain numbers ({@link DiffuseShade}):
 * the isotropic part of the sky through the sky view ratio, the circumsolar part (Hay–Davies
 * Ai·Rb, Perez F1) through the beam's sunlit fraction of the hour (it comes from the sun's
 * direction), the horizon-brightening part (Perez F2) through the open share of the horizon band,
 * and the ground-reflected light through the ground view ratio.
 */
import { airMassKastenYoungFromSine } from './airMass';
import { RAD, SunpaneError, requireRange } from '../common';
import { extraterrestrialSpencer, requireDayOfYear } from './extraterrestrial';
import { PEREZ_1990_COMPOSITE, type PerezBrightness, type PerezParts, perezBrightnessKernel, perezCombineKernel, perezPartsKernel } from './perez1990';
import { incidenceAngle } from '../sun';
import { COS_85, requireIrradiance, verticalDiffuseRatioFromCosine } from './transposition';
import { requirePossibleIrradiance } from './qualityLimits';

const { cos, sin } = Math;

/**
 * A sky-diffuse transposition model: isotropic, Hay–Davies (1980), Perez et al. (1990), or the
 * handbook's clear-day procedure (`ashraeClearDay`: the vertical-surface diffuse ratio Y and its
 * tilted-surface form, meant for the ASHRAE τb/τd clear sky of design days).
 */
export type SkyModel = 'isotropic' | 'hayDavies' | 'perez1990' | 'ashraeClearDay';

/** The sky-diffuse models {@link planeIrradiance} accepts. */
export const SKY_MODELS: readonly SkyModel[] = Object.freeze(['isotropic', 'hayDavies', 'perez1990', 'ashraeClearDay'] as SkyModel[]);

/** Inputs of {@link planeIrradiance}; each field is checked and an error names it. */
export interface PlaneIrradianceInput {
  /** Direct normal irradiance [W/m²], 0…2000. */
  dni: number;
  /** Diffuse horizontal irradiance [W/m²], 0…2000. */
  dhi: number;
  /** Sun altitude [°], −90…90. */
  sunAltitude: number;
  /** Sun azimuth clockwise from north [°], 0…360. */
  sunAzimuth: number;
  /** Surface tilt [°], 0 (facing up) … 180; 90 = vertical window. */
  surfaceTilt: number;
  /** Direction the window faces, clockwise from north [°], 0…360. */
  surfaceAzimuth: number;
  /** Ground reflectance [-], 0…1. */
  groundAlbedo: number;
  /** Day of the year, 1…366 (extraterrestrial irradiance for Hay–Davies and Perez). */
  dayOfYear: number;
  /** Sky-diffuse model. */
  skyModel: SkyModel;
  /** What a shaded window keeps of each part of the diffuse light; default all 1 (an unshaded plane). */
  shade?: DiffuseShade;
}

/**
 * How much of each part of the diffuse light reaches the glass of a shaded window, each 0…1 (1 = all
 * of it, the bare plane). Plain numbers: the shading folder works them out (view factors and the
 * sunlit fraction), this folder only applies them.
 */
export interface DiffuseShade {
  /** Multiplier on the isotropic part of the sky diffuse: the window's sky view ratio. */
  isotropic: number;
  /** Multiplier on the circumsolar part (Hay–Davies Ai·Rb, Perez F1): the beam's sunlit fraction of the hour. */
  circumsolar: number;
  /** Multiplier on the horizon-brightening part (Perez F2): the open share of the horizon band. */
  horizon: number;
  /** Multiplier on the ground-reflected irradiance: the window's ground view ratio. */
  ground: number;
}

/** An unshaded plane. */
const NO_SHADE: Readonly<DiffuseShade> = Object.freeze({ isotropic: 1, circumsolar: 1, horizon: 1, ground: 1 });

/** Checks a {@link DiffuseShade}: each multiplier 0…1, errors naming `shade.<part>`. */
function requireShade(shade: DiffuseShade | undefined): DiffuseShade {
  if (shade === undefined) return NO_SHADE;
  if (shade === null || typeof shade !== 'object') throw new SunpaneError('shade', shade, 'must be the four diffuse multipliers (isotropic, circumsolar, horizon, ground), each 0…1');
  requireRange('shade.isotropic', shade.isotropic, 0, 1);
  requireRange('shade.circumsolar', shade.circumsolar, 0, 1);
  requireRange('shade.horizon', shade.horizon, 0, 1);
  requireRange('shade.ground', shade.ground, 0, 1);
  return shade;
}

/** Irradiance on the window plane [W/m²] and the incidence angle [°]. */
export interface PlaneIrradiance {
  /** Beam on the plane, DNI · max(0, cos θ) [W/m²]; 0 with the sun below the horizon or behind the plane. */
  beam: number;
  /** Sky diffuse reaching the glass, each part through its multiplier of `shade` [W/m²]. */
  sky: number;
  /** Ground-reflected reaching the glass, through the ground multiplier [W/m²]. */
  ground: number;
  /** beam + sky + ground [W/m²]. */
  total: number;
  /** Sky diffuse on the bare plane (no shade) [W/m²]. */
  skyUnshaded: number;
  /** Ground-reflected on the bare plane [W/m²]. */
  groundUnshaded: number;
  /** Incidence angle of the sun on the plane [°], 0…180 (> 90: sun behind the plane). */
  incidence: number;
}

/**
 * Irradiance on a window plane by the chosen sky model.
 *
 * @param input - see {@link PlaneIrradianceInput}; errors name the field (`dni`, `groundAlbedo`, `skyModel`...).
 *   A DNI/DHI pair no sky can give with the sun where it is (past the physically possible limits of
 *   Long & Shi 2008, {@link requirePossibleIrradiance}) is refused naming `dni` or `dhi` with the limit.
 * @returns beam (unshaded), sky diffuse and ground-reflected reaching the glass through `shade`, their
 * total, the same sky and ground on the bare plane [W/m²], and the incidence angle [°]. With the sun
 * at or below the horizon the beam is 0 and any diffuse given is spread isotropically by every model
 * (no circumsolar disc); with the sun behind the plane (incidence > 90°) the beam and circumsolar
 * parts are 0.
 * @remarks beam = DNI max(0, cos θ); GHI = DNI sin β + DHI (sun up); ground = GHI ρg (1 − cos Σ)/2;
 * sky by {@link skyDiffuseIsotropic}, {@link skyDiffuseHayDavies}, {@link skyDiffusePerez1990} or the
 * handbook's clear-day form Ed·(Y sin Σ + cos Σ) for Σ ≤ 90°, Ed·Y·sin Σ beyond
 * ({@link skyDiffuseAshraeClearDay}; with the sun down it falls back to isotropic),
 * with E0n by Spencer (1971) and m by Kasten & Young (1989) (Duffie & Beckman, Solar Engineering of
 * Thermal Processes, 4th ed., §2.15–2.16). Shaded: isotropic part × shade.isotropic + circumsolar
 * part × shade.circumsolar + horizon part × shade.horizon (the sum floored at 0, as the Perez total
 * is), ground × shade.ground; the clear-day form has no separate circumsolar or horizon part, so all
 * of it goes × shade.isotropic (docs/diffuse-shading.md).
 */
export function planeIrradiance(input: PlaneIrradianceInput): PlaneIrradiance {
  const dni = requireIrradiance('dni', input.dni);
  const dhi = requireIrradiance('dhi', input.dhi);
  const altitude = requireRange('sunAltitude', input.sunAltitude, -90, 90, '°');
  const sunAzimuth = requireRange('sunAzimuth', input.sunAzimuth, 0, 360, '°');
  const tilt = requireRange('surfaceTilt', input.surfaceTilt, 0, 180, '°');
  const surfaceAzimuth = requireRange('surfaceAzimuth', input.surfaceAzimuth, 0, 360, '°');
  const albedo = requireRange('groundAlbedo', input.groundAlbedo, 0, 1);
  const dayOfYear = requireDayOfYear(input.dayOfYear);
  const model = requireSkyModel(input.skyModel);
  const shade = requireShade(input.shade);

  const sinAltitude = sin(altitude * RAD);
  const e0 = extraterrestrialSpencer(dayOfYear);
  requirePossibleIrradiance(dni, dhi, sinAltitude, e0);

  const incidence = incidenceAngle(altitude, sunAzimuth, tilt, surfaceAzimuth);
  const plane = planeOf(tilt, albedo, model, shade);
  const out = { beam: 0, sky: 0, ground: 0, total: 0, skyUnshaded: 0, groundUnshaded: 0, incidence };
  planeKernel(out, plane, dni, dhi, altitude, sinAltitude, cos(incidence * RAD), e0, shade.circumsolar);
  return out;
}

function requireSkyModel(model: SkyModel): SkyModel {
  if (!SKY_MODELS.includes(model)) {
    throw new SunpaneError('skyModel', model, `must be one of ${SKY_MODELS.map((m) => `"${m}"`).join(', ')}`);
  }
  return model;
}

/** The hour-independent part of a plane: its tilt's view factors, albedo, sky model and shade. */
interface PlaneConstants {
  model: SkyModel;
  tilt: number;
  /** (1 + cos Σ) / 2: isotropic sky view of the plane. */
  isotropicView: number;
  /** sin Σ (Perez horizon band, clear-day Y term). */
  sinTilt: number;
  /** cos Σ, floored at 0 (the clear-day form's horizontal-sky term is dropped for Σ > 90°). */
  cosTiltUp: number;
  /** 1 − cos Σ (ground view, times 2). */
  oneMinusCosTilt: number;
  albedo: number;
  /** Multipliers on the isotropic sky, the horizon band and the ground ({@link DiffuseShade}). */
  isotropicShade: number;
  horizonShade: number;
  groundShade: number;
  /** Scratch record for the Perez parts (one per plane: no allocation per hour). */
  perez: PerezParts;
}

function planeOf(tilt: number, albedo: number, model: SkyModel, shade: Omit<DiffuseShade, 'circumsolar'>): PlaneConstants {
  const tiltRad = tilt * RAD;
  const cosTilt = cos(tiltRad);
  return {
    model,
    tilt,
    isotropicView: (1 + cosTilt) / 2,
    sinTilt: sin(tiltRad),
    cosTiltUp: cosTilt > 0 ? cosTilt : 0,
    oneMinusCosTilt: 1 - cosTilt,
    albedo,
    isotropicShade: shade.isotropic,
    horizonShade: shade.horizon,
    groundShade: shade.ground,
    // Stryker disable next-line ObjectLiteral: a scratch record; the kernels write every field they later read (f1 and f2 before the combination, the parts after it)
    perez: { epsilon: 1, delta: 0, bin: 1, f1: 0, f2: 0, isotropic: 0, circumsolar: 0, horizon: 0, total: 0 },
  };
}

/** The beam, sky and ground parts a {@link PreparedPlane} writes. */
export interface PlaneParts {
  /** [W/m²] as {@link PlaneIrradiance}. */
  beam: number;
  sky: number;
  ground: number;
  total: number;
  skyUnshaded: number;
  groundUnshaded: number;
}

/**
 * The plane irradiance of one hour, behind {@link planeIrradiance} and the one-hour calls of
 * {@link preparePlane}: inputs already checked, the sun given by its altitude, the sine of the
 * altitude and the cosine of the incidence angle, `circumsolar` the hour's multiplier on the
 * circumsolar part (the sunlit fraction); writes `out`. It runs {@link planeKernelRows} (the one
 * implementation) for one row; with `shared`, the brightness coefficients of row `hour`.
 */
function planeKernel(out: PlaneParts, p: PlaneConstants, dni: number, dhi: number, altitude: number, sinAltitude: number, cosIncidence: number, dniExtra: number, circumsolar: number, shared?: PerezBrightnessColumns, hour = 0): void {
  const one = ONE_HOUR;
  one.dni[0] = dni;
  one.dhi[0] = dhi;
  one.altitude[0] = altitude;
  one.sinAltitude[0] = sinAltitude;
  one.cosIncidence[0] = cosIncidence;
  one.dniExtra[0] = dniExtra;
  one.circumsolar[0] = circumsolar;
  let brightness: PerezBrightnessColumns | undefined;
  if (shared !== undefined) {
    ONE_BRIGHTNESS.f1[0] = shared.f1[hour];
    ONE_BRIGHTNESS.f2[0] = shared.f2[hour];
    brightness = ONE_BRIGHTNESS;
  }
  planeKernelRows(p, ONE_ROW, 1, one, brightness);
  const beam = one.beam[0];
  const sky = one.sky[0];
  const ground = one.ground[0];
  out.beam = beam;
  out.sky = sky;
  out.ground = ground;
  out.total = beam + sky + ground;
  out.skyUnshaded = one.skyUnshaded[0];
  out.groundUnshaded = one.groundUnshaded[0];
}

/** One row of inputs and results for {@link planeKernel}. */
const ONE_ROW = new Int32Array(1);
const ONE_HOUR: PlaneRows = {
  dni: new Float64Array(1),
  dhi: new Float64Array(1),
  altitude: new Float64Array(1),
  sinAltitude: new Float64Array(1),
  cosIncidence: new Float64Array(1),
  dniExtra: new Float64Array(1),
  circumsolar: new Float64Array(1),
  beam: new Float64Array(1),
  sky: new Float64Array(1),
  ground: new Float64Array(1),
  skyUnshaded: new Float64Array(1),
  groundUnshaded: new Float64Array(1),
};
const ONE_BRIGHTNESS: PerezBrightnessColumns = { f1: new Float64Array(1), f2: new Float64Array(1) };

/**
 * The hourly inputs and results of {@link PreparedPlane.irradianceRows}: one column per quantity,
 * row i of each the same hour.
 */
export interface PlaneRows {
  /** Direct normal and diffuse horizontal irradiance [W/m²], 0…2000 (not checked). */
  dni: Float64Array;
  dhi: Float64Array;
  /** Sun altitude [°] and its sine. */
  altitude: Float64Array;
  sinAltitude: Float64Array;
  /** Cosine of the incidence angle on the plane, −1…1. */
  cosIncidence: Float64Array;
  /** Extraterrestrial normal irradiance of the hour's day [W/m²] (not read when {@link PreparedPlane.needsDniExtra} is false). */
  dniExtra: Float64Array;
  /** The hour's multiplier on the circumsolar part, 0…1 (the sunlit fraction; 1 unshaded). */
  circumsolar: Float64Array;
  /** Filled: beam (unshaded), sky and ground reaching the glass, sky and ground on the bare plane [W/m²]. */
  beam: Float64Array;
  sky: Float64Array;
  ground: Float64Array;
  skyUnshaded: Float64Array;
  groundUnshaded: Float64Array;
}

/**
 * The one implementation of the plane irradiance: for each row i = rows[k], k < count, the hour's
 * inputs read from `c` at i, its parts written to `c` at i (with `shared`, the Perez brightness
 * coefficients of row i taken from it). A loop over rows rather than a call per hour, so that the
 * hourly path passes no number through a call (the engine would box each one).
 */
function planeKernelRows(p: PlaneConstants, rows: Int32Array, count: number, c: PlaneRows, shared: PerezBrightnessColumns | undefined): void {
  const { dni: dniIn, dhi: dhiIn, altitude: altitudeIn, sinAltitude: sinAltitudeIn, cosIncidence: cosIncidenceIn, dniExtra: dniExtraIn, circumsolar: circumsolarIn } = c;
  for (let k = 0; k < count; k++) {
    const i = rows[k];
    const dni = dniIn[i];
    const dhi = dhiIn[i];
    const altitude = altitudeIn[i];
    const sinAltitude = sinAltitudeIn[i];
    const cosIncidence = cosIncidenceIn[i];
    const sunUp = altitude > 0;
    const beam = sunUp && cosIncidence > 0 ? dni * cosIncidence : 0;
    const ghi = (sunUp ? dni * sinAltitude : 0) + dhi;
    let sky: number;
    let skyUnshaded: number;
    if (!sunUp || p.model === 'isotropic') {
      skyUnshaded = dhi * p.isotropicView; // D&B Eq. 2.15.1
      sky = skyUnshaded * p.isotropicShade;
    } else if (p.model === 'ashraeClearDay') {
      skyUnshaded = dhi * (verticalDiffuseRatioFromCosine(cosIncidence) * p.sinTilt + p.cosTiltUp); // ASHRAE ch. 14 clear-day tilted form
      sky = skyUnshaded * p.isotropicShade; // no separate circumsolar part: all of it × the sky view ratio
    } else if (p.model === 'hayDavies') {
      const dniExtra = dniExtraIn[i];
      const ai = dni / dniExtra < 1 ? dni / dniExtra : 1;
      const rb = (cosIncidence > 0 ? cosIncidence : 0) / (sinAltitude > COS_85 ? sinAltitude : COS_85);
      const isotropic = dhi * (1 - ai) * p.isotropicView;
      const disc = dhi * ai * rb;
      skyUnshaded = isotropic + disc; // D&B Eq. 2.16.4
      sky = isotropic * p.isotropicShade + disc * circumsolarIn[i];
    } else {
      let parts: PerezParts;
      if (shared !== undefined && dhi > 0) {
        // The hour's brightness coefficients, worked out once for every plane under this sky (perezBrightnessColumns).
        p.perez.f1 = shared.f1[i];
        p.perez.f2 = shared.f2[i];
        parts = perezCombineKernel(p.perez, p.isotropicView, p.sinTilt, dhi, sinAltitude, cosIncidence);
      } else parts = perezPartsKernel(p.perez, p.isotropicView, p.sinTilt, dhi, dni, dniExtraIn[i], 90 - altitude, sinAltitude, airMassKastenYoungFromSine(altitude, sinAltitude), cosIncidence, PEREZ_1990_COMPOSITE);
      skyUnshaded = parts.total;
      const shaded = parts.isotropic * p.isotropicShade + parts.circumsolar * circumsolarIn[i] + parts.horizon * p.horizonShade;
      sky = shaded > 0 ? shaded : 0; // floored at 0 as the Perez total is
    }
    const groundUnshaded = (ghi * p.albedo * p.oneMinusCosTilt) / 2; // D&B Eq. 2.15.1
    c.beam[i] = beam;
    c.sky[i] = sky;
    c.ground[i] = groundUnshaded * p.groundShade;
    c.skyUnshaded[i] = skyUnshaded;
    c.groundUnshaded[i] = groundUnshaded;
  }
}

/** The plane fields of {@link PlaneIrradianceInput}: everything that does not change by the hour. */
export type PlaneSurfaceInput = Pick<PlaneIrradianceInput, 'surfaceTilt' | 'surfaceAzimuth' | 'groundAlbedo' | 'skyModel'> & {
  /** The window's constant multipliers (isotropic sky, horizon band, ground); the circumsolar one comes by the hour. Default all 1. */
  shade?: Omit<DiffuseShade, 'circumsolar'>;
};

/** A window plane checked once, for the irradiance of many hours (e.g. every hour of a year). */
export interface PreparedPlane {
  /** Whether the sky model needs the extraterrestrial irradiance (Hay–Davies, Perez). */
  readonly needsDniExtra: boolean;
  /**
   * Irradiance on the plane for one hour, the same as {@link planeIrradiance} for the prepared plane,
   * without argument checks, written into `out`.
   * @param out - record to fill (beam, sky, ground, total, skyUnshaded, groundUnshaded [W/m²])
   * @param dni - direct normal irradiance [W/m²], 0…2000 (not checked)
   * @param dhi - diffuse horizontal irradiance [W/m²], 0…2000 (not checked)
   * @param sunAltitude - [°] −90…90 (not checked)
   * @param sinAltitude - sin of the altitude [-]
   * @param cosIncidence - cos of the incidence angle on the plane [-], −1…1
   * @param dniExtra - extraterrestrial normal irradiance of the day [W/m²] (Spencer 1971, as
   *   {@link planeIrradiance} uses); any value when {@link needsDniExtra} is false
   * @param circumsolar - the hour's multiplier on the circumsolar part, 0…1 (the sunlit fraction; 1 unshaded)
   */
  irradiance(out: PlaneParts, dni: number, dhi: number, sunAltitude: number, sinAltitude: number, cosIncidence: number, dniExtra: number, circumsolar: number): void;
  /** Whether the sky model is Perez 1990 (whose brightness coefficients planes may share hour by hour). */
  readonly perez: boolean;
  /**
   * {@link irradiance} with the Perez brightness coefficients of the hour taken from `shared` (row
   * `hour`) instead of worked out again: the same numbers, for many planes under one sky. Other sky
   * models ignore `shared`.
   */
  irradianceShared(out: PlaneParts, dni: number, dhi: number, sunAltitude: number, sinAltitude: number, cosIncidence: number, dniExtra: number, circumsolar: number, shared: PerezBrightnessColumns, hour: number): void;
  /**
   * {@link irradiance} for many hours at once (e.g. the lit hours of a year): for each row
   * i = rows[k], k < count, the hour's inputs are read from the columns of `c` at i and its beam,
   * sky, ground, sky and ground on the bare plane written to them at i — the same numbers as a
   * call per hour, without passing numbers through a call per hour. With `shared` (Perez), the
   * brightness coefficients of row i are taken from it as {@link irradianceShared} does.
   * @param rows - the rows to work out (each below every column's length)
   * @param count - how many of `rows`
   * @param c - the hourly inputs and results
   * @param shared - the Perez brightness coefficients by row, for planes under one sky (other models ignore it)
   */
  irradianceRows(rows: Int32Array, count: number, c: PlaneRows, shared?: PerezBrightnessColumns): void;
}

/** Perez brightness coefficients F1 and F2 of every hour of a sky (0 where there is no sun or no diffuse). */
export interface PerezBrightnessColumns {
  f1: Float64Array;
  f2: Float64Array;
}

/**
 * The Perez (1990) brightness coefficients of every hour under one sky, for planes that share it
 * ({@link PreparedPlane.irradianceShared}): the same first half of the model that
 * {@link planeIrradiance} works out per plane (perezBrightnessKernel), at the same sun.
 * @param dni - direct normal irradiance by hour [W/m²] (not checked)
 * @param dhi - diffuse horizontal irradiance by hour [W/m²] (not checked)
 * @param altitude - sun altitude by hour [°]
 * @param sinAltitude - its sine
 * @param dniExtraOfHour - extraterrestrial normal irradiance of the hour's day [W/m²]
 * @param hours - the hours to fill (others stay 0)
 */
export function perezBrightnessColumns(dni: ArrayLike<number>, dhi: ArrayLike<number>, altitude: ArrayLike<number>, sinAltitude: ArrayLike<number>, dniExtraOfHour: (hour: number) => number, hours: ArrayLike<number>): PerezBrightnessColumns {
  const n = altitude.length;
  const f1 = new Float64Array(n);
  const f2 = new Float64Array(n);
  // Stryker disable next-line ObjectLiteral: a scratch record; perezBrightnessKernel writes all five fields before f1 and f2 are read
  const b: PerezBrightness = { epsilon: 1, delta: 0, bin: 1, f1: 0, f2: 0 };
  for (let k = 0; k < hours.length; k++) {
    const i = hours[k];
    const a = altitude[i];
    if (!(a > 0) || !(dhi[i] > 0)) continue;
    perezBrightnessKernel(b, dhi[i], dni[i], dniExtraOfHour(i), 90 - a, airMassKastenYoungFromSine(a, sinAltitude[i]), PEREZ_1990_COMPOSITE);
    f1[i] = b.f1;
    f2[i] = b.f2;
  }
  return { f1, f2 };
}

/**
 * Checks a window plane once and returns its hourly irradiance function.
 * @param input - surface tilt [°] 0…180, surface azimuth [°] 0…360, albedo 0…1, sky model and the
 *   window's constant shade multipliers, each 0…1 (default 1); errors name the field as {@link planeIrradiance}
 * @returns {@link PreparedPlane}
 * @remarks Same kernel and formulas as {@link planeIrradiance} (see there); the caller supplies the
 * sun's sine and incidence cosine it already has, and the day's extraterrestrial irradiance.
 */
export function preparePlane(input: PlaneSurfaceInput): PreparedPlane {
  const tilt = requireRange('surfaceTilt', input.surfaceTilt, 0, 180, '°');
  requireRange('surfaceAzimuth', input.surfaceAzimuth, 0, 360, '°');
  const albedo = requireRange('groundAlbedo', input.groundAlbedo, 0, 1);
  const model = requireSkyModel(input.skyModel);
  const shade = input.shade === undefined ? NO_SHADE : requireShade({ ...input.shade, circumsolar: 1 });
  const plane = planeOf(tilt, albedo, model, shade);
  return {
    needsDniExtra: model !== 'isotropic' && model !== 'ashraeClearDay',
    irradiance: (out, dni, dhi, sunAltitude, sinAltitude, cosIncidence, dniExtra, circumsolar) => planeKernel(out, plane, dni, dhi, sunAltitude, sinAltitude, cosIncidence, dniExtra, circumsolar),
    perez: model === 'perez1990',
    irradianceShared: (out, dni, dhi, sunAltitude, sinAltitude, cosIncidence, dniExtra, circumsolar, shared, hour) => planeKernel(out, plane, dni, dhi, sunAltitude, sinAltitude, cosIncidence, dniExtra, circumsolar, shared, hour),
    irradianceRows: (rows, count, c, shared) => planeKernelRows(plane, rows, count, c, shared),
  };
}
