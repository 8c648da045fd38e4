/**
 * The shared result shape: every number ionheat reports comes as an
 * `Estimate`, a value with its standard uncertainty, its 95 % interval, its
 * unit, the basis it rests on, the method that made it and the sources behind
 * it.
 *
 * @module
 */
import { IonheatError } from '../error.js';
import { COVERAGE_95 } from './constants.js';
import { roundToExponent, roundToUncertainty } from './rounding.js';
import { estimateArgument } from './argumentChecks.js';
import { normalCdf } from '../numeric/normalCdf.js';
import { unsignedZero } from '../numeric/unsignedZero.js';
import { basisOrder } from './basisOrder.js';
import type { Basis, Estimate } from './estimateSchema.js';

export { basisOrder } from './basisOrder.js';
export type { Basis, Estimate } from './estimateSchema.js';


/** What a caller supplies to {@link makeEstimate}; the interval defaults to value ± 1.96·u. */
export interface EstimateInput {
  quantity: string;
  value: number;
  u: number;
  unit: string;
  basis: Basis;
  method: string;
  sources?: readonly string[];
  notes?: readonly string[];
  low?: number;
  high?: number;
}

function requireFinite(x: number, what: string): void {
  if (typeof x !== 'number' || !Number.isFinite(x)) throw new IonheatError('INVALID_ARGUMENT', `${what} must be a finite number, got ${typeof x === 'number' ? String(x) : typeof x}`, { field: what });
}

function requireText(x: unknown, what: string): void {
  if (typeof x !== 'string') throw new IonheatError('INVALID_ARGUMENT', `the ${what} of an estimate must be text, got ${x === null ? 'null' : typeof x}`, { field: what });
}

function requireTextList(x: unknown, what: string): void {
  if (x === undefined) return;
  if (!Array.isArray(x) || !x.every((s) => typeof s === 'string')) throw new IonheatError('INVALID_ARGUMENT', `the ${what} of an estimate must be a list of text`, { field: what });
}

/** Checks the shape of what {@link probabilityPositive} and {@link formatEstimate} read: an object with finite numbers, u ≥ 0. */
function requireNumbers(e: unknown, keys: readonly string[]): void {
  if (e === null || typeof e !== 'object') throw new IonheatError('INVALID_ARGUMENT', `an estimate must be an object with ${keys.join(', ')}, got ${e === null ? 'null' : typeof e}`, { field: 'estimate' });
  for (const k of keys) requireFinite((e as Record<string, number>)[k]!, k);
  if ((e as { u: number }).u < 0) throw new IonheatError('INVALID_ARGUMENT', `an uncertainty cannot be negative, got ${(e as { u: number }).u}`, { field: 'u' });
}

/**
 * Builds an {@link Estimate}, checking that every number is finite and that
 * the interval holds the value. The interval is value ± k·u with k = 1.96
 * (normal, 95 %) unless the caller gives its own ends.
 *
 * @param input - the quantity in words, `value` and its standard uncertainty `u` (both in `unit`,
 *   e.g. kJ/mol), the basis, the method name, source keys, notes, and optionally the interval ends `low`/`high`
 * @see JCGM 100:2008 (GUM), Evaluation of measurement data — Guide to the expression of uncertainty in
 *   measurement, §6.2–6.3: expanded uncertainty U = k·u with coverage factor k = 1.96 for 95 % of a normal distribution.
 *
 * @example
 * ```ts
 * const e = makeEstimate({ quantity: 'lattice enthalpy', value: 787, u: 10, unit: 'kJ/mol', basis: 'model', method: 'kapustinskii' });
 * e.low; // 767.40
 * e.high; // 806.60
 * ```
 */
