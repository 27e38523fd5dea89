/**
 * functions.json as generated from the registry: the shape Excel reads
 * (docs/platform.md#custom-function-metadata), every parameter and result a matrix of any, units and ranges in the descriptions,
 * optional arguments only at the end, and ids Excel accepts. Also checks the built dist/functions.json
 * is exactly what the generator gives for the current registry (the build cannot ship stale metadata).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { MAX_DESCRIPTION, MAX_PARAMETER_NAME, functionDescription, functionsMetadata } from '../../src/functions/metadata';
import { FUNCTIONS, paramHelp } from '../../src/registry';
import type { FunctionDescriptor } from '../../src/registry/types';

const SAMPLE: FunctionDescriptor = {
  name: 'SAMPLE',
  summary: 'Sample quantity for the metadata test.',
  category: 'Sky and irradiance',
  outsideCheck: { source: 'none: a toy descriptor for the plumbing tests', tests: [] },
  params: [
    { name: 'latitude', kind: 'number', unit: '°', min: -90, max: 90, description: 'site latitude, north positive' },
    { name: 'albedo', kind: 'number', min: 0, max: 1, default: 0.2, description: 'ground reflectance' },
    { name: 'surfaceTilt', kind: 'number', unit: '°', min: 0, max: 180, description: 'tilt' },
    { name: 'model', kind: 'choice', choices: ['isotropic', 'perez1990'], default: 'perez1990', description: 'sky model' },
  ],
  result: { shape: 'value', unit: 'W/m²', description: 'irradiance' },
  evaluate: () => 0,
};

describe('functions.json from descriptors', () => {
  const meta = functionsMetadata([SAMPLE]);
  const fn = meta.functions[0];

  test('id and name are the worksheet name', () => {
    expect(fn.id).toBe('SAMPLE');
    expect(fn.name).toBe('SAMPLE');
  });

  test('the description is the summary followed by the result unit', () => {
    expect(fn.description).toBe('Sample quantity for the metadata test [W/m²].');
    expect(functionDescription({ ...SAMPLE, result: { shape: 'spill', description: 't' } })).toBe('Sample quantity for the metadata test. Spills a table.');
  });

  test('every parameter and the result are matrices of any type', () => {
    expect(fn.result).toEqual({ type: 'any', dimensionality: 'matrix' });
    for (const p of fn.parameters) {
      expect(p.type).toBe('any');
      expect(p.dimensionality).toBe('matrix');
    }
  });

  test('parameter descriptions carry the unit, the range and the default', () => {
    expect(fn.parameters[0].description).toBe('site latitude, north positive; a number from -90 to 90 °');
    expect(fn.parameters[1].description).toBe(paramHelp(SAMPLE.params[1]));
    expect(fn.parameters[1].description).toContain('0.2');
  });

  test('a parameter is optional only when every later parameter is optional too', () => {
    expect(fn.parameters.map((p) => p.optional)).toEqual([false, false, false, true]);
  });

  test('ids that are not uppercase letters, or repeated, fail the build', () => {
    expect(() => functionsMetadata([{ ...SAMPLE, name: 'DOY1' }])).toThrow(/uppercase letters only/);
    expect(() => functionsMetadata([{ ...SAMPLE, name: 'Sample' }])).toThrow(/uppercase letters only/);
    expect(() => functionsMetadata([SAMPLE, SAMPLE])).toThrow(/registered twice/);
  });

  test('a parameter name longer than Excel allows fails the build', () => {
    const long = { ...SAMPLE.params[0], name: 'x'.repeat(MAX_PARAMETER_NAME + 1) };
    expect(() => functionsMetadata([{ ...SAMPLE, params: [long] }])).toThrow(/1 to 64 characters/);
  });
});

describe('functions.json for the registry', () => {
  const meta = functionsMetadata(FUNCTIONS);

  test('lists every registered function once, in registry order', () => {
    expect(meta.functions.map((f) => f.id)).toEqual(FUNCTIONS.map((f) => f.name));
  });

  test('keeps every text within Excel limits', () => {
    for (const f of meta.functions) {
      expect(f.description.length).toBeLessThanOrEqual(MAX_DESCRIPTION);
      for (const p of f.parameters) {
        expect(p.name.length).toBeLessThanOrEqual(MAX_PARAMETER_NAME);
        expect(p.description.length).toBeLessThanOrEqual(MAX_DESCRIPTION);
        expect(p.description.length).toBeGreaterThan(0);
      }
    }
  });

  test('states the unit of every number parameter that has one', () => {
    for (const fn of FUNCTIONS) {
      const entry = meta.functions.find((f) => f.id === fn.name);
      fn.params.forEach((p, k) => {
        if (p.unit && (p.kind === 'number' || p.kind === 'numberList')) expect(entry?.parameters[k].description).toContain(p.unit);
      });
    }
  });

  test('dist/functions.json (built by `npm run build`) matches the registry', () => {
    const built = path.resolve(__dirname, '../../dist/functions.json');
    if (!fs.existsSync(built)) throw new Error('dist/functions.json is missing: run `npm run build` (npm test does it in pretest)');
    expect(JSON.parse(fs.readFileSync(built, 'utf8'))).toEqual(meta);
  });
});
