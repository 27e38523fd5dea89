/**
 * Worksheet-function descriptors: window gain for one hour, its step-by-step explanation, cooling
 * load by the radiant time series, design-day peaks and one quantity of the annual hourly series.
 *
 * Argument order: the essentials (when, where, which way, how big, which glass, which weather) come
 * first; the rest have defaults, and the shading group at the end defaults to "no device".
 */
import { SunpaneError } from '../core/common';
import { annualSeries, type AnnualSeries, windowGainAt, gainSteps, type Weather, type WindowSpec, DEFAULT_RADIANT_FRACTION, validateWindowSpec } from '../core/gain';
import { designDayPeaks, coolingLoad, requireRadiantTimeFactors } from '../core/load';
import { hoursInYear, serialToCivil } from '../core/time';
import type { Shading } from '../core/shading';
import type { SkyModel } from '../core/sky';
import { GLOSSARY } from './glossary';
import { type Args, type FunctionDescriptor, NotAvailable, type OutsideCheck, type OutTable, type ParamDescriptor } from './types';

const G = GLOSSARY;
const P = {
  year: G.year,
  width: G.width,
  height: G.height,
  shgcNormal: G.shgcNormal,
  dni: { ...G.dni, optional: true, description: "the hour's direct normal irradiance; blank: clear sky from tauB and tauD" },
  dhi: { ...G.dhi, optional: true, description: "the hour's diffuse horizontal irradiance; blank: clear sky from tauB and tauD" },
  tauB: { ...G.tauB, optional: true, description: `${G.tauB.description}; used when dni and dhi are blank` },
  tauD: { ...G.tauD, optional: true, description: `${G.tauD.description}; used when dni and dhi are blank` },
  panes: G.panes,
  frameFraction: G.frameFraction,
  groundAlbedo: G.groundAlbedo,
  skyModel: G.skyModel,
  surfaceTilt: { ...G.surfaceTilt, description: 'window tilt from horizontal: 90 is a vertical window (shading devices need 90)' },
  interiorAttenuation: G.interiorAttenuation,
  radiantFraction: { name: 'radiantFraction', kind: 'number', min: 0, max: 1, default: DEFAULT_RADIANT_FRACTION, description: 'share of the gain that is radiant (reaches the air only through the room surfaces)' },
  overhangProjection: G.overhangProjection,
  overhangGap: G.overhangGap,
  overhangExtensionLeft: G.overhangExtensionLeft,
  overhangExtensionRight: G.overhangExtensionRight,
  finProjection: { ...G.overhangProjection, name: 'finProjection', description: 'depth of a fin at each side of the window, from head to sill; 0 = no fins' },
  finGap: G.finGap,
  revealDepth: G.revealDepth,
  skyline: G.skyline,
  quantity: {
    name: 'quantity',
    kind: 'choice',
    choices: ['gain', 'radiant', 'convective', 'beam', 'sky', 'ground', 'skyunshaded', 'groundunshaded', 'dni', 'dhi', 'sunlit', 'skyview', 'groundview', 'horizonshare', 'shgc', 'incidence', 'profile', 'altitude', 'azimuth', 'stamp'],
    default: 'gain',
    description:
      'column of the hourly series: gain, radiant, convective [W]; beam on the window plane, sky and ground reaching the glass, skyunshaded and groundunshaded on the bare window, dni, dhi [W/m²]; sunlit fraction; the window’s skyview and groundview ratios and horizonshare (0…1, the same every hour); shgc; incidence, profile, altitude, azimuth [°]; stamp (end of hour)',
  },
  day: { name: 'day', kind: 'number', integer: true, min: 1, max: 28, default: 21, description: 'day of each month for the clear design day' },
  factors: { name: 'factors', kind: 'numberList', min: 0, max: 1, length: { exact: 24 }, description: 'the 24 radiant time factors r0…r23 of the room (from your handbook or room model), summing to 1' },
  factorsOptional: { name: 'factors', kind: 'numberList', min: 0, max: 1, length: { exact: 24 }, optional: true, description: 'the 24 radiant time factors r0…r23 of the room, summing to 1; blank: no cooling-load columns' },
  gains: { name: 'gains', kind: 'numberList', unit: 'W', min: -1e7, max: 1e7, length: { exact: 24 }, description: 'hourly gain of the design day, hour ending 1:00 first' },
  dniSeries: { ...G.dni, kind: 'numberList', optional: true, gapsAreMissing: true, description: "a year's hourly direct normal irradiance, one value per hour (8760, or 8784 in a leap year); a blank or text cell marks that hour missing (#N/A in the result); blank range: clear sky from tauB and tauD" },
  dhiSeries: { ...G.dhi, kind: 'numberList', optional: true, gapsAreMissing: true, description: "a year's hourly diffuse horizontal irradiance, one value per hour; a blank or text cell marks that hour missing; blank range: clear sky from tauB and tauD" },
} satisfies Record<string, ParamDescriptor>;

