/** `npm run docs`: rewrites the generated function reference in README.md. */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { withReference } from './reference';

const file = path.resolve(__dirname, '../README.md');
fs.writeFileSync(file, withReference(fs.readFileSync(file, 'utf8')));
console.log(`README.md: function reference regenerated`);
