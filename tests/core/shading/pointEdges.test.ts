/**
 * Glass points on the edges of the opening (src/core/shading/viewFactors.ts, `pointViewFactors`):
 * the sill (y = 0), the head (y = height) and the jambs (x = 0, x = width) are accepted, so they must
 * give what geometry says.
 * Checks are stated geometric properties, derived here (no published values exist for them):
 * - Without a reveal, nothing in any direction changes as a point moves a nanometre off the sill, the
 *   head or a jamb when no device edge passes through it, so the view factors are continuous there.
 * - An overhang with no gap lies in the horizontal plane of a point on the head: every upward ray
 *   leaves that plane at once, above the plate, so the point sees the sky as if the overhang were
 *   absent (it blocks nothing below the horizontal either).
 * The mutation run of lines 1–436 found these edges unchecked (a point on an edge of an opening
 * without a reveal divided 0 by 0 if the code's reveal test admitted a depth of 0).
 */
import { pointViewFactors } from '../../../src/core/shading/viewFactors';
import type { Shading } from '../../../src/core/shading/types';
import { EVERY_DEVICE_SHADING, EVERY_DEVICE_WINDOW } from '../../support/shadedWindow';

const { abs } = Math;
const WINDOW = EVERY_DEVICE_WINDOW;
/** The every-device window without its reveal: its head and sill are the wall's edge. */
const NO_REVEAL: Shading = { ...structuredClone(EVERY_DEVICE_SHADING), revealDepth: 0 };

describe('points on the edges of a window without a reveal', () => {
  const W = WINDOW.width;
  const H = WINDOW.height;
  const along = [0.2, 0.5, 0.8];
  test.each([
    { edge: 'sill', points: along.map((f) => ({ on: [f * W, 0], near: [f * W, 1e-9] })) },
    { edge: 'head', points: along.map((f) => ({ on: [f * W, H], near: [f * W, H - 1e-9] })) },
    { edge: 'left jamb', points: along.map((f) => ({ on: [0, f * H], near: [1e-9, f * H] })) },
    { edge: 'right jamb', points: along.map((f) => ({ on: [W, f * H], near: [W - 1e-9, f * H] })) },
  ])('on the $edge: the same view factors as a point a nanometre inside (within 1e-6)', ({ points }) => {
    for (const { on: [x, y], near: [xi, yi] } of points) {
      for (const azimuth of [180, 250]) {
        const on = pointViewFactors(WINDOW, NO_REVEAL, azimuth, x, y);
        const near = pointViewFactors(WINDOW, NO_REVEAL, azimuth, xi, yi);
        expect(on.sky).toBeGreaterThan(0.05);
        expect(on.ground).toBeGreaterThan(0.05);
        expect(abs(on.sky - near.sky)).toBeLessThan(1e-6);
        expect(abs(on.ground - near.ground)).toBeLessThan(1e-6);
        expect(abs(on.horizonShare - near.horizonShare)).toBeLessThan(1e-6);
      }
    }
  });
});

describe('a point on the head under an overhang with no gap', () => {
  // No reveal (a reveal's head soffit and the wall above it hide the sky from the head itself); a left
  // fin in both, so that neither is the bare window's shortcut.
  test('sees the sky and the ground as if the overhang were absent (within 1e-5)', () => {
    const flush: Shading = { overhang: { projection: 0.8, gap: 0, extensionLeft: 0.2, extensionRight: 0.2 } };
    const without: Shading = { leftFin: { projection: 0.3, gap: 0, extensionAbove: 0, extensionBelow: 0 } };
    flush.leftFin = without.leftFin;
    for (const x of [0.2, 1, 1.8]) {
      const a = pointViewFactors(WINDOW, flush, 180, x, WINDOW.height);
      const b = pointViewFactors(WINDOW, without, 180, x, WINDOW.height);
      expect(abs(a.sky - b.sky)).toBeLessThan(1e-5);
      expect(abs(a.ground - b.ground)).toBeLessThan(1e-5);
      // And a point just below is under the plate: its sky is cut.
      expect(pointViewFactors(WINDOW, flush, 180, x, WINDOW.height - 0.05).sky).toBeLessThan(b.sky - 0.05);
    }
  });
});
