/**
 * Source: Ineichen, P. & Perez, R. (2002), "A new airmass independent formulation for the Linke
 * turbidity coefficient", Solar Energy 73(3), 151–157 — global and beam clear-sky equations with
 * the altitude corrections fh1 = exp(−h/8000), fh2 = exp(−h/1250) and cg1, cg2. The equations are
 * from memory (no copy of the paper was available here), so they are checked only as written out
 * below (a transcription check, not an independent value) plus physical orderings marked
 * "common practice, no source". No published numeric example could be sourced.
 */
import { airMassKastenYoung } from '../../src/core/sky/airMass';
import { ineichenPerezClearSky } from '../../src/core/sky/clearSky';
import { SunpaneError } from '../../src/core/common/errors';
import { extraterrestrialSpencer } from '../../src/core/sky/extraterrestrial';

describe('Ineichen–Perez (2002) clear sky', () => {
  test('at 40° altitude, day 80, TL 3.5, 1500 m the equations give the values written out (1e-9 relative)', () => {
    const h = 1500;
    const tl = 3.5;
    const i0 = extraterrestrialSpencer(80);
    const m = (airMassKastenYoung(40) * 1013.25 * (1 - 2.25577e-5 * h) ** 5.25588) / 1013.25; // absolute air mass
    const cosZ = Math.sin((40 * Math.PI) / 180);
    const fh1 = Math.exp(-h / 8000);
    const fh2 = Math.exp(-h / 1250);
    const cg1 = 5.09e-5 * h + 0.868;
    const cg2 = 3.92e-5 * h + 0.0387;
    const ghi = cg1 * i0 * cosZ * Math.exp(-cg2 * m * (fh1 + fh2 * (tl - 1))) * Math.exp(0.01 * m ** 1.8);
    const dniModel = (0.664 + 0.163 / fh1) * i0 * Math.exp(-0.09 * m * (tl - 1));
    const dniLimit = (ghi * (1 - (0.1 - 0.2 * Math.exp(-tl)) / (0.1 + 0.882 / fh1))) / cosZ;
    const dni = Math.min(dniModel, dniLimit);
    const r = ineichenPerezClearSky(40, 80, tl, h);
    expect(r.ghi / ghi).toBeCloseTo(1, 9);
    expect(r.dni / dni).toBeCloseTo(1, 9);
    expect(r.dhi / (ghi - dni * cosZ)).toBeCloseTo(1, 9);
  });

  test('a clean sky (TL 1.5) at 1500 m with the sun 20° high: the beam is the global-based limit, not the beam formula (1e-9 relative)', () => {
    // There the second term of DNI = min(b I0 exp(−0.09 m (TL − 1)), GHI (1 − (0.1 − 0.2 e^−TL)/(0.1 + 0.882/fh1)) / cos z) is the smaller.
    const [h, tl, altitude, day] = [1500, 1.5, 20, 172];
    const i0 = extraterrestrialSpencer(day);
    const m = airMassKastenYoung(altitude) * (1 - 2.25577e-5 * h) ** 5.25588; // absolute air mass
    const cosZ = Math.sin((altitude * Math.PI) / 180);
    const fh1 = Math.exp(-h / 8000);
    const fh2 = Math.exp(-h / 1250);
    const ghi = (5.09e-5 * h + 0.868) * i0 * cosZ * Math.exp(-(3.92e-5 * h + 0.0387) * m * (fh1 + fh2 * (tl - 1))) * Math.exp(0.01 * m ** 1.8);
    const dniModel = (0.664 + 0.163 / fh1) * i0 * Math.exp(-0.09 * m * (tl - 1));
    const dniLimit = (ghi * (1 - (0.1 - 0.2 * Math.exp(-tl)) / (0.1 + 0.882 / fh1))) / cosZ;
    expect(dniLimit).toBeLessThan(dniModel - 10);
    const r = ineichenPerezClearSky(altitude, day, tl, h);
    expect(r.dni / dniLimit).toBeCloseTo(1, 9);
    expect(r.ghi / ghi).toBeCloseTo(1, 9);
    expect(r.dhi / (ghi - dniLimit * cosZ)).toBeCloseTo(1, 9);
  });

  test('a higher site gets more beam and more global at every sun altitude, and global stays below the extraterrestrial on the horizontal (common practice, no source)', () => {
    for (const altitude of [5, 20, 45, 80]) {
      const low = ineichenPerezClearSky(altitude, 172, 3, 0);
      const high = ineichenPerezClearSky(altitude, 172, 3, 3000);
      expect(high.dni).toBeGreaterThan(low.dni);
      expect(high.ghi).toBeGreaterThan(low.ghi);
      expect(high.ghi).toBeLessThan(extraterrestrialSpencer(172) * Math.sin((altitude * Math.PI) / 180));
    }
  });

  test('more turbidity gives less beam and more diffuse; global = beam sin β + diffuse', () => {
    const clean = ineichenPerezClearSky(50, 172, 2, 0);
    const hazy = ineichenPerezClearSky(50, 172, 5, 0);
    expect(hazy.dni).toBeLessThan(clean.dni);
    expect(hazy.dhi).toBeGreaterThan(clean.dhi);
    for (const r of [clean, hazy]) expect(r.ghi).toBeCloseTo(r.dni * Math.sin((50 * Math.PI) / 180) + r.dhi, 9);
  });

  test('night gives zeros and a turbidity below 1 is refused naming linkeTurbidity', () => {
    expect(ineichenPerezClearSky(-1, 172, 3, 0)).toEqual({ dni: 0, dhi: 0, ghi: 0 });
    expect(() => ineichenPerezClearSky(30, 172, 0.5, 0)).toThrow(SunpaneError);
    expect(() => ineichenPerezClearSky(30, 172, 0.5, 0)).toThrow(/^linkeTurbidity/);
    expect(() => ineichenPerezClearSky(30, 172, 3, 20000)).toThrow(/^elevation/);
  });
});

describe('Ineichen–Perez clear sky at high sites', () => {
  test('direct normal never exceeds the extraterrestrial value (Spencer 1971), even at 8,000–9,000 m with the sun high', () => {
    // Physical bound: no atmosphere adds to the beam. Without the cap the formula's b = 0.664 + 0.163/fh1
    // gives b·I0·exp(−0.09 m (TL − 1)) > I0 above about 6,000 m at TL 1.
    for (const elevation of [6000, 7000, 8000, 9000]) {
      for (const altitude of [30, 60, 90]) {
        for (const day of [3, 172]) {
          const r = ineichenPerezClearSky(altitude, day, 1, elevation);
          expect(r.dni).toBeLessThanOrEqual(extraterrestrialSpencer(day) + 1e-9);
        }
      }
    }
    const r = ineichenPerezClearSky(90, 3, 1, 9000);
    expect(r.dni).toBeCloseTo(extraterrestrialSpencer(3), 6);
    expect(r.dhi).toBeGreaterThanOrEqual(0);
  });
});
