/**
 * The function reference, generated from the registry so that the documents say what the code does:
 * `docs/functions.md` (the glossary of shared parameters and every function) and one page per
 * function, `docs/functions/<NAME>.md`. `npm run docs` writes them; tests/docs/functions.test.ts
 * fails when a committed file differs from what this module gives.
 *
 * Two steps, kept apart so that other renderers can reuse the first:
 * 1. {@link functionPage} collects what a reader needs to know about one function — what it
 *    computes, each argument with unit, allowed values and default, the result, examples and the
 *    outside check — as plain data (a {@link FunctionPage}), with no formatting;
 * 2. {@link pageMarkdown} renders that data as Markdown. An HTML renderer (for example for the
 *    add-in's help pages) takes the same {@link FunctionPage}.
 */
import { GLOSSARY } from '../src/registry/glossary';
import { DATE_TIME_FORMAT, FUNCTIONS, NAMESPACE, isOptional, signature, unitWords } from '../src/registry';
import { allowedText } from '../src/registry/evaluate';
import type { FunctionDescriptor, ParamDescriptor } from '../src/registry/types';

/** One argument of a function, as a reader needs it. */
export interface ArgumentDoc {
  /** The name Excel shows, e.g. `latitude`. */
  name: string;
  /** What it is. */
  meaning: string;
  /** Unit as printed (`°`, `W/m²`); `no unit` for a pure number; for other kinds what the value is (`date-time`, `text`, …). */
  unit: string;
  /** The values it accepts, in words (e.g. `a number from -90 to 90 °`). */
  allowed: string;
  /** What a blank or omitted argument means: `required`, the default value, or `optional`. */
  ifBlank: string;
  /** True when the argument may be left blank. */
  optional: boolean;
}

/** Everything the reference says about one function, unformatted. */
export interface FunctionPage {
  /** Worksheet name without the namespace, e.g. `SUNALTITUDE`. */
  name: string;
  /** `SUNPANE.SUNALTITUDE(dateTime, latitude, …, [deltaT])`: optional arguments in brackets. */
  signature: string;
  /** Reference section, e.g. `Time and sun`. */
  category: string;
  /** What it computes, one line. */
  summary: string;
  /** `value` (one number per cell; ranges broadcast) or `spill` (a table). */
  shape: 'value' | 'spill';
  /** What the result is, with its unit and the bounds it always keeps. */
  result: string;
  /** Column headings of a spilled result, when fixed. */
  columns: readonly string[];
  arguments: readonly ArgumentDoc[];
  /** Worked examples: the formula as typed, and what it shows. */
  examples: readonly { formula: string; note: string }[];
  /** The outside check: its source and the test files that make it. */
  outsideCheck: { source: string; tests: readonly string[] };
}

function noEndStop(text: string): string {
  return text.trim().replace(/\.$/, '');
}

function defaultText(value: number | string | boolean): string {
  if (typeof value === 'string') return `"${value}"`;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  return String(value);
}

function countText(p: ParamDescriptor): string {
  const n = p.length;
  if (n?.exact !== undefined) return `${n.exact} numbers`;
  if (n?.min !== undefined && n?.max !== undefined) return `${n.min} to ${n.max} numbers`;
  if (n?.min !== undefined) return `at least ${n.min} numbers`;
  if (n?.max !== undefined) return `up to ${n.max} numbers`;
  return 'numbers';
}

/** The values a parameter accepts, in words, without "must be". */
export function allowedWords(p: ParamDescriptor): string {
  switch (p.kind) {
    case 'numberList': {
      const each = allowedText({ ...p, kind: 'number' }).replace(/^must be /, '');
      const order = p.ascending ? ', strictly ascending' : '';
      const gaps = p.gapsAreMissing ? '; a blank or text cell marks its value missing' : '';
      return `a range of ${countText(p)}, each ${each}${order}${gaps}`;
    }
    case 'table':
      return 'a range';
    default:
      return allowedText(p).replace(/^must be /, '');
  }
}

/** An argument as the reference shows it. */
export function argumentDoc(p: ParamDescriptor): ArgumentDoc {
  const optional = isOptional(p);
  const ifBlank = p.default !== undefined ? defaultText(p.default) : optional ? 'optional (see meaning)' : 'required';
  return { name: p.name, meaning: noEndStop(p.description), unit: unitWords(p), allowed: allowedWords(p), ifBlank, optional };
}

