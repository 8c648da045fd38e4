// dissolve(): the best basis, the verdict, the heats per gram, hydrates and
// temperature. Reference values: the CRC Handbook table 'Enthalpy of solution
// of electrolytes' (after Parker 1965) as entered in solution-enthalpies.json,
// and the NBS tables (Wagman et al. 1982).
import { describe, expect, it } from 'vitest';
import { integralEnthalpyOfSolution } from '../../src/solution/integralEnthalpy.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { builtinDataset } from '../../src/data/builtin.js';
import { dissolve } from '../../src/solution/dissolve.js';
import { IonheatError } from '../../src/error.js';

const dataset = builtinDataset();

function verdictOrNotApplicable(formula: string, excludeMeasured: boolean): string {
  try {
    return dissolve(formula, { excludeMeasured }).verdict;
  } catch (e) {
    // A molecular solute without its measured value has no estimate at all: no verdict, the honest 'undetermined'.
    if (e instanceof IonheatError && e.code === 'NOT_APPLICABLE') return 'undetermined';
    throw e;
  }
}

describe('dissolve: measured values', () => {
  const records = dataset.records('solution-enthalpies.json');
  it.each(records.map((r) => [r.formula, r] as const))('%s: best reproduces the CRC value within its uncertainty', (_f, r) => {
    const result = dissolve(r.formula);
    const u = dataset.uncertaintyOf('solution-enthalpies.json', r)!;
    expect(result.best.basis).toBe('measured');
    expect(Math.abs(result.best.value - r.value)).toBeLessThanOrEqual(u);
  });
});

describe('dissolve: facts of the trade (common practice)', () => {
  // Cold packs: ammonium nitrate, ammonium chloride, potassium nitrate, urea. Hot packs: anhydrous CaCl2, MgSO4.
  const facts: [string, 'endothermic' | 'exothermic'][] = [
    ['NH4NO3', 'endothermic'],
    ['NH4Cl', 'endothermic'],
    ['KNO3', 'endothermic'],
    ['CO(NH2)2', 'endothermic'],
    ['CaCl2', 'exothermic'],
    ['MgSO4', 'exothermic'],
  ];
  it.each(facts)('%s is %s', (formula, verdict) => {
    expect(dissolve(formula).verdict).toBe(verdict);
  });
  it.each(facts)('%s with excludeMeasured: %s or undetermined, never the opposite', (formula, verdict) => {
    expect([verdict, 'undetermined']).toContain(verdictOrNotApplicable(formula, true));
  });
});

describe('dissolve: the result', () => {
  it('orders estimates by trust and keeps the contract fields', () => {
    const r = dissolve('NaCl');
    const order = ['measured', 'cycle', 'anchored', 'model'];
    expect(r.estimates.slice(0, 2).map((e) => e.basis)).toEqual(['measured', 'cycle']);
    expect(r.estimates.map((e) => order.indexOf(e.basis))).toEqual([...r.estimates.map((e) => order.indexOf(e.basis))].sort((a, b) => a - b));
    expect(new Set(r.estimates.map((e) => e.basis))).toEqual(new Set(order));
    expect(r.best).toBe(r.estimates[0]);
    expect(r.formula).toBe('NaCl');
    expect(r.salt.formula).toBe('NaCl');
    expect(r.probabilityEndothermic).toBeGreaterThan(0.99);
    expect(r.best.unit).toBe('kJ/mol');
  });
  it('gives the heat per gram of salt and of a saturated fill', () => {
    const r = dissolve('NH4NO3');
    // 25.69 kJ/mol (CRC) / 80.043 g/mol = 320.9 J/g
    expect(r.perGram.salt.value).toBeCloseTo(25690 / 80.043, 0);
    // solubility 212.5 g per 100 g water at 25 °C (CRC): 80.043 + 37.667 g per mole, m_sat = 1000/37.667 = 26.55 mol/kg;
    // the integral enthalpy to saturation is ΔsolH°(∞) + φL(m_sat) (brine module), taken here from integralEnthalpyOfSolution.
    const mSat = 1000 / ((80.043 * 100) / 212.5);
    const integral = integralEnthalpyOfSolution(parseSalt('NH4NO3'), mSat).value;
    expect(r.perGram.saturatedFill!.value).toBeCloseTo((integral * 1000) / (80.043 + (80.043 * 100) / 212.5), 0);
    expect(r.perGram.saturatedFill!.notes.join(' ')).toMatch(/integral enthalpy of solution to saturation/);
    expect(r.perGram.saturatedFill!.unit).toBe('J/g');
  });
  it('gives both hydration sums of an ionic salt and none for urea', () => {
    const r = dissolve('KCl');
    expect(r.hydration!.absolute!.value).toBe(-334 - 367); // Marcus (from memory)
    expect(dissolve('urea').hydration).toBeUndefined();
  });
  it('says that no lattice model applies to a non-electrolyte, and refuses without a measured value', () => {
    expect(dissolve('urea').notes.join(' ')).toMatch(/no lattice model applies/);
    expect(() => dissolve('urea', { excludeMeasured: true })).toThrowError(/molecular solute, to which no lattice model applies/);
  });
  it('hides only the salt’s own values under excludeMeasured', () => {
    const r = dissolve('LiCl·H2O', { excludeMeasured: true });
    expect(r.estimates.every((e) => e.basis !== 'measured' && e.method !== 'formation-enthalpies')).toBe(true);
    expect(r.notes.join(' ')).toMatch(/hidden/);
  });
});

