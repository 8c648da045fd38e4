/**
 * `dissolve`: the enthalpy of solution of a salt on every basis that the data
 * allow, the most trusted one as `best`, and what a formulator reads from it.
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import { typoSuspicion } from '../chem/typoSuspicion.js';
import { userValueDisagreement } from './userValueCheck.js';
import { optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import type { BoundedCache } from '../data/boundedCache.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords, WATER } from '../chem/saltRecords.js';
import { IonheatError } from '../error.js';
import { basisOrder, type Estimate } from '../quantity/estimate.js';
import { saltHydrationEnthalpy } from '../hydration/saltHydration.js';
import { ionsUnstableInWater } from './waterStability.js';
import { measuredSolutionEnthalpy } from './measuredSolution.js';
import { solutionEnthalpyFromCycle } from './cycleSolution.js';
import { hydrateFromParent, hydrateRuleFamily, hydrateRuleScatter, saltFormIndex } from './hydrateRule.js';
import { heatPerGramOfFill, heatPerGramOfSalt, saturatedFill, type SaturatedFill } from './heatPerGram.js';
import { toMolality } from './toMolality.js';
import { molarMass } from '../chem/molarMass.js';
import { checkKirchhoffTemperature, kirchhoffCorrection, solutionHeatCapacity, TABLE_TEMPERATURE_C, typicalSolutionHeatCapacity } from './solutionHeatCapacity.js';
import { solutionVerdict, type Verdict } from './verdict.js';
import { anchoredEstimates } from './anchoredSolution.js';
import { widenForDisagreement } from './anchoredDisagreement.js';
import { hypotheticalHydrate, type HypotheticalHydrate } from './knownHydrates.js';
import { hydrationText, modelEstimate } from './modelSolution.js';
import { saltLattice, type SaltLattice } from './saltLattice.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';
import { caution, type Caution } from '../quantity/caution.js';
import { hazardCautions } from './hazardCautions.js';

/** The caution every dissolve result ends with (common practice). */
export const DISSOLVE_SCREENING_CAUTION: Caution = Object.freeze(
  caution(
    'screening',
    'notice',
    'Screening estimate. A dissolving salt can scald or freeze skin, and some salts are oxidisers, toxic or restricted: follow the safety data sheet, local codes, product-safety regulation and licensed practice.',
  ),
);

const DISSOLVE_OPTIONS = optionNames<DissolveOptions>('dissolve', { excludeMeasured: true, temperatureC: true });

export interface DissolveOptions {
  /**
   * Hide the target salt's own measured enthalpy of solution and crystal
   * formation enthalpy (not those of other salts), to see how the estimators
   * do on salts the tables cover.
   */
  excludeMeasured?: boolean;
  /** Temperature of the result, °C, 0–40 (default 25, the tables' temperature); other values get a Kirchhoff correction. */
  temperatureC?: number;
}

