/**
 * Freezing point of an aqueous solution by the ideal freezing-point
 * depression law, with full dissociation of the salts.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/**
 * Cryoscopic constant of water, K·kg/mol. Physical chemistry textbooks give
 * 1.86 (e.g. Atkins, P.; de Paula, J. Physical Chemistry, table of freezing-point
 * constants; from memory); third-party copies checked give 1.853–1.86.
 */
export const WATER_CRYOSCOPIC_CONSTANT = 1.86;

/**
 * Freezing point of water holding dissolved particles, °C:
 * T_f = 0 °C − K_f · Σ νᵢ·mᵢ, with mᵢ the molality of solute i (mol per kg of
 * water) and νᵢ the particles one formula unit gives (2 for NaCl, 3 for CaCl2,
 * 1 for urea). Ideal and dilute: at pack concentrations activity effects make
 * the true depression larger for most salts, which is why the pack model also
 * clamps at the measured salt–ice eutectic where the data give one.
 *
 * @param particleMoles - Σ νᵢ·nᵢ, moles of dissolved particles
 * @param waterG - grams of liquid water holding them
 * @returns °C; undefined when there is no liquid water
 * @see Atkins, P.; de Paula, J. Physical Chemistry, chapter on colligative properties
 * @example
 * ```ts
 * freezingPointOfSolution(0.5, 1000); // -0.93 (0.5 mol of particles per kg: 1.86 × 0.5 K)
 * ```
 */
export function freezingPointOfSolution(particleMoles: number, waterG: number): number | undefined {
  numberArgument(particleMoles, 'particleMoles', 'the moles of dissolved particles', { min: 0, max: 1e9 });
  numberArgument(waterG, 'waterG', 'the grams of liquid water', { max: 1e12 });
  if (!(waterG >= 1e-6)) return undefined;
  const t = -(WATER_CRYOSCOPIC_CONSTANT * particleMoles * 1000) / waterG;
  return unsignedZero(t);
}
