/**
 * The branches of the Perez (1990) sky model that the published check case (one clear, high sun,
 * tests/reference/perez-1990.test.ts) does not reach: every ε bin, F1 held at 0, the circumsolar
 * ratio's cos 85° floor, the sun behind the plane, a negative sum floored at 0, no diffuse and no sun.
 *
 * Source: Perez, R., Ineichen, P., Seals, R., Michalsky, J. & Stewart, R. (1990), Solar Energy 44(5),
 * 271–289: ε = [(DHI + DNI)/DHI + κ z³]/(1 + κ z³) with κ = 1.041 and z in radians (Eq. 1),
 * Δ = DHI m / E0n (Eq. 2), F1 = max(0, f11 + f12 Δ + f13 z), F2 = f21 + f22 Δ + f23 z (Eq. 9), the
 * composite coefficients and ε bins of Table 6 (typed again below from the paper's table, not taken
 * from the code), and Id,T = DHI [(1 − F1)(1 + cos Σ)/2 + F1 a/b + F2 sin Σ] with a = max(0, cos θ),
 * b = max(cos 85°, cos z) (also Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed.,
 * Eq. 2.16.14, from memory). The model as written in the paper is worked out here by hand for each
 * case; the floor of the total at 0 and the isotropic sky with the sun down or no diffuse are the
 * conventions skyDiffusePerez1990 documents.
 */
import { perezParts, skyDiffusePerez1990 } from '../../../src/core/sky/perez1990';

const RAD = Math.PI / 180;

/** Table 6 of Perez et al. (1990), composite set: f11, f12, f13, f21, f22, f23 by ε bin. */
const TABLE_6 = [
  [-0.008, 0.588, -0.062, -0.06, 0.072, -0.022],
  [0.13, 0.683, -0.151, -0.019, 0.066, -0.029],
  [0.33, 0.487, -0.221, 0.055, -0.064, -0.026],
  [0.568, 0.187, -0.295, 0.109, -0.152, -0.014],
  [0.873, -0.392, -0.362, 0.226, -0.462, 0.001],
  [1.132, -1.237, -0.412, 0.288, -0.823, 0.056],
  [1.06, -1.6, -0.359, 0.264, -1.127, 0.131],
  [0.678, -0.327, -0.25, 0.156, -1.377, 0.251],
];
/** Lower edges of ε bins 2…8 (Table 6). */
const EDGES = [1.065, 1.23, 1.5, 1.95, 2.8, 4.5, 6.2];

interface Case {
  tilt: number;
  surfaceAzimuth: number;
  dhi: number;
  dni: number;
  e0: number;
  zenith: number;
  sunAzimuth: number;
  m: number;
}

/** The paper's model written out, with the incidence cosine by Duffie & Beckman Eq. 1.6.3 (zenith form). */
function byHand(c: Case) {
  const z = c.zenith * RAD;
  const k = 1.041 * z ** 3;
  const epsilon = ((c.dhi + c.dni) / c.dhi + k) / (1 + k);
  const delta = (c.dhi * c.m) / c.e0;
  const bin = 1 + EDGES.filter((e) => epsilon >= e).length;
  const [f11, f12, f13, f21, f22, f23] = TABLE_6[bin - 1];
  const f1 = Math.max(0, f11 + f12 * delta + f13 * z);
  const f2 = f21 + f22 * delta + f23 * z;
  const cosTheta = Math.cos(z) * Math.cos(c.tilt * RAD) + Math.sin(z) * Math.sin(c.tilt * RAD) * Math.cos((c.sunAzimuth - c.surfaceAzimuth) * RAD);
  const isotropic = c.dhi * (1 - f1) * ((1 + Math.cos(c.tilt * RAD)) / 2);
  const circumsolar = (c.dhi * f1 * Math.max(0, cosTheta)) / Math.max(Math.cos(85 * RAD), Math.cos(z));
  const horizon = c.dhi * f2 * Math.sin(c.tilt * RAD);
  return { epsilon, delta, bin, f1, f2, isotropic, circumsolar, horizon, total: Math.max(0, isotropic + circumsolar + horizon) };
}

const parts = (c: Case) => perezParts(c.tilt, c.surfaceAzimuth, c.dhi, c.dni, c.e0, c.zenith, c.sunAzimuth, c.m);
const diffuse = (c: Case) => skyDiffusePerez1990(c.tilt, c.surfaceAzimuth, c.dhi, c.dni, c.e0, c.zenith, c.sunAzimuth, c.m);

function expectAsPaper(c: Case) {
  const want = byHand(c);
  const got = parts(c);
  for (const key of ['epsilon', 'delta', 'f1', 'f2', 'isotropic', 'circumsolar', 'horizon', 'total'] as const) {
    expect(Math.abs(got[key] - want[key])).toBeLessThan(1e-9 * Math.max(1, Math.abs(want[key])));
  }
  expect(got.bin).toBe(want.bin);
  expect(diffuse(c)).toBe(got.total);
  return want;
}

