/**
 * Real-client check of the demo workbook: LibreOffice Calc, run headless with a fresh profile set to
 * recalculate every formula on load, opens the generated file and saves it as ods (which holds the
 * results LibreOffice worked out on that load); the ods's sheets, exported as CSV without
 * recalculating, are what the checks read, so one recalculation serves them all, and
 * - every sheet comes out (an xlsx it had to repair would lose sheets or tables),
 * - its OWN results for our native formulas (SUM, MAX, arithmetic) equal the values our core worked
 *   out (relative tolerance 1e-9: both are double precision; LibreOffice prints 15 significant digits),
 * - a round trip through its xlsx and ods writers keeps every sheet, table and the colour scale,
 * - one-page sheets render to PDF and PNG (test-artifacts/libreoffice/, looked at by eye).
 *
 * Outside source: LibreOffice Calc (Debian package libreoffice-calc-nogui; 7.4 here, ≥ 7.2 needed for
 * the all-sheets CSV export), not written by this project. A missing LibreOffice fails the test.
 * The SUNPANE.* cells are not compared: LibreOffice does not know them (it shows #NAME?).
 */
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { buildDemoWorkbook, computeDemo, type DemoCheckCells, type DemoResults } from '../../src/cli/demo';
import { newWorkbook, saveWorkbook, setFormula } from '../../src/cli/workbook';
import { findFunction } from '../../src/registry';
import { CSV_ALL_SHEETS, convert, pdfPageToPng, readCsvRows, sheetsOf, sofficeVersion } from './soffice';

const ARTIFACTS = path.join(__dirname, '..', '..', 'test-artifacts', 'libreoffice');
let work: string;
let demoFile: string;
let results: DemoResults;
let checks: DemoCheckCells;
let sheetNames: string[];
let csvSheets: Map<string, string>;
let canarySheets: Map<string, string>;
/** The demo as LibreOffice saved it in ods after recalculating it on load. */
let odsFile: string | undefined;

/** Splits `Sheet name!B12` into the sheet and 0-based row and column. */
function locate(ref: string): { sheet: string; row: number; col: number } {
  const bang = ref.lastIndexOf('!');
  const m = /^([A-Z]+)(\d+)$/.exec(ref.slice(bang + 1));
  if (!m) throw new Error(`bad reference ${ref}`);
  const col = [...m[1]].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0) - 1;
  return { sheet: ref.slice(0, bang), row: Number(m[2]) - 1, col };
}

/** A number as LibreOffice's CSV shows it (percent-formatted cells carry a % sign). */
function csvNumber(text: string): number {
  const t = text.trim();
  // A cell formatted as a date and time comes out as text (2026-06-21 14:30:00): its serial.
  const dt = /^(\d{4})-(\d{2})-(\d{2}) (\d{2}):(\d{2})(?::(\d{2}))?$/.exec(t);
  if (dt) return Date.UTC(+dt[1], +dt[2] - 1, +dt[3], +dt[4], +dt[5], +(dt[6] ?? 0)) / 86_400_000 + 25_569;
  if (t.endsWith('%')) return Number(t.slice(0, -1)) / 100;
  return t === '' ? NaN : Number(t);
}

function valueAt(sheets: Map<string, string>, ref: string): string {
  const { sheet, row, col } = locate(ref);
  const file = sheets.get(sheet);
  if (!file) throw new Error(`LibreOffice wrote no CSV for sheet ${sheet}`);
  return readCsvRows(file)[row]?.[col] ?? '';
}

function allChecks(): { cell: string; expected: number }[] {
  return [checks.summary.annualKWh, checks.summary.peakW, checks.summary.glassArea, ...checks.monthly, ...checks.options, ...checks.overview, ...checks.hourly, ...checks.formulas];
}

function expectSameNumbers(sheets: Map<string, string>): void {
  for (const { cell, expected } of allChecks()) {
    const got = csvNumber(valueAt(sheets, cell));
    const tolerance = 1e-9 * Math.max(1, Math.abs(expected));
    if (!(Math.abs(got - expected) <= tolerance)) throw new Error(`${cell}: LibreOffice shows ${got} ("${valueAt(sheets, cell)}"), our core ${expected}`);
  }
}

beforeAll(async () => {
  work = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-lo-'));
  results = computeDemo();
  const built = buildDemoWorkbook(results);
  checks = built.checks;
  sheetNames = built.workbook.worksheets.map((w) => w.name);
  demoFile = path.join(work, 'sunpane-demo.xlsx');
  await saveWorkbook(built.workbook, demoFile, {}, built.charts);
  // The canary: a SUM whose cached result is wrong (-1), converted by the same LibreOffice runs as the
  // demo (one program start for both), so the run that gives the demo's numbers is shown to recalculate.
  const wb = newWorkbook('canary');
  const ws = wb.addWorksheet('Canary');
  ws.getCell('A1').value = 2;
  ws.getCell('A2').value = 3;
  setFormula(ws, 'A3', 'SUM(A1:A2)', -1);
  const canaryFile = path.join(work, 'canary.xlsx');
  await saveWorkbook(wb, canaryFile);
  // Loaded with recalculation and saved as ods; the ods's sheets as CSV, not recalculated again: the
  // CSV shows the results of the first load. (The CSV of the xlsx itself, recalculated, was byte for
  // byte the same on every sheet when both were made, December 2026, and cost a second recalculation.)
  const ods = convert([demoFile, canaryFile], 'ods', path.join(work, 'ods'));
  odsFile = ods.files.find((f) => path.basename(f) === 'sunpane-demo.ods')!;
  const conversion = convert(ods.files, CSV_ALL_SHEETS, path.join(work, 'csv'), { recalc: false });
  csvSheets = sheetsOf(conversion, 'sunpane-demo');
  canarySheets = sheetsOf(conversion, 'canary');
});

