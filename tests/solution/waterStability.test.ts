// Oxides react with water (O²⁻ + H₂O → 2 OH⁻, common practice) instead of
// dissolving to O²⁻(aq): the lattice-plus-hydration bases must not report an
// "enthalpy of solution" for them, which would be thousands of kJ/mol and
// look like a superb cold pack.
import { describe, expect, it } from 'vitest';
import { dissolve, IonheatError, screen } from '../../src/index.js';

describe('salts with an ion that does not exist in water', () => {
  it.each(['MgO', 'CaO', 'Na2O', 'Fe2O3', 'Al2O3'])('%s: dissolve says it reacts instead (NOT_APPLICABLE)', (formula) => {
    expect(() => dissolve(formula)).toThrow(IonheatError);
    try {
      dissolve(formula);
    } catch (e) {
      expect((e as IonheatError).code).toBe('NOT_APPLICABLE');
      expect((e as IonheatError).message).toMatch(/reacts with water/);
    }
  });
  it('leaves a screen row with the reason instead of a number', () => {
    const row = screen(['MgO', 'NaCl']).rows[0]!;
    expect(row.status).not.toBe('computed');
    expect(JSON.stringify(row)).toMatch(/reacts with water/);
  });
});
