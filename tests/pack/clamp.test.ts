// The freezing, eutectic and boiling limits of the heat balance.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { freezingPointOfSolution, packFinalTemperature, solubilityCurve, WATER_CRYOSCOPIC_CONSTANT } from '../../src/index.js';

describe('eutectic clamp', () => {
  // 100 g NH4NO3 in 100 g water at 20 °C: a naive balance (all dissolved, ΔsolH = 25.69 kJ/mol, CRC)
  // gives 20 − 1.2493 mol × 25 690 J/mol / 592 J/K ≈ −34 °C, far below the NH4NO3–ice eutectic at
  // −16.9 °C (Linke–Seidell, from memory). The model stops there and says ice and crystals form.
  const r = packFinalTemperature({ solids: [{ formula: 'NH4NO3', massG: 100 }], waterG: 100, startC: 20 });
  it('never reports below the eutectic', () => {
    expect(r.clamp?.kind).toBe('eutectic');
    expect(r.finalTemperature.value).toBeCloseTo(-16.9, 9);
    expect(r.finalTemperature.low).toBeGreaterThanOrEqual(-16.9 - 1e-9);
    expect(r.clamp?.message).toContain('ice and salt crystals');
    expect(r.notes).toContain(r.clamp!.message);
    expect(r.cautions.some((c) => c.includes('frostbite'))).toBe(true);
  });
});

describe('freezing clamp of a dilute fill', () => {
  // 20 g NH4NO3 in 100 g water from 0 °C. All of it dissolves (CRC solubility ≫ 20 g/100 g).
  // The balance alone: n = 20 / 80.043 = 0.24987 mol, Q = 0.24987 × 25 690 = 6419 J (CRC ΔsolH, checked by the data helper),
  //   C = 417.935 + 0.24987 × 139.3 = 452.74 J/K (NBS Cp°, from memory) → −14.18 °C.
  // But the solution freezes first: T_f = −K_f·ν·m = −1.86 × 2 × 0.24987 / 0.100 = −9.295 °C
  // (ideal freezing-point depression, K_f = 1.86 K·kg/mol, textbook value from memory), above the
  // NH4NO3–ice eutectic at −16.9 °C. The model stops at T_f and says ice forms.
  const r = packFinalTemperature({ solids: [{ formula: 'NH4NO3', massG: 20 }], waterG: 100, startC: 0 });
  const n = 20 / 80.043;
  it('stops at the freezing point of the solution it has made', () => {
    expect(0 - (n * 25690) / ((100 * 75.291) / 18.015 + n * 139.3)).toBeLessThan(-14);
    expect(r.clamp?.kind).toBe('freezing');
    expect(r.finalTemperature.value).toBeCloseTo(-(WATER_CRYOSCOPIC_CONSTANT * 2 * n * 1000) / 100, 6);
    expect(r.finalTemperature.value).toBeCloseTo(-9.295, 3);
    expect(r.finalTemperature.low).toBeGreaterThanOrEqual(r.finalTemperature.value - 1e-9);
    expect(r.clamp?.message).toContain('ice would form');
  });
});

describe('the final temperature is never below the floor of the solution it ends with', () => {
  it('holds for random cold fills', () => {
    const salts = ['KNO3', 'NH4NO3', 'NH4Cl', 'CO(NH2)2', 'KCl', 'NaCl', 'NaCH3COO·3H2O', 'Na2S2O3·5H2O'];
    fc.assert(
      fc.property(fc.constantFrom(...salts), fc.double({ min: 1, max: 400, noNaN: true }), fc.double({ min: 20, max: 500, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }), (formula, mass, water, start) => {
        const r = packFinalTemperature({ solids: [{ formula, massG: mass }], waterG: water, startC: start });
        const d = r.dissolved[0]!;
        const curve = solubilityCurve(formula)!;
        const molar = { KNO3: 101.1023, NH4NO3: 80.043, NH4Cl: 53.489, 'CO(NH2)2': 60.056, KCl: 74.5483, NaCl: 58.43976928, 'NaCH3COO·3H2O': 136.07876928, 'Na2S2O3·5H2O': 248.17153856 }[formula]!;
        const particles = formula === 'CO(NH2)2' ? 1 : formula === 'Na2S2O3·5H2O' ? 3 : 2;
        const fp = freezingPointOfSolution((d.dissolvedMass / molar) * particles, r.liquidWater)!;
        const eutectic = curve.eutectic?.temperature ?? -Infinity;
        expect(r.finalTemperature.value).toBeGreaterThanOrEqual(Math.max(fp, eutectic) - 1e-6);
        expect(r.finalTemperature.low).toBeGreaterThanOrEqual(eutectic - 1e-6);
        if (r.finalTemperature.value < 0 && r.clamp) expect(['freezing', 'eutectic']).toContain(r.clamp.kind);
      }),
      { numRuns: 120 },
    );
  });
});

describe('boiling clamp', () => {
  // 300 g anhydrous CaCl2 in 100 g water: ΔsolH = −81.3 kJ/mol (NBS cycle) on 2.7 mol would heat the
  // fill by hundreds of kelvin; it is reported at 100 °C with a boiling caution.
  const r = packFinalTemperature({ solids: [{ formula: 'CaCl2', massG: 300 }], waterG: 100, startC: 20 });
  it('stops at 100 °C and warns of boiling and burns', () => {
    expect(r.clamp?.kind).toBe('boiling');
    expect(r.finalTemperature.value).toBe(100);
    expect(r.cautions[0]).toMatch(/^Boiling/);
    expect(r.cautions.some((c) => c.startsWith('Contact-burn risk'))).toBe(true);
  });
});
