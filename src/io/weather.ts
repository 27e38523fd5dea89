/**
 * Hourly weather from a user's file or sheet, read so that it cannot lie: the one reader and
 * checker behind `sunpane table --weather`, `sunpane schedule --weather` and the pane's weather
 * columns, so that both report the same problems in the same words (only the place differs: a
 * file's `line 14`, a sheet's `row 14`). What it reads and checks, and why, is set out once in
 * docs/conventions.md#hourly-weather-from-the-user: time stamps place the rows (hour-ending unless
 * stated; zones converted; other years, gaps, repeats and disorder reported), a typical year when
 * the user declares one, one decimal mark per file, units from the headers or the user, the
 * physically possible limits of Long & Shi (2008) at the sun's mid-hour position
 * (src/core/sky/qualityLimits.ts), no light with the sun well below the horizon, the light keeping
 * time with the sun (sunrise and sunset compared), and a limit on the share of unusable hours.
 * An unusable hour is NaN in the series (the core counts it missing): never zero.
 */
import { type Weather, MAX_IRRADIANCE } from '../core/gain';
import { COMPARISON_MIN_GHI, IRRADIANCE_FLOOR, closureTolerance, diffuseRatioLimit, extraterrestrialSpencer, physicalIrradianceLimits } from '../core/sky';
import { type Site, annualSunPath } from '../core/sun';
import { civilToSerial, fitYearOfHours, formatSerialIso, hoursInYear, serialToCivil, utcOffsetText } from '../core/time';
import { type DecimalMark, type PlacedText, findDecimalMark, readNumberText } from './numberText';
import { type CivilStamp, readStampText, stampFromSerial } from './stampText';

/** The irradiance quantities a weather table may hold. */
export type Quantity = 'dni' | 'dhi' | 'ghi';

/** The quantities in words, as messages name them. */
export const QUANTITY_WORDS: Readonly<Record<Quantity, string>> = { dni: 'direct normal', dhi: 'diffuse horizontal', ghi: 'global horizontal' };

/** A cell as read: text from a file, or a sheet cell's value. */
export type CellValue = string | number | boolean | null | undefined;

/** Units a weather column may be in: hourly mean irradiance, or hourly irradiation. */
export type WeatherUnit = 'W/m²' | 'Wh/m²' | 'kJ/m²';
export const WEATHER_UNITS: readonly WeatherUnit[] = ['W/m²', 'Wh/m²', 'kJ/m²'];

/** Which instant of its hour a row's stamp marks. */
export type HourStamp = 'end' | 'start' | 'middle';
export const HOUR_STAMPS: readonly HourStamp[] = ['end', 'start', 'middle'];

/** Share of the year's hours that may be unusable before the weather is refused [%]. */
export const DEFAULT_MAX_UNUSABLE_PERCENT = 1;

/** Night light: with the sun lower than this at mid-hour [°] it is below the horizon all hour. */
const DARK_ALTITUDE = -8;
/** Night light: more than this is not twilight or a sensor's offset [W/m²]. */
const DARK_LIGHT_MAX = 10;
/** An hour "has light" above this [W/m²] (for the sunrise / sunset comparison). */
const LIGHT_THRESHOLD = 1;
/** Fewest days with a sunrise and a sunset in both the data and the sun for the timing check. */
const TIMING_MIN_DAYS = 20;
/** Hour index (0-based, from 1 January 00:00) of 29 February 00:00 in a leap year. */
const FEB29_HOUR = 59 * 24;
/** Examples shown per problem. */
const SHOWN = 4;

/** One column of cells and its header, if it had one. */
export interface WeatherColumn {
  header?: string;
  cells: readonly CellValue[];
}

/** Hourly weather as columns of cells, however they were read. */
export interface WeatherTable {
  /** The irradiance columns, each with one cell per data row. */
  columns: Partial<Record<Quantity, WeatherColumn>>;
  /** The time-stamp column, if any. */
  stamps?: WeatherColumn;
  /** Number of data rows. */
  rows: number;
  /** How a message names data row `row` (0-based): `line 14`, `row 14`. */
  where(row: number): string;
  /** Rows that cannot be read at all, with the reason (e.g. a CSV line with too many fields). */
  brokenRows?: ReadonlyMap<number, string>;
  /** What may explain the broken rows, added to their report. */
  brokenHint?: string;
}

