/**
 * The window file: one window described in JSON, read into a {@link WindowSpec}.
 *
 * The format is Sunpane's own; its field names are the WindowSpec / glossary names so that one
 * name means one thing in cells, files and the pane. Every error names the field by its path
 * (`glazing.shgc`, `shading.overhang.projection`). Unknown fields are refused (a typo would
 * otherwise silently drop a shading device; they are reported before anything else); fields whose name starts with `_` or equals
 * `comment` are ignored, for notes.
 *
 * ```jsonc
 * {
 *   "name": "East office",           // required: label for tables and sheets
 *   "year": 2026,                    // required: calendar year of the hourly series, 1901…9998
 *   "site": {                        // required: an object, or the id of an example site ("brackwater")
 *     "latitude": 52.2,              //   [°] −90…90, north positive
 *     "longitude": 4.9,              //   [°] −180…180, east positive
 *     "utcOffset": 1,                //   [h] −12…14, standard time (no daylight saving)
 *     "elevation": 5,                //   [m], default 0
 *     "pressure": 1013,              //   [hPa], default: standard atmosphere at the elevation
 *     "temperature": 12              //   [°C], default 12
 *   },
 *   "surfaceAzimuth": 90,            // required: [°] direction the glass faces, clockwise from north
 *   "surfaceTilt": 90,               // [°] 0 = facing the sky, 90 = vertical (default)
 *   "width": 1.8, "height": 1.5,     // required: rough opening [m]
 *   "frameFraction": 0.15,           // frame share of the opening 0…<1, default 0
 *   "glazing": {                     // required
 *     "shgc": 0.4,                   //   required: SHGC at normal incidence 0…1
 *     "panes": 2,                    //   1…4 for the angular model, default 2
 *     "angleTable": { "angles": [0, 40, 60, 80, 90], "values": [0.4, 0.39, 0.35, 0.2, 0] }, // optional
 *     "interiorAttenuation": 1,      //   blinds/curtains 0…1, default 1 (none)
 *     "radiantFraction": 0.6         //   optional: radiant share for cooling load, default from the core
 *   },
 *   "shading": {                     // optional; every device optional, lengths [m]
 *     "overhang": { "projection": 0.6, "gap": 0.2, "extensionLeft": 0.3, "extensionRight": 0.3 },
 *     "leftFin":  { "projection": 0.4, "gap": 0.1, "extensionAbove": 0.2, "extensionBelow": 0 },
 *     "rightFin": { "projection": 0.4, "gap": 0.1, "extensionAbove": 0.2, "extensionBelow": 0 },
 *     "revealDepth": 0.15,           //   glass set back behind the wall face
 *     "skyline": [5, 5, 12, 20, 8, 0, 0, 3] // elevation angles [°] of equal azimuth sectors from north
 *   },                               //   gap and extensions default 0
 *   "groundAlbedo": 0.2,             // ground reflectance 0…1, default 0.2
 *   "skyModel": "perez1990",         // "isotropic" | "hayDavies" | "perez1990" (default)
 *   "diffuseShading": "viewFactors", // "viewFactors" (default): devices cut sky and ground light too;
 *                                    // "beamOnly": the earlier treatment, for comparison
 *   "weather": { "kind": "ineichenClearSky", "linkeTurbidity": 3.2 }
 *       // or { "kind": "ashraeClearSky", "tauB": 0.35, "tauD": 2.3 }; numbers or lists of 12 (by month).
 *       // Optional when hourly weather comes from a CSV file (`--weather`), or when `site` names an
 *       // example site (its invented clear-sky turbidity is used).
 * }
 * ```
 */
import * as fs from 'node:fs';
import { SunpaneError } from '../core/common';
import type { Fin, Overhang, Shading } from '../core/shading';
import type { Glazing } from '../core/glazing';
import type { Site } from '../core/sun';
import type { SkyModel } from '../core/sky';
import type { DiffuseShading, Weather, WindowSpec } from '../core/gain';
import { findExampleSite, EXAMPLE_SITES } from '../demo/sites';
import { CliInputError } from './cliError';
import { describeFsError } from './atomicWrite';

