/**
 * The window file: one window described in JSON, read into a {@link WindowSpec}.
 *
 * Its keys are the glossary's window fields (src/registry/glossary.ts) — the same names as the
 * worksheet functions' window range, the schedule's columns and the pane — read by the same reader
 * (src/registry/windowRange.ts), so one name means one thing in cells, files and the pane:
 *
 * ```jsonc
 * {
 *   "name": "East office",          // label for tables and sheets
 *   "year": 2026,                   // calendar year of the hourly series, 1901…9998
 *   "latitude": 52.2, "longitude": 4.9, "utcOffset": 1, "elevation": 5,   // or "site": "brackwater"
 *   "surfaceAzimuth": 90,           // [°] direction the glass faces, clockwise from north
 *   "width": 1.8, "height": 1.5,    // rough opening [m]
 *   "frameFraction": 0.15,          // frame share of the opening
 *   "shgc": 0.4, "panes": 2,        // SHGC at normal incidence; or "shgcAngles"/"shgcValues" lists
 *   "overhangProjection": 0.6, "overhangGap": 0.2, "overhangExtension": 0.3,
 *   "finProjection": 0.4, "finGap": 0.1,   // both fins; leftFin… / rightFin… fields for one side
 *   "revealDepth": 0.15,
 *   "skyline": [5, 5, 12, 20, 8, 0, 0, 3],
 *   "diffuseShading": "viewFactors", // default; "beamOnly": devices cut only the beam (the earlier treatment)
 *   "linkeTurbidity": 3.2           // or "tauB" and "tauD"; one value or 12 by month
 * }
 * ```
 *
 * Every field and its default: docs/window-fields.md and `sunpane table --help`. The older nested
 * form (`site: {latitude…}`, `glazing: {shgc…}`, `shading: {overhang: {projection…}}`,
 * `weather: {kind, linkeTurbidity}`) is still read, into the same fields. Unknown keys are refused
 * (a typo would otherwise silently drop a shading device; the nearest field name is suggested); keys
 * starting with `_` or named `comment` are notes and ignored. Messages name a key as written in the
 * file (a nested one by its path in the file).
 */
import * as fs from 'node:fs';
import { SunpaneError } from '../core/common';
import type { WindowSpec } from '../core/gain';
import { GLOSSARY, type GlossaryEntry, windowFieldFor } from '../registry/glossary';
import { fieldsOf, unknownNameText, windowSpecFromFields } from '../registry/windowRange';
import { CliInputError } from './cliError';
import { describeFsError } from './atomicWrite';

/** Defaults applied to omitted optional fields (the glossary's; documented in `sunpane table --help`). */
export const WINDOW_DEFAULTS = Object.freeze({
  surfaceTilt: GLOSSARY.surfaceTilt.default as number,
  frameFraction: GLOSSARY.frameFraction.default as number,
  panes: GLOSSARY.panes.default as number,
  interiorAttenuation: GLOSSARY.interiorAttenuation.default as number,
  groundAlbedo: GLOSSARY.groundAlbedo.default as number,
  skyModel: GLOSSARY.skyModel.default as string,
  timeConvention: GLOSSARY.timeConvention.default as string,
});

type Json = Record<string, unknown>;

