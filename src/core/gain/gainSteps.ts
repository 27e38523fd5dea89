/**
 * The gain explanation: one hour's window gain as an ordered table of steps, from sun position to
 * watts, each with its value, unit and the method used — for checking a consultant's number by hand.
 */
import { formatSerialIso, requireSerial } from '../time';
import { gainOfPrepared, prepareWindow, type WeatherHour, type WindowGainHour } from './windowGain';
import type { WindowSpec } from './window';

/** One line of the explanation. */
export interface GainStep {
  /** 1, 2, 3 ... in the order of the calculation. */
  step: number;
  /** What the value is, in words. */
  quantity: string;
  value: number;
  /** Unit as printed, '' for pure numbers. */
  unit: string;
  /** How it was obtained: equation or model, with its source. */
  method: string;
}

const SKY_MODEL_TEXT: Record<WindowSpec['skyModel'], string> = {
  isotropic: 'isotropic sky: DHI · (1 + cos tilt) / 2 × sky view factor',
  hayDavies: 'Hay–Davies sky (circumsolar + isotropic) × sky view factor',
  perez1990: 'Perez et al. (1990) sky, composite coefficients × sky view factor',
};

/** The step table of an hour already worked out. */
export function stepsOf(spec: WindowSpec, h: WindowGainHour): GainStep[] {
  const rows: Omit<GainStep, 'step'>[] = [];
  const add = (quantity: string, value: number, unit: string, method: string) => rows.push({ quantity, value, unit, method });
  const shgcModel = spec.glazing.angleTable
    ? 'from the glazing angle table (monotone cubic interpolation)'
    : `Fresnel reflection + absorption model, ${spec.glazing.panes} pane(s), scaled to SHGC ${spec.glazing.shgc} at normal incidence`;
  const when = formatSerialIso(h.dateTime);
  add('sun altitude', h.sunAltitude, '°', `NREL SPA (Reda & Andreas 2008) at ${when} local standard time, with refraction`);
  add('sun azimuth', h.sunAzimuth, '°', 'NREL SPA, clockwise from north');
  add('incidence angle', h.incidence, '°', 'angle between the sun and the window normal: cos θ = sin β cos Σ + cos β sin Σ cos(φ − ψ)');
  add('profile angle', h.profileAngle, '°', 'vertical shadow angle: tan Ω = tan β / cos γ');
  add('sunlit fraction', h.sunlitFraction, '', 'union of the shadow polygons of overhang, fins and reveal on the glazing; 0 when the sun is down, behind the wall or behind the skyline');
  add('direct normal irradiance', h.dni, 'W/m²', h.weatherSource);
  add('diffuse horizontal irradiance', h.dhi, 'W/m²', h.weatherSource);
  add('sky view factor', h.skyViewFactor, '', spec.shading.skyline ? 'share of the open-sky diffuse that the skyline leaves visible' : 'open horizon');
  add('beam on the window', h.beam, 'W/m²', 'DNI × cos θ (unshaded; 0 with the sun down or behind the window)');
  add('sky diffuse on the window', h.sky, 'W/m²', SKY_MODEL_TEXT[spec.skyModel]);
  add('ground-reflected on the window', h.ground, 'W/m²', `GHI × albedo ${spec.groundAlbedo} × (1 − cos tilt) / 2`);
  add('SHGC at the incidence angle', h.shgcBeam, '', shgcModel);
  add('diffuse SHGC', h.shgcDiffuse, '', 'hemispherical average 2 ∫ SHGC(θ) cos θ sin θ dθ');
  add('interior attenuation', h.interiorAttenuation, '', spec.glazing.interiorAttenuation === undefined ? 'no interior shade (default 1)' : 'given');
  add('glass area', h.glassArea, 'm²', `width ${spec.width} × height ${spec.height} × (1 − frame fraction ${spec.frameFraction})`);
  add('beam gain', h.gain.beam, 'W', 'glass area × beam × sunlit fraction × SHGC(θ) × interior attenuation');
  add('sky-diffuse gain', h.gain.sky, 'W', 'glass area × sky diffuse × diffuse SHGC × interior attenuation');
  add('ground-reflected gain', h.gain.ground, 'W', 'glass area × ground-reflected × diffuse SHGC × interior attenuation');
  add('window gain', h.gain.total, 'W', h.missing ? 'no weather for this hour: 0' : 'beam + sky-diffuse + ground-reflected gain');
  add('radiant part', h.gain.radiant, 'W', `radiant fraction ${h.radiantFraction} × window gain`);
  add('convective part', h.gain.convective, 'W', 'window gain − radiant part');
  return rows.map((r, i) => ({ step: i + 1, ...r }));
}

/**
 * The gain of one window at one instant, explained step by step.
 * @param spec - the window (validated; errors name the field by its path)
 * @param dateTime - local standard date-time at which the sun is evaluated (serial)
 * @param weatherHour - DNI and DHI of the hour [W/m²]; omitted: from `spec.weather`
 * @returns the ordered steps: sun altitude and azimuth → incidence and profile angles → sunlit
 *   fraction → DNI, DHI → irradiance on the window by part → SHGC at the angle, diffuse SHGC →
 *   interior attenuation → glass area → gain by part [W] → radiant and convective parts. At night the
 *   irradiance and gain steps are 0.
 * @remarks Same calculation as {@link windowGainAt}; see src/core/gain/windowGain.ts for the equation and source.
 */
export function gainSteps(spec: WindowSpec, dateTime: number, weatherHour?: WeatherHour): GainStep[] {
  requireSerial('dateTime', dateTime);
  return stepsOf(spec, gainOfPrepared(prepareWindow(spec), dateTime, weatherHour));
}
