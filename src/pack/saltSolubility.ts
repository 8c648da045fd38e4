/**
 * `saltSolubility`: how much of a salt water holds at saturation, and how
 * well that is known — measured (the solubility table), estimated (from a
 * solubility product) or unknown — with the curve the pack model uses.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { saltArgument } from '../chem/saltArgument.js';
import { numberArgument } from '../quantity/argumentChecks.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import { productSolubility, ESTIMATE_IONIC_STRENGTH_LIMIT, UNESTIMATED_CATION_CHARGE, type ProductSolubility } from '../brine/productSolubility.js';
import { constantSolubilityCurve, solubilityAt, solubilityCurve, type SolubilityCurve } from './solubilityCurve.js';

/** How well a salt's solubility is known. */
export type SolubilityStatus = 'measured' | 'estimated' | 'unknown';

/**
 * Relative standard uncertainty of a tabulated solubility: the table's own
 * note gives 0.5 % for the best-studied salts and 1–3 % for the others; 2 %
 * covers both. A value from memory gets 5 %.
 */
const TABLE_RELATIVE_U = 0.02;
const FROM_MEMORY_RELATIVE_U = 0.05;

/**
 * Relative standard uncertainty of a measured solubility curve: 2 % for a
 * tabulated value, 5 % for one from memory (see the table's note).
 * @internal
 */
export function measuredSolubilityRelativeU(curve: { fromMemory: boolean }): number {
  return curve.fromMemory ? FROM_MEMORY_RELATIVE_U : TABLE_RELATIVE_U;
}

/** What the pack model and {@link saltSolubility} know of one salt's solubility. @internal */
export interface PackSolubility {
  status: SolubilityStatus;
  /** The curve a fill dissolves against: the table's, or a constant estimate; undefined when unknown. */
  curve: SolubilityCurve | undefined;
  /** The estimate from a solubility product, where one was made (also for `too-soluble`, which leaves the status unknown). */
  product: ProductSolubility | undefined;
  /** One sentence on where the solubility comes from, or why it is unknown. */
  note: string;
}

function describeProduct(p: ProductSolubility): string {
  return `log Ksp ${p.logKsp.toFixed(2)} (${p.mineral}, ${p.solidPhase}; source ${p.source})`;
}

function build(salt: Salt, dataset: Dataset): PackSolubility {
  const table = solubilityCurve(salt, dataset);
  if (table) return { status: 'measured', curve: table, product: undefined, note: `measured: the solubility table (source ${table.source}${table.fromMemory ? ', from memory' : ''})` };
  const anhydrous = salt.water > 0 ? parseSalt(salt.anhydrous, dataset) : salt;
  const product = productSolubility(salt, anhydrous.molarMass, dataset);
  if (product?.kind === 'estimated') {
    const curve = constantSolubilityCurve(salt.anhydrous, product.value, product.solidPhase, product.solidWater, product.source, product.fromMemory);
    return {
      status: 'estimated',
      curve,
      product,
      note: `estimated from ${describeProduct(product)} with activity coefficients of 1: ${product.value.toPrecision(2)} g per 100 g water at 25 °C (95 %: ${product.low.toPrecision(2)}–${product.high.toPrecision(2)}), taken as the same at every temperature; a sparingly soluble salt`,
    };
  }
  if (product?.kind === 'unreliable') {
    return {
      status: 'unknown',
      curve: undefined,
      product,
      note: `unknown: no measured solubility, and for a cation of charge ${UNESTIMATED_CATION_CHARGE} or more the estimate from ${describeProduct(product)} is not given (hydrolysis and complexes make it fail by orders of magnitude)`,
    };
  }
  if (product) {
    return {
      status: 'unknown',
      curve: undefined,
      product,
      note: `unknown: no measured solubility, and ${describeProduct(product)} puts ${salt.anhydrous} among the soluble salts (about ${product.value.toPrecision(2)} g per 100 g water with activity coefficients of 1, ionic strength ${product.ionicStrength.toPrecision(2)} mol/kg, beyond the ${ESTIMATE_IONIC_STRENGTH_LIMIT} mol/kg where that estimate holds)`,
    };
  }
  return { status: 'unknown', curve: undefined, product: undefined, note: `unknown: neither the solubility table nor the solubility products have ${salt.anhydrous}` };
}

/**
 * The solubility of a salt as the pack model uses it, kept per dataset.
 * @internal
 */
