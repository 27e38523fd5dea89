/**
 * LibreOffice headless as a real spreadsheet client for the generated workbooks: converts a file
 * with a fresh user profile per run (so no earlier settings or locks interfere), set to recalculate
 * every formula when a file is loaded — so the values read back are LibreOffice's own results,
 * not the cached ones we wrote.
 *
 * A missing LibreOffice is an error (the check must fail, never skip).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';

/** CSV export options: comma, double quote, UTF-8, from line 1, raw values (not as shown), every sheet to its own file (LibreOffice ≥ 7.2). */
export const CSV_ALL_SHEETS = 'csv:Text - txt - csv (StarCalc):44,34,76,1,,0,false,true,false,false,false,-1';

// Recalculation on load: 0 = always, 1 = never (2 ask) for OOXML and ODF files.
const profileSettings = (recalc: boolean) => `<?xml version="1.0" encoding="UTF-8"?>
<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>${recalc ? 0 : 1}</value></prop></item>
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="ODFRecalcMode" oor:op="fuse"><value>${recalc ? 0 : 1}</value></prop></item>
</oor:items>
`;

/** The LibreOffice program on PATH; throws when there is none. */
export function sofficePath(): string {
  for (const name of ['soffice', 'libreoffice']) {
    const r = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' });
    if (r.status === 0 && r.stdout.trim() !== '') return r.stdout.trim();
  }
  throw new Error('LibreOffice (soffice) is not installed: the real-client check needs it (Debian: apt-get install libreoffice-calc-nogui)');
}

/** LibreOffice's version as [major, minor, patch]. */
export function sofficeVersion(): number[] {
  const text = execFileSync(sofficePath(), ['--version'], { encoding: 'utf8' });
  const m = /LibreOffice (\d+)\.(\d+)\.(\d+)/.exec(text);
  if (!m) throw new Error(`cannot read the LibreOffice version from: ${text}`);
  return [Number(m[1]), Number(m[2]), Number(m[3])];
}

/** The result of one conversion. */
export interface Conversion {
  /** Files written to the output folder (full paths, sorted). */
  files: string[];
  stdout: string;
  stderr: string;
}

/**
 * Converts `input` with LibreOffice headless: one program start for every file given (each start
 * costs about a second of CPU before any work, so files converted the same way go in one call).
 * @param input - the file to open, or several files (their outputs must have different names: the
 *   output is named after the input)
 * @param convertTo - the `--convert-to` argument, e.g. `xlsx`, `ods`, `pdf` or {@link CSV_ALL_SHEETS}
 * @param outDir - folder for the output (created; should be empty)
 * @param options - `recalc: false` shows the results stored in the file (what LibreOffice itself
 *   computed when it wrote an ods, or our cached results) instead of recalculating every formula
 *   on load, for checks of shape, print and drawing that need no new numbers
 * @returns the files that appeared in `outDir`
 */
export function convert(input: string | string[], convertTo: string, outDir: string, options: { recalc?: boolean } = {}): Conversion {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-lo-profile-'));
  fs.mkdirSync(path.join(profile, 'user'), { recursive: true });
  fs.writeFileSync(path.join(profile, 'user', 'registrymodifications.xcu'), profileSettings(options.recalc ?? true));
  fs.mkdirSync(outDir, { recursive: true });
  try {
    const r = spawnSync(
      sofficePath(),
      [`-env:UserInstallation=file://${profile}`, '--headless', '--norestore', '--nolockcheck', '--convert-to', convertTo, '--outdir', outDir, ...(Array.isArray(input) ? input : [input])],
      { encoding: 'utf8', timeout: 180_000 },
    );
    if (r.error) throw r.error;
    if (r.status !== 0) throw new Error(`soffice exited with ${r.status}: ${r.stderr}`);
    const files = fs.readdirSync(outDir).map((f) => path.join(outDir, f)).sort();
    return { files, stdout: r.stdout, stderr: r.stderr };
  } finally {
    fs.rmSync(profile, { recursive: true, force: true });
  }
}

/** Reads a CSV file written by LibreOffice into rows of fields (RFC 4180 quoting). */
export function readCsvRows(file: string): string[][] {
  const text = fs.readFileSync(file, 'utf8');
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      row.push(field);
      field = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
    } else field += ch;
  }
  if (field !== '' || row.length > 0) {
    row.push(field);
    rows.push(row);
  }
  return rows;
}

/** The sheet CSV files of an all-sheets export, by sheet name (`<base>-<sheet>.csv`). */
export function sheetsOf(conversion: Conversion, base: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const f of conversion.files) {
    const name = path.basename(f);
    if (name.startsWith(`${base}-`) && name.endsWith('.csv')) out.set(name.slice(base.length + 1, -4), f);
  }
  return out;
}

/** Renders page `page` of a PDF to a PNG with pdftoppm; returns the PNG path. */
export function pdfPageToPng(pdf: string, page: number, pngBase: string, dpi = 110): string {
  const r = spawnSync('pdftoppm', ['-png', '-r', String(dpi), '-f', String(page), '-l', String(page), '-singlefile', pdf, pngBase], { encoding: 'utf8' });
  if (r.error) throw r.error;
  if (r.status !== 0) throw new Error(`pdftoppm exited with ${r.status}: ${r.stderr}`);
  return `${pngBase}.png`;
}
