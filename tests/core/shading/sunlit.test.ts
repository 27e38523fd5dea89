/**
 * Sunlit fraction (src/core/shading/sunlit.ts): closed forms, invariants, edge cases and bad input.
 *
 * Closed forms — source: the shadow of a long horizontal projection on a wall has depth
 * P · tan Ω (Ω the profile angle, tan Ω = tan β / cos γ) and the shadow of a tall vertical
 * projection has width P · |tan γ| (γ the wall-solar azimuth); ASHRAE Handbook—Fundamentals,
 * chapter "Fenestration", exterior shading section — from memory (no page or equation number
 * quoted). For an overhang much wider than the window (extensions far beyond the sideways shift
 * P·|tan γ|) and a fin much taller than it, the finite devices reproduce those forms exactly, so the
 * tolerance is rounding only (1e-12).
 *
 * The general case is checked against three.js ray casting in tests/reference/raycast-three.test.ts.
 */
import fc from 'fast-check';
import { pointSunlit, requireVerticalForShading, shadowDepth, shadowWidth, sunlitFraction } from '../../../src/core/shading/sunlit';
import type { Fin, Overhang, Shading } from '../../../src/core/shading/types';
import { expectArgumentError } from '../../support/expectError';

const RAD = Math.PI / 180;
const EXACT = 1e-12;
const WIDE = 1e4;

function profileTan(sunAltitude: number, gamma: number): number {
  return Math.tan(sunAltitude * RAD) / Math.cos(gamma * RAD);
}

function clip01(x: number): number {
  return Math.min(1, Math.max(0, x));
}


describe('closed forms for long overhangs and tall fins (ASHRAE Fundamentals, Fenestration — from memory)', () => {
  test('a long overhang leaves 1 − (P·tan Ω − G)/H of the glass sunlit, clipped to 0…1', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 3, noNaN: true }), // H
        fc.double({ min: 0, max: 2, noNaN: true }), // P
        fc.double({ min: 0, max: 1, noNaN: true }), // G
        fc.double({ min: 1, max: 85, noNaN: true }), // altitude
        fc.double({ min: -80, max: 80, noNaN: true }), // γ
        fc.double({ min: 0, max: 359, noNaN: true }), // surface azimuth
        (H, P, G, alt, gamma, surf) => {
          const oh: Overhang = { projection: P, gap: G, extensionLeft: WIDE, extensionRight: WIDE };
          const f = sunlitFraction({ width: 1.5, height: H }, { overhang: oh }, alt, surf + gamma, surf);
          expect(Math.abs(f - clip01(1 - (P * profileTan(alt, gamma) - G) / H))).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 300, seed: 1 },
    );
  });

  test('a tall fin on the sun side leaves 1 − (P·|tan γ| − gap)/W sunlit; on the other side it casts nothing', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 3, noNaN: true }), // W
        fc.double({ min: 0, max: 2, noNaN: true }), // P
        fc.double({ min: 0, max: 1, noNaN: true }), // gap
        fc.double({ min: 1, max: 85, noNaN: true }), // altitude
        fc.double({ min: 0.5, max: 80, noNaN: true }), // |γ|
        fc.double({ min: 0, max: 359, noNaN: true }),
        (W, P, gap, alt, g, surf) => {
          const fin: Fin = { projection: P, gap, extensionAbove: WIDE, extensionBelow: WIDE };
          const expected = clip01(1 - (P * Math.tan(g * RAD) - gap) / W);
          // Sun azimuth = surface azimuth + g (g > 0): the sun is to the LEFT seen from outside, so the left fin shades.
          const leftSunLeft = sunlitFraction({ width: W, height: 1 }, { leftFin: fin }, alt, surf + g, surf);
          const rightSunRight = sunlitFraction({ width: W, height: 1 }, { rightFin: fin }, alt, surf - g, surf);
          const leftSunRight = sunlitFraction({ width: W, height: 1 }, { leftFin: fin }, alt, surf - g, surf);
          expect(Math.abs(leftSunLeft - expected)).toBeLessThan(1e-9);
          expect(Math.abs(rightSunRight - expected)).toBeLessThan(1e-9);
          expect(leftSunRight).toBe(1);
        },
      ),
      { numRuns: 300, seed: 2 },
    );
  });

  test('worked numbers: P = 1, G = 0.2, H = 1.5, sun due south at 45° on a south wall → 1 − 0.8/1.5', () => {
    const oh: Overhang = { projection: 1, gap: 0.2, extensionLeft: WIDE, extensionRight: WIDE };
    expect(Math.abs(sunlitFraction({ width: 2, height: 1.5 }, { overhang: oh }, 45, 180, 180) - (1 - 0.8 / 1.5))).toBeLessThan(EXACT);
  });

  test('on a south wall (northern hemisphere view) the sun in the south-east is on the right seen from outside', () => {
    const fin: Fin = { projection: 1, gap: 0.5, extensionAbove: WIDE, extensionBelow: WIDE };
    // Sun at azimuth 135°: γ = −45°, tan = 1 → shadow 1 − 0.5 = 0.5 of W = 2 from the RIGHT fin.
    expect(Math.abs(sunlitFraction({ width: 2, height: 1.5 }, { rightFin: fin }, 30, 135, 180) - 0.75)).toBeLessThan(EXACT);
    expect(sunlitFraction({ width: 2, height: 1.5 }, { leftFin: fin }, 30, 135, 180)).toBe(1);
  });

  test('a reveal of depth R shades R·tan Ω at the head and R·|tan γ| at one jamb (area of the overlap once)', () => {
    const W = 2;
    const H = 1.5;
    const R = 0.2;
    const alt = 40;
    const gamma = 25;
    const dx = R * Math.tan(gamma * RAD);
    const dy = R * profileTan(alt, gamma);
    const expected = ((W - dx) * (H - dy)) / (W * H);
    expect(Math.abs(sunlitFraction({ width: W, height: H }, { revealDepth: R }, alt, 200 + gamma, 200) - expected)).toBeLessThan(EXACT);
  });

  test('shadow depth and width of the worksheet helpers are P·tan Ω and P·|tan γ|', () => {
    expect(shadowDepth(1.2, 50, 210, 180)).toBeCloseTo(1.2 * profileTan(50, 30), 12);
    expect(shadowWidth(1.2, 50, 210, 180)).toBeCloseTo(1.2 * Math.tan(30 * RAD), 12);
    expect(shadowWidth(1.2, 50, 150, 180)).toBeCloseTo(1.2 * Math.tan(30 * RAD), 12);
  });
});

