/**
 * The caution check shared by the tests of every output: which sheets of a workbook do not show
 * the caution (src/outputs/caution.ts) in column A of their first six rows.
 */
import ExcelJS from 'exceljs';
import { CAUTION } from '../../src/outputs/caution';

/** The sheets of `wb` whose heading lacks the caution. */
export function sheetsWithoutCaution(wb: ExcelJS.Workbook): string[] {
  return wb.worksheets.filter((ws) => ![1, 2, 3, 4, 5, 6].some((r) => ws.getCell(r, 1).value === CAUTION)).map((w) => w.name);
}

/** Reads a workbook file and returns its sheet names and those without the caution. */
export async function cautionOfFile(file: string): Promise<{ sheets: string[]; missing: string[] }> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.readFile(file);
  return { sheets: wb.worksheets.map((w) => w.name), missing: sheetsWithoutCaution(wb) };
}
