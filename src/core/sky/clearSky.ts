/**
 * Clear-sky irradiance models: the ASHRAE pseudo-optical-depth model (τb, τd) and the
 * turbidity-based model of Ineichen & Perez (2002).
 *
 * Both return direct normal, diffuse horizontal and global horizontal irradiance; with the sun at or
 * below the horizon all three are 0 (no sun is a result, not an error). Handbook equation numbers
 * cited here are from memory; the formulas are gathered in
 * docs/methods.md#clear-sky-ashrae-pseudo-optical-depths.
 */
import { airMassKastenYoung } from './airMass';
import { RAD, SunpaneError, requireRange } from '../common';
import { type IrradianceLimits, physicalIrradianceLimits } from './qualityLimits';
import { standardPressure } from '../sun';
import { extraterrestrialIrradiance, extraterrestrialSpencer, requireDayOfYear } from './extraterrestrial';

const { exp, pow, sin, min } = Math;

/** Clear-sky irradiance [W/m²]. */
export interface ClearSky {
  /** Direct normal irradiance [W/m²]. */
  dni: number;
  /** Diffuse horizontal irradiance [W/m²]. */
  dhi: number;
  /** Global horizontal irradiance = dni · sin(altitude) + dhi [W/m²]. */
  ghi: number;
}

/** Upper bound of the beam pseudo-optical depth τb accepted (published climate tables stay well below). */
export const TAU_B_MAX = 1.2;
/** Upper bound of the diffuse pseudo-optical depth τd accepted (published climate tables stay well below). */
export const TAU_D_MAX = 4;
/** Range of Linke turbidity accepted: 1 is a clean dry atmosphere; very hazy skies reach about 7. */
export const LINKE_MIN = 1;
export const LINKE_MAX = 10;
/** Range of site elevation accepted [m] (as the glossary's `elevation`). */
export const ELEVATION_MIN = -500;
export const ELEVATION_MAX = 9000;

const NO_SUN: Readonly<ClearSky> = Object.freeze({ dni: 0, dhi: 0, ghi: 0 });

/**
 * Air-mass exponents of the ASHRAE clear-sky model (current coefficients).
 *
 * @param tauB - beam pseudo-optical depth [-], > 0
 * @param tauD - diffuse pseudo-optical depth [-], > 0
 * @returns `{ ab, ad }`, the beam and diffuse air-mass exponents [-]
 * @remarks ab = 1.454 − 0.406 τb − 0.268 τd + 0.021 τb τd; ad = 0.507 + 0.205 τb − 0.080 τd
 * − 0.190 τb τd — Gueymard, C. A. & Thevenard, D. (2013), ASHRAE Trans. 119(2) (RP-1613), as in
 * ASHRAE Handbook—Fundamentals (2013) ch. 14, Eqs. 17–18. (The 2009 Handbook had other coefficients.)
 */
export function ashraeAirMassExponents(tauB: number, tauD: number): { ab: number; ad: number } {
  const ab = 1.454 - 0.406 * tauB - 0.268 * tauD + 0.021 * tauB * tauD; // Eq. 17
  const ad = 0.507 + 0.205 * tauB - 0.08 * tauD - 0.19 * tauB * tauD; // Eq. 18
  return { ab, ad };
}

/**
 * Clear-sky irradiance by the ASHRAE pseudo-optical-depth model.
 *
 * @param sunAltitude - sun altitude [°], −90…90
 * @param dayOfYear - day of the year, 1…366
 * @param tauB - beam pseudo-optical depth τb [-], above 0 up to {@link TAU_B_MAX}
 * @param tauD - diffuse pseudo-optical depth τd [-], above 0 up to {@link TAU_D_MAX}
 * @returns direct normal, diffuse horizontal and global horizontal irradiance [W/m²]; all 0 when the
 * sun is at or below the horizon
 * @remarks Eb = E0 exp(−τb m^ab), Ed = E0 exp(−τd m^ad) (ASHRAE Handbook—Fundamentals (2013)
 * ch. 14, Eqs. 15–16), E0 by the Handbook's Eq. 4 ({@link extraterrestrialIrradiance}), m by
 * Kasten & Young (1989), exponents by {@link ashraeAirMassExponents}. Global = Eb sin β + Ed.
 * A pair that gives, at any sun altitude, more than the physically possible limits of Long & Shi
 * (2008) is refused ({@link requireClearSkyPair}).
 */
