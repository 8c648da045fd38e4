// The warmer chart (src/render/warmerCourse.ts): the course of a latent-heat warmer with its plateau marked.
import { describe, expect, it } from 'vitest';
import { latentWarmer, warmerCourseSvg } from '../../src/index.js';

describe('warmer chart', () => {
  it('draws the course with the plateau band, its end and the burn threshold', () => {
    const w = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100 }, { samples: 60 });
    const svg = warmerCourseSvg(w, { title: 'Sodium acetate warmer' });
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('<title>Sodium acetate warmer</title>');
    expect(svg).toMatch(/plateau 58 °C \(95 % 57–59\) for about 21\.\d min; 43 % crystallised at once/);
    expect(svg).toContain('contact-burn threshold 44 °C (ISO 13732-1)');
    expect(svg).toMatch(/burn threshold 44 °C: \d+(\.\d)? min above/);
    expect(svg.match(/<polyline/g)).toHaveLength(1);
    // 60 samples plus the jump from the start temperature at the trigger
    expect(svg.match(/<polyline points="([^"]*)"/)![1]!.split(' ')).toHaveLength(61);
  });
});

describe('warmer chart input', () => {
  it('refuses what is not a result of latentWarmer, naming it', () => {
    expect(() => warmerCourseSvg(null as never)).toThrow(/warmer must be the result of latentWarmer/);
    expect(() => warmerCourseSvg({ points: [] } as never)).toThrow(/not a whole result of latentWarmer/);
  });
});
