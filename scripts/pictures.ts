/**
 * `npm run pictures`: the README's pictures, made from the real program (not part of `npm test`).
 *
 * - docs/images/pane-window.png, docs/images/pane-sunpath.png: the BUILT task pane (dist/) in
 *   headless Chromium at the width of a task pane (350 px), with office.js replaced by the browser
 *   tests' stand-in Excel host, after entering an invented window at an example site;
 * - docs/images/demo-options.png: the Options sheet of the demo workbook (`sunpane demo`), printed
 *   to PDF by LibreOffice headless (the other sheets hidden for the print; its bar chart is
 *   drawn from the DrawingML parts the workbook writer adds) and rasterised with pdftoppm.
 *
 * Needs what the tests need: `npm run build` and `npm run build:cli` first (the npm script does
 * both), Debian's chromium, soffice and pdftoppm. Each picture must stay under 200 KB.
 */
import { execFileSync } from 'node:child_process';
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import { buildDemoWorkbook, computeDemo } from '../src/cli/demo';
import { saveWorkbook } from '../src/cli/workbook';
import { launchBrowser, openAddinPage } from '../tests/browser/chromium';
import { convert } from '../tests/libreoffice/soffice';

const ROOT = path.resolve(__dirname, '..');
const IMAGES = path.join(ROOT, 'docs', 'images');
const MAX_BYTES = 200 * 1024;
const PANE_WIDTH = 350;
const WORKBOOK_SHEET = 'Options';
/** Resolution of the workbook picture [dots per inch]. */
const DPI = 96;

function checkSize(file: string): void {
  const bytes = fs.statSync(file).size;
  if (bytes > MAX_BYTES) throw new Error(`${path.relative(ROOT, file)} is ${bytes} bytes: more than ${MAX_BYTES}`);
  console.log(`${path.relative(ROOT, file)}: ${bytes} bytes`);
}

async function panePictures(): Promise<void> {
  const hostJs = fs.readFileSync(path.join(ROOT, 'tests', 'browser', 'excel-host.js'), 'utf8');
  const browser = await launchBrowser();
  try {
    const page = await openAddinPage(browser, hostJs);
    await page.setViewportSize({ width: PANE_WIDTH, height: 820 });
    await page.waitForSelector('#run-year');
    // An invented west-facing window with an overhang and a fin, at one of the example sites.
    await page.selectOption('#examplePlace', 'saltReach');
    const fields: [string, string][] = [
      ['name', 'Studio west'],
      ['surfaceAzimuth', '250'],
      ['width', '2.4'],
      ['height', '1.6'],
      ['overhangProjection', '0.8'],
      ['overhangGap', '0.3'],
      ['rightFinProjection', '0.5'],
    ];
    for (const [id, value] of fields) await page.fill(`#${id}`, value);
    await page.evaluate(() => {
      (document.activeElement as HTMLElement | null)?.blur();
      window.scrollTo(0, 0);
    });
    await page.screenshot({ path: path.join(IMAGES, 'pane-window.png') });
    await page.click('#tab-sunpath');
    await page.waitForSelector('#panel-sunpath svg', { timeout: 60_000 });
    await page.waitForTimeout(500);
    await page.screenshot({ path: path.join(IMAGES, 'pane-sunpath.png') });
    await page.close();
  } finally {
    await browser.close();
  }
}

async function workbookPicture(): Promise<void> {
  const work = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-pictures-'));
  try {
    // The demo workbook as `sunpane demo` builds it, charts included, with the other sheets hidden.
    const built = buildDemoWorkbook(computeDemo());
    const book = built.workbook;
    if (!book.getWorksheet(WORKBOOK_SHEET)) throw new Error(`the demo workbook has no sheet ${WORKBOOK_SHEET}`);
    for (const sheet of book.worksheets) if (sheet.name !== WORKBOOK_SHEET) sheet.state = 'hidden';
    book.views = [{ x: 0, y: 0, width: 10000, height: 20000, firstSheet: 0, activeTab: book.worksheets.findIndex((s) => s.name === WORKBOOK_SHEET), visibility: 'visible' }];
    const single = path.join(work, 'options.xlsx');
    await saveWorkbook(book, single, {}, built.charts);
    const pdfDir = path.join(work, 'pdf');
    const pdf = convert(single, 'pdf', pdfDir).files.find((f) => f.endsWith('.pdf'));
    if (!pdf) throw new Error('LibreOffice wrote no PDF');
    // Crop the page to the printed table: the words' bounding boxes (pdftotext -bbox, in points) plus a margin.
    // The page footer (sheet name, page number) is left out.
    const bbox = execFileSync('pdftotext', ['-bbox', '-f', '1', '-l', '1', pdf, '-'], { encoding: 'utf8' });
    const pageHeight = Number(/<page width="[\d.]+" height="([\d.]+)"/.exec(bbox)?.[1] ?? 842);
    const boxes = [...bbox.matchAll(/xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)"/g)].map((m) => m.slice(1, 5).map(Number)).filter((b) => b[1] < pageHeight - 50);
    if (boxes.length === 0) throw new Error('the printed sheet has no text');
    const margin = 12;
    const scale = DPI / 72;
    const [x0, y0] = [Math.max(0, Math.min(...boxes.map((b) => b[0])) - margin), Math.max(0, Math.min(...boxes.map((b) => b[1])) - margin)];
    const [x1, y1] = [Math.max(...boxes.map((b) => b[2])) + margin, Math.max(...boxes.map((b) => b[3])) + margin];
    const crop = [x0, y0, x1 - x0, y1 - y0].map((v) => String(Math.round(v * scale)));
    const base = path.join(work, 'options');
    execFileSync('pdftoppm', ['-png', '-r', String(DPI), '-f', '1', '-l', '1', '-x', crop[0], '-y', crop[1], '-W', crop[2], '-H', crop[3], '-singlefile', pdf, base]);
    fs.copyFileSync(`${base}.png`, path.join(IMAGES, 'demo-options.png'));
  } finally {
    fs.rmSync(work, { recursive: true, force: true });
  }
}

async function main(): Promise<void> {
  fs.mkdirSync(IMAGES, { recursive: true });
  await panePictures();
  await workbookPicture();
  for (const name of ['pane-window.png', 'pane-sunpath.png', 'demo-options.png']) checkSize(path.join(IMAGES, name));
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
