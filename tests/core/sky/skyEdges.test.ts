/**
 * The edges of the sky folder's simpler models, where a published formula switches branch: the
 * Hay–Davies anisotropy index and circumsolar ratio, the ASHRAE clear-day form above and below a
 * vertical surface, the pieces of the Erbs correlation and the floors of the split, and the
 * physically possible limits at their own value and with the sun down.
 *
 * Sources (each formula written out by hand in its test):
 * - Hay, J. E. & Davies, J. A. (1980), in Duffie & Beckman, Solar Engineering of Thermal Processes,
 *   4th ed., Eq. 2.16.4: Id,T = DHI [(1 − Ai)(1 + cos Σ)/2 + Ai Rb], Ai = DNI / E0n (the share of
 *   the extraterrestrial beam that arrives, at most 1), Rb = max(0, cos θ) / cos z; the cos 85°
 *   floor of cos z is the one the Perez (1990) model uses (as transposition.ts documents).
 * - ASHRAE Handbook—Fundamentals (2013) ch. 14 (from memory): Ed = Edh (Y sin Σ + cos Σ) for
 *   Σ ≤ 90°, Edh Y sin Σ beyond, Y = max(0.45, 0.55 + 0.437 cos θ + 0.313 cos² θ).
 * - Erbs, D. G., Klein, S. A. & Duffie, J. A. (1982), Solar Energy 28(4), 293–302, Eq. 1: the first
 *   piece for kt ≤ 0.22, the quartic for 0.22 < kt ≤ 0.80, 0.165 above; kt = GHI / (E0 cos z) with
 *   the documented floor 0.065 on cos z and kt at most 1; E0 by Spencer (1971) at 1366.1 W/m².
 * - Long, C. N. & Shi, Y. (2008), The Open Atmospheric Science Journal 2, 23–37 (from memory):
 *   GHI ≤ 1.5 Sa μ0^1.2 + 100, DHI ≤ 0.95 Sa μ0^1.2 + 50, DNI ≤ Sa, "at or below" the limit passing.
 */
import { decomposeErbs, diffuseFractionErbs1982 } from '../../../src/core/sky/decomposition';
import { isPossibleGlobal, isPossibleIrradiance, physicalIrradianceLimits, requirePossibleIrradiance } from '../../../src/core/sky/qualityLimits';
import { skyDiffuseAshraeClearDay, skyDiffuseHayDavies } from '../../../src/core/sky/transposition';

const RAD = Math.PI / 180;
const cosd = (d: number) => Math.cos(d * RAD);
const sind = (d: number) => Math.sin(d * RAD);
/** Spencer (1971): (r0/r)² by its Fourier series, times 1366.1 W/m². */
function spencer(n: number): number {
  const g = (2 * Math.PI * (n - 1)) / 365;
  return 1366.1 * (1.00011 + 0.034221 * Math.cos(g) + 0.00128 * Math.sin(g) + 0.000719 * Math.cos(2 * g) + 0.000077 * Math.sin(2 * g));
}

describe('Hay–Davies (1980) at its edges', () => {
  test('a beam above the extraterrestrial value counts as Ai = 1: all of the diffuse is circumsolar', () => {
    // DNI 1450 > E0n 1400 (a measurement the caller did not screen): Id,T = DHI · Rb.
    expect(skyDiffuseHayDavies(100, 1450, 1400, 0.8, 30, 60)).toBeCloseTo((100 * 0.8) / cosd(30), 9);
  });

  test('with the sun behind the plane Rb is 0 and only the isotropic share (1 − Ai) remains', () => {
    const ai = 600 / 1367;
    expect(skyDiffuseHayDavies(120, 600, 1367, -0.4, 40, 90)).toBeCloseTo(120 * (1 - ai) * 0.5, 9);
  });

  test('with the sun 3° high the circumsolar ratio divides by cos 85°, not by cos 87°', () => {
    const ai = 400 / 1367;
    const want = 80 * ((1 - ai) * 0.5 + (ai * 0.9) / cosd(85));
    expect(skyDiffuseHayDavies(80, 400, 1367, 0.9, 87, 90)).toBeCloseTo(want, 9);
  });

  test('with the sun on the horizon (zenith 90°) there is no circumsolar disc: the isotropic sky', () => {
    expect(skyDiffuseHayDavies(40, 300, 1367, 0.9, 90, 90)).toBeCloseTo(20, 12);
    expect(skyDiffuseHayDavies(40, 300, 1367, 0.9, 120, 30)).toBeCloseTo((40 * (1 + cosd(30))) / 2, 12);
  });
});

