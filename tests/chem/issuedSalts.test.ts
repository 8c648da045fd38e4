// Salts from parseSalt are frozen and trusted as they are; any other object
// that claims to be a salt is read again from its formula.
import { describe, expect, it } from 'vitest';
import { dissolve, molarMass, parseSalt } from '../../src/index.js';
import { saltArgument } from '../../src/chem/saltArgument.js';

describe('salts handed to public functions', () => {
  it('are frozen when parseSalt makes them, so a caller cannot damage a shared one', () => {
    const s = parseSalt('CaCl2·6H2O');
    expect(Object.isFrozen(s) && Object.isFrozen(s.ions) && Object.isFrozen(s.ions[0]) && Object.isFrozen(s.composition)).toBe(true);
    expect(saltArgument(s)).toBe(s);
  });

  it('are read again from the formula when they did not come from parseSalt', () => {
    const forged = { ...parseSalt('CaCl2·6H2O'), water: 0, molarMass: 1 };
    const read = saltArgument(forged);
    expect(read).not.toBe(forged);
    expect(read.water).toBe(6);
    // M(CaCl2·6H2O) = 110.98 + 6 × 18.015 = 219.07 g/mol (IUPAC 2021 atomic weights)
    expect(read.molarMass).toBeCloseTo(molarMass({ Ca: 1, Cl: 2, H: 12, O: 6 }), 9);
    expect(dissolve(forged).best.value).toBe(dissolve('CaCl2·6H2O').best.value);
  });
});