const SITE_AND_WINDOW: readonly ParamDescriptor[] = [GLOSSARY.latitude, GLOSSARY.longitude, GLOSSARY.utcOffset, GLOSSARY.surfaceAzimuth, P.width, P.height, P.shgcNormal];
const GLASS_AND_GROUND: readonly ParamDescriptor[] = [P.panes, P.frameFraction, P.groundAlbedo, P.skyModel, P.surfaceTilt, P.interiorAttenuation];
const SHADING: readonly ParamDescriptor[] = [P.overhangProjection, P.overhangGap, P.overhangExtensionLeft, P.overhangExtensionRight, P.finProjection, P.finGap, P.revealDepth, P.skyline];

const SKY_MODEL: Record<string, SkyModel> = { isotropic: 'isotropic', haydavies: 'hayDavies', perez: 'perez1990' };

/** The shading set the shading arguments describe (devices of zero depth left out). */
function shadingOf(a: Args): Shading {
  const s: Shading = {};
  if ((a.overhangProjection as number) > 0) {
    s.overhang = { projection: a.overhangProjection as number, gap: a.overhangGap as number, extensionLeft: a.overhangExtensionLeft as number, extensionRight: a.overhangExtensionRight as number };
  }
  if ((a.finProjection as number) > 0) {
    const fin = { projection: a.finProjection as number, gap: a.finGap as number, extensionAbove: 0, extensionBelow: 0 };
    s.leftFin = fin;
    s.rightFin = { ...fin };
  }
  if ((a.revealDepth as number) > 0) s.revealDepth = a.revealDepth as number;
  if (a.skyline !== undefined) s.skyline = a.skyline as number[];
  return s;
}

/** The window the arguments describe; `year` of the hourly series and its weather. */
function specOf(a: Args, year: number, weather: Weather): WindowSpec {
  return {
    name: 'window',
    site: { latitude: a.latitude as number, longitude: a.longitude as number, utcOffset: a.utcOffset as number },
    surfaceAzimuth: a.surfaceAzimuth as number,
    surfaceTilt: a.surfaceTilt as number,
    width: a.width as number,
    height: a.height as number,
    frameFraction: a.frameFraction as number,
    glazing: { shgc: a.shgcNormal as number, panes: a.panes as number, interiorAttenuation: a.interiorAttenuation as number, radiantFraction: (a.radiantFraction as number | undefined) ?? DEFAULT_RADIANT_FRACTION },
    shading: shadingOf(a),
    groundAlbedo: a.groundAlbedo as number,
    skyModel: SKY_MODEL[a.skyModel as string],
    weather,
    year,
  };
}

function clearSkyOf(a: Args): Weather {
  return { kind: 'ashraeClearSky', tauB: [a.tauB as number], tauD: [a.tauD as number] };
}

/** Reason the weather arguments do not fit together, or undefined. */
function weatherProblem(a: Args, dniName = 'dni'): string | undefined {
  const hasDni = a.dni !== undefined;
  const hasDhi = a.dhi !== undefined;
  if (hasDni !== hasDhi) return `${hasDni ? 'dhi' : dniName} is needed too: give both dni and dhi, or neither for clear sky`;
  if (!hasDni && (a.tauB === undefined || a.tauD === undefined)) return `${a.tauB === undefined ? 'tauB' : 'tauD'} is needed for clear sky when dni and dhi are blank`;
  return undefined;
}

