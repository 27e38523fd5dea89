/**
 * Relative optical air mass: the path length of sunlight through the atmosphere relative to the
 * path at the zenith.
 */
import { RAD } from './angles';
import { requireRange } from './errors';

const { sin, exp, log } = Math;

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
 * @remarks Kasten & Young (1989) Eq. 3, the power written x^−1.6364 = exp(−1.6364 ln x) (x ≥ 6.08,
 * so the logarithm is well defined; same value to about 1e-15 relative, about half the time of
 * Math.pow in V8).
 */
export function airMassKastenYoungUnchecked(sunAltitude: number): number {
  const beta = sunAltitude > 0 ? sunAltitude : 0;
  return 1 / (sin(beta * RAD) + 0.50572 * exp(-1.6364 * log(beta + 6.07995))); // Kasten & Young Eq. 3
}

/** Kasten–Young air mass at the horizon, the largest value {@link airMassKastenYoung} returns. */
export const AIR_MASS_HORIZON = airMassKastenYoungUnchecked(0);
