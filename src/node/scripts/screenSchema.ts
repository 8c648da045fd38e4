/**
 * Writes the JSON Schema of the screen output, generated from the zod
 * schemas, to docs/schema/screen-output.schema.json (shipped in the
 * package). Run with `npm run schema`; a test fails when the file is stale.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { screenOutputJsonSchema } from '../../screen/screenOutputJsonSchema.js';

const target = fileURLToPath(new URL('../../../docs/schema/screen-output.schema.json', import.meta.url));
writeFileSync(target, `${JSON.stringify(screenOutputJsonSchema(), null, 2)}\n`);
process.stdout.write(`wrote ${target}\n`);
