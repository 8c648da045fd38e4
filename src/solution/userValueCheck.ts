/**
 * A user's own measured value, checked against what the other bases say: a
 * value far outside their combined uncertainty is more often a slip (a unit,
 * a sign, the hydrate for the anhydrous salt) than a discovery, so the result
 * says so instead of using it without a word.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import type { Estimate } from '../quantity/estimate.js';

/** The override file a user's estimate came from, or undefined for built-in data. */
export function userSourceOf(estimate: Estimate, dataset: Dataset): string | undefined {
  for (const key of estimate.sources) {
    const file = dataset.userSource(key);
    if (file !== undefined) return file;
  }
  return undefined;
}

/**
 * A note when the most trusted estimate is a user's measured value and the
 * most trusted estimate of another basis differs from it by more than
 * 1.96·√(u_user² + u_other²); undefined otherwise.
 *
 * @param estimates - the estimates of one salt, most trusted first
 * @param dataset - where the user's sources are recorded
 */
export function userValueDisagreement(estimates: readonly Estimate[], dataset: Dataset): string | undefined {
  const mine = estimates[0];
  if (!mine || mine.basis !== 'measured') return undefined;
  const file = userSourceOf(mine, dataset);
  return file === undefined ? undefined : measuredValueDisagreement(mine, estimates, file);
}

/**
 * The note of {@link userValueDisagreement} for a user's measured value `mine` that came from `origin` (a file, or
 * the screening input), against the most trusted estimate of another basis among `estimates`.
 */
export function measuredValueDisagreement(mine: Estimate, estimates: readonly Estimate[], origin: string): string | undefined {
  const file = origin;
  const other = estimates.find((e) => e.basis !== 'measured');
  if (!other) return undefined;
  const combined = Math.hypot(mine.u, other.u);
  const gap = Math.abs(mine.value - other.value);
  if (!(gap > COVERAGE_95 * combined)) return undefined;
  const f = (x: number) => Number(x.toPrecision(4));
  return `your value ${f(mine.value)} ± ${f(mine.u)} ${mine.unit} (${file}) disagrees with the ${other.basis} estimate ${f(other.value)} ± ${f(other.u)} ${other.unit} by ${f(gap)}, ${f(gap / combined)} times their combined standard uncertainty: check its unit, its sign and that it is for this salt (anhydrous or the hydrate)`;
}
