// Hand-checkable fills: each test writes out the hand calculation with the
// tabulated numbers it uses and their sources, then compares the model. The
// balance is enthalpy conservation: each salt dissolves with its integral
// enthalpy of solution to the molality reached, ΔsolH°(∞, T₀) + φL(m, T₀)
// (Pitzer, src/brine/), and the final state's heat capacity counts the
// dissolved salt by its apparent molar heat capacity φCp° + φJ.
//
// Shared numbers:
//   Cp°(H2O, l) = 75.291 J/(mol·K), NBS 1982 tables (Wagman et al.), checked against a copy by the data helper;
//   M(H2O) = 2 × 1.008 + 15.999 = 18.015 g/mol (IUPAC 2021 abridged atomic weights)
//   → c(water) = 75.291 / 18.015 = 4.17935 J/(g·K); 100 g of water holds 417.935 J/K.
// A check holds to 0.01 K: the hand arithmetic below keeps 5–6 significant digits.
import { describe, expect, it } from 'vitest';
import { CONTACT_BURN_THRESHOLD_C, packFinalTemperature, SCREENING_LINE } from '../../src/index.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { integralEnthalpyOfSolution } from '../../src/solution/integralEnthalpy.js';
import { aqueousHeatCapacity, solidHeatCapacity } from '../../src/pack/solidHeatCapacity.js';
import { brineModel } from '../../src/brine/brineModel.js';
import { relativeApparentHeatCapacity } from '../../src/brine/pitzerBrine.js';
import { brineFreezingPoint } from '../../src/brine/brineFreezingPoint.js';

const WATER_100G = (100 * 75.291) / 18.015; // J/K

const fill = (formula: string, massG: number, startC = 20, waterG = 100) => packFinalTemperature({ solids: [{ formula, massG }], waterG, startC });

/** Energy closure: heat taken up (dissolution, conversion, ice) + change of sensible heat = 0, within 0.1 %. */
function expectClosure(r: ReturnType<typeof fill>): void {
  expect(Math.abs(r.heat.absorbed + r.heat.sensible)).toBeLessThanOrEqual(0.001 * Math.abs(r.heat.absorbed));
  expect(r.heat.imbalance).toBeLessThanOrEqual(0.001);
}

/**
 * The hand calculation of a fill that dissolves completely without ice:
 *   n = mass/M, W = water + n·(crystal water)·18.015 g, m = 1000·n/W,
 *   ΔsolH(m, T₀) = ΔsolH°(∞, T₀) + φL(m, T₀)        (integralEnthalpyOfSolution)
 *   C = W·c(water) + n·(φCp° + φJ(m, T₀))          (φCp° = Σν·Cp°(ion, aq), or the crystal's Cp° where an ion lacks one)
 *   T = T₀ − n·ΔsolH(m, T₀)·1000 / C
 */
function handTemperature(formula: string, massG: number, startC: number, waterG = 100) {
  const salt = parseSalt(formula);
  const n = massG / salt.molarMass;
  const W = waterG + n * salt.water * 18.015;
  const m = (1000 * n) / W;
  const dH = integralEnthalpyOfSolution(salt, m, startC).value;
  const cp0 = (aqueousHeatCapacity(salt.anhydrous) ?? solidHeatCapacity(salt.anhydrous)).value;
  const phiJ = relativeApparentHeatCapacity(brineModel(salt).pitzer!, m, startC + 273.15);
  const C = W * (75.291 / 18.015) + n * (cp0 + phiJ);
  return { n, W, m, dH, C, T: startC - (n * dH * 1000) / C };
}

