/**
 * Physically meaningless sizes through every function (the registry's property fuzz is in
 * tests/support/registryFuzz.ts and the other fuzz-*.test.ts files; docs/testing.md).
 */
import fc from 'fast-check';
import { SunpaneError } from '../../src/core/common/errors';
import { applyFunction } from '../../src/registry/evaluate';
import { FUNCTIONS } from '../../src/registry';
import { type GlossaryEntry, WINDOW_FIELDS } from '../../src/registry/glossary';
import { type FunctionDescriptor, NotAvailable, type OutTable, type ParamDescriptor, type RawArg } from '../../src/registry/types';
import { MESSAGES, readArgs, validCaseArb } from '../support/registryFuzz';

/**
 * Physically meaningless sizes: 1e-200 m in every length argument of every function, and in every
 * length field of a window range, gives either a finite result inside the declared bounds or a
 * message naming that argument, the value and the allowed range — never "internal error", NaN or a
 * thrown exception. The other arguments are valid random draws (fixed seed).
 */
describe('a size of 1e-200 m', () => {
  const TINY = 1e-200;
  const BASE_WINDOW: [string, number][] = [['latitude', 40], ['longitude', -105], ['utcOffset', -7], ['surfaceAzimuth', 180], ['width', 1.5], ['height', 1.2], ['shgc', 0.4], ['tauB', 0.4], ['tauD', 2.3], ['year', 2026]];
  const LENGTH_FIELDS = WINDOW_FIELDS.filter((f) => f.unit === 'm' && f.window!.cell === 'number');
  type Case = [string, string, FunctionDescriptor, number, GlossaryEntry | ParamDescriptor, RawArg];
  const cases: Case[] = FUNCTIONS.flatMap((fn) =>
    fn.params.flatMap((p, k): Case[] => {
      if (p.kind === 'number' && p.unit === 'm') return [[fn.name, p.name, fn, k, p, TINY]];
      if (p.kind !== 'window') return [];
      return LENGTH_FIELDS.map((f): Case => {
        // A gap or extension needs its device: give it one 0.5 m deep.
        const device = /^(overhang|leftFin|rightFin|fin)(?!Projection$)/.exec(f.name)?.[1];
        const rows: [string, number][] = [...BASE_WINDOW.filter(([n]) => n !== f.name), ...(device ? [[`${device}Projection`, 0.5] as [string, number]] : []), [f.name, TINY]];
        return [fn.name, `${p.name} ${f.name}`, fn, k, f, rows as RawArg];
      });
    }),
  );

  test('covers the length arguments and window fields', () => {
    expect(LENGTH_FIELDS.map((f) => f.name)).toEqual(expect.arrayContaining(['width', 'height', 'overhangProjection', 'finProjection', 'revealDepth']));
    expect(new Set(cases.map(([name]) => name)).size).toBeGreaterThan(10);
  });

  /**
   * The valid draws of a function (20 from the fixed seed, those not marked wide), drawn once per
   * function: every case of the function starts from the same draws, as it did when each case drew
   * them itself with the same seed.
   */
  const DRAWS = new Map<string, RawArg[][]>();
  const drawsOf = (fn: FunctionDescriptor): RawArg[][] => {
    let d = DRAWS.get(fn.name);
    if (d === undefined) {
      d = fc.sample(validCaseArb(fn), { numRuns: 20, seed: 20261203 }).filter((c) => !c.wide).map((c) => c.raw);
      DRAWS.set(fn.name, d);
    }
    return d;
  };

  test.each(cases)('%s %s', (_name, _label, fn, k, size, tinyArg) => {
    const belowRange = size.min !== undefined && (TINY < size.min || (TINY === size.min && size.exclusiveMin === true));
    const draws = drawsOf(fn).map((raw) => {
      const args = [...raw];
      args[k] = tinyArg;
      return args;
    });
    // The first usable draws in order (the first 2, or the first 1 of a spill or 5 of a value the
    // descriptor does not refuse), read one by one until enough are found.
    const wanted = belowRange ? 2 : fn.result.shape === 'spill' ? 1 : 5;
    const usable: RawArg[][] = [];
    for (const raw of draws) {
      if (usable.length >= wanted) break;
      if (!belowRange) {
        try {
          if (fn.refuses?.(readArgs(fn, raw)) !== undefined) continue;
        } catch {
          continue;
        }
      }
      usable.push(raw);
    }
    expect(usable.length).toBeGreaterThan(0);
    for (const raw of usable) {
      let out: OutTable;
      try {
        out = applyFunction(fn, raw);
      } catch (err) {
        if (!(err instanceof SunpaneError)) throw err;
        out = [[err]];
      }
      // A year's spill has tens of thousands of cells: each is checked with plain comparisons and
      // what fails is listed, one expect per call (an expect per cell was most of this file's time).
      const wrong: string[] = [];
      let more = 0;
      const note = (problem: string) => (wrong.length < 20 ? wrong.push(`${fn.name}: ${problem}`) : more++);
      for (const cell of out.flat()) {
        if (cell instanceof SunpaneError || cell instanceof NotAvailable) MESSAGES.push({ fn: fn.name, message: cell.message });
        if (belowRange) {
          if (!(cell instanceof SunpaneError)) {
            note(`${String(cell)} is no error`);
            continue;
          }
          if (!cell.argument.startsWith(fn.params[k].name)) note(`the error names ${cell.argument}, not ${fn.params[k].name}`);
          if (!cell.message.includes(size.name)) note(`the message does not name ${size.name}: ${cell.message}`);
          if (!/= 1e-200 is not allowed: must be a number (from|above) [\d.]+ (and up )?to [\d.]+ m/.test(cell.message)) note(`the message does not give the value and range: ${cell.message}`);
        } else if (cell instanceof SunpaneError) {
          throw new Error(`${fn.name}: ${size.name} = 1e-200 m (inside its range) gave an error: ${cell.message}`);
        } else if (typeof cell === 'number') {
          if (!Number.isFinite(cell)) note(`${cell} is not finite`);
          else if (fn.result.shape === 'value' && fn.result.min !== undefined && !(cell >= fn.result.min - 1e-9)) note(`${cell} is below the result's minimum ${fn.result.min}`);
          else if (fn.result.shape === 'value' && fn.result.max !== undefined && !(cell <= fn.result.max + 1e-9)) note(`${cell} is above the result's maximum ${fn.result.max}`);
        }
      }
      if (more > 0) wrong.push(`… and ${more} more`);
      expect(wrong).toEqual([]);
    }
  });
});

/** Every message these sizes provoked, in the user's words (as the fuzz files check theirs). */
test('every message a tiny size provoked names the argument, with no internal path', () => {
  expect(MESSAGES.length).toBeGreaterThan(0);
  const internal = /\b(site|glazing|shading|weather|angleTable|overhang|leftFin|rightFin)\.[a-zA-Z]|internal error|undefined|\[object |is not allowed: is /;
  expect([...new Set(MESSAGES.map((m) => `${m.fn}: ${m.message}`))].filter((m) => internal.test(m))).toEqual([]);
});
