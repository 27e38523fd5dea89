/**
 * The sky: extraterrestrial irradiance, air mass, clear-sky models, the split of global horizontal
 * irradiance, and the irradiance on a window plane (beam, sky diffuse by the isotropic, Hay–Davies or
 * Perez 1990 model, ground-reflected), and the limits a measured value can physically reach. Imports:
 * common, time, sun.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { AIR_MASS_HORIZON, airMassKastenYoung } from './airMass';
export { ashraeClearSky, ineichenPerezClearSky, isAcceptedClearSkyPair, requireClearSkyPair, LINKE_MAX, LINKE_MIN, TAU_B_MAX, TAU_D_MAX } from './clearSky';
export { decomposeErbs, GHI_MAX } from './decomposition';
export { extraterrestrialIrradiance, extraterrestrialSpencer } from './extraterrestrial';
export { type DiffuseShade, perezBrightnessColumns, type PerezBrightnessColumns, planeIrradiance, type PlaneParts, type PlaneRows, type PreparedPlane, preparePlane, type SkyModel } from './planeIrradiance';
export { ashraeVerticalDiffuseRatio, IRRADIANCE_MAX } from './transposition';
export { closureTolerance, COMPARISON_MIN_GHI, diffuseRatioLimit, IRRADIANCE_FLOOR, type IrradianceLimits, isPossibleGlobal, isPossibleIrradiance, physicalIrradianceLimits, requirePossibleIrradiance } from './qualityLimits';
