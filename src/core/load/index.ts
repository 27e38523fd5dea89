/**
 * Load: cooling load from window gain by the radiant time series, and design-day peaks of gain and
 * load. Imports: common, gain.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { designDayPeaks } from './designDay';
export { coolingLoad, requireRadiantTimeFactors } from './rts';
