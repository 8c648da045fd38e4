/**
 * The index behind the `anchored` basis, built once per dataset: every
 * anhydrous salt of one cation and one anion with a measured or cycle
 * enthalpy of solution and plain lattice estimates (the anchor pool), keyed
 * by its ion pair, and for every ion the other ions of its sign that occur in
 * the pool, nearest first.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { saltRecords } from '../chem/saltRecords.js';
import type { Salt } from '../chem/salt.js';
import type { Estimate } from '../quantity/estimate.js';
import { latticeModels, type LatticeModel } from '../lattice/latticeModel.js';
import { bornRadius } from '../hydration/bornHydration.js';
import { measuredSolutionEnthalpy } from './measuredSolution.js';
import { solutionEnthalpyFromCycle } from './cycleSolution.js';
import { saltLattice } from './saltLattice.js';
import { tableSalts } from './tableSalts.js';
import { saltIonClass, type SaltIonClass } from '../lattice/saltIonClass.js';

/** One anchor: a salt M_aX_b with a known enthalpy of solution. */
export interface AnchorSalt {
  formula: string;
  cation: string;
  anion: string;
  /** Cations and anions per formula unit. */
  cationCount: number;
  anionCount: number;
  /** `z+:|z−|`, e.g. `2:1` for CaCl₂. */
  chargeType: string;
  /** The class of its ions, by which the anchored floors are calibrated. */
  ionClass: SaltIonClass;
  /** Enthalpy of solution, kJ/mol, and its standard uncertainty. */
  value: number;
  u: number;
  basis: 'measured' | 'cycle';
  sources: readonly string[];
  /** Structure type from crystals.json, where given. */
  structure: string | undefined;
  /** Plain lattice enthalpy by estimator, kJ/mol. */
  lattice: ReadonlyMap<LatticeModel, number>;
}

/** How alike two ions of one sign are: 0 for the same ion, larger for less alike. */
export interface Neighbour {
  ion: string;
  distance: number;
}

/** An anchor with its plain lattice enthalpies by estimator as an array, in the order of `latticeModels` (NaN where the estimator does not apply), for the anchor search. */
export interface IndexedAnchor {
  anchor: AnchorSalt;
  lattice: Float64Array;
}

/** A neighbour with its position among the pool's ions of its sign. */
export interface PooledNeighbour extends Neighbour {
  index: number;
}

/**
 * The pool as arrays, for the anchor search: the cations and anions that
 * occur in it numbered, the anchor of every cation–anion pair by number, and
 * every ion's neighbours with their numbers, so that finding the anchors near
 * a target walks arrays instead of looking names up.
 */
export interface AnchorGrid {
  cationIndex: ReadonlyMap<string, number>;
  anionIndex: ReadonlyMap<string, number>;
  /** `byCation[n][y]`: the anchor of pool cation n with pool anion y. */
  byCation: readonly (readonly (IndexedAnchor | undefined)[])[];
  /** `byAnion[x][n]`: the anchor of pool cation n with pool anion x. */
  byAnion: readonly (readonly (IndexedAnchor | undefined)[])[];
  /** {@link AnchorIndex.neighbours} with the neighbours' numbers. */
  neighbours: ReadonlyMap<string, readonly PooledNeighbour[]>;
}

export interface AnchorIndex {
  /** Every anchor, in formula order. */
  anchors: readonly AnchorSalt[];
  /** Anchors by cation, then anion. */
  byIons: ReadonlyMap<string, ReadonlyMap<string, AnchorSalt>>;
  /** For every ion of the table, the other ions of its sign that occur in the pool, nearest first. */
  neighbours: ReadonlyMap<string, readonly Neighbour[]>;
  /** The same pool as arrays, for the search. */
  grid: AnchorGrid;
}

