/**
 * The check of a user's table records against the zod schemas of the
 * tables, installed into {@link Dataset.withOverrides} when this module
 * loads. Only what merges users' tables loads it (the public entry, the
 * reading of `--data` files, a screen candidate with its own measurement),
 * so that a command over the built-in tables never loads zod.
 *
 * @module
 */
import { Dataset, installRecordCheck, type RecordCheckResult } from './dataset.js';
import { builtinDataset as builtin } from './builtin.js';
import { tableSchemas, type TableName } from './schemas.js';

function checkRecord(name: TableName, raw: unknown): RecordCheckResult {
  const result = tableSchemas[name].shape.records.element.safeParse(raw);
  return result.success ? { success: true, data: result.data } : { success: false, issues: result.error.issues };
}

installRecordCheck(checkRecord);

export { Dataset };

/**
 * `dataset.withOverrides(…)`, for the modules of ionheat that merge tables:
 * calling it through this module is what keeps the record check installed
 * in a bundle that leaves unused modules out. @internal
 */
export function mergeOverrides(dataset: Dataset, ...args: Parameters<Dataset['withOverrides']>): Dataset {
  return dataset.withOverrides(...args);
}

/**
 * The dataset of built-in tables (the same object on every call; it is
 * immutable), with the checks that {@link Dataset.withOverrides} applies to
 * your own tables loaded. Merge your own tables over it with
 * {@link Dataset.withOverrides}.
 *
 * @see data/sources.json, the full citation of every source key the records name; DEVELOPERS.md, "Data tables".
 *
 * @example
 * ```ts
 * builtinDataset().records('ions.json').length > 60; // true
 * builtinDataset() === builtinDataset(); // true
 * ```
 */
export const builtinDataset: () => Dataset = builtin;
