/**
 * The 95 % interval of a fill's final temperature, propagated from the
 * intervals of the enthalpies of solution and the uncertainty of the heat
 * capacity.
 *
 * @module
 */
import { COVERAGE_95 } from '../quantity/constants.js';
import { quadrature } from '../quantity/propagate.js';
import type { Perturbation } from './fillEquilibrium.js';
import { brineHeatCapacityU } from '../brine/brineProperties.js';
import { ZERO_CELSIUS_K } from '../brine/debyeHuckelSlopes.js';
import type { PreparedFill } from './packFill.js';
import type { PackIntervalOptions } from './packInput.js';
import { seededNormal } from '../numeric/seededNormal.js';
import { withSolubilityBounds } from './solubilityBounds.js';
import { measuredSolubilityRelativeU } from './saltSolubility.js';
import { solveFillTemperature, type FillSolution } from './solveFillTemperature.js';
import { quantile } from '../numeric/quantile.js';

/** One uncertain input of the balance. @internal */
export interface UncertainInput {
  /** What it is, in words. */
  label: string;
  /** Standard uncertainty, in the unit of the shift (for an interval wider than ±1.96·u, the one it implies). */
  u: number;
  /** Distance from the value up to the top / down to the bottom of the input's own 95 % interval; ±1.96·u when absent. */
  up?: number;
  down?: number;
  /** The perturbation that moves this input by `shift`. */
  perturb(shift: number): Perturbation;
}

/** The interval and how it was found. */
export interface TemperatureInterval {
  /** °C. */
  low: number;
  /** °C. */
  high: number;
  /** Standard uncertainty, K. */
  u: number;
  method: 'bounds' | 'monte-carlo';
  /** Monte Carlo only. */
  samples?: number;
  seed?: number;
  /** How the interval was found, in words. */
  description: string;
}

/** Default Monte Carlo draws. */
export const DEFAULT_SAMPLES = 2000;
/** Default Monte Carlo seed: fixed, so that a result is reproducible. */
export const DEFAULT_SEED = 1;

/**
 * The uncertain inputs of a fill at its solved state: each solid's enthalpy of
 * solution (kJ/mol), that of each equilibrium solid an undissolved salt
 * turns into, and the heat capacity (relative).
 *
 * Heat capacity from the parts: u² = (W·u(c_w))² + Σ(nᵢ,dissolved)²·(u(φCp°ᵢ)² + u(φJᵢ)²)
 * + Σ(nᵢ,undissolved·u(Cp°solid))², u(φJ) being the brine module's fit
 * allowance or model discrepancy at the final molality. The integral
 * enthalpy's input combines the interval of ΔsolH°(∞) with u(φL) at the final
 * molality; a measured solubility is an input (relative u of 2 %, 5 % from
 * memory: S·(1 ± 1.96·u)) where its salt ends at or near saturation; the
 * osmotic coefficients are an input where ice or boiling is involved.
 * @internal
 */
