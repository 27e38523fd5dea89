/**
 * From the form's text boxes (and the ranges they point at) to a WindowSpec, and back to messages
 * beside the boxes. The pane does no physics and no range checks of its own: numbers go to the
 * core's validator as typed, so the messages are the core's, word for word the same as the
 * worksheet functions show.
 */
import { SunpaneError } from '../core/common';
import type { AngleTable } from '../core/glazing';
import type { Shading } from '../core/shading';
import type { Weather, WindowSpec } from '../core/gain';
import { GLOSSARY } from '../registry/glossary';
import type { Scalar } from '../registry/types';
import { fieldsOf, inGlossaryWords } from '../registry/windowRange';
import type { DateSystem, DaylightSavingRule } from '../core/time';
import { RANGE_ADDRESS_HELP, parseRangeAddress } from './addresses';
import type { SheetWeather } from './weather';
import { FIELDS, FIELD_BY_ID, type FieldDef, type FormValues, fieldForArgument } from './fields';

/** Data the form refers to on sheets, once read. */
export interface SheetData {
  angleTable?: AngleTable;
  skyline?: number[];
  /** The hourly weather, once checked (NaN marks an unusable hour). */
  dni?: number[];
  dhi?: number[];
  ghi?: number[];
  /** The weather ranges as read, before the check (see ./weather.ts). */
  weatherRanges?: SheetWeather;
}

/** Checks a WindowSpec; throws SunpaneError naming the field path (the core's validateWindowSpec). */
export type SpecValidator = (spec: WindowSpec) => void;

/** Boxes where blank means the box's initial value (no device, sea level, no blind). */
const BLANK_MEANS_INITIAL = new Set(
  FIELDS.filter((f) => f.section === 'shade' && f.kind === 'number').map((f) => f.id).concat(['elevation', 'interiorAttenuation']),
);

/**
 * A number box's text as a value for the core: a number when it reads as one, `null` when blank
 * (the core then says "blank is not allowed"), else the text itself, so the core's message quotes
 * what was typed.
 */
export function readNumberText(text: string | undefined): number | string | null {
  const t = (text ?? '').trim();
  if (t === '') return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : t;
}

/** A list box (`3.1, 3.3; 3.6`) as values for the core, each read like a number box. */
export function readListText(text: string | undefined): (number | string | null)[] {
  const t = (text ?? '').trim();
  if (t === '') return [];
  return t.split(/[;,\s]+/).filter((s) => s !== '').map(readNumberText);
}

function num(values: FormValues, id: string): number {
  const raw = values[id];
  if (BLANK_MEANS_INITIAL.has(id) && (raw ?? '').trim() === '') return readNumberText(FIELD_BY_ID.get(id)?.initial) as number;
  // The core validates: a text or null here is reported by it with the field's path.
  return readNumberText(raw) as number;
}

function isZero(values: FormValues, id: string): boolean {
  return num(values, id) === 0;
}

/** Address boxes that may stay blank: the skyline, the weather's time stamps. */
const OPTIONAL_ADDRESSES = new Set(['skylineAddress', 'timeAddress']);

/** Which sheet ranges the form needs read before a run, by field id. */
export function neededAddresses(values: FormValues): FieldDef[] {
  return FIELDS.filter((f) => f.kind === 'address' && (f.visible ? f.visible(values) : true) && (!OPTIONAL_ADDRESSES.has(f.id) || (values[f.id] ?? '').trim() !== ''));
}

/**
 * Checks the address boxes the form needs; throws SunpaneError naming the spec path
 * (`weather.dni`, `shading.skyline`…) in the same words as the core's messages.
 */
export function checkAddresses(values: FormValues): void {
  for (const f of neededAddresses(values)) {
    const text = values[f.id] ?? '';
    if (!parseRangeAddress(text)) throw new SunpaneError(f.paths?.[0] ?? f.id, text.trim() === '' ? null : text, RANGE_ADDRESS_HELP);
  }
}

