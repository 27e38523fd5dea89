/**
 * From the form's boxes to a WindowSpec, and the core's validation messages back beside the boxes.
 * Expected messages are produced by the core's own validator (src/core/gain/windowSpec.ts) on specs
 * written out here, so the test checks that the pane passes values through unchanged and puts each
 * message beside the right box.
 */
import { inGlossaryWords } from '../../src/registry/windowRange';
import { SunpaneError } from '../../src/core/common/errors';
import type { WindowSpec } from '../../src/core/gain/window';
import { validateWindowSpec } from '../../src/core/gain/windowSpec';
import { FIELD_BY_ID, applyExampleSite, fieldForArgument, initialValues } from '../../src/taskpane/fields';
import { inUserWords } from '../../src/taskpane/messages';
import { buildWindowSpec, findProblems, isClean, readListText, readNumberText } from '../../src/taskpane/spec';
import { validateSpec } from '../../src/taskpane/engine';
import { applyFunction } from '../../src/registry/evaluate';
import { findFunction } from '../../src/registry';
import type { RawArg } from '../../src/registry/types';
import { civilToSerial } from '../../src/core/time/calendar';

const validate = (s: WindowSpec) => void validateWindowSpec(s);

/** The core's refusal in the glossary's words (the field's name, not its path inside the description). */
function coreMessage(spec: WindowSpec): string {
  try {
    validateWindowSpec(spec);
  } catch (err) {
    const named = inGlossaryWords(err);
    if (named instanceof SunpaneError) return named.message;
  }
  throw new Error('expected a refusal');
}

