// Parts of the fill model beyond the single-salt hand fills.
import { describe, expect, it } from 'vitest';
import { packFinalTemperature } from '../../src/index.js';

const WATER_100G = (100 * 75.291) / 18.015; // J/K, NBS 1982 Cp°(H2O, l)

describe('container heat capacity', () => {
  // 10 g KNO3 in 100 g water with a 200 J/K container: C = 427.470 + 200 = 627.470 J/K,
  // ΔT = −3451.0 J / 627.470 J/K = −5.4998 K (ΔsolH 34.89 kJ/mol CRC; Cp° 96.4 J/(mol·K) NBS, from memory).
  it('adds to the heat capacity from the parts', () => {
    const n = 10 / 101.1023;
    const r = packFinalTemperature({ solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20, containerJPerK: 200 });
    expect(r.heatCapacity.parts.container).toBe(200);
    expect(r.finalTemperature.value).toBeCloseTo(20 - (n * 34890) / (WATER_100G + n * 96.4 + 200), 6);
  });
});

describe('a solid without solubility data', () => {
  // KOH has a measured ΔsolH (−57.61 kJ/mol, CRC) but no solubility record: it is taken to dissolve completely.
  const r = packFinalTemperature({ solids: [{ formula: 'KOH', massG: 10 }], waterG: 100, startC: 20 });
  it('dissolves completely and says so', () => {
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
    expect(r.dissolved[0]!.solubility).toBeNull();
    expect(r.notes.some((n) => n.includes('no solubility data for KOH'))).toBe(true);
    expect(r.cautions.some((c) => c.startsWith('KOH (corrosive'))).toBe(true);
  });
});

describe('several solids', () => {
  // 20 g NH4Cl + 10 g urea in 100 g water at 20 °C, both unsaturated: heats add.
  //   NH4Cl: 20/53.489 = 0.37391 mol × 14.78 kJ/mol (CRC, checked by the data helper) = 5526.4 J; Cp° 84.1 J/(mol·K) (NBS, from memory)
  //   urea:  10/60.056 = 0.16651 mol × 15.1 kJ/mol (Egan & Luff 1966; from memory) = 2514.3 J; Cp° 93.14 (NBS, from memory)
  //   C = 417.935 + 0.37391 × 84.1 + 0.16651 × 93.14 = 417.935 + 31.446 + 15.509 = 464.890 J/K
  //   ΔT = −8040.7 / 464.890 = −17.296 K → 2.704 °C
  const r = packFinalTemperature({ solids: [{ formula: 'NH4Cl', massG: 20 }, { formula: 'CO(NH2)2', massG: 10 }], waterG: 100, startC: 20 });
  const a = 20 / 53.489;
  const b = 10 / 60.056;
  it('adds their heats and heat capacities, ignoring mixing effects, and says so', () => {
    expect(r.finalTemperature.value).toBeCloseTo(20 - (a * 14780 + b * 15100) / (WATER_100G + a * 84.1 + b * 93.14), 6);
    expect(r.dissolved.map((d) => d.heat)).toEqual([expect.closeTo(a * 14.78, 6), expect.closeTo(b * 15.1, 6)]);
    expect(r.notes.some((n) => n.includes('mixing effects'))).toBe(true);
    expect(r.heat.imbalance).toBeLessThan(0.001);
  });
});

describe('a balance that sits at a change of equilibrium solid', () => {
  // Anhydrous Na2SO4 from 15 °C: below about 32 °C the saturating solid is Na2SO4·10H2O, whose formation
  // releases much heat as the excess hydrates; above, the anhydrous salt. The model pins the fill at the
  // change in its table (halfway between the 30 and 40 °C points) and says so.
  const r = packFinalTemperature({ solids: [{ formula: 'Na2SO4', massG: 100 }], waterG: 100, startC: 15 });
  it('reports the pinned temperature with a note', () => {
    expect(r.finalTemperature.value).toBeCloseTo(35, 6);
    expect(r.notes.some((n) => n.includes('pinned'))).toBe(true);
  });
});
