/**
 * The prepared (validate-once) fast paths of the annual series held to their checked twins:
 * - `prepareShading(...).sunlit` / `.sunlitInWallFrame` / `.sunlitOfRows` against `sunlitFraction`
 *   (and many suns at once against one at a time, exactly),
 * - `preparePlane(...).irradiance` against `planeIrradiance` (and `.irradianceRows`, many hours at
 *   once, against one hour at a time, exactly),
 * - `perezPartsKernel` against `perezParts`,
 * - `unionAreaInRectangle` with bounding boxes against the same union without them,
 * - every hour of `annualSeries` against the checked functions applied to that hour's own sun.
 * The checked twins are themselves tested against outside sources (tests/reference/); here the
 * requirement is equality: 1e-12, relative to the size of the value where it is an irradiance.
 */
import { withinLimits } from '../../support/possibleIrradiance';
import fc from 'fast-check';
import { RAD, wrap180, wrap360 } from '../../../src/core/common/angles';
import { annualSeries } from '../../../src/core/gain/annual';
import { SunpaneError } from '../../../src/core/common/errors';
import { circumsolarShade, prepareWindow } from '../../../src/core/gain/prepared';
import { airMassKastenYoung, airMassKastenYoungFromSine, airMassKastenYoungUnchecked } from '../../../src/core/sky/airMass';
import { PEREZ_1990_COMPOSITE, PEREZ_EPSILON_EDGES, perezBin, perezParts, perezPartsKernel } from '../../../src/core/sky/perez1990';
import { type PlaneParts, planeIrradiance, preparePlane, type SkyModel } from '../../../src/core/sky/planeIrradiance';
import { unionAreaInRectangle, writeQuadHalfPlanes } from '../../../src/core/shading/polygon';
import { prepareShading, sunlitFraction } from '../../../src/core/shading/sunlit';
import { extraterrestrialSpencer } from '../../../src/core/sky/extraterrestrial';
import { incidenceAngle, profileAngle } from '../../../src/core/sun/surfaceAngles';
import type { Shading } from '../../../src/core/shading/types';
import { shadedSpec } from './gainFixtures';
import { Mismatches, must } from '../../support/mismatches';

const EQUAL = 1e-12;

function closeTo(a: number, b: number, scale = 1): boolean {
  // a === b also covers the unchecked kernels' ε = ∞ for a subnormal DHI (same on both paths).
  return a === b || Math.abs(a - b) <= EQUAL * Math.max(scale, Math.abs(a), Math.abs(b));
}

const shadingArb: fc.Arbitrary<Shading> = fc.record(
  {
    overhang: fc.record({
      projection: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2, noNaN: true })),
      gap: fc.double({ min: 0, max: 1, noNaN: true }),
      extensionLeft: fc.double({ min: -0.5, max: 2, noNaN: true }),
      extensionRight: fc.double({ min: -0.5, max: 2, noNaN: true }),
    }),
    leftFin: fc.record({
      projection: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2, noNaN: true })),
      gap: fc.double({ min: 0, max: 1, noNaN: true }),
      extensionAbove: fc.double({ min: -0.5, max: 2, noNaN: true }),
      extensionBelow: fc.double({ min: -0.5, max: 2, noNaN: true }),
    }),
    rightFin: fc.record({
      projection: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2, noNaN: true })),
      gap: fc.double({ min: 0, max: 1, noNaN: true }),
      extensionAbove: fc.double({ min: -0.5, max: 2, noNaN: true }),
      extensionBelow: fc.double({ min: -0.5, max: 2, noNaN: true }),
    }),
    revealDepth: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 0.5, noNaN: true })),
    skyline: fc.array(fc.double({ min: 0, max: 60, noNaN: true }), { minLength: 1, maxLength: 12 }),
  },
  { requiredKeys: [] },
);

/** Sun altitudes with the edge cases drawn often: horizon, zenith, just above / below 0. */
const altitudeArb = fc.oneof(fc.constantFrom(0, 90, -90, 1e-9, -1e-9, 89.999999), fc.double({ min: -90, max: 90, noNaN: true }));
/** Sun azimuth relative to the wall: in the wall plane (±90 exactly), just inside, behind, anywhere. */
const relativeAzimuthArb = fc.oneof(fc.constantFrom(0, 90, -90, 89.9999999, -89.9999999, 180, 135), fc.double({ min: -180, max: 180, noNaN: true }));

