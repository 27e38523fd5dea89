/**
 * Property fuzzing driven by the registry (fast-check). For EVERY registered worksheet function the
 * arguments are generated from its descriptor — each parameter's kind, unit, range, integer flag,
 * choices, list length and order; whole-range arguments (the SHGC table's angles and values drawn
 * as one table, radiant time factors summing to 1, a year of hourly weather); and the window range
 * of the glossary (src/registry/glossary.ts, src/registry/windowRange.ts) in both of its layouts —
 * and each run draws either a valid set of arguments or the same with ONE argument made invalid.
 *
 * - Valid arguments: either the descriptor's `refuses` names a reason and the call gives the typed
 *   error, or the call is a VALID EVALUATION: every cell finite, inside the declared result range,
 *   the spilled table exactly the declared size, and the physics of its result kind holds (fractions
 *   within 0…1, beam + sky + ground = total, a hemispherical SHGC not above the table's maximum, no
 *   gain at night under a clear sky, monotone where the physics says so: a deeper overhang never
 *   raises the sunlit fraction, a larger glass area never lowers the gain, …). Valid evaluations
 *   are counted per function and the count is asserted, so a generator that drifts into refused
 *   combinations fails instead of passing with nothing checked.
 * - One invalid argument: the typed error, naming that argument as the signature does.
 *
 * Run counts: FUZZ_RUNS (every function, the heavy ones included) or the defaults below; the seed
 * is FUZZ_SEED or a fixed one, and a failure names the seed and how to replay it (fast-check's own
 * report adds the shrunk counterexample and its path). `npm run fuzz` runs every function 10,000
 * times with a fresh seed. docs/testing.md has the whole story.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { SunpaneError } from '../../src/core/common/errors';
import { civilToSerial, type DateSystem, formatSerialIso, hoursInYear, MAX_SERIAL_EXCLUSIVE, MIN_SERIAL } from '../../src/core/time';
import type { ClockFields } from '../../src/registry/types';
import { applyFunction, readRange, readScalar } from '../../src/registry/evaluate';
import { globalWithinLimit, withinLimits } from './possibleIrradiance';
import { isAcceptedClearSkyPair, TAU_B_MAX, TAU_D_MAX } from '../../src/core/sky';
import { readWindowRange } from '../../src/registry/windowRange';
import { FUNCTIONS, findFunction, isOptional } from '../../src/registry';
import { GLOSSARY, type GlossaryEntry, WINDOW_FIELDS } from '../../src/registry/glossary';
import { type Args, type FunctionDescriptor, NotAvailable, type OutCell, type OutTable, type ParamDescriptor, type RawArg, type Scalar } from '../../src/registry/types';

// ---------------------------------------------------------------------------------------------
// Run counts and seed

/** Runs per function in `npm test`: every function, the heavy ones below included. */
export const DEFAULT_RUNS = 10_000;
/**
 * Functions whose every valid evaluation costs a millisecond or more on the machine `npm test` is
 * budgeted for (2 cores, the whole suite under about 4 minutes): in `npm test` they run 10,000 times
 * like every other function, but only this many of their runs draw valid arguments (each a full
 * evaluation: a year of hours, 12 design days, 288 mask positions, a window's view factors); the
 * rest draw one invalid argument, which must be refused, naming it, before anything is worked out
 * (about a tenth of a millisecond). Stated in their test names and in docs/testing.md, with the
 * per-run costs they were set from. With FUZZ_RUNS (and in `npm run fuzz`) every function draws
 * valid arguments four runs in five, as the others always do.
 */
export const HEAVY_VALID_DRAWS: Readonly<Record<string, number>> = {
  SOLARGAIN: 2_400, // the window prepared (view factors of its devices) on every call, and the monotone re-evaluations
  SOLARGAINSTEPS: 2_400,
  WINDOWGAIN: 2_400,
  GAINSTEPS: 2_400,
  WINDOWSUNLIT: 5_600, // window ranges read and built on every call
  VIEWFACTORS: 5_600, // a numerical hemisphere integration per call
  WINDOWVIEWFACTORS: 5_600,
  WINDOWSUNLITMASK: 480, // 288 sun positions and sunlit fractions per call
  SUNLITMASK: 480,
  SOLARGAINPEAKS: 320, // 12 design days × 24 hours per call
  PEAKGAINS: 320,
  SOLARGAINYEAR: 400, // 8,760 or 8,784 hours per call
  WINDOWYEAR: 400,
};

const envRuns = process.env.FUZZ_RUNS !== undefined && process.env.FUZZ_RUNS !== '' ? Number(process.env.FUZZ_RUNS) : undefined;
if (envRuns !== undefined && !(Number.isInteger(envRuns) && envRuns > 0)) throw new Error(`FUZZ_RUNS must be a whole number above 0, not "${process.env.FUZZ_RUNS}"`);
const envSeed = process.env.FUZZ_SEED !== undefined && process.env.FUZZ_SEED !== '' ? Number(process.env.FUZZ_SEED) : undefined;
if (envSeed !== undefined && !Number.isInteger(envSeed)) throw new Error(`FUZZ_SEED must be a whole number, not "${process.env.FUZZ_SEED}"`);

/** The seed of every property in this run. */
export const SEED = envSeed ?? 20261203;

/** Runs of one function: FUZZ_RUNS when set, else {@link DEFAULT_RUNS}. */
export function runsOf(): number {
  return envRuns ?? DEFAULT_RUNS;
}

/** Share of a function's runs that draw valid arguments: four in five, or a heavy function's own in `npm test`. */
export function validShareOf(name: string): number {
  const heavy = HEAVY_VALID_DRAWS[name];
  return envRuns === undefined && heavy !== undefined ? heavy / DEFAULT_RUNS : 0.8;
}

/** Share of a function's valid draws that must end in a checked valid evaluation (the rest refused combinations). */
export const MIN_VALID_SHARE = 0.5;

// ---------------------------------------------------------------------------------------------
// Which file fuzzes which functions (jest runs the files on separate workers)

export type FuzzPart = 'sun' | 'shading' | 'skyGlazing' | 'gainHour' | 'gainDays';

/** Columns of the design-day peaks: 3, the gain's parts with `parts`, the load with a room, its parts with both. */
function peakColumns(a: Args, room: boolean): number {
  const load = a.factors !== undefined || room;
  return 3 + (a.parts === true ? 3 : 0) + (load ? 2 : 0) + (load && a.parts === true ? 3 : 0);
}

/** Whether a window range names a room (its construction or its own series). */
function windowHasRoom(w: unknown): boolean {
  const values = (w as { values?: ReadonlyMap<string, unknown> } | undefined)?.values;
  return values !== undefined && (values.has('roomConstruction') || values.has('solarRadiantTimeSeries') || values.has('nonSolarRadiantTimeSeries'));
}

/** The part of the fuzz a function belongs to; every registered function is in exactly one. */
export function partOf(fn: FunctionDescriptor): FuzzPart {
  switch (fn.category) {
    case 'Time and sun':
    case 'Surface angles':
      return 'sun';
    case 'Shading':
      return 'shading';
    case 'Sky and irradiance':
    case 'Glazing':
      return 'skyGlazing';
    case 'Gain and load':
      return ['SOLARGAIN', 'SOLARGAINSTEPS', 'WINDOWGAIN', 'GAINSTEPS', 'COOLINGLOAD'].includes(fn.name) ? 'gainHour' : 'gainDays';
  }
}

// ---------------------------------------------------------------------------------------------
// Generators from the descriptors

/**
 * Sites and years shared by the functions that work out a year of sun (one-hour gains read the
 * year's sun path, kept for a few sites; design days and the hourly year likewise): varied enough
 * to cover both hemispheres, the tropics and high latitude, few enough that the path is reused.
 */
const SITE_POOL: readonly { latitude: number; longitude: number; utcOffset: number; year: number }[] = [
  { latitude: 40, longitude: -105, utcOffset: -7, year: 2026 },
  { latitude: -33.9, longitude: 151.2, utcOffset: 10, year: 2028 },
  { latitude: 64.1, longitude: -21.9, utcOffset: 0, year: 2027 },
];

export function numberArb(p: ParamDescriptor): fc.Arbitrary<number> {
  const min = p.min ?? -1e6;
  const max = p.max ?? 1e6;
  if (p.integer) return fc.integer({ min: Math.ceil(min + (p.exclusiveMin ? 1 : 0)), max: Math.floor(max - (p.exclusiveMax ? 1 : 0)) });
  const lo = p.exclusiveMin ? min + Math.max(1e-9, Math.abs(min) * 1e-9) : min;
  const hi = p.exclusiveMax ? max - Math.max(1e-9, Math.abs(max) * 1e-9) : max;
  // Edge values are where formulas break: give them a fair chance besides the random interior.
  return fc.oneof(
    { weight: 6, arbitrary: fc.double({ min: lo, max: hi, noNaN: true, noDefaultInfinity: true }) },
    { weight: 1, arbitrary: fc.constantFrom(lo, hi, Math.min(Math.max(0, lo), hi)) },
  );
}

type Pair = [string, number | string];

/** One window field's cell, drawn from its glossary entry (number, choice, monthly or other list, date-time). */
function fieldValue(f: GlossaryEntry): fc.Arbitrary<number | string> {
  const cell = f.window!.cell;
  if (cell === 'choice') return fc.constantFrom(...(f.choices ?? []), ...Object.keys(f.choiceAliases ?? {}));
  if (cell === 'monthly') return fc.oneof(numberArb({ ...f, kind: 'number' }), fc.array(numberArb({ ...f, kind: 'number' }), { minLength: 12, maxLength: 12 }).map((xs) => xs.join(' ')));
  if (cell === 'dateTime') return fc.double({ min: MIN_SERIAL, max: MAX_SERIAL_EXCLUSIVE - 1, noNaN: true });
  // a room's radiant time series: its exact count, 24 factors summing to 1
  if (cell === 'list' && f.length?.exact === 24) return factorsArb().map((xs) => xs.join(' '));
  if (cell === 'list') return fc.array(numberArb({ ...f, kind: 'number' }), { minLength: 1, maxLength: 12 }).map((xs) => xs.join(' '));
  return numberArb(f);
}

/** The SHGC table as one: strictly ascending angles at least 0.01° apart, and as many values. */
export function shgcTableArb(): fc.Arbitrary<{ angles: number[]; values: number[] }> {
  return fc
    .uniqueArray(fc.integer({ min: 0, max: 9000 }), { minLength: 1, maxLength: 12 })
    .chain((centi) => {
      const angles = [...centi].sort((a, b) => a - b).map((c) => c / 100);
      return fc.array(numberArb(GLOSSARY.shgcValues), { minLength: angles.length, maxLength: angles.length }).map((values) => ({ angles, values }));
    });
}

