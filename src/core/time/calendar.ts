/**
 * Time: spreadsheet serial numbers, UTC instants, calendar dates and Julian days.
 *
 * All calendar and spreadsheet-serial handling in Sunpane lives in this folder (ΔT in deltaT.ts).
 *
 * Conventions (docs/conventions.md#date-times): a date-time crossing a public interface is a spreadsheet serial number in
 * the 1900 date system, in *local standard time* (no daylight saving), with the site's UTC offset in
 * hours, east positive. Inside the core an instant is a UTC time in milliseconds since 1970-01-01
 * (the JavaScript epoch), written `utcMs`.
 *
 * The 1900 date system counts 1900-01-01 as serial 1 and, for compatibility with early spreadsheets,
 * treats 1900 as a leap year: serial 60 is the non-existent 29 February 1900 and serial 61 is
 * 1 March 1900. From serial 61 on, serial = days since 1899-12-30. Sunpane accepts serials from 61
 * (1 March 1900) to the end of 31 December 9999, where the quirk no longer matters.
 */
import { SunpaneError, requireRange } from '../common';

const { floor, round } = Math;
const { isFinite: numberIsFinite } = Number;

const MS_PER_DAY = 86_400_000;
const MS_PER_HOUR = 3_600_000;
/** Serial of 1970-01-01 00:00 in the 1900 date system. */
const SERIAL_UNIX_EPOCH = 25_569;
/** Serial of 1900-03-01, the first serial Sunpane accepts. */
export const MIN_SERIAL = 61;
/** Serial of 10000-01-01 00:00; accepted serials are below it (the end of 31 December 9999). */
export const MAX_SERIAL_EXCLUSIVE = 2_958_466;
/** Allowed UTC offsets [h]. */
export const UTC_OFFSET_MIN = -12;
export const UTC_OFFSET_MAX = 14;
/** Julian day of 1970-01-01 00:00 UT. */
const JD_UNIX_EPOCH = 2_440_587.5;

/** A calendar date and time of day (local standard time when it comes from a serial). */
export interface CivilDateTime {
  year: number;
  /** 1…12 */
  month: number;
  /** 1…31 */
  day: number;
  hour: number;
  minute: number;
  /** Seconds including fractions. */
  second: number;
}

/** Validates a spreadsheet serial date-time; returns it. */
export function requireSerial(argument: string, serial: unknown): number {
  if (typeof serial !== 'number' || !numberIsFinite(serial) || serial < MIN_SERIAL || serial >= MAX_SERIAL_EXCLUSIVE) {
    throw new SunpaneError(
      argument,
      serial,
      `must be a date-time from 1 March 1900 (serial ${MIN_SERIAL}) to 31 December 9999 (serial below ${MAX_SERIAL_EXCLUSIVE})`,
    );
  }
  return serial;
}

/** Validates a UTC offset [h], −12…+14, east positive; fractions such as 5.5 and 5.75 allowed. */
export function requireUtcOffset(utcOffset: unknown, argument = 'utcOffset'): number {
  return requireRange(argument, utcOffset, UTC_OFFSET_MIN, UTC_OFFSET_MAX, 'h');
}

/** A standard-time offset as every output writes it: `UTC+1 h`, `UTC-5 h`, `UTC+5.5 h`. */
export function utcOffsetText(utcOffset: number): string {
  return `UTC${utcOffset >= 0 ? '+' : ''}${utcOffset} h`;
}

/**
 * Local standard-time serial → UTC instant.
 * @param serial - spreadsheet serial date-time, local standard time, ≥ 61 (1 March 1900)
 * @param utcOffset - site's offset from UTC [h], −12…+14, east positive
 * @returns UTC instant [ms since 1970-01-01]
 */
export function serialToUtcMs(serial: number, utcOffset: number): number {
  requireSerial('dateTime', serial);
  requireUtcOffset(utcOffset);
  return (serial - SERIAL_UNIX_EPOCH) * MS_PER_DAY - utcOffset * MS_PER_HOUR;
}

/**
 * UTC instant → local standard-time serial (the inverse of {@link serialToUtcMs}).
 * @param utcMs - UTC instant [ms since 1970-01-01]
 * @param utcOffset - site's offset from UTC [h], east positive
 */
export function utcMsToSerial(utcMs: number, utcOffset: number): number {
  return (utcMs + utcOffset * MS_PER_HOUR) / MS_PER_DAY + SERIAL_UNIX_EPOCH;
}

/** Days from 1970-01-01 to the given proleptic Gregorian date (Howard Hinnant's days_from_civil). */
function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = floor(y / 400);
  const yoe = y - era * 400;
  const mp = (month + 9) % 12;
  const doy = floor((153 * mp + 2) / 5) + day - 1;
  const doe = yoe * 365 + floor(yoe / 4) - floor(yoe / 100) + doy;
  return era * 146_097 + doe - 719_468;
}

