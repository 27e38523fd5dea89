/**
 * Shading masks (src/core/shading/shadingMask.ts).
 *
 * Source for the month × hour mask's timing: suncalc 2.0.2 (npm, pinned in package.json),
 * `getPosition(date, lat, lng)` (degrees, azimuth clockwise from north, refraction included in
 * version 2). For a window with no devices the mask must be 1 exactly when the sun is above the
 * horizon and in front of the wall at the middle of each hour (hour ending h → sun at h − 0.5 local
 * standard time). suncalc differs from the SPA by about 0.02°, so hours whose sun lies within 1° of
 * the horizon or of the wall plane are left out of the comparison. The grid mask is checked against
 * the one-position functions it tabulates (same code path, structural check only).
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { pointSunlit, sunlitFraction } from '../../../src/core/shading/sunlit';
import { monthHourMask, shadingMaskGrid } from '../../../src/core/shading/shadingMask';
import type { Shading } from '../../../src/core/shading/types';

// eslint-disable-next-line @typescript-eslint/no-require-imports
const SunCalc = require('suncalc') as { getPosition(date: Date, lat: number, lng: number): { altitude: number; azimuth: number } };

const WINDOW = { width: 1.2, height: 1.5 };
const SHADING: Shading = {
  overhang: { projection: 0.8, gap: 0.1, extensionLeft: 0.3, extensionRight: 0.3 },
  rightFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
  revealDepth: 0.05,
};

describe('shadingMaskGrid', () => {
  // Worked out before each test, not while the tests are collected, so that mutation testing can
  // tell which tests run which code (work done at collection time counts for no test).
  let grid: ReturnType<typeof shadingMaskGrid>;
  beforeEach(() => {
    grid = shadingMaskGrid(WINDOW, SHADING, 160, { azimuthStep: 15, altitudeStep: 10 });
  });

  test('covers azimuths 0…345 and altitudes 0…90 in the given steps', () => {
    expect(grid.azimuths).toHaveLength(24);
    expect(grid.azimuths[23]).toBe(345);
    expect(grid.altitudes).toEqual([0, 10, 20, 30, 40, 50, 60, 70, 80, 90]);
    expect(grid.whole).toHaveLength(10);
    for (const row of grid.whole) expect(row).toHaveLength(24);
  });

  test('each cell is the sunlit fraction, and the point mask is the centre point test', () => {
    expect(grid.pointX).toBeCloseTo(0.6, 14);
    expect(grid.pointY).toBeCloseTo(0.75, 14);
    for (let i = 0; i < grid.altitudes.length; i++) {
      for (let j = 0; j < grid.azimuths.length; j++) {
        expect(grid.whole[i][j]).toBe(sunlitFraction(WINDOW, SHADING, grid.altitudes[i], grid.azimuths[j], 160));
        expect(grid.point[i][j]).toBe(pointSunlit(WINDOW, SHADING, 0.6, 0.75, grid.altitudes[i], grid.azimuths[j], 160));
      }
    }
  });

  test('the horizon row and the directions behind the wall are dark', () => {
    expect(grid.whole[0].every((v) => v === 0)).toBe(true);
    const j = grid.azimuths.indexOf(345); // 175° from the normal
    expect(grid.whole.every((row) => row[j] === 0)).toBe(true);
  });

  test('a chosen point is used and checked', () => {
    const g = shadingMaskGrid(WINDOW, SHADING, 160, { azimuthStep: 90, altitudeStep: 45, point: { x: 0, y: 1.5 } });
    expect(g.pointX).toBe(0);
    expect(g.pointY).toBe(1.5);
    expect(() => shadingMaskGrid(WINDOW, SHADING, 160, { azimuthStep: 90, altitudeStep: 45, point: { x: 2, y: 0 } })).toThrow(SunpaneError);
  });

  test('bad steps name the argument', () => {
    expect(() => shadingMaskGrid(WINDOW, SHADING, 160, { azimuthStep: 0, altitudeStep: 10 })).toThrow(/^azimuthStep/);
    expect(() => shadingMaskGrid(WINDOW, SHADING, 160, { azimuthStep: 10, altitudeStep: 91 })).toThrow(/^altitudeStep/);
  });
});

describe('monthHourMask', () => {
  const site = { latitude: 40.4, longitude: -3.7, utcOffset: 1 };

  test('is 12 rows × 24 columns of fractions 0…1', () => {
    const m = monthHourMask(site, WINDOW, SHADING, 180);
    expect(m).toHaveLength(12);
    for (const row of m) {
      expect(row).toHaveLength(24);
      for (const v of row) {
        expect(v).toBeGreaterThanOrEqual(0);
        expect(v).toBeLessThanOrEqual(1);
      }
    }
  });

  test('an unshaded window is sunlit exactly in the hours suncalc 2.0.2 puts the mid-hour sun up and in front', () => {
    for (const [lat, lon, off, surf] of [
      [40.4, -3.7, 1, 180],
      [-33.9, 151.2, 10, 0],
      [64.1, -21.9, 0, 90],
      [1.3, 103.8, 8, 270],
    ]) {
      const m = monthHourMask({ latitude: lat, longitude: lon, utcOffset: off }, WINDOW, {}, surf, { day: 21, year: 2026 });
      let compared = 0;
      for (let month = 0; month < 12; month++) {
        for (let h = 1; h <= 24; h++) {
          const utc = Date.UTC(2026, month, 21, h - 1, 30) - off * 3_600_000;
          const p = SunCalc.getPosition(new Date(utc), lat, lon);
          const gamma = Math.abs((((p.azimuth - surf) % 360) + 540) % 360 - 180);
          if (Math.abs(p.altitude) < 1 || Math.abs(gamma - 90) < 1) continue;
          const expected = p.altitude > 0 && gamma < 90 ? 1 : 0;
          expect(m[month][h - 1]).toBe(expected);
          compared++;
        }
      }
      expect(compared).toBeGreaterThan(250);
    }
  });

  test('under an overhang a south window at 51.5° N is more shaded at noon in June than in December', () => {
    const m = monthHourMask({ latitude: 51.5, longitude: 0, utcOffset: 0 }, WINDOW, { overhang: SHADING.overhang }, 180);
    expect(m[5][12]).toBeLessThan(m[11][12]);
  });

  test('the day option changes the date used, and bad options name the argument', () => {
    const d1 = monthHourMask(site, WINDOW, SHADING, 180, { day: 1 });
    const d21 = monthHourMask(site, WINDOW, SHADING, 180, { day: 21 });
    expect(d1[2][10]).not.toBe(d21[2][10]);
    expect(() => monthHourMask(site, WINDOW, SHADING, 180, { day: 29 })).toThrow(/^day/);
    expect(() => monthHourMask(site, WINDOW, SHADING, 180, { year: 1800 })).toThrow(/^year/);
    expect(() => monthHourMask({ ...site, utcOffset: 20 }, WINDOW, SHADING, 180)).toThrow(/^utcOffset/);
    expect(() => monthHourMask({ ...site, latitude: 95 }, WINDOW, SHADING, 180)).toThrow(/^latitude/);
  });
});