/** 24 radiant time factors summing to 1 (a room's), sometimes a front-loaded light room's. */
function factorsArb(): fc.Arbitrary<number[]> {
  return fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 24, maxLength: 24 }).map((w) => {
    const sum = w.reduce((s, x) => s + x, 0);
    if (sum <= 0) return Array.from({ length: 24 }, () => 1 / 24);
    const f = w.map((x) => x / sum);
    // make the sum exactly 1 within the core's tolerance
    f[0] += 1 - f.reduce((s, x) => s + x, 0);
    return f.map((x) => Math.min(1, Math.max(0, x)));
  });
}

/** Hourly weather for one year (clear-ish days, a few hours missing), cached by length. */
const SERIES = new Map<number, [number[], number[]]>();
function seriesOf(hours: number): [number[], number[]] {
  let s = SERIES.get(hours);
  if (s === undefined) {
    const dni: number[] = [];
    const dhi: number[] = [];
    for (let i = 0; i < hours; i++) {
      const h = i % 24;
      const day = Math.max(0, Math.sin(((h - 6) / 12) * Math.PI));
      dni.push(800 * day * (1 + 0.2 * Math.sin(i / 97)));
      dhi.push(40 + 120 * day);
    }
    dni[100] = Number.NaN; // a missing hour: #N/A in the weather columns
    s = [dni, dhi];
    SERIES.set(hours, s);
  }
  return s;
}

/**
 * The same weather as the worksheet ranges a call receives (a column of 8,760 or 8,784 cells, and a
 * row of the first 48 hours, too short), built once per length: a draw shares them, as nothing
 * changes a range it reads.
 */
const SERIES_RANGES = new Map<number, { dni: RawArg; dhi: RawArg; dniShort: RawArg; dhiShort: RawArg }>();
function seriesRangesOf(hours: number): { dni: RawArg; dhi: RawArg; dniShort: RawArg; dhiShort: RawArg } {
  let r = SERIES_RANGES.get(hours);
  if (r === undefined) {
    const [dni, dhi] = seriesOf(hours);
    r = { dni: dni.map((v) => [Number.isNaN(v) ? null : v]), dhi: dhi.map((v) => [v]), dniShort: [dni.slice(0, 48)], dhiShort: [dhi.slice(0, 48)] };
    SERIES_RANGES.set(hours, r);
  }
  return r;
}

/** Fields no generated window sets at random: its place, the sky and the glass type with its table (each drawn as one). */
const SET_APART = ['name', 'site', 'shgcAngles', 'shgcValues', 'linkeTurbidity', 'tauB', 'tauD', 'year', 'surfaceTilt', 'glazingType', 'glazingTypeParameter', 'dateSystem'];
/** Fields that only mean something together (drawn as a group). */
const GROUPS: readonly (readonly string[])[] = [
  ['daylightSavingStart', 'daylightSavingEnd', 'daylightSavingShift'],
  ['uValue', 'indoorTemperature', 'dryBulbMax', 'dailyRange'],
];
const SITE_KEYED = ['elevation', 'pressure', 'temperature'];

/** The projection a device's other fields need (a gap or extension without its device is refused). */
function projectionFor(name: string): string | undefined {
  for (const dev of ['overhang', 'leftFin', 'rightFin', 'fin']) if (name.startsWith(dev) && name !== `${dev}Projection`) return `${dev}Projection`;
  return undefined;
}

/** A daylight-saving rule: clocks forward in March or April, back in September to November of one year. */
const DST_ARB: fc.Arbitrary<Pair[]> = fc
  .tuple(fc.integer({ min: 1950, max: 2100 }), fc.integer({ min: 3, max: 4 }), fc.integer({ min: 1, max: 28 }), fc.integer({ min: 9, max: 11 }), fc.integer({ min: 1, max: 28 }), fc.option(numberArb(GLOSSARY.daylightSavingShift), { nil: undefined }))
  .map(([y, m1, d1, m2, d2, shift]) => [['daylightSavingStart', civilToSerial(y, m1, d1, 2)], ['daylightSavingEnd', civilToSerial(y, m2, d2, 3)], ...(shift !== undefined ? [['daylightSavingShift', shift] as Pair] : [])]);

/**
 * A valid clock range (the trailing `clock` argument): a daylight-saving rule drawn whole (start and
 * end together, the end after the start; the shift sometimes blank), a date system, or both, in
 * either layout, under the names, labels or aliases of the glossary. In the 1904 date system the
 * rule's serials count from 1 January 1904, or are ISO text (the same in both systems).
 */
export const CLOCK_ARB: fc.Arbitrary<{ raw: RawArg; dateSystem: 1900 | 1904 }> = fc
  .tuple(fc.option(DST_ARB, { nil: undefined }), fc.constantFrom<(1900 | 1904 | undefined)>(undefined, 1900, 1904, 1904), fc.boolean(), fc.boolean(), fc.boolean())
  .filter(([rule, system]) => rule !== undefined || system !== undefined)
  .map(([rule, system, down, iso, label]) => {
    const names: Record<string, string> = label
      ? { daylightSavingStart: 'Daylight saving start', daylightSavingEnd: 'dstEnd', daylightSavingShift: 'Daylight saving shift [h]', dateSystem: 'Date system' }
      : { daylightSavingStart: 'daylightSavingStart', daylightSavingEnd: 'daylightSavingEnd', daylightSavingShift: 'daylightSavingShift', dateSystem: 'dateSystem' };
    const pairs: Pair[] = (rule ?? []).map(([n, v]) => {
      if (n === 'daylightSavingShift' || typeof v !== 'number') return [names[n], v] as Pair;
      return [names[n], iso ? formatSerialIso(v) : system === 1904 ? v - 1462 : v] as Pair;
    });
    if (system !== undefined) pairs.push([names.dateSystem, system]);
    const raw: RawArg = down ? pairs.map(([n, v]) => [n, v]) : [pairs.map(([n]) => n), pairs.map(([, v]) => v)];
    return { raw, dateSystem: system ?? 1900 };
  });

/** Clock ranges each refused for one reason: the end before the start, a shift or date system out of range, a start alone, a name that is no clock field. */
const BAD_CLOCKS: readonly RawArg[] = [
  [['daylightSavingStart', civilToSerial(2026, 10, 25, 3)], ['daylightSavingEnd', civilToSerial(2026, 3, 29, 2)]],
  [['dstStart', '2026-03-29T02:00'], ['dstEnd', '2026-10-25T03:00'], ['dstShift', 2.5]],
  [['dstStart', '2026-03-29T02:00'], ['dstEnd', '2026-10-25T03:00'], ['dstShift', 0]],
  [['dateSystem', 1903]],
  [['Date system'], ['Mac']],
  [['daylightSavingStart', civilToSerial(2026, 3, 29, 2)]],
  [['latitude', 40]],
  [['dstStart', -5], ['dstEnd', 200], ['dateSystem', 1904]],
  [['dstStart', civilToSerial(2026, 3, 29, 2), 1], ['dstEnd', civilToSerial(2026, 10, 25, 3), 2]],
];

/** Conduction: U-value, indoor temperature and the design day's dry-bulb and range, all together. */
const CONDUCTION_ARB: fc.Arbitrary<Pair[]> = fc
  .tuple(fieldValue(GLOSSARY.uValue), fieldValue(GLOSSARY.indoorTemperature), fieldValue(GLOSSARY.dryBulbMax), fieldValue(GLOSSARY.dailyRange))
  .map(([u, t, db, r]) => [['uValue', u], ['indoorTemperature', t], ['dryBulbMax', db], ['dailyRange', r]]);

/** One time in six: the value, else nothing. */
function sometimes<T>(arb: fc.Arbitrary<T>): fc.Arbitrary<T | undefined> {
  return fc.oneof({ weight: 5, arbitrary: fc.constant(undefined) }, { weight: 1, arbitrary: arb });
}

/** Tilt: vertical most of the time (devices need it), any tilt otherwise. */
const TILT_ARB = fc.oneof({ weight: 6, arbitrary: fc.constant(90) }, { weight: 1, arbitrary: numberArb(GLOSSARY.surfaceTilt) });

/** Glass: the pane model (type clear/tinted or none), a coated unit with its parameter, or a table. */
const GLASS_ARB: fc.Arbitrary<Pair[]> = fc.oneof(
  { weight: 3, arbitrary: fc.constant([] as Pair[]) },
  { weight: 1, arbitrary: fc.constantFrom('clear', 'tinted').map((t) => [['glazingType', t]] as Pair[]) },
  { weight: 1, arbitrary: numberArb(GLOSSARY.glazingTypeParameter).map((q) => [['glazingType', 'coated'], ['glazingTypeParameter', q]] as Pair[]) },
  { weight: 2, arbitrary: fc.tuple(shgcTableArb(), fc.boolean()).map(([t, named]) => [...(named ? [['glazingType', 'table'] as Pair] : []), ['shgcAngles', t.angles.join(' ')], ['shgcValues', t.values.join(' ')]] as Pair[]) },
);

/**
 * A τb/τd pair brought into the pairs the engine accepts: a pair whose ASHRAE clear sky passes the
 * physically possible limits at some sun is refused (requireClearSkyPair, checked against the
 * limits in tests/core/sky/physically-possible.test.ts). τb below {@link TAU_B_FLOOR} (a beam above
 * the extraterrestrial value whatever τd) is raised to it; for a given τb the accepted τd form one
 * interval, found by bisection (kept per τb) and entered by a small margin so that a draw never sits
 * on the edge of the trial grid. Pairs already inside are unchanged, so the box edges are still drawn.
 *
 * The bisection keeps the accepted end of its bracket and stops after {@link EDGE_STEPS} halvings,
 * when the bracket is under 0.002 wide (τd spans 0…4): the edge it returns is accepted and within
 * 0.002 of the true one, ten times finer than the margin. Each step asks the engine about one pair
 * on its whole grid of sun altitudes, and a τb drawn at random is seldom drawn twice: run to 40
 * halvings, the bisection took about a third of the fuzz's CPU time; a neighbour's range is tried
 * first ({@link TAU_D_NEAR}).
 */
