/**
 * The window schedule — one row per window — described once for every reader: the task pane reads
 * it from an Excel table, `sunpane schedule` from a CSV file or the first sheet of a workbook.
 *
 * Each column has one header users see (our own words, the unit in brackets: `Overhang depth [m]`)
 * and may be written in either of the two older styles, kept as aliases so that existing tables
 * keep working: the pane's words without units (`Overhang depth`) and the window file's field
 * names (`overhangProjection`). Headers are matched by {@link headerKey}: case, spaces,
 * punctuation and a unit in brackets do not matter.
 *
 * What a row must give:
 * - everywhere: `Window` (the label); in the pane also `Faces`, `Width` and `Height` — every
 *   other blank cell takes the value in the pane's form;
 * - in the command line, blanks take the window file's defaults (see src/cli/windowJson.ts), so
 *   a row also needs `Year`, `Faces`, `Width`, `Height`, `SHGC`, a place (`Site`, or `Latitude`,
 *   `Longitude` and `UTC offset`) and a sky (`Linke turbidity`, or the two optical depths, or an
 *   example site, or hourly weather given with `--weather`).
 *
 * Columns that set both sides (`Overhang reach`, `Fin depth`, `Fin gap`, `Fin rise above head`,
 * `Fin drop below sill`) are applied before the one-side columns, so `Left fin depth` beside
 * `Fin depth` wins for the left fin. The fin gap and extensions apply to each fin that has a depth.
 *
 * Pure data and matching: imports nothing outside src/core (lint enforces it), so that both
 * adapters can share it without importing each other.
 */

/** How a cell is read: free text, one number, or one or more numbers (space, comma or semicolon separated). */
export type ScheduleColumnKind = 'text' | 'number' | 'list';

/** The reader a requirement applies to. */
export type ScheduleReader = 'pane' | 'cli';

/** One schedule column. */
export interface ScheduleColumn {
  /** Stable key for code (camelCase; never shown). */
  key: string;
  /** The header users see: our own words, with the unit in brackets. */
  header: string;
  /** Other headers accepted for the same column (the pane's former words, the window file's names). */
  aliases: readonly string[];
  /**
   * WindowSpec / window-file paths the cell fills (two for a column that sets both sides);
   * `site` takes an example site id.
   */
  paths: readonly string[];
  kind: ScheduleColumnKind;
  /** Unit of the value, when it has one. */
  unit?: string;
  /** One help line: what the value is, its range, and what a blank means. */
  help: string;
  /** Readers for which every row must fill this cell (others fill blanks from the form or defaults). */
  requiredBy: readonly ScheduleReader[];
}

/** Example-site id column key: it fills the place (and its invented clear sky) rather than one path. */
export const SITE_KEY = 'site';
/** Skyline column key: a list of angles rather than one number. */
export const SKYLINE_KEY = 'skyline';

const m = 'm';
const deg = '°';

