/**
 * Source: Long, C. N. & Shi, Y. (2008), "An automated quality assessment and control algorithm for
 * surface radiation measurements", The Open Atmospheric Science Journal 2, 23–37 (the BSRN
 * "physically possible" limits and the comparison tests), from memory:
 * - physically possible: GHI ≤ Sa · 1.5 · μ0^1.2 + 100, DHI ≤ Sa · 0.95 · μ0^1.2 + 50, DNI ≤ Sa,
 *   each ≥ −4 W/m², with Sa the extraterrestrial irradiance at the day's Earth–Sun distance and μ0
 *   the cosine of the solar zenith angle;
 * - diffuse ratio DHI / GHI < 1.05 for zenith < 75°, < 1.10 for 75° ≤ zenith < 93°, tested only when
 *   GHI > 50 W/m²;
 * - closure (DNI μ0 + DHI) / GHI within ±8 % for zenith < 75°, ±15 % for 75° ≤ zenith < 93°, GHI > 50.
 * The checks are the published limits evaluated by hand at stated points (arithmetic below).
 */
import { SunpaneError } from '../../src/core/common';
import { COMPARISON_MIN_GHI, IRRADIANCE_FLOOR, closureTolerance, diffuseRatioLimit, physicalIrradianceLimits } from '../../src/core/sky';

describe('Long & Shi (2008) physically possible limits', () => {
  test('sun at 60° zenith, Sa = 1361: GHI 988.614, DHI 612.789, DNI 1361 W/m² (0.5^1.2 = 0.435275; 1e-3)', () => {
    // GHI: 1.5 · 1361 · 0.4352753 + 100 = 988.614; DHI: 0.95 · 1361 · 0.4352753 + 50 = 612.789
    const l = physicalIrradianceLimits(0.5, 1361);
    expect(l.ghi).toBeCloseTo(988.614, 3);
    expect(l.dhi).toBeCloseTo(612.789, 3);
    expect(l.dni).toBe(1361);
  });

  test('sun overhead: GHI 2141.5, DHI 1342.95; sun down (μ0 ≤ 0): only the allowances, 100 and 50 W/m²', () => {
    const overhead = physicalIrradianceLimits(1, 1361);
    expect(overhead.ghi).toBeCloseTo(2141.5, 9);
    expect(overhead.dhi).toBeCloseTo(1342.95, 9);
    expect(physicalIrradianceLimits(-0.3, 1400)).toEqual({ ghi: 100, dhi: 50, dni: 1400 });
    expect(IRRADIANCE_FLOOR).toBe(-4);
  });

  test('arguments out of range are refused naming them', () => {
    expect(() => physicalIrradianceLimits(1.5, 1361)).toThrow(SunpaneError);
    expect(() => physicalIrradianceLimits(0.5, 200)).toThrow(/extraterrestrialNormal/);
  });
});

describe('Long & Shi (2008) comparison tests', () => {
  test('diffuse ratio limit 1.05 below 75° zenith, 1.10 from 75° to 93°, none beyond; only above 50 W/m² of GHI', () => {
    expect([diffuseRatioLimit(10), diffuseRatioLimit(74.9), diffuseRatioLimit(75), diffuseRatioLimit(92.9), diffuseRatioLimit(93)]).toEqual([1.05, 1.05, 1.1, 1.1, undefined]);
    expect(COMPARISON_MIN_GHI).toBe(50);
  });

  test('closure tolerance ±8 % below 75° zenith, ±15 % from 75° to 93°, none beyond', () => {
    expect([closureTolerance(0), closureTolerance(75), closureTolerance(93)]).toEqual([0.08, 0.15, undefined]);
  });
});
