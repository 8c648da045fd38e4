import type { Dataset } from '../data/dataset.js';
import { saltArgument } from '../chem/saltArgument.js';
import { builtinDataset } from '../data/builtin.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords } from '../chem/saltRecords.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';

/**
 * The tabulated enthalpy of solution at infinite dilution, 25 °C, as an
 * {@link Estimate} on the `measured` basis; undefined when the table has none.
 * Positive = endothermic = the solution cools.
 *
 * @param salt - the salt as dissolved (a hydrate is its own entry)
 * @param dataset - the solution-enthalpies table (default: built-in)
 * @returns kJ/mol, with the record's uncertainty or the table default
 * @see CRC Handbook of Chemistry and Physics, 'Enthalpy of solution of electrolytes'
 * @example
 * ```ts
 * measuredSolutionEnthalpy(parseSalt('NH4NO3'))?.value; // 25.69 kJ/mol (CRC)
 * ```
 */
export function measuredSolutionEnthalpy(salt: Salt, dataset: Dataset = builtinDataset()): Estimate | undefined {
  salt = saltArgument(salt, dataset);
  const record = saltRecords('solution-enthalpies.json', salt, dataset)[0];
  if (!record) return undefined;
  const u = dataset.uncertaintyOf('solution-enthalpies.json', record) ?? 0;
  return makeEstimate({
    quantity: 'enthalpy of solution',
    value: record.value,
    u,
    unit: 'kJ/mol',
    basis: 'measured',
    method: 'table',
    sources: [record.source],
    notes: record.fromMemory ? ['tabulated value entered from memory, not checked against the source'] : [],
  });
}
