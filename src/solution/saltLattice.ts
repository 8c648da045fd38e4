/**
 * The lattice estimates of a salt, every method that applies, computed once
 * per dataset and salt (each estimate costs a calibration look-up and a
 * model evaluation, too much to repeat on every call of `dissolve`).
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { Salt } from '../chem/salt.js';
import { isIonheatError } from '../error.js';
import type { Estimate } from '../quantity/estimate.js';
import { latticeEstimate, latticeEstimates, type LatticeMethod } from '../lattice/latticeEstimate.js';
import { latticeModels, type LatticeModel } from '../lattice/latticeModel.js';

/** Lattice enthalpy by method for an anhydrous ionic salt; empty for anything else or when no method applies. */
export function saltLattice(salt: Salt, dataset: Dataset): ReadonlyMap<LatticeMethod, Estimate> {
  const cache = dataset.memo('solution.saltLattice', () => new Map<string, ReadonlyMap<LatticeMethod, Estimate>>());
  let found = cache.get(salt.formula);
  if (!found) {
    const map = new Map<LatticeMethod, Estimate>();
    if (salt.kind === 'ionic' && salt.water === 0) {
      try {
        for (const e of latticeEstimates(salt, {}, dataset).estimates) map.set(e.method as LatticeMethod, e);
      } catch (e) {
        if (!isIonheatError(e)) throw e;
      }
    }
    found = map;
    cache.set(salt.formula, found);
  }
  return found;
}

/**
 * The plain lattice enthalpies the anchored basis differences, by estimator,
 * cached per dataset and salt. Kapustinskii's equation takes every radius at
 * coordination 6, as Kapustinskii did, so that the four salts of an anchor
 * set are treated alike whatever their structures; the structure-based
 * estimators keep their own structures.
 */
export function anchorLattice(salt: Salt, dataset: Dataset): ReadonlyMap<LatticeModel, number> {
  const cache = dataset.memo('solution.anchorLattice', () => new Map<string, ReadonlyMap<LatticeModel, number>>());
  let found = cache.get(salt.formula);
  if (!found) {
    const map = new Map<LatticeModel, number>();
    if (salt.kind === 'ionic' && salt.water === 0) {
      for (const model of latticeModels) {
        try {
          map.set(model, latticeEstimate(salt, model, model === 'kapustinskii' ? { coordination: 6 } : {}, dataset).value);
        } catch (e) {
          if (!isIonheatError(e)) throw e;
        }
      }
    }
    found = map;
    cache.set(salt.formula, found);
  }
  return found;
}
