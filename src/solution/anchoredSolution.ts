/**
 * The `anchored` basis: the enthalpy of solution of a salt MX from those of
 * related salts and a lattice-model difference, in which the hydration terms
 * cancel exactly and most of the model's systematic error cancels too.
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import { optionsArgument } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { chargeType, type Salt } from '../chem/salt.js';
import { saltRecords } from '../chem/saltRecords.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { latticeModels, type LatticeModel } from '../lattice/latticeModel.js';
import { anchorIndex, binaryIons, cationCore, type AnchorSalt } from './anchorIndex.js';
import { anchorLattice, saltLattice } from './saltLattice.js';

/** Nearest cations N and nearest anions Y tried per target: at most this many of each, so at most its square of anchor sets. */
export const ANCHOR_NEIGHBOURS = 6;
/**
 * Penalty in the set distance for each anchor whose structure type differs
 * from the target's (both known), for the estimators that ignore structure.
 * Born–Landé and Born–Mayer take only anchors of the target's own structure
 * type: their Madelung constants make the model errors of different
 * structures unlike, so the bracket would not cancel them.
 */
const STRUCTURE_PENALTY = 1;
const SAME_STRUCTURE_ONLY: ReadonlySet<LatticeModel> = new Set(['born-lande', 'born-mayer']);
/** Fewest calibration salts of one charge type that get their own floor; others use the pooled floor. */
const MIN_FLOOR_GROUP = 10;
/**
 * Pseudo-sets of the typical spread mixed into a target's own spread: a
 * target with one or two anchor sets (whose spread says little) is given
 * about the spread its charge type usually shows.
 */
const SPREAD_PRIOR_SETS = 3;

/** One usable anchor set MY, NX, NY for a target MX and what it gives. */
export interface AnchorSet {
  my: AnchorSalt;
  nx: AnchorSalt;
  ny: AnchorSalt;
  /** Coefficients of ΔH(MX) = α·ΔH(MY) + β·ΔH(NX) + γ·ΔH(NY) + [L(MX) − α·L(MY) − β·L(NX) − γ·L(NY)]. */
  alpha: number;
  beta: number;
  gamma: number;
  /** The set's estimate, kJ/mol, and the standard uncertainty from the anchors' values. */
  value: number;
  u: number;
  /** Weight from ion and structure similarity, exp(−D). */
  weight: number;
}

/** The raw combination of every anchor set for one estimator, before the calibrated floor. */
export interface AnchorCombination {
  sets: AnchorSet[];
  /** Weighted mean of the sets, kJ/mol. */
  value: number;
  /** Weighted mean of the sets' data uncertainties, kJ/mol. */
  dataU: number;
  /** Weighted standard deviation of the sets about the mean, kJ/mol. */
  spread: number;
  /** Effective number of sets, (Σw)²/Σw². */
  effectiveSets: number;
  /** The target's plain lattice enthalpy for this estimator, kJ/mol. */
  lattice: number;
}

interface Target {
  formula: string;
  cation: string;
  anion: string;
  cationCount: number;
  anionCount: number;
  structure: string | undefined;
  lattice: ReadonlyMap<LatticeModel, number>;
}

/** The nearest anchors on each side of a target for one estimator: NX with N near M, MY with Y near X. */
interface Sides {
  ns: { distance: number; nx: AnchorSalt; row: ReadonlyMap<string, AnchorSalt> }[];
  ys: { ion: string; distance: number; my: AnchorSalt }[];
}

