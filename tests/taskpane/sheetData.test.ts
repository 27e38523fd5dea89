/** Reading what the form points at on the user's sheets, in node against the fake Excel host. */
import { SunpaneError } from '../../src/core/common/errors';
import { initialValues } from '../../src/taskpane/fields';
import type { RunBatch } from '../../src/taskpane/resultSheets';
import { angleTableOf, readNamedTable, readSheetData } from '../../src/taskpane/sheetData';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost } = require('../browser/excel-host.js');

function setup() {
  const { Excel, host } = createExcelHost();
  const run: RunBatch = (batch) => Excel.run(batch);
  return { run, host };
}

describe('sheet data for the form', () => {
  test('an angle table may have a text header row; blank rows are skipped', () => {
    expect(angleTableOf([['Angle', 'SHGC'], [0, 0.5], ['', ''], [60, '0.4'], [90, 0]])).toEqual({ angles: [0, 60, 90], values: [0.5, 0.4, 0] });
    expect(() => angleTableOf([[0], [10]])).toThrow(SunpaneError);
  });

  test('the skyline, the angle table and both weather columns are read in one request from their sheets', async () => {
    const { run, host } = setup();
    host.addUserSheet('Site', [[10, 0, 0.55], [20, 40, 0.5], [15, 70, 0.3], ['', 90, 0]]);
    host.addUserSheet('My weather', [[800, 100], [0, 0], ['', 50]]);
    const syncsBefore = host.state.syncs.length;
    const data = await readSheetData(run, {
      ...initialValues(),
      skylineAddress: 'Site!A1:A4',
      glassModel: 'table',
      angleTableAddress: 'Site!B1:C4',
      weatherSource: 'measured',
      dniAddress: "'My weather'!A1:A3",
      dhiAddress: "'My weather'!B1:B3",
    });
    expect(host.state.syncs.length - syncsBefore).toBe(1);
    expect(data).toEqual({
      skyline: [10, 20, 15],
      angleTable: { angles: [0, 40, 70, 90], values: [0.55, 0.5, 0.3, 0] },
      weatherRanges: {
        columns: {
          dni: { address: "'My weather'!A1:A3", topRow: 1, values: [[800], [0], ['']] },
          dhi: { address: "'My weather'!B1:B3", topRow: 1, values: [[100], [0], [50]] },
        },
      },
    });
  });

  test('a range on a sheet that does not exist is reported naming the field', async () => {
    const { run, host } = setup();
    host.addUserSheet('Active', [[1], [2], [3]]);
    await expect(readSheetData(run, { ...initialValues(), skylineAddress: 'Nowhere!A1:A4' })).rejects.toThrow(/^skyline = "Nowhere!A1:A4" is not allowed: must point at cells that exist/);
    await expect(readSheetData(run, { ...initialValues(), weatherSource: 'measured', dniAddress: 'A1:A3', dhiAddress: 'Gone!B1:B3' })).rejects.toThrow(/^dhi = "Gone!B1:B3" is not allowed/);
  });

  test('a schedule table is read by name, header first; an unknown name says what to do', async () => {
    const { run, host } = setup();
    host.addUserSheet('W', [['Window', 'Faces'], ['A', 90]]);
    host.addUserTable('W', 'A1:B2', 'WindowList');
    expect(await readNamedTable(run, ' windowlist ')).toEqual([['Window', 'Faces'], ['A', 90]]);
    await expect(readNamedTable(run, 'Other')).rejects.toThrow('table = "Other" is not allowed: must be the name of an Excel table in this workbook');
  });
});
