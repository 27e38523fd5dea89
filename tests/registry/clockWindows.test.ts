/**
 * The workbook's clock in the window functions: the clock range given as the trailing argument is
 * the window's own daylight-saving and date-system fields written once; under a rule the hourly
 * year's stamps are clock readings — the IANA time-zone database's (Node Intl) for the instant of
 * each standard stamp — and the one-hour gain at each of them is that row; in the 1904 date system
 * every serial going in and coming out is 1462 days lower. Refusals name the field as written.
 */
import { civilToSerial, serialToUtcMs, utcMsToSerial } from '../../src/core/time/calendar';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import type { RawArg } from '../../src/registry/types';

const call = (name: string, args: RawArg[]) => applyFunction(findFunction(name)!, args);

/** An invented window at an example location near Denver, under an invented clear sky. */
const WINDOW: [string, number | string][] = [
  ['year', 2026],
  ['latitude', 39.7],
  ['longitude', -105],
  ['utcOffset', -7],
  ['surfaceAzimuth', 250],
  ['width', 2],
  ['height', 1.5],
  ['shgc', 0.5],
  ['overhangProjection', 0.5],
  ['tauB', 0.4],
  ['tauD', 2.3],
];
/** The zone's rule by its 2026 dates (second Sunday of March 02:00, first Sunday of November 02:00). */
const RULE: [string, number | string][] = [
  ['daylightSavingStart', '2026-03-08T02:00'],
  ['daylightSavingEnd', '2026-11-01T02:00'],
];
const CLOCK: RawArg = RULE;

