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

/** Where the irradiance comes from. */
export type Weather =
  /** ASHRAE clear-sky model with a pseudo-optical depth pair per month (12 values each) or one pair all year. */
  | { kind: 'ashraeClearSky'; tauB: number[]; tauD: number[] }
  /** Turbidity-based clear sky (Ineichen–Perez) with Linke turbidity per month (12) or one value. */
  | { kind: 'ineichenClearSky'; linkeTurbidity: number[] }
  /** The caller's hourly series: direct normal and diffuse horizontal [W/m²], one value per hour of the year; NaN marks a missing hour. */
  | { kind: 'measured'; dni: Float64Array | number[]; dhi: Float64Array | number[] }
  /** The caller's hourly global horizontal [W/m²], decomposed by Erbs et al. (1982); NaN marks a missing hour. */
  | { kind: 'globalHorizontal'; ghi: Float64Array | number[] };

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
  /** Sky-diffuse transposition model; default Perez 1990 for measured weather. */
  skyModel: SkyModel;
  weather: Weather;
  /** Calendar year of the hourly series. */
  year: number;
}
