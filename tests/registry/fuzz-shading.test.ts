/**
 * Property fuzzing from the registry, part "shading" (see tests/support/registryFuzz.ts for the
 * generators, the properties and the run counts; docs/testing.md for running larger counts), and
 * the diffuse-shading path at the edges the random draws rarely reach.
 */
import fc from 'fast-check';
import { SunpaneError } from '../../src/core/common/errors';
import { applyFunction } from '../../src/registry/evaluate';
import { FUNCTIONS } from '../../src/registry';
import { NotAvailable, type OutTable } from '../../src/registry/types';
import { fuzzPart, messagesInUsersWords } from '../support/registryFuzz';

fuzzPart('shading', 'tests/registry/fuzz-shading.test.ts');

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
      { numRuns: 200, seed: 20261212 },
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
          const hour = [`2026-03-21T${String(r.hour).padStart(2, '0')}:30`, 40, -105, -7, 200, 1.2, 1.5, 0.6, 300, 45, 0.4, 2.3, 2, 0.1, 0.2, r.model, 90, 1];
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
      { numRuns: 100, seed: 20261213 },
    );
  });
});

messagesInUsersWords('shading');
