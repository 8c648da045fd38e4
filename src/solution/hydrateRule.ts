/**
 * The thermodynamic difference rule of Jenkins and Glasser for hydrates: each
 * water of crystallization adds a nearly constant amount θ to a salt's
 * enthalpy of formation, so a hydrate's enthalpy of solution follows from
 * that of the anhydrous salt (or of another hydrate of it).
 *
 * @module
 */
import { describeValue, estimateArgument, numberArgument, optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { saltRecordIndex, saltRecords, WATER } from '../chem/saltRecords.js';
import { chargeType, type Salt } from '../chem/salt.js';
import { IonheatError } from '../error.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { widenEstimate } from './widenEstimate.js';
import { tableSalts } from './tableSalts.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';

const RULE_SCATTER_OPTIONS = optionNames<{ excludeFormula?: string; family?: string }>('hydrateRuleScatter', { excludeFormula: true, family: true });
const RULE_INPUT = optionNames<HydrateRuleInput>('hydrateFromParent', { parentFormula: true, parentWater: true, water: true, waterFormation: true, scatter: true, theta: true, family: true, thetaU: true });

/**
 * θ_Hf(H₂O, s–s): the change in standard enthalpy of formation of a solid
 * per water of crystallization, kJ/mol, for inorganic hydrates.
 * "About −298 kJ/mol", recalled from memory, not checked against the paper.
 *
 * @see Jenkins, H. D. B.; Glasser, L. Difference rule – a new thermodynamic principle: prediction of standard thermodynamic data for inorganic solvates. J. Am. Chem. Soc. 126, 15809–15817 (2004).
 */
export const WATER_OF_CRYSTALLIZATION_ENTHALPY = -298;

/** One hydrate–parent pair of crystal formation enthalpies in the tables, for the scatter of the rule. */
interface RulePair {
  hydrate: string;
  parent: string;
  /** Waters the hydrate has beyond its parent. */
  waters: number;
  /** ΔfH°(hydrate) − ΔfH°(parent) − waters·θ, kJ/mol: how far the rule misses for this pair. */
  miss: number;
  /** The pair's own θ, (ΔfH°(hydrate) − ΔfH°(parent))/waters, kJ/mol. */
  theta: number;
  /** The salt family the pair calibrates (`hydrateRuleFamily`). */
  family: string;
}

/** Fewest pairs of one family that calibrate its own θ and scatter; a smaller family uses every pair. */
export const MIN_FAMILY_PAIRS = 4;
/** Pseudo-pairs of the pooled scatter mixed into a family's own, so that a family of a few close pairs does not claim a tiny scatter. */
export const FAMILY_PRIOR_PAIRS = 4;

/**
 * The salt family of the difference rule: the charge type of the salt
 * (`1:1`, `2:1`, `1:2`, `2:2`, `3:1` …, `other` for double salts). The water
 * of crystallization binds mostly to the cation, and how strongly depends on
 * its charge and on the anion it shares the crystal with, so θ and the
 * rule's scatter are calibrated per charge type.
 *
 * @param salt - a parsed salt (water ignored)
 */
export function hydrateRuleFamily(salt: Salt): string {
  return chargeType(salt) ?? 'other';
}

export interface HydrateRuleScatter {
  /**
   * Standard uncertainty of the rule, kJ/mol, for one water of
   * crystallization; for Δn waters it is this times √Δn. The RMS over the
   * tabulated pairs of miss/√Δn.
   */
  perSqrtWater: number;
  /** Pairs the scatter was measured on. */
  pairs: number;
  /** θ the scatter is measured about, kJ/mol per water: the family's fitted θ, or {@link WATER_OF_CRYSTALLIZATION_ENTHALPY} without a family. */
  theta: number;
  /** The family calibrated (`2:1` …), `all` where the family had too few pairs, `all (θ of Jenkins and Glasser)` without a family. */
  family: string;
  /**
   * Standard uncertainty of θ itself, kJ/mol per water: 0 where the family
   * fits its own θ; where it falls back to every pair, its own θ is not
   * known, and may lie as far from the pooled θ as any single pair's: the
   * largest |θᵢ − θ_pooled| over the pairs (and at least the spread of the
   * θ of the families that fit their own).
   * It enters linearly in Δn, being the same for every water.
   */
  thetaU: number;
}

/** What {@link hydrateFromParent} needs besides the parent's enthalpy of solution. */
export interface HydrateRuleInput {
  /** The parent's formula, for the note. */
  parentFormula: string;
  /** Waters of crystallization of the parent (0 for the anhydrous salt). */
  parentWater: number;
  /** Waters of crystallization of the hydrate. */
  water: number;
  /** ΔfH°(H₂O, l), kJ/mol. */
  waterFormation: number;
  /** The rule's standard uncertainty for one water, kJ/mol ({@link HydrateRuleScatter.perSqrtWater}). */
  scatter: number;
  /** θ, kJ/mol per water of crystallization (default {@link WATER_OF_CRYSTALLIZATION_ENTHALPY}); a family's fitted θ from {@link hydrateRuleScatter}. */
  theta?: number;
  /** The family θ and the scatter were calibrated on, for the note. */
  family?: string;
  /** Standard uncertainty of θ, kJ/mol per water ({@link HydrateRuleScatter.thetaU}); default 0. */
  thetaU?: number;
}

/** Anhydrous formula → every form (canonical formula, waters, the parsed salt) that the formation and solution tables hold, fewest waters first. */
export function saltFormIndex(dataset: Dataset): ReadonlyMap<string, readonly { formula: string; water: number; salt: Salt }[]> {
  return dataset.memo('solution.saltForms', () => {
    const byAnhydrous = new Map<string, { formula: string; water: number; salt: Salt }[]>();
    for (const salt of tableSalts(dataset).values()) {
      const list = byAnhydrous.get(salt.anhydrous) ?? [];
      list.push({ formula: salt.formula, water: salt.water, salt });
      byAnhydrous.set(salt.anhydrous, list);
    }
    for (const list of byAnhydrous.values()) list.sort((a, b) => a.water - b.water);
    return byAnhydrous;
  });
}

function rulePairs(dataset: Dataset): readonly RulePair[] {
  return dataset.memo('solution.hydrateRulePairs', () => {
    const crystal = new Map<string, number>();
    for (const [formula, records] of saltRecordIndex('compound-formation.json', dataset)) {
      const cr = records.find((r) => r.phase === 'cr');
      if (cr) crystal.set(formula, cr.value);
    }
    const solution = new Map<string, number>();
    for (const [formula, records] of saltRecordIndex('solution-enthalpies.json', dataset)) if (records[0]) solution.set(formula, records[0].value);
    const waterFormation = saltRecords('compound-formation.json', { formula: WATER }, dataset).find((r) => r.phase === 'l')?.value;
    const pairs: RulePair[] = [];
    for (const forms of saltFormIndex(dataset).values()) {
      // Each hydrate against the form with the fewest waters below it (the anhydrous salt where tabulated):
      // from crystal formation enthalpies where both are tabulated, else from measured enthalpies of solution.
      for (const h of forms) {
        if (h.water === 0) continue;
        const byCrystal = crystal.has(h.formula) ? forms.find((p) => p.water < h.water && crystal.has(p.formula)) : undefined;
        if (byCrystal) {
          const waters = h.water - byCrystal.water;
          const step = crystal.get(h.formula)! - crystal.get(byCrystal.formula)!;
          pairs.push({ hydrate: h.formula, parent: byCrystal.formula, waters, miss: step - waters * WATER_OF_CRYSTALLIZATION_ENTHALPY, theta: step / waters, family: hydrateRuleFamily(h.salt) });
          continue;
        }
        const bySolution = solution.has(h.formula) && waterFormation !== undefined ? forms.find((p) => p.water < h.water && solution.has(p.formula)) : undefined;
        if (bySolution) {
          const waters = h.water - bySolution.water;
          // ΔsolH(n) = ΔsolH(n′) + Δn·(ΔfH°(H2O, l) − θ) − miss
          const miss = solution.get(bySolution.formula)! + waters * (waterFormation! - WATER_OF_CRYSTALLIZATION_ENTHALPY) - solution.get(h.formula)!;
          pairs.push({ hydrate: h.formula, parent: bySolution.formula, waters, miss, theta: WATER_OF_CRYSTALLIZATION_ENTHALPY + miss / waters, family: hydrateRuleFamily(h.salt) });
        }
      }
    }
    return pairs.sort((a, b) => (a.hydrate < b.hydrate ? -1 : a.hydrate > b.hydrate ? 1 : 0));
  });
}

/**
 * The scatter of the difference rule in this dataset. For every hydrate
 * whose crystal formation enthalpy is tabulated together with that of a
 * lower hydrate or the anhydrous salt, the miss ΔfH°(hydrate) −
 * ΔfH°(parent) − Δn·θ; for hydrates without one, the same miss read from
 * the measured enthalpies of solution of hydrate and parent. The misses grow
 * more slowly than Δn (the first water of a strongly hydrated salt such as
 * KOH or LiI misses by 20–30 kJ/mol on its own), so the scatter is the RMS of
 * miss/√Δn and the rule's uncertainty for Δn waters is that times √Δn.
 *
 * Without `family`, θ is Jenkins and Glasser's {@link WATER_OF_CRYSTALLIZATION_ENTHALPY}
 * and every pair counts. With `family` (see `hydrateRuleFamily`), θ is
 * fitted to the pairs of that family, θ_f = Σ Δn·θᵢ / Σ Δn (θᵢ each pair's
 * step per water), and the scatter is measured about it and mixed with the
 * pooled scatter (about the θ fitted to every pair) as `FAMILY_PRIOR_PAIRS`
 * pseudo-pairs, s² = (N_f·s_f² + 4·s²_all)/(N_f + 4); a family with fewer
 * than `MIN_FAMILY_PAIRS` pairs uses every pair and the pooled fit instead,
 * and its θ is then uncertain by as much as the farthest single pair's θ
 * lies from the pooled one (`thetaU`). `excludeFormula`
 * leaves out the pairs involving one salt (its own values are hidden in
 * leave-one-out), so neither θ nor the scatter sees them.
 *
 *   s = √( Σ miss² / Δn ÷ N ),  u(Δn) = s·√Δn
 *
 * @param options - `excludeFormula`: a canonical formula whose pairs are left out; `family`: calibrate θ on that family
 * @param dataset - crystal formation enthalpies, enthalpies of solution, ΔfH°(H₂O, l) (default: built-in)
 * @returns s in kJ/mol per √(mole of water), the number N of pairs, θ and the family used
 * @see Jenkins and Glasser (2004), source key `jenkinsGlasser2004`; the pairs' values from Wagman et al. (1982),
 *   `wagman1982`, and the CRC table, `crcSolution`.
 *
 * @example
 * ```ts
 * hydrateRuleScatter().perSqrtWater; // ≈ 16.6 kJ/mol (41 pairs of the NBS and CRC tables)
 * hydrateRuleScatter().pairs; // 41
 * hydrateRuleScatter({ family: '2:2' }).theta; // ≈ -299.4 kJ/mol per water (the five sulfate hydrates)
 * ```
 */
export function hydrateRuleScatter(options: { excludeFormula?: string; family?: string } = {}, dataset: Dataset = builtinDataset()): HydrateRuleScatter {
  options = optionsArgument(options, RULE_SCATTER_OPTIONS);
  const pairs = rulePairs(dataset).filter((p) => p.hydrate !== options.excludeFormula && p.parent !== options.excludeFormula);
  const rms = (list: readonly RulePair[], theta: number): number => Math.sqrt(list.reduce((s, p) => s + (p.waters * (p.theta - theta)) ** 2 / p.waters, 0) / Math.max(1, list.length));
  if (options.family === undefined) return { perSqrtWater: rms(pairs, WATER_OF_CRYSTALLIZATION_ENTHALPY), pairs: pairs.length, theta: WATER_OF_CRYSTALLIZATION_ENTHALPY, family: 'all (θ of Jenkins and Glasser)', thetaU: 0 };
  const fitted = (list: readonly RulePair[]): number => {
    const waters = list.reduce((s, p) => s + p.waters, 0);
    return waters > 0 ? list.reduce((s, p) => s + p.waters * p.theta, 0) / waters : WATER_OF_CRYSTALLIZATION_ENTHALPY;
  };
  const pooledTheta = fitted(pairs);
  const pooled = rms(pairs, pooledTheta);
  const own = pairs.filter((p) => p.family === options.family);
  if (own.length < MIN_FAMILY_PAIRS) {
    const families = new Map<string, RulePair[]>();
    for (const p of pairs) families.set(p.family, [...(families.get(p.family) ?? []), p]);
    const thetas = [...families.values()].filter((l) => l.length >= MIN_FAMILY_PAIRS).map(fitted);
    const mean = thetas.reduce((s, t) => s + t, 0) / Math.max(1, thetas.length);
    const familySpread = thetas.length > 1 ? Math.sqrt(thetas.reduce((s, t) => s + (t - mean) ** 2, 0) / (thetas.length - 1)) : 0;
    // A family the tables cannot calibrate may sit as far from the pooled θ as the most extreme salt seen (AlCl₃ binds its
    // six waters some 30 kJ/mol per water more strongly than the pooled θ), not merely as far as the fitted families' means.
    const widest = pairs.reduce((w, p) => Math.max(w, Math.abs(p.theta - pooledTheta)), 0);
    const thetaU = Math.max(familySpread, widest);
    return { perSqrtWater: pooled, pairs: pairs.length, theta: pooledTheta, family: 'all', thetaU };
  }
  const theta = fitted(own);
  // A few pairs say little about their spread: theirs is mixed with the pooled one as FAMILY_PRIOR_PAIRS pseudo-pairs.
  const perSqrtWater = Math.sqrt((own.length * rms(own, theta) ** 2 + FAMILY_PRIOR_PAIRS * pooled ** 2) / (own.length + FAMILY_PRIOR_PAIRS));
  return { perSqrtWater, pairs: own.length, theta, family: options.family, thetaU: 0 };
}

/**
 * The enthalpy of solution of a hydrate from that of a parent (the anhydrous
 * salt or another hydrate of it) by the difference rule:
 *
 *   ΔfH°(MX·nH₂O, cr) ≈ ΔfH°(MX·n′H₂O, cr) + (n − n′)·θ
 *   ⇒ ΔsolH°(n) = ΔsolH°(n′) + (n − n′)·(ΔfH°(H₂O, l) − θ)
 *
 * with θ = `rule.theta` (a family's θ from {@link hydrateRuleScatter}),
 * else {@link WATER_OF_CRYSTALLIZATION_ENTHALPY}. The standard
 * uncertainty adds u_rule = √(|n − n′|·s² + ((n − n′)·u_θ)²) to the
 * parent's in quadrature: s the rule's scatter, u_θ the uncertainty of θ
 * itself (`rule.thetaU`, default 0; see {@link hydrateRuleScatter}). A measured or
 * cycle parent gives the `anchored` basis (a related salt's value plus an
 * empirical difference, like the four-salt anchors); an anchored or model
 * parent keeps its basis.
 *
 * @param parent - the parent's enthalpy of solution, kJ/mol
 * @param rule - the parent's formula and waters, the hydrate's waters, ΔfH°(H₂O, l) and the rule's scatter
 * @see Jenkins and Glasser, J. Am. Chem. Soc. 126, 15809 (2004)
 * @example
 * ```ts
 * const parent = makeEstimate({ quantity: 'enthalpy of solution', value: -82.8, u: 1, unit: 'kJ/mol', basis: 'cycle', method: 'formation-enthalpies' });
 * // CaCl2 → CaCl2·6H2O: −82.8 + 6·(−285.83 + 298) = −9.8 kJ/mol
 * hydrateFromParent(parent, { parentFormula: 'CaCl2', parentWater: 0, water: 6, waterFormation: -285.83, scatter: 16.6 }).value; // ≈ -9.78
 * ```
 */
export function hydrateFromParent(parent: Estimate, rule: HydrateRuleInput): Estimate {
  parent = estimateArgument(parent, 'parent');
  rule = optionsArgument(rule, RULE_INPUT, 'rule');
  if (typeof rule.parentFormula !== 'string') throw new IonheatError('INVALID_ARGUMENT', `rule.parentFormula must be a formula, got ${describeValue(rule.parentFormula)}`, { field: 'rule.parentFormula' });
  numberArgument(rule.parentWater, 'rule.parentWater', 'the waters of crystallization of the parent', { min: 0, max: 1000 });
  numberArgument(rule.water, 'rule.water', 'the waters of crystallization of the hydrate', { min: 0, max: 1000 });
  numberArgument(rule.waterFormation, 'rule.waterFormation', 'ΔfH°(H₂O, l) in kJ/mol', { min: -1e4, max: 1e4 });
  numberArgument(rule.scatter, 'rule.scatter', 'the scatter of the rule in kJ/mol', { min: 0, max: 1e4 });
  if (rule.theta !== undefined) numberArgument(rule.theta, 'rule.theta', 'θ in kJ/mol per water of crystallization', { min: -1e4, max: 0 });
  if (rule.thetaU !== undefined) numberArgument(rule.thetaU, 'rule.thetaU', 'the standard uncertainty of θ in kJ/mol', { min: 0, max: 1e4 });
  const { parentFormula, parentWater, water, waterFormation, scatter } = rule;
  const theta = rule.theta ?? WATER_OF_CRYSTALLIZATION_ENTHALPY;
  const dn = water - parentWater;
  const shift = dn * (waterFormation - theta);
  const thetaU = rule.thetaU ?? 0;
  const uRule = Math.sqrt(Math.abs(dn) * scatter ** 2 + (dn * thetaU) ** 2);
  const shifted = widenEstimate(parent, uRule, shift);
  return makeEstimate({
    ...shifted,
    basis: parent.basis === 'measured' || parent.basis === 'cycle' ? 'anchored' : parent.basis,
    method: parent.basis === 'measured' || parent.basis === 'cycle' ? 'difference-rule' : `${parent.method}+difference-rule`,
    sources: [...parent.sources, 'jenkinsGlasser2004'],
    notes: [
      `hydrate's crystal enthalpy from ${parentFormula} (${parent.basis}) by the difference rule: ${dn > 0 ? '+' : ''}${dn} × θ = ${fixedDecimal(theta, 1)} kJ/mol per water of crystallization (${rule.theta === undefined ? 'Jenkins & Glasser 2004, from memory' : `fitted to the tabulated hydrate pairs of ${rule.family ?? 'the tables'}`}), scatter ${fixedDecimal(scatter, 1)} kJ/mol × √${Math.abs(dn)} from the tabulated hydrate pairs`,
      ...parent.notes,
    ],
  });
}
