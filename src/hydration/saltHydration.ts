/**
 * Hydration enthalpy of a whole salt: Σν·ΔhydH°(ion) over its ions, on the
 * absolute or the conventional scale, with Born estimates standing in for
 * ions the tables lack (flagged).
 *
 * @module
 */
import { IonheatError } from '../error.js';
import { saltArgument } from '../chem/saltArgument.js';
import { describeValue, optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { Salt } from '../chem/salt.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { exactSum } from '../quantity/exactSum.js';
import { linearUncertainty } from '../quantity/propagate.js';
import { bornHydrationEnthalpy } from './bornHydration.js';
import { protonHydration, tabulatedHydrationTerm, type HydrationScale, type HydrationTerm } from './ionHydration.js';

const SALT_HYDRATION_OPTIONS = optionNames<SaltHydrationOptions>('saltHydrationEnthalpy', { scale: true, born: true });

export interface SaltHydrationOptions {
  /** `absolute` (Marcus, default) or `conventional` (ΔfH°(aq) − ΔfH°(g), ΔhydH°(H⁺) ≡ 0). */
  scale?: HydrationScale;
  /** Let Born estimates stand in for ions without tabulated values (default true). */
  born?: boolean;
}

/** One ion's term on one scale, tabulated or (where allowed) a Born estimate; undefined when neither exists. */
function ionTerm(ion: string, charge: number, scale: HydrationScale, born: boolean, dataset: Dataset): HydrationTerm | undefined {
  let term = tabulatedHydrationTerm(ion, scale, dataset);
  if (!term && born) {
    const estimate = bornHydrationEnthalpy(ion, {}, dataset);
    const proton = protonHydration(dataset);
    if (estimate && (scale === 'absolute' || proton)) {
      // The Born value is absolute; on the conventional scale subtract z·ΔhydH°abs(H⁺).
      const shift = scale === 'conventional' ? -charge * proton!.value : 0;
      term = { ion, charge, value: estimate.value + shift, u: estimate.u, sources: estimate.sources, fromMemory: false, kind: 'born', notes: estimate.notes };
    }
  }
  return term;
}

/**
 * Each ion's term per scale (with and without Born estimates), built on
 * first use and kept per dataset: per-ion data, shared by every salt of the
 * ion. The terms kept are never handed out (see {@link saltHydrationTerms}).
 */
function ionTerms(dataset: Dataset): Record<HydrationScale, { born: Map<string, HydrationTerm | null>; tabulated: Map<string, HydrationTerm | null> }> {
  return dataset.memo('hydration.ionTerms', () => ({ absolute: { born: new Map(), tabulated: new Map() }, conventional: { born: new Map(), tabulated: new Map() } }));
}

/** The options as a caller passes them: an object whose `scale`, when given, is absolute or conventional. */
function hydrationOptions(options: SaltHydrationOptions | undefined): SaltHydrationOptions {
  const o = optionsArgument(options, SALT_HYDRATION_OPTIONS);
  if (o.scale !== undefined && o.scale !== 'absolute' && o.scale !== 'conventional') throw new IonheatError('INVALID_ARGUMENT', `scale must be absolute or conventional, got ${describeValue(o.scale)}`, { field: 'scale' });
  return o;
}

/** The kept terms of a salt's hydration sum (shared: not to be changed or handed out), or undefined when an ion has no value. */
function keptTerms(salt: Salt, options: SaltHydrationOptions, dataset: Dataset): { term: HydrationTerm; count: number }[] | undefined {
  if (salt.kind !== 'ionic') return undefined;
  const scale = options.scale ?? 'absolute';
  const born = options.born !== false;
  const byScale = ionTerms(dataset)[scale];
  const cache = born ? byScale.born : byScale.tabulated;
  const out: { term: HydrationTerm; count: number }[] = [];
  for (const { ion, count, charge } of salt.ions) {
    let term = cache.get(ion);
    if (term === undefined) {
      term = ionTerm(ion, charge, scale, born, dataset) ?? null;
      cache.set(ion, term);
    }
    if (!term) return undefined;
    out.push({ term, count });
  }
  return out;
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
  options = hydrationOptions(options);
  return keptTerms(salt, options, dataset)?.map(({ term, count }) => ({ term: { ...term, sources: [...term.sources], notes: [...term.notes] }, count }));
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
  salt = saltArgument(salt, dataset);
  options = hydrationOptions(options);
  const terms = keptTerms(salt, options, dataset);
  if (!terms) return undefined;
  const scale = options.scale ?? 'absolute';
  // Plain loops: this runs for every salt dissolve is asked about.
  const sum: { coefficient: number; value: number }[] = [];
  const us: { coefficient: number; u: number }[] = [];
  const sources: string[] = [];
  const notes: string[] = [];
  const memory: string[] = [];
  for (const { term, count } of terms) {
    sum.push({ coefficient: count, value: term.value });
    us.push({ coefficient: count, u: term.u });
    for (const source of term.sources) sources.push(source);
    if (term.kind === 'born') notes.push(`${term.ion}: ${term.notes[0] ?? 'Born estimate'}`);
    if (term.fromMemory && !memory.includes(term.ion)) memory.push(term.ion);
  }
  const born = notes.length > 0;
  if (memory.length > 0) notes.push(`entered from memory, not checked against the source: ${memory.join(', ')}`);
  return makeEstimate({
    quantity: 'hydration enthalpy of the salt',
    value: exactSum(sum),
    u: linearUncertainty(us),
    unit: 'kJ/mol',
    basis: born ? 'model' : scale === 'absolute' ? 'measured' : 'cycle',
    method: born ? (scale === 'absolute' ? 'marcus+born-lps' : 'formation-enthalpies+born-lps') : scale === 'absolute' ? 'marcus' : 'formation-enthalpies',
    sources,
    notes,
  });
}
