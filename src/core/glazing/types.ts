/**
 * The description of a window's glazing: its SHGC at normal incidence and how that changes with the
 * angle of incidence.
 */

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
