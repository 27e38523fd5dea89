/**
 * Worksheet-function descriptors: window gain for one hour, its step-by-step working, design-day
 * peaks with cooling load, the hourly year, and the cooling load of a 24-hour gain profile.
 *
 * Two forms of the window functions:
 * - the window as ONE range (SOLARGAIN, SOLARGAINSTEPS, SOLARGAINPEAKS, SOLARGAINYEAR): the window
 *   is a block of glossary fields (src/registry/windowRange.ts), so a formula names the window and
 *   the hour and nothing else — `=SUNPANE.SOLARGAIN(B2:C20, "2026-07-21 13:00")`;
 * - the older positional forms (WINDOWGAIN, GAINSTEPS, PEAKGAINS, WINDOWYEAR), whose ids are
 *   released: saved workbooks call them with 12 to 28 positional arguments, and Excel stores a
 *   formula by id and position, so their arguments keep their places. Options added since go at
 *   the end (timeConvention, headers), with defaults that leave every saved result as it was.
 *   docs/window-fields.md says why the window forms are new functions rather than new signatures.
 *
 * Both forms read the window through the same glossary fields, so their messages name the same
 * things (a positional argument's name is the field's name).
 */
import { SunpaneError } from '../core/common';
import { annualSeries, type AnnualSeries, windowGainAt, gainSteps, type Weather, type WindowSpec, type WindowGainHour } from '../core/gain';
import { annualLoadParts, designDayPeaks, coolingLoad, requireRadiantTimeFactors, type RoomSeries, type WindowLoad, windowRoomSeries } from '../core/load';
import { MASK_DEFAULT_YEAR } from '../core/shading';
import { type DateSystem, evaluationSerial, fromSerial1900, hoursInYear, requireStamp, serialToCivil, type TimeConvention } from '../core/time';
import { windowOnClock } from './clockRange';
import { GLOSSARY, type GlossaryEntry } from './glossary';
import { type Args, type ClockFields, type FunctionDescriptor, NotAvailable, type OutCell, type OutsideCheck, type OutTable, type ParamDescriptor, type WindowFields } from './types';
import { fieldsOf, skyWithDesignDays, windowSpecFromFields } from './windowRange';

const { max: mathMax, min: mathMin } = Math;

const G = GLOSSARY;

/** Year of design days when the window gives none (the year moves the sun by well under 0.3°). */
export const DESIGN_DAY_DEFAULT_YEAR = MASK_DEFAULT_YEAR;

/** Columns of the hourly year, by glossary token, and the series column each reads. */
const SERIES_COLUMN: Record<string, keyof AnnualSeries> = {
  gain: 'gain',
  gainBeam: 'gainBeam',
  gainDiffuse: 'gainDiffuse',
  conduction: 'conduction',
  radiant: 'radiant',
  convective: 'convective',
  beam: 'beam',
  sky: 'sky',
  ground: 'ground',
  skyUnshaded: 'skyUnshaded',
  groundUnshaded: 'groundUnshaded',
  dni: 'dni',
  dhi: 'dhi',
  sunlitFraction: 'sunlitFraction',
  shgc: 'shgc',
  incidence: 'incidence',
  profileAngle: 'profileAngle',
  sunAltitude: 'sunAltitude',
  sunAzimuth: 'sunAzimuth',
  stamp: 'clockStamp', // the row's date-time as the window reads date-times: on its clock
};
/** Columns of the cooling load by the radiant time series, and the part of the load each reads. */
const LOAD_COLUMN: Record<string, keyof WindowLoad> = { load: 'total', loadBeam: 'beam', loadDiffuse: 'diffuse', loadConduction: 'conduction' };
/** Columns that depend on the weather (shown as #N/A on a missing hour). */
const WEATHER_COLUMNS = new Set(['gain', 'gainBeam', 'gainDiffuse', 'conduction', 'radiant', 'convective', 'beam', 'sky', 'ground', 'skyUnshaded', 'groundUnshaded', 'dni', 'dhi', ...Object.keys(LOAD_COLUMN)]);
/** The window's diffuse-shading ratios, constant over the year (one value repeated on every row). */
const DIFFUSE_CONSTANTS: Record<string, (s: AnnualSeries) => number> = {
  skyViewRatio: (s) => s.diffuse.skyViewRatio,
  groundViewRatio: (s) => s.diffuse.groundViewRatio,
  horizonShare: (s) => s.diffuse.horizonShare,
};

