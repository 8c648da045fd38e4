import Decimal from 'decimal.js';

/** One term ν·x of a sum of tabulated values. */
export interface Term {
  /** Stoichiometric coefficient ν (may be negative or fractional). */
  coefficient: number;
  /** Tabulated value x. */
  value: number;
}

/**
 * Σνᵢ·xᵢ computed exactly in decimal arithmetic, then returned as a float.
 *
 * Tabulated values are decimal numbers (−411.153 kJ/mol); adding them in
 * binary floating point leaves digits such as …0000001 that then show up in
 * reports and break byte-identical output. Each number is read through its
 * shortest decimal form, so the sum is the one a person would get by hand.
 *
 * @param terms - coefficients and tabulated values, any unit (the result has the same unit)
 * @returns the exact sum, rounded once to the nearest float
 * @example
 * ```ts
 * // ΔsolH(NaCl) = ΔfH(Na⁺, aq) + ΔfH(Cl⁻, aq) − ΔfH(NaCl, cr), NBS 1982 values, kJ/mol
 * const terms = [{ coefficient: 1, value: -240.12 }, { coefficient: 1, value: -167.159 }, { coefficient: -1, value: -411.153 }];
 * exactSum(terms); // 3.874
 * ```
 */
export function exactSum(terms: readonly Term[]): number {
  const fast = scaledIntegerSum(terms) ?? twoLimbSum(terms);
  if (fast !== undefined) return fast;
  let total = new Decimal(0);
  for (const { coefficient, value } of terms) total = total.plus(new Decimal(value).times(coefficient));
  return total.toNumber();
}

/** 10^k, exact in binary floating point for k ≤ 22. */
const POWERS_OF_TEN = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22];
/** Most decimal places read in the fast path. */
const MAX_PLACES = 9;
/** Largest integer significand read in the fast path: 15 digits, so that it is the number's shortest decimal form. */
const MAX_SIGNIFICAND = 1e15;

/** Decimal places of the shortest decimal form of x, if at most {@link MAX_PLACES} and its significand has at most 15 digits; else −1. */
function placesOf(x: number): number {
  for (let k = 0; k <= MAX_PLACES; k++) {
    const m = Math.round(x * POWERS_OF_TEN[k]!);
    if (Math.abs(m) >= MAX_SIGNIFICAND) return -1;
    if (m / POWERS_OF_TEN[k]! === x) return k;
  }
  return -1;
}

/**
 * The same exact sum in integer arithmetic, where it fits: each number is
 * read as m·10⁻ᵏ with m an integer of at most 15 digits (a decimal of at
 * most 15 significant digits that rounds to the number is its shortest
 * decimal form, the one decimal.js reads), the products and the running sum
 * are kept as integers below 2⁵³ at a common scale, and the one division by
 * 10ᴷ at the end is correctly rounded, as decimal.js's conversion is.
 * Undefined where any step would not be exact (then decimal.js sums).
 */
function scaledIntegerSum(terms: readonly Term[]): number | undefined {
  let total = 0;
  let scale = 0;
  for (const { coefficient, value } of terms) {
    const kc = placesOf(coefficient);
    const kv = placesOf(value);
    if (kc < 0 || kv < 0) return undefined;
    const k = kc + kv;
    // Each step is exact while its result stays below 2⁵³, and a result that would not is seen to be at least 2⁵³.
    let product = Math.round(coefficient * POWERS_OF_TEN[kc]!) * Math.round(value * POWERS_OF_TEN[kv]!);
    if (k > scale) {
      total *= POWERS_OF_TEN[k - scale]!;
      scale = k;
    } else if (k < scale) product *= POWERS_OF_TEN[scale - k]!;
    if (!Number.isSafeInteger(product) || !Number.isSafeInteger(total)) return undefined;
    total += product;
    if (!Number.isSafeInteger(total)) return undefined;
  }
  return total === 0 ? 0 : total / POWERS_OF_TEN[scale]!;
}

/** The base of the low limb of {@link twoLimbSum}. */
const LIMB = 1e8;
/**
 * Bound on the high limb that keeps hi·10⁸ + lo below 10²⁰: decimal.js
 * rounds every product and sum to 20 significant digits, so a sum is the
 * same in both only while every step stays within 20 digits.
 */
const TWENTY_DIGITS_HI = 999_999_999_998;

