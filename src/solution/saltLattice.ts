/**
 * The lattice enthalpies of a salt that the `model` and `anchored` bases of
 * the enthalpy of solution build on: every method that applies, as numbers
 * and sources (see {@link saltLatticeValues}), computed afresh on each call
 * (a few model evaluations and calibration look-ups; `dissolve` keeps what
 * it builds from them per salt).
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { Salt } from '../chem/salt.js';
import { saltLatticeValues, type LatticeMethod, type LatticeValue } from '../lattice/latticeEstimate.js';
import type { LatticeModel } from '../lattice/latticeModel.js';

/** A salt's lattice values by method, and the plain values the anchored basis differences. */
export interface SaltLattice {
  /**
   * Lattice enthalpy by method for an anhydrous ionic salt, in method order;
   * empty for anything else, when no method applies, or when a method fails
   * for a reason other than missing data (as `latticeEstimates` would throw).
   */
  byMethod: ReadonlyMap<LatticeMethod, LatticeValue>;
  /**
   * The plain lattice enthalpies the anchored basis differences, by
   * estimator. Kapustinskii's equation takes every radius at coordination
   * 6, as Kapustinskii did, so that the four salts of an anchor set are
   * treated alike whatever their structures; the structure-based estimators
   * keep their own structures.
   */
  anchor: ReadonlyMap<LatticeModel, number>;
}

/** The lattice values of a salt (see {@link SaltLattice}). */
export function saltLattice(salt: Salt, dataset: Dataset): SaltLattice {
  const { values, fatal, plainAtCn6 } = saltLatticeValues(salt, dataset);
  const byMethod = new Map<LatticeMethod, LatticeValue>();
  if (fatal === undefined) for (const v of values) byMethod.set(v.method, v);
  return { byMethod, anchor: plainAtCn6 };
}
