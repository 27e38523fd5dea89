/**
 * Source: Erbs, D. G., Klein, S. A. & Duffie, J. A. (1982), "Estimation of the diffuse radiation
 * fraction for hourly, daily and monthly-average global radiation", Solar Energy 28(4), 293–302,
 * Eq. 1; extraterrestrial irradiance by Spencer (1971) at 1366.1 W/m². Check values (as pinned in
 * pvlib-python's public test suite; docs/methods.md#global-into-direct-and-diffuse-erbs-et-al-1982): GHI 50 W/m², zenith 85°, 1 January → kt 0.405724,
 * DHI 41.5704, DNI 96.7193.
 */
import { decomposeErbs, diffuseFractionErbs1982 } from '../../src/core/sky/decomposition';

describe('Erbs et al. (1982) decomposition', () => {
  test('GHI 50 W/m² at zenith 85° on 1 January gives kt 0.405724, DHI 41.5704, DNI 96.7193', () => {
    const r = decomposeErbs(50, 85, 1);
    expect(Math.abs(r.clearnessIndex - 0.405724)).toBeLessThan(1e-6);
    expect(Math.abs(r.dhi - 41.5704)).toBeLessThan(1e-4);
    expect(Math.abs(r.dni - 96.7193)).toBeLessThan(1e-4);
  });

  test('the three pieces of Eq. 1 are as published and meet at kt = 0.22 and 0.80 within 0.005', () => {
    expect(diffuseFractionErbs1982(0)).toBe(1);
    expect(diffuseFractionErbs1982(0.1)).toBeCloseTo(1 - 0.009, 12);
    expect(diffuseFractionErbs1982(0.9)).toBe(0.165);
    const at = (kt: number) => 0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4;
    expect(diffuseFractionErbs1982(0.5)).toBeCloseTo(at(0.5), 12);
    expect(Math.abs(at(0.22) - (1 - 0.09 * 0.22))).toBeLessThan(0.005);
    expect(Math.abs(at(0.8) - 0.165)).toBeLessThan(0.005);
  });
});
