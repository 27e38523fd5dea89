/**
 * Writes one window's hourly year to a new sheet: a heading (ending with the caution), the hourly
 * rows as an Excel table named after the window (written in blocks of rows with a sync after each,
 * so that no request nears Excel on the web's 5 MB limit), and beside it, as formulas over that
 * table (src/outputs/hourlyFormulas.ts) — so that editing an hour updates them — the monthly
 * summary with a column chart of the annual profile, the year's key figures, and a month × hour
 * block of mean gain with a colour scale.
 *
 * Cancel: the run stops after the block being written and deletes the half-written sheet, so the
 * workbook is left as it was before the run (apart from an earlier result sheet the user had
 * already agreed to replace). A request Excel refuses part-way does the same (WriteFailed).
 */
import type { DateSystem, TimeConvention } from '../core/time';
import { rowsInDateSystem } from './dateSystem';
import { escapeFormulaText } from '../io/textCells';
import { HOURLY_COLUMNS, type HourlyData, type HourlyExtras, type HourlyKey, extrasOf, hourlyColumnsFor } from '../outputs/hourlyColumns';
import { type ColumnRef, monthHourMeanFormula, monthlyGainFormula, tableColumnRef, yearFigureFormulas, yearPeakFormula, yearPeakStampFormula } from '../outputs/hourlyFormulas';
import { PALETTE, hexColour } from '../outputs/palette';
import { LOAD_WORDS } from '../registry/glossary';
import { DEFAULT_BLOCK_ROWS, cellAddress, columnLetters, rangeAddress, roundForSheet, rowBlocks } from './blocks';
import { type RunBatch, RunCancelled, writingSheet } from './resultSheets';
import { tableNamesIn, uniqueTableName } from './tableNames';

/**
 * The hourly columns the sheet shows (one value per hour of the year): the base columns, and the
 * conduction gain and cooling load when the window has them (src/outputs/hourlyColumns.ts hourlyData).
 */
export type HourColumns = HourlyData;

/** The yearly figures the pane reports when done (the sheet itself holds formulas). */
export interface YearFigures {
  monthlyKWh: readonly number[];
  annualKWh: number;
  peakW: number;
  /** Hour-ending stamp of the peak (local serial); undefined when there is no gain at all. */
  peakStamp?: number;
  sunlitHours: number;
  meanSunlitFraction: number;
  /** Shares of the year's beam and of its sky and ground light the window's shading takes away, 0…1. */
  beamCut: number;
  diffuseCut: number;
  missingHours: number;
  glassArea: number;
  /** The year's largest cooling load [W] and its stamp, when the window has a room. */
  peakLoadW?: number;
  peakLoadStamp?: number;
}

/** Row (0-based) of the hourly table's header. */
export const TABLE_HEADER_ROW = 4;
/** First column (0-based) of the monthly summary. */
export const SUMMARY_COLUMN = summaryColumnFor(HOURLY_COLUMNS.length);
/** First column (0-based) of the monthly summary beside a table of `width` columns. */
export function summaryColumnFor(width: number): number {
  return width + 1;
}
/** First column (0-based) of the month × hour block beside a table of `width` columns. */
export function heatColumnFor(width: number): number {
  return summaryColumnFor(width) + 4;
}
/** First column (0-based) of the month × hour block. */
export const HEAT_COLUMN = heatColumnFor(HOURLY_COLUMNS.length);

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** Our colour-scale stops for the month × hour block (src/outputs/palette.ts). */
export const HEAT_COLOURS = { low: hexColour(PALETTE.heatLow), middle: hexColour(PALETTE.heatMid), high: hexColour(PALETTE.heatHigh) };
/** Header fill of our tables. */
export const HEAD_FILL = hexColour(PALETTE.headerFill);

/** Header of the monthly summary block (units in parentheses). */
export const MONTHLY_HEADER = ['Month', 'Solar gain (kWh)', 'Per glass area (kWh/m²)'] as const;

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
  /** How the rows are stamped (the window's time convention); default hour ending. */
  timeConvention?: TimeConvention;
  /** The workbook's date system: the stamps are written in it (default 1900). */
  dateSystem?: DateSystem;
  /** The stamps are on the local clock (the window has a daylight-saving rule): the stamp column says so. */
  clock?: boolean;
}

/** The hourly table's headers: the first column says how the rows are stamped. */
export function hourTableHeaders(convention: TimeConvention = 'hourEnding', extras: HourlyExtras = {}): string[] {
  return hourlyColumnsFor(convention, extras).map((c) => c.header);
}

/**
 * The hourly rows from `start` to `end` (exclusive), rounded for the sheet (the columns `cols` has),
 * the stamps in the workbook's date system (`dateSystem`, default 1900).
 */
export function hourRows(cols: HourColumns, start: number, end: number, dateSystem: DateSystem = 1900): (number | string)[][] {
  const columns = hourlyColumnsFor('hourEnding', extrasOf(cols));
  const rows: (number | string)[][] = [];
  for (let i = start; i < end; i++) {
    rows.push(columns.map((c) => roundForSheet((cols[c.key as HourlyKey] as ArrayLike<number>)[i], c.sheetDecimals)));
  }
  return rowsInDateSystem(rows, columns.map((c) => c.numFmt), dateSystem);
}

