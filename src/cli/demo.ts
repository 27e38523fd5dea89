/**
 * `sunpane demo`: the demo workbook of the invented building (src/demo) — window schedule and
 * summary, monthly gains, one window's hourly year and heat map, a shading option comparison and a
 * sheet of example Sunpane worksheet formulas with their results cached — and a short text summary.
 */
import * as path from 'node:path';
import { annualSeries, summarizeAnnual, validateWindowSpec } from '../core/gain';
import { SunpaneError } from '../core/common';
import { glassArea } from '../core/glazing';
import type { Shading } from '../core/shading';
import { DEMO_BUILDING, DEMO_HOURLY_TAG, DEMO_YEAR, type DemoWindow, SHADING_OPTIONS, demoWindows } from '../demo/building';
import { EXAMPLE_SITES, findExampleSite } from '../demo/sites';
import { CAUTION } from '../outputs/caution';
import { DATE_1904_OFFSET, type DateSystem, civilToSerial } from '../core/time';
import { applyFunction } from '../registry/evaluate';
import { NAMESPACE, findFunction } from '../registry';
import { GLOSSARY } from '../registry/glossary';
import type { Output } from './call';
import { MONTHS, addHeatMapSheet, addHourlySheet, addMonthlySheet } from './annualSheets';
import { checkOutput, ensureFolder } from './atomicWrite';
import { DATE_SYSTEM_FLAG, type Flags, dateSystemFlag, dateSystemHelp, parseFlags } from './flags';
import { type DemoFormulaSet, addFormulaSheet, clockCells, demoFormulas, storedFormula } from './demoFormulas';
import { ProgressBar } from './progress';
import { type SummaryTotals, type WindowResult, addSummaryTable, summaryChart, windowResult } from './schedule';
import { type SheetChart, cellRef, columnRef } from './xlsxCharts';
import { PALETTE } from '../outputs/palette';
import { type ExcelJS, NUMBER_FORMATS, type TableCell, addDataTable, addSheetHeading, address, columnLetter, fillContentsSheet, freezeAt, newWorkbook, saveWorkbook, serialToCellDate, setFormula, setLabel, styleHeader } from './workbook';

export const DEMO_HELP = `usage: sunpane demo [--out DIR] [--${DATE_SYSTEM_FLAG} 1904]

Writes DIR/sunpane-demo.xlsx (default DIR: out/demo) for an invented building, ${DEMO_BUILDING.name},
on two example sites (invented names, rounded real coordinates; one in each hemisphere) under a
clear sky, and prints a summary.

Sheets: Overview (the building, annual gain by site and facing, best shading option),
Schedule (the windows as a window schedule table, one SUNPANE.SOLARGAIN formula per row), Summary (each window's year, SUM/MAX totals), Monthly (gain by month
and window), Options (shading options compared on the equator-facing office window),
Hourly ${DEMO_HOURLY_TAG} (8760 hours), Year ${DEMO_HOURLY_TAG} (monthly, peak), Heat map ${DEMO_HOURLY_TAG} (day × hour),
Formulas (example SUNPANE.* worksheet formulas with cached results; they recalculate in Excel
once the add-in is installed).

  --out DIR   output folder (created if needed)
${dateSystemHelp(14)}
  --force     replace the workbook if it exists (a read-only one is never replaced)
  --help      this text

Every number in the demo building is invented; results are estimates by published methods.
Exit codes: 0 done, 1 bad input (e.g. an unwritable folder), 2 wrong usage.`;

const DEMO_FLAGS = { out: true, [DATE_SYSTEM_FLAG]: true, force: false, help: false } as const;

/** Name of the demo workbook file. */
export const DEMO_FILE = 'sunpane-demo.xlsx';

/** One row of the shading option comparison. */
export interface OptionResult {
  tag: string;
  option: string;
  result: WindowResult;
  /**
   * The same window under the earlier beam-only treatment of diffuse light (devices cut only the
   * beam; `diffuseShading: "beamOnly"`), for the before/after columns: annual gain [kWh], peak [W].
   */
  beamOnly: { annualKWh: number; peakW: number };
}

