/**
 * A salt's solubility estimated from the solubility products of the
 * `solubility-products.json` table (llnl.dat), for salts without a measured
 * curve: the stable solid at 25 °C is the phase with the lowest solubility.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { SolubilityProductRecord } from '../data/schemas.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { findIon } from '../chem/ionIndex.js';
import { IonheatError, isIonheatError } from '../error.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import { solubilityFromProduct } from './solubilityFromProduct.js';

/**
 * Highest ionic strength of the saturated solution, mol/kg, at which an
 * estimate with activity coefficients of 1 is given (common practice,
 * `solubilityEstimatePractice`): mean activity coefficients there are still
 * within a factor of about 2 of 1 for the charge types of the table.
 */
export const ESTIMATE_IONIC_STRENGTH_LIMIT = 0.1;

/**
 * Standard uncertainty, in log10, of a solubility estimated from Ksp for
 * what the estimate leaves out (activity coefficients, ion pairs, hydrolysis
 * and complexes), by kind of cation. Checked against the CRC table at 25 °C
 * (tests/brine/productSolubility.test.ts): for cations of the s and p blocks
 * (Ca, Sr, Ba, Mg, Pb fluorides, sulfates and halides) the CRC value lies
 * within a factor of 3 of the estimate, so 0.4 (95 %: a factor of 6); for
 * d-block cations fluoride complexes put CoF₂ and NiF₂ a factor of 10–12
 * above it, so 1.0 (95 %: a factor of about 100).
 */
export const ESTIMATE_MODEL_U_LOG10 = { mainGroup: 0.4, dBlock: 1.0 } as const;

/**
 * Cations of this charge or more are not estimated: hydrolysis and
 * complexes dominate, and the CRC table puts AlF₃ and FeF₃ 10³ to 10⁵ times
 * above the ideal figure.
 */
export const UNESTIMATED_CATION_CHARGE = 3;

/** Atomic numbers of the d-block metals (groups 3–12 of periods 4–6, lanthanum aside). */
function isDBlock(z: number): boolean {
  return (z >= 21 && z <= 30) || (z >= 39 && z <= 48) || (z >= 72 && z <= 80);
}

/** What the solubility products say about a salt. */
export interface ProductSolubility {
  /**
   * `estimated` when the saturated solution is dilute enough for the
   * estimate; `too-soluble` when it is not; `unreliable` for a cation of
   * charge 3 or more (see {@link UNESTIMATED_CATION_CHARGE}).
   */
  kind: 'estimated' | 'too-soluble' | 'unreliable';
  /** Grams of anhydrous salt per 100 g of water at 25 °C (ideal estimate). */
  value: number;
  /** Standard uncertainty, g/100 g H2O (from the log10 uncertainty, first order). */
  u: number;
  /** 95 % interval, g/100 g H2O: value ÷ and × 10^(1.96·u(log10 s)). */
  low: number;
  high: number;
  /** Standard uncertainty of log10 s. */
  uLog10: number;
  /** The solid in equilibrium (canonical formula) and its name in the source. */
  solidPhase: string;
  solidWater: number;
  mineral: string;
  /** log10 Ksp used. */
  logKsp: number;
  /** Ionic strength of the saturated solution, mol/kg (ideal). */
  ionicStrength: number;
  source: string;
  fromMemory: boolean;
}

interface Indexed {
  record: SolubilityProductRecord;
  salt: Salt;
}

function buildIndex(dataset: Dataset): ReadonlyMap<string, readonly Indexed[]> {
  const index = new Map<string, Indexed[]>();
  dataset.records('solubility-products.json').forEach((record, i) => {
    let salt: Salt;
    try {
      salt = parseSalt(record.formula, dataset);
    } catch (e) {
      const why = isIonheatError(e) ? e.message : String(e);
      throw new IonheatError('INVALID_DATA', `${dataset.label} table solubility-products.json, record ${i + 1} ("${record.formula}"): ${why}`, { field: `solubility-products.json[${i}].formula` });
    }
    const list = index.get(salt.anhydrous) ?? [];
    list.push({ record, salt });
    index.set(salt.anhydrous, list);
  });
  return index;
}

function estimateOf({ record, salt }: Indexed, anhydrousMolarMass: number, dataset: Dataset): ProductSolubility {
  const [cation, anion] = salt.ions as [Salt['ions'][number], Salt['ions'][number]];
  const { molality, ionicStrength } = solubilityFromProduct(record.value, cation.count, cation.charge, anion.count, anion.charge);
  const nu = cation.count + anion.count;
  const uLogK = dataset.uncertaintyOf('solubility-products.json', record) ?? 0;
  const element = Object.keys(findIon(cation.ion, dataset)?.composition ?? {});
  const z = element.length === 1 ? (dataset.records('elements.json').find((e) => e.symbol === element[0])?.z ?? 0) : 0;
  const uLog10 = Math.hypot(uLogK / nu, isDBlock(z) ? ESTIMATE_MODEL_U_LOG10.dBlock : ESTIMATE_MODEL_U_LOG10.mainGroup);
  const value = (molality * anhydrousMolarMass) / 10;
  const factor = 10 ** (COVERAGE_95 * uLog10);
  return {
    kind: cation.charge >= UNESTIMATED_CATION_CHARGE ? 'unreliable' : ionicStrength <= ESTIMATE_IONIC_STRENGTH_LIMIT ? 'estimated' : 'too-soluble',
    value,
    u: value * Math.LN10 * uLog10,
    low: value / factor,
    high: value * factor,
    uLog10,
    solidPhase: salt.formula,
    solidWater: salt.water,
    mineral: record.mineral,
    logKsp: record.value,
    ionicStrength,
    source: record.source,
    fromMemory: record.fromMemory,
  };
}

/**
 * The solubility of a salt at 25 °C estimated from the least soluble of
 * its phases in the solubility-product table, or undefined when the table
 * has none of them (only salts of one cation and one anion are estimated).
 *
 * @param salt - a parsed salt; its water of crystallization is ignored
 * @param anhydrousMolarMass - g/mol of the anhydrous salt, the mass the value counts
 * @param dataset - the solubility-product table
 * @internal
 */
export function productSolubility(salt: Salt, anhydrousMolarMass: number, dataset: Dataset): ProductSolubility | undefined {
  const candidates = dataset.memo('brine.solubilityProducts', () => buildIndex(dataset)).get(salt.anhydrous);
  if (!candidates || salt.ions.length !== 2) return undefined;
  let best: ProductSolubility | undefined;
  for (const c of candidates) {
    if (c.salt.ions.length !== 2) continue;
    const e = estimateOf(c, anhydrousMolarMass, dataset);
    if (!best || e.value < best.value) best = e;
  }
  return best;
}
