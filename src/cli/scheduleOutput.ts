/**
 * The schedule's summary written as it is worked out, one window at a time, so that a schedule of
 * any length (a firm's portfolio of tens of thousands of windows) needs the memory of one window:
 * CSV lines go straight to the output, and the workbook is written by ExcelJS's streaming writer,
 * each row committed as soon as it is filled. Both go to a temporary file that becomes the output
 * only when complete (./atomicWrite.ts): a failed or interrupted run leaves no partial file.
 *
 * The streamed workbook holds what the in-memory one did (./schedule.ts `addSummaryTable`, used by
 * the demo) — title and caution, a styled header with filter buttons, number formats, frozen
 * header, the totals row as SUM/MAX formulas with their results — except that the rows are a
 * filtered range rather than an Excel table object, which the streaming writer cannot make.
 */
import ExcelJS from 'exceljs';
import { formatSerialIso } from '../core/time';
import { escapeFormulaText } from '../io/textCells';
import { CAUTION } from '../outputs/caution';
import { MONTHS } from './annualSheets';
import { type OutputOptions, openAtomicOutput } from './atomicWrite';
import { csvLine, formatFixed } from './csv';
import type { AnnualSummary, WindowSpec } from '../core/gain';
import { COLOURS, NUMBER_FORMATS, address, serialToCellDate } from './workbook';

/** One window's results for the summary table. */
export interface WindowResult {
  spec: WindowSpec;
  glassArea: number;
  summary: AnnualSummary;
}

/** The summary columns (headers of our own), shared by CSV, workbook and demo. */
export const SUMMARY_HEADERS = [
  'Window',
  'Latitude (°)',
  'Faces (°)',
  'Glass area (m²)',
  'Annual gain (kWh)',
  'Peak gain (W)',
  'Peak hour ending',
  'Hours with beam on the glass (h)',
  'Mean sunlit fraction (0-1)',
  'Weather missing (h)',
  ...MONTHS.map((m) => `${m} (kWh)`),
] as const;

/** The summary as CSV text (all windows at once; the command streams it line by line instead). */
export function summaryCsv(results: readonly WindowResult[]): string {
  return `${[csvLine([...SUMMARY_HEADERS]), ...results.map(summaryCsvLine)].join('\n')}\n`;
}

/** Where the schedule's rows go, one window at a time. */
export interface SummaryWriter {
  /** Writes one window's row (waits while the output is busy). */
  add(result: WindowResult): Promise<void>;
  /** Writes what follows the rows (totals), and makes the file the output. */
  finish(): Promise<void>;
  /** Gives up: the temporary file is removed, the output untouched. */
  abort(): Promise<void>;
}

/** Writes `text` to a stream, waiting for it to drain when its buffer is full (bounded memory). */
function write(stream: NodeJS.WritableStream, text: string): Promise<void> {
  return stream.write(text) ? Promise.resolve() : new Promise((resolve) => stream.once('drain', () => resolve()));
}

/** One window's CSV line (numbers as the CSV output prints them; the label escaped). */
export function summaryCsvLine(r: WindowResult): string {
  const s = r.summary;
  return csvLine([
    escapeFormulaText(r.spec.name),
    formatFixed(r.spec.site.latitude, 4),
    formatFixed(r.spec.surfaceAzimuth, 2),
    formatFixed(r.glassArea, 4),
    formatFixed(s.annualKWh, 3),
    formatFixed(s.peakW, 2),
    formatSerialIso(s.peakStamp),
    s.sunlitHours,
    formatFixed(s.meanSunlitFraction, 4),
    s.missingHours,
    ...s.monthlyKWh.map((k) => formatFixed(k, 3)),
  ]);
}

/** A CSV summary streamed to `target`: the header line first, then a line per window. */
export function csvSummaryWriter(target: string, options: OutputOptions): SummaryWriter {
  const out = openAtomicOutput(target, options);
  let started = false;
  return {
    async add(r) {
      if (!started) {
        started = true;
        await write(out.stream, `${csvLine([...SUMMARY_HEADERS])}\n`);
      }
      await write(out.stream, `${summaryCsvLine(r)}\n`);
    },
    async finish() {
      if (!started) await write(out.stream, `${csvLine([...SUMMARY_HEADERS])}\n`);
      await out.commit();
    },
    abort: () => out.abort(),
  };
}

const NUM_FMTS = [undefined, NUMBER_FORMATS.angle, NUMBER_FORMATS.angle, NUMBER_FORMATS.area, NUMBER_FORMATS.kwh, NUMBER_FORMATS.watts, NUMBER_FORMATS.dateTime, NUMBER_FORMATS.integer, NUMBER_FORMATS.fraction, NUMBER_FORMATS.integer, ...MONTHS.map(() => NUMBER_FORMATS.kwh)];
const WIDTHS = [22, 12, 11, 15, 18, 14, 18, 13, 20, 14, ...MONTHS.map(() => 11)];
/** Columns summed (SUM) and the one maximised (MAX) in the totals row, by header. */
const SUMMED = new Set(['Glass area (m²)', 'Annual gain (kWh)', ...MONTHS.map((m) => `${m} (kWh)`)]);
const MAXED = 'Peak gain (W)';

/**
 * A workbook summary streamed to `target`: a Contents sheet, then the Summary sheet (title and
 * caution, the header, a row per window, the totals row).
 * @param title - the Summary sheet's title (users' words: escaped)
 * @param source - what the schedule came from, for the Contents sheet
 */
