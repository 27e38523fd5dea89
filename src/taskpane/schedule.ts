/**
 * The window schedule in the pane: many windows read from an Excel table, one row per window, each
 * run for the whole year and summarised in one row. The columns are the command line's too
 * (src/schedule/columns.ts: headers, older names accepted, what each fills). The form supplies
 * everything a row leaves blank (place, glass model, sky and weather, year); a row's cells
 * override it. A Site cell fills the place from an example site; a Skyline cell gives the row its
 * own skyline; a Linke turbidity or optical-depth cell switches the row to that clear sky.
 * Any row with a missing or bad value is reported by row and column, and nothing is written until
 * every row is valid.
 */
import { SunpaneError } from '../core/common';
import type { WindowSpec } from '../core/gain';
import { EXAMPLE_SITES } from '../demo/sites';
import { GLOSSARY, LOAD_WORDS, choiceFor } from '../registry/glossary';
import { inGlossaryWords, readFieldCell, setPath } from '../registry/windowRange';
import { SCHEDULE_COLUMNS, SITE_KEY, SKYLINE_KEY, type ScheduleColumn, type ScheduleConvention, TIME_CONVENTION_HEADER, columnForHeader, headerKey, matchHeaders, peakAtHeaders, requiredColumns } from '../schedule/columns';
import { FIELDS, type FieldDef, type FormValues, applyExampleSite, fieldForArgument } from './fields';
import { withoutPath } from './messages';
import { type SheetData, type SpecValidator, buildWindowSpec, readListText } from './spec';
import type { DateSystem } from '../core/time';

export { headerKey };

/** Help text listing the headers, for the pane. */
export const SCHEDULE_HELP = `One row per window. Needed: ${requiredColumns('pane').map((c) => c.header).join(', ')}. Optional (blank takes the form's value): ${SCHEDULE_COLUMNS.filter((c) => !c.requiredBy.includes('pane')).map((c) => c.header).join(', ')}. The same table runs with \`sunpane schedule\`, and a row of it (with its header row) is the window of SOLARGAIN. Case does not matter and the unit in brackets may be left out; the field names (surfaceAzimuth, overhangProjection…) and older names are accepted too. Lists (skyline, monthly turbidity) are space-separated.`;

/** The form box a column path fills, if the form has one (the skyline and the example site are handled apart). */
function fieldOfPath(path: string): FieldDef | undefined {
  return FIELDS.find((f) => f.kind !== 'address' && f.paths?.includes(path));
}

/** Form boxes of every column (a both-sides column fills two); empty for a column the form has no box for. */
const COLUMN_FIELDS: ReadonlyMap<string, readonly FieldDef[]> = new Map(
  SCHEDULE_COLUMNS.map((c) => {
    if (c.key === SITE_KEY) return [c.key, []];
    if (c.key === SKYLINE_KEY) return [c.key, FIELDS.filter((f) => f.id === 'skylineAddress')];
    // A row's daylight-saving rule is set on its window directly, as one rule over the form's: its
    // date-time cells are serials of the workbook's date system, read by the window reader (the form's
    // boxes hold typed text), and its shift belongs to its own dates.
    if (c.paths.some((p) => p.startsWith('site.daylightSaving'))) return [c.key, []];
    const boxes = c.paths.map(fieldOfPath);
    return [c.key, boxes.every((b) => b !== undefined) ? (boxes as FieldDef[]) : []];
  }),
);

/** Columns the form has no box for (air pressure and temperature, an SHGC table, the radiant fraction) or whose cells a box would read otherwise (date-times): set on the row's window directly. */
const BOXLESS = new Set(SCHEDULE_COLUMNS.filter((c) => c.key !== SITE_KEY && c.key !== SKYLINE_KEY && (COLUMN_FIELDS.get(c.key) ?? []).length === 0).map((c) => c.key));

/** Weather kind a row switches to when it fills a clear-sky column. */
const WEATHER_OF_COLUMN: Readonly<Record<string, string>> = { linkeTurbidity: 'ineichenClearSky', tauB: 'ashraeClearSky', tauD: 'ashraeClearSky' };

