/**
 * The help deployed with the add-in: one HTML page per worksheet function (`help/<NAME>.html`, the
 * page each function's `helpUrl` in functions.json points at), an index (`help/index.html`) and one
 * stylesheet (`help/help.css`). Rendered from the same {@link FunctionPage} as the Markdown reference
 * (scripts/functionDocs.ts), so the pages say what the registry says; webpack.config.js emits them
 * into dist/ beside the task pane, and nothing of them enters the add-in's JavaScript.
 *
 * The pages run no script and carry no inline style: their Content-Security-Policy allows only the
 * stylesheet from the add-in's own origin (docs/platform.md#deployment-two-manifests-no-source-maps-a-content-security-policy).
 * Colours are the Fluent tokens the pane uses, light or dark as the system prefers.
 */
import { HELP_DIR, helpPagePath } from '../src/functions/metadata';
import { CAUTION } from '../src/outputs/caution';
import { FUNCTIONS, NAMESPACE } from '../src/registry';
import type { FunctionDescriptor } from '../src/registry/types';
import { FLUENT_DARK, FLUENT_LIGHT } from '../src/taskpane/fluentTokens';
import { type FunctionPage, functionPage } from './functionDocs';

/** The policy of every help page: nothing but the stylesheet from our own origin. */
export const HELP_POLICY = "default-src 'none'; style-src 'self'; img-src 'self'; base-uri 'none'; form-action 'none'";

/** Text as HTML (element content and quoted attribute values). */
export function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** `code`-marked text (`like this`) in a registry sentence, as <code>. */
function inline(text: string): string {
  return escapeHtml(text).replace(/`([^`]+)`/g, '<code>$1</code>');
}

function head(title: string): string {
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="${HELP_POLICY}">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<meta name="color-scheme" content="light dark">',
    `<title>${escapeHtml(title)}</title>`,
    '<link rel="stylesheet" href="help.css">',
    '</head>',
  ].join('\n');
}

function caution(): string {
  return `<p class="caution" role="note">${escapeHtml(CAUTION)}</p>`;
}

/** One function's help page. */
export function pageHtml(page: FunctionPage): string {
  const out: string[] = [head(`${page.name} — Sunpane function help`), '<body>'];
  out.push(`<nav><a href="index.html">All Sunpane functions</a> › ${escapeHtml(page.category)}</nav>`);
  out.push('<main>');
  out.push(`<h1>${escapeHtml(page.name)}</h1>`);
  out.push(`<p class="summary">${inline(page.summary)}.</p>`);
  out.push(`<pre class="formula"><code>=${escapeHtml(page.signature)}</code></pre>`);
  out.push('<p class="hint">Arguments in [brackets] may be left blank.</p>');
  out.push('<h2>Result</h2>');
  const lead = page.shape === 'spill' ? 'Spills a table: ' : 'For each cell: ';
  out.push(`<p>${lead}${inline(page.result)}.</p>`);
  if (page.columns.length > 0) out.push(`<p>Columns: ${page.columns.map((c) => `<code>${escapeHtml(c)}</code>`).join(', ')}.</p>`);
  out.push('<h2>Arguments</h2>');
  if (page.arguments.length === 0) out.push('<p>None.</p>');
  for (const a of page.arguments) {
    out.push(`<section class="argument" id="arg-${escapeHtml(a.name)}">`);
    out.push(`<h3><code>${escapeHtml(a.name)}</code>${a.optional ? ' <span class="tag">optional</span>' : ''}</h3>`);
    out.push(`<p>${inline(a.meaning)}.</p>`);
    out.push('<dl>');
    out.push(`<dt>Unit</dt><dd>${escapeHtml(a.unit)}</dd>`);
    out.push(`<dt>Allowed</dt><dd>${inline(a.allowed)}</dd>`);
    out.push(`<dt>If blank</dt><dd>${escapeHtml(a.ifBlank)}</dd>`);
    out.push('</dl>');
    out.push('</section>');
  }
  out.push(`<h2>${page.examples.length === 1 ? 'Example' : 'Examples'}</h2>`);
  if (page.examples.length === 0) out.push('<p>None yet.</p>');
  for (const ex of page.examples) out.push(`<pre class="formula"><code>${escapeHtml(ex.formula)}</code></pre>`, `<p class="note">${inline(ex.note)}</p>`);
  out.push('<h2>Outside check</h2>');
  out.push(`<p>${inline(page.outsideCheck.source)}</p>`);
  out.push(`<p class="hint">Tests in the Sunpane source: ${page.outsideCheck.tests.map((t) => `<code>${escapeHtml(t)}</code>`).join(', ')}.</p>`);
  out.push('<h2>Ranges and errors</h2>');
  out.push(`<p>${RANGES}</p>`);
  out.push(caution());
  out.push('</main>', '</body>', '</html>', '');
  return out.join('\n');
}

/** How every function treats ranges and bad input, said once for the help pages. */
const RANGES =
  'An argument that takes one value also takes a range: ranges pair cell by cell, a single row repeats down and a single column across, and the result spills. ' +
  'A bad cell makes only its own result <code>#VALUE!</code>, with a message naming the argument, the value and the allowed range; <code>#N/A</code> means there is no value for a documented reason (no sunrise in polar night, the sun behind the wall).';

/** The index: every function by category, with what it computes. */
export function indexHtml(functions: readonly FunctionDescriptor[]): string {
  const out: string[] = [head('Sunpane function help'), '<body>', '<main>'];
  out.push('<h1>Sunpane worksheet functions</h1>');
  out.push(`<p class="summary">Solar gain through windows as worksheet functions: type <code>=${NAMESPACE}.</code> in a cell and pick a function. Each page below gives what the function computes, every argument with its unit and allowed values, an example and the outside check its results are tested against.</p>`);
  out.push(caution());
  for (const category of [...new Set(functions.map((f) => f.category))]) {
    out.push(`<h2>${escapeHtml(category)}</h2>`, '<ul class="functions">');
    for (const fn of functions.filter((f) => f.category === category)) {
      const page = functionPage(fn);
      out.push(`<li><a href="${escapeHtml(fn.name)}.html">${escapeHtml(fn.name)}</a> — ${inline(page.summary)}</li>`);
    }
    out.push('</ul>');
  }
  out.push('<h2>Ranges and errors</h2>', `<p>${RANGES}</p>`);
  out.push('</main>', '</body>', '</html>', '');
  return out.join('\n');
}

/** CSS custom properties of one Fluent theme. */
function themeVars(t: Readonly<Record<string, string>>): string {
  const pick = ['colorNeutralBackground1', 'colorNeutralBackground3', 'colorNeutralForeground1', 'colorNeutralForeground2', 'colorNeutralStroke2', 'colorBrandForeground1', 'colorStatusWarningBackground1', 'colorStatusWarningBorder1'];
  return pick.map((k) => `  --${k}: ${t[k]};`).join('\n');
}

/** The stylesheet of the help pages: Office type and colours, light and dark, narrow-pane friendly. */
export function helpCss(): string {
  return `/* Sunpane help pages. Generated from the pane's Fluent tokens by scripts/helpPages.ts. */
