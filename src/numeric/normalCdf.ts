/**
 * The standard normal cumulative distribution, for the probability that an
 * estimate is positive.
 *
 * @module
 */

/**
 * The standard normal cumulative distribution Φ(x), by the complementary
 * error function (W. J. Cody's rational approximations are overkill here; the
 * Abramowitz–Stegun 7.1.26 form has |error| < 1.5e−7, enough for a probability
 * reported to three digits).
 *
 * @param x - the standard score z = (value − mean)/σ, dimensionless
 * @see Abramowitz, M.; Stegun, I. A. Handbook of Mathematical Functions (1964), eq. 7.1.26.
 * @example
 * ```ts
 * normalCdf(0); // 0.5
 * normalCdf(1.959963984540054); // ≈ 0.975
 * ```
 */
export function normalCdf(x: number): number {
  const z = Math.abs(x) / Math.SQRT2;
  const t = 1 / (1 + 0.3275911 * z);
  const poly = t * (0.254829592 + t * (-0.284496736 + t * (1.421413741 + t * (-1.453152027 + t * 1.061405429))));
  const erfc = poly * Math.exp(-z * z);
  return x >= 0 ? 1 - erfc / 2 : erfc / 2;
}
