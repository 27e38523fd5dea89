/**
 * The released worksheet-function ids (tests/functions/released-ids.json). A workbook that uses
 * `=SUNPANE.NAME(...)` breaks if NAME disappears or is renamed, so once an id is released it must
 * stay; tests/functions/ids.test.ts enforces it.
 *
 * Usage:
 *   node -r ts-node/register/transpile-only scripts/released-ids.ts           check: lists missing and unreleased ids
 *   node -r ts-node/register/transpile-only scripts/released-ids.ts --update  adds every registered id not yet listed
 * `--update` only ever adds: it never removes an id (removing one needs a deliberate hand edit and
 * a major version).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { FUNCTIONS } from '../src/registry';

export const RELEASED_IDS_FILE = path.resolve(__dirname, '../tests/functions/released-ids.json');

export interface ReleasedIds {
  /** Ids in the order they were released. */
  ids: string[];
}

/** Reads the committed list. */
export function readReleased(file = RELEASED_IDS_FILE): ReleasedIds {
  const data = JSON.parse(fs.readFileSync(file, 'utf8')) as ReleasedIds;
  if (!Array.isArray(data.ids) || !data.ids.every((id) => typeof id === 'string')) throw new Error(`${file}: expected { "ids": [string, ...] }`);
  return data;
}

/**
 * Compares the released ids with the registered ones.
 * @param released - the committed list
 * @param registered - the worksheet names in the registry now
 * @returns `missing`: released ids no longer registered (a breaking change); `unreleased`:
 *   registered ids not yet in the list (added by `--update`)
 */
export function compareIds(released: readonly string[], registered: readonly string[]): { missing: string[]; unreleased: string[] } {
  const now = new Set(registered);
  const before = new Set(released);
  return { missing: released.filter((id) => !now.has(id)), unreleased: registered.filter((id) => !before.has(id)) };
}

function run(argv: readonly string[]): number {
  const released = readReleased();
  const { missing, unreleased } = compareIds(released.ids, FUNCTIONS.map((f) => f.name));
  if (missing.length > 0) {
    process.stderr.write(`released ids no longer registered (workbooks using them would break): ${missing.join(', ')}\n`);
    return 1;
  }
  if (argv.includes('--update')) {
    const next: ReleasedIds = { ids: [...released.ids, ...unreleased] };
    fs.writeFileSync(RELEASED_IDS_FILE, `${JSON.stringify(next, null, 2)}\n`);
    process.stdout.write(unreleased.length > 0 ? `added ${unreleased.length} id(s): ${unreleased.join(', ')}\n` : 'nothing to add\n');
    return 0;
  }
  process.stdout.write(unreleased.length > 0 ? `not yet released (run with --update to add): ${unreleased.join(', ')}\n` : `all ${released.ids.length} released ids are registered\n`);
  return 0;
}

if (require.main === module) process.exitCode = run(process.argv.slice(2));
