/**
 * Source: Hay, J. E. & Davies, J. A. (1980), "Calculation of the solar radiation incident on an
 * inclined surface", Proc. First Canadian Solar Radiation Data Workshop; in Duffie & Beckman, Solar
 * Engineering of Thermal Processes, 4th ed., Eq. 2.16.4. Check value (as pinned in
 * pvlib-python's public test suite; docs/methods.md#sky-diffuse-on-the-window): 102.9949 W/m², isotropic part 30.1818, circumsolar part 72.8130.
 */
import { RAD } from '../../src/core/common/angles';
import { skyDiffuseHayDavies } from '../../src/core/sky/transposition';

const dhi = 118.45831879;
const dni = 939.95469881;
const dniExtra = 1321.1655834833093;
const zenith = 10.56413562;
const sunAzimuth = 144.76567754;
const tilt = 40;
const surfaceAzimuth = 180;
// Incidence cosine written out (Duffie & Beckman Eq. 1.6.3, zenith form).
const cosTheta = Math.cos(zenith * RAD) * Math.cos(tilt * RAD) + Math.sin(zenith * RAD) * Math.sin(tilt * RAD) * Math.cos((sunAzimuth - surfaceAzimuth) * RAD);

describe('Hay–Davies sky diffuse', () => {
  test('the published check case gives 102.9949 W/m² (within 1e-4)', () => {
    expect(Math.abs(skyDiffuseHayDavies(dhi, dni, dniExtra, cosTheta, zenith, tilt) - 102.9949)).toBeLessThan(1e-4);
  });

  test('its isotropic part is 30.1818 and its circumsolar part 72.8130 W/m² (within 1e-4)', () => {
    const isotropicPart = skyDiffuseHayDavies(dhi, dni, dniExtra, 0, zenith, tilt); // cos θ = 0 removes the circumsolar term
    expect(Math.abs(isotropicPart - 30.1818)).toBeLessThan(1e-4);
    expect(Math.abs(skyDiffuseHayDavies(dhi, dni, dniExtra, cosTheta, zenith, tilt) - isotropicPart - 72.813)).toBeLessThan(1e-4);
  });

  test('with no direct beam it is the isotropic sky (anisotropy index 0)', () => {
    expect(skyDiffuseHayDavies(100, 0, 1367, 0.7, 30, 40)).toBeCloseTo(88.30222216, 6);
  });
});
