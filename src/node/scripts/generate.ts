/**
 * `npm run generate`: writes the modules generated from the tables under
 * data/ — src/data/builtinTables.generated.ts (the tables without their
 * prose) and src/data/builtinSnapshot.generated.ts (their indexes and
 * calibrations computed ahead). Run it after changing data/*.json or the way
 * an index or calibration is built; a test fails while either is stale.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { builtinTablesText } from './builtinTables.js';

const dir = fileURLToPath(new URL('../../data/', import.meta.url));
writeFileSync(`${dir}builtinTables.generated.ts`, builtinTablesText());
process.stdout.write(`wrote ${dir}builtinTables.generated.ts\n`);
// The snapshot is computed from the tables just written: load it only now.
const { builtinSnapshotText } = await import('./builtinSnapshot.js');
writeFileSync(`${dir}builtinSnapshot.generated.ts`, builtinSnapshotText());
process.stdout.write(`wrote ${dir}builtinSnapshot.generated.ts\n`);
