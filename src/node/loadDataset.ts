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
import { basename } from 'node:path';
import { builtinDataset } from '../data/builtin.js';
import type { Dataset } from '../data/dataset.js';
import { parseJsonStrict } from './strictJson.js';
import { readTextFile } from './readInputFile.js';
import { applyOverrideDocument } from './overrideDocument.js';

export { applyOverrideDocument } from './overrideDocument.js';

/** The largest override file read (a table of every ion and salt ionheat knows is well under 1 MB). */
const MAX_DATA_FILE_BYTES = 16 * 2 ** 20;

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
