// Fills of two cold-pack candidates whose solubility limits the pack:
// potassium dihydrogen phosphate and ammonium bicarbonate. Without their
// solubility curves a 60 g fill was assumed to dissolve fully and promised
// temperatures far below what the salt can reach.
import { describe, expect, it } from 'vitest';
import { packFinalTemperature, solubilityAt, solubilityCurve } from '../../src/index.js';

const fill = (formula: string, massG: number) => packFinalTemperature({ solids: [{ formula, massG }], waterG: 100, startC: 20 });

describe('KH2PO4 solubility curve', () => {
  it('follows the smoothing equation of Vogel, Figurski and Vohland (1963) in the IUPAC-NIST Solubility Database', () => {
    // ln x = −4.810 − 1510.549/T + 1.128 ln T at T = 293.15 K:
    //   −4.810 − 5.15282 + 1.128 × 5.68069 = −3.55504 → x = 0.028578
    //   r = 100 × x/(1 − x) × 136.086/18.015 = 100 × 0.029419 × 7.55404 = 22.22 g per 100 g water
    // The commonly quoted handbook figure, 22.6 g per 100 mL at 20 °C, agrees within 2 % (from memory).
    expect(solubilityAt(solubilityCurve('KH2PO4')!, 20).value).toBeCloseTo(22.23, 1);
  });
});

describe('60 g of a sparingly soluble salt in 100 g water at 20 °C', () => {
  for (const formula of ['KH2PO4', 'NH4HCO3']) {
    it(`${formula}: saturates, keeps the rest solid, and dissolves what the curve allows at the final temperature`, () => {
      const r = fill(formula, 60);
      const d = r.dissolved[0]!;
      expect(d.saturated).toBe(true);
      expect(d.undissolvedMass).toBeGreaterThan(30);
      const atFinal = solubilityAt(solubilityCurve(formula)!, r.finalTemperature.value).value;
      expect(d.dissolvedMass).toBeCloseTo(atFinal, 6);
      // Both cool the fill (endothermic), but only by the few degrees their
      // limited solubility allows: not the −20 °C a fully dissolved 60 g would promise.
      expect(r.finalTemperature.value).toBeGreaterThan(5);
      expect(r.finalTemperature.value).toBeLessThan(20);
      expect(r.notes.join(' ')).not.toMatch(/no solubility data/);
    });
  }
});
