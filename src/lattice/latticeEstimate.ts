/**
 * Lattice enthalpy estimates with honest intervals: each estimator's value
 * with the 95 % interval of its leave-one-out calibration against cycle
 * lattice enthalpies, and a bias-corrected variant of each.
 *
 * Every "lattice" value ionheat reports is the lattice enthalpy ΔH_L at
 * 298.15 K, positive, for crystal → gaseous ions.
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import { describeValue, numberArgument, optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import { saltRecords } from '../chem/saltRecords.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError, isIonheatError, type ErrorCode } from '../error.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { calibrationChargeType, calibrationGroups, calibrationStats, saltCationCore, saltIonKind, type CalibrationStats } from './latticeCalibration.js';
import { latticeModels, PointFailure, prepareLatticeSalt, tryLatticeModelPoint, type LatticeModel, type LatticeModelOptions, type ModelPoint } from './latticeModel.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/** The option names of the lattice estimates. @internal */
export const LATTICE_ESTIMATE_OPTIONS = optionNames<LatticeEstimateOptions>('latticeEstimate', { structure: true, latticeParameter: true, coordination: true, excludeSalt: true });

export { cycleLatticeEnthalpy, type CycleLatticeOptions } from '../cycle/cycleLatticeEnthalpy.js';
export type { LatticeModel, LatticeModelOptions } from './latticeModel.js';

/** An estimator, or its bias-corrected variant (`kapustinskii-corrected`). */
export type LatticeMethod = LatticeModel | `${LatticeModel}-corrected`;

/** Every method, plain estimators first, then their corrected variants. */
export const latticeMethods: readonly LatticeMethod[] = [...latticeModels, ...latticeModels.map((m) => `${m}-corrected` as const)];

/** Options of {@link latticeEstimate}. */
export interface LatticeEstimateOptions extends LatticeModelOptions {
  /**
   * A further salt to leave out of the calibration (the salt estimated is
   * always left out of its own interval), so that a caller can run a
   * leave-one-out check of a quantity built on this estimate.
   */
  excludeSalt?: string;
}

const CORRECTED = '-corrected';

/**
 * The options as a caller passes them, checked: an object whose `structure`
 * and `excludeSalt` are text and whose `latticeParameter` (Å) and
 * `coordination` are finite numbers, else `INVALID_ARGUMENT` naming the field.
 */
function latticeOptions(options: LatticeEstimateOptions | undefined): LatticeEstimateOptions {
  const o = optionsArgument(options, LATTICE_ESTIMATE_OPTIONS);
  for (const k of ['structure', 'excludeSalt'] as const) {
    if (o[k] !== undefined && typeof o[k] !== 'string') throw new IonheatError('INVALID_ARGUMENT', `${k} must be text when given, got ${describeValue(o[k])}`, { field: k });
  }
  if (o.latticeParameter !== undefined) numberArgument(o.latticeParameter, 'latticeParameter', 'the lattice parameter in Å', { min: 0, above: true, max: 1000 });
  if (o.coordination !== undefined) numberArgument(o.coordination, 'coordination', 'the coordination number', { min: 2, max: 14, integer: true });
  return o;
}

function readMethod(method: string): { model: LatticeModel; corrected: boolean } {
  if (typeof method !== 'string') throw new IonheatError('INVALID_ARGUMENT', `a lattice method is a name (known: ${latticeMethods.join(', ')}), got ${describeValue(method)}`, { field: 'method' });
  const corrected = method.endsWith(CORRECTED);
  const model = (corrected ? method.slice(0, -CORRECTED.length) : method) as LatticeModel;
  if (!latticeModels.includes(model)) {
    throw new IonheatError('INVALID_ARGUMENT', `"${method}" is not a lattice method (known: ${latticeMethods.join(', ')})`, { field: 'method', text: method });
  }
  return { model, corrected };
}

