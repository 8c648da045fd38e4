import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCliInMemory } from './runCliInMemory.js';

export const run = (args: string[], stdin = '', cwd = process.cwd()) => runCliInMemory(args, { stdin, cwd });

describe('ionheat command line basics', () => {
  it('lists the commands on help and exits 0', async () => {
    const r = await run(['help']);
    expect(r.status).toBe(0);
    expect(r.out).toMatch(/salt\s+show how a formula is read/);
  });
  it('exits 2 with a one-line message for an unknown command', async () => {
    const r = await run(['dissolv']);
    expect(r.status).toBe(2);
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.err).toMatch(/no command "dissolv"/);
  });
  it('salt --json gives the parsed salt', async () => {
    const r = await run(['salt', 'CaCl2·6H2O', '--json']);
    expect(r.status).toBe(0);
    const salt = JSON.parse(r.out);
    expect(salt.formula).toBe('CaCl2·6H2O');
    expect(salt.water).toBe(6);
    // IUPAC 2021 abridged weights: 40.078 + 2·35.45 + 6·18.015 ≈ 219.07 g/mol
    expect(salt.molarMass).toBeCloseTo(219.07, 1);
  });
  it.each([
    [['salt', 'NaCl2'], /charges in "NaCl2" do not balance/],
    [['salt'], /missing the formula/],
    [['salt', 'NaCl', '--colour'], /unknown option --colour/],
    [['salt', 'Ca(NO3'], /never closed/],
  ])('bad input %j: exit 2, one line, no stack trace', async (args, message) => {
    const r = await run(args);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(message);
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.err).not.toMatch(/at .*\.ts:\d+/);
  });
  it('merges a --data override file, and names the file, record and field when it is bad', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ionheat-'));
    writeFileSync(join(dir, 'bad.json'), JSON.stringify({ tables: { 'solution-enthalpies': [{ formula: 'KNO3', value: 'x', unit: 'kJ/mol', uncertainty: null, source: 'crcSolution', fromMemory: false }] } }));
    const r = await run(['salt', 'KNO3', '--data', 'bad.json'], '', dir);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/bad\.json: solution-enthalpies\.json record 1 \(KNO3\), field "value"/);
    writeFileSync(join(dir, 'dup.json'), '{"tables": {}, "tables": {}}');
    expect((await run(['salt', 'KNO3', '--data', 'dup.json'], '', dir)).err).toMatch(/dup\.json, line 1: the key "tables" appears twice/);
    writeFileSync(join(dir, 'proto.json'), '{"tables": {"__proto__": []}}');
    expect((await run(['salt', 'KNO3', '--data', 'proto.json'], '', dir)).err).toMatch(/the key "__proto__" is not allowed/);
    expect((await run(['salt', 'KNO3', '--data', 'missing.json'], '', dir)).err).toMatch(/cannot read data file ".*missing\.json": ENOENT/);
  });
});
