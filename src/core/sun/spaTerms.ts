/**
 * Periodic-term tables of the NREL Solar Position Algorithm.
 *
 * Transcribed from Reda, I. & Andreas, A., *Solar Position Algorithm for Solar Radiation
 * Applications*, NREL/TP-560-34302 (revised January 2008): Table A4.2 (Earth periodic terms: the
 * heliocentric longitude series L0–L5, latitude B0–B1 and radius vector R0–R4, a truncation of
 * VSOP87) and Table A4.3 (periodic terms for the nutation in longitude and obliquity: the
 * multipliers Y0…Y4 of the five fundamental arguments and the coefficients a, b, c, d).
 *
 * Each Earth row is `[A, B, C]` and contributes A·cos(B + C·τ) (τ = Julian ephemeris millennium),
 * in units of 1e-8 rad (L, B) or 1e-8 AU (R). Each nutation row is `[Y0, Y1, Y2, Y3, Y4, a, b, c, d]`
 * and contributes (a + b·T)·sin(ΣXj·Yj) to Δψ and (c + d·T)·cos(ΣXj·Yj) to Δε, in units of 0.0001″.
 *
 * The transcription is checked against the row counts and column sums of both tables
 * (tests/reference/spa-worked-example.test.ts; docs/methods.md#sun-position-nrel-solar-position-algorithm).
 *
 * The sums over the tables ({@link earthPeriodicSums}, {@link nutationSums}) are arranged for speed
 * without changing the algorithm:
 * - Earth terms: cos(B + Cτ) = cos B · cos Cτ − sin B · sin Cτ, with A cos B and A sin B computed once
 *   and cos Cτ, sin Cτ once per distinct frequency. Frequencies that differ only by the rounding of
 *   the table (e.g. 6283.07585, 6283.0758, 6283.076, 6283.08 in different series) share the value of
 *   their largest-amplitude term, and a frequency within 0.01 rad/millennium of the sum or difference
 *   of two lower ones is composed from them by angle addition (VSOP87 frequencies are combinations
 *   of the planets' mean motions): 195 terms need 68 frequencies, of which only 18 call Math.cos and
 *   Math.sin. The error of these substitutions is at most Σ A·|ΔC|·|τ|, given per unit τ by
 *   {@link EARTH_FREQUENCY_MERGE_BOUND} and checked in tests/core/sun/spaTerms.test.ts against the
 *   plain term-by-term sums — far below the SPA's ±0.0003°.
 * - Nutation: each argument is an integer combination of the five fundamental arguments X0…X4
 *   (multipliers −2…3), so sin and cos of every row follow exactly from sin and cos of X0…X4 and
 *   their multiples by the angle-addition formulas: 5 sine/cosine pairs instead of 63.
 */

/** One Earth periodic term: amplitude A [1e-8 rad or 1e-8 AU], phase B [rad], frequency C [rad per millennium]. */
export type EarthTerm = readonly [number, number, number];

