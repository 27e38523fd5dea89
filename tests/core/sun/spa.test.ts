/**
 * Invariants and edge cases of the sun position and events (src/core/sun/spa.ts). The published and
 * library checks are in tests/reference/spa-worked-example.test.ts, astronomy-engine-sun.test.ts
 * and suncalc-sun-position.test.ts.
 */
import { RISE_SET_ALTITUDE, spaSteps, standardPressure, sunPosition } from '../../../src/core/sun/spa';
import { sunEvents } from '../../../src/core/sun/events';
import { civilToSerial, serialToUtcMs } from '../../../src/core/time/calendar';
import { deltaTAt } from '../../../src/core/time/deltaT';
import { expectArgumentError } from '../../support/expectError';

const HOUR = 3_600_000;

const expectError = expectArgumentError;

function angleDifference(a: number, b: number): number {
  const d = Math.abs(a - b) % 360;
  return d > 180 ? 360 - d : d;
}

describe('sun position invariants', () => {
  test('azimuth stays in [0, 360) and moves smoothly through north at a midnight sun', () => {
    // 75° N at the June solstice: the sun passes due north near local midnight (lower transit).
    let previous: number | undefined;
    let crossedNorth = false;
    for (let m = -120; m <= 120; m += 5) {
      const { azimuth } = sunPosition(Date.UTC(2026, 5, 21, 23, 0) + m * 60_000, 75, 15);
      expect(azimuth).toBeGreaterThanOrEqual(0);
      expect(azimuth).toBeLessThan(360);
      if (previous !== undefined) {
        // 5 minutes move the sun about 1.25° in azimuth; across the wrap the raw difference is ~360.
        expect(angleDifference(azimuth, previous)).toBeLessThan(2);
        if (previous > 300 && azimuth < 60) crossedNorth = true;
      }
      previous = azimuth;
    }
    expect(crossedNorth).toBe(true);
  });

  test('altitude is symmetric about solar noon at the solstice and azimuths mirror about south', () => {
    const serial = civilToSerial(2026, 6, 21);
    const ev = sunEvents(serial, 48.2, 16.4, 1);
    const noonMs = serialToUtcMs(ev.solarNoon, 1);
    for (const hours of [1, 3, 5]) {
      const before = sunPosition(noonMs - hours * HOUR, 48.2, 16.4);
      const after = sunPosition(noonMs + hours * HOUR, 48.2, 16.4);
      // At the solstice the declination changes by < 0.001° in ±5 h, so the asymmetry stays below 0.005°.
      expect(Math.abs(before.altitude - after.altitude)).toBeLessThan(0.005);
      expect(Math.abs(before.azimuth + after.azimuth - 360)).toBeLessThan(0.01);
    }
  });

  test('at solar noon the hour angle is 0, solar time 12 h and the sun due south (north of the tropics)', () => {
    const ev = sunEvents(civilToSerial(2026, 3, 20), 40, -3.7, 1);
    const p = sunPosition(serialToUtcMs(ev.solarNoon, 1), 40, -3.7);
    // Noon is found on the geocentric hour angle; the topocentric azimuth differs by the parallax in RA (< 0.001°).
    expect(Math.abs(p.hourAngle)).toBeLessThan(1e-5);
    expect(Math.abs(p.solarTime - 12)).toBeLessThan(1e-6);
    expect(Math.abs(p.azimuth - 180)).toBeLessThan(0.001);
  });

  test('refraction lifts the sun only above −0.8334° and is larger at lower altitude', () => {
    const night = sunPosition(Date.UTC(2026, 0, 1, 0, 0), 51.5, 0);
    expect(night.altitude).toBe(night.altitudeUnrefracted);
    const s = spaSteps(Date.UTC(2026, 5, 21, 4, 0), 51.5, 0);
    expect(s.deltaE).toBeGreaterThan(0.1);
    expect(sunPosition(Date.UTC(2026, 5, 21, 12, 0), 51.5, 0).altitude - sunPosition(Date.UTC(2026, 5, 21, 12, 0), 51.5, 0).altitudeUnrefracted).toBeLessThan(0.02);
  });

  test('a lower pressure gives less refraction; blank pressure follows the standard atmosphere at the elevation', () => {
    const t = Date.UTC(2026, 5, 21, 4, 30);
    const sea = spaSteps(t, 51.5, 0, { pressure: 1013.25 }).deltaE;
    const high = spaSteps(t, 51.5, 0, { pressure: 700 }).deltaE;
    expect(high).toBeLessThan(sea);
    expect(spaSteps(t, 51.5, 0, { elevation: 2000 }).deltaE).toBeCloseTo(spaSteps(t, 51.5, 0, { elevation: 2000, pressure: standardPressure(2000) }).deltaE, 12);
  });

  test('standard pressure matches the U.S. Standard Atmosphere 1976 at 0, 1000 and 2000 m', () => {
    // Table values 1013.25, 898.76 and 795.01 hPa — from memory; tolerance 0.1 hPa.
    expect(Math.abs(standardPressure(0) - 1013.25)).toBeLessThan(1e-9);
    expect(Math.abs(standardPressure(1000) - 898.76)).toBeLessThan(0.1);
    expect(Math.abs(standardPressure(2000) - 795.01)).toBeLessThan(0.1);
  });

  test('blank ΔT is the Espenak & Meeus value at the instant', () => {
    const t = Date.UTC(2026, 4, 5, 10, 0);
    const blank = sunPosition(t, 10, 20);
    const given = sunPosition(t, 10, 20, { deltaT: deltaTAt(t) });
    expect(blank.altitude).toBe(given.altitude);
    expect(blank.azimuth).toBe(given.azimuth);
  });

  test('the equation of time peaks near +16.4 min in early November and −14.2 min in mid-February', () => {
    // Almanac extremes of the equation of time — common knowledge, from memory; tolerance 0.2 min.
    expect(Math.abs(sunPosition(Date.UTC(2026, 10, 3, 12), 0, 0).equationOfTime - 16.4)).toBeLessThan(0.2);
    expect(Math.abs(sunPosition(Date.UTC(2026, 1, 11, 12), 0, 0).equationOfTime + 14.2)).toBeLessThan(0.2);
  });

  test('results stay finite at the poles and the date line', () => {
    for (const [lat, lon] of [[90, 0], [-90, 180], [0, -180], [89.999, 179.999]]) {
      for (let h = 0; h < 24; h += 6) {
        const p = sunPosition(Date.UTC(2026, 2, 1, h), lat, lon);
        for (const v of Object.values(p)) expect(Number.isFinite(v)).toBe(true);
      }
    }
  });
});

