/**
 * A pack fill — solids, water, start temperature, container — checked and
 * joined to the data it needs: enthalpies of solution, heat capacities,
 * solubility curves and the equilibrium solids those curves name.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import { ionsPerFormulaUnit, type Salt } from '../chem/salt.js';
import { saltRecords, WATER } from '../chem/saltRecords.js';
import { molarMass } from '../chem/molarMass.js';
import { IonheatError, isIonheatError } from '../error.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { quadrature } from '../quantity/propagate.js';
import { KIRCHHOFF_RANGE_C, kirchhoffShifted, solutionHeatCapacity, typicalSolutionHeatCapacity } from '../solution/solutionHeatCapacity.js';
import { waterSpecificHeat } from './solidHeatCapacity.js';
import { brineModel, type BrineModel } from '../brine/brineModel.js';
import { waterConstants } from '../brine/brineParameterSets.js';
import { checkOptionKeys } from '../quantity/argumentChecks.js';
import { checkPackInput, packInputNumber, SOLID_KEYS, type PackFill, type PackOptions, type PackSolid } from './packInput.js';
import type { SolubilityCurve } from './solubilityCurve.js';
import { packSaltData, type PackSaltData } from './packSaltData.js';
import type { SolubilityStatus } from './saltSolubility.js';
import { solubilityBoundsOf, solubilityNote, type SolubilityBounds } from './solubilityBounds.js';

/** An equilibrium solid a salt may leave undissolved. @internal */
export interface PreparedPhase {
  formula: string;
  /** Water of crystallization per formula unit. */
  water: number;
  /** Enthalpy of solution of this solid at the start temperature, kJ/mol, when known. */
  enthalpy: Estimate | undefined;
  /** Cp° of this solid, J/(mol·K). */
  heatCapacity: Estimate;
}

/** One solid joined to its data. @internal */
export interface PreparedSolid {
  input: PackSolid;
  salt: Salt;
  massG: number;
  /** Moles of formula units loaded. */
  moles: number;
  /** Molar mass of the anhydrous salt, g/mol. */
  anhydrousMolarMass: number;
  /** Particles per formula unit in solution (ions, or 1 for a non-electrolyte). */
  particles: number;
  /** Enthalpy of solution as used (25 °C, or Kirchhoff-corrected to the start), kJ/mol of the loaded formula. */
  enthalpy: Estimate;
  /** Cp° of the solid as loaded, J/(mol·K). */
  heatCapacityLoaded: Estimate;
  /** Cp° of the anhydrous crystal, J/(mol·K): its contribution to the solution's heat capacity. */
  heatCapacityAnhydrous: Estimate;
  /** φCp° of the dissolved salt at infinite dilution, J/(mol·K): Σν·Cp°(ion, aq), or the anhydrous crystal's Cp° where an ion is not tabulated. */
  heatCapacityInfinite: number;
  /** Standard uncertainty of φCp°, J/(mol·K) (wide where the crystal value stands in). */
  additivityU: number;
  /** The brine model of the dissolved salt: φ, φL, φJ. */
  brine: BrineModel;
  curve: SolubilityCurve | undefined;
  /** How well the solubility is known. */
  solubilityStatus: SolubilityStatus;
  /** The ends of an estimated or unknown solubility, for the interval. */
  solubilityBounds: SolubilityBounds | undefined;
  /** Every equilibrium solid the curve names, by canonical formula. */
  phases: ReadonlyMap<string, PreparedPhase>;
}

/** A checked fill with its data. @internal */
export interface PreparedFill {
  solids: PreparedSolid[];
  waterG: number;
  startC: number;
  containerJPerK: number;
  /** J/(g·K). */
  waterSpecificHeat: Estimate;
  /** g/mol. */
  waterMolarMass: number;
  /** Constants of water, ice and vapour (molar mass in kg/mol, enthalpies in J/mol, ice in J/(g·K)). */
  water: ReturnType<typeof waterConstants>;
  /** The user's heat capacity, J/K, when given. */
  heatCapacityOverride: { value: number; u: number } | undefined;
  /** Temperatures (°C, ascending) where a solid's equilibrium solid changes in its solubility table: the balance may jump there. */
  phaseChanges: number[];
  /** Notes that hold whatever the final state. */
  notes: string[];
  sources: string[];
  dataset: Dataset;
}

