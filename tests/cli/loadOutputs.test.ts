/**
 * The command line's outputs with the conduction gain and the cooling load: the hourly CSV of
 * `table`, its summary line, and the schedule's summary columns. Window numbers are invented test
 * inputs; the values are held to the core (checked in tests/core/load and tests/core/gain).
 */
import { annualSeries } from '../../src/core/gain/annual';
import { annualLoadParts, loadPeak } from '../../src/core/load/room';
import { illustrativeRadiantTimeSeries } from '../../src/core/load/rtsSeries';
import { summarizeAnnual } from '../../src/core/gain/annualSummary';
import { hourlyCsv } from '../../src/cli/annualSheets';
import { tableSummaryLine } from '../../src/cli/table';
import { SUMMARY_HEADERS, summaryCsv, summaryHeaders, windowResult } from '../../src/cli/schedule';
import { summaryExtrasOf } from '../../src/cli/scheduleOutput';
import { parseCsv } from '../../src/cli/csv';
import { formatSerialIso } from '../../src/core/time';

/** The CSV's rows as lists of cells. */
const cells = (text: string): string[][] => parseCsv(text).map((r) => r.fields);
import { baseSpec } from '../core/gain/gainFixtures';

const withConduction = baseSpec({
  name: 'Loaded',
  glazing: { shgc: 0.6, panes: 2, uValue: 2 },
  indoorTemperature: 24,
  weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [30], dailyRange: [10] },
});
const withRoom = { ...withConduction, room: { construction: 'medium' } };

describe('table: conduction and cooling load beside the solar gain', () => {
  test('the CSV has the conduction and load columns after the solar gain, with the core values', () => {
    const series = annualSeries(withRoom);
    const load = annualLoadParts(series, illustrativeRadiantTimeSeries('medium')).total;
    const rows = cells(hourlyCsv(series, undefined, load));
    expect(rows[0].slice(12)).toEqual(['Solar gain (W)', 'Conduction gain (W)', 'Cooling load (W)', 'Weather missing (1 = yes)']);
    expect(Number(rows[4817][13])).toBeCloseTo(series.conduction[4816], 2);
    expect(Number(rows[4817][14])).toBeCloseTo(load[4816], 2);
  });

  test('a window without a U-value or a room keeps the columns as before', () => {
    const rows = cells(hourlyCsv(annualSeries(baseSpec())));
    expect(rows[0]).toHaveLength(14);
    expect(rows[0]).not.toContain('Conduction gain (W)');
  });

  test('the summary line names the peak cooling load and its hour', () => {
    const series = annualSeries(withRoom);
    const load = annualLoadParts(series, illustrativeRadiantTimeSeries('medium')).total;
    const peak = loadPeak(series, load);
    const line = tableSummaryLine(series, summarizeAnnual(series), peak);
    expect(line).toMatch(new RegExp(`peak cooling load ${Math.round(peak.peakLoadW)} W in the hour ending \\d{4}-\\d\\d-\\d\\dT\\d\\d:00`));
  });
});

describe('schedule: conduction and peak load columns when a window has them', () => {
  test('the extra columns come before the months; a window without a U-value leaves them blank, one without a room says so', () => {
    const results = [windowResult(withRoom), windowResult(baseSpec({ name: 'Plain' }))];
    const headers = summaryHeaders(summaryExtrasOf(results.map((r) => r.spec)));
    const at = headers.indexOf('Weather missing (h)') + 1;
    expect(headers.slice(at, at + 4)).toEqual(['Conduction, year (kWh)', 'Peak conduction (W)', 'Peak cooling load (W)', 'Peak load hour ending']);
    const rows = cells(summaryCsv(results));
    expect(rows[0]).toEqual(headers);
    const series = annualSeries(withRoom);
    const conductionKWh = Array.from(series.conduction).reduce((a, b) => a + b, 0) / 1000;
    expect(Number(rows[1][at])).toBeCloseTo(conductionKWh, 3);
    expect(Number(rows[1][at + 2])).toBeCloseTo(results[0].load!.peakLoadW, 2);
    // No U-value: blank conduction; no room: the pane's words in the load cell (LOAD_WORDS.noRoom), blank hour.
    expect(rows[2].slice(at, at + 4)).toEqual(['', '', 'no room given — gains only', '']);
  });

  test('windows with neither keep the summary as it was', () => {
    expect(summaryHeaders(summaryExtrasOf([baseSpec()]))).toEqual([...SUMMARY_HEADERS]);
  });
});