function requireWeatherArgs(a: Args): void {
  const reason = weatherProblem(a);
  if (reason !== undefined) {
    const name = reason.split(' ')[0];
    throw new SunpaneError(name, null, reason.slice(name.length + 1));
  }
}

/** The reason a spec built from the arguments is refused, or undefined. */
function specProblem(build: () => WindowSpec): string | undefined {
  try {
    validateWindowSpec(build());
    return undefined;
  } catch (err) {
    if (err instanceof SunpaneError) return err.message;
    throw err;
  }
}

/** The year of a one-hour calculation: the calendar year of its date-time, within what a spec accepts. */
function yearOf(serial: number): number {
  return Math.min(9998, Math.max(1901, serialToCivil(serial).year));
}

/**
 * The window of a one-hour function and the hour's weather. With dni and dhi given, the spec's
 * weather is not used for the hour; it still needs one, so it gets the clear sky of tauB/tauD when
 * given, else a placeholder clear sky that nothing reads.
 */
function hourSpec(a: Args): { spec: WindowSpec; weatherHour?: { dni: number; dhi: number } } {
  requireWeatherArgs(a);
  const measured = a.dni !== undefined;
  const weather: Weather = a.tauB !== undefined && a.tauD !== undefined ? clearSkyOf(a) : { kind: 'ashraeClearSky', tauB: [G.tauB.max as number], tauD: [G.tauD.max as number] };
  return { spec: specOf(a, yearOf(a.dateTime as number), weather), weatherHour: measured ? { dni: a.dni as number, dhi: a.dhi as number } : undefined };
}

/**
 * Runs a core call and renames a refused spec field to the worksheet parameter it came from
 * (`weather.dni` → `dni`, `shading.overhang.extensionLeft` → `overhangExtensionLeft`, ...).
 */
function asParams<T>(work: () => T): T {
  try {
    return work();
  } catch (err) {
    if (!(err instanceof SunpaneError)) throw err;
    const name = paramNameOf(err.argument);
    if (name === err.argument) throw err;
    throw new SunpaneError(name, err.value, err.allowed);
  }
}

const FIELD_TO_PARAM: Record<string, string> = {
  'shading.overhang.projection': 'overhangProjection',
  'shading.overhang.gap': 'overhangGap',
  'shading.overhang.extensionLeft': 'overhangExtensionLeft',
  'shading.overhang.extensionRight': 'overhangExtensionRight',
  'shading.leftFin.projection': 'finProjection',
  'shading.rightFin.projection': 'finProjection',
  'shading.leftFin.gap': 'finGap',
  'shading.rightFin.gap': 'finGap',
  'shading.revealDepth': 'revealDepth',
  groundAlbedo: 'groundAlbedo',
  skyModel: 'skyModel',
  'glazing.shgc': 'shgcNormal',
};

function paramNameOf(field: string): string {
  const base = field.replace(/\[\d+\]$/, '');
  if (FIELD_TO_PARAM[base]) return FIELD_TO_PARAM[base];
  const m = /^(?:site|glazing|weather|shading)\.(\w+)$/.exec(base);
  return m ? m[1] : field;
}

function hourRefuses(a: Args): string | undefined {
  return weatherProblem(a) ?? specProblem(() => hourSpec(a).spec);
}

const HOUR_PARAMS: readonly ParamDescriptor[] = [GLOSSARY.dateTime, ...SITE_AND_WINDOW, P.dni, P.dhi, P.tauB, P.tauD, ...GLASS_AND_GROUND];