/** Heliocentric longitude terms L0…L5 (Table A4.2). */
export const L_TERMS: readonly (readonly EarthTerm[])[] = [
  [
    [175347046, 0, 0],
    [3341656, 4.6692568, 6283.07585],
    [34894, 4.6261, 12566.1517],
    [3497, 2.7441, 5753.3849],
    [3418, 2.8289, 3.5231],
    [3136, 3.6277, 77713.7715],
    [2676, 4.4181, 7860.4194],
    [2343, 6.1352, 3930.2097],
    [1324, 0.7425, 11506.7698],
    [1273, 2.0371, 529.691],
    [1199, 1.1096, 1577.3435],
    [990, 5.233, 5884.927],
    [902, 2.045, 26.298],
    [857, 3.508, 398.149],
    [780, 1.179, 5223.694],
    [753, 2.533, 5507.553],
    [505, 4.583, 18849.228],
    [492, 4.205, 775.523],
    [357, 2.92, 0.067],
    [317, 5.849, 11790.629],
    [284, 1.899, 796.298],
    [271, 0.315, 10977.079],
    [243, 0.345, 5486.778],
    [206, 4.806, 2544.314],
    [205, 1.869, 5573.143],
    [202, 2.458, 6069.777],
    [156, 0.833, 213.299],
    [132, 3.411, 2942.463],
    [126, 1.083, 20.775],
    [115, 0.645, 0.98],
    [103, 0.636, 4694.003],
    [102, 0.976, 15720.839],
    [102, 4.267, 7.114],
    [99, 6.21, 2146.17],
    [98, 0.68, 155.42],
    [86, 5.98, 161000.69],
    [85, 1.3, 6275.96],
    [85, 3.67, 71430.7],
    [80, 1.81, 17260.15],
    [79, 3.04, 12036.46],
    [75, 1.76, 5088.63],
    [74, 3.5, 3154.69],
    [74, 4.68, 801.82],
    [70, 0.83, 9437.76],
    [62, 3.98, 8827.39],
    [61, 1.82, 7084.9],
    [57, 2.78, 6286.6],
    [56, 4.39, 14143.5],
    [56, 3.47, 6279.55],
    [52, 0.19, 12139.55],
    [52, 1.33, 1748.02],
    [51, 0.28, 5856.48],
    [49, 0.49, 1194.45],
    [41, 5.37, 8429.24],
    [41, 2.4, 19651.05],
    [39, 6.17, 10447.39],
    [37, 6.04, 10213.29],
    [37, 2.57, 1059.38],
    [36, 1.71, 2352.87],
    [36, 1.78, 6812.77],
    [33, 0.59, 17789.85],
    [30, 0.44, 83996.85],
    [30, 2.74, 1349.87],
    [25, 3.16, 4690.48],
  ],
  [
    [628331966747, 0, 0],
    [206059, 2.678235, 6283.07585],
    [4303, 2.6351, 12566.1517],
    [425, 1.59, 3.523],
    [119, 5.796, 26.298],
    [109, 2.966, 1577.344],
    [93, 2.59, 18849.23],
    [72, 1.14, 529.69],
    [68, 1.87, 398.15],
    [67, 4.41, 5507.55],
    [59, 2.89, 5223.69],
    [56, 2.17, 155.42],
    [45, 0.4, 796.3],
    [36, 0.47, 775.52],
    [29, 2.65, 7.11],
    [21, 5.34, 0.98],
    [19, 1.85, 5486.78],
    [19, 4.97, 213.3],
    [17, 2.99, 6275.96],
    [16, 0.03, 2544.31],
    [16, 1.43, 2146.17],
    [15, 1.21, 10977.08],
    [12, 2.83, 1748.02],
    [12, 3.26, 5088.63],
    [12, 5.27, 1194.45],
    [12, 2.08, 4694],
    [11, 0.77, 553.57],
    [10, 1.3, 6286.6],
    [10, 4.24, 1349.87],
    [9, 2.7, 242.73],
    [9, 5.64, 951.72],
    [8, 5.3, 2352.87],
    [6, 2.65, 9437.76],
    [6, 4.67, 4690.48],
  ],
  [
    [52919, 0, 0],
    [8720, 1.0721, 6283.0758],
    [309, 0.867, 12566.152],
    [27, 0.05, 3.52],
    [16, 5.19, 26.3],
    [16, 3.68, 155.42],
    [10, 0.76, 18849.23],
    [9, 2.06, 77713.77],
    [7, 0.83, 775.52],
    [5, 4.66, 1577.34],
    [4, 1.03, 7.11],
    [4, 3.44, 5573.14],
    [3, 5.14, 796.3],
    [3, 6.05, 5507.55],
    [3, 1.19, 242.73],
    [3, 6.12, 529.69],
    [3, 0.31, 398.15],
    [3, 2.28, 553.57],
    [2, 4.38, 5223.69],
    [2, 3.75, 0.98],
  ],
  [
    [289, 5.844, 6283.076],
    [35, 0, 0],
    [17, 5.49, 12566.15],
    [3, 5.2, 155.42],
    [1, 4.72, 3.52],
    [1, 5.3, 18849.23],
    [1, 5.97, 242.73],
  ],
  [
    [114, 3.142, 0],
    [8, 4.13, 6283.08],
    [1, 3.84, 12566.15],
  ],
  [[1, 3.14, 0]],
];

/** Heliocentric latitude terms B0…B1 (Table A4.2). */
export const B_TERMS: readonly (readonly EarthTerm[])[] = [
  [
    [280, 3.199, 84334.662],
    [102, 5.422, 5507.553],
    [80, 3.88, 5223.69],
    [44, 3.7, 2352.87],
    [32, 4, 1577.34],
  ],
  [
    [9, 3.9, 5507.55],
    [6, 1.73, 5223.69],
  ],
];