export interface DissolveResult {
  /** Canonical formula of the salt. */
  formula: string;
  salt: Salt;
  /** The estimate on the most trusted basis available. */
  best: Estimate;
  /** Every estimate that could be made, most trusted basis first. */
  estimates: Estimate[];
  /** `endothermic` (cools), `exothermic` (heats) or `undetermined` (the 95 % interval of `best` spans zero). */
  verdict: Verdict;
  /** Probability that ΔsolH > 0 under the stated uncertainty of `best`. */
  probabilityEndothermic: number;
  perGram: {
    /** Heat absorbed per gram of salt as dissolved, J/g (positive = cools). */
    salt: Estimate;
    /** Heat absorbed per gram of a saturated fill at 25 °C (salt + the water that just dissolves it), J/g; where solubility data exist. */
    saturatedFill?: Estimate;
  };
  /** Hydration enthalpy of the salt's ions, Σν·ΔhydH°, on both scales (ionic salts only). */
  hydration?: { absolute?: Estimate; conventional?: Estimate };
  temperature: {
    /** The temperature the values refer to, °C. */
    celsius: number;
    /** ΔsolCp°, J/(mol·K), where the heat capacities are tabulated. */
    heatCapacityOfSolution?: Estimate;
  };
  /**
   * Set when the salt is a hydrate no table lists but with no more waters
   * than a known form of its salt (`MgSO4·4H2O` between the known mono- and
   * hexahydrates): its estimates come from the difference rule applied to a
   * solid the tables do not know, so they are given on the `model` basis,
   * with a note. A hydrate with more waters than any known form
   * (`KCl·50H2O`) is refused instead (`NOT_APPLICABLE`).
   */
  hypotheticalHydrate?: HypotheticalHydrate;
  /**
   * Set when the formula as written reads through a likely slip of the keyboard while another salt is one slip
   * away (`KN3` for `KNO3`): the values are those of the salt as read, and `suggestion` is the one probably meant.
   */
  suspectedTypo?: { suggestion: string; message: string };
  notes: string[];
  /**
   * What to take care of, each `{ kind, severity, text }`: a suspected typo (`suspected-typo`), a hypothetical
   * hydrate (`data-quality`), the salt's hazards from the hazards table, and the closing screening line.
   */
  cautions: Caution[];
}

/** Within one basis, methods in order of preference (lower first); others after. */
const METHOD_RANK: Readonly<Record<string, number>> = { table: 0, 'formation-enthalpies': 1 };

/** Position of each basis in {@link basisOrder}. */
const BASIS_RANK: Readonly<Record<string, number>> = Object.fromEntries(basisOrder.map((b, i) => [b, i]));

function rank(a: Estimate, b: Estimate): number {
  return BASIS_RANK[a.basis]! - BASIS_RANK[b.basis]! || (METHOD_RANK[a.method] ?? 9) - (METHOD_RANK[b.method] ?? 9) || a.u - b.u || (a.method < b.method ? -1 : a.method > b.method ? 1 : 0);
}

function waterFormation(dataset: Dataset): number | undefined {
  return dataset.memo('solution.waterFormation', () => saltRecords('compound-formation.json', { formula: WATER }, dataset).find((r) => r.phase === 'l')?.value);
}

/**
 * Where the profiles of salts are kept: per dataset for {@link dissolve}, or
 * nowhere ({@link dissolveUncached}: every call computes its salt afresh
 * from the dataset's indexes).
 */
type ProfileStore = BoundedCache<string, SaltProfile> | undefined;

function profileStore(dataset: Dataset): BoundedCache<string, SaltProfile> {
  return dataset.cache<string, SaltProfile>('solution.profiles');
}

/** The anhydrous salt of a hydrate, parsed; kept with the hydrate's profile where profiles are kept. */
function anhydrousSalt(salt: Salt, dataset: Dataset, store: ProfileStore): Salt {
  return store?.get(salt.anhydrous)?.salt ?? parseSalt(salt.anhydrous, dataset);
}

/**
 * The nearest other form (anhydrous or another hydrate) of the salt with a
 * measured or cycle value, for the difference rule; undefined if none.
 */
function ruleEstimate(salt: Salt, hide: boolean, dataset: Dataset): Estimate | undefined {
  const forms = saltFormIndex(dataset).get(salt.anhydrous);
  const hw = waterFormation(dataset);
  if (!forms || hw === undefined) return undefined;
  let chosen: { formula: string; water: number; estimate: Estimate } | undefined;
  for (const form of forms) {
    if (form.formula === salt.formula) continue;
    if (chosen && Math.abs(form.water - salt.water) >= Math.abs(chosen.water - salt.water)) continue;
    const estimate = measuredSolutionEnthalpy(form.salt, dataset) ?? solutionEnthalpyFromCycle(form.salt, dataset);
    if (estimate) chosen = { formula: form.formula, water: form.water, estimate };
  }
  if (!chosen) return undefined;
  const rule = familyRule(salt, hide, dataset);
  return hydrateFromParent(chosen.estimate, { parentFormula: chosen.formula, parentWater: chosen.water, water: salt.water, waterFormation: hw, ...rule });
}

