/**
 * Reading `--name value` / `--name=value` flags of the table, schedule and demo commands. Unknown
 * flags, missing values and stray arguments are usage errors (exit code 2).
 */
import { DATE_SYSTEM_WORDS, type DateSystem } from '../core/time';
import { GLOSSARY } from '../registry/glossary';
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

/** The flag that names the written workbook's date system (the glossary's dateSystem, its values). */
export const DATE_SYSTEM_FLAG = 'date-system';

/**
 * The help lines of {@link DATE_SYSTEM_FLAG}, the same words for every command that writes a
 * workbook; `column` is where the command's help puts its descriptions.
 */
export function dateSystemHelp(column: number): string {
  const pad = ' '.repeat(column);
  return [
    `  --${DATE_SYSTEM_FLAG} ${GLOSSARY.dateSystem.choices!.join('|')}`,
    `${pad}the workbook's date system (glossary field ${GLOSSARY.dateSystem.name}; default ${GLOSSARY.dateSystem.default}): 1904 writes`,
    `${pad}it in Excel's 1904 date system (serial 0 = 1 January 1904), every date-time`,
    `${pad}the same on screen; .xlsx only (a CSV's date-times are text)`,
  ].join('\n');
}

/**
 * The date system asked for with `--date-system` (1900 when left out).
 * @param kind - the output's kind: a CSV writes date-times as ISO 8601 text, the same in both
 *   systems, so 1904 is refused there rather than quietly left unused
 * @throws CliUsageError naming the flag, the value and the allowed values
 */
export function dateSystemFlag(flags: Flags, kind: string): DateSystem {
  const v = flags.get(DATE_SYSTEM_FLAG);
  if (v === undefined) return 1900;
  const choices = GLOSSARY.dateSystem.choices!;
  if (!choices.includes(v.trim())) throw new CliUsageError(`--${DATE_SYSTEM_FLAG} ${JSON.stringify(v)} is not allowed: ${DATE_SYSTEM_WORDS} (allowed: ${choices.join(', ')})`);
  const system = Number(v.trim()) as DateSystem;
  if (system === 1904 && kind !== 'xlsx') throw new CliUsageError(`--${DATE_SYSTEM_FLAG} 1904 applies to a workbook (.xlsx): a .${kind} file writes date-times as ISO 8601 text, read the same in both date systems (leave the flag out)`);
  return system;
}

/** The output kind from a file name's extension. */
export function outputKind(file: string, allowed: readonly string[]): string {
  const m = /\.([A-Za-z0-9]+)$/.exec(file);
  const ext = m ? m[1].toLowerCase() : '';
  if (!allowed.includes(ext)) throw new CliUsageError(`--out ${file}: the file name must end in ${allowed.map((a) => `.${a}`).join(' or ')}`);
  return ext;
}