describe('prepared shading equals sunlitFraction', () => {
  test('over random windows, devices (including zero projection), reveals, skylines and suns', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        shadingArb,
        altitudeArb,
        relativeAzimuthArb,
        fc.double({ min: 0, max: 360, noNaN: true }),
        (width, height, shading, altitude, relative, surfaceAzimuth) => {
          // Devices narrower than the window are only valid down to total width / height 0.
          if (shading.overhang && width + shading.overhang.extensionLeft + shading.overhang.extensionRight < 0) return;
          for (const fin of [shading.leftFin, shading.rightFin]) if (fin && height + fin.extensionAbove + fin.extensionBelow < 0) return;
          const window = { width, height };
          const sunAzimuth = surfaceAzimuth + relative;
          const checked = sunlitFraction(window, shading, altitude, sunAzimuth, surfaceAzimuth);
          const prepared = prepareShading(window, shading, surfaceAzimuth);
          const sunlit = prepared.sunlit(altitude, sunAzimuth);
          must(Math.abs(sunlit - checked) <= EQUAL, () => `sunlit ${sunlit}, sunlitFraction ${checked}`);
          const gamma = wrap180(surfaceAzimuth - sunAzimuth);
          const betaRad = altitude * RAD;
          const framed = prepared.sunlitInWallFrame(altitude, sunAzimuth, gamma, Math.sin(betaRad), Math.cos(betaRad), Math.sin(gamma * RAD), Math.cos(gamma * RAD));
          must(Math.abs(framed - checked) <= EQUAL, () => `sunlitInWallFrame ${framed}, sunlitFraction ${checked}`);
        },
      ),
      { numRuns: 3000, seed: 8 },
    );
  });

  test('many suns at once (sunlitOfRows, the hourly path) give each sun\'s own sunlitInWallFrame exactly, and sunlitFraction within 1e-12; rows not listed are left alone', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        shadingArb,
        fc.double({ min: 0, max: 360, noNaN: true }),
        fc.array(fc.tuple(altitudeArb, relativeAzimuthArb), { minLength: 1, maxLength: 40 }),
        (width, height, shading, surfaceAzimuth, suns) => {
          if (shading.overhang && width + shading.overhang.extensionLeft + shading.overhang.extensionRight < 0) return;
          for (const fin of [shading.leftFin, shading.rightFin]) if (fin && height + fin.extensionAbove + fin.extensionBelow < 0) return;
          const window = { width, height };
          const prepared = prepareShading(window, shading, surfaceAzimuth);
          // Row 2k holds sun k; the odd rows are not listed and must keep their marker.
          const n = 2 * suns.length;
          const cols = { altitude: new Float64Array(n), azimuth: new Float64Array(n), sinAltitude: new Float64Array(n), cosAltitude: new Float64Array(n), gamma: new Float64Array(n), sinGamma: new Float64Array(n), cosGamma: new Float64Array(n) };
          const rows = new Int32Array(suns.length);
          suns.forEach(([altitude, relative], k) => {
            const i = 2 * k;
            const sunAzimuth = wrap360(surfaceAzimuth + relative);
            const gamma = wrap180(surfaceAzimuth - sunAzimuth);
            cols.altitude[i] = altitude;
            cols.azimuth[i] = sunAzimuth;
            cols.sinAltitude[i] = Math.sin(altitude * RAD);
            cols.cosAltitude[i] = Math.cos(altitude * RAD);
            cols.gamma[i] = gamma;
            cols.sinGamma[i] = Math.sin(gamma * RAD);
            cols.cosGamma[i] = Math.cos(gamma * RAD);
            rows[k] = i;
          });
          const out = new Float64Array(n).fill(-7);
          prepared.sunlitOfRows(rows, rows.length, cols, out);
          suns.forEach(([altitude], k) => {
            const i = 2 * k;
            const one = prepared.sunlitInWallFrame(altitude, cols.azimuth[i], cols.gamma[i], cols.sinAltitude[i], cols.cosAltitude[i], cols.sinGamma[i], cols.cosGamma[i]);
            must(Object.is(out[i], one), () => `sun ${k}: sunlitOfRows ${out[i]}, sunlitInWallFrame ${one}`);
            const checked = sunlitFraction(window, shading, altitude, cols.azimuth[i], surfaceAzimuth);
            must(Math.abs(out[i] - checked) <= EQUAL, () => `sun ${k}: sunlitOfRows ${out[i]}, sunlitFraction ${checked}`);
            must(Object.is(out[i + 1], -7), () => `row ${i + 1} (not listed) was changed to ${out[i + 1]}`);
          });
        },
      ),
      { numRuns: 400, seed: 9 },
    );
  });

  test('the sun in the wall plane, behind it or below the horizon gives 0 on both paths; an open window gives 1 in front', () => {
    const window = { width: 2, height: 1.5 };
    const shading: Shading = { overhang: { projection: 0.5, gap: 0.1, extensionLeft: 0.2, extensionRight: 0.2 } };
    const prepared = prepareShading(window, shading, 180);
    for (const [alt, az] of [[30, 90], [30, 270], [30, 0], [0, 180], [-5, 180]]) {
      expect(prepared.sunlit(alt, az)).toBe(0);
      expect(sunlitFraction(window, shading, alt, az, 180)).toBe(0);
    }
    const open = prepareShading(window, {}, 180);
    expect(open.shades).toBe(false);
    expect(open.sunlit(30, 200)).toBe(1);
    expect(open.sunlit(30, 90)).toBe(0);
    expect(prepared.shades).toBe(true);
  });

  test('the checks run once at preparation, name the argument, and later edits to the shading do not reach the prepared copy', () => {
    expect(() => prepareShading({ width: 2, height: 1 }, { revealDepth: -1 }, 180)).toThrow(SunpaneError);
    try {
      prepareShading({ width: 2, height: 1 }, { leftFin: { projection: Number.NaN, gap: 0, extensionAbove: 0, extensionBelow: 0 } }, 180);
    } catch (err) {
      expect((err as SunpaneError).argument).toBe('leftFinProjection');
    }
    expect(() => prepareShading({ width: 2, height: 1 }, {}, Number.POSITIVE_INFINITY)).toThrow(/^surfaceAzimuth/);
    const shading: Shading = { overhang: { projection: 0.5, gap: 0, extensionLeft: 1, extensionRight: 1 }, skyline: [0] };
    const prepared = prepareShading({ width: 2, height: 1 }, shading, 180);
    const before = prepared.sunlit(40, 180);
    shading.overhang!.projection = 5;
    shading.skyline![0] = 80;
    expect(prepared.sunlit(40, 180)).toBe(before);
  });
});