describe('the demo workbook in LibreOffice Calc', () => {
  it('finds LibreOffice installed and new enough to export every sheet as CSV (7.2 or later)', () => {
    const [major, minor] = sofficeVersion();
    expect(major * 100 + minor).toBeGreaterThanOrEqual(702);
  });

  it('recalculates formulas on load in the test profile: a wrong cached result is replaced', () => {
    expect([...canarySheets.keys()]).toEqual(['Canary']);
    expect(valueAt(canarySheets, 'Canary!A3')).toBe('5');
  });

  it('brings out every sheet of the workbook, in order', () => {
    expect(sheetNames).toEqual(['Contents', 'Overview', 'Schedule', 'Summary', 'Monthly', 'Options', 'Formulas', 'Heat map BW-S1', 'Year BW-S1', 'Hourly BW-S1']);
    expect([...csvSheets.keys()].sort()).toEqual([...sheetNames].sort());
  });

  it("computes the native formulas — SUM, MAX, savings, and the SUMIFS and SUMPRODUCT formulas over the hourly table that the pane writes too — to our core's values", () => {
    // Totals, per-window months, options, overview, and on the Year sheet the year, top month, peak,
    // 12 months and the 12 × 24 month × hour block.
    expect(allChecks().length).toBeGreaterThanOrEqual(3 + 2 * results.windows.length + results.options.length + 2 + 3 + 12 + 288);
    expectSameNumbers(csvSheets);
  });

  it('shows 8760 hourly rows and 365 heat-map days for the demo year', () => {
    // Title, note and caution, then the header and the hours.
    expect(readCsvRows(csvSheets.get('Hourly BW-S1')!).filter((r) => r.some((c) => c !== '')).length).toBe(3 + 1 + 8760);
    // Title, caution, a blank row, the header and the days.
    expect(readCsvRows(csvSheets.get('Heat map BW-S1')!).length).toBe(4 + 365);
  });

  it('leaves the SUNPANE formula cells as unknown functions without breaking anything else', () => {
    const rows = readCsvRows(csvSheets.get('Formulas')!);
    const formulaRows = rows.filter((r) => r[1]?.startsWith('=SUNPANE.'));
    expect(formulaRows.length).toBe(results.formulas.formulas.length);
    for (const r of formulaRows) {
      const name = /^=SUNPANE\.([A-Z]+)\(/.exec(r[1])?.[1] ?? '';
      expect(findFunction(name)).toBeDefined();
      expect(r[2]).toBe('#NAME?');
    }
  });

  it('keeps every sheet, table and the colour scale through its own xlsx writer, and every sheet and result through ods', async () => {
    // Shape only: no recalculation needed on this load.
    const xlsx = convert(demoFile, 'xlsx', path.join(work, 'roundtrip-xlsx'), { recalc: false }).files.find((f) => f.endsWith('.xlsx'))!;
    const [before, after] = [new ExcelJS.Workbook(), new ExcelJS.Workbook()];
    await before.xlsx.readFile(demoFile);
    await after.xlsx.readFile(xlsx);
    const shape = (wb: ExcelJS.Workbook) => wb.worksheets.map((w) => [w.name, w.getTables().length, (w as unknown as { conditionalFormattings: unknown[] }).conditionalFormattings.length]);
    expect(shape(after)).toEqual(shape(before));
    expect(shape(before).reduce((n, s) => n + (s[1] as number), 0)).toBe(9);

    // The ods written in beforeAll holds the results LibreOffice computed when it wrote it (it
    // recalculated on loading the xlsx); read back without recalculating, every sheet and result is there.
    expect(odsFile).toBeDefined();
    expect([...csvSheets.keys()].sort()).toEqual([...sheetNames].sort());
    expectSameNumbers(csvSheets);
  });

  it('renders the one-page sheets to PDF and the overview and heat map to PNG', () => {
    // Drawn from the cached results (no recalculation: about 4 s of CPU less), which the CSV test
    // above finds equal to LibreOffice's own; the SUNPANE cells show their cached values, as in Excel.
    const pdf = convert(demoFile, 'pdf:calc_pdf_Export:{"PageRange":{"type":"string","value":"1-8"}}', path.join(work, 'pdf'), { recalc: false }).files.find((f) => f.endsWith('.pdf'))!;
    fs.mkdirSync(ARTIFACTS, { recursive: true });
    fs.copyFileSync(pdf, path.join(ARTIFACTS, 'sunpane-demo-sheets.pdf'));
    const overview = pdfPageToPng(pdf, 1, path.join(ARTIFACTS, 'demo-overview'));
    const heat = pdfPageToPng(pdf, sheetNames.indexOf('Heat map BW-S1') + 1, path.join(ARTIFACTS, 'demo-heat-map'));
    for (const png of [overview, heat]) expect(fs.statSync(png).size).toBeGreaterThan(10_000);
  });
});
