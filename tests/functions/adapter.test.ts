/**
 * The Excel adapter, without Excel: arguments as Excel passes them (matrices, `[[v]]`, null,
 * omitted, an invocation object), broadcasting through the registry's helper, defaults for blanks,
 * and the mapping of every kind of failure to #VALUE! / #N/A with a message.
 *
 * Pure plumbing: the expected numbers are the test descriptors' own arithmetic (a / b), so no
 * outside source is involved; the calculations themselves are checked in tests/reference/.
 */
import fc from 'fast-check';
import { SunpaneError, requireRange } from '../../src/core/common/errors';
import { makeHandler, normaliseArg } from '../../src/functions/adapter';
import { hostRuntime, registerFunctions } from '../../src/functions/register';
import { FUNCTIONS } from '../../src/registry';
import { type FunctionDescriptor, NotAvailable } from '../../src/registry/types';
import { ERROR_CODE, StubError, callHandler, stubRuntime } from './runtime-stub';

/** a / b, with a few deliberately awkward values of a to exercise every error path. */
const RATIO: FunctionDescriptor = {
  name: 'RATIO',
  summary: 'a divided by b (test descriptor)',
  category: 'Gain and load',
  outsideCheck: { source: 'none: a toy descriptor for the plumbing tests', tests: [] },
  params: [
    { name: 'a', kind: 'number', min: 0, max: 10, description: 'dividend' },
    { name: 'b', kind: 'number', min: 1, max: 5, default: 2, description: 'divisor' },
    { name: 'mode', kind: 'choice', choices: ['plain', 'inverse'], default: 'plain', description: 'plain a/b or b/a' },
  ],
  result: { shape: 'value', description: 'the ratio' },
  evaluate: ({ a, b, mode }) => {
    const x = a as number;
    if (x === 0) return new NotAvailable('no ratio for a = 0 (documented "no value")');
    if (x === 7) requireRange('b', -1, 1, 5); // a core error raised inside evaluate
    if (x === 8) return Number.NaN; // a core bug: must never reach a cell
    if (x === 9) throw new TypeError('boom'); // a core bug of another kind
    return mode === 'inverse' ? (b as number) / x : x / (b as number);
  },
};

/** A spilling descriptor with a ragged table. */
const STAIRS: FunctionDescriptor = {
  name: 'STAIRS',
  summary: 'a ragged table (test descriptor)',
  category: 'Gain and load',
  outsideCheck: { source: 'none: a toy descriptor for the plumbing tests', tests: [] },
  params: [{ name: 'n', kind: 'number', min: 0, max: 3, integer: true, description: 'rows' }],
  result: { shape: 'spill', description: 'rows 1..n' },
  evaluate: ({ n }) => Array.from({ length: n as number }, (_, i) => Array.from({ length: i + 1 }, (_, j) => j + 1)),
};

const rt = stubRuntime();
const ratio = makeHandler(RATIO, rt);
const stairs = makeHandler(STAIRS, rt);

function expectError(value: unknown, code: string, messageStart?: string): void {
  expect(value).toBeInstanceOf(StubError);
  const err = value as StubError;
  expect(err.code).toBe(code);
  if (messageStart !== undefined) expect(err.message?.slice(0, messageStart.length)).toBe(messageStart);
}

describe('arguments as Excel passes them', () => {
  test('single cells arrive as [[v]] and give a 1 × 1 result', () => {
    expect(ratio([[6]], [[3]], [['plain']])).toEqual([[2]]);
  });

  test('plain scalars are accepted too', () => {
    expect(ratio(6, 3)).toEqual([[2]]);
  });

  test('an omitted optional argument (null) takes the default', () => {
    expect(ratio([[6]], null, null)).toEqual([[3]]);
  });

  test('omitted trailing arguments take their defaults', () => {
    expect(ratio([[6]])).toEqual([[3]]);
  });

  test('a blank cell ([[null]] or [[""]]) takes the default', () => {
    expect(ratio([[6]], [[null]], [['']])).toEqual([[3]]);
    expect(ratio([[6]], [['']])).toEqual([[3]]);
  });

  test('an invocation object after the declared arguments is ignored', () => {
    expect(ratio([[6]], [[3]], [['inverse']], { functionName: 'RATIO', address: 'Sheet1!A1' })).toEqual([[0.5]]);
  });

  test('choice texts are read case-insensitively', () => {
    expect(ratio([[4]], [[2]], [['INVERSE']])).toEqual([[0.5]]);
  });

  test('numbers typed as text are read as numbers', () => {
    expect(ratio([['6']], [['3']])).toEqual([[2]]);
  });

  test('normaliseArg turns omitted and blank single cells into undefined and unwraps [[v]]', () => {
    expect(normaliseArg(null)).toBeUndefined();
    expect(normaliseArg(undefined)).toBeUndefined();
    expect(normaliseArg([[null]])).toBeUndefined();
    expect(normaliseArg([[5]])).toBe(5);
    expect(normaliseArg([[1], [2]])).toEqual([[1], [2]]);
  });
});