const P = {
  dni: { ...G.dni, optional: true, description: "the hour's direct normal irradiance, at most the extraterrestrial value; blank: the window's clear sky" },
  dhi: { ...G.dhi, optional: true, description: "the hour's diffuse horizontal irradiance, at most the physically possible limit at the hour's sun (Long & Shi 2008); blank: the window's clear sky" },
  tauB: { ...G.tauB, optional: true, description: 'beam pseudo-optical depth τb of the ASHRAE clear-sky model; used when dni and dhi are blank' },
  tauD: { ...G.tauD, optional: true, description: 'diffuse pseudo-optical depth τd of the ASHRAE clear-sky model; used when dni and dhi are blank' },
  quantities: {
    name: 'quantities',
    kind: 'choiceList',
    choices: [...Object.keys(SERIES_COLUMN), ...Object.keys(DIFFUSE_CONSTANTS), ...Object.keys(LOAD_COLUMN)],
    choiceAliases: { sunlit: 'sunlitFraction', profile: 'profileAngle', altitude: 'sunAltitude', azimuth: 'sunAzimuth', skyview: 'skyViewRatio', groundview: 'groundViewRatio' },
    default: 'gain',
    length: { max: 20 },
    description:
      "columns of the hourly year, one per name: gain, gainBeam, gainDiffuse, conduction, radiant, convective, load, loadBeam, loadDiffuse, loadConduction in W (a load needs factors or the window's room); beam, sky, ground, skyUnshaded, groundUnshaded, dni, dhi in W/m²; sunlitFraction, skyViewRatio, groundViewRatio, horizonShare, shgc from 0 to 1; incidence, profileAngle, sunAltitude, sunAzimuth in °; stamp: the row's date-time on the clock (yyyy-mm-dd hh:mm)",
  },
  day: { name: 'day', kind: 'number', integer: true, min: 1, max: 28, default: 21, description: 'day of each month for the clear design day' },
  factors: { name: 'factors', kind: 'numberList', min: 0, max: 1, length: { exact: 24 }, sumsToOne: true, description: 'the 24 radiant time factors r0…r23 of the room (from your handbook or room model), summing to 1' },
  factorsOptional: { name: 'factors', kind: 'numberList', min: 0, max: 1, length: { exact: 24 }, sumsToOne: true, optional: true, description: "the 24 radiant time factors r0…r23 of the room, summing to 1, used as both its solar and non-solar series; blank: the window's own room (roomConstruction, or its two series), else no cooling-load columns" },
  yearFactors: { name: 'factors', kind: 'numberList', min: 0, max: 1, length: { exact: 24 }, sumsToOne: true, optional: true, description: "the 24 radiant time factors r0…r23 of the room, summing to 1, used as both its solar and non-solar series for the load quantities; blank: the window's own room" },
  positionalYearFactors: { name: 'factors', kind: 'numberList', min: 0, max: 1, length: { exact: 24 }, sumsToOne: true, optional: true, description: 'the 24 radiant time factors r0…r23 of the room, summing to 1, used as both its solar and non-solar series, for the load quantities' },
  parts: { name: 'parts', kind: 'flag', default: false, description: "TRUE: also the peak hour's gain by part (beam, diffuse, conduction) and, with a room, the peak load's parts; FALSE (default): the columns as before" },
  showGain: { name: 'showGain', kind: 'flag', default: false, description: 'TRUE: two columns, the gain as given and its cooling load; FALSE (default): the load alone' },
  monthlyTauB: { ...G.tauB, kind: 'numberList', length: { oneOf: [1, 12] }, optional: false, description: 'beam pseudo-optical depth τb of the ASHRAE clear-sky model for the design days: one value, or 12 by month (January first)' },
  monthlyTauD: { ...G.tauD, kind: 'numberList', length: { oneOf: [1, 12] }, optional: false, description: 'diffuse pseudo-optical depth τd for the design days: one value (read for every month), or 12 by month (January first)' },
  yearTauB: { ...G.tauB, kind: 'numberList', length: { oneOf: [1, 12] }, optional: true, description: 'beam pseudo-optical depth τb of the ASHRAE clear-sky model: one value, or 12 by month; used when dni and dhi are blank' },
  yearTauD: { ...G.tauD, kind: 'numberList', length: { oneOf: [1, 12] }, optional: true, description: 'diffuse pseudo-optical depth τd: one value (read for every month), or 12 by month (January first); used when dni and dhi are blank' },
  gains: { name: 'gains', kind: 'numberList', unit: 'W', min: -1e7, max: 1e7, length: { exact: 24 }, description: 'hourly gain of the design day, hour ending 1:00 first' },
  dniSeries: {
    ...G.dni,
    kind: 'numberList',
    optional: true,
    gapsAreMissing: true,
    description: "a year's hourly direct normal irradiance, one value per hour (8760, or 8784 in a leap year); a blank or text cell marks that hour missing (#N/A in the result); blank range: the window's clear sky",
  },
  dhiSeries: {
    ...G.dhi,
    kind: 'numberList',
    optional: true,
    gapsAreMissing: true,
    description: "a year's hourly diffuse horizontal irradiance, one value per hour; a blank or text cell marks that hour missing; blank range: the window's clear sky",
  },
  stepsHeaders: { ...G.headers, default: true, description: 'TRUE (default): the table starts with the row step, quantity, value, unit, method; FALSE: the steps only' },
  surfaceTilt: { ...G.surfaceTilt, description: 'window tilt from horizontal: 90 is a vertical window (shading devices need 90)' },
  instantConvention: { ...G.timeConvention, default: 'instant', description: 'how dateTime is read: "instant" (default, as this form has always done) = the sun at dateTime; "hourEnding" = the hour ending at dateTime, sun at mid-hour, as the hourly year and the pane' },
  hourEndingConvention: { ...G.timeConvention, description: 'how the hours are read: "hourEnding" (default) = rows stamped at the end of their hour, sun at mid-hour; "instant" = rows at 00:00 … 23:00, sun at the stamp' },
} satisfies Record<string, ParamDescriptor>;

