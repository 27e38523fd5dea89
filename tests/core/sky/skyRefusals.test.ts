/**
 * The words of every range refusal of the sky folder (src/core/sky): extraterrestrial irradiance,
 * air mass, clear-sky models, the Erbs split, the physically possible limits, the transposition
 * models and the window-plane irradiance.
 *
 * Source: the error convention of docs/architecture.md ("The one error type"): a refusal names the
 * argument as the user sees it, the refused value and the allowed range in words, e.g.
 * `latitude = 91 is not allowed: must be a number from -90 to 90 °`; and the ranges each function
 * documents in its doc comment (irradiance 0…2000 W/m², extraterrestrial 1000…1500 W/m², angles
 * 0…180 ° or 0…360 °, altitude −90…90 °, air mass 1…40, albedo and fractions 0…1, cos −1…1, τb
 * above 0 up to 1.2, τd above 0 up to 4, Linke turbidity 1…10, elevation −500…9000 m, day 1…366).
 * The other sky tests check which argument is named; these check the whole message a user reads.
 */
import { airMassKastenYoung } from '../../../src/core/sky/airMass';
import { ashraeClearSky, ineichenPerezClearSky } from '../../../src/core/sky/clearSky';
import { decomposeErbs, diffuseFractionErbs1982 } from '../../../src/core/sky/decomposition';
import { extraterrestrialIrradiance, extraterrestrialSpencer } from '../../../src/core/sky/extraterrestrial';
import { skyDiffusePerez1990 } from '../../../src/core/sky/perez1990';
import { planeIrradiance, preparePlane, type PlaneIrradianceInput } from '../../../src/core/sky/planeIrradiance';
import { closureTolerance, diffuseRatioLimit, physicalIrradianceLimits } from '../../../src/core/sky/qualityLimits';
import {
  ashraeVerticalDiffuseRatio,
  groundReflected,
  skyDiffuseAshraeClearDay,
  skyDiffuseHayDavies,
  skyDiffuseIsotropic,
} from '../../../src/core/sky/transposition';
import { refusalMessage as refusal } from '../../support/expectError';

/** The message of the refusal thrown by `fn` (fails the test when `fn` does not refuse). */
const DEG = 'must be a number from 0 to 180 °';
const AZ = 'must be a number from 0 to 360 °';
const IRR = 'must be a number from 0 to 2000 W/m²';

describe('Perez (1990) sky diffuse', () => {
  // A valid call: tilt 40°, south, DHI 100, DNI 500, E0n 1367, zenith 30°, sun azimuth 160°, m 1.15.
  const perez = (k: number, v: number) => () => {
    const args = [40, 180, 100, 500, 1367, 30, 160, 1.15];
    args[k] = v;
    return skyDiffusePerez1990(...(args as [number, number, number, number, number, number, number, number]));
  };

  test('each of the eight arguments is refused by its own name with its range and unit', () => {
    expect(perez(0, 40)()).toBeGreaterThan(0); // the call is valid apart from the argument changed below
    expect(refusal(perez(0, 181))).toBe(`surfaceTilt = 181 is not allowed: ${DEG}`);
    expect(refusal(perez(1, -1))).toBe(`surfaceAzimuth = -1 is not allowed: ${AZ}`);
    expect(refusal(perez(2, -1))).toBe(`dhi = -1 is not allowed: ${IRR}`);
    expect(refusal(perez(3, 2001))).toBe(`dni = 2001 is not allowed: ${IRR}`);
    expect(refusal(perez(4, 999))).toBe('dniExtra = 999 is not allowed: must be a number from 1000 to 1500 W/m²');
    expect(refusal(perez(5, 180.5))).toBe(`sunZenith = 180.5 is not allowed: ${DEG}`);
    expect(refusal(perez(6, 361))).toBe(`sunAzimuth = 361 is not allowed: ${AZ}`);
    expect(refusal(perez(7, 41))).toBe('airMass = 41 is not allowed: must be a number from 1 to 40');
  });
});

