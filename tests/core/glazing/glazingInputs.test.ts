/**
 * The glazing module's choices and refusals: which model a glazing gets, the area its SHGC applies to,
 * interior attenuation, the solver for a pane's absorption, and the words of every refusal.
 *
 * Sources named beside each check:
 * - the error convention of docs/architecture.md ("Errors"): a refusal names the argument as the user
 *   sees it, the value, and the allowed range in words;
 * - the documented contracts in src/core/glazing (types, defaults, the table rules);
 * - the definition of a whole-window SHGC, rated over the whole rough opening, frame included, against a
 *   centre-of-glass SHGC over the glass alone (NFRC 200 / ISO 15099 usage, from memory);
 * - the interior attenuation coefficient as a multiplier on the bare glazing's gain, beam and diffuse
 *   each with their own (ASHRAE Handbook—Fundamentals (2013) ch. 15, from memory);
 * - Fresnel optics without absorption, (1 − r)/(1 + (2N − 1) r) per polarisation for N panes
 *   (Duffie & Beckman, Solar Engineering of Thermal Processes, 4th ed., Eq. 5.1.8, from memory).
 */
import {
  diffuseShgcOfType,
  glazingTypeOf,
  interiorAttenuationOf,
  interiorAttenuationsOf,
  requireAngleTable,
  shgcAtAngle,
  shgcAtAngleOfType,
  shgcBasisOf,
  shgcCurve,
  shgcFromTable,
  solarArea,
} from '../../../src/core/glazing/shgc';
import { GLASS_REFRACTIVE_INDEX, interfaceReflectance, KL_MAX, paneExtinctionFor, paneStackTransmittance } from '../../../src/core/glazing/fresnel';
import { karlssonRoosFactor } from '../../../src/core/glazing/karlssonRoos';
import { diffuseShgc } from '../../../src/core/glazing/shgc';
import { expectArgumentError, refusalOf as refusal } from '../../support/expectError';