/**
 * The lattice enthalpy of a salt by one estimator, with its calibrated 95 %
 * interval, on the `model` basis.
 *
 * The interval comes from the relative residuals e = (ΔH_cycle − ΔH_model)/
 * ΔH_model of the estimator over the built-in salts with a closed cycle, in
 * the salt's group (charge type, ion kind and cation core, falling back to
 * charge type and core, then core, then all salts, when a group has fewer
 * than `MIN_GROUP`), leaving the salt
 * itself out: with bias b, scatter s and n salts, the plain method reports
 * ΔH_model ± t·ΔH_model·√(b² + s²(1 + 1/n)); the corrected method reports
 * ΔH_model·(1 + b) ± t·ΔH_model·s·√(1 + 1/n), t the Student quantile with
 * n − 1 degrees of freedom.
 *
 * @param salt - an anhydrous ionic salt (formula or parsed)
 * @param method - `kapustinskii`, `born-lande`, `born-mayer`, `vbt`, or one of these with `-corrected`
 * @param options - structure, lattice parameter a (Å), coordination number, a further salt to leave out
 * @param dataset - radii (Å), ion volumes (nm³), structures, Born exponents and the cycle data of the calibration (default: built-in)
 * @returns kJ/mol, positive for crystal → gaseous ions
 * @throws IonheatError `NOT_APPLICABLE` (non-electrolyte, hydrate, a structure
 *   that does not fit), `MISSING_DATA` (naming the missing radius, volume,
 *   structure or calibration), `INVALID_ARGUMENT`
 * @see Kapustinskii (1956); Born & Landé (1918); Born & Mayer (1932); Jenkins et al., Inorg. Chem. 38, 3609 (1999).
 * @example
 * ```ts
 * const e = latticeEstimate('NaCl', 'kapustinskii');
 * e.value; // ≈ 744 kJ/mol (cycle: 787)
 * e.low < 787 && 787 < e.high; // true
 * const c = latticeEstimate('NaCl', 'kapustinskii-corrected');
 * c.value; // ≈ 799 (the 1:1 halides' mean bias, +7.4 %, added)
 * c.low < 787 && 787 < c.high; // true
 * ```
 */
export function latticeEstimate(salt: Salt | string, method: LatticeMethod, options: LatticeEstimateOptions = {}, dataset: Dataset = builtinDataset()): Estimate {
  const hit = lookup(saltArgument(salt, dataset), method, latticeOptions(options), dataset);
  if (hit instanceof Error) throw hit;
  return copy(hit);
}

/**
 * {@link latticeEstimate} without the exception: undefined where the method
 * does not apply or lacks data (`NOT_APPLICABLE`, `MISSING_DATA`; the fast
 * path for callers that try many salts). Bad arguments still throw.
 *
 * @param salt - an anhydrous ionic salt (formula or parsed)
 * @param method - one of {@link latticeMethods}
 * @param options - structure, lattice parameter a (Å), coordination number, a further salt to leave out
 * @param dataset - the tables (default: built-in)
 * @returns kJ/mol, or undefined
 * @see the methods' sources at {@link latticeEstimate}: Kapustinskii (1956), `kapustinskii1956`; Born and Landé (1918),
 *   `born1918`; Born and Mayer (1932), `born1932`; Jenkins et al. (1999), `jenkins1999`.
 *
 * @example
 * ```ts
 * tryLatticeEstimate('KNO3', 'born-lande'); // undefined (no structure type for KNO3)
 * tryLatticeEstimate('KNO3', 'kapustinskii')?.method; // 'kapustinskii'
 * tryLatticeEstimate('KNO3', 'kapustinskii')?.value; // ≈ 640 kJ/mol
 * ```
 */
export function tryLatticeEstimate(salt: Salt | string, method: LatticeMethod, options: LatticeEstimateOptions = {}, dataset: Dataset = builtinDataset()): Estimate | undefined {
  const hit = lookup(saltArgument(salt, dataset), method, latticeOptions(options), dataset);
  if (hit instanceof Error) {
    if (hit.code === 'MISSING_DATA' || hit.code === 'NOT_APPLICABLE') return undefined;
    throw hit;
  }
  return copy(hit);
}

