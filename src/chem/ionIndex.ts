/**
 * Lookups over a dataset's ion table, built once per dataset: by id, by
 * elemental composition (for matching pieces of a formula), and by the
 * written forms of non-electrolyte solutes.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { IonRecord } from '../data/schemas.js';
import { readFormulaSyntax, unitComposition } from './formulaSyntax.js';

export interface IonIndex {
  byId: ReadonlyMap<string, IonRecord>;
  /** Position of each ion id in the table: the canonical order of ions in a formula. */
  order: ReadonlyMap<string, number>;
  /** Ions that can stand in a salt, by composition key (see {@link compositionKey}). */
  byComposition: ReadonlyMap<string, readonly IonRecord[]>;
  /** Non-electrolyte solutes by each written form (`CO(NH2)2`, `CH4N2O`). */
  soluteForms: ReadonlyMap<string, IonRecord>;
  /** Non-electrolyte solutes by lower-case name (`urea`). */
  soluteNames: ReadonlyMap<string, IonRecord>;
}

/** A canonical text key of an element-count map: symbols in alphabetical order with their counts, `C2H3O2`. */
export function compositionKey(composition: ReadonlyMap<string, number> | Readonly<Record<string, number>>): string {
  const entries = composition instanceof Map ? [...composition.entries()] : Object.entries(composition);
  return entries
    .filter(([, n]) => n !== 0)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([el, n]) => `${el}${n}`)
    .join('');
}

/** The hydrogen ion dissolves from acids, not salts; it never stands in a salt formula. */
const NOT_IN_SALTS = new Set(['H[+]']);

/** The ion index of a dataset, built on first use. */
export function ionIndex(dataset: Dataset): IonIndex {
  return dataset.memo('chem.ionIndex', () => {
    const byId = new Map<string, IonRecord>();
    const order = new Map<string, number>();
    const byComposition = new Map<string, IonRecord[]>();
    const soluteForms = new Map<string, IonRecord>();
    const soluteNames = new Map<string, IonRecord>();
    dataset.records('ions.json').forEach((ion, i) => {
      byId.set(ion.id, ion);
      order.set(ion.id, i);
      if (ion.kind === 'non-electrolyte') {
        for (const form of [ion.formula, ...(ion.aliases ?? [])]) soluteForms.set(form, ion);
        soluteNames.set(ion.name.toLowerCase(), ion);
        return;
      }
      if (NOT_IN_SALTS.has(ion.id)) return;
      const keys = new Set([compositionKey(ion.composition)]);
      // An alias written with other counts would be a data error; its composition must agree.
      for (const alias of ion.aliases ?? []) keys.add(compositionKey(unitComposition(readFormulaSyntax(alias).units)));
      for (const key of keys) {
        const list = byComposition.get(key) ?? [];
        list.push(ion);
        byComposition.set(key, list);
      }
    });
    return { byId, order, byComposition, soluteForms, soluteNames };
  });
}

/**
 * The ion with this id (`Na[+]`, `SO4[2-]`), or undefined.
 *
 * @param id - formula plus bracketed charge, as in `data/ions.json`
 * @param dataset - the ion table (default: built-in)
 * @see data/ions.json (each record names its source); DEVELOPERS.md, "Adding an ion".
 *
 * @example
 * ```ts
 * findIon('SO4[2-]')?.charge; // -2
 * findIon('NH4[+]')?.name; // 'ammonium'
 * findIon('Xx[+]'); // undefined
 * ```
 */
export function findIon(id: string, dataset: Dataset = builtinDataset()): IonRecord | undefined {
  return ionIndex(dataset).byId.get(id);
}
