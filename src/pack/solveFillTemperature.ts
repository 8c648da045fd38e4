/**
 * The adiabatic final temperature of a fill: the first temperature, going
 * from the start in the direction the dissolution drives it, at which the
 * heat taken up by dissolution equals the fill's loss of sensible heat — or
 * the point where the solution would freeze or boil first.
 *
 * @module
 */
import { bracketedRoot } from '../numeric/bracketedRoot.js';
import { evaluateFill, fillEquilibrium, fillScratch, frozenMargin, mixedFillState, type FillEquilibrium, type FillScratch, type Perturbation } from './fillEquilibrium.js';
import type { PreparedFill } from './packFill.js';

/** Where the balance was cut short. @internal */
export interface FillClamp {
  kind: 'freezing' | 'eutectic' | 'boiling';
  /** °C. */
  temperature: number;
}

/** @internal */
export interface FillSolution {
  /** °C. */
  temperature: number;
  state: FillEquilibrium;
  clamp: FillClamp | undefined;
  /** True when the balance jumps across zero (a change of equilibrium solid) rather than passing through it. */
  jump: boolean;
  /** Where the fill holds at a change of equilibrium solid: the change's temperature (°C) and the share of the fill in the state below it (0–1). */
  transition?: { temperature: number; lowShare: number };
  /** Grams of water boiled off at a boiling hold (0 elsewhere). */
  vaporG: number;
}

/** Smallest and largest scan step while looking for the first sign change, K. */
const MIN_STEP_K = 0.25;
const MAX_STEP_K = 10;

/**
 * The next scan temperature from t towards `direction`: half the distance
 * the remaining imbalance f would move a fill of heat capacity C (and half
 * the way to the freezing floor), between 0.25 and 10 K, never stepping over
 * a change of equilibrium solid. Steps shrink as f approaches zero, so a
 * crossing cannot be stepped over unless |df/dT| exceeds 2C.
 */
function nextScanTemperature(t: number, direction: number, f: number, C: number, floorGap: number, stops: readonly number[]): number {
  let step = C > 0 ? Math.abs(f) / (2 * C) : MAX_STEP_K;
  if (direction < 0 && Number.isFinite(floorGap)) step = Math.min(step, floorGap / 2);
  step = Math.min(MAX_STEP_K, Math.max(MIN_STEP_K, step));
  let next = t + direction * step;
  for (const s of stops) {
    if (direction > 0 ? s > t && s < next : s < t && s > next) next = s;
  }
  return next;
}
/** Tolerance of the final temperature, K. */
export const TEMPERATURE_TOLERANCE_K = 1e-9;
/** No pack solution stays liquid below this, °C; a guard for the scan only. */
const LOWEST_C = -100;
/** Boiling point of water at 1 bar, °C, before elevation by dissolved salt (kept for callers that cap at it). */
export const BOILING_C = 100;
/** No brine at 1 atm boils above this, °C; a guard for the scan only. */
const HIGHEST_C = 200;
/** Bisection steps for a phase boundary (the eutectic, the boiling point) and a hold fraction. */
const BOUNDARY_STEPS = 40;

/**
 * Solves H(final state at T) = H(start state at T₀) for the final
 * temperature T: C(T)·(T − T₀) + Q(T) = 0, where Q(T) is the heat taken up,
 * at T₀, in reaching the state the fill would hold at T ({@link
 * fillEquilibrium}: dissolution to the final molality with its integral
 * enthalpy, hydrate conversion, ice) and C(T) that state's heat capacity.
 *
 * From T₀ the scan steps towards lower T (if dissolution absorbs heat) or
 * higher T (if it releases it) until the balance changes sign; Brent's method
 * then finds the crossing to 1e-9 K. Ice is a phase of the state at T, so the
 * balance stays continuous across the liquidus. Two boundaries stop the scan:
 * the salt–ice eutectic (below it no liquid exists), where the fill holds
 * while the share of brine that freezes out with its salt closes the
 * balance; and the brine's boiling point, where the fill holds while water
 * boils off. Each step is half the distance the remaining imbalance would
 * move the fill at its current heat capacity (0.25 to 10 K, stopping at every
 * change of equilibrium solid), so steps shrink near any crossing.
 *
 * @internal
 */
export function solveFillTemperature(fill: PreparedFill, perturbation: Perturbation = {}): FillSolution {
  const ctx: Solver = { fill, perturbation, w: fillScratch(fill), t0: fill.startC };
  const t0 = ctx.t0;
  const w = ctx.w;
  evaluateFill(fill, t0, perturbation, w);
  const q0 = w.heatJ;
  if (q0 === 0) return { temperature: t0, state: stateAt(ctx, t0), clamp: undefined, jump: false, vaporG: 0 };
  const direction = q0 > 0 ? -1 : 1;
  let prev = t0;
  let t = t0;
  let f = q0;
  for (;;) {
    t = nextScanTemperature(t, direction, f, w.heatCapacity, Infinity, fill.phaseChanges);
    t = Math.min(HIGHEST_C, Math.max(LOWEST_C, t));
    f = balanceAt(ctx, t);
    if (w.frozen) return eutecticHold(ctx, boundary(ctx, prev, t, 'frozen'), prev);
    if (w.boiling) return boilingHold(ctx, boundary(ctx, prev, t, 'boiling'), prev);
    if (direction < 0 ? f <= 0 : f >= 0) return finish(ctx, direction < 0 ? bracketedRoot((x) => balanceAt(ctx, x), t, prev, TEMPERATURE_TOLERANCE_K).x : bracketedRoot((x) => balanceAt(ctx, x), prev, t, TEMPERATURE_TOLERANCE_K).x);
    if (t === LOWEST_C || t === HIGHEST_C) return { temperature: t, state: stateAt(ctx, t), clamp: { kind: t === LOWEST_C ? 'freezing' : 'boiling', temperature: t }, jump: false, vaporG: 0 };
    prev = t;
  }
}