/** Proleptic Gregorian date of a day count from 1970-01-01 (Hinnant's civil_from_days). */
function civilFromDays(days: number): { year: number; month: number; day: number } {
  const z = days + 719_468;
  const era = floor(z / 146_097);
  const doe = z - era * 146_097;
  const yoe = floor((doe - floor(doe / 1460) + floor(doe / 36_524) - floor(doe / 146_096)) / 365);
  const doy = doe - (365 * yoe + floor(yoe / 4) - floor(yoe / 100));
  const mp = floor((5 * doy + 2) / 153);
  const day = doy - floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return { year: yoe + era * 400 + (month <= 2 ? 1 : 0), month, day };
}

/**
 * Calendar date and time → spreadsheet serial, 1900 date system with its leap-year quirk
 * (dates before 1 March 1900 are one lower than their day count, so 1900-01-01 is serial 1).
 */
export function civilToSerial(year: number, month: number, day: number, hour = 0, minute = 0, second = 0): number {
  let serial = daysFromCivil(year, month, day) + SERIAL_UNIX_EPOCH;
  if (serial < MIN_SERIAL) serial -= 1;
  return serial + (hour + minute / 60 + second / 3600) / 24;
}

/**
 * Spreadsheet serial → calendar date and time of day. Serial 60 gives the 1900 system's fictitious
 * 29 February 1900; serials 1…59 give January and February 1900.
 */
export function serialToCivil(serial: number): CivilDateTime {
  let whole = floor(serial);
  let fraction = serial - whole;
  // Round to the millisecond so that 0.999999999 of a day reads as the next midnight, not 23:59:60.
  let ms = round(fraction * MS_PER_DAY);
  if (ms >= MS_PER_DAY) {
    whole += 1;
    ms -= MS_PER_DAY;
  }
  fraction = ms;
  let date: { year: number; month: number; day: number };
  if (whole === 60) date = { year: 1900, month: 2, day: 29 };
  else date = civilFromDays((whole < MIN_SERIAL ? whole + 1 : whole) - SERIAL_UNIX_EPOCH);
  const hour = floor(fraction / MS_PER_HOUR);
  const minute = floor((fraction - hour * MS_PER_HOUR) / 60_000);
  const second = (fraction - hour * MS_PER_HOUR - minute * 60_000) / 1000;
  return { year: date.year, month: date.month, day: date.day, hour, minute, second };
}

/** True for Gregorian leap years. */
export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Hours in a calendar year: 8760, or 8784 in a leap year. */
export function hoursInYear(year: number): number {
  return isLeapYear(year) ? 8784 : 8760;
}

/** Day of the year, 1 (1 January) … 365 or 366, of a local serial date-time. */
export function dayOfYear(serial: number): number {
  const { year, month, day } = serialToCivil(serial);
  return daysFromCivil(year, month, day) - daysFromCivil(year, 1, 1) + 1;
}

/** Days in a month of a year (Gregorian). */
export function daysInMonth(year: number, month: number): number {
  return daysFromCivil(month === 12 ? year + 1 : year, month === 12 ? 1 : month + 1, 1) - daysFromCivil(year, month, 1);
}

/** Validates a calendar year for annual work (1901…9998, so that the whole year is inside the serial range). */
export function requireYear(year: unknown, argument = 'year'): number {
  return requireRange(argument, year, 1901, 9998, undefined, { integer: true });
}

/**
 * Julian day (UT) of a UTC instant. JD 2440587.5 is 1970-01-01 00:00 UT.
 * @remarks Meeus, *Astronomical Algorithms* (2nd ed.), ch. 7; Reda & Andreas (2008) Eq. 4.
 */
export function julianDay(utcMs: number): number {
  return utcMs / MS_PER_DAY + JD_UNIX_EPOCH;
}


const ISO_LOCAL = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2}(?:\.\d+)?))?)?$/;

/**
 * Parses an ISO 8601 local date or date-time (`2026-06-21`, `2026-06-21T12:30`, `2026-06-21 12:30:15`)
 * into a serial. Zone designators are refused: Sunpane date-times are local standard time.
 */
export function parseIsoLocal(text: string, argument = 'dateTime'): number {
  const m = ISO_LOCAL.exec(text.trim());
  const allowed = 'must be a serial number or an ISO 8601 local date-time such as 2026-06-21T12:30 (no time zone)';
  if (!m) throw new SunpaneError(argument, text, allowed);
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const [hour, minute, second] = [Number(m[4] ?? 0), Number(m[5] ?? 0), Number(m[6] ?? 0)];
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month) || hour > 24 || minute > 59 || second >= 60 || (hour === 24 && (minute > 0 || second > 0))) {
    throw new SunpaneError(argument, text, allowed);
  }
  return requireSerial(argument, civilToSerial(year, month, day, hour, minute, second));
}

/** Formats a serial as an ISO 8601 local date-time to the minute, e.g. `2026-06-21T12:30`. */
export function formatSerialIso(serial: number): string {
  const c = serialToCivil(serial);
  const p = (n: number) => String(n).padStart(2, '0');
  return `${c.year}-${p(c.month)}-${p(c.day)}T${p(c.hour)}:${p(c.minute)}`;
}
