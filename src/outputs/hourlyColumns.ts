/**
 * The hourly table's columns: one set of header words, one order and one unit notation (the unit
 * in parentheses after the words) for the pane's sheet, the command line's CSV and workbook, and
 * the demo workbook. Each column is a field of the core's annual series. The stamp column's words
 * follow the window's time convention (src/core/time/convention.ts): the hour ending at the stamp,
 * or the instant itself. Two columns come only with the window that has them: the conduction gain
 * (a window with a U-value) and the cooling load (a window with a room), after the solar gain.
 */
import type { AnnualSeries } from '../core/gain';
import { DEFAULT_TIME_CONVENTION, type TimeConvention } from '../core/time';

/** Fields of an annual series that the hourly table shows, in table order. */
export type HourlyKey =
  | 'stampSerial'
  | 'sunAltitude'
  | 'sunAzimuth'
  | 'incidence'
  | 'profileAngle'
  | 'sunlitFraction'
  | 'dni'
  | 'dhi'
  | 'beam'
  | 'sky'
  | 'ground'
  | 'shgc'
  | 'gain'
  | 'conduction'
  | 'load'
  | 'missing';

/** The columns a window has only when it has what they need. */
export interface HourlyExtras {
  /** The conduction gain U·A·ΔT (a window with a U-value). */
  conduction?: boolean;
  /** The cooling load by the radiant time series (a window with a room). */
  load?: boolean;
  /** Stamps on the local clock (a window with a daylight-saving rule): the stamp column says so. */
  clock?: boolean;
}

/** The columns every hourly table has. */
export type HourlyBaseKey = Exclude<HourlyKey, 'conduction' | 'load'>;

/** The values of an hourly table, one per hour: every base column, and the extra ones the window has. */
export type HourlyData = Record<HourlyBaseKey, ArrayLike<number>> & { conduction?: ArrayLike<number>; load?: ArrayLike<number> };

/** The extra columns a table's data has. */
export function extrasOf(data: HourlyData): HourlyExtras {
  return { conduction: data.conduction !== undefined, load: data.load !== undefined };
}

/**
 * The hourly table's data of a window's year: the series' columns, its conduction gain when the
 * window has a U-value, and the cooling load when one is given (the window has a room).
 */
export function hourlyData(series: AnnualSeries, load?: ArrayLike<number>): HourlyData {
  const { stampSerial, sunAltitude, sunAzimuth, incidence, profileAngle, sunlitFraction, dni, dhi, beam, sky, ground, shgc, gain, missing } = series;
  return {
    stampSerial, sunAltitude, sunAzimuth, incidence, profileAngle, sunlitFraction, dni, dhi, beam, sky, ground, shgc, gain, missing,
    ...(series.hasConduction ? { conduction: series.conduction } : {}),
    ...(load !== undefined ? { load } : {}),
  };
}

/** One hourly column. */
export interface HourlyColumn {
  key: HourlyKey;
  /** Header words with the unit in parentheses. */
  header: string;
  /** Number format of the column's cells in a workbook. */
  numFmt: string;
  /** Decimals kept in CSV output. */
  csvDecimals: number;
  /** Decimals of the values the pane sends to Excel (smaller requests; the format shows fewer). */
  sheetDecimals: number;
}

const ANGLE = '0.00';
const IRRADIANCE = '0.0';
const FRACTION = '0.000';

