/** Shading options compared against the unshaded window. */
import type { WindowSpec } from '../../src/core/gain/window';
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { OptionProblem, PEAK_LOAD_COLUMN, compareFormats, compareHeader, comparisonRows, optionShading, optionSpecs, starterOptions } from '../../src/taskpane/compare';
import { initialValues } from '../../src/taskpane/fields';
import { buildWindowSpec } from '../../src/taskpane/spec';

const validate = (s: WindowSpec) => void validateWindowSpec(s);

describe('shading options', () => {
  test('an option becomes a shading set with only its non-zero devices and the base skyline', () => {
    const s = optionShading({ label: 'x', overhangDepth: '0.8', overhangGap: '0.1', overhangReach: '0.2', leftFinDepth: '', rightFinDepth: '0.3', finGap: '0.05', setBack: '0' }, [10, 20]);
    expect(s).toEqual({
      overhang: { projection: 0.8, gap: 0.1, extensionLeft: 0.2, extensionRight: 0.2 },
      rightFin: { projection: 0.3, gap: 0.05, extensionAbove: 0, extensionBelow: 0 },
      skyline: [10, 20],
    });
  });

  test('the unshaded window comes first, devices removed; a bad option is named with its number, label and column', () => {
    const base = buildWindowSpec({ ...initialValues(), year: '2025', overhangProjection: '0.4' });
    const specs = optionSpecs(base, starterOptions(), validate);
    expect(specs.map((s) => s.label)).toEqual(['No outside shading', 'Short overhang', 'Deep overhang', 'Overhang and fins']);
    expect(specs[0].spec.shading).toEqual({});
    const bad = [...starterOptions()];
    bad[1] = { ...bad[1], overhangGap: 'high' };
    expect(() => optionSpecs(base, bad, validate)).toThrow('overhangGap = "high" is not allowed: must be a number from 0 to 100 m (option 2 "Deep overhang", column "Overhang gap (m)")');
    try {
      optionSpecs(base, bad, validate);
    } catch (err) {
      expect((err as OptionProblem).inUserWords).toBe('Option 2 "Deep overhang", Overhang gap (m): "high" is not allowed: must be a number from 0 to 100 m');
    }
    expect.assertions(6);
    expect(() => optionSpecs(base, new Array(11).fill(starterOptions()[0]), validate)).toThrow(/at most 10/);
    expect(optionSpecs(base, new Array(10).fill(starterOptions()[0]), validate)).toHaveLength(11);
  });

  test('the cut is 1 − annual ÷ unshaded annual in %, beam and diffuse cuts side by side in %, and the shaded share is 1 − mean sunlit share', () => {
    const rows = comparisonRows([
      { label: 'none', figures: { annualKWh: 400, peakW: 900, meanSunlitFraction: 1, beamCut: 0, diffuseCut: 0 } },
      { label: 'deep', figures: { annualKWh: 300, peakW: 600, meanSunlitFraction: 0.62, beamCut: 0.4123, diffuseCut: 0.2049 } },
    ]);
    expect(rows).toEqual([
      ['none', 400, 900, 0, 0, 0, 0],
      ['deep', 300, 600, 25, 41.2, 20.5, 0.38],
    ]);
  });

  test('with a room, each option gets its peak cooling load, its hour and the peak load cut = 1 − peak ÷ unshaded peak in %', () => {
    const rows = comparisonRows(
      [
        { label: 'none', figures: { annualKWh: 400, peakW: 900, meanSunlitFraction: 1, beamCut: 0, diffuseCut: 0, peakLoadW: 640, peakLoadStamp: 45900.625 } },
        { label: 'deep', figures: { annualKWh: 300, peakW: 600, meanSunlitFraction: 0.62, beamCut: 0.4123, diffuseCut: 0.2049, peakLoadW: 480.04, peakLoadStamp: 45901.666667 } },
      ],
      true,
    );
    expect(rows.map((r) => r.slice(7))).toEqual([
      [640, 45900.625, 0],
      [480, 45901.666667, 25],
    ]);
    expect(compareHeader(true).slice(7)).toEqual(['Peak cooling load (W)', 'Peak load at (hour ending)', 'Peak load cut vs no shading (%)']);
    expect(compareHeader(true)[PEAK_LOAD_COLUMN]).toBe('Peak cooling load (W)');
    expect(compareFormats(true)).toHaveLength(compareHeader(true).length);
    // Figures without a room under load columns say so rather than 0.
    const bare = comparisonRows([{ label: 'none', figures: { annualKWh: 400, peakW: 900, meanSunlitFraction: 1, beamCut: 0, diffuseCut: 0 } }], true);
    expect(bare[0].slice(7)).toEqual(['no room given — gains only', '', '']);
  });
});
