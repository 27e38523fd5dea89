/**
 * One window's year as output: the hourly columns (for CSV and for a workbook sheet, the same
 * header words, order and units as the pane: src/outputs/hourlyColumns.ts), the monthly summary
 * sheet whose months are formulas over the hourly table (the pane's formulas), with the month ×
 * hour block of mean gain, and the day × hour heat map of the gain. Every sheet starts with its
 * title and the caution.
 */
import type { AnnualSeries, AnnualSummary } from '../core/gain';
import { formatSerialIso } from '../core/time';
import { type HourlyData, type HourlyKey, extrasOf, hourlyColumn, hourlyColumnsFor, hourlyData } from '../outputs/hourlyColumns';
import { monthHourMeanFormula, monthlyGainFormula, monthlyPeakFormula, monthlyPeakStampFormula, monthlySumFormula, tableColumnRef } from '../outputs/hourlyFormulas';
import { LOAD_WORDS } from '../registry/glossary';
import { PALETTE } from '../outputs/palette';
import { csvLine, formatFixed } from './csv';
import { type SheetChart, cellRef, columnRef } from './xlsxCharts';
import { type ExcelJS, NUMBER_FORMATS, type TableCell, type TablePlacement, addColourScale, addDataTable, addSheetHeading, address, freezeAt, serialToCellDate, setFormula, setLabel, sheetSerial, styleHeader } from './workbook';

/** Header of the stamp column (the hour's END, local standard time). */
export const STAMP_HEADER = hourlyColumn('stampSerial').header;
/** Header of the stamp column of a year read with the time convention `instant`. */
export const INSTANT_HEADER = hourlyColumn('stampSerial', 'instant').header;

/** The stamp column's header for a series: how its rows are stamped. */
export function stampHeader(series: AnnualSeries): string {
  return hourlyColumn('stampSerial', series.timeConvention).header;
}

/** How the rows of a series are stamped, in words (a sheet's note under its title). */
export function rowsNote(series: AnnualSeries): string {
  const rows =
    series.timeConvention === 'instant'
      ? 'Rows are instants at the top of each hour, local standard time; the sun is taken at the instant (time convention instant).'
      : 'Rows are hour-ending, local standard time; the sun is taken at the middle of the hour (time convention hourEnding).';
  const clock = standardTimeNote(series);
  return clock === undefined ? rows : `${rows} ${clock}`;
}

/**
 * For a window with a daylight-saving rule: that the command line's stamps stay in local standard
 * time all year and how to read them on the clock (the worksheet functions and the pane give clock
 * stamps; docs/conventions.md). Undefined without a rule.
 */
export function standardTimeNote(series: AnnualSeries): string | undefined {
  if (series.clockStamp === series.stampSerial) return undefined;
  return `Stamps stay in local standard time all year: the window's rule (${series.clockRule}) is not applied to them; while it is in force, clock time is standard time plus its shift.`;
}

/** The gain column's header (used by formulas that refer to it). */
export const GAIN_HEADER = hourlyColumn('gain').header;

/** Month names for summaries. */
export const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

const valueOf = (d: HourlyData, key: HourlyKey, i: number): number => (d[key] as ArrayLike<number>)[i];

/**
 * The hourly year as CSV text: the header line and one line per hour (stamp as ISO 8601 local);
 * the conduction gain with a U-value, the cooling load when given.
 */
export function hourlyCsv(series: AnnualSeries, onRow?: () => void, load?: ArrayLike<number>): string {
  const data = hourlyData(series, load);
  const columns = hourlyColumnsFor(series.timeConvention, extrasOf(data));
  const lines = [csvLine(columns.map((c) => c.header))];
  const rest = columns.slice(1);
  for (let i = 0; i < series.hours; i++) {
    lines.push(csvLine([formatSerialIso(series.stampSerial[i]), ...rest.map((c) => formatFixed(valueOf(data, c.key, i), c.csvDecimals))]));
    onRow?.();
  }
  return `${lines.join('\n')}\n`;
}

