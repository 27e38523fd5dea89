/**
 * What every window of one site shares over a year: the sun's hourly path (with the sines and
 * cosines of its altitude and azimuth) and the weather's direct normal and diffuse horizontal
 * irradiance hour by hour (a clear sky at the sun, or a supplied series fitted to the year), with
 * the hours the weather leaves missing. It depends on the year, the site and the weather only, so a
 * schedule of many windows works it out once per site and weather ({@link SharedYears}) and every
 * window's year ({@link annualOfPrepared} in ./annual.ts) reads it; the per-window work is then the
 * window's own angles, shading and gain.
 *
 * Nothing here is approximate: a window's year from a shared year is the same numbers as from its
 * own (tests/core/gain/sharedYear.test.ts holds them equal).
 */
import { RAD } from '../common';
import { monthlyValue, type PreparedWindow } from './prepared';
import { ashraeClearSky, decomposeErbs, extraterrestrialSpencer, ineichenPerezClearSky, isPossibleGlobal, isPossibleIrradiance, perezBrightnessColumns, type PerezBrightnessColumns } from '../sky';
import { annualSunPath, type Site, type SunTrigColumns } from '../sun';
import { daysInMonth, type TimeConvention } from '../time';
import type { Weather } from './window';

const { cos, max, min, sin } = Math;
const { isFinite: numberIsFinite } = Number;

/** The sun's path and the weather of one site and year, hour by hour. */
export interface SharedYear {
  /** Year, site and weather this was worked out for (see {@link sharedYearKey}). */
  readonly key: string;
  readonly year: number;
  /** 8760, or 8784 in a leap year. */
  readonly hours: number;
  /** Local standard-time serial at the END of each hour. */
  readonly stampSerial: Float64Array;
  /** Sun at the middle of each hour [°]: altitude (with refraction), azimuth, zenith. */
  readonly altitude: Float64Array;
  readonly azimuth: Float64Array;
  readonly zenith: Float64Array;
  /** Sines and cosines of the altitude and the azimuth (from the sun path's topocentric vector). */
  readonly sinAltitude: Float64Array;
  readonly cosAltitude: Float64Array;
  readonly sinAzimuth: Float64Array;
  readonly cosAzimuth: Float64Array;
  /** Direct normal and diffuse horizontal irradiance [W/m²] (0 on missing hours and at night under a clear sky). */
  readonly dni: Float64Array;
  readonly dhi: Float64Array;
  /** 1 where the weather has no value for the hour, else 0. */
  readonly missing: Uint8Array;
  /** The hours with the sun above the horizon (at mid-hour), in order. */
  readonly daylight: Int32Array;
  /** The hours with weather and light (diffuse, or direct with the sun up), in order: the only ones with irradiance. */
  readonly lit: Int32Array;
}

/** Month (1…12) of each day of the year, index 0 = 1 January. */
export function monthOfDay(year: number): Uint8Array {
  const out = new Uint8Array(366);
  let d = 0;
  for (let m = 1; m <= 12; m++) {
    const n = daysInMonth(year, m);
    out.fill(m, d, d + n);
    d += n;
  }
  return out;
}

let dniExtraTable: Float64Array | undefined;

/**
 * Extraterrestrial normal irradiance by day of the year [W/m²], index 1…366 (Spencer 1971, as
 * src/core/sky/planeIrradiance.ts uses), worked out on first use and kept: it depends on the day only.
 */
export function dniExtraByDay(): Float64Array {
  if (dniExtraTable === undefined) {
    const table = new Float64Array(367);
    for (let d = 1; d <= 366; d++) table[d] = extraterrestrialSpencer(d);
    dniExtraTable = table;
  }
  return dniExtraTable;
}

const perezOfYear = new WeakMap<SharedYear, PerezBrightnessColumns>();

/**
 * The Perez (1990) brightness coefficients of every hour with light of a shared year, worked out on
 * first use and kept with it: what the sky is, the same for every window plane under it.
 */
export function perezBrightnessOf(sy: SharedYear): PerezBrightnessColumns {
  let b = perezOfYear.get(sy);
  if (b === undefined) {
    const table = dniExtraByDay();
    b = perezBrightnessColumns(sy.dni, sy.dhi, sy.altitude, sy.sinAltitude, (i) => table[((i / 24) | 0) + 1], sy.lit);
    perezOfYear.set(sy, b);
  }
  return b;
}

/** Identity numbers of supplied weather series, so that windows given the same series share it. */
const seriesIds = new WeakMap<object, number>();
let nextSeriesId = 1;

