// The difference rule per salt family, and hypothetical hydrates flagged.
// Pairs and hydrates: NBS formation enthalpies (Wagman et al. 1982) and the CRC solution table, as entered in data/.
import { describe, expect, it } from 'vitest';
import { hydrateRuleFamily, hydrateRuleScatter, MIN_FAMILY_PAIRS, WATER_OF_CRYSTALLIZATION_ENTHALPY } from '../../src/solution/hydrateRule.js';
import { hypotheticalHydrate } from '../../src/solution/knownHydrates.js';
import { dissolve } from '../../src/solution/dissolve.js';
import { solutionEnthalpyFromCycle } from '../../src/solution/cycleSolution.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { builtinDataset } from '../../src/data/builtin.js';

const dataset = builtinDataset();

describe('difference rule by salt family', () => {
  it('names the family by charge type', () => {
    expect(hydrateRuleFamily(parseSalt('MgSO4·7H2O'))).toBe('2:2');
    expect(hydrateRuleFamily(parseSalt('KAl(SO4)2·12H2O'))).toBe('other');
  });

  it('fits θ to the family: the five NBS sulfate hydrates of 2:2 salts give about −299 kJ/mol per water', () => {
    const c = hydrateRuleScatter({ family: '2:2' });
    expect(c.family).toBe('2:2');
    expect(c.pairs).toBeGreaterThanOrEqual(MIN_FAMILY_PAIRS);
    // Wagman 1982 steps per water: MgSO4 −300.5, CaSO4 −294.3, FeSO4 −298.0, CuSO4 −301.7, ZnSO4 −299.3 (weighted by waters)
    expect(c.theta).toBeCloseTo(-299.35, 1);
  });

  it('leaves the salt’s own pairs out of θ and scatter (leave-one-salt-out)', () => {
    const all = hydrateRuleScatter({ family: '2:2' });
    const without = hydrateRuleScatter({ family: '2:2', excludeFormula: 'CaSO4·2H2O' });
    expect(without.pairs).toBe(all.pairs - 1);
    expect(without.theta).toBeLessThan(all.theta); // CaSO4·2H2O (−294.3) was the least negative step
  });

  it('falls back to every pair where a family has too few', () => {
    const c = hydrateRuleScatter({ family: '3:1' });
    expect(c.family).toBe('all');
    expect(c.pairs).toBe(hydrateRuleScatter().pairs);
    expect(hydrateRuleScatter().theta).toBe(WATER_OF_CRYSTALLIZATION_ENTHALPY);
  });

  it('gives an uncalibrated family’s θ the uncertainty of the farthest pair, so AlCl3 and its hexahydrate are held', () => {
    // Its own θ is unknown: it may lie as far from the pooled θ as any pair does (AlCl3·6H2O: about −331 against −300 kJ/mol per water).
    const c = hydrateRuleScatter({ family: '3:1', excludeFormula: 'AlCl3·6H2O' });
    const fitted = ['1:1', '2:1', '1:2', '2:2'].map((family) => hydrateRuleScatter({ family, excludeFormula: 'AlCl3·6H2O' }).theta);
    for (const theta of fitted) expect(c.thetaU).toBeGreaterThanOrEqual(Math.abs(theta - c.theta));
    // References: the NBS cycle values (Wagman et al. 1982), the salt's own crystal value hidden from the estimate.
    for (const formula of ['AlCl3·6H2O', 'AlCl3']) {
      const r = dissolve(formula, { excludeMeasured: true });
      const reference = solutionEnthalpyFromCycle(parseSalt(formula))!.value;
      expect(r.best.low, formula).toBeLessThanOrEqual(reference);
      expect(r.best.high, formula).toBeGreaterThanOrEqual(reference);
    }
  });
});

describe('hypothetical hydrates', () => {
  it('flags a hydrate with more waters than any known one, and one no table lists', () => {
    expect(hypotheticalHydrate(parseSalt('KCl·50H2O'), dataset)).toEqual({ knownWaters: [0], reason: 'more waters than any known hydrate' });
    expect(hypotheticalHydrate(parseSalt('MgSO4·4H2O'), dataset)?.reason).toBe('a hydrate no table lists');
    expect(hypotheticalHydrate(parseSalt('CaCl2·6H2O'), dataset)).toBeUndefined();
    expect(hypotheticalHydrate(parseSalt('CaCl2·4H2O'), dataset)).toBeUndefined(); // a solid phase of the CaCl2 solubility curve
    expect(hypotheticalHydrate(parseSalt('NaCl'), dataset)).toBeUndefined();
  });

  it('dissolve refuses KCl·50H2O (more waters than any known form) and names the known forms', () => {
    // The difference rule would have given about +914 kJ/mol for a solid nobody has made.
    expect(() => dissolve('KCl·50H2O')).toThrowError(expect.objectContaining({ code: 'NOT_APPLICABLE', message: expect.stringMatching(/more waters of crystallization than any form of KCl .*\(KCl\)/) }));
    expect(() => dissolve('KCl·50H2O', { excludeMeasured: true })).toThrowError(expect.objectContaining({ code: 'NOT_APPLICABLE' }));
  });

  it('dissolve gives a hydrate no table lists, within the known waters, only flagged estimates', () => {
    const r = dissolve('MgSO4·4H2O');
    expect(r.hypotheticalHydrate?.reason).toBe('a hydrate no table lists');
    expect(r.estimates.every((e) => e.basis === 'model')).toBe(true);
    expect(r.notes[0]).toMatch(/hypothetical hydrate/);
    expect(r.best.notes[0]).toMatch(/not a property of a real solid/);
    expect(dissolve('CaCl2·6H2O').hypotheticalHydrate).toBeUndefined();
  });
});
