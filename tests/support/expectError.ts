/** Shared assertion: `fn` throws the one typed error, naming `argument` first in its message (and matching `message` when given). */
import { SunpaneError } from '../../src/core/common/errors';

export function expectArgumentError(fn: () => unknown, argument: string, message?: RegExp): void {
  let caught: unknown;
  try {
    fn();
  } catch (err) {
    caught = err;
  }
  expect(caught).toBeInstanceOf(SunpaneError);
  expect((caught as SunpaneError).argument).toBe(argument);
  expect((caught as SunpaneError).message.startsWith(argument)).toBe(true);
  if (message) expect((caught as SunpaneError).message).toMatch(message);
}

/** The typed error `fn` throws; a test fails when `fn` returns instead, or throws anything else. */
export function refusalOf(fn: () => unknown): SunpaneError {
  try {
    fn();
  } catch (err) {
    if (err instanceof SunpaneError) return err;
    throw err;
  }
  throw new Error('not refused');
}

/** The whole message of the typed error `fn` throws (see `refusalOf`). */
export function refusalMessage(fn: () => unknown): string {
  return refusalOf(fn).message;
}
