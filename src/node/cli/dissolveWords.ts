/**
 * The words of a dissolve result that the command line and the workbench
 * page both show: the verdict in words, the heat per gram with the sign
 * read out, and the cautions. No Node built-in (the page bundles it).
 *
 * @module
 */
import type { Dataset } from '../../data/dataset.js';
import type { Salt } from '../../chem/salt.js';
import { roundEstimate, type Estimate } from '../../quantity/estimate.js';
import { hazardCoverage, saltHazards } from '../../solution/saltHazards.js';
import { formatNumber } from '../../notation/minus.js';

/** The caution every dissolve result carries (common practice). */
export const GENERAL_CAUTION =
  'Screening estimate. A dissolving salt can scald or freeze skin, and some salts are oxidisers, toxic or restricted: follow the safety data sheet, local codes, product-safety regulation and licensed practice.';

/** Hazard statements of the salt (a hydrate shares its anhydrous salt's) and of its ions, from hazards.json. */
export function cautionsFor(salt: Salt, dataset: Dataset): string[] {
  const found = saltHazards(salt, dataset).map((h) => `${h.subject} (${h.classes.join(', ')}): ${h.statement}`);
  const coverage = hazardCoverage(salt, dataset);
  if (coverage.status === 'no hazard data') found.push(`No hazard data: the hazards table has no record for ${coverage.missingIons.join(' or ')}, which is not a sign of safety; check the safety data sheet.`);
  return found;
}

/** The verdict in words. */
export const VERDICT_WORDS = { endothermic: 'endothermic — dissolving absorbs heat (cools)', exothermic: 'exothermic — dissolving releases heat (heats)', undetermined: 'undetermined — the 95 % interval spans zero' } as const;

/**
 * Heat per gram in words that follow the sign, so that the number after them is always positive: heat absorbed
 * (cools) or released (heats); the direction in brackets only where the whole 95 % interval has one sign.
 */
export function perGramWords(e: Estimate, what: string): { lead: string; magnitude: string; u: string; tail: string } {
  const g = roundEstimate(e);
  const released = g.value < 0;
  return { lead: `Heat ${released ? 'released' : 'absorbed'} per gram of ${what}`, magnitude: formatNumber(Math.abs(g.value)), u: String(g.u), tail: g.high < 0 ? ' (heats)' : g.low > 0 ? ' (cools)' : '' };
}

/** `Heat absorbed per gram of salt: 345.7 ± 1.2 J/g (cools)`. */
export function perGramText(e: Estimate, what: string): string {
  const w = perGramWords(e, what);
  return `${w.lead}: ${w.magnitude} ± ${w.u} J/g${w.tail}`;
}
