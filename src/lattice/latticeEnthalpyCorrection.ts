/**
 * From lattice energy to lattice enthalpy.
 *
 * @module
 */
import { GAS_CONSTANT, STANDARD_TEMPERATURE } from '../quantity/constants.js';
import type { IonShape } from './latticeIons.js';

/** Degrees of freedom s of a gaseous ion: 3 monatomic, 5 linear, 6 non-linear (Jenkins 2005). */
const DEGREES: Readonly<Record<IonShape, number>> = { monatomic: 3, linear: 5, nonlinear: 6 };

/**
 * The correction that turns a lattice energy U (static lattice) into the
 * lattice enthalpy at temperature T:
 *
 *   ΔH_L = U + [p(s_M/2 − 2) + q(s_X/2 − 2)]·RT
 *
 * for MₚXₙ, summed over every kind of ion in general, where s is 3 for a
 * monatomic ion, 5 for a linear polyatomic ion and 6 for a non-linear one.
 * For NaCl the correction is −RT (−2.48 kJ/mol at 298.15 K).
 *
 * @param ions - each kind of ion with its count per formula unit and shape
 * @param temperature - T, K (default 298.15)
 * @returns ΔH_L − U in kJ/mol
 * @see Jenkins, H. D. B. Thermodynamics of the relationship between lattice energy and lattice enthalpy. J. Chem. Educ. 82, 950–952 (2005).
 * @example
 * ```ts
 * latticeEnthalpyCorrection([{ count: 1, shape: 'monatomic' }, { count: 1, shape: 'monatomic' }]); // -2.479 (NaCl)
 * latticeEnthalpyCorrection([{ count: 1, shape: 'monatomic' }, { count: 1, shape: 'nonlinear' }]); // 1.239 (KNO3: −½ + 1)
 * ```
 */
export function latticeEnthalpyCorrection(ions: readonly { count: number; shape: IonShape }[], temperature: number = STANDARD_TEMPERATURE): number {
  let degrees = 0;
  for (const { count, shape } of ions) degrees += count * (DEGREES[shape] / 2 - 2);
  return (degrees * GAS_CONSTANT * temperature) / 1000;
}
