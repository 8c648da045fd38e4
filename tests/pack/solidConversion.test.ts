// Conversion of undissolved solid into the equilibrium solid of the solubility table, and the measured
// solubility's own uncertainty in the pack interval. Shared numbers (see handFills.test.ts): 100 g of water
// hold 417.935 J/K (NBS 1982 Cp°(H2O, l), IUPAC 2021 M(H2O)).
import { describe, expect, it } from 'vitest';
import { packFinalTemperature, packRatioCurve } from '../../src/index.js';
import { preparePackFill } from '../../src/pack/packFill.js';
import { solveFillTemperature } from '../../src/pack/solveFillTemperature.js';
import { uncertainInputs } from '../../src/pack/finalTemperatureInterval.js';
import { CONVERSION_MIN_SOLUBILITY, convertsWithinPack } from '../../src/pack/solidConversion.js';
import { COVERAGE_95 } from '../../src/quantity/constants.js';

const fill = (formula: string, massG: number, startC = 20) => packFinalTemperature({ solids: [{ formula, massG }], waterG: 100, startC });

describe('the rule: conversion is counted only for a salt that dissolves at least 1 g per 100 g water', () => {
  it('puts the boundary at 1 g per 100 g water (pharmacopoeia terms, from memory)', () => {
    expect(CONVERSION_MIN_SOLUBILITY).toBe(1);
    expect(convertsWithinPack(0.99)).toBe(false);
    expect(convertsWithinPack(1)).toBe(true);
  });
});

describe('anhydrite that barely dissolves: 30 g CaSO4 in 100 g water at 20 °C', () => {
  // Hand calculation. CRC: w = 0.202 % at 20 °C → S = 100·0.202/99.798 = 0.2024 g per 100 g water; the
  // undissolved anhydrite stays anhydrite (no water bound), so 0.2024 g = 1.487e-3 mol dissolve. NBS 1982
  // ΔsolH°(∞, 25 °C) = −17.99 kJ/mol, brought to 20 °C by Kirchhoff with ΔCp° = Cp°(Ca²⁺, aq) + Cp°(SO₄²⁻, aq)
  // − Cp°(CaSO4, cr) = −5.1 − 293 − 99.7 = −397.8 J/(mol·K) (Shock & Helgeson on the NBS scale; NBS 1982):
  // −17.99 + 0.3978·5 = −16.00; plus φL to 0.015 mol/kg (+1.35, the charge-type estimate) → −14.65 kJ/mol,
  // Q = −21.8 J. C = 417.935 + (29.8/136.14)·99.7 (NBS 1982 Cp°(CaSO4, cr)) ≈ 439.8 J/K → ΔT ≈ +0.0496 K.
  // Counting the conversion to gypsum in full (the old behaviour) gives about +8.7 K.
  const r = fill('CaSO4', 30);

  it('dissolves its solubility and leaves the rest as loaded, warming by about 0.05 K', () => {
    expect(r.dissolved[0]!.dissolvedMass).toBeCloseTo(0.2024, 3);
    expect(r.dissolved[0]!.undissolvedSolid!.formula).toBe('CaSO4');
    expect(r.heat.solidConversion).toBe(0);
    // ±0.003 K: the φL estimate (±0.2 kJ/mol here) and Cp° (±2 %) move ΔT by under 0.002 K.
    expect(Math.abs(r.temperatureChange - 0.0496)).toBeLessThan(0.003);
  });

  it('reaches with its interval to the temperature with the conversion to gypsum counted in full', () => {
    const counted = solveFillTemperature(preparePackFill({ solids: [{ formula: 'CaSO4', massG: 30 }], waterG: 100, startC: 20 }), { slowConversion: true });
    expect(counted.temperature).toBeGreaterThan(25);
    expect(counted.state.solids[0]!.undissolvedPhase).toBe('CaSO4·2H2O');
    expect(r.finalTemperature.high).toBeCloseTo(counted.temperature, 6);
    expect(r.interval.description).toContain('slow conversion of undissolved CaSO4 into CaSO4·2H2O');
  });

  it('says why in a note, and closes the energy balance (0.1 %)', () => {
    expect(r.notes.some((n) => n.startsWith('undissolved CaSO4 is taken to stay as loaded: it barely dissolves'))).toBe(true);
    expect(r.heat.imbalance).toBeLessThan(1e-3);
  });
});

describe('an estimated solubility below the boundary: 30 g CuF2 in 100 g water at 20 °C', () => {
  // llnl.dat puts CuF2·2H2O at about 0.19 g per 100 g water: no conversion in the central value, so the
  // fill stays within a kelvin of its start (it ranked #64 of a cold screen at 41 °C before).
  const r = fill('CuF2', 30);
  it('does not count the conversion to CuF2·2H2O and stays within 1 K of the start', () => {
    expect(r.heat.solidConversion).toBe(0);
    expect(Math.abs(r.temperatureChange)).toBeLessThan(1);
    expect(r.finalTemperature.high).toBeGreaterThan(30);
  });
});