describe('no sun on the glass', () => {
  const shading: Shading = {};
  test.each([
    ['at the horizon', 0, 180],
    ['below the horizon', -5, 180],
    ['exactly in the wall plane', 30, 90],
    ['behind the wall', 30, 0],
    ['far behind the wall', 30, 359],
  ])('the sunlit fraction is 0 with the sun %s', (_what, alt, az) => {
    expect(sunlitFraction({ width: 1, height: 1 }, shading, alt, az, 180)).toBe(0);
  });

  test('shadow depth and width have no value (null) when the sun is behind the wall or down', () => {
    expect(shadowDepth(1, 30, 0, 180)).toBeNull();
    expect(shadowWidth(1, -1, 180, 180)).toBeNull();
  });

  test('a skyline above the sun blocks the beam; the same sun just above it does not', () => {
    const skyline = [0, 0, 0, 0, 0, 0, 0, 0, 30, 0, 0, 0]; // 30° from 240° to 270°
    expect(sunlitFraction({ width: 1, height: 1 }, { skyline }, 29.9, 250, 220)).toBe(0);
    expect(sunlitFraction({ width: 1, height: 1 }, { skyline }, 30.1, 250, 220)).toBe(1);
    expect(sunlitFraction({ width: 1, height: 1 }, { skyline }, 10, 270, 220)).toBe(1);
  });

  test('an unshaded window in front of the sun is fully sunlit', () => {
    expect(sunlitFraction({ width: 1, height: 2 }, {}, 10, 100, 180)).toBe(1);
  });

  test('a device of zero projection casts no shadow', () => {
    const shading0: Shading = {
      overhang: { projection: 0, gap: 0, extensionLeft: 0, extensionRight: 0 },
      leftFin: { projection: 0, gap: 0, extensionAbove: 0, extensionBelow: 0 },
      rightFin: { projection: 0, gap: 0, extensionAbove: 0, extensionBelow: 0 },
      revealDepth: 0,
    };
    expect(sunlitFraction({ width: 1, height: 1 }, shading0, 60, 150, 180)).toBe(1);
    expect(pointSunlit({ width: 1, height: 1 }, shading0, 0.5, 1, 60, 150, 180)).toBe(1);
  });
});

