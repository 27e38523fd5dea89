/**
 * Design-day peaks: for each month, one clear day (the 21st unless asked otherwise), the hourly
 * window gain, its peak hour and value, and — when radiant time factors are given — the cooling
 * load by the radiant time series and its peak.
 */
import { SunpaneError, requireRange } from './errors';
import { gainOfPrepared, prepareWindow } from './gain';
import { coolingLoad, peakOfDay, requireRadiantTimeFactors } from './load';
import { civilToSerial } from './time';
import type { Weather, WindowSpec } from './window';

/** Options of {@link designDayPeaks}. */
export interface DesignDayOptions {
  /** Day of each month, 1…28 (every month has it); default 21. */
  day?: number;
  /** Radiant time factors r₀…r₂₃ (sum 1 ± 0.01): when given, the cooling load is worked out too. */
  factors?: ArrayLike<number>;
  /**
   * Clear-sky weather for the design days (`ashraeClearSky` or `ineichenClearSky`); default the
   * window's own weather, which must then be a clear-sky model.
   */
  clearSky?: Weather;
}

/** One month's design day. */
export interface DesignDayMonth {
  /** 1…12 */
  month: number;
  /** Day of the month. */
  day: number;
  /** Window gain of each hour [W]; index 0 is the hour ending 01:00, sun at its middle. */
  hourlyGain: number[];
  /** Hour ending (1…24, local standard time) of the largest gain; the earliest on ties. */
  peakHour: number;
  /** The largest hourly gain [W] (0 when the sun never reaches the window that day). */
  peakGain: number;
  /** Local serial at the end of the peak hour. */
  peakStamp: number;
  /** Cooling load of each hour by the radiant time series [W], when factors were given. */
  coolingLoad?: number[];
  /** Hour ending (1…24) of the largest cooling load, when factors were given. */
  peakLoadHour?: number;
  /** The largest cooling load [W], when factors were given. */
  peakLoad?: number;
}

/** Default day of the month for design days. */
export const DEFAULT_DESIGN_DAY = 21;

/**
 * The clear-day gain of a window on one day of every month, with its peak hour, and optionally
 * the cooling load by the radiant time series.
 * @param spec - the window (validated; errors name the field by its path)
 * @param options - day of the month (1…28, default 21), radiant time factors, clear-sky weather
 * @returns 12 months, January first; a month whose design day has no sun on the window has peak 0
 *   at the first hour
 * @remarks Gain as in src/core/gain.ts at the middle of each hour of spec.year's design day;
 *   cooling load Q_θ = (1 − f_r) q_θ + Σ r_i f_r q_{θ−i} over the periodic day (Spitler, Fisher &
 *   Pedersen 1997, ASHRAE Trans. 103(2)) with f_r the glazing's radiant fraction.
 * @throws SunpaneError naming `day`, `factors` or `weather.kind` (a measured weather series and no
 *   clear-sky model given)
 */
export function designDayPeaks(spec: WindowSpec, options: DesignDayOptions = {}): DesignDayMonth[] {
  const day = requireRange('day', options.day ?? DEFAULT_DESIGN_DAY, 1, 28, undefined, { integer: true });
  const factors = options.factors !== undefined ? requireRadiantTimeFactors(options.factors) : undefined;
  const weather = options.clearSky ?? spec?.weather;
  const kind = weather?.kind;
  if (kind !== 'ashraeClearSky' && kind !== 'ineichenClearSky') {
    throw new SunpaneError(options.clearSky ? 'clearSky.kind' : 'weather.kind', kind, 'design days need a clear-sky model ("ashraeClearSky" or "ineichenClearSky"); give one as the clearSky option');
  }
  const w = prepareWindow(options.clearSky ? { ...spec, weather: options.clearSky } : spec);
  const out: DesignDayMonth[] = [];
  for (let month = 1; month <= 12; month++) {
    const midnight = civilToSerial(spec.year, month, day);
    const hourlyGain: number[] = [];
    for (let h = 0; h < 24; h++) hourlyGain.push(gainOfPrepared(w, midnight + (h + 0.5) / 24).gain.total);
    const peak = peakOfDay(hourlyGain);
    const row: DesignDayMonth = { month, day, hourlyGain, peakHour: peak.index + 1, peakGain: peak.value, peakStamp: midnight + (peak.index + 1) / 24 };
    if (factors) {
      const load = Array.from(coolingLoad(hourlyGain, factors, w.radiantFraction));
      const lp = peakOfDay(load);
      row.coolingLoad = load;
      row.peakLoadHour = lp.index + 1;
      row.peakLoad = lp.value;
    }
    out.push(row);
  }
  return out;
}
