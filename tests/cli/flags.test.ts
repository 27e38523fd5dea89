/** Command-line flags: values, switches and usage errors. */
import { CliUsageError } from '../../src/cli/cliError';
import { outputKind, parseFlags, requireFlag } from '../../src/cli/flags';

const SPEC = { out: true, weather: true, help: false } as const;

describe('flags', () => {
  it('reads --name value, --name=value and switches', () => {
    const f = parseFlags(['--out', 'a.csv', '--weather=w.csv', '--help'], SPEC);
    expect([...f.entries()]).toEqual([['out', 'a.csv'], ['weather', 'w.csv'], ['help', 'true']]);
    expect(parseFlags(['-h'], SPEC).get('help')).toBe('true');
  });

  it.each([
    [['--colour', 'red'], 'unknown flag --colour'],
    [['--out'], '--out needs a value'],
    [['--out', '--help'], '--out needs a value'],
    [['--out', 'a', '--out', 'b'], '--out is given twice'],
    [['--help=yes'], '--help takes no value'],
    [['a.csv'], 'unexpected argument "a.csv" (flags start with --)'],
  ])('refuses %j as a usage error', (argv, message) => {
    expect(() => parseFlags(argv, SPEC)).toThrow(new CliUsageError(message));
  });

  it('names a missing required flag and checks the output extension in any case', () => {
    expect(() => requireFlag(new Map(), 'out', 'FILE')).toThrow('--out FILE is required');
    expect(outputKind('Annual.XLSX', ['csv', 'xlsx'])).toBe('xlsx');
    expect(() => outputKind('annual', ['csv', 'xlsx'])).toThrow(CliUsageError);
  });
});
