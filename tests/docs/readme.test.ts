/** The README is for a person: it opens with the job and gives the two fresh-machine commands. */
import * as fs from 'node:fs';
import * as path from 'node:path';

const README = fs.readFileSync(path.resolve(__dirname, '../../README.md'), 'utf8');

test('the README opens with the job paragraph and gives the two fresh-machine commands', () => {
  const firstParagraph = README.split('\n').find((l) => l.trim() !== '' && !l.startsWith('#')) ?? '';
  expect(firstParagraph.length).toBeGreaterThan(200);
  expect(README).toContain('npm ci && npm run demo');
  expect(README).toContain('npm ci && npm test');
});

test('the README points to the generated function reference instead of carrying it', () => {
  expect(README).toContain('docs/functions.md');
  expect(README).not.toContain('<!-- reference:start');
});

test('the README stays short: at most 15,000 bytes', () => {
  expect(Buffer.byteLength(README, 'utf8')).toBeLessThanOrEqual(15_000);
});

test('the README carries the safety caution', () => {
  expect(README).toMatch(/results are estimates by published methods/i);
  expect(README).toContain('design decisions need a qualified engineer and the local energy code');
});

test('every picture the README shows is in docs/images and under 200 KB (`npm run pictures` makes them)', () => {
  const pictures = [...README.matchAll(/(?:!\[[^\]]*\]\(|src=")(docs\/images\/[^)"]+)/g)].map((m) => m[1]);
  expect(pictures.length).toBeGreaterThanOrEqual(2);
  for (const p of pictures) {
    const file = path.resolve(__dirname, '../..', p);
    expect(fs.existsSync(file)).toBe(true);
    expect(fs.statSync(file).size).toBeLessThan(200 * 1024);
  }
});
