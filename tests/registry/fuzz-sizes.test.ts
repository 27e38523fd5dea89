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

  test.each(cases)('%s %s', (_name, _label, fn, k, size, tinyArg) => {
    const belowRange = size.min !== undefined && (TINY < size.min || (TINY === size.min && size.exclusiveMin === true));
    const draws = fc.sample(validCaseArb(fn), { numRuns: 20, seed: 20261203 }).filter((c) => !c.wide).map((c) => {
      const args = [...c.raw];
      args[k] = tinyArg;
      return args;
    });
    const usable = belowRange
      ? draws.slice(0, 2)
      : draws
          .filter((raw) => {
            try {
              return fn.refuses?.(readArgs(fn, raw)) === undefined;
            } catch {
              return false;
            }
          })
          .slice(0, fn.result.shape === 'spill' ? 1 : 5);
    expect(usable.length).toBeGreaterThan(0);
    for (const raw of usable) {
      let out: OutTable;
      try {
        out = applyFunction(fn, raw);
      } catch (err) {
        if (!(err instanceof SunpaneError)) throw err;
        out = [[err]];
      }
      for (const cell of out.flat()) {
        if (cell instanceof SunpaneError || cell instanceof NotAvailable) MESSAGES.push({ fn: fn.name, message: cell.message });
        if (belowRange) {
          expect(cell).toBeInstanceOf(SunpaneError);
          const err = cell as SunpaneError;
          expect(err.argument.startsWith(fn.params[k].name)).toBe(true);
          expect(err.message).toContain(size.name);
          expect(err.message).toMatch(/= 1e-200 is not allowed: must be a number (from|above) [\d.]+ (and up )?to [\d.]+ m/);
        } else if (cell instanceof SunpaneError) {
          throw new Error(`${fn.name}: ${size.name} = 1e-200 m (inside its range) gave an error: ${cell.message}`);
        } else if (typeof cell === 'number') {
          expect(Number.isFinite(cell)).toBe(true);
          if (fn.result.shape === 'value' && fn.result.min !== undefined) expect(cell).toBeGreaterThanOrEqual(fn.result.min - 1e-9);
          if (fn.result.shape === 'value' && fn.result.max !== undefined) expect(cell).toBeLessThanOrEqual(fn.result.max + 1e-9);
        }
      }
    }
  });
});

/** Every message these sizes provoked, in the user's words (as the fuzz files check theirs). */
test('every message a tiny size provoked names the argument, with no internal path', () => {
  expect(MESSAGES.length).toBeGreaterThan(0);
  const internal = /\b(site|glazing|shading|weather|angleTable|overhang|leftFin|rightFin)\.[a-zA-Z]|internal error|undefined|\[object |is not allowed: is /;
  expect([...new Set(MESSAGES.map((m) => `${m.fn}: ${m.message}`))].filter((m) => internal.test(m))).toEqual([]);
});
