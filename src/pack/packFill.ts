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
import { checkOptionKeys, optionNames } from '../quantity/argumentChecks.js';
import type { SolubilityCurve } from './solubilityCurve.js';
import { packSaltData, type PackSaltData } from './packSaltData.js';
import type { SolubilityStatus } from './saltSolubility.js';
import { solubilityBoundsOf, solubilityNote, type SolubilityBounds } from './solubilityBounds.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/** One solid of a fill. */
export interface PackSolid {
  /** Formula as loaded, hydrate water included (`CaCl2`, `NaCH3COO·3H2O`). */
  formula: string;
  /** Grams loaded. */
  massG: number;
}

/** What goes into the pack. */
export interface PackFill {
  solids: readonly PackSolid[];
  /** Grams of liquid water (not counting any water of crystallization of the solids). */
  waterG: number;
  /** Start temperature of water, solids and container, °C (default 20 °C). */
  startC?: number;
  /** Heat capacity of the container, gel or wrapping that follows the fill's temperature, J/K (default 0). */
  containerJPerK?: number;
}

/** How the 95 % interval of the final temperature is found. */
export type PackIntervalOptions =
  | { method: 'bounds' }
  | {
      method: 'monte-carlo';
      /** Number of draws (default 2000). */
      samples?: number;
      /** Seed of the pseudo-random draws (default 1): the same seed gives the same interval. */
      seed?: number;
    };

/** Options of the pack model. */
export interface PackOptions {
  /**
   * Your own heat capacity of the whole fill (solution, undissolved solid and
   * container), J/K, replacing the sum of parts.
   */
  heatCapacityJPerK?: number;
  /** Standard uncertainty of your heat capacity, J/K (default 0). */
  heatCapacityUJPerK?: number;
  /**
   * Kept for callers of earlier versions: the enthalpy balance now always
   * takes ΔsolH°(∞) at the start temperature (Kirchhoff, with the typical
   * ΔsolCp° and a wider interval where the salt's own is unknown).
   */
  kirchhoff?: boolean;
  /** Default `{ method: 'bounds' }`. */
  interval?: PackIntervalOptions;
}

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

/** Default start temperature: a room, °C (common practice). */
export const DEFAULT_START_C = 20;

/**
 * Relative allowance for the heat capacity a dissolved salt adds when the
 * infinite-dilution value is not tabulated: an assumed 50 % of the crystal's
 * Cp°, not a published figure.
 */
const ADDITIVITY_FALLBACK_RELATIVE = 0.5;

const FILL_KEYS = optionNames<PackFill>('a pack fill', { solids: true, waterG: true, startC: true, containerJPerK: true });
const SOLID_KEYS = optionNames<PackSolid>('a solid of the fill', { formula: true, massG: true });
const PACK_OPTION_KEYS = optionNames<PackOptions>('the pack model', { heatCapacityJPerK: true, heatCapacityUJPerK: true, kirchhoff: true, interval: true });
const INTERVAL_KEYS = optionNames<{ method: string; samples?: number; seed?: number }>('the interval option', { method: true, samples: true, seed: true });

function invalid(field: string, message: string): IonheatError {
  return new IonheatError('INVALID_ARGUMENT', message, { field });
}

/**
 * The range a mass (g) or heat capacity (J/K) of a fill may take: from a
 * microgram (or µJ/K) to a thousand tonnes (or GJ/K), so that every product
 * and quotient of the heat balance stays a finite, meaningful number.
 */
const FILL_RANGE = { min: 1e-6, max: 1e9 };