/** Everything the demo computed: for the workbook, the text summary and the tests. */
export interface DemoResults {
  windows: (DemoWindow & WindowResult)[];
  options: OptionResult[];
  formulas: DemoFormulaSet;
}

/** The option comparison windows: the first equator-facing office window on each site. */
function optionWindows(windows: readonly DemoWindow[]): DemoWindow[] {
  return DEMO_BUILDING.siteIds.map((id) => {
    const equator = (findExampleSite(id)?.site.latitude ?? 0) >= 0 ? 'S' : 'N';
    const w = windows.find((x) => x.siteId === id && x.facing === equator && x.room === 'office');
    if (!w) throw new Error(`internal error: no equator-facing office window on ${id}`);
    return w;
  });
}

/** Works out every window's year, the option comparison and the example formulas. */
export function computeDemo(onStep: () => void = () => undefined, dateSystem: DateSystem = 1900): DemoResults {
  const schedule = demoWindows();
  const windows = schedule.map((w) => {
    validateWindowSpec(w.spec);
    const r = windowResult(w.spec);
    onStep();
    return { ...w, ...r };
  });
  const options: OptionResult[] = [];
  for (const w of optionWindows(schedule)) {
    for (const o of SHADING_OPTIONS) {
      const spec = { ...w.spec, name: `${w.tag} ${o.option}`, shading: o.shading as Shading };
      const before = summarizeAnnual(annualSeries(validateWindowSpec({ ...spec, diffuseShading: 'beamOnly' })));
      options.push({ tag: w.tag, option: o.option, result: windowResult(validateWindowSpec(spec)), beamOnly: { annualKWh: before.annualKWh, peakW: before.peakW } });
      onStep();
    }
  }
  return { windows, options, formulas: demoFormulas(schedule.find((w) => w.tag === DEMO_HOURLY_TAG) ?? schedule[0], dateSystem) };
}

/** Steps {@link computeDemo} reports (for the progress bar). */
export function demoSteps(): number {
  return demoWindows().length + DEMO_BUILDING.siteIds.length * SHADING_OPTIONS.length;
}

const FACINGS = ['N', 'E', 'S', 'W'] as const;

/** Annual gain [kWh] by site and facing. */
export function gainBySiteAndFacing(results: DemoResults): { siteId: string; byFacing: Record<string, number> }[] {
  return DEMO_BUILDING.siteIds.map((siteId) => {
    const byFacing: Record<string, number> = {};
    for (const f of FACINGS) byFacing[f] = results.windows.filter((w) => w.siteId === siteId && w.facing === f).reduce((a, w) => a + w.summary.annualKWh, 0);
    return { siteId, byFacing };
  });
}

/** The option with the least annual gain for each compared window, and its saving against no shading. */
export function bestOptions(results: DemoResults): { tag: string; option: string; kwh: number; saving: number }[] {
  const tags = [...new Set(results.options.map((o) => o.tag))];
  return tags.map((tag) => {
    const rows = results.options.filter((o) => o.tag === tag);
    const none = rows.find((o) => o.option === 'none')?.result.summary.annualKWh ?? 0;
    const best = rows.reduce((a, b) => (b.result.summary.annualKWh < a.result.summary.annualKWh ? b : a));
    return { tag, option: best.option, kwh: best.result.summary.annualKWh, saving: none > 0 ? 1 - best.result.summary.annualKWh / none : 0 };
  });
}

function siteLabel(siteId: string): string {
  const s = findExampleSite(siteId);
  if (!s) return siteId;
  const lat = s.site.latitude;
  return `${s.label}, ${Math.abs(lat).toFixed(1)}° ${lat >= 0 ? 'N' : 'S'}`;
}