/** Radius vector terms R0…R4 (Table A4.2). */
export const R_TERMS: readonly (readonly EarthTerm[])[] = [
  [
    [100013989, 0, 0],
    [1670700, 3.0984635, 6283.07585],
    [13956, 3.05525, 12566.1517],
    [3084, 5.1985, 77713.7715],
    [1628, 1.1739, 5753.3849],
    [1576, 2.8469, 7860.4194],
    [925, 5.453, 11506.77],
    [542, 4.564, 3930.21],
    [472, 3.661, 5884.927],
    [346, 0.964, 5507.553],
    [329, 5.9, 5223.694],
    [307, 0.299, 5573.143],
    [243, 4.273, 11790.629],
    [212, 5.847, 1577.344],
    [186, 5.022, 10977.079],
    [175, 3.012, 18849.228],
    [110, 5.055, 5486.778],
    [98, 0.89, 6069.78],
    [86, 5.69, 15720.84],
    [86, 1.27, 161000.69],
    [65, 0.27, 17260.15],
    [63, 0.92, 529.69],
    [57, 2.01, 83996.85],
    [56, 5.24, 71430.7],
    [49, 3.25, 2544.31],
    [47, 2.58, 775.52],
    [45, 5.54, 9437.76],
    [43, 6.01, 6275.96],
    [39, 5.36, 4694],
    [38, 2.39, 8827.39],
    [37, 0.83, 19651.05],
    [37, 4.9, 12139.55],
    [36, 1.67, 12036.46],
    [35, 1.84, 2942.46],
    [33, 0.24, 7084.9],
    [32, 0.18, 5088.63],
    [32, 1.78, 398.15],
    [28, 1.21, 6286.6],
    [28, 1.9, 6279.55],
    [26, 4.59, 10447.39],
  ],
  [
    [103019, 1.10749, 6283.07585],
    [1721, 1.0644, 12566.1517],
    [702, 3.142, 0],
    [32, 1.02, 18849.23],
    [31, 2.84, 5507.55],
    [25, 1.32, 5223.69],
    [18, 1.42, 1577.34],
    [10, 5.91, 10977.08],
    [9, 1.42, 6275.96],
    [9, 0.27, 5486.78],
  ],
  [
    [4359, 5.7846, 6283.0758],
    [124, 5.579, 12566.152],
    [12, 3.14, 0],
    [9, 3.63, 77713.77],
    [6, 1.87, 5573.14],
    [3, 5.47, 18849.23],
  ],
  [
    [145, 4.273, 6283.076],
    [7, 3.92, 12566.15],
  ],
  [[4, 2.56, 6283.08]],
];

/** One nutation row: multipliers Y0…Y4 of X0…X4, then a, b (Δψ) and c, d (Δε) [0.0001″, per century for b, d]. */
export type NutationTerm = readonly [number, number, number, number, number, number, number, number, number];

