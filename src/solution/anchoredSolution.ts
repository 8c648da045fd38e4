/**
 * The `anchored` basis: the enthalpy of solution of a salt MX from those of
 * related salts and a lattice-model difference, in which the hydration terms
 * cancel exactly and most of the model's systematic error cancels too.
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import { optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { chargeType, type Salt } from '../chem/salt.js';
import { saltRecords } from '../chem/saltRecords.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { latticeModels, type LatticeModel } from '../lattice/latticeModel.js';
import { anchorIndex, binaryIons, cationCoresAlike, type AnchorSalt, type IndexedAnchor } from './anchorIndex.js';
import { saltIonClass, type SaltIonClass } from '../lattice/saltIonClass.js';
import { saltLattice, type SaltLattice } from './saltLattice.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';
import { quantile } from '../numeric/quantile.js';

const ANCHORED_OPTIONS = optionNames<{ excludeMeasured?: boolean }>('anchoredSolutionEnthalpies', { excludeMeasured: true });

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
 * The quantile of |miss|/(1.96·spread) over a calibration group that scales
 * the spread down where the pool shows it overstates the misses. Above 0.95
 * because `dissolve` returns the most precise of several anchored
 * estimates, and picking the narrowest of several intervals holds its
 * value less often than each does alone; 0.975 brought the 2:1 salts back
 * above 90 % coverage in the leave-one-out validation, 0.95 did not.
 */
const SPREAD_SCALE_QUANTILE = 0.975;
/** Fewest pool salts of one charge type that fit their own bracket scale; others use the pooled scale. */
const MIN_SCALE_GROUP = 5;
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
  chargeType: string;
  structure: string | undefined;
  lattice: ReadonlyMap<LatticeModel, number>;
}

/**
 * The nearest anchors on each side of a target: NX with N near M, MY with Y
 * near X, in neighbour order, as many as the estimators asked for need
 * (each takes the first {@link ANCHOR_NEIGHBOURS} of each side for which it
 * has lattice enthalpies).
 */
interface Sides {
  ns: { distance: number; nx: IndexedAnchor; row: readonly (IndexedAnchor | undefined)[] }[];
  ys: { index: number; distance: number; my: IndexedAnchor }[];
}

/** True when every estimator of `models` has found `ANCHOR_NEIGHBOURS` on a side, of every kind of anchor asked for. */
function enough(found: readonly number[][], models: readonly number[]): boolean {
  for (const kind of found) for (const m of models) if (kind[m]! < ANCHOR_NEIGHBOURS) return false;
  return true;
}

/**
 * How anchor sets are chosen: `same`, all four salts of the target's charge
 * type; `cross`, the fallback for a salt with no set of its own charge type,
 * sets in which at least one anchor is of another charge type (Kapustinskii
 * differences only, see {@link CROSS_MODEL}).
 */
export type SetMode = 'same' | 'cross';

/**
 * The one estimator whose form holds across charge types:
 * Kapustinskii's equation, 1202.5·ν·|z₊z₋|/(r₊ + r₋)·(1 − 0.345/(r₊ + r₋)),
 * has the same constants for every charge type, whereas the volume-based
 * equation fits its coefficients to each charge type and the Born–Landé and
 * Born–Mayer Madelung constants belong to one structure.
 */
const CROSS_MODEL = latticeModels.indexOf('kapustinskii');

