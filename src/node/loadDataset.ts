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
import { mergeOverrides } from '../data/recordCheck.js';
import { basename } from 'node:path';
import { z } from 'zod';
import { builtinDataset } from '../data/builtin.js';
import type { Dataset, TableOverrides } from '../data/dataset.js';
import { sourceSchema } from '../data/schemas.js';
import { IonheatError } from '../error.js';
import { overrideError } from '../data/dataset.js';
import { didYouMean } from '../quantity/nearestName.js';
import { parseJsonStrict } from './strictJson.js';
import { readTextFile } from './readInputFile.js';

/** The largest override file read (a table of every ion and salt ionheat knows is well under 1 MB). */
const MAX_DATA_FILE_BYTES = 16 * 2 ** 20;
import { implausibleOverrides } from './plausibleOverrides.js';

const overrideFileSchema = z.strictObject({
  $schema: z.string().optional(),
  description: z.string().optional(),
  sources: z.record(z.string().min(1).max(80), sourceSchema).optional(),
  tables: z.record(z.string(), z.array(z.unknown())),
});

/**
 * Merges the tables of an override document (already parsed JSON) over a
 * dataset. Errors name `label`, the table, the record and the field.
 *
 * @param document - the parsed JSON: `sources` (citations by key) and `tables` (records by table name); units as in
 *   the built-in tables (kJ/mol, Å, nm³, g per 100 g water)
 * @param label - where the document came from (a file name), for messages
 * @param base - the dataset to merge over (default: built-in); it is not changed
 * @see DEVELOPERS.md, "A user's own tables"; the record schemas in src/data/schemas.ts.
 *
 * @example
 * ```ts
 * const mine = applyOverrideDocument({
 *   sources: { myLab: { citation: 'Our calorimeter, 2026', kind: 'derived' } },
 *   tables: { 'solution-enthalpies': [{ formula: 'KNO3', value: 34.9, unit: 'kJ/mol', uncertainty: 0.2, source: 'myLab', fromMemory: false }] },
 * }, 'my-values.json');
 * dissolve('KNO3', {}, mine).best.value; // 34.9 kJ/mol (the built-in 34.89 is unchanged)
 * mine.label; // 'built-in + my-values.json'
 * let error;
 * try { applyOverrideDocument({ tables: { 'solution-enthalpies': [{ formula: 'KNO3', value: 'hot' }] } }, 'bad.json'); } catch (e) { error = e; }
 * error.code; // 'INVALID_DATA'
 * error.message.startsWith('bad.json: solution-enthalpies.json record 1'); // true
 * ```
 */
export function applyOverrideDocument(document: unknown, label: string, base: Dataset = builtinDataset()): Dataset {
  const parsed = overrideFileSchema.safeParse(document);
  if (!parsed.success) {
    // Every problem of the file's shape at once, each with its path.
    throw overrideError(
      label,
      parsed.error.issues.map((issue) => {
        const path = issue.path.join('.') || '(top level)';
        const unknownKeys = issue.code === 'unrecognized_keys' ? issue.keys.map((k) => `"${k}"${didYouMean(k, TOP_LEVEL_KEYS)}`).join(', ') : '';
        return { field: issue.path.join('.'), message: unknownKeys ? `${path}: unknown key ${unknownKeys}` : `${path}: ${issue.message}` };
      }),
    );
  }
  const tables: Record<string, unknown[]> = {};
  for (const [name, records] of Object.entries(parsed.data.tables)) tables[name.endsWith('.json') ? name : `${name}.json`] = records;
  return mergeOverrides(base, tables as TableOverrides, label, parsed.data.sources ?? {}, { problems: implausibleOverrides(tables), refuseConflicts: true });
}

const TOP_LEVEL_KEYS = ['$schema', 'description', 'sources', 'tables'];

/**
 * Reads override files in order, each merged over the result of the ones
 * before it, starting from the built-in tables.
 *
 * @param paths - JSON files in the override format above
 * @param base - the dataset to start from (default: built-in); it is not changed
 * @throws IonheatError `INVALID_ARGUMENT` for a file that cannot be read, is not a regular file (a FIFO, a device, a
 *   directory) or is over 16 MB; `INVALID_DATA` naming the file, table, record and field for bad content (JSON
 *   syntax errors at their line and column; a leading byte-order mark is allowed)
 * @see DEVELOPERS.md, "A user's own tables"; {@link applyOverrideDocument} for the format.
 *
 * @example
 * ```ts
 * const { mkdtempSync, writeFileSync } = await import('node:fs');
 * const { tmpdir } = await import('node:os');
 * const { join } = await import('node:path');
 * const file = join(mkdtempSync(join(tmpdir(), 'ionheat-')), 'my-values.json');
 * writeFileSync(file, JSON.stringify({
 *   sources: { myLab: { citation: 'Our calorimeter, 2026', kind: 'derived' } },
 *   tables: { 'solution-enthalpies': [{ formula: 'NH4NO3', value: 25.8, unit: 'kJ/mol', uncertainty: 0.3, source: 'myLab', fromMemory: false }] },
 * }));
 * const data = loadDataset([file]);
 * dissolve('NH4NO3', {}, data).best.value; // 25.8 kJ/mol
 * data.label; // 'built-in + my-values.json'
 * ```
 */
export function loadDataset(paths: readonly string[], base: Dataset = builtinDataset()): Dataset {
  let dataset = base;
  for (const path of paths) {
    const text = readTextFile(path, 'data file', path, MAX_DATA_FILE_BYTES);
    dataset = applyOverrideDocument(parseJsonStrict(text, basename(path)), basename(path), dataset);
  }
  return dataset;
}
