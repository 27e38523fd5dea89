/**
 * The SPA with its slow terms interpolated between nodes two days apart (src/core/sun/sunNodes.ts) against the direct SPA
 * (src/core/sun/spa.ts, itself held to the NREL report's worked example, astronomy-engine and
 * suncalc in tests/reference): the same position within 1e-6° over random instants and sites, the
 * same checks and messages, and the report's worked example to its printed digits.
 */
import { spaSteps, sunPosition } from '../../../src/core/sun/spa';
import { clearSunNodes, geocentricFromNodes, sunPositionFromNodes } from '../../../src/core/sun/sunNodes';
import { Mismatches } from '../../support/mismatches';
import { seeded } from '../../support/sky';

describe('sun position from interpolated nodes', () => {
  test('agrees with the direct SPA within 1e-6° over random instants 1900–2100 and sites', () => {
    const rnd = seeded(20261203);
    let worstAlt = 0;
    let worstDecl = 0;
    for (let k = 0; k < 1200; k++) {
      const utcMs = Date.UTC(1900, 0, 1) + rnd() * (Date.UTC(2100, 0, 1) - Date.UTC(1900, 0, 1));
      const lat = -89 + 178 * rnd();
      const lon = -180 + 360 * rnd();
      const options = { elevation: 3000 * rnd(), temperature: -20 + 50 * rnd() };
      const a = sunPosition(utcMs, lat, lon, options);
      const b = sunPositionFromNodes(utcMs, lat, lon, options);
      worstAlt = Math.max(worstAlt, Math.abs(a.altitude - b.altitude));
      worstDecl = Math.max(worstDecl, Math.abs(a.declination - b.declination));
      expect(Math.abs(a.altitude - b.altitude)).toBeLessThan(1e-6);
      // azimuth errors grow as 1/cos(altitude) near the zenith
      expect(Math.abs(((a.azimuth - b.azimuth + 540) % 360) - 180) * Math.cos((a.altitude * Math.PI) / 180)).toBeLessThan(1e-6);
      expect(Math.abs(a.equationOfTime - b.equationOfTime)).toBeLessThan(1e-5);
      expect(Math.abs(((a.rightAscension - b.rightAscension + 540) % 360) - 180)).toBeLessThan(1e-6);
      expect(Math.abs(a.solarTime - b.solarTime) % 24).toBeLessThan(1e-6);
      expect(Math.abs(a.earthSunDistance - b.earthSunDistance)).toBeLessThan(1e-8); // AU
    }
    expect(worstAlt).toBeGreaterThan(0); // a real interpolation, not the same call
    expect(worstDecl).toBeLessThan(1e-6);
  });

  test('geocentric hour angle and declination (what the rise/set search reads) agree with the direct SPA within 1e-6° over random instants 1900–9999, ΔT by default and given', () => {
    const rnd = seeded(977);
    const found = new Mismatches();
    let worst = 0;
    const out = { hourAngle: 0, declination: 0 };
    for (let k = 0; k < 1500; k++) {
      const utcMs = Date.UTC(1900, 0, 1) + rnd() * (Date.UTC(9999, 11, 31) - Date.UTC(1900, 0, 1));
      const lon = -180 + 360 * rnd();
      const deltaT = rnd() < 0.3 ? -100 + 10_100 * rnd() : undefined;
      const s = spaSteps(utcMs, 0, lon, deltaT === undefined ? undefined : { deltaT });
      const g = geocentricFromNodes(utcMs, lon, deltaT, out);
      const dH = Math.abs(((g.hourAngle - s.H + 540) % 360) - 180);
      const dDelta = Math.abs(g.declination - s.delta);
      worst = Math.max(worst, dH, dDelta);
      found.check(dH < 1e-6 && dDelta < 1e-6 && g.hourAngle >= 0 && g.hourAngle < 360, () => `${new Date(utcMs).toISOString()} ${lon} ΔT ${deltaT}: H ${g.hourAngle} vs ${s.H}, δ ${g.declination} vs ${s.delta}`);
    }
    expect(found.list).toEqual([]);
    expect(worst).toBeGreaterThan(0); // a real interpolation, not the same call
  });

  test('gives the NREL SPA worked example to the printed digits (Reda & Andreas 2008, Table A5.1)', () => {
    // 2003-10-17 12:30:30 local, UTC−7, ΔT 67 s, 39.742476° N, 105.1786° W, 1830.14 m, 820 mbar, 11 °C
    const utcMs = Date.UTC(2003, 9, 17, 19, 30, 30);
    const p = sunPositionFromNodes(utcMs, 39.742476, -105.1786, { elevation: 1830.14, pressure: 820, temperature: 11, deltaT: 67 });
    expect(p.zenith).toBeCloseTo(50.11162, 5);
    expect(p.azimuth).toBeCloseTo(194.34024, 5);
  });

  test('keeps its nodes apart per ΔT and refuses what the direct SPA refuses, by the same names', () => {
    const t = Date.UTC(2026, 5, 21, 12);
    clearSunNodes();
    const a = sunPositionFromNodes(t, 40, -105);
    const b = sunPositionFromNodes(t, 40, -105, { deltaT: 500 });
    expect(a.altitude).not.toBe(b.altitude);
    expect(sunPositionFromNodes(t, 40, -105).altitude).toBe(a.altitude);
    expect(() => sunPositionFromNodes(t, 91, 0)).toThrow(/^latitude = 91/);
    expect(() => sunPositionFromNodes(t, 40, 0, { pressure: 0 })).toThrow(/^pressure = 0/);
    expect(() => sunPositionFromNodes(Date.UTC(1800, 0, 1), 40, 0)).toThrow(/^deltaT = blank/);
  });
});
