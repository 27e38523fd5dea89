/**
 * The gain explanation states the inputs it used: each step's method text gives the numbers and the
 * choices of the window it explains (time convention, daylight-saving rule, glazing model, interior
 * shade, SHGC basis, diffuse treatment, sky model, weather source, conduction), so that a reader
 * checking a consultant's number by hand is never told one thing while another was computed.
 *
 * Source: the property itself (the words must agree with the window description and with the
 * step's own value), and the published methods named in the steps: NREL SPA (Reda & Andreas 2008),
 * Karlsson & Roos (2000), Perez et al. (1990), Hay & Davies (1980), the handbook's clear-day
 * procedure with Y = max(0.45, 0.55 + 0.437 cos θ + 0.313 cos² θ) (ASHRAE Handbook—Fundamentals
 * (2013) ch. 14, from memory), and the glass-area rule A = W · H · (1 − frame fraction).
 */
import { gainSteps } from '../../../src/core/gain/gainSteps';
import type { WindowSpec } from '../../../src/core/gain/window';
import { civilToSerial } from '../../../src/core/time/calendar';
import { baseSpec, shadedSpec } from './gainFixtures';

const T = civilToSerial(2026, 9, 21, 15);
const method = (spec: WindowSpec, quantity: string, t = T) => {
  const s = gainSteps(spec, t).find((x) => x.quantity === quantity);
  if (!s) throw new Error(`no step ${quantity}`);
  return s.method;
};

