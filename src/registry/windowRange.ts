/**
 * A window described once, by glossary field names (src/registry/glossary.ts), read the same way
 * from every place a window can be written:
 *
 * - a worksheet range — names in the first column with values beside them, or a header row of
 *   names over value rows (rows of a window schedule); each value column or row is one window;
 * - a row of the window schedule (CSV, workbook, the pane's Excel table);
 * - the window JSON file (flat keys; the older nested form is turned into the same fields);
 * - the task pane's form.
 *
 * Reading has two steps: {@link readWindowFields} reads each cell by its field (number, text,
 * choice, list, monthly list) and checks it against the field's range; {@link windowSpecFromFields}
 * builds the core's WindowSpec (defaults, an example site, devices, clear sky) and has the core
 * check the whole. Every message names the field as the user wrote it, never a path inside the
 * program (`site.latitude`, `glazing.angleTable.values`).
 */
import { MONTHLY_LIST_RULE, SunpaneError, describeValue, rangeText } from '../core/common';
import type { Weather, WindowSpec } from '../core/gain';
import { validateWindowSpec } from '../core/gain';
import { windowRoomSeries } from '../core/load';
import { PATH_SHADING_NAMES, requireShading, requireVerticalForShading, type Shading } from '../core/shading';
import type { SkyModel } from '../core/sky';
import { type DateSystem, DATE_SYSTEM_WORDS, formatSerialIso, parseIsoLocal, requireDateSystem, requireSerialIn, type TimeConvention } from '../core/time';
import { EXAMPLE_SITES, findExampleSite } from '../demo/sites';
import { GLOSSARY, type GlossaryEntry, LENGTH_MAX, WINDOW_FIELDS, choiceFor, nameKey, windowFieldFor } from './glossary';
import type { Matrix, RawArg, Scalar, WindowFields } from './types';

const { floor, max: mathMax, min: mathMin } = Math;
const { isArray } = Array;
const { isFinite: numberIsFinite, isInteger: numberIsInteger, isNaN: numberIsNaN } = Number;

/** A name cell that names no field, or a field already named. */
export interface NameProblem {
  /** 0-based position along the names. */
  index: number;
  /** The name as written (trimmed). */
  written: string;
}

/** A row (or column) of names matched to window fields. */
export interface MatchedNames {
  /** Per position: the field, or undefined for a blank, unknown or repeated name. */
  fields: (GlossaryEntry | undefined)[];
  /** The names as written, by glossary name. */
  written: ReadonlyMap<string, string>;
  unknown: NameProblem[];
  repeated: NameProblem[];
}

function isBlank(v: unknown): boolean {
  return v === null || v === undefined || (typeof v === 'string' && v.trim() === '');
}

/**
 * Matches names (a header row, a name column, the keys of a JSON object) to window fields: case,
 * spaces, punctuation and a bracketed unit or note do not matter; older names are accepted.
 */
export function matchFieldNames(names: readonly unknown[]): MatchedNames {
  const fields: (GlossaryEntry | undefined)[] = [];
  const written = new Map<string, string>();
  const unknown: NameProblem[] = [];
  const repeated: NameProblem[] = [];
  names.forEach((n, index) => {
    const text = isBlank(n) ? '' : String(n).trim();
    const field = text === '' ? undefined : windowFieldFor(text);
    if (text !== '' && !field) unknown.push({ index, written: text });
    if (field && written.has(field.name)) {
      repeated.push({ index, written: text });
      fields.push(undefined);
      return;
    }
    if (field) written.set(field.name, text);
    fields.push(field);
  });
  return { fields, written, unknown, repeated };
}

/** Edit distance of two keys (for "did you mean"). */
export function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let prev = row[0];
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const here = row[j];
      row[j] = mathMin(row[j] + 1, row[j - 1] + 1, prev + (a[i - 1] === b[j - 1] ? 0 : 1));
      prev = here;
    }
  }
  return row[b.length];
}

/** The field name nearest a name that matched none, when one is close (among `fields`: the window's by default). */
export function nearestFieldName(text: string, fields: readonly GlossaryEntry[] = WINDOW_FIELDS): string | undefined {
  const k = nameKey(text);
  let best: string | undefined;
  let bestD = mathMax(2, floor(k.length / 4)) + 1;
  for (const f of fields) {
    for (const w of [f.name, f.label, ...(f.aliases ?? [])]) {
      const d = editDistance(k, nameKey(w));
      if (d < bestD) {
        bestD = d;
        best = f.name;
      }
    }
  }
  return best;
}

