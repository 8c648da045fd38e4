/**
 * Single-ion hydration enthalpies, ion(g) → ion(aq), on two scales:
 *
 * - `absolute`: the tabulated values of Marcus, which rest on an
 *   extrathermodynamic choice of the proton's hydration enthalpy
 *   (`protonHydrationEnthalpy` of the table, −1103 kJ/mol);
 * - `conventional`: from formation enthalpies, ΔhydH°conv(ion) =
 *   ΔfH°(ion, aq) − ΔfH°(ion, g) + z·ΔfH°(H⁺, g), which sets
 *   ΔhydH°conv(H⁺) ≡ 0 (the proton convention). Aqueous values are on the
 *   conventional scale ΔfH°(H⁺, aq) = 0, gaseous ones on the electron
 *   convention; both choices cancel in a neutral salt.
 *
 * The two scales differ for an ion of charge z by z·ΔhydH°abs(H⁺); for any
 * neutral salt Σν·z = 0 and the sums agree.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { TableFile } from '../data/schemas.js';
import { findIon } from '../chem/ionIndex.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { exactSum } from '../quantity/exactSum.js';
import { quadrature } from '../quantity/propagate.js';
import { gaseousIonFormationEnthalpy } from './gaseousIonFormation.js';

/** Which hydration scale: Marcus's absolute values, or the conventional scale with ΔhydH°(H⁺) ≡ 0. */
export type HydrationScale = 'absolute' | 'conventional';

/** One ion's hydration term before the proton's own uncertainty is added (it cancels in a neutral salt). */
export interface HydrationTerm {
  ion: string;
  charge: number;
  value: number;
  /** Standard uncertainty relative to the proton, kJ/mol. */
  u: number;
  sources: string[];
  fromMemory: boolean;
  /** `table` (Marcus), `formation` (ΔfH°(aq) − ΔfH°(g)), `born` (estimated). */
  kind: 'table' | 'formation' | 'born';
  notes: string[];
}

export interface ProtonScale {
  /** ΔhydH°abs(H⁺), kJ/mol, and its standard uncertainty. */
  value: number;
  u: number;
  source: string;
}

/** The absolute hydration enthalpy of the proton the tabulated single-ion values assume. */
export function protonHydration(dataset: Dataset = builtinDataset()): ProtonScale | undefined {
  return dataset.memo('hydration.proton', () => {
    // The schema's extra envelope fields are not in the inferred table type.
    const table = dataset.table('hydration-enthalpies.json') as (TableFile<'hydration-enthalpies.json'> & { protonHydrationEnthalpy: number; protonSource: string }) | undefined;
    if (!table || typeof table.protonHydrationEnthalpy !== 'number') return undefined;
    const record = table.records.find((r) => r.ion === 'H[+]');
    const u = record ? (dataset.uncertaintyOf('hydration-enthalpies.json', record) ?? 0) : 0;
    return { value: table.protonHydrationEnthalpy, u, source: record?.source ?? table.protonSource };
  });
}

function marcusIndex(dataset: Dataset) {
  return dataset.index('hydration-enthalpies.json');
}

function aqueousIndex(dataset: Dataset) {
  return dataset.index('ion-formation-aq.json');
}

/**
 * The hydration term of one ion on a scale from the tables, with the
 * uncertainty relative to the proton; undefined when the tables lack it.
 * Born estimates are not made here (see {@link bornHydrationEnthalpy}).
 */
export function tabulatedHydrationTerm(ion: string, scale: HydrationScale, dataset: Dataset = builtinDataset()): HydrationTerm | undefined {
  const record = findIon(ion, dataset);
  if (!record) return undefined;
  if (scale === 'absolute') {
    const r = marcusIndex(dataset).get(ion);
    if (!r) return undefined;
    return {
      ion,
      charge: record.charge,
      value: r.value,
      u: dataset.uncertaintyOf('hydration-enthalpies.json', r) ?? 0,
      sources: [r.source],
      fromMemory: r.fromMemory,
      kind: 'table',
      notes: [],
    };
  }
  const aq = aqueousIndex(dataset).get(ion);
  const gas = gaseousIonFormationEnthalpy(ion, dataset);
  if (!aq || !gas) return undefined;
  const proton = record.charge === 0 ? undefined : gaseousIonFormationEnthalpy('H[+]', dataset);
  if (record.charge !== 0 && !proton) return undefined;
  const value = exactSum([
    { coefficient: 1, value: aq.value },
    { coefficient: -1, value: gas.value },
    { coefficient: record.charge, value: proton?.value ?? 0 },
  ]);
  return {
    ion,
    charge: record.charge,
    value,
    u: quadrature(dataset.uncertaintyOf('ion-formation-aq.json', aq) ?? 0, gas.u),
    sources: [aq.source, ...gas.sources, ...(proton?.sources ?? [])],
    fromMemory: aq.fromMemory || gas.notes.some((n) => n.includes('from memory')),
    kind: 'formation',
    notes: gas.basis === 'cycle' ? [`ΔfH°(${ion}, g) formed from the gaseous atom`] : [],
  };
}

/**
 * The standard hydration enthalpy of one ion, ion(g) → ion(aq), kJ/mol,
 * negative = heat released.
 *
 * - `absolute`: Marcus's tabulated value; its uncertainty includes |z| times
 *   the uncertainty of the proton's absolute value.
 * - `conventional`: ΔfH°(ion, aq) − ΔfH°(ion, g) + z·ΔfH°(H⁺, g), the scale
 *   on which ΔhydH°(H⁺) ≡ 0.
 *
 * @param ion - an ion id, e.g. `Na[+]`
 * @param scale - `absolute` (default) or `conventional`
 * @param dataset - hydration enthalpies and aqueous and gaseous formation enthalpies (default: built-in)
 * @returns basis `measured` (absolute, tabulated) or `cycle` (conventional); undefined when the tables lack the ion
 * @see Marcus, Y. Ion Properties (Dekker, 1997); Marcus, Y. J. Chem. Soc. Faraday Trans. 87, 2995 (1991)
 * @see Wagman et al. 1982, the NBS tables (J. Phys. Chem. Ref. Data 11, Suppl. 2)
 * @example
 * ```ts
 * ionHydrationEnthalpy('Na[+]')?.value; // -416 (Marcus)
 * // −240.12 − 609.358 + 1536.202 = 686.72 kJ/mol on the conventional scale
 * ionHydrationEnthalpy('Na[+]', 'conventional')?.value; // 686.724
 * ```
 */
export function ionHydrationEnthalpy(ion: string, scale: HydrationScale = 'absolute', dataset: Dataset = builtinDataset()): Estimate | undefined {
  const term = tabulatedHydrationTerm(ion, scale, dataset);
  if (!term) return undefined;
  const proton = protonHydration(dataset);
  const protonU = scale === 'absolute' && proton ? Math.abs(term.charge) * proton.u : 0;
  return makeEstimate({
    quantity: 'hydration enthalpy',
    value: term.value,
    u: quadrature(term.u, protonU),
    unit: 'kJ/mol',
    basis: scale === 'absolute' ? 'measured' : 'cycle',
    method: scale === 'absolute' ? 'marcus' : 'formation-enthalpies',
    sources: term.sources,
    notes: [
      ...(scale === 'absolute' && proton ? [`absolute scale with ΔhydH°(H+) = ${proton.value} kJ/mol`] : ['conventional scale, ΔhydH°(H+) ≡ 0']),
      ...term.notes,
      ...(term.fromMemory ? ['entered from memory, not checked against the source'] : []),
    ],
  });
}
