/**
 * Sources:
 * - the IANA time-zone database as Node's built-in Intl (ICU) applies it: which clock reading a zone
 *   shows at each UTC instant (zones named only by their database identifiers);
 * - astronomy-engine 2.1.19 (npm, pinned in package.json): `SearchRiseSet` for the UTC instant of
 *   sunrise and sunset — produced by a named npm library.
 *
 * The sun functions given a clock range (a daylight-saving rule, by its 2026 dates) read date-times
 * on the clock: at every hour of 2026 in three zones, the zone's own clock reading (from Intl) given
 * to SUNALTITUDE, SUNAZIMUTH and INCIDENCEAT with the clock must give the sun at that UTC instant
 * (the same functions given the standard-time reading, worked out from the instant and the zone's
 * standard offset, without a clock). In the hour the clocks go back a reading occurs twice; the
 * second one (the function takes the first, docs/conventions.md) is left out and counted.
 *
 * SUNRISE and SUNSET with the clock give clock readings: every third day of 2026 and the days around
 * each change of the clocks, astronomy-engine's UTC
 * instant of the event turned into the zone's clock reading by Intl must match within 60 s. The
 * SPA's and astronomy-engine's rise definitions differ by seconds (tests/reference/astronomy-engine-sun.test.ts
 * holds them to 0.012° of altitude); 60 s is far below the hour a wrong clock would make.
 *
 * The sites are example locations near each zone's main city.
 */
import * as Astronomy from 'astronomy-engine';
import { civilToSerial, serialToUtcMs, utcMsToSerial } from '../../src/core/time/calendar';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import type { RawArg } from '../../src/registry/types';

const call = (name: string, args: RawArg[]) => applyFunction(findFunction(name)!, args);

const ZONES = [
  { zone: 'Europe/Berlin', offset: 1, latitude: 52.5, longitude: 13.4, start: civilToSerial(2026, 3, 29, 2), end: civilToSerial(2026, 10, 25, 3) },
  { zone: 'America/Denver', offset: -7, latitude: 39.7, longitude: -105, start: civilToSerial(2026, 3, 8, 2), end: civilToSerial(2026, 11, 1, 2) },
  { zone: 'Australia/Sydney', offset: 10, latitude: -33.9, longitude: 151.2, start: civilToSerial(2026, 10, 4, 2), end: civilToSerial(2027, 4, 4, 3) },
];

const FORMATS = new Map<string, Intl.DateTimeFormat>();