:root {
${themeVars(FLUENT_LIGHT)}
  color-scheme: light dark;
}
@media (prefers-color-scheme: dark) {
  :root {
${themeVars(FLUENT_DARK)
  .split('\n')
  .map((l) => `  ${l}`)
  .join('\n')}
  }
}
* { box-sizing: border-box; }
body {
  margin: 0; padding: 12px 16px 24px;
  font-family: ${FLUENT_LIGHT.fontFamilyBase};
  font-size: ${FLUENT_LIGHT.fontSizeBase300}; line-height: ${FLUENT_LIGHT.lineHeightBase300};
  color: var(--colorNeutralForeground1); background: var(--colorNeutralBackground1);
}
main, nav { max-width: 48em; margin: 0 auto; }
nav { font-size: ${FLUENT_LIGHT.fontSizeBase200}; color: var(--colorNeutralForeground2); margin-bottom: 8px; }
a { color: var(--colorBrandForeground1); }
h1 { font-size: 20px; line-height: 28px; font-weight: ${FLUENT_LIGHT.fontWeightSemibold}; margin: 4px 0 8px; overflow-wrap: anywhere; }
h2 { font-size: ${FLUENT_LIGHT.fontSizeBase400}; line-height: 22px; font-weight: ${FLUENT_LIGHT.fontWeightSemibold}; margin: 20px 0 6px; padding-bottom: 2px; border-bottom: 1px solid var(--colorNeutralStroke2); }
h3 { font-size: ${FLUENT_LIGHT.fontSizeBase300}; margin: 12px 0 2px; font-weight: ${FLUENT_LIGHT.fontWeightSemibold}; }
p { margin: 4px 0 8px; }
code, pre { font-family: Consolas, 'Cascadia Mono', Menlo, monospace; font-size: 13px; }
code { background: var(--colorNeutralBackground3); border-radius: ${FLUENT_LIGHT.borderRadiusMedium}; padding: 0 3px; overflow-wrap: anywhere; }
pre { background: var(--colorNeutralBackground3); border-radius: ${FLUENT_LIGHT.borderRadiusMedium}; padding: 6px 8px; margin: 4px 0; white-space: pre-wrap; overflow-wrap: anywhere; }
pre code { padding: 0; }
.summary { font-size: ${FLUENT_LIGHT.fontSizeBase400}; line-height: 22px; }
.hint, .note { color: var(--colorNeutralForeground2); }
.tag { font-size: ${FLUENT_LIGHT.fontSizeBase200}; font-weight: normal; color: var(--colorNeutralForeground2); border: 1px solid var(--colorNeutralStroke2); border-radius: ${FLUENT_LIGHT.borderRadiusMedium}; padding: 0 4px; }
.argument { padding: 2px 0 6px; border-bottom: 1px solid var(--colorNeutralStroke2); }
.argument p { margin: 2px 0 4px; }
dl { display: grid; grid-template-columns: max-content 1fr; gap: 2px 10px; margin: 0 0 4px; }
dt { color: var(--colorNeutralForeground2); }
dd { margin: 0; overflow-wrap: anywhere; }
.caution { margin: 16px 0 8px; padding: 6px 10px; background: var(--colorStatusWarningBackground1); border: 1px solid var(--colorStatusWarningBorder1); border-radius: ${FLUENT_LIGHT.borderRadiusMedium}; }
ul.functions { padding-left: 18px; }
ul.functions li { margin: 2px 0; }
`;
}

/** Every help file: path under dist/ → content. */
export function helpFiles(functions: readonly FunctionDescriptor[] = FUNCTIONS): Map<string, string> {
  const files = new Map<string, string>();
  files.set(`${HELP_DIR}/help.css`, helpCss());
  files.set(`${HELP_DIR}/index.html`, indexHtml(functions));
  for (const fn of functions) files.set(helpPagePath(fn.name), pageHtml(functionPage(fn)));
  return files;
}
