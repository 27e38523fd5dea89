/**
 * The Monthly sheet of the `sunpane table` workbook for a window with a room: each month's peak
 * cooling load and its hour, and the year's, as formulas over the Hourly table.
 *
 * Reference: the worksheet function SOLARGAINYEAR with the quantities stamp and load, evaluated
 * through the registry as a cell would (the registry's functions are the reference for the sheet
 * writers; the radiant time series itself is checked against its published properties in
 * tests/reference/rts-spitler-1997.test.ts and tests/core/load). The month of each row and its
 * maximum are worked out here, from the stamps, by the convention docs/conventions.md states (a row
 * stamped at the end of its hour belongs to the day the hour lies in).
 *
 * Read twice: the values cached in the file (what a program that does not recalculate shows, read
 * with ExcelJS) and LibreOffice Calc's own results after it recalculated every formula on load
 * (outside source: LibreOffice Calc, Debian package libreoffice-calc-nogui). A missing LibreOffice
 * fails the test. The window's numbers are invented test inputs.
 */
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import { LOAD_WORDS } from '../../src/registry/glossary';
import { CAUTION } from '../../src/outputs/caution';
import type { RawArg } from '../../src/registry/types';
import { run } from '../cli/run';
import { CSV_ALL_SHEETS, convert, pdfPageToPng, readCsvRows, sheetsOf } from './soffice';

const ARTIFACTS = path.join(__dirname, '..', '..', 'test-artifacts', 'libreoffice');

/** An invented south-west window with conduction and a medium room (ASHRAE clear sky with a warm day). */
const WINDOW: Record<string, number | string> = {
  name: 'SW office',
  year: 2026,
  latitude: 40,
  longitude: -105,
  utcOffset: -7,
  elevation: 1600,
  surfaceAzimuth: 225,
  width: 2,
  height: 1.5,
  frameFraction: 0.1,
  shgc: 0.5,
  overhangProjection: 0.4,
  overhangGap: 0.2,
  uValue: 2.8,
  indoorTemperature: 24,
  tauB: 0.4,
  tauD: 2.3,
  dryBulbMax: 33,
  dailyRange: 12,
  skyModel: 'perez1990',
  roomConstruction: 'medium',
};

/** Each month's largest load over the hours with weather (0 when none is above 0) and the stamp of its first such hour, from SOLARGAINYEAR. */
function referenceMonthlyPeaks(window: Record<string, number | string>): { peakW: number; stamp: number | undefined }[] {
  const range = Object.entries(window) as RawArg;
  const out = applyFunction(findFunction('SOLARGAINYEAR')!, [range, [['stamp', 'load']]]);
  const instant = window.timeConvention === 'instant';
  const peaks = Array.from({ length: 12 }, () => ({ peakW: 0, stamp: undefined as number | undefined }));
  for (const [stamp, load] of out as [number, unknown][]) {
    if (typeof load !== 'number') continue; // #N/A: an hour without weather
    // The hour's day: an hour-ending stamp at 00:00 closes the day before.
    const inHour = instant ? stamp : stamp - 1 / 1440;
    const month = new Date(Math.round((inHour - 25_569) * 86_400_000)).getUTCMonth();
    if (load > peaks[month].peakW) peaks[month] = { peakW: load, stamp };
  }
  return peaks;
}

/** A number or a date-time as LibreOffice's CSV shows it. */
function csvNumber(text: string): number {
  const dt = /^(\d{4})-(\d{2})-(\d{2}) (\d{2}):(\d{2})(?::(\d{2}))?$/.exec(text.trim());
  if (dt) return Date.UTC(+dt[1], +dt[2] - 1, +dt[3], +dt[4], +dt[5], +(dt[6] ?? 0)) / 86_400_000 + 25_569;
  return text.trim() === '' ? NaN : Number(text);
}