function sidesOf(target: Target, model: LatticeModel, dataset: Dataset): Sides {
  const { byIons, neighbours } = anchorIndex(dataset);
  const ns: Sides['ns'] = [];
  for (const n of neighbours.get(target.cation) ?? []) {
    const row = byIons.get(n.ion);
    const nx = row?.get(target.anion);
    if (!nx || !nx.lattice.has(model) || nx.formula === target.formula) continue;
    ns.push({ distance: n.distance, nx, row: row! });
    if (ns.length === ANCHOR_NEIGHBOURS) break;
  }
  const ys: Sides['ys'] = [];
  const own = byIons.get(target.cation);
  if (own) {
    for (const y of neighbours.get(target.anion) ?? []) {
      const my = own.get(y.ion);
      if (!my || !my.lattice.has(model) || my.formula === target.formula) continue;
      ys.push({ ion: y.ion, distance: y.distance, my });
      if (ys.length === ANCHOR_NEIGHBOURS) break;
    }
  }
  return { ns, ys };
}

/**
 * Every usable anchor set for a target and one estimator, combined: the
 * nearest {@link ANCHOR_NEIGHBOURS} cations N (with NX known) and anions Y
 * (with MY known), each pair (N, Y) with NY known. For MX = M_pX_q,
 * MY = M_aY_b, NX = N_cX_d, NY = N_eY_f the coefficients α = p/a,
 * β = q/d, γ = −α·b/f make the ions of α·MY + β·NX + γ·NY those of MX,
 * so the hydration enthalpies cancel exactly for any charge types.
 * `keep` collects the sets themselves (for inspection); without it nothing
 * is allocated per set.
 */
function combine(target: Target, model: LatticeModel, dataset: Dataset, keep?: AnchorSet[]): (Omit<AnchorCombination, 'sets'> & { count: number; top: AnchorSet }) | undefined {
  const lt = target.lattice.get(model);
  if (lt === undefined) return undefined;
  const { ns, ys } = sidesOf(target, model, dataset);
  const sameStructure = SAME_STRUCTURE_ONLY.has(model);
  let count = 0;
  let w = 0;
  let wv = 0;
  let wv2 = 0;
  let wu = 0;
  let ww = 0;
  let top: AnchorSet | undefined;
  for (const n of ns) {
    const nx = n.nx;
    const lnx = nx.lattice.get(model)!;
    const beta = target.anionCount / nx.anionCount;
    for (const y of ys) {
      const ny = n.row.get(y.ion);
      if (!ny || ny.formula === target.formula) continue;
      const lny = ny.lattice.get(model);
      if (lny === undefined) continue;
      const my = y.my;
      const alpha = target.cationCount / my.cationCount;
      const gamma = (-alpha * my.anionCount) / ny.anionCount;
      const bracket = lt - alpha * my.lattice.get(model)! - beta * lnx - gamma * lny;
      const value = alpha * my.value + beta * nx.value + gamma * ny.value + bracket;
      const u = Math.hypot(alpha * my.u, beta * nx.u, gamma * ny.u);
      let mismatches = 0;
      if (target.structure !== undefined) {
        if (my.structure !== undefined && my.structure !== target.structure) mismatches++;
        if (nx.structure !== undefined && nx.structure !== target.structure) mismatches++;
        if (ny.structure !== undefined && ny.structure !== target.structure) mismatches++;
      }
      if (sameStructure && (mismatches > 0 || target.structure === undefined)) continue;
      const weight = Math.exp(-(n.distance + y.distance + STRUCTURE_PENALTY * mismatches));
      count++;
      w += weight;
      wv += weight * value;
      wv2 += weight * value * value;
      wu += weight * u;
      ww += weight * weight;
      if (!top || weight > top.weight) top = { my, nx, ny, alpha, beta, gamma, value, u, weight };
      keep?.push({ my, nx, ny, alpha, beta, gamma, value, u, weight });
    }
  }
  if (count === 0 || !top) return undefined;
  const value = wv / w;
  return { count, top, value, dataU: wu / w, spread: Math.sqrt(Math.max(0, wv2 / w - value * value)), effectiveSets: (w * w) / ww, lattice: lt };
}

function targetOf(salt: Salt, dataset: Dataset): Target | undefined {
  if (salt.water > 0) return undefined;
  const ions = binaryIons(salt);
  if (!ions) return undefined;
  const lattice = anchorLattice(salt, dataset);
  return { formula: salt.formula, ...ions, structure: saltRecords('crystals.json', salt, dataset)[0]?.structure, lattice };
}

