/**
 * Shading masks: the sunlit fraction of one window over a grid of sun positions (azimuth ×
 * altitude), and over the hours of one day in each month — the data the task pane draws.
 *
 * Both are tables of {@link sunlitFraction} / {@link pointSunlit} values; the sun positions of the
 * month × hour mask come from the NREL SPA (src/core/sun/spa.ts).
 */
import { requireRange } from '../common';
import { pointSunlit, requireShading, sunlitFraction, type WindowOpening } from './sunlit';
import { sunPosition, type Site } from '../sun';
import { civilToSerial, hourFraction, requireTimeConvention, requireUtcOffset, requireYear, serialToUtcMs, type TimeConvention } from '../time';
import type { Shading } from './types';

/** The default year of the month × hour mask (any year gives the same mask to within 0.3° of sun). */
export const MASK_DEFAULT_YEAR = 2026;

/** A sun-position grid of sunlit values. */
export interface ShadingMaskGrid {
  /** Sun azimuths [°] of the columns, 0 ≤ azimuth < 360, ascending, clockwise from north. */
  azimuths: number[];
  /** Sun altitudes [°] of the rows, 0 … 90, ascending. */
  altitudes: number[];
  /** Sunlit fraction 0…1 of the whole glass, `whole[row][column]` = altitude row, azimuth column. */
  whole: number[][];
  /** 1 where the reference point sees the sun, 0 where it is shaded (or the sun is behind the wall). */
  point: number[][];
  /** The reference point used, from the lower-left corner seen from outside [length]. */
  pointX: number;
  pointY: number;
}

/** Options of {@link shadingMaskGrid}. */
export interface ShadingMaskOptions {
  /** Azimuth spacing [°], 0.1…360. */
  azimuthStep: number;
  /** Altitude spacing [°], 0.1…90. */
  altitudeStep: number;
  /** Reference point on the glass [length] from the lower-left corner seen from outside; default the centre. */
  point?: { x: number; y: number };
}

/**
 * Sunlit fraction of a window for every sun position of an azimuth × altitude grid.
 *
 * @param window - glass width and height [length] > 0
 * @param shading - overhang, fins, reveal, skyline (as for {@link sunlitFraction})
 * @param surfaceAzimuth - direction the window faces [°] clockwise from north, any finite value
 * @param options - `azimuthStep` [°] 0.1…360, `altitudeStep` [°] 0.1…90, `point` (default the centre)
 * @returns azimuths 0, step, … below 360; altitudes 0, step, … up to 90 (90 included when the step
 * divides it); `whole` the sunlit fraction and `point` the 0/1 sun at the reference point, both
 * [altitude row][azimuth column]. Sun positions at altitude 0, behind the wall or below the skyline
 * give 0.
 * @throws SunpaneError naming `azimuthStep`, `altitudeStep`, `x`, `y`, or any window/shading argument
 */
export function shadingMaskGrid(window: WindowOpening, shading: Shading, surfaceAzimuth: number, options: ShadingMaskOptions): ShadingMaskGrid {
  requireShading(window, shading);
  const azStep = requireRange('azimuthStep', options.azimuthStep, 0.1, 360, '°');
  const altStep = requireRange('altitudeStep', options.altitudeStep, 0.1, 90, '°');
  const x = options.point ? requireRange('x', options.point.x, 0, window.width) : window.width / 2;
  const y = options.point ? requireRange('y', options.point.y, 0, window.height) : window.height / 2;
  const azimuths: number[] = [];
  for (let k = 0; k * azStep < 360 - 1e-9; k++) azimuths.push(k * azStep);
  const altitudes: number[] = [];
  for (let k = 0; k * altStep <= 90 + 1e-9; k++) altitudes.push(Math.min(90, k * altStep));
  const whole = altitudes.map((alt) => azimuths.map((az) => sunlitFraction(window, shading, alt, az, surfaceAzimuth)));
  const point = altitudes.map((alt) => azimuths.map((az) => pointSunlit(window, shading, x, y, alt, az, surfaceAzimuth)));
  return { azimuths, altitudes, whole, point, pointX: x, pointY: y };
}

/** Options of {@link monthHourMask}. */
export interface MonthHourOptions {
  /** Day of each month, 1…28; default 21. */
  day?: number;
  /** Calendar year, 1901…9998; default {@link MASK_DEFAULT_YEAR}. */
  year?: number;
  /**
   * `hourEnding` (default): columns are the hours ending 01:00 … 24:00, sun at mid-hour;
   * `instant`: columns are the instants 00:00 … 23:00.
   */
  timeConvention?: TimeConvention;
}

/**
 * Sunlit fraction of a window for each hour of one day in every month: 12 rows (January first) ×
 * 24 columns (hour ending 1:00 … 24:00 local standard time, sun at the middle of the hour; or, with
 * the `instant` time convention, the instants 00:00 … 23:00).
 *
 * @param site - latitude, longitude, UTC offset [h], optional elevation, pressure, temperature
 * @param window - glass width and height [length] > 0
 * @param shading - overhang, fins, reveal, skyline
 * @param surfaceAzimuth - direction the window faces [°] clockwise from north
 * @param options - `day` of each month 1…28 (default 21), `year` (default {@link MASK_DEFAULT_YEAR}),
 *   `timeConvention` (default `hourEnding`)
 * @returns 12 × 24 sunlit fractions 0…1; 0 for hours with the sun down, behind the wall or below
 * the skyline
 * @remarks Sun position by the NREL SPA (Reda & Andreas 2008) via src/core/sun/spa.ts; hourly stamps at
 * the END of the hour with the sun at mid-hour by default, or at the top of the hour with the instant
 * time convention (docs/conventions.md#hourly-rows).
 * @throws SunpaneError naming `day`, `year`, `timeConvention`, `utcOffset`, `latitude`, `longitude`,
 * or any window or shading argument
 */
export function monthHourMask(site: Site, window: WindowOpening, shading: Shading, surfaceAzimuth: number, options: MonthHourOptions = {}): number[][] {
  requireShading(window, shading);
  const day = requireRange('day', options.day ?? 21, 1, 28, undefined, { integer: true });
  const year = requireYear(options.year ?? MASK_DEFAULT_YEAR);
  const utcOffset = requireUtcOffset(site.utcOffset);
  const minute = hourFraction(requireTimeConvention(options.timeConvention)) * 60;
  const sunOptions = { elevation: site.elevation, pressure: site.pressure, temperature: site.temperature };
  const rows: number[][] = [];
  for (let month = 1; month <= 12; month++) {
    const row: number[] = [];
    for (let hour = 0; hour < 24; hour++) {
      const serial = civilToSerial(year, month, day, hour, minute);
      const sun = sunPosition(serialToUtcMs(serial, utcOffset), site.latitude, site.longitude, sunOptions);
      row.push(sunlitFraction(window, shading, sun.altitude, sun.azimuth, surfaceAzimuth));
    }
    rows.push(row);
  }
  return rows;
}
