/**
 * An INVENTED hourly weather year for the examples and CLI tests: the turbidity clear sky of an
 * example site, dimmed by a made-up, repeatable day-to-day cloudiness. It looks like weather (clear
 * and overcast days, more diffuse light under cloud) but it is not a measurement of anywhere; never
 * use it for design.
 */
import { ineichenPerezClearSky } from '../core/sky';
import { annualSunPath } from '../core/sun';
import type { ExampleSite } from './sites';

/** One invented year: stamps at the end of each hour and the two irradiance columns [W/m²]. */
export interface InventedWeather {
  stampSerial: Float64Array;
  dni: Float64Array;
  dhi: Float64Array;
}

/** Repeatable pseudo-random numbers in [0, 1) (a 32-bit linear congruential generator). */
function randomSequence(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1_664_525) + 1_013_904_223) >>> 0;
    return state / 4_294_967_296;
  };
}

/**
 * The invented weather of an example site over a year.
 * @param site - example site (its invented monthly Linke turbidity sets the clear sky)
 * @param year - calendar year
 * @param seed - seed of the made-up cloudiness (same seed, same year)
 * @returns 8760 (8784) hours; DNI and DHI rounded to 0.1 W/m², 0 at night
 */
export function inventedWeatherYear(site: ExampleSite, year: number, seed = 2026): InventedWeather {
  const path = annualSunPath(year, site.site);
  const n = path.hours;
  const random = randomSequence(seed);
  const dni = new Float64Array(n);
  const dhi = new Float64Array(n);
  const days = Math.ceil(n / 24);
  // Cloudiness of each day 0…1: a slowly wandering value, so spells of clear and dull days follow each other.
  const cloud = new Float64Array(days);
  let c = 0.4;
  for (let d = 0; d < days; d++) {
    c = Math.min(1, Math.max(0, 0.5 * c + 0.5 * random() ** 1.6));
    cloud[d] = c;
  }
  let monthStartDay = 0;
  const monthOf = new Uint8Array(days);
  for (let m = 0; m < 12; m++) {
    const len = new Date(Date.UTC(year, m + 1, 0)).getUTCDate();
    monthOf.fill(m, monthStartDay, Math.min(days, monthStartDay + len));
    monthStartDay += len;
  }
  for (let i = 0; i < n; i++) {
    const altitude = path.altitude[i];
    if (altitude <= 0) continue;
    const day = Math.floor(i / 24);
    const clear = ineichenPerezClearSky(altitude, day + 1, site.linkeTurbidity[monthOf[day]], site.site.elevation ?? 0);
    const k = Math.min(1, Math.max(0, cloud[day] + 0.15 * (random() - 0.5)));
    const beam = clear.dni * (1 - k) ** 1.5;
    const scattered = clear.dni * Math.sin((altitude * Math.PI) / 180) * k * 0.35;
    dni[i] = Math.round(beam * 10) / 10;
    dhi[i] = Math.round((clear.dhi + scattered) * 10) / 10;
  }
  return { stampSerial: Float64Array.from(path.stampSerial), dni, dhi };
}

/** Header of the invented weather CSV, units stated (columns picked with `--dni "direct normal" --dhi "diffuse horizontal"`). */
export const INVENTED_WEATHER_HEADER = 'hour ending,direct normal [W/m²],diffuse horizontal [W/m²]';

/**
 * The invented weather year as the CSV text of examples/ (a comment line, a header, then one row
 * per hour: ISO 8601 local stamp at the end of the hour, DNI, DHI).
 */
export function inventedWeatherCsv(site: ExampleSite, year: number, formatStamp: (serial: number) => string): string {
  const w = inventedWeatherYear(site, year);
  const lines = [`# INVENTED hourly weather for ${site.label}, ${year}: clear sky dimmed by made-up clouds. Not a measurement; do not use for design.`, INVENTED_WEATHER_HEADER];
  for (let i = 0; i < w.dni.length; i++) lines.push(`${formatStamp(w.stampSerial[i])},${w.dni[i]},${w.dhi[i]}`);
  return `${lines.join('\n')}\n`;
}