export function uncertainInputs(fill: PreparedFill, solution: FillSolution): UncertainInput[] {
  const inputs: UncertainInput[] = [];
  const n = fill.solids.length;
  const shiftAt = (i: number, shift: number): number[] => Array.from({ length: n }, (_, k) => (k === i ? shift : 0));
  fill.solids.forEach((s, i) => {
    // ΔsolH°(∞) and φL at the final molality are independent; their spreads add in quadrature on each side.
    const own = ownInterval(s.enthalpy);
    const uL = solution.state.solids[i]!.integralEnthalpyU;
    const spread = { u: Math.hypot(own.u, uL), up: Math.hypot(own.up, COVERAGE_95 * uL), down: Math.hypot(own.down, COVERAGE_95 * uL) };
    inputs.push({ label: `integral enthalpy of solution of ${s.salt.formula} (ΔsolH°(∞) and φL)`, ...spread, perturb: (shift) => ({ enthalpyShift: shiftAt(i, shift) }) });
    const state = solution.state.solids[i]!;
    if (state.converts && state.fraction < 1) {
      const phase = s.phases.get(state.undissolvedPhase);
      const spread = phase?.enthalpy ? ownInterval(phase.enthalpy) : { u: 0 };
      inputs.push({ label: `enthalpy of solution of ${state.undissolvedPhase}`, ...spread, perturb: (shift) => ({ phaseShift: shiftAt(i, shift) }) });
    }
  });
  // A measured solubility moves the final temperature only where the salt is at or near saturation.
  fill.solids.forEach((s, i) => {
    if (s.solubilityStatus !== 'measured' || !s.curve) return;
    const state = solution.state.solids[i]!;
    const relative = measuredSolubilityRelativeU(s.curve);
    if (!nearSaturation(s.moles * s.anhydrousMolarMass, solution.state.liquidWaterG, state, relative)) return;
    inputs.push({ label: `solubility of ${s.salt.anhydrous} (measured, ${(100 * relative).toFixed(0)} %)`, u: relative, perturb: (shift) => ({ solubilityRelative: shiftAt(i, shift) }) });
  });
  // The osmotic coefficients set where ice forms and where the brine boils: an input wherever either can happen
  // (below 0 °C or above 99 °C), not only where it does at the solved state, so that the interval does not jump
  // where ice first forms as the salt-to-water ratio grows.
  if (solution.state.iceG > 0 || solution.clamp || solution.temperature < 0 || solution.temperature > 99) inputs.push({ label: 'osmotic coefficients (freezing and boiling points)', u: 1, perturb: (shift) => ({ osmoticZ: shift }) });
  if (fill.heatCapacityOverride) {
    const { value, u } = fill.heatCapacityOverride;
    inputs.push({ label: 'your heat capacity', u: u / value, perturb: (shift) => ({ heatCapacityRelative: shift }) });
  } else {
    inputs.push({ label: 'heat capacity from the parts', u: heatCapacityRelativeU(fill, solution), perturb: (shift) => ({ heatCapacityRelative: shift }) });
  }
  return inputs.filter((input) => input.u > 0);
}

/**
 * True when a solid is saturated at the solved state, or dissolved to within
 * 2·1.96 relative standard uncertainties of its solubility, so that a
 * solubility at either end of its 95 % interval could change what dissolves.
 */
function nearSaturation(loadedAnhydrousG: number, liquidWaterG: number, state: { fraction: number; solubility: { value: number } | undefined }, relative: number): boolean {
  if (state.fraction < 1) return true;
  if (!state.solubility || !(liquidWaterG > 0)) return false;
  const perHundred = (100 * loadedAnhydrousG) / liquidWaterG;
  return perHundred >= state.solubility.value * (1 - 2 * COVERAGE_95 * relative);
}

/**
 * An enthalpy's spread as its own 95 % interval gives it: the distances up
 * and down to the interval's ends (which a Student-t factor or an anchor
 * spread may have made wider than ±1.96·u, or lopsided), and the standard
 * uncertainty a normal distribution of that width would have,
 * u = (high − low)/(2·1.96), never less than the estimate's own u.
 */
function ownInterval(e: { value: number; u: number; low: number; high: number }): { u: number; up: number; down: number } {
  const up = Math.max(e.high - e.value, 0);
  const down = Math.max(e.value - e.low, 0);
  return { u: Math.max(e.u, (up + down) / (2 * COVERAGE_95)), up, down };
}

/**
 * Relative standard uncertainty of the heat capacity from the parts at the
 * solved state (see {@link uncertainInputs}); 0 with an override.
 * @internal
 */
export function heatCapacityRelativeU(fill: PreparedFill, solution: FillSolution): number {
  if (fill.heatCapacityOverride) return 0;
  const state = solution.state;
  const terms = [state.liquidWaterG * fill.waterSpecificHeat.u];
  fill.solids.forEach((s, i) => {
    const e = state.solids[i]!;
    terms.push(s.moles * e.fraction * quadrature(s.additivityU, e.molality > 0 ? brineHeatCapacityU(s.brine, e.molality, fill.startC + ZERO_CELSIUS_K) : 0));
    const solidCp = e.converts ? (s.phases.get(e.undissolvedPhase)?.heatCapacity.u ?? 0) : s.heatCapacityLoaded.u;
    terms.push(s.moles * (1 - e.fraction) * solidCp);
  });
  const parts = state.heatCapacity - state.heatCapacityParts.container;
  return parts > 0 ? quadrature(...terms) / parts : 0;
}