/** Defaults applied to omitted optional fields (documented above and in `sunpane table --help`). */
export const WINDOW_DEFAULTS = Object.freeze({
  surfaceTilt: 90,
  frameFraction: 0,
  panes: 2,
  interiorAttenuation: 1,
  groundAlbedo: 0.2,
  skyModel: 'perez1990' as SkyModel,
  deviceGap: 0,
  deviceExtension: 0,
});

/** The top-level fields of a window file. */
const WINDOW_FIELDS = ['name', 'year', 'site', 'surfaceAzimuth', 'surfaceTilt', 'width', 'height', 'frameFraction', 'glazing', 'shading', 'groundAlbedo', 'skyModel', 'diffuseShading', 'weather'];

const SKY_MODELS: readonly SkyModel[] = ['isotropic', 'hayDavies', 'perez1990'];
const DIFFUSE_SHADINGS: readonly DiffuseShading[] = ['viewFactors', 'beamOnly'];

type Json = Record<string, unknown>;

function isObject(v: unknown): v is Json {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function join(path: string, key: string): string {
  return path ? `${path}.${key}` : key;
}

/** Reads the fields of one JSON object by path, refusing unknown ones at the end. */
class FieldReader {
  constructor(
    private readonly obj: Json,
    private readonly path: string,
  ) {}

  has(key: string): boolean {
    return this.obj[key] !== undefined && this.obj[key] !== null;
  }

  raw(key: string): unknown {
    return this.obj[key];
  }

  number(key: string, fallback?: number, unit?: string): number {
    const v = this.raw(key);
    if (v === undefined || v === null) {
      if (fallback !== undefined) return fallback;
      throw new SunpaneError(join(this.path, key), v, `is required: must be a number${unit ? ` in ${unit}` : ''}`);
    }
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new SunpaneError(join(this.path, key), v, `must be a number${unit ? ` in ${unit}` : ''} (without quotes)`);
    }
    return v;
  }

  optionalNumber(key: string, unit?: string): number | undefined {
    return this.has(key) ? this.number(key, undefined, unit) : undefined;
  }

  text(key: string, fallback?: string): string {
    const v = this.raw(key);
    if (v === undefined || v === null || v === '') {
      if (fallback !== undefined) return fallback;
      throw new SunpaneError(join(this.path, key), v, 'is required: must be a text');
    }
    if (typeof v !== 'string') throw new SunpaneError(join(this.path, key), v, 'must be a text (in quotes)');
    return v;
  }

  numberList(key: string, unit?: string): number[] {
    const v = this.raw(key);
    const p = join(this.path, key);
    if (typeof v === 'number') return [this.number(key, undefined, unit)];
    if (!Array.isArray(v)) throw new SunpaneError(p, v, `${v === undefined ? 'is required: ' : ''}must be a number or a list of numbers${unit ? ` in ${unit}` : ''}`);
    return v.map((x, i) => {
      if (typeof x !== 'number' || !Number.isFinite(x)) throw new SunpaneError(`${p}[${i}]`, x, `must be a number${unit ? ` in ${unit}` : ''}`);
      return x;
    });
  }

  object(key: string): FieldReader | undefined {
    const v = this.raw(key);
    if (v === undefined || v === null) return undefined;
    if (!isObject(v)) throw new SunpaneError(join(this.path, key), v, 'must be an object { ... }');
    return new FieldReader(v, join(this.path, key));
  }

  requiredObject(key: string): FieldReader {
    const r = this.object(key);
    if (!r) throw new SunpaneError(join(this.path, key), undefined, 'is required: must be an object { ... }');
    return r;
  }

  /**
   * Throws for the first field not in `known` (a typo or an unsupported option) — checked before
   * any value, so that a misspelt field is reported as such rather than as a missing one.
   */
  only(known: readonly string[]): this {
    for (const key of Object.keys(this.obj)) {
      if (known.includes(key) || key.startsWith('_') || key === 'comment') continue;
      throw new SunpaneError(join(this.path, key), this.obj[key], `is not a field of ${this.path || 'the window'} (known fields: ${known.join(', ')})`);
    }
    return this;
  }
}

