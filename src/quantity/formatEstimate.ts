import type { Estimate } from './estimate.js';
import { roundToUncertainty } from './rounding.js';
import { describeValue, numberArgument } from './argumentChecks.js';
import { IonheatError } from '../error.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/** The four numbers {@link formatEstimate} writes must be finite, u ≥ 0. */
function requireEstimateNumbers(e: unknown): void {
  if (e === null || typeof e !== 'object') throw new IonheatError('INVALID_ARGUMENT', `formatEstimate takes an estimate { value, u, low, high }, got ${describeValue(e)}`, { field: 'estimate' });
  const n = e as Record<string, unknown>;
  for (const k of ['value', 'low', 'high']) numberArgument(n[k], k, `the ${k} of the estimate`);
  numberArgument(n.u, 'u', 'the standard uncertainty of the estimate', { min: 0 });
}

/** Text forms of an estimate's numbers, rounded together for display. */
export interface FormattedEstimate {
  value: string;
  u: string;
  low: string;
  high: string;
}

/** Writes x with exactly `places` decimals (or rounded to tens, hundreds… when places < 0), keeping trailing zeros. */
function fixed(x: number, exponent: number, signed: boolean): string {
  const places = Math.max(0, -exponent);
  const scaled = exponent > 0 ? Math.round(x / 10 ** exponent) * 10 ** exponent : x;
  let s = unsignedZero(scaled).toFixed(Math.min(places, 20));
  if (/^-0(\.0*)?$/.test(s)) s = s.slice(1);
  if (signed && !s.startsWith('-') && Number(s) !== 0) s = `+${s}`;
  return s.replace(/^-/, '−');
}

/**
 * The numbers of an estimate as text for tables and reports: the standard
 * uncertainty to two significant digits and the value and interval ends to
 * the same decimal place, trailing zeros kept (`0.20`, not `0.2`), a true
 * minus sign, and a `+` on positive values when `signed` is set (useful for
 * enthalpies, where the sign is the message). No more than six significant
 * digits are written, however small the uncertainty.
 *
 * @param e - the estimate's value, standard uncertainty and interval ends (one unit, any unit)
 * @param options - display choices
 * @param options.signed - prefix positive numbers with `+`
 * @see JCGM 100:2008 (GUM), §7.2.6, the rounding rule (as in {@link roundToUncertainty}).
 *
 * @example
 * ```ts
 * const e = makeEstimate({ quantity: 'enthalpy of solution', value: 34.89, u: 0.2, unit: 'kJ/mol', basis: 'measured', method: 'table' });
 * formatEstimate(e, { signed: true }).value; // '+34.89'
 * formatEstimate(e).u; // '0.20'
 * formatEstimate({ value: 19.99999, u: 1e-9, low: 19.99987, high: 20 }).low; // '19.9999'
 * ```
 */
export function formatEstimate(e: Pick<Estimate, 'value' | 'u' | 'low' | 'high'>, options: { signed?: boolean } = {}): FormattedEstimate {
  requireEstimateNumbers(e);
  const signed = options?.signed === true;
  if (!(e.u > 0)) {
    const plain = (x: number) => fixed(x, -Math.min(6, Math.max(0, 4 - Math.floor(Math.log10(Math.abs(x) || 1)))), signed);
    return { value: plain(e.value), u: '0', low: plain(e.low), high: plain(e.high) };
  }
  // At most six significant digits: an uncertainty far below the value's own size (a fill a sparingly soluble salt
  // barely changes) would otherwise print a dozen decimals that tell a reader nothing.
  const size = Math.max(Math.abs(e.value), Math.abs(e.low), Math.abs(e.high));
  const floor = size > 0 ? Math.floor(Math.log10(size)) - 5 : -Infinity;
  const exponent = Math.max(roundToUncertainty(e.value, e.u).exponent, floor);
  return { value: fixed(e.value, exponent, signed), u: fixed(e.u, exponent, false), low: fixed(e.low, exponent, signed), high: fixed(e.high, exponent, signed) };
}