/** One calibration salt: the floor it needs, relative to its lattice enthalpy. */
interface FloorPoint {
  formula: string;
  /** Calibration groups of the salt, most specific first: `2:1|other`, `2:1`, `*`. */
  keys: string[];
  /** √max(0, (miss/1.96)² − spread_used²) / ΔH_L. */
  needed: number;
}

/** Needed floors sorted ascending, with each formula's position. */
interface FloorGroup {
  needed: number[];
  position: Map<string, number>;
}

/** One estimator's calibration: typical relative spreads and needed floors, by charge type and pooled (`*`). */
interface FloorCalibration {
  typicalSpread: Map<string, number>;
  groups: Map<string, FloorGroup>;
}

function median(values: number[]): number {
  if (values.length === 0) return 0;
  const v = [...values].sort((a, b) => a - b);
  const m = Math.floor(v.length / 2);
  return v.length % 2 ? v[m]! : (v[m - 1]! + v[m]!) / 2;
}

/** The spread used for a combination: its own, shrunk toward the typical spread of its charge type by {@link SPREAD_PRIOR_SETS} pseudo-sets. */
function usedSpread(c: { spread: number; effectiveSets: number; lattice: number }, typicalRelative: number): number {
  const typical = typicalRelative * Math.abs(c.lattice);
  return Math.sqrt((c.effectiveSets * c.spread ** 2 + SPREAD_PRIOR_SETS * typical ** 2) / (c.effectiveSets + SPREAD_PRIOR_SETS));
}

function typicalSpreadOf(calibration: FloorCalibration | undefined, type: string): number {
  return calibration?.typicalSpread.get(type) ?? calibration?.typicalSpread.get('*') ?? 0;
}

/** Per estimator, the floor calibration; built once per dataset. */
function floorGroups(dataset: Dataset): ReadonlyMap<LatticeModel, FloorCalibration> {
  return dataset.memo('solution.anchorFloors', () => {
    const out = new Map<LatticeModel, FloorCalibration>();
    const charges = new Map(dataset.records('ions.json').map((i) => [i.id, i.charge]));
    for (const model of latticeModels) {
      const rows: { a: AnchorSalt; type: string; core: string; c: NonNullable<ReturnType<typeof combine>> }[] = [];
      for (const a of anchorIndex(dataset).anchors) {
        if (!a.lattice.has(model)) continue;
        const c = combine({ formula: a.formula, cation: a.cation, anion: a.anion, cationCount: a.cationCount, anionCount: a.anionCount, structure: a.structure, lattice: a.lattice }, model, dataset);
        if (c) rows.push({ a, type: `${charges.get(a.cation)}:${-(charges.get(a.anion) ?? 0)}`, core: cationCore(a.cation, dataset), c });
      }
      // The typical relative spread, from salts with at least three effective sets.
      const spreads = new Map<string, number[]>();
      for (const { type, c } of rows) {
        if (c.effectiveSets < 3) continue;
        for (const key of ['*', type]) (spreads.get(key) ?? spreads.set(key, []).get(key)!).push(c.spread / Math.abs(c.lattice));
      }
      const typicalSpread = new Map<string, number>();
      for (const [key, list] of spreads) if (key === '*' || list.length >= MIN_FLOOR_GROUP) typicalSpread.set(key, median(list));
      const calibration: FloorCalibration = { typicalSpread, groups: new Map() };
      const points: FloorPoint[] = [];
      for (const { a, type, core, c } of rows) {
        // The anchors' stated uncertainties are not subtracted, so that a wider input never narrows a result.
        const miss = c.value - a.value;
        const needed2 = (miss / COVERAGE_95) ** 2 - usedSpread(c, typicalSpreadOf(calibration, type)) ** 2;
        points.push({ formula: a.formula, keys: [`${type}|${core}`, type, '*'], needed: Math.sqrt(Math.max(0, needed2)) / Math.abs(c.lattice) });
      }
      points.sort((x, y) => x.needed - y.needed || (x.formula < y.formula ? -1 : 1));
      for (const p of points) {
        for (const key of p.keys) {
          let g = calibration.groups.get(key);
          if (!g) calibration.groups.set(key, (g = { needed: [], position: new Map() }));
          g.position.set(p.formula, g.needed.length);
          g.needed.push(p.needed);
        }
      }
      out.set(model, calibration);
    }
    return out;
  });
}

