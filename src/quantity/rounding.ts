import Decimal from 'decimal.js';
import { numberArgument } from './argumentChecks.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/** The decimal exponent of the last digit kept when `u` is given to two significant digits. */
function lastDigitExponent(u: number): number {
  return Math.floor(Math.log10(Math.abs(u))) - 1;
}

/**
 * Rounds `x` to the given decimal exponent (−1 keeps one decimal), half away
 * from zero, through decimal arithmetic so that 2.675 rounds to 2.68.
 */
export function roundToExponent(x: number, exponent: number): number {
  const places = -exponent;
  if (places >= 0) return new Decimal(x).toDecimalPlaces(Math.min(places, 15), Decimal.ROUND_HALF_UP).toNumber();
  const step = new Decimal(10).pow(-places);
  return new Decimal(x).dividedBy(step).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).times(step).toNumber();
}

/**
 * Rounds a value and its standard uncertainty by the usual rule of
 * measurement reporting: the uncertainty to two significant digits, the value
 * to the same decimal place (GUM, JCGM 100:2008, §7.2.6).
 *
 * A zero uncertainty leaves the value as given.
 *
 * @param value - the value, any unit
 * @param u - its standard uncertainty, same unit, ≥ 0
 * @returns the rounded pair and the decimal exponent used
 * @see JCGM 100:2008 (GUM), Guide to the expression of uncertainty in measurement, §7.2.6.
 *
 * @example
 * ```ts
 * roundToUncertainty(787.3456, 1.2345); // { value: 787.3, u: 1.2, exponent: -1 }
 * roundToUncertainty(-3.14159, 0.0271); // { value: -3.142, u: 0.027, exponent: -3 }
 * ```
 */
export function roundToUncertainty(value: number, u: number): { value: number; u: number; exponent: number } {
  value = numberArgument(value, 'value', 'the value to round');
  u = numberArgument(u, 'u', 'the standard uncertainty', { min: 0 });
  if (!(u > 0) || !Number.isFinite(u)) return { value, u, exponent: 0 };
  let exponent = lastDigitExponent(u);
  let roundedU = roundToExponent(u, exponent);
  // 0.0996 rounds to 0.10: one more digit of magnitude, still two significant digits.
  if (lastDigitExponent(roundedU) > exponent) {
    exponent = lastDigitExponent(roundedU);
    roundedU = roundToExponent(u, exponent);
  }
  const rounded = roundToExponent(value, exponent);
  return { value: unsignedZero(rounded), u: roundedU, exponent };
}
