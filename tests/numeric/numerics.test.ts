// Root finding, maximisation, reproducible draws and solubility interpolation.
import { describe, expect, it } from 'vitest';
import { isIonheatError, solubilityAt, solubilityCurve } from '../../src/index.js';
import { bracketedRoot } from '../../src/numeric/bracketedRoot.js';
import { goldenSectionMaximum } from '../../src/numeric/goldenSectionMaximum.js';
import { seededNormal } from '../../src/numeric/seededNormal.js';

describe('bracketedRoot (Brent)', () => {
  it('converges to its tolerance, not a fixed count', () => {
    const loose = bracketedRoot((x) => Math.cos(x) - x, 0, 1, 1e-3);
    const tight = bracketedRoot((x) => Math.cos(x) - x, 0, 1, 1e-13);
    expect(Math.abs(tight.x - 0.7390851332151607)).toBeLessThan(1e-12); // Dottie number
    expect(Math.abs(loose.x - 0.7390851332151607)).toBeLessThan(1e-3);
    expect(tight.evaluations).toBeGreaterThan(loose.evaluations);
    expect(tight.evaluations).toBeLessThan(20);
  });
  it('converges to a jump, reporting the jump', () => {
    const r = bracketedRoot((x) => (x < 0.3 ? -1 : 1), 0, 1, 1e-10);
    expect(Math.abs(r.x - 0.3)).toBeLessThan(1e-9);
    expect(Math.abs(r.fx)).toBe(1);
  });
  it('refuses a bracket without a sign change', () => {
    try {
      bracketedRoot((x) => x * x + 1, -1, 1, 1e-9);
      expect.unreachable();
    } catch (e) {
      expect(isIonheatError(e) && e.code).toBe('NO_SOLUTION');
    }
  });
});

describe('goldenSectionMaximum', () => {
  it('finds the peak of a kinked function', () => {
    expect(goldenSectionMaximum((x) => Math.min(2 * x, 1 - x), 0, 1, 1e-10).x).toBeCloseTo(1 / 3, 9);
  });
});

describe('seededNormal', () => {
  it('repeats for a seed and has unit spread', () => {
    const a = seededNormal(42);
    const b = seededNormal(42);
    const xs = Array.from({ length: 20000 }, () => a());
    expect(b()).toBe(xs[0]);
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    const sd = Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (xs.length - 1));
    expect(Math.abs(mean)).toBeLessThan(0.03);
    expect(Math.abs(sd - 1)).toBeLessThan(0.03);
  });
});

describe('solubility curve', () => {
  const kno3 = solubilityCurve('KNO3')!;
  it('interpolates the CRC table', () => {
    expect(solubilityAt(kno3, 15).value).toBeCloseTo((21.36 + 31.93) / 2, 9); // CRC: 21.36 at 10 °C, 31.93 at 20 °C
    expect(solubilityAt(kno3, 20).value).toBeCloseTo(31.93, 9);
    expect(solubilityAt(kno3, 20).extrapolated).toBe(false);
  });
  it('takes the eutectic liquid as the low end of the curve', () => {
    // KNO3–ice eutectic −2.8 °C at 10.5 % by mass (Linke–Seidell, from memory): 100·0.105/0.895 = 11.73 g/100 g
    expect(kno3.points[0]).toMatchObject({ t: -2.8, eutectic: true });
    expect(solubilityAt(kno3, -2.8).value).toBeCloseTo(11.732, 3);
    expect(solubilityAt(kno3, -5).extrapolated).toBe(true);
  });
  it('names the equilibrium solid, finding a hydrate salt by its anhydrous formula', () => {
    const cacl2 = solubilityCurve('CaCl2·6H2O')!;
    expect(cacl2.formula).toBe('CaCl2');
    expect(solubilityAt(cacl2, 10).phase).toBe('CaCl2·6H2O');
    expect(solubilityAt(cacl2, 40).phase).toBe('CaCl2·4H2O');
    expect(solubilityAt(cacl2, 90).phaseWater).toBe(2);
  });
});
