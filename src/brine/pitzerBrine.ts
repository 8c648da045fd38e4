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
  return osmoticCoefficientWith(p, m, debyeHuckelOsmotic(tK), pitzerAt(p.beta0, tK), pitzerAt(p.beta1, tK), p.alpha2 > 0 ? pitzerAt(p.beta2, tK) : 0, pitzerAt(p.cphi, tK));
}

/**
 * φ from Aφ and the parameters already taken at T: for loops over molality
 * at one temperature (the ice balance), which then evaluate no logarithm.
 */
export function osmoticCoefficientWith(p: PitzerParameters, m: number, aPhi: number, beta0: number, beta1: number, beta2: number, cphi: number): number {
  if (m <= 0) return 1;
  const sqrtI = Math.sqrt(ionicStrength(p, m));
  const nu = p.nuM + p.nuX;
  const b = beta0 + beta1 * Math.exp(-p.alpha1 * sqrtI) + (p.alpha2 > 0 ? beta2 * Math.exp(-p.alpha2 * sqrtI) : 0);
  const nn = p.nuM * p.nuX;
  return 1 - (p.zM * p.zX * aPhi * sqrtI) / (1 + PITZER_B * sqrtI) + (m * 2 * nn * b) / nu + (m * m * 2 * nn * Math.sqrt(nn) * cphi) / nu;
}

/** B or one of its temperature derivatives, given β's at T and √I. */
function bSum(b0: number, b1: number, b2: number, p: PitzerParameters, sqrtI: number): number {
  return b0 + b1 * gFunction(p.alpha1 * sqrtI) + (p.alpha2 > 0 ? b2 * gFunction(p.alpha2 * sqrtI) : 0);
}

/**
 * The temperature-dependent parts of φL at tK into `out`: A_H, β⁰ᴸ, β¹ᴸ, β²ᴸ, Cᴸ
 * (for loops over molality at one temperature).
 */
export function enthalpyTerms(p: PitzerParameters, tK: number, out: Float64Array): void {
  termsInto(p, tK, debyeHuckelEnthalpy(tK), pitzerSlope, out);
}

/** The Debye–Hückel slope, then each of β⁰, β¹, β², Cᵠ taken through `derivative` (Cᵠ scaled to C). */
function termsInto(p: PitzerParameters, tK: number, slope: number, derivative: (a: PitzerCoefficients, tK: number) => number, out: Float64Array): void {
  out[0] = slope;
  out[1] = derivative(p.beta0, tK);
  out[2] = derivative(p.beta1, tK);
  out[3] = derivative(p.beta2, tK);
  out[4] = derivative(p.cphi, tK) / (2 * Math.sqrt(p.zM * p.zX));
}

/**
 * The temperature-dependent parts of φJ at tK into `out`: A_J, β⁰ᴶ, β¹ᴶ, β²ᴶ, Cᴶ.
 */
export function heatCapacityTerms(p: PitzerParameters, tK: number, out: Float64Array): void {
  termsInto(p, tK, debyeHuckelHeatCapacity(tK), heatCapacityParameter, out);
}

/** φL or φJ from its terms at tK: ν|zMzX|·(A/2b)·ln(1 + b√I) − 2νMνX·R·T²·(m·Bˣ + m²·νM·zM·Cˣ). */
export function apparentFromTerms(p: PitzerParameters, m: number, tK: number, terms: Float64Array): number {
  if (m <= 0) return 0;
  const sqrtI = Math.sqrt(ionicStrength(p, m));
  const nu = p.nuM + p.nuX;
  const b = bSum(terms[1]!, terms[2]!, terms[3]!, p, sqrtI);
  const dh = ((nu * p.zM * p.zX * terms[0]!) / (2 * PITZER_B)) * Math.log(1 + PITZER_B * sqrtI);
  return dh - 2 * p.nuM * p.nuX * GAS_CONSTANT * tK * tK * (m * b + m * m * p.nuM * p.zM * terms[4]!);
}

/** φL, J/mol of salt, at m (mol/kg) and T (K). */
export function relativeApparentEnthalpy(p: PitzerParameters, m: number, tK: number): number {
  const terms = new Float64Array(5);
  enthalpyTerms(p, tK, terms);
  return apparentFromTerms(p, m, tK, terms);
}

/** Xᴶ = ∂²X/∂T² + (2/T)·∂X/∂T, per K². */
function heatCapacityParameter(a: PitzerCoefficients, tK: number): number {
  return pitzerCurvature(a, tK) + (2 / tK) * pitzerSlope(a, tK);
}

/** φJ = φCp − φCp°, J/(mol·K), at m (mol/kg) and T (K). */
export function relativeApparentHeatCapacity(p: PitzerParameters, m: number, tK: number): number {
  const terms = new Float64Array(5);
  heatCapacityTerms(p, tK, terms);
  return apparentFromTerms(p, m, tK, terms);
}
