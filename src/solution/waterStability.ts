import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { findIon } from '../chem/ionIndex.js';
import type { Salt } from '../chem/salt.js';

/**
 * The ions of a salt that do not survive in water (the ion table marks them
 * `stableInWater: false`; O²⁻ is the one built in: it takes a proton from
 * water, O²⁻ + H₂O → 2 OH⁻). A salt with such an ion reacts with water
 * rather than dissolving to its ions, so the lattice-plus-hydration bases
 * (anchored, model) do not describe it. A fact of the trade (common practice).
 *
 * @param salt - a parsed salt
 * @returns the ion ids, empty for a salt whose ions all exist in water
 * @example
 * ```ts
 * ionsUnstableInWater(parseSalt('MgO')); // ['O[2-]']
 * ionsUnstableInWater(parseSalt('MgCl2')); // []
 * ```
 */
export function ionsUnstableInWater(salt: Pick<Salt, 'ions'>, dataset: Dataset = builtinDataset()): string[] {
  return salt.ions.filter((i) => findIon(i.ion, dataset)?.stableInWater === false).map((i) => i.ion);
}
