// The ranked interval chart: structure checks at 10 and at 80 candidates. (Its
// looks were checked by rendering both sizes to PNG in headless Chromium.)
import { describe, expect, it } from 'vitest';
import { enumerate, intervalChart, screen } from '../../src/index.js';

const count = (svg: string, pattern: RegExp): number => (svg.match(pattern) ?? []).length;

describe('intervalChart', () => {
  const ten = screen(['KNO3', 'NH4Cl', 'NaCl', 'CaCl2·6H2O', 'CaCl2', 'MgSO4', 'CO(NH2)2', 'KCl', { formula: 'LiNO3', measuredEnthalpy: 0.5, measuredUncertainty: 1 }, 'Xy']);

  it('draws one row per ranked candidate, with its interval, marker and numbers', () => {
    const svg = intervalChart(ten);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg).toContain('<title>Enthalpy of solution — candidates ranked for a cold pack</title>');
    for (const label of ['1. KNO₃', 'NH₄Cl', 'CaCl₂·6H₂O', 'MgSO₄']) expect(svg).toContain(label);
    // Nine computed rows: nine value labels of the form "34.89  [34.50, 35.28]".
    expect(count(svg, /\d  \[[−\d.]+, [−\d.]+\]</g)).toBe(9);
    expect(svg).toContain('34.89  [34.50, 35.28]');
    expect(svg).toContain('9 of 10 candidates drawn; 1 could not be computed.');
  });

  it('tells the basis by marker shape, with a legend of the bases shown', () => {
    const svg = intervalChart(ten);
    expect(svg).toContain('>measured<');
    expect(svg).toContain('>formation-enthalpy cycle<');
    // Circles for measured values, squares for cycle values (plus the legend's own marker of each).
    const measured = ten.rows.filter((r) => r.objective?.basis === 'measured').length;
    expect(count(svg, /<circle /g)).toBe(measured + 1);
  });

  it('marks zero and sets undetermined verdicts apart in their own shaded, dashed group', () => {
    const svg = intervalChart(ten);
    expect(svg).toContain('cools (endothermic) →');
    expect(svg).toContain('Undetermined — the 95 % interval of ΔsolH spans zero');
    expect(svg).toMatch(/<text[^>]*font-style="italic"[^>]*>\d+\. LiNO₃<\/text>/);
    expect(svg).toMatch(/stroke-dasharray="5 3"/);
    expect(svg).toContain('Works the other way (heats)');
  });

  it('stays legible at 80 candidates: smaller rows, every label kept, axis top and bottom', () => {
    const all = screen(enumerate());
    const eighty = { settings: all.settings, rows: all.rows.filter((r) => r.rank !== undefined && r.rank <= 80) };
    const svg = intervalChart(eighty);
    const height = Number(/height="(\d+(?:\.\d+)?)"/.exec(svg)![1]);
    expect(height).toBeGreaterThan(80 * 15);
    expect(height).toBeLessThan(80 * 20 + 400);
    expect(count(svg, /font-size="11"/g)).toBeGreaterThanOrEqual(160);
    for (let rank = 1; rank <= 80; rank++) expect(svg).toContain(`>${rank}. `);
    // The zero tick appears on both axes.
    expect(count(svg, />0<\/text>/g)).toBe(2);
  });

  it('draws at most maxRows rows and says how many were left out', () => {
    const all = screen(enumerate({ cationCharges: [1], anionCharges: [1] }));
    const svg = intervalChart(all, { maxRows: 20 });
    const drawn = count(svg, /\d  \[[−\d.]+, [−\d.]+\]</g);
    expect(drawn).toBe(20);
    expect(svg).toMatch(/more computed candidates? not drawn/);
  });

  it('marks reference lines and labels the axis with the objective’s unit', () => {
    const r = screen(['KNO3', 'NH4Cl'], { fill: '40:80@22' });
    const svg = intervalChart(r, { marks: [{ at: 5, label: 'target ≤ 5 °C' }] });
    expect(svg).toContain('target ≤ 5 °C');
    expect(svg).toContain('Temperature the standard fill reaches (°C)');
  });

  it('keeps one wild interval from squeezing the others: its bar runs past the axis and ends in an arrow', () => {
    const rows = [
      ...['KNO3', 'NH4Cl', 'NaCl', 'KCl', 'NH4NO3', 'CO(NH2)2', 'NaCH3COO·3H2O', 'CsCl', 'RbCl', 'KBr', 'NaBr', 'KI'],
      { formula: 'LiF', measuredEnthalpy: 5, measuredUncertainty: 300 },
    ];
    const svg = intervalChart(screen(rows));
    expect(svg).toContain('An arrow at the end of a bar marks an interval that runs past the axis');
    // The axis spans the values, not ±600 kJ/mol.
    const ticks = [...svg.matchAll(/class="small muted" text-anchor="middle">([−\d.]+)</g)].map((m) => Number(m[1]!.replace('−', '-')));
    expect(Math.min(...ticks)).toBeGreaterThan(-100);
    expect(Math.max(...ticks)).toBeLessThan(100);
    expect(svg).toContain('10  [−580, 590]'); // 5 ± 588, rounded to the tens that u = 300 allows
  });

  it('escapes every text it draws', () => {
    const svg = intervalChart(ten, { title: 'a <b> & "c"' });
    expect(svg).toContain('a &lt;b&gt; &amp; &quot;c&quot;');
  });
});
