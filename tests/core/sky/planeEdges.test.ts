/**
 * The window-plane irradiance (planeIrradiance, preparePlane, perezBrightnessColumns) at the suns
 * where its branches turn: low suns under the cos 85° floor, the sun behind the window, night with a
 * beam still given, an unchecked beam above the extraterrestrial value, a Perez sum below zero, and
 * the shared brightness coefficients.
 *
 * Sources: each sky model inside the plane kernel must give what its stand-alone function gives —
 * those are checked against published values and the published equations written out by hand
 * (tests/reference/isotropic-sky, hay-davies, perez-1990 and ashrae-clear-sky; tests/core/sky/
 * perezBranches and skyEdges); the ground term is Duffie & Beckman (Solar Engineering of Thermal
 * Processes, 4th ed., Eq. 2.15.1) GHI ρg (1 − cos Σ)/2 with GHI = DNI sin β + DHI while the sun is
 * up and DHI alone when it is not (planeIrradiance's documented convention); Hay & Davies' anisotropy
 * index Ai = DNI/E0n is at most 1; a Perez sum below zero is floored at 0 (skyDiffusePerez1990).
 */
import { airMassKastenYoung } from '../../../src/core/sky/airMass';
import { extraterrestrialSpencer } from '../../../src/core/sky/extraterrestrial';
import { perezParts, skyDiffusePerez1990 } from '../../../src/core/sky/perez1990';
import { type PlaneIrradianceInput, type PlaneParts, perezBrightnessColumns, planeIrradiance, preparePlane } from '../../../src/core/sky/planeIrradiance';
import { groundReflected, skyDiffuseAshraeClearDay, skyDiffuseHayDavies, skyDiffuseIsotropic } from '../../../src/core/sky/transposition';

const RAD = Math.PI / 180;
const sind = (d: number) => Math.sin(d * RAD);
const cosd = (d: number) => Math.cos(d * RAD);
const close = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(b));

const base: PlaneIrradianceInput = { dni: 0, dhi: 0, sunAltitude: 0, sunAzimuth: 180, surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.25, dayOfYear: 172, skyModel: 'perez1990' };