/** The refusal thrown by fn (docs/architecture.md, "Errors": argument, value, allowed range in words). */
describe('which model a glazing gets (the documented defaults)', () => {
  test('no type: a table when an angle table is given, else clear panes; a given type is kept', () => {
    expect(glazingTypeOf({ shgc: 0.5, panes: 2 })).toBe('clear');
    expect(glazingTypeOf({ shgc: 0.5, panes: 2, angleTable: { angles: [0], values: [0.5] } })).toBe('table');
    expect(glazingTypeOf({ shgc: 0.5, panes: 2, type: 'tinted' })).toBe('tinted');
    expect(glazingTypeOf({ shgc: 0.5, panes: 2, type: 'coated', angleTable: { angles: [0], values: [0.5] } })).toBe('coated');
    const e = refusal(() => glazingTypeOf({ shgc: 0.5, panes: 2, type: 'frosted' as never }));
    expect(e.argument).toBe('glazing.type');
    expect(e.message).toBe('glazing.type = "frosted" is not allowed: must be one of "clear", "tinted", "coated", "table"');
  });

  test('the SHGC basis is centre of glass unless whole window is given; others are refused listing both', () => {
    expect(shgcBasisOf({ shgc: 0.5, panes: 2 })).toBe('centreOfGlass');
    expect(shgcBasisOf({ shgc: 0.5, panes: 2, shgcBasis: 'wholeWindow' })).toBe('wholeWindow');
    expect(shgcBasisOf({ shgc: 0.5, panes: 2, shgcBasis: 'centreOfGlass' })).toBe('centreOfGlass');
    const e = refusal(() => shgcBasisOf({ shgc: 0.5, panes: 2, shgcBasis: 'frame' as never }));
    expect(e.message).toBe('glazing.shgcBasis = "frame" is not allowed: must be one of "centreOfGlass", "wholeWindow"');
  });

  test('a clear or tinted glazing by name is the Fresnel model, a coated one Karlsson & Roos scaled by its SHGC', () => {
    for (const theta of [0, 35, 60, 80]) {
      expect(shgcAtAngleOfType(0.55, 2, theta, 'clear')).toBe(shgcAtAngle(0.55, 2, theta));
      expect(shgcAtAngleOfType(0.55, 2, theta, 'tinted')).toBe(shgcAtAngle(0.55, 2, theta));
      expect(shgcAtAngleOfType(0.55, 2, theta, 'coated', 3)).toBeCloseTo(0.55 * karlssonRoosFactor(theta, 2, 3), 14);
    }
    expect(diffuseShgcOfType(0.55, 2, 'clear')).toBe(diffuseShgc(0.55, 2));
    expect(diffuseShgcOfType(0.55, 2, 'coated', 3)).not.toBeCloseTo(diffuseShgc(0.55, 2), 3);
    const curve = shgcCurve({ shgc: 0.55, panes: 2, type: 'coated', typeParameter: 3 });
    expect(diffuseShgcOfType(0.55, 2, 'coated', 3)).toBeCloseTo(curve.diffuse, 12);
  });

  test('by name, a table is sent to the lookup functions, and each argument is checked with its range', () => {
    for (const call of [() => shgcAtAngleOfType(0.5, 2, 30, 'table'), () => diffuseShgcOfType(0.5, 2, 'table')]) {
      const e = refusal(call);
      expect(e.argument).toBe('glazingType');
      expect(e.message).toBe('glazingType = "table" is not allowed: must be "clear", "tinted" or "coated" here (a table goes to the lookup functions)');
    }
    expectArgumentError(() => diffuseShgcOfType(0.5, 2, 'lowe'), 'glazingType');
    expectArgumentError(() => shgcAtAngleOfType(1.5, 2, 30, 'clear'), 'shgcNormal');
    expectArgumentError(() => diffuseShgcOfType(1.5, 2, 'clear'), 'shgcNormal');
    expectArgumentError(() => shgcAtAngleOfType(0.5, 0, 30, 'clear'), 'panes');
    expectArgumentError(() => diffuseShgcOfType(0.5, 5, 'coated', 3), 'panes');
    expectArgumentError(() => shgcAtAngleOfType(0.5, 2, 181, 'clear'), 'incidence');
    expectArgumentError(() => diffuseShgcOfType(0.5, 2, 'coated'), 'glazingTypeParameter');
    const q = refusal(() => shgcAtAngleOfType(0.5, 2, 30, 'coated'));
    expect(q.message).toContain('from 1 to 10');
  });

  test('a table glazing needs its table, named glazing.angleTable; its curve takes the table, not glazing.shgc', () => {
    const e = refusal(() => shgcCurve({ shgc: 0.5, panes: 2, type: 'table' }));
    expect(e.argument).toBe('glazing.angleTable');
    expect(e.message).toContain('must be given for glazing type "table"');
    const table = { angles: [0, 60], values: [0.42, 0.3] };
    const curve = shgcCurve({ shgc: 0.9, panes: 2, angleTable: table });
    expect(curve.normal).toBe(0.42);
    expect(curve.atAngle(60)).toBeCloseTo(0.3, 12);
    expect(curve.atAngle(30)).toBeCloseTo(shgcFromTable(table, 30), 5);
    expectArgumentError(() => shgcCurve({ shgc: 0.5, panes: 2, angleTable: { angles: [0, 100], values: [0.5, 0.2] } }), 'glazing.angleTable.angles');
    expectArgumentError(() => shgcCurve({ shgc: 1.5, panes: 2 }), 'glazing.shgc');
    expectArgumentError(() => shgcCurve({ shgc: 0.5, panes: 7 }), 'glazing.panes');
  });
});

