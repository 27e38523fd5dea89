/**
 * Source: Duffie, J. A. & Beckman, W. A., Solar Engineering of Thermal Processes, 4th ed., ch. 5:
 * the Fresnel equations (sin/tan form, Eqs. 5.1.1–5.1.2), Snell's law, the transmittance of N
 * non-absorbing covers per polarisation τ = (1 − r)/(1 + (2N − 1) r) (Eq. 5.1.8), and Example 5.1.1
 * (one and two covers at 60°, n = 1.526: τ ≈ 0.84 and 0.76 — values from memory, so a tolerance of
 * 0.01). Normal-incidence reflectance of one interface ((n − 1)/(n + 1))² = 0.0434 for n = 1.526
 * (docs/methods.md#fresnel-optics-of-uncoated-panes). Equation numbers from memory.
 */
import { RAD } from '../../src/core/common/angles';
import { GLASS_REFRACTIVE_INDEX, interfaceReflectance, paneStackTransmittance } from '../../src/core/glazing/fresnel';

const n = GLASS_REFRACTIVE_INDEX;

describe('Fresnel reflection and transmission of glass panes', () => {
  test('n is 1.526 and one interface reflects ((n − 1)/(n + 1))² = 0.0434 at normal incidence (within 5e-5)', () => {
    expect(n).toBe(1.526);
    const r = interfaceReflectance(0);
    expect(Math.abs(r.perpendicular - 0.0434)).toBeLessThan(5e-5);
    expect(r.parallel).toBeCloseTo(r.perpendicular, 15);
  });

  test('the cosine form agrees with the sin²/tan² form of Eqs. 5.1.1–5.1.2 from 1° to 89° (1e-12)', () => {
    for (let theta = 1; theta < 90; theta += 4) {
      const t1 = theta * RAD;
      const t2 = Math.asin(Math.sin(t1) / n);
      const perp = Math.sin(t2 - t1) ** 2 / Math.sin(t2 + t1) ** 2;
      const par = Math.tan(t2 - t1) ** 2 / Math.tan(t2 + t1) ** 2;
      const r = interfaceReflectance(theta);
      expect(r.perpendicular).toBeCloseTo(perp, 12);
      expect(r.parallel).toBeCloseTo(par, 12);
    }
  });

  test('without absorption N panes transmit the average of (1 − r)/(1 + (2N − 1) r) over the polarisations (1e-12)', () => {
    for (const panes of [1, 2, 3, 4]) {
      for (const theta of [0, 20, 45, 60, 75, 85]) {
        const r = interfaceReflectance(theta);
        const closed = ((1 - r.perpendicular) / (1 + (2 * panes - 1) * r.perpendicular) + (1 - r.parallel) / (1 + (2 * panes - 1) * r.parallel)) / 2;
        expect(paneStackTransmittance(theta, panes, 0)).toBeCloseTo(closed, 12);
      }
    }
  });

  test('Example 5.1.1 (from memory): at 60° one cover transmits about 0.84 and two about 0.76 (within 0.01)', () => {
    expect(Math.abs(paneStackTransmittance(60, 1, 0) - 0.84)).toBeLessThan(0.01);
    expect(Math.abs(paneStackTransmittance(60, 2, 0) - 0.76)).toBeLessThan(0.01);
  });

  test('at normal incidence one absorbing pane follows τ = τa (1 − r)²/(1 − (r τa)²) with τa = e^−KL (1e-12)', () => {
    const r = ((n - 1) / (n + 1)) ** 2;
    const tauA = Math.exp(-0.05);
    expect(paneStackTransmittance(0, 1, 0.05)).toBeCloseTo((tauA * (1 - r) ** 2) / (1 - (r * tauA) ** 2), 12);
  });

  test('grazing incidence transmits nothing', () => {
    expect(paneStackTransmittance(90, 1, 0)).toBe(0);
    expect(paneStackTransmittance(89.999, 2, 0.05)).toBeLessThan(1e-3);
  });
});
