/**
 * The angular model of Karlsson & Roos for the total solar energy transmittance (SHGC) of coated
 * glazing units (low-emittance and spectrally selective coatings), whose angular fall differs from
 * that of clear panes with added absorption.
 *
 * Source: Karlsson, J. & Roos, A. (2000), "Modelling the angular behaviour of the total solar energy
 * transmittance of windows", Solar Energy 69(4), 321–329:
 *
 *   g(θ) / g(0) = 1 − a·z^α − b·z^β − c·z^γ,   z = θ / 90°
 *   a = 8,  b = 0.25 / q,  c = 1 − a − b,  α = 5.2 + 0.7 q,  β = 2,
 *   γ = (5.26 + 0.06 p) + (0.73 + 0.04 p) q
 *
 * with p the number of panes and q the paper's glazing-type parameter (a larger q keeps the
 * transmittance up to higher angles). Since c = 1 − a − b the curve is exactly 1 at 0° and 0 at
 * 90°. The formula and its constants are as the paper gives them (cross-read against two
 * independent public transcriptions); the paper's own table of q by glazing type could not be read
 * through this project's search, so Sunpane takes q from the user and ships no per-product values.
 */
import { requireRange } from '../common';

/** Range of the glazing-type parameter q accepted: the paper's curves run from 1 to 10 (from memory). */
export const KR_TYPE_PARAMETER_MIN = 1;
export const KR_TYPE_PARAMETER_MAX = 10;

const { pow } = Math;

/**
 * The normalised angular factor g(θ)/g(0) of Karlsson & Roos (2000) for a coated unit.
 *
 * @param incidence - incidence angle [°], 0…180; 90 or more gives 0
 * @param panes - number of panes p, 1…4
 * @param typeParameter - the glazing-type parameter q, 1…10
 * @returns g(θ)/g(0) [-], 0…1 (values of the polynomial outside 0…1 are clipped)
 * @remarks See the module comment for the formula and its source.
 */
export function karlssonRoosFactor(incidence: number, panes: number, typeParameter: number): number {
  const theta = requireRange('incidence', incidence, 0, 180, '°');
  const p = requireRange('panes', panes, 1, 4, undefined, { integer: true });
  const q = requireRange('glazingTypeParameter', typeParameter, KR_TYPE_PARAMETER_MIN, KR_TYPE_PARAMETER_MAX);
  return karlssonRoosModel(p, q)(theta);
}

/** The Karlsson–Roos factor as a function of the incidence angle for checked p and q. */
export function karlssonRoosModel(panes: number, q: number): (incidence: number) => number {
  const a = 8;
  const b = 0.25 / q;
  const c = 1 - a - b;
  const alpha = 5.2 + 0.7 * q;
  const beta = 2;
  const gamma = 5.26 + 0.06 * panes + (0.73 + 0.04 * panes) * q;
  return (incidence) => {
    if (incidence >= 90) return 0;
    const z = incidence / 90;
    const f = 1 - a * pow(z, alpha) - b * pow(z, beta) - c * pow(z, gamma); // Karlsson & Roos (2000)
    return f < 0 ? 0 : f > 1 ? 1 : f;
  };
}
