/**
 * Source: the hemispherical (diffuse) average of an angular property for isotropic radiance,
 * 2 ∫₀^{π/2} X(θ) cos θ sin θ dθ (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed.,
 * §5.4; docs/methods.md#hemispherical-diffuse-shgc), and its closed forms: a constant averages to itself; X = cos θ averages to
 * 2 ∫ cos² θ sin θ dθ = 2/3; X = cos² θ to 1/2; a step to 0 above θc to sin² θc.
 */
import { hemisphericalAverage } from '../../src/core/common/hemispherical';

describe('hemispherical average', () => {
  test('of a constant is the constant (1e-13)', () => {
    expect(hemisphericalAverage(() => 0.73)).toBeCloseTo(0.73, 13);
  });

  test('of cos θ is 2/3 and of cos² θ is 1/2 (1e-13)', () => {
    expect(hemisphericalAverage((t) => Math.cos((t * Math.PI) / 180))).toBeCloseTo(2 / 3, 13);
    expect(hemisphericalAverage((t) => Math.cos((t * Math.PI) / 180) ** 2)).toBeCloseTo(0.5, 13);
  });

  test('of a step at 60° (1 below, 0 above) is sin² 60° = 0.75 when split there (1e-13)', () => {
    expect(hemisphericalAverage((t) => (t < 60 ? 1 : 0), [60])).toBeCloseTo(0.75, 13);
  });
});