describe('every sky model inside the plane equals its stand-alone function', () => {
  test('low suns (under and over the cos 85° floor), suns beside and behind the window, tilts from up to down', () => {
    const e0 = extraterrestrialSpencer(172);
    let compared = 0;
    for (const altitude of [1.5, 3, 4.9, 5.1, 12, 40, 75]) {
      // A sky within the physically possible limits at this sun (Long & Shi 2008): half the allowed diffuse, a beam to suit.
      const dhi = 0.5 * (0.95 * e0 * sind(altitude) ** 1.2 + 50);
      const dni = Math.min(0.7 * e0, (0.9 * (1.5 * e0 * sind(altitude) ** 1.2 + 100) - dhi) / sind(altitude));
      for (const sunAzimuth of [180, 250, 300, 20]) {
        for (const surfaceTilt of [0, 30, 90, 120, 180]) {
          const input = { ...base, dni, dhi, sunAltitude: altitude, sunAzimuth, surfaceTilt };
          const r = (skyModel: PlaneIrradianceInput['skyModel']) => planeIrradiance({ ...input, skyModel });
          const cosTheta = cosd(r('isotropic').incidence);
          const zenith = 90 - altitude;
          expect(close(r('isotropic').sky, skyDiffuseIsotropic(dhi, surfaceTilt))).toBe(true);
          expect(close(r('hayDavies').sky, skyDiffuseHayDavies(dhi, dni, e0, Math.max(-1, Math.min(1, cosTheta)), zenith, surfaceTilt))).toBe(true);
          expect(close(r('perez1990').sky, skyDiffusePerez1990(surfaceTilt, 180, dhi, dni, e0, zenith, sunAzimuth, airMassKastenYoung(altitude)))).toBe(true);
          expect(close(r('ashraeClearDay').sky, skyDiffuseAshraeClearDay(dhi, r('isotropic').incidence, surfaceTilt))).toBe(true);
          for (const model of ['isotropic', 'hayDavies', 'perez1990', 'ashraeClearDay'] as const) {
            const p = r(model);
            expect(close(p.ground, groundReflected(dni * sind(altitude) + dhi, 0.25, surfaceTilt))).toBe(true);
            expect(close(p.beam, dni * Math.max(0, cosTheta))).toBe(true);
          }
          compared++;
        }
      }
    }
    expect(compared).toBe(7 * 4 * 5);
  });

  test('at night a beam still given adds nothing: no beam on the glass and the ground sees the diffuse alone', () => {
    for (const model of ['isotropic', 'hayDavies', 'perez1990', 'ashraeClearDay'] as const) {
      const r = planeIrradiance({ ...base, skyModel: model, sunAltitude: -4, dni: 300, dhi: 40, surfaceTilt: 60 });
      expect(r.beam).toBe(0);
      expect(r.sky).toBeCloseTo((40 * (1 + cosd(60))) / 2, 9);
      expect(r.ground).toBeCloseTo((40 * 0.25 * (1 - cosd(60))) / 2, 9);
    }
  });

  test('the sun exactly on the horizon counts as down: no beam, and every model spreads the diffuse isotropically', () => {
    // Altitude 0 with a beam given (any DNI up to E0n passes the limits there; the global is the diffuse alone).
    for (const model of ['isotropic', 'hayDavies', 'perez1990', 'ashraeClearDay'] as const) {
      const r = planeIrradiance({ ...base, skyModel: model, sunAltitude: 0, sunAzimuth: 200, dni: 500, dhi: 30 });
      expect(r.incidence).toBeLessThan(90);
      expect(r.beam).toBe(0);
      expect(r.sky).toBeCloseTo(15, 9);
      expect(r.ground).toBeCloseTo(30 * 0.25 * 0.5, 9);
    }
  });

  test('a low clear sun behind a vertical window: the Perez sum is negative and the sky diffuse is 0, shaded or not', () => {
    // Day 172, sun 2° high, DHI 72 and DNI 1320 (within the Long & Shi limits there): ε bin 7, Δ ≈ 1.06,
    // F1 held at 0, F2 ≈ −0.73, so DHI [(1 + cos 90°)/2 + F2 sin 90°] ≈ 72 (0.5 − 0.73) < 0.
    const input = { ...base, sunAltitude: 2, sunAzimuth: 0, dni: 1320, dhi: 72 };
    const parts = perezParts(90, 180, 72, 1320, extraterrestrialSpencer(172), 88, 0, airMassKastenYoung(2));
    expect(parts.bin).toBe(7);
    expect(parts.isotropic + parts.circumsolar + parts.horizon).toBeLessThan(-10);
    const r = planeIrradiance(input);
    expect(r.sky).toBe(0);
    expect(r.skyUnshaded).toBe(0);
    expect(planeIrradiance({ ...input, shade: { isotropic: 0.9, circumsolar: 1, horizon: 1, ground: 1 } }).sky).toBe(0);
    // Take away the horizon band and what is left of the isotropic part reaches the glass.
    expect(planeIrradiance({ ...input, shade: { isotropic: 0.9, circumsolar: 1, horizon: 0, ground: 1 } }).sky).toBeCloseTo(parts.isotropic * 0.9, 9);
  });
});