function sidesOf(target: Target, models: readonly number[], dataset: Dataset, mode: SetMode): Sides {
  const { cationIndex, anionIndex, byCation, byAnion, neighbours } = anchorIndex(dataset).grid;
  // found[kind][model]: anchors taken so far of the target's charge type (0) and, in cross mode, of another (1).
  const kinds = mode === 'cross' ? 2 : 1;
  const found = Array.from({ length: kinds }, () => [0, 0, 0, 0]);
  const take = (a: IndexedAnchor): boolean => {
    const kind = a.anchor.chargeType === target.chargeType ? 0 : 1;
    if (kind >= kinds) return false;
    let useful = false;
    for (const m of models) {
      if (Number.isNaN(a.lattice[m]!) || found[kind]![m]! >= ANCHOR_NEIGHBOURS) continue;
      found[kind]![m]!++;
      useful = true;
    }
    return useful;
  };
  const ns: Sides['ns'] = [];
  // The anchors N_X of every pool cation N with the target's anion X.
  const x = anionIndex.get(target.anion);
  const withX = x === undefined ? undefined : byAnion[x]!;
  for (const n of (withX && neighbours.get(target.cation)) || []) {
    const nx = withX![n.index];
    if (!nx || nx.anchor.formula === target.formula) continue;
    // Across charge types a d-block cation's covalent excess differs with the anion's charge, so N must bond like M.
    if (mode === 'cross' && !cationCoresAlike(n.ion, target.cation, dataset)) continue;
    if (take(nx)) ns.push({ distance: n.distance, nx, row: byCation[n.index]! });
    if (enough(found, models)) break;
  }
  const ys: Sides['ys'] = [];
  const m = cationIndex.get(target.cation);
  if (m !== undefined) {
    const own = byCation[m]!;
    for (const kind of found) kind.fill(0);
    for (const y of neighbours.get(target.anion) ?? []) {
      const my = own[y.index];
      if (!my || my.anchor.formula === target.formula) continue;
      if (take(my)) ys.push({ index: y.index, distance: y.distance, my });
      if (enough(found, models)) break;
    }
  }
  return { ns, ys };
}

/**
 * Weighted moments of the sets' anchor sums b = α·ΔH(MY) + β·ΔH(NX) + γ·ΔH(NY)
 * and lattice brackets r, from which the value and spread follow for any
 * scale k of the bracket ({@link atScale}).
 */
interface Moments {
  b: number;
  r: number;
  bb: number;
  rr: number;
  br: number;
}

type Combination = Omit<AnchorCombination, 'sets'> & { count: number; top: AnchorSet; moments: Moments };

/** The combined value and spread of the sets with every bracket scaled by k: v = b + k·r. */
function atScale(c: Combination, k: number): { value: number; spread: number } {
  const m = c.moments;
  const value = m.b + k * m.r;
  return { value, spread: Math.sqrt(Math.max(0, m.bb + 2 * k * m.br + k * k * m.rr - value * value)) };
}

/** Slots per anchor set in the scratch of {@link combine}: state (undefined unseen, 1 no NY, 2 seen), γ, u, structure mismatches, weight (NaN until needed). */
const PART = 5;

/**
 * Every usable anchor set for a target and each estimator asked for,
 * combined: the nearest {@link ANCHOR_NEIGHBOURS} cations N (with NX known)
 * and anions Y (with MY known), each pair (N, Y) with NY known. N has the
 * charge of M and Y that of X, so all four salts share one charge type (see
 * {@link anchoredSolutionEnthalpies} for why). For MX = M_pX_q, MY = M_aY_b,
 * NX = N_cX_d, NY = N_eY_f the coefficients α = p/a, β = q/d, γ = −α·b/f make
 * the ions of α·MY + β·NX + γ·NY those of MX, so the hydration enthalpies
 * cancel exactly (with one charge type, α = β = −γ = 1).
 * What does not depend on the estimator (coefficients, the anchors' data
 * uncertainty, the weight) is worked out once per set and shared by the
 * estimators. `keep` collects the sets themselves (for inspection, one
 * estimator); without it nothing is allocated per set.
 */
