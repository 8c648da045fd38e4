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
import type { PreparedFill, PreparedPhase } from './packFill.js';
import { brineApparentTerms, brineApparentWith, brineHeatCapacityU, brineOsmoticTerms, brineOsmoticU, brineOsmoticWith, enthalpyAllowance } from '../brine/brineProperties.js';
import { boilingWaterActivityLn, fusionEnthalpyAt, iceWaterActivityLn } from '../brine/waterPhases.js';
import { ZERO_CELSIUS_K } from '../brine/debyeHuckelSlopes.js';
import { solubilityAt, type SolubilityAt } from './solubilityCurve.js';
import { convertsWithinPack } from './solidConversion.js';

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
  /** Standard normal shifts of each solid's φL, of its φJ, and of every osmotic coefficient (in units of their standard uncertainties). */
  brineEnthalpyZ?: readonly number[];
  brineHeatCapacityZ?: readonly number[];
  osmoticZ?: number;
  /** Relative shift of each solid's measured solubility (0.02 = 2 % more dissolves at saturation). */
  solubilityRelative?: readonly number[];
  /** Count the conversion of undissolved solid that barely dissolves (left out of the central value, see `convertsWithinPack`). */
  slowConversion?: boolean;
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
  /** True when the undissolved solid would become another equilibrium solid of known enthalpy but barely dissolves, so the change is left out (see `convertsWithinPack`). */
  slowConversion: boolean;
  /** Molality of this salt in the final liquid, mol/kg. */
  molality: number;
  /** The integral enthalpy of solution to that molality used, kJ/mol of the loaded formula: ΔsolH°(∞) + φL. */
  integralEnthalpy: number;
  /** Its standard uncertainty from φL, kJ/mol. */
  integralEnthalpyU: number;
  /** J absorbed by dissolving. */
  dissolutionJ: number;
  /** J absorbed by the conversion of the undissolved solid. */
  conversionJ: number;
  /** J/K this solid adds: dissolved part (φCp° + φJ) plus undissolved part. */
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
  heatCapacityParts: { water: number; dissolved: number; undissolved: number; container: number; ice: number };
  /** Grams of ice. */
  iceG: number;
  /** J absorbed by the ice that formed (negative: freezing releases heat). */
  iceJ: number;
  /** True when no liquid can exist at this temperature (below the salt–ice eutectic). */
  frozen: boolean;
  /** True when the brine would boil at this temperature. */
  boiling: boolean;
  /** Share of the brine frozen out together with salt at the eutectic (0 elsewhere). */
  eutecticFraction: number;
  /** ln a_w of the liquid (computed only below 0 °C and above 99 °C; NaN between). */
  waterActivityLn: number;
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
  /** 1 where it would, but too slowly to count (it barely dissolves). */
  slow: number[];
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
  iceCp: number;
  iceG: number;
  iceJ: number;
  frozen: boolean;
  boiling: boolean;
  /** Set by the solver at a eutectic hold: the share of the brine frozen out with salt. */
  holdFraction: number;
  waterActivityLn: number;
  /** Loaded plus crystal water, water the loaded solids hold, and the water their conversion to the equilibrium hydrate needs, g. */
  totalWater: number;
  heldAsLoaded: number;
  hydrationNeed: number;
  molality: number[];
  /** Per solid, the temperature-dependent terms of φ at the temperature of this evaluation. */
  osmoticTerms: Float64Array[];
  /** Per solid, the terms of φL and of φJ at the start temperature (fixed for the solve). */
  enthalpyTerms: Float64Array[];
  heatCapacityTerms: Float64Array[];
  integralEnthalpy: number[];
  integralEnthalpyU: number[];
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
    slow: zeros(n),
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
    iceCp: 0,
    iceG: 0,
    iceJ: 0,
    frozen: false,
    boiling: false,
    holdFraction: 0,
    waterActivityLn: 0,
    totalWater: 0,
    heldAsLoaded: 0,
    hydrationNeed: 0,
    molality: zeros(n),
    osmoticTerms: Array.from({ length: n }, () => new Float64Array(5)),
    enthalpyTerms: fill.solids.map((s) => {
      const out = new Float64Array(5);
      brineApparentTerms(s.brine, 'enthalpy', fill.startC + ZERO_CELSIUS_K, out);
      return out;
    }),
    heatCapacityTerms: fill.solids.map((s) => {
      const out = new Float64Array(5);
      brineApparentTerms(s.brine, 'heatCapacity', fill.startC + ZERO_CELSIUS_K, out);
      return out;
    }),
    integralEnthalpy: zeros(n),
    integralEnthalpyU: zeros(n),
  };
}