describe('prepared plane equals planeIrradiance', () => {
  const planeArb = fc.record({
    dni: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2000, noNaN: true })),
    dhi: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2000, noNaN: true })),
    sunAltitude: altitudeArb,
    sunAzimuth: fc.double({ min: 0, max: 360, noNaN: true }),
    surfaceTilt: fc.oneof(fc.constantFrom(0, 90, 180), fc.double({ min: 0, max: 180, noNaN: true })),
    surfaceAzimuth: fc.double({ min: 0, max: 360, noNaN: true }),
    groundAlbedo: fc.double({ min: 0, max: 1, noNaN: true }),
    dayOfYear: fc.integer({ min: 1, max: 366 }),
    skyModel: fc.constantFrom<SkyModel>('isotropic', 'hayDavies', 'perez1990'),
    shade: fc.record({ isotropic: fc.double({ min: 0, max: 1, noNaN: true }), circumsolar: fc.double({ min: 0, max: 1, noNaN: true }), horizon: fc.double({ min: 0, max: 1, noNaN: true }), ground: fc.double({ min: 0, max: 1, noNaN: true }) }),
  });

  test('over random suns (at, below and above the horizon, in front of and behind the plane), planes and models', () => {
    const out: PlaneParts = { beam: 0, sky: 0, ground: 0, total: 0, skyUnshaded: 0, groundUnshaded: 0 };
    fc.assert(
      fc.property(planeArb, (drawn) => {
        const input = withinLimits(drawn); // the checked path refuses irradiance past the physically possible limits
        const checked = planeIrradiance(input);
        const plane = preparePlane(input);
        // The caller's own sun trig, as the annual loop has it.
        const betaRad = input.sunAltitude * RAD;
        const cosIncidence =
          Math.sin(betaRad) * Math.cos(input.surfaceTilt * RAD) +
          Math.cos(betaRad) * Math.sin(input.surfaceTilt * RAD) * Math.cos((input.sunAzimuth - input.surfaceAzimuth) * RAD);
        plane.irradiance(out, input.dni, input.dhi, input.sunAltitude, Math.sin(betaRad), cosIncidence, extraterrestrialSpencer(input.dayOfYear), input.shade.circumsolar);
        const scale = input.dni + input.dhi;
        for (const key of ['beam', 'sky', 'ground', 'total', 'skyUnshaded', 'groundUnshaded'] as const) {
          must(closeTo(out[key], checked[key], scale), () => `${key}: prepared ${out[key]}, planeIrradiance ${checked[key]}`);
        }
        must(plane.needsDniExtra === (input.skyModel !== 'isotropic'), () => `needsDniExtra ${plane.needsDniExtra} for ${input.skyModel}`);
      }),
      { numRuns: 3000, seed: 9 },
    );
  });

  test('many hours at once (irradianceRows, the hourly path) give each hour\'s own one-hour call exactly, with and without shared Perez brightness; rows not listed are left alone', () => {
    const hourArb = fc.record({
      dni: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2000, noNaN: true })),
      dhi: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2000, noNaN: true })),
      sunAltitude: altitudeArb,
      cosIncidence: fc.oneof(fc.constantFrom(-1, 0, 1), fc.double({ min: -1, max: 1, noNaN: true })),
      dniExtra: fc.double({ min: 1300, max: 1420, noNaN: true }),
      circumsolar: fc.double({ min: 0, max: 1, noNaN: true }),
      f1: fc.double({ min: 0, max: 1.5, noNaN: true }),
      f2: fc.double({ min: -0.5, max: 0.5, noNaN: true }),
    });
    const one: PlaneParts = { beam: 0, sky: 0, ground: 0, total: 0, skyUnshaded: 0, groundUnshaded: 0 };
    fc.assert(
      fc.property(
        planeArb,
        fc.constantFrom<SkyModel>('isotropic', 'hayDavies', 'perez1990', 'ashraeClearDay'),
        fc.array(hourArb, { minLength: 1, maxLength: 30 }),
        fc.boolean(),
        (input, skyModel, hours, withShared) => {
          const plane = preparePlane({ ...input, skyModel });
          // Row 2k holds hour k; the odd rows are not listed and must keep their marker.
          const n = 2 * hours.length;
          const col = () => new Float64Array(n);
          const c = { dni: col(), dhi: col(), altitude: col(), sinAltitude: col(), cosIncidence: col(), dniExtra: col(), circumsolar: col(), beam: col().fill(-7), sky: col().fill(-7), ground: col().fill(-7), skyUnshaded: col().fill(-7), groundUnshaded: col().fill(-7) };
          const shared = { f1: col(), f2: col() };
          const rows = Int32Array.from(hours, (_, k) => 2 * k);
          hours.forEach((h, k) => {
            const i = 2 * k;
            c.dni[i] = h.dni;
            c.dhi[i] = h.dhi;
            c.altitude[i] = h.sunAltitude;
            c.sinAltitude[i] = Math.sin(h.sunAltitude * RAD);
            c.cosIncidence[i] = h.cosIncidence;
            c.dniExtra[i] = h.dniExtra;
            c.circumsolar[i] = h.circumsolar;
            shared.f1[i] = h.f1;
            shared.f2[i] = h.f2;
          });
          plane.irradianceRows(rows, rows.length, c, withShared ? shared : undefined);
          hours.forEach((h, k) => {
            const i = 2 * k;
            if (withShared) plane.irradianceShared(one, h.dni, h.dhi, h.sunAltitude, c.sinAltitude[i], h.cosIncidence, h.dniExtra, h.circumsolar, shared, i);
            else plane.irradiance(one, h.dni, h.dhi, h.sunAltitude, c.sinAltitude[i], h.cosIncidence, h.dniExtra, h.circumsolar);
            for (const key of ['beam', 'sky', 'ground', 'skyUnshaded', 'groundUnshaded'] as const) {
              must(Object.is(c[key][i], one[key]), () => `hour ${k} ${key}: irradianceRows ${c[key][i]}, one-hour call ${one[key]}`);
              must(Object.is(c[key][i + 1], -7), () => `row ${i + 1} (not listed) ${key} was changed to ${c[key][i + 1]}`);
            }
          });
        },
      ),
      { numRuns: 600, seed: 10 },
    );
  });

  test('bad plane fields are refused at preparation, naming the field', () => {
    const good = { surfaceTilt: 90, surfaceAzimuth: 180, groundAlbedo: 0.2, skyModel: 'perez1990' as SkyModel };
    for (const [field, value] of [['surfaceTilt', 181], ['surfaceAzimuth', -1], ['groundAlbedo', 2], ['skyModel', 'cloudy'], ['shade.horizon', 1.5]] as const) {
      let caught: unknown;
      try {
        const input = field === 'shade.horizon' ? { ...good, shade: { isotropic: 1, horizon: value, ground: 1 } } : { ...good, [field]: value };
        preparePlane(input as typeof good);
      } catch (err) {
        caught = err;
      }
      expect(caught).toBeInstanceOf(SunpaneError);
      expect((caught as SunpaneError).argument).toBe(field);
    }
  });
});

