/**
 * The adiabatic final temperature of a fill: the first temperature, going
 * from the start in the direction the dissolution drives it, at which the
 * heat taken up by dissolution equals the fill's loss of sensible heat — or
 * the point where the solution would freeze or boil first.
 *
 * @module
 */
import { bracketedRoot } from './bracketedRoot.js';
import { evaluateFill, fillEquilibrium, fillScratch, type FillEquilibrium, type FillScratch, type Perturbation } from './fillEquilibrium.js';
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
function nextScanTemperature(t: number, direction: 1 | -1, f: number, C: number, floorGap: number, stops: readonly number[]): number {
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
/** Boiling point of water at 1 bar, °C (the elevation by dissolved salt is ignored). */
export const BOILING_C = 100;

/**
 * Solves C(T)·(T − T₀) + Q(T) = 0 for the final temperature T, where Q(T) is
 * the heat taken up by dissolution in the state the fill would reach at T
 * ({@link fillEquilibrium}) and C(T) that state's heat capacity. The
 * sensible heat is that of the final state taken from the start temperature
 * (dissolution at T₀, then warming or cooling of what results).
 *
 * From T₀ the scan steps towards lower T (if dissolution absorbs heat) or
 * higher T (if it releases it) until the balance changes sign or the
 * solution reaches its freezing floor or 100 °C; Brent's method then finds
 * the crossing to 1e-9 K. Each step is half the distance the remaining
 * imbalance would move the fill at its current heat capacity (0.25 to 10 K,
 * stopping at every change of equilibrium solid), so steps shrink near any
 * crossing. The first crossing is the one the pack reaches as it dissolves;
 * later ones cannot be reached.
 *
 * @internal
 */
export function solveFillTemperature(fill: PreparedFill, perturbation: Perturbation = {}): FillSolution {
  const ctx: Solver = { fill, perturbation, w: fillScratch(fill), t0: fill.startC };
  const t0 = ctx.t0;
  const w = ctx.w;
  evaluateFill(fill, t0, perturbation, w);
  const q0 = w.heatJ;
  if (q0 === 0) return { temperature: t0, state: stateAt(ctx, t0), clamp: undefined, jump: false };

  if (q0 > 0) {
    // Cools: look downwards, stopping at the floor where ice (or ice and salt) would form.
    if (t0 <= w.floorC) {
      const state = stateAt(ctx, t0);
      return { temperature: t0, state, clamp: { kind: floorKind(state.floorKind), temperature: t0 }, jump: false };
    }
    let prev = t0;
    let t = t0;
    let f = q0;
    let gap = t0 - w.floorC;
    for (;;) {
      t = Math.max(nextScanTemperature(t, -1, f, w.heatCapacity, gap, fill.phaseChanges), LOWEST_C);
      f = balanceAt(ctx, t);
      gap = t - w.floorC;
      if (f <= 0 || gap <= 0) {
        const tBalance = f <= 0 ? bracketedRoot((x) => balanceAt(ctx, x), t, prev, TEMPERATURE_TOLERANCE_K).x : -Infinity;
        let tFloor = -Infinity;
        if (gap <= 0) {
          // The floor's crossing, taken on its liquid side so that the result never lies below the floor.
          const crossing = bracketedRoot((x) => floorGapAt(ctx, x), t, prev, TEMPERATURE_TOLERANCE_K).x;
          tFloor = crossing + Math.max(0, -floorGapAt(ctx, crossing));
        }
        if (tBalance >= tFloor) return finish(ctx, tBalance);
        const state = stateAt(ctx, tFloor);
        return { temperature: tFloor, state, clamp: { kind: floorKind(state.floorKind), temperature: tFloor }, jump: false };
      }
      if (t === LOWEST_C) return { temperature: t, state: stateAt(ctx, t), clamp: { kind: 'freezing', temperature: t }, jump: false };
      prev = t;
    }
  }
  // Warms: look upwards, stopping at boiling.
  let prev = t0;
  let t = t0;
  let f = q0;
  for (;;) {
    t = Math.min(nextScanTemperature(t, 1, f, w.heatCapacity, Infinity, fill.phaseChanges), BOILING_C);
    f = balanceAt(ctx, t);
    if (f >= 0) return finish(ctx, bracketedRoot((x) => balanceAt(ctx, x), prev, t, TEMPERATURE_TOLERANCE_K).x);
    if (t === BOILING_C) return { temperature: t, state: stateAt(ctx, t), clamp: { kind: 'boiling', temperature: t }, jump: false };
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

/** How far t lies above the floor of the state at t. */
function floorGapAt(ctx: Solver, t: number): number {
  evaluateFill(ctx.fill, t, ctx.perturbation, ctx.w);
  return t - Math.max(ctx.w.floorC, LOWEST_C - 1);
}

function stateAt(ctx: Solver, t: number): FillEquilibrium {
  return fillEquilibrium(ctx.fill, t, ctx.perturbation, ctx.w);
}

function finish(ctx: Solver, t: number): FillSolution {
  const state = stateAt(ctx, t);
  const f = state.heatCapacity * (t - ctx.t0) + state.heatJ;
  return { temperature: t, state, clamp: undefined, jump: Math.abs(f) > 1e-6 * Math.abs(state.heatJ) + 1e-6 };
}

function floorKind(kind: FillEquilibrium['floorKind']): FillClamp['kind'] {
  return kind === 'eutectic' ? 'eutectic' : 'freezing';
}
