/**
 * The workbook's clock as one small range: a daylight-saving rule and the date system, written once
 * in a workbook and given to every function that reads or returns a date-time (its trailing `clock`
 * argument). The fields are the glossary's (src/registry/glossary.ts) — the same names a window
 * range uses for its own rule — and they are read by the same cell reader as a window's fields
 * (src/registry/windowRange.ts), so a value means the same thing in both places:
 *
 * | name                | value                                                               |
 * |---------------------|---------------------------------------------------------------------|
 * | daylightSavingStart | the clock reading when the clocks go forward, in any one year       |
 * | daylightSavingEnd   | the clock reading when they go back (daylight time), after the start |
 * | daylightSavingShift | hours, above 0 up to 2; blank 1                                     |
 * | dateSystem          | 1900 (default) or 1904                                              |
 *
 * Names go in the first column with the values beside them, or in a header row over one value row.
 * Every message names the field as the user wrote it (`clock dstEnd`), with the value and the range.
 */
import { SunpaneError, describeValue } from '../core/common';
import { type DateSystem, type DaylightSavingRule, formatSerialIso, requireDaylightSaving } from '../core/time';
import { GLOSSARY, type GlossaryEntry, windowFieldFor } from './glossary';
import type { ClockFields, RawArg, Scalar, WindowFields } from './types';
import { fieldsOf, nearestFieldName } from './windowRange';

const { max } = Math;
const { isArray } = Array;

/** The fields a clock range takes, in the order help lists them. */
export const CLOCK_FIELDS: readonly GlossaryEntry[] = [GLOSSARY.daylightSavingStart, GLOSSARY.daylightSavingEnd, GLOSSARY.daylightSavingShift, GLOSSARY.dateSystem];

const CLOCK_NAMES = CLOCK_FIELDS.map((f) => f.name).join(', ');
const CLOCK_HELP = `must be a range of clock fields: names (${CLOCK_NAMES}) in the first column with values beside them, or a header row of names over one row of values`;

/** The clock field a name (or label, or alias) names, if any. */
export function clockFieldFor(text: unknown): GlossaryEntry | undefined {
  const f = windowFieldFor(text);
  return f !== undefined && CLOCK_FIELDS.includes(f) ? f : undefined;
}

/** The clock when none is given: local standard time in the 1900 date system. */
export const STANDARD_CLOCK: ClockFields = Object.freeze({ kind: 'clock', dateSystem: 1900 });

function isBlank(v: unknown): boolean {
  return v === null || v === undefined || (typeof v === 'string' && v.trim() === '');
}

/**
 * Reads a clock range.
 * @param raw - the range as given (rows of cells); blank or omitted: {@link STANDARD_CLOCK}
 * @param argument - the parameter's name, for messages (`clock`)
 * @returns the rule (checked, in 1900-system serials) and the date system
 * @throws SunpaneError naming the argument, or the field as written after it (`clock dstEnd`), with
 *   the value and what is allowed: a name that is no clock field, a repeated one, more than one
 *   value column or row, a start without an end (or the reverse), a shift without a rule, an end
 *   not after the start, a shift outside above 0 up to 2 h, a date system other than 1900 or 1904
 */
export function readClockRange(raw: RawArg | undefined, argument = 'clock'): ClockFields {
  if (raw === undefined || raw === null || (typeof raw === 'string' && raw.trim() === '')) return STANDARD_CLOCK;
  if (!isArray(raw) || raw.length === 0) throw new SunpaneError(argument, raw, CLOCK_HELP);
  if (raw.every((r) => r.every(isBlank))) return STANDARD_CLOCK;
  const rows = raw.length;
  const cols = raw.reduce((w, r) => max(w, r.length), 0);
  const at = (i: number, j: number): Scalar => raw[i]?.[j] ?? null;
  const firstColumn = Array.from({ length: rows }, (_, i) => at(i, 0));
  const firstRow = Array.from({ length: cols }, (_, j) => at(0, j));
  const named = (cells: Scalar[]) => cells.filter((c) => typeof c === 'string' && windowFieldFor(c) !== undefined).length;
  const down = named(firstColumn);
  const across = named(firstRow);
  if (down === 0 && across === 0) {
    const text = [...firstColumn, ...firstRow].find((c): c is string => typeof c === 'string' && c.trim() !== '');
    const near = text === undefined ? undefined : nearestClockName(text);
    if (text !== undefined && near !== undefined) throw new SunpaneError(`${argument} field name`, text.trim(), `no clock field has this name (did you mean ${near}?): a clock range takes ${CLOCK_NAMES}`);
    throw new SunpaneError(argument, `a ${rows} × ${cols} range without clock field names`, CLOCK_HELP);
  }
  // A tie (one name each way: a single name and its value) reads the way the range is longer.
  const namesDown = down > across || (down === across && cols >= rows);
  const names = namesDown ? firstColumn : firstRow;
  const count = namesDown ? cols - 1 : rows - 1;
  if (count < 1) throw new SunpaneError(argument, `a ${rows} × ${cols} range`, `has names but no values: put the values ${namesDown ? 'in the column right of the names' : 'in a row under the names'}`);
  if (count > 1) throw new SunpaneError(argument, `a ${rows} × ${cols} range`, `must describe one clock: ${namesDown ? 'one column of values beside the names' : 'one row of values under the names'} (it has ${count}); a workbook has one clock`);
  const entries: { field: GlossaryEntry; written: string; cell: Scalar }[] = [];
  const seen = new Map<string, string>();
  names.forEach((n, k) => {
    if (isBlank(n)) return;
    const text = String(n).trim();
    if (typeof n !== 'string') throw new SunpaneError(argument, n, `must hold field names in ${namesDown ? 'the first column' : 'the first row'}: cell ${k + 1} there is ${describeValue(n)}`);
    const field = clockFieldFor(text);
    if (field === undefined) {
      const other = windowFieldFor(text);
      const why = other
        ? `names a window field, not a clock field: a clock range takes ${CLOCK_NAMES}`
        : `no clock field has this name${nearestClockName(text) ? ` (did you mean ${nearestClockName(text)}?)` : ''}: a clock range takes ${CLOCK_NAMES}`;
      throw new SunpaneError(`${argument} field name`, text, why);
    }
    if (seen.has(field.name)) throw new SunpaneError(`${argument} field name`, text, `names the same field as "${seen.get(field.name)}" (${field.name}): keep one`);
    seen.set(field.name, text);
    entries.push({ field, written: `${argument} ${text}`, cell: namesDown ? at(k, 1) : at(1, k) });
  });
  return clockFromFields(fieldsOf(entries), argument);
}

