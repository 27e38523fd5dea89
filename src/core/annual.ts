/**
 * The hourly series of one window over a year: 8760 rows (8784 in a leap year), each stamped at the
 * END of its hour with the sun at the middle of the hour (DESIGN.md), in typed-array columns.
 *
 * Same calculation as {@link windowGainAt} hour by hour (the tests hold them together), written for
 * speed: the sun path comes from {@link annualSunPath} (slow terms every second day, interpolated);
 * everything that does not change by the hour (SHGC curve, glass area, sky view factor, the shading
 * and the plane's checks, the day's extraterrestrial irradiance) is worked out once; per hour only
 * the kernels run that the checked functions share ({@link prepareShading}, {@link preparePlane}),
 * with the sun's sines and cosines taken from the sun path (which has them from its topocentric
 * vector, parked in output columns until their row is written), and nothing is allocated. Hours that cannot matter are skipped: no shading with the sun down or
 * behind the wall, no shadow work with the sun below the skyline, no sky model in the dark.
 * The shadow union is a closed form (src/core/shadowPlan.ts), the Kasten–Young power a tabulated
 * series (src/core/airMass.ts), the SHGC table filled on first use (src/core/glazing.ts).
 * tests/core/preparedFast.test.ts holds every hour to the checked functions within 1e-12 (the
 * incidence angle within 1e-9 °: acos amplifies rounding near 0° and 180°).
 *
 * Speed (`npm run bench`, window_annual_vs_suncalc, on the shared 2-core machine): about 4.4 ms a
 * year two rounds ago, 2.2–2.5 ms (best of many runs) after the last, of which the sun path is
 * 0.75–0.9 ms; suncalc 2.0.2's bare getPosition for the same 8760 instants 2.0–2.5 ms. With the
 * sun's sines and cosines from the sun path: 5–7 % less than that in the same process (medians of
 * 300 interleaved rounds, 2.21–2.27 ms against 2.37–2.39 ms; 0.97–1.08 of suncalc).
 *
 * Weather: clear-sky models (12 monthly values or one for the year) at each hour's sun; a supplied
 * DNI + DHI series; or a supplied GHI series split by Erbs et al. (1982). A non-finite value in a
 * supplied series marks that row missing: `missing[i] = 1`, and its irradiance and gain are 0 —
 * the summary counts these hours so they never pass for dark ones.
 */
import { SunpaneError } from './errors';
import { type PreparedWindow, monthlyValue, prepareWindow } from './gain';
import { ashraeClearSky, decomposeErbs, extraterrestrialSpencer, ineichenPerezClearSky } from './sky';
import { type PlaneParts, preparePlane } from './planeIrradiance';
import { prepareShading } from './shading';
import { annualSunPath } from './sun';
import { DEG, RAD, acosClamped, wrap180 } from './angles';
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
  /**
   * Profile angle [°] as src/core/surface.ts `profileAngle` gives it: −90…90 with the sun in front
   * of the wall; |Ω| ≥ 90 when the sun is in or behind the wall plane (no shadow geometry then).
   */
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
  /** SHGC for the beam at the incidence angle; 0 when no beam can reach the glass (sun down or behind the window). */
  shgc: Float64Array;
  /** Window solar gain [W], and its radiant and convective parts. */
  gain: Float64Array;
  radiant: Float64Array;
  convective: Float64Array;
  /** 1 where the weather series has no value for the hour (gain etc. 0), else 0. */
  missing: Uint8Array;
}

/**
 * `wrap180(d)` of src/core/angles.ts without its floating-point remainder when |d| < 360 (there the
 * remainder is d itself, so the result is the same number); other values go to wrap180.
 * @param d - an angle difference [°], any finite value
 * @returns the same number as wrap180(d), −180…180
 */
