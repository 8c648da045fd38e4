/**
 * A salt's brine properties at molality m and temperature T with their
 * standard uncertainties: the osmotic coefficient φ, the relative apparent
 * molar enthalpy φL and heat capacity φJ. Numbers in, number out; nothing
 * allocated (they run inside the pack solver).
 *
 * Uncertainty: inside the fitted range of a salt's own parameters, an
 * allowance for the fit (FIT_ALLOWANCE); past it, or where the charge-type
 * estimate stands in, the model discrepancy s·c·Δm, with s calibrated leave
 * one salt out (brineCalibration.ts), c = ν|zMzX|/2 and Δm the molality past
 * the range (all of m for an estimate).
 *
 * @module
 */
import { FIT_ALLOWANCE, type BrineModel } from './brineModel.js';
import { osmoticCoefficient, relativeApparentEnthalpy, relativeApparentHeatCapacity } from './pitzerBrine.js';

/** Molality past the model's own range (all of it without own data). */
function excess(model: BrineModel, m: number, own: boolean): number {
  return own ? Math.max(0, m - model.maxMolality) : m;
}

/** φ at m (mol/kg), T (K). */
export function brineOsmotic(model: BrineModel, m: number, tK: number): number {
  return model.pitzer ? osmoticCoefficient(model.pitzer, m, tK) : 1;
}

/** Standard uncertainty of φ at m (mol/kg). */
export function brineOsmoticU(model: BrineModel, m: number): number {
  const fit = model.own.osmotic ? FIT_ALLOWANCE.osmoticPerMolality * Math.min(m, model.maxMolality) : 0;
  return fit + model.scales.osmotic * model.chargeScale * excess(model, m, model.own.osmotic);
}

/** φL, J/mol, at m (mol/kg), T (K). */
export function brineEnthalpy(model: BrineModel, m: number, tK: number): number {
  return model.pitzer ? relativeApparentEnthalpy(model.pitzer, m, tK) : 0;
}

/** Standard uncertainty of φL, J/mol, at m (mol/kg), T (K). */
export function brineEnthalpyU(model: BrineModel, m: number, tK: number): number {
  const fit = model.own.enthalpy ? FIT_ALLOWANCE.enthalpyRelative * Math.abs(brineEnthalpy(model, Math.min(m, model.maxMolality), tK)) + FIT_ALLOWANCE.enthalpyPerMolality * Math.min(m, model.maxMolality) : 0;
  return fit + model.scales.enthalpy * model.chargeScale * excess(model, m, model.own.enthalpy);
}

/** φJ = φCp − φCp°, J/(mol·K), at m (mol/kg), T (K). */
export function brineHeatCapacity(model: BrineModel, m: number, tK: number): number {
  return model.pitzer ? relativeApparentHeatCapacity(model.pitzer, m, tK) : 0;
}

/** Standard uncertainty of φJ, J/(mol·K). */
export function brineHeatCapacityU(model: BrineModel, m: number, tK: number): number {
  const fit = model.own.heatCapacity ? FIT_ALLOWANCE.heatCapacityRelative * Math.abs(brineHeatCapacity(model, Math.min(m, model.maxMolality), tK)) + FIT_ALLOWANCE.heatCapacityPerMolality * Math.min(m, model.maxMolality) : 0;
  return fit + model.scales.heatCapacity * model.chargeScale * excess(model, m, model.own.heatCapacity);
}
