/**
 * The table, schedule and demo commands end to end (in process): saved-output diffs of help texts,
 * `list` and example outputs; bad input named by field, row or line with exit code 1; usage errors
 * with exit code 2; unwritable output paths leave no partial file.
 */
import { spawnSync } from 'node:child_process';
import * as fs from 'node:fs';
import * as path from 'node:path';
import ExcelJS from 'exceljs';
import { CAUTION } from '../../src/outputs/caution';
import { sheetsWithoutCaution } from '../support/caution';
import { EXAMPLES, ROOT, expectSaved, run, tempDir } from './run';
import { addHeatMapSheet, addHourlySheet, addMonthlySheet } from '../../src/cli/annualSheets';
import { annualSeries, summarizeAnnual } from '../../src/core/gain';
import { readWindowFile } from '../../src/cli/windowJson';

const WINDOW = path.join(EXAMPLES, 'east-office.json');
const WEATHER = path.join(EXAMPLES, 'weather-brackwater-2026.csv');
const SCHEDULE = path.join(EXAMPLES, 'windows.csv');
const WEATHER_FLAGS = ['--weather', WEATHER, '--dni', 'direct normal', '--dhi', 'diffuse horizontal'];

function weatherLines(): string[] {
  return fs.readFileSync(WEATHER, 'utf8').split('\n');
}

function writeTemp(dir: string, name: string, text: string): string {
  const file = path.join(dir, name);
  fs.writeFileSync(file, text);
  return file;
}

/**
 * Contents rows whose sheet name and description do not both sit at the top of their cell: a
 * description wraps to several lines, and a name left at Excel's default (bottom) alignment then
 * prints beside its last line, next to the following row's name (seen in LibreOffice's PDF).
 */
function contentsMisaligned(wb: ExcelJS.Workbook): string[] {
  const contents = wb.getWorksheet('Contents')!;
  const wrong: string[] = [];
  contents.eachRow((row) => {
    const link = row.getCell(1).value as ExcelJS.CellHyperlinkValue | null;
    if (link === null || typeof link !== 'object' || !('hyperlink' in link)) return;
    if (row.getCell(1).alignment?.vertical !== 'top' || row.getCell(2).alignment?.vertical !== 'top') wrong.push(link.text);
  });
  return wrong.length === 0 && contents.rowCount < 6 ? ['(no contents rows)'] : wrong;
}

describe('help texts', () => {
  it.each(['table', 'schedule', 'demo'])('prints the saved help of %s and exits 0', async (command) => {
    const r = await run(command, '--help');
    expect(r.code).toBe(0);
    expect(r.out.startsWith(`usage: sunpane ${command}`)).toBe(true);
    expectSaved(`${command}-help.txt`, r.out);
  });

  it('lists every command in the top-level usage', async () => {
    const r = await run('--help');
    expect(r.code).toBe(0);
    for (const c of ['list', 'call', 'table', 'schedule', 'demo']) expect(r.out).toMatch(new RegExp(`^  ${c} `, 'm'));
  });

  it('prints the first worksheet functions of `sunpane list` as saved', async () => {
    const r = await run('list');
    expect(r.code).toBe(0);
    expectSaved('list-head.txt', r.out.split('\n').slice(0, 6).join('\n'));
  });
});

