// The apparent molar heat capacity of a dissolved salt, φCp = φCp° + φJ (φCp° = Σν·Cp°(ion, aq), φJ from
// Pitzer's heat-capacity terms), against the model of Laliberté (2009) for the heat capacity of aqueous
// solutions (parameters as carried by the chemicals package 1.5.2, MIT licence, copied into
// tests/reference/brine-laliberte-heat-capacity.json), and the CaCl2·6H2O fill that depends on it.
import { describe, expect, it } from 'vitest';
import { packFinalTemperature } from '../../src/index.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { builtinDataset } from '../../src/data/builtin.js';
import { brineModel } from '../../src/brine/brineModel.js';
import { brineHeatCapacity, brineHeatCapacityU } from '../../src/brine/brineProperties.js';
import { aqueousHeatCapacity, solidHeatCapacity } from '../../src/pack/solidHeatCapacity.js';
import { integralEnthalpyOfSolution } from '../../src/solution/integralEnthalpy.js';
import { laliberteApparentSpecificHeat, laliberteMolarHeatCapacity, laliberteSalts } from '../../src/node/scripts/brineReferenceData.js';

const salts = laliberteSalts();
const apparentSpecificHeat = laliberteApparentSpecificHeat;
const laliberteMolar = (formula: string, m: number, t = 25) => laliberteMolarHeatCapacity(salts[formula]!, m, t);

function toolMolar(formula: string, m: number): { value: number; u: number } | undefined {
  const salt = parseSalt(formula);
  const aq = aqueousHeatCapacity(salt);
  const model = brineModel(salt);
  if (!aq || !model.own.heatCapacity || m > model.maxMolality) return undefined;
  return { value: aq.value + brineHeatCapacity(model, m, 298.15), u: Math.hypot(aq.u, brineHeatCapacityU(model, m, 298.15)) };
}

describe('Cp° of Ca²⁺ and Mg²⁺ (aq)', () => {
  const records = builtinDataset().records('ion-heat-capacities-aq.json');
  it('come from Shock & Helgeson (1988), brought to the NBS scale of the table, said to be from memory', () => {
    for (const [ion, cal] of [['Ca[2+]', -7.53], ['Mg[2+]', -5.34]] as const) {
      const r = records.find((x) => x.ion === ion)!;
      expect(r.source).toBe('shockHelgeson1988');
      expect(r.fromMemory).toBe(true);
      // their value in J/(mol·K) plus z × 13.2, the offset of their Cl⁻ (−123.2) from NBS (−136.4)
      expect(r.value).toBeCloseTo(cal * 4.184 + 2 * 13.2, 1);
    }
  });
  it('give φCp°(CaCl2) = −277.9 J/(mol·K), the neutral sum of Shock & Helgeson (−31.5 + 2 × −123.2)', () => {
    expect(aqueousHeatCapacity('CaCl2')!.value).toBeCloseTo(-7.53 * 4.184 + 2 * -29.44 * 4.184, 0);
  });
});

describe('φCp = φCp° + φJ against Laliberté (2009) at 25 °C', () => {
  const rows: { formula: string; m: number; diff: number; tolerance: number }[] = [];
  for (const formula of Object.keys(salts)) {
    for (const m of [1, 2, 3, 4, 5, 6]) {
      const ref = laliberteMolar(formula, m);
      if (ref.w > salts[formula]!.maxW) continue;
      const tool = toolMolar(formula, m);
      if (!tool) continue;
      rows.push({ formula, m, diff: tool.value - ref.value, tolerance: 1.96 * Math.hypot(tool.u, ref.u) });
    }
  }
  it('covers at least 90 % of the points with its 95 % interval (salts with their own heat-capacity terms, 1–6 mol/kg within both fits)', () => {
    expect(rows.length).toBeGreaterThanOrEqual(25);
    const inside = rows.filter((r) => Math.abs(r.diff) <= r.tolerance).length;
    expect(inside / rows.length).toBeGreaterThanOrEqual(0.9);
  });
  it('agrees within 10 J/(mol·K) for NaCl and KCl, whose Cp° and Pitzer terms are best known', () => {
    for (const r of rows.filter((x) => x.formula === 'NaCl' || x.formula === 'KCl')) expect(Math.abs(r.diff)).toBeLessThan(10);
  });
  it('puts dissolved CaCl2 near zero at 5 mol/kg where the crystal Cp° (72.6 J/(mol·K)) stood in before', () => {
    const ref = laliberteMolar('CaCl2', 5);
    const tool = toolMolar('CaCl2', 5)!;
    expect(ref.value).toBeCloseTo(-18.5, 0); // Laliberté, 25 °C
    expect(Math.abs(tool.value - ref.value)).toBeLessThan(1.96 * tool.u);
    expect(solidHeatCapacity('CaCl2').value + brineHeatCapacity(brineModel(parseSalt('CaCl2')), 5, 298.15) - ref.value).toBeGreaterThan(250);
  });
});

