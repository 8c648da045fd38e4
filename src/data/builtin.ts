/**
 * The built-in dataset: every table under `data/`, bundled into the package
 * so that the core entry needs no file access (it runs in a browser or a
 * notebook). Built on first use. The tables are validated by the test suite,
 * not at every start-up; the running library carries them without their
 * prose (`builtinTables.generated.ts`: notes and checks stay in data/*.json),
 * and the indexes and calibrations that take time to build come computed
 * ahead (`builtinSnapshot.generated.ts`); `npm run generate` writes both.
 *
 * @module
 */
import { Dataset } from './dataset.js';
import { builtinSnapshot } from './builtinSnapshot.generated.js';
import { builtinSources, builtinTables } from './builtinTables.generated.js';

let builtin: Dataset | undefined;

/**
 * The dataset of built-in tables (the same object on every call; it is
 * immutable). Merge your own tables over it with {@link Dataset.withOverrides}.
 *
 * @see data/sources.json, the full citation of every source key the records name; DEVELOPERS.md, "Data tables".
 *
 * @example
 * ```ts
 * builtinDataset().records('ions.json').length > 60; // true
 * builtinDataset() === builtinDataset(); // true
 * ```
 */
export function builtinDataset(): Dataset {
  builtin ??= new Dataset(builtinTables, builtinSources, 'built-in', new Map(), builtinSnapshot);
  return builtin;
}
