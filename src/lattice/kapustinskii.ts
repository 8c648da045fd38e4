/**
 * The Kapustinskii equation, 1956 form.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';

/**
 * Kapustinskii's constant K = 1.2025 × 10⁻⁴ J·m/mol, written in
 * kJ·mol⁻¹·Å (1.2025e−4 J·m = 1202.5 kJ·Å).
 *
 * @see Kapustinskii, A. F. Q. Rev. Chem. Soc. 10, 283 (1956).
 */
export const KAPUSTINSKII_CONSTANT = 1202.5;
/** The repulsion range ρ = 0.345 Å of the same equation (Kapustinskii 1956). */
export const KAPUSTINSKII_RHO = 0.345;

/**
 * The lattice energy of an ionic crystal by Kapustinskii's equation:
 *
 *   U = K · ν|z₊z₋| / d · (1 − ρ/d),  K = 1202.5 kJ·Å/mol, ρ = 0.345 Å
 *
 * with ν ions per formula unit, z₊ and z₋ the charge numbers and d = r₊ + r₋
 * the cation–anion distance. For a salt of several kinds of ion the charge
 * factor ν|z₊z₋| is replaced by Σnᵢzᵢ² (twice the ionic strength of the
 * formula unit, which equals ν|z₊z₋| for a binary salt) and d by a mean
 * cation–anion distance, after Glasser's generalisation (Inorg. Chem. 34,
 * 4935, 1995).
 *
 * This is a lattice *energy* U (static lattice), positive for crystal →
 * gaseous ions; `latticeEnthalpyCorrection` turns it into the lattice
 * enthalpy at 298.15 K.
 *
 * @param chargeFactor - ν|z₊z₋| = Σnᵢzᵢ² (dimensionless; 2 for NaCl, 6 for CaF₂)
 * @param distance - cation–anion distance d, Å
 * @returns U in kJ/mol
 * @see Kapustinskii, A. F. Lattice energy of ionic crystals. Q. Rev. Chem. Soc. 10, 283–294 (1956).
 * @example
 * ```ts
 * // NaCl with Shannon radii at CN 6: d = 1.02 + 1.81 = 2.83 Å
 * kapustinskii(2, 2.83); // 746.2 kJ/mol
 * ```
 */
export function kapustinskii(chargeFactor: number, distance: number): number {
  numberArgument(chargeFactor, 'chargeFactor', 'the charge factor ν·|z₊·z₋|', { min: 0, above: true, max: 10_000 });
  numberArgument(distance, 'distance', 'the cation–anion distance in Å', { min: 0.01, max: 1000 });
  return ((KAPUSTINSKII_CONSTANT * chargeFactor) / distance) * (1 - KAPUSTINSKII_RHO / distance);
}