/** The schedule's columns, in the order help texts list them (both-sides columns before one-side ones). */
export const SCHEDULE_COLUMNS: readonly ScheduleColumn[] = Object.freeze([
  { key: 'name', header: 'Window', aliases: ['name'], paths: ['name'], kind: 'text', help: 'label of the window', requiredBy: ['pane', 'cli'] },
  { key: SITE_KEY, header: 'Site', aliases: ['site'], paths: ['site'], kind: 'text', help: 'example site id, instead of the three above', requiredBy: [] },
  { key: 'latitude', header: 'Latitude [°]', aliases: ['latitude'], paths: ['site.latitude'], kind: 'number', unit: deg, help: 'north positive', requiredBy: [] },
  { key: 'longitude', header: 'Longitude [°]', aliases: ['longitude'], paths: ['site.longitude'], kind: 'number', unit: deg, help: 'east positive', requiredBy: [] },
  { key: 'utcOffset', header: 'UTC offset [h]', aliases: ['utcOffset'], paths: ['site.utcOffset'], kind: 'number', unit: 'h', help: 'standard time, east positive', requiredBy: [] },
  { key: 'elevation', header: 'Elevation [m]', aliases: ['elevation'], paths: ['site.elevation'], kind: 'number', unit: m, help: 'above sea level (0)', requiredBy: [] },
  { key: 'year', header: 'Year', aliases: ['year'], paths: ['year'], kind: 'number', help: 'calendar year of the hours', requiredBy: ['cli'] },
  { key: 'surfaceAzimuth', header: 'Faces [°]', aliases: ['surfaceAzimuth'], paths: ['surfaceAzimuth'], kind: 'number', unit: deg, help: 'bearing, clockwise from north', requiredBy: ['pane', 'cli'] },
  { key: 'surfaceTilt', header: 'Tilt [°]', aliases: ['surfaceTilt'], paths: ['surfaceTilt'], kind: 'number', unit: deg, help: 'from horizontal, 90 = upright (90)', requiredBy: [] },
  { key: 'width', header: 'Width [m]', aliases: ['width'], paths: ['width'], kind: 'number', unit: m, help: 'rough opening', requiredBy: ['pane', 'cli'] },
  { key: 'height', header: 'Height [m]', aliases: ['height'], paths: ['height'], kind: 'number', unit: m, help: 'rough opening', requiredBy: ['pane', 'cli'] },
  { key: 'frameFraction', header: 'Frame share', aliases: ['frameFraction'], paths: ['frameFraction'], kind: 'number', help: 'of the opening, 0 to below 1 (0)', requiredBy: [] },
  { key: 'shgc', header: 'SHGC', aliases: ['shgc'], paths: ['glazing.shgc'], kind: 'number', help: 'at normal incidence, 0…1', requiredBy: ['cli'] },
  { key: 'panes', header: 'Panes', aliases: ['panes'], paths: ['glazing.panes'], kind: 'number', help: '1…4, for the angle model (2)', requiredBy: [] },
  { key: 'interiorAttenuation', header: 'Blind factor', aliases: ['interiorAttenuation'], paths: ['glazing.interiorAttenuation'], kind: 'number', help: 'inside blind, 0…1, 1 = none (1)', requiredBy: [] },
  { key: 'overhangDepth', header: 'Overhang depth [m]', aliases: ['overhangProjection'], paths: ['shading.overhang.projection'], kind: 'number', unit: m, help: 'out from the wall (none)', requiredBy: [] },
  { key: 'overhangGap', header: 'Overhang gap [m]', aliases: ['overhangGap'], paths: ['shading.overhang.gap'], kind: 'number', unit: m, help: 'underside above the head (0)', requiredBy: [] },
  { key: 'overhangReach', header: 'Overhang reach [m]', aliases: [], paths: ['shading.overhang.extensionLeft', 'shading.overhang.extensionRight'], kind: 'number', unit: m, help: 'past each jamb, both sides (0)', requiredBy: [] },
  { key: 'overhangPastLeft', header: 'Overhang past left [m]', aliases: ['overhangExtensionLeft'], paths: ['shading.overhang.extensionLeft'], kind: 'number', unit: m, help: 'left as seen from outside (0)', requiredBy: [] },
  { key: 'overhangPastRight', header: 'Overhang past right [m]', aliases: ['overhangExtensionRight'], paths: ['shading.overhang.extensionRight'], kind: 'number', unit: m, help: 'right as seen from outside (0)', requiredBy: [] },
  { key: 'finDepth', header: 'Fin depth [m]', aliases: ['finProjection'], paths: ['shading.leftFin.projection', 'shading.rightFin.projection'], kind: 'number', unit: m, help: 'a fin at each jamb (none)', requiredBy: [] },
  { key: 'leftFinDepth', header: 'Left fin depth [m]', aliases: [], paths: ['shading.leftFin.projection'], kind: 'number', unit: m, help: 'left as seen from outside (none)', requiredBy: [] },
  { key: 'rightFinDepth', header: 'Right fin depth [m]', aliases: [], paths: ['shading.rightFin.projection'], kind: 'number', unit: m, help: 'right as seen from outside (none)', requiredBy: [] },
  { key: 'finGap', header: 'Fin gap [m]', aliases: ['finGap'], paths: ['shading.leftFin.gap', 'shading.rightFin.gap'], kind: 'number', unit: m, help: 'jamb to each fin (0)', requiredBy: [] },
  { key: 'finRise', header: 'Fin rise above head [m]', aliases: ['finExtensionAbove'], paths: ['shading.leftFin.extensionAbove', 'shading.rightFin.extensionAbove'], kind: 'number', unit: m, help: 'fins above the head (0)', requiredBy: [] },
  { key: 'finDrop', header: 'Fin drop below sill [m]', aliases: ['finExtensionBelow'], paths: ['shading.leftFin.extensionBelow', 'shading.rightFin.extensionBelow'], kind: 'number', unit: m, help: 'fins below the sill (0)', requiredBy: [] },
  { key: 'setBack', header: 'Set-back [m]', aliases: ['revealDepth'], paths: ['shading.revealDepth'], kind: 'number', unit: m, help: 'glass behind the wall face (0)', requiredBy: [] },
  { key: SKYLINE_KEY, header: 'Skyline [°]', aliases: ['skyline'], paths: ['shading.skyline'], kind: 'list', unit: deg, help: 'obstruction angles, equal sectors from north', requiredBy: [] },
  { key: 'groundAlbedo', header: 'Ground reflectance', aliases: ['groundAlbedo'], paths: ['groundAlbedo'], kind: 'number', help: '0…1 (0.2)', requiredBy: [] },
  { key: 'skyModel', header: 'Sky model', aliases: ['skyModel'], paths: ['skyModel'], kind: 'text', help: 'isotropic | hayDavies | perez1990 (perez1990)', requiredBy: [] },
  { key: 'linkeTurbidity', header: 'Linke turbidity', aliases: ['linkeTurbidity'], paths: ['weather.linkeTurbidity'], kind: 'list', help: 'clear sky: 1 or 12 monthly values', requiredBy: [] },
  { key: 'tauB', header: 'Beam optical depth', aliases: ['tauB'], paths: ['weather.tauB'], kind: 'list', help: 'clear sky: 1 or 12 values, with the diffuse', requiredBy: [] },
  { key: 'tauD', header: 'Diffuse optical depth', aliases: ['tauD'], paths: ['weather.tauD'], kind: 'list', help: 'clear sky: 1 or 12 values, with the beam', requiredBy: [] },
] satisfies ScheduleColumn[]);

