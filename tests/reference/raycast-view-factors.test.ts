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
 * A ray reaches the sky when it points above the horizon (world z > 0), meets no triangle, and passes
 * above the skyline at its compass azimuth (the skyline is not geometry: its definition, an
 * elevation by azimuth sector, docs/conventions.md#skyline, is applied to the ray's altitude and
 * azimuth); the ground when it points below the horizon and meets no triangle. The glass average comes from drawing the ray's
 * start on the glass too.
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
import type { Fin, Shading } from '../../src/core/shading/types';
import { RaycastScene, seededRandom } from './raycast-scene';

const GEOMETRIES = 200;
const GLASS = 16;
const DISC = 16;
const BAND = 128;
const VIEW_TOLERANCE = 0.003;
const MEAN_BIAS = 0.00015;
const BAND_TOLERANCE = 0.02;
// Math's functions as locals: under Jest a global lookup in a hot loop costs ~25× a local one.
const { PI, sqrt, sin, cos, asin, atan2, min, max, floor } = Math;
const D2R = PI / 180;
const BAND_TOP = 6.5;

interface Geometry {
  width: number;
  height: number;
  shading: Shading;
  surfaceAzimuth: number;
}

function randomGeometry(rnd: () => number): Geometry {
  const u = (lo: number, hi: number) => lo + (hi - lo) * rnd();
  const width = u(0.4, 3);
  const height = u(0.4, 3);
  const proj = () => (rnd() < 0.1 ? 0 : u(0.05, 1.5));
  const gap = () => (rnd() < 0.3 ? 0 : u(0, 0.6));
  const shading: Shading = {};
  if (rnd() < 0.7) shading.overhang = { projection: proj(), gap: gap(), extensionLeft: u(-0.45 * width, 1.5), extensionRight: u(-0.45 * width, 1.5) };
  const fin = (): Fin => ({ projection: proj(), gap: gap(), extensionAbove: u(-0.45 * height, 1), extensionBelow: u(-0.45 * height, 1) });
  if (rnd() < 0.5) shading.leftFin = fin();
  if (rnd() < 0.5) shading.rightFin = fin();
  if (rnd() < 0.5) shading.revealDepth = u(0, 0.4);
  if (rnd() < 0.4) shading.skyline = Array.from({ length: 1 + floor(rnd() * 24) }, () => (rnd() < 0.4 ? 0 : u(0, 40)));
  return { width, height, shading, surfaceAzimuth: u(0, 360) };
}

/** Skyline elevation [°] at a compass azimuth [°] (sector k covers [k·360/n, (k+1)·360/n)). */
function skylineAt(skyline: readonly number[] | undefined, azimuth: number): number {
  if (!skyline) return 0;
  const a = ((azimuth % 360) + 360) % 360;
  const k = min(skyline.length - 1, floor((a * skyline.length) / 360));
  return skyline[k];
}

/** Does a world direction (unit, z up) from glass point (x, y) reach the open sky (1), the open ground (2), or neither (0)? */
function classify(scene: RaycastScene, g: Geometry, x: number, y: number, dx: number, dy: number, dz: number): 0 | 1 | 2 {
  if (!scene.directionOpen(x, y, dx, dy, dz)) return 0;
  if (dz <= 0) return 2;
  const altitude = asin(min(1, dz)) / D2R;
  const azimuth = atan2(dx, dy) / D2R; // compass: x east, y north
  return altitude < skylineAt(g.shading.skyline, azimuth) ? 0 : 1;
}

function rayCast(g: Geometry, rnd: () => number): { sky: number; ground: number; band: number } {
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
          const kind = classify(scene, g, x, y, dx, dy, dz);
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
      if (classify(scene, g, x, y, dx, dy, dz) === 1) open++;
      drawn++;
    }
  }
  return { sky: sky / n, ground: ground / n, band: open / drawn };
}

describe('view factors agree with a three.js ray-cast hemisphere integration', () => {
  test(`${GEOMETRIES} random windows with devices, reveals and skylines: within ${VIEW_TOLERANCE}`, () => {
    const rnd = seededRandom(20261212);
    const sampler = seededRandom(99);
    let worst = 0;
    let worstText = '';
    let worstBand = 0;
    let bias = 0;
    let sumSq = 0;
    let shaded = 0;
    for (let k = 0; k < GEOMETRIES; k++) {
      const g = randomGeometry(rnd);
      const ours = windowViewFactors({ width: g.width, height: g.height }, g.shading, g.surfaceAzimuth);
      const ref = rayCast(g, sampler);
      const dSky = ours.sky - ref.sky;
      const dGround = ours.ground - ref.ground;
      bias += dSky + dGround;
      sumSq += dSky * dSky + dGround * dGround;
      if (ours.skyRatio < 0.95) shaded++;
      const d = max(Math.abs(dSky), Math.abs(dGround));
      if (d > worst) {
        worst = d;
        worstText = `${JSON.stringify(g)}: ours ${JSON.stringify(ours)}, ray cast ${JSON.stringify(ref)}`;
      }
      worstBand = max(worstBand, Math.abs(ours.horizonShare - ref.band));
    }
    const sd = sqrt(sumSq / (2 * GEOMETRIES));
    // The geometries must shade: most of them cut the sky view by more than 5 %.
    expect(shaded).toBeGreaterThan(GEOMETRIES / 2);
    if (worst > VIEW_TOLERANCE) throw new Error(`worst |difference| ${worst} (spread σ ${sd}) for ${worstText}`);
    expect(Math.abs(bias / (2 * GEOMETRIES))).toBeLessThan(MEAN_BIAS);
    expect(worstBand).toBeLessThan(BAND_TOLERANCE);
  });
});
