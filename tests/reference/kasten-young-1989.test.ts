/**
 * Source: Kasten, F. & Young, A. T. (1989), "Revised optical air mass tables and approximation
 * formula", Applied Optics 28(22), 4735–4738, Eq. 3. Check values (stated in the publication) — zenith 0° →
 * 1.000, 80° → 5.586, 89.9° → 36.467 (as tabulated to three decimals, so tolerance 5e-4).
 */
import { airMassKastenYoung, AIR_MASS_HORIZON } from '../../src/core/sky/airMass';
import { SunpaneError } from '../../src/core/common/errors';

describe('Kasten–Young relative air mass', () => {
  test.each([
    [0, 1.0],
    [80, 5.586],
    [89.9, 36.467],
  ])('zenith %p° gives %p (within 5e-4)', (zenith, expected) => {
    expect(Math.abs(airMassKastenYoung(90 - zenith) - expected)).toBeLessThan(5e-4);
  });

  test('at and below the horizon it returns the finite horizon value', () => {
    expect(airMassKastenYoung(0)).toBeCloseTo(AIR_MASS_HORIZON, 10);
    expect(airMassKastenYoung(-30)).toBeCloseTo(AIR_MASS_HORIZON, 10);
    expect(AIR_MASS_HORIZON).toBeGreaterThan(37.5);
    expect(AIR_MASS_HORIZON).toBeLessThan(38.5);
  });

  test('it falls monotonically from the horizon to the zenith', () => {
    let previous = Infinity;
    for (let a = 0; a <= 90; a += 0.5) {
      const m = airMassKastenYoung(a);
      expect(m).toBeLessThan(previous);
      previous = m;
    }
  });

  test('an altitude outside −90…90 is refused naming sunAltitude', () => {
    expect(() => airMassKastenYoung(91)).toThrow(SunpaneError);
    expect(() => airMassKastenYoung(Number.NaN)).toThrow(/^sunAltitude/);
  });
});
