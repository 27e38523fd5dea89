/**
 * Design-day peaks with cooling load: the clear-day gains of gain/designDay.ts for every month
 * and, when radiant time factors are given, the cooling load of each day by the radiant time
 * series and its peak.
 */
import { type DesignDayGainMonth, type DesignDayGainOptions, designDayGains, peakOfDay, type WindowSpec } from '../gain';
import { requireRadiantTimeFactors } from './rts';
import { windowRoomSeries } from './room';
import { type RoomSeries, windowCoolingLoad } from './windowLoad';

/** Options of {@link designDayPeaks}. */
export interface DesignDayOptions extends DesignDayGainOptions {
  /**
   * One series r₀…r₂₃ (sum 1 ± 0.01) used as both the solar and the non-solar series: when given,
   * the cooling load is worked out too.
   */
  factors?: ArrayLike<number>;
  /** The room's solar and non-solar series (instead of `factors`); neither given: the window's own `room`, if any. */
  room?: RoomSeries;
}

/** One month's design day, with its cooling load when factors were given. */
export interface DesignDayMonth extends DesignDayGainMonth {
  /** Cooling load of each hour by the radiant time series [W], when factors were given. */
  coolingLoad?: number[];
  /** The cooling load of each hour by part [W] (transmitted beam, diffuse, conduction), when factors were given. */
  coolingLoadBeam?: number[];
  coolingLoadDiffuse?: number[];
  coolingLoadConduction?: number[];
  /** Hour of the largest cooling load, when factors were given: hour ending 1…24, or 0…23 for the time convention `instant` (as `peakHour`). */
  peakLoadHour?: number;
  /** The largest cooling load [W], when factors were given. */
  peakLoad?: number;
}

/**
 * The clear-day gain of a window on one day of every month, with its peak hour, and optionally
 * the cooling load by the radiant time series.
 * @param spec - the window (validated; errors name the field by its path)
 * @param options - day of the month (1…28, default 21), radiant time factors, clear-sky weather
 * @returns 12 months, January first; a month whose design day has no sun on the window has peak 0
 *   at the first hour
 * @remarks Cooling load by the radiant time series as published ({@link windowCoolingLoad}): beam
 *   through the solar series (non-solar with an interior shade), diffuse and conduction through the
 *   non-solar series, each with its radiant fraction, over the periodic day (Spitler, Fisher &
 *   Pedersen 1997, ASHRAE Trans. 103(2)).
 * @throws SunpaneError naming `day`, `factors` or `weather.kind` / `clearSky.kind`
 */
export function designDayPeaks(spec: WindowSpec, options: DesignDayOptions = {}): DesignDayMonth[] {
  const factors = options.factors !== undefined ? requireRadiantTimeFactors(options.factors) : undefined;
  const room: RoomSeries | undefined = options.room ?? (factors ? { solar: factors, nonSolar: factors } : windowRoomSeries(spec));
  const { months, window } = designDayGains(spec, options);
  if (!room) return months;
  const first = window.convention === 'hourEnding' ? 1 : 0;
  const fractions = { beam: window.radiantFraction, diffuse: window.radiantFractionDiffuse, conduction: window.radiantFractionConduction };
  return months.map((m): DesignDayMonth => {
    const parts = windowCoolingLoad({ beam: m.hourlyBeam, diffuse: m.hourlyDiffuse, conduction: m.hourlyConduction }, room, fractions, window.interiorShade);
    const load = Array.from(parts.total);
    const lp = peakOfDay(load);
    return { ...m, coolingLoad: load, coolingLoadBeam: Array.from(parts.beam), coolingLoadDiffuse: Array.from(parts.diffuse), coolingLoadConduction: Array.from(parts.conduction), peakLoadHour: lp.index + first, peakLoad: lp.value };
  });
}
