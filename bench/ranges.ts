/**
 * Worksheet ranges benchmark: 100,000 SUNALTITUDE cells (hourly date-times from 2026, one site)
 * through the custom-function adapter exactly as Excel calls it — the handler built by
 * src/functions/adapter.ts, arguments as matrices — once as a column (100,000 × 1) and once as a
 * row (1 × 100,000), against suncalc 2.0.2's `getPosition` for the same 100,000 instants, in the
 * same run. The sun's daily nodes (src/core/sun/sunNodes.ts) are dropped before every round, so
 * each round pays for them as a first recalculation would.
 * Ratio keys: `column_vs_row_100k` (a column costs what a row costs: each cell is read once) and
 * `range_100k_vs_suncalc` (the whole worksheet path against bare positions).
 */
import { makeHandler, type CustomFunctionsRuntime } from '../src/functions/adapter';
import { clearSunNodes } from '../src/core/sun/sunNodes';
import { civilToSerial, serialToUtcMs } from '../src/core/time/calendar';
import { findFunction } from '../src/registry';
import { type BenchSection, consume, ratio, timeInterleaved } from './harness';

// eslint-disable-next-line @typescript-eslint/no-require-imports
const SunCalc = require('suncalc') as { getPosition(date: Date, lat: number, lng: number): { altitude: number } };

const CELLS = 100_000;
const SITE = { latitude: 40, longitude: -105, utcOffset: -7 };

/** A stand-in for Excel's CustomFunctions runtime: the adapter needs only its error class. */
class BenchError {
  constructor(
    readonly code: string,
    readonly message?: string,
  ) {}
}
const RUNTIME: CustomFunctionsRuntime = { Error: BenchError as never, ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A' } };

export function rangesBench(): BenchSection {
  const handler = makeHandler(findFunction('SUNALTITUDE')!, RUNTIME);
  const start = civilToSerial(2026, 1, 1);
  const serials = Array.from({ length: CELLS }, (_, i) => start + (i + 0.5) / 24);
  const column = serials.map((s) => [s]);
  const row = [serials];
  const dates = serials.map((s) => new Date(serialToUtcMs(s, SITE.utcOffset)));
  const lat = [[SITE.latitude]];
  const lon = [[SITE.longitude]];
  const offset = [[SITE.utcOffset]];
  const sumOf = (out: unknown[][]): number => (out[0][0] as number) + (out[out.length - 1][out[out.length - 1].length - 1] as number);

  const [asColumn, asRow, suncalc] = timeInterleaved(
    [
      {
        label: `SUNALTITUDE through the adapter, a column of ${CELLS} date-times`,
        operations: CELLS,
        work: () => {
          clearSunNodes();
          consume(sumOf(handler(column, lat, lon, offset)));
        },
      },
      {
        label: `SUNALTITUDE through the adapter, a row of ${CELLS} date-times`,
        operations: CELLS,
        work: () => {
          clearSunNodes();
          consume(sumOf(handler(row, lat, lon, offset)));
        },
      },
      {
        label: `suncalc 2.0.2 getPosition (${CELLS} instants)`,
        operations: CELLS,
        work: () => {
          let s = 0;
          for (let i = 0; i < CELLS; i++) s += SunCalc.getPosition(dates[i], SITE.latitude, SITE.longitude).altitude;
          consume(s);
        },
      },
    ],
    21,
    3,
  );

  return {
    title: 'Worksheet ranges: 100,000 cells through the custom-function adapter',
    timings: [asColumn, asRow, suncalc],
    ratios: {
      column_vs_row_100k: ratio(asColumn, asRow),
      range_100k_vs_suncalc: ratio(asColumn, suncalc),
    },
  };
}
