/**
 * The window form: every field the pane shows, the defaults a practitioner expects, and the paths
 * its value goes to (so that a validation message naming `shgc` or `glazing.shgc` lands beside the
 * SHGC box). A box that holds a window field has the field's glossary name as its id and the
 * glossary's label (src/registry/glossary.ts), so the pane speaks the words of the functions, the
 * window file and the schedule; the pane's own boxes (example place, glass model, weather source,
 * sheet ranges) keep ids of their own.
 */
import { EXAMPLE_SITES } from '../demo/sites';
import { HOUR_STAMPS } from '../io/weather';
import { HOUR_STAMP_LABELS } from './weather';
import { GLOSSARY, type GlossaryEntry } from '../registry/glossary';

export type SectionId = 'site' | 'facing' | 'opening' | 'glass' | 'shade' | 'sky' | 'run';

export interface FieldOption {
  value: string;
  label: string;
}

export interface FieldDef {
  /** DOM id and key in the saved form. */
  id: string;
  label: string;
  section: SectionId;
  /** `number`: one number; `list`: one or twelve numbers separated by commas or semicolons; `address`: a range address; `select`: one of `options`; `text`: free text. */
  kind: 'number' | 'list' | 'address' | 'select' | 'text';
  unit?: string;
  /** Default text of the box. */
  initial: string;
  /** WindowSpec path(s) whose validation messages belong to this field. */
  paths?: readonly string[];
  options?: readonly FieldOption[];
  /** Short hint under the box. */
  hint?: string;
  /** Shown only when this returns true for the current form values. */
  visible?: (v: FormValues) => boolean;
  /** Ids this box had in earlier versions (a saved form under an old id is read into it). */
  formerIds?: readonly string[];
}

/** The form's values as typed: field id → text. */
export type FormValues = Record<string, string>;

/** A box for a glossary window field: its name as id, its label (unit apart), and its name and paths for messages. */
function box(g: GlossaryEntry, section: SectionId, initial: string, extra: Partial<FieldDef> = {}): FieldDef {
  const label = g.label.replace(/\s*\[[^\]]*\]\s*$/, '');
  return { id: g.name, label, section, kind: 'number', ...(g.unit ? { unit: g.unit } : {}), initial, paths: [g.name, ...(g.window?.paths ?? [])], ...extra };
}

const physical = (v: FormValues) => v.glassModel !== 'table';
const table = (v: FormValues) => v.glassModel === 'table';
const weatherIs = (...kinds: string[]) => (v: FormValues) => kinds.includes(v.weatherSource);
const hourly = weatherIs('measured', 'globalHorizontal');

export const SECTIONS: readonly { id: SectionId; title: string }[] = [
  { id: 'site', title: 'Place' },
  { id: 'facing', title: 'Which way it faces' },
  { id: 'opening', title: 'Opening' },
  { id: 'glass', title: 'Glass' },
  { id: 'shade', title: 'Outside shading' },
  { id: 'sky', title: 'Sky and weather' },
  { id: 'run', title: 'Year' },
];

