/**
 * `packFinalTemperature`: the temperature a hot or cold pack fill reaches,
 * limited by solubility and by freezing or boiling, with its 95 % interval,
 * the dissolved and undissolved masses, the heat, and the cautions.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { basisOrder, makeEstimate, type Basis, type Estimate } from '../quantity/estimate.js';
import { finalTemperatureInterval, heatCapacityRelativeU, transitionBracket, type TemperatureInterval } from './finalTemperatureInterval.js';
import type { FillEquilibrium } from './fillEquilibrium.js';
import { packCautions } from './packCautions.js';
import type { Caution } from '../quantity/caution.js';
import { preparePackFill, type PreparedFill } from './packFill.js';
import { type PackFill, type PackOptions } from './packInput.js';
import { solveFillTemperature, type FillSolution } from './solveFillTemperature.js';
import { integralFromInfinite } from '../solution/toMolality.js';
import type { SolubilityStatus } from './saltSolubility.js';
import { CONVERSION_MIN_SOLUBILITY } from './solidConversion.js';

/** One solid at the end, grams of the solid as loaded unless said otherwise. */
export interface PackDissolvedSolid {
  /** Canonical formula as loaded. */
  formula: string;
  loadedMass: number;
  dissolvedMass: number;
  undissolvedMass: number;
  /** What stays solid: the equilibrium solid (when the loaded solid turns into it) with its mass in grams; null when everything dissolved. */
  undissolvedSolid: { formula: string; mass: number } | null;
  /** True when the solution ends saturated in this salt. */
  saturated: boolean;
  /** How well the solubility is known: measured (table), estimated (solubility product) or unknown (then `solubility` is null and the interval spans none to all dissolved). */
  solubilityStatus: SolubilityStatus;
  /** Solubility at the final temperature, or null when unknown (the value is then the one with the solid all dissolved). */
  solubility: { value: number; unit: 'g/100 g H2O'; solidPhase: string; extrapolated: boolean; source: string; fromMemory: boolean } | null;
  /** The enthalpy of solution at infinite dilution and the start temperature, kJ/mol of the loaded formula, positive = endothermic. */
  enthalpyOfSolution: Estimate;
  /** The integral enthalpy of solution used, to the molality reached (ΔsolH°(∞) + φL at the start temperature), kJ/mol of the loaded formula. */
  integralEnthalpy: Estimate;
  /** Molality of this salt in the final liquid, mol of anhydrous salt per kg of liquid water (0 when none dissolved). */
  molality: number;
  /** kJ absorbed by this solid (dissolving, plus any conversion of what stays undissolved); negative = released. */
  heat: number;
}

/** The heat of the fill, kJ. */
export interface PackHeat {
  unit: 'kJ';
  /** Net heat absorbed by dissolution; positive = endothermic (the fill cools), negative = released (it warms). */
  absorbed: number;
  direction: 'absorbed' | 'released' | 'none';
  /** Part taken up by the dissolving salt. */
  dissolution: number;
  /** Part taken up by undissolved solid turning into its equilibrium hydrate (negative when binding water releases heat). */
  solidConversion: number;
  /** Part taken up by ice forming (negative: freezing releases heat), ΔfusH at the start temperature. */
  iceFormation: number;
  /** Part taken up by water boiling off at a boiling hold. */
  boiling: number;
  /** Change of the fill's sensible heat, C·(T_final − T_start). */
  sensible: number;
  /** Relative imbalance |absorbed + sensible| / |absorbed| (0 when nothing is absorbed): the energy residual; it exceeds 1e-6 only where even the whole brine freezing at the eutectic cannot close the balance. */
  imbalance: number;
}

/** The heat capacity used, J/K. */
export interface PackHeatCapacity {
  value: number;
  /** Standard uncertainty, J/K. */
  u: number;
  unit: 'J/K';
  basis: 'parts' | 'override';
  /** The parts at the final state, J/K (the override replaces their sum). */
  parts: { water: number; dissolvedSalt: number; undissolvedSolid: number; container: number; ice: number };
}

/** Where the heat balance was cut short. */
export interface PackClamp {
  kind: 'freezing' | 'eutectic' | 'boiling';
  /** °C. */
  temperature: number;
  message: string;
}