describe('ASHRAE clear-day diffuse on tilted surfaces', () => {
  test('Σ ≤ 90°: Edh (Y sin Σ + cos Σ); Σ > 90°: Edh Y sin Σ (the horizontal-sky term dropped)', () => {
    for (const [incidence, tilt] of [
      [30, 30],
      [70, 60],
      [130, 45],
      [30, 120],
      [70, 150],
      [100, 135],
    ]) {
      const c = cosd(incidence);
      const y = Math.max(0.45, 0.55 + 0.437 * c + 0.313 * c * c);
      const want = tilt <= 90 ? 150 * (y * sind(tilt) + cosd(tilt)) : 150 * y * sind(tilt);
      expect(skyDiffuseAshraeClearDay(150, incidence, tilt)).toBeCloseTo(want, 9);
    }
  });
});

describe('Erbs et al. (1982) at the joins of its pieces and the floors of the split', () => {
  test('kt = 0.22 takes the first piece and kt = 0.80 the quartic (each piece up to and including its end)', () => {
    expect(diffuseFractionErbs1982(0.22)).toBeCloseTo(1 - 0.09 * 0.22, 14);
    const quartic = (kt: number) => 0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4;
    expect(diffuseFractionErbs1982(0.8)).toBeCloseTo(quartic(0.8), 14);
    expect(diffuseFractionErbs1982(0.8000001)).toBe(0.165);
    expect(diffuseFractionErbs1982(0.2200001)).toBeCloseTo(quartic(0.2200001), 14);
  });

  test('the sun 3° high: kt and the direct normal divide by the floor 0.065, not by cos 87° (0.0523)', () => {
    const e0 = spencer(1);
    const kt = 30 / (e0 * 0.065);
    const dhi = 30 * (0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4);
    const r = decomposeErbs(30, 87, 1);
    expect(r.clearnessIndex).toBeCloseTo(kt, 12);
    expect(r.dhi).toBeCloseTo(dhi, 9);
    expect(r.dni).toBeCloseTo((30 - dhi) / 0.065, 9);
  });

  test('a global above the extraterrestrial on the horizontal gives kt = 1 (the last piece: 16.5 % diffuse)', () => {
    // 1400 / (1321.6 · cos 10°) = 1.076, within the physically possible global (≈ 2046 W/m²).
    expect(1400 / (spencer(172) * cosd(10))).toBeGreaterThan(1);
    const r = decomposeErbs(1400, 10, 172);
    expect(r.clearnessIndex).toBe(1);
    expect(r.dhi).toBeCloseTo(1400 * 0.165, 9);
    expect(r.dni).toBeCloseTo((1400 * 0.835) / cosd(10), 9);
  });

  test('the sun exactly on the horizon: no beam, all of the global is diffuse', () => {
    expect(decomposeErbs(50, 90, 100)).toMatchObject({ dni: 0, dhi: 50 });
  });

  test('a global past its limit is refused with the limit, the sun and the day\'s extraterrestrial in the words', () => {
    const sa = spencer(172);
    const limit = 1.5 * sa * cosd(80) ** 1.2 + 100;
    expect(() => decomposeErbs(500, 80, 172)).toThrow(
      `ghi = 500 is not allowed: must be at most ${Number(limit.toFixed(1))} W/m², the physically possible limit (Long & Shi 2008) with the sun 10° high and an extraterrestrial ${Number(sa.toFixed(1))} W/m²; check the units (W/m², not hourly sums in Wh/m² or kJ/m²), the date-time and the site`,
    );
    // The sun exactly on the horizon is "at or below" it, not "0° high".
    expect(() => decomposeErbs(120, 90, 172)).toThrow(/^ghi = 120 is not allowed: must be at most 100 W\/m², the physically possible limit \(Long & Shi 2008\) with the sun at or below the horizon and/);
    expect(() => decomposeErbs(120, 95, 172)).toThrow(
      `ghi = 120 is not allowed: must be at most 100 W/m², the physically possible limit (Long & Shi 2008) with the sun at or below the horizon and an extraterrestrial ${Number(sa.toFixed(1))} W/m²`,
    );
  });
});