/** θ and the scatter of the difference rule for the salt's family, its own pairs left out when its values are hidden. */
function familyRule(salt: Salt, hide: boolean, dataset: Dataset): { scatter: number; theta: number; thetaU: number; family: string } {
  const c = hydrateRuleScatter({ family: hydrateRuleFamily(salt), ...(hide ? { excludeFormula: salt.formula } : {}) }, dataset);
  return { scatter: c.perSqrtWater, theta: c.theta, thetaU: c.thetaU, family: c.family === 'all' ? `all families (too few ${hydrateRuleFamily(salt)} pairs; θ uncertain by ${fixedDecimal(c.thetaU, 1)} kJ/mol per water)` : `${c.family} salts` };
}

/**
 * What dissolve needs of a salt that does not depend on the options, kept
 * per dataset and salt (the tables never change within a dataset). The
 * estimates kept here are frozen and shared by every result.
 */
interface SaltProfile {
  salt: Salt;
  /** Whether the profile is kept (its estimates frozen, as results share them). */
  kept: boolean;
  measured: Estimate | undefined;
  cycle: Estimate | undefined;
  /** The difference rule from the nearest other form, with all pairs / without the salt's own pairs. */
  rule: { open?: Estimate | undefined; hidden?: Estimate | undefined };
  hydration: { absolute?: Estimate; conventional?: Estimate } | undefined;
  heatCapacity: Estimate | undefined;
  fill: SaturatedFill | undefined;
  /** Lattice estimate + hydration sum, one per lattice method (anhydrous ionic salts). */
  model: Estimate[];
  /** Anchored and model estimates (a hydrate's carried over from its anhydrous salt), with all data / with the salt's own hidden. */
  modelled: { open?: Estimate[]; hidden?: Estimate[] };
  /** Every estimate at 25 °C in order of trust, and the heats per gram of the first, with all data / with the salt's own hidden. */
  ranked: { open?: { estimates: readonly Estimate[]; perGram: DissolveResult['perGram'] | undefined }; hidden?: { estimates: readonly Estimate[]; perGram: DissolveResult['perGram'] | undefined } };
  /** The error to throw when nothing can be estimated, kept so that repeated calls do not rebuild it. */
  failure: { open?: IonheatError; hidden?: IonheatError };
  /** The salt's lattice values, once computed. */
  lattice?: SaltLattice;
  /** The salt's hazard cautions, once computed. */
  hazards?: readonly Caution[];
}

function profileOf(salt: Salt, dataset: Dataset, store: ProfileStore): SaltProfile {
  let profile = store?.get(salt.formula);
  if (!profile) {
    const ionic = salt.kind === 'ionic';
    const kept = store !== undefined;
    const keep = kept ? frozen : <E extends Estimate | undefined>(e: E): E => e;
    profile = {
      salt,
      kept,
      measured: keep(measuredSolutionEnthalpy(salt, dataset)),
      cycle: keep(solutionEnthalpyFromCycle(salt, dataset)),
      rule: {},
      hydration: ionic ? { absolute: keep(saltHydrationEnthalpy(salt, { scale: 'absolute' }, dataset)), conventional: keep(saltHydrationEnthalpy(salt, { scale: 'conventional' }, dataset)) } : undefined,
      heatCapacity: keep(solutionHeatCapacity(salt, dataset)),
      fill: saturatedFill(salt, dataset),
      model: [],
      modelled: {},
      ranked: {},
      failure: {},
    };
    const hydration = modelHydration(profile.hydration);
    if (hydration) {
      const text = hydrationText(hydration);
      for (const lattice of latticeOf(profile, dataset).byMethod.values()) profile.model.push(keep(modelEstimate(lattice, hydration, text)));
    }
    store?.set(salt.formula, profile);
  }
  return profile;
}

