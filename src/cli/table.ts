/**
 * `sunpane table`: one window's hourly year, from a window file and optionally an hourly weather
 * file, written as CSV or as a workbook (hourly table, monthly summary, heat map).
 */
import * as path from 'node:path';
import { type AnnualSeries, annualSeries, type AnnualSummary, summarizeAnnual, type WindowSpec, validateWindowSpec } from '../core/gain';
import { annualLoadParts, type LoadPeak, loadPeak, windowRoomSeries } from '../core/load';
import { formatSerialIso } from '../core/time';
import { CAUTION } from '../outputs/caution';
import type { Output } from './call';
import { addHeatMapSheet, addHourlySheet, addMonthlySheet, hourlyCsv, standardTimeNote } from './annualSheets';
import { checkOutput, writeFileAtomic } from './atomicWrite';
import { CliInputError } from './cliError';
import { DATE_SYSTEM_FLAG, dateSystemFlag, dateSystemHelp, outputKind, parseFlags, requireFlag } from './flags';
import { ProgressBar } from './progress';
import { WEATHER_FLAGS, WEATHER_HELP, type WeatherRequest, checkWeatherTable, readWeatherTable, weatherRequest } from './weatherCsv';
import { readWindowFile } from './windowJson';
import { windowFieldLines } from '../registry/windowRange';
import { fillContentsSheet, newWorkbook, saveWorkbook } from './workbook';

export const TABLE_HELP = `usage: sunpane table --window FILE.json [--weather FILE.csv (--dni COL --dhi COL | --ghi COL) ...] --out FILE.xlsx|FILE.csv [--${DATE_SYSTEM_FLAG} 1904]

Writes one window's hourly year: 8760 rows (8784 in a leap year), each stamped at the END of its
hour in local standard time, the sun taken at mid-hour (the window's timeConvention "hourEnding",
the default; "instant" stamps rows 00:00 … 23:00 and takes the sun at the stamp).

  --window FILE.json   the window (see "window file" below)
${WEATHER_HELP}
  --out FILE           .csv: the hourly columns; .xlsx: hourly table, monthly summary, heat map
                       (a window with uValue adds the conduction gain; one with roomConstruction, or
                       solarRadiantTimeSeries and nonSolarRadiantTimeSeries, the cooling load)
${dateSystemHelp(23)}
  --force              replace FILE if it exists (a read-only file is never replaced)
  --help               this text

Without --weather the window file's own clear sky is used (linkeTurbidity, or tauB and tauD, or an example site).

Window file (JSON): one object whose keys are the window fields, the same names as the worksheet
functions' window range and the schedule's columns (any case; older names accepted), e.g.
  {"name": "East office", "year": 2026, "latitude": 52.2, "longitude": 4.9, "utcOffset": 1,
   "surfaceAzimuth": 90, "width": 1.8, "height": 1.5, "shgc": 0.4, "overhangProjection": 0.6,
   "linkeTurbidity": 3.2}
The older nested form (site {…}, glazing {…}, shading {overhang {…}}, weather {kind, …}) is read too.
Fields (blank or left out: the default after "blank:"):
${windowFieldLines().map((l) => `  ${l}`).join('\n')}
Example: examples/east-office.json

Exit codes: 0 done, 1 bad input (the message names the field, row or line; weather that cannot be
used), 2 wrong usage.`;

/** What each sheet of the `table` workbook holds. */
export const TABLE_CONTENTS = [
  { sheet: 'Contents', holds: 'This list.' },
  { sheet: 'Monthly', holds: 'Solar gain and missing weather hours by month, as formulas over the Hourly table; with a room, the peak cooling load of each month and its hour (formulas over the Hourly load column); the year, the largest month and the peak hour; mean gain by month and hour ending (colour scale); a chart of the annual profile.' },
  { sheet: 'Heat map', holds: 'Solar gain (W) of every hour of the year, one row per day, coloured from least to most.' },
  { sheet: 'Hourly', holds: 'The hourly year as a table: sun position, incidence and profile angles, sunlit fraction, irradiance, SHGC at incidence and solar gain (with a U-value the conduction gain, with a room the cooling load), hour-ending in local standard time.' },
] as const;

const TABLE_FLAGS = { window: true, ...WEATHER_FLAGS, out: true, [DATE_SYSTEM_FLAG]: true, force: false, help: false } as const;

/** A window with its weather resolved and validated, and the weather report (for stderr). */
export interface ResolvedWindow {
  spec: WindowSpec;
  /** Lines about the weather file (problems within the limit, notes); empty when nothing to say. */
  weatherReport: string[];
}

