/**
 * The pane writes a user's labels (window names, option names, the description lines that start
 * with the window's name) as text: Excel would enter a value starting with = + - @ as a formula.
 * The fake host (tests/browser/excel-host.js) enters such values as formulas as Excel does, and
 * takes a leading apostrophe as Excel's text mark.
 */
import type { RunBatch } from '../../src/taskpane/resultSheets';
import { writeSmallTableSheet } from '../../src/taskpane/tableSheet';
import { writeYearSheet } from '../../src/taskpane/yearSheet';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost } = require('../browser/excel-host.js');

const HOSTILE = ['=HYPERLINK("http://example.invalid","x")', '+1+2', '-3', '@SUM(A1)'];

function setup() {
  const { Excel, host } = createExcelHost();
  const run: RunBatch = (batch) => Excel.run(batch);
  return { run, host };
}

describe('labels from the user are written as text', () => {
  test('a summary table of windows named = + - @ holds their names as text and no formula', async () => {
    const { run, host } = setup();
    await writeSmallTableSheet(run, { name: 'Results' }, {
      title: 'Sunpane window schedule',
      lines: [`${HOSTILE[0]}: faces 90°`],
      header: ['Window', 'kWh'],
      rows: HOSTILE.map((h, i) => [h, i]),
      formats: ['@', '0'],
      chartColumn: 1,
    });
    expect(host.formulaCells('Results')).toEqual([]);
    expect(host.read('Results', 'A2')).toEqual([[`${HOSTILE[0]}: faces 90°`]]);
    expect(host.read('Results', 'A5:A8')).toEqual(HOSTILE.map((h) => [h]));
  });

  test('the hourly year sheet\'s heading lines are text too', async () => {
    const { run, host } = setup();
    const n = 8760;
    const col = () => new Float64Array(n);
    const cols = { stampSerial: Float64Array.from({ length: n }, (_, i) => 45658 + (i + 1) / 24), sunAltitude: col(), sunAzimuth: col(), incidence: col(), profileAngle: col(), sunlitFraction: col(), dni: col(), dhi: col(), beam: col(), sky: col(), ground: col(), shgc: col(), gain: col(), missing: new Uint8Array(n) };
    const fig = { monthlyKWh: new Array(12).fill(0), annualKWh: 0, peakW: 0, peakStamp: 45700.5, sunlitHours: 0, meanSunlitFraction: 0, beamCut: 0, diffuseCut: 0, missingHours: 0, glassArea: 1 };
    const lines = HOSTILE.slice(0, 3); // the sheet has room for three lines above its table
    await writeYearSheet(run, { name: 'Y' }, { title: 'Sunpane hourly solar gain', lines }, cols, fig);
    expect(host.formulaCells('Y')).toEqual([]);
    expect(host.read('Y', 'A2:A4')).toEqual(lines.map((h) => [h]));
  });
});
