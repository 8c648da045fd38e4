/**
 * A non-electrolyte solute (urea) in water: the osmotic coefficient and the
 * relative apparent molar enthalpy as power series in the molality m, with
 * the temperature dependence of the osmotic series that its φL implies.
 * Bare kernels: numbers in, number out, nothing allocated.
 *
 * With the excess Gibbs energy per kg of water Gᴱ/RT = Σ cᵢ·m^(i+1), the
 * osmotic coefficient is φ − 1 = Σ aᵢ·mⁱ with aᵢ = i·cᵢ, and the excess
 * enthalpy gives φL = −RT²·Σ (dcᵢ/dT)·mⁱ = Σ hᵢ·mⁱ. With hᵢ independent of T
 * (φJ = 0 for this model):
 *
 *   aᵢ(T) = aᵢ(T_ref) + (i·hᵢ/R)·(1/T − 1/T_ref)
 *
 * @see docs/methods.md, "Brines" (non-electrolytes); data/brine-pitzer.json `nonElectrolytes`.
 * @module
 */
import { GAS_CONSTANT } from './debyeHuckelSlopes.js';

/** A non-electrolyte's series, resolved. */
export interface NonElectrolyteParameters {
  /** a₁…aₙ of φ − 1 = Σ aᵢ·mⁱ at `referenceK`. */
  osmotic: Float64Array;
  /** h₁…hₖ of φL = Σ hᵢ·mⁱ, J/mol. */
  enthalpy: Float64Array;
  referenceK: number;
}

/**
 * Σ cᵢ·mⁱ (i from 1) of a coefficient list: φ − 1 or φL of a non-electrolyte at m (mol/kg).
 *
 * @example
 * ```ts
 * powerSeries([-360, 12], 5); // -1500
 * ```
 */
export function powerSeries(c: ArrayLike<number>, m: number): number {
  let sum = 0;
  let power = m;
  for (let i = 0; i < c.length; i++) {
    sum += c[i]! * power;
    power *= m;
  }
  return sum;
}

/**
 * The osmotic series at tK (K) written into `out` (up to five aᵢ(T), kg^i/mol^i, the rest zero),
 * aᵢ(T) = aᵢ(T_ref) + (i·hᵢ/R)·(1/T − 1/T_ref), R in J/(mol·K), hᵢ in J·kg^i/mol^(i+1).
 *
 * @example
 * ```ts
 * const out = new Float64Array(5);
 * nonElectrolyteOsmoticTerms({ osmotic: new Float64Array([-0.03]), enthalpy: new Float64Array([-360]), referenceK: 273.15 }, 298.15, out);
 * out[0]; // ≈ -0.01671 (−0.03 + (−360/8.314)·(1/298.15 − 1/273.15))
 * ```
 */
export function nonElectrolyteOsmoticTerms(p: NonElectrolyteParameters, tK: number, out: Float64Array): void {
  const shift = (1 / tK - 1 / p.referenceK) / GAS_CONSTANT;
  for (let i = 0; i < out.length; i++) out[i] = (p.osmotic[i] ?? 0) + (i + 1) * (p.enthalpy[i] ?? 0) * shift;
}

/**
 * φ = 1 + Σ aᵢ(T)·mⁱ at m (mol/kg) from the terms {@link nonElectrolyteOsmoticTerms} wrote.
 *
 * @example
 * ```ts
 * nonElectrolyteOsmoticWith(2, new Float64Array([-0.03, 0.003, 0, 0, 0])); // 0.952 (1 − 0.06 + 0.012)
 * ```
 */
export function nonElectrolyteOsmoticWith(m: number, terms: Float64Array): number {
  return m <= 0 ? 1 : 1 + powerSeries(terms, m);
}

/**
 * The osmotic coefficient of a non-electrolyte's solution at m (mol/kg) and
 * T (K): φ = 1 + Σ aᵢ(T)·mⁱ.
 *
 * @example
 * ```ts
 * const urea = { osmotic: new Float64Array([-0.029373, 0.0031437, -0.00018236]), enthalpy: new Float64Array([-360, 12]), referenceK: 273.15 };
 * nonElectrolyteOsmotic(urea, 4, 273.15); // ≈ 0.921 (fitted to the CRC freezing points)
 * ```
 */
export function nonElectrolyteOsmotic(p: NonElectrolyteParameters, m: number, tK: number): number {
  const terms = new Float64Array(5);
  nonElectrolyteOsmoticTerms(p, tK, terms);
  return nonElectrolyteOsmoticWith(m, terms);
}

/**
 * φL of a non-electrolyte, J/mol, at m (mol/kg): Σ hᵢ·mⁱ (independent of T).
 *
 * @example
 * ```ts
 * const urea = { osmotic: new Float64Array([-0.029373]), enthalpy: new Float64Array([-360, 12]), referenceK: 273.15 };
 * nonElectrolyteEnthalpy(urea, 5); // -1500 (−360 × 5 + 12 × 25)
 * ```
 */
export function nonElectrolyteEnthalpy(p: NonElectrolyteParameters, m: number): number {
  return m <= 0 ? 0 : powerSeries(p.enthalpy, m);
}
