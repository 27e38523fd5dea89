/**
 * Fast twin of the Kasten–Young power term (β + 6.07995)^−1.6364 of airMass.ts — the one hot-path
 * re-implementation of the sky folder. It replaces `Math.pow(β + 6.07995, −1.6364)`
 * ({@link kastenYoungPowerPlain} in airMass.ts) in every air-mass evaluation.
 *
 * Why it is kept: `npm run bench`'s window_annual_vs_suncalc runs this once per daylight hour
 * (Perez 1990 sky). In interleaved A/B runs in one process (301 rounds, shared 2-core machine) the
 * annual window series took a median 11 % longer with Math.pow (six runs: 0.80–1.26 of this
 * version's speed ratio, median 0.89) — at the 10 % bar docs/fast-paths.md sets for keeping a twin.
 *
 * Method: nodes y_k = 6.07995 + k·90/256 (values by Math.pow, made once at load) and the binomial
 * series of (1 + t)^c about the nearest node, t = (y − y_k)/y_k, |t| ≤ 0.176/6.08 < 0.029: 12 terms
 * leave a truncation below 0.029^12 · 3 ≈ 1e-18 relative; summed by Estrin's scheme (pairs, then
 * t², t⁴: short dependency chains). Outside 0 ≤ β ≤ 90 it falls back to exp/log.
 * Equality test: tests/core/sky/airMassFast.test.ts (within 1e-14 relative of Math.pow everywhere).
 */
const { exp, log, pow, round } = Math;

// The constants of Kasten & Young Eq. 3 (airMass.ts has them too; the equality test would fail if
// the two ever differed).
const KY_EXPONENT = -1.6364;
const KY_OFFSET = 6.07995;

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
 * (β + 6.07995)^−1.6364 — Math.pow's value within 1e-14 relative, in a fraction of its time.
 * @param beta - sun altitude [°], any finite value (0…90 takes the series)
 */
export function kastenYoungPowerFast(beta: number): number {
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
