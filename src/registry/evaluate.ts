/**
 * Reading arguments and broadcasting: the one place where any registered function is applied over
 * single values and ranges, for Excel and the CLI alike.
 *
 * Rules (like built-in worksheet functions):
 * - every `number` / `dateTime` / `choice` / `flag` parameter takes a single value or a range;
 *   ranges of equal shape pair element by element, and a single value (or 1 × 1 range) pairs with
 *   every element; other shapes are refused;
 * - a blank cell or omitted argument takes the parameter's default, if it has one;
 * - a bad element makes only its own result cell an error;
 * - `numberList` and `table` parameters take their whole range and are not broadcast;
 * - `spill` functions take single values for their broadcast parameters.
 */
import { SunpaneError, rangeText, requireRange } from '../core/common';
import { parseIsoLocal, requireSerial } from '../core/time';
import { type ArgValue, type Args, type FunctionDescriptor, type Matrix, NotAvailable, type OutCell, type OutTable, type ParamDescriptor, type RawArg, type Scalar } from './types';

function isMatrix(raw: RawArg | undefined): raw is Matrix {
  return Array.isArray(raw);
}

function isBlank(v: Scalar | undefined): boolean {
  return v === null || v === undefined || v === '';
}

/** Reads one single value for a broadcast parameter; throws SunpaneError naming the parameter. */
export function readScalar(param: ParamDescriptor, value: Scalar | undefined): ArgValue {
  if (isBlank(value)) {
    if (param.default !== undefined) return param.default;
    if (param.optional) return undefined;
    throw new SunpaneError(param.name, value, `is required: ${allowedText(param)}`);
  }
  switch (param.kind) {
    case 'number': {
      const n = typeof value === 'string' && value.trim() !== '' && !Number.isNaN(Number(value)) ? Number(value) : value;
      return requireRange(param.name, n, param.min, param.max, param.unit, param);
    }
    case 'dateTime':
      if (typeof value === 'string') {
        const t = value.trim();
        return t !== '' && !Number.isNaN(Number(t)) ? requireSerial(param.name, Number(t)) : parseIsoLocal(t, param.name);
      }
      return requireSerial(param.name, value);
    case 'choice': {
      const text = String(value).trim().toLowerCase();
      const hit = (param.choices ?? []).find((c) => c.toLowerCase() === text);
      if (hit === undefined || typeof value === 'boolean') throw new SunpaneError(param.name, value, allowedText(param));
      return hit;
    }
    case 'flag':
      if (typeof value === 'boolean') return value;
      if (value === 1 || value === 0) return value === 1;
      if (typeof value === 'string' && /^(true|false)$/i.test(value.trim())) return value.trim().toLowerCase() === 'true';
      throw new SunpaneError(param.name, value, allowedText(param));
    default:
      throw new SunpaneError(param.name, value, 'must be a range');
  }
}

/** Reads a whole-range parameter (`numberList` or `table`). */
export function readRange(param: ParamDescriptor, raw: RawArg | undefined): ArgValue {
  const rows: Matrix = isMatrix(raw) ? raw : isBlank(raw as Scalar) ? [] : [[raw as Scalar]];
  if (param.kind === 'table') {
    if (rows.length === 0 || rows.every((r) => r.every(isBlank))) {
      if (param.optional || param.default !== undefined) return undefined;
      throw new SunpaneError(param.name, raw ?? null, 'is required: must be a range that is not empty');
    }
    return rows;
  }
  const values: number[] = [];
  if (param.gapsAreMissing && rows.some((r) => r.some((c) => !isBlank(c)))) {
    // A series with gaps: every cell keeps its place; a blank or non-numeric cell is a missing value (NaN).
    for (const row of rows) {
      for (const cell of row) {
        const n = typeof cell === 'number' ? cell : typeof cell === 'string' && cell.trim() !== '' && !Number.isNaN(Number(cell)) ? Number(cell) : Number.NaN;
        if (!Number.isNaN(n)) requireRange(`${param.name} (value ${values.length + 1})`, n, param.min, param.max, param.unit);
        values.push(n);
      }
    }
  }
  for (const row of param.gapsAreMissing ? [] : rows) {
    for (const cell of row) {
      if (isBlank(cell) && rows.length * (row.length || 1) > 1) continue;
      if (isBlank(cell)) break;
      const n = typeof cell === 'string' && cell.trim() !== '' && !Number.isNaN(Number(cell)) ? Number(cell) : cell;
      requireRange(`${param.name} (value ${values.length + 1})`, n, param.min, param.max, param.unit);
      values.push(n as number);
    }
  }
  if (values.length === 0) {
    if (param.optional || param.default !== undefined) return undefined;
    throw new SunpaneError(param.name, raw ?? null, `is required: must be a range of numbers ${allowedText(param)}`);
  }
  const { exact, min, max } = param.length ?? {};
  if ((exact !== undefined && values.length !== exact) || (min !== undefined && values.length < min) || (max !== undefined && values.length > max)) {
    const want = exact !== undefined ? `exactly ${exact}` : min !== undefined && max !== undefined ? `${min} to ${max}` : min !== undefined ? `at least ${min}` : `at most ${max}`;
    throw new SunpaneError(param.name, values, `must hold ${want} numbers`);
  }
  if (param.ascending) {
    for (let i = 1; i < values.length; i++) {
      if (!(values[i] > values[i - 1])) throw new SunpaneError(param.name, values, `must be strictly ascending (value ${i + 1}, ${values[i]}, is not above ${values[i - 1]})`);
    }
  }
  return values;
}

