/**
 * Comma-separated text: reading lines into fields (RFC 4180 quoting, comma or semicolon) and
 * writing fields back, for the weather file, the window schedule and CSV output.
 */

/** One parsed data line: its 1-based line number in the file and its fields (trimmed). */
export interface CsvLine {
  line: number;
  fields: string[];
}

/** Splits a text into lines of fields; blank lines are skipped but counted for line numbers. */
export function parseCsv(text: string): CsvLine[] {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const rawLines = body.split(/\r\n|\n|\r/);
  const firstContent = rawLines.find((l) => l.trim() !== '') ?? '';
  const delimiter = firstContent.includes(',') || !firstContent.includes(';') ? ',' : ';';
  const out: CsvLine[] = [];
  for (let i = 0; i < rawLines.length; i++) {
    const raw = rawLines[i];
    if (raw.trim() === '' || raw.trimStart().startsWith('#')) continue;
    out.push({ line: i + 1, fields: splitLine(raw, delimiter) });
  }
  return out;
}

/** Splits one line at the delimiter, honouring double quotes ("" inside quotes is one quote). */
function splitLine(raw: string, delimiter: string): string[] {
  const fields: string[] = [];
  let cur = '';
  let quoted = false;
  for (let i = 0; i < raw.length; i++) {
    const ch = raw[i];
    if (quoted) {
      if (ch === '"' && raw[i + 1] === '"') {
        cur += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cur += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === delimiter) {
      fields.push(cur.trim());
      cur = '';
    } else cur += ch;
  }
  fields.push(cur.trim());
  return fields;
}

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