/** How the caller names its options, for the advice in messages. */
export interface WeatherAdvice {
  unit: string;
  decimal: string;
  typicalYear: string;
  hourStamp(convention: HourStamp): string;
  maxUnusable: string;
}

/** How to read a weather table. */
export interface WeatherOptions {
  /** The window's calendar year. */
  year: number;
  /** The window's site: the sun's position for the checks. */
  site: Site;
  /** The unit the user stated (a header's own unit must agree with it). */
  unit?: WeatherUnit;
  /** The decimal mark the user stated (else found from the cells). */
  decimalMark?: DecimalMark;
  /** The stamps are of a typical year: read them by month, day and hour as `year`. */
  typicalYear?: boolean;
  /** What a stamp marks; default `end`. */
  hourStamp?: HourStamp;
  /** Largest share of unusable hours accepted [%], default 1. */
  maxUnusablePercent?: number;
  advice: WeatherAdvice;
}

/** A kind of problem, how often it occurred, the first places, and possibly a hint. */
export interface WeatherProblem {
  what: string;
  /** How many (rows, values or hours). */
  count: number;
  /** The first few places (a place may cover several hours: a run of hours with no row). */
  examples: string[];
  /** How many places in all. */
  places: number;
  hint?: string;
}

/** The weather read and checked. */
export interface WeatherCheck {
  /** The series for the core (NaN marks an unusable hour); undefined when refused. */
  weather?: Weather;
  /** Hours in the window's year. */
  hours: number;
  /** Hours without a usable value. */
  unusableHours: number;
  /** The share allowed [%]. */
  maxUnusablePercent: number;
  /** Why the weather cannot be used at all (each a sentence); empty when it can. */
  refusals: string[];
  /** Problems found, in a fixed order. */
  problems: WeatherProblem[];
  /** Things done the user should know of. */
  notes: string[];
  /** True when the weather may be used: nothing refused and the unusable share within the limit. */
  usable: boolean;
}

/** Reads a unit the way users write it (`W/m2`, `W/m²`, `W m-2`, `Wh/m2`, `kJ/m2`, any case). */
export function readUnitText(text: string): WeatherUnit | undefined {
  const t = text.toLowerCase().replace(/\s+/g, '').replace(/²|\^2/g, '2').replace(/m-2$/, '/m2');
  return t === 'w/m2' ? 'W/m²' : t === 'wh/m2' ? 'Wh/m²' : t === 'kj/m2' ? 'kJ/m²' : undefined;
}

/** The unit a header states: in brackets (`[W/m²]`, `(kJ/m2)`) or as a word; `unknown` for a bracketed unit not read. */
export function unitInHeader(header: string): WeatherUnit | { unknown: string } | undefined {
  const bracket = /[[(]([^\])]*)[\])]/.exec(header);
  if (bracket) {
    const unit = readUnitText(bracket[1]);
    if (unit) return unit;
    if (/[a-z]/i.test(bracket[1])) return { unknown: bracket[1].trim() };
  }
  const word = /(?:^|[\s,;])(w\s*\/\s*m(?:2|²|\^2)|wh\s*\/\s*m(?:2|²|\^2)|kj\s*\/\s*m(?:2|²|\^2))(?:$|[\s,;])/i.exec(header);
  return word ? readUnitText(word[1]) : undefined;
}

/** The kinds of problem, in the order they are reported: [one, many]. */
const P = {
  broken: ['row that cannot be read', 'rows that cannot be read'],
  unreadable: ['value that is not a number', 'values that are not numbers'],
  negative: [`value below ${IRRADIANCE_FLOOR} W/m²`, `values below ${IRRADIANCE_FLOOR} W/m²`],
  aboveLimit: ['value above the physically possible limit', 'values above the physically possible limit'],
  nightLight: ['hour with light while the sun is below the horizon', 'hours with light while the sun is below the horizon'],
  diffuseAboveGlobal: ['hour with diffuse above global', 'hours with diffuse above global'],
  closure: ['hour whose direct and diffuse do not add up to the global', 'hours whose direct and diffuse do not add up to the global'],
  stampUnreadable: ['stamp that cannot be read', 'stamps that cannot be read'],
  stampOffHour: ['stamp not on the hour', 'stamps not on the hour'],
  outside: ['row stamped outside the year', 'rows stamped outside the year'],
  outOfOrder: ['row out of order', 'rows out of order'],
  conflict: ['hour given twice with different values', 'hours given twice with different values'],
  gap: ['hour with no row', 'hours with no row'],
} as const satisfies Record<string, readonly [string, string]>;
type ProblemKind = keyof typeof P;

