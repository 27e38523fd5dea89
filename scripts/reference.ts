/**
 * Renders the README's function reference and glossary from the registry, so the docs say what
 * the code does. `npm run docs` writes them into README.md between the marker comments; a test
 * fails when the committed README is stale.
 */
import { GLOSSARY } from '../src/registry/glossary';
import { FUNCTIONS, NAMESPACE, paramHelp, signature } from '../src/registry';
import type { FunctionDescriptor } from '../src/registry/types';

export const START = '<!-- reference:start (generated from src/registry by `npm run docs`; do not edit by hand) -->';
export const END = '<!-- reference:end -->';

function cellText(text: string): string {
  return text.replace(/\|/g, '\\|').replace(/\n/g, ' ');
}

function renderFunction(fn: FunctionDescriptor): string {
  const lines: string[] = [];
  lines.push(`#### \`${NAMESPACE}.${signature(fn)}\``);
  lines.push('');
  const unit = fn.result.unit ? ` [${fn.result.unit}]` : '';
  const shape = fn.result.shape === 'spill' ? 'Spills' : 'Returns';
  lines.push(`${fn.summary} ${shape}: ${fn.result.description}${unit}.`);
  lines.push('');
  if (fn.params.length > 0) {
    lines.push('| parameter | meaning |', '|---|---|');
    for (const p of fn.params) lines.push(`| \`${p.name}\` | ${cellText(paramHelp(p))} |`);
    lines.push('');
  }
  for (const ex of fn.examples ?? []) {
    lines.push(`Example: \`=${NAMESPACE}.${fn.name}(${ex.args.join(', ')})\` — ${ex.note}`);
    lines.push('');
  }
  return lines.join('\n');
}

/** The generated block, markers included. */
export function renderReference(): string {
  const out: string[] = [START, ''];
  out.push('### Glossary of shared parameters', '');
  out.push('| name | meaning |', '|---|---|');
  for (const p of Object.values(GLOSSARY)) out.push(`| \`${p.name}\` | ${cellText(paramHelp(p))} |`);
  out.push('');
  const categories = [...new Set(FUNCTIONS.map((f) => f.category))];
  for (const cat of categories) {
    out.push(`### ${cat}`, '');
    for (const fn of FUNCTIONS.filter((f) => f.category === cat)) out.push(renderFunction(fn));
  }
  out.push(END);
  return out.join('\n');
}

/** README text with its generated block replaced. */
export function withReference(readme: string): string {
  const a = readme.indexOf(START);
  const b = readme.indexOf(END);
  if (a < 0 || b < a) throw new Error('README.md lacks the reference markers');
  return readme.slice(0, a) + renderReference() + readme.slice(b + END.length);
}