export function wrapDifference180(d: number): number {
  if (!(d > -360 && d < 360)) return wrap180(d);
  const r = d < 0 ? d + 360 : d; // wrap360: d + 360 may round to 360, which the next line maps to 0 as wrap180 does
  return r > 180 ? r - 360 : r;
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
  const n = w.hours;
  const col = () => new Float64Array(n);
  // The sun path parks the sines and cosines of the sun's altitude and azimuth in four output
  // columns that the hourly loop fills in every row, each row read before it is overwritten (no
  // allocation for them).
  const incidence = col();
  const profileAngle = col();
  const sunlitFraction = col();
  const shgc = col();
  const trig = { sinAltitude: incidence, cosAltitude: profileAngle, sinAzimuth: sunlitFraction, cosAzimuth: shgc };
  const path = annualSunPath(spec.year, spec.site, { trig });
  if (path.hours !== n) throw new SunpaneError('year', spec.year, `sun path has ${path.hours} hours, expected ${n}`);
  // The sun path's columns are fresh arrays of this call: the series takes them over without copying.
  const out: AnnualSeries = {
    name: spec.name,
    year: spec.year,
    hours: n,
    glassArea: w.glassArea,
    stampSerial: path.stampSerial,
    sunAltitude: path.altitude,
    sunAzimuth: path.azimuth,
    incidence,
    profileAngle,
    sunlitFraction,
    dni: col(),
    dhi: col(),
    beam: col(),
    sky: col(),
    ground: col(),
    shgc,
    gain: col(),
    radiant: col(),
    convective: col(),
    missing: new Uint8Array(n),
  };
  fillWeather(w, path.altitude, path.zenith, out);

  const { curve, vertical } = w;
  const shgcDiffuse = curve.diffuse;
  const k = w.glassArea * w.interiorAttenuation;
  const fr = w.radiantFraction;
  const tilt = spec.surfaceTilt;
  const surfAz = spec.surfaceAzimuth;
  // Checked once here; per hour only the kernels run (the same ones the checked functions use).
  const shade = vertical ? prepareShading({ width: spec.width, height: spec.height }, spec.shading, surfAz) : undefined;
  const plane = preparePlane({ surfaceTilt: tilt, surfaceAzimuth: surfAz, groundAlbedo: spec.groundAlbedo, skyModel: spec.skyModel, skyViewFactor: w.skyViewFactor });
  const dniExtra = new Float64Array(367);
  if (plane.needsDniExtra) for (let d = 1; d <= 366; d++) dniExtra[d] = extraterrestrialSpencer(d);
  const parts: PlaneParts = { beam: 0, sky: 0, ground: 0, total: 0 };
  const alt = path.altitude;
  const az = path.azimuth;
  const { dni: dniColumn, dhi: dhiColumn, missing, beam, sky, ground, gain, radiant, convective } = out;
  const cosTilt = Math.cos(tilt * RAD);
  const sinTilt = Math.sin(tilt * RAD);
  const cosSurf = Math.cos(surfAz * RAD);
  const sinSurf = Math.sin(surfAz * RAD);
  const { sinAltitude: sinAlt, cosAltitude: cosAlt, sinAzimuth: sinAz, cosAzimuth: cosAz } = trig;

  for (let i = 0; i < n; i++) {
    const a = alt[i];
    const s = az[i];
    const sunUp = a > 0;
    // Incidence and profile angles with the surface's trig worked out once (same formulas as
    // src/core/surface.ts incidenceAngle / profileAngle — D&B Eq. 1.6.3, 1.9.1a — without the
    // per-call argument checks; the agreement tests with windowGainAt hold them together).
    // The sun's sines and cosines come with the sun path (from its topocentric vector, within a few
    // ulps of Math.sin / Math.cos of the columns); those of γ = surface azimuth − sun azimuth by the
    // difference formulas, the surface's once.
    const sinBeta = sinAlt[i];
    const cosBeta = cosAlt[i];
    const gamma = wrapDifference180(surfAz - s); // horizontal shadow angle (src/core/shading.ts convention)
    const sinGamma = sinSurf * cosAz[i] - cosSurf * sinAz[i];
    const cosGamma = cosSurf * cosAz[i] + sinSurf * sinAz[i];
    const cosTheta = sinBeta * cosTilt + cosBeta * sinTilt * cosGamma; // D&B Eq. 1.6.3
    const theta = acosClamped(cosTheta) * DEG;
    // D&B Eq. 1.9.1a, Ω = atan2(sin β, cos β cos γ), by one atan of the ratio: with the second
    // argument above 0 that is what fdlibm's atan2 does (same value); below 0 (sun behind the wall)
    // atan2(y, x) = ±π − atan(y / −x), + for y ≥ 0 (within an ulp of π of atan2's value).
    const horizontal = cosBeta * cosGamma;
    const omega =
      (horizontal > 0
        ? Math.atan(sinBeta / horizontal)
        : horizontal < 0
          ? (sinBeta >= 0 ? Math.PI : -Math.PI) - Math.atan(sinBeta / -horizontal)
          : Math.atan2(sinBeta, horizontal)) * DEG;
    const front = sunUp && theta < 90;
    // Geometry first, for every row (missing weather does not hide where the sun is).
    const lit = !front ? 0 : shade !== undefined ? shade.sunlitInWallFrame(a, s, gamma, sinBeta, cosBeta, sinGamma, cosGamma) : 1;
    const g = front ? curve.atAngle(theta) : 0;
    incidence[i] = theta;
    profileAngle[i] = omega === -180 ? 180 : omega;
    sunlitFraction[i] = lit;
    shgc[i] = g;

    if (missing[i] === 1) continue;
    const dni = dniColumn[i];
    const dhi = dhiColumn[i];
    if (dhi === 0 && (dni === 0 || !sunUp)) continue; // dark hour: irradiance and gain stay 0
    plane.irradiance(parts, sunUp ? dni : 0, dhi, a, sinBeta, cosTheta, dniExtra[((i / 24) | 0) + 1]);
    // Gain equation of src/core/gain.ts windowGainParts, inlined for the hourly path.
    const q = k * (parts.beam * lit * g + (parts.sky + parts.ground) * shgcDiffuse);
    beam[i] = parts.beam;
    sky[i] = parts.sky;
    ground[i] = parts.ground;
    gain[i] = q;
    radiant[i] = fr * q;
    convective[i] = (1 - fr) * q;
  }
  return out;
}

