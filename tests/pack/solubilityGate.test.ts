// Solubility as a gate in the pack model: a sparingly soluble salt dissolves only what it can, and a salt
// whose solubility is unknown is reported as such, with an interval from none to all of it dissolved.
// Shared numbers (see handFills.test.ts): 100 g of water hold 417.935 J/K (NBS 1982 Cp°(H2O, l), IUPAC 2021 M(H2O)).
import { describe, expect, it } from 'vitest';
import { packFinalTemperature, saltSolubility } from '../../src/index.js';
import { runCliInMemory } from '../node/runCliInMemory.js';

const fill = (solids: { formula: string; massG: number }[], startC = 20) => packFinalTemperature({ solids, waterG: 100, startC });

describe('a salt that barely dissolves: 30 g AgCl in 100 g water at 20 °C', () => {
  // Solubility estimated from llnl.dat (Chlorargyrite, log Ksp −9.7453): s = 10^−4.87265 = 1.3408e-5 mol/kg
  //   → 1.3408e-5 × 143.32 g/mol / 10 = 1.9216e-4 g per 100 g water, the same at every temperature.
  // Dissolved: 1.92e-4 g = 1.3408e-6 mol; ΔsolH(AgCl) ≈ +65.5 kJ/mol (cycle basis) → Q = 1.3408e-6 × 65 490 = 0.0878 J.
  // C ≈ 417.935 + (30/143.32) × Cp°(AgCl, cr) ≈ 428.6 J/K → ΔT = −0.0878 / 428.6 = −2.05e-4 K.
  // Before the gate the salt was taken to dissolve completely and the fill was reported at −7.8 °C.
  const r = fill([{ formula: 'AgCl', massG: 30 }]);

  it('dissolves a fifth of a milligram and stays within a thousandth of a kelvin of its start', () => {
    expect(r.dissolved[0]!.solubilityStatus).toBe('estimated');
    expect(r.dissolved[0]!.dissolvedMass).toBeCloseTo(1.92e-4, 6);
    expect(r.dissolved[0]!.saturated).toBe(true);
    expect(r.temperatureChange).toBeCloseTo(-2.05e-4, 5);
    // The estimate's 95 % range (a factor of about 96 either way for the d-block Ag⁺) still leaves the fill within 0.03 K.
    expect(r.finalTemperature.low).toBeGreaterThan(19.97);
    expect(r.finalTemperature.high).toBeLessThanOrEqual(20);
  });

  it('says where the solubility came from, with its source', () => {
    expect(r.dissolved[0]!.solubility).toMatchObject({ solidPhase: 'AgCl', source: 'llnlDat' });
    expect(r.notes.some((n) => n.startsWith('solubility of AgCl estimated from log Ksp -9.75'))).toBe(true);
    expect(r.sources).toEqual(expect.arrayContaining(['llnlDat', 'solubilityEstimatePractice']));
  });

  it('closes the energy balance (0.1 %)', () => {
    expect(Math.abs(r.heat.absorbed + r.heat.sensible)).toBeLessThanOrEqual(0.001 * Math.abs(r.heat.absorbed));
  });
});

describe('a salt whose solubility is unknown: 30 g ScF3 in 100 g water at 20 °C', () => {
  const r = fill([{ formula: 'ScF3', massG: 30 }]);

  it('is reported as unknown, with no solubility and a note', () => {
    expect(r.dissolved[0]!.solubilityStatus).toBe('unknown');
    expect(r.dissolved[0]!.solubility).toBeNull();
    expect(r.notes.some((n) => n.startsWith('no solubility data for ScF3') && n.includes('none dissolved'))).toBe(true);
  });

  it('gives the temperature with everything dissolved, and an interval that reaches back to the start (none dissolved)', () => {
    expect(r.dissolved[0]!.dissolvedMass).toBeCloseTo(30, 9);
    // With none dissolved nothing happens: the fill stays at 20 °C, the top of the interval.
    expect(r.finalTemperature.high).toBeCloseTo(20, 9);
    expect(r.finalTemperature.low).toBeLessThanOrEqual(r.finalTemperature.value);
    expect(r.interval.description).toContain('the unknown solubility of ScF3 (from none to all of it dissolved)');
  });
});

describe('a mixed fill with one unknown solubility: 10 g KNO3 and 5 g KCH3COO in 100 g water', () => {
  // KNO3 alone (handFills.test.ts): 11.51 °C (Q = 3512 J, C = 413.7 J/K). With the 5 g KCH3COO undissolved it adds only its
  // heat capacity, n·Cp° = 0.05095 mol × 199.5 J/(mol·K) (Dulong–Petit, 3R per atom: no Cp° in the table) = 10.2 J/K,
  // so 20 − 3512/423.9 = 11.72 °C. With it all dissolved, its heat of solution (exothermic, −15.33 kJ/mol, CRC) warms the fill.
  const r = fill([
    { formula: 'KNO3', massG: 10 },
    { formula: 'KCH3COO', massG: 5 },
  ]);

  it('spans both ends: the KNO3-only state at the low end and full dissolution inside', () => {
    expect(r.dissolved.map((d) => d.solubilityStatus)).toEqual(['measured', 'unknown']);
    expect(r.finalTemperature.low).toBeLessThanOrEqual(11.72 + 0.05);
    expect(r.finalTemperature.low).toBeGreaterThan(11.0);
    expect(r.finalTemperature.high).toBeGreaterThanOrEqual(r.finalTemperature.value);
    expect(r.finalTemperature.value).toBeGreaterThan(11.72 + 0.05); // its dissolution (exothermic) warms the fill past the KNO3-only state
  });
});

