/**
 * The demo's sheet of example worksheet formulas: one of the demo windows described ONCE, as a
 * block of glossary fields (labels in the first column, values beside them), a design hour, and
 * Sunpane functions applied to them — the window functions take the block as one argument. They
 * are written as real formulas, stored the way Excel saves a call to an add-in's custom function,
 * `_xldudf_SUNPANE_<NAME>(...)` (docs/platform.md), with cached results that come from our core
 * through the same `applyFunction` the add-in uses. They recalculate in Excel once the add-in is
 * installed; other programs show the cached value until they recalculate (then #NAME?).
 *
 * Functions are looked up with `findFunction`, and arguments are given by parameter name, so a
 * renamed function or parameter makes the demo fail loudly rather than write a dead formula.
 */
import { SunpaneError } from '../core/common';
import { DATE_1904_OFFSET, type DateSystem, civilToSerial } from '../core/time';
import type { DemoWindow } from '../demo/building';
import { applyFunction } from '../registry/evaluate';
import { NAMESPACE, findFunction } from '../registry';
import { GLOSSARY, type GlossaryEntry } from '../registry/glossary';
import { NotAvailable, type RawArg, type Scalar } from '../registry/types';
import { type ExcelJS, NUMBER_FORMATS, addDataTable, addSheetHeading, address, freezeAt, serialToCellDate, setFormula, sheetSerial, styleHeader } from './workbook';

/** One field of the demo window block. */
export interface DemoInput {
  /** Glossary name of the field, and the defined name of its value cell. */
  key: string;
  /** The field's label, written in the block's first column (the reader accepts it as the name). */
  label: string;
  value: number | string;
}

/** One example formula with its cached result. */
export interface DemoFormula {
  /** What it works out, in words. */
  label: string;
  /** Registry name (without the namespace). */
  name: string;
  /** Formula text without `=`, arguments as absolute references to the input cells. */
  formula: string;
  /** Our core's result (a number), or the text `#N/A` with a reason. */
  result: number | string;
  unit: string;
  numFmt: string;
  /** Raw arguments as passed to applyFunction (for the tests). */
  rawArgs: (RawArg | undefined)[];
}

/** The design hour, the window block and the formulas that refer to them. */
export interface DemoFormulaSet {
  /** The design hour: a stamp read as hour ending (the sun at mid-hour). */
  hour: number;
  inputs: DemoInput[];
  formulas: DemoFormula[];
  /**
   * The workbook's date system: in 1904 the sheet gets a clock range (Date system = 1904) that every
   * function reading or giving a date-time takes as its `clock`, so the 1904 serials read right.
   */
  dateSystem: DateSystem;
}

/** A formula argument: a window field's value cell, the whole window block, the hour, the mid-hour instant, or an earlier formula's result. */
type ArgSource = { input: string } | { window: true } | { hour: true } | { midHour: true } | { formula: string } | { clock: true };

interface FormulaPlan {
  label: string;
  name: string;
  args: Record<string, ArgSource>;
  unit: string;
  numFmt: string;
}

/**
 * A formula as a saved workbook stores it: each `SUNPANE.NAME(` call becomes
 * `_xldudf_SUNPANE_NAME(`, the form Excel writes for a custom function of an add-in and resolves
 * to the add-in's function when the add-in loads with the workbook (docs/platform.md). A call
 * written as plain `SUNPANE.NAME(` text is read as an unknown function and stays #NAME?.
 */
export function storedFormula(text: string): string {
  return text.replace(new RegExp(`\\b${NAMESPACE}\\.([A-Z][A-Z0-9_]*)\\(`, 'g'), `_xldudf_${NAMESPACE}_$1(`);
}

/** Rows of the sheet (1-based), under the title, its three lines and the caution: the design hour, the mid-hour instant, the block's header. */
const HOUR_ROW = 7;
const MID_ROW = 8;
/** The clock range of a 1904 workbook (label in A, 1904 in B). */
const CLOCK_ROW = 9;
const BLOCK_HEADER = 10;

