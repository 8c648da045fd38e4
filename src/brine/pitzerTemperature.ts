/**
 * A Pitzer parameter as a function of temperature, and its first and second
 * derivatives: P(T) = A0 + A1(1/T − 1/Tr) + A2·ln(T/Tr) + A3(T − Tr)
 * + A4(T² − Tr²) + A5(1/T² − 1/Tr²), Tr = 298.15 K (the form of PHREEQC's
 * pitzer.dat). Bare kernels: coefficients in, number out, nothing allocated.
 *
 * @module
 */
import { REFERENCE_K } from './debyeHuckelSlopes.js';

/** Six coefficients A0…A5 (missing ones zero). */
export type PitzerCoefficients = Float64Array;

/** Six coefficients from a table's list (shorter lists padded with zeros). */
export function pitzerCoefficients(list: readonly number[]): PitzerCoefficients {
  const a = new Float64Array(6);
  for (let i = 0; i < Math.min(6, list.length); i++) a[i] = list[i]!;
  return a;
}

/** P(T). @param tK - K */
export function pitzerAt(a: PitzerCoefficients, tK: number): number {
  const r = REFERENCE_K;
  return a[0]! + a[1]! * (1 / tK - 1 / r) + a[2]! * Math.log(tK / r) + a[3]! * (tK - r) + a[4]! * (tK * tK - r * r) + a[5]! * (1 / (tK * tK) - 1 / (r * r));
}

/** dP/dT, per K: the enthalpy parameter (βᴸ, Cᴸ). @param tK - K */
export function pitzerSlope(a: PitzerCoefficients, tK: number): number {
  return -a[1]! / (tK * tK) + a[2]! / tK + a[3]! + 2 * a[4]! * tK - (2 * a[5]!) / (tK * tK * tK);
}

/** d²P/dT², per K². @param tK - K */
export function pitzerCurvature(a: PitzerCoefficients, tK: number): number {
  const t2 = tK * tK;
  return (2 * a[1]!) / (t2 * tK) - a[2]! / t2 + 2 * a[4]! + (6 * a[5]!) / (t2 * t2);
}

/** True when the coefficients carry a temperature dependence (anything past A0). */
export function hasTemperatureDependence(a: PitzerCoefficients): boolean {
  return a[1] !== 0 || a[2] !== 0 || a[3] !== 0 || a[4] !== 0 || a[5] !== 0;
}
