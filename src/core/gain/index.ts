/**
 * Gain: one window described once (WindowSpec) and checked once, its solar gain for one hour with a
 * step-by-step working, its whole year as hourly columns with a summary, and its clear design days.
 * Imports: common, time, sun, sky, shading, glazing.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { type AnnualSeries, annualSeries } from './annual';
export { type AnnualSummary, summarizeAnnual, summarizeWindowYear, type WindowYearFigures } from './annualSummary';
export { type SharedYear, SharedYears, sharedYearKey } from './sharedYear';
export { type DesignDayGainMonth, type DesignDayGainOptions, designDayGains, peakOfDay } from './designDay';
export { gainSteps } from './gainSteps';
export { type DiffuseShading, type Weather, type WindowRoom, type WindowSpec } from './window';
export { type DesignTemperatures } from './window';
export { DAILY_RANGE_FRACTIONS, DAILY_RANGE_MAX, designDayDryBulb, DRY_BULB_MAX, DRY_BULB_MIN } from './outdoorTemperature';
export { type WindowGainHour, windowGainAt } from './windowGain';
export { DEFAULT_CONDUCTION_RADIANT_FRACTION, DEFAULT_RADIANT_FRACTION, INDOOR_TEMPERATURE_MAX, INDOOR_TEMPERATURE_MIN, MAX_IRRADIANCE, MAX_LENGTH, MIN_WINDOW_SIZE, skyModelOf, U_VALUE_MAX, validateWindowSpec } from './windowSpec';
