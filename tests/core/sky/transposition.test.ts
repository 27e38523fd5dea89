/**
 * Invariants, edge cases and bad input of the window-plane irradiance: the three sky models inside
 * planeIrradiance agree with their stand-alone functions, the parts add up, night and sun-behind are
 * documented results. Published check values are in tests/reference/.
 */
import fc from 'fast-check';
import { airMassKastenYoung } from '../../../src/core/sky/airMass';
import { extraterrestrialSpencer } from '../../../src/core/sky/extraterrestrial';
import { groundReflected, skyDiffuseAshraeClearDay, skyDiffuseHayDavies, skyDiffuseIsotropic, ashraeVerticalDiffuseRatio } from '../../../src/core/sky/transposition';
import { planeIrradiance, type PlaneIrradianceInput } from '../../../src/core/sky/planeIrradiance';
import { perezParts, skyDiffusePerez1990 } from '../../../src/core/sky/perez1990';
import { incidenceAngle } from '../../../src/core/sun/surfaceAngles';
import { withinLimits } from '../../support/possibleIrradiance';
import { expectArgumentError } from '../../support/expectError';

const cosd = (d: number) => Math.cos((d * Math.PI) / 180);
const sind = (d: number) => Math.sin((d * Math.PI) / 180);

const base: PlaneIrradianceInput = {
  dni: 750,
  dhi: 130,
  sunAltitude: 40,
  sunAzimuth: 150,
  surfaceTilt: 90,
  surfaceAzimuth: 180,
  groundAlbedo: 0.2,
  dayOfYear: 200,
  skyModel: 'perez1990',
};

const expectError = expectArgumentError;

