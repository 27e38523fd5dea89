/**
 * The help deployed with the add-in (scripts/helpPages.ts, emitted into dist/help/ by the build):
 * every function's helpUrl in the BUILT dist/functions.json leads to a page in dist/ that names the
 * function, shows every argument with its unit and allowed values, an example formula, the outside
 * check and the caution; date-time results say which number format to apply; the built pages are
 * exactly what the registry gives today, and no JavaScript ships with them.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { helpPagePath } from '../../src/functions/metadata';
import { CAUTION } from '../../src/outputs/caution';
import { FUNCTIONS, NAMESPACE, unitWords } from '../../src/registry';
import { escapeHtml, helpFiles } from '../../scripts/helpPages';
// eslint-disable-next-line @typescript-eslint/no-require-imports -- the build's own CommonJS helper
const { resolveHost } = require('../../scripts/manifest-host.js') as { resolveHost: (v: string | undefined) => string };

const DIST = path.resolve(__dirname, '../../dist');
const HOST = resolveHost(process.env.SUNPANE_HOST);

function distText(rel: string): string {
  const file = path.join(DIST, rel);
  if (!fs.existsSync(file)) throw new Error(`dist/${rel} is missing: run \`npm run build\` (npm test does it in pretest)`);
  return fs.readFileSync(file, 'utf8');
}

interface BuiltFunction {
  id: string;
  helpUrl?: string;
}
const built = (JSON.parse(distText('functions.json')) as { functions: BuiltFunction[] }).functions;

describe('the help pages in dist/', () => {
  test('dist/help/ holds exactly the pages the registry gives: one per function, the index and the stylesheet', () => {
    const expected = helpFiles();
    const onDisk = fs.readdirSync(path.join(DIST, 'help')).map((n) => `help/${n}`);
    expect(onDisk.sort()).toEqual([...expected.keys()].sort());
    const stale = [...expected].filter(([rel, content]) => distText(rel) !== content).map(([rel]) => rel);
    expect(stale).toEqual([]);
    expect(onDisk.filter((f) => !/\.(html|css)$/.test(f))).toEqual([]);
  });

  test.each(FUNCTIONS.map((f) => [f.name, f] as const))("%s: its helpUrl leads to its page, which shows the function, every argument's unit and range, an example and the outside check", (name, fn) => {
    const entry = built.find((f) => f.id === name);
    expect(entry?.helpUrl).toBe(`${HOST}/${helpPagePath(name)}`);
    const rel = entry!.helpUrl!.slice(HOST.length + 1);
    const html = distText(rel);
    expect(html).toContain(`<title>${name} — `);
    expect(html).toContain(`<h1>${name}</h1>`);
    expect(html).toContain(`=${NAMESPACE}.${name}(`);
    for (const p of fn.params) {
      const section = html.slice(html.indexOf(`<section class="argument" id="arg-${p.name}">`));
      expect(section).toMatch(new RegExp(`^<section class="argument" id="arg-${p.name}">\\n<h3><code>${p.name}</code>`));
      const body = section.slice(0, section.indexOf('</section>'));
      expect(body).toContain(`<dt>Unit</dt><dd>${escapeHtml(unitWords(p))}</dd>`);
      expect(body).toMatch(/<dt>Allowed<\/dt><dd>[^<]+/);
    }
    expect(fn.examples?.length).toBeGreaterThan(0);
    for (const ex of fn.examples ?? []) expect(html).toContain(`<pre class="formula"><code>${escapeHtml(`=${NAMESPACE}.${name}(${ex.args.join(', ')})`)}</code></pre>`);
    expect(html).toContain(escapeHtml(fn.outsideCheck.source));
    expect(html).toContain(CAUTION);
    if (fn.result.kind === 'dateTime') expect(html).toMatch(/format the cell as a date and time \(custom number format yyyy-mm-dd hh:mm\)/);
  });

  test('the index links every function page, and every link of every page leads to a file in dist/help/', () => {
    const index = distText('help/index.html');
    for (const fn of FUNCTIONS) expect(index).toContain(`<a href="${fn.name}.html">${fn.name}</a>`);
    expect(index).toContain(CAUTION);
    for (const [rel, content] of helpFiles()) {
      if (!rel.endsWith('.html')) continue;
      for (const [, href] of content.matchAll(/\bhref="([^"]+)"/g)) {
        expect({ rel, href, exists: !/^[a-z]+:/i.test(href) && fs.existsSync(path.join(DIST, 'help', href)) }).toEqual({ rel, href, exists: true });
      }
    }
  });

  test('every page whose result holds date-time serials says which number format to apply', () => {
    // Declared date-time results; the step tables (their first rows are date-times in the value
    // column); the hourly year with its "stamp" column.
    const holding = FUNCTIONS.filter((f) => f.result.kind === 'dateTime' || (f.result.columns?.includes('method') && f.result.columns.includes('unit')) || f.params.some((p) => p.choices?.includes('stamp')));
    expect(holding.map((f) => f.name)).toEqual(expect.arrayContaining(['SUNRISE', 'SOLARNOON', 'SUNSET', 'SOLARGAINSTEPS', 'GAINSTEPS', 'SOLARGAINYEAR', 'WINDOWYEAR']));
    for (const fn of holding) expect({ fn: fn.name, says: distText(helpPagePath(fn.name)).includes('yyyy-mm-dd hh:mm') }).toEqual({ fn: fn.name, says: true });
  });

  test('an example date is typed as a quoted text, as a cell needs it (2003-10-17 bare would be a subtraction)', () => {
    const bare = FUNCTIONS.flatMap((fn) => (fn.examples ?? []).flatMap((ex) => ex.args.filter((a) => /^\d{4}-\d\d-\d\d/.test(a.trim())).map((a) => `${fn.name}: ${a}`)));
    expect(bare).toEqual([]);
  });

  test("the add-in's support page (the manifest's help address) leads to the function help", () => {
    const hrefs = [...distText('assets/support.html').matchAll(/\bhref="([^"]+)"/g)].map((m) => path.join(DIST, 'assets', m[1]));
    expect(hrefs).toContain(path.join(DIST, 'help', 'index.html'));
    for (const file of hrefs) expect(fs.existsSync(file)).toBe(true);
  });

  test('no help text enters the add-in bundle', () => {
    const bundle = distText('taskpane.js');
    expect(bundle).not.toContain('Tests in the Sunpane source');
    expect(bundle).not.toContain(FUNCTIONS[0].outsideCheck.source.slice(0, 40));
  });
});