/** Solubility, equilibrium solid and water need of each salt at t, into `w`, with the perturbation's solubility shifts and conversion rule. */
function solubilityState(fill: PreparedFill, t: number, perturbation: Perturbation, w: FillScratch): void {
  const relative = perturbation.solubilityRelative;
  const countSlow = perturbation.slowConversion === true;
  const mw = fill.waterMolarMass;
  const list = fill.solids;
  let totalWater = fill.waterG;
  let heldAsLoaded = 0;
  let hydrationNeed = 0;
  for (let i = 0; i < list.length; i++) {
    const s = list[i]!;
    totalWater += s.moles * s.salt.water * mw;
    if (!s.curve) {
      w.limited[i] = 0;
      w.converts[i] = 0;
      w.slow[i] = 0;
      w.phaseWater[i] = s.salt.water;
      w.solubility[i] = undefined;
      w.phase[i] = undefined;
      continue;
    }
    const sol = solubilityAt(s.curve, t);
    const ph = s.phases.get(sol.phase);
    const other = ph !== undefined && ph.formula !== s.salt.formula && ph.enthalpy !== undefined;
    const fast = other && convertsWithinPack(sol.value);
    const c = fast || (other && countSlow);
    const value = sol.value * (1 + (relative?.[i] ?? 0));
    w.limited[i] = 1;
    w.solubility[i] = sol;
    w.phase[i] = ph;
    w.converts[i] = c ? 1 : 0;
    w.slow[i] = other && !fast ? 1 : 0;
    w.phaseWater[i] = c ? ph!.water : s.salt.water;
    w.waterToDissolve[i] = value > 0 ? (100 * s.moles * s.anhydrousMolarMass) / value : Infinity;
    w.holds[i] = s.moles * w.phaseWater[i]! * mw;
    heldAsLoaded += s.moles * s.salt.water * mw;
    if (c) hydrationNeed += s.moles * (w.phaseWater[i]! - s.salt.water) * mw;
  }
  w.totalWater = totalWater;
  w.heldAsLoaded = heldAsLoaded;
  w.hydrationNeed = hydrationNeed;
}

/**
 * Liquid water W and the dissolved shares when `available` grams of water
 * (loaded and crystal water, less any ice) are shared between solution and
 * undissolved hydrate: W solves g(W) = W − available + Σ bᵢ·(1 − xᵢ(W)) = 0
 * with xᵢ = min(1, W/W*ᵢ), piecewise linear, solved exactly.
 */
function shareWater(fill: PreparedFill, available: number, w: FillScratch): void {
  const n = fill.solids.length;
  let liquid = available;
  let hydrationFraction = 1;
  const g0 = waterBalance(0, available, w.limited, w.waterToDissolve, w.holds);
  if (g0 >= 0) {
    // Too little water to hydrate all the undissolved solid: it all goes into hydrate, none is left liquid.
    liquid = 0;
    hydrationFraction = w.hydrationNeed > 0 ? Math.min(1, Math.max(0, (available - w.heldAsLoaded) / w.hydrationNeed)) : 1;
  } else {
    let w0 = 0;
    let gw0 = g0;
    for (;;) {
      let w1 = available;
      for (let i = 0; i < n; i++) {
        const b = w.waterToDissolve[i]!;
        if (w.limited[i] === 1 && b > w0 && b < w1) w1 = b;
      }
      const gw1 = waterBalance(w1, available, w.limited, w.waterToDissolve, w.holds);
      if (gw1 >= 0) {
        liquid = gw1 === gw0 ? w1 : w0 - (gw0 * (w1 - w0)) / (gw1 - gw0);
        break;
      }
      if (w1 >= available) break;
      w0 = w1;
      gw0 = gw1;
    }
  }
  w.liquidWaterG = liquid;
  w.hydrationFraction = hydrationFraction;
  for (let i = 0; i < n; i++) {
    w.fraction[i] = dissolvedFraction(liquid, w.limited[i]!, w.waterToDissolve[i]!);
    const s = fill.solids[i]!;
    w.molality[i] = liquid > 0 ? (1000 * s.moles * w.fraction[i]!) / liquid : Infinity;
  }
}