/** One solve's fill, perturbation and working arrays. */
interface Solver {
  fill: PreparedFill;
  perturbation: Perturbation;
  w: FillScratch;
  t0: number;
}

/** C·(T − T₀) + Q at t. */
function balanceAt(ctx: Solver, t: number): number {
  evaluateFill(ctx.fill, t, ctx.perturbation, ctx.w);
  return ctx.w.heatCapacity * (t - ctx.t0) + ctx.w.heatJ;
}

/** The temperature between `inside` (liquid, not boiling) and `outside` where `kind` sets in, taken on the inside (bisection on the state's flag). */
function boundary(ctx: Solver, inside: number, outside: number, kind: 'frozen' | 'boiling'): number {
  let a = inside;
  let b = outside;
  for (let k = 0; k < BOUNDARY_STEPS && Math.abs(b - a) > TEMPERATURE_TOLERANCE_K; k++) {
    const mid = 0.5 * (a + b);
    let past: boolean;
    if (kind === 'frozen') past = mid < 0 && frozenMargin(ctx.fill, mid, ctx.perturbation, ctx.w) > 0;
    else {
      evaluateFill(ctx.fill, mid, ctx.perturbation, ctx.w);
      past = ctx.w.boiling;
    }
    if (past) b = mid;
    else a = mid;
  }
  return a;
}

/**
 * At the eutectic te: if the balance crosses zero before it, that crossing;
 * otherwise the fill holds at te while a share λ of the brine freezes out
 * with its salt, λ solving the balance (λ = 1 and a residual when even the
 * whole brine is not enough).
 */
function eutecticHold(ctx: Solver, te: number, prev: number): FillSolution {
  const fe = balanceAt(ctx, te);
  if (fe <= 0) return finish(ctx, bracketedRoot((x) => balanceAt(ctx, x), te, prev, TEMPERATURE_TOLERANCE_K).x);
  const w = ctx.w;
  const at = (lambda: number): number => {
    w.holdFraction = lambda;
    return balanceAt(ctx, te);
  };
  // The balance is linear in the frozen share (heats and heat capacities scale with it).
  const f1 = at(1);
  const lambda = f1 < 0 ? Math.min(1, Math.max(0, fe / (fe - f1))) : 1;
  w.holdFraction = lambda;
  const state = stateAt(ctx, te);
  w.holdFraction = 0;
  return { temperature: te, state, clamp: { kind: 'eutectic', temperature: te }, jump: false, vaporG: 0 };
}

/** At the boiling point tb: the crossing before it, or a hold while the heat still released boils water off. */
function boilingHold(ctx: Solver, tb: number, prev: number): FillSolution {
  const fb = balanceAt(ctx, tb);
  if (fb >= 0) return finish(ctx, bracketedRoot((x) => balanceAt(ctx, x), prev, tb, TEMPERATURE_TOLERANCE_K).x);
  const water = ctx.fill.water;
  const vaporG = (-fb * 1000 * water.molarMass) / water.vaporizationEnthalpy;
  return { temperature: tb, state: stateAt(ctx, tb), clamp: { kind: 'boiling', temperature: tb }, jump: false, vaporG };
}

function stateAt(ctx: Solver, t: number): FillEquilibrium {
  return fillEquilibrium(ctx.fill, t, ctx.perturbation, ctx.w);
}

/** Half-width of the step across a change of equilibrium solid, K: the states on either side of it. */
const ACROSS_CHANGE_K = 1e-9;

function finish(ctx: Solver, t: number): FillSolution {
  let state = stateAt(ctx, t);
  const f = state.heatCapacity * (t - ctx.t0) + state.heatJ;
  const jump = Math.abs(f) > 1e-6 * Math.abs(state.heatJ) + 1e-6;
  if (jump) {
    // Pinned at a change of equilibrium solid: the fill holds at the change's own temperature with both solids
    // present, a share of it in the state just below and the rest in the state just above, the share closing the balance.
    for (const s of ctx.fill.phaseChanges) {
      if (Math.abs(s - t) < 1e-6) {
        const below = stateAt(ctx, s - ACROSS_CHANGE_K);
        const above = stateAt(ctx, s + ACROSS_CHANGE_K);
        const fBelow = below.heatCapacity * (s - ctx.t0) + below.heatJ;
        const fAbove = above.heatCapacity * (s - ctx.t0) + above.heatJ;
        if (fBelow === fAbove || Math.sign(fBelow) === Math.sign(fAbove)) break;
        const lowShare = fAbove / (fAbove - fBelow);
        state = { ...mixedFillState(below, above, lowShare), temperature: s };
        return { temperature: s, state, clamp: undefined, jump: true, vaporG: 0, transition: { temperature: s, lowShare } };
      }
    }
  }
  return { temperature: t, state, clamp: undefined, jump, vaporG: 0 };
}