/**
 * The clock that fields give: the rule from the three daylight-saving fields (start and end
 * together, the shift 1 h when blank) and the date system (1900 when blank).
 * @param f - fields already read (a clock range's, or a window's)
 * @param argument - the argument's name, before a field's name the user did not write (`clock`)
 * @throws SunpaneError naming the field as written
 */
export function clockFromFields(f: WindowFields, argument = 'clock'): ClockFields {
  const shown = (name: string) => f.written.get(name) ?? `${argument} ${name}`;
  const start = f.values.get('daylightSavingStart') as number | undefined;
  const end = f.values.get('daylightSavingEnd') as number | undefined;
  const shift = f.values.get('daylightSavingShift') as number | undefined;
  const given = f.values.get('dateSystem') as DateSystem | undefined;
  const dateSystem = given ?? 1900;
  const system = given !== undefined ? { dateSystem, dateSystemGiven: true } : { dateSystem };
  if ((start === undefined) !== (end === undefined)) {
    const [given, missing] = start === undefined ? ['daylightSavingEnd', 'daylightSavingStart'] : ['daylightSavingStart', 'daylightSavingEnd'];
    throw new SunpaneError(shown(missing), null, `is needed with ${shown(given)}: a daylight-saving rule takes both the clock reading when the clocks go forward and the one when they go back (leave both blank for standard time all year)`);
  }
  if (start === undefined || end === undefined) {
    if (shift !== undefined) throw new SunpaneError(shown('daylightSavingShift'), shift, `needs ${shown('daylightSavingStart')} and ${shown('daylightSavingEnd')}: a shift alone is no rule`);
    return { kind: 'clock', ...system };
  }
  const rule: DaylightSavingRule = { start, end, shift: shift ?? (GLOSSARY.daylightSavingShift.default as number) };
  try {
    requireDaylightSaving(rule);
  } catch (err) {
    if (!(err instanceof SunpaneError)) throw err;
    const field = { 'daylightSaving.start': 'daylightSavingStart', 'daylightSaving.end': 'daylightSavingEnd', 'daylightSaving.shift': 'daylightSavingShift' }[err.argument];
    throw field ? new SunpaneError(shown(field), err.value, err.allowed, err.detail) : err;
  }
  return { kind: 'clock', rule, ...system };
}

/**
 * A window's fields with the call's clock put in: the clock's rule and date system fill the
 * window's own clock fields where the window leaves them blank; a field the window gives too must
 * agree with the clock (one clock per workbook).
 * @param f - the window as read
 * @param clock - the call's clock, or undefined
 * @returns the fields to build the window from (f itself when the clock adds nothing)
 * @throws SunpaneError naming the window's field as written, its value, and the clock's value
 */
export function windowOnClock(f: WindowFields, clock: ClockFields | undefined, argument = 'clock'): WindowFields {
  if (clock === undefined) return f;
  const add: [string, number][] = [];
  if (clock.rule) add.push(['daylightSavingStart', clock.rule.start], ['daylightSavingEnd', clock.rule.end], ['daylightSavingShift', clock.rule.shift]);
  if (clock.dateSystemGiven) add.push(['dateSystem', clock.dateSystem]);
  if (add.length === 0) return f;
  const values = new Map(f.values);
  const written = new Map(f.written);
  for (const [name, v] of add) {
    const own = f.values.get(name);
    if (own === undefined) {
      values.set(name, v);
      written.set(name, `${argument} ${name}`);
    } else if (own !== v) {
      const show = (x: unknown) => (typeof x === 'number' && name.startsWith('daylightSaving') && name !== 'daylightSavingShift' ? formatSerialIso(x) : String(x));
      throw new SunpaneError(f.written.get(name) ?? name, name !== 'daylightSavingShift' && name !== 'dateSystem' ? show(own) : own, `differs from the clock's ${name} (${show(v)}): a workbook has one clock; give it in the clock range only, or the same in both`);
    }
  }
  return { kind: 'window', values, written };
}

/** The clock field name nearest a name that matched none, when one is close (for "did you mean"). */
function nearestClockName(text: string): string | undefined {
  return nearestFieldName(text, CLOCK_FIELDS);
}