export function xlsxSummaryWriter(target: string, options: OutputOptions, title: string, source: string): SummaryWriter {
  const out = openAtomicOutput(target, options);
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: out.stream, useStyles: true, useSharedStrings: true });
  wb.creator = 'Sunpane';
  wb.title = 'Sunpane window schedule';
  wb.created = new Date(0);
  wb.modified = new Date(0);

  // Contents: written and committed first.
  const contents = wb.addWorksheet('Contents', { views: [{ state: 'frozen', ySplit: 5, xSplit: 0, topLeftCell: 'A6', activeCell: 'A6' }] });
  contents.columns = [{ width: 22 }, { width: 100 }];
  heading(contents, 'Sunpane window schedule', [`From ${source}.`]);
  const entries = [
    { sheet: 'Contents', holds: 'This list.' },
    { sheet: 'Summary', holds: "One row per window: its year's solar gain, peak hour, hours with beam on the glass, mean sunlit fraction, missing weather hours and gain by month; totals of all windows as formulas." },
  ];
  headerRow(contents.getRow(5), ['Sheet', 'What it holds']);
  entries.forEach((e, k) => {
    const row = contents.getRow(6 + k);
    row.getCell(1).value = { text: e.sheet, hyperlink: `#'${e.sheet}'!A1` } as ExcelJS.CellHyperlinkValue;
    row.getCell(2).value = e.holds;
    row.getCell(2).alignment = { wrapText: true, vertical: 'top' };
  });
  contents.commit();

  // Summary: heading, header, rows as they come, totals at the end.
  const top = 4; // title, caution, blank, then the header (as addSheetHeading lays a sheet out)
  const summary = wb.addWorksheet('Summary', { views: [{ state: 'frozen', xSplit: 1, ySplit: top, topLeftCell: address(top + 1, 2), activeCell: address(top + 1, 2) }] });
  summary.columns = WIDTHS.map((width) => ({ width }));
  heading(summary, title, []);
  headerRow(summary.getRow(top), [...SUMMARY_HEADERS]);
  summary.getRow(top).commit();
  let next = top + 1;
  const sums = new Map<string, number>([...SUMMED].map((h) => [h, 0]));
  let peak = 0;

  return {
    async add(r) {
      const s = r.summary;
      const values = [
        escapeFormulaText(r.spec.name),
        r.spec.site.latitude,
        r.spec.surfaceAzimuth,
        r.glassArea,
        s.annualKWh,
        s.peakW,
        serialToCellDate(s.peakStamp),
        s.sunlitHours,
        s.meanSunlitFraction,
        s.missingHours,
        ...s.monthlyKWh,
      ];
      const row = summary.getRow(next++);
      values.forEach((v, k) => {
        const cell = row.getCell(k + 1);
        cell.value = v;
        if (NUM_FMTS[k]) cell.numFmt = NUM_FMTS[k]!;
      });
      row.commit();
      SUMMARY_HEADERS.forEach((h, k) => {
        if (SUMMED.has(h)) sums.set(h, sums.get(h)! + (values[k] as number));
      });
      peak = Math.max(peak, s.peakW);
      // Let the zip stream drain: the rows must not pile up in memory.
      if (out.stream.writableNeedDrain) await new Promise<void>((resolve) => out.stream.once('drain', () => resolve()));
    },
    async finish() {
      const first = top + 1;
      const last = Math.max(first, next - 1);
      const totals = summary.getRow(next);
      totals.getCell(1).value = 'All windows';
      totals.getCell(1).font = { bold: true };
      SUMMARY_HEADERS.forEach((h, k) => {
        const column = k + 1;
        const range = `${address(first, column)}:${address(last, column)}`;
        if (SUMMED.has(h) || h === MAXED) {
          const cell = totals.getCell(column);
          cell.value = { formula: `${h === MAXED ? 'MAX' : 'SUM'}(${range})`, result: h === MAXED ? peak : sums.get(h)! } as ExcelJS.CellFormulaValue;
          cell.numFmt = NUM_FMTS[k]!;
        }
      });
      totals.commit();
      summary.autoFilter = `${address(top, 1)}:${address(last, SUMMARY_HEADERS.length)}`;
      summary.commit();
      await wb.commit();
      await out.commit();
    },
    abort: () => out.abort(),
  };
}

/** Title (escaped: it may carry users' words), lines and the caution at the top of a streamed sheet. */
function heading(sheet: ExcelJS.Worksheet, title: string, lines: readonly string[]): void {
  const t = sheet.getCell('A1');
  t.value = escapeFormulaText(title);
  t.font = { bold: true, size: 13 };
  lines.forEach((l, i) => (sheet.getCell(2 + i, 1).value = escapeFormulaText(l)));
  const caution = sheet.getCell(2 + lines.length, 1);
  caution.value = CAUTION;
  caution.font = { italic: true, color: { argb: COLOURS.note } };
}

/** A header row in our header colours. */
function headerRow(row: ExcelJS.Row, headers: readonly string[]): void {
  headers.forEach((h, k) => {
    const c = row.getCell(k + 1);
    c.value = h;
    c.font = { bold: true, color: { argb: COLOURS.headerText } };
    c.fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: COLOURS.headerFill } };
    c.alignment = { horizontal: 'center', vertical: 'middle', wrapText: true };
  });
}