/** Nutation in longitude and obliquity (Table A4.3), 63 rows. */
export const NUTATION_TERMS: readonly NutationTerm[] = [
  [0, 0, 0, 0, 1, -171996, -174.2, 92025, 8.9],
  [-2, 0, 0, 2, 2, -13187, -1.6, 5736, -3.1],
  [0, 0, 0, 2, 2, -2274, -0.2, 977, -0.5],
  [0, 0, 0, 0, 2, 2062, 0.2, -895, 0.5],
  [0, 1, 0, 0, 0, 1426, -3.4, 54, -0.1],
  [0, 0, 1, 0, 0, 712, 0.1, -7, 0],
  [-2, 1, 0, 2, 2, -517, 1.2, 224, -0.6],
  [0, 0, 0, 2, 1, -386, -0.4, 200, 0],
  [0, 0, 1, 2, 2, -301, 0, 129, -0.1],
  [-2, -1, 0, 2, 2, 217, -0.5, -95, 0.3],
  [-2, 0, 1, 0, 0, -158, 0, 0, 0],
  [-2, 0, 0, 2, 1, 129, 0.1, -70, 0],
  [0, 0, -1, 2, 2, 123, 0, -53, 0],
  [2, 0, 0, 0, 0, 63, 0, 0, 0],
  [0, 0, 1, 0, 1, 63, 0.1, -33, 0],
  [2, 0, -1, 2, 2, -59, 0, 26, 0],
  [0, 0, -1, 0, 1, -58, -0.1, 32, 0],
  [0, 0, 1, 2, 1, -51, 0, 27, 0],
  [-2, 0, 2, 0, 0, 48, 0, 0, 0],
  [0, 0, -2, 2, 1, 46, 0, -24, 0],
  [2, 0, 0, 2, 2, -38, 0, 16, 0],
  [0, 0, 2, 2, 2, -31, 0, 13, 0],
  [0, 0, 2, 0, 0, 29, 0, 0, 0],
  [-2, 0, 1, 2, 2, 29, 0, -12, 0],
  [0, 0, 0, 2, 0, 26, 0, 0, 0],
  [-2, 0, 0, 2, 0, -22, 0, 0, 0],
  [0, 0, -1, 2, 1, 21, 0, -10, 0],
  [0, 2, 0, 0, 0, 17, -0.1, 0, 0],
  [2, 0, -1, 0, 1, 16, 0, -8, 0],
  [-2, 2, 0, 2, 2, -16, 0.1, 7, 0],
  [0, 1, 0, 0, 1, -15, 0, 9, 0],
  [-2, 0, 1, 0, 1, -13, 0, 7, 0],
  [0, -1, 0, 0, 1, -12, 0, 6, 0],
  [0, 0, 2, -2, 0, 11, 0, 0, 0],
  [2, 0, -1, 2, 1, -10, 0, 5, 0],
  [2, 0, 1, 2, 2, -8, 0, 3, 0],
  [0, 1, 0, 2, 2, 7, 0, -3, 0],
  [-2, 1, 1, 0, 0, -7, 0, 0, 0],
  [0, -1, 0, 2, 2, -7, 0, 3, 0],
  [2, 0, 0, 2, 1, -7, 0, 3, 0],
  [2, 0, 1, 0, 0, 6, 0, 0, 0],
  [-2, 0, 2, 2, 2, 6, 0, -3, 0],
  [-2, 0, 1, 2, 1, 6, 0, -3, 0],
  [2, 0, -2, 0, 1, -6, 0, 3, 0],
  [2, 0, 0, 0, 1, -6, 0, 3, 0],
  [0, -1, 1, 0, 0, 5, 0, 0, 0],
  [-2, -1, 0, 2, 1, -5, 0, 3, 0],
  [-2, 0, 0, 0, 1, -5, 0, 3, 0],
  [0, 0, 2, 2, 1, -5, 0, 3, 0],
  [-2, 0, 2, 0, 1, 4, 0, 0, 0],
  [-2, 1, 0, 2, 1, 4, 0, 0, 0],
  [0, 0, 1, -2, 0, 4, 0, 0, 0],
  [-1, 0, 1, 0, 0, -4, 0, 0, 0],
  [-2, 1, 0, 0, 0, -4, 0, 0, 0],
  [1, 0, 0, 0, 0, -4, 0, 0, 0],
  [0, 0, 1, 2, 0, 3, 0, 0, 0],
  [0, 0, -2, 2, 2, -3, 0, 0, 0],
  [-1, -1, 1, 0, 0, -3, 0, 0, 0],
  [0, 1, 1, 0, 0, -3, 0, 0, 0],
  [0, -1, 1, 2, 2, -3, 0, 0, 0],
  [2, -1, -1, 2, 2, -3, 0, 0, 0],
  [0, 0, 3, 2, 2, -3, 0, 0, 0],
  [2, -1, 0, 2, 2, -3, 0, 0, 0],
];

/**
 * Math's functions bound once: the hot loops below call them by a module constant rather than
 * through the global `Math` (the same functions; under jest, which runs code in a vm context, each
 * lookup of a global there is slow — docs/testing.md, "Keeping npm test fast").
 */
const { cos, sin, PI } = Math;

/** Merging of equal-but-for-rounding frequencies: at most this far apart [rad per millennium]. */
const FREQUENCY_MERGE = 0.01;
/** Largest Σ A·|ΔC| a composed frequency may add [1e-8 rad or AU per unit τ]. */
const COMPOSE_BUDGET = 0.2;

interface EarthPlan {
  /** Effective frequency [rad per millennium] of each frequency slot. */
  frequencies: Float64Array;
  /**
   * How to get cos and sin of each slot, in evaluation order: per slot `[slot, i, j, sign]` — with
   * i < 0 by Math.cos/Math.sin, otherwise by angle addition from slots i and j (frequency
   * f_i + sign·f_j).
   */
  recipe: Int32Array;
  /** Per term: A cos B, A sin B, and the index of its frequency slot. */
  aCosB: Float64Array;
  aSinB: Float64Array;
  frequencyOf: Int32Array;
  /** Term index range [start[s], start[s + 1]) of series s: L0…L5, B0…B1, R0…R4. */
  start: Int32Array;
  /** Σ A·|C_effective − C| per quantity L, B, R [1e-8 rad or AU per unit τ]. */
  mergeBound: [number, number, number];
}

