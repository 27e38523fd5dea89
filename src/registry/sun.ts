/**
 * Worksheet-function descriptors: sun position (NREL SPA), sunrise / solar noon / sunset, and the
 * angles between the sun and a surface. Every descriptor reads its arguments and calls the core
 * (src/core/sun/sunNodes.ts — the SPA with its slow terms kept by day, so that a range of
 * date-times costs little more than suncalc — and src/core/sun/surfaceAngles.ts); none computes by itself.
 */
import { SunpaneError } from '../core/common';
import { clockStampToStandard, evaluationSerial, fromSerial1900, MAX_SERIAL_EXCLUSIVE, requireStamp, serialToUtcMs, type TimeConvention } from '../core/time';
import { type SunOptions, type SunPosition, sunEventsOnClock, sunPositionFromNodes, incidenceAngle, profileAngle, wallSolarAzimuth } from '../core/sun';
import { GLOSSARY } from './glossary';
import { type Args, type ClockFields, type FunctionDescriptor, NotAvailable, type OutsideCheck, type ParamDescriptor } from './types';

/** When and where, then the optional atmosphere and ΔT: the shared head of the sun-position functions. */
const WHEN_WHERE: readonly ParamDescriptor[] = [GLOSSARY.dateTime, GLOSSARY.latitude, GLOSSARY.longitude, GLOSSARY.utcOffset];
const ATMOSPHERE: readonly ParamDescriptor[] = [GLOSSARY.elevation, GLOSSARY.pressure, GLOSSARY.temperature, GLOSSARY.deltaT];
/**
 * The time convention, last (added after release): the sun at the instant typed by default, or at
 * the middle of the hour ending then, as the window functions and the hourly tables take it.
 */
const INSTANT: ParamDescriptor = {
  ...GLOSSARY.timeConvention,
  default: 'instant',
  description: 'how dateTime is read: "instant" (default) = the sun at dateTime; "hourEnding" = the hour ending at dateTime, sun at mid-hour (as the window functions and hourly tables read an hour)',
};
/**
 * The workbook's clock, last of all (added after release): a daylight-saving rule, so that
 * date-times are read on the clock, and the date system of serial date-times.
 */
const CLOCK: ParamDescriptor = GLOSSARY.clock;
const SUN_PARAMS: readonly ParamDescriptor[] = [...WHEN_WHERE, ...ATMOSPHERE, INSTANT, CLOCK];
/** Rise and set follow the SPA's fixed horizon convention: only ΔT changes them. */
const EVENT_PARAMS: readonly ParamDescriptor[] = [GLOSSARY.date, GLOSSARY.latitude, GLOSSARY.longitude, GLOSSARY.utcOffset, GLOSSARY.deltaT, CLOCK];

/** The lowest date-time a result can be: a minute before 1 January 1904, serial 0 of the 1904 date system. */
const EARLIEST_RESULT = -1 / 1440;

/** surfaceAzimuth comes before the optional tilt so that required arguments come first. */
const SURFACE_AZIMUTH: ParamDescriptor = { ...GLOSSARY.surfaceAzimuth };
const SURFACE_TILT: ParamDescriptor = { ...GLOSSARY.surfaceTilt };

const EXAMPLE_SPA = ['"2003-10-17T12:30:30"', '39.742476', '-105.1786', '-7', '1830.14', '820', '11', '67'];

const SPA_REPORT = 'NREL SPA worked example (Reda & Andreas, NREL/TP-560-34302, rev. 2008, Table A5.1)';
const SPA_TESTS = ['tests/reference/spa-worked-example.test.ts', 'tests/fixtures/formulas.ts'] as const;
/** Sun position: the report's example, and two independent npm libraries over many instants. */
const POSITION_CHECK: OutsideCheck = {
  source: `${SPA_REPORT} — stated in the publication; and astronomy-engine 2.1.19 (within 0.002°) and suncalc 2.0.2 (within 0.03°) at 2,500 random instants and sites, 1950–2100 — produced by named npm libraries.`,
  tests: [...SPA_TESTS, 'tests/reference/astronomy-engine-sun.test.ts', 'tests/reference/suncalc-sun-position.test.ts'],
};

