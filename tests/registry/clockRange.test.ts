/**
 * The clock range (src/registry/clockRange.ts): both layouts, the glossary's names and aliases, the
 * date system of its own date-times, and every refusal naming the field as written with the value
 * and what is allowed. Plumbing and wording: the rule's arithmetic is checked against the IANA
 * time-zone database in tests/core/time/clock.test.ts and tests/reference/iana-clock-sun.test.ts.
 */
import { civilToSerial } from '../../src/core/time/calendar';
import { readClockRange, STANDARD_CLOCK } from '../../src/registry/clockRange';
import { expectArgumentError } from '../support/expectError';

const EU = { start: civilToSerial(2026, 3, 29, 2), end: civilToSerial(2026, 10, 25, 3), shift: 1 };

describe('reading a clock range', () => {
  test('names down the first column, or a header row over one value row, give the same clock', () => {
    const down = readClockRange([
      ['daylightSavingStart', EU.start],
      ['daylightSavingEnd', EU.end],
    ]);
    const across = readClockRange([
      ['Daylight saving start', 'Daylight saving end', 'Daylight saving shift [h]'],
      ['2026-03-29T02:00', '2026-10-25 03:00', 1],
    ]);
    expect(down).toEqual({ kind: 'clock', rule: EU, dateSystem: 1900 });
    expect(across).toEqual(down);
  });

  test('a blank clock is local standard time in the 1900 date system', () => {
    expect(readClockRange(undefined)).toBe(STANDARD_CLOCK);
    expect(readClockRange(null)).toBe(STANDARD_CLOCK);
    expect(readClockRange([[null, null], ['', null]])).toBe(STANDARD_CLOCK);
    expect(readClockRange([['dateSystem', null]])).toEqual({ kind: 'clock', dateSystem: 1900 });
  });

  test('the date system alone, as a number or text, and a single name over its value', () => {
    expect(readClockRange([['dateSystem', 1904]])).toEqual({ kind: 'clock', dateSystem: 1904, dateSystemGiven: true });
    expect(readClockRange([['Date system'], ['1904']])).toEqual({ kind: 'clock', dateSystem: 1904, dateSystemGiven: true });
  });

  test("in the 1904 date system the rule's serials count from 1 January 1904 (1462 days later)", () => {
    const c = readClockRange([
      ['dstStart', EU.start - 1462],
      ['dstEnd', EU.end - 1462],
      ['dstShift', 1],
      ['dateSystem', 1904],
    ]);
    expect(c.rule).toEqual(EU);
    // ISO text is the same instant in both systems
    expect(readClockRange([['dstStart', '2026-03-29T02:00'], ['dstEnd', '2026-10-25T03:00'], ['dateSystem', 1904]]).rule).toEqual(EU);
  });
});

describe('bad clocks are refused by the field as written, with the value and what is allowed', () => {
  test('an end before the start', () => {
    expectArgumentError(() => readClockRange([['dstStart', '2026-10-25T03:00'], ['dstEnd', '2026-03-29T02:00']]), 'clock dstEnd', /"2026-03-29T02:00".*must come after the start of daylight saving \(2026-10-25T03:00\)/);
  });

  test('a shift outside above 0 up to 2 h', () => {
    expectArgumentError(() => readClockRange([['daylightSavingStart', EU.start], ['daylightSavingEnd', EU.end], ['Daylight saving shift [h]', 2.5]]), 'clock Daylight saving shift [h]', /= 2\.5 .*above 0 and up to 2 h/);
    expectArgumentError(() => readClockRange([['daylightSavingStart', EU.start], ['daylightSavingEnd', EU.end], ['daylightSavingShift', 0]]), 'clock daylightSavingShift', /= 0 .*above 0 and up to 2 h/);
  });

  test('a date system other than 1900 or 1904', () => {
    for (const bad of [1903, 1905, 'Mac', 0]) {
      expectArgumentError(() => readClockRange([['dateSystem', bad]]), 'clock dateSystem', /must be 1900 .* or 1904 /);
    }
    expect(() => readClockRange([['Date system', 1903]])).toThrow(/clock Date system = 1903 is not allowed/);
  });

  test('a start without an end, or a shift without a rule', () => {
    expectArgumentError(() => readClockRange([['dstStart', EU.start]]), 'clock daylightSavingEnd', /is needed with clock dstStart/);
    expectArgumentError(() => readClockRange([['dstEnd', EU.end]]), 'clock daylightSavingStart', /is needed with clock dstEnd/);
    expectArgumentError(() => readClockRange([['dstShift', 1]]), 'clock dstShift', /a shift alone is no rule/);
  });

  test('a date-time outside the date system', () => {
    expectArgumentError(() => readClockRange([['dstStart', -3], ['dstEnd', EU.end - 1462], ['dateSystem', 1904]]), 'clock dstStart', /1904 date system from 1 January 1904 \(serial 0\)/);
    expectArgumentError(() => readClockRange([['dstStart', 12], ['dstEnd', EU.end]]), 'clock dstStart', /from 1 March 1900/);
  });

  test('names that are no clock field, a window field, a repeat, and more than one clock', () => {
    expectArgumentError(() => readClockRange([['dstStrat', EU.start]]), 'clock field name', /did you mean daylightSavingStart\?/);
    expectArgumentError(() => readClockRange([['latitude', 40], ['dstStart', EU.start]]), 'clock field name', /names a window field, not a clock field/);
    expectArgumentError(() => readClockRange([['dstStart', EU.start], ['Daylight saving start', EU.start]]), 'clock field name', /names the same field as "dstStart"/);
    expectArgumentError(() => readClockRange([['dstStart', EU.start, EU.start], ['dstEnd', EU.end, EU.end]]), 'clock', /must describe one clock/);
    expectArgumentError(() => readClockRange(1904), 'clock', /must be a range of clock fields/);
    expectArgumentError(() => readClockRange([[1, 2], [3, 4]]), 'clock', /without clock field names/);
  });
});
