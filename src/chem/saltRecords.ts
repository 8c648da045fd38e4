/**
 * Finding a salt's records in the formula-keyed tables (formation
 * enthalpies, enthalpies of solution, crystals, solubility, heat capacities,
 * hazards). Record formulas are read by the same parser as user input, so
 * `CH3COONa·3H2O` in a table and `NaC2H3O2.3H2O` typed by a user meet.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { TableName, TableRecord } from '../data/schemas.js';
import { IonheatError, isIonheatError } from '../error.js';
import { parseSalt } from './parseSalt.js';
import type { Salt } from './salt.js';

/** The formula under which water's own records are kept. */
export const WATER = 'H2O';

/** Tables whose records are keyed by a salt formula. */
export type SaltTable = 'compound-formation.json' | 'solution-enthalpies.json' | 'crystals.json' | 'solubility.json' | 'heat-capacities.json';

/** The canonical formula of a record's formula text, with the table and record in any error. */
function canonical(name: TableName, formula: string, i: number, dataset: Dataset): string {
  if (formula === WATER) return WATER; // the solvent: in the tables, but not a salt
  try {
    return parseSalt(formula, dataset).formula;
  } catch (e) {
    const why = isIonheatError(e) ? e.message : String(e);
    throw new IonheatError('INVALID_DATA', `${dataset.label} table ${name}, record ${i + 1} ("${formula}"): ${why}`, { field: `${name}[${i}].formula` });
  }
}

/** The memo key of each table's index (written out, so that a look-up builds no string). */
const INDEX_KEYS: Readonly<Record<SaltTable, string>> = {
  'compound-formation.json': 'chem.saltRecords.compound-formation.json',
  'solution-enthalpies.json': 'chem.saltRecords.solution-enthalpies.json',
  'crystals.json': 'chem.saltRecords.crystals.json',
  'solubility.json': 'chem.saltRecords.solubility.json',
  'heat-capacities.json': 'chem.saltRecords.heat-capacities.json',
};

/** Records of a formula-keyed table grouped by canonical formula, built once per dataset. */
export function saltRecordIndex<N extends SaltTable>(name: N, dataset: Dataset): ReadonlyMap<string, readonly TableRecord<N>[]> {
  return dataset.memo(INDEX_KEYS[name], () => {
    const index = new Map<string, TableRecord<N>[]>();
    dataset.records(name).forEach((record, i) => {
      const key = canonical(name, (record as { formula: string }).formula, i, dataset);
      const list = index.get(key) ?? [];
      list.push(record);
      index.set(key, list);
    });
    return index;
  });
}

/**
 * The records of a table for one salt (every phase, for tables that have
 * phases), or an empty list.
 *
 * @example
 * ```ts
 * saltRecords('solution-enthalpies.json', parseSalt('KNO3'))[0]?.value; // 34.89 (CRC)
 * ```
 */
export function saltRecords<N extends SaltTable>(name: N, salt: Pick<Salt, 'formula'>, dataset: Dataset = builtinDataset()): readonly TableRecord<N>[] {
  return saltRecordIndex(name, dataset).get(salt.formula) ?? [];
}
