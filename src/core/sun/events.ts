/**
 * Sunrise, solar noon and sunset of a local calendar day, found on the NREL SPA.
 *
 * Source: Reda, I. & Andreas, A., *Solar Position Algorithm for Solar Radiation Applications*,
 * NREL/TP-560-34302 (revised January 2008), Appendix A.2 (the rise/transit/set definitions: the
 * upper limb on the refracted horizon, h′0 = −(0.26667° + 0.5667°)). The search itself is ours:
 * transits by Newton iteration on the hour angle, rise and set by the Illinois method between
 * consecutive transits, which works on the LOCAL day asked for rather than the report's UT day.
 * Its probes take the SPA's slow terms from nodes two days apart, interpolated
 * (src/core/sun/sunNodes.ts), and transits are found only as far as the day reaches (four or
 * five of them, not nine): a call costs some 46 cheap probes and about seven full SPA evaluations
 * instead of ninety, a neighbouring day at the same ΔT next to none; tests/core/sun/events.test.ts holds the
 * results to the definitions on the direct SPA.
 */
import { DEG, RAD, asinClamped, wrap180 } from '../common';
import { clockToStandard, type DaylightSavingRule, MIN_SERIAL, requireSerial, requireUtcOffset, serialToUtcMs, standardToClock, utcMsToSerial } from '../time';
import { RISE_SET_ALTITUDE, type ResolvedSunOptions, type SunOptions, requireInstant, requireSite, resolveSunOptions } from './spa';
import { type GeocentricHourAngle, geocentricFromNodes } from './sunNodes';

const { sin, cos, abs, floor } = Math;

const MS_PER_DAY = 86_400_000;
const probe: GeocentricHourAngle = { hourAngle: 0, declination: 0 };
/** Reused result of {@link eventProbe}: read before the next probe. */
const probed = { altitude: 0, hourAngle: 0 };

/** Sunrise, solar noon and sunset of one local day. */
export interface SunEvents {
  /** `polarDay`: the sun stays above the rise/set altitude all local day; `polarNight`: below it all day. */
  condition: 'normal' | 'polarDay' | 'polarNight';
  /** Local standard-time serial of sunrise, or null when the sun does not rise during the local day. */
  sunrise: number | null;
  /** Local serial of the upper transit (the sun due south or north); also given in polar day and night. */
  solarNoon: number;
  /** Local serial of sunset, or null when the sun does not set during the local day. */
  sunset: number | null;
}

/**
 * Geocentric altitude of the sun's centre without refraction [°] and the geocentric local hour angle
 * H [°] at an instant: the quantities the SPA's rise/transit/set routine (Appendix A.2) works with.
 * The slow terms (α, δ, nutation) come from the SPA at nodes two days apart, interpolated
 * (src/core/sun/sunNodes.ts: within 1e-6° of the direct SPA, its stated uncertainty being
 * ±0.0003°), so that the search's hundred-odd probes cost a handful of full SPA evaluations, and
 * none for a neighbouring day at the same ΔT.
 */
function eventProbe(utcMs: number, latitude: number, longitude: number, o: ResolvedSunOptions): { altitude: number; hourAngle: number } {
  const g = geocentricFromNodes(utcMs, longitude, o.deltaT, probe);
  const latRad = latitude * RAD;
  const deltaRad = g.declination * RAD;
  const altitude = asinClamped(sin(latRad) * sin(deltaRad) + cos(latRad) * cos(deltaRad) * cos(g.hourAngle * RAD)) * DEG; // as Eq. 41 with geocentric δ, H (Appendix A.2)
  probed.altitude = altitude;
  probed.hourAngle = g.hourAngle;
  return probed;
}

/** Instant near `guessMs` when the geocentric hour angle is `target` (0 upper, 180 lower transit). */
function transitNear(guessMs: number, target: number, latitude: number, longitude: number, o: ResolvedSunOptions): number {
  let t = guessMs;
  for (let i = 0; i < 8; i++) {
    // The hour angle advances about 360° per day (sidereal rate less the sun's motion).
    const offset = wrap180(eventProbe(t, latitude, longitude, o).hourAngle - target);
    t -= (offset / 360) * MS_PER_DAY;
    if (abs(offset) < 1e-8) break;
  }
  return t;
}