// ---- invariants (fast-check) ----

const windowArb = fc.record({ width: fc.double({ min: 0.2, max: 3, noNaN: true }), height: fc.double({ min: 0.2, max: 3, noNaN: true }) });
const finArb = (height: number) =>
  fc.record({
    projection: fc.double({ min: 0, max: 1.5, noNaN: true }),
    gap: fc.double({ min: 0, max: 0.5, noNaN: true }),
    extensionAbove: fc.double({ min: -0.45 * height, max: 1, noNaN: true }),
    extensionBelow: fc.double({ min: -0.45 * height, max: 1, noNaN: true }),
  });
const overhangArb = (width: number) =>
  fc.record({
    projection: fc.double({ min: 0, max: 1.5, noNaN: true }),
    gap: fc.double({ min: 0, max: 0.5, noNaN: true }),
    extensionLeft: fc.double({ min: -0.45 * width, max: 1, noNaN: true }),
    extensionRight: fc.double({ min: -0.45 * width, max: 1, noNaN: true }),
  });
const setupArb = windowArb.chain((w) =>
  fc.record({
    window: fc.constant(w),
    overhang: overhangArb(w.width),
    leftFin: finArb(w.height),
    rightFin: finArb(w.height),
    revealDepth: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 0.4, noNaN: true })),
    sunAltitude: fc.double({ min: 0.5, max: 85, noNaN: true }),
    gamma: fc.double({ min: -89, max: 89, noNaN: true }),
    surfaceAzimuth: fc.double({ min: 0, max: 360, noNaN: true }),
  }),
);