export const FIELDS: readonly FieldDef[] = [
  box(GLOSSARY.name, 'site', 'Window A', { kind: 'text', formerIds: ['windowName'] }),
  {
    id: 'examplePlace',
    label: 'Example place (fills the boxes below)',
    section: 'site',
    kind: 'select',
    initial: '',
    options: [{ value: '', label: 'my own coordinates' }, ...EXAMPLE_SITES.map((s) => ({ value: s.id, label: s.label }))],
  },
  box(GLOSSARY.latitude, 'site', '52.2', { hint: 'north positive' }),
  box(GLOSSARY.longitude, 'site', '4.9', { hint: 'east positive' }),
  box(GLOSSARY.elevation, 'site', '0'),
  box(GLOSSARY.utcOffset, 'site', '1', { hint: 'standard time, east positive' }),
  box(GLOSSARY.daylightSavingStart, 'site', '', { kind: 'text', hint: 'clock reading when the clocks go forward, e.g. 2025-03-30 02:00 (a date serial counts in this workbook\'s date system); repeats yearly on that weekday of the month; blank: standard time all year' }),
  box(GLOSSARY.daylightSavingEnd, 'site', '', { kind: 'text', hint: 'clock reading when they go back (daylight time), e.g. 2025-10-26 03:00, or a date serial as above' }),
  box(GLOSSARY.daylightSavingShift, 'site', '', { hint: 'blank: 1 h' }),

  box(GLOSSARY.surfaceAzimuth, 'facing', '180', { hint: 'the way the glass faces, from north: N 0 · E 90 · S 180 · W 270' }),
  box(GLOSSARY.surfaceTilt, 'facing', '90', { hint: 'from horizontal: 90 = upright wall; shading devices need 90' }),

  box(GLOSSARY.width, 'opening', '1.8'),
  box(GLOSSARY.height, 'opening', '1.5'),
  box(GLOSSARY.frameFraction, 'opening', '0.15', { hint: 'share of the opening, 0 to below 1' }),

  {
    id: 'glassModel',
    label: 'How the SHGC varies with angle',
    section: 'glass',
    kind: 'select',
    initial: 'physical',
    options: [
      { value: 'physical', label: 'from pane count (Fresnel reflection)' },
      { value: 'table', label: 'from my angle table on a sheet' },
    ],
  },
  box(GLOSSARY.shgc, 'glass', '0.4', { label: 'SHGC at normal incidence' }),
  box(GLOSSARY.panes, 'glass', '2', { visible: physical }),
  { id: 'angleTableAddress', label: 'Angle table (two columns: angle °, SHGC)', section: 'glass', kind: 'address', initial: '', paths: ['shgcAngles', 'shgcValues', 'glazing.angleTable'], visible: table, hint: 'e.g. Glass!A2:B10' },
  box(GLOSSARY.interiorAttenuation, 'glass', '1', { hint: 'inside blind or curtain; 1 = none' }),
  {
    ...box(GLOSSARY.roomConstruction, 'glass', '', { kind: 'select', hint: 'for the cooling load: illustrative radiant time series from our own room model, not a published table' }),
    options: [
      { value: '', label: 'none (gains only)' },
      { value: 'light', label: 'light' },
      { value: 'medium', label: 'medium' },
      { value: 'heavy', label: 'heavy' },
    ],
  },

  box(GLOSSARY.overhangProjection, 'shade', '0', { hint: 'depth out from the wall; 0 = no overhang' }),
  box(GLOSSARY.overhangGap, 'shade', '0', { hint: 'underside above the window head' }),
  box(GLOSSARY.overhangExtensionLeft, 'shade', '0', { hint: 'past the left jamb, seen from outside' }),
  { ...box(GLOSSARY.overhangExtensionRight, 'shade', '0', { hint: 'past the right jamb' }), paths: ['overhangExtensionRight', 'shading.overhang.extensionRight', 'shading.overhang'] },
  box(GLOSSARY.leftFinProjection, 'shade', '0', { hint: '0 = no fin' }),
  box(GLOSSARY.leftFinGap, 'shade', '0', { hint: 'from the left jamb' }),
  box(GLOSSARY.leftFinExtensionAbove, 'shade', '0', { hint: 'above the head', formerIds: ['leftFinAbove'] }),
  { ...box(GLOSSARY.leftFinExtensionBelow, 'shade', '0', { hint: 'below the sill', formerIds: ['leftFinBelow'] }), paths: ['leftFinExtensionBelow', 'shading.leftFin.extensionBelow', 'shading.leftFin'] },
  box(GLOSSARY.rightFinProjection, 'shade', '0', { hint: '0 = no fin' }),
  box(GLOSSARY.rightFinGap, 'shade', '0', { hint: 'from the right jamb' }),
  box(GLOSSARY.rightFinExtensionAbove, 'shade', '0', { hint: 'above the head', formerIds: ['rightFinAbove'] }),
  { ...box(GLOSSARY.rightFinExtensionBelow, 'shade', '0', { hint: 'below the sill', formerIds: ['rightFinBelow'] }), paths: ['rightFinExtensionBelow', 'shading.rightFin.extensionBelow', 'shading.rightFin'] },
  box(GLOSSARY.revealDepth, 'shade', '0', { hint: 'glass set back from the wall face' }),
  { id: 'skylineAddress', label: 'Skyline elevations (optional range)', section: 'shade', kind: 'address', initial: '', paths: ['skyline', 'shading.skyline'], hint: 'angles 0–90° for equal sectors clockwise from north, e.g. Site!B2:B13' },

  box(GLOSSARY.groundAlbedo, 'sky', '0.2', { hint: 'ground reflectance' }),
  {
    ...box(GLOSSARY.skyModel, 'sky', 'perez1990', { kind: 'select' }),
    options: [
      { value: 'perez1990', label: 'Perez 1990' },
      { value: 'hayDavies', label: 'Hay–Davies' },
      { value: 'isotropic', label: 'isotropic' },
    ],
  },
  {
    id: 'weatherSource',
    label: 'Irradiance from',
    section: 'sky',
    kind: 'select',
    initial: 'ineichenClearSky',
    paths: ['weather.kind', 'weather'],
    options: [
      { value: 'ineichenClearSky', label: 'clear sky by Linke turbidity' },
      { value: 'ashraeClearSky', label: 'clear sky by ASHRAE optical depths' },
      { value: 'measured', label: 'my hourly direct normal + diffuse horizontal' },
      { value: 'globalHorizontal', label: 'my hourly global horizontal only' },
    ],
  },
  box(GLOSSARY.linkeTurbidity, 'sky', '3', { kind: 'list', label: 'Linke turbidity (1 or 12 monthly values)', visible: weatherIs('ineichenClearSky') }),
  box(GLOSSARY.tauB, 'sky', '0.4', { kind: 'list', label: 'Tau b, beam optical depth (1 or 12 values)', visible: weatherIs('ashraeClearSky') }),
  box(GLOSSARY.tauD, 'sky', '2.2', { kind: 'list', label: 'Tau d, diffuse optical depth (1 or 12 values)', visible: weatherIs('ashraeClearSky') }),
  { id: 'dniAddress', label: 'Direct normal column', unit: 'W/m²', section: 'sky', kind: 'address', initial: '', paths: ['dni', 'weather.dni'], visible: weatherIs('measured'), hint: 'one cell per hour of the year; each stamp marks the end of its hour unless said below' },
  { id: 'dhiAddress', label: 'Diffuse horizontal column', unit: 'W/m²', section: 'sky', kind: 'address', initial: '', paths: ['dhi', 'weather.dhi'], visible: weatherIs('measured') },
  { id: 'ghiAddress', label: 'Global horizontal column', unit: 'W/m²', section: 'sky', kind: 'address', initial: '', paths: ['ghi', 'weather.ghi'], visible: weatherIs('globalHorizontal'), hint: 'split into beam and diffuse by Erbs et al. (1982)' },
  { id: 'timeAddress', label: 'Time stamps column (optional)', section: 'sky', kind: 'address', initial: '', paths: ['weather.stamps'], visible: hourly, hint: 'date-times; without it the rows are the hours in order from 01:00 on 1 January' },
  { id: 'hourStamp', label: 'Each stamp marks', section: 'sky', kind: 'select', initial: 'end', options: HOUR_STAMPS.map((s) => ({ value: s, label: HOUR_STAMP_LABELS[s] })), visible: hourly },
  {
    id: 'stampYear',
    label: 'The stamps are of',
    section: 'sky',
    kind: 'select',
    initial: '',
    options: [
      { value: '', label: 'the year below' },
      { value: 'typical', label: 'a typical year (read by month, day and hour)' },
    ],
    visible: hourly,
  },
  {
    id: 'weatherUnit',
    label: 'Units of the weather columns',
    section: 'sky',
    kind: 'select',
    initial: '',
    options: [
      { value: '', label: 'as their headers say, else W/m²' },
      { value: 'W/m²', label: 'W/m² (mean over the hour)' },
      { value: 'Wh/m²', label: 'Wh/m² (sum over the hour)' },
      { value: 'kJ/m²', label: 'kJ/m² (sum over the hour)' },
    ],
    visible: hourly,
  },
  { id: 'maxUnusable', label: 'Unusable hours allowed', unit: '%', section: 'sky', kind: 'number', initial: '1', paths: ['weather.maxUnusable'], visible: hourly, hint: 'more than this share of the year and the weather is refused' },

  box(GLOSSARY.year, 'run', String(new Date().getFullYear())),
  {
    ...box(GLOSSARY.timeConvention, 'run', 'hourEnding', { kind: 'select', hint: 'how each hourly row is stamped: the same choice as the timeConvention field of the functions and the schedule' }),
    options: [
      { value: 'hourEnding', label: 'hour ending (sun at mid-hour)' },
      { value: 'instant', label: 'instant (sun at the stamp)' },
    ],
  },
];