/** The lattice values of the profile's salt, computed on first use (they are needed only for the model and anchored bases). */
function latticeOf(profile: SaltProfile, dataset: Dataset): SaltLattice {
  return (profile.lattice ??= saltLattice(profile.salt, dataset));
}

/**
 * The hydration sum the model basis uses: from formation enthalpies where
 * every ion has them (the NBS set the lattice calibration also rests on),
 * else Marcus's values, else with Born estimates standing in.
 */
function modelHydration(h: SaltProfile['hydration']): Estimate | undefined {
  if (!h) return undefined;
  if (h.conventional && h.conventional.basis !== 'model') return h.conventional;
  if (h.absolute && h.absolute.basis !== 'model') return h.absolute;
  return h.absolute ?? h.conventional;
}

/** Anchored and model estimates of a salt, a hydrate's through its anhydrous salt and the difference rule; kept in the salt's profile. */
function modelledEstimates(profile: SaltProfile, hide: boolean, dataset: Dataset, store: ProfileStore): Estimate[] {
  const key = hide ? 'hidden' : 'open';
  let found = profile.modelled[key];
  if (!found) {
    found = computeModelled(profile, hide, dataset, store);
    if (profile.kept) found.forEach(frozen);
    profile.modelled[key] = found;
  }
  return found;
}

function computeModelled(profile: SaltProfile, hide: boolean, dataset: Dataset, store: ProfileStore): Estimate[] {
  const salt = profile.salt;
  if (salt.kind !== 'ionic' || ionsUnstableInWater(salt, dataset).length > 0) return [];
  if (salt.water === 0) return [...anchoredEstimates(salt, () => latticeOf(profile, dataset), { excludeMeasured: hide }, dataset), ...profile.model];
  const hw = waterFormation(dataset);
  if (hw === undefined) return [];
  const anhydrous = profileOf(anhydrousSalt(salt, dataset, store), dataset, store);
  const rule = { parentFormula: anhydrous.salt.formula, parentWater: 0, water: salt.water, waterFormation: hw, ...familyRule(salt, hide, dataset) };
  return modelledEstimates(anhydrous, false, dataset, store).map((e) => hydrateFromParent(e, rule));
}

function ruleOf(salt: Salt, profile: SaltProfile, hide: boolean, dataset: Dataset): Estimate | undefined {
  const key = hide ? 'hidden' : 'open';
  if (!(key in profile.rule)) {
    const rule = salt.kind === 'ionic' ? ruleEstimate(salt, hide, dataset) : undefined;
    profile.rule[key] = profile.kept ? frozen(rule) : rule;
  }
  return profile.rule[key];
}

function failure(salt: Salt, hide: boolean, dataset: Dataset): IonheatError {
  if (salt.kind === 'non-electrolyte') {
    return new IonheatError('NOT_APPLICABLE', `no enthalpy of solution can be given for ${salt.formula}: it is a molecular solute, to which no lattice model applies, and the ${dataset.label} tables hold no measured value for it${hide ? ' that is not hidden (excludeMeasured)' : ''}`, { text: salt.formula });
  }
  const unstable = ionsUnstableInWater(salt, dataset);
  if (unstable.length > 0) {
    return new IonheatError('NOT_APPLICABLE', `${salt.formula} reacts with water instead of dissolving to its ions: ${unstable.join(', ')} does not exist in water (O²⁻ + H₂O → 2 OH⁻), so no enthalpy of solution applies`, { text: salt.formula });
  }
  return new IonheatError('MISSING_DATA', `no enthalpy of solution can be given for ${salt.formula}: no measured value, no formation enthalpies and no lattice estimate (a radius, volume or structure is missing) in the ${dataset.label} tables`, { text: salt.formula });
}

/** Freezes an estimate kept in a profile: results share it, and no caller can change what the next one sees. */
function frozen<E extends Estimate | undefined>(e: E): E {
  if (e) {
    Object.freeze(e.sources);
    Object.freeze(e.notes);
    Object.freeze(e);
  }
  return e;
}

