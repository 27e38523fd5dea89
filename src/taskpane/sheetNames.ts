/**
 * Sheet names for the pane's result sheets: Excel allows at most 31 characters, none of
 * `: \ / ? * [ ]`, not blank, not starting or ending with an apostrophe, and names are unique
 * without regard to case (docs/platform.md#writing-sheets-from-the-pane).
 */

/** Longest sheet name Excel accepts. */
export const SHEET_NAME_MAX = 31;

const FORBIDDEN = /[:\\/?*[\]]/g;

/** True when Excel would accept `name` as a sheet name (uniqueness aside). */
export function isValidSheetName(name: string): boolean {
  return name.length > 0 && name.length <= SHEET_NAME_MAX && !/[:\\/?*[\]]/.test(name) && !name.startsWith("'") && !name.endsWith("'") && name.trim() === name && name.trim() !== '';
}

/**
 * Turns any text into an acceptable sheet name: forbidden characters become `-`, runs of blanks
 * shrink to one, apostrophes at the ends go, and the result is cut to 31 characters. A text with
 * nothing left gives `fallback`.
 */
export function cleanSheetName(text: string, fallback = 'Sunpane'): string {
  let name = text.replace(FORBIDDEN, '-').replace(/\s+/g, ' ').trim();
  name = name.replace(/^'+|'+$/g, '').trim();
  if (name.length > SHEET_NAME_MAX) name = name.slice(0, SHEET_NAME_MAX).trim();
  name = name.replace(/'+$/g, '').trim();
  return name === '' ? fallback : name;
}

/** Case-insensitive membership, the way Excel compares sheet names. */
export function hasSheetName(existing: readonly string[], name: string): boolean {
  const lower = name.toLowerCase();
  return existing.some((s) => s.toLowerCase() === lower);
}

/**
 * A name not yet used in the workbook: `base` itself when free, else `base (2)`, `base (3)` …,
 * shortening `base` so that the whole stays within 31 characters.
 */
export function uniqueSheetName(base: string, existing: readonly string[]): string {
  const clean = cleanSheetName(base);
  if (!hasSheetName(existing, clean)) return clean;
  for (let n = 2; n < 10_000; n++) {
    const suffix = ` (${n})`;
    const candidate = `${clean.slice(0, SHEET_NAME_MAX - suffix.length).trim()}${suffix}`;
    if (!hasSheetName(existing, candidate)) return candidate;
  }
  throw new Error('no free sheet name: the workbook has too many sheets of this name');
}
