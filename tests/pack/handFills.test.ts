// Hand-checkable fills: each test writes out the hand calculation with the
// tabulated numbers it uses and their sources, then compares the model.
//
// Shared numbers:
//   Cp°(H2O, l) = 75.291 J/(mol·K), NBS 1982 tables (Wagman et al.), checked against a copy by the data helper;
//   M(H2O) = 2 × 1.008 + 15.999 = 18.015 g/mol (IUPAC 2021 abridged atomic weights)
//   → c(water) = 75.291 / 18.015 = 4.17935 J/(g·K); 100 g of water holds 417.935 J/K.
// A check holds to 0.01 K: the hand arithmetic below keeps 5–6 significant digits.
import { describe, expect, it } from 'vitest';
import { CONTACT_BURN_THRESHOLD_C, packFinalTemperature, SCREENING_LINE } from '../../src/index.js';

const WATER_100G = (100 * 75.291) / 18.015; // J/K

const fill = (formula: string, massG: number, startC = 20) => packFinalTemperature({ solids: [{ formula, massG }], waterG: 100, startC });

/** Energy closure: heat taken up by dissolution + change of sensible heat = 0, within 0.1 %. */
function expectClosure(r: ReturnType<typeof fill>): void {
  expect(Math.abs(r.heat.absorbed + r.heat.sensible)).toBeLessThanOrEqual(0.001 * Math.abs(r.heat.absorbed));
  expect(r.heat.imbalance).toBeLessThanOrEqual(0.001);
}

describe('dilute potassium nitrate cold fill: 10 g KNO3 in 100 g water at 20 °C', () => {
  // M(KNO3) = 39.0983 + 14.007 + 3 × 15.999 = 101.1023 g/mol (IUPAC 2021)
  // ΔsolH(KNO3) = +34.89 kJ/mol at infinite dilution, 25 °C (CRC Handbook, enthalpy of solution of electrolytes; entered from memory)
  // Cp°(KNO3, cr) = 96.4 J/(mol·K) (NBS 1982; entered from memory)
  // n = 10 / 101.1023 = 0.098910 mol
  // Q = 0.098910 × 34 890 = 3451.0 J absorbed
  // C = 417.935 + 0.098910 × 96.4 = 417.935 + 9.535 = 427.470 J/K
  // ΔT = −3451.0 / 427.470 = −8.073 K → T = 11.927 °C
  // Solubility at 11.9 °C ≈ 21.36 + 0.193 × (31.93 − 21.36) = 23.4 g/100 g (CRC) > 10 g: all dissolves.
  const n = 10 / 101.1023;
  const C = WATER_100G + n * 96.4;
  const expected = 20 - (n * 34890) / C;
  const r = fill('KNO3', 10);

  it('reaches 11.93 °C, all dissolved', () => {
    expect(expected).toBeCloseTo(11.927, 3);
    expect(Math.abs(r.finalTemperature.value - expected)).toBeLessThan(0.01);
    expect(r.dissolved[0]!.dissolvedMass).toBeCloseTo(10, 9);
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
    expect(r.heat.absorbed).toBeCloseTo(3.451, 3);
    expect(r.heatCapacity.value).toBeCloseTo(427.47, 1);
  });
  it('closes its energy balance', () => expectClosure(r));
  it('has a 95 % interval around the value and carries the cold-injury caution, the KNO3 hazard and the closing line', () => {
    expect(r.finalTemperature.low).toBeLessThan(r.finalTemperature.value);
    expect(r.finalTemperature.high).toBeGreaterThan(r.finalTemperature.value);
    expect(r.cautions.some((c) => c.startsWith('Cold injury'))).toBe(true);
    expect(r.cautions.some((c) => c.startsWith('KNO3 (oxidizer'))).toBe(true);
    expect(r.cautions.at(-1)).toBe(SCREENING_LINE);
  });
});

describe('dilute sodium chloride fill: 10 g NaCl in 100 g water at 20 °C', () => {
  // M(NaCl) = 22.98976928 + 35.45 = 58.43977 g/mol (IUPAC 2021)
  // ΔsolH(NaCl) = +3.88 kJ/mol (CRC Handbook, enthalpy of solution of electrolytes; checked against a copy by the data helper)
  // Cp°(NaCl, cr) = 50.5 J/(mol·K) (NBS 1982, checked against a copy by the data helper)
  // n = 10 / 58.43977 = 0.171116 mol; Q = 0.171116 × 3880 = 663.93 J
  // C = 417.935 + 0.171116 × 50.5 = 426.576 J/K; ΔT = −663.93 / 426.576 = −1.5564 K → 18.444 °C
  const n = 10 / 58.43977;
  const expected = 20 - (n * 3880) / (WATER_100G + n * 50.5);
  const r = fill('NaCl', 10);

  it('cools by only 1.56 K', () => {
    expect(expected).toBeCloseTo(18.444, 3);
    expect(Math.abs(r.finalTemperature.value - expected)).toBeLessThan(0.01);
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
  });
  it('closes its energy balance', () => expectClosure(r));
  it('says NaCl has no hazard class (both ions checked), not that it has no data', () => {
    expect(r.cautions.some((c) => c.startsWith('NaCl: no hazard class in the ionheat hazards table'))).toBe(true);
  });
});