/** The text summary printed to stdout. */
export function demoSummaryText(results: DemoResults, file: string): string[] {
  const lines = [`${DEMO_BUILDING.name}: ${DEMO_BUILDING.description}; clear-sky year ${DEMO_YEAR}.`];
  for (const { siteId, byFacing } of gainBySiteAndFacing(results)) {
    lines.push(`  ${siteLabel(siteId)}: annual solar gain ${FACINGS.map((f) => `${f} ${Math.round(byFacing[f])}`).join(', ')} kWh`);
  }
  for (const b of bestOptions(results)) {
    lines.push(`  least gain on ${b.tag}: ${b.option} (${Math.round(b.kwh)} kWh, ${Math.round(b.saving * 100)} % below no shading)`);
  }
  lines.push(`wrote ${file}`, CAUTION);
  return lines;
}

/** Formula cells whose values a spreadsheet program must reproduce (for the LibreOffice check). */
export interface DemoCheckCells {
  summary: SummaryTotals;
  monthly: { cell: string; expected: number }[];
  options: { cell: string; expected: number }[];
  overview: { cell: string; expected: number }[];
  hourly: { cell: string; expected: number }[];
  formulas: { cell: string; expected: number }[];
}

function addOverview(wb: ExcelJS.Workbook, results: DemoResults): { cell: string; expected: number }[] {
  const ws = wb.addWorksheet('Overview');
  const top = addSheetHeading(ws, `${DEMO_BUILDING.name} — Sunpane demo`, [`An invented building on two example sites (invented names; rounded real coordinates chosen as example locations), clear-sky year ${DEMO_YEAR}; every other input is made up.`]);
  const rows: TableCell[][] = gainBySiteAndFacing(results).map(({ siteId, byFacing }) => {
    const s = findExampleSite(siteId)!;
    return [s.label, s.site.latitude, s.site.longitude, s.site.utcOffset, ...FACINGS.map((f) => byFacing[f])];
  });
  const t = addDataTable(
    ws,
    'GainBySite',
    { row: top, column: 1 },
    [
      { header: 'Site', width: 26 },
      { header: 'Latitude (°)', numFmt: NUMBER_FORMATS.angle, width: 16 },
      { header: 'Longitude (°)', numFmt: NUMBER_FORMATS.angle, width: 12 },
      { header: 'UTC offset (h)', numFmt: '0.0#', width: 12 },
      ...FACINGS.map((f) => ({ header: `${f}-facing (kWh)`, numFmt: NUMBER_FORMATS.kwh, width: 13 })),
    ],
    rows,
  );
  const checks: { cell: string; expected: number }[] = [];
  const totalCol = 5 + FACINGS.length;
  ws.getCell(top, totalCol).value = 'All facings (kWh)';
  styleHeader(ws, top, totalCol, totalCol);
  ws.getColumn(totalCol).width = 18;
  rows.forEach((r, k) => {
    const row = top + 1 + k;
    const expected = (r.slice(4) as number[]).reduce((a, b) => a + b, 0);
    const cell = address(row, totalCol);
    setFormula(ws, cell, `SUM(${address(row, 5)}:${address(row, 4 + FACINGS.length)})`, expected, NUMBER_FORMATS.kwh);
    checks.push({ cell: `Overview!${cell}`, expected });
  });
  let row = t.lastRow + 2;
  setLabel(ws, address(row, 1), 'Least annual gain by shading option (Options sheet)');
  for (const b of bestOptions(results)) {
    row++;
    ws.getCell(row, 1).value = b.tag;
    ws.getCell(row, 2).value = b.option;
    ws.getCell(row, 3).value = b.saving;
    ws.getCell(row, 3).numFmt = NUMBER_FORMATS.percent;
    ws.getCell(row, 4).value = 'below no shading';
  }
  row += 2;
  setLabel(ws, address(row, 1), 'Sites (examples, not a climate database)');
  for (const s of EXAMPLE_SITES.filter((x) => DEMO_BUILDING.siteIds.includes(x.id))) {
    row++;
    ws.getCell(row, 1).value = s.label;
    ws.getCell(row, 2).value = s.description;
  }
  freezeAt(ws, top + 1);
  return checks;
}

