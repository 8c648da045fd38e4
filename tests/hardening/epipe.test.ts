/**
 * A reader that stops early (`ionheat screen big.csv | head -1`) closes the
 * pipe under the command; the next write fails with EPIPE. The built command
 * must then end quietly (no "Unhandled 'error' event", no stack trace) with
 * the status its results call for, as if the output had been read to the end:
 * a closed pipe never turns a failed spec into success (issue 13).
 * Spawns dist/cli.js (built by `npm test`) with a pipe on stdout.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const CLI = fileURLToPath(new URL('../../dist/cli.js', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'ionheat-epipe-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
// 20 000 rows: every output format of it is far larger than a pipe's buffer (64 KiB on Linux).
const formulas = ['NaCl', 'KNO3', 'NH4NO3', 'KCl', 'CaCl2·6H2O'];
writeFileSync(join(dir, 'big.csv'), `formula\n${Array.from({ length: 20_000 }, (_, i) => formulas[i % formulas.length]).join('\n')}\n`);

/**
 * Runs the CLI with stdout piped to a reader that closes the pipe after `keep`
 * newline-terminated lines (0: at once, before any output).
 */
function runClosingEarly(args: string[], keep: number): Promise<{ status: number | null; signal: NodeJS.Signals | null; err: string; lines: string[] }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [CLI, ...args], { cwd: dir, stdio: ['ignore', 'pipe', 'pipe'] });
    let err = '';
    let got = '';
    const lines: string[] = [];
    child.stderr.setEncoding('utf8').on('data', (t: string) => (err += t));
    if (keep === 0) child.stdout.destroy();
    else
      child.stdout.setEncoding('utf8').on('data', (t: string) => {
        got += t;
        const parts = got.split('\n');
        got = parts.pop()!;
        lines.push(...parts);
        if (lines.length >= keep) child.stdout.destroy();
      });
    child.on('error', reject);
    child.on('close', (status, signal) => resolve({ status, signal, err, lines: lines.slice(0, keep) }));
  });
}

describe('output to a reader that closes early', () => {
  it.each([
    [['screen', 'big.csv', '--format', 'csv'], 'line,status,input.formula', 0],
    [['screen', 'big.csv', '--format', 'json'], '{', 0],
    [['screen', 'big.csv'], '', 0],
    // Some enumerated salts have no enthalpy of solution: a whole run exits 2, and so does one cut short by the reader.
    [['screen', '--enumerate', '--format', 'csv'], 'line,status,input.formula', 2],
    // The spec fails for every row: 1, not 0, though the reader took only the header.
    [['screen', 'big.csv', '--format', 'csv', '--spec', 'best.low > 1000'], 'line,status,input.formula', 1],
  ])('ionheat %j | head -1: no EPIPE error, and the status of the whole screen', async (args, firstLine, status) => {
    const r = await runClosingEarly(args, 1);
    expect(r.err).not.toMatch(/EPIPE|Unhandled|at .+:\d+/);
    expect(r.status).toBe(status);
    expect(r.lines[0]!.startsWith(firstLine)).toBe(true);
    expect(r.err).toMatch(/^screen: \d+ rows read.*; output stopped early \(the reader closed it\)\n$/m);
  });

  it.each([
    [['dissolve', 'NaCl', '--json']],
    [['pack', '--salt', 'NH4NO3', '--salt-mass', '40', '--water', '100', '--json']],
    [['screen', 'big.csv', '--format', 'json']],
  ])('ionheat %j with the reader gone before any output: status 0, no EPIPE error', async (args) => {
    const r = await runClosingEarly(args, 0);
    expect(r.err).not.toMatch(/EPIPE|Unhandled|at .+:\d+/);
    expect(r.status).toBe(0);
  });
});
