/**
 * Merging a parsed override document over a dataset. No Node built-in, so
 * that the workbench page checks a user's file with the same schemas and
 * plausible ranges as `--data` on the command line (loadDataset.ts reads
 * the files).
 *
 * @module
 */
import { z } from 'zod';
import { builtinDataset } from '../data/builtin.js';
import type { Dataset, TableOverrides } from '../data/dataset.js';
import { sourceSchema } from '../data/schemas.js';
import { overrideError } from '../data/dataset.js';
import { didYouMean } from '../quantity/nearestName.js';
import { implausibleOverrides } from './plausibleOverrides.js';
import { mergeOverrides } from '../data/recordCheck.js';

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