describe('Perez kernel equals perezParts', () => {
  test('every intermediate value, over random skies including no diffuse and the sun at or below the horizon', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 180, noNaN: true }),
        fc.double({ min: 0, max: 360, noNaN: true }),
        fc.oneof(fc.constant(0), fc.double({ min: 0, max: 2000, noNaN: true })),
        fc.double({ min: 0, max: 2000, noNaN: true }),
        fc.double({ min: 1000, max: 1500, noNaN: true }),
        fc.oneof(fc.constantFrom(0, 90, 89.999, 120), fc.double({ min: 0, max: 180, noNaN: true })),
        fc.double({ min: 0, max: 360, noNaN: true }),
        fc.double({ min: 1, max: 40, noNaN: true }),
        (tilt, surfAz, dhi, dni, e0, zenith, sunAz, m) => {
          const p = perezParts(tilt, surfAz, dhi, dni, e0, zenith, sunAz, m);
          const tiltRad = tilt * RAD;
          const cosTheta = zenith < 90 ? Math.cos(incidenceAngle(90 - zenith, sunAz, tilt, surfAz) * RAD) : 0;
          const out = { epsilon: 0, delta: 0, bin: 0, f1: 0, f2: 0, isotropic: 0, circumsolar: 0, horizon: 0, total: 0 };
          perezPartsKernel(out, (1 + Math.cos(tiltRad)) / 2, Math.sin(tiltRad), dhi, dni, e0, zenith, Math.cos(zenith * RAD), m, cosTheta, PEREZ_1990_COMPOSITE);
          for (const key of Object.keys(p) as (keyof typeof p)[]) must(closeTo(out[key], p[key], dhi + dni), () => `${key}: kernel ${out[key]}, perezParts ${p[key]}`);
        },
      ),
      { numRuns: 2000, seed: 10 },
    );
  });
});

