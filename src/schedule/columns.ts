/**
 * The window schedule — one row per window — described for every reader: the task pane reads it
 * from an Excel table, `sunpane schedule` from a CSV file or the first sheet of a workbook, and a
 * worksheet function from a header row over one row (SOLARGAIN and the other window functions).
 *
 * The columns ARE the glossary's window fields (src/registry/glossary.ts): a column's header is the
 * field's label (`Overhang projection [m]`), and the field's name (`overhangProjection`) and older
 * names (`Overhang depth`, the pane's and the window file's former words) are accepted too — case,
 * spaces, punctuation and a bracketed unit do not matter. Nothing here names a field on its own:
 * a field added to the glossary is a schedule column at once (docs/window-fields.md).
 *
 * What a row must give:
 * - everywhere: `Name` (the window's label); in the pane also `Surface azimuth`, `Width` and
 *   `Height` — every other blank cell takes the value in the pane's form;
 * - in the command line, blanks take the glossary's defaults, so a row also needs `Year`, `SHGC`, a
 *   place (`Site`, or `Latitude`, `Longitude` and `UTC offset`) and a sky (`Linke turbidity`, or
 *   `Tau b` and `Tau d`, or an example site, or hourly weather given with `--weather`).
 *
 * Fields that set both sides (`Overhang extension`, `Fin projection`, `Fin gap`, `Fin extension
 * above` / `below`) apply to each side that has a device; a one-side field beside them wins for its
 * side.
 */
import type { TimeConvention } from '../core/time';
import { GLOSSARY, type GlossaryEntry, LOAD_WORDS, PEAK_AT_WORDS, WINDOW_FIELDS, nameKey, windowFieldFor } from '../registry/glossary';
import { matchFieldNames } from '../registry/windowRange';

/** How a cell is read: free text, one number, or one or more numbers (space, comma or semicolon separated). */
export type ScheduleColumnKind = 'text' | 'number' | 'list';

/** The reader a requirement applies to. */
export type ScheduleReader = 'pane' | 'cli';

/** One schedule column: a glossary window field seen as a column. */
export interface ScheduleColumn {
  /** The field's glossary name (camelCase), e.g. `overhangProjection`. */
  key: string;
  /** The header users see: the field's label, with the unit in brackets. */
  header: string;
  /** Other headers accepted: the field's name and its older names. */
  aliases: readonly string[];
  /** WindowSpec paths the cell fills (two for a field that sets both sides); `site` takes an example site id. */
  paths: readonly string[];
  kind: ScheduleColumnKind;
  /** Unit of the value, when it has one. */
  unit?: string;
  /** One help line: what the value is. */
  help: string;
  /** Readers for which every row must fill this cell. */
  requiredBy: readonly ScheduleReader[];
  /** The glossary entry. */
  field: GlossaryEntry;
}

/** Example-site column key: it fills the place (and its invented clear sky) rather than one path. */
export const SITE_KEY = 'site';
/** Skyline column key: a list of angles rather than one number. */
export const SKYLINE_KEY = 'skyline';

const REQUIRED: Readonly<Record<ScheduleReader, readonly string[]>> = {
  pane: ['name', 'surfaceAzimuth', 'width', 'height'],
  cli: ['name', 'year', 'surfaceAzimuth', 'width', 'height', 'shgc'],
};

function columnOf(f: GlossaryEntry): ScheduleColumn {
  const cell = f.window!.cell;
  return {
    key: f.name,
    header: f.label,
    aliases: [f.name, ...(f.aliases ?? [])],
    paths: f.window!.paths,
    kind: cell === 'list' || cell === 'monthly' ? 'list' : cell === 'number' ? 'number' : 'text',
    ...(f.unit ? { unit: f.unit } : {}),
    help: f.description,
    requiredBy: (['pane', 'cli'] as const).filter((r) => REQUIRED[r].includes(f.name)),
    field: f,
  };
}

/** The schedule's columns, in glossary order (both-sides fields before one-side ones). */
export const SCHEDULE_COLUMNS: readonly ScheduleColumn[] = Object.freeze(WINDOW_FIELDS.map(columnOf));

const BY_KEY = new Map(SCHEDULE_COLUMNS.map((c) => [c.key, c]));

