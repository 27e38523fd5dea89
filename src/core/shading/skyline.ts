/**
 * Skyline (horizon profile): elevation angles of neighbouring buildings and terrain by azimuth
 * sector, the beam test against it, and the sky view it leaves to a vertical window.
 *
 * A skyline is a list of n elevation angles [°] 0…90 for n equal azimuth sectors clockwise from
 * true north: sector k covers azimuths [k·360/n, (k+1)·360/n). The direct beam is blocked when the
 * sun's altitude is below the skyline elevation at the sun's azimuth.
 */
import { RAD, wrap180, wrap360, SunpaneError, requireFinite } from '../common';

const { PI, sin, floor } = Math;

/**
 * Checks a skyline: a non-empty list of finite elevations, each 0…90 °.
 * @param skyline - elevation angles [°] for equal azimuth sectors clockwise from north
 * @param argument - the name to use in the error (default `skyline`)
 * @returns the same list
 * @throws SunpaneError naming `argument` for an empty list or a value outside 0…90 °
 */
export function requireSkyline(skyline: unknown, argument = 'skyline'): readonly number[] {
  if (!Array.isArray(skyline) || skyline.length === 0) {
    throw new SunpaneError(argument, skyline, 'must be a list of at least one elevation angle from 0 to 90 °');
  }
  for (let k = 0; k < skyline.length; k++) {
    const v = skyline[k];
    if (typeof v !== 'number' || !(v >= 0 && v <= 90)) {
      throw new SunpaneError(argument, skyline, 'must hold elevation angles from 0 to 90 °', `value ${k + 1} is ${String(v)}`);
    }
  }
  return skyline as readonly number[];
}

/** Elevation of an already checked skyline at an azimuth [°] (any finite value; wrapped). */
export function skylineElevationUnchecked(skyline: readonly number[], azimuth: number): number {
  const n = skyline.length;
  const k = floor((wrap360(azimuth) * n) / 360);
  return skyline[k >= n ? n - 1 : k];
}

/**
 * The skyline's elevation angle at an azimuth.
 * @param skyline - elevation angles [°] 0…90 for n equal sectors clockwise from north, n ≥ 1
 * @param azimuth - compass azimuth [°], any finite value (wrapped to 0…360)
 * @returns the elevation [°] 0…90 of the sector holding `azimuth` (a sector includes its start
 * azimuth and excludes its end)
 */
export function skylineElevationAt(skyline: readonly number[], azimuth: number): number {
  requireSkyline(skyline);
  requireFinite('azimuth', azimuth, '°');
  return skylineElevationUnchecked(skyline, azimuth);
}

/**
 * Sky view left to a VERTICAL window by a skyline, as a multiplier on isotropic sky diffuse.
 *
 * @param skyline - elevation angles [°] 0…90 for n equal sectors clockwise from north, n ≥ 1
 * @param surfaceAzimuth - direction the window faces [°], clockwise from north, any finite value
 * @returns the multiplier 0…1: 1 for an open horizon (all elevations 0), 0 when every sector the
 * window can see rises to 90°. Sectors behind the wall do not count.
 *
 * @remarks View factor from a small plane element to a part of the sky (the definition of the
 * view factor between a differential area and a finite surface, F = (1/π)∫ cos θ dω, e.g.
 * Incropera & DeWitt, *Fundamentals of Heat and Mass Transfer*, ch. 13 "Radiation exchange between
 * surfaces", the view-factor integral; Siegel & Howell, *Thermal Radiation Heat Transfer*, ch. on
 * configuration factors — equation numbers from memory, not quoted). For a vertical element facing
 * azimuth S, a sky direction at altitude h and azimuth φ has cos θ = cos h · cos ψ with ψ = φ − S,
 * and dω = cos h dh dφ. Over one sector ψ ∈ [ψ1, ψ2] ⊂ [−90°, 90°] with the sky visible above
 * elevation α:
 *
 *   F = (1/π) · (sin ψ2 − sin ψ1) · (π/4 − α/2 − sin 2α / 4)      (α in radians)
 *
 * An open horizon gives F = 1/2 (the sky half of a vertical surface, (1 + cos 90°)/2), so the
 * multiplier is 2F summed over the visible sectors. The obstruction itself is taken as dark (its
 * reflected light is not counted). Verified against a numeric double integral in
 * tests/core/shading/skyline.test.ts.
 */
export function skylineSkyViewFactor(skyline: readonly number[], surfaceAzimuth: number): number {
  requireSkyline(skyline);
  requireFinite('surfaceAzimuth', surfaceAzimuth, '°');
  const n = skyline.length;
  const width = 360 / n;
  let sum = 0;
  for (let k = 0; k < n; k++) {
    const start = wrap180(k * width - surfaceAzimuth);
    const end = start + width;
    // A sector may run past +180°: split it there.
    let visible = sinSpan(start, end > 180 ? 180 : end);
    if (end > 180) visible += sinSpan(-180, end - 360);
    if (visible === 0) continue;
    const alphaRad = skyline[k] * RAD;
    sum += visible * (PI / 4 - alphaRad / 2 - sin(2 * alphaRad) / 4);
  }
  const multiplier = (2 / PI) * sum;
  return multiplier < 0 ? 0 : multiplier > 1 ? 1 : multiplier;
}

/** sin ψ2 − sin ψ1 over the part of [ψ1, ψ2] [°] that lies in front of the wall (−90…90°). */
function sinSpan(psi1: number, psi2: number): number {
  const a = psi1 < -90 ? -90 : psi1;
  const b = psi2 > 90 ? 90 : psi2;
  return b > a ? sin(b * RAD) - sin(a * RAD) : 0;
}
