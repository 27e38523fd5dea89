/**
 * Source: suncalc 2.0.2 (npm, pinned in package.json), required through its CommonJS entry
 * (`suncalc.cjs`): `getPosition(date, lat, lng)` gives the refraction-corrected altitude and the
 * azimuth clockwise from north, in degrees (version 2 conventions; 1.x used radians from south).
 *
 * suncalc is a low-precision model: the sun's apparent longitude by Meeus' short series
 * (*Astronomical Algorithms*, ch. 25, about 0.01°), mean sidereal time without the nutation in right
 * ascension (up to 0.005°), a geocentric position (no parallax, up to 0.0024°), and refraction for
 * a standard atmosphere. Those add up to about 0.02°; the seeded sample here differs by about 0.014°
 * at most (measured), and the test allows 0.03°. Compared above 5° altitude with our refraction at
 * 1010 hPa and 10 °C, which makes the two refraction formulas nearly the same; azimuth is compared
 * through the angle between the two directions, which stays meaningful near the zenith.
 */
import { seeded, separation } from '../support/sky';
import { sunPosition } from '../../src/core/sun/spa';

// eslint-disable-next-line @typescript-eslint/no-require-imports
const SunCalc = require('suncalc') as { getPosition(date: Date, lat: number, lng: number): { altitude: number; azimuth: number } };

describe('sun position agrees with suncalc 2.0.2', () => {
  test('at 2,500 random instants 1950–2100 and sites from pole to pole, above 5° altitude, within 0.03°', () => {
    const random = seeded(424_242);
    const from = Date.UTC(1950, 0, 1);
    const to = Date.UTC(2100, 0, 1);
    let worstDirection = 0;
    let worstAltitude = 0;
    let compared = 0;
    for (let i = 0; i < 2500; i++) {
      const utcMs = from + random() * (to - from);
      const latitude = -89.9 + random() * 179.8;
      const longitude = -180 + random() * 360;
      const ours = sunPosition(utcMs, latitude, longitude, { pressure: 1010, temperature: 10 });
      if (ours.altitude <= 5) continue;
      const theirs = SunCalc.getPosition(new Date(utcMs), latitude, longitude);
      worstDirection = Math.max(worstDirection, separation(ours.altitude, ours.azimuth, theirs.altitude, theirs.azimuth));
      worstAltitude = Math.max(worstAltitude, Math.abs(ours.altitude - theirs.altitude));
      compared++;
    }
    expect(compared).toBeGreaterThan(800);
    expect(worstDirection).toBeLessThan(0.03);
    expect(worstAltitude).toBeLessThan(0.03);
  });

  test('azimuths on both sides of north agree across the 0/360 wrap', () => {
    // Near local midnight in midsummer at 70° N the sun is low in the north: azimuths near 0 and 360.
    let checked = 0;
    for (let minutes = -90; minutes <= 90; minutes += 10) {
      const utcMs = Date.UTC(2026, 5, 21, 23, 0) + minutes * 60_000;
      const ours = sunPosition(utcMs, 70, 15, { pressure: 1010, temperature: 10 });
      const theirs = SunCalc.getPosition(new Date(utcMs), 70, 15);
      expect(separation(ours.altitude, ours.azimuth, theirs.altitude, theirs.azimuth)).toBeLessThan(0.03);
      checked++;
    }
    expect(checked).toBe(19);
  });
});
