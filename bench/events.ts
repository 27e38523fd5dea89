/**
 * Sun events benchmark: sunrise, solar noon and sunset of the 365 local days of 2026 at one site
 * (an example location, 40° N 105° W, UTC−7), as a column of dates in a workbook asks for them:
 * - ours: `sunEvents` once per day (the three events of the day), the sun's nodes
 *   (src/core/sun/sunNodes.ts) dropped before every round, as a first recalculation pays for them;
 * - suncalc 2.0.2 `getTimes` (its low-precision model; it also gives twilights);
 * - astronomy-engine 2.1.19 `SearchRiseSet` (rise, set) and `SearchHourAngle` (transit) per day.
 * Ratio keys `events_year_vs_suncalc`, `events_year_vs_astronomy_engine` (ours / theirs, medians).
 */
import * as Astronomy from 'astronomy-engine';
import { sunEvents } from '../src/core/sun/events';
import { clearSunNodes } from '../src/core/sun/sunNodes';
import { civilToSerial, serialToUtcMs } from '../src/core/time/calendar';
import { type BenchSection, consume, ratio, timeInterleaved } from './harness';

// eslint-disable-next-line @typescript-eslint/no-require-imports
const SunCalc = require('suncalc') as { getTimes(date: Date, lat: number, lng: number): { sunrise: Date; solarNoon: Date; sunset: Date } };

const SITE = { latitude: 40, longitude: -105, utcOffset: -7 };
const DAYS = 365;

export function eventsBench(): BenchSection {
  const first = civilToSerial(2026, 1, 1);
  const serials = Array.from({ length: DAYS }, (_, i) => first + i);
  const dayStarts = serials.map((s) => serialToUtcMs(s, SITE.utcOffset));
  // suncalc takes any instant of the day; its local noon keeps it on the local day.
  const noons = dayStarts.map((ms) => new Date(ms + 43_200_000));
  const observer = new Astronomy.Observer(SITE.latitude, SITE.longitude, 0);

  const [ours, suncalc, astronomy] = timeInterleaved(
    [
      {
        label: `sunEvents, ${DAYS} days (nodes cold)`,
        operations: DAYS,
        work: () => {
          clearSunNodes();
          let s = 0;
          for (const serial of serials) s += sunEvents(serial, SITE.latitude, SITE.longitude, SITE.utcOffset).solarNoon;
          consume(s);
        },
      },
      {
        label: `suncalc 2.0.2 getTimes (${DAYS} days)`,
        operations: DAYS,
        work: () => {
          let s = 0;
          for (const d of noons) s += SunCalc.getTimes(d, SITE.latitude, SITE.longitude).solarNoon.getTime();
          consume(s);
        },
      },
      {
        label: `astronomy-engine 2.1.19 rise, set, transit (${DAYS} days)`,
        operations: DAYS,
        work: () => {
          let s = 0;
          for (const ms of dayStarts) {
            const start = new Date(ms);
            s += Astronomy.SearchRiseSet(Astronomy.Body.Sun, observer, 1, start, 1)?.ut ?? 0;
            s += Astronomy.SearchRiseSet(Astronomy.Body.Sun, observer, -1, start, 1)?.ut ?? 0;
            s += Astronomy.SearchHourAngle(Astronomy.Body.Sun, observer, 0, start, 1).time.ut;
          }
          consume(s);
        },
      },
    ],
    31,
    5,
  );

  return {
    title: 'Sun events: a year of days at one site',
    timings: [ours, suncalc, astronomy],
    ratios: {
      events_year_vs_suncalc: ratio(ours, suncalc),
      events_year_vs_astronomy_engine: ratio(ours, astronomy),
    },
  };
}