describe('unrolled and unchecked helpers equal their plain definitions', () => {
  test('perezBin is 1 + the number of bin edges at or below ε, at every edge, either side of it, and for NaN', () => {
    const byCount = (e: number) => 1 + PEREZ_EPSILON_EDGES.filter((edge) => e >= edge).length;
    const values = [Number.NaN, -1, 0, 1, Infinity, ...PEREZ_EPSILON_EDGES.flatMap((e) => [e, e * (1 - 1e-15), e * (1 + 1e-15), e - 0.01, e + 0.01])];
    for (let e = 0.9; e < 8; e += 0.001) values.push(e);
    const found = new Mismatches();
    for (const e of values) {
      const want = Number.isNaN(e) ? 1 : byCount(e);
      found.check(perezBin(e) === want, () => `ε ${e}: bin ${perezBin(e)}, by count ${want}`);
    }
    expect(found.list).toEqual([]);
  });

  test('the unchecked Kasten–Young air mass equals Eq. 3 written with Math.pow within 1e-14 relative, and the checked one is it', () => {
    const found = new Mismatches();
    for (let alt = -10; alt <= 90; alt += 0.01) {
      const beta = Math.max(alt, 0);
      const eq3 = 1 / (Math.sin(beta * RAD) + 0.50572 * Math.pow(beta + 6.07995, -1.6364));
      const m = airMassKastenYoungUnchecked(alt);
      found.check(Math.abs(m - eq3) <= 1e-14 * eq3, () => `${alt}°: unchecked ${m}, Eq. 3 ${eq3}`);
      found.check(Object.is(airMassKastenYoung(alt), m), () => `${alt}°: checked ${airMassKastenYoung(alt)}, unchecked ${m}`);
      if (alt > 0) found.check(Object.is(airMassKastenYoungFromSine(alt, Math.sin(alt * RAD)), m), () => `${alt}°: from the sine ${airMassKastenYoungFromSine(alt, Math.sin(alt * RAD))}, unchecked ${m}`);
    }
    expect(found.list).toEqual([]);
    // Random altitudes between the grid points and at the series' nodes and midpoints (90/256° apart).
    fc.assert(
      fc.property(fc.oneof(fc.double({ min: 0, max: 90, noNaN: true }), fc.integer({ min: 0, max: 512 }).map((k) => (k * 90) / 512)), (alt) => {
        const eq3 = 1 / (Math.sin(alt * RAD) + 0.50572 * Math.pow(alt + 6.07995, -1.6364));
        const m = airMassKastenYoungUnchecked(alt);
        must(Math.abs(m - eq3) <= 1e-14 * eq3, () => `${alt}°: unchecked ${m}, Eq. 3 ${eq3}`);
      }),
      { numRuns: 5000, seed: 13 },
    );
  });
});

