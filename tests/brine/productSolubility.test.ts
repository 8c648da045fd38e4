// Solubilities estimated from llnl.dat's solubility products, checked against the CRC table of aqueous
// solubilities at 25 °C (98th ed., as transcribed in github.com/chicolucio/solutions; tests/reference/crc-solubility.json).
import { describe, expect, it } from 'vitest';
import { builtinDataset } from '../../src/data/builtin.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { productSolubility } from '../../src/brine/productSolubility.js';
import crc from '../reference/crc-solubility.json';

const dataset = builtinDataset();
const products = dataset.records('solubility-products.json');
const estimate = (formula: string) => {
  const salt = parseSalt(formula, dataset);
  return productSolubility(salt, parseSalt(salt.anhydrous, dataset).molarMass, dataset);
};
/** CRC mass percent at 25 °C as grams of anhydrous salt per 100 g water, r = 100w/(100 − w). */
const crcAt25 = (formula: string): number | undefined => {
  const w = (crc.salts as Record<string, Record<string, number>>)[formula]?.['25'];
  return w === undefined ? undefined : (100 * w) / (100 - w);
};

describe('the solubility-product table (data/solubility-products.json)', () => {
  it('keeps log K as llnl.dat writes it and converts protonated anions with the file’s own species reactions', () => {
    // llnl.dat (usgs-coupled/phreeqc3 commit 8176af0c): Chlorargyrite AgCl = Ag+ + Cl-, log_k -9.7453
    const agcl = products.find((r) => r.mineral === 'Chlorargyrite')!;
    expect(agcl.logK).toBe(-9.7453);
    expect(agcl.value).toBe(-9.7453);
    // Gibbsite Al(OH)3 + 3 H+ = Al+3 + 3 H2O, log_k 7.756; H2O = OH- + H+, log_k -13.9951
    // → log Ksp = 7.756 + 3 × (−13.9951) = −34.2293
    const gibbsite = products.find((r) => r.mineral === 'Gibbsite')!;
    expect(gibbsite.logK).toBe(7.756);
    expect(gibbsite.value).toBeCloseTo(-34.2293, 4);
    // Calcite CaCO3 + H+ = Ca+2 + HCO3-, log_k 1.8487; HCO3- = CO3-2 + H+, log_k -10.3288 → −8.4801
    expect(products.find((r) => r.mineral === 'Calcite')!.value).toBeCloseTo(-8.4801, 4);
    for (const r of products) expect(r.source).toBe('llnlDat');
  });
});

describe('productSolubility against the CRC table at 25 °C', () => {
  const withCrc = [...new Set(products.map((r) => parseSalt(r.formula, dataset).anhydrous))].filter((f) => crcAt25(f) !== undefined);

  it('has a CRC value to compare for at least 30 salts', () => {
    expect(withCrc.length).toBeGreaterThanOrEqual(30);
  });

  it('puts the CRC value inside the 95 % range of every estimate (s and p block within ×6, d block within ×100)', () => {
    const estimated = withCrc.filter((f) => estimate(f)?.kind === 'estimated');
    // BaF2, CaF2, CaSO4, CoF2, CuF2, MgF2, NiF2, PbBr2, PbCl2, PbF2, PbI2, PbSO4, SrF2, SrSO4
    expect(estimated.length).toBeGreaterThanOrEqual(14);
    for (const f of estimated) {
      const e = estimate(f)!;
      const r = crcAt25(f)!;
      expect(r, `${f}: CRC ${r} g/100 g against ${e.low}–${e.high}`).toBeGreaterThanOrEqual(e.low);
      expect(r, `${f}: CRC ${r} g/100 g against ${e.low}–${e.high}`).toBeLessThanOrEqual(e.high);
    }
  });

  it('calls a salt too soluble to estimate only where the CRC table says it dissolves (more than 1 g per 100 g water)', () => {
    const tooSoluble = withCrc.filter((f) => estimate(f)?.kind === 'too-soluble');
    expect(tooSoluble.length).toBeGreaterThanOrEqual(15);
    for (const f of tooSoluble) expect(crcAt25(f)!, f).toBeGreaterThan(1);
  });

  it('gives no estimate for cations of charge 3 or more, where it fails by orders of magnitude (AlF3, FeF3)', () => {
    for (const f of ['AlF3', 'FeF3']) {
      const e = estimate(f)!;
      expect(e.kind).toBe('unreliable');
      expect(crcAt25(f)! / e.value, f).toBeGreaterThan(1000);
    }
  });

  it('uses the least soluble phase: gypsum, not anhydrite, for CaSO4 (llnl.dat log K −4.4823 against −4.3064)', () => {
    const e = estimate('CaSO4')!;
    expect(e.mineral).toBe('Gypsum');
    expect(e.solidPhase).toBe('CaSO4·2H2O');
    // s = 10^(−4.4823/2) = 10^−2.24115 = 5.7390e-3 mol/kg; × 136.14 g/mol / 10 = 0.07813 g per 100 g water
    expect(e.value).toBeCloseTo(0.07813, 4);
  });

  it('has nothing for a salt outside the table', () => {
    expect(estimate('ScF3')).toBeUndefined();
  });
});
