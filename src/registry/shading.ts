/**
 * Worksheet-function descriptors: sunlit fraction of a window behind an overhang, fins, a reveal and
 * a skyline; the window's view factors to the open sky and ground; shadow depth and width of long
 * devices; a month × hour sunlit mask. Every descriptor
 * reads its arguments and calls the core (src/core/shading/sunlit.ts, src/core/shading/shadingMask.ts).
 *
 * WINDOWSUNLIT and WINDOWSUNLITMASK take the window as one range of glossary fields
 * (src/registry/windowRange.ts). The positional forms keep their released argument places: sun
 * angles and surface azimuth, the window, then the devices, all optional with defaults meaning "no
 * device", and options added since at the end. Every name is a glossary name, so one name means one
 * thing in every function, the window range, the schedule and the pane.
 */
import { describeValue, SunpaneError } from '../core/common';
import { shadowDepth, shadowWidth, sunlitFraction, type WindowOpening, MASK_DEFAULT_YEAR, monthHourMask, type Shading, windowViewFactors } from '../core/shading';
import type { TimeConvention } from '../core/time';
import { GLOSSARY } from './glossary';
import { type Args, type FunctionDescriptor, NotAvailable, type OutTable, type OutsideCheck, type ParamDescriptor, type WindowFields } from './types';
import { siteFromFields, windowGeometryFromFields } from './windowRange';

const P = {
  width: { ...GLOSSARY.width, description: 'window width (the opening the shading is measured from)' },
  height: { ...GLOSSARY.height, description: 'window height (the opening the shading is measured from)' },
  overhangProjection: GLOSSARY.overhangProjection,
  overhangProjectionRequired: { ...GLOSSARY.overhangProjection, default: undefined, description: 'depth of the overhang out from the wall' },
  overhangGap: GLOSSARY.overhangGap,
  overhangExtensionLeft: GLOSSARY.overhangExtensionLeft,
  overhangExtensionRight: GLOSSARY.overhangExtensionRight,
  leftFinProjection: GLOSSARY.leftFinProjection,
  rightFinProjection: GLOSSARY.rightFinProjection,
  finGap: GLOSSARY.finGap,
  leftFinGap: GLOSSARY.leftFinGap,
  rightFinGap: GLOSSARY.rightFinGap,
  finExtensionAbove: GLOSSARY.finExtensionAbove,
  finExtensionBelow: GLOSSARY.finExtensionBelow,
  revealDepth: GLOSSARY.revealDepth,
  skyline: GLOSSARY.skyline,
  projection: { name: 'projection', kind: 'number', unit: 'm', min: 0, max: GLOSSARY.revealDepth.max, description: 'depth of the overhang or fin out from the wall' } as ParamDescriptor,
  day: { name: 'day', kind: 'number', integer: true, min: 1, max: 28, default: 21, description: 'day of each month the mask is drawn for' } as ParamDescriptor,
  year: { ...GLOSSARY.year, default: MASK_DEFAULT_YEAR, description: 'calendar year of the sun positions (any year gives nearly the same mask)' } as ParamDescriptor,
} as const;

const SUN_WALL: readonly ParamDescriptor[] = [GLOSSARY.sunAltitude, GLOSSARY.sunAzimuth, GLOSSARY.surfaceAzimuth];
const WINDOW: readonly ParamDescriptor[] = [P.width, P.height];
const OVERHANG_REST: readonly ParamDescriptor[] = [P.overhangGap, P.overhangExtensionLeft, P.overhangExtensionRight];
/** The complete shading set, as in SUNLITFRACTION and SUNLITMASK. */
const FULL_SET: readonly ParamDescriptor[] = [
  P.overhangProjection,
  ...OVERHANG_REST,
  P.leftFinProjection,
  P.leftFinGap,
  P.rightFinProjection,
  P.rightFinGap,
  P.finExtensionAbove,
  P.finExtensionBelow,
  P.revealDepth,
  P.skyline,
];

const num = (a: Args, name: string): number => a[name] as number;