/** The words for an unknown name: what it is not, and what it might be. */
export function unknownNameText(written: string): string {
  const near = nearestFieldName(written);
  return `no window field has this name${near ? ` (did you mean ${near}?)` : ''}; the window fields are listed in the function's help`;
}

/** The value of a number cell, or the cell itself when it does not read as a number (for the message). */
function numberOf(cell: Scalar | number): unknown {
  if (typeof cell === 'number') return cell;
  if (typeof cell === 'string') {
    const t = cell.trim();
    if (t !== '' && numberIsFinite(Number(t))) return Number(t);
    return t;
  }
  return cell;
}

function inRange(f: GlossaryEntry, v: unknown): v is number {
  if (typeof v !== 'number' || !numberIsFinite(v)) return false;
  if (f.integer && !numberIsInteger(v)) return false;
  if (f.min !== undefined && (f.exclusiveMin ? !(v > f.min) : !(v >= f.min))) return false;
  if (f.max !== undefined && (f.exclusiveMax ? !(v < f.max) : !(v <= f.max))) return false;
  return true;
}

function rangeOf(f: GlossaryEntry): string {
  return rangeText(f.min, f.max, f.unit, f);
}

/** A list cell split into its entries (space, comma or semicolon separated); a number cell is one entry. */
export function splitList(value: Scalar | number | readonly unknown[]): unknown[] {
  if (isArray(value)) return [...value];
  if (typeof value === 'number') return [value];
  return String(value ?? '')
    .split(/[\s;,]+/)
    .filter((t) => t !== '')
    .map((t) => (numberIsFinite(Number(t)) ? Number(t) : t));
}

/**
 * Reads one cell of a window field.
 * @param field - the glossary entry
 * @param cell - the value as written: a number, a text, or (from JSON) a list of numbers
 * @param name - the field's name as the user wrote it (for messages)
 * @param dateSystem - the date system a serial date-time cell counts in (1900 unless the fields
 *   say otherwise); a date-time is returned as a 1900-system serial
 * @returns the value: text for text fields, a token for choices, a number (a date system as 1900 or
 *   1904), or a list of numbers
 * @throws SunpaneError naming `name` with the value and the allowed range
 */
export function readFieldCell(field: GlossaryEntry, cell: Scalar | number | readonly unknown[], name: string = field.name, dateSystem: DateSystem = 1900): string | number | number[] {
  const cellKind = field.window?.cell ?? 'number';
  switch (cellKind) {
    case 'dateSystem':
      if (isArray(cell)) throw new SunpaneError(name, cell, DATE_SYSTEM_WORDS);
      return requireDateSystem(typeof cell === 'string' ? cell.trim() : cell, name);
    case 'text':
      if (typeof cell === 'boolean' || isArray(cell)) throw new SunpaneError(name, cell, 'must be a text');
      return String(cell).trim();
    case 'choice': {
      const token = typeof cell === 'string' ? choiceFor(field, cell) : undefined;
      if (token === undefined) throw new SunpaneError(name, cell, choiceText(field));
      return token;
    }
    case 'number': {
      const v = numberOf(cell as Scalar);
      if (!inRange(field, v)) throw new SunpaneError(name, v, rangeOf(field));
      return v;
    }
    case 'dateTime': {
      // A date-time cell: a serial (the workbook's date-time) or ISO 8601 local text (a file).
      if (typeof cell === 'string') {
        const t = cell.trim();
        return t !== '' && !numberIsNaN(Number(t)) ? requireSerialIn(name, Number(t), dateSystem) : parseIsoLocal(t, name);
      }
      return requireSerialIn(name, cell, dateSystem);
    }
    case 'list':
    case 'monthly': {
      const items = splitList(cell);
      const count = items.length;
      if (cellKind === 'monthly' && count !== 1 && count !== 12) {
        throw new SunpaneError(name, cell, `${MONTHLY_LIST_RULE}, separated by spaces, commas or semicolons`);
      }
      const { min, max, exact } = field.length ?? {};
      if (exact !== undefined && count !== exact) throw new SunpaneError(name, cell, `must hold exactly ${exact} values, separated by spaces, commas or semicolons (it holds ${count})`);
      if ((min !== undefined && count < min) || (max !== undefined && count > max)) {
        throw new SunpaneError(name, cell, `must hold ${min ?? 1} to ${max} values, separated by spaces, commas or semicolons`);
      }
      return items.map((x, i) => {
        if (!inRange(field, x)) throw new SunpaneError(`${name} (value ${i + 1})`, x, rangeOf(field));
        return x;
      });
    }
  }
}

