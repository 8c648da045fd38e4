/**
 * Hydration enthalpy of a whole salt: Σν·ΔhydH°(ion) over its ions, on the
 * absolute or the conventional scale, with Born estimates standing in for
 * ions the tables lack (flagged).
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import { optionsArgument } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { Salt } from '../chem/salt.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { exactSum } from '../quantity/exactSum.js';
import { linearUncertainty } from '../quantity/propagate.js';
import { bornHydrationEnthalpy } from './bornHydration.js';
import { protonHydration, tabulatedHydrationTerm, type HydrationScale, type HydrationTerm } from './ionHydration.js';

export interface SaltHydrationOptions {
  /** `absolute` (Marcus, default) or `conventional` (ΔfH°(aq) − ΔfH°(g), ΔhydH°(H⁺) ≡ 0). */
  scale?: HydrationScale;
  /** Let Born estimates stand in for ions without tabulated values (default true). */
  born?: boolean;
}

/**
 * The terms ν·ΔhydH°(ion) of a salt's hydration sum, one per ion with its
 * count ν, or undefined when an ion has no value (or for a non-electrolyte).
 * Each term is a tabulated value (Marcus, absolute scale; or ΔfH°(aq) −
 * ΔfH°(g), conventional scale) or, where `born` allows, a Born estimate.
 *
 * @param salt - an ionic salt (its water of crystallization plays no part)
 * @param options - `scale` (`absolute` or `conventional`) and `born` (let Born estimates stand in)
 * @param dataset - hydration and formation enthalpies (default: built-in)
 * @returns each ion's term, kJ/mol per ion, gaseous ion → aqueous ion at infinite dilution, with its count
 * @see Marcus, Ion Properties (1997), source key `marcus1997`; Wagman et al. (1982), `wagman1982`, for the conventional scale.
 *
 * @example
 * ```ts
 * const terms = saltHydrationTerms(parseSalt('CaCl2'));
 * terms.map((t) => `${t.count} ${t.term.ion}`); // ['1 Ca[2+]', '2 Cl[-]']
 * terms[1].term.value; // -367 kJ/mol (Marcus, Cl⁻)
 * saltHydrationTerms(parseSalt('urea')); // undefined
 * ```
 */
export function saltHydrationTerms(salt: Salt, options: SaltHydrationOptions = {}, dataset: Dataset = builtinDataset()): { term: HydrationTerm; count: number }[] | undefined {
  salt = saltArgument(salt, dataset);
  options = optionsArgument(options);
  if (salt.kind !== 'ionic') return undefined;
  const scale = options.scale ?? 'absolute';
  const out: { term: HydrationTerm; count: number }[] = [];
  for (const { ion, count, charge } of salt.ions) {
    let term = tabulatedHydrationTerm(ion, scale, dataset);
    if (!term && options.born !== false) {
      const born = bornHydrationEnthalpy(ion, {}, dataset);
      const proton = protonHydration(dataset);
      if (born && (scale === 'absolute' || proton)) {
        // The Born value is absolute; on the conventional scale subtract z·ΔhydH°abs(H⁺).
        const shift = scale === 'conventional' ? -charge * proton!.value : 0;
        term = { ion, charge, value: born.value + shift, u: born.u, sources: born.sources, fromMemory: false, kind: 'born', notes: born.notes };
      }
    }
    if (!term) return undefined;
    out.push({ term, count });
  }
  return out;
}

/**
 * Σν·ΔhydH°(ion) for a salt, gaseous ions → aqueous ions at infinite
 * dilution, kJ/mol (negative = heat released). For a neutral salt the two
 * scales give the same sum, because Σν·z = 0 removes the proton's value;
 * its uncertainty therefore does not enter.
 *
 * The basis is `measured` for a sum of Marcus's tabulated values, `cycle`
 * for a sum from formation enthalpies, and `model` once any Born estimate
 * stands in; the notes name the estimated ions.
 *
 * @param salt - an ionic salt (its water of crystallization plays no part)
 * @param options - `scale` (`absolute`, the default, or `conventional`) and `born` (default true)
 * @param dataset - hydration and formation enthalpies, radii for the Born estimates (default: built-in)
 * @returns undefined for a non-electrolyte or when an ion has neither a value nor a radius
 * @see Marcus, Y. Ion Properties (Dekker, 1997); Wagman et al. 1982 (NBS tables)
 * @example
 * ```ts
 * saltHydrationEnthalpy(parseSalt('NaCl'))?.value; // -783 (Marcus: −416 − 367)
 * // conventional: ΣΔfH°(aq) − ΣΔfH°(g) = −407.279 − 376.228 = −783.507
 * saltHydrationEnthalpy(parseSalt('NaCl'), { scale: 'conventional' })?.value; // -783.507
 * ```
 */
export function saltHydrationEnthalpy(salt: Salt, options: SaltHydrationOptions = {}, dataset: Dataset = builtinDataset()): Estimate | undefined {
  options = optionsArgument(options);
  const terms = saltHydrationTerms(salt, options, dataset);
  if (!terms) return undefined;
  const scale = options.scale ?? 'absolute';
  const born = terms.filter((t) => t.term.kind === 'born');
  const memory = terms.filter((t) => t.term.fromMemory).map((t) => t.term.ion);
  return makeEstimate({
    quantity: 'hydration enthalpy of the salt',
    value: exactSum(terms.map((t) => ({ coefficient: t.count, value: t.term.value }))),
    u: linearUncertainty(terms.map((t) => ({ coefficient: t.count, u: t.term.u }))),
    unit: 'kJ/mol',
    basis: born.length > 0 ? 'model' : scale === 'absolute' ? 'measured' : 'cycle',
    method: `${scale === 'absolute' ? 'marcus' : 'formation-enthalpies'}${born.length > 0 ? '+born-lps' : ''}`,
    sources: terms.flatMap((t) => t.term.sources),
    notes: [
      ...born.map((t) => `${t.term.ion}: ${t.term.notes[0] ?? 'Born estimate'}`),
      ...(memory.length > 0 ? [`entered from memory, not checked against the source: ${[...new Set(memory)].join(', ')}`] : []),
    ],
  });
}
