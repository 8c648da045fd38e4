// The SVG charts: standalone documents with a title, axis labels and units, and the marks they promise.
import { describe, expect, it } from 'vitest';
import { packCurveSvg, packRatioCurve, packTimeCourse, timeCourseSvg } from '../../src/index.js';

/** Every opened element is closed, in order (a small well-formedness check). */
function wellFormed(svg: string): boolean {
  const stack: string[] = [];
  for (const m of svg.matchAll(/<(\/?)([a-zA-Z]+)([^>]*?)(\/?)>/g)) {
    const [, closing, name, , selfClosing] = m;
    if (selfClosing) continue;
    if (closing) {
      if (stack.pop() !== name) return false;
    } else stack.push(name!);
  }
  return stack.length === 0;
}

describe('temperature–ratio chart', () => {
  const curve = packRatioCurve({ solids: [{ formula: 'KNO3', massG: 1 }], waterG: 100, startC: 20 }, { points: 60, targetC: 12 });
  const svg = packCurveSvg(curve);
  it('is a well-formed standalone SVG with title and axis units', () => {
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(wellFormed(svg)).toBe(true);
    expect(svg).toContain('<title>Final temperature against salt-to-water ratio: KNO₃</title>');
    expect(svg).toContain('final temperature (°C)');
    expect(svg).toContain('grams of solid per gram of water');
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  });
  it('marks the start, the target, the coldest point and the saturated region', () => {
    expect(svg).toContain('start 20 °C');
    expect(svg).toContain('target 12 °C');
    expect(svg).toMatch(/target reached at 0\.09\d g\/g/);
    expect(svg).toContain('coldest');
    expect(svg).toContain('undissolved solid remains');
  });
  it('draws the burn threshold for a hot fill', () => {
    const hot = packCurveSvg(packRatioCurve({ solids: [{ formula: 'CaCl2', massG: 1 }], waterG: 100 }, { points: 40 }));
    expect(hot).toContain('Contact-burn threshold 44 °C (ISO 13732-1)');
    expect(hot).toContain('burn threshold 44 °C (long contact)');
    // With the integral heats of the brine model and the apparent molar heat capacity of the dissolved CaCl2
    // (φCp° + φJ, far below the crystal's Cp°), CaCl2 in 100 g water peaks near 115 °C, short of its brine's boiling point.
    expect(hot).toContain('hottest: 115');
    expect(hot).not.toContain('boiling');
  });
});

describe('time-course chart', () => {
  const course = packTimeCourse({ solids: [{ formula: 'CaCl2', massG: 25 }], waterG: 100, startC: 20 }, { band: { lowC: 40, highC: 50 }, samples: 120 });
  const svg = timeCourseSvg(course, { fillLabel: '25 g CaCl2 in 100 g water' });
  it('is well formed, titled, with units and the assumed-value mark', () => {
    expect(wellFormed(svg)).toBe(true);
    expect(svg).toContain('<title>Pack temperature over time</title>');
    expect(svg).toContain('time since the salt met the water (min)');
    expect(svg).toContain('pack temperature (°C)');
    expect(svg).toContain('* assumed value for illustration');
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  });
  it('shows the band with its time inside, the burn threshold and the hottest point', () => {
    expect(svg).toMatch(/target band 40–50 °C: [\d.]+ min inside/);
    expect(svg).toContain('contact-burn threshold');
    expect(svg).toContain('hottest');
  });
});
