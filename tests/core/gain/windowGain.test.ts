/**
 * Window gain for one hour: the gain equation, its parts, no-sun cases, missing weather and bad
 * input. Outside source for the equation: the definition of the solar heat gain coefficient as the
 * fraction of incident solar irradiance admitted through the glazing, so that a bare, unshaded
 * window at normal incidence gains Q = SHGC × A_glass × E (ASHRAE Handbook—Fundamentals (2013)
 * ch. 15, fenestration solar heat gain; from memory) — checked below against hand computations
 * written out with their numbers.
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { windowGainAt, windowGainParts } from '../../../src/core/gain/windowGain';
import { sunPosition } from '../../../src/core/sun/spa';
import { civilToSerial, serialToUtcMs } from '../../../src/core/time/calendar';
import { validateWindowSpec } from '../../../src/core/gain/windowSpec';
import { baseSpec, shadedSpec } from './gainFixtures';

describe('the gain equation', () => {
  test('a hand computation: 2 m² of glass, 800 W/m² beam, 100 sky, 50 ground, SHGC 0.6 / 0.52', () => {
    // beam 2 × 800 × 1 × 0.6 = 960 W; sky 2 × 100 × 0.52 = 104 W; ground 2 × 50 × 0.52 = 52 W; total 1116 W
    const g = windowGainParts({ glassArea: 2, beam: 800, sky: 100, ground: 50, sunlitFraction: 1, shgcBeam: 0.6, shgcDiffuse: 0.52, interiorAttenuation: 1, radiantFraction: 0.7 });
    expect(g.beam).toBeCloseTo(960, 9);
    expect(g.sky).toBeCloseTo(104, 9);
    expect(g.ground).toBeCloseTo(52, 9);
    expect(g.total).toBeCloseTo(1116, 9);
    expect(g.radiant).toBeCloseTo(781.2, 9); // 0.7 × 1116
    expect(g.convective).toBeCloseTo(334.8, 9);
  });

  test('shading scales only the beam, interior attenuation scales everything', () => {
    // sunlit 0.25, IAC 0.5: beam 2 × 0.5 × 800 × 0.25 × 0.6 = 120 W; sky 0.5 × 104 = 52 W; ground 26 W
    const g = windowGainParts({ glassArea: 2, beam: 800, sky: 100, ground: 50, sunlitFraction: 0.25, shgcBeam: 0.6, shgcDiffuse: 0.52, interiorAttenuation: 0.5, radiantFraction: 1 });
    expect(g.beam).toBeCloseTo(120, 9);
    expect(g.sky).toBeCloseTo(52, 9);
    expect(g.ground).toBeCloseTo(26, 9);
    expect(g.convective).toBe(0);
  });

  test('inputs out of range are refused by name', () => {
    const ok = { glassArea: 2, beam: 800, sky: 100, ground: 50, sunlitFraction: 1, shgcBeam: 0.6, shgcDiffuse: 0.52, interiorAttenuation: 1, radiantFraction: 0.7 };
    expect(() => windowGainParts({ ...ok, sunlitFraction: 1.2 })).toThrow(/^sunlitFraction = 1\.2/);
    expect(() => windowGainParts({ ...ok, beam: -1 })).toThrow(/^beam = -1/);
    expect(() => windowGainParts({ ...ok, shgcDiffuse: Number.NaN })).toThrow(/^shgcDiffuse = NaN/);
  });
});

describe('gain of a window at one instant', () => {
  const noon = civilToSerial(2026, 7, 21, 12, 30);

  test('a bare window facing the sun gains SHGC × glass area × DNI (hand computation)', () => {
    // Point the window at the sun: tilt = zenith, azimuth = sun azimuth, so the incidence is 0.
    const spec = baseSpec({ frameFraction: 0, glazing: { shgc: 0.5, panes: 2 }, groundAlbedo: 0 });
    const sun = sunPosition(serialToUtcMs(noon, spec.site.utcOffset), spec.site.latitude, spec.site.longitude, { elevation: spec.site.elevation });
    const facing = { ...spec, surfaceTilt: sun.zenith, surfaceAzimuth: sun.azimuth, timeConvention: 'instant' as const };
    const h = windowGainAt(facing, noon, { dni: 800, dhi: 0 });
    expect(h.incidence).toBeLessThan(1e-4);
    expect(h.glassArea).toBeCloseTo(3, 12); // 2 m × 1.5 m × (1 − 0)
    expect(h.gain.total).toBeCloseTo(1200, 3); // 0.5 × 3 m² × 800 W/m² = 1200 W
    expect(h.gain.sky).toBe(0);
    expect(h.gain.ground).toBe(0);
  });

  test('the parts of the gain add up to the total and the split to the gain', () => {
    const h = windowGainAt(shadedSpec({ glazing: { shgc: 0.6, panes: 2, radiantFraction: 0.6 } }), noon);
    expect(h.gain.total).toBeGreaterThan(0);
    expect(h.gain.beam + h.gain.sky + h.gain.ground).toBeCloseTo(h.gain.total, 9);
    expect(h.gain.radiant + h.gain.convective).toBeCloseTo(h.gain.total, 9);
    expect(h.gain.radiant).toBeCloseTo(0.6 * h.gain.total, 9);
    // every part is the equation applied to the reported intermediate values
    const k = h.glassArea * h.interiorAttenuation;
    expect(h.gain.beam).toBeCloseTo(k * h.beam * h.sunlitFraction * h.shgcBeam, 9);
    expect(h.gain.sky).toBeCloseTo(k * h.sky * h.shgcDiffuse, 9);
    expect(h.gain.ground).toBeCloseTo(k * h.ground * h.shgcDiffuse, 9);
  });

  test('an overhang never increases the gain', () => {
    for (let hour = 6; hour <= 18; hour++) {
      const t = civilToSerial(2026, 6, 21, hour, 30);
      const bare = windowGainAt(baseSpec(), t).gain.total;
      const shaded = windowGainAt(baseSpec({ shading: { overhang: { projection: 1, gap: 0.1, extensionLeft: 0.5, extensionRight: 0.5 } } }), t).gain.total;
      expect(shaded).toBeLessThanOrEqual(bare + 1e-9);
    }
  });

  test('at night there is no beam and, under clear sky, no gain at all', () => {
    const h = windowGainAt(baseSpec(), civilToSerial(2026, 1, 15, 2, 30));
    expect(h.sunAltitude).toBeLessThan(0);
    expect(h.sunlitFraction).toBe(0);
    expect(h.gain.total).toBe(0);
  });

  test('with the sun behind the wall the beam part is 0 and diffuse remains', () => {
    // A north-facing window at 40° N at noon in July: the sun is in the south.
    const h = windowGainAt(baseSpec({ surfaceAzimuth: 0 }), noon);
    expect(h.incidence).toBeGreaterThan(90);
    expect(h.sunlitFraction).toBe(0);
    expect(h.shgcBeam).toBe(0);
    expect(h.gain.beam).toBe(0);
    expect(h.gain.sky).toBeGreaterThan(0);
  });

  test('a measured series supplies the hour containing the date-time; NaN marks it missing', () => {
    const dni = new Float64Array(8760).fill(0);
    const dhi = new Float64Array(8760).fill(0);
    const row = (31 + 28 + 31 + 30 + 31 + 30 + 20) * 24 + 12; // 21 July, 12:00–13:00
    dni[row] = 700;
    dhi[row] = 110;
    const spec = baseSpec({ weather: { kind: 'measured', dni, dhi } });
    const h = windowGainAt(spec, noon);
    expect(h.dni).toBe(700);
    expect(h.dhi).toBe(110);
    expect(h.missing).toBe(false);
    dni[row] = Number.NaN;
    const m = windowGainAt(spec, noon);
    expect(m.missing).toBe(true);
    expect(m.gain.total).toBe(0);
    expect(() => windowGainAt(spec, civilToSerial(2027, 7, 21, 12, 30))).toThrow(/^dateTime = .* must fall in 2026/);
  });
});

describe('window description validation', () => {
  function refusal(spec: unknown): string {
    try {
      validateWindowSpec(spec as never);
    } catch (err) {
      expect(err).toBeInstanceOf(SunpaneError);
      return (err as SunpaneError).argument;
    }
    throw new Error('not refused');
  }

  test('each bad field is named by its path', () => {
    const s = baseSpec();
    expect(refusal({ ...s, glazing: { ...s.glazing, shgc: 1.3 } })).toBe('glazing.shgc');
    expect(refusal({ ...s, glazing: { ...s.glazing, panes: 2.5 } })).toBe('glazing.panes');
    expect(refusal({ ...s, site: { ...s.site, latitude: 91 } })).toBe('site.latitude');
    expect(refusal({ ...s, width: 0 })).toBe('width');
    expect(refusal({ ...s, frameFraction: 1 })).toBe('frameFraction');
    expect(refusal({ ...s, groundAlbedo: -0.1 })).toBe('groundAlbedo');
    expect(refusal({ ...s, skyModel: 'cloudy' })).toBe('skyModel');
    expect(refusal({ ...s, shading: { overhang: { projection: -1, gap: 0, extensionLeft: 0, extensionRight: 0 } } })).toBe('shading.overhang.projection');
    expect(refusal({ ...s, shading: { overhang: { projection: 1, gap: 0, extensionLeft: -1.5, extensionRight: -1 } } })).toBe('shading.overhang.extensionLeft'); // the extension that cuts more
    expect(refusal({ ...s, shading: { leftFin: { projection: 1, gap: Number.NaN, extensionAbove: 0, extensionBelow: 0 } } })).toBe('shading.leftFin.gap');
    expect(refusal({ ...s, shading: { skyline: [10, 95] } })).toBe('shading.skyline'); // message: value 2 is 95
    expect(refusal({ ...s, surfaceTilt: 30, shading: { revealDepth: 0.1 } })).toBe('surfaceTilt');
    expect(refusal({ ...s, weather: { kind: 'ashraeClearSky', tauB: [0.4, 0.5], tauD: [2.3] } })).toBe('weather.tauB');
    expect(refusal({ ...s, weather: { kind: 'ashraeClearSky', tauB: new Array(12).fill(0.4).map((v, i) => (i === 3 ? 0 : v)), tauD: new Array(12).fill(2) } })).toBe('weather.tauB[3]');
    expect(refusal({ ...s, weather: { kind: 'measured', dni: new Float64Array(8000), dhi: new Float64Array(8760) } })).toBe('weather.dni');
    expect(refusal({ ...s, weather: { kind: 'measured', dni: new Float64Array(8784), dhi: new Float64Array(8760) } })).toBe('weather.dhi');
    const dhi = new Float64Array(8760);
    dhi[17] = -5;
    expect(refusal({ ...s, weather: { kind: 'measured', dni: new Float64Array(8760), dhi } })).toBe('weather.dhi[17]');
    expect(refusal({ ...s, weather: { kind: 'globalHorizontal', ghi: [1, 2, 3] } })).toBe('weather.ghi');
    expect(refusal({ ...s, weather: { kind: 'forecast' } })).toBe('weather.kind');
    expect(refusal({ ...s, year: 2026.5 })).toBe('year');
  });

  test('messages say the value and the allowed range', () => {
    const s = baseSpec();
    expect(() => validateWindowSpec({ ...s, glazing: { ...s.glazing, shgc: 1.3 } })).toThrow('glazing.shgc = 1.3 is not allowed: must be a number from 0 to 1');
    expect(() => validateWindowSpec({ ...s, weather: { kind: 'measured', dni: new Float64Array(100), dhi: new Float64Array(8760) } })).toThrow(/^weather\.dni = "100 rows" is not allowed: must hold one value per hour of the year: 8760 for 2026/);
  });

  test('a missing hour (NaN) in a measured series is accepted', () => {
    const dni = new Float64Array(8760);
    dni[5] = Number.NaN;
    expect(() => validateWindowSpec(baseSpec({ weather: { kind: 'measured', dni, dhi: new Float64Array(8760) } }))).not.toThrow();
  });
});
