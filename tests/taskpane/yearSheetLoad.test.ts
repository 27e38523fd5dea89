/**
 * The pane's hourly year with the conduction gain and the cooling load beside the solar gain, in
 * node against the fake Excel host. Columns are invented numbers (demo data): the test checks the
 * extra columns' place, headers and the key figures over them, not physics (the load's checks are
 * in tests/core/load).
 */
import { type HourColumns, type YearFigures, hourRows, heatColumnFor, summaryColumnFor, writeYearSheet } from '../../src/taskpane/yearSheet';
import { columnLetters } from '../../src/taskpane/blocks';
import { HOURLY_HEADERS, hourlyHeadersFor } from '../../src/outputs/hourlyColumns';
import type { RunBatch } from '../../src/taskpane/resultSheets';
import { runYear } from '../../src/taskpane/engine';
import { annualSeries } from '../../src/core/gain/annual';
import { annualLoadParts } from '../../src/core/load/room';
import { illustrativeRadiantTimeSeries } from '../../src/core/load/rtsSeries';
import { baseSpec } from '../core/gain/gainFixtures';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import { windowFieldFor } from '../../src/registry/glossary';
import { fieldsOf, windowSpecFromFields } from '../../src/registry/windowRange';
import type { RawArg } from '../../src/registry/types';
import { evaluateFormula } from '../support/sheetFormula';
import { tableColumnRef, yearPeakStampFormula } from '../../src/outputs/hourlyFormulas';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const { createExcelHost } = require('../browser/excel-host.js');

const HOURS = 8760;
function columns(): HourColumns {
  const col = (f: (i: number) => number) => Float64Array.from({ length: HOURS }, (_, i) => f(i));
  return {
    stampSerial: col((i) => 45658 + (i + 1) / 24),
    sunAltitude: col(() => 10),
    sunAzimuth: col(() => 100),
    incidence: col(() => 45),
    profileAngle: col(() => 30),
    sunlitFraction: col(() => 1),
    dni: col(() => 800),
    dhi: col(() => 100),
    beam: col(() => 500),
    sky: col(() => 50),
    ground: col(() => 10),
    shgc: col(() => 0.4),
    gain: col((i) => (i % 1000) + 0.26),
    conduction: col(() => -12.34),
    load: col((i) => (i === 5000 ? 2222 : 100)),
    missing: new Uint8Array(HOURS),
  };
}
const FIGURES: YearFigures = { monthlyKWh: new Array(12).fill(100), annualKWh: 1200, peakW: 999.26, peakStamp: 45700.5, sunlitHours: 3000, meanSunlitFraction: 0.8, beamCut: 0.3, diffuseCut: 0.2, missingHours: 0, glassArea: 2.3, peakLoadW: 2222, peakLoadStamp: 45658 + 5001 / 24 };

describe('the hourly year sheet with conduction and cooling load', () => {
  test('the two columns follow the solar gain, headed in the shared words', () => {
    const headers = hourlyHeadersFor('hourEnding', { conduction: true, load: true });
    expect(headers).toEqual([...HOURLY_HEADERS.slice(0, 13), 'Conduction gain (W)', 'Cooling load (W)', HOURLY_HEADERS[13]]);
    expect(hourRows(columns(), 0, 1)[0].slice(12)).toEqual([0.3, -12.3, 100, 0]);
  });

  test('the sheet gets the wider table, the summary moved right of it, and the peak load as formulas over the load column', async () => {
    const { Excel, host } = createExcelHost();
    const run: RunBatch = (batch) => Excel.run(batch);
    await writeYearSheet(run, { name: 'L hourly' }, { title: 'T', lines: [] }, columns(), FIGURES);
    expect(host.read('L hourly', 'A5:P5')).toEqual([hourlyHeadersFor('hourEnding', { conduction: true, load: true })]);
    expect(host.tables()).toEqual([expect.objectContaining({ address: 'A5:P8765' })]);
    const col = (k: number) => columnLetters(summaryColumnFor(16) + k);
    expect(host.read('L hourly', `${col(0)}28:${col(1)}29`)).toEqual([
      // Over the hours with weather (the flag column), 0 when none is above 0: as the core and SOLARGAINYEAR count.
      ['Peak cooling load (W)', '=MAX(0,SUMPRODUCT(MAX((L_hourly[[Weather missing (1 = yes)]]=0)*L_hourly[[Cooling load (W)]])))'],
      ['Peak load at (hour ending)', `=${yearPeakStampFormula(tableColumnRef('L_hourly'), 'load')}`],
    ]);
    expect(host.formatAt('L hourly', `${col(1)}29`)).toBe('yyyy-mm-dd hh:mm');
    expect(host.read('L hourly', `${columnLetters(heatColumnFor(16))}5`)).toEqual([['Month']]);
  });

  test("the pane's run gives conduction with a U-value and the load with a room, and neither without", () => {
    const plain = runYear(baseSpec());
    expect(plain.hourly.conduction).toBeUndefined();
    expect(plain.hourly.load).toBeUndefined();
    expect(plain.figures.peakLoadW).toBeUndefined();
    const spec = baseSpec({
      glazing: { shgc: 0.6, panes: 2, uValue: 2 },
      indoorTemperature: 24,
      weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [30], dailyRange: [10] },
      room: { construction: 'light' },
    });
    const r = runYear(spec);
    const load = annualLoadParts(annualSeries(spec), illustrativeRadiantTimeSeries('light')).total;
    expect(r.hourly.load![4816]).toBeCloseTo(load[4816], 9);
    expect(r.hourly.conduction![4816]).toBe(r.series.conduction[4816]);
    expect(r.figures.peakLoadW).toBeCloseTo(Math.max(...load), 9);
    expect(() => runYear(baseSpec({ room: { construction: 'stone' } }))).toThrow(/^roomConstruction = "stone" is not allowed/);
  });
});

