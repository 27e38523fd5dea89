/**
 * One schedule, two readers: the task pane's (src/taskpane/schedule.ts) and the command line's
 * (src/cli/schedule.ts) read the same table — in any of the three header styles — into the same
 * WindowSpecs. Test data: tests/schedule/styles.ts (invented windows).
 */
import { scheduleFromCsv, windowFromRow } from '../../src/cli/schedule';
import type { WindowSpec } from '../../src/core/gain/window';
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { initialValues } from '../../src/taskpane/fields';
import { readSchedule } from '../../src/taskpane/schedule';
import { type HeaderStyle, scheduleCsv, scheduleTable } from './styles';

const STYLES: HeaderStyle[] = ['shared', 'paneWords', 'fileNames'];
const validate = (s: WindowSpec) => void validateWindowSpec(s);

function paneSpecs(style: HeaderStyle): WindowSpec[] {
  const { rows, problems } = readSchedule(scheduleTable(style), { ...initialValues(), year: '2030' }, validate);
  expect(problems).toEqual([]);
  return rows.map((r) => r.spec);
}

function cliSpecs(style: HeaderStyle): WindowSpec[] {
  return scheduleFromCsv(scheduleCsv(style), 'windows.csv').map((row) => windowFromRow(row).spec);
}

describe('the pane and the command line read one schedule format', () => {
  test('the first window reads as written: both-sides columns first, one-side columns over them', () => {
    const [lab] = cliSpecs('shared');
    expect(lab).toEqual({
      name: 'Lab south-east',
      site: { latitude: 40, longitude: -105, utcOffset: -7, elevation: 1600 },
      surfaceAzimuth: 135,
      surfaceTilt: 90,
      width: 1.5,
      height: 1.2,
      frameFraction: 0.1,
      glazing: { shgc: 0.4, panes: 3, interiorAttenuation: 0.8 },
      shading: {
        overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.5 },
        leftFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0.05 },
        rightFin: { projection: 0.25, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0.05 },
        revealDepth: 0.15,
        skyline: [0, 5, 10, 5],
      },
      groundAlbedo: 0.3,
      skyModel: 'hayDavies',
      weather: { kind: 'ineichenClearSky', linkeTurbidity: [3.1] },
      year: 2026,
      timeConvention: 'hourEnding',
    });
  });

  test('an example-site row with optical depths gets the site and a left fin only', () => {
    const [, office] = cliSpecs('shared');
    expect(office.site).toEqual({ latitude: 52.2, longitude: 4.9, utcOffset: 1, elevation: 5 });
    expect(office.weather).toEqual({ kind: 'ashraeClearSky', tauB: [0.35], tauD: [2.3] });
    expect(office.shading).toEqual({ leftFin: { projection: 0.3, gap: 0, extensionAbove: 0, extensionBelow: 0 } });
  });

  test.each(STYLES)('headers in the %s style give the same windows as the shared headers, in both readers', (style) => {
    expect(cliSpecs(style)).toEqual(cliSpecs('shared'));
    expect(paneSpecs(style)).toEqual(paneSpecs('shared'));
  });

  test('the pane and the command line give the same windows when every cell is filled', () => {
    expect(paneSpecs('shared')).toEqual(cliSpecs('shared'));
  });
});
