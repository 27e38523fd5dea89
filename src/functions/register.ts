/**
 * Registering every worksheet function with Excel's CustomFunctions runtime.
 */
import { FUNCTIONS } from '../registry';
import type { FunctionDescriptor } from '../registry/types';
import { type CustomFunctionsRuntime, makeHandler } from './adapter';

/** Excel's CustomFunctions object when the page runs inside Excel, else undefined. */
export function hostRuntime(): CustomFunctionsRuntime | undefined {
  const candidate = (globalThis as { CustomFunctions?: Partial<CustomFunctionsRuntime> }).CustomFunctions;
  if (!candidate || typeof candidate.associate !== 'function' || typeof candidate.Error !== 'function' || !candidate.ErrorCode) return undefined;
  return candidate as CustomFunctionsRuntime;
}

/**
 * Associates a handler with every registered function id.
 *
 * @param runtime - the CustomFunctions runtime; when absent (the pane opened in a plain browser,
 *   or an Excel client without custom functions) nothing is registered and the page keeps working
 * @param functions - the descriptors to register (default: the whole registry)
 * @returns the ids associated, in registry order (empty when there is no runtime)
 */
export function registerFunctions(runtime: CustomFunctionsRuntime | undefined = hostRuntime(), functions: readonly FunctionDescriptor[] = FUNCTIONS): string[] {
  if (!runtime || typeof runtime.associate !== 'function') return [];
  const ids: string[] = [];
  for (const fn of functions) {
    runtime.associate(fn.name, makeHandler(fn, runtime));
    ids.push(fn.name);
  }
  return ids;
}
