/**
 * The words of a dissolve result that the command line and the workbench
 * page both show: the verdict in words and the heat per gram with the sign
 * read out. No Node built-in (the page bundles it).
 *
 * @module
 */
import { roundEstimate, type Estimate } from '../../quantity/estimate.js';
import { formatNumber } from '../../notation/minus.js';

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