/**
 * Per gram of salt at infinite dilution; per gram of a saturated fill with the integral enthalpy to saturation
 * (25 °C, where the fill is defined). Shared with the screen's own-measurement path.
 * @internal
 */
export function perGramOf(best: Estimate, salt: Salt, fill: SaturatedFill | undefined, dataset: Dataset): DissolveResult['perGram'] {
  if (!fill) return { salt: heatPerGramOfSalt(best, salt) };
  // Water per mole of salt in the fill: its own crystal water plus the water added to saturate it.
  const waterG = salt.water * molarMass({ H: 2, O: 1 }, dataset) + fill.waterPerGramSalt * salt.molarMass;
  const atSaturation = waterG > 0 ? toMolality(best, salt, Math.min(30, 1000 / waterG), TABLE_TEMPERATURE_C, dataset) : best;
  return { salt: heatPerGramOfSalt(best, salt), saturatedFill: heatPerGramOfFill(atSaturation, fill) };
}

/** The text that flags a hypothetical hydrate, in the result's notes and in each of its estimates. */
function hypotheticalText(salt: Salt, h: HypotheticalHydrate): string {
  const forms = h.knownWaters.map((w) => (w === 0 ? salt.anhydrous : `${salt.anhydrous}·${w === 1 ? "" : w}H2O`));
  return `${salt.formula} is a hypothetical hydrate (${h.reason}; the tables know ${forms.length > 0 ? forms.join(', ') : `no form of ${salt.anhydrous}`}): the difference rule gives what a crystal of that formula would have if it existed, not a property of a real solid`;
}

/**
 * The refusal for a hydrate with more waters than any known form of its
 * salt: the difference rule would extrapolate each water as if it were
 * bound in a crystal (KCl·50H₂O would come out near +900 kJ/mol), a number
 * that describes no solid and would read as a strong cooling effect.
 */
function overHydrated(salt: Salt, h: HypotheticalHydrate, dataset: Dataset): IonheatError {
  const forms = h.knownWaters.map((w) => (w === 0 ? salt.anhydrous : `${salt.anhydrous}·${w === 1 ? '' : w}H2O`));
  return new IonheatError(
    'NOT_APPLICABLE',
    `no enthalpy of solution is given for ${salt.formula}: it has more waters of crystallization than any form of ${salt.anhydrous} the ${dataset.label} tables know (${forms.join(', ')}), so no such solid is known and the difference rule would extrapolate to a crystal nobody has made; if the hydrate is real, give its measured enthalpy of solution or formation enthalpy in your own data`,
    { text: salt.formula },
  );
}

/** An estimate of a hypothetical hydrate: it rests on no real related solid, so it is never `anchored`. */
function asHypothetical(e: Estimate, salt: Salt, h: HypotheticalHydrate): Estimate {
  return { ...e, basis: e.basis === 'anchored' ? 'model' : e.basis, sources: [...e.sources], notes: [hypotheticalText(salt, h), ...e.notes] };
}

/** Every estimate at 25 °C, most trusted first, and the heats per gram of the first; kept in the profile. */
function ranked(salt: Salt, profile: SaltProfile, hide: boolean, dataset: Dataset, store: ProfileStore): { estimates: readonly Estimate[]; perGram: DissolveResult['perGram'] | undefined } {
  const key = hide ? 'hidden' : 'open';
  let found = profile.ranked[key];
  if (!found) {
    const made: Estimate[] = [];
    if (profile.measured && !hide) made.push(profile.measured);
    if (profile.cycle && !hide) made.push(profile.cycle);
    const rule = ruleOf(salt, profile, hide, dataset);
    if (rule) made.push(rule);
    for (const e of modelledEstimates(profile, hide, dataset, store)) made.push(e);
    const hypothetical = hypotheticalHydrate(salt, dataset);
    const estimates = widenForDisagreement(made)
      .map((e) => (hypothetical ? asHypothetical(e, salt, hypothetical) : e))
      .map((e) => (profile.kept ? frozen(e) : e));
    estimates.sort(rank);
    let perGram: DissolveResult['perGram'] | undefined;
    if (estimates[0]) {
      const p = perGramOf(estimates[0], salt, profile.fill, dataset);
      perGram = profile.kept ? { salt: frozen(p.salt), ...(p.saturatedFill ? { saturatedFill: frozen(p.saturatedFill) } : {}) } : p;
    }
    profile.ranked[key] = found = { estimates: profile.kept ? Object.freeze(estimates) : estimates, perGram };
  }
  return found;
}