describe('broadcasting through the registry helper', () => {
  test('a column range pairs with a single value and spills a column', () => {
    expect(ratio([[1], [2], [4]], [[2]])).toEqual([[0.5], [1], [2]]);
  });

  test('ranges of the same shape pair cell by cell', () => {
    expect(ratio([[2, 6]], [[1, 3]])).toEqual([[2, 2]]);
  });

  test('a blank cell inside a range takes the default for that cell only', () => {
    expect(ratio([[6], [6]], [[3], [null]])).toEqual([[2], [3]]);
  });

  test('ranges of different sizes spill to the larger, with #N/A where a range has no partner, as built-ins do', () => {
    const out = callHandler(ratio, [[1], [2], [3]], [[1], [2]]) as unknown[][];
    expect(out).toHaveLength(3);
    expect(typeof out[0][0]).toBe('number');
    expect(typeof out[1][0]).toBe('number');
    expectError(out[2][0], ERROR_CODE.notAvailable, 'b has no value here: it is a 2 × 1 range');
  });

  test('a column against a row spills a 2-D table', () => {
    const out = callHandler(ratio, [[1], [2], [3]], [[1, 2]]) as unknown[][];
    expect(out).toHaveLength(3);
    for (const row of out) expect(row).toHaveLength(2);
  });

  test('a range given to a spilling function is refused as a whole with #VALUE!', () => {
    expectError(callHandler(stairs, [[1], [2]]), ERROR_CODE.invalidValue, 'n = "a 2 × 1 range" is not allowed: must be a single value');
  });

  test('a spilled table comes back rectangular, short rows padded with empty text', () => {
    expect(stairs([[3]])).toEqual([
      [1, '', ''],
      [1, 2, ''],
      [1, 2, 3],
    ]);
  });

  test('an empty spilled table becomes one #N/A cell with a message', () => {
    const out = stairs([[0]]);
    expect(out).toHaveLength(1);
    expect(out[0]).toHaveLength(1);
    expectError(out[0][0], ERROR_CODE.notAvailable, 'STAIRS has no rows');
  });

  test('values after the declared arguments (such as an invocation object) are ignored', () => {
    const single: FunctionDescriptor = { ...RATIO, name: 'SINGLE', params: RATIO.params.slice(0, 1), evaluate: ({ a }) => (a as number) * 2 };
    expect(makeHandler(single, rt)([[4]], [[99]], { address: 'A1' })).toEqual([[8]]);
  });
});

