/**
 * One clock: the one-hour gain of a window at any hour of the year is, exactly, that hour's row of
 * the hourly year (SOLARGAINYEAR, the CLI table, the pane's sheet) — under the default hour-ending
 * convention and under the instant convention. Plumbing across the layers, no physics: the values
 * themselves are checked against outside sources in tests/core and tests/reference.
 */
import { civilToSerial } from '../../src/core/time/calendar';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import type { RawArg } from '../../src/registry/types';
import { runYear } from '../../src/taskpane/engine';
import { initialValues } from '../../src/taskpane/fields';
import { buildWindowSpec } from '../../src/taskpane/spec';
import { HOURLY_COLUMNS } from '../../src/outputs/hourlyColumns';
import { hourRows } from '../../src/taskpane/yearSheet';

function call(name: string, args: RawArg[]) {
  return applyFunction(findFunction(name)!, args);
}

/** An invented shaded window under an invented clear sky, as a name/value block. */
const FIELDS: [string, number | string][] = [
  ['name', 'Clock test'],
  ['year', 2026],
  ['latitude', 40],
  ['longitude', -105],
  ['utcOffset', -7],
  ['surfaceAzimuth', 200],
  ['width', 2],
  ['height', 1.5],
  ['frameFraction', 0.1],
  ['shgc', 0.6],
  ['overhangProjection', 0.6],
  ['overhangGap', 0.2],
  ['leftFinProjection', 0.4],
  ['rightFinProjection', 0.4],
  ['tauB', 0.4],
  ['tauD', 2.3],
];

/** The same window as the pane's form holds it. */
function paneForm(timeConvention: string) {
  return {
    ...initialValues(),
    name: 'Clock test',
    year: '2026',
    latitude: '40',
    longitude: '-105',
    utcOffset: '-7',
    elevation: '0',
    surfaceAzimuth: '200',
    width: '2',
    height: '1.5',
    frameFraction: '0.1',
    shgc: '0.6',
    overhangProjection: '0.6',
    overhangGap: '0.2',
    leftFinProjection: '0.4',
    rightFinProjection: '0.4',
    weatherSource: 'ashraeClearSky',
    tauB: '0.4',
    tauD: '2.3',
    timeConvention,
  };
}

describe.each(['hourEnding', 'instant'] as const)('one clock (%s)', (timeConvention) => {
  const window = [...FIELDS, ['timeConvention', timeConvention]] as RawArg;
  const year = call('SOLARGAINYEAR', [window, [['stamp', 'gain']]]);
  const stamps = year.map((r) => [r[0]]) as RawArg;
  const oneHour = call('SOLARGAIN', [window, stamps]);

  test('the year has one row per hour, stamped as the convention says', () => {
    expect(year).toHaveLength(8760);
    expect(year[0][0] as number).toBeCloseTo(civilToSerial(2026, 1, 1, timeConvention === 'hourEnding' ? 1 : 0), 9);
  });

  test('SOLARGAIN at every stamp of the year is that row of SOLARGAINYEAR, exactly', () => {
    expect(oneHour).toHaveLength(8760);
    const differ = oneHour.flatMap((r, i) => (r[0] === year[i][1] ? [] : [`${i}: ${String(r[0])} vs ${String(year[i][1])}`]));
    expect(differ).toEqual([]);
    expect(year.filter((r) => (r[1] as number) > 0).length).toBeGreaterThan(3000);
  });

  test("SOLARGAIN at every stamp is the pane's hourly table, cell for cell", () => {
    const result = runYear(buildWindowSpec(paneForm(timeConvention)));
    const rows = hourRows(result.series, 0, result.series.hours);
    const stampCol = HOURLY_COLUMNS.findIndex((c) => c.key === 'stampSerial');
    const gainCol = HOURLY_COLUMNS.findIndex((c) => c.key === 'gain');
    const decimals = HOURLY_COLUMNS[gainCol].sheetDecimals;
    expect(rows).toHaveLength(8760);
    const differ: string[] = [];
    rows.forEach((row, i) => {
      const shown = Math.round((oneHour[i][0] as number) * 10 ** decimals) / 10 ** decimals;
      if (row[gainCol] !== (Object.is(shown, -0) ? 0 : shown)) differ.push(`${i}: pane ${String(row[gainCol])}, SOLARGAIN ${String(oneHour[i][0])}`);
      if (Math.abs((row[stampCol] as number) - (stamps as number[][])[i][0]) > 1e-6) differ.push(`${i}: stamp`);
    });
    expect(differ).toEqual([]);
    // and the pane's unrounded series is the same numbers
    for (let i = 0; i < 8760; i += 1) if (result.series.gain[i] !== oneHour[i][0]) throw new Error(`row ${i}`);
  });

  test('the positional WINDOWGAIN, told the same convention, is the same row', () => {
    const args: RawArg[] = [stamps, 40, -105, -7, 200, 2, 1.5, 0.6, null, null, 0.4, 2.3, 2, 0.1, null, null, null, null, 0.6, 0.2, null, null, null, null, null, null, timeConvention];
    // WINDOWGAIN's positional fins are one symmetric pair: the same as the left and right fins of 0.4 above
    args[22] = 0.4;
    const legacy = call('WINDOWGAIN', args);
    const differ = legacy.flatMap((r, i) => (r[0] === year[i][1] ? [] : [`${i}`]));
    expect(differ).toEqual([]);
  });

  test('SOLARGAINSTEPS says which instant it used, and its window-gain step is the row', () => {
    const i = 4800;
    const steps = call('SOLARGAINSTEPS', [window, (stamps as number[][])[i][0]]);
    expect(steps[1][1]).toBe('sun evaluated at');
    expect(steps[1][2] as number).toBeCloseTo((stamps as number[][])[i][0] - (timeConvention === 'hourEnding' ? 1 / 48 : 0), 9);
    expect(String(steps[1][4])).toContain(`time convention ${timeConvention}`);
    expect(steps.find((r) => r[1] === 'window solar gain')![2]).toBe(year[i][1]);
  });
});
