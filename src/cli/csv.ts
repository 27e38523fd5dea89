/**
 * Comma-separated text: writing fields for CSV output; reading (RFC 4180 quoting, comma or
 * semicolon) is src/io/csvText.ts, re-exported here for the command line's readers.
 */

export { type CsvLine, parseCsv } from '../io/csvText';

/** One field as CSV text: quoted when it holds a comma, quote or line break. */
export function csvField(value: string | number): string {
  const text = typeof value === 'number' ? String(value) : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One CSV line (without the line break). */
export function csvLine(values: readonly (string | number)[]): string {
  return values.map(csvField).join(',');
}

/** Numbers as the CSV output prints them: at most `decimals` places, no trailing zeros, no "-0". */
export function formatFixed(value: number, decimals: number): string {
  const text = String(Number(value.toFixed(decimals)));
  return text === '-0' ? '0' : text;
}
