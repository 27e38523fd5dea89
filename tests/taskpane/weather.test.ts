/**
 * The pane's hourly weather goes through the command line's reader and checks (src/io/weather.ts):
 * the same weather, spoiled in the same ways, gives the same report in the pane as from a CSV file,
 * word for word but for what the weather is called and a sheet's `row` for a file's `line`. Data:
 * the invented weather year of the example site Brackwater (src/demo/weather.ts).
 */
import { CLI_WEATHER_ADVICE, weatherTableFromCsv } from '../../src/cli/weatherCsv';
import { SunpaneError } from '../../src/core/common';
import { formatSerialIso } from '../../src/core/time';
import { findExampleSite } from '../../src/demo/sites';
import { inventedWeatherYear } from '../../src/demo/weather';
import { checkWeather, describeWeatherCheck } from '../../src/io/weather';
import { initialValues } from '../../src/taskpane/fields';
import type { RunBatch } from '../../src/taskpane/resultSheets';
import { readSheetData, withCheckedWeather } from '../../src/taskpane/sheetData';
import { PANE_WEATHER_SOURCE, checkFormWeather, weatherTableFromRanges } from '../../src/taskpane/weather';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost } = require('../browser/excel-host.js');

const SITE = findExampleSite('brackwater')!.site;
const W = inventedWeatherYear(findExampleSite('brackwater')!, 2026);
const HEADER = ['hour ending', 'direct normal [W/m²]', 'diffuse horizontal [W/m²]'];

/** The invented year with a few faults: a garbled value, a missing row, a repeated hour with other values, light at night. */
function spoiledRows(): string[][] {
  const rows = Array.from(W.dni, (_, i) => [formatSerialIso(W.stampSerial[i]), String(W.dni[i]), String(W.dhi[i])]);
  rows[12][1] = 'oops';
  rows[2][2] = '30';
  rows.splice(700, 0, [rows[699][0], '1', '1']);
  rows.splice(3000, 1);
  return rows;
}

describe('the pane reads weather as the command line does', () => {
  test('the same faults give the same report, word for word, in the pane and from a CSV file', () => {
    const rows = spoiledRows();
    const csv = `${[HEADER, ...rows].map((r) => r.join(',')).join('\n')}\n`;
    const fromFile = checkWeather(weatherTableFromCsv(csv, 'w.csv', { dni: 'direct normal', dhi: 'diffuse horizontal' }), { year: 2026, site: SITE, advice: CLI_WEATHER_ADVICE });
    const fileLines = describeWeatherCheck(fromFile, 'w.csv', CLI_WEATHER_ADVICE);
    const column = (k: number) => ({ address: `Weather!${'ABC'[k]}1:${'ABC'[k]}${rows.length + 1}`, topRow: 1, values: [[HEADER[k]], ...rows.map((r) => [r[k]])] });
    const table = weatherTableFromRanges({ columns: { dni: column(1), dhi: column(2) }, stamps: column(0) });
    const { check, lines } = checkFormWeather(table, initialValues(), SITE, 2026);
    expect(check.unusableHours).toBe(fromFile.unusableHours);
    expect(check.unusableHours).toBe(4);
    expect(fileLines.length).toBeGreaterThan(3);
    expect(lines).toEqual(fileLines.map((l) => l.replace(/^w\.csv/, PANE_WEATHER_SOURCE).replace(/\bline (\d+)/g, 'row $1')));
  });

  test('stamps in date cells (serial numbers) are read; a header cell gives the unit', async () => {
    const { Excel, host } = createExcelHost();
    const run: RunBatch = (batch) => Excel.run(batch);
    host.addUserSheet('Weather', [['Hour ending', 'DNI [W/m²]', 'DHI [W/m²]'], ...Array.from(W.dni, (_, i) => [W.stampSerial[i], W.dni[i], W.dhi[i]])]);
    const form = { ...initialValues(), weatherSource: 'measured', dniAddress: 'Weather!B1:B8761', dhiAddress: 'Weather!C1:C8761', timeAddress: 'Weather!A1:A8761', year: '2026' };
    const data = await readSheetData(run, form);
    const checked = withCheckedWeather(data, form, SITE, 2026);
    expect(checked.usable).toBe(true);
    expect(checked.lines).toEqual([]);
    expect(checked.data.dni).toEqual(Array.from(W.dni));
  });

  test('a column too short for the year is refused in the words the command line uses', () => {
    const table = weatherTableFromRanges({ columns: { dni: { address: 'A1:A100', topRow: 1, values: Array.from({ length: 100 }, () => [500]) }, dhi: { address: 'B1:B100', topRow: 1, values: Array.from({ length: 100 }, () => [100]) } } });
    const { check, lines } = checkFormWeather(table, initialValues(), SITE, 2026);
    expect(check.usable).toBe(false);
    expect(lines[0]).toBe('The weather columns cannot be used: expected 8760 hourly rows for 2026 (one per hour, the first ending at 01:00 on 1 January; a typical year of 8760 or a leap-year file of 8784 is also fitted), found 100, row 1 to row 100; or give the rows their time stamps');
  });

  test('ranges of different lengths, and a limit that is not a percentage, are named by their box', () => {
    const col = (n: number) => ({ address: `A1:A${n}`, topRow: 1, values: Array.from({ length: n }, () => [1]) });
    expect(() => weatherTableFromRanges({ columns: { dni: col(8760), dhi: col(8759) } })).toThrow(new SunpaneError('weather.dhi', 'A1:A8759', 'must have as many values as the direct normal range (8760), not 8759'));
    const table = weatherTableFromRanges({ columns: { ghi: col(8760) } });
    expect(() => checkFormWeather(table, { ...initialValues(), maxUnusable: 'lots' }, SITE, 2026)).toThrow(/^weather\.maxUnusable = "lots" is not allowed: must be a percentage from 0 to 100/);
  });
});