describe('invariants', () => {
  test('adding an overhang or a fin never increases the sunlit fraction (reveal held fixed)', () => {
    fc.assert(
      fc.property(setupArb, fc.subarray(['overhang', 'leftFin', 'rightFin'] as const), fc.constantFrom('overhang', 'leftFin', 'rightFin'), (s, base, extra) => {
        const make = (parts: readonly string[]): Shading => {
          const sh: Shading = { revealDepth: s.revealDepth };
          if (parts.includes('overhang')) sh.overhang = s.overhang;
          if (parts.includes('leftFin')) sh.leftFin = s.leftFin;
          if (parts.includes('rightFin')) sh.rightFin = s.rightFin;
          return sh;
        };
        const az = s.surfaceAzimuth + s.gamma;
        const before = sunlitFraction(s.window, make(base), s.sunAltitude, az, s.surfaceAzimuth);
        const after = sunlitFraction(s.window, make([...base, extra]), s.sunAltitude, az, s.surfaceAzimuth);
        expect(after).toBeLessThanOrEqual(before + 1e-12);
      }),
      { numRuns: 400, seed: 3 },
    );
  });

  test('a deeper device never lets more sun through', () => {
    fc.assert(
      fc.property(setupArb, fc.double({ min: 0, max: 1, noNaN: true }), (s, more) => {
        const az = s.surfaceAzimuth + s.gamma;
        const base: Shading = { overhang: s.overhang, leftFin: s.leftFin, rightFin: s.rightFin, revealDepth: s.revealDepth };
        const deeper: Shading = { ...base, overhang: { ...s.overhang, projection: s.overhang.projection + more }, leftFin: { ...s.leftFin, projection: s.leftFin.projection + more } };
        expect(sunlitFraction(s.window, deeper, s.sunAltitude, az, s.surfaceAzimuth)).toBeLessThanOrEqual(sunlitFraction(s.window, base, s.sunAltitude, az, s.surfaceAzimuth) + 1e-12);
      }),
      { numRuns: 300, seed: 4 },
    );
  });

  test('mirror symmetry: swapping left and right devices and the sun side gives the same fraction', () => {
    fc.assert(
      fc.property(setupArb, (s) => {
        const shading: Shading = { overhang: s.overhang, leftFin: s.leftFin, rightFin: s.rightFin, revealDepth: s.revealDepth };
        const mirrored: Shading = {
          overhang: { ...s.overhang, extensionLeft: s.overhang.extensionRight, extensionRight: s.overhang.extensionLeft },
          leftFin: s.rightFin,
          rightFin: s.leftFin,
          revealDepth: s.revealDepth,
        };
        const a = sunlitFraction(s.window, shading, s.sunAltitude, s.surfaceAzimuth + s.gamma, s.surfaceAzimuth);
        const b = sunlitFraction(s.window, mirrored, s.sunAltitude, s.surfaceAzimuth - s.gamma, s.surfaceAzimuth);
        expect(Math.abs(a - b)).toBeLessThan(1e-12);
      }),
      { numRuns: 300, seed: 5 },
    );
  });

  test('the union is never more shaded than the sum of single shadows nor less than the largest one', () => {
    fc.assert(
      fc.property(setupArb, (s) => {
        const az = s.surfaceAzimuth + s.gamma;
        const shadeOf = (sh: Shading) => 1 - sunlitFraction(s.window, sh, s.sunAltitude, az, s.surfaceAzimuth);
        const singles = [shadeOf({ overhang: s.overhang }), shadeOf({ leftFin: s.leftFin }), shadeOf({ rightFin: s.rightFin })];
        const all = shadeOf({ overhang: s.overhang, leftFin: s.leftFin, rightFin: s.rightFin });
        expect(all).toBeLessThanOrEqual(singles[0] + singles[1] + singles[2] + 1e-12);
        expect(all).toBeGreaterThanOrEqual(Math.max(...singles) - 1e-12);
      }),
      { numRuns: 400, seed: 6 },
    );
  });

  test('the fraction does not depend on the wall azimuth, only on the sun relative to the wall', () => {
    fc.assert(
      fc.property(setupArb, fc.double({ min: -720, max: 720, noNaN: true }), (s, turn) => {
        const shading: Shading = { overhang: s.overhang, leftFin: s.leftFin, rightFin: s.rightFin, revealDepth: s.revealDepth };
        const a = sunlitFraction(s.window, shading, s.sunAltitude, s.surfaceAzimuth + s.gamma, s.surfaceAzimuth);
        const b = sunlitFraction(s.window, shading, s.sunAltitude, s.surfaceAzimuth + s.gamma + turn, s.surfaceAzimuth + turn);
        expect(Math.abs(a - b)).toBeLessThan(1e-9);
      }),
      { numRuns: 200, seed: 7 },
    );
  });

  test('scaling every length by the same factor changes nothing (only ratios matter)', () => {
    fc.assert(
      fc.property(setupArb, fc.double({ min: 0.01, max: 100, noNaN: true }), (s, k) => {
        const scaleFin = (f: Fin): Fin => ({ projection: f.projection * k, gap: f.gap * k, extensionAbove: f.extensionAbove * k, extensionBelow: f.extensionBelow * k });
        const shading: Shading = { overhang: s.overhang, leftFin: s.leftFin, rightFin: s.rightFin, revealDepth: s.revealDepth };
        const scaled: Shading = {
          overhang: { projection: s.overhang.projection * k, gap: s.overhang.gap * k, extensionLeft: s.overhang.extensionLeft * k, extensionRight: s.overhang.extensionRight * k },
          leftFin: scaleFin(s.leftFin),
          rightFin: scaleFin(s.rightFin),
          revealDepth: s.revealDepth * k,
        };
        const az = s.surfaceAzimuth + s.gamma;
        const a = sunlitFraction(s.window, shading, s.sunAltitude, az, s.surfaceAzimuth);
        const b = sunlitFraction({ width: s.window.width * k, height: s.window.height * k }, scaled, s.sunAltitude, az, s.surfaceAzimuth);
        expect(Math.abs(a - b)).toBeLessThan(1e-9);
      }),
      { numRuns: 200, seed: 8 },
    );
  });

  test('results are always finite and within 0…1, for any valid input including extreme suns', () => {
    fc.assert(
      fc.property(setupArb, fc.double({ min: -90, max: 90, noNaN: true }), fc.double({ min: -1e3, max: 1e3, noNaN: true }), (s, alt, az) => {
        const f = sunlitFraction(s.window, { overhang: s.overhang, leftFin: s.leftFin, rightFin: s.rightFin, revealDepth: s.revealDepth }, alt, az, s.surfaceAzimuth);
        expect(Number.isFinite(f)).toBe(true);
        expect(f).toBeGreaterThanOrEqual(0);
        expect(f).toBeLessThanOrEqual(1);
      }),
      { numRuns: 400, seed: 9 },
    );
  });

  test('the fraction of the whole window equals the share of lit points on a fine grid (same geometry, point test)', () => {
    const w = { width: 1.6, height: 1.2 };
    const shading: Shading = {
      overhang: { projection: 0.6, gap: 0.1, extensionLeft: 0.2, extensionRight: -0.3 },
      leftFin: { projection: 0.4, gap: 0.05, extensionAbove: 0.1, extensionBelow: -0.2 },
      rightFin: { projection: 0.5, gap: 0, extensionAbove: 0, extensionBelow: 0 },
      revealDepth: 0.1,
    };
    const n = 400;
    let lit = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) lit += pointSunlit(w, shading, ((i + 0.5) / n) * w.width, ((j + 0.5) / n) * w.height, 35, 160, 180);
    // Midpoint grid of 400 × 400: the boundary (≤ 16 segments × ≤ 799 cells) bounds the error by 16·799/160000 ≈ 0.08;
    // in practice it is far smaller, so hold it to 0.01.
    expect(Math.abs(lit / (n * n) - sunlitFraction(w, shading, 35, 160, 180))).toBeLessThan(0.01);
  });
});

