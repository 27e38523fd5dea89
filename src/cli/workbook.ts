/**
 * Writing real spreadsheet workbooks with ExcelJS: sheets holding Excel tables with number formats
 * and frozen header rows, summary cells as native formulas (SUM, MAX ...) carrying their cached
 * results, and a day × hour colour-scale heat map. The command line's only spreadsheet writer.
 */
import ExcelJS from 'exceljs';
import { DATE_1904_OFFSET, type DateSystem } from '../core/time';
import { escapeFormulaText } from '../io/textCells';
import { CAUTION } from '../outputs/caution';
import { PALETTE, argbColour } from '../outputs/palette';
import { type OutputOptions, writeFileAtomic } from './atomicWrite';
import { type SheetChart, addChartsToXlsx } from './xlsxCharts';

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
  fitRowHeight(sheet, topLeft.row);
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
    c.alignment = { vertical: 'top' }; // beside its description's first line, however many lines that wraps to
    ws.getCell(t.headerRow + 1 + k, 2).alignment = { wrapText: true, vertical: 'top' };
  });
  freezeAt(ws, top + 1);
}

/** Points of row height per line of body text (11 pt type). */
const LINE_HEIGHT = 15;

/**
 * Lines a text takes in a wrapped cell of `width` characters: words are kept whole, a bold
 * character counts 1.1.
 */
export function wrappedLines(text: string, width: number, bold = false): number {
  const room = Math.max(1, width - 1);
  let lines = 1;
  let used = 0;
  for (const word of text.split(/\s+/)) {
    const w = word.length * (bold ? 1.1 : 1);
    if (used > 0 && used + 1 + w > room) {
      lines++;
      used = w;
    } else used += (used > 0 ? 1 : 0) + w;
    while (used > room) {
      lines++;
      used -= room;
    }
  }
  return lines;
}

/**
 * Sets the height of a row with wrapped text to fit its longest cell (spreadsheet programs keep a
 * row's stored height, and a header that needs two lines would otherwise be cut).
 */
export function fitRowHeight(sheet: ExcelJS.Worksheet, row: number): void {
  let lines = 1;
  sheet.getRow(row).eachCell((cell) => {
    if (typeof cell.value !== 'string' || !cell.alignment?.wrapText) return;
    lines = Math.max(lines, wrappedLines(cell.value, sheet.getColumn(Number(cell.col)).width ?? 8.43, cell.font?.bold === true));
  });
  const r = sheet.getRow(row);
  r.height = Math.max(r.height ?? 0, lines * LINE_HEIGHT + 3);
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

/** Width of a column that has none of its own, in characters (the spreadsheet default, about 8.43). */
const DEFAULT_COLUMN_WIDTH = 8.43;

function columnWidth(sheet: ExcelJS.Worksheet, column: number): number {
  return sheet.getColumn(column).width ?? DEFAULT_COLUMN_WIDTH;
}

/**
 * How a sheet prints, for handing the workbook on: A4, fitted to the page width (and, for a sheet of
 * up to 60 rows, to one page), the table's header row repeated at the top of every page, a footer with the
 * sheet's name and page number, and a print area over the used cells and the charts — widened until
 * the heading's longest line (title, description, caution) fits, so that no line is cut at the
 * area's edge. Portrait, unless the area is wider than about 120 characters and no taller than a
 * page or two. ExcelJS writes the area and the repeated rows as the defined names
 * `_xlnm.Print_Area` and `_xlnm.Print_Titles` (ECMA-376 Part 1 §18.2.6).
 * @param titleRow - the header row to repeat (1-based); by default the last frozen row
 * @param reach - the last row and column (1-based) anything is drawn in, e.g. a chart's corner
 */
export function setPrintLayout(sheet: ExcelJS.Worksheet, titleRow?: number, reach: { row: number; column: number } = { row: 0, column: 0 }): void {
  const frozen = sheet.views[0]?.state === 'frozen' ? (sheet.views[0] as { ySplit?: number }).ySplit ?? 0 : 0;
  const repeat = titleRow ?? (frozen > 0 ? frozen : undefined);
  const lastRow = Math.max(sheet.rowCount, reach.row, 1);
  let lastColumn = Math.max(sheet.columnCount, reach.column, 1);
  let heading = 0;
  for (let r = 1; r <= 6; r++) {
    const v = sheet.getCell(r, 1).value;
    if (typeof v === 'string') heading = Math.max(heading, v.length * (r === 1 ? 1.35 : 1.05));
  }
  let width = 0;
  for (let c = 1; c <= lastColumn; c++) width += columnWidth(sheet, c);
  while (width < heading) width += columnWidth(sheet, ++lastColumn);
  sheet.pageSetup = {
    ...sheet.pageSetup,
    paperSize: 9,
    orientation: width > 120 && lastRow <= 80 ? 'landscape' : 'portrait',
    fitToPage: true,
    fitToWidth: 1,
    // A sheet of up to 60 rows (a table and its chart) on one page; a long one as many pages tall as it takes.
    fitToHeight: lastRow <= 60 ? 1 : 0,
    horizontalCentered: false,
    margins: { left: 0.5, right: 0.5, top: 0.6, bottom: 0.6, header: 0.3, footer: 0.3 },
    // ExcelJS puts a `$` before each corner as given (`A$1` comes out as the absolute `$A$1`); it
    // does not double an apostrophe in the sheet name, so such a sheet prints all its cells instead.
    // A hidden sheet gets none: LibreOffice prints a hidden sheet that has a print area.
    printArea: sheet.name.includes("'") || (sheet.state ?? 'visible') !== 'visible' ? undefined : `A$1:${columnLetter(lastColumn)}$${lastRow}`,
    printTitlesRow: repeat ? `${repeat}:${repeat}` : undefined,
  };
  sheet.headerFooter = { ...sheet.headerFooter, oddFooter: '&L&A&RPage &P of &N' };
}

/** A new workbook with Sunpane's document properties. */
export function newWorkbook(title: string, dateSystem: DateSystem = 1900): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Sunpane';
  wb.title = title;
  wb.created = new Date(0);
  wb.modified = new Date(0);
  // The 1904 date system (ECMA-376 Part 1, §18.17.4.1): the workbook property date1904, and ExcelJS
  // then writes every Date cell as a 1904 serial (1462 days less). Formulas that build dates
  // (DATE, MONTH, comparisons with stamps) read the same in either system.
  if (dateSystem === 1904) wb.properties.date1904 = true;
  return wb;
}

