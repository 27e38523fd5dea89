/**
 * The description of one window in its setting — site, orientation, size, glazing, shading, ground
 * and weather — shared by the gain, annual, pane and CLI code. Types only: each module that
 * consumes a part validates it (errors name the field by its path, e.g. `shading.overhang.projection`).
 *
 * Lengths of the window and its shading devices are in metres here (glass area in m² follows from
 * them); the shading geometry itself depends only on ratios.
 */

/** Where the window is. */
export interface Site {
  /** [°] −90…90, north positive */
  latitude: number;
  /** [°] −180…180, east positive */
  longitude: number;
  /** Standard-time offset from UTC [h], −12…+14, east positive. */
  utcOffset: number;
  /** [m] above sea level; default 0. */
  elevation?: number;
  /** Mean air pressure [hPa] for refraction; default: standard atmosphere at the elevation. */
  pressure?: number;
  /** Mean air temperature [°C] for refraction; default 12. */
  temperature?: number;
}

/** A horizontal projection above the window (DESIGN.md, "Window shading geometry"). */
export interface Overhang {
  /** Depth out from the wall face [m], ≥ 0 (0 casts no shadow). */
  projection: number;
  /** Height of its underside above the window head [m], ≥ 0. */
  gap: number;
  /** Extension beyond the left jamb, seen from outside [m]; negative stops short of the jamb. */
  extensionLeft: number;
  /** Extension beyond the right jamb, seen from outside [m]; negative stops short of the jamb. */
  extensionRight: number;
}

/** A vertical projection beside the window. */
export interface Fin {
  /** Depth out from the wall face [m], ≥ 0. */
  projection: number;
  /** Distance from the jamb to the fin [m], ≥ 0. */
  gap: number;
  /** Extension above the window head [m]; negative stops below the head. */
  extensionAbove: number;
  /** Extension below the sill [m]; negative stops above the sill. */
  extensionBelow: number;
}

/** Exterior shading of one window; every part optional. */
export interface Shading {
  overhang?: Overhang;
  /** Fin at the left jamb, seen from outside. */
  leftFin?: Fin;
  /** Fin at the right jamb, seen from outside. */
  rightFin?: Fin;
  /** Depth of the glass behind the wall face [m], ≥ 0 (shades from both jambs and the head). */
  revealDepth?: number;
  /**
   * Skyline: elevation angles [°] 0…90 of neighbouring buildings and terrain for equal azimuth
   * sectors clockwise from north; sector k covers azimuths [k·360/n, (k+1)·360/n).
   */
  skyline?: number[];
}

/** Angle-dependent glazing data from a table (angles ascending in 0…90 °, SHGC values 0…1). */
export interface AngleTable {
  angles: number[];
  values: number[];
}

export interface Glazing {
  /** SHGC at normal incidence, 0…1. */
  shgc: number;
  /** Number of panes for the physical angular model, 1…4 (ignored when `angleTable` is given). */
  panes: number;
  /** SHGC by incidence angle, replacing the physical model when given. */
  angleTable?: AngleTable;
  /** Interior attenuation coefficient (blinds, curtains), 0…1; 1 = none. */
  interiorAttenuation?: number;
  /** Share of the beam + diffuse gain that is radiant (for cooling load), 0…1. */
  radiantFraction?: number;
}

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

export type SkyModel = 'isotropic' | 'hayDavies' | 'perez1990';

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