function readSite(parent: FieldReader): { site: Site; exampleWeather?: Weather; exampleAlbedo?: number } {
  const raw = parent.raw('site');
  if (typeof raw === 'string') {
    const example = findExampleSite(raw);
    if (!example) {
      throw new SunpaneError('site', raw, `must be an object with latitude, longitude and utcOffset, or one of the example sites ${EXAMPLE_SITES.map((s) => `"${s.id}"`).join(', ')}`);
    }
    return {
      site: { ...example.site },
      exampleWeather: { kind: 'ineichenClearSky', linkeTurbidity: [...example.linkeTurbidity] },
      exampleAlbedo: example.groundAlbedo,
    };
  }
  const r = parent.requiredObject('site').only(['latitude', 'longitude', 'utcOffset', 'elevation', 'pressure', 'temperature']);
  const site: Site = {
    latitude: r.number('latitude', undefined, '°'),
    longitude: r.number('longitude', undefined, '°'),
    utcOffset: r.number('utcOffset', undefined, 'h'),
  };
  const elevation = r.optionalNumber('elevation', 'm');
  const pressure = r.optionalNumber('pressure', 'hPa');
  const temperature = r.optionalNumber('temperature', '°C');
  if (elevation !== undefined) site.elevation = elevation;
  if (pressure !== undefined) site.pressure = pressure;
  if (temperature !== undefined) site.temperature = temperature;
  return { site };
}

function readGlazing(parent: FieldReader): Glazing {
  const r = parent.requiredObject('glazing').only(['shgc', 'panes', 'angleTable', 'interiorAttenuation', 'radiantFraction']);
  const glazing: Glazing = { shgc: r.number('shgc'), panes: r.number('panes', WINDOW_DEFAULTS.panes) };
  const table = r.object('angleTable');
  if (table) {
    table.only(['angles', 'values']);
    glazing.angleTable = { angles: table.numberList('angles', '°'), values: table.numberList('values') };
  }
  glazing.interiorAttenuation = r.number('interiorAttenuation', WINDOW_DEFAULTS.interiorAttenuation);
  const radiant = r.optionalNumber('radiantFraction');
  if (radiant !== undefined) glazing.radiantFraction = radiant;
  return glazing;
}

function readOverhang(r: FieldReader): Overhang {
  r.only(['projection', 'gap', 'extensionLeft', 'extensionRight']);
  const o: Overhang = {
    projection: r.number('projection', undefined, 'm'),
    gap: r.number('gap', WINDOW_DEFAULTS.deviceGap, 'm'),
    extensionLeft: r.number('extensionLeft', WINDOW_DEFAULTS.deviceExtension, 'm'),
    extensionRight: r.number('extensionRight', WINDOW_DEFAULTS.deviceExtension, 'm'),
  };
  return o;
}

function readFin(r: FieldReader): Fin {
  r.only(['projection', 'gap', 'extensionAbove', 'extensionBelow']);
  const f: Fin = {
    projection: r.number('projection', undefined, 'm'),
    gap: r.number('gap', WINDOW_DEFAULTS.deviceGap, 'm'),
    extensionAbove: r.number('extensionAbove', WINDOW_DEFAULTS.deviceExtension, 'm'),
    extensionBelow: r.number('extensionBelow', WINDOW_DEFAULTS.deviceExtension, 'm'),
  };
  return f;
}

function readShading(parent: FieldReader): Shading {
  const r = parent.object('shading');
  if (!r) return {};
  r.only(['overhang', 'leftFin', 'rightFin', 'revealDepth', 'skyline']);
  const shading: Shading = {};
  const overhang = r.object('overhang');
  if (overhang) shading.overhang = readOverhang(overhang);
  const left = r.object('leftFin');
  if (left) shading.leftFin = readFin(left);
  const right = r.object('rightFin');
  if (right) shading.rightFin = readFin(right);
  const reveal = r.optionalNumber('revealDepth', 'm');
  if (reveal !== undefined) shading.revealDepth = reveal;
  if (r.has('skyline')) shading.skyline = r.numberList('skyline', '°');
  return shading;
}

