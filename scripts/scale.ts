/**
 * `npm run scale`: a schedule of 10,000 windows (a firm's portfolio) through `sunpane schedule` to
 * CSV and to a workbook, each run measured by GNU time (`/usr/bin/time -v`, Debian's `time`
 * package): peak memory (maximum resident set size) and wall-clock time. Fails when either run
 * needs more than 1 GB, does not write one row per window, or exits with an error. Not part of
 * `npm test` (it takes minutes); `tests/cli/scheduleStream.test.ts` checks the streaming at a small
 * scale there.
 *
 * The windows are invented: the rows of examples/windows.csv repeated on the five example sites,
 * with the facing turned and the size varied from row to row.
 *
 *   node -r ts-node/register/transpile-only scripts/scale.ts [WINDOWS]   (default 10000)
 */
import { spawnSync } from 'node:child_process';
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { EXAMPLE_SITES } from '../src/demo/sites';

const ROOT = path.resolve(__dirname, '..');
const TIME = '/usr/bin/time';
const LIMIT_KB = 1024 * 1024; // 1 GB

/** The invented portfolio: `n` windows as a schedule CSV. */
export function portfolioCsv(n: number): string {
  const lines = fs.readFileSync(path.join(ROOT, 'examples', 'windows.csv'), 'utf8').trimEnd().split('\n').filter((l) => !l.startsWith('#'));
  const [header, ...rows] = lines;
  const col = (name: string) => header.split(',').indexOf(name);
  const [name, site, faces, width] = [col('Window'), col('Site'), col('Faces [°]'), col('Width [m]')];
  const out = [header];
  for (let k = 0; k < n; k++) {
    const cells = rows[k % rows.length].split(',');
    cells[name] = `${cells[name]} ${k + 1}`;
    cells[site] = EXAMPLE_SITES[Math.floor(k / rows.length) % EXAMPLE_SITES.length].id;
    cells[faces] = String((Number(cells[faces]) + 13 * Math.floor(k / (rows.length * EXAMPLE_SITES.length))) % 360);
    cells[width] = (Number(cells[width]) * (0.8 + ((k * 7) % 9) / 20)).toFixed(2);
    out.push(cells.join(','));
  }
  return `${out.join('\n')}\n`;
}

interface Measured {
  output: string;
  peakMB: number;
  seconds: number;
  rows: number;
}

/** Runs `sunpane schedule` under GNU time; returns its peak memory, time and the rows written. */
async function measure(input: string, output: string): Promise<Measured> {
  const r = spawnSync(TIME, ['-v', process.execPath, path.join(ROOT, 'bin', 'sunpane.js'), 'schedule', '--in', input, '--out', output], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  if (r.status !== 0) throw new Error(`sunpane schedule --out ${path.basename(output)} failed (status ${r.status}):\n${r.stderr}`);
  const kb = Number(/Maximum resident set size \(kbytes\): (\d+)/.exec(r.stderr)?.[1]);
  const wall = /Elapsed \(wall clock\) time \(h:mm:ss or m:ss\): ([\d:.]+)/.exec(r.stderr)?.[1] ?? '';
  const seconds = wall.split(':').reduce((acc, part) => acc * 60 + Number(part), 0);
  let rows: number;
  if (output.endsWith('.csv')) rows = fs.readFileSync(output, 'utf8').trimEnd().split('\n').length - 1;
  else {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(output);
    const ws = wb.getWorksheet('Summary')!;
    rows = ws.rowCount - 5; // title, caution, blank, header … rows … totals
  }
  return { output: path.basename(output), peakMB: kb / 1024, seconds, rows };
}

async function main(): Promise<void> {
  const n = Number(process.argv[2] ?? 10_000);
  if (!fs.existsSync(TIME)) throw new Error(`${TIME} is missing: install Debian's "time" package (GNU time) to measure peak memory`);
  if (!fs.existsSync(path.join(ROOT, 'lib', 'cli', 'main.js'))) throw new Error('lib/ is not built: run npm run build:cli first');
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-scale-'));
  const input = path.join(dir, 'portfolio.csv');
  fs.writeFileSync(input, portfolioCsv(n));
  const results: Measured[] = [];
  for (const ext of ['csv', 'xlsx']) results.push(await measure(input, path.join(dir, `summary.${ext}`)));
  console.log(`sunpane schedule, ${n} windows on ${EXAMPLE_SITES.length} example sites (invented), measured by GNU time`);
  for (const m of results) console.log(`  ${m.output.padEnd(14)} peak memory ${m.peakMB.toFixed(0).padStart(5)} MB   time ${m.seconds.toFixed(1).padStart(6)} s   rows ${m.rows}`);
  fs.rmSync(dir, { recursive: true, force: true });
  const bad = results.filter((m) => m.peakMB * 1024 > LIMIT_KB || m.rows !== n);
  if (bad.length) {
    console.error(`FAILED: ${bad.map((m) => `${m.output}: ${m.rows !== n ? `${m.rows} rows for ${n} windows` : `peak memory ${m.peakMB.toFixed(0)} MB > 1024 MB`}`).join('; ')}`);
    process.exitCode = 1;
  } else console.log('peak memory within 1 GB; one row per window');
}

if (require.main === module) {
  main().catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exitCode = 1;
  });
}