describe('the streamed schedule workbook with the extra columns', () => {
  test('headers, the no-room words for the window without a room, and the MAX of the peak loads in the totals row', async () => {
    const fs = await import('node:fs');
    const os = await import('node:os');
    const path = await import('node:path');
    const ExcelJS = (await import('exceljs')).default;
    const { xlsxSummaryWriter } = await import('../../src/cli/scheduleOutput');
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-load-'));
    const target = path.join(dir, 'summary.xlsx');
    const results = [windowResult(withRoom), windowResult(baseSpec({ name: 'Plain' }))];
    const extras = summaryExtrasOf(results.map((r) => r.spec));
    const w = xlsxSummaryWriter(target, { force: false }, 'T', 'test', extras);
    for (const r of results) await w.add(r);
    await w.finish();
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(target);
    const ws = wb.getWorksheet('Summary')!;
    const headers = (ws.getRow(4).values as unknown[]).slice(1);
    expect(headers).toEqual(summaryHeaders(extras));
    const col = headers.indexOf('Peak cooling load (W)') + 1;
    expect(ws.getRow(5).getCell(col).value).toBeCloseTo(results[0].load!.peakLoadW, 9);
    expect(ws.getRow(6).getCell(col).value).toBe('no room given — gains only');
    expect(ws.getRow(6).getCell(col + 1).value).toBeNull();
    const total = ws.getRow(7).getCell(col).value as { formula: string; result: number };
    expect(total.formula).toMatch(/^MAX\(/);
    expect(total.result).toBeCloseTo(results[0].load!.peakLoadW, 9);
    fs.rmSync(dir, { recursive: true, force: true });
  });
});

describe('schedule headers follow the windows\' time convention', () => {
  const instantRoom = { ...withRoom, name: 'Instant', timeConvention: 'instant' as const };
  const csvHeaders = (results: ReturnType<typeof windowResult>[]) => cells(summaryCsv(results))[0];

  test('hour-ending windows: "Peak hour ending" and "Peak load hour ending"; instant windows: "Peak at (instant)" and "Peak load at (instant)"', () => {
    const ending = csvHeaders([windowResult(withRoom)]);
    expect(ending[6]).toBe('Peak hour ending');
    expect(ending).toContain('Peak load hour ending');
    expect(ending.join('|')).not.toMatch(/instant/);
    const instant = windowResult(instantRoom);
    const rows = cells(summaryCsv([instant]));
    expect(rows[0][6]).toBe('Peak at (instant)');
    expect(rows[0]).toContain('Peak load at (instant)');
    expect(rows[0].join('|')).not.toMatch(/hour ending/);
    // The instant row's stamps are at the top of an hour (the instant itself), as the core gives them.
    expect(rows[1][6]).toBe(formatSerialIso(instant.summary.peakStamp));
    expect(rows[1][rows[0].indexOf('Peak load at (instant)')]).toBe(formatSerialIso(instant.load!.peakLoadStamp));
  });

  test('windows that differ: both words in the headers and a Time convention column saying each window\'s', () => {
    const results = [windowResult(withRoom), windowResult(instantRoom)];
    const rows = cells(summaryCsv(results));
    expect(rows[0][6]).toBe('Peak at (hour ending or instant: see Time convention)');
    const at = rows[0].indexOf('Time convention');
    expect(at).toBe(rows[0].indexOf('Weather missing (h)') + 1);
    expect(rows.slice(1).map((r) => r[at])).toEqual(['hourEnding', 'instant']);
    expect(rows[0]).toContain('Peak load at (hour ending or instant: see Time convention)');
  });

  test('the streamed and the whole workbook write the same headers as the CSV', async () => {
    const fs = await import('node:fs');
    const os = await import('node:os');
    const path = await import('node:path');
    const ExcelJS = (await import('exceljs')).default;
    const { xlsxSummaryWriter } = await import('../../src/cli/scheduleOutput');
    const { addSummaryTable } = await import('../../src/cli/schedule');
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-conv-'));
    for (const results of [[windowResult(instantRoom)], [windowResult(withRoom), windowResult({ ...baseSpec({ name: 'Plain instant' }), timeConvention: 'instant' as const })]]) {
      const extras = summaryExtrasOf(results.map((r) => r.spec));
      const target = path.join(dir, `s${results.length}.xlsx`);
      const w = xlsxSummaryWriter(target, { force: false }, 'T', 'test', extras);
      for (const r of results) await w.add(r);
      await w.finish();
      const wb = new ExcelJS.Workbook();
      await wb.xlsx.readFile(target);
      const streamed = (wb.getWorksheet('Summary')!.getRow(4).values as unknown[]).slice(1);
      expect(streamed).toEqual(csvHeaders(results));
      const whole = new ExcelJS.Workbook().addWorksheet('Summary');
      addSummaryTable(whole, 'S', 4, results);
      expect((whole.getRow(4).values as unknown[]).slice(1)).toEqual(csvHeaders(results));
    }
    expect(csvHeaders([windowResult(instantRoom)])[6]).toBe('Peak at (instant)');
    fs.rmSync(dir, { recursive: true, force: true });
  });
});
