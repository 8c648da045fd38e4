import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeEstimate, probabilityPositive, roundEstimate } from '../../src/quantity/estimate.js';
import { normalCdf } from '../../src/numeric/normalCdf.js';
import { roundToUncertainty } from '../../src/quantity/rounding.js';
import { exactSum } from '../../src/quantity/exactSum.js';
import { IonheatError } from '../../src/error.js';

const base = { quantity: 'q', unit: 'kJ/mol', basis: 'model' as const, method: 'm' };

describe('makeEstimate', () => {
  it('builds the 95 % interval as value ± 1.96 u (normal, GUM G.3)', () => {
    const e = makeEstimate({ ...base, value: 10, u: 1 });
    expect(e.low).toBeCloseTo(10 - 1.959964, 6);
    expect(e.high).toBeCloseTo(10 + 1.959964, 6);
  });
  it('rejects NaN, infinities, negative u and intervals that miss the value', () => {
    for (const bad of [{ value: Number.NaN, u: 1 }, { value: 1, u: Number.POSITIVE_INFINITY }, { value: 1, u: -1 }, { value: 1, u: 1, low: 2, high: 3 }]) {
      expect(() => makeEstimate({ ...base, ...bad })).toThrow(IonheatError);
    }
  });
  it('never reports −0 and sorts and deduplicates sources', () => {
    const e = makeEstimate({ ...base, value: -0, u: 0, sources: ['b', 'a', 'b'] });
    expect(Object.is(e.value, -0)).toBe(false);
    expect(e.sources).toEqual(['a', 'b']);
  });
});

describe('rounding (GUM 7.2.6: u to two significant digits, value to the same place)', () => {
  it.each([
    [787.3456, 1.2345, 787.3, 1.2],
    [-3.14159, 0.0271, -3.142, 0.027],
    [25.6873, 0.4321, 25.69, 0.43],
    [1234.5, 0.0996, 1234.5, 0.1],
    [12345, 678, 12350, 680],
    [2.675, 0.011, 2.675, 0.011],
    [2.6755, 0.011, 2.676, 0.011],
  ])('%d ± %d → %d ± %d', (value, u, v, uu) => {
    const r = roundToUncertainty(value, u);
    expect(r.value).toBe(v);
    expect(r.u).toBe(uu);
  });
  it('rounds the interval ends to the same place', () => {
    const r = roundEstimate(makeEstimate({ ...base, value: 25.6873, u: 0.4321 }));
    expect([r.low, r.value, r.high, r.u]).toEqual([24.84, 25.69, 26.53, 0.43]);
  });
  it('keeps the rounded value within half a last digit of the true value', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: 1e-6, max: 1e5, noNaN: true }), (v, u) => {
        const r = roundToUncertainty(v, u);
        expect(Math.abs(r.value - v)).toBeLessThanOrEqual(0.5 * 10 ** r.exponent * (1 + 1e-9) + Math.abs(v) * 1e-15);
        expect(Number(r.u.toPrecision(2))).toBe(r.u);
      }),
    );
  });
});

describe('exactSum', () => {
  it('adds tabulated decimals exactly (NBS 1982 NaCl cycle: 3.874 kJ/mol)', () => {
    expect(exactSum([{ coefficient: 1, value: -240.12 }, { coefficient: 1, value: -167.159 }, { coefficient: -1, value: -411.153 }])).toBe(3.874);
    expect(exactSum([{ coefficient: 1, value: 0.1 }, { coefficient: 1, value: 0.2 }])).toBe(0.3);
  });
});

describe('normal distribution', () => {
  it('matches tabulated Φ values (Abramowitz & Stegun table 26.1)', () => {
    expect(normalCdf(0)).toBeCloseTo(0.5, 7);
    expect(normalCdf(1)).toBeCloseTo(0.841345, 6);
    expect(normalCdf(-1.959964)).toBeCloseTo(0.025, 6);
    expect(normalCdf(3)).toBeCloseTo(0.998650, 6);
  });
  it('gives the probability that the true value exceeds zero', () => {
    expect(probabilityPositive({ value: 0, u: 1 })).toBeCloseTo(0.5, 6);
    expect(probabilityPositive({ value: 2, u: 1 })).toBeCloseTo(0.97725, 5);
    expect(probabilityPositive({ value: -1, u: 0 })).toBe(0);
  });
});
