/**
 * The rearranged sums over the SPA periodic-term tables (src/core/sun/spaTerms.ts) against the plain
 * sums of Reda & Andreas (2008), Eq. 9–11 (Earth: X = Σ τ^n Σ A cos(B + Cτ) / 1e8) and Eq. 20–22
 * (nutation: Σ (a + bT) sin(Σ Xj Yj), Σ (c + dT) cos(Σ Xj Yj)), written out term by term here. The
 * table transcription itself is checked against published sums in
 * tests/reference/spa-worked-example.test.ts.
 */
import { B_TERMS, EARTH_DIRECT_FREQUENCY_COUNT, EARTH_FREQUENCY_MERGE_BOUND, L_TERMS, NUTATION_TERMS, R_TERMS, earthPeriodicSeries, earthPeriodicSums, nutationSeries, nutationSums } from '../../../src/core/sun/spaTerms';

type Series = readonly (readonly (readonly number[])[])[];

function plainEarth(series: Series, tau: number): number {
  let total = 0;
  series.forEach((rows, n) => {
    let sum = 0;
    for (const [a, b, c] of rows) sum += a * Math.cos(b + c * tau);
    total += sum * tau ** n;
  });
  return total / 1e8;
}

describe('Earth periodic sums with shared and composed frequencies', () => {
  test('stay within the exported bound of the plain term-by-term sums for −0.3 ≤ τ ≤ 0.8', () => {
    for (let tau = -0.3; tau <= 0.8; tau += 0.0137) {
      const ours = earthPeriodicSums(tau, { L: 0, B: 0, R: 0 });
      const plain = [plainEarth(L_TERMS, tau), plainEarth(B_TERMS, tau), plainEarth(R_TERMS, tau)];
      // Rounding of ~200 terms adds up to ~1e-13 on top of the substitution bound.
      [ours.L, ours.B, ours.R].forEach((v, q) => expect(Math.abs(v - plain[q])).toBeLessThanOrEqual(EARTH_FREQUENCY_MERGE_BOUND[q] * Math.abs(tau) + 1e-12));
    }
  });

  test('the bound is below 1e-7° in L and B and 1e-9 AU in R from 1900 to 2100 (|τ| ≤ 0.1)', () => {
    const degPerRad = 180 / Math.PI;
    expect(EARTH_FREQUENCY_MERGE_BOUND[0] * 0.1 * degPerRad).toBeLessThan(1e-6);
    expect(EARTH_FREQUENCY_MERGE_BOUND[1] * 0.1 * degPerRad).toBeLessThan(1e-7);
    expect(EARTH_FREQUENCY_MERGE_BOUND[2] * 0.1).toBeLessThan(1e-8);
    expect(EARTH_DIRECT_FREQUENCY_COUNT).toBeLessThan(40);
  });
});

describe('nutation sums by angle addition', () => {
  test('equal the plain sums over the 63 rows within 1e-12°', () => {
    for (let t = -1; t <= 1; t += 0.0731) {
      const x = [
        297.85036 + 445_267.11148 * t,
        357.52772 + 35_999.05034 * t,
        134.96298 + 477_198.867398 * t,
        93.27191 + 483_202.017538 * t,
        125.04452 - 1934.136261 * t,
      ];
      let psi = 0;
      let eps = 0;
      for (const [y0, y1, y2, y3, y4, a, b, c, d] of NUTATION_TERMS) {
        const arg = ((x[0] * y0 + x[1] * y1 + x[2] * y2 + x[3] * y3 + x[4] * y4) * Math.PI) / 180;
        psi += (a + b * t) * Math.sin(arg);
        eps += (c + d * t) * Math.cos(arg);
      }
      const ours = nutationSums(t, x, { deltaPsi: 0, deltaEpsilon: 0 });
      expect(Math.abs(ours.deltaPsi - psi / 36_000_000)).toBeLessThan(1e-12);
      expect(Math.abs(ours.deltaEpsilon - eps / 36_000_000)).toBeLessThan(1e-12);
    }
  });
});

describe('periodic sums carried by rotation over a series of instants', () => {
  test('the Earth series equals the single-instant sums at every one of 190 two-day steps within 1e-12 rad and AU', () => {
    for (const tau0 of [-0.09, 0.025, 0.6]) {
      const count = 190;
      const step = 2 / 365_250;
      const [L, B, R] = [new Float64Array(count), new Float64Array(count), new Float64Array(count)];
      earthPeriodicSeries(tau0, step, count, L, B, R);
      for (let n = 0; n < count; n++) {
        const direct = earthPeriodicSums(tau0 + n * step, { L: 0, B: 0, R: 0 });
        expect(Math.abs(L[n] - direct.L)).toBeLessThan(1e-12);
        expect(Math.abs(B[n] - direct.B)).toBeLessThan(1e-12);
        expect(Math.abs(R[n] - direct.R)).toBeLessThan(1e-12);
      }
    }
  });

  test('the nutation series equals the single-instant sums at every step within 1e-9° (chord of the fundamental arguments)', () => {
    const fundamental = (t: number) => [
      297.85036 + 445_267.11148 * t - 0.0019142 * t * t + (t * t * t) / 189_474,
      357.52772 + 35_999.05034 * t - 0.0001603 * t * t - (t * t * t) / 300_000,
      134.96298 + 477_198.867398 * t + 0.0086972 * t * t + (t * t * t) / 56_250,
      93.27191 + 483_202.017538 * t - 0.0036825 * t * t + (t * t * t) / 327_270,
      125.04452 - 1934.136261 * t + 0.0020708 * t * t + (t * t * t) / 450_000,
    ];
    // Years 1901, 2025 and 9000: the chord error grows with the cubic terms far from J2000.
    for (const t0 of [-0.99, 0.25, 70]) {
      const count = 190;
      const step = 2 / 36_525;
      const [psi, eps] = [new Float64Array(count), new Float64Array(count)];
      nutationSeries(t0, step, count, fundamental(t0), fundamental(t0 + (count - 1) * step), psi, eps);
      for (let n = 0; n < count; n++) {
        const t = t0 + n * step;
        const direct = nutationSums(t, fundamental(t), { deltaPsi: 0, deltaEpsilon: 0 });
        expect(Math.abs(psi[n] - direct.deltaPsi)).toBeLessThan(1e-9);
        expect(Math.abs(eps[n] - direct.deltaEpsilon)).toBeLessThan(1e-9);
      }
    }
  });
});
