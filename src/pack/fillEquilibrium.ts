/**
 * The state a fill would settle into if it were held at temperature T: how
 * much of each solid dissolves (the lesser of what was loaded and what the
 * solubility allows), how much water stays liquid, the heat that takes, the
 * heat capacity of the whole, and the lowest temperature the liquid can
 * reach without freezing. The final temperature is the T at which this heat
 * balances the fill's own sensible heat.
 *
 * @module
 */
import { freezingPointOfSolution } from './freezingPoint.js';
import type { PreparedFill, PreparedPhase } from './packFill.js';
import { solubilityAt, type SolubilityAt } from './solubilityCurve.js';

/**
 * Shifts of the uncertain inputs, for the interval: kJ/mol added to each
 * solid's enthalpy of solution and to that of its equilibrium solid, and a
 * relative change of the heat capacity from the parts.
 * @internal
 */
export interface Perturbation {
  enthalpyShift?: readonly number[];
  phaseShift?: readonly number[];
  heatCapacityRelative?: number;
}

/** One solid in the state at T. @internal */
export interface SolidEquilibrium {
  /** Fraction of the loaded formula units dissolved, 0–1. */
  fraction: number;
  /** True when the solution is saturated in this salt (something stays undissolved). */
  saturated: boolean;
  /** Solubility at T, when the table has the salt. */
  solubility: SolubilityAt | undefined;
  /** The solid left undissolved: the equilibrium solid when its conversion is modelled, else the solid as loaded. */
  undissolvedPhase: string;
  /** Water of crystallization per formula unit of the undissolved solid as it ends up. */
  undissolvedWater: number;
  /** True when the undissolved solid takes up (or gives off) water to become the equilibrium solid. */
  converts: boolean;
  /** J absorbed by dissolving. */
  dissolutionJ: number;
  /** J absorbed by the conversion of the undissolved solid. */
  conversionJ: number;
  /** J/(K) this solid adds: dissolved part (crystal Cp°) plus undissolved part. */
  heatCapacityDissolved: number;
  heatCapacityUndissolved: number;
}

/** The whole fill at T. @internal */
export interface FillEquilibrium {
  temperature: number;
  /** Grams of liquid water in the solution (loaded water + crystal water released − water bound by undissolved hydrate). */
  liquidWaterG: number;
  solids: SolidEquilibrium[];
  /** Share of the hydrate water the undissolved solid could take up that it does take up (below 1 only when water runs out). */
  hydrationFraction: number;
  /** J absorbed in all (positive = endothermic, the fill cools). */
  heatJ: number;
  /** J/K. */
  heatCapacity: number;
  heatCapacityParts: { water: number; dissolved: number; undissolved: number; container: number };
  /** Lowest temperature the solution stays liquid at, °C, and what sets it. */
  floorC: number;
  floorKind: 'freezing' | 'eutectic' | 'none';
  /** Ideal freezing point of the solution, °C (undefined without liquid water). */
  freezingPointC: number | undefined;
}

/** xᵢ = min(1, W/W*ᵢ): the share of salt i that W grams of water dissolve (1 without solubility data). */
function dissolvedFraction(W: number, limited: number, waterToDissolve: number): number {
  if (limited === 0) return 1;
  return waterToDissolve === Infinity ? 0 : Math.min(1, W / waterToDissolve);
}

/** g(W) = W − Wtot + Σ bᵢ·(1 − xᵢ(W)). */
function waterBalance(W: number, totalWater: number, limited: readonly number[], waterToDissolve: readonly number[], holds: readonly number[]): number {
  let sum = W - totalWater;
  for (let i = 0; i < limited.length; i++) if (limited[i] === 1) sum += holds[i]! * (1 - dissolvedFraction(W, 1, waterToDissolve[i]!));
  return sum;
}

/**
 * Working arrays and results of one evaluation, reused across the many
 * evaluations of one solve (made fresh for each solve, so nothing is shared
 * between calls).
 * @internal
 */
export interface FillScratch {
  /** 1 where the salt has solubility data. */
  limited: number[];
  /** Water (g) that would dissolve all of salt i; Infinity when its solubility is zero. */
  waterToDissolve: number[];
  /** Water of crystallization per formula unit of undissolved salt i once it is the equilibrium solid. */
  phaseWater: number[];
  /** Water (g) undissolved salt i holds when none of it dissolves. */
  holds: number[];
  /** 1 where undissolved salt i turns into a different equilibrium solid. */
  converts: number[];
  fraction: number[];
  dissolutionJ: number[];
  conversionJ: number[];
  cpDissolved: number[];
  cpUndissolved: number[];
  phase: (PreparedPhase | undefined)[];
  solubility: (SolubilityAt | undefined)[];
  liquidWaterG: number;
  hydrationFraction: number;
  heatJ: number;
  heatCapacity: number;
  waterCp: number;
  dissolvedCp: number;
  undissolvedCp: number;
  floorC: number;
  floorKind: 'freezing' | 'eutectic' | 'none';
  freezingPointC: number | undefined;
}

