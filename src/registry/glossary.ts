/**
 * The glossary: shared parameter names, with their meaning, unit and range, used by every
 * descriptor that takes them, so one name always means one thing (README "Glossary" is generated
 * from this list).
 */
import { UTC_OFFSET_MAX, UTC_OFFSET_MIN } from '../core/time';
import type { ParamDescriptor } from './types';

function p(d: ParamDescriptor): ParamDescriptor {
  return Object.freeze(d);
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
} as const;
