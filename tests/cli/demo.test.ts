/**
 * `sunpane demo` and its workbook, read back with ExcelJS: the sheets it promises, real tables,
 * frozen headers, number formats, the heat map's colour scale, every native formula's cached result
 * equal to the formula worked out again from the cells it refers to, and every SUNPANE formula's
 * cached result equal to the registered function applied to the cells it refers to.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { COLOURS } from '../../src/cli/workbook';
import { CAUTION } from '../../src/outputs/caution';
import { HOURLY_HEADERS } from '../../src/outputs/hourlyColumns';
import { sheetsWithoutCaution } from '../support/caution';
import { applyFunction } from '../../src/registry/evaluate';
import { FUNCTIONS, findFunction } from '../../src/registry';
import { functionsMetadata } from '../../src/functions/metadata';
import { expectSaved, run, tempDir } from './run';
import { storedDifferences, storedWorkbook } from '../support/storedXlsx';

let dir: string;
let stdout: string;
let wb: ExcelJS.Workbook;

/** The address on the formula sheet of a reference: `$B$9`, or a defined name of one cell there. */
function cellOf(ref: string): string {
  if (/^\$?[A-Z]+\$?\d+$/.test(ref)) return ref.replace(/\$/g, '');
  const ranges = wb.definedNames.getRanges(ref).ranges;
  if (ranges.length !== 1) throw new Error(`no defined name ${ref}`);
  return ranges[0].split('!')[1].replace(/\$/g, '');
}

/** The number a cell holds (dates as 1900-system serials, formulas by their cached result). */
function numberOf(v: ExcelJS.CellValue): number {
  if (typeof v === 'number') return v;
  if (v instanceof Date) return v.getTime() / 86_400_000 + 25_569;
  if (v && typeof v === 'object' && 'formula' in v) {
    // ExcelJS 4.4 reads a cached 0 back as no result (the file does hold <v>0</v>).
    const result = (v as ExcelJS.CellFormulaValue).result;
    return result === undefined ? 0 : numberOf(result as ExcelJS.CellValue);
  }
  throw new Error(`not a number: ${JSON.stringify(v)}`);
}

function sheetOf(ref: string, here: ExcelJS.Worksheet): { ws: ExcelJS.Worksheet; range: string } {
  const m = /^(?:'((?:[^']|'')+)'|([A-Za-z]\w*))!(.+)$/.exec(ref);
  if (!m) return { ws: here, range: ref };
  const ws = wb.getWorksheet((m[1] ?? m[2]).replace(/''/g, "'"));
  if (!ws) throw new Error(`no sheet in ${ref}`);
  return { ws, range: m[3] };
}

function rangeValues(ref: string, here: ExcelJS.Worksheet): number[] {
  const { ws, range } = sheetOf(ref, here);
  const [a, b = a] = range.split(':');
  const from = ws.getCell(a);
  const to = ws.getCell(b);
  const out: number[] = [];
  for (let r = Number(from.row); r <= Number(to.row); r++) for (let c = Number(from.col); c <= Number(to.col); c++) out.push(numberOf(ws.getCell(r, c).value));
  return out;
}

/** Works a native formula out again from its cells: SUM(range), MAX(range), 1-A/B or A-1/48. */
function evaluateNative(formula: string, here: ExcelJS.Worksheet): number {
  const mid = /^([A-Z]+\d+)-1\/48$/.exec(formula);
  if (mid) return numberOf(here.getCell(mid[1]).value) - 1 / 48;
  const fn = /^(SUM|MAX)\((.+)\)$/.exec(formula);
  if (fn) {
    const xs = rangeValues(fn[2], here);
    return fn[1] === 'SUM' ? xs.reduce((s, x) => s + x, 0) : Math.max(...xs);
  }
  const ratio = /^1-([A-Z]+\d+)\/([A-Z]+\d+)$/.exec(formula);
  if (ratio) return 1 - numberOf(here.getCell(ratio[1]).value) / numberOf(here.getCell(ratio[2]).value);
  throw new Error(`unexpected native formula ${formula}`);
}

