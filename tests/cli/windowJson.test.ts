/**
 * The window JSON reader: fields map onto WindowSpec, defaults are applied, and every bad field is
 * refused with an error naming its path. (Format of our own; nothing outside to compare with.)
 */
import * as fs from 'node:fs';
import * as os from 'node:os';
import * as path from 'node:path';
import { SunpaneError } from '../../src/core/common/errors';
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { CliInputError } from '../../src/cli/cliError';
import { readWindowFile, windowFromJson, WINDOW_DEFAULTS } from '../../src/cli/windowJson';
import { findExampleSite } from '../../src/demo/sites';

const MINIMAL = {
  name: 'Test window',
  year: 2026,
  site: { latitude: 52.2, longitude: 4.9, utcOffset: 1 },
  surfaceAzimuth: 180,
  width: 1.2,
  height: 1.5,
  glazing: { shgc: 0.4 },
  weather: { kind: 'ineichenClearSky', linkeTurbidity: 3 },
};

function refusal(json: unknown): SunpaneError {
  try {
    windowFromJson(json);
  } catch (err) {
    if (err instanceof SunpaneError) return err;
    throw err;
  }
  throw new Error('expected the window to be refused');
}

describe('window JSON', () => {
  it('fills every omitted optional field with its documented default', () => {
    const { spec, hasWeather } = windowFromJson(MINIMAL);
    expect(hasWeather).toBe(true);
    expect(spec.surfaceTilt).toBe(WINDOW_DEFAULTS.surfaceTilt);
    expect(spec.frameFraction).toBe(WINDOW_DEFAULTS.frameFraction);
    expect(spec.glazing).toEqual({ shgc: 0.4, panes: 2, interiorAttenuation: 1 });
    expect(spec.shading).toEqual({});
    expect(spec.groundAlbedo).toBe(0.2);
    expect(spec.skyModel).toBe('perez1990');
    expect(() => validateWindowSpec(spec)).not.toThrow();
  });

  it('reads every shading device with gap and extensions defaulting to zero', () => {
    const { spec } = windowFromJson({
      ...MINIMAL,
      shading: { overhang: { projection: 0.6 }, leftFin: { projection: 0.3, gap: 0.1 }, rightFin: { projection: 0.3, extensionAbove: 0.2 }, revealDepth: 0.1, skyline: [0, 10, 20, 5] },
    });
    expect(spec.shading).toEqual({
      overhang: { projection: 0.6, gap: 0, extensionLeft: 0, extensionRight: 0 },
      leftFin: { projection: 0.3, gap: 0.1, extensionAbove: 0, extensionBelow: 0 },
      rightFin: { projection: 0.3, gap: 0, extensionAbove: 0.2, extensionBelow: 0 },
      revealDepth: 0.1,
      skyline: [0, 10, 20, 5],
    });
  });

  it('takes an example site by id with its invented clear-sky turbidity and albedo', () => {
    const { spec, hasWeather } = windowFromJson({ ...MINIMAL, site: 'kestrelHeads', weather: undefined });
    const example = findExampleSite('kestrelHeads')!;
    expect(hasWeather).toBe(true);
    expect(spec.site.latitude).toBe(example.site.latitude);
    expect(spec.weather).toEqual({ kind: 'ineichenClearSky', linkeTurbidity: [...example.linkeTurbidity] });
    expect(spec.groundAlbedo).toBe(example.groundAlbedo);
  });

  it('reports that weather must still be supplied when the file has none', () => {
    expect(windowFromJson({ ...MINIMAL, weather: undefined }).hasWeather).toBe(false);
  });

  it.each([
    [{ ...MINIMAL, name: undefined }, 'name'],
    [{ ...MINIMAL, site: { latitude: 52, longitude: 4.9 } }, 'utcOffset'],
    [{ ...MINIMAL, site: 'atlantis' }, 'site'],
    [{ ...MINIMAL, width: 'wide' }, 'width'],
    [{ ...MINIMAL, glazing: {} }, 'shgc'],
    [{ ...MINIMAL, glazing: undefined }, 'shgc'],
    [{ ...MINIMAL, glazing: 0.4 }, 'glazing'],
    [{ ...MINIMAL, shading: { overhang: { gap: 0.2 } } }, 'shading.overhang.projection'],
    [{ ...MINIMAL, shading: { overhang: { projection: 0.5, projecton: 1 } } }, 'shading.overhang.projecton'],
    [{ ...MINIMAL, shading: { skyline: [10, 'x'] } }, 'shading.skyline (value 2)'],
    [{ ...MINIMAL, weather: { kind: 'measured' } }, 'weather.kind'],
    [{ ...MINIMAL, weather: { kind: 'ashraeClearSky', tauB: 0.3 } }, 'tauD'],
    [{ ...MINIMAL, skyModel: 'fancy' }, 'skyModel'],
    [{ ...MINIMAL, year: 2026.5 }, 'year'],
    [{ ...MINIMAL, colour: 'blue' }, 'colour'],
    [{ ...MINIMAL, overhangGap: 0.2 }, 'overhangProjection'],
    [{ ...MINIMAL, shgc: 0.4 }, 'shgc'],
  ])('refuses a missing, mistyped or unknown field naming it as written, or by its glossary name when missing (%#: %s)', (json, field) => {
    expect(refusal(json).argument).toBe(field);
  });

  it('reads diffuseShading: view factors by default, "beamOnly" for the earlier treatment, anything else refused', () => {
    expect(windowFromJson(MINIMAL).spec.diffuseShading ?? 'viewFactors').toBe('viewFactors');
    expect(windowFromJson({ ...MINIMAL, diffuseShading: 'beamonly' }).spec.diffuseShading).toBe('beamOnly');
    expect(windowFromJson({ ...MINIMAL, diffuseShading: 'viewFactors' }).spec.diffuseShading ?? 'viewFactors').toBe('viewFactors');
    expect(refusal({ ...MINIMAL, diffuseShading: 'none' }).argument).toBe('diffuseShading');
  });

  it('reads the flat form with the glossary names, the same window as the nested form', () => {
    const flat = windowFromJson({
      name: 'Test window',
      year: 2026,
      latitude: 52.2,
      longitude: 4.9,
      utcOffset: 1,
      surfaceAzimuth: 180,
      width: 1.2,
      height: 1.5,
      shgc: 0.4,
      linkeTurbidity: 3,
      overhangProjection: 0.6,
      overhangExtension: 0.2,
      finProjection: 0.3,
      rightFinGap: 0.1,
      skyline: '0 10 20 5',
      skyModel: 'Hay-Davies',
      timeConvention: 'instant',
    });
    const nested = windowFromJson({
      ...MINIMAL,
      shading: { overhang: { projection: 0.6, extensionLeft: 0.2, extensionRight: 0.2 }, leftFin: { projection: 0.3 }, rightFin: { projection: 0.3, gap: 0.1 }, skyline: [0, 10, 20, 5] },
      skyModel: 'hayDavies',
      timeConvention: 'instant',
    });
    expect(flat).toEqual(nested);
    expect(flat.spec.skyModel).toBe('hayDavies');
    expect(flat.spec.shading.rightFin).toEqual({ projection: 0.3, gap: 0.1, extensionAbove: 0, extensionBelow: 0 });
  });

  it('suggests the nearest field name for a misspelt key', () => {
    expect(refusal({ ...MINIMAL, overhangProjecton: 0.5 }).message).toMatch(/^overhangProjecton = 0\.5 is not allowed: no window field has this name \(did you mean overhangProjection\?\)/);
  });

  it('ignores note fields starting with an underscore or named comment', () => {
    expect(() => windowFromJson({ ...MINIMAL, _note: 'x', comment: 'y' })).not.toThrow();
  });

  it('checks each field against the glossary range, naming it as written', () => {
    expect(refusal({ ...MINIMAL, glazing: { shgc: 1.4 } }).message).toBe('glazing.shgc = 1.4 is not allowed: must be a number from 0 to 1');
    expect(refusal({ ...MINIMAL, width: 1e-200 }).message).toBe('width = 1e-200 is not allowed: must be a number from 0.01 to 100 m');
    expect(() => validateWindowSpec(windowFromJson(MINIMAL).spec)).not.toThrow();
  });

  it('names the file and the parser position when the file is not JSON', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-json-'));
    const file = path.join(dir, 'broken.json');
    fs.writeFileSync(file, '{ "name": "x", }');
    expect(() => readWindowFile(file)).toThrow(CliInputError);
    expect(() => readWindowFile(file)).toThrow(/broken\.json is not valid JSON/);
    expect(() => readWindowFile(path.join(dir, 'absent.json'))).toThrow(/cannot read the window file .*absent\.json: the folder does not exist|cannot read the window file/);
  });

  it('adds the file name to a field error from a file', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sunpane-json-'));
    const file = path.join(dir, 'w.json');
    fs.writeFileSync(file, JSON.stringify({ ...MINIMAL, height: undefined }));
    expect(() => readWindowFile(file)).toThrow(/^height = blank is not allowed: it is required and must be a number from 0\.01 to 100 m \(in .*w\.json\)$/);
  });
});