describe('angle tables (the documented table rules)', () => {
  test('angles from 0 to 90 °, at least one; as many values as angles; the messages say so', () => {
    expect(refusal(() => requireAngleTable({ angles: [], values: [] })).message).toBe(
      'angleTable.angles = a list of 0 is not allowed: must be a list of at least one angle from 0 to 90 °',
    );
    expect(refusal(() => requireAngleTable({ angles: [0, 30, 60], values: [0.5, 0.4] })).message).toBe(
      'angleTable.values = a list of 2 is not allowed: must be a list of 3 SHGC values, one per angle',
    );
    expectArgumentError(() => requireAngleTable({ angles: [0, 30], values: undefined as never }), 'angleTable.values');
    expectArgumentError(() => requireAngleTable(undefined as never), 'angleTable.angles');
    expectArgumentError(() => requireAngleTable({ angles: [-1, 30], values: [0.5, 0.4] }), 'angleTable.angles');
    expectArgumentError(() => requireAngleTable({ angles: [0, 30], values: [0.5, 1.01] }), 'angleTable.values');
    expectArgumentError(() => requireAngleTable({ angles: [0], values: [2] }, 'glazing.angleTable'), 'glazing.angleTable.values');
  });

  test('angles strictly ascending, and at least 0.01° apart: the message names the rows', () => {
    expect(refusal(() => requireAngleTable({ angles: [0, 40, 40], values: [0.5, 0.4, 0.3] })).message).toBe(
      'angleTable.angles = a list of 3 is not allowed: must be strictly ascending (angle 3, 40, is not above 40)',
    );
    expect(refusal(() => requireAngleTable({ angles: [0, 50, 40], values: [0.5, 0.4, 0.3] })).message).toContain('(angle 3, 40, is not above 50)');
    expect(refusal(() => requireAngleTable({ angles: [0, 40, 40.005], values: [0.5, 0.4, 0.3] })).message).toBe(
      'angleTable.angles = a list of 3 is not allowed: must be at least 0.01° apart (angles 2 and 3 are 40 and 40.005)',
    );
    // Exactly 0.01° apart is allowed (the rule is "at least"); the table comes back as given.
    const table = { angles: [0, 0.01], values: [0.5, 0.4] };
    expect(requireAngleTable(table)).toBe(table);
  });
});

describe('the area the SHGC applies to (whole window against centre of glass)', () => {
  test('a whole-window SHGC applies to the rough opening, a centre-of-glass one to the glass only', () => {
    expect(solarArea(2, 1.5, 0.2, 'wholeWindow')).toBe(3);
    expect(solarArea(2, 1.5, 0.2, 'centreOfGlass')).toBeCloseTo(2.4, 14);
    // The opening is still checked for a whole-window SHGC.
    expectArgumentError(() => solarArea(0, 1.5, 0.2, 'wholeWindow'), 'width');
    expectArgumentError(() => solarArea(2, 1.5, 1, 'wholeWindow'), 'frameFraction');
  });
});

describe('interior attenuation (a multiplier on the bare glazing, beam and diffuse apart)', () => {
  test('none given: no shade; one for both; beam and diffuse given apart override it', () => {
    expect(interiorAttenuationsOf({ shgc: 0.5, panes: 2 })).toEqual({ beam: 1, diffuse: 1, shaded: false });
    expect(interiorAttenuationsOf({ shgc: 0.5, panes: 2, interiorAttenuation: 1 })).toEqual({ beam: 1, diffuse: 1, shaded: false });
    expect(interiorAttenuationsOf({ shgc: 0.5, panes: 2, interiorAttenuation: 0.8 })).toEqual({ beam: 0.8, diffuse: 0.8, shaded: true });
    expect(interiorAttenuationsOf({ shgc: 0.5, panes: 2, interiorAttenuationBeam: 0.6 })).toEqual({ beam: 0.6, diffuse: 1, shaded: true });
    expect(interiorAttenuationsOf({ shgc: 0.5, panes: 2, interiorAttenuationDiffuse: 0.7 })).toEqual({ beam: 1, diffuse: 0.7, shaded: true });
    expect(interiorAttenuationsOf({ shgc: 0.5, panes: 2, interiorAttenuation: 0.8, interiorAttenuationBeam: 0.5, interiorAttenuationDiffuse: 0.9 })).toEqual({
      beam: 0.5,
      diffuse: 0.9,
      shaded: true,
    });
    expect(interiorAttenuationOf({ shgc: 0.5, panes: 2, interiorAttenuation: 0.8, interiorAttenuationBeam: 0.5 })).toBe(0.5);
  });

  test('each coefficient is checked within 0…1 under its own name', () => {
    expectArgumentError(() => interiorAttenuationsOf({ shgc: 0.5, panes: 2, interiorAttenuation: 1.2 }), 'glazing.interiorAttenuation');
    expectArgumentError(() => interiorAttenuationsOf({ shgc: 0.5, panes: 2, interiorAttenuationBeam: -0.1 }), 'glazing.interiorAttenuationBeam');
    expectArgumentError(() => interiorAttenuationsOf({ shgc: 0.5, panes: 2, interiorAttenuationDiffuse: 1.1 }), 'glazing.interiorAttenuationDiffuse');
  });
});

