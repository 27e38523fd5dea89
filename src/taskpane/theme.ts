/**
 * The pane in the Office look: Fluent design tokens (@fluentui/tokens, the web light and dark
 * themes of Microsoft's Fluent 2 design system; the values the pane uses, in fluentTokens.ts) as CSS
 * custom properties that pane.css uses, the
 * light or dark set chosen to follow the Office theme (`Office.context.officeTheme`: a dark body
 * background means a dark theme), and the pane's background and text in Office's own body colours
 * so that it sits in the host without a seam. Outside Office the system's colour scheme decides.
 */
import { FLUENT_DARK, FLUENT_LIGHT } from './fluentTokens';
import { USED_TOKENS } from './tokenNames';

/** The colours of the Office theme the pane reads (Office.context.officeTheme). */
export interface OfficeThemeColours {
  bodyBackgroundColor?: string;
  bodyForegroundColor?: string;
}

/** Relative luminance of a `#RRGGBB` colour (WCAG 2.1), or undefined for anything else. */
export function luminance(colour: string | undefined): number | undefined {
  const m = /^#?([0-9a-f]{6})$/i.exec((colour ?? '').trim());
  if (!m) return undefined;
  const [r, g, b] = [0, 2, 4].map((k) => {
    const c = parseInt(m[1].slice(k, k + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** True for a dark Office theme: its body background is dark (luminance below 0.2). */
export function isDarkOfficeTheme(theme: OfficeThemeColours | undefined): boolean | undefined {
  const l = luminance(theme?.bodyBackgroundColor);
  return l === undefined ? undefined : l < 0.2;
}

/** The Office theme, when the pane runs in Office and the host tells it. */
function officeTheme(): OfficeThemeColours | undefined {
  if (typeof Office === 'undefined') return undefined;
  return (Office.context as { officeTheme?: OfficeThemeColours } | undefined)?.officeTheme;
}

/**
 * Sets the Fluent tokens of the light or dark theme on the document, following `theme` (by default
 * the Office theme; without one, the system's colour scheme). Returns the scheme chosen.
 */
export function applyTheme(doc: Document, theme: OfficeThemeColours | undefined = officeTheme()): 'light' | 'dark' {
  const dark = isDarkOfficeTheme(theme) ?? doc.defaultView?.matchMedia?.('(prefers-color-scheme: dark)').matches === true;
  const tokens = dark ? FLUENT_DARK : FLUENT_LIGHT;
  const root = doc.documentElement;
  for (const name of USED_TOKENS) root.style.setProperty(`--${name}`, String(tokens[name]));
  // Office's own body colours, when they read well together; the Fluent ones otherwise.
  const bg = theme?.bodyBackgroundColor;
  const fg = theme?.bodyForegroundColor;
  const lb = luminance(bg);
  const lf = luminance(fg);
  if (bg && fg && lb !== undefined && lf !== undefined && (Math.max(lb, lf) + 0.05) / (Math.min(lb, lf) + 0.05) >= 7 && (lb < 0.2) === dark) {
    root.style.setProperty('--paneBackground', bg.startsWith('#') ? bg : `#${bg}`);
    root.style.setProperty('--paneForeground', fg.startsWith('#') ? fg : `#${fg}`);
  } else {
    root.style.setProperty('--paneBackground', String(tokens.colorNeutralBackground1));
    root.style.setProperty('--paneForeground', String(tokens.colorNeutralForeground1));
  }
  root.dataset.theme = dark ? 'dark' : 'light';
  root.style.colorScheme = dark ? 'dark' : 'light';
  return dark ? 'dark' : 'light';
}

/**
 * Applies the theme now and again whenever it may have changed while the pane is open. Excel gives a
 * task pane no event when the user switches the Office theme (the documented theme-changed event
 * belongs to other hosts), so the pane reads the theme again when it becomes visible (the user
 * comes back to it after changing the theme) and when the system's light or dark scheme changes.
 * @param doc - the pane's document
 * @param read - where the theme comes from (default: the Office theme)
 * @returns the scheme chosen now
 */
export function followTheme(doc: Document, read: () => OfficeThemeColours | undefined = officeTheme): 'light' | 'dark' {
  const again = () => {
    if (doc.visibilityState !== 'hidden') applyTheme(doc, read());
  };
  doc.addEventListener?.('visibilitychange', again);
  doc.defaultView?.matchMedia?.('(prefers-color-scheme: dark)').addEventListener?.('change', again);
  return applyTheme(doc, read());
}
