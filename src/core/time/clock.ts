/**
 * The local clock beside standard time: a daylight-saving rule, the 1904 date system of some
 * workbooks, and the fitting of a weather file's year of hours to the calendar year of a window.
 *
 * Conventions (see docs/methods.md, "Clock and calendar"):
 * - A daylight-saving rule is {start, end, shift}: `start` and `end` are the clock readings at the
 *   moment the clocks change, as the trade states a rule ("clocks go forward at 02:00 on …", "go
 *   back at 03:00 on …"): `start` in standard time, `end` in daylight time; `shift` in hours
 *   (usually 1). The rule repeats every year on the same weekday of the month (the n-th weekday,
 *   or the last one when the date falls in the month's last seven days) at the same time of day,
 *   so one rule serves every year. `end` must come after `start`; a period that runs over the new
 *   year (southern hemisphere) is given with `end` in the following year.
 * - Inside Sunpane every instant is local standard time; a clock-time input is converted on the
 *   way in and clock times are shown beside standard ones on the way out. In the hour the clocks
 *   go back, a clock reading occurs twice: it is read as the first (daylight) one. In the hour the
 *   clocks go forward, clock readings that never occur are read as standard time.
 * - The 1904 date system counts days from 1 January 1904 (serial 0): serial1900 = serial1904 + 1462.
 */
import { SunpaneError, requireRange } from '../common';
import { civilToSerial, daysInMonth, formatSerialIso, hoursInYear, isLeapYear, MAX_SERIAL_EXCLUSIVE, requireSerial, serialToCivil } from './calendar';

const { ceil, floor } = Math;
const { isFinite: numberIsFinite } = Number;

/** A daylight-saving rule as given (serials in the 1900 date system). */
export interface DaylightSavingRule {
  /** Clock reading (standard time) when the clocks go forward, as a serial of one year's date. */
  start: number;
  /** Clock reading (daylight time) when the clocks go back, as a serial; after `start`. */
  end: number;
  /** How far the clocks go forward [h], above 0 up to 2. */
  shift: number;
}

/** Largest daylight-saving shift accepted [h] (double summer time was 2 h). */
export const DST_SHIFT_MAX = 2;

/** One date of a rule, as it recurs: month, n-th (or last) weekday, time of day. */
interface RecurringDate {
  month: number;
  /** 1…4, or 5 for "the last". */
  nth: number;
  /** 0 = Sunday … 6 = Saturday. */
  weekday: number;
  /** Fraction of the day. */
  timeOfDay: number;
}

const WEEKDAY = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];
const MONTH = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
const ORDINAL = ['', 'first', 'second', 'third', 'fourth', 'last'];

/** Weekday of a serial date, 0 = Sunday (valid from serial 61 on). */
function weekdayOf(serial: number): number {
  // Serial 61 (1 March 1900) was a Thursday (4).
  return (((floor(serial) - 61 + 4) % 7) + 7) % 7;
}

function recurringOf(serial: number): RecurringDate {
  const c = serialToCivil(serial);
  const whole = floor(serial);
  const last = c.day + 7 > daysInMonth(c.year, c.month);
  return { month: c.month, nth: last ? 5 : ceil(c.day / 7), weekday: weekdayOf(whole), timeOfDay: serial - whole };
}

/** The serial of a recurring date in a year. */
function occurrence(r: RecurringDate, year: number): number {
  const first = civilToSerial(year, r.month, 1);
  const firstMatch = first + ((r.weekday - weekdayOf(first) + 7) % 7);
  let day = r.nth === 5 ? firstMatch + 28 : firstMatch + 7 * (r.nth - 1);
  while (day >= first + daysInMonth(year, r.month)) day -= 7;
  return day + r.timeOfDay;
}

/**
 * Checks a daylight-saving rule.
 * @param rule - {start, end, shift}; `argument` prefixes the field names in messages
 * @returns the rule
 * @throws SunpaneError naming `${argument}.start`, `.end` (end not after start, or more than a
 *   year after it) or `.shift` (above 0 up to 2 h)
 */
export function requireDaylightSaving(rule: DaylightSavingRule, argument = 'daylightSaving'): DaylightSavingRule {
  if (rule === null || typeof rule !== 'object') throw new SunpaneError(argument, rule, 'must be a rule with start, end and shift');
  const start = requireSerial(`${argument}.start`, rule.start);
  const end = requireSerial(`${argument}.end`, rule.end);
  requireRange(`${argument}.shift`, rule.shift, 0, DST_SHIFT_MAX, 'h', { exclusiveMin: true });
  if (!(end > start)) {
    throw new SunpaneError(`${argument}.end`, formatSerialIso(end), `must come after the start of daylight saving (${formatSerialIso(start)}); a period over the new year ends in the following year`);
  }
  if (end - start >= 366) throw new SunpaneError(`${argument}.end`, formatSerialIso(end), `must be less than a year after the start (${formatSerialIso(start)})`);
  return rule;
}