describe('continuity as the sun approaches the wall plane', () => {
  const w = { width: 1.2, height: 1.5 };
  const overhangOnly: Shading = { overhang: { projection: 0.5, gap: 0.1, extensionLeft: 0.1, extensionRight: 0.1 } };
  test('with an overhang the fraction converges (differences shrink as γ → 90°) and stays finite', () => {
    const eps = [1e-1, 1e-2, 1e-3, 1e-4, 1e-5, 1e-6, 1e-7];
    const f = eps.map((e) => sunlitFraction(w, overhangOnly, 30, 180 + 90 - e, 180));
    for (const v of f) expect(Number.isFinite(v)).toBe(true);
    for (let i = 2; i < f.length; i++) expect(Math.abs(f[i] - f[i - 1])).toBeLessThanOrEqual(Math.abs(f[i - 1] - f[i - 2]) + 1e-9);
    expect(Math.abs(f[f.length - 1] - f[f.length - 2])).toBeLessThan(1e-5);
  });

  test('a tall fin on the sun side or a reveal shades the whole glass in the limit, meeting the 0 behind the wall', () => {
    // The shadow of the fin's top slides down at tan β / sin γ ≈ tan 30° across the glass, so a fin
    // 10 above the head covers the whole 1.2 × 1.5 glass in the limit.
    const fin: Fin = { projection: 0.3, gap: 0, extensionAbove: 10, extensionBelow: 0 };
    for (const e of [1e-4, 1e-7, 1e-10]) {
      expect(sunlitFraction(w, { leftFin: fin }, 30, 180 + 90 - e, 180)).toBeLessThan(1e-3);
      expect(sunlitFraction(w, { revealDepth: 0.05 }, 30, 180 + 90 - e, 180)).toBe(0);
    }
    expect(sunlitFraction(w, { leftFin: fin }, 30, 270.0000001, 180)).toBe(0);
  });

  test('the sun approaching the zenith gives finite values', () => {
    for (const alt of [89.9, 89.999999, 90]) {
      const f = sunlitFraction(w, { ...overhangOnly, revealDepth: 0.1 }, alt, 170, 180);
      expect(Number.isFinite(f)).toBe(true);
      expect(f).toBeLessThanOrEqual(1e-3);
    }
  });
});

