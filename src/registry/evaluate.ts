/**
 * Reading arguments and broadcasting: the one place where any registered function is applied over
 * single values and ranges, for Excel and the CLI alike.
 *
 * Rules (like Excel's own functions):
 * - every `number` / `dateTime` / `choice` / `flag` / `text` parameter takes a single value or a
 *   range; the result has as many rows as the tallest argument and as many columns as the widest;
 *   an argument of one row is repeated down, one of one column across (so a column against a row
 *   gives a 2-D table), and a cell where a range has no partner is #N/A, as built-ins do;
 * - a `window` parameter is one window or several (one per value row or column of the range), and
 *   broadcasts like a column or a row of values (src/registry/windowRange.ts);
 * - each cell of a range is read once, however often the broadcast uses it;
 * - a blank cell or omitted argument takes the parameter's default, if it has one;
 * - a bad element makes only its own result cell an error;
 * - `numberList` and `table` parameters take their whole range and are not broadcast;
 * - a `clock` parameter (the workbook's clock, src/registry/clockRange.ts) is read first and whole:
 *   serial date-times of the call are read in its date system (ISO 8601 text reads the same in both);
 * - `spill` functions take single values (and one window) for their broadcast parameters.
 */
import { MONTHLY_LIST_RULE, SunpaneError, rangeText, requireRange } from '../core/common';
import { type DateSystem, parseIsoLocal, requireSerialIn } from '../core/time';
import { readClockRange } from './clockRange';
import { choiceFor } from './glossary';
import { type ArgValue, type Args, type ClockFields, type FunctionDescriptor, type Matrix, NotAvailable, type OutCell, type OutTable, type ParamDescriptor, type RawArg, type Scalar, type WindowFields } from './types';
import { choiceText, readWindowRange } from './windowRange';

const { max: mathMax } = Math;
const { isArray } = Array;
const { isFinite: numberIsFinite, isNaN: numberIsNaN } = Number;
const NAN = Number.NaN;

function isMatrix(raw: RawArg | undefined): raw is Matrix {
  return isArray(raw);
}

function isBlank(v: Scalar | undefined): boolean {
  return v === null || v === undefined || v === '';
}

/**
 * Reads one single value for a broadcast parameter; throws SunpaneError naming the parameter.
 * @param dateSystem - the date system a serial date-time counts in (the call's clock); a date-time
 *   is returned as a 1900-system serial
 */
export function readScalar(param: ParamDescriptor, value: Scalar | undefined, dateSystem: DateSystem = 1900): ArgValue {
  if (isBlank(value)) {
    if (param.default !== undefined) return param.default;
    if (param.optional) return undefined;
    throw new SunpaneError(param.name, value, `is required: ${allowedText(param)}`);
  }
  switch (param.kind) {
    case 'number': {
      const n = typeof value === 'string' && value.trim() !== '' && !numberIsNaN(Number(value)) ? Number(value) : value;
      return requireRange(param.name, n, param.min, param.max, param.unit, param);
    }
    case 'dateTime':
      if (typeof value === 'string') {
        const t = value.trim();
        return t !== '' && !numberIsNaN(Number(t)) ? requireSerialIn(param.name, Number(t), dateSystem) : parseIsoLocal(t, param.name);
      }
      return requireSerialIn(param.name, value, dateSystem);
    case 'choice': {
      const hit = typeof value === 'string' ? choiceFor(param, value) : undefined;
      if (hit === undefined) throw new SunpaneError(param.name, value, allowedText(param));
      return hit;
    }
    case 'text':
      if (typeof value !== 'string') throw new SunpaneError(param.name, value, allowedText(param));
      return value.trim();
    case 'flag':
      if (typeof value === 'boolean') return value;
      if (value === 1 || value === 0) return value === 1;
      if (typeof value === 'string' && /^(true|false)$/i.test(value.trim())) return value.trim().toLowerCase() === 'true';
      throw new SunpaneError(param.name, value, allowedText(param));
    default:
      throw new SunpaneError(param.name, value, 'must be a range');
  }
}