describe('window JSON: the clock fields', () => {
  const rule = { start: 46110 + 2 / 24, end: 46320 + 3 / 24, shift: 1 }; // 2026-03-29 02:00, 2026-10-25 03:00
  it('reads a daylight-saving rule given as serials of the 1904 date system, as ISO text, or as 1900 serials, the same', () => {
    const iso = windowFromJson({ ...MINIMAL, daylightSavingStart: '2026-03-29T02:00', daylightSavingEnd: '2026-10-25T03:00' }).spec.site.daylightSaving;
    const s1900 = windowFromJson({ ...MINIMAL, daylightSavingStart: rule.start, daylightSavingEnd: rule.end }).spec.site.daylightSaving;
    const s1904 = windowFromJson({ ...MINIMAL, dateSystem: 1904, daylightSavingStart: rule.start - 1462, daylightSavingEnd: rule.end - 1462 }).spec.site.daylightSaving;
    expect(iso).toEqual(rule);
    expect(s1900).toEqual(rule);
    expect(s1904!.start).toBeCloseTo(rule.start, 9);
    expect(s1904!.end).toBeCloseTo(rule.end, 9);
  });

  it('refuses a date system other than 1900 or 1904 by its key, with the value and the choices', () => {
    const err = refusal({ ...MINIMAL, 'Date system': 1903 });
    expect(err.argument).toBe('Date system');
    expect(err.message).toMatch(/^Date system = 1903 is not allowed: must be 1900 .* or 1904 /);
  });
});
