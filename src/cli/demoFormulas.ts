/**
 * The demo's sheet of example worksheet formulas: a block of input cells (one of the demo windows
 * on a midsummer afternoon) and Sunpane functions applied to them, written as real
 * `SUNPANE.<NAME>(...)` formulas whose cached results come from our core through the same
 * `applyFunction` the add-in uses. In the file each call is stored the way Excel itself saves a
 * call to an add-in's custom function, `_xldudf_SUNPANE_<NAME>(...)` (docs/platform.md), so that
 * Excel links it to the add-in when the add-in is loaded; other programs show the cached value
 * until they recalculate (then #NAME?).
 *
 * Functions are looked up with `findFunction`, and arguments are given by parameter name, so a
 * renamed function or parameter makes the demo fail loudly rather than write a dead formula.
 */
import { SunpaneError } from '../core/common';
import { civilToSerial } from '../core/time';
import type { DemoWindow } from '../demo/building';
import { applyFunction } from '../registry/evaluate';
import { NAMESPACE, findFunction } from '../registry';
import { NotAvailable, type RawArg } from '../registry/types';
import { type ExcelJS, NUMBER_FORMATS, addDataTable, addSheetHeading, address, freezeAt, serialToCellDate, setFormula, styleHeader } from './workbook';

/** One input cell of the formula sheet. */
export interface DemoInput {
  /** The parameter name it feeds, and the defined name of its cell. */
  key: string;
  label: string;
  value: number | string;
  unit: string;
  numFmt?: string;
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

/** The input cells and the formulas that refer to them. */
export interface DemoFormulaSet {
  inputs: DemoInput[];
  formulas: DemoFormula[];
}

/** A formula argument: an input key, or an earlier formula's label (its result cell). */
type ArgSource = { input: string } | { formula: string };

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

/** First row of the input block and of the formula table on the sheet. */
const INPUT_TOP = 7;

/** The input cells: the demo's equator-facing office window on 21 June at 14:00 (invented clear-sky depths). */
export function demoInputs(window: DemoWindow): DemoInput[] {
  const { spec } = window;
  const o = spec.shading.overhang;
  return [
    { key: 'dateTime', label: 'date-time (local standard time)', value: civilToSerial(spec.year, 6, 21, 14, 0, 0), unit: '', numFmt: NUMBER_FORMATS.dateTime },
    { key: 'latitude', label: 'latitude', value: spec.site.latitude, unit: '°' },
    { key: 'longitude', label: 'longitude', value: spec.site.longitude, unit: '°' },
    { key: 'utcOffset', label: 'UTC offset', value: spec.site.utcOffset, unit: 'h' },
    { key: 'surfaceAzimuth', label: 'window facing', value: spec.surfaceAzimuth, unit: '°' },
    { key: 'width', label: 'window width', value: spec.width, unit: 'm' },
    { key: 'height', label: 'window height', value: spec.height, unit: 'm' },
    { key: 'shgc', label: 'SHGC at normal incidence', value: spec.glazing.shgc, unit: '' },
    { key: 'frameFraction', label: 'frame share', value: spec.frameFraction, unit: '' },
    { key: 'tauB', label: 'clear-sky beam depth τb (invented)', value: 0.36, unit: '' },
    { key: 'tauD', label: 'clear-sky diffuse depth τd (invented)', value: 2.4, unit: '' },
    { key: 'overhangProjection', label: 'overhang depth', value: o?.projection ?? 0, unit: 'm' },
    { key: 'overhangGap', label: 'overhang gap above head', value: o?.gap ?? 0, unit: 'm' },
    { key: 'overhangExtensionLeft', label: 'overhang beyond left jamb', value: o?.extensionLeft ?? 0, unit: 'm' },
    { key: 'overhangExtensionRight', label: 'overhang beyond right jamb', value: o?.extensionRight ?? 0, unit: 'm' },
  ];
}

const SITE_ARGS = { latitude: { input: 'latitude' }, longitude: { input: 'longitude' }, utcOffset: { input: 'utcOffset' } } as const;
const WHEN_WHERE = { dateTime: { input: 'dateTime' }, ...SITE_ARGS } as const;

/** The example formulas, by function name and parameter name. */
const PLANS: readonly FormulaPlan[] = [
  { label: 'sun altitude', name: 'SUNALTITUDE', args: { ...WHEN_WHERE }, unit: '°', numFmt: '0.00' },
  { label: 'sun azimuth', name: 'SUNAZIMUTH', args: { ...WHEN_WHERE }, unit: '°', numFmt: '0.00' },
  { label: 'sunrise', name: 'SUNRISE', args: { date: { input: 'dateTime' }, ...SITE_ARGS }, unit: '', numFmt: 'hh:mm' },
  { label: 'sunset', name: 'SUNSET', args: { date: { input: 'dateTime' }, ...SITE_ARGS }, unit: '', numFmt: 'hh:mm' },
  { label: 'incidence angle on the window', name: 'INCIDENCEAT', args: { ...WHEN_WHERE, surfaceAzimuth: { input: 'surfaceAzimuth' } }, unit: '°', numFmt: '0.00' },
  {
    label: 'profile angle',
    name: 'PROFILEANGLE',
    args: { sunAltitude: { formula: 'sun altitude' }, sunAzimuth: { formula: 'sun azimuth' }, surfaceAzimuth: { input: 'surfaceAzimuth' } },
    unit: '°',
    numFmt: '0.00',
  },
  {
    label: 'sunlit fraction of the glass under the overhang',
    name: 'SUNLITFRACTION',
    args: {
      sunAltitude: { formula: 'sun altitude' },
      sunAzimuth: { formula: 'sun azimuth' },
      surfaceAzimuth: { input: 'surfaceAzimuth' },
      width: { input: 'width' },
      height: { input: 'height' },
      overhangProjection: { input: 'overhangProjection' },
      overhangGap: { input: 'overhangGap' },
      overhangExtensionLeft: { input: 'overhangExtensionLeft' },
      overhangExtensionRight: { input: 'overhangExtensionRight' },
    },
    unit: '',
    numFmt: NUMBER_FORMATS.fraction,
  },
  {
    label: 'SHGC at this incidence angle',
    name: 'SHGCANGLE',
    args: { incidence: { formula: 'incidence angle on the window' }, shgcNormal: { input: 'shgc' } },
    unit: '',
    numFmt: NUMBER_FORMATS.shgc,
  },
  {
    label: 'glass area',
    name: 'GLASSAREA',
    args: { width: { input: 'width' }, height: { input: 'height' }, frameFraction: { input: 'frameFraction' } },
    unit: 'm²',
    numFmt: NUMBER_FORMATS.area,
  },
  {
    label: 'window solar gain this hour (clear sky, overhang)',
    name: 'WINDOWGAIN',
    args: {
      ...WHEN_WHERE,
      surfaceAzimuth: { input: 'surfaceAzimuth' },
      width: { input: 'width' },
      height: { input: 'height' },
      shgcNormal: { input: 'shgc' },
      tauB: { input: 'tauB' },
      tauD: { input: 'tauD' },
      frameFraction: { input: 'frameFraction' },
      overhangProjection: { input: 'overhangProjection' },
      overhangGap: { input: 'overhangGap' },
      overhangExtensionLeft: { input: 'overhangExtensionLeft' },
      overhangExtensionRight: { input: 'overhangExtensionRight' },
    },
    unit: 'W',
    numFmt: NUMBER_FORMATS.watts,
  },
];

/** Row of the i-th input cell (1-based sheet row); values sit in column B. */
function inputRow(i: number): number {
  return INPUT_TOP + 1 + i;
}

/** First row of the formula table's body. */
function formulaTop(inputs: number): number {
  return inputRow(inputs) + 2;
}

/**
 * Works out the example formulas: text with cell references, and cached results by applyFunction.
 * @throws Error when a planned function or parameter is not in the registry (renamed or removed)
 */
export function demoFormulas(window: DemoWindow): DemoFormulaSet {
  const inputs = demoInputs(window);
  const inputIndex = new Map(inputs.map((x, i) => [x.key, i]));
  const out: DemoFormula[] = [];
  const resultRow = (k: number) => formulaTop(inputs.length) + 1 + k;
  for (const plan of PLANS) {
    const fn = findFunction(plan.name);
    if (!fn) throw new Error(`demo formula "${plan.label}": no worksheet function ${plan.name} in the registry`);
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
      } else if ('input' in src) {
        const i = inputIndex.get(src.input);
        if (i === undefined) throw new Error(`internal error: no demo input ${src.input}`);
        // Inputs by their defined names (the glossary's parameter names), so a formula reads like its function's signature.
        refs.push(inputs[i].key);
        raw.push(inputs[i].value);
      } else {
        const k = out.findIndex((f) => f.label === src.formula);
        if (k < 0 || typeof out[k].result !== 'number') throw new Error(`internal error: demo formula ${src.formula} is not a number`);
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
  return { inputs, formulas: out };
}

/**
 * Adds the formula sheet: title, the input block, and a table of quantity / formula text / result
 * (the live formula with its cached value) / unit.
 */
export function addFormulaSheet(wb: ExcelJS.Workbook, sheet: string, set: DemoFormulaSet): void {
  const { inputs, formulas } = set;
  const ws = wb.addWorksheet(sheet);
  const free = addSheetHeading(ws, 'Sunpane worksheet functions — examples', [
    'Results were worked out by Sunpane when the file was written.',
    'They recalculate in Excel when the Sunpane add-in is loaded (open its pane once); elsewhere they may show #NAME?.',
  ]);
  if (free > INPUT_TOP) throw new Error('internal error: the formula sheet heading overlaps its inputs');
  ws.getCell(INPUT_TOP, 1).value = 'Input';
  ws.getCell(INPUT_TOP, 2).value = 'Value';
  ws.getCell(INPUT_TOP, 3).value = 'Unit';
  ws.getCell(INPUT_TOP, 4).value = 'Named range';
  styleHeader(ws, INPUT_TOP, 1, 4);
  inputs.forEach((x, i) => {
    // Each input cell is a named range, named as the function parameter it feeds.
    wb.definedNames.add(`'${sheet.replace(/'/g, "''")}'!$B$${inputRow(i)}`, x.key);
    ws.getCell(inputRow(i), 1).value = x.label;
    const v = ws.getCell(inputRow(i), 2);
    v.value = x.numFmt === NUMBER_FORMATS.dateTime && typeof x.value === 'number' ? serialToCellDate(x.value) : x.value;
    if (x.numFmt) v.numFmt = x.numFmt;
    ws.getCell(inputRow(i), 3).value = x.unit;
    ws.getCell(inputRow(i), 4).value = x.key;
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
  freezeAt(ws, INPUT_TOP + 1);
}
