/**
 * Writes one window's hourly year to a new sheet: a heading, the hourly rows as an Excel table
 * (written in blocks of rows with a sync after each, so that no request nears Excel on the web's
 * 5 MB limit), a monthly summary with a column chart, and a day × hour heat map of the gain with a
 * colour scale.
 *
 * Cancel: the run stops after the block being written and deletes the half-written sheet, so the
 * workbook is left as it was before the run (apart from an earlier result sheet the user had
 * already agreed to replace).
 */
import { escapeFormulaText } from '../io/textCells';
import { DEFAULT_BLOCK_ROWS, cellAddress, rangeAddress, roundForSheet, rowBlocks } from './blocks';
import { type RunBatch, RunCancelled } from './resultSheets';

/** The hourly columns the sheet shows (one value per hour of the year). */
export interface HourColumns {
  stampSerial: ArrayLike<number>;
  sunAltitude: ArrayLike<number>;
  sunAzimuth: ArrayLike<number>;
  incidence: ArrayLike<number>;
  profileAngle: ArrayLike<number>;
  sunlitFraction: ArrayLike<number>;
  dni: ArrayLike<number>;
  dhi: ArrayLike<number>;
  beam: ArrayLike<number>;
  sky: ArrayLike<number>;
  ground: ArrayLike<number>;
  shgc: ArrayLike<number>;
  gain: ArrayLike<number>;
  missing: ArrayLike<number>;
}

/** The yearly figures the sheet's summary shows. */
export interface YearFigures {
  monthlyKWh: readonly number[];
  annualKWh: number;
  peakW: number;
  /** Hour-ending stamp of the peak (local serial); undefined when there is no gain at all. */
  peakStamp?: number;
  sunlitHours: number;
  meanSunlitFraction: number;
  missingHours: number;
  glassArea: number;
}

/** One column of the hourly table: our header, where its values come from, how they are shown. */
interface ColumnDef {
  header: string;
  key: keyof HourColumns;
  decimals: number;
  format: string;
}

/** The hourly table's columns, in order (header names of our own). */
export const HOUR_TABLE_COLUMNS: readonly ColumnDef[] = [
  { header: 'Hour ending (local standard time)', key: 'stampSerial', decimals: 6, format: 'yyyy-mm-dd hh:mm' },
  { header: 'Sun altitude °', key: 'sunAltitude', decimals: 2, format: '0.00' },
  { header: 'Sun azimuth °', key: 'sunAzimuth', decimals: 2, format: '0.00' },
  { header: 'Incidence on glass °', key: 'incidence', decimals: 2, format: '0.00' },
  { header: 'Profile angle °', key: 'profileAngle', decimals: 2, format: '0.00' },
  { header: 'Glass in sun (share)', key: 'sunlitFraction', decimals: 3, format: '0.000' },
  { header: 'Direct normal W/m²', key: 'dni', decimals: 1, format: '0.0' },
  { header: 'Diffuse horizontal W/m²', key: 'dhi', decimals: 1, format: '0.0' },
  { header: 'Beam on glass W/m²', key: 'beam', decimals: 1, format: '0.0' },
  { header: 'Sky diffuse on glass W/m²', key: 'sky', decimals: 1, format: '0.0' },
  { header: 'Ground light on glass W/m²', key: 'ground', decimals: 1, format: '0.0' },
  { header: 'SHGC at this angle', key: 'shgc', decimals: 3, format: '0.000' },
  { header: 'Solar gain W', key: 'gain', decimals: 1, format: '0.0' },
  { header: 'Weather missing (1 = yes)', key: 'missing', decimals: 0, format: '0' },
];

/** Row (0-based) of the hourly table's header. */
export const TABLE_HEADER_ROW = 4;
/** First column (0-based) of the monthly summary. */
export const SUMMARY_COLUMN = HOUR_TABLE_COLUMNS.length + 1;
/** First column (0-based) of the heat map. */
export const HEAT_COLUMN = SUMMARY_COLUMN + 6;

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** Our heat-map colours: low = pale sand, middle = amber, high = brick. */
export const HEAT_COLOURS = { low: '#F7F3E8', middle: '#F2B441', high: '#A63A1E' };
/** Heading colour of our sheets. */
export const HEAD_FILL = '#1F5C66';

/** What the caller wants done while writing. */
export interface WriteControl {
  blockRows?: number;
  /** Called after each block: rows written so far and in all. */
  onProgress?(done: number, total: number): void;
  /** Polled after each block; true stops the run. */
  cancelled?(): boolean;
}

