/** The pane's words about the cooling load of a schedule or a comparison: the sheet's line and the on-screen summary. */
import type { WindowSpec } from '../../src/core/gain/window';
import { compareSummaryText, roomText, scheduleLoadLine, scheduleSummaryText } from '../../src/taskpane/loadText';

describe("the pane's cooling-load words", () => {
  test('a schedule without any room says "no room given — gains only" on the sheet and on screen, never a zero', () => {
    const figures = [{ annualKWh: 1200.4 }, { annualKWh: 800.2 }];
    expect(scheduleLoadLine(figures)).toMatch(/^Cooling load: no room given — gains only/);
    expect(scheduleSummaryText(['A', 'B'], figures)).toBe('2,001 kWh of solar gain in the year in all; cooling load: no room given — gains only.');
  });

  test('a schedule names the window with the largest peak cooling load and its hour, and says how many windows have a room', () => {
    const figures = [{ annualKWh: 1000 }, { annualKWh: 900, peakLoadW: 1234.4, peakLoadStamp: 46224.625 }, { annualKWh: 500, peakLoadW: 700, peakLoadStamp: 46200.5 }];
    expect(scheduleSummaryText(['N', 'W', 'E'], figures)).toBe('2,400 kWh of solar gain in the year in all; largest peak cooling load 1,234 W (W, 2026-07-21 15:00).');
    expect(scheduleLoadLine(figures)).toContain('2 of 3 windows have a room; the others say "no room given — gains only"');
  });

  test('a comparison names the option with the least gain and the one with the lowest peak cooling load, against no shading', () => {
    const results = [
      { label: 'No outside shading', figures: { annualKWh: 400, peakLoadW: 800 } },
      { label: 'Short', figures: { annualKWh: 300, peakLoadW: 700 } },
      { label: 'Deep', figures: { annualKWh: 320, peakLoadW: 600 } },
    ];
    expect(compareSummaryText(results)).toBe('least solar gain with "Short", 300 kWh/yr (25 % below no shading); lowest peak cooling load with "Deep", 600 W against 800 W with no shading (25 % lower).');
    const noRoom = results.map((r) => ({ label: r.label, figures: { annualKWh: r.figures.annualKWh } }));
    expect(compareSummaryText(noRoom)).toBe('least solar gain with "Short", 300 kWh/yr (25 % below no shading); cooling load: no room given — gains only.');
  });

  test('the room in words: a construction with its illustrative series, the room’s own series, or none', () => {
    expect(roomText({ room: { construction: 'heavy' } } as WindowSpec)).toBe('heavy room construction, illustrative series');
    expect(roomText({ room: { solar: [1], nonSolar: [1] } } as unknown as WindowSpec)).toBe("the room's own radiant time series");
    expect(roomText({} as WindowSpec)).toBe('no room given — gains only');
  });
});
