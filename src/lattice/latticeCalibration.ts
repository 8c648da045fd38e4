/**
 * Calibration of the lattice estimators against cycle lattice enthalpies:
 * for every built-in salt with a closed Born–Haber cycle, the relative
 * residual e = (ΔH_cycle − ΔH_model)/ΔH_model of each estimator, grouped by
 * charge type, ion kind and the cation's electron core. Built once per
 * dataset, on first use; the sums Σe and Σe² of each group make any
 * leave-one-out statistic an O(1) update.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import { chargeType, type Salt } from '../chem/salt.js';
import { saltRecordIndex } from '../chem/saltRecords.js';
import { isIonheatError } from '../error.js';
import { cycleLatticeEnthalpy } from '../cycle/cycleLatticeEnthalpy.js';
import { latticeModelPoint, latticeModels, type LatticeModel } from './latticeModel.js';
import { studentQuantile975 } from '../numeric/studentQuantile.js';

/** `monatomic` when every ion of the salt is monatomic, else `polyatomic`. */
export type SaltIonKind = 'monatomic' | 'polyatomic';

/**
 * `noble-gas` when every cation has a noble-gas electron configuration
 * (alkali and alkaline-earth metals, Al³⁺, Sc³⁺, Y³⁺, La³⁺, Ti⁴⁺, and the
 * polyatomic NH₄⁺), else `other` (d-block and post-transition cations such
 * as Ag⁺, Cu⁺, Tl⁺, Zn²⁺, Pb²⁺, Fe³⁺). Salts of the second kind have more
 * covalent lattices, which the ionic models underestimate (common practice),
 * so they are calibrated apart.
 */
export type CationCore = 'noble-gas' | 'other';

/** One salt's comparison for one estimator. */
export interface CalibrationResidual {
  formula: string;
  model: LatticeModel;
  /** `1:1`, `2:1`, …, or `mixed` for a salt of several cations or anions. */
  chargeType: string;
  ionKind: SaltIonKind;
  cationCore: CationCore;
  /** Calibration groups the salt belongs to, most specific first, ending with `all`. */
  groups: readonly string[];
  /** The estimator's lattice enthalpy, kJ/mol. */
  estimate: number;
  /** The cycle lattice enthalpy, kJ/mol. */
  reference: number;
  /** Standard uncertainty of the cycle value, kJ/mol. */
  referenceU: number;
  /** (reference − estimate) / estimate. */
  residual: number;
}

/** Count, Σe and Σe² of a group's relative residuals. */
export interface Sums {
  n: number;
  s1: number;
  s2: number;
}

/** One estimator's residuals and group sums. */
export interface ModelCalibration {
  byFormula: Map<string, CalibrationResidual>;
  groups: Map<string, Sums>;
  /** Resolved statistics without exclusion, by `chargeType|ionKind`. */
  resolved: Map<string, CalibrationStats>;
}

/** The calibration of every estimator on one dataset. */
export interface LatticeCalibration {
  residuals: readonly CalibrationResidual[];
  models: ReadonlyMap<LatticeModel, ModelCalibration>;
}

/** The statistics an interval is built from. */
export interface CalibrationStats {
  /** The group used, e.g. `1:1 monatomic noble-gas`, `2:1 other`, `noble-gas` or `all`. */
  group: string;
  /** Salts in the group (after any exclusion). */
  n: number;
  /** Mean relative residual (the bias of the estimator: + means it reads low). */
  bias: number;
  /** Standard deviation of the relative residuals. */
  scatter: number;
  /** t₀.₉₇₅ with n − 1 degrees of freedom. */
  t: number;
}

/** Fewest salts a group must hold (after leaving salts out) to calibrate on its own; smaller groups fall back to a wider one. */
export const MIN_GROUP = 6;

/** The charge type of a salt for calibration (`mixed` for several kinds of cation or anion). */
export function calibrationChargeType(salt: Salt): string {
  return chargeType(salt) ?? 'mixed';
}

/** The ion kind of a salt for calibration. */
export function saltIonKind(salt: Salt, dataset: Dataset): SaltIonKind {
  const ions = dataset.index('ions.json');
  return salt.ions.every((i) => ions.get(i.ion)?.kind === 'monatomic') ? 'monatomic' : 'polyatomic';
}

const NOBLE_GAS_Z = new Set([2, 10, 18, 36, 54, 86]);

/** The electron core class of a salt's cations (see {@link CationCore}). */
export function saltCationCore(salt: Salt, dataset: Dataset): CationCore {
  const cores = dataset.memo('lattice.cationCores', () => {
    const z = new Map(dataset.records('elements.json').map((e) => [e.symbol, e.z]));
    const out = new Map<string, CationCore>();
    for (const ion of dataset.records('ions.json')) {
      if (ion.charge <= 0) continue;
      const symbols = Object.keys(ion.composition);
      if (ion.kind !== 'monatomic') out.set(ion.id, 'noble-gas');
      else out.set(ion.id, symbols.length === 1 && NOBLE_GAS_Z.has((z.get(symbols[0]!) ?? 0) - ion.charge) ? 'noble-gas' : 'other');
    }
    return out;
  });
  for (const i of salt.ions) if (i.charge > 0 && cores.get(i.ion) !== 'noble-gas') return 'other';
  return 'noble-gas';
}

/** The calibration groups of a salt, most specific first. */
export function calibrationGroups(type: string, kind: SaltIonKind, core: CationCore): string[] {
  return [`${type} ${kind} ${core}`, `${type} ${core}`, core, 'all'];
}