/** Text lines above the table: a title and a description of the run. */
export interface YearHeading {
  title: string;
  lines: readonly string[];
}

/** The hourly rows from `start` to `end` (exclusive), rounded for the sheet. */
export function hourRows(cols: HourColumns, start: number, end: number): (number | string)[][] {
  const rows: (number | string)[][] = [];
  for (let i = start; i < end; i++) {
    rows.push(HOUR_TABLE_COLUMNS.map((c) => roundForSheet(cols[c.key][i], c.decimals)));
  }
  return rows;
}

/**
 * The day × hour grid of the gain [W]: one row per day, 24 hour-ending columns, read straight from
 * the hourly series (row i of the series is day ⌊i / 24⌋, hour i mod 24).
 */
export function dayHourGrid(cols: HourColumns): (number | string)[][] {
  const hours = cols.gain.length;
  const rows: (number | string)[][] = [];
  for (let d = 0; d * 24 < hours; d++) {
    const row: (number | string)[] = [roundForSheet(Math.floor(cols.stampSerial[d * 24]), 0)];
    for (let h = 0; h < 24; h++) row.push(d * 24 + h < hours ? roundForSheet(cols.gain[d * 24 + h], 0) : '');
    rows.push(row);
  }
  return rows;
}

/** The monthly summary block (header row + 12 months + year). */
export function monthlyRows(fig: YearFigures): (number | string)[][] {
  const rows: (number | string)[][] = [['Month', 'Solar gain kWh', 'kWh per m² of glass']];
  fig.monthlyKWh.forEach((kwh, m) => rows.push([MONTHS[m], roundForSheet(kwh, 2), roundForSheet(fig.glassArea > 0 ? kwh / fig.glassArea : 0, 2)]));
  rows.push(['Year', roundForSheet(fig.annualKWh, 2), roundForSheet(fig.glassArea > 0 ? fig.annualKWh / fig.glassArea : 0, 2)]);
  return rows;
}

/** Key figures under the monthly summary. */
export function keyFigureRows(fig: YearFigures): (number | string)[][] {
  return [
    ['Peak gain W', roundForSheet(fig.peakW, 1), ''],
    ['Peak at (hour ending)', fig.peakStamp === undefined ? '' : roundForSheet(fig.peakStamp, 6), ''],
    ['Hours with sun on the glass', fig.sunlitHours, ''],
    ['Mean glass-in-sun share', roundForSheet(fig.meanSunlitFraction, 3), ''],
    ['Hours with missing weather', fig.missingHours, ''],
    ['Glass area m²', roundForSheet(fig.glassArea, 3), ''],
  ];
}

/** True when the host declares the ExcelApi requirement set `version` (false outside Office). */
export function excelApiSupports(version: string): boolean {
  return typeof Office !== 'undefined' && Office.context?.requirements?.isSetSupported?.('ExcelApi', version) === true;
}

function checkCancel(control: WriteControl): boolean {
  return control.cancelled?.() === true;
}

/**
 * Writes the year to a new sheet named `sheetName` (already chosen free by the caller; `replaces`
 * is deleted first). Returns the sheet's name. Throws {@link RunCancelled} after removing the
 * partial sheet when the user cancels.
 */
