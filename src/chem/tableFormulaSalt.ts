/**
 * A salt named by a data table, read with the dataset's ion table.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { isIonheatError } from '../error.js';
import { parseSalt } from './parseSalt.js';
import type { Salt } from './salt.js';

/**
 * The salt a table record names, or undefined when the ion table cannot read
 * its formula: a user's table may name salts of ions it does not define, and
 * such a record is skipped rather than failing every computation that scans
 * the table. Errors that are not the formula's fault still throw.
 * @internal
 */
export function tableFormulaSalt(formula: string, dataset: Dataset): Salt | undefined {
  try {
    return parseSalt(formula, dataset);
  } catch (e) {
    if (isIonheatError(e)) return undefined;
    throw e;
  }
}