/**
 * Hours without weather on the pane's year sheet: the key figures and the month × hour block skip
 * them, as the worksheet functions do (SOLARGAINYEAR gives #N/A there) and as the core's year
 * peaks count. The sheet's formulas are worked out by the small evaluator of tests/support/sheetFormula.ts
 * over the rows the pane wrote (the fake host records formulas, it does not calculate).
 */
describe('hours without weather are skipped by the sheet, as by the functions', () => {
  /** The rows, header and key figures the pane wrote for a year, and an evaluator over them. */
  async function written(r: ReturnType<typeof runYear>, sheet: string) {
    const { Excel, host } = createExcelHost();
    const run: RunBatch = (batch) => Excel.run(batch);
    const width = hourlyHeadersFor('hourEnding', { conduction: r.hourly.conduction !== undefined, load: r.hourly.load !== undefined }).length;
    await writeYearSheet(run, { name: sheet }, { title: 'T', lines: [] }, r.hourly, r.figures);
    const table = host.read(sheet, `A5:${columnLetters(width - 1)}${5 + r.series.hours}`) as (string | number)[][];
    const header = table[0] as string[];
    const tableName = sheet.replace(/ /g, '_');
    const column = (_t: string, h: string) => {
      const k = header.indexOf(h);
      if (k < 0) throw new Error(`no column ${h}`);
      return table.slice(1).map((row) => row[k]);
    };
    const keyAt = (label: string): string => {
      const col = columnLetters(summaryColumnFor(width));
      const keys = host.read(sheet, `${col}20:${columnLetters(summaryColumnFor(width) + 1)}32`) as string[][];
      const row = keys.find((k) => k[0] === label);
      if (!row) throw new Error(`no key figure ${label}`);
      return row[1];
    };
    const value = (formula: string) => evaluateFormula(formula, { column });
    const block = host.read(sheet, `${columnLetters(heatColumnFor(width))}5:${columnLetters(heatColumnFor(width) + 24)}17`) as string[][];
    return { tableName, keyAt, value, block };
  }

  // The pane's default window with a room, under a clear sky by Linke turbidity: its dni and dhi from
  // SOLARGAINYEAR, then the same window under that weather with some hours blank (no weather).
  const FIELDS: [string, number | string][] = [
    ['name', 'Gaps'], ['year', 2025], ['latitude', 52.2], ['longitude', 4.9], ['utcOffset', 1], ['surfaceAzimuth', 180],
    ['width', 1.8], ['height', 1.5], ['shgc', 0.4], ['panes', 2], ['roomConstruction', 'medium'],
  ];
  const SOLARGAINYEAR = findFunction('SOLARGAINYEAR')!;

  test('a year with missing hours: peak gain, peak load, their hours and the month × hour means are those of SOLARGAINYEAR over the hours it gives', async () => {
    const clear = applyFunction(SOLARGAINYEAR, [[...FIELDS, ['linkeTurbidity', 3]] as RawArg, [['dni', 'dhi']]]) as number[][];
    // Blank: every 3rd day's hours ending 11:00 to 15:00 in June and July (the sunniest hours), and 1 to 3 May.
    const gap = (i: number) => (i >= 3624 && i < 5088 && Math.floor(i / 24) % 3 === 0 && i % 24 >= 10 && i % 24 <= 14) || (i >= 2880 && i < 2952);
    const dni = clear.map(([d], i) => [gap(i) ? '' : d]);
    const dhi = clear.map(([, d], i) => [gap(i) ? '' : d]);
    const rows = applyFunction(SOLARGAINYEAR, [FIELDS as RawArg, [['stamp', 'gain', 'load']], dni as RawArg, dhi as RawArg]) as unknown[][];
    const spec = windowSpecFromFields(fieldsOf(FIELDS.map(([name, cell]) => ({ field: windowFieldFor(name)!, written: name, cell })))).spec;
    spec.weather = { kind: 'measured', dni: dni.map(([v]) => (v === '' ? NaN : (v as number))), dhi: dhi.map(([v]) => (v === '' ? NaN : (v as number))) };
    const r = runYear(spec);
    expect(r.figures.missingHours).toBe(rows.filter((x) => typeof x[1] !== 'number').length);
    expect(r.figures.missingHours).toBeGreaterThan(100);
    // The functions' figures: the largest gain and load over the hours with a number, the first on ties.
    const peakOf = (k: number) => rows.reduce((best, x) => (typeof x[k] === 'number' && (x[k] as number) > best.v ? { v: x[k] as number, at: x[0] as number } : best), { v: 0, at: NaN });
    const gain = peakOf(1);
    const load = peakOf(2);
    const w = await written(r, 'Gaps hourly');
    expect(w.value(w.keyAt('Peak gain (W)')) as number).toBeCloseTo(gain.v, 1);
    expect(w.value(w.keyAt('Peak at (hour ending)')) as number).toBeCloseTo(gain.at, 6);
    expect(w.value(w.keyAt('Peak cooling load (W)')) as number).toBeCloseTo(load.v, 1);
    expect(w.value(w.keyAt('Peak load at (hour ending)')) as number).toBeCloseTo(load.at, 6);
    // June, hour ending 13:00: the mean over the days that have weather then (every 3rd day has none).
    const june13 = rows.filter((x) => typeof x[1] === 'number' && new Date(Math.round(((x[0] as number) - 1 / 48 - 25_569) * 86_400_000)).getUTCMonth() === 5 && new Date(Math.round(((x[0] as number) - 1 / 48 - 25_569) * 86_400_000)).getUTCHours() === 12);
    expect(june13.length).toBe(20);
    const mean = june13.reduce((s, x) => s + (x[1] as number), 0) / june13.length;
    expect(w.block[6][0]).toBe('Jun');
    expect(w.value(w.block[6][13]) as number).toBeCloseTo(mean, 1);
  });

  test('a cold year whose dry-bulb is missing some afternoons: the peak cooling load is the core\'s (the pane\'s status line), not the load of an hour without weather', async () => {
    // Invented: a south window with a U-value in a year at -10 °C, the dry-bulb missing every 7th day
    // 13:00-16:00 (the hour's conduction then drops out, so its load is the radiant tail alone, above the
    // hours around it).
    const clear = annualSeries(baseSpec());
    const dryBulb = Array.from({ length: clear.hours }, (_, i) => (i % 24 >= 13 && i % 24 <= 16 && i % 7 === 0 ? NaN : -10));
    const spec = baseSpec({ name: 'Cold', glazing: { shgc: 0.6, panes: 2, uValue: 5 }, indoorTemperature: 24, room: { construction: 'heavy' }, weather: { kind: 'measured', dni: Array.from(clear.dni), dhi: Array.from(clear.dhi), dryBulb } });
    const r = runYear(spec);
    const load = r.hourly.load!;
    const anyHour = Math.max(...Array.from(load));
    expect(anyHour).toBeGreaterThan(r.figures.peakLoadW! + 50); // an hour without weather holds the largest number
    const w = await written(r, 'Cold hourly');
    expect(w.value(w.keyAt('Peak cooling load (W)')) as number).toBeCloseTo(r.figures.peakLoadW!, 1);
    expect(w.value(w.keyAt('Peak load at (hour ending)')) as number).toBeCloseTo(r.figures.peakLoadStamp!, 6);
  });
});