describe('150 g CaCl2·6H2O in 50 g water at 20 °C, checked by an independent balance', () => {
  // Independent balance (all arithmetic below): the same solubility curve (CRC, data/solubility.json: 57.98 g per
  // 100 g water at 0 °C, straight to the eutectic −50 °C, 31 % by mass) and the same integral enthalpy of
  // solution (NBS cycle + pitzer.dat φL, the only published φL of CaCl2 in reach), but the heat capacity of the
  // final brine from Laliberté (2009) instead of φCp° + φJ: its specific heat at the mean of start and end,
  // water 4.18 J/(g·K) (NBS 75.29 J/(mol·K) at 25 °C), and the undissolved hexahydrate at its Neumann–Kopp
  // estimate 316 J/(mol·K) (solidHeatCapacity). Fixed point of T = 20 − Q(T)/C(T), damped.
  const M = 110.984;
  const Mh = 219.075;
  const Mw = 18.015;
  const n0 = 150 / Mh;
  const solubility = (t: number): number => (t >= 0 ? 57.98 + (64.45 - 57.98) * (t / 10) : 57.98 + (57.98 - (100 * 0.31) / 0.69) * (t / 50));
  const hexahydrate = parseSalt('CaCl2·6H2O');
  const cpHex = solidHeatCapacity(hexahydrate).value;
  function independent(limited: boolean) {
    let t = -5;
    let state = { t, dissolved: 0, m: 0 };
    for (let k = 0; k < 200; k++) {
      const s = solubility(t);
      const nd = limited ? Math.min(n0, (50 * s) / (100 * M - 6 * Mw * s)) : n0;
      const W = 50 + 6 * Mw * nd;
      const m = (1000 * nd) / W;
      const Q = nd * integralEnthalpyOfSolution(hexahydrate, m, 20).value * 1000;
      const w = (nd * M) / (W + nd * M);
      const C = W * 4.18 + nd * M * apparentSpecificHeat(salts.CaCl2!, (20 + t) / 2, w) + (n0 - nd) * cpHex;
      t = 0.5 * t + 0.5 * (20 - Q / C);
      state = { t, dissolved: nd * Mh, m };
    }
    return state;
  }
  const r = packFinalTemperature({ solids: [{ formula: 'CaCl2·6H2O', massG: 150 }], waterG: 50, startC: 20 });

  it('the independent balance gives about −10 °C with about 119 g dissolved (5.0 mol/kg); the tool agrees within 1 K and its interval covers it', () => {
    const ind = independent(true);
    expect(ind.t).toBeGreaterThan(-11);
    expect(ind.t).toBeLessThan(-9);
    expect(ind.dissolved).toBeCloseTo(119, 0);
    expect(Math.abs(r.finalTemperature.value - ind.t)).toBeLessThan(1);
    expect(r.finalTemperature.low).toBeLessThan(ind.t);
    expect(r.finalTemperature.high).toBeGreaterThan(ind.t);
    expect(r.dissolved[0]!.molality).toBeCloseTo(ind.m, 1);
  });
  it('about −15 °C or colder only if all 150 g dissolved: the hexahydrate saturates near 55 g per 100 g water at −10 °C', () => {
    expect(independent(false).t).toBeLessThan(-15);
    expect(r.dissolved[0]!.saturated).toBe(true);
  });
  it('no longer has the crystal Cp° standing in for φCp° of CaCl2', () => {
    expect(r.notes.some((n) => n.includes('no infinite-dilution heat capacity for CaCl2'))).toBe(false);
    expect(r.heatCapacity.parts!.dissolvedSalt).toBeLessThan(0);
  });
});
