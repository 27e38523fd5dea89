/**
 * Excel's custom-function metadata (functions.json), generated from the registry so that the
 * worksheet names, parameter help and optional flags can never drift from the descriptors.
 *
 * Every parameter and every result is declared `type: "any"`, `dimensionality: "matrix"`: any
 * argument may be a single cell or a range (the registry's broadcast helper pairs them), and any
 * result may spill. Units and ranges go into the descriptions, because formula autocomplete shows
 * nothing else (docs/platform.md#custom-function-metadata).
 */
import { DATE_TIME_FORMAT, isOptional, paramHelp } from '../registry';
import type { FunctionDescriptor } from '../registry/types';

/** One parameter entry of functions.json. */
export interface ParameterMetadata {
  name: string;
  description: string;
  type: 'any';
  dimensionality: 'matrix';
  optional: boolean;
}

/** One function entry of functions.json. */
export interface FunctionMetadata {
  id: string;
  name: string;
  description: string;
  /** The function's page in the help deployed with the add-in (docs/platform.md#custom-function-metadata). */
  helpUrl: string;
  parameters: ParameterMetadata[];
  result: { type: 'any'; dimensionality: 'matrix' };
}

/** The whole functions.json document. */
export interface FunctionsMetadata {
  functions: FunctionMetadata[];
}

/** Our limits on metadata text (docs/platform.md#custom-function-metadata). */
export const MAX_PARAMETER_NAME = 64;
export const MAX_DESCRIPTION = 512;

/**
 * Worksheet ids we accept: uppercase letters only, so that no id can look like a cell reference
 * (`DOY1`) and every id reads the same in every locale.
 */
const ID_PATTERN = /^[A-Z]+$/;

/** Folder of the help pages in the deployed add-in (dist/help/), one page per function. */
export const HELP_DIR = 'help';

/** Path of a function's help page, relative to the add-in's host: `help/SUNRISE.html`. */
export function helpPagePath(name: string): string {
  return `${HELP_DIR}/${name}.html`;
}

/**
 * The description Excel shows for a function: its summary, then what the result is and its unit;
 * for a date-time result, the number format to give the cell.
 *
 * @param fn - a registered function
 * @returns at most {@link MAX_DESCRIPTION} characters
 */
export function functionDescription(fn: FunctionDescriptor): string {
  const unit = fn.result.unit ? ` [${fn.result.unit}]` : '';
  const spill = fn.result.shape === 'spill' ? ' Spills a table.' : '';
  const summary = fn.summary.trim().replace(/\.$/, '');
  const format = fn.result.kind === 'dateTime' ? ` Returns ${DATE_TIME_FORMAT}.` : '';
  return `${summary}${unit}.${spill}${format}`.slice(0, MAX_DESCRIPTION);
}

/**
 * Builds functions.json from registered descriptors.
 *
 * @param functions - the registry (src/registry/index.ts FUNCTIONS)
 * @param host - where the add-in is served from: an https origin, optionally with a path, without a
 *   trailing slash (scripts/manifest-host.js `resolveHost`, the same host the manifest names); each
 *   function's `helpUrl` is its page under it, `<host>/help/<NAME>.html`
 * @returns the metadata document; a parameter is marked optional only when it and every later
 *   parameter are optional (Excel lists optional arguments last; a blank argument in the middle is
 *   still read as its default by the adapter)
 * @throws Error naming the function when an id is not uppercase letters, is repeated, or a
 *   parameter name is too long — the build fails rather than ship metadata Excel refuses
 */
export function functionsMetadata(functions: readonly FunctionDescriptor[], host: string): FunctionsMetadata {
  if (!/^https:\/\/[^/?#\s]+(\/[^?#\s]*)?$/.test(host) || host.endsWith('/')) {
    throw new Error(`functions.json: the add-in host ${JSON.stringify(host)} must be an https URL without a trailing slash, query or fragment`);
  }
  const seen = new Set<string>();
  const out: FunctionMetadata[] = [];
  for (const fn of functions) {
    if (!ID_PATTERN.test(fn.name)) {
      throw new Error(`functions.json: the worksheet name ${JSON.stringify(fn.name)} must be uppercase letters only (A-Z)`);
    }
    if (seen.has(fn.name)) throw new Error(`functions.json: the worksheet name ${fn.name} is registered twice`);
    seen.add(fn.name);
    const parameters = fn.params.map((p, k): ParameterMetadata => {
      if (p.name.length === 0 || p.name.length > MAX_PARAMETER_NAME) {
        throw new Error(`functions.json: ${fn.name} parameter ${JSON.stringify(p.name)} must have 1 to ${MAX_PARAMETER_NAME} characters`);
      }
      return {
        name: p.name,
        description: paramHelp(p).slice(0, MAX_DESCRIPTION),
        type: 'any',
        dimensionality: 'matrix',
        optional: fn.params.slice(k).every(isOptional),
      };
    });
    out.push({
      id: fn.name,
      name: fn.name,
      description: functionDescription(fn),
      helpUrl: `${host}/${helpPagePath(fn.name)}`,
      parameters,
      result: { type: 'any', dimensionality: 'matrix' },
    });
  }
  return { functions: out };
}
