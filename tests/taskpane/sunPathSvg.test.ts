/**
 * The sun-path drawing: an equidistant polar projection (radius proportional to the zenith angle,
 * zenith at the centre, horizon on the rim, north up, bearings clockwise) — checked against its
 * definition — and the parts of the drawing.
 */
import { initialValues } from '../../src/taskpane/fields';
import { buildWindowSpec } from '../../src/taskpane/spec';
import { shadingMask, sunTracks } from '../../src/taskpane/engine';
import { project, sunPathSvg } from '../../src/taskpane/sunPathSvg';

describe('the sun-path diagram', () => {
  test('zenith is the centre, the horizon the rim; north up, east right, south down, west left', () => {
    const c = project(90, 123);
    expect(c.x).toBeCloseTo(160, 9);
    expect(c.y).toBeCloseTo(160, 9);
    const n = project(0, 0);
    const e = project(0, 90);
    const s = project(0, 180);
    const w = project(0, 270);
    expect([n.x, n.y]).toEqual([expect.closeTo(160, 9), expect.closeTo(24, 9)]);
    expect([e.x, e.y]).toEqual([expect.closeTo(296, 9), expect.closeTo(160, 9)]);
    expect([s.x, s.y]).toEqual([expect.closeTo(160, 9), expect.closeTo(296, 9)]);
    expect([w.x, w.y]).toEqual([expect.closeTo(24, 9), expect.closeTo(160, 9)]);
    // Equidistant: 45° altitude lies halfway out.
    const half = project(45, 90);
    expect(half.x - 160).toBeCloseTo(68, 9);
  });

  test('a window with an overhang draws tracks, hour marks and mask bands; an open window has no shaded band', () => {
    const shaded = buildWindowSpec({ ...initialValues(), year: '2025', overhangProjection: '0.8' });
    const open = buildWindowSpec({ ...initialValues(), year: '2025' });
    const tracks = sunTracks(shaded, [[6, 21], [12, 21]]);
    const svg = sunPathSvg({ tracks, mask: shadingMask(shaded), surfaceAzimuth: 180, caption: 'a <test>' });
    expect(svg.match(/class="track"/g)?.length).toBe(2);
    expect(svg).toContain('class="mask-full"');
    expect(svg).toContain('class="mask-behind"');
    expect(svg).toContain('a &lt;test&gt;');
    const bare = sunPathSvg({ tracks, mask: shadingMask(open), surfaceAzimuth: 180, caption: '' });
    expect(bare).not.toContain('mask-full');
    expect(bare).not.toContain('mask-part');
  });

  test('cells behind a south-facing wall are exactly those with the sun in the northern half of the sky', () => {
    const spec = buildWindowSpec({ ...initialValues(), year: '2025' });
    const mask = shadingMask(spec, undefined, 10, 10);
    expect(mask.cells.length).toBe(36 * 9);
    for (const cell of mask.cells) {
      const az = (cell.az0 + cell.az1) / 2;
      const behind = az < 90 || az > 270;
      if (az === 90 || az === 270 || cell.alt1 === 90) continue; // samples in the wall plane (due east, due west, the zenith)
      expect(cell.kind === 'behind').toBe(behind);
    }
  });

  test('the mask of one point is all or nothing, and a point off the glass is refused naming x', () => {
    const spec = buildWindowSpec({ ...initialValues(), year: '2025', overhangProjection: '0.8' });
    const mask = shadingMask(spec, { x: 0.1, y: 1.4 });
    expect(mask.cells.every((c) => c.sunlit === 0 || c.sunlit === 1)).toBe(true);
    expect(() => shadingMask(spec, { x: 5, y: 1 })).toThrow('x = 5 is not allowed: must be a number from 0 to 1.8');
  });
});
