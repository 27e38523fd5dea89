/**
 * An overhang that lies wholly beside the glass (its extension on one side below minus the window's
 * width: it covers the next bay only) still shades the glass when the sun from that side throws its
 * shadow across. The point test's quick overlap box (sunlit.ts) must reach from the overhang to its
 * shadow, x + dx, on the side the shadow moves; a survivor of the mutation run (`xl − dx`, `xr − dx`)
 * cut the box back to the overhang itself and let the shadow be skipped.
 *
 * Hand-worked geometry (elementary, no source needed beyond the shadow construction of
 * docs/conventions.md): a 1 × 1 window; overhang at the head (gap 0), projection P = 2, over
 * x ∈ [1.2, 2]; sun with tan γ = a = 0.5 (to the right) and tan Ω = b = 0.2. The overhang's edge moves
 * by (−a·P, −b·P) = (−1, −0.4), so its shadow is the parallelogram between y = 0.6 and y = 1 whose
 * left side runs from (0.2, 0.6) to (1.2, 1): x = 0.2 + 2.5 (y − 0.6). A glass point is shaded when
 * 0.6 < y and x > 0.2 + 2.5 (y − 0.6). The shaded area is ∫ from 0 to 0.32 of (0.8 − 2.5u) du =
 * 0.256 − 0.128 = 0.128, so the sunlit fraction is 0.872.
 */
import { pointSunlit, sunlitFraction } from '../../../src/core/shading/sunlit';
import { sunFromSlopes } from '../../support/sunFromSlopes';

const window = { width: 1, height: 1 };

describe('an overhang over the next bay, its shadow thrown across the glass', () => {
  const right = { overhang: { projection: 2, gap: 0, extensionLeft: -1.2, extensionRight: 1 } };
  // The mirror image: the overhang over x ∈ [−1, −0.2], the sun to the left (a = −0.5).
  const left = { overhang: { projection: 2, gap: 0, extensionLeft: 1, extensionRight: -1.2 } };

  test.each([
    ['right', right, 0.5, (x: number) => x],
    ['left', left, -0.5, (x: number) => 1 - x],
  ] as const)('beside the %s jamb: points shaded and lit as the hand-worked shadow says', (_side, shading, a, mirror) => {
    const sun = sunFromSlopes(a, 0.2);
    // [x, y, lit?] in the frame of the right-hand case (mirrored for the left one).
    const points: Array<[number, number, 0 | 1]> = [
      [0.9, 0.7, 0], // edge at y = 0.7 is x = 0.45
      [0.5, 0.7, 0],
      [0.3, 0.7, 1],
      [0.97, 0.9, 0], // edge at y = 0.9 is x = 0.95
      [0.93, 0.9, 1],
      [0.9, 0.5, 1], // below the shadow
      [0.99, 0.95, 1], // edge at 1.075: past the glass
    ];
    for (const [x, y, lit] of points) {
      expect([x, y, pointSunlit(window, shading, mirror(x), y, sun.altitude, sun.azimuth, 180)]).toEqual([x, y, lit]);
    }
  });

  test.each([
    ['right', right, 0.5],
    ['left', left, -0.5],
  ] as const)('beside the %s jamb: the whole glass is 0.872 sunlit (area worked by hand)', (_side, shading, a) => {
    const sun = sunFromSlopes(a, 0.2);
    expect(Math.abs(sunlitFraction(window, shading, sun.altitude, sun.azimuth, 180) - 0.872)).toBeLessThan(1e-9);
  });
});
