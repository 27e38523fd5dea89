/**
 * The sky and glazing worksheet functions evaluated as a cell would (through the registry's one
 * broadcasting helper): every documented example runs, and the numbers the examples' notes state
 * are the ones returned. The values trace to the reference checks in tests/reference/ (Kasten–Young,
 * Erbs, ASHRAE) or to hand arithmetic written here.
 */
import { parseCliArg } from '../../../src/cli/args';
import { SunpaneError } from '../../../src/core/common/errors';
import { applyFunction } from '../../../src/registry/evaluate';
import { GLAZING_FUNCTIONS } from '../../../src/registry/glazing';
import { SKY_FUNCTIONS } from '../../../src/registry/sky';
import type { FunctionDescriptor, OutTable } from '../../../src/registry/types';

const ALL = [...SKY_FUNCTIONS, ...GLAZING_FUNCTIONS];
const byName = (name: string): FunctionDescriptor => ALL.find((f) => f.name === name)!;
const call = (name: string, ...args: string[]): OutTable => applyFunction(byName(name), args.map(parseCliArg));
const value = (name: string, ...args: string[]): number => call(name, ...args)[0][0] as number;

describe('sky and glazing worksheet functions', () => {
  test('every documented example evaluates without an error cell', () => {
    for (const fn of ALL) {
      expect(fn.examples?.length).toBeGreaterThan(0);
      for (const ex of fn.examples ?? []) {
        const out = applyFunction(fn, ex.args.map(parseCliArg));
        for (const cell of out.flat()) expect(cell).not.toBeInstanceOf(SunpaneError);
      }
    }
  });

  test('the numbers stated in the examples are returned', () => {
    expect(value('EXTRATERRESTRIAL', '3')).toBeCloseTo(1412.111, 3);
    expect(value('EXTRATERRESTRIAL', '1', '"spencer"')).toBeCloseTo(1414.0, 1);
    expect(value('AIRMASS', '10')).toBeCloseTo(5.586, 3);
    const split = call('SPLITGLOBAL', '50', '5', '1')[0] as number[];
    expect(split[0]).toBeCloseTo(96.7193, 3);
    expect(split[1]).toBeCloseTo(41.5704, 3);
    expect(split[2]).toBeCloseTo(0.405724, 5);
    expect(value('VERTICALDIFFUSERATIO', '60')).toBeCloseTo(0.55 + 0.437 * 0.5 + 0.313 * 0.25, 12);
    expect(value('SHGCANGLE', '0', '0.7')).toBeCloseTo(0.7, 12);
    expect(value('GLASSAREA', '1.2', '1.5', '0.2')).toBeCloseTo(1.44, 12);
    expect(value('SHGCLOOKUP', '50', '{0,40,50,60,70,80}', '{0.7,0.68,0.66,0.6,0.48,0.28}')).toBeCloseTo(0.66, 12);
  });

  test('the parts spill sums to the total function and the model names map to the core models', () => {
    const args = ['800', '120', '45', '180', '180', '172'];
    for (const model of ['perez', 'haydavies', 'isotropic']) {
      const parts = call('WINDOWIRRADIANCEPARTS', ...args, '90', '0.2', `"${model}"`)[0] as number[];
      expect(parts[0] + parts[1] + parts[2]).toBeCloseTo(parts[3], 9);
      expect(value('WINDOWIRRADIANCE', ...args, '90', '0.2', `"${model}"`)).toBeCloseTo(parts[3], 9);
    }
    const iso = call('WINDOWIRRADIANCEPARTS', ...args, '90', '0.2', '"isotropic"')[0] as number[];
    expect(iso[1]).toBeCloseTo(60, 9); // vertical wall sees half of DHI 120
  });

  test('a global horizontal column broadcasts and a bad cell is an error in its own place only', () => {
    const out = applyFunction(byName('CLEARSKYDNI'), [[[60], [-95], [30]], 172, 0.4, 2.3]);
    expect(out).toHaveLength(3);
    expect(typeof out[0][0]).toBe('number');
    expect(out[1][0]).toBeInstanceOf(SunpaneError);
    expect((out[1][0] as SunpaneError).argument).toBe('sunAltitude');
    expect(typeof out[2][0]).toBe('number');
  });

  test('tables of unequal length are refused', () => {
    const fn = byName('SHGCDIFFUSELOOKUP');
    expect(fn.refuses?.({ shgcAngles: [0, 40], shgcValues: [0.7] })).toMatch(/shgcAngles has 2/);
    expect(() => applyFunction(fn, [[[0, 40]], [[0.7]]])).not.toThrow();
    expect(applyFunction(fn, [[[0, 40]], [[0.7]]])[0][0]).toBeInstanceOf(SunpaneError);
  });
});
