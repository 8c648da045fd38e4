/**
 * The shape of what a screen returns, as zod schemas: one row per candidate,
 * the summary of a run, and the JSON document the command writes. The JSON
 * Schema shipped with the package is generated from these
 * ({@link screenOutputJsonSchema}).
 *
 * @module
 */
import { z } from 'zod';
import { errorCodes } from '../error.js';
import { estimateSchema } from '../quantity/estimateSchema.js';
import { saltSchema } from '../chem/saltSchema.js';
import { hazardClassSchema } from '../data/schemas.js';
import { candidateInputSchema } from './candidate.js';
import { cautionSchema } from '../quantity/cautionSchema.js';

/** Which way the pack should go: `cool` wants an endothermic salt, `heat` an exothermic one. */
export const directionSchema = z.enum(['cool', 'heat']);
export type Direction = z.infer<typeof directionSchema>;

/**
 * What a screen ranks by: `enthalpy` (ΔsolH, kJ/mol), `heat-per-gram` (J per
 * gram of salt), `fill-temperature` (°C reached by the standard fill),
 * `cost-per-kj` (price per kJ of heat in the chosen direction), or, for
 * latent-heat warmers (the standard warmer: 100 g of hydrate triggered at
 * 20 °C), `plateau-temperature` (°C), `warmer-heat-per-gram` (J per gram of
 * fill) and `plateau-duration` (s).
 */
export const objectiveNameSchema = z.enum(['enthalpy', 'heat-per-gram', 'fill-temperature', 'cost-per-kj', 'plateau-temperature', 'warmer-heat-per-gram', 'plateau-duration']);
export type ObjectiveName = z.infer<typeof objectiveNameSchema>;

/** Whether a salt works in the chosen direction: from its verdict; `undetermined` when the 95 % interval of ΔsolH spans zero. */
export const suitabilitySchema = z.enum(['suitable', 'undetermined', 'unsuitable']);
export type Suitability = z.infer<typeof suitabilitySchema>;

/** A standard fill: grams of salt and of water, and the start temperature. */
export const fillSpecSchema = z.strictObject({
  saltMassG: z.number().describe('grams of salt as loaded'),
  waterMassG: z.number().describe('grams of water'),
  startC: z.number().describe('start temperature of salt and water, °C'),
});
export type FillSpec = z.infer<typeof fillSpecSchema>;

export const rowErrorSchema = z.strictObject({
  code: z.enum(errorCodes),
  message: z.string(),
  text: z.string().optional(),
  position: z.number().int().optional(),
  field: z.string().optional(),
});

/** What the pack model says about the standard fill ({@link packFinalTemperature}); further fields of its result are kept as they come. */
export const fillResultSchema = z
  .looseObject({
    finalTemperature: estimateSchema.describe('temperature the fill reaches, °C, with its 95 % interval'),
    temperatureChange: z.number().describe('final minus start temperature, K'),
    dissolved: z
      .array(z.looseObject({ formula: z.string(), loadedMass: z.number(), dissolvedMass: z.number(), undissolvedMass: z.number(), saturated: z.boolean() }))
      .describe('grams loaded, dissolved and left undissolved, per solid'),
    heat: z.looseObject({ unit: z.literal('kJ'), absorbed: z.number() }).describe('heat absorbed by dissolution, kJ (negative = released)'),
    clamp: z.looseObject({ kind: z.enum(['freezing', 'eutectic', 'boiling']), temperature: z.number(), message: z.string() }).nullable(),
    cautions: z.array(cautionSchema).describe('burn, cold-injury, boiling, undissolved-salt and chemical cautions for the fill'),
    notes: z.array(z.string()),
  })
  .describe('the pack model result for the standard fill');

/** What the warmer model says about the standard warmer ({@link latentWarmer}: 100 g of hydrate triggered at 20 °C). */
export const warmerRowSchema = z
  .looseObject({
    plateau: estimateSchema.describe('temperature right after triggering, °C, with its 95 % interval'),
    crystallisedAtPlateau: estimateSchema.describe('fraction of the hydrate crystallised at once, 0–1'),
    heatReleased: estimateSchema.describe('heat released back to the start temperature, kJ'),
    heatPerGram: estimateSchema.describe('heat released per gram of fill, J/g'),
    plateauDuration: estimateSchema.describe('time on the plateau against the assumed heat loss, s'),
    rechargeTemperature: estimateSchema.nullable().describe('temperature at which the fill is all liquid again, °C; null when heating in water cannot melt it all'),
    cautions: z.array(cautionSchema).describe('burn, recharge and chemical cautions for the warmer'),
    notes: z.array(z.string()),
  })
  .describe('the latent-heat warmer of the standard warmer fill');

