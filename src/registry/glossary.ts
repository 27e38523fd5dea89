/**
 * The glossary: shared parameter names, with their meaning, unit and range, used by every
 * descriptor that takes them, so one name always means one thing (the glossary of docs/functions.md is
 * generated from this list).
 */
import { PANES_MAX, PANES_MIN } from '../core/glazing';
import { IRRADIANCE_MAX, LINKE_MAX, LINKE_MIN, TAU_B_MAX, TAU_D_MAX } from '../core/sky';
import { UTC_OFFSET_MAX, UTC_OFFSET_MIN } from '../core/time';
import type { ParamDescriptor } from './types';

function p(d: ParamDescriptor): ParamDescriptor {
  return Object.freeze(d);
}

/** Longest window or shading dimension the worksheet functions accept [m]. */
export const LENGTH_MAX = 100;

function length(name: string, description: string, extra: Partial<ParamDescriptor> = {}): ParamDescriptor {
  return p({ name, kind: 'number', unit: 'm', min: 0, max: LENGTH_MAX, default: 0, description, ...extra });
}

export const GLOSSARY = {
  dateTime: p({ name: 'dateTime', kind: 'dateTime', description: 'local standard date-time (no daylight saving), as a spreadsheet serial or ISO 8601 text' }),
  date: p({ name: 'date', kind: 'dateTime', description: 'local date (any time of day on it; the local calendar day is used)' }),
  latitude: p({ name: 'latitude', kind: 'number', unit: '°', min: -90, max: 90, description: 'site latitude, north positive' }),
  longitude: p({ name: 'longitude', kind: 'number', unit: '°', min: -180, max: 180, description: 'site longitude, east positive' }),
  utcOffset: p({ name: 'utcOffset', kind: 'number', unit: 'h', min: UTC_OFFSET_MIN, max: UTC_OFFSET_MAX, description: "site's standard-time offset from UTC, east positive (e.g. -5, 5.5)" }),
  elevation: p({ name: 'elevation', kind: 'number', unit: 'm', min: -500, max: 9000, default: 0, description: 'site elevation above sea level' }),
  pressure: p({ name: 'pressure', kind: 'number', unit: 'hPa', min: 0, max: 1200, exclusiveMin: true, optional: true, description: 'mean air pressure for refraction; blank: standard atmosphere at the elevation' }),
  temperature: p({ name: 'temperature', kind: 'number', unit: '°C', min: -90, max: 60, default: 12, description: 'mean air temperature for refraction' }),
  deltaT: p({ name: 'deltaT', kind: 'number', unit: 's', min: -100, max: 10000, optional: true, description: 'TT − UT; blank: Espenak & Meeus (2006) polynomial' }),
  surfaceTilt: p({ name: 'surfaceTilt', kind: 'number', unit: '°', min: 0, max: 180, default: 90, description: 'surface tilt from horizontal: 0 faces the sky, 90 is a vertical wall' }),
  surfaceAzimuth: p({ name: 'surfaceAzimuth', kind: 'number', unit: '°', min: 0, max: 360, description: 'direction the surface faces, clockwise from true north (N 0, E 90, S 180, W 270)' }),
  sunAltitude: p({ name: 'sunAltitude', kind: 'number', unit: '°', min: -90, max: 90, description: 'sun altitude above the horizon' }),
  sunAzimuth: p({ name: 'sunAzimuth', kind: 'number', unit: '°', min: 0, max: 360, description: 'sun azimuth clockwise from true north' }),
  incidence: p({ name: 'incidence', kind: 'number', unit: '°', min: 0, max: 180, description: 'incidence angle of the sun on the glass (90 or more: sun behind it)' }),
  year: p({ name: 'year', kind: 'number', integer: true, min: 1901, max: 9998, description: 'calendar year (8784 hours in a leap year, else 8760)' }),
  dayOfYear: p({ name: 'dayOfYear', kind: 'number', min: 1, max: 366, description: 'day of the year, 1 = 1 January (fractions allowed)' }),
  width: length('width', 'window width (rough opening, frame included)', { exclusiveMin: true, default: undefined }),
  height: length('height', 'window height (rough opening, frame included)', { exclusiveMin: true, default: undefined }),
  overhangProjection: length('overhangProjection', 'depth of an overhang out from the wall; 0 = no overhang'),
  overhangGap: length('overhangGap', "height of the overhang's underside above the window head"),
  overhangExtensionLeft: length('overhangExtensionLeft', 'overhang extension beyond the left jamb, seen from outside (negative stops short)', { min: -LENGTH_MAX }),
  overhangExtensionRight: length('overhangExtensionRight', 'overhang extension beyond the right jamb, seen from outside (negative stops short)', { min: -LENGTH_MAX }),
  finGap: length('finGap', 'distance from each jamb to its fin'),
  revealDepth: length('revealDepth', 'depth of the glass behind the wall face; 0 = flush'),
  skyline: p({
    name: 'skyline',
    kind: 'numberList',
    unit: '°',
    min: 0,
    max: 90,
    optional: true,
    length: { min: 1, max: 360 },
    description: 'elevation angles of surrounding buildings and terrain for equal azimuth sectors clockwise from north; blank: open horizon',
  }),
  dni: p({ name: 'dni', kind: 'number', unit: 'W/m²', min: 0, max: IRRADIANCE_MAX, description: 'direct normal irradiance' }),
  dhi: p({ name: 'dhi', kind: 'number', unit: 'W/m²', min: 0, max: IRRADIANCE_MAX, description: 'diffuse horizontal irradiance' }),
  tauB: p({ name: 'tauB', kind: 'number', min: 0, max: TAU_B_MAX, exclusiveMin: true, description: 'beam pseudo-optical depth τb of the ASHRAE clear-sky model (site and month data)' }),
  tauD: p({ name: 'tauD', kind: 'number', min: 0, max: TAU_D_MAX, exclusiveMin: true, description: 'diffuse pseudo-optical depth τd of the ASHRAE clear-sky model (site and month data)' }),
  linkeTurbidity: p({ name: 'linkeTurbidity', kind: 'number', min: LINKE_MIN, max: LINKE_MAX, description: 'Linke turbidity factor (about 2 very clear, 3–4 typical, 6+ hazy)' }),
  groundAlbedo: p({ name: 'groundAlbedo', kind: 'number', min: 0, max: 1, default: 0.2, description: 'ground reflectance (0.2 for grass and soil is common practice, no source; fresh snow up to 0.8)' }),
  skyModel: p({ name: 'skyModel', kind: 'choice', choices: ['perez', 'haydavies', 'isotropic'], default: 'perez', description: 'sky-diffuse model: "perez" (Perez 1990), "haydavies" (Hay–Davies) or "isotropic"' }),
  shgcNormal: p({ name: 'shgcNormal', kind: 'number', min: 0, max: 1, description: 'solar heat gain coefficient of the glazing at normal incidence (from the product rating)' }),
  panes: p({ name: 'panes', kind: 'number', integer: true, min: PANES_MIN, max: PANES_MAX, default: 2, description: 'number of glass panes, for the fall of SHGC with incidence angle' }),
  frameFraction: p({ name: 'frameFraction', kind: 'number', min: 0, max: 1, exclusiveMax: true, default: 0, description: 'share of the rough opening taken by the frame' }),
  interiorAttenuation: p({ name: 'interiorAttenuation', kind: 'number', min: 0, max: 1, default: 1, description: 'interior attenuation coefficient of a blind or curtain; 1 = none' }),
} as const;
