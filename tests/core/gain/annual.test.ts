/**
 * The annual hourly series and its summary. The per-hour calculation is checked against the
 * one-hour path (windowGainAt), whose equation is checked by hand in windowGain.test.ts against the SHGC
 * definition (ASHRAE Handbook—Fundamentals (2013) ch. 15, from memory). Row count and stamping
 * follow docs/conventions.md#hourly-rows; the calendar facts (2028 is a leap year with 8784
 * hours; 1 January 01:00 ends the first hour) are the Gregorian calendar's.
 */
import { SunpaneError } from '../../../src/core/common/errors';
import { annualSeries } from '../../../src/core/gain/annual';
import { summarizeAnnual } from '../../../src/core/gain/annualSummary';
import { gainOfPrepared, windowGainAt } from '../../../src/core/gain/windowGain';
import { prepareWindow } from '../../../src/core/gain/prepared';
import { ashraeClearSky } from '../../../src/core/sky/clearSky';
import { annualSunPath } from '../../../src/core/sun/sunPath';
import { civilToSerial } from '../../../src/core/time/calendar';
import { skylineSkyViewFactor } from '../../../src/core/shading/skyline';
import { baseSpec, shadedSpec } from './gainFixtures';

/** Synthetic measured weather: clear-sky DNI/DHI at the mid-hour sun, scaled down on some days. */
function syntheticWeather(year: number, site = baseSpec().site) {
  const path = annualSunPath(year, site);
  const dni = new Float64Array(path.hours);
  const dhi = new Float64Array(path.hours);
  for (let i = 0; i < path.hours; i++) {
    const doy = Math.floor(i / 24) + 1;
    const c = ashraeClearSky(path.altitude[i], doy, 0.4, 2.3);
    const cloud = doy % 5 === 0 ? 0.3 : 1;
    dni[i] = c.dni * cloud;
    dhi[i] = c.dhi * (2 - cloud);
  }
  return { dni, dhi };
}

