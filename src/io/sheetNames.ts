/**
 * Sheet names for every workbook Sunpane writes, the pane's result sheets and the command line's
 * workbooks alike. Excel's rules (docs/platform.md#writing-sheets-from-the-pane): at most 31
 * characters, none of `: \ / ? * [ ]`, not blank, no apostrophe at either end, not `History` in
 * any case (Excel keeps that name for its change history), unique without regard to case. The
 * length is counted in UTF-16 code units, the stricter of the ways a character can be counted, so
 * that a name which fits here fits in every client. A name is cut only between whole graphemes
 * (what a reader sees as one character: an emoji with its skin tone or its family members, a flag,
 * a letter with its accent), never inside one.
 */

/** Longest sheet name Excel accepts [UTF-16 code units]. */
export const SHEET_NAME_MAX = 31;

/** Names Excel reserves for itself (compared without regard to case). */
const RESERVED = ['history'];

const FORBIDDEN = /[:\\/?*[\]]/g;
const CONTROL = /[\u0000-\u001f\u007f]/g;
const HAS_CONTROL = /[\u0000-\u001f\u007f]/;

/** True when Excel would accept `name` as a sheet name (uniqueness aside). */
export function isValidSheetName(name: string): boolean {
  return (
    name.length > 0 &&
    name.length <= SHEET_NAME_MAX &&
    !/[:\\/?*[\]]/.test(name) &&
    !HAS_CONTROL.test(name) &&
    !name.startsWith("'") &&
    !name.endsWith("'") &&
    name.trim() === name &&
    !RESERVED.includes(name.toLowerCase())
  );
}

interface GraphemeSegmenter {
  segment(text: string): Iterable<{ segment: string }>;
}

const SEGMENTER: GraphemeSegmenter | undefined = (() => {
  const Segmenter = (Intl as unknown as { Segmenter?: new (locale?: string, options?: { granularity: string }) => GraphemeSegmenter }).Segmenter;
  return Segmenter ? new Segmenter(undefined, { granularity: 'grapheme' }) : undefined;
})();

/**
 * Graphemes when the platform has no `Intl.Segmenter` (older browser engines): a base character
 * with every combining mark, variation selector, emoji skin tone, tag character and
 * zero-width-joiner sequence that follows it, and regional indicators in pairs (flags). Covers the
 * clusters that turn up in window labels; Unicode's full rules (UAX #29) also join Hangul syllable
 * parts and a few scripts' spacing marks, which this keeps apart.
 */
export function graphemesFallback(text: string): string[] {
  const out: string[] = [];
  const chars = Array.from(text); // code points
  const extend = /^[\p{M}\u200d\u{1f3fb}-\u{1f3ff}\u{e0020}-\u{e007f}]$/u;
  const regional = /^[\u{1f1e6}-\u{1f1ff}]$/u;
  for (let i = 0; i < chars.length; i++) {
    let g = chars[i];
    if (regional.test(g) && i + 1 < chars.length && regional.test(chars[i + 1])) g += chars[++i];
    while (i + 1 < chars.length) {
      const next = chars[i + 1];
      if (extend.test(next)) {
        g += next;
        i++;
        if (next === '\u200d' && i + 1 < chars.length) g += chars[++i]; // ZWJ joins the next character
      } else break;
    }
    out.push(g);
  }
  return out;
}

/** The graphemes of a text, by the platform's segmenter where it has one. */
export function graphemes(text: string): string[] {
  return SEGMENTER ? Array.from(SEGMENTER.segment(text), (s) => s.segment) : graphemesFallback(text);
}

/** The longest run of whole graphemes from the start of `text` within `max` UTF-16 code units. */
function cutToLength(text: string, max: number): string {
  if (text.length <= max) return text;
  let out = '';
  for (const g of graphemes(text)) {
    if (out.length + g.length > max) break;
    out += g;
  }
  return out;
}

/** Trims blanks and apostrophes at both ends, as often as it takes (each may uncover the other). */
function trimEnds(text: string): string {
  let t = text;
  for (;;) {
    const next = t.trim().replace(/^'+|'+$/g, '');
    if (next === t) return t;
    t = next;
  }
}

/**
 * Turns any text into an acceptable sheet name: forbidden characters become `-`, control
 * characters and runs of blanks one space, apostrophes and blanks at the ends go, and the result is
 * cut to 31 code units between whole graphemes. A text with nothing left gives `fallback`; a
 * reserved name (`History`) gets the number 2.
 */
export function cleanSheetName(text: string, fallback = 'Sunpane'): string {
  let name = trimEnds(text.replace(FORBIDDEN, '-').replace(CONTROL, ' ').replace(/\s+/g, ' '));
  name = trimEnds(cutToLength(name, SHEET_NAME_MAX));
  if (name === '') return fallback;
  return RESERVED.includes(name.toLowerCase()) ? numbered(name, 2) : name;
}

/** `base (n)`, with `base` cut between whole graphemes so that the whole fits in 31 code units. */
function numbered(base: string, n: number): string {
  const suffix = ` (${n})`;
  return `${trimEnds(cutToLength(base, SHEET_NAME_MAX - suffix.length))}${suffix}`;
}

/** Case-insensitive membership, the way Excel compares sheet names; reserved names count as taken. */
export function hasSheetName(existing: readonly string[], name: string): boolean {
  const lower = name.toLowerCase();
  return RESERVED.includes(lower) || existing.some((s) => s.toLowerCase() === lower);
}

/**
 * A name not yet used in the workbook: the cleaned `base` itself when free, else `base (2)`,
 * `base (3)` …, shortening `base` between whole graphemes so that the whole stays within 31
 * code units.
 */
export function uniqueSheetName(base: string, existing: readonly string[]): string {
  const clean = cleanSheetName(base);
  if (!hasSheetName(existing, clean)) return clean;
  const stem = /^(.*) \((\d+)\)$/.exec(clean);
  const root = stem && RESERVED.includes(stem[1].toLowerCase()) ? stem[1] : clean;
  for (let n = 2; n < 10_000; n++) {
    const candidate = numbered(root, n);
    if (!hasSheetName(existing, candidate)) return candidate;
  }
  throw new Error('no free sheet name: the workbook has too many sheets of this name');
}
