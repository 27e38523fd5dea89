/**
 * The words of every refusal of a window description (src/core/gain/windowSpec.ts): the window, its
 * site, glazing, ground, sky model, weather and the fields the conduction gain needs.
 *
 * Source: the error convention of docs/architecture.md ("The one error type"): a refusal names the
 * field by its path as the user wrote it, the refused value and the allowed range in words, e.g.
 * `latitude = 91 is not allowed: must be a number from -90 to 90 °`; and the ranges the window
 * description documents (src/core/gain/window.ts and the glossary): latitude −90…90 °, longitude
 * −180…180 °, UTC offset −12…14 h, elevation −500…9000 m, pressure above 0 up to 1200 hPa, air
 * temperature −90…60 °C, azimuth 0…360 °, tilt 0…180 °, width and height 0.01…100 m, frame fraction
 * 0 up to below 1, SHGC and fractions 0…1, panes 1…4 whole, U-value 0…10 W/(m²·K), indoor −20…50 °C,
 * τb above 0 up to 1.2, τd above 0 up to 4, Linke turbidity 1…10, irradiance series 0…2000 W/m².
 * The other gain tests check which field is named; these check the whole message a user reads, and
 * that values at the ends of the ranges (−60 and 60 °C, 0 and 2000 W/m², a daily range of 0 and 40 K)
 * are accepted.
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { validateWindowSpec } from '../../../src/core/gain/windowSpec';
import type { WindowSpec } from '../../../src/core/gain/window';
import { baseSpec } from './gainFixtures';

function refusal(spec: unknown): string {
  try {
    validateWindowSpec(spec as WindowSpec);
  } catch (err) {
    if (err instanceof SunpaneError) return err.message;
    throw err;
  }
  throw new Error('not refused');
}

const site = (s: Record<string, unknown>) => baseSpec({ site: { ...baseSpec().site, ...s } as WindowSpec['site'] });
const glazing = (g: Record<string, unknown>) => baseSpec({ glazing: { shgc: 0.6, panes: 2, ...g } as WindowSpec['glazing'] });
const weather = (w: Record<string, unknown>) => baseSpec({ weather: w as WindowSpec['weather'] });
const hours = (v = 0) => new Array<number>(8760).fill(v);

describe('window description refusals', () => {
  test('the valid fixture passes', () => {
    expect(validateWindowSpec(baseSpec())).toEqual(baseSpec());
  });

  test('the description itself, its name and the window', () => {
    expect(refusal(null)).toBe('spec = blank is not allowed: must be given (an object)');
    expect(refusal([])).toBe('spec = a list of 0 is not allowed: must be given (an object)');
    expect(refusal(baseSpec({ name: 3 as never }))).toBe('name = 3 is not allowed: must be a text');
    expect(refusal(baseSpec({ surfaceAzimuth: 361 }))).toBe('surfaceAzimuth = 361 is not allowed: must be a number from 0 to 360 °');
    expect(refusal(baseSpec({ surfaceTilt: -1 }))).toBe('surfaceTilt = -1 is not allowed: must be a number from 0 to 180 °');
    expect(refusal(baseSpec({ width: 0.005 }))).toBe('width = 0.005 is not allowed: must be a number from 0.01 to 100 m');
    expect(refusal(baseSpec({ height: 101 }))).toBe('height = 101 is not allowed: must be a number from 0.01 to 100 m');
    expect(refusal(baseSpec({ frameFraction: 1 }))).toBe('frameFraction = 1 is not allowed: must be a number of at least 0 and below 1');
    expect(refusal(baseSpec({ groundAlbedo: 1.1 }))).toBe('groundAlbedo = 1.1 is not allowed: must be a number from 0 to 1');
    expect(refusal(baseSpec({ diffuseShading: 'some' as never }))).toBe('diffuseShading = "some" is not allowed: must be one of "viewFactors", "beamOnly" (default "viewFactors")');
    expect(refusal(baseSpec({ skyModel: 'cloudy' as never }))).toBe('skyModel = "cloudy" is not allowed: must be one of "isotropic", "hayDavies", "perez1990", "ashraeClearDay"');
    expect(refusal(baseSpec({ indoorTemperature: 51 }))).toBe('indoorTemperature = 51 is not allowed: must be a number from -20 to 50 °C');
  });

  test('the site', () => {
    expect(refusal(baseSpec({ site: null as never }))).toBe('site = blank is not allowed: must be given (an object)');
    expect(refusal(site({ latitude: 91 }))).toBe('site.latitude = 91 is not allowed: must be a number from -90 to 90 °');
    expect(refusal(site({ longitude: -181 }))).toBe('site.longitude = -181 is not allowed: must be a number from -180 to 180 °');
    expect(refusal(site({ utcOffset: 15 }))).toBe('site.utcOffset = 15 is not allowed: must be a number from -12 to 14 h');
    expect(refusal(site({ elevation: -600 }))).toBe('site.elevation = -600 is not allowed: must be a number from -500 to 9000 m');
    expect(refusal(site({ pressure: 0 }))).toBe('site.pressure = 0 is not allowed: must be a number above 0 and up to 1200 hPa');
    expect(refusal(site({ temperature: 61 }))).toBe('site.temperature = 61 is not allowed: must be a number from -90 to 60 °C');
    expect(refusal(site({ daylightSaving: 5 }))).toBe('site.daylightSaving = 5 is not allowed: must be a rule with start, end and shift');
  });

  test('the glazing', () => {
    expect(refusal(baseSpec({ glazing: 'clear' as never }))).toBe('glazing = "clear" is not allowed: must be given (an object)');
    expect(refusal(glazing({ shgc: 1.2 }))).toBe('glazing.shgc = 1.2 is not allowed: must be a number from 0 to 1');
    expect(refusal(glazing({ panes: 2.5 }))).toBe('glazing.panes = 2.5 is not allowed: must be a whole number from 1 to 4');
    expect(refusal(glazing({ type: 'table' }))).toBe('glazing.angleTable = blank is not allowed: must be given for glazing type "table": a table of angles and SHGC values');
    expect(refusal(glazing({ type: 'clear', angleTable: { angles: [0, 90], shgc: [0.6, 0] } }))).toBe(
      'glazing.type = "clear" is not allowed: must be "table" (or left out) when an angle table is given: the table would otherwise be ignored',
    );
    expect(refusal(glazing({ radiantFraction: 1.5 }))).toBe('glazing.radiantFraction = 1.5 is not allowed: must be a number from 0 to 1');
    expect(refusal(glazing({ radiantFractionBeam: -0.1 }))).toBe('glazing.radiantFractionBeam = -0.1 is not allowed: must be a number from 0 to 1');
    expect(refusal(glazing({ radiantFractionDiffuse: 2 }))).toBe('glazing.radiantFractionDiffuse = 2 is not allowed: must be a number from 0 to 1');
    expect(refusal(glazing({ radiantFractionConduction: 3 }))).toBe('glazing.radiantFractionConduction = 3 is not allowed: must be a number from 0 to 1');
    expect(refusal(glazing({ uValue: 11 }))).toBe('glazing.uValue = 11 is not allowed: must be a number from 0 to 10 W/(m²·K)');
  });

  test('the conduction gain needs the indoor temperature and an outdoor dry-bulb', () => {
    expect(refusal(glazing({ uValue: 2.8 }))).toBe('indoorTemperature = blank is not allowed: must be given with glazing.uValue: the conduction gain needs the indoor temperature, from -20 to 50 °C');
    const needsOutdoor = 'is not allowed: must be given with glazing.uValue: the conduction gain needs the outdoor dry-bulb (an hourly series, or on clear design days the highest dry-bulb and the daily range)';
    expect(refusal({ ...glazing({ uValue: 2.8 }), indoorTemperature: 24 })).toBe(`weather.dryBulbMax = blank ${needsOutdoor}`);
    expect(refusal({ ...glazing({ uValue: 2.8 }), indoorTemperature: 24, weather: { kind: 'measured', dni: hours(), dhi: hours() } })).toBe(`weather.dryBulb = blank ${needsOutdoor}`);
    expect(refusal({ ...glazing({ uValue: 2.8 }), indoorTemperature: 24, weather: { kind: 'globalHorizontal', ghi: hours() } })).toBe(`weather.dryBulb = blank ${needsOutdoor}`);
    expect(() => validateWindowSpec({ ...glazing({ uValue: 2.8 }), indoorTemperature: 24, weather: { kind: 'ineichenClearSky', linkeTurbidity: [3], dryBulbMax: [30], dailyRange: [10] } })).not.toThrow();
  });

  test('clear-sky weather: the kind, monthly lists, τ pairs and design temperatures', () => {
    expect(refusal(baseSpec({ weather: null as never }))).toBe('weather = blank is not allowed: must be given (an object)');
    expect(refusal(weather({ kind: 'sunny' }))).toBe('weather.kind = "sunny" is not allowed: must be one of "ashraeClearSky", "ineichenClearSky", "measured", "globalHorizontal"');
    const monthly = 'is not allowed: must hold one value for the whole year or 12 monthly values (January first)';
    expect(refusal(weather({ kind: 'ashraeClearSky', tauB: [0.4, 0.4], tauD: [2.3] }))).toBe(`weather.tauB = a list of 2 ${monthly}`);
    expect(refusal(weather({ kind: 'ashraeClearSky', tauB: [0.4], tauD: 2.3 }))).toBe(`weather.tauD = 2.3 ${monthly}`);
    // τd of a length τb does not have: refused for its own length, in the same words, whatever τb holds
    expect(refusal(weather({ kind: 'ashraeClearSky', tauB: new Array<number>(12).fill(0.4), tauD: [2.3, 2.3] }))).toBe(`weather.tauD = a list of 2 ${monthly}`);
    expect(refusal(weather({ kind: 'ashraeClearSky', tauB: [0.4], tauD: new Array<number>(11).fill(2.3) }))).toBe(`weather.tauD = a list of 11 ${monthly}`);
    expect(refusal(weather({ kind: 'ashraeClearSky', tauB: [0], tauD: [2.3] }))).toBe('weather.tauB[0] = 0 is not allowed: must be a number above 0 and up to 1.2');
    expect(refusal(weather({ kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3, 2.3, 2.3, 2.3, 2.3, 2.3, 2.3, 2.3, 2.3, 2.3, 2.3, 4.5] }))).toBe(
      'weather.tauD[11] = 4.5 is not allowed: must be a number above 0 and up to 4',
    );
    expect(refusal(weather({ kind: 'ineichenClearSky', linkeTurbidity: [0.5] }))).toBe('weather.linkeTurbidity[0] = 0.5 is not allowed: must be a number from 1 to 10');
    const both = 'is not allowed: must be given with the other: the design-day dry-bulb needs its highest value and its daily range';
    expect(refusal(weather({ kind: 'ineichenClearSky', linkeTurbidity: [3], dryBulbMax: [30] }))).toBe(`weather.dailyRange = blank ${both}`);
    expect(refusal(weather({ kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dailyRange: [10] }))).toBe(`weather.dryBulbMax = blank ${both}`);
  });

  test('twelve monthly τb beside twelve τd, or one value beside twelve (read for every month), is accepted', () => {
    const twelve = (v: number) => new Array<number>(12).fill(v);
    expect(() => validateWindowSpec(weather({ kind: 'ashraeClearSky', tauB: twelve(0.4), tauD: twelve(2.3) }))).not.toThrow();
    expect(() => validateWindowSpec(weather({ kind: 'ashraeClearSky', tauB: twelve(0.4), tauD: [2.3] }))).not.toThrow();
    expect(() => validateWindowSpec(weather({ kind: 'ashraeClearSky', tauB: [0.4], tauD: twelve(2.3) }))).not.toThrow();
  });

  test('hourly weather: lists, lengths and values', () => {
    expect(refusal(weather({ kind: 'measured', dni: 'many', dhi: hours() }))).toBe('weather.dni = "many" is not allowed: must be a list of hourly values');
    const dni = hours();
    dni[17] = 2500;
    expect(refusal(weather({ kind: 'measured', dni, dhi: hours() }))).toBe('weather.dni[17] = 2500 is not allowed: must be a number from 0 to 2000 W/m², or NaN for a missing hour');
    const dhi = hours() as unknown[];
    dhi[3] = '12';
    expect(refusal(weather({ kind: 'measured', dni: hours(), dhi }))).toBe('weather.dhi[3] = "12" is not allowed: must be a number from 0 to 2000 W/m², or NaN for a missing hour');
    expect(refusal(weather({ kind: 'measured', dni: new Array<number>(8784).fill(0), dhi: hours() }))).toMatch(/^weather\.dhi = "8760 rows" is not allowed: must hold as many rows as weather\.dni \(8784\)/);
    const ghi = hours();
    ghi[0] = -1;
    expect(refusal(weather({ kind: 'globalHorizontal', ghi }))).toBe('weather.ghi[0] = -1 is not allowed: must be a number from 0 to 2000 W/m², or NaN for a missing hour');
    const hot = hours(20);
    hot[5] = 80;
    expect(refusal(weather({ kind: 'globalHorizontal', ghi: hours(), dryBulb: hot }))).toMatch(/^weather\.dryBulb\[5\] = 80 is not allowed: must be a number from -?\d+ to \d+ °C, or NaN for a missing hour$/);
    expect(refusal(weather({ kind: 'measured', dni: hours(), dhi: hours(), dryBulb: new Array<number>(8784).fill(20) }))).toBe(
      'weather.dryBulb = "8784 rows" is not allowed: must hold as many rows as the irradiance series (8760)',
    );
    // A non-finite value is a missing hour, not an error.
    const gaps = hours();
    gaps[9] = Number.NaN;
    expect(() => validateWindowSpec(weather({ kind: 'measured', dni: gaps, dhi: new Float64Array(8760) }))).not.toThrow();
  });

  test('the glazing model\'s own fields and the shading lengths are checked with the description, by their paths', () => {
    expect(refusal(glazing({ type: 'coated', typeParameter: 99 }))).toBe('glazing.typeParameter = 99 is not allowed: must be a number from 1 to 10');
    expect(refusal(glazing({ type: 'coated' }))).toBe(
      'glazing.typeParameter = blank is not allowed: must be given for a coated unit: the glazing-type parameter q of Karlsson & Roos (2000), from 1 to 10 (larger keeps the SHGC up to higher angles)',
    );
    expect(refusal(glazing({ type: 'table', angleTable: { angles: [0, 90], values: [0.5] } }))).toBe('glazing.angleTable.values = a list of 1 is not allowed: must be a list of 2 SHGC values, one per angle');
    expect(refusal(baseSpec({ shading: { overhang: { projection: 101, gap: 0, extensionLeft: 0, extensionRight: 0 } } }))).toBe(
      'shading.overhang.projection = 101 is not allowed: must be a number from 0 to 100 m',
    );
  });

  test('design-day temperatures: the highest dry-bulb −60…60 and the daily range 0…40, ends included, one value or twelve', () => {
    const design = (dryBulbMax: unknown, dailyRange: unknown) => weather({ kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax, dailyRange });
    expect(refusal(design([61], [10]))).toBe('weather.dryBulbMax[0] = 61 is not allowed: must be a number from -60 to 60 °C');
    expect(refusal(design([30], [41]))).toBe('weather.dailyRange[0] = 41 is not allowed: must be a number from 0 to 40 K');
    const monthly = 'is not allowed: must hold one value for the whole year or 12 monthly values (January first)';
    expect(refusal(design([30, 31], [10]))).toBe(`weather.dryBulbMax = a list of 2 ${monthly}`);
    expect(refusal(design([30], [10, 11, 12]))).toBe(`weather.dailyRange = a list of 3 ${monthly}`);
    expect(() => validateWindowSpec(design([-60], [0]))).not.toThrow();
    expect(() => validateWindowSpec(design(new Array<number>(12).fill(60), new Array<number>(12).fill(40)))).not.toThrow();
  });

  test('hourly values at the ends of their ranges are accepted: 0 and 2000 W/m², −60 and 60 °C', () => {
    const dni = hours();
    dni[100] = 2000;
    const dryBulb = hours(20);
    dryBulb[7] = 60;
    dryBulb[8] = -60;
    expect(() => validateWindowSpec(weather({ kind: 'measured', dni, dhi: hours(2000), dryBulb }))).not.toThrow();
    expect(() => validateWindowSpec(weather({ kind: 'globalHorizontal', ghi: hours(2000) }))).not.toThrow();
  });
});
