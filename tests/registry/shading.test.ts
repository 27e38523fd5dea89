/**
 * Shading worksheet functions (src/registry/shading.ts): formula → result tables through the one
 * broadcasting helper, as a cell would call them. Expected numbers come from the closed forms of long
 * devices (shadow depth P·tan Ω, width P·|tan γ|; ASHRAE Handbook—Fundamentals, "Fenestration",
 * exterior shading — from memory) worked by hand in each row's comment; tolerance 1e-9.
 */
import { SunpaneError } from '../../src/core/common/errors';
import { parseCliArg } from '../../src/cli/args';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import { NotAvailable, type OutTable } from '../../src/registry/types';

function call(formula: string): OutTable {
  const m = /^(\w+)\((.*)\)$/.exec(formula);
  if (!m) throw new Error(formula);
  const fn = findFunction(m[1]);
  if (!fn) throw new Error(`no function ${m[1]}`);
  const args = m[2].match(/(\{[^}]*\}|[^,]+|(?<=,)(?=,|$))/g) ?? [];
  return applyFunction(fn, args.map((a) => parseCliArg(a)));
}

describe('formula → result', () => {
  test.each([
    // Long overhang: 1 − (P tan Ω − G)/H = 1 − (1·1 − 0.2)/1.5
    ['OVERHANGSUNLIT(45,180,180,2,1.5,1,0.2,100,100)', 1 - 0.8 / 1.5],
    // Shadow above the head only (P tan Ω = 0.2 ≤ G = 0.5): all sunlit
    ['OVERHANGSUNLIT(45,180,180,2,1.5,0.2,0.5)', 1],
    // Tall right fin, γ = 45° to the right: 1 − (1 − 0.5)/2
    ['FINSUNLIT(30,135,180,2,1.5,0,1,0.5,100,100)', 0.75],
    ['FINSUNLIT(30,225,180,2,1.5,0,1,0.5,100,100)', 1],
    // Left fin with the sun 45° to the left (west on a south wall)
    ['FINSUNLIT(30,225,180,2,1.5,1,0,0.5,100,100)', 0.75],
    // Reveal alone, sun normal at 45°: 1 − R tan β / H = 1 − 0.3/1.5
    ['SUNLITFRACTION(45,180,180,2,1.5,,,,,,,,,,,0.3)', 0.8],
    // Skyline of 30° all round hides a sun at 20°
    ['SUNLITFRACTION(20,180,180,2,1.5,,,,,,,,,,,,{30})', 0],
    ['SHADOWDEPTH(45,180,180,1.5)', 1.5],
    // tan Ω = tan 45° / cos 60° = 2
    ['SHADOWDEPTH(45,240,180,1)', 2],
    ['SHADOWWIDTH(30,135,180,2)', 2],
  ])('%s = %p', (formula, expected) => {
    const out = call(formula);
    expect(out).toHaveLength(1);
    expect(Math.abs((out[0][0] as number) - expected)).toBeLessThan(1e-9);
  });

  test('the sun behind the wall gives 0 for the fractions and #N/A for the shadow sizes', () => {
    expect(call('SUNLITFRACTION(30,0,180,1,1)')[0][0]).toBe(0);
    expect(call('SHADOWDEPTH(30,0,180,1)')[0][0]).toBeInstanceOf(NotAvailable);
    expect(call('SHADOWWIDTH(-5,180,180,1)')[0][0]).toBeInstanceOf(NotAvailable);
  });

  test('ranges broadcast: a column of sun altitudes gives a column of fractions', () => {
    const out = applyFunction(findFunction('OVERHANGSUNLIT')!, [[[30], [45], [60]], 180, 180, 2, 1.5, 1, 0, 100, 100]);
    expect(out.map((r) => r[0] as number).map((v) => Number(v.toFixed(9)))).toEqual([1 - Math.tan(Math.PI / 6) / 1.5, 1 - 1 / 1.5, 0].map((v) => Number(v.toFixed(9))));
  });

  test('SUNLITMASK spills 12 rows × 24 columns', () => {
    const out = call('SUNLITMASK(51.5,-0.1,0,180,1.2,1.5,0.8,0.1,0.3,0.3)');
    expect(out).toHaveLength(12);
    for (const row of out) expect(row).toHaveLength(24);
  });

  test('every example runs and, where its note starts with a number, gives that number (4 decimals)', () => {
    for (const name of ['OVERHANGSUNLIT', 'FINSUNLIT', 'SUNLITFRACTION', 'SHADOWDEPTH', 'SHADOWWIDTH', 'SUNLITMASK']) {
      const fn = findFunction(name)!;
      for (const ex of fn.examples ?? []) {
        const out = applyFunction(fn, ex.args.map((a) => parseCliArg(a)));
        expect(out.flat().some((c) => c instanceof SunpaneError)).toBe(false);
        const lead = /^(-?\d+(\.\d+)?):/.exec(ex.note);
        if (lead) expect(Math.abs((out[0][0] as number) - Number(lead[1]))).toBeLessThan(5e-5);
      }
    }
  });
});

describe('cross-argument refusals name an argument', () => {
  test('an overhang narrower than nothing', () => {
    const cell = call('OVERHANGSUNLIT(45,180,180,1,1,1,0,-0.8,-0.5)')[0][0];
    expect(cell).toBeInstanceOf(SunpaneError);
    expect((cell as SunpaneError).argument).toBe('overhangExtensionLeft');
  });

  test('fins shorter than nothing', () => {
    const cell = call('FINSUNLIT(45,180,180,1,1,1,1,0,-0.6,-0.6)')[0][0];
    expect(cell).toBeInstanceOf(SunpaneError);
    expect((cell as SunpaneError).argument).toMatch(/^finExtension/);
    const full = call('SUNLITFRACTION(45,180,180,1,1,,,,,,,,,-2,0.5)')[0][0];
    expect((full as SunpaneError).argument).toBe('finExtensionAbove');
  });
});
