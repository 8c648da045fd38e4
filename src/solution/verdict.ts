import { estimateArgument } from '../quantity/argumentChecks.js';
import { probabilityPositive, type Estimate } from '../quantity/estimate.js';
import { COVERAGE_95 } from '../quantity/constants.js';

/** What a formulator reads: does the salt cool the pack, heat it, or can we not tell? */
export type Verdict = 'endothermic' | 'exothermic' | 'undetermined';

/**
 * The verdict of an enthalpy of solution: `endothermic` (cools) when the whole
 * 95 % interval lies above zero, `exothermic` (heats) when it lies below,
 * `undetermined` when it spans zero; and the probability that ΔsolH > 0 for
 * a normal distribution centred on the value whose spread is read from the
 * same interval, on the side that faces zero:
 * P = Φ(ΔsolH / s), s = (ΔsolH − low)/1.96 for ΔsolH ≥ 0, (high − ΔsolH)/1.96 otherwise.
 * For the usual interval ΔsolH ± 1.96·u, s = u. Methods that widen their
 * interval (a Student-t factor, an anchor spread) widen s with it, so P passes
 * 0.975 exactly when the verdict leaves `undetermined`, never before.
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
 * const widened = makeEstimate({ quantity: 'enthalpy of solution', value: 5, u: 2, low: -0.2, high: 10.2, unit: 'kJ/mol', basis: 'model', method: 'kapustinskii' });
 * solutionVerdict(widened).verdict; // 'undetermined'
 * solutionVerdict(widened).probabilityEndothermic; // 0.970
 * ```
 */
export function solutionVerdict(e: Estimate): { verdict: Verdict; probabilityEndothermic: number } {
  e = estimateArgument(e);
  const verdict: Verdict = e.low > 0 ? 'endothermic' : e.high < 0 ? 'exothermic' : 'undetermined';
  const spread = (e.value >= 0 ? e.value - e.low : e.high - e.value) / COVERAGE_95;
  return { verdict, probabilityEndothermic: probabilityPositive({ value: e.value, u: spread > 0 ? spread : 0 }) };
}