export function packSolubility(salt: Salt, dataset: Dataset = builtinDataset()): PackSolubility {
  const cache = dataset.cache<string, PackSolubility>('pack.solubility');
  let known = cache.get(salt.anhydrous);
  if (!known) {
    known = build(salt, dataset);
    cache.set(salt.anhydrous, known);
  }
  return known;
}

/** What {@link saltSolubility} returns. */
export interface SaltSolubility {
  /** Canonical anhydrous formula: the mass the value counts. */
  formula: string;
  /** °C. */
  temperature: number;
  status: SolubilityStatus;
  /** Grams of anhydrous salt per 100 g of water at saturation; null when unknown. */
  value: number | null;
  /** Standard uncertainty, g/100 g H2O; null when unknown. */
  u: number | null;
  /** 95 % interval, g/100 g H2O; null when unknown. */
  low: number | null;
  high: number | null;
  unit: 'g/100 g H2O';
  /** The solid in equilibrium with the saturated solution; null when unknown. */
  solidPhase: string | null;
  /** `table` (measured curve), `solubility-product` (estimate) or `none`. */
  method: 'table' | 'solubility-product' | 'none';
  source: string | null;
  fromMemory: boolean | null;
  /** True when t lies outside the measured curve, or the estimate is used away from 25 °C. */
  extrapolated: boolean;
  note: string;
}

/**
 * The solubility of a salt at temperature t, and how well it is known:
 *
 * - `measured`: interpolated in the solubility table (CRC and others), with
 *   a standard uncertainty of 2 % (5 % for values from memory);
 * - `estimated`: from the least soluble phase of the salt in the
 *   solubility-product table (llnl.dat), s = (Ksp/(aᵃ·bᵇ))^(1/(a+b)) mol/kg
 *   with activity coefficients of 1 ({@link solubilityFromProduct}), given
 *   only while the ionic strength of the saturated solution stays at or
 *   below 0.1 mol/kg; u(log10 s) = √((u(log Ksp)/(a+b))² + 0.4²), and the
 *   25 °C value is taken at every temperature;
 * - `unknown`: anything else (the note says whether the solubility products
 *   put the salt among the soluble ones).
 *
 * @param salt - a formula or a parsed salt; its water of crystallization is ignored
 * @param t - temperature, °C (default 25)
 * @param dataset - the solubility and solubility-product tables (default: built-in)
 * @returns grams of anhydrous salt per 100 g of water, with status, interval, solid and source
 * @see the CRC table, `crcSolubility`; llnl.dat, `llnlDat`; the ideal estimate, `solubilityEstimatePractice`; docs/methods.md, "Solubility".
 * @example
 * ```ts
 * saltSolubility('KNO3', 20).value; // 31.93 (CRC)
 * saltSolubility('AgCl').status; // 'estimated'
 * saltSolubility('AgCl').value; // ≈ 1.92e-4 g per 100 g water (llnl.dat log Ksp −9.75)
 * saltSolubility('ScF3').status; // 'unknown'
 * ```
 */
export function saltSolubility(salt: string | Salt, t = 25, dataset: Dataset = builtinDataset()): SaltSolubility {
  const parsed = saltArgument(salt, dataset);
  t = numberArgument(t, 't', 'the temperature in °C', { min: -100, max: 200 });
  const known = packSolubility(parsed, dataset);
  const base = { formula: parsed.anhydrous, temperature: t, status: known.status, unit: 'g/100 g H2O' as const, note: known.note };
  if (known.status === 'unknown' || !known.curve) {
    return { ...base, value: null, u: null, low: null, high: null, solidPhase: null, method: 'none', source: null, fromMemory: null, extrapolated: false };
  }
  const at = solubilityAt(known.curve, t);
  if (known.status === 'estimated') {
    const p = known.product!;
    return { ...base, value: p.value, u: p.u, low: p.low, high: p.high, solidPhase: p.solidPhase, method: 'solubility-product', source: p.source, fromMemory: p.fromMemory, extrapolated: t !== 25 };
  }
  const u = at.value * measuredSolubilityRelativeU(known.curve);
  return {
    ...base,
    value: at.value,
    u,
    low: Math.max(0, at.value - COVERAGE_95 * u),
    high: at.value + COVERAGE_95 * u,
    solidPhase: at.phase,
    method: 'table',
    source: known.curve.source,
    fromMemory: known.curve.fromMemory,
    extrapolated: at.extrapolated,
  };
}