function add(groups: Map<string, Sums>, key: string, e: number): void {
  const g = groups.get(key) ?? { n: 0, s1: 0, s2: 0 };
  g.n += 1;
  g.s1 += e;
  g.s2 += e * e;
  groups.set(key, g);
}

/** Every estimator's residual for every calibration salt, in table order (the costly part: a cycle and every estimator per salt). */
function buildResiduals(dataset: Dataset): CalibrationResidual[] {
  const residuals: CalibrationResidual[] = [];
  for (const [formula, records] of saltRecordIndex('compound-formation.json', dataset)) {
    if (!records.some((r) => r.phase === 'cr')) continue;
    let salt: Salt;
    try {
      salt = parseSalt(formula, dataset);
    } catch {
      continue; // water and molecular substances
    }
    if (salt.kind !== 'ionic' || salt.water > 0) continue;
    const cycle = cycleLatticeEnthalpy(salt, dataset);
    if (!cycle) continue;
    const ct = calibrationChargeType(salt);
    const kind = saltIonKind(salt, dataset);
    const core = saltCationCore(salt, dataset);
    const groups = calibrationGroups(ct, kind, core);
    for (const model of latticeModels) {
      let estimate: number;
      try {
        estimate = latticeModelPoint(salt, model, {}, dataset).value;
      } catch (e) {
        if (isIonheatError(e)) continue;
        throw e;
      }
      const residual = (cycle.value - estimate) / estimate;
      residuals.push({ formula: salt.formula, model, chargeType: ct, ionKind: kind, cationCore: core, groups, estimate, reference: cycle.value, referenceU: cycle.u, residual });
    }
  }
  return residuals;
}

/** The residuals by estimator: by formula, and the sums of each group. */
function modelsOf(residuals: readonly CalibrationResidual[]): Map<LatticeModel, ModelCalibration> {
  const models = new Map<LatticeModel, ModelCalibration>();
  for (const model of latticeModels) models.set(model, { byFormula: new Map(), groups: new Map(), resolved: new Map() });
  for (const r of residuals) {
    const m = models.get(r.model)!;
    m.byFormula.set(r.formula, r);
    for (const g of r.groups) add(m.groups, g, r.residual);
  }
  return models;
}

/**
 * The calibration of the lattice estimators on a dataset, computed on first
 * use and kept for the dataset's life: for every anhydrous ionic salt with a
 * closed Born–Haber cycle, each estimator's relative residual
 *
 *   e = (ΔH_L,cycle − ΔH_L,model) / ΔH_L,model
 *
 * (dimensionless; positive where the model reads low), with the group sums
 * n, Σe, Σe² per charge type, ion kind and cation core.
 *
 * @param dataset - the cycle data (formation enthalpies, gaseous ions) and the estimators' inputs (default: built-in)
 * @see the cycle values: Wagman et al. (1982), `wagman1982`, and Cox et al. (1989), `cox1989`; docs/lattice-calibration.md
 *   (written by `npm run calibrate`) for the tables this builds.
 *
 * @example
 * ```ts
 * const r = latticeCalibration().residuals.find((r) => r.formula === 'NaCl' && r.model === 'kapustinskii');
 * r.reference; // ≈ 787 kJ/mol (cycle)
 * r.estimate; // ≈ 744 kJ/mol
 * r.residual; // 0.058 (Kapustinskii reads NaCl 5.8 % low)
 * ```
 */
export function latticeCalibration(dataset: Dataset = builtinDataset()): LatticeCalibration {
  return dataset.memo('lattice.calibration', () => {
    const residuals = dataset.memo('lattice.calibrationResiduals', () => buildResiduals(dataset));
    return { residuals, models: modelsOf(residuals) };
  });
}

function statsOf(group: string, n: number, s1: number, s2: number): CalibrationStats {
  const bias = s1 / n;
  const variance = n > 1 ? Math.max(0, (s2 - n * bias * bias) / (n - 1)) : 0;
  return { group, n, bias, scatter: Math.sqrt(variance), t: studentQuantile975(n - 1) };
}

/**
 * The calibration statistics for a salt in these groups (most specific
 * first, see {@link calibrationGroups}): those of the first group that holds
 * at least {@link MIN_GROUP} salts, else of all salts. `exclude` (canonical
 * formulas) leaves salts out, each in O(1) from the group sums.
 *
 * @returns undefined when fewer than three salts calibrate the estimator
 */
export function calibrationStats(model: LatticeModel, groups: readonly string[], exclude: readonly string[], dataset: Dataset = builtinDataset()): CalibrationStats | undefined {
  const m = latticeCalibration(dataset).models.get(model)!;
  const key = groups[0]!;
  let left: CalibrationResidual[] | undefined;
  for (const formula of exclude) {
    const r = m.byFormula.get(formula);
    if (r && !left?.includes(r)) (left ??= []).push(r);
  }
  const cacheKey = left ? [key, ...left.map((r) => r.formula).sort()].join('|') : key;
  const cached = m.resolved.get(cacheKey);
  if (cached) return cached;
  for (const candidate of groups) {
    const g = m.groups.get(candidate);
    if (!g) continue;
    let { n, s1, s2 } = g;
    for (const r of left ?? []) {
      if (r.groups.includes(candidate)) {
        n -= 1;
        s1 -= r.residual;
        s2 -= r.residual * r.residual;
      }
    }
    if (n < MIN_GROUP && candidate !== 'all') continue;
    if (n < 3) return undefined;
    const stats = statsOf(candidate, n, s1, s2);
    m.resolved.set(cacheKey, stats);
    return stats;
  }
  return undefined;
}