export function makeEstimate(input: EstimateInput): Estimate {
  if (input === null || typeof input !== 'object') throw new IonheatError('INVALID_ARGUMENT', `makeEstimate takes an object { quantity, value, u, unit, basis, method }, got ${input === null ? 'null' : typeof input}`, { field: 'input' });
  requireText(input.quantity, 'quantity');
  requireText(input.unit, 'unit');
  requireText(input.method, 'method');
  if (!basisOrder.includes(input.basis)) throw new IonheatError('INVALID_ARGUMENT', `the basis of an estimate is one of ${basisOrder.join(', ')}, got ${typeof input.basis === 'string' ? `"${input.basis}"` : typeof input.basis}`, { field: 'basis' });
  requireTextList(input.sources, 'sources');
  requireTextList(input.notes, 'notes');
  requireFinite(input.value, 'value');
  requireFinite(input.u, 'uncertainty');
  if (input.u < 0) throw new IonheatError('INVALID_ARGUMENT', `an uncertainty cannot be negative, got ${input.u}`, { field: 'uncertainty' });
  const low = input.low ?? input.value - COVERAGE_95 * input.u;
  const high = input.high ?? input.value + COVERAGE_95 * input.u;
  requireFinite(low, 'low');
  requireFinite(high, 'high');
  if (!(low <= input.value && input.value <= high)) {
    throw new IonheatError('INVALID_ARGUMENT', `the interval [${low}, ${high}] does not hold the value ${input.value}`, { field: 'interval' });
  }
  return {
    quantity: input.quantity,
    value: unsignedZero(input.value),
    u: unsignedZero(input.u),
    low: unsignedZero(low),
    high: unsignedZero(high),
    unit: input.unit,
    basis: input.basis,
    method: input.method,
    sources: sortedUnique(input.sources),
    notes: input.notes ? input.notes.slice() : [],
  };
}

/** The distinct strings of a list in the default sort order (UTF-16 code units), as `[...new Set(list)].sort()` gives them. */
function sortedUnique(list: readonly string[] | undefined): string[] {
  const out: string[] = [];
  if (!list) return out;
  // Insertion into a sorted list: the lists are a handful of source keys.
  for (const x of list) {
    let i = out.length;
    while (i > 0 && out[i - 1]! > x) i--;
    if (i > 0 && out[i - 1] === x) continue;
    for (let j = out.length; j > i; j--) out[j] = out[j - 1]!;
    out[i] = x;
  }
  return out;
}

/**
 * Rounds an estimate for reporting: `u` to two significant digits, and the
 * value and interval ends to the same decimal place.
 *
 * @param e - the estimate; an exact one (u = 0) is returned unchanged
 * @see JCGM 100:2008 (GUM), §7.2.6: give an uncertainty to at most two significant digits and the value to match.
 *
 * @example
 * ```ts
 * const e = makeEstimate({ quantity: 'q', value: 25.6873, u: 0.4321, unit: 'kJ/mol', basis: 'measured', method: 'table' });
 * roundEstimate(e).value; // 25.69
 * roundEstimate(e).u; // 0.43
 * ```
 */
export function roundEstimate(e: Estimate): Estimate {
  e = estimateArgument(e);
  const { value, u, exponent } = roundToUncertainty(e.value, e.u);
  if (e.u === 0) return { ...e };
  return { ...e, value: unsignedZero(value), u, low: unsignedZero(roundToExponent(e.low, exponent)), high: unsignedZero(roundToExponent(e.high, exponent)) };
}

/**
 * Probability that the true value exceeds zero, P(X > 0) = Φ(value / u), for
 * a normal distribution with the estimate's value as mean and `u` as standard
 * deviation. An exact estimate (u = 0) gives 1 or 0.
 *
 * @param e - an estimate's `value` and standard uncertainty `u` (same unit, any unit)
 * @see JCGM 100:2008 (GUM), §G.2: the normal distribution of a quantity known by its best estimate and standard uncertainty.
 *
 * @example
 * ```ts
 * probabilityPositive({ value: 1.96, u: 1 }); // 0.975
 * probabilityPositive({ value: -1, u: 1 }); // 0.159
 * probabilityPositive({ value: 3, u: 0 }); // 1
 * ```
 */
export function probabilityPositive(e: Pick<Estimate, 'value' | 'u'>): number {
  requireNumbers(e, ['value', 'u']);
  const z = e.value / e.u;
  if (e.u === 0 || !Number.isFinite(z)) return e.value > 0 ? 1 : 0;
  return normalCdf(z);
}