/**
 * A header reduced for matching: lower case, a unit in brackets or parentheses dropped, letters
 * and digits only (`Overhang depth (m)` → `overhangdepth`, `surfaceAzimuth` → `surfaceazimuth`).
 */
export const headerKey = nameKey;

/** The column a header names, if any. */
export function columnForHeader(text: unknown): ScheduleColumn | undefined {
  const f = windowFieldFor(text);
  return f ? BY_KEY.get(f.name) : undefined;
}

/** A header cell that names no column, or names one already named to its left. */
export interface HeaderProblem {
  /** 0-based position in the header row. */
  index: number;
  /** The header as written (trimmed). */
  header: string;
}

/** A header row matched to columns. */
export interface MatchedHeaders {
  /** Per position: the column, or undefined for a blank, unknown or repeated header. */
  columns: (ScheduleColumn | undefined)[];
  /** The header text as written, by column key (for messages in the user's own words). */
  written: ReadonlyMap<string, string>;
  /** Non-blank headers that name no column. */
  unknown: HeaderProblem[];
  /** Headers naming a column already named to their left (e.g. `Set-back` and `revealDepth`). */
  repeated: HeaderProblem[];
}

/**
 * Matches a header row to the schedule's columns.
 * @param headers - the header cells, left to right (blanks allowed)
 * @returns the column at each position, and the unknown and repeated headers by name
 */
export function matchHeaders(headers: readonly unknown[]): MatchedHeaders {
  const m = matchFieldNames(headers);
  return {
    columns: m.fields.map((f) => (f ? BY_KEY.get(f.name) : undefined)),
    written: m.written,
    unknown: m.unknown.map((u) => ({ index: u.index, header: u.written })),
    repeated: m.repeated.map((r) => ({ index: r.index, header: r.written })),
  };
}

/** The columns every row must fill for a reader. */
export function requiredColumns(reader: ScheduleReader): ScheduleColumn[] {
  return SCHEDULE_COLUMNS.filter((c) => c.requiredBy.includes(reader));
}

/** The columns that fill a WindowSpec path (both-sides columns first, as listed). */
export function columnsForPath(path: string): ScheduleColumn[] {
  return SCHEDULE_COLUMNS.filter((c) => c.paths.includes(path));
}

/**
 * A list cell split into its entries (space, comma or semicolon separated), each trimmed; a number
 * cell is one entry. Entries are left as text so that each reader reports a bad one in its own way.
 */
export function splitListCell(value: string | number): string[] {
  if (typeof value === 'number') return [String(value)];
  return value.split(/[\s;,]+/).filter((t) => t !== '');
}

/** How a schedule's windows stamp their rows: all by one time convention, or some each way. */
export type ScheduleConvention = TimeConvention | 'mixed';

/** The time convention of a schedule's windows (a window without one reads hour ending, the default). */
export function scheduleConventionOf(conventions: readonly (TimeConvention | undefined)[]): ScheduleConvention {
  const seen = new Set(conventions.map((c) => c ?? (GLOSSARY.timeConvention.default as TimeConvention)));
  return seen.size > 1 ? 'mixed' : seen.has('instant') ? 'instant' : 'hourEnding';
}

/** The header of the column that says each window's time convention (in a schedule whose windows differ). */
export const TIME_CONVENTION_HEADER = GLOSSARY.timeConvention.label;

/**
 * The headers of a schedule summary's peak-gain and peak-load date-time columns, following how the
 * windows stamp their rows (the pane and the command line word the hour-ending case each their own
 * way, as they always have; the instant and mixed cases alike).
 */
export function peakAtHeaders(convention: ScheduleConvention, reader: ScheduleReader): { gain: string; load: string } {
  if (convention === 'instant') return { gain: PEAK_AT_WORDS.peakAtInstant, load: LOAD_WORDS.peakLoadAtInstant };
  if (convention === 'mixed') return { gain: PEAK_AT_WORDS.peakAtEither, load: PEAK_AT_WORDS.peakLoadAtEither };
  return reader === 'cli' ? { gain: PEAK_AT_WORDS.peakHourEnding, load: LOAD_WORDS.peakLoadHourEnding } : { gain: PEAK_AT_WORDS.peakAtHourEnding, load: LOAD_WORDS.peakLoadAtHourEnding };
}
