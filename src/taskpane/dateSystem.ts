/**
 * The workbook's date system, as the pane finds it and writes in it. Excel keeps serial date-times
 * in one of two systems per workbook (docs/conventions.md, "The clock"): the 1900 system (the
 * default) or the 1904 system, where serial 0 is 1 January 1904. The Excel JavaScript API has no
 * property for it, but the worksheet DATE function answers in the workbook's own system:
 * DATE(1904, 1, 1) is 0 in a 1904 workbook and 1462 in a 1900 one (Excel.Functions.date, ExcelApi
 * 1.2; docs/platform.md, "The workbook's date system").
 */
import { type DateSystem, fromSerial1900, toSerial1900 } from '../core/time';
import type { RunBatch } from './resultSheets';

/**
 * The date system DATE(1904, 1, 1) says the workbook keeps: 0 → 1904; anything else (1462, or no
 * answer) → 1900, the default.
 */
export function dateSystemOf(date19040101: unknown): DateSystem {
  return date19040101 === 0 ? 1904 : 1900;
}

/**
 * Asks Excel for the workbook's date system (one small request).
 * @returns 1904 when DATE(1904, 1, 1) is 0, else 1900 (also where the host has no worksheet
 *   functions, which ExcelApi 1.2 and every later host have)
 */
export async function workbookDateSystem(run: RunBatch): Promise<DateSystem> {
  return run(async (ctx) => {
    const functions = (ctx.workbook as { functions?: Excel.Functions }).functions;
    if (functions === undefined || typeof functions.date !== 'function') return 1900;
    const day = functions.date(1904, 1, 1);
    day.load('value');
    await ctx.sync();
    return dateSystemOf(day.value);
  });
}

/** Whether a cell number format shows a date (a year in it): its numbers are date-time serials. */
export function isDateFormat(format: string): boolean {
  return /y/i.test(format) && !format.startsWith('@');
}

/**
 * Rows for a sheet, their date-time cells (by the column's number format) moved from the 1900
 * system the calculation keeps to the workbook's; other cells as they are.
 */
export function rowsInDateSystem<T extends number | string>(rows: readonly (readonly T[])[], formats: readonly string[], system: DateSystem | undefined): T[][] {
  if (system !== 1904) return rows.map((r) => r.slice());
  const dated = formats.map(isDateFormat);
  return rows.map((r) => r.map((v, j) => (dated[j] && typeof v === 'number' ? (fromSerial1900(v, system) as T) : v)));
}

/** A date-time cell read from the workbook, as a 1900-system serial (text and blanks as they are). */
export function serialFromSheet<T>(cell: T, system: DateSystem | undefined): T | number {
  return system === 1904 && typeof cell === 'number' && Number.isFinite(cell) ? toSerial1900(cell, system) : cell;
}