function openingOf(a: Args): WindowOpening {
  return { width: num(a, 'width'), height: num(a, 'height') };
}

/** Overhang width W + EL + ER below 0: the reason, or undefined. */
function overhangProblem(a: Args): string | undefined {
  const total = num(a, 'width') + num(a, 'overhangExtensionLeft') + num(a, 'overhangExtensionRight');
  return total < 0 ? `overhangExtensionLeft/Right leave the overhang a negative width (${total})` : undefined;
}

/** Fin height H + EA + EB below 0 (the extensions shared by both fins): the reason, or undefined. */
function finProblem(a: Args): string | undefined {
  const total = num(a, 'height') + num(a, 'finExtensionAbove') + num(a, 'finExtensionBelow');
  return total < 0 ? `finExtensionAbove/Below leave the fins a negative height (${total})` : undefined;
}

/** Throws the fin-height error under the worksheet's own argument names. */
function requireFinHeight(a: Args): void {
  if (finProblem(a) === undefined) return;
  const above = num(a, 'finExtensionAbove') <= num(a, 'finExtensionBelow');
  const name = above ? 'finExtensionAbove' : 'finExtensionBelow';
  const other = num(a, above ? 'finExtensionBelow' : 'finExtensionAbove');
  throw new SunpaneError(name, a[name], `must be at least ${describeValue(-(num(a, 'height') + other))}`, 'the fin height, window height + extension above + extension below, must not be negative');
}

function overhangOf(a: Args): Shading['overhang'] {
  return { projection: num(a, 'overhangProjection'), gap: num(a, 'overhangGap'), extensionLeft: num(a, 'overhangExtensionLeft'), extensionRight: num(a, 'overhangExtensionRight') };
}

function fullShadingOf(a: Args): Shading {
  requireFinHeight(a);
  const fin = (projection: number, gap: number) => ({ projection, gap, extensionAbove: num(a, 'finExtensionAbove'), extensionBelow: num(a, 'finExtensionBelow') });
  const s: Shading = {
    overhang: overhangOf(a),
    leftFin: fin(num(a, 'leftFinProjection'), num(a, 'leftFinGap')),
    rightFin: fin(num(a, 'rightFinProjection'), num(a, 'rightFinGap')),
    revealDepth: num(a, 'revealDepth'),
  };
  if (a.skyline !== undefined) s.skyline = a.skyline as number[];
  return s;
}

function noShadow(): NotAvailable {
  return new NotAvailable('no shadow: the sun is down or behind the wall');
}

const HOURS = Array.from({ length: 24 }, (_, k) => `${String(k + 1).padStart(2, '0')}:00`);
const INSTANTS = Array.from({ length: 24 }, (_, k) => `${String(k).padStart(2, '0')}:00`);

/** The mask's rows, with a header row of month and hour names when asked. */
function maskRows(mask: number[][], convention: TimeConvention, headers: boolean): OutTable {
  if (!headers) return mask;
  return [['month', ...(convention === 'instant' ? INSTANTS : HOURS)], ...mask.map((row, m) => [m + 1, ...row])];
}

function windowMask(a: Args): OutTable {
  const f = a.window as WindowFields;
  const g = windowGeometryFromFields(f, 'window ');
  const site = siteFromFields(f, 'window ');
  const convention = ((f.values.get('timeConvention') as TimeConvention | undefined) ?? 'hourEnding');
  const year = (f.values.get('year') as number | undefined) ?? MASK_DEFAULT_YEAR;
  return maskRows(monthHourMask(site, { width: g.width, height: g.height }, g.shading, g.surfaceAzimuth, { day: num(a, 'day'), year, timeConvention: convention }), convention, a.headers as boolean);
}

/** The reason a window range is refused for its geometry (and place), or undefined. */
function geometryProblem(a: Args, withSite: boolean): string | undefined {
  try {
    windowGeometryFromFields(a.window as WindowFields, 'window ');
    if (withSite) siteFromFields(a.window as WindowFields, 'window ');
    return undefined;
  } catch (err) {
    if (err instanceof SunpaneError) return err.message;
    throw err;
  }
}

