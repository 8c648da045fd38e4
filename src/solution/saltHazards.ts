/**
 * The chemical hazards the hazards table lists for a salt: its own entry
 * (a hydrate shares the entry of its anhydrous salt) and those of its ions.
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { HazardRecord } from '../data/schemas.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError, isIonheatError } from '../error.js';

/** An ion id such as `Ba[2+]`, as opposed to a salt formula. */
function isIonId(subject: string): boolean {
  return /\[(?:0|[1-9]?[+-])\]$/.test(subject);
}

interface HazardIndex {
  bySalt: ReadonlyMap<string, HazardRecord>;
  byIon: ReadonlyMap<string, HazardRecord>;
}

function buildIndex(dataset: Dataset): HazardIndex {
  const bySalt = new Map<string, HazardRecord>();
  const byIon = new Map<string, HazardRecord>();
  for (const record of dataset.records('hazards.json')) {
    if (isIonId(record.subject)) {
      byIon.set(record.subject, record);
      continue;
    }
    try {
      bySalt.set(parseSalt(record.subject, dataset).anhydrous, record);
    } catch (e) {
      const why = isIonheatError(e) ? e.message : String(e);
      throw new IonheatError('INVALID_DATA', `${dataset.label} table hazards.json ("${record.subject}"): ${why}`, { field: 'hazards.json.subject' });
    }
  }
  return { bySalt, byIon };
}

/**
 * The hazard records that apply to a salt: the record of the salt itself
 * (anhydrous formula, so `CuSO4·5H2O` finds `CuSO4`), then any record of one
 * of its ions not already covered. Empty when the table lists nothing.
 *
 * @param salt - formula or parsed salt
 * @param dataset - the hazards table (default: built-in)
 * @see each record's own source: the CLP Regulation's Annex VI, `clpAnnexVI`; the explosives-precursors Regulation,
 *   `eu2019_1148`; REACH Annexes XIV and XVII, `reachAnnexXIV`, `reachAnnexXVII`; the mercury Regulation,
 *   `euMercury2017`; supplier safety data sheets, `supplierSds`.
 *
 * @example
 * ```ts
 * saltHazards('NH4NO3')[0]?.classes.includes('explosive-precursor'); // true
 * saltHazards('NaCl').length; // 0 (checked: neither ion adds a class; see hazardCoverage)
 * saltHazards('NH4NO3')[0]?.source; // 'eu2019_1148'
 * ```
 */
export function saltHazards(salt: string | Salt, dataset: Dataset = builtinDataset()): HazardRecord[] {
  const s = saltArgument(salt, dataset);
  const index = dataset.memo('pack.hazardIndex', () => buildIndex(dataset));
  const found: HazardRecord[] = [];
  const own = index.bySalt.get(s.anhydrous);
  // A record without classes says "checked: nothing of its own"; it is coverage (hazardCoverage), not a hazard.
  if (own && own.classes.length > 0) found.push(own);
  for (const ion of s.ions) {
    const record = index.byIon.get(ion.ion);
    // With a record of its own, the salt's ions add only what that record does not already say.
    if (!record || record.classes.length === 0 || found.includes(record)) continue;
    if (own && own.classes.length > 0 && record.classes.every((c) => own.classes.includes(c))) continue;
    found.push(record);
  }
  return found;
}

/** What the hazards table knows of a salt. */
export interface HazardCoverage {
  /**
   * `classified`: at least one hazard class applies; `not classified`: the salt, or every one of its ions, has a
   * record and none gives a class; `no hazard data`: neither, so nothing can be said (never read it as harmless).
   */
  status: 'classified' | 'not classified' | 'no hazard data';
  /** Ion ids without a record, when the salt has no record of its own. */
  missingIons: string[];
}

/**
 * Whether the hazards table classifies a salt, checked it and found no class, or has no data for it.
 *
 * @param salt - a formula or a parsed salt
 * @param dataset - the hazards table (default: built-in)
 * @see the hazards table and its sources (`clpAnnexVI`, `supplierSds`, `commonPractice` …); DEVELOPERS.md, "Data tables".
 *
 * @example
 * ```ts
 * hazardCoverage('NH4NO3').status; // 'classified'
 * hazardCoverage('NaCl').status; // 'not classified' (both ions checked, neither adds a class)
 * hazardCoverage('LiBr').status; // 'classified' (lithium)
 * ```
 */
export function hazardCoverage(salt: string | Salt, dataset: Dataset = builtinDataset()): HazardCoverage {
  const s = saltArgument(salt, dataset);
  const index = dataset.memo('pack.hazardIndex', () => buildIndex(dataset));
  const own = index.bySalt.get(s.anhydrous);
  const missingIons = own ? [] : s.ions.filter((i) => !index.byIon.has(i.ion)).map((i) => i.ion);
  if (saltHazards(s, dataset).length > 0) return { status: 'classified', missingIons };
  return { status: own || missingIons.length === 0 ? 'not classified' : 'no hazard data', missingIons };
}
