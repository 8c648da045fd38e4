/**
 * One run of the warmer model for one set of data values: the trigger (the
 * crystallisation at once), the course of temperature and crystal mass
 * against a heat loss to air and skin, the plateau, the heat back to the
 * start temperature, the recharge temperature and the energy balance.
 *
 * @module
 */
import { shareInside } from '../pack/packTimeCourse.js';
import { CONTACT_BURN_THRESHOLD_C } from '../pack/packCautions.js';
import {
  equilibriumCrystal,
  fillConstants,
  heatCapacityWith,
  stateOfEnthalpy,
  type CrystallisingFill,
  type LiquidusPoint,
} from './crystallisingFill.js';

/** How the fill loses heat: Newton's law to the air and to the skin, Q = G_air·(T − T_air) + G_skin·(T − T_skin). */
export interface HeatLoss {
  ambientC: number;
  ambientConductanceWPerK: number;
  skinC: number;
  skinConductanceWPerK: number;
}

/**
 * The plateau ends when the fill has crystallised completely or has fallen
 * this far below its plateau temperature, K (a convention of this model).
 */
export const PLATEAU_BAND_K = 1;

/** Longest course followed, s (a week). */
const MAX_COURSE_S = 7 * 86400;
/** Most integration steps of one course. */
const MAX_STEPS = 400_000;

/** The outcome of one run; heats in J, times in s, temperatures in °C. */
export interface WarmerRun {
  plateauC: number;
  /** Hydrate crystallised at once on triggering, g. */
  crystalAtOnceG: number;
  /** Heat released when the fill is back at its start temperature in equilibrium, J. */
  heatReleasedJ: number;
  plateauDurationS: number;
  /** The temperature at which the fill is all liquid again, °C; null when heating in water (to 100 °C) cannot get there. */
  rechargeC: number | null;
  /** t (s), T (°C), crystallised fraction of the hydrate. */
  points: { t: number; temperature: number; crystallised: number }[];
  secondsAboveBurnThreshold: number;
  energy: {
    trigger: { latentJ: number; sensibleJ: number; residualJ: number };
    course: { latentJ: number; sensibleJ: number; lostJ: number; residualJ: number };
  };
}

/**
 * The temperature at which a fill holding s g of salt per g of water is all
 * liquid again: its liquidus, or, where a solid separated on melting, the
 * temperature at which that solid's solubility reaches s; null when it does
 * not below 100 °C.
 */
export function rechargeTemperature(liquidusC: number, s: number, separated: readonly LiquidusPoint[]): number | null {
  if (separated.length < 2 || separated[0]!.s >= s) return liquidusC;
  for (let k = 1; k < separated.length; k++) {
    const a = separated[k - 1]!;
    const b = separated[k]!;
    if (b.s >= s && b.s > a.s) return Math.max(liquidusC, a.t + ((b.t - a.t) * (s - a.s)) / (b.s - a.s));
  }
  return null;
}

/**
 * Runs the model. The fill starts all liquid at its start temperature; the
 * trigger brings it at once to the equilibrium state of the same enthalpy
 * (H = 0). From there dH/dt = −Q(T) is integrated with explicit steps short
 * against the fill's own cooling time C/G, the state following H through
 * {@link stateOfEnthalpy}.
 */
export function runWarmer(f: CrystallisingFill, loss: HeatLoss, options: { durationS: number; samples: number; separated: readonly LiquidusPoint[] }): WarmerRun {
  const c = fillConstants(f);
  const trigger = stateOfEnthalpy(f, c, 0);
  const plateauC = trigger.temperature;
  const g = loss.ambientConductanceWPerK + loss.skinConductanceWPerK;
  const lossAt = (t: number) => loss.ambientConductanceWPerK * (t - loss.ambientC) + loss.skinConductanceWPerK * (t - loss.skinC);
  const smallestC = Math.min(c.liquidJPerK, heatCapacityWith(f, c, f.hydrateG));
  // Steps short against the fill's own cooling time C/G, so explicit steps stay accurate.
  const h = Math.min(5, smallestC / g / 200);

  const t: number[] = [0];
  const temps: number[] = [plateauC];
  const crystals: number[] = [trigger.crystalG];
  let H = 0;
  let lost = 0;
  let above = 0;
  let plateauEnd: number | null = null;
  let state = trigger;
  for (let k = 1; k <= MAX_STEPS && k * h <= MAX_COURSE_S; k++) {
    const q = lossAt(state.temperature) * h;
    H -= q;
    lost += q;
    const before = state.temperature;
    state = stateOfEnthalpy(f, c, H);
    const now = k * h;
    above += shareInside(before, state.temperature, CONTACT_BURN_THRESHOLD_C, Infinity) * h;
    t.push(now);
    temps.push(state.temperature);
    crystals.push(state.crystalG);
    if (plateauEnd === null) {
      if (state.temperature < plateauC - PLATEAU_BAND_K) plateauEnd = now - h + (h * (before - (plateauC - PLATEAU_BAND_K))) / (before - state.temperature);
      else if (state.crystalG >= f.hydrateG * (1 - 1e-12)) plateauEnd = now;
    }
    if (plateauEnd !== null && now >= Math.max(options.durationS, 1.5 * plateauEnd)) break;
  }
  if (plateauEnd === null) plateauEnd = Infinity;

  const end = { temperature: temps[temps.length - 1]!, crystalG: crystals[crystals.length - 1]! };
  const courseLatent = end.crystalG * c.latentAtStartJPerG;
  const courseSensible = heatCapacityWith(f, c, end.crystalG) * (end.temperature - f.startC);
  const triggerLatent = trigger.crystalG * c.latentAtStartJPerG;
  const triggerSensible = heatCapacityWith(f, c, trigger.crystalG) * (plateauC - f.startC);

  const n = t.length;
  const samples = Math.min(options.samples, n);
  const points = Array.from({ length: samples }, (_, i) => {
    const k = samples === 1 ? 0 : Math.round((i * (n - 1)) / (samples - 1));
    return { t: t[k]!, temperature: temps[k]!, crystallised: crystals[k]! / f.hydrateG };
  });
  return {
    plateauC,
    crystalAtOnceG: trigger.crystalG,
    heatReleasedJ: equilibriumCrystal(f, c, f.startC) * c.latentAtStartJPerG,
    plateauDurationS: plateauEnd,
    rechargeC: rechargeTemperature(c.liquidusC, c.anhydrousG / c.waterG, options.separated),
    points,
    secondsAboveBurnThreshold: above,
    energy: {
      trigger: { latentJ: triggerLatent, sensibleJ: triggerSensible, residualJ: triggerLatent - triggerSensible },
      course: { latentJ: courseLatent, sensibleJ: courseSensible, lostJ: lost, residualJ: courseLatent - courseSensible - lost },
    },
  };
}

