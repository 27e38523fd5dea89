/**
 * Source: the published catalogue of radiation configuration factors — J. R. Howell, *A Catalog of
 * Radiation Heat Transfer Configuration Factors* (also the appendix of Siegel & Howell, *Thermal
 * Radiation Heat Transfer*, 4th ed., p. 842 for the strip cases). Cases used:
 *
 * - Section B, differential strip to a PARALLEL rectangle, the strip lying under one edge of the
 *   rectangle: published worked value F = 0.3886 for a rectangle a = 3 by b = 2 at c = 0.5, the strip
 *   of length b along the edge (value as printed with that reference's example; 4 decimals).
 * - Section B, differential strip to a PERPENDICULAR rectangle, the strip parallel to the line where
 *   the planes meet: published worked value F = 0.2153 for a rectangle of height a = 1 (out of the
 *   strip's plane) and length b = 2, at c = 0.5 from the strip (4 decimals).
 * - C-11, identical, parallel, directly opposed rectangles (from memory, formula below).
 * - C-14, two rectangles of the same length with one common edge at 90° to each other (from memory).
 *
 * The two recalled formulas are held to the enclosure rule before use: the faces of a cube must add
 * up to 1 (4 × adjacent + 1 × opposite), which a mis-remembered term would break.
 *
 * How they map onto a window (coordinates seen from outside; docs/diffuse-shading.md):
 * - the glass set back R behind the wall face sees the sky through the upper part of the opening and
 *   the ground through the lower part; a point on the sill line sees the sky through the whole
 *   opening, a rectangle parallel to the glass at distance R — the parallel-strip case with a = H,
 *   b = W, c = R; and the whole glass sees sky and ground each through half of the C-11 factor
 *   (the set-up is symmetric top to bottom);
 * - an overhang is a rectangle perpendicular to the wall: points a distance D below it see it as
 *   the perpendicular-strip case with a = P, b = its length, c = D, and the sky left to them is
 *   ½ − F; an overhang as wide as the window at gap 0 shares the head as a common edge (C-14);
 * - a fin at gap 0, as tall as the window, shares a jamb (C-14) and takes half its view from the
 *   sky and half from the ground.
 *
 * Tolerances: the published values are rounded to 4 decimals (±0.00005); the strip averages are
 * taken over 400 midpoints of Sunpane's point view factor (a smooth function of x; midpoint error
 * below 1e-6). The glass averages are held to Sunpane's stated numerical error, 0.002.
 */
import { pointViewFactors, windowViewFactors } from '../../src/core/shading/viewFactors';

const { atan, sqrt, log, PI } = Math;

/** C-11 (from memory): directly opposed identical rectangles X × Y at distance L. */
function parallelRectangles(X: number, Y: number, L: number): number {
  const x = X / L;
  const y = Y / L;
  const a = log(sqrt(((1 + x * x) * (1 + y * y)) / (1 + x * x + y * y)));
  const b = x * sqrt(1 + y * y) * atan(x / sqrt(1 + y * y)) + y * sqrt(1 + x * x) * atan(y / sqrt(1 + x * x));
  return (2 / (PI * x * y)) * (a + b - x * atan(x) - y * atan(y));
}

/**
 * C-14 (from memory): from rectangle i (common edge X, width Y) to rectangle j (common edge X,
 * width Z) at 90°.
 */
function perpendicularRectangles(X: number, Y: number, Z: number): number {
  const h = Z / X;
  const w = Y / X;
  const hw = h * h + w * w;
  const t1 = ((1 + w * w) * (1 + h * h)) / (1 + hw);
  const t2 = ((w * w * (1 + hw)) / ((1 + w * w) * hw)) ** (w * w);
  const t3 = ((h * h * (1 + hw)) / ((1 + h * h) * hw)) ** (h * h);
  return (1 / (PI * w)) * (w * atan(1 / w) + h * atan(1 / h) - sqrt(hw) * atan(1 / sqrt(hw)) + 0.25 * log(t1 * t2 * t3));
}

/** Average of f over [0, b] by the midpoint rule. */
function stripAverage(f: (x: number) => number, b: number, n = 400): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += f(((i + 0.5) / n) * b);
  return s / n;
}

