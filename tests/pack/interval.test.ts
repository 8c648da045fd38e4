// The 95 % interval of the final temperature: bounds by default, seeded Monte Carlo on request.
import { describe, expect, it } from 'vitest';
import { dissolve, molarMass, packFinalTemperature } from '../../src/index.js';
import { DEFAULT_SEED } from '../../src/pack/finalTemperatureInterval.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { integralEnthalpyOfSolution } from '../../src/solution/integralEnthalpy.js';
import { aqueousHeatCapacity } from '../../src/pack/solidHeatCapacity.js';
import { brineModel } from '../../src/brine/brineModel.js';
import { brineHeatCapacityU } from '../../src/brine/brineProperties.js';

const fill = { solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 };

describe('bounds interval of a dilute KNO3 fill, by hand', () => {
  // T = T₀ + ΔT with ΔT = −n·ΔsolH(m)·1000/C = −8.490 K (see handFills.test.ts).
  // Enthalpy input: ΔsolH°(∞) with u = 0.2 kJ/mol (the solution-enthalpy table's default) widened, after Kirchhoff, by
  //   the ΔsolCp° term, and φL's u at m = 0.989 mol/kg (charge-type temperature terms for KNO3): its own ends combined
  //   in quadrature; T moves linearly: n·spread·1000/C either way.
  // Heat capacity from the parts: u(C)² = (100 g × 0.1/18.015)² + (n·√(u(φCp°)² + u(φJ)²))², relative to C;
  //   at ±1.96·u_rel, T = T₀ + ΔT/(1 ± 1.96·u_rel).
  // high = T + √(shiftH² + upC²), low = T − √(shiftH² + downC²).
  const r = packFinalTemperature(fill);
  const d = r.dissolved[0]!;
  const n = 10 / 101.1023;
  const C = r.heatCapacity.value;
  const dT = r.finalTemperature.value - 20;
  const I = d.integralEnthalpy;
  const shiftUp = (n * (I.high - I.value) * 1000) / C;
  const shiftDown = (n * (I.value - I.low) * 1000) / C;
  const uJ = brineHeatCapacityU(brineModel(parseSalt('KNO3')), d.molality, 293.15);
  const uRel = Math.hypot((100 * 0.1) / 18.015, n * Math.hypot(aqueousHeatCapacity('KNO3')!.u, uJ)) / C;
  const upC = dT / (1 + 1.959963984540054 * uRel) - dT;
  const downC = dT - dT / (1 - 1.959963984540054 * uRel);

  it('matches the hand propagation', () => {
    expect(r.interval.method).toBe('bounds');
    expect(r.finalTemperature.high - r.finalTemperature.value).toBeCloseTo(Math.hypot(shiftDown, upC), 4);
    expect(r.finalTemperature.value - r.finalTemperature.low).toBeCloseTo(Math.hypot(shiftUp, downC), 4);
    expect(r.heatCapacity.u).toBeCloseTo(uRel * C, 6);
  });
  it('says how it was made', () => {
    expect(r.finalTemperature.notes[0]).toContain('bounds');
    expect(r.finalTemperature.unit).toBe('°C');
  });
});

describe('seeded Monte Carlo interval', () => {
  const mc = packFinalTemperature(fill, { interval: { method: 'monte-carlo' } });
  const again = packFinalTemperature(fill, { interval: { method: 'monte-carlo' } });
  const other = packFinalTemperature(fill, { interval: { method: 'monte-carlo', seed: 99, samples: 4000 } });
  const bounds = packFinalTemperature(fill);

  it('uses the fixed default seed, so the same fill gives the same interval', () => {
    expect(mc.interval.seed).toBe(DEFAULT_SEED);
    expect(mc.interval.samples).toBe(2000);
    expect(again.finalTemperature).toEqual(mc.finalTemperature);
  });
  it('agrees with the bounds interval for a fill far from any limit', () => {
    for (const m of [mc, other]) {
      expect(Math.abs(m.finalTemperature.high - bounds.finalTemperature.high)).toBeLessThan(0.05);
      expect(Math.abs(m.finalTemperature.low - bounds.finalTemperature.low)).toBeLessThan(0.05);
    }
    expect(other.finalTemperature.low).not.toBe(mc.finalTemperature.low);
  });
});