/** What {@link packFinalTemperature} returns. */
export interface PackResult {
  fill: { solids: { formula: string; massG: number }[]; waterG: number; startC: number; containerJPerK: number };
  /** Final temperature, °C, with its 95 % interval. */
  finalTemperature: Estimate;
  /** T_final − T_start, K. */
  temperatureChange: number;
  interval: TemperatureInterval;
  dissolved: PackDissolvedSolid[];
  /** Grams of liquid water in the final solution. */
  liquidWater: number;
  /** Grams of ice in the final state (0 when none). */
  iceMass: number;
  /** Grams of water boiled off at a boiling hold (0 when none). */
  vaporMass: number;
  heat: PackHeat;
  heatCapacity: PackHeatCapacity;
  clamp: PackClamp | null;
  /** Burns, cold injury, boiling, undissolved salt, the salts' hazards and the screening line, each `{ kind, severity, text }`. */
  cautions: Caution[];
  notes: string[];
  /** Source keys of data/sources.json behind the numbers. */
  sources: string[];
}

function weakestBasis(estimates: readonly Estimate[]): Basis {
  return estimates.reduce<Basis>((worst, e) => (basisOrder.indexOf(e.basis) > basisOrder.indexOf(worst) ? e.basis : worst), 'measured');
}

function clampMessage(kind: PackClamp['kind'], t: number, solution: FillSolution): string {
  if (kind === 'boiling') return `the heat balance would carry the fill past the boiling point of its brine (${t.toFixed(2)} °C at 1 atm, raised by the dissolved salt): it holds there while about ${solution.vaporG.toFixed(1)} g of water boils off`;
  if (kind === 'eutectic') {
    const share = solution.state.eutecticFraction;
    return share < 1
      ? `the fill reaches the salt–ice eutectic of its brine (${t.toFixed(2)} °C) and holds there: ${(100 * share).toFixed(0)} % of the brine freezes out as ice and salt together, which closes the heat balance`
      : `the fill reaches the salt–ice eutectic of its brine (${t.toFixed(2)} °C) and all its brine freezes there; the heat balance still does not close (see heat.imbalance)`;
  }
  return `the scan reached ${t} °C without a balance; the result there is not a pack temperature`;
}

/** The integral enthalpy used for one solid, as an estimate: ΔsolH°(∞, T₀)'s interval widened by u(φL). */
function integralEstimate(infinite: Estimate, value: number, uL: number, molality: number, basis: string, sources: readonly string[]): Estimate {
  return integralFromInfinite(infinite, value, uL, basis, sources, [`to ${molality.toFixed(3)} mol/kg: φL = ${(value - infinite.value).toFixed(3)} kJ/mol`]);
}

/**
 * Assembles a result from a solved fill. Exposed for the inverse design and
 * the time course, which re-solve prepared fills.
 * @internal
 */