/** The window fields of the demo schedule, in column order (the block a gain formula reads). */
const SCHEDULE_FIELDS = [
  'name',
  'site',
  'year',
  'surfaceAzimuth',
  'width',
  'height',
  'frameFraction',
  'shgc',
  'panes',
  'overhangProjection',
  'overhangGap',
  'overhangExtension',
  'finProjection',
  'finGap',
  'finExtensionAbove',
  'finExtensionBelow',
  'revealDepth',
  'skyline',
] as const;

/** A demo window as a row of schedule cells (blank where it has no such device). */
export function scheduleRowOf(w: DemoWindow): (string | number)[] {
  const s = w.spec.shading;
  const o = s.overhang;
  const fin = s.leftFin ?? s.rightFin;
  if (o && o.extensionLeft !== o.extensionRight) throw new Error(`internal error: ${w.tag} has an overhang reaching unequally past its jambs`);
  if (s.leftFin && s.rightFin && JSON.stringify(s.leftFin) !== JSON.stringify(s.rightFin)) throw new Error(`internal error: ${w.tag} has unequal fins`);
  const cells: Record<(typeof SCHEDULE_FIELDS)[number], string | number> = {
    name: w.spec.name,
    site: w.siteId,
    year: w.spec.year,
    surfaceAzimuth: w.spec.surfaceAzimuth,
    width: w.spec.width,
    height: w.spec.height,
    frameFraction: w.spec.frameFraction,
    shgc: w.spec.glazing.shgc,
    panes: w.spec.glazing.panes,
    overhangProjection: o?.projection ?? '',
    overhangGap: o?.gap ?? '',
    overhangExtension: o?.extensionLeft ?? '',
    finProjection: fin?.projection ?? '',
    finGap: fin?.gap ?? '',
    finExtensionAbove: fin?.extensionAbove ?? '',
    finExtensionBelow: fin?.extensionBelow ?? '',
    revealDepth: s.revealDepth ?? '',
    skyline: s.skyline ? s.skyline.join(' ') : '',
  };
  return SCHEDULE_FIELDS.map((k) => cells[k]);
}

/** The header row of the demo schedule's window fields: the glossary labels. */
export function scheduleHeader(): string[] {
  return SCHEDULE_FIELDS.map((k) => GLOSSARY[k].label);
}

/** The design hour of the schedule's gain column: 21 July of the demo year, the hour ending 16:00. */
export function scheduleHour(): number {
  return civilToSerial(DEMO_YEAR, 7, 21, 16, 0, 0);
}

/** Column of the schedule's design-hour cell (E; made wide enough for a date-time). */
const HOUR_COLUMN = 5;

/** Width of a window-field column of the schedule: its header and its longest cell fit, 9 to 26 characters; the design hour's column fits a date-time. */
function fieldWidth(k: number, header: string, rows: readonly TableCell[][]): number {
  const longest = Math.max(header.length, ...rows.map((r) => String(r[k] ?? '').length));
  const width = Math.max(9, Math.min(26, longest + 2));
  return k + 1 === HOUR_COLUMN ? Math.max(width, 17) : width;
}

/**
 * The window schedule: an Excel table whose first columns are window fields (headers = glossary
 * labels), and a gain column with one short formula per row that hands the function its own row
 * with the header row — `SUNPANE.SOLARGAIN(VSTACK(header, row), hour)` — cached by our core.
 * @returns the formula cells with the values they hold (for the tests)
 */
