/**
 * Which hydrates of a salt are known: those some table names (formation and
 * solution enthalpies, crystal structures, heat capacities, and the solid
 * phases of the solubility curves). A hydrate none of them names, and above
 * all one with more waters than any known hydrate of its salt, is
 * hypothetical: the difference rule would still give it a number, but the
 * number describes no solid anyone has made.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { saltRecordIndex, WATER, type SaltTable } from '../chem/saltRecords.js';
import { isIonheatError } from '../error.js';

const FORMULA_TABLES: readonly SaltTable[] = ['compound-formation.json', 'solution-enthalpies.json', 'crystals.json', 'heat-capacities.json', 'solubility.json'];

/** Why a hydrate is flagged. */
export type HypotheticalReason = 'more waters than any known hydrate' | 'a hydrate no table lists';

export interface HypotheticalHydrate {
  /** Waters of crystallization of the forms of the salt that the tables know (0 for the anhydrous salt), fewest first. */
  knownWaters: number[];
  reason: HypotheticalReason;
}

/** Anhydrous formula → waters of every form the tables name, built once per dataset. */
export function knownSaltForms(dataset: Dataset): ReadonlyMap<string, ReadonlySet<number>> {
  return dataset.memo('solution.knownSaltForms', () => {
    const out = new Map<string, Set<number>>();
    const add = (salt: Salt): void => {
      const set = out.get(salt.anhydrous) ?? new Set<number>();
      set.add(salt.water);
      out.set(salt.anhydrous, set);
    };
    const tryAdd = (formula: string): void => {
      if (formula === WATER) return;
      try {
        add(parseSalt(formula, dataset));
      } catch (e) {
        if (!isIonheatError(e)) throw e;
      }
    };
    for (const table of FORMULA_TABLES) for (const formula of saltRecordIndex(table, dataset).keys()) tryAdd(formula);
    for (const record of dataset.records('solubility.json')) {
      if (record.solidPhase) tryAdd(record.solidPhase);
      for (const point of record.points) if (point.solidPhase) tryAdd(point.solidPhase);
    }
    return out;
  });
}

/**
 * Whether a hydrate is hypothetical, and why: undefined for an anhydrous
 * salt or a hydrate a table names; otherwise the known forms of the salt and
 * the reason (more waters than any of them, or simply unlisted).
 *
 * @param salt - a parsed salt
 * @param dataset - the formula-keyed tables
 */
export function hypotheticalHydrate(salt: Salt, dataset: Dataset): HypotheticalHydrate | undefined {
  if (salt.kind !== 'ionic' || salt.water === 0) return undefined;
  const known = knownSaltForms(dataset).get(salt.anhydrous);
  if (known?.has(salt.water)) return undefined;
  const knownWaters = [...(known ?? [])].sort((a, b) => a - b);
  const most = knownWaters.length > 0 ? knownWaters[knownWaters.length - 1]! : 0;
  return { knownWaters, reason: salt.water > most ? 'more waters than any known hydrate' : 'a hydrate no table lists' };
}
