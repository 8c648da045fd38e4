// The energy-level diagram of a Born–Haber cycle: a standalone SVG with a
// title, kJ/mol, every step labelled, arrows up for endothermic steps and
// down for exothermic ones (common practice for these diagrams).
import { describe, expect, it } from 'vitest';
import { bornHaberCycle, cycleDiagram } from '../../src/index.js';
import { palette } from '../../src/render/palette.js';

/** Arrowheads as drawn: colour, and whether the tip points up. */
function arrowheads(svg: string): { fill: string; up: boolean }[] {
  const out: { fill: string; up: boolean }[] = [];
  for (const m of svg.matchAll(/<path d="M([\d.-]+) ([\d.-]+) L([\d.-]+) ([\d.-]+) L([\d.-]+) ([\d.-]+) Z" fill="([^"]+)"/g)) {
    out.push({ fill: m[7]!, up: Number(m[6]) < Number(m[2]) });
  }
  return out;
}

describe('cycleDiagram', () => {
  for (const [formula, options] of [
    ['NaCl', {}],
    ['CaCl2', {}],
    ['MgO', { solve: 'electron-affinity', latticeEnthalpy: { value: 3792, u: 20 } }],
    ['KNO3', {}],
  ] as const) {
    it(`${formula}: one arrow per step, up when endothermic, down when exothermic`, () => {
      const cycle = bornHaberCycle(formula, options as never);
      const svg = cycleDiagram(cycle);
      expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
      expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
      expect(svg).toContain('<title>Born–Haber cycle of');
      expect(svg).toContain('kJ/mol');
      const heads = arrowheads(svg);
      expect(heads).toHaveLength(cycle.steps.length);
      cycle.steps.forEach((step, i) => {
        const head = heads[i]!;
        // The solved step's direction follows its value too, drawn in the solved colour; endothermic is the cold colour in every chart.
        expect(head.up, step.label).toBe(step.value > 0);
        expect(head.fill, step.label).toBe(step.solved ? palette.solved : step.value > 0 ? palette.cold : palette.hot);
        expect(svg).toContain(step.label.replace(/&/g, '&amp;'));
      });
    });
  }
});