function weatherOf(values: FormValues, data: SheetData): Weather {
  switch (values.weatherSource) {
    case 'ashraeClearSky':
      return { kind: 'ashraeClearSky', tauB: readListText(values.tauB) as number[], tauD: readListText(values.tauD) as number[] };
    case 'measured':
      return { kind: 'measured', dni: data.dni ?? [], dhi: data.dhi ?? [] };
    case 'globalHorizontal':
      return { kind: 'globalHorizontal', ghi: data.ghi ?? [] };
    case 'ineichenClearSky':
      return { kind: 'ineichenClearSky', linkeTurbidity: readListText(values.linkeTurbidity) as number[] };
    default:
      return { kind: values.weatherSource } as unknown as Weather;
  }
}

/** The daylight-saving boxes, in the glossary's order. */
const DAYLIGHT_SAVING = [GLOSSARY.daylightSavingStart, GLOSSARY.daylightSavingEnd, GLOSSARY.daylightSavingShift];

/**
 * The daylight-saving rule of the form, its cells read as the worksheet functions read the same
 * fields of a window in the workbook (the window reader: a date-time as ISO 8601 text, or as a
 * serial of the workbook's date system, as a window range with that dateSystem reads it), the shift
 * 1 h when blank (the glossary's default); undefined when the three boxes are blank. Nothing is
 * checked here: the core's validator checks the rule, so a bad one (an end before the start, a
 * shift out of range, a start without an end) gets the functions' own message, naming the field.
 * @param dateSystem - the workbook's date system (./dateSystem.ts): a serial typed in a box counts
 *   days in it, as the workbook's own cells do
 * @returns the rule, its dates as 1900-system serials (the core's)
 * @throws SunpaneError naming the field when a box's text is no date-time or number, or a serial
 *   outside the date system
 */
export function daylightSavingOf(values: FormValues, dateSystem: DateSystem): DaylightSavingRule | undefined {
  const given = DAYLIGHT_SAVING.filter((g) => (values[g.name] ?? '').trim() !== '');
  if (given.length === 0) return undefined;
  const boxes = given.map((g) => ({ field: g, written: g.name, cell: readNumberText(values[g.name]) as Scalar }));
  const f = fieldsOf([...boxes, { field: GLOSSARY.dateSystem, written: GLOSSARY.dateSystem.name, cell: dateSystem }]);
  const at = (g: (typeof DAYLIGHT_SAVING)[number]) => f.values.get(g.name) as number | undefined;
  return { start: at(GLOSSARY.daylightSavingStart), end: at(GLOSSARY.daylightSavingEnd), shift: at(GLOSSARY.daylightSavingShift) ?? (GLOSSARY.daylightSavingShift.default as number) } as DaylightSavingRule;
}

/**
 * The WindowSpec the form describes. Devices of depth 0 are left out; the skyline, angle table and
 * hourly weather come from `data` (read from the sheets beforehand).
 * @param dateSystem - the workbook's date system, in which a serial in a daylight-saving box counts
 *   (default 1900, the default system: for a caller with no workbook to ask)
 */
