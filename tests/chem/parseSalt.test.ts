import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { formatSalt } from '../../src/chem/formatSalt.js';
import { IonheatError } from '../../src/error.js';
import { builtinDataset } from '../../src/data/builtin.js';

const ions = (formula: string) => parseSalt(formula).ions.map((i) => `${i.count} ${i.ion}`);

function codeOf(formula: string): string {
  try {
    parseSalt(formula);
  } catch (e) {
    if (e instanceof IonheatError) return e.code;
    throw e;
  }
  return 'OK';
}

describe('parseSalt: formulas a chemist writes', () => {
  it.each([
    ['NaCl', ['1 Na[+]', '1 Cl[-]']],
    ['CaCl2', ['1 Ca[2+]', '2 Cl[-]']],
    ['(NH4)2SO4', ['2 NH4[+]', '1 SO4[2-]']],
    ['NH4NO3', ['1 NH4[+]', '1 NO3[-]']],
    ['Ca(NO3)2', ['1 Ca[2+]', '2 NO3[-]']],
    ['KAl(SO4)2·12H2O', ['1 K[+]', '1 Al[3+]', '2 SO4[2-]']],
    ['NaHCO3', ['1 Na[+]', '1 HCO3[-]']],
    ['NaHSO4', ['1 Na[+]', '1 HSO4[-]']],
    ['Na2HPO4', ['2 Na[+]', '1 HPO4[2-]']],
    ['NH4H2PO4', ['1 NH4[+]', '1 H2PO4[-]']],
    ['CH3COONa', ['1 Na[+]', '1 CH3COO[-]']],
    ['NaC2H3O2', ['1 Na[+]', '1 CH3COO[-]']],
    ['KSCN', ['1 K[+]', '1 SCN[-]']],
    ['KCNS', ['1 K[+]', '1 SCN[-]']],
    ['KMnO4', ['1 K[+]', '1 MnO4[-]']],
    ['Na2S2O3', ['2 Na[+]', '1 S2O3[2-]']],
    ['K2Cr2O7', ['2 K[+]', '1 Cr2O7[2-]']],
    ['NaN3', ['1 Na[+]', '1 N3[-]']],
    ['FeCl3', ['1 Fe[3+]', '3 Cl[-]']],
    ['FeCl2', ['1 Fe[2+]', '2 Cl[-]']],
    ['Fe2(SO4)3', ['2 Fe[3+]', '3 SO4[2-]']],
    ['N(CH3)4Cl', ['1 N(CH3)4[+]', '1 Cl[-]']],
    ['Ca(H2PO4)2', ['1 Ca[2+]', '2 H2PO4[-]']],
    ['Na₂SO₄', ['2 Na[+]', '1 SO4[2-]']],
    ['Ca[NO3]2', ['1 Ca[2+]', '2 NO3[-]']],
  ])('%s', (formula, expected) => {
    expect(ions(formula)).toEqual(expected);
  });

  it('counts water of crystallization written with ·, . or *', () => {
    for (const f of ['MgSO4·7H2O', 'MgSO4.7H2O', 'MgSO4*7H2O', 'MgSO4•7H2O']) {
      const s = parseSalt(f);
      expect(s.water).toBe(7);
      expect(s.formula).toBe('MgSO4·7H2O');
      expect(s.anhydrous).toBe('MgSO4');
    }
    expect(parseSalt('CaSO4·0.5H2O').water).toBe(0.5);
  });

  it('writes the canonical formula, cations first', () => {
    expect(parseSalt('CH3COONa·3H2O').formula).toBe('NaCH3COO·3H2O');
    expect(parseSalt('AlK(SO4)2·12H2O').formula).toBe('KAl(SO4)2·12H2O');
    expect(formatSalt(parseSalt('Ca(NO3)2·4H2O'), { style: 'unicode' })).toBe('Ca(NO₃)₂·4H₂O');
  });

  it('knows non-electrolytes by formula and by name', () => {
    for (const f of ['CO(NH2)2', '(NH2)2CO', 'CH4N2O', 'urea', ' Urea ']) {
      const s = parseSalt(f);
      expect(s.kind).toBe('non-electrolyte');
      expect(s.ions[0]!.ion).toBe('CO(NH2)2[0]');
    }
  });

  it('gives the element composition with water included', () => {
    expect(parseSalt('CaCl2·6H2O').composition).toEqual({ Ca: 1, Cl: 2, H: 12, O: 6 });
  });
});

