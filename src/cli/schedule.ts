/**
 * `sunpane schedule`: the annual summary of many windows, one per row of a CSV file or of the
 * first sheet of a workbook, written as CSV or as a workbook table with SUM/MAX totals. The
 * columns are the task pane's (src/schedule/columns.ts); blanks take the window file's defaults.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { annualSeries, SharedYears, summarizeAnnual, summarizeWindowYear, type Weather, type WindowSpec, validateWindowSpec } from '../core/gain';
import { SunpaneError } from '../core/common';
import { annualLoadParts, loadPeak, windowRoomSeries } from '../core/load';
import { CAUTION } from '../outputs/caution';
import type { Output } from './call';
import { MONTHS } from './annualSheets';
import { checkOutput, describeFsError } from './atomicWrite';
import { escapeFormulaText } from '../io/textCells';
import { CliInputError } from './cliError';
import { parseCsv } from './csv';
import { DATE_SYSTEM_FLAG, dateSystemFlag, dateSystemHelp, outputKind, parseFlags, requireFlag } from './flags';
import { ProgressBar } from './progress';
import { LOAD_HEADERS, SUMMARY_HEADERS, type WindowResult, csvSummaryWriter, extraCells, summaryExtrasOf, summaryFormats, summaryHeaders, xlsxSummaryWriter } from './scheduleOutput';
import { WEATHER_FLAGS, checkWeatherTable, readWeatherTable, weatherRequest } from './weatherCsv';
import { PALETTE } from '../outputs/palette';
import { type SheetChart, cellRef, columnRef } from './xlsxCharts';
import { fieldsOf, windowSpecFromFields } from '../registry/windowRange';
import { NUMBER_FORMATS, type TableCell, addDataTable, addSheetHeading, address, columnLetter, fillContentsSheet, freezeAt, newWorkbook, saveWorkbook, serialToCellDate, setFormula, setLabel } from './workbook';
import { type MatchedHeaders, type ScheduleColumn, SCHEDULE_COLUMNS, columnForHeader, matchHeaders, requiredColumns } from '../schedule/columns';

/**
 * Largest schedule written as a whole workbook (an Excel table and a chart of annual gain by
 * window); above it the workbook is streamed row by row (a filtered range, no chart — a chart of
 * thousands of bars says nothing), so that a schedule of any length needs the memory of one window.
 */
export const STREAM_WORKBOOK_ABOVE = 1000;

const SCHEDULE_FLAGS = { in: true, ...WEATHER_FLAGS, out: true, [DATE_SYSTEM_FLAG]: true, force: false, help: false } as const;

export const SCHEDULE_HELP = `usage: sunpane schedule --in FILE.csv|FILE.xlsx [--weather FILE.csv (--dni COL --dhi COL | --ghi COL) ...] --out FILE.xlsx|FILE.csv [--${DATE_SYSTEM_FLAG} 1904]

Works out each window's year and writes one summary row per window: annual and monthly gain
[kWh], peak hour [W] and when, sunlit hours, mean sunlit fraction, missing hours.

  --in FILE      the window schedule: a CSV file, or the first sheet of a workbook; a header row,
                 then one row per window; blank cells take the default (in brackets below)
  --weather FILE hourly weather for every window, with the options of \`sunpane table --help\`
                 (--dni, --dhi, --ghi, --time, --hour-stamp, --typical-year, --units, --decimal,
                 --max-unusable), checked for each window's year and site; without it each row
                 needs a clear sky (Linke turbidity, or both optical depths) or an example site
  --out FILE     .csv or .xlsx (a table with SUM/MAX totals)
${dateSystemHelp(17)}
  --force        replace FILE if it exists (a read-only file is never replaced)
  --help         this text

Schedule columns: the window fields, the same as in the task pane, the window file and the
worksheet functions' window range. A header is the label or the field name (any case; the unit in
brackets may be left out; older names are accepted too). Required: ${requiredColumns('cli').map((c) => c.header).join(', ')},
and a place: Site, or Latitude, Longitude and UTC offset. Lists are space-separated.
  ${'header'.padEnd(32)}${'field name'.padEnd(24)}meaning
${SCHEDULE_COLUMNS.map(helpLine).join('\n')}

Example: examples/windows.csv. Errors name the row and the column.
Exit codes: 0 done, 1 bad input, 2 wrong usage.`;