export function packResult(fill: PreparedFill, solution: FillSolution, interval: TemperatureInterval, dataset: Dataset): PackResult {
  const state: FillEquilibrium = solution.state;
  const t = solution.temperature;
  const notes = [...fill.notes];
  const sources = new Set(fill.sources);
  const dissolved: PackDissolvedSolid[] = fill.solids.map((s, i) => {
    const e = state.solids[i]!;
    const loaded = s.massG;
    const dissolvedMass = loaded * e.fraction;
    const undissolvedMass = loaded - dissolvedMass;
    const leftMoles = s.moles * (1 - e.fraction);
    const solid = undissolvedMass > 0 ? { formula: e.undissolvedPhase, mass: leftMoles * (s.anhydrousMolarMass + e.undissolvedWater * fill.waterMolarMass) } : null;
    if (e.solubility?.extrapolated) notes.push(`the solubility of ${s.salt.anhydrous} at ${t.toFixed(1)} °C lies outside its table (${s.curve!.tableRange[0]}–${s.curve!.tableRange[1]} °C) and was extended from the nearest segment`);
    if (e.fraction < 1 && e.converts) {
      notes.push(`undissolved ${s.salt.formula} is taken to turn into ${e.undissolvedPhase}, the solid in equilibrium with the saturated solution, taking ${e.undissolvedWater > s.salt.water ? 'up' : 'off'} its water of crystallization; the heat of that change, ΔsolH(${s.salt.formula}) − ΔsolH(${e.undissolvedPhase}), is counted`);
      if (state.hydrationFraction < 1) notes.push(`there is too little water for all the undissolved solid to become ${e.undissolvedPhase}; only ${(100 * state.hydrationFraction).toFixed(0)} % of that change is counted and no liquid remains`);
    } else if (e.slowConversion) {
      notes.push(`undissolved ${s.salt.formula} is taken to stay as loaded: it barely dissolves (${e.solubility!.value.toPrecision(2)} g per 100 g water, below the ${CONVERSION_MIN_SOLUBILITY} g at which it is counted), and its change into ${e.solubility!.phase} runs through the solution, far more slowly than a pack is used; the 95 % interval reaches to the temperature with that change counted in full`);
    } else if (e.fraction < 1 && e.solubility && e.solubility.phase !== s.salt.formula) {
      notes.push(`undissolved ${s.salt.formula} is taken to stay as loaded: no enthalpy of solution is known for ${e.solubility.phase}, the solid in equilibrium with the saturated solution`);
    }
    return {
      formula: s.salt.formula,
      loadedMass: loaded,
      dissolvedMass,
      undissolvedMass,
      undissolvedSolid: solid,
      saturated: e.saturated,
      solubilityStatus: s.solubilityStatus,
      solubility: e.solubility
        ? { value: e.solubility.value, unit: 'g/100 g H2O', solidPhase: e.solubility.phase, extrapolated: e.solubility.extrapolated, source: s.curve!.source, fromMemory: s.curve!.fromMemory }
        : null,
      enthalpyOfSolution: s.enthalpy,
      integralEnthalpy: integralEstimate(s.enthalpy, e.integralEnthalpy, e.integralEnthalpyU, e.molality, s.brine.basis, s.brine.sources),
      molality: e.molality,
      heat: (e.dissolutionJ + e.conversionJ) / 1000,
    };
  });

  const absorbed = state.heatJ / 1000;
  const sensible = (state.heatCapacity * (t - fill.startC)) / 1000;
  const vaporJ = (solution.vaporG / (1000 * fill.water.molarMass)) * fill.water.vaporizationEnthalpy;
  const absorbedAll = absorbed + vaporJ / 1000;
  const clamp: PackClamp | null = solution.clamp ? { ...solution.clamp, message: clampMessage(solution.clamp.kind, solution.clamp.temperature, solution) } : null;
  if (state.iceG > 0) notes.push(`${state.iceG.toFixed(1)} g of ice forms: below 0 °C the brine concentrates until its water activity (Pitzer osmotic coefficient) equals that over ice; the latent heat, ΔfusH(T₀) = ΔfusH(0 °C) + ΔfusCp·T₀, is counted`);
  if (clamp) notes.push(clamp.message);
  if (solution.transition) {
    const bracket = transitionBracket(fill, solution.transition.temperature);
    notes.push(`the fill holds at ${t.toFixed(2)} °C, where the equilibrium solid changes in the solubility table${bracket ? ` (somewhere between its points at ${bracket[0]} and ${bracket[1]} °C, taken at the midpoint; the 95 % interval spans both)` : ''}: both solids are present, ${(100 * solution.transition.lowShare).toFixed(0)} % of the fill in the state below the change and the rest in the state above, which closes the heat balance`);
  } else if (solution.jump) notes.push(`the balance is pinned at ${t.toFixed(2)} °C, where the equilibrium solid changes in the solubility table; the true temperature lies near it`);
  if (fill.heatCapacityOverride) notes.push('heat capacity: your value replaces the sum of parts (solution, undissolved solid and container)');
  else notes.push('heat capacity from the parts: liquid water, the dissolved salt as its apparent molar heat capacity φCp = φCp°(∞) + φJ(m) (Pitzer), the undissolved solid, any ice, and the container');
  notes.push('heat balance: the enthalpy of the final state equals that of the start; each salt dissolves with its integral enthalpy of solution to the molality it reaches, ΔsolH°(∞, T₀) + φL(m, T₀) (brine module), and the interval carries the uncertainty of φL and φCp');
  for (const s of fill.solids) for (const n of s.enthalpy.notes) notes.push(`${s.salt.formula}: ${n}`);
  const enthalpies = fill.solids.map((s) => s.enthalpy);

  const u = interval.u;
  const finalTemperature = makeEstimate({
    quantity: 'final temperature',
    value: t,
    u,
    low: Math.min(interval.low, t),
    high: Math.max(interval.high, t),
    unit: '°C',
    basis: weakestBasis(enthalpies),
    method: 'adiabatic-balance',
    sources: [...sources],
    notes: [interval.description],
  });

  const heatCapacityU = fill.heatCapacityOverride ? fill.heatCapacityOverride.u : (state.heatCapacity - state.heatCapacityParts.container) * heatCapacityRelativeU(fill, solution);
  return {
    fill: { solids: fill.solids.map((s) => ({ formula: s.salt.formula, massG: s.massG })), waterG: fill.waterG, startC: fill.startC, containerJPerK: fill.containerJPerK },
    finalTemperature,
    temperatureChange: t - fill.startC,
    interval,
    dissolved,
    liquidWater: state.liquidWaterG,
    iceMass: state.iceG,
    vaporMass: solution.vaporG,
    heat: {
      unit: 'kJ',
      absorbed,
      direction: absorbed > 0 ? 'absorbed' : absorbed < 0 ? 'released' : 'none',
      dissolution: state.solids.reduce((sum, e) => sum + e.dissolutionJ, 0) / 1000,
      solidConversion: state.solids.reduce((sum, e) => sum + e.conversionJ, 0) / 1000,
      iceFormation: state.iceJ / 1000,
      boiling: vaporJ === 0 ? 0 : vaporJ / 1000,
      sensible,
      imbalance: absorbedAll === 0 ? 0 : Math.abs(absorbedAll + sensible) / Math.abs(absorbedAll),
    },
    heatCapacity: {
      value: state.heatCapacity,
      u: heatCapacityU,
      unit: 'J/K',
      basis: fill.heatCapacityOverride ? 'override' : 'parts',
      parts: { water: state.heatCapacityParts.water, dissolvedSalt: state.heatCapacityParts.dissolved, undissolvedSolid: state.heatCapacityParts.undissolved, container: state.heatCapacityParts.container, ice: state.heatCapacityParts.ice },
    },
    clamp,
    cautions: packCautions({ startC: fill.startC, final: finalTemperature, clamp: clamp?.kind, salts: fill.solids.map((s) => s.salt), undissolved: dissolved }, dataset),
    notes: [...new Set(notes)],
    sources: [...sources].sort(),
  };
}

