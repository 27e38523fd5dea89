/**
 * The worksheet functions in the BUILT add-in (dist/taskpane.html + taskpane.js from
 * `npm run build`), in headless Chromium with office.js replaced by a stub: our CustomFunctions
 * stand-in (records `associate`, provides Error and ErrorCode as Excel's runtime does) in front of
 * the pane's fake Excel host (tests/browser/excel-host.js, which provides Office.onReady).
 *
 * Checks: every id in dist/functions.json is associated; the shared formula table
 * (tests/fixtures/formulas.ts — its header names the source of every expected value) gives the
 * expected results; and EVERY registered function, generically, works with single values, with a
 * 2 × 1 range (a 2 × 1 result, or a #VALUE! for spilling functions), and refuses one bad argument
 * with #VALUE! naming it. The generic calls are compared with the registry evaluated here in node
 * (same core, so within 1e-9: a pure plumbing check of the bundle's adapter).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { SunpaneError } from '../../src/core/common/errors';
import { applyFunction } from '../../src/registry/evaluate';
import { FUNCTIONS, findFunction } from '../../src/registry';
import { NotAvailable, type OutTable } from '../../src/registry/types';
import { type Cell, FORMULAS, type FormulaArg, excelArgs } from '../fixtures/formulas';
import { badArgs, firstBroadcastIndex, otherValue, transpose, validArgs } from '../functions/sample-args';
import { DIST, launchBrowser, openAddinPage } from './chromium';
import { Mismatches } from '../support/mismatches';

const HOST_JS = fs.readFileSync(path.join(__dirname, 'excel-host.js'), 'utf8');

/** Our CustomFunctions stand-in, installed before the fake Excel host (which then keeps it). */
const CUSTOM_FUNCTIONS_STUB = `
(function () {
  var handlers = {};
  window.__pageErrors = [];
  window.addEventListener('error', function (e) { window.__pageErrors.push(String(e.message || e)); });
  window.addEventListener('unhandledrejection', function (e) { window.__pageErrors.push('unhandled rejection: ' + String(e.reason)); });
  function CfError(code, message) { this.code = code; this.message = message; }
  window.CustomFunctions = {
    associate: function (id, fn) {
      if (typeof id !== 'string' || typeof fn !== 'function') throw new Error('associate(id, function) expected');
      if (handlers[id]) throw new Error(id + ' associated twice');
      handlers[id] = fn;
    },
    Error: CfError,
    ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A', divisionByZero: '#DIV/0!', invalidNumber: '#NUM!', nullReference: '#NULL!' },
  };
  function enc(v) {
    if (v instanceof CfError) return { error: v.code, message: v.message };
    if (typeof v === 'number') return Number.isFinite(v) ? v : { nonFinite: String(v) };
    if (typeof v === 'string') return v;
    return { unexpected: String(v) };
  }
  window.__sunpaneFunctions = {
    ids: function () { return Object.keys(handlers); },
    call: function (id, args) {
      var h = handlers[id];
      if (!h) return { missing: id };
      try {
        var out = h.apply(null, args);
        if (!Array.isArray(out) || !out.every(Array.isArray)) return { notMatrix: String(out) };
        return { ok: out.map(function (row) { return row.map(enc); }) };
      } catch (e) {
        return { thrown: e instanceof CfError ? { error: e.code, message: e.message } : { raw: String((e && e.stack) || e) } };
      }
    },
  };
})();
`;

type Shown = number | string | { error: string; message?: string } | { nonFinite: string } | { unexpected: string };
type CallResult = { ok: Shown[][] } | { thrown: { error?: string; message?: string; raw?: string } } | { missing: string } | { notMatrix: string };

let browser: Browser;
let page: Page;
const pageErrors: string[] = [];

