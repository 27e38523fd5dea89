/**
 * The pane's only door to the calculation core: it hands over a WindowSpec and gets numbers back.
 * Nothing here computes physics; it only calls core functions and reshapes their results for the
 * sheet writer and the sun-path drawing.
 */
import { type AnnualSeries, annualSeries } from '../core/annual';
import { type AnnualSummary, summarizeAnnual } from '../core/annualSummary';
import { pointSunlit, sunlitFraction } from '../core/shading';
import { sunPosition } from '../core/sun';
import { incidenceAngle } from '../core/surface';
import { civilToSerial, serialToUtcMs } from '../core/time';
import type { Shading, WindowSpec } from '../core/window';
import { validateWindowSpec } from '../core/windowSpec';
import type { YearFigures } from './yearSheet';

/** Checks a WindowSpec (throws SunpaneError naming the field path). */
export function validateSpec(spec: WindowSpec): void {
  validateWindowSpec(spec);
}

/** One window's year and its totals. */
export interface YearResult {
  series: AnnualSeries;
  summary: AnnualSummary;
  figures: YearFigures;
}

/** Runs the core's annual series and summary for one window. */
export function runYear(spec: WindowSpec): YearResult {
  validateWindowSpec(spec);
  const series = annualSeries(spec);
  const summary = summarizeAnnual(series);
  const figures: YearFigures = {
    monthlyKWh: summary.monthlyKWh,
    annualKWh: summary.annualKWh,
    peakW: summary.peakW,
    peakStamp: summary.peakW > 0 ? summary.peakStamp : undefined,
    sunlitHours: summary.sunlitHours,
    meanSunlitFraction: summary.meanSunlitFraction,
    missingHours: summary.missingHours,
    glassArea: series.glassArea,
  };
  return { series, summary, figures };
}

/** One point of a sun track. */
export interface TrackPoint {
  /** Local standard time of day [h]. */
  hour: number;
  altitude: number;
  azimuth: number;
}

/** The sun's track over one day at the site, sampled every `stepMinutes`. */
export interface SunTrack {
  month: number;
  day: number;
  points: TrackPoint[];
}

/**
 * Sun tracks for the given days of `year` (local standard time), from the core's NREL SPA.
 * @param spec - supplies the site and year
 * @param days - [month, day] pairs
 * @param stepMinutes - sampling step [min]
 */
export function sunTracks(spec: WindowSpec, days: readonly (readonly [number, number])[], stepMinutes = 10): SunTrack[] {
  const { latitude, longitude, utcOffset, elevation } = spec.site;
  return days.map(([month, day]) => {
    const points: TrackPoint[] = [];
    for (let minute = 0; minute <= 24 * 60; minute += stepMinutes) {
      const serial = civilToSerial(spec.year, month, day, 0, minute);
      const sun = sunPosition(serialToUtcMs(serial, utcOffset), latitude, longitude, { elevation });
      points.push({ hour: minute / 60, altitude: sun.altitude, azimuth: sun.azimuth });
    }
    return { month, day, points };
  });
}

/** Where the sun can be relative to the window, cell by cell of the sky. */
export type MaskClass = 'open' | 'part' | 'full' | 'behind';

/** A sky grid of sun directions and, for each, how much of the glass (or the point) is in sun. */
export interface MaskGrid {
  azimuthStep: number;
  altitudeStep: number;
  /** Cells: lower-left corner azimuth / altitude [°], the sunlit value at the cell centre 0…1, and its class. */
  cells: { azimuth: number; altitude: number; sunlit: number; kind: MaskClass }[];
}

/** Sunlit value at or above which a cell counts as not shaded (and at or below 1 − this, fully shaded). */
export const MASK_OPEN = 0.995;

/**
 * The shading mask over the sky in front of a vertical window: for sun directions at the centres
 * of an azimuth × altitude grid, the core's sunlit fraction of the glass (or, with `point`, whether
 * that point of the glass is in sun). The horizon profile is left out here, since it is drawn apart.
 * @param point - a point on the glass [m] from the left jamb (seen from outside) and above the sill
 */
export function shadingMask(spec: WindowSpec, point?: { x: number; y: number }, azimuthStep = 5, altitudeStep = 5): MaskGrid {
  const opening = { width: spec.width, height: spec.height };
  const shading: Shading = { ...spec.shading, skyline: undefined };
  delete shading.skyline;
  const cells: MaskGrid['cells'] = [];
  for (let az = 0; az < 360; az += azimuthStep) {
    for (let alt = 0; alt < 90; alt += altitudeStep) {
      const a = alt + altitudeStep / 2;
      const s = az + azimuthStep / 2;
      if (incidenceAngle(a, s, spec.surfaceTilt, spec.surfaceAzimuth) >= 90) {
        cells.push({ azimuth: az, altitude: alt, sunlit: 0, kind: 'behind' });
        continue;
      }
      const sunlit = point ? pointSunlit(opening, shading, point.x, point.y, a, s, spec.surfaceAzimuth) : sunlitFraction(opening, shading, a, s, spec.surfaceAzimuth);
      const kind: MaskClass = sunlit >= MASK_OPEN ? 'open' : sunlit <= 1 - MASK_OPEN ? 'full' : 'part';
      cells.push({ azimuth: az, altitude: alt, sunlit, kind });
    }
  }
  return { azimuthStep, altitudeStep, cells };
}
