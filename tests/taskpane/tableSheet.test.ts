/**
 * Writing a small result table (schedule results, an options comparison) in node against the fake
 * Excel host, which refuses a request over 5 MB as Excel on the web does (docs/platform.md): the
 * rows go in blocks under the budget, a refused request removes the half-written sheet. The rows
 * are invented (demo data): the test checks blocks, placement and clean-up, not physics.
 */
import { type RunBatch, WriteFailed, planSheet, stillOurs } from '../../src/taskpane/resultSheets';
import { BLOCK_BYTES, rowsPerBlock, tableHeaderRow, writeSmallTableSheet, type SmallTable } from '../../src/taskpane/tableSheet';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost, REQUEST_LIMIT_BYTES } = require('../browser/excel-host.js');

function setup() {
  const { Excel, host } = createExcelHost();
  const run: RunBatch = (batch) => Excel.run(batch);
  return { run, host };
}

/** A schedule summary of `n` invented windows with long names: about 330 bytes a row with its formats. */
function bigTable(n: number): SmallTable {
  return {
    title: 'Sunpane window schedule: invented',
    lines: ['From an invented table.', 'caution'],
    header: ['Window', 'Faces (°)', 'Width (m)', 'Height (m)', 'Solar gain (kWh/yr)', 'Peak gain (W)', 'Peak at', 'Per glass area (kWh/m²)', 'Cut (%)', 'Beam cut (%)', 'Diffuse cut (%)', 'Shaded share'],
    rows: Array.from({ length: n }, (_, i) => [`Block ${Math.floor(i / 100)} level ${i % 100} window with a long descriptive name ${i}`, (i * 37) % 360, 1.234567, 2.345678, 1234.567891 + i, 987.654321, 45678.123456, 345.678912, 12.345678, 23.456789, 34.567891, 0.456789]),
    formats: ['@', '0', '0.00', '0.00', '0.0', '0.0', 'yyyy-mm-dd hh:mm', '0.0', '0.0', '0.0', '0.0', '0.000'],
    chartColumn: 4,
    chartTitle: 'Solar gain by window (kWh/yr)',
  };
}

describe('the small result table', () => {
  test('30,000 rows (about 10 MB in one request) go in blocks under 1 MB each: nothing refused, every row in place, one table over all', async () => {
    const { run, host } = setup();
    const t = bigTable(30_000);
    const oneRequest = JSON.stringify(t.rows).length + JSON.stringify(t.rows.map(() => t.formats)).length;
    expect(oneRequest).toBeGreaterThan(REQUEST_LIMIT_BYTES); // written at once this table would be refused
    await writeSmallTableSheet(run, { name: 'Schedule results' }, t);
    const syncs = host.state.syncs as { bytes: number; refused?: boolean; valueRows: number[] }[];
    expect(syncs.some((s) => s.refused)).toBe(false);
    expect(Math.max(...syncs.map((s) => s.bytes))).toBeLessThan(BLOCK_BYTES * 1.2);
    expect(syncs.filter((s) => s.valueRows.some((r) => r > 100)).length).toBeGreaterThan(10);
    const top = tableHeaderRow(t);
    expect(host.read('Schedule results', `A${top + 2}:B${top + 2}`)).toEqual([[t.rows[0][0], t.rows[0][1]]]);
    expect(host.read('Schedule results', `A${top + 1 + 30_000}:A${top + 1 + 30_000}`)).toEqual([[t.rows[29_999][0]]]);
    expect(host.tables()).toEqual([expect.objectContaining({ name: 'Schedule_results', address: `A${top + 1}:L${top + 1 + 30_000}` })]);
  });

  test('the blocks follow the widest row and the budget', () => {
    const t = bigTable(10);
    const per = rowsPerBlock(t.rows, t.formats, 0, 10_000);
    expect(per * (JSON.stringify(t.rows[9]).length + JSON.stringify(t.formats).length)).toBeLessThanOrEqual(10_000);
    expect(rowsPerBlock([['x'.repeat(50_000)]], ['@'], 0, 10_000)).toBe(1);
  });

  test('with the limit lowered to 64 kB, a budget of 32 kB still writes every row', async () => {
    const { run, host } = setup();
    host.state.requestLimitBytes = 64 * 1024;
    await writeSmallTableSheet(run, { name: 'Small limit' }, bigTable(1_000), 32 * 1024);
    expect((host.state.syncs as { refused?: boolean }[]).some((s) => s.refused)).toBe(false);
    expect(host.tables()[0].address).toBe(`A${tableHeaderRow(bigTable(1)) + 1}:L${tableHeaderRow(bigTable(1)) + 1 + 1_000}`);
  });

  test('Excel refusing a request part-way (a block of rows, the table, the chart) removes the half-written sheet and says why; other sheets untouched', async () => {
    for (const fault of [{ op: 'range.values', after: 3 }, { op: 'tables.add' }, { op: 'charts.add' }]) {
      const { run, host } = setup();
      host.addUserSheet('Notes', [['mine', 1]]);
      const before = host.snapshot('Notes');
      host.state.failOp = fault;
      const write = writeSmallTableSheet(run, { name: 'W options' }, bigTable(5_000));
      await expect(write).rejects.toThrow(WriteFailed);
      await expect(write).rejects.toThrow(/^Excel refused a request while writing "W options", so the half-written sheet was removed/);
      expect(host.sheetNames()).toEqual(['Notes']);
      expect(host.snapshot('Notes')).toBe(before);
      expect(host.tables()).toEqual([]);
    }
  });
});

describe('which sheets are ours', () => {
  const book = (names: string[]) => ({ isOurs: (n: string) => names.includes(n), remember: () => undefined, forget: (n: string) => void names.splice(names.indexOf(n), 1) });

  test('a remembered name whose sheet no longer carries our title is the user\'s: no question, a free name, and forgotten', async () => {
    const { run, host } = setup();
    host.addUserSheet('W options', [['my own table', 3]]);
    host.addUserSheet('Old', [['Sunpane shading options: W']]);
    const names = ['W options', 'Old'];
    let asked = 0;
    const ask = async () => {
      asked++;
      return 'replace' as const;
    };
    const plan = await planSheet('W options', host.sheetNames(), book(names), ask, (n) => stillOurs(run, n));
    expect(plan).toEqual({ name: 'W options (2)' });
    expect(asked).toBe(0);
    expect(names).toEqual(['Old']);
    // our own earlier sheet, still with our title: the user is asked
    const again = await planSheet('Old', host.sheetNames(), book(names), ask, (n) => stillOurs(run, n));
    expect(asked).toBe(1);
    expect(again).toEqual({ name: 'Old', replaces: 'Old' });
  });
});
