/**
 * Cooling load of a window by the radiant time series as published: each part of the window's gain
 * is split into a convective share (load in the same hour) and a radiant share, and the radiant
 * share goes through the series that fits it —
 *
 * - transmitted beam: the SOLAR series (it lands mostly on the floor);
 * - diffuse (sky and ground) solar gain and conduction: the NON-SOLAR series;
 * - with an interior shade (attenuation below 1 for beam or diffuse), the beam is absorbed and
 *   re-radiated by the shade, so it goes to the non-solar series too;
 *
 *   Q_θ = Σ_parts [ (1 − f_p) q_p,θ + f_p Σ_{i=0..23} r^(p)_i q_p,θ−i ]
 *
 * Source: Spitler, J. D., Fisher, D. E. & Pedersen, C. O. (1997), "The Radiant Time Series Cooling
 * Load Calculation Procedure", ASHRAE Transactions 103(2) — the RTS equation and the solar /
 * non-solar split; the radiant fractions per part are the user's (defaults in src/core/gain/windowSpec.ts).
 */
import { SunpaneError, requireRange } from '../common';
import type { AnnualSeries } from '../gain';
import { requireRadiantTimeFactors, RTS_HOURS } from './rts';

/** The two series of a room: solar (transmitted beam) and non-solar (everything else). */
export interface RoomSeries {
  solar: ArrayLike<number>;
  nonSolar: ArrayLike<number>;
  /** Where the series come from, in words. */
  source?: string;
}

/** A window's gain by part for the hours of a day or a year [W]. */
export interface GainByPart {
  beam: ArrayLike<number>;
  diffuse: ArrayLike<number>;
  conduction: ArrayLike<number>;
}

/** Radiant fractions per part [-], each 0…1. */
export interface RadiantFractions {
  beam: number;
  diffuse: number;
  conduction: number;
}

/** Cooling load by part and in all [W]. */
export interface WindowLoad {
  beam: Float64Array;
  diffuse: Float64Array;
  conduction: Float64Array;
  total: Float64Array;
}

function requireFractions(f: RadiantFractions): RadiantFractions {
  return {
    beam: requireRange('radiantFractionBeam', f.beam, 0, 1),
    diffuse: requireRange('radiantFractionDiffuse', f.diffuse, 0, 1),
    conduction: requireRange('radiantFractionConduction', f.conduction, 0, 1),
  };
}

/** Checks a room's two series (24 factors each, within 0…1, sum 1 ± 0.01); errors name `solarFactors` / `nonSolarFactors`. */
export function requireRoomSeries(series: RoomSeries): { solar: Float64Array; nonSolar: Float64Array } {
  if (series === null || typeof series !== 'object') throw new SunpaneError('factors', series, 'must give a solar and a non-solar radiant time series');
  return { solar: requireRadiantTimeFactors(series.solar, 'solarFactors'), nonSolar: requireRadiantTimeFactors(series.nonSolar, 'nonSolarFactors') };
}

/**
 * Periodic (design-day) or running (year) convolution of one part with a series, plus its convective share.
 * For a periodic day the hours before 0 are the day's own last hours; for a year they are the
 * year's last hours (the year taken as repeating, so 1 January starts from 31 December's gains).
 */
function partLoad(q: ArrayLike<number>, r: Float64Array, fr: number, out: Float64Array): void {
  const n = q.length;
  for (let t = 0; t < n; t++) {
    let radiant = 0;
    for (let i = 0; i < RTS_HOURS; i++) {
      let k = t - i;
      if (k < 0) k += n;
      radiant += r[i] * q[k]; // RTS equation
    }
    out[t] += (1 - fr) * q[t] + fr * radiant;
  }
}

/**
 * Cooling load of a window's gain parts by the published radiant time series.
 * @param gains - beam, diffuse and conduction gain per hour [W], the same length (24 for a
 *   periodic design day, or the hours of a year)
 * @param series - the room's solar and non-solar series
 * @param fractions - radiant fractions of the beam, diffuse and conduction gains [-], each 0…1
 * @param interiorShade - true when an interior shade is present: the beam then goes to the
 *   non-solar series
 * @returns the load of each part and their total [W], same length as the gains
 * @throws SunpaneError naming `solarFactors`, `nonSolarFactors`, `radiantFractionBeam`, … or `gains`
 */
export function windowCoolingLoad(gains: GainByPart, series: RoomSeries, fractions: RadiantFractions, interiorShade: boolean): WindowLoad {
  const { solar, nonSolar } = requireRoomSeries(series);
  const f = requireFractions(fractions);
  const n = gains.beam.length;
  if (n < RTS_HOURS || gains.diffuse.length !== n || gains.conduction.length !== n) {
    throw new SunpaneError('gains', n, `must hold the beam, diffuse and conduction gains for the same hours, at least ${RTS_HOURS}`);
  }
  const beam = new Float64Array(n);
  const diffuse = new Float64Array(n);
  const conduction = new Float64Array(n);
  partLoad(gains.beam, interiorShade ? nonSolar : solar, f.beam, beam);
  partLoad(gains.diffuse, nonSolar, f.diffuse, diffuse);
  partLoad(gains.conduction, nonSolar, f.conduction, conduction);
  const total = new Float64Array(n);
  for (let t = 0; t < n; t++) total[t] = beam[t] + diffuse[t] + conduction[t];
  return { beam, diffuse, conduction, total };
}

/**
 * The hourly cooling load of a window's year: {@link windowCoolingLoad} over the annual series'
 * gain parts with its radiant fractions and interior shade; a missing hour counts as zero gain.
 * @param series - from annualSeries
 * @param room - the room's solar and non-solar series
 * @returns the total load of each hour [W]
 */
export function annualCoolingLoad(series: AnnualSeries, room: RoomSeries): Float64Array {
  return windowCoolingLoad({ beam: series.gainBeam, diffuse: series.gainDiffuse, conduction: series.conduction }, room, series.radiantFractions, series.interiorShade).total;
}
