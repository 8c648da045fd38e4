// ΔsolCp° = Σν·Cp°(ion, aq) + n_w·Cp°(H₂O, l) − Cp°(salt, cr) for a hydrate,
// whose water of crystallization becomes solvent, and the cases where a term
// is missing. Values from the NBS tables (Wagman et al. 1982): Cp°(Na⁺, aq)
// = 46.4, Cp°(SO₄²⁻, aq) = −293, Cp°(H₂O, l) = 75.291 J/(mol·K) (in the
// built-in tables); Cp°(Na₂SO₄·10H₂O, cr) ≈ 592 J/(mol·K), from memory and
// not checked against the NBS tables, given as an override because the
// built-in table lacks it: the check is of the hydrate term of the sum.
import { describe, expect, it } from 'vitest';
import { builtinDataset } from '../../src/data/recordCheck.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { solutionHeatCapacity } from '../../src/solution/solutionHeatCapacity.js';

describe('solutionHeatCapacity', () => {
  it('counts the water of crystallization as liquid water', () => {
    const mine = builtinDataset().withOverrides(
      { 'heat-capacities.json': [{ formula: 'Na2SO4·10H2O', phase: 'cr', value: 592.0, unit: 'J/(mol·K)', uncertainty: 1, source: 'wagman1982', fromMemory: true }] },
      'glauber.json',
    );
    const cp = solutionHeatCapacity(parseSalt('Na2SO4·10H2O', mine), mine);
    // 2·46.4 − 293 + 10·75.291 − 592.0 = −39.29 J/(mol·K)
    expect(cp?.value).toBeCloseTo(-39.29, 6);
    expect(cp?.unit).toBe('J/(mol·K)');
    expect(cp?.basis).toBe('cycle');
    expect(cp?.notes).toEqual(['heat capacities entered from memory, not checked against the source']);
  });
  it('is undefined where the crystal or an ion has no heat capacity', () => {
    // No crystal value for Na2SO4·10H2O in the built-in tables.
    expect(solutionHeatCapacity(parseSalt('Na2SO4·10H2O'))).toBeUndefined();
    // BaCl2 has a crystal value but Ba²⁺ has no aqueous one in the built-in tables (Ca²⁺ and Mg²⁺ now have).
    expect(solutionHeatCapacity(parseSalt('BaCl2'))).toBeUndefined();
    // A non-electrolyte has no ions.
    expect(solutionHeatCapacity(parseSalt('urea'))).toBeUndefined();
  });
});
