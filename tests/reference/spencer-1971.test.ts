/**
 * Source: Spencer, J. W. (1971), "Fourier series representation of the position of the sun", Search
 * 2(5), 172 — the eccentricity correction (r0/r)² = 1.000110 + 0.034221 cos Γ + 0.001280 sin Γ
 * + 0.000719 cos 2Γ + 0.000077 sin 2Γ with the day angle Γ = 2π (n − 1)/365 (also in Iqbal, An
 * Introduction to Solar Radiation, 1983, Eq. 1.2.1, from memory), times the solar constant 1366.1 W/m²
 * used with it here. The series is written out by hand below at days spread over the year, where
 * each of its sine and cosine terms weighs differently; and the factor's range over a year against
 * the Earth's orbit: perihelion about 0.9833 AU in early January, aphelion about 1.0167 AU in early
 * July (from memory), so (r0/r)² from 1/1.0167² = 0.9674 to 1/0.9833² = 1.0343 — matched by the
 * series within 0.002 (it is a five-term fit).
 */
import { extraterrestrialSpencer } from '../../src/core/sky/extraterrestrial';

function byHand(n: number): number {
  const g = (2 * Math.PI * (n - 1)) / 365;
  return 1366.1 * (1.00011 + 0.034221 * Math.cos(g) + 0.00128 * Math.sin(g) + 0.000719 * Math.cos(2 * g) + 0.000077 * Math.sin(2 * g));
}

describe('Spencer (1971) extraterrestrial irradiance', () => {
  test('equals the series written out at days across the year, fractions included (1e-9 W/m²)', () => {
    for (const n of [1, 3, 33.5, 80, 126, 172, 185, 230.25, 266, 310, 355, 366]) {
      expect(Math.abs(extraterrestrialSpencer(n) - byHand(n))).toBeLessThan(1e-9);
    }
  });

  test('its largest value falls in early January and its smallest in early July, 1/0.9833² and 1/1.0167² of 1366.1 W/m² within 0.002', () => {
    let [max, min, dayMax, dayMin] = [0, Infinity, 0, 0];
    for (let n = 1; n <= 365; n++) {
      const e = extraterrestrialSpencer(n);
      if (e > max) [max, dayMax] = [e, n];
      if (e < min) [min, dayMin] = [e, n];
    }
    expect(dayMax).toBeLessThanOrEqual(6);
    expect(dayMin).toBeGreaterThanOrEqual(180);
    expect(dayMin).toBeLessThanOrEqual(190);
    expect(Math.abs(max / 1366.1 - 1 / 0.9833 ** 2)).toBeLessThan(0.002);
    expect(Math.abs(min / 1366.1 - 1 / 1.0167 ** 2)).toBeLessThan(0.002);
  });
});
