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
import type { FunctionDescriptor, ParamDescriptor } from '../../src/registry/types';
// eslint-disable-next-line @typescript-eslint/no-require-imports -- the build's own CommonJS helper
const { resolveHost } = require('../../scripts/manifest-host.js') as { resolveHost: (v: string | undefined) => string };

/** The host this run's build used (npm test builds with the environment's SUNPANE_HOST). */
const HOST = resolveHost(process.env.SUNPANE_HOST);

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
  const meta = functionsMetadata([SAMPLE], 'https://addin.example.org/sunpane');
  const fn = meta.functions[0];

  test("helpUrl is the function's page under the add-in's host", () => {
    expect(fn.helpUrl).toBe('https://addin.example.org/sunpane/help/SAMPLE.html');
    expect(functionsMetadata([SAMPLE], 'https://localhost:3000').functions[0].helpUrl).toBe('https://localhost:3000/help/SAMPLE.html');
  });

  test('a host that is not https, or ends in a slash, fails the build', () => {
    expect(() => functionsMetadata([SAMPLE], 'http://addin.example.org')).toThrow(/https URL/);
    expect(() => functionsMetadata([SAMPLE], 'https://addin.example.org/')).toThrow(/trailing slash/);
    expect(() => functionsMetadata([SAMPLE], '')).toThrow(/https URL/);
  });

  test('a date-time result says which number format to give the cell', () => {
    const when = functionDescription({ ...SAMPLE, result: { shape: 'value', kind: 'dateTime', description: 'sunrise' } });
    expect(when).toMatch(/format the cell .*yyyy-mm-dd hh:mm/);
    expect(fn.description).not.toMatch(/yyyy/);
  });

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

  test('parameter descriptions carry the unit (or "no unit"), the range and the default', () => {
    expect(fn.parameters[0].description).toBe('site latitude, north positive; a number from -90 to 90 °');
    expect(fn.parameters[1].description).toBe('ground reflectance; a number from 0 to 1, no unit; blank: 0.2');
    expect(fn.parameters[1].description).toBe(paramHelp(SAMPLE.params[1]));
  });

  test('a parameter is optional only when every later parameter is optional too', () => {
    expect(fn.parameters.map((p) => p.optional)).toEqual([false, false, false, true]);
  });

  test('ids that are not uppercase letters, or repeated, fail the build', () => {
    expect(() => functionsMetadata([{ ...SAMPLE, name: 'DOY1' }], HOST)).toThrow(/uppercase letters only/);
    expect(() => functionsMetadata([{ ...SAMPLE, name: 'Sample' }], HOST)).toThrow(/uppercase letters only/);
    expect(() => functionsMetadata([SAMPLE, SAMPLE], HOST)).toThrow(/registered twice/);
  });

  test('a parameter name longer than Excel allows fails the build', () => {
    const long = { ...SAMPLE.params[0], name: 'x'.repeat(MAX_PARAMETER_NAME + 1) };
    expect(() => functionsMetadata([{ ...SAMPLE, params: [long] }], HOST)).toThrow(/1 to 64 characters/);
  });
});

describe('functions.json for the registry', () => {
  const meta = functionsMetadata(FUNCTIONS, HOST);

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

  test("every function has a helpUrl: its own page under the add-in's host", () => {
    for (const f of meta.functions) expect(f.helpUrl).toBe(`${HOST}/help/${f.id}.html`);
    expect(new Set(meta.functions.map((f) => f.helpUrl)).size).toBe(FUNCTIONS.length);
  });

  test('dist/functions.json (built by `npm run build`) matches the registry', () => {
    const built = path.resolve(__dirname, '../../dist/functions.json');
    if (!fs.existsSync(built)) throw new Error('dist/functions.json is missing: run `npm run build` (npm test does it in pretest)');
    expect(JSON.parse(fs.readFileSync(built, 'utf8'))).toEqual(meta);
  });
});

/**
 * What formula autocomplete shows is all most users read: every argument's description must carry
 * its unit — or say "no unit", or what kind of value it is (a date-time, TRUE or FALSE, one of some
 * names, a range of window fields) — and its allowed range, whole (not cut at 512 characters).
 */
