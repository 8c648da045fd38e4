/**
 * The Born–Haber cycle of a salt, step by step, solved for any one unknown.
 *
 * @module
 */
import { saltArgument } from '../chem/saltArgument.js';
import { describeValue, numberArgument, optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords } from '../chem/saltRecords.js';
import { IonheatError } from '../error.js';
import { exactSum } from '../quantity/exactSum.js';
import { quadrature } from '../quantity/propagate.js';
import { makeEstimate, type Basis, type Estimate } from '../quantity/estimate.js';
import type { CycleStep } from './cycleStep.js';
import { elementSteps, gaseousIon } from './gaseousIon.js';
import { ionText } from '../notation/charge.js';
import { formulaText } from '../notation/formula.js';
import { thermalElectronEnthalpy } from './thermalElectronEnthalpy.js';

const BORN_HABER_OPTIONS = optionNames<BornHaberOptions>('bornHaberCycle', { solve: true, latticeEnthalpy: true, formationEnthalpy: true });

/** What a cycle can be solved for. */
export type CycleUnknown = 'lattice' | 'formation' | 'electron-affinity';
/** Every unknown, in the order the command line lists them. */
export const cycleUnknowns: readonly CycleUnknown[] = ['lattice', 'formation', 'electron-affinity'];

/** A value the caller supplies to a cycle (an {@link Estimate} will do). */
export interface KnownValue {
  value: number;
  /** Standard uncertainty, same unit. */
  u: number;
  /** Source key, or a method name for a model estimate. */
  source?: string;
  method?: string;
  basis?: Basis;
  sources?: readonly string[];
}

/** Options of {@link bornHaberCycle}. */
export interface BornHaberOptions {
  /** The unknown (default `lattice`). */
  solve?: CycleUnknown;
  /** Lattice enthalpy ΔH_L, kJ/mol, positive; needed to solve for the formation enthalpy or an electron affinity. */
  latticeEnthalpy?: KnownValue;
  /** ΔfH°(crystal), kJ/mol; default: the tabulated value. */
  formationEnthalpy?: KnownValue;
}

/** A solved Born–Haber cycle. */
export interface BornHaberCycle {
  /** Canonical formula of the salt. */
  formula: string;
  solve: CycleUnknown;
  /**
   * Every step in the order of the path elements → gaseous atoms →
   * gaseous ions → crystal, then the direct formation step; the path steps
   * sum to the formation step. The step solved for has `solved: true`.
   */
  steps: CycleStep[];
  /** The unknown: `lattice enthalpy` (positive), `enthalpy of formation`, or `electron affinity` (0 K, energy released, the tabulating convention). */
  result: Estimate;
}

/** A value the caller gives: { value, u } in kJ/mol (magnitude at most 1e6), optional source and method text. */
function checkKnown(known: KnownValue | undefined, field: string): void {
  if (known === undefined) return;
  if (known === null || typeof known !== 'object') throw new IonheatError('INVALID_ARGUMENT', `${field} must be { value, u } in kJ/mol, got ${describeValue(known)}`, { field });
  numberArgument(known.value, `${field}.value`, 'a known enthalpy in kJ/mol', { min: -1e6, max: 1e6 });
  numberArgument(known.u, `${field}.u`, 'its standard uncertainty in kJ/mol', { min: 0, max: 1e6 });
  for (const k of ['source', 'method'] as const) {
    if (known[k] !== undefined && typeof known[k] !== 'string') throw new IonheatError('INVALID_ARGUMENT', `${field}.${k} must be text when given, got ${describeValue(known[k])}`, { field: `${field}.${k}` });
  }
}

const ORDER: Readonly<Record<CycleStep['kind'], number>> = { 'ion-formation': 0, atomization: 1, ionization: 2, 'electron-attachment': 3, 'electron-enthalpy': 4, lattice: 5, formation: 6 };

function scaled(step: CycleStep, count: number): CycleStep {
  if (count === 1) return { ...step };
  return { ...step, label: `${step.label} (×${count})`, value: exactSum([{ coefficient: count, value: step.value }]), u: step.u * count, count };
}

