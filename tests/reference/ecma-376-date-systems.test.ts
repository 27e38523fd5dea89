/**
 * Sources:
 * - ECMA-376, Office Open XML File Formats (the SpreadsheetML "Date Representation" clause): in the
 *   1900 date base system 1 January 1900 is serial 1 and 31 December 9999 is serial 2,958,465; in
 *   the 1904 system 1 January 1904 is serial 0 and 31 December 9999 is serial 2,957,003; the 1900
 *   system treats 1900 as a leap year (serial 60 is 29 February 1900, 61 is 1 March) — stated in the
 *   standard.
 * - Microsoft's [MS-XLS] specification, the Date1904 record: "The first date of the 1904 date system
 *   is 00:00:00 on January 1, 1904, specified by a serial value of 0" — stated in the publication.
 * - The Office JavaScript API reference (@types/office-js 1.0.612, Excel.Functions.date, ExcelApi
 *   1.2): DATE's year runs "from 1900 or 1904 (depending on the workbook's date system)", so
 *   DATE(1904,1,1) is 1462 in a 1900 workbook and 0 in a 1904 one — what the pane relies on.
 *
 * Together: serial1900 = serial1904 + 1462 for every date both systems show, the offset the clock
 * range's `dateSystem` applies to date-times going in and coming out.
 */
import { civilToSerial, serialToCivil } from '../../src/core/time/calendar';
import { DATE_1904_OFFSET, fromSerial1900, MAX_SERIAL_1904_EXCLUSIVE, requireSerialIn, toSerial1900 } from '../../src/core/time/clock';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import type { RawArg } from '../../src/registry/types';
import { expectArgumentError } from '../support/expectError';

const call = (name: string, args: RawArg[]) => applyFunction(findFunction(name)!, args);

describe('the two date systems as ECMA-376 and [MS-XLS] state them', () => {
  test('the 1900 system: 1 January 1900 is 1, 1 March 1900 is 61 after the fictitious 29 February, 31 December 9999 is 2,958,465', () => {
    expect(civilToSerial(1900, 1, 1)).toBe(1);
    expect(serialToCivil(60)).toMatchObject({ year: 1900, month: 2, day: 29 });
    expect(civilToSerial(1900, 3, 1)).toBe(61);
    expect(civilToSerial(9999, 12, 31)).toBe(2_958_465);
  });

  test('the 1904 system: 1 January 1904 is 0 and 31 December 9999 is 2,957,003, so the offset is 1462 days', () => {
    expect(requireSerialIn('dateTime', 0, 1904)).toBe(civilToSerial(1904, 1, 1));
    expect(requireSerialIn('dateTime', 2_957_003, 1904)).toBe(civilToSerial(9999, 12, 31));
    expect(2_958_465 - 2_957_003).toBe(DATE_1904_OFFSET);
    // DATE(1904,1,1): 1462 in a 1900 workbook, 0 in a 1904 one
    expect(civilToSerial(1904, 1, 1)).toBe(1462);
    expect(fromSerial1900(civilToSerial(1904, 1, 1), 1904)).toBe(0);
    expect(toSerial1900(0.5, 1904)).toBe(1462.5);
  });

  test('a 1904 serial outside 1 January 1904 … 31 December 9999 is refused with its range', () => {
    expect(MAX_SERIAL_1904_EXCLUSIVE).toBe(2_957_004);
    expectArgumentError(() => requireSerialIn('dateTime', -0.5, 1904), 'dateTime', /1904 date system from 1 January 1904 \(serial 0\) to 31 December 9999 \(serial below 2957004\)/);
    expectArgumentError(() => requireSerialIn('dateTime', 2_957_004, 1904), 'dateTime');
  });
});

describe('functions given a 1904 clock read and give serials of that system', () => {
  const site = [51.5, 0, 0];
  const clock1904: RawArg = [['dateSystem', 1904]];

  test('a 1904 date-time is the 1900 one less 1462 days: the same sun', () => {
    const days = Array.from({ length: 40 }, (_, k) => [civilToSerial(1904 + k * 150, 1 + (k % 12), 1 + k, k % 24, 7)]);
    const as1904 = days.map(([d]) => [d - 1462]);
    const a = call('SUNALTITUDE', [days, ...site]);
    const b = call('SUNALTITUDE', [as1904, ...site, null, null, null, null, null, clock1904]);
    expect(b).toEqual(a);
    // text is the same instant in both systems
    expect(call('SUNALTITUDE', ['2026-06-21T12:00', ...site, null, null, null, null, null, clock1904])).toEqual(call('SUNALTITUDE', ['2026-06-21T12:00', ...site]));
  });

  test('SUNRISE, SOLARNOON and SUNSET come back 1462 lower in a 1904 workbook', () => {
    for (const name of ['SUNRISE', 'SOLARNOON', 'SUNSET']) {
      const a = call(name, [civilToSerial(2026, 6, 21), ...site]);
      const b = call(name, [civilToSerial(2026, 6, 21) - 1462, ...site, null, clock1904]);
      expect((a[0][0] as number) - (b[0][0] as number)).toBeCloseTo(1462, 9);
      expect(serialToCivil((b[0][0] as number) + 1462)).toMatchObject({ year: 2026, month: 6, day: 21 });
    }
    // the first day of the 1904 system: events on 1 January 1904
    const first = call('SOLARNOON', [0, ...site, null, clock1904])[0][0] as number;
    expect(first).toBeGreaterThan(0.49);
    expect(first).toBeLessThan(0.51);
  });

  test('a serial before 1 January 1904 is refused in a 1904 workbook, naming the argument, the value and the range', () => {
    const out = call('SUNALTITUDE', [-1, ...site, null, null, null, null, null, clock1904]);
    expect(String(out[0][0])).toMatch(/^SunpaneError: dateTime = -1 is not allowed: must be a date-time of the 1904 date system from 1 January 1904/);
  });
});
