/**
 * Degree/radian conversion and clamped inverse trigonometry: the only place these live.
 *
 * Inverse cosine of 1.0000000002 is a classic NaN source; every inverse trig call in the core goes
 * through the clamped forms here.
 */
const { PI, asin, acos } = Math;

/** Radians per degree. */
export const RAD = PI / 180;
/** Degrees per radian. */
export const DEG = 180 / PI;

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
  const w = r < 0 ? r + 360 : r;
  return w >= 360 ? 0 : w; // a tiny negative angle plus 360 rounds to 360 itself
}

/** Reduces an angle to (−180, 180] [°]. */
export function wrap180(deg: number): number {
  const r = wrap360(deg);
  return r > 180 ? r - 360 : r;
}
