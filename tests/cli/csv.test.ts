/** CSV splitting and quoting (RFC 4180 rules for quotes). */
import { csvLine, formatFixed, parseCsv } from '../../src/cli/csv';

describe('CSV text', () => {
  it('splits quoted fields holding commas and doubled quotes', () => {
    expect(parseCsv('a,"b, c","say ""hi"""\n1,2,3\n')).toEqual([
      { line: 1, fields: ['a', 'b, c', 'say "hi"'] },
      { line: 2, fields: ['1', '2', '3'] },
    ]);
  });

  it('accepts semicolons when the first line has no comma, and a byte-order mark', () => {
    expect(parseCsv('\ufeffx;y\r\n1;2')).toEqual([
      { line: 1, fields: ['x', 'y'] },
      { line: 2, fields: ['1', '2'] },
    ]);
  });

  it('quotes only the fields that need it when writing', () => {
    expect(csvLine(['plain', 'with,comma', 'q"uote', 3.5])).toBe('plain,"with,comma","q""uote",3.5');
  });

  it('prints numbers to fixed decimals without trailing zeros or a negative zero', () => {
    expect(formatFixed(1.23456, 3)).toBe('1.235');
    expect(formatFixed(2.5, 3)).toBe('2.5');
    expect(formatFixed(-0.0001, 3)).toBe('0');
  });
});
