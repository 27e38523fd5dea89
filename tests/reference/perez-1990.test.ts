/**
 * Source: Perez, R., Ineichen, P., Seals, R., Michalsky, J. & Stewart, R. (1990), "Modeling daylight
 * availability and irradiance components from direct and global irradiance", Solar Energy 44(5),
 * 271–289 — model Eqs. 1, 2, 9, composite coefficients of Table 6, ε bin edges and κ = 1.041.
 * Check value (docs/methods.md#sky-diffuse-on-the-window; the published model's value for this case as pinned in pvlib's
 * public test suite): 109.084332 W/m². Coefficient table cross-read against Duffie & Beckman,
 * Solar Engineering of Thermal Processes, 4th ed., Table 2.16.1 (from memory).
 */
import { RAD } from '../../src/core/common/angles';
import { SunpaneError } from '../../src/core/common/errors';
import { PEREZ_1990_COMPOSITE, PEREZ_EPSILON_EDGES, perezBin, perezParts, skyDiffusePerez1990 } from '../../src/core/sky/perez1990';
import { skyDiffuseIsotropic } from '../../src/core/sky/transposition';

const CASE = {
  tilt: 40,
  surfaceAzimuth: 180,
  dhi: 118.45831879,
  dni: 939.95469881,
  dniExtra: 1321.1655834833093,
  zenith: 10.56413562,
  sunAzimuth: 144.76567754,
  airMass: 1.01688136,
};

describe('Perez et al. (1990) sky diffuse, composite coefficients', () => {
  test('the published check case gives 109.084332 W/m² (within 1e-6 W/m²)', () => {
    const v = skyDiffusePerez1990(CASE.tilt, CASE.surfaceAzimuth, CASE.dhi, CASE.dni, CASE.dniExtra, CASE.zenith, CASE.sunAzimuth, CASE.airMass);
    expect(Math.abs(v - 109.084332)).toBeLessThan(1e-6);
  });

  test('the check case falls in the clearest ε bin with ε and Δ by Eqs. 1–2 written out', () => {
    const p = perezParts(CASE.tilt, CASE.surfaceAzimuth, CASE.dhi, CASE.dni, CASE.dniExtra, CASE.zenith, CASE.sunAzimuth, CASE.airMass);
    const z = CASE.zenith * RAD;
    const eps = ((CASE.dhi + CASE.dni) / CASE.dhi + 1.041 * z ** 3) / (1 + 1.041 * z ** 3);
    expect(p.epsilon).toBeCloseTo(eps, 12);
    expect(p.delta).toBeCloseTo((CASE.dhi * CASE.airMass) / CASE.dniExtra, 12);
    expect(p.bin).toBe(8);
    expect(p.isotropic + p.circumsolar + p.horizon).toBeCloseTo(p.total, 9);
  });

  test('ε bin edges are 1.065, 1.230, 1.500, 1.950, 2.800, 4.500, 6.200 with the lower edge in the upper bin', () => {
    expect([...PEREZ_EPSILON_EDGES]).toEqual([1.065, 1.23, 1.5, 1.95, 2.8, 4.5, 6.2]);
    expect(perezBin(1)).toBe(1);
    expect(perezBin(1.0649)).toBe(1);
    expect(perezBin(1.065)).toBe(2);
    expect(perezBin(2.8)).toBe(6);
    expect(perezBin(6.2)).toBe(8);
    expect(perezBin(50)).toBe(8);
  });

  test('the composite table has 8 rows of 6 coefficients; first and last rows as printed in Table 6', () => {
    expect(PEREZ_1990_COMPOSITE).toHaveLength(8);
    for (const row of PEREZ_1990_COMPOSITE) expect(row).toHaveLength(6);
    expect([...PEREZ_1990_COMPOSITE[0]]).toEqual([-0.008, 0.588, -0.062, -0.06, 0.072, -0.022]);
    expect([...PEREZ_1990_COMPOSITE[7]]).toEqual([0.678, -0.327, -0.25, 0.156, -1.377, 0.251]);
  });

  test('with all coefficients forced to zero (F1 = F2 = 0) the model is exactly the isotropic sky', () => {
    const zero = Array.from({ length: 8 }, () => [0, 0, 0, 0, 0, 0] as const);
    for (const tilt of [0, 30, 90, 135]) {
      const p = perezParts(tilt, 200, CASE.dhi, CASE.dni, CASE.dniExtra, CASE.zenith, CASE.sunAzimuth, CASE.airMass, zero);
      expect(p.total).toBeCloseTo(skyDiffuseIsotropic(CASE.dhi, tilt), 10);
    }
  });

  test('bad input names the argument', () => {
    expect(() => skyDiffusePerez1990(40, 180, -1, 0, 1367, 10, 180, 1.1)).toThrow(SunpaneError);
    expect(() => skyDiffusePerez1990(40, 180, 100, 0, 1367, 10, 180, 0.5)).toThrow(/^airMass/);
    expect(() => skyDiffusePerez1990(40, 400, 100, 0, 1367, 10, 180, 1.1)).toThrow(/^surfaceAzimuth/);
  });
});
