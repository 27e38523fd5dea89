/**
 * Source: three.js 0.187.0 ray casting — an independent sunlit-fraction reference built on three.js 0.187.0 (npm `three`, pinned in
 * package.json): the window's overhang, fins, reveal (jambs, head and sill) and the wall face around
 * the opening are built as double-sided rectangles in WORLD coordinates (x east, y north, z up), the
 * sun direction comes straight from its altitude and azimuth, and rays from sample points on the
 * glass toward the sun are tested with three.js's `Raycaster` (Möller–Trumbore triangle tests).
 *
 * Nothing here uses Sunpane's shading code or its wall-frame formulas (a = tan γ, b = tan Ω): the
 * window frame is placed by its compass azimuth only, with "right as seen from outside" taken as
 * the compass direction surface azimuth − 90° (for a viewer facing the window).
 *
 * Two definitions are not geometry and are applied as such: the glass receives no beam from behind
 * its own plane (sun direction · outward normal ≤ 0), and none at or below the horizon.
 *
 * Used by tests/reference/raycast-three.test.ts and bench/shading.ts (not a test file itself).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import type { Shading } from '../../src/core/shading/types';

// three.js ships no TypeScript types here (@types/three is not installed); only these parts are used.
interface Vec3 {
  x: number;
  y: number;
  z: number;
  set(x: number, y: number, z: number): Vec3;
}
interface ThreeApi {
  Vector3: new (x?: number, y?: number, z?: number) => Vec3;
  Raycaster: new () => { set(origin: Vec3, direction: Vec3): void; intersectObjects(objs: unknown[], recursive: boolean): { distance: number }[]; near: number; far: number };
  BufferGeometry: new () => { setAttribute(name: string, attr: unknown): void; setIndex(idx: number[]): void; computeBoundingSphere(): void; computeBoundingBox(): void };
  Float32BufferAttribute: new (arr: number[], size: number) => unknown;
  MeshBasicMaterial: new (opts: { side: number }) => unknown;
  Mesh: new (geometry: unknown, material: unknown) => { updateMatrixWorld(force?: boolean): void };
  DoubleSide: number;
  Ray: new (origin?: Vec3, direction?: Vec3) => { origin: Vec3; direction: Vec3; intersectTriangle(a: Vec3, b: Vec3, c: Vec3, backfaceCulling: boolean, target: Vec3): Vec3 | null };
}

// three.js 0.187 is ES-module-only (its CommonJS entry re-exports the module through Node's
// require(esm), which Jest's module loader refuses). Its build/three.core.js has no imports and one
// closing `export { … }` list, so it is loaded unchanged as a function body that returns that list.
const THREE = loadThreeCore();

function loadThreeCore(): ThreeApi {
  const file = path.join(path.dirname(require.resolve('three')), 'three.core.js');
  const source = fs.readFileSync(file, 'utf8');
  const at = source.lastIndexOf('\nexport {');
  if (at < 0 || source.slice(0, at).includes('\nexport ')) throw new Error(`unexpected layout of ${file}`);
  const body = `${source.slice(0, at)}\nreturn {${source.slice(at + '\nexport {'.length).replace(/};?\s*$/, '')}};`;
  // Math is handed in as a parameter: under Jest the code runs in a vm context, where every lookup
  // of a global (Math.abs in the ray/triangle test) goes through the context's interceptor and costs
  // about 25 times a local one.
  return new Function('Math', body)(Math) as ThreeApi;
}

const { sin, cos, PI, imul } = Math;
const D2R = PI / 180;

export interface RaycastWindow {
  width: number;
  height: number;
  shading: Shading;
  surfaceAzimuth: number;
}

/** A window scene ready for ray tests. */
export class RaycastScene {
  private readonly meshes: unknown[] = [];
  private readonly raycaster = new THREE.Raycaster();
  private readonly origin = new THREE.Vector3();
  private readonly dir = new THREE.Vector3();
  /** Unit vectors of the window frame in world coordinates: right (seen from outside), up, outward. */
  private readonly u: [number, number, number];
  private readonly v: [number, number, number] = [0, 0, 1];
  private readonly n: [number, number, number];
  /** The same rectangles as triangles in double precision, for {@link directionOpen}. */
  private readonly triangles: Vec3[] = [];
  private readonly ray = new THREE.Ray();
  private readonly hit = new THREE.Vector3();

  constructor(private readonly win: RaycastWindow) {
    const s = win.surfaceAzimuth * D2R;
    this.n = [sin(s), cos(s), 0];
    // A viewer outside faces azimuth S + 180°; their right hand points to azimuth S + 270° = S − 90°.
    const r = (win.surfaceAzimuth - 90) * D2R;
    this.u = [sin(r), cos(r), 0];
    const { width: W, height: H, shading } = win;
    // Double precision would be nicer, but three.js stores positions as Float32: keep the scene small
    // (metres) so the rounding (~1e-7 m) stays far below the sampling error.
    const oh = shading.overhang;
    if (oh && oh.projection > 0) this.rect([-oh.extensionLeft, H + oh.gap, 0], [W + oh.extensionLeft + oh.extensionRight, 0, 0], [0, 0, oh.projection]);
    const lf = shading.leftFin;
    if (lf && lf.projection > 0) this.rect([-lf.gap, -lf.extensionBelow, 0], [0, H + lf.extensionAbove + lf.extensionBelow, 0], [0, 0, lf.projection]);
    const rf = shading.rightFin;
    if (rf && rf.projection > 0) this.rect([W + rf.gap, -rf.extensionBelow, 0], [0, H + rf.extensionAbove + rf.extensionBelow, 0], [0, 0, rf.projection]);
    const R = shading.revealDepth ?? 0;
    if (R > 0) {
      this.rect([0, 0, -R], [0, H, 0], [0, 0, R]); // left jamb
      this.rect([W, 0, -R], [0, H, 0], [0, 0, R]); // right jamb
      this.rect([0, H, -R], [W, 0, 0], [0, 0, R]); // head
      this.rect([0, 0, -R], [W, 0, 0], [0, 0, R]); // sill
    }
    // The wall face around the opening, 50 units each way.
    const L = 50;
    this.rect([-L, -L, 0], [L, 0, 0], [0, 2 * L + H, 0]);
    this.rect([W, -L, 0], [L, 0, 0], [0, 2 * L + H, 0]);
    this.rect([0, H, 0], [W, 0, 0], [0, L, 0]);
    this.rect([0, -L, 0], [W, 0, 0], [0, L, 0]);
  }