beforeAll(async () => {
  browser = await launchBrowser();
  page = await openAddinPage(browser, CUSTOM_FUNCTIONS_STUB + HOST_JS);
  page.on('pageerror', (err) => pageErrors.push(String(err)));
  // Registration happens on Office.onReady; wait for it (or for the page to fail trying).
  await page.waitForFunction(
    () => {
      const w = window as never as { __sunpaneFunctions: { ids(): string[] }; __pageErrors: string[] };
      return w.__sunpaneFunctions.ids().length > 0 || w.__pageErrors.length > 0;
    },
    undefined,
    { timeout: 30_000 },
  );
  pageErrors.push(...(await page.evaluate(() => (window as never as { __pageErrors: string[] }).__pageErrors)));
});

afterAll(async () => {
  await browser?.close();
});

function call(id: string, args: readonly FormulaArg[]): Promise<CallResult> {
  return page.evaluate(([i, a]) => (window as never as { __sunpaneFunctions: { call(id: string, args: unknown[]): CallResult } }).__sunpaneFunctions.call(i, a), [id, excelArgs(args)] as const);
}

/** The node-side registry result in the same shape the page reports. */
function expectedFromNode(id: string, args: readonly FormulaArg[]): CallResult {
  const fn = findFunction(id)!;
  let table: OutTable;
  try {
    table = applyFunction(fn, args);
  } catch (err) {
    if (err instanceof SunpaneError) return { thrown: { error: '#VALUE!', message: err.message } };
    throw err;
  }
  return {
    ok: table.map((r) =>
      r.map((c): Shown => (c instanceof SunpaneError ? { error: '#VALUE!', message: c.message } : c instanceof NotAvailable ? { error: '#N/A', message: c.message } : (c as number | string))),
    ),
  };
}

function expectSame(actual: CallResult, expected: CallResult): void {
  if ('ok' in expected) {
    expect(actual).toHaveProperty('ok');
    const got = (actual as { ok: Shown[][] }).ok;
    expect(got.length).toBe(expected.ok.length);
    // Cell by cell with plain comparisons (a year's spill has tens of thousands of cells: see
    // tests/support/mismatches.ts); the cells that are not numbers are compared in one toEqual.
    const found = new Mismatches();
    const gotOthers: Shown[] = [];
    const expectedOthers: Shown[] = [];
    expected.ok.forEach((row, i) => {
      found.check(got[i].length === row.length, () => `row ${i + 1}: ${got[i].length} cells, the registry in node gives ${row.length}`);
      row.forEach((cell, j) => {
        // Same code on both sides: equal to 1e-9 relative (allows only a different summation order).
        if (typeof cell === 'number') found.check(Math.abs((got[i][j] as number) - cell) <= 1e-9 * Math.max(1, Math.abs(cell)), () => `row ${i + 1}, column ${j + 1}: ${JSON.stringify(got[i][j])}, the registry in node ${cell}`);
        else {
          gotOthers.push(got[i][j]);
          expectedOthers.push(cell);
        }
      });
    });
    expect(found.list).toEqual([]);
    expect(gotOthers).toEqual(expectedOthers);
  } else {
    expect(actual).toEqual(expected);
  }
}

test('the bundle loads without page errors and associates every id in dist/functions.json', async () => {
  const meta = JSON.parse(fs.readFileSync(path.join(DIST, 'functions.json'), 'utf8')) as { functions: { id: string }[] };
  const ids = await page.evaluate(() => (window as never as { __sunpaneFunctions: { ids(): string[] } }).__sunpaneFunctions.ids());
  expect(meta.functions.map((f) => f.id).sort()).toEqual([...ids].sort());
  expect(ids.sort()).toEqual(FUNCTIONS.map((f) => f.name).sort());
  expect(pageErrors).toEqual([]);
});

test('dist/taskpane.html loads office.js from Microsoft’s CDN before the bundle', () => {
  const html = fs.readFileSync(path.join(DIST, 'taskpane.html'), 'utf8');
  const office = html.indexOf('https://appsforoffice.microsoft.com/lib/1/hosted/office.js');
  expect(office).toBeGreaterThan(-1);
  expect(html.indexOf('taskpane.js')).toBeGreaterThan(office);
});

