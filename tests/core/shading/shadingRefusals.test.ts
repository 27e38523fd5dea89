/**
 * The words of every refusal of the shading folder (src/core/shading): sunlit fraction, point test,
 * shadow depth and width, skyline, shading masks.
 *
 * Source: the error convention of docs/architecture.md ("The one error type"): a refusal names the
 * argument as the user sees it, the refused value and the allowed range in words, e.g.
 * `latitude = 91 is not allowed: must be a number from -90 to 90 °`; and the ranges each function
 * documents in its doc comment (width and height above 0, device lengths at least 0, extensions any
 * finite value, the overhang's width W + EL + ER and the fin's height H + EA + EB not negative,
 * skyline elevations 0…90 °, sun altitude −90…90 °, mask steps 0.1…360 ° and 0.1…90 °, day 1…28).
 * The other shading tests check which argument is named; these check the whole message a user reads.
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { monthHourMask, shadingMaskGrid } from '../../../src/core/shading/shadingMask';
import { requireSkyline, skylineElevationAt, skylineSkyViewFactor } from '../../../src/core/shading/skyline';
import { PATH_SHADING_NAMES, pointSunlit, requireShading, requireVerticalForShading, shadowDepth, shadowWidth, sunlitFraction } from '../../../src/core/shading/sunlit';
import type { Fin, Overhang, Shading } from '../../../src/core/shading/types';
import { refusalMessage as refusal } from '../../support/expectError';

/** The message of the refusal thrown by `fn` (fails the test when `fn` does not refuse). */
const W = { width: 1, height: 1 };
const oh = (o: Partial<Overhang>): Shading => ({ overhang: { projection: 1, gap: 0, extensionLeft: 0, extensionRight: 0, ...o } });
const lf = (f: Partial<Fin>): Shading => ({ leftFin: { projection: 1, gap: 0, extensionAbove: 0, extensionBelow: 0, ...f } });
const rf = (f: Partial<Fin>): Shading => ({ rightFin: { projection: 1, gap: 0, extensionAbove: 0, extensionBelow: 0, ...f } });
const sunlit = (shading: Shading) => () => sunlitFraction(W, shading, 30, 180, 180);