function buildEarthPlan(): EarthPlan {
  const series = [...L_TERMS, ...B_TERMS, ...R_TERMS];
  const quantity = [...L_TERMS.map(() => 0), ...B_TERMS.map(() => 1), ...R_TERMS.map(() => 2)];
  const terms = series.flatMap((rows, s) => rows.map((r) => ({ s, a: r[0], b: r[1], c: r[2] })));
  // Representative frequencies: each term, largest amplitude first, joins a slot within FREQUENCY_MERGE or opens one.
  const wanted: number[] = [];
  const slotOf = new Map<(typeof terms)[number], number>();
  const weight: number[] = [];
  for (const t of [...terms].sort((x, y) => y.a - x.a)) {
    let g = wanted.findIndex((f) => Math.abs(f - t.c) <= FREQUENCY_MERGE);
    if (g < 0) g = wanted.push(t.c) - 1;
    weight[g] = (weight[g] ?? 0) + t.a;
    slotOf.set(t, g);
  }
  // Slots in ascending frequency; each is the sum or difference of two earlier ones when that lands
  // within FREQUENCY_MERGE of it (VSOP frequencies are combinations of planetary mean motions), else direct.
  const order = wanted.map((_, g) => g).sort((x, y) => wanted[x] - wanted[y]);
  const effective = new Float64Array(wanted.length);
  const recipe: number[] = [];
  const done: number[] = [];
  for (const g of order) {
    let best: [number, number, number] | undefined;
    // Composition error budget: Σ A·miss ≤ COMPOSE_BUDGET per slot (1e-8 units per unit τ).
    let bestMiss = Math.min(FREQUENCY_MERGE, COMPOSE_BUDGET / weight[g]);
    for (let x = 0; x < done.length && wanted[g] !== 0; x++) {
      for (let y = 0; y < done.length; y++) {
        const [i, j] = [done[x], done[y]];
        if (effective[i] === 0 || effective[j] === 0) continue;
        for (const sign of [1, -1]) {
          const miss = Math.abs(effective[i] + sign * effective[j] - wanted[g]);
          if (miss <= bestMiss) [best, bestMiss] = [[i, j, sign], miss];
        }
      }
    }
    if (best) {
      effective[g] = effective[best[0]] + best[2] * effective[best[1]];
      recipe.push(g, ...best);
    } else {
      effective[g] = wanted[g];
      recipe.push(g, -1, -1, 0);
    }
    done.push(g);
  }
  const mergeBound: [number, number, number] = [0, 0, 0];
  for (const t of terms) mergeBound[quantity[t.s]] += t.a * Math.abs(effective[slotOf.get(t) as number] - t.c);
  const start = new Int32Array(series.length + 1);
  series.forEach((rows, s) => (start[s + 1] = start[s] + rows.length));
  return {
    frequencies: effective,
    recipe: Int32Array.from(recipe),
    aCosB: Float64Array.from(terms, (t) => t.a * Math.cos(t.b)),
    aSinB: Float64Array.from(terms, (t) => t.a * Math.sin(t.b)),
    frequencyOf: Int32Array.from(terms, (t) => slotOf.get(t) as number),
    start,
    mergeBound,
  };
}

const EARTH = buildEarthPlan();
const FREQ_COS = new Float64Array(EARTH.frequencies.length);
const FREQ_SIN = new Float64Array(EARTH.frequencies.length);

/**
 * Upper bound of the error from the shared and composed frequencies per unit |τ|, in radians (L, B)
 * and AU (R): the error at τ is at most this times |τ| (τ = 0.1 in 2100).
 */
export const EARTH_FREQUENCY_MERGE_BOUND: readonly [number, number, number] = EARTH.mergeBound.map((b) => b / 1e8) as [number, number, number];

/** Number of distinct Earth frequencies needing Math.cos/Math.sin per instant. */
export const EARTH_DIRECT_FREQUENCY_COUNT = EARTH.recipe.filter((_, k) => k % 4 === 1).filter((i) => i < 0).length;

function seriesSum(s: number): number {
  let sum = 0;
  const { aCosB, aSinB, frequencyOf } = EARTH;
  for (let k = EARTH.start[s], end = EARTH.start[s + 1]; k < end; k++) {
    const f = frequencyOf[k];
    sum += aCosB[k] * FREQ_COS[f] - aSinB[k] * FREQ_SIN[f]; // A cos(B + Cτ)
  }
  return sum;
}

/** Heliocentric longitude L [rad, not reduced], latitude B [rad] and radius vector R [AU]. */
export interface EarthHeliocentric {
  L: number;
  B: number;
  R: number;
}

/**
 * Earth heliocentric longitude, latitude and radius vector from the periodic terms.
 * @param jme - Julian ephemeris millennium τ from J2000.0
 * @param out - object to fill
 * @returns `out`: L [rad, not reduced to one turn], B [rad], R [AU]
 * @remarks Reda & Andreas (2008), Eq. 9–12 and Table A4.2: X_n = Σ A cos(B + Cτ) (Eq. 9),
 *   X = (X0 + X1 τ + X2 τ² + …) / 1e8 (Eq. 10, 11).
 */
