/** The window schedule: headers of our own, one row per window, problems named by row and column. */
import type { WindowSpec } from '../../src/core/gain/window';
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { initialValues } from '../../src/taskpane/fields';
import { headerKey, readSchedule, summaryFormats, summaryHeader, summaryRow } from '../../src/taskpane/schedule';

const validate = (s: WindowSpec) => void validateWindowSpec(s);
const form = { ...initialValues(), year: '2025' };

describe('the window schedule', () => {
  test('headers match without regard to case, spacing or units in brackets', () => {
    expect(headerKey('Overhang depth (m)')).toBe('overhangdepth');
    expect(headerKey(' FACES [°] ')).toBe('faces');
  });

  test('each row overrides the form; blank optional cells keep the form value; an overhang reach sets both sides', () => {
    const { rows, problems } = readSchedule(
      [
        ['Window', 'Faces', 'Width', 'Height', 'SHGC', 'Overhang depth', 'Overhang reach', 'Latitude'],
        ['S1', 180, 1.2, 1.4, '', 0.5, 0.25, -33.9],
        ['', '', '', '', '', '', '', ''],
        ['E1', 90, 2, 1.5, 0.3, 0, 0, ''],
      ],
      form,
      validate,
    );
    expect(problems).toEqual([]);
    expect(rows.map((r) => r.row)).toEqual([1, 3]);
    expect(rows[0].spec.glazing.shgc).toBe(0.4);
    expect(rows[0].spec.shading.overhang).toEqual({ projection: 0.5, gap: 0, extensionLeft: 0.25, extensionRight: 0.25 });
    expect(rows[0].spec.site.latitude).toBe(-33.9);
    expect(rows[1].spec.site.latitude).toBe(52.2);
    expect(rows[1].spec.shading).toEqual({});
  });

  test('unknown headers and missing required columns are reported before any row', () => {
    const { problems } = readSchedule([['Window', 'Bearing', 'Width']], form, validate);
    expect(problems.map((p) => p.message)).toEqual([
      'Header "Bearing" is not a schedule column (see the list of headers).',
      'The table has no "Surface azimuth [°]" column, which every schedule needs.',
      'The table has no "Height [m]" column, which every schedule needs.',
    ]);
  });

  test('a column named twice (the shared header and an older name) is reported by both names', () => {
    const { problems } = readSchedule([['Window', 'Faces', 'Width', 'Height', 'Set-back [m]', 'revealDepth']], form, validate);
    expect(problems.map((p) => p.message)).toEqual(['Headers "Set-back [m]" and "revealDepth" name the same column: keep one.']);
  });

  test('the window file\'s names work in the pane: a site fills the place, a skyline and a turbidity apply to their row only', () => {
    const { rows, problems } = readSchedule(
      [
        ['name', 'site', 'surfaceAzimuth', 'width', 'height', 'skyline', 'linkeTurbidity', 'skyModel'],
        ['N', 'Brackwater', 0, 1, 1, '10 10 0 0', '2.5 ; 2.7 2.9 3 3 3 3 3 3 3 2.7 2.5', 'Isotropic'],
        ['S', '', 180, 1, 1, '', '', ''],
      ],
      { ...form, weatherSource: 'ashraeClearSky' },
      validate,
    );
    expect(problems).toEqual([]);
    expect(rows[0].spec.site).toEqual({ latitude: 52.2, longitude: 4.9, utcOffset: 1, elevation: 5 });
    expect(rows[0].spec.shading.skyline).toEqual([10, 10, 0, 0]);
    expect(rows[0].spec.weather).toEqual({ kind: 'ineichenClearSky', linkeTurbidity: [2.5, 2.7, 2.9, 3, 3, 3, 3, 3, 3, 3, 2.7, 2.5] });
    expect(rows[0].spec.skyModel).toBe('isotropic');
    expect(rows[1].spec.site.latitude).toBe(52.2);
    expect(rows[1].spec.shading.skyline).toBeUndefined();
    expect(rows[1].spec.weather.kind).toBe('ashraeClearSky');
  });

  test('an unknown example site, and a site beside its own coordinates, are named by row and column', () => {
    const { problems } = readSchedule(
      [
        ['Window', 'Site', 'Latitude [°]', 'Faces', 'Width', 'Height'],
        ['A', 'nowhere', '', 180, 1, 1],
        ['B', 'brackwater', 40, 180, 1, 1],
      ],
      form,
      validate,
    );
    expect(problems.map((p) => p.message)).toEqual([
      expect.stringMatching(/^Row 1 \(A\), column "Site": "nowhere" is not an example site \(brackwater, /),
      'Row 2 (B), column "Latitude [°]": give either an example site (column "Site") or its own latitude, longitude, UTC offset and elevation, not both.',
    ]);
  });

  test('every bad row is named with its column and the core message (without the field path: the column names it), and no row is returned for it', () => {
    const { rows, problems } = readSchedule(
      [
        ['Window', 'Faces', 'Width', 'Height', 'Fin gap', 'Left fin depth'],
        ['A', 400, 1, 1, 0, 0],
        ['', 180, 1, 1, 0, 0],
        ['C', 180, 1, 1, -0.2, 0.3],
        ['D', 180, 1, 1, 0, 0],
        ['E', 180, '', 1, 0, 0],
      ],
      form,
      validate,
    );
    expect(rows.map((r) => r.spec.name)).toEqual(['D']);
    expect(problems.map((p) => p.message)).toEqual([
      'Row 1 (A), column "Faces": 400 is not allowed: must be a number from 0 to 360 °',
      'Row 2, column "Window": blank is not allowed: every window needs a label.',
      'Row 3 (C), column "Fin gap": -0.2 is not allowed: must be a number from 0 to 100 m',
      'Row 5 (E), column "Width": blank is not allowed: must be a number from 0.01 to 100 m',
    ]);
  });

  test('a summary row gives kWh per m² of glass as annual kWh over glass area', () => {
    const spec = { name: 'X', surfaceAzimuth: 90 } as WindowSpec;
    const row = summaryRow(spec, { annualKWh: 300, peakW: 512.345, peakStamp: 45800.5, meanSunlitFraction: 0.81234, missingHours: 2, glassArea: 2.5 });
    expect(row).toEqual(['X', 90, 2.5, 300, 120, 512.3, 45800.5, 0.812, 2]);
  });

  test('with a room in the schedule, the peak cooling load and its hour end the row; a window without one says so instead of a blank or zero', () => {
    const spec = { name: 'X', surfaceAzimuth: 90 } as WindowSpec;
    const fig = { annualKWh: 300, peakW: 512.345, peakStamp: 45800.5, meanSunlitFraction: 0.81234, missingHours: 2, glassArea: 2.5 };
    expect(summaryHeader(true).slice(-2)).toEqual(['Peak cooling load (W)', 'Peak load at (hour ending)']);
    expect(summaryHeader(false)).toHaveLength(9);
    expect(summaryFormats(true)).toHaveLength(summaryHeader(true).length);
    expect(summaryRow(spec, { ...fig, peakLoadW: 401.26, peakLoadStamp: 45800.625 }, true).slice(-2)).toEqual([401.3, 45800.625]);
    expect(summaryRow(spec, fig, true).slice(-2)).toEqual(['no room given — gains only', '']);
    // Without the load columns the row is as before, whatever the figures hold.
    expect(summaryRow(spec, { ...fig, peakLoadW: 401.26, peakLoadStamp: 45800.625 })).toHaveLength(9);
  });

  test('the peak columns\' headers follow the windows\' time convention; windows that differ get a Time convention column', () => {
    const fig = { annualKWh: 300, peakW: 512.345, peakStamp: 45800.5, meanSunlitFraction: 0.81234, missingHours: 2, glassArea: 2.5, peakLoadW: 401.26, peakLoadStamp: 45800.625 };
    expect(summaryHeader(true, 'hourEnding')).toEqual(summaryHeader(true));
    const instant = summaryHeader(true, 'instant');
    expect(instant[6]).toBe('Peak at (instant)');
    expect(instant.slice(-2)).toEqual(['Peak cooling load (W)', 'Peak load at (instant)']);
    expect(instant.join('|')).not.toMatch(/hour ending/);
    const mixed = summaryHeader(true, 'mixed');
    expect(mixed[6]).toBe('Peak at (hour ending or instant: see Time convention)');
    expect(mixed.slice(-3)).toEqual(['Peak cooling load (W)', 'Peak load at (hour ending or instant: see Time convention)', 'Time convention']);
    expect(summaryFormats(true, 'mixed')).toHaveLength(mixed.length);
    const a = { name: 'A', surfaceAzimuth: 90, timeConvention: 'instant' } as WindowSpec;
    const b = { name: 'B', surfaceAzimuth: 90 } as WindowSpec;
    expect(summaryRow(a, fig, true, 'mixed').slice(-1)).toEqual(['instant']);
    expect(summaryRow(b, fig, true, 'mixed').slice(-1)).toEqual(['hourEnding']);
    expect(summaryRow(a, fig, true, 'instant')).toHaveLength(instant.length);
  });
});
