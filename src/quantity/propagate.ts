/**
 * Combined standard uncertainty of independent contributions, √(Σuᵢ²)
 * (GUM, JCGM 100:2008, eq. 10 with unit sensitivity coefficients).
 *
 * @param us - standard uncertainties, same unit
 * @returns their root sum of squares
 * @example
 * ```ts
 * quadrature(3, 4); // 5
 * ```
 */
export function quadrature(...us: readonly number[]): number {
  // hypot avoids overflow and underflow of the squares.
  return Math.hypot(...us);
}

/**
 * Standard uncertainty of Σνᵢxᵢ for independent xᵢ: √(Σ(νᵢuᵢ)²).
 *
 * @example
 * ```ts
 * linearUncertainty([{ coefficient: 2, u: 0.5 }, { coefficient: -1, u: 1 }]); // 1.4142 (√2)
 * ```
 */
export function linearUncertainty(terms: readonly { coefficient: number; u: number }[]): number {
  return quadrature(...terms.map((t) => t.coefficient * t.u));
}
