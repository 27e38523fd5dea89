/**
 * The hourly weather file of `sunpane table` and `sunpane schedule`: a CSV file read into the
 * table of cells that src/io/weather.ts checks (the pane's weather ranges go through the same
 * checks, so both report the same problems in the same words).
 *
 * Format (Sunpane's own, deliberately plain):
 * - comma-separated, or semicolon-separated when the first line that is not a comment has a
 *   semicolon (the usual form with decimal commas); double quotes allowed; blank lines and lines
 *   starting with `#` are skipped;
 * - an optional header line; columns are picked by the `--dni`, `--dhi`, `--ghi` and `--time`
 *   flags, each a header name (case-insensitive; a unit in brackets may be left out) or a 1-based
 *   column number; a header is required when a name is used, and is recognised by a text that is
 *   not a number in a picked column of the first line;
 * - a time-stamp column (ISO 8601, e.g. `2026-01-01T01:00`): `--time COL`, or found as the first
 *   column whose first value is a stamp; `--time none` reads the rows in order instead, exactly one
 *   per hour of the window's year;
 * - units in each header (`direct normal [W/m²]`, `[Wh/m2]`, `[kJ/m2]`) or by `--units`;
 * - every line has as many fields as the header: a line with more (decimal commas in a
 *   comma-separated file split each number in two) or too few to reach a picked column cannot be
 *   read, and is reported.
 */
import * as fs from 'node:fs';
import { type Site } from '../core/sun';
import { readCsvText } from '../io/csvText';
import { type DecimalMark, readNumberText } from '../io/numberText';
import { readStampText } from '../io/stampText';
import {
  DEFAULT_MAX_UNUSABLE_PERCENT,
  HOUR_STAMPS,
  type HourStamp,
  type WeatherAdvice,
  type WeatherCheck,
  type WeatherColumn,
  type WeatherTable,
  type WeatherUnit,
  checkWeather,
  describeWeatherCheck,
  readUnitText,
} from '../io/weather';
import { describeFsError } from './atomicWrite';
import { CliInputError, CliUsageError } from './cliError';
import type { Flags } from './flags';

/** Which columns hold the weather (header names or 1-based numbers); `time: 'none'` for no stamps. */
export interface WeatherColumns {
  dni?: string;
  dhi?: string;
  ghi?: string;
  time?: string;
}

/** How the user asked the weather to be read (the flags besides the columns). */
export interface WeatherReading {
  unit?: WeatherUnit;
  decimalMark?: DecimalMark;
  typicalYear?: boolean;
  hourStamp?: HourStamp;
  maxUnusablePercent?: number;
}

/** The command line's names for its weather options, for advice in messages. */
export const CLI_WEATHER_ADVICE: WeatherAdvice = {
  unit: '--units W/m2|Wh/m2|kJ/m2',
  decimal: '--decimal point|comma',
  typicalYear: '--typical-year',
  hourStamp: (c) => `--hour-stamp ${c}`,
  maxUnusable: '--max-unusable PERCENT sets it',
};

/** A header without a unit in brackets, for matching a column name (`direct normal [W/m²]` → `direct normal`). */
function headerKey(h: string): string {
  return h
    .replace(/[([][^)\]]*[)\]]/g, '')
    .trim()
    .toLowerCase();
}

function isNumberText(text: string): boolean {
  return readNumberText(text, 'point') !== undefined || readNumberText(text, 'comma') !== undefined;
}

/** Resolves a `--dni`-style flag value to a 0-based column index. */
function pickColumn(flag: string, spec: string, header: string[] | undefined, file: string): number {
  const t = spec.trim();
  if (/^\d+$/.test(t)) {
    const n = Number(t);
    if (n < 1) throw new CliUsageError(`--${flag} ${spec}: column numbers start at 1`);
    return n - 1;
  }
  if (!header) throw new CliInputError(`--${flag} ${spec}: ${file} has no header line to find a column named "${spec}" (give a column number instead)`);
  let index = header.findIndex((h) => h.toLowerCase() === t.toLowerCase());
  if (index < 0) index = header.findIndex((h) => headerKey(h) === headerKey(t));
  if (index < 0) throw new CliInputError(`--${flag} ${spec}: ${file} has no column named "${spec}" (its columns: ${header.join(', ')})`);
  return index;
}

/**
 * Reads weather CSV text into a table of cells for {@link checkWeather}.
 * @param text - the file content
 * @param file - the file name, for messages
 * @param columns - the picked columns
 * @throws CliInputError for a column that does not exist; CliUsageError for a column number below 1
 */