/** Reads a whole-range parameter (`numberList`, `choiceList` or `table`). */
export function readRange(param: ParamDescriptor, raw: RawArg | undefined): ArgValue {
  if (param.kind === 'clock') return readClockRange(raw, param.name);
  const rows: Matrix = isMatrix(raw) ? raw : isBlank(raw as Scalar) ? [] : [[raw as Scalar]];
  if (param.kind === 'choiceList') return readChoiceList(param, rows, raw);
  if (param.kind === 'table') {
    if (rows.length === 0 || rows.every((r) => r.every(isBlank))) {
      if (param.optional || param.default !== undefined) return undefined;
      throw new SunpaneError(param.name, raw ?? null, 'is required: must be a range that is not empty');
    }
    return rows;
  }
  const values: number[] = [];
  // A cell inside the bounds passes without a call: a year of weather is 8,760 cells, and the
  // argument's name for a message ("dni (value 17)") is built only for a cell that fails.
  const lo = param.min ?? -Infinity;
  const hi = param.max ?? Infinity;
  if (param.gapsAreMissing && rows.some((r) => r.some((c) => !isBlank(c)))) {
    // A series with gaps: every cell keeps its place; a blank or non-numeric cell is a missing value (NaN).
    for (const row of rows) {
      for (const cell of row) {
        const n = typeof cell === 'number' ? cell : typeof cell === 'string' && cell.trim() !== '' && !numberIsNaN(Number(cell)) ? Number(cell) : NAN;
        if (!numberIsNaN(n) && !(numberIsFinite(n) && n >= lo && n <= hi)) requireRange(`${param.name} (value ${values.length + 1})`, n, param.min, param.max, param.unit);
        values.push(n);
      }
    }
  }
  for (const row of param.gapsAreMissing ? [] : rows) {
    for (const cell of row) {
      if (isBlank(cell) && rows.length * (row.length || 1) > 1) continue;
      if (isBlank(cell)) break;
      const n = typeof cell === 'string' && cell.trim() !== '' && !numberIsNaN(Number(cell)) ? Number(cell) : cell;
      if (!(typeof n === 'number' && numberIsFinite(n) && n >= lo && n <= hi)) requireRange(`${param.name} (value ${values.length + 1})`, n, param.min, param.max, param.unit);
      values.push(n as number);
    }
  }
  if (values.length === 0) {
    if (param.optional || param.default !== undefined) return undefined;
    throw new SunpaneError(param.name, raw ?? null, `is required: must be a range of numbers ${allowedText(param)}`);
  }
  const { exact, min, max, oneOf } = param.length ?? {};
  // One value for the year or twelve for the months: the words every monthly list is refused in.
  if (oneOf !== undefined && oneOf.length === 2 && oneOf[0] === 1 && oneOf[1] === 12 && values.length !== 1 && values.length !== 12) {
    throw new SunpaneError(param.name, values, MONTHLY_LIST_RULE);
  }
  if ((exact !== undefined && values.length !== exact) || (min !== undefined && values.length < min) || (max !== undefined && values.length > max) || (oneOf !== undefined && !oneOf.includes(values.length))) {
    const want =
      oneOf !== undefined
        ? oneOf.join(' or ')
        : exact !== undefined
          ? `exactly ${exact}`
          : min !== undefined && max !== undefined
            ? `${min} to ${max}`
            : min !== undefined
              ? `at least ${min}`
              : `at most ${max}`;
    throw new SunpaneError(param.name, values, `must hold ${want} numbers`);
  }
  if (param.ascending) {
    for (let i = 1; i < values.length; i++) {
      if (!(values[i] > values[i - 1])) throw new SunpaneError(param.name, values, `must be strictly ascending (value ${i + 1}, ${values[i]}, is not above ${values[i - 1]})`);
    }
  }
  return values;
}

function readChoiceList(param: ParamDescriptor, rows: Matrix, raw: RawArg | undefined): ArgValue {
  const tokens: string[] = [];
  for (const row of rows) {
    for (const cell of row) {
      if (isBlank(cell)) continue;
      const token = typeof cell === 'string' ? choiceFor(param, cell) : undefined;
      if (token === undefined) throw new SunpaneError(`${param.name} (value ${tokens.length + 1})`, cell, choiceText(param));
      tokens.push(token);
    }
  }
  if (tokens.length === 0) {
    if (param.default !== undefined) return [String(param.default)];
    if (param.optional) return undefined;
    throw new SunpaneError(param.name, raw ?? null, `is required: ${choiceText(param)}`);
  }
  const max = param.length?.max;
  if (max !== undefined && tokens.length > max) throw new SunpaneError(param.name, tokens, `must hold at most ${max} names`);
  return tokens;
}

/** The allowed values of a parameter in words (shared by messages, Excel descriptions and docs). */
export function allowedText(param: ParamDescriptor): string {
  switch (param.kind) {
    case 'number':
      return rangeText(param.min, param.max, param.unit, param);
    case 'dateTime':
      return 'must be a date-time (serial number or ISO 8601 local text) from 1 March 1900 to 31 December 9999 (from 1 January 1904 in the 1904 date system)';
    case 'choice':
    case 'choiceList':
      return choiceText(param);
    case 'text':
      return 'must be a text';
    case 'window':
      return 'must be a range of window fields (names with values)';
    case 'clock':
      return 'must be a range of clock fields (names with values)';
    case 'flag':
      return 'must be TRUE or FALSE';
    case 'numberList':
      return `(each ${rangeText(param.min, param.max, param.unit).replace(/^must be /, '')})`;
    default:
      return 'must be a range';
  }
}