function isObject(v: unknown): v is Json {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function isNote(key: string): boolean {
  return key.startsWith('_') || key === 'comment';
}

/** Keys of the older nested form: object → its keys → glossary field. */
const NESTED: Readonly<Record<string, Readonly<Record<string, string>>>> = {
  site: { latitude: 'latitude', longitude: 'longitude', utcOffset: 'utcOffset', elevation: 'elevation', pressure: 'pressure', temperature: 'temperature' },
  glazing: { shgc: 'shgc', panes: 'panes', interiorAttenuation: 'interiorAttenuation', radiantFraction: 'radiantFraction' },
  'glazing.angleTable': { angles: 'shgcAngles', values: 'shgcValues' },
  shading: { revealDepth: 'revealDepth', skyline: 'skyline' },
  'shading.overhang': { projection: 'overhangProjection', gap: 'overhangGap', extensionLeft: 'overhangExtensionLeft', extensionRight: 'overhangExtensionRight' },
  'shading.leftFin': { projection: 'leftFinProjection', gap: 'leftFinGap', extensionAbove: 'leftFinExtensionAbove', extensionBelow: 'leftFinExtensionBelow' },
  'shading.rightFin': { projection: 'rightFinProjection', gap: 'rightFinGap', extensionAbove: 'rightFinExtensionAbove', extensionBelow: 'rightFinExtensionBelow' },
  weather: { linkeTurbidity: 'linkeTurbidity', tauB: 'tauB', tauD: 'tauD' },
};
/** Objects of the nested form inside each nested object. */
const NESTED_OBJECTS: Readonly<Record<string, readonly string[]>> = { glazing: ['angleTable'], shading: ['overhang', 'leftFin', 'rightFin'] };

interface Entry {
  field: GlossaryEntry;
  written: string;
  cell: string | number | readonly unknown[];
}

function cellOf(key: string, v: unknown): string | number | readonly unknown[] {
  if (typeof v === 'string' || typeof v === 'number' || Array.isArray(v)) return v;
  throw new SunpaneError(key, v, Array.isArray(v) || isObject(v) ? 'must be a number, a text or a list of numbers' : 'must be a number, a text or a list of numbers');
}

/** The entries of a nested object (`glazing`, `shading.overhang`, …), refusing unknown keys. */
function nestedEntries(path: string, obj: Json, out: Entry[]): void {
  const keys = NESTED[path];
  for (const [key, v] of Object.entries(obj)) {
    if (isNote(key) || v === undefined || v === null) continue;
    const at = `${path}.${key}`;
    if (path === 'weather' && key === 'kind') {
      if (v !== 'ineichenClearSky' && v !== 'ashraeClearSky') {
        throw new SunpaneError(at, v, 'must be "ineichenClearSky" or "ashraeClearSky" (hourly measured weather comes from a CSV file: --weather FILE.csv); or leave weather out and give linkeTurbidity, or tauB and tauD');
      }
      continue;
    }
    if ((NESTED_OBJECTS[path] ?? []).includes(key)) {
      if (!isObject(v)) throw new SunpaneError(at, v, 'must be an object { ... }');
      nestedEntries(at, v, out);
      continue;
    }
    const name = keys?.[key];
    if (name === undefined) {
      const known = [...Object.keys(keys ?? {}), ...(NESTED_OBJECTS[path] ?? []), ...(path === 'weather' ? ['kind'] : [])];
      throw new SunpaneError(at, v, `is not a field of ${path} (known: ${known.join(', ')})`);
    }
    out.push({ field: GLOSSARY[name as keyof typeof GLOSSARY], written: at, cell: cellOf(at, v) });
  }
  if (path === 'shading.overhang' || path === 'shading.leftFin' || path === 'shading.rightFin') {
    if (obj.projection === undefined || obj.projection === null) throw new SunpaneError(`${path}.projection`, null, 'is required: must be a number from 0 to 100 m (the device is given)');
  }
}

/** The result of reading a window file: the spec, and whether its weather still has to be supplied. */
export interface WindowFile {
  spec: WindowSpec;
  /** False when the JSON gave no sky (then the caller must supply hourly weather). */
  hasWeather: boolean;
}

/**
 * Reads a window description from parsed JSON.
 * @param json - the parsed file content: flat glossary keys, or the older nested form
 * @returns the window; `spec.weather` is a placeholder when `hasWeather` is false
 * @throws SunpaneError naming the key as written for a missing, mistyped, out-of-range or unknown field
 */
export function windowFromJson(json: unknown): WindowFile {
  if (!isObject(json)) throw new SunpaneError('window', json, 'must be a JSON object { ... } describing one window');
  const entries: Entry[] = [];
  for (const [key, v] of Object.entries(json)) {
    if (isNote(key) || v === undefined || v === null) continue;
    if (NESTED[key] && (isObject(v) || key !== 'site')) {
      if (!isObject(v)) throw new SunpaneError(key, v, 'must be an object { ... }');
      nestedEntries(key, v, entries);
      continue;
    }
    const field = windowFieldFor(key);
    if (!field) throw new SunpaneError(key, v, unknownNameText(key).replace("the function's help", '`sunpane table --help`'));
    entries.push({ field, written: key, cell: cellOf(key, v) });
  }
  const seen = new Map<string, string>();
  for (const e of entries) {
    const before = seen.get(e.field.name);
    if (before !== undefined) throw new SunpaneError(e.written, e.cell, `gives the same field as ${before} (${e.field.name}): keep one`);
    seen.set(e.field.name, e.written);
  }
  if (!seen.has('name')) throw new SunpaneError('name', null, 'is required: a text, the window’s label in tables and sheets');
  const { spec, hasWeather } = windowSpecFromFields(fieldsOf(entries));
  return { spec, hasWeather };
}

/**
 * Reads and parses a window file.
 * @throws CliInputError when the file cannot be read or is not JSON (with the parser's position);
 * SunpaneError naming the field for content errors
 */
export function readWindowFile(file: string): WindowFile {
  let text: string;
  try {
    text = fs.readFileSync(file, 'utf8');
  } catch (err) {
    throw new CliInputError(`cannot read the window file ${file}: ${describeFsError(err)}`);
  }
  // A byte-order mark (as some editors save UTF-8) is not part of the JSON.
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (err) {
    throw new CliInputError(`${file} is not valid JSON: ${err instanceof Error ? err.message : String(err)}`);
  }
  try {
    return windowFromJson(json);
  } catch (err) {
    if (err instanceof SunpaneError) throw new SunpaneError(err.argument, err.value, `${err.allowed} (in ${file})`);
    throw err;
  }
}