/** A number's shortest decimal form as ±(hi·10⁸ + lo)·10⁻ᵖˡᵃᶜᵉˢ, hi and lo whole, or undefined when it is not finite or too long. */
function decimalLimbs(x: number): { negative: boolean; hi: number; lo: number; places: number } | undefined {
  if (!Number.isFinite(x)) return undefined;
  // String(x) is the shortest decimal form, the one decimal.js reads.
  const text = String(x);
  const negative = text.charCodeAt(0) === 45; // '-'
  const e = text.indexOf('e');
  const mantissa = text.slice(negative ? 1 : 0, e < 0 ? text.length : e);
  const exponent = e < 0 ? 0 : Number(text.slice(e + 1));
  const dot = mantissa.indexOf('.');
  let digits = dot < 0 ? mantissa : mantissa.slice(0, dot) + mantissa.slice(dot + 1);
  let places = (dot < 0 ? 0 : mantissa.length - dot - 1) - exponent;
  if (places < 0) {
    digits += '0'.repeat(-places);
    places = 0;
  }
  if (digits.length > 23 || places > 30) return undefined;
  const split = Math.max(0, digits.length - 8);
  return { negative, hi: split > 0 ? Number(digits.slice(0, split)) : 0, lo: Number(digits.slice(split)), places };
}

/** Moves whole multiples of 10⁸ from lo into hi, so that |lo| < 10⁸ (up to rounding of the quotient, which only leaves lo a little outside). */
function carry(acc: { hi: number; lo: number }): void {
  const q = Math.trunc(acc.lo / LIMB);
  acc.hi += q;
  acc.lo -= q * LIMB;
}

/** Multiplies hi·10⁸ + lo by 10ʲ in place; false where hi would leave the safe integers. */
function shift(acc: { hi: number; lo: number }, j: number): boolean {
  while (j > 0) {
    const step = Math.min(j, 6);
    const p = POWERS_OF_TEN[step]!;
    carry(acc);
    acc.hi *= p;
    acc.lo *= p;
    carry(acc);
    if (!Number.isSafeInteger(acc.hi)) return false;
    j -= step;
  }
  return true;
}

/**
 * The same sum for numbers of up to 17 significant digits (such as
 * computed estimates) and small decimal coefficients: each term is kept as
 * an integer hi·10⁸ + lo at a common decimal scale, both limbs exact
 * integers below 2⁵³, and the total is read back through its decimal digits
 * (the conversion decimal.js makes too). Every product and partial sum is
 * kept below 10²⁰, where decimal.js (20 significant digits) is exact too.
 * Undefined where a number does not fit (then decimal.js sums).
 */
function twoLimbSum(terms: readonly Term[]): number | undefined {
  const acc = { hi: 0, lo: 0 };
  let scale = 0;
  const term = { hi: 0, lo: 0 };
  for (const { coefficient, value } of terms) {
    const kc = placesOf(coefficient);
    if (kc < 0) return undefined;
    const mc = Math.round(coefficient * POWERS_OF_TEN[kc]!);
    if (Math.abs(mc) > 1e6) return undefined;
    const v = decimalLimbs(value);
    if (!v) return undefined;
    const sign = v.negative ? -mc : mc;
    term.hi = sign * v.hi;
    term.lo = sign * v.lo;
    if (!(Math.abs(term.hi) < TWENTY_DIGITS_HI)) return undefined;
    const k = kc + v.places;
    if (k > scale) {
      if (!shift(acc, k - scale)) return undefined;
      scale = k;
    } else if (k < scale && !shift(term, scale - k)) return undefined;
    acc.hi += term.hi;
    acc.lo += term.lo;
    carry(acc);
    if (!(Math.abs(acc.hi) < TWENTY_DIGITS_HI) || scale > 30) return undefined;
  }
  // The total hi·10⁸ + lo with 0 ≤ lo < 10⁸, then its magnitude's digits.
  let { hi, lo } = acc;
  while (lo < 0) {
    lo += LIMB;
    hi -= 1;
  }
  while (lo >= LIMB) {
    lo -= LIMB;
    hi += 1;
  }
  const negative = hi < 0;
  if (negative) {
    if (lo > 0) {
      hi = -hi - 1;
      lo = LIMB - lo;
    } else hi = -hi;
  }
  if (hi === 0 && lo === 0) return 0;
  const digits = hi > 0 ? `${hi}${String(lo).padStart(8, '0')}` : String(lo);
  return Number(`${negative ? '-' : ''}${digits}e-${scale}`);
}
