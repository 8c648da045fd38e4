/**
 * The cautions of a latent-heat warmer: contact burns at the plateau (which
 * can last long), what repeated recharging does, boiling water and a burst
 * pouch when recharging, the salt's own hazards, and the closing screening
 * line.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { WarmerMeltRecord } from '../data/schemas.js';
import type { Salt } from '../chem/salt.js';
import { CONTACT_BURN_THRESHOLD_C, packCautions } from '../pack/packCautions.js';
import { caution, type Caution } from '../quantity/caution.js';

/** What the cautions are about; temperatures °C, times s. */
export interface WarmerCautionInput {
  salt: Salt;
  record: WarmerMeltRecord;
  startC: number;
  plateau: { value: number; low: number; high: number };
  plateauDurationS: number;
  secondsAboveBurnThreshold: number;
  rechargeC: number | null;
}

const c = (x: number): string => `${x.toFixed(1)} °C`;

/**
 * The cautions in plain words, each naming its basis: the burn threshold of
 * ISO 13732-1 (from memory) for long contact, against the plateau's 95 %
 * interval; the loss of heat over cycles for a salt that melts incongruently
 * (the table's own words, with its source); recharging in hot water; then the
 * salt's hazards and the screening line, as for a pack.
 */
export function warmerCautions(input: WarmerCautionInput, dataset: Dataset): Caution[] {
  const out: Caution[] = [];
  const { plateau } = input;
  const minutes = (s: number) => Math.round(s / 60);
  if (plateau.high > CONTACT_BURN_THRESHOLD_C) {
    const held = input.secondsAboveBurnThreshold > 0 ? ` With the heat loss assumed here it stays above ${CONTACT_BURN_THRESHOLD_C} °C for about ${minutes(input.secondsAboveBurnThreshold)} min.` : '';
    out.push(
      caution(
        'contact-burn',
        plateau.value > CONTACT_BURN_THRESHOLD_C ? 'danger' : 'warning',
        `Contact-burn risk: the warmer holds a plateau near ${c(plateau.value)} (95 % interval up to ${c(plateau.high)}) for a long time, above the roughly ${CONTACT_BURN_THRESHOLD_C} °C at which ISO 13732-1 puts the burn threshold for skin contact lasting many minutes to hours (threshold from memory, not checked against the standard). A latent-heat warmer does not cool off while it crystallises, so the risk grows with every minute of contact. Keep a cover between warmer and skin, never sleep on one or bind it on, and do not use it on children, older people or anyone with poor sensation or circulation.${held}`,
      ),
    );
  } else {
    out.push(
      caution(
        'warm-contact',
        'notice',
        `Long contact: the plateau, near ${c(plateau.value)}, stays below the roughly ${CONTACT_BURN_THRESHOLD_C} °C long-contact burn threshold of ISO 13732-1 (from memory), but it lasts a long time and prolonged contact with warm packs can still injure people who cannot feel heat or move away from it (common practice: a cover and limited contact time).`,
      ),
    );
  }
  const r = input.record;
  if (r.melting !== 'congruent') {
    out.push(
      caution(
        'recharge',
        'notice',
        `Repeated recharging of ${input.salt.formula}: ${r.consequence ?? `it melts ${r.melting}ly; a solid can separate on melting and settle, so the heat released falls from cycle to cycle.`} Melt the fill completely (until clear, with no crystals left) at every recharge: a crystal left behind triggers the fill as it cools. [${r.source}${r.fromMemory ? ', from memory' : ''}]`,
      ),
    );
  }
  const recharge =
    input.rechargeC === null
      ? 'heating in water does not melt this fill completely (the separated solid does not redissolve below 100 °C), so it cannot be fully recharged that way.'
      : `recharging needs the whole fill above about ${c(input.rechargeC)}; in boiling water the pouch can soften or burst and the fill scalds, so recharge it wrapped in a cloth, never in a microwave oven unless the maker says so, and let it cool before use.`;
  out.push(caution('recharge', 'warning', `Recharging: ${recharge} Pouches age and leak with repeated recharging; discard a pouch that is damaged or no longer triggers cleanly (common practice).`));
  // The salt's own hazards and the screening line, as every pack result carries them.
  const pack = packCautions({ startC: input.startC, final: { value: input.startC, low: input.startC, high: input.startC }, salts: [input.salt] }, dataset);
  out.push(...pack);
  return out;
}