function resultText(fn: FunctionDescriptor): string {
  const r = fn.result;
  const unit = r.unit ? ` [${r.unit}]` : '';
  // A date-time's bounds are those of the spreadsheet calendar: what helps is the number format.
  if (r.kind === 'dateTime') return `${noEndStop(r.description)}${unit}; the number is ${DATE_TIME_FORMAT}`;
  const bounds =
    r.min !== undefined && r.max !== undefined ? `; always from ${r.min} to ${r.max}` : r.min !== undefined ? `; never below ${r.min}` : r.max !== undefined ? `; never above ${r.max}` : '';
  return `${noEndStop(r.description)}${unit}${bounds}`;
}

/** The reference's content for one function. */
export function functionPage(fn: FunctionDescriptor): FunctionPage {
  return {
    name: fn.name,
    signature: `${NAMESPACE}.${signature(fn)}`,
    category: fn.category,
    summary: noEndStop(fn.summary),
    shape: fn.result.shape,
    result: resultText(fn),
    columns: fn.result.columns ?? [],
    arguments: fn.params.map(argumentDoc),
    examples: (fn.examples ?? []).map((ex) => ({ formula: `=${NAMESPACE}.${fn.name}(${ex.args.join(', ')})`, note: ex.note })),
    outsideCheck: { source: fn.outsideCheck.source, tests: [...fn.outsideCheck.tests] },
  };
}

/** Text for a Markdown table cell. */
function cell(text: string): string {
  return text.replace(/\|/g, '\\|').replace(/\n/g, ' ');
}

/** Where a page is rendered: its own file, or a section of docs/functions.md. */
export interface RenderPlace {
  /** Heading level of the function's title (1 on its own page, 3 in the reference). */
  level: number;
  /** Path from the rendered file to the repository root, e.g. `../../` for a page in docs/functions/. */
  toRoot: string;
}