/**
 * Adds the hourly year as an Excel table on its own sheet, under the title and the caution; header
 * row and stamp column frozen.
 * @returns the table's placement (for formulas on other sheets)
 */
export function addHourlySheet(
  wb: ExcelJS.Workbook,
  sheet: string,
  tableName: string,
  series: AnnualSeries,
  onRow?: () => void,
  title = `${series.name}: hourly solar gain, ${series.year}`,
  load?: ArrayLike<number>,
): TablePlacement {
  const ws = wb.addWorksheet(sheet);
  const top = addSheetHeading(ws, title, [rowsNote(series)]);
  const data = hourlyData(series, load);
  const columns = hourlyColumnsFor(series.timeConvention, extrasOf(data));
  const rows: TableCell[][] = new Array(series.hours);
  const rest = columns.slice(1);
  for (let i = 0; i < series.hours; i++) {
    rows[i] = [serialToCellDate(series.stampSerial[i]), ...rest.map((c) => valueOf(data, c.key, i))];
    onRow?.();
  }
  const placement = addDataTable(ws, tableName, { row: top, column: 1 }, columns.map((c, k) => ({ header: c.header, numFmt: c.numFmt, width: k === 0 ? 18 : 13 })), rows);
  ws.getRow(top).height = 45;
  freezeAt(ws, top + 1, 2);
  return placement;
}

/** Where the monthly summary's formula cells are, with the values they must show. */
export interface MonthlyCells {
  /** `Sheet!A1` address of the annual total (SUM of the months) and the core's value. */
  annualKWh: { cell: string; expected: number };
  /** Address of the largest month (MAX) and its value. */
  maxMonthKWh: { cell: string; expected: number };
  /** Address of the peak hour (MAX over the hourly gain column), when the hourly sheet exists. */
  peakW?: { cell: string; expected: number };
  /** Each month's gain, a SUMIFS over the hourly table (when the hourly sheet exists). */
  months: { cell: string; expected: number }[];
  /** The month × hour block of mean gain [W], each a SUMPRODUCT over the hourly table. */
  monthHour: { cell: string; expected: number }[];
  /**
   * With a room: each month's peak cooling load [W] and its stamp (formulas over the hourly table),
   * and the year's (MAX of the months, and the stamp of that month's peak).
   */
  load?: { months: { cell: string; expected: number; stampCell: string; expectedStamp: number | undefined }[]; year: { cell: string; expected: number; stampCell: string } };
  /** The annual profile: a column chart of the months' gain, under the summary. */
  chart: SheetChart;
}

/** Quotes a sheet name for a formula reference. */
export function sheetRef(sheet: string): string {
  return `'${sheet.replace(/'/g, "''")}'`;
}

/**
 * Mean gain [W] for each month and hour of the day (hour ending 1…24, or instants 0…23), as the
 * month × hour formulas work it out: the rows with weather whose hour falls in the month and hour
 * of day, summed, over their count (0 when none has weather).
 */
export function monthHourMeans(series: AnnualSeries): number[][] {
  const sums = Array.from({ length: 12 }, () => new Array<number>(24).fill(0));
  const counts = Array.from({ length: 12 }, () => new Array<number>(24).fill(0));
  for (let i = 0; i < series.hours; i++) {
    if (series.missing[i] === 1) continue;
    const inside = series.timeConvention === 'instant' ? 1 / 48 : -1 / 48; // a point inside the row's hour
    const mid = new Date(Math.round((series.stampSerial[i] + inside - 25_569) * 86_400_000));
    sums[mid.getUTCMonth()][mid.getUTCHours()] += series.gain[i];
    counts[mid.getUTCMonth()][mid.getUTCHours()]++;
  }
  return sums.map((row, m) => row.map((x, h) => x / Math.max(1, counts[m][h])));
}

