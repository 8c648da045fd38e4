/**
 * The kernel of the warmer model: the enthalpy of a fill of salt hydrate (with
 * any extra water and a container) as a function of its temperature, with the
 * hydrate crystals in equilibrium with the liquid, and the inverse, the state
 * (temperature and crystal mass) that holds a given enthalpy. Plain numbers
 * in, plain numbers out; no look-ups and no checks (the public function above
 * it does those).
 *
 * @module
 */
import { bracketedRoot } from '../numeric/bracketedRoot.js';

/** One point of the hydrate's liquidus: temperature (°C) and grams of anhydrous salt per gram of water. */
export interface LiquidusPoint {
  t: number;
  s: number;
}

/** What the kernel needs, all as plain numbers. */
export interface CrystallisingFill {
  /** Hydrate, g. */
  hydrateG: number;
  /** Extra water, g. */
  extraWaterG: number;
  /** Container or thickener heat capacity, J/K. */
  containerJPerK: number;
  /** Start temperature of the supercooled fill, °C. */
  startC: number;
  /** Melting (peritectic) temperature, °C. */
  meltingC: number;
  /** Latent heat of fusion at the melting point, J per g of hydrate. */
  latentJPerG: number;
  /** Specific heat capacity of the solid hydrate, J/(g·K). */
  solidCpJPerGK: number;
  /** Specific heat capacity of the melt, J/(g·K). */
  meltCpJPerGK: number;
  /** Specific heat capacity of liquid water, J/(g·K). */
  waterCpJPerGK: number;
  /** Mass fraction of anhydrous salt in the hydrate. */
  anhydrousFraction: number;
  /** The hydrate's liquidus below the melting point, temperatures rising, ending at (meltingC, w0/(1 − w0)). Needed only with extra water. */
  liquidus: readonly LiquidusPoint[];
}

/** An equilibrium state of the fill. */
export interface FillState {
  /** °C. */
  temperature: number;
  /** Grams of hydrate crystallised. */
  crystalG: number;
}

/** Linear interpolation through points (x rising), extending the end segments. */
function interpolate<P>(points: readonly P[], x: number, xOf: (p: P) => number, yOf: (p: P) => number): number {
  const n = points.length;
  let k = 0;
  while (k < n - 2 && xOf(points[k + 1]!) < x) k++;
  const a = points[k]!;
  const b = points[k + 1]!;
  return yOf(a) + ((yOf(b) - yOf(a)) * (x - xOf(a))) / (xOf(b) - xOf(a));
}

/** Grams of anhydrous salt per gram of water on the liquidus at t °C (never below zero). */
export function liquidusRatio(liquidus: readonly LiquidusPoint[], t: number): number {
  return Math.max(0, interpolate(liquidus, t, (p) => p.t, (p) => p.s));
}

/** The liquidus temperature, °C, of a liquid holding s grams of anhydrous salt per gram of water. */
export function liquidusTemperature(liquidus: readonly LiquidusPoint[], s: number): number {
  return interpolate(liquidus, s, (p) => p.s, (p) => p.t);
}

/** The derived constants of a fill, computed once. */
export interface FillConstants {
  /** Anhydrous salt, g. */
  anhydrousG: number;
  /** All water, of crystallisation and extra, g. */
  waterG: number;
  /** Heat capacity of the all-liquid fill with its container, J/K. */
  liquidJPerK: number;
  /** Latent heat per gram at the start temperature (Kirchhoff: L(T) = L_m − (c_l − c_s)(T_m − T)), J/g. */
  latentAtStartJPerG: number;
  /** Liquidus temperature of the fill's own composition, °C (the melting point for the hydrate alone). */
  liquidusC: number;
}

