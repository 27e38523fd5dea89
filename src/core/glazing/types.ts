/**
 * The description of a window's glazing: its SHGC at normal incidence, how that changes with the
 * angle of incidence (the glazing type), what the SHGC was rated on (centre of glass or whole
 * window), interior shading, the radiant shares of its gains and its thermal transmittance.
 */

/** Angle-dependent glazing data from a table (angles ascending in 0…90 °, SHGC values 0…1). */
export interface AngleTable {
  angles: number[];
  values: number[];
}

/**
 * How the SHGC falls with the angle of incidence:
 * - `clear`, `tinted`: uncoated panes, Fresnel reflection + absorption (the same physical model;
 *   the absorption follows from the SHGC);
 * - `coated`: low-emittance or spectrally selective units, Karlsson & Roos (2000) with the
 *   glazing-type parameter q (`typeParameter`);
 * - `table`: the user's table of SHGC by angle (`angleTable`).
 */
export type GlazingType = 'clear' | 'tinted' | 'coated' | 'table';

/**
 * What the given SHGC describes: `centreOfGlass` (the glass alone; the gain is worked out on the
 * glass area, rough opening × (1 − frame fraction)) or `wholeWindow` (a rating that includes the
 * frame; the gain is worked out on the whole rough opening and the frame fraction is not applied
 * again).
 */
export type ShgcBasis = 'centreOfGlass' | 'wholeWindow';

export interface Glazing {
  /** SHGC at normal incidence, 0…1 (for `table`, the table's own value at 0° is used). */
  shgc: number;
  /** Number of panes for the physical and Karlsson–Roos models, 1…4 (ignored for `table`). */
  panes: number;
  /** How the SHGC falls with angle; default `table` when an angle table is given, else `clear`. */
  type?: GlazingType;
  /** Karlsson–Roos glazing-type parameter q, 1…10; required for `coated`. */
  typeParameter?: number;
  /** SHGC by incidence angle: required for (and implies) `table`. */
  angleTable?: AngleTable;
  /** What the SHGC was rated on; default `centreOfGlass`. */
  shgcBasis?: ShgcBasis;
  /** Interior attenuation coefficient for beam and diffuse alike (blinds, curtains), 0…1; 1 = none. */
  interiorAttenuation?: number;
  /** Interior attenuation coefficient for the beam, 0…1 (default `interiorAttenuation`, else 1). */
  interiorAttenuationBeam?: number;
  /** Interior attenuation coefficient for diffuse light, 0…1 (default `interiorAttenuation`, else 1). */
  interiorAttenuationDiffuse?: number;
  /** Radiant share of the whole solar gain (beam and diffuse alike), 0…1. */
  radiantFraction?: number;
  /** Radiant share of the beam gain, 0…1 (default `radiantFraction`, else 1). */
  radiantFractionBeam?: number;
  /** Radiant share of the diffuse gain, 0…1 (default `radiantFraction`, else 1). */
  radiantFractionDiffuse?: number;
  /** Radiant share of the conduction gain, 0…1. */
  radiantFractionConduction?: number;
  /** Whole-window thermal transmittance U [W/(m²·K)], ≥ 0, applied to the rough opening. */
  uValue?: number;
}