// ---------------------------------------------------------------------------------------------
// Reading the window and the hour's weather

/** The window of a positional form: its arguments are glossary fields under the same names. */
function fieldsOfArgs(a: Args, names: readonly string[]): WindowFields {
  const entries: { field: GlossaryEntry; written: string; cell: number | string | readonly unknown[] }[] = [];
  for (const n of names) {
    const v = a[n];
    if (v === undefined) continue;
    entries.push({ field: G[n as keyof typeof G], written: n, cell: v as number | string | readonly number[] });
  }
  return fieldsOf(entries);
}

/** The window of a window form, on the call's clock (the clock fills the window's clock fields). */
function winOf(a: Args): WindowFields {
  return windowOnClock(a.window as WindowFields, a.clock as ClockFields | undefined);
}

/** The window of a positional form, on the call's clock. */
function posOf(a: Args): WindowFields {
  return windowOnClock(fieldsOfArgs(a, POSITIONAL_FIELDS), a.clock as ClockFields | undefined);
}

/** The date system the window's date-times are given in (its own field, or the clock's put in). */
function systemOf(f: WindowFields): DateSystem {
  return (f.values.get('dateSystem') as DateSystem | undefined) ?? 1900;
}

const SITE_AND_WINDOW = [G.latitude, G.longitude, G.utcOffset, G.surfaceAzimuth, G.width, G.height, G.shgc] as const;
const GLASS_AND_GROUND = [G.panes, G.frameFraction, G.groundAlbedo, G.skyModel, P.surfaceTilt, G.interiorAttenuation] as const;
const SHADING = [G.overhangProjection, G.overhangGap, G.overhangExtensionLeft, G.overhangExtensionRight, G.finProjection, G.finGap, G.revealDepth, G.skyline] as const;
/** The window fields a positional form takes (the rest of its arguments are the hour's or options). */
const POSITIONAL_FIELDS = [...SITE_AND_WINDOW, ...GLASS_AND_GROUND, ...SHADING, G.tauB, G.tauD, G.radiantFraction, G.timeConvention, G.year].map((p) => p.name);

/** The year a one-hour calculation lies in: that of its evaluation instant, within what a window accepts. */
function yearOfHour(dateTime: number, convention: TimeConvention): number {
  return mathMin(9998, mathMax(1901, serialToCivil(evaluationSerial(dateTime, convention)).year));
}

/** A clear sky that nothing reads: a window whose hour comes with its own DNI and DHI still needs a weather. */
const UNREAD_SKY: Weather = { kind: 'ashraeClearSky', tauB: [G.tauB.max as number], tauD: [G.tauD.max as number] };

/** The hour's DNI and DHI when given; both or neither. */
function weatherHourOf(a: Args): { dni: number; dhi: number } | undefined {
  const hasDni = a.dni !== undefined;
  const hasDhi = a.dhi !== undefined;
  if (hasDni !== hasDhi) throw new SunpaneError(hasDni ? 'dhi' : 'dni', null, 'is needed too: give both dni and dhi, or neither for the clear sky');
  return hasDni ? { dni: a.dni as number, dhi: a.dhi as number } : undefined;
}

/** Why an hour has no weather: the window has no sky and no DNI/DHI were given. */
function noSky(where: string): SunpaneError {
  return new SunpaneError('dni', null, `give the hour's dni and dhi: ${where} has no clear sky of its own (or give it linkeTurbidity, or tauB and tauD, or an example site)`);
}

/**
 * The window of a one-hour call, built for the hour's year, and the hour's own weather: checks
 * everything the arguments say about the window and its sky (what `refuses` reports), nothing of
 * the hour's physics.
 */
function hourWindow(f: WindowFields, a: Args, prefix: string, convention?: TimeConvention): { spec: WindowSpec; weatherHour?: { dni: number; dhi: number } } {
  const weatherHour = weatherHourOf(a);
  const conv = convention ?? ((f.values.get('timeConvention') as TimeConvention | undefined) ?? 'hourEnding');
  const fields: WindowFields = convention ? withField(f, 'timeConvention', convention) : f;
  const { spec, hasWeather } = windowSpecFromFields(fields, { year: yearOfHour(a.dateTime as number, conv), prefix });
  if (!hasWeather && weatherHour === undefined) throw noSky(prefix === '' ? 'the window' : 'the window range');
  requireStamp('dateTime', a.dateTime, conv);
  return { spec: hasWeather ? spec : { ...spec, weather: skyWithDesignDays(spec.weather, UNREAD_SKY) }, weatherHour };
}

/** One hour of a window given as fields. */
function hourOfFields(f: WindowFields, a: Args, prefix: string, convention?: TimeConvention): WindowGainHour {
  const { spec, weatherHour } = hourWindow(f, a, prefix, convention);
  return windowGainAt(spec, a.dateTime as number, weatherHour);
}

function withField(f: WindowFields, name: string, value: string | number): WindowFields {
  const values = new Map(f.values);
  values.set(name, value);
  return { kind: 'window', values, written: f.written };
}