/** The columns of the view factors' row. */
const VIEW_COLUMNS = ['skyViewFactor', 'groundViewFactor', 'skyViewRatio', 'groundViewRatio', 'horizonShare'];

/** The view factors of a shaded window: crossed strings, the configuration-factor catalogue and ray casting. */
const VIEW_CHECK: OutsideCheck = {
  source:
    "Hottel's crossed-strings method (a long overhang, derived in the test; to 1e-7); the catalogue of configuration factors (Howell; Siegel & Howell appendix): strip to a parallel rectangle 0.3886 and to a perpendicular rectangle 0.2153 as published, C-11 and C-14 from memory; and three.js 0.187.0 ray casting, a cosine-weighted hemisphere integration over 200 random windows within 0.003 — produced by a named library; in the formula table, a uniform skyline by the view-factor definition.",
  tests: ['tests/reference/crossed-strings-overhang.test.ts', 'tests/reference/configuration-factors.test.ts', 'tests/reference/raycast-view-factors.test.ts', 'tests/fixtures/formulas.ts'],
};

/** The sunlit fraction of overhang, fins, reveal and skyline: long-device closed forms, ray casting and a polygon library. */
const SUNLIT_CHECK: OutsideCheck = {
  source:
    'Long devices: shadow depth P·tan Ω below an overhang and width P·|tan γ| beside a fin (ASHRAE Handbook—Fundamentals, "Fenestration", exterior shading; Duffie & Beckman §1.9 — from memory), exact; any window, devices and sun: three.js 0.187.0 ray casting over 320 random cases (60 × 60 jittered rays each) and the shadow union against polygon-clipping 0.15.7 — produced by named npm libraries.',
  tests: ['tests/core/shading/sunlit.test.ts', 'tests/reference/raycast-three.test.ts', 'tests/reference/polygon-clipping-union.test.ts', 'tests/fixtures/formulas.ts'],
};