function readWeather(parent: FieldReader): Weather | undefined {
  const r = parent.object('weather');
  if (!r) return undefined;
  r.only(['kind', 'linkeTurbidity', 'tauB', 'tauD']);
  const kind = r.text('kind');
  let weather: Weather;
  if (kind === 'ineichenClearSky') weather = { kind, linkeTurbidity: r.numberList('linkeTurbidity') };
  else if (kind === 'ashraeClearSky') weather = { kind, tauB: r.numberList('tauB'), tauD: r.numberList('tauD') };
  else {
    throw new SunpaneError('weather.kind', kind, 'must be "ineichenClearSky" or "ashraeClearSky" (hourly measured weather comes from a CSV file: --weather FILE.csv)');
  }
  return weather;
}

/** The result of reading a window file: the spec, and whether its weather still has to be supplied. */
export interface WindowFile {
  spec: WindowSpec;
  /** False when the JSON gave no weather (then the caller must supply hourly weather). */
  hasWeather: boolean;
}

/**
 * Reads a window description from parsed JSON.
 * @param json - the parsed file content
 * @returns the window; `spec.weather` is a placeholder clear sky when `hasWeather` is false
 * @throws SunpaneError naming the field path for a missing, mistyped or unknown field
 */
export function windowFromJson(json: unknown): WindowFile {
  if (!isObject(json)) throw new SunpaneError('window', json, 'must be a JSON object { ... } describing one window');
  const r = new FieldReader(json, '').only(WINDOW_FIELDS);
  const name = r.text('name');
  const year = r.number('year');
  if (!Number.isInteger(year)) throw new SunpaneError('year', year, 'must be a whole number (calendar year)');
  const { site, exampleWeather, exampleAlbedo } = readSite(r);
  const surfaceAzimuth = r.number('surfaceAzimuth', undefined, '°');
  const surfaceTilt = r.number('surfaceTilt', WINDOW_DEFAULTS.surfaceTilt, '°');
  const width = r.number('width', undefined, 'm');
  const height = r.number('height', undefined, 'm');
  const frameFraction = r.number('frameFraction', WINDOW_DEFAULTS.frameFraction);
  const glazing = readGlazing(r);
  const shading = readShading(r);
  const groundAlbedo = r.number('groundAlbedo', exampleAlbedo ?? WINDOW_DEFAULTS.groundAlbedo);
  const skyModelText = r.text('skyModel', WINDOW_DEFAULTS.skyModel);
  const skyModel = SKY_MODELS.find((m) => m.toLowerCase() === skyModelText.toLowerCase());
  if (!skyModel) throw new SunpaneError('skyModel', skyModelText, `must be one of ${SKY_MODELS.map((m) => `"${m}"`).join(', ')}`);
  const diffuseText = r.text('diffuseShading', 'viewFactors');
  const diffuseShading = DIFFUSE_SHADINGS.find((m) => m.toLowerCase() === diffuseText.toLowerCase());
  if (!diffuseShading) throw new SunpaneError('diffuseShading', diffuseText, `must be one of ${DIFFUSE_SHADINGS.map((m) => `"${m}"`).join(', ')}`);
  const given = readWeather(r);
  const weather = given ?? exampleWeather;
  return {
    spec: {
      name,
      site,
      surfaceAzimuth,
      surfaceTilt,
      width,
      height,
      frameFraction,
      glazing,
      shading,
      groundAlbedo,
      skyModel,
      ...(diffuseShading === 'beamOnly' ? { diffuseShading } : {}),
      weather: weather ?? { kind: 'measured', dni: [], dhi: [] },
      year,
    },
    hasWeather: weather !== undefined,
  };
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