/** A clock range that says the workbook's date system (the glossary's field, as a function's `clock` reads it). */
export function clockCells(dateSystem: DateSystem): [string, number][] {
  return [[GLOSSARY.dateSystem.label, dateSystem]];
}

/** The window fields the block gives, from the demo window (the invented clear sky by τb and τd). */
export function demoInputs(window: DemoWindow): DemoInput[] {
  const { spec } = window;
  const o = spec.shading.overhang;
  const field = (g: GlossaryEntry, value: number | string): DemoInput => ({ key: g.name, label: g.label, value });
  const G = GLOSSARY;
  return [
    field(G.name, spec.name),
    field(G.latitude, spec.site.latitude),
    field(G.longitude, spec.site.longitude),
    field(G.utcOffset, spec.site.utcOffset),
    field(G.elevation, spec.site.elevation ?? 0),
    field(G.surfaceAzimuth, spec.surfaceAzimuth),
    field(G.width, spec.width),
    field(G.height, spec.height),
    field(G.frameFraction, spec.frameFraction),
    field(G.shgc, spec.glazing.shgc),
    field(G.panes, spec.glazing.panes),
    field(G.overhangProjection, o?.projection ?? 0),
    field(G.overhangGap, o?.gap ?? 0),
    field(G.overhangExtension, o?.extensionLeft ?? 0),
    field(G.tauB, 0.36),
    field(G.tauD, 2.4),
  ];
}

/** The design hour: 21 June of the demo year, the hour ending 15:00 (the sun at 14:30). */
export function demoHour(window: DemoWindow): number {
  return civilToSerial(window.spec.year, 6, 21, 15, 0, 0);
}

const WHEN_WHERE = { dateTime: { midHour: true }, latitude: { input: 'latitude' }, longitude: { input: 'longitude' }, utcOffset: { input: 'utcOffset' } } as const;

/** The example formulas, by function name and parameter name. */
const PLANS: readonly FormulaPlan[] = [
  { label: 'solar gain of the window in the design hour', name: 'SOLARGAIN', args: { window: { window: true }, dateTime: { hour: true } }, unit: 'W', numFmt: NUMBER_FORMATS.watts },
  { label: 'sun altitude at mid-hour', name: 'SUNALTITUDE', args: { ...WHEN_WHERE }, unit: '°', numFmt: '0.00' },
  { label: 'sun azimuth at mid-hour', name: 'SUNAZIMUTH', args: { ...WHEN_WHERE }, unit: '°', numFmt: '0.00' },
  { label: 'sunrise', name: 'SUNRISE', args: { date: { hour: true }, latitude: { input: 'latitude' }, longitude: { input: 'longitude' }, utcOffset: { input: 'utcOffset' } }, unit: '', numFmt: 'hh:mm' },
  { label: 'sunset', name: 'SUNSET', args: { date: { hour: true }, latitude: { input: 'latitude' }, longitude: { input: 'longitude' }, utcOffset: { input: 'utcOffset' } }, unit: '', numFmt: 'hh:mm' },
  { label: 'incidence angle on the window', name: 'INCIDENCEAT', args: { ...WHEN_WHERE, surfaceAzimuth: { input: 'surfaceAzimuth' } }, unit: '°', numFmt: '0.00' },
  {
    label: 'profile angle',
    name: 'PROFILEANGLE',
    args: { sunAltitude: { formula: 'sun altitude at mid-hour' }, sunAzimuth: { formula: 'sun azimuth at mid-hour' }, surfaceAzimuth: { input: 'surfaceAzimuth' } },
    unit: '°',
    numFmt: '0.00',
  },
  {
    label: 'sunlit fraction of the glass under its overhang',
    name: 'WINDOWSUNLIT',
    args: { window: { window: true }, sunAltitude: { formula: 'sun altitude at mid-hour' }, sunAzimuth: { formula: 'sun azimuth at mid-hour' } },
    unit: '',
    numFmt: NUMBER_FORMATS.fraction,
  },
  { label: 'SHGC at this incidence angle', name: 'SHGCANGLE', args: { incidence: { formula: 'incidence angle on the window' }, shgc: { input: 'shgc' } }, unit: '', numFmt: NUMBER_FORMATS.shgc },
  { label: 'glass area', name: 'GLASSAREA', args: { width: { input: 'width' }, height: { input: 'height' }, frameFraction: { input: 'frameFraction' } }, unit: 'm²', numFmt: NUMBER_FORMATS.area },
];