describe('the window form', () => {
  test('the initial form is a valid window with no devices, clear sky and the usual defaults', () => {
    const spec = buildWindowSpec({ ...initialValues(), year: '2025' });
    expect(() => validateWindowSpec(spec)).not.toThrow();
    expect(spec.glazing).toEqual({ shgc: 0.4, panes: 2, interiorAttenuation: 1 });
    expect(spec.frameFraction).toBe(0.15);
    expect(spec.groundAlbedo).toBe(0.2);
    expect(spec.shading).toEqual({});
    expect(spec.weather).toEqual({ kind: 'ineichenClearSky', linkeTurbidity: [3] });
  });

  test('devices appear only when their depth is not zero, and blank device boxes mean zero', () => {
    const spec = buildWindowSpec({ ...initialValues(), overhangProjection: '0.6', overhangGap: '', rightFinProjection: '0.3', revealDepth: '0.1' });
    expect(spec.shading.overhang).toEqual({ projection: 0.6, gap: 0, extensionLeft: 0, extensionRight: 0 });
    expect(spec.shading.leftFin).toBeUndefined();
    expect(spec.shading.rightFin).toEqual({ projection: 0.3, gap: 0, extensionAbove: 0, extensionBelow: 0 });
    expect(spec.shading.revealDepth).toBe(0.1);
  });

  test('numbers are read as typed; text and blanks go to the core as they are', () => {
    expect(readNumberText(' 0.35 ')).toBe(0.35);
    expect(readNumberText('')).toBeNull();
    expect(readNumberText('abc')).toBe('abc');
    expect(readListText('3.1, 3.3; 3.6  4')).toEqual([3.1, 3.3, 3.6, 4]);
  });

  test("each bad box gets the core's own message, all at once", () => {
    const values = { ...initialValues(), year: '2025', shgc: '1.4', latitude: 'north', width: '' };
    const problems = findProblems(values, validate);
    const base = buildWindowSpec({ ...initialValues(), year: '2025' });
    expect(problems.byField.shgc).toBe(coreMessage({ ...base, glazing: { ...base.glazing, shgc: 1.4 } }));
    expect(problems.byField.latitude).toBe(coreMessage({ ...base, site: { ...base.site, latitude: 'north' as never } }));
    expect(problems.byField.width).toBe(coreMessage({ ...base, width: null as never }));
    expect(Object.keys(problems.byField).sort()).toEqual(['latitude', 'shgc', 'width']);
    expect(problems.general).toEqual([]);
  });

  test('a device on a tilted window is refused beside the tilt box', () => {
    const problems = findProblems({ ...initialValues(), year: '2025', surfaceTilt: '45', overhangProjection: '0.5' }, validate);
    expect(problems.byField.surfaceTilt).toMatch(/^surfaceTilt = 45 is not allowed: must be 90/);
  });

  test('twelve monthly turbidities are checked value by value, and the message lands beside the list box', () => {
    const problems = findProblems({ ...initialValues(), year: '2025', linkeTurbidity: '3,3,3,3,3,30,3,3,3,3,3,3' }, validate);
    const base = buildWindowSpec({ ...initialValues(), year: '2025' });
    const monthly = [3, 3, 3, 3, 3, 30, 3, 3, 3, 3, 3, 3];
    expect(problems.byField.linkeTurbidity).toBe(coreMessage({ ...base, weather: { kind: 'ineichenClearSky', linkeTurbidity: monthly } }));
    expect(problems.byField.linkeTurbidity).toMatch(/^linkeTurbidity \(value 6\) = 30 is not allowed/);
    expect(isClean(findProblems({ ...initialValues(), year: '2025', linkeTurbidity: '3,3,3,3,3,3,3,3,3,3,3,3' }, validate))).toBe(true);
  });

  test('a τd list of a length other than 1 or 12 gets the monthly-list words beside the Tau d box, whatever τb holds; 1 beside 12 is accepted', () => {
    const ashrae = { ...initialValues(), year: '2025', weatherSource: 'ashraeClearSky' };
    const twelve = '0.4, 0.4, 0.4, 0.4, 0.4, 0.4, 0.4, 0.4, 0.4, 0.4, 0.4, 0.4';
    const words = 'a list of 2 is not allowed: must hold one value for the whole year or 12 monthly values (January first)';
    for (const tauB of ['0.4', twelve]) {
      const problems = findProblems({ ...ashrae, tauB, tauD: '2.2; 2.3' }, validateSpec);
      expect(problems).toEqual({ byField: { tauD: `tauD = ${words}` }, general: [] });
      // as the pane shows it under the box (formView.ts): the box's label, then the core's words
      expect(inUserWords(problems.byField.tauD, FIELD_BY_ID.get('tauD')!.label)).toBe(`Tau d, diffuse optical depth (1 or 12 values): ${words}`);
    }
    expect(isClean(findProblems({ ...ashrae, tauB: twelve, tauD: '2.2' }, validateSpec))).toBe(true);
    expect(isClean(findProblems({ ...ashrae, tauB: '0.4', tauD: twelve.replace(/0\.4/g, '2.2') }, validateSpec))).toBe(true);
  });

  test('hourly weather needs two range addresses, checked before anything is read', () => {
    const problems = findProblems({ ...initialValues(), year: '2025', weatherSource: 'measured', dniAddress: 'Weather!B2:B8761', dhiAddress: 'nowhere' }, validate);
    expect(problems.byField).toEqual({ dhiAddress: expect.stringMatching(/^dhi = "nowhere" is not allowed: must be a range address/) });
  });

  test('messages find their box by the longest matching path', () => {
    expect(fieldForArgument('shading.overhang.projection')?.id).toBe('overhangProjection');
    expect(fieldForArgument('shading.overhang.extensionRight')?.id).toBe('overhangExtensionRight');
    expect(fieldForArgument('glazing.angleTable.values[3]')?.id).toBe('angleTableAddress');
    expect(fieldForArgument('shading.skyline[2]')?.id).toBe('skylineAddress');
    expect(fieldForArgument('site.latitude')?.id).toBe('latitude');
    expect(fieldForArgument('nothing.like.this')).toBeUndefined();
  });

  test('picking an example site fills the place, ground and turbidity boxes from the shared example list', () => {
    const v = applyExampleSite(initialValues(), 'kestrelHeads');
    expect([v.latitude, v.longitude, v.utcOffset]).toEqual(['-37.9', '145', '10']);
    expect(readListText(v.linkeTurbidity)).toHaveLength(12);
  });
});

