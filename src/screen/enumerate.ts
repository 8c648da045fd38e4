/**
 * `enumerate`: every charge-balanced salt of one cation and one anion of the
 * ion table, so that a screen can reach salts nobody has listed.
 *
 * @module
 */
import { describeValue, checkOptionKeys, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { HazardClass, IonKind, IonRecord } from '../data/schemas.js';
import { HAZARD_CLASSES, isTerm } from '../data/tableTerms.js';
import { formatIons } from '../chem/formatSalt.js';
import { findIon } from '../chem/ionIndex.js';
import { molarMass } from '../chem/molarMass.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError } from '../error.js';
import { saltHazards } from '../solution/saltHazards.js';

/** Which salts {@link enumerate} produces. Every filter is optional; together they must all hold. */
export interface EnumerateFilters {
  /** Allowed cation charges, e.g. `[1, 2]`. */
  cationCharges?: readonly number[];
  /** Allowed anion charges as magnitudes, e.g. `[1]` for F⁻, Cl⁻, NO₃⁻… */
  anionCharges?: readonly number[];
  /** Allowed kinds of cation: `monatomic` (Na⁺) or `polyatomic` (NH₄⁺). */
  cationKinds?: readonly Exclude<IonKind, 'non-electrolyte'>[];
  /** Allowed kinds of anion. */
  anionKinds?: readonly Exclude<IonKind, 'non-electrolyte'>[];
  /** Only these cations (ion ids, `K[+]`); default every cation of the table. */
  cations?: readonly string[];
  /** Only these anions (ion ids, `NO3[-]`). */
  anions?: readonly string[];
  /** Leave out salts containing any of these ions. */
  excludeIons?: readonly string[];
  /** Leave out salts the hazards table puts in any of these classes. */
  excludeHazards?: readonly HazardClass[];
  /** Lightest formula unit allowed, g/mol. */
  minMolarMass?: number;
  /** Heaviest formula unit allowed, g/mol. */
  maxMolarMass?: number;
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
/** The hydrogen ion makes acids, not salts. */
const NOT_A_SALT_CATION = 'H[+]';

function checkCharges(list: readonly number[] | undefined, field: string): void {
  for (const c of list ?? []) {
    if (!Number.isInteger(c) || c < 1 || c > 4) throw new IonheatError('INVALID_ARGUMENT', `${field}: a charge is a whole number from 1 to 4 (give anion charges as magnitudes), got ${describeValue(c)}`, { field });
  }
}

function checkIons(list: readonly string[] | undefined, field: string, dataset: Dataset): void {
  for (const id of list ?? []) {
    if (typeof id !== 'string' || !findIon(id, dataset)) throw new IonheatError('UNKNOWN_ION', `${field}: ${describeValue(id)} is not an ion id of the ${dataset.label} ion table (ids look like K[+], SO4[2-])`, { field, text: typeof id === 'string' ? id : undefined });
  }
}

function checkMass(x: number | undefined, field: string): void {
  if (x !== undefined && !(Number.isFinite(x) && x > 0)) throw new IonheatError('INVALID_ARGUMENT', `${field} is a molar mass in g/mol and must be a positive number, got ${describeValue(x)}`, { field });
}

function saltOf(cation: IonRecord, anion: IonRecord, dataset: Dataset): Salt {
  const g = gcd(cation.charge, -anion.charge);
  const ions = [
    { ion: cation.id, formula: cation.formula, charge: cation.charge, count: -anion.charge / g },
    { ion: anion.id, formula: anion.formula, charge: anion.charge, count: cation.charge / g },
  ];
  const counts = new Map<string, number>();
  for (const [ion, n] of [[cation, ions[0]!.count], [anion, ions[1]!.count]] as const) {
    for (const [el, k] of Object.entries(ion.composition)) counts.set(el, (counts.get(el) ?? 0) + k * n);
  }
  const composition = Object.fromEntries([...counts.entries()].sort(([a], [b]) => (a < b ? -1 : 1)));
  const formula = formatIons(ions);
  return { formula, anhydrous: formula, kind: 'ionic', ions, water: 0, composition, molarMass: molarMass(composition, dataset) };
}

const ENUMERATE_FILTERS = optionNames<EnumerateFilters>('enumerate', { cationCharges: true, anionCharges: true, cationKinds: true, anionKinds: true, cations: true, anions: true, excludeIons: true, excludeHazards: true, minMolarMass: true, maxMolarMass: true });

/**
 * Every charge-balanced salt of one cation and one anion of the dataset's ion
 * table (anhydrous, the hydrogen ion left out), in table order: cations in
 * the order of the ion table, and for each cation its anions in table order.
 * A cation of charge a and an anion of charge −b combine as b/g cations and
 * a/g anions, g = gcd(a, b), so Al³⁺ and SO₄²⁻ give Al₂(SO₄)₃.
 *
 * The list says nothing about whether a salt exists as a stable solid or
 * dissolves without reacting with water (oxides, sulfides and some
 * carbonates hydrolyse); screening it tells which ones the data can speak
 * for.
 *
 * @param filters - charges, ion kinds, ion lists, hazard classes, molar mass in g/mol
 * @param dataset - the ion and hazards tables (default: built-in)
 * @see data/ions.json for the ions and their sources; formulas written by the conventions of IUPAC, Nomenclature of
 *   Inorganic Chemistry (Recommendations 2005), IR-4.
 * @returns parsed salts, ready for {@link dissolve} or {@link screen}
 * @throws IonheatError `INVALID_ARGUMENT` for a charge outside 1–4 or a non-positive mass; `UNKNOWN_ION` for an ion id not in the table
 * @example
 * ```ts
 * enumerate({ cations: ['K[+]'], anionCharges: [2] }).map((s) => s.formula).slice(0, 3); // ['K2O', 'K2S', 'K2Se']
 * enumerate({ cations: ['Al[3+]'], anions: ['SO4[2-]'] })[0].molarMass; // ≈ 342.15 g/mol
 * enumerate({ cations: ['NH4[+]'], excludeHazards: ['explosive-precursor'] }).some((s) => s.formula === 'NH4NO3'); // false
 * ```
 */
export function enumerate(filters: EnumerateFilters = {}, dataset: Dataset = builtinDataset()): Salt[] {
  if (filters === null || typeof filters !== 'object') throw new IonheatError('INVALID_ARGUMENT', 'the filters of enumerate are an object', { field: 'filters' });
  checkOptionKeys(filters, ENUMERATE_FILTERS, 'options');
  for (const k of ['cationCharges', 'anionCharges', 'cations', 'anions', 'excludeIons', 'cationKinds', 'anionKinds', 'excludeHazards'] as const) {
    const v: unknown = filters[k];
    if (v !== undefined && !Array.isArray(v)) throw new IonheatError('INVALID_ARGUMENT', `${k} must be a list when given, got ${describeValue(v)}`, { field: k });
  }
  checkCharges(filters.cationCharges, 'cationCharges');
  checkCharges(filters.anionCharges, 'anionCharges');
  checkIons(filters.cations, 'cations', dataset);
  checkIons(filters.anions, 'anions', dataset);
  checkIons(filters.excludeIons, 'excludeIons', dataset);
  checkMass(filters.minMolarMass, 'minMolarMass');
  checkMass(filters.maxMolarMass, 'maxMolarMass');
  for (const k of [...(filters.cationKinds ?? []), ...(filters.anionKinds ?? [])]) {
    if (k !== 'monatomic' && k !== 'polyatomic') throw new IonheatError('INVALID_ARGUMENT', `an ion kind for enumerate is "monatomic" or "polyatomic", got ${describeValue(k)}`, { field: 'kinds' });
  }
  for (const h of filters.excludeHazards ?? []) {
    if (!isTerm(HAZARD_CLASSES, h)) throw new IonheatError('INVALID_ARGUMENT', `excludeHazards: ${describeValue(h)} is not a hazard class (known: ${HAZARD_CLASSES.join(', ')})`, { field: 'excludeHazards' });
  }
  const excluded = new Set(filters.excludeIons ?? []);
  const allowed = (ion: IonRecord, ids: readonly string[] | undefined, charges: readonly number[] | undefined, kinds: readonly string[] | undefined): boolean =>
    !excluded.has(ion.id) && (ids === undefined || ids.includes(ion.id)) && (charges === undefined || charges.includes(Math.abs(ion.charge))) && (kinds === undefined || kinds.includes(ion.kind));
  const ions = dataset.records('ions.json');
  const cations = ions.filter((i) => i.charge > 0 && i.id !== NOT_A_SALT_CATION && allowed(i, filters.cations, filters.cationCharges, filters.cationKinds));
  const anions = ions.filter((i) => i.charge < 0 && allowed(i, filters.anions, filters.anionCharges, filters.anionKinds));
  const banned = new Set(filters.excludeHazards ?? []);
  const salts: Salt[] = [];
  for (const cation of cations) {
    for (const anion of anions) {
      const salt = saltOf(cation, anion, dataset);
      if (filters.minMolarMass !== undefined && salt.molarMass < filters.minMolarMass) continue;
      if (filters.maxMolarMass !== undefined && salt.molarMass > filters.maxMolarMass) continue;
      if (banned.size > 0 && saltHazards(salt, dataset).some((r) => r.classes.some((c) => banned.has(c)))) continue;
      salts.push(salt);
    }
  }
  return salts;
}
