/**
 * The shape of a worksheet-function descriptor: the single description of each function, from which
 * Excel's functions.json, the CLI's `call` and `list`, the function reference in docs/ and the fuzz
 * tests are all derived.
 */
import type { SunpaneError } from '../core/common';
import type { DateSystem, DaylightSavingRule } from '../core/time';

/** One value as it comes from a cell or a CLI argument. `null` is a blank cell. */
export type Scalar = number | string | boolean | null;
/** A range: rows of cells. */
export type Matrix = Scalar[][];
/** One argument as given: a single value or a range. */
export type RawArg = Scalar | Matrix;

/**
 * A cell that has no value for a documented reason that is not bad input (no sunrise during polar
 * day, for example). Excel shows it as #N/A with the message; the CLI prints `#N/A` and the message.
 */
export class NotAvailable {
  constructor(readonly message: string) {}
}

/** One result cell: a number, a text, a per-cell input error, or a documented "no value". */
export type OutCell = number | string | SunpaneError | NotAvailable;
/** A result: rows of cells (a single value is a 1 × 1 table). */
export type OutTable = OutCell[][];

/**
 * How a parameter is read.
 * - `number`: a finite number, checked against min/max/integer.
 * - `dateTime`: a spreadsheet serial in local standard time, or an ISO 8601 local date-time text.
 * - `choice`: one of `choices` (case-insensitive text), passed on in the spelling of `choices`.
 * - `flag`: TRUE/FALSE (also 1/0).
 * - `text`: any text (a label, a site id).
 * - `numberList`: the whole range, read row by row into a list of numbers (not broadcast).
 * - `choiceList`: the whole range, read row by row into a list of `choices` tokens (not broadcast).
 * - `table`: the whole range as given, rows of cells (not broadcast).
 * - `window`: a window described by glossary field names (src/registry/windowRange.ts): names in
 *   the first column with values beside them, or a header row over value rows; each value column
 *   or row is one window, and the windows broadcast like a column or a row of values.
 * - `clock`: the workbook's clock as one small range of glossary fields (a daylight-saving rule and
 *   the date system; src/registry/clockRange.ts), read whole (not broadcast). The date-time
 *   arguments of the call are read in its date system and on its clock.
 */
export type ParamKind = 'number' | 'dateTime' | 'choice' | 'flag' | 'text' | 'numberList' | 'choiceList' | 'table' | 'window' | 'clock';

export interface ParamDescriptor {
  /** The glossary name, camelCase, e.g. `latitude`. Shown as the parameter name in Excel. */
  name: string;
  /** One line saying what it is, without unit or range (those are added where it is shown). */
  description: string;
  kind: ParamKind;
  /** Unit as printed, e.g. `°`, `h`, `m`, `W/m²`; omit for pure numbers. */
  unit?: string;
  min?: number;
  max?: number;
  exclusiveMin?: boolean;
  exclusiveMax?: boolean;
  integer?: boolean;
  /** Allowed texts for `choice` (tokens; matched ignoring case, spaces and punctuation). */
  choices?: readonly string[];
  /** Other spellings accepted for a `choice`, each mapped to its token (e.g. `perez` → `perez1990`). */
  choiceAliases?: Readonly<Record<string, string>>;
  /** Default for a blank or omitted argument. A parameter with a default is optional. */
  default?: number | string | boolean;
  /** Optional without a default value: the function works something out itself (documented in `description`). */
  optional?: boolean;
  /**
   * For `numberList` / `choiceList`: allowed count of entries (`oneOf`: only these counts, e.g. one
   * value for the year or twelve by month). Element bounds use min/max.
   */
  length?: { min?: number; max?: number; exact?: number; oneOf?: readonly number[] };
  /** For `numberList`: the entries must sum to 1 (radiant time factors; the core checks the tolerance). */
  sumsToOne?: boolean;
  /** For `numberList`: numbers must be strictly ascending. */
  ascending?: boolean;
  /**
   * For `numberList` series (e.g. hourly weather): every cell keeps its place, and a blank or
   * non-numeric cell is a missing value (NaN) for the core to flag, instead of being skipped or refused.
   */
  gapsAreMissing?: boolean;
}

