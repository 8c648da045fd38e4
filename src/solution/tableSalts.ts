/**
 * The salts the formation and solution tables name, each parsed once per
 * dataset: the anchor index and the hydrate forms both start from them.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { tableFormulaSalt } from '../chem/tableFormulaSalt.js';
import { saltRecordIndex, WATER } from '../chem/saltRecords.js';
import type { Salt } from '../chem/salt.js';

/**
 * Canonical formula → parsed salt for every formula of compound-formation.json
 * and then solution-enthalpies.json (in that order, water left out). A
 * formula the ion table cannot read is skipped: a user's table may name salts
 * of ions it does not define.
 * @internal
 */
export function tableSalts(dataset: Dataset): ReadonlyMap<string, Salt> {
  return dataset.memo('solution.tableSalts', () => {
    const salts = new Map<string, Salt>();
    for (const table of ['compound-formation.json', 'solution-enthalpies.json'] as const) {
      for (const formula of saltRecordIndex(table, dataset).keys()) {
        if (formula === WATER || salts.has(formula)) continue;
        const salt = tableFormulaSalt(formula, dataset);
        if (salt) salts.set(formula, salt);
      }
    }
    return salts;
  });
}
