/**
 * The built pane as a user meets it, in headless Chromium with the recording Excel stand-in
 * (tests/browser/excel-host.js) in place of office.js:
 * - at 350 px (the pane's default width) and 500 px, in the light and the dark Office theme, every
 *   tab is screenshot (test-artifacts/look/), and the test fails on horizontal overflow, on any
 *   text under 11 px (the sun-path picture's included), on a primary action that is not in view
 *   without scrolling, and on any serious or critical accessibility violation found by axe-core
 *   (outside checker: @axe-core/playwright, WCAG 2.1 A and AA rules);
 * - the pane can be worked with the keyboard alone;
 * - the page's Content-Security-Policy is enforced and the pane runs under it without one violation.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import AxeBuilder from '@axe-core/playwright';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, openAddinPage } from './chromium';

const HOST_JS = fs.readFileSync(path.join(__dirname, 'excel-host.js'), 'utf8');
const SHOTS = path.resolve(__dirname, '../../test-artifacts/look');
/** Office theme colours the stand-in reports: white, and a dark grey theme. */
const THEMES = {
  light: { bodyBackgroundColor: '#FFFFFF', bodyForegroundColor: '#000000', controlBackgroundColor: '#FFFFFF', controlForegroundColor: '#000000' },
  dark: { bodyBackgroundColor: '#262626', bodyForegroundColor: '#FFFFFF', controlBackgroundColor: '#3A3A3A', controlForegroundColor: '#FFFFFF' },
} as const;
const TABS = ['window', 'schedule', 'options', 'sunpath'] as const;
const PRIMARY: Record<(typeof TABS)[number], string> = { window: '#run-year', schedule: '#run-schedule', options: '#run-compare', sunpath: '#draw-sun-path' };

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

/** Opens the pane at a width in a theme (the pane's height: 800 px). */
async function openPane(width: number, theme: keyof typeof THEMES): Promise<Page> {
  const preset = `window.__excelHostOptions = ${JSON.stringify({ theme: THEMES[theme] })};\n`;
  const page = await openAddinPage(browser, preset + HOST_JS, '/taskpane.html', (p) => p.setViewportSize({ width, height: 800 }));
  await page.waitForSelector('#run-year');
  return page;
}

/** What is wrong with the view as laid out: overflow to the side, small text, a primary action out of view. */
function layoutProblems(primary: string): string[] {
  const problems: string[] = [];
  const vw = document.documentElement.clientWidth;
  const vh = document.documentElement.clientHeight;
  if (document.documentElement.scrollWidth > vw) problems.push(`page scrolls sideways: ${document.documentElement.scrollWidth} > ${vw}`);
  const visible = (el: Element) => {
    const r = el.getBoundingClientRect();
    return r.width > 0 && r.height > 0 && getComputedStyle(el).visibility !== 'hidden' && !el.closest('[hidden]');
  };
  for (const el of Array.from(document.querySelectorAll('body *'))) {
    if (!visible(el)) continue;
    const r = el.getBoundingClientRect();
    const scroller = el.closest('.panels, .tabs');
    if (!scroller && r.right > vw + 0.5) problems.push(`${el.tagName.toLowerCase()}#${el.id || '?'}.${el.className} sticks out to ${r.right.toFixed(0)} px`);
    if (scroller && el !== scroller && r.right > scroller.getBoundingClientRect().right + 0.5 && scroller.classList.contains('panels')) problems.push(`${el.tagName.toLowerCase()}#${el.id || '?'} wider than its panel`);
  }
  // Text: every element with its own text, HTML and SVG alike, at its rendered size.
  for (const el of Array.from(document.querySelectorAll('body *'))) {
    const own = Array.from(el.childNodes).some((n) => n.nodeType === Node.TEXT_NODE && (n.textContent ?? '').trim() !== '');
    if (!own || !visible(el)) continue;
    let size = parseFloat(getComputedStyle(el).fontSize);
    if (el instanceof SVGGraphicsElement) size *= el.getScreenCTM()?.a ?? 1;
    if (size < 11 - 1e-6) problems.push(`"${(el.textContent ?? '').trim().slice(0, 30)}" is ${size.toFixed(1)} px`);
  }
  const p = document.querySelector(primary);
  if (!p || !visible(p)) problems.push(`${primary} is not shown`);
  else {
    const r = p.getBoundingClientRect();
    if (r.top < 0 || r.bottom > vh || r.left < 0 || r.right > vw) problems.push(`${primary} is out of view at ${r.top.toFixed(0)}–${r.bottom.toFixed(0)} px of ${vh}`);
  }
  if (window.scrollY !== 0) problems.push('the page itself scrolled');
  return problems;
}