function combine(target: Target, models: readonly number[], dataset: Dataset, mode: SetMode, keep?: AnchorSet[]): (Combination | undefined)[] {
  const out: (Combination | undefined)[] = [];
  const lts = models.map((m) => target.lattice.get(latticeModels[m]!));
  const wanted = models.filter((_, i) => lts[i] !== undefined);
  if (wanted.length === 0) return out;
  const { ns, ys } = sidesOf(target, wanted, dataset, mode);
  const cross = mode === 'cross';
  const perSide = cross ? 2 * ANCHOR_NEIGHBOURS : ANCHOR_NEIGHBOURS;
  // Filled as sets are met (a plain array: a typed array costs more to allocate than the few sets it would hold).
  const parts: number[] = new Array<number>(ns.length * ys.length * PART);
  for (let k = 0; k < models.length; k++) {
    const m = models[k]!;
    const lt = lts[k];
    if (lt === undefined) continue;
    const sameStructure = SAME_STRUCTURE_ONLY.has(latticeModels[m]!);
    let count = 0;
    let w = 0;
    let wb = 0;
    let wr = 0;
    let wbb = 0;
    let wrr = 0;
    let wbr = 0;
    let wu = 0;
    let ww = 0;
    let top: AnchorSet | undefined;
    let takenN = 0;
    for (let i = 0; i < ns.length && takenN < perSide; i++) {
      const n = ns[i]!;
      const nx = n.nx;
      const lnx = nx.lattice[m]!;
      if (Number.isNaN(lnx)) continue;
      takenN++;
      const beta = target.anionCount / nx.anchor.anionCount;
      let takenY = 0;
      for (let j = 0; j < ys.length && takenY < perSide; j++) {
        const y = ys[j]!;
        const my = y.my;
        const lmy = my.lattice[m]!;
        if (Number.isNaN(lmy)) continue;
        takenY++;
        const at = (i * ys.length + j) * PART;
        if (parts[at] === undefined) {
          const ny = n.row[y.index];
          if (!ny || ny.anchor.formula === target.formula) parts[at] = 1;
          else {
            const alpha = target.cationCount / my.anchor.cationCount;
            const gamma = (-alpha * my.anchor.anionCount) / ny.anchor.anionCount;
            let mismatches = 0;
            if (target.structure !== undefined) {
              if (my.anchor.structure !== undefined && my.anchor.structure !== target.structure) mismatches++;
              if (nx.anchor.structure !== undefined && nx.anchor.structure !== target.structure) mismatches++;
              if (ny.anchor.structure !== undefined && ny.anchor.structure !== target.structure) mismatches++;
            }
            parts[at] = 2;
            parts[at + 1] = gamma;
            parts[at + 2] = Math.hypot(alpha * my.anchor.u, beta * nx.anchor.u, gamma * ny.anchor.u);
            parts[at + 3] = mismatches;
            parts[at + 4] = Number.NaN;
          }
        }
        if (parts[at] === 1) continue;
        const ny = n.row[y.index]!;
        const lny = ny.lattice[m]!;
        if (Number.isNaN(lny)) continue;
        const mismatches = parts[at + 3]!;
        if (sameStructure && (mismatches > 0 || target.structure === undefined)) continue;
        // A cross set must span charge types: a set of the target's own type belongs to the same mode.
        if (cross && my.anchor.chargeType === target.chargeType && nx.anchor.chargeType === target.chargeType && ny.anchor.chargeType === target.chargeType) continue;
        const alpha = target.cationCount / my.anchor.cationCount;
        const gamma = parts[at + 1]!;
        const u = parts[at + 2]!;
        const bracket = lt - alpha * lmy - beta * lnx - gamma * lny;
        const sum = alpha * my.anchor.value + beta * nx.anchor.value + gamma * ny.anchor.value;
        const value = sum + bracket;
        let weight = parts[at + 4]!;
        if (Number.isNaN(weight)) parts[at + 4] = weight = Math.exp(-(n.distance + y.distance + STRUCTURE_PENALTY * mismatches));
        count++;
        w += weight;
        wb += weight * sum;
        wr += weight * bracket;
        wbb += weight * sum * sum;
        wrr += weight * bracket * bracket;
        wbr += weight * sum * bracket;
        wu += weight * u;
        ww += weight * weight;
        if (!top || weight > top.weight) top = { my: my.anchor, nx: nx.anchor, ny: ny.anchor, alpha, beta, gamma, value, u, weight };
        keep?.push({ my: my.anchor, nx: nx.anchor, ny: ny.anchor, alpha, beta, gamma, value, u, weight });
      }
    }
    if (count === 0 || !top) continue;
    const moments: Moments = { b: wb / w, r: wr / w, bb: wbb / w, rr: wrr / w, br: wbr / w };
    const c: Combination = { count, top, moments, value: 0, spread: 0, dataU: wu / w, effectiveSets: (w * w) / ww, lattice: lt };
    Object.assign(c, atScale(c, 1));
    out[k] = c;
  }
  return out;
}

/** Index of every estimator in `latticeModels`, for {@link combine}. */
const ALL_MODELS: readonly number[] = latticeModels.map((_, i) => i);

function targetOf(salt: Salt, lattice: () => SaltLattice, dataset: Dataset): Target | undefined {
  if (salt.water > 0) return undefined;
  const ions = binaryIons(salt);
  if (!ions) return undefined;
  return { formula: salt.formula, ...ions, structure: saltRecords('crystals.json', salt, dataset)[0]?.structure, lattice: lattice().anchor };
}

