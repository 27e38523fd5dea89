/**
 * Source: the isotropic-sky transposition of Liu & Jordan as given in Duffie & Beckman, Solar
 * Engineering of Thermal Processes, 4th ed., Eq. 2.15.1 (sky and ground terms): sky = DHI (1 + cos Σ)/2,
 * ground = GHI ρg (1 − cos Σ)/2. Check value (docs/methods.md#sky-diffuse-on-the-window): tilt 40°, DHI 100 → 88.30222216 W/m².
 */
import { groundReflected, skyDiffuseIsotropic } from '../../src/core/sky/transposition';

describe('isotropic sky and ground reflection', () => {
  test('tilt 40°, DHI 100 W/m² gives 88.30222216 W/m² (within 1e-8)', () => {
    expect(Math.abs(skyDiffuseIsotropic(100, 40) - 88.30222216)).toBeLessThan(1e-8);
  });

  test('a vertical surface sees half the sky and half the ground', () => {
    expect(skyDiffuseIsotropic(100, 90)).toBeCloseTo(50, 10);
    expect(groundReflected(800, 0.2, 90)).toBeCloseTo(80, 10);
  });

  test('a horizontal surface facing up sees the whole sky and no ground; facing down the reverse', () => {
    expect(skyDiffuseIsotropic(100, 0)).toBeCloseTo(100, 10);
    expect(groundReflected(800, 0.2, 0)).toBeCloseTo(0, 10);
    expect(skyDiffuseIsotropic(100, 180)).toBeCloseTo(0, 10);
    expect(groundReflected(800, 0.2, 180)).toBeCloseTo(160, 10);
  });
});
