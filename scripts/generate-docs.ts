/**
 * `npm run docs`: writes the function reference generated from the registry — docs/functions.md and
 * one page per function in docs/functions/ — and removes pages of functions that no longer exist.
 * tests/docs/functions.test.ts fails when the committed files are out of date.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { generatedDocs } from './functionDocs';

const ROOT = path.resolve(__dirname, '..');
const PAGES = path.join(ROOT, 'docs', 'functions');

const files = generatedDocs();
fs.mkdirSync(PAGES, { recursive: true });
let written = 0;
for (const [rel, content] of files) {
  const file = path.join(ROOT, rel);
  if (!fs.existsSync(file) || fs.readFileSync(file, 'utf8') !== content) {
    fs.writeFileSync(file, content);
    written++;
  }
}
let removed = 0;
for (const name of fs.readdirSync(PAGES)) {
  if (name.endsWith('.md') && !files.has(`docs/functions/${name}`)) {
    fs.unlinkSync(path.join(PAGES, name));
    removed++;
  }
}
console.log(`function reference: ${files.size} files, ${written} written, ${removed} removed`);