/** A schedule row ready to run. */
export interface ScheduleRow {
  /** 1-based row number within the table's data. */
  row: number;
  spec: WindowSpec;
}

/** A problem with the schedule: the row (1-based, 0 for the header), the column, the message. */
export interface ScheduleProblem {
  row: number;
  column?: string;
  message: string;
}

function cellText(v: unknown): string {
  if (v === null || v === undefined) return '';
  return typeof v === 'number' ? String(v) : String(v).trim();
}

/** A cell's text as the box expects it: a choice matched to its option without regard to case. */
function boxText(field: FieldDef, text: string): string {
  if (field.kind !== 'select') return text;
  return field.options?.find((o) => o.value.toLowerCase() === text.toLowerCase())?.value ?? text;
}

/**
 * Reads a schedule table (header row first) into WindowSpecs, each checked by the core's
 * validator. Returns every problem found (nothing is run when there is any).
 * @param table - the table's values, header row first
 * @param form - the form, supplying what a row leaves out
 * @param data - sheet data the form refers to (skyline, angle table, weather columns)
 */
export function readSchedule(table: readonly (readonly unknown[])[], form: FormValues, validate: SpecValidator, data: SheetData = {}, dateSystem: DateSystem = 1900): { rows: ScheduleRow[]; problems: ScheduleProblem[] } {
  const problems: ScheduleProblem[] = [];
  const rows: ScheduleRow[] = [];
  if (table.length === 0) return { rows, problems: [{ row: 0, message: 'The table is empty: it needs a header row and one row per window.' }] };
  const matched = matchHeaders(table[0]);
  for (const u of matched.unknown) problems.push({ row: 0, column: u.header, message: `Header "${u.header}" is not a schedule column (see the list of headers).` });
  for (const r of matched.repeated) {
    const first = matched.written.get(columnForHeader(r.header)?.key ?? '');
    problems.push({ row: 0, column: r.header, message: `Headers "${first}" and "${r.header}" name the same column: keep one.` });
  }
  for (const c of requiredColumns('pane')) {
    if (!matched.written.has(c.key)) problems.push({ row: 0, column: c.header, message: `The table has no "${c.header}" column, which every schedule needs.` });
  }
  if (problems.length) return { rows, problems };
  if (table.length < 2) return { rows, problems: [{ row: 0, message: 'The table has no windows: add one row per window under the header.' }] };
  const present: { column: ScheduleColumn; index: number; header: string }[] = SCHEDULE_COLUMNS.filter((c) => matched.written.has(c.key)).map((column) => ({
    column,
    index: matched.columns.indexOf(column),
    header: matched.written.get(column.key)!,
  }));

  for (let r = 1; r < table.length; r++) {
    const line = table[r];
    if (line.every((v) => cellText(v) === '')) continue;
    const problem = readRow(line, present, form, data, validate, dateSystem);
    if ('spec' in problem) rows.push({ row: r, spec: problem.spec });
    else problems.push({ row: r, column: problem.column, message: `Row ${r}${problem.label ? ` (${problem.label})` : ''}, ${problem.where}: ${problem.message}` });
  }
  return { rows, problems };
}

type RowOutcome = { spec: WindowSpec } | { label: string; column?: string; where: string; message: string };

function labelOf(line: readonly unknown[], present: readonly { column: ScheduleColumn; index: number }[]): string {
  const c = present.find((p) => p.column.key === 'name');
  return c ? cellText(line[c.index]) : '';
}