function addSchedule(wb: ExcelJS.Workbook, results: DemoResults, dateSystem: DateSystem): { cell: string; formula: string; expected: number }[] {
  const ws = wb.addWorksheet('Schedule');
  const top = addSheetHeading(ws, `${DEMO_BUILDING.name}: window schedule`, [
    'Each row is one window, described by the window fields (the same names as the functions, the window file and the pane). The gain column calls SUNPANE.SOLARGAIN with the header row stacked on its own row; results were worked out by Sunpane when the file was written.',
  ]);
  ws.getCell(top, 1).value = 'Design hour (hour ending, local standard time)';
  const hourCell = ws.getCell(top, HOUR_COLUMN);
  hourCell.value = serialToCellDate(scheduleHour());
  hourCell.numFmt = NUMBER_FORMATS.dateTime;
  const hourRef = `$${address(top, HOUR_COLUMN).replace(/\d+$/, '')}$${top}`;
  // In a 1904 workbook, the clock range beside the hour (Date system = 1904), SOLARGAIN's last argument.
  const clock = dateSystem === 1904 ? clockCells(1904) : undefined;
  let clockArgs = '';
  if (clock) {
    ws.getCell(top, HOUR_COLUMN + 2).value = clock[0][0];
    ws.getCell(top, HOUR_COLUMN + 3).value = clock[0][1];
    clockArgs = `,,,$${columnLetter(HOUR_COLUMN + 2)}$${top}:$${columnLetter(HOUR_COLUMN + 3)}$${top}`;
  }
  const cellHour = clock ? scheduleHour() - DATE_1904_OFFSET : scheduleHour();
  const header = scheduleHeader();
  const fieldCount = header.length;
  const rows: TableCell[][] = results.windows.map((w) => [...scheduleRowOf(w), w.room, glassArea(w.spec.width, w.spec.height, w.spec.frameFraction), null]);
  const gainHeader = 'Solar gain in the design hour (W)';
  const t = addDataTable(
    ws,
    'Schedule',
    { row: top + 2, column: 1 },
    [
      ...header.map((h, k) => ({ header: h, width: fieldWidth(k, h, rows) })),
      { header: 'Room', width: 14 },
      { header: 'Glass area (m²)', numFmt: NUMBER_FORMATS.area, width: 15 },
      { header: gainHeader, numFmt: NUMBER_FORMATS.watts, width: 18 },
    ],
    rows,
  );
  const fn = findFunction('SOLARGAIN')!;
  const lastField = address(t.headerRow, fieldCount).replace(/\d+$/, '');
  const headerRef = `$A$${t.headerRow}:$${lastField}$${t.headerRow}`;
  const out: { cell: string; formula: string; expected: number }[] = [];
  results.windows.forEach((w, k) => {
    const row = t.headerRow + 1 + k;
    const cells = scheduleRowOf(w);
    const value = applyFunction(fn, clock ? [[header, cells], cellHour, undefined, undefined, clock] : [[header, cells], cellHour])[0][0];
    if (typeof value !== 'number') throw new Error(`the demo's schedule row of ${w.tag} was refused: ${String((value as Error).message ?? value)}`);
    const formula = `${NAMESPACE}.SOLARGAIN(_xlfn.VSTACK(${headerRef},$A${row}:$${lastField}${row}),${hourRef}${clockArgs})`;
    const cell = address(row, t.columnOf(gainHeader));
    setFormula(ws, cell, storedFormula(formula), value, NUMBER_FORMATS.watts);
    out.push({ cell: `Schedule!${cell}`, formula, expected: value });
  });
  freezeAt(ws, t.headerRow + 1, 2);
  return out;
}

