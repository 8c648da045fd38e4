/**
 * The Born–Landé equation.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';
import { COULOMB_KJ_ANGSTROM } from '../quantity/constants.js';

/**
 * The lattice energy of an ionic crystal by the Born–Landé equation:
 *
 *   U = N_A·A·|z₊z₋|·e² / (4πε₀·r₀) · (1 − 1/n)
 *
 * with A the Madelung constant referred to the shortest cation–anion
 * distance r₀ and to unit charges, and n the Born exponent (Pauling's
 * values by noble-gas core, averaged over the ions).
 *
 * @param madelung - Madelung constant A (dimensionless, 1.747565 for rock salt)
 * @param chargeProduct - |z₊z₋| of the binary salt (1 for NaCl, 2 for CaF₂, 4 for MgO)
 * @param r0 - shortest cation–anion distance, Å
 * @param bornExponent - Born exponent n (dimensionless)
 * @returns U in kJ/mol, positive for crystal → gaseous ions
 * @see Born, M.; Landé, A. Verh. Dtsch. Phys. Ges. 20, 210 (1918); Pauling, The Nature of the Chemical Bond (1960) for n.
 * @example
 * ```ts
 * // NaCl: A = 1.747565, r₀ = a/2 = 2.8201 Å, n = (7 + 9)/2 = 8
 * bornLande(1.747565, 1, 2.8201, 8); // 753.3 kJ/mol
 * ```
 */
export function bornLande(madelung: number, chargeProduct: number, r0: number, bornExponent: number): number {
  numberArgument(madelung, 'madelung', 'the Madelung constant', { min: 0, above: true, max: 1000 });
  numberArgument(chargeProduct, 'chargeProduct', 'the charge product |z₊·z₋|', { min: 0, above: true, max: 1000 });
  numberArgument(r0, 'r0', 'the cation–anion distance in Å', { min: 0.01, max: 1000 });
  numberArgument(bornExponent, 'bornExponent', 'the Born exponent', { min: 1, max: 100 });
  return ((COULOMB_KJ_ANGSTROM * madelung * chargeProduct) / r0) * (1 - 1 / bornExponent);
}
