/**
 * Source: three.js 0.187.0 (npm `three`, pinned in package.json) — its `Ray.intersectTriangle`
 * (Möller–Trumbore ray/triangle test), on the scene of tests/reference/raycast-scene.ts; which rays
 * reach the sky or the ground: tests/reference/raycast-hemisphere.ts. Nothing here uses Sunpane's
 * view-factor code, its azimuth columns or its (ψ, τ) coordinates.
 *
 * The view factors of single glass points (`pointViewFactors`, the core's function for one point of
 * the glass, the independent path the window's glass average is checked against) by ray casting from
 * that point. F = (1/π) ∫ cos θ dω over the directions that reach the sky (or the ground); directions
 * drawn with density cos θ / π (a uniform point on the unit disc in the glass plane lifted onto the
 * hemisphere, Malley's method) make F the share of rays that get there. The horizon band share
 * (0…6.5° above the horizon, weighted by cos θ): sin ψ uniform on (−1, 1), h uniform on (0, 6.5°)
 * kept with probability cos²h, as in raycast-view-factors.test.ts.
 *
 * Sampling and tolerance. DISC × DISC disc cells (jittered stratified: 25 600 rays) per point and
 * BAND × BAND for the band. Stratification leaves variance only in the cells a visibility edge
 * crosses. Over the 120 random points the spread of (ray cast − Sunpane) measured a standard
 * deviation of 0.0002 and a worst case of 0.00066 for the view factors, 0.0022 for the band share (its
 * rays are fewer); the view factors are allowed 0.0012 (6σ), their mean signed difference over the
 * 240 values 0.00008 (6σ of a mean of 240: a systematic bias shows there first), the band share
 * 0.006. The points exactly below an overhang's end are held to the same tolerances. The PRNGs are
 * seeded, so the test is repeatable.
 */
import { pointViewFactors } from '../../src/core/shading/viewFactors';
import { classifyDirection, randomShadedWindow, RaycastTally } from './raycast-hemisphere';
import { RaycastScene, seededRandom, type RaycastWindow } from './raycast-scene';

const GEOMETRIES = 60;
const POINTS = 2;
const DISC = 160;
const BAND = 96;
const VIEW_TOLERANCE = 0.0012;
const MEAN_BIAS = 0.00008;
const BAND_TOLERANCE = 0.006;
// Math's functions as locals: under Jest a global lookup in a hot loop costs ~25× a local one.
const { PI, sqrt, sin, cos, max, abs } = Math;
const D2R = PI / 180;
const BAND_TOP = 6.5;

function rayCastPoint(g: RaycastWindow, scene: RaycastScene, x: number, y: number, rnd: () => number): { sky: number; ground: number; band: number } {
  const { right, up, normal } = scene.frame();
  let sky = 0;
  let ground = 0;
  for (let k = 0; k < DISC; k++) {
    for (let l = 0; l < DISC; l++) {
      const r = sqrt((k + rnd()) / DISC);
      const phi = (2 * PI * (l + rnd())) / DISC;
      const a = r * cos(phi);
      const b = r * sin(phi);
      const c = sqrt(max(0, 1 - r * r));
      const kind = classifyDirection(scene, g, x, y, a * right[0] + b * up[0] + c * normal[0], a * right[1] + b * up[1] + c * normal[1], a * right[2] + b * up[2] + c * normal[2]);
      if (kind === 1) sky++;
      else if (kind === 2) ground++;
    }
  }
  let open = 0;
  let drawn = 0;
  for (let i = 0; i < BAND; i++) {
    for (let j = 0; j < BAND; j++) {
      const sinPsi = 2 * ((i + rnd()) / BAND) - 1;
      const cosPsi = sqrt(1 - sinPsi * sinPsi);
      let h: number;
      do h = ((j + rnd()) / BAND) * BAND_TOP * D2R;
      while (rnd() > cos(h) ** 2);
      const a = cos(h) * sinPsi;
      const b = sin(h);
      const c = cos(h) * cosPsi;
      if (classifyDirection(scene, g, x, y, a * right[0] + b * up[0] + c * normal[0], a * right[1] + b * up[1] + c * normal[1], a * right[2] + b * up[2] + c * normal[2]) === 1) open++;
      drawn++;
    }
  }
  return { sky: sky / (DISC * DISC), ground: ground / (DISC * DISC), band: open / drawn };
}

describe('point view factors agree with a three.js ray cast from the point', () => {
  test(`${GEOMETRIES * POINTS} points on ${GEOMETRIES} random windows with devices, reveals and skylines: within ${VIEW_TOLERANCE}`, () => {
    const rnd = seededRandom(20261204);
    const sampler = seededRandom(7);
    const tally = new RaycastTally();
    for (let k = 0; k < GEOMETRIES; k++) {
      const g = randomShadedWindow(rnd);
      const scene = new RaycastScene(g);
      for (let p = 0; p < POINTS; p++) {
        const x = rnd() * g.width;
        const y = rnd() * g.height;
        const ours = pointViewFactors({ width: g.width, height: g.height }, g.shading, g.surfaceAzimuth, x, y);
        // Most points must be shaded: devices cut their view of sky and ground by more than 5 %.
        tally.add({ ours, ref: rayCastPoint(g, scene, x, y, sampler) }, ours.sky + ours.ground < 0.95, () => `${JSON.stringify(g)} at (${x}, ${y})`);
      }
    }
    tally.expectWithin(VIEW_TOLERANCE, MEAN_BIAS, BAND_TOLERANCE);
  });
});

describe('points exactly below an end of an overhang narrower than the glass', () => {
  // Directly below an end, the rays toward that end's side pass it at every elevation: the
  // overhang blocks only on the other side. Random points never fall exactly there.
  const cases: RaycastWindow[] = [
    { width: 2, height: 1.5, shading: { overhang: { projection: 0.6, gap: 0.2, extensionLeft: -0.4, extensionRight: -0.5 } }, surfaceAzimuth: 180 },
    { width: 1.2, height: 2, shading: { overhang: { projection: 1, gap: 0, extensionLeft: -0.3, extensionRight: -0.3 }, revealDepth: 0.1 }, surfaceAzimuth: 75 },
  ];
  test.each(cases.flatMap((g) => {
    const o = g.shading.overhang!;
    return [
      { g, x: -o.extensionLeft, side: 'left' },
      { g, x: g.width + o.extensionRight, side: 'right' },
    ];
  }))(`$side end at x = $x, three heights: within ${VIEW_TOLERANCE}`, ({ g, x }) => {
    const scene = new RaycastScene(g);
    const sampler = seededRandom(11);
    for (const y of [0.1 * g.height, 0.5 * g.height, 0.9 * g.height]) {
      const ours = pointViewFactors({ width: g.width, height: g.height }, g.shading, g.surfaceAzimuth, x, y);
      const ref = rayCastPoint(g, scene, x, y, sampler);
      expect(abs(ours.sky - ref.sky)).toBeLessThan(VIEW_TOLERANCE);
      expect(abs(ours.ground - ref.ground)).toBeLessThan(VIEW_TOLERANCE);
      expect(abs(ours.horizonShare - ref.band)).toBeLessThan(BAND_TOLERANCE);
    }
  });
});