/** The allowed tokens of a choice in words (with the accepted older spellings). */
export function choiceText(field: { choices?: readonly string[]; choiceAliases?: Readonly<Record<string, string>> }): string {
  const tokens = (field.choices ?? []).map((c) => `"${c}"`).join(', ');
  const aliases = Object.keys(field.choiceAliases ?? {});
  return `must be one of ${tokens}${aliases.length ? ` (also accepted: ${aliases.map((a) => `"${a}"`).join(', ')})` : ''}; case does not matter`;
}

/** Builds the WindowFields of one window from (field, written name, cell) triples. */
export function fieldsOf(entries: readonly { field: GlossaryEntry; written: string; cell: Scalar | number | readonly unknown[] }[]): WindowFields {
  const values = new Map<string, string | number | number[]>();
  const written = new Map<string, string>();
  const empty = (cell: Scalar | number | readonly unknown[]) => isBlank(cell) || (isArray(cell) && cell.length === 0);
  // The date system first: the serial date-times of the same fields count days in it.
  const system = entries.find((x) => x.field.name === 'dateSystem' && !empty(x.cell));
  const dateSystem = system ? (readFieldCell(system.field, system.cell, system.written) as DateSystem) : 1900;
  for (const { field, written: w, cell } of entries) {
    written.set(field.name, w);
    if (empty(cell)) continue;
    values.set(field.name, readFieldCell(field, cell, w, dateSystem));
  }
  return { kind: 'window', values, written };
}

/** The windows of a window range, laid out as they broadcast: a column of windows or a row of them. */
export interface WindowRange {
  /** Windows down (a header row over value rows) or across (a name column beside value columns). */
  rows: number;
  columns: number;
  /** Row-major: one per value row or value column; a window whose cells are bad is its error. */
  windows: (WindowFields | SunpaneError)[];
}

function isMatrix(raw: RawArg | undefined): raw is Matrix {
  return isArray(raw);
}

const WINDOW_HELP = 'must be a range of window fields: names (latitude, surfaceAzimuth, width, height, shgc, …) in the first column with values beside them, or a header row of names over one row of values';

/**
 * Reads a worksheet range that describes one or more windows.
 * @param raw - the range as given (rows of cells)
 * @param argument - the parameter's name, for messages (`window`)
 * @returns the windows and their layout; a bad cell makes only its window an error
 * @throws SunpaneError naming `argument` when the range is not a window layout at all (no field
 *   names, an unknown or repeated name, a number where a name belongs)
 */
export function readWindowRange(raw: RawArg | undefined, argument = 'window'): WindowRange {
  if (!isMatrix(raw) || raw.length === 0) throw new SunpaneError(argument, raw ?? null, WINDOW_HELP);
  const rows = raw.length;
  const cols = raw.reduce((w, r) => mathMax(w, r.length), 0);
  const at = (i: number, j: number): Scalar => raw[i]?.[j] ?? null;
  const firstRow = Array.from({ length: cols }, (_, j) => at(0, j));
  const firstColumn = Array.from({ length: rows }, (_, i) => at(i, 0));
  const known = (cells: Scalar[]) => cells.filter((c) => typeof c === 'string' && windowFieldFor(c) !== undefined).length;
  const down = known(firstColumn);
  const across = known(firstRow);
  if (down === 0 && across === 0) throw new SunpaneError(argument, `a ${rows} × ${cols} range without field names`, WINDOW_HELP);
  // Names in the first column (windows across) or in the first row (windows down); a tie reads as a header row.
  const namesDown = down > across;
  const names = namesDown ? firstColumn : firstRow;
  const count = namesDown ? cols - 1 : rows - 1;
  const where = namesDown ? 'the first column' : 'the first row';
  const matched = matchFieldNames(names.map((n) => (typeof n === 'number' || typeof n === 'boolean' ? '' : n)));
  names.forEach((n, k) => {
    if (typeof n === 'number' || typeof n === 'boolean') throw new SunpaneError(argument, n, `must hold field names in ${where}: cell ${k + 1} there is ${describeValue(n)}`);
  });
  if (matched.unknown.length > 0) {
    const u = matched.unknown[0];
    throw new SunpaneError(`${argument} field name`, u.written, unknownNameText(u.written));
  }
  if (matched.repeated.length > 0) {
    const r = matched.repeated[0];
    const field = windowFieldFor(r.written)!;
    throw new SunpaneError(`${argument} field name`, r.written, `names the same field as "${matched.written.get(field.name)}" (${field.name}): keep one`);
  }
  if (count < 1) throw new SunpaneError(argument, `a ${rows} × ${cols} range`, `has names but no values: put each window's values ${namesDown ? 'in the column right of the names' : 'in a row under the names'}`);
  const windows: (WindowFields | SunpaneError)[] = [];
  for (let w = 1; w <= count; w++) {
    const entries: { field: GlossaryEntry; written: string; cell: Scalar }[] = [];
    matched.fields.forEach((field, k) => {
      if (field) entries.push({ field, written: `${argument} ${matched.written.get(field.name)}`, cell: namesDown ? at(k, w) : at(w, k) });
    });
    try {
      windows.push(fieldsOf(entries));
    } catch (err) {
      if (!(err instanceof SunpaneError)) throw err;
      windows.push(err);
    }
  }
  return namesDown ? { rows: 1, columns: count, windows } : { rows: count, columns: 1, windows };
}

