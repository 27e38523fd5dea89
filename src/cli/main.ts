/**
 * The `sunpane` command line: the same engine as the worksheet functions, without Excel.
 */
import { callCommand, listCommand, type Output } from './call';

interface Command {
  summary: string;
  run(argv: readonly string[], io: Output): number | Promise<number>;
}

const COMMANDS: Record<string, Command> = {
  list: { summary: 'print every worksheet function with its signature', run: (_argv, io) => listCommand(io) },
  call: { summary: 'call NAME ARG...: evaluate a function as in a cell (ranges as {1,2;3,4}; --iso prints date-times as text)', run: callCommand },
};

/** Registers a further command (used by the table / schedule / demo modules). */
export function addCommand(name: string, command: Command): void {
  COMMANDS[name] = command;
}

function usage(io: Output): void {
  io.out('usage: sunpane COMMAND [ARGS...]\n');
  for (const [name, c] of Object.entries(COMMANDS)) io.out(`  ${name.padEnd(10)} ${c.summary}`);
  io.out('\nResults are estimates by published methods; design decisions need a qualified engineer and the local energy code.');
}

/** Runs the command line; resolves to the process exit code. */
export async function main(argv: readonly string[], io: Output = { out: (t) => process.stdout.write(`${t}\n`), err: (t) => process.stderr.write(`${t}\n`) }): Promise<number> {
  const [name, ...rest] = argv;
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
