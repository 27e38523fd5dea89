/**
 * The BUILT function help (dist/help/) as a user meets it, in headless Chromium: a function page and
 * the index load their stylesheet under their Content-Security-Policy with no violation and no
 * console error, read in the light and the dark scheme (the stylesheet's colours applied, text at
 * 11 px or more, nothing wider than a 350 px task pane), and pass axe-core's WCAG 2.1 A/AA rules
 * (outside checker: @axe-core/playwright) without a serious or critical finding.
 */
import AxeBuilder from '@axe-core/playwright';
import type { Browser, Page } from 'playwright-core';
import { FLUENT_DARK, FLUENT_LIGHT } from '../../src/taskpane/fluentTokens';
import { launchBrowser, openAddinPage } from './chromium';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

/** The page opened at `width` in a colour scheme, with every console error and policy violation recorded. */
async function openHelp(pagePath: string, scheme: 'light' | 'dark', width: number): Promise<{ page: Page; errors: string[] }> {
  const errors: string[] = [];
  const page = await openAddinPage(browser, '', pagePath, async (p) => {
    await p.setViewportSize({ width, height: 800 });
    await p.emulateMedia({ colorScheme: scheme });
    p.on('console', (m) => {
      if (m.type() === 'error') errors.push(`console: ${m.text()}`);
    });
    p.on('pageerror', (e) => errors.push(`page: ${e.message}`));
    p.on('requestfailed', (r) => errors.push(`request failed: ${r.url()}`));
    p.on('response', (r) => {
      if (r.status() >= 400) errors.push(`HTTP ${r.status()}: ${r.url()}`);
    });
    // Playwright's own script, not the page's: it runs whatever the page's policy says.
    await p.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (e) => console.error(`CSP ${e.violatedDirective} ${e.blockedURI}`));
    });
  });
  await page.waitForLoadState('load');
  return { page, errors };
}

function rgb(hex: string): string {
  const n = parseInt(hex.slice(1), 16);
  return `rgb(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255})`;
}

/** Sideways overflow and text under 11 px. */
function layoutProblems(): string[] {
  const problems: string[] = [];
  const vw = document.documentElement.clientWidth;
  if (document.documentElement.scrollWidth > vw) problems.push(`page scrolls sideways: ${document.documentElement.scrollWidth} > ${vw}`);
  for (const el of Array.from(document.querySelectorAll('body *'))) {
    const own = Array.from(el.childNodes).some((n) => n.nodeType === Node.TEXT_NODE && (n.textContent ?? '').trim() !== '');
    if (own && parseFloat(getComputedStyle(el).fontSize) < 11) problems.push(`"${(el.textContent ?? '').trim().slice(0, 30)}" is under 11 px`);
    if (el.getBoundingClientRect().right > vw + 0.5) problems.push(`${el.tagName.toLowerCase()} sticks out`);
  }
  return problems;
}

describe('the function help pages in Chromium', () => {
  for (const pagePath of ['/help/SUNRISE.html', '/help/SOLARGAINYEAR.html', '/help/index.html']) {
    for (const scheme of ['light', 'dark'] as const) {
      test(`${pagePath}, ${scheme}, 350 px: styled, no policy violation or console error, fits, passes axe`, async () => {
        const { page, errors } = await openHelp(pagePath, scheme, 350);
        try {
          const tokens = scheme === 'light' ? FLUENT_LIGHT : FLUENT_DARK;
          const look = await page.evaluate(() => ({ bg: getComputedStyle(document.body).backgroundColor, fg: getComputedStyle(document.body).color, sheets: document.styleSheets.length }));
          expect(look).toEqual({ bg: rgb(tokens.colorNeutralBackground1), fg: rgb(tokens.colorNeutralForeground1), sheets: 1 });
          expect(await page.evaluate(layoutProblems)).toEqual([]);
          const axe = await new AxeBuilder({ page }).setLegacyMode(true).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
          expect(axe.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
          expect(errors).toEqual([]);
        } finally {
          await page.close();
        }
      });
    }
  }

  test('the policy is enforced: an inline style added to a page is refused and reported', async () => {
    const { page, errors } = await openHelp('/help/SUNRISE.html', 'light', 500);
    try {
      await page.evaluate(() => {
        const s = document.createElement('style');
        s.textContent = 'body { background: rgb(1, 2, 3) !important; }';
        document.head.appendChild(s);
      });
      await page.waitForTimeout(100);
      expect(await page.evaluate(() => getComputedStyle(document.body).backgroundColor)).not.toBe('rgb(1, 2, 3)');
      expect(errors.some((e) => /style-src/.test(e))).toBe(true);
    } finally {
      await page.close();
    }
  });
});
