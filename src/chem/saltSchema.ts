/**
 * The zod schema of a {@link Salt}, for the JSON Schema of the screen output.
 * The computations import only its types (salt.ts), so that zod is not
 * loaded at start-up.
 *
 * @module
 */
import { z } from 'zod';

export const saltIonSchema = z.strictObject({
  /** Ion id of the table, e.g. `Ca[2+]`. */
  ion: z.string(),
  /** The ion's formula as written in salts, e.g. `NO3`. */
  formula: z.string(),
  charge: z.number().int(),
  /** Ions of this kind per formula unit. */
  count: z.number().int().positive(),
});
export type SaltIon = z.infer<typeof saltIonSchema>;

export const saltSchema = z.strictObject({
  /** Canonical formula: cations then anions, in table order; hydrate water after `·`. */
  formula: z.string(),
  /** The formula without its water of crystallization. */
  anhydrous: z.string(),
  /** `ionic` for a salt; `non-electrolyte` for a molecular solute such as urea. */
  kind: z.enum(['ionic', 'non-electrolyte']),
  /** Cations first, then anions (a non-electrolyte has its one molecule here, charge 0). */
  ions: z.array(saltIonSchema),
  /** Moles of water of crystallization per formula unit. */
  water: z.number().nonnegative(),
  /** Element counts of the whole formula unit, water included, symbols in alphabetical order. */
  composition: z.record(z.string(), z.number()),
  /** Molar mass of the formula unit as written (hydrate water included), g/mol. */
  molarMass: z.number().positive(),
});
export type Salt = z.infer<typeof saltSchema>;
