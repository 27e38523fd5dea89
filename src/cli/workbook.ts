/**
 * Writing real spreadsheet workbooks with ExcelJS: sheets holding Excel tables with number formats
 * and frozen header rows, summary cells as native formulas (SUM, MAX ...) carrying their cached
 * results, and a day × hour colour-scale heat map. The command line's only spreadsheet writer.
 */
import ExcelJS from 'exceljs';
import { escapeFormulaText } from '../io/textCells';
import { CAUTION } from '../outputs/caution';
import { PALETTE, argbColour } from '../outputs/palette';
import { type OutputOptions, writeFileAtomic } from './atomicWrite';

/** Number formats used across Sunpane workbooks. */
export const NUMBER_FORMATS = Object.freeze({
  dateTime: 'yyyy-mm-dd hh:mm',
  angle: '0.0',
  fraction: '0.000',
  irradiance: '0.0',
  watts: '#,##0',
  kwh: '#,##0.0',
  area: '0.00',
  length: '0.00',
  percent: '0.0%',
  shgc: '0.000',
  integer: '0',
});

/** One column of a data table. */
export interface TableColumn {
  /** Header text (units in brackets), unique within the table. */
  header: string;
  /** Excel number format for the body cells; none for text. */
  numFmt?: string;
  /** Column width in characters; default from the header length. */
  width?: number;
}

/** A cell value in a data table: number, text, a date, or blank. */
export type TableCell = number | string | Date | null;

/** Our own colours as ARGB, from the one palette of every output (src/outputs/palette.ts). */
export const COLOURS = Object.freeze({
  headerFill: argbColour(PALETTE.headerFill),
  headerText: argbColour(PALETTE.headerText),
  heatLow: argbColour(PALETTE.heatLow),
  heatMid: argbColour(PALETTE.heatMid),
  heatHigh: argbColour(PALETTE.heatHigh),
  note: argbColour(PALETTE.note),
});

/**
 * Writes a sheet's heading from A1: the title (bold), any description lines, then the caution
 * every sheet carries (italic, grey), and a blank row.
 * @returns the first row below the heading (1-based), where a table's header goes
 */
export function addSheetHeading(sheet: ExcelJS.Worksheet, title: string, lines: readonly string[] = []): number {
  // Titles carry users' words (window labels): never let them read as formulas.
  sheet.getCell('A1').value = escapeFormulaText(title);
  sheet.getCell('A1').font = { bold: true, size: 13 };
  lines.forEach((l, i) => (sheet.getCell(2 + i, 1).value = escapeFormulaText(l)));
  const caution = sheet.getCell(2 + lines.length, 1);
  caution.value = CAUTION;
  caution.font = { italic: true, color: { argb: COLOURS.note } };
  return 4 + lines.length;
}

const TABLE_STYLE = 'TableStyleMedium2';

/**
 * Excel table names: letters, digits and underscores, starting with a letter, unique in a workbook;
 * Sunpane tables are named after their sheet.
 */
export function tableName(text: string): string {
  const cleaned = text.replace(/[^A-Za-z0-9_]/g, '_').replace(/^([^A-Za-z])/, 'T_$1');
  return cleaned.length > 0 ? cleaned.slice(0, 250) : 'Table';
}

