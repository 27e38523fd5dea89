/**
 * The gain explanation's steps as a reader sees them: every step in the documented order with its
 * unit, and the words that depend on the hour asked for (a date-time between the rows of the year,
 * how a supplied series is read for the year, an interior shade on the beam only, a date-time out of range).
 *
 * Sources: the order gainSteps documents (src/core/gain/gainSteps.ts: the instant, clock time → sun
 * altitude and azimuth → incidence and profile angles → sunlit fraction → DNI, DHI → sky and ground
 * view ratios and horizon band share → irradiance on the bare and on the shaded window by part →
 * SHGC at the angle, diffuse SHGC → interior attenuation → glass area → gain by part → radiant and
 * convective parts, then the conduction steps when a U-value is given); each quantity's SI unit
 * (angles in degrees, irradiance in W/m², areas in m², heat flows in W, temperatures in °C; ratios,
 * fractions, SHGC and attenuations are pure numbers); the time conventions of docs/conventions.md
 * (an hour-ending date-time names the hour that ends then, the sun at its middle); and the error
 * convention of docs/architecture.md (a refusal names the argument, the value and the range in words).
 */
import { gainSteps } from '../../../src/core/gain/gainSteps';
import { windowGainAt } from '../../../src/core/gain/windowGain';
import { civilToSerial } from '../../../src/core/time/calendar';
import { refusalMessage } from '../../support/expectError';
import { baseSpec, shadedSpec } from './gainFixtures';

const T = civilToSerial(2026, 9, 21, 15);
const method = (steps: ReturnType<typeof gainSteps>, quantity: string) => {
  const s = steps.find((x) => x.quantity === quantity);
  if (!s) throw new Error(`no step ${quantity}`);
  return s.method;
};

describe('the gain explanation as a reader sees it', () => {
  test('every step in the documented order, with its unit', () => {
    const spec = shadedSpec({
      glazing: { shgc: 0.6, panes: 2, uValue: 2.8 },
      indoorTemperature: 24,
      weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax: [31], dailyRange: [11] },
    });
    const degrees = '°';
    const irradiance = 'W/m²';
    const none = '';
    expect(gainSteps(spec, T).map((s) => [s.quantity, s.unit])).toEqual([
      ['sun evaluated at', 'date-time'],
      ['local clock time', 'date-time'],
      ['sun altitude', degrees],
      ['sun azimuth', degrees],
      ['incidence angle', degrees],
      ['profile angle', degrees],
      ['sunlit fraction', none],
      ['direct normal irradiance', irradiance],
      ['diffuse horizontal irradiance', irradiance],
      ['sky view ratio', none],
      ['ground view ratio', none],
      ['horizon band share', none],
      ['beam on the window', irradiance],
      ['sky diffuse on the bare window', irradiance],
      ['sky diffuse on the window', irradiance],
      ['ground-reflected on the bare window', irradiance],
      ['ground-reflected on the window', irradiance],
      ['SHGC at the incidence angle', none],
      ['diffuse SHGC', none],
      ['interior attenuation, beam', none],
      ['interior attenuation, diffuse', none],
      ['glass area', 'm²'],
      ['area for the SHGC', 'm²'],
      ['beam gain', 'W'],
      ['sky-diffuse gain', 'W'],
      ['ground-reflected gain', 'W'],
      ['window solar gain', 'W'],
      ['radiant part', 'W'],
      ['convective part', 'W'],
      ['outdoor dry-bulb', '°C'],
      ['indoor temperature', '°C'],
      ['conduction gain', 'W'],
    ]);
  });

  test('a date-time between the rows of the year names no row; an hour-ending one still takes the sun at its hour\'s middle', () => {
    const steps = gainSteps(baseSpec(), civilToSerial(2026, 9, 21, 15, 30));
    expect(method(steps, 'sun evaluated at')).toBe('local standard time 2026-09-21T15:00: the middle of the hour ending 2026-09-21T15:30 (time convention hourEnding)');
    const instant = gainSteps(baseSpec({ timeConvention: 'instant' }), civilToSerial(2026, 9, 21, 15, 30));
    expect(method(instant, 'sun evaluated at')).toBe('local standard time 2026-09-21T15:30: the date-time itself (time convention instant)');
  });

  test('how a supplied series is read for the year is said beside the direct normal irradiance', () => {
    // A typical year of 8760 rows read for the leap year 2028: 29 February repeats 28 February.
    const hours = new Array<number>(8760).fill(100);
    const spec = baseSpec({ year: 2028, weather: { kind: 'measured', dni: hours, dhi: hours } });
    const t = civilToSerial(2028, 3, 1, 12);
    const fit = windowGainAt(spec, t).yearFit;
    expect(typeof fit).toBe('string');
    expect(fit!.length).toBeGreaterThan(0);
    const steps = gainSteps(spec, t);
    expect(method(steps, 'direct normal irradiance')).toBe(`supplied hourly series; ${fit}`);
    expect(method(steps, 'diffuse horizontal irradiance')).toBe('supplied hourly series');
  });

  test('an interior shade on the beam alone is an interior shade: both attenuation steps say they were given', () => {
    const spec = baseSpec({ glazing: { shgc: 0.6, panes: 2, interiorAttenuation: 0.7, interiorAttenuationDiffuse: 1 } });
    const steps = gainSteps(spec, T);
    expect(method(steps, 'interior attenuation, beam')).toBe('given (interior shade: the beam goes to the non-solar radiant time series)');
    expect(method(steps, 'interior attenuation, diffuse')).toBe('given');
  });

  test('a date-time out of range is refused naming dateTime, the value and the range', () => {
    const refusal = (t: number) => refusalMessage(() => gainSteps(baseSpec(), t));
    expect(refusal(60)).toBe('dateTime = 60 is not allowed: must be a date-time from 1 March 1900 (serial 61) to 31 December 9999 (serial below 2958466)');
    expect(refusal(Number.NaN)).toBe('dateTime = NaN is not allowed: must be a date-time from 1 March 1900 (serial 61) to 31 December 9999 (serial below 2958466)');
  });
});
