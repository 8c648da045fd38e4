/**
 * Disagreement between anchored estimates widens them: each anchored
 * estimate of a salt is widened to hold the value of every other anchored
 * estimate that disagrees with it beyond their stated uncertainties, so that
 * an error the anchor sets of one lattice model or one anchor family share
 * shows in the interval instead of being hidden by the narrowest of them.
 *
 * @module
 */
import { COVERAGE_95 } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';

/**
 * Two estimates disagree beyond their stated uncertainties when their values
 * differ by more than 1.96·√(u₁² + u₂²): the difference of two independent
 * normal estimates of one quantity falls outside that 5 % of the time.
 */
export function disagree(a: Pick<Estimate, 'value' | 'u'>, b: Pick<Estimate, 'value' | 'u'>): boolean {
  return Math.abs(a.value - b.value) > COVERAGE_95 * Math.hypot(a.u, b.u);
}

/**
 * The estimates of one salt with every anchored one (one per lattice model,
 * the difference rule from another form of the salt, a hydrate's
 * carried-over estimates) widened to hold the values of the other anchored
 * estimates that {@link disagree} with it: each end moves out as far as the
 * farthest such value on its side, and u grows with the wider side,
 * u′ = max(u, side/1.96). Whichever anchored estimate is then the most
 * precise, its interval covers every anchored value that contradicts it.
 * Estimates on other bases, and anchored ones that agree with the rest, are
 * returned as they are; the list keeps its order.
 *
 * @param estimates - estimates of one salt on any basis
 */
export function widenForDisagreement(estimates: readonly Estimate[]): Estimate[] {
  const anchored = estimates.filter((e) => e.basis === 'anchored');
  if (anchored.length < 2) return [...estimates];
  return estimates.map((e) => {
    if (e.basis !== 'anchored') return e;
    const outliers = anchored.filter((o) => o !== e && disagree(e, o));
    if (outliers.length === 0) return e;
    const low = Math.min(e.low, ...outliers.map((o) => o.value));
    const high = Math.max(e.high, ...outliers.map((o) => o.value));
    const u = Math.max(e.u, Math.max(e.value - low, high - e.value) / COVERAGE_95);
    return makeEstimate({
      ...e,
      u,
      low,
      high,
      notes: [
        ...e.notes,
        `widened to hold ${outliers.map((o) => `${o.method} ${fixedDecimal(o.value, 1)} ± ${fixedDecimal(o.u, 1)}`).join(', ')} kJ/mol, which disagree${outliers.length === 1 ? 's' : ''} with it beyond the stated uncertainties: an error its anchor sets share with no other estimate`,
      ],
    });
  });
}
