/**
 * Comma-separated text read into lines of fields (RFC 4180 quoting), for every file a user gives:
 * the hourly weather, the window schedule. Blank lines and lines starting with `#` are skipped but
 * keep their place in the line numbers.
 *
 * The separator is taken from the first line that is neither blank nor a comment (usually the
 * header): a semicolon there outside quotes makes the file semicolon-separated — the usual form
 * where the comma is the decimal mark — and otherwise fields are separated by commas.
 */

/** One parsed data line: its 1-based line number in the file and its fields (trimmed). */
export interface CsvLine {
  line: number;
  fields: string[];
}

/** The lines of a CSV text and the separator they were split at. */
export interface CsvText {
  lines: CsvLine[];
  separator: ',' | ';';
}

function isSkipped(raw: string): boolean {
  return raw.trim() === '' || raw.trimStart().startsWith('#');
}

/** True when `raw` holds a semicolon outside double quotes. */
function hasSemicolonOutsideQuotes(raw: string): boolean {
  let quoted = false;
  for (const ch of raw) {
    if (ch === '"') quoted = !quoted;
    else if (ch === ';' && !quoted) return true;
  }
  return false;
}

/** Splits a text into lines of fields, with the separator found (see the module comment). */
export function readCsvText(text: string): CsvText {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const rawLines = body.split(/\r\n|\n|\r/);
  const firstContent = rawLines.find((l) => !isSkipped(l)) ?? '';
  const separator = hasSemicolonOutsideQuotes(firstContent) ? ';' : ',';
  const lines: CsvLine[] = [];
  for (let i = 0; i < rawLines.length; i++) {
    if (isSkipped(rawLines[i])) continue;
    lines.push({ line: i + 1, fields: splitLine(rawLines[i], separator) });
  }
  return { lines, separator };
}

/** Splits a text into lines of fields; blank and comment lines are skipped but counted for line numbers. */
export function parseCsv(text: string): CsvLine[] {
  return readCsvText(text).lines;
}

/** Splits one line at the separator, honouring double quotes ("" inside quotes is one quote). */
function splitLine(raw: string, separator: string): string[] {
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
    else if (ch === separator) {
      fields.push(cur.trim());
      cur = '';
    } else cur += ch;
  }
  fields.push(cur.trim());
  return fields;
}
