import { COVERAGE_95 } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';

/**
 * An estimate moved by `shift` and with an independent standard uncertainty
 * `extra` added in quadrature: u′ = √(u² + extra²). Each end of the 95 %
 * interval moves out by k·(u′ − u), where k is the estimate's own
 * half-width over u (1.96 for a normal interval), so intervals a method
 * built itself keep their shape. A wider input never gives a narrower result.
 *
 * @param e - the estimate
 * @param extra - standard uncertainty to add, same unit, ≥ 0
 * @param shift - amount to add to the value and both ends, same unit
 * @param notes - notes to append
 * @example
 * ```ts
 * const e = makeEstimate({ quantity: 'q', value: 10, u: 3, unit: 'kJ/mol', basis: 'model', method: 'm' });
 * widenEstimate(e, 4).u; // 5
 * widenEstimate(e, 4, 1).value; // 11
 * ```
 */
export function widenEstimate(e: Estimate, extra: number, shift = 0, notes: readonly string[] = []): Estimate {
  const u = Math.hypot(e.u, extra);
  const k = e.u > 0 ? (e.high - e.low) / (2 * e.u) : COVERAGE_95;
  const grow = k * (u - e.u);
  return makeEstimate({ ...e, value: e.value + shift, u, low: e.low + shift - grow, high: e.high + shift + grow, notes: [...e.notes, ...notes] });
}