/** n zeros in a plain array (small typed arrays cost more to allocate than they save here). */
function zeros(n: number): number[] {
  const a = new Array<number>(n);
  for (let i = 0; i < n; i++) a[i] = 0;
  return a;
}

/** Fresh working arrays for a fill. @internal */
export function fillScratch(fill: PreparedFill): FillScratch {
  const n = fill.solids.length;
  return {
    limited: zeros(n),
    waterToDissolve: zeros(n),
    phaseWater: zeros(n),
    holds: zeros(n),
    converts: zeros(n),
    fraction: zeros(n),
    dissolutionJ: zeros(n),
    conversionJ: zeros(n),
    cpDissolved: zeros(n),
    cpUndissolved: zeros(n),
    phase: new Array<PreparedPhase | undefined>(n),
    solubility: new Array<SolubilityAt | undefined>(n),
    liquidWaterG: 0,
    hydrationFraction: 1,
    heatJ: 0,
    heatCapacity: 0,
    waterCp: 0,
    dissolvedCp: 0,
    undissolvedCp: 0,
    floorC: 0,
    floorKind: 'none',
    freezingPointC: undefined,
  };
}

/**
 * The state of the fill held at temperature t (°C), written into `w`.
 *
 * Solubility: salt i dissolves up to Sᵢ(t)·W/100 grams of anhydrous salt in
 * W grams of liquid water. W is the loaded water plus the crystal water of
 * everything loaded, less the water the undissolved solid holds as its
 * equilibrium hydrate; it is solved exactly (the balance is piecewise linear
 * in W). A salt without solubility data dissolves completely.
 *
 * Heat: Σ nᵢ·[xᵢ·ΔsolHᵢ + (1 − xᵢ)·(ΔsolHᵢ − ΔsolH(equilibrium solid))], the
 * second term being the heat of the undissolved solid turning into the
 * equilibrium hydrate (or losing water) where that solid differs from the
 * loaded one and its enthalpy of solution is known.
 *
 * Heat capacity from the parts: liquid water × c(water) + dissolved salt ×
 * Cp°(anhydrous crystal) + undissolved solid × its Cp° + container (Kopp-style
 * additivity; good to a few per cent for concentrated solutions, an
 * overestimate for dilute ones, allowed for in the uncertainty).
 *
 * Floor: the ideal freezing point of the solution, and the salt–ice eutectic
 * of a salt that is alone in the fill or saturated.
 *
 * @internal
 */