export function earthPeriodicSums(jme: number, out: EarthHeliocentric): EarthHeliocentric {
  seedFrequencies(jme);
  return sumEarthSeries(jme, out);
}

/** cos and sin of every frequency slot at τ into FREQ_COS, FREQ_SIN (direct or by angle addition). */
function seedFrequencies(jme: number): void {
  const { frequencies, recipe } = EARTH;
  for (let k = 0; k < recipe.length; k += 4) {
    const g = recipe[k];
    const i = recipe[k + 1];
    if (i < 0) {
      const arg = frequencies[g] * jme;
      FREQ_COS[g] = cos(arg);
      FREQ_SIN[g] = sin(arg);
    } else {
      const j = recipe[k + 2];
      const sj = recipe[k + 3] * FREQ_SIN[j];
      FREQ_COS[g] = FREQ_COS[i] * FREQ_COS[j] - FREQ_SIN[i] * sj; // cos(a ± b)
      FREQ_SIN[g] = FREQ_SIN[i] * FREQ_COS[j] + FREQ_COS[i] * sj; // sin(a ± b)
    }
  }
}

/** L, B, R from the slot values in FREQ_COS, FREQ_SIN (Eq. 9–11). */
function sumEarthSeries(jme: number, out: EarthHeliocentric): EarthHeliocentric {
  // Horner in τ over the series of each quantity (Eq. 10): L0…L5 are series 0–5, B0…B1 6–7, R0…R4 8–12.
  let l = 0;
  for (let s = 5; s >= 0; s--) l = l * jme + seriesSum(s);
  let b = 0;
  for (let s = 7; s >= 6; s--) b = b * jme + seriesSum(s);
  let r = 0;
  for (let s = 12; s >= 8; s--) r = r * jme + seriesSum(s);
  out.L = l / 1e8; // Eq. 11
  out.B = b / 1e8;
  out.R = r / 1e8;
  return out;
}

const STEP_COS = new Float64Array(EARTH.frequencies.length);
const STEP_SIN = new Float64Array(EARTH.frequencies.length);

/**
 * Earth heliocentric longitude, latitude and radius vector at equally spaced instants
 * τ_n = τ0 + n·Δτ, n = 0 … count − 1 — {@link earthPeriodicSums} for a series of instants.
 * @param jme0 - Julian ephemeris millennium τ0 of the first instant
 * @param stepJme - spacing Δτ [millennia]
 * @param count - number of instants
 * @param L - filled with L [rad, not reduced] per instant; B [rad] and R [AU] likewise
 * @remarks Same terms and frequency slots as {@link earthPeriodicSums}; cos and sin of each slot
 *   are computed at τ0 and then carried from instant to instant by rotation through the slot's
 *   fixed step C·Δτ (cos(x + d) = cos x cos d − sin x sin d, sin(x + d) = sin x cos d + cos x sin d),
 *   so that no cos or sin is needed after the first instant. The rotations add only rounding
 *   (≈ n·1e-16 relative); tests/core/sun/spaTerms.test.ts holds the series to the single-instant sums.
 */
export function earthPeriodicSeries(jme0: number, stepJme: number, count: number, L: Float64Array, B: Float64Array, R: Float64Array): void {
  const { frequencies } = EARTH;
  const slots = frequencies.length;
  for (let g = 0; g < slots; g++) {
    STEP_COS[g] = Math.cos(frequencies[g] * stepJme);
    STEP_SIN[g] = Math.sin(frequencies[g] * stepJme);
  }
  seedFrequencies(jme0);
  const out: EarthHeliocentric = { L: 0, B: 0, R: 0 };
  for (let n = 0; n < count; n++) {
    sumEarthSeries(jme0 + n * stepJme, out);
    L[n] = out.L;
    B[n] = out.B;
    R[n] = out.R;
    for (let g = 0; g < slots; g++) {
      const c = FREQ_COS[g] * STEP_COS[g] - FREQ_SIN[g] * STEP_SIN[g];
      FREQ_SIN[g] = FREQ_SIN[g] * STEP_COS[g] + FREQ_COS[g] * STEP_SIN[g];
      FREQ_COS[g] = c;
    }
  }
}

/**
 * How to get cos and sin of every nutation row's argument Σ Y_j X_j with one complex product each.
 * The phasor pool holds first cos and sin of m·X_j for j = 0…4 and m = −3…3 (index j·7 + m + 3), then
 * one entry per product: a row's argument is an earlier entry's plus one m·X_j (a row of the table
 * when one fits, else the row without its last multiplier, made as an entry of its own). Products of
 * integer multiples are exact identities, so this changes nothing but rounding (≈ 1e-16).
 */