/** The constants of {@link CrystallisingFill} a state needs. */
export function fillConstants(f: CrystallisingFill): FillConstants {
  const anhydrousG = f.anhydrousFraction * f.hydrateG;
  const waterG = (1 - f.anhydrousFraction) * f.hydrateG + f.extraWaterG;
  return {
    anhydrousG,
    waterG,
    liquidJPerK: f.hydrateG * f.meltCpJPerGK + f.extraWaterG * f.waterCpJPerGK + f.containerJPerK,
    latentAtStartJPerG: f.latentJPerG - (f.meltCpJPerGK - f.solidCpJPerGK) * (f.meltingC - f.startC),
    liquidusC: f.extraWaterG > 0 ? Math.min(f.meltingC, liquidusTemperature(f.liquidus, anhydrousG / waterG)) : f.meltingC,
  };
}

/** Heat capacity of the fill with x g of hydrate crystallised, J/K: the crystals replace as much melt. */
export function heatCapacityWith(f: CrystallisingFill, c: FillConstants, crystalG: number): number {
  return c.liquidJPerK + crystalG * (f.solidCpJPerGK - f.meltCpJPerGK);
}

/**
 * Enthalpy of the fill relative to the all-liquid fill at the start
 * temperature, J: crystallise x g at the start temperature, then warm the
 * whole to T, H = −x·L(T_s) + C(x)·(T − T_s).
 */
export function fillEnthalpy(f: CrystallisingFill, c: FillConstants, state: FillState): number {
  return -state.crystalG * c.latentAtStartJPerG + heatCapacityWith(f, c, state.crystalG) * (state.temperature - f.startC);
}

/**
 * Grams of hydrate in equilibrium with the liquid at t °C, by the lever rule
 * on the liquidus: the liquid keeps s(t) g of salt per g of water, the rest
 * of the salt stands as hydrate, x = (A − s·W)/(w₀ − s·(1 − w₀)). The hydrate
 * alone is all solid below its melting point and all liquid above it.
 */
export function equilibriumCrystal(f: CrystallisingFill, c: FillConstants, t: number): number {
  if (t >= c.liquidusC) return 0;
  if (f.extraWaterG <= 0) return f.hydrateG;
  const s = liquidusRatio(f.liquidus, t);
  const w0 = f.anhydrousFraction;
  const x = (c.anhydrousG - s * c.waterG) / (w0 - s * (1 - w0));
  return Math.min(f.hydrateG, Math.max(0, x));
}

/** Tolerance of the temperature solve, K. */
const TEMPERATURE_TOLERANCE_K = 1e-9;

/**
 * The equilibrium state holding enthalpy H (J, relative to the all-liquid
 * fill at the start temperature). Above the liquidus the fill is liquid;
 * the hydrate alone sits at its melting point while H lies between the
 * fully solid and the fully liquid fill there; otherwise the temperature is
 * found where the equilibrium enthalpy, which rises with temperature, equals H.
 */
export function stateOfEnthalpy(f: CrystallisingFill, c: FillConstants, H: number): FillState {
  const dtLiquid = c.liquidusC - f.startC;
  if (H >= c.liquidJPerK * dtLiquid) return { temperature: f.startC + H / c.liquidJPerK, crystalG: 0 };
  if (f.extraWaterG <= 0) {
    const solidJPerK = heatCapacityWith(f, c, f.hydrateG);
    const solidAtMelting = -f.hydrateG * c.latentAtStartJPerG + solidJPerK * dtLiquid;
    if (H <= solidAtMelting) return { temperature: f.startC + (H + f.hydrateG * c.latentAtStartJPerG) / solidJPerK, crystalG: f.hydrateG };
    // On the plateau: C(x)·ΔT − x·L(T_s) = H gives x = (C_liquid·ΔT − H)/L_m.
    return { temperature: f.meltingC, crystalG: (c.liquidJPerK * dtLiquid - H) / (c.latentAtStartJPerG + (f.meltCpJPerGK - f.solidCpJPerGK) * dtLiquid) };
  }
  const g = (t: number) => fillEnthalpy(f, c, { temperature: t, crystalG: equilibriumCrystal(f, c, t) }) - H;
  let low = f.startC - 5;
  while (g(low) > 0 && low > -273) low -= 20;
  const t = bracketedRoot(g, low, c.liquidusC, TEMPERATURE_TOLERANCE_K).x;
  return { temperature: t, crystalG: equilibriumCrystal(f, c, t) };
}
