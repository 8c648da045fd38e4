// The 95 % interval of the final temperature: bounds by default, seeded Monte Carlo on request.
import { describe, expect, it } from 'vitest';
import { dissolve, molarMass, packFinalTemperature } from '../../src/index.js';
import { DEFAULT_SEED } from '../../src/pack/finalTemperatureInterval.js';

const fill = { solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 };

describe('bounds interval of a dilute KNO3 fill, by hand', () => {
  // T = T₀ + ΔT with ΔT = −nΔH/C = −8.073 K (see handFills.test.ts).
  // Enthalpy: u(ΔsolH) = 0.2 kJ/mol (the CRC table's default uncertainty in the solution-enthalpy table);
  //   shift = 1.96 × 0.2 kJ/mol × 0.098910 mol / 427.470 J/K = 0.0907 K either way.
  // Heat capacity from the parts: u(C)² = (100 g × 0.1/18.015)² + (n·√(1.5² + a²))², with
  //   a² = (|96.4 − (21.8 − 86.6)|/√3)² + 3² + 3² (crystal vs infinite-dilution Cp°, NBS, ion default u 3)
  //   → u(C) = 9.233 J/K, u_rel = 0.02160; at ±1.96·u_rel, T = T₀ + ΔT/(1 ± 0.04233):
  //   +0.328 K upwards, −0.357 K downwards.
  // high = T + √(0.0907² + 0.328²) = T + 0.340; low = T − √(0.0907² + 0.357²) = T − 0.368.
  const n = 10 / 101.1023;
  const C = (100 * 75.291) / 18.015 + n * 96.4;
  const dT = -(n * 34890) / C;
  const shiftH = (1.959963984540054 * 0.2 * 1000 * n) / C;
  const a = Math.hypot(Math.abs(96.4 - (21.8 - 86.6)) / Math.sqrt(3), 3, 3);
  const uRel = Math.hypot((100 * 0.1) / 18.015, n * Math.hypot(1.5, a)) / C;
  const up = dT / (1 + 1.959963984540054 * uRel) - dT;
  const downC = dT - dT / (1 - 1.959963984540054 * uRel);
  const r = packFinalTemperature(fill);

  it('matches the hand propagation', () => {
    expect(r.interval.method).toBe('bounds');
    expect(uRel).toBeCloseTo(0.0216, 4);
    expect(r.finalTemperature.high - r.finalTemperature.value).toBeCloseTo(Math.hypot(shiftH, up), 6);
    expect(r.finalTemperature.value - r.finalTemperature.low).toBeCloseTo(Math.hypot(shiftH, downC), 6);
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
  // 10 g KNO3 with your own 500 ± 10 J/K for the whole fill: ΔT = −3451.0 J / 500 J/K = −6.902 K.
  const r = packFinalTemperature(fill, { heatCapacityJPerK: 500, heatCapacityUJPerK: 10 });
  it('replaces the sum of parts and carries its own uncertainty', () => {
    expect(r.heatCapacity.basis).toBe('override');
    expect(r.heatCapacity.value).toBe(500);
    expect(r.finalTemperature.value).toBeCloseTo(20 - (3450.96 / 500), 3);
    expect(r.finalTemperature.high - r.finalTemperature.value).toBeGreaterThan(0.1);
  });
});

describe('a clamped fill has a lopsided interval that stays on the liquid side', () => {
  const r = packFinalTemperature({ solids: [{ formula: 'NH4NO3', massG: 100 }], waterG: 100, startC: 20 });
  it('keeps low at the eutectic', () => {
    expect(r.finalTemperature.low).toBe(r.finalTemperature.value);
    expect(r.finalTemperature.high).toBeGreaterThan(r.finalTemperature.value + 0.5);
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
    expect(r.finalTemperature.high - r.finalTemperature.value).toBeCloseTo((n * (h.value - h.low) * 1000) / C, 6);
    expect(r.finalTemperature.value - r.finalTemperature.low).toBeCloseTo((n * (h.high - h.value) * 1000) / C, 6);
  });
});
