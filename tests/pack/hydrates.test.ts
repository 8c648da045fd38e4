// Water of crystallization in the fill model: a hydrate fill brings its water
// into the solution; an anhydrous fill whose saturating solid is a hydrate
// binds water in what stays undissolved.
import { describe, expect, it } from 'vitest';
import { packFinalTemperature } from '../../src/index.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { integralEnthalpyOfSolution } from '../../src/solution/integralEnthalpy.js';
import { brineModel } from '../../src/brine/brineModel.js';
import { relativeApparentHeatCapacity } from '../../src/brine/pitzerBrine.js';

const M_WATER = 18.015; // g/mol, IUPAC 2021 abridged weights
const C_WATER = 75.291 / M_WATER; // J/(g·K), NBS 1982 Cp°(H2O, l)

describe('a hydrate fill brings its water of crystallization into the solution', () => {
  // 50 g Na2S2O3·5H2O in 100 g water at 20 °C.
  // M(Na2S2O3·5H2O) = 248.1715 g/mol → n = 0.201474 mol, carrying 5n × 18.015 = 18.148 g of water.
  // ΔsolH(Na2S2O3·5H2O) by the cycle, NBS 1982 (all from memory):
  //   2 × ΔfH°(Na+, aq) + ΔfH°(S2O3 2−, aq) + 5 × ΔfH°(H2O, l) − ΔfH°(hydrate, cr)
  //   = 2 × (−240.12) − 652.3 + 5 × (−285.83) + 2607.93 = +46.24 kJ/mol
  // Heat capacity: 118.148 g water × 4.17935 + n × Cp°(Na2S2O3, cr); the table has no Cp° of
  //   anhydrous Na2S2O3, so Dulong–Petit: 7 atoms × 3R = 174.60 J/(mol·K) → 493.78 + 35.18 = 528.96 J/K
  // The balance takes the integral enthalpy to m = 1000·n/118.148 = 1.705 mol/kg: +46.24 kJ/mol plus φL from the
  // 1:2 charge-type estimate (no Pitzer parameters for Na2S2O3), and adds φJ of that estimate to the heat capacity.
  // Solubility at the final temperature ≈ 51 g Na2S2O3 per 100 g water (CRC); the solution holds 31.85 g in 118.1 g: unsaturated.
  const n = 50 / 248.17154;
  const water = 100 + 5 * n * M_WATER;
  const dH = 2 * -240.12 - 652.3 + 5 * -285.83 + 2607.93;
  const salt = parseSalt('Na2S2O3·5H2O');
  const m = (1000 * n) / water;
  const dHm = integralEnthalpyOfSolution(salt, m, 20).value;
  const C = water * C_WATER + n * (7 * 3 * 8.314462618 + relativeApparentHeatCapacity(brineModel(salt).pitzer!, m, 293.15));
  const r = packFinalTemperature({ solids: [{ formula: 'Na2S2O3·5H2O', massG: 50 }], waterG: 100, startC: 20 });

  it('counts the crystal water as liquid water of the solution', () => {
    expect(r.liquidWater).toBeCloseTo(water, 3);
    expect(r.liquidWater).toBeCloseTo(118.148, 2);
  });
  it('reaches the hand-calculated temperature', () => {
    expect(dH).toBeCloseTo(46.24, 6);
    expect(Math.abs(r.finalTemperature.value - (20 - (n * dHm * 1000) / C))).toBeLessThan(0.01);
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
  });
});

describe('an undissolved hydrate stays as loaded', () => {
  // 200 g NaCH3COO·3H2O in 100 g water: far more than dissolves; what stays is the trihydrate
  // itself, which is the equilibrium solid below 58 °C in the CRC table.
  const r = packFinalTemperature({ solids: [{ formula: 'NaCH3COO·3H2O', massG: 200 }], waterG: 100, startC: 20 });
  const d = r.dissolved[0]!;
  it('leaves trihydrate, holding its own water', () => {
    expect(d.saturated).toBe(true);
    expect(d.undissolvedSolid?.formula).toBe('NaCH3COO·3H2O');
    expect(d.undissolvedSolid!.mass).toBeCloseTo(d.undissolvedMass, 6);
    expect(r.heat.solidConversion).toBe(0);
  });
  it('has liquid water = loaded water + the crystal water of what dissolved', () => {
    const dissolvedMoles = d.dissolvedMass / 136.07877;
    expect(r.liquidWater).toBeCloseTo(100 + 3 * dissolvedMoles * M_WATER, 2);
    // and that water holds exactly the solubility: anhydrous grams per 100 g of liquid water
    expect((100 * dissolvedMoles * 82.0338) / r.liquidWater).toBeCloseTo(d.solubility!.value, 4);
  });
});

describe('anhydrous salt whose saturating solid is a hydrate binds water when it stays undissolved', () => {
  // 60 g anhydrous Na2CO3 in 100 g water at 10 °C warms (ΔsolH < 0) until saturated; near 38 °C the CRC
  // table's nearest equilibrium solid is Na2CO3·H2O. What stays undissolved is taken to become that
  // monohydrate, taking one water each from the solution, with the heat
  // ΔsolH(Na2CO3) − ΔsolH(Na2CO3·H2O) (NBS 1982 cycle values, from memory; negative = released).
  const r = packFinalTemperature({ solids: [{ formula: 'Na2CO3', massG: 60 }], waterG: 100, startC: 10 });
  const d = r.dissolved[0]!;
  it('turns the undissolved anhydrous salt into the monohydrate', () => {
    expect(d.saturated).toBe(true);
    expect(d.undissolvedSolid?.formula).toMatch(/^Na2CO3·1?H2O$/);
    // the monohydrate weighs more than the anhydrous salt it came from: 124.00 / 105.99 g/mol
    expect(d.undissolvedSolid!.mass / d.undissolvedMass).toBeCloseTo((105.98754 + M_WATER) / 105.98754, 4);
  });
  it('takes that water out of the solution', () => {
    const boundWater = (d.undissolvedMass / 105.98754) * M_WATER;
    expect(r.liquidWater).toBeCloseTo(100 - boundWater, 3);
    expect((100 * d.dissolvedMass) / r.liquidWater).toBeCloseTo(d.solubility!.value, 4);
  });
  it('counts the heat of hydration and still closes the balance', () => {
    expect(r.heat.solidConversion).toBeLessThan(0);
    expect(r.heat.dissolution + r.heat.solidConversion).toBeCloseTo(r.heat.absorbed, 9);
    expect(r.heat.imbalance).toBeLessThan(0.001);
    expect(r.notes.some((n) => n.includes('turn into') && n.includes('Na2CO3'))).toBe(true);
  });
});
