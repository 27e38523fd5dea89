/**
 * Irradiance on a window plane from direct normal and diffuse horizontal irradiance: beam, sky
 * diffuse (isotropic, Hay–Davies or Perez 1990) and ground-reflected parts.
 */
import { airMassKastenYoungFromSine } from './airMass';
import { RAD, SunpaneError, requireRange } from '../common';
import { extraterrestrialSpencer, requireDayOfYear } from './extraterrestrial';
import { PEREZ_1990_COMPOSITE, type PerezParts, perezPartsKernel } from './perez1990';
import { incidenceAngle } from '../sun';
import { COS_85, requireIrradiance, verticalDiffuseRatioFromCosine } from './transposition';

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
  /** Multiplier 0…1 on the sky diffuse for a skyline that hides part of the sky; default 1 (open). */
  skyViewFactor?: number;
}

/** Irradiance on the window plane [W/m²] and the incidence angle [°]. */
export interface PlaneIrradiance {
  /** Beam on the plane, DNI · max(0, cos θ) [W/m²]; 0 with the sun below the horizon or behind the plane. */
  beam: number;
  /** Sky diffuse on the plane, after the sky view factor [W/m²]. */
  sky: number;
  /** Ground-reflected on the plane [W/m²]. */
  ground: number;
  /** beam + sky + ground [W/m²]. */
  total: number;
  /** Incidence angle of the sun on the plane [°], 0…180 (> 90: sun behind the plane). */
  incidence: number;
}

/**
 * Irradiance on a window plane by the chosen sky model.
 *
 * @param input - see {@link PlaneIrradianceInput}; errors name the field (`dni`, `groundAlbedo`, `skyModel`...)
 * @returns beam, sky diffuse, ground-reflected and total irradiance on the plane [W/m²] and the
 * incidence angle [°]. With the sun at or below the horizon the beam is 0 and any diffuse given is
 * spread isotropically by every model (no circumsolar disc); with the sun behind the plane
 * (incidence > 90°) the beam and circumsolar parts are 0.
 * @remarks beam = DNI max(0, cos θ); GHI = DNI sin β + DHI (sun up); ground = GHI ρg (1 − cos Σ)/2;
 * sky by {@link skyDiffuseIsotropic}, {@link skyDiffuseHayDavies}, {@link skyDiffusePerez1990} or the
 * handbook's clear-day form Ed·(Y sin Σ + cos Σ) for Σ ≤ 90°, Ed·Y·sin Σ beyond
 * ({@link skyDiffuseAshraeClearDay}; with the sun down it falls back to isotropic),
 * with E0n by Spencer (1971) and m by Kasten & Young (1989), then × skyViewFactor. (Duffie & Beckman,
 * Solar Engineering of Thermal Processes, 4th ed., §2.15–2.16.)
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
  const svf = input.skyViewFactor === undefined ? 1 : requireRange('skyViewFactor', input.skyViewFactor, 0, 1);

  const incidence = incidenceAngle(altitude, sunAzimuth, tilt, surfaceAzimuth);
  const plane = planeOf(tilt, albedo, model, svf);
  const out = { beam: 0, sky: 0, ground: 0, total: 0, incidence };
  const e0 = model === 'isotropic' || model === 'ashraeClearDay' ? 0 : extraterrestrialSpencer(dayOfYear);
  planeKernel(out, plane, dni, dhi, altitude, sin(altitude * RAD), cos(incidence * RAD), e0);
  return out;
}

function requireSkyModel(model: SkyModel): SkyModel {
  if (!SKY_MODELS.includes(model)) {
    throw new SunpaneError('skyModel', model, `must be one of ${SKY_MODELS.map((m) => `"${m}"`).join(', ')}`);
  }
  return model;
}

/** The hour-independent part of a plane: its tilt's view factors, albedo, sky model and sky view. */
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
  skyViewFactor: number;
  /** Scratch record for the Perez parts (one per plane: no allocation per hour). */
  perez: PerezParts;
}

function planeOf(tilt: number, albedo: number, model: SkyModel, skyViewFactor: number): PlaneConstants {
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
    skyViewFactor,
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
}

/**
 * The one implementation of the plane irradiance, behind {@link planeIrradiance} and
 * {@link preparePlane}: inputs already checked, the sun given by its altitude, the sine of the
 * altitude and the cosine of the incidence angle; writes `out`.
 */
