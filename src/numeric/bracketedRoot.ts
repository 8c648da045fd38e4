/**
 * A bracketed root finder (Brent's method): the pack balances and the inverse
 * designs all reduce to "find x in [a, b] where f changes sign".
 *
 * @module
 */
import { IonheatError } from '../error.js';

/** What {@link bracketedRoot} found. */
export interface RootResult {
  /** The root, to within the tolerance. */
  x: number;
  /** f at `x`. Far from zero when f jumps across zero instead of passing through it. */
  fx: number;
  /** Function evaluations used. */
  evaluations: number;
}

/** Safety net only: Brent's method on a sign change needs about log2((b − a)/tol) steps at worst. */
const MAX_EVALUATIONS = 400;

/**
 * Brent's method on a bracket [a, b] with f(a)·f(b) ≤ 0: inverse quadratic
 * interpolation and secant steps where they behave, bisection where they do
 * not, so the bracket always shrinks and convergence is guaranteed. Stops when
 * the bracket is narrower than `2·(tolerance + 4ε|x|)` or f is exactly zero —
 * a tolerance, not a fixed number of iterations. A function that jumps across
 * zero (a discontinuity) converges to the jump.
 *
 * @param f - a function of one real variable
 * @param a - one end of the bracket
 * @param b - the other end
 * @param tolerance - absolute tolerance on x (same unit as x)
 * @returns the root, f there and the evaluation count
 * @throws IonheatError `NO_SOLUTION` when f(a) and f(b) have the same sign
 * @see Brent, R. P. Algorithms for Minimization without Derivatives, Prentice-Hall (1973), ch. 4.
 * @example
 * ```ts
 * bracketedRoot((x) => x * x - 2, 0, 2, 1e-12).x; // 1.414213562
 * ```
 */
export function bracketedRoot(f: (x: number) => number, a: number, b: number, tolerance: number): RootResult {
  let fa = f(a);
  let fb = f(b);
  let evaluations = 2;
  if (fa === 0) return { x: a, fx: 0, evaluations };
  if (fb === 0) return { x: b, fx: 0, evaluations };
  if (Math.sign(fa) === Math.sign(fb)) {
    throw new IonheatError('NO_SOLUTION', `no sign change between ${a} and ${b} (f = ${fa} and ${fb})`, {});
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  while (evaluations < MAX_EVALUATIONS) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + tolerance;
    const m = (c - b) / 2;
    if (Math.abs(m) <= tol || fb === 0) return { x: b, fx: fb, evaluations };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Interpolate: secant when only two distinct points, inverse quadratic otherwise.
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    evaluations++;
  }
  // Unreachable for a true bracket; report where the bracket stands rather than loop on.
  return { x: b, fx: fb, evaluations };
}