describe('annual series', () => {
  test('a common year has 8760 rows stamped at the end of each hour', () => {
    const s = annualSeries(baseSpec());
    expect(s.hours).toBe(8760);
    expect(s.gain.length).toBe(8760);
    expect(s.stampSerial[0]).toBeCloseTo(civilToSerial(2026, 1, 1, 1), 9);
    expect(s.stampSerial[8759]).toBeCloseTo(civilToSerial(2027, 1, 1, 0), 9);
  });

  test('a leap year has 8784 rows; a typical year of 8760 rows repeats 28 February for 29 February, and other row counts are refused', () => {
    const spec = baseSpec({ year: 2028 });
    expect(annualSeries(spec).hours).toBe(8784);
    const dni = Float64Array.from({ length: 8760 }, (_, i) => (i % 24 === 12 ? 500 + Math.floor(i / 24) : 0));
    const typical = annualSeries(baseSpec({ year: 2028, weather: { kind: 'measured', dni, dhi: new Float64Array(8760) } }));
    expect(typical.hours).toBe(8784);
    expect(typical.yearFit).toMatch(/29 February repeats 28 February/);
    expect(typical.dni[58 * 24 + 12]).toBe(500 + 58); // 28 February, day index 58
    expect(typical.dni[59 * 24 + 12]).toBe(500 + 58); // 29 February: the same row again
    expect(typical.dni[60 * 24 + 12]).toBe(500 + 59); // 1 March: the file's own 1 March
    const bad = baseSpec({ year: 2028, weather: { kind: 'measured', dni: new Float64Array(8000), dhi: new Float64Array(8000) } });
    expect(() => annualSeries(bad)).toThrow(SunpaneError);
    expect(() => annualSeries(bad)).toThrow(/^weather\.dni = "8000 rows" is not allowed: must hold one value per hour of the year: 8784 for 2028/);
  });

  test('a leap-year file of 8784 rows for a common year drops its 29 February', () => {
    const dni = Float64Array.from({ length: 8784 }, (_, i) => (i % 24 === 12 ? 500 + Math.floor(i / 24) : 0));
    const s = annualSeries(baseSpec({ year: 2026, weather: { kind: 'measured', dni, dhi: new Float64Array(8784) } }));
    expect(s.hours).toBe(8760);
    expect(s.yearFit).toMatch(/29 February is dropped/);
    expect(s.dni[58 * 24 + 12]).toBe(500 + 58);
    expect(s.dni[59 * 24 + 12]).toBe(500 + 60); // 1 March takes the file's 1 March (day index 60)
  });

  test('the one-hour gain at every row stamp is that row, to the last bit, under either time convention', () => {
    for (const timeConvention of ['hourEnding', 'instant'] as const) {
      const spec = shadedSpec({ timeConvention });
      const s = annualSeries(spec);
      for (let i = 0; i < s.hours; i++) {
        const h = windowGainAt(spec, s.stampSerial[i]);
        if (h.gain.total !== s.gain[i] || h.sunAltitude !== s.sunAltitude[i] || h.sunlitFraction !== s.sunlitFraction[i] || h.row !== i) {
          throw new Error(`${timeConvention} row ${i}: one-hour ${h.gain.total} W, annual ${s.gain[i]} W`);
        }
      }
      // the stamps: hour ending 01:00 … 24:00, or instants 00:00 … 23:00
      expect(s.stampSerial[0]).toBeCloseTo(civilToSerial(2026, 1, 1, timeConvention === 'hourEnding' ? 1 : 0), 9);
      expect(windowGainAt(spec, s.stampSerial[4000]).dateTime).toBeCloseTo(s.stampSerial[4000] - (timeConvention === 'hourEnding' ? 1 / 48 : 0), 12);
    }
  });

  test('with daylight saving and conduction, the one-hour gain at every clock stamp is that row, under either time convention', () => {
    // clocks forward 29 March 2026 02:00, back 25 October 03:00 (daylight time), by 1 h
    const daylightSaving = { start: civilToSerial(2026, 3, 29, 2), end: civilToSerial(2026, 10, 25, 3), shift: 1 };
    for (const timeConvention of ['hourEnding', 'instant'] as const) {
      const spec = shadedSpec({
        timeConvention,
        site: { ...shadedSpec().site, daylightSaving },
        indoorTemperature: 24,
        glazing: { shgc: 0.4, panes: 2, type: 'coated', typeParameter: 4, uValue: 1.6 },
        weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [33], dailyRange: [11] },
      });
      const s = annualSeries(spec);
      expect(s.timeConvention).toBe(timeConvention);
      for (let i = 0; i < s.hours; i += 7) {
        const h = windowGainAt(spec, s.clockStamp[i]);
        if (h.row !== i || h.gain.total !== s.gain[i] || h.gain.conduction !== s.conduction[i] || h.outdoorTemperature !== s.dryBulb[i]) {
          throw new Error(`${timeConvention} row ${i}: one-hour row ${h.row}, ${h.gain.total} W / ${h.gain.conduction} W, annual ${s.gain[i]} W / ${s.conduction[i]} W`);
        }
      }
      // July: clock time runs one hour ahead of the rows' standard-time stamps
      const july = 181 * 24 + 12;
      expect(s.clockStamp[july] - s.stampSerial[july]).toBeCloseTo(1 / 24, 9);
    }
  });

  test('agrees with the direct one-hour calculation (full SPA at mid-hour) (shaded window, Perez sky, clear sky)', () => {
    const spec = shadedSpec();
    const s = annualSeries(spec);
    let daylight = 0;
    for (let i = 5; i < s.hours; i += 53) {
      // the direct path: the sun by the full SPA at mid-hour
      const h = gainOfPrepared(prepareWindow(spec), s.stampSerial[i] - 1 / 48, undefined, s.stampSerial[i]);
      expect(h.row).toBeUndefined();
      // The annual sun path interpolates the SPA's slow terms (≤ 1e-4° from the direct algorithm),
      // so angles agree to about 1e-4° and the gain to a small fraction of a watt.
      expect(s.sunAltitude[i]).toBeCloseTo(h.sunAltitude, 3);
      expect(s.incidence[i]).toBeCloseTo(h.incidence, 3);
      expect(s.sunlitFraction[i]).toBeCloseTo(h.sunlitFraction, 3);
      expect(s.beam[i]).toBeCloseTo(h.beam, 1);
      expect(s.sky[i]).toBeCloseTo(h.sky, 1);
      expect(s.ground[i]).toBeCloseTo(h.ground, 1);
      expect(s.gain[i]).toBeCloseTo(h.gain.total, 0);
      if (h.gain.total > 0) daylight++;
    }
    expect(daylight).toBeGreaterThan(40);
  });

  test('agrees with the one-hour calculation for measured and for global-horizontal weather', () => {
    const { dni, dhi } = syntheticWeather(2026);
    const ghi = new Float64Array(dni.length);
    const path = annualSunPath(2026, baseSpec().site);
    for (let i = 0; i < ghi.length; i++) ghi[i] = dni[i] * Math.max(0, Math.sin((path.altitude[i] * Math.PI) / 180)) + dhi[i];
    for (const weather of [{ kind: 'measured' as const, dni, dhi }, { kind: 'globalHorizontal' as const, ghi }]) {
      const spec = shadedSpec({ weather, skyModel: 'hayDavies' });
      const s = annualSeries(spec);
      for (let i = 7; i < s.hours; i += 97) {
        const h = gainOfPrepared(prepareWindow(spec), s.stampSerial[i] - 1 / 48, undefined, s.stampSerial[i]);
        expect(s.dni[i]).toBeCloseTo(h.dni, 1);
        expect(s.dhi[i]).toBeCloseTo(h.dhi, 1);
        expect(s.gain[i]).toBeCloseTo(h.gain.total, 0);
      }
    }
  });

  test('missing hours are flagged, zero, and counted by the summary', () => {
    const { dni, dhi } = syntheticWeather(2026);
    const missing = [100, 101, 4000, 8759];
    for (const i of missing) dni[i] = Number.NaN;
    dhi[5000] = Number.POSITIVE_INFINITY;
    const s = annualSeries(baseSpec({ weather: { kind: 'measured', dni, dhi } }));
    for (const i of [...missing, 5000]) {
      expect(s.missing[i]).toBe(1);
      expect(s.gain[i]).toBe(0);
    }
    const sum = summarizeAnnual(s);
    expect(sum.missingHours).toBe(5);
    expect(sum.monthlyMissingHours[0]).toBe(2); // hours 100, 101: 5 January
    expect(sum.monthlyMissingHours[11]).toBe(1); // hour 8759: 31 December 23:00–24:00
    expect(sum.monthlyMissingHours.reduce((a, b) => a + b, 0)).toBe(5);
  });

  test('the summary equals the sums of its series', () => {
    const s = annualSeries(shadedSpec());
    const sum = summarizeAnnual(s);
    let total = 0;
    let peak = 0;
    let peakAt = 0;
    let sunlitHours = 0;
    const monthly = new Array(12).fill(0);
    for (let i = 0; i < s.hours; i++) {
      total += s.gain[i];
      if (s.gain[i] > peak) [peak, peakAt] = [s.gain[i], i];
      if (s.beam[i] > 0 && s.sunlitFraction[i] > 0) sunlitHours++;
    }
    // January: rows 0…743 (31 days × 24 h); the row ending 1 February 00:00 is January's last.
    for (let i = 0; i < 744; i++) monthly[0] += s.gain[i];
    expect(sum.annualKWh).toBeCloseTo(total / 1000, 6);
    expect(sum.monthlyKWh.reduce((a, b) => a + b, 0)).toBeCloseTo(sum.annualKWh, 9);
    expect(sum.monthlyKWh[0]).toBeCloseTo(monthly[0] / 1000, 6);
    expect(sum.peakW).toBe(peak);
    expect(sum.peakStamp).toBe(s.stampSerial[peakAt]);
    expect(sum.sunlitHours).toBe(sunlitHours);
    expect(sum.meanSunlitFraction).toBeGreaterThan(0);
    expect(sum.meanSunlitFraction).toBeLessThan(1);
    expect(sum.missingHours).toBe(0);
  });

  test('shading lowers the annual gain and never raises an hour', () => {
    const bare = annualSeries(baseSpec());
    const shaded = annualSeries(shadedSpec());
    for (let i = 0; i < bare.hours; i++) expect(shaded.gain[i]).toBeLessThanOrEqual(bare.gain[i] + 1e-9);
    expect(summarizeAnnual(shaded).annualKWh).toBeLessThan(summarizeAnnual(bare).annualKWh);
  });

  test('twelve monthly clear-sky values are used month by month', () => {
    const tauB = [0.3, 0.3, 0.3, 0.3, 0.3, 0.3, 0.6, 0.6, 0.6, 0.6, 0.6, 0.6];
    const s = annualSeries(baseSpec({ weather: { kind: 'ashraeClearSky', tauB, tauD: new Array(12).fill(2.3) } }));
    const one = annualSeries(baseSpec({ weather: { kind: 'ashraeClearSky', tauB: [0.3], tauD: [2.3] } }));
    const noonJan = 14 * 24 + 12;
    const noonJul = (181 + 14) * 24 + 12;
    expect(s.dni[noonJan]).toBe(one.dni[noonJan]);
    expect(s.dni[noonJul]).toBeLessThan(one.dni[noonJul]);
  });
});

