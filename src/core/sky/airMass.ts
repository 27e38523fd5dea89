/**
 * Relative optical air mass: the path length of sunlight through the atmosphere relative to the
 * path at the zenith.
 */
import { RAD, requireRange } from '../common';

const { sin, exp, log, pow, round } = Math;

/** Exponent and offset of the power term of Kasten & Young (1989) Eq. 3: 0.50572 (β + 6.07995)^−1.6364. */
const KY_EXPONENT = -1.6364;
const KY_OFFSET = 6.07995;

// (β + 6.07995)^−1.6364 for 0 ≤ β ≤ 90 by nodes y_k every 90/256 ° (values by Math.pow, made once at
// load) and the binomial series of (1 + t)^c about the nearest node, |t| ≤ 0.176 / 6.08 < 0.029:
// 12 terms leave a truncation below 0.029^12 · 3 ≈ 1e-18 relative.
const KY_NODES = 256;
const KY_STEP = 90 / KY_NODES;
const KY_TERMS = 12;
const kyY = new Float64Array(KY_NODES + 1);
const kyInverse = new Float64Array(KY_NODES + 1);
const kyPower = new Float64Array(KY_NODES + 1);
for (let k = 0; k <= KY_NODES; k++) {
  const y = KY_OFFSET + k * KY_STEP;
  kyY[k] = y;
  kyInverse[k] = 1 / y;
  kyPower[k] = pow(y, KY_EXPONENT);
}
/** Binomial coefficients C(c, j) = c (c − 1) … (c − j + 1) / j!, j = 0…KY_TERMS − 1. */
const kyBinomial = new Float64Array(KY_TERMS);
kyBinomial[0] = 1;
for (let j = 1; j < KY_TERMS; j++) kyBinomial[j] = (kyBinomial[j - 1] * (KY_EXPONENT - j + 1)) / j;
const [B0, B1, B2, B3, B4, B5, B6, B7, B8, B9, B10, B11] = kyBinomial;

/**
 * (β + 6.07995)^−1.6364 — Math.pow's value to about 1e-15 relative (tests/core/gain/preparedFast.test.ts
 * holds it within 1e-14 over the whole range), in a fraction of the time: nearest tabulated node
 * times the binomial series in t = (y − y_k) / y_k, summed by Estrin's scheme (pairs, then powers
 * t², t⁴, t⁸: short dependency chains); exp/log outside 0 ≤ β ≤ 90.
 */
function kastenYoungPower(beta: number): number {
  if (!(beta >= 0 && beta <= 90)) return exp(KY_EXPONENT * log(beta + KY_OFFSET));
  const k = round(beta / KY_STEP);
  const t = (beta + KY_OFFSET - kyY[k]) * kyInverse[k];
  const t2 = t * t;
  const t4 = t2 * t2;
  const low = B0 + B1 * t + t2 * (B2 + B3 * t);
  const mid = B4 + B5 * t + t2 * (B6 + B7 * t);
  const high = B8 + B9 * t + t2 * (B10 + B11 * t);
  return kyPower[k] * (low + t4 * (mid + t4 * high));
}

/**
 * Relative air mass of Kasten & Young (1989).
 *
 * @param sunAltitude - sun altitude above the horizon [°], −90…90
 * @returns relative air mass [-], 1 at the zenith, about 37.9 at the horizon. For the sun at or
 * below the horizon (altitude ≤ 0) it returns the horizon value (≈ 37.92), a finite number that
 * callers do not use because there is no beam then.
 * @remarks m = 1 / [sin β + 0.50572 (β + 6.07995)^−1.6364], β in degrees — Kasten, F. & Young,
 * A. T. (1989), "Revised optical air mass tables and approximation formula", Applied Optics 28(22),
 * 4735–4738, Eq. 3.
 */
export function airMassKastenYoung(sunAltitude: number): number {
  return airMassKastenYoungUnchecked(requireRange('sunAltitude', sunAltitude, -90, 90, '°'));
}

/**
 * {@link airMassKastenYoung} without the argument check, for hourly loops that have checked the
 * altitude once (the one implementation: the checked form calls it).
 * @param sunAltitude - sun altitude [°], a finite number (not checked)
 * @returns as {@link airMassKastenYoung}
 * @remarks Kasten & Young (1989) Eq. 3, the power (β + 6.07995)^−1.6364 by tabulated nodes and a
 * binomial series (same value as Math.pow to about 1e-15 relative, a quarter of its time in V8).
 */
export function airMassKastenYoungUnchecked(sunAltitude: number): number {
  const beta = sunAltitude > 0 ? sunAltitude : 0;
  return 1 / (sin(beta * RAD) + 0.50572 * kastenYoungPower(beta)); // Kasten & Young Eq. 3
}

/**
 * {@link airMassKastenYoungUnchecked} for a sun above the horizon whose sine the caller already has
 * (the hourly plane irradiance): same value, without a second sine.
 * @param sunAltitude - sun altitude [°], above 0 (not checked)
 * @param sinAltitude - `Math.sin(sunAltitude * RAD)`
 * @returns as {@link airMassKastenYoung}
 */
export function airMassKastenYoungFromSine(sunAltitude: number, sinAltitude: number): number {
  return 1 / (sinAltitude + 0.50572 * kastenYoungPower(sunAltitude)); // Kasten & Young Eq. 3
}

/** Kasten–Young air mass at the horizon, the largest value {@link airMassKastenYoung} returns. */
export const AIR_MASS_HORIZON = airMassKastenYoungUnchecked(0);
