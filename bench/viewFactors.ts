/**
 * View-factor benchmark: the sky, ground and horizon-band view factors of one fully shaded window
 * (overhang, two fins, reveal and a skyline — the window of bench/annual.ts), worked out from
 * scratch each round (the per-geometry cache of src/core/shading/viewFactors.ts is bypassed),
 * against suncalc 2.0.2's `getPosition` for the 8760 hourly instants of a year, in the same run.
 * View factors are per-window constants: this says that a window's diffuse shading costs no more
 * than the bare sun positions of its year. Ratio key: `viewfactors_vs_suncalc_annual`.
 */
import { viewFactorsUnchecked } from '../src/core/shading/viewFactors';
import type { Shading } from '../src/core/shading/types';
import { type BenchSection, consume, ratio, timeInterleaved, suncalcJob } from './harness';

const SITE = { latitude: 40, longitude: -105 };
const WINDOW = { width: 2, height: 1.5 };
const SURFACE_AZIMUTH = 200;
const SHADING: Shading = {
  overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.3 },
  leftFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
  rightFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
  revealDepth: 0.1,
  skyline: [5, 10, 20, 15, 0, 0, 5, 30],
};

export function viewFactorsBench(): BenchSection {
  const start = Date.UTC(2026, 0, 1, 7, 30); // 00:30 local standard time (UTC−7)
  const dates = Array.from({ length: 8760 }, (_, i) => new Date(start + i * 3_600_000));
  const [ours, suncalc] = timeInterleaved([
    {
      label: 'view factors of one fully shaded window (sky, ground, horizon band)',
      operations: 1,
      work: () => consume(viewFactorsUnchecked(WINDOW, SHADING, SURFACE_AZIMUTH).sky),
    },
    suncalcJob(dates, SITE),
  ]);
  return {
    title: "View factors of one shaded window (once per window) vs a year's bare sun positions",
    timings: [ours, suncalc],
    ratios: { viewfactors_vs_suncalc_annual: ratio(ours, suncalc) },
  };
}
