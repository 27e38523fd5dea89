/**
 * Invariants, edge cases and bad input of the glazing module: angle-dependent SHGC (physical model
 * and tables), diffuse SHGC, the prepared curve, interior attenuation and glass area. Outside checks
 * (Fresnel, Fritsch–Carlson, hemispherical integral) are in tests/reference/.
 */
import fc from 'fast-check';
import { CURVE_STEP, diffuseShgc, diffuseShgcFromTable, glassArea, interiorAttenuationOf, shgcAtAngle, shgcCurve, shgcFromTable } from '../../../src/core/glazing/shgc';
import { hemisphericalAverage } from '../../../src/core/common/hemispherical';
import { expectArgumentError } from '../../support/expectError';
import { must } from '../../support/mismatches';

const TABLE = { angles: [0, 40, 50, 60, 70, 80], values: [0.7, 0.68, 0.66, 0.6, 0.48, 0.28] };

const expectError = expectArgumentError;

describe('SHGC by the physical model', () => {
  test('returns the rated SHGC at normal incidence (1e-12) and 0 from 90° on', () => {
    for (const panes of [1, 2, 3, 4]) {
      for (const s of [0, 0.25, 0.5, 0.87, 1]) {
        expect(shgcAtAngle(s, panes, 0)).toBeCloseTo(s, 12);
        expect(shgcAtAngle(s, panes, 90)).toBe(0);
        expect(shgcAtAngle(s, panes, 135)).toBe(0);
      }
    }
  });

  test('never rises with the angle and stays within 0…SHGCn (random SHGC and pane counts, every 0.5°)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.integer({ min: 1, max: 4 }), (s, panes) => {
        const curve = shgcCurve({ shgc: s, panes });
        let previous = Infinity;
        for (let theta = 0; theta <= 90; theta += 0.5) {
          const v = shgcAtAngle(s, panes, theta);
          must(v <= previous + 1e-15, () => `${theta}°: ${v} above the value before it, ${previous}`);
          must(v >= 0 && v <= s + 1e-15, () => `${theta}°: ${v} outside 0…${s}`);
          must(Math.abs(curve.atAngle(theta) - v) < 1e-4, () => `${theta}°: curve ${curve.atAngle(theta)}, model ${v}`);
          previous = v;
        }
      }),
      { numRuns: 60, seed: 5 },
    );
  });

  test('more panes at the same rating fall off at least as fast at 70° (common practice, no source)', () => {
    expect(shgcAtAngle(0.6, 3, 70)).toBeLessThanOrEqual(shgcAtAngle(0.6, 1, 70));
  });

  test('the diffuse SHGC lies below the normal value and equals the hemispherical average of the curve (1e-12)', () => {
    for (const panes of [1, 2, 3, 4]) {
      const d = diffuseShgc(0.6, panes);
      expect(d).toBeLessThan(0.6);
      expect(d).toBeGreaterThan(0.4);
      expect(d).toBeCloseTo(hemisphericalAverage((t) => shgcAtAngle(0.6, panes, t)), 12);
    }
    expect(diffuseShgc(0, 2)).toBe(0);
  });

  test('bad SHGC, pane count and angle are refused by name', () => {
    expectError(() => shgcAtAngle(1.2, 2, 30), 'shgcNormal');
    expectError(() => shgcAtAngle(-0.1, 2, 30), 'shgcNormal');
    expectError(() => shgcAtAngle(0.5, 5, 30), 'panes');
    expectError(() => shgcAtAngle(0.5, 1.5, 30), 'panes');
    expectError(() => shgcAtAngle(0.5, 2, -1), 'incidence');
    expectError(() => diffuseShgc(0.5, 0), 'panes');
  });
});

