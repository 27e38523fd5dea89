/**
 * The clear-sky models where they meet the physically possible limits: which τb/τd pairs the
 * ASHRAE model refuses and what the refusal says, a pair at the edge refused at a sun between the
 * trial altitudes, a bad pair after a good one, and the Ineichen–Perez model with the sun on the horizon.
 *
 * Sources:
 * - ASHRAE Handbook—Fundamentals (2013) ch. 14, Eqs. 4, 15–18 (from memory; exponents of Gueymard &
 *   Thevenard 2013): E0 = 1367 [1 + 0.033 cos(360° (n − 3)/365)], Eb = E0 exp(−τb m^ab),
 *   Ed = E0 exp(−τd m^ad), ab = 1.454 − 0.406 τb − 0.268 τd + 0.021 τb τd,
 *   ad = 0.507 + 0.205 τb − 0.080 τd − 0.190 τb τd, global Eb sin β + Ed; m by Kasten & Young (1989)
 *   Eq. 3, 1/[sin β + 0.50572 (β + 6.07995)^−1.6364].
 * - Long & Shi (2008), physically possible limits (from memory): DNI ≤ Sa, DHI ≤ 0.95 Sa μ0^1.2 + 50,
 *   GHI ≤ 1.5 Sa μ0^1.2 + 100, Sa by Spencer (1971) at 1366.1 W/m².
 * - Ineichen & Perez (2002): with the sun on the horizon there is no clear-sky irradiance (the
 *   models' documented night result: all three 0).
 * Every value below is these equations written out by hand.
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { ashraeClearSky, ineichenPerezClearSky, isAcceptedClearSkyPair, requireClearSkyPair } from '../../../src/core/sky/clearSky';
import { refusalOf as refusal } from '../../support/expectError';

const RAD = Math.PI / 180;
const ashraeE0 = (n: number) => 1367 * (1 + 0.033 * Math.cos((2 * Math.PI * (n - 3)) / 365));
function spencer(n: number): number {
  const g = (2 * Math.PI * (n - 1)) / 365;
  return 1366.1 * (1.00011 + 0.034221 * Math.cos(g) + 0.00128 * Math.sin(g) + 0.000719 * Math.cos(2 * g) + 0.000077 * Math.sin(2 * g));
}
const airMass = (beta: number) => 1 / (Math.sin(beta * RAD) + 0.50572 * (beta + 6.07995) ** -1.6364);

/** The ASHRAE clear sky and the Long & Shi limits at altitude β on day n, written out. */
function byHand(beta: number, n: number, tb: number, td: number) {
  const m = airMass(beta);
  const ab = 1.454 - 0.406 * tb - 0.268 * td + 0.021 * tb * td;
  const ad = 0.507 + 0.205 * tb - 0.08 * td - 0.19 * tb * td;
  const dni = ashraeE0(n) * Math.exp(-tb * m ** ab);
  const dhi = ashraeE0(n) * Math.exp(-td * m ** ad);
  const mu = Math.sin(beta * RAD);
  const sa = spencer(n);
  const p = mu > 0 ? mu ** 1.2 : 0;
  return { dni, dhi, ghi: dni * mu + dhi, limit: { dni: sa, dhi: 0.95 * sa * p + 50, ghi: 1.5 * sa * p + 100 } };
}

/**
 * The refusal of a pair states the component past its limit, its value, the sun and the limit:
 * they must be the model's and the limit's at that sun, on one of the two days tried (perihelion
 * and aphelion, where the two E0 formulas differ most) or on the day asked for.
 */