function isWholeRange(param: ParamDescriptor): boolean {
  return param.kind === 'numberList' || param.kind === 'choiceList' || param.kind === 'table' || param.kind === 'clock';
}

function shapeOf(raw: RawArg | undefined): [number, number] {
  if (!isMatrix(raw)) return [1, 1];
  return [raw.length, raw.reduce((w, r) => mathMax(w, r.length), 0)];
}

/** Turns anything a function throws into a result cell; programming errors are re-thrown. */
function errorCell(err: unknown): OutCell {
  if (err instanceof SunpaneError) return err;
  throw err;
}

/** One broadcast argument, read: its shape and each cell's value (or the error reading it), row-major. */
interface ReadArg {
  rows: number;
  cols: number;
  cells: (ArgValue | SunpaneError)[];
}

function readOnce(param: ParamDescriptor, value: Scalar | undefined, dateSystem: DateSystem): ArgValue | SunpaneError {
  try {
    return readScalar(param, value, dateSystem);
  } catch (err) {
    if (err instanceof SunpaneError) return err;
    throw err;
  }
}

/** Reads a broadcast argument: every cell once. */
function readBroadcast(param: ParamDescriptor, raw: RawArg | undefined, dateSystem: DateSystem): ReadArg {
  if (param.kind === 'window') {
    if (raw === undefined || raw === null || raw === '') throw new SunpaneError(param.name, null, `is required: ${allowedText(param)}`);
    const w = readWindowRange(raw, param.name);
    return { rows: w.rows, cols: w.columns, cells: w.windows };
  }
  const [rows, cols] = shapeOf(raw);
  if (rows === 0 || cols === 0) throw new SunpaneError(param.name, raw ?? null, 'must not be an empty range');
  if (!isMatrix(raw)) return { rows: 1, cols: 1, cells: [readOnce(param, raw, dateSystem)] };
  const cells: (ArgValue | SunpaneError)[] = new Array(rows * cols);
  for (let i = 0; i < rows; i++) {
    const line = raw[i];
    for (let j = 0; j < cols; j++) cells[i * cols + j] = readOnce(param, line[j] ?? null, dateSystem);
  }
  return { rows, cols, cells };
}

/** The #N/A of a cell where one of the ranges has no value (they differ in size). */
function noPartner(param: ParamDescriptor, arg: ReadArg): NotAvailable {
  return new NotAvailable(`${param.name} has no value here: it is a ${arg.rows} × ${arg.cols} range and the other ranges are larger`);
}

/**
 * Applies a registered function to raw arguments (as from cells or the CLI), broadcasting over
 * ranges as Excel's own functions do. Returns the result table; bad elements are SunpaneError
 * cells, cells without a partner NotAvailable. Throws SunpaneError only when the call as a whole is
 * malformed (too many arguments, a bad whole-range argument, a range given to a spilling function).
 */
