/**
 * The data range an axis should show: the values that matter, not the
 * widest thing in the data. A few wild values (a model estimate of an
 * exotic salt, an interval hundreds of kJ/mol wide) would otherwise squeeze
 * every useful candidate into a few pixels; they are clipped at the axis
 * and the chart marks them.
 *
 * @module
 */
import { quantile } from '../numeric/quantile.js';

/**
 * The range [lo, hi] an axis shows: every value within Tukey's far fences
 * (3 interquartile ranges beyond the quartiles) of `values`, every number
 * of `always` (zero, a threshold, a target), and each interval end of
 * `ends` that lies within a quarter of that span beyond it. Values and
 * ends outside are to be drawn clipped, with a mark.
 *
 * @see Tukey, J. W. Exploratory Data Analysis, Addison-Wesley (1977): the fences (common practice).
 */
export function focusRange(values: readonly number[], ends: readonly number[], always: readonly number[]): [number, number] {
  const sorted = [...values].sort((a, b) => a - b);
  let core = sorted;
  if (sorted.length >= 4) {
    const q1 = quantile(sorted, 0.25);
    const q3 = quantile(sorted, 0.75);
    const spread = Math.max(q3 - q1, 1e-9 + 0.05 * Math.max(Math.abs(q1), Math.abs(q3)));
    core = sorted.filter((v) => v >= q1 - 3 * spread && v <= q3 + 3 * spread);
  }
  const base = [...core, ...always];
  let lo = Math.min(...base);
  let hi = Math.max(...base);
  const reach = 0.25 * Math.max(hi - lo, 1e-9);
  for (const e of ends) {
    if (e < lo && e >= lo - reach) lo = e;
    if (e > hi && e <= hi + reach) hi = e;
  }
  return [lo, hi];
}
