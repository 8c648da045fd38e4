/**
 * The `model` basis: an enthalpy of solution from a lattice estimate and the
 * hydration sum alone, ΔsolH° = ΔH_L + Σν·ΔhydH°. Two numbers of several
 * hundred to several thousand kJ/mol nearly cancel, so the result carries
 * their whole uncertainty and its verdict is usually `undetermined`.
 *
 * @module
 */
import { estimateArgument } from '../quantity/argumentChecks.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';

/**
 * ΔsolH° = ΔH_L(model) + Σν·ΔhydH°, kJ/mol, positive = endothermic.
 *
 * The standard uncertainties add in quadrature, and so do the half-widths
 * of the two 95 % intervals (the lattice estimate brings its own calibrated
 * Student-t interval); the two are independent estimates.
 *
 * @param lattice - a lattice enthalpy estimate (crystal → gaseous ions), kJ/mol
 * @param hydration - the salt's hydration sum (gaseous ions → aqueous ions), kJ/mol
 * @returns basis `model`, method the lattice method's
 * @see Any text on the Born–Haber analysis of dissolution, e.g. Jenkins, H. D. B. Chemical Thermodynamics at a Glance (Blackwell, 2008)
 * @example
 * ```ts
 * const L = makeEstimate({ quantity: 'lattice enthalpy', value: 799, u: 5, unit: 'kJ/mol', basis: 'model', method: 'kapustinskii-corrected' });
 * const H = makeEstimate({ quantity: 'hydration enthalpy of the salt', value: -783.5, u: 1.6, unit: 'kJ/mol', basis: 'cycle', method: 'formation-enthalpies' });
 * solutionEnthalpyFromModel(L, H).value; // 15.5
 * solutionEnthalpyFromModel(L, H).basis; // 'model'
 * ```
 */
export function solutionEnthalpyFromModel(lattice: Estimate, hydration: Estimate): Estimate {
  lattice = estimateArgument(lattice, 'lattice');
  hydration = estimateArgument(hydration, 'hydration');
  return modelEstimate(lattice, hydration, hydrationText(hydration));
}

/** The part of the note of {@link solutionEnthalpyFromModel} that the hydration sum fills in (the same for every lattice method). */
export function hydrationText(hydration: Estimate): string {
  return `plus hydration ${fixedDecimal(hydration.value, 1)} ± ${fixedDecimal(hydration.u, 1)} kJ/mol (${hydration.method}): a small difference of two large numbers`;
}

/**
 * {@link solutionEnthalpyFromModel} from the numbers and sources of a
 * lattice estimate, with the hydration part of the note already written
 * ({@link hydrationText}): for callers that pair one hydration sum with
 * every lattice method.
 */
export function modelEstimate(lattice: Pick<Estimate, 'value' | 'u' | 'low' | 'high' | 'method'> & { sources: readonly string[] }, hydration: Estimate, hydrationNote: string): Estimate {
  const value = lattice.value + hydration.value;
  const u = Math.hypot(lattice.u, hydration.u);
  const halfWidth = Math.hypot((lattice.high - lattice.low) / 2, (hydration.high - hydration.low) / 2);
  return makeEstimate({
    quantity: 'enthalpy of solution',
    value,
    u,
    low: value - halfWidth,
    high: value + halfWidth,
    unit: 'kJ/mol',
    basis: 'model',
    method: lattice.method,
    sources: [...lattice.sources, ...hydration.sources],
    notes: [
      `lattice enthalpy ${fixedDecimal(lattice.value, 1)} ± ${fixedDecimal(lattice.u, 1)} kJ/mol (${lattice.method}) ${hydrationNote}`,
      ...hydration.notes,
    ],
  });
}
