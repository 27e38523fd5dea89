/**
 * Cooling load from window gain by the radiant time series (RTS).
 *
 * The gain of each hour is split into a convective part, which becomes cooling load in the same
 * hour, and a radiant part, which is first absorbed by the room's surfaces and released over the
 * following 24 hours in the proportions of the radiant time factors r₀…r₂₃:
 *
 *   Q_θ = (1 − f_r)·q_θ + Σ_{i=0..23} r_i · f_r · q_{θ−i}          (hours taken modulo 24)
 *
 * over a periodic design day (the same day repeated), Σ r_i = 1.
 *
 * Source: Spitler, J. D., Fisher, D. E. & Pedersen, C. O. (1997), "The Radiant Time Series Cooling
 * Load Calculation Procedure", ASHRAE Transactions 103(2). The radiant time factors are the
 * user's input (from their handbook's tables for the room construction, or their own room model):
 * Sunpane ships no factor tables.
 *
 * Hour indexing: value k of a 24-hour series is the hour ending at k + 1 o'clock (rows stamped at
 * the end of the hour, docs/conventions.md#hourly-rows), so index 0 is the hour 00:00–01:00.
 */
import { SunpaneError, rangeText, requireRange } from '../common';

/** Hours in the periodic design day of the radiant time series. */
export const RTS_HOURS = 24;
/** How far the radiant time factors may sum from 1 (published tables are rounded). */
export const RTS_SUM_TOLERANCE = 0.01;

/**
 * Checks a list of 24 radiant time factors: each finite and within 0…1, and their sum 1 ± 0.01.
 * @param factors - r₀…r₂₃, the share of a radiant pulse released in the same hour (r₀) and each
 *   following hour [-], each 0…1
 * @param argument - the name used in error messages
 * @returns the factors as a new Float64Array (used as given, not rescaled)
 * @throws SunpaneError naming `argument` when the count, an element or the sum is out of range
 */
export function requireRadiantTimeFactors(factors: ArrayLike<number>, argument = 'factors'): Float64Array {
  if (factors === null || typeof factors !== 'object' || typeof factors.length !== 'number') {
    throw new SunpaneError(argument, factors, `must be a list of ${RTS_HOURS} radiant time factors`);
  }
  if (factors.length !== RTS_HOURS) {
    throw new SunpaneError(argument, Array.from(factors), `must hold exactly ${RTS_HOURS} radiant time factors (hour 0 to hour 23 after the gain)`);
  }
  const out = new Float64Array(RTS_HOURS);
  let sum = 0;
  for (let i = 0; i < RTS_HOURS; i++) {
    out[i] = requireRange(`${argument}[${i}]`, factors[i], 0, 1);
    sum += out[i];
  }
  if (Math.abs(sum - 1) > RTS_SUM_TOLERANCE) {
    throw new SunpaneError(argument, Array.from(factors), `the ${RTS_HOURS} radiant time factors must sum to 1 ± ${RTS_SUM_TOLERANCE}`, `they sum to ${Number(sum.toPrecision(6))}`);
  }
  return out;
}

/** Checks a 24-hour series of finite numbers; returns a copy. */
function requireDaySeries(argument: string, values: ArrayLike<number>): Float64Array {
  if (values === null || typeof values !== 'object' || typeof values.length !== 'number') {
    throw new SunpaneError(argument, values, `must be a list of ${RTS_HOURS} hourly values`);
  }
  if (values.length !== RTS_HOURS) {
    throw new SunpaneError(argument, Array.from(values), `must hold exactly ${RTS_HOURS} hourly values (hour ending 1:00 to hour ending 24:00)`);
  }
  const out = new Float64Array(RTS_HOURS);
  for (let i = 0; i < RTS_HOURS; i++) {
    const v = values[i];
    if (typeof v !== 'number' || !Number.isFinite(v)) throw new SunpaneError(`${argument}[${i}]`, v, rangeText(undefined, undefined, 'W'));
    out[i] = v;
  }
  return out;
}

/**
 * Converts a 24-hour radiant gain series into cooling load: the periodic convolution with the
 * radiant time factors.
 * @param radiant - radiant part of the gain for each hour of the design day [W], 24 finite values
 * @param factors - radiant time factors r₀…r₂₃ [-], each 0…1, sum 1 ± 0.01
 * @returns the cooling load caused by the radiant gain, 24 values [W]
 * @remarks Q_θ = Σ_{i=0..23} r_i q_{θ−i}, θ − i taken modulo 24 (Spitler, Fisher & Pedersen 1997,
 *   ASHRAE Trans. 103(2), the radiant time series equation).
 */
export function radiantToCoolingLoad(radiant: ArrayLike<number>, factors: ArrayLike<number>): Float64Array {
  const q = requireDaySeries('radiant', radiant);
  const r = requireRadiantTimeFactors(factors);
  const load = new Float64Array(RTS_HOURS);
  for (let theta = 0; theta < RTS_HOURS; theta++) {
    let sum = 0;
    for (let i = 0; i < RTS_HOURS; i++) sum += r[i] * q[(theta - i + RTS_HOURS) % RTS_HOURS]; // RTS equation
    load[theta] = sum;
  }
  return load;
}

/**
 * Hourly cooling load of a 24-hour gain series by the radiant time series.
 * @param gains - total gain for each hour of the design day [W], 24 finite values (index 0 = hour
 *   ending 1:00)
 * @param factors - radiant time factors r₀…r₂₃ [-], each 0…1, sum 1 ± 0.01
 * @param radiantFraction - share of each hour's gain that is radiant [-], 0…1
 * @returns the cooling load for each hour [W], 24 values
 * @remarks Q_θ = (1 − f_r) q_θ + Σ_{i=0..23} r_i f_r q_{θ−i} (Spitler, Fisher & Pedersen 1997,
 *   ASHRAE Trans. 103(2)). With Σ r_i = 1 the 24-hour total of the load equals that of the gain;
 *   factors summing to 1 ± 0.01 are used as given, so the total may differ by that much.
 * @throws SunpaneError naming `gains`, `factors` or `radiantFraction`
 */
export function coolingLoad(gains: ArrayLike<number>, factors: ArrayLike<number>, radiantFraction: number): Float64Array {
  const q = requireDaySeries('gains', gains);
  const r = requireRadiantTimeFactors(factors);
  const fr = requireRange('radiantFraction', radiantFraction, 0, 1);
  const load = new Float64Array(RTS_HOURS);
  for (let theta = 0; theta < RTS_HOURS; theta++) {
    let radiantLoad = 0;
    for (let i = 0; i < RTS_HOURS; i++) radiantLoad += r[i] * q[(theta - i + RTS_HOURS) % RTS_HOURS];
    load[theta] = (1 - fr) * q[theta] + fr * radiantLoad; // convective now + radiant released by the RTS
  }
  return load;
}