/** The 0.95 quantile of a sorted list with the element at `skip` left out (−1: none), linear between order statistics. */
function quantile95(sorted: readonly number[], skip: number): number {
  const n = sorted.length - (skip >= 0 ? 1 : 0);
  if (n <= 0) return 0;
  const at = (i: number): number => sorted[skip >= 0 && i >= skip ? i + 1 : i]!;
  const h = (n - 1) * 0.95;
  const lo = Math.floor(h);
  const hi = Math.min(n - 1, lo + 1);
  return at(lo) + (h - lo) * (at(hi) - at(lo));
}

/** The calibration group of a target: its charge type and the electron core of its cation. */
export interface FloorGroupKey {
  chargeType: string;
  cationCore: 'noble-gas' | 'other';
}

/**
 * The calibrated floor of an anchored estimate, relative to the target's
 * lattice enthalpy: the 0.95 quantile, over the pool salts of the target's
 * charge type and cation core (else of its charge type, else of all pool
 * salts, whichever first holds ten), of the standard uncertainty beyond the
 * spread of its sets that each would have needed for its 95 % interval to
 * hold its own value (each pool salt estimated from the others); and never
 * less than the largest such need within the smaller, more specific groups
 * passed over. The anchors' stated uncertainties are added on top rather
 * than taken out, which errs wide but keeps a wider input from ever
 * narrowing a result. `excludeFormula` leaves one salt's own miss out
 * (leave-one-out).
 */
export function anchoredFloor(model: LatticeModel, group: FloorGroupKey, options: { excludeFormula?: string } = {}, dataset: Dataset = builtinDataset()): { relative: number; salts: number; group: string } {
  const groups = floorGroups(dataset).get(model)?.groups;
  let atLeast = 0;
  for (const key of [`${group.chargeType}|${group.cationCore}`, group.chargeType, '*']) {
    const g = groups?.get(key);
    if (!g) continue;
    const skip = options.excludeFormula !== undefined ? (g.position.get(options.excludeFormula) ?? -1) : -1;
    const n = g.needed.length - (skip >= 0 ? 1 : 0);
    if (n >= MIN_FLOOR_GROUP || key === '*') {
      const label = key === '*' ? 'all charge types' : key.replace('|', ', cation core ');
      return { relative: Math.max(quantile95(g.needed, skip), atLeast), salts: n, group: atLeast > 0 ? `${label}; at least the largest miss of the salts more like it` : label };
    }
    if (n > 0) atLeast = Math.max(atLeast, g.needed[skip === g.needed.length - 1 ? g.needed.length - 2 : g.needed.length - 1]!);
  }
  return { relative: atLeast, salts: 0, group: 'none' };
}

