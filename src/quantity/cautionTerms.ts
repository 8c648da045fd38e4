/**
 * The closed vocabularies of a caution, without zod (the computations that make
 * cautions import these; the zod schema over them is in `cautionSchema.ts`).
 *
 * @module
 */

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
export const CAUTION_KINDS = [
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
] as const;
export type CautionKind = (typeof CAUTION_KINDS)[number];

/**
 * How serious, most serious first: `danger` (harm is likely as the result
 * stands: a burn, boiling, a toxic or carcinogenic salt), `warning` (harm is
 * possible, or the answer may not be the one asked for), `notice` (worth
 * knowing; no harm expected on its own).
 */
export const CAUTION_SEVERITIES = ['danger', 'warning', 'notice'] as const;
export type CautionSeverity = (typeof CAUTION_SEVERITIES)[number];

/** One caution: what it is about, how serious, and the sentence for people. */
export interface Caution {
  kind: CautionKind;
  severity: CautionSeverity;
  /** The caution in plain words. */
  text: string;
}
