/**
 * The weather CSV reader: row count per year, columns by name or number, missing and garbled
 * values marking their hour missing by line number. (Format of our own.)
 */
import { CliInputError } from '../../src/cli/cliError';
import { describeMissing, weatherFromCsv } from '../../src/cli/weatherCsv';

function hourlyCsv(hours: number, header = 'stamp,dni,dhi', edit?: (h: number) => string | undefined): string {
  const lines = header ? [header] : [];
  for (let h = 0; h < hours; h++) lines.push(edit?.(h) ?? `${h},${(h % 24) * 10},${h % 24}`);
  return `${lines.join('\n')}\n`;
}

describe('weather CSV', () => {
  it('reads direct normal and diffuse columns by name into one value per hour', () => {
    const w = weatherFromCsv(hourlyCsv(8760), 'w.csv', 2026, { dni: 'DNI', dhi: 'dhi' });
    expect(w.weather.kind).toBe('measured');
    if (w.weather.kind !== 'measured') throw new Error('kind');
    expect(w.weather.dni.length).toBe(8760);
    expect(w.weather.dni[13]).toBe(130);
    expect(w.weather.dhi[13]).toBe(13);
    expect(w.missingHours).toBe(0);
  });

  it('reads columns by 1-based number in a file without a header', () => {
    const w = weatherFromCsv(hourlyCsv(8784, ''), 'w.csv', 2028, { ghi: '2' });
    if (w.weather.kind !== 'globalHorizontal') throw new Error('kind');
    expect(w.weather.ghi.length).toBe(8784);
    expect(w.weather.ghi[25]).toBe(10);
  });

  it('refuses a wrong hour count naming the rows expected and found', () => {
    expect(() => weatherFromCsv(hourlyCsv(8759), 'short.csv', 2026, { dni: 'dni', dhi: 'dhi' })).toThrow(
      /short\.csv: expected 8760 hourly rows for 2026 .*found 8759/,
    );
    expect(() => weatherFromCsv(hourlyCsv(8760), 'leap.csv', 2028, { dni: 'dni', dhi: 'dhi' })).toThrow(/expected 8784 hourly rows for 2028.*found 8760/);
  });

  it('marks hours with blank, garbled, negative or implausible values missing and names their lines', () => {
    const bad: Record<number, string> = { 0: '0,,0', 5: '5,abc,3', 9: '9,10,-4', 30: '30,2500,10', 40: '40' };
    const w = weatherFromCsv(hourlyCsv(8760, 'stamp,dni,dhi', (h) => bad[h]), 'w.csv', 2026, { dni: 'dni', dhi: 'dhi' });
    expect(w.missingHours).toBe(5);
    if (w.weather.kind !== 'measured') throw new Error('kind');
    for (const h of [0, 5, 9, 30, 40]) {
      expect(Number.isNaN(w.weather.dni[h])).toBe(true);
      expect(Number.isNaN(w.weather.dhi[h])).toBe(true);
    }
    expect(w.weather.dni[6]).toBe(60);
    // Header is line 1, hour h is on line h + 2.
    expect(w.missing.map((m) => [m.line, m.quantity, m.reason])).toEqual([
      [2, 'dni', 'blank'],
      [7, 'dni', 'not a number'],
      [11, 'dhi', 'negative'],
      [32, 'dni', 'above 2000 W/m²'],
      [42, 'dni', 'the row has only 1 columns'],
      [42, 'dhi', 'the row has only 1 columns'],
    ]);
    expect(describeMissing('w.csv', w, 2)).toBe('w.csv: 5 hours missing — line 2 dni (blank); line 7 dni "abc" (not a number), and 4 more');
  });

  it('refuses a column name the header does not have, listing the columns', () => {
    expect(() => weatherFromCsv(hourlyCsv(8760), 'w.csv', 2026, { dni: 'beam', dhi: 'dhi' })).toThrow(/no column named "beam" \(its columns: stamp, dni, dhi\)/);
    expect(() => weatherFromCsv(hourlyCsv(8760, ''), 'w.csv', 2026, { dni: 'dni', dhi: '3' })).toThrow(CliInputError);
  });

  it('skips blank and # comment lines while keeping file line numbers', () => {
    const text = `# invented test data\n\n${hourlyCsv(8760, 'a,dni,dhi', (h) => (h === 2 ? '2,x,1' : undefined))}`;
    const w = weatherFromCsv(text, 'w.csv', 2026, { dni: 'dni', dhi: 'dhi' });
    expect(w.missing[0].line).toBe(6); // comment 1, blank 2, header 3, hours 0–2 on lines 4–6
  });
});
