/**
 * One window's year as output: the hourly columns (for CSV and for a workbook sheet), the monthly
 * summary sheet with native SUM/MAX formulas, and the day × hour heat map of the gain.
 */
import type { AnnualSeries, AnnualSummary } from '../core/gain';
import { formatSerialIso } from '../core/time';
import { csvLine, formatFixed } from './csv';
import { type ExcelJS, NUMBER_FORMATS, type TableCell, type TableColumn, type TablePlacement, addColourScale, addDataTable, address, fitOnOnePage, freezeAt, serialToCellDate, setFormula, setLabel, styleHeader } from './workbook';

/** One hourly output column: header, number format, CSV decimals and where the value comes from. */
interface HourlyColumn extends TableColumn {
  decimals: number;
  value: (s: AnnualSeries, i: number) => number;
}

/** Header of the stamp column (the hour's END, local standard time). */
export const STAMP_HEADER = 'hour ending (local standard time)';

/** The hourly columns, in order, after the stamp column. */
export const HOURLY_COLUMNS: readonly HourlyColumn[] = [
  { header: 'sun altitude [°]', numFmt: NUMBER_FORMATS.angle, decimals: 3, value: (s, i) => s.sunAltitude[i] },
  { header: 'sun azimuth [°]', numFmt: NUMBER_FORMATS.angle, decimals: 3, value: (s, i) => s.sunAzimuth[i] },
  { header: 'incidence [°]', numFmt: NUMBER_FORMATS.angle, decimals: 3, value: (s, i) => s.incidence[i] },
  { header: 'profile angle [°]', numFmt: NUMBER_FORMATS.angle, decimals: 3, value: (s, i) => s.profileAngle[i] },
  { header: 'sunlit fraction', numFmt: NUMBER_FORMATS.fraction, decimals: 4, value: (s, i) => s.sunlitFraction[i] },
  { header: 'direct normal [W/m²]', numFmt: NUMBER_FORMATS.irradiance, decimals: 2, value: (s, i) => s.dni[i] },
  { header: 'diffuse horizontal [W/m²]', numFmt: NUMBER_FORMATS.irradiance, decimals: 2, value: (s, i) => s.dhi[i] },
  { header: 'beam on window [W/m²]', numFmt: NUMBER_FORMATS.irradiance, decimals: 2, value: (s, i) => s.beam[i] },
  { header: 'sky diffuse on window [W/m²]', numFmt: NUMBER_FORMATS.irradiance, decimals: 2, value: (s, i) => s.sky[i] },
  { header: 'ground reflected on window [W/m²]', numFmt: NUMBER_FORMATS.irradiance, decimals: 2, value: (s, i) => s.ground[i] },
  { header: 'SHGC at angle', numFmt: NUMBER_FORMATS.shgc, decimals: 4, value: (s, i) => s.shgc[i] },
  { header: 'gain [W]', numFmt: NUMBER_FORMATS.watts, decimals: 2, value: (s, i) => s.gain[i] },
  { header: 'missing weather', numFmt: NUMBER_FORMATS.integer, decimals: 0, value: (s, i) => s.missing[i] },
];

/** The gain column's header (used by formulas that refer to it). */
export const GAIN_HEADER = 'gain [W]';

/** Month names for summaries. */
export const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/** The hourly year as CSV text: a header line and one line per hour (stamp as ISO 8601 local). */
export function hourlyCsv(series: AnnualSeries, onRow?: () => void): string {
  const lines = [csvLine([STAMP_HEADER, ...HOURLY_COLUMNS.map((c) => c.header)])];
  for (let i = 0; i < series.hours; i++) {
    lines.push(csvLine([formatSerialIso(series.stampSerial[i]), ...HOURLY_COLUMNS.map((c) => formatFixed(c.value(series, i), c.decimals))]));
    onRow?.();
  }
  return `${lines.join('\n')}\n`;
}

/**
 * Adds the hourly year as an Excel table on its own sheet, header frozen.
 * @returns the table's placement (for formulas on other sheets)
 */
