/**
 * A fin that starts above the head (extension below the sill negative) still shades the glass when
 * its shadow falls down onto it: shadowPlan.ts's quick overlap test must use the shadow's lowest
 * point y_b − b·P (a survivor of its mutation run, `b / P`, let that shadow be skipped).
 */
import { sunlitFraction } from '../../../src/core/shading/sunlit';
import { sunFromSlopes } from '../../support/sunFromSlopes';

test('a left fin from 1.2 to 2 above a 1 × 1 window casts the hand-worked 0.05 onto it (a = −0.5, b = 0.2, P = 2)', () => {
  // Shadow of the fin edge x = 0, y ∈ [1.2, 2] shifted by (−a·P, −b·P) = (1, −0.4): over the glass its
  // lower edge runs from (0, 1.2) to (1, 0.8), so the shaded part is ∫ from 0.5 to 1 of (1 − (1.2 − 0.4x)) dx
  // = [0.2x² − 0.2x] from 0.5 to 1 = 0.05 (elementary integration, worked by hand).
  // Sun: tan γ = a = −0.5 (γ < 0: the sun to the left seen from outside), tan Ω = tan β / cos γ = b = 0.2.
  const sun = sunFromSlopes(-0.5, 0.2);
  const shading = { leftFin: { projection: 2, gap: 0, extensionAbove: 1, extensionBelow: -1.2 } };
  const f = sunlitFraction({ width: 1, height: 1 }, shading, sun.altitude, sun.azimuth, 180);
  expect(Math.abs(f - 0.95)).toBeLessThan(1e-9);
});

test('the mirror image: a right fin from 1.2 to 2 above a 1 × 1 window with the sun to the right casts 0.05 (a = 0.5, b = 0.2, P = 2)', () => {
  // The fin edge x = 1 shifted by (−a·P, −b·P) = (−1, −0.4): its lower edge runs from (1, 1.2) to (0, 0.8),
  // the mirror of the case above, so the shaded part is the same 0.05 (worked by hand as above).
  const sun = sunFromSlopes(0.5, 0.2);
  const shading = { rightFin: { projection: 2, gap: 0, extensionAbove: 1, extensionBelow: -1.2 } };
  const f = sunlitFraction({ width: 1, height: 1 }, shading, sun.altitude, sun.azimuth, 180);
  expect(Math.abs(f - 0.95)).toBeLessThan(1e-9);
});
