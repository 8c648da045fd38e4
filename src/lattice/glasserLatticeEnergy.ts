/**
 * Glasser's volume-based form for large lattice energies.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';

/**
 * A = 121.39 kJ·mol⁻¹·nm, the constant of Glasser's generalised equation.
 *
 * @see Glasser, L. Inorg. Chem. 34, 4935–4936 (1995).
 */
export const GLASSER_CONSTANT = 121.39;

/**
 * The lattice energy of a salt with a large lattice energy (above about
 * 5000 kJ/mol: highly charged ions, complex salts), where the α, β fits of
 * the volume-based equation no longer hold:
 *
 *   U = A · I · (2I / V_m)^(1/3),  A = 121.39 kJ·mol⁻¹·nm
 *
 * @param ionicStrength - I = ½Σnᵢzᵢ² of the formula unit (15 for Al₂O₃)
 * @param volume - formula-unit volume V_m, nm³
 * @returns U in kJ/mol, positive for crystal → gaseous ions
 * @see Glasser, L. Lattice energies of crystals with multiple ions: a generalized Kapustinskii equation. Inorg. Chem. 34, 4935–4936 (1995); Glasser, L.; Jenkins, H. D. B. J. Am. Chem. Soc. 122, 632 (2000).
 * @example
 * ```ts
 * // Al2O3: M = 101.96 g/mol, ρ = 3.99 g/cm³ → V_m = 0.04243 nm³
 * glasserLatticeEnergy(15, 0.04243); // ≈ 16221
 * ```
 */
export function glasserLatticeEnergy(ionicStrength: number, volume: number): number {
  numberArgument(ionicStrength, 'ionicStrength', 'the ionic strength factor I', { min: 0, above: true, max: 10_000 });
  numberArgument(volume, 'volume', 'the formula-unit volume in nm³', { min: 1e-6, max: 1000 });
  return GLASSER_CONSTANT * ionicStrength * Math.cbrt((2 * ionicStrength) / volume);
}
