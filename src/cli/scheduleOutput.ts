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
import { DATE_1904_OFFSET, type DateSystem, formatSerialIso } from '../core/time';
import { escapeFormulaText } from '../io/textCells';
import { CAUTION } from '../outputs/caution';
import { MONTHS } from './annualSheets';
import { type OutputOptions, openAtomicOutput } from './atomicWrite';
import { csvLine, formatFixed } from './csv';
import type { AnnualSummary, WindowSpec } from '../core/gain';
import type { LoadPeak } from '../core/load';
import { COLOURS, NUMBER_FORMATS, address, serialToCellDate } from './workbook';
import { LOAD_WORDS } from '../registry/glossary';
import { type ScheduleConvention, TIME_CONVENTION_HEADER, peakAtHeaders, scheduleConventionOf } from '../schedule/columns';

/** One window's results for the summary table. */
export interface WindowResult {
  spec: WindowSpec;
  glassArea: number;
  summary: AnnualSummary;
  /** The year's conduction gain [kWh, net: negative when the window loses more than it gains] and its largest hour [W], with a U-value. */
  conduction?: { annualKWh: number; peakW: number };
  /** The year's peak cooling load, with a room. */
  load?: LoadPeak;
}

/**
 * Which extra columns a summary has: some window has a U-value (conduction), some a room (load);
 * and how its windows stamp their rows (the peak columns' words follow; windows that differ add a
 * time-convention column).
 */
export interface SummaryExtras {
  conduction: boolean;
  load: boolean;
  /** The windows' time convention (all hour ending when left out). */
  convention?: ScheduleConvention;
}
const NO_EXTRAS: SummaryExtras = { conduction: false, load: false };

/** Columns of the summary that come only when some window has a U-value, or a room. */
export const CONDUCTION_HEADERS = ['Conduction, year (kWh)', 'Peak conduction (W)'] as const;
export const LOAD_HEADERS = [LOAD_WORDS.peakLoad, LOAD_WORDS.peakLoadHourEnding] as const;

/** The extra columns a schedule's windows call for (known from the windows before any is worked out). */
export function summaryExtrasOf(specs: readonly WindowSpec[]): SummaryExtras {
  return { conduction: specs.some((s) => s.glazing.uValue !== undefined), load: specs.some((s) => s.room !== undefined), convention: scheduleConventionOf(specs.map((s) => s.timeConvention)) };
}

/**
 * The summary's headers: SUMMARY_HEADERS with the peak's date-time column worded by the windows'
 * time convention, and the extra columns before the months (the time convention of each window
 * first when they differ).
 */
export function summaryHeaders(extras: SummaryExtras = NO_EXTRAS): string[] {
  const at = SUMMARY_HEADERS.indexOf('Weather missing (h)') + 1;
  const convention = extras.convention ?? 'hourEnding';
  const peakAt = peakAtHeaders(convention, 'cli');
  const base = SUMMARY_HEADERS.map((h) => (h === 'Peak hour ending' ? peakAt.gain : h));
  return [
    ...base.slice(0, at),
    ...(convention === 'mixed' ? [TIME_CONVENTION_HEADER] : []),
    ...(extras.conduction ? CONDUCTION_HEADERS : []),
    ...(extras.load ? [LOAD_HEADERS[0], peakAt.load] : []),
    ...base.slice(at),
  ];
}

/**
 * The extra cells of one window, each through its formatter (kWh, W, a stamp, words), blank where
 * the window lacks what the column needs — except the cooling load of a window without a room,
 * which says so in the glossary's words (LOAD_WORDS.noRoom, as the pane writes it).
 */
export function extraCells<T>(r: WindowResult, x: SummaryExtras, kwh: (v: number) => T, watts: (v: number) => T, stamp: (v: number) => T, blank: T, text: (words: string) => T): T[] {
  const out: T[] = [];
  if (x.convention === 'mixed') out.push(text(r.spec.timeConvention ?? 'hourEnding'));
  if (x.conduction) out.push(...(r.conduction ? [kwh(r.conduction.annualKWh), watts(r.conduction.peakW)] : [blank, blank]));
  if (x.load) out.push(...(r.load ? [watts(r.load.peakLoadW), stamp(r.load.peakLoadStamp)] : [text(LOAD_WORDS.noRoom), blank]));
  return out;
}

