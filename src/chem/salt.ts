/**
 * The salt model: what a written formula means once it has been decomposed
 * into the ions of the table.
 *
 * @module
 */
import { isIssuedSalt } from './issuedSalts.js';
import { z } from 'zod';
import { IonheatError } from '../error.js';

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

/** What the structural functions read of a salt: its ions (formula, charge, count) and its water. Extra keys are allowed. */
const saltShapeSchema = z.object({
  ions: z.array(z.object({ formula: z.string(), charge: z.number().int().min(-12).max(12), count: z.number().int().positive().max(1_000_000) })),
  water: z.number().nonnegative().max(1_000_000),
});

/**
 * Checks that `salt` has the ions and water a {@link Salt} has, else an
 * `INVALID_ARGUMENT` error naming the field.
 * @internal
 */
export function checkSaltShape(salt: unknown, field = 'salt'): void {
  if (isIssuedSalt(salt)) return;
  const parsed = saltShapeSchema.safeParse(salt);
  if (parsed.success) return;
  const issue = parsed.error.issues[0]!;
  const at = [field, ...issue.path].join('.');
  throw new IonheatError('INVALID_ARGUMENT', `${field} must be a salt from parseSalt: ${at} ${issue.message.toLowerCase()}`, { field: at });
}

/**
 * The charge type |z₊|:|z₋| of a salt with one kind of cation and one kind of
 * anion: `1:1` (NaCl), `2:1` (CaCl2), `1:2` (Na2SO4). Undefined for a double
 * salt or a non-electrolyte.
 *
 * @param salt - a parsed salt ({@link parseSalt})
 * @see The charge-type classes of electrolytes used throughout Parker (1965), source key `parker1965`.
 *
 * @example
 * ```ts
 * chargeType(parseSalt('CaCl2')); // '2:1'
 * chargeType(parseSalt('Na2SO4')); // '1:2'
 * chargeType(parseSalt('KAl(SO4)2·12H2O')); // undefined
 * ```
 */
export function chargeType(salt: Salt): string | undefined {
  checkSaltShape(salt);
  const cations = salt.ions.filter((i) => i.charge > 0);
  const anions = salt.ions.filter((i) => i.charge < 0);
  if (cations.length !== 1 || anions.length !== 1) return undefined;
  return `${cations[0]!.charge}:${-anions[0]!.charge}`;
}

/**
 * Total number of ions per formula unit, ν = Σᵢ νᵢ, of the dissolution
 * reaction MₐXᵦ(s) → a M(aq) + b X(aq); water of crystallization excluded.
 * ν is the prefactor of the Kapustinskii equation.
 *
 * @param salt - a parsed salt ({@link parseSalt})
 * @see Kapustinskii (1956), source key `kapustinskii1956`, for ν as the number of ions per formula unit.
 *
 * @example
 * ```ts
 * ionsPerFormulaUnit(parseSalt('CaCl2·6H2O')); // 3
 * ionsPerFormulaUnit(parseSalt('KAl(SO4)2·12H2O')); // 4
 * ```
 */
export function ionsPerFormulaUnit(salt: Salt): number {
  checkSaltShape(salt);
  return salt.ions.reduce((n, i) => n + i.count, 0);
}
