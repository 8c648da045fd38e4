/**
 * Writes the JSON Schema of the screen output, generated from the zod
 * schemas, to docs/schema/screen-output.schema.json; the build copies it
 * into dist/ (tsup publicDir), and the package exports it as
 * `ionheat/screen-output.schema.json`. Run with `npm run schema`; a test
 * fails when the file is stale.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { screenOutputJsonSchema } from '../../screen/screenOutputJsonSchema.js';

const target = fileURLToPath(new URL('../../../docs/schema/screen-output.schema.json', import.meta.url));
writeFileSync(target, `${JSON.stringify(screenOutputJsonSchema(), null, 2)}\n`);
process.stdout.write(`wrote ${target}\n`);
