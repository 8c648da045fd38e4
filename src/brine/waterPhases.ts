/**
 * Water in a brine against ice and vapour: the activity of water from the
 * osmotic coefficient, and the activity that ice (or vapour at 1 atm) would
 * be in equilibrium with at T. Bare kernels: numbers in, number out.
 *
 *   ln a_w = −Mw·Σνᵢ·mᵢ·φᵢ
 *   ice:    ln a_w = −(ΔfusH/R)(1/T − 1/T₀) − (ΔfusCp/R)[(T − T₀)/T − ln(T/T₀)],  T₀ = 273.15 K
 *   vapour: ln a_w = (ΔvapH/R)(1/T − 1/T_b),  T_b = 373.12 K (1 atm)
 *
 * @see any physical chemistry text for the Gibbs–Helmholtz form; docs/methods.md, "Brines".
 * @module
 */
import { GAS_CONSTANT, ZERO_CELSIUS_K } from './debyeHuckelSlopes.js';

/** Boiling point of pure water at 1 atm, K (common practice: 99.97 °C on ITS-90). */
export const WATER_BOILING_K = 373.12;

/** Constants of water the kernels need (from data/brine-pitzer.json). */
export interface WaterConstants {
  /** J/mol at 273.15 K. */
  fusionEnthalpy: number;
  /** J/(mol·K). */
  fusionHeatCapacity: number;
  /** J/mol at the normal boiling point. */
  vaporizationEnthalpy: number;
  /** kg/mol. */
  molarMass: number;
}

/** ln a_w of water in equilibrium with ice at T (K). */
export function iceWaterActivityLn(water: WaterConstants, tK: number): number {
  const t0 = ZERO_CELSIUS_K;
  return -(water.fusionEnthalpy / GAS_CONSTANT) * (1 / tK - 1 / t0) - (water.fusionHeatCapacity / GAS_CONSTANT) * ((tK - t0) / tK - Math.log(tK / t0));
}

/** ΔfusH at T (K), J/mol: ΔfusH(T₀) + ΔfusCp·(T − T₀). */
export function fusionEnthalpyAt(water: WaterConstants, tK: number): number {
  return water.fusionEnthalpy + water.fusionHeatCapacity * (tK - ZERO_CELSIUS_K);
}

/** ln a_w of a brine that boils at T (K) under 1 atm (ΔvapH taken as constant near 100 °C). */
export function boilingWaterActivityLn(water: WaterConstants, tK: number): number {
  return (water.vaporizationEnthalpy / GAS_CONSTANT) * (1 / tK - 1 / WATER_BOILING_K);
}
