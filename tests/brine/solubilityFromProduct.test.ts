// The ideal solubility of a salt from its solubility product: s = (Ksp/(aᵃ·bᵇ))^(1/(a+b)).
// log Ksp values are those of llnl.dat (PHREEQC 3, usgs-coupled/phreeqc3 commit 8176af0c, database/llnl.dat),
// as data/solubility-products.json carries them; the arithmetic is written out beside each check.
import { describe, expect, it } from 'vitest';
import { solubilityFromProduct } from '../../src/index.js';

describe('solubilityFromProduct', () => {
  it('gives √Ksp for a 1:1 salt: AgCl, log Ksp −9.7453 (llnl.dat, Chlorargyrite)', () => {
    // s = 10^(−9.7453/2) = 10^−4.87265 = 1.34076e-5 mol/kg; I = ½·s·(1 + 1) = s
    const r = solubilityFromProduct(-9.7453, 1, 1, 1, 1);
    expect(r.molality).toBeCloseTo(1.34076e-5, 9);
    expect(r.ionicStrength).toBeCloseTo(r.molality, 12);
  });

  it('divides by aᵃ·bᵇ for a 1:2 salt: CaF2, log Ksp −10.037 (llnl.dat, Fluorite)', () => {
    // Ksp = s·(2s)² = 4s³ → s = (10^−10.037 / 4)^(1/3) = (2.2953e-11)^(1/3) = 2.8422e-4 mol/kg
    // I = ½·s·(1·2² + 2·1²) = 3s = 8.5266e-4 mol/kg
    const r = solubilityFromProduct(-10.037, 1, 2, 2, 1);
    expect(r.molality).toBeCloseTo(2.8422e-4, 7);
    expect(r.ionicStrength).toBeCloseTo(8.5266e-4, 7);
  });

  it('handles a 3:1 salt and ignores the sign of the anion charge: Al(OH)3, log Ksp −34.2293', () => {
    // Ksp = s·(3s)³ = 27s⁴ → s = (10^−34.2293 / 27)^(1/4) = 10^((−34.2293 − 1.43136)/4) = 10^−8.91517 = 1.2159e-9 mol/kg
    expect(solubilityFromProduct(-34.2293, 1, 3, 3, -1).molality).toBeCloseTo(1.2159e-9, 12);
  });

  it('refuses what is not a solubility product or a count, naming the field', () => {
    expect(() => solubilityFromProduct(Number.NaN, 1, 1, 1, 1)).toThrow(/logKsp/);
    expect(() => solubilityFromProduct(-5, 0, 1, 1, 1)).toThrow(/cations/);
    expect(() => solubilityFromProduct(-5, 1, 1, 1, 99)).toThrow(/anionCharge/);
  });
});
