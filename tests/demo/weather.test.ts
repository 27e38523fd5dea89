/**
 * The invented weather year (examples/weather-brackwater-2026.csv): repeatable, one row per hour,
 * dark at night, never brighter than the clear sky it is made from, and the committed example file
 * is exactly what the generator writes. (Invented data; structural checks only.)
 */
import * as fs from 'node:fs';
import * as path from 'node:path';
import { ineichenPerezClearSky } from '../../src/core/sky/clearSky';
import { annualSunPath } from '../../src/core/sun/sunPath';
import { formatSerialIso } from '../../src/core/time/calendar';
import { findExampleSite } from '../../src/demo/sites';
import { inventedWeatherCsv, inventedWeatherYear } from '../../src/demo/weather';
import { Mismatches } from '../support/mismatches';

const site = findExampleSite('brackwater')!;

describe('invented weather year', () => {
  const w = inventedWeatherYear(site, 2026);

  it('has one value per hour, and 8784 in a leap year', () => {
    expect(w.dni.length).toBe(8760);
    expect(inventedWeatherYear(site, 2028).dni.length).toBe(8784);
  });

  it('is the same every time for the same seed and differs for another', () => {
    expect(inventedWeatherYear(site, 2026).dni).toEqual(w.dni);
    expect(inventedWeatherYear(site, 2026, 7).dni).not.toEqual(w.dni);
  });

  it('is dark with the sun down and its beam never exceeds the clear sky (tolerance 0.05 W/m² rounding)', () => {
    const path_ = annualSunPath(2026, site.site);
    let clearDays = 0;
    const found = new Mismatches();
    for (let i = 0; i < w.dni.length; i++) {
      const altitude = path_.altitude[i];
      if (altitude <= 0) {
        found.check(Object.is(w.dni[i] + w.dhi[i], 0), () => `hour ${i}: dni ${w.dni[i]} + dhi ${w.dhi[i]} with the sun down`);
        continue;
      }
      const day = Math.floor(i / 24);
      const month = new Date(Date.UTC(2026, 0, day + 1)).getUTCMonth();
      const clear = ineichenPerezClearSky(altitude, day + 1, site.linkeTurbidity[month], site.site.elevation ?? 0);
      found.check(w.dni[i] <= clear.dni + 0.05, () => `hour ${i}: dni ${w.dni[i]} above the clear sky's ${clear.dni}`);
      found.check(w.dhi[i] >= clear.dhi - 0.05, () => `hour ${i}: dhi ${w.dhi[i]} below the clear sky's ${clear.dhi}`);
      if (i % 24 === 12 && w.dni[i] > 0.8 * clear.dni) clearDays++;
    }
    expect(found.list).toEqual([]);
    expect(clearDays).toBeGreaterThan(20);
  });

  it('matches the committed example file: same lines and stamps, values within 2 W/m² (room for small clear-sky model revisions)', () => {
    const file = path.join(__dirname, '..', '..', 'examples', 'weather-brackwater-2026.csv');
    const saved = fs.readFileSync(file, 'utf8').split('\n');
    const fresh = inventedWeatherCsv(site, 2026, formatSerialIso).split('\n');
    expect(saved.length).toBe(fresh.length);
    expect(saved.slice(0, 2)).toEqual(fresh.slice(0, 2));
    let worst = 0;
    const stamps = new Mismatches();
    for (let i = 2; i < fresh.length - 1; i++) {
      const [stampA, ...a] = saved[i].split(',');
      const [stampB, ...b] = fresh[i].split(',');
      stamps.check(stampA === stampB, () => `line ${i + 1}: stamp ${stampA} in the file, ${stampB} written now`);
      for (let k = 0; k < 2; k++) worst = Math.max(worst, Math.abs(Number(a[k]) - Number(b[k])));
    }
    expect(stamps.list).toEqual([]);
    expect(worst).toBeLessThanOrEqual(2);
  });
});
