/**
 * The gain worksheet functions, called as a cell would call them, against the core they wrap
 * (whose outside checks are in tests/core/gain*.test.ts and tests/reference/rts-spitler-1997.test.ts).
 * Plumbing only: argument order, defaults, error names, spill shapes.
 */
import { NotAvailable, type RawArg } from '../../src/registry/types';
import { SunpaneError } from '../../src/core/common/errors';
import { annualSeries } from '../../src/core/gain/annual';
import { windowGainAt } from '../../src/core/gain/windowGain';
import { civilToSerial } from '../../src/core/time/calendar';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import { baseSpec } from '../core/gain/gainFixtures';

function call(name: string, args: RawArg[]) {
  return applyFunction(findFunction(name)!, args);
}

const NOON = '2026-07-21T12:30';
// dateTime, latitude, longitude, utcOffset, surfaceAzimuth, width, height, shgc, dni, dhi, tauB, tauD
const HOUR = [NOON, 40, -105, -7, 180, 2, 1.5, 0.6, null, null, 0.4, 2.3];
// panes, frameFraction, groundAlbedo, skyModel, surfaceTilt, interiorAttenuation
const GLASS = [2, 0.1, 0.2, 'perez', 90, 1];
// GAINSTEPS rows for a window with no interior shade: sun, angles, shading, weather, the three diffuse ratios, irradiance bare and shaded, SHGC, area, gain.
const STEPS = 29;