const copy = (e: Estimate): Estimate => ({ ...e, sources: e.sources.slice(), notes: e.notes.slice() });

/** The estimate or the error of one method for one salt, computed once per dataset. */
function lookup(s: Salt, method: LatticeMethod, options: LatticeEstimateOptions, dataset: Dataset): Estimate | IonheatError {
  // Estimates are kept per dataset: by method, then by formula (default options) or by formula and options.
  const cache = dataset.cache<string, Estimate | IonheatError>('lattice.estimateCache', CACHE_LIMIT);
  // Only a method name given as text can be a key; anything else is computed (and refused) without being kept.
  const key = typeof method === 'string' ? `${method}|${plainOptions(options) ? s.formula : optionsKey(s.formula, options)}` : undefined;
  let hit = key === undefined ? undefined : cache.get(key);
  if (hit === undefined) {
    try {
      hit = computeEstimate(s, method, options, dataset);
    } catch (e) {
      if (!isIonheatError(e)) throw e;
      hit = e;
    }
    if (key !== undefined) cache.set(key, hit);
  }
  return hit;
}

/** Most estimates kept per dataset (a bounded cache: those not used for longest go first). */
const CACHE_LIMIT = 20_000;

function plainOptions(o: LatticeEstimateOptions): boolean {
  return o.structure === undefined && o.latticeParameter === undefined && o.coordination === undefined && o.excludeSalt === undefined;
}

function optionsKey(formula: string, o: LatticeEstimateOptions): string {
  return `${formula}|${o.structure ?? ''}|${o.latticeParameter ?? ''}|${o.coordination ?? ''}|${o.excludeSalt ?? ''}`;
}

/** The model point of a salt, kept per dataset (it does not depend on what the calibration leaves out). */
function cachedPoint(s: Salt, model: LatticeModel, options: LatticeModelOptions, dataset: Dataset): ModelPoint {
  const cache = dataset.cache<string, ModelPoint | IonheatError>('lattice.pointCache', CACHE_LIMIT);
  const key = `${model}|${s.formula}|${options.structure ?? ''}|${options.latticeParameter ?? ''}|${options.coordination ?? ''}`;
  let hit = cache.get(key);
  if (hit === undefined) {
    const point = tryLatticeModelPoint(s, model, options, dataset, []);
    hit = point instanceof PointFailure ? point.error() : point;
    cache.set(key, hit);
  }
  if (hit instanceof Error) throw hit;
  return hit;
}

/** The canonical formula of a formula the caller typed, kept per dataset. */
function canonicalFormula(text: string, dataset: Dataset): string {
  const cache = dataset.cache<string, string>('lattice.canonicalFormulas', CACHE_LIMIT);
  let f = cache.get(text);
  if (f === undefined) {
    f = parseSalt(text, dataset).formula;
    cache.set(text, f);
  }
  return f;
}

/** The calibrated value and standard uncertainty of a method from its model point: see {@link latticeEstimate}. */
function calibrated(est: number, corrected: boolean, stats: CalibrationStats): { value: number; u: number } {
  const prediction = Math.sqrt(1 + 1 / stats.n);
  const value = corrected ? est * (1 + stats.bias) : est;
  const u = corrected ? Math.abs(est) * stats.scatter * prediction : Math.abs(est) * Math.hypot(stats.bias, stats.scatter * prediction);
  return { value, u };
}

