/**
 * Valid and invalid arguments for ANY registered function, derived from its descriptor (ranges,
 * defaults, choices, list lengths), so the add-in tests cover functions added later with no extra
 * work. A formula-table row for the function, when there is one, is preferred as the valid call.
 */
import { SunpaneError } from '../../src/core/common/errors';
import { applyFunction } from '../../src/registry/evaluate';
import { isOptional } from '../../src/registry';
import type { FunctionDescriptor, OutTable, ParamDescriptor } from '../../src/registry/types';
import { type Cell, FORMULAS, type FormulaArg, serialOf } from '../fixtures/formulas';

/** A mid-year, midday local date-time: valid for every dateTime parameter. */
const SAMPLE_SERIAL = serialOf(2024, 6, 21, 12, 30);

function bounds(p: ParamDescriptor): [number, number] {
  const lo = p.min ?? (p.max !== undefined ? Math.min(0, p.max - 10) : 0);
  const hi = p.max ?? Math.max(lo + 10, 10);
  return [lo, hi];
}

function roundFor(p: ParamDescriptor, x: number): number {
  return p.integer ? Math.round(x) : x;
}

/** A valid single value of a broadcast parameter at fraction `t` of its range (0 < t < 1). */
export function sampleValue(p: ParamDescriptor, t = 0.5): FormulaArg {
  switch (p.kind) {
    case 'number': {
      const [lo, hi] = bounds(p);
      return roundFor(p, lo + t * (hi - lo));
    }
    case 'dateTime':
      return SAMPLE_SERIAL + Math.round((t - 0.5) * 60);
    case 'choice': {
      const choices = p.choices ?? [];
      return t === 0.5 && typeof p.default === 'string' ? p.default : choices[Math.floor(t * choices.length) % Math.max(1, choices.length)];
    }
    case 'flag':
      return t < 0.5;
    case 'text':
      return `text ${t}`;
    case 'window':
      // A window as a block of fields beside their values: enough for every window function.
      return [
        ['latitude', 40],
        ['longitude', -105],
        ['utcOffset', -7],
        ['surfaceAzimuth', Math.round(90 + t * 180)],
        ['width', 1.5],
        ['height', 1.2],
        ['shgc', 0.4],
        ['tauB', 0.4],
        ['tauD', 2.3],
        ['year', 2024],
      ];
    case 'clock':
      // A workbook's clock: a daylight-saving rule by its 2024 dates (the last Sundays of March and October).
      return [
        ['daylightSavingStart', '2024-03-31T02:00'],
        ['daylightSavingEnd', '2024-10-27T03:00'],
        ['daylightSavingShift', 1],
      ];
    case 'choiceList':
      return [[(p.choices ?? [])[0]]];
    case 'numberList': {
      const n = p.length?.exact ?? p.length?.oneOf?.[0] ?? p.length?.min ?? 3;
      const [lo, hi] = bounds(p);
      if (p.ascending) return [Array.from({ length: n }, (_, i) => roundFor(p, lo + ((i + 1) / (n + 1)) * (hi - lo)))];
      // Equal shares: valid for lists that must sum to 1 (radiant time factors) and for plain lists.
      return Array.from({ length: n }, () => [Math.min(hi, Math.max(lo, 1 / n))]);
    }
    default:
      throw new Error(`sample-args: no generic value for the ${p.kind} parameter ${p.name}: add a row for this function to tests/fixtures/formulas.ts`);
  }
}

function popcount(m: number): number {
  let n = 0;
  for (let x = m; x; x >>= 1) n += x & 1;
  return n;
}

/** Does the call give at least one cell without an input error? */
function isUsable(fn: FunctionDescriptor, args: FormulaArg[]): boolean {
  let out: OutTable;
  try {
    out = applyFunction(fn, args);
  } catch (err) {
    if (err instanceof SunpaneError) return false;
    throw err;
  }
  return out.every((r) => r.every((c) => !(c instanceof SunpaneError)));
}

/**
 * Valid arguments for one call of `fn`: a formula-table row without an expected error if there is
 * one; else required parameters at mid-range, defaults as such, optional parameters without a
 * default left blank — or, when the function then refuses (e.g. it needs one of two optional
 * inputs), given mid-range values too.
 */
