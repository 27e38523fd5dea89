/**
 * Source: Reda, I. & Andreas, A., *Solar Position Algorithm for Solar Radiation Applications*,
 * NREL/TP-560-34302 (revised January 2008) — the worked example of the report (Table A5.1 and its
 * appendix) — stated in the publication — and the row counts and column sums of its
 * periodic-term tables A4.2 and A4.3 (computed from two independent public transcriptions of the
 * report) to check our transcription. Summary in docs/methods.md#sun-position-nrel-solar-position-algorithm.
 *
 * Inputs: 2003-10-17 12:30:30 local standard time at UTC−7 (19:30:30 UT), ΔUT1 = 0, ΔT = 67 s,
 * latitude 39.742476°, longitude −105.1786°, elevation 1830.14 m, pressure 820 hPa, temperature
 * 11 °C, surface slope 30° facing 170° (azimuth rotation −10°), refraction at rise/set 0.5667°.
 * Tolerances follow the digits the report prints for each quantity (6–10 digits).
 */
import { B_TERMS, L_TERMS, NUTATION_TERMS, R_TERMS } from '../../src/core/sun/spaTerms';
import { spaSteps, sunPosition } from '../../src/core/sun/spa';
import { sunEvents } from '../../src/core/sun/events';
import { incidenceAngle } from '../../src/core/sun/surfaceAngles';
import { civilToSerial, serialToCivil } from '../../src/core/time/calendar';

const UTC_MS = Date.UTC(2003, 9, 17, 19, 30, 30);
const LAT = 39.742476;
const LON = -105.1786;
const OPTIONS = { elevation: 1830.14, pressure: 820, temperature: 11, deltaT: 67 };

/** Half a unit in the last printed decimal of a published sum, plus floating-point slack. */
function printedTolerance(published: number): number {
  const decimals = (String(published).split('.')[1] ?? '').length;
  return 0.5 * 10 ** -decimals + 1e-9;
}

function columnSums(rows: readonly (readonly number[])[], columns: number): number[] {
  return Array.from({ length: columns }, (_, k) => rows.reduce((s, r) => s + r[k], 0));
}

/** Seconds of the local day of a serial. */
function secondsOfDay(serial: number): number {
  const c = serialToCivil(serial);
  return c.hour * 3600 + c.minute * 60 + c.second;
}

describe('periodic-term tables match the row counts and column sums of the revised report', () => {
  const expected: [string, readonly (readonly number[])[], number, number, number, number][] = [
    ['L0', L_TERMS[0], 64, 178752448, 173.696557, 750369.20045],
    ['L1', L_TERMS[1], 34, 628332178527, 92.785335, 118934.33255],
    ['L2', L_TERMS[2], 20, 62068, 52.8591, 136783.2378],
    ['L3', L_TERMS[3], 7, 347, 32.524, 38100.126],
    ['L4', L_TERMS[4], 3, 123, 11.112, 18849.23],
    ['L5', L_TERMS[5], 1, 1, 3.14, 0],
    ['B0', B_TERMS[0], 5, 538, 20.201, 98996.115],
    ['B1', B_TERMS[1], 2, 15, 5.63, 10731.24],
    ['R0', R_TERMS[0], 40, 101709876, 119.983014, 667402.53835],
    ['R1', R_TERMS[1], 10, 105576, 19.51389, 72746.85755],
    ['R2', R_TERMS[2], 6, 4513, 25.4736, 120985.3678],
    ['R3', R_TERMS[3], 2, 152, 8.193, 18849.226],
    ['R4', R_TERMS[4], 1, 4, 2.56, 6283.08],
  ];
  test.each(expected)('table %s has the published row count and sums of A, B and C', (_name, rows, count, sumA, sumB, sumC) => {
    expect(rows).toHaveLength(count);
    const [a, b, c] = columnSums(rows, 3);
    // The published sums are rounded to the decimals printed: agree within half a unit of the last one.
    expect(Math.abs(a - sumA)).toBeLessThanOrEqual(printedTolerance(sumA));
    expect(Math.abs(b - sumB)).toBeLessThanOrEqual(printedTolerance(sumB));
    expect(Math.abs(c - sumC)).toBeLessThanOrEqual(printedTolerance(sumC));
  });

  test('there are exactly six L, two B and five R series', () => {
    expect([L_TERMS.length, B_TERMS.length, R_TERMS.length]).toEqual([6, 2, 5]);
  });

  test('the nutation table has 63 rows with the published sums of Y0…Y4 and a, b, c, d', () => {
    expect(NUTATION_TERMS).toHaveLength(63);
    const sums = columnSums(NUTATION_TERMS, 9);
    expect(sums.slice(0, 5)).toEqual([-13, 3, 22, 64, 64]);
    expect(sums[5]).toBe(-184150);
    expect(Math.abs(sums[6] - -178.7)).toBeLessThan(1e-9);
    expect(sums[7]).toBe(98301);
    expect(Math.abs(sums[8] - 5.3)).toBeLessThan(1e-9);
  });
});