describe('diffuse shading in the annual series (docs/diffuse-shading.md)', () => {
  test('the sky and ground reaching the glass are the bare window’s cut by the view factors; the beam is unchanged', () => {
    for (const skyModel of ['isotropic', 'hayDavies', 'perez1990'] as const) {
      const shaded = annualSeries(shadedSpec({ skyModel }));
      const bare = annualSeries(baseSpec({ skyModel }));
      const { skyViewRatio, groundViewRatio, horizonShare, diffuseShading } = shaded.diffuse;
      expect(diffuseShading).toBe('viewFactors');
      expect(skyViewRatio).toBeGreaterThan(0.3);
      expect(skyViewRatio).toBeLessThan(0.9);
      expect(groundViewRatio).toBeLessThan(1);
      expect(horizonShare).toBeLessThan(1);
      expect(bare.diffuse).toEqual({ skyViewRatio: 1, groundViewRatio: 1, horizonShare: 1, diffuseShading: 'viewFactors' });
      // Worst deviations over the year (one expect each: expect in a loop of 8760 is slow under Jest).
      let beam = 0;
      let unshaded = 0;
      let ground = 0;
      let above = 0;
      let isotropic = 0;
      for (let i = 0; i < shaded.hours; i++) {
        beam = Math.max(beam, Math.abs(shaded.beam[i] - bare.beam[i]));
        unshaded = Math.max(unshaded, Math.abs(shaded.skyUnshaded[i] - bare.sky[i]), Math.abs(shaded.groundUnshaded[i] - bare.ground[i]));
        ground = Math.max(ground, Math.abs(shaded.ground[i] - bare.ground[i] * groundViewRatio));
        above = Math.max(above, shaded.sky[i] - bare.sky[i]);
        isotropic = Math.max(isotropic, Math.abs(shaded.sky[i] - bare.sky[i] * skyViewRatio));
      }
      expect(beam).toBe(0);
      expect(unshaded).toBe(0);
      expect(ground).toBeLessThan(1e-9);
      expect(above).toBeLessThanOrEqual(1e-9);
      if (skyModel === 'isotropic') expect(isotropic).toBeLessThan(1e-9);
    }
  });

  test('"beamOnly" is the earlier treatment: the whole sky × the skyline’s sky view, the ground uncut', () => {
    const spec = shadedSpec({ diffuseShading: 'beamOnly' });
    const s = annualSeries(spec);
    const svf = skylineSkyViewFactor(spec.shading.skyline!, spec.surfaceAzimuth);
    expect(s.diffuse.diffuseShading).toBe('beamOnly');
    expect(s.diffuse.skyViewRatio).toBe(svf);
    let sky = 0;
    let ground = 0;
    for (let i = 0; i < s.hours; i++) {
      sky = Math.max(sky, Math.abs(s.sky[i] - s.skyUnshaded[i] * svf));
      ground = Math.max(ground, Math.abs(s.ground[i] - s.groundUnshaded[i]));
    }
    expect(sky).toBeLessThan(1e-9);
    expect(ground).toBe(0);
    // and the devices now take more than that away
    expect(summarizeAnnual(annualSeries(shadedSpec())).annualKWh).toBeLessThan(summarizeAnnual(s).annualKWh);
  });

  test('a bad diffuseShading is refused naming it', () => {
    expect(() => annualSeries(baseSpec({ diffuseShading: 'none' as never }))).toThrow(SunpaneError);
    try {
      annualSeries(baseSpec({ diffuseShading: 'none' as never }));
    } catch (err) {
      expect((err as SunpaneError).argument).toBe('diffuseShading');
    }
  });
});

describe('the beam and diffuse cuts of the summary', () => {
  test('a bare window cuts nothing; an overhang cuts the isotropic sky by its view ratio and no ground', () => {
    const bare = summarizeAnnual(annualSeries(baseSpec({ skyModel: 'isotropic' })));
    expect(bare.beamCut).toBe(0);
    expect(bare.diffuseCut).toBe(0);
    const series = annualSeries(baseSpec({ skyModel: 'isotropic', shading: { overhang: { projection: 1, gap: 0.1, extensionLeft: 0.5, extensionRight: 0.5 } } }));
    const s = summarizeAnnual(series);
    let sky = 0;
    let ground = 0;
    for (let i = 0; i < series.hours; i++) {
      sky += series.skyUnshaded[i];
      ground += series.groundUnshaded[i];
    }
    // Isotropic sky: the kept diffuse is ratio × sky + ground, so the cut is (1 − ratio) × sky share.
    expect(s.diffuseCut).toBeCloseTo(((1 - series.diffuse.skyViewRatio) * sky) / (sky + ground), 9);
    expect(s.beamCut).toBeGreaterThan(0.1);
    expect(s.beamCut).toBeLessThan(1);
  });
});
