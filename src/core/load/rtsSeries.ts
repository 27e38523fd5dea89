/**
 * Example radiant time series for light, medium and heavy construction — ILLUSTRATIVE, computed by
 * Sunpane from a stated room model, not taken from any published table (the handbook's
 * representative series could not be read through this project's search, and remembered numbers
 * are not shipped as a handbook's). Use your handbook's series, or your own room model's, for design.
 *
 * Room model (ours): of a radiant pulse absorbed by the room's surfaces in hour 0, a share f0 comes
 * back to the air within that hour (light surfaces and furnishings); the rest is stored in the
 * structure and released as a first-order (exponential) response with time constant τ [h]:
 *
 *   h_0 = f0 + (1 − f0)(1 − e^(−1/τ)),   h_k = (1 − f0)(e^(−k/τ) − e^(−(k+1)/τ))  (k ≥ 1)
 *
 * On a periodic design day the pulse's tail wraps onto the same 24 hours (as the radiant time
 * series method's periodic response does, Spitler, Fisher & Pedersen 1997), so
 *
 *   r_k = f0·[k = 0] + (1 − f0)(e^(−k/τ) − e^(−(k+1)/τ)) / (1 − e^(−24/τ)),   Σ r_k = 1 exactly.
 *
 * Solar series (transmitted beam lands mostly on the floor, usually the most massive surface) use
 * a smaller f0 and a longer τ than non-solar series (radiation spread over all surfaces):
 *
 *   construction   non-solar f0, τ     solar f0, τ
 *   light          0.45, 1.5 h          0.30, 2.5 h
 *   medium         0.40, 4 h            0.25, 6 h
 *   heavy          0.35, 10 h           0.20, 14 h
 *
 * These parameters are our choice for a plausible spread (common practice, no source).
 */
import { SunpaneError } from '../common';

const { exp } = Math;

/** Construction weights with shipped illustrative series. */
export type Construction = 'light' | 'medium' | 'heavy';
export const CONSTRUCTIONS: readonly Construction[] = Object.freeze(['light', 'medium', 'heavy'] as Construction[]);

/** The room-model parameters of each illustrative series (see the module comment). */
export const ILLUSTRATIVE_ROOM_MODEL: Readonly<Record<Construction, { nonSolar: { f0: number; tau: number }; solar: { f0: number; tau: number } }>> = Object.freeze({
  light: { nonSolar: { f0: 0.45, tau: 1.5 }, solar: { f0: 0.3, tau: 2.5 } },
  medium: { nonSolar: { f0: 0.4, tau: 4 }, solar: { f0: 0.25, tau: 6 } },
  heavy: { nonSolar: { f0: 0.35, tau: 10 }, solar: { f0: 0.2, tau: 14 } },
});

/** Where the shipped series come from, in words (shown beside every load they produce). */
export const ILLUSTRATIVE_SOURCE = 'illustrative series computed by Sunpane from a first-order room model (not a published table)';

/**
 * The periodic 24-hour radiant time series of the first-order room model.
 * @param f0 - share returned within the first hour [-], 0…1
 * @param tau - time constant of the stored part [h], above 0
 * @returns r_0…r_23 [-], summing to 1
 */
export function firstOrderRadiantTimeSeries(f0: number, tau: number): Float64Array {
  const r = new Float64Array(24);
  const wrap = 1 - exp(-24 / tau);
  for (let k = 0; k < 24; k++) r[k] = ((1 - f0) * (exp(-k / tau) - exp(-(k + 1) / tau))) / wrap;
  r[0] += f0;
  return r;
}

/**
 * The illustrative solar and non-solar series of a construction.
 * @param construction - `light`, `medium` or `heavy`
 * @returns `{ solar, nonSolar, source }`
 * @throws SunpaneError naming `construction` and listing the accepted ones
 */
export function illustrativeRadiantTimeSeries(construction: string): { solar: Float64Array; nonSolar: Float64Array; source: string } {
  if (!CONSTRUCTIONS.includes(construction as Construction)) {
    throw new SunpaneError('construction', construction, `must be one of ${CONSTRUCTIONS.map((c) => `"${c}"`).join(', ')} (illustrative series), or give your own series`);
  }
  const p = ILLUSTRATIVE_ROOM_MODEL[construction as Construction];
  return { solar: firstOrderRadiantTimeSeries(p.solar.f0, p.solar.tau), nonSolar: firstOrderRadiantTimeSeries(p.nonSolar.f0, p.nonSolar.tau), source: `${construction} construction: ${ILLUSTRATIVE_SOURCE}` };
}