function addMonthlyMatrix(wb: ExcelJS.Workbook, results: DemoResults): { cell: string; expected: number }[] {
  const ws = wb.addWorksheet('Monthly');
  const top = addSheetHeading(ws, `${DEMO_BUILDING.name}: solar gain by month and window (kWh), clear-sky ${DEMO_YEAR}`);
  const rows: TableCell[][] = MONTHS.map((m, k) => [m, ...results.windows.map((w) => w.summary.monthlyKWh[k])]);
  const t = addDataTable(
    ws,
    'MonthlyByWindow',
    { row: top, column: 1 },
    [{ header: 'Month', width: 9 }, ...results.windows.map((w) => ({ header: `${w.tag} (kWh)`, numFmt: NUMBER_FORMATS.kwh, width: 11 }))],
    rows,
  );
  const sumRow = t.lastRow + 1;
  const maxRow = t.lastRow + 2;
  setLabel(ws, address(sumRow, 1), 'Year');
  setLabel(ws, address(maxRow, 1), 'Top month');
  const checks: { cell: string; expected: number }[] = [];
  results.windows.forEach((w) => {
    const h = `${w.tag} (kWh)`;
    const col = t.columnOf(h);
    const topMonth = Math.max(...w.summary.monthlyKWh);
    setFormula(ws, address(sumRow, col), `SUM(${t.bodyRange(h)})`, w.summary.annualKWh, NUMBER_FORMATS.kwh);
    setFormula(ws, address(maxRow, col), `MAX(${t.bodyRange(h)})`, topMonth, NUMBER_FORMATS.kwh);
    checks.push({ cell: `Monthly!${address(sumRow, col)}`, expected: w.summary.annualKWh }, { cell: `Monthly!${address(maxRow, col)}`, expected: topMonth });
  });
  freezeAt(ws, t.headerRow + 1, 2);
  return checks;
}

function addOptions(wb: ExcelJS.Workbook, results: DemoResults): { checks: { cell: string; expected: number }[]; chart: SheetChart } {
  const ws = wb.addWorksheet('Options');
  const top = addSheetHeading(ws, `${DEMO_BUILDING.name}: outside shading options compared, clear-sky ${DEMO_YEAR}`, [
    'Saving = 1 − annual gain ÷ annual gain of the same window with no outside shading.',
    'Beam-only: the earlier treatment, in which the devices cut only the beam; now they cut the sky and ground light too.',
    'Beam and diffuse cuts: the share of the year’s beam, and of its sky and ground light, that the shading keeps off the glass.',
  ]);
  const rows: TableCell[][] = results.options.map((o) => [
    o.tag,
    o.option,
    o.result.summary.annualKWh,
    o.result.summary.peakW,
    o.beamOnly.annualKWh,
    o.beamOnly.peakW,
    o.result.summary.beamCut,
    o.result.summary.diffuseCut,
    o.result.summary.sunlitHours,
    o.result.summary.meanSunlitFraction,
    null,
  ]);
  const t = addDataTable(
    ws,
    'ShadingOptions',
    { row: top, column: 1 },
    [
      { header: 'Window', width: 10 },
      { header: 'Shading option', width: 20 },
      { header: 'Annual gain (kWh)', numFmt: NUMBER_FORMATS.kwh, width: 18 },
      { header: 'Peak gain (W)', numFmt: NUMBER_FORMATS.watts, width: 14 },
      { header: 'Annual gain, beam-only (kWh)', numFmt: NUMBER_FORMATS.kwh, width: 28 },
      { header: 'Peak gain, beam-only (W)', numFmt: NUMBER_FORMATS.watts, width: 24 },
      { header: 'Beam cut (%)', numFmt: NUMBER_FORMATS.percent, width: 13 },
      { header: 'Diffuse cut (%)', numFmt: NUMBER_FORMATS.percent, width: 15 },
      { header: 'Hours with beam on the glass (h)', numFmt: NUMBER_FORMATS.integer, width: 30 },
      { header: 'Mean sunlit fraction (0-1)', numFmt: NUMBER_FORMATS.fraction, width: 25 },
      { header: 'Saving vs no shading (%)', numFmt: NUMBER_FORMATS.percent, width: 24 },
    ],
    rows,
  );
  const checks: { cell: string; expected: number }[] = [];
  const gainCol = t.columnOf('Annual gain (kWh)');
  const savingCol = t.columnOf('Saving vs no shading (%)');
  results.options.forEach((o, k) => {
    const row = t.headerRow + 1 + k;
    const noneIndex = results.options.findIndex((x) => x.tag === o.tag && x.option === 'none');
    const noneRow = t.headerRow + 1 + noneIndex;
    const none = results.options[noneIndex].result.summary.annualKWh;
    const expected = none > 0 ? 1 - o.result.summary.annualKWh / none : 0;
    const cell = address(row, savingCol);
    setFormula(ws, cell, `1-${address(row, gainCol)}/${address(noneRow, gainCol)}`, expected, NUMBER_FORMATS.percent);
    checks.push({ cell: `Options!${cell}`, expected });
  });
  freezeAt(ws, t.headerRow + 1, 3);
  // A bar chart of annual gain by option, one series per compared window (rows grouped by window).
  const tags = [...new Set(results.options.map((o) => o.tag))];
  const series = tags.map((tag, k) => {
    const first = results.options.findIndex((o) => o.tag === tag);
    const rows = results.options.filter((o) => o.tag === tag);
    const r0 = t.headerRow + 1 + first;
    return {
      name: tag,
      nameRef: cellRef('Options', 'A', r0),
      categories: rows.map((o) => o.option),
      categoriesRef: columnRef('Options', 'B', r0, r0 + rows.length - 1),
      values: rows.map((o) => o.result.summary.annualKWh),
      valuesRef: columnRef('Options', columnLetter(gainCol), r0, r0 + rows.length - 1),
      colour: PALETTE.series[k % PALETTE.series.length],
    };
  });
  const below = t.lastRow + 2;
  const chart: SheetChart = { sheet: 'Options', kind: 'bar', title: 'Annual solar gain by shading option (kWh)', valueAxisTitle: 'Solar gain (kWh/yr)', valueFormat: '#,##0', series, from: { col: 0, row: below }, to: { col: 6, row: below + 20 } };
  return { checks, chart };
}

