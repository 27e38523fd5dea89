/**
 * The gain explanation: one hour's window gain as an ordered table of steps, from the instant the
 * sun is taken at (the first step, so the time convention is never hidden) and the sun position to
 * watts, each with its value, unit and the method used — for checking a consultant's number by hand.
 */
import { hasShading, HORIZON_BAND_DEG } from '../shading';
import { describeDaylightSaving, formatSerialIso, requireStamp } from '../time';
import { glazingTypeOf, shgcBasisOf } from '../glazing';
import { prepareWindow } from './prepared';
import { forHour, gainAtStamp, standardStamp, type WeatherHour, type WindowGainHour } from './windowGain';
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

type Model = NonNullable<WindowSpec['skyModel']>;

const SKY_MODEL_TEXT: Record<Model, string> = {
  isotropic: 'isotropic sky DHI · (1 + cos tilt) / 2, × sky view ratio',
  hayDavies: 'Hay–Davies sky: isotropic part × sky view ratio + circumsolar part × sunlit fraction',
  perez1990: 'Perez et al. (1990) sky, composite coefficients: isotropic part × sky view ratio + circumsolar (F1) part × sunlit fraction + horizon (F2) part × horizon band share',
  ashraeClearDay: 'handbook clear-day procedure: DHI · (Y sin tilt + cos tilt), Y = max(0.45, 0.55 + 0.437 cos θ + 0.313 cos² θ); no separate circumsolar part, so all of it × sky view ratio',
};

const SKY_MODEL_TEXT_BEAM_ONLY: Record<Model, string> = {
  isotropic: 'isotropic sky DHI · (1 + cos tilt) / 2, × the skyline’s sky view (beam-only treatment)',
  hayDavies: 'Hay–Davies sky (circumsolar + isotropic) × the skyline’s sky view (beam-only treatment)',
  perez1990: 'Perez et al. (1990) sky, composite coefficients, × the skyline’s sky view (beam-only treatment)',
  ashraeClearDay: 'handbook clear-day procedure DHI · (Y sin tilt + cos tilt) × the skyline’s sky view (beam-only treatment)',
};

const SKY_MODEL_NAME: Record<Model, string> = { isotropic: 'isotropic sky', hayDavies: 'Hay–Davies sky', perez1990: 'Perez et al. (1990) sky', ashraeClearDay: 'handbook clear-day procedure' };

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

/** Where the diffuse ratios of a window came from, in words. */
function viewText(spec: WindowSpec, h: WindowGainHour): { sky: string; ground: string; horizon: string } {
  if (h.diffuseShading === 'beamOnly') {
    const skyline = spec.shading.skyline ? 'the skyline’s sky view' : 'open horizon';
    return {
      sky: `${skyline}; devices left out of the diffuse (beam-only treatment)`,
      ground: 'not cut (beam-only treatment)',
      horizon: `${skyline} (beam-only treatment)`,
    };
  }
  if (spec.surfaceTilt !== 90 || !hasShading(spec.shading)) {
    return { sky: 'nothing shades the window: the bare window’s ½ ÷ ½', ground: 'nothing shades the window: ½ ÷ ½', horizon: 'nothing shades the window' };
  }
  const sky = h.skyViewRatio / 2;
  const ground = h.groundViewRatio / 2;
  return {
    sky: `glass-averaged, cosine-weighted view factor to the open sky ${sky.toFixed(4)} ÷ ½ (bare window): overhang, fins, reveal and skyline together, a direction blocked by several counted once; devices black`,
    ground: `view factor to the open ground ${ground.toFixed(4)} ÷ ½: overhang, fins and reveal together; devices black`,
    horizon: `open share of the sky 0–${HORIZON_BAND_DEG}° above the horizon, cosine-weighted, past devices and skyline (the Perez sky’s horizon brightening)`,
  };
}

