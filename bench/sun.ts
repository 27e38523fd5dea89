/**
 * Sun-position benchmark: the same 8760 hourly instants of 2025 at one site (the NREL SPA report's
 * example site, 39.74° N 105.18° W, UTC−7, 1830 m), mid-hour, through
 * - our direct NREL SPA (`sunPosition`, one call per hour),
 * - our annual fast path (`annualSunPath`, slow terms once a day),
 * - suncalc 2.0.2 `getPosition` (low-precision model),
 * - astronomy-engine 2.1.19 `Equator(Body.Sun, time, observer, true, true)` + `Horizon(..., 'normal')`.
 * Ratios are ours / theirs of median times (below 1: we are faster).
 */
import * as Astronomy from 'astronomy-engine';
import { annualSunPath } from '../src/core/sun/sunPath';
import { sunPosition } from '../src/core/sun/spa';
import { civilToSerial, serialToUtcMs } from '../src/core/time/calendar';
import type { Site } from '../src/core/sun/site';
import { type BenchSection, consume, ratio, timeInterleaved } from './harness';

// eslint-disable-next-line @typescript-eslint/no-require-imports
const SunCalc = require('suncalc') as { getPosition(date: Date, lat: number, lng: number): { altitude: number; azimuth: number } };

const SITE: Site = { latitude: 39.742476, longitude: -105.1786, utcOffset: -7, elevation: 1830 };
const YEAR = 2025;

export function sunBench(): BenchSection {
  const hours = 8760;
  const start = serialToUtcMs(civilToSerial(YEAR, 1, 1), SITE.utcOffset);
  const instants = Float64Array.from({ length: hours }, (_, i) => start + (i + 0.5) * 3_600_000);
  const dates = Array.from(instants, (ms) => new Date(ms));
  const observer = new Astronomy.Observer(SITE.latitude, SITE.longitude, SITE.elevation ?? 0);
  const options = { elevation: SITE.elevation };

  const [direct, annual, suncalc, astronomy] = timeInterleaved([
    {
      label: `sun position, direct SPA (${hours} instants)`,
      operations: hours,
      work: () => {
        for (let i = 0; i < hours; i++) consume(sunPosition(instants[i], SITE.latitude, SITE.longitude, options).altitude);
      },
    },
    { label: `sun position, annual fast path (${hours} hours)`, operations: hours, work: () => consume(annualSunPath(YEAR, SITE).altitude[4000]) },
    {
      label: `suncalc 2.0.2 getPosition (${hours} instants)`,
      operations: hours,
      work: () => {
        for (let i = 0; i < hours; i++) consume(SunCalc.getPosition(dates[i], SITE.latitude, SITE.longitude).altitude);
      },
    },
    {
      label: `astronomy-engine 2.1.19 Equator + Horizon (${hours} instants)`,
      operations: hours,
      work: () => {
        for (let i = 0; i < hours; i++) {
          const eq = Astronomy.Equator(Astronomy.Body.Sun, dates[i], observer, true, true);
          consume(Astronomy.Horizon(dates[i], observer, eq.ra, eq.dec, 'normal').altitude);
        }
      },
    },
  ]);

  return {
    title: 'Sun position: one year of hours at one site',
    timings: [direct, annual, suncalc, astronomy],
    ratios: {
      sun_direct_vs_suncalc: ratio(direct, suncalc),
      sun_annual_vs_suncalc: ratio(annual, suncalc),
      sun_direct_vs_astronomy_engine: ratio(direct, astronomy),
    },
  };
}
