/**
 * What the pack model needs to know about one salt, gathered once per
 * dataset: its enthalpy of solution at 25 °C, heat capacities, solubility
 * curve and the equilibrium solids that curve names.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { isIonheatError } from '../error.js';
import type { Estimate } from '../quantity/estimate.js';
import { dissolve } from '../solution/dissolve.js';
import { aqueousHeatCapacity, solidHeatCapacity } from './solidHeatCapacity.js';
import type { SolubilityCurve } from './solubilityCurve.js';
import { packSolubility, type PackSolubility } from './saltSolubility.js';

/** An equilibrium solid of a salt's solubility curve. */
export interface PackPhaseData {
  salt: Salt;
  /** ΔsolH at infinite dilution, 25 °C, kJ/mol, when the tables give one. */
  enthalpy: Estimate | undefined;
  /** Cp°, J/(mol·K). */
  heatCapacity: Estimate;
}

/** The data of one salt. */
export interface PackSaltData {
  salt: Salt;
  anhydrousSalt: Salt;
  /** ΔsolH at infinite dilution, 25 °C, kJ/mol (the `best` of {@link dissolve}). */
  enthalpy: Estimate;
  /** Cp° of the solid as written and of its anhydrous crystal, J/(mol·K). */
  heatCapacity: Estimate;
  heatCapacityAnhydrous: Estimate;
  /** Σν·Cp°(ion, aq) of the anhydrous salt, when every ion is tabulated. */
  aqueousHeatCapacity: Estimate | undefined;
  /** The curve a fill dissolves against: measured, or a constant estimate from a solubility product; undefined when unknown. */
  curve: SolubilityCurve | undefined;
  /** How well the solubility is known, and from where. */
  solubility: PackSolubility;
  /** Every equilibrium solid of the curve, by canonical formula. */
  phases: ReadonlyMap<string, PackPhaseData>;
}

function build(salt: Salt, dataset: Dataset): PackSaltData {
  const enthalpy = dissolve(salt, {}, dataset).best;
  const heatCapacity = solidHeatCapacity(salt, dataset);
  const anhydrousSalt = salt.water > 0 ? parseSalt(salt.anhydrous, dataset) : salt;
  const heatCapacityAnhydrous = salt.water > 0 ? solidHeatCapacity(anhydrousSalt, dataset) : heatCapacity;
  const solubility = packSolubility(salt, dataset);
  const curve = solubility.curve;
  const phases = new Map<string, PackPhaseData>();
  for (const point of curve?.points ?? []) {
    if (phases.has(point.phase)) continue;
    if (point.phase === salt.formula) {
      phases.set(point.phase, { salt, enthalpy, heatCapacity });
      continue;
    }
    const phaseSalt = parseSalt(point.phase, dataset);
    let phaseEnthalpy: Estimate | undefined;
    try {
      phaseEnthalpy = dissolve(phaseSalt, {}, dataset).best;
    } catch (e) {
      if (!isIonheatError(e)) throw e;
    }
    phases.set(point.phase, { salt: phaseSalt, enthalpy: phaseEnthalpy, heatCapacity: solidHeatCapacity(phaseSalt, dataset) });
  }
  return { salt, anhydrousSalt, enthalpy, heatCapacity, heatCapacityAnhydrous, aqueousHeatCapacity: aqueousHeatCapacity(anhydrousSalt, dataset), curve, solubility, phases };
}

/**
 * The pack data of a salt, kept per dataset after the first call (a salt
 * without an enthalpy of solution throws every time and is not kept).
 *
 * @throws IonheatError from the formula parser, or `MISSING_DATA` from {@link dissolve}
 * @example
 * ```ts
 * packSaltData(parseSalt('CaCl2')).phases.has('CaCl2·6H2O'); // true
 * ```
 */
export function packSaltData(salt: Salt, dataset: Dataset = builtinDataset()): PackSaltData {
  const cache = dataset.cache<string, PackSaltData>('pack.saltData');
  let data = cache.get(salt.formula);
  if (!data) {
    data = build(salt, dataset);
    cache.set(salt.formula, data);
  }
  return data;
}
