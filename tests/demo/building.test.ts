/** The invented demo building and example sites: what the demo promises to show. (Invented data; structural checks only.) */
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { DEMO_BUILDING, DEMO_HOURLY_TAG, SHADING_OPTIONS, demoWindows } from '../../src/demo/building';
import { EXAMPLE_SITES, findExampleSite } from '../../src/demo/sites';

describe('demo building', () => {
  const windows = demoWindows();

  it('has windows facing at least three ways on each of its sites', () => {
    for (const id of DEMO_BUILDING.siteIds) {
      const facings = new Set(windows.filter((w) => w.siteId === id).map((w) => w.spec.surfaceAzimuth));
      expect(facings.size).toBeGreaterThanOrEqual(3);
    }
  });

  it('stands on one site in each hemisphere', () => {
    const latitudes = DEMO_BUILDING.siteIds.map((id) => findExampleSite(id)!.site.latitude);
    expect(latitudes.some((l) => l > 0)).toBe(true);
    expect(latitudes.some((l) => l < 0)).toBe(true);
  });

  it('turns its equator-facing office to the north on the southern site', () => {
    const office = windows.filter((w) => w.room === 'office');
    expect(office.filter((w) => w.siteId === 'brackwater').every((w) => w.spec.surfaceAzimuth === 180)).toBe(true);
    expect(office.filter((w) => w.siteId === 'kestrelHeads').every((w) => w.spec.surfaceAzimuth === 0)).toBe(true);
  });

  it('gives every window a unique tag and a spec the core accepts', () => {
    expect(new Set(windows.map((w) => w.tag)).size).toBe(windows.length);
    for (const w of windows) expect(() => validateWindowSpec(w.spec)).not.toThrow();
    expect(windows.some((w) => w.tag === DEMO_HOURLY_TAG)).toBe(true);
  });

  it('compares no shading with an overhang, overhang and fins, and a deep reveal', () => {
    expect(SHADING_OPTIONS.map((o) => o.option)).toEqual(['none', 'overhang 0.8 m', 'overhang + fins', 'deep reveal 0.4 m']);
    expect(SHADING_OPTIONS[0].shading).toEqual({});
  });
});

describe('example sites', () => {
  it('are labelled as examples, have unique ids and valid coordinates with 12 turbidity values', () => {
    expect(new Set(EXAMPLE_SITES.map((s) => s.id)).size).toBe(EXAMPLE_SITES.length);
    for (const s of EXAMPLE_SITES) {
      expect(s.label).toMatch(/\(example\)$/);
      expect(Math.abs(s.site.latitude)).toBeLessThanOrEqual(90);
      expect(s.linkeTurbidity).toHaveLength(12);
    }
  });

  it('are found by id in any case, and an unknown id finds none', () => {
    expect(findExampleSite('KESTRELHEADS')?.id).toBe('kestrelHeads');
    expect(findExampleSite('atlantis')).toBeUndefined();
  });
});