describe('transposition models', () => {
  test('isotropic sky and ground reflection', () => {
    expect(refusal(() => skyDiffuseIsotropic(2500, 90))).toBe(`dhi = 2500 is not allowed: ${IRR}`);
    expect(refusal(() => skyDiffuseIsotropic(100, -5))).toBe(`surfaceTilt = -5 is not allowed: ${DEG}`);
    expect(refusal(() => groundReflected(-3, 0.2, 90))).toBe(`ghi = -3 is not allowed: ${IRR}`);
    expect(refusal(() => groundReflected(500, 1.2, 90))).toBe('groundAlbedo = 1.2 is not allowed: must be a number from 0 to 1');
    expect(refusal(() => groundReflected(500, 0.2, 200))).toBe(`surfaceTilt = 200 is not allowed: ${DEG}`);
  });

  test('Hay–Davies: each argument by its own name', () => {
    const hd = (k: number, v: number) => () => {
      const args = [100, 500, 1367, 0.5, 30, 90];
      args[k] = v;
      return skyDiffuseHayDavies(...(args as [number, number, number, number, number, number]));
    };
    expect(hd(0, 100)()).toBeGreaterThan(0);
    expect(refusal(hd(0, -1))).toBe(`dhi = -1 is not allowed: ${IRR}`);
    expect(refusal(hd(1, -1))).toBe(`dni = -1 is not allowed: ${IRR}`);
    expect(refusal(hd(2, 1600))).toBe('dniExtra = 1600 is not allowed: must be a number from 1000 to 1500 W/m²');
    expect(refusal(hd(3, 1.5))).toBe('cosIncidence = 1.5 is not allowed: must be a number from -1 to 1');
    expect(refusal(hd(4, -2))).toBe(`sunZenith = -2 is not allowed: ${DEG}`);
    expect(refusal(hd(5, 181))).toBe(`surfaceTilt = 181 is not allowed: ${DEG}`);
  });

  test('ASHRAE clear-day diffuse and its vertical ratio', () => {
    expect(refusal(() => ashraeVerticalDiffuseRatio(190))).toBe(`incidence = 190 is not allowed: ${DEG}`);
    expect(refusal(() => skyDiffuseAshraeClearDay(-1, 30, 90))).toBe(`dhi = -1 is not allowed: ${IRR}`);
    expect(refusal(() => skyDiffuseAshraeClearDay(100, -1, 90))).toBe(`incidence = -1 is not allowed: ${DEG}`);
    expect(refusal(() => skyDiffuseAshraeClearDay(100, 30, 181))).toBe(`surfaceTilt = 181 is not allowed: ${DEG}`);
  });
});

describe('extraterrestrial irradiance, air mass and clear skies', () => {
  test('day of the year 1…366 and sun altitude −90…90 °', () => {
    expect(refusal(() => extraterrestrialIrradiance(367))).toBe('dayOfYear = 367 is not allowed: must be a number from 1 to 366');
    expect(refusal(() => extraterrestrialSpencer(0.5))).toBe('dayOfYear = 0.5 is not allowed: must be a number from 1 to 366');
    expect(refusal(() => airMassKastenYoung(91))).toBe('sunAltitude = 91 is not allowed: must be a number from -90 to 90 °');
  });

  test('ASHRAE τb/τd model: altitude, day, τb above 0 up to 1.2, τd above 0 up to 4', () => {
    expect(refusal(() => ashraeClearSky(-91, 100, 0.4, 2))).toBe('sunAltitude = -91 is not allowed: must be a number from -90 to 90 °');
    expect(refusal(() => ashraeClearSky(30, 0, 0.4, 2))).toBe('dayOfYear = 0 is not allowed: must be a number from 1 to 366');
    expect(refusal(() => ashraeClearSky(30, 100, 0, 2))).toBe('tauB = 0 is not allowed: must be a number above 0 and up to 1.2');
    expect(refusal(() => ashraeClearSky(30, 100, 1.3, 2))).toBe('tauB = 1.3 is not allowed: must be a number above 0 and up to 1.2');
    expect(refusal(() => ashraeClearSky(30, 100, 0.4, 0))).toBe('tauD = 0 is not allowed: must be a number above 0 and up to 4');
  });

  test('Ineichen–Perez model: altitude, day, Linke turbidity 1…10, elevation −500…9000 m', () => {
    expect(refusal(() => ineichenPerezClearSky(90.5, 100, 3, 0))).toBe('sunAltitude = 90.5 is not allowed: must be a number from -90 to 90 °');
    expect(refusal(() => ineichenPerezClearSky(30, 366.5, 3, 0))).toBe('dayOfYear = 366.5 is not allowed: must be a number from 1 to 366');
    expect(refusal(() => ineichenPerezClearSky(30, 100, 0.9, 0))).toBe('linkeTurbidity = 0.9 is not allowed: must be a number from 1 to 10');
    expect(refusal(() => ineichenPerezClearSky(30, 100, 3, 9001))).toBe('elevation = 9001 is not allowed: must be a number from -500 to 9000 m');
  });
});

