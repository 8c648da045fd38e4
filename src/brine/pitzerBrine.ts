/**
 * Pitzer's equations for a single salt M_νM X_νX in water at molality m and
 * temperature T: the osmotic coefficient φ, the relative apparent molar
 * enthalpy φL and the relative apparent molar heat capacity φJ = φCp − φCp°.
 * Bare kernels over a resolved parameter set: numbers in, number out, no
 * allocation (they run inside the pack solver).
 *
 * With I = ½m(νM·zM² + νX·zX²), b = 1.2, g(x) = 2[1 − (1 + x)e^{−x}]/x²:
 *
 *   φ − 1 = −|zMzX|·Aφ·√I/(1 + b√I) + m·(2νMνX/ν)·(β⁰ + β¹e^{−α₁√I} + β²e^{−α₂√I}) + m²·(2(νMνX)^{3/2}/ν)·Cᵠ
 *   φL = ν|zMzX|·(A_H/2b)·ln(1 + b√I) − 2νMνX·R·T²·(m·Bᴸ + m²·νM·zM·Cᴸ)
 *   φJ = ν|zMzX|·(A_J/2b)·ln(1 + b√I) − 2νMνX·R·T²·(m·Bᴶ + m²·νM·zM·Cᴶ)
 *
 * with Bᴸ = ∂B/∂T, B = β⁰ + β¹g(α₁√I) + β²g(α₂√I), C = Cᵠ/(2√|zMzX|), and
 * Xᴶ = ∂²X/∂T² + (2/T)·∂X/∂T.
 *
 * @see silvesterPitzer1977 (φL, φJ), pitzerMayorga1973 (φ); docs/methods.md, "Brines".
 * @module
 */
import { debyeHuckelEnthalpy, debyeHuckelHeatCapacity, debyeHuckelOsmotic, GAS_CONSTANT } from './debyeHuckelSlopes.js';
import { pitzerAt, pitzerCurvature, pitzerSlope, type PitzerCoefficients } from './pitzerTemperature.js';

/** Pitzer's b, kg^½/mol^½. */
export const PITZER_B = 1.2;

/** A salt's Pitzer parameters, resolved (own data or the charge-type estimate). */
export interface PitzerParameters {
  zM: number;
  /** |zX|. */
  zX: number;
  nuM: number;
  nuX: number;
  beta0: PitzerCoefficients;
  beta1: PitzerCoefficients;
  beta2: PitzerCoefficients;
  cphi: PitzerCoefficients;
  alpha1: number;
  /** 0 when there is no β². */
  alpha2: number;
}

function ionicStrength(p: PitzerParameters, m: number): number {
  return 0.5 * m * (p.nuM * p.zM * p.zM + p.nuX * p.zX * p.zX);
}

/** g(x) = 2[1 − (1 + x)e^{−x}]/x², with its series near 0. */
function gFunction(x: number): number {
  if (x < 1e-4) return 1 - (2 * x) / 3;
  return (2 * (1 - (1 + x) * Math.exp(-x))) / (x * x);
}

/** The osmotic coefficient φ at m (mol/kg) and T (K). */
export function osmoticCoefficient(p: PitzerParameters, m: number, tK: number): number {
  if (m <= 0) return 1;
  const sqrtI = Math.sqrt(ionicStrength(p, m));
  const nu = p.nuM + p.nuX;
  const b = pitzerAt(p.beta0, tK) + pitzerAt(p.beta1, tK) * Math.exp(-p.alpha1 * sqrtI) + (p.alpha2 > 0 ? pitzerAt(p.beta2, tK) * Math.exp(-p.alpha2 * sqrtI) : 0);
  const c = pitzerAt(p.cphi, tK);
  return (
    1 -
    (p.zM * p.zX * debyeHuckelOsmotic(tK) * sqrtI) / (1 + PITZER_B * sqrtI) +
    (m * (2 * p.nuM * p.nuX) * b) / nu +
    (m * m * 2 * Math.pow(p.nuM * p.nuX, 1.5) * c) / nu
  );
}

/** B or one of its temperature derivatives, given β's at T and √I. */
function bSum(b0: number, b1: number, b2: number, p: PitzerParameters, sqrtI: number): number {
  return b0 + b1 * gFunction(p.alpha1 * sqrtI) + (p.alpha2 > 0 ? b2 * gFunction(p.alpha2 * sqrtI) : 0);
}

/** φL, J/mol of salt, at m (mol/kg) and T (K). */
export function relativeApparentEnthalpy(p: PitzerParameters, m: number, tK: number): number {
  if (m <= 0) return 0;
  const sqrtI = Math.sqrt(ionicStrength(p, m));
  const nu = p.nuM + p.nuX;
  const bL = bSum(pitzerSlope(p.beta0, tK), pitzerSlope(p.beta1, tK), pitzerSlope(p.beta2, tK), p, sqrtI);
  const cL = pitzerSlope(p.cphi, tK) / (2 * Math.sqrt(p.zM * p.zX));
  const dh = ((nu * p.zM * p.zX * debyeHuckelEnthalpy(tK)) / (2 * PITZER_B)) * Math.log(1 + PITZER_B * sqrtI);
  return dh - 2 * p.nuM * p.nuX * GAS_CONSTANT * tK * tK * (m * bL + m * m * p.nuM * p.zM * cL);
}

/** Xᴶ = ∂²X/∂T² + (2/T)·∂X/∂T, per K². */
function heatCapacityParameter(a: PitzerCoefficients, tK: number): number {
  return pitzerCurvature(a, tK) + (2 / tK) * pitzerSlope(a, tK);
}

/** φJ = φCp − φCp°, J/(mol·K), at m (mol/kg) and T (K). */
export function relativeApparentHeatCapacity(p: PitzerParameters, m: number, tK: number): number {
  if (m <= 0) return 0;
  const sqrtI = Math.sqrt(ionicStrength(p, m));
  const nu = p.nuM + p.nuX;
  const bJ = bSum(heatCapacityParameter(p.beta0, tK), heatCapacityParameter(p.beta1, tK), heatCapacityParameter(p.beta2, tK), p, sqrtI);
  const cJ = heatCapacityParameter(p.cphi, tK) / (2 * Math.sqrt(p.zM * p.zX));
  const dh = ((nu * p.zM * p.zX * debyeHuckelHeatCapacity(tK)) / (2 * PITZER_B)) * Math.log(1 + PITZER_B * sqrtI);
  return dh - 2 * p.nuM * p.nuX * GAS_CONSTANT * tK * tK * (m * bJ + m * m * p.nuM * p.zM * cJ);
}
