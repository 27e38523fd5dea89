/**
 * The sun: its position by the NREL Solar Position Algorithm (every step of the report, one
 * instant), sunrise / solar noon / sunset of a local day, the fast hourly path over a year, the site
 * description, and the angles between the sun and a surface (incidence, horizontal and vertical
 * shadow angles). Imports: common, time.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { sunEvents, sunEventsOnClock } from './events';
export { type Site } from './site';
export { standardPressure, type SunOptions, type SunPosition, sunPosition } from './spa';
export { clearSunNodes, sunPositionFromNodes } from './sunNodes';
export { annualSunPath, type SunPathYear, type SunTrigColumns } from './sunPath';
export { incidenceAngle, profileAngle, wallSolarAzimuth } from './surfaceAngles';
