/**
 * The time course of a pack: a lumped model in which the salt dissolves with
 * a first-order time constant while the pack exchanges heat with the air
 * around it and with the skin it rests on.
 *
 * @module
 */
import { describeValue, optionsArgument, optionNames, checkOptionKeys } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { IonheatError } from '../error.js';
import type { Estimate } from '../quantity/estimate.js';
import { evaluateFill, fillScratch } from './fillEquilibrium.js';
import { finalTemperatureInterval } from './finalTemperatureInterval.js';
import { CONTACT_BURN_THRESHOLD_C, packCautions } from './packCautions.js';
import type { Caution } from '../quantity/caution.js';
import { packResult } from './packFinalTemperature.js';
import { preparePackFill } from './packFill.js';
import { type PackFill, type PackOptions } from './packInput.js';
import { BOILING_C, solveFillTemperature } from './solveFillTemperature.js';

const BAND_KEYS = optionNames<{ lowC: number; highC: number }>('packTimeCourse', { lowC: true, highC: true });
const TIME_COURSE_OPTIONS = optionNames<TimeCourseOptions>('packTimeCourse', { durationS: true, dissolutionTimeConstantS: true, ambientC: true, ambientConductanceWPerK: true, skinC: true, skinConductanceWPerK: true, band: true, samples: true });

/** Parameters of the time course; each one you leave out takes an assumed value for illustration. */
export interface TimeCourseOptions {
  /** How long to follow the pack, s (default 3600). */
  durationS?: number;
  /** Dissolution time constant τ, s: the dissolved amount approaches equilibrium as 1 − e^(−t/τ) (default 60, assumed). */
  dissolutionTimeConstantS?: number;
  /** Air temperature, °C (default 22, assumed). */
  ambientC?: number;
  /** Heat-transfer conductance from pack to air, W/K (default 0.15, assumed). */
  ambientConductanceWPerK?: number;
  /** Temperature of the skin (or whatever the pack rests on), °C (default 33, assumed). */
  skinC?: number;
  /** Conductance from pack to skin through its wrapping, W/K (default 0.25, assumed). */
  skinConductanceWPerK?: number;
  /** A temperature band to stay inside, °C. */
  band?: { lowC: number; highC: number };
  /** Points in the returned curve (default 361). */
  samples?: number;
}

/** A parameter as used, and whether it was your value or the assumed default. */
export interface TimeCourseParameter {
  value: number;
  unit: string;
  /** True when it is the default, an assumed value for illustration. */
  assumed: boolean;
}

/** One point of T(t). */
export interface TimeCoursePoint {
  /** s. */
  t: number;
  /** °C. */
  temperature: number;
  /** kJ absorbed by dissolution so far (negative = released). */
  heatAbsorbed: number;
}

/** What {@link packTimeCourse} returns. */
export interface PackTimeCourse {
  parameters: {
    durationS: TimeCourseParameter;
    dissolutionTimeConstantS: TimeCourseParameter;
    ambientC: TimeCourseParameter;
    ambientConductanceWPerK: TimeCourseParameter;
    skinC: TimeCourseParameter;
    skinConductanceWPerK: TimeCourseParameter;
  };
  startC: number;
  /** The fill as run: each solid's formula and grams, the grams of water and the container's heat capacity, J/K. */
  fill: { solids: { formula: string; massG: number }[]; waterG: number; containerJPerK: number };
  /** The adiabatic final temperature of the same fill, with its 95 % interval, °C. */
  adiabaticFinal: Estimate;
  /** The heat capacity used throughout, J/K (that of the adiabatic final state). */
  heatCapacityJPerK: number;
  points: TimeCoursePoint[];
  /** The coldest point of a cold pack, the hottest of a hot one. */
  extreme: { temperature: number; timeS: number };
  /** Time inside your band, when you gave one. */
  band: { lowC: number; highC: number; secondsInside: number; firstInsideS: number | null; lastInsideS: number | null } | null;
  /** Seconds above the contact-burn threshold. */
  secondsAboveBurnThreshold: number;
  /** As a pack result's, with the time spent above the burn threshold in the contact-burn caution; `{ kind, severity, text }`. */
  cautions: Caution[];
  notes: string[];
}

