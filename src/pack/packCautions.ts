/**
 * The cautions every pack result carries: contact burns from hot fills, cold
 * injury from cold ones, boiling, the chemical hazards of the salts, and the
 * closing reminder that these are screening estimates.
 *
 * @module
 */
import { describeValue, numberArgument } from '../quantity/argumentChecks.js';
import { saltArgument } from '../chem/saltArgument.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { IonheatError } from '../error.js';
import type { Salt } from '../chem/salt.js';
import { hazardCautions } from '../solution/hazardCautions.js';
import { caution, type Caution } from '../quantity/caution.js';

/**
 * Skin-contact temperature above which a burn becomes possible when contact
 * lasts a long time (tens of minutes to hours), °C: about 44 °C after
 * ISO 13732-1:2006, whose burn thresholds fall as the contact time grows
 * (from memory; not checked against a copy of the standard).
 */
export const CONTACT_BURN_THRESHOLD_C = 44;

/** Change of temperature below which a fill counts as neither hot nor cold, K. */
const NEUTRAL_BAND_K = 0.5;

/** The closing line of every caution list. */
export const SCREENING_LINE =
  'These are screening estimates from tabulated data; they do not replace testing of the real product and defer to local codes, product-safety regulation and licensed practice.';

/** What the cautions are about. */
export interface CautionInput {
  /** Start temperature, °C. */
  startC: number;
  /** Final temperature and its 95 % interval, °C. */
  final: { value: number; low: number; high: number };
  /** Set when the balance was cut short by freezing, a eutectic or boiling. */
  clamp?: 'freezing' | 'eutectic' | 'boiling' | undefined;
  /** The solids of the fill. */
  salts: readonly Salt[];
  /** From a time course, when one was run: seconds the pack spends above the burn threshold. */
  secondsAboveBurnThreshold?: number;
  /** Solids left undissolved at the final temperature, g, by formula (from the pack result's `dissolved`). */
  undissolved?: readonly { formula: string; undissolvedMass: number }[];
}

const c = (x: number): string => `${x.toFixed(1)} °C`;

/** The fields {@link packCautions} reads, each checked, else `INVALID_ARGUMENT` naming it. */
function checkCautionInput(input: CautionInput, dataset: Dataset): void {
  if (input === null || typeof input !== 'object') throw new IonheatError('INVALID_ARGUMENT', `packCautions takes { startC, final, salts }, got ${describeValue(input)}`, { field: 'input' });
  numberArgument(input.startC, 'startC', 'the start temperature in °C', { min: -273.15, max: 1000 });
  const f = input.final;
  if (f === null || typeof f !== 'object') throw new IonheatError('INVALID_ARGUMENT', `final must be { value, low, high } in °C, got ${describeValue(f)}`, { field: 'final' });
  for (const k of ['value', 'low', 'high'] as const) numberArgument(f[k], `final.${k}`, 'a final temperature in °C', { min: -273.15, max: 1000 });
  if (input.clamp !== undefined && !['freezing', 'eutectic', 'boiling'].includes(input.clamp)) throw new IonheatError('INVALID_ARGUMENT', `clamp is freezing, eutectic or boiling when given, got ${describeValue(input.clamp)}`, { field: 'clamp' });
  if (!Array.isArray(input.salts)) throw new IonheatError('INVALID_ARGUMENT', `salts must be a list of salts from parseSalt, got ${describeValue(input.salts)}`, { field: 'salts' });
  input.salts.forEach((s, i) => saltArgument(s, dataset, `salts[${i}]`));
  if (input.undissolved !== undefined && !(Array.isArray(input.undissolved) && input.undissolved.every((u) => u !== null && typeof u === 'object' && typeof u.formula === 'string' && Number.isFinite(u.undissolvedMass)))) {
    throw new IonheatError('INVALID_ARGUMENT', `undissolved must be a list of { formula, undissolvedMass } when given, got ${describeValue(input.undissolved)}`, { field: 'undissolved' });
  }
  if (input.secondsAboveBurnThreshold !== undefined) numberArgument(input.secondsAboveBurnThreshold, 'secondsAboveBurnThreshold', 'the seconds above the burn threshold', { min: 0, max: 1e9 });
}

