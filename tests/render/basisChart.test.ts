// The chart of every basis of one salt: a row per estimate after the best, each bar in the colour its 95 % interval
// calls for, and the axis holding zero.
import { describe, expect, it } from 'vitest';
import { dissolve } from '../../src/index.js';
import { basisChart } from '../../src/render/basisChart.js';
import { palette } from '../../src/render/palette.js';

/** The bars (6 px wide lines) of a chart, in order, with their colours. */
const bars = (svg: string) => [...svg.matchAll(/<line [^>]*stroke="(#[0-9a-f]{6})" stroke-width="6"/g)].map((m) => m[1]);

describe('basisChart', () => {
  it('draws the best estimate and every basis; NH4NO3 (measured +25.69 kJ/mol, CRC) is endothermic, so cold', () => {
    const r = dissolve('NH4NO3');
    const svg = basisChart(r);
    const colours = bars(svg);
    expect(colours).toHaveLength(r.estimates.length + 1);
    expect(colours[0]).toBe(palette.cold);
    expect(svg).toContain('best (measured)');
    expect(svg).toContain('>0</text>');
  });

  it('draws an exothermic salt hot and an interval across zero as undetermined (CaCl2: −82.8 kJ/mol, CRC)', () => {
    const r = dissolve('CaCl2');
    const colours = bars(basisChart(r));
    expect(colours[0]).toBe(palette.hot);
    const spanning = r.estimates.findIndex((e) => e.low < 0 && e.high > 0);
    expect(spanning).toBeGreaterThanOrEqual(0);
    expect(colours[spanning + 1]).toBe(palette.unsure);
  });
});