/** The assumed values of the time-course parameters (shared with the warmer model). */
export const DEFAULTS = {
  durationS: 3600,
  dissolutionTimeConstantS: 60,
  ambientC: 22,
  ambientConductanceWPerK: 0.15,
  skinC: 33,
  skinConductanceWPerK: 0.25,
} as const;

/** Each parameter in words, with the command-line option that sets it (the library option is the key of `parameters`). */
const PARAMETER_WORDS: Record<keyof typeof DEFAULTS, readonly [string, string]> = {
  durationS: ['duration', '--duration'],
  dissolutionTimeConstantS: ['dissolution time constant', '--tau'],
  ambientC: ['air temperature', '--ambient'],
  ambientConductanceWPerK: ['heat exchange with the air', '--g-ambient'],
  skinC: ['skin temperature', '--skin'],
  skinConductanceWPerK: ['heat exchange with the skin', '--g-skin'],
};

const UNITS: Record<keyof typeof DEFAULTS, string> = {
  durationS: 's',
  dissolutionTimeConstantS: 's',
  ambientC: '°C',
  ambientConductanceWPerK: 'W/K',
  skinC: '°C',
  skinConductanceWPerK: 'W/K',
};

/** Integration steps: at least this many over the run… */
const MIN_STEPS = 2000;
/** …and at least four per dissolution time constant, up to this many. */
const MAX_STEPS = 200_000;

/** Share of a straight segment from a to b that lies inside [lo, hi]. */
export function shareInside(a: number, b: number, lo: number, hi: number): number {
  if (a === b) return a >= lo && a <= hi ? 1 : 0;
  const s0 = (lo - a) / (b - a);
  const s1 = (hi - a) / (b - a);
  const enter = Math.max(0, Math.min(s0, s1));
  const leave = Math.min(1, Math.max(s0, s1));
  return Math.max(0, leave - enter);
}

/** A time-course parameter as given (checked) or its assumed default. */
export function parameter(options: TimeCourseOptions, key: keyof typeof DEFAULTS, check: (v: number) => boolean, rule: string): TimeCourseParameter {
  const given = options[key];
  if (given === undefined) return { value: DEFAULTS[key], unit: UNITS[key], assumed: true };
  if (typeof given !== 'number' || !Number.isFinite(given) || !check(given)) {
    throw new IonheatError('INVALID_ARGUMENT', `the time-course parameter ${key} ${rule}, got ${describeValue(given)}`, { field: key });
  }
  return { value: given, unit: UNITS[key], assumed: false };
}

/**
 * T(t) of a pack from the moment the salt meets the water.
 *
 * Two states: the heat q taken up by dissolution so far, and the pack
 * temperature T. The salt relaxes towards the equilibrium of the current
 * temperature, dq/dt = (Q_eq(T) − q)/τ, where Q_eq(T) is the heat the
 * adiabatic model gives for the state the fill would reach at T (solubility
 * limit included). The pack, of heat capacity C (that of its adiabatic final
 * state), exchanges heat with the air and the skin:
 * C·dT/dt = −dq/dt + G_air·(T_air − T) + G_skin·(T_skin − T).
 * Each step integrates the dissolution and the exchange exactly for a frozen
 * T (exponential steps, stable for any τ); T never goes below the floor of
 * the adiabatic model (ice would form; its later melting is not followed)
 * nor above boiling. With both conductances zero, T settles at the adiabatic
 * final temperature.
 *
 * The defaults are assumed values for illustration, not measurements: give
 * your own for a real pack.
 *
 * @param fill - solids (formula, grams), water (g), start temperature (°C, default 20), container heat capacity (J/K, default 0)
 * @param options - duration (s), dissolution time constant τ (s), air and skin temperatures (°C) and conductances
 *   G_air, G_skin (W/K), a comfort band (°C), and the number of samples
 * @param packOptions - as for {@link packFinalTemperature}: heat-capacity override (J/K), Kirchhoff correction, interval method
 * @param dataset - enthalpies of solution, solubilities, heat capacities and hazards (default: built-in)
 * @returns times in s, temperatures in °C, heats in kJ
 * @see Newton's law of cooling, C·dT/dt = G·(T_env − T): any heat-transfer text, e.g. Incropera, F. P.; DeWitt, D. P.
 *   Fundamentals of Heat and Mass Transfer (Wiley); first-order dissolution kinetics: `commonPractice`; the
 *   adiabatic end point as in {@link packFinalTemperature}.
 *
 * @example
 * ```ts
 * const course = packTimeCourse({ solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 }, { ambientConductanceWPerK: 0, skinConductanceWPerK: 0 });
 * course.points[course.points.length - 1].temperature; // ≈ 11.51 (the adiabatic final temperature)
 * // with the default (assumed) exchange with air and skin the pack warms back up within the hour
 * const held = packTimeCourse({ solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 });
 * held.points[held.points.length - 1].t; // 3600 s
 * ```
 */
