/**
 * The fake Excel host used by the pane's tests (tests/browser/excel-host.js) enforces what Excel on
 * the web enforces (docs/platform.md#writing-sheets-from-the-pane): a request over 5 MB is refused,
 * sheet names follow Excel's rules, value arrays match their range, and properties are readable
 * only after load() and sync(). Without these refusals the pane's tests could not fail.
 */
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost } = require('../browser/excel-host.js');

type Ctx = Excel.RequestContext;

describe('the fake Excel host', () => {
  test('a request of more than 5 MB (8760 rows × 40 unrounded numbers) is refused and nothing of it is applied', async () => {
    const { Excel, host } = createExcelHost();
    await Excel.run(async (ctx: Ctx) => {
      ctx.workbook.worksheets.add('Big');
      await ctx.sync();
    });
    const big = Array.from({ length: 8760 }, (_, i) => Array.from({ length: 40 }, (_, j) => i * 1.234567890123 + j / 7));
    await expect(
      Excel.run(async (ctx: Ctx) => {
        ctx.workbook.worksheets.getItem('Big').getRange('A1:AN8760').values = big;
        await ctx.sync();
      }),
    ).rejects.toThrow(/RequestPayloadSizeLimitExceeded/);
    expect(host.read('Big', 'A1:A1')).toEqual([['']]);
    expect(host.state.syncs[host.state.syncs.length - 1].bytes).toBeGreaterThan(5 * 1024 * 1024);
  });

  test("sheet names break Excel's rules → refused; names are unique regardless of case", async () => {
    const { Excel } = createExcelHost();
    for (const bad of ['a'.repeat(32), 'x:y', 'a/b', 'q?', 'star*', '[x]', "'quoted", '']) {
      await expect(Excel.run(async (ctx: Ctx) => { ctx.workbook.worksheets.add(bad); await ctx.sync(); })).rejects.toThrow(/InvalidArgument/);
    }
    await Excel.run(async (ctx: Ctx) => { ctx.workbook.worksheets.add('Results'); await ctx.sync(); });
    await expect(Excel.run(async (ctx: Ctx) => { ctx.workbook.worksheets.add('RESULTS'); await ctx.sync(); })).rejects.toThrow(/ItemAlreadyExists/);
  });

  test('values must match the range and be finite; reading needs load and sync', async () => {
    const { Excel } = createExcelHost();
    await expect(Excel.run(async (ctx: Ctx) => {
      const s = ctx.workbook.worksheets.add('S');
      s.getRange('A1:B2').values = [[1, 2]];
      await ctx.sync();
    })).rejects.toThrow(/does not match/);
    await expect(Excel.run(async (ctx: Ctx) => {
      ctx.workbook.worksheets.getItem('S').getRange('A1').values = [[NaN]];
      await ctx.sync();
    })).rejects.toThrow(/not a finite number/);
    const values = await Excel.run(async (ctx: Ctx) => {
      const r = ctx.workbook.worksheets.getItem('S').getRange('A1:B1');
      r.values = [[1, 'two']];
      expect(() => r.values).toThrow(/PropertyNotLoaded/);
      r.load('values');
      await ctx.sync();
      return r.values;
    });
    expect(values).toEqual([[1, 'two']]);
  });

  test('getItemOrNullObject tells whether a sheet exists only after sync', async () => {
    const { Excel } = createExcelHost();
    await Excel.run(async (ctx: Ctx) => {
      const none = ctx.workbook.worksheets.getItemOrNullObject('Nope');
      expect(() => none.isNullObject).toThrow(/PropertyNotLoaded/);
      await ctx.sync();
      expect(none.isNullObject).toBe(true);
    });
  });
});