/** ln a_w = −Mw·Σνᵢmᵢφᵢ of the liquid at tK (each salt's φ at its own molality; mixing ignored). */
function waterActivityLn(fill: PreparedFill, tK: number, perturbation: Perturbation, w: FillScratch): number {
  if (!(w.liquidWaterG > 0)) return -Infinity;
  const z = perturbation.osmoticZ ?? 0;
  let sum = 0;
  for (let i = 0; i < fill.solids.length; i++) {
    const m = w.molality[i]!;
    if (!(m > 0)) continue;
    const b = fill.solids[i]!.brine;
    let phi = brineOsmoticWith(b, m, w.osmoticTerms[i]!);
    // φ is positive: its shift is taken on the log scale, φ·exp(z·u/φ), the same as φ + z·u to first order, so that
    // a wide allowance (u/φ near 0.5 past a fitted range) cannot drive it to zero and the liquidus to 0 °C.
    if (z !== 0 && phi > 0) phi *= Math.exp((z * brineOsmoticU(b, m, tK)) / phi);
    sum += b.particles * m * Math.max(phi, 0.05);
  }
  return -fill.water.molarMass * sum;
}

/** Most steps of the ice balance, and its tolerance as a share of the water. */
const ICE_STEPS = 100;
const ICE_TOLERANCE = 1e-12;
/** Share of the water taken as the last liquid when testing for the eutectic. */
const MIN_LIQUID_SHARE = 1e-9;

/**
 * How far the fill at t lies below its eutectic: ln a_w of the brine left
 * when nearly all water has frozen (saturated where the salts have
 * solubility data) less ln a_w over ice; positive where no liquid can exist
 * (the `frozen` of {@link evaluateFill}, computed the same way).
 * @internal
 */
export function frozenMargin(fill: PreparedFill, t: number, perturbation: Perturbation, w: FillScratch): number {
  const tK = t + ZERO_CELSIUS_K;
  for (let i = 0; i < fill.solids.length; i++) brineOsmoticTerms(fill.solids[i]!.brine, tK, w.osmoticTerms[i]!);
  solubilityState(fill, t, perturbation, w);
  shareWater(fill, w.totalWater * MIN_LIQUID_SHARE, w);
  return waterActivityLn(fill, tK, perturbation, w) - iceWaterActivityLn(fill.water, tK);
}

/**
 * The state of the fill held at temperature t (°C), written into `w`.
 *
 * Solubility: salt i dissolves up to Sᵢ(t)·W/100 grams of anhydrous salt in
 * W grams of liquid water. W is the loaded water plus the crystal water of
 * everything loaded, less the water the undissolved solid holds as its
 * equilibrium hydrate, less any ice; it is solved exactly (the balance is
 * piecewise linear in W). A salt without solubility data dissolves completely.
 * Undissolved solid becomes the equilibrium solid of the table only when
 * the salt dissolves enough for that change to run within a pack's time
 * (`convertsWithinPack`); otherwise it stays as loaded.
 *
 * Ice: below 0 °C, where the brine's water activity (Pitzer osmotic
 * coefficient, brine module) exceeds that of water over ice at t, ice forms
 * until the concentrated brine's activity equals it (bisection on the ice
 * mass, the solubility rechecked at each step). When even a saturated brine
 * cannot reach it, no liquid exists at t (`frozen`: below the eutectic).
 *
 * Heat (enthalpy conservation, reaction at the start temperature T₀, then
 * the final state taken to t): Σ nᵢ·xᵢ·[ΔsolH°ᵢ(∞, T₀) + φLᵢ(mᵢ, T₀)] +
 * conversion of undissolved solid − n_ice·ΔfusH(T₀).
 *
 * Heat capacity of the final state: liquid water × c(water) + Σ dissolved
 * nᵢ·(φCp°ᵢ + φJᵢ(mᵢ)) + undissolved solid × its Cp° + ice × c(ice) + container.
 *
 * @internal
 */
