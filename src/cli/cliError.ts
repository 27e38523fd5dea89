/**
 * The command line's own error for bad input that is not a single core argument: a file that
 * cannot be read or written, a malformed line, a missing column. Exit code 1, message shown as is.
 * Usage mistakes (unknown flag, missing required flag) are {@link CliUsageError}, exit code 2.
 */
export class CliInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CliInputError';
  }
}

/** A mistake in how the command was called; the command's usage line follows the message. */
export class CliUsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CliUsageError';
  }
}

/** Exit codes of every command. */
export const EXIT_OK = 0;
export const EXIT_BAD_INPUT = 1;
export const EXIT_USAGE = 2;
