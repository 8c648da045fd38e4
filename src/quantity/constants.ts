/**
 * Constants of nature, in one place. Values are the CODATA 2018 recommended
 * values (exact where the 2019 SI fixes them).
 *
 * @see Tiesinga, E.; Mohr, P. J.; Newell, D. B.; Taylor, B. N. CODATA recommended
 * values of the fundamental physical constants: 2018. Rev. Mod. Phys. 93, 025010 (2021).
 * @module
 */

/** Molar gas constant R, J/(mol·K) (exact: N_A·k). */
export const GAS_CONSTANT = 8.314462618;
/** Avogadro constant N_A, 1/mol (exact). */
export const AVOGADRO = 6.02214076e23;
/** Elementary charge e, C (exact). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** Vacuum electric permittivity ε₀, F/m. */
export const VACUUM_PERMITTIVITY = 8.8541878128e-12;
/** Standard temperature of the tables, K. */
export const STANDARD_TEMPERATURE = 298.15;
/** 0 °C in kelvin. */
export const ZERO_CELSIUS = 273.15;
/**
 * e²N_A/(4πε₀) in kJ·mol⁻¹·Å: the Coulomb energy of one mole of unit-charge
 * pairs at 1 Å. About 1389.35 kJ·mol⁻¹·Å.
 */
export const COULOMB_KJ_ANGSTROM =
  (ELEMENTARY_CHARGE ** 2 * AVOGADRO) / (4 * Math.PI * VACUUM_PERMITTIVITY) / 1e-10 / 1000;
/** RT at 298.15 K, kJ/mol. */
export const RT_STANDARD = (GAS_CONSTANT * STANDARD_TEMPERATURE) / 1000;
/**
 * Two-sided 95 % coverage factor of the normal distribution. Intervals called
 * "95 %" in ionheat are value ± 1.96·u (GUM, JCGM 100:2008, §G.3; k ≈ 2).
 */
export const COVERAGE_95 = 1.959963984540054;
