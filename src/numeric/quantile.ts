/**
 * Quantiles of sorted samples, linear between order statistics: the one
 * definition used by calibrations, Monte Carlo intervals and chart ranges.
 *
 * @module
 */

/**
 * The p-quantile of ascending `sorted` values: at position h = (n − 1)·p,
 * x₍⌊h⌋₎ + (h − ⌊h⌋)·(x₍⌊h⌋+1₎ − x₍⌊h⌋₎) (Hyndman and Fan's type 7, the
 * default of R and NumPy). An element may be left out without copying the
 * list (`skip`, its index; −1 for none). Zero for an empty list.
 *
 * @param sorted - values in ascending order (an array or a typed array)
 * @param p - the probability, 0–1
 * @param skip - index of an element to leave out, or −1
 * @returns the quantile, in the unit of the values
 * @see Hyndman, R. J.; Fan, Y. Sample quantiles in statistical packages. Am. Stat. 50, 361–365 (1996).
 * @example
 * ```ts
 * quantile([1, 2, 3, 4], 0.5); // 2.5
 * quantile([1, 2, 3, 4], 0.5, 3); // 2
 * ```
 */
export function quantile(sorted: ArrayLike<number>, p: number, skip = -1): number {
  const n = sorted.length - (skip >= 0 ? 1 : 0);
  if (n <= 0) return 0;
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(n - 1, lo + 1);
  const a = sorted[skip >= 0 && lo >= skip ? lo + 1 : lo]!;
  const b = sorted[skip >= 0 && hi >= skip ? hi + 1 : hi]!;
  return a + (h - lo) * (b - a);
}