/** Collects problems by kind, with the first few places of each. */
class ProblemList {
  private readonly byKind = new Map<ProblemKind, WeatherProblem>();
  constructor(private readonly year: number) {}

  add(kind: ProblemKind, example: string, count = 1): void {
    let p = this.byKind.get(kind);
    if (!p) {
      p = { what: '', count: 0, examples: [], places: 0 };
      this.byKind.set(kind, p);
    }
    p.count += count;
    p.places++;
    if (p.examples.length < SHOWN) p.examples.push(example);
  }

  hint(kind: ProblemKind, hint: string): void {
    const p = this.byKind.get(kind);
    if (p) p.hint = hint;
  }

  has(kind: ProblemKind): boolean {
    return this.byKind.has(kind);
  }

  hintOf(kind: ProblemKind): string | undefined {
    return this.byKind.get(kind)?.hint;
  }

  /** The problems in the fixed order, each worded for its count. */
  list(): WeatherProblem[] {
    return (Object.keys(P) as ProblemKind[])
      .filter((k) => this.byKind.has(k))
      .map((k) => {
        const p = this.byKind.get(k)!;
        const what = P[k][p.count === 1 ? 0 : 1].replace('the year', String(this.year));
        return { ...p, what };
      });
  }
}

function fmtNumber(x: number): string {
  return String(Number(x.toFixed(1)));
}

function percent(part: number, whole: number): string {
  const p = (100 * part) / whole;
  return p === 0 ? '0' : p < 0.01 ? '< 0.01' : String(Number(p.toFixed(2)));
}

/** The texts of a column's cells, with their places (for finding the decimal mark). */
function* textsOf(table: WeatherTable, quantities: readonly Quantity[]): Generator<PlacedText> {
  for (const q of quantities) {
    const cells = table.columns[q]!.cells;
    for (let k = 0; k < cells.length; k++) {
      const c = cells[k];
      if (typeof c === 'string') yield { text: c, where: table.where(k) };
    }
  }
}

/** A cell as a number, or the reason it is not one. */
function cellNumber(cell: CellValue, mark: DecimalMark): number | 'blank' | 'not a number' {
  if (typeof cell === 'number') return Number.isFinite(cell) ? cell : 'not a number';
  if (cell === null || cell === undefined || (typeof cell === 'string' && cell.trim() === '')) return 'blank';
  if (typeof cell !== 'string') return 'not a number';
  return readNumberText(cell, mark) ?? 'not a number';
}

function cellText(cell: CellValue): string {
  return cell === null || cell === undefined ? '' : String(cell).trim();
}

/** A stamp cell as a civil stamp (text, or a spreadsheet serial). */
function cellStamp(cell: CellValue): CivilStamp | undefined {
  if (typeof cell === 'number') return stampFromSerial(cell);
  if (typeof cell === 'string') return readStampText(cell);
  return undefined;
}

/**
 * Reads and checks hourly weather.
 * @param table - the cells, with a way to name each row
 * @param options - year, site, what the user stated, and how to word advice
 * @returns the series (when usable), the count of unusable hours, and every problem and note
 * @throws SunpaneError naming the field when `options.year` or `options.site` is not valid
 */