describe('every intermediate value of the NREL SPA worked example', () => {
  const s = spaSteps(UTC_MS, LAT, LON, OPTIONS);
  const cases: [string, number, number, number][] = [
    ['Julian day JD', s.jd, 2452930.312847, 1e-6],
    ['Julian ephemeris day JDE', s.jde, 2452930.313623, 1e-6],
    ['heliocentric longitude L [°]', s.L, 24.0182616917, 1e-6],
    ['heliocentric latitude B [°]', s.B, -0.0001011219, 1e-6],
    ['radius vector R [AU]', s.R, 0.9965422974, 1e-6],
    ['nutation in longitude Δψ [°]', s.deltaPsi, -0.0039984, 1e-7],
    ['nutation in obliquity Δε [°]', s.deltaEpsilon, 0.00166657, 1e-7],
    ['true obliquity ε [°]', s.epsilon, 23.440465, 1e-6],
    ['apparent sun longitude λ [°]', s.lambda, 204.0085519281, 1e-6],
    ['apparent sidereal time ν [°]', s.nu, 318.51191, 1e-5],
    ['geocentric right ascension α [°]', s.alpha, 202.227408, 1e-6],
    ['geocentric declination δ [°]', s.delta, -9.31434, 1e-6],
    ['observer local hour angle H [°]', s.H, 11.105902, 1e-5],
    ['topocentric right ascension α′ [°]', s.alphaPrime, 202.22704, 1e-5],
    ['topocentric declination δ′ [°]', s.deltaPrime, -9.316179, 1e-5],
    ['topocentric hour angle H′ [°]', s.HPrime, 11.10627, 1e-5],
    ['elevation without refraction e0 [°]', s.e0, 39.872046, 1e-6],
    ['elevation with refraction e [°]', s.e, 39.888378, 1e-6],
    ['topocentric zenith [°]', s.zenith, 50.111622, 1e-5],
    ['topocentric azimuth from north [°]', s.phi, 194.340241, 1e-5],
    ['equation of time [min]', s.E, 14.641511, 1e-3],
  ];
  test.each(cases)('%s is as published', (_name, ours, published, tolerance) => {
    expect(Math.abs(ours - published)).toBeLessThan(tolerance);
  });

  test('sunPosition gives the same zenith, azimuth, declination and equation of time', () => {
    const p = sunPosition(UTC_MS, LAT, LON, OPTIONS);
    expect(Math.abs(p.zenith - 50.111622)).toBeLessThan(1e-5);
    expect(Math.abs(p.azimuth - 194.340241)).toBeLessThan(1e-5);
    expect(Math.abs(p.altitude - 39.888378)).toBeLessThan(1e-6);
    expect(Math.abs(p.declination - -9.31434)).toBeLessThan(1e-6);
    expect(Math.abs(p.equationOfTime - 14.641511)).toBeLessThan(1e-3);
    expect(Math.abs(p.rightAscension - 202.227408)).toBeLessThan(1e-6);
  });

  test('the incidence angle on the 30° slope facing 170° is 25.187°', () => {
    const p = sunPosition(UTC_MS, LAT, LON, OPTIONS);
    expect(Math.abs(incidenceAngle(p.altitude, p.azimuth, 30, 170) - 25.187)).toBeLessThan(1e-5);
  });

  test('sunrise is 06:12:43 and sun transit 11:46:05 local time, within 1 s', () => {
    const ev = sunEvents(civilToSerial(2003, 10, 17, 12, 30, 30), LAT, LON, -7, OPTIONS);
    expect(ev.condition).toBe('normal');
    expect(Math.abs(secondsOfDay(ev.sunrise as number) - (6 * 3600 + 12 * 60 + 43))).toBeLessThanOrEqual(1);
    expect(Math.abs(secondsOfDay(ev.solarNoon) - (11 * 3600 + 46 * 60 + 5))).toBeLessThanOrEqual(1);
  });
});
