/**
 * Worksheet-function descriptors: glazing — SHGC at an incidence angle (physical model or the user's
 * table), diffuse SHGC and glass area. The core computes (src/core/glazing/shgc.ts).
 */
import { diffuseShgc, diffuseShgcFromTable, glassArea, shgcAtAngle, shgcFromTable, TABLE_MIN_SPACING } from '../core/glazing';
import { SunpaneError } from '../core/common';
import { GLOSSARY } from './glossary';
import type { Args, FunctionDescriptor, OutsideCheck, ParamDescriptor } from './types';

const incidence: ParamDescriptor = { ...GLOSSARY.incidence, description: 'incidence angle of the sun on the glass (90 or more: sun behind it, SHGC 0)' };
const { shgc, panes } = GLOSSARY;
const shgcAngles: ParamDescriptor = { ...GLOSSARY.shgcAngles, optional: false, description: 'incidence angles of your SHGC table, strictly ascending, at least 0.01° apart' };
const shgcValues: ParamDescriptor = { ...GLOSSARY.shgcValues, optional: false, description: 'SHGC at each of the shgcAngles, same count' };

function table(a: Args) {
  return { angles: a.shgcAngles as number[], values: a.shgcValues as number[] };
}

/** The table's angles and values as given, checked together: the reason it is refused, or undefined. */
function tableMismatch(a: Args): string | undefined {
  const x = a.shgcAngles as number[] | undefined;
  const y = a.shgcValues as number[] | undefined;
  if (x && y && x.length !== y.length) return `shgcAngles has ${x.length} values but shgcValues has ${y.length}`;
  const k = x ? x.findIndex((v, i) => i > 0 && v - x[i - 1] < TABLE_MIN_SPACING) : -1;
  return k > 0 ? `shgcAngles ${x![k - 1]} and ${x![k]} are less than ${TABLE_MIN_SPACING}° apart` : undefined;
}

/** Checks the table; a refusal names shgcAngles or shgcValues as the signature does. */
function checkedTable(a: Args) {
  const reason = tableMismatch(a);
  if (reason !== undefined) {
    const name = reason.startsWith('shgcAngles has') ? 'shgcValues' : 'shgcAngles';
    throw new SunpaneError(name, a[name] as number[], reason.replace(/^shgcAngles /, ''));
  }
  return table(a);
}

/** The diffuse SHGC: the hemispherical average and its quadrature, each against published forms. */
const DIFFUSE_CHECK: OutsideCheck = {
  source:
    'The hemispherical average 2∫ X(θ) cos θ sin θ dθ (Duffie & Beckman, 4th ed., §5.4) against its closed forms (a constant, cos θ → 2/3, cos² θ → 1/2, a step) and the Gauss–Legendre nodes and weights of Abramowitz & Stegun (1964) Table 25.4 — stated in the publication; the diffuse SHGC is held to that average of the SHGC curve.',
  tests: ['tests/reference/hemispherical-average.test.ts', 'tests/reference/gauss-legendre-abramowitz-stegun.test.ts', 'tests/core/glazing/shgc.test.ts'],
};

export const GLAZING_FUNCTIONS: readonly FunctionDescriptor[] = [
  {
    name: 'SHGCANGLE',
    summary: 'SHGC at an incidence angle from the normal-incidence SHGC and pane count (Fresnel reflection and absorption).',
    category: 'Glazing',
    params: [incidence, shgc, panes],
    result: { shape: 'value', min: 0, max: 1, description: 'SHGC at the angle, never above the normal value; 0 from 90° on' },
    evaluate: (a) => shgcAtAngle(a.shgc as number, a.panes as number, a.incidence as number),
    examples: [
      { args: ['60', '0.7', '2'], note: 'double glazing rated 0.70, sun 60° off the normal' },
      { args: ['0', '0.7'], note: 'normal incidence returns the rating itself' },
    ],
    outsideCheck: { source: 'Fresnel equations, Snell\'s law and pane stacks of Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., ch. 5: normal reflectance 0.0434 for n = 1.526 and N covers transmitting (1 − r)/(1 + (2N − 1) r) — from the published equations; Example 5.1.1 (one and two covers at 60°: 0.84 and 0.76) from memory; SHGC(0°) is the rating and 0 at 90°.', tests: ['tests/reference/fresnel-glazing.test.ts', 'tests/fixtures/formulas.ts'] },
  },
  {
    name: 'SHGCLOOKUP',
    summary: 'SHGC at an incidence angle from your table of SHGC by angle (monotone cubic, tapering to 0 at 90°).',
    category: 'Glazing',
    params: [incidence, shgcAngles, shgcValues],
    result: { shape: 'value', min: 0, max: 1, description: 'SHGC at the angle; 0 from 90° on' },
    evaluate: (a) => shgcFromTable(checkedTable(a), a.incidence as number),
    refuses: tableMismatch,
    examples: [{ args: ['55', '{0,40,50,60,70,80}', '{0.7,0.68,0.66,0.6,0.48,0.28}'], note: 'between the 50° and 60° rows of a product table' }],
    outsideCheck: { source: 'Fritsch & Carlson (1980), SIAM J. Numer. Anal. 17(2): the interpolant passes through the RPN 14 data set of the paper and stays monotone (data from memory); the table points themselves come back exactly.', tests: ['tests/reference/fritsch-carlson-1980.test.ts', 'tests/fixtures/formulas.ts'] },
  },
  {
    name: 'SHGCDIFFUSE',
    summary: 'Hemispherical (diffuse) SHGC from the normal-incidence SHGC and pane count.',
    category: 'Glazing',
    params: [shgc, panes],
    result: { shape: 'value', min: 0, max: 1, description: 'SHGC for isotropic diffuse irradiance, 2∫ SHGC(θ) cos θ sin θ dθ' },
    evaluate: (a) => diffuseShgc(a.shgc as number, a.panes as number),
    examples: [{ args: ['0.7', '2'], note: 'double glazing rated 0.70' }],
    outsideCheck: DIFFUSE_CHECK,
  },
  {
    name: 'SHGCDIFFUSELOOKUP',
    summary: 'Hemispherical (diffuse) SHGC from your table of SHGC by angle.',
    category: 'Glazing',
    params: [shgcAngles, shgcValues],
    result: { shape: 'value', min: 0, max: 1, description: 'SHGC for isotropic diffuse irradiance, integrated over the interpolated table' },
    evaluate: (a) => diffuseShgcFromTable(checkedTable(a)),
    refuses: tableMismatch,
    examples: [{ args: ['{0,40,50,60,70,80}', '{0.7,0.68,0.66,0.6,0.48,0.28}'], note: 'diffuse value of a product table' }],
    outsideCheck: DIFFUSE_CHECK,
  },
  {
    name: 'GLASSAREA',
    summary: 'Glass area of a window from its rough opening and the frame share.',
    category: 'Glazing',
    params: [
      { ...GLOSSARY.width, max: 1000, description: 'rough-opening width' },
      { ...GLOSSARY.height, max: 1000, description: 'rough-opening height' },
      GLOSSARY.frameFraction,
    ],
    result: { shape: 'value', unit: 'm²', min: 0, description: 'width × height × (1 − frame share)' },
    evaluate: (a) => glassArea(a.width as number, a.height as number, a.frameFraction as number),
    examples: [{ args: ['1.2', '1.5', '0.2'], note: '1.44 m² of glass' }],
    outsideCheck: { source: 'The definition of the frame share: glass area = width × height × (1 − frame share), worked by hand: 1.2 × 1.5 × 0.8 = 1.44 m² (common practice, no source).', tests: ['tests/fixtures/formulas.ts'] },
  },
];