export function checkWeather(table: WeatherTable, options: WeatherOptions): WeatherCheck {
  const { year, site, advice } = options;
  const n = hoursInYear(year);
  const maxUnusablePercent = options.maxUnusablePercent ?? DEFAULT_MAX_UNUSABLE_PERCENT;
  const refusals: string[] = [];
  const notes: string[] = [];
  const problems = new ProblemList(year);
  const refused = (): WeatherCheck => ({ hours: n, unusableHours: n, maxUnusablePercent, refusals, problems: problems.list(), notes, usable: false });

  // Which quantities, and the kind of weather they make.
  const quantities = (['dni', 'dhi', 'ghi'] as const).filter((q) => table.columns[q] !== undefined);
  const has = (q: Quantity) => quantities.includes(q);
  if (!((has('dni') && has('dhi')) || (has('ghi') && !has('dni') && !has('dhi')))) {
    refusals.push('the weather needs direct normal and diffuse horizontal irradiance (global horizontal may be given as well, for checking), or global horizontal alone');
    return refused();
  }
  if (table.rows === 0) {
    refusals.push(`there are no rows: expected one per hour of ${year} (${n})`);
    return refused();
  }

  // Units: the header's, else the stated one, else W/m² (noted).
  const factor: Partial<Record<Quantity, number>> = {};
  const assumed: Quantity[] = [];
  for (const q of quantities) {
    const header = table.columns[q]!.header;
    const fromHeader = header !== undefined ? unitInHeader(header) : undefined;
    if (fromHeader !== undefined && typeof fromHeader === 'object') {
      refusals.push(`the column "${header}" is in ${fromHeader.unknown}, which is not a unit Sunpane reads (${WEATHER_UNITS.join(', ')}; ${advice.unit})`);
      continue;
    }
    if (fromHeader !== undefined && options.unit !== undefined && fromHeader !== options.unit) {
      refusals.push(`the column "${header}" says ${fromHeader}, but ${options.unit} was stated (${advice.unit}): which is it?`);
      continue;
    }
    const unit = fromHeader ?? options.unit;
    if (unit === undefined) assumed.push(q);
    factor[q] = unit === 'kJ/m²' ? 1 / 3.6 : 1;
  }
  if (assumed.length) notes.push(`no unit stated for ${assumed.map((q) => QUANTITY_WORDS[q]).join(' and ')}: read as W/m² (state it in the header, e.g. "${QUANTITY_WORDS[assumed[0]]} [W/m²]", or ${advice.unit})`);

  // The decimal mark.
  let mark: DecimalMark = options.decimalMark ?? 'point';
  if (options.decimalMark === undefined) {
    const found = findDecimalMark(textsOf(table, quantities));
    if (found.mixed) {
      refusals.push(`decimal marks are mixed: ${found.mixed.point.where} has "${found.mixed.point.text}", ${found.mixed.comma.where} "${found.mixed.comma.text}" (state the one the file uses: ${advice.decimal})`);
    } else if (found.ambiguous) {
      refusals.push(`"${found.ambiguous.text}" (${found.ambiguous.where}) may be a decimal comma or a thousands separator (state the decimal mark: ${advice.decimal})`);
    }
    mark = found.mark;
    if (!found.mixed && !found.ambiguous && mark === 'comma') notes.push('values read with a decimal comma');
  }
  if (refusals.length) return refused();

  // Where each row goes.
  const slotRow = new Int32Array(n).fill(-1);
  const duplicates = new Map<number, number[]>();
  if (table.stamps) {
    const placed = placeByStamps(table, options, n, slotRow, duplicates, problems, notes);
    if (placed === 0) {
      const hint = problems.hintOf('outside');
      refusals.push(`no row could be placed in ${year} by its stamp${hint ? ` (${hint})` : ''}`);
    }
  } else if (table.rows !== 8760 && table.rows !== 8784) {
    refusals.push(
      `expected ${n} hourly rows for ${year} (one per hour, the first ending at 01:00 on 1 January; a typical year of 8760 or a leap-year file of 8784 is also fitted), found ${table.rows}${table.rows > 0 ? `, ${table.where(0)} to ${table.where(table.rows - 1)}` : ''}; or give the rows their time stamps`,
    );
  } else {
    // Rows in order; a file of the other length is fitted by date as the core fits series (src/core/time/clock.ts).
    const fit = fitYearOfHours(table.rows, year);
    slotRow.set(fit.rowOf);
    notes.push(`no time stamps: rows read in order, the first as the hour ending 01:00 on 1 January ${year}`);
    if (fit.rule !== 'asGiven') notes.push(fit.text);
  }
  if (refusals.length) return { ...refused(), problems: problems.list() };

  // Values, hour by hour.
  const path = annualSunPath(year, site, { slowColumns: false });
  const yearStart = civilToSerial(year, 1, 1);
  const hourEnding = (i: number) => formatSerialIso(yearStart + (i + 1) / 24);
  const values: Partial<Record<Quantity, Float64Array>> = {};
  for (const q of quantities) values[q] = new Float64Array(n).fill(NaN);
  const usable = new Uint8Array(n);
  let smallNegatives = 0;
  let sameTwice = 0;

  const readRow = (row: number, out: Partial<Record<Quantity, number>>): boolean => {
    const broken = table.brokenRows?.get(row);
    if (broken !== undefined) {
      problems.add('broken', `${table.where(row)} (${broken})`);
      return false;
    }
    let ok = true;
    for (const q of quantities) {
      const cell = table.columns[q]!.cells[row];
      const v = cellNumber(cell, mark);
      if (typeof v === 'string') {
        problems.add('unreadable', `${table.where(row)} ${QUANTITY_WORDS[q]} ${v === 'blank' ? '(blank)' : `"${cellText(cell)}"`}`);
        ok = false;
        continue;
      }
      const w = v * factor[q]!;
      if (w < IRRADIANCE_FLOOR) {
        problems.add('negative', `${table.where(row)} ${QUANTITY_WORDS[q]} ${fmtNumber(w)} W/m²`);
        ok = false;
      } else if (w < 0) {
        smallNegatives++;
        out[q] = 0;
      } else out[q] = w;
    }
    return ok;
  };

  const rowValues: Partial<Record<Quantity, number>> = {};
  const other: Partial<Record<Quantity, number>> = {};
  for (let i = 0; i < n; i++) {
    const row = slotRow[i];
    if (row < 0) continue;
    if (!readRow(row, rowValues)) continue;
    const twins = duplicates.get(i);
    if (twins) {
      let differ = false;
      for (const t of twins) {
        if (!readRow(t, other) || quantities.some((q) => other[q] !== rowValues[q])) differ = true;
      }
      if (differ) {
        problems.add('conflict', `${[row, ...twins].map((r) => table.where(r)).join(' and ')} (hour ending ${hourEnding(i)})`);
        continue;
      }
      sameTwice += twins.length;
    }
    for (const q of quantities) values[q]![i] = rowValues[q]!;
    usable[i] = 1;
  }

  // Does the light keep time with the sun? (on the values as read, before the physics checks)
  const timing = timingShift(values, quantities, path.altitude, usable, n);

  // Physics at mid-hour.
  for (let i = 0; i < n; i++) {
    if (!usable[i]) continue;
    const where = table.where(slotRow[i]);
    const alt = path.altitude[i];
    const zenith = path.zenith[i];
    const mu = Math.cos((zenith * Math.PI) / 180);
    const limits = physicalIrradianceLimits(Math.max(-1, Math.min(1, mu)), extraterrestrialSpencer(Math.floor(i / 24) + 1));
    const dni = values.dni?.[i];
    const dhi = values.dhi?.[i];
    const ghi = values.ghi?.[i];
    const impliedGhi = dni !== undefined && dhi !== undefined ? dni * Math.max(0, mu) + dhi : undefined;
    let bad = false;
    const over = (q: string, v: number | undefined, limit: number) => {
      if (v !== undefined && v > Math.min(limit, MAX_IRRADIANCE)) {
        problems.add('aboveLimit', `${where} ${q} ${fmtNumber(v)} W/m² (limit ${fmtNumber(Math.min(limit, MAX_IRRADIANCE))})`);
        bad = true;
      }
    };
    over(QUANTITY_WORDS.dni, dni, limits.dni);
    over(QUANTITY_WORDS.dhi, dhi, limits.dhi);
    over(QUANTITY_WORDS.ghi, ghi, limits.ghi);
    if (!bad && ghi === undefined) over('global (direct × cos z + diffuse)', impliedGhi, limits.ghi);
    if (!bad && alt < DARK_ALTITUDE) {
      const brightest = quantities.reduce((a, q) => Math.max(a, values[q]![i]), 0);
      if (brightest > DARK_LIGHT_MAX) {
        const q = quantities.find((x) => values[x]![i] === brightest)!;
        problems.add('nightLight', `${where} (hour ending ${hourEnding(i)}, sun at ${Math.round(alt)}°) ${QUANTITY_WORDS[q]} ${fmtNumber(brightest)} W/m²`);
        bad = true;
      }
    }
    if (!bad && ghi !== undefined && ghi > COMPARISON_MIN_GHI) {
      const ratio = diffuseRatioLimit(zenith);
      if (dhi !== undefined && ratio !== undefined && dhi > ratio * ghi) {
        problems.add('diffuseAboveGlobal', `${where}: diffuse ${fmtNumber(dhi)}, global ${fmtNumber(ghi)} W/m²`);
        bad = true;
      }
      const tol = closureTolerance(zenith);
      if (!bad && impliedGhi !== undefined && tol !== undefined && Math.abs(impliedGhi - ghi) > tol * ghi) {
        problems.add('closure', `${where}: direct × cos z + diffuse ${fmtNumber(impliedGhi)}, global ${fmtNumber(ghi)} W/m²`);
        bad = true;
      }
    }
    if (bad) {
      usable[i] = 0;
      for (const q of quantities) values[q]![i] = NaN;
    }
  }

  // Hints and notes.
  if (table.brokenHint) problems.hint('broken', table.brokenHint);
  if (assumed.length && problems.has('aboveLimit')) {
    problems.hint('aboveLimit', `no unit was stated: if the values are hourly sums in kJ/m², say so (${advice.unit})`);
  }
  if (smallNegatives) notes.push(`${smallNegatives} small negative value${smallNegatives > 1 ? 's' : ''} (${IRRADIANCE_FLOOR} to 0 W/m², a sensor's night offset) read as 0`);
  if (sameTwice) notes.push(`${sameTwice} row${sameTwice > 1 ? 's' : ''} repeat${sameTwice > 1 ? '' : 's'} an hour with the same values: used once`);
  if (timing !== undefined) {
    const { shift, days } = timing;
    const off = site.utcOffset >= 0 ? `+${site.utcOffset}` : String(site.utcOffset);
    if (Math.abs(shift) >= 0.75) {
      const k = Math.round(Math.abs(shift));
      refusals.push(
        `the light in the file comes about ${k} h ${shift > 0 ? 'later' : 'earlier'} than the sun at the site (judged by sunrise and sunset on ${days} days): check the window's UTC offset (${off} h) and longitude, and whether the stamps mark the end of each hour${shift < 0 ? ` (if they mark its start: ${advice.hourStamp('start')})` : ''}`,
      );
    } else if (Math.abs(shift) >= 0.25) {
      notes.push(`the light comes about half an hour ${shift > 0 ? 'later' : 'earlier'} than the sun at the site: are the values readings at the stamp rather than means over the hour?`);
    }
  }

  // Gaps: hours of the year without a row.
  for (let i = 0; i < n; ) {
    if (slotRow[i] >= 0) {
      i++;
      continue;
    }
    let j = i;
    while (j + 1 < n && slotRow[j + 1] < 0) j++;
    const len = j - i + 1;
    problems.add('gap', len === 1 ? `hour ending ${hourEnding(i)}` : `hours ending ${hourEnding(i)} to ${hourEnding(j)} (${len} h)`, len);
    i = j + 1;
  }

  let unusableHours = 0;
  for (let i = 0; i < n; i++) if (!usable[i]) unusableHours++;
  const withinLimit = unusableHours <= (maxUnusablePercent / 100) * n;
  const weather: Weather = has('dni') ? { kind: 'measured', dni: values.dni!, dhi: values.dhi! } : { kind: 'globalHorizontal', ghi: values.ghi! };
  const ok = refusals.length === 0 && withinLimit;
  return { ...(ok ? { weather } : {}), hours: n, unusableHours, maxUnusablePercent, refusals, problems: problems.list(), notes, usable: ok };
}