describe('shadow union with bounding boxes equals the union without them', () => {
  test('random convex quadrilaterals (parallelograms with axis-aligned edges and general ones), overlapping or apart', () => {
    // Coordinates on a 1e-6 grid: shadow-sized figures (subnormal edge lengths, which no shadow has,
    // would lose their normals to underflow).
    const coordinate = (min: number, max: number) => fc.integer({ min: min * 1e6, max: max * 1e6 }).map((v) => v / 1e6);
    const quad = fc.record({
      x: coordinate(-2, 3),
      y: coordinate(-2, 3),
      ux: coordinate(-2, 2),
      uy: fc.oneof(fc.constant(0), coordinate(-2, 2)),
      vx: fc.oneof(fc.constant(0), coordinate(-2, 2)),
      vy: coordinate(-2, 2),
    });
    fc.assert(
      fc.property(fc.array(quad, { minLength: 0, maxLength: 3 }), (quads) => {
        const planes = new Float64Array(36);
        const boxes = new Float64Array(12);
        let m = 0;
        for (const q of quads) {
          // Parallelogram (x, y), +u, +u+v, +v: convex; axis-aligned edges when uy or vx is 0.
          if (writeQuadHalfPlanes(planes, m * 4, q.x, q.y, q.x + q.ux, q.y + q.uy, q.x + q.ux + q.vx, q.y + q.uy + q.vy, q.x + q.vx, q.y + q.vy, boxes)) m++;
        }
        const plain = unionAreaInRectangle(0, 0, 2, 1.5, planes, m);
        const boxed = unionAreaInRectangle(0, 0, 2, 1.5, planes, m, boxes);
        must(Math.abs(plain - boxed) <= EQUAL * 3, () => `without boxes ${plain}, with them ${boxed}`);
      }),
      { numRuns: 3000, seed: 11 },
    );
  });
});

/**
 * The sunlit fraction by the general convex clipper: the shadow parallelograms built here from their
 * vertices (module comment of src/core/shading/sunlit.ts), united by inclusion–exclusion of convex clips
 * (`unionAreaInRectangle`) — the method the closed form replaced, kept as its independent check.
 */
function sunlitByClipping(width: number, height: number, shading: Shading, altitude: number, gamma: number): number {
  if (!(altitude > 0) || gamma <= -90 || gamma >= 90) return 0;
  const betaRad = altitude * RAD;
  const gammaRad = gamma * RAD;
  const sz = Math.cos(betaRad) * Math.cos(gammaRad);
  if (!(sz > 0)) return 0;
  const a = (Math.cos(betaRad) * Math.sin(gammaRad)) / sz;
  const b = Math.sin(betaRad) / sz;
  const r = shading.revealDepth ?? 0;
  const x0 = Math.max(0, a * r);
  const x1 = Math.min(width, width + a * r);
  const y0 = Math.max(0, b * r);
  const y1 = Math.min(height, height + b * r);
  if (!(x1 > x0 && y1 > y0)) return 0;
  const planes = new Float64Array(36);
  let m = 0;
  const oh = shading.overhang;
  if (oh && oh.projection > 0) {
    const y = height + oh.gap;
    const xl = -oh.extensionLeft;
    const xr = width + oh.extensionRight;
    const dx = -a * oh.projection;
    const dy = -b * oh.projection;
    if (writeQuadHalfPlanes(planes, m * 4, xl, y, xr, y, xr + dx, y + dy, xl + dx, y + dy)) m++;
  }
  for (const [fin, x] of [
    [shading.leftFin, -(shading.leftFin?.gap ?? 0)],
    [shading.rightFin, width + (shading.rightFin?.gap ?? 0)],
  ] as const) {
    if (!fin || !(fin.projection > 0)) continue;
    const yb = -fin.extensionBelow;
    const yt = height + fin.extensionAbove;
    const dx = -a * fin.projection;
    const dy = -b * fin.projection;
    if (writeQuadHalfPlanes(planes, m * 4, x, yb, x, yt, x + dx, yt + dy, x + dx, yb + dy)) m++;
  }
  const lit = (x1 - x0) * (y1 - y0);
  return Math.min(1, Math.max(0, (lit - unionAreaInRectangle(x0, y0, x1, y1, planes, m)) / (width * height)));
}

