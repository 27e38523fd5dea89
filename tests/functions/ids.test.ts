/**
 * Released worksheet-function ids never disappear or change: a workbook with `=SUNPANE.NAME(...)`
 * must keep working after an update. The committed list is tests/functions/released-ids.json; new
 * ids are added to it with
 *   node -r ts-node/register/transpile-only scripts/released-ids.ts --update
 * (see DEVELOPERS.md, "Adding a worksheet function").
 */
import { RELEASED_IDS_FILE, compareIds, readReleased } from '../../scripts/released-ids';
import { FUNCTIONS } from '../../src/registry';

describe('released function ids', () => {
  const released = readReleased(RELEASED_IDS_FILE).ids;

  test('every released id is still registered under exactly the same name', () => {
    expect(compareIds(released, FUNCTIONS.map((f) => f.name)).missing).toEqual([]);
  });

  test('the released list has no repeated ids and only ids Excel accepts', () => {
    expect(new Set(released).size).toBe(released.length);
    for (const id of released) expect(id).toMatch(/^[A-Z]+$/);
  });

  test('a removed or renamed id is reported as missing; a new one as unreleased', () => {
    expect(compareIds(['SUNUP', 'SUNDOWN'], ['SUNUP', 'SUNDOWNTIME'])).toEqual({ missing: ['SUNDOWN'], unreleased: ['SUNDOWNTIME'] });
    expect(compareIds(['SUNUP'], ['SUNUP'])).toEqual({ missing: [], unreleased: [] });
  });
});
