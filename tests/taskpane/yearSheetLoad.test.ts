/**
 * The pane's hourly year with the conduction gain and the cooling load beside the solar gain, in
 * node against the fake Excel host. Columns are invented numbers (demo data): the test checks the
 * extra columns' place, headers and the key figures over them, not physics (the load's checks are
 * in tests/core/load).
 */
import { type HourColumns, type YearFigures, hourRows, heatColumnFor, summaryColumnFor, writeYearSheet } from '../../src/taskpane/yearSheet';
import { columnLetters } from '../../src/taskpane/blocks';
import { HOURLY_HEADERS, hourlyHeadersFor } from '../../src/outputs/hourlyColumns';
import type { RunBatch } from '../../src/taskpane/resultSheets';
import { runYear } from '../../src/taskpane/engine';
import { annualSeries } from '../../src/core/gain/annual';
import { annualLoadParts } from '../../src/core/load/room';
import { illustrativeRadiantTimeSeries } from '../../src/core/load/rtsSeries';
import { baseSpec } from '../core/gain/gainFixtures';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost } = require('../browser/excel-host.js');

const HOURS = 8760;
function columns(): HourColumns {
  const col = (f: (i: number) => number) => Float64Array.from({ length: HOURS }, (_, i) => f(i));
  return {
    stampSerial: col((i) => 45658 + (i + 1) / 24),
    sunAltitude: col(() => 10),
    sunAzimuth: col(() => 100),
    incidence: col(() => 45),
    profileAngle: col(() => 30),
    sunlitFraction: col(() => 1),
    dni: col(() => 800),
    dhi: col(() => 100),
    beam: col(() => 500),
    sky: col(() => 50),
    ground: col(() => 10),
    shgc: col(() => 0.4),
    gain: col((i) => (i % 1000) + 0.26),
    conduction: col(() => -12.34),
    load: col((i) => (i === 5000 ? 2222 : 100)),
    missing: new Uint8Array(HOURS),
  };
}
const FIGURES: YearFigures = { monthlyKWh: new Array(12).fill(100), annualKWh: 1200, peakW: 999.26, peakStamp: 45700.5, sunlitHours: 3000, meanSunlitFraction: 0.8, beamCut: 0.3, diffuseCut: 0.2, missingHours: 0, glassArea: 2.3, peakLoadW: 2222, peakLoadStamp: 45658 + 5001 / 24 };

describe('the hourly year sheet with conduction and cooling load', () => {
  test('the two columns follow the solar gain, headed in the shared words', () => {
    const headers = hourlyHeadersFor('hourEnding', { conduction: true, load: true });
    expect(headers).toEqual([...HOURLY_HEADERS.slice(0, 13), 'Conduction gain (W)', 'Cooling load (W)', HOURLY_HEADERS[13]]);
    expect(hourRows(columns(), 0, 1)[0].slice(12)).toEqual([0.3, -12.3, 100, 0]);
  });

  test('the sheet gets the wider table, the summary moved right of it, and the peak load as formulas over the load column', async () => {
    const { Excel, host } = createExcelHost();
    const run: RunBatch = (batch) => Excel.run(batch);
    await writeYearSheet(run, { name: 'L hourly' }, { title: 'T', lines: [] }, columns(), FIGURES);
    expect(host.read('L hourly', 'A5:P5')).toEqual([hourlyHeadersFor('hourEnding', { conduction: true, load: true })]);
    expect(host.tables()).toEqual([expect.objectContaining({ address: 'A5:P8765' })]);
    const col = (k: number) => columnLetters(summaryColumnFor(16) + k);
    expect(host.read('L hourly', `${col(0)}28:${col(1)}29`)).toEqual([
      ['Peak cooling load (W)', '=MAX(L_hourly[[Cooling load (W)]])'],
      ['Peak load at (hour ending)', '=INDEX(L_hourly[[Hour ending (local standard time)]],MATCH(MAX(L_hourly[[Cooling load (W)]]),L_hourly[[Cooling load (W)]],0))'],
    ]);
    expect(host.formatAt('L hourly', `${col(1)}29`)).toBe('yyyy-mm-dd hh:mm');
    expect(host.read('L hourly', `${columnLetters(heatColumnFor(16))}5`)).toEqual([['Month']]);
  });

  test("the pane's run gives conduction with a U-value and the load with a room, and neither without", () => {
    const plain = runYear(baseSpec());
    expect(plain.hourly.conduction).toBeUndefined();
    expect(plain.hourly.load).toBeUndefined();
    expect(plain.figures.peakLoadW).toBeUndefined();
    const spec = baseSpec({
      glazing: { shgc: 0.6, panes: 2, uValue: 2 },
      indoorTemperature: 24,
      weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [30], dailyRange: [10] },
      room: { construction: 'light' },
    });
    const r = runYear(spec);
    const load = annualLoadParts(annualSeries(spec), illustrativeRadiantTimeSeries('light')).total;
    expect(r.hourly.load![4816]).toBeCloseTo(load[4816], 9);
    expect(r.hourly.conduction![4816]).toBe(r.series.conduction[4816]);
    expect(r.figures.peakLoadW).toBeCloseTo(Math.max(...load), 9);
    expect(() => runYear(baseSpec({ room: { construction: 'stone' } }))).toThrow(/^roomConstruction = "stone" is not allowed/);
  });
});
