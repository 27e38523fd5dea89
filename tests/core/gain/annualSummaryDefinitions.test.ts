/**
 * The definitions of the annual summary (src/core/gain/annualSummary.ts, `summarizeAnnual`) at their
 * edges, on columns of hours set by hand: the peak is the first of equal largest hours, the sun is
 * "on the wall" only above the horizon (altitude > 0) and in front of the glass (incidence < 90°), a
 * year without the sun on the wall has a mean sunlit fraction of 0, a year without beam or without
 * diffuse light cuts nothing, and a cut stays within 0…1 whatever its sums.
 *
 * Source: the definitions as the summary documents them (AnnualSummary's fields), each a stated
 * property worked out here by hand on a few hours; the rest of the year is dark (altitude below the
 * horizon, no gain, no light), so the expected values are plain arithmetic.
 */
import { annualSeries, type AnnualSeries } from '../../../src/core/gain/annual';
import { summarizeAnnual } from '../../../src/core/gain/annualSummary';
import { baseSpec } from './gainFixtures';

/** A year of the fixture window with every hour dark and empty: columns to be set by hand. */
function darkYear(): AnnualSeries {
  const s = annualSeries(baseSpec());
  for (const column of [s.gain, s.beam, s.sky, s.ground, s.skyUnshaded, s.groundUnshaded, s.sunlitFraction]) column.fill(0);
  s.shgc.fill(0.5);
  s.sunAltitude.fill(-10);
  s.incidence.fill(120);
  s.missing.fill(0);
  return s;
}

describe('annual summary definitions at their edges', () => {
  test('the peak is the first of equal largest hours; a year without gain has peak 0 at its first hour', () => {
    const s = darkYear();
    expect(summarizeAnnual(s).peakW).toBe(0);
    expect(summarizeAnnual(s).peakStamp).toBe(s.stampSerial[0]);
    s.gain[100] = 250;
    s.gain[3000] = 250;
    s.gain[50] = 120;
    const summary = summarizeAnnual(s);
    expect(summary.peakW).toBe(250);
    expect(summary.peakStamp).toBe(s.stampSerial[100]);
  });

  test('the sun is on the wall only above the horizon and in front of the glass: altitude exactly 0 or incidence exactly 90° is not', () => {
    const s = darkYear();
    for (let i = 2000; i < 2010; i++) {
      s.sunAltitude[i] = 20;
      s.incidence[i] = 40;
      s.sunlitFraction[i] = 0.25;
    }
    s.sunAltitude[2010] = 0; // on the horizon, in front of the glass
    s.incidence[2010] = 30;
    s.sunlitFraction[2010] = 1;
    s.sunAltitude[2011] = 15; // up, but grazing the glass
    s.incidence[2011] = 90;
    s.sunlitFraction[2011] = 1;
    const summary = summarizeAnnual(s);
    expect(summary.sunOnWallHours).toBe(10);
    expect(summary.meanSunlitFraction).toBe(0.25);
  });

  test('a year without the sun on the wall has a mean sunlit fraction of 0, not 0 ÷ 0', () => {
    const summary = summarizeAnnual(darkYear());
    expect(summary.sunOnWallHours).toBe(0);
    expect(summary.meanSunlitFraction).toBe(0);
  });

  test('a year without beam or without diffuse light cuts nothing (0, not 0 ÷ 0)', () => {
    const summary = summarizeAnnual(darkYear());
    expect(summary.beamCut).toBe(0);
    expect(summary.diffuseCut).toBe(0);
  });

  test('the cuts are 1 − kept ÷ all, held within 0…1 whatever the sums', () => {
    const s = darkYear();
    // Beam: 400 W/m² at SHGC 0.5 for two hours, half of it sunlit in one: cut = 1 − 300 ÷ 400 = 0.25.
    s.beam[10] = 400;
    s.sunlitFraction[10] = 1;
    s.beam[11] = 400;
    s.sunlitFraction[11] = 0.5;
    // Diffuse: more on the shaded window than on the bare one (as rounding could leave it): cut 0, not −0.25.
    s.sky[10] = 100;
    s.skyUnshaded[10] = 80;
    let summary = summarizeAnnual(s);
    expect(summary.beamCut).toBeCloseTo(0.25, 15);
    expect(summary.diffuseCut).toBe(0);
    // Diffuse kept below 0 (a negative sum): cut 1, not 1.5.
    s.sky[10] = -40;
    summary = summarizeAnnual(s);
    expect(summary.diffuseCut).toBe(1);
  });
});
