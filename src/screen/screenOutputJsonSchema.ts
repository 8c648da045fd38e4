/**
 * The JSON Schema of the screen's output, generated from its zod schemas.
 *
 * @module
 */
import { z } from 'zod';
import { screenDocumentSchema, screenRowSchema } from './screenRow.js';

/**
 * The JSON Schema (draft 2020-12) of the document that `ionheat screen
 * --format json` writes: the settings, one row per candidate and the
 * summary. Generated from the zod schemas of `screenRow.ts`; the package
 * ships it as `ionheat/screen-output.schema.json`. A row may carry further
 * fields of the `dissolve` result beyond those listed.
 *
 * @see JSON Schema Draft 2020-12, Wright, A.; Andrews, H.; Hutton, B.; Dennis, G. (json-schema.org, 2020); the
 *   generated copy is docs/schema/screen-output.schema.json (`npm run schema`).
 *
 * @example
 * ```ts
 * screenOutputJsonSchema().properties.rows.type; // 'array'
 * screenOutputJsonSchema().$schema; // 'https://json-schema.org/draft/2020-12/schema'
 * ```
 */
export function screenOutputJsonSchema(): Record<string, any> {
  const schema = z.toJSONSchema(screenDocumentSchema, { target: 'draft-2020-12' }) as Record<string, any>;
  return {
    $schema: schema.$schema,
    title: 'ionheat screen output',
    ...schema,
  };
}

/**
 * The JSON Schema of one row, with its top level closed, as the
 * specification language reads it: a spec may name only the fields listed
 * there, so a misspelt field is an error rather than a silent miss.
 */
export function screenSpecSchema(): Record<string, any> {
  const schema = z.toJSONSchema(screenRowSchema, { target: 'draft-2020-12' }) as Record<string, any>;
  return { ...schema, additionalProperties: false };
}