/**
 * Places rows at their hours by their stamps; fills `slotRow` (hour → first row) and `duplicates`
 * (hour → later rows), reports stamp problems. Returns the number of rows placed.
 */
function placeByStamps(
  table: WeatherTable,
  options: WeatherOptions,
  n: number,
  slotRow: Int32Array,
  duplicates: Map<number, number[]>,
  problems: ProblemList,
  notes: string[],
): number {
  const { year, site, advice } = options;
  const convention = options.hourStamp ?? 'end';
  const shiftMinutes = convention === 'end' ? 60 : convention === 'middle' ? 30 : 0;
  const siteOffsetMinutes = Math.round(site.utcOffset * 60);
  const firstDay = civilToSerial(year, 1, 1);
  const cells = table.stamps!.cells;
  let placed = 0;
  let lastIndex = -1;
  let lastText = '';
  let zoned: number | undefined;
  let halfPast = 0;
  let offHour = 0;
  const yearsOutside = new Map<number, number>();
  const yearsSeen = new Set<number>();
  let startOfYearFirst = false;
  let feb29Dropped = 0;
  for (let row = 0; row < table.rows; row++) {
    if (table.brokenRows?.has(row)) {
      problems.add('broken', `${table.where(row)} (${table.brokenRows.get(row)})`);
      continue;
    }
    const cell = cells[row];
    const text = cellText(cell);
    const s = cellStamp(cell);
    if (!s) {
      problems.add('stampUnreadable', `${table.where(row)} "${text}"`);
      continue;
    }
    yearsSeen.add(s.year);
    if (s.offsetMinutes !== undefined) zoned = s.offsetMinutes;
    const zoneShift = s.offsetMinutes !== undefined ? siteOffsetMinutes - s.offsetMinutes : 0;
    let minutes: number;
    if (options.typicalYear) {
      // The hour's own start, in the stamp's year, then its month, day and time in the window's year.
      const start = serialToCivil(civilToSerial(s.year, s.month, s.day, s.hour, s.minute, s.second) + (zoneShift - shiftMinutes) / 1440);
      if (start.month === 2 && start.day === 29 && hoursInYear(year) === 8760) {
        feb29Dropped++;
        continue;
      }
      minutes = (civilToSerial(year, start.month, start.day) - firstDay) * 1440 + start.hour * 60 + start.minute + Math.round(start.second) / 60;
    } else {
      minutes = (civilToSerial(s.year, s.month, s.day) - firstDay) * 1440 + s.hour * 60 + s.minute + s.second / 60 + zoneShift - shiftMinutes;
    }
    if (minutes % 60 !== 0) {
      problems.add('stampOffHour', `${table.where(row)} "${text}"`);
      offHour++;
      if (s.minute === 30) halfPast++;
      continue;
    }
    const index = minutes / 60;
    if (index < 0 || index >= n) {
      if (index === -1 && placed === 0) startOfYearFirst = true;
      problems.add('outside', `${table.where(row)} "${text}"`);
      yearsOutside.set(s.year, (yearsOutside.get(s.year) ?? 0) + 1);
      continue;
    }
    if (index < lastIndex) problems.add('outOfOrder', `${table.where(row)} "${text}" after "${lastText}"`);
    lastIndex = index;
    lastText = text;
    if (slotRow[index] < 0) slotRow[index] = row;
    else duplicates.set(index, [...(duplicates.get(index) ?? []), row]);
    placed++;
  }
  // Hints from the pattern of the stamps.
  const outside = 'outside';
  if (problems.has(outside)) {
    const [topYear, topCount] = [...yearsOutside.entries()].sort((a, b) => b[1] - a[1])[0] ?? [undefined, 0];
    if (startOfYearFirst && convention === 'end' && yearsOutside.size <= 1 && topCount <= 2) {
      problems.hint(outside, `the first row is stamped 00:00 on 1 January: if each stamp marks the start of its hour, say so (${advice.hourStamp('start')})`);
    } else if (!options.typicalYear && yearsSeen.size > 2) {
      problems.hint(outside, `the stamps span ${Math.min(...yearsSeen)}–${Math.max(...yearsSeen)}: if the file is a typical year, say so (${advice.typicalYear})`);
    } else if (!options.typicalYear && topYear !== undefined && topCount >= table.rows / 2) {
      problems.hint(outside, `the stamps are for ${topYear}: set the window's year to ${topYear}, or, if the file is a typical year, say so (${advice.typicalYear})`);
    }
  }
  if (offHour > 0 && halfPast >= offHour / 2 && convention !== 'middle') {
    problems.hint('stampOffHour', `stamps at half past: if each marks the middle of its hour, say so (${advice.hourStamp('middle')})`);
  }
  if (zoned !== undefined && zoned !== siteOffsetMinutes) {
    notes.push(`stamps with a time zone converted to the window's standard time (${utcOffsetText(site.utcOffset)})`);
  }
  if (options.typicalYear && feb29Dropped > 0) notes.push(`29 February's ${feb29Dropped} row${feb29Dropped > 1 ? 's' : ''} dropped: ${year} has no 29 February`);
  if (options.typicalYear && hoursInYear(year) === 8784) {
    // A typical year has no 29 February: as the trade fits one to a leap year, that day repeats 28 February.
    const feb29 = FEB29_HOUR;
    let empty = true;
    for (let i = feb29; i < feb29 + 24; i++) if (slotRow[i] >= 0) empty = false;
    if (empty) {
      for (let i = feb29; i < feb29 + 24; i++) slotRow[i] = slotRow[i - 24];
      notes.push(`a typical year fitted to leap year ${year}: 29 February repeats 28 February's hours`);
    }
  }
  if (options.typicalYear) {
    const ys = [...yearsSeen];
    notes.push(`stamps of a typical year${ys.length ? ` (${Math.min(...ys) === Math.max(...ys) ? Math.min(...ys) : `${Math.min(...ys)}–${Math.max(...ys)}`})` : ''} read by month, day and hour as ${year}`);
  }
  return placed;
}