/**
 * Relative allowance for the heat capacity a dissolved salt adds when the
 * infinite-dilution value is not tabulated: an assumed 50 % of the crystal's
 * Cp°, not a published figure.
 */
const ADDITIVITY_FALLBACK_RELATIVE = 0.5;

function invalid(field: string, message: string): IonheatError {
  return new IonheatError('INVALID_ARGUMENT', message, { field });
}

/** ΔsolH°(∞) at the start temperature, by the one Kirchhoff correction of the solution layer. */
function kirchhoff(h25: Estimate, solid: Salt, startC: number, dataset: Dataset): Estimate {
  const corrected = kirchhoffShifted(h25, startC, solutionHeatCapacity(solid, dataset), typicalSolutionHeatCapacity(dataset).rms);
  if (startC < KIRCHHOFF_RANGE_C.min || startC > KIRCHHOFF_RANGE_C.max) return makeEstimate({ ...corrected, notes: [...corrected.notes, `the Kirchhoff correction is extrapolated to ${startC} °C, outside the ${KIRCHHOFF_RANGE_C.min}–${KIRCHHOFF_RANGE_C.max} °C over which ΔsolCp° may be taken as constant`] });
  return corrected;
}

/** Formula texts kept per dataset once read (up to this many, so that odd inputs cannot grow the cache without bound). */
const PARSED_CACHE_LIMIT = 4096;

/** {@link parseSalt}, remembered per dataset for texts already read. */
function parsedFormula(text: string, dataset: Dataset): Salt {
  const cache = dataset.cache<string, Salt>('pack.parsedFormulas', PARSED_CACHE_LIMIT);
  const known = cache.get(text);
  if (known) return known;
  const salt = parseSalt(text, dataset);
  cache.set(text, salt);
  return salt;
}

function saltDataOf(salt: Salt, field: string, dataset: Dataset): PackSaltData {
  try {
    return packSaltData(salt, dataset);
  } catch (e) {
    if (isIonheatError(e)) throw new IonheatError(e.code, `${field} "${salt.formula}": ${e.message}`, { text: salt.formula, field });
    throw e;
  }
}

/**
 * Checks a fill and joins it to its data.
 *
 * @throws IonheatError `INVALID_ARGUMENT` naming the field (`solids[0].massG`,
 * `waterG`, `startC`…) for a non-positive mass, no water, a start temperature
 * outside liquid water (0–100 °C), or the same salt listed twice; the
 * formula parser's errors, and `MISSING_DATA`, for an unknown salt or one
 * without an enthalpy of solution.
 * @internal
 */