describe('Erbs split and the physically possible limits', () => {
  test('clearness index 0…1, global 0…2000 W/m², zenith 0…180 °, day 1…366', () => {
    expect(refusal(() => diffuseFractionErbs1982(1.01))).toBe('clearnessIndex = 1.01 is not allowed: must be a number from 0 to 1');
    expect(refusal(() => decomposeErbs(2001, 30, 100))).toBe(`ghi = 2001 is not allowed: ${IRR}`);
    expect(refusal(() => decomposeErbs(100, -1, 100))).toBe(`sunZenith = -1 is not allowed: ${DEG}`);
    expect(refusal(() => decomposeErbs(100, 30, 400))).toBe('dayOfYear = 400 is not allowed: must be a number from 1 to 366');
  });

  test('limit functions: cos z −1…1, extraterrestrial 1000…1500 W/m², zenith 0…180 °', () => {
    expect(refusal(() => physicalIrradianceLimits(1.1, 1367))).toBe('cosZenith = 1.1 is not allowed: must be a number from -1 to 1');
    expect(refusal(() => physicalIrradianceLimits(0.5, 900))).toBe('extraterrestrialNormal = 900 is not allowed: must be a number from 1000 to 1500 W/m²');
    expect(refusal(() => diffuseRatioLimit(-1))).toBe(`zenith = -1 is not allowed: ${DEG}`);
    expect(refusal(() => closureTolerance(181))).toBe(`zenith = 181 is not allowed: ${DEG}`);
  });
});

describe('window-plane irradiance', () => {
  const base: PlaneIrradianceInput = {
    dni: 500,
    dhi: 100,
    sunAltitude: 40,
    sunAzimuth: 150,
    surfaceTilt: 90,
    surfaceAzimuth: 180,
    groundAlbedo: 0.2,
    dayOfYear: 200,
    skyModel: 'perez1990',
  };

  test('each field by its own name, with its range and unit', () => {
    expect(planeIrradiance(base).total).toBeGreaterThan(0);
    expect(refusal(() => planeIrradiance({ ...base, dni: 2100 }))).toBe(`dni = 2100 is not allowed: ${IRR}`);
    expect(refusal(() => planeIrradiance({ ...base, dhi: -0.5 }))).toBe(`dhi = -0.5 is not allowed: ${IRR}`);
    expect(refusal(() => planeIrradiance({ ...base, sunAltitude: 95 }))).toBe('sunAltitude = 95 is not allowed: must be a number from -90 to 90 °');
    expect(refusal(() => planeIrradiance({ ...base, sunAzimuth: 400 }))).toBe(`sunAzimuth = 400 is not allowed: ${AZ}`);
    expect(refusal(() => planeIrradiance({ ...base, surfaceTilt: -1 }))).toBe(`surfaceTilt = -1 is not allowed: ${DEG}`);
    expect(refusal(() => planeIrradiance({ ...base, surfaceAzimuth: 361 }))).toBe(`surfaceAzimuth = 361 is not allowed: ${AZ}`);
    expect(refusal(() => planeIrradiance({ ...base, groundAlbedo: 2 }))).toBe('groundAlbedo = 2 is not allowed: must be a number from 0 to 1');
    expect(refusal(() => planeIrradiance({ ...base, dayOfYear: 0 }))).toBe('dayOfYear = 0 is not allowed: must be a number from 1 to 366');
  });

  test('the sky model lists the four accepted names; a shade that is not an object names shade', () => {
    expect(refusal(() => planeIrradiance({ ...base, skyModel: 'cloudy' as never }))).toBe(
      'skyModel = "cloudy" is not allowed: must be one of "isotropic", "hayDavies", "perez1990", "ashraeClearDay"',
    );
    expect(refusal(() => planeIrradiance({ ...base, shade: null as never }))).toBe(
      'shade = blank is not allowed: must be the four diffuse multipliers (isotropic, circumsolar, horizon, ground), each 0…1',
    );
    expect(refusal(() => planeIrradiance({ ...base, shade: 0.5 as never }))).toBe(
      'shade = 0.5 is not allowed: must be the four diffuse multipliers (isotropic, circumsolar, horizon, ground), each 0…1',
    );
    expect(refusal(() => planeIrradiance({ ...base, shade: { isotropic: 1, circumsolar: 1.5, horizon: 1, ground: 1 } }))).toBe(
      'shade.circumsolar = 1.5 is not allowed: must be a number from 0 to 1',
    );
  });

  test('a prepared plane checks its fields once, by the same names', () => {
    const surface = { surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, skyModel: 'perez1990' as const };
    expect(preparePlane(surface).perez).toBe(true);
    expect(refusal(() => preparePlane({ ...surface, surfaceTilt: 180.5 }))).toBe(`surfaceTilt = 180.5 is not allowed: ${DEG}`);
    expect(refusal(() => preparePlane({ ...surface, surfaceAzimuth: -0.5 }))).toBe(`surfaceAzimuth = -0.5 is not allowed: ${AZ}`);
    expect(refusal(() => preparePlane({ ...surface, groundAlbedo: -0.1 }))).toBe('groundAlbedo = -0.1 is not allowed: must be a number from 0 to 1');
    expect(refusal(() => preparePlane({ ...surface, skyModel: 'overcast' as never }))).toMatch(/^skyModel = "overcast" is not allowed: must be one of "isotropic"/);
    expect(refusal(() => preparePlane({ ...surface, shade: { isotropic: 0.5, horizon: 1.2, ground: 1 } }))).toBe(
      'shade.horizon = 1.2 is not allowed: must be a number from 0 to 1',
    );
  });
});
