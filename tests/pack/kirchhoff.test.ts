// Temperature dependence of ΔsolH: the 25 °C value by default, Kirchhoff on request.
import { describe, expect, it } from 'vitest';
import { packFinalTemperature } from '../../src/index.js';

describe('Kirchhoff correction of ΔsolH to the start temperature', () => {
  // KNO3 from 5 °C. ΔsolCp° = Cp°(K+, aq) + Cp°(NO3−, aq) − Cp°(KNO3, cr)
  //   = 21.8 + (−86.6) − 96.4 = −161.2 J/(mol·K) (NBS 1982; the crystal value from memory)
  // ΔsolH(5 °C) = 34.89 + (−161.2) × (5 − 25) / 1000 = 34.89 + 3.224 = 38.114 kJ/mol
  // 5 g in 100 g: n = 0.049455 mol; C = 417.935 + 0.049455 × 96.4 = 422.702 J/K
  // ΔT = −0.049455 × 38 114 / 422.702 = −4.459 K (−4.082 K with the 25 °C value)
  const fill = { solids: [{ formula: 'KNO3', massG: 5 }], waterG: 100, startC: 5 };
  const plain = packFinalTemperature(fill);
  const corrected = packFinalTemperature(fill, { kirchhoff: true });
  const n = 5 / 101.1023;
  const C = (100 * 75.291) / 18.015 + n * 96.4;

  it('uses the 25 °C value unless asked, and says so', () => {
    expect(plain.dissolved[0]!.enthalpyOfSolution.value).toBe(34.89);
    expect(plain.notes.some((x) => x.includes('no Kirchhoff correction'))).toBe(true);
    expect(plain.finalTemperature.value).toBeCloseTo(5 - (n * 34890) / C, 6);
  });
  it('corrects with the infinite-dilution ΔsolCp° when asked', () => {
    expect(corrected.dissolved[0]!.enthalpyOfSolution.value).toBeCloseTo(38.114, 6);
    expect(corrected.finalTemperature.value).toBeCloseTo(5 - (n * 38114) / C, 6);
    expect(corrected.notes.some((x) => x.includes('Kirchhoff'))).toBe(true);
  });
});