/** One function as Markdown. */
export function pageMarkdown(page: FunctionPage, place: RenderPlace): string {
  const h = (extra: number) => '#'.repeat(place.level + extra);
  const out: string[] = [];
  out.push(`${h(0)} ${page.name}`, '');
  out.push(`${page.summary}.`, '');
  out.push('```', `=${page.signature}`, '```', '');
  const spill = page.shape === 'spill' ? `Spills a table: ${page.result}` : `Returns, for each cell: ${page.result}`;
  out.push(`${spill}.${page.columns.length > 0 ? ` Columns: ${page.columns.map((c) => `\`${c}\``).join(', ')}.` : ''}`, '');
  if (page.arguments.length > 0) {
    out.push('| argument | meaning | unit | allowed | if blank |', '|---|---|---|---|---|');
    for (const a of page.arguments) out.push(`| \`${a.name}\` | ${cell(a.meaning)} | ${cell(a.unit)} | ${cell(a.allowed)} | ${cell(a.ifBlank)} |`);
    out.push('');
  }
  if (page.examples.length > 0) {
    out.push(`${h(1)} Examples`, '');
    for (const ex of page.examples) out.push(`- \`${ex.formula}\` — ${ex.note}`);
    out.push('');
  }
  out.push(`${h(1)} Outside check`, '');
  out.push(page.outsideCheck.source, '');
  out.push(`Tests: ${page.outsideCheck.tests.map((t) => `[\`${t}\`](${place.toRoot}${t})`).join(', ')}.`, '');
  return out.join('\n');
}

const HEADER = '<!-- Generated from src/registry by `npm run docs`: do not edit by hand. -->';

function pageFile(name: string): string {
  return `docs/functions/${name}.md`;
}

/** The page of one function: the function, then where to read more. */
export function functionPageFile(fn: FunctionDescriptor): string {
  const body = pageMarkdown(functionPage(fn), { level: 1, toRoot: '../../' });
  const more =
    'Arguments that take single cells also take ranges (see [the function reference](../functions.md#how-the-functions-take-ranges)). ' +
    'Angles, times and signs follow [the conventions](../conventions.md); the methods and their sources are in [the methods](../methods.md).';
  return `${HEADER}\n\n${body}\n${more}\n`;
}

/** docs/functions.md: how the functions behave, the glossary, and every function. */
export function referenceFile(): string {
  const out: string[] = [HEADER, '', '# Function reference', ''];
  out.push(
    `Every worksheet function lives in the \`${NAMESPACE}\` namespace (type \`=${NAMESPACE}.\` in a cell). The same functions run on the command line as \`sunpane call NAME ARG…\`. Each function also has a page of its own in [functions/](functions/).`,
    '',
    '## How the functions take ranges',
    '',
    'Any argument that takes one value also takes a range, as Excel\'s own functions do: the result has as many rows as the tallest argument and as many columns as the widest, an argument of one row is repeated down and one of one column across (so a column of hours against a row of windows gives a 2-D table), and a cell where a range has no partner is `#N/A`. Each cell of a range is read once. A blank cell or an omitted argument takes the default shown under "if blank". A bad element makes only its own result cell an error (`#VALUE!`), whose message names the argument, the value and the allowed range; a documented "no value" (no sunrise during polar day, the sun behind the wall) is `#N/A` with the reason. Arguments described as "a range of … numbers" take the whole range as one list. Units, angles, times and signs follow [conventions.md](conventions.md).',
    '',
    '## A window in one argument',
    '',
    'The window functions (`SOLARGAIN`, `SOLARGAINSTEPS`, `SOLARGAINPEAKS`, `SOLARGAINYEAR`, `WINDOWSUNLIT`, `WINDOWSUNLITMASK`) take the whole window as one range of window fields: names in the first column with values beside them, or a header row of names over a value row — a row of a window schedule. Several value rows (or columns) are several windows, one result each. The names are those of the glossary below, the same as the window file, the schedule and the pane; case, spaces and a unit in brackets do not matter, and older names are accepted. In a schedule table, `=SUNPANE.SOLARGAIN(VSTACK($A$5:$R$5,$A6:$R6),$E$2)` hands the function the header row and its own row. The older forms with every field a positional argument (`WINDOWGAIN`, `GAINSTEPS`, `PEAKGAINS`, `WINDOWYEAR`, `SUNLITFRACTION`, `SUNLITMASK`) stay for saved workbooks. The fields, their defaults and how one is added: [window-fields.md](window-fields.md).',
    '',
  );
  out.push('## Glossary of shared parameters', '', 'One name means one thing in every function, the window range, the window file, the schedule and the pane. A window field (✓) may be written by its name, its label or an older name; case, spaces and a unit in brackets do not matter.', '');
  out.push('| name | meaning | unit | allowed | if blank | window field, also written |', '|---|---|---|---|---|---|');
  for (const p of Object.values(GLOSSARY)) {
    const a = argumentDoc(p);
    const also = p.window ? `✓ ${[p.label, ...(p.aliases ?? [])].map((w) => `\`${w}\``).join(', ')}` : '';
    out.push(`| \`${a.name}\` | ${cell(a.meaning)} | ${cell(a.unit)} | ${cell(a.allowed)} | ${cell(a.ifBlank)} | ${cell(also)} |`);
  }
  out.push('');
  const categories = [...new Set(FUNCTIONS.map((f) => f.category))];
  out.push('## Contents', '');
  for (const cat of categories) {
    const names = FUNCTIONS.filter((f) => f.category === cat).map((f) => `[${f.name}](#${f.name.toLowerCase()})`);
    out.push(`- ${cat}: ${names.join(', ')}`);
  }
  out.push('');
  for (const cat of categories) {
    out.push(`## ${cat}`, '');
    for (const fn of FUNCTIONS.filter((f) => f.category === cat)) {
      out.push(pageMarkdown(functionPage(fn), { level: 3, toRoot: '../' }));
      out.push(`Page of its own: [functions/${fn.name}.md](functions/${fn.name}.md).`, '');
    }
  }
  return `${out.join('\n').trimEnd()}\n`;
}

/** Every generated file: repository path → content. */
export function generatedDocs(): Map<string, string> {
  const files = new Map<string, string>();
  files.set('docs/functions.md', referenceFile());
  for (const fn of FUNCTIONS) files.set(pageFile(fn.name), functionPageFile(fn));
  return files;
}
