/**
 * The weather CSV file (format of our own): columns by name or number, the separator found after
 * comment lines, decimal commas read in semicolon files and refused with the reason in comma
 * files, the stamp column found, lines that do not line up with the header reported by line. The
 * checks themselves are src/io/weather.ts (tests/io/weather.test.ts); the data is the invented
 * year of the example site Brackwater (src/demo/weather.ts).
 */
import { CliInputError, CliUsageError } from '../../src/cli/cliError';
import { CLI_WEATHER_ADVICE, checkWeatherTable, weatherTableFromCsv } from '../../src/cli/weatherCsv';
import { formatSerialIso } from '../../src/core/time';
import { findExampleSite } from '../../src/demo/sites';
import { inventedWeatherYear } from '../../src/demo/weather';
import { checkWeather, describeWeatherCheck } from '../../src/io/weather';

const SITE = findExampleSite('brackwater')!.site;
const W = inventedWeatherYear(findExampleSite('brackwater')!, 2026);
const STAMPS = Array.from(W.stampSerial, (s) => formatSerialIso(s));

/** The invented year as CSV text, each line made by `line(stamp, dni, dhi, i)`. */
function csv(header: string | undefined, line: (stamp: string, dni: string, dhi: string, i: number) => string, before = ''): string {
  const lines = header === undefined ? [] : [header];
  for (let i = 0; i < STAMPS.length; i++) lines.push(line(STAMPS[i], String(W.dni[i]), String(W.dhi[i]), i));
  return `${before}${lines.join('\n')}\n`;
}

const comma = (t: string, a: string, b: string) => `${t},${a},${b}`;

function read(text: string, columns = { dni: 'direct normal', dhi: 'diffuse horizontal' }) {
  const table = weatherTableFromCsv(text, 'w.csv', columns);
  const check = checkWeather(table, { year: 2026, site: SITE, advice: CLI_WEATHER_ADVICE });
  return { table, check, lines: describeWeatherCheck(check, 'w.csv', CLI_WEATHER_ADVICE) };
}

describe('weather CSV', () => {
  test('reads columns by name (a unit in brackets may be left out), finds the stamp column, and keeps every value', () => {
    const r = read(csv('hour ending,direct normal [W/m²],diffuse horizontal [W/m²]', comma));
    expect(r.table.stamps?.header).toBe('hour ending');
    expect(r.check.usable).toBe(true);
    expect(r.lines).toEqual([]);
    if (r.check.weather?.kind !== 'measured') throw new Error('kind');
    expect(Array.from(r.check.weather.dni)).toEqual(Array.from(W.dni));
  });

  test('reads columns by 1-based number in a file without a header', () => {
    const r = read(csv(undefined, comma), { dni: '2', dhi: '3' });
    expect(r.table.rows).toBe(8760);
    expect(r.check.usable).toBe(true);
  });

  test('a semicolon-separated file with decimal commas is read correctly, also after # comment lines', () => {
    const text = csv('hour ending;direct normal [W/m²];diffuse horizontal [W/m²]', (t, a, b) => `${t};${a.replace('.', ',')};${b.replace('.', ',')}`, '# invented test data; not a measurement\n# second comment, with a comma\n');
    const r = read(text);
    expect(r.check.usable).toBe(true);
    expect(r.lines).toEqual(['w.csv: values read with a decimal comma']);
    if (r.check.weather?.kind !== 'measured') throw new Error('kind');
    expect(Array.from(r.check.weather.dhi)).toEqual(Array.from(W.dhi));
    expect(r.table.where(0)).toBe('line 4');
  });

  test('decimal commas in a comma-separated file are refused, naming the lines and the likely cause', () => {
    const r = read(csv('hour ending,direct normal,diffuse horizontal', (t, a, b) => `${t},${a.replace('.', ',')},${b.replace('.', ',')}`));
    expect(r.check.usable).toBe(false);
    expect(r.lines[0]).toMatch(/^w\.csv cannot be used: \d+ of 8760 hours cannot be used \(\d+(\.\d+)? %\), more than the 1 % allowed \(--max-unusable PERCENT sets it\):$/);
    expect(r.lines[1]).toMatch(
      /^ {2}\d+ rows that cannot be read: line \d+ \(\d fields where the header has 3\); .* \(decimal commas in a comma-separated file split each number in two: separate the fields with semicolons, or put each number in quotes\)$/,
    );
  });

  test('a line too short to reach a picked column cannot be read and is named', () => {
    const r = read(csv('t,direct normal,diffuse horizontal', (t, a, b, i) => (i === 40 ? t : comma(t, a, b))));
    expect(r.check.unusableHours).toBe(1);
    expect(r.lines).toContain('  1 row that cannot be read: line 42 (1 field, too few to reach column 3)');
  });

  test('without a stamp column (--time none) the rows are the hours in order and must number one per hour', () => {
    const r = read(csv('t,direct normal,diffuse horizontal', comma), { dni: 'direct normal', dhi: 'diffuse horizontal', time: 'none' } as never);
    expect(r.check.usable).toBe(true);
    expect(r.lines).toEqual(['w.csv: no unit stated for direct normal and diffuse horizontal: read as W/m² (state it in the header, e.g. "direct normal [W/m²]", or --units W/m2|Wh/m2|kJ/m2)', 'w.csv: no time stamps: rows read in order, the first as the hour ending 01:00 on 1 January 2026']);
    const short = read(csv('t,direct normal,diffuse horizontal', comma).split('\n').slice(0, -2).join('\n'), { dni: 'direct normal', dhi: 'diffuse horizontal', time: 'none' } as never);
    expect(short.check.refusals[0]).toBe('expected 8760 hourly rows for 2026 (one per hour, the first ending at 01:00 on 1 January; a typical year of 8760 or a leap-year file of 8784 is also fitted), found 8759, line 2 to line 8760; or give the rows their time stamps');
  });

  test('refuses a column name the header does not have, listing the columns; a column number below 1 is wrong usage', () => {
    expect(() => read(csv('stamp,dni,dhi', comma), { dni: 'beam', dhi: 'dhi' })).toThrow(/--dni beam: w\.csv has no column named "beam" \(its columns: stamp, dni, dhi\)/);
    expect(() => read(csv(undefined, comma), { dni: 'dni', dhi: '3' })).toThrow(CliInputError);
    expect(() => read(csv(undefined, comma), { dni: '0', dhi: '3' })).toThrow(CliUsageError);
  });

  test('the command line throws the whole report when the weather cannot be used', () => {
    const table = weatherTableFromCsv(csv('t,direct normal,diffuse horizontal', (t, a, b, i) => comma(t, i % 20 === 0 ? 'x' : a, b)), 'w.csv', { dni: 'direct normal', dhi: 'diffuse horizontal' });
    expect(() => checkWeatherTable(table, 'w.csv', 2026, SITE)).toThrow(/^w\.csv cannot be used: 438 of 8760 hours cannot be used \(5 %\), more than the 1 % allowed/);
    expect(checkWeatherTable(table, 'w.csv', 2026, SITE, { maxUnusablePercent: 6 }).report[0]).toMatch(/within the 6 % allowed/);
  });
});
