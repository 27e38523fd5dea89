/**
 * The built pane as a user meets it, in headless Chromium with the recording Excel stand-in
 * (tests/browser/excel-host.js) in place of office.js: the page's Content-Security-Policy is
 * enforced and the pane runs under it without one violation.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, openAddinPage } from './chromium';

const HOST_JS = fs.readFileSync(path.join(__dirname, 'excel-host.js'), 'utf8');

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

/** Opens the pane, recording every Content-Security-Policy violation from the first moment. */
async function openWatched(): Promise<Page> {
  const page = await openAddinPage(browser, HOST_JS, '/taskpane.html', async (p) => {
    await p.addInitScript(() => {
      const w = window as unknown as { __cspViolations: string[] };
      w.__cspViolations = [];
      document.addEventListener('securitypolicyviolation', (e) => w.__cspViolations.push(`${e.violatedDirective} ${e.blockedURI}`));
    });
  });
  await page.waitForSelector('#run-year');
  return page;
}

const violations = (page: Page) => page.evaluate(() => (window as unknown as { __cspViolations: string[] }).__cspViolations.slice());

describe('the pane page under its Content-Security-Policy', () => {
  test('loads office.js, its script and its stylesheet, draws every tab, with no violation', async () => {
    const page = await openWatched();
    // The stylesheet applied (a rule of taskpane.css), office.js ran (the stand-in defines __excelHost).
    expect(await page.evaluate(() => getComputedStyle(document.body).margin)).toBe('0px');
    expect(await page.evaluate(() => typeof (window as unknown as { __excelHost?: unknown }).__excelHost)).toBe('object');
    for (const tab of ['schedule', 'options', 'sunpath']) await page.click(`#tab-${tab}`);
    await page.waitForSelector('#sun-path svg');
    await page.click('#tab-window');
    expect(await violations(page)).toEqual([]);
    await page.close();
  });

  test('is enforced: an inline script injected into the page does not run and is reported', async () => {
    const page = await openWatched();
    const ran = await page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'window.__inlineRan = true;';
      document.head.append(s);
      return (window as unknown as { __inlineRan?: boolean }).__inlineRan === true;
    });
    expect(ran).toBe(false);
    await page.waitForFunction(() => (window as unknown as { __cspViolations: string[] }).__cspViolations.length > 0);
    expect((await violations(page)).some((v) => v.startsWith('script-src'))).toBe(true);
    await page.close();
  });
});
