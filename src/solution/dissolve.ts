/**
 * `dissolve`: the enthalpy of solution of a salt on every basis that the data
 * allow, the most trusted one as `best`, and what a formulator reads from it.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError } from '../error.js';
import { basisOrder, makeEstimate, type Estimate } from '../quantity/estimate.js';
import { measuredSolutionEnthalpy } from './measuredSolution.js';
import { solutionEnthalpyFromCycle } from './cycleSolution.js';
import { solutionVerdict, type Verdict } from './verdict.js';

export interface DissolveOptions {
  /**
   * Hide the target salt's own measured enthalpy of solution and crystal
   * formation enthalpy (not those of other salts), to see how the estimators
   * do on salts the tables cover.
   */
  excludeMeasured?: boolean;
}

export interface DissolveResult {
  /** Canonical formula of the salt. */
  formula: string;
  salt: Salt;
  /** The estimate on the most trusted basis available. */
  best: Estimate;
  /** Every estimate that could be made, most trusted basis first. */
  estimates: Estimate[];
  /** `endothermic` (cools), `exothermic` (heats) or `undetermined` (the 95 % interval of `best` spans zero). */
  verdict: Verdict;
  /** Probability that ΔsolH > 0 under the stated uncertainty of `best`. */
  probabilityEndothermic: number;
  perGram: {
    /** Heat absorbed per gram of salt as dissolved, J/g (positive = cools). */
    salt: Estimate;
  };
  notes: string[];
}

/** J/g from kJ/mol: ×1000 / M. */
function perGramOf(e: Estimate, salt: Salt): Estimate {
  const f = 1000 / salt.molarMass;
  return makeEstimate({ ...e, quantity: 'heat of solution per gram of salt', value: e.value * f, u: e.u * f, low: e.low * f, high: e.high * f, unit: 'J/g' });
}

/**
 * The enthalpy of solution at infinite dilution, 25 °C, of a salt, on every
 * basis the data allow, in order of trust: `measured` (the tabulated value),
 * `cycle` (Σν·ΔfH°(ions, aq) − ΔfH°(crystal)).
 *
 * @param formula - a formula (`NH4NO3`) or an already parsed {@link Salt}
 * @returns kJ/mol, positive = endothermic (the pack cools)
 * @throws IonheatError `MISSING_DATA` when no basis applies
 * @example
 * ```ts
 * const r = dissolve('NH4NO3');
 * r.best.value; // 25.69 kJ/mol (CRC, measured)
 * r.verdict; // 'endothermic'
 * ```
 */
export function dissolve(formula: string | Salt, options: DissolveOptions = {}, dataset: Dataset = builtinDataset()): DissolveResult {
  const salt = typeof formula === 'string' ? parseSalt(formula, dataset) : formula;
  const hide = options.excludeMeasured === true;
  const estimates: Estimate[] = [];
  const measured = hide ? undefined : measuredSolutionEnthalpy(salt, dataset);
  if (measured) estimates.push(measured);
  const cycle = solutionEnthalpyFromCycle(salt, dataset, { hideCrystal: hide });
  if (cycle) estimates.push(cycle);
  estimates.sort((a, b) => basisOrder.indexOf(a.basis) - basisOrder.indexOf(b.basis));
  const best = estimates[0];
  if (!best) {
    throw new IonheatError('MISSING_DATA', `no enthalpy of solution can be given for ${salt.formula}: no measured value and no formation enthalpies in the ${dataset.label} tables`, { text: salt.formula });
  }
  return {
    formula: salt.formula,
    salt,
    best,
    estimates,
    ...solutionVerdict(best),
    perGram: { salt: perGramOf(best, salt) },
    notes: hide ? ['the salt\'s own measured enthalpy of solution and crystal formation enthalpy were hidden (excludeMeasured)'] : [],
  };
}
