/**
 * The clock: daylight-saving rules, the 1904 date system and fitting a year of hours. Outside check:
 * the IANA time-zone database as Node's built-in Intl (ICU) applies it — for the years 2020–2030
 * the offset a zone's clock shows on each hour must equal our recurring rule's (one rule given by
 * its 2026 dates). Zones are named only as the database's identifiers.
 */
import { clockToStandard, DATE_1904_OFFSET, describeDaylightSaving, fitYearOfHours, fromSerial1900, inDaylightSaving, requireDaylightSaving, standardToClock, toSerial1900 } from '../../../src/core/time/clock';
import { civilToSerial, serialToCivil, utcMsToSerial } from '../../../src/core/time/calendar';
import { expectArgumentError } from '../../support/expectError';

/** One formatter per zone (making one is far dearer than using it). */
const FORMATTERS = new Map<string, Intl.DateTimeFormat>();

/** The zone's clock offset from UTC [h] at a UTC instant, by Intl. */
function intlOffset(zone: string, utcMs: number): number {
  let format = FORMATTERS.get(zone);
  if (format === undefined) {
    format = new Intl.DateTimeFormat('en-GB', { timeZone: zone, hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric' });
    FORMATTERS.set(zone, format);
  }
  const parts = format.formatToParts(new Date(utcMs));
  const get = (t: string) => Number(parts.find((p) => p.type === t)!.value);
  const local = Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute'));
  return Math.round((local - utcMs) / 60000) / 60;
}

const CASES = [
  // zone, standard offset, rule by its 2026 dates (clock readings at the change)
  { zone: 'Europe/Berlin', offset: 1, rule: { start: civilToSerial(2026, 3, 29, 2), end: civilToSerial(2026, 10, 25, 3), shift: 1 } },
  { zone: 'America/Denver', offset: -7, rule: { start: civilToSerial(2026, 3, 8, 2), end: civilToSerial(2026, 11, 1, 2), shift: 1 } },
  { zone: 'Australia/Sydney', offset: 10, rule: { start: civilToSerial(2026, 10, 4, 2), end: civilToSerial(2027, 4, 4, 3), shift: 1 } },
];

/**
 * The database's offset at every hour of a year, read with few Intl calls: once a day, and hour by
 * hour only through a day whose two ends differ (no zone here changes its offset twice in a day).
 */
function intlOffsetsOfYear(zone: string, start: number): number[] {
  const out: number[] = [];
  let before = intlOffset(zone, start - 1800000);
  for (let day = 0; day < 365; day++) {
    const dayStart = start + day * 86400000;
    const after = intlOffset(zone, dayStart + 23 * 3600000 + 1800000);
    for (let h = 0; h < 24; h++) out.push(before === after ? after : intlOffset(zone, dayStart + h * 3600000 + 1800000));
    before = after;
  }
  return out;
}

describe('daylight-saving rules against the IANA time-zone database (Node Intl)', () => {
  test.each(CASES)('$zone: every hour of 2020–2030 has the database clock offset', ({ zone, offset, rule }) => {
    requireDaylightSaving(rule);
    let checked = 0;
    let changes = 0;
    const wrong: string[] = [];
    for (let year = 2020; year <= 2030; year++) {
      const start = Date.UTC(year, 0, 1) - offset * 3600000;
      const database = intlOffsetsOfYear(zone, start);
      for (let h = 0; h < 8760; h += 1) {
        const utcMs = start + h * 3600000 + 1800000;
        const standard = utcMsToSerial(utcMs, offset);
        const ours = offset + (inDaylightSaving(standard, rule) ? rule.shift : 0);
        if (h > 0 && database[h] !== database[h - 1]) changes++;
        if (ours !== database[h] && wrong.length < 5) wrong.push(`${new Date(utcMs).toISOString()}: ours ${ours} h, database ${database[h]} h`);
        checked++;
      }
    }
    // One expectation over the whole run (an expect per hour costs more than the check itself).
    expect(wrong).toEqual([]);
    expect(checked).toBe(11 * 8760);
    // Two changes a year, each found to the hour (the year's ends excepted for the southern zone).
    expect(changes).toBeGreaterThanOrEqual(21);
  });
});

describe('clock and standard time', () => {
  const eu = CASES[0].rule;
  test('clock time is standard time plus the shift inside the period, and converts back', () => {
    const julyNoon = civilToSerial(2026, 7, 1, 12);
    expect(standardToClock(julyNoon, eu)).toBeCloseTo(julyNoon + 1 / 24, 12);
    expect(clockToStandard(julyNoon + 1 / 24, eu)).toBeCloseTo(julyNoon, 12);
    const janNoon = civilToSerial(2026, 1, 15, 12);
    expect(standardToClock(janNoon, eu)).toBe(janNoon);
    expect(clockToStandard(janNoon, undefined)).toBe(janNoon);
  });

  test('the rule is said in the trade\'s words', () => {
    expect(describeDaylightSaving(eu)).toBe('daylight saving +1 h from the last Sunday of March 02:00 to the last Sunday of October 03:00 (clock time), every year');
    expect(describeDaylightSaving(CASES[1].rule)).toMatch(/second Sunday of March 02:00 to the first Sunday of November 02:00/);
  });

  test('an end before the start, a shift out of range or a bad date is refused by name', () => {
    expectArgumentError(() => requireDaylightSaving({ start: civilToSerial(2026, 10, 25), end: civilToSerial(2026, 3, 29), shift: 1 }), 'daylightSaving.end');
    expect(() => requireDaylightSaving({ start: civilToSerial(2026, 10, 25), end: civilToSerial(2026, 3, 29), shift: 1 })).toThrow(/must come after the start of daylight saving/);
    expectArgumentError(() => requireDaylightSaving({ ...eu, shift: 0 }), 'daylightSaving.shift');
    expectArgumentError(() => requireDaylightSaving({ ...eu, shift: 3 }), 'daylightSaving.shift');
    expectArgumentError(() => requireDaylightSaving({ ...eu, start: Number.NaN }), 'daylightSaving.start');
  });
});

describe('the 1904 date system', () => {
  test('serial 0 of the 1904 system is 1 January 1904 (1462 days after the 1900 system\'s count)', () => {
    expect(DATE_1904_OFFSET).toBe(1462);
    expect(serialToCivil(toSerial1900(0, 1904))).toMatchObject({ year: 1904, month: 1, day: 1 });
    expect(fromSerial1900(civilToSerial(2026, 6, 21), 1904)).toBe(civilToSerial(2026, 6, 21) - 1462);
    expect(toSerial1900(45000, 1900)).toBe(45000);
  });
});

describe('fitting a year of hours', () => {
  test('maps rows by date and says which rule it used', () => {
    expect(fitYearOfHours(8760, 2026).rule).toBe('asGiven');
    const leap = fitYearOfHours(8760, 2028);
    expect(leap.rule).toBe('feb29Repeated');
    expect(leap.rowOf[59 * 24 + 5]).toBe(58 * 24 + 5);
    expect(leap.rowOf[8783]).toBe(8759);
    const common = fitYearOfHours(8784, 2026);
    expect(common.rule).toBe('feb29Dropped');
    expect(common.rowOf[59 * 24]).toBe(60 * 24);
    expectArgumentError(() => fitYearOfHours(100, 2026, 'weather.ghi'), 'weather.ghi');
  });
});
