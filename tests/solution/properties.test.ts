// Property tests of dissolve(): a wider input uncertainty never narrows an
// output interval, and results do not depend on the order of the records in
// the data tables.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Dataset, type Tables } from '../../src/data/dataset.js';
import { builtinDataset } from '../../src/data/builtin.js';
import type { TableName } from '../../src/data/schemas.js';
import { dissolve, type DissolveResult } from '../../src/solution/dissolve.js';
import { builtinTables, shuffledDataset } from '../hydration/helpers.js';

const base = builtinDataset();

/** Salts with something to compute: every measured or crystal-tabulated formula. */
const formulas = [...new Set([...base.records('solution-enthalpies.json').map((r) => r.formula), ...base.records('compound-formation.json').filter((r) => r.phase === 'cr').map((r) => r.formula)])].filter((f) => f !== 'H2O');

const UNCERTAIN_TABLES: TableName[] = ['solution-enthalpies.json', 'compound-formation.json', 'ion-formation-aq.json', 'hydration-enthalpies.json', 'ion-formation-gas.json', 'heat-capacities.json', 'ion-heat-capacities-aq.json'];

/** The built-in tables with one table's uncertainties (each record's and the default) multiplied by k ≥ 1. */
function widened(name: TableName, k: number): Dataset {
  const tables = builtinTables() as Record<string, any>;
  const t = tables[name];
  tables[name] = {
    ...t,
    ...(t.defaultUncertainty !== undefined ? { defaultUncertainty: t.defaultUncertainty * k } : {}),
    records: t.records.map((r: any) => (typeof r.uncertainty === 'number' ? { ...r, uncertainty: r.uncertainty * k } : r)),
  };
  return new Dataset(tables as Tables, base.sources, `widened ${name}`);
}

function tryDissolve(formula: string, excludeMeasured: boolean, dataset: Dataset): DissolveResult | undefined {
  try {
    return dissolve(formula, { excludeMeasured }, dataset);
  } catch {
    return undefined;
  }
}

describe('a wider input uncertainty never narrows an output interval', () => {
  const datasets = new Map<string, Dataset>();
  it('holds for every estimate of random salts, tables and factors', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...formulas),
        fc.constantFrom(...UNCERTAIN_TABLES),
        fc.constantFrom(1.5, 3, 10),
        fc.boolean(),
        fc.constantFrom(25, 5, 38),
        (formula, table, k, excludeMeasured, temperatureC) => {
          const key = `${table}|${k}`;
          if (!datasets.has(key)) datasets.set(key, widened(table, k));
          const wide = datasets.get(key)!;
          let narrow: DissolveResult | undefined;
          let broad: DissolveResult | undefined;
          try {
            narrow = dissolve(formula, { excludeMeasured, temperatureC }, base);
            broad = dissolve(formula, { excludeMeasured, temperatureC }, wide);
          } catch {
            return; // no estimate on either
          }
          for (const e of narrow.estimates) {
            const w = broad.estimates.find((x) => x.basis === e.basis && x.method === e.method);
            expect(w, `${formula}: ${e.basis}/${e.method} disappeared`).toBeDefined();
            expect(w!.low, `${formula} ${e.method} low`).toBeLessThanOrEqual(e.low + 1e-9);
            expect(w!.high, `${formula} ${e.method} high`).toBeGreaterThanOrEqual(e.high - 1e-9);
          }
          for (const [a, b] of [
            [narrow.hydration?.absolute, broad.hydration?.absolute],
            [narrow.hydration?.conventional, broad.hydration?.conventional],
          ]) {
            if (a && b) {
              expect(b.low).toBeLessThanOrEqual(a.low + 1e-9);
              expect(b.high).toBeGreaterThanOrEqual(a.high - 1e-9);
            }
          }
        },
      ),
      { numRuns: 150, seed: 20240611 },
    );
  });
});

/** Equal, numbers to a relative 1e-12: sums over a table in another order may differ in the last bits of a float. */
function expectSame(a: unknown, b: unknown, where: string): void {
  if (typeof a === 'number' && typeof b === 'number') {
    expect(Math.abs(a - b), where).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(a), Math.abs(b)));
  } else if (Array.isArray(a) && Array.isArray(b)) {
    expect(a.length, where).toBe(b.length);
    a.forEach((x, i) => expectSame(x, b[i], `${where}[${i}]`));
  } else if (a && b && typeof a === 'object' && typeof b === 'object') {
    expect(Object.keys(a).sort(), where).toEqual(Object.keys(b).sort());
    for (const k of Object.keys(a)) expectSame((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${where}.${k}`);
  } else {
    expect(a, where).toEqual(b);
  }
}

describe('results do not depend on the order of the data tables', () => {
  // ions.json is kept in order: its order is the canonical order of ions in a formula (DEVELOPERS.md).
  it.each([7, 1234])('seed %i: every salt gives the same result as with the built-in order', (seed) => {
    const shuffled = shuffledDataset(seed, ['ions.json']);
    for (const formula of formulas) {
      for (const excludeMeasured of [false, true]) {
        expectSame(tryDissolve(formula, excludeMeasured, shuffled), tryDissolve(formula, excludeMeasured, base), `${formula} ${excludeMeasured}`);
      }
    }
  });
});