describe('dilute potassium nitrate cold fill: 10 g KNO3 in 100 g water at 20 °C', () => {
  // M(KNO3) = 101.1023 g/mol (IUPAC 2021); n = 0.098910 mol; m = 0.9891 mol/kg
  // ΔsolH°(KNO3, ∞, 25 °C) = +34.89 kJ/mol (CRC, from memory), Kirchhoff to 20 °C with
  //   ΔsolCp° = Cp°(K⁺, aq) + Cp°(NO3⁻, aq) − Cp°(KNO3, cr) (NBS 1982) → +35.696 kJ/mol
  // φL(0.989 m, 20 °C) = −0.187 kJ/mol (KNO3: Pitzer–Mayorga 25 °C values with the 1:1 temperature terms)
  //   → ΔsolH(m) = +35.509 kJ/mol; Q = 0.098910 × 35 509 = 3512.2 J
  // C = 417.935 + 0.098910 × (φCp° −64.8 + φJ 21.90) = 413.692 J/K (the dissolved salt lowers the heat capacity)
  // ΔT = −3512.2 / 413.692 = −8.490 K → T = 11.510 °C (the crystal-Cp, infinite-dilution balance gave 11.93 °C)
  const hand = handTemperature('KNO3', 10, 20);
  const r = fill('KNO3', 10);

  it('reaches 11.51 °C, all dissolved', () => {
    expect(hand.T).toBeCloseTo(11.510, 2);
    expect(Math.abs(r.finalTemperature.value - hand.T)).toBeLessThan(0.01);
    expect(r.dissolved[0]!.dissolvedMass).toBeCloseTo(10, 9);
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
    expect(r.dissolved[0]!.molality).toBeCloseTo(hand.m, 6);
    expect(r.dissolved[0]!.integralEnthalpy.value).toBeCloseTo(hand.dH, 4);
    expect(r.heatCapacity.value).toBeCloseTo(hand.C, 2);
    expect(r.iceMass).toBe(0);
  });
  it('closes its energy balance', () => expectClosure(r));
  it('has a 95 % interval around the value and carries the cold-injury caution, the KNO3 hazard and the closing line', () => {
    expect(r.finalTemperature.low).toBeLessThan(r.finalTemperature.value);
    expect(r.finalTemperature.high).toBeGreaterThan(r.finalTemperature.value);
    expect(r.cautions.some((c) => c.text.startsWith('Cold injury'))).toBe(true);
    expect(r.cautions.some((c) => c.text.startsWith('KNO3 (oxidizer'))).toBe(true);
    expect(r.cautions.at(-1)?.text).toBe(SCREENING_LINE);
  });
});

describe('dilute sodium chloride fill: 10 g NaCl in 100 g water at 20 °C', () => {
  // M(NaCl) = 58.43977 g/mol; n = 0.171116 mol; m = 1.7112 mol/kg
  // ΔsolH°(NaCl, ∞) = +3.88 kJ/mol at 25 °C (CRC), +4.5825 at 20 °C (Kirchhoff, ΔsolCp° = −140.5 J/(mol·K), NBS)
  // φL(1.71 m, 20 °C) = −0.908 kJ/mol (pitzer.dat NaCl) → ΔsolH(m) = +3.674 kJ/mol; Q = 628.7 J
  // C = 417.935 + 0.171116 × (−90.0 + 65.46) = 413.736 J/K; ΔT = −1.520 K → T = 18.480 °C
  const hand = handTemperature('NaCl', 10, 20);
  const r = fill('NaCl', 10);

  it('cools by only 1.52 K', () => {
    expect(hand.T).toBeCloseTo(18.480, 2);
    expect(Math.abs(r.finalTemperature.value - hand.T)).toBeLessThan(0.01);
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
  });
  it('closes its energy balance', () => expectClosure(r));
  it('says NaCl has no hazard class (both ions checked), not that it has no data', () => {
    expect(r.cautions.some((c) => c.text.startsWith('NaCl: no hazard class in the ionheat hazards table'))).toBe(true);
  });
});

