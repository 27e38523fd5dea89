/**
 * The gain explanation: one hour's window gain as an ordered table of steps, from sun position to
 * watts, each with its value, unit and the method used — for checking a consultant's number by hand.
 */
import { clockToStandard, describeDaylightSaving, formatSerialIso, requireSerial } from '../time';
import { glazingTypeOf, shgcBasisOf } from '../glazing';
import { gainOfPrepared, prepareWindow, type WeatherHour, type WindowGainHour } from './windowGain';
import { skyModelOf } from './windowSpec';
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

const SKY_MODEL_TEXT: Record<NonNullable<WindowSpec['skyModel']>, string> = {
  isotropic: 'isotropic sky: DHI · (1 + cos tilt) / 2 × sky view factor',
  hayDavies: 'Hay–Davies sky (circumsolar + isotropic) × sky view factor',
  perez1990: 'Perez et al. (1990) sky, composite coefficients × sky view factor',
  ashraeClearDay: "handbook clear-day procedure: DHI · (Y sin tilt + cos tilt), Y = max(0.45, 0.55 + 0.437 cos θ + 0.313 cos² θ) × sky view factor",
};

/** The angular model of the glazing, in words. */
function shgcModelText(spec: WindowSpec): string {
  const g = spec.glazing;
  switch (glazingTypeOf(g)) {
    case 'table':
      return 'from the glazing angle table (monotone cubic interpolation)';
    case 'coated':
      return `coated unit: Karlsson & Roos (2000) angular model, ${g.panes} pane(s), glazing-type parameter q ${g.typeParameter}, × SHGC ${g.shgc} at normal incidence`;
    default:
      return `${glazingTypeOf(g)} panes: Fresnel reflection + absorption model, ${g.panes} pane(s), scaled to SHGC ${g.shgc} at normal incidence`;
  }
}

