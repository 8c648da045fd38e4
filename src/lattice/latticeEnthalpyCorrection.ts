/**
 * From lattice energy to lattice enthalpy.
 *
 * @module
 */
import { describeValue, numberArgument } from '../quantity/argumentChecks.js';
import { IonheatError } from '../error.js';
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
  if (!Array.isArray(ions)) throw new IonheatError('INVALID_ARGUMENT', `the ions of latticeEnthalpyCorrection are a list of { count, shape }, got ${describeValue(ions)}`, { field: 'ions' });
  numberArgument(temperature, 'temperature', 'the temperature in K', { min: 0, above: true, max: 100_000 });
  let degrees = 0;
  ions.forEach((ion, i) => {
    if (ion === null || typeof ion !== 'object') throw new IonheatError('INVALID_ARGUMENT', `ions[${i}] must be { count, shape }, got ${describeValue(ion)}`, { field: `ions[${i}]` });
    const count = numberArgument(ion.count, `ions[${i}].count`, 'the count of an ion', { min: 1, max: 1_000_000, integer: true });
    if (!Object.hasOwn(DEGREES, ion.shape)) throw new IonheatError('INVALID_ARGUMENT', `ions[${i}].shape must be monatomic, linear or nonlinear, got ${describeValue(ion.shape)}`, { field: `ions[${i}].shape` });
    degrees += count * (DEGREES[ion.shape as IonShape] / 2 - 2);
  });
  return (degrees * GAS_CONSTANT * temperature) / 1000;
}