/** One calibration salt: the floor it needs, relative to its lattice enthalpy. */
interface FloorPoint {
  formula: string;
  /** Calibration groups of the salt, most specific first: `2:1|other`, `2:1`, `*`. */
  keys: string[];
  /** √max(0, (miss/1.96)² − spread_used²) / ΔH_L. */
  needed: number;
  /** |miss| / (1.96·spread_used): below 1, the spread alone would have held the salt with room to spare. */
  ratio: number;
}

/** Needed floors sorted ascending, with each formula's position. */
interface FloorGroup {
  needed: Ranked;
  /** |miss| / (1.96·spread used) of each salt. */
  ratios: Ranked;
}

/** One quantity of a group's salts, sorted ascending, with each formula's position. */
interface Ranked {
  values: number[];
  position: Map<string, number>;
}

/** Adds one quantity of every point to the sorted lists of the point's groups. */
function rankInto(points: readonly FloorPoint[], value: (p: FloorPoint) => number, list: (key: string) => Ranked): void {
  const sorted = [...points].sort((x, y) => value(x) - value(y) || (x.formula < y.formula ? -1 : 1));
  for (const p of sorted) {
    for (const key of p.keys) {
      const l = list(key);
      l.position.set(p.formula, l.values.length);
      l.values.push(value(p));
    }
  }
}

/** Least-squares sums of the bracket scale over the pool salts of one group, and each salt's own terms (to leave it out). */
interface ScaleSums {
  xy: number;
  xx: number;
  own: Map<string, { xy: number; xx: number }>;
}

/** One estimator's calibration: bracket scales, typical relative spreads and needed floors, by charge type and pooled (`*`). */
interface FloorCalibration {
  scale: Map<string, ScaleSums>;
  typicalSpread: Map<string, number>;
  groups: Map<string, FloorGroup>;
}

/**
 * The scale k of an estimator's lattice brackets for a charge type: the
 * least-squares fit of ΔH(pool salt) − b = k·r over the pool salts of that
 * type (b the weighted anchor sum, r the weighted bracket, each salt
 * estimated from the others), leaving out `excludeFormula`, kept within
 * [0, 2]. Where a model overstates the differences between salts (the
 * volume-based equation, and Kapustinskii on 2:2 salts) k < 1 shrinks them
 * toward ion additivity (k = 0 drops the bracket); where it understates them
 * (Kapustinskii at coordination 6 on 1:1 salts) k > 1. Pooled over every
 * charge type where the type has fewer than {@link MIN_SCALE_GROUP} salts.
 * Fitting k per ion class as well was tried and did worse under leave-one-out.
 */
