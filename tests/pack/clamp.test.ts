// Ice, the salt–ice eutectic and boiling in the heat balance: ice is a phase of the final state, the
// eutectic holds only when the brine is saturated in the salt as well, and boiling holds at the brine's
// raised boiling point; energy closes in every case.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { packFinalTemperature } from '../../src/index.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { brineFreezingPoint } from '../../src/brine/brineFreezingPoint.js';

const closes = (r: ReturnType<typeof packFinalTemperature>) => expect(r.heat.imbalance).toBeLessThanOrEqual(0.001);

describe('eutectic hold', () => {
  // 60 g KNO3 in 100 g water from 0 °C: the brine saturates (CRC solubility 13.3 g/100 g at 0 °C) and ice forms
  // as it cools; where the saturated brine meets the ice line (the eutectic, −2.8 °C in the tables, Linke–Seidell,
  // from memory; −3.07 °C from the Pitzer water activity) the fill holds while a share of the brine freezes out as
  // ice and KNO3 together, which closes the balance.
  const r = packFinalTemperature({ solids: [{ formula: 'KNO3', massG: 60 }], waterG: 100, startC: 0 });
  it('holds at the eutectic, saturated, with ice, and closes its energy', () => {
    expect(r.clamp?.kind).toBe('eutectic');
    expect(Math.abs(r.finalTemperature.value - -2.8)).toBeLessThan(0.5);
    expect(r.dissolved[0]!.saturated).toBe(true);
    expect(r.iceMass).toBeGreaterThan(0);
    expect(r.clamp?.message).toMatch(/freezes out as ice and salt together/);
    closes(r);
  });
  it('has an interval of nonzero width, set by where the eutectic lies', () => {
    expect(r.finalTemperature.high - r.finalTemperature.low).toBeGreaterThan(0);
  });
});

describe('ice in an unsaturated fill', () => {
  // 20 g NH4NO3 in 100 g water from 0 °C: all dissolves (CRC solubility ≫ 20 g/100 g). The balance alone would
  // reach about −14 °C; the brine freezes first, so ice forms and concentrates it until its freezing point
  // equals the temperature. No eutectic: the brine stays unsaturated (the old ideal clamp at −9.3 °C is gone).
  const r = packFinalTemperature({ solids: [{ formula: 'NH4NO3', massG: 20 }], waterG: 100, startC: 0 });
  it('forms ice and ends on the freezing curve of the brine it has made', () => {
    expect(r.clamp).toBeNull();
    expect(r.iceMass).toBeGreaterThan(1);
    expect(r.dissolved[0]!.saturated).toBe(false);
    expect(Math.abs(brineFreezingPoint(parseSalt('NH4NO3'), r.dissolved[0]!.molality).value - r.finalTemperature.value)).toBeLessThan(0.01);
    expect(r.notes.some((n) => n.includes('g of ice forms'))).toBe(true);
    closes(r);
  });
});

describe('random cold fills', () => {
  it('end on or above the freezing curve of their brine, with ice only on it, and energy closed', () => {
    const salts = ['KNO3', 'NH4NO3', 'NH4Cl', 'CO(NH2)2', 'KCl', 'NaCl'];
    fc.assert(
      fc.property(fc.constantFrom(...salts), fc.double({ min: 1, max: 400, noNaN: true }), fc.double({ min: 20, max: 500, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }), (formula, mass, water, start) => {
        const r = packFinalTemperature({ solids: [{ formula, massG: mass }], waterG: water, startC: start });
        expect(r.heat.imbalance).toBeLessThanOrEqual(0.001);
        expect(r.finalTemperature.high - r.finalTemperature.low).toBeGreaterThan(0);
        const d = r.dissolved[0]!;
        if (r.liquidWater > 0 && d.molality > 0 && d.molality <= 30) {
          const fp = brineFreezingPoint(parseSalt(formula), d.molality).value;
          expect(r.finalTemperature.value).toBeGreaterThanOrEqual(fp - 0.01);
          if (r.iceMass > 0 && !r.clamp) expect(r.finalTemperature.value).toBeCloseTo(fp, 1);
        }
      }),
      { numRuns: 60 },
    );
  });
});

describe('boiling hold', () => {
  // 300 g anhydrous CaCl2 in 100 g water: ΔsolH = −81.3 kJ/mol (NBS cycle) on 2.7 mol would heat the fill by
  // hundreds of kelvin. It holds at the boiling point of its brine, above 100 °C (boiling-point elevation from the
  // Pitzer water activity), while water boils off; the boiling and burn cautions come first.
  const r = packFinalTemperature({ solids: [{ formula: 'CaCl2', massG: 300 }], waterG: 100, startC: 20 });
  it('holds above 100 °C, boils water off, closes its energy and warns', () => {
    expect(r.clamp?.kind).toBe('boiling');
    expect(r.finalTemperature.value).toBeGreaterThan(100);
    expect(r.vaporMass).toBeGreaterThan(0);
    closes(r);
    expect(r.cautions[0]?.text).toMatch(/^Boiling/);
    expect(r.cautions.some((c) => c.text.startsWith('Contact-burn risk'))).toBe(true);
  });
});
