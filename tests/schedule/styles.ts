/**
 * One small schedule written in three header styles — the shared headers (with units), the pane's
 * former words and the window file's names — for the tests that hold both readers to one format.
 * Window values are invented test data. Every cell a reader could fill from its own defaults is
 * given, so that the pane (form) and the command line (window-file defaults) must agree.
 */
import { SCHEDULE_COLUMNS } from '../../src/schedule/columns';

/** Header style → header by column key (falls back to the shared header where a style has no word). */
const PANE_WORDS: Record<string, string> = {
  name: 'Window',
  latitude: 'Latitude',
  longitude: 'Longitude',
  utcOffset: 'UTC offset',
  elevation: 'Elevation',
  surfaceAzimuth: 'Faces',
  surfaceTilt: 'Tilt',
  width: 'Width',
  height: 'Height',
  frameFraction: 'Frame share',
  shgc: 'SHGC',
  panes: 'Panes',
  interiorAttenuation: 'Blind factor',
  overhangProjection: 'Overhang depth',
  overhangGap: 'Overhang gap',
  overhangExtension: 'Overhang reach',
  leftFinProjection: 'Left fin depth',
  rightFinProjection: 'Right fin depth',
  finGap: 'Fin gap',
  revealDepth: 'Set-back',
  groundAlbedo: 'Ground reflectance',
};

export type HeaderStyle = 'shared' | 'paneWords' | 'fileNames';

export function headerIn(style: HeaderStyle, key: string): string {
  const column = SCHEDULE_COLUMNS.find((c) => c.key === key);
  if (!column) throw new Error(`no column ${key}`);
  if (style === 'paneWords') return PANE_WORDS[key] ?? column.header;
  if (style === 'fileNames') return column.aliases.find((a) => /^[a-z][A-Za-z]*$/.test(a)) ?? column.header;
  return column.header;
}

/** Two windows: own coordinates with a Linke-turbidity sky; an example site with optical depths. */
const ROWS: Record<string, string | number>[] = [
  {
    name: 'Lab south-east',
    latitude: 40,
    longitude: -105,
    utcOffset: -7,
    elevation: 1600,
    year: 2026,
    surfaceAzimuth: 135,
    surfaceTilt: 90,
    width: 1.5,
    height: 1.2,
    frameFraction: 0.1,
    shgc: 0.4,
    panes: 3,
    interiorAttenuation: 0.8,
    overhangProjection: 0.6,
    overhangGap: 0.2,
    overhangExtension: 0.3,
    overhangExtensionRight: 0.5,
    finProjection: 0.4,
    rightFinProjection: 0.25,
    finGap: 0.1,
    finExtensionAbove: 0.2,
    finExtensionBelow: 0.05,
    revealDepth: 0.15,
    skyline: '0 5 10 5',
    groundAlbedo: 0.3,
    skyModel: 'hayDavies',
    linkeTurbidity: 3.1,
  },
  {
    name: 'Office west',
    site: 'brackwater',
    year: 2026,
    surfaceAzimuth: 270,
    surfaceTilt: 90,
    width: 2,
    height: 1.5,
    frameFraction: 0.12,
    shgc: 0.35,
    panes: 2,
    interiorAttenuation: 1,
    leftFinProjection: 0.3,
    finGap: 0,
    finExtensionAbove: 0,
    finExtensionBelow: 0,
    groundAlbedo: 0.25,
    skyModel: 'isotropic',
    tauB: 0.35,
    tauD: 2.3,
  },
];

/** The keys the table uses (every column). */
const KEYS = SCHEDULE_COLUMNS.map((c) => c.key);

/** The schedule as a table of cells, header row first, in a header style. */
export function scheduleTable(style: HeaderStyle): (string | number)[][] {
  return [KEYS.map((k) => headerIn(style, k)), ...ROWS.map((r) => KEYS.map((k) => r[k] ?? ''))];
}

/** The schedule as CSV text (quoted where a cell holds a comma or quote). */
export function scheduleCsv(style: HeaderStyle): string {
  const cell = (v: string | number) => (/[",\n]/.test(String(v)) ? `"${String(v).replace(/"/g, '""')}"` : String(v));
  return `${scheduleTable(style).map((line) => line.map(cell).join(',')).join('\n')}\n`;
}
