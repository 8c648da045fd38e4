/**
 * A target design with its margins: the designed mass with the 95 %
 * interval of masses that may reach the target, and the largest mass whose
 * 95 % interval stays clear of the contact-burn threshold (hot fills) or of
 * freezing against skin (cold fills). Built on the pack's own solve and
 * interval ({@link packFinalTemperature}, {@link packRatioCurve}), so that
 * whatever model they use, the margin follows.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { numberArgument } from '../quantity/argumentChecks.js';
import { bracketedRoot } from '../numeric/bracketedRoot.js';
import { CONTACT_BURN_THRESHOLD_C } from './packCautions.js';
import { caution, type Caution } from '../quantity/caution.js';
import type { PackFill, PackOptions } from './packInput.js';
import { packFinalTemperature } from './packFinalTemperature.js';
import { packRatioCurve } from './packRatioCurve.js';

/**
 * The temperature at or below which a cold fill can freeze skin on contact,
 * °C: the 0 °C line the pack cautions use (common practice).
 */
export const FROSTBITE_THRESHOLD_C = 0;

/** Grams to which the masses are solved. */
const MASS_TOLERANCE_G = 1e-4;

/** A final temperature with its 95 % interval, °C. */
export interface TemperatureBand {
  value: number;
  low: number;
  high: number;
}

/** What {@link packDesignMargin} returns. All masses are grams of solid (all solids together, in the fill's proportions). */
export interface PackDesignMargin {
  /** The temperature asked for, °C. */
  targetC: number;
  /** A fill that warms (hot) or cools (cold) from its start. */
  kind: 'hot' | 'cold';
  /** False when no mass reaches the target (then `design` and `massInterval` are null). */
  reachable: boolean;
  /** The designed mass and the final temperature it gives, with its 95 % interval. */
  design: { saltMassG: number; ratio: number; finalTemperature: TemperatureBand } | null;
  /**
   * The 95 % interval of the designed mass: from the mass whose interval's far
   * edge already reaches the target to the mass whose near edge only just does.
   * `high` is null when even the most effective mass leaves the near edge short of the target.
   */
  massInterval: { low: number; high: number | null } | null;
  /** The safety line this kind of fill is held to. */
  threshold: {
    kind: 'contact-burn' | 'frostbite';
    temperatureC: number;
    /**
     * The largest mass whose 95 % interval stays on the safe side of the line
     * (upper bound below it for a hot fill, lower bound above it for a cold
     * one); null when every mass up to the most effective one does.
     */
    largestSafeMassG: number | null;
  };
  /** Set when the design's own 95 % interval crosses the line: a `design-margin` warning. */
  caution: Caution | null;
  /** The design and its margins in one sentence. */
  message: string;
}

/** Two decimals, without a minus sign on a rounded zero. */
const g2 = (x: number): string => (Math.abs(x) < 0.005 ? 0 : x).toFixed(2);

/**
 * The designed mass for a target temperature with its 95 % interval, and
 * the largest mass that keeps the fill's 95 % interval clear of the
 * contact-burn threshold (hot fill, {@link CONTACT_BURN_THRESHOLD_C}) or of
 * {@link FROSTBITE_THRESHOLD_C} (cold fill).
 *
 * Each mass m solves an edge of the interval for a line: T_high(m) = T* or
 * T_low(m) = T* (bracketed root over masses up to the most effective one,
 * where T(m) is monotonic). The interval is the pack's own; a Monte Carlo
 * interval is replaced by bounds for these solves, which the message says.
 *
 * @param fill - solids (formula, grams: only their proportions matter), water (g), start (°C), container (J/K)
 * @param targetC - the final temperature to design for, °C
 * @param packOptions - as for {@link packFinalTemperature}
 * @param dataset - the tables (default: built-in)
 * @returns masses in g of solid, temperatures in °C
 * @see the burn threshold: ISO 13732-1:2006 (long contact, from memory), `iso13732`; the pack model and its interval:
 *   docs/methods.md, "Pack design".
 *
 * @example
 * ```ts
 * const m = packDesignMargin({ solids: [{ formula: 'CaCl2', massG: 1 }], waterG: 100, startC: 20 }, 40);
 * m.kind; // 'hot'
 * m.design.saltMassG; // ≈ 11.62 g of CaCl2 in 100 g of water
 * m.massInterval.low < m.design.saltMassG; // true
 * m.threshold.largestSafeMassG > m.design.saltMassG; // true
 * ```
 */
