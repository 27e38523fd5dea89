/**
 * Schedule benchmark: the computing cost of one window-hour in a schedule run — 48 windows of one
 * site (eight facings × six shadings: none, an overhang, overhang and fins, one fin, a reveal, a
 * skyline with an overhang; Perez 1990 sky under the site's turbidity clear sky), each worked out
 * for the year and summed up (`summarizeWindowYear`), with the sun's positions and the weather
 * shared by all windows of the site (worked out once per round, inside the timed work) and no file
 * written — against suncalc 2.0.2's bare `getPosition`, per position. Ratio key:
 * `schedule_window_hour_vs_suncalc` = (time per window-hour) / (time per suncalc position).
 */
import { type SharedYears as SharedYearsType, type WindowSpec, SharedYears, summarizeWindowYear } from '../src/core/gain';
import type { Shading } from '../src/core/shading';
import { type BenchSection, consume, timeInterleaved, suncalcJob } from './harness';

const YEAR = 2026;
/** An example location (the demo's temperate northern site), standard time UTC+1. */
const SITE = { latitude: 52.2, longitude: 4.9, utcOffset: 1, elevation: 5 };
const LINKE = [2.8, 3.0, 3.2, 3.4, 3.6, 3.7, 3.8, 3.7, 3.4, 3.2, 3.0, 2.8];

const SHADINGS: Shading[] = [
  {},
  { overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.3 } },
  {
    overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.3 },
    leftFin: { projection: 0.3, gap: 0.1, extensionAbove: 0, extensionBelow: 0 },
    rightFin: { projection: 0.3, gap: 0.1, extensionAbove: 0, extensionBelow: 0 },
  },
  { leftFin: { projection: 0.4, gap: 0, extensionAbove: 0.2, extensionBelow: 0 } },
  { revealDepth: 0.15 },
  { skyline: [5, 10, 20, 15, 0, 0, 5, 30], overhang: { projection: 0.4, gap: 0.1, extensionLeft: 0, extensionRight: 0 } },
];

/** The 48 windows of the benchmark schedule. */
export function benchScheduleWindows(): WindowSpec[] {
  const out: WindowSpec[] = [];
  SHADINGS.forEach((shading, v) => {
    for (let k = 0; k < 8; k++) {
      out.push({
        name: `window ${v}-${k}`,
        site: SITE,
        surfaceAzimuth: k * 45,
        surfaceTilt: 90,
        width: 1.2 + 0.1 * v,
        height: 1.5,
        frameFraction: 0.1,
        glazing: { shgc: 0.4, panes: 2 },
        shading,
        groundAlbedo: 0.2,
        skyModel: 'perez1990',
        weather: { kind: 'ineichenClearSky', linkeTurbidity: LINKE },
        year: YEAR,
      });
    }
  });
  return out;
}

/** One schedule run: fresh shared years (the sun and weather worked out once), every window summed up. */
export function runBenchSchedule(windows: readonly WindowSpec[], years: SharedYearsType = new SharedYears()): number {
  let acc = 0;
  for (const w of windows) acc += summarizeWindowYear(w, years).summary.annualKWh;
  return acc;
}

/** Windows per timed round: a round then lasts about as long as suncalc's year of positions. */
const WINDOWS_PER_ROUND = 4;

export function scheduleBench(): BenchSection {
  const windows = benchScheduleWindows();
  const hours = 8760;
  const start = Date.UTC(YEAR, 0, 1, 0, 30) - SITE.utcOffset * 3_600_000; // 00:30 local standard time
  const dates = Array.from({ length: hours }, (_, i) => new Date(start + i * 3_600_000));
  // The schedule's windows in rounds of a few (rotating through all 48) with the site's shared year
  // kept, so that each timed piece of work is about as long as the peer's: under a loaded machine a
  // long piece of work is interrupted more often than a short one. The shared year (the sun and the
  // weather of the site) is timed on its own and its cost spread over the 48 windows.
  const years = new SharedYears();
  runBenchSchedule(windows, years);
  let next = 0;
  const [perWindow, shared, suncalc] = timeInterleaved([
    {
      label: `schedule windows, ${WINDOWS_PER_ROUND} a round, site's sun and weather shared (${WINDOWS_PER_ROUND} × ${hours} window-hours)`,
      operations: WINDOWS_PER_ROUND * hours,
      work: () => {
        const round = [];
        for (let k = 0; k < WINDOWS_PER_ROUND; k++) round.push(windows[(next + k) % windows.length]);
        next = (next + WINDOWS_PER_ROUND) % windows.length;
        consume(runBenchSchedule(round, years));
      },
    },
    {
      label: `the site's shared year: sun path, clear-sky weather, Perez brightness (${hours} h; once per site)`,
      operations: hours,
      work: () => consume(runBenchSchedule(windows.slice(0, 1))),
    },
    suncalcJob(dates, SITE),
  ]);
  // One window-hour of the 48-window schedule: its own work, plus its share of the site's year.
  const perHour = perWindow.medianMs / perWindow.operations + Math.max(0, shared.medianMs - perWindow.medianMs / WINDOWS_PER_ROUND) / (windows.length * hours);
  return {
    title: `Schedule: one window-hour of a ${windows.length}-window schedule (sun and weather shared per site, no file written) vs one bare sun position`,
    timings: [perWindow, shared, suncalc],
    ratios: { schedule_window_hour_vs_suncalc: Number((perHour / (suncalc.medianMs / suncalc.operations)).toPrecision(3)) },
  };
}
