/**
 * Every mention of a Markdown file (`*.md`, optionally with a `#section`) in the code, the tests,
 * the scripts, the docs and the root documents names a file that is in this repository — and, when
 * a section is given, a heading of that file. A comment can therefore never again cite a document
 * that a person who clones the repository does not have.
 *
 * A mention resolves relative to the file it is in, or to the repository root. Web addresses
 * (http/https) are left alone: they cite public pages, not files.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';

const ROOT = path.resolve(__dirname, '../..');
/** Folders and root files that are scanned. */
const SCAN = ['src', 'tests', 'bench', 'scripts', 'docs', 'examples', '.ci', 'README.md', 'DEVELOPERS.md', 'webpack.config.js', 'eslint.config.js', 'jest.config.js', '.dependency-cruiser.js', 'manifest.xml', 'package.json'];
/** Files whose mentions are not paths from where they stand: the reference generator writes links relative to the pages it makes, and those pages are scanned. */
const EXEMPT = new Set(['scripts/functionDocs.ts']);
const SKIP_DIRS = new Set(['node_modules', 'lib', 'dist', 'out', 'test-artifacts', 'coverage', '.git']);
const TEXT = /\.(ts|js|cjs|mjs|json|md|html|xml|csv|txt|sh)$|^run$/;

/** A Markdown file name (path characters, ending in a letter, digit, `_` or `-` before `.md`) and an optional section. */
const MENTION = /(?<![\w./-])([\w./-]*[\w-]\.md)(?:#([\w-]+))?(?![\w])/g;
const URL_PATTERN = /\bhttps?:\/\/\S+/g;

function filesUnder(rel: string): string[] {
  const abs = path.join(ROOT, rel);
  if (!fs.existsSync(abs)) return [];
  const stat = fs.statSync(abs);
  if (stat.isFile()) return [rel];
  const out: string[] = [];
  for (const entry of fs.readdirSync(abs, { withFileTypes: true })) {
    if (entry.isDirectory()) {
      if (!SKIP_DIRS.has(entry.name)) out.push(...filesUnder(path.join(rel, entry.name)));
    } else if (TEXT.test(entry.name)) {
      out.push(path.join(rel, entry.name));
    }
  }
  return out;
}

/** GitHub's heading anchor: lower case, punctuation dropped, spaces to hyphens. */
export function slug(heading: string): string {
  return heading
    .trim()
    .toLowerCase()
    .replace(/[^\p{L}\p{N}\s_-]/gu, '')
    .replace(/\s/g, '-');
}

function anchorsOf(file: string): Set<string> {
  const anchors = new Set<string>();
  let fenced = false;
  for (const line of fs.readFileSync(file, 'utf8').split('\n')) {
    if (/^\s*```/.test(line)) fenced = !fenced;
    const m = !fenced && /^#{1,6}\s+(.*?)\s*#*\s*$/.exec(line);
    if (m) anchors.add(slug(m[1].replace(/`/g, '')));
  }
  return anchors;
}

export interface Mention {
  file: string;
  line: number;
  target: string;
  section?: string;
  problem?: string;
}

/** The Markdown mentions of one text, each with the reason it does not resolve (if it does not). */
export function checkMentions(file: string, text: string): Mention[] {
  const out: Mention[] = [];
  const lines = text.replace(URL_PATTERN, (u) => ' '.repeat(u.length)).split('\n');
  lines.forEach((lineText, i) => {
    for (const m of lineText.matchAll(MENTION)) {
      const target = m[1];
      const section = m[2];
      const candidates = [path.resolve(ROOT, path.dirname(file), target), path.resolve(ROOT, target)];
      const found = candidates.find((c) => (c === ROOT || c.startsWith(ROOT + path.sep)) && fs.existsSync(c) && fs.statSync(c).isFile());
      let problem: string | undefined;
      if (!found) problem = 'no such file in the repository';
      else if (section !== undefined && !anchorsOf(found).has(section)) problem = `no heading with the anchor #${section} in ${path.relative(ROOT, found)}`;
      out.push({ file, line: i + 1, target, section, problem });
    }
  });
  return out;
}

describe('mentions of Markdown files', () => {
  const files = SCAN.flatMap(filesUnder).filter((f) => !EXEMPT.has(f));
  const mentions = files.flatMap((f) => checkMentions(f, fs.readFileSync(path.join(ROOT, f), 'utf8')));

  test('every scanned file is read and the docs are among them', () => {
    expect(files).toEqual(expect.arrayContaining(['README.md', 'DEVELOPERS.md', 'docs/architecture.md', 'src/core/sun/spa.ts']));
    expect(mentions.length).toBeGreaterThan(20);
  });

  test('every mentioned Markdown file exists in the repository, with the section named', () => {
    const broken = mentions.filter((m) => m.problem).map((m) => `${m.file}:${m.line}: ${m.target}${m.section ? `#${m.section}` : ''} — ${m.problem}`);
    expect(broken).toEqual([]);
  });

  test('the checker itself refuses a file outside the repository, a missing file and a missing section', () => {
    // Built from pieces so that this file itself does not mention them.
    const md = '.' + 'md';
    const probe = checkMentions('src/core/sun/spa.ts', `see DESIGN${md} and /elsewhere/NOTES${md}, docs/conventions${md}#no-such-heading; fine: docs/conventions${md}#hourly-rows, https://example.org/X${md}`);
    expect(probe.map((m) => [m.target, m.problem !== undefined])).toEqual([
      [`DESIGN${md}`, true],
      [`/elsewhere/NOTES${md}`, true],
      ['docs/conventions.md', true],
      ['docs/conventions.md', false],
    ]);
  });

  test('anchors follow the heading text', () => {
    expect(slug('Air mass: Kasten & Young (1989)')).toBe('air-mass-kasten--young-1989');
    expect(slug('Hourly rows')).toBe('hourly-rows');
  });
});