function bracketScale(calibration: FloorCalibration | undefined, type: string, excludeFormula: string | undefined): { k: number; salts: number; group: string } {
  for (const key of [type, '*']) {
    const g = calibration?.scale.get(key);
    if (!g) continue;
    const own = excludeFormula !== undefined ? g.own.get(excludeFormula) : undefined;
    const n = g.own.size - (own ? 1 : 0);
    if (n < MIN_SCALE_GROUP && key !== '*') continue;
    const xx = g.xx - (own?.xx ?? 0);
    const xy = g.xy - (own?.xy ?? 0);
    return { k: xx > 0 ? Math.min(2, Math.max(0, xy / xx)) : 1, salts: n, group: key === '*' ? 'all charge types' : type };
  }
  return { k: 1, salts: 0, group: 'none' };
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

/**
 * Per estimator, the floor calibration of one way of choosing sets; built
 * once per dataset. In `cross` mode every pool salt is estimated from sets
 * that span charge types only, as a salt without sets of its own type is.
 */
function floorGroups(dataset: Dataset, mode: SetMode = 'same'): ReadonlyMap<LatticeModel, FloorCalibration> {
  return dataset.memo(`solution.anchorFloors.${mode}`, () => {
    const out = new Map<LatticeModel, FloorCalibration>();
    for (const [mi, model] of latticeModels.entries()) {
      if (mode === 'cross' && mi !== CROSS_MODEL) continue;
      const rows: { a: AnchorSalt; type: string; c: Combination }[] = [];
      for (const a of anchorIndex(dataset).anchors) {
        if (!a.lattice.has(model)) continue;
        const [c] = combine({ formula: a.formula, cation: a.cation, anion: a.anion, cationCount: a.cationCount, anionCount: a.anionCount, chargeType: a.chargeType, structure: a.structure, lattice: a.lattice }, [mi], dataset, mode);
        if (c) rows.push({ a, type: a.chargeType, c });
      }
      const calibration: FloorCalibration = { scale: new Map(), typicalSpread: new Map(), groups: new Map() };
      for (const { a, type, c } of rows) {
        const xy = c.moments.r * (a.value - c.moments.b);
        const xx = c.moments.r ** 2;
        for (const key of ['*', type]) {
          let g = calibration.scale.get(key);
          if (!g) calibration.scale.set(key, (g = { xy: 0, xx: 0, own: new Map() }));
          g.xy += xy;
          g.xx += xx;
          g.own.set(a.formula, { xy, xx });
        }
      }
      // Each pool salt as its own estimate would be, with its own value out of the bracket scale.
      const scaled = rows.map(({ a, type, c }) => ({ a, type, c: { ...c, ...atScale(c, bracketScale(calibration, type, a.formula).k) } }));
      // The typical relative spread, from salts with at least three effective sets.
      const spreads = new Map<string, number[]>();
      for (const { type, c } of scaled) {
        if (c.effectiveSets < 3) continue;
        for (const key of ['*', type]) (spreads.get(key) ?? spreads.set(key, []).get(key)!).push(c.spread / Math.abs(c.lattice));
      }
      for (const [key, list] of spreads) if (key === '*' || list.length >= MIN_FLOOR_GROUP) calibration.typicalSpread.set(key, median(list));
      const points: FloorPoint[] = [];
      for (const { a, type, c } of scaled) {
        // The anchors' stated uncertainties are not subtracted, so that a wider input never narrows a result.
        const miss = c.value - a.value;
        const spread = usedSpread(c, typicalSpreadOf(calibration, type));
        const needed2 = (miss / COVERAGE_95) ** 2 - spread ** 2;
        points.push({ formula: a.formula, keys: [`${type}|${a.ionClass}`, type, '*'], needed: Math.sqrt(Math.max(0, needed2)) / Math.abs(c.lattice), ratio: spread > 0 ? Math.abs(miss) / (COVERAGE_95 * spread) : Infinity });
      }
      const group = (key: string): FloorGroup => {
        let g = calibration.groups.get(key);
        if (!g) calibration.groups.set(key, (g = { needed: { values: [], position: new Map() }, ratios: { values: [], position: new Map() } }));
        return g;
      };
      rankInto(points, (p) => p.needed, (key) => group(key).needed);
      rankInto(points, (p) => p.ratio, (key) => group(key).ratios);
      out.set(model, calibration);
    }
    return out;
  });
}

/** The calibration group of a target: its charge type and the class of its ions. */
export interface FloorGroupKey {
  chargeType: string;
  ionClass: SaltIonClass;
}

/**
 * The calibrated floor of an anchored estimate, relative to the target's
 * lattice enthalpy: the 0.95 quantile, over the pool salts of the target's
 * charge type and cation core (else of its charge type, else of all pool
 * salts, whichever first holds ten), of the standard uncertainty beyond the
 * spread of its sets that each would have needed for its 95 % interval to
 * hold its own value (each pool salt estimated from the others); and never
 * less than the largest such need within the smaller, more specific groups
 * passed over, as seen by any estimator (a small group is small for each of
 * them, and the structure-bound ones see fewer of its salts). The anchors' stated uncertainties are added on top rather
 * than taken out, which errs wide but keeps a wider input from ever
 * narrowing a result. `excludeFormula` leaves one salt's own miss out
 * (leave-one-out). `mode` `cross` gives the floor of the sets that span
 * charge types (see {@link anchoredEstimates}).
 *
 * Where the spread alone overstates the misses, the floor is zero and the
 * spread itself is scaled down: `spreadScale` κ = min(1, the
 * {@link SPREAD_SCALE_QUANTILE} quantile of |miss|/(1.96·spread) over the same
 * group, and at least the largest such ratio of the smaller groups passed
 * over). The anchors' own uncertainties are never scaled.
 */
export function anchoredFloor(model: LatticeModel, group: FloorGroupKey, options: { excludeFormula?: string; mode?: SetMode } = {}, dataset: Dataset = builtinDataset()): { relative: number; spreadScale: number; salts: number; group: string } {
  const groups = floorGroups(dataset, options.mode).get(model)?.groups;
  let atLeast = 0;
  let ratioAtLeast = 0;
  /** Where the salt left out sits in a list (−1: not in it, or nothing left out). */
  const skipOf = (r: Ranked): number => (options.excludeFormula !== undefined ? (r.position.get(options.excludeFormula) ?? -1) : -1);
  /** The largest of a list with the salt left out; undefined when nothing is left. */
  const largest = (r: Ranked): number | undefined => {
    const skip = skipOf(r);
    const n = r.values.length;
    return n - (skip >= 0 ? 1 : 0) > 0 ? r.values[skip === n - 1 ? n - 2 : n - 1] : undefined;
  };
  for (const key of [`${group.chargeType}|${group.ionClass}`, group.chargeType, '*']) {
    const g = groups?.get(key);
    if (!g) continue;
    const skip = skipOf(g.needed);
    const n = g.needed.values.length - (skip >= 0 ? 1 : 0);
    if (n >= MIN_FLOOR_GROUP || key === '*') {
      const label = key === '*' ? 'all charge types' : key.replace('|', ', ');
      const spreadScale = Math.min(1, Math.max(quantile(g.ratios.values, SPREAD_SCALE_QUANTILE, skipOf(g.ratios)), ratioAtLeast));
      return { relative: Math.max(quantile(g.needed.values, 0.95, skip), atLeast), spreadScale, salts: n, group: atLeast > 0 || ratioAtLeast > 0 ? `${label}; at least the largest miss of the salts more like it` : label };
    }
    ratioAtLeast = Math.max(ratioAtLeast, largest(g.ratios) ?? 0);
    // The largest need any estimator saw in a small group stands for all of them: Born–Mayer sees only the
    // rock-salt silver halides, and AgCl alone would let AgBr claim ±12 kJ/mol.
    for (const other of floorGroups(dataset, options.mode).values()) {
      const h = other.groups.get(key);
      if (h) atLeast = Math.max(atLeast, largest(h.needed) ?? 0);
    }
  }
  return { relative: atLeast, spreadScale: 1, salts: 0, group: 'none' };
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
 * structure type.
 *
 * All four salts of a set share the target's charge type. Only then does
 * the bracket cancel the model's error: the volume-based equation fits its
 * coefficients to each charge type, the Born–Landé and Born–Mayer Madelung
 * constants belong to one structure, and although Kapustinskii's equation
 * is one form for every charge type, its radius errors enter as
 * ν·|z₊z₋|/(r₊ + r₋), so sets that mix charge types leave them uncancelled
 * (K₂CO₃ from KClO₃ + Na₂CO₃ − NaClO₃ missed by about 180 kJ/mol, Al₂(SO₄)₃
 * from 1:1 and 2:2 salts by about 1000) when they were mixed in among sets
 * of one type under the same calibration. Sets of the target's own charge
 * type are therefore used wherever one exists. Only a salt with none gets
 * one fallback estimate, method `anchored-cross-kapustinskii`, from sets
 * that span charge types, with Kapustinskii differences alone (the one
 * form with the same constants for every charge type), a substituting
 * cation N that bonds like M (noble-gas core or not, both), and a bracket
 * scale, typical spread and floors of their own, calibrated by estimating
 * every pool salt from such sets only. The standard uncertainty is
 * √(u_data² + (κ·spread)² + f²): the anchors' own uncertainties, the
 * weighted spread of the sets (scaled by κ ≤ 1 where the pool shows it
 * overstating the misses), and a floor f calibrated so that 95 % of the
 * pool salts, each estimated from the others, fall inside their intervals
 * (see {@link anchoredFloor}). The salt itself is never an anchor;
 * `excludeMeasured` also leaves its own miss out of the calibration.
 *
 * @param salt - an anhydrous salt of one cation and one anion
 * @param options - leave-one-out switches
 * @param options.excludeMeasured - leave the salt's own miss out of the floor calibration
 * @param dataset - measured and cycle enthalpies of solution of the anchor salts, and the lattice estimators' inputs (default: built-in)
 * @returns basis `anchored`, method `anchored-<estimator>` (or `anchored-cross-kapustinskii`); empty when no set applies
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
  options = optionsArgument(options, ANCHORED_OPTIONS);
  let lattice: SaltLattice | undefined;
  return anchoredEstimates(salt, () => (lattice ??= saltLattice(salt, dataset)), options, dataset);
}

/** {@link anchoredSolutionEnthalpies} with the salt's lattice values given (computed on first call of `lattice`), for callers that have them already. */
export function anchoredEstimates(salt: Salt, lattice: () => SaltLattice, options: { excludeMeasured?: boolean }, dataset: Dataset): Estimate[] {
  const target = targetOf(salt, lattice, dataset);
  if (!target) return [];
  const type = chargeType(salt) ?? 'other';
  const group: FloorGroupKey = { chargeType: type, ionClass: saltIonClass(salt, dataset) };
  const out: Estimate[] = [];
  let mode: SetMode = 'same';
  let combinations = combine(target, ALL_MODELS, dataset, mode);
  if (!combinations.some((c) => c !== undefined)) {
    // No set of the target's own charge type: sets that span charge types, with Kapustinskii differences and their own calibration.
    mode = 'cross';
    const [c] = combine(target, [CROSS_MODEL], dataset, mode);
    combinations = [];
    combinations[CROSS_MODEL] = c;
  }
  for (const [mi, model] of latticeModels.entries()) {
    const c = combinations[mi];
    if (!c) continue;
    const floor = anchoredFloor(model, group, { ...(options.excludeMeasured ? { excludeFormula: salt.formula } : {}), mode }, dataset);
    const f = floor.relative * Math.abs(c.lattice);
    const calibration = floorGroups(dataset, mode).get(model);
    const scale = bracketScale(calibration, type, options.excludeMeasured ? salt.formula : undefined);
    const at = atScale(c, scale.k);
    const spread = floor.spreadScale * usedSpread({ ...c, spread: at.spread }, typicalSpreadOf(calibration, type));
    const u = Math.sqrt(c.dataU ** 2 + spread ** 2 + f ** 2);
    const top = c.top;
    out.push(
      makeEstimate({
        quantity: 'enthalpy of solution',
        value: at.value,
        u,
        unit: 'kJ/mol',
        basis: 'anchored',
        method: mode === 'cross' ? `anchored-cross-${model}` : `anchored-${model}`,
        sources: [...top.my.sources, ...top.nx.sources, ...top.ny.sources, ...(lattice().byMethod.get(model)?.sources ?? [])],
        notes: [
          `${c.count} anchor set${c.count === 1 ? '' : 's'} with ${model} lattice differences${mode === 'cross' ? `, spanning charge types (no set of ${type} salts alone exists; Kapustinskii's equation has one form for every charge type)` : ''}; the closest: ${top.my.formula} + ${top.nx.formula} − ${top.ny.formula}${top.alpha !== 1 || top.beta !== 1 || top.gamma !== -1 ? ` (coefficients ${+fixedDecimal(top.alpha, 3)}, ${+fixedDecimal(top.beta, 3)}, ${+fixedDecimal(top.gamma, 3)})` : ''}`,
          `lattice brackets scaled by ${fixedDecimal(scale.k, 2)} (fitted on ${scale.salts} pool salts, ${scale.group}; 1 trusts the model's differences in full, 0 drops them for ion additivity)`,
          `u = √(anchors ${fixedDecimal(c.dataU, 1)}² + spread ${fixedDecimal(spread, 1)}² + floor ${fixedDecimal(f, 1)}²) kJ/mol: the sets' own spread ${fixedDecimal(at.spread, 1)} (${fixedDecimal(c.effectiveSets, 1)} effective sets) mixed with the typical spread of ${type} salts${floor.spreadScale < 1 ? `, scaled by ${fixedDecimal(floor.spreadScale, 2)} (the pool salts of the group show the spread overstating their misses)` : ''}; floor ${fixedDecimal(100 * floor.relative, 2)} % of the lattice enthalpy, calibrated on ${floor.salts} salts (${floor.group}${mode === 'cross' ? ', each estimated from sets spanning charge types' : ''})`,
        ],
      }),
    );
  }
  return out;
}

/** The anchor sets behind an anchored estimate, for inspection: of the target's own charge type, or (`cross`) spanning charge types. */
export function anchorSets(salt: Salt, model: LatticeModel, dataset: Dataset = builtinDataset(), mode: SetMode = 'same'): AnchorCombination | undefined {
  const target = targetOf(salt, () => saltLattice(salt, dataset), dataset);
  if (!target) return undefined;
  const sets: AnchorSet[] = [];
  const [c] = combine(target, [latticeModels.indexOf(model)], dataset, mode, sets);
  return c ? { sets, value: c.value, dataU: c.dataU, spread: c.spread, effectiveSets: c.effectiveSets, lattice: c.lattice } : undefined;
}

