/**
 * The volume of one formula unit of a crystal.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';
import { AVOGADRO } from '../quantity/constants.js';

/** nm³ per cm³. */
const NM3_PER_CM3 = 1e21;

/**
 * The formula-unit volume of a crystal from its molar mass and density:
 *
 *   V_m = M / (ρ · N_A)
 *
 * @param molarMass - M, g/mol
 * @param density - ρ, g/cm³
 * @returns V_m in nm³
 * @see Jenkins et al. (1999), source key `jenkins1999`, for V_m from density as the input of the volume-based estimate;
 *   N_A from CODATA 2018 (src/quantity/constants.ts).
 *
 * @example
 * ```ts
 * formulaUnitVolume(58.44, 2.17); // 0.04472 nm³ (NaCl)
 * ```
 */
export function formulaUnitVolume(molarMass: number, density: number): number {
  numberArgument(molarMass, 'molarMass', 'the molar mass in g/mol', { min: 0.001, max: 1e6 });
  numberArgument(density, 'density', 'the density in g/cm³', { min: 0.001, max: 100 });
  return (molarMass / (density * AVOGADRO)) * NM3_PER_CM3;
}
