/**
 * Summary of a window's annual hourly series: monthly and annual energy, the peak hour, sunlit
 * hours, mean sunlit fraction while the sun is on the wall, how much of the beam and of the diffuse
 * light the window's shading takes away over the year, and the count of missing hours.
 */
import { type AnnualSeries, annualOfPrepared, monthOfDay } from './annual';
import type { SharedYears } from './sharedYear';
import type { WindowSpec } from './window';
import { prepareWindow } from './prepared';

/** What one year of a window adds up to. */
export interface AnnualSummary {
  /** Solar gain per month, January first [kWh] (12 values; missing hours add nothing). */
  monthlyKWh: number[];
  /** Solar gain over the year [kWh]: the sum of `monthlyKWh`. */
  annualKWh: number;
  /** Largest hourly gain [W] (0 for a year without sun). */
  peakW: number;
  /** Local serial at the end of the peak hour (the first such hour on ties). */
  peakStamp: number;
  /** Hours with beam on the glass: beam on the plane > 0 and sunlit fraction > 0 [h]. */
  sunlitHours: number;
  /**
   * Mean sunlit fraction over the hours with the sun above the horizon and in front of the wall
   * (incidence < 90°), 0…1; 0 when the sun never reaches the wall.
   */
  meanSunlitFraction: number;
  /** Hours the sun is above the horizon and in front of the window [h]. */
  sunOnWallHours: number;
  /**
   * Share of the year's beam on the glass that the shading takes away, 0…1:
   * 1 − Σ beam · sunlit fraction · SHGC(θ) ÷ Σ beam · SHGC(θ) (0 when no beam reaches the window).
   */
  beamCut: number;
  /**
   * Share of the year's sky-diffuse and ground-reflected light that the shading (devices and
   * skyline) takes away, 0…1: 1 − Σ (sky + ground) ÷ Σ (sky + ground on the bare window)
   * (docs/diffuse-shading.md; 0 without diffuse light).
   */
  diffuseCut: number;
  /** Hours without weather values [h]; their gain is not in the totals. */
  missingHours: number;
  /** Missing hours per month, January first [h]. */
  monthlyMissingHours: number[];
}

/**
 * Adds up an annual series. Each row is one hour, so its gain in W is its energy in Wh.
 * @param series - from {@link annualSeries}
 * @returns monthly and annual kWh, peak W and its stamp, sunlit hours, mean sunlit fraction with
 *   the sun on the wall, the beam and diffuse cuts of the shading, and missing hours (overall and by month) so that a total with gaps is
 *   never mistaken for a complete one
 * @remarks The month of a row is the month of the middle of its hour (the stamp of the hour ending
 *   at midnight on the 31st belongs to that 31st).
 */
export function summarizeAnnual(series: AnnualSeries): AnnualSummary {
  const monthlyWh = new Array<number>(12).fill(0);
  const monthlyMissingHours = new Array<number>(12).fill(0);
  let peakW = 0;
  let peakIndex = 0;
  let sunlitHours = 0;
  let sunOnWallHours = 0;
  let sunlitSum = 0;
  let missingHours = 0;
  let beamKept = 0;
  let beamAll = 0;
  let diffuseKept = 0;
  let diffuseAll = 0;
  const months = monthOfDay(series.year);
  const { hours, missing, gain, beam, shgc, sky, ground, skyUnshaded, groundUnshaded, sunlitFraction, sunAltitude, incidence } = series;
  // Day by day (a day lies in one month), each month's energy added up hour by hour in order.
  for (let day = 0, i = 0; i < hours; day++) {
    const m = months[day] - 1;
    let wh = monthlyWh[m];
    for (const end = i + 24; i < end; i++) {
      const fraction = sunlitFraction[i];
      if (missing[i] === 1) {
        missingHours++;
        monthlyMissingHours[m]++;
      } else {
        const q = gain[i];
        wh += q;
        if (q > peakW) {
          peakW = q;
          peakIndex = i;
        }
        const bm = beam[i];
        if (bm > 0 && fraction > 0) sunlitHours++;
        const b = bm * shgc[i];
        beamAll += b;
        beamKept += b * fraction;
        diffuseKept += sky[i] + ground[i];
        diffuseAll += skyUnshaded[i] + groundUnshaded[i];
      }
      if (sunAltitude[i] > 0 && incidence[i] < 90) {
        sunOnWallHours++;
        sunlitSum += fraction;
      }
    }
    monthlyWh[m] = wh;
  }
  const monthlyKWh = monthlyWh.map((wh) => wh / 1000);
  return {
    monthlyKWh,
    annualKWh: monthlyKWh.reduce((a, b) => a + b, 0),
    peakW,
    peakStamp: series.stampSerial[peakIndex],
    sunlitHours,
    meanSunlitFraction: sunOnWallHours > 0 ? sunlitSum / sunOnWallHours : 0,
    sunOnWallHours,
    beamCut: cutOf(beamKept, beamAll),
    diffuseCut: cutOf(diffuseKept, diffuseAll),
    missingHours,
    monthlyMissingHours,
  };
}

/** 1 − kept ÷ all, within 0…1 (0 when there is nothing to cut). */
function cutOf(kept: number, all: number): number {
  if (!(all > 0)) return 0;
  const cut = 1 - kept / all;
  return cut < 0 ? 0 : cut > 1 ? 1 : cut;
}

/** A window's year in figures, with its glass area. */
export interface WindowYearFigures {
  glassArea: number;
  summary: AnnualSummary;
}

/**
 * The summary of one window's year when many windows share their sites' sun and weather (a
 * schedule): the same numbers as `summarizeAnnual(annualSeries(spec))`, with the sun's path and the
 * weather taken from `years` (worked out once per site, year and weather) and no hourly columns
 * kept (the series is written into scratch columns; what a summary does not read is skipped).
 * @param spec - the window (validated; errors name the field by its path)
 * @param years - the shared years of the run
 */
export function summarizeWindowYear(spec: WindowSpec, years: SharedYears): WindowYearFigures {
  const w = prepareWindow(spec);
  const series = annualOfPrepared(w, years.of(w), true);
  return { glassArea: series.glassArea, summary: summarizeAnnual(series) };
}
