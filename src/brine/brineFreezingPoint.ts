/**
 * The freezing point of a single-salt brine: the temperature at which its
 * water activity (Pitzer osmotic coefficient, or the charge-type estimate)
 * equals that of water over ice, with the 95 % interval from the
 * uncertainty of φ.
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
import { ZERO_CELSIUS_K } from './debyeHuckelSlopes.js';
import { brineModel, type BrineModel } from './brineModel.js';
import { waterConstants } from './brineParameterSets.js';
import { brineOsmotic, brineOsmoticU } from './brineProperties.js';
import { iceWaterActivityLn, type WaterConstants } from './waterPhases.js';

/** Lowest temperature searched, °C (below every salt–ice eutectic of a pack salt). */
const LOWEST_C = -80;

/** The freezing point (°C) of the brine at m with φ shifted by z standard uncertainties; LOWEST_C when it lies below. */
export function freezingPointKernel(model: BrineModel, water: WaterConstants, m: number, z: number): number {
  const gap = (tC: number): number => {
    const tK = tC + ZERO_CELSIUS_K;
    const phi = brineOsmotic(model, m, tK) + z * brineOsmoticU(model, m, tK);
    return -water.molarMass * model.particles * m * Math.max(phi, 0.05) - iceWaterActivityLn(water, tK);
  };
  // gap < 0 above the freezing point (liquid stable), > 0 below it.
  if (gap(LOWEST_C) < 0) return LOWEST_C;
  let lo = LOWEST_C;
  let hi = 0;
  for (let k = 0; k < 60; k++) {
    const mid = 0.5 * (lo + hi);
    if (gap(mid) > 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Freezing point of a brine of one salt at molality m: the T solving
 * −Mw·ν·m·φ(m, T) = −(ΔfusH/R)(1/T − 1/T₀) − (ΔfusCp/R)[(T − T₀)/T − ln(T/T₀)],
 * with φ from Pitzer's equations (brine module). The 95 % interval comes
 * from φ ± 1.96·u(φ): the fit allowance inside the fitted range, the model
 * discrepancy past it or where the charge-type estimate stands in. Ice only:
 * whether the salt itself would crystallize first (past the eutectic) is
 * not checked here.
 *
 * @param salt - the salt (its anhydrous form dissolves)
 * @param molality - mol of salt per kg of water, 0–30
 * @param dataset - the Pitzer table (default: built-in)
 * @returns °C, with its 95 % interval
 * @see pitzerMayorga1973, silvesterPitzer1977, pitzerDat; docs/methods.md, "Brines"
 * @example
 * ```ts
 * brineFreezingPoint(parseSalt('CaCl2'), 2).value; // ≈ -15.9 (Smithsonian table: −15.27 °C; the fit is extrapolated below 0 °C)
 * ```
 */
export function brineFreezingPoint(salt: Salt, molality: number, dataset: Dataset = builtinDataset()): Estimate {
  salt = saltArgument(salt, dataset);
  numberArgument(molality, 'molality', 'the molality in mol/kg', { min: 0, max: 30 });
  const model = brineModel(salt, dataset);
  const water = waterConstants(dataset);
  const value = freezingPointKernel(model, water, molality, 0);
  // A larger φ lowers the freezing point: the interval's ends come from φ ∓ 1.96·u, whichever lies where.
  const a = freezingPointKernel(model, water, molality, COVERAGE_95);
  const b = freezingPointKernel(model, water, molality, -COVERAGE_95);
  const low = Math.min(value, a, b);
  const high = Math.max(value, a, b);
  return makeEstimate({
    quantity: 'freezing point of brine',
    value,
    u: (high - low) / (2 * COVERAGE_95),
    low,
    high,
    unit: '°C',
    basis: model.own.osmotic ? 'measured' : 'model',
    method: model.basis,
    sources: [...model.sources, ...water.sources],
    notes: model.notes,
  });
}
