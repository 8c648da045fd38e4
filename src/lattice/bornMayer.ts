/**
 * The Born–Mayer equation.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';
import { COULOMB_KJ_ANGSTROM } from '../quantity/constants.js';

/**
 * The repulsion range ρ = 0.345 Å of the Born–Mayer exponential repulsion,
 * the value fitted to the alkali halides.
 *
 * @see Born, M.; Mayer, J. E. Z. Phys. 75, 1 (1932).
 */
export const BORN_MAYER_RHO = 0.345;

/**
 * The lattice energy of an ionic crystal by the Born–Mayer equation
 * (exponential repulsion):
 *
 *   U = N_A·A·|z₊z₋|·e² / (4πε₀·r₀) · (1 − ρ/r₀)
 *
 * @param madelung - Madelung constant A referred to r₀ and unit charges
 * @param chargeProduct - |z₊z₋| of the binary salt
 * @param r0 - shortest cation–anion distance, Å
 * @param rho - repulsion range, Å (default 0.345)
 * @returns U in kJ/mol, positive for crystal → gaseous ions
 * @see Born, M.; Mayer, J. E. Zur Gittertheorie der Ionenkristalle. Z. Phys. 75, 1–18 (1932).
 * @example
 * ```ts
 * // NaCl: A = 1.747565, r₀ = 2.8201 Å
 * bornMayer(1.747565, 1, 2.8201); // 755.6 kJ/mol
 * ```
 */
export function bornMayer(madelung: number, chargeProduct: number, r0: number, rho: number = BORN_MAYER_RHO): number {
  numberArgument(madelung, 'madelung', 'the Madelung constant', { min: 0, above: true, max: 1000 });
  numberArgument(chargeProduct, 'chargeProduct', 'the charge product |z₊·z₋|', { min: 0, above: true, max: 1000 });
  numberArgument(r0, 'r0', 'the cation–anion distance in Å', { min: 0.01, max: 1000 });
  numberArgument(rho, 'rho', 'the repulsion range ρ in Å', { min: 0, above: true, max: 100 });
  return ((COULOMB_KJ_ANGSTROM * madelung * chargeProduct) / r0) * (1 - rho / r0);
}
