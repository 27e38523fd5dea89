/**
 * The Excel adapter: one generic handler per registered function. It turns what Excel passes
 * (matrix arguments, `null` for omitted ones, `[[v]]` for a single cell) into the registry's raw
 * arguments, lets the registry's one broadcast helper ({@link applyFunction}) do all reading,
 * checking and pairing of ranges, and turns the result table back into cells Excel can show.
 *
 * Error mapping (Excel shows a custom message only on #VALUE! and #N/A, docs/platform.md#errors):
 * - a result cell holding a SunpaneError → #VALUE! with its message (only that cell);
 * - a result cell holding a NotAvailable → #N/A with its message;
 * - a call refused as a whole (mismatched range shapes, a bad whole-range argument) → the handler
 *   throws #VALUE! with the SunpaneError's message;
 * - anything else thrown → #VALUE! "internal error: ...": nothing escapes uncaught, and no NaN or
 *   Infinity ever reaches a cell.
 */
import { SunpaneError } from '../core/common';
import { applyFunction } from '../registry/evaluate';
import { NotAvailable, type FunctionDescriptor, type Matrix, type OutCell, type OutTable, type RawArg, type Scalar } from '../registry/types';

/** The error codes the adapter uses, as CustomFunctions.ErrorCode provides them. */
export interface ErrorCodes {
  invalidValue: CustomFunctions.ErrorCode | string;
  notAvailable: CustomFunctions.ErrorCode | string;
}

/**
 * The part of Excel's CustomFunctions runtime the adapter needs: the error class and its codes
 * (and `associate`, for registering). Tests pass a stub of the same shape.
 */
export interface CustomFunctionsRuntime {
  Error: new (code: never, message?: string) => object;
  ErrorCode: ErrorCodes;
  associate?: (id: string, handler: (...args: unknown[]) => unknown) => void;
}

/** What a handler returns to Excel: rows of numbers, texts and error objects. */
export type ExcelCell = number | string | object;
export type ExcelResult = ExcelCell[][];

/** A handler as associated with Excel: any arguments in, a 2-D result out (or a thrown error). */
export type Handler = (...args: unknown[]) => ExcelResult;

function makeError(runtime: CustomFunctionsRuntime, code: CustomFunctions.ErrorCode | string, message: string): object {
  return new runtime.Error(code as never, message);
}

/** The text Sunpane reads for a cell holding an Excel error (e.g. an input cell showing #N/A). */
function errorText(value: object): string {
  const code = (value as { code?: unknown }).code;
  return typeof code === 'string' && code !== '' ? code : '#ERROR';
}

/** One cell as Excel gives it → a registry scalar. Blank cells become `null`. */
export function normaliseCell(value: unknown): Scalar {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean') return value;
  // Excel passes nothing else for `any` cells; an error value or a rich value is read as text so
  // that the parameter's own check refuses it with the parameter's name.
  if (typeof value === 'object') return errorText(value);
  return String(value);
}

/**
 * One argument as Excel gives it → a registry raw argument: omitted or `null` → undefined (blank),
 * `[[v]]` → the single value v, a range → rows of scalars.
 */
export function normaliseArg(value: unknown): RawArg | undefined {
  if (value === null || value === undefined) return undefined;
  if (!Array.isArray(value)) return normaliseCell(value);
  // Excel hands each call arrays of its own: cells are normalised in place, each read once.
  const rows = value as unknown[];
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i];
    if (!Array.isArray(row)) {
      rows[i] = [normaliseCell(row)];
      continue;
    }
    for (let j = 0; j < row.length; j++) {
      const c = row[j];
      if (typeof c !== 'number' && typeof c !== 'string' && typeof c !== 'boolean' && c !== null) row[j] = normaliseCell(c);
    }
  }
  const matrix = rows as Matrix;
  if (matrix.length === 1 && matrix[0].length === 1) return matrix[0][0] === null ? undefined : matrix[0][0];
  return matrix;
}

/** One result cell → what Excel shows. */
function toExcelCell(cell: OutCell, runtime: CustomFunctionsRuntime): ExcelCell {
  if (cell instanceof SunpaneError) return makeError(runtime, runtime.ErrorCode.invalidValue, cell.message);
  if (cell instanceof NotAvailable) return makeError(runtime, runtime.ErrorCode.notAvailable, cell.message);
  if (typeof cell === 'number') {
    return Number.isFinite(cell) ? cell : makeError(runtime, runtime.ErrorCode.invalidValue, `internal error: a non-finite result (${cell})`);
  }
  if (typeof cell === 'string') return cell;
  return makeError(runtime, runtime.ErrorCode.invalidValue, `internal error: an unexpected result cell (${String(cell)})`);
}

/**
 * The result table → a rectangular 2-D array for Excel (short rows padded with empty text; an empty
 * table becomes one #N/A cell, since Excel cannot show an empty spill).
 */
export function toExcelResult(table: OutTable, fnName: string, runtime: CustomFunctionsRuntime): ExcelResult {
  const width = table.reduce((w, row) => Math.max(w, row.length), 0);
  if (table.length === 0 || width === 0) return [[makeError(runtime, runtime.ErrorCode.notAvailable, `${fnName} has no rows to show for these arguments`)]];
  // The table is the registry's own, made for this call: its cells are turned into Excel's in place.
  const out = table as unknown as ExcelCell[][];
  for (const line of out) {
    for (let j = 0; j < line.length; j++) {
      const c = line[j] as OutCell;
      if (typeof c !== 'number' || !Number.isFinite(c)) line[j] = toExcelCell(c, runtime);
    }
    while (line.length < width) line.push('');
  }
  return out;
}

/**
 * Builds the worksheet handler of one registered function.
 *
 * @param fn - the function's descriptor from the registry
 * @param runtime - Excel's CustomFunctions object (or a stub with the same shape)
 * @returns a handler taking Excel's arguments (any extra trailing argument, such as an invocation
 *   object, is ignored) and returning a 2-D result; it throws only a `runtime.Error` (#VALUE!)
 */
export function makeHandler(fn: FunctionDescriptor, runtime: CustomFunctionsRuntime): Handler {
  return (...excelArgs: unknown[]): ExcelResult => {
    let table: OutTable;
    try {
      const raw = excelArgs.slice(0, fn.params.length).map(normaliseArg);
      while (raw.length > 0 && raw[raw.length - 1] === undefined) raw.pop();
      table = applyFunction(fn, raw);
    } catch (err) {
      if (err instanceof SunpaneError) throw makeError(runtime, runtime.ErrorCode.invalidValue, err.message);
      throw makeError(runtime, runtime.ErrorCode.invalidValue, `internal error: ${err instanceof Error ? err.message : String(err)}`);
    }
    try {
      return toExcelResult(table, fn.name, runtime);
    } catch (err) {
      throw makeError(runtime, runtime.ErrorCode.invalidValue, `internal error: ${err instanceof Error ? err.message : String(err)}`);
    }
  };
}
