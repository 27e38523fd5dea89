/**
 * The shared formula table (tests/fixtures/formulas.ts — its header names the source of every
 * expected value) through the command line: `sunpane call NAME ARG...` must show what the Excel
 * add-in shows, with ranges typed as array constants ({1,2;3,4}). One call also goes through the
 * installed entry point, `node bin/sunpane.js` (the compiled lib/, built by `npm run build:cli`).
 */
import { spawnSync } from 'node:child_process';
import * as fs from 'node:fs';
import * as path from 'node:path';
import { main } from '../../src/cli/main';
import { FORMULAS, cliArg } from '../fixtures/formulas';

const ROOT = path.resolve(__dirname, '../..');

async function runCli(argv: string[]): Promise<{ code: number; out: string[]; err: string[] }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, { out: (t) => out.push(t), err: (t) => err.push(t) });
  return { code, out, err };
}

describe('the shared formula table on the command line', () => {
  test.each(FORMULAS.map((r, i) => [`${i + 1}. ${r.fn}: ${r.source}`, r] as const))('%s', async (_label, row) => {
    const { code, out, err } = await runCli(['call', row.fn, ...row.args.map(cliArg)]);
    const e = row.expect;
    if ('values' in e) {
      expect({ code, err }).toEqual({ code: 0, err: [] });
      const cells = out.map((line) => line.split('\t'));
      expect([cells.length, cells[0]?.length]).toEqual([e.values.length, e.values[0].length]);
      e.values.forEach((r, i) =>
        r.forEach((v, j) => {
          if (typeof v === 'number') {
            const shown = Number(cells[i][j]);
            expect(Number.isFinite(shown)).toBe(true);
            // The CLI prints 12 significant digits: allow that rounding on top of the row's tolerance.
            expect(Math.abs(shown - v)).toBeLessThanOrEqual(e.tolerance + Math.abs(v) * 1e-11);
          } else expect(cells[i][j]).toBe(v);
        }),
      );
    } else {
      // A per-cell error prints the code in the cell; a refused call prints nothing. The message goes to stderr.
      if (out.length > 0) expect(out).toEqual([e.error]);
      expect(code).toBe(e.error === '#VALUE!' ? 1 : 0);
      expect(err.length).toBeGreaterThan(0);
      expect(err[0].slice(0, e.messageStart.length)).toBe(e.messageStart);
    }
  });
});

describe('the installed command', () => {
  test('`node bin/sunpane.js call` prints the SPA worked example’s zenith angle', () => {
    if (!fs.existsSync(path.join(ROOT, 'lib', 'cli', 'main.js'))) throw new Error('lib/ is missing: run `npm run build:cli` (npm test does it in pretest)');
    const row = FORMULAS.find((r) => r.fn === 'SUNZENITH' && 'values' in r.expect)!;
    const run = spawnSync(process.execPath, [path.join(ROOT, 'bin', 'sunpane.js'), 'call', row.fn, ...row.args.map(cliArg)], { encoding: 'utf8', timeout: 60_000 });
    expect(run.status).toBe(0);
    expect(run.stderr).toBe('');
    const e = row.expect as { values: number[][]; tolerance: number };
    expect(Math.abs(Number(run.stdout.trim()) - e.values[0][0])).toBeLessThanOrEqual(e.tolerance);
  });

  test('`node bin/sunpane.js call` exits 1 with the message for a bad argument', () => {
    const run = spawnSync(process.execPath, [path.join(ROOT, 'bin', 'sunpane.js'), 'call', 'SUNZENITH', '2003-10-17T12:30:30', '91', '0', '0'], { encoding: 'utf8', timeout: 60_000 });
    expect(run.status).toBe(1);
    expect(run.stdout.trim()).toBe('#VALUE!');
    expect(run.stderr).toMatch(/^latitude = 91 is not allowed: must be a number from -90 to 90 °/);
  });
});