export function evaluateFill(fill: PreparedFill, t: number, perturbation: Perturbation, w: FillScratch): void {
  const list = fill.solids;
  const n = list.length;
  const tK = t + ZERO_CELSIUS_K;
  const water = fill.water;
  // The water activity matters only where ice or vapour can form; between 0 and 99 °C it is left uncomputed (NaN).
  const phases = t < 0 || t > 99;
  if (phases) for (let i = 0; i < n; i++) brineOsmoticTerms(list[i]!.brine, tK, w.osmoticTerms[i]!);
  solubilityState(fill, t, perturbation, w);
  const totalWater = w.totalWater;
  shareWater(fill, totalWater, w);
  let lnAw = phases ? waterActivityLn(fill, tK, perturbation, w) : NaN;
  let ice = 0;
  let frozen = false;
  if (t < 0) {
    const target = iceWaterActivityLn(water, tK);
    // Below the eutectic even the brine left when nearly all water has frozen lies above the ice line.
    const top = totalWater * (1 - MIN_LIQUID_SHARE);
    shareWater(fill, totalWater - top, w);
    let gHi = waterActivityLn(fill, tK, perturbation, w) - target;
    if (gHi > 0) {
      frozen = true;
      ice = totalWater;
    } else if (lnAw > target) {
      // Ice forms: find the ice mass whose removal brings the brine to the ice line
      // (regula falsi, Illinois variant: g(ice) = ln a_w − target falls as ice forms).
      let lo = 0;
      let gLo = lnAw - target;
      let hi = top;
      let side = 0;
      ice = lo;
      for (let k = 0; k < ICE_STEPS && hi - lo > ICE_TOLERANCE * totalWater; k++) {
        const x = gHi === -Infinity ? 0.5 * (lo + hi) : (lo * gHi - hi * gLo) / (gHi - gLo);
        shareWater(fill, totalWater - x, w);
        const gx = waterActivityLn(fill, tK, perturbation, w) - target;
        ice = x;
        if (gx === 0) break;
        if (gx > 0) {
          lo = x;
          gLo = gx;
          if (side === 1) gHi /= 2;
          side = 1;
        } else {
          hi = x;
          gHi = gx;
          if (side === -1) gLo /= 2;
          side = -1;
        }
      }
    }
    if (frozen || ice > 0) {
      shareWater(fill, totalWater - ice, w);
      lnAw = frozen ? target : waterActivityLn(fill, tK, perturbation, w);
    } else shareWater(fill, totalWater, w);
  }
  // A eutectic hold freezes out a share of the brine together with its salt.
  const hold = w.holdFraction;
  if (hold > 0) {
    ice += hold * w.liquidWaterG;
    w.liquidWaterG *= 1 - hold;
    for (let i = 0; i < n; i++) w.fraction[i]! *= 1 - hold;
  }
  const liquid = w.liquidWaterG;
  const hydrationFraction = w.hydrationFraction;
  const boiling = t > 99 && lnAw >= boilingWaterActivityLn(water, tK);

  const t0K = fill.startC + ZERO_CELSIUS_K;
  const shifts = perturbation.enthalpyShift;
  const phaseShifts = perturbation.phaseShift;
  const zL = perturbation.brineEnthalpyZ;
  const zJ = perturbation.brineHeatCapacityZ;
  let heatJ = 0;
  let dissolvedCp = 0;
  let undissolvedCp = 0;
  for (let i = 0; i < n; i++) {
    const s = list[i]!;
    const x = w.fraction[i]!;
    const m = w.molality[i]!;
    let phiL = 0;
    let phiLU = 0;
    let phiJ = 0;
    if (x > 0 && m > 0 && Number.isFinite(m)) {
      const b = s.brine;
      const lTerms = w.enthalpyTerms[i]!;
      phiL = brineApparentWith(b, m, t0K, lTerms);
      phiLU = enthalpyAllowance(b, m, b.own.enthalpy && m > b.maxMolality ? brineApparentWith(b, b.maxMolality, t0K, lTerms) : phiL);
      // φJ at the start temperature: the final state's heat capacity over T₀ → T (its change with T is a second-order term).
      phiJ = brineApparentWith(b, m, t0K, w.heatCapacityTerms[i]!);
      const zj = zJ?.[i] ?? 0;
      if (zj !== 0) phiJ += zj * brineHeatCapacityU(b, m, t0K);
    }
    const zl = zL?.[i] ?? 0;
    const integral = s.enthalpy.value + (shifts?.[i] ?? 0) + (phiL + zl * phiLU) / 1000;
    const c = w.converts[i] === 1;
    const phi = c ? hydrationFraction : 1;
    const dH = s.enthalpy.value + (shifts?.[i] ?? 0);
    const dissolutionJ = 1000 * s.moles * x * integral;
    const conversionJ = c ? 1000 * s.moles * (1 - x) * phi * (dH - (w.phase[i]!.enthalpy!.value + (phaseShifts?.[i] ?? 0))) : 0;
    heatJ += dissolutionJ + conversionJ;
    const cpSolid = c ? s.heatCapacityLoaded.value + phi * (w.phase[i]!.heatCapacity.value - s.heatCapacityLoaded.value) : s.heatCapacityLoaded.value;
    w.integralEnthalpy[i] = integral;
    w.integralEnthalpyU[i] = phiLU / 1000;
    w.dissolutionJ[i] = dissolutionJ;
    w.conversionJ[i] = conversionJ;
    w.cpDissolved[i] = s.moles * x * (s.heatCapacityInfinite + phiJ);
    w.cpUndissolved[i] = s.moles * (1 - x) * cpSolid;
    dissolvedCp += w.cpDissolved[i]!;
    undissolvedCp += w.cpUndissolved[i]!;
  }
  const iceJ = ice > 0 ? -(ice / (1000 * water.molarMass)) * fusionEnthalpyAt(water, t0K) : 0;
  heatJ += iceJ;

  const scale = 1 + (perturbation.heatCapacityRelative ?? 0);
  w.waterCp = liquid * fill.waterSpecificHeat.value * scale;
  w.dissolvedCp = dissolvedCp * scale;
  w.undissolvedCp = undissolvedCp * scale;
  w.iceCp = ice * water.iceSpecificHeat * scale;
  const parts = w.waterCp + w.dissolvedCp + w.undissolvedCp + w.iceCp;
  // The dissolved salt's φCp may be negative; the whole stays positive (a floor for pathological fills only).
  w.heatCapacity = fill.heatCapacityOverride ? fill.heatCapacityOverride.value * scale : Math.max(parts, 1e-3 * (w.waterCp + w.undissolvedCp + w.iceCp) + 1e-9) + fill.containerJPerK;
  w.heatJ = heatJ;
  w.iceG = ice;
  w.iceJ = iceJ;
  w.frozen = frozen;
  w.boiling = boiling;
  w.waterActivityLn = lnAw;
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
      slowConversion: w.slow[i] === 1 && w.fraction[i]! < 1,
      molality: Number.isFinite(w.molality[i]!) ? w.molality[i]! : 0,
      integralEnthalpy: w.integralEnthalpy[i]!,
      integralEnthalpyU: w.integralEnthalpyU[i]!,
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
    heatCapacityParts: { water: w.waterCp, dissolved: w.dissolvedCp, undissolved: w.undissolvedCp, container: fill.containerJPerK, ice: w.iceCp },
    iceG: w.iceG,
    iceJ: w.iceJ,
    frozen: w.frozen,
    boiling: w.boiling,
    eutecticFraction: w.holdFraction,
    waterActivityLn: w.waterActivityLn,
  };
}

