/**
 * Reading CSV text (src/io/csvText.ts): the separator is taken from the first line that is neither
 * blank nor a `#` comment, so a comment with commas above a semicolon file does not hide its
 * semicolons; a semicolon inside quotes does not count.
 */
import { readCsvText } from '../../src/io/csvText';

describe('CSV text', () => {
  test('a semicolon file with decimal commas is split at the semicolons, also after a comment line with commas', () => {
    const r = readCsvText('# made up, for the test\n\nstamp;dni;dhi\n2026-01-01T10:00;312,5;80,1\n');
    expect(r.separator).toBe(';');
    expect(r.lines).toEqual([
      { line: 3, fields: ['stamp', 'dni', 'dhi'] },
      { line: 4, fields: ['2026-01-01T10:00', '312,5', '80,1'] },
    ]);
  });

  test('a data line with both commas and semicolons as its first line is a semicolon file', () => {
    expect(readCsvText('2026-01-01T10:00;312,5;80,1\n').separator).toBe(';');
  });

  test('a semicolon inside quotes does not make a comma file a semicolon file', () => {
    const r = readCsvText('Window,Skyline\n"a; b","0;5;10"\n');
    expect(r.separator).toBe(',');
    expect(r.lines[1].fields).toEqual(['a; b', '0;5;10']);
  });
});
