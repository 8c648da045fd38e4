// dissolveUncached (the bench's timing of the computation itself) must give
// exactly what dissolve gives, and dissolve's kept results must stay shared
// and frozen as before, so that no caller can change what the next one sees.
import { describe, expect, it } from 'vitest';
import { builtinDataset } from '../../src/data/builtin.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { dissolve, dissolveUncached, type DissolveOptions } from '../../src/solution/dissolve.js';
import { enumerate } from '../../src/screen/enumerate.js';

const run = (f: (s: string, o: DissolveOptions) => unknown, formula: string, options: DissolveOptions): string => {
  try {
    return JSON.stringify(f(formula, options));
  } catch (e) {
    return `error ${(e as Error).message}`;
  }
};

describe('dissolveUncached', () => {
  it('gives the same result text as dissolve, for enumerated and table salts, hidden or not, at 25 and 10 °C', () => {
    const dataset = builtinDataset();
    const formulas = enumerate({}, dataset)
      .filter((_, i) => i % 9 === 0)
      .map((s) => s.formula);
    formulas.push('NH4NO3', 'CaCl2·6H2O', 'Na2SO4·10H2O', 'KAl(SO4)2·12H2O', 'CO(NH2)2', 'MgSO4·7H2O');
    for (const formula of formulas) {
      for (const options of [{}, { excludeMeasured: true }, { temperatureC: 10 }, { excludeMeasured: true, temperatureC: 10 }]) {
        expect(run((s, o) => dissolveUncached(s, o, dataset), formula, options), `${formula} ${JSON.stringify(options)}`).toBe(run((s, o) => dissolve(s, o, dataset), formula, options));
      }
    }
  });
  it('keeps dissolve results frozen and shared, and hands out fresh ones without the cache', () => {
    const salt = parseSalt('KNO3');
    const a = dissolve(salt);
    const b = dissolve(salt);
    expect(a.best).toBe(b.best);
    expect(Object.isFrozen(a.best)).toBe(true);
    expect(Object.isFrozen(a.best.notes)).toBe(true);
    const c = dissolveUncached(salt);
    const d = dissolveUncached(salt);
    expect(c.best).not.toBe(d.best);
    expect(c).toEqual(a);
  });
});