/** Row of the i-th field of the block (1-based sheet row); labels in column A, values in column B. */
function inputRow(i: number): number {
  return BLOCK_HEADER + 1 + i;
}

/** First row of the formula table (its header). */
function formulaTop(inputs: number): number {
  return inputRow(inputs) + 2;
}

/**
 * Works out the example formulas: text with cell references, and cached results by applyFunction.
 * @throws Error when a planned function or parameter is not in the registry (renamed or removed)
 */
export function demoFormulas(window: DemoWindow, dateSystem: DateSystem = 1900): DemoFormulaSet {
  const inputs = demoInputs(window);
  const hour = demoHour(window);
  // The date-times as the workbook's cells hold them (1462 days less in a 1904 workbook).
  const cellHour = dateSystem === 1904 ? hour - DATE_1904_OFFSET : hour;
  const inputIndex = new Map(inputs.map((x, i) => [x.key, i]));
  const block = `$A$${inputRow(0)}:$B$${inputRow(inputs.length - 1)}`;
  const blockCells: Scalar[][] = inputs.map((x) => [x.label, x.value]);
  const out: DemoFormula[] = [];
  const resultRow = (k: number) => formulaTop(inputs.length) + 1 + k;
  for (const planned of PLANS) {
    const fn = findFunction(planned.name);
    if (!fn) throw new Error(`demo formula "${planned.label}": no worksheet function ${planned.name} in the registry`);
    const readsTime = Object.values(planned.args).some((a) => 'hour' in a || 'midHour' in a);
    const plan: FormulaPlan = dateSystem === 1904 && readsTime ? { ...planned, args: { ...planned.args, clock: { clock: true } } } : planned;
    for (const p of Object.keys(plan.args)) {
      if (!fn.params.some((q) => q.name === p)) throw new Error(`demo formula "${plan.label}": ${plan.name} has no parameter ${p}`);
    }
    let last = -1;
    fn.params.forEach((p, k) => {
      if (plan.args[p.name]) last = k;
    });
    const refs: string[] = [];
    const raw: (RawArg | undefined)[] = [];
    for (const p of fn.params.slice(0, last + 1)) {
      const src = plan.args[p.name];
      if (!src) {
        refs.push('');
        raw.push(undefined);
      } else if ('window' in src) {
        refs.push(block);
        raw.push(blockCells);
      } else if ('hour' in src) {
        refs.push(`$B$${HOUR_ROW}`);
        raw.push(cellHour);
      } else if ('midHour' in src) {
        refs.push(`$B$${MID_ROW}`);
        raw.push(cellHour - 1 / 48);
      } else if ('clock' in src) {
        refs.push(`$A$${CLOCK_ROW}:$B$${CLOCK_ROW}`);
        raw.push(clockCells(dateSystem));
      } else if ('input' in src) {
        const i = inputIndex.get(src.input);
        if (i === undefined) throw new Error(`demo formula "${plan.label}": no field ${src.input} in the window block`);
        // Fields by their defined names (the glossary's names), so a formula reads like its function's signature.
        refs.push(inputs[i].key);
        raw.push(inputs[i].value);
      } else {
        const k = out.findIndex((f) => f.label === src.formula);
        if (k < 0 || typeof out[k].result !== 'number') throw new Error(`demo formula "${plan.label}": ${src.formula} is not a number`);
        refs.push(`$C$${resultRow(k)}`);
        raw.push(out[k].result as number);
      }
    }
    const table = applyFunction(fn, raw);
    const cell = table[0]?.[0];
    if (cell instanceof SunpaneError) throw new Error(`demo formula "${plan.label}" was refused: ${cell.message}`);
    const result = cell instanceof NotAvailable ? '#N/A' : (cell as number | string);
    out.push({ label: plan.label, name: fn.name, formula: `${NAMESPACE}.${fn.name}(${refs.join(',')})`, result, unit: plan.unit, numFmt: plan.numFmt, rawArgs: raw });
  }
  return { hour, inputs, formulas: out, dateSystem };
}

