/**
 * The most precise model estimate of a lattice enthalpy.
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import { optionsArgument } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError } from '../error.js';
import type { Estimate } from '../quantity/estimate.js';
import { latticeEstimates, type LatticeEstimateOptions, LATTICE_ESTIMATE_OPTIONS } from './latticeEstimate.js';

/**
 * Of the bias-corrected lattice estimates that apply to a salt, the one
 * with the narrowest calibrated 95 % interval relative to its value (the
 * salt itself always left out of the calibration). For a cycle solved for a
 * formation enthalpy or an electron affinity, or a caller who needs a
 * lattice enthalpy where the tables close no cycle.
 *
 * The choice minimises the relative interval width (high − low)/ΔH_L over
 * the `-corrected` methods of {@link latticeEstimates}.
 *
 * @param salt - an anhydrous ionic salt (formula or parsed)
 * @param options - structure type, lattice parameter a (Å), coordination number, a further salt to leave out of the calibration
 * @param dataset - radii, volumes, structures and the cycle data of the calibration (default: built-in)
 * @returns kJ/mol, basis `model`
 * @throws IonheatError `MISSING_DATA` when no estimator applies; `NOT_APPLICABLE` for a non-electrolyte or a hydrate
 * @see Kapustinskii (1956), `kapustinskii1956`; Born and Landé (1918), `born1918`; Born and Mayer (1932), `born1932`;
 *   Jenkins et al. (1999), `jenkins1999`; calibrated against cycle values from Wagman et al. (1982), `wagman1982`.
 *
 * @example
 * ```ts
 * const e = bestLatticeEstimate('KCl');
 * e.method; // 'born-mayer-corrected'
 * e.value; // ≈ 724 kJ/mol
 * e.method.endsWith('-corrected'); // true
 * e.low < 717.3 && 717.3 < e.high; // true (cycle value 717.3 kJ/mol)
 * ```
 */
export function bestLatticeEstimate(salt: Salt | string, options: LatticeEstimateOptions = {}, dataset: Dataset = builtinDataset()): Estimate {
  const s = saltArgument(salt, dataset);
  options = optionsArgument(options, LATTICE_ESTIMATE_OPTIONS);
  const { estimates, skipped } = latticeEstimates(s, options, dataset);
  let best: Estimate | undefined;
  for (const e of estimates) {
    if (!e.method.endsWith('-corrected')) continue;
    if (!best || (e.high - e.low) / e.value < (best.high - best.low) / best.value) best = e;
  }
  if (!best) {
    throw new IonheatError('MISSING_DATA', `no lattice estimator applies to ${s.formula}: ${skipped.filter((k) => k.method.endsWith('-corrected')).map((k) => `${k.method}: ${k.reason}`).join('; ')}`, { text: s.formula });
  }
  return best;
}
