/**
 * Quantiles of Student's t distribution, for prediction intervals from a
 * small calibration set.
 *
 * @module
 */
import { COVERAGE_95 } from '../quantity/constants.js';

/**
 * The two-sided 95 % quantile t₀.₉₇₅ of Student's t distribution with ν
 * degrees of freedom: exact for ν = 1 and 2, else the Cornish–Fisher
 * expansion in 1/ν about the normal quantile (error 0.004 at ν = 3, below 10⁻³ for ν ≥ 4,
 * below 10⁻⁵ for ν ≥ 10); the normal 1.96 as ν → ∞.
 *
 * @param df - degrees of freedom ν ≥ 1 (need not be whole)
 * @returns t such that P(|T| ≤ t) = 0.95
 * @see Abramowitz, M.; Stegun, I. A. Handbook of Mathematical Functions (1964), eq. 26.7.5.
 * @example
 * ```ts
 * studentQuantile975(10); // 2.228
 * studentQuantile975(1); // 12.706
 * ```
 */
export function studentQuantile975(df: number): number {
  if (!(df >= 1)) return Number.POSITIVE_INFINITY;
  if (df === 1) return Math.tan(Math.PI * 0.475);
  if (df === 2) return 0.95 / Math.sqrt(2 * 0.975 * 0.025);
  const x = COVERAGE_95;
  const x2 = x * x;
  const g1 = (x * (x2 + 1)) / 4;
  const g2 = (x * ((5 * x2 + 16) * x2 + 3)) / 96;
  const g3 = (x * (((3 * x2 + 19) * x2 + 17) * x2 - 15)) / 384;
  const g4 = (x * ((((79 * x2 + 776) * x2 + 1482) * x2 - 1920) * x2 - 945)) / 92160;
  return x + g1 / df + g2 / df ** 2 + g3 / df ** 3 + g4 / df ** 4;
}