export function acceptedTauPair(tauB: number, tauD: number): [number, number] {
  if (!(tauB > 0 && tauB <= TAU_B_MAX && tauD > 0 && tauD <= TAU_D_MAX)) return [tauB, tauD];
  const tb = Math.max(tauB, TAU_B_FLOOR);
  const ok = (td: number) => isAcceptedClearSkyPair(tb, td);
  if (ok(tauD)) return [tb, tauD];
  let range = TAU_D_RANGES.get(tb);
  if (range === undefined) {
    // a τb in the same hundredth as one already bisected: its range, when that brings the pair into the accepted ones
    const near = TAU_D_NEAR.get(Math.round(tb * 100));
    if (near !== undefined) {
      const td = Math.min(near[1], Math.max(near[0], tauD));
      if (ok(td)) return [tb, td];
    }
  }
  if (range === undefined) {
    const inside = 1.9; // passes for every τb from the floor to the maximum
    if (!ok(inside)) throw new Error(`no accepted tauD for tauB ${tb}`);
    const edge = (bad: number) => {
      let [a, b] = [inside, bad];
      for (let k = 0; k < EDGE_STEPS; k++) {
        const m = (a + b) / 2;
        if (ok(m)) a = m;
        else b = m;
      }
      return a;
    };
    const lo = ok(Number.MIN_VALUE) ? Number.MIN_VALUE : edge(Number.MIN_VALUE) + 0.02;
    const hi = ok(TAU_D_MAX) ? TAU_D_MAX : edge(TAU_D_MAX) - 0.02;
    range = [lo, hi];
    TAU_D_RANGES.set(tb, range);
    TAU_D_NEAR.set(Math.round(tb * 100), range);
  }
  return [tb, Math.min(range[1], Math.max(range[0], tauD))];
}
/** Halvings of the bisection for an edge of the accepted τd: 2^-11 of the 0…4 span is under 0.002. */
const EDGE_STEPS = 11;
/** Lowest τb the fuzz draws: below about 0.002 the model's beam passes the extraterrestrial value. */
const TAU_B_FLOOR = 0.01;
const TAU_D_RANGES = new Map<number, [number, number]>();
/**
 * The last bisected range by τb rounded to a hundredth. The edges move by far less than the 0.02
 * margin over a hundredth of τb, so a pair clamped into a neighbour's range is nearly always
 * accepted, and it is asked before it is used (bisected afresh if not): with about one τb in three
 * drawn outside the accepted pairs, the bisections took a fifth of a shading or one-hour gain run.
 */
const TAU_D_NEAR = new Map<number, [number, number]>();

/** {@link acceptedTauD} over a window's τb/τd cells: one number each, or twelve written in one cell. */
function clearSkyPairs(b: number | string, d: number | string): [number | string, number | string] {
  if (typeof b === 'number' && typeof d === 'number') return acceptedTauPair(b, d);
  const bs = String(b).split(' ').map(Number);
  const ds = String(d).split(' ').map(Number);
  if (bs.length === 1) {
    const pairs = ds.map((x) => acceptedTauPair(bs[0], x));
    return [pairs[0][0], pairs.map((p) => p[1]).join(' ')];
  }
  const pairs = ds.map((x, k) => acceptedTauPair(bs[k], x));
  return [pairs.map((p) => p[0]).join(' '), pairs.map((p) => p[1]).join(' ')];
}

/** The positional τ arguments of a call (tauB/tauD, one number each or lists) brought into the accepted pairs in place. */
function acceptedTauArgs(names: string[], out: RawArg[]): void {
  for (const [x, y] of [['tauB', 'tauD'], ['yearTauB', 'yearTauD']]) {
    const [kb, kd] = [names.indexOf(x), names.indexOf(y)];
    if (kb < 0 || kd < 0) continue;
    const b = out[kb];
    const d = out[kd];
    if (typeof b === 'number' && typeof d === 'number') [out[kb], out[kd]] = acceptedTauPair(b, d);
    else if (Array.isArray(b) && Array.isArray(d)) {
      const bs = (b as Scalar[][]).flat();
      const ds = (d as Scalar[][]).flat();
      if (!bs.every((v) => typeof v === 'number') || !ds.every((v) => typeof v === 'number')) continue;
      const n = Math.max(bs.length, ds.length);
      if ((bs.length !== 1 && bs.length !== n) || (ds.length !== 1 && ds.length !== n)) continue;
      const pairs = Array.from({ length: n }, (_, k) => acceptedTauPair(bs[bs.length === 1 ? 0 : k] as number, ds[ds.length === 1 ? 0 : k] as number));
      // a single value standing for every month is kept single when the pairs still agree, else written out by month
      const single = (values: number[]) => values.every((v) => v === values[0]);
      const bValues = pairs.map((p) => p[0]);
      const dValues = pairs.map((p) => p[1]);
      out[kb] = bs.length === 1 && single(bValues) ? [[bValues[0]]] : [bValues];
      out[kd] = ds.length === 1 && single(dValues) ? [[dValues[0]]] : [dValues];
    }
  }
}

/** A window's clear sky: Linke turbidity, or τb with τd (as many values each: 1 or 12), or none. */
function skyArb(noneWeight: number): fc.Arbitrary<Pair[]> {
  const G = GLOSSARY;
  const monthly = (f: GlossaryEntry, n: number) => (n === 1 ? numberArb({ ...f, kind: 'number' }) : fc.array(numberArb({ ...f, kind: 'number' }), { minLength: 12, maxLength: 12 }).map((xs) => xs.join(' ')));
  return fc.oneof(
    { weight: 4, arbitrary: fieldValue(G.linkeTurbidity).map((l) => [['linkeTurbidity', l]] as Pair[]) },
    { weight: 4, arbitrary: fc.constantFrom(1, 12).chain((n) => fc.tuple(monthly(G.tauB, n), monthly(G.tauD, n))).map(([b, d]) => clearSkyPairs(b, d)).map(([b, d]) => [['tauB', b], ['tauD', d]] as Pair[]) },
    { weight: noneWeight, arbitrary: fc.constant([] as Pair[]) },
  );
}

interface WindowOptions {
  /** Site and year from {@link SITE_POOL}; elevation, pressure and temperature left out (they key the sun path). */
  pooled?: boolean;
  /** Give it a clear sky of its own nearly always. */
  sky?: boolean;
  /** A year field always (the hourly year needs one). */
  year?: boolean;
}

/**
 * A valid window as name → value cells in either layout: names down the first column with values
 * beside them, or a header row over a value row. Every field is drawn from its glossary entry;
 * fields that only mean something together are drawn together (a device's gap with its projection,
 * τb with τd, the daylight-saving rule, the conduction group, a glazing type with what it needs);
 * combinations may still be refused (extensions that leave an overhang a negative width, devices on
 * a tilted window …) — the descriptor's `refuses` says which.
 */
export function windowArb(o: WindowOptions = {}): fc.Arbitrary<{ raw: RawArg; pairs: Pair[]; site: (typeof SITE_POOL)[number] | undefined }> {
  const G = GLOSSARY;
  const place = [G.latitude, G.longitude, G.utcOffset];
  const rest = [G.surfaceAzimuth, G.width, G.height, G.shgc];
  const grouped = GROUPS.flat();
  const optional = WINDOW_FIELDS.filter((f) => ![...place, ...rest].includes(f as never) && !SET_APART.includes(f.name) && !grouped.includes(f.name) && !(o.pooled && SITE_KEYED.includes(f.name)));
  const placeArb = o.pooled
    ? fc.constantFrom(...SITE_POOL).map((s) => ({ site: s as (typeof SITE_POOL)[number] | undefined, pairs: [['latitude', s.latitude], ['longitude', s.longitude], ['utcOffset', s.utcOffset], ['year', s.year]] as Pair[] }))
    : fc.tuple(fc.tuple(...place.map(fieldValue)), o.year ? fc.integer({ min: 1901, max: 9998 }).map((y) => y as number | undefined) : fc.option(fc.integer({ min: 1901, max: 9998 }), { nil: undefined })).map(([v, year]) => ({
        site: undefined as (typeof SITE_POOL)[number] | undefined,
        pairs: [...place.map((f, k) => [f.name, v[k]] as Pair), ...(year !== undefined ? [['year', year] as Pair] : [])],
      }));
  const extras = fc.tuple(
    fc.option(TILT_ARB, { nil: undefined }),
    sometimes(DST_ARB),
    sometimes(CONDUCTION_ARB),
    GLASS_ARB,
  );
  return fc
    .tuple(
      placeArb,
      fc.tuple(...rest.map(fieldValue)),
      fc.subarray(optional, { maxLength: 6 }).chain((fields) => {
        const withDevices = [...fields];
        for (const f of fields) {
          const proj = projectionFor(f.name);
          const entry = proj ? WINDOW_FIELDS.find((x) => x.name === proj) : undefined;
          if (entry && !withDevices.includes(entry)) withDevices.push(entry);
        }
        return fc.tuple(...withDevices.map((f) => fieldValue(f).map((v) => [f.name, v] as Pair)));
      }),
      skyArb(o.sky ? 1 : 6),
      extras,
      fc.boolean(),
    )
    .map(([pl, req, opt, sky, [tilt, dst, conduction, glass], down]) => {
      const pairs: Pair[] = [...pl.pairs, ...rest.map((f, k) => [f.name, req[k]] as Pair), ...opt, ...sky, ...(tilt !== undefined ? [['surfaceTilt', tilt] as Pair] : []), ...(dst ?? []), ...(conduction ?? []), ...glass];
      const raw: RawArg = down ? pairs.map(([n, v]) => [n, v]) : [pairs.map(([n]) => n), pairs.map(([, v]) => v)];
      return { raw, pairs, site: pl.site };
    });
}

/** A window with one field out of its range, or a name that is no field. */
function invalidWindowArb(): fc.Arbitrary<RawArg> {
  const numeric = WINDOW_FIELDS.filter((f) => f.window!.cell === 'number' && (f.min !== undefined || f.max !== undefined));
  return fc.tuple(fc.constantFrom(...numeric), fc.boolean(), fc.constantFrom('widht', 'overhang', 'colour')).map(([f, badValue, name]) => {
    const base: [string, unknown][] = [['latitude', 40], ['longitude', -105], ['utcOffset', -7], ['surfaceAzimuth', 180], ['width', 1.5], ['height', 1.2], ['shgc', 0.4], ['tauB', 0.4], ['tauD', 2.3]];
    const bad = f.max !== undefined ? f.max + 1 + Math.abs(f.max) : (f.min as number) - 1 - Math.abs(f.min as number);
    const rows = badValue ? [...base.filter(([n]) => n !== f.name), [f.name, bad]] : [...base, [name, 1]];
    return rows as RawArg;
  });
}

/** What a generated valid case carries besides the arguments: the pooled site and a random nudge for the monotone checks. */
export interface ValidCase {
  raw: RawArg[];
  site?: (typeof SITE_POOL)[number];
  bump: number;
  /**
   * True when the hour's dni and dhi were drawn over their whole range (1 draw in 5) for a function
   * that works out the sun itself: they may be past the physically possible limits at that sun, and
   * such a call is then refused naming dni or dhi (counted refused, tests/core/sky/physically-possible.test.ts).
   */
  wide?: boolean;
}

/** A DNI/DHI pair some sky can give at any sun: DNI to 1320 W/m² (below the lowest extraterrestrial), DHI to 50 (the Long & Shi allowance). */
const ANY_SUN_DNI_MAX = 1320;
const ANY_SUN_DHI_MAX = 50;

/** The functions that read a whole year of sun per call: they take their place from the pool. */
const POOLED = new Set(['SOLARGAIN', 'SOLARGAINSTEPS', 'SOLARGAINPEAKS', 'SOLARGAINYEAR', 'WINDOWGAIN', 'GAINSTEPS', 'PEAKGAINS', 'WINDOWYEAR', 'WINDOWSUNLITMASK', 'SUNLITMASK']);

