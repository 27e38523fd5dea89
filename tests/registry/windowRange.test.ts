/**
 * A window described once (src/registry/windowRange.ts): the layouts a worksheet range may take,
 * several windows broadcasting like a column or a row, the fields read and checked by the glossary,
 * devices and clear skies built from the fields, and every message naming the field as written.
 * Plumbing and wording only (the physics is checked in tests/core and tests/reference).
 */
import { SunpaneError } from '../../src/core/common/errors';
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { scheduleHeader, scheduleRowOf } from '../../src/cli/demo';
import { demoWindows } from '../../src/demo/building';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import { NotAvailable, type RawArg } from '../../src/registry/types';
import { readWindowRange, windowSpecFromFields } from '../../src/registry/windowRange';

const PAIRS: [string, number | string][] = [
  ['latitude', 40],
  ['longitude', -105],
  ['utcOffset', -7],
  ['surfaceAzimuth', 180],
  ['width', 1.5],
  ['height', 1.2],
  ['shgc', 0.4],
  ['tauB', 0.4],
  ['tauD', 2.3],
];
const DOWN = PAIRS as RawArg;
const ACROSS = [PAIRS.map(([n]) => n), PAIRS.map(([, v]) => v)] as RawArg;
const HOUR = '2026-07-21T13:00';

function call(name: string, args: RawArg[]) {
  return applyFunction(findFunction(name)!, args);
}

function refusal(fields: [string, unknown][], year = 2026): SunpaneError {
  const range = readWindowRange(fields as RawArg);
  const w = range.windows[0];
  if (w instanceof SunpaneError) return w;
  try {
    windowSpecFromFields(w, { year, prefix: 'window ' });
  } catch (err) {
    if (err instanceof SunpaneError) return err;
    throw err;
  }
  throw new Error('expected a refusal');
}

describe('reading a window range', () => {
  test('names beside values and a header row over values are the same window', () => {
    const down = call('SOLARGAIN', [DOWN, HOUR]);
    expect(typeof down[0][0]).toBe('number');
    expect(call('SOLARGAIN', [ACROSS, HOUR])).toEqual(down);
    // an inline array constant is a range too
    expect(call('SOLARGAIN', [PAIRS.map(([n, v]) => [n, v]), HOUR])).toEqual(down);
  });

  test('labels, field names and older words may be mixed; case and a unit in brackets do not matter', () => {
    const words: [string, number | string][] = [
      ['Latitude [°]', 40],
      ['LONGITUDE', -105],
      ['UTC offset (h)', -7],
      ['Faces', 180],
      ['width', 1.5],
      ['Height [m]', 1.2],
      ['SHGC', 0.4],
      ['Beam optical depth', 0.4],
      ['tau d', 2.3],
    ];
    expect(call('SOLARGAIN', [words as RawArg, HOUR])).toEqual(call('SOLARGAIN', [DOWN, HOUR]));
  });

  test('several value rows are several windows, broadcasting against a row of hours into a 2-D table', () => {
    const three = [PAIRS.map(([n]) => n), PAIRS.map(([, v]) => v), PAIRS.map(([n, v]) => (n === 'surfaceAzimuth' ? 270 : v)), PAIRS.map(([n, v]) => (n === 'width' ? 3 : v))] as RawArg;
    const hours = [['2026-07-21T10:00', '2026-07-21T13:00', '2026-07-21T17:00', '2026-07-21T19:00']];
    const out = call('SOLARGAIN', [three, hours]);
    expect(out).toHaveLength(3);
    for (const row of out) expect(row).toHaveLength(4);
    expect(out[0][1]).toBe(call('SOLARGAIN', [DOWN, HOUR])[0][0]);
    expect(out[2][1] as number).toBeCloseTo(2 * (out[0][1] as number), 9); // twice the width, twice the gain
    // value columns beside a name column are windows across
    const across = [...PAIRS.map(([n, v]) => [n, v, n === 'surfaceAzimuth' ? 270 : v])] as RawArg;
    const row = call('SOLARGAIN', [across, HOUR]);
    expect(row).toHaveLength(1);
    expect(row[0]).toEqual([out[0][1], out[1][1]]);
  });

  test('a bad cell spoils only its own window; a range with no partner gives #N/A', () => {
    const two = [PAIRS.map(([n]) => n), PAIRS.map(([, v]) => v), PAIRS.map(([n, v]) => (n === 'shgc' ? 1.4 : v))] as RawArg;
    const out = call('SOLARGAIN', [two, [[HOUR], [HOUR], [HOUR]]]);
    expect(typeof out[0][0]).toBe('number');
    expect((out[1][0] as SunpaneError).message).toBe('window shgc = 1.4 is not allowed: must be a number from 0 to 1');
    expect(out[2][0]).toBeInstanceOf(NotAvailable);
  });

  test('a layout with no field names, an unknown name or a repeated one is refused as a whole, naming it', () => {
    expect(() => call('SOLARGAIN', [[[1, 2], [3, 4]], HOUR])).toThrow(/^window = "a 2 × 2 range without field names" is not allowed: must be a range of window fields/);
    expect(() => call('SOLARGAIN', [[...PAIRS, ['overhangProjecton', 1]] as RawArg, HOUR])).toThrow('window field name = "overhangProjecton" is not allowed: no window field has this name (did you mean overhangProjection?)');
    expect(() => call('SOLARGAIN', [[...PAIRS, ['colour', 1]] as RawArg, HOUR])).toThrow("window field name = \"colour\" is not allowed: no window field has this name; the window fields are listed in the function's help");
    expect(() => call('SOLARGAIN', [[...PAIRS, ['Faces', 90]] as RawArg, HOUR])).toThrow('window field name = "Faces" is not allowed: names the same field as "surfaceAzimuth" (surfaceAzimuth): keep one');
    expect(() => call('SOLARGAIN', [[PAIRS.map(([n]) => n)] as RawArg, HOUR])).toThrow(/has names but no values/);
  });

  test('a spilling function takes one window', () => {
    expect(() => call('SOLARGAINSTEPS', [[PAIRS.map(([n]) => n), PAIRS.map(([, v]) => v), PAIRS.map(([, v]) => v)] as RawArg, HOUR])).toThrow(/^window = "a 2 × 1 range" is not allowed: must be one window: SOLARGAINSTEPS spills a table of its own/);
  });
});

