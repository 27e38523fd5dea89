/** Table names the pane gives its tables: valid by Excel's rules, from the window's words, unique. */
import { cleanTableName, isValidTableName, uniqueTableName } from '../../src/taskpane/tableNames';

describe('table names', () => {
  test('come from the words of what the table holds', () => {
    expect(cleanTableName('Window A hourly')).toBe('Window_A_hourly');
    expect(cleanTableName('Büro Süd – 2.OG options')).toBe('Buro_Sud_2.OG_options');
    expect(cleanTableName('Schedule results')).toBe('Schedule_results');
  });

  test('never start with a digit, never read as a cell reference, never come out blank', () => {
    expect(cleanTableName('2nd floor')).toBe('T_2nd_floor');
    expect(cleanTableName('A1')).toBe('T_A1');
    expect(cleanTableName('R2C3')).toBe('T_R2C3');
    expect(cleanTableName('c')).toBe('T_c');
    expect(cleanTableName('— ? —')).toBe('Sunpane');
    for (const t of ['2nd floor', 'A1', 'R2C3', 'c', '— ? —', 'x'.repeat(400), 'Window A hourly']) expect(isValidTableName(cleanTableName(t))).toBe(true);
  });

  test('are unique in the workbook without regard to case', () => {
    expect(uniqueTableName('Window A hourly', [])).toBe('Window_A_hourly');
    expect(uniqueTableName('Window A hourly', ['window_a_hourly'])).toBe('Window_A_hourly_2');
    expect(uniqueTableName('Window A hourly', ['Window_A_hourly', 'Window_A_hourly_2'])).toBe('Window_A_hourly_3');
  });

  test('the validity check refuses what Excel refuses', () => {
    for (const bad of ['', '1abc', 'a b', 'A1', 'R1C1', 'r', 'x'.repeat(256), 'a-b']) expect(isValidTableName(bad)).toBe(false);
    for (const good of ['_x', 'Window_A', 'a.b', 'ABCD1']) expect(isValidTableName(good)).toBe(true);
  });
});