/** A date-time within a pooled site's year (a spreadsheet serial). */
function dateInYear(year: number): fc.Arbitrary<number> {
  const start = civilToSerial(year, 1, 1);
  return fc.double({ min: start + 1 / 24, max: start + hoursInYear(year) / 24, noNaN: true });
}

function paramArb(fn: FunctionDescriptor, p: ParamDescriptor): fc.Arbitrary<RawArg> {
  let arb: fc.Arbitrary<RawArg>;
  switch (p.kind) {
    case 'number':
      arb = numberArb(p);
      break;
    case 'dateTime':
      arb = fc.double({ min: MIN_SERIAL, max: MAX_SERIAL_EXCLUSIVE - 1, noNaN: true });
      break;
    case 'choice':
      arb = fc.constantFrom(...(p.choices ?? []), ...Object.keys(p.choiceAliases ?? {}));
      break;
    case 'flag':
      arb = fc.boolean();
      break;
    case 'text':
      arb = fc.string({ minLength: 1, maxLength: 12 });
      break;
    case 'window':
      return fc.constant(null); // drawn as a whole window by validCaseArb
    case 'clock':
      return fc.constant(null); // drawn as a whole clock by validCaseArb (its date system moves the date-times)
    case 'choiceList':
      arb = fc.subarray([...(p.choices ?? []), ...Object.keys(p.choiceAliases ?? {})], { minLength: 1, maxLength: Math.min(4, p.length?.max ?? 4) }).chain((xs) => fc.boolean().map((down) => (down ? xs.map((x) => [x]) : [xs])));
      break;
    case 'numberList': {
      if (p.name === 'factors') {
        arb = factorsArb().map((xs) => xs.map((x) => [x]));
        break;
      }
      if (p.length?.oneOf !== undefined) {
        // only these counts (one value for the year, or twelve by month)
        arb = fc.constantFrom(...p.length.oneOf).chain((n) => fc.array(numberArb({ ...p, kind: 'number' }), { minLength: n, maxLength: n })).map((xs) => [xs]);
        break;
      }
      const minLen = p.length?.exact ?? p.length?.min ?? 1;
      const maxLen = p.length?.exact ?? Math.min(p.length?.max ?? 48, 48);
      arb = fc
        .array(numberArb({ ...p, kind: 'number' }), { minLength: minLen, maxLength: maxLen })
        .map((xs) => (p.ascending ? [...new Set(xs)].sort((a, b) => a - b) : xs))
        .filter((xs) => xs.length >= minLen)
        .map((xs) => [xs]);
      break;
    }
    default:
      throw new Error(`fuzz: no generator for ${p.kind} parameter ${p.name} of ${fn.name}: add one in tests/support/registryFuzz.ts`);
  }
  return isOptional(p) ? fc.oneof({ weight: 4, arbitrary: arb }, { weight: 1, arbitrary: fc.constant(null) }) : arb;
}

/** Valid arguments of a function, with the couplings its parameters have drawn together. */
export function validCaseArb(fn: FunctionDescriptor): fc.Arbitrary<ValidCase> {
  const names = fn.params.map((p) => p.name);
  const pooled = POOLED.has(fn.name);
  const windowK = fn.params.findIndex((p) => p.kind === 'window');
  const needsSky = ['SOLARGAIN', 'SOLARGAINSTEPS', 'SOLARGAINPEAKS', 'SOLARGAINYEAR'].includes(fn.name);
  const win = windowK >= 0 ? windowArb({ pooled, sky: needsSky, year: fn.name === 'SOLARGAINYEAR' }).map((w) => w as { raw: RawArg; site?: (typeof SITE_POOL)[number] }) : fc.constant(undefined);
  const place = pooled && windowK < 0 ? fc.constantFrom(...SITE_POOL) : fc.constant(undefined);
  const table = names.includes('shgcAngles') && names.includes('shgcValues') ? fc.option(shgcTableArb(), { nil: undefined, freq: 12 }) : fc.constant(undefined);
  // positional arguments that go together: both of a pair or neither; devices need a vertical window
  const pairs = [['dni', 'dhi'], ['tauB', 'tauD']].filter(([x, y]) => names.includes(x) && names.includes(y) && isOptional(fn.params[names.indexOf(x)]) && (fn.params[names.indexOf(x)].kind === 'number' || fn.params[names.indexOf(x)].length?.oneOf !== undefined));
  const together = fc.tuple(...pairs.map(() => fc.oneof({ weight: 6, arbitrary: fc.constant(true) }, { weight: 1, arbitrary: fc.constant(false) })));
  const tilt = windowK < 0 && names.includes('surfaceTilt') && names.includes('overhangProjection') ? fc.oneof({ weight: 9, arbitrary: fc.constant(90) }, { weight: 1, arbitrary: numberArb(GLOSSARY.surfaceTilt) }) : fc.constant(undefined);
  const yearSeries = names.includes('dni') && fn.params[names.indexOf('dni')].kind === 'numberList' ? fc.constantFrom<'clear' | 'series' | 'short'>('clear', 'clear', 'clear', 'clear', 'clear', 'clear', 'series', 'series', 'series', 'short') : fc.constant(undefined);
  return fc
    .tuple(fc.tuple(...fn.params.map((p) => paramArb(fn, p))), win, place, table, yearSeries, fc.double({ min: 0, max: 1, noNaN: true }), together, tilt, fc.tuple(...pairs.map(([x, y]) => pairArb(fn, x, y))))
    .chain(([raw, w, pl, tab, series, bump, both, t, pairValues]): fc.Arbitrary<ValidCase> => {
      const out = [...raw];
      let wide = false;
      pairs.forEach(([x, y], k) => {
        out[names.indexOf(x)] = both[k] ? pairValues[k][0] : null;
        out[names.indexOf(y)] = both[k] ? pairValues[k][1] : null;
        if (both[k] && pairValues[k][2]) wide = true;
      });
      heldWithinLimits(names, out);
      acceptedTauArgs(names, out);
      if (t !== undefined) out[names.indexOf('surfaceTilt')] = t;
      const site = w?.site ?? pl;
      if (w) out[windowK] = w.raw;
      if (tab) {
        out[names.indexOf('shgcAngles')] = [tab.angles];
        out[names.indexOf('shgcValues')] = [tab.values];
      }
      if (pl) {
        // positional window: its place and year from the pool
        for (const k of ['latitude', 'longitude', 'utcOffset', 'year'] as const) if (names.includes(k)) out[names.indexOf(k)] = pl[k];
        for (const k of SITE_KEYED) if (names.includes(k)) out[names.indexOf(k)] = null;
      }
      if (series !== undefined) {
        const year = site?.year ?? 2026;
        const ranges = seriesRangesOf(hoursInYear(year));
        const kDni = names.indexOf('dni');
        const kDhi = names.indexOf('dhi');
        if (series === 'clear') out[kDni] = out[kDhi] = null;
        else if (series === 'series') {
          out[kDni] = ranges.dni;
          out[kDhi] = ranges.dhi;
        } else {
          out[kDni] = ranges.dniShort;
          out[kDhi] = ranges.dhiShort;
        }
      }
      const kDate = names.indexOf('dateTime');
      const extra = wide ? { wide } : {};
      const dated: fc.Arbitrary<ValidCase> = site && kDate >= 0 ? dateInYear(site.year).map((d): ValidCase => ({ raw: withAt(out, kDate, d), site, bump, ...extra })) : fc.constant({ raw: out, site, bump, ...extra });
      const kClock = fn.params.findIndex((p) => p.kind === 'clock');
      if (kClock < 0) return dated;
      // The clock: blank one time in three, else a drawn clock; in its 1904 system the serial date-times count 1462 days fewer.
      // A window function: the window's own dateSystem field now and then (no clock then: both would have to agree).
      const ownSystem = windowK >= 0 ? fc.oneof({ weight: 5, arbitrary: fc.constant(false) }, { weight: 1, arbitrary: fc.constant(true) }) : fc.constant(false);
      return fc.tuple(dated, fc.oneof({ weight: 1, arbitrary: fc.constant(undefined) }, { weight: 2, arbitrary: CLOCK_ARB }), ownSystem).map(([c, drawnClock, own]) => {
        const clock = own ? { raw: null as RawArg, dateSystem: 1904 as const } : drawnClock;
        if (clock === undefined) return c;
        // a window with its own rule gets no clock (the two would have to agree: tests/registry/clockWindows.test.ts)
        if (windowK >= 0 && !own && fieldIn(c.raw[windowK], 'daylightSavingStart') !== undefined) return c;
        const raw = withAt(c.raw, kClock, clock.raw);
        if (own) raw[windowK] = windowWith(raw[windowK], 'dateSystem', 1904);
        if (clock.dateSystem === 1904) {
          fn.params.forEach((p, k) => {
            if (p.kind === 'dateTime' && typeof raw[k] === 'number' && (raw[k] as number) >= 1462) raw[k] = (raw[k] as number) - 1462;
          });
        }
        return { ...c, raw };
      });
    });
}

/**
 * The two values of an optional pair. For the hour's dni and dhi: 4 draws in 5 inside what some sky
 * gives at any sun ({@link ANY_SUN_DNI_MAX}, {@link ANY_SUN_DHI_MAX}), 1 in 5 over the whole range
 * (marked wide: the call may then be refused at the hour's sun).
 */
function pairArb(fn: FunctionDescriptor, x: string, y: string): fc.Arbitrary<[RawArg, RawArg, boolean]> {
  const names = fn.params.map((p) => p.name);
  const full = fc.tuple(paramArb(fn, { ...fn.params[names.indexOf(x)], optional: false, default: undefined }), paramArb(fn, { ...fn.params[names.indexOf(y)], optional: false, default: undefined }));
  if (x !== 'dni' || fn.params[names.indexOf(x)].kind !== 'number') return full.map(([a, b]) => [a, b, false]);
  const anySun = fc.tuple(fc.double({ min: 0, max: ANY_SUN_DNI_MAX, noNaN: true }), fc.double({ min: 0, max: ANY_SUN_DHI_MAX, noNaN: true }));
  return fc.oneof({ weight: 4, arbitrary: anySun.map(([a, b]) => [a, b, false] as [RawArg, RawArg, boolean]) }, { weight: 1, arbitrary: full.map(([a, b]) => [a, b, true] as [RawArg, RawArg, boolean]) });
}

/**
 * For functions given the sun's altitude and the day (the window-plane irradiance functions): dni and
 * dhi brought within the physically possible limits at that sun (the engine refuses more; the
 * refusal is checked in tests/core/sky/physically-possible.test.ts).
 */
