/**
 * Limits of the skyline's sky view (src/core/shading/skyline.ts) where rounding would carry the sum of
 * the sectors just past them.
 *
 * Source: the view factor from a plane element to a set of directions, F = (1/π) ∫ cos θ dω over
 * those directions (Incropera & DeWitt, *Fundamentals of Heat and Mass Transfer*, ch. 13, the
 * view-factor integral; from memory): an integral of a non-negative integrand over part of the
 * sky, so 0 ≤ F ≤ F(whole sky) = ½ for a vertical element, and the multiplier 2F lies in 0…1 —
 * exactly 1 for an open horizon and exactly 0 for a horizon that rises to 90° all round, as the
 * function documents. The sector sums below (3 open sectors on a wall facing 14.6°, one sector at
 * 90°) come out at 1 + 2e-16 and −4e-17 before the limits are applied.
 */
import { skylineSkyViewFactor } from '../../../src/core/shading/skyline';

describe('skylineSkyViewFactor stays within 0…1', () => {
  test('an open horizon cut into sectors gives exactly 1, never more', () => {
    for (const [sectors, surfaceAzimuth] of [
      [3, 14.6],
      [3, 51.1],
      [2, 284.7],
      [1, 0],
      [36, 123],
    ]) {
      const open = new Array<number>(sectors).fill(0);
      expect(skylineSkyViewFactor(open, surfaceAzimuth)).toBe(1);
    }
  });

  test('a horizon at 90° all round gives exactly 0, never less', () => {
    for (const [sectors, surfaceAzimuth] of [
      [1, 0],
      [1, 11],
      [4, 200],
    ]) {
      expect(skylineSkyViewFactor(new Array<number>(sectors).fill(90), surfaceAzimuth)).toBe(0);
    }
  });
});
