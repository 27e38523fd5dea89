/**
 * Load: cooling load from window gain by the radiant time series as published (solar series for
 * the transmitted beam, non-solar for diffuse and conduction, radiant fractions per part), example
 * series (illustrative, from a stated room model), and design-day peaks of gain and load.
 * Imports: common, gain.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { designDayPeaks, type DesignDayMonth, type DesignDayOptions } from './designDay';
export { coolingLoad, requireRadiantTimeFactors } from './rts';
export { annualLoadParts, type LoadPeak, loadPeak, windowRoomSeries } from './room';
export { type Construction, CONSTRUCTIONS, firstOrderRadiantTimeSeries, ILLUSTRATIVE_ROOM_MODEL, ILLUSTRATIVE_SOURCE, illustrativeRadiantTimeSeries } from './rtsSeries';
export { annualCoolingLoad, type GainByPart, type RadiantFractions, requireRoomSeries, type RoomSeries, windowCoolingLoad, type WindowLoad } from './windowLoad';