export function evaluateFill(fill: PreparedFill, t: number, perturbation: Perturbation, w: FillScratch): void {
  const mw = fill.waterMolarMass;
  const list = fill.solids;
  const n = list.length;
  let totalWater = fill.waterG;
  let heldAsLoaded = 0;
  let hydrationNeed = 0;
  for (let i = 0; i < n; i++) {
    const s = list[i]!;
    totalWater += s.moles * s.salt.water * mw;
    if (!s.curve) {
      w.limited[i] = 0;
      w.converts[i] = 0;
      w.phaseWater[i] = s.salt.water;
      w.solubility[i] = undefined;
      w.phase[i] = undefined;
      continue;
    }
    const sol = solubilityAt(s.curve, t);
    const ph = s.phases.get(sol.phase);
    const c = ph !== undefined && ph.formula !== s.salt.formula && ph.enthalpy !== undefined;
    w.limited[i] = 1;
    w.solubility[i] = sol;
    w.phase[i] = ph;
    w.converts[i] = c ? 1 : 0;
    w.phaseWater[i] = c ? ph!.water : s.salt.water;
    w.waterToDissolve[i] = sol.value > 0 ? (100 * s.moles * s.anhydrousMolarMass) / sol.value : Infinity;
    w.holds[i] = s.moles * w.phaseWater[i]! * mw;
    heldAsLoaded += s.moles * s.salt.water * mw;
    if (c) hydrationNeed += s.moles * (w.phaseWater[i]! - s.salt.water) * mw;
  }

  // Liquid water W solves g(W) = W − Wtot + Σ bᵢ·(1 − xᵢ(W)) = 0 with xᵢ = min(1, W/W*ᵢ) and
  // bᵢ = nᵢ·sᵢ·M(H2O) the water salt i holds when undissolved: piecewise linear, solved exactly.
  let liquid = totalWater;
  let hydrationFraction = 1;
  const g0 = waterBalance(0, totalWater, w.limited, w.waterToDissolve, w.holds);
  if (g0 >= 0) {
    // Too little water to hydrate all the undissolved solid: it all goes into hydrate, none is left liquid.
    liquid = 0;
    hydrationFraction = hydrationNeed > 0 ? Math.min(1, Math.max(0, (totalWater - heldAsLoaded) / hydrationNeed)) : 1;
  } else {
    let w0 = 0;
    let gw0 = g0;
    for (;;) {
      // The next breakpoint above w0 (or the total water).
      let w1 = totalWater;
      for (let i = 0; i < n; i++) {
        const b = w.waterToDissolve[i]!;
        if (w.limited[i] === 1 && b > w0 && b < w1) w1 = b;
      }
      const gw1 = waterBalance(w1, totalWater, w.limited, w.waterToDissolve, w.holds);
      if (gw1 >= 0) {
        liquid = gw1 === gw0 ? w1 : w0 - (gw0 * (w1 - w0)) / (gw1 - gw0);
        break;
      }
      if (w1 >= totalWater) break;
      w0 = w1;
      gw0 = gw1;
    }
  }

  const shifts = perturbation.enthalpyShift;
  const phaseShifts = perturbation.phaseShift;
  let heatJ = 0;
  let particles = 0;
  let dissolvedCp = 0;
  let undissolvedCp = 0;
  for (let i = 0; i < n; i++) {
    const s = list[i]!;
    const x = dissolvedFraction(liquid, w.limited[i]!, w.waterToDissolve[i]!);
    const dH = s.enthalpy.value + (shifts?.[i] ?? 0);
    const c = w.converts[i] === 1;
    const phi = c ? hydrationFraction : 1;
    const dissolutionJ = 1000 * s.moles * x * dH;
    const conversionJ = c ? 1000 * s.moles * (1 - x) * phi * (dH - (w.phase[i]!.enthalpy!.value + (phaseShifts?.[i] ?? 0))) : 0;
    heatJ += dissolutionJ + conversionJ;
    particles += s.moles * x * s.particles;
    const cpSolid = c ? s.heatCapacityLoaded.value + phi * (w.phase[i]!.heatCapacity.value - s.heatCapacityLoaded.value) : s.heatCapacityLoaded.value;
    w.fraction[i] = x;
    w.dissolutionJ[i] = dissolutionJ;
    w.conversionJ[i] = conversionJ;
    w.cpDissolved[i] = s.moles * x * s.heatCapacityAnhydrous.value;
    w.cpUndissolved[i] = s.moles * (1 - x) * cpSolid;
    dissolvedCp += w.cpDissolved[i]!;
    undissolvedCp += w.cpUndissolved[i]!;
  }

  const scale = 1 + (perturbation.heatCapacityRelative ?? 0);
  w.waterCp = liquid * fill.waterSpecificHeat.value * scale;
  w.dissolvedCp = dissolvedCp * scale;
  w.undissolvedCp = undissolvedCp * scale;
  w.heatCapacity = fill.heatCapacityOverride ? fill.heatCapacityOverride.value * scale : w.waterCp + w.dissolvedCp + w.undissolvedCp + fill.containerJPerK;
  w.liquidWaterG = liquid;
  w.hydrationFraction = hydrationFraction;
  w.heatJ = heatJ;

  const freezingPointC = freezingPointOfSolution(particles, liquid);
  let floorC = freezingPointC ?? -Infinity;
  let floorKind: FillScratch['floorKind'] = freezingPointC === undefined ? 'none' : 'freezing';
  for (let i = 0; i < n; i++) {
    const e = list[i]!.curve?.eutectic;
    if (e && (n === 1 || w.fraction[i]! < 1) && e.temperature > floorC) {
      floorC = e.temperature;
      floorKind = 'eutectic';
    }
  }
  w.freezingPointC = freezingPointC;
  w.floorC = floorC;
  w.floorKind = floorKind;
}

/**
 * The state of the fill held at temperature t (°C), in full (see
 * {@link evaluateFill} for the model).
 * @internal
 */
export function fillEquilibrium(fill: PreparedFill, t: number, perturbation: Perturbation = {}, scratch: FillScratch = fillScratch(fill)): FillEquilibrium {
  const w = scratch;
  evaluateFill(fill, t, perturbation, w);
  const solids: SolidEquilibrium[] = fill.solids.map((s, i) => {
    const c = w.converts[i] === 1;
    const phi = c ? w.hydrationFraction : 1;
    return {
      fraction: w.fraction[i]!,
      saturated: w.fraction[i]! < 1,
      solubility: w.solubility[i],
      undissolvedPhase: c ? w.phase[i]!.formula : s.salt.formula,
      undissolvedWater: s.salt.water + phi * (w.phaseWater[i]! - s.salt.water),
      converts: c,
      dissolutionJ: w.dissolutionJ[i]!,
      conversionJ: w.conversionJ[i]!,
      heatCapacityDissolved: w.cpDissolved[i]!,
      heatCapacityUndissolved: w.cpUndissolved[i]!,
    };
  });
  return {
    temperature: t,
    liquidWaterG: w.liquidWaterG,
    solids,
    hydrationFraction: w.hydrationFraction,
    heatJ: w.heatJ,
    heatCapacity: w.heatCapacity,
    heatCapacityParts: { water: w.waterCp, dissolved: w.dissolvedCp, undissolved: w.undissolvedCp, container: fill.containerJPerK },
    floorC: w.floorC,
    floorKind: w.floorKind,
    freezingPointC: w.freezingPointC,
  };
}
