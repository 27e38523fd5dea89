/**
 * Writes a small result table (a schedule summary, an options comparison) to a new sheet: a title,
 * a few lines of description, the table as an Excel table, and optionally a bar chart of one of its
 * columns.
 */
import { escapeFormulaText } from '../io/textCells';
import { cellAddress, rangeAddress } from './blocks';
import { PALETTE, hexColour } from '../outputs/palette';
import type { RunBatch } from './resultSheets';
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
}

/** A row's text cells as Excel should keep them: never read as a formula (labels come from the user). */
function textSafeRow(row: readonly (number | string)[]): (number | string)[] {
  return row.map((v) => (typeof v === 'string' ? escapeFormulaText(v) : v));
}

/** Row (0-based) of the table's header on the sheet. */
export function tableHeaderRow(t: SmallTable): number {
  return t.lines.length + 2;
}

/** Writes `t` to a new sheet `target.name` (deleting `target.replaces` first); returns the name. */
export async function writeSmallTableSheet(run: RunBatch, target: { name: string; replaces?: string }, t: SmallTable): Promise<string> {
  await run(async (ctx) => {
    if (target.replaces) ctx.workbook.worksheets.getItem(target.replaces).delete();
    const sheet = ctx.workbook.worksheets.add(target.name);
    const head = sheet.getRange(rangeAddress(0, 0, 1 + t.lines.length, 1));
    head.values = [[escapeFormulaText(t.title)], ...t.lines.map((l) => [escapeFormulaText(l)])];
    sheet.getRange(cellAddress(0, 0)).format.font.bold = true;
    const top = tableHeaderRow(t);
    const width = t.header.length;
    const all = sheet.getRange(rangeAddress(top, 0, t.rows.length + 1, width));
    all.values = [t.header.slice(), ...t.rows.map(textSafeRow)];
    all.numberFormat = [t.header.map(() => '@'), ...t.rows.map(() => t.formats.slice())];
    const tableName = uniqueTableName(target.name, await tableNamesIn(ctx));
    const table = sheet.tables.add(rangeAddress(top, 0, t.rows.length + 1, width), true);
    table.name = tableName;
    table.style = 'TableStyleMedium16';
    const header = sheet.getRange(rangeAddress(top, 0, 1, width));
    header.format.fill.color = HEAD_FILL;
    header.format.font.color = '#FFFFFF';
    header.format.autofitColumns();
    if (t.chartColumn !== undefined && t.rows.length > 0) {
      const labels = sheet.getRange(rangeAddress(top, 0, t.rows.length + 1, 1));
      void labels;
      // A bar chart over the label column and the chosen column: written as a two-column block
      // beside the table so the chart has one contiguous source range.
      const chartCol = width + 1;
      const src = sheet.getRange(rangeAddress(top, chartCol, t.rows.length + 1, 2));
      src.values = [[t.header[0], t.header[t.chartColumn]], ...t.rows.map((r) => textSafeRow([r[0], r[t.chartColumn as number]]))];
      const chart = sheet.charts.add('BarClustered', src, 'Columns');
      chart.title.text = t.chartTitle ?? t.header[t.chartColumn];
      chart.legend.position = 'Bottom';
      // Bars in our palette's first series colour, as in the command line's workbooks.
      chart.series.getItemAt(0).format.fill.setSolidColor(hexColour(PALETTE.series[0]));
      chart.setPosition(cellAddress(top + t.rows.length + 3, 0), cellAddress(top + t.rows.length + 20, 4));
    }
    sheet.freezePanes.freezeRows(top + 1);
    sheet.activate();
    await ctx.sync();
  });
  return target.name;
}
