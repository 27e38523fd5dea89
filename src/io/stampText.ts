/**
 * Time stamps of hourly data as users write them: ISO 8601 date-times (`2026-01-01T01:00`,
 * `2026-01-01 01:00:00`, with or without a zone: `Z`, `+01:00`), the same with slashes
 * (`2026/01/01 01:00`), `24:00` for the end of a day, and spreadsheet serial numbers (date cells).
 * Day-first and month-first forms (`01/02/2026`) are not read: they cannot be told apart.
 */
import { daysInMonth, serialToCivil } from '../core/time';

/** A calendar date and time as written; `offsetMinutes` when the stamp names its zone. */
export interface CivilStamp {
  year: number;
  month: number;
  day: number;
  /** 0…24 (24 only at 24:00). */
  hour: number;
  minute: number;
  second: number;
  /** The stamp's own offset from UTC [min], when it gives one (`Z` is 0). */
  offsetMinutes?: number;
}

const STAMP = /^(\d{4})([-/])(\d{1,2})\2(\d{1,2})[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i;

function offsetOf(zone: string | undefined): number | undefined {
  if (zone === undefined) return undefined;
  if (zone.toUpperCase() === 'Z') return 0;
  const sign = zone[0] === '-' ? -1 : 1;
  const digits = zone.slice(1).replace(':', '');
  return sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2) || '0'));
}

/** Reads a stamp written as text; undefined when it is not one of the forms above or not a real date and time. */
export function readStampText(text: string): CivilStamp | undefined {
  const m = STAMP.exec(text.trim());
  if (!m) return undefined;
  const year = Number(m[1]);
  const month = Number(m[3]);
  const day = Number(m[4]);
  const hour = Number(m[5]);
  const minute = Number(m[6]);
  const second = Number(m[7] ?? 0);
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return undefined;
  if (hour > 24 || minute > 59 || second > 59 || (hour === 24 && (minute > 0 || second > 0))) return undefined;
  const offsetMinutes = offsetOf(m[8]);
  if (offsetMinutes !== undefined && Math.abs(offsetMinutes) > 14 * 60) return undefined;
  return { year, month, day, hour, minute, second, ...(offsetMinutes !== undefined ? { offsetMinutes } : {}) };
}

/** A stamp from a spreadsheet date cell (a serial number in the sheet's local time), to the second. */
export function stampFromSerial(serial: number): CivilStamp | undefined {
  if (!Number.isFinite(serial) || serial < 61 || serial >= 2_958_466) return undefined;
  const c = serialToCivil(Math.round(serial * 86_400) / 86_400);
  return { year: c.year, month: c.month, day: c.day, hour: c.hour, minute: c.minute, second: Math.round(c.second) };
}

/** A stamp as ISO 8601 text (to the minute; the zone when it had one), for messages. */
export function formatStamp(s: CivilStamp): string {
  const p = (n: number) => String(n).padStart(2, '0');
  const zone = s.offsetMinutes === undefined ? '' : s.offsetMinutes === 0 ? 'Z' : `${s.offsetMinutes < 0 ? '-' : '+'}${p(Math.floor(Math.abs(s.offsetMinutes) / 60))}:${p(Math.abs(s.offsetMinutes) % 60)}`;
  return `${s.year}-${p(s.month)}-${p(s.day)}T${p(s.hour)}:${p(s.minute)}${zone}`;
}