/** The reason a call is refused, or undefined (for the fuzz tests' `refuses`). */
function reasonOf(work: () => unknown): string | undefined {
  try {
    work();
    return undefined;
  } catch (err) {
    if (err instanceof SunpaneError) return err.message;
    throw err;
  }
}

/** The step table; date-time steps in the window's date system (their text in `method` reads the same in both). */
function stepRows(h: ReturnType<typeof gainSteps>, headers: boolean, system: DateSystem = 1900): OutTable {
  const rows: OutTable = headers ? [['step', 'quantity', 'value', 'unit', 'method']] : [];
  for (const s of h) rows.push([s.step, s.quantity, s.unit === 'date-time' ? fromSerial1900(s.value, system) : s.value, s.unit, s.method]);
  return rows;
}

/** The steps of an hour of a window given as fields (same reading as {@link hourOfFields}). */
function stepsOfFields(f: WindowFields, a: Args, prefix: string, convention?: TimeConvention) {
  const { spec, weatherHour } = hourWindow(f, a, prefix, convention);
  return gainSteps(spec, a.dateTime as number, weatherHour);
}

// ---------------------------------------------------------------------------------------------
// Design days and the hourly year

/** Columns of the design-day peaks: always, with a room, and the parts added by `parts`. */
const PEAK_COLUMNS = ['month', 'peakHour', 'peakGain'] as const;
const PEAK_LOAD_COLUMNS = ['peakLoadHour', 'peakLoad'] as const;
const PEAK_GAIN_PARTS = ['peakGainBeam', 'peakGainDiffuse', 'peakGainConduction'] as const;
const PEAK_LOAD_PARTS = ['peakLoadBeam', 'peakLoadDiffuse', 'peakLoadConduction'] as const;

/**
 * The design-day peaks as rows: month, peak hour, peak solar gain; with `parts` the peak hour's
 * solar gain by part and its conduction gain beside it; with a room (factors, or the window's own)
 * the peak load's hour and value, and with `parts` the load's parts at that hour.
 */
function peakRows(spec: WindowSpec, a: Args, headers: boolean): OutTable {
  const months = designDayPeaks(spec, { day: a.day as number, factors: a.factors as number[] | undefined });
  const withLoad = months[0]?.peakLoad !== undefined;
  const parts = a.parts === true;
  const header: string[] = [...PEAK_COLUMNS, ...(parts ? PEAK_GAIN_PARTS : []), ...(withLoad ? PEAK_LOAD_COLUMNS : []), ...(withLoad && parts ? PEAK_LOAD_PARTS : [])];
  const rows: OutTable = headers ? [header] : [];
  for (const m of months) {
    const row: OutCell[] = [m.month, m.peakHour, m.peakGain];
    const first = spec.timeConvention === 'instant' ? 0 : 1; // peak hours are 1…24 hour ending, 0…23 instants
    const g = m.peakHour - first;
    if (parts) row.push(m.hourlyBeam[g], m.hourlyDiffuse[g], m.hourlyConduction[g]);
    if (withLoad) row.push(m.peakLoadHour!, m.peakLoad!);
    if (withLoad && parts) {
      const l = m.peakLoadHour! - first;
      row.push(m.coolingLoadBeam![l], m.coolingLoadDiffuse![l], m.coolingLoadConduction![l]);
    }
    rows.push(row);
  }
  return rows;
}

function factorsProblem(factors: number[] | undefined): string | undefined {
  if (factors === undefined) return undefined;
  return reasonOf(() => requireRadiantTimeFactors(factors));
}

/** The window of a design-day call: its own clear sky is required. */
function designSpec(f: WindowFields, prefix: string): WindowSpec {
  const { spec, hasWeather } = windowSpecFromFields(f, { year: DESIGN_DAY_DEFAULT_YEAR, prefix });
  if (!hasWeather) {
    throw new SunpaneError(`${prefix}linkeTurbidity`, null, 'a clear sky is needed for design days: give linkeTurbidity (1 or 12 values from 1 to 10), or tauB and tauD, or an example site');
  }
  return spec;
}

/** The window of an hourly-year call, with supplied series in place of its own sky when given. */
function yearSpec(f: WindowFields, a: Args, prefix: string): WindowSpec {
  const dni = a.dni as number[] | undefined;
  const dhi = a.dhi as number[] | undefined;
  if ((dni === undefined) !== (dhi === undefined)) throw new SunpaneError(dni ? 'dhi' : 'dni', null, 'is needed too: give both hourly series, or neither for the clear sky');
  const { spec, hasWeather } = windowSpecFromFields(f, { prefix });
  if (dni && dhi) {
    if (spec.glazing.uValue !== undefined) {
      // the series bring no outdoor dry-bulb, and these functions take none: say so by the window's own field
      throw new SunpaneError(f.written.get('uValue') ?? `${prefix}uValue`, spec.glazing.uValue, 'cannot be used with hourly dni and dhi series here: the conduction gain needs the hourly outdoor dry-bulb, which this function does not take; leave uValue out for the solar gain (the command line and the pane read dry-bulb from a weather file)');
    }
    const hours = hoursInYear(spec.year);
    for (const [name, s] of [['dni', dni], ['dhi', dhi]] as const) {
      if (s.length !== hours) throw new SunpaneError(name, s, `must hold ${hours} values, one per hour of ${spec.year}`);
    }
    return { ...spec, weather: { kind: 'measured', dni, dhi } };
  }
  if (!hasWeather) throw noSky(prefix === '' ? 'the window' : 'the window range');
  return spec;
}