/** The zone's clock reading at a UTC instant, as a 1900-system serial, by Intl. */
function clockReading(zone: string, utcMs: number): number {
  let format = FORMATS.get(zone);
  if (format === undefined) {
    format = new Intl.DateTimeFormat('en-GB', { timeZone: zone, hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric', second: 'numeric' });
    FORMATS.set(zone, format);
  }
  const parts = format.formatToParts(new Date(utcMs));
  const get = (t: string) => Number(parts.find((p) => p.type === t)!.value);
  return utcMsToSerial(Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute'), get('second')), 0);
}

describe.each(ZONES)('the sun on the clock of $zone (IANA database by Intl)', (z) => {
  const clock: RawArg = [
    ['daylightSavingStart', z.start],
    ['daylightSavingEnd', z.end],
    ['daylightSavingShift', 1],
  ];
  const yearStart = Date.UTC(2026, 0, 1) - z.offset * 3_600_000;
  const clockCol: number[][] = [];
  const standardCol: number[][] = [];
  const seen = new Set<number>();
  let repeated = 0;
  let shifted = 0;
  for (let h = 0; h < 8760; h++) {
    const utcMs = yearStart + h * 3_600_000 + 1_800_000;
    const reading = clockReading(z.zone, utcMs);
    const key = Math.round(reading * 1440);
    if (seen.has(key)) {
      repeated++;
      continue;
    }
    seen.add(key);
    const standard = utcMsToSerial(utcMs, z.offset);
    if (Math.abs(reading - standard) > 1 / 48) shifted++;
    clockCol.push([reading]);
    standardCol.push([standard]);
  }

  test('the database moves the clock for part of the year, and one reading a year repeats', () => {
    // Berlin and Denver: summer; Sydney: both ends of the year. One repeated hour in 2026 each.
    expect(shifted).toBeGreaterThan(2500);
    expect(repeated).toBe(1);
    expect(clockCol).toHaveLength(8759);
  });

  test.each(['SUNALTITUDE', 'SUNAZIMUTH'])('%s at the clock reading is the sun at that instant, every hour of 2026', (name) => {
    const onClock = call(name, [clockCol, z.latitude, z.longitude, z.offset, null, null, null, null, 'instant', clock]);
    const standard = call(name, [standardCol, z.latitude, z.longitude, z.offset, null, null, null, null, 'instant']);
    const wrong = onClock.flatMap((r, i) => (Math.abs((r[0] as number) - (standard[i][0] as number)) < 1e-6 ? [] : [`${clockCol[i][0]}: ${String(r[0])} vs ${String(standard[i][0])}`]));
    expect(wrong.slice(0, 5)).toEqual([]);
    // and without the clock the same readings are an hour off for the shifted part of the year
    const ignored = call(name, [clockCol, z.latitude, z.longitude, z.offset, null, null, null, null, 'instant']);
    expect(ignored.filter((r, i) => Math.abs((r[0] as number) - (standard[i][0] as number)) > 1e-3).length).toBeGreaterThan(2500);
  });

  test('INCIDENCEAT (the clock after its twelve other arguments) reads the same instant', () => {
    const onClock = call('INCIDENCEAT', [clockCol, z.latitude, z.longitude, z.offset, 180, 90, null, null, null, null, 'instant', clock]);
    const standard = call('INCIDENCEAT', [standardCol, z.latitude, z.longitude, z.offset, 180, 90, null, null, null, null, 'instant']);
    expect(onClock.filter((r, i) => Math.abs((r[0] as number) - (standard[i][0] as number)) >= 1e-6)).toEqual([]);
  });

  test.each([
    ['SUNRISE', 1],
    ['SUNSET', -1],
  ] as const)('%s on each clock day of 2026 is astronomy-engine 2.1.19\'s event read on the zone\'s clock, within 60 s (every third day and the days of the changes)', (name, direction) => {
    // every third day, and each day from two before to two after a change of the clocks
    const near = (d: number) => [z.start, z.end].some((c) => Math.abs(d - Math.floor(c)) <= 2 || Math.abs(d - Math.floor(c) + 365) <= 2);
    const days = Array.from({ length: 365 }, (_, d) => civilToSerial(2026, 1, 1) + d).filter((d, k) => k % 3 === 0 || near(d)).map((d) => [d]);
    const ours = call(name, [days, z.latitude, z.longitude, z.offset, null, clock]);
    const observer = new Astronomy.Observer(z.latitude, z.longitude, 0);
    let worst = 0;
    let compared = 0;
    days.forEach(([day], i) => {
      // the event after the clock day's midnight (at most 2 h before the standard one)
      const from = serialToUtcMs(day, z.offset) - 2 * 3_600_000;
      const event = Astronomy.SearchRiseSet(Astronomy.Body.Sun, observer, direction, new Date(from), 2);
      if (event === null) return;
      const reading = clockReading(z.zone, event.date.getTime());
      if (Math.floor(reading) !== day) return;
      const v = ours[i][0];
      expect(typeof v).toBe('number');
      worst = Math.max(worst, Math.abs((v as number) - reading) * 86_400);
      compared++;
    });
    expect(compared).toBe(days.length);
    expect(days.length).toBeGreaterThanOrEqual(125);
    if (process.env.CLOCK_REPORT) process.stdout.write(`${z.zone} ${name}: ${compared} days, worst ${worst.toFixed(1)} s\n`);
    expect(worst).toBeLessThan(60);
  });
});
