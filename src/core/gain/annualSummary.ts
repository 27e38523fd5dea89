/**
 * Summary of a window's annual hourly series: monthly and annual energy, the peak hour, sunlit
 * hours, mean sunlit fraction while the sun is on the wall, how much of the beam and of the diffuse
 * light the window's shading takes away over the year, and the count of missing hours.
 */
import { type AnnualSeries, annualOfPrepared, emptyYearTotals, monthOfDay, type YearTotals, yearTotalsOfShared } from './annual';
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
  const t = emptyYearTotals();
  const { monthlyWh, monthlyMissingHours } = t;
  const months = monthOfDay(series.year);
  const { hours, missing, gain, beam, shgc, sky, ground, skyUnshaded, groundUnshaded, sunlitFraction, sunAltitude, incidence } = series;
  // Day by day (a day lies in one month), each month's energy added up hour by hour in order.
  for (let day = 0, i = 0; i < hours; day++) {
    const m = months[day] - 1;
    let wh = monthlyWh[m];
    for (const end = i + 24; i < end; i++) {
      const fraction = sunlitFraction[i];
      if (missing[i] === 1) {
        t.missingHours++;
        monthlyMissingHours[m]++;
      } else {
        const q = gain[i];
        wh += q;
        if (q > t.peakW) {
          t.peakW = q;
          t.peakIndex = i;
        }
        const bm = beam[i];
        if (bm > 0 && fraction > 0) t.sunlitHours++;
        const b = bm * shgc[i];
        t.beamAll += b;
        t.beamKept += b * fraction;
        t.diffuseKept += sky[i] + ground[i];
        t.diffuseAll += skyUnshaded[i] + groundUnshaded[i];
      }
      if (sunAltitude[i] > 0 && incidence[i] < 90) {
        t.sunOnWallHours++;
        t.sunlitSum += fraction;
      }
    }
    monthlyWh[m] = wh;
  }
  return summaryOfTotals(t, series.stampSerial);
}

/** The summary of a year's totals; `stampSerial` the year's row stamps (for the peak's). */
function summaryOfTotals(t: YearTotals, stampSerial: Float64Array): AnnualSummary {
  const monthlyKWh = t.monthlyWh.map((wh) => wh / 1000);
  return {
    monthlyKWh,
    annualKWh: monthlyKWh.reduce((a, b) => a + b, 0),
    peakW: t.peakW,
    peakStamp: stampSerial[t.peakIndex],
    sunlitHours: t.sunlitHours,
    meanSunlitFraction: t.sunOnWallHours > 0 ? t.sunlitSum / t.sunOnWallHours : 0,
    sunOnWallHours: t.sunOnWallHours,
    beamCut: cutOf(t.beamKept, t.beamAll),
    diffuseCut: cutOf(t.diffuseKept, t.diffuseAll),
    missingHours: t.missingHours,
    monthlyMissingHours: t.monthlyMissingHours,
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
 * kept: a window without a U-value has its totals added up while its hours are worked out
 * (`yearTotalsOfShared`, ./annual.ts), one with a U-value goes through the summary-only year
 * (scratch columns; what a summary does not read is skipped) and {@link summarizeAnnual}.
 * @param spec - the window (validated; errors name the field by its path)
 * @param years - the shared years of the run
 */
export function summarizeWindowYear(spec: WindowSpec, years: SharedYears): WindowYearFigures {
  const w = prepareWindow(spec);
  const sy = years.of(w);
  if (spec.glazing.uValue === undefined) return { glassArea: w.glassArea, summary: summaryOfTotals(yearTotalsOfShared(w, sy), sy.stampSerial) };
  // Conduction may mark further hours missing (a dry-bulb series with gaps): the summary-only year.
  const series = annualOfPrepared(w, sy, true);
  return { glassArea: series.glassArea, summary: summarizeAnnual(series) };
}
