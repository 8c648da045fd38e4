/**
 * ΔsolH°(∞) carried to a finite molality: ΔsolH(m, T) = ΔsolH°(∞, T) + φL(m, T),
 * the interval widened by u(φL) in quadrature on each side. The one place
 * where an infinite-dilution enthalpy becomes an integral one.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { Salt } from '../chem/salt.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { ZERO_CELSIUS_K } from '../brine/debyeHuckelSlopes.js';
import { brineModel } from '../brine/brineModel.js';
import { brineEnthalpy, brineEnthalpyU } from '../brine/brineProperties.js';

/** @internal */
export function toMolality(infinite: Estimate, salt: Salt, molality: number, temperatureC: number, dataset: Dataset, quantity = 'integral enthalpy of solution'): Estimate {
  const model = brineModel(salt, dataset);
  const tK = temperatureC + ZERO_CELSIUS_K;
  const phiL = brineEnthalpy(model, molality, tK) / 1000;
  const uL = brineEnthalpyU(model, molality, tK) / 1000;
  const value = infinite.value + phiL;
  const notes = [`to ${Number(molality.toPrecision(4))} mol/kg at ${temperatureC} °C: ΔsolH°(∞) ${infinite.value.toFixed(2)} kJ/mol plus φL ${phiL.toFixed(2)} ± ${uL.toFixed(2)} kJ/mol`, ...model.notes];
  return integralFromInfinite(infinite, value, uL, model.basis, model.sources, notes, quantity);
}

/**
 * The estimate of an integral enthalpy `value` (kJ/mol) reached from the
 * infinite-dilution estimate with a φL of standard uncertainty `uL`: u and
 * each side of the 95 % interval combine those of ΔsolH°(∞) with u(φL) in
 * quadrature.
 *
 * @internal
 */
export function integralFromInfinite(infinite: Estimate, value: number, uL: number, brineBasis: string, sources: readonly string[], notes: readonly string[], quantity = 'integral enthalpy of solution'): Estimate {
  return makeEstimate({
    quantity,
    value,
    u: Math.hypot(infinite.u, uL),
    low: value - Math.hypot(infinite.value - infinite.low, COVERAGE_95 * uL),
    high: value + Math.hypot(infinite.high - infinite.value, COVERAGE_95 * uL),
    unit: 'kJ/mol',
    basis: infinite.basis,
    method: `infinite-dilution+${brineBasis}`,
    sources: [...infinite.sources, ...sources],
    notes: [...notes],
  });
}
