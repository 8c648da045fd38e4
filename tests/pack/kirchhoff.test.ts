// Temperature dependence of ΔsolH°(∞): the balance takes it at the start temperature, always, by the one
// Kirchhoff correction of the solution layer (the pack option `kirchhoff` is kept for old callers and changes nothing).
import { describe, expect, it } from 'vitest';
import { dissolve, packFinalTemperature } from '../../src/index.js';

describe('Kirchhoff correction of ΔsolH to the start temperature', () => {
  // KNO3 from 5 °C. ΔsolCp° = Cp°(K+, aq) + Cp°(NO3−, aq) − Cp°(KNO3, cr)
  //   = 21.8 + (−86.6) − 96.4 = −161.2 J/(mol·K) (NBS 1982; the crystal value from memory)
  // ΔsolH°(∞, 5 °C) = 34.89 + (−161.2) × (5 − 25) / 1000 = 34.89 + 3.224 = 38.114 kJ/mol
  const fill = { solids: [{ formula: 'KNO3', massG: 5 }], waterG: 100, startC: 5 };
  const plain = packFinalTemperature(fill);
  const asked = packFinalTemperature(fill, { kirchhoff: true });

  it('takes ΔsolH°(∞) at the start temperature', () => {
    expect(plain.dissolved[0]!.enthalpyOfSolution.value).toBeCloseTo(38.114, 6);
    expect(plain.notes.some((x) => x.includes('Kirchhoff'))).toBe(true);
  });
  it('is the same correction dissolve makes (one place)', () => {
    expect(plain.dissolved[0]!.enthalpyOfSolution.value).toBeCloseTo(dissolve('KNO3', { temperatureC: 5 }).best.value, 9);
  });
  it('gives the same result whether or not the old option asks for it', () => {
    expect(asked.finalTemperature).toEqual(plain.finalTemperature);
  });
});