/** The room of an hourly-year call: the factors given (both series), else the window's own. */
function roomOf(spec: WindowSpec, factors: number[] | undefined): RoomSeries | undefined {
  if (factors !== undefined) {
    const r = requireRadiantTimeFactors(factors);
    return { solar: r, nonSolar: r };
  }
  return windowRoomSeries(spec);
}

/**
 * The room the load quantities asked for need, or undefined when none is asked for.
 * @throws SunpaneError naming the quantities argument when a load is asked for without a room
 */
function yearRoom(spec: WindowSpec, quantities: readonly string[], factors: number[] | undefined, quantitiesName: string): RoomSeries | undefined {
  const load = quantities.find((q) => LOAD_COLUMN[q] !== undefined);
  if (load === undefined) return undefined;
  const room = roomOf(spec, factors);
  if (room === undefined) {
    throw new SunpaneError(quantitiesName, load, "needs the room's radiant time series: give factors, or the window's roomConstruction (light, medium, heavy) or its solarRadiantTimeSeries and nonSolarRadiantTimeSeries");
  }
  return room;
}

function yearRows(spec: WindowSpec, quantities: readonly string[], headers: boolean, factors?: number[], quantitiesName = 'quantities', system: DateSystem = 1900): OutTable {
  const room = yearRoom(spec, quantities, factors, quantitiesName);
  const series = annualSeries(spec);
  const load = room ? annualLoadParts(series, room) : undefined;
  const columns = quantities.map((q) => {
    const constant = DIFFUSE_CONSTANTS[q];
    if (constant !== undefined) return new Float64Array(series.hours).fill(constant(series));
    if (LOAD_COLUMN[q] !== undefined) return load![LOAD_COLUMN[q]];
    if (q === 'stamp' && system === 1904) return (series.clockStamp as Float64Array).map((v) => fromSerial1900(v, system));
    return series[SERIES_COLUMN[q]] as Float64Array;
  });
  const weather = quantities.map((q) => WEATHER_COLUMNS.has(q));
  const out: OutTable = new Array(series.hours + (headers ? 1 : 0));
  let r = 0;
  if (headers) out[r++] = [...quantities];
  const gap = new NotAvailable('no weather value for this hour');
  for (let i = 0; i < series.hours; i++) {
    const missing = series.missing[i] === 1;
    const line: OutCell[] = new Array(columns.length);
    for (let k = 0; k < columns.length; k++) line[k] = missing && weather[k] ? gap : columns[k][i];
    out[r++] = line;
  }
  return out;
}

// ---------------------------------------------------------------------------------------------
// Outside checks (shown in the function reference)

const GAIN_CHECK: OutsideCheck = {
  source:
    'The fenestration solar heat gain equation Q = A_glass · IAC · [E_beam · F_sunlit · SHGC(θ) + (E_sky + E_ground) · SHGC_diffuse] (ASHRAE Handbook—Fundamentals (2013) ch. 15 — from memory), worked by hand with the numbers written out, and a bare window facing the sun gaining SHGC × glass area × DNI; the sun, sky, shading and SHGC it uses are checked against their own sources (see SUNALTITUDE, WINDOWIRRADIANCE, SUNLITFRACTION, SHGCANGLE). At every stamp of the year the value is, exactly, that row of the hourly year and of the pane\'s table.',
  tests: ['tests/core/gain/windowGain.test.ts', 'tests/core/gain/gainSteps.test.ts', 'tests/core/gain/annual.test.ts', 'tests/registry/gainFunctions.test.ts', 'tests/registry/clock.test.ts', 'tests/fixtures/formulas.ts'],
};
const STEPS_CHECK: OutsideCheck = { ...GAIN_CHECK, source: `Every step re-derived by hand from the earlier steps: ${GAIN_CHECK.source}` };
const RTS_CHECK: OutsideCheck = {
  source: 'Radiant time series, Spitler, Fisher & Pedersen (1997), ASHRAE Trans. 103(2): a constant gain gives an equal load, a unit impulse gives back the factors, the 24-hour total is kept, factors must sum to 1 — properties of the published method (the factor lists are test inputs; no published factor table is shipped).',
  tests: ['tests/reference/rts-spitler-1997.test.ts', 'tests/fixtures/formulas.ts'],
};
const PEAKS_CHECK: OutsideCheck = {
  source: "Each month's peak is the largest of 24 one-hour gains (checked as for SOLARGAIN, on the ASHRAE clear-sky model as for CLEARSKYDNI), each exactly the one-hour gain of its stamp; with factors the cooling load follows Spitler, Fisher & Pedersen (1997) and keeps the day total; west windows peak after solar noon and east windows before (geometry).",
  tests: ['tests/core/load/designDay.test.ts', 'tests/reference/rts-spitler-1997.test.ts', 'tests/registry/gainFunctions.test.ts'],
};
const YEAR_CHECK: OutsideCheck = {
  source: "Every hour held to the checked one-hour functions (see SOLARGAIN) within 1e-12 (relative for irradiances), and the year's sun path held to the direct NREL SPA within 1e-4° (which is checked against the report's worked example, astronomy-engine 2.1.19 and suncalc 2.0.2); rows stamped as the time convention says, 8760 or 8784 of them.",
  tests: ['tests/core/gain/annual.test.ts', 'tests/core/gain/preparedFast.test.ts', 'tests/core/sun/sunPath.test.ts', 'tests/registry/gainFunctions.test.ts', 'tests/registry/clock.test.ts'],
};