/**
 * The shift between the light in the data and the sun [h], from sunrise and sunset: on each day
 * whose every hour is usable and which has both a first and a last hour of light in the data and
 * with the sun up (at mid-hour), the differences of the first and of the last; the shift is the
 * mean of the two mean differences. Undefined with fewer than {@link TIMING_MIN_DAYS} such days.
 */
function timingShift(values: Partial<Record<Quantity, Float64Array>>, quantities: readonly Quantity[], altitude: Float64Array, usable: Uint8Array, n: number): { shift: number; days: number } | undefined {
  let riseSum = 0;
  let setSum = 0;
  let days = 0;
  for (let d = 0; d * 24 + 23 < n; d++) {
    let complete = true;
    let dataFirst = -1;
    let dataLast = -1;
    let sunFirst = -1;
    let sunLast = -1;
    for (let h = 0; h < 24; h++) {
      const i = d * 24 + h;
      if (!usable[i]) {
        complete = false;
        break;
      }
      let lit = false;
      for (const q of quantities) if (values[q]![i] > LIGHT_THRESHOLD) lit = true;
      if (lit) {
        if (dataFirst < 0) dataFirst = h;
        dataLast = h;
      }
      if (altitude[i] > 0) {
        if (sunFirst < 0) sunFirst = h;
        sunLast = h;
      }
    }
    // Only days with a sunrise and a sunset inside the day, in both.
    if (!complete || dataFirst <= 0 || sunFirst <= 0 || dataLast >= 23 || sunLast >= 23) continue;
    const rise = dataFirst - sunFirst;
    const set = dataLast - sunLast;
    if (Math.abs(rise) > 6 || Math.abs(set) > 6) continue;
    riseSum += rise;
    setSum += set;
    days++;
  }
  if (days < TIMING_MIN_DAYS) return undefined;
  return { shift: (riseSum / days + setSum / days) / 2, days };
}

