// Datasets built from the built-in tables for tests: with a table filtered, or
// with every table's records in another order.
import { Dataset, type Tables } from '../../src/data/dataset.js';
import { builtinDataset } from '../../src/data/builtin.js';
import { tableSchemas, type TableName } from '../../src/data/schemas.js';

export function builtinTables(): Tables {
  const base = builtinDataset();
  const tables: Tables = {};
  for (const name of Object.keys(tableSchemas) as TableName[]) {
    const t = base.table(name);
    if (t) (tables as Record<string, unknown>)[name] = t;
  }
  return tables;
}

/** The built-in dataset with one table's records filtered. */
export function datasetWith<N extends TableName>(name: N, keep: (record: any) => boolean): Dataset {
  const tables = builtinTables() as Record<string, any>;
  tables[name] = { ...tables[name], records: tables[name].records.filter(keep) };
  return new Dataset(tables as Tables, builtinDataset().sources, `built-in, ${name} filtered`);
}

/** The built-in dataset with every table's records permuted by a seeded shuffle. */
export function shuffledDataset(seed: number, keepOrder: readonly string[] = []): Dataset {
  let s = seed >>> 0 || 1;
  const rand = () => ((s = (s * 1664525 + 1013904223) >>> 0) / 2 ** 32);
  const tables = builtinTables() as Record<string, any>;
  for (const name of Object.keys(tables)) {
    if (keepOrder.includes(name)) continue;
    const records = [...tables[name].records];
    for (let i = records.length - 1; i > 0; i--) {
      const j = Math.floor(rand() * (i + 1));
      [records[i], records[j]] = [records[j], records[i]];
    }
    tables[name] = { ...tables[name], records };
  }
  return new Dataset(tables as Tables, builtinDataset().sources, `built-in, shuffled ${seed}`);
}