/** Evenly spread length [m] on a 1 mm grid (fc.double favours the ends of its range). */
const even = (min: number, max: number) => fc.integer({ min: Math.round(min * 1000), max: Math.round(max * 1000) }).map((k) => k / 1000);
/** Devices drawn evenly, so that overhang and fin shadows overlap inside the window often. */
const evenShadingArb: fc.Arbitrary<Shading> = fc.record(
  {
    overhang: fc.record({ projection: even(0, 2), gap: even(0, 1), extensionLeft: even(-0.5, 2), extensionRight: even(-0.5, 2) }),
    leftFin: fc.record({ projection: even(0, 2), gap: even(0, 1), extensionAbove: even(-0.5, 2), extensionBelow: even(-0.5, 2) }),
    rightFin: fc.record({ projection: even(0, 2), gap: even(0, 1), extensionAbove: even(-0.5, 2), extensionBelow: even(-0.5, 2) }),
    revealDepth: fc.oneof(fc.constant(0), even(0, 0.5)),
  },
  { requiredKeys: [] },
);

describe('closed-form shadow union equals the general convex clipper', () => {
  test('over thousands of random windows, devices (one, two or three, overlapping or apart), reveals and suns in front', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        fc.double({ min: 0.2, max: 3, noNaN: true }),
        fc.oneof({ arbitrary: evenShadingArb, weight: 4 }, { arbitrary: shadingArb.map(({ skyline: _skyline, ...rest }) => rest), weight: 1 }),
        // Mostly evenly spread suns (fc.double favours the ends of its range), plus the edge cases.
        fc.oneof(
          { arbitrary: fc.integer({ min: 1, max: 89_999 }).map((k) => k / 1000), weight: 4 },
          { arbitrary: fc.oneof(fc.constantFrom(1e-6, 0.01, 45, 89.9999), fc.double({ min: 1e-6, max: 89.9999, noNaN: true })), weight: 1 },
        ),
        fc.oneof(
          { arbitrary: fc.integer({ min: -89_999, max: 89_999 }).map((k) => k / 1000), weight: 4 },
          { arbitrary: fc.oneof(fc.constantFrom(0, 1e-9, -1e-9, 89.9999, -89.9999), fc.double({ min: -89.9999, max: 89.9999, noNaN: true })), weight: 1 },
        ),
        (width, height, shading, altitude, gamma) => {
          if (shading.overhang && width + shading.overhang.extensionLeft + shading.overhang.extensionRight < 0) return;
          for (const fin of [shading.leftFin, shading.rightFin]) if (fin && height + fin.extensionAbove + fin.extensionBelow < 0) return;
          const sunAzimuth = 180 - gamma;
          const closed = sunlitFraction({ width, height }, shading, altitude, sunAzimuth, 180);
          // γ as the kernel forms it from the two azimuths (180 − (180 − γ) need not be γ exactly).
          const clipped = sunlitByClipping(width, height, shading, altitude, wrap180(180 - sunAzimuth));
          must(Math.abs(closed - clipped) <= EQUAL, () => `closed form ${closed}, clipper ${clipped}`);
        },
      ),
      { numRuns: 10000, seed: 12 },
    );
  });

  test('every hour of the year of the benchmark-like window (overhang, two fins, reveal) agrees, and most hours are part-shaded', () => {
    const shading: Shading = {
      overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.3 },
      leftFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
      rightFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
      revealDepth: 0.1,
    };
    let partial = 0;
    const found = new Mismatches();
    for (let altitude = 0.5; altitude < 90; altitude += 1.5) {
      for (let gamma = -89.5; gamma < 90; gamma += 1.5) {
        const closed = sunlitFraction({ width: 2, height: 1.5 }, shading, altitude, 200 - gamma, 200);
        const clipped = sunlitByClipping(2, 1.5, shading, altitude, wrap180(200 - (200 - gamma)));
        found.check(Math.abs(closed - clipped) <= EQUAL, () => `altitude ${altitude}°, γ ${gamma}°: closed form ${closed}, clipper ${clipped}`);
        if (closed > 0 && closed < 1) partial++;
      }
    }
    expect(found.list).toEqual([]);
    expect(partial).toBeGreaterThan(1000);
  });
});

