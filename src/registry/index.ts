/**
 * The registry: every worksheet function, described once. Excel's functions.json, the CLI's
 * `list` / `call`, the function reference in docs/functions.md and the fuzz tests all read this list.
 */
import { GAIN_FUNCTIONS } from './gain';
import { GLAZING_FUNCTIONS } from './glazing';
import { SHADING_FUNCTIONS } from './shading';
import { SKY_FUNCTIONS } from './sky';
import { SUN_FUNCTIONS } from './sun';
import type { FunctionDescriptor, ParamDescriptor } from './types';
import { allowedText } from './evaluate';

/** The namespace shown in Excel before every function name, e.g. `=SUNPANE.SUNALTITUDE(...)`. */
export const NAMESPACE = 'SUNPANE';

export const FUNCTIONS: readonly FunctionDescriptor[] = [
  ...SUN_FUNCTIONS,
  ...SHADING_FUNCTIONS,
  ...SKY_FUNCTIONS,
  ...GLAZING_FUNCTIONS,
  ...GAIN_FUNCTIONS,
];

const BY_NAME = new Map(FUNCTIONS.map((f) => [f.name, f]));

/** Looks a function up by its worksheet name (with or without the namespace, any case). */
export function findFunction(name: string): FunctionDescriptor | undefined {
  const upper = name.trim().toUpperCase();
  return BY_NAME.get(upper.startsWith(`${NAMESPACE}.`) ? upper.slice(NAMESPACE.length + 1) : upper);
}

/** Is the parameter optional (blank allowed)? */
export function isOptional(p: ParamDescriptor): boolean {
  return p.default !== undefined || p.optional === true;
}

/** `NAME(a, b, [c])`: the signature as `sunpane list` and the reference show it. */
export function signature(fn: FunctionDescriptor): string {
  return `${fn.name}(${fn.params.map((p) => (isOptional(p) ? `[${p.name}]` : p.name)).join(', ')})`;
}

/**
 * How a date-time result is to be shown: the one wording used by functions.json, the function
 * reference and the help pages (a serial number reads as 46193.27 until the cell is formatted).
 */
export const DATE_TIME_FORMAT = "a date-time serial in local standard time, or on the clock when a daylight-saving rule is given, in the workbook's date system (1900 unless the clock says 1904): format the cell as a date and time (custom number format yyyy-mm-dd hh:mm), or as hh:mm for the time of day alone";

/** The unit words of a parameter: its unit, `no unit` for a pure number, or what kind of value it takes. */
export function unitWords(p: ParamDescriptor): string {
  if (p.unit) return p.unit;
  switch (p.kind) {
    case 'number':
    case 'numberList':
      return 'no unit';
    case 'dateTime':
      return 'date-time';
    case 'flag':
      return 'TRUE or FALSE';
    case 'window':
      return 'window fields, each in its own unit';
    case 'clock':
      return 'clock fields: date-times, h, 1900 or 1904';
    default:
      return 'text';
  }
}

/**
 * A parameter's full description: meaning, unit and range, and default; what Excel's autocomplete
 * shows (≤ 512 characters) and what the reference lists. A pure number says `no unit`. When the
 * whole would be longer than 512 characters, the older spellings of a choice are left out (they
 * are still accepted, and the reference lists them), and then a list of names the description
 * already gives is not repeated.
 */
export function paramHelp(p: ParamDescriptor): string {
  const unit = p.unit && p.kind !== 'number' && p.kind !== 'numberList' ? ` [${p.unit}]` : '';
  const dflt = p.default !== undefined ? `; blank: ${typeof p.default === 'string' ? `"${p.default}"` : String(p.default).toUpperCase() === 'TRUE' || String(p.default).toUpperCase() === 'FALSE' ? String(p.default).toUpperCase() : p.default}` : '';
  let allowed = p.kind === 'table' ? '' : allowedText(p).replace(/^must be /, '');
  if ((p.kind === 'number' || p.kind === 'numberList') && !p.unit) allowed = allowed.endsWith(')') ? `${allowed.slice(0, -1)}, no unit)` : `${allowed}, no unit`;
  const whole = (a: string) => `${p.description}${unit}${a ? `; ${a}` : ''}${dflt}`;
  const text = whole(allowed);
  if (text.length <= 512) return text;
  const shorter = whole(allowed.replace(/ \(also accepted: [^)]*\)/, ''));
  if (shorter.length <= 512) return shorter;
  // A long list of names that the description already gives in its own words (with their units).
  const named = (p.choices ?? []).every((c) => new RegExp(`\\b${c}\\b`).test(p.description));
  return (named && p.choices ? whole('any of these names, in any case') : shorter).slice(0, 512);
}
