// The adaptive scan of the solver finds the same first crossing of the heat balance as a
// brute-force walk in 0.02 K steps from the start temperature.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fillEquilibrium } from '../../src/pack/fillEquilibrium.js';
import { preparePackFill } from '../../src/pack/packFill.js';
import { solveFillTemperature } from '../../src/pack/solveFillTemperature.js';

const STEP = 0.02;

function bruteForce(fill: ReturnType<typeof preparePackFill>): number {
  const t0 = fill.startC;
  const f = (t: number) => {
    const s = fillEquilibrium(fill, t);
    return { f: s.heatCapacity * (t - t0) + s.heatJ, frozen: s.frozen, boiling: s.boiling };
  };
  const q0 = fillEquilibrium(fill, t0).heatJ;
  const dir = q0 > 0 ? -1 : 1;
  for (let t = t0 + dir * STEP; t > -100 && t < 200; t += dir * STEP) {
    const { f: v, frozen, boiling } = f(t);
    if (frozen || boiling) return t;
    if (dir * v >= 0) return t;
  }
  return dir > 0 ? 200 : -100;
}

describe('first crossing', () => {
  it('matches a 0.02 K walk for random fills of every kind', () => {
    const salts = ['KNO3', 'NH4NO3', 'NH4Cl', 'CO(NH2)2', 'NaCl', 'CaCl2', 'MgSO4', 'Na2CO3', 'Na2SO4', 'CuSO4', 'NaCH3COO·3H2O', 'Na2S2O3·5H2O', 'NaCH3COO', 'LiCl'];
    fc.assert(
      fc.property(fc.constantFrom(...salts), fc.double({ min: 0.01, max: 2.5, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true }), (formula, ratio, startC) => {
        const fill = preparePackFill({ solids: [{ formula, massG: ratio * 100 }], waterG: 100, startC });
        const solved = solveFillTemperature(fill).temperature;
        expect(Math.abs(solved - bruteForce(fill))).toBeLessThanOrEqual(STEP + 1e-6);
      }),
      { numRuns: 150 },
    );
  });
});