/**
 * The 95 % interval of the final temperature.
 *
 * `bounds` (the default): each uncertain input in turn is moved to the ends
 * of its own 95 % interval (an enthalpy to its `low` and `high`, which may be
 * wider than ±1.96·u; the heat capacity by ±1.96·u) and the fill re-solved; the upward and
 * the downward shifts of the final temperature are each combined in
 * quadrature (first-order propagation, GUM, with separate sensitivities on
 * each side, so a solubility limit or the freezing clamp shows as a lopsided
 * interval). u is the root sum of squares of the central differences.
 *
 * `monte-carlo`: every input drawn together from a normal distribution as
 * wide as its own 95 % interval (seeded, default seed 1, 2000 draws), the fill solved for each draw, and
 * the 2.5th and 97.5th percentiles taken; u is the spread of the draws.
 *
 * Inputs are treated as independent, which overstates the spread where two
 * enthalpies share a formation enthalpy.
 *
 * @see JCGM 100:2008 (GUM) §5.1; JCGM 101:2008 (propagation of distributions by Monte Carlo).
 * @internal
 */
export function finalTemperatureInterval(fill: PreparedFill, solution: FillSolution, options: PackIntervalOptions = { method: 'bounds' }): TemperatureInterval {
  return withTransitionBracket(fill, solution, withSolubilityBounds(fill, solution, propagatedInterval(fill, solution, options)));
}

/**
 * The table points either side of the change of equilibrium solid a fill
 * holds at, °C: the table places the change only between them.
 * @internal
 */
export function transitionBracket(fill: PreparedFill, temperature: number): [number, number] | undefined {
  for (const s of fill.solids) {
    const pts = s.curve?.points ?? [];
    for (let k = 0; k + 1 < pts.length; k++) {
      if (pts[k]!.phase !== pts[k + 1]!.phase && Math.abs((pts[k]!.t + pts[k + 1]!.t) / 2 - temperature) < 1e-9) return [pts[k]!.t, pts[k + 1]!.t];
    }
  }
  return undefined;
}

/**
 * A fill that holds at a change of equilibrium solid holds at the change's
 * own temperature, which the solubility table places only somewhere between
 * two of its points (the change is taken at their midpoint): the interval
 * takes in both points, so that it is never of zero width there.
 */
function withTransitionBracket(fill: PreparedFill, solution: FillSolution, interval: TemperatureInterval): TemperatureInterval {
  if (!solution.transition) return interval;
  const bracket = transitionBracket(fill, solution.transition.temperature);
  if (!bracket) return interval;
  const low = Math.min(interval.low, bracket[0]);
  const high = Math.max(interval.high, bracket[1]);
  return {
    ...interval,
    low,
    high,
    u: Math.max(interval.u, (high - low) / (2 * COVERAGE_95)),
    description: `${interval.description}; widened to the table points ${bracket[0]} and ${bracket[1]} °C between which the equilibrium solid changes, where the fill holds`,
  };
}

