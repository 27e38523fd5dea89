/**
 * Property tests driven by the registry (fast-check): for EVERY registered worksheet function,
 * random valid arguments (inside each parameter's declared range) give finite results inside the
 * declared result range, and one random invalid argument gives the typed error naming that
 * argument. The descriptors' ranges are the contract; this test holds the core to it.
 */
import fc from 'fast-check';
import { SunpaneError } from '../../src/core/common/errors';
import { MAX_SERIAL_EXCLUSIVE, MIN_SERIAL } from '../../src/core/time/calendar';
import { applyFunction, readRange, readScalar } from '../../src/registry/evaluate';
import { readWindowRange } from '../../src/registry/windowRange';
import { FUNCTIONS, isOptional } from '../../src/registry';
import { GLOSSARY, type GlossaryEntry, WINDOW_FIELDS } from '../../src/registry/glossary';
import { type Args, type FunctionDescriptor, NotAvailable, type OutTable, type ParamDescriptor, type RawArg } from '../../src/registry/types';

/** Every message a call gave (errors and #N/A reasons) and the function that gave it, read at the end for wording no user should see. */
const MESSAGES: { fn: string; message: string }[] = [];

/** A window's fields as name → value cells (only valid values; combinations may still be refused). */
function windowArb(): fc.Arbitrary<RawArg> {
  const G = GLOSSARY;
  const value = (f: GlossaryEntry): fc.Arbitrary<number | string> => {
    const cell = f.window!.cell;
    if (cell === 'choice') return fc.constantFrom(...(f.choices ?? []), ...Object.keys(f.choiceAliases ?? {}));
    if (cell === 'monthly') return fc.oneof(numberArb({ ...f, kind: 'number' }), fc.array(numberArb({ ...f, kind: 'number' }), { minLength: 12, maxLength: 12 }).map((xs) => xs.join(' ')));
    if (cell === 'dateTime') return fc.double({ min: 61, max: 2958465, noNaN: true });
    if (cell === 'list') return fc.array(numberArb({ ...f, kind: 'number', min: f.min, max: f.max }), { minLength: 1, maxLength: 12 }).map((xs) => xs.join(' '));
    return numberArb(f);
  };
  const required = [G.latitude, G.longitude, G.utcOffset, G.surfaceAzimuth, G.width, G.height, G.shgc];
  const optional = WINDOW_FIELDS.filter((f) => !required.includes(f) && !['name', 'site', 'shgcAngles', 'shgcValues', 'linkeTurbidity', 'tauB', 'tauD', 'year'].includes(f.name));
  const sky = fc.oneof(
    fc.tuple(value(G.linkeTurbidity)).map(([l]) => [['linkeTurbidity', l]] as [string, number | string][]),
    fc.tuple(numberArb(G.tauB), numberArb(G.tauD)).map(([b, d]) => [['tauB', b], ['tauD', d]] as [string, number | string][]),
    fc.constant([] as [string, number | string][]),
  );
  return fc
    .tuple(
      fc.tuple(...required.map(value)),
      fc.subarray(optional, { maxLength: 8 }).chain((fields) => fc.tuple(...fields.map((f) => value(f).map((v) => [f.name, v] as [string, number | string])))),
      sky,
      fc.option(fc.integer({ min: 1990, max: 2040 }), { nil: undefined }),
      fc.boolean(),
    )
    .map(([req, opt, skyPairs, year, down]) => {
      const pairs: [string, number | string][] = [...required.map((f, k) => [f.name, req[k]] as [string, number | string]), ...opt, ...skyPairs, ...(year !== undefined ? [['year', year] as [string, number]] : [])];
      // a name column beside a value column, or a header row over a value row
      return down ? pairs.map(([n, v]) => [n, v]) : [pairs.map(([n]) => n), pairs.map(([, v]) => v)];
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

const RUNS = Number(process.env.SUNPANE_FUZZ_RUNS ?? 40);

function numberArb(p: ParamDescriptor): fc.Arbitrary<number> {
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

function validArb(p: ParamDescriptor): fc.Arbitrary<RawArg> {
  let arb: fc.Arbitrary<RawArg>;
  switch (p.kind) {
    case 'number':
      arb = numberArb(p);
      break;
    case 'dateTime':
      arb = fc.double({ min: MIN_SERIAL, max: MAX_SERIAL_EXCLUSIVE - 1, noNaN: true });
      break;
    case 'choice':
      arb = fc.constantFrom(...(p.choices ?? []));
      break;
    case 'flag':
      arb = fc.boolean();
      break;
    case 'text':
      arb = fc.string({ minLength: 1, maxLength: 12 });
      break;
    case 'window':
      arb = windowArb();
      break;
    case 'choiceList':
      arb = fc.subarray([...(p.choices ?? [])], { minLength: 1, maxLength: 4 }).map((xs) => [xs]);
      break;
    case 'numberList': {
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
      throw new Error(`fuzz: no generator for ${p.kind} parameter ${p.name}: add one here`);
  }
  return isOptional(p) ? fc.oneof({ weight: 4, arbitrary: arb }, { weight: 1, arbitrary: fc.constant(null) }) : arb;
}

function invalidArb(p: ParamDescriptor): fc.Arbitrary<RawArg> {
  const bad: RawArg[] = [];
  switch (p.kind) {
    case 'number':
      bad.push(Number.NaN, Number.POSITIVE_INFINITY, 'text');
      if (p.min !== undefined) bad.push(p.exclusiveMin ? p.min : p.min - 1 - Math.abs(p.min));
      if (p.max !== undefined) bad.push(p.exclusiveMax ? p.max : p.max + 1 + Math.abs(p.max));
      if (p.integer) bad.push((p.min ?? 0) + 0.5);
      break;
    case 'dateTime':
      bad.push(60, 0, -1, MAX_SERIAL_EXCLUSIVE, Number.NaN, 'yesterday');
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
    case 'numberList':
      // In a series with gaps, text and blanks are missing values, not errors.
      if (!p.gapsAreMissing) bad.push([['text']], [[Number.NaN]]);
      if (p.max !== undefined) bad.push([[p.max + 1 + Math.abs(p.max)]]);
      if (p.min !== undefined) bad.push([[p.min - 1 - Math.abs(p.min)]]);
      break;
    default:
      break;
  }
  return fc.constantFrom(...bad);
}

/** The arguments as `evaluate` would see them, to ask the descriptor's `refuses`. */
function readArgs(fn: FunctionDescriptor, raw: RawArg[]): Args {
  const args: Args = {};
  fn.params.forEach((p, k) => {
    if (p.kind === 'window') {
      const w = readWindowRange(raw[k], p.name).windows[0];
      if (w instanceof SunpaneError) throw w;
      args[p.name] = w;
    } else args[p.name] = p.kind === 'numberList' || p.kind === 'choiceList' || p.kind === 'table' ? readRange(p, raw[k]) : readScalar(p, raw[k] as never);
  });
  return args;
}

function checkValid(fn: FunctionDescriptor, out: OutTable): void {
  for (const row of out) {
    for (const cell of row) {
      if (cell instanceof SunpaneError) throw new Error(`${fn.name}: valid arguments gave an error: ${cell.message}`);
      if (cell instanceof NotAvailable) MESSAGES.push({ fn: fn.name, message: cell.message });
      if (cell instanceof NotAvailable || typeof cell === 'string') continue;
      expect(Number.isFinite(cell)).toBe(true);
      if (fn.result.shape === 'value') {
        if (fn.result.min !== undefined) expect(cell).toBeGreaterThanOrEqual(fn.result.min - 1e-9);
        if (fn.result.max !== undefined) expect(cell).toBeLessThanOrEqual(fn.result.max + 1e-9);
      }
    }
  }
}

function errorOf(fn: FunctionDescriptor, raw: RawArg[]): SunpaneError | undefined {
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

test('the registry lists functions with unique names of uppercase letters', () => {
  expect(FUNCTIONS.length).toBeGreaterThan(0);
  const names = FUNCTIONS.map((f) => f.name);
  expect(new Set(names).size).toBe(names.length);
  for (const n of names) expect(n).toMatch(/^[A-Z]+$/);
});

describe.each(FUNCTIONS.map((f) => [f.name, f] as const))('%s', (_name: string, fn: FunctionDescriptor) => {
  const spillRuns = fn.result.shape === 'spill' ? Math.max(5, Math.floor(RUNS / 4)) : RUNS;

  test('random valid arguments give finite results in the declared range', () => {
    fc.assert(
      fc.property(fc.tuple(...fn.params.map(validArb)), (raw) => {
        const reason = fn.refuses?.(readArgs(fn, raw));
        if (reason !== undefined) {
          expect(errorOf(fn, raw)).toBeInstanceOf(SunpaneError);
          return;
        }
        checkValid(fn, applyFunction(fn, raw));
      }),
      { numRuns: spillRuns, seed: 20261201 },
    );
  });

  test('one invalid argument gives the typed error naming that argument', () => {
    const arb = fc
      .tuple(fc.tuple(...fn.params.map(validArb)), fc.integer({ min: 0, max: fn.params.length - 1 }))
      .chain(([raw, k]) => invalidArb(fn.params[k]).map((bad) => ({ raw, k, bad })))
      .filter(({ raw, k }) => ['number', 'dateTime', 'choice', 'flag', 'numberList'].includes(fn.params[k].kind) && fn.refuses?.(readArgs(fn, raw)) === undefined);
    fc.assert(
      fc.property(arb, ({ raw, k, bad }) => {
        const args = [...raw];
        args[k] = bad;
        const err = errorOf(fn, args);
        expect(err).toBeInstanceOf(SunpaneError);
        expect(err!.argument.startsWith(fn.params[k].name)).toBe(true);
      }),
      { numRuns: spillRuns, seed: 20261201 },
    );
  });
});

/**
 * The diffuse-shading path (view factors, docs/diffuse-shading.md) at the edges the random draws
 * above rarely reach: devices of zero projection, extensions at the parameter cap, reveals far deeper
 * than the window, skylines at 90°. Every result finite and in range, no error, no "internal error".
 */
describe('diffuse shading at the edges', () => {
  const fnOf = (name: string) => FUNCTIONS.find((f) => f.name === name)!;
  const VIEW = fnOf('VIEWFACTORS');
  const GAIN = fnOf('WINDOWGAIN');
  const STEPS = fnOf('GAINSTEPS');
  const cap = 100; // LENGTH_MAX of the glossary
  const edge = (lo: number, hi: number) => fc.oneof(fc.constantFrom(lo, hi, Math.min(Math.max(0, lo), hi)), fc.double({ min: lo, max: hi, noNaN: true, noDefaultInfinity: true }));

  function cells(out: OutTable): (number | string)[] {
    return out.flat().map((c) => {
      if (c instanceof SunpaneError || c instanceof NotAvailable) throw new Error(`unexpected ${c.constructor.name}: ${c.message}`);
      return c;
    });
  }

  test('VIEWFACTORS: zero projections and no reveal give exactly the bare window', () => {
    const out = applyFunction(VIEW, [180, 1.2, 1.5, 0, 0.3, 5, 5, 0, 0.2, 0, 0.1, 1, 1, 0, null]);
    expect(out).toEqual([[0.5, 0.5, 1, 1, 1]]);
  });

  test('VIEWFACTORS: random devices at the edges of their ranges stay finite and in 0…1', () => {
    fc.assert(
      fc.property(
        fc.record({
          width: edge(0.01, cap),
          height: edge(0.01, cap),
          projection: edge(0, cap),
          gap: edge(0, cap),
          ext: edge(-cap, cap),
          fin: edge(0, cap),
          reveal: edge(0, cap),
          skyline: fc.oneof(fc.constant(null), fc.array(edge(0, 90), { minLength: 1, maxLength: 36 }).map((xs) => [xs])),
          azimuth: edge(0, 360),
        }),
        (r) => {
          // Extensions that would leave the overhang or fins a negative size are refused by design; keep them valid.
          const ext = Math.max(r.ext, -r.width / 2);
          const finExt = Math.max(r.ext, -r.height / 2);
          const out = applyFunction(VIEW, [r.azimuth, r.width, r.height, r.projection, r.gap, ext, ext, r.fin, r.gap, r.fin, r.gap, finExt, finExt, r.reveal, r.skyline]);
          for (const v of cells(out)) {
            expect(typeof v).toBe('number');
            expect(Number.isFinite(v)).toBe(true);
            expect(v as number).toBeGreaterThanOrEqual(0);
            expect(v as number).toBeLessThanOrEqual(1);
          }
        },
      ),
      { numRuns: Math.max(60, RUNS), seed: 20261212 },
    );
  });

  test('a reveal ten times deeper than the window: finite ratios in 0…1 through VIEWFACTORS, WINDOWGAIN and GAINSTEPS', () => {
    const view = cells(applyFunction(VIEW, [180, 1.2, 1.5, 1, 0, 0.5, 0.5, 0.4, 0, 0.4, 0, 0, 0, 15, null]));
    for (const v of view) expect(v as number).toBeGreaterThanOrEqual(0);
    expect(view[2] as number).toBeLessThan(0.02);
    const hour = ['2026-07-21T12:30', 40, -105, -7, 180, 1.2, 1.5, 0.6, null, null, 0.4, 2.3, 2, 0.1, 0.2, 'perez', 90, 1];
    const gain = cells(applyFunction(GAIN, [...hour, 1, 0, 0.5, 0.5, 0.4, 0, 15]))[0] as number;
    expect(Number.isFinite(gain)).toBe(true);
    expect(gain).toBeGreaterThanOrEqual(0);
    const steps = cells(applyFunction(STEPS, [...hour, 1, 1, 0, 0.5, 0.5, 0.4, 0, 15]));
    for (const v of steps) {
      if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
      else expect(v).not.toMatch(/internal error|NaN|Infinity/);
    }
  });

  test('WINDOWGAIN and GAINSTEPS over random extreme shading: finite, never above the bare window, no internal error', () => {
    fc.assert(
      fc.property(
        fc.record({ projection: edge(0, cap), gap: edge(0, cap), ext: edge(-0.6, cap), fin: edge(0, cap), reveal: edge(0, cap), model: fc.constantFrom('perez', 'haydavies', 'isotropic'), hour: fc.integer({ min: 0, max: 23 }) }),
        (r) => {
          const hour = [`2026-03-21T${String(r.hour).padStart(2, '0')}:30`, 40, -105, -7, 200, 1.2, 1.5, 0.6, 300, 150, 0.4, 2.3, 2, 0.1, 0.2, r.model, 90, 1];
          const shading = [r.projection, r.gap, r.ext, r.ext, r.fin, r.gap, r.reveal];
          const gain = cells(applyFunction(GAIN, [...hour, ...shading]))[0] as number;
          const bare = cells(applyFunction(GAIN, hour))[0] as number;
          expect(Number.isFinite(gain)).toBe(true);
          expect(gain).toBeGreaterThanOrEqual(0);
          expect(gain).toBeLessThanOrEqual(bare + 1e-9);
          for (const v of cells(applyFunction(STEPS, [...hour, 1, ...shading]))) {
            if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
            else expect(v).not.toMatch(/internal error|NaN|Infinity/);
          }
        },
      ),
      { numRuns: Math.max(40, RUNS), seed: 20261213 },
    );
  });
});

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
    const draws = fc.sample(fc.tuple(...fn.params.map(validArb)), { numRuns: 100, seed: 20261203 }).map((raw) => {
      const args = [...raw];
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

/**
 * Every message the runs above provoked, in the user's words: no path inside the program
 * (`site.latitude`, `glazing.angleTable.values`, `shading.overhang.projection`, `weather.tauB`) and
 * never "internal error". Every registered function must have given some (its invalid-argument runs
 * alone give one per run), so no function's messages go unread. Runs after the tests above (jest
 * runs a file's tests in order).
 */
test('every message the fuzzing provoked names arguments as the signatures do, with no internal path', () => {
  const silent = FUNCTIONS.map((f) => f.name).filter((name) => !MESSAGES.some((m) => m.fn === name));
  expect(silent).toEqual([]);
  expect(new Set(MESSAGES.map((m) => m.fn)).size).toBe(FUNCTIONS.length);
  const internal = /\b(site|glazing|shading|weather|angleTable|overhang|leftFin|rightFin)\.[a-zA-Z]|internal error|undefined|\[object |is not allowed: is /;
  const bad = [...new Set(MESSAGES.map((m) => `${m.fn}: ${m.message}`))].filter((m) => internal.test(m));
  expect(bad).toEqual([]);
});
