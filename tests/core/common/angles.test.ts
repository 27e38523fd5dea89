import { acosClamped, asinClamped, wrap180, wrap360 } from '../../../src/core/common/angles';

describe('the angle helpers of the core', () => {
  test('clamped inverse trig stays finite just outside ±1 (rounding), and equals Math.asin / Math.acos inside', () => {
    expect(acosClamped(1.0000000002)).toBe(0);
    expect(acosClamped(-1.0000000002)).toBe(Math.PI);
    expect(asinClamped(1.0000000002)).toBe(Math.PI / 2);
    expect(asinClamped(-1.0000000002)).toBe(-Math.PI / 2);
    for (const x of [-1, -0.5, 0, 0.3, 1]) {
      expect(acosClamped(x)).toBe(Math.acos(x));
      expect(asinClamped(x)).toBe(Math.asin(x));
    }
  });

  test('wrap360 gives [0, 360) and wrap180 gives (−180, 180] at the edges and for large angles', () => {
    const cases: [number, number, number][] = [
      // angle, wrap360, wrap180
      [0, 0, 0],
      [360, 0, 0],
      [-360, 0, 0],
      [180, 180, 180],
      [-180, 180, 180],
      [190, 190, -170],
      [-190, 170, 170],
      [725, 5, 5],
      [-1e-14, 0, 0], // 360 − 1e-14 rounds to 360 itself, so the wrap gives 0 (the same direction)
    ];
    for (const [a, w360, w180] of cases) {
      expect(wrap360(a)).toBeCloseTo(w360, 12);
      expect(wrap180(a)).toBeCloseTo(w180, 12);
      expect(wrap360(a)).toBeGreaterThanOrEqual(0);
      expect(wrap360(a)).toBeLessThan(360);
    }
  });
});
