import { describe, expect, it } from 'vitest';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { brineFreezingPoint } from '../../src/brine/brineFreezingPoint.js';
import { brineCalibration } from '../../src/brine/brineCalibration.js';
import { brineModel } from '../../src/brine/brineModel.js';
import { brineRecords } from '../../src/brine/brineParameterSets.js';
import { debyeHuckelEnthalpy, debyeHuckelOsmotic, GAS_CONSTANT } from '../../src/brine/debyeHuckelSlopes.js';
import { osmoticCoefficient, relativeApparentEnthalpy } from '../../src/brine/pitzerBrine.js';
import { pitzerSlope } from '../../src/brine/pitzerTemperature.js';
import { integralEnthalpyOfSolution } from '../../src/solution/integralEnthalpy.js';

const record = (formula: string) => brineRecords().find((r) => r.formula === formula)!;

describe('Debye–Hückel slopes', () => {
  it('give Aφ = 0.3915 and A_H/RT = 0.8018 kg^½/mol^½ at 25 °C', () => {
    // Pitzer (1991), table of Debye–Hückel parameters (from memory): 0.3915 and 0.8018; the fit is good to 0.1 %.
    expect(debyeHuckelOsmotic(298.15)).toBeCloseTo(0.3915, 3);
    expect(debyeHuckelEnthalpy(298.15) / (GAS_CONSTANT * 298.15)).toBeCloseTo(0.8018, 2);
  });
  it('gives the limiting law φL → A_H·√m for a 1:1 salt', () => {
    const p = record('NaCl').pitzer;
    const m = 1e-6;
    expect(relativeApparentEnthalpy(p, m, 298.15) / (debyeHuckelEnthalpy(298.15) * Math.sqrt(m))).toBeCloseTo(1, 2);
  });
});

describe('Pitzer parameters', () => {
  it('reproduce the osmotic coefficient of NaCl at 1 and 6 mol/kg', () => {
    // Robinson & Stokes, Electrolyte Solutions (1959), appendix 8.10 (from memory): φ = 0.936 at 1 m, 1.271 at 6 m.
    expect(osmoticCoefficient(record('NaCl').pitzer, 1, 298.15)).toBeCloseTo(0.936, 2);
    expect(osmoticCoefficient(record('NaCl').pitzer, 6, 298.15)).toBeCloseTo(1.271, 2);
  });
  it('give enthalpy parameters that agree with the second, independent set of Silvester & Pitzer', () => {
    // Silvester & Pitzer (1977) / Pitzer (1991), table of β⁽⁰⁾ᴸ (from memory): NaCl 7.159e-4, KCl 5.794e-4 per K.
    // pitzer.dat's temperature functions, differentiated at 25 °C, agree within 5 % (independent fits).
    expect(pitzerSlope(record('NaCl').pitzer.beta0, 298.15) / 7.159e-4).toBeCloseTo(1, 1);
    expect(pitzerSlope(record('KCl').pitzer.beta0, 298.15) / 5.794e-4).toBeCloseTo(1, 1);
  });
});

describe('freezing points of brines', () => {
  // Smithsonian Physical Tables, 9th ed. (1956), as reprinted in the CRC Handbook, "Freezing point lowering by
  // electrolytes in aqueous solution" (checked against a copy): lowering in K at the molality given.
  // Tolerance: 8 % of the lowering + 0.05 K: the parameters are fitted at 0 °C and above and extrapolated below
  // 0 °C (CaCl2 at 3 m, −28 °C, is the worst case); docs/brine-validation.md lists every point.
  const table: [string, number, number][] = [
    ['NaCl', 0.5, 1.68], ['NaCl', 0.75, 2.6], ['KCl', 1, 3.29], ['KCl', 2, 6.5], ['KCl', 3, 9.77],
    ['CaCl2', 1, 6.35], ['CaCl2', 2, 15.27], ['CaCl2', 3, 28.08], ['KNO3', 1, 2.66], ['NH4Cl', 0.75, 2.55],
    ['MgSO4', 1, 2.08], ['MgSO4', 1.5, 3.41], ['NaNO3', 1, 3.1], ['LiCl', 0.75, 2.78],
  ];
  for (const [formula, m, lowering] of table) {
    it(`${formula} at ${m} mol/kg freezes at −${lowering} °C`, () => {
      const e = brineFreezingPoint(parseSalt(formula), m);
      expect(Math.abs(e.value + lowering)).toBeLessThanOrEqual(0.08 * lowering + 0.05);
    });
  }
  it('never gives an interval of zero width', () => {
    for (const formula of ['NaCl', 'CaCl2', 'NH4NO3', 'CO(NH2)2', 'AgNO3']) {
      const e = brineFreezingPoint(parseSalt(formula), 2);
      expect(e.high - e.low).toBeGreaterThan(0);
    }
  });
});

describe('integral enthalpy of solution', () => {
  it('is the infinite-dilution value at m = 0 and falls for NaCl towards saturation', () => {
    // Wagman et al. (1982) via the CRC table: ΔsolH°(NaCl) = 3.88 kJ/mol. Towards saturation (6 m) dissolution is
    // less endothermic: φL(6 m) ≈ −2 kJ/mol from the Pitzer parameters (about half the infinite-dilution value).
    expect(integralEnthalpyOfSolution(parseSalt('NaCl'), 0).value).toBeCloseTo(3.88, 2);
    const e = integralEnthalpyOfSolution(parseSalt('NaCl'), 6);
    expect(e.value).toBeLessThan(2.5);
    expect(e.value).toBeGreaterThan(1.2);
  });
  it('makes a CaCl2·6H2O fill far more endothermic than at infinite dilution', () => {
    const inf = integralEnthalpyOfSolution(parseSalt('CaCl2·6H2O'), 0);
    const fill = integralEnthalpyOfSolution(parseSalt('CaCl2·6H2O'), 5.5);
    expect(fill.value / inf.value).toBeGreaterThan(1.5);
  });
  it('has an interval of nonzero width for every salt, with data or without', () => {
    for (const formula of ['NaCl', 'NH4NO3', 'CaCl2', 'CO(NH2)2', 'AgNO3', 'KAl(SO4)2·12H2O']) {
      const e = integralEnthalpyOfSolution(parseSalt(formula), 3);
      expect(e.high - e.low).toBeGreaterThan(0);
    }
  });
  it('says when the charge-type estimate stands in, never silently the infinite-dilution value', () => {
    const m = brineModel(parseSalt('AgNO3'));
    expect(m.basis).toBe('charge-type-estimate');
    expect(integralEnthalpyOfSolution(parseSalt('AgNO3'), 3).notes.join(' ')).toMatch(/estimated from/);
  });
});

describe('leave-one-salt-out coverage of the model discrepancy', () => {
  it('is at least 90 % for φ, φL and φJ', () => {
    const c = brineCalibration();
    for (const q of ['osmotic', 'enthalpy', 'heatCapacity'] as const) {
      expect(c.coverage[q].total).toBeGreaterThan(20);
      expect(c.coverage[q].share).toBeGreaterThanOrEqual(0.9);
    }
  });
});
