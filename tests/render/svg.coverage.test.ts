// Axis ticks of the shared SVG writer (src/render/svg.ts): steps of 1, 2 or
// 5 × 10ⁿ (the usual "nice numbers" rule of chart axes, common practice),
// and a degenerate range widened so that a single value still gets an axis.
import { describe, expect, it } from 'vitest';
import { niceTicks, tickLabel } from '../../src/render/svg.js';

describe('niceTicks', () => {
  it('covers a range with round steps', () => {
    expect(niceTicks(0, 10)).toEqual({ ticks: [0, 2, 4, 6, 8, 10], domain: [0, 10] });
  });
  it('widens a single value by 10 % on each side', () => {
    const { ticks, domain } = niceTicks(5, 5);
    expect(ticks).toEqual([4.4, 4.6, 4.8, 5, 5.2, 5.4, 5.6]);
    expect(domain[0]).toBeCloseTo(4.4, 12);
    expect(domain[1]).toBeCloseTo(5.6, 12);
  });
  it('widens zero to ±1, and a negative value by 10 % of its size', () => {
    expect(niceTicks(0, 0).ticks).toEqual([-1, -0.5, 0, 0.5, 1]);
    expect(niceTicks(-3, -3).ticks).toEqual([-3.3, -3.2, -3.1, -3, -2.9, -2.8, -2.7]);
  });
  it('labels ticks without floating-point noise and with a true minus', () => {
    expect(tickLabel(0.1 + 0.2)).toBe('0.3');
    expect(tickLabel(-2.5)).toBe('−2.5');
  });
});
