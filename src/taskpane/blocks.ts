/**
 * Cell addressing, row blocks and rounding for writing large tables in pieces: Excel on the web
 * refuses a request over 5 MB, so an hourly year (8760 rows) is written in blocks of rows with a
 * `context.sync()` after each (docs/platform.md#writing-sheets-from-the-pane).
 */

/** Rows per block when writing the hourly table (1,000–2,000 keeps each request well under 5 MB). */
export const DEFAULT_BLOCK_ROWS = 1500;

/** One block of rows: `start` (0-based, inclusive) and `end` (exclusive). */
export interface RowBlock {
  start: number;
  end: number;
}

/**
 * Splits `total` rows into consecutive blocks of at most `size` rows.
 * @param total - number of rows, ≥ 0
 * @param size - rows per block, ≥ 1
 */
export function rowBlocks(total: number, size: number = DEFAULT_BLOCK_ROWS): RowBlock[] {
  if (!Number.isInteger(total) || total < 0) throw new RangeError(`total must be a whole number of rows ≥ 0, got ${total}`);
  if (!Number.isInteger(size) || size < 1) throw new RangeError(`size must be a whole number of rows ≥ 1, got ${size}`);
  const blocks: RowBlock[] = [];
  for (let start = 0; start < total; start += size) blocks.push({ start, end: Math.min(total, start + size) });
  return blocks;
}

/** Column letters of a 0-based column index: 0 → A, 25 → Z, 26 → AA. */
export function columnLetters(index: number): string {
  if (!Number.isInteger(index) || index < 0) throw new RangeError(`column index must be a whole number ≥ 0, got ${index}`);
  let n = index + 1;
  let letters = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    letters = String.fromCharCode(65 + r) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}

/** A1 address of a 0-based cell. */
export function cellAddress(row: number, column: number): string {
  return `${columnLetters(column)}${row + 1}`;
}

/** A1 address of a block of cells from a 0-based top-left corner and a size. */
export function rangeAddress(row: number, column: number, rowCount: number, columnCount: number): string {
  if (rowCount < 1 || columnCount < 1) throw new RangeError(`a range needs at least one row and one column, got ${rowCount} × ${columnCount}`);
  const first = cellAddress(row, column);
  return rowCount === 1 && columnCount === 1 ? first : `${first}:${cellAddress(row + rowCount - 1, column + columnCount - 1)}`;
}

/**
 * Rounds to `decimals` places for writing (smaller requests; the numbers stay numbers). Non-finite
 * values never reach a sheet: they become an empty cell.
 */
export function roundForSheet(value: number, decimals: number): number | string {
  if (!Number.isFinite(value)) return '';
  const f = 10 ** decimals;
  const r = Math.round(value * f) / f;
  return Object.is(r, -0) ? 0 : r;
}

/** A 2-D array of one repeated value (e.g. a number format for every cell of a block). */
export function filled<T>(rows: number, columns: number, value: T): T[][] {
  const out: T[][] = new Array(rows);
  for (let i = 0; i < rows; i++) out[i] = new Array<T>(columns).fill(value);
  return out;
}