function expectStated(err: SunpaneError, tb: number, td: number, component: 'dni' | 'dhi' | 'ghi', days = [3, 185]) {
  const words = { dni: 'a direct normal irradiance', dhi: 'a diffuse horizontal irradiance', ghi: 'a global horizontal irradiance' }[component];
  expect(err.argument).toBe('tauD');
  expect(err.message.startsWith(`tauD = ${td} is not allowed: must give, with tauB = ${tb}, a clear sky within the physically possible limits (Long & Shi 2008) at every sun altitude (the model gives ${words} of `)).toBe(true);
  expect(err.message).toMatch(/; published climate tables give about τb 0\.2–0\.8 and τd 1\.2–3\.5 \(from memory\): check the pair against the table and that τb and τd are not swapped\)$/);
  const m = /of (\d+\.\d) W\/m² with the sun (at the horizon|([\d.]+)° high), above the limit of (\d+\.\d) W\/m²/.exec(err.message);
  expect(m).not.toBeNull();
  const [value, limit] = [Number(m![1]), Number(m![4])];
  expect(value).toBeGreaterThanOrEqual(limit); // one decimal: a pair at the edge can print both the same
  const beta = m![3] === undefined ? 0 : Number(m![3]);
  const matches = days.some((n) => {
    const h = byHand(beta, n, tb, td);
    return Math.abs(h[component] - value) <= 0.051 && Math.abs(h.limit[component] - limit) <= 0.051;
  });
  expect(matches).toBe(true);
}