describe('sunpane table', () => {
  it("writes the example window's clear-sky year as CSV, whose first day is as saved", async () => {
    const dir = tempDir();
    const out = path.join(dir, 'east.csv');
    const r = await run('table', '--window', WINDOW, '--out', out);
    expect(r).toMatchObject({ code: 0, err: '' });
    const lines = fs.readFileSync(out, 'utf8').trimEnd().split('\n');
    expect(lines.length).toBe(1 + 8760);
    expectSaved('table-east-head.txt', lines.slice(0, 25).join('\n'));
    expect(r.out.split('\n').at(-1)).toBe(CAUTION);
    expect(r.out).toMatch(/^East meeting room: \d+\.\d kWh in 2026, peak \d+ W in the hour ending 2026-\d\d-\d\dT\d\d:00, \d+ sunlit hours\nwrote /);
  });

  it('says, for a window with a daylight-saving rule, that its stamps stay in standard time (printed and on every year sheet), and nothing without one', async () => {
    // The command line's table is stamped in local standard time all year; the worksheet functions
    // and the pane stamp on the clock (docs/conventions.md). A rule in the window file must not pass unseen.
    const dir = tempDir();
    const file = path.join(dir, 'with-rule.json');
    const window = JSON.parse(fs.readFileSync(WINDOW, 'utf8'));
    fs.writeFileSync(file, JSON.stringify({ ...window, daylightSavingStart: '2026-03-29T02:00', daylightSavingEnd: '2026-10-25T03:00' }));
    const note = /^Stamps stay in local standard time all year: the window's rule \(daylight saving \+1 h from the last Sunday of March 02:00 to the last Sunday of October 03:00 \(clock time\), every year\) is not applied to them; while it is in force, clock time is standard time plus its shift\.$/m;
    const r = await run('table', '--window', file, '--out', path.join(dir, 'with-rule.csv'));
    expect(r).toMatchObject({ code: 0, err: '' });
    expect(r.out).toMatch(note);
    const plain = await run('table', '--window', WINDOW, '--out', path.join(dir, 'plain.csv'));
    expect(plain.out).not.toMatch(/Stamps stay/);
    // The sheets of the workbook, built in memory from the same window.
    for (const [spec, expected] of [[readWindowFile(file).spec, true], [readWindowFile(WINDOW).spec, false]] as const) {
      const series = annualSeries(spec);
      const wb = new ExcelJS.Workbook();
      const placement = addHourlySheet(wb, 'Hourly', 'Hourly', series);
      addHeatMapSheet(wb, 'Heat map', series, 'heat map');
      addMonthlySheet(wb.addWorksheet('Monthly'), 'Monthly', summarizeAnnual(series), { sheet: 'Hourly', placement, series });
      for (const ws of wb.worksheets) {
        const lines = [2, 3].map((row) => String(ws.getCell(row, 1).value ?? ''));
        expect([ws.name, lines.some((l) => /Stamps stay in local standard time all year: the window's rule \(daylight saving \+1 h/.test(l))]).toEqual([ws.name, expected]);
      }
    }
  });

  it('reads hourly weather by column name and writes a workbook with hourly, monthly and heat-map sheets', async () => {
    const dir = tempDir();
    const out = path.join(dir, 'east.xlsx');
    const r = await run('table', '--window', WINDOW, ...WEATHER_FLAGS, '--out', out);
    expect(r.code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Contents', 'Monthly', 'Heat map', 'Hourly']);
    expect(contentsMisaligned(wb)).toEqual([]);
    const hourly = wb.getWorksheet('Hourly')!;
    // Title, note, caution, a blank row, then the table: header in row 5, the hour ending 01:00 in row 6.
    expect(hourly.rowCount).toBe(5 + 8760);
    expect(hourly.getCell('G16').value).toBe(311.7); // direct normal in the hour ending 2026-01-01 11:00 (weather file line 13)
    // The caution on every sheet and at the end of the printed summary.
    expect(sheetsWithoutCaution(wb)).toEqual([]);
    expect(r.out.split('\n').at(-1)).toBe(CAUTION);
    expect(fs.readdirSync(dir)).toEqual(['east.xlsx']);
  });

  it('marks garbled and blank weather values missing, names their lines, and keeps going', async () => {
    const dir = tempDir();
    const lines = weatherLines();
    lines[12] = '2026-01-01T11:00,oops,67.1';
    lines[13] = '2026-01-01T12:00,,77.1';
    const weather = writeTemp(dir, 'w.csv', lines.join('\n'));
    const out = path.join(dir, 'east.csv');
    const r = await run('table', '--window', WINDOW, '--weather', weather, '--dni', '2', '--dhi', '3', '--out', out);
    expect(r.code).toBe(0);
    expect(r.err).toBe(
      `${weather}: 2 of 8760 hours cannot be used (0.02 %), within the 1 % allowed; their gain is left out of the totals:\n  2 values that are not numbers: line 13 direct normal "oops"; line 14 direct normal (blank)`,
    );
    expect(r.out).toMatch(/2 hours missing \(not in the total\)/);
    const rows = fs.readFileSync(out, 'utf8').split('\n');
    expect(rows[11].split(',').at(-1)).toBe('1');
    expect(rows[12].split(',').at(-1)).toBe('1');
    expect(rows[13].split(',').at(-1)).toBe('0');
  });

  it('places the rows of a weather file by their stamps: a row left out is an hour reported and left out of the totals', async () => {
    const dir = tempDir();
    const lines = weatherLines();
    lines.splice(500, 1); // line 501: the hour ending 2026-01-21T19:00
    const weather = writeTemp(dir, 'short.csv', lines.join('\n'));
    const out = path.join(dir, 'x.csv');
    const r = await run('table', '--window', WINDOW, '--weather', weather, '--dni', '2', '--dhi', '3', '--out', out);
    expect(r.code).toBe(0);
    expect(r.err).toBe(`${weather}: 1 of 8760 hours cannot be used (0.01 %), within the 1 % allowed; their gain is left out of the totals:\n  1 hour with no row: hour ending 2026-01-21T19:00`);
    const rows = fs.readFileSync(out, 'utf8').split('\n');
    expect(rows[499].split(',')[0]).toBe('2026-01-21T19:00');
    expect(rows[499].split(',').at(-1)).toBe('1');
    const inOrder = await run('table', '--window', WINDOW, '--weather', weather, '--dni', '2', '--dhi', '3', '--time', 'none', '--out', path.join(dir, 'y.csv'));
    expect(inOrder.code).toBe(1);
    expect(inOrder.err).toMatch(/short\.csv cannot be used: expected 8760 hourly rows for 2026 .*found 8759/);
    expect(fs.readdirSync(dir).sort()).toEqual(['short.csv', 'x.csv']);
  });

  it("refuses a weather file for another year than the window's, saying which year it is for", async () => {
    const dir = tempDir();
    const json = JSON.parse(fs.readFileSync(WINDOW, 'utf8'));
    const window = writeTemp(dir, 'w.json', JSON.stringify({ ...json, year: 2028 }));
    const r = await run('table', '--window', window, ...WEATHER_FLAGS, '--out', path.join(dir, 'x.csv'));
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/cannot be used: no row could be placed in 2028 by its stamp \(the stamps are for 2026: set the window's year to 2026, or, if the file is a typical year, say so \(--typical-year\)\)/);
    const typical = await run('table', '--window', window, ...WEATHER_FLAGS, '--typical-year', '--out', path.join(dir, 'y.csv'));
    expect(typical.code).toBe(0);
    expect(typical.err).toMatch(/a typical year fitted to leap year 2028: 29 February repeats 28 February's hours/);
    expect(typical.err).toMatch(/stamps of a typical year \(2026–2027\) read by month, day and hour as 2028/);
  });

  it.each([
    [{ shgc: undefined }, /^sunpane: shgc = blank is not allowed: it is required and must be a number from 0 to 1/],
    [{ width: -1 }, /^sunpane: width = -1 is not allowed: must be a number from 0\.01 to 100 m/],
    [{ overhangProjecton: 0.5 }, /^sunpane: overhangProjecton = 0\.5 is not allowed: no window field has this name \(did you mean overhangProjection\?\)/],
    [{ shading: { overhang: { projecton: 0.5 } } }, /^sunpane: shading\.overhang\.projecton = 0\.5 is not allowed: is not a field of shading\.overhang/],
    [{ latitude: 95 }, /^sunpane: latitude = 95 is not allowed: must be a number from -90 to 90/],
    [{ linkeTurbidity: undefined }, /has no clear sky of its own/],
  ])('refuses a bad window file with exit code 1 naming the field (%#)', async (change, message) => {
    const dir = tempDir();
    const json = { ...JSON.parse(fs.readFileSync(WINDOW, 'utf8')), ...change };
    const r = await run('table', '--window', writeTemp(dir, 'w.json', JSON.stringify(json)), '--out', path.join(dir, 'x.csv'));
    expect(r.code).toBe(1);
    expect(r.err).toMatch(message);
  });

  it('refuses a window file that is not JSON', async () => {
    const dir = tempDir();
    const r = await run('table', '--window', writeTemp(dir, 'w.json', '{"name": '), '--out', path.join(dir, 'x.csv'));
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/w\.json is not valid JSON/);
  });

  it('refuses an unwritable output path with exit code 1 and leaves no partial file', async () => {
    const dir = tempDir();
    const missing = path.join(dir, 'no', 'such', 'annual.xlsx');
    const r1 = await run('table', '--window', WINDOW, '--out', missing);
    expect(r1.code).toBe(1);
    expect(r1.err).toBe(`sunpane: cannot write ${missing}: the folder does not exist`);
    fs.writeFileSync(path.join(dir, 'file'), 'x');
    const r2 = await run('table', '--window', WINDOW, '--out', path.join(dir, 'file', 'annual.csv'));
    expect(r2.code).toBe(1);
    expect(r2.err).toMatch(/a part of the path is not a folder/);
    expect(fs.readdirSync(dir)).toEqual(['file']);
  });

  it.each([
    [['--window', 'w.json'], /--out FILE\.xlsx\|FILE\.csv \(where to write\) is required/],
    [['--out', 'x.csv'], /--window FILE\.json \(the window\) is required/],
    [['--window', 'w.json', '--out', 'x.txt'], /must end in \.csv or \.xlsx/],
    [['--window', 'w.json', '--out', 'x.csv', '--colour', 'red'], /unknown flag --colour/],
    [['--window', 'w.json', '--out', 'x.csv', '--dni', '2'], /--dni is about a --weather file: give --weather FILE\.csv too/],
    [['--window', 'w.json', '--out', 'x.csv', '--weather', 'w.csv', '--dni', '2'], /--dni and --dhi go together/],
    [['--window', 'w.json', '--out', 'x.csv', '--weather', 'w.csv', '--dhi', '3', '--ghi', '4'], /--dni and --dhi go together \(with --ghi as well to check them\), or give --ghi alone/],
    [['--window', 'w.json', '--out', 'x.csv', '--weather', 'w.csv'], /--weather needs its columns/],
    [['--window', 'w.json', '--out', 'x.csv', '--weather', 'w.csv', '--ghi', '2', '--units', 'MJ/m2'], /--units MJ\/m2: must be W\/m2, Wh\/m2 or kJ\/m2/],
    [['--window', 'w.json', '--out', 'x.csv', '--weather', 'w.csv', '--ghi', '2', '--max-unusable', '120'], /--max-unusable 120: must be a percentage from 0 to 100/],
    [['--window', 'w.json', '--out', 'x.csv', '--typical-year'], /--typical-year is about a --weather file/],
    [['stray'], /unexpected argument "stray"/],
  ])('answers wrong usage with exit code 2 and the usage line (%#)', async (args, message) => {
    const r = await run('table', ...args);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
    expect(r.err).toMatch(/usage: sunpane table --window/);
  });
});

describe('sunpane schedule', () => {
  it('summarises the example schedule as saved CSV', async () => {
    const dir = tempDir();
    const out = path.join(dir, 'summary.csv');
    const r = await run('schedule', '--in', SCHEDULE, '--out', out);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^4 windows: \d+\.\d kWh of solar gain a year in all\nwrote /);
    expectSaved('schedule-example.csv.txt', fs.readFileSync(out, 'utf8'));
  });

  it('reads a workbook schedule and writes a workbook with SUM/MAX totals', async () => {
    const dir = tempDir();
    const input = new ExcelJS.Workbook();
    const ws = input.addWorksheet('Windows');
    ws.addRow(['Name', 'latitude', 'longitude', 'utcOffset', 'year', 'surfaceAzimuth', 'width', 'height', 'shgc', 'tauB', 'tauD']);
    ws.addRow(['Lab east', 40, -105, -7, 2026, 90, 1.5, 1.2, 0.4, 0.4, 2.3]);
    ws.addRow(['Lab west', 40, -105, -7, 2026, 270, 1.5, 1.2, 0.4, 0.4, 2.3]);
    await input.xlsx.writeFile(path.join(dir, 'in.xlsx'));
    const out = path.join(dir, 'out.xlsx');
    const r = await run('schedule', '--in', path.join(dir, 'in.xlsx'), '--out', out);
    expect(r.code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(out);
    const sheet = wb.getWorksheet('Summary')!;
    expect(sheet.getTables().length).toBe(1);
    // Title, caution, a blank row; the table's header in row 4, the windows in rows 5 and 6.
    const total = sheet.getCell('E7').value as ExcelJS.CellFormulaValue;
    expect(total.formula).toBe('SUM(E5:E6)');
    const e2 = sheet.getCell('E5').value as number;
    const e3 = sheet.getCell('E6').value as number;
    expect(total.result).toBeCloseTo(e2 + e3, 9);
    // The caution on every sheet and at the end of the printed summary.
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Contents', 'Summary']);
    expect(contentsMisaligned(wb)).toEqual([]);
    expect(sheetsWithoutCaution(wb)).toEqual([]);
    expect(r.out.split('\n').at(-1)).toBe(CAUTION);
  });

  it('names the line, window and column of a row with a required field missing', async () => {
    const dir = tempDir();
    const text = fs.readFileSync(SCHEDULE, 'utf8').replace('East meeting room,brackwater,2026,90,1.8,', 'East meeting room,brackwater,2026,90,,');
    const input = writeTemp(dir, 'windows.csv', text);
    const r = await run('schedule', '--in', input, '--out', path.join(dir, 'out.csv'));
    expect(r.code).toBe(1);
    expect(r.err).toBe(`sunpane: ${input} line 4 ("East meeting room"), column "Width [m]" = blank is not allowed: it is required and must be a number from 0.01 to 100 m`);
    expect(fs.readdirSync(dir)).toEqual(['windows.csv']);
  });

  it('names the line and column of a value out of range or not a number, and an unknown column', async () => {
    const dir = tempDir();
    const base = fs.readFileSync(SCHEDULE, 'utf8');
    const r1 = await run('schedule', '--in', writeTemp(dir, 'a.csv', base.replace(',0.5,2,,,,0.15', ',1.5,2,,,,0.15')), '--out', path.join(dir, 'o.csv'));
    expect(r1.code).toBe(1);
    expect(r1.err).toMatch(/a\.csv line 6 \("North studio"\), column "SHGC" = 1\.5 is not allowed: must be a number from 0 to 1$/);
    const r2 = await run('schedule', '--in', writeTemp(dir, 'b.csv', base.replace('South office,brackwater,2026,180,3.0', 'South office,brackwater,2026,south,3.0')), '--out', path.join(dir, 'o.csv'));
    expect(r2.err).toMatch(/b\.csv line 3 \("South office"\), column "Surface azimuth \[°\]" = "south" is not allowed: must be a number from 0 to 360 °$/);
    const r3 = await run('schedule', '--in', writeTemp(dir, 'c.csv', base.replace('Panes,', 'Pains,')), '--out', path.join(dir, 'o.csv'));
    expect(r3.err).toMatch(/c\.csv line 2: unknown column "Pains"/);
  });

  it('applies one hourly weather file to every window', async () => {
    const dir = tempDir();
    const out = path.join(dir, 'summary.csv');
    const r = await run('schedule', '--in', SCHEDULE, ...WEATHER_FLAGS, '--out', out);
    expect(r.code).toBe(0);
    const clear = await run('schedule', '--in', SCHEDULE, '--out', path.join(dir, 'clear.csv'));
    const total = (t: string) => Number(/: (\d+\.\d) kWh/.exec(t)![1]);
    expect(total(r.out)).toBeLessThan(total(clear.out));
  });
});

describe('the installed command', () => {
  it('exits with 0, 1 and 2 as a process for success, bad input and wrong usage', () => {
    const bin = path.join(ROOT, 'bin', 'sunpane.js');
    if (!fs.existsSync(path.join(ROOT, 'lib', 'cli', 'main.js'))) throw new Error('lib/ is not built: run npm run build:cli first');
    const dir = tempDir();
    const ok = spawnSync(process.execPath, [bin, 'schedule', '--help'], { encoding: 'utf8' });
    const bad = spawnSync(process.execPath, [bin, 'table', '--window', path.join(dir, 'none.json'), '--out', path.join(dir, 'x.csv')], { encoding: 'utf8' });
    const usage = spawnSync(process.execPath, [bin, 'table', '--bogus'], { encoding: 'utf8' });
    expect([ok.status, bad.status, usage.status]).toEqual([0, 1, 2]);
    expect(bad.stderr).toMatch(/cannot read the window file .*none\.json: the folder does not exist/);
  });
});

describe('help by name', () => {
  it('prints a command\'s help for `sunpane help COMMAND`', async () => {
    const r = await run('help', 'schedule');
    expect(r.code).toBe(0);
    expect(r.out.startsWith('usage: sunpane schedule')).toBe(true);
  });

  it('asks for a site when a schedule row has neither an example site nor coordinates', async () => {
    const dir = tempDir();
    const input = writeTemp(dir, 'w.csv', 'name,year,surfaceAzimuth,width,height,shgc,linkeTurbidity\nLone,2026,180,1,1,0.4,3\n');
    const r = await run('schedule', '--in', input, '--out', path.join(dir, 'o.csv'));
    expect(r.code).toBe(1);
    expect(r.err).toBe(`sunpane: ${input} line 2 ("Lone"), column "Latitude [°]" = blank is not allowed: it is required and must be a number from -90 to 90 ° (or give an example site)`);
  });
});