describe('the daylight-saving rule in the form', () => {
  const form = { ...initialValues(), year: '2025' };
  /** The same window as a range of the worksheet functions' fields. */
  const RANGE: [string, number | string][] = [['latitude', 52.2], ['longitude', 4.9], ['utcOffset', 1], ['surfaceAzimuth', 180], ['width', 1.8], ['height', 1.5], ['shgc', 0.4], ['year', 2025], ['linkeTurbidity', 3]];
  /** SOLARGAIN's message for the window with these daylight-saving fields, without the argument's name before the field's. */
  const functionsSay = (rule: Record<string, string>): string => {
    const out = applyFunction(findFunction('SOLARGAIN')!, [[...RANGE, ...Object.entries(rule)] as RawArg, '2025-07-01T12:00'])[0][0];
    if (!(out instanceof SunpaneError)) throw new Error('expected SOLARGAIN to refuse the rule');
    return out.message.replace(/^window /, '');
  };

  test('a rule typed in the three boxes is the rule the functions read; blank boxes: standard time; a blank shift: 1 h', () => {
    expect(buildWindowSpec(form).site.daylightSaving).toBeUndefined();
    const rule = { daylightSavingStart: '2025-03-30 02:00', daylightSavingEnd: '2025-10-26T03:00' };
    expect(buildWindowSpec({ ...form, ...rule }).site.daylightSaving).toEqual({ start: civilToSerial(2025, 3, 30, 2), end: civilToSerial(2025, 10, 26, 3), shift: 1 });
    expect(buildWindowSpec({ ...form, ...rule, daylightSavingShift: '0.5' }).site.daylightSaving?.shift).toBe(0.5);
    expect(isClean(findProblems({ ...form, ...rule }, validateSpec))).toBe(true);
    // the same rule given to the functions: no refusal, the same gain as the pane's window
    const gain = applyFunction(findFunction('SOLARGAIN')!, [[...RANGE, ['daylightSavingStart', rule.daylightSavingStart], ['daylightSavingEnd', rule.daylightSavingEnd]] as RawArg, '2025-07-01T12:00'])[0][0];
    expect(typeof gain).toBe('number');
  });

  test.each([
    ['an end before the start', { daylightSavingStart: '2025-10-26 03:00', daylightSavingEnd: '2025-03-30 02:00' }, 'daylightSavingEnd'],
    ['a shift outside above 0 up to 2 h', { daylightSavingStart: '2025-03-30 02:00', daylightSavingEnd: '2025-10-26 03:00', daylightSavingShift: '3' }, 'daylightSavingShift'],
    ['a shift with no dates', { daylightSavingShift: '1' }, 'daylightSavingStart'],
    ['a start that is no date-time', { daylightSavingStart: 'soon', daylightSavingEnd: '2025-10-26 03:00' }, 'daylightSavingStart'],
  ])('%s: the functions\' message, beside its box, once', (_what, rule, box) => {
    const problems = findProblems({ ...form, ...rule }, validateSpec);
    expect(problems).toEqual({ byField: { [box]: functionsSay(rule) }, general: [] });
  });
});

