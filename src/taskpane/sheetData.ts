/**
 * Reads what the form points at on the user's sheets: the glazing angle table, the skyline and the
 * hourly weather columns (checked by src/io/weather.ts through ./weather.ts), and a schedule table
 * by name. Reading only; errors name the form field
 * (by its WindowSpec path) in the core's words.
 */
import { SunpaneError } from '../core/common';
import { RANGE_ADDRESS_HELP, type RangeRef, parseRangeAddress } from './addresses';
import type { FormValues } from './fields';
import type { RunBatch } from './resultSheets';
import { type SheetData, neededAddresses } from './spec';
import type { Site } from '../core/sun';
import { type SheetWeather, checkFormWeather, weatherTableFromRanges } from './weather';

type Cell = string | number | boolean | null;

function rangeOf(ctx: Excel.RequestContext, ref: RangeRef): Excel.Range {
  const sheet = ref.sheet === undefined ? ctx.workbook.worksheets.getActiveWorksheet() : ctx.workbook.worksheets.getItem(ref.sheet);
  return sheet.getRange(ref.range);
}

/** A cell as a number for the core, a blank as NaN (a missing hour in a weather column). */
function cellNumber(v: Cell): number | string {
  if (typeof v === 'number') return v;
  if (v === null || v === '' || (typeof v === 'string' && v.trim() === '')) return NaN;
  const n = Number(String(v).trim());
  return Number.isFinite(n) ? n : String(v);
}

/** A column of numbers from a range (row by row); blank cells become NaN. */
export function columnValues(values: readonly (readonly Cell[])[]): (number | string)[] {
  const out: (number | string)[] = [];
  for (const row of values) for (const cell of row) out.push(cellNumber(cell));
  return out;
}

/** 1-based sheet row of the first cell of an A1 range (`B2:B8761` → 2). */
function topRowOf(range: string): number {
  const rows = range.split(':').map((c) => Number(/(\d+)$/.exec(c)?.[1] ?? '1'));
  return Math.min(...rows);
}

/**
 * Checks the weather ranges read by {@link readSheetData} (src/io/weather.ts, as the command line
 * does) for the form's year and site, and puts the usable series into the data.
 * @returns the data with `dni`/`dhi` or `ghi` filled when the weather can be used, and the report's lines
 * @throws SunpaneError naming the box for ranges of different lengths or a bad limit
 */
export function withCheckedWeather(data: SheetData, form: FormValues, site: Site, year: number): { data: SheetData; usable: boolean; lines: string[] } {
  if (!data.weatherRanges) return { data, usable: true, lines: [] };
  const { check, lines } = checkFormWeather(weatherTableFromRanges(data.weatherRanges), form, site, year);
  if (!check.usable || !check.weather) return { data, usable: false, lines };
  const w = check.weather;
  const series = w.kind === 'measured' ? { dni: Array.from(w.dni), dhi: Array.from(w.dhi) } : w.kind === 'globalHorizontal' ? { ghi: Array.from(w.ghi) } : {};
  return { data: { ...data, ...series }, usable: true, lines };
}

/** A two-column angle table (angle, SHGC), skipping blank rows and a text header row. */
export function angleTableOf(values: readonly (readonly Cell[])[]): { angles: number[]; values: number[] } {
  const rows = values.filter((r) => r.some((c) => c !== '' && c !== null));
  const body = rows.length > 0 && typeof rows[0][0] === 'string' && !Number.isFinite(Number(rows[0][0])) ? rows.slice(1) : rows;
  if (body.length > 0 && body[0].length < 2) throw new SunpaneError('glazing.angleTable', `a range ${body[0].length} column wide`, 'must be two columns: incidence angle ° and SHGC');
  return { angles: body.map((r) => cellNumber(r[0]) as number), values: body.map((r) => cellNumber(r[1]) as number) };
}

/** Reads every range the form needs (by its address boxes) in one request. */
export async function readSheetData(run: RunBatch, form: FormValues): Promise<SheetData> {
  const wanted = neededAddresses(form).map((f) => {
    const ref = parseRangeAddress(form[f.id] ?? '');
    if (!ref) throw new SunpaneError(f.paths?.[0] ?? f.id, (form[f.id] ?? '').trim() === '' ? null : form[f.id], RANGE_ADDRESS_HELP);
    return { field: f, ref };
  });
  if (wanted.length === 0) return {};
  return run(async (ctx) => {
    const ranges = wanted.map((w) => {
      const r = rangeOf(ctx, w.ref);
      r.load('values');
      return r;
    });
    try {
      await ctx.sync();
    } catch (err) {
      // Excel does not say which range failed: try them one by one to name the right box.
      for (const w of wanted) {
        rangeOf(ctx, w.ref).load('address');
        try {
          await ctx.sync();
        } catch {
          throw new SunpaneError(w.field.paths?.[0] ?? w.field.id, `${w.ref.sheet ? `${w.ref.sheet}!` : ''}${w.ref.range}`, 'must point at cells that exist (check the sheet name)');
        }
      }
      throw err;
    }
    const data: SheetData = {};
    const weather: SheetWeather = { columns: {} };
    wanted.forEach((w, i) => {
      const values = ranges[i].values as Cell[][];
      const range = { address: form[w.field.id].trim(), topRow: topRowOf(w.ref.range), values };
      switch (w.field.id) {
        case 'angleTableAddress':
          data.angleTable = angleTableOf(values);
          break;
        case 'skylineAddress':
          data.skyline = columnValues(values).filter((v) => !(typeof v === 'number' && Number.isNaN(v))) as number[];
          break;
        case 'dniAddress':
          weather.columns.dni = range;
          break;
        case 'dhiAddress':
          weather.columns.dhi = range;
          break;
        case 'ghiAddress':
          weather.columns.ghi = range;
          break;
        case 'timeAddress':
          weather.stamps = range;
          break;
      }
    });
    if (Object.keys(weather.columns).length > 0) data.weatherRanges = weather;
    return data;
  });
}

/** Reads a table's values (header row first) by the table's name; a clear message if missing. */
export async function readNamedTable(run: RunBatch, name: string): Promise<Cell[][]> {
  return run(async (ctx) => {
    const table = ctx.workbook.tables.getItemOrNullObject(name.trim());
    await ctx.sync();
    if (table.isNullObject) throw new SunpaneError('table', name, 'must be the name of an Excel table in this workbook (Insert → Table, then Table Design → Table Name)');
    const range = table.getRange();
    range.load('values');
    await ctx.sync();
    return range.values as Cell[][];
  });
}