/**
 * Weights of the ion distance (a method choice of ionheat, not published
 * values): radius difference in units of 0.25 Å, squared; 6 for monatomic
 * against polyatomic (a halide carries a covalent lattice excess with Ag⁺ or
 * Tl⁺ that an oxoanion lacks, so AgBr is a poor stand-in for AgNO₃); 3 for a
 * cation with a noble-gas core against one without (d-block and
 * post-transition cations bond more covalently, and the ionic models miss
 * them by more); 4 for the radius term where an ion has no radius. Charge
 * comes before all of these: an ion of another charge is farther than any
 * ion of the same charge (neighbours are ordered by charge first) and its
 * distance carries a further `charge` term. Chosen by leave-one-out over the
 * anchor pool among a handful of settings (kind 1, 3, 6, 10).
 */
export const ION_DISTANCE = { radiusScale: 0.25, charge: 25, kind: 6, core: 3, noRadius: 4 } as const;

const NOBLE_GAS_Z = new Set([2, 10, 18, 36, 54, 86]);

/** A binary salt's single cation and anion, and its charge type, or undefined. */
export function binaryIons(salt: Salt): { cation: string; anion: string; cationCount: number; anionCount: number; chargeType: string } | undefined {
  if (salt.kind !== 'ionic' || salt.ions.length !== 2) return undefined;
  const [c, a] = salt.ions[0]!.charge > 0 ? [salt.ions[0]!, salt.ions[1]!] : [salt.ions[1]!, salt.ions[0]!];
  if (!(c.charge > 0 && a.charge < 0)) return undefined;
  return { cation: c.ion, anion: a.ion, cationCount: c.count, anionCount: a.count, chargeType: `${c.charge}:${-a.charge}` };
}

interface IonFeatures {
  charge: number;
  radius: number | undefined;
  kind: string;
  nobleCore: boolean;
}

function ionFeatures(dataset: Dataset): ReadonlyMap<string, IonFeatures> {
  return dataset.memo('solution.anchorIonFeatures', () => {
    const z = new Map(dataset.records('elements.json').map((e) => [e.symbol, e.z]));
    const out = new Map<string, IonFeatures>();
    for (const ion of dataset.records('ions.json')) {
      if (ion.charge === 0) continue;
      const symbols = Object.keys(ion.composition);
      const nobleCore = ion.kind !== 'monatomic' || (symbols.length === 1 && NOBLE_GAS_Z.has((z.get(symbols[0]!) ?? 0) - ion.charge));
      out.set(ion.id, { charge: ion.charge, radius: bornRadius(ion.id, dataset)?.radius, kind: ion.kind, nobleCore });
    }
    return out;
  });
}


/** The distance between two ions of one sign (see {@link ION_DISTANCE}). */
export function ionDistance(a: string, b: string, dataset: Dataset): number {
  const f = ionFeatures(dataset);
  const x = f.get(a);
  const y = f.get(b);
  if (!x || !y) return Infinity;
  const dr = x.radius !== undefined && y.radius !== undefined ? ((x.radius - y.radius) / ION_DISTANCE.radiusScale) ** 2 : ION_DISTANCE.noRadius;
  return dr + (x.charge !== y.charge ? ION_DISTANCE.charge : 0) + (x.kind !== y.kind ? ION_DISTANCE.kind : 0) + (x.charge > 0 && x.nobleCore !== y.nobleCore ? ION_DISTANCE.core : 0);
}

/**
 * Whether two cations bond alike: both with a noble-gas core, or both
 * without (d-block and post-transition cations, whose covalent lattice
 * excess depends on the anion they meet).
 */
export function cationCoresAlike(a: string, b: string, dataset: Dataset): boolean {
  const f = ionFeatures(dataset);
  return f.get(a)?.nobleCore === f.get(b)?.nobleCore;
}

