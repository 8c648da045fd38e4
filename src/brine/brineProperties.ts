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
import { apparentFromTerms, enthalpyTerms, heatCapacityTerms, osmoticCoefficient, osmoticCoefficientWith, relativeApparentEnthalpy, relativeApparentHeatCapacity } from './pitzerBrine.js';
import { debyeHuckelOsmotic, REFERENCE_K } from './debyeHuckelSlopes.js';
import { pitzerAt } from './pitzerTemperature.js';
import { nonElectrolyteEnthalpy, nonElectrolyteOsmotic, nonElectrolyteOsmoticTerms, nonElectrolyteOsmoticWith, powerSeries } from './nonElectrolyteBrine.js';

/** Molality past the model's own range (all of it without own data). */
function excess(model: BrineModel, m: number, own: boolean): number {
  return own ? Math.max(0, m - model.maxMolality) : m;
}

/** φ at m (mol/kg), T (K). */
export function brineOsmotic(model: BrineModel, m: number, tK: number): number {
  if (model.nonElectrolyte) return nonElectrolyteOsmotic(model.nonElectrolyte, m, tK);
  return model.pitzer ? osmoticCoefficient(model.pitzer, m, tK) : 1;
}

/**
 * The temperature-dependent parts of φ at tK written into `out` (Aφ, β⁰, β¹,
 * β², Cᵠ), for {@link brineOsmoticWith} at many molalities.
 */
export function brineOsmoticTerms(model: BrineModel, tK: number, out: Float64Array): void {
  if (model.nonElectrolyte) return nonElectrolyteOsmoticTerms(model.nonElectrolyte, tK, out);
  const p = model.pitzer;
  if (!p) return;
  out[0] = debyeHuckelOsmotic(tK);
  out[1] = pitzerAt(p.beta0, tK);
  out[2] = pitzerAt(p.beta1, tK);
  out[3] = p.alpha2 > 0 ? pitzerAt(p.beta2, tK) : 0;
  out[4] = pitzerAt(p.cphi, tK);
}

/** φ at m from the terms {@link brineOsmoticTerms} wrote. */
export function brineOsmoticWith(model: BrineModel, m: number, terms: Float64Array): number {
  if (model.nonElectrolyte) return nonElectrolyteOsmoticWith(m, terms);
  return model.pitzer ? osmoticCoefficientWith(model.pitzer, m, terms[0]!, terms[1]!, terms[2]!, terms[3]!, terms[4]!) : 1;
}

/** Standard uncertainty of φ at m (mol/kg) and tK (the fit allowance grows away from the temperature of the fit: 25 °C for the Pitzer sets, the series' own reference for a non-electrolyte). */
export function brineOsmoticU(model: BrineModel, m: number, tK = REFERENCE_K): number {
  // A non-electrolyte's series is fitted to freezing points (at and below its reference): only warmer is extrapolated.
  const away = model.nonElectrolyte ? Math.max(0, tK - model.nonElectrolyte.referenceK) : Math.abs(tK - REFERENCE_K);
  const ownScatter = model.osmoticRelativeU ? model.osmoticRelativeU * brineOsmotic(model, Math.min(m, model.maxMolality), tK) : 0;
  const perKelvin = model.basis === 'pitzer-with-estimated-temperature-terms' ? FIT_ALLOWANCE.osmoticPerMolalityKelvinEstimated : FIT_ALLOWANCE.osmoticPerMolalityKelvin;
  const fit = model.own.osmotic ? ownScatter + (FIT_ALLOWANCE.osmoticPerMolality + perKelvin * away) * Math.min(m, model.maxMolality) : 0;
  return fit + model.scales.osmotic * model.chargeScale * excess(model, m, model.own.osmotic);
}

/** φL, J/mol, at m (mol/kg), T (K). */
export function brineEnthalpy(model: BrineModel, m: number, tK: number): number {
  if (model.nonElectrolyte) return nonElectrolyteEnthalpy(model.nonElectrolyte, m);
  return model.pitzer ? relativeApparentEnthalpy(model.pitzer, m, tK) : 0;
}

/** Standard uncertainty of φL, J/mol, at m (mol/kg), T (K). */
export function brineEnthalpyU(model: BrineModel, m: number, tK: number): number {
  return enthalpyAllowance(model, m, model.own.enthalpy && m > model.maxMolality ? brineEnthalpy(model, model.maxMolality, tK) : brineEnthalpy(model, m, tK));
}

/** u(φL) from φL at min(m, the fitted range) already known (J/mol). */
export function enthalpyAllowance(model: BrineModel, m: number, phiLInRange: number): number {
  const fit = model.own.enthalpy ? (model.enthalpyRelativeU ?? FIT_ALLOWANCE.enthalpyRelative) * Math.abs(phiLInRange) + FIT_ALLOWANCE.enthalpyPerMolality * Math.min(m, model.maxMolality) : 0;
  return fit + model.scales.enthalpy * model.chargeScale * excess(model, m, model.own.enthalpy);
}

/** The terms of φL (`kind` 'enthalpy') or φJ ('heatCapacity') at tK into `out` (five numbers), for the *With kernels. */
export function brineApparentTerms(model: BrineModel, kind: 'enthalpy' | 'heatCapacity', tK: number, out: Float64Array): void {
  if (model.nonElectrolyte) {
    // φL = Σ hᵢ·mⁱ independent of T; φJ = 0.
    for (let i = 0; i < out.length; i++) out[i] = kind === 'enthalpy' ? (model.nonElectrolyte.enthalpy[i] ?? 0) : 0;
    return;
  }
  if (!model.pitzer) return;
  if (kind === 'enthalpy') enthalpyTerms(model.pitzer, tK, out);
  else heatCapacityTerms(model.pitzer, tK, out);
}

/** φL (J/mol) or φJ (J/(mol·K)) at m from terms at tK written by {@link brineApparentTerms}. */
export function brineApparentWith(model: BrineModel, m: number, tK: number, terms: Float64Array): number {
  if (model.nonElectrolyte) return m <= 0 ? 0 : powerSeries(terms, m);
  return model.pitzer ? apparentFromTerms(model.pitzer, m, tK, terms) : 0;
}

/** φJ = φCp − φCp°, J/(mol·K), at m (mol/kg), T (K). */
export function brineHeatCapacity(model: BrineModel, m: number, tK: number): number {
  return model.pitzer ? relativeApparentHeatCapacity(model.pitzer, m, tK) : 0;
}

/** Standard uncertainty of φJ, J/(mol·K): inside the fitted range 5 % of φJ + 8·c·√m (checked against Laliberté 2009, see FIT_ALLOWANCE). */
export function brineHeatCapacityU(model: BrineModel, m: number, tK: number): number {
  const inRange = Math.min(m, model.maxMolality);
  const fit = model.own.heatCapacity ? FIT_ALLOWANCE.heatCapacityRelative * Math.abs(brineHeatCapacity(model, inRange, tK)) + FIT_ALLOWANCE.heatCapacityPerRootMolality * model.chargeScale * Math.sqrt(inRange) : 0;
  return fit + model.scales.heatCapacity * model.chargeScale * excess(model, m, model.own.heatCapacity);
}