function missing(what: string, salt: Salt): never {
  throw new IonheatError('MISSING_DATA', `${what}, needed for the Born–Haber cycle of ${salt.formula}`, { text: salt.formula });
}

/** The monatomic anion whose last electron affinity is the unknown, with its element steps. */
function affinityUnknown(salt: Salt, dataset: Dataset): { ion: string; element: string; charge: number; count: number; steps: CycleStep[]; electron: number } {
  const anions = salt.ions.filter((i) => i.charge < 0);
  const ion = dataset.records('ions.json').find((r) => r.id === anions[0]?.ion);
  if (anions.length !== 1 || !ion || ion.kind !== 'monatomic' || ion.charge < -2) {
    throw new IonheatError('NOT_APPLICABLE', `an electron affinity can be solved for only in a salt of one monatomic anion X⁻ or X²⁻; ${salt.formula} has ${anions.map((a) => ionText(a.ion)).join(', ')}`, { text: salt.formula, field: 'solve' });
  }
  const element = Object.keys(ion.composition)[0]!;
  const { atomization, affinity } = elementSteps(dataset);
  const atom = atomization.get(element) ?? missing(`no atomization enthalpy of ${element} (atomization-enthalpies.json)`, salt);
  const steps = [atom];
  if (ion.charge === -2) steps.push(affinity.get(element) ?? missing(`no first electron affinity of ${element} (electron-affinities.json)`, salt));
  const ordinal = ion.charge === -1 ? 'first' : 'second';
  const from = ion.charge === -1 ? `${element}(g)` : ionText(`${element}[-]`) + '(g)';
  steps.push({ kind: 'electron-attachment', label: `${ordinal} electron affinity of ${element} (solved; the step is −EA)`, equation: `${from} + e⁻ → ${ionText(ion.id)}(g)`, value: 0, u: 0, source: 'solved', fromMemory: false, count: 1, solved: true });
  return { ion: ion.id, element, charge: ion.charge, count: anions[0]!.count, steps, electron: thermalElectronEnthalpy(ion.charge) };
}

/**
 * The Born–Haber cycle of an anhydrous salt MₚXₙ from the elements in their
 * standard states, with every step (label, equation, value, standard
 * uncertainty, source): atomization (sublimation, or ½D° for a diatomic
 * element), successive ionization energies, electron affinities (the second
 * ones of O, S and Se from the tabulated ΔfH° of the gaseous dianion),
 * gaseous polyatomic ions from their tabulated formation enthalpies, the
 * thermal electron term of `thermalElectronEnthalpy` where it does not
 * cancel, the lattice step (−ΔH_L) and the formation enthalpy:
 *
 *   ΔfH°(MₚXₙ, cr) = Σ(atomization + ionization + attachment steps) − ΔH_L
 *
 * Solves for one unknown: the lattice enthalpy (default), the formation
 * enthalpy (given ΔH_L) or the last electron affinity of the anion (given
 * ΔH_L). The uncertainty of the unknown is that of the other steps in
 * quadrature, a repeated step counting with its multiplicity.
 *
 * @param salt - an anhydrous ionic salt (formula or parsed)
 * @param options - the unknown, and a lattice or formation enthalpy where needed
 * @param dataset - formation enthalpies, ionization energies, electron affinities, atomization enthalpies (default: built-in)
 * @throws IonheatError `NOT_APPLICABLE` (non-electrolyte, hydrate, an
 *   electron affinity for a polyatomic anion), `MISSING_DATA` (naming the
 *   step without data)
 * @see Born, M. Verh. Dtsch. Phys. Ges. 21, 13 (1919); Haber, F. ibid. 21, 750 (1919); data: Wagman et al. 1982, Cox et al. 1989, the CRC tables.
 * @example
 * ```ts
 * const c = bornHaberCycle('NaCl');
 * c.result.value; // ≈ 787.2 kJ/mol
 * c.steps.map((s) => s.kind); // ['atomization', 'atomization', 'ionization', 'electron-attachment', 'lattice', 'formation']
 * const ea = bornHaberCycle('NaCl', { solve: 'electron-affinity', latticeEnthalpy: { value: 787.2, u: 2 } });
 * ea.result.value; // ≈ 348.6 kJ/mol (Cl)
 * ```
 */
