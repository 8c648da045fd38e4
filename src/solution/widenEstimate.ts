import { COVERAGE_95 } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';

/**
 * An estimate moved by `shift` and with an independent standard uncertainty
 * `extra` added: u′ = √(u² + extra²), and each side of the 95 % interval
 * grows as d′ = √(d² + (1.96·extra)²), where d is that side's distance from
 * the value. Intervals a method built itself (Student-t, asymmetric) keep
 * their own width and gain the new part in quadrature, so a wider input
 * never gives a narrower result.
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
 * widenEstimate(e, 4).high; // 19.80 (10 + 1.96·5)
 * ```
 */
export function widenEstimate(e: Estimate, extra: number, shift = 0, notes: readonly string[] = []): Estimate {
  const add = COVERAGE_95 * extra;
  const below = Math.hypot(e.value - e.low, add);
  const above = Math.hypot(e.high - e.value, add);
  const value = e.value + shift;
  return makeEstimate({ ...e, value, u: Math.hypot(e.u, extra), low: value - below, high: value + above, notes: [...e.notes, ...notes] });
}