/** How {@link windowSpecFromFields} fills what a window leaves out. */
export interface WindowSpecOptions {
  /** Year when the window gives none (e.g. the year of a one-hour function's date-time). */
  year?: number;
  /** Name when the window gives none. */
  name?: string;
  /**
   * How messages name a field the user did not write (a missing one): words before its glossary
   * name (`window ` for a worksheet range), or a function of the field (a schedule's column label).
   */
  prefix?: Namer;
}

/** A window read: the spec, and whether it described its own sky (else the caller must supply weather). */
export interface WindowFromFields {
  spec: WindowSpec;
  hasWeather: boolean;
  /** The fields it was read from. */
  fields: WindowFields;
}

const SHADING_BOTH: readonly [string, string, string][] = [
  ['finProjection', 'leftFinProjection', 'rightFinProjection'],
  ['finGap', 'leftFinGap', 'rightFinGap'],
  ['finExtensionAbove', 'leftFinExtensionAbove', 'rightFinExtensionAbove'],
  ['finExtensionBelow', 'leftFinExtensionBelow', 'rightFinExtensionBelow'],
];

/**
 * The field a path inside the window description belongs to: the one the user gave if several
 * fill it (a one-side fin field before the both-sides one), else the first that fills it.
 * @param path - a WindowSpec path as the core names it (`shading.leftFin.gap`, `weather.tauB[3]`)
 * @param fields - the window as read
 * @returns the glossary entry, or undefined for a path no field fills
 */
export function fieldForPath(path: string, fields?: WindowFields): GlossaryEntry | undefined {
  const base = path.replace(/\[\d+\]$/, '').replace(/ \(value \d+\)$/, '');
  const candidates = WINDOW_FIELDS.filter((f) => f.window!.paths.includes(base));
  const given = candidates.filter((f) => fields?.values.has(f.name));
  const pick = (list: GlossaryEntry[]) => list.find((f) => !f.window!.both) ?? list[0];
  if (given.length) return pick(given);
  if (candidates.length) return pick(candidates);
  if (base === 'glazing.angleTable') return GLOSSARY.shgcAngles;
  if (base === 'site') return GLOSSARY.latitude;
  return undefined;
}

/** How a field the user did not write is named in messages: words before its name, or a function of the field. */
export type Namer = string | ((field: GlossaryEntry) => string);

/** The name to show for a field: as written, else as the namer names it. */
function shown(field: GlossaryEntry, fields: WindowFields, prefix: Namer): string {
  const w = fields.written.get(field.name);
  if (w !== undefined) return w;
  return typeof prefix === 'string' ? `${prefix}${field.name}` : prefix(field);
}

/**
 * Renames a core refusal (argument = a path like `site.latitude` or `shading.overhang.extensionLeft`)
 * to the field as the user wrote it; anything else is passed on.
 */