/** A parameter's value after reading: what `evaluate` receives under the parameter's name. */
export type ArgValue = number | string | boolean | number[] | string[] | Matrix | WindowFields | ClockFields | undefined;

/**
 * A clock as read from a clock range: the daylight-saving rule (serials in the 1900 date system,
 * whatever system the range was written in) and the workbook's date system.
 */
export interface ClockFields {
  readonly kind: 'clock';
  /** The rule, checked; undefined: local standard time all year. */
  readonly rule?: DaylightSavingRule;
  /** The date system serial date-times of the call are read and given in. */
  readonly dateSystem: DateSystem;
  /** Whether the range gave the date system (else 1900 by default, and a window's own may say otherwise). */
  readonly dateSystemGiven?: boolean;
}

/**
 * A window as read from a range: its fields by glossary name, each already read and checked
 * against the field's range (text, number, list of numbers), blanks left out.
 */
export interface WindowFields {
  readonly kind: 'window';
  /** Field values by glossary name. */
  readonly values: ReadonlyMap<string, string | number | number[]>;
  /** The names as the user wrote them, by glossary name (for messages). */
  readonly written: ReadonlyMap<string, string>;
}
export type Args = Record<string, ArgValue>;

export interface ResultDescriptor {
  /** `value`: one number per (broadcast) cell. `spill`: a table from single-value arguments. */
  shape: 'value' | 'spill';
  unit?: string;
  /** What the value is; for spills, what rows and columns hold. */
  description: string;
  /** For spills: column headings, when fixed. */
  columns?: readonly string[];
  /** Bounds a valid result always keeps (checked by the fuzz tests). */
  min?: number;
  max?: number;
  /** `dateTime`: the number is a local serial date-time (the CLI also shows it as ISO 8601). */
  kind?: 'number' | 'dateTime' | 'text';
}

/**
 * How a function's results are checked against something this project did not write: the source
 * (publication with table or example number, or npm library with version, labelled as in
 * docs/methods.md#how-the-outside-checks-are-labelled) and the test files that hold the function, or
 * the core code it calls, to that source. Shown in the function reference; every descriptor has one.
 */
export interface OutsideCheck {
  /** The source and its label, in a sentence or two. */
  source: string;
  /** Repository paths of the test files that make the check (each must exist; checked by tests/docs). */
  tests: readonly string[];
}

export interface FunctionDescriptor {
  /** Worksheet name without the namespace: uppercase letters and digits, e.g. `SUNALTITUDE`. */
  name: string;
  /** One line, shown in formula autocomplete and `sunpane list`. */
  summary: string;
  /** Reference section. */
  category: 'Time and sun' | 'Surface angles' | 'Shading' | 'Sky and irradiance' | 'Glazing' | 'Gain and load';
  params: readonly ParamDescriptor[];
  result: ResultDescriptor;
  /**
   * Computes one result from read and checked arguments (defaults already applied). Returns a
   * number, a {@link NotAvailable}, or for spills a table. Throws {@link SunpaneError} on bad input.
   */
  evaluate(args: Args): number | NotAvailable | OutTable;
  /**
   * For the fuzz tests and docs: combinations of individually valid arguments that the function
   * still refuses with a SunpaneError (e.g. overhang extensions that leave it a negative width).
   * Returns the reason, or undefined when the combination is valid. The fuzz tests expect a
   * SunpaneError exactly when this returns a reason.
   */
  refuses?(args: Args): string | undefined;
  /** Worked examples for the reference: arguments as typed in a cell (text), and what they show. */
  examples?: readonly { args: readonly string[]; note: string }[];
  /** The outside check of this function (for the reference; dropped from the add-in bundle). */
  outsideCheck: OutsideCheck;
  /**
   * For an older positional form kept so that saved workbooks keep working (its id is released):
   * the function that takes the window as one range and should be used instead.
   */
  supersededBy?: string;
}
