/**
 * Windows sharing their site's sun and weather (src/core/gain/sharedYear.ts): a window's year and
 * summary from a shared year are the same numbers, to the last bit, as from its own year
 * (annualSeries, which the annual tests hold to the one-hour path); shared years are kept once per
 * site, year and weather, and a shared year of another site is refused. The windows are invented
 * test inputs (tests/core/gain/gainFixtures.ts).
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { annualOfPrepared, annualSeries } from '../../../src/core/gain/annual';
import { summarizeAnnual, summarizeWindowYear } from '../../../src/core/gain/annualSummary';
import { SharedYears, sharedYearOf } from '../../../src/core/gain/sharedYear';
import type { WindowSpec } from '../../../src/core/gain/window';
import { prepareWindow } from '../../../src/core/gain/prepared';
import { ashraeClearSky } from '../../../src/core/sky/clearSky';
import { annualSunPath } from '../../../src/core/sun/sunPath';
import { civilToSerial } from '../../../src/core/time/calendar';
import { baseSpec, shadedSpec } from './gainFixtures';
import { Mismatches } from '../../support/mismatches';

const SITE = baseSpec().site;

function measured(year = 2026): { dni: Float64Array; dhi: Float64Array } {
  const path = annualSunPath(year, SITE);
  const dni = new Float64Array(path.hours);
  const dhi = new Float64Array(path.hours);
  for (let i = 0; i < path.hours; i++) {
    const c = ashraeClearSky(path.altitude[i], Math.floor(i / 24) + 1, 0.4, 2.3);
    // Some hours missing, some dark by day (a reading of zero): the hours a window's passes skip.
    const dark = i % 211 === 0;
    dni[i] = i % 97 === 0 ? NaN : dark ? 0 : c.dni * (i % 5 === 0 ? 0.4 : 1);
    dhi[i] = dark ? 0 : c.dhi;
  }
  return { dni, dhi };
}

/** The measured year and the dry-bulb series: built in beforeAll, not while jest collects the file (see below). */
let WEATHER: { dni: Float64Array; dhi: Float64Array };

/** A window's year worked out alone: its own sun path and weather, no shared or kept year. */
/**
 * Where two columns of hours differ (Object.is, as toEqual compares numbers), and a different length:
 * one expect per column instead of toEqual's deep walk over 8,760 numbers (tests/support/mismatches.ts).
 */
function differences(a: ArrayLike<number>, b: ArrayLike<number>): string[] {
  const found = new Mismatches();
  found.check(a.length === b.length, () => `${a.length} hours against ${b.length}`);
  for (let i = 0; i < Math.max(a.length, b.length); i++) found.check(Object.is(a[i], b[i]), () => `hour ${i}: ${a[i]} against ${b[i]}`);
  return found.list;
}

function ownYear(spec: WindowSpec) {
  return annualOfPrepared(prepareWindow(spec));
}
/** Outdoor dry-bulb [°C] for the window with a U-value: a daily swing, one hour missing. */
let DRY_BULB: Float64Array;

// Built before the tests, not at collection: work done while jest collects the file runs before any
// test, so a mutation run could tell neither which test needs the code nor kill a mutant there (it
// reported such mutants as runtime errors).
beforeAll(() => {
  WEATHER = measured();
  DRY_BULB = Float64Array.from({ length: 8760 }, (_, i) => (i === 4000 ? NaN : 12 + 8 * Math.sin((i / 24) * 2 * Math.PI)));
});

