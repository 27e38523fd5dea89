/**
 * Surface angles (src/core/sun/surfaceAngles.ts). Outside checks: the NREL SPA worked example's incidence angle
 * on its 30° slope (Reda & Andreas 2008, in tests/reference/spa-worked-example.test.ts) and, here,
 * Duffie & Beckman, *Solar Engineering of Thermal Processes* (4th ed.), Example 1.6.1 (latitude 43° N,
 * 13 February, 10:30 solar time, surface tilted 45° facing 15° west of south: θ = 35°, printed to the
 * whole degree) — from memory, tolerance 0.5°; and the same book's long form of the incidence angle in
 * declination, latitude and hour angle (Eq. 1.6.2, from memory), an independent route to the same angle. The remaining tests are geometric invariants, several checked by an independent
 * vector construction written in this file.
 */
import { RAD } from '../../../src/core/common/angles';
import { SunpaneError } from '../../../src/core/common/errors';
import { incidenceAngle, profileAngle, sunInFront, wallSolarAzimuth } from '../../../src/core/sun/surfaceAngles';

const { sin, cos, acos, atan2, asin } = Math;

/** Unit vector (east, north, up) of a direction by altitude and azimuth [°]. */
function unit(altitude: number, azimuth: number): [number, number, number] {
  return [cos(altitude * RAD) * sin(azimuth * RAD), cos(altitude * RAD) * cos(azimuth * RAD), sin(altitude * RAD)];
}

/** Outward normal (east, north, up) of a surface by tilt and azimuth [°]: the direction 90° − tilt above the horizon. */
function normal(tilt: number, azimuth: number): [number, number, number] {
  return unit(90 - tilt, azimuth);
}

function dot(a: number[], b: number[]): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}

describe('incidence angle', () => {
  test('is 0° when the sun is normal to the surface', () => {
    expect(incidenceAngle(30, 200, 60, 200)).toBeLessThan(1e-6);
    expect(incidenceAngle(90, 0, 0, 123)).toBeLessThan(1e-6);
  });

  test('on a horizontal surface it is the zenith angle', () => {
    for (const alt of [-10, 0, 12.5, 45, 89]) expect(Math.abs(incidenceAngle(alt, 77, 0, 180) - (90 - alt))).toBeLessThan(1e-9);
  });

  test('equals the angle between the sun vector and the surface normal for random geometry', () => {
    let seed = 99;
    const random = () => ((seed = (Math.imul(seed, 1_664_525) + 1_013_904_223) >>> 0) / 4_294_967_296);
    for (let i = 0; i < 500; i++) {
      const [alt, az, tilt, surfAz] = [-90 + 180 * random(), 360 * random(), 180 * random(), 360 * random()];
      const expected = acos(Math.max(-1, Math.min(1, dot(unit(alt, az), normal(tilt, surfAz))))) / RAD;
      expect(Math.abs(incidenceAngle(alt, az, tilt, surfAz) - expected)).toBeLessThan(1e-7);
    }
  });

  test('is above 90° when the sun is behind the surface', () => {
    const theta = incidenceAngle(30, 90, 90, 270);
    expect(Math.abs(theta - 150)).toBeLessThan(1e-9);
    expect(sunInFront(theta)).toBe(false);
    expect(sunInFront(incidenceAngle(30, 270, 90, 270))).toBe(true);
  });

  test('matches Duffie & Beckman Example 1.6.1 (θ = 35°, from memory) and their long form Eq. 1.6.2', () => {
    // The example: φ = 43°, 13 February δ = −14°, 10:30 solar time ω = −22.5°: sun altitude and azimuth
    // from the textbook's relations, then the incidence on a 45° surface facing 15° west of south.
    const [phi, delta, omega, slope, gamma] = [43 * RAD, -14 * RAD, -22.5 * RAD, 45 * RAD, 15 * RAD];
    const altitude = asin(cos(phi) * cos(delta) * cos(omega) + sin(phi) * sin(delta)) / RAD;
    const azimuth = 180 + atan2(sin(omega) * cos(delta), cos(omega) * cos(delta) * sin(phi) - sin(delta) * cos(phi)) / RAD;
    const theta = incidenceAngle(altitude, azimuth, 45, 195);
    expect(Math.abs(theta - 35)).toBeLessThan(0.5);
    const cosTheta =
      sin(delta) * sin(phi) * cos(slope) -
      sin(delta) * cos(phi) * sin(slope) * cos(gamma) +
      cos(delta) * cos(phi) * cos(slope) * cos(omega) +
      cos(delta) * sin(phi) * sin(slope) * cos(gamma) * cos(omega) +
      cos(delta) * sin(slope) * sin(gamma) * sin(omega); // D&B Eq. 1.6.2
    expect(Math.abs(theta - acos(cosTheta) / RAD)).toBeLessThan(1e-9);
  });

  test('stays within 0…180° and never returns NaN at the extremes', () => {
    for (const [alt, az, tilt, surfAz] of [[90, 0, 180, 0], [-90, 360, 0, 0], [0, 0, 90, 180], [0, 180, 90, 180]]) {
      const theta = incidenceAngle(alt, az, tilt, surfAz);
      expect(theta).toBeGreaterThanOrEqual(0);
      expect(theta).toBeLessThanOrEqual(180);
    }
  });
});