describe("a pane's absorption fitted to a normal transmittance (Fresnel optics)", () => {
  test('the fitted K·L gives the target back at normal incidence, for 1…4 panes', () => {
    for (const panes of [1, 2, 3, 4]) {
      for (const target of [0.7, 0.45, 0.2, 0.02]) {
        const kl = paneExtinctionFor(target, panes);
        expect(kl).toBeGreaterThan(0);
        expect(kl).toBeLessThanOrEqual(KL_MAX);
        expect(paneStackTransmittance(0, panes, kl)).toBeCloseTo(target, 10);
      }
    }
  });

  test('at or above the clear stack (1 − r)/(1 + (2N − 1) r) no absorption is needed (K·L = 0)', () => {
    const { perpendicular: r } = interfaceReflectance(0);
    expect(r).toBeCloseTo(((GLASS_REFRACTIVE_INDEX - 1) / (GLASS_REFRACTIVE_INDEX + 1)) ** 2, 14);
    for (const panes of [1, 2, 3, 4]) {
      const clear = (1 - r) / (1 + (2 * panes - 1) * r);
      expect(paneExtinctionFor(clear, panes)).toBe(0);
      expect(paneExtinctionFor(0.99, panes)).toBe(0);
      expect(paneExtinctionFor(clear - 1e-6, panes)).toBeGreaterThan(0);
    }
  });

  test('more absorption transmits less at every angle (Bouguer), and a thicker stack less than a thinner one', () => {
    for (const theta of [0, 30, 60, 85]) {
      expect(paneStackTransmittance(theta, 2, 0.2)).toBeLessThan(paneStackTransmittance(theta, 2, 0.05));
      expect(paneStackTransmittance(theta, 3, 0.05)).toBeLessThan(paneStackTransmittance(theta, 2, 0.05));
    }
    expect(paneStackTransmittance(89.9, 1, 0)).toBeGreaterThan(0);
    expect(paneStackTransmittance(90, 1, 0)).toBe(0);
  });
});