export function validArgs(fn: FunctionDescriptor): FormulaArg[] {
  const fromTable = FORMULAS.find((r) => r.fn === fn.name && 'values' in r.expect && r.args.every((a) => !Array.isArray(a)));
  if (fromTable) return fromTable.args.slice();
  // Optional parameters without a default: try leaving them all blank, then giving mid-range values
  // to ever larger subsets (a function may need one of two alternative inputs).
  const open = fn.params.map((p, k) => (p.default === undefined && isOptional(p) ? k : -1)).filter((k) => k >= 0).slice(0, 8);
  const subsets = Array.from({ length: 2 ** open.length }, (_, m) => m).sort((a, b) => popcount(a) - popcount(b) || a - b);
  for (const mask of subsets) {
    const given = new Set(open.filter((_, i) => mask & (1 << i)));
    const args = fn.params.map((p, k) => (p.default !== undefined ? (p.default as FormulaArg) : isOptional(p) && !given.has(k) ? null : sampleValue(p)));
    if (isUsable(fn, args)) return args;
  }
  throw new Error(`sample-args: cannot derive a valid call of ${fn.name} from its descriptor; add a row to tests/fixtures/formulas.ts`);
}

/** Rows ↔ columns of a range (a list given as a column instead of a row). */
export function transpose(m: readonly Cell[][]): Cell[][] {
  const width = m.reduce((w, r) => Math.max(w, r.length), 0);
  return Array.from({ length: width }, (_, j) => m.map((r) => r[j] ?? null));
}

/** Index of the first broadcast parameter that has a value in `args` (for the range call). */
export function firstBroadcastIndex(fn: FunctionDescriptor, args: readonly FormulaArg[]): number {
  // A window's range is its fields, not a range of values (several windows are checked in tests/fixtures/formulas.ts).
  return fn.params.findIndex((p, k) => p.kind !== 'numberList' && p.kind !== 'choiceList' && p.kind !== 'table' && p.kind !== 'window' && p.kind !== 'clock' && args[k] !== null && args[k] !== undefined);
}

/** A second valid value for a broadcast parameter, different from `v` where the range allows. */
export function otherValue(p: ParamDescriptor, v: FormulaArg): FormulaArg {
  for (const t of [0.25, 0.75, 0.1, 0.9]) {
    const w = sampleValue(p, t);
    if (w !== v) return w;
  }
  return v;
}

/**
 * One invalid argument: the first number parameter with a bound gets a value beyond it; else a
 * choice gets an unknown text; else a date-time gets a text that is not a date.
 */
export function badArgs(fn: FunctionDescriptor, valid: readonly FormulaArg[]): { args: FormulaArg[]; param: string } {
  const args = valid.slice();
  let k = fn.params.findIndex((p) => p.kind === 'number' && (p.max !== undefined || p.min !== undefined));
  if (k >= 0) {
    const p = fn.params[k];
    args[k] = p.max !== undefined ? p.max + Math.max(1, Math.abs(p.max)) : (p.min as number) - Math.max(1, Math.abs(p.min as number));
    return { args, param: p.name };
  }
  k = fn.params.findIndex((p) => p.kind === 'choice' || p.kind === 'dateTime');
  if (k >= 0) {
    args[k] = fn.params[k].kind === 'choice' ? 'no-such-choice' : 'not a date';
    return { args, param: fn.params[k].name };
  }
  k = fn.params.findIndex((p, i) => p.kind === 'numberList' && (p.max !== undefined || p.min !== undefined) && Array.isArray(args[i]));
  if (k >= 0) {
    const p = fn.params[k];
    const list = (args[k] as Cell[][]).map((r) => r.slice());
    list[0][0] = p.max !== undefined ? p.max + Math.max(1, Math.abs(p.max)) : (p.min as number) - Math.max(1, Math.abs(p.min as number));
    args[k] = list;
    return { args, param: p.name };
  }
  k = fn.params.findIndex((p, i) => p.kind === 'window' && Array.isArray(args[i]));
  if (k >= 0) {
    // A window field out of its range: only that window's result is an error.
    args[k] = (args[k] as Cell[][]).map((r) => (r[0] === 'shgc' ? ['shgc', 1.5] : r.slice()));
    return { args, param: fn.params[k].name };
  }
  throw new Error(`sample-args: ${fn.name} has no parameter to make invalid generically`);
}
