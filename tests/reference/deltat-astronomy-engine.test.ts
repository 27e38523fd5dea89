/**
 * Source: astronomy-engine 2.1.19 (npm), `DeltaT_EspenakMeeus`, an independent implementation of
 * the Espenak & Meeus (2006) polynomial expressions for ΔT (NASA/TP-2006-214141).
 * Both evaluate the same published polynomials from the same year origin, so they agree to rounding;
 * the tolerance, 0.001 s, allows for summation order only.
 */
import * as Astronomy from 'astronomy-engine';
import { deltaTAt } from '../../src/core/time/deltaT';
import { julianDay } from '../../src/core/time/calendar';

describe('ΔT by Espenak & Meeus agrees with astronomy-engine 2.1.19', () => {
  test('at 500 instants from 1900 to 2200 within 0.001 s', () => {
    let worst = 0;
    for (let i = 0; i < 500; i++) {
      const utcMs = Date.UTC(1900, 2, 1) + (i / 499) * (Date.UTC(2199, 0, 1) - Date.UTC(1900, 2, 1));
      const ut = julianDay(utcMs) - 2451545.0;
      const theirs = Astronomy.DeltaT_EspenakMeeus(ut);
      worst = Math.max(worst, Math.abs(deltaTAt(utcMs) - theirs));
    }
    expect(worst).toBeLessThan(0.001);
  });
});