export function inFieldWords(err: unknown, fields: WindowFields, prefix: Namer = ''): unknown {
  if (!(err instanceof SunpaneError)) return err;
  const field = fieldForPath(err.argument, fields);
  if (!field) {
    if (err.argument === 'weather.kind' || err.argument === 'weather') {
      return new SunpaneError(shown(GLOSSARY.linkeTurbidity, fields, prefix), null, 'a clear sky is needed: give linkeTurbidity, or tauB and tauD, or an example site, or hourly weather');
    }
    return err;
  }
  const index = /\[(\d+)\]$/.exec(err.argument);
  const name = shown(field, fields, prefix) + (index ? ` (value ${Number(index[1]) + 1})` : '');
  const given = fields.values.get(field.name) ?? err.value;
  // A date-time field is shown as the date-time it is, not as its serial.
  const value = field.window!.cell === 'dateTime' && typeof given === 'number' && numberIsFinite(given) ? formatSerialIso(given) : given;
  return new SunpaneError(name, index ? err.value : value, err.allowed.replace(/weather\.|glazing\.angleTable\.|glazing\.|shading\.|site\.|room\./g, ''), err.detail);
}

const NO_FIELDS: WindowFields = { kind: 'window', values: new Map(), written: new Map() };

/**
 * A core refusal named by its path inside the window description (`site.latitude`,
 * `shading.leftFin.gap`, `weather.tauB[3]`) renamed to the glossary field it belongs to
 * (`latitude`, `leftFinGap`, `tauB (value 4)`), for callers that build the description themselves
 * (the pane); anything else is passed on unchanged.
 */
export function inGlossaryWords(err: unknown): unknown {
  if (!(err instanceof SunpaneError)) return err;
  const series = /^weather\.(dni|dhi|ghi)(\[(\d+)\])?$/.exec(err.argument);
  if (series) return new SunpaneError(`${series[1]}${series[3] !== undefined ? ` (value ${Number(series[3]) + 1})` : ''}`, err.value, err.allowed);
  if (fieldForPath(err.argument) === undefined) return err;
  return inFieldWords(err, NO_FIELDS, '');
}

function num(fields: WindowFields, name: string): number | undefined {
  const v = fields.values.get(name);
  return typeof v === 'number' ? v : undefined;
}

function list(fields: WindowFields, name: string): number[] | undefined {
  const v = fields.values.get(name);
  return isArray(v) ? v : undefined;
}

function missing(fields: WindowFields, prefix: Namer, name: string, why: string): SunpaneError {
  return new SunpaneError(shown(GLOSSARY[name as keyof typeof GLOSSARY], fields, prefix), null, why);
}

/** The shading devices the fields describe (a device needs its projection; both-sides fields apply to each fin that has one). */
function shadingOf(f: WindowFields, prefix: Namer): Shading {
  const s: Shading = {};
  const has = (n: string) => f.values.has(n);
  const overhangRest = ['overhangGap', 'overhangExtension', 'overhangExtensionLeft', 'overhangExtensionRight'].filter(has);
  const projection = num(f, 'overhangProjection');
  if (projection === undefined && overhangRest.length > 0) {
    throw missing(f, prefix, 'overhangProjection', `needed because ${shown(GLOSSARY[overhangRest[0] as keyof typeof GLOSSARY], f, prefix)} is given for an overhang (0 for no overhang)`);
  }
  if (projection !== undefined && projection > 0) {
    const both = num(f, 'overhangExtension') ?? 0;
    s.overhang = {
      projection,
      gap: num(f, 'overhangGap') ?? 0,
      extensionLeft: num(f, 'overhangExtensionLeft') ?? both,
      extensionRight: num(f, 'overhangExtensionRight') ?? both,
    };
  }
  for (const side of ['left', 'right'] as const) {
    const one = (k: number) => SHADING_BOTH[k][side === 'left' ? 1 : 2];
    const value = (k: number) => num(f, one(k)) ?? num(f, SHADING_BOTH[k][0]);
    const p = value(0);
    const sideRest = [1, 2, 3].map(one).filter(has);
    if (p === undefined && sideRest.length > 0) {
      throw missing(f, prefix, one(0), `needed because ${shown(GLOSSARY[sideRest[0] as keyof typeof GLOSSARY], f, prefix)} is given for the ${side} fin (or give finProjection for both fins; 0 for no fin)`);
    }
    if (p !== undefined && p > 0) s[side === 'left' ? 'leftFin' : 'rightFin'] = { projection: p, gap: value(1) ?? 0, extensionAbove: value(2) ?? 0, extensionBelow: value(3) ?? 0 };
  }
  const bothRest = SHADING_BOTH.slice(1).map((b) => b[0]).filter(has);
  if (!has('finProjection') && !has('leftFinProjection') && !has('rightFinProjection') && bothRest.length > 0) {
    throw missing(f, prefix, 'finProjection', `needed because ${shown(GLOSSARY[bothRest[0] as keyof typeof GLOSSARY], f, prefix)} is given for the fins (0 for no fins)`);
  }
  const reveal = num(f, 'revealDepth');
  if (reveal !== undefined && reveal > 0) s.revealDepth = reveal;
  const skyline = list(f, 'skyline');
  if (skyline !== undefined) s.skyline = skyline;
  return s;
}

