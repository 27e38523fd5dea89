/**
 * Shading: the sunlit fraction of a window's glass behind an overhang, fins, a reveal and a
 * skyline by exact shadow polygons (united, never summed), the polygon arithmetic under it, and
 * shading masks over the sky. Imports: common, time, sun.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { MASK_DEFAULT_YEAR, monthHourMask, shadingMaskGrid } from './shadingMask';
export { skylineSkyViewFactor } from './skyline';
export { hasShading, PATH_SHADING_NAMES, type PreparedShading, prepareShading, requireShading, requireVerticalForShading, shadowDepth, shadowWidth, sunlitFraction, type WindowOpening } from './sunlit';
export { type Fin, type Overhang, type Shading } from './types';