/**
 * The enthalpy of solution at infinite dilution of a salt, on every basis
 * the data allow, in order of trust:
 *
 * - `measured`: the tabulated value;
 * - `cycle`: Σν·ΔfH°(ions, aq) + n_w·ΔfH°(H₂O, l) − ΔfH°(crystal) from
 *   tabulated formation enthalpies;
 * - `anchored`: from related salts with measured or cycle values — the
 *   four-salt difference with a lattice-model bracket (one estimate per
 *   lattice estimator, see {@link anchoredSolutionEnthalpies}), and for a
 *   hydrate or anhydrous salt the difference rule from the nearest other
 *   form of the same salt (method `difference-rule`);
 * - `model`: a calibrated lattice estimate plus the hydration sum (one per
 *   lattice method, see {@link solutionEnthalpyFromModel}); wide by nature.
 *
 * A hydrate without values of its own gets the anchored and model
 * estimates of its anhydrous salt carried over by the difference rule.
 * Within a basis the estimate with the smallest uncertainty comes first.
 *
 * `best` is the most trusted estimate; the verdict, the probability of an
 * endothermic dissolution and the heats per gram are read from it. Values
 * are at 25 °C unless `temperatureC` asks for another temperature in 0–40 °C
 * (Kirchhoff correction, or a widened interval with a caveat where the heat
 * capacities are missing). Non-electrolytes get measured values only: no
 * lattice model applies to a molecular solute.
 *
 * @param formula - a formula (`NH4NO3`) or an already parsed {@link Salt}
 * @param options - `excludeMeasured` (hide the salt's own measured and cycle values, for leave-one-out checks) and
 *   `temperatureC` (°C, 0–40; default 25)
 * @param dataset - every table the bases draw on (default: built-in)
 * @returns kJ/mol, positive = endothermic (the pack cools); heats per gram in J/g
 * @throws IonheatError `MISSING_DATA` when no basis applies; `NOT_APPLICABLE` for a non-electrolyte without a measured value,
 *   a salt that reacts with water, or a hydrate with more waters than any form of its salt the tables know (`KCl·50H2O`)
 * @see measured values: the CRC table, source key `crcSolution`, Parker (1965), `parker1965`; formation enthalpies:
 *   Wagman et al. (1982), `wagman1982`; hydration: Marcus (1997), `marcus1997`; the difference rule: Jenkins and
 *   Glasser (2004), `jenkinsGlasser2004`; docs/methods.md, "Enthalpy of solution".
 *
 * @example
 * ```ts
 * const r = dissolve('NH4NO3');
 * r.best.value; // 25.69 kJ/mol (CRC, measured)
 * r.best.basis; // 'measured'
 * r.verdict; // 'endothermic'
 * const c = dissolve('CaCl2');
 * c.best.value; // -81.348 kJ/mol (NBS tables)
 * c.verdict; // 'exothermic'
 * ```
 */
export function dissolve(formula: string | Salt, options: DissolveOptions = {}, dataset: Dataset = builtinDataset()): DissolveResult {
  return dissolveWith(formula, options, dataset, profileStore(dataset));
}

/**
 * {@link dissolve} without its per-salt results: nothing about the salt (or
 * any other salt) is looked up from an earlier call or kept for a later one;
 * only the dataset's indexes and calibrations are used (built on first use,
 * as for `dissolve`). The result is deep-equal to `dissolve`'s. For the
 * bench, which times the computation itself, and for tests that compare the
 * two paths; not part of the public API.
 *
 * @internal
 */
