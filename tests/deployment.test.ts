/**
 * What the production build (dist/, from `npm run build` in pretest) ships: no source maps, and
 * pages whose Content-Security-Policy allows only what they load. The browser test
 * (tests/browser/look.browser.test.ts) checks that Chromium enforces the policy and that the pane
 * runs under it without a single violation.
 */
import { createHash } from 'node:crypto';
import * as fs from 'node:fs';
import * as path from 'node:path';

const DIST = path.resolve(__dirname, '..', 'dist');
/** A tag's src attribute, quoted or not (the build writes compact HTML). */
const SRC = /\bsrc="?([^"\s>]+)"?/;

function distFile(name: string): string {
  const file = path.join(DIST, name);
  if (!fs.existsSync(file)) throw new Error(`dist/${name} is missing: run \`npm run build\` (npm test does it in pretest)`);
  return fs.readFileSync(file, 'utf8');
}

function allFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? allFiles(path.join(dir, e.name)) : [path.join(dir, e.name)]));
}

/** The policy of a page's `<meta http-equiv="Content-Security-Policy">`, as directive → sources. */
function policyOf(html: string): Map<string, string[]> {
  const metas = [...html.matchAll(/<meta\s+http-equiv="?Content-Security-Policy"?\s+content="([^"]+)"/gi)];
  expect(metas).toHaveLength(1);
  // The policy must come before anything it governs.
  expect(html.indexOf(metas[0][0])).toBeLessThan(Math.min(...['<script', '<link', '<style'].map((t) => (html.includes(t) ? html.indexOf(t) : Infinity))));
  const out = new Map<string, string[]>();
  for (const part of metas[0][1].split(';')) {
    const [name, ...sources] = part.trim().split(/\s+/);
    if (name) out.set(name, sources);
  }
  return out;
}

/** True when `url` (absolute or relative to the page) is allowed by `sources`. */
function allows(sources: readonly string[], url: string): boolean {
  if (!/^https?:/.test(url)) return sources.includes("'self'");
  const { origin } = new URL(url);
  return sources.some((s) => s === origin || (s.endsWith('/') && url.startsWith(s)));
}

describe('the production build', () => {
  test('ships no source maps: no .map files and no sourceMappingURL comments', () => {
    const files = allFiles(DIST);
    expect(files.filter((f) => f.endsWith('.map'))).toEqual([]);
    for (const f of files.filter((x) => x.endsWith('.js') || x.endsWith('.css'))) expect(fs.readFileSync(f, 'utf8')).not.toMatch(/sourceMappingURL/);
  });

  test('the pane page (also the functions page of the shared runtime) allows only its own files and office.js', () => {
    const html = distFile('taskpane.html');
    const policy = policyOf(html);
    expect(policy.get('default-src')).toEqual(["'none'"]);
    const scriptSrc = policy.get('script-src') ?? [];
    expect(scriptSrc).not.toContain("'unsafe-inline'");
    expect(scriptSrc).not.toContain("'unsafe-eval'");
    expect(policy.get('style-src')).toEqual(["'self'"]);
    expect(policy.get('object-src')).toEqual(["'none'"]);
    expect(policy.get('base-uri')).toEqual(["'none'"]);
    // Every script and stylesheet the page names is allowed, and there is nothing inline.
    const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/g)];
    expect(scripts.length).toBeGreaterThanOrEqual(2);
    for (const [, attrs, body] of scripts) {
      const src = SRC.exec(attrs)?.[1];
      expect(src).toBeDefined();
      expect(body.trim()).toBe('');
      expect({ src, allowed: allows(scriptSrc, src!) }).toEqual({ src, allowed: true });
    }
    expect(scripts.map(([, a]) => SRC.exec(a)![1])).toContain('https://appsforoffice.microsoft.com/lib/1/hosted/office.js');
    const sheets = [...html.matchAll(/<link\b[^>]*rel="?stylesheet"?[^>]*href="?([^"\s>]+)"?/g)].map((m) => m[1]);
    expect(sheets).toEqual(['taskpane.css']);
    expect(fs.existsSync(path.join(DIST, 'taskpane.css'))).toBe(true);
    expect(html).not.toMatch(/<style|\sstyle="|\son[a-z]+="/i);
  });

  test('the function help pages (dist/help/) allow nothing but their stylesheet from our origin, and run no script', () => {
    const pages = fs.readdirSync(path.join(DIST, 'help')).filter((n) => n.endsWith('.html'));
    expect(pages.length).toBeGreaterThan(10);
    expect(pages).toContain('index.html');
    for (const name of pages) {
      const html = distFile(`help/${name}`);
      const policy = policyOf(html);
      expect(policy.get('default-src')).toEqual(["'none'"]);
      expect(policy.has('script-src')).toBe(false);
      expect(policy.get('style-src')).toEqual(["'self'"]);
      expect(policy.get('base-uri')).toEqual(["'none'"]);
      expect(html).not.toMatch(/<script|<style|\sstyle=|\son[a-z]+=|<iframe|<object|<embed/i);
      const sheets = [...html.matchAll(/<link\b[^>]*rel="?stylesheet"?[^>]*href="?([^"\s>]+)"?/g)].map((m) => m[1]);
      expect(sheets).toEqual(['help.css']);
    }
    expect(fs.existsSync(path.join(DIST, 'help', 'help.css'))).toBe(true);
  });

  test('the help page allows nothing but its own inline style, by hash', () => {
    const html = distFile('assets/support.html');
    const policy = policyOf(html);
    expect(policy.get('default-src')).toEqual(["'none'"]);
    expect(policy.has('script-src')).toBe(false);
    const styles = [...html.matchAll(/<style>([\s\S]*?)<\/style>/g)].map((m) => `'sha256-${createHash('sha256').update(m[1]).digest('base64')}'`);
    expect(styles).toHaveLength(1);
    expect(policy.get('style-src')).toEqual(styles);
  });
});
