// Warmer candidates ranked by the standard warmer (100 g of hydrate triggered at 20 °C): plateau temperature,
// heat per gram of fill and plateau duration (issue 16). Orders follow from the warmer-melts table (Lane 1983,
// Abhat 1983; from memory) and the model, not from dissolution.
import { describe, expect, it } from 'vitest';
import { screen } from '../../src/index.js';

const candidates = ['NaCH3COO·3H2O', 'Na2S2O3·5H2O', 'Na2HPO4·12H2O', 'Na2SO4·10H2O', 'CaCl2·6H2O', 'KNO3', 'MgSO4·7H2O'];
const order = (objective: 'plateau-temperature' | 'warmer-heat-per-gram' | 'plateau-duration') =>
  screen(candidates, { objective })
    .rows.filter((r) => r.rank !== undefined)
    .sort((a, b) => a.rank! - b.rank!)
    .map((r) => r.formula);

describe('warmer objectives', () => {
  it('plateau-temperature: melting points 58 > 48 > 35 > 32.4 > 29.8 °C, highest first', () => {
    expect(order('plateau-temperature')).toEqual(['NaCH3COO·3H2O', 'Na2S2O3·5H2O', 'Na2HPO4·12H2O', 'Na2SO4·10H2O', 'CaCl2·6H2O']);
  });
  it('warmer-heat-per-gram: the phosphate (281 J/g, Abhat 1983) first, the thiosulfate (201 J/g) last', () => {
    const ranked = order('warmer-heat-per-gram');
    expect(ranked[0]).toBe('Na2HPO4·12H2O');
    expect(ranked.at(-1)).toBe('Na2S2O3·5H2O');
  });
  it('plateau-duration: longest first, and the objective is the row warmer\'s plateau duration in s', () => {
    const { rows } = screen(candidates, { objective: 'plateau-duration' });
    const ranked = rows.filter((r) => r.rank !== undefined).sort((a, b) => a.rank! - b.rank!);
    for (let i = 1; i < ranked.length; i++) expect(ranked[i]!.objective!.value).toBeLessThanOrEqual(ranked[i - 1]!.objective!.value);
    expect(ranked[0]!.objective!.unit).toBe('s');
    expect(ranked[0]!.warmer!.plateauDuration.value).toBe(ranked[0]!.objective!.value);
  });
  it('a salt without melt data gets no rank and a note saying why', () => {
    const { rows } = screen(candidates, { objective: 'plateau-temperature' });
    const kno3 = rows.find((r) => r.formula === 'KNO3')!;
    expect(kno3.rank).toBeUndefined();
    expect(kno3.notes!.some((n) => n.startsWith('no standard warmer (100 g triggered at 20 °C): KNO3 is not a salt hydrate'))).toBe(true);
  });
  it('a spec can read the warmer fields when ranking by a warmer objective, and is told when it cannot', () => {
    const { rows } = screen(candidates, { objective: 'plateau-temperature', spec: 'has(warmer) and warmer.plateau.low > 40' });
    expect(rows.filter((r) => r.spec?.holds).map((r) => r.formula)).toEqual(['NaCH3COO·3H2O', 'Na2S2O3·5H2O']);
    expect(() => screen(['KNO3'], { spec: 'warmer.plateau.value > 40' })).toThrow(/warmer/);
  });
});
