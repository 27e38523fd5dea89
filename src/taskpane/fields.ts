/**
 * The window form: every field the pane shows, with our own labels, the defaults a practitioner
 * expects, and the WindowSpec path its value goes to (so that a core validation message naming
 * `glazing.shgc` lands beside the SHGC box).
 */
import { EXAMPLE_SITES } from '../demo/sites';
import { HOUR_STAMPS } from '../io/weather';
import { HOUR_STAMP_LABELS } from './weather';

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
}

/** The form's values as typed: field id → text. */
export type FormValues = Record<string, string>;

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
  { id: 'windowName', label: 'Window label', section: 'site', kind: 'text', initial: 'Window A', paths: ['name'] },
  {
    id: 'examplePlace',
    label: 'Example place (fills the boxes below)',
    section: 'site',
    kind: 'select',
    initial: '',
    options: [{ value: '', label: 'my own coordinates' }, ...EXAMPLE_SITES.map((s) => ({ value: s.id, label: s.label }))],
  },
  { id: 'latitude', label: 'Latitude', unit: '°', section: 'site', kind: 'number', initial: '52.2', paths: ['site.latitude', 'latitude'], hint: 'north positive' },
  { id: 'longitude', label: 'Longitude', unit: '°', section: 'site', kind: 'number', initial: '4.9', paths: ['site.longitude', 'longitude'], hint: 'east positive' },
  { id: 'elevation', label: 'Elevation', unit: 'm', section: 'site', kind: 'number', initial: '0', paths: ['site.elevation', 'elevation'] },
  { id: 'utcOffset', label: 'Offset from UTC', unit: 'h', section: 'site', kind: 'number', initial: '1', paths: ['site.utcOffset', 'utcOffset'], hint: 'standard time, east positive' },

  { id: 'surfaceAzimuth', label: 'Glass faces (bearing)', unit: '°', section: 'facing', kind: 'number', initial: '180', paths: ['surfaceAzimuth'], hint: 'from north: N 0 · E 90 · S 180 · W 270' },
  { id: 'surfaceTilt', label: 'Tilt from horizontal', unit: '°', section: 'facing', kind: 'number', initial: '90', paths: ['surfaceTilt'], hint: '90 = upright wall; shading devices need 90' },

  { id: 'width', label: 'Width', unit: 'm', section: 'opening', kind: 'number', initial: '1.8', paths: ['width'] },
  { id: 'height', label: 'Height', unit: 'm', section: 'opening', kind: 'number', initial: '1.5', paths: ['height'] },
  { id: 'frameFraction', label: 'Frame share of the opening', section: 'opening', kind: 'number', initial: '0.15', paths: ['frameFraction'], hint: '0 to below 1' },

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
  { id: 'shgc', label: 'SHGC at normal incidence', section: 'glass', kind: 'number', initial: '0.4', paths: ['glazing.shgc'] },
  { id: 'panes', label: 'Panes', section: 'glass', kind: 'number', initial: '2', paths: ['glazing.panes'], visible: physical },
  { id: 'angleTableAddress', label: 'Angle table (two columns: angle °, SHGC)', section: 'glass', kind: 'address', initial: '', paths: ['glazing.angleTable'], visible: table, hint: 'e.g. Glass!A2:B10' },
  { id: 'interiorAttenuation', label: 'Inside blind or curtain factor', section: 'glass', kind: 'number', initial: '1', paths: ['glazing.interiorAttenuation'], hint: '1 = none' },

  { id: 'overhangProjection', label: 'Overhang depth', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.overhang.projection'], hint: '0 = no overhang' },
  { id: 'overhangGap', label: 'Overhang gap above head', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.overhang.gap'] },
  { id: 'overhangExtensionLeft', label: 'Overhang past left jamb', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.overhang.extensionLeft'], hint: 'left as seen from outside' },
  { id: 'overhangExtensionRight', label: 'Overhang past right jamb', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.overhang.extensionRight', 'shading.overhang'] },
  { id: 'leftFinProjection', label: 'Left fin depth', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.leftFin.projection'], hint: '0 = no fin' },
  { id: 'leftFinGap', label: 'Left fin gap from jamb', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.leftFin.gap'] },
  { id: 'leftFinAbove', label: 'Left fin rise above head', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.leftFin.extensionAbove'] },
  { id: 'leftFinBelow', label: 'Left fin drop below sill', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.leftFin.extensionBelow', 'shading.leftFin'] },
  { id: 'rightFinProjection', label: 'Right fin depth', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.rightFin.projection'], hint: '0 = no fin' },
  { id: 'rightFinGap', label: 'Right fin gap from jamb', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.rightFin.gap'] },
  { id: 'rightFinAbove', label: 'Right fin rise above head', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.rightFin.extensionAbove'] },
  { id: 'rightFinBelow', label: 'Right fin drop below sill', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.rightFin.extensionBelow', 'shading.rightFin'] },
  { id: 'revealDepth', label: 'Glass set back from face', unit: 'm', section: 'shade', kind: 'number', initial: '0', paths: ['shading.revealDepth'] },
  { id: 'skylineAddress', label: 'Skyline elevations (optional range)', section: 'shade', kind: 'address', initial: '', paths: ['shading.skyline', 'skyline'], hint: 'angles 0–90° for equal sectors clockwise from north, e.g. Site!B2:B13' },

  { id: 'groundAlbedo', label: 'Ground reflectance', section: 'sky', kind: 'number', initial: '0.2', paths: ['groundAlbedo'] },
  {
    id: 'skyModel',
    label: 'Sky diffuse model',
    section: 'sky',
    kind: 'select',
    initial: 'perez1990',
    paths: ['skyModel'],
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
  { id: 'linkeTurbidity', label: 'Linke turbidity (1 or 12 monthly values)', section: 'sky', kind: 'list', initial: '3', paths: ['weather.linkeTurbidity'], visible: weatherIs('ineichenClearSky') },
  { id: 'tauB', label: 'Beam optical depth τb (1 or 12 values)', section: 'sky', kind: 'list', initial: '0.4', paths: ['weather.tauB'], visible: weatherIs('ashraeClearSky') },
  { id: 'tauD', label: 'Diffuse optical depth τd (1 or 12 values)', section: 'sky', kind: 'list', initial: '2.2', paths: ['weather.tauD'], visible: weatherIs('ashraeClearSky') },
  { id: 'dniAddress', label: 'Direct normal column', section: 'sky', kind: 'address', initial: '', paths: ['weather.dni'], visible: weatherIs('measured'), hint: 'one cell per hour of the year, hour-ending' },
  { id: 'dhiAddress', label: 'Diffuse horizontal column', section: 'sky', kind: 'address', initial: '', paths: ['weather.dhi'], visible: weatherIs('measured') },
  { id: 'ghiAddress', label: 'Global horizontal column', section: 'sky', kind: 'address', initial: '', paths: ['weather.ghi'], visible: weatherIs('globalHorizontal'), hint: 'split into beam and diffuse by Erbs et al. (1982)' },
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

  { id: 'year', label: 'Year', section: 'run', kind: 'number', initial: String(new Date().getFullYear()), paths: ['year'] },
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