describe('ASHRAE τb/τd pairs past the physically possible limits', () => {
  test('τb 1.2, τd 4: a diffuse of 700.5 W/m² with the sun at the horizon, against 50 W/m²', () => {
    const h = byHand(0, 3, 1.2, 4);
    expect(h.dhi.toFixed(1)).toBe('700.5');
    const err = refusal(() => ashraeClearSky(30, 3, 1.2, 4));
    expectStated(err, 1.2, 4, 'dhi');
    expect(err.message).toContain('of 700.5 W/m² with the sun at the horizon, above the limit of 50.0 W/m²');
  });

  test('τb 0.02, τd 1.0: each part within its own limit but the global past its own at a low sun', () => {
    const err = refusal(() => ashraeClearSky(45, 100, 0.02, 1));
    expectStated(err, 0.02, 1, 'ghi');
  });

  test('τb 0.001: the beam passes the extraterrestrial value (the model\'s E0 at aphelion is above Spencer\'s)', () => {
    expect(byHand(68, 185, 0.001, 2).dni).toBeGreaterThan(spencer(185));
    const err = refusal(() => ashraeClearSky(45, 100, 0.001, 2));
    expectStated(err, 0.001, 2, 'dni');
  });

  test('a pair at the edge that passes every trial altitude is refused at a sun between two of them, in the same words', () => {
    // τb 0.1, τd 0.89471: the diffuse at 7.59° on day 3 is 0.002 W/m² above its limit (168.358), below it at 7.5° and 8°.
    for (const beta of [7.5, 8]) expect(byHand(beta, 3, 0.1, 0.89471).dhi).toBeLessThan(byHand(beta, 3, 0.1, 0.89471).limit.dhi);
    const at = byHand(7.59, 3, 0.1, 0.89471);
    expect(at.dhi).toBeGreaterThan(at.limit.dhi);
    expect(ashraeClearSky(30, 3, 0.1, 0.89471).dhi).toBeGreaterThan(0);
    const err = refusal(() => ashraeClearSky(7.59, 3, 0.1, 0.89471));
    expectStated(err, 0.1, 0.89471, 'dhi');
    expect(err.message).toContain('with the sun 7.59° high');
  });

  test('a pair at the edge of the global limit that passes every trial altitude is refused at a sun between two of them', () => {
    // τb 0.02, τd 1.1706 on day 3: the global passes its limit between the trial altitudes 16° and 16.5°.
    for (const beta of [16, 16.5]) expect(byHand(beta, 3, 0.02, 1.1706).ghi).toBeLessThan(byHand(beta, 3, 0.02, 1.1706).limit.ghi);
    const at = byHand(16.28, 3, 0.02, 1.1706);
    expect(at.ghi).toBeGreaterThan(at.limit.ghi);
    expect(at.dni).toBeLessThan(at.limit.dni);
    expect(at.dhi).toBeLessThan(at.limit.dhi);
    expect(isAcceptedClearSkyPair(0.02, 1.1706)).toBe(true);
    expect(ashraeClearSky(30, 3, 0.02, 1.1706).ghi).toBeGreaterThan(0);
    const err = refusal(() => ashraeClearSky(16.28, 3, 0.02, 1.1706));
    expectStated(err, 0.02, 1.1706, 'ghi');
    expect(err.message).toContain('with the sun 16.28° high');
  });

  test('a beam that passes the extraterrestrial value only between the two trial days is refused on the day it does', () => {
    // The model's E0 (Eq. 4) over Spencer's is largest near day 252, not on either trial day:
    // ln(E0/Sa) is 0.00162 there, 0.00108 on day 185 and negative on day 3. With τb 0.0013 the
    // beam stays within Sa at both trial days (sun overhead, m = 1) but not on day 252 at 60°.
    for (const n of [3, 185]) expect(byHand(90, n, 0.0013, 2).dni).toBeLessThan(spencer(n));
    const at = byHand(60, 252, 0.0013, 2);
    expect(at.dni).toBeGreaterThan(at.limit.dni);
    expect(isAcceptedClearSkyPair(0.0013, 2)).toBe(true);
    expect(ashraeClearSky(60, 185, 0.0013, 2).dni).toBeGreaterThan(0);
    const err = refusal(() => ashraeClearSky(60, 252, 0.0013, 2));
    expectStated(err, 0.0013, 2, 'dni', [252]);
    expect(err.message).toContain('with the sun 60° high');
  });

  test('a bad pair right after a good one is still judged, whichever of τb and τd changed', () => {
    for (let k = 0; k < 2; k++) {
      expect(() => ashraeClearSky(30, 100, 0.4, 2.3)).not.toThrow();
      expect(() => ashraeClearSky(30, 100, 0.4, 0.5)).toThrow(/^tauD = 0\.5 is not allowed/);
      expect(() => ashraeClearSky(30, 100, 0.4, 2.3)).not.toThrow();
      expect(() => ashraeClearSky(30, 100, 0.001, 2.3)).toThrow(/^tauD = 2\.3 is not allowed: must give, with tauB = 0\.001/);
    }
    // Judged on its own (the clear-sky function also checks the sun asked for, which would hide a pair let through here).
    expect(() => requireClearSkyPair(0.4, 2.3)).not.toThrow();
    expect(() => requireClearSkyPair(0.4, 0.5)).toThrow(/^tauD = 0\.5 is not allowed/);
    expect(() => requireClearSkyPair(0.4, 2.3)).not.toThrow();
    expect(() => requireClearSkyPair(0.001, 2.3)).toThrow(/^tauD = 2\.3 is not allowed/);
    expect(() => requireClearSkyPair(1.2, 4, { tauB: 'beamDepth', tauD: 'diffuseDepth' })).toThrow(/^diffuseDepth = 4 is not allowed: must give, with beamDepth = 1\.2, /);
  });

  test('isAcceptedClearSkyPair gives the verdict of requireClearSkyPair, pair by pair and right after an accepted pair', () => {
    const differ: string[] = [];
    let accepted = 0;
    for (let b = 1; b <= 120; b += 7) {
      for (let d = 1; d <= 400; d += 13) {
        const [tb, td] = [b / 100 - 0.009, d / 100];
        let thrown = false;
        try {
          requireClearSkyPair(tb, td);
        } catch {
          thrown = true;
        }
        if (!thrown) accepted++;
        // asked twice: cold, and with the pair the last one judged (accepted or not)
        for (let k = 0; k < 2; k++) if (isAcceptedClearSkyPair(tb, td) !== !thrown) differ.push(`${tb}/${td}`);
      }
    }
    expect(differ).toEqual([]);
    // an accepted pair that is no longer the last one judged, and a bad pair sharing τd with the last good one
    requireClearSkyPair(0.4, 2.3);
    requireClearSkyPair(0.3, 2);
    expect(isAcceptedClearSkyPair(0.4, 2.3)).toBe(true);
    expect(isAcceptedClearSkyPair(0.001, 2)).toBe(false);
    expect(isAcceptedClearSkyPair(0.3, 0.5)).toBe(false);
    // both verdicts occur on the grid (τd 0.01 is refused at every τb, τb 0.4 with τd 2.3 passes, above)
    expect(accepted).toBeGreaterThan(0);
    expect(accepted).toBeLessThan(18 * 31);
  });
});

describe('Ineichen–Perez (2002) with the sun on the horizon', () => {
  test('altitude exactly 0 gives no irradiance, as below it', () => {
    for (const elevation of [0, 2000]) expect(ineichenPerezClearSky(0, 172, 3, elevation)).toEqual({ dni: 0, dhi: 0, ghi: 0 });
    expect(ineichenPerezClearSky(0.5, 172, 3, 0).dni).toBeGreaterThan(0);
  });
});