/** The one-hour gain equation: hand computations; its inputs are each checked against their own sources. */
const GAIN_CHECK: OutsideCheck = {
  source:
    'The fenestration solar heat gain equation Q = A_glass · IAC · [E_beam · F_sunlit · SHGC(θ) + (E_sky + E_ground) · SHGC_diffuse] (ASHRAE Handbook—Fundamentals (2013) ch. 15 — from memory), worked by hand with the numbers written out, and a bare window facing the sun gaining SHGC × glass area × DNI; the sun, sky, shading and SHGC it uses are checked against their own sources (see SUNALTITUDE, WINDOWIRRADIANCE, SUNLITFRACTION, SHGCANGLE).',
  tests: ['tests/core/gain/windowGain.test.ts', 'tests/core/gain/gainSteps.test.ts', 'tests/registry/gainFunctions.test.ts'],
};

const WINDOWGAIN: FunctionDescriptor = {
  name: 'WINDOWGAIN',
  summary: 'Solar heat gain through a window in one hour: beam through the sunlit glass plus sky and ground diffuse, × SHGC × glass area.',
  category: 'Gain and load',
  params: [...HOUR_PARAMS, ...SHADING],
  result: { shape: 'value', unit: 'W', min: 0, description: 'window solar gain at the date-time (0 at night)' },
  evaluate: (a) => {
    const { spec, weatherHour } = hourSpec(a);
    return asParams(() => windowGainAt(spec, a.dateTime as number, weatherHour).gain.total);
  },
  refuses: hourRefuses,
  examples: [
    { args: ['"2026-07-21T12:30"', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '', '', '0.4', '2.3'], note: 'a south window at noon on a clear July day (ASHRAE clear sky, τb 0.4, τd 2.3)' },
    { args: ['"2026-07-21T12:30"', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '850', '120', '', '', '2', '0.15', '0.2', '"perez"', '90', '1', '0.6', '0.1'], note: 'the same window with measured irradiance, a 15 % frame and a 0.6 m overhang 0.1 m above the head' },
  ],
  outsideCheck: GAIN_CHECK,
};

const GAINSTEPS: FunctionDescriptor = {
  name: 'GAINSTEPS',
  summary: 'The window gain of one hour worked out step by step (sun, angles, shading, irradiance, SHGC, area, watts), for checking by hand.',
  category: 'Gain and load',
  params: [...HOUR_PARAMS, P.radiantFraction, ...SHADING],
  result: { shape: 'spill', description: 'a heading row, then one row per step: step number, quantity, value, unit, method', columns: ['step', 'quantity', 'value', 'unit', 'method'] },
  evaluate: (a) => {
    const { spec, weatherHour } = hourSpec(a);
    const rows: OutTable = [['step', 'quantity', 'value', 'unit', 'method']];
    for (const s of asParams(() => gainSteps(spec, a.dateTime as number, weatherHour))) rows.push([s.step, s.quantity, s.value, s.unit, s.method]);
    return rows;
  },
  refuses: hourRefuses,
  examples: [{ args: ['"2026-07-21T12:30"', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '', '', '0.4', '2.3'], note: 'every step from sun altitude to watts for a south window at noon in July' }],
  outsideCheck: { ...GAIN_CHECK, source: `Every step re-derived by hand from the earlier steps: ${GAIN_CHECK.source}` },
};

const COOLINGLOAD: FunctionDescriptor = {
  name: 'COOLINGLOAD',
  summary: 'Hourly cooling load of a 24-hour gain profile by the radiant time series (Spitler, Fisher & Pedersen 1997), with your radiant time factors.',
  category: 'Gain and load',
  params: [P.gains, P.factors, P.radiantFraction],
  result: { shape: 'spill', unit: 'W', description: '24 rows: the cooling load of each hour, hour ending 1:00 first' },
  evaluate: (a) => Array.from(coolingLoad(a.gains as number[], a.factors as number[], a.radiantFraction as number), (q) => [q]),
  refuses: (a) => factorsProblem(a.factors as number[] | undefined),
  examples: [{ args: ['B2:B25', 'C2:C25', '1'], note: 'gains in B2:B25 (hour ending 1:00 to 24:00), the room’s 24 radiant time factors in C2:C25' }],
  outsideCheck: { source: 'Radiant time series, Spitler, Fisher & Pedersen (1997), ASHRAE Trans. 103(2): a constant gain gives an equal load, a unit impulse gives back the factors, the 24-hour total is kept, factors must sum to 1 — properties of the published method (the factor lists are test inputs; no published factor table is shipped).', tests: ['tests/reference/rts-spitler-1997.test.ts', 'tests/fixtures/formulas.ts'] },
};

