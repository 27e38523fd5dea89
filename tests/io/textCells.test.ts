/**
 * Text from the user (window labels, option names) written into a cell is never read back as a
 * formula: a text starting with = + - @, a tab or a carriage return (and their full-width forms,
 * which some input methods give) gets an apostrophe in front — the CSV-injection defence the OWASP
 * "CSV Injection" page recommends, and Excel's own mark for "this cell is text".
 */
import * as fc from 'fast-check';
import { escapeFormulaText } from '../../src/io/textCells';

describe('text cells', () => {
  test.each([
    ['=HYPERLINK("http://example.invalid","x")', '\'=HYPERLINK("http://example.invalid","x")'],
    ['+1+2', "'+1+2"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\tx', "'\tx"],
    ['\rx', "'\rx"],
    ['＝1+1', "'＝1+1"],
  ])('%j is written as %j', (text, written) => {
    expect(escapeFormulaText(text)).toBe(written);
  });

  test('ordinary labels, and formula characters after the first, are left alone', () => {
    for (const t of ['South office', 'Level 2 = east', 'a+b', 'x@y', '', "'already quoted", '3rd floor']) expect(escapeFormulaText(t)).toBe(t);
  });

  test('an escaped text never starts with a formula character and ends with the original (property, 2000 runs)', () => {
    fc.assert(
      fc.property(fc.string(), (t) => {
        const e = escapeFormulaText(t);
        expect(/^[=+\-@\t\r＝＋－＠]/.test(e)).toBe(false);
        expect(e.endsWith(t)).toBe(true);
        expect(e.length - t.length).toBeLessThanOrEqual(1);
      }),
      { numRuns: 2000 },
    );
  });
});