/** Windows of one site in several shapes: facings, tilt, shading, sky models, weathers, a U-value, daylight saving. */
function windows(): WindowSpec[] {
  return [
    baseSpec(),
    shadedSpec({ surfaceAzimuth: 90 }),
    shadedSpec({ surfaceAzimuth: 250, skyModel: 'hayDavies' }),
    baseSpec({ surfaceTilt: 30, surfaceAzimuth: 200, skyModel: 'isotropic' }),
    shadedSpec({ weather: { kind: 'measured', ...WEATHER } }),
    baseSpec({ surfaceAzimuth: 0, weather: { kind: 'measured', ...WEATHER, dryBulb: DRY_BULB }, glazing: { shgc: 0.5, panes: 3, uValue: 1.4 }, indoorTemperature: 24 }),
    baseSpec({ weather: { kind: 'ineichenClearSky', linkeTurbidity: [3.1] }, site: { ...SITE, daylightSaving: { start: civilToSerial(2026, 3, 29, 2), end: civilToSerial(2026, 10, 25, 3), shift: 1 } } }),
    shadedSpec({ weather: { kind: 'globalHorizontal', ghi: WEATHER.dhi.map((d, i) => d + (Number.isNaN(WEATHER.dni[i]) ? 0 : WEATHER.dni[i] * 0.5)) } }),
  ];
}

