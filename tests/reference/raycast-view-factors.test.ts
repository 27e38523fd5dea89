/**
 * Source: three.js 0.187.0 (npm `three`, pinned in package.json) — its `Ray.intersectTriangle`
 * (Möller–Trumbore ray/triangle test), on the scene of tests/reference/raycast-scene.ts: overhang,
 * fins, reveal (jambs, head, sill) and the wall face, built as rectangles in WORLD coordinates from
 * the window's compass azimuth. A hemisphere integration by ray casting: nothing here uses Sunpane's
 * view-factor code, its azimuth columns or its (ψ, τ) coordinates.
 *
 * The estimator. A view factor from a point is F = (1/π) ∫ cos θ dω over the directions that reach
 * the sky (or the ground). Directions drawn with density cos θ / π over the hemisphere in front of
 * the glass (a uniform point on the unit disc in the glass plane, lifted onto the hemisphere —
 * Malley's method) make F the probability that a ray reaches the sky: F ≈ (rays to the open sky) / N.
 * Which rays reach the sky or the ground: tests/reference/raycast-hemisphere.ts. The glass average
 * comes from drawing the ray's start on the glass too.
 *
 * The horizon band share (directions 0…6.5° above the horizon, weighted by cos θ) is estimated
 * apart: azimuth ψ from the wall normal with sin ψ uniform on (−1, 1) (density ∝ cos ψ), elevation h
 * uniform on (0, 6.5°) kept with probability cos²h (rejection; density ∝ cos²h), so that with
 * cos θ dω = cos²h cos ψ dh dψ the share is the fraction of such rays that reach the sky.
 *
 * Sampling and tolerance. Each geometry uses N = 16 × 16 glass cells × 16 × 16 disc cells (jittered
 * stratified in all four dimensions; 65 536 rays) for sky and ground, and 128 × 128 stratified rays
 * for the band. Stratification leaves variance only in the cells that a visibility edge crosses; over
 * these 200 geometries the spread of (ray cast − Sunpane) measured a standard deviation of 0.0005 and
 * a worst case of 0.0017 for the view factors. We allow 0.003 per geometry, as the issue asks (6σ),
 * and hold the mean signed difference over all 400 values within 0.00015 (6σ of a mean of 400): a
 * systematic bias shows there first. The horizon share, from narrower rays, measured a worst case of
 * 0.010 and is allowed 0.02. The PRNG is seeded, so the test is repeatable.
 */
import { windowViewFactors } from '../../src/core/shading/viewFactors';
import { classifyDirection, randomShadedWindow, RaycastTally } from './raycast-hemisphere';
import { RaycastScene, seededRandom, type RaycastWindow } from './raycast-scene';

const GEOMETRIES = 200;
const GLASS = 16;
const DISC = 16;
const BAND = 128;
const VIEW_TOLERANCE = 0.003;
const MEAN_BIAS = 0.00015;
const BAND_TOLERANCE = 0.02;
// Math's functions as locals: under Jest a global lookup in a hot loop costs ~25× a local one.
const { PI, sqrt, sin, cos, max } = Math;
const D2R = PI / 180;
const BAND_TOP = 6.5;

function rayCast(g: RaycastWindow, rnd: () => number): { sky: number; ground: number; band: number } {
  const scene = new RaycastScene(g);
  const { right, up, normal } = scene.frame();
  let sky = 0;
  let ground = 0;
  for (let i = 0; i < GLASS; i++) {
    for (let j = 0; j < GLASS; j++) {
      for (let k = 0; k < DISC; k++) {
        for (let l = 0; l < DISC; l++) {
          const x = ((i + rnd()) / GLASS) * g.width;
          const y = ((j + rnd()) / GLASS) * g.height;
          // Uniform on the unit disc (polar, stratified in r² and angle), lifted onto the hemisphere.
          const r = sqrt((k + rnd()) / DISC);
          const phi = (2 * PI * (l + rnd())) / DISC;
          const a = r * cos(phi);
          const b = r * sin(phi);
          const c = sqrt(max(0, 1 - r * r));
          const dx = a * right[0] + b * up[0] + c * normal[0];
          const dy = a * right[1] + b * up[1] + c * normal[1];
          const dz = a * right[2] + b * up[2] + c * normal[2];
          const kind = classifyDirection(scene, g, x, y, dx, dy, dz);
          if (kind === 1) sky++;
          else if (kind === 2) ground++;
        }
      }
    }
  }
  const n = GLASS * GLASS * DISC * DISC;
  // The horizon band: sin ψ uniform, h uniform on (0, 6.5°) kept with probability cos²h.
  let open = 0;
  let drawn = 0;
  for (let i = 0; i < BAND; i++) {
    for (let j = 0; j < BAND; j++) {
      const x = rnd() * g.width;
      const y = rnd() * g.height;
      const sinPsi = 2 * ((i + rnd()) / BAND) - 1;
      const cosPsi = sqrt(1 - sinPsi * sinPsi);
      let h: number;
      do h = ((j + rnd()) / BAND) * BAND_TOP * D2R;
      while (rnd() > cos(h) ** 2);
      // Direction in the window frame: ψ to the right of the normal, h up.
      const a = cos(h) * sinPsi;
      const b = sin(h);
      const c = cos(h) * cosPsi;
      const dx = a * right[0] + b * up[0] + c * normal[0];
      const dy = a * right[1] + b * up[1] + c * normal[1];
      const dz = a * right[2] + b * up[2] + c * normal[2];
      if (classifyDirection(scene, g, x, y, dx, dy, dz) === 1) open++;
      drawn++;
    }
  }
  return { sky: sky / n, ground: ground / n, band: open / drawn };
}

describe('view factors agree with a three.js ray-cast hemisphere integration', () => {
  test(`${GEOMETRIES} random windows with devices, reveals and skylines: within ${VIEW_TOLERANCE}`, () => {
    const rnd = seededRandom(20261212);
    const sampler = seededRandom(99);
    const tally = new RaycastTally();
    for (let k = 0; k < GEOMETRIES; k++) {
      const g = randomShadedWindow(rnd);
      const ours = windowViewFactors({ width: g.width, height: g.height }, g.shading, g.surfaceAzimuth);
      // The geometries must shade: most of them cut the sky view by more than 5 %.
      tally.add({ ours, ref: rayCast(g, sampler) }, ours.skyRatio < 0.95, () => JSON.stringify(g));
    }
    tally.expectWithin(VIEW_TOLERANCE, MEAN_BIAS, BAND_TOLERANCE);
  });
});