/**
 * Each month's largest hourly cooling load [W] and the stamp of its first hour, over the hours with
 * weather, months as the monthly formulas count them; 0 and no stamp for a month without load above 0.
 */
export function monthlyLoadPeaks(series: AnnualSeries, load: ArrayLike<number>): { peakW: number; stamp: number | undefined }[] {
  const out = Array.from({ length: 12 }, () => ({ peakW: 0, stamp: undefined as number | undefined }));
  const inside = series.timeConvention === 'instant' ? 1 / 48 : -1 / 48; // a point inside the row's hour
  for (let i = 0; i < series.hours; i++) {
    if (series.missing[i] === 1) continue;
    const m = new Date(Math.round((series.stampSerial[i] + inside - 25_569) * 86_400_000)).getUTCMonth();
    if (load[i] > out[m].peakW) out[m] = { peakW: load[i], stamp: series.stampSerial[i] };
  }
  return out;
}

/**
 * Fills a sheet with the monthly summary of one window: under the title and the caution, a table
 * of month, gain and missing hours — with the hourly sheet given, each a SUMIFS formula over the
 * hourly table (the pane's formulas, src/outputs/hourlyFormulas.ts) — then the annual total (SUM),
 * the largest month (MAX), the peak hour (MAX over the hourly gain column) and, beside them, the
 * month × hour block of mean gain with our colour scale. With the hourly cooling load (a window
 * with a room), the table also has each month's peak cooling load and its hour, and the year row
 * the year's. Every formula carries its cached result.
 *
 * Why the peak and not the month's load energy: by the radiant time series the load of a repeating
 * year sums to its gain (every series sums to 1), so a month's load energy differs from its gain only
 * by the few hours of radiant tail carried across the month's ends; the peak is the figure that
 * sizes plant, and it differs from the peak gain in size and hour.
 */