export function packTimeCourse(fill: PackFill, options: TimeCourseOptions = {}, packOptions: PackOptions = {}, dataset: Dataset = builtinDataset()): PackTimeCourse {
  options = optionsArgument(options, TIME_COURSE_OPTIONS);
  const parameters = {
    durationS: parameter(options, 'durationS', (v) => v > 0 && v <= 7 * 86400, 'must be a time from above 0 s to 7 days'),
    dissolutionTimeConstantS: parameter(options, 'dissolutionTimeConstantS', (v) => v > 0 && v <= 1e7, 'must be greater than 0 s and at most 10000000 s'),
    ambientC: parameter(options, 'ambientC', (v) => v > -60 && v < 100, 'must lie between −60 and 100 °C'),
    ambientConductanceWPerK: parameter(options, 'ambientConductanceWPerK', (v) => v >= 0 && v <= 1e6, 'must be from 0 to 1000000 W/K'),
    skinC: parameter(options, 'skinC', (v) => v > 0 && v < 60, 'must lie between 0 and 60 °C'),
    skinConductanceWPerK: parameter(options, 'skinConductanceWPerK', (v) => v >= 0 && v <= 1e6, 'must be from 0 to 1000000 W/K'),
  };
  const band = options.band;
  if (band !== null && typeof band === 'object') checkOptionKeys(band, BAND_KEYS, 'band');
  if (band !== undefined && !(band !== null && typeof band === 'object' && typeof band.lowC === 'number' && typeof band.highC === 'number' && Number.isFinite(band.lowC) && Number.isFinite(band.highC) && band.lowC < band.highC)) {
    throw new IonheatError('INVALID_ARGUMENT', `a target band needs a lower and a higher temperature in °C (band.lowC < band.highC), got ${band !== null && typeof band === 'object' ? `${describeValue(band.lowC)} and ${describeValue(band.highC)}` : describeValue(band)}`, { field: 'band' });
  }
  const samples = options.samples ?? 361;
  if (!Number.isInteger(samples) || samples < 2 || samples > 100_000) throw new IonheatError('INVALID_ARGUMENT', `samples must be a whole number from 2 to 100000, got ${describeValue(samples)}`, { field: 'samples' });

  const prepared = preparePackFill(fill, packOptions, dataset);
  const adiabatic = solveFillTemperature(prepared);
  const interval = finalTemperatureInterval(prepared, adiabatic, packOptions.interval);
  const adiabaticResult = packResult(prepared, adiabatic, interval, dataset);
  const C = adiabatic.state.heatCapacity;

  const duration = parameters.durationS.value;
  const tau = parameters.dissolutionTimeConstantS.value;
  const gAir = parameters.ambientConductanceWPerK.value;
  const gSkin = parameters.skinConductanceWPerK.value;
  const g = gAir + gSkin;
  const tEnv = g > 0 ? (gAir * parameters.ambientC.value + gSkin * parameters.skinC.value) / g : 0;
  const steps = Math.min(MAX_STEPS, Math.max(MIN_STEPS, Math.ceil((4 * duration) / tau)));
  const h = duration / steps;
  const relax = 1 - Math.exp(-h / tau);
  const exchange = g > 0 ? Math.exp((-g * h) / C) : 1;
  const every = (steps) / (samples - 1);

  const w = fillScratch(prepared);
  let T = prepared.startC;
  let q = 0;
  const points: TimeCoursePoint[] = [{ t: 0, temperature: T, heatAbsorbed: 0 }];
  let nextSample = 1;
  let extreme = { temperature: T, timeS: 0 };
  const cools = adiabatic.temperature < prepared.startC;
  let inside = 0;
  let firstInside: number | null = band && T >= band.lowC && T <= band.highC ? 0 : null;
  let lastInside: number | null = firstInside;
  let above = 0;
  let frozeAt: number | null = null;
  evaluateFill(prepared, T, {}, w);
  for (let k = 1; k <= steps; k++) {
    const before = T;
    const dq = (w.heatJ - q) * relax;
    q += dq;
    T -= dq / C;
    if (g > 0) T = tEnv + (T - tEnv) * exchange;
    if (T > BOILING_C) T = BOILING_C;
    evaluateFill(prepared, T, {}, w);
    if (w.frozen) {
      // Below the eutectic no liquid is left: the fill holds where it was.
      T = before;
      evaluateFill(prepared, T, {}, w);
    }
    if (w.iceG > 0) frozeAt ??= k * h;
    const t = k * h;
    if (band) {
      const share = shareInside(before, T, band.lowC, band.highC);
      inside += share * h;
      if (share > 0) {
        firstInside ??= t - h;
        lastInside = t;
      }
    }
    above += shareInside(before, T, CONTACT_BURN_THRESHOLD_C, Infinity) * h;
    if (cools ? T < extreme.temperature - 1e-6 : T > extreme.temperature + 1e-6) extreme = { temperature: T, timeS: t };
    if (k >= nextSample * every - 1e-9 || k === steps) {
      points.push({ t, temperature: T, heatAbsorbed: q / 1000 });
      nextSample++;
    }
  }

  const notes = [
    'lumped model: one temperature for the whole pack, first-order dissolution towards the equilibrium of the current temperature, linear heat exchange with air and skin; the heat capacity is that of the adiabatic final state throughout',
  ];
  const assumed = (Object.keys(parameters) as (keyof typeof PARAMETER_WORDS)[]).filter((k) => parameters[k].assumed).map((k) => `${PARAMETER_WORDS[k][0]} ${parameters[k].value} ${parameters[k].unit} (${PARAMETER_WORDS[k][1]})`);
  if (assumed.length > 0) notes.push(`assumed values for illustration, not measurements: ${assumed.join(', ')}; give your own for a real pack`);
  if (frozeAt !== null) notes.push(`from about ${Math.round(frozeAt)} s the pack sits at the freezing floor of the solution; ice would form, and its later melting is not followed`);
  const cautions = packCautions(
    { startC: prepared.startC, final: adiabaticResult.finalTemperature, clamp: adiabaticResult.clamp?.kind, salts: prepared.solids.map((s) => s.salt), secondsAboveBurnThreshold: above, undissolved: adiabaticResult.dissolved },
    dataset,
  );
  return {
    parameters,
    startC: prepared.startC,
    fill: { solids: prepared.solids.map((x) => ({ formula: x.salt.formula, massG: x.massG })), waterG: prepared.waterG, containerJPerK: prepared.containerJPerK },
    adiabaticFinal: adiabaticResult.finalTemperature,
    heatCapacityJPerK: C,
    points,
    extreme,
    band: band ? { lowC: band.lowC, highC: band.highC, secondsInside: inside, firstInsideS: firstInside, lastInsideS: lastInside } : null,
    secondsAboveBurnThreshold: above,
    cautions,
    notes: [...notes, ...prepared.notes],
  };
}
