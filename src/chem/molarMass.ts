import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { describeValue, numberArgument } from '../quantity/argumentChecks.js';
import { IonheatError } from '../error.js';
import { exactSum } from '../quantity/exactSum.js';

/** Atomic weights by symbol, built once per dataset. */
function atomicWeights(dataset: Dataset): ReadonlyMap<string, number> {
  return dataset.memo('chem.atomicWeights', () => new Map(dataset.records('elements.json').map((e) => [e.symbol, e.value])));
}

/** True when the dataset has an atomic weight for this element symbol. */
export function isKnownElement(symbol: string, dataset: Dataset = builtinDataset()): boolean {
  return atomicWeights(dataset).has(symbol);
}

/**
 * Molar mass M = Σ nᵢ·Aᵣ(i) of an element composition, g/mol, from the
 * IUPAC standard atomic weights of the dataset, summed exactly.
 *
 * @param composition - element symbol → count
 * @param dataset - the atomic weights table, elements.json (default: built-in)
 * @returns g/mol
 * @see Prohaska et al., Standard atomic weights of the elements 2021, Pure Appl. Chem. 94, 573 (2022).
 * @example
 * ```ts
 * molarMass({ Na: 1, Cl: 1 }); // 58.44 (22.990 + 35.45 with the abridged IUPAC 2021 weights)
 * ```
 */
export function molarMass(composition: Readonly<Record<string, number>>, dataset: Dataset = builtinDataset()): number {
  if (composition === null || typeof composition !== 'object' || Array.isArray(composition)) {
    throw new IonheatError('INVALID_ARGUMENT', `a composition is an object of element symbols and counts, such as { Na: 1, Cl: 1 }; got ${describeValue(composition)}`, { field: 'composition' });
  }
  const weights = atomicWeights(dataset);
  return exactSum(
    Object.entries(composition).map(([symbol, count]) => {
      numberArgument(count, `composition.${symbol}`, `the count of ${symbol}`, { min: 0, max: 1_000_000 });
      const weight = weights.get(symbol);
      if (weight === undefined) throw new IonheatError('UNKNOWN_ELEMENT', `no atomic weight for element "${symbol}" in the ${dataset.label} tables`, { text: symbol });
      return { coefficient: count, value: weight };
    }),
  );
}
