/**
 * The window schedule: many windows read from an Excel table, one row per window, each run for the
 * whole year and summarised in one row. The form supplies everything a row leaves out (place,
 * glass model, sky and weather, year); a row's columns override it.
 *
 * Column headers (our own; case, spaces and units in brackets do not matter):
 *   Window            label of the window (required)
 *   Faces             bearing the glass faces, ° from north (required)
 *   Width, Height     opening size, m (required)
 *   Tilt              °; Frame share; SHGC; Panes; Blind factor (inside attenuation)
 *   Overhang depth, Overhang gap, Overhang reach (past each jamb), m
 *   Left fin depth, Right fin depth, Fin gap (from the jamb), m
 *   Set-back (glass behind the wall face), m
 *   Latitude, Longitude, UTC offset, Elevation, Ground reflectance
 * Any row with a missing or bad value is reported by row and column, and nothing is written until
 * every row is valid.
 */
import { SunpaneError } from '../core/errors';
import type { WindowSpec } from '../core/window';
import { type FormValues, fieldForArgument } from './fields';
import { type SheetData, type SpecValidator, buildWindowSpec } from './spec';

/** One schedule column: our header, the form boxes it fills, and whether a row must give it. */
export interface ScheduleColumn {
  header: string;
  /** Form field ids it sets (an overhang reach sets both sides). */
  fields: readonly string[];
  required?: boolean;
}

export const SCHEDULE_COLUMNS: readonly ScheduleColumn[] = [
  { header: 'Window', fields: ['windowName'], required: true },
  { header: 'Faces', fields: ['surfaceAzimuth'], required: true },
  { header: 'Width', fields: ['width'], required: true },
  { header: 'Height', fields: ['height'], required: true },
  { header: 'Tilt', fields: ['surfaceTilt'] },
  { header: 'Frame share', fields: ['frameFraction'] },
  { header: 'SHGC', fields: ['shgc'] },
  { header: 'Panes', fields: ['panes'] },
  { header: 'Blind factor', fields: ['interiorAttenuation'] },
  { header: 'Overhang depth', fields: ['overhangProjection'] },
  { header: 'Overhang gap', fields: ['overhangGap'] },
  { header: 'Overhang reach', fields: ['overhangExtensionLeft', 'overhangExtensionRight'] },
  { header: 'Left fin depth', fields: ['leftFinProjection'] },
  { header: 'Right fin depth', fields: ['rightFinProjection'] },
  { header: 'Fin gap', fields: ['leftFinGap', 'rightFinGap'] },
  { header: 'Set-back', fields: ['revealDepth'] },
  { header: 'Latitude', fields: ['latitude'] },
  { header: 'Longitude', fields: ['longitude'] },
  { header: 'UTC offset', fields: ['utcOffset'] },
  { header: 'Elevation', fields: ['elevation'] },
  { header: 'Ground reflectance', fields: ['groundAlbedo'] },
];

/** Help text listing the headers, for the pane. */
export const SCHEDULE_HELP = `One row per window. Needed: ${SCHEDULE_COLUMNS.filter((c) => c.required).map((c) => c.header).join(', ')}. Optional (blank takes the form's value): ${SCHEDULE_COLUMNS.filter((c) => !c.required).map((c) => c.header).join(', ')}. Lengths in m, angles in °; units in brackets after a header are ignored.`;

/** A header reduced for matching: lower case, no units in brackets, letters and digits only. */
export function headerKey(text: unknown): string {
  return String(text ?? '')
    .replace(/[([][^)\]]*[)\]]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]/g, '');
}

const BY_KEY = new Map(SCHEDULE_COLUMNS.map((c) => [headerKey(c.header), c]));

/** A schedule row ready to run. */
export interface ScheduleRow {
  /** 1-based row number within the table's data. */
  row: number;
  spec: WindowSpec;
}

/** A problem with the schedule: the row (1-based, 0 for the header), the column, the message. */
export interface ScheduleProblem {
  row: number;
  column?: string;
  message: string;
}

function cellText(v: unknown): string {
  if (v === null || v === undefined) return '';
  return typeof v === 'number' ? String(v) : String(v).trim();
}