export const SHADING_FUNCTIONS: readonly FunctionDescriptor[] = [
  {
    name: 'WINDOWSUNLIT',
    summary: 'Share of a window in the sun behind its own overhang, fins, reveal and skyline (shadows united), the window given as one range of fields',
    category: 'Shading',
    params: [GLOSSARY.window, GLOSSARY.sunAltitude, GLOSSARY.sunAzimuth],
    result: { shape: 'value', min: 0, max: 1, description: 'sunlit fraction of the window area; 0 with the sun down, behind the wall or below the skyline' },
    refuses: (a) => geometryProblem(a, false),
    evaluate: (a) => {
      const g = windowGeometryFromFields(a.window as WindowFields, 'window ');
      return sunlitFraction({ width: g.width, height: g.height }, g.shading, num(a, 'sunAltitude'), num(a, 'sunAzimuth'), g.surfaceAzimuth);
    },
    outsideCheck: SUNLIT_CHECK,
    examples: [
      { args: ['B2:C14', '35', '150'], note: 'the window in B2:C14 (surfaceAzimuth, width, height and its devices) with the sun 35° high at 150°' },
      { args: ['{"surfaceAzimuth",220;"width",1.2;"height",1.5;"skyline","0 0 0 0 0 0 0 0 30 0 0 0"}', '20', '250'], note: '0: a window written as an array constant; a 30° building in the west-south-west hides the sun at 20°' },
    ],
  },
  {
    name: 'WINDOWSUNLITMASK',
    summary: 'Month × hour table of the share of a window in the sun on one day of each month (spills 12 × 24), the window given as one range of fields',
    category: 'Shading',
    params: [GLOSSARY.window, P.day, GLOSSARY.headers],
    result: {
      shape: 'spill',
      description:
        "sunlit fraction 0…1; rows January … December, columns by the window's time convention: hour ending 01:00 … 24:00 (sun at mid-hour) or the instants 00:00 … 23:00; with headers a first row of hours and a first column of months",
      columns: HOURS,
      min: 0,
      max: 1,
    },
    refuses: (a) => geometryProblem(a, true),
    evaluate: windowMask,
    outsideCheck: {
      source: "suncalc 2.0.2 — produced by a named npm library: a bare window's mask is 1 exactly in the hours whose sun suncalc puts above the horizon and in front of the wall; with devices each cell comes from the sunlit-fraction code checked for SUNLITFRACTION (three.js 0.187.0 ray casting).",
      tests: ['tests/core/shading/shadingMask.test.ts', 'tests/reference/raycast-three.test.ts', 'tests/registry/shading.test.ts'],
    },
    examples: [{ args: ['B2:C14'], note: "the window's mask on the 21st of each month (its year, or 2026)" }],
  },
  {
    name: 'OVERHANGSUNLIT',
    summary: 'Share of a window in the sun below an overhang of finite width (exact shadow geometry)',
    category: 'Shading',
    params: [...SUN_WALL, ...WINDOW, P.overhangProjectionRequired, ...OVERHANG_REST],
    result: { shape: 'value', min: 0, max: 1, description: 'sunlit fraction of the window area; 0 with the sun down or behind the wall' },
    refuses: overhangProblem,
    evaluate: (a) => sunlitFraction(openingOf(a), { overhang: overhangOf(a) }, num(a, 'sunAltitude'), num(a, 'sunAzimuth'), num(a, 'surfaceAzimuth')),
    examples: [
      { args: ['45', '180', '180', '2', '1.5', '1', '0.2', '100', '100'], note: '0.4667: a long overhang 1 deep, 0.2 above a 1.5 high window, sun due south at 45° (shadow 1 − 0.2 = 0.8 deep)' },
      { args: ['45', '150', '180', '2', '1.5', '1', '0.2'], note: '0.4713: the same overhang only as wide as the window, sun 30° east of south: the east end escapes part of the shadow (a long one would give 0.3635)' },
    ],
    outsideCheck: SUNLIT_CHECK,
  },
  {
    name: 'FINSUNLIT',
    summary: 'Share of a window in the sun beside a left and/or right fin (exact shadow geometry)',
    category: 'Shading',
    params: [...SUN_WALL, ...WINDOW, P.leftFinProjection, P.rightFinProjection, P.finGap, P.finExtensionAbove, P.finExtensionBelow],
    result: { shape: 'value', min: 0, max: 1, description: 'sunlit fraction of the window area; 0 with the sun down or behind the wall' },
    refuses: finProblem,
    evaluate: (a) => {
      requireFinHeight(a);
      const fin = (projection: number) => ({ projection, gap: num(a, 'finGap'), extensionAbove: num(a, 'finExtensionAbove'), extensionBelow: num(a, 'finExtensionBelow') });
      const shading: Shading = { leftFin: fin(num(a, 'leftFinProjection')), rightFin: fin(num(a, 'rightFinProjection')) };
      return sunlitFraction(openingOf(a), shading, num(a, 'sunAltitude'), num(a, 'sunAzimuth'), num(a, 'surfaceAzimuth'));
    },
    examples: [
      { args: ['30', '135', '180', '2', '1.5', '0', '1', '0.5', '100', '100'], note: '0.75: a tall right fin 1 deep, 0.5 from the jamb, sun 45° to the right (east on a south wall)' },
      { args: ['30', '225', '180', '2', '1.5', '0', '1', '0.5'], note: '1: the same fin with the sun on the other side casts no shadow on the window' },
    ],
    outsideCheck: SUNLIT_CHECK,
  },
  {
    name: 'SUNLITFRACTION',
    summary: 'Share of a window in the sun behind overhang, fins, reveal and skyline together (shadows united, never summed), every device a positional argument (the older form of WINDOWSUNLIT)',
    category: 'Shading',
    params: [...SUN_WALL, ...WINDOW, ...FULL_SET],
    result: { shape: 'value', min: 0, max: 1, description: 'sunlit fraction of the window area; 0 with the sun down, behind the wall or below the skyline' },
    refuses: (a) => overhangProblem(a) ?? finProblem(a),
    supersededBy: 'WINDOWSUNLIT',
    evaluate: (a) => sunlitFraction(openingOf(a), fullShadingOf(a), num(a, 'sunAltitude'), num(a, 'sunAzimuth'), num(a, 'surfaceAzimuth')),
    examples: [
      { args: ['35', '150', '180', '1.2', '1.5', '0.6', '0.1', '0.2', '0.2', '0.3', '0', '0.3', '0', '0', '0', '0.1'], note: 'overhang, two fins and a 0.1 reveal on a south window, mid-morning sun' },
    ],
    outsideCheck: SUNLIT_CHECK,
  },
  {
    name: 'VIEWFACTORS',
    summary: "What a window's glass still sees of the open sky and ground past overhang, fins, reveal and skyline: view factors, their ratios to the bare window and the open share of the horizon band",
    category: 'Shading',
    params: [GLOSSARY.surfaceAzimuth, ...WINDOW, ...FULL_SET],
    result: {
      shape: 'spill',
      columns: VIEW_COLUMNS,
      min: 0,
      max: 1,
      description:
        'one row: glass-averaged view factor to the open sky and to the open ground (½ each for a bare vertical window), each over the bare window’s ½ (the share of the isotropic sky diffuse and of the ground-reflected light that reaches the glass), and the open share of the sky 0–6.5° above the horizon; devices and skyline block together, black; numerical error at most 0.002',
    },
    refuses: (a) => overhangProblem(a) ?? finProblem(a),
    evaluate: (a) => {
      const vf = windowViewFactors(openingOf(a), fullShadingOf(a), num(a, 'surfaceAzimuth'));
      return [[vf.sky, vf.ground, vf.skyRatio, vf.groundRatio, vf.horizonShare]];
    },
    examples: [
      { args: ['180', '1.2', '1.5', '1', '0', '100', '100'], note: 'a 1.0 m overhang at the head running 100 m each side: sky 0.2676 (ratio 0.5352, the crossed-strings value of a long overhang), ground 0.5, horizon band 0.941' },
    ],
    supersededBy: 'WINDOWVIEWFACTORS',
    outsideCheck: VIEW_CHECK,
  },
  {
    name: 'WINDOWVIEWFACTORS',
    summary: "What a window's glass still sees of the open sky and ground past its own overhang, fins, reveal and skyline, the window given as one range of fields",
    category: 'Shading',
    params: [GLOSSARY.window, GLOSSARY.headers],
    result: {
      shape: 'spill',
      columns: VIEW_COLUMNS,
      min: 0,
      max: 1,
      description:
        'one row (under a header row of the column names with headers TRUE): view factor to the open sky and to the open ground (½ each for a bare vertical window), each over the bare window’s ½, and the open share of the sky 0–6.5° above the horizon; devices and skyline block together, black; numerical error at most 0.002',
    },
    refuses: (a) => geometryProblem(a, false),
    evaluate: (a) => {
      const g = windowGeometryFromFields(a.window as WindowFields, 'window ');
      const vf = windowViewFactors({ width: g.width, height: g.height }, g.shading, g.surfaceAzimuth);
      const row = [vf.sky, vf.ground, vf.skyRatio, vf.groundRatio, vf.horizonShare];
      return a.headers === true ? [[...VIEW_COLUMNS], row] : [row];
    },
    examples: [
      { args: ['B2:C14'], note: 'the window in B2:C14 (surfaceAzimuth, width, height and its devices)' },
      { args: ['{"surfaceAzimuth",180;"width",2.4;"height",2.1;"revealDepth",0.15}', 'TRUE'], note: 'glass set back 0.15 m: sky and ground 0.4397 each (ratio 0.8793), horizon band 0.934, under a header row' },
    ],
    outsideCheck: VIEW_CHECK,
  },
  {
    name: 'SHADOWDEPTH',
    summary: 'How far the shadow of a long overhang reaches down the wall below its edge (projection × tan profile angle)',
    category: 'Shading',
    params: [...SUN_WALL, P.projection],
    result: { shape: 'value', unit: 'm', min: 0, description: 'vertical shadow depth below the edge, in the unit of the projection; #N/A with the sun down or behind the wall' },
    evaluate: (a) => shadowDepth(num(a, 'projection'), num(a, 'sunAltitude'), num(a, 'sunAzimuth'), num(a, 'surfaceAzimuth')) ?? noShadow(),
    examples: [
      { args: ['45', '180', '180', '1'], note: '1: sun due south at 45° on a south wall' },
      { args: ['45', '240', '180', '1'], note: '2: the sun 60° round to the west doubles the profile angle tangent' },
    ],
    outsideCheck: { source: 'Shadow depth of a long overhang = projection × tan(profile angle) (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., §1.9 — from memory), worked by hand: sun normal to the wall at 45° and 60°.', tests: ['tests/fixtures/formulas.ts', 'tests/registry/shading.test.ts'] },
  },
  {
    name: 'SHADOWWIDTH',
    summary: 'How far the shadow of a tall fin reaches sideways across the wall (projection × |tan horizontal shadow angle|)',
    category: 'Shading',
    params: [...SUN_WALL, P.projection],
    result: { shape: 'value', unit: 'm', min: 0, description: 'horizontal shadow width beside the fin, on the side away from the sun; #N/A with the sun down or behind the wall' },
    evaluate: (a) => shadowWidth(num(a, 'projection'), num(a, 'sunAltitude'), num(a, 'sunAzimuth'), num(a, 'surfaceAzimuth')) ?? noShadow(),
    examples: [{ args: ['30', '135', '180', '1'], note: '1: the sun 45° to the side' }],
    outsideCheck: { source: 'Shadow width of a tall fin = projection × |tan γ| (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., §1.9 — from memory), worked by hand for |γ| = 45° and 20°.', tests: ['tests/fixtures/formulas.ts', 'tests/registry/shading.test.ts'] },
  },
  {
    name: 'SUNLITMASK',
    summary: 'Month × hour table of the share of a window in the sun on one day of each month (spills 12 × 24), every field a positional argument (the older form of WINDOWSUNLITMASK)',
    category: 'Shading',
    params: [GLOSSARY.latitude, GLOSSARY.longitude, GLOSSARY.utcOffset, GLOSSARY.surfaceAzimuth, ...WINDOW, ...FULL_SET, P.day, P.year, GLOSSARY.timeConvention, GLOSSARY.headers],
    result: {
      shape: 'spill',
      description: 'sunlit fraction 0…1; rows January … December, columns hour ending 01:00 … 24:00 local standard time (sun at mid-hour; with timeConvention instant the instants 00:00 … 23:00); 0 with the sun down, behind the wall or below the skyline',
      columns: HOURS,
      min: 0,
      max: 1,
    },
    refuses: (a) => overhangProblem(a) ?? finProblem(a),
    supersededBy: 'WINDOWSUNLITMASK',
    evaluate: (a) =>
      maskRows(
        monthHourMask({ latitude: num(a, 'latitude'), longitude: num(a, 'longitude'), utcOffset: num(a, 'utcOffset') }, openingOf(a), fullShadingOf(a), num(a, 'surfaceAzimuth'), {
          day: num(a, 'day'),
          year: num(a, 'year'),
          timeConvention: a.timeConvention as TimeConvention,
        }),
        a.timeConvention as TimeConvention,
        a.headers as boolean,
      ),
    examples: [{ args: ['51.5', '-0.1', '0', '180', '1.2', '1.5', '0.8', '0.1', '0.3', '0.3'], note: 'a south window at 51.5° N (an example location) under a 0.8 overhang: shaded at midday in summer, sunlit in winter' }],
    outsideCheck: { source: 'suncalc 2.0.2 — produced by a named npm library: a bare window\'s mask is 1 exactly in the hours whose mid-hour sun suncalc puts above the horizon and in front of the wall; with devices each cell comes from the sunlit-fraction code checked for SUNLITFRACTION (three.js 0.187.0 ray casting).', tests: ['tests/core/shading/shadingMask.test.ts', 'tests/reference/raycast-three.test.ts'] },
  },
];