describe('an override heat capacity', () => {
  // 10 g KNO3 with your own 500 ± 10 J/K for the whole fill: Q = n·ΔsolH(m) = 0.098910 × 35 509 = 3512.2 J
  // (see handFills.test.ts), ΔT = −3512.2 J / 500 J/K = −7.024 K.
  const r = packFinalTemperature(fill, { heatCapacityJPerK: 500, heatCapacityUJPerK: 10 });
  const Q = (10 / 101.1023) * integralEnthalpyOfSolution(parseSalt('KNO3'), (1000 * 10) / 101.1023 / 100, 20).value * 1000;
  it('replaces the sum of parts and carries its own uncertainty', () => {
    expect(r.heatCapacity.basis).toBe('override');
    expect(r.heatCapacity.value).toBe(500);
    expect(r.finalTemperature.value).toBeCloseTo(20 - Q / 500, 6);
    expect(r.finalTemperature.high - r.finalTemperature.value).toBeGreaterThan(0.1);
  });
});

describe('a fill held at its eutectic still has an interval', () => {
  // 60 g KNO3 from 0 °C holds at the KNO3–ice eutectic (clamp.test.ts): where that lies is uncertain through the
  // osmotic coefficient, so the interval has width (a zero-width interval would claim the eutectic exactly known).
  const r = packFinalTemperature({ solids: [{ formula: 'KNO3', massG: 60 }], waterG: 100, startC: 0 });
  it('has nonzero width around the hold', () => {
    expect(r.clamp?.kind).toBe('eutectic');
    expect(r.finalTemperature.high - r.finalTemperature.low).toBeGreaterThan(0.01);
    expect(r.finalTemperature.low).toBeLessThanOrEqual(r.finalTemperature.value);
  });
});

describe('an enthalpy whose own interval is wider than ±1.96·u', () => {
  // KHS has only the model basis; its interval carries a Student-t factor from
  // the lattice calibration, so high − low > 2 × 1.96 × u. With the heat
  // capacity given exactly (u = 0) the fill's interval comes from the
  // enthalpy alone, and a fully dissolved fill is linear in it:
  //   T = T₀ − n·ΔH·1000/C, so T(high) − T = n·(ΔH − ΔH_low)·1000/C and T − T(low) = n·(ΔH_high − ΔH)·1000/C.
  const h = dissolve('KHS').best;
  const C = 450; // J/K, given
  const n = 2 / molarMass({ K: 1, H: 1, S: 1 });
  const r = packFinalTemperature({ solids: [{ formula: 'KHS', massG: 2 }], waterG: 100, startC: 20 }, { heatCapacityJPerK: C, heatCapacityUJPerK: 0 });

  it('is read at the ends of that interval, not at ±1.96·u', () => {
    expect(h.high - h.low).toBeGreaterThan(2 * 1.959963984540054 * h.u * 1.01);
    expect(r.dissolved[0]!.undissolvedMass).toBe(0);
    // The integral enthalpy's interval carries ΔsolH°(∞)'s own (Student-t) ends combined with u(φL) in quadrature.
    const I = r.dissolved[0]!.integralEnthalpy;
    expect(I.value - I.low).toBeGreaterThanOrEqual(h.value - h.low - 1e-9);
    expect(r.finalTemperature.high - r.finalTemperature.value).toBeCloseTo((n * (I.value - I.low) * 1000) / C, 6);
    expect(r.finalTemperature.value - r.finalTemperature.low).toBeCloseTo((n * (I.high - I.value) * 1000) / C, 6);
  });
});