describe('prepared planes', () => {
  const out = (): PlaneParts => ({ beam: 0, sky: 0, ground: 0, total: 0, skyUnshaded: 0, groundUnshaded: 0 });

  test('Hay–Davies with an unchecked beam above the extraterrestrial value takes Ai = 1: all of the diffuse is circumsolar', () => {
    const plane = preparePlane({ surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, skyModel: 'hayDavies' });
    const o = out();
    const cosTheta = cosd(40) * cosd(10); // vertical window, sun 40° high, 10° off its normal
    plane.irradiance(o, 1450, 100, 40, sind(40), cosTheta, 1400, 1);
    expect(o.sky).toBeCloseTo((100 * cosTheta) / sind(40), 9);
    expect(o.total).toBeCloseTo(o.beam + o.sky + o.ground, 9);
  });

  test('many hours at once: only the rows listed (the first `count` of them) are worked out; the others are left as they were', () => {
    const plane = preparePlane({ surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, skyModel: 'perez1990' });
    const n = 3;
    const col = (v: number) => new Float64Array(n).fill(v);
    const c = { dni: col(600), dhi: col(100), altitude: col(35), sinAltitude: col(sind(35)), cosIncidence: col(cosd(35) * cosd(20)), dniExtra: col(1330), circumsolar: col(1), beam: col(-7), sky: col(-7), ground: col(-7), skyUnshaded: col(-7), groundUnshaded: col(-7) };
    plane.irradianceRows(Int32Array.from([0, 2]), 1, c);
    expect(c.beam[0]).toBeCloseTo(600 * cosd(35) * cosd(20), 9);
    for (const key of ['beam', 'sky', 'ground', 'skyUnshaded', 'groundUnshaded'] as const) {
      expect(c[key][1]).toBe(-7); // not listed
      expect(c[key][2]).toBe(-7); // listed after the count
    }
  });

  test('the clear-day form under a shade: all of it goes through the sky view ratio (it has no separate circumsolar or horizon part)', () => {
    const input = { ...base, skyModel: 'ashraeClearDay' as const, sunAltitude: 40, sunAzimuth: 200, dni: 700, dhi: 110 };
    const bare = planeIrradiance(input);
    const shaded = planeIrradiance({ ...input, shade: { isotropic: 0.4, circumsolar: 0.2, horizon: 0.9, ground: 0.5 } });
    expect(shaded.skyUnshaded).toBe(bare.sky);
    expect(shaded.sky).toBeCloseTo(0.4 * bare.sky, 9);
    expect(shaded.ground).toBeCloseTo(0.5 * bare.ground, 9);
  });

  test('what each model needs: the extraterrestrial irradiance for Hay–Davies and Perez only; shared coefficients for Perez only', () => {
    const flags = (skyModel: PlaneIrradianceInput['skyModel']) => {
      const p = preparePlane({ surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, skyModel });
      return [p.needsDniExtra, p.perez];
    };
    expect(flags('isotropic')).toEqual([false, false]);
    expect(flags('ashraeClearDay')).toEqual([false, false]);
    expect(flags('hayDavies')).toEqual([true, false]);
    expect(flags('perez1990')).toEqual([true, true]);
  });

  test('a window\'s constant shade applies to every hour; without one the plane is bare', () => {
    const surface = { surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, skyModel: 'isotropic' as const };
    const shaded = preparePlane({ ...surface, shade: { isotropic: 0.4, horizon: 1, ground: 0.5 } });
    const bare = preparePlane(surface);
    const [a, b] = [out(), out()];
    shaded.irradiance(a, 500, 100, 30, sind(30), 0.6, 1367, 1);
    bare.irradiance(b, 500, 100, 30, sind(30), 0.6, 1367, 1);
    expect(b.sky).toBeCloseTo(50, 9);
    expect(a.sky).toBeCloseTo(50 * 0.4, 9);
    expect(a.ground).toBeCloseTo(b.ground * 0.5, 9);
    expect(b.ground).toBeCloseTo(((500 * 0.5 + 100) * 0.2) / 2, 9);
  });

  test('shared Perez coefficients: filled only for the hours listed with the sun up and some diffuse, and the planes that use them agree with planeIrradiance', () => {
    // Five hours: sun up with diffuse, sun down, sun up with no diffuse, sun up but not listed, sun on the horizon.
    const dni = [600, 0, 700, 500, 0];
    const dhi = [120, 10, 0, 90, 20];
    const altitude = [35, -3, 50, 20, 0];
    const sinAltitude = altitude.map(sind);
    const days: number[] = [];
    const cols = perezBrightnessColumns(dni, dhi, altitude, sinAltitude, (h) => (days.push(h), extraterrestrialSpencer(172)), [0, 1, 2, 4]);
    expect(days).toEqual([0]);
    const parts = perezParts(90, 180, 120, 600, extraterrestrialSpencer(172), 55, 200, airMassKastenYoung(35));
    expect([cols.f1[0], cols.f2[0]]).toEqual([parts.f1, parts.f2]);
    expect([...cols.f1.slice(1)]).toEqual([0, 0, 0, 0]);
    expect([...cols.f2.slice(1)]).toEqual([0, 0, 0, 0]);
    const plane = preparePlane({ surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, skyModel: 'perez1990' });
    const checked = planeIrradiance({ dni: 600, dhi: 120, sunAltitude: 35, sunAzimuth: 200, surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, dayOfYear: 172, skyModel: 'perez1990', shade: { isotropic: 1, circumsolar: 0.3, horizon: 1, ground: 1 } });
    const o = out();
    plane.irradianceShared(o, 600, 120, 35, sind(35), cosd(checked.incidence), extraterrestrialSpencer(172), 0.3, cols, 0);
    for (const key of ['beam', 'sky', 'ground', 'total', 'skyUnshaded', 'groundUnshaded'] as const) expect(close(o[key], checked[key])).toBe(true);
    // Coefficients given for another sky are used as given (that is what sharing means): F1 = F2 = 0 is the isotropic sky.
    const zero = { f1: new Float64Array(1), f2: new Float64Array(1) };
    plane.irradianceShared(o, 600, 120, 35, sind(35), cosd(checked.incidence), extraterrestrialSpencer(172), 1, zero, 0);
    expect(o.sky).toBeCloseTo(60, 9);
  });
});
