/**
 * The hourly series of one window over a year: 8760 rows (8784 in a leap year), each stamped at the
 * END of its hour with the sun at the middle of the hour (DESIGN.md), in typed-array columns.
 *
 * Same calculation as {@link windowGainAt} hour by hour (the tests hold them together), written for
 * speed: the sun path comes from {@link annualSunPath} (slow terms once a day), everything that
 * does not change by the hour (SHGC curve, glass area, sky view factor) is worked out once, and
 * nothing is allocated per hour except what the sky model's call returns.
 *
 * Weather: clear-sky models (12 monthly values or one for the year) at each hour's sun; a supplied
 * DNI + DHI series; or a supplied GHI series split by Erbs et al. (1982). A non-finite value in a
 * supplied series marks that row missing: `missing[i] = 1`, and its irradiance and gain are 0 —
 * the summary counts these hours so they never pass for dark ones.
 */
import { SunpaneError } from './errors';
import { type PreparedWindow, monthlyValue, prepareWindow } from './gain';
import { type PlaneIrradianceInput, ashraeClearSky, decomposeErbs, ineichenPerezClearSky, planeIrradiance } from './sky';
import { sunlitFraction } from './shading';
import { annualSunPath } from './sun';
import { DEG, RAD, acosClamped } from './angles';
import { daysInMonth } from './time';
import type { WindowSpec } from './window';

/** One window's year, hour by hour. Every column has `hours` entries; row i is the hour ending at stampSerial[i]. */
export interface AnnualSeries {
  name: string;
  year: number;
  /** 8760, or 8784 in a leap year. */
  hours: number;
  /** Glass area [m²]. */
  glassArea: number;
  /** Local standard-time serial at the END of each hour. */
  stampSerial: Float64Array;
  /** Sun at the middle of the hour [°]. */
  sunAltitude: Float64Array;
  sunAzimuth: Float64Array;
  /** Incidence angle on the glass [°], 0…180 (> 90: sun behind the window). */
  incidence: Float64Array;
  /** Profile angle [°] (src/core/surface.ts). */
  profileAngle: Float64Array;
  /** Sunlit fraction of the glazing, 0…1 (0 with the sun down, behind the wall or the skyline). */
  sunlitFraction: Float64Array;
  /** Direct normal and diffuse horizontal irradiance used [W/m²] (0 on missing rows). */
  dni: Float64Array;
  dhi: Float64Array;
  /** Irradiance on the window plane [W/m²]: beam (unshaded), sky diffuse, ground reflected. */
  beam: Float64Array;
  sky: Float64Array;
  ground: Float64Array;
  /** SHGC at the incidence angle (0 with the sun behind the window). */
  shgc: Float64Array;
  /** Window solar gain [W], and its radiant and convective parts. */
  gain: Float64Array;
  radiant: Float64Array;
  convective: Float64Array;
  /** 1 where the weather series has no value for the hour (gain etc. 0), else 0. */
  missing: Uint8Array;
}

/** Month (1…12) of each day of the year, index 0 = 1 January. */
export function monthOfDay(year: number): Uint8Array {
  const out = new Uint8Array(366);
  let d = 0;
  for (let m = 1; m <= 12; m++) {
    const n = daysInMonth(year, m);
    out.fill(m, d, d + n);
    d += n;
  }
  return out;
}

/**
 * The hourly series of one window over `spec.year`.
 * @param spec - the window (validated; errors name the field by its path; a supplied series of the
 *   wrong length is refused naming `weather.dni`, `weather.dhi` or `weather.ghi`)
 * @returns the columns of {@link AnnualSeries}; night rows have zero beam, sunlit fraction and (for
 *   clear-sky weather) zero irradiance; missing rows are flagged and zero
 * @remarks Per hour: sun by the NREL SPA (annual fast path), incidence and profile angles, sunlit
 *   fraction by shadow polygons, irradiance on the plane by the chosen sky model, then
 *   Q = A · IAC · [E_beam · F_sunlit · SHGC(θ) + (E_sky + E_ground) · SHGC_d] as in src/core/gain.ts.
 */
export function annualSeries(spec: WindowSpec): AnnualSeries {
  const w = prepareWindow(spec);
  return annualOfPrepared(w);
}

