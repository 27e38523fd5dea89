/**
 * The function reference (docs/functions.md and docs/functions/<NAME>.md) is generated from the
 * registry by `npm run docs` and must not go stale; every function names its outside check, and the
 * test files that check names exist.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { FUNCTIONS } from '../../src/registry';
import { functionPage, generatedDocs, pageMarkdown } from '../../scripts/functionDocs';

const ROOT = path.resolve(__dirname, '../..');

describe('the generated function reference', () => {
  const files = generatedDocs();

  test('has docs/functions.md and one page per registered function', () => {
    expect([...files.keys()].sort()).toEqual(['docs/functions.md', ...FUNCTIONS.map((f) => `docs/functions/${f.name}.md`)].sort());
  });

  test('every committed file matches the registry (run `npm run docs` to update)', () => {
    const stale = [...files].filter(([rel, content]) => !fs.existsSync(path.join(ROOT, rel)) || fs.readFileSync(path.join(ROOT, rel), 'utf8') !== content).map(([rel]) => rel);
    expect(stale).toEqual([]);
  });

  test('docs/functions/ holds no page of a function that is not registered (run `npm run docs`)', () => {
    const pages = fs.readdirSync(path.join(ROOT, 'docs', 'functions')).map((n) => `docs/functions/${n}`);
    expect(pages.filter((p) => !files.has(p))).toEqual([]);
  });

  test('a page shows every argument, the result, each example and the outside check of its function', () => {
    for (const fn of FUNCTIONS) {
      const md = pageMarkdown(functionPage(fn), { level: 1, toRoot: '../../' });
      for (const p of fn.params) expect(md).toContain(`| \`${p.name}\` |`);
      for (const ex of fn.examples ?? []) expect(md).toContain(ex.note);
      expect(md).toContain(fn.outsideCheck.source);
      for (const t of fn.outsideCheck.tests) expect(md).toContain(t);
    }
  });
});

describe('outside checks named in the registry', () => {
  test.each(FUNCTIONS.map((f) => [f.name, f] as const))('%s names a source and existing test files', (_name, fn) => {
    expect(fn.outsideCheck.source.length).toBeGreaterThan(40);
    expect(fn.outsideCheck.tests.length).toBeGreaterThan(0);
    for (const t of fn.outsideCheck.tests) {
      expect(t).toMatch(/^tests\/.+\.ts$/);
      expect(fs.existsSync(path.join(ROOT, t))).toBe(true);
    }
  });

  test('a function in the shared formula table lists that table among its checks', () => {
    const table = fs.readFileSync(path.join(ROOT, 'tests/fixtures/formulas.ts'), 'utf8');
    const inTable = FUNCTIONS.filter((f) => table.includes(`fn: '${f.name}'`));
    expect(inTable.length).toBeGreaterThan(20);
    expect(inTable.filter((f) => !f.outsideCheck.tests.includes('tests/fixtures/formulas.ts')).map((f) => f.name)).toEqual([]);
  });
});
