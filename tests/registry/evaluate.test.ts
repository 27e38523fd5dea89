/**
 * The broadcasting rules of src/registry/evaluate.ts, on a toy descriptor (plumbing only: no
 * calculation is checked here, so no outside source applies).
 */
import { SunpaneError, requireRange } from '../../src/core/common/errors';
import { applyFunction } from '../../src/registry/evaluate';
import { type FunctionDescriptor, NotAvailable } from '../../src/registry/types';

const ADD: FunctionDescriptor = {
  name: 'TOYADD',
  summary: 'a + b × scale',
  category: 'Time and sun',
  outsideCheck: { source: 'none: a toy descriptor for the plumbing tests', tests: [] },
  params: [
    { name: 'a', kind: 'number', min: 0, max: 10, description: 'first' },
    { name: 'b', kind: 'number', min: -5, max: 5, description: 'second' },
    { name: 'scale', kind: 'number', min: 0, max: 100, default: 1, description: 'scale' },
  ],
  result: { shape: 'value', description: 'sum' },
  evaluate: (args) => {
    if ((args.a as number) === 7) return new NotAvailable('seven has no value');
    return (args.a as number) + (args.b as number) * (args.scale as number);
  },
};

const LIST: FunctionDescriptor = {
  name: 'TOYSUM',
  summary: 'sum of a list',
  category: 'Time and sun',
  outsideCheck: { source: 'none: a toy descriptor for the plumbing tests', tests: [] },
  params: [{ name: 'values', kind: 'numberList', min: 0, max: 90, length: { min: 2, max: 4 }, ascending: true, description: 'values' }],
  result: { shape: 'spill', description: 'the list and its sum' },
  evaluate: (args) => [[...(args.values as number[]), (args.values as number[]).reduce((s, v) => s + v, 0)]],
};