/** Why a date-time cannot be read by the convention asked for (the hour ending then starts before 1900-03-01), or undefined. */
function stampProblem(a: Args): string | undefined {
  try {
    requireStamp('dateTime', a.dateTime, (a.timeConvention as TimeConvention | undefined) ?? 'instant');
    return undefined;
  } catch (err) {
    if (err instanceof SunpaneError) return err.message;
    throw err;
  }
}

/** The last options made, reused while a range of cells shares them (most ranges vary only the date-time). */
let lastOptions: SunOptions = {};

function optionsOf(a: Args): SunOptions {
  const o = lastOptions;
  if (o.elevation === a.elevation && o.pressure === a.pressure && o.temperature === a.temperature && o.deltaT === a.deltaT) return o;
  lastOptions = {
    elevation: a.elevation as number,
    pressure: a.pressure as number | undefined,
    temperature: a.temperature as number,
    deltaT: a.deltaT as number | undefined,
  };
  return lastOptions;
}

function positionOf(a: Args): SunPosition {
  const convention = (a.timeConvention as TimeConvention | undefined) ?? 'instant';
  const stamp = requireStamp('dateTime', a.dateTime, convention);
  const rule = (a.clock as ClockFields | undefined)?.rule;
  const standard = rule === undefined ? stamp : clockStampToStandard(stamp, convention, rule);
  const utcMs = serialToUtcMs(evaluationSerial(standard, convention), a.utcOffset as number);
  return sunPositionFromNodes(utcMs, a.latitude as number, a.longitude as number, optionsOf(a), SCRATCH);
}

/** The position the last cell was given; each evaluate reads one number from it before the next cell. */
const SCRATCH: SunPosition = { altitude: 0, azimuth: 0, zenith: 0, declination: 0, hourAngle: 0, equationOfTime: 0, rightAscension: 0, altitudeUnrefracted: 0, solarTime: 0, earthSunDistance: 0 };

/** The day's events on the call's clock (clock-time serials, 1900 system). */
function eventsOf(a: Args) {
  const clock = a.clock as ClockFields | undefined;
  return sunEventsOnClock(a.date as number, a.latitude as number, a.longitude as number, a.utcOffset as number, clock?.rule, { deltaT: a.deltaT as number | undefined });
}

/** A date-time result in the call's date system. */
function inDateSystem(a: Args, serial: number): number {
  return fromSerial1900(serial, (a.clock as ClockFields | undefined)?.dateSystem ?? 1900);
}

const DEGREES = '°';