/** The step table of an hour already worked out. */
export function stepsOf(spec: WindowSpec, h: WindowGainHour): GainStep[] {
  const rows: Omit<GainStep, 'step'>[] = [];
  const add = (quantity: string, value: number, unit: string, method: string) => rows.push({ quantity, value, unit, method });
  const shgcModel = shgcModelText(spec);
  const when = formatSerialIso(h.dateTime);
  const rule = spec.site.daylightSaving;
  add('sun evaluated at', h.dateTime, 'date-time', instantText(h));
  add('local clock time', h.clockTime, 'date-time', `${formatSerialIso(h.clockTime)} on the clock; ${describeDaylightSaving(rule)}${rule ? '; standard time is clock time less the daylight-saving shift inside the period' : ''}`);
  add('sun altitude', h.sunAltitude, '°', `NREL SPA (Reda & Andreas 2008) at ${when} local standard time, with refraction`);
  add('sun azimuth', h.sunAzimuth, '°', 'NREL SPA, clockwise from north');
  add('incidence angle', h.incidence, '°', 'angle between the sun and the window normal: cos θ = sin β cos Σ + cos β sin Σ cos(φ − ψ)');
  add('profile angle', h.profileAngle, '°', 'vertical shadow angle: tan Ω = tan β / cos γ');
  add('sunlit fraction', h.sunlitFraction, '', 'union of the shadow polygons of overhang, fins and reveal on the glazing; 0 when the sun is down, behind the wall or behind the skyline');
  add('direct normal irradiance', h.dni, 'W/m²', h.yearFit ? `${h.weatherSource}; ${h.yearFit}` : h.weatherSource);
  add('diffuse horizontal irradiance', h.dhi, 'W/m²', h.weatherSource);
  const view = viewText(spec, h);
  add('sky view ratio', h.skyViewRatio, '', view.sky);
  add('ground view ratio', h.groundViewRatio, '', view.ground);
  add('horizon band share', h.horizonShare, '', view.horizon);
  add('beam on the window', h.beam, 'W/m²', 'DNI × cos θ (unshaded; 0 with the sun down or behind the window)');
  const model = skyModelOf(spec);
  add('sky diffuse on the bare window', h.skyUnshaded, 'W/m²', `${SKY_MODEL_NAME[model]}, no devices and no skyline`);
  add('sky diffuse on the window', h.sky, 'W/m²', h.diffuseShading === 'beamOnly' ? SKY_MODEL_TEXT_BEAM_ONLY[model] : SKY_MODEL_TEXT[model]);
  add('ground-reflected on the bare window', h.groundUnshaded, 'W/m²', `GHI × albedo ${spec.groundAlbedo} × (1 − cos tilt) / 2`);
  add('ground-reflected on the window', h.ground, 'W/m²', h.diffuseShading === 'beamOnly' ? 'as on the bare window (beam-only treatment)' : 'ground-reflected on the bare window × ground view ratio');
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

/** Where the sun was taken, in words: the date-time as given, the convention, the instant used. */
function instantText(h: WindowGainHour): string {
  const given = formatSerialIso(h.stamp);
  const used = formatSerialIso(h.dateTime);
  const row = h.row !== undefined ? `; row ${h.row + 1} of the hourly year` : '';
  return h.convention === 'hourEnding'
    ? `local standard time ${used}: the middle of the hour ending ${given} (time convention hourEnding)${row}`
    : `local standard time ${used}: the date-time itself (time convention instant)${row}`;
}

/**
 * The gain of one window for one hour, explained step by step.
 * @param spec - the window (validated; errors name the field by its path)
 * @param dateTime - local date-time (serial): standard time, or clock time when the site has a
 *   daylight-saving rule; read by the window's `timeConvention` (default `hourEnding`: the hour
 *   ending at `dateTime`, sun at mid-hour)
 * @param weatherHour - DNI and DHI of the hour [W/m²]; omitted: from `spec.weather`
 * @returns the ordered steps: the instant the sun was taken at, clock time → sun altitude and azimuth → incidence and profile angles → sunlit
 *   fraction → DNI, DHI → sky and ground view ratios and horizon band share → irradiance on the bare
 *   window and on the shaded window by part → SHGC at the angle, diffuse SHGC →
 *   interior attenuation → glass area → gain by part [W] → radiant and convective parts. At night the
 *   irradiance and gain steps are 0.
 * @remarks Same calculation as {@link windowGainAt}; see src/core/gain/windowGain.ts for the equation and source.
 */
export function gainSteps(spec: WindowSpec, dateTime: number, weatherHour?: WeatherHour): GainStep[] {
  const w = prepareWindow(forHour(spec, dateTime));
  requireStamp('dateTime', dateTime, w.convention);
  return stepsOf(spec, gainAtStamp(w, standardStamp(w, dateTime), weatherHour));
}
