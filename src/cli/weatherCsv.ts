/**
 * The hourly weather file: a CSV with one row per hour of the year, read into the `measured`
 * (direct normal + diffuse horizontal) or `globalHorizontal` {@link Weather} of a window.
 *
 * Format (Sunpane's own, deliberately plain):
 * - comma-separated (semicolons are accepted when a line has no comma); double quotes allowed;
 *   blank lines and lines starting with `#` are skipped;
 * - an optional header line; columns are picked by the `--dni`, `--dhi` or `--ghi` flags, each a
 *   header name (case-insensitive) or a 1-based column number; a header is required when a name
 *   is used, and is recognised by a non-numeric value in a picked column of the first line;
 * - then exactly one row per hour of the window's year, in order: 8760 rows, 8784 in a leap year;
 *   row k is the hour ENDING at k:00 local standard time on 1 January (weather-data practice);
 * - values in W/m². A blank, non-numeric, negative or implausibly high value (above
 *   {@link MAX_PLAUSIBLE_IRRADIANCE}) marks that hour missing; so does a row too short to hold a
 *   picked column. The core counts missing hours (their gain is not estimated); the reader lists
 *   their line numbers.
 */
import * as fs from 'node:fs';
import { hoursInYear } from '../core/time';
import { MAX_IRRADIANCE, type Weather } from '../core/gain';
import { CliInputError, CliUsageError } from './cliError';
import { describeFsError } from './atomicWrite';
import { parseCsv, type CsvLine } from './csv';

/** Above this irradiance [W/m²] a value is treated as a recording error and its hour as missing (the core's limit). */
export const MAX_PLAUSIBLE_IRRADIANCE = MAX_IRRADIANCE;

/** Which columns hold the weather: direct normal + diffuse horizontal, or global horizontal only. */
export type WeatherColumns = { dni: string; dhi: string; ghi?: undefined } | { ghi: string; dni?: undefined; dhi?: undefined };

/** One value that made its hour missing. */
export interface MissingValue {
  /** 1-based line number in the file. */
  line: number;
  /** The quantity (`dni`, `dhi`, `ghi`). */
  quantity: string;
  /** The text found ('' when blank or absent). */
  text: string;
  reason: string;
}

/** The weather read from a file, with the hours it could not read. */
export interface WeatherFile {
  weather: Weather;
  /** Number of hours marked missing. */
  missingHours: number;
  /** Each refused value (an hour can have more than one). */
  missing: MissingValue[];
}

interface ColumnPick {
  quantity: string;
  index: number;
}

function isNumeric(text: string): boolean {
  return text.trim() !== '' && Number.isFinite(Number(text));
}

/** Resolves a `--dni`-style flag value to a 0-based column index. */
function pickColumn(quantity: string, spec: string, header: string[] | undefined, file: string): number {
  const t = spec.trim();
  if (/^\d+$/.test(t)) {
    const n = Number(t);
    if (n < 1) throw new CliUsageError(`--${quantity} ${spec}: column numbers start at 1`);
    return n - 1;
  }
  if (!header) throw new CliInputError(`--${quantity} ${spec}: ${file} has no header line to find a column named "${spec}" (give a column number instead)`);
  const index = header.findIndex((h) => h.toLowerCase() === t.toLowerCase());
  if (index < 0) throw new CliInputError(`--${quantity} ${spec}: ${file} has no column named "${spec}" (its columns: ${header.join(', ')})`);
  return index;
}

/** Reads one value; NaN (with a reason) when it marks the hour missing. */
function readValue(fields: string[], index: number): { value: number; text: string; reason?: string } {
  if (index >= fields.length) return { value: NaN, text: '', reason: `the row has only ${fields.length} columns` };
  const text = fields[index];
  if (text === '') return { value: NaN, text, reason: 'blank' };
  if (!isNumeric(text)) return { value: NaN, text, reason: 'not a number' };
  const value = Number(text);
  if (value < 0) return { value: NaN, text, reason: 'negative' };
  if (value > MAX_PLAUSIBLE_IRRADIANCE) return { value: NaN, text, reason: `above ${MAX_PLAUSIBLE_IRRADIANCE} W/m²` };
  return { value, text };
}