export function packDesignMargin(fill: PackFill, targetC: number, packOptions: PackOptions = {}, dataset: Dataset = builtinDataset()): PackDesignMargin {
  numberArgument(targetC, 'targetC', 'the target temperature in °C', { min: -50, max: 150 });
  const curve = packRatioCurve(fill, { targetC, points: 2, band: false }, packOptions, dataset);
  const { base } = curve;
  const startC = base.startC;
  const monteCarlo = packOptions.interval?.method === 'monte-carlo';
  const options: PackOptions = monteCarlo ? { ...packOptions, interval: { method: 'bounds' } } : packOptions;
  const extremeMass = curve.largestChange.saltMass;
  const kind: 'hot' | 'cold' = curve.largestChange.temperature >= startC ? 'hot' : 'cold';
  const line = kind === 'hot' ? CONTACT_BURN_THRESHOLD_C : FROSTBITE_THRESHOLD_C;

  const band = (massG: number): TemperatureBand => {
    if (massG <= 0) return { value: startC, low: startC, high: startC };
    const solids = base.solids.map((s) => ({ formula: s.formula, massG: massG * s.share }));
    const t = packFinalTemperature({ solids, waterG: base.waterG, startC, containerJPerK: base.containerJPerK }, options, dataset).finalTemperature;
    return { value: t.value, low: t.low, high: t.high };
  };
  // The far edge (toward the line) and the near edge of the interval, signed so that "more salt" means "more change".
  const farEdge = (b: TemperatureBand) => (kind === 'hot' ? b.high : b.low);
  const nearEdge = (b: TemperatureBand) => (kind === 'hot' ? b.low : b.high);
  const past = (t: number, level: number) => (kind === 'hot' ? t - level : level - t);
  /** The smallest mass in [0, extremeMass] at which edge(m) reaches `level`, or null when none does. */
  const massWhere = (edge: (b: TemperatureBand) => number, level: number): number | null => {
    if (past(edge(band(0)), level) >= 0) return 0;
    if (extremeMass <= 0 || past(edge(band(extremeMass)), level) < 0) return null;
    return bracketedRoot((m) => past(edge(band(m)), level), 0, extremeMass, MASS_TOLERANCE_G).x;
  };

  const unsafeFrom = massWhere(farEdge, line);
  const threshold = { kind: kind === 'hot' ? ('contact-burn' as const) : ('frostbite' as const), temperatureC: line, largestSafeMassG: unsafeFrom };
  const lineText = kind === 'hot' ? `the ${line} °C contact-burn threshold` : `${line} °C, where a cold fill can freeze skin`;
  const safeText = unsafeFrom === null ? `every mass up to the most effective (${g2(extremeMass)} g) keeps its 95 % interval clear of ${lineText}` : `at most ${g2(unsafeFrom)} g keeps the 95 % interval clear of ${lineText}`;
  const bandNote = monteCarlo ? ' (margins found with the bounds interval)' : '';

  const target = curve.target!;
  if (!target.reachable || !target.design) {
    return { targetC, kind, reachable: false, design: null, massInterval: null, threshold, caution: null, message: `${target.message}; ${safeText}${bandNote}` };
  }
  const mass = target.design.saltMass;
  const at = band(mass);
  const low = massWhere(farEdge, targetC) ?? mass;
  const high = massWhere(nearEdge, targetC);
  const crosses = past(farEdge(at), line) > 0;
  const marginText = crosses
    ? kind === 'hot'
      ? `Contact-burn margin: the design's 95 % interval reaches ${g2(at.high)} °C, above the ${line} °C long-contact burn threshold (ISO 13732-1, from memory); ${unsafeFrom === null ? 'no mass avoids it' : `at most ${g2(unsafeFrom)} g of solid keeps the interval below it`}. Design for a lower target or keep an insulating sleeve and short contact.`
      : `Frostbite margin: the design's 95 % interval reaches down to ${g2(at.low)} °C, at or below ${line} °C where skin can freeze on contact (common practice); ${unsafeFrom === null ? 'no mass avoids it' : `at most ${g2(unsafeFrom)} g of solid keeps the interval above it`}. Keep a cloth between pack and skin.`
    : null;
  const margin = marginText === null ? null : caution('design-margin', 'warning', marginText);
  const message = `${g2(mass)} g of solid (95 % interval ${g2(low)} to ${high === null ? 'beyond the most effective mass' : `${g2(high)} g`}) reaches ${targetC} °C (final ${g2(at.value)} °C, 95 % interval ${g2(at.low)} to ${g2(at.high)} °C); ${safeText}${bandNote}`;
  return { targetC, kind, reachable: true, design: { saltMassG: mass, ratio: target.design.ratio, finalTemperature: at }, massInterval: { low, high }, threshold, caution: margin, message };
}
