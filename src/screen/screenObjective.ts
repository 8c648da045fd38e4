/**
 * What a screen ranks by, and which way is better.
 *
 * @module
 */
import { COVERAGE_95 } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import type { Verdict } from '../solution/verdict.js';
import type { Direction, ObjectiveName, Suitability } from './screenRow.js';

/** The parts of a computed row an objective is read from. */
export interface ObjectiveSource {
  best: Estimate;
  perGram: { salt: Estimate };
  fill?: { finalTemperature: { value: number; low: number; high: number }; dissolved?: readonly { solubilityStatus?: string }[] };
  costPerKJ?: Estimate;
  warmer?: { plateau: Estimate; heatPerGram: Estimate; plateauDuration: Estimate };
}

/** The objectives read from the standard latent-heat warmer rather than from dissolution. */
export const WARMER_OBJECTIVES: ReadonlySet<ObjectiveName> = new Set(['plateau-temperature', 'warmer-heat-per-gram', 'plateau-duration']);

/**
 * The objective of one row as an {@link Estimate}: the enthalpy of solution
 * (kJ/mol), the heat per gram of salt (J/g), the temperature the standard
 * fill reaches (°C; its standard uncertainty is the 95 % half-width over
 * 1.96, the interval kept as the pack model gives it), the cost per kJ, or
 * the standard warmer's plateau temperature (°C), heat per gram of fill (J/g)
 * or plateau duration (s). Undefined when the row lacks what the objective
 * needs (no fill, no price, no warmer data, or a fill of a salt whose
 * solubility is unknown: how far it cools or warms then depends on a number
 * nobody has).
 *
 * @example
 * ```ts
 * screenObjective('heat-per-gram', dissolve('KNO3'))?.unit; // 'J/g'
 * screenObjective('cost-per-kj', dissolve('KNO3')); // undefined (no price was given)
 * ```
 */
export function screenObjective(name: ObjectiveName, row: ObjectiveSource): Estimate | undefined {
  switch (name) {
    case 'enthalpy':
      return row.best;
    case 'heat-per-gram':
      return row.perGram.salt;
    case 'cost-per-kj':
      return row.costPerKJ;
    case 'plateau-temperature':
      return row.warmer?.plateau;
    case 'warmer-heat-per-gram':
      return row.warmer?.heatPerGram;
    case 'plateau-duration':
      return row.warmer?.plateauDuration;
    case 'fill-temperature': {
      const t = row.fill?.finalTemperature;
      if (!t || unknownSolubility(row.fill!) !== undefined) return undefined;
      return makeEstimate({
        quantity: 'temperature the standard fill reaches',
        value: t.value,
        u: Math.max(0, (t.high - t.low) / (2 * COVERAGE_95)),
        low: Math.min(t.low, t.value),
        high: Math.max(t.high, t.value),
        unit: '°C',
        basis: row.best.basis,
        method: 'pack-model',
        sources: row.best.sources,
      });
    }
  }
}

/**
 * The index of the first solid of a fill whose solubility is unknown, or
 * undefined when every solubility is measured or estimated.
 *
 * @example
 * ```ts
 * unknownSolubility({ dissolved: [{ solubilityStatus: 'measured' }, { solubilityStatus: 'unknown' }] }); // 1
 * ```
 */
export function unknownSolubility(fill: { dissolved?: readonly { solubilityStatus?: string }[] }): number | undefined {
  const i = fill.dissolved?.findIndex((d) => d.solubilityStatus === 'unknown') ?? -1;
  return i < 0 ? undefined : i;
}

/**
 * True when a larger objective value is better: a larger (more endothermic)
 * enthalpy or heat per gram for cooling, a more negative one for heating; a
 * lower fill temperature for cooling, a higher one for heating; a lower cost
 * always; a higher plateau, more heat per gram and a longer plateau for a
 * warmer, whatever the direction.
 *
 * @example
 * ```ts
 * higherIsBetter('enthalpy', 'cool'); // true
 * higherIsBetter('fill-temperature', 'cool'); // false
 * ```
 */
export function higherIsBetter(name: ObjectiveName, direction: Direction): boolean {
  if (name === 'cost-per-kj') return false;
  if (WARMER_OBJECTIVES.has(name)) return true;
  if (name === 'fill-temperature') return direction === 'heat';
  return direction === 'cool';
}

/**
 * Whether a salt works in the chosen direction: `suitable` when its verdict
 * is the wanted one (endothermic to cool, exothermic to heat), `unsuitable`
 * when it is the opposite, `undetermined` when the 95 % interval of the
 * enthalpy of solution spans zero.
 *
 * @example
 * ```ts
 * suitabilityOf('endothermic', 'cool'); // 'suitable'
 * suitabilityOf('endothermic', 'heat'); // 'unsuitable'
 * ```
 */
export function suitabilityOf(verdict: Verdict, direction: Direction): Suitability {
  if (verdict === 'undetermined') return 'undetermined';
  return (verdict === 'endothermic') === (direction === 'cool') ? 'suitable' : 'unsuitable';
}