export async function writeYearSheet(
  run: RunBatch,
  target: { name: string; replaces?: string },
  heading: YearHeading,
  cols: HourColumns,
  fig: YearFigures,
  control: WriteControl = {},
): Promise<string> {
  const total = cols.gain.length;
  const width = HOUR_TABLE_COLUMNS.length;
  const firstDataRow = TABLE_HEADER_ROW + 1;
  const blocks = rowBlocks(total, control.blockRows ?? DEFAULT_BLOCK_ROWS);

  // 1. The sheet, its heading and the table header.
  await run(async (ctx) => {
    if (target.replaces) ctx.workbook.worksheets.getItem(target.replaces).delete();
    const sheet = ctx.workbook.worksheets.add(target.name);
    const head = sheet.getRange(rangeAddress(0, 0, 1 + heading.lines.length, 1));
    // The heading names the window: the user's text, never read as a formula.
    head.values = [[escapeFormulaText(heading.title)], ...heading.lines.map((l) => [escapeFormulaText(l)])];
    sheet.getRange(cellAddress(0, 0)).format.font.bold = true;
    const header = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, 0, 1, width));
    header.values = [HOUR_TABLE_COLUMNS.map((c) => c.header)];
    await ctx.sync();
  });

  const removePartial = async (): Promise<never> => {
    await run(async (ctx) => {
      ctx.workbook.worksheets.getItem(target.name).delete();
      await ctx.sync();
    });
    throw new RunCancelled('Stopped: the half-written sheet was removed.');
  };

  // 2. The hourly rows, block by block: values first, then their number formats, one sync each.
  let suspended = false;
  for (const block of blocks) {
    if (checkCancel(control)) return removePartial();
    await run(async (ctx) => {
      if (!suspended) {
        ctx.application.suspendApiCalculationUntilNextSync?.();
        if (excelApiSupports('1.9')) ctx.application.suspendScreenUpdatingUntilNextSync();
        suspended = true;
      }
      const rows = block.end - block.start;
      const range = ctx.workbook.worksheets.getItem(target.name).getRange(rangeAddress(firstDataRow + block.start, 0, rows, width));
      range.values = hourRows(cols, block.start, block.end);
      range.numberFormat = Array.from({ length: rows }, () => HOUR_TABLE_COLUMNS.map((c) => c.format));
      await ctx.sync();
    });
    control.onProgress?.(block.end, total);
  }
  if (checkCancel(control)) return removePartial();

  // 3. Table, summary, chart, heat map, panes.
  await run(async (ctx) => {
    const sheet = ctx.workbook.worksheets.getItem(target.name);
    const table = sheet.tables.add(rangeAddress(TABLE_HEADER_ROW, 0, total + 1, width), true);
    table.style = 'TableStyleLight9';

    const monthly = monthlyRows(fig);
    const monthRange = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, SUMMARY_COLUMN, monthly.length, 3));
    monthRange.values = monthly;
    monthRange.numberFormat = monthly.map((_, i) => (i === 0 ? ['@', '@', '@'] : ['@', '0.00', '0.00']));
    const monthHead = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, SUMMARY_COLUMN, 1, 3));
    monthHead.format.font.bold = true;
    monthHead.format.fill.color = HEAD_FILL;
    monthHead.format.font.color = '#FFFFFF';
    const keys = keyFigureRows(fig);
    const keyRow = TABLE_HEADER_ROW + monthly.length + 1;
    const keyRange = sheet.getRange(rangeAddress(keyRow, SUMMARY_COLUMN, keys.length, 3));
    keyRange.values = keys;
    keyRange.numberFormat = keys.map((_, i) => ['@', i === 1 ? 'yyyy-mm-dd hh:mm' : i === 3 ? '0.000' : '0.0', '@']);

    const chartData = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, SUMMARY_COLUMN, 13, 2));
    const chart = sheet.charts.add('ColumnClustered', chartData, 'Columns');
    chart.title.text = 'Solar gain by month (kWh)';
    chart.legend.position = 'Bottom';
    const chartTop = keyRow + keys.length + 1;
    chart.setPosition(cellAddress(chartTop, SUMMARY_COLUMN), cellAddress(chartTop + 15, SUMMARY_COLUMN + 4));

    const grid = dayHourGrid(cols);
    const heatHead = ['Day', ...Array.from({ length: 24 }, (_, h) => `${String(h + 1).padStart(2, '0')}h`)];
    sheet.getRange(cellAddress(TABLE_HEADER_ROW - 1, HEAT_COLUMN)).values = [['Solar gain W, day × hour ending']];
    const heatHeader = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, HEAT_COLUMN, 1, 25));
    heatHeader.values = [heatHead];
    heatHeader.format.font.bold = true;
    const heat = sheet.getRange(rangeAddress(TABLE_HEADER_ROW + 1, HEAT_COLUMN, grid.length, 25));
    heat.values = grid;
    heat.numberFormat = grid.map(() => ['yyyy-mm-dd', ...new Array<string>(24).fill('0')]);
    const cells = sheet.getRange(rangeAddress(TABLE_HEADER_ROW + 1, HEAT_COLUMN + 1, grid.length, 24));
    const scale = cells.conditionalFormats.add('ColorScale');
    scale.colorScale.criteria = {
      minimum: { formula: null as unknown as string, type: 'LowestValue', color: HEAT_COLOURS.low },
      midpoint: { formula: '50', type: 'Percentile', color: HEAT_COLOURS.middle },
      maximum: { formula: null as unknown as string, type: 'HighestValue', color: HEAT_COLOURS.high },
    };

    sheet.freezePanes.freezeRows(TABLE_HEADER_ROW + 1);
    sheet.getRange(rangeAddress(TABLE_HEADER_ROW, 0, 1, width)).format.autofitColumns();
    sheet.activate();
    await ctx.sync();
  });
  control.onProgress?.(total, total);
  return target.name;
}