export function ashraeClearSky(sunAltitude: number, dayOfYear: number, tauB: number, tauD: number): ClearSky {
  const altitude = requireRange('sunAltitude', sunAltitude, -90, 90, '°');
  const e0 = extraterrestrialIrradiance(dayOfYear);
  const tb = requireRange('tauB', tauB, 0, TAU_B_MAX, undefined, { exclusiveMin: true });
  const td = requireRange('tauD', tauD, 0, TAU_D_MAX, undefined, { exclusiveMin: true });
  requireClearSkyPair(tb, td);
  if (altitude <= 0) return { ...NO_SUN };
  const sky = ashraeModel(altitude, e0, tb, td);
  // The trial altitudes of requireClearSkyPair are a grid: between its points a pair at the edge is
  // judged again at the sun asked for (same words), so no value past the limit is ever returned.
  const problem = pastLimits(sky, altitude, extraterrestrialSpencer(requireDayOfYear(dayOfYear)));
  if (problem !== undefined) throw pairError('tauB', 'tauD', tb, td, altitude, problem);
  return sky;
}

/**
 * What of a clear sky is past the physically possible limits (Long & Shi 2008) with the sun at
 * `altitude` and the day's extraterrestrial irradiance `sa` by Spencer (1971) — the value every
 * irradiance input of the engine is judged by — or undefined.
 */
function pastLimits(sky: ClearSky, altitude: number, sa: number): { what: string; value: number; limit: number } | undefined {
  const limits = physicalIrradianceLimits(sin(altitude * RAD), sa);
  if (sky.dni > limits.dni) return { what: 'a direct normal irradiance', value: sky.dni, limit: limits.dni };
  if (sky.dhi > limits.dhi) return { what: 'a diffuse horizontal irradiance', value: sky.dhi, limit: limits.dhi };
  if (sky.ghi > limits.ghi) return { what: 'a global horizontal irradiance', value: sky.ghi, limit: limits.ghi };
  return undefined;
}

/** Eqs. 15–16 and the global, unchecked, with the sun above the horizon. */
function ashraeModel(altitude: number, e0: number, tb: number, td: number): ClearSky {
  const m = airMassKastenYoung(altitude);
  const { ab, ad } = ashraeAirMassExponents(tb, td);
  const dni = e0 * exp(-tb * pow(m, ab)); // Eq. 15
  const dhi = e0 * exp(-td * pow(m, ad)); // Eq. 16
  return { dni, dhi, ghi: dni * sin(altitude * RAD) + dhi };
}

/**
 * Sun altitudes [°] at which a τ pair is tried: dense near the horizon, where the model's diffuse
 * goes wrong first for pairs whose diffuse air-mass exponent is small or negative, every half degree
 * to 20° (a very small τd fails around 8–15°), then every two degrees. A pair at the edge that passes here and fails
 * between two of these altitudes is refused when that sun is asked for ({@link ashraeClearSky}).
 */
const TRIAL_ALTITUDES: readonly number[] = (() => {
  const a = [1e-6, 0.01, 0.02, 0.05, 0.1, 0.2, 0.3, 0.5, 0.75, 1, 1.5];
  for (let x = 2; x < 20; x += 0.5) a.push(x);
  for (let x = 20; x <= 90; x += 2) a.push(x);
  return a;
})();
/**
 * Days tried: near perihelion and aphelion (the model and the limits scale with different E0
 * formulas). The ratio of the two is not largest on either (ln E0/Sa is 0.00162 near day 252 against
 * 0.00108 on day 185), so a pair at the beam's edge (τb between about 0.0011 and 0.0016) passes here
 * and is refused on the days it fails, at the sun asked for ({@link ashraeClearSky}), in the same words.
 */
const TRIAL_DAYS = [3, 185];

/**
 * What the trials of a pair share, worked out once: for each trial day and altitude (days outer, in
 * the order tried) the model's E0, the air mass, the sine of the altitude and the physically possible
 * limits — the same functions of the same arguments as {@link ashraeModel} and {@link pastLimits}
 * evaluate, so every verdict and message is the one they give. A pair is then judged with two powers
 * and two exponentials per trial.
 */
interface Trial {
  altitude: number;
  e0: number;
  m: number;
  sinAltitude: number;
  limits: IrradianceLimits;
}
const TRIALS: readonly Trial[] = TRIAL_DAYS.flatMap((day) => {
  const e0 = extraterrestrialIrradiance(day);
  const sa = extraterrestrialSpencer(day);
  return TRIAL_ALTITUDES.map((altitude) => {
    const sinAltitude = sin(altitude * RAD);
    return { altitude, e0, m: airMassKastenYoung(altitude), sinAltitude, limits: physicalIrradianceLimits(sinAltitude, sa) };
  });
});

