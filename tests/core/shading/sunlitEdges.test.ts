/**
 * Edges of src/core/shading/sunlit.ts that its mutation run (2026-12-04, 85.3 %) found unchecked: a
 * single point of the glass behind a skyline, the refusals of a window, a device or the shading set
 * given as `null` or as a number or a string (a script or a JSON file can send one), a fin shortened to exactly nothing, and the unit in
 * the prepared function's refusal. The expected values follow from the documented conventions
 * (docs/conventions.md, window shading geometry: a skyline hides the sun below its elevation; a fin's
 * extensions may shorten it down to no length but not beyond).
 */
import { pointSunlit, prepareShading, sunlitFraction } from '../../../src/core/shading/sunlit';
import type { Shading } from '../../../src/core/shading/types';
import { expectArgumentError } from '../../support/expectError';

const window = { width: 1, height: 1 };

describe('one point of the glass behind a skyline', () => {
  // A south window (180°) with the sun due south at 20°: a skyline of 30° in that sector hides it, one of
  // 10° does not. With no device the point's answer is the whole window's fraction (0 or 1).
  test.each([
    [[30, 30, 30, 30], 0],
    [[10, 10, 10, 10], 1],
    [[10, 10, 40, 10], 0], // the third of four sectors (180–270°) starts at due south: 40° there
    [[40, 10, 10, 40], 1], // the second sector (90–180°) ends at due south; the sun is in the third
  ])('skyline %j: the centre of the glass sees the sun → %p', (skyline, expected) => {
    const shading: Shading = { skyline };
    expect(pointSunlit(window, shading, 0.5, 0.5, 20, 180, 180)).toBe(expected);
    expect(sunlitFraction(window, shading, 20, 180, 180)).toBe(expected);
  });
});

describe('refusals', () => {
  test('a window given as null is refused naming width', () => {
    expectArgumentError(() => sunlitFraction(null as never, {}, 30, 180, 180), 'width', /must be a window of width and height above 0/);
  });

  test('an overhang or a fin given as null is refused naming its projection', () => {
    expectArgumentError(() => sunlitFraction(window, { overhang: null as never }, 30, 180, 180), 'overhangProjection', /must be an overhang/);
    expectArgumentError(() => sunlitFraction(window, { leftFin: null as never }, 30, 180, 180), 'leftFinProjection', /must be a fin/);
  });

  test('a window, an overhang or a fin given as a number or a string is refused as not one, not as a missing length', () => {
    // A worksheet cell or a JSON value of the wrong kind: the message must say what was expected, the
    // same words as for null (a number passing the kind check would be refused only as "width undefined").
    expectArgumentError(() => sunlitFraction(2 as never, {}, 30, 180, 180), 'width', /must be a window of width and height above 0/);
    expectArgumentError(() => sunlitFraction(window, { overhang: 0.5 as never }, 30, 180, 180), 'overhangProjection', /must be an overhang/);
    expectArgumentError(() => sunlitFraction(window, { rightFin: 'fin' as never }, 30, 180, 180), 'rightFinProjection', /must be a fin/);
  });

  test('a shading set given as a number or a string is refused, not read as no shading', () => {
    // Without the kind check a number's missing fields read as "no device": a silently bare window.
    expectArgumentError(() => sunlitFraction(window, 0.5 as never, 30, 180, 180), 'shading', /must be a shading description/);
    expectArgumentError(() => pointSunlit(window, 'overhang' as never, 0.5, 0.5, 30, 180, 180), 'shading', /must be a shading description/);
  });

  test('the prepared function refuses a surface azimuth that is not finite, with its unit', () => {
    expectArgumentError(() => prepareShading(window, {}, NaN), 'surfaceAzimuth', /must be a finite number in °/);
  });
});

describe('a fin shortened to exactly nothing', () => {
  test('extensions that cancel the window height exactly are accepted and shade nothing; a millimetre more is refused', () => {
    const fin = { projection: 1, gap: 0, extensionAbove: -0.5, extensionBelow: -0.5 };
    // The sun far to the left (γ = −60°): a full-height left fin 1 deep would shade the glass.
    expect(sunlitFraction(window, { leftFin: fin }, 10, 240, 180)).toBe(1);
    expect(sunlitFraction(window, { leftFin: { ...fin, extensionAbove: -0.5, extensionBelow: 0.5 } }, 10, 240, 180)).toBeLessThan(1);
    expectArgumentError(() => sunlitFraction(window, { leftFin: { ...fin, extensionBelow: -0.501 } }, 10, 240, 180), 'leftFinExtensionBelow');
  });
});
