/**
 * Source: three.js 0.187.0 (npm `three`, pinned in package.json) — its `Raycaster` ray/triangle
 * intersection, used on a scene of the overhang, fins, reveal and wall face built in world
 * coordinates (tests/reference/raycast-scene.ts). An independent reference: it shares no code or
 * formula with src/core/shading/sunlit.ts, only the description of the geometry (docs/conventions.md#window-shading-geometry).
 *
 * Sampling and tolerance. Each case estimates the sunlit fraction from N = 60 × 60 = 3600 rays,
 * one uniformly random point in each cell of a 60 × 60 grid over the glass (jittered stratified
 * sampling). The estimate's error is the sum over cells of independent terms (X_i − p_i)/N with
 * variance p_i(1 − p_i)/N² ≤ 1/(4N²), non-zero only in the k cells that a shadow edge crosses, so
 * its standard deviation is at most √k/(2N). The edges inside the glass are at most 16 straight
 * segments (lit rectangle of the reveal 4, three parallelograms 12) and a segment crosses at most
 * 2·60 − 1 = 119 cells, so k ≤ 1904 and σ ≤ 0.0061. Per case we allow 0.03 (≥ 4.9σ at that worst
 * case; 320 cases × P(|z| > 4.9) ≈ 3e-4). Over all cases the mean signed error has
 * σ ≤ 0.0061/√320 = 0.00034, and we allow 0.0017 (5σ): this catches a small systematic bias that
 * the per-case allowance would let through. The PRNG is seeded, so the test is repeatable; the
 * measured worst case is about 0.004 and the mean about 3e-5.
 */
import { pointSunlit, sunlitFraction } from '../../src/core/shading/sunlit';
import type { Fin, Shading } from '../../src/core/shading/types';
import { RaycastScene, seededRandom } from './raycast-scene';

const CASES = 320;
const GRID = 60;
const PER_CASE = 0.03;
const MEAN_BIAS = 0.0017;

interface Case {
  width: number;
  height: number;
  shading: Shading;
  surfaceAzimuth: number;
  sunAltitude: number;
  sunAzimuth: number;
}

function randomCase(rnd: () => number): Case {
  const u = (lo: number, hi: number) => lo + (hi - lo) * rnd();
  const width = u(0.3, 3);
  const height = u(0.3, 3);
  // Some devices have exactly zero projection (valid, no shadow) or zero gap.
  const proj = () => (rnd() < 0.1 ? 0 : u(0.05, 1.5));
  const gap = () => (rnd() < 0.3 ? 0 : u(0, 0.6));
  const shading: Shading = {};
  if (rnd() < 0.65) {
    const extensionLeft = u(-0.45 * width, 1);
    const extensionRight = u(-0.45 * width, 1);
    shading.overhang = { projection: proj(), gap: gap(), extensionLeft, extensionRight };
  }
  const fin = (): Fin => ({ projection: proj(), gap: gap(), extensionAbove: u(-0.45 * height, 1), extensionBelow: u(-0.45 * height, 1) });
  if (rnd() < 0.5) shading.leftFin = fin();
  if (rnd() < 0.5) shading.rightFin = fin();
  if (rnd() < 0.5) shading.revealDepth = u(0, 0.4);
  const surfaceAzimuth = u(0, 360);
  // Mostly suns in front of the wall, some behind it and some below the horizon.
  const gamma = rnd() < 0.9 ? u(-88, 88) : u(90, 270);
  const sunAzimuth = (surfaceAzimuth + gamma + 720) % 360;
  const sunAltitude = rnd() < 0.05 ? u(-20, 0) : u(1, 80);
  return { width, height, shading, surfaceAzimuth, sunAltitude, sunAzimuth };
}

describe('the sunlit fraction agrees with three.js ray casting', () => {
  const rnd = seededRandom(20261201);
  const cases = Array.from({ length: CASES }, () => randomCase(rnd));

  test(`over ${CASES} random windows, devices and sun positions within the sampling error of ${GRID}×${GRID} jittered rays`, () => {
    const sampler = seededRandom(7);
    let worst = 0;
    let worstCase: Case | undefined;
    let biasSum = 0;
    let partlyShaded = 0;
    for (const c of cases) {
      const ours = sunlitFraction({ width: c.width, height: c.height }, c.shading, c.sunAltitude, c.sunAzimuth, c.surfaceAzimuth);
      const scene = new RaycastScene({ width: c.width, height: c.height, shading: c.shading, surfaceAzimuth: c.surfaceAzimuth });
      const ref = scene.sunlitFraction(c.sunAltitude, c.sunAzimuth, GRID, sampler);
      const diff = ours - ref;
      biasSum += diff;
      if (ours > 0.02 && ours < 0.98) partlyShaded++;
      if (Math.abs(diff) > worst) {
        worst = Math.abs(diff);
        worstCase = c;
      }
    }
    // The cases must exercise partial shading, not only all-lit / all-dark windows.
    expect(partlyShaded).toBeGreaterThan(CASES / 2);
    if (worst > PER_CASE) throw new Error(`worst |difference| ${worst} > ${PER_CASE} for ${JSON.stringify(worstCase)}`);
    expect(Math.abs(biasSum / CASES)).toBeLessThan(MEAN_BIAS);
  });

  test('single glass points are lit or shaded exactly as their rays say (2 000 points)', () => {
    const pick = seededRandom(11);
    let mismatches = 0;
    let lit = 0;
    let checked = 0;
    for (const c of cases.slice(0, 100)) {
      const scene = new RaycastScene({ width: c.width, height: c.height, shading: c.shading, surfaceAzimuth: c.surfaceAzimuth });
      for (let k = 0; k < 20; k++) {
        const x = pick() * c.width;
        const y = pick() * c.height;
        const ours = pointSunlit({ width: c.width, height: c.height }, c.shading, x, y, c.sunAltitude, c.sunAzimuth, c.surfaceAzimuth);
        const ref = scene.pointLit(x, y, c.sunAltitude, c.sunAzimuth) ? 1 : 0;
        if (ours !== ref) mismatches++;
        lit += ref;
        checked++;
      }
    }
    expect(lit).toBeGreaterThan(checked / 5);
    expect(lit).toBeLessThan((checked * 4) / 5);
    // A random point lies on a shadow edge with probability 0; three.js stores positions in
    // Float32 (~1e-7 relative), so allow at most 2 points within that distance of an edge.
    expect(mismatches).toBeLessThanOrEqual(2);
  });
});