function helpLine(c: ScheduleColumn): string {
  return `  ${c.header.padEnd(32)}${c.key.padEnd(24)}${c.help}`;
}

/** One schedule row as read: where it is (for messages) and its cells by column key. */
export interface ScheduleRow {
  /** `line 4` (CSV) or `row 4` (sheet). */
  where: string;
  /** Cell values by column key ({@link ScheduleColumn.key}). */
  cells: Map<string, string | number>;
  /** The headers as written in the file, by column key (messages use the user's own words). */
  headers: ReadonlyMap<string, string>;
}

/**
 * Turns one schedule row into a window spec (weather resolved later if the row has none), by the
 * same reader as the window file and the worksheet functions (src/registry/windowRange.ts).
 * @throws CliInputError naming the row and the column as written in the file
 */
export function windowFromRow(row: ScheduleRow): { spec: WindowSpec; hasWeather: boolean } {
  const entries: { field: ScheduleColumn['field']; written: string; cell: string | number }[] = [];
  for (const column of SCHEDULE_COLUMNS) {
    const raw = row.cells.get(column.key);
    if (raw === undefined) continue;
    entries.push({ field: column.field, written: `column "${row.headers.get(column.key) ?? column.header}"`, cell: raw });
  }
  const name = row.cells.get('name');
  const label = typeof name === 'string' && name.trim() !== '' ? ` ("${name.trim()}")` : '';
  try {
    return windowSpecFromFields(fieldsOf(entries), { prefix: (f) => `column "${f.label}"` });
  } catch (err) {
    if (err instanceof SunpaneError) throw new CliInputError(`${row.where}${label}, ${err.message}`);
    throw err;
  }
}

/** Matches the header row; unknown or repeated headers and a missing label column are errors. */
function readHeader(headers: readonly string[], where: string): MatchedHeaders {
  const matched = matchHeaders(headers);
  if (matched.unknown.length) {
    const names = matched.unknown.map((u) => `"${u.header}"`).join(', ');
    throw new CliInputError(`${where}: unknown column${matched.unknown.length > 1 ? 's' : ''} ${names} (see \`sunpane schedule --help\` for the columns)`);
  }
  if (matched.repeated.length) {
    const r = matched.repeated[0];
    const first = matched.written.get(columnForHeader(r.header)!.key);
    throw new CliInputError(`${where}: columns "${first}" and "${r.header}" are the same column; keep one`);
  }
  const label = SCHEDULE_COLUMNS.find((c) => c.key === 'name')!;
  if (!matched.written.has(label.key)) throw new CliInputError(`${where}: the header row has no "${label.header}" column`);
  return matched;
}

function rowCells(matched: MatchedHeaders, values: readonly (string | number)[]): Map<string, string | number> {
  const cells = new Map<string, string | number>();
  matched.columns.forEach((c, k) => {
    if (c) cells.set(c.key, values[k] ?? '');
  });
  return cells;
}

/** Reads a CSV schedule. */
export function scheduleFromCsv(text: string, file: string): ScheduleRow[] {
  const lines = parseCsv(text);
  if (lines.length === 0) throw new CliInputError(`${file} is empty: expected a header row and one row per window`);
  const matched = readHeader(lines[0].fields, `${file} line ${lines[0].line}`);
  return lines.slice(1).map((l) => ({ where: `${file} line ${l.line}`, cells: rowCells(matched, l.fields), headers: matched.written }));
}

function plainCellValue(v: ExcelJS.CellValue): string | number {
  if (v === null || v === undefined) return '';
  if (typeof v === 'number' || typeof v === 'string') return v;
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  if (v instanceof Date) return v.toISOString();
  if (typeof v === 'object' && 'result' in v) return plainCellValue((v as ExcelJS.CellFormulaValue).result as ExcelJS.CellValue);
  if (typeof v === 'object' && 'richText' in v) return v.richText.map((r) => r.text).join('');
  if (typeof v === 'object' && 'text' in v) return String((v as { text: unknown }).text);
  return String(v);
}