describe('anhydrous calcium chloride hot fill: 25 g CaCl2 in 100 g water at 20 °C', () => {
  // M(CaCl2) = 40.078 + 2 × 35.45 = 110.978 g/mol (IUPAC 2021)
  // ΔsolH(CaCl2) by the formation cycle, NBS 1982 (Wagman et al.):
  //   ΔfH°(Ca2+, aq) = −542.83, ΔfH°(Cl−, aq) = −167.159 (from memory), ΔfH°(CaCl2, cr) = −795.8 kJ/mol (from memory)
  //   ΔsolH = −542.83 + 2 × (−167.159) − (−795.8) = −81.348 kJ/mol (exothermic)
  // Cp°(CaCl2, cr) = 72.59 J/(mol·K) (NBS 1982; from memory)
  // n = 25 / 110.978 = 0.225270 mol; Q = 0.225270 × (−81 348) = −18 325 J (released)
  // C = 417.935 + 0.225270 × 72.59 = 434.287 J/K; ΔT = +18 325 / 434.287 = +42.196 K → 62.196 °C
  // Solubility at 62 °C ≈ 131.9 g/100 g (CRC) > 25 g: all dissolves.
  const n = 25 / 110.978;
  const dH = -542.83 + 2 * -167.159 - -795.8;
  const expected = 20 - (n * dH * 1000) / (WATER_100G + n * 72.59);
  const r = fill('CaCl2', 25);

  it('reaches 62.2 °C, all dissolved', () => {
    expect(dH).toBeCloseTo(-81.348, 6);
    expect(expected).toBeCloseTo(62.196, 2);
    expect(Math.abs(r.finalTemperature.value - expected)).toBeLessThan(0.01);
    expect(r.heat.direction).toBe('released');
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
  });
  it('closes its energy balance', () => expectClosure(r));
  it('carries the contact-burn caution citing ISO 13732-1, said to be from memory', () => {
    expect(r.finalTemperature.value).toBeGreaterThan(CONTACT_BURN_THRESHOLD_C);
    const burn = r.cautions.find((c) => c.startsWith('Contact-burn risk'));
    expect(burn).toBeDefined();
    expect(burn).toContain('ISO 13732-1');
    expect(burn).toContain('from memory');
    expect(r.cautions.at(-1)).toBe(SCREENING_LINE);
  });
});

describe('potassium nitrate far beyond its solubility: 200 g KNO3 in 100 g water at 20 °C', () => {
  // Dissolved and undissolved KNO3 carry the same crystal Cp° in the model, so
  //   C = 417.935 + (200 / 101.1023) × 96.4 = 417.935 + 190.698 = 608.633 J/K, whatever dissolves.
  // The solution ends saturated: dissolved mass m = S(T) g per 100 g water. Between the CRC points
  //   S(0 °C) = 13.64 and S(10 °C) = 21.36 g/100 g: S(T) = 13.64 + 0.772·T.
  // Heat taken up per gram dissolved: 34 890 / 101.1023 = 345.097 J/g.
  // Balance: 608.633·(T − 20) = −345.097·(13.64 + 0.772·T)
  //   → 608.633·T − 12 172.66 = −4707.12 − 266.415·T → 875.048·T = 7465.54 → T = 8.532 °C
  //   → m = 13.64 + 0.772 × 8.532 = 20.226 g dissolved; 179.774 g stays undissolved.
  const C = WATER_100G + (200 / 101.1023) * 96.4;
  const perGram = 34890 / 101.1023;
  const expectedT = (20 * C - perGram * 13.64) / (C + perGram * 0.772);
  const expectedDissolved = 13.64 + 0.772 * expectedT;
  const r = fill('KNO3', 200);
  const d = r.dissolved[0]!;

  it('stays mostly undissolved and ends at 8.53 °C', () => {
    expect(expectedT).toBeCloseTo(8.532, 2);
    expect(Math.abs(r.finalTemperature.value - expectedT)).toBeLessThan(0.01);
    expect(d.undissolvedMass).toBeGreaterThan(0.85 * 200);
    expect(d.saturated).toBe(true);
  });
  it('dissolves exactly what the solubility allows at the final temperature', () => {
    expect(Math.abs(d.dissolvedMass - expectedDissolved)).toBeLessThan(0.01);
    // and the model's own solubility at its final temperature says the same
    expect(d.solubility!.value).toBeCloseTo(d.dissolvedMass, 6);
    expect(d.dissolvedMass + d.undissolvedMass).toBeCloseTo(200, 9);
  });
  it('closes its energy balance', () => expectClosure(r));
  it('does far less than the naive balance that dissolves everything', () => {
    // naive: 200 g × 345.097 J/g / 608.633 J/K = 113 K of cooling, far below freezing
    expect(20 - (200 * perGram) / C).toBeLessThan(-90);
    expect(r.finalTemperature.value).toBeGreaterThan(0);
  });
});
