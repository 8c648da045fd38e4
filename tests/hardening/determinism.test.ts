/**
 * The same inputs give byte-identical output (issue 7): two runs in one
 * process and two separate processes of `screen --format json` and
 * `pack --json` (with a Monte Carlo interval, whose draws are seeded); and a
 * screen of shuffled rows gives the same rows, once each is matched to its
 * input by formula (the output's contract: rows in input order, each with its
 * input line number).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { runInProcess } from './cliHarness.js';

const CLI = fileURLToPath(new URL('../../dist/cli.js', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'ionheat-determinism-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Distinct formulas (a repeated one would point at its first line through duplicateOf), good and bad. */
const ROWS = ['NaCl', 'KNO3', 'NH4NO3', 'KCl', 'CaCl2·6H2O', 'NaCH3COO·3H2O', 'CO(NH2)2', 'NaXy', '(NH4)2SO4', 'MgSO4·7H2O', 'Na2CO3·10H2O', 'KBr', 'LiCl', 'NH4Cl'];
writeFileSync(join(dir, 'list.csv'), `formula\n${ROWS.join('\n')}\n`);

const SCREEN = ['screen', 'list.csv', '--format', 'json', '--fill', '40:80@22', '--spec', 'best.low > 0'];
const PACK = ['pack', '--salt', 'NH4NO3', '--salt-mass', '40', '--salt', 'CO(NH2)2', '--salt-mass', '20', '--water', '100', '--monte-carlo', '300', '--json', '--curve', '--duration', '900'];

function spawnCli(args: string[]): string {
  try {
    return execFileSync(process.execPath, [CLI, ...args], { cwd: dir, encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
  } catch (e) {
    // screen exits 2 because one row (NaXy) cannot be computed; its output is still complete.
    const out = (e as { stdout?: string }).stdout;
    if (typeof out === 'string' && out.length > 0) return out;
    throw e;
  }
}

describe('the same input gives byte-identical output', () => {
  it.each([
    ['screen --format json', SCREEN],
    ['pack --json with a Monte Carlo interval', PACK],
    ['dissolve --json', ['dissolve', 'CaCl2·6H2O', '--json']],
  ])('%s: two runs in one process', async (_, args) => {
    const first = await runInProcess(args, dir);
    const second = await runInProcess(args, dir);
    expect(first.out.length).toBeGreaterThan(1000);
    expect(second.out).toBe(first.out);
    expect(second.err).toBe(first.err);
    expect(second.status).toBe(first.status);
  });

  it.each([
    ['screen --format json', SCREEN],
    ['pack --json with a Monte Carlo interval', PACK],
  ])('%s: two separate processes, and the same as in-process', async (_, args) => {
    const a = spawnCli(args);
    const b = spawnCli(args);
    expect(a.length).toBeGreaterThan(1000);
    expect(b).toBe(a);
    expect((await runInProcess(args, dir)).out).toBe(a);
  });

  it('the Monte Carlo interval is seeded: the default seed is stated, another seed gives other draws, the same seed the same', async () => {
    const base = JSON.parse((await runInProcess(PACK, dir)).out).finalTemperature;
    const seeded = JSON.parse((await runInProcess([...PACK, '--seed', '7'], dir)).out).finalTemperature;
    const again = JSON.parse((await runInProcess([...PACK, '--seed', '7'], dir)).out).finalTemperature;
    expect(base.interval).toBe('monte-carlo');
    expect(Number.isInteger(base.seed)).toBe(true);
    expect(seeded.seed).toBe(7);
    expect(again).toEqual(seeded);
    expect([seeded.low, seeded.high]).not.toEqual([base.low, base.high]);
  });
});

describe('shuffled input rows give the same rows', () => {
  /** The rows of a screen, without their line numbers, by input formula. */
  async function rowsByFormula(order: readonly string[], name: string): Promise<{ rows: Record<string, string>; summary: string }> {
    writeFileSync(join(dir, name), `formula\n${order.join('\n')}\n`);
    const r = await runInProcess(['screen', name, '--format', 'json', '--fill', '40:80@22'], dir);
    const out = JSON.parse(r.out) as { rows: { line: number; input: { formula: string } }[]; summary: unknown };
    // The contract: one row per input row, in input order, each with its line (header = line 1).
    expect(out.rows.map((x) => x.input.formula)).toEqual([...order]);
    expect(out.rows.map((x) => x.line)).toEqual(order.map((_, i) => i + 2));
    const rows: Record<string, string> = {};
    for (const row of out.rows) rows[row.input.formula] = JSON.stringify({ ...row, line: undefined });
    return { rows, summary: JSON.stringify(out.summary) };
  }

  it('for any order of the rows, each row (line number aside) and the summary are the same', async () => {
    const reference = await rowsByFormula(ROWS, 'ordered.csv');
    let n = 0;
    await fc.assert(
      fc.asyncProperty(fc.shuffledSubarray(ROWS, { minLength: ROWS.length, maxLength: ROWS.length }), async (order) => {
        const shuffled = await rowsByFormula(order, `shuffled-${n++}.csv`);
        expect(shuffled.rows).toEqual(reference.rows);
        expect(shuffled.summary).toBe(reference.summary);
      }),
      { numRuns: 8 },
    );
  });
});
