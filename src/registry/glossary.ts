/**
 * The glossary: every shared name — worksheet-function parameters and the fields that describe a
 * window — defined once, with its meaning, unit, range, default, the words tables show, the older
 * or other spellings still accepted, and for a window field the part of the window it fills.
 *
 * One name means one thing everywhere: a function's parameter, a field of a window range on a
 * sheet, a key of the window JSON file, a column of the window schedule (CSV, workbook or the
 * pane's Excel table) and the pane's form all use these names. How names are matched and how a new
 * window field is added: docs/window-fields.md; the glossary of docs/functions.md is generated from
 * this list.
 *
 * Rules the tests hold (tests/registry/glossary.test.ts):
 * - a name is camelCase; its label reduces to the same key (case, spaces, punctuation and a
 *   bracketed unit or note ignored: `Overhang projection [m]` ≡ `overhangProjection`);
 * - no alias of one entry is the name, label or alias of another;
 * - trade words stay (projection, reveal, SHGC, albedo, Linke turbidity, τb); a word that is neither
 *   a trade term nor plain English gets a plain name and keeps the old word as an alias.
 */
import { DAILY_RANGE_MAX, DEFAULT_RADIANT_FRACTION, DRY_BULB_MAX, DRY_BULB_MIN, INDOOR_TEMPERATURE_MAX, INDOOR_TEMPERATURE_MIN, MAX_LENGTH, MIN_WINDOW_SIZE, U_VALUE_MAX } from '../core/gain';
import { KR_TYPE_PARAMETER_MAX, KR_TYPE_PARAMETER_MIN, PANES_MAX, PANES_MIN } from '../core/glazing';
import { IRRADIANCE_MAX, LINKE_MAX, LINKE_MIN, TAU_B_MAX, TAU_D_MAX } from '../core/sky';
import { DST_SHIFT_MAX, UTC_OFFSET_MAX, UTC_OFFSET_MIN } from '../core/time';
import type { ParamDescriptor } from './types';

/** How one cell of a window range is read. */
export type WindowCellKind = 'number' | 'text' | 'choice' | 'list' | 'monthly' | 'dateTime' | 'dateSystem';

/** One glossary entry: a parameter descriptor with the words and spellings tables use. */
export interface GlossaryEntry extends ParamDescriptor {
  /** The words tables and the pane show: the name's words, a unit in brackets where it has one. */
  label: string;
  /** Older or other names accepted for the same field or parameter (any case; spaces and punctuation ignored). */
  aliases?: readonly string[];
  /**
   * For a window field: the WindowSpec paths its value fills (two for a field that sets both sides,
   * e.g. `finProjection`), and how its cell is read. Absent for parameters that are not window fields.
   */
  window?: { paths: readonly string[]; cell: WindowCellKind; group: WindowFieldGroup; both?: boolean };
}

/** Groups of window fields, in the order help lists them. */
export type WindowFieldGroup = 'window' | 'place' | 'size' | 'glass' | 'room' | 'shading' | 'sky';

/** Longest window or shading dimension accepted [m] (the core's: one bound everywhere). */
export const LENGTH_MAX = MAX_LENGTH;
/** Smallest window width or height accepted [m] (the core's: 1 cm; smaller has no physical meaning). */
export const WINDOW_SIZE_MIN = MIN_WINDOW_SIZE;

function e(d: GlossaryEntry): GlossaryEntry {
  return Object.freeze(d);
}

function windowField(paths: string | readonly string[], cell: WindowCellKind, group: WindowFieldGroup): GlossaryEntry['window'] {
  const list = typeof paths === 'string' ? [paths] : paths;
  return { paths: list, cell, group, ...(list.length > 1 ? { both: true } : {}) };
}

/**
 * A device or setback length [m]: 0 (none) up to LENGTH_MAX. The description goes in `extra` (an
 * object literal), so that the add-in build drops it with the other documentation words.
 */
function length(name: string, label: string, paths: string | readonly string[], extra: Partial<GlossaryEntry> & { description: string }): GlossaryEntry {
  return e({ name, label, kind: 'number', unit: 'm', min: 0, max: LENGTH_MAX, default: 0, window: windowField(paths, 'number', 'shading'), ...extra });
}

const OVERHANG = 'shading.overhang';
const LEFT = 'shading.leftFin';
const RIGHT = 'shading.rightFin';