describe('argument help in functions.json: unit and allowed range', () => {
  const meta = functionsMetadata(FUNCTIONS, HOST);
  const cases = FUNCTIONS.flatMap((fn) => fn.params.map((p, k) => [fn.name, p.name, p, meta.functions.find((f) => f.id === fn.name)!.parameters[k].description] as const));

  /** Parameters whose name says what they measure: they must carry that unit. */
  const DIMENSIONS: [RegExp, string][] = [
    [/(Projection|Gap|Depth|Extension(Left|Right)?|^width|^height|^elevation|^projection)$/, 'm'],
    [/(Azimuth|Altitude|Tilt|^incidence|^latitude|^longitude|^skyline|Angles)$/, '°'],
    [/^(dni|dhi|ghi)$/, 'W/m²'],
    [/^utcOffset$/, 'h'],
  ];

  function problems(p: ParamDescriptor, text: string): string[] {
    const out: string[] = [];
    switch (p.kind) {
      case 'number':
      case 'numberList':
        if (p.min === undefined || p.max === undefined) out.push('no lower or upper bound');
        else if (!/from -?[\d.e+]+ (and )?(to|below)|(above|of at least) -?[\d.e+]+ and (up to|below)/.test(text)) out.push('the range is not stated');
        if (p.unit ? !text.includes(p.unit) : !text.includes('no unit')) out.push('neither its unit nor "no unit"');
        for (const [name, unit] of DIMENSIONS) if (name.test(p.name) && p.unit !== unit) out.push(`measured in ${unit} but declares ${p.unit ?? 'no unit'}`);
        break;
      case 'dateTime':
        if (!/date-time .*from 1 March 1900 to 31 December 9999/.test(text)) out.push('the date-time range is not stated');
        break;
      case 'choice':
      case 'choiceList':
        for (const c of p.choices ?? []) if (!new RegExp(`\\b${c}\\b`).test(text)) out.push(`the choice "${c}" is not listed`);
        break;
      case 'flag':
        if (!text.includes('TRUE or FALSE')) out.push('TRUE or FALSE is not stated');
        break;
      case 'window':
        if (!text.includes('window fields')) out.push('does not say it takes window fields');
        break;
      case 'clock':
        for (const f of ['daylightSavingStart', 'daylightSavingEnd', 'daylightSavingShift', 'dateSystem']) if (!text.includes(f)) out.push(`the clock field ${f} is not named`);
        if (!/daylightSavingShift \[h\] \(above 0 up to 2/.test(text)) out.push("the shift's unit and range are not stated");
        if (!text.includes('1900 or 1904')) out.push('the date systems are not stated');
        break;
      default:
        out.push(`no rule for a ${p.kind} parameter: add one to this test`);
    }
    if (text.length >= MAX_DESCRIPTION) out.push('cut at 512 characters');
    return out;
  }

  test.each(cases)('%s %s', (_fn, _p, p, text) => {
    expect(problems(p, text)).toEqual([]);
  });

  test('the rules catch a descriptor without a unit, without a bound, or cut short', () => {
    expect(problems({ name: 'overhangProjection', kind: 'number', min: 0, max: 10, description: 'depth' }, paramHelp({ name: 'overhangProjection', kind: 'number', min: 0, max: 10, description: 'depth' }))).toEqual([
      'measured in m but declares no unit',
    ]);
    const open: ParamDescriptor = { name: 'albedo', kind: 'number', min: 0, description: 'reflectance' };
    expect(problems(open, paramHelp(open))).toContain('no lower or upper bound');
    const long: ParamDescriptor = { name: 'mode', kind: 'choice', choices: ['a', 'b'], description: 'x'.repeat(600) };
    expect(problems(long, paramHelp(long))).toEqual(expect.arrayContaining(['cut at 512 characters']));
  });
});

describe('date-time results say how to format them', () => {
  const meta = functionsMetadata(FUNCTIONS, HOST);

  test('SUNRISE, SOLARNOON and SUNSET are declared date-time results, and so is every function so declared', () => {
    const dateTimes = FUNCTIONS.filter((f) => f.result.kind === 'dateTime').map((f) => f.name);
    expect(dateTimes).toEqual(expect.arrayContaining(['SUNRISE', 'SOLARNOON', 'SUNSET']));
    for (const name of dateTimes) expect(meta.functions.find((f) => f.id === name)!.description).toMatch(/format the cell as a date and time \(custom number format yyyy-mm-dd hh:mm\)/);
  });

  test('a column of date-times in a spilled year (the quantity "stamp") says its format too', () => {
    const withStamp = FUNCTIONS.flatMap((fn) => fn.params.filter((p) => p.choices?.includes('stamp')).map((p) => [fn.name, paramHelp(p)] as const));
    expect(withStamp.length).toBeGreaterThanOrEqual(2);
    for (const [, text] of withStamp) expect(text).toMatch(/stamp[^;]*yyyy-mm-dd hh:mm/);
  });
});
