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
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError, isIonheatError } from '../error.js';

/** What the hazards table says about one salt. */
export interface SaltHazards {
  /** Hazard classes, in the order of the schema's vocabulary, each once. */
  classes: HazardClass[];
  /** The table's plain-words statements, salt first, then its ions in formula order. */
  statements: string[];
  /** Source keys of the records used. */
  sources: string[];
}

interface HazardIndex {
  bySalt: ReadonlyMap<string, { classes: readonly HazardClass[]; statement: string; source: string }>;
  byIon: ReadonlyMap<string, { classes: readonly HazardClass[]; statement: string; source: string }>;
  order: ReadonlyMap<string, number>;
}

function hazardIndex(dataset: Dataset): HazardIndex {
  return dataset.memo('screen.hazardIndex', () => {
    const bySalt = new Map<string, { classes: readonly HazardClass[]; statement: string; source: string }>();
    const byIon = new Map<string, { classes: readonly HazardClass[]; statement: string; source: string }>();
    dataset.records('hazards.json').forEach((r, i) => {
      const entry = { classes: r.classes, statement: r.statement, source: r.source };
      if (r.subject.includes('[')) {
        byIon.set(r.subject, entry);
        return;
      }
      try {
        bySalt.set(parseSalt(r.subject, dataset).anhydrous, entry);
      } catch (e) {
        const why = isIonheatError(e) ? e.message : String(e);
        throw new IonheatError('INVALID_DATA', `${dataset.label} table hazards.json, record ${i + 1} ("${r.subject}"): ${why}`, { field: `hazards.json[${i}].subject` });
      }
    });
    const vocabulary: readonly HazardClass[] = ['restricted', 'explosive-precursor', 'oxidizer', 'carcinogen', 'toxic', 'corrosive', 'harmful', 'irritant', 'environmental'];
    return { bySalt, byIon, order: new Map(vocabulary.map((c, i) => [c, i])) };
  });
}

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
 * saltHazards(parseSalt('NH4NO3')).classes.includes('explosive-precursor'); // true
 * saltHazards(parseSalt('K2CrO4')).classes.includes('carcinogen'); // true (from the chromate ion's record)
 * saltHazards(parseSalt('KCl')).classes; // []
 * ```
 */
export function saltHazards(salt: Pick<Salt, 'anhydrous' | 'ions'>, dataset: Dataset = builtinDataset()): SaltHazards {
  const index = hazardIndex(dataset);
  const entries = [index.bySalt.get(salt.anhydrous), ...salt.ions.map((i) => index.byIon.get(i.ion))].filter((e) => e !== undefined);
  const classes = [...new Set(entries.flatMap((e) => e.classes))].sort((a, b) => (index.order.get(a) ?? 99) - (index.order.get(b) ?? 99));
  return { classes, statements: [...new Set(entries.map((e) => e.statement))], sources: [...new Set(entries.map((e) => e.source))].sort() };
}
