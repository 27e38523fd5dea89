/**
 * Outputs that cannot hurt: labels from the user never become formulas in CSV or workbook output;
 * an existing output file is replaced only with --force and a read-only one never; a window file
 * saved with a byte-order mark is read; every command and subcommand answers --help; a closed pipe
 * (`sunpane list | head -1`) ends the command quietly with exit status 0.
 */
import { spawnSync } from 'node:child_process';
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { EXAMPLES, ROOT, run, tempDir } from './run';

const WINDOW = path.join(EXAMPLES, 'east-office.json');
const BIN = path.join(ROOT, 'bin', 'sunpane.js');
const HOSTILE = ['=HYPERLINK("http://example.invalid","click")', '+1+2', '-3+4', '@SUM(A1)'];

function writeTemp(dir: string, name: string, text: string | Buffer): string {
  const file = path.join(dir, name);
  fs.writeFileSync(file, text);
  return file;
}

/** A schedule of the example site whose window labels are the hostile texts. */
function hostileSchedule(dir: string): string {
  const rows = HOSTILE.map((name, i) => `"${name.replace(/"/g, '""')}",brackwater,2026,${90 * i},1.5,1.2,0.4`);
  return writeTemp(dir, 'hostile.csv', `Window,Site,Year,Faces,Width,Height,SHGC\n${rows.join('\n')}\n`);
}

describe('labels from the user are written as text, never as formulas', () => {
  it('CSV: a label starting with = + - @ gets an apostrophe in front', async () => {
    const dir = tempDir();
    const out = path.join(dir, 's.csv');
    const r = await run('schedule', '--in', hostileSchedule(dir), '--out', out);
    expect(r.code).toBe(0);
    const firstFields = fs
      .readFileSync(out, 'utf8')
      .trimEnd()
      .split('\n')
      .slice(1)
      .map((l) => (l.startsWith('"') ? /^"((?:[^"]|"")*)"/.exec(l)![1].replace(/""/g, '"') : l.split(',')[0]));
    expect(firstFields).toEqual(HOSTILE.map((h) => `'${h}`));
  });

  it('workbook: the same labels are text cells with the apostrophe, and no cell of the table holds a formula', async () => {
    const dir = tempDir();
    const out = path.join(dir, 's.xlsx');
    const r = await run('schedule', '--in', hostileSchedule(dir), '--out', out);
    expect(r.code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    const ws = wb.getWorksheet('Summary')!;
    // Under the title and the caution, the table's header is in row 4 and the windows start in row 5.
    const labels = HOSTILE.map((_, i) => ws.getCell(5 + i, 1));
    expect(labels.map((c) => c.value)).toEqual(HOSTILE.map((h) => `'${h}`));
    for (const c of labels) expect(c.type).toBe(ExcelJS.ValueType.String);
    for (let row = 5; row < 5 + HOSTILE.length; row++) {
      ws.getRow(row).eachCell((c) => expect(c.type).not.toBe(ExcelJS.ValueType.Formula));
    }
  });

  it("the table command's heat-map title, which starts with the window's name, is escaped as well", async () => {
    const dir = tempDir();
    const json = { ...JSON.parse(fs.readFileSync(WINDOW, 'utf8')), name: '=1+1' };
    const out = path.join(dir, 't.xlsx');
    const r = await run('table', '--window', writeTemp(dir, 'w.json', JSON.stringify(json)), '--out', out);
    expect(r.code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    expect(String(wb.getWorksheet('Heat map')!.getCell('A1').value)).toMatch(/^'=1\+1: /);
  });
});

describe('existing outputs are kept', () => {
  it.each(['csv', 'xlsx'])('an existing .%s is not replaced without --force, and the message says so', async (ext) => {
    const dir = tempDir();
    const out = writeTemp(dir, `t.${ext}`, 'earlier result');
    const r = await run('table', '--window', WINDOW, '--out', out);
    expect(r.code).toBe(1);
    expect(r.err).toBe(`sunpane: ${out} exists: give --force to replace it`);
    expect(fs.readFileSync(out, 'utf8')).toBe('earlier result');
    expect(fs.readdirSync(dir)).toEqual([`t.${ext}`]);
  });

  it('--force replaces an existing output', async () => {
    const dir = tempDir();
    const out = writeTemp(dir, 's.csv', 'earlier result');
    const r = await run('schedule', '--in', path.join(EXAMPLES, 'windows.csv'), '--out', out, '--force');
    expect(r.code).toBe(0);
    expect(fs.readFileSync(out, 'utf8')).toMatch(/^Window,/);
  });

  it('a read-only output is never replaced, even with --force', async () => {
    const dir = tempDir();
    const out = writeTemp(dir, 't.csv', 'protected');
    fs.chmodSync(out, 0o444);
    const r = await run('table', '--window', WINDOW, '--out', out, '--force');
    expect(r.code).toBe(1);
    expect(r.err).toBe(`sunpane: ${out} is read-only: not replaced`);
    expect(fs.readFileSync(out, 'utf8')).toBe('protected');
    expect(fs.readdirSync(dir)).toEqual(['t.csv']);
  });

  it('demo refuses to replace its earlier workbook without --force, and a read-only one even with it, before any work', async () => {
    const dir = tempDir();
    const file = writeTemp(dir, 'sunpane-demo.xlsx', 'earlier');
    const r = await run('demo', '--out', dir);
    expect(r.code).toBe(1);
    expect(r.err).toBe(`sunpane: ${file} exists: give --force to replace it`);
    fs.chmodSync(file, 0o444);
    const forced = await run('demo', '--out', dir, '--force');
    expect(forced.code).toBe(1);
    expect(forced.err).toBe(`sunpane: ${file} is read-only: not replaced`);
    expect(fs.readFileSync(file, 'utf8')).toBe('earlier');
    expect(fs.readdirSync(dir)).toEqual(['sunpane-demo.xlsx']);
  });
});

describe('window files', () => {
  it('a window file saved with a byte-order mark is read like one without', async () => {
    const dir = tempDir();
    const bom = writeTemp(dir, 'bom.json', Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), fs.readFileSync(WINDOW)]));
    const a = await run('table', '--window', bom, '--out', path.join(dir, 'a.csv'));
    const b = await run('table', '--window', WINDOW, '--out', path.join(dir, 'b.csv'));
    expect([a.code, b.code]).toEqual([0, 0]);
    expect(fs.readFileSync(path.join(dir, 'a.csv'), 'utf8')).toBe(fs.readFileSync(path.join(dir, 'b.csv'), 'utf8'));
  });
});