/** Builds the whole demo workbook; returns it with the formula cells a spreadsheet must reproduce. */
export function buildDemoWorkbook(results: DemoResults, onHour?: () => void): { workbook: ExcelJS.Workbook; checks: DemoCheckCells; charts: SheetChart[]; schedule: { cell: string; formula: string; expected: number }[] } {
  // The workbook's date system is the one the example formulas were worked out in (computeDemo).
  const dateSystem = results.formulas.dateSystem;
  const wb = newWorkbook(`Sunpane demo: ${DEMO_BUILDING.name}`, dateSystem);
  const contents = wb.addWorksheet('Contents');
  const overview = addOverview(wb, results);
  const schedule = addSchedule(wb, results, dateSystem);
  const summarySheet = wb.addWorksheet('Summary');
  const summaryTop = addSheetHeading(summarySheet, `${DEMO_BUILDING.name}: each window's year, clear-sky ${DEMO_YEAR}`);
  const summary = addSummaryTable(summarySheet, 'WindowSummary', summaryTop, results.windows);
  freezeAt(summarySheet, summaryTop + 1, 2);
  const monthly = addMonthlyMatrix(wb, results);
  const { checks: options, chart: optionsChart } = addOptions(wb, results);
  const formulaChecks = addFormulaSheet(wb, 'Formulas', results.formulas);
  const hourlyWindow = results.windows.find((w) => w.tag === DEMO_HOURLY_TAG) ?? results.windows[0];
  const series = annualSeries(hourlyWindow.spec);
  const hourlySheet = `Hourly ${hourlyWindow.tag}`;
  addHeatMapSheet(wb, `Heat map ${hourlyWindow.tag}`, series, `${hourlyWindow.spec.name}: solar gain (W) by day and hour ending, clear-sky ${DEMO_YEAR}`);
  // The monthly sheet refers to the hourly one, which comes last (its many printed pages follow
  // the one-page sheets).
  const yearSheet = wb.addWorksheet(`Year ${hourlyWindow.tag}`);
  const placement = addHourlySheet(wb, hourlySheet, `Hourly_${hourlyWindow.tag}`, series, onHour, `${hourlyWindow.spec.name}: hourly solar gain, clear-sky ${DEMO_YEAR}`);
  const yearCells = addMonthlySheet(yearSheet, `Year_${hourlyWindow.tag}`, summarizeAnnual(series), { sheet: hourlySheet, placement, series }, `${hourlyWindow.spec.name}: solar gain by month, clear-sky ${DEMO_YEAR}`);
  const tag = hourlyWindow.tag;
  fillContentsSheet(contents, `${DEMO_BUILDING.name} — Sunpane demo workbook`, [`An invented building on two example sites (invented names; rounded real coordinates chosen as example locations), clear-sky year ${DEMO_YEAR}; every other input is made up.`], [
    { sheet: 'Contents', holds: 'This list.' },
    { sheet: 'Overview', holds: 'The building in brief: annual solar gain by site and facing, the shading option with the least gain, the example sites.' },
    { sheet: 'Schedule', holds: 'The windows as a window schedule table (one row per window, the window fields as columns) with one SUNPANE.SOLARGAIN formula per row: the solar gain in the design hour.' },
    { sheet: 'Summary', holds: "Each window's year: annual and monthly solar gain, peak hour, hours with beam on the glass, mean sunlit fraction; totals as formulas; a chart of annual gain by window." },
    { sheet: 'Monthly', holds: 'Solar gain by month for every window, with yearly totals and the top month as formulas.' },
    { sheet: 'Options', holds: 'Outside shading options compared on the equator-facing office window of each site: annual and peak gain, saving against no shading; a chart of annual gain by option.' },
    { sheet: 'Formulas', holds: 'Sunpane worksheet functions on one window, described once in a block of window fields, at one hour; the results recalculate in Excel when the add-in is loaded.' },
    { sheet: `Heat map ${tag}`, holds: `Solar gain (W) of window ${tag} for every hour of the year, one row per day, coloured from least to most.` },
    { sheet: `Year ${tag}`, holds: `Window ${tag} by month, as formulas over its hourly table: gain, missing hours, the year, the peak hour, mean gain by month and hour ending; a chart of the annual profile.` },
    { sheet: `Hourly ${tag}`, holds: `The hourly year of window ${tag} as a table (8760 rows; left out of the printed pages).` },
  ]);
  const hourly = [yearCells.annualKWh, yearCells.maxMonthKWh, ...(yearCells.peakW ? [yearCells.peakW] : []), ...yearCells.months, ...yearCells.monthHour];
  const charts = [summaryChart('Summary', summaryTop, results.windows), optionsChart, yearCells.chart];
  return { workbook: wb, checks: { summary, monthly, options, overview, hourly, formulas: formulaChecks }, charts, schedule };
}