// ---------------------------------------------------------------------------------------------
// The window forms

const WINDOW = G.window;

const SOLARGAIN: FunctionDescriptor = {
  name: 'SOLARGAIN',
  summary: 'Solar heat gain through a window in one hour, the window given as one range of fields: beam through the sunlit glass plus sky and ground diffuse, × SHGC × glass area.',
  category: 'Gain and load',
  params: [WINDOW, G.dateTime, P.dni, P.dhi, G.clock],
  result: { shape: 'value', unit: 'W', min: 0, description: "window solar gain in the hour (0 at night); at a row's stamp exactly that row of SOLARGAINYEAR and of the pane's hourly table" },
  evaluate: (a) => hourOfFields(winOf(a), a, 'window ').gain.total,
  refuses: (a) => reasonOf(() => hourWindow(winOf(a), a, 'window ')),
  examples: [
    { args: ['B2:C14', '"2026-07-21 13:00"'], note: 'a window described by the name/value block B2:C14 (latitude, longitude, utcOffset, surfaceAzimuth, width, height, shgc, tauB, tauD …), the hour ending 13:00, sun at 12:30' },
    { args: ['VSTACK(Windows[#Headers],Windows[@])', 'Hour'], note: 'one row of a window schedule table and its header row, in a column beside the table' },
  ],
  outsideCheck: GAIN_CHECK,
};

const SOLARGAINSTEPS: FunctionDescriptor = {
  name: 'SOLARGAINSTEPS',
  summary: 'The solar gain of one hour worked out step by step (the instant used, sun, angles, shading, irradiance, SHGC, area, watts), for checking by hand; the window as one range.',
  category: 'Gain and load',
  params: [WINDOW, G.dateTime, P.dni, P.dhi, P.stepsHeaders, G.clock],
  result: { shape: 'spill', description: "a heading row (unless headers is FALSE), then one row per step: step number, quantity, value, unit, method; the first step is the instant the sun was taken at. The rows whose unit is date-time hold a date-time serial in value (format those cells yyyy-mm-dd hh:mm) and the same date-time as text in method", columns: ['step', 'quantity', 'value', 'unit', 'method'] },
  evaluate: (a) => {
    const f = winOf(a);
    return stepRows(stepsOfFields(f, a, 'window '), a.headers as boolean, systemOf(f));
  },
  refuses: (a) => reasonOf(() => hourWindow(winOf(a), a, 'window ')),
  examples: [{ args: ['B2:C14', '"2026-07-21 13:00"'], note: 'every step from the instant (12:30, the middle of the hour ending 13:00) to watts' }],
  outsideCheck: STEPS_CHECK,
};

const SOLARGAINPEAKS: FunctionDescriptor = {
  name: 'SOLARGAINPEAKS',
  summary: "For each month, the peak hour and peak solar gain of a window on a clear design day, and the peak cooling load when radiant time factors are given; the window as one range (its clear sky, its year or 2026).",
  category: 'Gain and load',
  params: [WINDOW, P.factorsOptional, P.day, G.headers, P.parts],
  result: {
    shape: 'spill',
    description:
      "12 rows, January first: month, peak hour (by the window's time convention: hour ending 1–24, or the instant's hour 0–23; local standard time, also under a daylight-saving rule), peak solar gain [W]; with parts TRUE the peak hour's solar gain by part and its conduction gain [W]; with factors (or the window's own room) the hour and value [W] of the peak cooling load (below 0 when conduction on a design day colder than the room outweighs the sun), and with parts its beam, diffuse and conduction shares [W]",
    columns: ['month', 'peakHour', 'peakGain', 'peakGainBeam', 'peakGainDiffuse', 'peakGainConduction', 'peakLoadHour', 'peakLoad', 'peakLoadBeam', 'peakLoadDiffuse', 'peakLoadConduction'],
  },
  evaluate: (a) => peakRows(designSpec(winOf(a), 'window '), a, a.headers as boolean),
  refuses: (a) => factorsProblem(a.factors as number[] | undefined) ?? reasonOf(() => designSpec(winOf(a), 'window ')),
  examples: [
    { args: ['B2:C14'], note: 'peak hour and watts on the 21st of each month' },
    { args: ['B2:C19', '', '21', 'TRUE', 'TRUE'], note: 'with the window\'s roomConstruction, uValue, indoorTemperature, dryBulbMax and dailyRange: gain and cooling load by part at their peaks' },
  ],
  outsideCheck: PEAKS_CHECK,
};