/** Column letters of a 1-based column number (1 → A, 27 → AA). */
export function columnLetter(column: number): string {
  let n = column;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** An A1 address from 1-based row and column. */
export function address(row: number, column: number): string {
  return `${columnLetter(column)}${row}`;
}

/** Sheet names by Excel's rules: the one implementation the pane uses too (src/io/sheetNames.ts). */
export { cleanSheetName as sheetName } from '../io/sheetNames';

/** Where a data table sits on its sheet (1-based), for formulas that refer to it. */
export interface TablePlacement {
  /** The table's name (valid, as written). */
  name: string;
  firstRow: number;
  /** Row of the header. */
  headerRow: number;
  /** Last body row. */
  lastRow: number;
  firstColumn: number;
  /** 1-based column of each header. */
  columnOf: (header: string) => number;
  /** A1 range of one column's body cells, e.g. `D3:D14`. */
  bodyRange: (header: string) => string;
}

/**
 * Adds an Excel table (with filter buttons, banded rows and our number formats) to a sheet.
 * @param sheet - the worksheet
 * @param name - table name (made valid by {@link tableName})
 * @param topLeft - 1-based row and column of the header cell
 * @param columns - the columns
 * @param rows - the body, one array per row, as long as `columns`
 * @returns where the table sits
 */
export function addDataTable(
  sheet: ExcelJS.Worksheet,
  name: string,
  topLeft: { row: number; column: number },
  columns: readonly TableColumn[],
  rows: readonly (readonly TableCell[])[],
): TablePlacement {
  const validName = tableName(name);
  sheet.addTable({
    name: validName,
    ref: address(topLeft.row, topLeft.column),
    headerRow: true,
    totalsRow: false,
    style: { theme: TABLE_STYLE, showRowStripes: true },
    columns: columns.map((c) => ({ name: c.header, filterButton: true })),
    rows: rows.map((r) => r.map((v) => (v === null ? undefined : v))) as unknown[][],
  });
  // Explicit header colours as well as the table style: not every spreadsheet program draws table styles.
  styleHeader(sheet, topLeft.row, topLeft.column, topLeft.column + columns.length - 1);
  columns.forEach((c, k) => {
    const col = sheet.getColumn(topLeft.column + k);
    const width = c.width ?? Math.max(10, Math.min(40, c.header.length + 2));
    col.width = Math.max(col.width ?? 0, width);
    if (c.numFmt) {
      for (let i = 0; i < rows.length; i++) sheet.getCell(topLeft.row + 1 + i, topLeft.column + k).numFmt = c.numFmt;
    }
  });
  const headers = columns.map((c) => c.header);
  const columnOf = (header: string): number => {
    const k = headers.indexOf(header);
    if (k < 0) throw new Error(`internal error: table ${name} has no column "${header}"`);
    return topLeft.column + k;
  };
  const lastRow = topLeft.row + Math.max(rows.length, 1);
  return {
    name: validName,
    firstRow: topLeft.row,
    headerRow: topLeft.row,
    lastRow,
    firstColumn: topLeft.column,
    columnOf,
    bodyRange: (header) => `${address(topLeft.row + 1, columnOf(header))}:${address(lastRow, columnOf(header))}`,
  };
}

/** One line of a workbook's contents sheet. */
export interface ContentsEntry {
  sheet: string;
  holds: string;
}

/**
 * Fills a workbook's first sheet (made first, filled last) with what each sheet holds: a table of
 * sheet (a link to it) and contents, under the title, a description and the caution.
 */
export function fillContentsSheet(ws: ExcelJS.Worksheet, title: string, lines: readonly string[], entries: readonly ContentsEntry[]): void {
  const top = addSheetHeading(ws, title, lines);
  const t = addDataTable(ws, 'Contents', { row: top, column: 1 }, [{ header: 'Sheet', width: 22 }, { header: 'What it holds', width: 100 }], entries.map((e) => [e.sheet, e.holds]));
  entries.forEach((e, k) => {
    const c = ws.getCell(t.headerRow + 1 + k, 1);
    c.value = { text: e.sheet, hyperlink: `#'${e.sheet.replace(/'/g, "''")}'!A1` } as ExcelJS.CellHyperlinkValue;
    ws.getCell(t.headerRow + 1 + k, 2).alignment = { wrapText: true, vertical: 'top' };
  });
  freezeAt(ws, top + 1);
}

/** Freezes the rows above `row` and the columns left of `column` (both 1-based; 1 freezes none). */
export function freezeAt(sheet: ExcelJS.Worksheet, row: number, column = 1): void {
  sheet.views = [{ state: 'frozen', xSplit: column - 1, ySplit: row - 1, topLeftCell: address(row, column), activeCell: address(row, column) }];
}

/**
 * Writes a native formula with its cached result, so that the file shows the value before any
 * recalculation and a spreadsheet program can check it by recalculating.
 */
export function setFormula(sheet: ExcelJS.Worksheet, cell: string, formula: string, result: number | string, numFmt?: string): void {
  const c = sheet.getCell(cell);
  c.value = { formula: formula.replace(/^=/, ''), result } as ExcelJS.CellFormulaValue;
  if (numFmt) c.numFmt = numFmt;
}

/** A bold label cell (optionally with a note in grey beside it). */
export function setLabel(sheet: ExcelJS.Worksheet, cell: string, text: string): void {
  const c = sheet.getCell(cell);
  c.value = text;
  c.font = { bold: true };
}

/** Styles a header row of plain (non-table) cells with our header colours. */
export function styleHeader(sheet: ExcelJS.Worksheet, row: number, fromColumn: number, toColumn: number): void {
  for (let col = fromColumn; col <= toColumn; col++) {
    const c = sheet.getCell(row, col);
    c.font = { bold: true, color: { argb: COLOURS.headerText } };
    c.fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: COLOURS.headerFill } };
    c.alignment = { horizontal: 'center', vertical: 'middle', wrapText: true };
  }
}

/**
 * Adds a three-stop colour scale (lowest → median → highest) over a range: the heat map.
 * @param range - A1 range, e.g. `B3:Y367`
 */
export function addColourScale(sheet: ExcelJS.Worksheet, range: string): void {
  sheet.addConditionalFormatting({
    ref: range,
    rules: [
      {
        type: 'colorScale',
        priority: 1,
        cfvo: [{ type: 'min' }, { type: 'percentile', value: 50 }, { type: 'max' }],
        color: [{ argb: COLOURS.heatLow }, { argb: COLOURS.heatMid }, { argb: COLOURS.heatHigh }],
      } as ExcelJS.ConditionalFormattingRule,
    ],
  });
}

/** Prints a sheet on one page (scaled to fit), for PDF output and printing. */
export function fitOnOnePage(sheet: ExcelJS.Worksheet, orientation: 'portrait' | 'landscape' = 'landscape'): void {
  sheet.pageSetup = {
    orientation,
    fitToPage: true,
    fitToWidth: 1,
    fitToHeight: 1,
    paperSize: 9,
    margins: { left: 0.4, right: 0.4, top: 0.5, bottom: 0.5, header: 0.2, footer: 0.2 },
  };
}

/** A new workbook with Sunpane's document properties. */
export function newWorkbook(title: string): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Sunpane';
  wb.title = title;
  wb.created = new Date(0);
  wb.modified = new Date(0);
  return wb;
}

/** Serialises a workbook and writes it atomically (temporary file, then rename; see atomicWrite.ts). */
export async function saveWorkbook(wb: ExcelJS.Workbook, file: string, options: OutputOptions = {}): Promise<void> {
  const buffer = await wb.xlsx.writeBuffer();
  await writeFileAtomic(file, new Uint8Array(buffer as ArrayBuffer), options);
}

/** A Date in UTC that shows a local standard-time serial's wall-clock time in a spreadsheet cell. */
export function serialToCellDate(serial: number): Date {
  // Spreadsheet programs show date cells by their serial; ExcelJS converts a Date via its UTC
  // fields, so the UTC fields must carry the local wall-clock time. Round to the second.
  const ms = Math.round(((serial - 25_569) * 86_400_000) / 1000) * 1000;
  return new Date(ms);
}

export type { ExcelJS };