/** The window's own sky, if it describes one: Linke turbidity, or τb and τd, or an example site's. */
function weatherOf(f: WindowFields, prefix: Namer, siteSky: Weather | undefined): Weather | undefined {
  const linke = list(f, 'linkeTurbidity');
  const tauB = list(f, 'tauB');
  const tauD = list(f, 'tauD');
  if (linke && (tauB || tauD)) {
    throw new SunpaneError(shown(GLOSSARY.linkeTurbidity, f, prefix), linke, `cannot be given with ${tauB ? shown(GLOSSARY.tauB, f, prefix) : shown(GLOSSARY.tauD, f, prefix)}: choose one clear-sky model`);
  }
  if (linke) return { kind: 'ineichenClearSky', linkeTurbidity: linke };
  if (tauB && !tauD) throw missing(f, prefix, 'tauD', `needed with ${shown(GLOSSARY.tauB, f, prefix)}: the ASHRAE clear sky takes both (${rangeOf(GLOSSARY.tauD).replace(/^must be /, '')})`);
  if (tauD && !tauB) throw missing(f, prefix, 'tauB', `needed with ${shown(GLOSSARY.tauD, f, prefix)}: the ASHRAE clear sky takes both (${rangeOf(GLOSSARY.tauB).replace(/^must be /, '')})`);
  if (tauB && tauD) {
    // One value stands for every month, so one τ beside twelve of the other is read month by month.
    if (tauB.length !== tauD.length && tauB.length !== 1 && tauD.length !== 1) {
      throw new SunpaneError(shown(GLOSSARY.tauD, f, prefix), tauD, `must hold as many values as ${shown(GLOSSARY.tauB, f, prefix)} (${tauB.length}), or one for every month`);
    }
    return { kind: 'ashraeClearSky', tauB, tauD };
  }
  return siteSky;
}

const PLACE = ['latitude', 'longitude', 'utcOffset', 'elevation'];

/** The place the fields give (an example site, or latitude, longitude and UTC offset), with an example site's sky and albedo. */
function siteOf(f: WindowFields, prefix: Namer): { site: WindowSpec['site']; siteSky?: Weather; albedo?: number } {
  const siteId = f.values.get('site') as string | undefined;
  let out: { site: WindowSpec['site']; siteSky?: Weather; albedo?: number };
  if (siteId !== undefined) {
    const example = findExampleSite(siteId);
    if (!example) throw new SunpaneError(shown(GLOSSARY.site, f, prefix), siteId, `must be one of the example sites ${EXAMPLE_SITES.map((s) => `"${s.id}"`).join(', ')}`);
    const clash = PLACE.find((n) => f.values.has(n));
    if (clash) {
      throw new SunpaneError(
        shown(GLOSSARY[clash as keyof typeof GLOSSARY], f, prefix),
        f.values.get(clash),
        `cannot be given with ${shown(GLOSSARY.site, f, prefix)}: give either an example site or your own latitude, longitude, UTC offset and elevation`,
      );
    }
    out = { site: { ...example.site }, siteSky: { kind: 'ineichenClearSky', linkeTurbidity: [...example.linkeTurbidity] }, albedo: example.groundAlbedo };
  } else {
    for (const n of ['latitude', 'longitude', 'utcOffset']) {
      if (!f.values.has(n)) throw missing(f, prefix, n, `is required: ${rangeOf(GLOSSARY[n as keyof typeof GLOSSARY])} (or give an example site)`);
    }
    out = { site: { latitude: num(f, 'latitude')!, longitude: num(f, 'longitude')!, utcOffset: num(f, 'utcOffset')! } };
  }
  for (const n of ['elevation', 'pressure', 'temperature'] as const) {
    const v = num(f, n);
    if (v !== undefined) out.site[n] = v;
  }
  return out;
}

function requireFields(f: WindowFields, prefix: Namer, names: readonly string[]): void {
  for (const n of names) {
    if (!f.values.has(n)) throw missing(f, prefix, n, `is required: ${rangeOf(GLOSSARY[n as keyof typeof GLOSSARY])}`);
  }
}

