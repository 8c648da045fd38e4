// A candidate's own measured enthalpy takes a cheap path (ownMeasurement.ts);
// it must give the row what merging the value over the tables with
// Dataset.withOverrides gives.
import { describe, expect, it } from 'vitest';
import { builtinDataset, dissolve, parseSalt, screen } from '../../src/index.js';
import { saltRecords } from '../../src/chem/saltRecords.js';

const cases: [string, number, number | undefined][] = [
  ['KNO3', 30.0, 0.5], // measured in the table (CRC): replaced
  ['NaCH3COO·3H2O', 19.0, undefined], // the table spells it its own way; default uncertainty
  ['CaCl2', -80.0, 1.0], // cycle basis in the tables
  ['MgF2', -10.0, 2.0], // cycle and estimates only
  ['Na2S2O3·5H2O', 47.0, 0.4], // a hydrate
  ['KCl', 0.3, 1.0], // an undetermined verdict
];

describe('own measured enthalpy: the cheap path equals the merged dataset', () => {
  for (const [formula, value, u] of cases) {
    it(formula, () => {
      const salt = parseSalt(formula);
      const tableFormula = saltRecords('solution-enthalpies.json', salt)[0]?.formula ?? salt.formula;
      const merged = builtinDataset().withOverrides(
        { 'solution-enthalpies.json': [{ formula: tableFormula, value, unit: 'kJ/mol', uncertainty: u ?? null, source: 'screenInput', fromMemory: false, note: 'given with the candidate in the screening input' }] },
        'screening input',
        { screenInput: { citation: 'x', kind: 'derived' } },
      );
      const reference = JSON.parse(JSON.stringify(dissolve(salt, {}, merged)));
      const row = JSON.parse(JSON.stringify(screen([{ formula, measuredEnthalpy: value, ...(u !== undefined ? { measuredUncertainty: u } : {}) }]).rows[0]));
      for (const field of ['formula', 'salt', 'best', 'verdict', 'probabilityEndothermic', 'perGram', 'hydration', 'temperature']) {
        expect(row[field], field).toEqual(reference[field]);
      }
      // The other estimates are those of the unchanged tables: the same methods as with a merged dataset, and the same
      // values outside the anchored basis, but with the anchored calibrations (floors and bracket scales) of the published
      // tables. (A merged dataset recalibrates them with the user's value among the measured salts, so one outlying value —
      // KCl at 0.3 kJ/mol against 17.22 in the CRC table — would move and widen the anchored estimates of the very salt it
      // was given for.)
      type E = { basis: string; method: string; value: number; u: number };
      const plain = JSON.parse(JSON.stringify(dissolve(salt))).estimates.filter((e: E) => e.basis !== 'measured');
      expect(row.estimates.slice(1)).toEqual(plain);
      // The same bases and methods. Values agree to a small part of their uncertainty: the anchored estimates' bracket
      // scale and floors are fitted over every measured salt, so a merged dataset moves them a little with the user's value.
      const key = (e: E) => `${e.basis}/${e.method}`;
      expect(row.estimates.map(key).sort()).toEqual(reference.estimates.map(key).sort());
      for (const e of reference.estimates as E[]) {
        const mine = (row.estimates as E[]).find((r) => key(r) === key(e))!;
        expect(Math.abs(mine.value - e.value), key(e)).toBeLessThanOrEqual(e.basis === 'anchored' ? 0.05 * e.u : 1e-6);
      }
      expect(row.notes.slice(0, reference.notes.length)).toEqual(reference.notes);
    });
  }

  it('is cheap: a thousand rows with their own values take well under the time of a merged dataset each', () => {
    const rows = Array.from({ length: 1000 }, (_, i) => ({ formula: ['KNO3', 'NaCl', 'KCl', 'NH4Cl'][i % 4]!, measuredEnthalpy: 10 + i / 100 }));
    const started = Date.now();
    const { summary } = screen(rows);
    expect(summary.computed).toBe(1000);
    // Not a speed target (see npm run bench); a merged dataset per row would take minutes here.
    expect(Date.now() - started).toBeLessThan(30_000);
  });
});
