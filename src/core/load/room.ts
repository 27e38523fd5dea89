/**
 * The room behind a window, as the cooling load needs it: its solar and non-solar radiant time
 * series, from the window's `room` — a construction whose illustrative series Sunpane ships
 * (src/core/load/rtsSeries.ts), or the room's own two series — and the year's cooling load by part
 * with its peak.
 */
import { SunpaneError } from '../common';
import type { AnnualSeries, WindowSpec } from '../gain';
import { requireRadiantTimeFactors } from './rts';
import { CONSTRUCTIONS, illustrativeRadiantTimeSeries } from './rtsSeries';
import { type RoomSeries, windowCoolingLoad, type WindowLoad } from './windowLoad';

/**
 * The room series of a window, checked.
 * @param spec - the window; its `room` may be absent
 * @returns the solar and non-solar series with where they come from, or undefined when the window
 *   names no room (gains only)
 * @throws SunpaneError naming `room.construction` (unknown; or given with series), `room.solar` or
 *   `room.nonSolar` (one without the other; a count, value or sum out of range)
 */
export function windowRoomSeries(spec: WindowSpec): RoomSeries | undefined {
  const room = spec.room;
  if (room === undefined) return undefined;
  if (room === null || typeof room !== 'object') throw new SunpaneError('room', room, 'must be an object with a construction, or a solar and a non-solar series');
  const hasSeries = room.solar !== undefined || room.nonSolar !== undefined;
  if (room.construction !== undefined) {
    if (hasSeries) {
      throw new SunpaneError('room.construction', room.construction, "cannot be given with the room's own series: give a construction (its illustrative series) or the room's own solar and non-solar series");
    }
    if (!CONSTRUCTIONS.includes(room.construction as (typeof CONSTRUCTIONS)[number])) {
      throw new SunpaneError('room.construction', room.construction, `must be one of ${CONSTRUCTIONS.map((c) => `"${c}"`).join(', ')} (illustrative series), or give the room's own solar and non-solar series`);
    }
    return illustrativeRadiantTimeSeries(room.construction);
  }
  if (room.solar === undefined) throw new SunpaneError('room.solar', undefined, 'must be given with the non-solar series: the cooling load needs both (24 factors each, summing to 1)');
  if (room.nonSolar === undefined) throw new SunpaneError('room.nonSolar', undefined, 'must be given with the solar series: the cooling load needs both (24 factors each, summing to 1)');
  return {
    solar: requireRadiantTimeFactors(room.solar, 'room.solar'),
    nonSolar: requireRadiantTimeFactors(room.nonSolar, 'room.nonSolar'),
    source: "the room's own radiant time series",
  };
}

/**
 * The cooling load of each hour of a window's year by part ({@link windowCoolingLoad} over the
 * series' beam, diffuse and conduction gains, its radiant fractions and interior shade). The year
 * is taken as repeating: 1 January's first hours receive the radiant tail of 31 December's gains.
 * A missing hour counts as zero gain; its load is still worked out (callers show it as missing).
 * @param series - from annualSeries
 * @param room - the room's solar and non-solar series
 * @returns beam, diffuse, conduction and total load of every hour [W]
 */
export function annualLoadParts(series: AnnualSeries, room: RoomSeries): WindowLoad {
  return windowCoolingLoad({ beam: series.gainBeam, diffuse: series.gainDiffuse, conduction: series.conduction }, room, series.radiantFractions, series.interiorShade);
}

/** The year's largest cooling load and when. */
export interface LoadPeak {
  /** Largest hourly cooling load over the hours with weather [W] (0 for a year without gain). */
  peakLoadW: number;
  /** Row of the peak (the first such hour on ties). */
  peakLoadRow: number;
  /** Local standard-time serial of the peak row's stamp (as the series stamps its rows). */
  peakLoadStamp: number;
}

/**
 * The peak of a year's cooling load, skipping hours without weather.
 * @param series - the series the load was worked out from (stamps and missing hours)
 * @param load - total cooling load of every hour [W]
 */
export function loadPeak(series: AnnualSeries, load: ArrayLike<number>): LoadPeak {
  let peak = 0;
  let row = 0;
  for (let i = 0; i < series.hours; i++) {
    if (series.missing[i] === 1) continue;
    if (load[i] > peak) {
      peak = load[i];
      row = i;
    }
  }
  return { peakLoadW: peak, peakLoadRow: row, peakLoadStamp: series.stampSerial[row] };
}
