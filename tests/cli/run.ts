/**
 * Test helpers for the command line: run `main` in process with captured output, compare text with
 * a saved expected file (tests/cli/expected/), and make temporary folders.
 *
 * Saved outputs are generated once, reviewed, and committed; a test fails when the output changes.
 * After an intended change, regenerate them with SUNPANE_UPDATE_EXPECTED=1 and review the diff.
 */
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import { main } from '../../src/cli/main';

export const ROOT = path.join(__dirname, '..', '..');
export const EXAMPLES = path.join(ROOT, 'examples');

export interface RunResult {
  code: number;
  out: string;
  err: string;
}

/** Runs the CLI in process; stdout and stderr lines are collected. */
export async function run(...argv: string[]): Promise<RunResult> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, { out: (t) => out.push(t), err: (t) => err.push(t) });
  return { code, out: out.join('\n'), err: err.join('\n') };
}

/** A fresh temporary folder. */
export function tempDir(prefix = 'sunpane-cli-'): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), prefix));
}

/** Compares text with tests/cli/expected/<name>; rewrites the file instead when SUNPANE_UPDATE_EXPECTED=1. */
export function expectSaved(name: string, actual: string): void {
  const file = path.join(__dirname, 'expected', name);
  const text = actual.endsWith('\n') ? actual : `${actual}\n`;
  if (process.env.SUNPANE_UPDATE_EXPECTED === '1') {
    fs.mkdirSync(path.dirname(file), { recursive: true });
    fs.writeFileSync(file, text);
    return;
  }
  if (!fs.existsSync(file)) throw new Error(`no saved output ${file}: run with SUNPANE_UPDATE_EXPECTED=1 once and review it`);
  expect(text).toBe(fs.readFileSync(file, 'utf8'));
}
