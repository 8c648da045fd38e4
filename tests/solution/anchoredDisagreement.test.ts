// Disagreeing anchored estimates widen one another; the ion classes the floors and the validation use.
import { describe, expect, it } from 'vitest';
import { makeEstimate } from '../../src/quantity/estimate.js';
import { disagree, widenForDisagreement } from '../../src/solution/anchoredDisagreement.js';
import { saltIonClass } from '../../src/lattice/saltIonClass.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { builtinDataset } from '../../src/data/builtin.js';

const est = (method: string, value: number, u: number, basis: 'anchored' | 'model' = 'anchored') => makeEstimate({ quantity: 'enthalpy of solution', value, u, unit: 'kJ/mol', basis, method });

describe('widenForDisagreement', () => {
  it('uses the 95 % test on the difference of two independent estimates', () => {
    // 1.96·√(3² + 4²) = 9.8
    expect(disagree({ value: 0, u: 3 }, { value: 9.7, u: 4 })).toBe(false);
    expect(disagree({ value: 0, u: 3 }, { value: 9.9, u: 4 })).toBe(true);
  });

  it('widens the narrow estimate to hold a disagreeing one, on that side only, and leaves agreeing ones alone', () => {
    const [narrow, wide, model] = widenForDisagreement([est('anchored-a', -60, 5), est('anchored-b', -10, 10), est('kapustinskii', 300, 10, 'model')]);
    expect(narrow!.low).toBeCloseTo(-60 - 1.96 * 5, 2);
    expect(narrow!.high).toBe(-10);
    expect(narrow!.u).toBeCloseTo(50 / 1.96, 2);
    expect(narrow!.notes.at(-1)).toMatch(/anchored-b -10\.0/);
    expect(wide!.low).toBe(-60);
    expect(model!.low).toBeCloseTo(300 - 1.96 * 10, 2); // other bases are not touched
    const agreeing = widenForDisagreement([est('anchored-a', 0, 5), est('anchored-b', 5, 5)]);
    expect(agreeing[0]!.low).toBeCloseTo(-9.8, 2);
    expect(agreeing[1]!.high).toBeCloseTo(14.8, 2);
  });
});

describe('saltIonClass', () => {
  const dataset = builtinDataset();
  it.each([
    ['AgNO3', 'covalent-prone'],
    ['PbCl2', 'covalent-prone'],
    ['ZnSO4', 'covalent-prone'],
    ['TlCl', 'covalent-prone'],
    ['NiCl2', 'transition metal'],
    ['CuSO4', 'transition metal'],
    ['NH4Cl', 'ammonium'],
    ['K2CO3', 'polyatomic anion'],
    ['CaCl2·6H2O', 'monatomic'],
    ['NaCl', 'monatomic'],
  ])('%s is %s (d¹⁰ and d¹⁰s² cores count as covalent-prone: common practice)', (formula, kind) => {
    expect(saltIonClass(parseSalt(formula), dataset)).toBe(kind);
  });
});