export const FIELD_BY_ID: ReadonlyMap<string, FieldDef> = new Map(FIELDS.map((f) => [f.id, f]));

/** The form as it first opens. */
export function initialValues(): FormValues {
  const v: FormValues = {};
  for (const f of FIELDS) v[f.id] = f.initial;
  return v;
}

/**
 * The field a validation message belongs to: the field whose path is the longest prefix of the
 * error's argument (`shading.overhang.projection`, `weather.linkeTurbidity (value 3)`…).
 */
export function fieldForArgument(argument: string): FieldDef | undefined {
  let best: FieldDef | undefined;
  let bestLength = -1;
  for (const f of FIELDS) {
    for (const p of f.paths ?? []) {
      const hit = argument === p || argument.startsWith(`${p}.`) || argument.startsWith(`${p}[`) || argument.startsWith(`${p} `);
      if (hit && p.length > bestLength) {
        best = f;
        bestLength = p.length;
      }
    }
  }
  return best;
}

/** Fills the site boxes from an example site. */
export function applyExampleSite(values: FormValues, id: string): FormValues {
  const s = EXAMPLE_SITES.find((e) => e.id === id);
  if (!s) return values;
  return {
    ...values,
    examplePlace: id,
    latitude: String(s.site.latitude),
    longitude: String(s.site.longitude),
    utcOffset: String(s.site.utcOffset),
    elevation: String(s.site.elevation ?? 0),
    groundAlbedo: String(s.groundAlbedo),
    linkeTurbidity: s.linkeTurbidity.join(', '),
  };
}
