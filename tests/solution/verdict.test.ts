// The verdict and the probability that a salt cools read the same interval,
// so they never disagree: P(endothermic) passes 0.975 exactly when the whole
// 95 % interval lies above zero (and falls below 0.025 exactly when it lies below).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeEstimate, solutionVerdict } from '../../src/index.js';
import { normalCdf } from '../../src/numeric/normalCdf.js';

const estimate = (value: number, u: number, low?: number, high?: number) =>
  makeEstimate({ quantity: 'enthalpy of solution', value, u, unit: 'kJ/mol', basis: 'model', method: 'kapustinskii', ...(low === undefined ? {} : { low, high }) });

describe('solutionVerdict', () => {
  it('gives Φ(value/u) for the usual interval value ± 1.96·u', () => {
    // Φ(25.69/0.2) is 1 to machine precision; Φ(2/3) = 0.7475 (standard normal table, common practice).
    expect(solutionVerdict(estimate(25.69, 0.2)).probabilityEndothermic).toBe(1);
    expect(solutionVerdict(estimate(2, 3)).probabilityEndothermic).toBeCloseTo(0.7475, 4);
    expect(solutionVerdict(estimate(-2, 3)).probabilityEndothermic).toBeCloseTo(1 - 0.7475, 4);
  });

  it('reads a widened interval: 5 ± 2 kJ/mol with the interval [−0.2, 10.2] is undetermined and P < 0.975', () => {
    // s = 5.2/1.96 = 2.6531; P = Φ(5/2.6531) = Φ(1.8846) = 0.9703 (Φ(5/2) = 0.9938 would contradict the verdict)
    const r = solutionVerdict(estimate(5, 2, -0.2, 10.2));
    expect(r.verdict).toBe('undetermined');
    expect(r.probabilityEndothermic).toBeCloseTo(0.9703, 4);
  });

  // Tolerance 2e-7: Φ is the Abramowitz–Stegun 7.1.26 form, |error| < 1.5e-7.
  it('never disagrees with its own verdict, for any interval round the value', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -200, max: 200, noNaN: true }),
        fc.double({ min: 0.01, max: 50, noNaN: true }),
        fc.double({ min: 1, max: 4, noNaN: true }),
        fc.double({ min: 1, max: 4, noNaN: true }),
        (value, u, kLow, kHigh) => {
          const r = solutionVerdict(estimate(value, u, value - kLow * u, value + kHigh * u));
          if (r.verdict === 'endothermic') expect(r.probabilityEndothermic).toBeGreaterThanOrEqual(0.975 - 2e-7);
          else if (r.verdict === 'exothermic') expect(r.probabilityEndothermic).toBeLessThanOrEqual(0.025 + 2e-7);
          else {
            expect(r.probabilityEndothermic).toBeGreaterThanOrEqual(0.025 - 2e-7);
            expect(r.probabilityEndothermic).toBeLessThanOrEqual(0.975 + 2e-7);
          }
        },
      ),
    );
  });

  it('uses the standard normal distribution', () => {
    expect(normalCdf(1.959963984540054)).toBeCloseTo(0.975, 6);
  });
});
