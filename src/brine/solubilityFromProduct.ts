/**
 * The molal solubility of a salt from its solubility product, with the
 * activity coefficients taken as 1.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';

/** The ideal solubility and the ionic strength of the saturated solution. */
export interface SolubilityFromProduct {
  /** Formula units dissolved per kg of water at saturation, mol/kg. */
  molality: number;
  /** Ionic strength of the saturated solution, I = ½·Σ mᵢ·zᵢ², mol/kg. */
  ionicStrength: number;
}

/**
 * Solubility of a salt MₐXᵦ from log10 Ksp, where Ksp = (a·s)ᵃ·(b·s)ᵇ with
 * the activities of the ions taken as their molalities (activity
 * coefficients 1, water activity 1):
 *
 *   s = (Ksp / (aᵃ·bᵇ))^(1/(a+b)),   I = ½·s·(a·z₊² + b·z₋²)
 *
 * Good while I stays low (where the coefficients are near 1) and the ions
 * neither hydrolyse nor form complexes; both effects raise the true
 * solubility above s.
 *
 * @param logKsp - log10 of the solubility product, mol/kg standard state
 * @param cations - cations per formula unit, a
 * @param cationCharge - charge of the cation, z₊
 * @param anions - anions per formula unit, b
 * @param anionCharge - charge of the anion, z₋ (its sign is ignored)
 * @returns the molality of the salt at saturation (mol/kg) and the ionic strength (mol/kg)
 * @see Atkins, P.; de Paula, J. Physical Chemistry (solubility products and ionic strength); Davies, C. W. Ion Association (Butterworths, 1962) for where activity coefficients depart from 1.
 * @example
 * ```ts
 * // AgCl, log Ksp = −9.7453 (llnl.dat, Chlorargyrite): s = 10^(−9.7453/2)
 * solubilityFromProduct(-9.7453, 1, 1, 1, 1).molality; // ≈ 1.34e-5 mol/kg
 * // CaF2, log Ksp = −10.037: s = (10^−10.037 / 4)^(1/3)
 * solubilityFromProduct(-10.037, 1, 2, 2, 1).molality; // ≈ 2.84e-4 mol/kg
 * ```
 */
export function solubilityFromProduct(logKsp: number, cations: number, cationCharge: number, anions: number, anionCharge: number): SolubilityFromProduct {
  logKsp = numberArgument(logKsp, 'logKsp', 'log10 of the solubility product', { min: -200, max: 50 });
  cations = numberArgument(cations, 'cations', 'the cations per formula unit', { min: 1, max: 20 });
  anions = numberArgument(anions, 'anions', 'the anions per formula unit', { min: 1, max: 20 });
  cationCharge = numberArgument(cationCharge, 'cationCharge', 'the charge of the cation', { min: 1, max: 8 });
  anionCharge = Math.abs(numberArgument(anionCharge, 'anionCharge', 'the charge of the anion', { min: -8, max: 8 }));
  const nu = cations + anions;
  const logS = (logKsp - cations * Math.log10(cations) - anions * Math.log10(anions)) / nu;
  const molality = 10 ** logS;
  return { molality, ionicStrength: 0.5 * molality * (cations * cationCharge ** 2 + anions * anionCharge ** 2) };
}
