/**
 * Fixed-point text of a number, as `toFixed` writes it, made faster for the
 * notes that every result carries.
 *
 * @module
 */

const POWERS_OF_TEN = [1, 10, 100, 1000, 10000, 100000, 1000000];
const ZEROS = '000000';

/**
 * `x.toFixed(digits)`, the same text, for the numbers notes are made of.
 *
 * toFixed rounds the exact value of x·10^digits to the nearest whole number
 * n, ties upward, and writes n with a decimal point `digits` places from the
 * right. Where |x|·10^digits < 10⁹ the product in floating point is within
 * 10⁻⁷ of the exact one, so unless its fraction lies within 10⁻⁶ of one half
 * it rounds to the same n; n is then written by integer arithmetic. Ties,
 * larger numbers, non-finite values and more than 6 digits go to toFixed
 * itself.
 *
 * @param x - any number
 * @param digits - decimal places, 0–6 on the fast path (any that toFixed accepts otherwise)
 */
export function fixedDecimal(x: number, digits: number): string {
  const scale = POWERS_OF_TEN[digits];
  const a = x < 0 ? -x : x;
  if (scale === undefined) return x.toFixed(digits);
  const p = a * scale;
  if (!(p < 1e9)) return x.toFixed(digits);
  const whole = Math.floor(p);
  const fraction = p - whole;
  if (fraction > 0.499999 && fraction < 0.500001) return x.toFixed(digits);
  const n = fraction > 0.5 ? whole + 1 : whole;
  let text: string;
  if (digits === 0) text = String(n);
  else {
    const integer = Math.floor(n / scale);
    const decimals = String(n - integer * scale);
    text = `${integer}.${decimals.length < digits ? ZEROS.slice(0, digits - decimals.length) + decimals : decimals}`;
  }
  return x < 0 ? `-${text}` : text;
}
