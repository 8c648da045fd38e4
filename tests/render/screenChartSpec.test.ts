// Issue 12, item 5: the screen chart states its inputs and draws the spec's threshold and the fill's start from the
// screen result itself, as a library caller gets it, not only when the command line passes marks.
import { describe, expect, it } from 'vitest';
import { intervalChart, screen } from '../../src/index.js';

const count = (svg: string, needle: string) => svg.split(needle).length - 1;

describe('the screen chart draws the spec and the fill from the result', () => {
  const spec = 'fill.finalTemperature.value > 40 and fill.finalTemperature.high < 60';
  const result = screen(['CaCl2', 'MgSO4', 'Na2CO3', 'KNO3'], { direction: 'heat', fill: '30:100@20', spec });
  it('the result carries the thresholds the spec sets on the objective, with the comparison as written', () => {
    expect(result.settings.specThresholds).toEqual([
      { at: 40, label: 'spec: fill.finalTemperature.value > 40' },
      { at: 60, label: 'spec: fill.finalTemperature.high < 60' },
    ]);
  });
  it('draws each threshold once and the start temperature of the fill, with no marks passed', () => {
    const svg = intervalChart(result);
    expect(count(svg, '>spec: fill.finalTemperature.value &gt; 40<')).toBe(1);
    expect(count(svg, '>spec: fill.finalTemperature.high &lt; 60<')).toBe(1);
    expect(count(svg, 'start 20 °C (fill 30 g salt in 100 g water)')).toBe(1);
    // marks the caller passes as well are not drawn twice
    const again = intervalChart(result, { marks: [{ at: 40, label: 'spec: fill.finalTemperature.value > 40' }, { at: 44, label: 'burn threshold 44 °C' }] });
    expect(count(again, '>spec: fill.finalTemperature.value &gt; 40<')).toBe(1);
    expect(count(again, 'burn threshold 44 °C')).toBe(1);
  });
  it('draws one line per position: the caller’s own words for a threshold or the start replace the automatic label', () => {
    const worded = intervalChart(result, { marks: [{ at: 40, label: 'warm enough ≥ 40 °C' }, { at: 20, label: 'start 20 °C' }] });
    expect(count(worded, 'warm enough ≥ 40 °C')).toBe(1);
    expect(worded).not.toContain('>spec: fill.finalTemperature.value &gt; 40<');
    expect(count(worded, '>start 20 °C<')).toBe(1);
    expect(worded).not.toContain('start 20 °C (fill');
    // every drawn line is a dashed reference line; three positions (20, 40, 60), three lines
    expect(count(worded, 'stroke-dasharray')).toBe(count(intervalChart(result), 'stroke-dasharray'));
  });
  it('draws no threshold without a spec, and no start line when the objective is not the fill temperature', () => {
    const plain = intervalChart(screen(['CaCl2', 'MgSO4'], { direction: 'heat' }));
    expect(plain).not.toContain('spec:');
    expect(plain).not.toContain('start 20');
    const enthalpy = screen(['KNO3', 'NH4Cl'], { objective: 'enthalpy', fill: '30:100@20', spec: 'best.value > 10' });
    const svg = intervalChart(enthalpy);
    expect(svg).toContain('spec: best.value &gt; 10');
    expect(svg).not.toContain('start 20 °C (fill');
  });
});