/** Standard-time intervals [from, to) of daylight saving that touch a calendar year. */
function periodsAround(rule: DaylightSavingRule, year: number): [number, number][] {
  const s = recurringOf(rule.start);
  const e = recurringOf(rule.end);
  const wraps = serialToCivil(rule.end).year > serialToCivil(rule.start).year;
  const out: [number, number][] = [];
  for (let y = year - 1; y <= year; y++) {
    const from = occurrence(s, y);
    const to = occurrence(e, wraps ? y + 1 : y) - rule.shift / 24; // the end is a daylight-time reading
    out.push([from, to]);
  }
  return out;
}

/**
 * Whether a local standard-time instant falls in daylight saving under the rule.
 * @param standardSerial - local standard-time serial
 * @param rule - a checked rule
 */
export function inDaylightSaving(standardSerial: number, rule: DaylightSavingRule): boolean {
  const periods = periodsNear(rule, serialToCivil(standardSerial).year);
  for (let k = 0; k < periods.length; k += 2) if (standardSerial >= periods[k] && standardSerial < periods[k + 1]) return true;
  return false;
}

/**
 * The periods of {@link periodsAround} for a year and the next, flattened [from, to, from, to, …],
 * kept by rule and year: the rule's dates are worked out once per year, not once per hour (a year
 * of hours under a rule asks 8,760 times).
 */
const PERIODS = new Map<string, Map<number, Float64Array>>();

function periodsNear(rule: DaylightSavingRule, year: number): Float64Array {
  const key = `${rule.start}|${rule.end}|${rule.shift}`;
  let byYear = PERIODS.get(key);
  if (byYear === undefined) {
    if (PERIODS.size >= 16) PERIODS.delete(PERIODS.keys().next().value as string);
    byYear = new Map();
    PERIODS.set(key, byYear);
  }
  let periods = byYear.get(year);
  if (periods === undefined) {
    periods = Float64Array.from([...periodsAround(rule, year), ...periodsAround(rule, year + 1)].flat());
    byYear.set(year, periods);
  }
  return periods;
}

/**
 * Local standard time → local clock time under a rule.
 * @param standardSerial - local standard-time serial
 * @param rule - a daylight-saving rule (checked), or undefined for none
 * @returns the clock-time serial (standard + shift inside the period)
 */
export function standardToClock(standardSerial: number, rule: DaylightSavingRule | undefined): number {
  if (rule === undefined) return standardSerial;
  return inDaylightSaving(standardSerial, rule) ? standardSerial + rule.shift / 24 : standardSerial;
}

/**
 * Local clock time → local standard time under a rule (the inverse of {@link standardToClock}).
 * @param clockSerial - local clock-time serial
 * @param rule - a daylight-saving rule (checked), or undefined for none
 * @returns the standard-time serial; a reading in the hour the clocks go back is taken as the
 *   first (daylight) one, one in the hour that never occurs (clocks go forward) as standard time
 */
export function clockToStandard(clockSerial: number, rule: DaylightSavingRule | undefined): number {
  if (rule === undefined) return clockSerial;
  const asDaylight = clockSerial - rule.shift / 24;
  return inDaylightSaving(asDaylight, rule) ? asDaylight : clockSerial;
}

/** The rule in words, for step-by-step output (e.g. "daylight saving +1 h from the last Sunday of March 02:00 to the last Sunday of October 03:00 (clock time)"). */
export function describeDaylightSaving(rule: DaylightSavingRule | undefined): string {
  if (rule === undefined) return 'no daylight saving: local standard time';
  const words = (serial: number) => {
    const r = recurringOf(serial);
    const c = serialToCivil(serial);
    const hh = String(c.hour).padStart(2, '0');
    const mm = String(c.minute).padStart(2, '0');
    return `the ${ORDINAL[r.nth]} ${WEEKDAY[r.weekday]} of ${MONTH[r.month - 1]} ${hh}:${mm}`;
  };
  return `daylight saving +${rule.shift} h from ${words(rule.start)} to ${words(rule.end)} (clock time), every year`;
}

/** Days between the 1900 and 1904 date systems: serial1900 = serial1904 + 1462. */
export const DATE_1904_OFFSET = 1462;

/** A workbook's date system. */
export type DateSystem = 1900 | 1904;

