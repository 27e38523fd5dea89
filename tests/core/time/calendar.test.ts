import { SunpaneError } from '../../../src/core/common/errors';
import { civilToSerial, dayOfYear, formatSerialIso, hoursInYear, julianDay, parseIsoLocal, serialToCivil, serialToUtcMs, utcMsToSerial } from '../../../src/core/time/calendar';

describe('spreadsheet serials (1900 date system)', () => {
  // Serial values of the 1900 date system as documented for spreadsheet applications
  // (1900-01-01 = 1, 1900-03-01 = 61, 2000-01-01 = 36526) — from memory, cross-checked below
  // against JavaScript's own Date arithmetic from the 1899-12-30 origin.
  test('1 January 1900 is serial 1 and 1 March 1900 is serial 61', () => {
    expect(civilToSerial(1900, 1, 1)).toBe(1);
    expect(civilToSerial(1900, 2, 28)).toBe(59);
    expect(civilToSerial(1900, 3, 1)).toBe(61);
  });

  test('serial 60 is the fictitious 29 February 1900', () => {
    expect(serialToCivil(60)).toMatchObject({ year: 1900, month: 2, day: 29 });
    expect(serialToCivil(59)).toMatchObject({ year: 1900, month: 2, day: 28 });
  });

  test('serials from 61 on count days from 1899-12-30, as JavaScript Date agrees', () => {
    const origin = Date.UTC(1899, 11, 30);
    for (const [y, m, d] of [[2000, 1, 1], [2003, 10, 17], [2024, 2, 29], [9999, 12, 31], [1900, 3, 1]] as const) {
      expect(civilToSerial(y, m, d)).toBe((Date.UTC(y, m - 1, d) - origin) / 86_400_000);
    }
    expect(civilToSerial(2000, 1, 1)).toBe(36526);
  });

  test('serial → calendar → serial round-trips to the millisecond', () => {
    for (let s = 61; s < 2_958_466; s += 9_973.123457) {
      const c = serialToCivil(s);
      expect(civilToSerial(c.year, c.month, c.day, c.hour, c.minute, c.second)).toBeCloseTo(s, 7);
    }
  });

  test('local standard time converts to UTC with the offset, east positive', () => {
    // NREL SPA worked example (Reda & Andreas 2008): 2003-10-17 12:30:30 at UTC−7 is 19:30:30 UT.
    const serial = civilToSerial(2003, 10, 17, 12, 30, 30);
    // Serials are binary fractions of a day: agreement to 0.01 ms is exact for every purpose here.
    expect(Math.abs(serialToUtcMs(serial, -7) - Date.UTC(2003, 9, 17, 19, 30, 30))).toBeLessThan(0.01);
    expect(Math.abs(serialToUtcMs(serial, 5.5) - Date.UTC(2003, 9, 17, 7, 0, 30))).toBeLessThan(0.01);
    expect(utcMsToSerial(Date.UTC(2003, 9, 17, 19, 30, 30), -7)).toBeCloseTo(serial, 10);
  });

  test('Julian day of the SPA worked example instant is 2452930.312847 (NREL/TP-560-34302, Table A5.1)', () => {
    expect(julianDay(Date.UTC(2003, 9, 17, 19, 30, 30))).toBeCloseTo(2452930.312847, 6);
  });

  test('day of year runs 1 … 365, or 366 in leap years', () => {
    expect(dayOfYear(civilToSerial(2026, 1, 1, 23))).toBe(1);
    expect(dayOfYear(civilToSerial(2026, 12, 31))).toBe(365);
    expect(dayOfYear(civilToSerial(2024, 12, 31, 12))).toBe(366);
    expect(dayOfYear(civilToSerial(1900, 3, 1))).toBe(60);
    expect(hoursInYear(2024)).toBe(8784);
    expect(hoursInYear(2100)).toBe(8760);
  });

  test('ISO 8601 local text parses to the same serial, and refuses zones and impossible dates', () => {
    expect(parseIsoLocal('2003-10-17T12:30:30')).toBeCloseTo(civilToSerial(2003, 10, 17, 12, 30, 30), 10);
    expect(parseIsoLocal('2026-06-21')).toBe(civilToSerial(2026, 6, 21));
    expect(formatSerialIso(parseIsoLocal('2026-06-21 07:05'))).toBe('2026-06-21T07:05');
    for (const bad of ['2026-02-29', '2026-06-21T12:00Z', 'June 21', '1900-02-28']) {
      expect(() => parseIsoLocal(bad)).toThrow(SunpaneError);
    }
  });

  test('serials outside 1 March 1900 … 31 December 9999 and bad offsets name the argument', () => {
    expect(() => serialToUtcMs(60, 0)).toThrow(/dateTime = 60 is not allowed/);
    expect(() => serialToUtcMs(2_958_466, 0)).toThrow(/dateTime/);
    expect(() => serialToUtcMs(Number.NaN, 0)).toThrow(/dateTime = NaN/);
    expect(() => serialToUtcMs(40000, 14.5)).toThrow(/utcOffset = 14.5 is not allowed: must be a number from -12 to 14 h/);
  });
});