/** {@link annualSeries} for a window already prepared. */
export function annualOfPrepared(w: PreparedWindow): AnnualSeries {
  const { spec } = w;
  const path = annualSunPath(spec.year, spec.site);
  const n = w.hours;
  if (path.hours !== n) throw new SunpaneError('year', spec.year, `sun path has ${path.hours} hours, expected ${n}`);
  const col = () => new Float64Array(n);
  const out: AnnualSeries = {
    name: spec.name,
    year: spec.year,
    hours: n,
    glassArea: w.glassArea,
    stampSerial: Float64Array.from(path.stampSerial),
    sunAltitude: Float64Array.from(path.altitude),
    sunAzimuth: Float64Array.from(path.azimuth),
    incidence: col(),
    profileAngle: col(),
    sunlitFraction: col(),
    dni: col(),
    dhi: col(),
    beam: col(),
    sky: col(),
    ground: col(),
    shgc: col(),
    gain: col(),
    radiant: col(),
    convective: col(),
    missing: new Uint8Array(n),
  };
  const months = monthOfDay(spec.year);
  const { curve, vertical, skyViewFactor } = w;
  const shgcDiffuse = curve.diffuse;
  const k = w.glassArea * w.interiorAttenuation;
  const fr = w.radiantFraction;
  const tilt = spec.surfaceTilt;
  const surfAz = spec.surfaceAzimuth;
  const albedo = spec.groundAlbedo;
  const model = spec.skyModel;
  const opening = { width: spec.width, height: spec.height };
  const shading = spec.shading;
  const weather = spec.weather;
  const elevation = spec.site.elevation ?? 0;
  const alt = path.altitude;
  const az = path.azimuth;
  const zen = path.zenith;
  const cosTilt = Math.cos(tilt * RAD);
  const planeInput: PlaneIrradianceInput = { dni: 0, dhi: 0, sunAltitude: 0, sunAzimuth: 0, surfaceTilt: tilt, surfaceAzimuth: surfAz, albedo, dayOfYear: 1, model, skyViewFactor };
  const sinTilt = Math.sin(tilt * RAD);

  for (let i = 0; i < n; i++) {
    const day = (i / 24) | 0;
    const doy = day + 1;
    const month = months[day];
    const a = alt[i];
    const s = az[i];
    const sunUp = a > 0;
    // Incidence and profile angles with the surface's trig worked out once (same formulas as
    // src/core/surface.ts incidenceAngle / profileAngle — D&B Eq. 1.6.3, 1.9.1a — without the
    // per-call argument checks; the agreement tests with windowGainAt hold them together).
    const betaRad = a * RAD;
    const sinBeta = Math.sin(betaRad);
    const cosBeta = Math.cos(betaRad);
    const cosGamma = Math.cos((s - surfAz) * RAD);
    const theta = acosClamped(sinBeta * cosTilt + cosBeta * sinTilt * cosGamma) * DEG; // D&B Eq. 1.6.3
    const omega = Math.atan2(sinBeta, cosBeta * cosGamma) * DEG; // D&B Eq. 1.9.1a
    const front = sunUp && theta < 90;
    // Geometry first, for every row (missing weather does not hide where the sun is).
    const lit = !front ? 0 : vertical ? sunlitFraction(opening, shading, a, s, surfAz) : 1;
    const g = theta < 90 ? curve.atAngle(theta) : 0;
    out.incidence[i] = theta;
    out.profileAngle[i] = omega === -180 ? 180 : omega;
    out.sunlitFraction[i] = lit;
    out.shgc[i] = g;

    let dni: number;
    let dhi: number;
    switch (weather.kind) {
      case 'ashraeClearSky': {
        if (!sunUp) continue; // clear sky with the sun down: no irradiance (the columns start at 0)
        const c = ashraeClearSky(a, doy, monthlyValue(weather.tauB, month), monthlyValue(weather.tauD, month));
        dni = c.dni;
        dhi = c.dhi;
        break;
      }
      case 'ineichenClearSky': {
        if (!sunUp) continue;
        const c = ineichenPerezClearSky(a, doy, monthlyValue(weather.linkeTurbidity, month), elevation);
        dni = c.dni;
        dhi = c.dhi;
        break;
      }
      case 'measured':
        dni = weather.dni[i];
        dhi = weather.dhi[i];
        if (!(Number.isFinite(dni) && Number.isFinite(dhi))) {
          out.missing[i] = 1;
          continue;
        }
        break;
      default: {
        const ghi = weather.ghi[i];
        if (!Number.isFinite(ghi)) {
          out.missing[i] = 1;
          continue;
        }
        const d = decomposeErbs(ghi, zen[i], doy);
        dni = d.dni;
        dhi = d.dhi;
      }
    }
    out.dni[i] = dni;
    out.dhi[i] = dhi;
    if (dhi === 0 && (dni === 0 || !sunUp)) continue; // dark hour: irradiance and gain stay 0

    // One input record reused for every hour (no allocation per hour on our side).
    planeInput.dni = sunUp ? dni : 0;
    planeInput.dhi = dhi;
    planeInput.sunAltitude = a;
    planeInput.sunAzimuth = s;
    planeInput.dayOfYear = doy;
    const plane = planeIrradiance(planeInput);
    // Gain equation of src/core/gain.ts windowGainParts, inlined for the hourly path.
    const q = k * (plane.beam * lit * g + (plane.sky + plane.ground) * shgcDiffuse);
    out.beam[i] = plane.beam;
    out.sky[i] = plane.sky;
    out.ground[i] = plane.ground;
    out.gain[i] = q;
    out.radiant[i] = fr * q;
    out.convective[i] = (1 - fr) * q;
  }
  return out;
}
