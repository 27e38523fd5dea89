/**
 * Shading benchmark: the sunlit fraction of a window with an overhang, two fins and a reveal for the
 * 8760 hourly sun positions of one year at one site, against
 * - the three.js 0.187.0 ray-casting reference (tests/reference/raycast-scene.ts) at a sample count
 *   giving about 0.001 of the glass (3 decimals, what the year sheets show): 128 × 128 jittered rays,
 *   σ ≤ √k/(2N) ≈ 1e-3 for the few hundred cells a shadow edge crosses. Ours is exact to ~1e-12, so
 *   this comparison is generous to the reference. Ray casting is slow, so both are timed on the
 *   same subset of sun-facing hours and compared per evaluation;
 * - polygon-clipping 0.15.7's general union + intersection of the same shadow parallelograms (the
 *   alternative union method weighed in src/core/shading/sunlit.ts), on all 8760 hours.
 *
 * Sun positions come from suncalc 2.0.2 (outside the timed part), so this bench does not depend on
 * Sunpane's own sun code. Ratio keys (ours / theirs, per evaluation): `shading_vs_raycast`,
 * `shading_vs_polygonclipping`.
 */
import polygonClipping, { type Polygon } from 'polygon-clipping';
import { sunlitFraction } from '../src/core/shading/sunlit';
import type { Shading } from '../src/core/shading/types';
import { RaycastScene, seededRandom } from '../tests/reference/raycast-scene';
import { type BenchSection, type Timing, consume, timeIt } from './harness';

// eslint-disable-next-line @typescript-eslint/no-require-imports
const SunCalc = require('suncalc') as { getPosition(date: Date, lat: number, lng: number): { altitude: number; azimuth: number } };

const SITE = { latitude: 40.4, longitude: -3.7, utcOffset: 1 };
const SURFACE_AZIMUTH = 200;
const WINDOW = { width: 1.2, height: 1.5 };
const SHADING: Shading = {
  overhang: { projection: 0.6, gap: 0.1, extensionLeft: 0.2, extensionRight: 0.2 },
  leftFin: { projection: 0.4, gap: 0.05, extensionAbove: 0.1, extensionBelow: 0 },
  rightFin: { projection: 0.4, gap: 0.05, extensionAbove: 0.1, extensionBelow: 0 },
  revealDepth: 0.08,
};
const RAY_GRID = 128;
const RAY_HOURS = 16;

/** Per-evaluation ratio ours / theirs, 3 significant digits. */
function perEvalRatio(ours: Timing, theirs: Timing): number {
  return Number(((ours.medianMs / ours.operations) / (theirs.medianMs / theirs.operations)).toPrecision(3));
}

/** Sun positions at the middle of each hour of 2026 (hour ending h → h − 0.5 local standard time). */
function yearOfSun(): { altitude: Float64Array; azimuth: Float64Array } {
  const n = 8760;
  const altitude = new Float64Array(n);
  const azimuth = new Float64Array(n);
  const start = Date.UTC(2026, 0, 1, 0, 30) - SITE.utcOffset * 3_600_000;
  for (let i = 0; i < n; i++) {
    const p = SunCalc.getPosition(new Date(start + i * 3_600_000), SITE.latitude, SITE.longitude);
    altitude[i] = p.altitude;
    azimuth[i] = ((p.azimuth % 360) + 360) % 360;
  }
  return { altitude, azimuth };
}

