/**
 * The sun-path drawing: an equidistant polar projection (radius proportional to the zenith angle,
 * zenith at the centre, horizon on the rim, north up, bearings clockwise) — checked against its
 * definition — and the parts of the drawing.
 */
import { initialValues } from '../../src/taskpane/fields';
import { buildWindowSpec } from '../../src/taskpane/spec';
import { clockAheadOn, shadingMask, sunTracks } from '../../src/taskpane/engine';
import { project, sunPathSvg } from '../../src/taskpane/sunPathSvg';
import { sunPathTime } from '../../src/taskpane/sunPathView';

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

  test('the hour dots stay in local standard time, and the picture says so under the sky in its own lettering', () => {
    const spec = buildWindowSpec({ ...initialValues(), year: '2025' });
    const time = sunPathTime(spec);
    expect(time.onPicture).toEqual(['Hour dots: local standard time (UTC+1 h)']);
    expect(time.trackLabels).toEqual(['21 Jun', '21 Mar ≈ 23 Sep', '21 Dec']);
    const svg = sunPathSvg({ tracks: sunTracks(spec, [[6, 21]]), surfaceAzimuth: 180, caption: '', timeNote: ['Hour dots: a & b', 'second line'] });
    expect(svg).toContain('viewBox="0 0 320 350"');
    expect(svg.match(/<text class="time-note"[^>]*font-size="12"[^>]*>([^<]*)<\/text>/g)?.map((t) => t.replace(/<[^>]*>/g, ''))).toEqual(['Hour dots: a &amp; b', 'second line']);
    expect(sunPathSvg({ tracks: [], surfaceAzimuth: 180, caption: '' })).toContain('viewBox="0 0 320 320"');
    // the dots themselves: at whole hours of standard time, whatever the rule (tracks of the same spec with and without one)
    const ruled = buildWindowSpec({ ...initialValues(), year: '2025', daylightSavingStart: '2025-03-30 02:00', daylightSavingEnd: '2025-10-26 03:00' });
    expect(sunTracks(ruled, [[6, 21]])).toEqual(sunTracks(spec, [[6, 21]]));
  });

  // Outside check: the clock of the example locations' zones on the drawn days, from the IANA time
  // zone database as Node's Intl gives it (the form's 52.2° N 4.9° E at UTC+1 is in Europe/Amsterdam;
  // the example site Kestrel Heads, 37.9° S 145° E at UTC+10, in Australia/Melbourne), each zone's
  // rule given to the form as the dates of its 2025 changes.
  test.each([
    ['Europe/Amsterdam', 1, { daylightSavingStart: '2025-03-30 02:00', daylightSavingEnd: '2025-10-26 03:00' }, {}],
    ['Australia/Melbourne', 10, { daylightSavingStart: '2025-10-05 02:00', daylightSavingEnd: '2026-04-05 03:00' }, { latitude: '-37.9', longitude: '145', utcOffset: '10' }],
  ])('under the rule of %s, the key gives the clock of each drawn day as the zone keeps it', (zone, standardOffset, rule, place) => {
    const spec = buildWindowSpec({ ...initialValues(), year: '2025', ...place, ...rule });
    const zoneAhead = (month: number, day: number): number => {
      const name = new Intl.DateTimeFormat('en-GB', { timeZone: zone, timeZoneName: 'longOffset' }).formatToParts(new Date(Date.UTC(2025, month - 1, day, 12 - standardOffset))).find((p) => p.type === 'timeZoneName')!.value;
      const m = /GMT([+-])(\d\d):(\d\d)/.exec(name)!;
      return (m[1] === '-' ? -1 : 1) * (Number(m[2]) + Number(m[3]) / 60) - standardOffset;
    };
    const days: [number, number][] = [[6, 21], [3, 21], [9, 23], [12, 21]];
    const zoneSays = days.map(([m, d]) => zoneAhead(m, d));
    expect(days.map(([m, d]) => clockAheadOn(spec, m, d))).toEqual(zoneSays);
    const labelOf = (ahead: number) => (ahead > 0 ? ' (clock +1 h)' : ' (clock on standard time)');
    const equinox = zoneSays[1] === zoneSays[2] ? labelOf(zoneSays[1]) : ` (clock +1 h on ${zoneSays[1] > 0 ? '21 Mar' : '23 Sep'})`;
    const time = sunPathTime(spec);
    expect(time.trackLabels).toEqual([`21 Jun${labelOf(zoneSays[0])}`, `21 Mar ≈ 23 Sep${equinox}`, `21 Dec${labelOf(zoneSays[3])}`]);
    expect(time.onPicture).toEqual([`Hour dots: local standard time (UTC+${standardOffset} h),`, 'not the daylight-saving clock']);
    const ahead = days.filter((_, i) => zoneSays[i] > 0).map(([m, d]) => `${d} ${['Mar', 'Jun', 'Sep', 'Dec'][[3, 6, 9, 12].indexOf(m)]}`);
    expect(time.sentence).toBe(
      `Hour dots are local standard time (UTC+${standardOffset} h), not the clock the hourly sheet is stamped on: the daylight-saving rule puts the clock 1 h ahead on ${ahead.join(' and ')}, so on those days a dot's hour reads 1 h later on the sheet.`,
    );
  });
});