function byName(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

function gridOf(anchors: readonly AnchorSalt[], inPool: { cation: Set<string>; anion: Set<string> }, neighbours: ReadonlyMap<string, readonly Neighbour[]>): AnchorGrid {
  const cationIndex = new Map([...inPool.cation].map((ion, i) => [ion, i]));
  const anionIndex = new Map([...inPool.anion].map((ion, i) => [ion, i]));
  const byCation: (IndexedAnchor | undefined)[][] = [...inPool.cation].map(() => new Array<IndexedAnchor | undefined>(anionIndex.size).fill(undefined));
  const byAnion: (IndexedAnchor | undefined)[][] = [...inPool.anion].map(() => new Array<IndexedAnchor | undefined>(cationIndex.size).fill(undefined));
  for (const a of anchors) {
    const n = cationIndex.get(a.cation)!;
    const x = anionIndex.get(a.anion)!;
    const entry: IndexedAnchor = { anchor: a, lattice: Float64Array.from(latticeModels, (m) => a.lattice.get(m) ?? Number.NaN) };
    byCation[n]![x] = entry;
    byAnion[x]![n] = entry;
  }
  const pooled = new Map<string, PooledNeighbour[]>();
  for (const [ion, list] of neighbours) pooled.set(ion, list.map((nb) => ({ ...nb, index: (cationIndex.get(nb.ion) ?? anionIndex.get(nb.ion))! })));
  return { cationIndex, anionIndex, byCation, byAnion, neighbours: pooled };
}

/** The anchors of a dataset in formula order, built on first use (the costly part of the index: a lattice enthalpy by every estimator). */
function anchorSalts(dataset: Dataset): readonly AnchorSalt[] {
  return dataset.memo('solution.anchorSalts', () => {
    const salts = tableSalts(dataset);
    const anchors: AnchorSalt[] = [];
    for (const formula of [...salts.keys()].sort(byName)) {
      const salt = salts.get(formula)!;
      if (salt.water > 0) continue;
      const ions = binaryIons(salt);
      if (!ions) continue;
      const known: Estimate | undefined = measuredSolutionEnthalpy(salt, dataset) ?? solutionEnthalpyFromCycle(salt, dataset);
      if (!known) continue;
      const lattice = saltLattice(salt, dataset).anchor;
      if (lattice.size === 0) continue;
      anchors.push({
        formula: salt.formula,
        ...ions,
        ionClass: saltIonClass(salt, dataset),
        value: known.value,
        u: known.u,
        basis: known.basis === 'measured' ? 'measured' : 'cycle',
        sources: known.sources,
        structure: saltRecords('crystals.json', salt, dataset)[0]?.structure,
        lattice,
      });
    }
    return anchors;
  });
}

/** The anchor index of a dataset, built on first use. */
export function anchorIndex(dataset: Dataset): AnchorIndex {
  return dataset.memo('solution.anchorIndex', () => {
    const anchors = anchorSalts(dataset);
    const byIons = new Map<string, Map<string, AnchorSalt>>();
    const inPool = { cation: new Set<string>(), anion: new Set<string>() };
    for (const a of anchors) {
      inPool.cation.add(a.cation);
      inPool.anion.add(a.anion);
      let row = byIons.get(a.cation);
      if (!row) byIons.set(a.cation, (row = new Map()));
      row.set(a.anion, a);
    }
    const neighbours = new Map<string, Neighbour[]>();
    const features = ionFeatures(dataset);
    for (const ion of dataset.records('ions.json')) {
      if (ion.charge === 0) continue;
      const candidates = ion.charge > 0 ? inPool.cation : inPool.anion;
      // Ions of the same charge first, then by distance, then by name; the charge test once per neighbour, not per comparison.
      const ranked: { neighbour: Neighbour; otherCharge: number }[] = [];
      for (const other of candidates) {
        if (other === ion.id) continue;
        const distance = ionDistance(ion.id, other, dataset);
        if (Number.isFinite(distance)) ranked.push({ neighbour: { ion: other, distance }, otherCharge: features.get(other)?.charge === ion.charge ? 0 : 1 });
      }
      ranked.sort((a, b) => a.otherCharge - b.otherCharge || a.neighbour.distance - b.neighbour.distance || byName(a.neighbour.ion, b.neighbour.ion));
      neighbours.set(ion.id, ranked.map((r) => r.neighbour));
    }
    return { anchors, byIons, neighbours, grid: gridOf(anchors, inPool, neighbours) };
  });
}
