/**
 * `sunpane schedule` at a small scale (the 10,000-window run is `npm run scale`, outside the test
 * suite): rows are streamed to the output as the windows are worked out, each row the same as the
 * window's own year summed up (src/core/gain: annualSeries + summarizeAnnual); an interrupted run
 * (SIGINT while rows are being written) leaves neither the output nor a temporary file. The windows
 * are invented: the example schedule's rows repeated with other facings.
 */
import { spawn } from 'node:child_process';
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { STREAM_WORKBOOK_ABOVE, scheduleFromCsv, windowFromRow } from '../../src/cli/schedule';
import { summaryCsvLine } from '../../src/cli/scheduleOutput';
import { annualSeries, summarizeAnnual } from '../../src/core/gain';
import { EXAMPLES, ROOT, run, tempDir } from './run';

/** A schedule of `n` windows: the example rows, each repeated with the facing turned by 7° a time. */
function bigSchedule(n: number): string {
  const lines = fs.readFileSync(path.join(EXAMPLES, 'windows.csv'), 'utf8').trimEnd().split('\n').filter((l) => !l.startsWith('#'));
  const [header, ...rows] = lines;
  const faces = header.split(',').indexOf('Faces [°]');
  const out = [header];
  for (let k = 0; k < n; k++) {
    const cells = rows[k % rows.length].split(',');
    cells[0] = `${cells[0]} ${k + 1}`;
    cells[faces] = String((Number(cells[faces]) + 7 * k) % 360);
    out.push(cells.join(','));
  }
  return `${out.join('\n')}\n`;
}

describe('the schedule streamed', () => {
  it('writes one row per window to CSV, each as the window\'s own year sums up', async () => {
    const dir = tempDir();
    const input = path.join(dir, 'in.csv');
    fs.writeFileSync(input, bigSchedule(40));
    const csv = await run('schedule', '--in', input, '--out', path.join(dir, 'out.csv'));
    expect(csv.code).toBe(0);
    const lines = fs.readFileSync(path.join(dir, 'out.csv'), 'utf8').trimEnd().split('\n');
    expect(lines.length).toBe(41);
    const specs = scheduleFromCsv(fs.readFileSync(input, 'utf8'), 'in.csv').map((r) => windowFromRow(r).spec);
    for (const k of [0, 13, 39]) {
      const series = annualSeries(specs[k]);
      expect(lines[k + 1]).toBe(summaryCsvLine({ spec: specs[k], glassArea: series.glassArea, summary: summarizeAnnual(series) }));
    }
    expect(fs.readdirSync(dir).sort()).toEqual(['in.csv', 'out.csv']);
  });

  it(`a workbook of more than ${STREAM_WORKBOOK_ABOVE} windows is streamed too: a filtered range with its totals, each row the window's own`, async () => {
    const dir = tempDir();
    const input = path.join(dir, 'in.csv');
    const n = STREAM_WORKBOOK_ABOVE + 1;
    fs.writeFileSync(input, bigSchedule(n));
    const xlsx = await run('schedule', '--in', input, '--out', path.join(dir, 'out.xlsx'));
    expect(xlsx.code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(path.join(dir, 'out.xlsx'));
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Contents', 'Summary']);
    const ws = wb.getWorksheet('Summary')!;
    expect(ws.getTables().length).toBe(0);
    expect(ws.autoFilter).toBe(`A4:V${4 + n}`);
    expect(ws.views[0]).toMatchObject({ state: 'frozen', xSplit: 1, ySplit: 4 });
    expect(ws.getCell('A4').value).toBe('Window');
    expect(ws.getCell('A5').value).toBe('South office 1');
    expect(ws.getCell(`A${4 + n}`).value).toBe(`South office ${n}`);
    const specs = scheduleFromCsv(fs.readFileSync(input, 'utf8'), 'in.csv').map((r) => windowFromRow(r).spec);
    const last = summarizeAnnual(annualSeries(specs[n - 1]));
    expect(ws.getCell(`E${4 + n}`).value).toBe(last.annualKWh);
    const total = ws.getCell(`E${5 + n}`).value as ExcelJS.CellFormulaValue;
    expect(total.formula).toBe(`SUM(E5:E${4 + n})`);
    let sum = 0;
    for (let r = 5; r < 5 + n; r++) sum += ws.getCell(`E${r}`).value as number;
    expect(total.result).toBe(sum);
    expect(String(ws.getCell('A2').value)).toMatch(/^Results are estimates/);
    expect(fs.readdirSync(dir).sort()).toEqual(['in.csv', 'out.xlsx']);
  });

  it('an interrupted run (Ctrl+C while rows are written) leaves no output and no temporary file', async () => {
    if (!fs.existsSync(path.join(ROOT, 'lib', 'cli', 'main.js'))) throw new Error('lib/ is not built: run npm run build:cli first');
    const dir = tempDir();
    const input = path.join(dir, 'in.csv');
    fs.writeFileSync(input, bigSchedule(3000));
    const child = spawn(process.execPath, [path.join(ROOT, 'bin', 'sunpane.js'), 'schedule', '--in', input, '--out', path.join(dir, 'out.csv')], { stdio: 'ignore' });
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    // Wait until the temporary file holds rows (the output is being streamed), then interrupt.
    const started = Date.now();
    for (;;) {
      const partial = fs.readdirSync(dir).find((f) => f.endsWith('.partial'));
      if (partial && fs.statSync(path.join(dir, partial)).size > 2000) break;
      if (Date.now() - started > 60_000) throw new Error('no streamed rows within a minute');
      await new Promise((r) => setTimeout(r, 20));
    }
    child.kill('SIGINT');
    expect(await exited).toBe(130);
    expect(fs.readdirSync(dir)).toEqual(['in.csv']);
  });
});
