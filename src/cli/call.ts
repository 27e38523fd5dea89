/**
 * `sunpane list` and `sunpane call NAME ARG...`: any registered function, evaluated exactly as in a
 * worksheet cell.
 */
import { SunpaneError } from '../core/common';
import { formatSerialIso } from '../core/time';
import { applyFunction } from '../registry/evaluate';
import { FUNCTIONS, findFunction, paramHelp, signature } from '../registry';
import { NotAvailable, type OutCell, type OutTable } from '../registry/types';
import { parseCliArg } from './args';

export interface Output {
  out: (text: string) => void;
  err: (text: string) => void;
}

export const LIST_HELP = `usage: sunpane list

Prints every worksheet function, one a line: its signature (optional parameters in brackets), a
tab, and what it does. \`sunpane call NAME --help\` describes one function's parameters.`;

export const CALL_HELP = `usage: sunpane call NAME [ARG...] [--iso]

Evaluates the worksheet function NAME (see \`sunpane list\`) exactly as a cell would, and prints
the result: one line per row, cells separated by tabs; errors as #VALUE! or #N/A with the message
on stderr.

  ARG      a number, TRUE/FALSE, a text, "" for a blank cell, or a range as an Excel array
           constant: {10,20,30} is a row, {1;2;3} a column, {1,2;3,4} two rows
  --iso    print date-time results as ISO 8601 local date-times instead of serial numbers
  --help   this text; \`sunpane call NAME --help\` describes that function

Exit codes: 0 done (a #N/A cell is an answer, e.g. no sunrise on a polar day), 1 a cell is #VALUE!
(a refused argument), 2 wrong usage.`;

/** Prints every function's signature and summary, one per line. */
export function listCommand(argv: readonly string[], io: Output): number {
  if (argv.some(isHelp)) {
    io.out(LIST_HELP);
    return 0;
  }
  if (argv.length > 0) {
    io.err(`sunpane: list takes no arguments (got "${argv[0]}")`);
    io.err(LIST_HELP.split('\n')[0]);
    return 2;
  }
  for (const fn of FUNCTIONS) io.out(`${signature(fn)}\t${fn.summary}`);
  return 0;
}

function isHelp(arg: string): boolean {
  return arg === '--help' || arg === '-h';
}

/** One function's help: usage line, summary, each parameter with its meaning, unit, range and default, and the result. */
export function functionHelp(name: string): string | undefined {
  const fn = findFunction(name);
  if (!fn) return undefined;
  const width = Math.max(...fn.params.map((p) => p.name.length), 6) + 2;
  const lines = [`usage: sunpane call ${fn.name} ${fn.params.map((p) => (p.default !== undefined || p.optional ? `[${p.name}]` : p.name)).join(' ')}`, '', `${signature(fn)}: ${fn.summary}`, ''];
  for (const p of fn.params) lines.push(`  ${p.name.padEnd(width)}${paramHelp(p)}`);
  lines.push('', `Result: ${fn.result.description}${fn.result.unit ? ` [${fn.result.unit}]` : ''}`);
  return lines.join('\n');
}

function formatNumber(n: number): string {
  return String(Number(n.toPrecision(12)));
}

/** The text a cell shows, as the CLI prints it. */
export function formatCell(cell: OutCell, iso: boolean): string {
  if (cell instanceof SunpaneError) return '#VALUE!';
  if (cell instanceof NotAvailable) return '#N/A';
  if (typeof cell === 'number') return iso ? formatSerialIso(cell) : formatNumber(cell);
  return cell;
}

/** Evaluates `NAME ARG...`; prints the result (tab-separated rows), messages to stderr. */
export function callCommand(argv: readonly string[], io: Output): number {
  const iso = argv.includes('--iso');
  const [name, ...rest] = argv.filter((a) => a !== '--iso');
  if (name === undefined || isHelp(name)) {
    if (name !== undefined) {
      io.out(CALL_HELP);
      return 0;
    }
    io.err(CALL_HELP.split('\n')[0]);
    io.err('(see `sunpane list` for the functions, `sunpane call --help` for more)');
    return 2;
  }
  if (rest.some(isHelp)) {
    const help = functionHelp(name);
    if (help === undefined) {
      io.err(`sunpane: no function named ${name}; \`sunpane list\` shows them all`);
      return 2;
    }
    io.out(help);
    return 0;
  }
  const fn = findFunction(name);
  if (!fn) {
    io.err(`sunpane: no function named ${name}; \`sunpane list\` shows them all`);
    return 2;
  }
  let table: OutTable;
  try {
    table = applyFunction(fn, rest.map(parseCliArg));
  } catch (err) {
    if (err instanceof SunpaneError) {
      io.err(err.message);
      return 1;
    }
    throw err;
  }
  const asIso = iso && fn.result.kind === 'dateTime';
  let failed = false;
  for (const row of table) {
    io.out(row.map((c) => formatCell(c, asIso && typeof c === 'number')).join('\t'));
    for (const c of row) {
      if (c instanceof SunpaneError) {
        io.err(c.message);
        failed = true;
      } else if (c instanceof NotAvailable) io.err(c.message);
    }
  }
  return failed ? 1 : 0;
}