function heldWithinLimits(names: string[], out: RawArg[]): void {
  const [kDni, kDhi, kGhi, kAlt, kDay] = ['dni', 'dhi', 'ghi', 'sunAltitude', 'dayOfYear'].map((n) => names.indexOf(n));
  if (kAlt < 0 || kDay < 0) return;
  const [sunAltitude, dayOfYear] = [out[kAlt], out[kDay]];
  if (typeof sunAltitude !== 'number' || typeof dayOfYear !== 'number' || !(dayOfYear >= 1 && dayOfYear <= 366)) return;
  if (kGhi >= 0 && typeof out[kGhi] === 'number') out[kGhi] = globalWithinLimit(out[kGhi] as number, 90 - sunAltitude, dayOfYear);
  if (kDni < 0 || kDhi < 0) return;
  const [dni, dhi] = [out[kDni], out[kDhi]];
  if (typeof dni !== 'number' || typeof dhi !== 'number') return;
  const held = withinLimits({ dni, dhi, sunAltitude, dayOfYear });
  out[kDni] = held.dni;
  out[kDhi] = held.dhi;
}

function withAt(raw: RawArg[], k: number, v: RawArg): RawArg[] {
  const out = [...raw];
  out[k] = v;
  return out;
}

/** Bad values for one parameter, from its descriptor. */
export function invalidArb(p: ParamDescriptor, withClock = false): fc.Arbitrary<RawArg> | undefined {
  const bad: RawArg[] = [];
  switch (p.kind) {
    case 'number':
      bad.push(Number.NaN, Number.POSITIVE_INFINITY, 'text', true);
      if (p.min !== undefined) bad.push(p.exclusiveMin ? p.min : p.min - 1 - Math.abs(p.min));
      if (p.max !== undefined) bad.push(p.exclusiveMax ? p.max : p.max + 1 + Math.abs(p.max));
      if (p.integer) bad.push((p.min ?? 0) + 0.5);
      break;
    case 'dateTime':
      // 60 and 0 are 1900-system refusals only (the 1904 system starts at 0): not with a drawn clock
      bad.push(...(withClock ? [] : [60, 0]), -1, MAX_SERIAL_EXCLUSIVE, Number.NaN, 'yesterday', '2026-02-30T10:00');
      break;
    case 'choice':
      bad.push('no-such-choice', 3);
      break;
    case 'flag':
      bad.push('maybe', 2);
      break;
    case 'choiceList':
      bad.push([['no-such-choice']], [[3]]);
      break;
    case 'window':
      return invalidWindowArb();
    case 'clock':
      return fc.constantFrom(...BAD_CLOCKS);
    case 'numberList':
      // In a series with gaps, text and blanks are missing values, not errors.
      if (!p.gapsAreMissing) bad.push([['text']], [[Number.NaN]]);
      if (p.max !== undefined) bad.push([[p.max + 1 + Math.abs(p.max)]]);
      if (p.min !== undefined) bad.push([[p.min - 1 - Math.abs(p.min)]]);
      break;
    default:
      break;
  }
  return bad.length > 0 ? fc.constantFrom(...bad) : undefined;
}

// ---------------------------------------------------------------------------------------------
// Evaluating and checking

/** Every message a call gave (errors and #N/A reasons) and the function that gave it, read at the end for wording no user should see. */
export const MESSAGES: { fn: string; message: string }[] = [];

/** The arguments as `evaluate` would see them, to ask the descriptor's `refuses`. */
export function readArgs(fn: FunctionDescriptor, raw: readonly RawArg[]): Args {
  const args: Args = {};
  const kClock = fn.params.findIndex((p) => p.kind === 'clock');
  const clock = kClock >= 0 ? (readRange(fn.params[kClock], raw[kClock]) as ClockFields) : undefined;
  const kWindow = fn.params.findIndex((p) => p.kind === 'window');
  // the window range read once (its date system first, then the window under its parameter's name, as evaluate does)
  const windows = kWindow >= 0 ? readWindowRange(raw[kWindow], fn.params[kWindow].name).windows : undefined;
  const windowSystem = windows?.map((w) => (w instanceof SunpaneError ? undefined : w.values.get('dateSystem'))).find((v) => v !== undefined) as DateSystem | undefined;
  const dateSystem: DateSystem = clock?.dateSystemGiven ? clock.dateSystem : (windowSystem ?? 1900);
  fn.params.forEach((p, k) => {
    if (p.kind === 'clock') args[p.name] = readRange(p, raw[k]);
    else if (p.kind === 'window') {
      const w = windows![0];
      if (w instanceof SunpaneError) throw w;
      args[p.name] = w;
    } else args[p.name] = p.kind === 'numberList' || p.kind === 'choiceList' || p.kind === 'table' ? readRange(p, raw[k]) : readScalar(p, raw[k] as Scalar, dateSystem);
  });
  return args;
}

/** Throws (the property fails) unless `ok`. Cheaper than expect() in a loop of 10,000. */
export function must(ok: boolean, what: string): void {
  if (!ok) throw new Error(what);
}

/** `Math`'s and `Number`'s functions the per-cell checks call, taken once (a global's lookup costs about a microsecond under jest: docs/testing.md). */
const { abs: mathAbs, max: mathMax } = Math;
const { isFinite: numberIsFinite } = Number;

const near = (a: number, b: number, tol: number) => mathAbs(a - b) <= tol * mathMax(1, mathAbs(a), mathAbs(b));

/** The error a call gives, or undefined. */
export function errorOf(fn: FunctionDescriptor, raw: readonly RawArg[]): SunpaneError | undefined {
  try {
    const out = applyFunction(fn, raw);
    const cell = out.flat().find((c) => c instanceof SunpaneError);
    if (cell) MESSAGES.push({ fn: fn.name, message: (cell as SunpaneError).message });
    return cell as SunpaneError | undefined;
  } catch (err) {
    if (err instanceof SunpaneError) {
      MESSAGES.push({ fn: fn.name, message: err.message });
      return err;
    }
    throw err;
  }
}

/** Evaluates valid arguments: the table, with any error cell turned into a failure. */
export function evaluateValid(fn: FunctionDescriptor, raw: readonly RawArg[]): OutTable {
  const out = applyFunction(fn, raw);
  for (const row of out) {
    for (const cell of row) {
      if (cell instanceof SunpaneError) throw new Error(`${fn.name}: valid arguments gave an error: ${cell.message}`);
      if (cell instanceof NotAvailable) MESSAGES.push({ fn: fn.name, message: cell.message });
      else if (typeof cell === 'number' && !numberIsFinite(cell)) must(false, `${fn.name}: non-finite cell ${cell}`);
    }
  }
  return out;
}

/** The one number of a value result (or undefined for #N/A). */
function single(out: OutTable): number | undefined {
  const c = out[0][0];
  return typeof c === 'number' ? c : undefined;
}

/** The same call with one argument changed; undefined when the change is refused. */
function again(fn: FunctionDescriptor, raw: readonly RawArg[], name: string, value: RawArg): OutTable | undefined {
  const k = fn.params.findIndex((p) => p.name === name);
  const out = applyFunction(fn, withAt([...raw], k, value));
  return out.flat().some((c) => c instanceof SunpaneError) ? undefined : out;
}

/** A window range with one field set (added or replaced). */
function windowWith(raw: RawArg, name: string, value: number | string): RawArg {
  const m = raw as Scalar[][];
  const down = m.length > 2 || (m.length > 0 && m[0].length === 2 && m.length !== 2) || (m.length === 2 && m[0].length === 2 && typeof m[0][1] !== 'string');
  const pairs: [Scalar, Scalar][] = down ? m.map((r) => [r[0], r[1]]) : m[0].map((n, j) => [n, m[1][j]]);
  const kept = pairs.filter(([n]) => String(n) !== name);
  return [...kept, [name, value]].map(([n, v]) => [n, v]);
}

/** A window range's field value as written (number or text), or undefined. */
function fieldIn(raw: RawArg, name: string): Scalar | undefined {
  const m = raw as Scalar[][];
  for (const r of m) if (r[0] === name) return r[1];
  const j = m[0].indexOf(name);
  return j >= 0 && m.length > 1 ? m[1][j] : undefined;
}

const numOr = (v: RawArg | undefined, dflt: number): number => (typeof v === 'number' ? v : dflt);

/** Rows and columns a spill must have, worked out from its arguments (every spill function has an entry). */
const SPILL_SHAPE: Record<string, (a: Args, raw: readonly RawArg[]) => [rows: number, cols: number] | [rows: 'steps', cols: number]> = {
  CLEARSKYLINKE: () => [1, 3],
  SPLITGLOBAL: () => [1, 3],
  WINDOWIRRADIANCEPARTS: () => [1, 5],
  VIEWFACTORS: () => [1, 5],
  WINDOWVIEWFACTORS: (a) => [a.headers ? 2 : 1, 5],
  WINDOWSUNLITMASK: (a) => [a.headers ? 13 : 12, a.headers ? 25 : 24],
  SUNLITMASK: (a) => [a.headers ? 13 : 12, a.headers ? 25 : 24],
  SOLARGAINSTEPS: () => ['steps', 5],
  GAINSTEPS: () => ['steps', 5],
  SOLARGAINPEAKS: (a) => [a.headers ? 13 : 12, peakColumns(a, windowHasRoom(a.window))],
  PEAKGAINS: (a) => [a.headers ? 13 : 12, peakColumns(a, false)],
  COOLINGLOAD: (a) => [24, a.showGain === true ? 2 : 1],
  SOLARGAINYEAR: (a) => [hoursInYear(Number((a.window as { values: ReadonlyMap<string, unknown> }).values.get('year'))) + (a.headers ? 1 : 0), (a.quantities as string[]).length],
  WINDOWYEAR: (a) => [hoursInYear(a.year as number) + (a.headers ? 1 : 0), (a.quantity as string[]).length],
};

/** The declared columns a spill names (its `result.columns`), checked against its header row when it has one. */
function checkShape(fn: FunctionDescriptor, a: Args, raw: readonly RawArg[], out: OutTable): void {
  if (fn.result.shape !== 'spill') {
    must(out.length === 1 && out[0].length === 1, `${fn.name}: a value function gave a ${out.length} × ${out[0]?.length} table`);
    return;
  }
  const shape = SPILL_SHAPE[fn.name];
  must(shape !== undefined, `${fn.name}: a spill function without its declared size in SPILL_SHAPE (tests/support/registryFuzz.ts)`);
  const [rows, cols] = shape(a, raw);
  if (rows === 'steps') must(out.length >= 10, `${fn.name}: only ${out.length} step rows`);
  else must(out.length === rows, `${fn.name}: ${out.length} rows, declared ${rows}`);
  for (const r of out) must(r.length === cols, `${fn.name}: a row of ${r.length} cells, declared ${cols}`);
  if (fn.result.columns && cols === fn.result.columns.length && !['WINDOWSUNLITMASK', 'SUNLITMASK'].includes(fn.name) && a.headers === true) {
    must(JSON.stringify(out[0]) === JSON.stringify(fn.result.columns), `${fn.name}: header row ${JSON.stringify(out[0])} is not the declared columns`);
  }
}