describe('errors become cells Excel can show', () => {
  test('a bad element makes only its own cell #VALUE!, with the message naming the argument, value and range', () => {
    const out = ratio([[1], [11]], [[2]]);
    expect(out[0][0]).toBe(0.5);
    expectError(out[1][0], ERROR_CODE.invalidValue, 'a = 11 is not allowed: must be a number from 0 to 10');
  });

  test('a required argument left blank is #VALUE! naming it', () => {
    expectError(ratio(null)[0][0], ERROR_CODE.invalidValue, 'a = blank is not allowed: it is required');
    expectError(ratio([['']], [[3]])[0][0], ERROR_CODE.invalidValue, 'a = blank is not allowed: it is required');
  });

  test('a documented "no value" is #N/A with its message', () => {
    const out = ratio([[0]]);
    expectError(out[0][0], ERROR_CODE.notAvailable, 'no ratio for a = 0');
  });

  test('a SunpaneError thrown inside the calculation is #VALUE! in its cell', () => {
    const out = ratio([[7], [2]]);
    expectError(out[0][0], ERROR_CODE.invalidValue, 'b = -1 is not allowed');
    expect(out[1][0]).toBe(1);
  });

  test('a non-finite number from the core never reaches a cell: #VALUE! "internal error"', () => {
    expectError(callHandler(ratio, [[8]]), ERROR_CODE.invalidValue, 'internal error:');
  });

  test('an unexpected exception is caught and shown as #VALUE! "internal error: ..."', () => {
    const out = callHandler(ratio, [[9]]);
    expectError(out, ERROR_CODE.invalidValue, 'internal error: boom');
  });

  test('an Excel error value in an input cell is refused naming the argument', () => {
    const out = ratio([[new StubError('#N/A')]]);
    expectError(out[0][0], ERROR_CODE.invalidValue, 'a = "#N/A" is not allowed');
  });

  test('a SunpaneError is never thrown raw out of a handler', () => {
    expect(() => stairs([[1], [2]])).toThrow(StubError);
    expect(() => stairs([[1], [2]])).not.toThrow(SunpaneError);
  });
});

describe('registration', () => {
  test('registerFunctions associates every registered function id with a handler', () => {
    const runtime = stubRuntime();
    const ids = registerFunctions(runtime);
    expect(ids).toEqual(FUNCTIONS.map((f) => f.name));
    expect([...runtime.associated.keys()]).toEqual(ids);
  });

  test('registerFunctions associates the descriptors it is given', () => {
    const runtime = stubRuntime();
    expect(registerFunctions(runtime, [RATIO, STAIRS])).toEqual(['RATIO', 'STAIRS']);
    expect(runtime.associated.get('RATIO')?.([[6]], [[3]])).toEqual([[2]]);
  });

  test('without a CustomFunctions runtime nothing is registered and nothing throws', () => {
    expect(hostRuntime()).toBeUndefined();
    expect(registerFunctions(undefined)).toEqual([]);
    expect(registerFunctions()).toEqual([]);
  });

  test('hostRuntime finds a global CustomFunctions object that has associate, Error and ErrorCode', () => {
    const g = globalThis as { CustomFunctions?: unknown };
    const runtime = stubRuntime();
    g.CustomFunctions = runtime;
    try {
      expect(hostRuntime()).toBe(runtime);
      g.CustomFunctions = { associate: runtime.associate };
      expect(hostRuntime()).toBeUndefined();
    } finally {
      delete g.CustomFunctions;
    }
  });
});

/** Anything a cell or range can hold, plus things Excel should never send. */
const cellArb = fc.oneof(
  fc.double({ noNaN: false }),
  fc.integer({ min: -1000, max: 100000 }),
  fc.string({ maxLength: 12 }),
  fc.boolean(),
  fc.constant(null),
  fc.constantFrom('', 'TRUE', '2024-06-21T12:00', '#N/A'),
);
const argArb = fc.oneof(cellArb, fc.array(fc.array(cellArb, { minLength: 1, maxLength: 3 }), { minLength: 1, maxLength: 3 }), fc.constant(undefined));

describe.each([...FUNCTIONS, RATIO, STAIRS].map((fn) => [fn.name, fn] as const))('%s through the adapter', (_name, fn) => {
  test('never throws anything but a CustomFunctions error and never puts NaN or Infinity in a cell', () => {
    const handler = makeHandler(fn, rt);
    fc.assert(
      fc.property(fc.array(argArb, { maxLength: fn.params.length + 1 }), (args) => {
        const out = callHandler(handler, ...args);
        if (out instanceof StubError) return [ERROR_CODE.invalidValue as string].includes(out.code) && typeof out.message === 'string';
        if (!Array.isArray(out) || out.length === 0) return false;
        const width = out[0].length;
        return out.every(
          (row) =>
            Array.isArray(row) &&
            row.length === width &&
            row.every((c) => (typeof c === 'number' ? Number.isFinite(c) : typeof c === 'string' || (c instanceof StubError && (c.code === ERROR_CODE.invalidValue || c.code === ERROR_CODE.notAvailable)))),
        );
      }),
      { numRuns: 60 },
    );
  });
});