export function addMonthlySheet(
  ws: ExcelJS.Worksheet,
  tableName: string,
  summary: AnnualSummary,
  hourly?: { sheet: string; placement: TablePlacement; series: AnnualSeries; load?: ArrayLike<number> },
  title = 'Solar gain by month',
): MonthlyCells {
  const sheet = ws.name;
  const clock = hourly ? standardTimeNote(hourly.series) : undefined;
  const top = addSheetHeading(ws, title, clock === undefined ? [] : [clock]);
  const loadPeaks = hourly?.load ? monthlyLoadPeaks(hourly.series, hourly.load) : undefined;
  const instant = hourly?.series.timeConvention === 'instant';
  const loadHeader = LOAD_WORDS.peakLoad;
  const loadAtHeader = instant ? LOAD_WORDS.peakLoadAtInstant : LOAD_WORDS.peakLoadAtHourEnding;
  const rows = MONTHS.map((m, k) => [m, summary.monthlyKWh[k], summary.monthlyMissingHours[k], ...(loadPeaks ? [loadPeaks[k].peakW, loadPeaks[k].stamp === undefined ? null : serialToCellDate(loadPeaks[k].stamp!)] : [])]);
  const gainHeader = 'Solar gain (kWh)';
  const missingHeader = 'Weather missing (h)';
  const t = addDataTable(
    ws,
    tableName,
    { row: top, column: 1 },
    [
      { header: 'Month', width: 14 },
      { header: gainHeader, numFmt: NUMBER_FORMATS.kwh, width: 16 },
      { header: missingHeader, numFmt: NUMBER_FORMATS.integer, width: 16 },
      ...(loadPeaks ? [{ header: loadHeader, numFmt: NUMBER_FORMATS.watts, width: 16 }, { header: loadAtHeader, numFmt: NUMBER_FORMATS.dateTime, width: 18 }] : []),
    ],
    rows,
  );
  const chartTop = t.lastRow + 6;
  const chart: SheetChart = {
    sheet,
    kind: 'column',
    title: 'Annual profile: solar gain by month (kWh)',
    valueAxisTitle: 'Solar gain (kWh)',
    valueFormat: '#,##0',
    series: [
      {
        name: gainHeader,
        nameRef: cellRef(sheet, 'B', top),
        categories: [...MONTHS],
        categoriesRef: columnRef(sheet, 'A', top + 1, top + 12),
        values: summary.monthlyKWh,
        valuesRef: columnRef(sheet, 'B', top + 1, top + 12),
        colour: PALETTE.series[0],
      },
    ],
    from: { col: 0, row: chartTop },
    to: { col: 9, row: chartTop + 18 },
  };
  const cells: MonthlyCells = { annualKWh: { cell: '', expected: 0 }, maxMonthKWh: { cell: '', expected: 0 }, months: [], monthHour: [], chart };
  const ref = hourly ? tableColumnRef(hourly.placement.name, hourly.series.timeConvention) : undefined;
  if (hourly && ref) {
    const load: NonNullable<MonthlyCells['load']>['months'] = [];
    MONTHS.forEach((_, k) => {
      const row = top + 1 + k;
      setFormula(ws, address(row, 2), monthlyGainFormula(ref, hourly.series.year, k + 1), summary.monthlyKWh[k], NUMBER_FORMATS.kwh);
      setFormula(ws, address(row, 3), monthlySumFormula(ref, 'missing', hourly.series.year, k + 1), summary.monthlyMissingHours[k], NUMBER_FORMATS.integer);
      cells.months.push({ cell: `${sheet}!${address(row, 2)}`, expected: summary.monthlyKWh[k] });
      if (loadPeaks) {
        const p = loadPeaks[k];
        setFormula(ws, address(row, 4), monthlyPeakFormula(ref, 'load', hourly.series.year, k + 1), p.peakW, NUMBER_FORMATS.watts);
        setFormula(ws, address(row, 5), monthlyPeakStampFormula(ref, 'load', hourly.series.year, k + 1, address(row, 4)), p.stamp === undefined ? '' : sheetSerial(ws, p.stamp), NUMBER_FORMATS.dateTime);
        load.push({ cell: `${sheet}!${address(row, 4)}`, expected: p.peakW, stampCell: `${sheet}!${address(row, 5)}`, expectedStamp: p.stamp });
      }
    });
    if (loadPeaks) cells.load = { months: load, year: { cell: '', expected: 0, stampCell: '' } };
  }
  freezeAt(ws, top + 1);
  const labelRow = t.lastRow + 2;
  const gainRange = t.bodyRange(gainHeader);
  const maxMonth = Math.max(...summary.monthlyKWh);
  setLabel(ws, address(labelRow, 1), 'Year');
  setFormula(ws, address(labelRow, 2), `SUM(${gainRange})`, summary.annualKWh, NUMBER_FORMATS.kwh);
  setFormula(ws, address(labelRow, 3), `SUM(${t.bodyRange(missingHeader)})`, summary.missingHours, NUMBER_FORMATS.integer);
  if (loadPeaks && cells.load) {
    // The year's peak: the largest month's (the first such month on ties, as the core's year peak).
    const top1 = loadPeaks.reduce((best, p, k) => (p.peakW > loadPeaks[best].peakW ? k : best), 0);
    const peaks = t.bodyRange(loadHeader);
    setFormula(ws, address(labelRow, 4), `MAX(${peaks})`, loadPeaks[top1].peakW, NUMBER_FORMATS.watts);
    const yearStamp = loadPeaks[top1].stamp;
    setFormula(ws, address(labelRow, 5), `INDEX(${t.bodyRange(loadAtHeader)},MATCH(${address(labelRow, 4)},${peaks},0))`, yearStamp === undefined ? '' : sheetSerial(ws, yearStamp), NUMBER_FORMATS.dateTime);
    cells.load.year = { cell: `${sheet}!${address(labelRow, 4)}`, expected: loadPeaks[top1].peakW, stampCell: `${sheet}!${address(labelRow, 5)}` };
  }
  setLabel(ws, address(labelRow + 1, 1), 'Largest month');
  setFormula(ws, address(labelRow + 1, 2), `MAX(${gainRange})`, maxMonth, NUMBER_FORMATS.kwh);
  cells.annualKWh = { cell: `${sheet}!${address(labelRow, 2)}`, expected: summary.annualKWh };
  cells.maxMonthKWh = { cell: `${sheet}!${address(labelRow + 1, 2)}`, expected: maxMonth };
  if (hourly && ref) {
    setLabel(ws, address(labelRow + 2, 1), 'Peak hour (W)');
    setFormula(ws, address(labelRow + 2, 2), `MAX(${sheetRef(hourly.sheet)}!${hourly.placement.bodyRange(GAIN_HEADER)})`, summary.peakW, NUMBER_FORMATS.watts);
    cells.peakW = { cell: `${sheet}!${address(labelRow + 2, 2)}`, expected: summary.peakW };

    // The month × hour block, as in the pane (right of the table, past the load columns when there are any).
    const left = loadPeaks ? 7 : 5;
    ws.getCell(top - 1, left).value = instant ? 'Mean solar gain (W) by month and hour (instant)' : 'Mean solar gain (W) by month and hour ending';
    ws.getCell(top - 1, left).font = { bold: true };
    ws.getCell(top, left).value = 'Month';
    for (let h = 1; h <= 24; h++) ws.getCell(top, left + h).value = instant ? h - 1 : h;
    styleHeader(ws, top, left, left + 24);
    const means = monthHourMeans(hourly.series);
    MONTHS.forEach((m, k) => {
      ws.getCell(top + 1 + k, left).value = m;
      for (let h = 1; h <= 24; h++) {
        const cell = address(top + 1 + k, left + h);
        setFormula(ws, cell, monthHourMeanFormula(ref, hourly.series.year, k + 1, h), means[k][h - 1], NUMBER_FORMATS.watts);
        cells.monthHour.push({ cell: `${sheet}!${cell}`, expected: means[k][h - 1] });
      }
    });
    ws.getColumn(left).width = 8;
    for (let h = 1; h <= 24; h++) ws.getColumn(left + h).width = 6;
    addColourScale(ws, `${address(top + 1, left + 1)}:${address(top + 12, left + 24)}`);
  }
  return cells;
}