describe('anhydrous calcium chloride hot fill: 25 g CaCl2 in 100 g water at 20 °C', () => {
  // M(CaCl2) = 110.978 g/mol; n = 0.225270 mol; m = 2.2527 mol/kg
  // ΔsolH°(CaCl2, ∞) by the formation cycle, NBS 1982 (Wagman et al.):
  //   −542.83 + 2 × (−167.159) − (−795.8) = −81.348 kJ/mol at 25 °C; Kirchhoff to 20 °C with
  //   ΔsolCp° = φCp° − Cp°(CaCl2, cr) = (−5.1 + 2 × (−136.4)) − 72.59 = −350.49 J/(mol·K)
  //   (Cp°(Ca²⁺, aq): Shock & Helgeson 1988 on the NBS scale, from memory; Cl⁻ and the crystal: NBS) → −79.596 kJ/mol
  // φL(2.25 m, 20 °C) = +5.736 kJ/mol (pitzer.dat CaCl2) → ΔsolH(m) = −73.859 kJ/mol: 9 % less heat than at infinite dilution
  // C = 417.935 + 0.225270 × (φCp° −277.9 + φJ 122.55) = 382.938 J/K (the dissolved salt lowers the heat capacity;
  //   Laliberté 2009 gives 390–396 J/K for this solution between 20 and 40 °C, see tests/brine/apparentHeatCapacity.test.ts)
  // ΔT = +0.225270 × 73 859 / 382.938 = +43.449 K → T = 63.449 °C (it was 56.9 °C with the crystal's Cp° standing in)
  const dH = -542.83 + 2 * -167.159 - -795.8;
  const hand = handTemperature('CaCl2', 25, 20);
  const r = fill('CaCl2', 25);

  it('reaches 63.4 °C, all dissolved', () => {
    expect(dH).toBeCloseTo(-81.348, 6);
    expect(hand.T).toBeCloseTo(63.449, 2);
    expect(Math.abs(r.finalTemperature.value - hand.T)).toBeLessThan(0.01);
    expect(r.heat.direction).toBe('released');
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
  });
  it('closes its energy balance', () => expectClosure(r));
  it('carries the contact-burn caution citing ISO 13732-1, said to be from memory', () => {
    expect(r.finalTemperature.value).toBeGreaterThan(CONTACT_BURN_THRESHOLD_C);
    const burn = r.cautions.find((c) => c.text.startsWith('Contact-burn risk'));
    expect(burn).toBeDefined();
    expect(burn?.kind).toBe('contact-burn');
    expect(burn?.text).toContain('ISO 13732-1');
    expect(burn?.text).toContain('from memory');
    expect(r.cautions.at(-1)?.text).toBe(SCREENING_LINE);
  });
});

describe('potassium nitrate far beyond its solubility: 200 g KNO3 in 100 g water at 20 °C', () => {
  // The solution ends saturated: dissolved mass = S(T) g per 100 g water, S(T) = 13.64 + 0.772·T between the
  // CRC points at 0 and 10 °C. Hand check of the final state the model reports (T, dissolved mass):
  //   m = 10·S(T)/101.1023 mol/kg; Q = n_d·ΔsolH(m, 20 °C)·1000; C = 417.935 + n_d·(−64.8 + φJ) + n_u·96.4
  //   and C·(T − 20) + Q = 0.
  const r = fill('KNO3', 200);
  const d = r.dissolved[0]!;
  const T = r.finalTemperature.value;
  const expectedDissolved = 13.64 + 0.772 * T;
  const nd = d.dissolvedMass / 101.1023;
  const nu = d.undissolvedMass / 101.1023;
  const m = (10 * expectedDissolved) / 101.1023;
  const Q = nd * integralEnthalpyOfSolution(parseSalt('KNO3'), m, 20).value * 1000;
  const C = WATER_100G + nd * (-64.8 + relativeApparentHeatCapacity(brineModel(parseSalt('KNO3')).pitzer!, m, 293.15)) + nu * 96.4;

  it('stays mostly undissolved, saturated, between 0 and 10 °C', () => {
    expect(T).toBeGreaterThan(0);
    expect(T).toBeLessThan(10);
    expect(d.undissolvedMass).toBeGreaterThan(0.85 * 200);
    expect(d.saturated).toBe(true);
  });
  it('dissolves exactly what the solubility allows at the final temperature', () => {
    expect(Math.abs(d.dissolvedMass - expectedDissolved)).toBeLessThan(0.01);
    expect(d.solubility!.value).toBeCloseTo(d.dissolvedMass, 6);
    expect(d.dissolvedMass + d.undissolvedMass).toBeCloseTo(200, 9);
  });
  it('balances by hand: C·(T − T₀) + Q = 0 within 0.1 %', () => {
    expect(Math.abs(C * (T - 20) + Q)).toBeLessThan(0.001 * Q);
  });
  it('closes its energy balance', () => expectClosure(r));
});