describe('building the window from its fields', () => {
  test('every demo window, written as a schedule row under its header, reads back as the demo window', () => {
    const header = scheduleHeader();
    for (const w of demoWindows()) {
      const range = readWindowRange([header, scheduleRowOf(w)] as RawArg);
      const fields = range.windows[0];
      if (fields instanceof SunpaneError) throw fields;
      expect(windowSpecFromFields(fields).spec).toEqual({ ...w.spec, timeConvention: 'hourEnding' });
    }
  });

  test('both-sides fields apply to each side that has a device; a one-side field wins for its side', () => {
    const range = readWindowRange([...PAIRS, ['overhangProjection', 0.6], ['overhangExtension', 0.3], ['overhangExtensionRight', 0.5], ['finProjection', 0.4], ['rightFinProjection', 0.25], ['finGap', 0.1]] as RawArg);
    const { spec } = windowSpecFromFields(range.windows[0] as never, { year: 2026 });
    expect(spec.shading).toEqual({
      overhang: { projection: 0.6, gap: 0, extensionLeft: 0.3, extensionRight: 0.5 },
      leftFin: { projection: 0.4, gap: 0.1, extensionAbove: 0, extensionBelow: 0 },
      rightFin: { projection: 0.25, gap: 0.1, extensionAbove: 0, extensionBelow: 0 },
    });
    expect(() => validateWindowSpec(spec)).not.toThrow();
  });

  test('the fields of glazing types, conduction, load by part, design temperatures and daylight saving go to their places, checked by the core in their own names', () => {
    const extra: [string, unknown][] = [
      ['glazingType', 'Coated'],
      ['typeParameter', 4],
      ['shgcBasis', 'center of glass'],
      ['uValue', 1.6],
      ['indoorTemperature', 24],
      ['interiorAttenuationDiffuse', 0.8],
      ['radiantFractionConduction', 0.46],
      ['dryBulbMax', '33'],
      ['dailyRange', '11'],
      ['daylightSavingStart', '2026-03-29T02:00'],
      ['Daylight saving end', '2026-10-25T03:00'],
      ['diffuseShading', 'beamonly'],
    ];
    const range = readWindowRange([...PAIRS, ...extra] as RawArg);
    const { spec } = windowSpecFromFields(range.windows[0] as never, { year: 2026 });
    expect(spec.glazing).toMatchObject({ type: 'coated', typeParameter: 4, shgcBasis: 'centreOfGlass', uValue: 1.6, interiorAttenuationDiffuse: 0.8, radiantFractionConduction: 0.46 });
    expect(spec.indoorTemperature).toBe(24);
    expect(spec.weather).toMatchObject({ kind: 'ashraeClearSky', dryBulbMax: [33], dailyRange: [11] });
    expect(spec.site.daylightSaving?.shift).toBe(1); // the glossary default when only start and end are given
    expect(spec.diffuseShading).toBe('beamOnly');
    expect(() => validateWindowSpec(spec)).not.toThrow();
    // the core's refusals, in the fields' own words
    expect(refusal([...PAIRS, ['glazingType', 'coated']]).message).toMatch(/^window glazingTypeParameter /);
    expect(refusal([...PAIRS, ['daylightSavingStart', '2026-03-29T02:00']]).message).toMatch(/^window daylightSavingEnd /);
    expect(refusal([...PAIRS, ['uValue', 1.6]]).message).toMatch(/^window (indoorTemperature|dryBulbMax) /);
    // a window whose hour comes with its own dni and dhi keeps its design temperatures for the conduction
    const hour = call('SOLARGAIN', [[...PAIRS.filter(([n]) => n !== 'tauB' && n !== 'tauD'), ['uValue', 1.6], ['indoorTemperature', 24], ['dryBulbMax', 33], ['dailyRange', 11]] as RawArg, HOUR, 500, 100]);
    expect(typeof hour[0][0]).toBe('number');
  });

  test('an example site fills the place, its clear sky and albedo; its own coordinates beside it are refused', () => {
    const range = readWindowRange([['site', 'Brackwater'], ['surfaceAzimuth', 180], ['width', 1], ['height', 1], ['shgc', 0.4]] as RawArg);
    const { spec, hasWeather } = windowSpecFromFields(range.windows[0] as never, { year: 2026 });
    expect(hasWeather).toBe(true);
    expect(spec.site.latitude).toBe(52.2);
    expect(spec.weather.kind).toBe('ineichenClearSky');
    expect(refusal([['site', 'brackwater'], ['latitude', 40], ['surfaceAzimuth', 180], ['width', 1], ['height', 1], ['shgc', 0.4]]).message).toBe(
      'window latitude = 40 is not allowed: cannot be given with window site: give either an example site or your own latitude, longitude, UTC offset and elevation',
    );
  });

  test.each([
    [[...PAIRS.slice(1)], 'window latitude = blank is not allowed: it is required and must be a number from -90 to 90 ° (or give an example site)'],
    [[...PAIRS, ['overhangGap', 0.2]], 'window overhangProjection = blank is not allowed: needed because window overhangGap is given for an overhang (0 for no overhang)'],
    [[...PAIRS, ['leftFinGap', 0.2]], 'window leftFinProjection = blank is not allowed: needed because window leftFinGap is given for the left fin (or give finProjection for both fins; 0 for no fin)'],
    [[...PAIRS, ['overhangProjection', 0.5], ['overhangExtensionLeft', -1.5], ['overhangExtensionRight', -1]], /^window overhangExtensionLeft = -1\.5 is not allowed: must be at least -0\.5/],
    [[...PAIRS, ['overhangProjection', 0.5], ['surfaceTilt', 45]], 'window surfaceTilt = 45 is not allowed: must be 90 ° (a vertical wall) when shading devices or a skyline are given (the shadows and the sky and ground view factors of overhangs, fins, reveals and skylines are worked out for vertical walls only; remove the devices or skyline for a tilted window)'],
    [[...PAIRS.slice(0, 7), ['tauB', 0.4]], 'window tauD = blank is not allowed: needed with window tauB: the ASHRAE clear sky takes both (a number above 0 and up to 4)'],
    [[...PAIRS.slice(0, 7), ['linkeTurbidity', '3 3 3']], 'window linkeTurbidity = "3 3 3" is not allowed: must hold one value for the whole year or 12 monthly values (January first), separated by spaces, commas or semicolons'],
    [[...PAIRS, ['skyline', '10 x']], 'window skyline (value 2) = "x" is not allowed: must be a number from 0 to 90 °'],
    [[...PAIRS, ['shgcAngles', '0 40 60']], 'window shgcValues = blank is not allowed: needed with window shgcAngles: one SHGC (0 to 1) per angle'],
    [[...PAIRS, ['shgcAngles', '0 40 60'], ['shgcValues', '0.4 0.38']], /^window shgcValues = a list of 2 is not allowed: must be a list of 3 SHGC values, one per angle/],
    [[...PAIRS, ['skyModel', 'klucher']], 'window skyModel = "klucher" is not allowed: must be one of "perez1990", "hayDavies", "isotropic", "ashraeClearDay" (also accepted: "perez"); case does not matter'],
    [[...PAIRS.filter(([n]) => n !== 'width'), ['width', 1e-200]], 'window width = 1e-200 is not allowed: must be a number from 0.01 to 100 m'],
  ])('messages name the field as written, never a path inside the program (%#)', (fields, message) => {
    const err = refusal(fields as [string, unknown][]);
    if (typeof message === 'string') expect(err.message).toBe(message);
    else expect(err.message).toMatch(message);
    expect(err.message).not.toMatch(/\b(site|glazing|shading|weather|angleTable)\./);
  });
});