/** The hourly columns, in order. */
export const HOURLY_COLUMNS: readonly HourlyColumn[] = Object.freeze([
  { key: 'stampSerial', header: 'Hour ending (local standard time)', numFmt: 'yyyy-mm-dd hh:mm', csvDecimals: 6, sheetDecimals: 6 },
  { key: 'sunAltitude', header: 'Sun altitude (°)', numFmt: ANGLE, csvDecimals: 3, sheetDecimals: 2 },
  { key: 'sunAzimuth', header: 'Sun azimuth (°)', numFmt: ANGLE, csvDecimals: 3, sheetDecimals: 2 },
  { key: 'incidence', header: 'Incidence angle (°)', numFmt: ANGLE, csvDecimals: 3, sheetDecimals: 2 },
  { key: 'profileAngle', header: 'Profile angle (°)', numFmt: ANGLE, csvDecimals: 3, sheetDecimals: 2 },
  { key: 'sunlitFraction', header: 'Sunlit fraction (0-1)', numFmt: FRACTION, csvDecimals: 4, sheetDecimals: 3 },
  { key: 'dni', header: 'Direct normal (W/m²)', numFmt: IRRADIANCE, csvDecimals: 2, sheetDecimals: 1 },
  { key: 'dhi', header: 'Diffuse horizontal (W/m²)', numFmt: IRRADIANCE, csvDecimals: 2, sheetDecimals: 1 },
  { key: 'beam', header: 'Beam on glass (W/m²)', numFmt: IRRADIANCE, csvDecimals: 2, sheetDecimals: 1 },
  { key: 'sky', header: 'Sky diffuse on glass (W/m²)', numFmt: IRRADIANCE, csvDecimals: 2, sheetDecimals: 1 },
  { key: 'ground', header: 'Ground-reflected on glass (W/m²)', numFmt: IRRADIANCE, csvDecimals: 2, sheetDecimals: 1 },
  { key: 'shgc', header: 'SHGC at incidence (0-1)', numFmt: FRACTION, csvDecimals: 4, sheetDecimals: 3 },
  { key: 'gain', header: 'Solar gain (W)', numFmt: '#,##0', csvDecimals: 2, sheetDecimals: 1 },
  { key: 'missing', header: 'Weather missing (1 = yes)', numFmt: '0', csvDecimals: 0, sheetDecimals: 0 },
] as HourlyColumn[]);

/** The conduction gain and cooling load columns, in this order after the solar gain. */
const CONDUCTION: HourlyColumn = Object.freeze({ key: 'conduction', header: 'Conduction gain (W)', numFmt: '#,##0', csvDecimals: 2, sheetDecimals: 1 });
const LOAD: HourlyColumn = Object.freeze({ key: 'load', header: 'Cooling load (W)', numFmt: '#,##0', csvDecimals: 2, sheetDecimals: 1 });

/** The stamp column of a table whose rows are instants (time convention `instant`). */
const INSTANT_STAMP: HourlyColumn = Object.freeze({ ...HOURLY_COLUMNS[0], header: 'Instant (local standard time)' });
/** The stamp columns of a table stamped on the local clock (a daylight-saving rule), by time convention. */
const CLOCK_STAMPS: Readonly<Record<TimeConvention, HourlyColumn>> = Object.freeze({
  hourEnding: Object.freeze({ ...HOURLY_COLUMNS[0], header: 'Hour ending (local clock time)' }),
  instant: Object.freeze({ ...HOURLY_COLUMNS[0], header: 'Instant (local clock time)' }),
});

/**
 * The hourly columns of a table read by a time convention (the stamp column's words differ), with
 * the conduction gain and the cooling load when the window has them.
 */
export function hourlyColumnsFor(convention: TimeConvention = DEFAULT_TIME_CONVENTION, extras: HourlyExtras = {}): readonly HourlyColumn[] {
  const plain = convention === 'instant' ? INSTANT_COLUMNS : HOURLY_COLUMNS;
  const base = extras.clock ? [CLOCK_STAMPS[convention], ...plain.slice(1)] : plain;
  if (!extras.conduction && !extras.load) return base;
  const at = base.findIndex((c) => c.key === 'gain') + 1;
  return [...base.slice(0, at), ...(extras.conduction ? [CONDUCTION] : []), ...(extras.load ? [LOAD] : []), ...base.slice(at)];
}

const INSTANT_COLUMNS: readonly HourlyColumn[] = Object.freeze([INSTANT_STAMP, ...HOURLY_COLUMNS.slice(1)]);

/** The header row, in order (hour-ending stamps). */
export const HOURLY_HEADERS: readonly string[] = Object.freeze(HOURLY_COLUMNS.map((c) => c.header));

/** The header row of a table read by a time convention (with the extra columns asked for). */
export function hourlyHeadersFor(convention: TimeConvention = DEFAULT_TIME_CONVENTION, extras: HourlyExtras = {}): readonly string[] {
  return hourlyColumnsFor(convention, extras).map((c) => c.header);
}

/** The column of `key` (the stamp column's words by the time convention, and on the clock with `clock`). */
export function hourlyColumn(key: HourlyKey, convention: TimeConvention = DEFAULT_TIME_CONVENTION, clock = false): HourlyColumn {
  const c = hourlyColumnsFor(convention, { conduction: true, load: true, clock }).find((x) => x.key === key);
  if (!c) throw new Error(`no hourly column ${key}`);
  return c;
}