const SOLARGAINYEAR: FunctionDescriptor = {
  name: 'SOLARGAINYEAR',
  summary: "One or more quantities of a window hour by hour over its year (gain, irradiance on the glass, sunlit fraction, angles...), rows as the window's time convention stamps them; the window as one range.",
  category: 'Gain and load',
  params: [WINDOW, P.quantities, { ...P.dniSeries, name: 'dni' }, { ...P.dhiSeries, name: 'dhi' }, G.headers, P.yearFactors, G.clock],
  result: {
    shape: 'spill',
    description: "8760 rows (8784 in a leap year), one column per quantity; hour-ending rows (1 January 01:00 first, sun at mid-hour) or, with timeConvention instant, rows at 00:00 … 23:00; the stamp column is each row's reading on the clock (the clock's or the window's daylight-saving rule) in the workbook's date system",
  },
  evaluate: (a) => {
    const f = winOf(a);
    return yearRows(yearSpec(f, a, 'window '), a.quantities as string[], a.headers as boolean, a.factors as number[] | undefined, 'quantities', systemOf(f));
  },
  refuses: (a) => factorsProblem(a.factors as number[] | undefined) ?? reasonOf(() => yearRoom(yearSpec(winOf(a), a, 'window '), a.quantities as string[], a.factors as number[] | undefined, 'quantities')),
  examples: [
    { args: ['B2:C15'], note: 'hourly gain of the window for its year (a year field is needed)' },
    { args: ['B2:C15', '{"stamp","gain","sunlitFraction"}', 'Weather!D2:D8761', 'Weather!E2:E8761', 'TRUE'], note: 'three columns with a header row, under your hourly direct normal and diffuse horizontal irradiance' },
    { args: ['B2:C15', '{"sky","skyUnshaded","skyViewRatio"}'], note: 'sky diffuse reaching the glass past the devices, on the bare window, and the ratio between them for an isotropic sky' },
    { args: ['B2:C18', '{"gain","conduction","load"}'], note: 'solar gain, conduction gain and cooling load of each hour, for a window whose range gives uValue, indoorTemperature, dryBulbMax, dailyRange and roomConstruction' },
  ],
  outsideCheck: YEAR_CHECK,
};

// ---------------------------------------------------------------------------------------------
// The positional forms (released ids: arguments keep their places; options added at the end)

const HOUR_PARAMS: readonly ParamDescriptor[] = [G.dateTime, ...SITE_AND_WINDOW, P.dni, P.dhi, P.tauB, P.tauD, ...GLASS_AND_GROUND];

function legacyHour(a: Args): WindowGainHour {
  return hourOfFields(posOf(a), a, '', a.timeConvention as TimeConvention);
}

function legacyRefuses(a: Args): string | undefined {
  return reasonOf(() => hourWindow(posOf(a), a, '', a.timeConvention as TimeConvention));
}

const WINDOWGAIN: FunctionDescriptor = {
  name: 'WINDOWGAIN',
  summary: 'Solar heat gain through a window in one hour, every field a positional argument (the older form of SOLARGAIN, kept for saved workbooks).',
  category: 'Gain and load',
  params: [...HOUR_PARAMS, ...SHADING, P.instantConvention, G.clock],
  result: { shape: 'value', unit: 'W', min: 0, description: 'window solar gain at the date-time (0 at night)' },
  evaluate: (a) => legacyHour(a).gain.total,
  refuses: legacyRefuses,
  supersededBy: 'SOLARGAIN',
  examples: [
    { args: ['"2026-07-21T12:30"', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '850', '120'], note: 'a south window at 12:30 on a July day with 850 W/m² direct normal and 120 W/m² diffuse horizontal irradiance' },
  ],
  outsideCheck: GAIN_CHECK,
};

const GAINSTEPS: FunctionDescriptor = {
  name: 'GAINSTEPS',
  summary: 'The window gain of one hour worked out step by step, every field a positional argument (the older form of SOLARGAINSTEPS, kept for saved workbooks).',
  category: 'Gain and load',
  params: [...HOUR_PARAMS, G.radiantFraction, ...SHADING, P.instantConvention, P.stepsHeaders, G.clock],
  result: { shape: 'spill', description: "a heading row (unless headers is FALSE), then one row per step: step number, quantity, value, unit, method. The rows whose unit is date-time hold a date-time serial in value (format those cells yyyy-mm-dd hh:mm) and the same date-time as text in method", columns: ['step', 'quantity', 'value', 'unit', 'method'] },
  evaluate: (a) => {
    const f = posOf(a);
    return stepRows(stepsOfFields(f, a, '', a.timeConvention as TimeConvention), a.headers as boolean, systemOf(f));
  },
  refuses: legacyRefuses,
  supersededBy: 'SOLARGAINSTEPS',
  examples: [{ args: ['"2026-07-21T12:30"', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '850', '120'], note: 'every step from sun altitude to watts for a south window at 12:30 in July, with the hour’s measured irradiance' }],
  outsideCheck: STEPS_CHECK,
};