describe('the shared formula table in the add-in', () => {
  test.each(FORMULAS.map((r, i) => [`${i + 1}. ${r.fn}: ${r.source}`, r] as const))('%s', async (_label, row) => {
    const out = await call(row.fn, row.args);
    const e = row.expect;
    if ('values' in e) {
      expect(out).toHaveProperty('ok');
      const got = (out as { ok: Shown[][] }).ok;
      expect([got.length, got[0]?.length]).toEqual([e.values.length, e.values[0].length]);
      e.values.forEach((r, i) =>
        r.forEach((v, j) => {
          if (typeof v === 'number') {
            expect(typeof got[i][j]).toBe('number');
            expect(Math.abs((got[i][j] as number) - v)).toBeLessThanOrEqual(e.tolerance);
          } else expect(got[i][j]).toBe(v);
        }),
      );
    } else {
      const err = 'thrown' in out ? out.thrown : 'ok' in out && out.ok.length === 1 && out.ok[0].length === 1 ? out.ok[0][0] : out;
      expect(err).toMatchObject({ error: e.error });
      expect(String((err as { message?: string }).message ?? '').slice(0, e.messageStart.length)).toBe(e.messageStart);
      expect(String((err as { message?: string }).message ?? '').length).toBeGreaterThan(0);
    }
  });
});

describe.each(FUNCTIONS.map((fn) => [fn.name, fn] as const))('%s in the built add-in', (name, fn) => {
  const valid = (): ReturnType<typeof validArgs> => validArgs(fn);

  test('single values give finite results, the same as the registry in node', async () => {
    const args = valid();
    const out = await call(name, args);
    expectSame(out, expectedFromNode(name, args));
    expect(out).toHaveProperty('ok');
    const found = new Mismatches();
    for (const r of (out as { ok: Shown[][] }).ok) for (const c of r) found.check(typeof c === 'number' || typeof c === 'string' || (c as { error?: string }).error === '#N/A', () => `cell ${JSON.stringify(c)}`);
    expect(found.list).toEqual([]);
  });

  test('a 2 × 1 range in the first broadcast argument gives a 2 × 1 result (spilling functions refuse it; list-only functions read a column like a row)', async () => {
    const base = valid();
    const k = firstBroadcastIndex(fn, base);
    if (k < 0) {
      // No broadcast parameter: its lists read the same given as a column instead of a row.
      const l = fn.params.findIndex((p, i) => p.kind === 'numberList' && Array.isArray(base[i]));
      expect(l).toBeGreaterThanOrEqual(0);
      const args = base.slice();
      args[l] = transpose(base[l] as Cell[][]);
      const out = await call(name, args);
      expectSame(out, expectedFromNode(name, base));
      return;
    }
    const args = base.slice();
    args[k] = [[base[k] as Cell], [otherValue(fn.params[k], base[k]) as Cell]];
    const out = await call(name, args);
    expectSame(out, expectedFromNode(name, args));
    if (fn.result.shape === 'value') {
      expect((out as { ok: Shown[][] }).ok.map((r) => r.length)).toEqual([1, 1]);
    } else {
      expect(out).toMatchObject({ thrown: { error: '#VALUE!' } });
    }
  });

  test('one bad argument gives #VALUE! with a message naming it', async () => {
    const { args, param } = badArgs(fn, valid());
    const out = await call(name, args);
    expectSame(out, expectedFromNode(name, args));
    const err = 'thrown' in out ? out.thrown : (out as { ok: Shown[][] }).ok[0][0];
    expect(err).toMatchObject({ error: '#VALUE!' });
    expect((err as { message: string }).message.slice(0, param.length + 1)).toBe(`${param} `);
  });
});

test('no page errors while calling every function', () => {
  expect(pageErrors).toEqual([]);
});
