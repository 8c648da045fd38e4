/**
 * A dataset with the built-in tables and empty caches, so that a benchmark's
 * first pass pays for every index and calibration it needs (none comes from
 * the snapshot computed ahead, builtinSnapshot.generated.ts).
 *
 * @module
 */
import { Dataset, type Tables } from '../../data/dataset.js';
import { builtinDataset } from '../../data/builtin.js';
import { tableSchemas, type TableName } from '../../data/schemas.js';

export function freshDataset(): Dataset {
  const base = builtinDataset();
  const tables: Tables = {};
  for (const name of Object.keys(tableSchemas) as TableName[]) {
    const t = base.table(name);
    if (t) (tables as Record<string, unknown>)[name] = t;
  }
  return new Dataset(tables, base.sources, base.label);
}
