/**
 * `--date-system 1904`: the command line's workbooks in Excel's 1904 date system (ECMA-376 Part 1,
 * §18.17.4.1 date systems: serial 0 is 1 January 1904, so a date-time's serial is 1462 less than in
 * the 1900 system — the worksheet functions' dateSystem, docs/conventions.md). The same year written
 * both ways: the workbook part says date1904, every date-time cell and every cached date-time result
 * is exactly 1462 lower, and every other cell is the same. The files are read as stored (the XML
 * parts), not through a reader that converts dates. LibreOffice's own recalculation of the 1904 file
 * is checked in tests/libreoffice/tableLoad.test.ts. Window and schedule: invented test inputs.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { type StoredWorkbook, storedDifferences, storedWorkbook } from '../support/storedXlsx';
import { EXAMPLES, run, tempDir } from './run';

/** The cells that differ between the two files, as [sheet!address, value in a, value in b]; the formulas must be the same. */
function differences(a: StoredWorkbook, b: StoredWorkbook): [string, string | undefined, string | undefined][] {
  return storedDifferences(a, b).map((d) => {
    expect(d.fb).toBe(d.fa);
    return [d.at, d.a, d.b];
  });
}
const stored = storedWorkbook;

const WINDOW = {
  name: 'SW office', year: 2026, latitude: 40, longitude: -105, utcOffset: -7, elevation: 1600, surfaceAzimuth: 225, width: 2, height: 1.5, shgc: 0.5,
  uValue: 2.8, indoorTemperature: 24, tauB: 0.4, tauD: 2.3, dryBulbMax: 33, dailyRange: 12, roomConstruction: 'medium',
};

describe('--date-system 1904: workbooks in the 1904 date system', () => {
  test('table: the same year both ways; date-times 1462 days lower as serials, everything else the same', async () => {
    const dir = tempDir();
    const json = path.join(dir, 'w.json');
    fs.writeFileSync(json, JSON.stringify(WINDOW));
    const a = await run('table', '--window', json, '--out', path.join(dir, 'a.xlsx'));
    const b = await run('table', '--window', json, '--out', path.join(dir, 'b.xlsx'), '--date-system', '1904');
    expect([a.code, b.code, b.err]).toEqual([0, 0, '']);
    expect(b.out).toBe(a.out.replace('a.xlsx', 'b.xlsx'));
    const x = await stored(path.join(dir, 'a.xlsx'));
    const y = await stored(path.join(dir, 'b.xlsx'));
    expect(x.workbook).not.toMatch(/date1904/);
    expect(y.workbook).toMatch(/<workbookPr[^>]*date1904="1"/);
    const diff = differences(x, y);
    // Every difference is a date-time exactly 1462 days lower: the hourly stamps, the heat map's days, the months' peak-load hours.
    const off = diff.filter(([, u, v]) => Math.abs(Number(u) - Number(v) - 1462) > 1e-9);
    expect(off).toEqual([]);
    const by = (sheet: string) => diff.filter(([at]) => at.startsWith(`${sheet}!`)).length;
    expect(by('Hourly')).toBe(8760);
    expect(by('Heat map')).toBe(365);
    expect(by('Monthly')).toBe(13); // 12 months' peak-load hours and the year's
    // The first hour, 2026-01-01 01:00: serial 46023 + 1/24 in the 1900 system, 44561 + 1/24 in the 1904 system.
    const first = diff.find(([at]) => at.startsWith('Hourly!'))!;
    expect(Number(first[1])).toBeCloseTo(46023 + 1 / 24, 6);
    expect(Number(first[2])).toBeCloseTo(44561 + 1 / 24, 6);
    fs.rmSync(dir, { recursive: true, force: true });
  });

  test('schedule: the whole and the streamed workbook both ways; the peak hours 1462 days lower', async () => {
    const dir = tempDir();
    const schedule = path.join(EXAMPLES, 'windows.csv');
    const a = await run('schedule', '--in', schedule, '--out', path.join(dir, 'a.xlsx'));
    const b = await run('schedule', '--in', schedule, '--out', path.join(dir, 'b.xlsx'), '--date-system', '1904');
    expect([a.code, b.code]).toEqual([0, 0]);
    const x = await stored(path.join(dir, 'a.xlsx'));
    const y = await stored(path.join(dir, 'b.xlsx'));
    expect(y.workbook).toMatch(/<workbookPr[^>]*date1904="1"/);
    const diff = differences(x, y);
    expect(diff.length).toBeGreaterThan(0);
    expect(diff.filter(([, u, v]) => Math.abs(Number(u) - Number(v) - 1462) > 1e-9)).toEqual([]);

    // The streamed writer (schedules above 1,000 windows), run directly on two windows.
    const { xlsxSummaryWriter, summaryExtrasOf } = await import('../../src/cli/scheduleOutput');
    const { windowResult } = await import('../../src/cli/schedule');
    const { baseSpec } = await import('../core/gain/gainFixtures');
    const results = [windowResult(baseSpec({ name: 'A' })), windowResult({ ...baseSpec({ name: 'B', room: { construction: 'light' } }), timeConvention: 'instant' })];
    const extras = summaryExtrasOf(results.map((r) => r.spec));
    for (const [file, system] of [['s1900.xlsx', 1900], ['s1904.xlsx', 1904]] as const) {
      const w = xlsxSummaryWriter(path.join(dir, file), { force: false }, 'T', 'test', extras, system);
      for (const r of results) await w.add(r);
      await w.finish();
    }
    const s = await stored(path.join(dir, 's1900.xlsx'));
    const t = await stored(path.join(dir, 's1904.xlsx'));
    expect(s.workbook).not.toMatch(/date1904/);
    expect(t.workbook).toMatch(/<workbookPr[^>]*date1904="1"/);
    const streamed = differences(s, t);
    expect(streamed.map(([at]) => at)).toEqual(['Summary!G5', 'Summary!G6', 'Summary!M6']); // the two peak hours and B's peak-load hour (after the Time convention column)
    expect(streamed.filter(([, u, v]) => Math.abs(Number(u) - Number(v) - 1462) > 1e-9)).toEqual([]);
    // … and the date format stays on the number cells
    expect(t.sheets.get('Summary')!.get('G5')!.s).toBe(s.sheets.get('Summary')!.get('G5')!.s);
    fs.rmSync(dir, { recursive: true, force: true });
  });

  test('--help lists the option; a bad value names the flag, the value and the allowed values; a CSV refuses 1904', async () => {
    for (const command of ['table', 'schedule']) {
      const help = await run(command, '--help');
      expect(help.out).toMatch(/--date-system 1900\|1904\n +the workbook's date system \(glossary field dateSystem; default 1900\): 1904 writes\n/);
    }
    const dir = tempDir();
    const bad = await run('table', '--window', path.join(EXAMPLES, 'east-office.json'), '--out', path.join(dir, 'o.xlsx'), '--date-system', '1905');
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/^sunpane: --date-system "1905" is not allowed: must be 1900 .* or 1904 .*\(allowed: 1900, 1904\)/);
    const csv = await run('schedule', '--in', path.join(EXAMPLES, 'windows.csv'), '--out', path.join(dir, 'o.csv'), '--date-system', '1904');
    expect(csv.code).toBe(2);
    expect(csv.err).toMatch(/--date-system 1904 applies to a workbook \(\.xlsx\)/);
    expect(fs.readdirSync(dir)).toEqual([]);
    fs.rmSync(dir, { recursive: true, force: true });
  });
});
