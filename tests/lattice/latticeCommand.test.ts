// `ionheat lattice`: the JSON contract outside scripts rely on, the text
// report, and one-line errors with exit status 2 and no stack trace.
import { describe, expect, it } from 'vitest';
import { runCliInMemory } from '../node/runCliInMemory.js';

const run = (args: string[]) => runCliInMemory(args);

describe('ionheat lattice', () => {
  it('--json prints { formula, estimates: [{ method, value, low, high, unit }] } for every method by default', async () => {
    const r = await run(['lattice', 'NaCl', '--json']);
    expect(r.status).toBe(0);
    expect(r.err).toBe('');
    const j = JSON.parse(r.out);
    expect(j.formula).toBe('NaCl');
    expect(j.estimates.map((e: { method: string }) => e.method)).toEqual([
      'kapustinskii',
      'born-lande',
      'born-mayer',
      'vbt',
      'kapustinskii-corrected',
      'born-lande-corrected',
      'born-mayer-corrected',
      'vbt-corrected',
    ]);
    for (const e of j.estimates) {
      expect(e.unit).toBe('kJ/mol');
      expect(typeof e.value).toBe('number');
      expect(e.low).toBeLessThan(e.value);
      expect(e.high).toBeGreaterThan(e.value);
      // common practice: a lattice enthalpy of NaCl near 787 kJ/mol; every model within 10 %
      expect(Math.abs(e.value - 787) / 787).toBeLessThan(0.1);
    }
    expect(j.cycle.method).toBe('born-haber');
  });

  it('--method picks one estimator and --structure changes the assumption', async () => {
    const one = JSON.parse((await run(['lattice', 'NaCl', '--method', 'born-lande', '--json'])).out);
    expect(one.estimates).toHaveLength(1);
    expect(one.estimates[0].method).toBe('born-lande');
    const cscl = JSON.parse((await run(['lattice', 'NaCl', '--method', 'born-lande', '--structure', 'caesium-chloride', '--json'])).out);
    expect(cscl.estimates[0].value).not.toBe(one.estimates[0].value);
  });

  it('lists the methods that do not apply', async () => {
    const j = JSON.parse((await run(['lattice', 'KNO3', '--json'])).out);
    expect(j.skipped.map((s: { method: string }) => s.method)).toContain('born-lande');
  });

  it('prints a readable table with the cycle value', async () => {
    const r = await run(['lattice', 'KCl']);
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/ΔH_L at 298\.15 K/);
    expect(r.out).toMatch(/kapustinskii-corrected/);
    expect(r.out).toMatch(/Born–Haber cycle/);
  });

  for (const [what, args, pattern] of [
    ['an unknown ion', ['lattice', 'NaXy'], /Xy|not a chemical element|no ion/],
    ['an unbalanced formula', ['lattice', 'NaCl2'], /balance/],
    ['an unknown method', ['lattice', 'NaCl', '--method', 'madelung'], /--method/],
    ['an unknown structure', ['lattice', 'NaCl', '--structure', 'diamond'], /structure/],
    ['a method without the data', ['lattice', 'KNO3', '--method', 'born-lande'], /structure/],
    ['a non-electrolyte', ['lattice', 'urea'], /non-electrolyte/],
    ['a missing formula', ['lattice'], /formula/],
  ] as const) {
    it(`${what}: one line on stderr, exit 2, no stack trace`, async () => {
      const r = await run([...args]);
      expect(r.status).toBe(2);
      expect(r.out).toBe('');
      expect(r.err.trimEnd().split('\n')).toHaveLength(1);
      expect(r.err).toMatch(/^ionheat: /);
      expect(r.err).toMatch(pattern);
      expect(r.err).not.toMatch(/\bat .*\.(ts|js):\d+/);
    });
  }
});