/** Whether the specification holds for a row, and if not, why. */
export const specOutcomeSchema = z.strictObject({
  holds: z.boolean(),
  reason: z.string().optional().describe('why the spec does not hold, in words'),
});
export type SpecOutcome = z.infer<typeof specOutcomeSchema>;

/**
 * One output row: the candidate as given, its line in the input, and either
 * the results (the fields of the `dissolve` result, the standard fill, the
 * objective) or the error that stopped it.
 */
export const screenRowSchema = z
  .looseObject({
    line: z.number().int().min(1).describe('line of the input where the candidate starts (for a generated list, its position)'),
    status: z.enum(['computed', 'failed', 'excluded']).describe('computed; failed (see error); or excluded by a filter (see excludedBy)'),
    input: candidateInputSchema.describe('the candidate as given'),
    error: rowErrorSchema.optional().describe('why the row could not be computed'),
    excludedBy: z.string().optional().describe('the filter that left the row out'),
    duplicateOf: z.number().int().min(1).optional().describe('line of an earlier row with the same candidate'),
    formula: z.string().optional().describe('canonical formula'),
    salt: saltSchema.optional(),
    best: estimateSchema.optional().describe('enthalpy of solution on the most trusted basis, kJ/mol, positive = endothermic'),
    estimates: z.array(estimateSchema).optional().describe('every estimate of the enthalpy of solution, most trusted basis first'),
    verdict: z.enum(['endothermic', 'exothermic', 'undetermined']).optional(),
    probabilityEndothermic: z.number().min(0).max(1).optional(),
    perGram: z
      .looseObject({ salt: estimateSchema, saturatedFill: estimateSchema.optional() })
      .optional()
      .describe('heat absorbed per gram of salt, and of a fill saturated at 25 °C where solubility data exist, J/g, positive = cools'),
    hydration: z.looseObject({ absolute: estimateSchema.optional(), conventional: estimateSchema.optional() }).optional().describe('hydration enthalpy of the ions, Σν·ΔhydH°, kJ/mol, on both scales'),
    temperature: z.looseObject({ celsius: z.number(), heatCapacityOfSolution: estimateSchema.optional() }).optional().describe('the temperature the values refer to, °C, and ΔsolCp° where tabulated'),
    notes: z.array(z.string()).optional(),
    hazards: z.array(hazardClassSchema).optional().describe('hazard classes of the salt and its ions from the hazards table'),
    cautions: z
      .array(cautionSchema)
      .optional()
      .describe('what to take care of with this salt: a suspected typo, a hypothetical hydrate, the hazards of the salt and its ions (from the hazards table), the screening line'),
    hazardData: z
      .enum(['classified', 'not classified', 'no hazard data'])
      .optional()
      .describe('whether the hazards table classifies the salt, checked it and found no class, or has no data (then an empty hazards list says nothing)'),
    fill: fillResultSchema.optional(),
    warmer: warmerRowSchema.optional(),
    suitability: suitabilitySchema.optional(),
    suspectedTypo: z
      .strictObject({ suggestion: z.string(), message: z.string() })
      .optional()
      .describe('the formula reads through a likely slip (a digit 0 for O, 1 for l…) and one slip away is another measured salt; the row is ranked as undetermined until you confirm'),
    objective: estimateSchema.optional().describe('the value the screen ranks by'),
    costPerKJ: estimateSchema.optional().describe('price per kJ of heat in the chosen direction, where a price is given'),
    rank: z.number().int().min(1).optional().describe('place in the ranking (1 = best); absent in streamed output'),
    spec: specOutcomeSchema.optional(),
  })
  .describe('one candidate of a screen');
export type ScreenRow = z.infer<typeof screenRowSchema>;

/** The counts of a run: nothing is dropped without being counted. */
export const screenSummarySchema = z.strictObject({
  read: z.number().int().min(0).describe('candidate rows read'),
  computed: z.number().int().min(0),
  failed: z.number().int().min(0),
  excluded: z.number().int().min(0),
  blankLines: z.number().int().min(0).describe('blank input lines skipped (not rows)'),
  specHeld: z.number().int().min(0),
  specFailed: z.number().int().min(0),
});
export type ScreenSummary = z.infer<typeof screenSummarySchema>;

/** The settings a screen ran with. */
export const screenSettingsSchema = z.strictObject({
  objective: objectiveNameSchema,
  direction: directionSchema,
  fill: fillSpecSchema.nullable(),
  spec: z.string().nullable(),
  excludeMeasured: z.boolean(),
});
export type ScreenSettings = z.infer<typeof screenSettingsSchema>;

/** The JSON document of `ionheat screen --format json`. */
export const screenDocumentSchema = z
  .strictObject({
    version: z.literal(1),
    settings: screenSettingsSchema,
    rows: z.array(screenRowSchema),
    summary: screenSummarySchema,
  })
  .describe('the output of an ionheat screen');
export type ScreenDocument = z.infer<typeof screenDocumentSchema>;