describe('saltSolubility', () => {
  it('has measured curves for the soluble salts a formulator tries first (CRC, mass percent w → 100w/(100 − w))', () => {
    // CRC 98th ed.: LiNO3 42.7 % at 20 °C, LiI 61.7 %, NaI 63.9 %, NaClO4 66.2 %, KOH 53.2 %, Na2HPO4 7.51 %.
    const expected: [string, number, string][] = [
      ['LiNO3', 42.7, 'LiNO3·3H2O'],
      ['LiI', 61.7, 'LiI·3H2O'],
      ['NaI', 63.9, 'NaI·2H2O'],
      ['NaClO4', 66.2, 'NaClO4·H2O'],
      ['KOH', 53.2, 'KOH·2H2O'],
      ['Na2HPO4', 7.51, 'Na2HPO4·12H2O'],
    ];
    for (const [formula, w, solid] of expected) {
      const s = saltSolubility(formula, 20);
      expect(s.status, formula).toBe('measured');
      // The record keeps four significant digits of r.
      expect(Math.abs(s.value! / ((100 * w) / (100 - w)) - 1), formula).toBeLessThan(5e-4);
      expect(s.solidPhase, formula).toBe(solid);
    }
  });

  it('reads a measured curve with 2 % standard uncertainty: KNO3 at 20 °C, 31.93 g per 100 g water (CRC)', () => {
    const s = saltSolubility('KNO3', 20);
    expect(s).toMatchObject({ status: 'measured', method: 'table', value: 31.93, solidPhase: 'KNO3', source: 'crcSolubility', fromMemory: false, extrapolated: false });
    expect(s.u).toBeCloseTo(0.6386, 4);
  });

  it('estimates a sparingly soluble salt with its range and says it holds at 25 °C only', () => {
    // BaSO4 (Barite, log Ksp −9.9711), a main-group cation: u(log10 s) = √((0.3/2)² + 0.4²) = 0.42720; 10^(1.96 × 0.42720) = 6.874
    const s = saltSolubility('BaSO4', 60);
    expect(s).toMatchObject({ status: 'estimated', method: 'solubility-product', source: 'llnlDat', extrapolated: true });
    expect(s.high! / s.value!).toBeCloseTo(6.874, 2);
    expect(s.value! / s.low!).toBeCloseTo(6.874, 2);
    // s = 10^(−9.9711/2) = 1.0338e-5 mol/kg × 233.39 g/mol / 10 = 2.413e-4 g per 100 g water
    expect(s.value!).toBeCloseTo(2.413e-4, 6);
    // AgCl, a d-block cation: u = √(0.15² + 1.0²) = 1.01119; 10^(1.96 × 1.01119) = 95.92
    const agcl = saltSolubility('AgCl');
    expect(agcl.high! / agcl.value!).toBeCloseTo(95.92, 1);
    expect(agcl.extrapolated).toBe(false);
  });

  it('declares unknown a salt with no data, a soluble salt the products cannot estimate, and a highly charged cation', () => {
    expect(saltSolubility('ScF3')).toMatchObject({ status: 'unknown', value: null, u: null, method: 'none', source: null });
    // NiCl2: llnl.dat log K 8.6113 → ideal s of several mol/kg: soluble, but beyond the estimate
    expect(saltSolubility('NiCl2').note).toContain('among the soluble salts');
    expect(saltSolubility('Al(OH)3').note).toContain('charge 3 or more');
  });

  it('finds a hydrate’s salt and refuses a temperature outside −100 to 200 °C', () => {
    expect(saltSolubility('MgSO4·7H2O', 25).value).toBe(35.69);
    expect(() => saltSolubility('KNO3', 500)).toThrow(/temperature/);
  });
});

describe('the pack command', () => {
  it('prints the solubility status and a sparingly soluble value to three significant digits in its JSON', async () => {
    const run = await runCliInMemory(['pack', '--salt', 'AgCl', '--salt-mass', '30', '--water', '100', '--json']);
    const out = JSON.parse(run.out) as { dissolved: { solubilityStatus: string; solubility: { value: number } }[] };
    expect(out.dissolved[0]!.solubilityStatus).toBe('estimated');
    expect(out.dissolved[0]!.solubility.value).toBe(0.000192);
  });
});