describe('gain worksheet functions', () => {
  test('WINDOWGAIN equals the core gain of the same window, the sun at the instant typed (as released)', () => {
    const spec = baseSpec({ site: { latitude: 40, longitude: -105, utcOffset: -7 }, timeConvention: 'instant' });
    const expected = windowGainAt(spec, civilToSerial(2026, 7, 21, 12, 30)).gain.total;
    expect(call('WINDOWGAIN', [...HOUR, ...GLASS])[0][0]).toBeCloseTo(expected, 9);
  });

  test('WINDOWGAIN with measured dni and dhi and an overhang', () => {
    const spec = baseSpec({ site: { latitude: 40, longitude: -105, utcOffset: -7 }, shading: { overhang: { projection: 0.6, gap: 0.1, extensionLeft: 0, extensionRight: 0 } }, timeConvention: 'instant' });
    const expected = windowGainAt(spec, civilToSerial(2026, 7, 21, 12, 30), { dni: 850, dhi: 120 }).gain.total;
    const args = [NOON, 40, -105, -7, 180, 2, 1.5, 0.6, 850, 120, null, null, ...GLASS, 0.6, 0.1];
    expect(call('WINDOWGAIN', args)[0][0]).toBeCloseTo(expected, 9);
  });

  test('WINDOWGAIN refuses half the weather and an overhang narrower than nothing, by parameter name', () => {
    const half = call('WINDOWGAIN', [NOON, 40, -105, -7, 180, 2, 1.5, 0.6, 850, null, null, null])[0][0] as SunpaneError;
    expect(half).toBeInstanceOf(SunpaneError);
    expect(half.argument).toBe('dhi');
    const noSky = call('WINDOWGAIN', [NOON, 40, -105, -7, 180, 2, 1.5, 0.6])[0][0] as SunpaneError;
    expect(noSky.argument).toBe('dni');
    expect(noSky.message).toMatch(/give the hour's dni and dhi: the window has no clear sky of its own \(or give it linkeTurbidity, or tauB and tauD/);
    const narrow = call('WINDOWGAIN', [...HOUR, ...GLASS, 0.5, 0, -1.5, -1])[0][0] as SunpaneError;
    expect(narrow).toBeInstanceOf(SunpaneError);
    expect(narrow.argument).toBe('overhangExtensionLeft'); // -1.5 cuts more than -1
    const tilted = call('WINDOWGAIN', [...HOUR, 2, 0.1, 0.2, 'perez', 45, 1, 0.5])[0][0] as SunpaneError;
    expect(tilted.argument).toBe('surfaceTilt');
  });

  test('GAINSTEPS spills a heading and its steps, the first the instant used, whose window-solar-gain line is WINDOWGAIN', () => {
    const table = call('GAINSTEPS', [...HOUR, ...GLASS]);
    expect(table[0]).toEqual(['step', 'quantity', 'value', 'unit', 'method']);
    expect(table).toHaveLength(STEPS + 1);
    expect(table[1].slice(0, 2)).toEqual([1, 'sun evaluated at']);
    expect(table[1][2]).toBeCloseTo(civilToSerial(2026, 7, 21, 12, 30), 9);
    expect(table[1][4]).toMatch(/the date-time itself \(time convention instant\)/);
    const line = table.find((r) => r[1] === 'window solar gain')!;
    expect(line[2]).toBe(call('WINDOWGAIN', [...HOUR, ...GLASS])[0][0]);
    expect(table.slice(1).map((r) => r[0])).toEqual(Array.from({ length: STEPS }, (_, i) => i + 1));
    const bare = call('GAINSTEPS', [...HOUR, ...GLASS, null, null, null, null, null, null, null, null, null, null, false]);
    expect(bare).toHaveLength(STEPS);
    expect(bare[0][1]).toBe('sun evaluated at');
  });

  test('GAINSTEPS shows each diffuse ratio and where it came from; the shaded sky is the bare sky cut by them', () => {
    // The same hour under a 0.8 m overhang, 0.2 m above the head, reaching 0.3 m past each jamb.
    const table = call('GAINSTEPS', [...HOUR, ...GLASS, 1, 0.8, 0.2, 0.3, 0.3]);
    const row = (q: string) => table.find((r) => r[1] === q)!;
    const ratio = row('sky view ratio');
    expect(ratio[2] as number).toBeGreaterThan(0.5);
    expect(ratio[2] as number).toBeLessThan(0.9);
    expect(ratio[4]).toMatch(/view factor to the open sky 0\.\d{4} ÷ ½/);
    expect(row('ground view ratio')[2]).toBeCloseTo(1, 9); // an overhang hides no ground
    expect(row('sky diffuse on the window')[2] as number).toBeLessThan(row('sky diffuse on the bare window')[2] as number);
    expect(row('sky diffuse on the window')[4]).toMatch(/isotropic part × sky view ratio \+ circumsolar \(F1\) part × sunlit fraction \+ horizon \(F2\) part × horizon band share/);
  });

  test('COOLINGLOAD spills 24 rows and keeps a constant gain', () => {
    const factors = [0.4, 0.3, 0.2, 0.1, ...new Array(20).fill(0)];
    const out = call('COOLINGLOAD', [[new Array(24).fill(500)], [factors], 0.7]);
    expect(out).toHaveLength(24);
    for (const r of out) expect(r[0]).toBeCloseTo(500, 9);
    const bad = call('COOLINGLOAD', [[new Array(24).fill(500)], [factors.map((f) => f / 2)], 0.7]);
    expect((bad[0][0] as SunpaneError).argument).toBe('factors');
  });

  test('PEAKGAINS spills 12 × 3, or 12 × 5 with radiant time factors', () => {
    const base = [2026, 40, -105, -7, 270, 2, 1.5, 0.6, 0.4, 2.3];
    const t = call('PEAKGAINS', base);
    expect(t).toHaveLength(12);
    expect(t.map((r) => r[0])).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    for (const r of t) expect(r).toHaveLength(3);
    const factors = [0.4, 0.3, 0.2, 0.1, ...new Array(20).fill(0)];
    const withLoad = call('PEAKGAINS', [...base, 21, [factors]]);
    for (const r of withLoad) expect(r).toHaveLength(5);
  });

  test('WINDOWYEAR spills the chosen column of the annual series', () => {
    const out = call('WINDOWYEAR', [2026, 40, -105, -7, 180, 2, 1.5, 0.6, 'gain', null, null, 0.4, 2.3, ...GLASS]);
    expect(out).toHaveLength(8760);
    const s = annualSeries(baseSpec({ site: { latitude: 40, longitude: -105, utcOffset: -7 } }));
    for (let i = 0; i < 8760; i += 37) expect(out[i][0]).toBeCloseTo(s.gain[i], 9);
    const wrong = () => call('WINDOWYEAR', [2026, 40, -105, -7, 180, 2, 1.5, 0.6, 'gain', [[1, 2, 3]], [[1, 2, 3]]]);
    const cell = wrong()[0][0] as SunpaneError;
    expect(cell).toBeInstanceOf(SunpaneError);
    expect(cell.argument).toBe('dni');
  });

  test('WINDOWYEAR returns the diffuse shading: sky and ground reaching the glass, on the bare window, and the constant ratios', () => {
    // year, site and window, quantity, no series, τb τd, glass, radiant fraction, then a 0.8 m overhang and 0.1 m fins
    const args = (q: string) => [2026, 40, -105, -7, 180, 1.5, 1.2, 0.4, q, null, null, 0.4, 2.3, ...GLASS, 1, 0.8, 0.1, 0.2, 0.2, 0.3, 0.05];
    const sky = call('WINDOWYEAR', args('sky')).map((r) => r[0] as number);
    const bare = call('WINDOWYEAR', args('skyunshaded')).map((r) => r[0] as number);
    const ground = call('WINDOWYEAR', args('ground')).map((r) => r[0] as number);
    const groundBare = call('WINDOWYEAR', args('groundunshaded')).map((r) => r[0] as number);
    const skyView = call('WINDOWYEAR', args('skyview')).map((r) => r[0] as number);
    const groundView = call('WINDOWYEAR', args('groundview')).map((r) => r[0] as number);
    const band = call('WINDOWYEAR', args('horizonshare')).map((r) => r[0] as number);
    expect(new Set(skyView).size).toBe(1);
    expect(skyView[0]).toBeGreaterThan(0.4);
    expect(skyView[0]).toBeLessThan(0.9);
    expect(groundView[0]).toBeLessThan(1); // the fins hide some ground
    expect(band[0]).toBeGreaterThan(0);
    let lit = 0;
    for (let i = 0; i < sky.length; i++) {
      expect(sky[i]).toBeLessThanOrEqual(bare[i] + 1e-9);
      expect(ground[i]).toBeCloseTo(groundBare[i] * groundView[0], 9);
      if (bare[i] > 0) lit++;
    }
    expect(lit).toBeGreaterThan(4000);
  });

  test('WINDOWYEAR marks a blank or text weather cell missing (#N/A) instead of reading it as zero', () => {
    const dni: (number | string | null)[][] = Array.from({ length: 8760 }, () => [600]);
    const dhi: (number | string | null)[][] = Array.from({ length: 8760 }, () => [100]);
    dni[4000][0] = null; // a blank hour
    dhi[4001][0] = 'n/a'; // a garbled hour
    const out = call('WINDOWYEAR', [2026, 40, -105, -7, 180, 2, 1.5, 0.6, 'gain', dni, dhi, null, null, ...GLASS]);
    expect(out).toHaveLength(8760);
    expect(out[4000][0]).toBeInstanceOf(NotAvailable);
    expect(out[4001][0]).toBeInstanceOf(NotAvailable);
    expect(typeof out[4002][0]).toBe('number');
    // Geometry does not depend on the weather: still given on the missing hour.
    expect(typeof call('WINDOWYEAR', [2026, 40, -105, -7, 180, 2, 1.5, 0.6, 'altitude', dni, dhi, null, null, ...GLASS])[4000][0]).toBe('number');
  });
});

describe('conduction fields, as the registry fuzz found them', () => {
  const site: [string, number | string][] = [['latitude', 40], ['longitude', -105], ['utcOffset', -7], ['surfaceAzimuth', 180], ['width', 1.5], ['height', 1.2], ['shgc', 0.4], ['tauB', 0.4], ['tauD', 2.3], ['year', 2026]];
  const messageOf = (name: string, args: RawArg[]) => {
    const cell = applyFunction(findFunction(name)!, args).flat()[0];
    expect(cell).toBeInstanceOf(SunpaneError);
    return cell as SunpaneError;
  };

  test('a U-value without the indoor temperature is refused in the window\'s words (no glazing.uValue)', () => {
    const err = messageOf('SOLARGAIN', [[...site, ['uValue', 3], ['dryBulbMax', 30], ['dailyRange', 10]], '2026-07-21T13:00']);
    expect(err.argument).toBe('window indoorTemperature');
    expect(err.message).toContain('must be given with uValue');
    expect(err.message).not.toMatch(/glazing\.|weather\./);
  });

  test('the hourly year under supplied series refuses a U-value by name (it takes no dry-bulb), and refuses says so first', () => {
    const fn = findFunction('SOLARGAINYEAR')!;
    const dni = Array.from({ length: 8760 }, () => [100]);
    const dhi = Array.from({ length: 8760 }, () => [50]);
    const args: RawArg[] = [[...site, ['uValue', 3], ['indoorTemperature', 24], ['dryBulbMax', 30], ['dailyRange', 10]], 'gain', dni, dhi];
    const err = messageOf('SOLARGAINYEAR', args);
    expect(err.argument).toBe('window uValue');
    expect(err.message).toContain('dry-bulb');
    expect(err.message).not.toMatch(/glazing\.|weather\./);
    expect(fn.refuses).toBeDefined();
  });

  test('a design day colder than the room gives a peak cooling load below 0 (conduction), and the result range says so', () => {
    const factors = Array.from({ length: 24 }, () => [1 / 24]);
    const out = applyFunction(findFunction('SOLARGAINPEAKS')!, [[...site.map(([n, v]) => [n, n === 'shgc' ? 0.05 : v]), ['uValue', 6], ['indoorTemperature', 24], ['dryBulbMax', -30], ['dailyRange', 5]], factors]);
    const loads = out.map((r) => r[4] as number);
    expect(Math.max(...loads)).toBeLessThan(0);
    expect(findFunction('SOLARGAINPEAKS')!.result.min).toBeUndefined();
    expect(findFunction('PEAKGAINS')!.result.min).toBeUndefined();
  });
});