/** The data cells of a result (header row and month column left out). */
function dataCells(fn: FunctionDescriptor, a: Args, out: OutTable): OutCell[] {
  const h = a.headers === true && fn.result.shape === 'spill' ? 1 : 0;
  const body = out.slice(h);
  if (['WINDOWSUNLITMASK', 'SUNLITMASK'].includes(fn.name)) return body.flatMap((r) => r.slice(h));
  return body.flat();
}

function checkRange(fn: FunctionDescriptor, a: Args, out: OutTable): void {
  const { min, max } = fn.result;
  if (min === undefined && max === undefined) return;
  if (fn.result.shape === 'spill' && ['SOLARGAINPEAKS', 'PEAKGAINS'].includes(fn.name)) return; // min 0 over watts and hours: checked with the physics
  for (const c of dataCells(fn, a, out)) {
    if (typeof c !== 'number') continue;
    // (the message is built only on a failure: these run once per cell of a spilled year)
    if (min !== undefined && !(c >= min - 1e-9)) must(false, `${fn.name}: ${c} below the declared minimum ${min}`);
    if (max !== undefined && !(c <= max + 1e-9)) must(false, `${fn.name}: ${c} above the declared maximum ${max}`);
  }
}

// ---------------------------------------------------------------------------------------------
// The physics of each result kind

type Physics = (fn: FunctionDescriptor, a: Args, raw: readonly RawArg[], out: OutTable, c: ValidCase) => void;

const fnNamed = (name: string) => findFunction(name)!;
const value = (name: string, raw: readonly RawArg[]): number | undefined => single(evaluateValid(fnNamed(name), raw));

/** Sun altitude at a positional call's instant (same date-time, place and convention). */
function altitudeAt(dateTime: RawArg, lat: number, lon: number, utc: number, convention: string): number | undefined {
  return value('SUNALTITUDE', [dateTime, lat, lon, utc, null, null, null, null, convention]);
}

/** A deeper device never lets more sun onto the glass. */
function deeperNeverRaises(fn: FunctionDescriptor, raw: readonly RawArg[], a: Args, names: readonly string[], bump: number): void {
  const base = single(evaluateValid(fn, raw));
  if (base === undefined) return;
  for (const n of names) {
    const deeper = Math.min(100, numOr(a[n] as number, 0) + bump * 2);
    const out = again(fn, raw, n, deeper);
    if (!out) continue;
    const v = single(out)!;
    must(v <= base + 1e-9, `${fn.name}: ${n} ${a[n]} → ${deeper} raised the sunlit fraction ${base} → ${v}`);
  }
}

const SUN_FUNCTIONS_OF = (raw: readonly RawArg[]) => raw;

const PHYSICS: Record<string, Physics> = {
  SUNZENITH: (_f, _a, raw, out) => {
    const alt = value('SUNALTITUDE', SUN_FUNCTIONS_OF(raw))!;
    must(near(single(out)!, 90 - alt, 1e-9), `SUNZENITH ${single(out)} is not 90 − altitude ${alt}`);
  },
  SOLARTIME: (_f, _a, _raw, out) => must(single(out)! < 24, 'SOLARTIME reached 24'),
  SUNAZIMUTH: (_f, _a, _raw, out) => must(single(out)! < 360, 'SUNAZIMUTH reached 360'),
  SUNRISE: (_f, a, _raw, out) => eventOnDay('SUNRISE', a, out),
  SOLARNOON: (_f, a, _raw, out) => eventOnDay('SOLARNOON', a, out),
  SUNSET: (_f, a, _raw, out) => eventOnDay('SUNSET', a, out),
  PROFILEANGLE: (_f, a, _raw, out) => {
    const v = single(out);
    if (v === undefined) return;
    // tan Ω = tan β / cos γ with |γ| < 90°: the profile angle is at least as steep as the altitude
    const beta = a.sunAltitude as number;
    must(beta >= 0 ? v >= beta - 1e-9 : v <= beta + 1e-9, `PROFILEANGLE ${v} less steep than the altitude ${beta}`);
  },
  INCIDENCEANGLE: (_f, a, _raw, out) => {
    // a horizontal surface sees the sun at 90° − altitude
    if (a.surfaceTilt === 0) must(near(single(out)!, 90 - (a.sunAltitude as number), 1e-9), 'INCIDENCEANGLE on a horizontal surface is not 90 − altitude');
  },
  OVERHANGSUNLIT: (fn, a, raw, out, c) => {
    sunDownGivesZero(fn, a, out);
    deeperNeverRaises(fn, raw, a, ['overhangProjection'], c.bump);
  },
  FINSUNLIT: (fn, a, raw, out, c) => {
    sunDownGivesZero(fn, a, out);
    deeperNeverRaises(fn, raw, a, ['leftFinProjection', 'rightFinProjection'], c.bump);
  },
  SUNLITFRACTION: (fn, a, raw, out, c) => {
    sunDownGivesZero(fn, a, out);
    deeperNeverRaises(fn, raw, a, ['overhangProjection', 'leftFinProjection', 'rightFinProjection', 'revealDepth'], c.bump);
  },
  WINDOWSUNLIT: (fn, a, raw, out, c) => {
    sunDownGivesZero(fn, a, out);
    const base = single(out)!;
    const depth = Number(fieldIn(raw[0], 'overhangProjection') ?? 0);
    const deeper = windowWith(raw[0], 'overhangProjection', Math.min(100, (Number.isFinite(depth) ? depth : 0) + c.bump * 2));
    const o = again(fn, raw, 'window', deeper);
    if (o) must(single(o)! <= base + 1e-9, `WINDOWSUNLIT: a deeper overhang raised the sunlit fraction ${base} → ${single(o)}`);
  },
  VIEWFACTORS: (fn, a, raw, out, c) => {
    viewRow(fn.name, out[0]);
    const deeper = Math.min(100, (a.overhangProjection as number) + c.bump * 2);
    const o = again(fn, raw, 'overhangProjection', deeper);
    // within the declared numerical error of 0.002 on each of the two values
    if (o) must((o[0][0] as number) <= (out[0][0] as number) + 0.004, `VIEWFACTORS: a deeper overhang raised the sky view factor ${out[0][0]} → ${o[0][0]}`);
  },
  WINDOWVIEWFACTORS: (fn, a, _raw, out) => viewRow(fn.name, out[a.headers ? 1 : 0]),
  SHADOWDEPTH: (fn, a, raw, out) => shadowScales(fn, a, raw, out),
  SHADOWWIDTH: (fn, a, raw, out) => shadowScales(fn, a, raw, out),
  AIRMASS: (fn, a, raw, out, c) => {
    const higher = Math.min(90, (a.sunAltitude as number) + c.bump * 10);
    const o = again(fn, raw, 'sunAltitude', higher)!;
    must(single(o)! <= single(out)! + 1e-9, `AIRMASS: a higher sun gave more air mass ${single(out)} → ${single(o)}`);
  },
  CLEARSKYGHI: (_f, a, raw, out) => {
    const dni = value('CLEARSKYDNI', raw)!;
    const dhi = value('CLEARSKYDHI', raw)!;
    const alt = a.sunAltitude as number;
    must(near(single(out)!, alt > 0 ? dni * Math.sin((alt * Math.PI) / 180) + dhi : 0, 1e-9), `CLEARSKYGHI ${single(out)} ≠ DNI sin h + DHI (${dni}, ${dhi}, ${alt})`);
    if (alt <= 0) must(dni === 0 && dhi === 0, 'clear sky light at night');
  },
  CLEARSKYLINKE: (_f, a, _raw, out) => {
    const [dni, dhi, ghi] = out[0] as number[];
    const alt = a.sunAltitude as number;
    must(dni >= 0 && dhi >= 0 && ghi >= 0, 'CLEARSKYLINKE: negative irradiance');
    if (alt <= 0) must(dni === 0 && dhi === 0 && ghi === 0, 'CLEARSKYLINKE: light at night');
    else must(Math.abs(dni * Math.sin((alt * Math.PI) / 180) + dhi - ghi) <= 1e-6 * Math.max(1, ghi), `CLEARSKYLINKE: DNI sin h + DHI ≠ GHI (${dni}, ${dhi}, ${ghi})`);
  },
  SPLITGLOBAL: (_f, a, _raw, out) => {
    const [dni, dhi, kt] = out[0] as number[];
    const ghi = a.ghi as number;
    const alt = a.sunAltitude as number;
    must(dni >= 0 && dhi >= 0 && kt >= 0, 'SPLITGLOBAL: a negative part');
    must(dhi <= ghi + 1e-9, `SPLITGLOBAL: diffuse ${dhi} above global ${ghi}`);
    if (alt <= 0) must(dni === 0 && near(dhi, ghi, 1e-12), 'SPLITGLOBAL: the sun down must leave all of the global diffuse');
  },
  WINDOWIRRADIANCEPARTS: (_f, a, raw, out) => {
    const [beam, sky, ground, total, incidence] = out[0] as number[];
    must(beam >= 0 && sky >= 0 && ground >= 0, 'WINDOWIRRADIANCEPARTS: a negative part');
    must(near(beam + sky + ground, total, 1e-12), `beam + sky + ground ${beam + sky + ground} ≠ total ${total}`);
    must(incidence >= 0 && incidence <= 180, `incidence ${incidence} outside 0…180`);
    // nothing direct with the sun down or behind the window (a sun 1e-300° up gives a beam of about 1e-300)
    if ((a.sunAltitude as number) <= 0 || incidence >= 90) must(beam <= 1e-9, `beam ${beam} with the sun down or behind the window`);
    must(value('WINDOWIRRADIANCE', raw) === total, 'WINDOWIRRADIANCE is not the total of WINDOWIRRADIANCEPARTS');
  },
  VERTICALDIFFUSERATIO: (_f, a, _raw, out) => {
    const r = a.skyViewRatio as number;
    must(single(out)! >= 0.45 * r - 1e-12 && single(out)! <= 1.3 * r + 1e-12, 'VERTICALDIFFUSERATIO outside 0.45…1.3 × skyViewRatio');
  },
  SHGCANGLE: (fn, a, raw, out, c) => {
    const v = single(out)!;
    must(v <= (a.shgc as number) + 1e-12, `SHGCANGLE ${v} above the rating ${a.shgc}`);
    if ((a.incidence as number) >= 90) must(v === 0, 'SHGCANGLE not 0 from 90°');
    const steeper = Math.min(180, (a.incidence as number) + c.bump * 30);
    must(single(again(fn, raw, 'incidence', steeper)!)! <= v + 1e-12, 'SHGCANGLE rose with the incidence angle');
  },
  SHGCDIFFUSE: (_f, a, _raw, out) => must(single(out)! <= (a.shgc as number) + 1e-12, 'diffuse SHGC above the rating'),
  SHGCLOOKUP: (_f, a, _raw, out) => {
    const v = single(out)!;
    const values = a.shgcValues as number[];
    const angles = a.shgcAngles as number[];
    must(v <= Math.max(...values) + 1e-12, `SHGCLOOKUP ${v} above the table's maximum ${Math.max(...values)}`);
    if ((a.incidence as number) >= 90) must(v === 0, 'SHGCLOOKUP not 0 from 90°');
    const k = angles.indexOf(a.incidence as number);
    if (k >= 0 && angles[k] < 90) must(near(v, values[k], 1e-12), `SHGCLOOKUP at a table angle ${angles[k]} gave ${v}, not ${values[k]}`);
  },
  SHGCDIFFUSELOOKUP: (_f, a, _raw, out) => {
    const max = Math.max(...(a.shgcValues as number[]));
    must(single(out)! <= max + 1e-12, `hemispherical SHGC ${single(out)} above the table's maximum ${max}`);
  },
  GLASSAREA: (_f, a, _raw, out) => {
    const wh = (a.width as number) * (a.height as number);
    must(near(single(out)!, wh * (1 - (a.frameFraction as number)), 1e-12) && single(out)! <= wh, 'GLASSAREA is not width × height × (1 − frame)');
  },
  COOLINGLOAD: (_f, a, _raw, out) => {
    // the radiant time series keeps the day's total
    const gains = a.gains as number[];
    const sumG = gains.reduce((s, x) => s + x, 0);
    const load = a.showGain === true ? 1 : 0; // with showGain the gain comes first, as given
    if (load === 1) must(out.every((r, i) => r[0] === gains[i]), 'COOLINGLOAD: the gain column is not the gains given');
    const sumQ = out.reduce((s, r) => s + (r[load] as number), 0);
    must(Math.abs(sumG - sumQ) <= 1e-6 * Math.max(1, ...gains.map(Math.abs)) * 24, `cooling load total ${sumQ} ≠ gain total ${sumG}`);
  },
  WINDOWGAIN: (fn, a, raw, out, c) => oneHourGain(fn, a, raw, out, c, false),
  SOLARGAIN: (fn, a, raw, out, c) => oneHourGain(fn, a, raw, out, c, true),
  GAINSTEPS: (fn, a, raw, out) => stepsAddUp(fn, a, raw, out, 'WINDOWGAIN'),
  SOLARGAINSTEPS: (fn, a, raw, out) => stepsAddUp(fn, a, raw, out, 'SOLARGAIN'),
  SOLARGAINPEAKS: (fn, a, _raw, out) => peaksSane(fn, a, out, ((a.window as { values: ReadonlyMap<string, unknown> }).values.get('timeConvention') as string) ?? 'hourEnding'),
  PEAKGAINS: (fn, a, _raw, out) => peaksSane(fn, a, out, a.timeConvention as string),
  SOLARGAINYEAR: (fn, a, _raw, out) => yearSane(fn, a, out, a.quantities as string[]),
  WINDOWYEAR: (fn, a, _raw, out) => yearSane(fn, a, out, a.quantity as string[]),
};

