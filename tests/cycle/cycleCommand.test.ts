// `ionheat cycle`: the JSON contract, the SVG file, and one-line errors with
// exit status 2 and no stack trace.
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCliInMemory } from '../node/runCliInMemory.js';

const run = (args: string[], cwd = process.cwd()) => runCliInMemory(args, { cwd });

describe('ionheat cycle', () => {
  it('--json prints { formula, steps, result: { quantity, value, low, high, unit } }', async () => {
    const r = await run(['cycle', 'NaCl', '--json']);
    expect(r.status).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.formula).toBe('NaCl');
    expect(j.steps).toHaveLength(6);
    for (const s of j.steps) for (const key of ['kind', 'label', 'equation', 'value', 'u', 'source']) expect(s).toHaveProperty(key);
    expect(Object.keys(j.result)).toEqual(expect.arrayContaining(['quantity', 'value', 'low', 'high', 'unit']));
    expect(j.result.quantity).toBe('lattice enthalpy');
    expect(j.result.unit).toBe('kJ/mol');
    // the worked NaCl cycle: about 787 kJ/mol (common practice)
    expect(Math.abs(j.result.value - 787)).toBeLessThan(1);
  });

  it('--solve formation uses a model lattice enthalpy unless --lattice is given', async () => {
    const model = JSON.parse((await run(['cycle', 'KCl', '--solve', 'formation', '--json'])).out);
    expect(model.result.quantity).toBe('enthalpy of formation');
    expect(model.result.basis).toBe('model');
    // NBS: ΔfH°(KCl, cr) = −436.747 kJ/mol; the model interval should hold it
    expect(model.result.low).toBeLessThan(-436.747);
    expect(model.result.high).toBeGreaterThan(-436.747);
    const given = JSON.parse((await run(['cycle', 'KCl', '--solve', 'formation', '--lattice', '717.3', '--lattice-u', '2', '--json'])).out);
    expect(given.result.value).toBeCloseTo(-436.7, 0);
  });

  it('--solve electron-affinity gives the first electron affinity of Cl from NaCl (CRC 348.57 kJ/mol)', async () => {
    const j = JSON.parse((await run(['cycle', 'NaCl', '--solve', 'electron-affinity', '--lattice', '787.17', '--json'])).out);
    expect(j.result.quantity).toBe('electron affinity');
    expect(j.result.value).toBeCloseTo(348.6, 0);
  });

  it('--svg writes the energy-level diagram', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ionheat-cycle-'));
    const r = await run(['cycle', 'MgCl2', '--svg', 'mgcl2.svg'], dir);
    expect(r.status).toBe(0);
    const svg = readFileSync(join(dir, 'mgcl2.svg'), 'utf8');
    expect(svg).toMatch(/^<svg/);
    expect(svg).toContain('Born–Haber cycle of MgCl₂');
    expect(r.out).toMatch(/diagram written to/);
  });

  it('prints the steps as a table with the result', async () => {
    const r = await run(['cycle', 'CaF2']);
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/first ionization energy of Ca/);
    expect(r.out).toMatch(/lattice enthalpy: \d+/);
  });

  for (const [what, args, pattern] of [
    ['an unknown ion', ['cycle', 'KXy'], /Xy|element|no ion/],
    ['an unbalanced formula', ['cycle', 'MgCl'], /balance/],
    ['missing data for the cycle', ['cycle', 'Na2SO4'], /SO₄²⁻/],
    ['a bad --solve', ['cycle', 'NaCl', '--solve', 'entropy'], /--solve/],
    ['an electron affinity of a polyatomic anion', ['cycle', 'KNO3', '--solve', 'electron-affinity', '--lattice', '690'], /monatomic anion/],
    ['a bad number', ['cycle', 'NaCl', '--solve', 'formation', '--lattice', 'lots'], /--lattice/],
    ['an unwritable SVG path', ['cycle', 'NaCl', '--svg', '/nonexistent-dir/x.svg'], /cannot write/],
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
