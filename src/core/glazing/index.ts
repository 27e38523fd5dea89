/**
 * Glazing: the solar heat gain coefficient by angle of incidence (Fresnel equations for clear and
 * tinted panes, Karlsson & Roos (2000) for coated units, or the user's table), its hemispherical
 * (diffuse) value, interior attenuation for beam and diffuse, the SHGC basis (centre of glass or
 * whole window) and the areas it applies to. Imports: common.
 *
 * This index is the folder's only public door: code outside the folder imports from here.
 */
export { karlssonRoosFactor, KR_TYPE_PARAMETER_MAX, KR_TYPE_PARAMETER_MIN } from './karlssonRoos';
export {
  diffuseShgc,
  diffuseShgcFromTable,
  diffuseShgcOfType,
  GLAZING_TYPES,
  glassArea,
  glazingTypeOf,
  interiorAttenuationOf,
  interiorAttenuationsOf,
  PANES_MAX,
  PANES_MIN,
  requireAngleTable,
  requireGlazingType,
  requireShgcBasis,
  requireTypeParameter,
  SHGC_BASES,
  shgcAtAngle,
  shgcAtAngleOfType,
  shgcBasisOf,
  type ShgcCurve,
  shgcCurve,
  shgcFromTable,
  solarArea,
  TABLE_MIN_SPACING,
} from './shgc';
export { type AngleTable, type Glazing, type GlazingType, type ShgcBasis } from './types';
