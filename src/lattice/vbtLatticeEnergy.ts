/**
 * Volume-based thermodynamics: the lattice energy from the formula-unit
 * volume.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';

/**
 * The lattice energy by the volume-based equation of Jenkins, Roobottom,
 * Passmore and Glasser (1999):
 *
 *   U = 2I · (α / V_m^(1/3) + β)
 *
 * with I = ½Σnᵢzᵢ² the ionic strength of the formula unit, V_m the
 * formula-unit volume and α, β the published coefficients for the salt's
 * charge type (data/volume-coefficients.json). Meant for lattice energies
 * below about 5000 kJ/mol; above that use {@link glasserLatticeEnergy}.
 *
 * @param ionicStrength - I = ½Σnᵢzᵢ² (1 for NaCl, 3 for CaF₂, 4 for MgO)
 * @param volume - formula-unit volume V_m, nm³
 * @param alpha - α, kJ·mol⁻¹·nm
 * @param beta - β, kJ/mol
 * @returns U in kJ/mol, positive for crystal → gaseous ions
 * @see Jenkins, H. D. B.; Roobottom, H. K.; Passmore, J.; Glasser, L. Inorg. Chem. 38, 3609–3620 (1999).
 * @example
 * ```ts
 * // NaCl: V_m = M/(ρN_A) = 58.44 g/mol / (2.17 g/cm³ · N_A) = 0.04472 nm³; 1:1 coefficients α = 117.3, β = 51.9
 * vbtLatticeEnergy(1, 0.04472, 117.3, 51.9); // ≈ 765
 * ```
 */
export function vbtLatticeEnergy(ionicStrength: number, volume: number, alpha: number, beta: number): number {
  numberArgument(ionicStrength, 'ionicStrength', 'the ionic strength factor I', { min: 0, above: true, max: 10_000 });
  numberArgument(volume, 'volume', 'the formula-unit volume in nm³', { min: 1e-6, max: 1000 });
  numberArgument(alpha, 'alpha', 'the coefficient α in kJ·nm/mol', { min: -1e6, max: 1e6 });
  numberArgument(beta, 'beta', 'the coefficient β in kJ/mol', { min: -1e6, max: 1e6 });
  return 2 * ionicStrength * (alpha / Math.cbrt(volume) + beta);
}
