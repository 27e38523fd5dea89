/**
 * Angles between the sun and a surface: incidence angle, horizontal shadow angle (wall-solar
 * azimuth) and vertical shadow angle (profile angle).
 *
 * Conventions (docs/conventions.md#directions-and-angles): degrees; azimuths clockwise from true north, for the sun and for the
 * direction the surface faces (its outward normal); tilt 0 = horizontal facing up, 90 = vertical;
 * left and right as seen from outside, facing the window.
 *
 * Sources: Duffie, J. A. & Beckman, W. A., *Solar Engineering of Thermal Processes*, 4th ed. (Wiley
 * 2013), §1.6 (angle of incidence on a surface, Eq. 1.6.3) and §1.9 (profile angle, Eq. 1.9.1a);
 * ASHRAE Handbook—Fundamentals (2013), ch. 14 "Solar angles" (surface-solar azimuth γ = φ − ψ and
 * cos θ = cos β cos γ sin Σ + sin β cos Σ). Equation numbers are from memory.
 */
import { DEG, RAD, acosClamped, wrap180, requireRange } from '../common';

const { sin, cos, atan2 } = Math;

function requireSunAngles(sunAltitude: number, sunAzimuth: number): void {
  requireRange('sunAltitude', sunAltitude, -90, 90, '°');
  requireRange('sunAzimuth', sunAzimuth, 0, 360, '°');
}

function requireSurfaceAzimuth(surfaceAzimuth: number): void {
  requireRange('surfaceAzimuth', surfaceAzimuth, 0, 360, '°');
}

/**
 * Angle between the sun's direction and the surface's outward normal.
 * @param sunAltitude - sun altitude above the horizon [°], −90…90
 * @param sunAzimuth - sun azimuth clockwise from north [°], 0…360
 * @param surfaceTilt - tilt from horizontal [°], 0…180: 0 faces the sky, 90 is a vertical wall
 * @param surfaceAzimuth - direction the surface faces, clockwise from north [°], 0…360
 * @returns incidence angle [°], 0…180. 0: the sun is normal to the surface; above 90: the sun is
 *   behind the surface (no beam on it) — a documented result, not an error. The sun below the
 *   horizon is not checked here: use the altitude for that.
 * @remarks cos θ = sin β cos Σ + cos β sin Σ cos(φ − ψ), β sun altitude, Σ tilt, φ − ψ the
 *   surface-solar azimuth (Duffie & Beckman 4th ed. Eq. 1.6.3 with θz = 90° − β; ASHRAE
 *   Handbook—Fundamentals 2013 ch. 14).
 */
export function incidenceAngle(sunAltitude: number, sunAzimuth: number, surfaceTilt: number, surfaceAzimuth: number): number {
  requireSunAngles(sunAltitude, sunAzimuth);
  requireRange('surfaceTilt', surfaceTilt, 0, 180, '°');
  requireSurfaceAzimuth(surfaceAzimuth);
  const betaRad = sunAltitude * RAD;
  const tiltRad = surfaceTilt * RAD;
  const gammaRad = (sunAzimuth - surfaceAzimuth) * RAD;
  const cosTheta = sin(betaRad) * cos(tiltRad) + cos(betaRad) * sin(tiltRad) * cos(gammaRad); // D&B Eq. 1.6.3
  return acosClamped(cosTheta) * DEG;
}

/**
 * Horizontal shadow angle: the sun's azimuth relative to the surface's outward normal, signed by the
 * left/right convention.
 * @param sunAzimuth - sun azimuth clockwise from north [°], 0…360
 * @param surfaceAzimuth - direction the surface faces, clockwise from north [°], 0…360
 * @returns [°] in (−180, 180]: 0 when the sun is straight in front of the normal; POSITIVE when the
 *   sun is to the RIGHT as seen by someone outside facing the window (counter-clockwise from the
 *   normal seen from above), negative to the left. |γ| ≥ 90: the sun is in or behind the wall plane.
 * @remarks γ = ψ − φ reduced to (−180, 180], ψ surface azimuth, φ sun azimuth: the ASHRAE
 *   surface-solar azimuth (φ − ψ) with the sign reversed to match Sunpane's left/right convention.
 *   Example: a window facing south (180) with the morning sun in the east-south-east (120): the
 *   viewer outside faces north, so east is on the right: γ = +60.
 */
export function wallSolarAzimuth(sunAzimuth: number, surfaceAzimuth: number): number {
  requireRange('sunAzimuth', sunAzimuth, 0, 360, '°');
  requireSurfaceAzimuth(surfaceAzimuth);
  return wrap180(surfaceAzimuth - sunAzimuth);
}

/**
 * Vertical shadow angle (profile angle): the sun's altitude projected onto the vertical plane normal
 * to a vertical surface (the angle an overhang's shadow edge makes with the horizontal).
 * @param sunAltitude - sun altitude [°], −90…90
 * @param sunAzimuth - sun azimuth clockwise from north [°], 0…360
 * @param surfaceAzimuth - direction the (vertical) surface faces, clockwise from north [°], 0…360
 * @returns [°] in (−180, 180]. Sun in front of the wall (|γ| < 90): the textbook profile angle,
 *   −90…90 (negative when the sun is below the horizon). Sun in or behind the wall plane
 *   (|γ| ≥ 90): the same projection continued, |Ω| ≥ 90 (e.g. 90 for a sun in the wall plane,
 *   above 90 behind it) — always finite; callers that need "no value" test |γ| ≥ 90 or |Ω| ≥ 90.
 * @remarks tan Ω = tan β / cos γ (Duffie & Beckman 4th ed. Eq. 1.9.1a; ASHRAE Handbook—Fundamentals
 *   ch. 15 "vertical shadow angle"), evaluated as Ω = atan2(sin β, cos β cos γ), which is the same for
 *   cos γ > 0 and has no division by zero.
 */
export function profileAngle(sunAltitude: number, sunAzimuth: number, surfaceAzimuth: number): number {
  requireSunAngles(sunAltitude, sunAzimuth);
  requireSurfaceAzimuth(surfaceAzimuth);
  const betaRad = sunAltitude * RAD;
  const gammaRad = (sunAzimuth - surfaceAzimuth) * RAD;
  const omega = atan2(sin(betaRad), cos(betaRad) * cos(gammaRad)) * DEG; // D&B Eq. 1.9.1a
  return omega === -180 ? 180 : omega;
}

/**
 * Whether the sun is in front of a surface (beam can reach it).
 * @param incidence - incidence angle [°] from {@link incidenceAngle}
 * @returns true when the incidence angle is below 90°
 */
export function sunInFront(incidence: number): boolean {
  return incidence < 90;
}