/** The year of an hourly table: that of its middle row (the first stamp may be the 1st at 01:00). */
function yearOf(cols: HourColumns): number {
  const serial = cols.stampSerial[Math.floor(cols.stampSerial.length / 2)];
  return new Date(Math.round((serial - 25_569) * 86_400_000)).getUTCFullYear();
}

/**
 * The monthly summary block as formulas (header row, 12 months, the year): gain by SUMIFS over the
 * table, per glass area against the glass-area cell `areaCell`.
 */
export function monthlyFormulas(ref: ColumnRef, year: number, monthRow0: number, column: number, areaCell: string): (number | string)[][] {
  const gainCell = (r: number) => cellAddress(r, column + 1);
  const rows: (number | string)[][] = [[...MONTHLY_HEADER]];
  MONTHS.forEach((m, k) => {
    const r = monthRow0 + 1 + k;
    rows.push([m, `=${monthlyGainFormula(ref, year, k + 1)}`, `=IF(${areaCell}>0,${gainCell(r)}/${areaCell},0)`]);
  });
  const first = gainCell(monthRow0 + 1);
  const last = gainCell(monthRow0 + 12);
  const yearRow = monthRow0 + 13;
  rows.push(['Year', `=SUM(${first}:${last})`, `=IF(${areaCell}>0,${gainCell(yearRow)}/${areaCell},0)`]);
  return rows;
}

/**
 * Key figures under the monthly summary: label, formula (or a value), unit. The glass area is an
 * input; the beam and diffuse cuts of the shading are the core's values (the table holds what
 * reaches the glass, not what a bare window would get).
 */
export function keyFigureRows(ref: ColumnRef, fig: Pick<YearFigures, 'glassArea' | 'beamCut' | 'diffuseCut'>, withLoad = false): (number | string)[][] {
  const f = yearFigureFormulas(ref);
  const load = withLoad
    ? [
        [LOAD_WORDS.peakLoad, `=${yearPeakFormula(ref, 'load')}`],
        [ref.convention === 'instant' ? LOAD_WORDS.peakLoadAtInstant : LOAD_WORDS.peakLoadAtHourEnding, `=${yearPeakStampFormula(ref, 'load')}`],
      ]
    : [];
  return [
    ['Peak gain (W)', `=${f.peakW}`],
    [ref.convention === 'instant' ? 'Peak at (instant)' : 'Peak at (hour ending)', `=${f.peakStamp}`],
    ['Hours with beam on the glass (h)', `=${f.sunlitHours}`],
    ['Mean sunlit fraction, sun on the wall (0-1)', `=${f.meanSunlitFraction}`],
    ['Hours with weather missing (h)', `=${f.missingHours}`],
    ['Glass area (m²)', roundForSheet(fig.glassArea, 3)],
    ['Beam cut by shading (%)', roundForSheet(fig.beamCut * 100, 1)],
    ['Diffuse cut by shading (%)', roundForSheet(fig.diffuseCut * 100, 1)],
    ...load,
  ];
}

/** The month × hour block: header (month, hours ending 1…24, or instants 0…23) and 12 rows of mean-gain formulas. */
export function monthHourFormulas(ref: ColumnRef, year: number): string[][] {
  const first = ref.convention === 'instant' ? 0 : 1;
  const rows: string[][] = [['Month', ...Array.from({ length: 24 }, (_, h) => String(h + first))]];
  MONTHS.forEach((m, k) => rows.push([m, ...Array.from({ length: 24 }, (_, h) => `=${monthHourMeanFormula(ref, year, k + 1, h + 1)}`)]));
  return rows;
}

/** True when the host declares the ExcelApi requirement set `version` (false outside Office). */
export function excelApiSupports(version: string): boolean {
  return typeof Office !== 'undefined' && Office.context?.requirements?.isSetSupported?.('ExcelApi', version) === true;
}

function checkCancel(control: WriteControl): boolean {
  return control.cancelled?.() === true;
}

/** What the run wrote. */
export interface WrittenYear {
  sheet: string;
  table: string;
}

/**
 * Writes the year to a new sheet named `target.name` (already chosen free by the caller;
 * `replaces` is deleted first), its table named from `target.tableBase` (unique in the workbook).
 * Throws {@link RunCancelled} after removing the partial sheet when the user cancels.
 */
