/**
 * The pane's only door to the calculation core: it hands over a WindowSpec and gets numbers back.
 * Nothing here computes physics; it only calls core functions and reshapes their results for the
 * sheet writer and the sun-path drawing.
 */
import { type AnnualSeries, annualSeries, type AnnualSummary, summarizeAnnual, type WindowSpec, validateWindowSpec } from '../core/gain';
import { shadingMaskGrid, type Shading } from '../core/shading';
import { sunPosition, incidenceAngle } from '../core/sun';
import { civilToSerial, inDaylightSaving, serialToUtcMs } from '../core/time';
import { annualLoadParts, loadPeak, windowRoomSeries } from '../core/load';
import { type HourlyData, hourlyData } from '../outputs/hourlyColumns';
import { inGlossaryWords } from '../registry/windowRange';
import type { YearFigures } from './yearSheet';

/**
 * Checks a WindowSpec; a refusal names the field by its glossary name (`latitude`, `shgc`,
 * `overhangProjection`), as the functions, the window file and the schedule do.
 */
export function validateSpec(spec: WindowSpec): void {
  try {
    validateWindowSpec(spec);
    windowRoomSeries(spec);
  } catch (err) {
    throw inGlossaryWords(err);
  }
}

/** One window's year and its totals. */
export interface YearResult {
  series: AnnualSeries;
  summary: AnnualSummary;
  figures: YearFigures;
  /** The hourly table's columns: the series', with the conduction gain (a U-value) and the cooling load (a room). */
  hourly: HourlyData;
}

/** Runs the core's annual series and summary for one window. */
export function runYear(spec: WindowSpec): YearResult {
  validateSpec(spec);
  const series = annualSeries(spec);
  const summary = summarizeAnnual(series);
  const room = windowRoomSeries(spec);
  const load = room ? annualLoadParts(series, room).total : undefined;
  const peak = load ? loadPeak(series, load) : undefined;
  // Under a daylight-saving rule the rows and the peak hours are given on the local clock (the
  // series' clock stamps, as SOLARGAINYEAR's stamp column); without one the clock is standard time.
  const clock = spec.site.daylightSaving !== undefined;
  const onClock = (stamp: number) => (clock ? series.clockStamp[Math.round((stamp - series.stampSerial[0]) * 24)] : stamp);
  const figures: YearFigures = {
    monthlyKWh: summary.monthlyKWh,
    annualKWh: summary.annualKWh,
    peakW: summary.peakW,
    peakStamp: summary.peakW > 0 ? onClock(summary.peakStamp) : undefined,
    sunlitHours: summary.sunlitHours,
    meanSunlitFraction: summary.meanSunlitFraction,
    beamCut: summary.beamCut,
    diffuseCut: summary.diffuseCut,
    missingHours: summary.missingHours,
    glassArea: series.glassArea,
    ...(peak ? { peakLoadW: peak.peakLoadW, peakLoadStamp: onClock(peak.peakLoadStamp) } : {}),
  };
  const hourly = hourlyData(series, load);
  return { series, summary, figures, hourly: clock ? { ...hourly, stampSerial: series.clockStamp } : hourly };
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

/**
 * How far the window's clock is ahead of local standard time on a day of its year [h]: the rule's
 * shift when the day's noon (standard time) falls in daylight saving under the core's rule, else 0
 * (and 0 with no rule). Noon stands for the day's daylight hours, since clocks change at night.
 */
export function clockAheadOn(spec: WindowSpec, month: number, day: number): number {
  const rule = spec.site.daylightSaving;
  return rule !== undefined && inDaylightSaving(civilToSerial(spec.year, month, day, 12), rule) ? rule.shift : 0;
}

/** Where the sun can be relative to the window, cell by cell of the sky. */
export type MaskClass = 'open' | 'part' | 'full' | 'behind';

/** A sky grid of sun directions and, for each, how much of the glass (or the point) is in sun. */
export interface MaskGrid {
  /** Cells around each sampled sun direction: azimuth and altitude bounds [°], the sunlit value 0…1 at the sample, and its class. */
  cells: { az0: number; az1: number; alt0: number; alt1: number; sunlit: number; kind: MaskClass }[];
}

/** Sunlit value at or above which a cell counts as not shaded (and at or below 1 − this, fully shaded). */
export const MASK_OPEN = 0.995;

/**
 * The shading mask over the sky for a vertical window, from the core's {@link shadingMaskGrid}:
 * the sunlit fraction of the glass (or, with `point`, whether that point of the glass sees the sun)
 * for sun directions on an azimuth × altitude grid; each sample is drawn as the cell around it.
 * Directions behind the window plane (incidence ≥ 90°, from the core's incidence angle) are marked
 * apart. The skyline is left out here, since the drawing shows it on its own.
 * @param point - a point on the glass [m] from the left jamb (seen from outside) and above the sill
 */
export function shadingMask(spec: WindowSpec, point?: { x: number; y: number }, azimuthStep = 5, altitudeStep = 5): MaskGrid {
  const shading: Shading = { ...spec.shading };
  delete shading.skyline;
  const grid = shadingMaskGrid({ width: spec.width, height: spec.height }, shading, spec.surfaceAzimuth, { azimuthStep, altitudeStep, point });
  const values = point ? grid.point : grid.whole;
  const cells: MaskGrid['cells'] = [];
  grid.altitudes.forEach((alt, i) => {
    // The horizon row is 0 by the core's convention (sun on the horizon): nothing to draw there.
    if (alt <= 0) return;
    grid.azimuths.forEach((az, j) => {
      const sunlit = values[i][j];
      const behind = incidenceAngle(alt, az, spec.surfaceTilt, spec.surfaceAzimuth) >= 90;
      const kind: MaskClass = behind ? 'behind' : sunlit >= MASK_OPEN ? 'open' : sunlit <= 1 - MASK_OPEN ? 'full' : 'part';
      cells.push({ az0: az - azimuthStep / 2, az1: az + azimuthStep / 2, alt0: Math.max(0, alt - altitudeStep / 2), alt1: Math.min(90, alt + altitudeStep / 2), sunlit, kind });
    });
  });
  return { cells };
}
