/**
 * The month × hour mask (src/core/shading/shadingMask.ts) works out the sun for the site's own air:
 * its pressure and temperature set the refraction that lifts a sun near the horizon.
 *
 * Sources: astronomy-engine 2.1.19 (npm, pinned in package.json) — `Equator(Body.Sun, date, observer,
 * true, true)` and `Horizon(date, observer, ra, dec)` give the airless topocentric altitude, and with
 * `'normal'` the altitude refracted by a standard atmosphere; and the refraction of the NREL SPA,
 * Δe = (P/1010)(283/(273 + T)) · 1.02 / (60 tan(e0 + 10.3/(e0 + 5.11))) (Reda & Andreas 2008, Eq. 42;
 * from memory), which is proportional to the pressure P: at 1 hPa it is about 0.0005° at the horizon.
 *
 * The site's longitude is chosen (by bisection on astronomy-engine's airless altitude) so that on
 * 21 March 2026 at 06:30 UTC — the mid-hour of the hour ending 07:00 at a UTC offset of 0 — the sun's
 * centre lies 0.25° below the horizon without air. Through a standard atmosphere it is seen about
 * 0.25° above it; through air of 1 hPa it stays below. An east window with no shading is sunlit
 * exactly when the sun is up and in front, so that hour's cell is 1 at standard pressure and 0 at 1 hPa.
 */
import * as Astronomy from 'astronomy-engine';
import { monthHourMask } from '../../../src/core/shading/shadingMask';

const WHEN = new Date(Date.UTC(2026, 2, 21, 6, 30));

function altitude(longitude: number, refraction?: 'normal'): number {
  const observer = new Astronomy.Observer(0, longitude, 0);
  const eq = Astronomy.Equator(Astronomy.Body.Sun, WHEN, observer, true, true);
  return Astronomy.Horizon(WHEN, observer, eq.ra, eq.dec, refraction).altitude;
}

/** The longitude where astronomy-engine's airless altitude at {@link WHEN} is `target` (the sun rises in the east: altitude grows eastwards). */
function longitudeFor(target: number): number {
  let west = -30;
  let east = 30;
  for (let i = 0; i < 60; i++) {
    const mid = (west + east) / 2;
    if (altitude(mid) < target) west = mid;
    else east = mid;
  }
  return (west + east) / 2;
}

describe('monthHourMask uses the site pressure and temperature', () => {
  test('a sun 0.25° below the horizon without air is up through a standard atmosphere and down through 1 hPa', () => {
    const longitude = longitudeFor(-0.25);
    expect(altitude(longitude)).toBeCloseTo(-0.25, 6);
    expect(altitude(longitude, 'normal')).toBeGreaterThan(0.1);
    const site = { latitude: 0, longitude, utcOffset: 0 };
    const options = { day: 21, year: 2026 };
    const standard = monthHourMask({ ...site, pressure: 1013.25, temperature: 10 }, { width: 1, height: 1 }, {}, 90, options);
    const thin = monthHourMask({ ...site, pressure: 1, temperature: 10 }, { width: 1, height: 1 }, {}, 90, options);
    // March is row 2; the hour ending 07:00 is column 6.
    expect(standard[2][6]).toBe(1);
    expect(thin[2][6]).toBe(0);
    // An hour later the sun is about 15° up whatever the air.
    expect(standard[2][7]).toBe(1);
    expect(thin[2][7]).toBe(1);
  });
});