describe('Perez (1990) model by hand, every branch', () => {
  test('one case in each of the eight ε bins, window facing the sun, matches the paper written out (1e-9)', () => {
    // A south window 20° off the sun, zenith 30°, m 1.15, E0n 1367; the beam grows so that ε crosses every bin.
    const bins = new Set<number>();
    for (const dni of [0, 20, 40, 90, 170, 300, 500, 800]) {
      const want = expectAsPaper({ tilt: 90, surfaceAzimuth: 180, dhi: 100, dni, e0: 1367, zenith: 30, sunAzimuth: 160, m: 1.15 });
      bins.add(want.bin);
    }
    expect([...bins].sort()).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
  });

  test('an overcast low sky: F1 of Eq. 9 is negative and held at 0, so there is no circumsolar part', () => {
    // Bin 1 (no beam, ε = 1), Δ = 20 · 5.6 / 1367 = 0.082, z = 80°: f11 + f12 Δ + f13 z = −0.046.
    const c = { tilt: 60, surfaceAzimuth: 180, dhi: 20, dni: 0, e0: 1367, zenith: 80, sunAzimuth: 180, m: 5.6 };
    const z = 80 * RAD;
    expect(-0.008 + 0.588 * ((20 * 5.6) / 1367) - 0.062 * z).toBeLessThan(-0.04);
    const got = parts(c);
    expect(got.f1).toBe(0);
    expect(got.circumsolar).toBe(0);
    expect(got.isotropic).toBeCloseTo(20 * ((1 + Math.cos(60 * RAD)) / 2), 12);
    expectAsPaper(c);
  });

  test('the sun 2° above the horizon: the circumsolar ratio divides by cos 85°, not by cos 88°', () => {
    const c = { tilt: 90, surfaceAzimuth: 180, dhi: 60, dni: 300, e0: 1367, zenith: 88, sunAzimuth: 185, m: 18 };
    const got = parts(c);
    expect(got.f1).toBeGreaterThan(0);
    const cosTheta = Math.sin(88 * RAD) * Math.cos(5 * RAD); // vertical window: cos θ = sin z cos(γs − γ)
    expect(got.circumsolar).toBeCloseTo((60 * got.f1 * cosTheta) / Math.cos(85 * RAD), 9);
    expectAsPaper(c);
  });

  test('with the sun behind the window there is no circumsolar part (a = max(0, cos θ) = 0)', () => {
    const c = { tilt: 90, surfaceAzimuth: 180, dhi: 150, dni: 600, e0: 1367, zenith: 50, sunAzimuth: 10, m: 1.55 };
    const got = parts(c);
    expect(got.f1).toBeGreaterThan(0);
    expect(got.circumsolar).toBe(0);
    expectAsPaper(c);
  });

  test('a horizon band negative enough to outweigh the rest gives 0, never a negative irradiance', () => {
    // Bin 4, Δ = 300 · 10.3 / 1367 = 2.26: F2 = 0.109 − 0.152 Δ − 0.014 z = −0.255; a vertical window facing away.
    const c = { tilt: 90, surfaceAzimuth: 0, dhi: 300, dni: 900, e0: 1367, zenith: 85, sunAzimuth: 180, m: 10.3 };
    const got = parts(c);
    expect(got.bin).toBe(4);
    expect(got.isotropic + got.circumsolar + got.horizon).toBeLessThan(-5);
    expect(got.total).toBe(0);
    expect(diffuse(c)).toBe(0);
  });

  test('no diffuse: every part 0 (ε taken as 1, bin 1) whatever the beam', () => {
    const got = parts({ tilt: 90, surfaceAzimuth: 180, dhi: 0, dni: 800, e0: 1367, zenith: 30, sunAzimuth: 180, m: 1.15 });
    expect(got).toEqual({ epsilon: 1, delta: 0, bin: 1, f1: 0, f2: 0, isotropic: 0, circumsolar: 0, horizon: 0, total: 0 });
  });

  test('the sun on or below the horizon: the diffuse is spread isotropically, DHI (1 + cos Σ)/2', () => {
    for (const zenith of [90, 95, 180]) {
      for (const tilt of [0, 45, 90, 150]) {
        const c = { tilt, surfaceAzimuth: 180, dhi: 50, dni: 0, e0: 1367, zenith, sunAzimuth: 180, m: 38 };
        const got = parts(c);
        expect(got.total).toBeCloseTo((50 * (1 + Math.cos(tilt * RAD))) / 2, 12);
        expect(got.isotropic).toBe(got.total);
        expect([got.f1, got.f2, got.circumsolar, got.horizon, got.bin, got.epsilon]).toEqual([0, 0, 0, 0, 1, 1]);
        expect(diffuse(c)).toBe(got.total);
      }
    }
  });
});