export function dissolveUncached(formula: string | Salt, options: DissolveOptions = {}, dataset: Dataset = builtinDataset()): DissolveResult {
  return dissolveWith(formula, options, dataset, undefined);
}

function dissolveWith(formula: string | Salt, options: DissolveOptions, dataset: Dataset, store: ProfileStore): DissolveResult {
  const salt = saltArgument(formula, dataset, 'formula');
  options = optionsArgument(options, DISSOLVE_OPTIONS);
  const hide = options.excludeMeasured === true;
  const celsius = options.temperatureC ?? TABLE_TEMPERATURE_C;
  checkKirchhoffTemperature(celsius);
  if (Object.is(celsius, -0)) return dissolveWith(salt, { ...options, temperatureC: 0 }, dataset, store);
  const notes: string[] = [];
  const typo = typeof formula === 'string' ? typoSuspicion(formula, salt, dataset) : undefined;
  const hypothetical = hypotheticalHydrate(salt, dataset);
  if (hypothetical?.reason === 'more waters than any known hydrate' && hypothetical.knownWaters.length > 0) throw overHydrated(salt, hypothetical, dataset);
  if (hypothetical) notes.push(hypotheticalText(salt, hypothetical));
  if (hide) notes.push("the salt's own measured enthalpy of solution and crystal formation enthalpy were hidden (excludeMeasured)");

  const profile = profileOf(salt, dataset, store);
  if (salt.kind !== 'ionic') notes.push('a molecular solute: no lattice model applies, so only measured values (or formation enthalpies) are used');
  const at25 = ranked(salt, profile, hide, dataset, store);
  const heatCapacity = profile.heatCapacity;
  let estimates: Estimate[];
  if (celsius === TABLE_TEMPERATURE_C) {
    estimates = [...at25.estimates];
  } else {
    const typical = typicalSolutionHeatCapacity(dataset).rms;
    estimates = at25.estimates.map((e) => kirchhoffCorrection(e, celsius, heatCapacity, typical)).sort(rank);
    if (!heatCapacity) notes.push(`no heat capacity of solution for ${salt.formula}: values are those at 25 °C with a widened interval`);
  }
  const disagreement = userValueDisagreement(estimates, dataset);
  if (disagreement) notes.push(disagreement);
  const best = estimates[0];
  if (!best) throw (profile.failure[hide ? 'hidden' : 'open'] ??= failure(salt, hide, dataset));
  const perGram = celsius === TABLE_TEMPERATURE_C && at25.perGram ? { ...at25.perGram } : perGramOf(best, salt, profile.fill, dataset);
  let hydration: DissolveResult['hydration'];
  if (profile.hydration) {
    hydration = {};
    if (profile.hydration.absolute) hydration.absolute = profile.hydration.absolute;
    if (profile.hydration.conventional) hydration.conventional = profile.hydration.conventional;
  }
  return {
    formula: salt.formula,
    salt,
    best,
    estimates,
    ...solutionVerdict(best),
    perGram,
    ...(hydration ? { hydration } : {}),
    temperature: { celsius, ...(heatCapacity ? { heatCapacityOfSolution: heatCapacity } : {}) },
    ...(hypothetical ? { hypotheticalHydrate: hypothetical } : {}),
    ...(typo ? { suspectedTypo: { suggestion: typo.suggestion, message: typo.message } } : {}),
    notes,
    cautions: [
      ...(typo ? [caution('suspected-typo', 'warning', `Suspected typo: ${typo.message}. The values given are those of ${salt.formula} as read.`)] : []),
      ...(hypothetical ? [caution('data-quality', 'warning', `Hypothetical hydrate: ${hypotheticalText(salt, hypothetical)}.`)] : []),
      ...(profile.hazards ??= hazardCautions(salt, dataset).map((c) => (profile.kept ? Object.freeze(c) : c))),
      DISSOLVE_SCREENING_CAUTION,
    ],
  };
}