function eventOnDay(name: string, a: Args, out: OutTable): void {
  let v = single(out);
  if (v === undefined) {
    must(name !== 'SOLARNOON', 'SOLARNOON must always have a value');
    return;
  }
  // on the local day of the clock (a.date is read as a 1900-system serial; the result is in the clock's system)
  const clock = a.clock as ClockFields | undefined;
  v += clock?.dateSystem === 1904 ? 1462 : 0;
  const day = Math.floor(a.date as number);
  // on the local day, to a minute (the SPA's events are worked out for the day's 0 h UT and can land
  // a second outside a local day whose transit falls at midnight, near the date line)
  const minute = 1 / 1440;
  // A clock day of 23 hours may hold no transit (solar noon near midnight): SOLARNOON then gives the nearest, up to the shift outside.
  const slack = name === 'SOLARNOON' && clock?.rule !== undefined ? clock.rule.shift / 24 : 0;
  must(v >= day - minute - slack && v <= day + 1 + minute + slack, `${name} ${v} is not on the local day ${day}`);
}

function sunDownGivesZero(fn: FunctionDescriptor, a: Args, out: OutTable): void {
  if ((a.sunAltitude as number) <= 0) must(single(out) === 0, `${fn.name}: ${single(out)} with the sun down`);
}

function viewRow(name: string, row: OutCell[]): void {
  const [sky, ground, skyRatio, groundRatio] = row as number[];
  must(near(skyRatio, sky / 0.5, 1e-9) && near(groundRatio, ground / 0.5, 1e-9), `${name}: the ratios are not the view factors over ½`);
}

function shadowScales(fn: FunctionDescriptor, a: Args, raw: readonly RawArg[], out: OutTable): void {
  const v = single(out);
  const twice = again(fn, raw, 'projection', Math.min(100, (a.projection as number) * 2))!;
  if (v === undefined) {
    must((a.sunAltitude as number) <= 0 || Math.abs(value('SHADOWANGLE', [a.sunAzimuth as number, a.surfaceAzimuth as number])!) >= 90, `${fn.name}: #N/A with the sun up in front of the wall`);
    return;
  }
  if ((a.projection as number) <= 50) must(near(single(twice)!, 2 * v, 1e-9), `${fn.name}: twice the projection did not double the shadow`);
}

/** One hour of a window: nothing at night under a clear sky; more glass or a higher SHGC never lowers it. */
function oneHourGain(fn: FunctionDescriptor, a: Args, raw: readonly RawArg[], out: OutTable, c: ValidCase, range: boolean): void {
  const gain = single(out)!;
  must(gain >= 0, `${fn.name}: negative gain ${gain}`);
  const given = a.dni !== undefined;
  const w = range ? (a.window as { values: ReadonlyMap<string, unknown> }).values : undefined;
  // (a window on daylight saving reads its date-times on the clock: its night is checked by the steps' own sun)
  if (!given && c.site && !w?.has('daylightSavingStart') && (a.clock as ClockFields | undefined)?.rule === undefined) {
    const convention = range ? ((w!.get('timeConvention') as string) ?? 'hourEnding') : (a.timeConvention as string);
    const alt = altitudeAt(a.dateTime as number, c.site.latitude, c.site.longitude, c.site.utcOffset, convention);
    if (alt !== undefined && alt < -0.9) must(gain === 0, `${fn.name}: gain ${gain} at night (sun ${alt}°) under a clear sky`);
  }
  // a larger glass area never lowers the gain: less frame in the same opening
  if (range) {
    const frame = Number(fieldIn(raw[0], 'frameFraction') ?? 0);
    if (Number.isFinite(frame) && frame > 0) {
      const o = again(fn, raw, 'window', windowWith(raw[0], 'frameFraction', frame * c.bump));
      if (o) must(single(o)! >= gain - 1e-9 * Math.max(1, gain), `${fn.name}: less frame (more glass) lowered the gain ${gain} → ${single(o)}`);
    }
  } else {
    const frame = a.frameFraction as number;
    if (frame > 0) {
      const o = again(fn, raw, 'frameFraction', frame * c.bump);
      if (o) must(single(o)! >= gain - 1e-9 * Math.max(1, gain), `${fn.name}: less frame (more glass) lowered the gain ${gain} → ${single(o)}`);
    }
    const shgc = a.shgc as number;
    const o = again(fn, raw, 'shgc', shgc + (1 - shgc) * c.bump);
    if (o) must(single(o)! >= gain - 1e-9 * Math.max(1, gain), `${fn.name}: a higher SHGC lowered the gain ${gain} → ${single(o)}`);
  }
}

/** The steps add up: beam + sky + ground gains = the window's gain = the one-hour function; radiant + convective = gain. */
function stepsAddUp(fn: FunctionDescriptor, a: Args, raw: readonly RawArg[], out: OutTable, gainFn: string): void {
  const rows = out.slice(a.headers ? 1 : 0);
  const step = (q: string) => {
    const r = rows.find((x) => x[1] === q);
    must(r !== undefined, `${fn.name}: no step "${q}"`);
    return r![2] as number;
  };
  const total = step('window solar gain');
  must(near(step('beam gain') + step('sky-diffuse gain') + step('ground-reflected gain'), total, 1e-12), `${fn.name}: beam + sky + ground gains ≠ the window's gain`);
  must(near(step('radiant part') + step('convective part'), total, 1e-12), `${fn.name}: radiant + convective ≠ the window's gain`);
  must(step('beam on the window') >= 0, `${fn.name}: negative beam`);
  must(step('sunlit fraction') >= 0 && step('sunlit fraction') <= 1, `${fn.name}: sunlit fraction outside 0…1`);
  // the one-hour function's arguments, lined up by name (GAINSTEPS has radiantFraction where WINDOWGAIN's shading starts)
  const byName = new Map(fn.params.map((p, k) => [p.name, raw[k]]));
  const gainRaw = fnNamed(gainFn).params.map((p) => byName.get(p.name) ?? null);
  must(value(gainFn, gainRaw) === total, `${fn.name}: its gain ${total} is not ${gainFn}'s ${value(gainFn, gainRaw)}`);
}

function peaksSane(fn: FunctionDescriptor, a: Args, out: OutTable, convention: string): void {
  const rows = out.slice(a.headers ? 1 : 0);
  rows.forEach((r, m) => {
    must(r[0] === m + 1, `${fn.name}: row ${m + 1} is month ${r[0]}`);
    const hour = r[1] as number;
    must(Number.isInteger(hour) && (convention === 'instant' ? hour >= 0 && hour <= 23 : hour >= 1 && hour <= 24), `${fn.name}: peak hour ${hour} (${convention})`);
    must((r[2] as number) >= 0, `${fn.name}: negative peak gain`);
    if (r.length === 5) {
      const lh = r[3] as number;
      must(Number.isInteger(lh) && lh >= 0 && lh <= 24, `${fn.name}: peak load hour ${lh}`);
      // without conduction every gain is ≥ 0, and so is the radiant time series' load
      if (!hasConduction(a)) must((r[4] as number) >= 0, `${fn.name}: negative peak load from non-negative gains`);
    }
  });
}

function hasConduction(a: Args): boolean {
  const w = a.window as { values: ReadonlyMap<string, unknown> } | undefined;
  return w?.values.has('uValue') === true;
}