export function weatherTableFromCsv(text: string, file: string, columns: WeatherColumns): WeatherTable {
  const { lines, separator } = readCsvText(text);
  const wanted = (['dni', 'dhi', 'ghi'] as const).filter((q) => columns[q] !== undefined).map((q) => [q, columns[q]!] as const);
  const first = lines[0]?.fields ?? [];
  const byName = [...wanted.map(([, s]) => s), ...(columns.time !== undefined && columns.time !== 'none' ? [columns.time] : [])].some((s) => !/^\d+$/.test(s.trim()));
  const firstIsHeader =
    lines.length > 0 &&
    (byName ||
      wanted.some(([, s]) => {
        const cell = first[Number(s) - 1] ?? '';
        return cell.trim() !== '' && !isNumberText(cell);
      }));
  const header = firstIsHeader ? first : undefined;
  const body = firstIsHeader ? lines.slice(1) : lines;
  const picks = wanted.map(([q, spec]) => ({ q, index: pickColumn(q, spec, header, file) }));

  let timeIndex: number | undefined;
  if (columns.time !== undefined && columns.time.trim().toLowerCase() !== 'none') timeIndex = pickColumn('time', columns.time, header, file);
  else if (columns.time === undefined && body.length > 0) {
    const taken = new Set(picks.map((p) => p.index));
    const k = body[0].fields.findIndex((f, i) => !taken.has(i) && readStampText(f) !== undefined);
    if (k >= 0) timeIndex = k;
  }

  // Lines whose fields do not line up with the header (or with the usual line, without one).
  const counts = new Map<number, number>();
  for (const l of body) counts.set(l.fields.length, (counts.get(l.fields.length) ?? 0) + 1);
  const usual = header?.length ?? [...counts.entries()].sort((a, b) => b[1] - a[1])[0]?.[0] ?? 0;
  const needed = Math.max(...picks.map((p) => p.index), timeIndex ?? -1) + 1;
  const brokenRows = new Map<number, string>();
  let tooMany = false;
  body.forEach((l, k) => {
    const extra = l.fields.slice(usual);
    if (extra.some((f) => f !== '')) {
      brokenRows.set(k, `${l.fields.length} fields where ${header ? 'the header has' : 'most lines have'} ${usual}`);
      tooMany = true;
    } else if (l.fields.length < needed) brokenRows.set(k, `${l.fields.length} field${l.fields.length === 1 ? '' : 's'}, too few to reach column ${needed}`);
  });

  const column = (index: number): WeatherColumn => ({
    ...(header ? { header: header[index] } : {}),
    cells: body.map((l) => l.fields[index]),
  });
  const table: WeatherTable = {
    columns: Object.fromEntries(picks.map((p) => [p.q, column(p.index)])),
    rows: body.length,
    where: (row) => `line ${body[row].line}`,
    brokenRows,
    ...(timeIndex !== undefined ? { stamps: column(timeIndex) } : {}),
    ...(tooMany && separator === ','
      ? { brokenHint: 'decimal commas in a comma-separated file split each number in two: separate the fields with semicolons, or put each number in quotes' }
      : {}),
  };
  return table;
}

/** Reads a weather file from disk into a table; see {@link weatherTableFromCsv}. */
export function readWeatherTable(file: string, columns: WeatherColumns): WeatherTable {
  let text: string;
  try {
    text = fs.readFileSync(file, 'utf8');
  } catch (err) {
    throw new CliInputError(`cannot read the weather file ${file}: ${describeFsError(err)}`);
  }
  return weatherTableFromCsv(text, file, columns);
}

/** A weather file checked for one window's year and site, with its report for stderr. */
export interface CheckedWeather {
  check: WeatherCheck;
  /** Lines for stderr (problems, notes); empty when there is nothing to say. */
  report: string[];
}

/**
 * Checks a weather table for a year and site (src/io/weather.ts).
 * @throws CliInputError with the whole report when the weather cannot be used
 */
export function checkWeatherTable(table: WeatherTable, file: string, year: number, site: Site, reading: WeatherReading = {}): CheckedWeather {
  const check = checkWeather(table, { year, site, ...reading, advice: CLI_WEATHER_ADVICE });
  const report = describeWeatherCheck(check, file, CLI_WEATHER_ADVICE);
  if (!check.usable) throw new CliInputError(report.join('\n'));
  return { check, report };
}

/** The weather flags of `table` and `schedule` (see {@link WEATHER_HELP}). */
export const WEATHER_FLAGS = {
  weather: true,
  dni: true,
  dhi: true,
  ghi: true,
  time: true,
  units: true,
  decimal: true,
  'typical-year': false,
  'hour-stamp': true,
  'max-unusable': true,
} as const;

