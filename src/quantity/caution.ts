/**
 * The one shape of a caution, in every result that carries one (pack, time
 * course, design margin, warmer, `dissolve`, screen rows): what it is about
 * (`kind`, from a closed list a program can switch on), how serious it is
 * (`severity`) and the sentence for people (`text`).
 *
 * @module
 */
import { z } from 'zod';
import { IonheatError } from '../error.js';
import { describeValue } from './argumentChecks.js';

/**
 * What a caution is about:
 * `contact-burn` (a hot fill or plateau above the long-contact burn threshold),
 * `warm-contact` (warm, below it, but long contact still harms some people),
 * `cold-injury` (a cold fill; frostbite where it reaches 0 °C or below),
 * `boiling` (the fill would boil),
 * `hazard-class` (a class of the hazards table for the salt or one of its ions),
 * `restricted-salt` (sale or supply restricted or reportable somewhere),
 * `no-hazard-data` (the hazards table knows nothing of an ion: not a sign of safety),
 * `no-hazard-class` (checked, no class: the safety data sheet still decides),
 * `undissolved-salt` (part of the salt stays solid at the final temperature),
 * `suspected-typo` (the formula reads through a likely slip; another salt was probably meant),
 * `data-quality` (the numbers describe no real solid, or rest on shaky data),
 * `design-margin` (a designed fill whose 95 % interval crosses a skin threshold),
 * `recharge` (recharging a warmer: hot water, burst pouches, heat lost over cycles),
 * `screening` (the closing reminder that these are screening estimates).
 */
export const cautionKindSchema = z.enum([
  'contact-burn',
  'warm-contact',
  'cold-injury',
  'boiling',
  'hazard-class',
  'restricted-salt',
  'no-hazard-data',
  'no-hazard-class',
  'undissolved-salt',
  'suspected-typo',
  'data-quality',
  'design-margin',
  'recharge',
  'screening',
]);
export type CautionKind = z.infer<typeof cautionKindSchema>;

/**
 * How serious, most serious first: `danger` (harm is likely as the result
 * stands: a burn, boiling, a toxic or carcinogenic salt), `warning` (harm is
 * possible, or the answer may not be the one asked for), `notice` (worth
 * knowing; no harm expected on its own).
 */
export const cautionSeveritySchema = z.enum(['danger', 'warning', 'notice']);
export type CautionSeverity = z.infer<typeof cautionSeveritySchema>;

export const cautionSchema = z
  .strictObject({
    kind: cautionKindSchema,
    severity: cautionSeveritySchema,
    text: z.string().describe('the caution in plain words'),
  })
  .describe('one caution: what it is about, how serious, and the sentence for people');
export type Caution = z.infer<typeof cautionSchema>;

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
    throw new IonheatError('INVALID_ARGUMENT', `a caution is { kind, severity, text } with severity ${cautionSeveritySchema.options.join(', ')}; got ${describeValue(c)}`, { field: 'caution' });
  }
  return `${SEVERITY_WORD[c.severity]} — ${c.text}`;
}

/** The most serious severity of a list, or undefined for none. @internal */
export function worstSeverity(list: readonly Caution[]): CautionSeverity | undefined {
  let worst: number | undefined;
  for (const c of list) {
    const at = cautionSeveritySchema.options.indexOf(c.severity);
    if (worst === undefined || at < worst) worst = at;
  }
  return worst === undefined ? undefined : cautionSeveritySchema.options[worst];
}