/** One row: the form overridden by the row's cells, in the column list's order (both sides before one side). */
function readRow(line: readonly unknown[], present: readonly { column: ScheduleColumn; index: number; header: string }[], form: FormValues, data: SheetData, validate: SpecValidator, dateSystem: DateSystem): RowOutcome {
  let values: FormValues = { ...form };
  const rowData: SheetData = { ...data };
  const fieldToColumn = new Map<string, string>();
  const extras: { column: ScheduleColumn; header: string; text: string }[] = [];
  let siteHeader: string | undefined;
  for (const { column, index, header } of present) {
    const text = cellText(line[index]);
    for (const f of COLUMN_FIELDS.get(column.key) ?? []) if (text !== '' || !fieldToColumn.has(f.id)) fieldToColumn.set(f.id, header);
    // A blank optional cell keeps the form's value; a blank required one goes to the core as blank.
    if (text === '' && !column.requiredBy.includes('pane')) continue;
    if (column.key === SITE_KEY) {
      const site = EXAMPLE_SITES.find((s) => s.id.toLowerCase() === text.toLowerCase());
      if (!site) return { label: labelOf(line, present), column: header, where: `column "${header}"`, message: `"${text}" is not an example site (${EXAMPLE_SITES.map((s) => s.id).join(', ')}).` };
      values = applyExampleSite(values, site.id);
      siteHeader = header;
      continue;
    }
    if (siteHeader && (column.paths[0] ?? '').startsWith('site.')) {
      return { label: labelOf(line, present), column: header, where: `column "${header}"`, message: `give either an example site (column "${siteHeader}") or its own latitude, longitude, UTC offset and elevation, not both.` };
    }
    if (column.key === SKYLINE_KEY) {
      rowData.skyline = readListText(text) as number[];
      continue;
    }
    if (BOXLESS.has(column.key)) {
      extras.push({ column, header, text });
      continue;
    }
    const token = column.field.kind === 'choice' ? choiceFor(column.field, text) : undefined;
    for (const f of COLUMN_FIELDS.get(column.key) ?? []) values[f.id] = token ?? boxText(f, text);
    if (WEATHER_OF_COLUMN[column.key]) values.weatherSource = WEATHER_OF_COLUMN[column.key];
  }
  const label = (values.name ?? '').trim();
  const labelHeader = fieldToColumn.get('name') ?? 'Name';
  const labelColumn = present.find((p) => p.column.key === 'name');
  if (labelColumn === undefined || cellText(line[labelColumn.index]) === '') {
    return { label: '', column: labelHeader, where: `column "${labelHeader}"`, message: 'blank is not allowed: every window needs a label.' };
  }
  let extra: { column: ScheduleColumn; header: string; text: string } | undefined;
  try {
    const spec = buildWindowSpec(values, rowData, dateSystem);
    for (const x of extras) {
      extra = x;
      // Date-time cells are serials of the workbook's date system; a date-system column must name it.
      const value = readFieldCell(x.column.field, x.text, x.header, dateSystem);
      if (x.column.field.name === 'dateSystem' && value !== dateSystem) {
        throw new SunpaneError(x.header, value, `must be this workbook's date system, ${dateSystem} (Excel's option "Use 1904 date system" is ${dateSystem === 1904 ? 'on' : 'off'}), or blank`);
      }
      for (const p of x.column.paths) setPath(spec as unknown as Record<string, unknown>, p, value);
    }
    extra = undefined;
    // A rule without its shift column moves the clocks 1 h, as everywhere else (the glossary's default).
    const rule = spec.site.daylightSaving as { shift?: number } | undefined;
    if (rule !== undefined && rule.shift === undefined) rule.shift = GLOSSARY.daylightSavingShift.default as number;
    validate(spec);
    return { spec };
  } catch (caught) {
    const err = inGlossaryWords(caught);
    if (!(err instanceof SunpaneError)) throw err;
    if (extra) return { label, column: extra.header, where: `column "${extra.header}"`, message: err.message };
    const boxless = extras.find((x) => err.argument === x.column.key || err.argument.startsWith(`${x.column.key} `) || x.column.paths.some((p) => err.argument === p || err.argument.startsWith(`${p}[`) || err.argument.startsWith(`${p}.`)));
    if (boxless) return { label, column: boxless.header, where: `column "${boxless.header}"`, message: `${boxless.header} ${err.message.slice(err.argument.length + 1)}` };
    const field = fieldForArgument(err.argument);
    const column = field ? fieldToColumn.get(field.id) : undefined;
    const where = column ? `column "${column}"` : field ? `form box "${field.label}"` : 'form';
    return { label, column, where, message: withoutPath(err.message) };
  }
}