interface NutationPlan {
  /** Per product: [pool index of the result, pool index of the earlier entry, pool index of m·X_j]. */
  products: Int32Array;
  /** Pool index of each row's phasor. */
  rowEntry: Int32Array;
  /** Pool size. */
  size: number;
}

function buildNutationPlan(): NutationPlan {
  const baseIndex = (j: number, m: number): number => j * 7 + m + 3;
  const known = new Map<string, number>();
  const products: number[] = [];
  let size = 35;
  const entryOf = (y: readonly number[]): number => {
    const nonZero = [0, 1, 2, 3, 4].filter((j) => y[j] !== 0);
    if (nonZero.length === 1) return baseIndex(nonZero[0], y[nonZero[0]]);
    const key = y.join(',');
    const found = known.get(key);
    if (found !== undefined) return found;
    // Prefer an entry that already exists: y minus one of its multipliers.
    let split = nonZero[nonZero.length - 1];
    for (const j of nonZero) if (known.has(y.map((v, k) => (k === j ? 0 : v)).join(','))) split = j;
    const earlier = entryOf(y.map((v, k) => (k === split ? 0 : v)));
    const index = size++;
    products.push(index, earlier, baseIndex(split, y[split]));
    known.set(key, index);
    return index;
  };
  const rowEntry = Int32Array.from(NUTATION_TERMS, (row) => entryOf(row.slice(0, 5)));
  return { products: Int32Array.from(products), rowEntry, size };
}

const NUTATION_PLAN = buildNutationPlan();
const POOL_COS = new Float64Array(NUTATION_PLAN.size);
const POOL_SIN = new Float64Array(NUTATION_PLAN.size);
const NUT_COEFFICIENTS = Float64Array.from(NUTATION_TERMS.flatMap((r) => r.slice(5)));

/** Nutation in longitude and obliquity [°]. */
export interface Nutation {
  deltaPsi: number;
  deltaEpsilon: number;
}

/**
 * Nutation in longitude Δψ and obliquity Δε.
 * @param jce - Julian ephemeris century T from J2000.0
 * @param x - the fundamental arguments X0…X4 [°] (Eq. 15–19)
 * @param out - object to fill
 * @returns `out`: Δψ, Δε [°]
 * @remarks Reda & Andreas (2008), Eq. 20–22 and Table A4.3: Δψ = Σ (a + bT) sin(Σ Xj Yj),
 *   Δε = Σ (c + dT) cos(Σ Xj Yj), in 0.0001″.
 */
export function nutationSums(jce: number, x: readonly number[], out: Nutation): Nutation {
  fillPhasorPool(x);
  const { rowEntry } = NUTATION_PLAN;
  let psiSum = 0;
  let epsSum = 0;
  for (let i = 0; i < rowEntry.length; i++) {
    const q = i * 4;
    const e = rowEntry[i];
    psiSum += (NUT_COEFFICIENTS[q] + NUT_COEFFICIENTS[q + 1] * jce) * POOL_SIN[e]; // Eq. 20
    epsSum += (NUT_COEFFICIENTS[q + 2] + NUT_COEFFICIENTS[q + 3] * jce) * POOL_COS[e]; // Eq. 21
  }
  out.deltaPsi = psiSum / 36_000_000; // Eq. 22
  out.deltaEpsilon = epsSum / 36_000_000;
  return out;
}

/** cos and sin of m·X_j (m = −3…3) and of every product of the plan into POOL_COS, POOL_SIN; X_j in degrees. */
function fillPhasorPool(x: readonly number[]): void {
  for (let j = 0; j < 5; j++) {
    const argRad = ((x[j] % 360) * PI) / 180;
    const c1 = cos(argRad);
    const s1 = sin(argRad);
    const c2 = c1 * c1 - s1 * s1;
    const s2 = 2 * s1 * c1;
    const c3 = c2 * c1 - s2 * s1;
    const s3 = s2 * c1 + c2 * s1;
    const k = j * 7 + 3;
    POOL_COS[k] = 1;
    POOL_SIN[k] = 0;
    POOL_COS[k + 1] = POOL_COS[k - 1] = c1;
    POOL_SIN[k + 1] = s1;
    POOL_SIN[k - 1] = -s1;
    POOL_COS[k + 2] = POOL_COS[k - 2] = c2;
    POOL_SIN[k + 2] = s2;
    POOL_SIN[k - 2] = -s2;
    POOL_COS[k + 3] = POOL_COS[k - 3] = c3;
    POOL_SIN[k + 3] = s3;
    POOL_SIN[k - 3] = -s3;
  }
  const { products } = NUTATION_PLAN;
  for (let p = 0; p < products.length; p += 3) {
    const a = products[p + 1];
    const b = products[p + 2];
    const c = POOL_COS[a] * POOL_COS[b] - POOL_SIN[a] * POOL_SIN[b]; // cos(α + β)
    POOL_SIN[products[p]] = POOL_SIN[a] * POOL_COS[b] + POOL_COS[a] * POOL_SIN[b]; // sin(α + β)
    POOL_COS[products[p]] = c;
  }
}

