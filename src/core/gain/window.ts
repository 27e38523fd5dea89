/**
 * The description of one window in its setting — site, orientation, size, glazing, shading, ground
 * and weather — shared by the gain, annual, pane and CLI code. The parts live with their concepts
 * (Site in sun/, Shading in shading/, Glazing in glazing/, SkyModel in sky/). Types only: each module that
 * consumes a part validates it (errors name the field by its path, e.g. `shading.overhang.projection`).
 *
 * Lengths of the window and its shading devices are in metres here (glass area in m² follows from
 * them); the shading geometry itself depends only on ratios.
 */
import type { Glazing } from '../glazing';
import type { Shading } from '../shading';
import type { SkyModel } from '../sky';
import type { Site } from '../sun';
import type { TimeConvention } from '../time';

/**
 * Outdoor dry-bulb on clear design days: the day's highest temperature and its daily range, each 12
 * monthly values (January first) or one for the year; the hours follow the fractions of daily
 * range (src/core/gain/outdoorTemperature.ts).
 */
export interface DesignTemperatures {
  /** Highest dry-bulb of the day [°C], −60…60. */
  dryBulbMax?: number[];
  /** Daily range of dry-bulb [K], 0…40. */
  dailyRange?: number[];
}

/**
 * Where the irradiance (and, for conduction, the outdoor dry-bulb) comes from. Hourly series hold
 * one value per hour of the window's year (8760, or 8784 in a leap year); a typical year of 8760
 * rows for a leap year, or a leap-year file of 8784 rows for another year, is fitted by date
 * (29 February repeated or dropped, src/core/time/clock.ts).
 */
export type Weather =
  /** ASHRAE clear-sky model with a pseudo-optical depth pair per month (12 values each) or one pair all year. */
  | ({ kind: 'ashraeClearSky'; tauB: number[]; tauD: number[] } & DesignTemperatures)
  /** Turbidity-based clear sky (Ineichen–Perez) with Linke turbidity per month (12) or one value. */
  | ({ kind: 'ineichenClearSky'; linkeTurbidity: number[] } & DesignTemperatures)
  /** The caller's hourly series: direct normal and diffuse horizontal [W/m²]; NaN marks a missing hour; optional dry-bulb [°C]. */
  | { kind: 'measured'; dni: Float64Array | number[]; dhi: Float64Array | number[]; dryBulb?: Float64Array | number[] }
  /** The caller's hourly global horizontal [W/m²], decomposed by Erbs et al. (1982); NaN marks a missing hour; optional dry-bulb [°C]. */
  | { kind: 'globalHorizontal'; ghi: Float64Array | number[]; dryBulb?: Float64Array | number[] };

/** One window, completely described. */
export interface WindowSpec {
  /** A label for tables and sheets. */
  name: string;
  site: Site;
  /** Direction the glass faces, clockwise from true north [°]. */
  surfaceAzimuth: number;
  /** Tilt from horizontal [°]; 90 = vertical (shading devices need 90). */
  surfaceTilt: number;
  /** Rough-opening width [m] > 0. */
  width: number;
  /** Rough-opening height [m] > 0. */
  height: number;
  /** Frame share of the rough opening, 0…<1; glass area = width × height × (1 − frameFraction). */
  frameFraction: number;
  glazing: Glazing;
  shading: Shading;
  /** Ground reflectance, 0…1. */
  groundAlbedo: number;
  /**
   * Sky-diffuse transposition model; omitted: the handbook's clear-day procedure (`ashraeClearDay`)
   * on ASHRAE τb/τd clear skies, Perez 1990 otherwise.
   */
  skyModel?: SkyModel;
  /** Indoor air temperature [°C], −20…50, for the conduction gain (needed with `glazing.uValue`). */
  indoorTemperature?: number;
  weather: Weather;
  /** Calendar year of the hourly series. */
  year: number;
  /**
   * How shading devices act on the diffuse light (docs/diffuse-shading.md): `"viewFactors"` (the
   * default) — the overhang, fins, reveal and skyline cut the sky-diffuse and ground-reflected light
   * by the window's view factors; `"beamOnly"` — the earlier treatment, kept for comparison: devices
   * cut only the beam, the skyline scales the whole sky diffuse by its sky view, the ground is not cut.
   */
  diffuseShading?: DiffuseShading;
  /**
   * How date-times and hourly rows are read: `hourEnding` (default; rows stamped at the end of
   * their hour, sun at mid-hour) or `instant` (rows stamped at the top of the hour, sun at the stamp).
   */
  timeConvention?: TimeConvention;
  /**
   * The room behind the window, for the cooling load by the radiant time series: a construction
   * whose illustrative series Sunpane ships (`light`, `medium`, `heavy`), or the room's own solar
   * and non-solar series (24 factors each, summing to 1). Checked and resolved by the load folder
   * (src/core/load/room.ts); absent: gains only.
   */
  room?: WindowRoom;
}

/** The room of a window ({@link WindowSpec.room}): a construction, or both series. */
export interface WindowRoom {
  construction?: string;
  solar?: number[];
  nonSolar?: number[];
}

/** The two treatments of diffuse light behind shading devices ({@link WindowSpec.diffuseShading}). */
export type DiffuseShading = 'viewFactors' | 'beamOnly';