/** The weather flags' lines of a help text. */
export const WEATHER_HELP = `  --weather FILE.csv   hourly weather (a header line is optional; # lines are comments; fields
                       separated by commas, or by semicolons when the first line has one)
  --dni COL --dhi COL  columns of direct normal and diffuse horizontal irradiance
  --ghi COL            or a column of global horizontal irradiance (split by Erbs et al. 1982);
                       with --dni and --dhi as well, it is used to check them
                       COL is a header name (a unit in brackets may be left out) or a 1-based
                       column number
  --time COL           the column of time stamps (ISO 8601, e.g. 2026-01-01T01:00; a zone such as
                       Z or +01:00 is converted); default: the first column holding stamps;
                       "none": the rows are the year's hours in order
  --hour-stamp end|start|middle   what a stamp marks (default end: the row stamped 01:00 is the
                       first hour of the year)
  --typical-year       the stamps are of a typical year: read them by month, day and hour as the
                       window's year, whatever year they state
  --units W/m2|Wh/m2|kJ/m2   units of the columns, unless their headers say (e.g. "dni [W/m2]");
                       Wh/m2 and kJ/m2 are sums over each hour; default W/m2
  --decimal point|comma   the decimal mark (default: found from the file)
  --max-unusable PERCENT  refuse the weather when more of the year's hours than this cannot be
                       used (default ${DEFAULT_MAX_UNUSABLE_PERCENT})

  Every hour is checked: stamps (other years, gaps, repeats, order), numbers, physical limits at
  the sun's position, light keeping time with the sun. Problems are listed by kind with their
  lines; an unusable hour is left out of the totals (never read as zero).`;

/** The weather file and how to read it, from the flags; undefined without --weather. */
export interface WeatherRequest {
  file: string;
  columns: WeatherColumns;
  reading: WeatherReading;
}

/**
 * Reads the weather flags.
 * @throws CliUsageError for a weather flag without --weather, a bad combination of columns, or an option value not allowed
 */
export function weatherRequest(flags: Flags): WeatherRequest | undefined {
  const given = (Object.keys(WEATHER_FLAGS) as (keyof typeof WEATHER_FLAGS)[]).filter((k) => k !== 'weather' && flags.has(k));
  const file = flags.get('weather');
  if (file === undefined) {
    if (given.length) throw new CliUsageError(`${given.map((g) => `--${g}`).join(', ')} ${given.length > 1 ? 'are' : 'is'} about a --weather file: give --weather FILE.csv too`);
    return undefined;
  }
  const [dni, dhi, ghi, time] = [flags.get('dni'), flags.get('dhi'), flags.get('ghi'), flags.get('time')];
  if ((dni === undefined) !== (dhi === undefined)) throw new CliUsageError('--dni and --dhi go together (with --ghi as well to check them), or give --ghi alone');
  if (dni === undefined && ghi === undefined) throw new CliUsageError('--weather needs its columns: --dni COL --dhi COL, or --ghi COL');
  const columns: WeatherColumns = { ...(dni !== undefined ? { dni, dhi } : {}), ...(ghi !== undefined ? { ghi } : {}), ...(time !== undefined ? { time } : {}) };
  const reading: WeatherReading = {};
  const units = flags.get('units');
  if (units !== undefined) {
    const unit = readUnitText(units);
    if (!unit) throw new CliUsageError(`--units ${units}: must be W/m2, Wh/m2 or kJ/m2`);
    reading.unit = unit;
  }
  const decimal = flags.get('decimal');
  if (decimal !== undefined) {
    if (decimal !== 'point' && decimal !== 'comma') throw new CliUsageError(`--decimal ${decimal}: must be point or comma`);
    reading.decimalMark = decimal;
  }
  const stamp = flags.get('hour-stamp');
  if (stamp !== undefined) {
    if (!(HOUR_STAMPS as readonly string[]).includes(stamp)) throw new CliUsageError(`--hour-stamp ${stamp}: must be ${HOUR_STAMPS.join(', ')}`);
    reading.hourStamp = stamp as HourStamp;
  }
  if (flags.has('typical-year')) reading.typicalYear = true;
  const limit = flags.get('max-unusable');
  if (limit !== undefined) {
    const p = Number(limit.replace(/%$/, ''));
    if (limit.trim() === '' || !Number.isFinite(p) || p < 0 || p > 100) throw new CliUsageError(`--max-unusable ${limit}: must be a percentage from 0 to 100`);
    reading.maxUnusablePercent = p;
  }
  return { file, columns, reading };
}