export const SUN_FUNCTIONS: readonly FunctionDescriptor[] = [
  {
    name: 'SUNALTITUDE',
    summary: 'Sun altitude above the horizon seen from the site, with refraction (NREL SPA)',
    category: 'Time and sun',
    params: SUN_PARAMS,
    refuses: stampProblem,
    result: { shape: 'value', unit: DEGREES, min: -90, max: 90, description: 'topocentric altitude of the sun centre with refraction; negative at night' },
    evaluate: (a) => positionOf(a).altitude,
    examples: [
      { args: EXAMPLE_SPA, note: '39.888378: the NREL SPA worked example' },
      { args: ['"2026-06-21T12:00"', '51.5', '0', '0'], note: 'about 62: midsummer noon at 51.5° N, 0° E (an example location)' },
    ],
    outsideCheck: POSITION_CHECK,
  },
  {
    name: 'SUNAZIMUTH',
    summary: 'Sun azimuth clockwise from true north, seen from the site (NREL SPA)',
    category: 'Time and sun',
    params: SUN_PARAMS,
    refuses: stampProblem,
    result: { shape: 'value', unit: DEGREES, min: 0, max: 360, description: 'topocentric azimuth: N 0, E 90, S 180, W 270' },
    evaluate: (a) => positionOf(a).azimuth,
    examples: [{ args: EXAMPLE_SPA, note: '194.340241: the NREL SPA worked example' }],
    outsideCheck: POSITION_CHECK,
  },
  {
    name: 'SUNZENITH',
    summary: 'Sun zenith angle seen from the site, with refraction (90 minus the altitude)',
    category: 'Time and sun',
    params: SUN_PARAMS,
    refuses: stampProblem,
    result: { shape: 'value', unit: DEGREES, min: 0, max: 180, description: 'topocentric zenith angle; above 90 at night' },
    evaluate: (a) => positionOf(a).zenith,
    examples: [{ args: EXAMPLE_SPA, note: '50.111622: the NREL SPA worked example' }],
    outsideCheck: POSITION_CHECK,
  },
  {
    name: 'SOLARDECLINATION',
    summary: 'Declination of the sun (geocentric), by the NREL SPA',
    category: 'Time and sun',
    params: SUN_PARAMS,
    refuses: stampProblem,
    result: { shape: 'value', unit: DEGREES, min: -24.5, max: 24.5, description: 'geocentric declination of the sun, north positive' },
    evaluate: (a) => positionOf(a).declination,
    examples: [{ args: EXAMPLE_SPA, note: '-9.314340: the NREL SPA worked example' }],
    outsideCheck: { source: `${SPA_REPORT}: geocentric declination −9.314340° — stated in the publication.`, tests: [...SPA_TESTS] },
  },
  {
    name: 'EQUATIONOFTIME',
    summary: 'Equation of time: apparent minus mean solar time',
    category: 'Time and sun',
    params: SUN_PARAMS,
    refuses: stampProblem,
    result: { shape: 'value', unit: 'min', min: -20, max: 20, description: 'equation of time in minutes; positive when the sundial is ahead of the clock' },
    evaluate: (a) => positionOf(a).equationOfTime,
    examples: [{ args: EXAMPLE_SPA, note: '14.641511: the NREL SPA worked example' }],
    outsideCheck: { source: `${SPA_REPORT}: equation of time 14.641511 min — stated in the publication.`, tests: [...SPA_TESTS] },
  },
  {
    name: 'SOLARTIME',
    summary: 'Apparent solar time at the site, in hours (12 at solar noon)',
    category: 'Time and sun',
    params: SUN_PARAMS,
    refuses: stampProblem,
    result: { shape: 'value', unit: 'h', min: 0, max: 24, description: 'apparent (sundial) time of day in hours, 0 up to 24' },
    evaluate: (a) => positionOf(a).solarTime,
    examples: [{ args: EXAMPLE_SPA, note: 'about 12.74: 12:44 by the sundial at 12:30:30 local standard time' }],
    outsideCheck: { source: `${SPA_REPORT}: observer hour angle H = 11.105902° — stated in the publication; solar time = 12 h + H/15.`, tests: [...SPA_TESTS] },
  },
  {
    name: 'SUNRISE',
    summary: 'Sunrise on a local day (upper limb on the horizon with standard refraction)',
    category: 'Time and sun',
    params: EVENT_PARAMS,
    result: { shape: 'value', kind: 'dateTime', min: EARLIEST_RESULT, max: MAX_SERIAL_EXCLUSIVE, description: 'local date-time of sunrise: standard time, or clock time under the clock\'s daylight-saving rule, in the clock\'s date system; #N/A when the sun does not rise that day' },
    evaluate: (a) => {
      const e = eventsOf(a);
      if (e.sunrise !== null) return inDateSystem(a, e.sunrise);
      return new NotAvailable(noEventMessage('rise', e.condition));
    },
    examples: [
      { args: ['"2003-10-17"', '39.742476', '-105.1786', '-7', '67'], note: '06:12:43 local: the NREL SPA worked example' },
      { args: ['"2026-06-21"', '78', '15', '1'], note: '#N/A: midnight sun at 78° N' },
    ],
    outsideCheck: { source: `${SPA_REPORT}: sunrise 06:12:43 local (±1 s) — stated in the publication; and astronomy-engine 2.1.19 rise times on 300 random local days within ±65° latitude and on 300 more from pole to pole (within 0.012° of altitude; the same polar days and nights), and no sunrise in polar night — produced by a named npm library.`, tests: [...SPA_TESTS, 'tests/reference/astronomy-engine-sun.test.ts'] },
  },
  {
    name: 'SOLARNOON',
    summary: 'Solar noon on a local day: when the sun crosses the meridian',
    category: 'Time and sun',
    params: EVENT_PARAMS,
    result: { shape: 'value', kind: 'dateTime', min: EARLIEST_RESULT, max: MAX_SERIAL_EXCLUSIVE, description: 'local date-time of the upper transit (also during polar day and night): standard time, or clock time under the clock\'s daylight-saving rule, in the clock\'s date system' },
    evaluate: (a) => inDateSystem(a, eventsOf(a).solarNoon),
    examples: [{ args: ['"2003-10-17"', '39.742476', '-105.1786', '-7', '67'], note: '11:46:05 local: the NREL SPA worked example' }],
    outsideCheck: { source: `${SPA_REPORT}: sun transit 11:46:05 local (±1 s) — stated in the publication; and astronomy-engine 2.1.19 transits (SearchHourAngle) on 300 random local days from pole to pole, within 1 s — produced by a named npm library.`, tests: [...SPA_TESTS, 'tests/reference/astronomy-engine-sun.test.ts'] },
  },
  {
    name: 'SUNSET',
    summary: 'Sunset on a local day (upper limb on the horizon with standard refraction)',
    category: 'Time and sun',
    params: EVENT_PARAMS,
    result: { shape: 'value', kind: 'dateTime', min: EARLIEST_RESULT, max: MAX_SERIAL_EXCLUSIVE, description: 'local date-time of sunset: standard time, or clock time under the clock\'s daylight-saving rule, in the clock\'s date system; #N/A when the sun does not set that day' },
    evaluate: (a) => {
      const e = eventsOf(a);
      if (e.sunset !== null) return inDateSystem(a, e.sunset);
      return new NotAvailable(noEventMessage('set', e.condition));
    },
    examples: [
      { args: ['"2003-10-17"', '39.742476', '-105.1786', '-7', '67'], note: 'about 17:18:52 local on 17 October' },
      { args: ['"2026-12-21"', '78', '15', '1'], note: '#N/A: polar night at 78° N' },
    ],
    outsideCheck: { source: 'astronomy-engine 2.1.19: sunset of the report\'s example site on the local 17 October at 17:18:51 (±30 s; the report\'s own 17:20:19 belongs to the previous local day), set times on 300 random local days within ±65° latitude and on 300 more from pole to pole (within 0.012° of altitude; the same polar days and nights), and no sunset in polar day — produced by a named npm library.', tests: ['tests/reference/astronomy-engine-sun.test.ts', 'tests/fixtures/formulas.ts'] },
  },
  {
    name: 'INCIDENCEANGLE',
    summary: 'Angle between the sun and the normal of a surface, from sun altitude and azimuth',
    category: 'Surface angles',
    params: [GLOSSARY.sunAltitude, GLOSSARY.sunAzimuth, SURFACE_AZIMUTH, SURFACE_TILT],
    result: { shape: 'value', unit: DEGREES, min: 0, max: 180, description: 'incidence angle; above 90 the sun is behind the surface' },
    evaluate: (a) => incidenceAngle(a.sunAltitude as number, a.sunAzimuth as number, a.surfaceTilt as number, a.surfaceAzimuth as number),
    examples: [
      { args: ['39.888378', '194.340241', '170', '30'], note: '25.187: the NREL SPA worked example (30° slope facing 170°)' },
      { args: ['30', '90', '270'], note: '150: the sun in the east is behind a west wall' },
    ],
    outsideCheck: { source: `${SPA_REPORT}: incidence 25.187000° on the 30° slope facing 170° — stated in the publication; the sun at the zenith gives the tilt (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., Eq. 1.6.3); D&B Example 1.6.1 (35°, from memory).`, tests: [...SPA_TESTS, 'tests/core/sun/surfaceAngles.test.ts'] },
  },
  {
    name: 'INCIDENCEAT',
    summary: 'Incidence angle of the sun on a surface at a date-time and site (NREL SPA)',
    category: 'Surface angles',
    params: [...WHEN_WHERE, SURFACE_AZIMUTH, SURFACE_TILT, ...ATMOSPHERE, INSTANT, CLOCK],
    refuses: stampProblem,
    result: { shape: 'value', unit: DEGREES, min: 0, max: 180, description: 'incidence angle; above 90 the sun is behind the surface (check the altitude for night)' },
    evaluate: (a) => {
      const s = positionOf(a);
      return incidenceAngle(s.altitude, s.azimuth, a.surfaceTilt as number, a.surfaceAzimuth as number);
    },
    examples: [{ args: ['"2003-10-17T12:30:30"', '39.742476', '-105.1786', '-7', '170', '30', '1830.14', '820', '11', '67'], note: '25.187: the NREL SPA worked example' }],
    outsideCheck: { source: `${SPA_REPORT}: incidence 25.187000° on the 30° slope facing 170° at the example instant — stated in the publication.`, tests: [...SPA_TESTS] },
  },
  {
    name: 'PROFILEANGLE',
    summary: 'Vertical shadow angle on a vertical wall: sun altitude projected onto the plane normal to the wall',
    category: 'Surface angles',
    params: [GLOSSARY.sunAltitude, GLOSSARY.sunAzimuth, SURFACE_AZIMUTH],
    result: { shape: 'value', unit: DEGREES, min: -90, max: 90, description: 'profile angle; #N/A when the sun is in or behind the wall plane' },
    evaluate: (a) => {
      const azimuth = a.sunAzimuth as number;
      const facing = a.surfaceAzimuth as number;
      if (Math.abs(wallSolarAzimuth(azimuth, facing)) >= 90) return new NotAvailable('the sun is in or behind the wall plane, so it casts no shadow on the window');
      return profileAngle(a.sunAltitude as number, azimuth, facing);
    },
    examples: [
      { args: ['45', '120', '180'], note: '63.43: tan Ω = tan 45° / cos 60°' },
      { args: ['45', '0', '180'], note: '#N/A: the sun in the north is behind a south wall' },
    ],
    outsideCheck: { source: 'The profile angle tan Ω = tan β / cos γ (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., Eq. 1.9.1a) evaluated by hand: β 30°, γ 60° → 49.106605°; γ 0° → Ω = β — from the published equations.', tests: ['tests/fixtures/formulas.ts', 'tests/core/sun/surfaceAngles.test.ts'] },
  },
  {
    name: 'SHADOWANGLE',
    summary: 'Horizontal shadow angle: sun azimuth relative to the wall normal, positive to the right seen from outside',
    category: 'Surface angles',
    params: [GLOSSARY.sunAzimuth, SURFACE_AZIMUTH],
    result: { shape: 'value', unit: DEGREES, min: -180, max: 180, description: 'horizontal shadow angle; beyond ±90 the sun is behind the wall' },
    evaluate: (a) => wallSolarAzimuth(a.sunAzimuth as number, a.surfaceAzimuth as number),
    examples: [
      { args: ['120', '180'], note: '60: morning sun to the right of a south window seen from outside' },
      { args: ['240', '180'], note: '-60: afternoon sun to the left' },
    ],
    outsideCheck: { source: `${SPA_REPORT}: a surface facing 170° with the sun at 194.340241° gives −24.340241° (the textbook surface-solar azimuth with the sign of docs/conventions.md#horizontal-shadow-angle).`, tests: ['tests/fixtures/formulas.ts', 'tests/core/sun/surfaceAngles.test.ts'] },
  },
];

function noEventMessage(event: 'rise' | 'set', condition: 'normal' | 'polarDay' | 'polarNight'): string {
  if (condition === 'polarDay') return `the sun does not ${event} on this day: it stays above the horizon all day (polar day)`;
  if (condition === 'polarNight') return `the sun does not ${event} on this day: it stays below the horizon all day (polar night)`;
  return `the sun does not ${event} during this local day (it ${event === 'rise' ? 'rises' : 'sets'} just before or after it)`;
}