describe('bad input names the argument', () => {
  const ok: Shading = {};
  const w = { width: 1, height: 1 };
  const oh = (o: Partial<Overhang>): Shading => ({ overhang: { projection: 1, gap: 0, extensionLeft: 0, extensionRight: 0, ...o } });
  const lf = (f: Partial<Fin>): Shading => ({ leftFin: { projection: 1, gap: 0, extensionAbove: 0, extensionBelow: 0, ...f } });
  const rf = (f: Partial<Fin>): Shading => ({ rightFin: { projection: 1, gap: 0, extensionAbove: 0, extensionBelow: 0, ...f } });
  test.each<[string, () => unknown]>([
    ['width', () => sunlitFraction({ width: 0, height: 1 }, ok, 30, 180, 180)],
    ['width', () => sunlitFraction({ width: -1, height: 1 }, ok, 30, 180, 180)],
    ['height', () => sunlitFraction({ width: 1, height: Number.NaN }, ok, 30, 180, 180)],
    ['height', () => sunlitFraction({ width: 1, height: Infinity }, ok, 30, 180, 180)],
    ['overhangProjection', () => sunlitFraction(w, oh({ projection: -0.1 }), 30, 180, 180)],
    ['overhangGap', () => sunlitFraction(w, oh({ gap: -0.1 }), 30, 180, 180)],
    ['overhangExtensionLeft', () => sunlitFraction(w, oh({ extensionLeft: Number.NaN }), 30, 180, 180)],
    ['overhangExtensionLeft', () => sunlitFraction(w, oh({ extensionLeft: -0.8, extensionRight: -0.3 }), 30, 180, 180)],
    ['overhangExtensionRight', () => sunlitFraction(w, oh({ extensionLeft: 0.1, extensionRight: -1.2 }), 30, 180, 180)],
    ['leftFinProjection', () => sunlitFraction(w, lf({ projection: -1 }), 30, 180, 180)],
    ['leftFinGap', () => sunlitFraction(w, lf({ gap: -1 }), 30, 180, 180)],
    ['leftFinExtensionBelow', () => sunlitFraction(w, lf({ extensionAbove: 0, extensionBelow: -1.5 }), 30, 180, 180)],
    ['rightFinExtensionAbove', () => sunlitFraction(w, rf({ extensionAbove: Infinity }), 30, 180, 180)],
    ['rightFinProjection', () => sunlitFraction(w, rf({ projection: Number.NaN }), 30, 180, 180)],
    ['revealDepth', () => sunlitFraction(w, { revealDepth: -0.01 }, 30, 180, 180)],
    ['skyline', () => sunlitFraction(w, { skyline: [] }, 30, 180, 180)],
    ['skyline', () => sunlitFraction(w, { skyline: [10, 91] }, 30, 180, 180)],
    ['skyline', () => sunlitFraction(w, { skyline: [10, -1] }, 30, 180, 180)],
    ['sunAltitude', () => sunlitFraction(w, ok, 91, 180, 180)],
    ['sunAzimuth', () => sunlitFraction(w, ok, 30, Number.NaN, 180)],
    ['surfaceAzimuth', () => sunlitFraction(w, ok, 30, 180, Infinity)],
    ['x', () => pointSunlit(w, ok, 1.1, 0.5, 30, 180, 180)],
    ['y', () => pointSunlit(w, ok, 0.5, -0.1, 30, 180, 180)],
    ['projection', () => shadowDepth(-1, 30, 180, 180)],
    ['surfaceTilt', () => requireVerticalForShading(45, oh({}))],
  ])('%s', (argument, call) => expectArgumentError(call, argument));

  test('an overhang exactly as narrow as allowed (total width 0) is valid and casts no shadow', () => {
    expect(sunlitFraction(w, oh({ extensionLeft: -0.5, extensionRight: -0.5 }), 30, 180, 180)).toBe(1);
  });

  test('the error says what is allowed', () => {
    expect(() => sunlitFraction(w, oh({ extensionLeft: -0.8, extensionRight: -0.3 }), 30, 180, 180)).toThrow(/must be at least -0.7/);
  });

  test('a tilted window without devices is fine; a vertical one with devices is fine', () => {
    expect(() => requireVerticalForShading(30, {})).not.toThrow();
    expect(() => requireVerticalForShading(90, oh({}))).not.toThrow();
  });
});