/** The step table of an hour already worked out. */
export function stepsOf(spec: WindowSpec, h: WindowGainHour): GainStep[] {
  const rows: Omit<GainStep, 'step'>[] = [];
  const add = (quantity: string, value: number, unit: string, method: string) => rows.push({ quantity, value, unit, method });
  const shgcModel = shgcModelText(spec);
  const when = formatSerialIso(h.dateTime);
  const rule = spec.site.daylightSaving;
  add('local clock time', h.clockTime, 'date-time', `${formatSerialIso(h.clockTime)} on the clock; ${describeDaylightSaving(rule)}`);
  add('local standard time', h.dateTime, 'date-time', rule ? `${when}: clock time less the daylight-saving shift inside the period` : 'the clock keeps standard time all year');
  add('sun altitude', h.sunAltitude, '°', `NREL SPA (Reda & Andreas 2008) at ${when} local standard time, with refraction`);
  add('sun azimuth', h.sunAzimuth, '°', 'NREL SPA, clockwise from north');
  add('incidence angle', h.incidence, '°', 'angle between the sun and the window normal: cos θ = sin β cos Σ + cos β sin Σ cos(φ − ψ)');
  add('profile angle', h.profileAngle, '°', 'vertical shadow angle: tan Ω = tan β / cos γ');
  add('sunlit fraction', h.sunlitFraction, '', 'union of the shadow polygons of overhang, fins and reveal on the glazing; 0 when the sun is down, behind the wall or behind the skyline');
  add('direct normal irradiance', h.dni, 'W/m²', h.yearFit ? `${h.weatherSource}; ${h.yearFit}` : h.weatherSource);
  add('diffuse horizontal irradiance', h.dhi, 'W/m²', h.weatherSource);
  add('sky view factor', h.skyViewFactor, '', spec.shading.skyline ? 'share of the open-sky diffuse that the skyline leaves visible' : 'open horizon');
  add('beam on the window', h.beam, 'W/m²', 'DNI × cos θ (unshaded; 0 with the sun down or behind the window)');
  add('sky diffuse on the window', h.sky, 'W/m²', SKY_MODEL_TEXT[skyModelOf(spec)]);
  add('ground-reflected on the window', h.ground, 'W/m²', `GHI × albedo ${spec.groundAlbedo} × (1 − cos tilt) / 2`);
  add('SHGC at the incidence angle', h.shgcBeam, '', shgcModel);
  add('diffuse SHGC', h.shgcDiffuse, '', 'hemispherical average 2 ∫ SHGC(θ) cos θ sin θ dθ');
  const shaded = h.interiorAttenuation < 1 || h.interiorAttenuationDiffuse < 1;
  add('interior attenuation, beam', h.interiorAttenuation, '', shaded ? 'given (interior shade: the beam goes to the non-solar radiant time series)' : 'no interior shade (1)');
  add('interior attenuation, diffuse', h.interiorAttenuationDiffuse, '', shaded ? 'given' : 'no interior shade (1)');
  add('glass area', h.glassArea, 'm²', `width ${spec.width} × height ${spec.height} × (1 − frame fraction ${spec.frameFraction})`);
  const basis = shgcBasisOf(spec.glazing);
  add('area for the SHGC', h.solarArea, 'm²', basis === 'wholeWindow' ? 'whole-window SHGC (frame included in the rating): the rough opening, frame not subtracted again' : 'centre-of-glass SHGC: the glass area');
  add('beam gain', h.gain.beam, 'W', 'area × beam × sunlit fraction × SHGC(θ) × beam interior attenuation');
  add('sky-diffuse gain', h.gain.sky, 'W', 'area × sky diffuse × diffuse SHGC × diffuse interior attenuation');
  add('ground-reflected gain', h.gain.ground, 'W', 'area × ground-reflected × diffuse SHGC × diffuse interior attenuation');
  add('window solar gain', h.gain.total, 'W', h.missing ? 'no weather for this hour: 0' : 'beam + sky-diffuse + ground-reflected gain');
  add('radiant part', h.gain.radiant, 'W', `radiant fraction ${h.radiantFraction} × beam gain + ${h.radiantFractionDiffuse} × diffuse gains`);
  add('convective part', h.gain.convective, 'W', 'window solar gain − radiant part');
  if (h.outdoorTemperature !== undefined) {
    add('outdoor dry-bulb', h.outdoorTemperature, '°C', spec.weather.kind === 'measured' || spec.weather.kind === 'globalHorizontal' ? 'supplied hourly series' : "design day: highest dry-bulb − fraction of daily range (handbook climatic-design chapter's profile, from memory) × daily range");
    add('indoor temperature', h.indoorTemperature!, '°C', 'given');
    add('conduction gain', h.gain.conduction, 'W', `U ${spec.glazing.uValue} W/(m²·K) × rough opening ${spec.width} × ${spec.height} m² × (outdoor − indoor)`);
  }
  return rows.map((r, i) => ({ step: i + 1, ...r }));
}

/**
 * The gain of one window at one instant, explained step by step.
 * @param spec - the window (validated; errors name the field by its path)
 * @param dateTime - local date-time at which the sun is evaluated (serial): standard time, or clock
 *   time when the site has a daylight-saving rule
 * @param weatherHour - DNI and DHI of the hour [W/m²]; omitted: from `spec.weather`
 * @returns the ordered steps: sun altitude and azimuth → incidence and profile angles → sunlit
 *   fraction → DNI, DHI → irradiance on the window by part → SHGC at the angle, diffuse SHGC →
 *   interior attenuation → glass area → gain by part [W] → radiant and convective parts. At night the
 *   irradiance and gain steps are 0.
 * @remarks Same calculation as {@link windowGainAt}; see src/core/gain/windowGain.ts for the equation and source.
 */
export function gainSteps(spec: WindowSpec, dateTime: number, weatherHour?: WeatherHour): GainStep[] {
  requireSerial('dateTime', dateTime);
  const w = prepareWindow(spec);
  return stepsOf(spec, gainOfPrepared(w, clockToStandard(dateTime, spec.site.daylightSaving), weatherHour));
}
