// The public lattice API: estimates with calibrated intervals, the cycle
// lattice enthalpy, leave-one-out coverage, trends, and errors.
import { describe, expect, it } from 'vitest';
import { builtinDataset, IonheatError, kapustinskii, latticeEstimate, latticeEstimates, latticeMethods, parseSalt } from '../../src/index.js';
import { calibrationStats } from '../../src/lattice/latticeCalibration.js';
import { RT_STANDARD } from '../../src/quantity/constants.js';
import { cycleLatticeEnthalpy } from '../../src/cycle/cycleLatticeEnthalpy.js';
import { latticeCalibration } from '../../src/lattice/latticeCalibration.js';
import { latticeEnthalpyCorrection } from '../../src/lattice/latticeEnthalpyCorrection.js';

const dataset = builtinDataset();

function code(f: () => unknown): string | undefined {
  try {
    f();
  } catch (e) {
    return e instanceof IonheatError ? e.code : `not an IonheatError: ${String(e)}`;
  }
  return undefined;
}

describe('latticeEstimate', () => {
  it('reports the lattice enthalpy, positive, kJ/mol, on the model basis, with the 95 % interval holding the value', () => {
    for (const method of latticeMethods) {
      const e = latticeEstimate('NaCl', method);
      expect(e.quantity).toBe('lattice enthalpy');
      expect(e.unit).toBe('kJ/mol');
      expect(e.basis).toBe('model');
      expect(e.method).toBe(method);
      expect(e.value).toBeGreaterThan(0);
      expect(e.low).toBeLessThan(e.value);
      expect(e.high).toBeGreaterThan(e.value);
      for (const key of e.sources) expect(dataset.source(key), `source ${key}`).toBeDefined();
    }
  });

  it('Kapustinskii for NaCl is the kernel on Shannon CN 6 radii plus the −RT enthalpy correction', () => {
    // Shannon (1976): Na⁺ 1.02 Å, Cl⁻ 1.81 Å at CN 6 (rock salt); Jenkins (2005): ΔH_L = U − RT for MX
    expect(latticeEstimate('NaCl', 'kapustinskii').value).toBeCloseTo(kapustinskii(2, 2.83) - RT_STANDARD, 6);
  });

  it('uses thermochemical radii for polyatomic ions (Roobottom et al. 1999)', () => {
    const e = latticeEstimate('KNO3', 'kapustinskii');
    // K⁺ 1.38 Å (Shannon CN 6), NO3⁻ 2.00 Å (thermochemical); KNO3 correction +½RT
    expect(e.value).toBeCloseTo(kapustinskii(2, 3.38) + 0.5 * RT_STANDARD, 6);
  });

  it('handles a salt of several cations by the generalised Kapustinskii form (Glasser 1995)', () => {
    const e = latticeEstimate('KAl(SO4)2', 'kapustinskii');
    // Σnz² = 1 + 9 + 2·4 = 18; d = mean cation radius (1.38 + 0.535)/2 + 2.58 Å (SO4²⁻ thermochemical)
    const d = (1.38 + 0.535) / 2 + 2.58;
    const correction = latticeEnthalpyCorrection([{ count: 1, shape: 'monatomic' }, { count: 1, shape: 'monatomic' }, { count: 2, shape: 'nonlinear' }]);
    expect(e.value).toBeCloseTo(kapustinskii(18, d) + correction, 6);
    expect(e.notes.join(' ')).toMatch(/several kinds of ion/);
    expect(code(() => latticeEstimate('KAl(SO4)2', 'born-lande'))).toBe('NOT_APPLICABLE');
  });

  it('the corrected variant removes the calibrated bias', () => {
    const plain = latticeEstimate('KCl', 'kapustinskii');
    const corrected = latticeEstimate('KCl', 'kapustinskii-corrected');
    const cycle = cycleLatticeEnthalpy('KCl')!.value;
    expect(Math.abs(corrected.value - cycle)).toBeLessThan(Math.abs(plain.value - cycle));
    expect(corrected.high - corrected.low).toBeLessThan(plain.high - plain.low);
  });

  it('leaves the salt itself and excludeSalt out of the calibration', () => {
    const salt = parseSalt('NaCl');
    const groups = ['1:1 monatomic noble-gas', '1:1 noble-gas', 'noble-gas', 'all'];
    const all = calibrationStats('kapustinskii', groups, [], dataset)!;
    const self = calibrationStats('kapustinskii', groups, [salt.formula], dataset)!;
    const both = calibrationStats('kapustinskii', groups, [salt.formula, 'KCl'], dataset)!;
    expect(self.n).toBe(all.n - 1);
    expect(both.n).toBe(all.n - 2);
    expect(latticeEstimate('NaCl', 'kapustinskii').notes[0]).toContain(`${self.n} salts`);
    expect(latticeEstimate('NaCl', 'kapustinskii', { excludeSalt: 'KCl' }).notes[0]).toContain(`${both.n} salts`);
  });

  it('takes a structure, a lattice parameter and a coordination number from the caller', () => {
    const fromA = latticeEstimate('NaCl', 'born-mayer', { latticeParameter: 5.64 });
    const other = latticeEstimate('NaCl', 'born-mayer', { latticeParameter: 6.0 });
    expect(other.value).toBeLessThan(fromA.value);
    const cn8 = latticeEstimate('NaCl', 'kapustinskii', { coordination: 8 });
    expect(cn8.value).toBeLessThan(latticeEstimate('NaCl', 'kapustinskii').value);
    expect(latticeEstimate('NaCl', 'born-lande', { structure: 'caesium-chloride' }).value).not.toBeCloseTo(latticeEstimate('NaCl', 'born-lande').value, 0);
  });

  it('throws NOT_APPLICABLE, MISSING_DATA or INVALID_ARGUMENT with the problem named', () => {
    expect(code(() => latticeEstimate('CO(NH2)2', 'kapustinskii'))).toBe('NOT_APPLICABLE');
    expect(code(() => latticeEstimate('CaCl2·6H2O', 'kapustinskii'))).toBe('NOT_APPLICABLE');
    expect(code(() => latticeEstimate('NaCl', 'madelung' as never))).toBe('INVALID_ARGUMENT');
    expect(code(() => latticeEstimate('NaCl', 'born-lande', { structure: 'fluorite' }))).toBe('NOT_APPLICABLE');
    expect(code(() => latticeEstimate('NaCl', 'born-lande', { structure: 'diamond' }))).toBe('INVALID_ARGUMENT');
    expect(code(() => latticeEstimate('MgF2', 'born-lande', { latticeParameter: 4.6 }))).toBe('INVALID_ARGUMENT');
    // no structure type for KNO3 in crystals.json
    expect(() => latticeEstimate('KNO3', 'born-lande')).toThrow(/structure/);
    // HCOO⁻ has neither a Shannon nor a thermochemical radius in the built-in tables
    expect(() => latticeEstimate('NaHCOO', 'kapustinskii')).toThrow(/HCOO⁻/);
    expect(code(() => latticeEstimate('NaHCOO', 'kapustinskii'))).toBe('MISSING_DATA');
  });
});

