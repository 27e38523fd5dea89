/**
 * The demo workbook on paper, as LibreOffice Calc prints it (outside program: Debian's
 * libreoffice-calc-nogui, PDF export; poppler-utils reads the PDF):
 * - without the hourly table (hidden, as a reader would leave it out), the whole workbook prints on
 *   at most 40 pages; the check fails above that;
 * - no number is clipped to ### and every printed sheet shows its caution sentence whole (text cut
 *   at the print area's edge would break it), and no text cell runs into a filled neighbour;
 * - the charts we write as DrawingML parts are drawn: the page of the shading options renders to
 *   PNG with pixels of the chart's series colour inside the chart (the plot area's bars).
 * PDF and PNG go to test-artifacts/libreoffice/ to be looked at.
 */
import { spawnSync } from 'node:child_process';
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { buildDemoWorkbook, computeDemo } from '../../src/cli/demo';
import { saveWorkbook, wrappedLines } from '../../src/cli/workbook';
import { CAUTION } from '../../src/outputs/caution';
import { PALETTE } from '../../src/outputs/palette';
import { convert } from './soffice';

const ARTIFACTS = path.join(__dirname, '..', '..', 'test-artifacts', 'libreoffice');
const PAGE_LIMIT = 40;

let work: string;
let pdf: string;
let printedSheets: string[];
let pageTexts: string[];
let workbook: ExcelJS.Workbook;