describe('dissolve: hydrates by the difference rule (Jenkins & Glasser 2004)', () => {
  it('LiCl·H2O from LiCl: holds the CRC value −19.08 kJ/mol in its interval', () => {
    const r = dissolve('LiCl·H2O', { excludeMeasured: true });
    expect(r.best.method).toBe('difference-rule');
    expect(r.best.low).toBeLessThanOrEqual(-19.08);
    expect(r.best.high).toBeGreaterThanOrEqual(-19.08);
    expect(r.best.notes[0]).toMatch(/difference rule/);
  });
  it('a hydrate without a crystal formation enthalpy still gets a flagged estimate (CaCl2·4H2O from CaCl2·2H2O or CaCl2·6H2O)', () => {
    const r = dissolve('CaCl2·4H2O');
    expect(r.best.method).toBe('difference-rule');
    expect(r.best.notes[0]).toMatch(/CaCl2·(2|6)H2O/);
  });
  it('the difference-rule interval holds every tabulated hydrate’s cycle value', () => {
    // NBS crystal formation enthalpies of the hydrates, compared with the rule applied to the nearest other form.
    const hydrates = dataset.records('compound-formation.json').filter((r) => r.phase === 'cr' && r.formula.includes('·'));
    let n = 0;
    let inside = 0;
    for (const h of hydrates) {
      const truth = dissolve(h.formula).estimates.find((e) => e.method === 'formation-enthalpies');
      const rule = dissolve(h.formula, { excludeMeasured: true }).estimates.find((e) => e.method === 'difference-rule');
      if (!truth || !rule) continue;
      n++;
      if (rule.low <= truth.value && truth.value <= rule.high) inside++;
    }
    expect(n).toBeGreaterThan(20);
    expect(inside / n).toBeGreaterThanOrEqual(0.9);
  });
});

describe('dissolve: temperature', () => {
  it('NaCl at 40 °C by Kirchhoff: 3.88 − 0.1405·15 kJ/mol (ΔsolCp° = −140.5 J/(mol·K), NBS)', () => {
    const r = dissolve('NaCl', { temperatureC: 40 });
    expect(r.best.value).toBeCloseTo(3.88 - 0.1405 * 15, 3);
    expect(r.temperature.heatCapacityOfSolution!.value).toBeCloseTo(-140.5, 6);
    expect(r.temperature.celsius).toBe(40);
  });
  it('widens the interval with a caveat where no heat capacity is known', () => {
    const at25 = dissolve('KBrO3');
    const at0 = dissolve('KBrO3', { temperatureC: 0 });
    expect(at0.best.value).toBe(at25.best.value);
    expect(at0.best.u).toBeGreaterThan(at25.best.u);
    expect(at0.best.notes.join(' ')).toMatch(/correction to 0 °C is unknown/);
  });
  it('refuses temperatures outside 0–40 °C', () => {
    expect(() => dissolve('NaCl', { temperatureC: 60 })).toThrowError(/outside 0–40 °C/);
  });
});