/** A window's geometry: what its sunlit fraction depends on. */
export interface WindowGeometry {
  surfaceAzimuth: number;
  surfaceTilt: number;
  width: number;
  height: number;
  shading: Shading;
}

/**
 * The geometry the fields give — facing, tilt, size and shading devices — checked by the core.
 * @throws SunpaneError naming the field as written
 */
export function windowGeometryFromFields(f: WindowFields, prefix: Namer = ''): WindowGeometry {
  try {
    requireFields(f, prefix, ['surfaceAzimuth', 'width', 'height']);
    const g: WindowGeometry = {
      surfaceAzimuth: num(f, 'surfaceAzimuth')!,
      surfaceTilt: num(f, 'surfaceTilt') ?? (GLOSSARY.surfaceTilt.default as number),
      width: num(f, 'width')!,
      height: num(f, 'height')!,
      shading: shadingOf(f, prefix),
    };
    requireShading({ width: g.width, height: g.height }, g.shading, PATH_SHADING_NAMES, { max: LENGTH_MAX, unit: 'm' });
    requireVerticalForShading(g.surfaceTilt, g.shading);
    return g;
  } catch (err) {
    throw inFieldWords(err, f, prefix);
  }
}

/**
 * The site the fields give (an example site, or latitude, longitude and UTC offset, with elevation,
 * pressure and temperature when given).
 * @throws SunpaneError naming the field as written
 */
export function siteFromFields(f: WindowFields, prefix: Namer = ''): WindowSpec['site'] {
  try {
    return siteOf(f, prefix).site;
  } catch (err) {
    throw inFieldWords(err, f, prefix);
  }
}

/**
 * Builds the core's window description from fields, fills the defaults and has the core check it.
 * @param f - the fields (from {@link readWindowRange}, {@link fieldsOf} or a schedule row)
 * @param options - a year and name to use when the fields give none, and the words before field
 *   names in messages
 * @returns the spec; when the fields describe no sky `hasWeather` is false and `spec.weather` is a
 *   placeholder (an empty measured series) the caller must replace
 * @throws SunpaneError naming the field as written (never a path inside the program)
 */
export function windowSpecFromFields(f: WindowFields, options: WindowSpecOptions = {}): WindowFromFields {
  const prefix = options.prefix ?? '';
  try {
    const { site, siteSky, albedo } = siteOf(f, prefix);
    requireFields(f, prefix, ['surfaceAzimuth', 'width', 'height', 'shgc']);
    const year = num(f, 'year') ?? options.year;
    if (year === undefined) throw missing(f, prefix, 'year', `is required: ${rangeOf(GLOSSARY.year)}`);
    const angles = list(f, 'shgcAngles');
    const values = list(f, 'shgcValues');
    if (angles && !values) throw missing(f, prefix, 'shgcValues', `needed with ${shown(GLOSSARY.shgcAngles, f, prefix)}: one SHGC (0 to 1) per angle`);
    if (values && !angles) throw missing(f, prefix, 'shgcAngles', `needed with ${shown(GLOSSARY.shgcValues, f, prefix)}: the angle (0 to 90 °) of each SHGC`);
    const weather = weatherOf(f, prefix, siteSky);
    const spec: WindowSpec = {
      name: (f.values.get('name') as string | undefined) ?? options.name ?? 'Window',
      site,
      surfaceAzimuth: num(f, 'surfaceAzimuth')!,
      surfaceTilt: num(f, 'surfaceTilt') ?? (GLOSSARY.surfaceTilt.default as number),
      width: num(f, 'width')!,
      height: num(f, 'height')!,
      frameFraction: num(f, 'frameFraction') ?? (GLOSSARY.frameFraction.default as number),
      glazing: {
        shgc: num(f, 'shgc')!,
        panes: num(f, 'panes') ?? (GLOSSARY.panes.default as number),
        interiorAttenuation: num(f, 'interiorAttenuation') ?? (GLOSSARY.interiorAttenuation.default as number),
        ...(angles && values ? { angleTable: { angles, values } } : {}),
        ...(f.values.has('radiantFraction') ? { radiantFraction: num(f, 'radiantFraction') } : {}),
      },
      shading: shadingOf(f, prefix),
      groundAlbedo: num(f, 'groundAlbedo') ?? albedo ?? (GLOSSARY.groundAlbedo.default as number),
      skyModel: ((f.values.get('skyModel') as string | undefined) ?? GLOSSARY.skyModel.default) as SkyModel,
      weather: weather ?? { kind: 'measured', dni: [], dhi: [] },
      year,
      timeConvention: ((f.values.get('timeConvention') as string | undefined) ?? GLOSSARY.timeConvention.default) as TimeConvention,
    };
    setPlainFields(spec, f);
    const rule = spec.site.daylightSaving as Partial<NonNullable<WindowSpec['site']['daylightSaving']>> | undefined;
    if (rule !== undefined && rule.shift === undefined) rule.shift = GLOSSARY.daylightSavingShift.default as number;
    validateWindowSpec(weather ? spec : { ...spec, weather: skyWithDesignDays(spec.weather, STAND_IN_SKY) });
    windowRoomSeries(spec); // the room's series checked with the window (construction, counts, sums)
    return { spec, hasWeather: weather !== undefined, fields: f };
  } catch (err) {
    throw inFieldWords(err, f, prefix);
  }
}

