/**
 * The annual fast path (src/core/sun/sunPath.ts) against the direct NREL SPA (src/core/sun/spa.ts), which is
 * itself checked against the published worked example and two outside libraries
 * (tests/reference/). Requirement (docs/methods.md#sun-position-nrel-solar-position-algorithm): agreement within 1e-4° in altitude and azimuth.
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { annualSunPath } from '../../../src/core/sun/sunPath';
import { sunPosition } from '../../../src/core/sun/spa';
import { civilToSerial, serialToUtcMs } from '../../../src/core/time/calendar';
import type { Site } from '../../../src/core/sun/site';
import { Mismatches } from '../../support/mismatches';

function angleDifference(a: number, b: number): number {
  const d = Math.abs(a - b) % 360;
  return d > 180 ? 360 - d : d;
}

const SITES: Site[] = [
  { latitude: -70, longitude: -60.5, utcOffset: -4, elevation: 40 },
  { latitude: -33.9, longitude: 151.2, utcOffset: 10, elevation: 50 },
  { latitude: 0, longitude: -78.5, utcOffset: -5, elevation: 2850, pressure: 730, temperature: 14 },
  { latitude: 23.4, longitude: 88.4, utcOffset: 5.5 },
  { latitude: 51.5, longitude: -0.1, utcOffset: 0, elevation: 20 },
  { latitude: 78, longitude: 15.6, utcOffset: 1, temperature: -5 },
];

describe('annual sun path agrees with the direct algorithm', () => {
  test.each(SITES.map((s) => [s.latitude, s] as const))(
    'at latitude %s° every hour of 2025 with altitude above −1° is within 1e-4° in altitude and azimuth',
    (_lat, site) => {
      const path = annualSunPath(2025, site);
      const options = { elevation: site.elevation, pressure: site.pressure, temperature: site.temperature };
      let worstAltitude = 0;
      let worstAzimuth = 0;
      let worstDeclination = 0;
      let worstEquation = 0;
      let compared = 0;
      const zenithOff = new Mismatches();
      for (let i = 0; i < path.hours; i++) {
        // The sun is evaluated at the middle of the hour that ends at the stamp.
        const utcMs = serialToUtcMs(path.stampSerial[i] - 1 / 48, site.utcOffset);
        const direct = sunPosition(utcMs, site.latitude, site.longitude, options);
        worstDeclination = Math.max(worstDeclination, Math.abs(direct.declination - path.declination[i]));
        worstEquation = Math.max(worstEquation, Math.abs(direct.equationOfTime - path.equationOfTime[i]));
        zenithOff.check(Math.abs(path.zenith[i] - (90 - path.altitude[i])) < 1e-12, () => `hour ${i}: zenith ${path.zenith[i]}, altitude ${path.altitude[i]}`);
        if (direct.altitude <= -1) continue;
        worstAltitude = Math.max(worstAltitude, Math.abs(direct.altitude - path.altitude[i]));
        worstAzimuth = Math.max(worstAzimuth, angleDifference(direct.azimuth, path.azimuth[i]));
        compared++;
      }
      expect(zenithOff.list).toEqual([]);
      expect(compared).toBeGreaterThan(1500);
      expect(worstAltitude).toBeLessThan(1e-4);
      expect(worstAzimuth).toBeLessThan(1e-4);
      expect(worstDeclination).toBeLessThan(1e-4);
      // 1e-4 min is 0.006 s.
      expect(worstEquation).toBeLessThan(1e-4);
    },
  );
});

describe('annual sun path in years where the default ΔT curves most', () => {
  test.each([1915, 1921, 2150])('in %s every hour with altitude above −1° at latitude 23.4° is within 1e-4° of the direct algorithm', (year) => {
    const site: Site = { latitude: 23.4, longitude: 88.4, utcOffset: 5.5 };
    const path = annualSunPath(year, site);
    let worstAltitude = 0;
    let worstAzimuth = 0;
    for (let i = 0; i < path.hours; i++) {
      const direct = sunPosition(serialToUtcMs(path.stampSerial[i] - 1 / 48, site.utcOffset), site.latitude, site.longitude);
      if (direct.altitude <= -1) continue;
      worstAltitude = Math.max(worstAltitude, Math.abs(direct.altitude - path.altitude[i]));
      worstAzimuth = Math.max(worstAzimuth, angleDifference(direct.azimuth, path.azimuth[i]));
    }
    expect(worstAltitude).toBeLessThan(1e-4);
    expect(worstAzimuth).toBeLessThan(1e-4);
  });
});

describe('annual sun path layout', () => {
  const site: Site = { latitude: 40, longitude: -105, utcOffset: -7 };

  test('a leap year has 8784 rows stamped at the end of each local hour', () => {
    const path = annualSunPath(2024, site);
    expect(path.hours).toBe(8784);
    for (const column of [path.stampSerial, path.altitude, path.azimuth, path.zenith, path.declination, path.equationOfTime]) expect(column).toHaveLength(8784);
    // Serials of whole hours are exact only to rounding of 1/24: compare within 1e-9 day (0.1 ms).
    expect(Math.abs(path.stampSerial[0] - civilToSerial(2024, 1, 1, 1))).toBeLessThan(1e-9);
    expect(Math.abs(path.stampSerial[8783] - civilToSerial(2025, 1, 1))).toBeLessThan(1e-9);
    expect(annualSunPath(2025, site).hours).toBe(8760);
  });

  test('at "end" the sun is evaluated at the stamp itself', () => {
    const path = annualSunPath(2025, site, { at: 'end' });
    for (const i of [0, 4000, 4012, 8759]) {
      const direct = sunPosition(serialToUtcMs(path.stampSerial[i], site.utcOffset), site.latitude, site.longitude);
      expect(Math.abs(direct.altitude - path.altitude[i])).toBeLessThan(1e-4);
    }
  });

  test('a given ΔT is used instead of the default', () => {
    const path = annualSunPath(2025, site, { deltaT: 500 });
    const i = 4012;
    const direct = sunPosition(serialToUtcMs(path.stampSerial[i] - 1 / 48, site.utcOffset), site.latitude, site.longitude, { deltaT: 500 });
    expect(Math.abs(direct.altitude - path.altitude[i])).toBeLessThan(1e-4);
    expect(Math.abs(direct.azimuth - path.azimuth[i])).toBeLessThan(1e-4);
  });

  test.each([
    ['year', () => annualSunPath(1900, site)],
    ['site.latitude', () => annualSunPath(2025, { ...site, latitude: 95 })],
    ['site.longitude', () => annualSunPath(2025, { ...site, longitude: Number.NaN })],
    ['site.utcOffset', () => annualSunPath(2025, { ...site, utcOffset: -13 })],
    ['site.pressure', () => annualSunPath(2025, { ...site, pressure: -1 })],
    ['site.elevation', () => annualSunPath(2025, { ...site, elevation: 20_000 })],
    ['deltaT', () => annualSunPath(2025, site, { deltaT: -1000 })],
    ['trig', () => annualSunPath(2025, site, { trig: 'yes' as unknown as boolean })],
    [
      'trig',
      () =>
        annualSunPath(2024, site, {
          trig: { sinAltitude: new Float64Array(8760), cosAltitude: new Float64Array(8784), sinAzimuth: new Float64Array(8784), cosAzimuth: new Float64Array(8784) },
        }),
    ],
  ])('a bad %s is refused with an error naming it', (argument, fn) => {
    expect(fn).toThrow(SunpaneError);
    try {
      fn();
    } catch (err) {
      expect((err as SunpaneError).argument).toBe(argument);
    }
  });
});


describe('annual sun path sines and cosines', () => {
  // Reference: Math.sin / Math.cos of the path's own angle columns. The columns come from the
  // topocentric vector instead; measured agreement ≤ 2.3e-15 (a few ulps), required 1e-14.
  const TRIG_EQUAL = 1e-14;

  test.each([...SITES, { latitude: 89.9, longitude: 0, utcOffset: 0 }, { latitude: 0.5, longitude: 179, utcOffset: 12 }].map((s) => [s.latitude, s] as const))(
    'at latitude %s° every hour of 2024 matches Math.sin and Math.cos of the altitude and azimuth, which are unchanged',
    (_lat, site) => {
      const plain = annualSunPath(2024, site);
      const path = annualSunPath(2024, site, { trig: true });
      const { sinAltitude, cosAltitude, sinAzimuth, cosAzimuth } = path;
      if (!sinAltitude || !cosAltitude || !sinAzimuth || !cosAzimuth) throw new Error('trig columns missing');
      let worst = 0;
      const changed = new Mismatches();
      for (let i = 0; i < path.hours; i++) {
        changed.check(Object.is(path.altitude[i], plain.altitude[i]), () => `hour ${i}: altitude ${path.altitude[i]} with trig, ${plain.altitude[i]} without`);
        changed.check(Object.is(path.azimuth[i], plain.azimuth[i]), () => `hour ${i}: azimuth ${path.azimuth[i]} with trig, ${plain.azimuth[i]} without`);
        const altitudeRad = (path.altitude[i] * Math.PI) / 180;
        const azimuthRad = (path.azimuth[i] * Math.PI) / 180;
        worst = Math.max(
          worst,
          Math.abs(sinAltitude[i] - Math.sin(altitudeRad)),
          Math.abs(cosAltitude[i] - Math.cos(altitudeRad)),
          Math.abs(sinAzimuth[i] - Math.sin(azimuthRad)),
          Math.abs(cosAzimuth[i] - Math.cos(azimuthRad)),
        );
      }
      expect(changed.list).toEqual([]);
      expect(worst).toBeLessThan(TRIG_EQUAL);
    },
  );

  test('without the option there are no trig columns; given columns are filled and returned', () => {
    const site: Site = { latitude: -33.9, longitude: 151.2, utcOffset: 10 };
    const plain = annualSunPath(2025, site);
    expect(plain.sinAltitude).toBeUndefined();
    expect(plain.cosAzimuth).toBeUndefined();
    // Longer columns are accepted (rows past the year are left alone).
    const given = { sinAltitude: new Float64Array(8784).fill(7), cosAltitude: new Float64Array(8760), sinAzimuth: new Float64Array(8760), cosAzimuth: new Float64Array(8760) };
    const path = annualSunPath(2025, site, { trig: given });
    const fresh = annualSunPath(2025, site, { trig: true });
    expect(path.sinAltitude).toBe(given.sinAltitude);
    expect(path.cosAzimuth).toBe(given.cosAzimuth);
    expect(Array.from(given.sinAltitude.subarray(0, 8760))).toEqual(Array.from(fresh.sinAltitude ?? []));
    expect(Array.from(given.cosAltitude)).toEqual(Array.from(fresh.cosAltitude ?? []));
    expect(Array.from(given.sinAzimuth)).toEqual(Array.from(fresh.sinAzimuth ?? []));
    expect(Array.from(given.cosAzimuth)).toEqual(Array.from(fresh.cosAzimuth ?? []));
    expect(given.sinAltitude[8783]).toBe(7);
  });

  test('with slowColumns false the position columns are the same numbers and the declination and equation-of-time columns are empty', () => {
    const site: Site = { latitude: 47.4, longitude: 8.5, utcOffset: 1, elevation: 400 };
    const full = annualSunPath(2024, site, { trig: true });
    const fast = annualSunPath(2024, site, { trig: true, slowColumns: false });
    expect(fast.hours).toBe(8784);
    expect(fast.declination).toHaveLength(0);
    expect(fast.equationOfTime).toHaveLength(0);
    expect(full.declination).toHaveLength(8784);
    for (const key of ['stampSerial', 'altitude', 'azimuth', 'zenith', 'sinAltitude', 'cosAltitude', 'sinAzimuth', 'cosAzimuth'] as const) {
      expect(Array.from(fast[key] ?? [])).toEqual(Array.from(full[key] ?? []));
    }
    expect(() => annualSunPath(2024, site, { slowColumns: 'no' as unknown as boolean })).toThrow(SunpaneError);
    expect(() => annualSunPath(2024, site, { slowColumns: 'no' as unknown as boolean })).toThrow(/^slowColumns/);
  });
});
