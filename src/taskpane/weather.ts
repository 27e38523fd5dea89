/**
 * The pane's hourly weather: the ranges the form points at (direct normal and diffuse horizontal,
 * or global horizontal; optionally a column of time stamps) read into the table that
 * src/io/weather.ts checks — the same reader and checks as `sunpane table --weather`, so the pane
 * reports the same problems in the same words (a sheet's `row 14` where a file says `line 14`).
 *
 * A range may start with a header cell (a text that is neither a number nor a stamp): its unit in
 * brackets counts, as in a file (`Direct normal [W/m²]`). Rows are named by their sheet row in
 * the first irradiance range; the ranges must have as many cells as each other.
 */
import { SunpaneError } from '../core/common';
import type { Site } from '../core/sun';
import { readNumberText } from '../io/numberText';
import { readStampText } from '../io/stampText';
import { type CellValue, type HourStamp, type Quantity, type WeatherAdvice, type WeatherCheck, type WeatherColumn, type WeatherTable, HOUR_STAMPS, QUANTITY_WORDS, checkWeather, describeWeatherCheck, readUnitText } from '../io/weather';
import type { DateSystem } from '../core/time';
import { serialFromSheet } from './dateSystem';

/** How the pane names its weather options in advice (the labels of its boxes). */
export const PANE_WEATHER_ADVICE: WeatherAdvice = {
  unit: 'choose it under "Units of the weather columns"',
  decimal: 'enter the values as numbers rather than text',
  typicalYear: 'choose "a typical year" under "The stamps are of"',
  hourStamp: (c) => `choose "${HOUR_STAMP_LABELS[c]}" under "Each stamp marks"`,
  maxUnusable: 'the box "Unusable hours allowed" sets it',
};

/** The choices of the "Each stamp marks" box. */
export const HOUR_STAMP_LABELS: Readonly<Record<HourStamp, string>> = { end: 'the end of its hour', start: 'the start of its hour', middle: 'the middle of its hour' };

/** What messages call the weather in the pane. */
export const PANE_WEATHER_SOURCE = 'The weather columns';

/** The cells of one range as read, and the sheet row of its first cell. */
export interface SheetRange {
  /** `Weather!B2:B8761` as typed, for messages. */
  address: string;
  /** 1-based sheet row of the range's first row. */
  topRow: number;
  values: readonly (readonly CellValue[])[];
}

/** The weather ranges the form pointed at, as read. */
export interface SheetWeather {
  columns: Partial<Record<Quantity, SheetRange>>;
  stamps?: SheetRange;
  /** The workbook's date system: serial stamps count days in it (default 1900). */
  dateSystem?: DateSystem;
}

function isHeaderCell(cell: CellValue, stamps: boolean): boolean {
  if (typeof cell !== 'string' || cell.trim() === '') return false;
  if (stamps) return readStampText(cell) === undefined;
  return readNumberText(cell, 'point') === undefined && readNumberText(cell, 'comma') === undefined;
}

function columnOf(range: SheetRange, stamps: boolean): { column: WeatherColumn; headed: boolean } {
  const cells: CellValue[] = [];
  for (const row of range.values) for (const c of row) cells.push(c);
  const headed = cells.length > 0 && isHeaderCell(cells[0], stamps);
  return { column: headed ? { header: String(cells[0]).trim(), cells: cells.slice(1) } : { cells }, headed };
}

/**
 * The weather ranges as one table for the checker.
 * @throws SunpaneError naming the range (`weather.dhi`, `weather.stamps`) whose cell count differs from the first one's
 */
export function weatherTableFromRanges(w: SheetWeather): WeatherTable {
  const quantities = (['dni', 'dhi', 'ghi'] as const).filter((q) => w.columns[q] !== undefined);
  const read = quantities.map((q) => ({ q, range: w.columns[q]!, ...columnOf(w.columns[q]!, false) }));
  const stamps = w.stamps ? columnOf(w.stamps, true) : undefined;
  if (stamps && w.dateSystem === 1904) stamps.column = { ...stamps.column, cells: stamps.column.cells.map((c) => serialFromSheet(c, w.dateSystem)) };
  const first = read[0];
  const rows = first ? first.column.cells.length : 0;
  for (const r of read.slice(1)) {
    if (r.column.cells.length !== rows) {
      throw new SunpaneError(`weather.${r.q}`, r.range.address, `must have as many values as the ${QUANTITY_WORDS[first.q]} range (${rows}), not ${r.column.cells.length}`);
    }
  }
  if (stamps && w.stamps && stamps.column.cells.length !== rows) {
    throw new SunpaneError('weather.stamps', w.stamps.address, `must have as many stamps as the ${QUANTITY_WORDS[first.q]} range has values (${rows}), not ${stamps.column.cells.length}`);
  }
  const firstRow = first ? first.range.topRow + (first.headed ? 1 : 0) : 1;
  return {
    columns: Object.fromEntries(read.map((r) => [r.q, r.column])),
    ...(stamps ? { stamps: stamps.column } : {}),
    rows,
    where: (row) => `row ${firstRow + row}`,
  };
}

/**
 * Checks the weather ranges for the form's year and site with the form's weather options (the
 * boxes `weatherUnit`, `hourStamp`, `stampYear`, `maxUnusable`).
 * @returns the check and its lines for the pane (the same lines the command line prints)
 * @throws SunpaneError naming the box when the unusable-hours limit is not a percentage
 */
export function checkFormWeather(table: WeatherTable, values: Readonly<Record<string, string>>, site: Site, year: number): { check: WeatherCheck; lines: string[] } {
  const unit = readUnitText(values.weatherUnit ?? '');
  const stamp = (values.hourStamp ?? 'end') as HourStamp;
  const limitText = (values.maxUnusable ?? '').trim();
  const limit = limitText === '' ? undefined : Number(limitText);
  if (limit !== undefined && !(Number.isFinite(limit) && limit >= 0 && limit <= 100)) throw new SunpaneError('weather.maxUnusable', limitText, 'must be a percentage from 0 to 100');
  const check = checkWeather(table, {
    year,
    site,
    ...(unit ? { unit } : {}),
    typicalYear: values.stampYear === 'typical',
    hourStamp: HOUR_STAMPS.includes(stamp) ? stamp : 'end',
    ...(limit !== undefined ? { maxUnusablePercent: limit } : {}),
    advice: PANE_WEATHER_ADVICE,
  });
  return { check, lines: describeWeatherCheck(check, PANE_WEATHER_SOURCE, PANE_WEATHER_ADVICE) };
}