describe('the recalled catalogue formulas pass the enclosure rule', () => {
  test('a cube: 4 adjacent faces (C-14) + the opposite face (C-11) = 1', () => {
    const adjacent = perpendicularRectangles(1, 1, 1);
    const opposite = parallelRectangles(1, 1, 1);
    expect(adjacent).toBeCloseTo(0.2, 3);
    expect(opposite).toBeCloseTo(0.1998, 4);
    expect(4 * adjacent + opposite).toBeCloseTo(1, 10);
  });

  test('a long box 1 × 2 × 3: the faces seen from one face add up to 1', () => {
    // From the 1 × 2 face (edges 1 and 2), depth 3: opposite face, two 1 × 3 and two 2 × 3 side faces.
    const opposite = parallelRectangles(1, 2, 3);
    const sidesOnEdge1 = perpendicularRectangles(1, 2, 3); // common edge of length 1
    const sidesOnEdge2 = perpendicularRectangles(2, 1, 3); // common edge of length 2
    expect(opposite + 2 * sidesOnEdge1 + 2 * sidesOnEdge2).toBeCloseTo(1, 10);
  });
});

describe('catalogue configuration factors against Sunpane', () => {
  test('strip to a parallel rectangle (published 0.3886): sill line of a 2 × 3 window set back 0.5', () => {
    const window = { width: 2, height: 3 };
    const shading = { revealDepth: 0.5 };
    const sky = stripAverage((x) => pointViewFactors(window, shading, 180, x, 0).sky, 2);
    expect(Math.abs(sky - 0.3886)).toBeLessThan(0.00006);
    // and the sill line sees no ground at all
    expect(pointViewFactors(window, shading, 180, 0.7, 0).ground).toBe(0);
  });

  test('strip to a perpendicular rectangle (published 0.2153): 0.5 below an overhang 1 deep, 2 long', () => {
    const window = { width: 2, height: 1.5 };
    const shading = { overhang: { projection: 1, gap: 0, extensionLeft: 0, extensionRight: 0 } };
    const sky = stripAverage((x) => pointViewFactors(window, shading, 180, x, 1.0).sky, 2);
    expect(Math.abs(sky - (0.5 - 0.2153))).toBeLessThan(0.00006);
  });

  test.each([
    [1.2, 1.5, 0.1],
    [2.4, 2.1, 0.15],
    [1.0, 1.0, 1.0],
    [3.0, 1.8, 0.4],
    [0.6, 2.0, 0.3],
  ])('C-11: a %p × %p window set back %p sees sky and ground each through half the opening factor', (W, H, R) => {
    const vf = windowViewFactors({ width: W, height: H }, { revealDepth: R }, 180);
    const half = parallelRectangles(W, H, R) / 2;
    expect(Math.abs(vf.sky - half)).toBeLessThan(0.002);
    expect(Math.abs(vf.ground - half)).toBeLessThan(0.002);
  });

  test.each([
    [1.2, 1.5, 1.0],
    [3.0, 1.8, 0.8],
    [1.0, 2.4, 0.3],
    [2.0, 0.8, 2.5],
  ])('C-14: a %p × %p window under an overhang %p deep, as wide as the window, at the head', (W, H, P) => {
    const vf = windowViewFactors({ width: W, height: H }, { overhang: { projection: P, gap: 0, extensionLeft: 0, extensionRight: 0 } }, 180);
    expect(Math.abs(vf.sky - (0.5 - perpendicularRectangles(W, H, P)))).toBeLessThan(0.002);
    expect(vf.ground).toBeCloseTo(0.5, 12);
  });

  test.each([
    [1.2, 1.5, 0.5],
    [2.4, 1.0, 1.2],
    [0.8, 2.2, 0.3],
  ])('C-14: a %p × %p window between two fins %p deep at the jambs, as tall as the window', (W, H, P) => {
    const fin = { projection: P, gap: 0, extensionAbove: 0, extensionBelow: 0 };
    const one = windowViewFactors({ width: W, height: H }, { leftFin: fin }, 180);
    const F = perpendicularRectangles(H, W, P); // common edge: the jamb, of length H
    expect(Math.abs(one.sky - (0.5 - F / 2))).toBeLessThan(0.002);
    expect(Math.abs(one.ground - (0.5 - F / 2))).toBeLessThan(0.002);
    const two = windowViewFactors({ width: W, height: H }, { leftFin: fin, rightFin: { ...fin } }, 180);
    expect(Math.abs(two.sky - (0.5 - F))).toBeLessThan(0.002);
  });
});
