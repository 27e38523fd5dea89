
const { abs, hypot } = Math;
/**
 * Shape-preserving piecewise cubic Hermite interpolation (Fritsch & Carlson 1980): on data that rise
 * or fall monotonically the interpolant does too, with no overshoot between the points.
 */

/** An interpolant over [x0, xn]: evaluates without allocating. */
export interface MonotoneCubic {
  /** Interpolated value at x; x outside the data range gives the nearest end value. */
  at(x: number): number;
  /** The data abscissae (a copy), ascending. */
  readonly xs: readonly number[];
}

/**
 * Builds a Fritsch–Carlson monotone cubic interpolant.
 *
 * @param xs - abscissae, strictly ascending, at least 1 (checked by the caller)
 * @param ys - ordinates, same length
 * @returns the interpolant; one point gives a constant, two points a straight line
 * @remarks Secants Δk = (y[k+1] − y[k]) / h[k]; initial tangents m[k] = (Δ[k−1] + Δ[k]) / 2 inside
 * (0 where the secants change sign or one is 0), one-sided at the ends; then on each interval with
 * α = m[k]/Δk, β = m[k+1]/Δk, if α² + β² > 9 both are scaled by 3/√(α² + β²) — Fritsch, F. N. &
 * Carlson, R. E. (1980), "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17(2),
 * 238–246, steps 1–5 of §4 (the circle α² + β² ≤ 9 lies inside their region of monotonicity).
 * Evaluation by the cubic Hermite basis.
 */
export function monotoneCubic(xs: readonly number[], ys: readonly number[]): MonotoneCubic {
  const n = xs.length;
  const x = Float64Array.from(xs);
  const y = Float64Array.from(ys);
  const m = new Float64Array(n);
  if (n >= 2) {
    const h = new Float64Array(n - 1);
    const d = new Float64Array(n - 1);
    for (let k = 0; k < n - 1; k++) {
      h[k] = x[k + 1] - x[k];
      d[k] = (y[k + 1] - y[k]) / h[k];
    }
    m[0] = d[0];
    m[n - 1] = d[n - 2];
    for (let k = 1; k < n - 1; k++) m[k] = d[k - 1] * d[k] <= 0 ? 0 : (d[k - 1] + d[k]) / 2;
    for (let k = 0; k < n - 1; k++) {
      if (d[k] === 0) {
        m[k] = 0;
        m[k + 1] = 0;
        continue;
      }
      // α = m[k]/Δk and β = m[k+1]/Δk, kept as products: α² + β² > 9 ⇔ |(m[k], m[k+1])| > 3|Δk|, and
      // the scaled tangents τα·Δk = 3|Δk|·m/|(m[k], m[k+1])| (the same numbers, without the ratios,
      // which overflow to Infinity when a secant of 1e-320 sits beside one of 0.3 and then give NaN).
      const r = hypot(m[k], m[k + 1]);
      const limit = 3 * abs(d[k]);
      if (r > limit) {
        m[k] = (limit * m[k]) / r;
        m[k + 1] = (limit * m[k + 1]) / r;
      }
    }
  }
  const at = (xv: number): number => {
    if (n === 1 || xv <= x[0]) return y[0];
    if (xv >= x[n - 1]) return y[n - 1];
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (x[mid] <= xv) lo = mid;
      else hi = mid;
    }
    const hk = x[hi] - x[lo];
    const t = (xv - x[lo]) / hk;
    const t2 = t * t;
    const t3 = t2 * t;
    return (2 * t3 - 3 * t2 + 1) * y[lo] + (t3 - 2 * t2 + t) * hk * m[lo] + (-2 * t3 + 3 * t2) * y[hi] + (t3 - t2) * hk * m[hi];
  };
  return { at, xs: Array.from(x) };
}