const COOLINGLOAD: FunctionDescriptor = {
  name: 'COOLINGLOAD',
  summary: 'Hourly cooling load of a 24-hour gain profile by the radiant time series (Spitler, Fisher & Pedersen 1997), with your radiant time factors.',
  category: 'Gain and load',
  params: [P.gains, P.factors, G.radiantFraction, P.showGain],
  result: { shape: 'spill', unit: 'W', description: '24 rows: the cooling load of each hour, hour ending 1:00 first; with showGain TRUE two columns, the gain beside its load' },
  evaluate: (a) => {
    const gains = a.gains as number[];
    const load = coolingLoad(gains, a.factors as number[], a.radiantFraction as number);
    return Array.from(load, (q, i) => (a.showGain === true ? [gains[i], q] : [q]));
  },
  refuses: (a) => factorsProblem(a.factors as number[] | undefined),
  examples: [{ args: ['B2:B25', 'C2:C25', '1'], note: 'gains in B2:B25 (hour ending 1:00 to 24:00), the room’s 24 radiant time factors in C2:C25' }],
  outsideCheck: RTS_CHECK,
};

function legacyDesignSpec(a: Args): WindowSpec {
  return designSpec(posOf(a), '');
}

const PEAKGAINS: FunctionDescriptor = {
  name: 'PEAKGAINS',
  summary: 'For each month, the peak hour and peak window gain on a clear design day (and the peak cooling load with radiant time factors), every field a positional argument (the older form of SOLARGAINPEAKS).',
  category: 'Gain and load',
  params: [
    G.year,
    ...SITE_AND_WINDOW,
    P.monthlyTauB,
    P.monthlyTauD,
    P.day,
    P.factorsOptional,
    ...GLASS_AND_GROUND,
    G.radiantFraction,
    ...SHADING,
    P.hourEndingConvention,
    G.headers,
    P.parts,
  ],
  result: {
    shape: 'spill',
    description:
      '12 rows, January first: month, peak hour (hour ending, 1–24, local standard time; with timeConvention instant the hour 0–23), peak solar gain [W]; with parts TRUE the peak hour\'s gain by part (beam, diffuse; conduction is 0 in this form); with factors also the hour and value [W] of the peak cooling load (below 0 when conduction on a design day colder than the room outweighs the sun), and with parts its beam, diffuse and conduction shares',
    columns: ['month', 'peakHour', 'peakGain', 'peakGainBeam', 'peakGainDiffuse', 'peakGainConduction', 'peakLoadHour', 'peakLoad', 'peakLoadBeam', 'peakLoadDiffuse', 'peakLoadConduction'],
  },
  evaluate: (a) => peakRows(legacyDesignSpec(a), a, a.headers as boolean),
  refuses: (a) => factorsProblem(a.factors as number[] | undefined) ?? reasonOf(() => legacyDesignSpec(a)),
  supersededBy: 'SOLARGAINPEAKS',
  examples: [
    { args: ['2026', '40', '-105', '-7', '270', '1.5', '1.2', '0.4', '0.4', '2.3'], note: 'a west window: peak hour and watts on the 21st of each month' },
    { args: ['2026', '40', '-105', '-7', '270', '1.5', '1.2', '0.4', 'Sky!B2:B13', 'Sky!C2:C13'], note: 'the same window under twelve monthly τb and τd values from a climate table (January first)' },
  ],
  outsideCheck: PEAKS_CHECK,
};

function legacyYearSpec(a: Args): WindowSpec {
  return yearSpec(posOf(a), a, '');
}

const WINDOWYEAR: FunctionDescriptor = {
  name: 'WINDOWYEAR',
  summary: 'One or more quantities of a window hour by hour over a year, every field a positional argument (the older form of SOLARGAINYEAR, kept for saved workbooks).',
  category: 'Gain and load',
  params: [G.year, ...SITE_AND_WINDOW, { ...P.quantities, name: 'quantity' }, { ...P.dniSeries, name: 'dni' }, { ...P.dhiSeries, name: 'dhi' }, P.yearTauB, P.yearTauD, ...GLASS_AND_GROUND, G.radiantFraction, ...SHADING, P.hourEndingConvention, G.headers, P.positionalYearFactors, G.clock],
  result: { shape: 'spill', description: '8760 rows (8784 in a leap year), 1 January 00:00–01:00 first, one column per quantity; sun at the middle of each hour (with timeConvention instant: rows at 00:00 … 23:00, sun at the stamp)' },
  evaluate: (a) => yearRows(legacyYearSpec(a), a.quantity as string[], a.headers as boolean, a.factors as number[] | undefined, 'quantity', (a.clock as ClockFields | undefined)?.dateSystem ?? 1900),
  refuses: (a) => factorsProblem(a.factors as number[] | undefined) ?? reasonOf(() => yearRoom(legacyYearSpec(a), a.quantity as string[], a.factors as number[] | undefined, 'quantity')),
  supersededBy: 'SOLARGAINYEAR',
  examples: [{ args: ['2026', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '"gain"', 'Weather!D2:D8761', 'Weather!E2:E8761'], note: 'hourly gain of a south window for the whole year under your hourly weather' }],
  outsideCheck: YEAR_CHECK,
};

export const GAIN_FUNCTIONS: readonly FunctionDescriptor[] = [SOLARGAIN, SOLARGAINSTEPS, SOLARGAINPEAKS, SOLARGAINYEAR, COOLINGLOAD, WINDOWGAIN, GAINSTEPS, PEAKGAINS, WINDOWYEAR];