function computeEstimate(s: Salt, method: LatticeMethod, options: LatticeEstimateOptions, dataset: Dataset): Estimate {
  const { model, corrected } = readMethod(method);
  const point = cachedPoint(s, model, options, dataset);
  const exclude = options.excludeSalt !== undefined ? [s.formula, canonicalFormula(options.excludeSalt, dataset)] : [s.formula];
  const groups = calibrationGroups(calibrationChargeType(s), saltIonKind(s, dataset), saltCationCore(s, dataset));
  const stats = calibrationStats(model, groups, exclude, dataset);
  if (!stats) {
    throw new IonheatError('MISSING_DATA', `the ${model} estimator has fewer than three salts with a closed cycle to calibrate its interval in the ${dataset.label} tables`, { text: s.formula, field: 'calibration' });
  }
  const est = point.value;
  const { value, u } = calibrated(est, corrected, stats);
  const pct = (x: number) => `${x >= 0 ? '+' : '−'}${fixedDecimal(Math.abs(100 * x), 1)} %`;
  const notes = [
    `${corrected ? 'bias-corrected; ' : ''}95 % interval from ${stats.n} salts (${stats.group}) with closed cycles, the salt itself left out: bias ${pct(stats.bias)}, scatter ${fixedDecimal(100 * stats.scatter, 1)} %`,
    `lattice energy U = ${+fixedDecimal(point.energy, 1)} kJ/mol before the enthalpy correction to 298.15 K`,
    ...point.notes,
  ];
  return makeEstimate({
    quantity: 'lattice enthalpy',
    value,
    u,
    low: value - stats.t * u,
    high: value + stats.t * u,
    unit: 'kJ/mol',
    basis: 'model',
    method,
    sources: [...point.sources, 'jenkins2005'],
    notes,
  });
}

/**
 * Every lattice method that applies to a salt, with the reason each other
 * method was skipped.
 *
 * @param salt - an anhydrous ionic salt (formula or parsed)
 * @param options - structure, lattice parameter a (Å), coordination number, a further salt to leave out
 * @param dataset - the tables (default: built-in)
 * @returns the estimates (kJ/mol) in the order of {@link latticeMethods}, and each skipped method with the reason
 * @throws IonheatError `NOT_APPLICABLE` for a non-electrolyte or a hydrate
 * @see Kapustinskii (1956), `kapustinskii1956`; Born and Landé (1918), `born1918`; Born and Mayer (1932), `born1932`;
 *   Jenkins et al. (1999), `jenkins1999`; the calibration: docs/lattice-calibration.md.
 *
 * @example
 * ```ts
 * const { estimates, skipped } = latticeEstimates('NaCl');
 * estimates.map((e) => e.method).includes('born-mayer-corrected'); // true
 * estimates.find((e) => e.method === 'vbt-corrected').value; // ≈ 785 kJ/mol (cycle: 787)
 * skipped.length; // 0
 * ```
 */
export function latticeEstimates(
  salt: Salt | string,
  options: LatticeEstimateOptions = {},
  dataset: Dataset = builtinDataset(),
): { estimates: Estimate[]; skipped: { method: LatticeMethod; reason: string }[] } {
  const s = saltArgument(salt, dataset);
  options = latticeOptions(options);
  const estimates: Estimate[] = [];
  const skipped: { method: LatticeMethod; reason: string }[] = [];
  for (const method of latticeMethods) {
    const hit = lookup(s, method, options, dataset);
    if (!(hit instanceof Error)) {
      estimates.push(copy(hit));
      continue;
    }
    if (hit.code === 'NOT_APPLICABLE' && (s.kind !== 'ionic' || s.water > 0)) throw hit;
    if (hit.code !== 'NOT_APPLICABLE' && hit.code !== 'MISSING_DATA') throw hit;
    skipped.push({ method, reason: hit.message });
  }
  return { estimates, skipped };
}

/**
 * A calibrated lattice enthalpy without its notes: the numbers and sources
 * that estimates built on it (the `model` and `anchored` bases of the
 * enthalpy of solution) take from it. The same numbers as
 * {@link latticeEstimate} with default options gives.
 */
export interface LatticeValue {
  method: LatticeMethod;
  /** kJ/mol, positive for crystal → gaseous ions. */
  value: number;
  u: number;
  low: number;
  high: number;
  /** Source keys, in no particular order and possibly repeated (a result built on them sorts them). */
  sources: readonly string[];
}

