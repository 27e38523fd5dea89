/**
 * Checks of many cases with few calls of jest's `expect`.
 *
 * `expect(value)` makes a function for every matcher it knows, six ways over (plain, `.not`,
 * `.resolves`, `.rejects` …), and an Error, before it compares anything: tens of microseconds a call, so a loop that expects something of each of the
 * 8,760 hours of a year, or of each run of a property, spends most of its time there. In such a loop
 * the case is compared with plain code instead:
 *
 * - over a fixed set of cases (every hour, every grid point): {@link Mismatches} writes down each
 *   case that fails (the first {@link LISTED}, then a count) and one `expect(found.list).toEqual([])`
 *   after the loop fails naming them;
 * - inside a fast-check property: {@link must} throws at the first failing case, so fast-check
 *   reports and shrinks the counterexample as it does for a failed expect.
 *
 * Either way each case is held to the same comparison as before; only the reporting is gathered.
 */

/** How many failing cases a {@link Mismatches} lists by name. */
export const LISTED = 20;

/** Failing cases of a loop, for one expect after it. */
export class Mismatches {
  private readonly found: string[] = [];
  private more = 0;

  /** Writes down the case `what()` describes when `ok` is false (the words are built only then). */
  check(ok: boolean, what: () => string): void {
    if (ok) return;
    if (this.found.length < LISTED) this.found.push(what());
    else this.more++;
  }

  /** The failing cases: the first {@link LISTED}, and how many more there were. */
  get list(): string[] {
    return this.more > 0 ? [...this.found, `… and ${this.more} more`] : [...this.found];
  }
}

/**
 * jest's `toBeCloseTo(expected, digits)` as a plain test: |expected − received| < 10^−digits / 2, and
 * equal infinities pass.
 */
export function closeToDigits(received: number, expected: number, digits = 2): boolean {
  if (received === Number.POSITIVE_INFINITY && expected === Number.POSITIVE_INFINITY) return true;
  if (received === Number.NEGATIVE_INFINITY && expected === Number.NEGATIVE_INFINITY) return true;
  return Math.abs(expected - received) < Math.pow(10, -digits) / 2;
}

/** Throws an Error with the words `what()` gives when `ok` is false (for fast-check properties). */
export function must(ok: boolean, what: () => string): void {
  if (!ok) throw new Error(what());
}
