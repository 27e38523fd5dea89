/**
 * The `sunpane` command line: the same engine as the worksheet functions, without Excel.
 */
import { SunpaneError } from '../core/common';
import { CALL_HELP, LIST_HELP, callCommand, listCommand, type Output } from './call';
import { CliInputError, CliUsageError, EXIT_BAD_INPUT, EXIT_USAGE } from './cliError';
import { DEMO_HELP, demoCommand } from './demo';
import { SCHEDULE_HELP, scheduleCommand } from './schedule';
import { TABLE_HELP, tableCommand } from './table';

interface Command {
  summary: string;
  help: string;
  run(argv: readonly string[], io: Output): number | Promise<number>;
}

/**
 * Runs a file command, turning its errors into messages and exit codes: bad input (a core
 * SunpaneError naming the field, or a file/row/line problem) → 1; wrong usage → 2 with the usage
 * line. Anything else is a programming error and propagates.
 */
function guarded(run: (argv: readonly string[], io: Output) => Promise<number>, help: string): Command['run'] {
  return async (argv, io) => {
    try {
      return await run(argv, io);
    } catch (err) {
      if (err instanceof SunpaneError || err instanceof CliInputError) {
        io.err(`sunpane: ${err.message}`);
        return EXIT_BAD_INPUT;
      }
      if (err instanceof CliUsageError) {
        io.err(`sunpane: ${err.message}`);
        io.err(help.split('\n')[0]);
        return EXIT_USAGE;
      }
      throw err;
    }
  };
}

const COMMANDS: Record<string, Command> = {
  list: { summary: 'print every worksheet function with its signature', help: LIST_HELP, run: listCommand },
  call: { summary: 'call NAME ARG...: evaluate a function as in a cell (ranges as {1,2;3,4}; --iso prints date-times as text)', help: CALL_HELP, run: callCommand },
  table: { summary: "one window's hourly year from a window file (+ hourly weather CSV) to .csv or .xlsx", help: TABLE_HELP, run: guarded(tableCommand, TABLE_HELP) },
  schedule: { summary: 'annual summary of many windows, one per row of a .csv or .xlsx schedule', help: SCHEDULE_HELP, run: guarded(scheduleCommand, SCHEDULE_HELP) },
  demo: { summary: 'write the demo workbook of an invented building (default folder out/demo)', help: DEMO_HELP, run: guarded(demoCommand, DEMO_HELP) },
};


function usage(io: Output): void {
  io.out('usage: sunpane COMMAND [ARGS...]   (`sunpane COMMAND --help` or `sunpane help COMMAND` for one command)\n');
  for (const [name, c] of Object.entries(COMMANDS)) io.out(`  ${name.padEnd(10)} ${c.summary}`);
  io.out('\nResults are estimates by published methods; design decisions need a qualified engineer and the local energy code.');
}

/** Runs the command line; resolves to the process exit code. */
export async function main(argv: readonly string[], io: Output = { out: (t) => process.stdout.write(`${t}\n`), err: (t) => process.stderr.write(`${t}\n`) }): Promise<number> {
  const [name, ...rest] = argv;
  if (name === 'help' && rest.length === 1 && COMMANDS[rest[0]]) {
    io.out(COMMANDS[rest[0]].help);
    return 0;
  }
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    usage(io);
    return name ? 0 : 2;
  }
  const command = COMMANDS[name];
  if (!command) {
    io.err(`sunpane: unknown command ${name}`);
    usage(io);
    return 2;
  }
  return command.run(rest, io);
}

/**
 * Runs the command line as the `sunpane` process: sets the exit code, and ends quietly with status 0
 * when the reader of its output goes away (`sunpane list | head -1`: writing to a closed pipe gives
 * EPIPE, which is not an error of ours). Unfinished output files are removed on the way out
 * (atomicWrite.ts).
 */
export function runAsProcess(argv: readonly string[]): void {
  for (const stream of [process.stdout, process.stderr]) {
    stream.on('error', (err: NodeJS.ErrnoException) => {
      if (err.code === 'EPIPE') process.exit(0);
      throw err;
    });
  }
  main(argv).then(
    (code) => {
      process.exitCode = code;
    },
    (err: unknown) => {
      process.stderr.write(`sunpane: ${err instanceof Error ? err.message : String(err)}\n`);
      process.exitCode = 2;
    },
  );
}
