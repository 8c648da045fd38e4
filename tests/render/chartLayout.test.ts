// Every chart, over varied inputs: no two labels overlap and none runs off the drawing (boxes estimated with the
// charts' own, wide-leaning metrics; tests/render/chartPng.test.ts repeats the check with a real browser's boxes),
// one meaning per colour in every chart, our own type, references in the legends, and the inputs stated.
import { describe, expect, it } from 'vitest';
import { chartFixtures } from './chartFixtures.js';
import { overlappingTexts, textsOutside } from './svgTextBoxes.js';
import { fontStack, palette } from '../../src/render/palette.js';

const charts = chartFixtures();

describe('chart layout', () => {
  for (const { name, svg } of charts) {
    it(`${name}: no two labels overlap, none runs off the drawing`, () => {
      expect(overlappingTexts(svg)).toEqual([]);
      expect(textsOutside(svg)).toEqual([]);
      expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    });
  }

  it('uses the palette only, and our own font stack', () => {
    const allowed = new Set<string>(Object.values(palette));
    for (const { name, svg } of charts) {
      for (const m of svg.matchAll(/(?:fill|stroke)="(#[0-9a-fA-F]{3,6})"/g)) expect(allowed.has(m[1]!), `${name}: ${m[1]}`).toBe(true);
      expect(svg).toContain(`font-family:${fontStack}`);
    }
    expect(fontStack).not.toMatch(/system-ui|-apple-system|Segoe|Roboto|Helvetica/);
  });

  it('draws endothermic / cooling in the cold colour and exothermic / heating in the hot colour in every chart', () => {
    const get = (n: string) => charts.find((c) => c.name === n)!.svg;
    // Cycle: the up (endothermic) key line is cold, the down (exothermic) one hot.
    expect(get('cycle-NaCl-lattice')).toMatch(new RegExp(`stroke="${palette.cold}"[^>]*/><text[^>]*>up: endothermic`));
    expect(get('cycle-NaCl-lattice')).toMatch(new RegExp(`stroke="${palette.hot}"[^>]*/><text[^>]*>down: exothermic`));
    // Pack curves and time courses: a cold pack's curve is cold, a hot pack's hot.
    expect(get('curve-NH4NO3-cold-target')).toMatch(new RegExp(`<polyline[^>]*stroke="${palette.cold}"`));
    expect(get('curve-CaCl2-hot-boiling')).toMatch(new RegExp(`<polyline[^>]*stroke="${palette.hot}"`));
    expect(get('course-NH4NO3-cold-band')).toMatch(new RegExp(`<polyline[^>]*stroke="${palette.cold}"`));
    expect(get('course-CaCl2-hot-band')).toMatch(new RegExp(`<polyline[^>]*stroke="${palette.hot}"`));
    // Screen: the "cools" hint is cold and the "heats" hint hot.
    const hint = get('screen-heat-per-gram-outliers');
    expect(hint).toMatch(new RegExp(`fill="${palette.cold}"[^>]*>cools \\(endothermic\\)`));
  });

  it('the cycle legend gives references, not source keys, and says which sign the solved step carries', () => {
    const svg = charts.find((c) => c.name === 'cycle-MgO-electron-affinity')!.svg;
    expect(svg).toContain('Cox, J. D.; Wagman, D. D.; Medvedev, V. A. CODATA Key Values for Thermodynamics');
    expect(svg).not.toMatch(/\[(cox1989|crcIonization|wagman1982)\]/);
    // EA = −746.6 kJ/mol (energy released); the attachment step drawn is +746.6 = −EA.
    expect(svg).toMatch(/the electron affinity: EA = −\d+\.\d ± \d+ kJ\/mol/);
    expect(svg).toMatch(/the step drawn, ⑥, is \+\d+\.\d = −EA/);
  });

  it('every chart states its inputs: fill, start and threshold', () => {
    const get = (n: string) => charts.find((c) => c.name === n)!.svg;
    expect(get('screen-fill-spec')).toContain('fill: 30 g of each salt in 100 g water, start 22 °C; spec: fill.finalTemperature.value &lt; 12');
    expect(get('screen-fill-spec')).toContain('>spec: fill.finalTemperature.value &lt; 12<');
    expect(get('screen-hot-enthalpy')).toContain('no standard fill; no spec');
    expect(get('course-NH4NO3-cold-band')).toContain('Fill: 60 g NH₄NO₃ in 100 g water; start 20 °C');
    expect(get('course-NH4NO3-cold-band')).toContain('cold-injury limit 0 °C');
    expect(get('course-CaCl2-hot-band')).toContain('contact-burn threshold 44 °C (ISO 13732-1)');
    expect(get('curve-NH4NO3-cold-target')).toContain('Fill: NH₄NO₃ in 100 g water; start 22 °C; target 5 °C');
  });

  it('keeps the axis on the candidates that matter: outliers are clipped and marked', () => {
    const svg = charts.find((c) => c.name === 'screen-heat-per-gram-outliers')!.svg;
    const ticks = [...svg.matchAll(/class="small muted" text-anchor="middle">([−\d.]+)</g)].map((m) => Number(m[1]!.replace('−', '-')));
    // KNO3 +345 J/g, NH4NO3 +321 J/g, NaCl +66 J/g (measured) must stand apart: the axis is not stretched to ±5000 J/g.
    expect(Math.max(...ticks) - Math.min(...ticks)).toBeLessThan(2000);
    expect(svg).toMatch(/beyond the axis|runs past the axis/);
  });
});