describe('latticeEstimates', () => {
  it('gives every method that applies and says why the others do not', () => {
    const { estimates, skipped } = latticeEstimates('KNO3');
    expect(estimates.map((e) => e.method)).toEqual(['kapustinskii', 'vbt', 'kapustinskii-corrected', 'vbt-corrected']);
    expect(skipped.map((s) => s.method)).toEqual(['born-lande', 'born-mayer', 'born-lande-corrected', 'born-mayer-corrected']);
    expect(skipped[0]!.reason).toMatch(/structure/);
    expect(latticeEstimates('NaCl').estimates).toHaveLength(8);
  });
  it('throws for a salt no method applies to as a whole', () => {
    expect(code(() => latticeEstimates('CO(NH2)2'))).toBe('NOT_APPLICABLE');
  });
});

describe('cycleLatticeEnthalpy', () => {
  it('closes NaCl at about 787 kJ/mol (the textbook value; CRC lattice-energy table: U_POT 790, i.e. ΔH_L = 790 − RT, from memory)', () => {
    const e = cycleLatticeEnthalpy('NaCl')!;
    expect(e.basis).toBe('cycle');
    expect(e.quantity).toBe('lattice enthalpy');
    expect(e.value).toBeGreaterThan(786);
    expect(e.value).toBeLessThan(788.5);
  });
  it('closes polyatomic salts through the gaseous-ion table', () => {
    // ΔfH°(K⁺, g) from elements + ΔfH°(NO3⁻, g) −314.9 (derived, ion-formation-gas.json) + 494.63 (NBS ΔfH°(KNO3, cr))
    const e = cycleLatticeEnthalpy('KNO3')!;
    expect(e.value).toBeCloseTo(89.0 + 418.8 + 2.5 * RT_STANDARD + -314.9 + 494.63, 6);
  });
  it('is undefined for hydrates, non-electrolytes and salts whose gaseous ions are not tabulated', () => {
    expect(cycleLatticeEnthalpy('CaCl2·6H2O')).toBeUndefined();
    expect(cycleLatticeEnthalpy('CO(NH2)2')).toBeUndefined();
    expect(cycleLatticeEnthalpy('Na2SO4')).toBeUndefined(); // no ΔfH°(SO4²⁻, g) in the tables
    expect(cycleLatticeEnthalpy('NaCl', dataset, { hideCrystal: true })).toBeUndefined();
  });
});