/** The first trial at which the pair's clear sky is past the limits, with what is past them, or undefined. */
function pairProblem(tauB: number, tauD: number): { altitude: number; problem: { what: string; value: number; limit: number } } | undefined {
  const { ab, ad } = ashraeAirMassExponents(tauB, tauD);
  for (const t of TRIALS) {
    const dni = t.e0 * exp(-tauB * pow(t.m, ab)); // Eq. 15, as ashraeModel
    const dhi = t.e0 * exp(-tauD * pow(t.m, ad)); // Eq. 16
    const ghi = dni * t.sinAltitude + dhi;
    const limits = t.limits;
    // the order of pastLimits: the direct normal, the diffuse, the global
    if (dni > limits.dni) return { altitude: t.altitude, problem: { what: 'a direct normal irradiance', value: dni, limit: limits.dni } };
    if (dhi > limits.dhi) return { altitude: t.altitude, problem: { what: 'a diffuse horizontal irradiance', value: dhi, limit: limits.dhi } };
    if (ghi > limits.ghi) return { altitude: t.altitude, problem: { what: 'a global horizontal irradiance', value: ghi, limit: limits.ghi } };
  }
  return undefined;
}

/**
 * Whether {@link requireClearSkyPair} accepts a τb/τd pair, without an error to build (for callers
 * that search the accepted pairs). Arguments as there, already checked.
 */
export function isAcceptedClearSkyPair(tauB: number, tauD: number): boolean {
  return (tauB === lastB && tauD === lastD) || pairProblem(tauB, tauD) === undefined;
}

/** The last pairs judged (a year of hours asks about the same few pairs again and again). */
const judged = new Map<string, true>();

/**
 * Refuses a τb/τd pair for which the ASHRAE clear-sky model gives, at some sun altitude, a diffuse
 * or global horizontal irradiance past the physically possible limits of Long & Shi (2008):
 * with a small or negative diffuse air-mass exponent the model's diffuse grows as the sun sets
 * (τb 1.2, τd 4 gives 656 W/m² of diffuse with the sun 0.05° high, and the Perez sky turns that
 * into tens of thousands of W/m² on a window facing the low sun); a very small τd gives a diffuse
 * no clear sky has (τd 0.5: some 800 W/m² with the sun overhead); a τb below about 0.002 gives a
 * beam above the extraterrestrial value (the model's E0 by the Handbook's Eq. 4 is judged against
 * Spencer's, which every irradiance input of the engine is judged by). Pairs across the span of
 * published climate tables pass (tests/core/sky/physically-possible.test.ts).
 * @param tauB - beam pseudo-optical depth [-] (already checked 0 < τb ≤ {@link TAU_B_MAX})
 * @param tauD - diffuse pseudo-optical depth [-] (already checked 0 < τd ≤ {@link TAU_D_MAX})
 * @param names - the arguments' names as the user sees them (default `tauB`, `tauD`)
 * @throws SunpaneError naming the τd argument, with τb, the altitude and the value past the limit
 */
export function requireClearSkyPair(tauB: number, tauD: number, names: { tauB: string; tauD: string } = { tauB: 'tauB', tauD: 'tauD' }): void {
  if (tauB === lastB && tauD === lastD) return; // the same pair hour after hour: no key to build
  const key = `${tauB}/${tauD}`;
  // Stryker disable next-line BlockStatement: emptied, the pair is judged again and passes again (the cache only saves time)
  if (judged.has(key)) {
    lastB = tauB;
    lastD = tauD;
    return;
  }
  const found = pairProblem(tauB, tauD);
  if (found !== undefined) throw pairError(names.tauB, names.tauD, tauB, tauD, found.altitude, found.problem);
  // Stryker disable next-line ConditionalExpression,EqualityOperator: when the cache is emptied only changes how often a pair is judged again, never the verdict
  if (judged.size > 64) judged.clear();
  // Stryker disable next-line BooleanLiteral: the cache is read by has() only, never by its value
  judged.set(key, true);
  lastB = tauB;
  lastD = tauD;
}
let lastB = Number.NaN;
let lastD = Number.NaN;

function pairError(tauBName: string, tauDName: string, tb: number, td: number, altitude: number, problem: { what: string; value: number; limit: number }): SunpaneError {
  const sun = altitude < 0.005 ? 'at the horizon' : `${Number(altitude.toFixed(2))}° high`;
  return new SunpaneError(
    tauDName,
    td,
    `must give, with ${tauBName} = ${tb}, a clear sky within the physically possible limits (Long & Shi 2008) at every sun altitude`,
    `the model gives ${problem.what} of ${problem.value.toFixed(1)} W/m² with the sun ${sun}, above the limit of ${problem.limit.toFixed(1)} W/m²; published climate tables give about τb 0.2–0.8 and τd 1.2–3.5 (from memory): check the pair against the table and that τb and τd are not swapped`,
  );
}

