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