describe('the gain explanation states what it used', () => {
  test('the instant the sun was taken at, by the time convention, and the clock rule', () => {
    // 21 September 2026 is day 264: the hour ending 15:00 is row 263 × 24 + 15 = 6327 (counting from 1) of the year.
    expect(method(baseSpec(), 'sun evaluated at')).toBe('local standard time 2026-09-21T14:30: the middle of the hour ending 2026-09-21T15:00 (time convention hourEnding); row 6327 of the hourly year');
    expect(method(baseSpec({ timeConvention: 'instant' }), 'sun evaluated at')).toBe('local standard time 2026-09-21T15:00: the date-time itself (time convention instant); row 6328 of the hourly year');
    expect(method(baseSpec(), 'local clock time')).toBe('2026-09-21T14:30 on the clock; no daylight saving: local standard time'); // the sun's instant, read on the clock
    const site = { ...baseSpec().site, daylightSaving: { start: civilToSerial(2026, 3, 8, 2), end: civilToSerial(2026, 11, 1, 2), shift: 1 } };
    const dst = method(baseSpec({ site }), 'local clock time');
    expect(dst).toMatch(/^2026-09-21T14:30 on the clock; daylight saving \+1 h from .* \(clock time\), every year; standard time is clock time less the daylight-saving shift inside the period$/);
    expect(method(baseSpec({ site }), 'sun evaluated at')).toMatch(/^local standard time 2026-09-21T13:30: the middle of the hour ending 2026-09-21T14:00/);
    expect(method(baseSpec(), 'sun altitude')).toBe('NREL SPA (Reda & Andreas 2008) at 2026-09-21T14:30 local standard time, with refraction');
  });

  test('the glazing model with its numbers', () => {
    expect(method(baseSpec(), 'SHGC at the incidence angle')).toBe('clear panes: Fresnel reflection + absorption model, 2 pane(s), scaled to SHGC 0.6 at normal incidence');
    expect(method(baseSpec({ glazing: { shgc: 0.4, panes: 3, type: 'coated', typeParameter: 4 } }), 'SHGC at the incidence angle')).toBe(
      'coated unit: Karlsson & Roos (2000) angular model, 3 pane(s), glazing-type parameter q 4, × SHGC 0.4 at normal incidence',
    );
    expect(method(baseSpec({ glazing: { shgc: 0.5, panes: 2, type: 'table', angleTable: { angles: [0, 40, 60, 80, 90], values: [0.5, 0.49, 0.45, 0.3, 0] } } }), 'SHGC at the incidence angle')).toBe(
      'from the glazing angle table (monotone cubic interpolation)',
    );
    expect(method(baseSpec(), 'glass area')).toBe('width 2 × height 1.5 × (1 − frame fraction 0.1)');
    expect(method(baseSpec(), 'area for the SHGC')).toBe('centre-of-glass SHGC: the glass area');
    expect(method(baseSpec({ glazing: { shgc: 0.6, panes: 2, shgcBasis: 'wholeWindow' } }), 'area for the SHGC')).toMatch(/^whole-window SHGC/);
  });

  test('an interior shade is said to be there exactly when an attenuation below 1 is used', () => {
    expect(method(baseSpec(), 'interior attenuation, beam')).toBe('no interior shade (1)');
    expect(method(baseSpec(), 'interior attenuation, diffuse')).toBe('no interior shade (1)');
    const beamOnly = baseSpec({ glazing: { shgc: 0.6, panes: 2, interiorAttenuation: 0.7 } });
    expect(method(beamOnly, 'interior attenuation, beam')).toBe('given (interior shade: the beam goes to the non-solar radiant time series)');
    expect(method(beamOnly, 'interior attenuation, diffuse')).toBe('given');
    const diffuseOnly = baseSpec({ glazing: { shgc: 0.6, panes: 2, interiorAttenuation: 1, interiorAttenuationDiffuse: 0.8 } });
    expect(method(diffuseOnly, 'interior attenuation, beam')).toMatch(/^given/);
  });

  test('the diffuse treatment behind devices: view factors on a shaded vertical window, the bare window otherwise, or beam-only', () => {
    const shaded = shadedSpec();
    const sky = gainSteps(shaded, T).find((s) => s.quantity === 'sky view ratio')!;
    expect(sky.method).toBe(
      `glass-averaged, cosine-weighted view factor to the open sky ${(sky.value / 2).toFixed(4)} ÷ ½ (bare window): overhang, fins, reveal and skyline together, a direction blocked by several counted once; devices black`,
    );
    const ground = gainSteps(shaded, T).find((s) => s.quantity === 'ground view ratio')!;
    expect(ground.method).toBe(`view factor to the open ground ${(ground.value / 2).toFixed(4)} ÷ ½: overhang, fins and reveal together; devices black`);
    expect(method(shaded, 'horizon band share')).toMatch(/^open share of the sky 0–[\d.]+° above the horizon, cosine-weighted, past devices and skyline/);
    expect(method(shaded, 'sky diffuse on the window')).toMatch(/^Perez et al\. \(1990\) sky, composite coefficients: isotropic part × sky view ratio \+ circumsolar \(F1\) part × sunlit fraction \+ horizon \(F2\) part × horizon band share$/);
    expect(method(shaded, 'ground-reflected on the window')).toBe('ground-reflected on the bare window × ground view ratio');
    expect(method(baseSpec(), 'sky view ratio')).toBe('nothing shades the window: the bare window’s ½ ÷ ½');
    expect(method(baseSpec(), 'ground view ratio')).toBe('nothing shades the window: ½ ÷ ½');
    expect(method(baseSpec(), 'horizon band share')).toBe('nothing shades the window');
    expect(method(shadedSpec({ surfaceTilt: 60, shading: {} }), 'sky view ratio')).toMatch(/^nothing shades the window/);
    const beamOnly = shadedSpec({ diffuseShading: 'beamOnly' });
    expect(method(beamOnly, 'sky view ratio')).toBe('the skyline’s sky view; devices left out of the diffuse (beam-only treatment)');
    expect(method(beamOnly, 'ground view ratio')).toBe('not cut (beam-only treatment)');
    expect(method(beamOnly, 'horizon band share')).toBe('the skyline’s sky view (beam-only treatment)');
    expect(method(beamOnly, 'ground-reflected on the window')).toBe('as on the bare window (beam-only treatment)');
    expect(method(beamOnly, 'sky diffuse on the window')).toBe('Perez et al. (1990) sky, composite coefficients, × the skyline’s sky view (beam-only treatment)');
    const openBeamOnly = baseSpec({ diffuseShading: 'beamOnly', shading: { overhang: { projection: 0.5, gap: 0, extensionLeft: 0, extensionRight: 0 } } });
    expect(method(openBeamOnly, 'sky view ratio')).toBe('open horizon; devices left out of the diffuse (beam-only treatment)');
  });

  test('each sky model is named in the sky steps; the ground step states the albedo', () => {
    const names = { isotropic: 'isotropic sky', hayDavies: 'Hay–Davies sky', perez1990: 'Perez et al. (1990) sky', ashraeClearDay: 'handbook clear-day procedure' } as const;
    for (const skyModel of ['isotropic', 'hayDavies', 'perez1990', 'ashraeClearDay'] as const) {
      expect(method(baseSpec({ skyModel }), 'sky diffuse on the bare window')).toBe(`${names[skyModel]}, no devices and no skyline`);
      expect(method(shadedSpec({ skyModel }), 'sky diffuse on the window').startsWith(names[skyModel] === 'handbook clear-day procedure' ? 'handbook clear-day procedure: DHI · (Y sin tilt + cos tilt), Y = max(0.45, 0.55 + 0.437 cos θ + 0.313 cos² θ)' : names[skyModel].split(' sky')[0])).toBe(true);
      expect(method(shadedSpec({ skyModel, diffuseShading: 'beamOnly' }), 'sky diffuse on the window')).toMatch(/× the skyline’s sky view \(beam-only treatment\)$/);
    }
    // A τb/τd clear sky with no model given uses the clear-day procedure.
    expect(method(baseSpec({ skyModel: undefined }), 'sky diffuse on the bare window')).toBe('handbook clear-day procedure, no devices and no skyline');
    // Any other weather with no model given uses Perez 1990 (window.ts: skyModel's default).
    expect(method(baseSpec({ skyModel: undefined, weather: { kind: 'ineichenClearSky', linkeTurbidity: [3] } }), 'sky diffuse on the bare window')).toBe('Perez et al. (1990) sky, no devices and no skyline');
    expect(method(baseSpec({ groundAlbedo: 0.35 }), 'ground-reflected on the bare window')).toBe('GHI × albedo 0.35 × (1 − cos tilt) / 2');
  });

  test('the radiant split states its fractions; conduction states U, the opening and where the dry-bulb came from', () => {
    const spec = baseSpec({ glazing: { shgc: 0.6, panes: 2, radiantFractionBeam: 0.9, radiantFractionDiffuse: 0.6 } });
    expect(method(spec, 'radiant part')).toBe('radiant fraction 0.9 × beam gain + 0.6 × diffuse gains');
    const withU = baseSpec({ glazing: { shgc: 0.6, panes: 2, uValue: 2.8 }, indoorTemperature: 24, weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [31], dailyRange: [11] } });
    expect(method(withU, 'conduction gain')).toBe('U 2.8 W/(m²·K) × rough opening 2 × 1.5 m² × (outdoor − indoor)');
    expect(method(withU, 'outdoor dry-bulb')).toMatch(/^design day: highest dry-bulb − fraction of daily range/);
    expect(method(withU, 'indoor temperature')).toBe('given');
    const hours = (v: number) => new Array<number>(8760).fill(v);
    const measured = { ...withU, weather: { kind: 'measured' as const, dni: hours(0), dhi: hours(0), dryBulb: hours(20) } };
    expect(method(measured, 'outdoor dry-bulb')).toBe('supplied hourly series');
    expect(method({ ...withU, weather: { kind: 'globalHorizontal' as const, ghi: hours(0), dryBulb: hours(20) } }, 'outdoor dry-bulb')).toBe('supplied hourly series');
    expect(gainSteps(baseSpec(), T).some((s) => s.quantity === 'conduction gain')).toBe(false);
  });

  test('an hour with no weather says so in the gain step', () => {
    const hours = new Array<number>(8760).fill(0);
    const dni = [...hours];
    dni[6281] = Number.NaN; // 19 September (day 262), hour ending 18:00: row 261 × 24 + 17 counting from 0
    const spec = baseSpec({ weather: { kind: 'measured', dni, dhi: hours } });
    const t = civilToSerial(2026, 9, 19, 18);
    expect(method(spec, 'window solar gain', t)).toBe('no weather for this hour: 0');
    expect(method(spec, 'window solar gain', t - 1 / 24)).toBe('beam + sky-diffuse + ground-reflected gain');
  });
});
