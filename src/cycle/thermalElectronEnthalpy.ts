/**
 * The one place where ionheat turns 0 K ionization energies and electron
 * affinities into 298.15 K enthalpies.
 *
 * @module
 */
import { numberArgument } from '../quantity/argumentChecks.js';
import { GAS_CONSTANT, STANDARD_TEMPERATURE } from '../quantity/constants.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/**
 * The enthalpy that the electrons carry when an ion of signed charge z is
 * made from its atom at temperature T, on the electron convention of the
 * NBS and JANAF tables (the electron an ideal gas, H(T) − H(0) = 5/2·RT, and
 * ΔfH°(e⁻, g) = 0):
 *
 *   ΔH(M → M^z+ + z e⁻, T) = ΣIE(0 K) + z·(5/2)RT
 *   ΔH(X + |z| e⁻ → X^z−, T) = −ΣEA(0 K) + z·(5/2)RT   (z < 0)
 *
 * i.e. +6.197 kJ/mol per electron removed and −6.197 per electron added at
 * 298.15 K (the thermal enthalpies of atom and ion cancel). The tables of
 * ionization energies and electron affinities hold 0 K energies, and
 * ion-formation-gas.json holds electron-convention enthalpies, so every
 * cycle step from atom to ion adds this term once. Over a neutral formula
 * unit the terms cancel (Σz = 0) when every ion is built from its atom.
 *
 * @param charge - signed charge number z of the ion made
 * @param temperature - T, K (default 298.15)
 * @returns kJ/mol
 * @see Wagman et al. 1982 (the NBS tables), the electron convention; ion-formation-gas.json `conventions`.
 * @example
 * ```ts
 * thermalElectronEnthalpy(1); // 6.197 kJ/mol (Na → Na⁺)
 * thermalElectronEnthalpy(-2); // -12.395 kJ/mol (O → O²⁻)
 * ```
 */
export function thermalElectronEnthalpy(charge: number, temperature: number = STANDARD_TEMPERATURE): number {
  charge = numberArgument(charge, 'charge', 'the charge of the ion', { min: -12, max: 12, integer: true });
  numberArgument(temperature, 'temperature', 'the temperature in K', { min: 0, above: true, max: 100_000 });
  if (charge === 0) return 0;
  const h = (charge * 2.5 * GAS_CONSTANT * temperature) / 1000;
  return unsignedZero(h); // a denormal temperature can underflow to −0
}
