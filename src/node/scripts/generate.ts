/**
 * `npm run generate`: writes src/data/builtinSnapshot.generated.ts, the
 * indexes and calibrations of the built-in tables computed ahead. Run it
 * after changing data/*.json or the way an index or calibration is built.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { builtinSnapshotText } from './builtinSnapshot.js';

const target = fileURLToPath(new URL('../../data/builtinSnapshot.generated.ts', import.meta.url));
writeFileSync(target, builtinSnapshotText());
process.stdout.write(`wrote ${target}\n`);
