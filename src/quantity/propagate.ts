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
  // The same Math.hypot as quadrature, without building an argument list for the usual two or three terms.
  if (terms.length === 2) return Math.hypot(terms[0]!.coefficient * terms[0]!.u, terms[1]!.coefficient * terms[1]!.u);
  if (terms.length === 3) return Math.hypot(terms[0]!.coefficient * terms[0]!.u, terms[1]!.coefficient * terms[1]!.u, terms[2]!.coefficient * terms[2]!.u);
  return quadrature(...terms.map((t) => t.coefficient * t.u));
}