describe('a soluble salt still converts: 60 g anhydrous MgSO4 in 100 g water at 20 °C', () => {
  // CRC: MgSO4 dissolves 25–50 g per 100 g water; the excess takes up water as the table's equilibrium solid.
  const r = fill('MgSO4', 60);
  it('counts the conversion of what stays undissolved', () => {
    expect(r.dissolved[0]!.saturated).toBe(true);
    expect(r.heat.solidConversion).toBeLessThan(0);
    expect(r.dissolved[0]!.undissolvedSolid!.formula).not.toBe('MgSO4');
  });
});

describe('the measured solubility in the interval: 50 g KNO3 in 100 g water at 20 °C (saturated)', () => {
  // Hand calculation. CRC: S(0 °C) = 13.64, S(10 °C) = 21.36 g per 100 g water, so S(T) = 13.64 + 0.772·T
  // near the final temperature. The solved fill takes up 6.287 kJ over 14.23 K: C = 441.8 J/K, and KNO3
  // takes up 35.13 kJ/mol (integral, to 1.79 mol/kg) / 101.10 g/mol = 347.5 J per gram dissolved.
  //   441.8·(T − 20) + 347.5·(13.64 + 0.772·T) = 0          → T = 5.768 °C (the solved value)
  //   441.8·(T − 20) + 347.5·1.0392·(13.64 + 0.772·T) = 0   → T = 5.427 °C (S at +1.96·2 %)
  // a shift of 0.34 K; ±0.05 K for φL and φCp changing with the extra salt, which the hand sum leaves out.
  const prepared = preparePackFill({ solids: [{ formula: 'KNO3', massG: 50 }], waterG: 100, startC: 20 });
  const solution = solveFillTemperature(prepared);
  it('is an uncertain input of 2 % for a saturated salt', () => {
    const input = uncertainInputs(prepared, solution).find((i) => i.label.startsWith('solubility of KNO3'));
    expect(input?.u).toBe(0.02);
  });
  it('moves the final temperature by 0.34 K at the top of its 95 % interval', () => {
    const higher = solveFillTemperature(prepared, { solubilityRelative: [COVERAGE_95 * 0.02] });
    const shift = solution.temperature - higher.temperature;
    expect(Math.abs(shift - 0.34)).toBeLessThan(0.05);
    const r = fill('KNO3', 50);
    expect(r.finalTemperature.low).toBeLessThanOrEqual(higher.temperature + 1e-9);
  });
  it('is no input where the salt is far from saturation (10 g KNO3)', () => {
    const dilute = preparePackFill({ solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 });
    expect(uncertainInputs(dilute, solveFillTemperature(dilute)).some((i) => i.label.startsWith('solubility'))).toBe(false);
  });
});

describe('the interval band of the NH4NO3 ratio curve is continuous across ice, saturation and the eutectic', () => {
  // 100 g water at 20 °C, NH4NO3 from 0 to 1.6 g per g water (40 points, 0.041 g/g apart): ice can form from
  // about 0.28 g/g, the salt saturates at the eutectic near 0.64 g/g (CRC curve and eutectic) and leaves it near
  // 1 g/g. Before, the band's top jumped by 4.4 K where ice first formed (the osmotic coefficients counted only
  // once ice was there) and by 7.8 K where the fill left the eutectic, and its bottom collapsed onto the value
  // where a re-solve stopped at a eutectic above it. Between neighbours the ends may now move by the slope of
  // the curve itself plus at most 2 K.
  const curve = packRatioCurve({ solids: [{ formula: 'NH4NO3', massG: 1 }], waterG: 100, startC: 20 }, { points: 40, maxRatio: 1.6 });
  it('moves each end of the band by at most 2 K more than the value between neighbouring points', () => {
    const pts = curve.points.map((p) => ({ ratio: p.ratio, t: p.temperature, low: p.low!, high: p.high! }));
    for (let k = 1; k < pts.length; k++) {
      const [a, b] = [pts[k - 1]!, pts[k]!];
      const dT = Math.abs(b.t - a.t);
      expect(Math.abs(b.low - a.low), `low at ${b.ratio}`).toBeLessThanOrEqual(dT + 2);
      expect(Math.abs(b.high - a.high), `high at ${b.ratio}`).toBeLessThanOrEqual(dT + 2);
      expect(b.low).toBeLessThan(b.t + 1e-9);
    }
  });
});

describe('a salt that dissolves almost nothing: 40 g ZnS in 80 g water at 22 °C', () => {
  // llnl.dat puts sphalerite's solubility near 1e-10 g per 100 g water: the fill moves by far less than the
  // solver's tolerance (1e-9 K), so it reports no imbalance and an interval at least that tolerance wide.
  const r = packFinalTemperature({ solids: [{ formula: 'ZnS', massG: 40 }], waterG: 80, startC: 22 });
  it('closes the balance within the solve tolerance and has an interval of non-zero width', () => {
    expect(r.heat.imbalance).toBe(0);
    expect(r.finalTemperature.high).toBeGreaterThan(r.finalTemperature.low);
    expect(Math.abs(r.temperatureChange)).toBeLessThan(1e-6);
  });
});
