/**
 * Reading worksheet-style arguments typed on the command line: numbers, TRUE/FALSE, text, a blank
 * (`""`), and ranges written as Excel array constants (`{10,20,30}` is a row, `{1;2;3}` a column,
 * `{1,2;3,4}` two rows).
 */
import type { Matrix, RawArg, Scalar } from '../registry/types';

function parseScalar(text: string): Scalar {
  const t = text.trim();
  if (t === '') return null;
  if (/^(true|false)$/i.test(t)) return t.toLowerCase() === 'true';
  if (/^"(.*)"$/.test(t)) return t.slice(1, -1);
  const n = Number(t);
  return Number.isNaN(n) ? t : n;
}

/** Parses one command-line argument as a cell value or an array constant. */
export function parseCliArg(text: string): RawArg {
  const t = text.trim();
  if (t.startsWith('{') && t.endsWith('}')) {
    const body = t.slice(1, -1);
    const rows: Matrix = body.split(';').map((row) => row.split(',').map(parseScalar));
    return rows;
  }
  return parseScalar(t);
}