export const GLOSSARY = {
  // The window's label
  name: e({ name: 'name', label: 'Name', aliases: ['window', 'label', 'windowLabel'], kind: 'text', description: 'label of the window in tables and sheets', window: windowField('name', 'text', 'window') }),
  // When
  dateTime: e({ name: 'dateTime', label: 'Date-time', kind: 'dateTime', description: "local date-time: standard time, or clock time when the clock (or the window) gives a daylight-saving rule; a spreadsheet serial in the workbook's date system, or ISO 8601 text" }),
  date: e({ name: 'date', label: 'Date', kind: 'dateTime', description: "local date (any time of day on it; the local calendar day is used, on the clock when the clock gives a daylight-saving rule); a serial in the workbook's date system, or ISO 8601 text" }),
  timeConvention: e({
    name: 'timeConvention',
    label: 'Time convention',
    kind: 'choice',
    choices: ['hourEnding', 'instant'],
    choiceAliases: { midHour: 'hourEnding', hourEnd: 'hourEnding', instantaneous: 'instant' },
    default: 'hourEnding',
    description: 'how a date-time is read: "hourEnding" = the hour ending then, sun at mid-hour (hourly weather practice); "instant" = the sun at that instant',
    window: windowField('timeConvention', 'choice', 'window'),
  }),
  year: e({ name: 'year', label: 'Year', kind: 'number', integer: true, min: 1901, max: 9998, description: 'calendar year (8784 hours in a leap year, else 8760)', window: windowField('year', 'number', 'window') }),
  // The window's place
  site: e({ name: 'site', label: 'Site', aliases: ['exampleSite', 'examplePlace'], kind: 'text', description: 'an example site id, instead of latitude, longitude, UTC offset and elevation (its invented clear sky too)', window: windowField('site', 'text', 'place') }),
  latitude: e({ name: 'latitude', label: 'Latitude [°]', kind: 'number', unit: '°', min: -90, max: 90, description: 'site latitude, north positive', window: windowField('site.latitude', 'number', 'place') }),
  longitude: e({ name: 'longitude', label: 'Longitude [°]', kind: 'number', unit: '°', min: -180, max: 180, description: 'site longitude, east positive', window: windowField('site.longitude', 'number', 'place') }),
  utcOffset: e({ name: 'utcOffset', label: 'UTC offset [h]', aliases: ['offsetFromUtc'], kind: 'number', unit: 'h', min: UTC_OFFSET_MIN, max: UTC_OFFSET_MAX, description: "site's standard-time offset from UTC, east positive (e.g. -5, 9.5)", window: windowField('site.utcOffset', 'number', 'place') }),
  elevation: e({ name: 'elevation', label: 'Elevation [m]', kind: 'number', unit: 'm', min: -500, max: 9000, default: 0, description: 'site elevation above sea level', window: windowField('site.elevation', 'number', 'place') }),
  pressure: e({ name: 'pressure', label: 'Pressure [hPa]', kind: 'number', unit: 'hPa', min: 0, max: 1200, exclusiveMin: true, optional: true, description: 'mean air pressure for refraction; blank: standard atmosphere at the elevation', window: windowField('site.pressure', 'number', 'place') }),
  temperature: e({ name: 'temperature', label: 'Temperature [°C]', kind: 'number', unit: '°C', min: -90, max: 60, default: 12, description: 'mean air temperature for refraction', window: windowField('site.temperature', 'number', 'place') }),
  daylightSavingStart: e({
    name: 'daylightSavingStart',
    label: 'Daylight saving start',
    aliases: ['dstStart', 'summerTimeStart'],
    kind: 'dateTime',
    optional: true,
    description: 'the clock reading (standard time) when the clocks go forward, on any one year (the rule repeats on the same weekday of the month every year, e.g. the last Sunday of March at 02:00); with daylightSavingEnd; blank: standard time all year',
    window: windowField('site.daylightSaving.start', 'dateTime', 'place'),
  }),
  daylightSavingEnd: e({
    name: 'daylightSavingEnd',
    label: 'Daylight saving end',
    aliases: ['dstEnd', 'summerTimeEnd'],
    kind: 'dateTime',
    optional: true,
    description: 'the clock reading (daylight time) when the clocks go back, after the start (in the following year for a period over the new year); date-times are then read on the clock',
    window: windowField('site.daylightSaving.end', 'dateTime', 'place'),
  }),
  daylightSavingShift: e({
    name: 'daylightSavingShift',
    label: 'Daylight saving shift [h]',
    aliases: ['dstShift'],
    kind: 'number',
    unit: 'h',
    min: 0,
    max: DST_SHIFT_MAX,
    exclusiveMin: true,
    default: 1,
    description: 'how far the clocks go forward',
    window: windowField('site.daylightSaving.shift', 'number', 'place'),
  }),
  dateSystem: e({
    name: 'dateSystem',
    label: 'Date system',
    aliases: ['workbookDateSystem', 'date1904'],
    kind: 'choice',
    choices: ['1900', '1904'],
    default: '1900',
    description:
      "the workbook's date system, as Excel names it: 1900 (the default) or 1904 (Excel's \"Use 1904 date system\" option: serial 0 is 1 January 1904, 1462 days after the 1900 system's count); serial date-times given are read in it and date-times returned are given in it (ISO 8601 text reads the same in both)",
    window: windowField([], 'dateSystem', 'place'),
  }),
  deltaT: e({ name: 'deltaT', label: 'Delta T [s]', kind: 'number', unit: 's', min: -100, max: 10000, optional: true, description: 'TT − UT; blank: Espenak & Meeus (2006) polynomial' }),
  // Which way, how big
  surfaceAzimuth: e({
    name: 'surfaceAzimuth',
    label: 'Surface azimuth [°]',
    aliases: ['faces', 'glassFaces', 'facing'],
    kind: 'number',
    unit: '°',
    min: 0,
    max: 360,
    description: 'direction the surface faces, clockwise from true north (N 0, E 90, S 180, W 270)',
    window: windowField('surfaceAzimuth', 'number', 'size'),
  }),
  surfaceTilt: e({
    name: 'surfaceTilt',
    label: 'Surface tilt [°]',
    aliases: ['tilt', 'tiltFromHorizontal'],
    kind: 'number',
    unit: '°',
    min: 0,
    max: 180,
    default: 90,
    description: 'surface tilt from horizontal: 0 faces the sky, 90 is a vertical wall (shading devices need 90)',
    window: windowField('surfaceTilt', 'number', 'size'),
  }),
  width: e({ name: 'width', label: 'Width [m]', kind: 'number', unit: 'm', min: WINDOW_SIZE_MIN, max: LENGTH_MAX, description: 'window width (rough opening, frame included)', window: windowField('width', 'number', 'size') }),
  height: e({ name: 'height', label: 'Height [m]', kind: 'number', unit: 'm', min: WINDOW_SIZE_MIN, max: LENGTH_MAX, description: 'window height (rough opening, frame included)', window: windowField('height', 'number', 'size') }),
  frameFraction: e({
    name: 'frameFraction',
    label: 'Frame fraction',
    aliases: ['frameShare', 'frameShareOfTheOpening'],
    kind: 'number',
    min: 0,
    max: 1,
    exclusiveMax: true,
    default: 0,
    description: 'share of the rough opening taken by the frame',
    window: windowField('frameFraction', 'number', 'size'),
  }),
  // Glass
  shgc: e({ name: 'shgc', label: 'SHGC', aliases: ['shgcNormal', 'shgcAtNormalIncidence'], kind: 'number', min: 0, max: 1, description: 'solar heat gain coefficient of the glazing at normal incidence (from the product rating)', window: windowField('glazing.shgc', 'number', 'glass') }),
  panes: e({ name: 'panes', label: 'Panes', kind: 'number', integer: true, min: PANES_MIN, max: PANES_MAX, default: 2, description: 'number of glass panes, for the fall of SHGC with incidence angle', window: windowField('glazing.panes', 'number', 'glass') }),
  shgcAngles: e({
    name: 'shgcAngles',
    label: 'SHGC angles [°]',
    aliases: ['angles', 'angleTableAngles'],
    kind: 'numberList',
    unit: '°',
    min: 0,
    max: 90,
    ascending: true,
    length: { min: 1, max: 91 },
    optional: true,
    description: 'incidence angles of your SHGC table, strictly ascending, at least 0.01° apart (with shgcValues; instead of the pane model)',
    window: windowField('glazing.angleTable.angles', 'list', 'glass'),
  }),
  shgcValues: e({
    name: 'shgcValues',
    label: 'SHGC values',
    aliases: ['angleTableValues'],
    kind: 'numberList',
    min: 0,
    max: 1,
    length: { min: 1, max: 91 },
    optional: true,
    description: 'SHGC at each of the shgcAngles, same count',
    window: windowField('glazing.angleTable.values', 'list', 'glass'),
  }),
  interiorAttenuation: e({
    name: 'interiorAttenuation',
    label: 'Interior attenuation',
    aliases: ['blindFactor', 'insideBlindOrCurtainFactor', 'iac'],
    kind: 'number',
    min: 0,
    max: 1,
    default: 1,
    description: 'interior attenuation coefficient of a blind or curtain; 1 = none',
    window: windowField('glazing.interiorAttenuation', 'number', 'glass'),
  }),
  radiantFraction: e({ name: 'radiantFraction', label: 'Radiant fraction', kind: 'number', min: 0, max: 1, default: DEFAULT_RADIANT_FRACTION, description: 'share of the gain that is radiant (reaches the air only through the room surfaces)', window: windowField('glazing.radiantFraction', 'number', 'glass') }),
  glazingType: e({
    name: 'glazingType',
    label: 'Glazing type',
    kind: 'choice',
    choices: ['clear', 'tinted', 'coated', 'table'],
    optional: true,
    description: 'how the SHGC falls with the angle of incidence: "clear" or "tinted" (uncoated panes, Fresnel reflection and absorption), "coated" (low-e or selective units, Karlsson & Roos 2000, with glazingTypeParameter), "table" (shgcAngles and shgcValues); blank: table when an angle table is given, else clear',
    window: windowField('glazing.type', 'choice', 'glass'),
  }),
  glazingTypeParameter: e({
    name: 'glazingTypeParameter',
    label: 'Glazing type parameter',
    aliases: ['typeParameter', 'karlssonRoosQ'],
    kind: 'number',
    min: KR_TYPE_PARAMETER_MIN,
    max: KR_TYPE_PARAMETER_MAX,
    optional: true,
    description: 'the glazing-type parameter q of Karlsson & Roos (2000) for a coated unit (needed with glazingType "coated")',
    window: windowField('glazing.typeParameter', 'number', 'glass'),
  }),
  shgcBasis: e({
    name: 'shgcBasis',
    label: 'SHGC basis',
    kind: 'choice',
    choices: ['centreOfGlass', 'wholeWindow'],
    choiceAliases: { centerOfGlass: 'centreOfGlass' },
    default: 'centreOfGlass',
    description: 'what the SHGC was rated on: "centreOfGlass" (the glass alone; the gain uses the glass area) or "wholeWindow" (a rating with the frame; the gain uses the whole rough opening)',
    window: windowField('glazing.shgcBasis', 'choice', 'glass'),
  }),
  interiorAttenuationBeam: e({
    name: 'interiorAttenuationBeam',
    label: 'Interior attenuation, beam',
    kind: 'number',
    min: 0,
    max: 1,
    optional: true,
    description: 'interior attenuation coefficient of the beam alone; blank: interiorAttenuation',
    window: windowField('glazing.interiorAttenuationBeam', 'number', 'glass'),
  }),
  interiorAttenuationDiffuse: e({
    name: 'interiorAttenuationDiffuse',
    label: 'Interior attenuation, diffuse',
    kind: 'number',
    min: 0,
    max: 1,
    optional: true,
    description: 'interior attenuation coefficient of diffuse light; blank: interiorAttenuation',
    window: windowField('glazing.interiorAttenuationDiffuse', 'number', 'glass'),
  }),
  radiantFractionBeam: e({
    name: 'radiantFractionBeam',
    label: 'Radiant fraction, beam',
    kind: 'number',
    min: 0,
    max: 1,
    optional: true,
    description: 'radiant share of the beam gain; blank: radiantFraction',
    window: windowField('glazing.radiantFractionBeam', 'number', 'glass'),
  }),
  radiantFractionDiffuse: e({
    name: 'radiantFractionDiffuse',
    label: 'Radiant fraction, diffuse',
    kind: 'number',
    min: 0,
    max: 1,
    optional: true,
    description: 'radiant share of the diffuse gain; blank: radiantFraction',
    window: windowField('glazing.radiantFractionDiffuse', 'number', 'glass'),
  }),
  radiantFractionConduction: e({
    name: 'radiantFractionConduction',
    label: 'Radiant fraction, conduction',
    kind: 'number',
    min: 0,
    max: 1,
    optional: true,
    description: 'radiant share of the conduction gain; blank: the core default',
    window: windowField('glazing.radiantFractionConduction', 'number', 'glass'),
  }),
  uValue: e({
    name: 'uValue',
    label: 'U-value [W/(m²·K)]',
    kind: 'number',
    unit: 'W/(m²·K)',
    min: 0,
    max: U_VALUE_MAX,
    optional: true,
    description: 'whole-window thermal transmittance, applied to the rough opening for the conduction gain (needs indoorTemperature and an outdoor dry-bulb: dryBulbMax with dailyRange, or a weather file with dry-bulb); blank: no conduction',
    window: windowField('glazing.uValue', 'number', 'glass'),
  }),
  indoorTemperature: e({
    name: 'indoorTemperature',
    label: 'Indoor temperature [°C]',
    kind: 'number',
    unit: '°C',
    min: INDOOR_TEMPERATURE_MIN,
    max: INDOOR_TEMPERATURE_MAX,
    optional: true,
    description: 'indoor air temperature for the conduction gain (with uValue)',
    window: windowField('indoorTemperature', 'number', 'glass'),
  }),
  // The room behind the window (cooling load by the radiant time series)
  roomConstruction: e({
    name: 'roomConstruction',
    label: 'Room construction',
    aliases: ['construction'],
    kind: 'choice',
    choices: ['light', 'medium', 'heavy'],
    optional: true,
    description:
      'the room\'s construction, for the cooling load with the illustrative radiant time series Sunpane computes from a stated room model (not a published table): "light", "medium" or "heavy"; or give solarRadiantTimeSeries and nonSolarRadiantTimeSeries instead; blank: gains only',
    window: windowField('room.construction', 'choice', 'room'),
  }),
  solarRadiantTimeSeries: e({
    name: 'solarRadiantTimeSeries',
    label: 'Solar radiant time series',
    aliases: ['solarRts', 'solarSeries'],
    kind: 'numberList',
    min: 0,
    max: 1,
    length: { exact: 24 },
    optional: true,
    description: "the room's solar radiant time series r0…r23 (24 factors summing to 1, for the transmitted beam), from your handbook or room model; with nonSolarRadiantTimeSeries",
    window: windowField('room.solar', 'list', 'room'),
  }),
  nonSolarRadiantTimeSeries: e({
    name: 'nonSolarRadiantTimeSeries',
    label: 'Non-solar radiant time series',
    aliases: ['nonSolarRts', 'nonSolarSeries'],
    kind: 'numberList',
    min: 0,
    max: 1,
    length: { exact: 24 },
    optional: true,
    description: "the room's non-solar radiant time series r0…r23 (24 factors summing to 1, for diffuse and conduction gains, and the beam behind an interior shade); with solarRadiantTimeSeries",
    window: windowField('room.nonSolar', 'list', 'room'),
  }),
  // Outside shading: the overhang
  overhangProjection: length('overhangProjection', 'Overhang projection [m]', `${OVERHANG}.projection`, { description: 'depth of an overhang out from the wall; 0 = no overhang', aliases: ['overhangDepth'] }),
  overhangGap: length('overhangGap', 'Overhang gap [m]', `${OVERHANG}.gap`, { description: "height of the overhang's underside above the window head", aliases: ['overhangGapAboveHead'] }),
  overhangExtension: length('overhangExtension', 'Overhang extension [m]', [`${OVERHANG}.extensionLeft`, `${OVERHANG}.extensionRight`], { description: 'overhang extension beyond each jamb, both sides (a one-side field beside it wins for its side)', min: -LENGTH_MAX,
    aliases: ['overhangReach'], }),
  overhangExtensionLeft: length('overhangExtensionLeft', 'Overhang extension left [m]', `${OVERHANG}.extensionLeft`, { description: 'overhang extension beyond the left jamb, seen from outside (negative stops short)', min: -LENGTH_MAX,
    aliases: ['overhangPastLeft', 'overhangPastLeftJamb'], }),
  overhangExtensionRight: length('overhangExtensionRight', 'Overhang extension right [m]', `${OVERHANG}.extensionRight`, { description: 'overhang extension beyond the right jamb, seen from outside (negative stops short)', min: -LENGTH_MAX,
    aliases: ['overhangPastRight', 'overhangPastRightJamb'], }),
  // Fins: both sides at once, or each side (a one-side field wins for its side)
  finProjection: length('finProjection', 'Fin projection [m]', [`${LEFT}.projection`, `${RIGHT}.projection`], { description: 'depth of a fin at each jamb out from the wall; 0 = no fins', aliases: ['finDepth'] }),
  finGap: length('finGap', 'Fin gap [m]', [`${LEFT}.gap`, `${RIGHT}.gap`], { description: 'distance from each jamb to its fin' }),
  finExtensionAbove: length('finExtensionAbove', 'Fin extension above [m]', [`${LEFT}.extensionAbove`, `${RIGHT}.extensionAbove`], { description: 'extension of the fins above the window head (negative stops below it)', min: -LENGTH_MAX,
    aliases: ['finRise', 'finRiseAboveHead'], }),
  finExtensionBelow: length('finExtensionBelow', 'Fin extension below [m]', [`${LEFT}.extensionBelow`, `${RIGHT}.extensionBelow`], { description: 'extension of the fins below the sill (negative stops above it)', min: -LENGTH_MAX,
    aliases: ['finDrop', 'finDropBelowSill'], }),
  leftFinProjection: length('leftFinProjection', 'Left fin projection [m]', `${LEFT}.projection`, { description: 'depth of the fin at the left jamb (seen from outside); 0 = no left fin', aliases: ['leftFinDepth'] }),
  leftFinGap: length('leftFinGap', 'Left fin gap [m]', `${LEFT}.gap`, { description: 'distance from the left jamb to the left fin', aliases: ['leftFinGapFromJamb'] }),
  leftFinExtensionAbove: length('leftFinExtensionAbove', 'Left fin extension above [m]', `${LEFT}.extensionAbove`, { description: 'extension of the left fin above the head (negative stops below it)', min: -LENGTH_MAX,
    aliases: ['leftFinAbove', 'leftFinRiseAboveHead'], }),
  leftFinExtensionBelow: length('leftFinExtensionBelow', 'Left fin extension below [m]', `${LEFT}.extensionBelow`, { description: 'extension of the left fin below the sill (negative stops above it)', min: -LENGTH_MAX,
    aliases: ['leftFinBelow', 'leftFinDropBelowSill'], }),
  rightFinProjection: length('rightFinProjection', 'Right fin projection [m]', `${RIGHT}.projection`, { description: 'depth of the fin at the right jamb (seen from outside); 0 = no right fin', aliases: ['rightFinDepth'] }),
  rightFinGap: length('rightFinGap', 'Right fin gap [m]', `${RIGHT}.gap`, { description: 'distance from the right jamb to the right fin', aliases: ['rightFinGapFromJamb'] }),
  rightFinExtensionAbove: length('rightFinExtensionAbove', 'Right fin extension above [m]', `${RIGHT}.extensionAbove`, { description: 'extension of the right fin above the head (negative stops below it)', min: -LENGTH_MAX,
    aliases: ['rightFinAbove', 'rightFinRiseAboveHead'], }),
  rightFinExtensionBelow: length('rightFinExtensionBelow', 'Right fin extension below [m]', `${RIGHT}.extensionBelow`, { description: 'extension of the right fin below the sill (negative stops above it)', min: -LENGTH_MAX,
    aliases: ['rightFinBelow', 'rightFinDropBelowSill'], }),
  revealDepth: length('revealDepth', 'Reveal depth [m]', 'shading.revealDepth', { description: 'depth of the glass behind the wall face; 0 = flush', aliases: ['setBack', 'glassSetBackFromFace'] }),
  skyline: e({
    name: 'skyline',
    label: 'Skyline [°]',
    kind: 'numberList',
    unit: '°',
    min: 0,
    max: 90,
    optional: true,
    length: { min: 1, max: 360 },
    description: 'elevation angles of surrounding buildings and terrain for equal azimuth sectors clockwise from north; blank: open horizon',
    window: windowField('shading.skyline', 'list', 'shading'),
  }),
  // Sky
  groundAlbedo: e({
    name: 'groundAlbedo',
    label: 'Ground albedo',
    aliases: ['groundReflectance'],
    kind: 'number',
    min: 0,
    max: 1,
    default: 0.2,
    description: 'ground reflectance (0.2 for grass and soil is common practice, no source; fresh snow up to 0.8)',
    window: windowField('groundAlbedo', 'number', 'sky'),
  }),
  skyModel: e({
    name: 'skyModel',
    label: 'Sky model',
    aliases: ['skyDiffuseModel'],
    kind: 'choice',
    choices: ['perez1990', 'hayDavies', 'isotropic', 'ashraeClearDay'],
    choiceAliases: { perez: 'perez1990' },
    default: 'perez1990',
    description: 'sky-diffuse model: "perez1990" (Perez et al. 1990), "hayDavies" (Hay–Davies), "isotropic" or "ashraeClearDay" (the handbook\'s clear-day procedure, for τb/τd clear skies)',
    window: windowField('skyModel', 'choice', 'sky'),
  }),
  diffuseShading: e({
    name: 'diffuseShading',
    label: 'Diffuse shading',
    kind: 'choice',
    choices: ['viewFactors', 'beamOnly'],
    default: 'viewFactors',
    description:
      'how the devices act on diffuse light: "viewFactors" (default) — overhang, fins, reveal and skyline cut the sky and ground light by the window\'s view factors; "beamOnly" — the earlier treatment, kept for comparison: devices cut only the beam',
    window: windowField('diffuseShading', 'choice', 'sky'),
  }),
  linkeTurbidity: e({
    name: 'linkeTurbidity',
    label: 'Linke turbidity',
    kind: 'number',
    min: LINKE_MIN,
    max: LINKE_MAX,
    description: 'Linke turbidity factor (about 2 very clear, 3–4 typical, 6+ hazy); in a window: one value or 12 by month, for a clear sky by Ineichen & Perez (2002)',
    window: windowField('weather.linkeTurbidity', 'monthly', 'sky'),
  }),
  dryBulbMax: e({
    name: 'dryBulbMax',
    label: 'Dry-bulb max [°C]',
    aliases: ['designDryBulb'],
    kind: 'number',
    unit: '°C',
    min: DRY_BULB_MIN,
    max: DRY_BULB_MAX,
    optional: true,
    description: "the clear design day's highest outdoor dry-bulb, one value or 12 by month, for the conduction gain (with dailyRange; the hours follow the handbook's fractions of daily range)",
    window: windowField('weather.dryBulbMax', 'monthly', 'sky'),
  }),
  dailyRange: e({
    name: 'dailyRange',
    label: 'Daily range [K]',
    kind: 'number',
    unit: 'K',
    min: 0,
    max: DAILY_RANGE_MAX,
    optional: true,
    description: "the design day's range of outdoor dry-bulb, one value or 12 by month (with dryBulbMax)",
    window: windowField('weather.dailyRange', 'monthly', 'sky'),
  }),
  tauB: e({
    name: 'tauB',
    label: 'Tau b (beam optical depth)',
    aliases: ['beamOpticalDepth'],
    kind: 'number',
    min: 0,
    max: TAU_B_MAX,
    exclusiveMin: true,
    description: 'beam pseudo-optical depth τb of the ASHRAE clear-sky model (site and month data); in a window: one value or 12 by month, with tauD',
    window: windowField('weather.tauB', 'monthly', 'sky'),
  }),
  tauD: e({
    name: 'tauD',
    label: 'Tau d (diffuse optical depth)',
    aliases: ['diffuseOpticalDepth'],
    kind: 'number',
    min: 0,
    max: TAU_D_MAX,
    exclusiveMin: true,
    description: 'diffuse pseudo-optical depth τd of the ASHRAE clear-sky model (site and month data); in a window: one value or 12 by month, with tauB; a pair giving more light than any sky can (high τb with high τd, or τd below about 0.9) is refused',
    window: windowField('weather.tauD', 'monthly', 'sky'),
  }),
  // Quantities functions take or give
  sunAltitude: e({ name: 'sunAltitude', label: 'Sun altitude [°]', aliases: ['altitude'], kind: 'number', unit: '°', min: -90, max: 90, description: 'sun altitude above the horizon' }),
  sunAzimuth: e({ name: 'sunAzimuth', label: 'Sun azimuth [°]', aliases: ['azimuth'], kind: 'number', unit: '°', min: 0, max: 360, description: 'sun azimuth clockwise from true north' }),
  incidence: e({ name: 'incidence', label: 'Incidence [°]', kind: 'number', unit: '°', min: 0, max: 180, description: 'incidence angle of the sun on the glass (90 or more: sun behind it)' }),
  dayOfYear: e({ name: 'dayOfYear', label: 'Day of year', kind: 'number', min: 1, max: 366, description: 'day of the year, 1 = 1 January (fractions allowed)' }),
  dni: e({ name: 'dni', label: 'DNI (direct normal irradiance) [W/m²]', kind: 'number', unit: 'W/m²', min: 0, max: IRRADIANCE_MAX, description: 'direct normal irradiance; no more than the physically possible limit at the sun (Long & Shi 2008: the extraterrestrial value)' }),
  dhi: e({ name: 'dhi', label: 'DHI (diffuse horizontal irradiance) [W/m²]', kind: 'number', unit: 'W/m²', min: 0, max: IRRADIANCE_MAX, description: 'diffuse horizontal irradiance; no more than the physically possible limit at the sun (Long & Shi 2008: 0.95 E0 sin(altitude)^1.2 + 50 W/m², and the global within its own)' }),
  headers: e({ name: 'headers', label: 'Headers', kind: 'flag', default: false, description: 'TRUE: the spilled table starts with a row of column names (the glossary tokens)' }),
  clock: e({
    name: 'clock',
    label: 'Clock',
    kind: 'clock',
    optional: true,
    description:
      "the workbook's clock: names with values beside them — daylightSavingStart and daylightSavingEnd (clock readings when the clocks go forward and back, in any one year; the rule repeats yearly), daylightSavingShift [h] (above 0 up to 2; blank 1), dateSystem (1900 or 1904); date-times are then read and given on that clock, in that date system; blank: standard time, 1900",
  }),
  window: e({
    name: 'window',
    label: 'Window',
    kind: 'window',
    description:
      'the window as one range: field names in the first column with values beside them, or a header row of field names over one value row (a row of a window schedule); several value rows or columns give one result per window. Names as in the glossary, any case',
  }),
} as const satisfies Record<string, GlossaryEntry>;

