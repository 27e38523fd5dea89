/**
 * Design-day peaks. Checked against the one-hour path (windowGainAt) and the radiant time series
 * (Spitler, Fisher & Pedersen 1997, ASHRAE Trans. 103(2): 24-hour total conserved with Σ r = 1).
 * The east/west check rests on geometry alone: the sun is in the west after solar noon (about
 * 12:00–12:30 local standard time at this site, longitude −105° on the −7 h zone meridian).
 */
import { designDayPeaks } from '../../../src/core/load/designDay';
import { windowGainAt } from '../../../src/core/gain/windowGain';
import { civilToSerial } from '../../../src/core/time/calendar';
import { baseSpec, shadedSpec } from '../gain/gainFixtures';

const FACTORS = (() => {
  const raw = Array.from({ length: 24 }, (_, i) => 0.55 ** i);
  const s = raw.reduce((a, b) => a + b, 0);
  return raw.map((v) => v / s);
})();

describe('design-day peaks', () => {
  test('twelve months, each peak the largest of its 24 hourly gains and exactly the one-hour gain of its stamp', () => {
    const spec = shadedSpec({ surfaceAzimuth: 250 });
    const months = designDayPeaks(spec);
    expect(months.map((m) => m.month)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    for (const m of months) {
      expect(m.day).toBe(21);
      expect(m.hourlyGain).toHaveLength(24);
      expect(m.peakGain).toBe(Math.max(...m.hourlyGain));
      expect(m.peakStamp).toBeCloseTo(civilToSerial(2026, m.month, 21) + m.peakHour / 24, 12);
      expect(windowGainAt(spec, m.peakStamp).gain.total).toBe(m.peakGain);
    }
  });

  test('with the instant convention the hours are 00:00 … 23:00 and the peak is the gain at that instant', () => {
    const spec = shadedSpec({ surfaceAzimuth: 250, timeConvention: 'instant' });
    for (const m of designDayPeaks(spec)) {
      expect(m.peakHour).toBeGreaterThanOrEqual(0);
      expect(m.peakHour).toBeLessThanOrEqual(23);
      expect(m.peakStamp).toBeCloseTo(civilToSerial(2026, m.month, 21) + m.peakHour / 24, 12);
      expect(windowGainAt(spec, m.peakStamp).gain.total).toBe(m.peakGain);
      expect(windowGainAt(spec, m.peakStamp).dateTime).toBe(m.peakStamp);
    }
  });

  test('a west window peaks in the afternoon and an east window in the morning', () => {
    for (const m of designDayPeaks(baseSpec({ surfaceAzimuth: 270 }))) expect(m.peakHour).toBeGreaterThan(13);
    for (const m of designDayPeaks(baseSpec({ surfaceAzimuth: 90 }))) expect(m.peakHour).toBeLessThan(12);
  });

  test('with radiant time factors the cooling load keeps the day total and peaks no earlier', () => {
    const months = designDayPeaks(baseSpec({ surfaceAzimuth: 270, glazing: { shgc: 0.6, panes: 2, radiantFraction: 0.8 } }), { factors: FACTORS, day: 15 });
    for (const m of months) {
      expect(m.day).toBe(15);
      const gain = m.hourlyGain.reduce((a, b) => a + b, 0);
      const load = m.coolingLoad!.reduce((a, b) => a + b, 0);
      expect(load).toBeCloseTo(gain, 6);
      expect(m.peakLoad!).toBeLessThanOrEqual(m.peakGain + 1e-9);
      expect(m.peakLoadHour!).toBeGreaterThanOrEqual(m.peakHour);
    }
  });

  test('a measured-weather window needs a clear-sky model for its design days', () => {
    const spec = baseSpec({ weather: { kind: 'measured', dni: new Float64Array(8760), dhi: new Float64Array(8760) } });
    expect(() => designDayPeaks(spec)).toThrow(/^weather\.kind = "measured" is not allowed: design days need a clear-sky model/);
    const months = designDayPeaks(spec, { clearSky: { kind: 'ineichenClearSky', linkeTurbidity: [3] } });
    expect(months[6].peakGain).toBeGreaterThan(0);
  });

  test('bad day and bad factors are refused by name', () => {
    expect(() => designDayPeaks(baseSpec(), { day: 30 })).toThrow(/^day = 30/);
    expect(() => designDayPeaks(baseSpec(), { factors: FACTORS.map((f) => f * 2) })).toThrow(/^factors = /);
  });
});