/** Number formats of the extra columns. */
function extraFormats(x: SummaryExtras): (string | undefined)[] {
  return [...(x.convention === 'mixed' ? [undefined] : []), ...(x.conduction ? [NUMBER_FORMATS.kwh, NUMBER_FORMATS.watts] : []), ...(x.load ? [NUMBER_FORMATS.watts, NUMBER_FORMATS.dateTime] : [])];
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
  const x = summaryExtrasOf(results.map((r) => r.spec));
  return `${[csvLine(summaryHeaders(x)), ...results.map((r) => summaryCsvLine(r, x))].join('\n')}\n`;
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
export function summaryCsvLine(r: WindowResult, extras: SummaryExtras = NO_EXTRAS): string {
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
    ...extraCells<string | number>(r, extras, (v) => formatFixed(v, 3), (v) => formatFixed(v, 2), formatSerialIso, '', (w) => w),
    ...s.monthlyKWh.map((k) => formatFixed(k, 3)),
  ]);
}

/** A CSV summary streamed to `target`: the header line first, then a line per window. */
export function csvSummaryWriter(target: string, options: OutputOptions, extras: SummaryExtras = NO_EXTRAS): SummaryWriter {
  const out = openAtomicOutput(target, options);
  let started = false;
  return {
    async add(r) {
      if (!started) {
        started = true;
        await write(out.stream, `${csvLine(summaryHeaders(extras))}\n`);
      }
      await write(out.stream, `${summaryCsvLine(r, extras)}\n`);
    },
    async finish() {
      if (!started) await write(out.stream, `${csvLine(summaryHeaders(extras))}\n`);
      await out.commit();
    },
    abort: () => out.abort(),
  };
}

/** Number formats and widths of the summary's columns (with the extra ones asked for). */
export function summaryFormats(x: SummaryExtras = NO_EXTRAS): { numFmts: (string | undefined)[]; widths: number[] } {
  const extra = extraFormats(x);
  return {
    numFmts: [undefined, NUMBER_FORMATS.angle, NUMBER_FORMATS.angle, NUMBER_FORMATS.area, NUMBER_FORMATS.kwh, NUMBER_FORMATS.watts, NUMBER_FORMATS.dateTime, NUMBER_FORMATS.integer, NUMBER_FORMATS.fraction, NUMBER_FORMATS.integer, ...extra, ...MONTHS.map(() => NUMBER_FORMATS.kwh)],
    widths: [22, 12, 11, 15, 18, 14, 18, 13, 20, 14, ...extra.map(() => 18), ...MONTHS.map(() => 11)],
  };
}
/** Columns summed (SUM) and those maximised (MAX) in the totals row, by header. */
const SUMMED = new Set(['Glass area (m²)', 'Annual gain (kWh)', ...MONTHS.map((m) => `${m} (kWh)`)]);
const MAXED = new Set<string>(['Peak gain (W)', LOAD_HEADERS[0]]);

/**
 * A workbook summary streamed to `target`: a Contents sheet, then the Summary sheet (title and
 * caution, the header, a row per window, the totals row).
 * @param title - the Summary sheet's title (users' words: escaped)
 * @param source - what the schedule came from, for the Contents sheet
 */