/** Root of altitude − RISE_SET_ALTITUDE between a and b (opposite signs) by the Illinois method. */
function crossing(a: number, fa: number, b: number, fb: number, latitude: number, longitude: number, o: ResolvedSunOptions): number {
  let side = 0;
  for (let i = 0; i < 60 && b - a > 1; i++) {
    const c = (a * fb - b * fa) / (fb - fa);
    const fc = eventProbe(c, latitude, longitude, o).altitude - RISE_SET_ALTITUDE;
    if (fc === 0) return c;
    if (fc * fb > 0) {
      b = c;
      fb = fc;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb /= 2;
      side = 1;
    }
    if (abs(fc) < 1e-7) return c;
  }
  return (a + b) / 2;
}

/**
 * Sunrise, solar noon and sunset on a local calendar day.
 * @param localDate - spreadsheet serial in local standard time; only its calendar day is used
 * @param latitude - [°] −90…90, north positive
 * @param longitude - [°] −180…180, east positive
 * @param utcOffset - standard-time offset from UTC [h], −12…14, east positive
 * @param options - elevation, pressure, temperature (these do not change the rise/set definition), ΔT
 * @returns local serials. Sunrise/sunset: the sun's upper limb on the horizon, i.e. geocentric
 *   geometric altitude of the centre −(0.26667° + 0.5667°), the SPA's convention (Appendix A.2,
 *   h′0); pressure and temperature do not change it. Solar noon: the upper transit (geocentric
 *   local hour angle 0, as in Appendix A.2) inside the local day, or the one nearest the day's
 *   middle in the rare day without one. `condition` is `polarDay` / `polarNight` with null rise and
 *   set when the sun stays above / below that altitude all day. On a day when only one of the two
 *   events happens (near the polar circles, or when an event falls just across midnight) the other
 *   is null and the condition is `normal`; if an event happens twice in one day, the first is given.
 * @remarks Events are found on the SPA (its slow terms interpolated between nodes two days apart,
 *   within 1e-6° of the direct algorithm): transits by Newton iteration on the hour angle, rise
 *   and set by the Illinois method between consecutive transits (altitude is monotonic there). This
 *   replaces the SPA's Appendix A.2 interpolation, which works on the UT day.
 */
export function sunEvents(localDate: number, latitude: number, longitude: number, utcOffset: number, options?: SunOptions): SunEvents {
  requireSerial('date', localDate);
  requireSite(latitude, longitude);
  requireUtcOffset(utcOffset);
  const o = resolveSunOptions(options);
  const dayStart = serialToUtcMs(floor(localDate), utcOffset);
  const dayEnd = dayStart + MS_PER_DAY;
  requireInstant(dayStart - MS_PER_DAY, o.deltaT !== undefined);

  // Upper transit nearest local noon, then alternating lower/upper transits half a day apart (k
  // half days from it, up to two days either way), only as far as the intervals between them reach
  // into the local day: one transit before its start and one at or after its end.
  const noon = transitNear(dayStart + MS_PER_DAY / 2, 0, latitude, longitude, o);
  const transits: number[] = [noon];
  let first = 0;
  while (first > -4 && transits[0] >= dayStart) {
    first--;
    transits.unshift(transitNear(noon + (first * MS_PER_DAY) / 2, first % 2 === 0 ? 0 : 180, latitude, longitude, o));
  }
  for (let k = 1; k <= 4 && transits[transits.length - 1] < dayEnd; k++) transits.push(transitNear(noon + (k * MS_PER_DAY) / 2, k % 2 === 0 ? 0 : 180, latitude, longitude, o));
  const f = transits.map((t) => eventProbe(t, latitude, longitude, o).altitude - RISE_SET_ALTITUDE);

  let sunrise: number | null = null;
  let sunset: number | null = null;
  let solarNoon: number | null = null;
  for (let k = 0; k < transits.length; k++) {
    const isUpper = (k + first) % 2 === 0;
    if (isUpper && transits[k] >= dayStart && transits[k] < dayEnd && solarNoon === null) solarNoon = transits[k];
    if (k + 1 === transits.length) break;
    const [a, b] = [transits[k], transits[k + 1]];
    if (b < dayStart || a >= dayEnd || f[k] * f[k + 1] >= 0) continue;
    const t = crossing(a, f[k], b, f[k + 1], latitude, longitude, o);
    if (t < dayStart || t >= dayEnd) continue;
    if (isUpper) sunset ??= t;
    else sunrise ??= t;
  }
  if (solarNoon === null) {
    const middle = dayStart + MS_PER_DAY / 2;
    solarNoon = transits.filter((_, k) => (k + first) % 2 === 0).reduce((best, t) => (abs(t - middle) < abs(best - middle) ? t : best));
  }
  let condition: SunEvents['condition'] = 'normal';
  if (sunrise === null && sunset === null) {
    const probeAt = solarNoon >= dayStart && solarNoon < dayEnd ? solarNoon : dayStart;
    condition = eventProbe(probeAt, latitude, longitude, o).altitude > RISE_SET_ALTITUDE ? 'polarDay' : 'polarNight';
  }
  const toSerial = (t: number | null) => (t === null ? null : utcMsToSerial(t, utcOffset));
  return { condition, sunrise: toSerial(sunrise), solarNoon: utcMsToSerial(solarNoon, utcOffset), sunset: toSerial(sunset) };
}

