/**
 * Writes src/taskpane/fluentTokens.ts: the values of the Fluent design tokens the pane uses, for the
 * web light and dark themes of @fluentui/tokens (the version pinned in package.json). The pane
 * carries only these values instead of both whole themes (about 30 KB of bundle);
 * tests/taskpane/theme.test.ts fails when they drift from the package.
 *
 * Usage: node -r ts-node/register/transpile-only scripts/fluent-tokens.ts
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { webDarkTheme, webLightTheme } from '@fluentui/tokens';
import { USED_TOKENS } from '../src/taskpane/tokenNames';

const pick = (theme: Record<string, string | number>) => Object.fromEntries(USED_TOKENS.map((k) => [k, String(theme[k])]));
const out = `/**
 * Fluent design tokens (@fluentui/tokens, web light and dark themes) that the pane's stylesheet
 * uses. Written by scripts/fluent-tokens.ts from the installed package; do not edit by hand.
 */
import type { TokenName } from './tokenNames';

export const FLUENT_LIGHT: Readonly<Record<TokenName, string>> = ${JSON.stringify(pick(webLightTheme as never), null, 2)};

export const FLUENT_DARK: Readonly<Record<TokenName, string>> = ${JSON.stringify(pick(webDarkTheme as never), null, 2)};
`;
fs.writeFileSync(path.join(__dirname, '..', 'src', 'taskpane', 'fluentTokens.ts'), out);