/** A cell's value as a number: a formula's cached result, a date as its serial. */
function cellNumber(v: ExcelJS.CellValue): number {
  const x = v && typeof v === 'object' && 'formula' in v ? (v as ExcelJS.CellFormulaValue).result : v;
  if (x instanceof Date) return x.getTime() / 86_400_000 + 25_569;
  return typeof x === 'number' ? x : NaN;
}

let work: string;
/** The workbook of WINDOW as it is (no time convention given: hour-ending rows), read by both the cached-value and the LibreOffice test. */
let swOffice: string;

beforeAll(async () => {
  work = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-tableload-'));
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  swOffice = path.join(work, 'sw-office.xlsx');
  await writeTable(WINDOW, swOffice);
});

afterAll(() => {
  fs.rmSync(work, { recursive: true, force: true });
});

async function writeTable(window: Record<string, number | string>, file: string, ...flags: string[]): Promise<void> {
  const json = path.join(work, `${path.basename(file, '.xlsx')}.json`);
  fs.writeFileSync(json, JSON.stringify(window));
  const r = await run('table', '--window', json, '--out', file, ...flags);
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
}

/** The Monthly sheet's header row (row 4: title, caution, a blank row, then the table). */
const HEADER_ROW = 4;

describe('the table workbook: the peak cooling load of each month on the Monthly sheet', () => {
  test("cached values equal SOLARGAINYEAR's load, month by month, for hour-ending and instant rows; the year row holds the year's peak", async () => {
    for (const convention of ['hourEnding', 'instant']) {
      const window = { ...WINDOW, timeConvention: convention };
      // Hour-ending rows are the default: WINDOW's own workbook (written once for this file) is
      // compared with SOLARGAINYEAR told 'hourEnding' in so many words.
      const file = convention === 'hourEnding' ? swOffice : path.join(work, `cached-${convention}.xlsx`);
      if (convention !== 'hourEnding') await writeTable(window, file);
      const wb = new ExcelJS.Workbook();
      await wb.xlsx.readFile(file);
      const ws = wb.getWorksheet('Monthly')!;
      const header = (ws.getRow(HEADER_ROW).values as unknown[]).slice(1, 6);
      const at = convention === 'instant' ? LOAD_WORDS.peakLoadAtInstant : LOAD_WORDS.peakLoadAtHourEnding;
      expect(header).toEqual(['Month', 'Solar gain (kWh)', 'Weather missing (h)', LOAD_WORDS.peakLoad, at]);
      const ref = referenceMonthlyPeaks(window);
      ref.forEach((p, k) => {
        const row = ws.getRow(HEADER_ROW + 1 + k);
        expect(cellNumber(row.getCell(4).value)).toBeCloseTo(p.peakW, 6);
        expect(cellNumber(row.getCell(5).value)).toBeCloseTo(p.stamp!, 6);
        expect((row.getCell(4).value as ExcelJS.CellFormulaValue).formula).toMatch(/^SUMPRODUCT\(MAX\(/);
      });
      // Summer peaks above winter ones would be a coincidence of this window; that the months differ is not.
      expect(new Set(ref.map((p) => Math.round(p.peakW))).size).toBeGreaterThan(6);
      const yearRow = ws.getRow(HEADER_ROW + 12 + 2);
      expect(yearRow.getCell(1).value).toBe('Year');
      const year = ref.reduce((a, b) => (b.peakW > a.peakW ? b : a));
      expect(cellNumber(yearRow.getCell(4).value)).toBeCloseTo(year.peakW, 6);
      expect(cellNumber(yearRow.getCell(5).value)).toBeCloseTo(year.stamp!, 6);
      expect(ws.getCell('A2').value).toBe(CAUTION);
    }
  });

  test('a window without a room keeps the Monthly sheet as it was: no load columns', async () => {
    const { roomConstruction: _omit, ...plain } = WINDOW;
    void _omit;
    const file = path.join(work, 'plain.xlsx');
    await writeTable(plain, file);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(file);
    const header = (wb.getWorksheet('Monthly')!.getRow(HEADER_ROW).values as unknown[]).slice(1, 6);
    expect(header).toEqual(['Month', 'Solar gain (kWh)', 'Weather missing (h)', undefined, 'Month']);
  });

  test("LibreOffice's own results of the monthly peak-load formulas equal SOLARGAINYEAR's, and the sheet renders to one page", async () => {
    // The same window written in the 1904 date system (--date-system 1904; ECMA-376 Part 1, §18.17.4.1),
    // converted by the same LibreOffice run (one program start for both; neither name begins with
    // the other's followed by a dash, so each file's sheets are told apart).
    const file1904 = path.join(work, 'sw-office1904.xlsx');
    await writeTable(WINDOW, file1904, '--date-system', '1904');
    const conversion = convert([swOffice, file1904], CSV_ALL_SHEETS, path.join(work, 'csv'));
    const sheets = sheetsOf(conversion, 'sw-office');
    const sheets1904 = sheetsOf(conversion, 'sw-office1904');
    expect([...sheets.keys()].sort()).toEqual([...sheets1904.keys()].sort());
    const rows = readCsvRows(sheets.get('Monthly')!);
    expect(rows[HEADER_ROW - 1].slice(3, 5)).toEqual([LOAD_WORDS.peakLoad, LOAD_WORDS.peakLoadAtHourEnding]);
    const ref = referenceMonthlyPeaks(WINDOW);
    ref.forEach((p, k) => {
      const row = rows[HEADER_ROW + k];
      const got = csvNumber(row[3]);
      if (!(Math.abs(got - p.peakW) <= 1e-9 * Math.max(1, p.peakW))) throw new Error(`month ${k + 1}: LibreOffice shows ${row[3]}, SOLARGAINYEAR ${p.peakW}`);
      // The stamp as shown to the minute.
      expect(Math.abs(csvNumber(row[4]) - p.stamp!)).toBeLessThan(1 / 1440 / 2);
    });
    const yearRow = rows[HEADER_ROW + 13];
    const year = ref.reduce((a, b) => (b.peakW > a.peakW ? b : a));
    expect(Math.abs(csvNumber(yearRow[3]) - year.peakW)).toBeLessThanOrEqual(1e-9 * year.peakW);
    expect(Math.abs(csvNumber(yearRow[4]) - year.stamp!)).toBeLessThan(1 / 1440 / 2);
    expect(rows[1][0]).toBe(CAUTION);

    // The 1904 workbook: LibreOffice recalculates it to the same dates and values on every sheet —
    // the monthly sums and peaks whose formulas build dates with DATE(), the peak hours, the hourly
    // stamps, the heat map's days — although every date-time is stored 1462 days lower
    // (tests/cli/dateSystem.test.ts).
    for (const sheet of ['Monthly', 'Hourly', 'Heat map']) {
      const same = readCsvRows(sheets1904.get(sheet)!);
      expect(same).toEqual(readCsvRows(sheets.get(sheet)!));
    }
    expect(readCsvRows(sheets1904.get('Hourly')!).some((r) => /^2026-07-01 13:00/.test(r[0]))).toBe(true);

    // A picture of the Monthly sheet as LibreOffice draws it, to look at (test-artifacts/libreoffice/):
    // pages 1 and 2 (Contents, Monthly) only; the whole workbook is 67 pages, most of them the hourly
    // table, and cost LibreOffice about 3 s of CPU more to draw.
    const pdf = convert(swOffice, 'pdf:calc_pdf_Export:{"PageRange":{"type":"string","value":"1-2"}}', path.join(work, 'pdf'), { recalc: false }).files.find((f) => f.endsWith('.pdf'))!;
    fs.copyFileSync(pdf, path.join(ARTIFACTS, 'table-load.pdf'));
    expect(fs.existsSync(pdfPageToPng(pdf, 2, path.join(ARTIFACTS, 'table-load-monthly')))).toBe(true);
  });
});