/**
 * Sunrise, solar noon and sunset on a local calendar day of the CLOCK: under a daylight-saving rule
 * the day runs from the clock's midnight to the next (in standard time from `clockToStandard(D)`
 * to `clockToStandard(D + 1)`, 23 or 25 hours on the days the clocks change), and the events are
 * given as clock readings. An event of the standard day before that falls after the clock's
 * midnight (a sunset just before standard midnight, near the polar circles) belongs to it, and one
 * of the standard day that falls after the next clock midnight does not. Without a rule this is
 * {@link sunEvents}.
 * @param clockDate - spreadsheet serial (1900 system) of the clock day; only its calendar day is used
 * @param rule - a checked daylight-saving rule, or undefined for standard time
 * @returns as {@link sunEvents}, with clock-time serials; if an event happens twice in the clock
 *   day, the first is given; solar noon is the transit in the clock day, or (a day of 23 hours
 *   without one, where solar noon falls near midnight) the one nearest the day's middle
 */
export function sunEventsOnClock(clockDate: number, latitude: number, longitude: number, utcOffset: number, rule: DaylightSavingRule | undefined, options?: SunOptions): SunEvents {
  if (rule === undefined) return sunEvents(clockDate, latitude, longitude, utcOffset, options);
  requireSerial('date', clockDate);
  const day = floor(clockDate);
  const from = clockToStandard(day, rule);
  const to = clockToStandard(day + 1, rule);
  const own = sunEvents(day, latitude, longitude, utcOffset, options);
  // The clock day starts before the standard one while the clocks are ahead at its midnight.
  const before = from < day && day - 1 >= MIN_SERIAL ? sunEvents(day - 1, latitude, longitude, utcOffset, options) : undefined;
  const inDay = (t: number | null | undefined): t is number => typeof t === 'number' && t >= from && t < to;
  const first = (key: 'sunrise' | 'sunset' | 'solarNoon'): number | null => {
    const t = [before?.[key], own[key]].find(inDay);
    return t === undefined ? null : standardToClock(t, rule);
  };
  const sunrise = first('sunrise');
  const sunset = first('sunset');
  // A clock day of 23 hours (the clocks go forward) may hold no transit where solar noon falls near
  // midnight: then, as in sunEvents, the transit nearest the day's middle.
  const middle = (from + to) / 2;
  const nearest = [before?.solarNoon, own.solarNoon].filter((t): t is number => t !== undefined).reduce((best, t) => (abs(t - middle) < abs(best - middle) ? t : best));
  const noon = first('solarNoon') ?? standardToClock(nearest, rule);
  const condition = sunrise === null && sunset === null ? own.condition : 'normal';
  return { condition, sunrise, solarNoon: noon, sunset };
}
