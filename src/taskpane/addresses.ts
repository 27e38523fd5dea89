/**
 * Range addresses typed by the user in the pane (e.g. `Weather!B2:B8761`, `'My data'!C2:C8785`,
 * `D2:D13`): parsed into an optional sheet name and an A1 range, so that the pane can read them
 * through the Excel API. Only single rectangular ranges are accepted.
 */

/** A parsed range address. */
export interface RangeRef {
  /** Sheet name, or undefined for the active sheet. */
  sheet?: string;
  /** A1 range without the sheet, upper-case, e.g. `B2:B8761`. */
  range: string;
}

const CELL = '\\$?[A-Za-z]{1,3}\\$?[0-9]{1,7}';
const A1 = new RegExp(`^(${CELL})(?::(${CELL}))?$`);

/**
 * Parses a range address; returns undefined when it is not one. A sheet name with spaces or other
 * characters is written in single quotes, with a doubled quote for a quote in the name.
 */
export function parseRangeAddress(text: string): RangeRef | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  let sheet: string | undefined;
  let rest = t;
  if (t.startsWith("'")) {
    const m = /^'((?:[^']|'')+)'!(.+)$/.exec(t);
    if (!m) return undefined;
    sheet = m[1].replace(/''/g, "'");
    rest = m[2];
  } else if (t.includes('!')) {
    const i = t.lastIndexOf('!');
    sheet = t.slice(0, i);
    rest = t.slice(i + 1);
    if (!/^[A-Za-z0-9_.]+$/.test(sheet)) return undefined;
  }
  const m = A1.exec(rest.trim());
  if (!m) return undefined;
  return { sheet, range: rest.trim().replace(/\$/g, '').toUpperCase() };
}

/** Text of the allowed form, for messages. */
export const RANGE_ADDRESS_HELP = "must be a range address such as B2:B8761 or Weather!B2:B8761 (quote sheet names with spaces: 'My data'!B2:B8761)";
