/**
 * The glossary's own rules (src/registry/glossary.ts): one name per thing, labels that read back as
 * the name, aliases that never collide, every parameter of every function a glossary name or a
 * function-specific one that no glossary entry uses for something else, and tokens matched
 * whatever their case. Plumbing and wording: no outside source applies.
 */
import { FUNCTIONS } from '../../src/registry';
import { GLOSSARY, WINDOW_FIELDS, choiceFor, nameKey, windowFieldFor } from '../../src/registry/glossary';
import { MAX_DESCRIPTION, MAX_PARAMETER_NAME } from '../../src/functions/metadata';
import { paramHelp } from '../../src/registry';

describe('the glossary', () => {
  test('every name is camelCase and its label reduces to the same key', () => {
    for (const g of Object.values(GLOSSARY)) {
      expect(g.name).toMatch(/^[a-z][A-Za-z0-9]*$/);
      expect(nameKey(g.label)).toBe(nameKey(g.name));
    }
  });

  test('the key of each entry is its name', () => {
    for (const [key, g] of Object.entries(GLOSSARY)) expect(g.name).toBe(key);
  });

  test('names, labels and aliases of the window fields each find their own field, and no other', () => {
    for (const f of WINDOW_FIELDS) {
      for (const written of [f.name, f.label, ...(f.aliases ?? [])]) expect(windowFieldFor(written)?.name).toBe(f.name);
    }
    // matching ignores case, spaces, punctuation and a bracketed unit
    expect(windowFieldFor('  OVERHANG projection (m) ')?.name).toBe('overhangProjection');
    expect(windowFieldFor('Set-back [m]')?.name).toBe('revealDepth');
  });

  test('older words stay accepted as aliases: the pane, schedule and window-file names of before', () => {
    const older: [string, string][] = [
      ['Faces', 'surfaceAzimuth'],
      ['Overhang depth', 'overhangProjection'],
      ['Overhang reach', 'overhangExtension'],
      ['Overhang past left', 'overhangExtensionLeft'],
      ['Fin depth', 'finProjection'],
      ['Left fin depth', 'leftFinProjection'],
      ['Fin rise above head', 'finExtensionAbove'],
      ['Fin drop below sill', 'finExtensionBelow'],
      ['Set-back', 'revealDepth'],
      ['Blind factor', 'interiorAttenuation'],
      ['Frame share', 'frameFraction'],
      ['Ground reflectance', 'groundAlbedo'],
      ['Beam optical depth', 'tauB'],
      ['Diffuse optical depth', 'tauD'],
      ['shgcNormal', 'shgc'],
      ['angles', 'shgcAngles'],
      ['Window', 'name'],
      ['leftFinAbove', 'leftFinExtensionAbove'],
    ];
    for (const [word, name] of older) expect(windowFieldFor(word)?.name).toBe(name);
  });

  test('tokens match whatever their case and punctuation, and the older spellings still work', () => {
    const sky = GLOSSARY.skyModel;
    expect(['perez', 'Perez 1990', 'PEREZ1990', 'perez1990'].map((t) => choiceFor(sky, t))).toEqual(['perez1990', 'perez1990', 'perez1990', 'perez1990']);
    expect(['haydavies', 'Hay–Davies', 'hayDavies', 'HAY DAVIES'].map((t) => choiceFor(sky, t))).toEqual(['hayDavies', 'hayDavies', 'hayDavies', 'hayDavies']);
    expect(choiceFor(sky, 'klucher')).toBeUndefined();
    expect(choiceFor(GLOSSARY.timeConvention, 'hour-ending')).toBe('hourEnding');
    expect(choiceFor(GLOSSARY.timeConvention, 'Instant')).toBe('instant');
  });

  test('every function parameter that shares a glossary name means the glossary thing (same kind and unit)', () => {
    for (const fn of FUNCTIONS) {
      for (const p of fn.params) {
        const g = (GLOSSARY as Record<string, (typeof GLOSSARY)[keyof typeof GLOSSARY]>)[p.name];
        if (!g) continue;
        if (p.kind !== 'numberList' && g.kind !== 'numberList') expect(`${fn.name}.${p.name} ${p.unit ?? ''}`).toBe(`${fn.name}.${p.name} ${g.unit ?? ''}`);
      }
    }
  });

  test('no function parameter takes a glossary alias as its name (one word per thing)', () => {
    const aliases = new Map<string, string>();
    for (const g of Object.values(GLOSSARY)) for (const a of ('aliases' in g ? (g.aliases ?? []) : [])) aliases.set(nameKey(a), g.name);
    // `window` is both the window parameter and an older header of the window's label column
    // ("Window" over the names of a schedule): the one overlap, kept so older schedules read.
    for (const fn of FUNCTIONS) for (const p of fn.params) if (p.kind !== 'window') expect(`${fn.name}.${p.name} → ${aliases.get(nameKey(p.name)) ?? 'ok'}`).toBe(`${fn.name}.${p.name} → ok`);
  });

  test('every parameter help gives its meaning with unit and range within Excel’s limits', () => {
    for (const fn of FUNCTIONS) {
      for (const p of fn.params) {
        expect(p.name.length).toBeLessThanOrEqual(MAX_PARAMETER_NAME);
        const help = paramHelp(p);
        expect(help.length).toBeLessThanOrEqual(MAX_DESCRIPTION);
        if (p.kind === 'number' && (p.min !== undefined || p.max !== undefined)) expect(help).toMatch(/from|above|below|at least|at most/);
        if (p.unit && p.kind === 'number') expect(help).toContain(p.unit);
      }
    }
  });

  test('the window functions take about ten arguments at most; only the older positional forms take more', () => {
    for (const fn of FUNCTIONS) {
      if (fn.supersededBy) {
        expect(FUNCTIONS.some((f) => f.name === fn.supersededBy)).toBe(true);
        continue;
      }
      // The workbook's clock is one range at the end, shared by every function that reads a date-time: not counted.
      const own = fn.params.filter((p, k) => !(p.kind === 'clock' && k === fn.params.length - 1)).length;
      expect(`${fn.name} ${own}`).toBe(`${fn.name} ${Math.min(own, 11)}`);
    }
  });

  test('the clock is one argument, the last, of every function that reads a date-time or gives one', () => {
    for (const fn of FUNCTIONS) {
      const clocks = fn.params.flatMap((p, k) => (p.kind === 'clock' ? [k] : []));
      expect(`${fn.name} ${clocks.length <= 1 && clocks.every((k) => k === fn.params.length - 1)}`).toBe(`${fn.name} true`);
      // a date-time read, a date-time result, or a column of date-times (the hourly year's stamp)
      const dated = fn.params.some((p) => p.kind === 'dateTime' || (p.kind === 'choiceList' && (p.choices ?? []).includes('stamp'))) || fn.result.kind === 'dateTime';
      expect(`${fn.name} ${clocks.length}`).toBe(`${fn.name} ${dated ? 1 : 0}`);
    }
  });
});
