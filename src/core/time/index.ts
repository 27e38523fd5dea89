/**
 * Time: spreadsheet serial numbers (1900 date system, local standard time), UTC instants, calendar
 * dates, Julian days and ΔT. Every calendar and serial calculation of the project lives here.
 * Imports: common.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { civilToSerial, dayOfYear, daysInMonth, formatSerialIso, hoursInYear, julianDay, MAX_SERIAL_EXCLUSIVE, MIN_SERIAL, parseIsoLocal, requireSerial, requireUtcOffset, requireYear, serialToCivil, serialToUtcMs, UTC_OFFSET_MAX, UTC_OFFSET_MIN, utcMsToSerial } from './calendar';
export { deltaTAt } from './deltaT';