/**
 * Reads a schedule table (header row first) into WindowSpecs, each checked by the core's
 * validator. Returns every problem found (nothing is run when there is any).
 * @param table - the table's values, header row first
 * @param form - the form, supplying what a row leaves out
 * @param data - sheet data the form refers to (skyline, angle table, weather columns)
 */
export function readSchedule(table: readonly (readonly unknown[])[], form: FormValues, validate: SpecValidator, data: SheetData = {}): { rows: ScheduleRow[]; problems: ScheduleProblem[] } {
  const problems: ScheduleProblem[] = [];
  const rows: ScheduleRow[] = [];
  if (table.length === 0) return { rows, problems: [{ row: 0, message: 'The table is empty: it needs a header row and one row per window.' }] };
  const header = table[0].map(headerKey);
  const columns: (ScheduleColumn | undefined)[] = header.map((k) => BY_KEY.get(k));
  table[0].forEach((h, i) => {
    if (!columns[i] && cellText(h) !== '') problems.push({ row: 0, column: cellText(h), message: `Header "${cellText(h)}" is not a schedule column (see the list of headers).` });
  });
  for (const c of SCHEDULE_COLUMNS.filter((c) => c.required)) {
    if (!columns.includes(c)) problems.push({ row: 0, column: c.header, message: `The table has no "${c.header}" column, which every schedule needs.` });
  }
  if (problems.length) return { rows, problems };
  if (table.length < 2) return { rows, problems: [{ row: 0, message: 'The table has no windows: add one row per window under the header.' }] };

  for (let r = 1; r < table.length; r++) {
    const line = table[r];
    if (line.every((v) => cellText(v) === '')) continue;
    const values: FormValues = { ...form };
    const fieldToColumn = new Map<string, string>();
    columns.forEach((col, i) => {
      if (!col) return;
      const text = cellText(line[i]);
      for (const id of col.fields) fieldToColumn.set(id, col.header);
      if (text === '' && !col.required) return;
      for (const id of col.fields) values[id] = text;
    });
    const label = values.windowName.trim();
    if (label === '') {
      problems.push({ row: r, column: 'Window', message: `Row ${r}, column "Window": blank is not allowed: every window needs a label.` });
      continue;
    }
    try {
      const spec = buildWindowSpec(values, data);
      validate(spec);
      rows.push({ row: r, spec });
    } catch (err) {
      if (!(err instanceof SunpaneError)) throw err;
      const field = fieldForArgument(err.argument);
      const column = field ? fieldToColumn.get(field.id) : undefined;
      const where = column ? `column "${column}"` : field ? `form box "${field.label}"` : 'form';
      problems.push({ row: r, column, message: `Row ${r} (${label}), ${where}: ${err.message}` });
    }
  }
  return { rows, problems };
}

/** Header of the summary sheet's table (our own wording). */
export const SUMMARY_HEADER = ['Window', 'Faces °', 'Glass m²', 'Solar gain kWh/yr', 'kWh per m² of glass', 'Peak gain W', 'Peak at (hour ending)', 'Mean glass-in-sun share', 'Hours with missing weather'] as const;

/** One summary row from a window's yearly figures. */
export function summaryRow(spec: WindowSpec, fig: { annualKWh: number; peakW: number; peakStamp?: number; meanSunlitFraction: number; missingHours: number; glassArea: number }): (number | string)[] {
  const round = (x: number, d: number) => Math.round(x * 10 ** d) / 10 ** d;
  return [
    spec.name,
    spec.surfaceAzimuth,
    round(fig.glassArea, 3),
    round(fig.annualKWh, 1),
    round(fig.glassArea > 0 ? fig.annualKWh / fig.glassArea : 0, 1),
    round(fig.peakW, 1),
    fig.peakStamp === undefined ? '' : round(fig.peakStamp, 6),
    round(fig.meanSunlitFraction, 3),
    fig.missingHours,
  ];
}

/** Number formats of a summary row. */
export const SUMMARY_FORMATS = ['@', '0', '0.00', '0.0', '0.0', '0.0', 'yyyy-mm-dd hh:mm', '0.000', '0'];