describe('the daylight-saving boxes in a workbook of the 1904 date system', () => {
  // ECMA-376 Part 1, §18.17.4.1: in the 1904 date system serial 0 is 1 January 1904 00:00, one day
  // per unit; in the 1900 system the same date-time has a serial 1,462 larger. The serials here are
  // counted from that definition with the JavaScript Date (not with the code under test).
  const serial1904 = (iso: string) => (Date.parse(`${iso}Z`) - Date.UTC(1904, 0, 1)) / 86_400_000;
  const serial1900 = (iso: string) => (Date.parse(`${iso}Z`) - Date.UTC(1899, 11, 30)) / 86_400_000;
  const form = { ...initialValues(), year: '2025' };
  const iso = { daylightSavingStart: '2025-03-30T02:00', daylightSavingEnd: '2025-10-26T03:00' };
  const RANGE: [string, number | string][] = [['latitude', 52.2], ['longitude', 4.9], ['utcOffset', 1], ['surfaceAzimuth', 180], ['width', 1.8], ['height', 1.5], ['shgc', 0.4], ['year', 2025], ['linkeTurbidity', 3], ['dateSystem', 1904]];
  /** SOLARGAIN's message for a window range of the 1904 date system with these daylight-saving cells. */
  const functionsSay = (rule: Record<string, number | string>): string => {
    const out = applyFunction(findFunction('SOLARGAIN')!, [[...RANGE, ...Object.entries(rule)] as RawArg, '2025-07-01T12:00'])[0][0];
    if (!(out instanceof SunpaneError)) throw new Error('expected SOLARGAIN to refuse the rule');
    return out.message.replace(/^window /, '');
  };

  test('the same rule as ISO text and as 1904 serials is the same rule; ISO text reads the same in both systems', () => {
    const serials = { daylightSavingStart: String(serial1904(iso.daylightSavingStart)), daylightSavingEnd: String(serial1904(iso.daylightSavingEnd)) };
    expect(serials).toEqual({ daylightSavingStart: String(44284 + 1 / 12), daylightSavingEnd: String(44494 + 1 / 8) });
    const fromIso = buildWindowSpec({ ...form, ...iso }, {}, 1904).site.daylightSaving;
    expect(fromIso).toEqual(buildWindowSpec({ ...form, ...iso }, {}, 1900).site.daylightSaving);
    expect(buildWindowSpec({ ...form, ...serials }, {}, 1904).site.daylightSaving).toEqual(fromIso);
    expect(fromIso).toEqual({ start: civilToSerial(2025, 3, 30, 2), end: civilToSerial(2025, 10, 26, 3), shift: 1 });
    expect(isClean(findProblems({ ...form, ...serials }, validateSpec, undefined, 1904))).toBe(true);
  });

  test('a 1900 serial typed in a 1904 workbook is the date the 1904 system gives it: 1,462 days on', () => {
    const typed = { daylightSavingStart: String(serial1900(iso.daylightSavingStart)), daylightSavingEnd: String(serial1900(iso.daylightSavingEnd)) };
    expect(buildWindowSpec({ ...form, ...typed }, {}, 1900).site.daylightSaving).toEqual(buildWindowSpec({ ...form, ...iso }).site.daylightSaving);
    expect(buildWindowSpec({ ...form, ...typed }, {}, 1904).site.daylightSaving).toEqual({
      start: serial1900('2029-03-31T02:00'),
      end: serial1900('2029-10-27T03:00'),
      shift: 1,
    });
  });

  test.each([
    ['serial 0 (1 January 1904) and a day on: a rule in 1904, refused by the 1900 system alone', { daylightSavingStart: '0', daylightSavingEnd: '1' }, undefined],
    ['a serial below 0', { daylightSavingStart: '-1', daylightSavingEnd: '200' }, 'daylightSavingStart'],
    ['an end serial before the start serial', { daylightSavingStart: '44494.125', daylightSavingEnd: '44284.0833333333' }, 'daylightSavingEnd'],
    ['a serial past 9999', { daylightSavingStart: '44284', daylightSavingEnd: '3000000' }, 'daylightSavingEnd'],
  ])("%s: the functions' check and message", (_what, rule, box) => {
    const problems = findProblems({ ...form, ...rule }, validateSpec, undefined, 1904);
    if (box === undefined) {
      expect(problems).toEqual({ byField: {}, general: [] });
      expect(buildWindowSpec({ ...form, ...rule }, {}, 1904).site.daylightSaving).toEqual({ start: 1462, end: 1463, shift: 1 });
      expect(findProblems({ ...form, ...rule }, validateSpec, undefined, 1900).byField.daylightSavingStart).toMatch(/^daylightSavingStart = 0 is not allowed/);
    } else {
      expect(problems).toEqual({ byField: { [box]: functionsSay(Object.fromEntries(Object.entries(rule).map(([k, v]) => [k, Number(v)]))) }, general: [] });
    }
  });
});