/** Reads the first sheet of a workbook schedule. */
export async function scheduleFromXlsx(file: string): Promise<ScheduleRow[]> {
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.readFile(file);
  } catch (err) {
    throw new CliInputError(`cannot read the workbook ${file}: ${err instanceof Error && 'code' in err ? describeFsError(err) : 'not a readable .xlsx file'}`);
  }
  const ws = wb.worksheets[0];
  if (!ws) throw new CliInputError(`${file} has no sheets`);
  const headerRow = ws.getRow(1);
  const headers: string[] = [];
  headerRow.eachCell({ includeEmpty: true }, (cell, col) => (headers[col - 1] = String(plainCellValue(cell.value)).trim()));
  const matched = readHeader(headers, `${file} sheet "${ws.name}" row 1`);
  const rows: ScheduleRow[] = [];
  for (let r = 2; r <= ws.rowCount; r++) {
    const row = ws.getRow(r);
    const cells = rowCells(matched, headers.map((_, k) => plainCellValue(row.getCell(k + 1).value)));
    if ([...cells.values()].every((v) => v === '')) continue;
    rows.push({ where: `${file} sheet "${ws.name}" row ${r}`, cells, headers: matched.written });
  }
  return rows;
}

export { SUMMARY_HEADERS, type WindowResult, summaryCsv, summaryHeaders } from './scheduleOutput';

/** Formula cells below a summary table and the values they must show. */
export interface SummaryTotals {
  annualKWh: { cell: string; expected: number };
  peakW: { cell: string; expected: number };
  glassArea: { cell: string; expected: number };
}

/**
 * Adds the summary table of several windows to a sheet, with a total row of native formulas (SUM
 * of glass area and annual gain, MAX of peaks) carrying their cached results.
 */
export function addSummaryTable(ws: ExcelJS.Worksheet, tableName: string, topRow: number, results: readonly WindowResult[]): SummaryTotals {
  const x = summaryExtrasOf(results.map((r) => r.spec));
  const { numFmts, widths } = summaryFormats(x);
  const rows: TableCell[][] = results.map((r) => [
    escapeFormulaText(r.spec.name),
    r.spec.site.latitude,
    r.spec.surfaceAzimuth,
    r.glassArea,
    r.summary.annualKWh,
    r.summary.peakW,
    serialToCellDate(r.summary.peakStamp),
    r.summary.sunlitHours,
    r.summary.meanSunlitFraction,
    r.summary.missingHours,
    ...extraCells<TableCell>(r, x, (v) => v, (v) => v, serialToCellDate, null, (w) => w),
    ...r.summary.monthlyKWh,
  ]);
  const t = addDataTable(ws, tableName, { row: topRow, column: 1 }, summaryHeaders(x).map((header, k) => ({ header, numFmt: numFmts[k], width: widths[k] })), rows);
  const totalRow = t.lastRow + 1;
  const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
  setLabel(ws, address(totalRow, 1), 'All windows');
  const cell = (header: string) => address(totalRow, t.columnOf(header));
  const area = sum(results.map((r) => r.glassArea));
  const annual = sum(results.map((r) => r.summary.annualKWh));
  const peak = Math.max(0, ...results.map((r) => r.summary.peakW));
  setFormula(ws, cell('Glass area (m²)'), `SUM(${t.bodyRange('Glass area (m²)')})`, area, NUMBER_FORMATS.area);
  setFormula(ws, cell('Annual gain (kWh)'), `SUM(${t.bodyRange('Annual gain (kWh)')})`, annual, NUMBER_FORMATS.kwh);
  setFormula(ws, cell('Peak gain (W)'), `MAX(${t.bodyRange('Peak gain (W)')})`, peak, NUMBER_FORMATS.watts);
  if (x.load) {
    // The largest of the windows' own peaks (they need not fall in the same hour).
    const h = LOAD_HEADERS[0];
    setFormula(ws, cell(h), `MAX(${t.bodyRange(h)})`, Math.max(0, ...results.map((r) => r.load?.peakLoadW ?? 0)), NUMBER_FORMATS.watts);
  }
  for (const m of MONTHS) {
    const h = `${m} (kWh)`;
    setFormula(ws, cell(h), `SUM(${t.bodyRange(h)})`, sum(results.map((r) => r.summary.monthlyKWh[MONTHS.indexOf(m)])), NUMBER_FORMATS.kwh);
  }
  const sheet = ws.name;
  return {
    annualKWh: { cell: `${sheet}!${cell('Annual gain (kWh)')}`, expected: annual },
    peakW: { cell: `${sheet}!${cell('Peak gain (W)')}`, expected: peak },
    glassArea: { cell: `${sheet}!${cell('Glass area (m²)')}`, expected: area },
  };
}