/**
 * The adiabatic final temperature of a hot- or cold-pack fill.
 *
 * Each solid dissolves up to what its solubility allows at the final
 * temperature (interpolated in the solubility table; a solid without data
 * dissolves completely); the heat taken up, Σ nᵢ,dissolved·ΔsolHᵢ, equals
 * the fill's loss of sensible heat, C·(T₀ − T). The balance is solved with a
 * bracketed root finder (Brent) to 1e-9 K and never reported below the
 * solution's freezing point or the salt–ice eutectic, nor above boiling. The
 * 95 % interval comes from the enthalpy intervals and the heat-capacity
 * uncertainty, by bounds (default) or seeded Monte Carlo.
 *
 * The balance, for solids i dissolving nᵢ(T) mol with ΔsolHᵢ (kJ/mol,
 * positive = endothermic) into a fill of heat capacity C (J/K):
 *
 *   Σᵢ nᵢ(T)·ΔsolHᵢ·1000 = C·(T₀ − T)
 *
 * @param fill - solids (formula, grams), water (g), start (°C, default 20), container (J/K, default 0)
 * @param options - heat-capacity override, Kirchhoff correction, interval method
 * @param dataset - enthalpies of solution, solubilities, heat capacities and hazards (default: built-in)
 * @returns temperatures in °C, masses in g, heats in kJ, heat capacity in J/K, with cautions and notes
 * @see enthalpies of solution: the CRC table, `crcSolution`, and Wagman et al. (1982), `wagman1982`; solubilities: the CRC
 *   table, `crcSolubility`; heat capacities: `wagman1982`; the root finder: Brent, R. P. Algorithms for Minimization
 *   without Derivatives (Prentice-Hall, 1973), ch. 4; docs/methods.md, "Pack design".
 * @throws IonheatError `INVALID_ARGUMENT` naming the field for bad input; parser errors or `MISSING_DATA` for an unknown salt
 * @example
 * ```ts
 * // 10 g KNO3 in 100 g water at 20 °C: 0.0989 mol × 35.51 kJ/mol (integral, to 0.99 mol/kg) over 413.7 J/K
 * const r = packFinalTemperature({ solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 });
 * r.finalTemperature.value; // 11.51
 * r.dissolved[0].undissolvedMass; // 0
 * r.heatCapacity.value; // ≈ 413.7 J/K
 * r.iceMass; // 0
 * // 30 g CaCl2 in 100 g water: a hot pack, with the contact-burn caution first
 * const hot = packFinalTemperature({ solids: [{ formula: 'CaCl2', massG: 30 }], waterG: 100, startC: 20 });
 * hot.finalTemperature.value; // ≈ 72.0 °C
 * hot.cautions[0].kind; // 'contact-burn'
 * hot.cautions[0].severity; // 'danger'
 * ```
 */
export function packFinalTemperature(fill: PackFill, options: PackOptions = {}, dataset: Dataset = builtinDataset()): PackResult {
  const prepared = preparePackFill(fill, options, dataset);
  const solution = solveFillTemperature(prepared);
  const interval = finalTemperatureInterval(prepared, solution, options.interval);
  return packResult(prepared, solution, interval, dataset);
}