describe('Long & Shi (2008) limits: a value at the limit passes, above it fails', () => {
  test('direct, diffuse and global each at their own limit pass; 0.01 W/m² more fails', () => {
    for (const altitude of [0.5, 10, 35, 60, 90]) {
      const mu = sind(altitude);
      const sa = spencer(3);
      const l = physicalIrradianceLimits(mu, sa);
      expect(l.dhi).toBeCloseTo(0.95 * sa * mu ** 1.2 + 50, 9);
      expect(isPossibleIrradiance(l.dni, 0, mu, sa)).toBe(true);
      expect(isPossibleIrradiance(l.dni + 0.01, 0, mu, sa)).toBe(false);
      expect(isPossibleIrradiance(0, l.dhi, mu, sa)).toBe(true);
      expect(isPossibleIrradiance(0, l.dhi + 0.01, mu, sa)).toBe(false);
      expect(isPossibleGlobal(l.ghi, mu, sa)).toBe(true);
      expect(isPossibleGlobal(l.ghi + 0.01, mu, sa)).toBe(false);
    }
  });

  test('with the sun down only the allowances are left: 50 W/m² of diffuse, 100 of global, any beam up to Sa', () => {
    for (const mu of [0, -0.2, -1]) {
      expect(isPossibleIrradiance(0, 50, mu, 1367)).toBe(true);
      expect(isPossibleIrradiance(0, 50.01, mu, 1367)).toBe(false);
      expect(isPossibleIrradiance(1367, 50, mu, 1367)).toBe(true);
      expect(isPossibleGlobal(100, mu, 1367)).toBe(true);
      expect(isPossibleGlobal(100.01, mu, 1367)).toBe(false);
      expect(() => requirePossibleIrradiance(1000, 50, mu, 1367)).not.toThrow();
    }
  });

  test('the refusal names the component past its limit, in the caller\'s words, with the limit at this sun', () => {
    const sa = 1367;
    const mu = sind(30);
    const l = physicalIrradianceLimits(mu, sa);
    const why = `the physically possible limit (Long & Shi 2008) with the sun 30° high and an extraterrestrial 1367 W/m²; check the units (W/m², not hourly sums in Wh/m² or kJ/m²), the date-time and the site`;
    expect(() => requirePossibleIrradiance(1400, 0, mu, sa)).toThrow(`dni = 1400 is not allowed: must be at most 1367 W/m², ${why}`);
    expect(() => requirePossibleIrradiance(0, 700, mu, sa, { dni: 'beamNormal', dhi: 'skyDiffuse' })).toThrow(
      `skyDiffuse = 700 is not allowed: must be at most ${Number(l.dhi.toFixed(1))} W/m², ${why}`,
    );
    // DNI 1300 · sin 30° + DHI 600 = 1250 > the global limit (≈ 1039) while each part is within its own.
    expect(600).toBeLessThan(l.dhi);
    expect(() => requirePossibleIrradiance(1300, 600, mu, sa, { dni: 'beamNormal', dhi: 'skyDiffuse' })).toThrow(
      `skyDiffuse = 600 is not allowed: must keep the global beamNormal × sin(altitude) + skyDiffuse at or below ${Number(l.ghi.toFixed(1))} W/m², ${why} (the global is 1250 W/m²)`,
    );
    // The first component past its limit is named: a beam exactly at its limit passes, so a diffuse past its own is named;
    // a diffuse exactly at its limit passes, so a global past its own is named.
    expect(() => requirePossibleIrradiance(1367, 700, mu, sa)).toThrow(/^dhi = 700 is not allowed: must be at most /);
    expect(1000 * 0.5 + l.dhi).toBeGreaterThan(l.ghi);
    expect(() => requirePossibleIrradiance(1000, l.dhi, mu, sa)).toThrow(/^dhi = [\d.]+ is not allowed: must keep the global dni × sin\(altitude\) \+ dhi at or below /);
    expect(() => requirePossibleIrradiance(0, 60, 0, sa)).toThrow(/with the sun at or below the horizon/);
    expect(() => requirePossibleIrradiance(0, 60, sind(-5), sa)).toThrow(
      'dhi = 60 is not allowed: must be at most 50 W/m², the physically possible limit (Long & Shi 2008) with the sun at or below the horizon and an extraterrestrial 1367 W/m²',
    );
  });
});