/** Header of the summary sheet's table (our own wording). */
export const SUMMARY_HEADER = ['Window', 'Faces (°)', 'Glass area (m²)', 'Solar gain (kWh/yr)', 'Per glass area (kWh/m²·yr)', 'Peak gain (W)', 'Peak at (hour ending)', 'Mean sunlit fraction, sun on the wall (0-1)', 'Weather missing (h)'] as const;

/** The cooling-load columns that follow when some window of the schedule has a room (the glossary's words). */
export const SUMMARY_LOAD_HEADER = [LOAD_WORDS.peakLoad, LOAD_WORDS.peakLoadAtHourEnding] as const;

/**
 * The summary's header: the peak's date-time columns worded by the windows' time convention
 * (src/schedule/columns.ts `peakAtHeaders`), the cooling-load columns at the end when some window
 * has a room, and each window's time convention last when the windows differ.
 */
export function summaryHeader(withLoad = false, convention: ScheduleConvention = 'hourEnding'): string[] {
  const at = peakAtHeaders(convention, 'pane');
  return [...SUMMARY_HEADER.map((h) => (h === 'Peak at (hour ending)' ? at.gain : h)), ...(withLoad ? [LOAD_WORDS.peakLoad, at.load] : []), ...(convention === 'mixed' ? [TIME_CONVENTION_HEADER] : [])];
}

/** A window's yearly figures as the summary needs them (the pane's YearFigures). */
export interface SummaryFigures {
  annualKWh: number;
  peakW: number;
  peakStamp?: number;
  meanSunlitFraction: number;
  missingHours: number;
  glassArea: number;
  /** The year's largest cooling load [W] and its stamp, when the window has a room. */
  peakLoadW?: number;
  peakLoadStamp?: number;
}

/**
 * One summary row from a window's yearly figures; with `withLoad`, the peak cooling load and its
 * hour at the end — for a window without a room, the words "no room given — gains only" in place of
 * the load and a blank hour.
 */
export function summaryRow(spec: WindowSpec, fig: SummaryFigures, withLoad = false, convention: ScheduleConvention = 'hourEnding'): (number | string)[] {
  const round = (x: number, d: number) => Math.round(x * 10 ** d) / 10 ** d;
  const load = !withLoad ? [] : fig.peakLoadW === undefined ? [LOAD_WORDS.noRoom, ''] : [round(fig.peakLoadW, 1), fig.peakLoadStamp === undefined ? '' : round(fig.peakLoadStamp, 6)];
  return [
    spec.name,
    spec.surfaceAzimuth,
    round(fig.glassArea, 3),
    round(fig.annualKWh, 1),
    round(fig.glassArea > 0 ? fig.annualKWh / fig.glassArea : 0, 1),
    round(fig.peakW, 1),
    fig.peakStamp === undefined ? '' : round(fig.peakStamp, 6),
    round(fig.meanSunlitFraction, 3),
    fig.missingHours,
    ...load,
    ...(convention === 'mixed' ? [spec.timeConvention ?? 'hourEnding'] : []),
  ];
}

/** Number formats of a summary row. */
export const SUMMARY_FORMATS = ['@', '0', '0.00', '0.0', '0.0', '0.0', 'yyyy-mm-dd hh:mm', '0.000', '0'];

/** Number formats of a summary row with or without the cooling-load columns. */
export function summaryFormats(withLoad = false, convention: ScheduleConvention = 'hourEnding'): string[] {
  return [...SUMMARY_FORMATS, ...(withLoad ? ['0.0', 'yyyy-mm-dd hh:mm'] : []), ...(convention === 'mixed' ? ['@'] : [])];
}