export async function writeYearSheet(
  run: RunBatch,
  target: { name: string; replaces?: string; tableBase?: string },
  heading: YearHeading,
  cols: HourColumns,
  fig: YearFigures,
  control: WriteControl = {},
): Promise<WrittenYear> {
  return writingSheet(run, target.name, async () => {
    const total = cols.gain.length;
    const extras = { ...extrasOf(cols), clock: heading.clock === true };
    const columns = hourlyColumnsFor(heading.timeConvention, extras);
    const width = columns.length;
    const SUMMARY_COLUMN = summaryColumnFor(width);
    const HEAT_COLUMN = heatColumnFor(width);
    const firstDataRow = TABLE_HEADER_ROW + 1;
    const blocks = rowBlocks(total, control.blockRows ?? DEFAULT_BLOCK_ROWS);

    // 1. The sheet, its heading and the table header; the table's name, free in the workbook.
    const tableName = await run(async (ctx) => {
      if (target.replaces) ctx.workbook.worksheets.getItem(target.replaces).delete();
      const sheet = ctx.workbook.worksheets.add(target.name);
      const head = sheet.getRange(rangeAddress(0, 0, 1 + heading.lines.length, 1));
      // The heading names the window: the user's text, never read as a formula.
      head.values = [[escapeFormulaText(heading.title)], ...heading.lines.map((l) => [escapeFormulaText(l)])];
      sheet.getRange(cellAddress(0, 0)).format.font.bold = true;
      const header = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, 0, 1, width));
      header.values = [hourTableHeaders(heading.timeConvention, extras)];
      await ctx.sync();
      return uniqueTableName(target.tableBase ?? target.name, await tableNamesIn(ctx));
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
        range.values = hourRows(cols, block.start, block.end, heading.dateSystem);
        range.numberFormat = Array.from({ length: rows }, () => columns.map((c) => c.numFmt));
        await ctx.sync();
      });
      control.onProgress?.(block.end, total);
    }
    if (checkCancel(control)) return removePartial();

    // 3. Table, then the formulas over it: monthly summary and chart, key figures, month × hour block.
    await run(async (ctx) => {
      const sheet = ctx.workbook.worksheets.getItem(target.name);
      const table = sheet.tables.add(rangeAddress(TABLE_HEADER_ROW, 0, total + 1, width), true);
      table.name = tableName;
      table.style = 'TableStyleLight9';
      const ref = tableColumnRef(tableName, heading.timeConvention, heading.clock === true);
      const year = yearOf(cols);

      const keyRow = TABLE_HEADER_ROW + 15;
      const areaCell = `$${columnLetters(SUMMARY_COLUMN + 1)}$${keyRow + 5 + 1}`;
      const monthly = monthlyFormulas(ref, year, TABLE_HEADER_ROW, SUMMARY_COLUMN, areaCell);
      const monthRange = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, SUMMARY_COLUMN, monthly.length, 3));
      monthRange.formulas = monthly;
      monthRange.numberFormat = monthly.map((_, i) => (i === 0 ? ['@', '@', '@'] : ['@', '#,##0.0', '0.00']));
      const monthHead = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, SUMMARY_COLUMN, 1, 3));
      monthHead.format.font.bold = true;
      monthHead.format.fill.color = HEAD_FILL;
      monthHead.format.font.color = hexColour(PALETTE.headerText);
      const keys = keyFigureRows(ref, fig, extras.load);
      const keyRange = sheet.getRange(rangeAddress(keyRow, SUMMARY_COLUMN, keys.length, 2));
      keyRange.formulas = keys;
      keyRange.numberFormat = keys.map((_, i) => ['@', i === 1 || i === 9 ? 'yyyy-mm-dd hh:mm' : i === 3 ? '0.000' : i === 5 ? '0.00' : i === 6 || i === 7 ? '0.0' : '#,##0']);

      const chartData = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, SUMMARY_COLUMN, 13, 2));
      const chart = sheet.charts.add('ColumnClustered', chartData, 'Columns');
      chart.title.text = 'Annual profile: solar gain by month (kWh)';
      chart.legend.position = 'Bottom';
      // Bars in our palette's first series colour, as in the command line's workbooks.
      chart.series.getItemAt(0).format.fill.setSolidColor(hexColour(PALETTE.series[0]));
      const chartTop = keyRow + keys.length + 1;
      chart.setPosition(cellAddress(chartTop, SUMMARY_COLUMN), cellAddress(chartTop + 15, SUMMARY_COLUMN + 2));

      const block = monthHourFormulas(ref, year);
      sheet.getRange(cellAddress(TABLE_HEADER_ROW - 1, HEAT_COLUMN)).values = [[ref.convention === 'instant' ? 'Mean solar gain (W) by month and hour (instant)' : 'Mean solar gain (W) by month and hour ending']];
      const heatHeader = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, HEAT_COLUMN, 1, 25));
      heatHeader.format.font.bold = true;
      const heat = sheet.getRange(rangeAddress(TABLE_HEADER_ROW, HEAT_COLUMN, block.length, 25));
      heat.formulas = block;
      heat.numberFormat = block.map((_, i) => ['@', ...new Array<string>(24).fill(i === 0 ? '@' : '#,##0')]);
      const cells = sheet.getRange(rangeAddress(TABLE_HEADER_ROW + 1, HEAT_COLUMN + 1, 12, 24));
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
    return { sheet: target.name, table: tableName };
  });
}
