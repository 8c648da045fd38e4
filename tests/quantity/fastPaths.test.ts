// The fast paths of exactSum (integer arithmetic) and fixedDecimal (notes'
// numbers) must give exactly what the plain forms give: decimal.js sums and
// Number.prototype.toFixed. Checked here on the kinds of numbers the tables
// and estimators produce, and on random doubles.
import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { exactSum, type Term } from '../../src/quantity/exactSum.js';
import { fixedDecimal } from '../../src/quantity/fixedDecimal.js';
import { makeEstimate } from '../../src/quantity/estimate.js';

function decimalSum(terms: readonly Term[]): number {
  let total = new Decimal(0);
  for (const { coefficient, value } of terms) total = total.plus(new Decimal(value).times(coefficient));
  return total.toNumber();
}

/** A tabulated-looking number: up to 9 significant digits, 0–4 decimal places. */
const tabulated = fc.tuple(fc.integer({ min: -999_999_999, max: 999_999_999 }), fc.integer({ min: 0, max: 4 })).map(([m, k]) => m / 10 ** k);
const computed = fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true });
const coefficient = fc.oneof(fc.integer({ min: -12, max: 12 }), fc.constantFrom(0.5, 1.5, -0.5, 2.5));

describe('exactSum fast paths', () => {
  it('equals the decimal.js sum for tabulated values (3.874 stays 3.874)', () => {
    expect(exactSum([{ coefficient: 1, value: 1.1 }, { coefficient: 1, value: 2.774 }])).toBe(3.874);
    fc.assert(fc.property(fc.array(fc.record({ coefficient, value: tabulated }), { maxLength: 8 }), (terms) => Object.is(exactSum(terms) + 0, decimalSum(terms) + 0)), { numRuns: 5000 });
  });
  it('equals the decimal.js sum for computed doubles and mixed terms', () => {
    fc.assert(fc.property(fc.array(fc.record({ coefficient, value: fc.oneof(computed, tabulated) }), { maxLength: 8 }), (terms) => Object.is(exactSum(terms) + 0, decimalSum(terms) + 0)), { numRuns: 5000 });
  });
  it('equals the decimal.js sum for very large, very small and long numbers', () => {
    const odd = fc.oneof(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e25, max: 1e25 }), fc.double({ noNaN: true, min: -1e-12, max: 1e-12 }));
    fc.assert(fc.property(fc.array(fc.record({ coefficient: fc.oneof(coefficient, fc.double({ min: -1e3, max: 1e3, noNaN: true })), value: odd }), { maxLength: 6 }), (terms) => Object.is(exactSum(terms) + 0, decimalSum(terms) + 0)), { numRuns: 3000 });
  });
});

describe('fixedDecimal', () => {
  it('writes what toFixed writes', () => {
    for (const [x, d] of [[0.05, 1], [-0.04, 1], [-0, 1], [2.5, 0], [1.005, 2], [-783.507, 1], [1e9, 2], [123.4567891, 6]] as const) expect(fixedDecimal(x, d)).toBe(x.toFixed(d));
    fc.assert(fc.property(fc.oneof(computed, tabulated, fc.double({ noNaN: true, noDefaultInfinity: true })), fc.integer({ min: 0, max: 8 }), (x, d) => fixedDecimal(x, d) === x.toFixed(d)), { numRuns: 20000 });
  });
});

describe('makeEstimate sources', () => {
  it('sorts and deduplicates as [...new Set(list)].sort() does', () => {
    fc.assert(fc.property(fc.array(fc.string({ maxLength: 4 }), { maxLength: 10 }), (list) => {
        expect(makeEstimate({ quantity: 'q', unit: 'kJ/mol', basis: 'model', method: 'm', value: 1, u: 1, sources: list }).sources).toEqual([...new Set(list)].sort());
      }),
    );
  });
});
