/**
 * Writing an hourly year to a new sheet, in node against the fake Excel host. The hourly columns
 * here are invented numbers (demo data): the test checks placement, blocks, rounding and cancel,
 * not physics.
 */
import { rowBlocks } from '../../src/taskpane/blocks';
import { RunCancelled, type RunBatch, WriteFailed } from '../../src/taskpane/resultSheets';
import { HEAT_COLUMN, type HourColumns, SUMMARY_COLUMN, type YearFigures, hourRows, writeYearSheet } from '../../src/taskpane/yearSheet';
import { columnLetters } from '../../src/taskpane/blocks';
import { HOURLY_HEADERS } from '../../src/outputs/hourlyColumns';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost } = require('../browser/excel-host.js');

const HOURS = 8760;
/** Invented columns: row i holds recognisable values (gain = i mod 1000 + 0.26). */
function columns(): HourColumns {
  const col = (f: (i: number) => number) => Float64Array.from({ length: HOURS }, (_, i) => f(i));
  return {
    stampSerial: col((i) => 45658 + (i + 1) / 24),
    sunAltitude: col((i) => ((i % 24) - 12) * 5.123456),
    sunAzimuth: col((i) => (i * 15) % 360),
    incidence: col(() => 45.6789),
    profileAngle: col(() => 30.4444),
    sunlitFraction: col((i) => (i % 3) / 3),
    dni: col(() => 800.04),
    dhi: col(() => 100.06),
    beam: col(() => 500.01),
    sky: col(() => 50.55),
    ground: col(() => 10.1),
    shgc: col(() => 0.41234),
    gain: col((i) => (i % 1000) + 0.26),
    missing: new Uint8Array(HOURS),
  };
}
const FIGURES: YearFigures = { monthlyKWh: new Array(12).fill(100.123), annualKWh: 1201.476, peakW: 999.26, peakStamp: 45700.5, sunlitHours: 3000, meanSunlitFraction: 0.8, beamCut: 0.31234, diffuseCut: 0.18765, missingHours: 0, glassArea: 2.3 };

function setup() {
  const { Excel, host } = createExcelHost();
  const run: RunBatch = (batch) => Excel.run(batch);
  return { run, host };
}

