/**
 * Design-day gains: for each month, one clear day (the 21st unless asked otherwise), the hourly
 * window gain and its peak hour and value. The cooling load of these days is worked out in
 * load/designDay.ts.
 */
import { SunpaneError, requireRange } from '../common';
import { civilToSerial, standardToClock } from '../time';
import { prepareWindow, type PreparedWindow } from './prepared';
import { gainAtStamp } from './windowGain';
import type { Weather, WindowSpec } from './window';

/** Options of {@link designDayGains}. */
export interface DesignDayGainOptions {
  /** Day of each month, 1…28 (every month has it); default 21. */
  day?: number;
  /**
   * Clear-sky weather for the design days (`ashraeClearSky` or `ineichenClearSky`); default the
   * window's own weather, which must then be a clear-sky model.
   */
  clearSky?: Weather;
}

/** One month's design day. */
export interface DesignDayGainMonth {
  /** 1…12 */
  month: number;
  /** Day of the month. */
  day: number;
  /**
   * Window solar gain of each hour [W], read by the window's time convention (local standard time):
   * `hourEnding` — index 0 is the hour ending 01:00, sun at its middle; `instant` — index 0 is
   * 00:00, sun at that instant.
   */
  hourlyGain: number[];
  /** The solar gain by part [W]: transmitted beam, and diffuse (sky + ground). */
  hourlyBeam: number[];
  hourlyDiffuse: number[];
  /** Conduction gain U·A·(T_out − T_in) of each hour [W] (zeros without a U-value). */
  hourlyConduction: number[];
  /** Outdoor dry-bulb of each hour [°C] (empty without a U-value). */
  hourlyDryBulb: number[];
  /**
   * Hour of the largest gain (local standard time), the earliest on ties: the hour ending 1…24
   * (`hourEnding`) or the instant's hour 0…23 (`instant`).
   */
  peakHour: number;
  /** The largest hourly gain [W] (0 when the sun never reaches the window that day). */
  peakGain: number;
  /** Local serial of the peak hour's stamp (its end for `hourEnding`, the instant for `instant`). */
  peakStamp: number;
  /** The peak hour's stamp on the local clock (serial; equals `peakStamp` without daylight saving). */
  peakClockStamp: number;
}

/** Default day of the month for design days. */
export const DEFAULT_DESIGN_DAY = 21;

/** Index and value of the largest value of a day (the earliest on ties). */
export function peakOfDay(values: ArrayLike<number>): { index: number; value: number } {
  let index = 0;
  for (let i = 1; i < values.length; i++) if (values[i] > values[index]) index = i;
  return { index, value: values.length ? values[index] : 0 };
}

/**
 * The clear-day gain of a window on one day of every month, with its peak hour.
 * @param spec - the window (validated; errors name the field by its path)
 * @param options - day of the month (1…28, default 21), clear-sky weather
 * @returns 12 months, January first, and the prepared window (for the radiant fraction and
 *   anything else a caller needs); a month whose design day has no sun on the window has peak 0
 *   at the first hour
 * @remarks Gain as in gain/windowGain.ts for each hour of spec.year's design day, read by the
 *   window's time convention (default: hour ending, sun at mid-hour); each hour is a row of the
 *   window's year, with the same numbers as the annual series.
 * @throws SunpaneError naming `day` or `weather.kind` / `clearSky.kind` (a measured weather series
 *   and no clear-sky model given)
 */
export function designDayGains(spec: WindowSpec, options: DesignDayGainOptions = {}): { months: DesignDayGainMonth[]; window: PreparedWindow } {
  const day = requireRange('day', options.day ?? DEFAULT_DESIGN_DAY, 1, 28, undefined, { integer: true });
  const weather = options.clearSky ?? spec?.weather;
  const kind = weather?.kind;
  if (kind !== 'ashraeClearSky' && kind !== 'ineichenClearSky') {
    throw new SunpaneError(options.clearSky ? 'clearSky.kind' : 'weather.kind', kind, 'design days need a clear-sky model ("ashraeClearSky" or "ineichenClearSky"); give one as the clearSky option');
  }
  const w = prepareWindow(options.clearSky ? { ...spec, weather: options.clearSky } : spec);
  const months: DesignDayGainMonth[] = [];
  const first = w.convention === 'hourEnding' ? 1 : 0; // stamp of the day's first hour, in hours after midnight
  const half = w.convention === 'hourEnding' ? 1 / 48 : 0; // an hour-ending stamp moves on the clock with its hour's middle
  for (let month = 1; month <= 12; month++) {
    const midnight = civilToSerial(spec.year, month, day);
    const hourlyGain: number[] = [];
    const hourlyBeam: number[] = [];
    const hourlyDiffuse: number[] = [];
    const hourlyConduction: number[] = [];
    const hourlyDryBulb: number[] = [];
    for (let h = 0; h < 24; h++) {
      const hour = gainAtStamp(w, midnight + (h + first) / 24);
      hourlyGain.push(hour.gain.total);
      hourlyBeam.push(hour.gain.beam);
      hourlyDiffuse.push(hour.gain.sky + hour.gain.ground);
      hourlyConduction.push(hour.gain.conduction);
      if (hour.outdoorTemperature !== undefined) hourlyDryBulb.push(hour.outdoorTemperature);
    }
    const peak = peakOfDay(hourlyGain);
    const peakStamp = midnight + (peak.index + first) / 24;
    const peakClockStamp = standardToClock(peakStamp - half, spec.site.daylightSaving) + half;
    months.push({ month, day, hourlyGain, hourlyBeam, hourlyDiffuse, hourlyConduction, hourlyDryBulb, peakHour: peak.index + first, peakGain: peak.value, peakStamp, peakClockStamp });
  }
  return { months, window: w };
}
