// Inverse design: the ratio for a target, the largest change, the most change per gram, the curve.
import { describe, expect, it } from 'vitest';
import { packFinalTemperature, packRatioCurve, ratioForLargestChangePerGram, ratioForTargetTemperature } from '../../src/index.js';

const kno3 = { solids: [{ formula: 'KNO3', massG: 1 }], waterG: 100, startC: 20 };

describe('ratio for a target temperature', () => {
  it('gives a fill that reaches the target when solved forwards', () => {
    for (const [fill, target] of [
      [kno3, 12],
      [{ solids: [{ formula: 'NH4NO3', massG: 1 }], waterG: 250, startC: 25 }, 2],
      [{ solids: [{ formula: 'CaCl2', massG: 1 }], waterG: 100, startC: 20 }, 50],
    ] as const) {
      const d = ratioForTargetTemperature(fill, target);
      expect(d.reachable).toBe(true);
      const forward = packFinalTemperature({ ...fill, solids: [{ formula: fill.solids[0].formula, massG: d.design!.saltMass }] });
      expect(Math.abs(forward.finalTemperature.value - target)).toBeLessThan(1e-4);
    }
  });
  it('matches the hand calculation for KNO3 to 12 °C', () => {
    // Unsaturated: 8 K = n·ΔsolH(m)·1000 / C(n), ΔsolH(m) ≈ 35.5 kJ/mol and C ≈ 413.7 J/K near 10 g (handFills.test.ts)
    //   → n ≈ 8 × 413.7 / 35 500 = 0.0932 mol ≈ 9.4 g; the design fill, solved forward, reaches 12 °C.
    const mass = ratioForTargetTemperature(kno3, 12).design!.saltMass;
    expect(mass).toBeCloseTo((8 * 413.7 * 101.1023) / 35500, 1);
    expect(packFinalTemperature({ ...kno3, solids: [{ formula: 'KNO3', massG: mass }] }).finalTemperature.value).toBeCloseTo(12, 4);
  });
  it('says when a target is out of reach, and why', () => {
    const cold = ratioForTargetTemperature(kno3, 0); // KNO3 saturates near 5.7 °C from 20 °C
    expect(cold.reachable).toBe(false);
    expect(cold.design).toBeNull();
    expect(cold.message).toContain('out of reach');
    const wrongWay = ratioForTargetTemperature(kno3, 30);
    expect(wrongWay.reachable).toBe(false);
    expect(wrongWay.message).toContain('cools');
  });
});

describe('largest change and most change per gram', () => {
  const curve = packRatioCurve(kno3, { points: 120 });
  it('finds the largest change where KNO3 just saturates at its own final temperature', () => {
    // At the saturation onset the dissolved mass equals the solubility at the final temperature.
    const lc = curve.largestChange;
    expect(curve.saturationRatio).not.toBeNull();
    expect(Math.abs(lc.ratio - curve.saturationRatio!)).toBeLessThan(1e-5);
    const r = packFinalTemperature({ ...kno3, solids: [{ formula: 'KNO3', massG: lc.saltMass }] });
    expect(Math.abs(r.dissolved[0]!.solubility!.value - lc.saltMass)).toBeLessThan(1e-3);
    for (const p of curve.points) expect(p.temperature).toBeGreaterThanOrEqual(lc.temperature - 1e-7);
  });
  it('finds the most change per gram of fill, no less than any curve point', () => {
    const best = ratioForLargestChangePerGram(kno3);
    for (const p of curve.points) expect(best.changePerGram).toBeGreaterThanOrEqual(p.changePerGram - 1e-9);
    expect(best.changePerGram).toBeCloseTo(Math.abs(best.temperature - 20) / (100 * (1 + best.ratio)), 12);
  });
  it('gives the curve as data: 120 points from 0, falling until saturation, band around each point', () => {
    expect(curve.points).toHaveLength(120);
    expect(curve.points[0]).toMatchObject({ ratio: 0, temperature: 20 });
    const below = curve.points.filter((p) => p.ratio <= curve.saturationRatio!);
    for (let i = 1; i < below.length; i++) expect(below[i]!.temperature).toBeLessThanOrEqual(below[i - 1]!.temperature + 1e-9);
    for (const p of curve.points) {
      expect(p.low!).toBeLessThanOrEqual(p.temperature);
      expect(p.high!).toBeGreaterThanOrEqual(p.temperature);
      expect(p.undissolvedMass > 0).toBe(p.ratio > curve.saturationRatio! + 1e-6);
    }
  });
});

describe('several solids keep their proportions along the curve', () => {
  it('scales both', () => {
    const mix = packRatioCurve({ solids: [{ formula: 'NH4Cl', massG: 30 }, { formula: 'CO(NH2)2', massG: 10 }], waterG: 100, startC: 20 }, { points: 10, band: false });
    expect(mix.base.solids.map((s) => s.share)).toEqual([0.75, 0.25]);
    expect(mix.notes.some((n) => n.includes('mixing effects'))).toBe(true);
  });
});
