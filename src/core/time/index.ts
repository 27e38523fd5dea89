/**
 * Time: spreadsheet serial numbers (1900 date system, local standard time), UTC instants, calendar
 * dates, Julian days, ΔT, daylight-saving rules, the 1904 date system and the fitting of a
 * typical year's rows to a calendar year. Every calendar and serial calculation of the project lives here.
 * Imports: common.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { civilToSerial, dayOfYear, daysInMonth, formatSerialIso, hoursInYear, isLeapYear, julianDay, MAX_SERIAL_EXCLUSIVE, MIN_SERIAL, parseIsoLocal, requireSerial, requireUtcOffset, requireYear, serialToCivil, serialToUtcMs, UTC_OFFSET_MAX, UTC_OFFSET_MIN, utcMsToSerial, utcOffsetText } from './calendar';
export { clockToStandard, DATE_1904_OFFSET, DATE_SYSTEM_WORDS, type DateSystem, type DaylightSavingRule, describeDaylightSaving, DST_SHIFT_MAX, fitYearOfHours, fromSerial1900, inDaylightSaving, MAX_SERIAL_1904_EXCLUSIVE, requireDateSystem, requireDaylightSaving, requireSerialIn, standardToClock, toSerial1900, type YearFit, type YearFitRule } from './clock';
export { deltaTAt } from './deltaT';
export { clockStampToStandard, DEFAULT_TIME_CONVENTION, evaluationSerial, hourFraction, requireStamp, requireTimeConvention, rowOfSerial, rowStamp, TIME_CONVENTIONS, type TimeConvention } from './convention';
