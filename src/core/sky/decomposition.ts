/**
 * Decomposition of global horizontal irradiance into its direct and diffuse parts by the
 * diffuse-fraction correlation of Erbs, Klein & Duffie (1982).
 */
import { RAD, SunpaneError, requireRange } from '../common';
import { extraterrestrialSpencer } from './extraterrestrial';
import { isPossibleGlobal, physicalIrradianceLimits } from './qualityLimits';

const { cos } = Math;

/** Global horizontal irradiance split into direct normal and diffuse horizontal. */
export interface Decomposed {
  /** Direct normal irradiance [W/m²]. */
  dni: number;
  /** Diffuse horizontal irradiance [W/m²]. */
  dhi: number;
  /** Clearness index kt = GHI / (E0 max(cos z, 0.065)) [-], 0…1. */
  clearnessIndex: number;
}

/** Highest global horizontal irradiance accepted [W/m²] (above any measured value at ground level). */
export const GHI_MAX = 2000;
/** Floor on cos(zenith) in the clearness index and the direct normal, as in the reference check (≈ 86.3°). */
export const COS_ZENITH_FLOOR = 0.065;

/**
 * Diffuse fraction of global horizontal irradiance by Erbs et al. (1982).
 *
 * @param clearnessIndex - clearness index kt [-], 0…1
 * @returns diffuse fraction DHI / GHI [-], 0.165…1
 * @remarks kt ≤ 0.22: 1 − 0.09 kt; 0.22 < kt ≤ 0.80: 0.9511 − 0.1604 kt + 4.388 kt² − 16.638 kt³
 * + 12.336 kt⁴; kt > 0.80: 0.165 — Erbs, D. G., Klein, S. A. & Duffie, J. A. (1982), "Estimation of
 * the diffuse radiation fraction for hourly, daily and monthly-average global radiation", Solar
 * Energy 28(4), 293–302, Eq. 1.
 */
export function diffuseFractionErbs1982(clearnessIndex: number): number {
  const kt = requireRange('clearnessIndex', clearnessIndex, 0, 1);
  if (kt <= 0.22) return 1 - 0.09 * kt;
  if (kt <= 0.8) return 0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4;
  return 0.165;
}

/**
 * Splits global horizontal irradiance into direct normal and diffuse horizontal (Erbs et al. 1982).
 *
 * @param ghi - global horizontal irradiance [W/m²], 0…2000 and at most the physically possible global
 *   at this sun (Long & Shi 2008: 1.5 E0 cos(z)^1.2 + 100; 100 with the sun down), else refused
 * @param sunZenith - sun zenith angle [°], 0…180
 * @param dayOfYear - day of the year, 1…366 (for the extraterrestrial irradiance)
 * @returns direct normal and diffuse horizontal irradiance [W/m²] and the clearness index. With the
 * sun at or below the horizon (zenith ≥ 90°) the direct normal is 0 and all of the global is diffuse.
 * @remarks kt = GHI / (E0 max(cos z, 0.065)), limited to 1, with E0 by Spencer (1971) at 1366.1 W/m²;
 * DHI = GHI · fd(kt) by {@link diffuseFractionErbs1982}; DNI = (GHI − DHI) / max(cos z, 0.065), then
 * limited to E0 (the beam cannot exceed its extraterrestrial value). The floor keeps the direct
 * normal finite near the horizon, where dividing by cos z amplifies measurement error.
 */
export function decomposeErbs(ghi: number, sunZenith: number, dayOfYear: number): Decomposed {
  const g = requireRange('ghi', ghi, 0, GHI_MAX, 'W/m²');
  const zenith = requireRange('sunZenith', sunZenith, 0, 180, '°');
  const e0 = extraterrestrialSpencer(dayOfYear);
  const cosZ = cos(zenith * RAD);
  if (!isPossibleGlobal(g, cosZ, e0)) {
    const limit = physicalIrradianceLimits(Math.max(-1, Math.min(1, cosZ)), e0).ghi;
    const sun = zenith < 90 ? `with the sun ${Number((90 - zenith).toFixed(2))}° high` : 'with the sun at or below the horizon';
    throw new SunpaneError('ghi', ghi, `must be at most ${Number(limit.toFixed(1))} W/m², the physically possible limit (Long & Shi 2008) ${sun} and an extraterrestrial ${Number(e0.toFixed(1))} W/m²; check the units (W/m², not hourly sums in Wh/m² or kJ/m²), the date-time and the site`);
  }
  const cosZFloored = cosZ > COS_ZENITH_FLOOR ? cosZ : COS_ZENITH_FLOOR;
  const kt = Math.min(1, g / (e0 * cosZFloored));
  if (zenith >= 90) return { dni: 0, dhi: g, clearnessIndex: kt };
  const dhi = g * diffuseFractionErbs1982(kt);
  const dni = Math.min(e0, (g - dhi) / cosZFloored);
  return { dni, dhi, clearnessIndex: kt };
}
