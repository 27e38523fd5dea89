/**
 * Shading: the sunlit fraction of a window's glass behind an overhang, fins, a reveal and a
 * skyline by exact shadow polygons (united, never summed), the polygon arithmetic under it, shading
 * masks over the sky, and the view factors of the glass to the open sky, ground and horizon band
 * (the diffuse counterpart of the sunlit fraction). Imports: common, time, sun.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { MASK_DEFAULT_YEAR, monthHourMask, shadingMaskGrid } from './shadingMask';
export { skylineSkyViewFactor } from './skyline';
export { hasShading, PATH_SHADING_NAMES, type PreparedShading, prepareShading, requireShading, requireVerticalForShading, shadowDepth, shadowWidth, sunlitFraction, type WallFrameColumns, type WindowOpening } from './sunlit';
export { type Fin, type Overhang, type Shading } from './types';
export { BARE_VIEW_FACTORS, HORIZON_BAND_DEG, pointViewFactors, VIEW_FACTOR_ERROR, type WindowViewFactors, windowViewFactors } from './viewFactors';