describe('parseSalt: bad input gets a typed error a chemist understands', () => {
  it.each([
    ['', 'EMPTY_FORMULA'],
    ['   ', 'EMPTY_FORMULA'],
    ['Ca(NO3', 'UNMATCHED_PARENTHESIS'],
    ['CaNO3)2', 'UNMATCHED_PARENTHESIS'],
    ['Ca(NO3]2', 'UNMATCHED_PARENTHESIS'],
    ['Ca()2', 'UNMATCHED_PARENTHESIS'],
    ['NaCl2', 'UNBALANCED_CHARGE'],
    ['NaK', 'UNBALANCED_CHARGE'],
    ['Na', 'UNBALANCED_CHARGE'],
    ['XyCl', 'UNKNOWN_ELEMENT'],
    ['NaPt', 'UNKNOWN_ION'],
    ['HCl', 'UNKNOWN_ION'],
    ['nacl', 'UNEXPECTED_CHARACTER'],
    ['2NaCl', 'UNEXPECTED_CHARACTER'],
    ['Na+Cl-', 'UNEXPECTED_CHARACTER'],
    ['NaCl·7CO2', 'UNEXPECTED_CHARACTER'],
    ['Na0Cl', 'BAD_COUNT'],
    ['Na999999999Cl999999999', 'BAD_COUNT'],
    ['MgSO4·0H2O', 'BAD_COUNT'],
    ['·7H2O', 'EMPTY_FORMULA'],
    ['Na'.repeat(200), 'FORMULA_TOO_LONG'],
    ['('.repeat(10_000) + 'NaCl' + ')'.repeat(10_000), 'FORMULA_TOO_LONG'],
    ['(((((((NaCl)))))))', 'NESTING_TOO_DEEP'],
  ])('%j → %s', (formula, code) => {
    expect(codeOf(formula)).toBe(code);
  });

  it('names the charges it found when they do not balance', () => {
    expect(() => parseSalt('NaCl2')).toThrow(/Na⁺ \(\+1\), 2 × Cl⁻ \(−2\)/);
  });

  it('points at the position of the problem', () => {
    try {
      parseSalt('NaPt');
    } catch (e) {
      expect((e as IonheatError).position).toBe(2);
      expect((e as IonheatError).text).toBe('NaPt');
    }
    expect.assertions(2);
  });
});

describe('parseSalt: properties', () => {
  // Bounded work: the syntax reader caps the text at 200 characters and the
  // nesting at 6, and scans once; segmentation looks at most 8 units back.
  it('never throws anything but IonheatError for any string', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom(...'NaClKCaSO4()[]·.*H2O0123456789+-xyz '.split('')), maxLength: 40 }), (s) => {
        try {
          parseSalt(s);
        } catch (e) {
          expect(e).toBeInstanceOf(IonheatError);
        }
      }),
      { numRuns: 2000 },
    );
    fc.assert(
      fc.property(fc.string({ maxLength: 300 }), (s) => {
        try {
          parseSalt(s);
        } catch (e) {
          expect(e).toBeInstanceOf(IonheatError);
        }
      }),
      { numRuns: 1000 },
    );
  });

  it('formatting any charge-balanced salt of the ion table and parsing it again gives the same salt', () => {
    const table = builtinDataset().records('ions.json').filter((i) => i.id !== 'H[+]');
    const cations = table.filter((i) => i.charge > 0);
    const anions = table.filter((i) => i.charge < 0);
    const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
    fc.assert(
      fc.property(fc.constantFrom(...cations), fc.constantFrom(...anions), fc.constantFrom(0, 0.5, 1, 6, 12), (c, a, w) => {
        const g = gcd(c.charge, -a.charge);
        const salt = { ions: [{ ion: c.id, formula: c.formula, charge: c.charge, count: -a.charge / g }, { ion: a.id, formula: a.formula, charge: a.charge, count: c.charge / g }], water: w };
        let parsed;
        try {
          parsed = parseSalt(formatSalt(salt));
        } catch (e) {
          // Two ion formulas that run together into another reading would be a real defect of the format.
          throw new Error(`${formatSalt(salt)}: ${(e as Error).message}`);
        }
        expect(parsed.ions).toEqual(salt.ions);
        expect(parsed.water).toBe(w);
        expect(parseSalt(formatSalt(parsed))).toEqual(parsed);
      }),
      { numRuns: 3000 },
    );
  });

  it('formatting a parsed salt and parsing it again gives the same salt', () => {
    const formulas = ['NaCl', 'CaCl2·6H2O', '(NH4)2SO4', 'KAl(SO4)2·12H2O', 'N(CH3)4Cl', 'Fe2(SO4)3', 'Ba(N3)2', 'NaCH3COO·3H2O', 'Ca(H2PO4)2', 'urea'];
    fc.assert(
      fc.property(fc.constantFrom(...formulas), fc.constantFrom(0, 1, 2, 10), (f, w) => {
        const base = parseSalt(f);
        if (base.kind === 'non-electrolyte') return;
        const salt = parseSalt(w > 0 ? `${base.anhydrous}·${w}H2O` : base.anhydrous);
        expect(parseSalt(formatSalt(salt))).toEqual(salt);
      }),
    );
  });
});
