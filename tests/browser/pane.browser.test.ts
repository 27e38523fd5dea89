/**
 * The task pane, built (dist/taskpane.html from `npm run build`), in headless Chromium, with
 * office.js replaced by our fake Excel host (tests/browser/excel-host.js: records every call,
 * refuses requests over 5 MB and bad sheet names).
 *
 * Expected numbers come from the calculation core run here in node on a WindowSpec written out in
 * this file (not built by the pane's code), so the checks are of the pane's plumbing: what it asks
 * the core and what it writes. Screenshots go to test-artifacts/.
 */
import * as fs from 'node:fs';
import * as os from 'node:os';
import ExcelJS from 'exceljs';
import { run } from '../cli/run';
import * as path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { annualSeries } from '../../src/core/gain/annual';
import { summarizeAnnual } from '../../src/core/gain/annualSummary';
import { inGlossaryWords } from '../../src/registry/windowRange';
import { SunpaneError } from '../../src/core/common/errors';
import type { WindowSpec } from '../../src/core/gain/window';
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { EXAMPLE_SITES } from '../../src/demo/sites';
import { CAUTION } from '../../src/outputs/caution';
import { HOURLY_HEADERS } from '../../src/outputs/hourlyColumns';
import { monthHourMeanFormula, monthlyGainFormula, tableColumnRef, yearFigureFormulas } from '../../src/outputs/hourlyFormulas';
import { inUserWords } from '../../src/taskpane/messages';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import { LOAD_WORDS } from '../../src/registry/glossary';
import type { RawArg } from '../../src/registry/types';
import { launchBrowser, openAddinPage } from './chromium';

const HOST_JS = fs.readFileSync(path.join(__dirname, 'excel-host.js'), 'utf8');
const ARTIFACTS = path.resolve(__dirname, '../../test-artifacts');
const YEAR = 2025;

type Cell = string | number | boolean;

let browser: Browser;
/** The pane's hourly header row, as read from its sheet by the year test (compared with the CLI's). */
let paneHourlyHeader: string[] | undefined;