/** The allowed date systems in words (one wording for every message). */
export const DATE_SYSTEM_WORDS = 'must be 1900 (the 1900 date system, the default) or 1904 (the 1904 date system, set in a workbook\'s calculation options; older Mac workbooks use it)';

/** Checks a date system (1900 or 1904; the text "1900" or "1904" too). */
export function requireDateSystem(value: unknown, argument = 'dateSystem'): DateSystem {
  const v = typeof value === 'string' && /^\s*(1900|1904)\s*$/.test(value) ? Number(value) : value;
  if (v !== 1900 && v !== 1904) throw new SunpaneError(argument, value, DATE_SYSTEM_WORDS);
  return v;
}

/** The last serial accepted in the 1904 system, exclusive (the end of 31 December 9999). */
export const MAX_SERIAL_1904_EXCLUSIVE = MAX_SERIAL_EXCLUSIVE - DATE_1904_OFFSET;

/**
 * Checks a serial date-time of a workbook in `system` and gives the same instant as a 1900-system
 * serial. In the 1904 system a serial counts days from 1 January 1904 (serial 0), the first date
 * that system can show; in the 1900 system the range of {@link requireSerial} holds.
 * @throws SunpaneError naming `argument`, with the value as given and the system's range
 */
export function requireSerialIn(argument: string, serial: unknown, system: DateSystem): number {
  if (system === 1900) return requireSerial(argument, serial);
  if (typeof serial !== 'number' || !numberIsFinite(serial) || serial < 0 || serial >= MAX_SERIAL_1904_EXCLUSIVE) {
    throw new SunpaneError(argument, serial, `must be a date-time of the 1904 date system from 1 January 1904 (serial 0) to 31 December 9999 (serial below ${MAX_SERIAL_1904_EXCLUSIVE})`);
  }
  return serial + DATE_1904_OFFSET;
}

/** A serial of a workbook in `system` → the same instant as a 1900-system serial. */
export function toSerial1900(serial: number, system: DateSystem): number {
  return system === 1904 ? serial + DATE_1904_OFFSET : serial;
}

/** A 1900-system serial → the same instant in `system`. */
export function fromSerial1900(serial: number, system: DateSystem): number {
  return system === 1904 ? serial - DATE_1904_OFFSET : serial;
}

/** How a weather file's rows were fitted to the window's calendar year. */
export type YearFitRule = 'asGiven' | 'feb29Repeated' | 'feb29Dropped';

/** The row map of a fitted year: `rowOf[i]` is the file row for hour i of the calendar year. */
export interface YearFit {
  rule: YearFitRule;
  /** The rule in words, for output. */
  text: string;
  rowOf: Int32Array;
}

/** Hour index (0-based, from 1 January 00:00) of 29 February 00:00 in a leap year. */
const FEB29_HOUR = 59 * 24;

/**
 * Fits an hourly file of 8760 or 8784 rows to a calendar year, as the trade does with typical-year
 * files: a typical year (8760 rows, no 29 February) used for a leap year gets 28 February's 24 rows
 * again for 29 February; a leap-year file (8784 rows) used for another year has its 29 February
 * dropped. Rows are matched by date, so 1 March onward keeps its own weather.
 * @param rows - the file's row count
 * @param year - the calendar year of the window
 * @param argument - name for messages (e.g. `weather.dni`)
 * @returns the rule and the row of each hour
 * @throws SunpaneError naming `argument` when `rows` is neither 8760 nor 8784
 */
export function fitYearOfHours(rows: number, year: number, argument = 'weather'): YearFit {
  const hours = hoursInYear(year);
  if (rows !== 8760 && rows !== 8784) {
    throw new SunpaneError(argument, `${rows} rows`, `must hold one value per hour of the year: ${hours} for ${year} (a typical year of 8760 or a leap-year file of 8784 is also fitted)`);
  }
  const rowOf = new Int32Array(hours);
  if (rows === hours) {
    for (let i = 0; i < hours; i++) rowOf[i] = i;
    return { rule: 'asGiven', text: `${rows} rows, one per hour of ${year}`, rowOf };
  }
  if (isLeapYear(year)) {
    // 8760 rows for a leap year: 29 February repeats 28 February.
    for (let i = 0; i < hours; i++) rowOf[i] = i < FEB29_HOUR ? i : i < FEB29_HOUR + 24 ? i - 24 : i - 24;
    return { rule: 'feb29Repeated', text: `typical year of 8760 rows fitted to leap year ${year}: 29 February repeats 28 February's hours`, rowOf };
  }
  for (let i = 0; i < hours; i++) rowOf[i] = i < FEB29_HOUR ? i : i + 24;
  return { rule: 'feb29Dropped', text: `leap-year file of 8784 rows fitted to ${year}: its 29 February is dropped`, rowOf };
}
