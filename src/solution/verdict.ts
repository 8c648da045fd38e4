import { estimateArgument } from '../quantity/argumentChecks.js';
import { probabilityPositive, type Estimate } from '../quantity/estimate.js';

/** What a formulator reads: does the salt cool the pack, heat it, or can we not tell? */
export type Verdict = 'endothermic' | 'exothermic' | 'undetermined';

/**
 * The verdict of an enthalpy of solution: `endothermic` (cools) when the whole
 * 95 % interval lies above zero, `exothermic` (heats) when it lies below,
 * `undetermined` when it spans zero; and the probability that ΔsolH > 0 for
 * a normal distribution with the estimate's value and standard uncertainty:
 * P = Φ(ΔsolH / u).
 *
 * @param e - an enthalpy of solution, kJ/mol, positive = endothermic
 * @see JCGM 100:2008 (GUM), §6.2–6.3, for the 95 % interval the verdict reads; DEVELOPERS.md, "Conventions", for the sign.
 *
 * @example
 * ```ts
 * const e = makeEstimate({ quantity: 'enthalpy of solution', value: 25.69, u: 0.1, unit: 'kJ/mol', basis: 'measured', method: 'table' });
 * solutionVerdict(e).verdict; // 'endothermic'
 * const wide = makeEstimate({ quantity: 'enthalpy of solution', value: 2, u: 3, unit: 'kJ/mol', basis: 'model', method: 'kapustinskii' });
 * solutionVerdict(wide).verdict; // 'undetermined'
 * solutionVerdict(wide).probabilityEndothermic; // 0.75
 * ```
 */
export function solutionVerdict(e: Estimate): { verdict: Verdict; probabilityEndothermic: number } {
  e = estimateArgument(e);
  const verdict: Verdict = e.low > 0 ? 'endothermic' : e.high < 0 ? 'exothermic' : 'undetermined';
  return { verdict, probabilityEndothermic: probabilityPositive(e) };
}