/**
 * The words tables show for the cooling-load figures worked out from a window's hourly year (the
 * pane's year, schedule and options sheets, the command line's workbooks and CSV): one place for
 * each, so that a figure has one name everywhere. Units in parentheses, as in the hourly columns.
 */
export const LOAD_WORDS = {
  /** The largest hourly cooling load of the year (or of a month) [W]. */
  peakLoad: 'Peak cooling load (W)',
  /** When that load falls, for rows stamped at the hour's end. */
  peakLoadAtHourEnding: 'Peak load at (hour ending)',
  /** When that load falls, for rows stamped at an instant. */
  peakLoadAtInstant: 'Peak load at (instant)',
  /** The command line schedule's words for the hour ending of the peak load (beside its "Peak hour ending"). */
  peakLoadHourEnding: 'Peak load hour ending',
  /** How much an option lowers the peak cooling load against the window with no outside shading [%]. */
  peakLoadCut: 'Peak load cut vs no shading (%)',
  /** Said where a cooling-load figure would stand for a window that names no room. */
  noRoom: 'no room given — gains only',
} as const;

/**
 * The words of a peak's date-time column, by how the rows are stamped (the windows' time
 * convention): the hour ending then, the instant itself, or — in a schedule whose windows differ —
 * each window's own, which a time-convention column beside them says.
 */
