import { atan2Fast } from '../../../src/core/common/angles';

describe('the fast atan2 of the hourly loops', () => {
  test('atan2Fast matches Math.atan2 within a few ulps (2e-15 rad) around the circle and at every octant edge', () => {
    let worst = 0;
    for (let k = 0; k < 7200; k++) {
      const a = (k / 7200) * 2 * Math.PI - Math.PI + 1e-7;
      for (const r of [1e-6, 1, 2.3e4]) {
        const [y, x] = [r * Math.sin(a), r * Math.cos(a)];
        worst = Math.max(worst, Math.abs(atan2Fast(y, x) - Math.atan2(y, x)));
      }
    }
    for (const [y, x] of [[1, 1], [-1, 1], [1, -1], [-1, -1], [0, 1], [1, 0], [-1, 0], [0.2679491924311227, 1]]) {
      worst = Math.max(worst, Math.abs(atan2Fast(y, x) - Math.atan2(y, x)));
    }
    expect(worst).toBeLessThan(2e-15);
    expect(atan2Fast(0, 0)).toBe(0);
  });
});
