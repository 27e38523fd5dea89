/**
 * The shading devices of one window: overhang, fins, reveal and skyline. Lengths in metres (any one
 * consistent unit works: the shadows depend only on ratios). Left and right are as seen from
 * outside, facing the window (docs/conventions.md).
 */

/** A horizontal projection above the window (docs/conventions.md#window-shading-geometry). */
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