export const PEAK_AT_WORDS = {
  /** The peak gain's hour, rows stamped at the hour's end (the pane's words). */
  peakAtHourEnding: 'Peak at (hour ending)',
  /** The command line schedule's words for the same (its first header, kept). */
  peakHourEnding: 'Peak hour ending',
  /** The peak gain's instant, rows stamped at an instant. */
  peakAtInstant: 'Peak at (instant)',
  /** The peak gain's stamp in a schedule whose windows read date-times differently. */
  peakAtEither: `Peak at (hour ending or instant: see ${GLOSSARY.timeConvention.label})`,
  /** The peak load's stamp in such a schedule. */
  peakLoadAtEither: `Peak load at (hour ending or instant: see ${GLOSSARY.timeConvention.label})`,
};

/** The glossary's window fields, in glossary order. */
export const WINDOW_FIELDS: readonly GlossaryEntry[] = Object.values(GLOSSARY).filter((g: GlossaryEntry) => g.window !== undefined);

/**
 * A name reduced for matching: lower case, anything in brackets or parentheses dropped (a unit or
 * a note), letters and digits only. `Overhang projection [m]` → `overhangprojection`.
 * @param text - the name as written; anything, read as text
 * @returns the key; '' for a blank
 */
export function nameKey(text: unknown): string {
  if (typeof text !== 'string') return keyOf(text);
  let k = NAME_KEYS.get(text);
  if (k === undefined) {
    k = keyOf(text);
    if (NAME_KEYS.size >= 1024) NAME_KEYS.clear();
    NAME_KEYS.set(text, k);
  }
  return k;
}

