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
 * The finest step, K, worth writing for a temperature a pack reaches: a
 * hundredth of a kelvin, below what a pack's thermometer resolves (common practice).
 */
export const TEMPERATURE_RESOLUTION_K = 0.01;

/**
 * x rounded down (`way` −1) or up (+1) to a multiple of 10^exponent, so that
 * an interval's ends rounded this way still contain the interval.
 */
function outward(x: number, exponent: number, way: -1 | 1): number {
  const step = 10 ** exponent;
  // The 1e-9 keeps an end that sits on the grid (6.23 stored as 6.2299999…) where it is.
  return way < 0 ? Math.floor(x / step + 1e-9) * step : Math.ceil(x / step - 1e-9) * step;
}

/**
 * The numbers of an estimate as text for tables and reports: the standard
 * uncertainty to two significant digits and the value and interval ends to
 * the same decimal place, trailing zeros kept (`0.20`, not `0.2`), a true
 * minus sign, and a `+` on positive values when `signed` is set (useful for
 * enthalpies, where the sign is the message). No more than six significant
 * digits are written, however small the uncertainty, and no decimal finer
 * than `resolution` when one is given. An interval of non-zero width whose
 * ends would print the same is written with its ends rounded outwards
 * (low down, high up), so that it never looks like a point:
 *
 *   low' = ⌊low/10ᵉ⌋·10ᵉ,  high' = ⌈high/10ᵉ⌉·10ᵉ  (e: the last decimal written)
 *
 * @param e - the estimate's value, standard uncertainty and interval ends (one unit, any unit)
 * @param options - display choices
 * @param options.signed - prefix positive numbers with `+`
 * @param options.resolution - the finest step worth writing, in the estimate's unit (e.g. 0.01 for a temperature in °C)
 * @see JCGM 100:2008 (GUM), §7.2.6, the rounding rule (as in {@link roundToUncertainty}); outward rounding of interval ends as in interval arithmetic (Moore, R. E. Interval Analysis, Prentice-Hall, 1966).
 *
 * @example
 * ```ts
 * const e = makeEstimate({ quantity: 'enthalpy of solution', value: 34.89, u: 0.2, unit: 'kJ/mol', basis: 'measured', method: 'table' });
 * formatEstimate(e, { signed: true }).value; // '+34.89'
 * formatEstimate(e).u; // '0.20'
 * formatEstimate({ value: 19.99999, u: 1e-9, low: 19.99987, high: 20 }).low; // '19.9999'
 * // a fill that barely changes: 22.0000029 °C, 95 % from 22.0000002 to 22.0000196 °C, written to 0.01 K
 * const f = formatEstimate({ value: 22.0000029, u: 5e-6, low: 22.0000002, high: 22.0000196 }, { resolution: 0.01 });
 * [f.value, f.low, f.high]; // ['22.00', '22.00', '22.01']
 * ```
 */
export function formatEstimate(e: Pick<Estimate, 'value' | 'u' | 'low' | 'high'>, options: { signed?: boolean; resolution?: number } = {}): FormattedEstimate {
  requireEstimateNumbers(e);
  const signed = options?.signed === true;
  const resolution = options?.resolution;
  if (resolution !== undefined) numberArgument(resolution, 'resolution', 'the finest step worth writing', { min: 1e-12 });
  const finest = resolution !== undefined ? Math.floor(Math.log10(resolution) + 1e-9) : -Infinity;
  const plainExponent = (x: number): number => Math.max(finest, -Math.min(6, Math.max(0, 4 - Math.floor(Math.log10(Math.abs(x) || 1)))));
  let exponent: number;
  if (!(e.u > 0)) {
    exponent = plainExponent(e.value);
    const low = fixed(e.low, plainExponent(e.low), signed);
    const high = fixed(e.high, plainExponent(e.high), signed);
    if (low !== high || !(e.high > e.low)) return { value: fixed(e.value, exponent, signed), u: '0', low, high };
  } else {
    // At most six significant digits: an uncertainty far below the value's own size (a fill a sparingly soluble salt
    // barely changes) would otherwise print a dozen decimals that tell a reader nothing.
    const size = Math.max(Math.abs(e.value), Math.abs(e.low), Math.abs(e.high));
    const floor = size > 0 ? Math.floor(Math.log10(size)) - 5 : -Infinity;
    exponent = Math.max(roundToUncertainty(e.value, e.u).exponent, floor, finest);
  }
  let low = fixed(e.low, exponent, signed);
  let high = fixed(e.high, exponent, signed);
  if (low === high && e.high > e.low) {
    low = fixed(outward(e.low, exponent, -1), exponent, signed);
    high = fixed(outward(e.high, exponent, 1), exponent, signed);
  }
  return { value: fixed(e.value, exponent, signed), u: e.u > 0 ? fixed(e.u, exponent, false) : '0', low, high };
}
