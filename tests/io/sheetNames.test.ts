/**
 * Sheet naming for every workbook Sunpane writes (pane and command line). Excel's rules: at most 31
 * characters, none of : \ / ? * [ ], not blank, no apostrophe at either end, not "History" (Excel
 * keeps that name for its change history), unique without regard to case. Sunpane adds: a name is
 * never cut inside a character a reader sees as one (an emoji with its modifiers, a flag, a letter
 * with its accent).
 */
import * as fc from 'fast-check';
import { SHEET_NAME_MAX, cleanSheetName, graphemes, graphemesFallback, isValidSheetName, uniqueSheetName } from '../../src/io/sheetNames';

/** The graphemes of a text by the platform's own segmenter (Node's Intl.Segmenter), as a set. */
function graphemeSet(text: string): Set<string> {
  const seg = new (Intl as unknown as { Segmenter: new (l?: string, o?: object) => { segment(t: string): Iterable<{ segment: string }> } }).Segmenter(undefined, { granularity: 'grapheme' });
  return new Set(Array.from(seg.segment(text), (s) => s.segment));
}

describe('sheet names', () => {
  test('forbidden characters become dashes and the name is cut to 31 characters', () => {
    const name = cleanSheetName('East: level 3/4 [north*] ? very long window label indeed');
    expect(name).toBe('East- level 3-4 -north-- - very');
    expect(name.length).toBeLessThanOrEqual(SHEET_NAME_MAX);
    expect(isValidSheetName(name)).toBe(true);
  });

  test('apostrophes at either end and blank names are not allowed', () => {
    expect(cleanSheetName("'quoted'")).toBe('quoted');
    expect(cleanSheetName('  ')).toBe('Sunpane');
    expect(isValidSheetName("'a")).toBe(false);
    expect(isValidSheetName('')).toBe(false);
    expect(isValidSheetName('a'.repeat(32))).toBe(false);
  });

  test('an apostrophe that comes to the front after blanks are trimmed is removed too', () => {
    expect(cleanSheetName("' 'x")).toBe('x');
    expect(cleanSheetName("a '")).toBe('a');
    expect(cleanSheetName(`${'b'.repeat(29)} ' tail`)).toBe('b'.repeat(29));
  });

  test('"History" in any case is Excel\'s own and is never given', () => {
    expect(isValidSheetName('History')).toBe(false);
    expect(isValidSheetName('history')).toBe(false);
    expect(cleanSheetName('HISTORY')).toBe('HISTORY (2)');
    expect(uniqueSheetName('history', [])).toBe('history (2)');
    expect(uniqueSheetName('History', ['History (2)'])).toBe('History (3)');
    expect(isValidSheetName('History 2026')).toBe(true);
  });

  test('control characters (line breaks, tabs) do not reach a name', () => {
    expect(cleanSheetName('East\nwing\tA\u0007')).toBe('East wing A');
  });

  test('a long name is cut between whole emoji, flags and accented letters, never inside one', () => {
    const family = '👩‍👩‍👧‍👦'; // 11 UTF-16 code units, one grapheme
    const text = `${'w'.repeat(25)}${family}`; // 36 code units
    expect(cleanSheetName(text)).toBe('w'.repeat(25));
    const thumbs = '👍🏽'; // 4 code units
    expect(cleanSheetName(`${'x'.repeat(28)}${thumbs}`)).toBe('x'.repeat(28));
    const flag = '🇳🇱'; // 4 code units
    expect(cleanSheetName(`${'y'.repeat(29)}${flag}`)).toBe('y'.repeat(29));
    const accented = 'e\u0301'; // e + combining acute
    expect(cleanSheetName(`${'z'.repeat(30)}${accented}`)).toBe('z'.repeat(30));
    expect(cleanSheetName(`${'z'.repeat(29)}${accented}`)).toBe(`${'z'.repeat(29)}${accented}`);
  });

  test('a numbered variant of a long emoji name is cut between whole graphemes as well', () => {
    const base = `${'q'.repeat(24)}😀😀😀`; // 30 code units
    const next = uniqueSheetName(base, [base]);
    expect(next).toBe(`${'q'.repeat(24)}😀 (2)`);
    expect(next.length).toBeLessThanOrEqual(SHEET_NAME_MAX);
  });

  test('the fallback segmentation (platforms without Intl.Segmenter) keeps the same clusters together', () => {
    for (const t of ['👩‍👩‍👧‍👦x', '👍🏽a', '🇳🇱🇧🇪', 'e\u0301a', '#\uFE0F\u20E3b', 'abc', '🏴\uDB40\uDC67\uDB40\uDC62\uDB40\uDC73\uDB40\uDC63\uDB40\uDC74\uDB40\uDC7Fz']) {
      expect(graphemesFallback(t)).toEqual(graphemes(t));
    }
  });

  test('a taken name gets the first free number, compared without regard to case, still within 31 characters', () => {
    expect(uniqueSheetName('Window A hourly', ['window a HOURLY'])).toBe('Window A hourly (2)');
    expect(uniqueSheetName('Window A hourly', ['Window A hourly', 'Window A hourly (2)'])).toBe('Window A hourly (3)');
    const long = 'x'.repeat(31);
    const next = uniqueSheetName(long, [long]);
    expect(next).toBe(`${'x'.repeat(27)} (2)`);
    expect(next.length).toBe(31);
    expect(uniqueSheetName('Free', ['Other'])).toBe('Free');
  });

  test('any text gives a valid, unique name whose every grapheme is one of the text\'s or of the numbering (property, 2000 runs)', () => {
    const pieces = fc.constantFrom('a', 'Z', ' ', "'", ':', '/', '[', ']', '*', '?', '\\', '\n', '😀', '👍🏽', '🇳🇱', 'e\u0301', '👩‍👩‍👧‍👦', 'History', 'é', '中');
    fc.assert(
      fc.property(fc.array(pieces, { maxLength: 40 }).map((p) => p.join('')), fc.array(fc.string({ maxLength: 8 }), { maxLength: 4 }), (text, taken) => {
        const name = uniqueSheetName(text, taken);
        expect(isValidSheetName(name)).toBe(true);
        expect(taken.some((t) => t.toLowerCase() === name.toLowerCase())).toBe(false);
        const allowed = graphemeSet(`${text}-() 0123456789Sunpane`);
        for (const g of graphemeSet(name)) expect(allowed.has(g)).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });
});
