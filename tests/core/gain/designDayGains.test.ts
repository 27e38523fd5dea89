/**
 * Design-day gains (src/core/gain/designDay.ts) beyond the peaks tested in tests/core/load/designDay:
 * every hour of a design day is the one-hour gain of its stamp, by part; the peak is the earliest
 * of equal hours; a polar-night day has no gain at all; the peak's clock stamp follows the
 * daylight-saving rule; the clear-sky option is refused by its own name.
 *
 * Sources: the documented equality with the one-hour path (windowGainAt, itself checked against the
 * published methods in tests/reference/), the clock rule's definition (clock = standard + shift inside
 * the period), and geometry: at 80° N on 21 December the sun stays below the horizon all day (its
 * declination is about −23.4°, so its noon altitude is 90 − 80 − 23.4 < 0; from memory).
 */
import { designDayGains, peakOfDay } from '../../../src/core/gain/designDay';
import { windowGainAt } from '../../../src/core/gain/windowGain';
import { civilToSerial } from '../../../src/core/time/calendar';
import { refusalMessage } from '../../support/expectError';
import { baseSpec } from './gainFixtures';

describe('design-day gains', () => {
  test('the peak is the earliest of equal largest values; an empty day has peak 0 at index 0', () => {
    expect(peakOfDay([3, 5, 5, 1])).toEqual({ index: 1, value: 5 });
    expect(peakOfDay([0, 0, 0])).toEqual({ index: 0, value: 0 });
    expect(peakOfDay([-1, -2])).toEqual({ index: 0, value: -1 });
    expect(peakOfDay([])).toEqual({ index: 0, value: 0 });
  });

  test('each hour of a design day is the one-hour gain of its stamp, beam and diffuse apart, with the conduction and dry-bulb', () => {
    const spec = baseSpec({
      surfaceAzimuth: 230,
      glazing: { shgc: 0.6, panes: 2, uValue: 2.8 },
      indoorTemperature: 24,
      weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [31], dailyRange: [11] },
    });
    const { months, window } = designDayGains(spec, { day: 9 });
    expect(window.spec.name).toBe(spec.name);
    const july = months[6];
    expect([july.month, july.day]).toEqual([7, 9]);
    for (const h of [0, 7, 12, 16, 23]) {
      const hour = windowGainAt(spec, civilToSerial(2026, 7, 9) + (h + 1) / 24);
      expect(july.hourlyGain[h]).toBe(hour.gain.total);
      expect(july.hourlyBeam[h]).toBe(hour.gain.beam);
      expect(july.hourlyDiffuse[h]).toBe(hour.gain.sky + hour.gain.ground);
      expect(july.hourlyConduction[h]).toBe(hour.gain.conduction);
      expect(july.hourlyDryBulb[h]).toBe(hour.outdoorTemperature);
    }
    expect(july.hourlyDryBulb).toHaveLength(24);
    expect(Math.max(...july.hourlyDryBulb)).toBeCloseTo(31, 9);
  });

  test('polar night: no gain at any hour, so the peak is 0 at the first hour of either convention', () => {
    const polar = baseSpec({ site: { latitude: 80, longitude: 15, utcOffset: 1 }, weather: { kind: 'ineichenClearSky', linkeTurbidity: [3] } });
    const december = designDayGains(polar).months[11];
    expect(december.hourlyGain.every((g) => g === 0)).toBe(true);
    expect([december.peakHour, december.peakGain]).toEqual([1, 0]);
    expect(december.peakStamp).toBeCloseTo(civilToSerial(2026, 12, 21, 1), 12);
    expect(december.peakClockStamp).toBe(december.peakStamp); // no daylight-saving rule
    // Without a U-value there is no dry-bulb and no conduction.
    expect(december.hourlyDryBulb).toHaveLength(0); // toEqual([]) would let a list of undefined through
    expect(december.hourlyConduction.every((c) => c === 0)).toBe(true);
    const instant = designDayGains({ ...polar, timeConvention: 'instant' }).months[11];
    expect([instant.peakHour, instant.peakGain]).toEqual([0, 0]);
    expect(instant.peakStamp).toBe(civilToSerial(2026, 12, 21));
  });

  test('the peak on the clock: one hour later than standard time inside the daylight-saving period, the same outside it', () => {
    const rule = { start: civilToSerial(2026, 3, 29, 2), end: civilToSerial(2026, 10, 25, 3), shift: 1 };
    for (const timeConvention of ['hourEnding', 'instant'] as const) {
      const months = designDayGains(baseSpec({ surfaceAzimuth: 250, timeConvention, site: { ...baseSpec().site, daylightSaving: rule } })).months;
      expect(months[6].peakClockStamp - months[6].peakStamp).toBeCloseTo(1 / 24, 9);
      expect(months[0].peakClockStamp).toBeCloseTo(months[0].peakStamp, 9);
    }
  });

  test('a daylight-saving period starting inside the peak hour: an hour-ending peak goes on the clock by its hour\'s middle, an instant by itself', () => {
    // docs/conventions.md: an hour-ending row moves with its hour's middle; clock = standard + shift
    // inside the period (the rule's start is a standard-time reading).
    for (const timeConvention of ['hourEnding', 'instant'] as const) {
      const spec = baseSpec({ surfaceAzimuth: 250, timeConvention });
      const july = designDayGains(spec).months[6];
      const start = july.peakStamp - 15 / 1440; // 15 minutes before the peak's stamp
      const rule = { start, end: start + 30, shift: 1 };
      const onClock = designDayGains({ ...spec, site: { ...spec.site, daylightSaving: rule } }).months[6];
      expect(onClock.peakStamp).toBe(july.peakStamp);
      if (timeConvention === 'hourEnding') {
        // The hour's middle (30 minutes before its end) is before the start: standard time.
        expect(onClock.peakClockStamp).toBeCloseTo(july.peakStamp, 9);
      } else {
        expect(onClock.peakClockStamp).toBeCloseTo(july.peakStamp + 1 / 24, 9);
      }
    }
  });

  test('a peak well inside a daylight-saving period (begun 30 days before, ending 30 days after) is an hour later on the clock under either convention', () => {
    // The hour-ending stamp's move by its hour's middle is half an hour, not more: a period that began
    // 30 days earlier covers the peak either way (the mutation run left 1 · 48 for 1 / 48 alive).
    for (const timeConvention of ['hourEnding', 'instant'] as const) {
      const spec = baseSpec({ surfaceAzimuth: 250, timeConvention });
      const july = designDayGains(spec).months[6];
      const rule = { start: july.peakStamp - 30, end: july.peakStamp + 30, shift: 1 };
      const onClock = designDayGains({ ...spec, site: { ...spec.site, daylightSaving: rule } }).months[6];
      expect(onClock.peakStamp).toBe(july.peakStamp);
      expect(onClock.peakClockStamp).toBeCloseTo(july.peakStamp + 1 / 24, 9);
    }
  });

  test('a window without weather, or no window at all, is refused as weather.kind in the same words', () => {
    const words = 'weather.kind = blank is not allowed: design days need a clear-sky model ("ashraeClearSky" or "ineichenClearSky"); give one as the clearSky option';
    const refusal = (spec: unknown) => refusalMessage(() => designDayGains(spec as never)); // a TypeError fails the test
    expect(refusal({ ...baseSpec(), weather: undefined })).toBe(words);
    expect(refusal(undefined)).toBe(words);
    expect(refusal(null)).toBe(words);
  });

  test('a clear-sky option that is not a clear-sky model is refused as clearSky.kind; a bad day by its name and range', () => {
    expect(() => designDayGains(baseSpec(), { clearSky: { kind: 'measured', dni: [], dhi: [] } as never })).toThrow(
      /^clearSky\.kind = "measured" is not allowed: design days need a clear-sky model \("ashraeClearSky" or "ineichenClearSky"\); give one as the clearSky option$/,
    );
    expect(() => designDayGains(baseSpec(), { day: 0 })).toThrow(/^day = 0 is not allowed: must be a whole number from 1 to 28$/);
    expect(() => designDayGains(baseSpec(), { day: 2.5 })).toThrow(/^day = 2\.5 is not allowed/);
    expect(designDayGains(baseSpec(), { day: 28 }).months[1].day).toBe(28);
  });
});