describe('planeIrradiance', () => {
  test('beam, sky and ground add up to the total and the beam is DNI × cos θ (1e-9)', () => {
    for (const model of ['isotropic', 'hayDavies', 'perez1990'] as const) {
      const r = planeIrradiance({ ...base, skyModel: model });
      expect(r.total).toBeCloseTo(r.beam + r.sky + r.ground, 9);
      expect(r.beam).toBeCloseTo(750 * cosd(r.incidence), 9);
    }
  });

  test('each model equals its stand-alone function on the same inputs (1e-9)', () => {
    const zenith = 90 - base.sunAltitude;
    const r = (model: PlaneIrradianceInput['skyModel']) => planeIrradiance({ ...base, skyModel: model });
    const e0 = extraterrestrialSpencer(base.dayOfYear);
    const cosTheta = cosd(r('isotropic').incidence);
    expect(r('isotropic').sky).toBeCloseTo(skyDiffuseIsotropic(base.dhi, base.surfaceTilt), 9);
    expect(r('hayDavies').sky).toBeCloseTo(skyDiffuseHayDavies(base.dhi, base.dni, e0, cosTheta, zenith, base.surfaceTilt), 9);
    expect(r('perez1990').sky).toBeCloseTo(
      skyDiffusePerez1990(base.surfaceTilt, base.surfaceAzimuth, base.dhi, base.dni, e0, zenith, base.sunAzimuth, airMassKastenYoung(base.sunAltitude)),
      9,
    );
    const ghi = base.dni * sind(base.sunAltitude) + base.dhi;
    expect(r('perez1990').ground).toBeCloseTo(groundReflected(ghi, base.groundAlbedo, base.surfaceTilt), 9);
  });

  test('a horizontal surface facing up under an isotropic sky receives exactly the global horizontal (1e-9)', () => {
    const r = planeIrradiance({ ...base, surfaceTilt: 0, skyModel: 'isotropic' });
    expect(r.total).toBeCloseTo(base.dni * sind(base.sunAltitude) + base.dhi, 9);
    expect(r.ground).toBe(0);
  });

  test('with the sun behind the window the beam is 0 and the incidence is above 90°', () => {
    const r = planeIrradiance({ ...base, sunAzimuth: 0, surfaceAzimuth: 180, sunAltitude: 20 });
    expect(r.incidence).toBeGreaterThan(90);
    expect(r.beam).toBe(0);
    for (const model of ['hayDavies', 'perez1990'] as const) {
      const anisotropic = planeIrradiance({ ...base, sunAzimuth: 0, sunAltitude: 20, skyModel: model });
      expect(anisotropic.beam).toBe(0);
      expect(anisotropic.sky).toBeGreaterThanOrEqual(0);
    }
  });

  test('at night the beam is 0 and any diffuse given is spread isotropically by every model', () => {
    for (const model of ['isotropic', 'hayDavies', 'perez1990'] as const) {
      const r = planeIrradiance({ ...base, sunAltitude: -5, dni: 0, dhi: 10, skyModel: model });
      expect(r.beam).toBe(0);
      expect(r.sky).toBeCloseTo(5, 9);
      expect(r.ground).toBeCloseTo(1, 9);
    }
  });

  test('a shaded window: each part of the diffuse goes through its own multiplier (docs/diffuse-shading.md)', () => {
    const shade = { isotropic: 0.55, circumsolar: 0.3, horizon: 0.7, ground: 0.8 };
    const theta = incidenceAngle(base.sunAltitude, base.sunAzimuth, base.surfaceTilt, base.surfaceAzimuth);
    const cosTheta = cosd(theta);
    const e0 = extraterrestrialSpencer(base.dayOfYear);
    // Perez: isotropic × sky view ratio, circumsolar × sunlit fraction, horizon × band share.
    const parts = perezParts(90, 180, base.dhi, base.dni, e0, 90 - base.sunAltitude, base.sunAzimuth, airMassKastenYoung(base.sunAltitude));
    const perez = planeIrradiance({ ...base, shade });
    expect(perez.sky).toBeCloseTo(parts.isotropic * 0.55 + parts.circumsolar * 0.3 + parts.horizon * 0.7, 9);
    expect(perez.skyUnshaded).toBeCloseTo(parts.total, 9);
    expect(perez.ground).toBeCloseTo(perez.groundUnshaded * 0.8, 9);
    expect(perez.beam).toBe(planeIrradiance(base).beam);
    // Hay–Davies: (1 − Ai) isotropic × sky view ratio, Ai Rb circumsolar × sunlit fraction.
    const ai = base.dni / e0;
    const rb = cosTheta / sind(base.sunAltitude);
    const hd = planeIrradiance({ ...base, skyModel: 'hayDavies', shade });
    expect(hd.sky).toBeCloseTo(base.dhi * ((1 - ai) * 0.5 * 0.55 + ai * rb * 0.3), 9);
    expect(hd.skyUnshaded).toBeCloseTo(skyDiffuseHayDavies(base.dhi, base.dni, e0, cosTheta, 90 - base.sunAltitude, 90), 9);
    // Isotropic: all of it × sky view ratio.
    const iso = planeIrradiance({ ...base, skyModel: 'isotropic', shade });
    expect(iso.sky).toBeCloseTo(base.dhi * 0.5 * 0.55, 9);
    expect(iso.total).toBeCloseTo(iso.beam + iso.sky + iso.ground, 9);
  });

  test('no shade is the unshaded window, and the unshaded parts are reported as such', () => {
    for (const skyModel of ['isotropic', 'hayDavies', 'perez1990'] as const) {
      const open = planeIrradiance({ ...base, skyModel });
      const ones = planeIrradiance({ ...base, skyModel, shade: { isotropic: 1, circumsolar: 1, horizon: 1, ground: 1 } });
      expect(ones).toEqual(open);
      expect(open.sky).toBe(open.skyUnshaded);
      expect(open.ground).toBe(open.groundUnshaded);
    }
  });

  test('at night every model spreads the diffuse isotropically, so only the sky view ratio applies', () => {
    for (const skyModel of ['isotropic', 'hayDavies', 'perez1990'] as const) {
      const r = planeIrradiance({ ...base, skyModel, sunAltitude: -5, dni: 0, dhi: 10, shade: { isotropic: 0.5, circumsolar: 0, horizon: 0, ground: 0.25 } });
      expect(r.sky).toBeCloseTo(2.5, 9);
      expect(r.ground).toBeCloseTo(0.25, 9);
    }
  });

  test('random valid inputs give finite, non-negative parts for every model', () => {
    fc.assert(
      fc.property(
        fc.record({
          dni: fc.double({ min: 0, max: 2000, noNaN: true }),
          dhi: fc.double({ min: 0, max: 2000, noNaN: true }),
          sunAltitude: fc.double({ min: -90, max: 90, noNaN: true }),
          sunAzimuth: fc.double({ min: 0, max: 360, noNaN: true }),
          surfaceTilt: fc.double({ min: 0, max: 180, noNaN: true }),
          surfaceAzimuth: fc.double({ min: 0, max: 360, noNaN: true }),
          groundAlbedo: fc.double({ min: 0, max: 1, noNaN: true }),
          dayOfYear: fc.double({ min: 1, max: 366, noNaN: true }),
          skyModel: fc.constantFrom('isotropic' as const, 'hayDavies' as const, 'perez1990' as const),
          shade: fc.record({ isotropic: fc.double({ min: 0, max: 1, noNaN: true }), circumsolar: fc.double({ min: 0, max: 1, noNaN: true }), horizon: fc.double({ min: 0, max: 1, noNaN: true }), ground: fc.double({ min: 0, max: 1, noNaN: true }) }),
        }),
        (drawn) => {
          const input = withinLimits(drawn);
          const r = planeIrradiance(input);
          expect(r.sky).toBeLessThanOrEqual(r.skyUnshaded + 1e-9);
          expect(r.ground).toBeLessThanOrEqual(r.groundUnshaded + 1e-9);
          for (const v of [r.beam, r.sky, r.ground, r.total, r.incidence, r.skyUnshaded, r.groundUnshaded]) {
            expect(Number.isFinite(v)).toBe(true);
            expect(v).toBeGreaterThanOrEqual(0);
          }
          expect(r.incidence).toBeLessThanOrEqual(180);
        },
      ),
      { numRuns: 500, seed: 3 },
    );
  });

  test('bad fields are refused naming the field', () => {
    expectError(() => planeIrradiance({ ...base, dni: -1 }), 'dni');
    expectError(() => planeIrradiance({ ...base, dhi: Number.NaN }), 'dhi');
    expectError(() => planeIrradiance({ ...base, groundAlbedo: 1.5 }), 'groundAlbedo');
    expectError(() => planeIrradiance({ ...base, groundAlbedo: -0.1 }), 'groundAlbedo');
    expectError(() => planeIrradiance({ ...base, shade: { isotropic: 2, circumsolar: 1, horizon: 1, ground: 1 } }), 'shade.isotropic');
    expectError(() => planeIrradiance({ ...base, shade: { isotropic: 1, circumsolar: Number.NaN, horizon: 1, ground: 1 } }), 'shade.circumsolar');
    expectError(() => planeIrradiance({ ...base, shade: { isotropic: 1, circumsolar: 1, horizon: -0.1, ground: 1 } }), 'shade.horizon');
    expectError(() => planeIrradiance({ ...base, shade: { isotropic: 1, circumsolar: 1, horizon: 1, ground: 1.1 } }), 'shade.ground');
    expectError(() => planeIrradiance({ ...base, dayOfYear: 0 }), 'dayOfYear');
    expectError(() => planeIrradiance({ ...base, surfaceTilt: 190 }), 'surfaceTilt');
    expectError(() => planeIrradiance({ ...base, skyModel: 'cloudy' as never }), 'skyModel');
  });
});

describe('ASHRAE clear-day diffuse on tilted surfaces', () => {
  test('a vertical surface gets Y × DHI and a horizontal one DHI (1e-12)', () => {
    expect(skyDiffuseAshraeClearDay(100, 30, 90)).toBeCloseTo(100 * ashraeVerticalDiffuseRatio(30), 12);
    expect(skyDiffuseAshraeClearDay(100, 30, 0)).toBeCloseTo(100, 12);
  });

  test('ground reflection refuses an albedo above 1 naming groundAlbedo', () => {
    expectError(() => groundReflected(500, 1.2, 90), 'groundAlbedo');
  });
});
