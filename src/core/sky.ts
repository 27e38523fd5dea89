/**
 * Sky irradiance: the one import for extraterrestrial irradiance, air mass, clear-sky models,
 * decomposition of global horizontal irradiance, and transposition to a window plane. Each concept
 * lives in its own module; this file gathers them.
 */
export type { SkyModel } from './window';
export {
  extraterrestrialIrradiance,
  extraterrestrialSpencer,
  requireDayOfYear,
  SOLAR_CONSTANT_ASHRAE,
  SOLAR_CONSTANT_SPENCER,
  DAY_OF_YEAR_MIN,
  DAY_OF_YEAR_MAX,
} from './extraterrestrial';
export { airMassKastenYoung, AIR_MASS_HORIZON } from './airMass';
export {
  type ClearSky,
  ashraeClearSky,
  ashraeAirMassExponents,
  ineichenPerezClearSky,
  TAU_B_MAX,
  TAU_D_MAX,
  LINKE_MIN,
  LINKE_MAX,
} from './clearSky';
export { type Decomposed, decomposeErbs, diffuseFractionErbs1982, GHI_MAX } from './decomposition';
export {
  skyDiffuseIsotropic,
  skyDiffuseHayDavies,
  groundReflected,
  ashraeVerticalDiffuseRatio,
  skyDiffuseAshraeClearDay,
  IRRADIANCE_MAX,
} from './transposition';
export { skyDiffusePerez1990, perezParts, type PerezParts, PEREZ_1990_COMPOSITE } from './perez1990';
export { type PlaneIrradianceInput, type PlaneIrradiance, planeIrradiance, SKY_MODELS } from './planeIrradiance';
