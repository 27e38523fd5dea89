/**
 * Source: three.js 0.187.0 ray casting (tests/reference/raycast-scene.ts) — the pieces of a
 * hemisphere integration by ray casting that the window and the point view-factor references share:
 * random shaded windows, the classification of one ray from a glass point as reaching the open sky,
 * the open ground or neither, and the tally of the differences with their tolerances. Nothing here uses Sunpane's view-factor code, its azimuth columns
 * or its (ψ, τ) coordinates.
 *
 * Used by tests/reference/raycast-view-factors.test.ts and raycast-point-view-factors.test.ts (not a
 * test file itself).
 */
import type { Fin, Shading } from '../../src/core/shading/types';
import type { RaycastScene, RaycastWindow } from './raycast-scene';

const { PI, asin, atan2, min, floor } = Math;
const D2R = PI / 180;

/**
 * A random window with devices: overhang (70 %), each fin (50 %), reveal (50 %), skyline (40 %, 1 to
 * 24 sectors), any azimuth; devices may be narrower than the glass and may start with a gap.
 */
export function randomShadedWindow(rnd: () => number): RaycastWindow {
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

/**
 * Does a world direction (unit, z up) from glass point (x, y) reach the open sky (1), the open ground
 * (2), or neither (0)? A ray reaches the sky when it points above the horizon, meets no triangle and
 * passes above the skyline at its compass azimuth (the skyline is not geometry: its definition, an
 * elevation by azimuth sector, docs/conventions.md#skyline, is applied to the ray's altitude and
 * azimuth); the ground when it points below the horizon and meets no triangle.
 */
export function classifyDirection(scene: RaycastScene, g: RaycastWindow, x: number, y: number, dx: number, dy: number, dz: number): 0 | 1 | 2 {
  if (!scene.directionOpen(x, y, dx, dy, dz)) return 0;
  if (dz <= 0) return 2;
  const altitude = asin(min(1, dz)) / D2R;
  const azimuth = atan2(dx, dy) / D2R; // compass: x east, y north
  return altitude < skylineAt(g.shading.skyline, azimuth) ? 0 : 1;
}

/** Sunpane's view factors and the ray cast's estimate of them, for {@link RaycastTally}. */
interface Pair {
  ours: { sky: number; ground: number; horizonShare: number };
  ref: { sky: number; ground: number; band: number };
}

/**
 * The differences (Sunpane − ray cast) over many cases: the worst sky or ground difference with its
 * case, the worst band-share difference, the mean signed difference and its spread, and how many
 * cases the devices actually shade.
 */
export class RaycastTally {
  private worst = 0;
  private worstText = '';
  private worstBand = 0;
  private bias = 0;
  private sumSq = 0;
  private values = 0;
  private cases = 0;
  private shaded = 0;

  /** Adds one case; `shaded` says whether its devices cut the view by more than 5 %; `what` names it. */
  add({ ours, ref }: Pair, shaded: boolean, what: () => string): void {
    const dSky = ours.sky - ref.sky;
    const dGround = ours.ground - ref.ground;
    this.bias += dSky + dGround;
    this.sumSq += dSky * dSky + dGround * dGround;
    this.values += 2;
    this.cases++;
    if (shaded) this.shaded++;
    const d = Math.max(Math.abs(dSky), Math.abs(dGround));
    if (d > this.worst) {
      this.worst = d;
      this.worstText = `${what()}: ours ${JSON.stringify(ours)}, ray cast ${JSON.stringify(ref)}`;
    }
    this.worstBand = Math.max(this.worstBand, Math.abs(ours.horizonShare - ref.band));
  }

  /**
   * Most cases must be shaded; every view factor within `view` of the ray cast (the failure names the
   * worst case and the spread); the mean signed difference within `meanBias`; the band share within `band`.
   */
  expectWithin(view: number, meanBias: number, band: number): void {
    expect(this.shaded).toBeGreaterThan(this.cases / 2);
    if (this.worst > view) throw new Error(`worst |difference| ${this.worst} (spread σ ${Math.sqrt(this.sumSq / this.values)}) for ${this.worstText}`);
    expect(Math.abs(this.bias / this.values)).toBeLessThan(meanBias);
    expect(this.worstBand).toBeLessThan(band);
  }
}
