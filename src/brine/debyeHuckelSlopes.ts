/**
 * The Debye–Hückel slopes of water on the osmotic-coefficient scale: Aφ(T)
 * and its temperature derivatives, the enthalpy slope A_H = 4RT²·dAφ/dT and
 * the heat-capacity slope A_J = dA_H/dT.
 *
 * Aφ(T) is a cubic in x = (T − 298.15 K)/100 K fitted (to 5e-5) to the
 * function of Møller (1988) over 0–100 °C; below 0 °C the cubic is
 * extrapolated (brines down to about −50 °C), which the brine module's
 * allowances cover. At 25 °C it gives Aφ = 0.3915 kg^½/mol^½ and
 * A_H/RT = 0.802 kg^½/mol^½ (Pitzer 1991 tabulates 0.3915 and 0.8018),
 * i.e. A_H = 1.988 kJ·kg^½/mol^{3/2}, and A_J/R = 3.9 kg^½/mol^½.
 *
 * Conventions: A_H is Pitzer's, entering φL = ν|z₊z₋|·(A_H/2b)·ln(1 + b√I) − …, so that
 * for a 1:1 salt φL → A_H·√m at high dilution. Values quoted as A_H/RT are
 * converted to this form here and nowhere else.
 *
 * @module
 */

/** Gas constant, J/(mol·K) (CODATA 2018, exact). */
export const GAS_CONSTANT = 8.314462618;
/** Reference temperature of the parameters, K. */
export const REFERENCE_K = 298.15;
/** 0 °C in K. */
export const ZERO_CELSIUS_K = 273.15;

const C0 = 0.39148145;
const C1 = 0.067252151;
const C2 = 0.032060891;
const C3 = 0.0012898409;

/** Aφ(T), kg^½/mol^½. @param tK - temperature, K */
export function debyeHuckelOsmotic(tK: number): number {
  const x = (tK - REFERENCE_K) / 100;
  return C0 + x * (C1 + x * (C2 + x * C3));
}

/** dAφ/dT, kg^½/(mol^½·K). */
function slope1(tK: number): number {
  const x = (tK - REFERENCE_K) / 100;
  return (C1 + x * (2 * C2 + 3 * C3 * x)) / 100;
}

/** d²Aφ/dT², kg^½/(mol^½·K²). */
function slope2(tK: number): number {
  const x = (tK - REFERENCE_K) / 100;
  return (2 * C2 + 6 * C3 * x) / 1e4;
}

/** A_H = 4RT²·dAφ/dT, J·kg^½/mol^{3/2}. @param tK - temperature, K */
export function debyeHuckelEnthalpy(tK: number): number {
  return 4 * GAS_CONSTANT * tK * tK * slope1(tK);
}

/** A_J = dA_H/dT = 4R(2T·dAφ/dT + T²·d²Aφ/dT²), J·kg^½/(mol^{3/2}·K). @param tK - temperature, K */
export function debyeHuckelHeatCapacity(tK: number): number {
  return 4 * GAS_CONSTANT * (2 * tK * slope1(tK) + tK * tK * slope2(tK));
}