describe('calibration: leave-one-out coverage of the 95 % intervals (issue target ≥ 90 % for every method)', () => {
  const cal = latticeCalibration();
  const reference = new Map(cal.residuals.map((r) => [r.formula, r.reference]));
  for (const method of latticeMethods) {
    it(`${method}`, () => {
      let n = 0;
      let inside = 0;
      for (const [formula, ref] of reference) {
        let e;
        try {
          e = latticeEstimate(formula, method);
        } catch {
          continue;
        }
        n++;
        if (e.low <= ref && ref <= e.high) inside++;
      }
      expect(n).toBeGreaterThanOrEqual(50);
      expect(inside / n).toBeGreaterThanOrEqual(0.9);
    });
  }
});

describe('facts of the trade (common practice)', () => {
  const alkaliHalides = ['Li', 'Na', 'K', 'Rb', 'Cs'].flatMap((m) => ['F', 'Cl', 'Br', 'I'].map((x) => `${m}${x}`));
  const bases = [...latticeMethods.filter((m) => !m.endsWith('-corrected')), 'cycle'] as const;
  const value = (f: string, m: (typeof bases)[number]) => (m === 'cycle' ? cycleLatticeEnthalpy(f)!.value : latticeEstimate(f, m).value);
  for (const m of bases) {
    it(`${m}: LiF highest and CsI lowest among the alkali halides`, () => {
      const ranked = alkaliHalides.map((f) => [f, value(f, m)] as const).sort((a, b) => b[1] - a[1]).map(([f]) => f);
      expect(ranked[0]).toBe('LiF');
      // The volume-based estimate ranks CsI (denser caesium-chloride packing) just above RbI: a known
      // limit of a density-only model, so for vbt CsI need only be among the two lowest.
      if (m === 'vbt') expect(ranked.slice(-2)).toContain('CsI');
      else expect(ranked.at(-1)).toBe('CsI');
    });
  }
  for (const m of ['kapustinskii', 'cycle'] as const) {
    it(`${m}: lattice enthalpy rises with the cation charge, Na⁺ < Mg²⁺ < Al³⁺`, () => {
      expect(value('NaCl', m)).toBeLessThan(value('MgCl2', m));
      expect(value('MgCl2', m)).toBeLessThan(value('AlCl3', m));
      expect(value('Na2O', m)).toBeLessThan(value('MgO', m));
      expect(value('MgO', m)).toBeLessThan(value('Al2O3', m));
    });
  }
  it('vbt, born-lande, born-mayer: Na2O < MgO < Al2O3', () => {
    for (const m of ['vbt', 'born-lande', 'born-mayer'] as const) {
      expect(value('Na2O', m)).toBeLessThan(value('MgO', m));
      expect(value('MgO', m)).toBeLessThan(value('Al2O3', m));
    }
  });
});

describe('tryLatticeEstimate', () => {
  it('returns undefined where a method lacks data, the estimate otherwise, and throws for bad arguments', async () => {
    const { tryLatticeEstimate } = await import('../../src/index.js');
    expect(tryLatticeEstimate('KNO3', 'born-lande')).toBeUndefined();
    expect(tryLatticeEstimate('NaHCOO', 'kapustinskii')).toBeUndefined();
    expect(tryLatticeEstimate('KNO3', 'kapustinskii')).toEqual(latticeEstimate('KNO3', 'kapustinskii'));
    expect(code(() => tryLatticeEstimate('NaCl', 'kapustinskii', { excludeSalt: 'NaXy' }))).toBe('UNKNOWN_ELEMENT');
    expect(code(() => tryLatticeEstimate('NaCl', 'kapustinskii', { coordination: 1 }))).toBe('INVALID_ARGUMENT');
  });
  it('returns a fresh copy each time, so a caller cannot change what the next caller sees', () => {
    const a = latticeEstimate('NaCl', 'vbt');
    a.notes.push('changed');
    a.value = 0;
    expect(latticeEstimate('NaCl', 'vbt').notes).not.toContain('changed');
    expect(latticeEstimate('NaCl', 'vbt').value).toBeGreaterThan(700);
  });
});
