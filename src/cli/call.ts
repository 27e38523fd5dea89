/**
 * `sunpane list` and `sunpane call NAME ARG...`: any registered function, evaluated exactly as in a
 * worksheet cell.
 */
import { SunpaneError } from '../core/common';
import { formatSerialIso } from '../core/time';
import { applyFunction } from '../registry/evaluate';
import { FUNCTIONS, findFunction, signature } from '../registry';
import { NotAvailable, type OutCell, type OutTable } from '../registry/types';
import { parseCliArg } from './args';

export interface Output {
  out: (text: string) => void;
  err: (text: string) => void;
}

/** Prints every function's signature and summary, one per line. */
export function listCommand(io: Output): number {
  for (const fn of FUNCTIONS) io.out(`${signature(fn)}\t${fn.summary}`);
  return 0;
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
  if (!name) {
    io.err('usage: sunpane call NAME [ARG...]   (see `sunpane list`; ranges as {1,2,3} or {1;2;3})');
    return 2;
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