/**
 * The check as lines of text for a person: why it was refused, how many hours cannot be used and
 * why (each kind of problem with its count and first places), and the notes. The same lines in the
 * command line and the pane.
 * @param check - from {@link checkWeather}
 * @param source - what the weather is called (the file name, `the weather columns`)
 * @param advice - how the caller names its options (for the limit)
 */
export function describeWeatherCheck(check: WeatherCheck, source: string, advice: WeatherAdvice): string[] {
  const lines: string[] = [];
  for (const r of check.refusals) lines.push(`${source} cannot be used: ${r}`);
  const { unusableHours: u, hours: n } = check;
  if (check.refusals.length === 0 && (u > 0 || check.problems.length > 0)) {
    const share = `${u} of ${n} hours cannot be used (${percent(u, n)} %)`;
    if (u === 0) lines.push(`${source}: every hour can be used, but:`);
    else if (check.usable) lines.push(`${source}: ${share}, within the ${check.maxUnusablePercent} % allowed; their gain is left out of the totals:`);
    else lines.push(`${source} cannot be used: ${share}, more than the ${check.maxUnusablePercent} % allowed (${advice.maxUnusable}):`);
  }
  if (check.refusals.length === 0 || check.problems.length > 0) {
    for (const p of check.problems) {
      const more = p.places > p.examples.length ? `; and ${p.places - p.examples.length} more` : '';
      lines.push(`  ${p.count} ${p.what}: ${p.examples.join('; ')}${more}${p.hint ? ` (${p.hint})` : ''}`);
    }
  }
  for (const note of check.notes) lines.push(`${source}: ${note}`);
  return lines;
}