describe('--help everywhere', () => {
  it.each(['list --help', 'call --help', 'table --help', 'schedule --help', 'demo --help', 'call SUNALTITUDE --help', 'help', 'list -h', 'call -h', 'schedule -h'])(
    '`sunpane %s` prints help and exits 0',
    async (line) => {
      const r = await run(...line.split(' '));
      expect(r.code).toBe(0);
      expect(r.err).toBe('');
      expect(r.out).toMatch(/usage: sunpane/);
    },
  );

  it('`sunpane call --help` explains call rather than looking for a function named --help', async () => {
    const r = await run('call', '--help');
    expect(r.out).toMatch(/^usage: sunpane call NAME \[ARG\.\.\.\]/);
    expect(r.out).not.toMatch(/no function named/);
  });

  it('`sunpane call NAME --help` describes that function: its parameters with units and ranges', async () => {
    const r = await run('call', 'SUNALTITUDE', '--help');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^usage: sunpane call SUNALTITUDE /);
    expect(r.out).toMatch(/latitude/);
  });

  it('`sunpane help COMMAND` works for every command, list and call included', async () => {
    for (const c of ['list', 'call', 'table', 'schedule', 'demo']) {
      const r = await run('help', c);
      expect(r.code).toBe(0);
      expect(r.out).toMatch(new RegExp(`usage: sunpane ${c}`));
    }
  });
});

describe('exit status of `sunpane call`', () => {
  it('#N/A is an answer (no sunrise on a polar day: 0), #VALUE! a refusal (1); the help says which', async () => {
    // 85° N on 21 June: the sun stays up all day (any almanac; NREL SPA's own event search says so too).
    const polar = await run('call', 'SUNRISE', '2026-06-21', '85', '0', '0');
    expect([polar.code, polar.out]).toEqual([0, '#N/A']);
    expect(polar.err).toMatch(/polar day/);
    const bad = await run('call', 'SUNRISE', '2026-06-21', '95', '0', '0');
    expect([bad.code, bad.out]).toEqual([1, '#VALUE!']);
    expect(bad.err).toMatch(/^latitude = 95 is not allowed/);
    const help = await run('call', '--help');
    expect(help.out).toMatch(/0 done \(a #N\/A cell is an answer/);
    expect(help.out).toMatch(/1 a cell is #VALUE!/);
  });
});

describe('a closed pipe', () => {
  /** Runs `sunpane ARGS | READER` in bash with pipefail; returns the pipeline's status and sunpane's stderr. */
  function piped(args: string, reader: string): { status: string; stderr: string } {
    if (!fs.existsSync(path.join(ROOT, 'lib', 'cli', 'main.js'))) throw new Error('lib/ is not built: run npm run build:cli first');
    const r = spawnSync('/bin/bash', ['-c', `set -o pipefail; "${process.execPath}" "${BIN}" ${args} | ${reader} >/dev/null; echo "$?"`], { encoding: 'utf8' });
    return { status: r.stdout.trim(), stderr: r.stderr };
  }

  it('`sunpane list` into a reader that has already gone (`| true`) ends quietly with status 0', () => {
    for (let i = 0; i < 3; i++) expect(piped('list', 'true')).toEqual({ status: '0', stderr: '' });
  });

  it('a long result (`sunpane call WINDOWYEAR ... | head -1`) ends quietly with status 0', () => {
    expect(piped('call WINDOWYEAR 2026 52 5 1 180 1.5 1.2 0.4 gain "" "" 0.4 2.3', 'head -1')).toEqual({ status: '0', stderr: '' });
  });
});
