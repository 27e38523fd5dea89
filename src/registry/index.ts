/**
 * The registry: every worksheet function, described once. Excel's functions.json, the CLI's
 * `list` / `call`, the function reference in docs/functions.md and the fuzz tests all read this list.
 */
import { GAIN_FUNCTIONS } from './gain';
import { GLAZING_FUNCTIONS } from './glazing';
import { SHADING_FUNCTIONS } from './shading';
import { SKY_FUNCTIONS } from './sky';
import { SUN_FUNCTIONS } from './sun';
import type { FunctionDescriptor, ParamDescriptor } from './types';
import { allowedText } from './evaluate';

/** The namespace shown in Excel before every function name, e.g. `=SUNPANE.SUNALTITUDE(...)`. */
export const NAMESPACE = 'SUNPANE';

export const FUNCTIONS: readonly FunctionDescriptor[] = [
  ...SUN_FUNCTIONS,
  ...SHADING_FUNCTIONS,
  ...SKY_FUNCTIONS,
  ...GLAZING_FUNCTIONS,
  ...GAIN_FUNCTIONS,
];

const BY_NAME = new Map(FUNCTIONS.map((f) => [f.name, f]));

/** Looks a function up by its worksheet name (with or without the namespace, any case). */
export function findFunction(name: string): FunctionDescriptor | undefined {
  const upper = name.trim().toUpperCase();
  return BY_NAME.get(upper.startsWith(`${NAMESPACE}.`) ? upper.slice(NAMESPACE.length + 1) : upper);
}

/** Is the parameter optional (blank allowed)? */
export function isOptional(p: ParamDescriptor): boolean {
  return p.default !== undefined || p.optional === true;
}

/** `NAME(a, b, [c])`: the signature as `sunpane list` and the reference show it. */
export function signature(fn: FunctionDescriptor): string {
  return `${fn.name}(${fn.params.map((p) => (isOptional(p) ? `[${p.name}]` : p.name)).join(', ')})`;
}

/**
 * A parameter's full description: meaning, unit and range, and default; what Excel's autocomplete
 * shows (≤ 512 characters) and what the reference lists.
 */
export function paramHelp(p: ParamDescriptor): string {
  const unit = p.unit && p.kind !== 'number' && p.kind !== 'numberList' ? ` [${p.unit}]` : '';
  const dflt = p.default !== undefined ? `; blank: ${typeof p.default === 'string' ? `"${p.default}"` : String(p.default).toUpperCase() === 'TRUE' || String(p.default).toUpperCase() === 'FALSE' ? String(p.default).toUpperCase() : p.default}` : '';
  const allowed = p.kind === 'table' ? '' : `; ${allowedText(p).replace(/^must be /, '')}`;
  return `${p.description}${unit}${allowed}${dflt}`.slice(0, 512);
}