describe('window and shading description', () => {
  test('the glass: width and height above 0; a missing window names width', () => {
    expect(refusal(() => sunlitFraction({ width: 0, height: 1 }, {}, 30, 180, 180))).toBe('width = 0 is not allowed: must be a number above 0');
    expect(refusal(() => sunlitFraction({ width: 1, height: -2 }, {}, 30, 180, 180))).toBe('height = -2 is not allowed: must be a number above 0');
    expect(refusal(() => sunlitFraction(null as never, {}, 30, 180, 180))).toBe('width = blank is not allowed: must be a window of width and height above 0');
  });

  test('the shading itself, an overhang or a fin that is not an object', () => {
    expect(refusal(sunlit(null as never))).toBe('shading = blank is not allowed: must be a shading description (an object, {} for none)');
    expect(refusal(sunlit({ overhang: null as never }))).toBe(
      'overhangProjection = blank is not allowed: must be an overhang (projection, gap, extensionLeft, extensionRight)',
    );
    expect(refusal(sunlit({ leftFin: 3 as never }))).toBe('leftFinProjection = 3 is not allowed: must be a fin (projection, gap, extensionAbove, extensionBelow)');
    expect(refusal(sunlit({ rightFin: null as never }))).toBe('rightFinProjection = blank is not allowed: must be a fin (projection, gap, extensionAbove, extensionBelow)');
  });

  test('projections, gaps and the reveal are at least 0; extensions any finite number', () => {
    expect(refusal(sunlit(oh({ projection: -0.1 })))).toBe('overhangProjection = -0.1 is not allowed: must be a number of at least 0');
    expect(refusal(sunlit(oh({ gap: -0.2 })))).toBe('overhangGap = -0.2 is not allowed: must be a number of at least 0');
    expect(refusal(sunlit(oh({ extensionRight: Number.NaN })))).toBe('overhangExtensionRight = NaN is not allowed: must be a finite number');
    expect(refusal(sunlit(lf({ gap: -1 })))).toBe('leftFinGap = -1 is not allowed: must be a number of at least 0');
    expect(refusal(sunlit(rf({ extensionBelow: Infinity })))).toBe('rightFinExtensionBelow = Infinity is not allowed: must be a finite number');
    expect(refusal(sunlit({ revealDepth: -0.01 }))).toBe('revealDepth = -0.01 is not allowed: must be a number of at least 0');
  });

  test('an overhang narrower than nothing: the extension that cuts more is named, with the least it may be', () => {
    // W + EL + ER ≥ 0 → EL ≥ −(W + ER).
    expect(refusal(sunlit(oh({ extensionLeft: -0.8, extensionRight: -0.3 })))).toBe(
      'overhangExtensionLeft = -0.8 is not allowed: must be at least -0.7 (the overhang width, window width + left + right extension, must not be negative)',
    );
    expect(refusal(sunlit(oh({ extensionLeft: 0.1, extensionRight: -1.2 })))).toMatch(/^overhangExtensionRight = -1.2 is not allowed: must be at least -1.1 \(/);
    // A tie names the left one.
    expect(refusal(sunlit(oh({ extensionLeft: -0.6, extensionRight: -0.6 })))).toMatch(/^overhangExtensionLeft = -0.6 is not allowed: must be at least -0.4 \(/);
  });

  test('a fin shorter than nothing: the extension that cuts more is named, with the least it may be', () => {
    expect(refusal(sunlit(lf({ extensionAbove: -1.5, extensionBelow: 0 })))).toBe(
      'leftFinExtensionAbove = -1.5 is not allowed: must be at least -1 (the fin height, window height + extension above + extension below, must not be negative)',
    );
    expect(refusal(sunlit(rf({ extensionAbove: 0.25, extensionBelow: -2 })))).toMatch(/^rightFinExtensionBelow = -2 is not allowed: must be at least -1.25 \(/);
    expect(refusal(sunlit(rf({ extensionAbove: -0.7, extensionBelow: -0.7 })))).toMatch(/^rightFinExtensionAbove = -0.7 is not allowed: must be at least -0.3 \(/);
  });

  test('with a length limit (a window description in metres) every length is bounded and named by its path', () => {
    const limit = { max: 50, unit: 'm' };
    const check = (shading: Shading) => () => requireShading(W, shading, PATH_SHADING_NAMES, limit);
    expect(refusal(check(oh({ projection: 60 })))).toBe('shading.overhang.projection = 60 is not allowed: must be a number from 0 to 50 m');
    expect(refusal(check(oh({ extensionLeft: -51 })))).toBe('shading.overhang.extensionLeft = -51 is not allowed: must be a number from -50 to 50 m');
    expect(refusal(check(lf({ extensionAbove: 51 })))).toBe('shading.leftFin.extensionAbove = 51 is not allowed: must be a number from -50 to 50 m');
    expect(refusal(check({ revealDepth: 50.5 }))).toBe('shading.revealDepth = 50.5 is not allowed: must be a number from 0 to 50 m');
    expect(refusal(check({ skyline: [95] }))).toBe('shading.skyline = a list of 1 is not allowed: must hold elevation angles from 0 to 90 ° (value 1 is 95)');
    // Within the limit, a negative extension of up to the limit is allowed.
    const ok = oh({ extensionLeft: -0.5, extensionRight: 50 });
    expect(requireShading(W, ok, PATH_SHADING_NAMES, limit)).toBe(ok);
  });

  test('devices on a tilted window', () => {
    expect(refusal(() => requireVerticalForShading(45, oh({})))).toBe(
      'surfaceTilt = 45 is not allowed: must be 90 ° (a vertical wall) when shading devices or a skyline are given ' +
        '(the shadows and the sky and ground view factors of overhangs, fins, reveals and skylines are worked out for vertical walls only; remove the devices or skyline for a tilted window)',
    );
    // A reveal of depth 0 is no shading (hasShading), so a tilted window may carry it.
    expect(() => requireVerticalForShading(45, { revealDepth: 0 })).not.toThrow();
    expect(() => requireVerticalForShading(45, { revealDepth: 0.1 })).toThrow(SunpaneError);
    expect(() => requireVerticalForShading(45, { skyline: [0] })).toThrow(SunpaneError);
    expect(() => requireVerticalForShading(45, lf({}))).toThrow(SunpaneError);
    expect(() => requireVerticalForShading(45, rf({}))).toThrow(SunpaneError);
  });
});

describe('sun and point', () => {
  test('sun altitude −90…90 °, azimuths finite, in degrees', () => {
    expect(refusal(() => sunlitFraction(W, {}, 91, 180, 180))).toBe('sunAltitude = 91 is not allowed: must be a number from -90 to 90 °');
    expect(refusal(() => sunlitFraction(W, {}, 30, Number.NaN, 180))).toBe('sunAzimuth = NaN is not allowed: must be a finite number in °');
    expect(refusal(() => sunlitFraction(W, {}, 30, 180, -Infinity))).toBe('surfaceAzimuth = -Infinity is not allowed: must be a finite number in °');
  });

  test('the point lies on the glass', () => {
    expect(refusal(() => pointSunlit({ width: 2, height: 1 }, {}, 2.5, 0.5, 30, 180, 180))).toBe('x = 2.5 is not allowed: must be a number from 0 to 2');
    expect(refusal(() => pointSunlit({ width: 2, height: 1 }, {}, 1, 1.5, 30, 180, 180))).toBe('y = 1.5 is not allowed: must be a number from 0 to 1');
  });

  test('shadow depth and width: projection at least 0', () => {
    expect(refusal(() => shadowDepth(-1, 30, 180, 180))).toBe('projection = -1 is not allowed: must be a number of at least 0');
    expect(refusal(() => shadowWidth(-0.5, 30, 180, 180))).toBe('projection = -0.5 is not allowed: must be a number of at least 0');
    expect(refusal(() => shadowWidth(1, -95, 180, 180))).toBe('sunAltitude = -95 is not allowed: must be a number from -90 to 90 °');
  });
});

describe('skyline', () => {
  test('a list of at least one elevation 0…90 °; the message says which value is out', () => {
    expect(refusal(() => requireSkyline([]))).toBe('skyline = a list of 0 is not allowed: must be a list of at least one elevation angle from 0 to 90 °');
    expect(refusal(() => requireSkyline('30'))).toBe('skyline = "30" is not allowed: must be a list of at least one elevation angle from 0 to 90 °');
    expect(refusal(() => requireSkyline([10, 20, 90.5]))).toBe('skyline = a list of 3 is not allowed: must hold elevation angles from 0 to 90 ° (value 3 is 90.5)');
    expect(refusal(() => requireSkyline([10, '20'], 'horizon'))).toBe('horizon = a list of 2 is not allowed: must hold elevation angles from 0 to 90 ° (value 2 is 20)');
    // The bounds themselves are allowed.
    expect(requireSkyline([0, 90])).toEqual([0, 90]);
  });

  test('azimuths are finite numbers in degrees', () => {
    expect(refusal(() => skylineElevationAt([0], Number.NaN))).toBe('azimuth = NaN is not allowed: must be a finite number in °');
    expect(refusal(() => skylineSkyViewFactor([0], Infinity))).toBe('surfaceAzimuth = Infinity is not allowed: must be a finite number in °');
  });
});

describe('shading masks', () => {
  const site = { latitude: 40, longitude: -3, utcOffset: 1 };
  test('grid steps and the reference point', () => {
    expect(refusal(() => shadingMaskGrid(W, {}, 180, { azimuthStep: 0.05, altitudeStep: 10 }))).toBe('azimuthStep = 0.05 is not allowed: must be a number from 0.1 to 360 °');
    expect(refusal(() => shadingMaskGrid(W, {}, 180, { azimuthStep: 10, altitudeStep: 90.5 }))).toBe('altitudeStep = 90.5 is not allowed: must be a number from 0.1 to 90 °');
    expect(refusal(() => shadingMaskGrid(W, {}, 180, { azimuthStep: 90, altitudeStep: 45, point: { x: 0.5, y: 1.5 } }))).toBe(
      'y = 1.5 is not allowed: must be a number from 0 to 1',
    );
    expect(refusal(() => shadingMaskGrid(W, {}, 180, { azimuthStep: 90, altitudeStep: 45, point: { x: 1.5, y: 0.5 } }))).toBe(
      'x = 1.5 is not allowed: must be a number from 0 to 1',
    );
  });

  test('the day of each month is a whole number 1…28', () => {
    expect(refusal(() => monthHourMask(site, W, {}, 180, { day: 29 }))).toBe('day = 29 is not allowed: must be a whole number from 1 to 28');
    expect(refusal(() => monthHourMask(site, W, {}, 180, { day: 2.5 }))).toBe('day = 2.5 is not allowed: must be a whole number from 1 to 28');
  });
});
