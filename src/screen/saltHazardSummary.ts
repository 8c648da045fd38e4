/**
 * The hazard classes and cautions that the hazards table gives for a salt:
 * those of the salt itself (a hydrate shares the entry of its anhydrous
 * salt) and those of each of its ions (every chromate, every soluble barium
 * salt).
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { HazardClass } from '../data/schemas.js';
import type { Salt } from '../chem/salt.js';
import { saltHazards } from '../pack/saltHazards.js';

/** What the hazards table says about one salt. */
export interface SaltHazards {
  /** Hazard classes, in the order of the schema's vocabulary, each once. */
  classes: HazardClass[];
  /** The table's plain-words statements, salt first, then its ions in formula order. */
  statements: string[];
  /** Source keys of the records used. */
  sources: string[];
}

/** The order classes are listed in: the gravest first. */
const CLASS_ORDER: readonly HazardClass[] = ['restricted', 'explosive-precursor', 'oxidizer', 'carcinogen', 'toxic', 'corrosive', 'harmful', 'irritant', 'environmental'];

/**
 * The hazard classes and statements of a salt from the hazards table: the
 * record of the salt (hydrates share their anhydrous salt's record) together
 * with the records of its ions. An empty list means the table names no
 * hazard, not that the salt is harmless: the safety data sheet of the
 * material actually used takes precedence.
 *
 * @param salt - a parsed salt
 * @example
 * ```ts
 * saltHazardSummary(parseSalt('NH4NO3')).classes.includes('explosive-precursor'); // true
 * saltHazardSummary(parseSalt('K2CrO4')).classes.includes('carcinogen'); // true (from the chromate ion's record)
 * saltHazardSummary(parseSalt('KCl')).classes; // []
 * ```
 */
export function saltHazardSummary(salt: Salt, dataset: Dataset = builtinDataset()): SaltHazards {
  const entries = saltHazards(salt, dataset);
  const rank = (c: HazardClass) => CLASS_ORDER.indexOf(c);
  const classes = [...new Set(entries.flatMap((e) => e.classes))].sort((a, b) => rank(a) - rank(b));
  return { classes, statements: [...new Set(entries.map((e) => e.statement))], sources: [...new Set(entries.map((e) => e.source))].sort() };
}
