/**
 * The pane in a 1904 workbook, in node against the Excel stand-in (tests/browser/excel-host.js): it
 * asks Excel's DATE(1904, 1, 1) — 0 in a 1904 workbook, 1462 in a 1900 one (the Office JavaScript API
 * reference, Excel.Functions.date; the offset is checked against ECMA-376 in
 * tests/reference/ecma-376-date-systems.test.ts) — reads serial stamps and schedule date-times in
 * that system and writes date-time cells in it. The browser test runs the whole pane both ways.
 */
import type { WindowSpec } from '../../src/core/gain/window';
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { civilToSerial } from '../../src/core/time/calendar';
import { dateSystemOf, isDateFormat, rowsInDateSystem, workbookDateSystem } from '../../src/taskpane/dateSystem';
import { initialValues } from '../../src/taskpane/fields';
import type { RunBatch } from '../../src/taskpane/resultSheets';
import { readSchedule } from '../../src/taskpane/schedule';
import { weatherTableFromRanges } from '../../src/taskpane/weather';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost } = require('../browser/excel-host.js');

function runIn(options: { dateSystem?: 1904 } = {}): RunBatch {
  const { Excel } = createExcelHost(options);
  return (batch) => Excel.run(batch);
}

describe("the workbook's date system", () => {
  test('DATE(1904,1,1) answers 0 in a 1904 workbook and 1462 in a 1900 one; the pane reads that', async () => {
    expect(await workbookDateSystem(runIn({ dateSystem: 1904 }))).toBe(1904);
    expect(await workbookDateSystem(runIn())).toBe(1900);
    expect(dateSystemOf(0)).toBe(1904);
    expect(dateSystemOf(1462)).toBe(1900);
    expect(dateSystemOf(undefined)).toBe(1900);
    const { Excel } = createExcelHost();
    const answer = await Excel.run(async (ctx: Excel.RequestContext) => {
      const d = ctx.workbook.functions.date(1904, 1, 1);
      d.load('value');
      await ctx.sync();
      return d.value;
    });
    expect(answer).toBe(civilToSerial(1904, 1, 1));
  });

  test('a host without worksheet functions is taken as the default 1900 system', async () => {
    const run: RunBatch = (batch) => batch({ workbook: {} } as never);
    expect(await workbookDateSystem(run)).toBe(1900);
  });

  test('only the cells whose format shows a date move 1462 days in a 1904 workbook', () => {
    expect(isDateFormat('yyyy-mm-dd hh:mm')).toBe(true);
    expect(isDateFormat('#,##0')).toBe(false);
    expect(isDateFormat('@')).toBe(false);
    const rows = [['A', 46000.5, 12.5]];
    expect(rowsInDateSystem(rows, ['@', 'yyyy-mm-dd hh:mm', '0.0'], 1904)).toEqual([['A', 44538.5, 12.5]]);
    expect(rowsInDateSystem(rows, ['@', 'yyyy-mm-dd hh:mm', '0.0'], 1900)).toEqual(rows);
  });

  test('serial weather stamps of a 1904 workbook are read as the same instants; text stamps as they are', () => {
    const t = civilToSerial(2025, 1, 1, 1);
    const table = weatherTableFromRanges({
      columns: { dni: { address: 'W!B1:B2', topRow: 1, values: [[500], [600]] }, dhi: { address: 'W!C1:C2', topRow: 1, values: [[50], [60]] } },
      stamps: { address: 'W!A1:A2', topRow: 1, values: [[t - 1462], ['2025-01-01T02:00']] },
      dateSystem: 1904,
    });
    expect(table.stamps!.cells).toEqual([t, '2025-01-01T02:00']);
  });

  test("a schedule's date-time cells are read in the workbook's system; a date-system column must name it", () => {
    const validate = (s: WindowSpec) => void validateWindowSpec(s);
    const form = { ...initialValues(), year: '2025' };
    const start = civilToSerial(2025, 3, 30, 2);
    const end = civilToSerial(2025, 10, 26, 3);
    const head = ['Window', 'Faces', 'Width', 'Height', 'Daylight saving start', 'Daylight saving end'];
    const in1904 = readSchedule([head, ['S1', 180, 1.2, 1.4, start - 1462, end - 1462]], form, validate, {}, 1904);
    expect(in1904.problems).toEqual([]);
    expect(in1904.rows[0].spec.site.daylightSaving).toMatchObject({ start, end });
    const clash = readSchedule([[...head, 'Date system'], ['S1', 180, 1.2, 1.4, start, end, 1900]], form, validate, {}, 1904);
    expect(clash.problems.map((p) => p.message)).toEqual([expect.stringMatching(/^Row 1 \(S1\), column "Date system": Date system = 1900 is not allowed: must be this workbook's date system, 1904/)]);
  });

  test("in a 1904 workbook a schedule row without its own rule takes the form's rule, its box serials read in 1904", () => {
    const validate = (s: WindowSpec) => void validateWindowSpec(s);
    const form = { ...initialValues(), year: '2025' };
    // ECMA-376 Part 1, §18.17.4.1: the 1904 system's serial of a date-time is the 1900 system's less 1462.
    const start = civilToSerial(2025, 3, 30, 2);
    const end = civilToSerial(2025, 10, 26, 3);
    const boxes = { ...form, daylightSavingStart: String(start - 1462), daylightSavingEnd: String(end - 1462) };
    const read = readSchedule([['Window', 'Faces', 'Width', 'Height'], ['S1', 180, 1.2, 1.4]], boxes, validate, {}, 1904);
    expect(read.problems).toEqual([]);
    expect(read.rows[0].spec.site.daylightSaving).toEqual({ start, end, shift: 1 });
  });
});
