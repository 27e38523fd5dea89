/**
 * The pane's Office look: the Fluent token values it carries are those of @fluentui/tokens (outside
 * source: the npm package, version pinned in package.json), its stylesheet uses no token it does
 * not set, and the light or dark set follows the Office theme's body colour.
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { webDarkTheme, webLightTheme } from '@fluentui/tokens';
import { FLUENT_DARK, FLUENT_LIGHT } from '../../src/taskpane/fluentTokens';
import { applyTheme, followTheme, isDarkOfficeTheme, luminance } from '../../src/taskpane/theme';
import { USED_TOKENS } from '../../src/taskpane/tokenNames';

/** A stand-in of the little of a document that applyTheme touches. */
function fakeDocument() {
  const props = new Map<string, string>();
  const style = { setProperty: (k: string, v: string) => props.set(k, v), colorScheme: '' };
  const doc = { documentElement: { style, dataset: {} as Record<string, string> }, defaultView: undefined };
  return { doc: doc as unknown as Document, props, root: doc.documentElement };
}

describe('the pane follows the Office theme with Fluent design tokens', () => {
  test('the token values are those of the installed @fluentui/tokens web themes (rerun scripts/fluent-tokens.ts when this fails)', () => {
    for (const name of USED_TOKENS) {
      expect({ name, light: FLUENT_LIGHT[name] }).toEqual({ name, light: String(webLightTheme[name]) });
      expect({ name, dark: FLUENT_DARK[name] }).toEqual({ name, dark: String(webDarkTheme[name]) });
    }
  });

  test('every token the stylesheet uses is one the pane sets', () => {
    const css = fs.readFileSync(path.join(__dirname, '..', '..', 'src', 'taskpane', 'pane.css'), 'utf8');
    const used = new Set([...css.matchAll(/var\(--([A-Za-z0-9]+)/g)].map((m) => m[1]));
    const set = new Set<string>([...USED_TOKENS, 'paneBackground', 'paneForeground']);
    expect([...used].filter((t) => !set.has(t))).toEqual([]);
    expect(used.size).toBeGreaterThan(20);
  });

  test('a dark Office body background means the dark theme; white means light (WCAG relative luminance)', () => {
    expect(luminance('#FFFFFF')).toBeCloseTo(1, 12);
    expect(luminance('#000000')).toBe(0);
    expect(luminance('#808080')).toBeCloseTo(0.2158605, 6); // WCAG 2.1 formula, sRGB 128
    expect(isDarkOfficeTheme({ bodyBackgroundColor: '#262626' })).toBe(true);
    expect(isDarkOfficeTheme({ bodyBackgroundColor: '#FFFFFF' })).toBe(false);
    expect(isDarkOfficeTheme({ bodyBackgroundColor: 'not a colour' })).toBeUndefined();
    expect(isDarkOfficeTheme(undefined)).toBeUndefined();
  });

  test('applying the theme sets every token, and Office’s own body colours when they contrast', () => {
    const dark = fakeDocument();
    expect(applyTheme(dark.doc, { bodyBackgroundColor: '#262626', bodyForegroundColor: '#FFFFFF' })).toBe('dark');
    for (const name of USED_TOKENS) expect(dark.props.get(`--${name}`)).toBe(FLUENT_DARK[name]);
    expect(dark.props.get('--paneBackground')).toBe('#262626');
    expect(dark.root.dataset.theme).toBe('dark');

    const light = fakeDocument();
    expect(applyTheme(light.doc, { bodyBackgroundColor: '#FFFFFF', bodyForegroundColor: '#000000' })).toBe('light');
    expect(light.props.get('--colorBrandBackground')).toBe(FLUENT_LIGHT.colorBrandBackground);
    // Body colours that do not contrast enough give way to Fluent's own.
    const weak = fakeDocument();
    applyTheme(weak.doc, { bodyBackgroundColor: '#FFFFFF', bodyForegroundColor: '#AAAAAA' });
    expect(weak.props.get('--paneForeground')).toBe(FLUENT_LIGHT.colorNeutralForeground1);
    // Outside Office, without a window, the light theme.
    expect(applyTheme(fakeDocument().doc, undefined)).toBe('light');
  });

  test('a theme switched while the pane is open is followed when the pane is shown again', () => {
    const { doc, root } = fakeDocument();
    const handlers = new Map<string, () => void>();
    const d = doc as unknown as { addEventListener: (t: string, h: () => void) => void; visibilityState: string };
    d.addEventListener = (t, h) => handlers.set(t, h);
    d.visibilityState = 'visible';
    let theme = { bodyBackgroundColor: '#FFFFFF', bodyForegroundColor: '#000000' };
    expect(followTheme(doc, () => theme)).toBe('light');
    theme = { bodyBackgroundColor: '#1F1F1F', bodyForegroundColor: '#FFFFFF' };
    d.visibilityState = 'hidden';
    handlers.get('visibilitychange')!();
    expect(root.dataset.theme).toBe('light'); // hidden: nothing to repaint yet
    d.visibilityState = 'visible';
    handlers.get('visibilitychange')!();
    expect(root.dataset.theme).toBe('dark');
  });
});