/** Fields the builder above reads itself (they combine into devices, a sky, a place or a table). */
const BUILT: ReadonlySet<string> = new Set([
  'name', 'site', 'latitude', 'longitude', 'utcOffset', 'elevation', 'pressure', 'temperature', 'year', 'timeConvention', 'dateSystem',
  'surfaceAzimuth', 'surfaceTilt', 'width', 'height', 'frameFraction', 'shgc', 'panes', 'interiorAttenuation', 'radiantFraction',
  'shgcAngles', 'shgcValues', 'groundAlbedo', 'skyModel', 'linkeTurbidity', 'tauB', 'tauD',
  ...WINDOW_FIELDS.filter((g) => g.window!.group === 'shading').map((g) => g.name),
]);

/**
 * Every other field the window gives is a plain one: its value goes to its path(s) in the window
 * description as read, and the core checks it. A field added to the glossary with a path the core
 * reads needs no code here (docs/window-fields.md).
 */
function setPlainFields(spec: WindowSpec, f: WindowFields): void {
  for (const [name, value] of f.values) {
    if (BUILT.has(name)) continue;
    const field = GLOSSARY[name as keyof typeof GLOSSARY] as GlossaryEntry | undefined;
    for (const path of field?.window?.paths ?? []) setPath(spec as unknown as Record<string, unknown>, path, value);
  }
}

/** Sets a dotted path of a window (`shading.overhang.projection`) in an object, making the objects on the way. */
export function setPath(obj: Record<string, unknown>, dotted: string, value: unknown): void {
  const keys = dotted.split('.');
  let o = obj;
  for (const k of keys.slice(0, -1)) {
    if (typeof o[k] !== 'object' || o[k] === null) o[k] = {};
    o = o[k] as Record<string, unknown>;
  }
  o[keys[keys.length - 1]] = value;
}

/**
 * A clear sky standing in for a window's own, keeping the design-day temperatures the window's
 * fields gave (`dryBulbMax`, `dailyRange`), which the conduction gain reads from a clear sky.
 * @param from - the window's weather as built (possibly a placeholder holding only the temperatures)
 * @param sky - the clear sky to use
 */
export function skyWithDesignDays(from: Weather | undefined, sky: Weather): Weather {
  if (sky.kind !== 'ashraeClearSky' && sky.kind !== 'ineichenClearSky') return sky;
  const t = (from ?? {}) as { dryBulbMax?: number[]; dailyRange?: number[] };
  return { ...sky, ...(t.dryBulbMax ? { dryBulbMax: t.dryBulbMax } : {}), ...(t.dailyRange ? { dailyRange: t.dailyRange } : {}) };
}

/** A sky to check a window that has none of its own (its weather comes later). */
const STAND_IN_SKY: Weather = { kind: 'ineichenClearSky', linkeTurbidity: [3] };

/** Every window field with its words, for help texts: `name (label) — meaning; range; blank means`. */
export function windowFieldLines(): string[] {
  return WINDOW_FIELDS.map((f) => {
    const range = f.window!.cell === 'number' ? `; ${rangeOf(f).replace(/^must be /, '')}` : f.window!.cell === 'choice' ? `; ${choiceText(f).replace(/^must be /, '')}` : f.window!.cell === 'dateSystem' ? `; ${DATE_SYSTEM_WORDS.replace(/^must be /, '')}` : '';
    const blank = f.default !== undefined ? `; blank: ${f.default}` : '';
    return `${f.name} — ${f.description}${range}${blank}`;
  });
}