/** The interval from the enthalpies and the heat capacity alone (see {@link finalTemperatureInterval}). */
function propagatedInterval(fill: PreparedFill, solution: FillSolution, options: PackIntervalOptions): TemperatureInterval {
  const t = solution.temperature;
  const inputs = uncertainInputs(fill, solution);
  const listed = inputs.map((i) => i.label).join(', ');
  if (options.method === 'monte-carlo') {
    const samples = Math.max(20, Math.floor(options.samples ?? DEFAULT_SAMPLES));
    const seed = (options.seed ?? DEFAULT_SEED) || 0; // −0 reported as 0
    const draw = seededNormal(seed);
    const n = fill.solids.length;
    const results = new Float64Array(samples);
    for (let k = 0; k < samples; k++) {
      const enthalpyShift = new Array<number>(n).fill(0);
      const phaseShift = new Array<number>(n).fill(0);
      const brineEnthalpyZ = new Array<number>(n).fill(0);
      const brineHeatCapacityZ = new Array<number>(n).fill(0);
      const solubilityRelative = new Array<number>(n).fill(0);
      let heatCapacityRelative = 0;
      let osmoticZ = 0;
      for (const input of inputs) {
        const p = input.perturb(1);
        const z = draw() * input.u;
        if (p.enthalpyShift) p.enthalpyShift.forEach((v, i) => (enthalpyShift[i]! += v * z));
        if (p.phaseShift) p.phaseShift.forEach((v, i) => (phaseShift[i]! += v * z));
        if (p.brineEnthalpyZ) p.brineEnthalpyZ.forEach((v, i) => (brineEnthalpyZ[i]! += v * z));
        if (p.brineHeatCapacityZ) p.brineHeatCapacityZ.forEach((v, i) => (brineHeatCapacityZ[i]! += v * z));
        if (p.solubilityRelative) p.solubilityRelative.forEach((v, i) => (solubilityRelative[i]! += v * z));
        if (p.osmoticZ) osmoticZ += p.osmoticZ * z;
        if (p.heatCapacityRelative) heatCapacityRelative += p.heatCapacityRelative * z;
      }
      results[k] = solveFillTemperature(fill, { enthalpyShift, phaseShift, brineEnthalpyZ, brineHeatCapacityZ, osmoticZ, solubilityRelative: solubilityRelative.map((r) => Math.max(-0.9, r)), heatCapacityRelative: Math.max(-0.9, heatCapacityRelative) }).temperature;
    }
    results.sort();
    let mean = 0;
    for (const r of results) mean += r / samples;
    let variance = 0;
    for (const r of results) variance += (r - mean) ** 2 / (samples - 1);
    return {
      low: Math.min(t, quantile(results, 0.025)),
      high: Math.max(t, quantile(results, 0.975)),
      u: Math.sqrt(variance),
      method: 'monte-carlo',
      samples,
      seed,
      description: `95 % interval from ${samples} seeded Monte Carlo draws (seed ${seed}) of ${listed || 'no uncertain input'}, each normal and independent; 2.5th to 97.5th percentile`,
    };
  }
  let up = 0;
  let down = 0;
  let central = 0;
  // The combined shift may not carry the interval past a floor or ceiling that a re-solve ran into.
  let floor = solution.clamp && solution.clamp.kind !== 'boiling' ? solution.clamp.temperature : -Infinity;
  let ceiling = solution.clamp?.kind === 'boiling' ? solution.clamp.temperature : Infinity;
  for (const input of inputs) {
    const upShift = input.up ?? COVERAGE_95 * input.u;
    const downShift = input.down ?? COVERAGE_95 * input.u;
    const plusSolution = solveFillTemperature(fill, input.perturb(upShift));
    const minusSolution = solveFillTemperature(fill, input.perturb(-downShift));
    // Only a limit on the far side of the solved temperature bounds the interval: a re-solve that stops at a
    // eutectic above it (its brine freezing sooner) is a shift upwards, not a floor.
    for (const s of [plusSolution, minusSolution]) {
      if (s.clamp?.kind === 'boiling') {
        if (s.clamp.temperature >= t) ceiling = Math.min(ceiling, s.clamp.temperature);
      } else if (s.clamp && s.clamp.temperature <= t) floor = floor === -Infinity ? s.clamp.temperature : Math.min(floor, s.clamp.temperature);
    }
    const plus = plusSolution.temperature;
    const minus = minusSolution.temperature;
    up += Math.max(0, plus - t, minus - t) ** 2;
    down += Math.max(0, t - plus, t - minus) ** 2;
    // sensitivity (plus − minus)/(up + down) times the input's u, (up + down)/(2·1.96)
    central += ((plus - minus) / (2 * COVERAGE_95)) ** 2;
  }
  const low = Math.min(t, Math.max(floor, t - Math.sqrt(down)));
  return {
    low,
    high: Math.max(t, Math.min(ceiling, t + Math.sqrt(up))),
    u: Math.sqrt(central),
    method: 'bounds',
    description: `95 % interval by bounds: each of ${listed || 'no uncertain input'} moved in turn to the ends of its own 95 % interval and the fill re-solved; upward and downward shifts combined in quadrature, and kept within any freezing, eutectic or boiling limit a re-solve reached`,
  };
}