/**
 * The fill at a change of equilibrium solid, as a share `low` of it in the
 * state just below the change (`a`) and the rest in the state just above
 * (`b`). Both are saturated at the same solubility, so the two parts hold
 * the same liquid and together are one state with both solids present;
 * every heat, heat capacity and mass is the same share of each.
 * @internal
 */
export function mixedFillState(a: FillEquilibrium, b: FillEquilibrium, low: number): FillEquilibrium {
  const mix = (x: number, y: number): number => low * x + (1 - low) * y;
  const solids = a.solids.map((sa, i): SolidEquilibrium => {
    const sb = b.solids[i]!;
    return {
      fraction: mix(sa.fraction, sb.fraction),
      saturated: sa.saturated || sb.saturated,
      solubility: sa.solubility,
      undissolvedPhase: sa.undissolvedPhase === sb.undissolvedPhase ? sa.undissolvedPhase : `${sa.undissolvedPhase} + ${sb.undissolvedPhase}`,
      undissolvedWater: mix(sa.undissolvedWater, sb.undissolvedWater),
      converts: sa.converts || sb.converts,
      slowConversion: sa.slowConversion || sb.slowConversion,
      molality: mix(sa.molality, sb.molality),
      integralEnthalpy: mix(sa.integralEnthalpy, sb.integralEnthalpy),
      integralEnthalpyU: mix(sa.integralEnthalpyU, sb.integralEnthalpyU),
      dissolutionJ: mix(sa.dissolutionJ, sb.dissolutionJ),
      conversionJ: mix(sa.conversionJ, sb.conversionJ),
      heatCapacityDissolved: mix(sa.heatCapacityDissolved, sb.heatCapacityDissolved),
      heatCapacityUndissolved: mix(sa.heatCapacityUndissolved, sb.heatCapacityUndissolved),
    };
  });
  const pa = a.heatCapacityParts;
  const pb = b.heatCapacityParts;
  return {
    ...a,
    liquidWaterG: mix(a.liquidWaterG, b.liquidWaterG),
    solids,
    hydrationFraction: mix(a.hydrationFraction, b.hydrationFraction),
    heatJ: mix(a.heatJ, b.heatJ),
    heatCapacity: mix(a.heatCapacity, b.heatCapacity),
    heatCapacityParts: { water: mix(pa.water, pb.water), dissolved: mix(pa.dissolved, pb.dissolved), undissolved: mix(pa.undissolved, pb.undissolved), container: pa.container, ice: mix(pa.ice, pb.ice) },
    iceG: mix(a.iceG, b.iceG),
    iceJ: mix(a.iceJ, b.iceJ),
  };
}
