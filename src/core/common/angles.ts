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
  return r < 0 ? r + 360 : r === 360 ? 0 : r;
}

/** Reduces an angle to (−180, 180] [°]. */
export function wrap180(deg: number): number {
  const r = wrap360(deg);
  return r > 180 ? r - 360 : r;
}


/**
 * atan2(y, x) [rad] in [−π, π] as Math.atan2 within a few ulps (0 when both are ±0), inlined in the
 * hourly loops instead of Math.atan2 (which the engine calls out of line). Accurate enough that the
 * sines and cosines taken from the components match the angles (as the annual sun path does).
 * @param y - ordinate, any finite value
 * @param x - abscissa, any finite value
 * @returns the angle [rad]
 * @remarks With t = min(|x|, |y|) / max(|x|, |y|): above tan 15°, atan t = 30° + atan((√3 t − 1)/(√3 + t));
 *   then the Maclaurin series to u²⁵ (|u| ≤ tan 15° = 0.268: truncation below u²⁷/27 < 2e-17).
 */
export function atan2Fast(y: number, x: number): number {
  const ax = x < 0 ? -x : x;
  const ay = y < 0 ? -y : y;
  if (ax === 0 && ay === 0) return 0;
  const steep = ay > ax;
  let t = steep ? ax / ay : ay / ax;
  let base = 0;
  if (t > 0.2679491924311227) {
    t = (1.7320508075688772 * t - 1) / (1.7320508075688772 + t); // √3 = 1.7320508075688772
    base = Math.PI / 6;
  }
  const u2 = t * t;
  const tail = u2 * (1 / 17 + u2 * (-1 / 19 + u2 * (1 / 21 + u2 * (-1 / 23 + u2 / 25))));
  let r = base + t * (1 + u2 * (-1 / 3 + u2 * (1 / 5 + u2 * (-1 / 7 + u2 * (1 / 9 + u2 * (-1 / 11 + u2 * (1 / 13 + u2 * (-1 / 15 + tail))))))));
  if (steep) r = Math.PI / 2 - r;
  if (x < 0) r = Math.PI - r;
  return y < 0 ? -r : r;
}