/** Every method's lattice values for one salt, and why {@link latticeEstimates} would fail for it. */
export interface SaltLatticeValues {
  /** The methods that apply, in the order of {@link latticeMethods}. */
  values: LatticeValue[];
  /**
   * The code of the first failure of a method that is neither
   * `NOT_APPLICABLE` nor `MISSING_DATA` (latticeEstimates would throw it),
   * else undefined.
   */
  fatal: ErrorCode | undefined;
  /** The plain value of each estimator, Kapustinskii's with every radius at coordination 6 (see the anchored basis). */
  plainAtCn6: Map<LatticeModel, number>;
}

/** Each method with the index of its estimator in `latticeModels` and whether it is the corrected variant. */
const METHOD_PARTS: readonly { method: LatticeMethod; model: number; corrected: boolean }[] = latticeMethods.map((method) => {
  const corrected = method.endsWith(CORRECTED);
  return { method, model: latticeModels.indexOf((corrected ? method.slice(0, -CORRECTED.length) : method) as LatticeModel), corrected };
});

/** The interval of a method as makeEstimate checks it; false where makeEstimate would refuse the numbers. */
function valid(value: number, u: number, low: number, high: number): boolean {
  return Number.isFinite(value) && Number.isFinite(u) && u >= 0 && Number.isFinite(low) && Number.isFinite(high) && low <= value && value <= high;
}

/**
 * The lattice values of a salt by every method with default options, and
 * the plain values with Kapustinskii's radii at coordination 6, computed
 * afresh on every call and without notes or errors: the fast path for
 * estimators that build on many salts' lattice enthalpies. Each value is
 * the one {@link latticeEstimate} gives (its value, u and interval; its
 * sources unsorted).
 */
export function saltLatticeValues(s: Salt, dataset: Dataset = builtinDataset()): SaltLatticeValues {
  const values: LatticeValue[] = [];
  const plainAtCn6 = new Map<LatticeModel, number>();
  let fatal: ErrorCode | undefined;
  if (s.kind !== 'ionic' || s.water > 0) return { values, fatal: 'NOT_APPLICABLE', plainAtCn6 };
  const groups = calibrationGroups(calibrationChargeType(s), saltIonKind(s, dataset), saltCationCore(s, dataset));
  const exclude = [s.formula];
  // Without a structure type, Kapustinskii's default radii are those at coordination 6 already.
  const structured = saltRecords('crystals.json', s, dataset)[0]?.structure !== undefined;
  const points: (ModelPoint | PointFailure)[] = [];
  const stats: (CalibrationStats | undefined)[] = [];
  const prepared = prepareLatticeSalt(s, dataset);
  for (const model of latticeModels) {
    const point = tryLatticeModelPoint(s, model, {}, dataset, undefined, prepared);
    const st = point instanceof PointFailure ? undefined : calibrationStats(model, groups, exclude, dataset);
    points.push(point);
    stats.push(st);
    // The plain value at coordination 6 (Kapustinskii) or with default options (the others).
    const at6 = model === 'kapustinskii' && structured ? tryLatticeModelPoint(s, model, { coordination: 6 }, dataset, undefined, prepared) : point;
    if (!(at6 instanceof PointFailure) && st) {
      const { value, u } = calibrated(at6.value, false, st);
      if (valid(value, u, value - st.t * u, value + st.t * u)) plainAtCn6.set(model, unsignedZero(value));
    }
  }
  for (const { method, model: i, corrected } of METHOD_PARTS) {
    const point = points[i]!;
    const st = stats[i];
    let code: ErrorCode | undefined;
    if (point instanceof PointFailure) code = point.code;
    else if (!st) code = 'MISSING_DATA';
    else {
      const { value, u } = calibrated(point.value, corrected, st);
      const low = value - st.t * u;
      const high = value + st.t * u;
      if (valid(value, u, low, high)) {
        values.push({ method, value: unsignedZero(value), u, low, high, sources: [...point.sources, 'jenkins2005'] });
        continue;
      }
      code = 'INVALID_ARGUMENT';
    }
    if (fatal === undefined && code !== 'NOT_APPLICABLE' && code !== 'MISSING_DATA') fatal = code;
  }
  return { values, fatal, plainAtCn6 };
}