/** A clear sky standing in while a window's year and site are checked before its weather is read. */
const STAND_IN_WEATHER: Weather = { kind: 'ineichenClearSky', linkeTurbidity: [3] };

/** What the weather check depends on: the year and everything of the site that moves the sun. */
function siteKey(spec: WindowSpec): string {
  const { latitude, longitude, utcOffset, elevation, pressure, temperature } = spec.site;
  return [spec.year, latitude, longitude, utcOffset, elevation, pressure, temperature].join('|');
}

/**
 * A bar chart of each window's annual solar gain, under the summary table that `addSummaryTable`
 * put at `topRow` (its header row) on `sheet`.
 */
export function summaryChart(sheet: string, topRow: number, results: readonly WindowResult[]): SheetChart {
  const first = topRow + 1;
  const last = topRow + results.length;
  const annual = columnLetter(SUMMARY_HEADERS.indexOf('Annual gain (kWh)') + 1);
  const below = last + 2;
  return {
    sheet,
    kind: 'bar',
    title: 'Annual solar gain by window (kWh)',
    valueAxisTitle: 'Solar gain (kWh/yr)',
    valueFormat: '#,##0',
    series: [
      {
        name: 'Annual gain (kWh)',
        nameRef: cellRef(sheet, annual, topRow),
        categories: results.map((r) => r.spec.name),
        categoriesRef: columnRef(sheet, 'A', first, last),
        values: results.map((r) => r.summary.annualKWh),
        valuesRef: columnRef(sheet, annual, first, last),
        colour: PALETTE.series[0],
      },
    ],
    from: { col: 0, row: below + 1 },
    to: { col: 7, row: below + 1 + Math.max(14, Math.ceil(results.length * 1.4) + 6) },
  };
}

/**
 * Computes one window's year and summary, with its conduction (a U-value: the year's net kWh and
 * the largest hour) and its peak cooling load (a room) when it has them.
 */
export function windowResult(spec: WindowSpec): WindowResult {
  const series = annualSeries(spec);
  const out: WindowResult = { spec, glassArea: series.glassArea, summary: summarizeAnnual(series) };
  if (series.hasConduction) {
    let wh = 0;
    let peakW = 0;
    for (let i = 0; i < series.hours; i++) {
      if (series.missing[i] === 1) continue;
      wh += series.conduction[i];
      if (series.conduction[i] > peakW) peakW = series.conduction[i];
    }
    out.conduction = { annualKWh: wh / 1000, peakW };
  }
  const room = windowRoomSeries(spec);
  if (room) out.load = loadPeak(series, annualLoadParts(series, room).total);
  return out;
}

/** True when a window's summary needs its whole hourly year (conduction or load), not the summary-only year. */
function needsWholeYear(spec: WindowSpec): boolean {
  return spec.glazing.uValue !== undefined || spec.room !== undefined;
}

