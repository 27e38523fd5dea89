/**
 * Sunrise, solar noon and sunset (src/core/sun/events.ts) against the definitions they stand for,
 * worked out on the direct SPA (src/core/sun/spa.ts, itself held to the NREL report's worked
 * example, astronomy-engine and suncalc in tests/reference): Reda & Andreas 2008, NREL/TP-560-34302,
 * Appendix A.2 — rise and set where the sun's geocentric centre is at h′0 = −0.8334° (the upper limb
 * on the refracted horizon), transit where the geocentric local hour angle is 0.
 *
 * The search works on the SPA's slow terms interpolated between nodes (src/core/sun/sunNodes.ts);
 * these checks use the direct SPA at every instant, so they hold the search and the interpolation
 * together. Over the days the SPA covers (1900–9999, the worksheet's dates), places from pole to pole,
 * ΔT by default and given.
 */
import { DEG, RAD } from '../../../src/core/common';
import { RISE_SET_ALTITUDE, spaSteps } from '../../../src/core/sun/spa';
import { sunEvents } from '../../../src/core/sun/events';
import { civilToSerial, serialToUtcMs } from '../../../src/core/time/calendar';
import { Mismatches } from '../../support/mismatches';
import { seeded } from '../../support/sky';

/** Geocentric altitude of the sun's centre without refraction [°] and hour angle (−180, 180] [°], by the direct SPA. */
function direct(utcMs: number, latitude: number, longitude: number, deltaT: number | undefined): { altitude: number; hourAngle: number } {
  const s = spaSteps(utcMs, latitude, longitude, deltaT === undefined ? undefined : { deltaT });
  const phi = latitude * RAD;
  const delta = s.delta * RAD;
  const altitude = Math.asin(Math.sin(phi) * Math.sin(delta) + Math.cos(phi) * Math.cos(delta) * Math.cos(s.H * RAD)) * DEG;
  return { altitude, hourAngle: s.H > 180 ? s.H - 360 : s.H };
}

const MINUTE = 60_000;
const STEP = 10 * MINUTE;