describe('SHGC from an angle table', () => {
  test('passes through the table points (1e-12) and holds the first value below the first angle', () => {
    TABLE.angles.forEach((a, k) => expect(shgcFromTable(TABLE, a)).toBeCloseTo(TABLE.values[k], 12));
    expect(shgcFromTable({ angles: [10, 80], values: [0.5, 0.2] }, 3)).toBe(0.5);
  });

  test('tapers to 0 at 90° when the table stops short, without rising on the way', () => {
    let previous = Infinity;
    for (let t = 0; t < 90; t += 0.25) {
      const v = shgcFromTable(TABLE, t);
      expect(v).toBeLessThanOrEqual(previous + 1e-15);
      previous = v;
    }
    expect(shgcFromTable(TABLE, 89.99)).toBeLessThan(0.01);
    expect(shgcFromTable(TABLE, 90)).toBe(0);
  });

  test('a table that reaches 90° is used as given below 90°', () => {
    const t = { angles: [0, 45, 90], values: [0.5, 0.5, 0.5] };
    expect(shgcFromTable(t, 89.9)).toBeCloseTo(0.5, 12);
    expect(shgcFromTable(t, 90)).toBe(0);
  });

  test('the curve of a table matches the table function and its diffuse value (1e-4)', () => {
    const curve = shgcCurve({ shgc: 0.7, panes: 2, angleTable: TABLE });
    expect(curve.normal).toBeCloseTo(0.7, 12);
    for (let t = 0; t <= 95; t += 0.37) expect(Math.abs(curve.atAngle(t) - shgcFromTable(TABLE, t))).toBeLessThan(1e-4);
    expect(curve.diffuse).toBeCloseTo(diffuseShgcFromTable(TABLE), 12);
  });

  test('a constant table to 90° has the constant as its diffuse value (1e-12)', () => {
    expect(diffuseShgcFromTable({ angles: [0, 90], values: [0.42, 0.42] })).toBeCloseTo(0.42, 12);
  });

  test('bad tables are refused naming the part', () => {
    expectError(() => shgcFromTable({ angles: [0, 50, 40], values: [0.7, 0.6, 0.5] }, 10), 'angleTable.angles');
    expectError(() => shgcFromTable({ angles: [0, 95], values: [0.7, 0.6] }, 10), 'angleTable.angles');
    expectError(() => shgcFromTable({ angles: [-5, 50], values: [0.7, 0.6] }, 10), 'angleTable.angles');
    expectError(() => shgcFromTable({ angles: [0, 50], values: [0.7, 1.6] }, 10), 'angleTable.values');
    expectError(() => shgcFromTable({ angles: [0, 50], values: [0.7] }, 10), 'angleTable.values');
    expectError(() => shgcFromTable({ angles: [], values: [] }, 10), 'angleTable.angles');
    expectError(() => shgcFromTable({ angles: [10, 10.001], values: [0.7, 0.6] }, 10), 'angleTable.angles');
    expectError(() => shgcCurve({ shgc: 0.5, panes: 2, angleTable: { angles: [0, 50, 40], values: [0.7, 0.6, 0.5] } }), 'glazing.angleTable.angles');
  });
});

describe('SHGC curve, interior attenuation and glass area', () => {
  test('the curve refuses a negative or non-finite angle naming incidence and gives 0 behind the glass', () => {
    const curve = shgcCurve({ shgc: 0.5, panes: 2 });
    expectError(() => curve.atAngle(-1), 'incidence');
    expectError(() => curve.atAngle(Number.NaN), 'incidence');
    expect(curve.atAngle(90)).toBe(0);
    expect(curve.atAngle(180)).toBe(0);
    expect(curve.normal).toBeCloseTo(0.5, 12);
  });

  test('a bad glazing is refused naming the field', () => {
    expectError(() => shgcCurve({ shgc: 1.5, panes: 2 }), 'glazing.shgc');
    expectError(() => shgcCurve({ shgc: 0.5, panes: 0 }), 'glazing.panes');
    expectError(() => interiorAttenuationOf({ shgc: 0.5, panes: 2, interiorAttenuation: 1.2 }), 'glazing.interiorAttenuation');
  });

  test('interior attenuation is 1 when not given and passes through when given', () => {
    expect(interiorAttenuationOf({ shgc: 0.5, panes: 2 })).toBe(1);
    expect(interiorAttenuationOf({ shgc: 0.5, panes: 2, interiorAttenuation: 0.65 })).toBe(0.65);
  });

  test('glass area is width × height × (1 − frame share); bad dimensions are refused by name', () => {
    expect(glassArea(1.2, 1.5, 0.2)).toBeCloseTo(1.44, 12);
    expect(glassArea(2, 1, 0)).toBe(2);
    expectError(() => glassArea(0, 1, 0.1), 'width');
    expectError(() => glassArea(1, -1, 0.1), 'height');
    expectError(() => glassArea(1, 1, 1), 'frameFraction');
  });
});