  private world(x: number, y: number, z: number): [number, number, number] {
    const { u, v, n } = this;
    return [u[0] * x + v[0] * y + n[0] * z, u[1] * x + v[1] * y + n[1] * z, u[2] * x + v[2] * y + n[2] * z];
  }

  /** A rectangle with one corner at c and edges e1, e2 (window-frame coordinates). */
  private rect(c: number[], e1: number[], e2: number[]): void {
    const p0 = this.world(c[0], c[1], c[2]);
    const p1 = this.world(c[0] + e1[0], c[1] + e1[1], c[2] + e1[2]);
    const p2 = this.world(c[0] + e1[0] + e2[0], c[1] + e1[1] + e2[1], c[2] + e1[2] + e2[2]);
    const p3 = this.world(c[0] + e2[0], c[1] + e2[1], c[2] + e2[2]);
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.Float32BufferAttribute([...p0, ...p1, ...p2, ...p3], 3));
    g.setIndex([0, 1, 2, 0, 2, 3]);
    g.computeBoundingSphere();
    g.computeBoundingBox();
    const [v0, v1, v2, v3] = [p0, p1, p2, p3].map((p) => new THREE.Vector3(p[0], p[1], p[2]));
    this.triangles.push(v0, v1, v2, v0, v2, v3);
    const mesh = new THREE.Mesh(g, new THREE.MeshBasicMaterial({ side: THREE.DoubleSide }));
    mesh.updateMatrixWorld(true);
    this.meshes.push(mesh);
  }

  /** Sun direction in world coordinates, or null when the glass cannot receive the beam. */
  private sunDir(sunAltitude: number, sunAzimuth: number): Vec3 | null {
    if (!(sunAltitude > 0)) return null;
    const b = sunAltitude * D2R;
    const a = sunAzimuth * D2R;
    this.dir.set(cos(b) * sin(a), cos(b) * cos(a), sin(b));
    const facing = this.dir.x * this.n[0] + this.dir.y * this.n[1] + this.dir.z * this.n[2];
    return facing > 0 ? this.dir : null;
  }

  /** Does the ray from glass point (x, y) (from the lower-left corner seen from outside) reach the sun? */
  pointLit(x: number, y: number, sunAltitude: number, sunAzimuth: number): boolean {
    const d = this.sunDir(sunAltitude, sunAzimuth);
    if (!d) return false;
    return this.rayFree(x, y);
  }

  private rayFree(x: number, y: number): boolean {
    const R = this.win.shading.revealDepth ?? 0;
    const p = this.world(x, y, -R);
    this.origin.set(p[0], p[1], p[2]);
    this.raycaster.set(this.origin, this.dir);
    return this.raycaster.intersectObjects(this.meshes, false).length === 0;
  }

  /** Unit vectors of the window frame in world coordinates: right (seen from outside), up, outward normal. */
  frame(): { right: readonly number[]; up: readonly number[]; normal: readonly number[] } {
    return { right: this.u, up: this.v, normal: this.n };
  }

  /**
   * Does the ray from glass point (x, y) in the WORLD direction (dx, dy, dz) (unit, dz up) leave the
   * window's devices, reveal and wall behind? three.js `Ray.intersectTriangle` (Möller–Trumbore) on
   * every triangle, both faces, in double precision.
   */
  directionOpen(x: number, y: number, dx: number, dy: number, dz: number): boolean {
    const R = this.win.shading.revealDepth ?? 0;
    const p = this.world(x, y, -R);
    this.ray.origin.set(p[0], p[1], p[2]);
    this.ray.direction.set(dx, dy, dz);
    const t = this.triangles;
    for (let i = 0; i < t.length; i += 3) {
      if (this.ray.intersectTriangle(t[i], t[i + 1], t[i + 2], false, this.hit) !== null) return false;
    }
    return true;
  }

  /**
   * Sunlit fraction by jittered stratified sampling: one uniformly random point in each cell of an
   * n × n grid over the glass (`random` gives uniform numbers in [0, 1)).
   */
  sunlitFraction(sunAltitude: number, sunAzimuth: number, n: number, random: () => number): number {
    if (!this.sunDir(sunAltitude, sunAzimuth)) return 0;
    const { width: W, height: H } = this.win;
    let lit = 0;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        if (this.rayFree(((i + random()) / n) * W, ((j + random()) / n) * H)) lit++;
      }
    }
    return lit / (n * n);
  }
}

/** mulberry32: a small seeded PRNG (public-domain algorithm by Tommy Ettinger), uniform in [0, 1). */
export function seededRandom(seed: number): () => number {
  let t = seed >>> 0;
  return () => {
    t = (t + 0x6d2b79f5) >>> 0;
    let r = imul(t ^ (t >>> 15), 1 | t);
    r = (r + imul(r ^ (r >>> 7), 61 | r)) ^ r;
    return ((r ^ (r >>> 14)) >>> 0) / 4294967296;
  };
}
