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
      `lattice enthalpy ${lattice.value.toFixed(1)} ± ${lattice.u.toFixed(1)} kJ/mol (${lattice.method}) plus hydration ${hydration.value.toFixed(1)} ± ${hydration.u.toFixed(1)} kJ/mol (${hydration.method}): a small difference of two large numbers`,
      ...hydration.notes,
    ],
  });
}