export function xlsxSummaryWriter(target: string, options: OutputOptions, title: string, source: string, extras: SummaryExtras = NO_EXTRAS, dateSystem: DateSystem = 1900): SummaryWriter {
  const HEADERS = summaryHeaders(extras);
  const { numFmts: NUM_FMTS, widths: WIDTHS } = summaryFormats(extras);
  const out = openAtomicOutput(target, options);
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: out.stream, useStyles: true, useSharedStrings: true });
  // A stamp as its cell value: a Date in the 1900 system (as the in-memory workbook writes it); in the
  // 1904 system the serial itself, 1462 days less, since the streaming writer converts Dates by 1900 only.
  const stampCell = (serial: number): ExcelJS.CellValue => (dateSystem === 1904 ? serial - DATE_1904_OFFSET : serialToCellDate(serial));
  if (dateSystem === 1904) mark1904(wb);
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
    row.getCell(1).alignment = { vertical: 'top' };
    row.getCell(2).value = e.holds;
    row.getCell(2).alignment = { wrapText: true, vertical: 'top' };
  });
  contents.commit();

  // Summary: heading, header, rows as they come, totals at the end.
  const top = 4; // title, caution, blank, then the header (as addSheetHeading lays a sheet out)
  const summary = wb.addWorksheet('Summary', { views: [{ state: 'frozen', xSplit: 1, ySplit: top, topLeftCell: address(top + 1, 2), activeCell: address(top + 1, 2) }] });
  summary.columns = WIDTHS.map((width) => ({ width }));
  heading(summary, title, []);
  headerRow(summary.getRow(top), HEADERS);
  summary.getRow(top).commit();
  let next = top + 1;
  const sums = new Map<string, number>([...SUMMED].map((h) => [h, 0]));
  const peaks = new Map<string, number>([...MAXED].map((h) => [h, 0]));

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
        stampCell(s.peakStamp),
        s.sunlitHours,
        s.meanSunlitFraction,
        s.missingHours,
        ...extraCells<ExcelJS.CellValue>(r, extras, (v) => v, (v) => v, stampCell, null, (w) => w),
        ...s.monthlyKWh,
      ];
      const row = summary.getRow(next++);
      values.forEach((v, k) => {
        const cell = row.getCell(k + 1);
        cell.value = v;
        if (NUM_FMTS[k]) cell.numFmt = NUM_FMTS[k]!;
      });
      row.commit();
      HEADERS.forEach((h, k) => {
        if (SUMMED.has(h)) sums.set(h, sums.get(h)! + (values[k] as number));
        if (MAXED.has(h) && typeof values[k] === 'number') peaks.set(h, Math.max(peaks.get(h)!, values[k] as number));
      });
      // Let the zip stream drain: the rows must not pile up in memory.
      if (out.stream.writableNeedDrain) await new Promise<void>((resolve) => out.stream.once('drain', () => resolve()));
    },
    async finish() {
      const first = top + 1;
      const last = Math.max(first, next - 1);
      const totals = summary.getRow(next);
      totals.getCell(1).value = 'All windows';
      totals.getCell(1).font = { bold: true };
      HEADERS.forEach((h, k) => {
        const column = k + 1;
        const range = `${address(first, column)}:${address(last, column)}`;
        if (SUMMED.has(h) || MAXED.has(h)) {
          const cell = totals.getCell(column);
          cell.value = { formula: `${MAXED.has(h) ? 'MAX' : 'SUM'}(${range})`, result: MAXED.has(h) ? peaks.get(h)! : sums.get(h)! } as ExcelJS.CellFormulaValue;
          cell.numFmt = NUM_FMTS[k]!;
        }
      });
      totals.commit();
      summary.autoFilter = `${address(top, 1)}:${address(last, HEADERS.length)}`;
      summary.commit();
      await wb.commit();
      await out.commit();
    },
    abort: () => out.abort(),
  };
}

/**
 * Marks a streamed workbook as in the 1904 date system (ECMA-376 Part 1, §18.17.4.1): ExcelJS's
 * streaming writer writes its workbook part with no properties, so the attribute date1904 is put
 * into that part's workbookPr element as the part goes into the zip. Fails loudly if the part ever
 * comes without the element, rather than writing 1904 serials into a 1900 workbook.
 */
function mark1904(wb: ExcelJS.stream.xlsx.WorkbookWriter): void {
  const zip = (wb as unknown as { zip: { append(data: unknown, options: { name: string }): unknown } }).zip;
  const append = zip.append.bind(zip);
  zip.append = (data, options) => {
    if (options?.name === '/xl/workbook.xml') {
      const xml = String(data);
      if (!/<workbookPr\b/.test(xml)) throw new Error('the streamed workbook part has no workbookPr element to mark as 1904');
      return append(xml.replace(/<workbookPr\b/, '<workbookPr date1904="1"'), options);
    }
    return append(data, options);
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
