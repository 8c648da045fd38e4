/**
 * The one place −0 becomes 0: a result never shows a signed zero (JSON
 * writes −0 as 0 but `Object.is` and text formatting tell them apart).
 *
 * @module
 */

/**
 * `x`, with −0 read as 0.
 *
 * @param x - any number, in any unit
 * @returns x, or +0 for −0
 * @see IEEE 754-2019, §6.3 (the sign of a zero result): common practice to report zero unsigned.
 * @example
 * ```ts
 * Object.is(unsignedZero(-0), 0); // true
 * unsignedZero(-2.5); // -2.5
 * ```
 */
export function unsignedZero(x: number): number {
  return x === 0 ? 0 : x;
}
