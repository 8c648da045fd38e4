/**
 * Golden-section search for the maximum of a unimodal function on an
 * interval, to a tolerance.
 *
 * @module
 */

/** (√5 − 1)/2, the golden ratio's reciprocal. */
const INVERSE_PHI = (Math.sqrt(5) - 1) / 2;

/**
 * The x in [a, b] where a unimodal f is largest: the bracket shrinks by the
 * golden ratio each step until it is narrower than `tolerance` (about
 * 1.44·log2((b − a)/tolerance) evaluations) or `maxSteps` steps are taken.
 * On a plateau it returns a point of the plateau. A minimum is the maximum
 * of −f.
 *
 * @param f - the function to maximise
 * @param a - left end
 * @param b - right end
 * @param tolerance - absolute tolerance on x
 * @param maxSteps - most steps to take (default: as many as the tolerance needs)
 * @returns the maximising x and f there, and the final bracket [lo, hi]
 * @see Kiefer, J. Sequential minimax search for a maximum. Proc. Am. Math. Soc. 4, 502–506 (1953).
 * @example
 * ```ts
 * goldenSectionMaximum((x) => -((x - 0.3) ** 2), 0, 1, 1e-9).x; // 0.3000
 * ```
 */
export function goldenSectionMaximum(f: (x: number) => number, a: number, b: number, tolerance: number, maxSteps = Number.POSITIVE_INFINITY): { x: number; fx: number; lo: number; hi: number } {
  let lo = Math.min(a, b);
  let hi = Math.max(a, b);
  let x1 = hi - INVERSE_PHI * (hi - lo);
  let x2 = lo + INVERSE_PHI * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let step = 0; hi - lo > tolerance && step < maxSteps; step++) {
    if (f1 >= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - INVERSE_PHI * (hi - lo);
      f1 = f(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + INVERSE_PHI * (hi - lo);
      f2 = f(x2);
    }
  }
  return f1 >= f2 ? { x: x1, fx: f1, lo, hi } : { x: x2, fx: f2, lo, hi };
}
