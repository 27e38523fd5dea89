/**
 * Worksheet formulas over the hourly table, the same text for the pane (Excel JavaScript API) and
 * the workbooks the command line writes, so that a summary follows the rows it sums: edit an hour
 * and the months, the year and the month × hour block follow. They refer to the table's columns
 * by structured reference (`Table[[Header]]`), which grows with the table.
 *
 * Month of a row: the month of its day, as the core's annual summary counts it. Under the time
 * convention `hourEnding` a row is stamped at the END of its hour, so the hour ending at midnight
 * on the 1st belongs to the month before: stamps after DATE(y, m, 1) and up to DATE(y, m + 1, 1);
 * under `instant` the stamps from DATE(y, m, 1) and before DATE(y, m + 1, 1).
 */
import { DEFAULT_TIME_CONVENTION, type TimeConvention } from '../core/time';
import { type HourlyKey, hourlyColumn } from './hourlyColumns';

export type { HourlyKey };

/** How a formula names a column of the hourly table; `convention` is how the table's rows are stamped (default `hourEnding`). */
export type ColumnRef = ((key: HourlyKey) => string) & { convention?: TimeConvention };

/**
 * A structured reference to a column of an Excel table. In a column specifier the characters
 * `[ ] # '` are escaped by a preceding `'`; the double brackets let any other character stand.
 * @param table - the table's name
 * @param convention - how the table's rows are stamped (names the stamp column; default `hourEnding`)
 * @param clock - the stamps are on the local clock (a daylight-saving rule; names the stamp column)
 */
export function tableColumnRef(table: string, convention: TimeConvention = DEFAULT_TIME_CONVENTION, clock = false): ColumnRef {
  const ref: ColumnRef = (key) => `${table}[[${hourlyColumn(key, convention, clock).header.replace(/(['#[\]])/g, "'$1")}]]`;
  ref.convention = convention;
  return ref;
}

/** The sum of column `key` over the rows of month `month` (1…12) of `year`. */
export function monthlySumFormula(ref: ColumnRef, key: HourlyKey, year: number, month: number): string {
  const t = ref('stampSerial');
  if (ref.convention === 'instant') return `SUMIFS(${ref(key)},${t},">="&DATE(${year},${month},1),${t},"<"&DATE(${year},${month + 1},1))`;
  return `SUMIFS(${ref(key)},${t},">"&DATE(${year},${month},1),${t},"<="&DATE(${year},${month + 1},1))`;
}

/** 1 for a row of month `month` (1…12) of `year`, 0 otherwise, as an array term (the months as {@link monthlySumFormula} counts them). */
function monthMask(ref: ColumnRef, year: number, month: number): string {
  const t = ref('stampSerial');
  if (ref.convention === 'instant') return `(${t}>=DATE(${year},${month},1))*(${t}<DATE(${year},${month + 1},1))`;
  return `(${t}>DATE(${year},${month},1))*(${t}<=DATE(${year},${month + 1},1))`;
}

/**
 * The largest value of column `key` over the rows of month `month` (1…12) of `year` that have
 * weather, and 0 when none is above 0 — as the core's year peak of the cooling load counts (hours
 * without weather skipped, 0 for a year without load). SUMPRODUCT makes Excel and LibreOffice read
 * the product as an array without an array formula (MAXIFS would need Excel 2019).
 */
export function monthlyPeakFormula(ref: ColumnRef, key: HourlyKey, year: number, month: number): string {
  return `SUMPRODUCT(MAX(${monthMask(ref, year, month)}*${withWeather(ref)}*${ref(key)}))`;
}

/**
 * The stamp of the first row of month `month` whose column `key` equals the month's peak in
 * `peakCell` (the row the core's peak names on ties), blank when the peak is 0. The earliest stamp
 * is found as a MAX of (a date after the year − stamp), so that the rows outside the month, at 0,
 * never win.
 */
