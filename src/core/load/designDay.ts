/**
 * Design-day peaks with cooling load: the clear-day gains of gain/designDay.ts for every month
 * and, when radiant time factors are given, the cooling load of each day by the radiant time
 * series and its peak.
 */
import { type DesignDayGainMonth, type DesignDayGainOptions, designDayGains, peakOfDay, type WindowSpec } from '../gain';
import { coolingLoad, requireRadiantTimeFactors } from './rts';

/** Options of {@link designDayPeaks}. */
export interface DesignDayOptions extends DesignDayGainOptions {
  /** Radiant time factors r₀…r₂₃ (sum 1 ± 0.01): when given, the cooling load is worked out too. */
  factors?: ArrayLike<number>;
}

/** One month's design day, with its cooling load when factors were given. */
export interface DesignDayMonth extends DesignDayGainMonth {
  /** Cooling load of each hour by the radiant time series [W], when factors were given. */
  coolingLoad?: number[];
  /** Hour ending (1…24) of the largest cooling load, when factors were given. */
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
 * @remarks Cooling load Q_θ = (1 − f_r) q_θ + Σ r_i f_r q_{θ−i} over the periodic day (Spitler,
 *   Fisher & Pedersen 1997, ASHRAE Trans. 103(2)) with f_r the glazing's radiant fraction.
 * @throws SunpaneError naming `day`, `factors` or `weather.kind` / `clearSky.kind`
 */
export function designDayPeaks(spec: WindowSpec, options: DesignDayOptions = {}): DesignDayMonth[] {
  const factors = options.factors !== undefined ? requireRadiantTimeFactors(options.factors) : undefined;
  const { months, window } = designDayGains(spec, options);
  if (!factors) return months;
  return months.map((m): DesignDayMonth => {
    const load = Array.from(coolingLoad(m.hourlyGain, factors, window.radiantFraction));
    const lp = peakOfDay(load);
    return { ...m, coolingLoad: load, peakLoadHour: lp.index + 1, peakLoad: lp.value };
  });
}