/**
 * The cautions for a fill, in plain words, each naming its basis:
 *
 * - hot fill whose 95 % interval reaches above about 44 °C: contact-burn risk,
 *   growing with contact time (ISO 13732-1, threshold from memory);
 * - warm fill below that: long contact can still harm people who cannot feel
 *   or move away from heat (common practice);
 * - boiling: scalding liquid or steam, a pack that may burst;
 * - cold fill: cold injury from prolonged direct contact, frostbite risk at or
 *   below 0 °C (common practice: a cloth between pack and skin, about 20
 *   minutes at a time);
 * - salt left undissolved at the final temperature (a lump that delivers no heat);
 * - every hazard the hazards table gives for each salt, with its source, and
 *   whether its sale is restricted;
 * - last, the screening line.
 *
 * Each caution is `{ kind, severity, text }` ({@link Caution}): `boiling` and a
 * `contact-burn` whose value passes the threshold are `danger`; a burn only
 * the interval reaches, and frostbite, `warning`; a warm or mildly cold fill,
 * undissolved salt and the screening line, `notice`.
 *
 * @param input - start and final temperatures with the final's 95 % interval (°C), any freezing/eutectic/boiling clamp,
 *   the salts, and optionally the seconds a time course spends above the burn threshold
 * @param dataset - the hazards table (default: built-in)
 * @returns the cautions, the screening line last
 * @see ISO 13732-1:2006, source key `iso13732` (contact-burn threshold); the hazards table's sources, e.g. `clpAnnexVI`,
 *   `eu2019_1148`, `reachAnnexXVII`, `supplierSds`; cold-injury advice: `commonPractice`.
 *
 * @example
 * ```ts
 * const salts = [parseSalt('CaCl2')];
 * const list = packCautions({ startC: 20, final: { value: 62, low: 60, high: 64 }, salts });
 * list[0].kind; // 'contact-burn'
 * list[0].severity; // 'danger'
 * list[0].text.startsWith('Contact-burn risk'); // true
 * list[list.length - 1].text === SCREENING_LINE; // true
 * list.some((c) => c.kind === 'hazard-class' && c.text.startsWith('CaCl2 (irritant)')); // true
 * ```
 */
export function packCautions(input: CautionInput, dataset: Dataset = builtinDataset()): Caution[] {
  checkCautionInput(input, dataset);
  const out: Caution[] = [];
  const { startC, final } = input;
  const hot = final.value > startC + NEUTRAL_BAND_K;
  const cold = final.value < startC - NEUTRAL_BAND_K;
  if (input.clamp === 'boiling') {
    out.push(
      caution(
        'boiling',
        'danger',
        'Boiling: the heat released would bring the fill to the boiling point of the solution. Boiling brine scalds, steam can burst the pack, and the real temperature may exceed 100 °C because dissolved salt raises the boiling point. Use less salt or more water.',
      ),
    );
  }
  if (final.high > CONTACT_BURN_THRESHOLD_C) {
    const held = input.secondsAboveBurnThreshold !== undefined && input.secondsAboveBurnThreshold > 0 ? ` In the time course it stays above ${CONTACT_BURN_THRESHOLD_C} °C for about ${Math.round(input.secondsAboveBurnThreshold / 60)} min.` : '';
    out.push(
      caution(
        'contact-burn',
        final.value > CONTACT_BURN_THRESHOLD_C ? 'danger' : 'warning',
        `Contact-burn risk: the fill may reach ${c(final.value)} (95 % interval up to ${c(final.high)}), above the roughly ${CONTACT_BURN_THRESHOLD_C} °C at which ISO 13732-1 puts the burn threshold for skin contact lasting many minutes to hours (threshold from memory, not checked against the standard). The hotter the pack and the longer it is held against skin, the greater the risk, and the threshold drops as contact lengthens. Keep an insulating sleeve between pack and skin and limit contact time; take special care with children, older people and anyone with poor sensation or circulation.${held}`,
      ),
    );
  } else if (hot) {
    out.push(
      caution(
        'warm-contact',
        'notice',
        `Warm fill: it stays below the roughly ${CONTACT_BURN_THRESHOLD_C} °C long-contact burn threshold of ISO 13732-1 (from memory), but prolonged contact with warm packs can still injure people who cannot feel heat or move away from it (common practice: a cover and limited contact time).`,
      ),
    );
  }
  if (cold) {
    const frost = final.low <= 0 || input.clamp === 'freezing' || input.clamp === 'eutectic';
    out.push(
      caution(
        'cold-injury',
        frost ? 'warning' : 'notice',
        `Cold injury: prolonged direct contact of a cold pack with skin can injure it${frost ? '; this fill can reach 0 °C or below, where frostbite is possible within minutes' : ''}. Common practice: a cloth between pack and skin, about 20 minutes at a time with breaks, never on skin that cannot feel cold.`,
      ),
    );
  }
  for (const u of input.undissolved ?? []) {
    if (u.undissolvedMass >= 0.05) {
      out.push(caution('undissolved-salt', 'notice', `Undissolved salt: about ${u.undissolvedMass.toFixed(1)} g of ${u.formula} stays solid at the final temperature; it gives no heat of solution, settles as a lump and can make the pack hard or uneven against the skin.`));
    }
  }
  for (const salt of input.salts) out.push(...hazardCautions(salt, dataset));
  out.push(caution('screening', 'notice', SCREENING_LINE));
  return out;
}