export function monthlyPeakStampFormula(ref: ColumnRef, key: HourlyKey, year: number, month: number, peakCell: string): string {
  const after = `DATE(${year + 1},1,2)`;
  return `IF(${peakCell}>0,${after}-SUMPRODUCT(MAX(${monthMask(ref, year, month)}*${withWeather(ref)}*(${ref(key)}=${peakCell})*(${after}-${ref('stampSerial')}))),"")`;
}

/** 1 for a row with weather, 0 for an hour without (the worksheet functions give #N/A there), as an array term. */
function withWeather(ref: ColumnRef): string {
  return `(${ref('missing')}=0)`;
}

/**
 * The year's largest value of column `key` over the rows that have weather, and 0 when none is
 * above 0 — as the core counts a year's peaks (the annual summary's peak gain, the peak cooling
 * load): an hour without weather, which SOLARGAINYEAR gives as #N/A, never counts, though the
 * table holds a number there (0 gain; a cooling load made of the radiant tail of earlier hours).
 */
export function yearPeakFormula(ref: ColumnRef, key: HourlyKey): string {
  return `MAX(0,SUMPRODUCT(MAX(${withWeather(ref)}*${ref(key)})))`;
}

/**
 * The stamp of the first row with weather whose column `key` equals the year's peak
 * ({@link yearPeakFormula}, written out so that the cell stands alone), blank when the peak is 0
 * (the core names no peak hour then). The earliest stamp is found as a MAX of (a date after the
 * last row − stamp), so that the rows left out, at 0, never win.
 */
export function yearPeakStampFormula(ref: ColumnRef, key: HourlyKey): string {
  const peak = yearPeakFormula(ref, key);
  const after = `(MAX(${ref('stampSerial')})+1)`;
  return `IF(${peak}>0,${after}-SUMPRODUCT(MAX(${withWeather(ref)}*(${ref(key)}=${peak})*(${after}-${ref('stampSerial')}))),"")`;
}

/** Solar gain of month `month` (1…12) of `year` [kWh]. */
export function monthlyGainFormula(ref: ColumnRef, year: number, month: number): string {
  return `${monthlySumFormula(ref, 'gain', year, month)}/1000`;
}

/**
 * Mean solar gain [W] in the day's `hourEnding`-th hour (1…24: the hour ending then, or for
 * `instant` rows the instant an hour earlier, 0:00…23:00) over the days of month `month` that have
 * weather in that hour: the rows whose hour falls in that month and that hour of the day and that
 * have weather, summed, over their count (0 when none has weather). Hours without weather are left
 * out, as the worksheet functions leave them (#N/A), rather than counted as hours without gain.
 * `year` is kept for the callers' sake (the month of a row is read from its stamp).
 */
export function monthHourMeanFormula(ref: ColumnRef, _year: number, month: number, hourEnding: number): string {
  // A point inside the row's hour: its middle for hour-ending rows, just after the instant for instant rows.
  const mid = ref.convention === 'instant' ? `(${ref('stampSerial')}+1/48)` : `(${ref('stampSerial')}-1/48)`;
  const rows = `(MONTH(${mid})=${month})*(HOUR(${mid})=${hourEnding - 1})*${withWeather(ref)}`;
  return `SUMPRODUCT(${rows}*${ref('gain')})/MAX(1,SUMPRODUCT(${rows}))`;
}

/** The year's figures as formulas over the table, by the core summary's definitions (hours without weather skipped). */
export function yearFigureFormulas(ref: ColumnRef): {
  peakW: string;
  peakStamp: string;
  sunlitHours: string;
  meanSunlitFraction: string;
  missingHours: string;
} {
  return {
    peakW: yearPeakFormula(ref, 'gain'),
    peakStamp: yearPeakStampFormula(ref, 'gain'),
    sunlitHours: `COUNTIFS(${ref('beam')},">0",${ref('sunlitFraction')},">0",${ref('missing')},0)`,
    meanSunlitFraction: `IFERROR(AVERAGEIFS(${ref('sunlitFraction')},${ref('sunAltitude')},">0",${ref('incidence')},"<90"),0)`,
    missingHours: `SUM(${ref('missing')})`,
  };
}