beforeAll(async () => {
  dir = tempDir('sunpane-demo-');
  const r = await run('demo', '--out', path.join(dir, 'nested', 'out'));
  if (r.code !== 0) throw new Error(`demo failed: ${r.err}`);
  stdout = r.out;
  wb = new ExcelJS.Workbook();
  await wb.xlsx.readFile(path.join(dir, 'nested', 'out', 'sunpane-demo.xlsx'));
});

describe('sunpane demo', () => {
  it('prints the building, gain per site and facing and the best shading option, as saved', () => {
    const lines = stdout.split('\n');
    expect(lines).toHaveLength(7);
    expect(lines[5]).toBe(`wrote ${path.join(dir, 'nested', 'out', 'sunpane-demo.xlsx')}`);
    expect(lines[6]).toBe(CAUTION);
    expectSaved('demo-summary.txt', lines.slice(0, 5).join('\n'));
  });

  it('states for each shading option the annual and peak gain under the earlier beam-only treatment and now, as the README does', () => {
    const ws = wb.getWorksheet('Options')!;
    let header = 0;
    ws.eachRow((row, r) => {
      if (header === 0 && row.getCell(2).value === 'Shading option') header = r;
    });
    const heads = (ws.getRow(header).values as ExcelJS.CellValue[]).map((v) => String(v ?? ''));
    const col = (h: string) => heads.indexOf(h);
    const rows: { tag: string; option: string; now: number; before: number; peak: number; peakBefore: number; diffuseCut: number }[] = [];
    for (let r = header + 1; r <= ws.rowCount && ws.getCell(r, 1).value; r++) {
      const at = (h: string) => numberOf(ws.getCell(r, col(h)).value);
      rows.push({
        tag: String(ws.getCell(r, 1).value),
        option: String(ws.getCell(r, 2).value),
        now: at('Annual gain (kWh)'),
        before: at('Annual gain, beam-only (kWh)'),
        peak: at('Peak gain (W)'),
        peakBefore: at('Peak gain, beam-only (W)'),
        diffuseCut: at('Diffuse cut (%)'),
      });
    }
    expect(rows).toHaveLength(8);
    for (const o of rows) {
      if (o.option === 'none') {
        expect(o.now).toBeCloseTo(o.before, 9); // nothing shades: both treatments agree
        expect(o.diffuseCut).toBe(0);
      } else {
        expect(o.now).toBeLessThan(o.before); // devices now cut the diffuse light too
        expect(o.peak).toBeLessThanOrEqual(o.peakBefore);
        expect(o.diffuseCut).toBeGreaterThan(0.05);
      }
    }
    // The README's table (rounded to whole kWh and W) is these numbers.
    const readme = fs.readFileSync(path.resolve(__dirname, '../../README.md'), 'utf8');
    for (const o of rows) {
      const line = readme.split('\n').find((l) => l.startsWith(`| ${o.tag} | ${o.option} |`));
      expect(line).toBe(`| ${o.tag} | ${o.option} | ${Math.round(o.before)} → ${Math.round(o.now)} | ${Math.round(o.peakBefore)} → ${Math.round(o.peak)} |`);
    }
  });

  it('carries the caution on every sheet', () => {
    expect(wb.worksheets.length).toBe(10);
    expect(sheetsWithoutCaution(wb)).toEqual([]);
    // The check fails on a sheet without it.
    const bare = new ExcelJS.Workbook();
    bare.addWorksheet('Bare').getCell('A1').value = 'no caution';
    expect(sheetsWithoutCaution(bare)).toEqual(['Bare']);
  });

  it('writes only the workbook into the (created) output folder', () => {
    expect(fs.readdirSync(path.join(dir, 'nested', 'out'))).toEqual(['sunpane-demo.xlsx']);
  });

  it('holds the schedule, summary, monthly, options, formula, heat-map, monthly-peak and hourly sheets', () => {
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Contents', 'Overview', 'Schedule', 'Summary', 'Monthly', 'Options', 'Formulas', 'Heat map BW-S1', 'Year BW-S1', 'Hourly BW-S1']);
  });

  it('puts its data in real tables with frozen header rows', () => {
    for (const ws of wb.worksheets) {
      if (ws.name.startsWith('Heat map')) continue;
      expect(ws.getTables().length).toBe(1);
    }
    for (const ws of wb.worksheets) expect(ws.views[0]).toMatchObject({ state: 'frozen' });
    expect(wb.getWorksheet('Summary')!.views[0]).toMatchObject({ ySplit: 4, xSplit: 1 });
  });

  it("gives the hourly sheet one row per hour of 2026, stamped at the hour's end with a date format", () => {
    const ws = wb.getWorksheet('Hourly BW-S1')!;
    // Title, note, caution, a blank row, then the table: header in row 5.
    expect(ws.rowCount).toBe(5 + 8760);
    expect(ws.getRow(5).values).toEqual([undefined, ...HOURLY_HEADERS]);
    // The header row of its table, found by the table's place (not by its words), is the one header
    // row of every hourly table: the pane's (tests/browser/pane.browser.test.ts reads it in the
    // browser and finds it HOURLY_HEADERS), the table command's CSV and workbook.
    const ref = (ws.getTables()[0] as unknown as { table: { tableRef: string } }).table.tableRef;
    const [first, last] = ref.split(':').map((a) => ws.getCell(a));
    const header = Array.from({ length: Number(last.col) - Number(first.col) + 1 }, (_, k) => ws.getRow(Number(first.row)).getCell(Number(first.col) + k).value);
    expect(header).toEqual([...HOURLY_HEADERS]);
    expect(numberOf(ws.getCell('A6').value)).toBeCloseTo(46023 + 1 / 24, 9); // 2026-01-01 01:00
    expect(numberOf(ws.getCell('A8765').value)).toBeCloseTo(46388, 9); // 2027-01-01 00:00
    expect(ws.getCell('A6').numFmt).toBe('yyyy-mm-dd hh:mm');
    expect(ws.getCell('M6').numFmt).toBe('#,##0');
  });

  it('colours the day × hour heat map with our own three-stop colour scale', () => {
    const ws = wb.getWorksheet('Heat map BW-S1')!;
    const cf = (ws as unknown as { conditionalFormattings: { ref: string; rules: { type: string; color: { argb: string }[] }[] }[] }).conditionalFormattings;
    expect(cf).toHaveLength(1);
    expect(cf[0].ref).toBe('B5:Y369');
    expect(cf[0].rules[0].type).toBe('colorScale');
    expect(cf[0].rules[0].color.map((c) => c.argb)).toEqual([COLOURS.heatLow, COLOURS.heatMid, COLOURS.heatHigh]);
  });

  it('caches every native formula result as the formula works out from its cells (relative 1e-12)', () => {
    let count = 0;
    for (const ws of wb.worksheets) {
      ws.eachRow((row) =>
        row.eachCell((cell) => {
          const v = cell.value as ExcelJS.CellFormulaValue;
          if (!v || typeof v !== 'object' || !('formula' in v) || v.formula.startsWith('_xldudf_SUNPANE_')) return;
          // Formulas over the hourly table (structured references: SUMIFS, SUMPRODUCT…) are
          // recalculated by LibreOffice against the core in tests/libreoffice/demo.test.ts.
          if (v.formula.includes('[[')) return;
          let expected: number;
          try {
            expected = evaluateNative(v.formula, ws);
          } catch (err) {
            throw new Error(`${ws.name}!${cell.address} ${v.formula}: ${(err as Error).message}`);
          }
          // ExcelJS 4.4 reads a cached 0 back as no result (the file does hold <v>0</v>).
          const cached = v.result === undefined ? 0 : numberOf(v.result as ExcelJS.CellValue);
          if (!(Math.abs(cached - expected) <= 1e-12 * Math.max(1, Math.abs(expected)))) throw new Error(`${ws.name}!${cell.address} ${v.formula}: cached ${cached}, from the cells ${expected}`);
          expect(Math.abs(cached - expected)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(expected)));
          count++;
        }),
      );
    }
    expect(count).toBeGreaterThan(40);
  });

  it('names every value cell of the formula sheet’s window block after its field, and the single-value formulas use the names', () => {
    const ws = wb.getWorksheet('Formulas')!;
    const names = ['latitude', 'longitude', 'utcOffset', 'surfaceAzimuth', 'width', 'height', 'shgc', 'tauB', 'tauD'];
    for (const name of names) {
      const ranges = wb.definedNames.getRanges(name).ranges;
      expect({ name, ranges: ranges.length }).toEqual({ name, ranges: 1 });
      expect(ranges[0]).toMatch(/^'?Formulas'?!\$B\$\d+$/);
      // The named cell holds a value and its row is labelled.
      expect(ws.getCell(cellOf(name)).value).not.toBeNull();
    }
    const incidence = (ws.getColumn(3).values as ExcelJS.CellValue[]).find((v) => typeof v === 'object' && v !== null && 'formula' in v && (v.formula ?? '').includes('INCIDENCEAT')) as ExcelJS.CellFormulaValue;
    expect(incidence.formula).toMatch(/^_xldudf_SUNPANE_INCIDENCEAT\(\$B\$\d+,latitude,longitude,utcOffset,surfaceAzimuth\)$/);
  });

  /** A cell as a function argument: numbers (dates as serials), texts as written, blanks as null. */
  function argCell(ws: ExcelJS.Worksheet, ref: string): number | string | null {
    const v = ws.getCell(ref).value;
    if (v === null || v === undefined || v === '') return null;
    if (typeof v === 'string') return v;
    return numberOf(v);
  }

  /** A range reference (`$A$9:$B$24`) as rows of argument cells. */
  function argRange(ws: ExcelJS.Worksheet, ref: string): (number | string | null)[][] {
    const [a, b] = ref.replace(/\$/g, '').split(':');
    const from = ws.getCell(a);
    const to = ws.getCell(b);
    const rows: (number | string | null)[][] = [];
    for (let r = Number(from.row); r <= Number(to.row); r++) {
      const line: (number | string | null)[] = [];
      for (let c = Number(from.col); c <= Number(to.col); c++) line.push(argCell(ws, ws.getCell(r, c).address));
      rows.push(line);
    }
    return rows;
  }

  /** One argument of a SUNPANE formula: blank, a cell, a range, or VSTACK of ranges. */
  function argOf(ws: ExcelJS.Worksheet, text: string): unknown {
    if (text === '') return null;
    const stack = /^_xlfn\.VSTACK\((.+)\)$/.exec(text);
    if (stack) return stack[1].split(',').flatMap((r) => argRange(ws, r));
    return text.includes(':') ? argRange(ws, text) : argCell(ws, cellOf(text));
  }

  /** Splits an argument list at top-level commas. */
  function splitArgs(list: string): string[] {
    const out: string[] = [];
    let depth = 0;
    let cur = '';
    for (const ch of list) {
      if (ch === ',' && depth === 0) {
        out.push(cur);
        cur = '';
        continue;
      }
      if (ch === '(') depth++;
      if (ch === ')') depth--;
      cur += ch;
    }
    out.push(cur);
    return out;
  }

  it.each(['Formulas', 'Schedule'])('caches every SUNPANE formula of the %s sheet as the registered function gives for the cells it refers to', (sheet) => {
    const registeredNames = new Set(functionsMetadata(FUNCTIONS, 'https://localhost:3000').functions.map((f) => f.name));
    const ws = wb.getWorksheet(sheet)!;
    let count = 0;
    ws.eachRow((row) =>
      row.eachCell((cell) => {
        const v = cell.value as ExcelJS.CellFormulaValue;
        if (!v || typeof v !== 'object' || !('formula' in v)) return;
        // Stored as Excel saves an add-in's custom function (docs/platform.md); never as plain SUNPANE.NAME text.
        expect(v.formula).not.toMatch(/SUNPANE\./);
        if (!v.formula.startsWith('_xldudf_SUNPANE_')) return; // a native formula (checked above)
        const m = /^_xldudf_SUNPANE_([A-Z]+)\((.*)\)$/.exec(v.formula)!;
        expect(m).not.toBeNull();
        // The stored name is the one the add-in's functions.json registers (namespace SUNPANE + name).
        expect(registeredNames.has(m[1])).toBe(true);
        const fn = findFunction(m[1]);
        expect(fn).toBeDefined();
        const table = applyFunction(fn!, splitArgs(m[2]).map((t) => argOf(ws, t)) as never[]);
        expect(typeof table[0][0]).toBe('number');
        // 1e-8: a cached time of day comes back through a millisecond Date (1 ms ≈ 1.2e-8 day).
        expect(Math.abs(numberOf(v.result as ExcelJS.CellValue) - (table[0][0] as number))).toBeLessThanOrEqual(1e-8);
        count++;
      }),
    );
    expect(count).toBeGreaterThanOrEqual(sheet === 'Schedule' ? 10 : 6);
  });

  it('gives every schedule row one short gain formula pointing at its own row and the header row', () => {
    const ws = wb.getWorksheet('Schedule')!;
    const formulas: { row: number; text: string }[] = [];
    ws.eachRow((row) => row.eachCell((cell) => {
      const v = cell.value as ExcelJS.CellFormulaValue;
      if (v && typeof v === 'object' && 'formula' in v && v.formula.startsWith('_xldudf_SUNPANE_')) formulas.push({ row: Number(cell.row), text: v.formula });
    }));
    expect(formulas).toHaveLength(10);
    for (const { row, text } of formulas) {
      // as typed in Excel: =SUNPANE.SOLARGAIN(VSTACK($A$7:$R$7,$A8:$R8),$E$5) — the header row 7, the design hour in E5
      expect(text).toMatch(new RegExp(`^_xldudf_SUNPANE_SOLARGAIN\\(_xlfn\\.VSTACK\\(\\$A\\$7:\\$[A-Z]+\\$7,\\$A${row}:\\$[A-Z]+${row}\\),\\$E\\$5\\)$`));
      expect(text.replace('_xldudf_SUNPANE_', 'SUNPANE.').replace('_xlfn.', '').length).toBeLessThan(55);
    }
  });

  it('--date-system 1904 writes the same demo in the 1904 date system: date-times 1462 days lower, the same results, the date-time functions given the clock', async () => {
    const other = tempDir('sunpane-demo-1904-');
    const r = await run('demo', '--out', other, '--date-system', '1904');
    expect(r.code).toBe(0);
    const a = await storedWorkbook(path.join(dir, 'nested', 'out', 'sunpane-demo.xlsx'));
    const b = await storedWorkbook(path.join(other, 'sunpane-demo.xlsx'));
    expect(a.workbook).not.toMatch(/date1904/);
    expect(b.workbook).toMatch(/<workbookPr[^>]*date1904="1"/);
    const lower = (d: { a?: string; b?: string }) => Math.abs(Number(d.a) - Number(d.b) - 1462) < 1e-8;
    const clocked: string[] = [];
    const withClock = (x?: string) => (x ?? '').replace(/,+\$[A-Z]+\$\d+:\$[A-Z]+\$\d+\)$/, ')');
    const wrong = storedDifferences(a, b).filter((d) => {
      if (d.fa === undefined && d.fb === undefined && /^=SUNPANE\./.test(d.a ?? '')) return withClock(d.b) !== d.a || d.b === d.a; // the formula's text, shown beside it
      if (d.fa === d.fb) return !lower(d); // a date-time cell or a native formula giving one
      // A Sunpane function that reads a date-time: the same call with the clock range as its last argument,
      // and the same result (a date-time result 1462 days lower).
      const clock = /,(\$[A-Z]+\$\d+:\$[A-Z]+\$\d+)\)$/.exec(d.fb ?? '');
      if (!clock || withClock(d.fb) !== d.fa) return true;
      clocked.push(d.at);
      return !(d.a === d.b || lower(d));
    });
    expect(wrong).toEqual([]);
    // Ten schedule rows (SOLARGAIN) and the formula sheet's date-time functions (SOLARGAIN, sun altitude and azimuth, sunrise, sunset, incidence).
    expect(clocked.filter((at) => at.startsWith('Schedule!'))).toHaveLength(10);
    expect(clocked.filter((at) => at.startsWith('Formulas!'))).toHaveLength(6);
    // The clock ranges say 1904 in the glossary's words, where the formulas point.
    expect(b.sheets.get('Formulas')!.get('A9')).toMatchObject({ v: 'Date system' });
    expect(b.sheets.get('Formulas')!.get('B9')).toMatchObject({ v: '1904' });
    fs.rmSync(other, { recursive: true, force: true });
  });
});