/**
 * Clear-sky irradiance by the turbidity model of Ineichen & Perez (2002).
 *
 * @param sunAltitude - sun altitude [°], −90…90
 * @param dayOfYear - day of the year, 1…366
 * @param linkeTurbidity - Linke turbidity factor TL (air-mass-2 value) [-], 1…10
 * @param elevation - site elevation above sea level [m], −500…9000
 * @returns direct normal, diffuse horizontal and global horizontal irradiance [W/m²]; all 0 when the
 * sun is at or below the horizon
 * @remarks Ineichen, P. & Perez, R. (2002), "A new airmass independent formulation for the Linke
 * turbidity coefficient", Solar Energy 73(3), 151–157 (equations from memory):
 * fh1 = exp(−h/8000), fh2 = exp(−h/1250), cg1 = 5.09e−5 h + 0.868, cg2 = 3.92e−5 h + 0.0387;
 * GHI = cg1 I0 cos z exp(−cg2 m (fh1 + fh2 (TL − 1))) exp(0.01 m^1.8);
 * DNI = b I0 exp(−0.09 m (TL − 1)) with b = 0.664 + 0.163 / fh1, limited so that it does not exceed
 * GHI (1 − (0.1 − 0.2 exp(−TL)) / (0.1 + 0.882 / fh1)) / cos z; DHI = GHI − DNI cos z.
 * m is the ABSOLUTE (pressure-corrected) air mass, the Kasten–Young relative air mass × p/p0 with
 * p the standard-atmosphere pressure at the elevation ({@link standardPressure}), as the formulation
 * is meant to be air-mass independent (from memory: with the relative air mass a high site would
 * get less global irradiance at low sun than a sea-level one, which is unphysical); I0 is the
 * extraterrestrial irradiance by Spencer (1971). The direct normal is also held at or below I0:
 * the beam coefficient b = 0.664 + 0.163/fh1 exceeds 1 above about 1,900 m, and with the sun high
 * above about 6,000 m the formula's beam would otherwise exceed the extraterrestrial value. The
 * diffuse is held at the physically possible limit of Long & Shi (2008), 0.95 I0 cos(z)^1.2 + 50
 * W/m², which the formula passes only with the sun within about half a degree of the horizon
 * (TL up to 2.5 at sea level); the global is then beam · cos z + the held diffuse.
 */
export function ineichenPerezClearSky(sunAltitude: number, dayOfYear: number, linkeTurbidity: number, elevation: number): ClearSky {
  const altitude = requireRange('sunAltitude', sunAltitude, -90, 90, '°');
  const i0 = extraterrestrialSpencer(requireDayOfYear(dayOfYear));
  const tl = requireRange('linkeTurbidity', linkeTurbidity, LINKE_MIN, LINKE_MAX);
  const h = requireRange('elevation', elevation, ELEVATION_MIN, ELEVATION_MAX, 'm');
  if (altitude <= 0) return { ...NO_SUN };
  const m = (airMassKastenYoung(altitude) * standardPressure(h)) / 1013.25;
  const cosZ = sin(altitude * RAD);
  const fh1 = exp(-h / 8000);
  const fh2 = exp(-h / 1250);
  const cg1 = 5.09e-5 * h + 0.868;
  const cg2 = 3.92e-5 * h + 0.0387;
  // GHI / cos z is formed first so the beam limit needs no division by cos z (finite at sunrise).
  const ghiPerCosZ = cg1 * i0 * exp(-cg2 * m * (fh1 + fh2 * (tl - 1))) * exp(0.01 * pow(m, 1.8));
  const ghi = ghiPerCosZ * cosZ;
  const b = 0.664 + 0.163 / fh1;
  const dniModel = b * i0 * exp(-0.09 * m * (tl - 1));
  const dniLimit = ghiPerCosZ * (1 - (0.1 - 0.2 * exp(-tl)) / (0.1 + 0.882 / fh1));
  // Never above the extraterrestrial value: at high sites (fh1 small) b exceeds 1 and the model's
  // beam would pass I0 with the sun high (above about 6,000 m), which no atmosphere allows.
  const dni = Math.max(0, min(dniModel, dniLimit, i0));
  // Within about half a degree of the horizon the formula's enhancement term exp(0.01 m^1.8) lifts
  // the global past anything a sky gives (sea level, TL 2, sun 0.3° high: a diffuse of 124 W/m²
  // against a physically possible 52): the diffuse is held at the Long & Shi (2008) limit.
  const dhiLimit = physicalIrradianceLimits(cosZ, i0).dhi;
  const dhiModel = Math.max(0, ghi - dni * cosZ);
  if (dhiModel <= dhiLimit) return { dni, dhi: dhiModel, ghi };
  return { dni, dhi: dhiLimit, ghi: dni * cosZ + dhiLimit };
}
