import type { Dataset } from '../data/dataset.js';
import { saltArgument } from '../chem/saltArgument.js';
import { builtinDataset } from '../data/builtin.js';
import type { HazardClass } from '../data/schemas.js';
import { HAZARD_CLASSES } from '../data/tableTerms.js';
import type { Salt } from '../chem/salt.js';
import { hazardCoverage, saltHazards, type HazardCoverage } from '../solution/saltHazards.js';

/** The hazard classes and statements of a salt, as one screen row shows them. */
export interface HazardSummary {
  /** Every class of the salt's and its ions' records, each once, in the order of the schema's vocabulary. */
  classes: HazardClass[];
  /** The records' plain-words statements, the salt's own first. */
  statements: string[];
  /** Classified, checked and not classified, or no hazard data (an empty `classes` then means nothing is known). */
  data: HazardCoverage['status'];
}

/**
 * The hazards table's classes and statements for a salt, joined from the
 * records {@link saltHazards} finds (the salt's own, a hydrate sharing its
 * anhydrous salt's, and its ions'), and whether the table has data at all
 * (`data`): an empty list with `no hazard data` says nothing is known.
 *
 * @param salt - a parsed salt
 * @param dataset - the hazards table (default: built-in)
 * @returns the hazard classes and the statements, in the order of the records
 * @see the hazards table's sources: `clpAnnexVI`, `eu2019_1148`, `reachAnnexXIV`, `reachAnnexXVII`, `euMercury2017`,
 *   `supplierSds`.
 *
 * @example
 * ```ts
 * hazardSummary(parseSalt('NH4NO3')).classes.includes('explosive-precursor'); // true
 * hazardSummary(parseSalt('K2CrO4')).classes.includes('carcinogen'); // true (from the chromate ion's record)
 * hazardSummary(parseSalt('KCl')).classes; // []
 * hazardSummary(parseSalt('KCl')).data; // 'not classified'
 * hazardSummary(parseSalt('KNO3')).classes; // ['oxidizer', 'explosive-precursor']
 * ```
 */
export function hazardSummary(salt: Salt, dataset: Dataset = builtinDataset()): HazardSummary {
  const records = saltHazards(saltArgument(salt, dataset), dataset);
  const order: readonly string[] = HAZARD_CLASSES;
  const classes = [...new Set(records.flatMap((r) => r.classes))].sort((a, b) => order.indexOf(a) - order.indexOf(b));
  const coverage = hazardCoverage(salt, dataset);
  const statements = [...new Set(records.map((r) => r.statement))];
  if (coverage.status === 'no hazard data') statements.push(`no hazard data for ${coverage.missingIons.join(' and ')} in the hazards table: this is not a sign of safety; check the safety data sheet`);
  return { classes, statements, data: coverage.status };
}