function checkPositive(value: unknown, field: string, what: string, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw invalid(field, `${what} (${field}) must be a number of ${unit}, got ${typeof value === 'number' ? String(value) : typeof value}`);
  if (value <= 0) throw invalid(field, `${what} (${field}) must be greater than zero, got ${value} ${unit}`);
  if (value < FILL_RANGE.min || value > FILL_RANGE.max) throw invalid(field, `${what} (${field}) must lie between ${FILL_RANGE.min} and ${FILL_RANGE.max} ${unit}, got ${value} ${unit}`);
  return value;
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
  if (options === null || typeof options !== 'object') throw invalid('options', `the pack options are an object, got ${options === null ? 'null' : typeof options}`);
  if (fill === null || typeof fill !== 'object') throw invalid('fill', 'a pack fill is an object with solids, waterG and optionally startC and containerJPerK');
  checkOptionKeys(options, PACK_OPTION_KEYS, 'options');
  checkOptionKeys(fill, FILL_KEYS, 'fill');
  if (!Array.isArray(fill.solids) || fill.solids.length === 0 || fill.solids.length > 100) throw invalid('solids', 'a pack fill needs from one to 100 solids (solids: [{ formula, massG }])');
  const waterG = checkPositive(fill.waterG, 'waterG', 'the water', 'g');
  const startGiven = fill.startC ?? DEFAULT_START_C;
  const startC = typeof startGiven === 'number' ? unsignedZero(startGiven) : startGiven;
  if (typeof startC !== 'number' || !Number.isFinite(startC) || startC < 0 || startC >= 100) {
    throw invalid('startC', `the start temperature (startC) must lie where water is liquid at 1 bar, from 0 °C up to (not including) 100 °C; got ${typeof startC === 'number' ? String(startC) : typeof startC} °C`);
  }
  const containerJPerK = fill.containerJPerK ?? 0;
  if (typeof containerJPerK !== 'number' || !Number.isFinite(containerJPerK) || containerJPerK < 0 || containerJPerK > FILL_RANGE.max) {
    throw invalid('containerJPerK', `the container heat capacity (containerJPerK) must be from 0 to ${FILL_RANGE.max} J/K, got ${typeof containerJPerK === 'number' ? String(containerJPerK) : typeof containerJPerK}`);
  }
  const interval: unknown = options.interval;
  if (interval !== undefined) {
    const iv = interval as { method?: unknown; samples?: unknown; seed?: unknown };
    if (iv === null || typeof iv !== 'object' || (iv.method !== 'bounds' && iv.method !== 'monte-carlo')) throw invalid('interval', `the interval option is { method: 'bounds' } or { method: 'monte-carlo', samples, seed }, got ${iv === null || typeof iv !== 'object' ? String(iv) : `method ${String(iv.method as string)}`}`);
    checkOptionKeys(iv, iv.method === 'bounds' ? { owner: 'the bounds interval', keys: ['method'] } : INTERVAL_KEYS, 'interval');
    if (iv.samples !== undefined && !(typeof iv.samples === 'number' && iv.samples >= 1 && iv.samples <= 100_000)) throw invalid('interval.samples', `the number of Monte Carlo draws (interval.samples) must be from 1 to 100000, got ${typeof iv.samples === 'number' ? iv.samples : typeof iv.samples}`);
    if (iv.seed !== undefined && !(typeof iv.seed === 'number' && Number.isFinite(iv.seed))) throw invalid('interval.seed', `the Monte Carlo seed (interval.seed) must be a finite number, got ${typeof iv.seed === 'number' ? iv.seed : typeof iv.seed}`);
  }
  let heatCapacityOverride: PreparedFill['heatCapacityOverride'];
  if (options.heatCapacityJPerK !== undefined) {
    const value = checkPositive(options.heatCapacityJPerK, 'heatCapacityJPerK', 'your heat capacity', 'J/K');
    const u = options.heatCapacityUJPerK ?? 0;
    if (typeof u !== 'number' || !Number.isFinite(u) || u < 0 || u > value) throw invalid('heatCapacityUJPerK', `the uncertainty of your heat capacity (heatCapacityUJPerK) must be from 0 J/K up to the heat capacity itself, got ${typeof u === 'number' ? String(u) : typeof u}`);
    heatCapacityOverride = { value, u };
  }

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
    const massG = checkPositive(solid.massG, `${field}.massG`, `the mass of ${salt.formula}`, 'g');
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
