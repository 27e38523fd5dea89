/**
 * Examples an engineer copies are short: no formula in the README, the docs, the registry's examples
 * or the demo workbook leaves two or more arguments blank in a row (`f(a, , , b)`), and the window
 * functions' examples name the window once. Wording only: no outside source applies.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { computeDemo, buildDemoWorkbook } from '../../src/cli/demo';
import { FUNCTIONS, NAMESPACE } from '../../src/registry';

const ROOT = path.resolve(__dirname, '../..');
/** Two blank arguments in a row: a comma, blanks, a comma, blanks, a comma. */
const TWO_BLANKS = /,\s*,\s*,/;

function markdownFiles(): string[] {
  const out = ['README.md'];
  const walk = (dir: string) => {
    for (const e of fs.readdirSync(path.join(ROOT, dir), { withFileTypes: true })) {
      const rel = path.join(dir, e.name);
      if (e.isDirectory()) walk(rel);
      else if (e.name.endsWith('.md')) out.push(rel);
    }
  };
  walk('docs');
  return out;
}

/** Formula calls in a text: `NAMESPACE.NAME(…)` up to the matching parenthesis. */
function calls(text: string): string[] {
  const out: string[] = [];
  const re = new RegExp(`${NAMESPACE}[._]([A-Z]+)\\(`, 'g');
  let m: RegExpExecArray | null;
  while ((m = re.exec(text)) !== null) {
    let depth = 0;
    let i = m.index + m[0].length - 1;
    for (; i < text.length; i++) {
      if (text[i] === '(') depth++;
      if (text[i] === ')' && --depth === 0) break;
    }
    out.push(text.slice(m.index, i + 1));
  }
  return out;
}

describe('formula examples', () => {
  test('no README or docs formula leaves two arguments blank in a row', () => {
    const bad: string[] = [];
    for (const file of markdownFiles()) for (const c of calls(fs.readFileSync(path.join(ROOT, file), 'utf8'))) if (TWO_BLANKS.test(c)) bad.push(`${file}: ${c}`);
    expect(bad).toEqual([]);
  });

  test('no registry example leaves two arguments blank in a row', () => {
    const bad = FUNCTIONS.flatMap((fn) => (fn.examples ?? []).map((ex) => `${fn.name}(${ex.args.join(',')})`)).filter((c) => TWO_BLANKS.test(c));
    expect(bad).toEqual([]);
  });

  test('no demo workbook formula leaves two arguments blank in a row', () => {
    const { workbook } = buildDemoWorkbook(computeDemo());
    const bad: string[] = [];
    let seen = 0;
    for (const ws of workbook.worksheets) {
      if (ws.name.startsWith('Hourly')) continue;
      ws.eachRow((row) =>
        row.eachCell((cell) => {
          const v = cell.value as { formula?: string } | string | null;
          const text = typeof v === 'string' ? v : v && typeof v === 'object' && typeof v.formula === 'string' ? v.formula : '';
          for (const c of calls(text)) {
            seen++;
            if (TWO_BLANKS.test(c)) bad.push(`${ws.name}!${cell.address}: ${c}`);
          }
        }),
      );
    }
    expect(seen).toBeGreaterThan(15);
    expect(bad).toEqual([]);
  });
});