function seriesId(series: object): number {
  let id = seriesIds.get(series);
  if (id === undefined) {
    id = nextSeriesId++;
    seriesIds.set(series, id);
  }
  return id;
}

/** The irradiance part of a weather, as a key: its values for a clear sky, its series' identity otherwise. */
function weatherKey(weather: Weather): string {
  switch (weather.kind) {
    case 'ashraeClearSky':
      return `ashrae:${weather.tauB.join(',')}:${weather.tauD.join(',')}`;
    case 'ineichenClearSky':
      return `ineichen:${weather.linkeTurbidity.join(',')}`;
    case 'measured':
      return `measured:${seriesId(weather.dni)}:${seriesId(weather.dhi)}:${weather.dni.length}`;
    case 'globalHorizontal':
      return `ghi:${seriesId(weather.ghi)}:${weather.ghi.length}`;
  }
}

/** Everything of a site that moves the sun or the clear sky (the clock's daylight saving does not). */
function siteKey(site: Site): string {
  return [site.latitude, site.longitude, site.utcOffset, site.elevation, site.pressure, site.temperature].join('|');
}

/** The key of a window's shared year: its year, its site, its time convention and its weather's irradiance. */
export function sharedYearKey(w: PreparedWindow): string {
  return `${w.spec.year}|${siteKey(w.spec.site)}|${w.convention}|${weatherKey(w.spec.weather)}`;
}

/** Where the sun path evaluates each hour for a time convention: the hour's middle, or the instant of the stamp. */
export function sunPathAt(convention: TimeConvention): 'middle' | 'start' {
  return convention === 'instant' ? 'start' : 'middle';
}

/**
 * Works out the shared year of a prepared (validated) window.
 * @param w - the window, from prepareWindow
 * @param trig - columns for the sines and cosines of the sun's altitude and azimuth (default: fresh
 *   ones; a caller that uses the year once may pass scratch columns)
 */
export function sharedYearOf(w: PreparedWindow, trig?: SunTrigColumns): SharedYear {
  const { spec } = w;
  const n = w.hours;
  const path = annualSunPath(spec.year, spec.site, { at: sunPathAt(w.convention), trig: trig ?? true, slowColumns: false });
  const dni = new Float64Array(n);
  const dhi = new Float64Array(n);
  const missing = new Uint8Array(n);
  fillWeather(w, path.altitude, path.zenith, { dni, dhi, missing }, 0, n);
  const daylight: number[] = [];
  const lit: number[] = [];
  for (let i = 0; i < n; i++) {
    const sunUp = path.altitude[i] > 0;
    if (sunUp) daylight.push(i);
    if (missing[i] === 0 && !(dhi[i] === 0 && (dni[i] === 0 || !sunUp))) lit.push(i);
  }
  return {
    key: sharedYearKey(w),
    year: spec.year,
    hours: n,
    stampSerial: path.stampSerial,
    altitude: path.altitude,
    azimuth: path.azimuth,
    zenith: path.zenith,
    sinAltitude: path.sinAltitude!,
    cosAltitude: path.cosAltitude!,
    sinAzimuth: path.sinAzimuth!,
    cosAzimuth: path.cosAzimuth!,
    dni,
    dhi,
    missing,
    daylight: Int32Array.from(daylight),
    lit: Int32Array.from(lit),
  };
}

/** The supplied series a weather's irradiance is read from (none for a clear sky). */
function suppliedSeries(weather: Weather): ArrayLike<number>[] {
  switch (weather.kind) {
    case 'measured':
      return [weather.dni, weather.dhi];
    case 'globalHorizontal':
      return [weather.ghi];
    default:
      return [];
  }
}

/** Whether a series still holds the values of its snapshot (NaN equal to NaN: a missing hour stays missing). */
function sameValues(series: ArrayLike<number>, snapshot: Float64Array): boolean {
  if (series.length !== snapshot.length) return false;
  for (let i = 0; i < snapshot.length; i++) {
    const a = series[i];
    const b = snapshot[i];
    if (a !== b && !(a !== a && b !== b)) return false;
  }
  return true;
}

/**
 * Shared years kept by key, for a run over many windows (a schedule) or for calls that come back to
 * the same site (a workbook's windows, the pane's options): each site, year and weather is worked
 * out once. Holds at most `limit` years (about 0.7 MB each), dropping the oldest first.
 *
 * A supplied series is known by its identity, and its values are checked on every use against a
 * copy taken when the year was worked out (a few microseconds against a millisecond of work), so
 * a series changed in place is never read from a stale year.
 */
