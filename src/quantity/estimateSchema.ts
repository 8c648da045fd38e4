/**
 * The zod schema of an {@link Estimate}, for what reads a user's file, a
 * specification or the JSON Schema of the screen output. The computations
 * import only its types and {@link basisOrder} (estimate.ts), so that zod is
 * not loaded at start-up.
 *
 * @module
 */
import { z } from 'zod';
import { basisOrder } from './basisOrder.js';

/**
 * How much an estimate can be trusted, most trusted first:
 * `measured` (a tabulated measurement), `cycle` (closed from tabulated
 * formation enthalpies), `anchored` (a model difference added to measured
 * values of related salts), `model` (an estimator alone).
 */
export const basisSchema = z.enum(basisOrder);
export type Basis = z.infer<typeof basisSchema>;

export const estimateSchema = z.strictObject({
  /** What is estimated, in words: `lattice enthalpy`, `enthalpy of solution`. */
  quantity: z.string(),
  value: z.number(),
  /** Standard uncertainty (one standard deviation), same unit as `value`. */
  u: z.number().nonnegative(),
  /** Lower end of the 95 % interval. */
  low: z.number(),
  /** Upper end of the 95 % interval. */
  high: z.number(),
  unit: z.string(),
  basis: basisSchema,
  /** Machine-readable method name, e.g. `kapustinskii`, `born-haber`, `anchored`. */
  method: z.string(),
  /** Source keys of `data/sources.json` behind the number. */
  sources: z.array(z.string()),
  /** Flags and caveats a reader should see beside the number. */
  notes: z.array(z.string()),
});
export type Estimate = z.infer<typeof estimateSchema>;
