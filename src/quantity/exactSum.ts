import Decimal from 'decimal.js';

/** One term ν·x of a sum of tabulated values. */
export interface Term {
  /** Stoichiometric coefficient ν (may be negative or fractional). */
  coefficient: number;
  /** Tabulated value x. */
  value: number;
}

/**
 * Σνᵢ·xᵢ computed exactly in decimal arithmetic, then returned as a float.
 *
 * Tabulated values are decimal numbers (−411.153 kJ/mol); adding them in
 * binary floating point leaves digits such as …0000001 that then show up in
 * reports and break byte-identical output. Each number is read through its
 * shortest decimal form, so the sum is the one a person would get by hand.
 *
 * @param terms - coefficients and tabulated values, any unit (the result has the same unit)
 * @returns the exact sum, rounded once to the nearest float
 * @example
 * ```ts
 * // ΔsolH(NaCl) = ΔfH(Na⁺, aq) + ΔfH(Cl⁻, aq) − ΔfH(NaCl, cr), NBS 1982 values, kJ/mol
 * const terms = [{ coefficient: 1, value: -240.12 }, { coefficient: 1, value: -167.159 }, { coefficient: -1, value: -411.153 }];
 * exactSum(terms); // 3.874
 * ```
 */
export function exactSum(terms: readonly Term[]): number {
  let total = new Decimal(0);
  for (const { coefficient, value } of terms) total = total.plus(new Decimal(value).times(coefficient));
  return total.toNumber();
}
