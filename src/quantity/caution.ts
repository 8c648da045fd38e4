/**
 * The one shape of a caution, in every result that carries one (pack, time
 * course, design margin, warmer, `dissolve`, screen rows): what it is about
 * (`kind`, from a closed list a program can switch on), how serious it is
 * (`severity`) and the sentence for people (`text`).
 *
 * The lists of kinds and severities are in `cautionTerms.ts` and the zod
 * schema in `cautionSchema.ts`, so that making a caution loads no zod.
 *
 * @module
 */
import { CAUTION_KINDS, CAUTION_SEVERITIES, type Caution, type CautionKind, type CautionSeverity } from './cautionTerms.js';
import { IonheatError } from '../error.js';
import { describeValue } from './argumentChecks.js';

export { CAUTION_KINDS, CAUTION_SEVERITIES, type Caution, type CautionKind, type CautionSeverity } from './cautionTerms.js';

/** One caution (internal: results build their cautions; callers read them). @internal */
export function caution(kind: CautionKind, severity: CautionSeverity, text: string): Caution {
  return { kind, severity, text };
}

/** Words that lead a caution in text output. */
const SEVERITY_WORD: Readonly<Record<CautionSeverity, string>> = { danger: 'DANGER', warning: 'Warning', notice: 'Note' };

/**
 * A caution as people read it in text output: its severity first, as a word (`DANGER`, `Warning`, `Note`), then
 * the text, so that the line says how serious it is without colour.
 *
 * @param c - a caution of any result (`{ kind, severity, text }`)
 * @returns one line of text (not wrapped)
 * @see DEVELOPERS.md, "Conventions" (results carry structured cautions; the CLI prints them with this line).
 *
 * @example
 * ```ts
 * const r = packFinalTemperature({ solids: [{ formula: 'CaCl2', massG: 30 }], waterG: 100, startC: 20 });
 * cautionLine(r.cautions[0]).startsWith('DANGER — Contact-burn risk'); // true
 * cautionLine({ kind: 'screening', severity: 'notice', text: 'Screening estimate.' }); // 'Note — Screening estimate.'
 * ```
 */
export function cautionLine(c: Caution): string {
  if (c === null || typeof c !== 'object' || !Object.hasOwn(SEVERITY_WORD, c.severity) || typeof c.text !== 'string') {
    throw new IonheatError('INVALID_ARGUMENT', `a caution is { kind, severity, text } with severity ${CAUTION_SEVERITIES.join(', ')}; got ${describeValue(c)}`, { field: 'caution' });
  }
  return `${SEVERITY_WORD[c.severity]} — ${c.text}`;
}

/** The most serious severity of a list, or undefined for none. @internal */
export function worstSeverity(list: readonly Caution[]): CautionSeverity | undefined {
  let worst: number | undefined;
  for (const c of list) {
    const at = CAUTION_SEVERITIES.indexOf(c.severity);
    if (worst === undefined || at < worst) worst = at;
  }
  return worst === undefined ? undefined : CAUTION_SEVERITIES[worst];
}