const FORMAT = new Intl.DateTimeFormat('en-GB', { timeZone: 'America/Denver', hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric' });

/** America/Denver's clock reading at a UTC instant, by Intl. */
function denverClock(utcMs: number): number {
  const parts = FORMAT.formatToParts(new Date(utcMs));
  const get = (t: string) => Number(parts.find((p) => p.type === t)!.value);
  return utcMsToSerial(Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute')), 0);
}

describe('the clock range in the window functions', () => {
  const onClock = call('SOLARGAINYEAR', [WINDOW, [['stamp', 'gain']], null, null, null, null, CLOCK]);
  const inWindow = call('SOLARGAINYEAR', [[...WINDOW, ...RULE], [['stamp', 'gain']]]);

  test("the clock argument is the window's own rule written once", () => {
    expect(onClock).toEqual(inWindow);
  });

  test("under the rule the year's stamps are the IANA database's clock readings (America/Denver), hour by hour", () => {
    const standard = call('SOLARGAINYEAR', [WINDOW, [['stamp']]]);
    const wrong: string[] = [];
    let shifted = 0;
    standard.forEach((r, i) => {
      // an hour-ending stamp moves with its hour's middle
      const mid = Math.round(serialToUtcMs((r[0] as number) - 1 / 48, -7) / 1000) * 1000;
      const expected = denverClock(mid) + 1 / 48;
      if (Math.abs((onClock[i][0] as number) - expected) > 1e-6 && wrong.length < 5) wrong.push(`${i}: ${String(onClock[i][0])} vs ${expected}`);
      if ((onClock[i][0] as number) - (r[0] as number) > 1 / 48) shifted++;
    });
    expect(wrong).toEqual([]);
    expect(shifted).toBeGreaterThan(5000);
  });

  test('SOLARGAIN at each clock stamp is that row of the year (the repeated hour of November read as its first)', () => {
    const stamps = onClock.map((r) => [r[0]]) as RawArg;
    const oneHour = call('SOLARGAIN', [WINDOW, stamps, null, null, CLOCK]);
    const repeatedAt = onClock.findIndex((r, i) => i > 0 && Math.abs((r[0] as number) - (onClock[i - 1][0] as number)) < 1e-9);
    expect(repeatedAt).toBeGreaterThan(0);
    const differ = oneHour.flatMap((r, i) => (i === repeatedAt || r[0] === onClock[i][1] ? [] : [`${i}`]));
    expect(differ).toEqual([]);
    expect(oneHour[repeatedAt][0]).toBe(onClock[repeatedAt - 1][1]);
  });

  test('the positional WINDOWGAIN takes the same clock at its end', () => {
    const t = civilToSerial(2026, 7, 21, 15);
    const args: RawArg[] = [t, 39.7, -105, -7, 250, 2, 1.5, 0.5, null, null, 0.4, 2.3, 2, 0, 0.2, 'perez1990', 90, 1, 0.5, null, null, null, null, null, null, null, 'hourEnding'];
    const positional = call('WINDOWGAIN', [...args, CLOCK]);
    expect(positional[0][0]).toBe(call('SOLARGAIN', [[...WINDOW, ['timeConvention', 'hourEnding']], t, null, null, CLOCK])[0][0]);
    expect(positional[0][0]).not.toBe(call('WINDOWGAIN', args)[0][0]);
  });

  test('a window rule that differs from the clock is refused, naming the window field as written, with both values', () => {
    const out = call('SOLARGAIN', [[...WINDOW, ['dstEnd', '2026-10-25T02:00'], ['dstStart', '2026-03-08T02:00']], civilToSerial(2026, 7, 1, 12), null, null, CLOCK]);
    expect(String(out[0][0])).toMatch(/^SunpaneError: window dstEnd = "2026-10-25T02:00" is not allowed: differs from the clock's daylightSavingEnd \(2026-11-01T02:00\)/);
  });
});

describe('the 1904 date system in the window functions', () => {
  const t = civilToSerial(2026, 7, 21, 13);
  const w1904: RawArg = [...WINDOW, ['dateSystem', 1904]];

  test("a window's own dateSystem field reads the date-time argument and the rule's serials in it", () => {
    const ruleSerials: [string, number][] = [['dstStart', civilToSerial(2026, 3, 8, 2) - 1462], ['dstEnd', civilToSerial(2026, 11, 1, 2) - 1462]];
    expect(call('SOLARGAIN', [[...(w1904 as [string, number][]), ...ruleSerials], t - 1462])).toEqual(call('SOLARGAIN', [[...WINDOW, ...RULE], t]));
  });

  test('the clock\'s dateSystem: stamps and step date-times come back 1462 lower, the watts unchanged', () => {
    const clock1904: RawArg = [...RULE, ['dateSystem', 1904]];
    const y1900 = call('SOLARGAINYEAR', [WINDOW, [['stamp', 'gain']], null, null, null, null, CLOCK]);
    const y1904 = call('SOLARGAINYEAR', [WINDOW, [['stamp', 'gain']], null, null, null, null, clock1904]);
    expect(y1904.every((r, i) => Math.abs((y1900[i][0] as number) - (r[0] as number) - 1462) < 1e-9 && r[1] === y1900[i][1])).toBe(true);
    const s1900 = call('SOLARGAINSTEPS', [WINDOW, t, null, null, true, CLOCK]);
    const s1904 = call('SOLARGAINSTEPS', [WINDOW, t - 1462, null, null, true, clock1904]);
    const dated = s1904.filter((r) => r[3] === 'date-time');
    expect(dated.length).toBe(2);
    s1904.forEach((r, i) => {
      if (r[3] === 'date-time') expect((s1900[i][2] as number) - (r[2] as number)).toBeCloseTo(1462, 9);
      else expect(r).toEqual(s1900[i]);
    });
  });

  test('a clock and a window that name different date systems, or two windows that do, are refused', () => {
    const out = call('SOLARGAIN', [[...WINDOW, ['Date system', 1900]], t - 1462, null, null, [['dateSystem', 1904]]]);
    expect(String(out[0][0])).toMatch(/^SunpaneError: window Date system = 1900 is not allowed: differs from the clock's dateSystem \(1904\)/);
    const two: RawArg = [
      ['latitude', 'longitude', 'utcOffset', 'surfaceAzimuth', 'width', 'height', 'shgc', 'tauB', 'tauD', 'dateSystem'],
      [39.7, -105, -7, 180, 2, 1.5, 0.5, 0.4, 2.3, 1900],
      [39.7, -105, -7, 180, 2, 1.5, 0.5, 0.4, 2.3, 1904],
    ];
    expect(() => call('SOLARGAIN', [two, t])).toThrow(/window dateSystem = 1904 is not allowed: must be the same for every window of one call/);
  });
});