/**
 * Reads hourly weather from CSV text.
 * @param text - the file content
 * @param file - the file name, for messages
 * @param year - the window's calendar year (fixes the row count: 8760 or 8784)
 * @param columns - the picked columns
 * @throws CliInputError for a wrong row count (expected vs found) or a column that does not exist
 */
export function weatherFromCsv(text: string, file: string, year: number, columns: WeatherColumns): WeatherFile {
  const lines = parseCsv(text);
  if (lines.length === 0) throw new CliInputError(`${file} is empty: expected ${hoursInYear(year)} hourly rows for ${year}`);
  const wanted: [string, string][] = columns.ghi !== undefined ? [['ghi', columns.ghi]] : [['dni', columns.dni], ['dhi', columns.dhi]];
  const first = lines[0].fields;
  const byName = wanted.some(([, spec]) => !/^\d+$/.test(spec.trim()));
  const firstIsHeader = byName || wanted.some(([, spec]) => /^\d+$/.test(spec.trim()) && !isNumeric(first[Number(spec) - 1] ?? ''));
  const header = firstIsHeader ? first : undefined;
  const picks: ColumnPick[] = wanted.map(([quantity, spec]) => ({ quantity, index: pickColumn(quantity, spec, header, file) }));
  const rows: CsvLine[] = firstIsHeader ? lines.slice(1) : lines;
  const expected = hoursInYear(year);
  if (rows.length !== expected) {
    const lastLine = rows.length > 0 ? `, lines ${rows[0].line}–${rows[rows.length - 1].line}` : '';
    throw new CliInputError(
      `${file}: expected ${expected} hourly rows for ${year} (one per hour, the first ending at 01:00 on 1 January), found ${rows.length}${lastLine}`,
    );
  }
  const series = picks.map(() => new Float64Array(expected));
  const missing: MissingValue[] = [];
  let missingHours = 0;
  rows.forEach((row, h) => {
    let rowMissing = false;
    picks.forEach((pick, k) => {
      const r = readValue(row.fields, pick.index);
      series[k][h] = r.value;
      if (r.reason) {
        rowMissing = true;
        missing.push({ line: row.line, quantity: pick.quantity, text: r.text, reason: r.reason });
      }
    });
    if (rowMissing) {
      missingHours++;
      for (const s of series) s[h] = NaN;
    }
  });
  const weather: Weather = columns.ghi !== undefined ? { kind: 'globalHorizontal', ghi: series[0] } : { kind: 'measured', dni: series[0], dhi: series[1] };
  return { weather, missingHours, missing };
}

/** Reads a weather file from disk; see {@link weatherFromCsv}. */
export function readWeatherFile(file: string, year: number, columns: WeatherColumns): WeatherFile {
  let text: string;
  try {
    text = fs.readFileSync(file, 'utf8');
  } catch (err) {
    throw new CliInputError(`cannot read the weather file ${file}: ${describeFsError(err)}`);
  }
  return weatherFromCsv(text, file, year, columns);
}

/** A short account of missing hours for stderr: the count and the first few lines with reasons. */
export function describeMissing(file: string, w: WeatherFile, shown = 8): string | undefined {
  if (w.missingHours === 0) return undefined;
  const items = w.missing.slice(0, shown).map((m) => `line ${m.line} ${m.quantity} ${m.text === '' ? '' : `"${m.text}" `}(${m.reason})`);
  const more = w.missing.length > shown ? `, and ${w.missing.length - shown} more` : '';
  return `${file}: ${w.missingHours} hour${w.missingHours === 1 ? '' : 's'} missing — ${items.join('; ')}${more}`;
}