/** The same shadow geometry as src/core/shading/sunlit.ts, as polygons for polygon-clipping (γ + = sun right). */
function unionByPolygonClipping(altitude: number, azimuth: number): number {
  if (!(altitude > 0)) return 0;
  const g = ((((SURFACE_AZIMUTH - azimuth) % 360) + 540) % 360) - 180;
  if (g <= -90 || g >= 90) return 0;
  const rad = Math.PI / 180;
  const a = Math.tan(g * rad);
  const b = Math.tan(altitude * rad) / Math.cos(g * rad);
  const { width: W, height: H } = WINDOW;
  const R = SHADING.revealDepth ?? 0;
  const x0 = Math.max(0, a * R);
  const x1 = Math.min(W, W + a * R);
  const y0 = Math.max(0, b * R);
  const y1 = Math.min(H, H + b * R);
  if (!(x1 > x0 && y1 > y0)) return 0;
  const lit: Polygon = [[[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]]];
  const shadows: Polygon[] = [];
  const oh = SHADING.overhang!;
  const y = H + oh.gap;
  const [xl, xr, dx, dy] = [-oh.extensionLeft, W + oh.extensionRight, -a * oh.projection, -b * oh.projection];
  shadows.push([[[xl, y], [xr, y], [xr + dx, y + dy], [xl + dx, y + dy], [xl, y]]]);
  for (const [fin, x] of [[SHADING.leftFin!, -SHADING.leftFin!.gap], [SHADING.rightFin!, W + SHADING.rightFin!.gap]] as const) {
    const [yb, yt, fx, fy] = [-fin.extensionBelow, H + fin.extensionAbove, -a * fin.projection, -b * fin.projection];
    shadows.push([[[x, yb], [x, yt], [x + fx, yt + fy], [x + fx, yb + fy], [x, yb]]]);
  }
  const shaded = polygonClipping.intersection(lit, polygonClipping.union(shadows[0], ...shadows.slice(1)));
  let area = 0;
  for (const poly of shaded) {
    poly.forEach((ring, k) => {
      let twice = 0;
      for (let i = 0; i < ring.length - 1; i++) twice += ring[i][0] * ring[i + 1][1] - ring[i + 1][0] * ring[i][1];
      area += (k === 0 ? 1 : -1) * Math.abs(twice / 2);
    });
  }
  return ((x1 - x0) * (y1 - y0) - area) / (W * H);
}

export function shadingBench(): BenchSection {
  const sun = yearOfSun();
  const n = sun.altitude.length;

  // Accuracy check of the alternatives before timing them (reported in the labels).
  let worstPc = 0;
  for (let i = 0; i < n; i++) {
    worstPc = Math.max(worstPc, Math.abs(sunlitFraction(WINDOW, SHADING, sun.altitude[i], sun.azimuth[i], SURFACE_AZIMUTH) - unionByPolygonClipping(sun.altitude[i], sun.azimuth[i])));
  }
  const facing: number[] = [];
  for (let i = 0; i < n; i++) {
    const f = sunlitFraction(WINDOW, SHADING, sun.altitude[i], sun.azimuth[i], SURFACE_AZIMUTH);
    if (f > 0 && f < 1) facing.push(i);
  }
  const stride = Math.max(1, Math.floor(facing.length / RAY_HOURS));
  const subset = facing.filter((_, k) => k % stride === 0).slice(0, RAY_HOURS);
  const scene = new RaycastScene({ width: WINDOW.width, height: WINDOW.height, shading: SHADING, surfaceAzimuth: SURFACE_AZIMUTH });
  const random = seededRandom(1);
  let worstRay = 0;
  for (const i of subset) {
    const d = sunlitFraction(WINDOW, SHADING, sun.altitude[i], sun.azimuth[i], SURFACE_AZIMUTH) - scene.sunlitFraction(sun.altitude[i], sun.azimuth[i], RAY_GRID, random);
    worstRay = Math.max(worstRay, Math.abs(d));
  }

  const ours = timeIt('ours: exact polygons, 8760 hours', n, () => {
    for (let i = 0; i < n; i++) consume(sunlitFraction(WINDOW, SHADING, sun.altitude[i], sun.azimuth[i], SURFACE_AZIMUTH));
  });
  const pc = timeIt(`polygon-clipping 0.15.7 union, 8760 h (max |Δ| ${worstPc.toExponential(1)})`, n, () => {
    for (let i = 0; i < n; i++) consume(unionByPolygonClipping(sun.altitude[i], sun.azimuth[i]));
  }, 5, 1);
  const REPEAT = 2000;
  const oursSubset = timeIt(`ours: exact polygons, ${subset.length} part-shaded hours`, subset.length * REPEAT, () => {
    for (let r = 0; r < REPEAT; r++) for (const i of subset) consume(sunlitFraction(WINDOW, SHADING, sun.altitude[i], sun.azimuth[i], SURFACE_AZIMUTH));
  });
  const ray = timeIt(`three.js rays ${RAY_GRID}x${RAY_GRID}/eval, same hours (max |Δ| ${worstRay.toFixed(4)})`, subset.length, () => {
    for (const i of subset) consume(scene.sunlitFraction(sun.altitude[i], sun.azimuth[i], RAY_GRID, random));
  }, 3, 1);

  return {
    title: `Shading: sunlit fraction, overhang + 2 fins + reveal, ${n} hourly suns (suncalc 2.0.2), ours vs ray casting at ~1e-3 and vs polygon-clipping`,
    timings: [ours, pc, oursSubset, ray],
    ratios: {
      shading_vs_raycast: perEvalRatio(oursSubset, ray),
      shading_vs_polygonclipping: perEvalRatio(ours, pc),
    },
  };
}
