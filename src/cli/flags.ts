/**
 * Reading `--name value` / `--name=value` flags of the table, schedule and demo commands. Unknown
 * flags, missing values and stray arguments are usage errors (exit code 2).
 */
import { CliUsageError } from './cliError';

/** The flags a command takes: `true` for flags with a value, `false` for switches. */
export type FlagSpec = Readonly<Record<string, boolean>>;

/** Parsed flags: values by name (switches hold 'true'). */
export type Flags = Map<string, string>;

/**
 * Parses command-line flags.
 * @param argv - the arguments after the command name
 * @param spec - allowed flag names (without `--`), each taking a value or not
 * @throws CliUsageError for an unknown flag, a flag given twice, a missing value or a stray argument
 */
export function parseFlags(argv: readonly string[], spec: FlagSpec): Flags {
  const flags: Flags = new Map();
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === '-h') {
      flags.set('help', 'true');
      continue;
    }
    const m = /^--([A-Za-z][\w-]*)(?:=(.*))?$/s.exec(arg);
    if (!m) throw new CliUsageError(`unexpected argument "${arg}" (flags start with --)`);
    const [, name, inline] = m;
    if (!(name in spec)) throw new CliUsageError(`unknown flag --${name}`);
    if (flags.has(name)) throw new CliUsageError(`--${name} is given twice`);
    if (!spec[name]) {
      if (inline !== undefined) throw new CliUsageError(`--${name} takes no value`);
      flags.set(name, 'true');
      continue;
    }
    const value = inline ?? argv[++i];
    if (value === undefined || (inline === undefined && value.startsWith('--'))) throw new CliUsageError(`--${name} needs a value`);
    flags.set(name, value);
  }
  return flags;
}

/** A flag's value, or a usage error naming it when it is missing. */
export function requireFlag(flags: Flags, name: string, what: string): string {
  const v = flags.get(name);
  if (v === undefined || v.trim() === '') throw new CliUsageError(`--${name} ${what} is required`);
  return v;
}

/** The output kind from a file name's extension. */
export function outputKind(file: string, allowed: readonly string[]): string {
  const m = /\.([A-Za-z0-9]+)$/.exec(file);
  const ext = m ? m[1].toLowerCase() : '';
  if (!allowed.includes(ext)) throw new CliUsageError(`--out ${file}: the file name must end in ${allowed.map((a) => `.${a}`).join(' or ')}`);
  return ext;
}
