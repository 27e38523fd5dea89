/**
 * Headless Chromium for the browser tests: Debian's /usr/bin/chromium driven by playwright-core,
 * serving the BUILT add-in (dist/) from memory at https://localhost:3000/ through request routing
 * (no server), with office.js replaced by a stub script given by the test.
 *
 * A missing browser is a failure, never a skip (.ci/run installs Debian's chromium).
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { type Browser, type Page, chromium } from 'playwright-core';

export const DIST = path.resolve(__dirname, '../../dist');
export const ORIGIN = 'https://localhost:3000';
const EXECUTABLE = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export async function launchBrowser(): Promise<Browser> {
  if (!fs.existsSync(EXECUTABLE)) {
    throw new Error(`Chromium not found at ${EXECUTABLE}: install Debian's chromium (apt-get install chromium) or set CHROMIUM_PATH`);
  }
  return chromium.launch({
    executablePath: EXECUTABLE,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}

const TYPES: Record<string, string> = { '.html': 'text/html', '.js': 'text/javascript', '.json': 'application/json', '.png': 'image/png', '.svg': 'image/svg+xml', '.css': 'text/css', '.map': 'application/json', '.xml': 'application/xml' };

/**
 * Opens a page on which every request to ORIGIN is answered from dist/, every request for office.js
 * (any host) is answered with `officeStub`, and any other request is refused. `beforeLoad` runs on
 * the new page before it is opened (init scripts, viewport, colour scheme).
 */
export async function openAddinPage(browser: Browser, officeStub: string, pagePath = '/taskpane.html', beforeLoad?: (page: Page) => Promise<void>): Promise<Page> {
  if (!fs.existsSync(DIST)) throw new Error('dist/ is missing: run `npm run build` first');
  const page = await browser.newPage();
  if (beforeLoad) await beforeLoad(page);
  await page.route('**/*', async (route) => {
    const url = new URL(route.request().url());
    if (/office(\.debug)?\.js$/.test(url.pathname)) {
      await route.fulfill({ status: 200, contentType: 'text/javascript', body: officeStub });
      return;
    }
    if (url.origin === ORIGIN) {
      const file = path.join(DIST, decodeURIComponent(url.pathname));
      if (file.startsWith(DIST) && fs.existsSync(file) && fs.statSync(file).isFile()) {
        await route.fulfill({ status: 200, contentType: TYPES[path.extname(file)] ?? 'application/octet-stream', body: fs.readFileSync(file) });
        return;
      }
      await route.fulfill({ status: 404, body: 'not found' });
      return;
    }
    await route.abort();
  });
  await page.goto(`${ORIGIN}${pagePath}`);
  return page;
}
