/**
 * Benchmark harness: median wall time of repeated runs, in one process, so that ratios against peer
 * libraries measured in the same run are comparable. Each bench/<area>.ts exports a
 * `BenchSection` factory; bench/run.ts prints them all and ends with one JSON line of ratios.
 */
import { performance } from 'node:perf_hooks';

export interface Timing {
  /** What was timed, e.g. "sun position, direct SPA (8760 instants)". */
  label: string;
  /** Median time of one run of the work [ms]. */
  medianMs: number;
  /** Evaluations per run, to print µs per evaluation. */
  operations: number;
}

export interface BenchSection {
  title: string;
  timings: Timing[];
  /** Named ratios ours / theirs (median times), merged into the final JSON line. */
  ratios: Record<string, number>;
}

/** Sink that keeps results alive so the optimiser cannot drop the timed work. */
export let blackhole = 0;
export function consume(x: number): void {
  blackhole += x;
}

/**
 * Times `work` (one whole run, e.g. 8760 evaluations) `repeats` times after `warmup` untimed runs and
 * returns the median.
 */
export function timeIt(label: string, operations: number, work: () => void, repeats = 21, warmup = 5): Timing {
  for (let i = 0; i < warmup; i++) work();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    work();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { label, medianMs: times[Math.floor(times.length / 2)], operations };
}

/** One piece of work to time: what it is, evaluations per run, and the run. */
export interface Job {
  label: string;
  operations: number;
  work: () => void;
}

/**
 * Times several jobs INTERLEAVED: each round runs every job once (the starting job rotates from
 * round to round), so that a change in the machine's load during the measurement affects all of
 * them alike; returns each job's median. Used for every ratio against a peer library.
 */
export function timeInterleaved(jobs: readonly Job[], repeats = 101, warmup = 11): Timing[] {
  const times: number[][] = jobs.map(() => []);
  for (let round = 0; round < warmup + repeats; round++) {
    for (let k = 0; k < jobs.length; k++) {
      const j = (round + k) % jobs.length;
      const t0 = performance.now();
      jobs[j].work();
      const dt = performance.now() - t0;
      if (round >= warmup) times[j].push(dt);
    }
  }
  return jobs.map((job, j) => {
    const sorted = times[j].sort((a, b) => a - b);
    return { label: job.label, medianMs: sorted[Math.floor(sorted.length / 2)], operations: job.operations };
  });
}

/** ratio = ours / theirs of median times, rounded to 3 significant digits. */
export function ratio(ours: Timing, theirs: Timing): number {
  return Number((ours.medianMs / theirs.medianMs).toPrecision(3));
}

// eslint-disable-next-line @typescript-eslint/no-require-imports
const SunCalc = require('suncalc') as { getPosition(date: Date, lat: number, lng: number): { altitude: number } };

/**
 * The peer job most ratios divide by: suncalc 2.0.2's bare `getPosition` at each of `dates` for a
 * site, the altitudes summed so that none of the work can be left out.
 */
export function suncalcJob(dates: readonly Date[], site: { latitude: number; longitude: number }): Job {
  return {
    label: `suncalc 2.0.2 getPosition (${dates.length} instants)`,
    operations: dates.length,
    work: () => {
      let acc = 0;
      for (const d of dates) acc += SunCalc.getPosition(d, site.latitude, site.longitude).altitude;
      consume(acc);
    },
  };
}
