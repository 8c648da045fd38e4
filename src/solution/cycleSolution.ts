import type { Dataset } from '../data/dataset.js';
import { saltArgument } from '../chem/saltArgument.js';
import { optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import { builtinDataset } from '../data/builtin.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords, WATER } from '../chem/saltRecords.js';
import { exactSum, type Term } from '../quantity/exactSum.js';
import { linearUncertainty } from '../quantity/propagate.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';

const CYCLE_SOLUTION_OPTIONS = optionNames<{ hideCrystal?: boolean }>('solutionEnthalpyFromCycle', { hideCrystal: true });

interface CycleTerm extends Term {
  u: number;
  source: string;
  label: string;
  fromMemory: boolean;
}

function ionFormationAq(ion: string, dataset: Dataset) {
  return dataset.index('ion-formation-aq.json').get(ion);
}

/** The formation-enthalpy terms of the dissolution, or undefined when one is missing. */
export function solutionCycleTerms(salt: Salt, dataset: Dataset = builtinDataset(), options: { hideCrystal?: boolean } = {}): CycleTerm[] | undefined {
  const terms: CycleTerm[] = [];
  const crystal = options.hideCrystal ? undefined : saltRecords('compound-formation.json', salt, dataset).find((r) => r.phase === 'cr');
  if (!crystal) return undefined;
  terms.push({ coefficient: -1, value: crystal.value, u: dataset.uncertaintyOf('compound-formation.json', crystal) ?? 0, source: crystal.source, label: `ΔfH°(${salt.formula}, cr)`, fromMemory: crystal.fromMemory });
  if (salt.kind === 'non-electrolyte') {
    const aq = saltRecords('compound-formation.json', salt, dataset).find((r) => r.phase === 'aq');
    if (!aq) return undefined;
    terms.push({ coefficient: 1, value: aq.value, u: dataset.uncertaintyOf('compound-formation.json', aq) ?? 0, source: aq.source, label: `ΔfH°(${salt.anhydrous}, aq)`, fromMemory: aq.fromMemory });
  } else {
    for (const { ion, count } of salt.ions) {
      const r = ionFormationAq(ion, dataset);
      if (!r) return undefined;
      terms.push({ coefficient: count, value: r.value, u: dataset.uncertaintyOf('ion-formation-aq.json', r) ?? 0, source: r.source, label: `ΔfH°(${ion}, aq)`, fromMemory: r.fromMemory });
    }
  }
  if (salt.water > 0) {
    const water = saltRecords('compound-formation.json', { formula: WATER }, dataset).find((r) => r.phase === 'l');
    if (!water) return undefined;
    terms.push({ coefficient: salt.water, value: water.value, u: dataset.uncertaintyOf('compound-formation.json', water) ?? 0, source: water.source, label: 'ΔfH°(H2O, l)', fromMemory: water.fromMemory });
  }
  return terms;
}

/**
 * Enthalpy of solution at infinite dilution from formation enthalpies, on the
 * `cycle` basis:
 *
 *   ΔsolH° = Σνᵢ·ΔfH°(ionᵢ, aq) + n_w·ΔfH°(H₂O, l) − ΔfH°(salt·n_wH₂O, cr)
 *
 * (a hydrate's water of crystallization becomes solvent). For a
 * non-electrolyte, ΔfH°(aq) − ΔfH°(cr). Summed exactly in decimal; the
 * uncertainty treats the terms as independent, which overstates it where
 * the tables derive values from one another.
 *
 * @param salt - the salt as dissolved
 * @param options - leave-one-out switches
 * @param options.hideCrystal - ignore the salt's own crystal formation enthalpy (for leave-one-out validation)
 * @param dataset - formation enthalpies of the crystal, the aqueous ions and liquid water (default: built-in)
 * @returns kJ/mol, positive = endothermic; undefined when a term is missing
 * @see Wagman et al. 1982, the NBS tables (J. Phys. Chem. Ref. Data 11, Suppl. 2)
 * @example
 * ```ts
 * // −240.12 − 167.159 + 411.153 = 3.874 kJ/mol (NBS 1982)
 * solutionEnthalpyFromCycle(parseSalt('NaCl'))?.value; // 3.874
 * ```
 */
export function solutionEnthalpyFromCycle(salt: Salt, dataset: Dataset = builtinDataset(), options: { hideCrystal?: boolean } = {}): Estimate | undefined {
  salt = saltArgument(salt, dataset);
  options = optionsArgument(options, CYCLE_SOLUTION_OPTIONS);
  const terms = solutionCycleTerms(salt, dataset, options);
  if (!terms) return undefined;
  const memory = terms.filter((t) => t.fromMemory).map((t) => t.label);
  return makeEstimate({
    quantity: 'enthalpy of solution',
    value: exactSum(terms),
    u: linearUncertainty(terms),
    unit: 'kJ/mol',
    basis: 'cycle',
    method: 'formation-enthalpies',
    sources: terms.map((t) => t.source),
    notes: memory.length > 0 ? [`entered from memory, not checked against the source: ${memory.join(', ')}`] : [],
  });
}