export function buildWindowSpec(values: FormValues, data: SheetData = {}, dateSystem: DateSystem = 1900): WindowSpec {
  const shading: Shading = {};
  if (!isZero(values, 'overhangProjection')) {
    shading.overhang = {
      projection: num(values, 'overhangProjection'),
      gap: num(values, 'overhangGap'),
      extensionLeft: num(values, 'overhangExtensionLeft'),
      extensionRight: num(values, 'overhangExtensionRight'),
    };
  }
  for (const side of ['left', 'right'] as const) {
    if (isZero(values, `${side}FinProjection`)) continue;
    shading[side === 'left' ? 'leftFin' : 'rightFin'] = {
      projection: num(values, `${side}FinProjection`),
      gap: num(values, `${side}FinGap`),
      extensionAbove: num(values, `${side}FinExtensionAbove`),
      extensionBelow: num(values, `${side}FinExtensionBelow`),
    };
  }
  if (!isZero(values, 'revealDepth')) shading.revealDepth = num(values, 'revealDepth');
  if (data.skyline) shading.skyline = data.skyline;

  const table = values.glassModel === 'table';
  const daylightSaving = daylightSavingOf(values, dateSystem);
  return {
    name: (values.name ?? '').trim() || 'Window',
    site: {
      latitude: num(values, 'latitude'),
      longitude: num(values, 'longitude'),
      utcOffset: num(values, 'utcOffset'),
      elevation: num(values, 'elevation'),
      ...(daylightSaving ? { daylightSaving } : {}),
    },
    surfaceAzimuth: num(values, 'surfaceAzimuth'),
    surfaceTilt: num(values, 'surfaceTilt'),
    width: num(values, 'width'),
    height: num(values, 'height'),
    frameFraction: num(values, 'frameFraction'),
    glazing: {
      shgc: num(values, 'shgc'),
      panes: table ? 2 : num(values, 'panes'),
      ...(table && data.angleTable ? { angleTable: data.angleTable } : {}),
      interiorAttenuation: num(values, 'interiorAttenuation'),
    },
    shading,
    groundAlbedo: num(values, 'groundAlbedo'),
    skyModel: values.skyModel as WindowSpec['skyModel'],
    weather: weatherOf(values, data),
    year: num(values, 'year'),
    timeConvention: (values.timeConvention || 'hourEnding') as WindowSpec['timeConvention'],
    ...(values.roomConstruction ? { room: { construction: values.roomConstruction } } : {}),
  };
}

/** Problems found in the form: field id → message, plus messages that belong to no one field. */
export interface FormProblems {
  byField: Record<string, string>;
  general: string[];
}

/** Stand-in weather for checking the form before the hourly columns are read. */
const STAND_IN_WEATHER: Weather = { kind: 'ineichenClearSky', linkeTurbidity: [3] };

/**
 * Every problem in the form, each with the core's own message. The validator stops at the first
 * bad field, so the check is repeated with that field set back to its initial value until the
 * form passes (each field is reported once).
 * @param values - the form as typed
 * @param validate - the core's WindowSpec validator
 * @param data - sheet data already read; without it, hourly weather is not checked here
 * @param dateSystem - the workbook's date system (see {@link buildWindowSpec})
 */
export function findProblems(values: FormValues, validate: SpecValidator, data?: SheetData, dateSystem: DateSystem = 1900): FormProblems {
  const problems: FormProblems = { byField: {}, general: [] };
  const work: FormValues = { ...values };
  for (let round = 0; round < FIELDS.length + 2; round++) {
    try {
      checkAddresses(work);
      const spec = buildWindowSpec(work, data ?? {}, dateSystem);
      if (!data && (spec.weather.kind === 'measured' || spec.weather.kind === 'globalHorizontal')) spec.weather = STAND_IN_WEATHER;
      validate(spec);
      return problems;
    } catch (caught) {
      const err = inGlossaryWords(caught);
      if (!(err instanceof SunpaneError)) throw err;
      const field = fieldForArgument(err.argument);
      if (!field || problems.byField[field.id] !== undefined) {
        problems.general.push(err.message);
        return problems;
      }
      problems.byField[field.id] = err.message;
      work[field.id] = field.kind === 'address' ? 'A1' : field.initial;
      // The daylight-saving boxes are one rule: set back together, so a half rule left behind is not reported again.
      if (DAYLIGHT_SAVING.some((g) => g.name === field.id)) for (const g of DAYLIGHT_SAVING) work[g.name] = FIELD_BY_ID.get(g.name)?.initial ?? '';
      if (field.kind === 'address' && data) return problems;
    }
  }
  return problems;
}

/** True when there is nothing to report. */
export function isClean(p: FormProblems): boolean {
  return p.general.length === 0 && Object.keys(p.byField).length === 0;
}