/** The keys of names already read (a window range's names are read again on every call). */
const NAME_KEYS = new Map<string, string>();

function keyOf(text: unknown): string {
  return String(text ?? '')
    .replace(/[([][^)\]]*[)\]]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]/g, '');
}

/** Every accepted window-field name key → its entry (name, label and aliases). */
const FIELD_BY_KEY: ReadonlyMap<string, GlossaryEntry> = (() => {
  const map = new Map<string, GlossaryEntry>();
  for (const f of WINDOW_FIELDS) {
    for (const written of [f.name, f.label, ...(f.aliases ?? [])]) {
      const k = nameKey(written);
      const taken = map.get(k);
      if (taken && taken !== f) throw new Error(`glossary: "${written}" names both ${taken.name} and ${f.name}`);
      map.set(k, f);
    }
  }
  return map;
})();

/** The window field a name (or label, or alias) names, if any. */
export function windowFieldFor(text: unknown): GlossaryEntry | undefined {
  return FIELD_BY_KEY.get(nameKey(text));
}

/**
 * The canonical token of a choice as written, matched by {@link nameKey} against the choices and
 * their aliases (`Perez 1990`, `perez`, `PEREZ1990` → `perez1990`; `Hay–Davies` → `hayDavies`).
 * @returns the token, or undefined when the text names none
 */
export function choiceFor(param: ParamDescriptor, text: string): string | undefined {
  const k = nameKey(text);
  if (k === '') return undefined;
  const hit = (param.choices ?? []).find((c) => nameKey(c) === k);
  if (hit !== undefined) return hit;
  for (const [alias, token] of Object.entries(param.choiceAliases ?? {})) if (nameKey(alias) === k) return token;
  return undefined;
}
