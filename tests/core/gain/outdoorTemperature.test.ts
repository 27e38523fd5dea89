/**
 * Design-day outdoor dry-bulb (src/core/gain/outdoorTemperature.ts) and the conduction gain it feeds
 * between the rows of the year (src/core/gain/prepared.ts, `outdoorTemperatureAt`).
 *
 * Sources:
 * - The design-day temperature profile of the fundamentals handbook's climatic-design chapter
 *   (ASHRAE Handbook—Fundamentals, "Generating design-day data"): T(h) = Tmax − f(h) · DR, with the
 *   fraction f of the daily range 1 at the coolest hour, hour ending 05:00, and 0 at the warmest,
 *   hours ending 14:00 and 15:00 (the hours from memory, as the module says), so every hour lies
 *   between Tmax − DR and Tmax.
 * - The module's stated layout of its table (index 0 = hour ending 01:00; hour 0 = hour 24) and its
 *   rule between the table's hours: linear, so a quarter past hour h is 3/4 of f(h) and 1/4 of
 *   f(h + 1) (a stated mathematical property, checked at every hour of the day).
 * - Conduction through the window: q = U · A · (T_out − T_in), A the rough opening width × height
 *   (ASHRAE Fundamentals, fenestration chapter; from memory).
 * - The error convention of docs/architecture.md: a refusal names the argument as the user wrote it,
 *   the value, and the allowed range with its unit, word for word.
 */
import { DAILY_RANGE_FRACTIONS, designDayDryBulb, fractionOfDailyRange } from '../../../src/core/gain/outdoorTemperature';
import { windowGainAt } from '../../../src/core/gain/windowGain';
import { civilToSerial } from '../../../src/core/time/calendar';
import { refusalMessage as refusal } from '../../support/expectError';
import { Mismatches } from '../../support/mismatches';
import { baseSpec } from './gainFixtures';

describe('design-day dry-bulb profile', () => {
  test('the coolest hour (ending 05:00) is Tmax − DR, the warmest (ending 14:00 and 15:00) Tmax, every other hour between them', () => {
    expect(designDayDryBulb(31, 11, 5)).toBe(20);
    expect(designDayDryBulb(31, 11, 14)).toBe(31);
    expect(designDayDryBulb(31, 11, 15)).toBe(31);
    const found = new Mismatches();
    for (let h = 0; h <= 24; h += 0.25) {
      const t = designDayDryBulb(31, 11, h);
      found.check(t >= 20 && t <= 31, () => `hour ${h}: ${t} °C`);
    }
    expect(found.list).toEqual([]);
    // No daily range: the whole day at Tmax.
    expect(designDayDryBulb(-5, 0, 5)).toBe(-5);
  });

  test('each whole hour ending h is Tmax − f · DR with f the table\'s value for that hour (index h − 1; hour 0 is hour 24)', () => {
    const found = new Mismatches();
    for (let h = 1; h <= 24; h++) {
      const want = 28 - DAILY_RANGE_FRACTIONS[h - 1] * 10;
      found.check(designDayDryBulb(28, 10, h) === want, () => `hour ${h}: ${designDayDryBulb(28, 10, h)} against ${want}`);
      found.check(fractionOfDailyRange(h) === DAILY_RANGE_FRACTIONS[h - 1], () => `fraction at hour ${h}`);
    }
    expect(found.list).toEqual([]);
    expect(fractionOfDailyRange(0)).toBe(DAILY_RANGE_FRACTIONS[23]);
    expect(designDayDryBulb(28, 10, 0)).toBe(designDayDryBulb(28, 10, 24));
  });

  test('between the table\'s hours the fraction is linear: a quarter and a half past hour h (h = 0…23; hour 0 is hour 24)', () => {
    const f = (h: number) => DAILY_RANGE_FRACTIONS[(h + 23) % 24];
    const found = new Mismatches();
    for (let h = 0; h < 24; h++) {
      const quarter = 0.75 * f(h) + 0.25 * f(h + 1);
      const half = 0.5 * f(h) + 0.5 * f(h + 1);
      found.check(Math.abs(fractionOfDailyRange(h + 0.25) - quarter) < 1e-12, () => `${h}.25: ${fractionOfDailyRange(h + 0.25)} against ${quarter}`);
      found.check(Math.abs(fractionOfDailyRange(h + 0.5) - half) < 1e-12, () => `${h}.5: ${fractionOfDailyRange(h + 0.5)} against ${half}`);
      found.check(Math.abs(designDayDryBulb(30, 8, h + 0.5) - (30 - half * 8)) < 1e-12, () => `dry-bulb at ${h}.5`);
    }
    expect(found.list).toEqual([]);
    // Half past hour 4 (between 0.98 and the coolest hour's 1.0), written out: 0.99.
    expect(fractionOfDailyRange(4.5)).toBeCloseTo((DAILY_RANGE_FRACTIONS[3] + 1) / 2, 12);
  });

  test('refusals name the argument, the value and the range with its unit', () => {
    expect(refusal(() => designDayDryBulb(61, 10, 12))).toBe('dryBulbMax = 61 is not allowed: must be a number from -60 to 60 °C');
    expect(refusal(() => designDayDryBulb(-60.5, 10, 12))).toBe('dryBulbMax = -60.5 is not allowed: must be a number from -60 to 60 °C');
    expect(refusal(() => designDayDryBulb(30, 41, 12))).toBe('dailyRange = 41 is not allowed: must be a number from 0 to 40 K');
    expect(refusal(() => designDayDryBulb(30, -1, 12))).toBe('dailyRange = -1 is not allowed: must be a number from 0 to 40 K');
    expect(refusal(() => designDayDryBulb(30, 10, 24.5))).toBe('hourEnding = 24.5 is not allowed: must be a number from 0 to 24 h');
    expect(refusal(() => designDayDryBulb(30, 10, Number.NaN))).toBe('hourEnding = NaN is not allowed: must be a number from 0 to 24 h');
    // The ends themselves are allowed.
    expect(designDayDryBulb(60, 40, 24)).toBeCloseTo(60 - DAILY_RANGE_FRACTIONS[23] * 40, 12);
    expect(designDayDryBulb(-60, 0, 0)).toBe(-60);
  });
});

