/**
 * The cautions a salt's chemical hazards call for, from the hazards table:
 * one per record that gives a class (with its source), one more where the
 * salt's sale or supply is restricted, and where the table gives no class,
 * whether it checked the salt or knows nothing of it.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { HazardClass } from '../data/schemas.js';
import type { Salt } from '../chem/salt.js';
import { caution, type Caution, type CautionSeverity } from '../quantity/caution.js';
import { hazardCoverage, saltHazards } from './saltHazards.js';

/** Classes whose harm is severe without any misuse: a `danger`; every other class is a `warning`. */
const DANGER_CLASSES: ReadonlySet<HazardClass> = new Set(['toxic', 'carcinogen']);
/** Classes under which sale or supply is restricted or reportable in some jurisdictions. */
const RESTRICTED_CLASSES: ReadonlySet<HazardClass> = new Set(['restricted', 'explosive-precursor']);

/** The head of a citation, for a bracket after a caution. */
function shortCitation(citation: string | undefined): string | undefined {
  if (!citation) return undefined;
  const cut = citation.search(/[.:;]\s/);
  const head = cut > 0 ? citation.slice(0, cut) : citation;
  return head.length > 100 ? `${head.slice(0, 99)}…` : head;
}

/**
 * The hazard cautions of one salt, each naming its source: a `hazard-class`
 * caution per record (`danger` for toxic or carcinogenic, else `warning`), a
 * `restricted-salt` warning where a class restricts sale or supply, and,
 * where nothing applies, a `no-hazard-data` warning (the table knows nothing
 * of an ion: never read as safe) or a `no-hazard-class` notice.
 * @internal
 */
export function hazardCautions(salt: Salt, dataset: Dataset): Caution[] {
  const hazards = saltHazards(salt, dataset);
  if (hazards.length === 0) {
    const coverage = hazardCoverage(salt, dataset);
    return [
      coverage.status === 'no hazard data'
        ? caution('no-hazard-data', 'warning', `${salt.formula}: no hazard data in the ionheat hazards table (nothing for ${coverage.missingIons.join(' or ')}), which is not a sign of safety; read the safety data sheet of the material actually used.`)
        : caution('no-hazard-class', 'notice', `${salt.formula}: no hazard class in the ionheat hazards table (its ions add none of their own); the safety data sheet of the material actually used still decides.`),
    ];
  }
  const out: Caution[] = [];
  let restricted = false;
  for (const h of hazards) {
    const cited = shortCitation(dataset.source(h.source)?.citation) ?? h.source;
    const severity: CautionSeverity = h.classes.some((c) => DANGER_CLASSES.has(c)) ? 'danger' : 'warning';
    out.push(caution('hazard-class', severity, `${salt.formula} (${h.classes.join(', ')}): ${h.statement} [${h.source}: ${cited}${h.fromMemory ? '; classification from memory' : ''}]`));
    restricted ||= h.classes.some((c) => RESTRICTED_CLASSES.has(c));
  }
  if (restricted) out.push(caution('restricted-salt', 'warning', `${salt.formula}: its sale or supply is restricted or must be reported in some jurisdictions; check the local rules before choosing it.`));
  return out;
}