function tool(cmd: string, args: string[]): string {
  const r = spawnSync(cmd, args, { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  if (r.error) throw r.error;
  if (r.status !== 0) throw new Error(`${cmd} exited with ${r.status}: ${r.stderr}`);
  return r.stdout;
}

/** An RGB image from a PPM (P6) file. */
function readPpm(file: string): { width: number; height: number; rgb: Buffer } {
  const b = fs.readFileSync(file);
  const header: string[] = [];
  let i = 0;
  while (header.length < 4) {
    while (/\s/.test(String.fromCharCode(b[i]))) i++;
    if (b[i] === 0x23) {
      while (b[i] !== 0x0a) i++;
      continue;
    }
    let token = '';
    while (!/\s/.test(String.fromCharCode(b[i]))) token += String.fromCharCode(b[i++]);
    header.push(token);
  }
  if (header[0] !== 'P6' || header[3] !== '255') throw new Error(`${file} is not an 8-bit PPM`);
  return { width: Number(header[1]), height: Number(header[2]), rgb: b.subarray(i + 1) };
}

/** Pixels within `tolerance` of the colour `hex` on each channel, and their bounding box. */
function pixelsOf(img: { width: number; height: number; rgb: Buffer }, hex: string, tolerance = 28): { count: number; box: [number, number, number, number] } {
  const [r, g, b] = [0, 2, 4].map((k) => parseInt(hex.slice(k, k + 2), 16));
  let count = 0;
  const box: [number, number, number, number] = [Infinity, Infinity, -1, -1];
  for (let y = 0; y < img.height; y++) {
    for (let x = 0; x < img.width; x++) {
      const p = (y * img.width + x) * 3;
      if (Math.abs(img.rgb[p] - r) <= tolerance && Math.abs(img.rgb[p + 1] - g) <= tolerance && Math.abs(img.rgb[p + 2] - b) <= tolerance) {
        count++;
        box[0] = Math.min(box[0], x);
        box[1] = Math.min(box[1], y);
        box[2] = Math.max(box[2], x);
        box[3] = Math.max(box[3], y);
      }
    }
  }
  return { count, box };
}

beforeAll(async () => {
  work = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-print-'));
  const built = buildDemoWorkbook(computeDemo());
  workbook = built.workbook;
  // A reader prints the workbook without the hourly table (8760 rows): hide it.
  for (const ws of workbook.worksheets) if (ws.name.startsWith('Hourly')) ws.state = 'hidden';
  printedSheets = workbook.worksheets.filter((ws) => ws.state !== 'hidden').map((ws) => ws.name);
  const file = path.join(work, 'sunpane-demo.xlsx');
  await saveWorkbook(workbook, file, {}, built.charts);
  // The cached results are the core's (checked against LibreOffice's own in demo.test.ts): no recalculation needed to print.
  pdf = convert(file, 'pdf', path.join(work, 'pdf'), { recalc: false }).files.find((f) => f.endsWith('.pdf'))!;
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  fs.copyFileSync(pdf, path.join(ARTIFACTS, 'sunpane-demo-printed.pdf'));
  const pages = Number(/Pages:\s+(\d+)/.exec(tool('pdfinfo', [pdf]))?.[1]);
  // One pdftotext run for the whole file (one process, not one per page): it ends every page with a
  // form feed, so splitting there gives each page's text, and the count must be the page count.
  pageTexts = tool('pdftotext', ['-layout', pdf, '-']).split('\f').slice(0, -1);
  if (pageTexts.length !== pages) throw new Error(`pdftotext gave ${pageTexts.length} pages of text, pdfinfo counts ${pages}`);
});

describe('the demo workbook printed by LibreOffice', () => {
  test(`prints on at most ${PAGE_LIMIT} pages without the hourly table`, () => {
    expect(pageTexts.length).toBeGreaterThanOrEqual(printedSheets.length);
    expect(pageTexts.length).toBeLessThanOrEqual(PAGE_LIMIT);
  });

  test('clips no number (###) and shows each printed sheet its caution whole, once', () => {
    const all = pageTexts.join('\n');
    expect(all).not.toMatch(/###/);
    const cautions = all.split('\n').filter((line) => line.includes(CAUTION)).length;
    expect(cautions).toBe(printedSheets.length);
  });

  test('repeats the header row on every page of a sheet that runs over several pages', () => {
    const heatPages = pageTexts.filter((t) => /^\s*Day\s+1\s+2\s+3/m.test(t));
    expect(heatPages.length).toBeGreaterThan(1);
  });

  test('no text cell runs into a filled cell beside it, and no wrapped text needs more lines than its row has', () => {
    const problems: string[] = [];
    for (const ws of workbook.worksheets.filter((w) => w.state !== 'hidden')) {
      ws.eachRow((row) =>
        row.eachCell((cell) => {
          if (typeof cell.value !== 'string') return;
          if (cell.alignment?.wrapText) {
            // An 11 pt line is 15 points high (a row without a height of its own has one line).
            const lines = wrappedLines(cell.value, ws.getColumn(Number(cell.col)).width ?? 8.43, cell.font?.bold === true);
            if (lines * 15 > (row.height ?? 15) + 0.5) problems.push(`${ws.name}!${cell.address} "${cell.value}" needs ${lines} lines, its row is ${row.height ?? 15} pt`);
            return;
          }
          const next = row.getCell(Number(cell.col) + 1).value;
          if (next === null || next === undefined || next === '') return;
          const width = ws.getColumn(Number(cell.col)).width ?? 9;
          // A character of body text is about one width unit; bold header text a little more.
          if (cell.value.length * (cell.font?.bold ? 1.1 : 1) > width + 1) problems.push(`${ws.name}!${cell.address} "${cell.value}" (${cell.value.length} characters, column ${width})`);
        }),
      );
    }
    expect(problems).toEqual([]);
  });

  test('draws the DrawingML charts: the shading options page shows the series colour inside the chart', () => {
    const page = pageTexts.findIndex((t) => t.includes('outside shading options compared')) + 1;
    expect(page).toBeGreaterThan(0);
    const base = path.join(ARTIFACTS, 'demo-options-page');
    tool('pdftoppm', ['-r', '60', '-f', String(page), '-l', String(page), '-singlefile', pdf, base]);
    tool('pdftoppm', ['-png', '-r', '60', '-f', String(page), '-l', String(page), '-singlefile', pdf, base]);
    const img = readPpm(`${base}.ppm`);
    const bars = pixelsOf(img, PALETTE.series[0]);
    const second = pixelsOf(img, PALETTE.series[1]);
    // Bars of both windows' series: many pixels each, in a box well inside the page.
    expect(bars.count).toBeGreaterThan(400);
    expect(second.count).toBeGreaterThan(400);
    expect(bars.box[2] - bars.box[0]).toBeGreaterThan(40);
    expect(bars.box[0]).toBeGreaterThan(0);
    fs.rmSync(`${base}.ppm`);
  });

  test('the pixel check finds nothing on a page without a chart', () => {
    const page = pageTexts.findIndex((t) => t.includes('window schedule')) + 1;
    expect(page).toBeGreaterThan(0);
    const base = path.join(work, 'schedule-page');
    tool('pdftoppm', ['-r', '60', '-f', String(page), '-l', String(page), '-singlefile', pdf, base]);
    expect(pixelsOf(readPpm(`${base}.ppm`), PALETTE.series[0]).count).toBeLessThan(20);
  });
});
