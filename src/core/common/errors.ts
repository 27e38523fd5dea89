/** The rule every monthly list states when refused (window JSON, worksheet arguments, window ranges, the pane). */
export const MONTHLY_LIST_RULE = 'must hold one value for the whole year or 12 monthly values (January first)';

/**
 * The one error type of the calculation core.
 *
 * Every core function that rejects its input throws a {@link SunpaneError} naming the argument,
 * the value it was given and the allowed range. Only the adapters (Excel, CLI, pane) turn it into
 * something a user sees; they show {@link SunpaneError.message} unchanged.
 */
/**
 * `Number`'s checks taken once: under jest every lookup of a global (`Number`, `Math`, `Infinity`,
 * `NaN`) from a module costs about a microsecond (docs/testing.md), and these run on hot paths.
 */
const { isFinite: finite, isInteger: integer } = Number;

export class SunpaneError extends Error {
  /** The argument's name, as in the registry and the glossary (e.g. `latitude`). */
  readonly argument: string;
  /** The value that was refused (as given). */
  readonly value: unknown;
  /** The allowed values in words, e.g. `from -90 to 90 °`. */
  readonly allowed: string;
  /** What was found, in words (e.g. `they sum to 1.1`), when the message gives it. */
  readonly detail?: string;

  constructor(argument: string, value: unknown, allowed: string, detail?: string) {
    super(`${argument} = ${describeValue(value)} is not allowed: ${requiredWords(allowed)}${detail ? ` (${detail})` : ''}`);
    this.name = 'SunpaneError';
    this.argument = argument;
    this.value = value;
    this.allowed = allowed;
    if (detail !== undefined) this.detail = detail;
  }
}

/**
 * `is required: must be …` as it reads after "is not allowed:" — `it is required and must be …` (not
 * the doubled "is not allowed: is required: must be"); likewise `is needed too` → `it is needed too`.
 */
function requiredWords(allowed: string): string {
  return allowed.replace(/^is required: must be /, 'it is required and must be ').replace(/^is (required|needed)\b/, 'it is $1');
}

/** A short, readable rendering of a refused value for messages. */
export function describeValue(value: unknown): string {
  if (value === null || value === undefined) return 'blank';
  if (typeof value === 'string') return value === '' ? 'blank' : JSON.stringify(value.length > 40 ? `${value.slice(0, 37)}...` : value);
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return 'NaN';
    if (!Number.isFinite(value)) return value > 0 ? 'Infinity' : '-Infinity';
    return String(Number(value.toPrecision(10)));
  }
  if (Array.isArray(value)) return `a list of ${value.length}`;
  return String(value);
}

function unitSuffix(unit: string | undefined): string {
  return unit ? ` ${unit}` : '';
}

/** Returns `value` if it is a finite number, else throws naming `argument`. */
export function requireFinite(argument: string, value: unknown, unit?: string): number {
  if (typeof value !== 'number' || !finite(value)) {
    throw new SunpaneError(argument, value, `must be a finite number${unit ? ` in ${unit}` : ''}`);
  }
  return value;
}

/**
 * Returns `value` if it is a finite number within [min, max] (bounds optional and inclusive unless
 * `exclusiveMin` / `exclusiveMax`), else throws a {@link SunpaneError} stating the allowed range.
 */
/** The default options of {@link requireRange}, shared (no object per call). */
const NO_OPTIONS: { exclusiveMin?: boolean; exclusiveMax?: boolean; integer?: boolean } = Object.freeze({});

export function requireRange(
  argument: string,
  value: unknown,
  min: number | undefined,
  max: number | undefined,
  unit?: string,
  options: { exclusiveMin?: boolean; exclusiveMax?: boolean; integer?: boolean } = NO_OPTIONS,
): number {
  // The message is built only on failure, and no options object is made per call: this check sits on hot paths.
  const ok =
    typeof value === 'number' &&
    finite(value) &&
    (!options.integer || integer(value)) &&
    (min === undefined || (options.exclusiveMin ? value > min : value >= min)) &&
    (max === undefined || (options.exclusiveMax ? value < max : value <= max));
  if (!ok) throw new SunpaneError(argument, value, rangeText(min, max, unit, options));
  return value as number;
}

/** The words for an allowed range, used in every range message so they read alike. */
export function rangeText(
  min: number | undefined,
  max: number | undefined,
  unit?: string,
  options: { exclusiveMin?: boolean; exclusiveMax?: boolean; integer?: boolean } = {},
): string {
  const kind = options.integer ? 'a whole number' : 'a number';
  const u = unitSuffix(unit);
  if (min !== undefined && max !== undefined) {
    if (options.exclusiveMin || options.exclusiveMax) {
      return `must be ${kind} ${options.exclusiveMin ? 'above' : 'of at least'} ${min} and ${options.exclusiveMax ? 'below' : 'up to'} ${max}${u}`;
    }
    return `must be ${kind} from ${min} to ${max}${u}`;
  }
  if (min !== undefined) return `must be ${kind} ${options.exclusiveMin ? 'above' : 'of at least'} ${min}${u}`;
  if (max !== undefined) return `must be ${kind} ${options.exclusiveMax ? 'below' : 'of at most'} ${max}${u}`;
  return `must be ${kind}${u ? ` in${u}` : ''}`;
}