export function bornHaberCycle(salt: Salt | string, options: BornHaberOptions = {}, dataset: Dataset = builtinDataset()): BornHaberCycle {
  const s = saltArgument(salt, dataset);
  options = optionsArgument(options, BORN_HABER_OPTIONS);
  checkKnown(options.latticeEnthalpy, 'latticeEnthalpy');
  checkKnown(options.formationEnthalpy, 'formationEnthalpy');
  const solve = options.solve ?? 'lattice';
  if (!['lattice', 'formation', 'electron-affinity'].includes(solve)) {
    throw new IonheatError('INVALID_ARGUMENT', `a cycle is solved for lattice, formation or electron-affinity, not ${describeValue(solve)}`, { field: 'solve' });
  }
  if (s.kind !== 'ionic') throw new IonheatError('NOT_APPLICABLE', `${s.formula} is a non-electrolyte: it has no ionic lattice and no Born–Haber cycle`, { text: s.formula });
  if (s.water > 0) throw new IonheatError('NOT_APPLICABLE', `${s.formula} is a hydrate; the Born–Haber cycle is built for the anhydrous salt (${s.anhydrous})`, { text: s.formula });

  const unknownEa = solve === 'electron-affinity' ? affinityUnknown(s, dataset) : undefined;
  const path: CycleStep[] = [];
  let electron = 0;
  for (const { ion, count } of s.ions) {
    if (unknownEa && ion === unknownEa.ion) {
      for (const st of unknownEa.steps) path.push(scaled(st, count));
      electron += count * unknownEa.electron;
      continue;
    }
    const g = gaseousIon(ion, dataset) ?? missing(`no formation enthalpy of gaseous ${ionText(ion)} (ion-formation-gas.json) and no complete route from its element`, s);
    for (const st of g.steps) path.push(scaled(st, count));
    electron += count * g.electronEnthalpy;
  }
  if (Math.abs(electron) > 1e-9) {
    path.push({ kind: 'electron-enthalpy', label: 'thermal enthalpy of the electrons, 5/2·RT each (electron convention)', equation: 'e⁻(g, 0 K) → e⁻(g, 298.15 K)', value: electron, u: 0, source: 'wagman1982', fromMemory: false, count: 1, solved: false });
  }
  path.sort((a, b) => ORDER[a.kind] - ORDER[b.kind]);

  const gasIons = s.ions.map((i) => `${i.count > 1 ? i.count + ' ' : ''}${ionText(i.ion)}(g)`).join(' + ');
  const crystal = `${formulaText(s.formula)}(s)`;
  const tabulated = saltRecords('compound-formation.json', s, dataset).find((r) => r.phase === 'cr');
  const formationKnown: KnownValue | undefined =
    options.formationEnthalpy ?? (tabulated ? { value: tabulated.value, u: dataset.uncertaintyOf('compound-formation.json', tabulated) ?? 0, source: tabulated.source } : undefined);
  const latticeKnown = options.latticeEnthalpy;
  const knownSource = (k: KnownValue): string => k.source ?? k.method ?? 'given';
  const memoryOfTabulated = !options.formationEnthalpy && tabulated?.fromMemory === true;

  const pathSum = (steps: readonly CycleStep[]) => exactSum(steps.filter((st) => !st.solved).map((st) => ({ coefficient: 1, value: st.value })));
  const pathU = (steps: readonly CycleStep[]) => quadrature(...steps.filter((st) => !st.solved).map((st) => st.u));

  let latticeStep: CycleStep;
  let formationStep: CycleStep;
  let value: number;
  let u: number;
  let quantity: string;
  const notes: string[] = [];
  let basis: Basis = 'cycle';

  if (solve === 'lattice') {
    if (!formationKnown) missing(`no ΔfH°(${s.formula}, cr) in compound-formation.json (give one)`, s);
    value = exactSum([{ coefficient: 1, value: pathSum(path) }, { coefficient: -1, value: formationKnown.value }]);
    u = quadrature(pathU(path), formationKnown.u);
    quantity = 'lattice enthalpy';
    latticeStep = { kind: 'lattice', label: `lattice enthalpy of ${s.formula} (solved; the step is −ΔH_L)`, equation: `${gasIons} → ${crystal}`, value: 0 - value, u, source: 'solved', fromMemory: false, count: 1, solved: true };
    formationStep = { kind: 'formation', label: `enthalpy of formation of ${s.formula}`, equation: `elements → ${crystal}`, value: formationKnown.value, u: formationKnown.u, source: knownSource(formationKnown), fromMemory: memoryOfTabulated, count: 1, solved: false };
  } else {
    if (!latticeKnown) {
      throw new IonheatError('MISSING_DATA', `solving the cycle of ${s.formula} for the ${solve === 'formation' ? 'formation enthalpy' : 'electron affinity'} needs a lattice enthalpy; give one (latticeEnthalpy, or --lattice on the command line)`, { text: s.formula, field: 'latticeEnthalpy' });
    }
    if (latticeKnown.basis === 'model' || latticeKnown.basis === 'anchored') basis = latticeKnown.basis;
    latticeStep = { kind: 'lattice', label: `lattice enthalpy of ${s.formula} (the step is −ΔH_L)`, equation: `${gasIons} → ${crystal}`, value: 0 - latticeKnown.value, u: latticeKnown.u, source: knownSource(latticeKnown), fromMemory: false, count: 1, solved: false };
    if (latticeKnown.method) notes.push(`lattice enthalpy ${+latticeKnown.value.toFixed(1)} ± ${+latticeKnown.u.toFixed(1)} kJ/mol from ${latticeKnown.method}`);
    if (solve === 'formation') {
      value = exactSum([{ coefficient: 1, value: pathSum(path) }, { coefficient: -1, value: latticeKnown.value }]);
      u = quadrature(pathU(path), latticeKnown.u);
      quantity = 'enthalpy of formation';
      formationStep = { kind: 'formation', label: `enthalpy of formation of ${s.formula} (solved)`, equation: `elements → ${crystal}`, value, u, source: 'solved', fromMemory: false, count: 1, solved: true };
    } else {
      if (!formationKnown) missing(`no ΔfH°(${s.formula}, cr) in compound-formation.json (give one)`, s);
      const ea = unknownEa!;
      // The unknown attachment step(s): ΔfH° + ΔH_L − (every other path step).
      const attachment = exactSum([{ coefficient: 1, value: formationKnown.value }, { coefficient: 1, value: latticeKnown.value }, { coefficient: -1, value: pathSum(path) }]);
      u = quadrature(pathU(path), latticeKnown.u, formationKnown.u) / ea.count;
      value = -attachment / ea.count;
      quantity = 'electron affinity';
      const solvedStep = path.find((st) => st.solved)!;
      solvedStep.value = attachment;
      solvedStep.u = u * ea.count;
      formationStep = { kind: 'formation', label: `enthalpy of formation of ${s.formula}`, equation: `elements → ${crystal}`, value: formationKnown.value, u: formationKnown.u, source: knownSource(formationKnown), fromMemory: memoryOfTabulated, count: 1, solved: false };
      notes.push(`electron affinity of ${ea.element} for ${ionText(ea.ion)}: energy released at 0 K (the tabulating convention), ${ea.charge === -2 ? 'the second electron; a negative value means the electron is bound only in the lattice' : 'per electron'}`);
    }
  }
  const steps = [...path, latticeStep, formationStep].map((st) => {
    const citation = st.solved ? undefined : dataset.source(st.source)?.citation;
    return citation ? { ...st, reference: citation } : st;
  });
  const memory = steps.filter((st) => st.fromMemory).map((st) => st.label);
  if (memory.length > 0) notes.push(`entered from memory, not checked against the source: ${[...new Set(memory)].join('; ')}`);
  const sources = steps.flatMap((st) => (st.source === 'solved' ? [] : [st.source])).concat(latticeKnown?.sources ?? []);
  const result = makeEstimate({ quantity, value, u, unit: 'kJ/mol', basis, method: 'born-haber', sources: sources.filter((k) => dataset.source(k) !== undefined), notes });
  return { formula: s.formula, solve, steps, result };
}