function factorsProblem(factors: number[] | undefined): string | undefined {
  if (factors === undefined) return undefined;
  try {
    requireRadiantTimeFactors(factors);
    return undefined;
  } catch (err) {
    if (err instanceof SunpaneError) return err.message;
    throw err;
  }
}

function peakSpec(a: Args): WindowSpec {
  return specOf(a, a.year as number, clearSkyOf(a));
}

const PEAKGAINS: FunctionDescriptor = {
  name: 'PEAKGAINS',
  summary: 'For each month, the peak hour and peak window gain on a clear design day (and the peak cooling load when radiant time factors are given).',
  category: 'Gain and load',
  params: [
    P.year,
    ...SITE_AND_WINDOW,
    { ...P.tauB, optional: false, description: 'beam pseudo-optical depth of the ASHRAE clear-sky model for the design days' },
    { ...P.tauD, optional: false, description: 'diffuse pseudo-optical depth of the ASHRAE clear-sky model for the design days' },
    P.day,
    P.factorsOptional,
    ...GLASS_AND_GROUND,
    P.radiantFraction,
    ...SHADING,
  ],
  result: {
    shape: 'spill',
    min: 0,
    description: '12 rows, January first: month, peak hour (hour ending, 1–24, local standard time), peak gain [W]; with factors also the hour and value [W] of the peak cooling load',
  },
  evaluate: (a) => {
    const months = asParams(() => designDayPeaks(peakSpec(a), { day: a.day as number, factors: a.factors as number[] | undefined }));
    return months.map((m) => (m.peakLoad !== undefined ? [m.month, m.peakHour, m.peakGain, m.peakLoadHour!, m.peakLoad] : [m.month, m.peakHour, m.peakGain]));
  },
  refuses: (a) => factorsProblem(a.factors as number[] | undefined) ?? specProblem(() => peakSpec(a)),
  examples: [{ args: ['2026', '40', '-105', '-7', '270', '1.5', '1.2', '0.4', '0.4', '2.3'], note: 'a west window: peak hour and watts on the 21st of each month' }],
  outsideCheck: { source: 'Each month\'s peak is the largest of 24 one-hour gains (checked as for WINDOWGAIN, on the ASHRAE clear-sky model as for CLEARSKYDNI); with factors the cooling load follows Spitler, Fisher & Pedersen (1997) and keeps the day total; west windows peak after solar noon and east windows before (geometry).', tests: ['tests/core/load/designDay.test.ts', 'tests/reference/rts-spitler-1997.test.ts', 'tests/registry/gainFunctions.test.ts'] },
};

/** Which column of the annual series a `quantity` choice picks. */
const SERIES_COLUMN: Record<string, keyof AnnualSeries> = {
  gain: 'gain',
  radiant: 'radiant',
  convective: 'convective',
  beam: 'beam',
  sky: 'sky',
  ground: 'ground',
  skyunshaded: 'skyUnshaded',
  groundunshaded: 'groundUnshaded',
  dni: 'dni',
  dhi: 'dhi',
  sunlit: 'sunlitFraction',
  shgc: 'shgc',
  incidence: 'incidence',
  profile: 'profileAngle',
  altitude: 'sunAltitude',
  azimuth: 'sunAzimuth',
  stamp: 'stampSerial',
};
/** Columns that depend on the weather (shown as #N/A on a missing hour). */
const WEATHER_COLUMNS = new Set(['gain', 'radiant', 'convective', 'beam', 'sky', 'ground', 'skyunshaded', 'groundunshaded', 'dni', 'dhi']);
/** The window's diffuse-shading ratios, constant over the year (one value repeated on every row). */
const DIFFUSE_CONSTANTS: Record<string, (s: AnnualSeries) => number> = {
  skyview: (s) => s.diffuse.skyViewRatio,
  groundview: (s) => s.diffuse.groundViewRatio,
  horizonshare: (s) => s.diffuse.horizonShare,
};

