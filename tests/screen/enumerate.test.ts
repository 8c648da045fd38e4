import { describe, expect, it } from 'vitest';
import { builtinDataset, enumerate, hazardSummary, isIonheatError, parseSalt } from '../../src/index.js';

describe('enumerate', () => {
  const ions = builtinDataset().records('ions.json');
  const cations = ions.filter((i) => i.charge > 0 && i.id !== 'H[+]');
  const anions = ions.filter((i) => i.charge < 0);

  it('gives one salt per cation–anion pair of the ion table (hydrogen ion left out)', () => {
    const all = enumerate();
    expect(all.length).toBe(cations.length * anions.length);
    expect(new Set(all.map((s) => s.formula)).size).toBe(all.length);
  });

  it('balances the charges: ν₊·z₊ + ν₋·z₋ = 0 with the smallest whole counts', () => {
    for (const s of enumerate()) {
      expect(s.ions.reduce((q, i) => q + i.charge * i.count, 0), s.formula).toBe(0);
      const [c, a] = s.ions;
      const g = (x: number, y: number): number => (y === 0 ? x : g(y, x % y));
      expect(g(c!.count, a!.count), s.formula).toBe(1);
    }
  });

  it('writes formulas that the parser reads back to the same salt', () => {
    for (const s of enumerate()) {
      const back = parseSalt(s.formula);
      expect(back.ions, s.formula).toEqual(s.ions);
      expect(back.molarMass, s.formula).toBeCloseTo(s.molarMass, 9);
    }
  });

  it('names the salts the way the house writes them', () => {
    const formulas = enumerate({ cations: ['Al[3+]', 'NH4[+]', 'Ca[2+]'], anions: ['SO4[2-]', 'PO4[3-]', 'NO3[-]'] }).map((s) => s.formula);
    // Cations in the order of the ion table, and for each its anions in table order.
    expect(formulas).toEqual(['NH4NO3', '(NH4)2SO4', '(NH4)3PO4', 'Ca(NO3)2', 'CaSO4', 'Ca3(PO4)2', 'Al(NO3)3', 'Al2(SO4)3', 'AlPO4']);
  });

  it('filters on charges, ion kinds, ion lists, molar mass and hazard classes', () => {
    const oneOne = enumerate({ cationCharges: [1], anionCharges: [1] });
    expect(oneOne.every((s) => s.ions[0]!.charge === 1 && s.ions[1]!.charge === -1)).toBe(true);
    expect(oneOne.length).toBe(cations.filter((c) => c.charge === 1).length * anions.filter((a) => a.charge === -1).length);

    const poly = enumerate({ cationKinds: ['polyatomic'], anionKinds: ['monatomic'] });
    expect(poly.map((s) => s.formula)).toContain('NH4Cl');
    expect(poly.every((s) => s.ions[0]!.ion === 'NH4[+]' || s.ions[0]!.ion === 'N(CH3)4[+]')).toBe(true);

    const noAmmonium = enumerate({ excludeIons: ['NH4[+]'] });
    expect(noAmmonium.some((s) => s.ions.some((i) => i.ion === 'NH4[+]'))).toBe(false);

    const light = enumerate({ maxMolarMass: 60 });
    expect(light.every((s) => s.molarMass <= 60)).toBe(true);
    // NaCl, 58.44 g/mol (IUPAC 2021 abridged atomic weights), is under 60; KCl, 74.55 g/mol, is not.
    expect(light.map((s) => s.formula)).toContain('NaCl');
    expect(light.map((s) => s.formula)).not.toContain('KCl');
    expect(enumerate({ minMolarMass: 500 }).every((s) => s.molarMass >= 500)).toBe(true);

    const safe = enumerate({ excludeHazards: ['explosive-precursor', 'carcinogen'] });
    const names = safe.map((s) => s.formula);
    // NH4NO3 is listed as an explosives precursor (Regulation (EU) 2019/1148, in the hazards table).
    expect(names).not.toContain('NH4NO3');
    // Chromates carry the carcinogen class through the CrO4[2-] ion record.
    expect(names).not.toContain('K2CrO4');
    expect(names).toContain('KCl');
    for (const s of safe) expect(hazardSummary(s).classes.some((c) => c === 'explosive-precursor' || c === 'carcinogen'), s.formula).toBe(false);
  });

  it('refuses bad filters with a typed error naming the filter', () => {
    const bad: [object, string, RegExp][] = [
      [{ cationCharges: [0] }, 'INVALID_ARGUMENT', /cationCharges: a charge is a whole number from 1 to 4/],
      [{ anionCharges: [-1] }, 'INVALID_ARGUMENT', /anionCharges.*magnitudes/],
      [{ cations: ['Xx[+]'] }, 'UNKNOWN_ION', /cations: "Xx\[\+\]" is not an ion id/],
      [{ excludeIons: ['Na+'] }, 'UNKNOWN_ION', /excludeIons/],
      [{ maxMolarMass: Number.NaN }, 'INVALID_ARGUMENT', /maxMolarMass/],
      [{ excludeHazards: ['spicy'] }, 'INVALID_ARGUMENT', /not a hazard class/],
      [{ cationKinds: ['non-electrolyte'] }, 'INVALID_ARGUMENT', /monatomic" or "polyatomic/],
    ];
    for (const [filters, code, message] of bad) {
      try {
        enumerate(filters as never);
        expect.unreachable(JSON.stringify(filters));
      } catch (e) {
        expect(isIonheatError(e)).toBe(true);
        expect((e as { code: string }).code).toBe(code);
        expect((e as Error).message).toMatch(message);
      }
    }
  });
});

describe('hazardSummary', () => {
  it('joins the salt record (hydrates share it) and the ion records', () => {
    // Hazards table: CaCl2 irritant (CLP, from the table); the hexahydrate shares the entry.
    expect(hazardSummary(parseSalt('CaCl2·6H2O')).classes).toEqual(hazardSummary(parseSalt('CaCl2')).classes);
    // BaCO3 is not listed as a salt, but Ba[2+] is toxic in the table.
    expect(hazardSummary(parseSalt('BaCO3')).classes).toContain('toxic');
    expect(hazardSummary(parseSalt('NaCl')).statements).toEqual([]);
  });
});
