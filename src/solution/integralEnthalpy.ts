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
import { COVERAGE_95 } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { ZERO_CELSIUS_K } from '../brine/debyeHuckelSlopes.js';
import { brineModel } from '../brine/brineModel.js';
import { brineEnthalpy, brineEnthalpyU } from '../brine/brineProperties.js';
import { dissolve } from './dissolve.js';

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
  const infinite = dissolve(salt, temperatureC === 25 ? {} : { temperatureC }, dataset).best;
  const model = brineModel(salt, dataset);
  const tK = temperatureC + ZERO_CELSIUS_K;
  const phiL = brineEnthalpy(model, molality, tK) / 1000;
  const uL = brineEnthalpyU(model, molality, tK) / 1000;
  const value = infinite.value + phiL;
  const down = Math.hypot(infinite.value - infinite.low, COVERAGE_95 * uL);
  const up = Math.hypot(infinite.high - infinite.value, COVERAGE_95 * uL);
  return makeEstimate({
    quantity: 'integral enthalpy of solution',
    value,
    u: Math.hypot(infinite.u, uL),
    low: value - down,
    high: value + up,
    unit: 'kJ/mol',
    basis: infinite.basis,
    method: `infinite-dilution+${model.basis}`,
    sources: [...infinite.sources, ...model.sources],
    notes: [`to ${molality} mol/kg at ${temperatureC} °C: ΔsolH°(∞) ${infinite.value.toFixed(2)} kJ/mol plus φL ${phiL.toFixed(2)} ± ${uL.toFixed(2)} kJ/mol`, ...model.notes],
  });
}