/** Reads `--out` (default out/demo). */
function outDir(flags: Flags): string {
  return flags.get('out') ?? path.join('out', 'demo');
}

/** Runs `sunpane demo`. */
export async function demoCommand(argv: readonly string[], io: Output): Promise<number> {
  const flags = parseFlags(argv, DEMO_FLAGS);
  if (flags.has('help')) {
    io.out(DEMO_HELP);
    return 0;
  }
  const dateSystem = dateSystemFlag(flags, 'xlsx');
  const dir = outDir(flags);
  await ensureFolder(dir);
  const force = { force: flags.has('force') };
  const file = path.join(dir, DEMO_FILE);
  checkOutput(file, force);
  const bar = new ProgressBar('demo windows', demoSteps());
  let results: DemoResults;
  try {
    results = computeDemo(() => bar.tick(), dateSystem);
  } catch (err) {
    if (err instanceof SunpaneError) throw new Error(`internal error: the demo data was refused: ${err.message}`);
    throw err;
  }
  bar.finish();
  const writing = new ProgressBar('hourly sheet', demoWindows()[0].spec.year % 4 === 0 ? 8784 : 8760);
  const { workbook, charts } = buildDemoWorkbook(results, () => writing.tick());
  writing.finish();
  await saveWorkbook(workbook, file, force, charts);
  for (const line of demoSummaryText(results, path.normalize(file))) io.out(line);
  return 0;
}
