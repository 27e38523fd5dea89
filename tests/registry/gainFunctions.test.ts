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

describe('gain worksheet functions', () => {
  test('WINDOWGAIN equals the core gain of the same window', () => {
    const spec = baseSpec({ site: { latitude: 40, longitude: -105, utcOffset: -7 } });
    const expected = windowGainAt(spec, civilToSerial(2026, 7, 21, 12, 30)).gain.total;
    expect(call('WINDOWGAIN', [...HOUR, ...GLASS])[0][0]).toBeCloseTo(expected, 9);
  });

  test('WINDOWGAIN with measured dni and dhi and an overhang', () => {
    const spec = baseSpec({ site: { latitude: 40, longitude: -105, utcOffset: -7 }, shading: { overhang: { projection: 0.6, gap: 0.1, extensionLeft: 0, extensionRight: 0 } } });
    const expected = windowGainAt(spec, civilToSerial(2026, 7, 21, 12, 30), { dni: 850, dhi: 120 }).gain.total;
    const args = [NOON, 40, -105, -7, 180, 2, 1.5, 0.6, 850, 120, null, null, ...GLASS, 0.6, 0.1];
    expect(call('WINDOWGAIN', args)[0][0]).toBeCloseTo(expected, 9);
  });

  test('WINDOWGAIN refuses half the weather and an overhang narrower than nothing, by parameter name', () => {
    const half = call('WINDOWGAIN', [NOON, 40, -105, -7, 180, 2, 1.5, 0.6, 850, null, null, null])[0][0] as SunpaneError;
    expect(half).toBeInstanceOf(SunpaneError);
    expect(half.argument).toBe('dhi');
    const noSky = call('WINDOWGAIN', [NOON, 40, -105, -7, 180, 2, 1.5, 0.6])[0][0] as SunpaneError;
    expect(noSky.argument).toBe('tauB');
    const narrow = call('WINDOWGAIN', [...HOUR, ...GLASS, 0.5, 0, -1.5, -1])[0][0] as SunpaneError;
    expect(narrow).toBeInstanceOf(SunpaneError);
    expect(narrow.argument).toBe('overhangExtensionLeft'); // -1.5 cuts more than -1
    const tilted = call('WINDOWGAIN', [...HOUR, 2, 0.1, 0.2, 'perez', 45, 1, 0.5])[0][0] as SunpaneError;
    expect(tilted.argument).toBe('surfaceTilt');
  });

  test('GAINSTEPS spills a heading and 25 steps whose window-solar-gain line is WINDOWGAIN', () => {
    const table = call('GAINSTEPS', [...HOUR, ...GLASS]);
    expect(table[0]).toEqual(['step', 'quantity', 'value', 'unit', 'method']);
    expect(table).toHaveLength(26);
    const line = table.find((r) => r[1] === 'window solar gain')!;
    expect(line[2]).toBeCloseTo(call('WINDOWGAIN', [...HOUR, ...GLASS])[0][0] as number, 9);
    expect(table.slice(1).map((r) => r[0])).toEqual(Array.from({ length: 25 }, (_, i) => i + 1));
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