export class SharedYears {
  private readonly years = new Map<string, { year: SharedYear; snapshots: Float64Array[] }>();
  constructor(private readonly limit = 64) {}

  /** The shared year of a prepared window, worked out on first use (or again when its series changed). */
  of(w: PreparedWindow): SharedYear {
    const key = sharedYearKey(w);
    const series = suppliedSeries(w.spec.weather);
    const kept = this.years.get(key);
    if (kept !== undefined && series.every((s, k) => sameValues(s, kept.snapshots[k]))) {
      // Most recently used last: the oldest is dropped first.
      this.years.delete(key);
      this.years.set(key, kept);
      return kept.year;
    }
    const year = sharedYearOf(w);
    this.years.delete(key);
    if (this.years.size >= this.limit) this.years.delete(this.years.keys().next().value as string);
    this.years.set(key, { year, snapshots: series.map((s) => Float64Array.from(s)) });
    return year;
  }

  /** Number of years kept. */
  get size(): number {
    return this.years.size;
  }
}

/**
 * Fills the dni, dhi and missing columns of rows `from` … `to` − 1 from the window's weather, one
 * loop per kind (no switch per hour): clear-sky models at each hour's sun (0 with the sun down), a
 * supplied series fitted to the year (a non-finite value marks the row missing), or a supplied GHI
 * series split by Erbs et al.
 */
export function fillWeather(w: PreparedWindow, alt: Float64Array, zen: Float64Array, out: { dni: Float64Array; dhi: Float64Array; missing: Uint8Array }, from: number, to: number): void {
  const weather = w.spec.weather;
  const { dni, dhi, missing } = out;
  const months = monthOfDay(w.spec.year);
  switch (weather.kind) {
    case 'ashraeClearSky':
      for (let day = (from / 24) | 0; day * 24 < to; day++) {
        const month = months[day];
        const tauB = monthlyValue(weather.tauB, month);
        const tauD = monthlyValue(weather.tauD, month);
        for (let i = max(from, day * 24); i < min(to, day * 24 + 24); i++) {
          if (!(alt[i] > 0)) continue; // sun down: no irradiance (the columns start at 0)
          const c = ashraeClearSky(alt[i], day + 1, tauB, tauD);
          dni[i] = c.dni;
          dhi[i] = c.dhi;
        }
      }
      return;
    case 'ineichenClearSky': {
      const elevation = w.spec.site.elevation ?? 0;
      for (let day = (from / 24) | 0; day * 24 < to; day++) {
        const linke = monthlyValue(weather.linkeTurbidity, months[day]);
        for (let i = max(from, day * 24); i < min(to, day * 24 + 24); i++) {
          if (!(alt[i] > 0)) continue;
          const c = ineichenPerezClearSky(alt[i], day + 1, linke, elevation);
          dni[i] = c.dni;
          dhi[i] = c.dhi;
        }
      }
      return;
    }
    case 'measured': {
      const dniIn = weather.dni;
      const dhiIn = weather.dhi;
      const rowOf = w.yearFit!.rowOf;
      const dniExtra = dniExtraByDay();
      for (let i = from; i < to; i++) {
        const b = dniIn[rowOf[i]];
        const d = dhiIn[rowOf[i]];
        // A value no sky can give at this sun (Long & Shi 2008) marks the hour missing, as the weather reader does.
        if (numberIsFinite(b) && numberIsFinite(d) && isPossibleIrradiance(b, d, sin(alt[i] * RAD), dniExtra[((i / 24) | 0) + 1])) {
          dni[i] = b;
          dhi[i] = d;
        } else missing[i] = 1;
      }
      return;
    }
    case 'globalHorizontal': {
      const ghiIn = weather.ghi;
      const rowOf = w.yearFit!.rowOf;
      const dniExtra = dniExtraByDay();
      for (let i = from; i < to; i++) {
        const ghi = ghiIn[rowOf[i]];
        // As decomposeErbs judges it (same cosine, same day's value): past the limit the hour is missing.
        if (!numberIsFinite(ghi) || !isPossibleGlobal(ghi, cos(zen[i] * RAD), dniExtra[((i / 24) | 0) + 1])) {
          missing[i] = 1;
          continue;
        }
        const d = decomposeErbs(ghi, zen[i], ((i / 24) | 0) + 1);
        dni[i] = d.dni;
        dhi[i] = d.dhi;
      }
    }
  }
}