/**
 * Anchored estimates of the enthalpy of solution of an anhydrous salt of one
 * cation M and one anion X, one per lattice estimator:
 *
 *   ΔH(MX) = α·ΔH(MY) + β·ΔH(NX) + γ·ΔH(NY) + [L(MX) − α·L(MY) − β·L(NX) − γ·L(NY)]
 *
 * over every usable anchor set (MY, NX, NY with measured or cycle values,
 * nearest ions first), combined with weights exp(−D), D the ion distance
 * of N from M and Y from X plus a penalty for each anchor of another
 * structure type. The standard uncertainty is √(u_data² + spread² + f²):
 * the anchors' own uncertainties, the weighted spread of the sets, and a
 * floor f calibrated so that 95 % of the pool salts, each estimated from
 * the others, fall inside their intervals. The salt itself is never an
 * anchor; `excludeMeasured` also leaves its own miss out of the floor.
 *
 * @param salt - an anhydrous salt of one cation and one anion
 * @param options - leave-one-out switches
 * @param options.excludeMeasured - leave the salt's own miss out of the floor calibration
 * @param dataset - measured and cycle enthalpies of solution of the anchor salts, and the lattice estimators' inputs (default: built-in)
 * @returns basis `anchored`, method `anchored-<estimator>`; empty when no set applies
 * @see Jenkins, H. D. B.; Glasser, L. on difference rules in thermochemistry; the four-salt difference is common practice in estimating thermochemical quantities
 * @example
 * ```ts
 * const [e] = anchoredSolutionEnthalpies(parseSalt('KCl'), { excludeMeasured: true });
 * e.basis; // 'anchored'
 * e.low < 17.22 && 17.22 < e.high; // true (CRC: 17.22 kJ/mol)
 * ```
 */
export function anchoredSolutionEnthalpies(salt: Salt, options: { excludeMeasured?: boolean } = {}, dataset: Dataset = builtinDataset()): Estimate[] {
  salt = saltArgument(salt, dataset);
  options = optionsArgument(options);
  const target = targetOf(salt, dataset);
  if (!target) return [];
  const type = chargeType(salt) ?? 'other';
  const group: FloorGroupKey = { chargeType: type, cationCore: cationCore(target.cation, dataset) };
  const out: Estimate[] = [];
  for (const model of latticeModels) {
    const c = combine(target, model, dataset);
    if (!c) continue;
    const floor = anchoredFloor(model, group, options.excludeMeasured ? { excludeFormula: salt.formula } : {}, dataset);
    const f = floor.relative * Math.abs(c.lattice);
    const spread = usedSpread(c, typicalSpreadOf(floorGroups(dataset).get(model), type));
    const u = Math.sqrt(c.dataU ** 2 + spread ** 2 + f ** 2);
    const top = c.top;
    out.push(
      makeEstimate({
        quantity: 'enthalpy of solution',
        value: c.value,
        u,
        unit: 'kJ/mol',
        basis: 'anchored',
        method: `anchored-${model}`,
        sources: [...top.my.sources, ...top.nx.sources, ...top.ny.sources, ...(saltLattice(salt, dataset).get(model)?.sources ?? [])],
        notes: [
          `${c.count} anchor set${c.count === 1 ? '' : 's'} with ${model} lattice differences; the closest: ${top.my.formula} + ${top.nx.formula} − ${top.ny.formula}${top.alpha !== 1 || top.beta !== 1 || top.gamma !== -1 ? ` (coefficients ${+top.alpha.toFixed(3)}, ${+top.beta.toFixed(3)}, ${+top.gamma.toFixed(3)})` : ''}`,
          `u = √(anchors ${c.dataU.toFixed(1)}² + spread ${spread.toFixed(1)}² + floor ${f.toFixed(1)}²) kJ/mol: the sets' own spread ${c.spread.toFixed(1)} (${c.effectiveSets.toFixed(1)} effective sets) mixed with the typical spread of ${type} salts; floor ${(100 * floor.relative).toFixed(2)} % of the lattice enthalpy, calibrated on ${floor.salts} salts (${floor.group})`,
        ],
      }),
    );
  }
  return out;
}

/** The anchor sets behind an anchored estimate, for inspection. */
export function anchorSets(salt: Salt, model: LatticeModel, dataset: Dataset = builtinDataset()): AnchorCombination | undefined {
  const target = targetOf(salt, dataset);
  if (!target) return undefined;
  const sets: AnchorSet[] = [];
  const c = combine(target, model, dataset, sets);
  return c ? { sets, value: c.value, dataU: c.dataU, spread: c.spread, effectiveSets: c.effectiveSets, lattice: c.lattice } : undefined;
}

