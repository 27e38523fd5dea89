/**
 * Glazing: the solar heat gain coefficient by angle of incidence (Fresnel equations for clear and
 * tinted panes, or the user's table), its hemispherical (diffuse) value, interior attenuation and the
 * glass area. Imports: common.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { diffuseShgc, diffuseShgcFromTable, glassArea, interiorAttenuationOf, PANES_MAX, PANES_MIN, requireAngleTable, shgcAtAngle, type ShgcCurve, shgcCurve, shgcFromTable, TABLE_MIN_SPACING } from './shgc';
export { type AngleTable, type Glazing } from './types';