describe('the hourly year sheet', () => {
  test('the rows are rounded for the sheet, in the order of the shared hourly columns', () => {
    const cols = columns();
    expect(hourRows(cols, 0, 1)[0]).toEqual([45658.041667, -61.48, 0, 45.68, 30.44, 0, 800, 100.1, 500, 50.6, 10.1, 0.412, 0.3, 0]);
  });

  test('the year goes to the named sheet in blocks of at most the block size, every request under 5 MB', async () => {
    const { run, host } = setup();
    const progress: number[] = [];
    const written = await writeYearSheet(run, { name: 'W hourly' }, { title: 'T', lines: ['a', 'b', 'c'] }, columns(), FIGURES, { blockRows: 2000, onProgress: (d) => progress.push(d) });
    expect(written).toEqual({ sheet: 'W hourly', table: 'W_hourly' });
    expect(host.read('W hourly', 'A5:N5')).toEqual([[...HOURLY_HEADERS]]);
    expect(progress).toEqual([...rowBlocks(HOURS, 2000).map((b) => b.end), HOURS]);
    const blocks = host.state.syncs.flatMap((s: { valueRows: number[] }) => s.valueRows).filter((n: number) => n >= 500);
    expect(blocks).toEqual([2000, 2000, 2000, 2000, 760]);
    expect(host.state.syncs.every((s: { bytes: number }) => s.bytes < 5 * 1024 * 1024)).toBe(true);
    expect(host.read('W hourly', 'M6:M7')).toEqual([[0.3], [1.3]]);
    expect(host.read('W hourly', 'M8765:M8765')).toEqual([[759.3]]);
    expect(host.formatAt('W hourly', 'A6')).toBe('yyyy-mm-dd hh:mm');
    expect(host.read('W hourly', 'P18:Q18')).toEqual([['Year', '=SUM(Q6:Q17)']]);
    expect(host.tables()).toEqual([expect.objectContaining({ name: 'W_hourly', sheet: 'W hourly', address: 'A5:N8765' })]);
  });

  test('the summary, key figures and month × hour block are formulas over the named table, the block coloured by our scale', async () => {
    const { run, host } = setup();
    await writeYearSheet(run, { name: 'East 1 hourly', tableBase: 'East 1 hourly' }, { title: 'T', lines: [] }, columns(), FIGURES);
    const col = (k: number) => columnLetters(SUMMARY_COLUMN + k);
    const jan = host.read('East 1 hourly', `${col(0)}6:${col(2)}6`)[0];
    expect(jan[0]).toBe('Jan');
    expect(jan[1]).toBe(
      '=SUMIFS(East_1_hourly[[Solar gain (W)]],East_1_hourly[[Hour ending (local standard time)]],">"&DATE(2025,1,1),East_1_hourly[[Hour ending (local standard time)]],"<="&DATE(2025,2,1))/1000',
    );
    expect(jan[2]).toBe(`=IF($${col(1)}$25>0,${col(1)}6/$${col(1)}$25,0)`);
    expect(host.read('East 1 hourly', `${col(0)}25:${col(1)}25`)).toEqual([['Glass area (m²)', 2.3]]);
    // The shading's cuts of the beam and, beside it, of the diffuse light: the core's values, in %.
    expect(host.read('East 1 hourly', `${col(0)}26:${col(1)}27`)).toEqual([
      ['Beam cut by shading (%)', 31.2],
      ['Diffuse cut by shading (%)', 18.8],
    ]);
    expect(host.read('East 1 hourly', `${col(0)}20:${col(1)}20`)).toEqual([['Peak gain (W)', '=MAX(0,SUMPRODUCT(MAX((East_1_hourly[[Weather missing (1 = yes)]]=0)*East_1_hourly[[Solar gain (W)]])))']]);
    const block = host.read('East 1 hourly', `${columnLetters(HEAT_COLUMN)}5:${columnLetters(HEAT_COLUMN + 24)}17`);
    expect(block[0]).toEqual(['Month', ...Array.from({ length: 24 }, (_, h) => String(h + 1))]);
    expect(block[7][0]).toBe('Jul');
    expect(block[7][14]).toBe(
      '=SUMPRODUCT((MONTH((East_1_hourly[[Hour ending (local standard time)]]-1/48))=7)*(HOUR((East_1_hourly[[Hour ending (local standard time)]]-1/48))=13)*(East_1_hourly[[Weather missing (1 = yes)]]=0)*East_1_hourly[[Solar gain (W)]])/MAX(1,SUMPRODUCT((MONTH((East_1_hourly[[Hour ending (local standard time)]]-1/48))=7)*(HOUR((East_1_hourly[[Hour ending (local standard time)]]-1/48))=13)*(East_1_hourly[[Weather missing (1 = yes)]]=0)))',
    );
    const cfs = host.conditionalFormats('East 1 hourly');
    expect(cfs).toEqual([expect.objectContaining({ type: 'ColorScale', address: `${columnLetters(HEAT_COLUMN + 1)}6:${columnLetters(HEAT_COLUMN + 24)}17` })]);
    expect(cfs[0].criteria.maximum.color).toBe('#A63A1E');
    const charts = host.charts('East 1 hourly');
    expect(charts).toEqual([expect.objectContaining({ type: 'ColumnClustered', source: `${col(0)}5:${col(1)}17`, title: 'Annual profile: solar gain by month (kWh)', seriesColours: ['#2E6DA4'] })]);
  });

  test('a second table from the same window gets its own valid name', async () => {
    const { run, host } = setup();
    await writeYearSheet(run, { name: '2nd floor hourly', tableBase: '2nd floor hourly' }, { title: 'T', lines: [] }, columns(), FIGURES);
    await writeYearSheet(run, { name: '2nd floor hourly (2)', tableBase: '2nd floor hourly' }, { title: 'T', lines: [] }, columns(), FIGURES);
    expect(host.tables().map((t: { name: string }) => t.name)).toEqual(['T_2nd_floor_hourly', 'T_2nd_floor_hourly_2']);
  });

  test('cancel after the first block removes the half-written sheet and says so', async () => {
    const { run, host } = setup();
    let blocksDone = 0;
    const write = writeYearSheet(run, { name: 'W hourly' }, { title: 'T', lines: [] }, columns(), FIGURES, {
      onProgress: () => blocksDone++,
      cancelled: () => blocksDone >= 1,
    });
    await expect(write).rejects.toThrow(RunCancelled);
    await expect(write).rejects.toThrow('Stopped: the half-written sheet was removed.');
    expect(host.sheetNames()).toEqual([]);
  });

  test('Excel refusing a request part-way (the third block, then the table) removes the half-written sheet and says why', async () => {
    for (const fault of [{ op: 'range.values', after: 4 }, { op: 'tables.add' }]) {
      const { run, host } = setup();
      host.addUserSheet('Notes', [['mine']]);
      host.state.failOp = fault;
      const write = writeYearSheet(run, { name: 'W hourly' }, { title: 'T', lines: [] }, columns(), FIGURES);
      await expect(write).rejects.toThrow(WriteFailed);
      await expect(write).rejects.toThrow(/^Excel refused a request while writing "W hourly", so the half-written sheet was removed and nothing else changed\. Excel said: GeneralException: The request failed at /);
      expect(host.sheetNames()).toEqual(['Notes']);
      expect(host.tables()).toEqual([]);
      expect(host.state.syncs.some((x: { failed?: string }) => x.failed === fault.op)).toBe(true);
    }
  });

  test('an earlier result sheet the user agreed to replace is deleted and written anew under its name', async () => {
    const { run, host } = setup();
    host.addUserSheet('W hourly', [['old']]);
    await writeYearSheet(run, { name: 'W hourly', replaces: 'W hourly' }, { title: 'New', lines: [] }, columns(), FIGURES);
    expect(host.sheetNames()).toEqual(['W hourly']);
    expect(host.tables().map((t: { name: string }) => t.name)).toEqual(['W_hourly']);
    expect(host.read('W hourly', 'A1')).toEqual([['New']]);
  });
});