/** Serious and critical findings of axe-core on the page as it is (WCAG 2.1 A and AA rules). */
async function axeFindings(page: Page): Promise<string[]> {
  // Legacy mode runs axe in the page itself (the pages here have no frames to gather results from).
  const result = await new AxeBuilder({ page }).setLegacyMode(true).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id} (${v.impact}): ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

describe('the pane in the Office look, light and dark, at 350 and 500 px', () => {
  beforeAll(() => fs.mkdirSync(SHOTS, { recursive: true }));

  for (const theme of ['light', 'dark'] as const) {
    for (const width of [350, 500]) {
      test(`${theme}, ${width} px: every tab fits, reads at 11 px or more, keeps its primary action in view, and passes axe`, async () => {
        const page = await openPane(width, theme);
        expect(await page.evaluate(() => document.documentElement.dataset.theme)).toBe(theme);
        const found: string[] = [];
        for (const tab of TABS) {
          await page.click(`#tab-${tab}`);
          if (tab === 'sunpath') await page.waitForSelector('#sun-path svg');
          await page.screenshot({ path: path.join(SHOTS, `pane-${width}-${theme}-${tab}.png`) });
          found.push(...(await page.evaluate(layoutProblems, PRIMARY[tab])).map((p) => `${tab}: ${p}`));
          // axe on every tab in both themes at the default width; on the window tab at 500 px.
          if (width === 350 || tab === 'window') found.push(...(await axeFindings(page)).map((p) => `${tab}: ${p}`));
        }
        expect(found).toEqual([]);
        await page.close();
      });
    }
  }

  test('the checks catch what they look for: tiny text, a box wider than the pane, and a contrast failure', async () => {
    const page = await openPane(350, 'light');
    await page.evaluate(() => {
      const small = document.createElement('p');
      small.textContent = 'tiny';
      small.style.fontSize = '9px';
      const wide = document.createElement('div');
      wide.textContent = 'wide';
      wide.style.width = '600px';
      const faint = document.createElement('p');
      faint.textContent = 'faint words';
      faint.style.color = '#eeeeee';
      document.getElementById('panel-window')!.prepend(small, wide, faint);
    });
    const problems = await page.evaluate(layoutProblems, '#run-year');
    expect(problems.some((p) => p.includes('"tiny" is 9.0 px'))).toBe(true);
    expect(problems.some((p) => p.includes('wider than its panel'))).toBe(true);
    expect((await axeFindings(page)).some((f) => f.startsWith('color-contrast'))).toBe(true);
    await page.close();
  });
});

describe('the pane by keyboard alone', () => {
  test('Tab reaches the tabs, the boxes and the primary action; arrow keys change tab; Enter runs', async () => {
    const page = await openPane(350, 'light');
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('tab-window');
    await page.keyboard.press('ArrowRight');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('tab-schedule');
    expect(await page.isVisible('#panel-schedule')).toBe(true);
    await page.keyboard.press('End');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('tab-sunpath');
    await page.keyboard.press('Home');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('tab-window');
    // Onward through the panel and every box to the primary action, then Enter writes the year.
    const seen: string[] = [];
    for (let i = 0; i < 120 && seen.at(-1) !== 'run-year'; i++) {
      await page.keyboard.press('Tab');
      seen.push((await page.evaluate(() => document.activeElement?.id)) ?? '');
    }
    expect(seen).toContain('name');
    expect(seen).toContain('overhangProjection');
    expect(seen.at(-1)).toBe('run-year');
    // The focused box is drawn with a visible focus ring.
    await page.focus('#latitude');
    expect(await page.evaluate(() => getComputedStyle(document.activeElement!).outlineStyle)).not.toBe('none');
    await page.focus('#run-year');
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => /^Wrote /.test(document.getElementById('status')?.textContent ?? ''), undefined, { timeout: 60_000 });
    await page.close();
  });
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