/** The allowed values of a parameter in words (shared by messages, Excel descriptions and docs). */
export function allowedText(param: ParamDescriptor): string {
  switch (param.kind) {
    case 'number':
      return rangeText(param.min, param.max, param.unit, param);
    case 'dateTime':
      return 'must be a date-time (serial number or ISO 8601 local text) from 1 March 1900 to 31 December 9999';
    case 'choice':
      return `must be one of ${(param.choices ?? []).map((c) => `"${c}"`).join(', ')}`;
    case 'flag':
      return 'must be TRUE or FALSE';
    case 'numberList':
      return `(each ${rangeText(param.min, param.max, param.unit).replace(/^must be /, '')})`;
    default:
      return 'must be a range';
  }
}

function isBroadcast(param: ParamDescriptor): boolean {
  return param.kind !== 'numberList' && param.kind !== 'table';
}

function shapeOf(raw: RawArg | undefined): [number, number] {
  if (!isMatrix(raw)) return [1, 1];
  return [raw.length, raw.reduce((w, r) => Math.max(w, r.length), 0)];
}

function elementAt(raw: RawArg | undefined, i: number, j: number): Scalar | undefined {
  if (!isMatrix(raw)) return raw;
  const [rows, cols] = shapeOf(raw);
  if (rows === 1 && cols === 1) return raw[0][0];
  return raw[i]?.[j] ?? null;
}

/** Turns anything a function throws into a result cell; programming errors are re-thrown. */
function errorCell(err: unknown): OutCell {
  if (err instanceof SunpaneError) return err;
  throw err;
}

/**
 * Applies a registered function to raw arguments (as from cells or the CLI), broadcasting over
 * ranges. Returns the result table; bad elements are SunpaneError cells. Throws SunpaneError only
 * when the call as a whole is malformed (mismatched range shapes, too many arguments, a bad
 * whole-range argument, a range given to a spilling function).
 */
export function applyFunction(fn: FunctionDescriptor, rawArgs: readonly (RawArg | undefined)[]): OutTable {
  if (rawArgs.length > fn.params.length) {
    throw new SunpaneError('arguments', rawArgs.length, `${fn.name} takes at most ${fn.params.length} arguments`);
  }
  const fixed: Args = {};
  let rows = 1;
  let cols = 1;
  let shapeFrom = '';
  fn.params.forEach((p, k) => {
    const raw = rawArgs[k];
    if (!isBroadcast(p)) {
      fixed[p.name] = readRange(p, raw);
      return;
    }
    const [r, c] = shapeOf(raw);
    if (r === 0 || c === 0) throw new SunpaneError(p.name, raw ?? null, 'must not be an empty range');
    if (r === 1 && c === 1) return;
    if (rows === 1 && cols === 1) {
      [rows, cols, shapeFrom] = [r, c, p.name];
    } else if (r !== rows || c !== cols) {
      throw new SunpaneError(p.name, `a ${r} × ${c} range`, `must be a single value or a range of the same shape as ${shapeFrom} (${rows} × ${cols})`);
    }
  });
  if (fn.result.shape === 'spill' && (rows > 1 || cols > 1)) {
    throw new SunpaneError(shapeFrom, `a ${rows} × ${cols} range`, `must be a single value: ${fn.name} spills a table of its own`);
  }
  const out: OutTable = [];
  for (let i = 0; i < rows; i++) {
    const line: OutCell[] = [];
    for (let j = 0; j < cols; j++) {
      let args: Args;
      try {
        args = { ...fixed };
        for (let k = 0; k < fn.params.length; k++) {
          const p = fn.params[k];
          if (isBroadcast(p)) args[p.name] = readScalar(p, elementAt(rawArgs[k], i, j));
        }
      } catch (err) {
        line.push(errorCell(err));
        continue;
      }
      let value: number | NotAvailable | OutTable;
      try {
        value = fn.evaluate(args);
      } catch (err) {
        line.push(errorCell(err));
        continue;
      }
      if (Array.isArray(value)) return value.map((r) => r.map(checkCell));
      line.push(checkCell(value));
    }
    out.push(line);
  }
  return out;
}

/** Last guard: a number leaving Sunpane is finite. */
function checkCell(cell: OutCell): OutCell {
  if (typeof cell === 'number' && !Number.isFinite(cell)) {
    throw new Error(`internal error: a non-finite result (${cell}) reached the adapter`);
  }
  return cell;
}

export { NotAvailable };
