// The model basis: lattice estimate + hydration sum, a small difference of
// two large numbers whose interval must be honest (wide).
import { describe, expect, it } from 'vitest';
import { builtinDataset } from '../../src/data/builtin.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { dissolve } from '../../src/solution/dissolve.js';
import { solutionEnthalpyFromModel } from '../../src/solution/modelSolution.js';
import { makeEstimate } from '../../src/quantity/estimate.js';

const dataset = builtinDataset();

describe('solutionEnthalpyFromModel', () => {
  it('adds the values, and the uncertainties and half-widths in quadrature', () => {
    const L = makeEstimate({ quantity: 'lattice enthalpy', value: 800, u: 10, low: 775, high: 825, unit: 'kJ/mol', basis: 'model', method: 'kapustinskii-corrected' });
    const H = makeEstimate({ quantity: 'hydration', value: -780, u: 2, unit: 'kJ/mol', basis: 'cycle', method: 'formation-enthalpies' });
    const e = solutionEnthalpyFromModel(L, H);
    expect(e.value).toBeCloseTo(20, 12);
    expect(e.u).toBeCloseTo(Math.hypot(10, 2), 12);
    expect(e.high - e.value).toBeCloseTo(Math.hypot(25, 1.959963984540054 * 2), 9);
  });
});

describe('model estimates with the salt’s own values hidden', () => {
  const measured = dataset.records('solution-enthalpies.json').filter((r) => parseSalt(r.formula).water === 0 && parseSalt(r.formula).kind === 'ionic');
  const pairs = measured.flatMap((r) => dissolve(r.formula, { excludeMeasured: true }).estimates.filter((e) => e.basis === 'model').map((e) => ({ r, e })));

  it('exist for most measured salts', () => expect(new Set(pairs.map((p) => p.r.formula)).size).toBeGreaterThan(60));

  it('are wide: their 95 % intervals span tens of kJ/mol, as two large numbers nearly cancel', () => {
    const widths = pairs.map(({ e }) => e.high - e.low).sort((a, b) => a - b);
    expect(widths[Math.floor(widths.length / 2)]!).toBeGreaterThan(30);
  });

  it('hold the CRC value for at least 90 % of (salt, method) pairs', () => {
    const inside = pairs.filter(({ r, e }) => e.low <= r.value && r.value <= e.high);
    expect(inside.length / pairs.length).toBeGreaterThanOrEqual(0.9);
  });

  it('never call the verdict wrongly for more than 2 % of pairs: they say undetermined instead', () => {
    const wrong = pairs.filter(({ r, e }) => (e.low > 0 && r.value < 0) || (e.high < 0 && r.value > 0));
    expect(wrong.length / pairs.length).toBeLessThanOrEqual(0.02);
  });
});