/**
 * Fills the dni, dhi and missing columns from the window's weather, one loop per kind (no switch
 * per hour): clear-sky models at each hour's sun (0 with the sun down), a supplied series as given
 * (a non-finite value marks the row missing), or a supplied GHI series split by Erbs et al.
 */
function fillWeather(w: PreparedWindow, alt: Float64Array, zen: Float64Array, out: AnnualSeries): void {
  const weather = w.spec.weather;
  const n = out.hours;
  const { dni, dhi, missing } = out;
  const months = monthOfDay(w.spec.year);
  switch (weather.kind) {
    case 'ashraeClearSky':
      for (let day = 0; day * 24 < n; day++) {
        const month = months[day];
        const tauB = monthlyValue(weather.tauB, month);
        const tauD = monthlyValue(weather.tauD, month);
        for (let i = day * 24; i < day * 24 + 24; i++) {
          if (!(alt[i] > 0)) continue; // sun down: no irradiance (the columns start at 0)
          const c = ashraeClearSky(alt[i], day + 1, tauB, tauD);
          dni[i] = c.dni;
          dhi[i] = c.dhi;
        }
      }
      return;
    case 'ineichenClearSky': {
      const elevation = w.spec.site.elevation ?? 0;
      for (let day = 0; day * 24 < n; day++) {
        const linke = monthlyValue(weather.linkeTurbidity, months[day]);
        for (let i = day * 24; i < day * 24 + 24; i++) {
          if (!(alt[i] > 0)) continue;
          const c = ineichenPerezClearSky(alt[i], day + 1, linke, elevation);
          dni[i] = c.dni;
          dhi[i] = c.dhi;
        }
      }
      return;
    }
    case 'measured': {
      const dniIn = weather.dni;
      const dhiIn = weather.dhi;
      for (let i = 0; i < n; i++) {
        const b = dniIn[i];
        const d = dhiIn[i];
        if (Number.isFinite(b) && Number.isFinite(d)) {
          dni[i] = b;
          dhi[i] = d;
        } else missing[i] = 1;
      }
      return;
    }
    case 'globalHorizontal': {
      const ghiIn = weather.ghi;
      for (let i = 0; i < n; i++) {
        const ghi = ghiIn[i];
        if (!Number.isFinite(ghi)) {
          missing[i] = 1;
          continue;
        }
        const d = decomposeErbs(ghi, zen[i], ((i / 24) | 0) + 1);
        dni[i] = d.dni;
        dhi[i] = d.dhi;
      }
    }
  }
}
