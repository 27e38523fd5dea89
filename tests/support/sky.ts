/** Shared helpers of the sun-position reference tests. */
import { RAD } from '../../src/core/common/angles';

/** Seeded linear congruential generator (Numerical Recipes constants): reproducible samples in [0, 1). */
export function seeded(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1_664_525) + 1_013_904_223) >>> 0;
    return state / 4_294_967_296;
  };
}

/** Angle between two directions given as altitude/azimuth [°] (chord formula, exact near the zenith). */
export function separation(alt1: number, az1: number, alt2: number, az2: number): number {
  const v = (alt: number, az: number) => [Math.cos(alt * RAD) * Math.sin(az * RAD), Math.cos(alt * RAD) * Math.cos(az * RAD), Math.sin(alt * RAD)];
  const [p, q] = [v(alt1, az1), v(alt2, az2)];
  return (2 * Math.asin(Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]) / 2)) / RAD;
}