/**
 * A header reduced for matching: lower case, a unit in brackets or parentheses dropped, letters
 * and digits only (`Overhang depth (m)` → `overhangdepth`, `surfaceAzimuth` → `surfaceazimuth`).
 * @param text - the header as written; anything, read as text
 * @returns the key; '' for a blank header
 */
export function headerKey(text: unknown): string {
  return String(text ?? '')
    .replace(/[([][^)\]]*[)\]]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]/g, '');
}

/** Every accepted header key → its column (the header and each alias). */
export const COLUMN_BY_HEADER_KEY: ReadonlyMap<string, ScheduleColumn> = (() => {
  const map = new Map<string, ScheduleColumn>();
  for (const c of SCHEDULE_COLUMNS) {
    for (const h of [c.header, ...c.aliases]) {
      const k = headerKey(h);
      const taken = map.get(k);
      if (taken && taken !== c) throw new Error(`schedule header "${h}" is used by both ${taken.key} and ${c.key}`);
      map.set(k, c);
    }
  }
  return map;
})();

/** The column a header names, if any. */
export function columnForHeader(text: unknown): ScheduleColumn | undefined {
  return COLUMN_BY_HEADER_KEY.get(headerKey(text));
}

/** A header cell that names no column, or names one already named to its left. */
export interface HeaderProblem {
  /** 0-based position in the header row. */
  index: number;
  /** The header as written (trimmed). */
  header: string;
}

/** A header row matched to columns. */
export interface MatchedHeaders {
  /** Per position: the column, or undefined for a blank, unknown or repeated header. */
  columns: (ScheduleColumn | undefined)[];
  /** The header text as written, by column key (for messages in the user's own words). */
  written: ReadonlyMap<string, string>;
  /** Non-blank headers that name no column. */
  unknown: HeaderProblem[];
  /** Headers naming a column already named to their left (e.g. `Set-back` and `revealDepth`). */
  repeated: HeaderProblem[];
}

/**
 * Matches a header row to the schedule's columns.
 * @param headers - the header cells, left to right (blanks allowed)
 * @returns the column at each position, and the unknown and repeated headers by name
 */
export function matchHeaders(headers: readonly unknown[]): MatchedHeaders {
  const columns: (ScheduleColumn | undefined)[] = [];
  const written = new Map<string, string>();
  const unknown: HeaderProblem[] = [];
  const repeated: HeaderProblem[] = [];
  headers.forEach((h, index) => {
    const header = String(h ?? '').trim();
    const column = header === '' ? undefined : columnForHeader(header);
    if (header !== '' && !column) unknown.push({ index, header });
    if (column && written.has(column.key)) {
      repeated.push({ index, header });
      columns.push(undefined);
      return;
    }
    if (column) written.set(column.key, header);
    columns.push(column);
  });
  return { columns, written, unknown, repeated };
}

/** The columns every row must fill for a reader. */
export function requiredColumns(reader: ScheduleReader): ScheduleColumn[] {
  return SCHEDULE_COLUMNS.filter((c) => c.requiredBy.includes(reader));
}

/** The columns that fill a WindowSpec path (both-sides columns first, as listed). */
export function columnsForPath(path: string): ScheduleColumn[] {
  return SCHEDULE_COLUMNS.filter((c) => c.paths.includes(path));
}

/**
 * A list cell split into its entries (space, comma or semicolon separated), each trimmed; a number
 * cell is one entry. Entries are left as text so that each reader reports a bad one in its own way.
 */
export function splitListCell(value: string | number): string[] {
  if (typeof value === 'number') return [String(value)];
  return value.split(/[\s;,]+/).filter((t) => t !== '');
}