/**
 * A date-time serial (1900 system, as the core gives it) as a number for a cell of this sheet's
 * workbook: 1462 days less in a 1904 workbook. For the cached results of formulas that give a
 * date-time (a Date cell value is converted by the writer itself).
 */
export function sheetSerial(sheet: ExcelJS.Worksheet, serial: number): number {
  return sheet.workbook?.properties?.date1904 ? serial - DATE_1904_OFFSET : serial;
}

/** Serialises a workbook and writes it atomically (temporary file, then rename; see atomicWrite.ts). */
export async function saveWorkbook(wb: ExcelJS.Workbook, file: string, options: OutputOptions = {}, charts: readonly SheetChart[] = []): Promise<void> {
  await writeFileAtomic(file, await workbookBytes(wb, charts), options);
}

/**
 * The xlsx package of a workbook ready to hand on: every sheet's print layout set
 * ({@link setPrintLayout}, reaching over its charts), and the charts written in as DrawingML parts
 * (xlsxCharts.ts).
 */
export async function workbookBytes(wb: ExcelJS.Workbook, charts: readonly SheetChart[] = []): Promise<Uint8Array> {
  for (const ws of wb.worksheets) {
    // Rows with wrapped text (headers) tall enough for it, now that every column has its width.
    const wrapped = new Set<number>();
    ws.eachRow((row, n) => row.eachCell((c) => void (c.alignment?.wrapText && typeof c.value === 'string' && wrapped.add(n))));
    for (const n of wrapped) fitRowHeight(ws, n);
    const own = charts.filter((c) => c.sheet === ws.name);
    // A chart anchored to 0-based cell (col, row) with no offset ends at that cell's top-left corner: 1-based row `row`, column `col`.
    setPrintLayout(ws, undefined, { row: Math.max(0, ...own.map((c) => c.to.row)), column: Math.max(0, ...own.map((c) => c.to.col)) });
  }
  const buffer = await wb.xlsx.writeBuffer();
  return addChartsToXlsx(new Uint8Array(buffer as ArrayBuffer), charts);
}

/** A Date in UTC that shows a local standard-time serial's wall-clock time in a spreadsheet cell. */
export function serialToCellDate(serial: number): Date {
  // Spreadsheet programs show date cells by their serial; ExcelJS converts a Date via its UTC
  // fields, so the UTC fields must carry the local wall-clock time. Round to the second.
  const ms = Math.round(((serial - 25_569) * 86_400_000) / 1000) * 1000;
  return new Date(ms);
}

export type { ExcelJS };