beforeAll(async () => {
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function openPane(settings?: unknown, options: { dateSystem?: 1904 } = {}): Promise<Page> {
  const preset = settings || options.dateSystem ? `window.__excelHostOptions = ${JSON.stringify({ ...(settings ? { settings } : {}), ...options })};\n` : '';
  const page = await openAddinPage(browser, preset + HOST_JS);
  await page.setViewportSize({ width: 420, height: 900 });
  await page.waitForSelector('#run-year');
  return page;
}

/** True when the caution is one of the first six rows of column A of a sheet the pane wrote. */
async function cautionRows(page: Page, sheet: string): Promise<boolean> {
  const column = await host.read(page, sheet, 'A1:A6');
  return column.some((r) => r[0] === CAUTION);
}

async function setField(page: Page, id: string, value: string): Promise<void> {
  await page.fill(`#${id}`, value);
}

/**
 * Presses a run button with the status line emptied first, so that a wait for this run's words
 * cannot be met by the previous run's status (a bad option after a comparison that "Wrote … options"
 * once passed `waitForStatus(page, /option/)` before the pane had checked anything).
 */
async function startRun(page: Page, button: string): Promise<void> {
  await page.evaluate(() => {
    document.getElementById('status')!.textContent = '';
  });
  await page.click(button);
}

/**
 * The message beside a box once the form's live check (250 ms after the last edit) has said words
 * containing `expected`, or what it says after 10 s. When a test fills two boxes, a check can run
 * between the two fills (a busy machine) and show a message about the half-edited form; waiting only
 * for a non-empty message would read that one.
 */
async function settledMessage(page: Page, id: string, expected: string): Promise<string | null> {
  await page
    .waitForFunction(([box, words]) => (document.getElementById(`${box}-msg`)?.textContent ?? '').includes(words), [id, expected] as const, { timeout: 10_000 })
    .catch(() => undefined);
  return page.textContent(`#${id}-msg`);
}

async function waitForStatus(page: Page, pattern: RegExp): Promise<string> {
  await page.waitForFunction((src) => new RegExp(src).test(document.getElementById('status')?.textContent ?? ''), pattern.source, { timeout: 90_000 });
  return (await page.textContent('#status')) ?? '';
}

type HostWindow = { __excelHost: { read(s: string, a: string): Cell[][]; addUserSheet(n: string, v: unknown[][]): void } };

const host = {
  sheetNames: (page: Page) => page.evaluate(() => (window as never as { __excelHost: { sheetNames(): string[] } }).__excelHost.sheetNames()),
  /**
   * Cell values of an A1 range of a sheet, as the stand-in holds them. A range of plain cells (text,
   * TRUE/FALSE, blank, finite numbers other than -0) crosses from the page as one JSON text, which
   * gives back exactly those values: the 8760 hourly rows of a year took about 6 s as Playwright's
   * value-by-value transfer and take a fraction of a second so. Any other cell (NaN, Infinity, -0,
   * undefined, an object) sends the range the value-by-value way, which keeps it as it is.
   */
  read: async (page: Page, sheet: string, address: string): Promise<Cell[][]> => {
    const json = await page.evaluate(([s, a]) => {
      const rows = (window as never as HostWindow).__excelHost.read(s, a);
      const plain = (v: unknown) => v === null || typeof v === 'string' || typeof v === 'boolean' || (typeof v === 'number' && Number.isFinite(v) && !Object.is(v, -0));
      return rows.every((r) => r.every(plain)) ? JSON.stringify(rows) : undefined;
    }, [sheet, address] as const);
    if (json !== undefined) return JSON.parse(json) as Cell[][];
    return page.evaluate(([s, a]) => (window as never as HostWindow).__excelHost.read(s, a), [sheet, address] as const);
  },
  /** A sheet of the user's, given as its rows of text and finite numbers (sent as one JSON text, see `read`). */
  addUserSheet: (page: Page, name: string, rows: (string | number)[][]) => {
    if (!rows.every((r) => r.every((v) => typeof v === 'string' || Number.isFinite(v)))) throw new Error(`addUserSheet ${name}: only text and finite numbers`);
    return page.evaluate(([n, json]) => (window as never as HostWindow).__excelHost.addUserSheet(n, JSON.parse(json)), [name, JSON.stringify(rows)] as const);
  },
  eval: <T>(page: Page, fn: string) => page.evaluate(`(function (host) { return ${fn}; })(window.__excelHost)`) as Promise<T>,
};

/**
 * The reference for the pane's load figures: the year's largest hourly cooling load and its stamp
 * from the worksheet function SOLARGAINYEAR (quantities stamp and load), evaluated through the
 * registry as a cell would, over the hours with weather (#N/A elsewhere), the first hour on ties.
 */
function registryYearPeakLoad(fields: Record<string, number | string>): { peakW: number; stamp: number } {
  const out = applyFunction(findFunction('SOLARGAINYEAR')!, [Object.entries(fields) as RawArg, [['stamp', 'load']]]) as [number, unknown][];
  let best = { peakW: 0, stamp: out[0][0] };
  for (const [stamp, load] of out) if (typeof load === 'number' && load > best.peakW) best = { peakW: load, stamp };
  return best;
}

/** The pane's default window (the form as it opens), as a window range's fields, with the year of these tests. */
const FORM_WINDOW: Record<string, number | string> = {
  name: 'Window A', year: YEAR, latitude: 52.2, longitude: 4.9, utcOffset: 1, elevation: 0, surfaceAzimuth: 180, surfaceTilt: 90, width: 1.8, height: 1.5,
  frameFraction: 0.15, shgc: 0.4, panes: 2, interiorAttenuation: 1, groundAlbedo: 0.2, skyModel: 'perez1990', linkeTurbidity: 3,
};

/** The demo window: an invented west-facing window at the "Salt Reach (example)" site with an overhang and a right fin. */
const SALT = EXAMPLE_SITES.find((s) => s.id === 'saltReach')!;
const DEMO: WindowSpec = {
  name: 'Demo west',
  site: { latitude: SALT.site.latitude, longitude: SALT.site.longitude, utcOffset: SALT.site.utcOffset, elevation: SALT.site.elevation },
  surfaceAzimuth: 250,
  surfaceTilt: 90,
  width: 2.4,
  height: 1.6,
  frameFraction: 0.15,
  glazing: { shgc: 0.4, panes: 2, interiorAttenuation: 1 },
  shading: {
    overhang: { projection: 0.8, gap: 0.3, extensionLeft: 0.4, extensionRight: 0.4 },
    rightFin: { projection: 0.5, gap: 0.1, extensionAbove: 0, extensionBelow: 0 },
  },
  groundAlbedo: SALT.groundAlbedo,
  skyModel: 'perez1990',
  weather: { kind: 'ineichenClearSky', linkeTurbidity: [...SALT.linkeTurbidity] },
  year: YEAR,
};

async function enterDemoWindow(page: Page): Promise<void> {
  await page.selectOption('#examplePlace', 'saltReach');
  await setField(page, 'name', 'Demo west');
  await setField(page, 'surfaceAzimuth', '250');
  await setField(page, 'width', '2.4');
  await setField(page, 'height', '1.6');
  await setField(page, 'overhangProjection', '0.8');
  await setField(page, 'overhangGap', '0.3');
  await setField(page, 'overhangExtensionLeft', '0.4');
  await setField(page, 'overhangExtensionRight', '0.4');
  await setField(page, 'rightFinProjection', '0.5');
  await setField(page, 'rightFinGap', '0.1');
  await setField(page, 'year', String(YEAR));
}

describe('the task pane in Chromium with a fake Excel host', () => {
  test('the pane shows the caution, and every box and button can be reached by keyboard and has a label', async () => {
    const page = await openPane();
    expect(await page.textContent('#caution')).toBe(CAUTION);
    const unlabelled = await page.evaluate(() =>
      Array.from(document.querySelectorAll('input, select')).filter((el) => !document.querySelector(`label[for="${el.id}"]`)).map((el) => el.id || el.outerHTML),
    );
    expect(unlabelled).toEqual([]);
    const unreachable = await page.evaluate(() => Array.from(document.querySelectorAll<HTMLElement>('#panel-window input, #panel-window select, #panel-window button')).filter((el) => el.tabIndex < 0).length);
    expect(unreachable).toBe(0);
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-window.png'), fullPage: true });
    await page.close();
  });

  test("the demo window's year is written to a new sheet in blocks under 5 MB, and matches the core", async () => {
    const page = await openPane();
    await enterDemoWindow(page);
    await startRun(page, '#run-year');
    const status = await waitForStatus(page, /Wrote|refused|Fix|Stopped/);
    expect(status).toMatch(/^Wrote "Demo west hourly"/);

    const series = annualSeries(DEMO);
    const summary = summarizeAnnual(series);
    // The annual summary gives the diffuse cut beside the beam cut (the core's numbers).
    expect(status).toContain(`shading takes ${(summary.beamCut * 100).toFixed(0)} % of the beam and ${(summary.diffuseCut * 100).toFixed(0)} % of the diffuse light`);
    expect(series.hours).toBe(8760);

    // Header row 5, hourly rows 6…8765 (columns A…N), in a table named after the window.
    const tableAt = (await host.eval<{ name: string; address: string }[]>(page, 'host.tables()')).find((t) => t.name === 'Demo_west_hourly')!.address;
    const header = await host.read(page, 'Demo west hourly', tableAt.replace(/:([A-Z]+)\d+$/, ':$15').replace(/^([A-Z]+)\d+/, '$15'));
    paneHourlyHeader = header[0] as string[];
    expect(header[0]).toEqual([...HOURLY_HEADERS]);
    const rows = await host.read(page, 'Demo west hourly', 'A6:N8765');
    expect(rows).toHaveLength(8760);
    expect(await host.read(page, 'Demo west hourly', 'A8766:A8766')).toEqual([['']]);
    for (const i of [0, 11, 2000, 4380 + 15, 5000, 8759]) {
      expect(rows[i][0] as number).toBeCloseTo(series.stampSerial[i], 5);
      expect(rows[i][1] as number).toBeCloseTo(series.sunAltitude[i], 2);
      expect(rows[i][2] as number).toBeCloseTo(series.sunAzimuth[i], 2);
      expect(rows[i][5] as number).toBeCloseTo(series.sunlitFraction[i], 3);
      expect(rows[i][6] as number).toBeCloseTo(series.dni[i], 1);
      expect(rows[i][11] as number).toBeCloseTo(series.shgc[i], 3);
      expect(Math.abs((rows[i][12] as number) - series.gain[i])).toBeLessThanOrEqual(0.05 + 1e-9);
    }
    // An afternoon hour with the sun on this west window is partly shaded by the overhang.
    const afternoon = rows.findIndex((r) => (r[5] as number) > 0 && (r[5] as number) < 1);
    expect(afternoon).toBeGreaterThan(-1);
    const columnSum = rows.reduce((s, r) => s + (r[12] as number), 0) / 1000;
    expect(Math.abs(columnSum - summary.annualKWh)).toBeLessThan(0.5);

    // Monthly summary in P5:R18 and the key figures: formulas over the table, the very text that
    // LibreOffice recalculates to the core's values in the demo workbook (tests/libreoffice).
    const ref = tableColumnRef('Demo_west_hourly');
    const monthly = await host.read(page, 'Demo west hourly', 'P5:R18');
    expect(monthly[0]).toEqual(['Month', 'Solar gain (kWh)', 'Per glass area (kWh/m²)']);
    for (let m = 0; m < 12; m++) expect(monthly[m + 1][1]).toBe(`=${monthlyGainFormula(ref, YEAR, m + 1)}`);
    expect(monthly[13]).toEqual(['Year', '=SUM(Q6:Q17)', '=IF($Q$25>0,Q18/$Q$25,0)']);
    const keys = await host.read(page, 'Demo west hourly', 'P20:Q25');
    expect(keys[0]).toEqual(['Peak gain (W)', `=${yearFigureFormulas(ref).peakW}`]);
    expect(keys[1]).toEqual(['Peak at (hour ending)', `=${yearFigureFormulas(ref).peakStamp}`]);
    expect(keys[5][0]).toBe('Glass area (m²)');
    expect(keys[5][1] as number).toBeCloseTo(series.glassArea, 3);
    const cuts = await host.read(page, 'Demo west hourly', 'P26:Q27');
    expect(cuts).toEqual([
      ['Beam cut by shading (%)', Math.round(summary.beamCut * 100 * 10) / 10],
      ['Diffuse cut by shading (%)', Math.round(summary.diffuseCut * 100 * 10) / 10],
    ]);

    // Month × hour block of mean gain, T5:AR17, formulas too.
    const block = await host.read(page, 'Demo west hourly', 'T5:AR17');
    expect(block[0][0]).toBe('Month');
    expect(block[6][16]).toBe(`=${monthHourMeanFormula(ref, YEAR, 6, 16)}`);

    // The host's record: blocks of ≤ 2,000 rows, each request under 5 MB, a table, a chart, a colour scale, frozen header.
    const syncs = await host.eval<{ bytes: number; valueRows: number[]; refused?: boolean }[]>(page, 'host.state.syncs');
    expect(syncs.every((s) => !s.refused && s.bytes < 5 * 1024 * 1024)).toBe(true);
    const blockRows = syncs.flatMap((s) => s.valueRows).filter((n) => n >= 1000);
    expect(blockRows.reduce((a, b) => a + b, 0)).toBe(8760);
    expect(Math.max(...blockRows)).toBeLessThanOrEqual(2000);
    const tables = await host.eval<{ name: string; sheet: string; address: string }[]>(page, 'host.tables()');
    expect(tables).toEqual([expect.objectContaining({ name: 'Demo_west_hourly', sheet: 'Demo west hourly', address: 'A5:N8765' })]);
    const charts = await host.eval<{ type: string; source: string; title: string }[]>(page, 'host.charts("Demo west hourly")');
    expect(charts).toEqual([expect.objectContaining({ type: 'ColumnClustered', source: 'P5:Q17', title: 'Annual profile: solar gain by month (kWh)' })]);
    const cfs = await host.eval<{ type: string; address: string; criteria: { minimum: { color: string } } }[]>(page, 'host.conditionalFormats("Demo west hourly")');
    expect(cfs).toEqual([expect.objectContaining({ type: 'ColorScale', address: 'U6:AR17' })]);
    expect(cfs[0].criteria.minimum.color).toBe('#F7F3E8');
    expect(await cautionRows(page, 'Demo west hourly')).toBe(true);
    expect(await host.eval<number>(page, 'host.sheet("Demo west hourly").frozenRows')).toBe(5);
    const calls = await host.eval<{ op: string }[]>(page, 'host.state.calls');
    expect(calls.some((c) => c.op === 'suspendApiCalculationUntilNextSync')).toBe(true);
    await page.close();
  });

  // The demo workbook's hourly table header, found the same way, is HOURLY_HEADERS too, which the
  // previous test finds the pane's header to be: tests/cli/demo.test.ts, which reads the demo's file
  // already (the demo made again here cost this file about 3 s).
  test('the hourly table has one header row — the same words, order and units — in the pane, the CSV and the workbook', async () => {
    if (!paneHourlyHeader) throw new Error("the pane's header row is read by the previous test, which did not get that far");
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-headers-'));
    const windowFile = path.join(__dirname, '..', '..', 'examples', 'east-office.json');
    expect((await run('table', '--window', windowFile, '--out', path.join(dir, 'east.csv'))).code).toBe(0);
    const csvHeader = fs.readFileSync(path.join(dir, 'east.csv'), 'utf8').split('\n')[0].split(',');
    expect((await run('table', '--window', windowFile, '--out', path.join(dir, 'east.xlsx'))).code).toBe(0);
    /** The header row of the hourly table (found by its place in the file, not by its words). */
    const xlsxHeader = async (file: string, sheet: string) => {
      const wb = new ExcelJS.Workbook();
      await wb.xlsx.readFile(file);
      const ws = wb.getWorksheet(sheet)!;
      const ref = (ws.getTables()[0] as unknown as { table: { tableRef: string } }).table.tableRef;
      const [first, last] = ref.split(':').map((a) => ws.getCell(a));
      const row = ws.getRow(Number(first.row));
      return Array.from({ length: Number(last.col) - Number(first.col) + 1 }, (_, k) => row.getCell(Number(first.col) + k).value);
    };
    const workbookHeader = await xlsxHeader(path.join(dir, 'east.xlsx'), 'Hourly');
    expect(paneHourlyHeader.length).toBe(14);
    expect({ csv: csvHeader, workbook: workbookHeader }).toEqual({ csv: paneHourlyHeader, workbook: paneHourlyHeader });
  });

  test('an earlier result sheet is never overwritten without asking, and a user sheet of the same name is left alone', async () => {
    const page = await openPane();
    await setField(page, 'year', String(YEAR));
    await page.evaluate(() => (window as never as { __excelHost: { addUserSheet(n: string, v: unknown[][]): void } }).__excelHost.addUserSheet('Window A hourly', [['my own notes', 42]]));
    const before = await host.eval<string>(page, 'host.snapshot("Window A hourly")');

    await startRun(page, '#run-year');
    await waitForStatus(page, /^Wrote/);
    // The user's sheet kept its name and cells; ours got a free variant, remembered as ours.
    expect(await host.sheetNames(page)).toEqual(['Window A hourly', 'Window A hourly (2)']);
    expect(await host.eval<string>(page, 'host.snapshot("Window A hourly")')).toBe(before);

    // Running again proposes "Window A hourly" again — taken by the user's sheet → another free name, no question.
    await startRun(page, '#run-year');
    await waitForStatus(page, /Wrote "Window A hourly \(3\)"/);
    expect(await page.isHidden('#confirm-backdrop')).toBe(true);

    // Rename the window so that its proposed sheet is one of ours: the pane asks first.
    await setField(page, 'name', 'Window A B');
    await startRun(page, '#run-year');
    await waitForStatus(page, /Wrote "Window A B hourly"/);
    await startRun(page, '#run-year');
    await page.waitForSelector('#confirm-backdrop:not([hidden])');
    expect(await page.textContent('#confirm-text')).toContain('"Window A B hourly" holds an earlier Sunpane result');
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-confirm.png') });
    await page.click('#confirm-cancel');
    expect(await waitForStatus(page, /Stopped/)).toBe('Stopped: the earlier result sheet was kept and nothing was written.');
    const namesAfterCancel = await host.sheetNames(page);
    expect(namesAfterCancel).toEqual(['Window A hourly', 'Window A hourly (2)', 'Window A hourly (3)', 'Window A B hourly']);

    await startRun(page, '#run-year');
    await page.waitForSelector('#confirm-backdrop:not([hidden])');
    await page.click('#confirm-keep');
    await waitForStatus(page, /Wrote "Window A B hourly \(2\)"/);

    await startRun(page, '#run-year');
    await page.waitForSelector('#confirm-backdrop:not([hidden])');
    // The safe choice has the focus: Enter keeps both.
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('confirm-keep');
    await page.keyboard.press('Enter');
    await waitForStatus(page, /Wrote "Window A B hourly \(3\)"/);
    expect((await host.sheetNames(page)).filter((n) => n.startsWith('Window A B'))).toHaveLength(3);

    // Replacing takes a deliberate move: Tab to "Replace it" (focus stays inside the dialog), then Enter.
    await startRun(page, '#run-year');
    await page.waitForSelector('#confirm-backdrop:not([hidden])');
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('confirm-replace');
    await page.keyboard.press('Enter');
    await waitForStatus(page, /Wrote "Window A B hourly"/);
    expect((await host.sheetNames(page)).filter((n) => n.startsWith('Window A B'))).toHaveLength(3);
    await page.close();
  });

  test('a schedule table runs every window into one summary row each, and a bad table names the row and column and writes nothing', async () => {
    const page = await openPane();
    await setField(page, 'year', String(YEAR));
    await page.evaluate(() => {
      const h = (window as never as { __excelHost: { addUserSheet(n: string, v: unknown[][]): void; addUserTable(s: string, a: string, n: string): void } }).__excelHost;
      h.addUserSheet('Windows', [
        ['Window', 'Faces (°)', 'Width [m]', 'Height [m]', 'SHGC', 'Overhang depth (m)', 'Overhang gap'],
        ['N1', 0, 1.2, 1.5, 0.4, 0, 0],
        ['E1', 90, 1.8, 1.5, 0.35, 0.6, 0.2],
        ['W1', 270, 1.8, 1.5, '', 0.6, 0.2],
        [], [], [], [], [], [], [],
        ['Window', 'Faces', 'Width', 'Height', 'SHGC', 'Overhang depth', 'Overhang gap'],
        ['Bad A', 180, '', 1.5, 0.4, 0, 0],
        ['Bad B', 180, 1.2, 1.5, 1.4, 0, 0],
      ]);
      h.addUserTable('Windows', 'A1:G4', 'WindowList');
      h.addUserTable('Windows', 'A12:G14', 'BadList');
    });
    await page.click('#tab-schedule');
    expect(await page.textContent('#schedule-help')).toContain('Overhang projection [m]');
    await startRun(page, '#run-schedule');
    await waitForStatus(page, /Wrote|problem/);
    const rows = await host.read(page, 'Schedule results', 'A6:I9');
    expect(rows[0]).toEqual(['Window', 'Faces (°)', 'Glass area (m²)', 'Solar gain (kWh/yr)', 'Per glass area (kWh/m²·yr)', 'Peak gain (W)', 'Peak at (hour ending)', 'Mean sunlit fraction, sun on the wall (0-1)', 'Weather missing (h)']);
    expect(await cautionRows(page, 'Schedule results')).toBe(true);
    expect(await host.eval<{ name: string }[]>(page, 'host.tables()')).toContainEqual(expect.objectContaining({ name: 'Schedule_results', sheet: 'Schedule results' }));
    expect(rows.slice(1).map((r) => r[0])).toEqual(['N1', 'E1', 'W1']);
    const east: WindowSpec = {
      name: 'E1',
      site: { latitude: 52.2, longitude: 4.9, utcOffset: 1, elevation: 0 },
      surfaceAzimuth: 90,
      surfaceTilt: 90,
      width: 1.8,
      height: 1.5,
      frameFraction: 0.15,
      glazing: { shgc: 0.35, panes: 2, interiorAttenuation: 1 },
      shading: { overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0, extensionRight: 0 } },
      groundAlbedo: 0.2,
      skyModel: 'perez1990',
      weather: { kind: 'ineichenClearSky', linkeTurbidity: [3] },
      year: YEAR,
      timeConvention: 'hourEnding',
    };
    const s = summarizeAnnual(annualSeries(east));
    expect(Math.abs((rows[2][3] as number) - s.annualKWh)).toBeLessThanOrEqual(0.05);
    expect(Math.abs((rows[2][5] as number) - s.peakW)).toBeLessThanOrEqual(0.05);
    // W1 left SHGC blank: the form's 0.4 applies, so it differs from E1 in more than orientation.
    expect(rows[3][2]).toBeCloseTo(1.8 * 1.5 * 0.85, 3);
    expect(await host.eval<number>(page, 'host.charts("Schedule results").length')).toBe(1);

    // A table with a blank width and an SHGC of 1.4.
    const sheetsBefore = await host.sheetNames(page);
    await page.fill('#schedule-table', 'BadList');
    await startRun(page, '#run-schedule');
    await waitForStatus(page, /problem/);
    const problems = await page.$$eval('#schedule-problems li', (lis) => lis.map((li) => li.textContent));
    expect(problems).toEqual([
      'Row 1 (Bad A), column "Width": blank is not allowed: must be a number from 0.01 to 100 m',
      'Row 2 (Bad B), column "SHGC": 1.4 is not allowed: must be a number from 0 to 1',
    ]);
    expect(await host.sheetNames(page)).toEqual(sheetsBefore);

    await page.fill('#schedule-table', 'NoSuchTable');
    await startRun(page, '#run-schedule');
    expect(await waitForStatus(page, /table/)).toContain('Excel table name: "NoSuchTable" is not allowed');
    await page.close();
  });

  test('shading options are compared against the unshaded window on a new sheet with a bar chart', async () => {
    const page = await openPane();
    await setField(page, 'year', String(YEAR));
    await page.click('#tab-options');
    expect(await page.$$eval('#options-list fieldset.option', (r) => r.length)).toBe(3);
    await page.click('#add-option');
    await page.fill('#opt-3-label', 'Deep set-back');
    await page.fill('#opt-3-setBack', '0.3');
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-options.png'), fullPage: true });
    await startRun(page, '#run-compare');
    await waitForStatus(page, /Wrote|refused|Fix|option/);
    const rows = await host.read(page, 'Window A options', 'A8:G12');
    expect(rows[0]).toEqual(['Shading option', 'Solar gain (kWh/yr)', 'Peak gain (W)', 'Cut vs no shading (%)', 'Beam cut by shading (%)', 'Diffuse cut by shading (%)', 'Shaded share, sun on the wall (0-1)']);
    expect(await cautionRows(page, 'Window A options')).toBe(true);
    expect(await host.eval<{ name: string }[]>(page, 'host.tables()')).toContainEqual(expect.objectContaining({ name: 'Window_A_options', sheet: 'Window A options' }));
    expect(rows.slice(1).map((r) => r[0])).toEqual(['No outside shading', 'Short overhang', 'Deep overhang', 'Overhang and fins']);
    const all = await host.read(page, 'Window A options', 'A9:G13');
    expect(all[4][0]).toBe('Deep set-back');
    const bare: WindowSpec = {
      name: 'Window A',
      site: { latitude: 52.2, longitude: 4.9, utcOffset: 1, elevation: 0 },
      surfaceAzimuth: 180,
      surfaceTilt: 90,
      width: 1.8,
      height: 1.5,
      frameFraction: 0.15,
      glazing: { shgc: 0.4, panes: 2, interiorAttenuation: 1 },
      shading: {},
      groundAlbedo: 0.2,
      skyModel: 'perez1990',
      weather: { kind: 'ineichenClearSky', linkeTurbidity: [3] },
      year: YEAR,
    };
    const ref = summarizeAnnual(annualSeries(bare));
    expect(Math.abs((all[0][1] as number) - ref.annualKWh)).toBeLessThanOrEqual(0.05);
    expect(all[0][3]).toBe(0);
    const deep = summarizeAnnual(annualSeries({ ...bare, shading: { overhang: { projection: 1.0, gap: 0.2, extensionLeft: 0.5, extensionRight: 0.5 } } }));
    expect(Math.abs((all[2][1] as number) - deep.annualKWh)).toBeLessThanOrEqual(0.05);
    expect(all[2][3] as number).toBeCloseTo((1 - deep.annualKWh / ref.annualKWh) * 100, 1);
    expect(all[2][4] as number).toBeCloseTo(deep.beamCut * 100, 1);
    expect(all[2][5] as number).toBeCloseTo(deep.diffuseCut * 100, 1);
    expect(all[2][5] as number).toBeGreaterThan(5); // the overhang takes sky light too, beside the beam
    expect(all[0][5]).toBe(0);
    expect(all[2][6] as number).toBeCloseTo(1 - deep.meanSunlitFraction, 3);
    // A deeper overhang never lets in more than a shorter one of the same gap.
    expect(all[2][1] as number).toBeLessThan(all[1][1] as number);
    const charts = await host.eval<{ type: string; title: string }[]>(page, 'host.charts("Window A options")');
    expect(charts).toEqual([expect.objectContaining({ type: 'BarClustered', title: 'Solar gain by shading option (kWh/yr)', seriesColours: ['#2E6DA4'] })]);

    // A bad option value is named with the option, and nothing is written.
    await page.fill('#opt-1-overhangDepth', '-1');
    const sheets = await host.sheetNames(page);
    await startRun(page, '#run-compare');
    expect(await waitForStatus(page, /option/)).toBe('An option has a value the calculation cannot use; nothing was written.');
    expect(await page.textContent('#options-msg')).toBe('Option 2 "Deep overhang", Overhang projection (m): -1 is not allowed: must be a number from 0 to 100 m');
    expect(await host.sheetNames(page)).toEqual(sheets);
    await page.close();
  });

  test("with a room, a schedule's windows get the peak cooling load and its hour of SOLARGAINYEAR; a window without one says so", async () => {
    const page = await openPane();
    await setField(page, 'year', String(YEAR));
    await page.evaluate(() => {
      const h = (window as never as { __excelHost: { addUserSheet(n: string, v: unknown[][]): void; addUserTable(s: string, a: string, n: string): void } }).__excelHost;
      h.addUserSheet('Rooms', [
        ['Window', 'Faces (°)', 'Width [m]', 'Height [m]', 'Overhang projection', 'Overhang gap', 'Room construction'],
        ['E1', 90, 1.8, 1.5, 0.6, 0.2, 'medium'],
        ['N1', 0, 1.2, 1.5, 0, 0, ''],
      ]);
      h.addUserTable('Rooms', 'A1:G3', 'RoomList');
    });
    await page.setViewportSize({ width: 350, height: 900 });
    await page.click('#tab-schedule');
    await page.fill('#schedule-table', 'RoomList');
    await startRun(page, '#run-schedule');
    const status = await waitForStatus(page, /Wrote|problem|refused/);
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-schedule-load-350.png') });
    const rows = await host.read(page, 'Schedule results', 'A6:K8');
    expect(rows[0].slice(9)).toEqual([LOAD_WORDS.peakLoad, LOAD_WORDS.peakLoadAtHourEnding]);
    const east = registryYearPeakLoad({ ...FORM_WINDOW, name: 'E1', surfaceAzimuth: 90, width: 1.8, height: 1.5, overhangProjection: 0.6, overhangGap: 0.2, roomConstruction: 'medium' });
    expect(Math.abs((rows[1][9] as number) - east.peakW)).toBeLessThanOrEqual(0.05);
    expect(rows[1][10] as number).toBeCloseTo(east.stamp, 6);
    expect(rows[2].slice(9)).toEqual([LOAD_WORDS.noRoom, '']);
    expect(await cautionRows(page, 'Schedule results')).toBe(true);
    const lines = await host.read(page, 'Schedule results', 'A1:A4');
    expect(lines[2][0]).toContain('1 of 2 windows have a room');
    expect(status).toContain(`largest peak cooling load ${Math.round(east.peakW).toLocaleString('en-GB')} W (E1, `);
    await page.close();
  });

  test('with a room, the comparison gives each option its peak cooling load, hour and cut against no shading, as SOLARGAINYEAR does, with a second bar chart; without one it says so', async () => {
    const page = await openPane();
    await setField(page, 'year', String(YEAR));
    await page.selectOption('#roomConstruction', 'medium');
    await page.setViewportSize({ width: 350, height: 900 });
    await page.click('#tab-options');
    await startRun(page, '#run-compare');
    const status = await waitForStatus(page, /Wrote|refused|Fix|option/);
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-options-load-350.png'), fullPage: true });
    const rows = await host.read(page, 'Window A options', 'A8:J12');
    expect(rows[0]).toEqual(['Shading option', 'Solar gain (kWh/yr)', 'Peak gain (W)', 'Cut vs no shading (%)', 'Beam cut by shading (%)', 'Diffuse cut by shading (%)', 'Shaded share, sun on the wall (0-1)', LOAD_WORDS.peakLoad, LOAD_WORDS.peakLoadAtHourEnding, LOAD_WORDS.peakLoadCut]);
    const room = { ...FORM_WINDOW, roomConstruction: 'medium' };
    const none = registryYearPeakLoad(room);
    const deep = registryYearPeakLoad({ ...room, overhangProjection: 1.0, overhangGap: 0.2, overhangExtension: 0.5 });
    expect(rows[1][0]).toBe('No outside shading');
    expect(Math.abs((rows[1][7] as number) - none.peakW)).toBeLessThanOrEqual(0.05);
    expect(rows[1][8] as number).toBeCloseTo(none.stamp, 6);
    expect(rows[1][9]).toBe(0);
    expect(rows[3][0]).toBe('Deep overhang');
    expect(Math.abs((rows[3][7] as number) - deep.peakW)).toBeLessThanOrEqual(0.05);
    expect(rows[3][8] as number).toBeCloseTo(deep.stamp, 6);
    expect(rows[3][9] as number).toBeCloseTo((1 - deep.peakW / none.peakW) * 100, 1);
    expect(rows[3][9] as number).toBeGreaterThan(0); // an overhang on a south wall lowers the peak load
    const charts = await host.eval<{ type: string; title: string }[]>(page, 'host.charts("Window A options")');
    expect(charts).toEqual([
      expect.objectContaining({ type: 'BarClustered', title: 'Solar gain by shading option (kWh/yr)', seriesColours: ['#2E6DA4'] }),
      expect.objectContaining({ type: 'BarClustered', title: 'Peak cooling load by shading option (W)', seriesColours: ['#D9822B'] }),
    ]);
    expect(await cautionRows(page, 'Window A options')).toBe(true);
    expect(status).toContain(`against ${Math.round(none.peakW).toLocaleString('en-GB')} W with no shading`);

    // The same without a room: no load columns, and the sheet and the status say why.
    await page.click('#tab-window');
    await page.selectOption('#roomConstruction', '');
    await page.click('#tab-options');
    await startRun(page, '#run-compare');
    // The earlier comparison is the pane's own: it asks, and keeping both writes "Window A options (2)".
    await page.click('#confirm-keep');
    const plain = await waitForStatus(page, /Wrote "Window A options \(2\)"|refused|Fix/);
    expect(plain).toContain(`cooling load: ${LOAD_WORDS.noRoom}`);
    expect((await host.read(page, 'Window A options (2)', 'A8:H8'))[0]).toEqual(['Shading option', 'Solar gain (kWh/yr)', 'Peak gain (W)', 'Cut vs no shading (%)', 'Beam cut by shading (%)', 'Diffuse cut by shading (%)', 'Shaded share, sun on the wall (0-1)', '']);
    expect((await host.read(page, 'Window A options (2)', 'A5:A5'))[0][0]).toContain(`Cooling load: ${LOAD_WORDS.noRoom}`);
    await page.close();
  });

  test("bad input shows the core's own message beside the box, and nothing is written; then a daylight-saving rule: a bad one refused as the functions refuse it, a good one stamps the hourly sheet on the zone's clock", async () => {
    const page = await openPane();
    await setField(page, 'shgc', '1.4');
    await setField(page, 'latitude', 'north');
    await page.waitForFunction(() => (document.getElementById('shgc-msg')?.textContent ?? '') !== '' && (document.getElementById('latitude-msg')?.textContent ?? '') !== '');
    const expected = (mutate: (s: WindowSpec) => void): string => {
      const spec: WindowSpec = JSON.parse(JSON.stringify(DEMO));
      mutate(spec);
      try {
        validateWindowSpec(spec);
      } catch (err) {
        // the pane names the field by its glossary name, as the functions do
        const named = inGlossaryWords(err);
        if (named instanceof SunpaneError) return named.message;
      }
      throw new Error('expected the core to refuse');
    };
    // The core's message, naming the box by its label (the user's words), not by the field path.
    expect(await page.textContent('#shgc-msg')).toBe(inUserWords(expected((s) => (s.glazing.shgc = 1.4)), 'SHGC at normal incidence'));
    expect(await page.textContent('#shgc-msg')).toBe('SHGC at normal incidence: 1.4 is not allowed: must be a number from 0 to 1');
    expect(await page.textContent('#latitude-msg')).toBe(inUserWords(expected((s) => (s.site.latitude = 'north' as never)), 'Latitude'));
    expect(await page.getAttribute('#shgc', 'aria-invalid')).toBe('true');
    await startRun(page, '#run-year');
    expect(await waitForStatus(page, /Fix/)).toBe('Fix the marked boxes on the Window tab first.');
    expect(await host.sheetNames(page)).toEqual([]);

    // Hourly weather from the sheet: an address that is not one, then a column of the wrong length.
    await setField(page, 'shgc', '0.4');
    await setField(page, 'latitude', '52.2');
    await page.selectOption('#weatherSource', 'measured');
    await setField(page, 'dniAddress', 'B2 to B8761');
    const notAnAddress = 'Direct normal column: "B2 to B8761" is not allowed: must be a range address';
    // (choosing measured weather shows the column boxes, blank until filled: a check may come between)
    expect(await settledMessage(page, 'dniAddress', notAnAddress)).toContain(notAnAddress);
    await page.evaluate(() => (window as never as { __excelHost: { addUserSheet(n: string, v: unknown[][]): void } }).__excelHost.addUserSheet('Weather', Array.from({ length: 100 }, () => [500, 100])));
    await setField(page, 'dniAddress', 'Weather!A1:A100');
    await setField(page, 'dhiAddress', 'Weather!B1:B100');
    await setField(page, 'year', String(YEAR));
    await startRun(page, '#run-year');
    await waitForStatus(page, /weather columns cannot be used/);
    // The box's message stays: the check the last edit scheduled (250 ms after it) must not wipe the
    // run's words once they are shown (it did, when the run answered within those 250 ms).
    await page.waitForTimeout(400);
    expect(await page.textContent('#dniAddress-msg')).toBe(
      `The weather columns cannot be used: expected 8760 hourly rows for ${YEAR} (one per hour, the first ending at 01:00 on 1 January; a typical year of 8760 or a leap-year file of 8784 is also fitted), found 100, row 1 to row 100; or give the rows their time stamps`,
    );
    expect(await host.sheetNames(page)).toEqual(['Weather']);
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-bad-input.png'), fullPage: true });

    // A daylight-saving rule on the same page. A bad one gets the worksheet functions' message beside its
    // box (SOLARGAIN given the same fields in a window range), in the box's words.
    await page.selectOption('#weatherSource', 'ineichenClearSky');
    expect(await page.inputValue('#weatherSource')).toBe('ineichenClearSky');
    expect(await page.isVisible('#dniAddress')).toBe(false);
    const functionsSay = (rule: Record<string, string>, label: string): string => {
      const out = applyFunction(findFunction('SOLARGAIN')!, [[...Object.entries(FORM_WINDOW), ...Object.entries(rule)] as RawArg, `${YEAR}-07-01T12:00`])[0][0];
      if (!(out instanceof SunpaneError)) throw new Error('expected SOLARGAIN to refuse the rule');
      return inUserWords(out.message.replace(/^window /, ''), label);
    };
    await setField(page, 'daylightSavingStart', `${YEAR}-10-26 03:00`);
    await setField(page, 'daylightSavingEnd', `${YEAR}-03-30 02:00`);
    const endWords = functionsSay({ daylightSavingStart: `${YEAR}-10-26 03:00`, daylightSavingEnd: `${YEAR}-03-30 02:00` }, 'Daylight saving end');
    expect(await settledMessage(page, 'daylightSavingEnd', endWords)).toBe(endWords);
    await setField(page, 'daylightSavingStart', `${YEAR}-03-30 02:00`);
    await setField(page, 'daylightSavingEnd', `${YEAR}-10-26 03:00`);
    await setField(page, 'daylightSavingShift', '3');
    const shiftWords = functionsSay({ daylightSavingStart: `${YEAR}-03-30 02:00`, daylightSavingEnd: `${YEAR}-10-26 03:00`, daylightSavingShift: '3' }, 'Daylight saving shift');
    expect(await settledMessage(page, 'daylightSavingShift', shiftWords)).toBe(shiftWords);
    expect(await page.textContent('#daylightSavingShift-msg')).toBe('Daylight saving shift: 3 is not allowed: must be a number above 0 and up to 2 h');

    // The rule of the example location's zone (the form's 52.2° N 4.9° E, UTC+1: Europe/Amsterdam in the
    // IANA database): the hourly sheet is stamped on the clock, each stamp as Node's Intl gives the zone's
    // clock reading for the hour (its middle, then the half hour on, as an hour-ending row is stamped).
    await setField(page, 'daylightSavingShift', '');
    await startRun(page, '#run-year');
    expect(await waitForStatus(page, /^Wrote|refused|Fix|Stopped/)).toMatch(/^Wrote "Window A hourly"/);
    const stamps = await host.read(page, 'Window A hourly', 'A5:A8765');
    expect(stamps[0][0]).toBe('Hour ending (local clock time)');
    const amsterdam = new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/Amsterdam', hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric' });
    const clockOf = (utcMs: number): number => {
      const p = amsterdam.formatToParts(new Date(utcMs));
      const get = (t: string) => Number(p.find((x) => x.type === t)!.value);
      return Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute')) / 86_400_000 + 25_569;
    };
    const yearStartUtc = Date.UTC(YEAR, 0, 1) - 3_600_000; // 1 January 00:00 at UTC+1
    const off = stamps.slice(1).flatMap(([v], i) => {
      const expected = clockOf(yearStartUtc + i * 3_600_000 + 1_800_000) + 1 / 48; // the hour's middle on the clock, then half an hour on
      return Math.abs((v as number) - expected) < 1e-5 ? [] : [`row ${i + 6}: ${v} vs ${expected}`];
    });
    expect(off).toEqual([]);
    // Summer hours are an hour on from standard time, winter ones not.
    expect((stamps[1][0] as number) - (Date.UTC(YEAR, 0, 1) / 86_400_000 + 25_569)).toBeCloseTo(1 / 24, 6);
    expect((stamps[4345][0] as number) - (Date.UTC(YEAR, 0, 1) / 86_400_000 + 25_569 + 4345 / 24)).toBeCloseTo(1 / 24, 6);
    // The rule in words on the sheet, as SOLARGAINSTEPS states it for the same window and rule.
    const rule = { daylightSavingStart: `${YEAR}-03-30 02:00`, daylightSavingEnd: `${YEAR}-10-26 03:00` };
    const steps = applyFunction(findFunction('SOLARGAINSTEPS')!, [[...Object.entries(FORM_WINDOW), ...Object.entries(rule)] as RawArg, `${YEAR}-07-01T12:00`]) as unknown[][];
    const words = /daylight saving \+1 h from .*? \(clock time\), every year/.exec(steps.map((r) => r.join(' ')).join('\n'))![0];
    expect(words).toBe('daylight saving +1 h from the last Sunday of March 02:00 to the last Sunday of October 03:00 (clock time), every year');
    const heading = (await host.read(page, 'Window A hourly', 'A1:A4')).map((r) => String(r[0]));
    expect(heading.some((l) => l.includes(`Rows are hour-ending, on the local clock (${words}), sun at mid-hour`))).toBe(true);
    // The key figures refer to the stamp column by its clock-time header.
    const peakAt = await host.read(page, 'Window A hourly', 'Q21:Q21');
    expect(String(peakAt[0][0])).toContain('[[Hour ending (local clock time)]]');
    await page.setViewportSize({ width: 350, height: 900 });
    await page.click('#sunpane-root');
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-daylight-saving-350.png'), fullPage: true });
    await page.close();
  });

  test('cancel stops after the current block and removes the half-written sheet', async () => {
    const page = await openPane();
    await setField(page, 'year', String(YEAR));
    await host.eval(page, '(host.state.syncDelayMs = 300)');
    await startRun(page, '#run-year');
    await page.waitForFunction(() => /Writing rows: \d+ of 8760/.test(document.getElementById('progress-text')?.textContent ?? ''), undefined, { timeout: 60_000 });
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-progress.png') });
    await page.click('#cancel');
    expect(await waitForStatus(page, /Stopped/)).toBe('Stopped: the half-written sheet was removed.');
    expect(await host.sheetNames(page)).toEqual([]);
    const written = await host.eval<number[]>(page, 'host.state.syncs.flatMap(function (s) { return s.valueRows; }).filter(function (n) { return n >= 1000; })');
    expect(written.reduce((a, b) => a + b, 0)).toBeLessThan(8760);
    expect(await page.isHidden('#progress')).toBe(true);
    await page.close();
  });

  test('a ten-option comparison stopped while it works writes nothing; run to the end, its eleven rows go in requests under the limit, with Cancel off during the write that cannot stop half-way', async () => {
    const options = Array.from({ length: 10 }, (_, i) => ({ label: `Scheme ${i + 1}`, overhangDepth: String(0.1 * (i + 1)), overhangGap: '0.2', overhangReach: '0.3', leftFinDepth: '0', rightFinDepth: '0', finGap: '0', setBack: '0' }));
    const page = await openPane({ 'sunpane.pane': { version: 1, options } });
    await setField(page, 'year', String(YEAR));
    await page.click('#tab-options');
    expect(await page.$$eval('#options-list fieldset.option', (r) => r.length)).toBe(10);
    expect(await page.isDisabled('#add-option')).toBe(true);
    // Cancel is pressed the moment the fourth option is being worked out.
    await page.evaluate(() => {
      const text = document.getElementById('progress-text')!;
      const watch = new MutationObserver(() => {
        if (/^Option 4 of 10/.test(text.textContent ?? '')) {
          watch.disconnect();
          (document.getElementById('cancel') as HTMLButtonElement).click();
        }
      });
      watch.observe(text, { childList: true, characterData: true, subtree: true });
    });
    const callsBefore = await host.eval<number>(page, 'host.state.calls.length');
    await startRun(page, '#run-compare');
    expect(await waitForStatus(page, /Stopped/)).toBe('Stopped: nothing was written.');
    expect(await host.sheetNames(page)).toEqual([]);
    const ops = await host.eval<string[]>(page, `host.state.calls.slice(${callsBefore}).map(function (c) { return c.op; })`);
    expect(ops.filter((op) => /worksheets\.add|range\.values|tables\.add|charts\.add|worksheet\.delete/.test(op))).toEqual([]);
    expect(await page.isHidden('#progress')).toBe(true);

    // To the end: Cancel is switched off while the sheet is written, and the whole table arrives.
    await host.eval(page, '(host.state.syncDelayMs = 150)');
    await startRun(page, '#run-compare');
    await page.waitForFunction(() => /^Writing the comparison/.test(document.getElementById('progress-text')?.textContent ?? ''), undefined, { timeout: 90_000 });
    expect(await page.isDisabled('#cancel')).toBe(true);
    expect(await waitForStatus(page, /^Wrote/)).toMatch(/^Wrote "Window A options" comparing 10 options: least solar gain with "[^"]+", [\d,]+ kWh\/yr \(\d+ % below no shading\); cooling load: no room given — gains only\.$/);
    expect((await host.read(page, 'Window A options', 'A9:A19')).map((r) => r[0])).toEqual(['No outside shading', ...options.map((o) => o.label)]);
    const syncs = await host.eval<{ bytes: number; refused?: boolean }[]>(page, 'host.state.syncs');
    expect(syncs.some((x) => x.refused)).toBe(false);
    expect(Math.max(...syncs.map((x) => x.bytes))).toBeLessThan(5 * 1024 * 1024);
    expect(await page.isDisabled('#cancel')).toBe(false);
    await page.close();
  });

  test('Excel refusing a request part-way leaves no half-written sheet and the user is told: the year, then the comparison', async () => {
    const page = await openPane();
    await setField(page, 'year', String(YEAR));
    await page.evaluate(() => (window as never as { __excelHost: { addUserSheet(n: string, v: unknown[][]): void } }).__excelHost.addUserSheet('Notes', [['mine', 1]]));
    const notes = await host.eval<string>(page, 'host.snapshot("Notes")');
    // the fourth block of hourly rows is refused
    await host.eval(page, "(host.state.failOp = { op: 'range.values', after: 5 })");
    await startRun(page, '#run-year');
    expect(await waitForStatus(page, /refused/)).toMatch(/^Excel refused a request while writing "Window A hourly", so the half-written sheet was removed and nothing else changed\. Excel said: GeneralException: /);
    expect(await host.sheetNames(page)).toEqual(['Notes']);
    // the comparison's table cannot be made
    await host.eval(page, "(host.state.failOp = { op: 'tables.add' })");
    await page.click('#tab-options');
    await startRun(page, '#run-compare');
    expect(await waitForStatus(page, /writing "Window A options"/)).toMatch(/^Excel refused a request while writing "Window A options", so the half-written sheet was removed/);
    expect(await host.sheetNames(page)).toEqual(['Notes']);
    expect(await host.eval<string>(page, 'host.snapshot("Notes")')).toBe(notes);
    expect(await host.eval<unknown[]>(page, 'host.tables()')).toEqual([]);
    // once Excel takes the requests again, the same run writes as usual
    await startRun(page, '#run-compare');
    expect(await waitForStatus(page, /^Wrote/)).toMatch(/^Wrote "Window A options" comparing 3 options: /);
    await page.close();
  });

  test('in a 1904 workbook the pane reads the weather stamps and writes the hourly stamps in the 1904 date system (DATE(1904,1,1) = 0), the same hours and watts as in a 1900 workbook', async () => {
    // A weather year of the form's own clear sky (SOLARGAINYEAR's dni and dhi), stamped hour-ending in each workbook's own serials.
    const clear = applyFunction(findFunction('SOLARGAINYEAR')!, [Object.entries(FORM_WINDOW) as RawArg, [['stamp', 'dni', 'dhi']]]) as number[][];
    const hours = clear.length;
    const start = Date.UTC(YEAR, 0, 1) / 86_400_000 + 25_569;
    const weather = (offset: number) => [['Stamp', 'DNI [W/m²]', 'DHI [W/m²]'], ...clear.map(([stamp, dni, dhi]) => [stamp - offset, Math.round(dni * 10) / 10, Math.round(dhi * 10) / 10])];
    const runIn = async (dateSystem: 1900 | 1904) => {
      const page = await openPane(undefined, dateSystem === 1904 ? { dateSystem } : {});
      expect(await host.eval<number>(page, 'host.state.dateSystem')).toBe(dateSystem);
      await host.addUserSheet(page, 'Weather', weather(dateSystem === 1904 ? 1462 : 0));
      await setField(page, 'year', String(YEAR));
      await page.selectOption('#weatherSource', 'measured');
      await setField(page, 'timeAddress', `Weather!A1:A${hours + 1}`);
      await setField(page, 'dniAddress', `Weather!B1:B${hours + 1}`);
      await setField(page, 'dhiAddress', `Weather!C1:C${hours + 1}`);
      await startRun(page, '#run-year');
      const status = await waitForStatus(page, /Wrote|refused|Fix|cannot|Stopped/);
      if (!/^Wrote/.test(status)) throw new Error(`${dateSystem} workbook: ${status} ${await page.textContent('#dniAddress-msg')} ${await page.textContent('#form-msg')}`);
      expect(status).toMatch(/^Wrote "Window A hourly"/);
      const rows = await host.read(page, 'Window A hourly', `A6:M${hours + 5}`);
      const calls = await host.eval<{ op: string; target: string }[]>(page, 'host.state.calls');
      await page.close();
      return { rows, status, asked: calls.some((c) => c.target === 'functions.date') };
    };
    const in1900 = await runIn(1900);
    const in1904 = await runIn(1904);
    expect(in1904.asked).toBe(true);
    expect(in1904.status).toBe(in1900.status);
    // the stamps: 1462 days lower (1 January 1904 is serial 0), every hour; the rest of each row the same
    expect(in1904.rows).toHaveLength(hours);
    const wrong = in1904.rows.flatMap((r, i) => (Math.abs((in1900.rows[i][0] as number) - (r[0] as number) - 1462) < 1e-6 && JSON.stringify(r.slice(1)) === JSON.stringify(in1900.rows[i].slice(1)) ? [] : [i]));
    expect(wrong).toEqual([]);
    expect(in1904.rows[0][0] as number).toBeCloseTo(start + 1 / 24 - 1462, 5);
  });

  test('in a 1904 workbook the daylight-saving boxes read serials in the 1904 date system: the rule as ISO text and as 1904 serials stamps the same hours, a 1900 serial lands on the date the 1904 system gives it; the sun path says its hours are standard time', async () => {
    // ECMA-376 Part 1, §18.17.4.1: the 1904 system counts days from 1 January 1904 (serial 0); the 1900
    // system's serial of the same date-time is larger by the days between, 1462. Counted here with the Date.
    const DAYS_1900_TO_1904 = (Date.UTC(1904, 0, 1) - Date.UTC(1899, 11, 30)) / 86_400_000;
    const serial1904 = (iso: string) => (Date.parse(`${iso}Z`) - Date.UTC(1904, 0, 1)) / 86_400_000;
    const serial1900 = (iso: string) => (Date.parse(`${iso}Z`) - Date.UTC(1899, 11, 30)) / 86_400_000;
    const page = await openPane(undefined, { dateSystem: 1904 });
    await setField(page, 'year', String(YEAR));
    // Each run under its own window name, so its sheet is new (no question about replacing an earlier one).
    const stampsOf = async (start: string, end: string, name: string): Promise<number[]> => {
      const sheet = `${name} hourly`;
      await setField(page, 'name', name);
      await setField(page, 'daylightSavingStart', start);
      await setField(page, 'daylightSavingEnd', end);
      await startRun(page, '#run-year');
      const status = await waitForStatus(page, new RegExp(`^Wrote "${sheet}"|refused|Fix|Stopped|cannot`));
      if (!status.startsWith(`Wrote "${sheet}"`)) throw new Error(`${start} – ${end}: ${status} ${await page.textContent('#daylightSavingStart-msg')} ${await page.textContent('#daylightSavingEnd-msg')}`);
      return (await host.read(page, sheet, `A6:A${YEAR % 4 === 0 ? 8789 : 8765}`)).map((r) => r[0] as number);
    };
    // The rule of the form's zone (Europe/Amsterdam in the IANA database) as ISO text: each stamp is the
    // zone's clock reading as Node's Intl gives it (the hour's middle, then half an hour on), in 1904 serials.
    const iso = await stampsOf(`${YEAR}-03-30 02:00`, `${YEAR}-10-26 03:00`, 'Rule as text');
    const amsterdam = new Intl.DateTimeFormat('en-GB', { timeZone: 'Europe/Amsterdam', hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric' });
    const clock1904 = (utcMs: number): number => {
      const p = amsterdam.formatToParts(new Date(utcMs));
      const get = (t: string) => Number(p.find((x) => x.type === t)!.value);
      return (Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute')) - Date.UTC(1904, 0, 1)) / 86_400_000;
    };
    const yearStartUtc = Date.UTC(YEAR, 0, 1) - 3_600_000; // 1 January 00:00 at UTC+1
    const offZone = iso.flatMap((v, i) => (Math.abs(v - (clock1904(yearStartUtc + i * 3_600_000 + 1_800_000) + 1 / 48)) < 1e-5 ? [] : [`row ${i + 6}: ${v}`]));
    expect(offZone).toEqual([]);
    // The same rule as serials of the 1904 system: the very same stamps.
    const start1904 = serial1904(`${YEAR}-03-30T02:00`);
    const end1904 = serial1904(`${YEAR}-10-26T03:00`);
    expect(await stampsOf(String(start1904), String(end1904), 'Rule as 1904 serials')).toEqual(iso);
    // The 1900 system's serials of those dates, typed in this workbook, are the 1904 system's dates 1462 days
    // on: 31 March and 27 October 2029, Saturdays, so the rule runs from the last Saturday of March 02:00 to
    // the last Saturday of October 03:00 (clock time); in the year drawn that is 29 March and 25 October.
    expect(serial1900(`${YEAR}-03-30T02:00`) - start1904).toBe(DAYS_1900_TO_1904);
    expect(new Date(Date.UTC(1904, 0, 1) + serial1900(`${YEAR}-03-30T02:00`) * 86_400_000).toISOString()).toBe('2029-03-31T02:00:00.000Z');
    const shifted = await stampsOf(String(serial1900(`${YEAR}-03-30T02:00`)), String(serial1900(`${YEAR}-10-26T03:00`)), 'Rule as 1900 serials');
    const lastSaturday = (month: number) => {
      const last = new Date(Date.UTC(YEAR, month, 0));
      return Date.UTC(YEAR, month - 1, last.getUTCDate() - ((last.getUTCDay() + 1) % 7));
    };
    const from = lastSaturday(3) + 2 * 3_600_000; // standard time, as UTC-like milliseconds of the local calendar
    const to = lastSaturday(10) + 2 * 3_600_000; // 03:00 on the clock is 02:00 standard time
    expect([new Date(from).toISOString(), new Date(to).toISOString()]).toEqual([`${YEAR}-03-29T02:00:00.000Z`, `${YEAR}-10-25T02:00:00.000Z`]);
    const offRule = shifted.flatMap((v, i) => {
      const middle = Date.UTC(YEAR, 0, 1) + (i + 0.5) * 3_600_000;
      const expected = (middle + (middle >= from && middle < to ? 3_600_000 : 0) + 1_800_000 - Date.UTC(1904, 0, 1)) / 86_400_000;
      return Math.abs(v - expected) < 1e-5 ? [] : [`row ${i + 6}: ${v} vs ${expected}`];
    });
    expect(offRule).toEqual([]);
    expect(shifted).not.toEqual(iso);

    // A serial the 1904 system has no date for: the worksheet functions' check and message (SOLARGAIN given
    // the same cells in a window range of the 1904 system), beside the box in its words.
    await setField(page, 'daylightSavingStart', '-1');
    await page.waitForFunction(() => (document.getElementById('daylightSavingStart-msg')?.textContent ?? '') !== '');
    const out = applyFunction(findFunction('SOLARGAIN')!, [[...Object.entries(FORM_WINDOW), ['dateSystem', 1904], ['daylightSavingStart', -1], ['daylightSavingEnd', serial1900(`${YEAR}-10-26T03:00`)]] as RawArg, `${YEAR}-07-01T12:00`])[0][0];
    if (!(out instanceof SunpaneError)) throw new Error('expected SOLARGAIN to refuse the rule');
    expect(await page.textContent('#daylightSavingStart-msg')).toBe(inUserWords(out.message.replace(/^window /, ''), 'Daylight saving start'));
    expect(await page.textContent('#daylightSavingStart-msg')).toMatch(/^Daylight saving start: -1 is not allowed: must be a date-time of the 1904 date system from 1 January 1904 \(serial 0\)/);

    // The sun path under the rule (as 1904 serials): standard-time hour dots, said on the picture, with the
    // clock of each drawn day in the key (the zone's clock, as the node test of sunPathTime checks it).
    await setField(page, 'daylightSavingStart', String(start1904));
    await setField(page, 'daylightSavingEnd', String(end1904));
    await page.waitForFunction(() => (document.getElementById('daylightSavingStart-msg')?.textContent ?? 'x') === '');
    await page.setViewportSize({ width: 350, height: 900 });
    await page.click('#sunpane-root');
    await page.screenshot({ path: path.join(ARTIFACTS, 'pane-1904-daylight-saving-350.png'), fullPage: true });
    await page.click('#tab-sunpath');
    await page.waitForFunction(() => document.querySelectorAll('#sun-path svg text.time-note').length === 2);
    expect(await page.$$eval('#sun-path svg text.time-note', (t) => t.map((x) => x.textContent))).toEqual(['Hour dots: local standard time (UTC+1 h),', 'not the daylight-saving clock']);
    expect((await page.$$eval('#sun-path-legend li', (li) => li.map((x) => x.textContent))).slice(0, 3)).toEqual(['21 Jun (clock +1 h)', '21 Mar ≈ 23 Sep (clock +1 h on 23 Sep)', '21 Dec (clock on standard time)']);
    expect(await page.textContent('#sun-path-caption')).toContain('the daylight-saving rule puts the clock 1 h ahead on 21 Jun and 23 Sep, so on those days a dot\'s hour reads 1 h later on the sheet.');
    await page.screenshot({ path: path.join(ARTIFACTS, 'sun-path-daylight-saving-350.png'), fullPage: true });
    await page.$eval('#sun-path-legend', (el) => el.scrollIntoView());
    await page.screenshot({ path: path.join(ARTIFACTS, 'sun-path-daylight-saving-key-350.png'), fullPage: true });
    await page.close();
  });

  test('the largest table, a leap year of 8784 hourly rows, goes in requests under the 5 MB the stand-in enforces', async () => {
    const page = await openPane();
    await setField(page, 'year', '2024');
    await startRun(page, '#run-year');
    await waitForStatus(page, /^Wrote/);
    const syncs = await host.eval<{ bytes: number; refused?: boolean; valueRows: number[] }[]>(page, 'host.state.syncs');
    expect(syncs.some((x) => x.refused)).toBe(false);
    expect(Math.max(...syncs.map((x) => x.bytes))).toBeLessThan(5 * 1024 * 1024);
    expect(syncs.filter((x) => x.valueRows.some((n) => n >= 1000)).length).toBeGreaterThan(1);
    expect(syncs.flatMap((x) => x.valueRows).filter((n) => n >= 1000).reduce((a, b) => a + b, 0)).toBe(8784);
    expect(await host.eval<{ address: string }[]>(page, 'host.tables()')).toEqual([expect.objectContaining({ address: 'A5:N8789' })]);
    await page.close();
  });

  test('a sheet the settings remember as ours that the user has since made their own is left alone, with no question', async () => {
    const page = await openPane({ 'sunpane.pane': { version: 1, resultSheets: ['Window A hourly'] } });
    await setField(page, 'year', String(YEAR));
    await page.evaluate(() => (window as never as { __excelHost: { addUserSheet(n: string, v: unknown[][]): void } }).__excelHost.addUserSheet('Window A hourly', [['my own workings', 7]]));
    const before = await host.eval<string>(page, 'host.snapshot("Window A hourly")');
    await startRun(page, '#run-year');
    expect(await waitForStatus(page, /^Wrote/)).toMatch(/^Wrote "Window A hourly \(2\)"/);
    expect(await page.isHidden('#confirm-backdrop')).toBe(true);
    expect(await host.eval<string>(page, 'host.snapshot("Window A hourly")')).toBe(before);
    await page.close();
  });

  test('the form and the options are saved with the workbook and restored when it is opened again', async () => {
    const page = await openPane();
    await setField(page, 'latitude', '-33.9');
    await page.selectOption('#skyModel', 'hayDavies');
    await page.click('#tab-options');
    await page.fill('#opt-0-label', 'Slim canopy');
    await page.waitForFunction(() => {
      const saved = (window as never as { __excelHost: { state: { savedSettings: Record<string, { form: Record<string, string>; options: { label: string }[] }> } } }).__excelHost.state.savedSettings['sunpane.pane'];
      return saved && saved.form.latitude === '-33.9' && saved.options[0].label === 'Slim canopy';
    });
    const saved = await host.eval<Record<string, unknown>>(page, 'host.state.savedSettings');
    await page.close();

    const reopened = await openPane(saved);
    expect(await reopened.inputValue('#latitude')).toBe('-33.9');
    expect(await reopened.inputValue('#skyModel')).toBe('hayDavies');
    expect(await reopened.inputValue('#opt-0-label')).toBe('Slim canopy');
    await reopened.close();
  });

  test('the sun path draws in both hemispheres with the shading mask of the glass or of one point', async () => {
    const page = await openPane();
    await page.setViewportSize({ width: 420, height: 760 });
    await setField(page, 'overhangProjection', '0.7');
    await setField(page, 'overhangGap', '0.2');
    await setField(page, 'leftFinProjection', '0.4');
    await page.click('#tab-sunpath');
    await page.waitForSelector('#sun-path svg polyline.track');
    // The highest point of the first (21 June) track — nearest the centre — lies south of the
    // centre (lower on the drawing) in the north, and north of it in the south.
    const noonY = () =>
      page.$eval('#sun-path svg polyline.track', (el) => {
        const pts = (el.getAttribute('points') ?? '').split(' ').map((p) => p.split(',').map(Number));
        const top = pts.reduce((best, p) => (Math.hypot(p[0] - 160, p[1] - 160) < Math.hypot(best[0] - 160, best[1] - 160) ? p : best));
        return top[1];
      });
    expect(await noonY()).toBeGreaterThan(160);
    expect(await page.$$eval('#sun-path svg path.mask-full', (p) => p.length)).toBeGreaterThan(0);
    expect(await page.$$eval('#sun-path svg path.mask-part', (p) => p.length)).toBeGreaterThan(0);
    await page.screenshot({ path: path.join(ARTIFACTS, 'sun-path-north.png'), fullPage: true });

    await page.click('#mask-point');
    await page.fill('#mask-x', '0.2');
    await page.fill('#mask-y', '1.4');
    await page.click('#draw-sun-path');
    await page.waitForFunction(() => (document.querySelector('#sun-path desc')?.textContent ?? '').includes('point 0.2 m'));
    expect(await page.$$eval('#sun-path svg path.mask-part', (p) => p.length)).toBe(0);
    await page.screenshot({ path: path.join(ARTIFACTS, 'sun-path-point.png'), fullPage: true });
    await page.fill('#mask-x', '5');
    await page.click('#draw-sun-path');
    await page.waitForFunction(() => (document.getElementById('mask-x-msg')?.textContent ?? '') !== '');
    expect(await page.textContent('#mask-x-msg')).toBe('From left jamb (m, blank = middle): 5 is not allowed: must be a number from 0 to 1.8');

    await page.click('#tab-window');
    await page.selectOption('#examplePlace', 'kestrelHeads');
    await setField(page, 'surfaceAzimuth', '0');
    await page.click('#tab-sunpath');
    await page.click('#mask-whole');
    await page.waitForFunction(() => (document.querySelector('#sun-path desc')?.textContent ?? '').includes('latitude -37.9'));
    expect(await noonY()).toBeLessThan(160);
    await page.screenshot({ path: path.join(ARTIFACTS, 'sun-path-south.png'), fullPage: true });
    await page.close();
  });
});
