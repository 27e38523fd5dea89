/** The README's function reference is generated from the registry and must not go stale. */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { withReference } from '../../scripts/reference';

test('the committed README function reference matches the registry (run `npm run docs` to update)', () => {
  const readme = fs.readFileSync(path.resolve(__dirname, '../../README.md'), 'utf8');
  expect(readme).toBe(withReference(readme));
});

test('the README opens with the job paragraph and gives the two fresh-machine commands', () => {
  const readme = fs.readFileSync(path.resolve(__dirname, '../../README.md'), 'utf8');
  const firstParagraph = readme.split('\n').find((l) => l.trim() !== '' && !l.startsWith('#')) ?? '';
  expect(firstParagraph.length).toBeGreaterThan(200);
  expect(readme).toContain('npm ci && npm run demo');
  expect(readme).toContain('npm ci && npm test');
});
