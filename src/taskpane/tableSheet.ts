/**
 * Writes a small result table (a schedule summary, an options comparison) to a new sheet: a title,
 * a few lines of description, the table as an Excel table, and optionally a bar chart of one of its
 * columns.
 */
import type { DateSystem } from '../core/time';
import { escapeFormulaText } from '../io/textCells';
import { rowsInDateSystem } from './dateSystem';
import { cellAddress, rangeAddress } from './blocks';
import { PALETTE, hexColour } from '../outputs/palette';
import { type RunBatch, writingSheet } from './resultSheets';
import { tableNamesIn, uniqueTableName } from './tableNames';
import { HEAD_FILL } from './yearSheet';

export interface SmallTable {
  title: string;
  lines: readonly string[];
  header: readonly string[];
  rows: readonly (readonly (number | string)[])[];
  formats: readonly string[];
  /** A bar chart of the first column (labels) against this column index. */
  chartColumn?: number;
  chartTitle?: string;
  /** Further bar charts of the labels against other columns (e.g. the peak cooling load), each under the one before. */
  moreCharts?: readonly { column: number; title: string }[];
  /** The workbook's date system: cells whose format shows a date are written in it (default 1900). */
  dateSystem?: DateSystem;
}

/** Rows (0-based, on the sheet) a chart of the table takes: 18 rows each, under the table. */
const CHART_ROWS = 18;

/** The table's bar charts, in order: the main one, then the further ones. */
function chartsOf(t: SmallTable): { column: number; title: string }[] {
  if (t.rows.length === 0) return [];
  const main = t.chartColumn !== undefined ? [{ column: t.chartColumn, title: t.chartTitle ?? t.header[t.chartColumn] }] : [];
  return [...main, ...(t.moreCharts ?? [])];
}

/** A row's text cells as Excel should keep them: never read as a formula (labels come from the user). */
function textSafeRow(row: readonly (number | string)[]): (number | string)[] {
  return row.map((v) => (typeof v === 'string' ? escapeFormulaText(v) : v));
}

/** Row (0-based) of the table's header on the sheet. */
export function tableHeaderRow(t: SmallTable): number {
  return t.lines.length + 2;
}

/**
 * The bytes one request of rows may take: a fifth of Excel on the web's 5 MB request limit
 * (docs/platform.md), leaving room for the request's own overhead.
 */
export const BLOCK_BYTES = 1_000_000;

/** Rows per request so that a block of the widest rows (values and number formats) stays under `budget` bytes. */
export function rowsPerBlock(rows: readonly (readonly (number | string)[])[], formats: readonly string[], extra: number, budget = BLOCK_BYTES): number {
  let widest = 0;
  for (const r of rows) widest = Math.max(widest, JSON.stringify(textSafeRow(r)).length);
  const perRow = widest + JSON.stringify(formats).length + extra + 8;
  return Math.max(1, Math.floor(budget / perRow));
}

/**
 * Writes `t` to a new sheet `target.name` (deleting `target.replaces` first); returns the name. The
 * rows go in blocks of at most {@link BLOCK_BYTES} per request, a sync each; the table, its style,
 * the chart and the frozen header come last. When Excel refuses any request the half-written sheet
 * is removed ({@link writingSheet}).
 */
export async function writeSmallTableSheet(run: RunBatch, target: { name: string; replaces?: string }, t: SmallTable, budget = BLOCK_BYTES): Promise<string> {
  const top = tableHeaderRow(t);
  const width = t.header.length;
  // Each chart's source: the label column and the charted column, side by side right of the table.
  const charts = chartsOf(t).map((c, k) => ({ ...c, sourceCol: width + 1 + 2 * k }));
  await writingSheet(run, target.name, async () => {
    // 1. The sheet, its heading and the table's header row (and the chart source's).
    await run(async (ctx) => {
      if (target.replaces) ctx.workbook.worksheets.getItem(target.replaces).delete();
      const sheet = ctx.workbook.worksheets.add(target.name);
      const head = sheet.getRange(rangeAddress(0, 0, 1 + t.lines.length, 1));
      head.values = [[escapeFormulaText(t.title)], ...t.lines.map((l) => [escapeFormulaText(l)])];
      sheet.getRange(cellAddress(0, 0)).format.font.bold = true;
      const header = sheet.getRange(rangeAddress(top, 0, 1, width));
      header.values = [t.header.slice()];
      header.numberFormat = [t.header.map(() => '@')];
      for (const c of charts) sheet.getRange(rangeAddress(top, c.sourceCol, 1, 2)).values = [[t.header[0], t.header[c.column]]];
      await ctx.sync();
    });
    // 2. The rows in blocks under the budget (a bar chart's two source columns beside them).
    const per = rowsPerBlock(t.rows, t.formats, 64 * charts.length, budget);
    for (let start = 0; start < t.rows.length; start += per) {
      const end = Math.min(t.rows.length, start + per);
      await run(async (ctx) => {
        const sheet = ctx.workbook.worksheets.getItem(target.name);
        const rows = rowsInDateSystem(t.rows.slice(start, end), t.formats, t.dateSystem);
        const range = sheet.getRange(rangeAddress(top + 1 + start, 0, rows.length, width));
        range.values = rows.map(textSafeRow);
        range.numberFormat = rows.map(() => t.formats.slice());
        for (const c of charts) sheet.getRange(rangeAddress(top + 1 + start, c.sourceCol, rows.length, 2)).values = rows.map((r) => textSafeRow([r[0], r[c.column]]));
        await ctx.sync();
      });
    }
    // 3. The table over it all, its style, the chart and the frozen header.
    await run(async (ctx) => {
      const sheet = ctx.workbook.worksheets.getItem(target.name);
      const tableName = uniqueTableName(target.name, await tableNamesIn(ctx));
      const table = sheet.tables.add(rangeAddress(top, 0, t.rows.length + 1, width), true);
      table.name = tableName;
      table.style = 'TableStyleMedium16';
      const header = sheet.getRange(rangeAddress(top, 0, 1, width));
      header.format.fill.color = HEAD_FILL;
      header.format.font.color = '#FFFFFF';
      header.format.autofitColumns();
      charts.forEach((c, k) => {
        // A bar chart over the label column and the chosen column, from the two-column block beside
        // the table, so that the chart has one contiguous source range.
        const src = sheet.getRange(rangeAddress(top, c.sourceCol, t.rows.length + 1, 2));
        const chart = sheet.charts.add('BarClustered', src, 'Columns');
        chart.title.text = c.title;
        chart.legend.position = 'Bottom';
        // Bars in our palette's series colours, in order, as in the command line's workbooks.
        chart.series.getItemAt(0).format.fill.setSolidColor(hexColour(PALETTE.series[k % PALETTE.series.length]));
        const first = top + t.rows.length + 3 + k * (CHART_ROWS + 2);
        chart.setPosition(cellAddress(first, 0), cellAddress(first + CHART_ROWS - 1, 4));
      });
      sheet.freezePanes.freezeRows(top + 1);
      sheet.activate();
      await ctx.sync();
    });
  });
  return target.name;
}
