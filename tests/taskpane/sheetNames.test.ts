/** Sheet naming rules for result sheets (Excel: ≤ 31 characters, none of : \ / ? * [ ], unique regardless of case). */
import { SHEET_NAME_MAX, cleanSheetName, isValidSheetName, uniqueSheetName } from '../../src/taskpane/sheetNames';

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

  test('a taken name gets the first free number, compared without regard to case, still within 31 characters', () => {
    expect(uniqueSheetName('Window A hourly', ['window a HOURLY'])).toBe('Window A hourly (2)');
    expect(uniqueSheetName('Window A hourly', ['Window A hourly', 'Window A hourly (2)'])).toBe('Window A hourly (3)');
    const long = 'x'.repeat(31);
    const next = uniqueSheetName(long, [long]);
    expect(next).toBe(`${'x'.repeat(27)} (2)`);
    expect(next.length).toBe(31);
    expect(uniqueSheetName('Free', ['Other'])).toBe('Free');
  });
});