/**
 * Adds the formula sheet: title, the design hour and its mid-hour instant (a native formula), the
 * window block (field label | value) and a table of quantity / formula text / result (the live
 * formula with its cached value) / unit.
 */
export function addFormulaSheet(wb: ExcelJS.Workbook, sheet: string, set: DemoFormulaSet): { cell: string; expected: number }[] {
  const { inputs, formulas } = set;
  const ws = wb.addWorksheet(sheet);
  const free = addSheetHeading(ws, 'Sunpane worksheet functions — examples', [
    `The window is described once, in the block A${inputRow(0)}:B${inputRow(inputs.length - 1)} (field names in A, values in B); window functions take the block as one argument.`,
    'Results were worked out by Sunpane when the file was written.',
    'They recalculate in Excel when the Sunpane add-in is loaded (open its pane once); elsewhere they may show #NAME?.',
  ]);
  if (free > HOUR_ROW) throw new Error('the formula sheet heading overlaps its inputs');
  ws.getCell(HOUR_ROW, 1).value = 'Design hour (hour ending, local standard time)';
  const hourCell = ws.getCell(HOUR_ROW, 2);
  hourCell.value = serialToCellDate(set.hour);
  hourCell.numFmt = NUMBER_FORMATS.dateTime;
  ws.getCell(MID_ROW, 1).value = 'Sun taken at (mid-hour, time convention hourEnding)';
  setFormula(ws, `B${MID_ROW}`, `B${HOUR_ROW}-1/48`, sheetSerial(ws, set.hour - 1 / 48), NUMBER_FORMATS.dateTime);
  if (set.dateSystem === 1904) {
    // The clock range the date-time functions take: this workbook counts dates in the 1904 system.
    const [[label, value]] = clockCells(1904);
    ws.getCell(CLOCK_ROW, 1).value = label;
    ws.getCell(CLOCK_ROW, 2).value = value;
    ws.getCell(CLOCK_ROW, 3).value = "the workbook's clock: the functions' last argument";
  }
  ws.getCell(BLOCK_HEADER, 1).value = 'Window field';
  ws.getCell(BLOCK_HEADER, 2).value = 'Value';
  ws.getCell(BLOCK_HEADER, 3).value = 'Unit';
  ws.getCell(BLOCK_HEADER, 4).value = 'Named range';
  styleHeader(ws, BLOCK_HEADER, 1, 4);
  inputs.forEach((x, i) => {
    ws.getCell(inputRow(i), 1).value = x.label;
    ws.getCell(inputRow(i), 2).value = x.value;
    ws.getCell(inputRow(i), 3).value = GLOSSARY[x.key as keyof typeof GLOSSARY]?.unit ?? '';
    ws.getCell(inputRow(i), 4).value = x.key;
    // Each value cell is a named range, named as the field: the functions that take single values refer to it by name.
    wb.definedNames.add(`'${sheet.replace(/'/g, "''")}'!$B$${inputRow(i)}`, x.key);
  });
  const top = formulaTop(inputs.length);
  const t = addDataTable(
    ws,
    'ExampleFormulas',
    { row: top, column: 1 },
    [{ header: 'Quantity', width: 50 }, { header: 'Formula', width: 60 }, { header: 'Result', width: 16 }, { header: 'Unit', width: 8 }],
    formulas.map((f) => [f.label, `=${f.formula}`, null, f.unit]),
  );
  formulas.forEach((f, k) => {
    const row = t.headerRow + 1 + k;
    const cell = address(row, 3);
    ws.getCell(row, 2).alignment = { wrapText: true, vertical: 'top' };
    if (typeof f.result === 'number') setFormula(ws, cell, storedFormula(f.formula), f.result, f.numFmt);
    else ws.getCell(cell).value = f.result;
  });
  freezeAt(ws, BLOCK_HEADER + 1);
  return [{ cell: `${sheet}!B${MID_ROW}`, expected: sheetSerial(ws, set.hour - 1 / 48) }];
}