function planeKernel(out: PlaneParts, p: PlaneConstants, dni: number, dhi: number, altitude: number, sinAltitude: number, cosIncidence: number, dniExtra: number): void {
  const sunUp = altitude > 0;
  const beam = sunUp && cosIncidence > 0 ? dni * cosIncidence : 0;
  const ghi = (sunUp ? dni * sinAltitude : 0) + dhi;
  let sky: number;
  if (!sunUp || p.model === 'isotropic') {
    sky = dhi * p.isotropicView; // D&B Eq. 2.15.1
  } else if (p.model === 'ashraeClearDay') {
    sky = dhi * (verticalDiffuseRatioFromCosine(cosIncidence) * p.sinTilt + p.cosTiltUp); // ASHRAE ch. 14 clear-day tilted form
  } else if (p.model === 'hayDavies') {
    const ai = dni / dniExtra < 1 ? dni / dniExtra : 1;
    const rb = (cosIncidence > 0 ? cosIncidence : 0) / (sinAltitude > COS_85 ? sinAltitude : COS_85);
    sky = dhi * ((1 - ai) * p.isotropicView + ai * rb); // D&B Eq. 2.16.4
  } else {
    sky = perezPartsKernel(p.perez, p.isotropicView, p.sinTilt, dhi, dni, dniExtra, 90 - altitude, sinAltitude, airMassKastenYoungFromSine(altitude, sinAltitude), cosIncidence, PEREZ_1990_COMPOSITE).total;
  }
  sky *= p.skyViewFactor;
  const ground = (ghi * p.albedo * p.oneMinusCosTilt) / 2; // D&B Eq. 2.15.1
  out.beam = beam;
  out.sky = sky;
  out.ground = ground;
  out.total = beam + sky + ground;
}

/** The plane fields of {@link PlaneIrradianceInput}: everything that does not change by the hour. */
export type PlaneSurfaceInput = Pick<PlaneIrradianceInput, 'surfaceTilt' | 'surfaceAzimuth' | 'groundAlbedo' | 'skyModel' | 'skyViewFactor'>;

/** A window plane checked once, for the irradiance of many hours (e.g. every hour of a year). */
export interface PreparedPlane {
  /** Whether the sky model needs the extraterrestrial irradiance (Hay–Davies, Perez). */
  readonly needsDniExtra: boolean;
  /**
   * Irradiance on the plane for one hour, the same as {@link planeIrradiance} for the prepared plane,
   * without argument checks, written into `out`.
   * @param out - record to fill (beam, sky, ground, total [W/m²])
   * @param dni - direct normal irradiance [W/m²], 0…2000 (not checked)
   * @param dhi - diffuse horizontal irradiance [W/m²], 0…2000 (not checked)
   * @param sunAltitude - [°] −90…90 (not checked)
   * @param sinAltitude - sin of the altitude [-]
   * @param cosIncidence - cos of the incidence angle on the plane [-], −1…1
   * @param dniExtra - extraterrestrial normal irradiance of the day [W/m²] (Spencer 1971, as
   *   {@link planeIrradiance} uses); any value when {@link needsDniExtra} is false
   */
  irradiance(out: PlaneParts, dni: number, dhi: number, sunAltitude: number, sinAltitude: number, cosIncidence: number, dniExtra: number): void;
}

/**
 * Checks a window plane once and returns its hourly irradiance function.
 * @param input - surface tilt [°] 0…180, surface azimuth [°] 0…360, albedo 0…1, sky model and sky
 *   view factor 0…1 (default 1); errors name the field as {@link planeIrradiance}
 * @returns {@link PreparedPlane}
 * @remarks Same kernel and formulas as {@link planeIrradiance} (see there); the caller supplies the
 * sun's sine and incidence cosine it already has, and the day's extraterrestrial irradiance.
 */
export function preparePlane(input: PlaneSurfaceInput): PreparedPlane {
  const tilt = requireRange('surfaceTilt', input.surfaceTilt, 0, 180, '°');
  requireRange('surfaceAzimuth', input.surfaceAzimuth, 0, 360, '°');
  const albedo = requireRange('groundAlbedo', input.groundAlbedo, 0, 1);
  const model = requireSkyModel(input.skyModel);
  const svf = input.skyViewFactor === undefined ? 1 : requireRange('skyViewFactor', input.skyViewFactor, 0, 1);
  const plane = planeOf(tilt, albedo, model, svf);
  return {
    needsDniExtra: model !== 'isotropic' && model !== 'ashraeClearDay',
    irradiance: (out, dni, dhi, sunAltitude, sinAltitude, cosIncidence, dniExtra) => planeKernel(out, plane, dni, dhi, sunAltitude, sinAltitude, cosIncidence, dniExtra),
  };
}
