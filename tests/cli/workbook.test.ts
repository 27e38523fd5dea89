/** Workbook helpers: addresses, names Excel accepts, and date cells that show local wall-clock time. */
import { address, columnLetter, serialToCellDate, sheetName, tableName } from '../../src/cli/workbook';
import { civilToSerial } from '../../src/core/time/calendar';

describe('workbook helpers', () => {
  it('spells column numbers as letters past Z and ZZ', () => {
    expect([1, 26, 27, 52, 702, 703].map(columnLetter)).toEqual(['A', 'Z', 'AA', 'AZ', 'ZZ', 'AAA']);
    expect(address(8761, 14)).toBe('N8761');
  });

  it('makes table names of letters, digits and underscores starting with a letter', () => {
    expect(tableName('Hourly BW-S1')).toBe('Hourly_BW_S1');
    expect(tableName('1st floor')).toBe('T_1st_floor');
  });

  it('names sheets by the rules the pane uses (src/io/sheetNames.ts; tests/io/sheetNames.test.ts)', () => {
    expect(sheetName('a/b:c?d*e[f]g\\h')).toBe('a-b-c-d-e-f-g-h');
    expect(sheetName('x'.repeat(40))).toHaveLength(31);
    expect(sheetName("'History'")).toBe('History (2)');
  });

  it('turns a local serial into a Date whose UTC fields carry the wall-clock time', () => {
    const d = serialToCellDate(civilToSerial(2026, 6, 21, 14, 30));
    expect(d.toISOString()).toBe('2026-06-21T14:30:00.000Z');
  });
});
