/**
 * Relative optical air mass: the path length of sunlight through the atmosphere relative to the
 * path at the zenith.
 */
import { RAD, requireRange } from '../common';
import { kastenYoungPowerFast } from './airMassFast';

const { sin, pow } = Math;

/** Exponent and offset of the power term of Kasten & Young (1989) Eq. 3: 0.50572 (β + 6.07995)^−1.6364. */
const KY_EXPONENT = -1.6364;
const KY_OFFSET = 6.07995;

/**
 * The power term (β + 6.07995)^−1.6364 of Kasten & Young Eq. 3 as written. The hourly path uses its
 * fast twin {@link kastenYoungPowerFast} (airMassFast.ts), held to this within 1e-14 relative.
 */
export function kastenYoungPowerPlain(beta: number): number {
  return pow(beta + KY_OFFSET, KY_EXPONENT);
}

const kastenYoungPower = kastenYoungPowerFast;

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
 * @remarks Kasten & Young (1989) Eq. 3.
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
