/**
 * The lattice enthalpy closed from formation enthalpies.
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import { optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords } from '../chem/saltRecords.js';
import { exactSum } from '../quantity/exactSum.js';
import { linearUncertainty } from '../quantity/propagate.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { gaseousIon } from './gaseousIon.js';

const CYCLE_LATTICE_OPTIONS = optionNames<CycleLatticeOptions>('cycleLatticeEnthalpy', { hideCrystal: true });

/** Options of {@link cycleLatticeEnthalpy}. */
export interface CycleLatticeOptions {
  /** Ignore the salt's own crystal formation enthalpy (for leave-one-out checks): the result is then undefined. */
  hideCrystal?: boolean;
}

/**
 * The lattice enthalpy of a salt at 298.15 K from a closed thermochemical
 * cycle, on the `cycle` basis:
 *
 *   ΔH_L = Σνᵢ·ΔfH°(ionᵢ, g) − ΔfH°(salt, cr)
 *
 * positive, for crystal → gaseous ions. The gaseous ions come from
 * `gaseousIon` (monatomic ions from their elements, polyatomic ions
 * from the tabulated gaseous-ion enthalpies). Summed exactly; the
 * uncertainty treats the terms as independent.
 *
 * @param salt - an anhydrous ionic salt (formula or parsed)
 * @param dataset - ΔfH°(cr) and the gaseous-ion formation enthalpies (default: built-in)
 * @param options - `hideCrystal`: ignore the salt's own crystal formation enthalpy (leave-one-out checks)
 * @returns kJ/mol; undefined when a term is missing, for a hydrate or for a non-electrolyte
 * @see Wagman et al. 1982 (NBS tables) for ΔfH°(cr); the Born–Haber cycle (Born 1919, Haber 1919).
 * @example
 * ```ts
 * cycleLatticeEnthalpy('NaCl')?.value; // ≈ 787.2 kJ/mol
 * ```
 */
export function cycleLatticeEnthalpy(salt: Salt | string, dataset: Dataset = builtinDataset(), options: CycleLatticeOptions = {}): Estimate | undefined {
  const s = saltArgument(salt, dataset);
  options = optionsArgument(options, CYCLE_LATTICE_OPTIONS);
  if (s.kind !== 'ionic' || s.water > 0 || options.hideCrystal) return undefined;
  const cache = dataset.cache<string, Estimate | null>('cycle.latticeCache', CACHE_LIMIT);
  let hit = cache.get(s.formula);
  if (hit === undefined) {
    hit = compute(s, dataset) ?? null;
    cache.set(s.formula, hit);
  }
  return hit === null ? undefined : { ...hit, sources: hit.sources.slice(), notes: hit.notes.slice() };
}

/** Most results kept per dataset (a bounded cache: those not used for longest go first). */
const CACHE_LIMIT = 20_000;

function compute(s: Salt, dataset: Dataset): Estimate | undefined {
  const crystal = saltRecords('compound-formation.json', s, dataset).find((r) => r.phase === 'cr');
  if (!crystal) return undefined;
  const terms = [{ coefficient: -1, value: crystal.value, u: dataset.uncertaintyOf('compound-formation.json', crystal) ?? 0 }];
  const sources = [crystal.source];
  const memory: string[] = crystal.fromMemory ? [`ΔfH°(${s.formula}, cr)`] : [];
  for (const { ion, count } of s.ions) {
    const g = gaseousIon(ion, dataset);
    if (!g) return undefined;
    terms.push({ coefficient: count, value: g.value, u: g.u });
    for (const st of g.steps) {
      sources.push(st.source);
      if (st.fromMemory) memory.push(st.label);
    }
  }
  return makeEstimate({
    quantity: 'lattice enthalpy',
    value: exactSum(terms),
    u: linearUncertainty(terms),
    unit: 'kJ/mol',
    basis: 'cycle',
    method: 'born-haber',
    sources,
    notes: memory.length > 0 ? [`entered from memory, not checked against the source: ${[...new Set(memory)].join(', ')}`] : [],
  });
}
