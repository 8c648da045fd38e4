/**
 * The solubility's own uncertainty in the interval of a fill's final
 * temperature: a salt whose solubility is unknown may dissolve anywhere
 * from none to all of it, and an estimated solubility anywhere in its 95 %
 * range. The fill is solved again at those ends and the interval widened to
 * take both in. Likewise the conversion of undissolved solid that barely
 * dissolves, left out of the central value, is counted at one end.
 *
 * @module
 */
import type { Salt } from '../chem/salt.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import type { PreparedFill } from './packFill.js';
import type { PackSolubility } from './saltSolubility.js';
import { constantSolubilityCurve, type SolubilityCurve } from './solubilityCurve.js';
import { solveFillTemperature, type FillSolution } from './solveFillTemperature.js';
import type { TemperatureInterval } from './finalTemperatureInterval.js';

/** The curves at the two ends of a solid's solubility range (undefined = no limit: it all dissolves). @internal */
export interface SolubilityBounds {
  lower: SolubilityCurve;
  upper: SolubilityCurve | undefined;
  /** What the range is, in words, for the interval's description. */
  label: string;
}

/** The ends of a salt's solubility range, or undefined for a measured one (its 2 % enters the interval as an uncertain input, finalTemperatureInterval.ts). @internal */
export function solubilityBoundsOf(salt: Salt, solubility: PackSolubility): SolubilityBounds | undefined {
  if (solubility.status === 'measured') return undefined;
  if (solubility.status === 'unknown') {
    return { lower: constantSolubilityCurve(salt.anhydrous, 0, salt.formula, salt.water, 'none', false), upper: undefined, label: `the unknown solubility of ${salt.anhydrous} (from none to all of it dissolved)` };
  }
  const p = solubility.product!;
  return {
    lower: constantSolubilityCurve(salt.anhydrous, p.low, p.solidPhase, p.solidWater, p.source, p.fromMemory),
    upper: constantSolubilityCurve(salt.anhydrous, p.high, p.solidPhase, p.solidWater, p.source, p.fromMemory),
    label: `the estimated solubility of ${salt.anhydrous} (${p.low.toPrecision(2)}–${p.high.toPrecision(2)} g per 100 g water)`,
  };
}

/** The note a fill carries for a solid whose solubility is not measured. @internal */
export function solubilityNote(salt: Salt, solubility: PackSolubility): string | undefined {
  if (solubility.status === 'unknown') {
    return `no solubility data for ${salt.formula} (${solubility.note}): the final temperature is the one reached if it all dissolves, and its 95 % interval reaches to the one with none dissolved; give a measured solubility to narrow it`;
  }
  if (solubility.status === 'estimated') return `solubility of ${salt.formula} ${solubility.note}`;
  return undefined;
}

function withCurves(fill: PreparedFill, end: 'lower' | 'upper'): PreparedFill {
  return { ...fill, solids: fill.solids.map((s) => (s.solubilityBounds ? { ...s, curve: s.solubilityBounds[end] } : s)) };
}

/**
 * The interval widened to take in the fill solved with every open
 * solubility at the low end of its range, and at the high end (for an
 * unknown one: none and all of it dissolved), and the fill solved with the
 * slow conversion of undissolved solid that barely dissolves counted in full
 * (left out of the central value, see `convertsWithinPack`). Unchanged
 * when every solid's solubility is measured and no conversion was left out.
 * @internal
 */
export function withSolubilityBounds(fill: PreparedFill, solution: FillSolution, interval: TemperatureInterval): TemperatureInterval {
  const open = fill.solids.filter((s) => s.solubilityBounds !== undefined);
  const slow = fill.solids.filter((_, i) => solution.state.solids[i]!.slowConversion);
  if (open.length === 0 && slow.length === 0) return interval;
  const ends: FillSolution[] = [];
  if (open.length > 0) {
    ends.push(solveFillTemperature(withCurves(fill, 'lower')));
    // An unknown solubility's upper end is the fill as solved (all of it dissolved): no need to solve it again.
    if (open.some((s) => s.solubilityBounds!.upper !== undefined)) ends.push(solveFillTemperature(withCurves(fill, 'upper')));
  }
  if (slow.length > 0) ends.push(solveFillTemperature(fill, { slowConversion: true }));
  const temperatures = ends.map((e) => e.temperature);
  const low = Math.min(interval.low, solution.temperature, ...temperatures);
  const high = Math.max(interval.high, solution.temperature, ...temperatures);
  const widened = low < interval.low || high > interval.high;
  const labels = [
    ...open.map((s) => `both ends of ${s.solubilityBounds!.label}`),
    ...slow.map((s) => {
      const e = solution.state.solids[fill.solids.indexOf(s)]!;
      return `the slow conversion of undissolved ${s.salt.formula} into ${e.solubility!.phase} counted in full`;
    }),
  ].join('; ');
  return {
    ...interval,
    low,
    high,
    u: Math.max(interval.u, (high - low) / (2 * COVERAGE_95)),
    description: `${interval.description}; ${widened ? 'widened to take in' : 'checked against'} the fill solved with ${labels}`,
  };
}
