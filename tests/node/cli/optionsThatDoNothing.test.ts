// Issue 12, item 2 on the command line: unknown options and commands get a did-you-mean, an option that has no
// effect without another is refused naming the one it needs, and --json works on every command.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCliInMemory } from '../runCliInMemory.js';

const packArgs = ['pack', '--salt', 'NH4NO3', '--salt-mass', '30', '--water', '100'];

describe('did you mean, on the command line', () => {
  it.each([
    [['dissovle', 'KNO3'], /no command "dissovle" \(did you mean "dissolve"\?\)/],
    [['help', 'scren'], /no command "scren" \(did you mean "screen"\?\)/],
    [['dissolve', 'KNO3', '--tempreature', '30'], /unknown option --tempreature \(did you mean --temperature\?\)/],
    [[...packArgs, '--monte-carl', '50'], /unknown option --monte-carl \(did you mean --monte-carlo\?\)/],
    [['screen', '--enumerate', '--fil', '30:100@20'], /unknown option --fil \(did you mean --fill\?\)/],
  ])('%j', async (args, message) => {
    const r = await runCliInMemory(args);
    expect(r.status).toBe(2);
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.err).toMatch(message);
  });
});

describe('options that do nothing without another are refused', () => {
  it.each([
    [[...packArgs, '--seed', '7'], /--seed has no effect without --monte-carlo/],
    [[...packArgs, '--curve', '--points', '10'], /--curve has no effect in text output/],
    [[...packArgs, '--points', '10'], /--points has no effect without --curve or --curve-svg/],
    [[...packArgs, '--heat-capacity-u', '3'], /--heat-capacity-u has no effect without --heat-capacity/],
    [['cycle', 'NaCl', '--lattice-u', '3'], /--lattice-u has no effect without --lattice/],
    [['screen', '--enumerate', '--objective', 'cost-per-kj'], /--enumerate has no prices/],
    [['screen', '--enumerate', '--json', '--format', 'csv'], /--json asks for JSON output but --format asks for csv/],
  ])('%j', async (args, message) => {
    const r = await runCliInMemory(args);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(message);
  });
  it('cost-per-kj over a file with no prices ranks nothing and exits 2, saying why', async () => {
    const r = await runCliInMemory(['screen', '-', '--objective', 'cost-per-kj'], { stdin: 'formula\nKNO3\nNH4Cl\n' });
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/needs a pricePerKg for the candidates, and no row had one/);
  });
  it('the same options together are accepted', async () => {
    const r = await runCliInMemory([...packArgs, '--monte-carlo', '50', '--seed', '7', '--curve', '--points', '10', '--json']);
    expect(r.status).toBe(0);
    const j = JSON.parse(r.out) as { finalTemperature: { seed: number }; curve: unknown[] };
    expect(j.finalTemperature.seed).toBe(7);
    expect(j.curve).toHaveLength(10);
  });
});

describe('--json on every command', () => {
  const dir = mkdtempSync(join(tmpdir(), 'ionheat-json-'));
  it.each([
    ['salt', ['salt', 'KNO3', '--json']],
    ['lattice', ['lattice', 'NaCl', '--json']],
    ['cycle', ['cycle', 'NaCl', '--json']],
    ['dissolve', ['dissolve', 'KNO3', '--json']],
    ['pack', [...packArgs, '--json']],
    ['warmer', ['warmer', '--salt', 'NaCH3COO·3H2O', '--mass', '100', '--json']],
    ['screen', ['screen', '-', '--json']],
    ['demo', ['demo', '--json', '--out', dir]],
  ])('%s', async (_, args) => {
    const r = await runCliInMemory(args as string[], { stdin: 'formula\nKNO3\n' });
    expect(r.status).toBe(0);
    expect(() => JSON.parse(r.out)).not.toThrow();
  });
});
