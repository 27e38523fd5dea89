/**
 * Foundations every concept folder uses: the one error type of the core (argument, value, allowed
 * range), degree/radian helpers with clamped inverse trigonometry, and two numerical methods —
 * Gauss–Legendre quadrature of hemispherical averages and Fritsch–Carlson monotone interpolation.
 * Imports nothing.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { acosClamped, asinClamped, DEG, RAD, wrap180, wrap360 } from './angles';
export { describeValue, MONTHLY_LIST_RULE, rangeText, requireFinite, requireRange, SunpaneError } from './errors';
export { gaussLegendre, hemisphericalAverage } from './hemispherical';
export { type MonotoneCubic, monotoneCubic } from './monotoneCubic';