describe('a hydrate fill: 100 g CaCl2·6H2O in 100 g water at 20 °C', () => {
  // M(CaCl2·6H2O) = 219.07 g/mol; n = 0.456479 mol brings 6 × 18.015 × n = 49.341 g of crystal water:
  //   W = 149.341 g, m = 3.0566 mol/kg (unsaturated: S ≈ 60 g CaCl2 per 100 g water near 0 °C, CRC)
  // ΔsolH°(CaCl2·6H2O, ∞) = +15.772 kJ/mol (formation cycle, NBS); φL(3.06 m, 20 °C) = +7.06 kJ/mol (pitzer.dat)
  //   → ΔsolH(m) = +22.834 kJ/mol, 45 % more cooling than at infinite dilution
  //   (no Kirchhoff shift: Cp° of the hexahydrate crystal is not tabulated, so ΔsolCp° is unknown and the interval widens)
  // C = 149.341 × 4.17935 + 0.456479 × (φCp° −277.9 + φJ 153.13) = 567.193 J/K
  //   (φCp° = Cp°(Ca²⁺, aq) −5.1 + 2 × Cp°(Cl⁻, aq) −136.4: Shock & Helgeson 1988 on the NBS scale, from memory, and NBS)
  // ΔT = −0.456479 × 22 834 / 567.193 = −18.377 K → T = 1.623 °C (5.67 °C with the crystal's Cp° standing in for φCp°)
  const hand = handTemperature('CaCl2·6H2O', 100, 20);
  const r = fill('CaCl2·6H2O', 100);
  it('reaches 1.62 °C with the crystal water in the solution', () => {
    expect(hand.T).toBeCloseTo(1.623, 2);
    expect(Math.abs(r.finalTemperature.value - hand.T)).toBeLessThan(0.01);
    expect(r.liquidWater).toBeCloseTo(hand.W, 2);
    expect(r.dissolved[0]!.integralEnthalpy.value / r.dissolved[0]!.enthalpyOfSolution.value).toBeGreaterThan(1.4);
  });
  it('closes its energy balance', () => expectClosure(r));
});

describe('an unsaturated fill started cold enough that ice forms: 30 g NH4NO3 in 100 g water at 2 °C', () => {
  // Without ice the balance would carry the fill below the brine's freezing point. Ice forms until the brine's
  // water activity equals that over ice. Hand check of the reported state (T, ice mass I, molality m):
  //   m = 1000·n/(100 − I) and the brine of molality m freezes at T (brineFreezingPoint);
  //   Q = n·ΔsolH(m, 2 °C)·1000 − (I/18.015)·ΔfusH(2 °C), ΔfusH(2 °C) = 6007 + 37.9 × 2 J/mol (NBS, from memory);
  //   C = (100 − I)·c(water) + n·(φCp° + φJ(m, 2 °C)) + I × 2.09 J/(g·K); C·(T − 2) + Q = 0.
  const r = fill('NH4NO3', 30, 2);
  const n = 30 / 80.043;
  const I = r.iceMass;
  const T = r.finalTemperature.value;
  const m = (1000 * n) / (100 - I);
  const salt = parseSalt('NH4NO3');
  const Q = n * integralEnthalpyOfSolution(salt, m, 2).value * 1000 - (I / 18.015) * (6007 + 37.9 * 2);
  const C = (100 - I) * (75.291 / 18.015) + n * ((aqueousHeatCapacity('NH4NO3')!.value) + relativeApparentHeatCapacity(brineModel(salt).pitzer!, m, 275.15)) + I * 2.09;

  it('reports the ice, and the brine left sits on its freezing curve', () => {
    expect(I).toBeGreaterThan(1);
    expect(r.dissolved[0]!.molality).toBeCloseTo(m, 6);
    expect(Math.abs(brineFreezingPoint(salt, m).value - T)).toBeLessThan(0.01);
  });
  it('balances by hand, the latent heat of the ice included, within 0.1 %', () => {
    expect(Math.abs(C * (T - 2) + Q)).toBeLessThan(0.001 * n * 25000);
  });
  it('closes its energy balance and has an interval of nonzero width', () => {
    expectClosure(r);
    expect(r.finalTemperature.high - r.finalTemperature.low).toBeGreaterThan(0);
  });
});

describe('a concentrated, solubility-limited NH4NO3 fill: 150 g in 100 g water at 20 °C', () => {
  const r = fill('NH4NO3', 150);
  const d = r.dissolved[0]!;
  it('ends saturated, with the dissolved mass the solubility allows at its final temperature', () => {
    expect(d.saturated).toBe(true);
    expect(d.solubility!.value * (r.liquidWater / 100)).toBeCloseTo(d.dissolvedMass, 4);
    // molality of the saturated brine, mol/kg: 10·S/M
    expect(d.molality).toBeCloseTo((1000 * d.dissolvedMass) / 80.043 / r.liquidWater, 6);
  });
  it('uses an integral enthalpy below the infinite-dilution value, with a wider interval (charge-type temperature terms)', () => {
    expect(d.integralEnthalpy.value).toBeLessThan(d.enthalpyOfSolution.value + 0.5);
    expect(d.integralEnthalpy.high - d.integralEnthalpy.low).toBeGreaterThan(d.enthalpyOfSolution.high - d.enthalpyOfSolution.low);
  });
  it('closes its energy balance', () => expectClosure(r));
});
