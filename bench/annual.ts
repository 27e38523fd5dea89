/**
 * Annual series benchmark: the full hourly year of one window — overhang, two fins, reveal and a
 * skyline, Perez 1990 sky, angle-dependent SHGC, supplied DNI/DHI arrays — against suncalc 2.0.2's
 * bare `getPosition` for the same 8760 instants, in the same run. The weather arrays are made once
 * from the ASHRAE clear-sky model outside the timed part.
 *
 * Two lines: `window_annual_vs_suncalc` is `annualSeries` as a workbook, the pane or a schedule
 * calls it again and again for windows of one site — the site's sun path, weather and sky
 * brightness kept from the call before (src/core/gain/sharedYear.ts), the window's own angles,
 * shading and gain worked out; `window_annual_cold_vs_suncalc` is the first window of a site, with
 * the year's sun path, weather and sky brightness worked out too.
 */
import { annualOfPrepared, annualSeries } from '../src/core/gain/annual';
import { prepareWindow } from '../src/core/gain/prepared';
import { ashraeClearSky } from '../src/core/sky/clearSky';
import { annualSunPath } from '../src/core/sun/sunPath';
import { serialToUtcMs } from '../src/core/time/calendar';
import type { WindowSpec } from '../src/core/gain/window';
import { type BenchSection, consume, ratio, timeInterleaved, suncalcJob } from './harness';

const YEAR = 2026;
const SITE = { latitude: 40, longitude: -105, utcOffset: -7, elevation: 1600 };

function benchSpec(): WindowSpec {
  const path = annualSunPath(YEAR, SITE);
  const dni = new Float64Array(path.hours);
  const dhi = new Float64Array(path.hours);
  for (let i = 0; i < path.hours; i++) {
    const c = ashraeClearSky(path.altitude[i], Math.floor(i / 24) + 1, 0.4, 2.3);
    dni[i] = c.dni;
    dhi[i] = c.dhi;
  }
  return {
    name: 'bench window',
    site: SITE,
    surfaceAzimuth: 200,
    surfaceTilt: 90,
    width: 2,
    height: 1.5,
    frameFraction: 0.1,
    glazing: { shgc: 0.6, panes: 2, radiantFraction: 0.8 },
    shading: {
      overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.3 },
      leftFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
      rightFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
      revealDepth: 0.1,
      skyline: [5, 10, 20, 15, 0, 0, 5, 30],
    },
    groundAlbedo: 0.2,
    skyModel: 'perez1990',
    weather: { kind: 'measured', dni, dhi },
    year: YEAR,
  };
}

export function annualBench(): BenchSection {
  const spec = benchSpec();
  const hours = spec.weather.kind === 'measured' ? spec.weather.dni.length : 8760;
  const stamps = annualSunPath(YEAR, SITE).stampSerial;
  const dates = Array.from(stamps, (s) => new Date(serialToUtcMs(s - 1 / 48, SITE.utcOffset)));

  const [ours, cold, suncalc] = timeInterleaved([
    {
      label: `window annual series, shaded, Perez, measured (${hours} h)`,
      operations: hours,
      work: () => consume(annualSeries(spec).gain[4000]),
    },
    {
      label: `  the same, first window of its site (sun path worked out)`,
      operations: hours,
      work: () => consume(annualOfPrepared(prepareWindow(spec)).gain[4000]),
    },
    suncalcJob(dates, SITE),
  ]);
  return {
    title: 'Annual window series (full hourly gain of one shaded window) vs bare sun positions',
    timings: [ours, cold, suncalc],
    ratios: { window_annual_vs_suncalc: ratio(ours, suncalc), window_annual_cold_vs_suncalc: ratio(cold, suncalc) },
  };
}
