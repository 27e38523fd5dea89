/**
 * A stand-in for Excel's CustomFunctions runtime in node tests: the error class with its code and
 * message, the error codes as Excel's runtime defines them (#VALUE!, #N/A, ...), and an `associate`
 * that records what was registered.
 */
import type { CustomFunctionsRuntime, Handler } from '../../src/functions/adapter';

export class StubError {
  constructor(
    readonly code: string,
    readonly message?: string,
  ) {}
}

export const ERROR_CODE = {
  invalidValue: '#VALUE!',
  notAvailable: '#N/A',
  invalidNumber: '#NUM!',
  divisionByZero: '#DIV/0!',
  nullReference: '#NULL!',
} as const;

export interface StubRuntime extends CustomFunctionsRuntime {
  associated: Map<string, Handler>;
}

export function stubRuntime(): StubRuntime {
  const associated = new Map<string, Handler>();
  return {
    Error: StubError as unknown as CustomFunctionsRuntime['Error'],
    ErrorCode: ERROR_CODE,
    associate: (id, handler) => {
      if (associated.has(id)) throw new Error(`${id} associated twice`);
      associated.set(id, handler as Handler);
    },
    associated,
  };
}

/** Calls a handler; returns its result, or the StubError it threw (anything else propagates). */
export function callHandler(handler: Handler, ...args: unknown[]): unknown[][] | StubError {
  try {
    return handler(...args);
  } catch (err) {
    if (err instanceof StubError) return err;
    throw err;
  }
}