/**
 * Adds the day × hour heat map of the gain [W]: one row per day, one column per hour (the hour
 * ending at 1:00 … 24:00, or for instant rows the instants 0:00 … 23:00), coloured by a three-stop colour scale; header row and date column frozen.
 */
export function addHeatMapSheet(wb: ExcelJS.Workbook, sheet: string, series: AnnualSeries, title: string): void {
  const ws = wb.addWorksheet(sheet);
  const clock = standardTimeNote(series);
  const headerRow = addSheetHeading(ws, title, clock === undefined ? [] : [clock]);
  ws.getCell(headerRow, 1).value = 'Day';
  const first = series.timeConvention === 'instant' ? 0 : 1;
  for (let h = 0; h < 24; h++) ws.getCell(headerRow, h + 2).value = h + first;
  styleHeader(ws, headerRow, 1, 25);
  const days = Math.floor(series.hours / 24);
  for (let d = 0; d < days; d++) {
    const row = ws.getRow(headerRow + 1 + d);
    const date = row.getCell(1);
    date.value = serialToCellDate(Math.floor(series.stampSerial[d * 24]));
    date.numFmt = 'dd mmm';
    for (let h = 0; h < 24; h++) {
      const c = row.getCell(h + 2);
      c.value = Math.round(series.gain[d * 24 + h]);
      c.numFmt = NUMBER_FORMATS.watts;
    }
  }
  ws.getColumn(1).width = 9;
  for (let h = 2; h <= 25; h++) ws.getColumn(h).width = 6;
  addColourScale(ws, `${address(headerRow + 1, 2)}:${address(headerRow + days, 25)}`);
  freezeAt(ws, headerRow + 1, 2);
}