describe('broadcasting over ranges', () => {
  test('single values give a 1 × 1 result and blanks take the default', () => {
    expect(applyFunction(ADD, [1, 2])).toEqual([[3]]);
    expect(applyFunction(ADD, [1, 2, null])).toEqual([[3]]);
    expect(applyFunction(ADD, [[[1]], 2, 10])).toEqual([[21]]);
  });

  test('ranges of equal shape pair element by element and single values pair with all', () => {
    expect(applyFunction(ADD, [[[1, 2], [3, 4]], [[1, 1], [2, 2]], 10])).toEqual([[11, 12], [23, 24]]);
    expect(applyFunction(ADD, [[[1], [2], [3]], 1])).toEqual([[2], [3], [4]]);
  });

  test('a column against a row gives a 2-D table, as =A1:A3+B1:C1 does in Excel', () => {
    // a down the rows, b across the columns: cell (i, j) = a_i + b_j
    expect(applyFunction(ADD, [[[1], [2], [3]], [[0.5, -1]]])).toEqual([
      [1.5, 0],
      [2.5, 1],
      [3.5, 2],
    ]);
  });

  test('cells where a range has no partner are #N/A, naming the short range, and the rest compute', () => {
    // Excel: ={1;2;3}+{10;20} gives {11;22;#N/A}; a 2 × 2 against a 3 × 1 fills column 2 of row 3 with #N/A
    const out = applyFunction(ADD, [[[1], [2], [3]], [[1], [2]]]);
    expect(out[0][0]).toBe(2);
    expect(out[1][0]).toBe(4);
    expect(out[2][0]).toBeInstanceOf(NotAvailable);
    expect((out[2][0] as NotAvailable).message).toBe('b has no value here: it is a 2 × 1 range and the other ranges are larger');
    const wide = applyFunction(ADD, [[[1, 2], [3, 4]], [[1], [1], [1]]]);
    expect(wide.map((r) => r.map((c) => (c instanceof NotAvailable ? 'N/A' : c)))).toEqual([
      [2, 3],
      [4, 5],
      ['N/A', 'N/A'],
    ]);
  });

  test('each cell of a range is read once, however often the broadcast uses it', () => {
    let reads = 0;
    const row = (v: number) =>
      new Proxy([v], {
        get(target, key, receiver) {
          if (typeof key === 'string' && /^\d+$/.test(key)) reads++;
          return Reflect.get(target, key, receiver);
        },
      });
    const out = applyFunction(ADD, [[row(1), row(2), row(3)], [[1, 2, 3, 4]]]);
    expect(out).toHaveLength(3);
    expect(out[0]).toHaveLength(4);
    expect(out[2][3]).toBe(7);
    expect(reads).toBe(3); // each cell of a once, not once per result cell (12)
  });

  test('a bad element makes only its own cell an error, naming argument, value and range', () => {
    const out = applyFunction(ADD, [[[1], [11], ['x'], [null]], 1]);
    expect(out[0][0]).toBe(2);
    expect(out[1][0]).toBeInstanceOf(SunpaneError);
    expect((out[1][0] as SunpaneError).message).toBe('a = 11 is not allowed: must be a number from 0 to 10');
    expect((out[2][0] as SunpaneError).message).toBe('a = "x" is not allowed: must be a number from 0 to 10');
    expect((out[3][0] as SunpaneError).message).toMatch(/^a = blank is not allowed: it is required/);
  });

  test('a documented no-value result passes through as NotAvailable', () => {
    expect(applyFunction(ADD, [7, 0])[0][0]).toBeInstanceOf(NotAvailable);
  });

  test('too many arguments are refused', () => {
    expect(() => applyFunction(ADD, [1, 2, 3, 4])).toThrow(/TOYADD takes at most 3 arguments/);
  });

  test('number lists take the whole range, skip blanks, and check count, bounds and order', () => {
    expect(applyFunction(LIST, [[[10, 20], [null, 30]]])).toEqual([[10, 20, 30, 60]]);
    expect(() => applyFunction(LIST, [[[10]]])).toThrow(/values = a list of 1 is not allowed: must hold 2 to 4 numbers/);
    expect(() => applyFunction(LIST, [[[10, 95]]])).toThrow(/values \(value 2\) = 95 is not allowed: must be a number from 0 to 90/);
    expect(() => applyFunction(LIST, [[[20, 10]]])).toThrow(/must be strictly ascending/);
  });

  test('a spilling function refuses a range for a broadcast argument', () => {
    const spill: FunctionDescriptor = { ...ADD, name: 'TOYSPILL', result: { shape: 'spill', description: 'x' }, evaluate: (a) => [[a.a as number]] };
    expect(() => applyFunction(spill, [[[1], [2]], 0])).toThrow(/must be a single value: TOYSPILL spills a table of its own/);
  });

  test('a non-finite number never leaves the registry', () => {
    const broken: FunctionDescriptor = { ...ADD, name: 'TOYBROKEN', evaluate: () => Number.NaN };
    expect(() => applyFunction(broken, [1, 1])).toThrow(/non-finite/);
  });

  test('core range messages read like the registry ones', () => {
    expect(() => requireRange('latitude', 95, -90, 90, '°')).toThrow('latitude = 95 is not allowed: must be a number from -90 to 90 °');
  });
});

describe('series with gaps', () => {
  const SERIES: FunctionDescriptor = {
    name: 'TOYSERIES',
    summary: 'count of missing values',
    category: 'Gain and load',
    outsideCheck: { source: 'none: a toy descriptor for the plumbing tests', tests: [] },
    params: [{ name: 'dni', kind: 'numberList', min: 0, max: 2000, optional: true, gapsAreMissing: true, description: 'series' }],
    result: { shape: 'spill', description: 'values' },
    evaluate: (args) => [(args.dni as number[] | undefined)?.map((v) => (Number.isNaN(v) ? -1 : v)) ?? []],
  };

  test('blank and text cells keep their place as missing values; numbers are still range-checked', () => {
    expect(applyFunction(SERIES, [[[1], [null], ['n/a'], [4]]])).toEqual([[1, -1, -1, 4]]);
    expect(() => applyFunction(SERIES, [[[1], [null], [2500]]])).toThrow(/dni \(value 3\) = 2500 is not allowed/);
  });

  test('a wholly blank range is "not given"', () => {
    expect(applyFunction(SERIES, [[[null], [null]]])).toEqual([[]]);
  });
});