describe('horizontal shadow angle', () => {
  test('is positive when the sun is to the right of a south window seen from outside (morning, east)', () => {
    // Outside a south-facing window one faces north, with east on the right.
    expect(wallSolarAzimuth(120, 180)).toBe(60);
    expect(wallSolarAzimuth(240, 180)).toBe(-60);
    expect(wallSolarAzimuth(180, 180)).toBe(0);
  });

  test('wraps into (−180, 180] across north', () => {
    expect(Math.abs(wallSolarAzimuth(10, 350) - -20)).toBeLessThan(1e-12);
    expect(Math.abs(wallSolarAzimuth(350, 10) - 20)).toBeLessThan(1e-12);
    expect(wallSolarAzimuth(0, 180)).toBe(180);
    expect(wallSolarAzimuth(360, 180)).toBe(180);
  });

  test('agrees with the side of the sun found by a cross product of the viewer direction and the sun', () => {
    for (let az = 0; az < 360; az += 7) {
      for (const surfAz of [0, 45, 180, 300]) {
        const gamma = wallSolarAzimuth(az, surfAz);
        if (Math.abs(gamma) < 1e-9 || Math.abs(Math.abs(gamma) - 180) < 1e-9) continue;
        // Viewer outside faces −n; the right-hand side is the horizontal vector −n × up.
        const n = normal(90, surfAz);
        const right = [-n[1], n[0], 0];
        const sunOnRight = dot(unit(0, az), right) > 0;
        expect(gamma > 0).toBe(sunOnRight);
      }
    }
  });
});

describe('profile angle', () => {
  test('equals the sun altitude when the sun is straight in front', () => {
    expect(Math.abs(profileAngle(35, 180, 180) - 35)).toBeLessThan(1e-9);
  });

  test('follows tan Ω = tan β / cos γ in front of the wall', () => {
    expect(Math.abs(profileAngle(45, 120, 180) - atan2(1, 0.5) / RAD)).toBeLessThan(1e-9);
    expect(Math.abs(profileAngle(20, 250, 200) - Math.atan(Math.tan(20 * RAD) / cos(50 * RAD)) / RAD)).toBeLessThan(1e-9);
  });

  test('is the angle of the sun vector projected onto the vertical plane normal to the wall', () => {
    for (let az = 100; az <= 260; az += 10) {
      for (const alt of [5, 30, 60, 85]) {
        const s = unit(alt, az);
        const n = normal(90, 180);
        const projected = atan2(s[2], dot(s, n)) / RAD;
        expect(Math.abs(profileAngle(alt, az, 180) - projected)).toBeLessThan(1e-9);
      }
    }
  });

  test('is 90° with the sun in the wall plane and beyond 90° behind it, never NaN', () => {
    expect(Math.abs(profileAngle(30, 90, 180) - 90)).toBeLessThan(1e-9);
    expect(profileAngle(30, 0, 180)).toBeGreaterThan(90);
    expect(profileAngle(-30, 0, 180)).toBeLessThan(-90);
    expect(profileAngle(-0, 0, 180)).toBe(180);
    expect(Number.isFinite(profileAngle(90, 0, 0))).toBe(true);
  });
});

describe('bad input names the argument', () => {
  test.each([
    ['sunAltitude', () => incidenceAngle(91, 0, 90, 180)],
    ['sunAzimuth', () => incidenceAngle(10, -1, 90, 180)],
    ['surfaceTilt', () => incidenceAngle(10, 0, 181, 180)],
    ['surfaceAzimuth', () => incidenceAngle(10, 0, 90, Number.NaN)],
    ['sunAzimuth', () => wallSolarAzimuth(400, 180)],
    ['surfaceAzimuth', () => wallSolarAzimuth(10, 361)],
    ['sunAltitude', () => profileAngle(Number.POSITIVE_INFINITY, 0, 180)],
    ['surfaceAzimuth', () => profileAngle(10, 0, -5)],
  ])('a bad %s is refused with an error naming it', (argument, fn) => {
    expect(fn).toThrow(SunpaneError);
    try {
      fn();
    } catch (err) {
      expect((err as SunpaneError).argument).toBe(argument);
    }
  });
});
