/**
 * Inverse design: the final temperature against the salt-to-water ratio, the
 * ratio that gives the largest change, the ratio that gives the most change
 * per gram of fill, and the ratio that reaches a target temperature.
 *
 * @module
 */
import { describeValue, optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { IonheatError } from '../error.js';
import { bracketedRoot } from '../numeric/bracketedRoot.js';
import { finalTemperatureInterval } from './finalTemperatureInterval.js';
import { goldenSectionMaximum } from '../numeric/goldenSectionMaximum.js';
import { preparePackFill, scalePreparedFill, type PreparedFill } from './packFill.js';
import { type PackFill, type PackOptions } from './packInput.js';
import { solveFillTemperature, type FillSolution } from './solveFillTemperature.js';

const PACK_CURVE_OPTIONS = optionNames<PackCurveOptions>('packRatioCurve', { points: true, maxRatio: true, targetC: true, band: true });

/** One point of the curve. */
export interface PackCurvePoint {
  /** Grams of solid (all solids together) per gram of water. */
  ratio: number;
  /** Grams of solid at this ratio, for the fill's water. */
  saltMass: number;
  /** Final temperature, °C. */
  temperature: number;
  /** 95 % interval, °C (bounds), when asked for. */
  low?: number;
  high?: number;
  /** Grams of solid (as loaded) left undissolved. */
  undissolvedMass: number;
  /** Set where freezing, a eutectic or boiling cut the balance short. */
  clamp: 'freezing' | 'eutectic' | 'boiling' | null;
  /** |T − T₀| per gram of fill (solid + water), K/g. */
  changePerGram: number;
}

/** A designed ratio. */
export interface PackDesignPoint {
  ratio: number;
  saltMass: number;
  temperature: number;
  /** K per gram of fill (solid + water). */
  changePerGram: number;
}

/** The ratio that reaches a target, or why none does. */
export interface PackTargetDesign {
  /** The temperature asked for, °C. */
  target: number;
  reachable: boolean;
  /** The design that reaches it; null when unreachable. */
  design: PackDesignPoint | null;
  message: string;
}

/** What {@link packRatioCurve} returns. */
export interface PackRatioCurve {
  /** The fill the ratios scale: solids keep their proportions, water and start stay. */
  base: { solids: { formula: string; share: number }[]; waterG: number; startC: number; containerJPerK: number };
  points: PackCurvePoint[];
  /** The ratio with the largest temperature change (for a solubility-limited salt, where the fill just saturates). */
  largestChange: PackDesignPoint;
  /** The ratio with the largest temperature change per gram of fill. */
  bestPerGram: PackDesignPoint;
  /** The smallest ratio at which something stays undissolved, or null when none within the curve. */
  saturationRatio: number | null;
  /** When a target was given. */
  target: PackTargetDesign | null;
  notes: string[];
}

/** Options of the sweep. */
export interface PackCurveOptions {
  /** Points of the curve (default 200, at least 2). */
  points?: number;
  /** Largest ratio of the curve (default: 2.5 × the ratio of largest change, at least 0.05). */
  maxRatio?: number;
  /** A temperature to design for, °C. */
  targetC?: number;
  /** Compute the 95 % interval (bounds) at every point (default true). */
  band?: boolean;
}

/** Tolerance on a designed ratio, g/g. */
const RATIO_TOLERANCE = 1e-7;
/** The scan for the largest change doubles the ratio from this… */
const SCAN_FIRST_RATIO = 0.005;
/** …up to this (11 doublings). */
const SCAN_LAST_RATIO = 5.12;

interface Sweeper {
  base: PreparedFill;
  /** Σ solid masses of the base fill, g. */
  baseMass: number;
  at(ratio: number): { solution: FillSolution; fill: PreparedFill };
  change(ratio: number): number;
}

function sweeper(base: PreparedFill): Sweeper {
  const baseMass = base.solids.reduce((s, x) => s + x.massG, 0);
  const at = (ratio: number) => {
    const fill = scalePreparedFill(base, (ratio * base.waterG) / baseMass);
    return { solution: solveFillTemperature(fill), fill };
  };
  return { base, baseMass, at, change: (ratio) => (ratio <= 0 ? 0 : at(ratio).solution.temperature - base.startC) };
}

function designAt(s: Sweeper, ratio: number): PackDesignPoint {
  const t = ratio <= 0 ? s.base.startC : s.at(ratio).solution.temperature;
  return { ratio, saltMass: ratio * s.base.waterG, temperature: t, changePerGram: Math.abs(t - s.base.startC) / (s.base.waterG * (1 + ratio)) };
}

/** Refines the maximum of g around grid index k of xs. */
function refineMaximum(g: (r: number) => number, xs: readonly number[], k: number): number {
  const lo = xs[Math.max(0, k - 1)]!;
  const hi = xs[Math.min(xs.length - 1, k + 1)]!;
  return goldenSectionMaximum(g, lo, hi, RATIO_TOLERANCE).x;
}

/** The largest salt-to-water mass ratio a curve may reach (a thousand grams of salt per gram of water). */
const MAX_RATIO = 1000;

/**
 * The final temperature against the ratio of solid to water, from zero to
 * `maxRatio`, with the designs a formulator asks for:
 *
 * - `largestChange`: the ratio with the largest |T − T₀|. Below saturation,
 *   more salt cools (or heats) more; beyond it, extra salt only adds heat
 *   capacity, so for a solubility-limited salt this is where the fill just
 *   saturates at its own final temperature.
 * - `bestPerGram`: the ratio with the largest |T − T₀| / (solid + water mass).
 * - `target`: the smallest ratio whose final temperature equals `targetC`
 *   (Brent on the curve between zero and `largestChange`), or why none does.
 *
 * The solids of `fill` keep their proportions; its water, start temperature
 * and container are kept. Maxima are refined by golden-section search to
 * 1e-7 g/g.
 *
 * @param fill - solids (formula, grams), water (g), start temperature (°C, default 20), container heat capacity (J/K, default 0)
 * @param options - `points` on the curve, `maxRatio` (g solid per g water), `targetC` (°C)
 * @param packOptions - as for {@link packFinalTemperature}: heat-capacity override (J/K), Kirchhoff correction, interval method
 * @param dataset - enthalpies of solution, solubilities, heat capacities and hazards (default: built-in)
 * @returns ratios in g solid per g water, temperatures in °C
 * @see enthalpies of solution: the CRC table, `crcSolution`, and Wagman et al. (1982), `wagman1982`; solubilities: the CRC
 *   table, `crcSolubility`; heat capacities: `wagman1982`; the root finder: Brent, R. P. Algorithms for Minimization
 *   without Derivatives (Prentice-Hall, 1973), ch. 4; docs/methods.md, "Pack design".
 * @see golden-section search: Kiefer, J. Proc. Am. Math. Soc. 4, 502–506 (1953).
 *
 * @example
 * ```ts
 * const curve = packRatioCurve({ solids: [{ formula: 'KNO3', massG: 1 }], waterG: 100, startC: 20 }, { points: 50, targetC: 12 });
 * curve.points.length; // 50
 * curve.target.design.ratio; // ≈ 0.0942 (9.4 g of KNO3 per 100 g of water gives 12 °C)
 * ```
 */
export function packRatioCurve(fill: PackFill, options: PackCurveOptions = {}, packOptions: PackOptions = {}, dataset: Dataset = builtinDataset()): PackRatioCurve {
  options = optionsArgument(options, PACK_CURVE_OPTIONS);
  const base = preparePackFill(fill, packOptions, dataset);
  const count = options.points ?? 200;
  if (!Number.isInteger(count) || count < 2 || count > 100_000) throw new IonheatError('INVALID_ARGUMENT', `the number of curve points (points) must be a whole number from 2 to 100000, got ${describeValue(count)}`, { field: 'points' });
  if (options.maxRatio !== undefined && !(typeof options.maxRatio === 'number' && options.maxRatio > 0 && options.maxRatio <= MAX_RATIO)) {
    throw new IonheatError('INVALID_ARGUMENT', `the largest ratio (maxRatio) must be greater than zero and at most ${MAX_RATIO} g of salt per g of water, got ${describeValue(options.maxRatio)}`, { field: 'maxRatio' });
  }
  if (options.targetC !== undefined && !(typeof options.targetC === 'number' && Number.isFinite(options.targetC))) throw new IonheatError('INVALID_ARGUMENT', `the target temperature (targetC) must be a number of °C, got ${describeValue(options.targetC)}`, { field: 'targetC' });
  const s = sweeper(base);
  const magnitude = (r: number) => Math.abs(s.change(r));
  const notes: string[] = [];

  // Where is the largest change? Double the ratio until the change stops growing, then golden
  // section over the last two doublings.
  const coarse = [0];
  const coarseValues = [0];
  for (let r = SCAN_FIRST_RATIO; r <= SCAN_LAST_RATIO * (1 + 1e-12); r *= 2) {
    coarse.push(r);
    coarseValues.push(magnitude(r));
    if (coarseValues[coarseValues.length - 1]! < coarseValues[coarseValues.length - 2]! - 1e-12) break;
  }
  const kBest = coarseValues.reduce((best, v, i) => (v > coarseValues[best]! + 1e-12 ? i : best), 0);
  let extremeRatio = kBest === 0 ? 0 : refineMaximum(magnitude, coarse, kBest);
  // On a plateau (the freezing or eutectic clamp) take the smallest ratio that reaches it.
  const extremeChange = magnitude(extremeRatio);
  if (extremeRatio > 0 && s.at(extremeRatio).solution.clamp) {
    let lo = 0;
    let hi = extremeRatio;
    while (hi - lo > RATIO_TOLERANCE) {
      const mid = (lo + hi) / 2;
      if (magnitude(mid) >= extremeChange - 1e-9) hi = mid;
      else lo = mid;
    }
    extremeRatio = hi;
  }
  const maxRatio = options.maxRatio ?? Math.max(0.05, 2.5 * extremeRatio);
  if (extremeRatio > maxRatio) notes.push(`the largest change lies beyond the curve's largest ratio (${maxRatio})`);

  const ratios = Array.from({ length: count }, (_, i) => (maxRatio * i) / (count - 1));
  const band = options.band !== false;
  let saturationRatio = null as number | null;
  const points: PackCurvePoint[] = ratios.map((ratio) => {
    if (ratio === 0) return { ratio, saltMass: 0, temperature: base.startC, ...(band ? { low: base.startC, high: base.startC } : {}), undissolvedMass: 0, clamp: null, changePerGram: 0 };
    const { solution, fill: scaled } = s.at(ratio);
    const undissolvedMass = scaled.solids.reduce((sum, x, i) => sum + x.massG * (1 - solution.state.solids[i]!.fraction), 0);
    if (saturationRatio === null && undissolvedMass > 1e-9) saturationRatio = ratio;
    const interval = band ? finalTemperatureInterval(scaled, solution) : undefined;
    return {
      ratio,
      saltMass: ratio * base.waterG,
      temperature: solution.temperature,
      ...(interval ? { low: interval.low, high: interval.high } : {}),
      undissolvedMass,
      clamp: solution.clamp?.kind ?? null,
      changePerGram: Math.abs(solution.temperature - base.startC) / (base.waterG * (1 + ratio)),
    };
  });
  if (saturationRatio !== null) {
    // Refine the onset of saturation between the grid points around it.
    const k = ratios.indexOf(saturationRatio);
    let lo = ratios[k - 1] ?? 0;
    let hi = saturationRatio;
    const undissolved = (r: number) => {
      const { solution } = s.at(r);
      return solution.state.solids.some((e) => e.fraction < 1);
    };
    while (hi - lo > RATIO_TOLERANCE) {
      const mid = (lo + hi) / 2;
      if (undissolved(mid)) hi = mid;
      else lo = mid;
    }
    saturationRatio = hi;
  }

  const perGram = (r: number) => (r <= 0 ? 0 : magnitude(r) / (base.waterG * (1 + r)));
  const kPer = points.reduce((best, p, i) => (p.changePerGram > points[best]!.changePerGram + 1e-15 ? i : best), 0);
  const bestRatio = kPer === 0 ? 0 : refineMaximum(perGram, ratios, kPer);

  let target: PackTargetDesign | null = null;
  if (options.targetC !== undefined) target = designForTarget(s, options.targetC, extremeRatio);

  return {
    base: { solids: base.solids.map((x) => ({ formula: x.salt.formula, share: x.massG / s.baseMass })), waterG: base.waterG, startC: base.startC, containerJPerK: base.containerJPerK },
    points,
    largestChange: designAt(s, extremeRatio),
    bestPerGram: designAt(s, bestRatio),
    saturationRatio,
    target,
    notes: [...base.notes, ...notes],
  };
}

function designForTarget(s: Sweeper, targetC: number, extremeRatio: number): PackTargetDesign {
  const t0 = s.base.startC;
  const wanted = targetC - t0;
  const best = designAt(s, extremeRatio);
  const bestChange = best.temperature - t0;
  if (wanted === 0) return { target: targetC, reachable: true, design: designAt(s, 0), message: 'the target is the start temperature: no salt is needed' };
  if (bestChange === 0 || Math.sign(wanted) !== Math.sign(bestChange)) {
    const way = bestChange > 0 ? 'warms' : bestChange < 0 ? 'cools' : 'neither warms nor cools';
    return { target: targetC, reachable: false, design: null, message: `this fill ${way} from ${t0} °C, so it cannot reach ${targetC} °C` };
  }
  if (Math.abs(wanted) > Math.abs(bestChange) + 1e-9) {
    return {
      target: targetC,
      reachable: false,
      design: null,
      message: `${targetC} °C is out of reach: the most this fill can do is ${best.temperature.toFixed(2)} °C, at ${best.ratio.toFixed(4)} g of solid per g of water; more salt beyond that stays undissolved or freezes and only adds heat capacity`,
    };
  }
  const g = (r: number) => (r <= 0 ? -wanted : s.change(r) - wanted);
  const ratio = bracketedRoot(g, 0, extremeRatio, RATIO_TOLERANCE).x;
  const design = designAt(s, ratio);
  return { target: targetC, reachable: true, design, message: `${design.saltMass.toFixed(2)} g of solid in ${s.base.waterG} g of water (ratio ${ratio.toFixed(4)}) reaches ${targetC} °C` };
}

/**
 * The salt-to-water ratio that brings a fill to a target temperature (see
 * {@link packRatioCurve}).
 *
 * @param fill - solids (formula, grams), water (g), start temperature (°C, default 20), container heat capacity (J/K, default 0)
 * @param targetC - the target final temperature, °C
 * @param packOptions - as for {@link packFinalTemperature}: heat-capacity override (J/K), Kirchhoff correction, interval method
 * @param dataset - enthalpies of solution, solubilities, heat capacities and hazards (default: built-in)
 * @returns the design (ratio in g solid per g water, final temperature in °C), or why no ratio reaches the target
 * @see enthalpies of solution: the CRC table, `crcSolution`, and Wagman et al. (1982), `wagman1982`; solubilities: the CRC
 *   table, `crcSolubility`; heat capacities: `wagman1982`; the root finder: Brent, R. P. Algorithms for Minimization
 *   without Derivatives (Prentice-Hall, 1973), ch. 4; docs/methods.md, "Pack design".
 *
 * @example
 * ```ts
 * const design = ratioForTargetTemperature({ solids: [{ formula: 'NH4NO3', massG: 1 }], waterG: 100, startC: 20 }, 5);
 * design.design.ratio; // ≈ 0.1992 (19.9 g of NH4NO3 per 100 g of water)
 * ```
 */
export function ratioForTargetTemperature(fill: PackFill, targetC: number, packOptions: PackOptions = {}, dataset: Dataset = builtinDataset()): PackTargetDesign {
  return packRatioCurve(fill, { targetC, points: 2, band: false }, packOptions, dataset).target!;
}

/**
 * The salt-to-water ratio with the largest temperature change per gram of
 * fill (solid + water), from a 200-point curve refined by golden section
 * (see {@link packRatioCurve}).
 *
 * @param fill - solids (formula, grams), water (g), start temperature (°C, default 20), container heat capacity (J/K, default 0)
 * @param packOptions - as for {@link packFinalTemperature}: heat-capacity override (J/K), Kirchhoff correction, interval method
 * @param dataset - enthalpies of solution, solubilities, heat capacities and hazards (default: built-in)
 * @returns the design point: ratio in g solid per g water, final temperature in °C
 * @see enthalpies of solution: the CRC table, `crcSolution`, and Wagman et al. (1982), `wagman1982`; solubilities: the CRC
 *   table, `crcSolubility`; heat capacities: `wagman1982`; the root finder: Brent, R. P. Algorithms for Minimization
 *   without Derivatives (Prentice-Hall, 1973), ch. 4; docs/methods.md, "Pack design".
 * @see golden-section search: Kiefer, J. Proc. Am. Math. Soc. 4, 502–506 (1953).
 *
 * @example
 * ```ts
 * ratioForLargestChangePerGram({ solids: [{ formula: 'KNO3', massG: 1 }], waterG: 100, startC: 20 }).ratio; // ≈ 0.176 (where KNO3 just saturates, at 5.1 °C)
 * ```
 */
export function ratioForLargestChangePerGram(fill: PackFill, packOptions: PackOptions = {}, dataset: Dataset = builtinDataset()): PackDesignPoint {
  return packRatioCurve(fill, { band: false }, packOptions, dataset).bestPerGram;
}
