/**
 * The closed vocabularies of the tables: structure types and hazard classes.
 * The schemas (schemas.ts) build their enums from these lists; the
 * computations check a name against them without loading zod.
 *
 * @module
 */

/** Structure types of crystals.json and madelung-constants.json. */
export const STRUCTURE_TYPES = [
  'rock-salt',
  'caesium-chloride',
  'zinc-blende',
  'wurtzite',
  'fluorite',
  'antifluorite',
  'rutile',
  'cadmium-iodide',
  'cadmium-chloride',
  'corundum',
  'perovskite',
] as const;

/** Hazard classes of hazards.json, in the order a summary lists them. */
export const HAZARD_CLASSES = [
  'oxidizer',
  'irritant',
  'corrosive',
  'toxic',
  'harmful',
  'environmental',
  'restricted',
  'explosive-precursor',
  'carcinogen',
] as const;

/** Whether `name` is one of `list` (a narrowing check for the vocabularies above). */
export function isTerm<T extends string>(list: readonly T[], name: unknown): name is T {
  return typeof name === 'string' && (list as readonly string[]).includes(name);
}