const YEAR_BOUNDS: Record<string, [number, number]> = {
  gain: [0, Infinity],
  gainBeam: [0, Infinity],
  gainDiffuse: [0, Infinity],
  // conduction and the loads it enters go below 0 when it is colder outside than in
  conduction: [-Infinity, Infinity],
  load: [-Infinity, Infinity],
  loadBeam: [0, Infinity],
  loadDiffuse: [0, Infinity],
  loadConduction: [-Infinity, Infinity],
  clockStamp: [MIN_SERIAL, MAX_SERIAL_EXCLUSIVE],
  radiant: [0, Infinity],
  convective: [0, Infinity],
  beam: [0, Infinity],
  sky: [0, Infinity],
  ground: [0, Infinity],
  skyUnshaded: [0, Infinity],
  groundUnshaded: [0, Infinity],
  dni: [0, Infinity],
  dhi: [0, Infinity],
  sunlitFraction: [0, 1],
  skyViewRatio: [0, 1],
  groundViewRatio: [0, 1],
  horizonShare: [0, 1],
  shgc: [0, 1],
  incidence: [0, 180],
  profileAngle: [-180, 180], // |Ω| ≥ 90 with the sun in or behind the wall plane (docs/conventions.md)
  sunAltitude: [-90, 90],
  sunAzimuth: [0, 360],
  stamp: [MIN_SERIAL, MAX_SERIAL_EXCLUSIVE],
};
/** The daylight-saving shift [h] a year call runs under (the window's rule or the clock's), 0 without one. */
function ruleShift(a: Args): number {
  const clock = a.clock as ClockFields | undefined;
  if (clock?.rule) return clock.rule.shift;
  const values = (a.window as { values?: ReadonlyMap<string, unknown> } | undefined)?.values;
  if (values?.has('daylightSavingStart')) return (values.get('daylightSavingShift') as number | undefined) ?? 1;
  return 0;
}

const ALIAS: Record<string, string> = { sunlit: 'sunlitFraction', profile: 'profileAngle', altitude: 'sunAltitude', azimuth: 'sunAzimuth', skyview: 'skyViewRatio', groundview: 'groundViewRatio' };

function yearSane(fn: FunctionDescriptor, a: Args, out: OutTable, quantities: string[]): void {
  const q = quantities.map((x) => ALIAS[x] ?? x);
  const rows = out.slice(a.headers ? 1 : 0);
  if (a.headers) must(JSON.stringify(out[0]) === JSON.stringify(quantities), `${fn.name}: header row ${JSON.stringify(out[0])}`);
  q.forEach((name, k) => {
    const [lo, hi] = YEAR_BOUNDS[name];
    must(lo !== undefined, `${fn.name}: no bounds for quantity ${name}`);
    const stamp = name === 'stamp';
    const shift = stamp ? ruleShift(a) : 0;
    let first = true;
    let prev = 0;
    // (messages built only on a failure: these run once per hour of the year)
    for (const r of rows) {
      const v = r[k];
      if (typeof v !== 'number') continue;
      if (!(v >= lo - 1e-9 && v <= hi + 1e-9)) must(false, `${fn.name}: ${name} ${v} outside ${lo}…${hi}`);
      if (stamp) {
        // on the clock: one hour apart, or one hour ± the shift where the clocks change
        const step = v - prev;
        if (!(first || near(step, 1 / 24, 1e-6) || (shift > 0 && (near(step, (1 + shift) / 24, 1e-6) || near(step, (1 - shift) / 24, 1e-6))))) must(false, `${fn.name}: stamps ${prev} → ${v} not one hour apart (or an hour ± the daylight-saving shift)`);
        prev = v;
        first = false;
      }
    }
  });
  // no gain with the sun down under the window's clear sky
  const g = q.indexOf('gain');
  const s = q.indexOf('sunAltitude');
  if (g >= 0 && s >= 0 && a.dni === undefined) {
    for (const r of rows) if (typeof r[s] === 'number' && (r[s] as number) <= 0 && r[g] !== 0) must(false, `${fn.name}: gain ${r[g]} with the sun at ${r[s]}° under a clear sky`);
  }
}

// ---------------------------------------------------------------------------------------------
// The property of one function

export interface Counts {
  runs: number;
  valid: number;
  refused: number;
  invalid: number;
}

/** Counts of this worker's runs by function (for the report and the assertions). */
export const COUNTS = new Map<string, Counts>();

type Drawn = { kind: 'valid'; c: ValidCase } | { kind: 'invalid'; c: ValidCase; k: number; bad: RawArg };

/** The runs of one function: valid cases ({@link validShareOf} of them) and one-invalid-argument cases. */
export function runFunction(fn: FunctionDescriptor, runs: number, file: string): Counts {
  const counts: Counts = { runs: 0, valid: 0, refused: 0, invalid: 0 };
  COUNTS.set(fn.name, counts);
  const withClock = fn.params.some((p) => p.kind === 'clock' || p.kind === 'window');
  const badable = fn.params.map((p, k) => ({ k, arb: invalidArb(p, withClock) })).filter((x) => x.arb !== undefined);
  const valid = validCaseArb(fn);
  const invalid: fc.Arbitrary<Drawn> = fc
    .tuple(valid, fc.constantFrom(...badable))
    .chain(([c, { k, arb }]) => arb!.map((bad) => ({ kind: 'invalid' as const, c, k, bad })));
  const validWeight = Math.round(validShareOf(fn.name) * 1000);
  const drawn: fc.Arbitrary<Drawn> = fc.oneof({ weight: validWeight, arbitrary: valid.map((c) => ({ kind: 'valid' as const, c })) }, { weight: 1000 - validWeight, arbitrary: invalid });
  const property = fc.property(drawn, (d) => {
    counts.runs++;
    if (d.kind === 'invalid') {
      const err = errorOf(fn, withAt(d.c.raw, d.k, d.bad));
      must(err instanceof SunpaneError, `${fn.name}: invalid ${fn.params[d.k].name} ${JSON.stringify(d.bad)} gave no error`);
      must(err!.argument.startsWith(fn.params[d.k].name), `${fn.name}: invalid ${fn.params[d.k].name} gave an error naming "${err!.argument}"`);
      counts.invalid++;
      return;
    }
    const raw = d.c.raw;
    let args: Args;
    try {
      args = readArgs(fn, raw);
    } catch (err) {
      throw new Error(`${fn.name}: generated valid arguments could not be read: ${(err as Error).message}`);
    }
    const reason = fn.refuses?.(args);
    if (reason !== undefined) {
      must(errorOf(fn, raw) instanceof SunpaneError, `${fn.name}: refuses says "${reason}" but the call gave no error`);
      counts.refused++;
      return;
    }
    let out: OutTable;
    try {
      out = evaluateValid(fn, raw);
    } catch (err) {
      // A wide draw of the hour's dni/dhi past what any sky gives at that sun: refused, in its own words.
      if (d.c.wide && /^\S+: valid arguments gave an error: (dni|dhi) = .* the physically possible limit \(Long & Shi 2008\)/.test((err as Error).message)) {
        counts.refused++;
        return;
      }
      throw err;
    }
    checkShape(fn, args, raw, out);
    checkRange(fn, args, out);
    PHYSICS[fn.name]?.(fn, args, raw, out, d.c);
    counts.valid++;
  });
  try {
    fc.assert(property, { numRuns: runs, seed: SEED, endOnFailure: true, includeErrorInReport: true });
  } catch (err) {
    const replay = `FUZZ_SEED=${SEED} FUZZ_RUNS=${runs} npx jest ${file} -t ${fn.name}`;
    throw new Error(`${fn.name}: the property failed with seed ${SEED} (replay: ${replay})\n${(err as Error).message}`);
  }
  return counts;
}

/** Registers one jest test per function of a part of the fuzz. */
export function fuzzPart(part: FuzzPart, file: string): void {
  const fns = FUNCTIONS.filter((f) => partOf(f) === part);
  test(`${part}: the fuzz covers ${fns.length} functions`, () => {
    expect(fns.length).toBeGreaterThan(0);
  });
  for (const fn of fns) {
    const runs = runsOf();
    const floor = Math.ceil(runs * validShareOf(fn.name) * MIN_VALID_SHARE);
    test(`${fn.name}: ${runs.toLocaleString('en-US')} runs (seed ${SEED}), at least ${floor.toLocaleString('en-US')} valid evaluations checked`, () => {
      const c = runFunction(fn, runs, file);
      if (process.env.FUZZ_REPORT) process.stdout.write(`fuzz ${fn.name}: ${c.runs} runs, ${c.valid} valid evaluations, ${c.refused} refused combinations, ${c.invalid} invalid arguments\n`);
      expect(c.runs).toBe(runs);
      expect(c.valid).toBeGreaterThanOrEqual(floor);
      expect(c.invalid).toBeGreaterThan(0);
    }, 20 * 60_000);
  }
}

/**
 * Every message the runs of this file provoked, in the user's words: no path inside the program
 * (`site.latitude`, `glazing.angleTable.values`, `shading.overhang.projection`, `weather.tauB`), never
 * "internal error", and every function of the part gave some (its invalid-argument runs alone give
 * one per run), so no function's messages go unread. Registered last in a file (jest runs a file's
 * tests in order).
 */
export function messagesInUsersWords(part?: FuzzPart): void {
  test('every message the fuzzing provoked names arguments as the signatures do, with no internal path', () => {
    expect(MESSAGES.length).toBeGreaterThan(0);
    if (part !== undefined) {
      const silent = FUNCTIONS.filter((f) => partOf(f) === part && !MESSAGES.some((m) => m.fn === f.name)).map((f) => f.name);
      expect(silent).toEqual([]);
    }
    const internal = /\b(site|glazing|shading|weather|angleTable|overhang|leftFin|rightFin)\.[a-zA-Z]|internal error|undefined|\[object |is not allowed: is /;
    const bad = [...new Set(MESSAGES.map((m) => `${m.fn}: ${m.message}`))].filter((m) => internal.test(m));
    expect(bad).toEqual([]);
  });
}

/** The files of the fuzz, by part (each registers its part with {@link fuzzPart}). */
export const FUZZ_FILES: Readonly<Record<FuzzPart, string>> = {
  sun: 'tests/registry/fuzz-sun.test.ts',
  shading: 'tests/registry/fuzz-shading.test.ts',
  skyGlazing: 'tests/registry/fuzz-sky-glazing.test.ts',
  gainHour: 'tests/registry/fuzz-gain-hour.test.ts',
  gainDays: 'tests/registry/fuzz-gain-days.test.ts',
};

/** Every registered function is fuzzed: each lies in exactly one part, and each part has its file. */
export function coverageTests(): void {
  test('the registry lists functions with unique names of uppercase letters', () => {
    expect(FUNCTIONS.length).toBeGreaterThan(0);
    const names = FUNCTIONS.map((f) => f.name);
    expect(new Set(names).size).toBe(names.length);
    for (const n of names) expect(n).toMatch(/^[A-Z]+$/);
  });
  test('every registered function is in one part of the fuzz, every part has its file, every spill its declared size', () => {
    for (const fn of FUNCTIONS) {
      const part = partOf(fn);
      expect(FUZZ_FILES[part]).toBeDefined();
      const text = readFileSync(FUZZ_FILES[part], 'utf8');
      expect(text).toContain(`fuzzPart('${part}'`);
      if (fn.result.shape === 'spill') expect(Object.keys(SPILL_SHAPE)).toContain(fn.name);
    }
  });
}