describe('refusals state the unit and the range (docs/architecture.md, "Errors")', () => {
  test('angles in degrees from 0 to 180, panes a whole number from 1 to 4, lengths above 0 m, q from 1 to 10', () => {
    expect(refusal(() => shgcAtAngle(0.5, 2, -1)).message).toBe('incidence = -1 is not allowed: must be a number from 0 to 180 °');
    expect(refusal(() => karlssonRoosFactor(200, 2, 4)).message).toBe('incidence = 200 is not allowed: must be a number from 0 to 180 °');
    expect(refusal(() => karlssonRoosFactor(30, 1.5, 4)).message).toBe('panes = 1.5 is not allowed: must be a whole number from 1 to 4');
    expect(refusal(() => karlssonRoosFactor(30, 2, 11)).message).toBe('glazingTypeParameter = 11 is not allowed: must be a number from 1 to 10');
    expect(refusal(() => requireAngleTable({ angles: [0, 95], values: [0.5, 0.4] })).message).toBe('angleTable.angles = 95 is not allowed: must be a number from 0 to 90 °');
    expect(refusal(() => solarArea(1, 0, 0.1, 'centreOfGlass')).message).toBe('height = 0 is not allowed: must be a number above 0 m');
    expect(refusal(() => solarArea(0, 1, 0.1, 'centreOfGlass')).message).toBe('width = 0 is not allowed: must be a number above 0 m');
    expect(refusal(() => diffuseShgc(2, 2)).message).toBe('shgcNormal = 2 is not allowed: must be a number from 0 to 1');
    expect(refusal(() => diffuseShgcOfType(0.5, 2.5, 'clear')).message).toBe('panes = 2.5 is not allowed: must be a whole number from 1 to 4');
    expect(refusal(() => shgcAtAngleOfType(0.5, 2.5, 30, 'clear')).message).toBe('panes = 2.5 is not allowed: must be a whole number from 1 to 4');
  });

  test('a coated unit without q (blank or null) is told what q is and its range', () => {
    for (const q of [undefined, null]) {
      expect(refusal(() => shgcAtAngleOfType(0.5, 2, 30, 'coated', q as never)).message).toBe(
        'glazingTypeParameter = blank is not allowed: must be given for a coated unit: the glazing-type parameter q of Karlsson & Roos (2000), from 1 to 10 (larger keeps the SHGC up to higher angles)',
      );
    }
  });
});

describe('sun behind the glass, and curves kept apart', () => {
  test('Karlsson & Roos: 0 from 90° to 180° for every p and q (the sun behind the glass), not the polynomial', () => {
    for (const p of [1, 2, 3, 4]) {
      for (const q of [1, 4, 10]) {
        for (const theta of [90, 120, 150, 180]) expect(karlssonRoosFactor(theta, p, q)).toBe(0);
      }
    }
  });

  test('a clear and a coated glazing of the same SHGC and panes keep their own curves, in either order', () => {
    const clear = shgcCurve({ shgc: 0.47, panes: 2 });
    const coated = shgcCurve({ shgc: 0.47, panes: 2, type: 'coated', typeParameter: 5 });
    expect(clear.atAngle(65)).toBeCloseTo(shgcAtAngle(0.47, 2, 65), 4);
    expect(coated.atAngle(65)).toBeCloseTo(0.47 * karlssonRoosFactor(65, 2, 5), 4);
    expect(Math.abs(clear.atAngle(65) - coated.atAngle(65))).toBeGreaterThan(0.01);
    const coated2 = shgcCurve({ shgc: 0.33, panes: 3, type: 'coated', typeParameter: 2 });
    const clear2 = shgcCurve({ shgc: 0.33, panes: 3 });
    expect(coated2.diffuse).toBeCloseTo(diffuseShgcOfType(0.33, 3, 'coated', 2), 12);
    expect(clear2.diffuse).toBeCloseTo(diffuseShgc(0.33, 3), 12);
  });
});

describe('two absorbing panes written out (Duffie & Beckman Eqs. 5.3.1–5.3.2 and the two-cover rule, from memory)', () => {
  test('at normal incidence: τ = τa(1 − r)²/(1 − (rτa)²), ρ = r + r(1 − r)²τa²/(1 − (rτa)²), T₂ = τ²/(1 − ρ²) (1e-12)', () => {
    const n = GLASS_REFRACTIVE_INDEX;
    const r = ((n - 1) / (n + 1)) ** 2; // both polarisations at normal incidence
    for (const kl of [0.05, 0.3, 1]) {
      const tauA = Math.exp(-kl);
      const d = 1 - (r * tauA) ** 2;
      const tau = (tauA * (1 - r) ** 2) / d;
      const rho = r + (r * (1 - r) ** 2 * tauA ** 2) / d;
      expect(paneStackTransmittance(0, 1, kl)).toBeCloseTo(tau, 12);
      expect(paneStackTransmittance(0, 2, kl)).toBeCloseTo((tau * tau) / (1 - rho * rho), 12);
    }
  });
});