/** Runs `sunpane schedule`. */
export async function scheduleCommand(argv: readonly string[], io: Output): Promise<number> {
  const flags = parseFlags(argv, SCHEDULE_FLAGS);
  if (flags.has('help')) {
    io.out(SCHEDULE_HELP);
    return 0;
  }
  const input = requireFlag(flags, 'in', 'FILE.csv|FILE.xlsx (the window schedule)');
  const out = requireFlag(flags, 'out', 'FILE.xlsx|FILE.csv (where to write)');
  const kind = outputKind(out, ['csv', 'xlsx']);
  const dateSystem = dateSystemFlag(flags, kind);
  const force = { force: flags.has('force') };
  checkOutput(out, force);
  const inKind = /\.xlsx$/i.test(input) ? 'xlsx' : 'csv';
  let rows: ScheduleRow[];
  if (inKind === 'xlsx') rows = await scheduleFromXlsx(input);
  else {
    let text: string;
    try {
      text = fs.readFileSync(input, 'utf8');
    } catch (err) {
      throw new CliInputError(`cannot read the schedule ${input}: ${describeFsError(err)}`);
    }
    rows = scheduleFromCsv(text, input);
  }
  if (rows.length === 0) throw new CliInputError(`${input} has a header but no windows`);
  const specs = rows.map((row) => ({ row, ...windowFromRow(row) }));
  const weather = weatherRequest(flags);
  const table = weather ? readWeatherTable(weather.file, weather.columns) : undefined;
  // One check per year and site (the checks look at the sun there); each report printed once.
  const weatherBySite = new Map<string, Weather>();
  const reported = new Set<string>();
  for (const s of specs) {
    if (weather && table) {
      validateWindowSpec({ ...s.spec, weather: STAND_IN_WEATHER });
      const key = siteKey(s.spec);
      let w = weatherBySite.get(key);
      if (!w) {
        const checked = checkWeatherTable(table, weather.file, s.spec.year, s.spec.site, weather.reading);
        for (const line of checked.report) {
          if (!reported.has(line)) io.err(line);
          reported.add(line);
        }
        w = checked.check.weather!;
        weatherBySite.set(key, w);
      }
      s.spec.weather = w;
    } else if (!s.hasWeather) {
      throw new CliInputError(`${s.row.where} ("${s.spec.name}"): no weather: fill linkeTurbidity (or tauB and tauD), use an example site, or give --weather FILE.csv`);
    }
    validateWindowSpec(s.spec);
  }
  // Each window worked out with its site's sun and weather shared (src/core/gain/sharedYear.ts).
  // CSV, and a workbook of more than STREAM_WORKBOOK_ABOVE windows, are written row by row as the
  // windows are done (./scheduleOutput.ts: memory stays that of one window); a smaller workbook is
  // built whole, with its table object and its chart.
  const years = new SharedYears();
  const bar = new ProgressBar('windows', specs.length);
  const stream = kind === 'csv' || specs.length > STREAM_WORKBOOK_ABOVE;
  const extras = summaryExtrasOf(specs.map((s) => s.spec));
  const writer = !stream ? undefined : kind === 'csv' ? csvSummaryWriter(out, force, extras) : xlsxSummaryWriter(out, force, `Window schedule: each window's year (${path.basename(input)})`, path.basename(input), extras, dateSystem);
  const kept: WindowResult[] = [];
  let total = 0;
  try {
    for (const s of specs) {
      // A window with a U-value or a room needs its whole hourly year; the others the shared summary-only one.
      const r: WindowResult = needsWholeYear(s.spec) ? windowResult(s.spec) : { spec: s.spec, ...summarizeWindowYear(s.spec, years) };
      total += r.summary.annualKWh;
      if (writer) await writer.add(r);
      else kept.push(r);
      bar.tick();
    }
    bar.finish();
    if (writer) await writer.finish();
  } catch (err) {
    bar.finish();
    await writer?.abort();
    throw err;
  }
  if (!writer) {
    const results = kept;
    const wb = newWorkbook('Sunpane window schedule', dateSystem);
    const charts: SheetChart[] = [];
    const contents = wb.addWorksheet('Contents');
    const ws = wb.addWorksheet('Summary');
    const top = addSheetHeading(ws, `Window schedule: each window's year (${path.basename(input)})`);
    addSummaryTable(ws, 'Summary', top, results);
    charts.push(summaryChart('Summary', top, results));
    freezeAt(ws, top + 1, 2);
    fillContentsSheet(contents, 'Sunpane window schedule', [`From ${path.basename(input)}.`], [
      { sheet: 'Contents', holds: 'This list.' },
      { sheet: 'Summary', holds: "One row per window: its year's solar gain, peak hour, hours with beam on the glass, mean sunlit fraction, missing weather hours and gain by month; totals of all windows as formulas; a chart of annual gain by window." },
    ]);
    await saveWorkbook(wb, out, force, charts);
  }
  io.out(`${specs.length} window${specs.length === 1 ? '' : 's'}: ${total.toFixed(1)} kWh of solar gain a year in all`);
  io.out(`wrote ${path.normalize(out)}`);
  io.out(CAUTION);
  return 0;
}
