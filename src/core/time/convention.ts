/**
 * The time convention: how a date-time that stands for an hour is read. One choice, the same for
 * every function, table, schedule and pane (docs/conventions.md, "Time"):
 *
 * - `hourEnding` (the default, as hourly weather files are stamped): the value T names the hour
 *   that ENDS at T; the sun and a clear sky are taken at its middle, T − 30 min. A year's rows are
 *   stamped 01:00, 02:00, … 24:00 of each day.
 * - `instant`: T is the instant itself; the sun is taken at T. A year's rows are stamped 00:00,
 *   01:00, … 23:00 (instantaneous readings at the top of each hour).
 *
 * Either way the row of an hourly series that a date-time belongs to is the row with the nearest
 * stamp, so a one-hour calculation at a row's stamp is that row's calculation.
 */
import { SunpaneError } from '../common';
import { MAX_SERIAL_EXCLUSIVE, MIN_SERIAL, requireSerial } from './calendar';
import { clockToStandard, type DaylightSavingRule } from './clock';

/** How a date-time standing for an hour is read (see the module comment). */
export type TimeConvention = 'hourEnding' | 'instant';

/** The conventions, default first. */
export const TIME_CONVENTIONS: readonly TimeConvention[] = ['hourEnding', 'instant'];

/** The default: hour-ending stamps, sun at mid-hour. */
export const DEFAULT_TIME_CONVENTION: TimeConvention = 'hourEnding';

/**
 * Checks a time convention.
 * @param value - `hourEnding` or `instant`; undefined gives the default
 * @param argument - the name the message uses
 * @returns the convention
 * @throws SunpaneError naming `argument` for anything else
 */
export function requireTimeConvention(value: unknown, argument = 'timeConvention'): TimeConvention {
  if (value === undefined) return DEFAULT_TIME_CONVENTION;
  if (value === 'hourEnding' || value === 'instant') return value;
  throw new SunpaneError(argument, value, 'must be "hourEnding" (the hour ending at the date-time, sun at mid-hour) or "instant" (the sun at the date-time itself)');
}

/**
 * The instant at which the sun is evaluated for a date-time read by a convention.
 * @param serial - the date-time as given (local serial)
 * @param convention - `hourEnding`: 30 minutes earlier; `instant`: the same
 * @returns local serial of the evaluation instant
 */
export function evaluationSerial(serial: number, convention: TimeConvention): number {
  return convention === 'hourEnding' ? serial - 1 / 48 : serial;
}

/**
 * Stamp of row `i` of a year's hourly series.
 * @param yearStart - local serial of 1 January 00:00
 * @param i - row, 0-based
 * @param convention - `hourEnding`: the end of the hour; `instant`: its start
 */
export function rowStamp(yearStart: number, i: number, convention: TimeConvention): number {
  return yearStart + (convention === 'hourEnding' ? i + 1 : i) / 24;
}

/**
 * Row of a year's hourly series whose stamp is nearest a date-time (may lie outside the year).
 * @param yearStart - local serial of 1 January 00:00
 * @param serial - the date-time (local serial)
 * @param convention - the series' convention
 * @returns the row index, not checked against the year's length
 */
export function rowOfSerial(yearStart: number, serial: number, convention: TimeConvention): number {
  return Math.round((serial - yearStart) * 24) - (convention === 'hourEnding' ? 1 : 0);
}

/** Where in an hour a convention evaluates the sun, as a fraction of the hour after its start (0.5 or 0). */
export function hourFraction(convention: TimeConvention): number {
  return convention === 'hourEnding' ? 0.5 : 0;
}

/**
 * Checks a date-time read by a convention: a serial in the supported range whose evaluation instant
 * is in range too (the first hour ending in range ends at 1 March 1900 01:00).
 * @throws SunpaneError naming `argument`, with the value as given
 */
export function requireStamp(argument: string, serial: unknown, convention: TimeConvention): number {
  requireSerial(argument, serial);
  const s = serial as number;
  if (convention === 'hourEnding' && s - 1 / 48 < MIN_SERIAL) {
    throw new SunpaneError(argument, s, `must be a date-time from 1 March 1900 01:00 (serial ${MIN_SERIAL + 1 / 24}, the end of the first whole hour) to 31 December 9999 (serial below ${MAX_SERIAL_EXCLUSIVE}) with the time convention hourEnding`);
  }
  return s;
}

/**
 * A date-time read by a convention, from the local clock to local standard time: an hour-ending
 * stamp moves with its hour's middle (the hour ending 14:00 on the clock is the hour ending 13:00
 * standard, also in the hour the clocks change), an instant moves itself. Unchanged without a rule.
 * @param stamp - the date-time as given (a clock reading; 1900-system serial)
 * @param convention - how the date-time names its hour
 * @param rule - a checked daylight-saving rule, or undefined
 * @returns the standard-time stamp
 */
export function clockStampToStandard(stamp: number, convention: TimeConvention, rule: DaylightSavingRule | undefined): number {
  if (rule === undefined) return stamp;
  return convention === 'hourEnding' ? clockToStandard(stamp - 1 / 48, rule) + 1 / 48 : clockToStandard(stamp, rule);
}