export function applyFunction(fn: FunctionDescriptor, rawArgs: readonly (RawArg | undefined)[]): OutTable {
  if (rawArgs.length > fn.params.length) {
    throw new SunpaneError('arguments', rawArgs.length, `${fn.name} takes at most ${fn.params.length} arguments`);
  }
  const fixed: Args = {};
  const broadcast: { param: ParamDescriptor; arg: ReadArg }[] = [];
  let rows = 1;
  let cols = 1;
  let shapeFrom = '';
  // The clock and the windows first: the date-times of the call are read in their date system.
  const clockK = fn.params.findIndex((p) => p.kind === 'clock');
  const clock = clockK >= 0 ? (readRange(fn.params[clockK], rawArgs[clockK]) as ClockFields) : undefined;
  const windowK = fn.params.findIndex((p) => p.kind === 'window');
  const windows = windowK >= 0 ? readBroadcast(fn.params[windowK], rawArgs[windowK], 1900) : undefined;
  const dateSystem = clock?.dateSystemGiven ? clock.dateSystem : windows ? windowsDateSystem(fn.params[windowK], windows) : 1900;
  for (let k = 0; k < fn.params.length; k++) {
    const p = fn.params[k];
    if (k === clockK) {
      fixed[p.name] = clock;
      continue;
    }
    if (isWholeRange(p)) {
      fixed[p.name] = readRange(p, rawArgs[k]);
      continue;
    }
    const arg = k === windowK ? windows! : readBroadcast(p, rawArgs[k], dateSystem);
    if (arg.rows === 1 && arg.cols === 1) {
      const v = arg.cells[0];
      if (v instanceof SunpaneError) {
        // A single bad value spoils every cell: report it once, as the whole result.
        if (fn.result.shape === 'spill') return [[v]];
        broadcast.push({ param: p, arg });
      } else fixed[p.name] = v;
      continue;
    }
    broadcast.push({ param: p, arg });
    if (arg.rows * arg.cols > rows * cols) shapeFrom = p.name;
    rows = mathMax(rows, arg.rows);
    cols = mathMax(cols, arg.cols);
  }
  if (fn.result.shape === 'spill' && (rows > 1 || cols > 1)) {
    const what = fn.params.find((p) => p.name === shapeFrom)?.kind === 'window' ? 'one window' : 'a single value';
    throw new SunpaneError(shapeFrom, `a ${rows} × ${cols} range`, `must be ${what}: ${fn.name} spills a table of its own`);
  }
  if (fn.result.shape === 'spill') {
    const args = argsAt({ ...fixed }, broadcast, 0, 0);
    if (!isArgs(args)) return [[args]];
    let value: number | NotAvailable | OutTable;
    try {
      value = fn.evaluate(args);
    } catch (err) {
      return [[errorCell(err)]];
    }
    return isArray(value) ? value.map((r) => r.map(checkCell)) : [[checkCell(value)]];
  }
  const out: OutTable = new Array(rows);
  // One arguments object for every cell, its broadcast entries set cell by cell (descriptors never
  // keep their arguments): a range of 100,000 cells allocates no object per cell for them.
  const args: Args = { ...fixed };
  if (cols === 1) {
    // A column: each row is one cell, made as a literal (one allocation, no change of element kind).
    for (let i = 0; i < rows; i++) out[i] = [cellOf(fn, argsAt(args, broadcast, i, 0))];
    return out;
  }
  for (let i = 0; i < rows; i++) {
    const line: OutCell[] = new Array(cols);
    for (let j = 0; j < cols; j++) line[j] = cellOf(fn, argsAt(args, broadcast, i, j));
    out[i] = line;
  }
  return out;
}

/**
 * The date system the windows of a call give (their `dateSystem` field; 1900 when none does): one
 * call reads its date-times in one system, so windows that name different ones are refused.
 */
function windowsDateSystem(param: ParamDescriptor, windows: ReadArg): DateSystem {
  let found: DateSystem | undefined;
  for (const w of windows.cells) {
    const v = w instanceof SunpaneError || w === undefined ? undefined : ((w as WindowFields).values.get('dateSystem') as DateSystem | undefined);
    if (v === undefined) continue;
    if (found !== undefined && v !== found) {
      throw new SunpaneError((w as WindowFields).written.get('dateSystem') ?? `${param.name} dateSystem`, v, `must be the same for every window of one call (another says ${found}): a workbook has one date system`);
    }
    found = v;
  }
  return found ?? 1900;
}

type Broadcast = readonly { param: ParamDescriptor; arg: ReadArg }[];

function isArgs(a: Args | OutCell): a is Args {
  return typeof a === 'object' && !(a instanceof SunpaneError) && !(a instanceof NotAvailable);
}

/**
 * The arguments of result cell (i, j): `args` (the fixed ones) with each broadcast one's partner set
 * in it, or the cell's error / #N/A.
 */
function argsAt(args: Args, broadcast: Broadcast, i: number, j: number): Args | OutCell {
  for (let b = 0; b < broadcast.length; b++) {
    const { param, arg } = broadcast[b];
    const r = arg.rows === 1 ? 0 : i;
    const c = arg.cols === 1 ? 0 : j;
    if (r >= arg.rows || c >= arg.cols) return noPartner(param, arg);
    const v = arg.cells[r * arg.cols + c];
    if (v instanceof SunpaneError) return v;
    args[param.name] = v;
  }
  return args;
}

/** One value cell: the function on its arguments (or the cell's error / #N/A as given). */
function cellOf(fn: FunctionDescriptor, args: Args | OutCell): OutCell {
  if (!isArgs(args)) return args;
  let value: number | NotAvailable | OutTable;
  try {
    value = fn.evaluate(args);
  } catch (err) {
    return errorCell(err);
  }
  if (isArray(value)) throw new Error(`${fn.name} is declared to return one value per cell but returned a table`);
  return checkCell(value);
}

/** Last guard: a number leaving Sunpane is finite. */
function checkCell(cell: OutCell): OutCell {
  if (typeof cell === 'number' && !numberIsFinite(cell)) {
    throw new Error(`internal error: a non-finite result (${cell}) reached the adapter`);
  }
  return cell;
}

export { NotAvailable };
