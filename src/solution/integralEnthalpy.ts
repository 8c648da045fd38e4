/**
 * The integral enthalpy of solution to a finite molality:
 * ΔsolH(m, T) = ΔsolH°(∞, T) + φL(m, T).
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { saltArgument } from '../chem/saltArgument.js';
import type { Salt } from '../chem/salt.js';
import { numberArgument } from '../quantity/argumentChecks.js';
import type { Estimate } from '../quantity/estimate.js';
import { dissolve } from './dissolve.js';
import { toMolality } from './toMolality.js';

/**
 * The integral enthalpy of solution of a salt to molality m (mol of
 * anhydrous salt per kg of water in the final solution, crystal water
 * counted as water), at T: ΔsolH(m, T) = ΔsolH°(∞, T) + φL(m, T), kJ/mol of
 * the formula as written. ΔsolH°(∞, T) is {@link dissolve}'s best value
 * (Kirchhoff-corrected to T); φL comes from Pitzer's equations (own
 * parameters, or the charge-type estimate with its validated discrepancy).
 * The interval adds the two in quadrature on each side.
 *
 * @param salt - the salt as dissolved (a hydrate brings its water)
 * @param molality - mol/kg, 0–30
 * @param temperatureC - °C, 0–40 (default 25)
 * @param dataset - default: built-in
 * @returns kJ/mol, positive = endothermic
 * @see silvesterPitzer1977 (φL), pitzerDat (parameters); docs/methods.md, "Brines"
 * @example
 * ```ts
 * integralEnthalpyOfSolution(parseSalt('NaCl'), 0).value; // 3.88 (the infinite-dilution value)
 * integralEnthalpyOfSolution(parseSalt('NaCl'), 6).value < 2.5; // true
 * ```
 */
export function integralEnthalpyOfSolution(salt: Salt, molality: number, temperatureC = 25, dataset: Dataset = builtinDataset()): Estimate {
  salt = saltArgument(salt, dataset);
  numberArgument(molality, 'molality', 'the molality in mol/kg', { min: 0, max: 30 });
  numberArgument(temperatureC, 'temperatureC', 'the temperature in °C', { min: 0, max: 40 });
  return toMolality(dissolve(salt, temperatureC === 25 ? {} : { temperatureC }, dataset).best, salt, molality, temperatureC, dataset);
}