/**
 * Reads the window file and the weather file (if any), checks the weather for the window's year
 * and site (src/io/weather.ts), validates the result.
 * @throws CliInputError with the weather report when the weather cannot be used
 */
export function resolveWindow(windowFile: string, weather: WeatherRequest | undefined): ResolvedWindow {
  const { spec, hasWeather } = readWindowFile(windowFile);
  let weatherReport: string[] = [];
  if (weather !== undefined) {
    // The year and the site are checked first: the weather is checked against them.
    validateWindowSpec({ ...spec, weather: { kind: 'ineichenClearSky', linkeTurbidity: [3] } });
    const checked = checkWeatherTable(readWeatherTable(weather.file, weather.columns), weather.file, spec.year, spec.site, weather.reading);
    spec.weather = checked.check.weather!;
    weatherReport = checked.report;
  } else if (!hasWeather) {
    throw new CliInputError(`${windowFile}: the window has no clear sky of its own: add "linkeTurbidity": 3 (or "tauB" and "tauD", or an example "site") or give hourly weather with --weather FILE.csv`);
  }
  validateWindowSpec(spec);
  return { spec, weatherReport };
}

/**
 * The text `table` prints when done: the window's year in one line (with the peak cooling load
 * when the window has a room), and where it went.
 */
export function tableSummaryLine(series: AnnualSeries, summary: AnnualSummary, load?: LoadPeak): string {
  const missing = summary.missingHours > 0 ? `; ${summary.missingHours} hours missing (not in the total)` : '';
  const when = series.timeConvention === 'instant' ? 'at' : 'in the hour ending';
  const peakLoad = load ? `, peak cooling load ${Math.round(load.peakLoadW)} W ${when} ${formatSerialIso(load.peakLoadStamp)}` : '';
  return `${series.name}: ${summary.annualKWh.toFixed(1)} kWh in ${series.year}, peak ${Math.round(summary.peakW)} W ${when} ${formatSerialIso(summary.peakStamp)}${peakLoad}, ${summary.sunlitHours} sunlit hours${missing}`;
}

/** Runs `sunpane table`. */
export async function tableCommand(argv: readonly string[], io: Output): Promise<number> {
  const flags = parseFlags(argv, TABLE_FLAGS);
  if (flags.has('help')) {
    io.out(TABLE_HELP);
    return 0;
  }
  const windowFile = requireFlag(flags, 'window', 'FILE.json (the window)');
  const out = requireFlag(flags, 'out', 'FILE.xlsx|FILE.csv (where to write)');
  const kind = outputKind(out, ['csv', 'xlsx']);
  const dateSystem = dateSystemFlag(flags, kind);
  const force = { force: flags.has('force') };
  checkOutput(out, force);
  const { spec, weatherReport } = resolveWindow(windowFile, weatherRequest(flags));
  for (const line of weatherReport) io.err(line);
  const series = annualSeries(spec);
  const summary = summarizeAnnual(series);
  const room = windowRoomSeries(spec);
  const load = room ? annualLoadParts(series, room).total : undefined;
  const bar = new ProgressBar('writing hours', series.hours);
  if (kind === 'csv') {
    const text = hourlyCsv(series, () => bar.tick(), load);
    bar.finish();
    await writeFileAtomic(out, text, force);
  } else {
    const wb = newWorkbook(`Sunpane: ${spec.name}`, dateSystem);
    const contents = wb.addWorksheet('Contents');
    const hourlySheet = 'Hourly';
    const monthlySheet = wb.addWorksheet('Monthly');
    addHeatMapSheet(wb, 'Heat map', series, `${spec.name}: solar gain (W) by day and ${series.timeConvention === 'instant' ? 'hour (instant)' : 'hour ending'}, ${series.year}`);
    const placement = addHourlySheet(wb, hourlySheet, 'Hourly', series, () => bar.tick(), undefined, load);
    bar.finish();
    const monthly = addMonthlySheet(monthlySheet, 'Monthly', summary, { sheet: hourlySheet, placement, series, load }, `${spec.name}: solar gain by month, ${series.year}`);
    fillContentsSheet(contents, `Sunpane: ${spec.name}, ${series.year}`, [`From ${path.basename(windowFile)}${flags.has('weather') ? ` and ${path.basename(flags.get('weather') ?? '')}` : ' (clear sky)'}.`], TABLE_CONTENTS);
    await saveWorkbook(wb, out, force, [monthly.chart]);
  }
  io.out(tableSummaryLine(series, summary, load ? loadPeak(series, load) : undefined));
  const clock = standardTimeNote(series);
  if (clock !== undefined) io.out(clock);
  io.out(`wrote ${path.normalize(out)}`);
  io.out(CAUTION);
  return 0;
}