/** cos and sin of every row argument Σ Xj Yj [°] into rowCos, rowSin. */
function rowPhasors(x: readonly number[], rowCos: Float64Array, rowSin: Float64Array): void {
  fillPhasorPool(x);
  const { rowEntry } = NUTATION_PLAN;
  for (let i = 0; i < rowEntry.length; i++) {
    rowCos[i] = POOL_COS[rowEntry[i]];
    rowSin[i] = POOL_SIN[rowEntry[i]];
  }
}

/** Δψ, Δε from the row phasors in ROW_COS, ROW_SIN (Eq. 20–22). */
function sumNutationRows(jce: number, out: Nutation): Nutation {
  let psiSum = 0;
  let epsSum = 0;
  for (let i = 0; i < NUTATION_TERMS.length; i++) {
    const q = i * 4;
    psiSum += (NUT_COEFFICIENTS[q] + NUT_COEFFICIENTS[q + 1] * jce) * ROW_SIN[i]; // Eq. 20
    epsSum += (NUT_COEFFICIENTS[q + 2] + NUT_COEFFICIENTS[q + 3] * jce) * ROW_COS[i]; // Eq. 21
  }
  out.deltaPsi = psiSum / 36_000_000; // Eq. 22
  out.deltaEpsilon = epsSum / 36_000_000;
  return out;
}

const ROW_COS = new Float64Array(NUTATION_TERMS.length);
const ROW_SIN = new Float64Array(NUTATION_TERMS.length);
const ROW_STEP_COS = new Float64Array(NUTATION_TERMS.length);
const ROW_STEP_SIN = new Float64Array(NUTATION_TERMS.length);

/**
 * Nutation in longitude and obliquity at equally spaced instants T_n = T0 + n·ΔT, n = 0 … count − 1
 * — {@link nutationSums} for a series of instants.
 * @param jce0 - Julian ephemeris century T0 of the first instant
 * @param stepJce - spacing ΔT [centuries]
 * @param count - number of instants, at least 2
 * @param xFirst - fundamental arguments X0…X4 [°] at the first instant (Eq. 15–19)
 * @param xLast - the same at the last instant
 * @param deltaPsi - filled with Δψ [°] per instant; deltaEpsilon with Δε [°]
 * @remarks Eq. 20–22 with cos and sin of each row's argument computed at the first instant and
 *   carried by rotation through a fixed step: the row's argument advanced at the mean rate between
 *   the first and last instant, (X_j,last − X_j,first)/(count − 1) per step. The fundamental
 *   arguments are cubic in T, so over a span s their departure from that chord is at most
 *   (s/2)²·max|X_j″|/2, with X_j″ = 2·(quadratic coefficient) + 6·T·(cubic coefficient) below
 *   0.03 °/century² for the years 1–9999: for a span of a year and a month (0.0103 century) under
 *   4e-7° per argument, 1.2e-6° for a row (multipliers up to 3), which changes Δψ and Δε by under
 *   1e-9°. tests/core/sun/spaTerms.test.ts holds the series to {@link nutationSums}.
 */
export function nutationSeries(
  jce0: number,
  stepJce: number,
  count: number,
  xFirst: readonly number[],
  xLast: readonly number[],
  deltaPsi: Float64Array,
  deltaEpsilon: Float64Array,
): void {
  const stepX = xFirst.map((first, j) => (xLast[j] - first) / (count - 1));
  rowPhasors(stepX, ROW_STEP_COS, ROW_STEP_SIN);
  rowPhasors(xFirst, ROW_COS, ROW_SIN);
  const rows = NUTATION_TERMS.length;
  const out: Nutation = { deltaPsi: 0, deltaEpsilon: 0 };
  for (let n = 0; n < count; n++) {
    sumNutationRows(jce0 + n * stepJce, out);
    deltaPsi[n] = out.deltaPsi;
    deltaEpsilon[n] = out.deltaEpsilon;
    for (let i = 0; i < rows; i++) {
      const c = ROW_COS[i] * ROW_STEP_COS[i] - ROW_SIN[i] * ROW_STEP_SIN[i];
      ROW_SIN[i] = ROW_SIN[i] * ROW_STEP_COS[i] + ROW_COS[i] * ROW_STEP_SIN[i];
      ROW_COS[i] = c;
    }
  }
}