export function preparePackFill(fill: PackFill, options: PackOptions = {}, dataset: Dataset = builtinDataset()): PreparedFill {
  const { waterG, startC, containerJPerK, heatCapacityOverride } = checkPackInput(fill, options);

  const water = waterSpecificHeat(dataset);
  const waterMolarMass = molarMass({ H: 2, O: 1 }, dataset);
  const notes: string[] = [];
  const sources = new Set<string>(water.sources);
  const seen = new Map<string, string>();

  // Array.from, not map: a hole in a sparse list is seen (as undefined) instead of skipped.
  const solids = Array.from(fill.solids, (solid, i): PreparedSolid => {
    const field = `solids[${i}]`;
    if (solid === null || typeof solid !== 'object') throw invalid(field, `${field} must be an object { formula, massG }`);
    checkOptionKeys(solid, SOLID_KEYS, field);
    if (typeof solid.formula !== 'string' || solid.formula.trim() === '') throw invalid(`${field}.formula`, `${field}.formula must be a salt formula`);
    let salt: Salt;
    try {
      salt = parsedFormula(solid.formula, dataset);
    } catch (e) {
      if (isIonheatError(e)) throw new IonheatError(e.code, `${field}.formula "${solid.formula}": ${e.message}`, { text: solid.formula, field: `${field}.formula` });
      throw e;
    }
    const massG = packInputNumber(solid.massG, 'massG', `${field}.massG`, `the mass of ${salt.formula}`);
    const earlier = seen.get(salt.anhydrous);
    if (earlier !== undefined) {
      throw invalid(`${field}.formula`, `${salt.formula} (${field}) and ${earlier} are the same salt; they share one solubility, so list the salt once`);
    }
    seen.set(salt.anhydrous, `${salt.formula} (${field})`);

    const data = saltDataOf(salt, `${field}.formula`, dataset);
    const h25 = data.enthalpy;
    const heatCapacityLoaded = data.heatCapacity;
    const anhydrousSalt = data.anhydrousSalt;
    const heatCapacityAnhydrous = data.heatCapacityAnhydrous;
    const aq = data.aqueousHeatCapacity;
    const heatCapacityInfinite = aq ? aq.value : heatCapacityAnhydrous.value;
    const additivityU = aq ? aq.u : ADDITIVITY_FALLBACK_RELATIVE * heatCapacityAnhydrous.value;
    if (!aq) notes.push(`no infinite-dilution heat capacity for ${salt.anhydrous}: the crystal's Cp° stands in for φCp°, with a wide allowance`);
    const brine = brineModel(salt, dataset);
    for (const note of brine.notes) notes.push(note);
    for (const source of brine.sources) sources.add(source);

    const enthalpy = kirchhoff(h25, salt, startC, dataset);

    const curve = data.curve;
    const phases = new Map<string, PreparedPhase>();
    for (const [formula, phase] of data.phases) {
      if (formula === salt.formula) {
        phases.set(formula, { formula, water: salt.water, enthalpy, heatCapacity: heatCapacityLoaded });
        continue;
      }
      let phaseEnthalpy = phase.enthalpy;
      if (phaseEnthalpy) phaseEnthalpy = kirchhoff(phaseEnthalpy, phase.salt, startC, dataset);
      phases.set(formula, { formula, water: phase.salt.water, enthalpy: phaseEnthalpy, heatCapacity: phase.heatCapacity });
    }
    if (curve) sources.add(curve.source);
    if (data.solubility.status === 'estimated') sources.add('solubilityEstimatePractice');
    const solubilityText = solubilityNote(salt, data.solubility);
    if (solubilityText) notes.push(solubilityText);
    for (const s of [...enthalpy.sources, ...heatCapacityLoaded.sources, ...heatCapacityAnhydrous.sources, ...(aq?.sources ?? [])]) sources.add(s);

    return {
      input: { formula: solid.formula, massG },
      salt,
      massG,
      moles: massG / salt.molarMass,
      anhydrousMolarMass: anhydrousSalt.molarMass,
      particles: ionsPerFormulaUnit(salt),
      enthalpy,
      heatCapacityLoaded,
      heatCapacityAnhydrous,
      heatCapacityInfinite,
      additivityU,
      brine,
      curve,
      solubilityStatus: data.solubility.status,
      solubilityBounds: solubilityBoundsOf(salt, data.solubility),
      phases,
    };
  });
  if (solids.length > 1) notes.push('several solids: their heats of solution are added and each dissolves against the same water as if alone; mixing effects (common ions, salting out, heats of mixing) are ignored');

  const phaseChanges = new Set<number>();
  for (const s of solids) {
    const pts = s.curve?.points ?? [];
    for (let k = 0; k + 1 < pts.length; k++) if (pts[k]!.phase !== pts[k + 1]!.phase) phaseChanges.add((pts[k]!.t + pts[k + 1]!.t) / 2);
  }
  const waterData = waterConstants(dataset);
  for (const source of waterData.sources) sources.add(source);
  return { solids, waterG, startC, containerJPerK, waterSpecificHeat: water, waterMolarMass, water: waterData, heatCapacityOverride, phaseChanges: [...phaseChanges].sort((a, b) => a - b), notes, sources: [...sources], dataset };
}

/**
 * The same prepared fill with every solid's mass multiplied by `factor`
 * (water, start and container unchanged): for sweeps over the salt-to-water ratio.
 * @internal
 */
export function scalePreparedFill(prepared: PreparedFill, factor: number): PreparedFill {
  return {
    ...prepared,
    solids: prepared.solids.map((s) => ({ ...s, massG: s.massG * factor, moles: s.moles * factor, input: { ...s.input, massG: s.massG * factor } })),
  };
}

/** The same prepared fill with another water mass. @internal */
export function withWater(prepared: PreparedFill, waterG: number): PreparedFill {
  return { ...prepared, waterG };
}
