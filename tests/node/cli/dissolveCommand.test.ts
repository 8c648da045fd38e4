// `ionheat dissolve`: the JSON contract outside scripts rely on, the text
// report, and one-line errors with exit status 2.
import { describe, expect, it } from 'vitest';
import { runCliInMemory } from '../runCliInMemory.js';

const run = (args: string[]) => runCliInMemory(args);

describe('ionheat dissolve', () => {
  it('says first that a hydrate no table lists is hypothetical, in text and JSON', async () => {
    const text = await run(['dissolve', 'MgSO4·4H2O']);
    expect(text.status).toBe(0);
    expect(text.out.split('\n')[1]).toMatch(/^Hypothetical hydrate \(a hydrate no table lists; known forms: anhydrous/);
    const j = JSON.parse((await run(['dissolve', 'MgSO4·4H2O', '--json'])).out);
    expect(j.hypotheticalHydrate).toMatchObject({ reason: 'a hydrate no table lists' });
    expect(j.hypotheticalHydrate.knownWaters).toContain(0);
    const real = JSON.parse((await run(['dissolve', 'KCl', '--json'])).out);
    expect(real.hypotheticalHydrate).toBeUndefined();
  });

  it('refuses a hydrate with more waters than any known form, without a number', async () => {
    const r = await run(['dissolve', 'KCl·50H2O']);
    expect(r.status).not.toBe(0);
    expect(r.out).toBe('');
    expect(r.err).toMatch(/no enthalpy of solution is given for KCl·50H2O: it has more waters of crystallization than any form of KCl/);
  });

  it('--json prints one object with the contract fields', async () => {
    const r = await run(['dissolve', 'NH4NO3', '--json']);
    expect(r.status).toBe(0);
    const j = JSON.parse(r.out);
    expect(Object.keys(j)).toEqual(expect.arrayContaining(['formula', 'best', 'estimates', 'verdict', 'probabilityEndothermic', 'perGram']));
    expect(j.formula).toBe('NH4NO3');
    for (const key of ['value', 'low', 'high', 'unit', 'basis', 'method']) expect(j.best).toHaveProperty(key);
    // CRC Handbook: 25.69 kJ/mol
    expect(j.best).toMatchObject({ value: 25.69, unit: 'kJ/mol', basis: 'measured', method: 'table' });
    expect(j.verdict).toBe('endothermic');
    expect(j.probabilityEndothermic).toBe(1);
    expect(j.perGram.salt.unit).toBe('J/g');
    expect(j.perGram.saturatedFill.unit).toBe('J/g');
    expect(j.estimates.length).toBeGreaterThanOrEqual(2);
    // Structured cautions: the hazards table's classes for NH4NO3 (eu2019_1148), its restriction, the screening line last.
    expect(j.cautions.map((c: { kind: string }) => c.kind)).toEqual(['hazard-class', 'restricted-salt', 'screening']);
    expect(j.cautions[0]).toMatchObject({ kind: 'hazard-class', severity: 'warning' });
    expect(j.cautions.map((c: { text: string }) => c.text).join(' ')).toMatch(/oxidiser/i);
  });

  it('--exclude-measured hides the measured value', async () => {
    const r = await run(['dissolve', 'LiCl·H2O', '--exclude-measured', '--json']);
    expect(r.status).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.estimates.some((e: { basis: string }) => e.basis === 'measured')).toBe(false);
  });

  it('--temperature gives values at another temperature', async () => {
    const j = JSON.parse((await run(['dissolve', 'NaCl', '--temperature', '40', '--json'])).out);
    expect(j.temperature.celsius).toBe(40);
    expect(j.best.value).toBeLessThan(3.88);
  });

  it('prints a readable report with the verdict and cautions', async () => {
    const r = await run(['dissolve', 'CaCl2']);
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/Verdict: exothermic/);
    expect(r.out).toMatch(/Cautions:/);
    expect(r.out).toMatch(/per gram of salt/);
  });

  it.each([
    [['dissolve'], /missing the formula/],
    [['dissolve', 'NaCl2'], /do not balance/],
    [['dissolve', 'Xy'], /not a chemical element/],
    [['dissolve', 'NaCl', '--temperature', 'warm'], /--temperature needs a number/],
    [['dissolve', 'NaCl', '--temperature', '90'], /outside 0–40 °C/],
    [['dissolve', 'urea', '--exclude-measured'], /no lattice model applies/],
  ])('bad input %j: exit 2, one line on stderr, no stack trace', async (args, message) => {
    const r = await run(args);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(message);
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.err).not.toMatch(/at .*\.ts:\d+/);
    expect(r.out).toBe('');
  });
});
