/**
 * Irradiance on a window plane from direct normal and diffuse horizontal irradiance: beam, sky
 * diffuse (isotropic, Hay–Davies or Perez 1990) and ground-reflected parts.
 */
import { airMassKastenYoung } from './airMass';
import { RAD } from './angles';
import { SunpaneError, requireRange } from './errors';
import { extraterrestrialSpencer, requireDayOfYear } from './extraterrestrial';
import { perezParts } from './perez1990';
import { incidenceAngle } from './surface';
import { COS_85, requireIrradiance } from './transposition';
import type { SkyModel } from './window';

const { cos, sin } = Math;

/** The sky-diffuse models {@link planeIrradiance} accepts. */
export const SKY_MODELS: readonly SkyModel[] = Object.freeze(['isotropic', 'hayDavies', 'perez1990'] as SkyModel[]);

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
  albedo: number;
  /** Day of the year, 1…366 (extraterrestrial irradiance for Hay–Davies and Perez). */
  dayOfYear: number;
  /** Sky-diffuse model. */
  model: SkyModel;
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
 * @param input - see {@link PlaneIrradianceInput}; errors name the field (`dni`, `albedo`, `model`...)
 * @returns beam, sky diffuse, ground-reflected and total irradiance on the plane [W/m²] and the
 * incidence angle [°]. With the sun at or below the horizon the beam is 0 and any diffuse given is
 * spread isotropically by every model (no circumsolar disc); with the sun behind the plane
 * (incidence > 90°) the beam and circumsolar parts are 0.
 * @remarks beam = DNI max(0, cos θ); GHI = DNI sin β + DHI (sun up); ground = GHI ρg (1 − cos Σ)/2;
 * sky by {@link skyDiffuseIsotropic}, {@link skyDiffuseHayDavies} or {@link skyDiffusePerez1990},
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
  const albedo = requireRange('albedo', input.albedo, 0, 1);
  const dayOfYear = requireDayOfYear(input.dayOfYear);
  const model = input.model;
  if (!SKY_MODELS.includes(model)) {
    throw new SunpaneError('model', model, `must be one of ${SKY_MODELS.map((m) => `"${m}"`).join(', ')}`);
  }
  const svf = input.skyViewFactor === undefined ? 1 : requireRange('skyViewFactor', input.skyViewFactor, 0, 1);

  const incidence = incidenceAngle(altitude, sunAzimuth, tilt, surfaceAzimuth);
  const cosTheta = cos(incidence * RAD);
  const tiltRad = tilt * RAD;
  const isotropicView = (1 + cos(tiltRad)) / 2;
  const sunUp = altitude > 0;
  const beam = sunUp && cosTheta > 0 ? dni * cosTheta : 0;
  const ghi = (sunUp ? dni * sin(altitude * RAD) : 0) + dhi;

  let sky: number;
  if (!sunUp || model === 'isotropic') {
    sky = dhi * isotropicView; // D&B Eq. 2.15.1
  } else if (model === 'hayDavies') {
    const e0 = extraterrestrialSpencer(dayOfYear);
    const ai = dni / e0 < 1 ? dni / e0 : 1;
    const cosZ = sin(altitude * RAD);
    const rb = (cosTheta > 0 ? cosTheta : 0) / (cosZ > COS_85 ? cosZ : COS_85);
    sky = dhi * ((1 - ai) * isotropicView + ai * rb); // D&B Eq. 2.16.4
  } else {
    const e0 = extraterrestrialSpencer(dayOfYear);
    sky = perezParts(tilt, surfaceAzimuth, dhi, dni, e0, 90 - altitude, sunAzimuth, airMassKastenYoung(altitude)).total;
  }
  sky *= svf;
  const ground = (ghi * albedo * (1 - cos(tiltRad))) / 2; // D&B Eq. 2.15.1
  return { beam, sky, ground, total: beam + sky + ground, incidence };
}