describe('windows sharing their site year', () => {
  test('each window\'s summary from shared years is exactly its summary from its own year', () => {
    const years = new SharedYears();
    for (const spec of windows()) {
      const own = ownYear(spec);
      const shared = summarizeWindowYear(spec, years);
      expect(shared.summary).toEqual(summarizeAnnual(own));
      expect(shared.glassArea).toBe(own.glassArea);
    }
  });

  test('summaries added up while the hours are worked out (windows without a U-value) are bit for bit those of the window\'s own year, field by field', () => {
    // Every shading kind, facings round the compass (360 too), sky models, the beam-only treatment,
    // an interior shade, a leap year, the instant convention and each weather kind (the measured
    // series has missing and dark hours).
    const shadings: WindowSpec['shading'][] = [
      {},
      { overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.3 } },
      { leftFin: { projection: 0.4, gap: 0, extensionAbove: 0.2, extensionBelow: 0 } },
      { revealDepth: 0.15 },
      shadedSpec().shading,
    ];
    const specs: WindowSpec[] = [];
    shadings.forEach((shading, v) => {
      for (const surfaceAzimuth of [0, 90, 200, 315, 360]) specs.push(baseSpec({ shading, surfaceAzimuth, width: 1.2 + 0.1 * v, weather: { kind: 'ineichenClearSky', linkeTurbidity: [2.8, 3.0, 3.2, 3.4, 3.6, 3.7, 3.8, 3.7, 3.4, 3.2, 3.0, 2.8] } }));
    });
    specs.push(
      shadedSpec({ skyModel: 'hayDavies', diffuseShading: 'beamOnly' }),
      shadedSpec({ skyModel: 'isotropic', glazing: { shgc: 0.6, panes: 2, interiorAttenuation: 0.7 } }),
      shadedSpec({ skyModel: 'ashraeClearDay', surfaceAzimuth: 135 }),
      shadedSpec({ year: 2028 }),
      shadedSpec({ timeConvention: 'instant', surfaceAzimuth: 250 }),
      baseSpec({ surfaceTilt: 30, surfaceAzimuth: 200 }),
      ...windows().filter((w) => w.glazing.uValue === undefined),
    );
    const years = new SharedYears();
    for (const spec of specs) {
      const shared = summarizeWindowYear(spec, years).summary;
      const own = summarizeAnnual(ownYear(spec)) as unknown as Record<string, number | number[]>;
      const found = new Mismatches();
      for (const [k, v] of Object.entries(shared)) {
        const o = own[k];
        if (Array.isArray(v)) v.forEach((x, m) => found.check(Object.is(x, (o as number[])[m]), () => `${k}[${m}]: ${x} shared, ${(o as number[])[m]} own`));
        else found.check(Object.is(v, o), () => `${k}: ${String(v)} shared, ${String(o)} own`);
      }
      expect(found.list).toEqual([]);
      expect(Object.keys(shared).sort()).toEqual(Object.keys(own).sort());
    }
    // The measured series' missing hours are counted month by month.
    expect(summarizeWindowYear(windows()[4], years).summary.missingHours).toBeGreaterThan(0);
  });

  test('a window\'s hourly columns from a shared year are exactly those from its own year', () => {
    const years = new SharedYears();
    for (const spec of windows().slice(1, 6)) {
      const own = ownYear(spec);
      const w = prepareWindow(spec);
      const fromShared = annualOfPrepared(w, years.of(w));
      for (const k of ['incidence', 'profileAngle', 'sunlitFraction', 'dni', 'dhi', 'beam', 'sky', 'ground', 'shgc', 'gain', 'radiant', 'convective', 'conduction', 'missing', 'sunAltitude', 'stampSerial', 'clockStamp'] as const) {
        expect(differences(fromShared[k], own[k])).toEqual([]);
      }
    }
  });

  test('the shared year is worked out once per site, year and weather, and is never changed by a window', () => {
    const years = new SharedYears();
    const specs = windows();
    for (const spec of specs) summarizeWindowYear(spec, years);
    // ASHRAE clear sky (four windows, two sky models and a tilt), the measured series (two), the
    // turbidity clear sky (one; daylight saving moves only the clock), the global series (one).
    expect(years.size).toBe(4);
    const w = prepareWindow(specs[4]);
    const before = Array.from(years.of(w).dni);
    summarizeWindowYear(specs[5], years); // conduction adds missing hours to its own copy only
    expect(Array.from(years.of(w).dni)).toEqual(before);
    expect(Array.from(years.of(w).missing)).toEqual(Array.from(sharedYearOf(w).missing));
    const copy = { kind: 'measured' as const, dni: WEATHER.dni.slice(), dhi: WEATHER.dhi.slice() };
    summarizeWindowYear(baseSpec({ weather: copy }), years);
    expect(years.size).toBe(5); // another series object is another weather, whatever its values
  });

  test('a shared year of another site or year is refused', () => {
    const years = new SharedYears();
    const here = prepareWindow(baseSpec());
    const elsewhere = prepareWindow(baseSpec({ site: { ...SITE, latitude: 41 } }));
    expect(() => annualOfPrepared(elsewhere, years.of(here))).toThrow(SunpaneError);
    expect(() => annualOfPrepared(prepareWindow(baseSpec({ year: 2027 })), years.of(here))).toThrow(/not those of this window's site, year and weather/);
  });

  test('a supplied series changed in place is read again, never from the year kept for its old values', () => {
    const years = new SharedYears();
    const weather = { kind: 'measured' as const, dni: WEATHER.dni.slice(), dhi: WEATHER.dhi.slice() };
    const spec = shadedSpec({ weather });
    const before = summarizeWindowYear(spec, years).summary;
    weather.dni.fill(0); // an overcast year: only diffuse light
    const after = summarizeWindowYear(spec, years).summary;
    expect(after).toEqual(summarizeAnnual(ownYear(spec)));
    expect(after).not.toEqual(before);
    weather.dhi[5000] = NaN; // one hour missing now
    expect(summarizeWindowYear(spec, years).summary).toEqual(summarizeAnnual(ownYear(spec)));
    expect(years.size).toBe(1);
  });

  test('annualSeries keeps the last sites\' years: the same numbers as the window\'s own year, columns of its own', () => {
    for (const spec of windows()) {
      const first = annualSeries(spec);
      const again = annualSeries(spec);
      const own = ownYear(spec);
      for (const k of ['sunAltitude', 'sunAzimuth', 'stampSerial', 'clockStamp', 'dni', 'dhi', 'sunlitFraction', 'sky', 'gain', 'conduction', 'missing'] as const) {
        expect(differences(again[k], own[k])).toEqual([]);
      }
      // What one caller does to its series never reaches the next caller.
      first.sunAltitude.fill(-1);
      first.stampSerial.fill(0);
      first.dni.fill(0);
      first.missing.fill(1);
      const third = annualSeries(spec);
      expect(differences(third.sunAltitude, own.sunAltitude)).toEqual([]);
      expect(differences(third.stampSerial, own.stampSerial)).toEqual([]);
      expect(differences(third.gain, own.gain)).toEqual([]);
    }
  });

  test('the number of years kept is bounded (oldest dropped first)', () => {
    const years = new SharedYears(2);
    for (const latitude of [10, 20, 30]) years.of(prepareWindow(baseSpec({ site: { ...SITE, latitude } })));
    expect(years.size).toBe(2);
  });
});
