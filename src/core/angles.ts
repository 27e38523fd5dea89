/**
 * Degree/radian conversion and clamped inverse trigonometry: the only place these live.
 *
 * Inverse cosine of 1.0000000002 is a classic NaN source; every inverse trig call in the core goes
 * through the clamped forms here.
 */
const { PI, asin, acos, atan2 } = Math;

/** Radians per degree. */
export const RAD = PI / 180;
/** Degrees per radian. */
export const DEG = 180 / PI;

/** Degrees → radians. */
export function toRad(deg: number): number {
  return deg * RAD;
}

/** Radians → degrees. */
export function toDeg(rad: number): number {
  return rad * DEG;
}

/** asin with its argument clamped to [−1, 1] [rad]. */
export function asinClamped(x: number): number {
  return asin(x > 1 ? 1 : x < -1 ? -1 : x);
}

/** acos with its argument clamped to [−1, 1] [rad]. */
export function acosClamped(x: number): number {
  return acos(x > 1 ? 1 : x < -1 ? -1 : x);
}

/** Reduces an angle to [0, 360) [°]. */
export function wrap360(deg: number): number {
  const r = deg % 360;
  return r < 0 ? r + 360 : r === 360 ? 0 : r;
}

/** Reduces an angle to (−180, 180] [°]. */
export function wrap180(deg: number): number {
  const r = wrap360(deg);
  return r > 180 ? r - 360 : r;
}

/** atan2 in degrees reduced to [0, 360). */
export function atan2Deg360(y: number, x: number): number {
  return wrap360(atan2(y, x) * DEG);
}