describe('sunrise, solar noon and sunset of the local day', () => {
  test('sunrise and sunset put the sun centre 0.8334° below the horizon, noon between them, all inside the day', () => {
    const serial = civilToSerial(2026, 9, 1, 17, 45);
    const ev = sunEvents(serial, -33.9, 151.2, 10);
    expect(ev.condition).toBe('normal');
    const day = Math.floor(serial);
    for (const t of [ev.sunrise, ev.solarNoon, ev.sunset] as number[]) {
      expect(t).toBeGreaterThanOrEqual(day);
      expect(t).toBeLessThan(day + 1);
    }
    expect(ev.sunrise as number).toBeLessThan(ev.solarNoon);
    expect(ev.solarNoon).toBeLessThan(ev.sunset as number);
    for (const t of [ev.sunrise, ev.sunset] as number[]) {
      // Rise/set use the geocentric altitude; the topocentric one is lower by the parallax, ≤ 0.0025°.
      const alt = sunPosition(serialToUtcMs(t, 10), -33.9, 151.2).altitudeUnrefracted;
      expect(alt).toBeLessThan(RISE_SET_ALTITUDE + 1e-6);
      expect(alt).toBeGreaterThan(RISE_SET_ALTITUDE - 0.0025);
    }
  });

  test('the time of day of the date argument does not matter', () => {
    const a = sunEvents(civilToSerial(2026, 4, 10), 35, 139.7, 9);
    const b = sunEvents(civilToSerial(2026, 4, 10, 23, 59), 35, 139.7, 9);
    expect(b).toEqual(a);
  });

  test('78° N has polar day on 21 June and polar night on 21 December, with null rise and set', () => {
    const june = sunEvents(civilToSerial(2026, 6, 21), 78, 15.6, 1);
    expect(june).toMatchObject({ condition: 'polarDay', sunrise: null, sunset: null });
    const december = sunEvents(civilToSerial(2026, 12, 21), 78, 15.6, 1);
    expect(december).toMatchObject({ condition: 'polarNight', sunrise: null, sunset: null });
    // Solar noon still exists: the sun crosses the meridian (below the horizon in polar night).
    expect(Math.floor(december.solarNoon)).toBe(civilToSerial(2026, 12, 21));
  });

  test('the southern hemisphere has polar day in December', () => {
    expect(sunEvents(civilToSerial(2026, 12, 21), -78, 166.7, 12).condition).toBe('polarDay');
  });

  test('a site whose clock is far from its sun time still gets the events of its local day', () => {
    // Longitude 0 at UTC+14: solar noon falls near 02:00 local.
    const serial = civilToSerial(2026, 3, 20);
    const ev = sunEvents(serial, 10, 0, 14);
    expect(ev.solarNoon - serial).toBeGreaterThan(0);
    expect(ev.solarNoon - serial).toBeLessThan(4 / 24);
  });
});

describe('bad input names the argument', () => {
  const t = Date.UTC(2026, 0, 1);
  test.each([
    ['latitude', () => sunPosition(t, 90.5, 0)],
    ['longitude', () => sunPosition(t, 0, -181)],
    ['utcMs', () => sunPosition(Number.NaN, 0, 0)],
    ['elevation', () => sunPosition(t, 0, 0, { elevation: 9001 })],
    ['pressure', () => sunPosition(t, 0, 0, { pressure: 0 })],
    ['temperature', () => sunPosition(t, 0, 0, { temperature: 61 })],
    ['deltaT', () => sunPosition(t, 0, 0, { deltaT: Number.POSITIVE_INFINITY })],
    ['deltaT', () => sunPosition(Date.UTC(1800, 0, 1), 0, 0)],
    ['date', () => sunEvents(10, 0, 0, 0)],
    ['utcOffset', () => sunEvents(civilToSerial(2026, 1, 1), 0, 0, 15)],
    ['latitude', () => sunEvents(civilToSerial(2026, 1, 1), Number.NaN, 0, 0)],
  ])('a bad %s is refused with an error naming it', (argument, fn) => expectError(fn, argument));
});