describe('annual series hour by hour equals the checked functions at its own sun', () => {
  test('sunlit fraction and plane irradiance of every hour of a shaded Perez window', () => {
    const spec = shadedSpec();
    const s = annualSeries(spec);
    const w = prepareWindow(spec);
    let front = 0;
    const found = new Mismatches();
    for (let i = 0; i < s.hours; i++) {
      const alt = s.sunAltitude[i];
      const az = s.sunAzimuth[i];
      const inFront = alt > 0 && s.incidence[i] < 90;
      const lit = inFront ? sunlitFraction({ width: spec.width, height: spec.height }, spec.shading, alt, az, spec.surfaceAzimuth) : 0;
      found.check(Math.abs(s.sunlitFraction[i] - lit) <= EQUAL, () => `hour ${i}: sunlit fraction ${s.sunlitFraction[i]}, sunlitFraction ${lit}`);
      if (inFront) front++;
      const dark = s.dhi[i] === 0 && (s.dni[i] === 0 || !(alt > 0));
      if (dark) continue;
      const p = planeIrradiance({
        dni: alt > 0 ? s.dni[i] : 0,
        dhi: s.dhi[i],
        sunAltitude: alt,
        sunAzimuth: az,
        surfaceTilt: spec.surfaceTilt,
        surfaceAzimuth: spec.surfaceAzimuth,
        groundAlbedo: spec.groundAlbedo,
        dayOfYear: Math.floor(i / 24) + 1,
        skyModel: spec.skyModel ?? 'perez1990',
        shade: { ...w.shade, circumsolar: circumsolarShade(w, lit) },
      });
      const scale = s.dni[i] + s.dhi[i];
      for (const key of ['beam', 'sky', 'ground', 'skyUnshaded', 'groundUnshaded'] as const) {
        found.check(closeTo(s[key][i], p[key], scale), () => `hour ${i} ${key}: series ${s[key][i]}, planeIrradiance ${p[key]}`);
      }
      found.check(Math.abs(s.incidence[i] - p.incidence) < 1e-9, () => `hour ${i}: incidence ${s.incidence[i]}, planeIrradiance ${p.incidence}`);
    }
    expect(found.list).toEqual([]);
    expect(front).toBeGreaterThan(2000);
  });

  test('incidence and profile angle of every hour, day and night, equal the checked functions within 1e-12 °', () => {
    for (const surfaceAzimuth of [0, 90, 200, 315]) {
      const spec = { ...shadedSpec(), surfaceAzimuth };
      const s = annualSeries(spec);
      let behind = 0;
      const found = new Mismatches();
      for (let i = 0; i < s.hours; i++) {
        const alt = s.sunAltitude[i];
        const az = s.sunAzimuth[i];
        const profile = profileAngle(alt, az, surfaceAzimuth);
        const incidence = incidenceAngle(alt, az, spec.surfaceTilt, surfaceAzimuth);
        found.check(Math.abs(s.profileAngle[i] - profile) <= 1e-12 * 180, () => `${surfaceAzimuth}° wall, hour ${i}: profile angle ${s.profileAngle[i]}, profileAngle ${profile}`);
        found.check(Math.abs(s.incidence[i] - incidence) <= 1e-9, () => `${surfaceAzimuth}° wall, hour ${i}: incidence ${s.incidence[i]}, incidenceAngle ${incidence}`);
        if (Math.abs(s.profileAngle[i]) > 90) behind++;
      }
      expect(found.list).toEqual([]);
      expect(behind).toBeGreaterThan(1000);
    }
  });
});