describe('SHGC curve lookup filled on first use', () => {
  test('gives the linear interpolation between the exact model at the neighbouring 0.1° nodes, whatever order the angles come in', () => {
    const physical = shgcCurve({ shgc: 0.6, panes: 2 });
    const table = { angles: [0, 40, 60, 80], values: [0.7, 0.68, 0.55, 0.2] };
    const tabled = shgcCurve({ shgc: 0.7, panes: 1, angleTable: table });
    fc.assert(
      fc.property(fc.double({ min: 0, max: 89.99, noNaN: true }), (theta) => {
        const k = Math.floor(theta / CURVE_STEP);
        const f = theta / CURVE_STEP - k;
        for (const [curve, exact] of [
          [physical, (a: number) => shgcAtAngle(0.6, 2, a)],
          [tabled, (a: number) => shgcFromTable(table, a)],
        ] as const) {
          const lo = exact(k * CURVE_STEP);
          const hi = exact((k + 1) * CURVE_STEP);
          const between = lo + f * (hi - lo);
          must(Math.abs(curve.atAngle(theta) - between) <= 1e-15, () => `${theta}°: curve ${curve.atAngle(theta)}, between the nodes ${between}`);
        }
      }),
      { numRuns: 2000, seed: 31 },
    );
    expect(physical.atAngle(90)).toBe(0);
    expect(physical.atAngle(89.99999)).toBeGreaterThanOrEqual(0);
    expect(physical.normal).toBe(shgcAtAngle(0.6, 2, 0));
  });
});

describe('kept physical-model curves', () => {
  test('a glazing prepared again gives the same values, diffuse SHGC and normal SHGC as the first time, also after other glazings pushed it out', () => {
    const first = shgcCurve({ shgc: 0.55, panes: 3 });
    const firstValues = [0, 12.34, 45.6, 70.05, 89.9].map((t) => first.atAngle(t));
    for (let k = 0; k < 20; k++) shgcCurve({ shgc: 0.3 + k / 100, panes: 2 }); // more glazings than are kept
    const again = shgcCurve({ shgc: 0.55, panes: 3 });
    const secondValues = [0, 12.34, 45.6, 70.05, 89.9].map((t) => again.atAngle(t));
    expect(secondValues).toEqual(firstValues);
    expect(again.diffuse).toBe(first.diffuse);
    expect(again.diffuse).toBe(diffuseShgc(0.55, 3));
    expect(again.normal).toBe(shgcAtAngle(0.55, 3, 0));
    // The table's values are the model's at the 0.1° nodes, interpolated in between (1e-4 as above).
    for (const t of [12.34, 45.6, 70.05]) expect(Math.abs(again.atAngle(t) - shgcAtAngle(0.55, 3, t))).toBeLessThan(1e-4);
  });

  test('a kept curve still refuses a bad incidence angle, naming it', () => {
    shgcCurve({ shgc: 0.61, panes: 2 });
    expectError(() => shgcCurve({ shgc: 0.61, panes: 2 }).atAngle(-1), 'incidence');
  });
});