function yearSpec(a: Args): WindowSpec {
  const weather: Weather = a.dni !== undefined && a.dhi !== undefined ? { kind: 'measured', dni: a.dni as number[], dhi: a.dhi as number[] } : clearSkyOf(a);
  return specOf(a, a.year as number, weather);
}

function yearRefuses(a: Args): string | undefined {
  const w = weatherProblem(a);
  if (w !== undefined) return w;
  if (a.dni !== undefined) {
    const hours = hoursInYear(a.year as number);
    for (const name of ['dni', 'dhi']) {
      const n = (a[name] as number[]).length;
      if (n !== hours) return `${name} holds ${n} values: ${a.year} needs ${hours}, one per hour`;
    }
  }
  return specProblem(() => yearSpec(a));
}

const WINDOWYEAR: FunctionDescriptor = {
  name: 'WINDOWYEAR',
  summary: 'One quantity of a window hour by hour over a year (gain, irradiance on the glass, sunlit fraction, angles...), rows stamped at the end of each hour.',
  category: 'Gain and load',
  params: [P.year, ...SITE_AND_WINDOW, P.quantity, P.dniSeries, P.dhiSeries, P.tauB, P.tauD, ...GLASS_AND_GROUND, P.radiantFraction, ...SHADING],
  result: { shape: 'spill', description: '8760 rows (8784 in a leap year), 1 January 00:00–01:00 first, of the chosen quantity; sun at the middle of each hour' },
  evaluate: (a) => {
    requireWeatherArgs(a);
    const series = asParams(() => annualSeries(yearSpec(a)));
    const key = a.quantity as string;
    const out: OutTable = new Array(series.hours);
    const constant = DIFFUSE_CONSTANTS[key];
    if (constant !== undefined) {
      const v = constant(series);
      for (let i = 0; i < series.hours; i++) out[i] = [v];
      return out;
    }
    const column = series[SERIES_COLUMN[key]] as Float64Array;
    const weatherDependent = WEATHER_COLUMNS.has(key);
    for (let i = 0; i < series.hours; i++) out[i] = [weatherDependent && series.missing[i] === 1 ? new NotAvailable('no weather value for this hour') : column[i]];
    return out;
  },
  refuses: yearRefuses,
  examples: [
    { args: ['2026', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '"gain"', '', '', '0.4', '2.3'], note: 'hourly clear-sky gain of a south window for the whole year' },
    { args: ['2026', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '"sunlit"', '', '', '0.4', '2.3', '', '', '', '', '', '', '0.8'], note: 'hourly sunlit fraction under a 0.8 m overhang' },
    { args: ['2026', '40', '-105', '-7', '180', '1.5', '1.2', '0.4', '"sky"', '', '', '0.4', '2.3', '', '', '', '', '', '', '0.8'], note: 'hourly sky diffuse reaching the glass under the same overhang ("skyunshaded" gives the bare window’s, "skyview" the ratio between them for an isotropic sky)' },
  ],
  outsideCheck: { source: 'Every hour held to the checked one-hour functions (see WINDOWGAIN) within 1e-12 (relative for irradiances), and the year\'s sun path held to the direct NREL SPA within 1e-4° (which is checked against the report\'s worked example, astronomy-engine 2.1.19 and suncalc 2.0.2); rows stamped at the end of each hour, 8760 or 8784 of them.', tests: ['tests/core/gain/annual.test.ts', 'tests/core/gain/preparedFast.test.ts', 'tests/core/sun/sunPath.test.ts', 'tests/registry/gainFunctions.test.ts'] },
};

export const GAIN_FUNCTIONS: readonly FunctionDescriptor[] = [WINDOWGAIN, GAINSTEPS, COOLINGLOAD, PEAKGAINS, WINDOWYEAR];
