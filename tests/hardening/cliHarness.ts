/**
 * Shared pieces of the hostile-input tests of the command line: an in-process
 * runner with buffered streams, a scratch directory of good and bad input
 * files, and checks of what a run may print.
 */
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { CliIO } from '../../src/node/cli/io.js';
import { runCli } from '../../src/node/cli/main.js';

export interface CliRun {
  status: number;
  out: string;
  err: string;
}

/** Runs `ionheat <argv>` in this process, with buffers for stdout and stderr. */
export async function runInProcess(argv: readonly string[], cwd: string, stdin = ''): Promise<CliRun> {
  let out = '';
  let err = '';
  const io: CliIO = { stdout: (t) => void (out += t), stderr: (t) => void (err += t), stderrIsTTY: false, readStdin: async () => stdin, cwd };
  const status = await runCli(argv, io);
  return { status, out, err };
}

/** A scratch directory with input files of every kind the tests need, by name. */
export function scratchFiles(): string {
  const dir = mkdtempSync(join(tmpdir(), 'ionheat-hostile-'));
  const files: Record<string, string> = {
    'good.csv': 'formula\nNaCl\nKNO3\nNH4NO3\n',
    'mixed.csv': 'formula,measuredEnthalpy\nNaCl,\nNaXy,\nKNO3,abc\n((((,\nNH4NO3,25.69\nNa999999999Cl999999999,\nCaCl2,1e9\n',
    'good.json': JSON.stringify(['NaCl', 'KNO3']),
    'bad.json': '{"formula": "NaCl", "formula": "KCl"}',
    'proto.json': '[{"formula": "NaCl", "__proto__": {"polluted": true}}]',
    'broken.json': '[{"formula": "NaCl"',
    'broken.csv': 'formula,measuredEnthalpy\n"NaCl,1\n',
    'unknown-column.csv': 'formula,colour\nNaCl,red\n',
    'empty.csv': '',
    'data-good.json': JSON.stringify({
      sources: { myLab: { citation: 'Invented test value', kind: 'derived' } },
      tables: { 'solution-enthalpies': [{ formula: 'KNO3', value: 34.9, unit: 'kJ/mol', uncertainty: 0.2, source: 'myLab', fromMemory: false }] },
    }),
    'data-dup.json': '{"tables": {"solution-enthalpies": []}, "tables": {}}',
    'data-proto.json': '{"tables": {"constructor": []}}',
    'data-badvalue.json': JSON.stringify({ tables: { 'solution-enthalpies': [{ formula: 'KNO3', value: 'hot', unit: 'kJ/mol', uncertainty: 0.2, source: 'commonPractice', fromMemory: true }] } }),
    'data-notjson.json': 'not json at all',
  };
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
  mkdirSync(join(dir, 'a-directory.csv'));
  return dir;
}

/** A line of a stack trace, as Node prints it. */
const STACK_LINE = /^\s+at .+(\(|:\d+)/m;

/**
 * What every run must satisfy: a known exit status, no stack trace, and on a
 * usage or input error (status 2) a one-line `ionheat: <problem>` message.
 * Returns a description of the first violation, or undefined.
 */
export function contractViolation(argv: readonly string[], run: CliRun): string | undefined {
  const shown = `ionheat ${argv.map((a) => (a.length > 60 ? `${a.slice(0, 60)}…(${a.length})` : a)).join(' ')}`;
  if (![0, 1, 2].includes(run.status)) return `${shown}: exit status ${run.status} (${run.err.slice(0, 300)})`;
  if (STACK_LINE.test(run.err) || STACK_LINE.test(run.out)) return `${shown}: a stack trace was printed: ${run.err.slice(0, 300)}`;
  if (run.err.includes('internal error')) return `${shown}: ${run.err.slice(0, 300)}`;
  if (run.status === 2) {
    const first = run.err.split('\n')[0] ?? '';
    // `screen` reports rows it could not compute in the rows themselves and ends with its summary line (exit 2).
    const screenSummary = /^screen: \d+ rows? read, \d+ computed, [1-9]\d* failed/.test(first);
    if (!screenSummary && !/^ionheat: \S.{4,}/.test(first)) return `${shown}: exit 2 without an "ionheat: <problem>" line: ${JSON.stringify(run.err.slice(0, 300))}`;
    if (!screenSummary && run.err.trim().split('\n').length !== 1) return `${shown}: the error takes more than one line: ${run.err.slice(0, 300)}`;
  }
  if (run.status === 1 && !(argv[0] === 'screen' || argv.includes('screen'))) return `${shown}: exit 1 outside screen`;
  return undefined;
}

/**
 * Every place in a JSON document where a number is missing or not finite:
 * `null` values (except at the paths listed as nullable for that output),
 * and the text NaN or Infinity outside strings (which JSON.stringify never
 * writes, but a hand-made writer could).
 */
export function badNumbers(json: unknown, nullable: ReadonlySet<string>, path = '$'): string[] {
  if (json === null) return nullable.has(path) ? [] : [path];
  if (typeof json === 'number') return Number.isFinite(json) ? [] : [path];
  if (Array.isArray(json)) return json.flatMap((v) => badNumbers(v, nullable, `${path}[]`));
  if (typeof json === 'object') return Object.entries(json as Record<string, unknown>).flatMap(([k, v]) => badNumbers(v, nullable, `${path}.${k}`));
  return [];
}
