/**
 * The gain explanation. Each step's value is re-derived here by hand from the earlier steps with
 * the gain equation (Q = A · IAC · [E_beam · F_sunlit · SHGC(θ) + (E_sky + E_ground) · SHGC_d],
 * ASHRAE Handbook—Fundamentals (2013) ch. 15, from memory) and the glass-area rule
 * A = W · H · (1 − frame fraction), so a reader can follow the same arithmetic on paper.
 */
import { windowGainAt } from '../../../src/core/gain/windowGain';
import { gainSteps } from '../../../src/core/gain/gainSteps';
import { civilToSerial } from '../../../src/core/time/calendar';
import { shadedSpec } from './gainFixtures';

describe('gain explanation', () => {
  const spec = shadedSpec({ glazing: { shgc: 0.6, panes: 2, interiorAttenuation: 0.8, radiantFraction: 0.7 } });
  const t = civilToSerial(2026, 9, 21, 15, 30);
  // Worked out before each test, not while the tests are collected, so that mutation testing can
  // tell which tests run which code (work done at collection time counts for no test).
  let steps: ReturnType<typeof gainSteps>;
  beforeEach(() => {
    steps = gainSteps(spec, t);
  });
  const v = (q: string) => {
    const s = steps.find((x) => x.quantity === q);
    if (!s) throw new Error(`no step ${q}`);
    return s.value;
  };

  test('steps are numbered in order from the sun to the watts', () => {
    expect(steps.map((s) => s.step)).toEqual(steps.map((_, i) => i + 1));
    const order = ['sun altitude', 'incidence angle', 'sunlit fraction', 'direct normal irradiance', 'beam on the window', 'SHGC at the incidence angle', 'glass area', 'window solar gain'];
    const at = order.map((q) => steps.findIndex((s) => s.quantity === q));
    expect(at.every((k) => k >= 0)).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    for (const s of steps) {
      expect(Number.isFinite(s.value)).toBe(true);
      expect(s.method.length).toBeGreaterThan(0);
    }
  });

  test('the watts follow from the listed values by hand', () => {
    // glass area = 2 × 1.5 × (1 − 0.1) = 2.7 m²
    expect(v('glass area')).toBeCloseTo(2.7, 12);
    const k = v('glass area') * v('interior attenuation, beam');
    expect(v('interior attenuation, beam')).toBe(0.8);
    expect(v('interior attenuation, diffuse')).toBe(0.8);
    expect(v('area for the SHGC')).toBe(v('glass area'));
    expect(v('beam gain')).toBeCloseTo(k * v('beam on the window') * v('sunlit fraction') * v('SHGC at the incidence angle'), 9);
    expect(v('sky-diffuse gain')).toBeCloseTo(k * v('sky diffuse on the window') * v('diffuse SHGC'), 9);
    expect(v('ground-reflected gain')).toBeCloseTo(k * v('ground-reflected on the window') * v('diffuse SHGC'), 9);
    expect(v('window solar gain')).toBeCloseTo(v('beam gain') + v('sky-diffuse gain') + v('ground-reflected gain'), 9);
    expect(v('radiant part')).toBeCloseTo(0.7 * v('window solar gain'), 9);
    expect(v('beam on the window')).toBeCloseTo(v('direct normal irradiance') * Math.cos((v('incidence angle') * Math.PI) / 180), 6);
  });

  test('the explanation and the one-hour gain are the same calculation', () => {
    expect(v('window solar gain')).toBe(windowGainAt(spec, t).gain.total);
    expect(v('window solar gain')).toBeGreaterThan(0);
  });
});
