/**
 * The zod schema of a {@link Caution}, for the JSON Schema of the screen
 * output and for checking a caution read back from a file.
 *
 * @module
 */
import { z } from 'zod';
import { CAUTION_KINDS, CAUTION_SEVERITIES, type Caution } from './cautionTerms.js';

/** What a caution is about (see `CAUTION_KINDS`). */
export const cautionKindSchema = z.enum(CAUTION_KINDS);

/** How serious, most serious first (see `CAUTION_SEVERITIES`). */
export const cautionSeveritySchema = z.enum(CAUTION_SEVERITIES);

export const cautionSchema: z.ZodType<Caution> = z
  .strictObject({
    kind: cautionKindSchema,
    severity: cautionSeveritySchema,
    text: z.string().describe('the caution in plain words'),
  })
  .describe('one caution: what it is about, how serious, and the sentence for people');
