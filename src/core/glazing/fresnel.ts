/**
 * Solar optics of uncoated glass panes from the Fresnel equations, Snell's law and Bouguer's law of
 * absorption (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., §5.1–5.3; the
 * equation numbers cited below are from memory, the formulas are gathered in docs/methods.md#fresnel-optics-of-uncoated-panes).
 */
import { RAD } from '../common';

const { cos, sin, exp, sqrt } = Math;

/** Refractive index of soda-lime glass for solar radiation (Duffie & Beckman §5.1). */
export const GLASS_REFRACTIVE_INDEX = 1.526;

/** Transmittance and reflectance of a pane or a stack of panes for one polarisation. */
interface PolarisedPair {
  t: number;
  r: number;
}

/**
 * Interface reflectances for the two polarisations at incidence θ from air (n = 1) into glass.
 *
 * @param incidence - angle of incidence [°], 0…90
 * @param n - refractive index of the glass [-]
 * @returns `{ perpendicular, parallel, cosRefracted }`: r⊥ and r∥ [-] and cos θ2 of the refracted ray
 * @remarks r⊥ = ((cos θ − n cos θ2)/(cos θ + n cos θ2))², r∥ = ((n cos θ − cos θ2)/(n cos θ + cos θ2))²,
 * sin θ2 = sin θ / n — the Fresnel equations in their cosine form, equal to D&B Eqs. 5.1.1–5.1.3
 * (sin²(θ2 − θ)/sin²(θ2 + θ) and tan²(θ2 − θ)/tan²(θ2 + θ)) but finite at normal incidence.
 */
export function interfaceReflectance(incidence: number, n: number = GLASS_REFRACTIVE_INDEX): { perpendicular: number; parallel: number; cosRefracted: number } {
  const thetaRad = incidence * RAD;
  const c1 = cos(thetaRad);
  const s2 = sin(thetaRad) / n; // Snell, D&B Eq. 5.1.4
  const c2 = sqrt(1 - s2 * s2);
  const perp = (c1 - n * c2) / (c1 + n * c2);
  const par = (n * c1 - c2) / (n * c1 + c2);
  return { perpendicular: perp * perp, parallel: par * par, cosRefracted: c2 };
}

function pane(r: number, tauA: number): PolarisedPair {
  const rt = r * tauA;
  const denom = 1 - rt * rt;
  const t = (tauA * (1 - r) * (1 - r)) / denom; // D&B Eq. 5.3.1 (per polarisation)
  const refl = r + (r * (1 - r) * (1 - r) * tauA * tauA) / denom; // D&B Eq. 5.3.2
  return { t, r: refl };
}

function stack(front: PolarisedPair, back: PolarisedPair): PolarisedPair {
  const denom = 1 - front.r * back.r; // symmetric panes: front and back reflectances are equal
  return { t: (front.t * back.t) / denom, r: front.r + (front.t * front.t * back.r) / denom };
}

/**
 * Solar transmittance of a stack of identical uncoated panes at an incidence angle.
 *
 * @param incidence - angle of incidence [°], 0…90 (90 gives 0)
 * @param panes - number of panes, 1…4
 * @param kl - extinction coefficient × thickness of one pane, K·L [-], ≥ 0
 * @param n - refractive index [-], default 1.526
 * @returns transmittance [-], 0…1
 * @remarks Per polarisation one pane: τ = τa (1 − r)² / (1 − (r τa)²), ρ = r + r (1 − r)² τa² / (1 − (r τa)²),
 * τa = exp(−K L / cos θ2); panes combine as T = T1 T2 / (1 − R1 R2) with the stack's reflectance
 * R = R1 + T1² R2 / (1 − R1 R2); the two polarisations are averaged last — Duffie & Beckman, 4th ed.,
 * §5.2–5.3. Each pane's reflectance is the same from both sides (an absorbing
 * pane with equal interfaces is symmetric), so the stack needs one reflectance per polarisation.
 */
export function paneStackTransmittance(incidence: number, panes: number, kl: number, n: number = GLASS_REFRACTIVE_INDEX): number {
  if (incidence >= 90) return 0;
  const { perpendicular, parallel, cosRefracted } = interfaceReflectance(incidence, n);
  const tauA = exp(-kl / cosRefracted); // Bouguer, D&B Eq. 5.2.2
  const onePerp = pane(perpendicular, tauA);
  const onePar = pane(parallel, tauA);
  let sPerp = onePerp;
  let sPar = onePar;
  for (let k = 1; k < panes; k++) {
    sPerp = stack(sPerp, onePerp);
    sPar = stack(sPar, onePar);
  }
  return (sPerp.t + sPar.t) / 2;
}

/** Largest K·L the solver will use; beyond it the normal transmittance of one pane is below 1e-8. */
export const KL_MAX = 20;

/**
 * The per-pane K·L at which a stack's normal-incidence transmittance equals a target.
 *
 * @param target - normal-incidence transmittance wanted [-], 0…1
 * @param panes - number of panes, 1…4
 * @returns K·L [-], 0…{@link KL_MAX}: 0 when the target is at or above the clear, non-absorbing
 * stack's transmittance ((1 − r)/(1 + (2N − 1) r) for N panes); bisection to 1e-12 otherwise
 * (the transmittance falls monotonically with K·L).
 */
export function paneExtinctionFor(target: number, panes: number): number {
  if (target >= paneStackTransmittance(0, panes, 0)) return 0;
  let lo = 0;
  let hi = KL_MAX;
  for (let i = 0; i < 200 && hi - lo > 1e-12; i++) {
    const mid = (lo + hi) / 2;
    if (paneStackTransmittance(0, panes, mid) > target) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
