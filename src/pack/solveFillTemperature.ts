/**
 * The adiabatic final temperature of a fill: the first temperature, going
 * from the start in the direction the dissolution drives it, at which the
 * heat taken up by dissolution equals the fill's loss of sensible heat — or
 * the point where the solution would freeze or boil first.
 *
 * @module
 */
import { bracketedRoot } from './bracketedRoot.js';
import { evaluateFill, fillEquilibrium, fillScratch, type FillEquilibrium, type Perturbation } from './fillEquilibrium.js';
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

/** Scan step while looking for the first sign change, K. Small enough that two roots within one step would be a curiosity of the data. */
const SCAN_STEP_K = 1;
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
 * From T₀ the scan steps 1 K at a time towards lower T (if dissolution
 * absorbs heat) or higher T (if it releases it) until the balance changes
 * sign or the solution reaches its freezing floor or 100 °C; Brent's method
 * then finds the crossing to 1e-9 K. The first crossing is the one the pack
 * reaches as it dissolves; later ones cannot be reached.
 *
 * @internal
 */
export function solveFillTemperature(fill: PreparedFill, perturbation: Perturbation = {}): FillSolution {
  const t0 = fill.startC;
  const w = fillScratch(fill);
  const balance = (t: number): number => {
    evaluateFill(fill, t, perturbation, w);
    return w.heatCapacity * (t - t0) + w.heatJ;
  };
  const floorGap = (t: number): number => {
    evaluateFill(fill, t, perturbation, w);
    return t - Math.max(w.floorC, LOWEST_C - 1);
  };
  const stateAt = (t: number): FillEquilibrium => fillEquilibrium(fill, t, perturbation, w);
  const finish = (t: number): FillSolution => {
    const state = stateAt(t);
    const f = state.heatCapacity * (t - t0) + state.heatJ;
    return { temperature: t, state, clamp: undefined, jump: Math.abs(f) > 1e-6 * Math.abs(state.heatJ) + 1e-6 };
  };
  const floorKind = (kind: FillEquilibrium['floorKind']): FillClamp['kind'] => (kind === 'eutectic' ? 'eutectic' : 'freezing');

  evaluateFill(fill, t0, perturbation, w);
  const q0 = w.heatJ;
  if (q0 === 0) return { temperature: t0, state: stateAt(t0), clamp: undefined, jump: false };

  if (q0 > 0) {
    // Cools: look downwards, stopping at the floor where ice (or ice and salt) would form.
    if (t0 <= w.floorC) {
      const state = stateAt(t0);
      return { temperature: t0, state, clamp: { kind: floorKind(state.floorKind), temperature: t0 }, jump: false };
    }
    let prev = t0;
    for (let k = 1; ; k++) {
      const t = Math.max(t0 - k * SCAN_STEP_K, LOWEST_C);
      const f = balance(t);
      const gap = t - w.floorC;
      if (f <= 0 || gap <= 0) {
        const tBalance = f <= 0 ? bracketedRoot(balance, t, prev, TEMPERATURE_TOLERANCE_K).x : -Infinity;
        // The floor's crossing, taken on its liquid side so that the result never lies below the floor.
        const crossing = gap <= 0 ? bracketedRoot(floorGap, t, prev, TEMPERATURE_TOLERANCE_K).x : -Infinity;
        const tFloor = gap <= 0 ? crossing + Math.max(0, -floorGap(crossing)) : -Infinity;
        if (tBalance >= tFloor) return finish(tBalance);
        const state = stateAt(tFloor);
        return { temperature: tFloor, state, clamp: { kind: floorKind(state.floorKind), temperature: tFloor }, jump: false };
      }
      if (t === LOWEST_C) return { temperature: t, state: stateAt(t), clamp: { kind: 'freezing', temperature: t }, jump: false };
      prev = t;
    }
  }
  // Warms: look upwards, stopping at boiling.
  let prev = t0;
  for (let k = 1; ; k++) {
    const t = Math.min(t0 + k * SCAN_STEP_K, BOILING_C);
    if (balance(t) >= 0) return finish(bracketedRoot(balance, prev, t, TEMPERATURE_TOLERANCE_K).x);
    if (t === BOILING_C) return { temperature: t, state: stateAt(t), clamp: { kind: 'boiling', temperature: t }, jump: false };
    prev = t;
  }
}
