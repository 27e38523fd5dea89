/** The shared window-schedule columns: the glossary's window fields, one header each, older header styles as aliases, matching by key. */
import { WINDOW_FIELDS } from '../../src/registry/glossary';
import { SCHEDULE_COLUMNS, columnForHeader, columnsForPath, headerKey, matchHeaders, requiredColumns, splitListCell } from '../../src/schedule/columns';

/** The pane's headers before the formats were merged (src/taskpane/schedule.ts at 872dc24). */
const FORMER_PANE_HEADERS = ['Window', 'Faces', 'Width', 'Height', 'Tilt', 'Frame share', 'SHGC', 'Panes', 'Blind factor', 'Overhang depth', 'Overhang gap', 'Overhang reach', 'Left fin depth', 'Right fin depth', 'Fin gap', 'Set-back', 'Latitude', 'Longitude', 'UTC offset', 'Elevation', 'Ground reflectance'];
/** The command line's headers before the formats were merged (src/cli/schedule.ts at 872dc24). */
const FORMER_CLI_HEADERS = ['name', 'site', 'latitude', 'longitude', 'utcOffset', 'elevation', 'year', 'surfaceAzimuth', 'surfaceTilt', 'width', 'height', 'frameFraction', 'shgc', 'panes', 'interiorAttenuation', 'overhangProjection', 'overhangGap', 'overhangExtensionLeft', 'overhangExtensionRight', 'finProjection', 'finGap', 'finExtensionAbove', 'finExtensionBelow', 'revealDepth', 'skyline', 'groundAlbedo', 'skyModel', 'linkeTurbidity', 'tauB', 'tauD'];

describe('schedule columns', () => {
  test('headers match without regard to case, spacing, punctuation or a unit in brackets', () => {
    expect(headerKey('Overhang depth (m)')).toBe('overhangdepth');
    expect(headerKey(' FACES [°] ')).toBe('faces');
    expect(headerKey('Set-back')).toBe('setback');
    expect(headerKey(undefined)).toBe('');
  });

  test('the columns are the glossary window fields: key = field name, header = label', () => {
    expect(SCHEDULE_COLUMNS.map((c) => c.key)).toEqual(WINDOW_FIELDS.map((f) => f.name));
    for (const c of SCHEDULE_COLUMNS) expect(headerKey(c.header)).toBe(headerKey(c.key));
  });

  test('every column has a unique key and its own header, and every header or alias finds its column', () => {
    expect(new Set(SCHEDULE_COLUMNS.map((c) => c.key)).size).toBe(SCHEDULE_COLUMNS.length);
    for (const c of SCHEDULE_COLUMNS) {
      for (const h of [c.header, ...c.aliases]) expect(columnForHeader(h)?.key).toBe(c.key);
    }
  });

  test('every header the pane and the command line accepted before still names a column', () => {
    expect(FORMER_PANE_HEADERS.filter((h) => !columnForHeader(h))).toEqual([]);
    expect(FORMER_CLI_HEADERS.filter((h) => !columnForHeader(h))).toEqual([]);
  });

  test('a former pane header and the former file name of one quantity name the same column', () => {
    const pairs: [string, string][] = [['Faces', 'surfaceAzimuth'], ['Overhang depth', 'overhangProjection'], ['Set-back', 'revealDepth'], ['Blind factor', 'interiorAttenuation'], ['Ground reflectance', 'groundAlbedo'], ['Window', 'name'], ['UTC offset', 'utcOffset'], ['Fin gap', 'finGap']];
    for (const [pane, cli] of pairs) expect(columnForHeader(pane)).toBe(columnForHeader(cli));
  });

  test('both-sides columns fill both paths and come before the one-side columns they share a path with', () => {
    const reach = columnForHeader('Overhang reach')!;
    expect(reach.paths).toEqual(['shading.overhang.extensionLeft', 'shading.overhang.extensionRight']);
    expect(columnsForPath('shading.overhang.extensionLeft').map((c) => c.key)).toEqual(['overhangExtension', 'overhangExtensionLeft']);
    expect(columnsForPath('shading.rightFin.projection').map((c) => c.key)).toEqual(['finProjection', 'rightFinProjection']);
  });

  test('matching a header row gives the column at each position and names unknown and repeated headers', () => {
    const m = matchHeaders(['Window', '', 'Bearing', 'Set-back (m)', 'revealDepth', 'surfaceAzimuth']);
    expect(m.columns.map((c) => c?.key)).toEqual(['name', undefined, undefined, 'revealDepth', undefined, 'surfaceAzimuth']);
    expect(m.unknown).toEqual([{ index: 2, header: 'Bearing' }]);
    expect(m.repeated).toEqual([{ index: 4, header: 'revealDepth' }]);
    expect(m.written.get('revealDepth')).toBe('Set-back (m)');
  });

  test('the pane needs the label, bearing and size; the command line also the year and SHGC', () => {
    expect(requiredColumns('pane').map((c) => c.key)).toEqual(['name', 'surfaceAzimuth', 'width', 'height']);
    expect(requiredColumns('cli').map((c) => c.key)).toEqual(['name', 'year', 'surfaceAzimuth', 'width', 'height', 'shgc']);
  });

  test('a list cell splits on spaces, commas and semicolons; a number cell is one entry', () => {
    expect(splitListCell(' 0 5,10; 5 ')).toEqual(['0', '5', '10', '5']);
    expect(splitListCell(3.2)).toEqual(['3.2']);
    expect(splitListCell('')).toEqual([]);
  });
});