export function addHourlySheet(wb: ExcelJS.Workbook, sheet: string, tableName: string, series: AnnualSeries, onRow?: () => void): TablePlacement {
  const ws = wb.addWorksheet(sheet);
  const rows: TableCell[][] = new Array(series.hours);
  for (let i = 0; i < series.hours; i++) {
    rows[i] = [serialToCellDate(series.stampSerial[i]), ...HOURLY_COLUMNS.map((c) => c.value(series, i))];
    onRow?.();
  }
  const placement = addDataTable(ws, tableName, { row: 1, column: 1 }, [{ header: STAMP_HEADER, numFmt: NUMBER_FORMATS.dateTime, width: 18 }, ...HOURLY_COLUMNS], rows);
  freezeAt(ws, 2, 2);
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
}

/** Quotes a sheet name for a formula reference. */
export function sheetRef(sheet: string): string {
  return `'${sheet.replace(/'/g, "''")}'`;
}

/**
 * Fills a sheet with the monthly summary of one window: a table of month, gain and missing hours, then the
 * annual total (SUM), the largest month (MAX) and — when the hourly sheet is given — the peak hour
 * (MAX over its gain column), all native formulas with cached results.
 */
export function addMonthlySheet(
  ws: ExcelJS.Worksheet,
  tableName: string,
  summary: AnnualSummary,
  hourly?: { sheet: string; placement: TablePlacement },
): MonthlyCells {
  const sheet = ws.name;
  const rows = MONTHS.map((m, k) => [m, summary.monthlyKWh[k], summary.monthlyMissingHours[k]]);
  const t = addDataTable(
    ws,
    tableName,
    { row: 1, column: 1 },
    [{ header: 'month', width: 10 }, { header: 'gain [kWh]', numFmt: NUMBER_FORMATS.kwh, width: 14 }, { header: 'missing hours', numFmt: NUMBER_FORMATS.integer, width: 15 }],
    rows,
  );
  freezeAt(ws, 2);
  const labelRow = t.lastRow + 2;
  const gainRange = t.bodyRange('gain [kWh]');
  const maxMonth = Math.max(...summary.monthlyKWh);
  setLabel(ws, address(labelRow, 1), 'year');
  setFormula(ws, address(labelRow, 2), `SUM(${gainRange})`, summary.annualKWh, NUMBER_FORMATS.kwh);
  setFormula(ws, address(labelRow, 3), `SUM(${t.bodyRange('missing hours')})`, summary.missingHours, NUMBER_FORMATS.integer);
  setLabel(ws, address(labelRow + 1, 1), 'largest month');
  setFormula(ws, address(labelRow + 1, 2), `MAX(${gainRange})`, maxMonth, NUMBER_FORMATS.kwh);
  const cells: MonthlyCells = {
    annualKWh: { cell: `${sheet}!${address(labelRow, 2)}`, expected: summary.annualKWh },
    maxMonthKWh: { cell: `${sheet}!${address(labelRow + 1, 2)}`, expected: maxMonth },
  };
  if (hourly) {
    setLabel(ws, address(labelRow + 2, 1), 'peak hour [W]');
    setFormula(ws, address(labelRow + 2, 2), `MAX(${sheetRef(hourly.sheet)}!${hourly.placement.bodyRange(GAIN_HEADER)})`, summary.peakW, NUMBER_FORMATS.watts);
    cells.peakW = { cell: `${sheet}!${address(labelRow + 2, 2)}`, expected: summary.peakW };
  }
  ws.getColumn(1).width = 16;
  fitOnOnePage(ws, 'portrait');
  return cells;
}

/**
 * Adds the day × hour heat map of the gain [W]: one row per day, one column per hour (the hour
 * ending at 1:00 … 24:00), coloured by a three-stop colour scale; header row and date column frozen.
 */
export function addHeatMapSheet(wb: ExcelJS.Workbook, sheet: string, series: AnnualSeries, title: string): void {
  const ws = wb.addWorksheet(sheet);
  ws.getCell('A1').value = title;
  ws.getCell('A1').font = { bold: true, size: 12 };
  const headerRow = 2;
  ws.getCell(headerRow, 1).value = 'day';
  for (let h = 1; h <= 24; h++) ws.getCell(headerRow, h + 1).value = h;
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
  fitOnOnePage(ws, 'portrait');
}