describe('design-day dry-bulb and conduction between the rows of the year', () => {
  // Twelve monthly values (January first), so the month read is checked too.
  const dryBulbMax = [5, 7, 11, 15, 20, 26, 31, 30, 25, 18, 10, 6];
  const dailyRange = [6, 7, 8, 9, 10, 11, 12, 11.5, 10.5, 9, 7.5, 6.5];
  const U = 2.8;
  const spec = (timeConvention: 'hourEnding' | 'instant') =>
    baseSpec({
      timeConvention,
      glazing: { shgc: 0.6, panes: 2, uValue: U },
      indoorTemperature: 24,
      weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3], dryBulbMax, dailyRange },
    });
  const area = 2 * 1.5; // rough opening of the fixture window

  test('an instant between the hours reads the profile linearly between them, in its own month; q = U · A · (T − Tin)', () => {
    const f = (h: number) => DAILY_RANGE_FRACTIONS[(h + 23) % 24];
    const cases: [number, number, number, number][] = [
      [7, 15, 13, 30], // 13:30 in July: half-way between the hours ending 13 and 14
      [1, 10, 4, 15], // 04:15 in January: a quarter of the way from hour 4 to the coolest hour 5
      [12, 3, 0, 45], // 00:45 in December: between hour 24 (midnight) and hour 1
    ];
    for (const [month, day, hour, minute] of cases) {
      const share = minute / 60;
      const fraction = (1 - share) * f(hour) + share * f(hour + 1);
      const want = dryBulbMax[month - 1] - fraction * dailyRange[month - 1];
      const g = windowGainAt(spec('instant'), civilToSerial(2026, month, day, hour, minute));
      expect(g.row).toBeUndefined(); // between the rows: the one-hour path
      expect(g.outdoorTemperature).toBeCloseTo(want, 9);
      expect(g.gain.conduction).toBeCloseTo(U * area * (want - 24), 8);
    }
  });

  test('an hour-ending stamp between the rows reads the profile at the end of the hour its middle lies in', () => {
    // 12:20 on 9 July ends the hour whose middle is 11:50: the hour ending 12:00.
    const g = windowGainAt(spec('hourEnding'), civilToSerial(2026, 7, 9, 12, 20));
    expect(g.row).toBeUndefined();
    const want = 31 - DAILY_RANGE_FRACTIONS[11] * 12;
    expect(g.outdoorTemperature).toBeCloseTo(want, 9);
    expect(g.gain.conduction).toBeCloseTo(U * area * (want - 24), 8);
    // 00:10 on 3 March ends the hour whose middle is 23:40 of 2 March: the hour ending 24:00.
    const late = windowGainAt(spec('hourEnding'), civilToSerial(2026, 3, 3, 0, 10));
    expect(late.outdoorTemperature).toBeCloseTo(11 - DAILY_RANGE_FRACTIONS[23] * 8, 9);
  });
});
