/**
 * Reading a user's own tables from files (Node only).
 *
 * An override file is JSON:
 *
 * ```json
 * {
 *   "sources": { "myLab": { "citation": "Our calorimeter, 2026", "kind": "derived" } },
 *   "tables": {
 *     "solution-enthalpies": [
 *       { "formula": "KNO3", "value": 34.9, "unit": "kJ/mol", "uncertainty": 0.2, "source": "myLab", "fromMemory": false }
 *     ]
 *   }
 * }
 * ```
 *
 * Table names are the file names under `data/`, with or without `.json`.
 * Records pass the same schemas as the built-in tables and replace built-in
 * records with the same key.
 *
 * @module
 */
import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { z } from 'zod';
import { builtinDataset } from '../data/builtin.js';
import type { Dataset, TableOverrides } from '../data/dataset.js';
import { sourceSchema } from '../data/schemas.js';
import { IonheatError } from '../error.js';
import { parseJsonStrict } from './strictJson.js';

const overrideFileSchema = z.strictObject({
  $schema: z.string().optional(),
  description: z.string().optional(),
  sources: z.record(z.string().min(1).max(80), sourceSchema).optional(),
  tables: z.record(z.string(), z.array(z.unknown())),
});

/**
 * Merges the tables of an override document (already parsed JSON) over a
 * dataset. Errors name `label`, the table, the record and the field.
 */
export function applyOverrideDocument(document: unknown, label: string, base: Dataset = builtinDataset()): Dataset {
  const parsed = overrideFileSchema.safeParse(document);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new IonheatError('INVALID_DATA', `${label}: ${issue.path.join('.') || '(top level)'}: ${issue.message}`, { field: issue.path.join('.') });
  }
  const tables: Record<string, unknown[]> = {};
  for (const [name, records] of Object.entries(parsed.data.tables)) tables[name.endsWith('.json') ? name : `${name}.json`] = records;
  return base.withOverrides(tables as TableOverrides, label, parsed.data.sources ?? {});
}

/**
 * Reads override files in order, each merged over the result of the ones
 * before it, starting from the built-in tables.
 *
 * @param paths - JSON files in the override format above
 */
export function loadDataset(paths: readonly string[], base: Dataset = builtinDataset()): Dataset {
  let dataset = base;
  for (const path of paths) {
    let text: string;
    try {
      text = readFileSync(path, 'utf8');
    } catch (e) {
      throw new IonheatError('INVALID_ARGUMENT', `cannot read data file "${path}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`, { field: path });
    }
    dataset = applyOverrideDocument(parseJsonStrict(text, basename(path)), basename(path), dataset);
  }
  return dataset;
}
