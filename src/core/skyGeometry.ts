/**
 * Sun–surface geometry used inside the sky models (internal to the sky modules).
 *
 * Note: the public incidence angle belongs to surface.ts; this private cosine stays here only until
 * that module is on main, then the sky modules switch to it.
 */
import { RAD } from './angles';

const { cos, sin } = Math;

/**
 * Cosine of the incidence angle between the sun's rays and a surface normal.
 *
 * @remarks cos θ = cos z cos Σ + sin z sin Σ cos(γs − γ), z = 90° − altitude (Duffie & Beckman,
 * Solar Engineering of Thermal Processes, 4th ed., Eq. 1.6.3 in zenith form; from memory).
 */
export function cosIncidence(sunAltitude: number, sunAzimuth: number, surfaceTilt: number, surfaceAzimuth: number): number {
  const altitudeRad = sunAltitude * RAD;
  const tiltRad = surfaceTilt * RAD;
  const c = sin(altitudeRad) * cos(tiltRad) + cos(altitudeRad) * sin(tiltRad) * cos((sunAzimuth - surfaceAzimuth) * RAD);
  return c > 1 ? 1 : c < -1 ? -1 : c;
}