describe('the day\'s events meet the SPA\'s definitions on the direct SPA', () => {
  const random = seeded(20_261_203);
  const first = civilToSerial(1900, 3, 2);
  const last = civilToSerial(9999, 12, 30);
  const cases = Array.from({ length: 300 }, (_, k) => {
    // One day in three at a latitude past 60°, where polar days and nights and single events happen.
    const polar = k % 3 === 0;
    const latitude = polar ? (random() < 0.5 ? -1 : 1) * (60 + 30 * random()) : -90 + 180 * random();
    const longitude = -180 + 360 * random();
    const utcOffset = Math.max(-12, Math.min(14, Math.round(longitude / 15) + Math.round(4 * random() - 2)));
    const serial = first + Math.floor(random() * (last - first));
    const deltaT = random() < 0.25 ? -100 + 10_100 * random() : undefined;
    return { serial, latitude, longitude, utcOffset, deltaT };
  });

  test('rise and set at h′0 within 4e-6° (rising, setting), noon at hour angle 0 within 2e-6°, on 300 days 1900–9999 from pole to pole', () => {
    // Tolerances: the search stops on a bracket of 1 ms (half a millisecond at the sun's fastest
    // climb, 0.0042°/s, is 2.1e-6° of altitude) or at 1e-7° (1e-8° of hour angle for the transit), and
    // the interpolated slow terms are within 1e-6° of the direct SPA (tests/core/sun/sunNodes.test.ts).
    const found = new Mismatches();
    let risesAndSets = 0;
    let worstAltitude = 0;
    let worstHourAngle = 0;
    for (const c of cases) {
      const ev = sunEvents(c.serial, c.latitude, c.longitude, c.utcOffset, c.deltaT === undefined ? undefined : { deltaT: c.deltaT });
      const where = () => `${JSON.stringify(c)} → ${JSON.stringify(ev)}`;
      for (const [event, sign] of [[ev.sunrise, -1], [ev.sunset, 1]] as const) {
        if (event === null) continue;
        const p = direct(serialToUtcMs(event, c.utcOffset), c.latitude, c.longitude, c.deltaT);
        worstAltitude = Math.max(worstAltitude, Math.abs(p.altitude - RISE_SET_ALTITUDE));
        found.check(Math.abs(p.altitude - RISE_SET_ALTITUDE) < 4e-6, () => `altitude ${p.altitude} at the event: ${where()}`);
        // Rising before the transit (hour angle negative), setting after it.
        found.check(Math.sign(p.hourAngle) === sign, () => `hour angle ${p.hourAngle} at a ${sign < 0 ? 'rise' : 'set'}: ${where()}`);
        risesAndSets++;
      }
      const noon = direct(serialToUtcMs(ev.solarNoon, c.utcOffset), c.latitude, c.longitude, c.deltaT);
      worstHourAngle = Math.max(worstHourAngle, Math.abs(noon.hourAngle));
      found.check(Math.abs(noon.hourAngle) < 2e-6, () => `hour angle ${noon.hourAngle} at noon: ${where()}`);
      found.check(ev.solarNoon >= c.serial - 1 / 1440 && ev.solarNoon < c.serial + 1 + 1 / 1440, () => `noon off the day: ${where()}`);
    }
    expect(found.list).toEqual([]);
    expect(risesAndSets).toBeGreaterThan(350);
    // The search and the interpolation are not exact: a real residual, under the bound.
    expect(worstAltitude).toBeGreaterThan(0);
    expect(worstHourAngle).toBeGreaterThan(0);
  });

  test('no rise or set missed: every crossing of h′0 the direct SPA shows at 10-minute steps through the day is reported (the first of each), and polar day / night only with the sun above / below all day', () => {
    const found = new Mismatches();
    let polarDays = 0;
    let polarNights = 0;
    for (const c of cases) {
      const ev = sunEvents(c.serial, c.latitude, c.longitude, c.utcOffset, c.deltaT === undefined ? undefined : { deltaT: c.deltaT });
      const where = () => `${JSON.stringify(c)} → ${JSON.stringify(ev)}`;
      const dayStart = serialToUtcMs(c.serial, c.utcOffset);
      const f = Array.from({ length: 145 }, (_, i) => direct(dayStart + i * STEP, c.latitude, c.longitude, c.deltaT).altitude - RISE_SET_ALTITUDE);
      const rise = ev.sunrise === null ? null : serialToUtcMs(ev.sunrise, c.utcOffset);
      const set = ev.sunset === null ? null : serialToUtcMs(ev.sunset, c.utcOffset);
      for (let i = 0; i < 144; i++) {
        const end = dayStart + (i + 1) * STEP;
        // A sampled crossing is a real one inside (t_i, t_i+1), inside the local day: the event must be
        // given, and no later than that step (it is the day's first of its kind).
        if (f[i] <= 0 && f[i + 1] > 0) found.check(rise !== null && rise < end, () => `rise missed near step ${i}: ${where()}`);
        if (f[i] > 0 && f[i + 1] <= 0) found.check(set !== null && set < end, () => `set missed near step ${i}: ${where()}`);
      }
      const allAbove = f.slice(0, 144).every((v) => v > 0);
      const allBelow = f.slice(0, 144).every((v) => v < 0);
      if (ev.condition === 'polarDay') found.check(allAbove, () => `polar day with the sun below h′0 at some step: ${where()}`);
      if (ev.condition === 'polarNight') found.check(allBelow, () => `polar night with the sun above h′0 at some step: ${where()}`);
      if (ev.condition === 'normal') found.check(rise !== null || set !== null, () => `normal day without events: ${where()}`);
      polarDays += ev.condition === 'polarDay' ? 1 : 0;
      polarNights += ev.condition === 'polarNight' ? 1 : 0;
    }
    expect(found.list).toEqual([]);
    // The sample holds both polar conditions.
    expect(polarDays).toBeGreaterThan(10);
    expect(polarNights).toBeGreaterThan(10);
  });
});
